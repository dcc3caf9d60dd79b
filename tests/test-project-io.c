/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The project file: round trips, unknown fields kept, one test per class
 * of bad file (each asserting the message and that the open document did
 * not change).  Saving under failures: tests/test-data-safety.c. */
#include "config.h"

#include <errno.h>
#include <fcntl.h>
#include <string.h>
#include <sys/resource.h>
#include <sys/stat.h>
#include <unistd.h>

#include <cjson/cJSON.h>
#include <glib/gstdio.h>

#include "model/rugosa-project.h"

static char *
source_path (const char *relative)
{
  const char *root = g_getenv ("RUGOSA_SOURCE_DIR");

  return g_build_filename (root ? root : "..", relative, NULL);
}

static RugosaProject *
load_demo (void)
{
  g_autofree char *path = source_path ("data/demo.rugosa");
  g_autoptr (GError) error = NULL;
  RugosaProject *project = rugosa_project_new ();

  g_assert_true (rugosa_project_load (project, path, &error));
  g_assert_no_error (error);
  return project;
}

/* A project with every field away from its default. */
static RugosaProject *
full_project (void)
{
  RugosaProject *p = rugosa_project_new ();
  RugosaSettings *s = rugosa_project_get_settings (p);
  g_autoptr (RugosaLine) a = rugosa_line_new ("Ünïcode \"quoted\" name");
  g_autoptr (RugosaLine) b = rugosa_line_new ("Second");

  g_object_set (s, "unit-system", RUGOSA_UNIT_SYSTEM_US,
                "unit-overrides", g_variant_new_parsed ("{'flow': 'L/s', 'head': 'ft'}"),
                "friction-model", 3, "re-laminar-max", 2300.0,
                "re-turbulent-min", 3500.0, "chart-re-min", 700.0,
                "chart-re-max", 3e7, "chart-f-min", 0.007, "chart-f-max", 0.09,
                "service-age", 17.5, "velocity-limit", 2.2,
                "gradient-limit", 4.4, NULL);
  g_object_set (a, "colour", "#A0b1C2", "note", "line one\nline two",
                "fluid-kind", 3, "temperature", 301.5, "pressure", 4.5e5,
                "salinity", 0.031, "density", 876.5, "viscosity", 0.0123,
                "oil-t1", 310.0, "oil-nu1", 4.1e-5, "oil-t2", 360.0,
                "oil-nu2", 7.7e-6, "oil-density-ref", 880.0,
                "oil-t-ref", 290.0, "oil-expansion", 6.5e-4,
                "material-id", "cast-iron", "roughness", 1.3e-4,
                "aging-class-id", "moderate", "aging-rate", 3.3e-5,
                "pipe-designation", "NPS 6 Sch 40", "inner-diameter", 0.1234,
                "length", 1234.5, "elevation", -7.25,
                "flow-design", 0.0321, "flow-minimum", 0.011,
                "flow-maximum", 0.0456, NULL);
  rugosa_line_set_fittings (a, g_variant_new_parsed (
    "[('elbow-90-standard', 0.0, 4.0), ('', 0.35, 2.0), ('', 0.1, 0.0)]"));
  /* 0.1 + 0.2 is not a short decimal: the number must survive exactly. */
  g_object_set (b, "inner-diameter", 0.1 + 0.2, "length", 1.0 / 3.0,
                "fluid-kind", 1, NULL);
  rugosa_project_insert_line (p, 0, a);
  rugosa_project_insert_line (p, 1, b);
  return p;
}

static void
test_round_trip (void)
{
  g_autoptr (RugosaProject) p = full_project ();
  g_autoptr (RugosaProject) q = rugosa_project_new ();
  g_autoptr (GError) error = NULL;
  g_autofree char *dir = g_dir_make_tmp ("rugosa-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "full.rugosa", NULL);
  g_autofree char *a = NULL, *b = NULL;

  g_assert_true (rugosa_project_save (p, path, &error));
  g_assert_no_error (error);
  g_assert_true (rugosa_project_load (q, path, &error));
  g_assert_no_error (error);
  a = rugosa_project_to_data (p, NULL);
  b = rugosa_project_to_data (q, NULL);
  g_assert_cmpstr (a, ==, b);
  g_assert_true (rugosa_project_equal (p, q));
  g_assert_cmpfloat (rugosa_line_get_double (rugosa_project_get_line (q, 1), "inner-diameter"),
                     ==, 0.1 + 0.2);

  g_unlink (path);
  g_rmdir (dir);
}

static void
test_demo_round_trip (void)
{
  g_autoptr (RugosaProject) p = load_demo ();
  g_autoptr (RugosaProject) q = NULL;
  g_autoptr (GError) error = NULL;
  g_autofree char *text = rugosa_project_to_data (p, NULL);

  g_assert_cmpuint (rugosa_project_get_n_lines (p), >=, 5);
  q = rugosa_project_new_from_data (text, strlen (text), &error);
  g_assert_no_error (error);
  g_assert_true (rugosa_project_equal (p, q));
}

static const char unknown_doc[] =
  "{\"format\": \"rugosa-line-options\", \"version\": 1, \"x_top\": [1, {\"a\": null}],\n"
  " \"settings\": {\"x_set\": true, \"units\": {\"overrides\": {\"x_quantity\": \"furlong\"}},\n"
  "              \"chart\": {\"x_chart\": \"c\"}},\n"
  " \"lines\": [{\"name\": \"L\", \"x_line\": {\"deep\": [2]}, \"material\": {\"roughness_m\": 0, \"x_mat\": 1},\n"
  "   \"pipe\": {\"inner_diameter_m\": 0.1}, \"length_m\": 10,\n"
  "   \"fluid\": {\"kind\": \"water\", \"x_fluid\": 3, \"oil\": {\"x_oil\": 4}},\n"
  "   \"fittings\": [{\"k\": 1, \"count\": 1}, {\"k\": 2, \"count\": 1, \"x_fit\": 5}],\n"
  "   \"flow\": {\"design_m3_s\": 0.01, \"x_flow\": 6}}]}";

static void
test_unknown_fields_kept (void)
{
  g_autoptr (GError) error = NULL;
  g_autoptr (RugosaProject) p = rugosa_project_new_from_data (unknown_doc, strlen (unknown_doc), &error);
  g_autoptr (RugosaProject) q = NULL;
  g_autofree char *text = NULL;
  cJSON *root, *line;

  g_assert_no_error (error);
  text = rugosa_project_to_data (p, NULL);
  root = cJSON_Parse (text);
  g_assert_nonnull (root);
  line = cJSON_GetArrayItem (cJSON_GetObjectItem (root, "lines"), 0);
#define AT(obj, key) cJSON_GetObjectItemCaseSensitive (obj, key)
  g_assert_cmpint (cJSON_GetArraySize (AT (root, "x_top")), ==, 2);
  g_assert_true (cJSON_IsTrue (AT (AT (root, "settings"), "x_set")));
  g_assert_cmpstr (AT (AT (AT (AT (root, "settings"), "units"), "overrides"), "x_quantity")->valuestring, ==, "furlong");
  g_assert_cmpstr (AT (AT (AT (root, "settings"), "chart"), "x_chart")->valuestring, ==, "c");
  g_assert_nonnull (AT (AT (line, "x_line"), "deep"));
  g_assert_nonnull (AT (AT (line, "material"), "x_mat"));
  g_assert_nonnull (AT (AT (line, "fluid"), "x_fluid"));
  g_assert_nonnull (AT (AT (AT (line, "fluid"), "oil"), "x_oil"));
  g_assert_null (AT (cJSON_GetArrayItem (AT (line, "fittings"), 0), "x_fit"));
  g_assert_nonnull (AT (cJSON_GetArrayItem (AT (line, "fittings"), 1), "x_fit"));
  g_assert_nonnull (AT (AT (line, "flow"), "x_flow"));
  /* Unknown fields never override known ones after an edit. */
  g_assert_cmpfloat (AT (line, "length_m")->valuedouble, ==, 10.0);
#undef AT
  cJSON_Delete (root);

  /* A duplicated line keeps them too, and a second round trip is stable. */
  q = rugosa_project_new_from_data (text, strlen (text), &error);
  g_assert_no_error (error);
  {
    g_autofree char *again = rugosa_project_to_data (q, NULL);
    g_assert_cmpstr (again, ==, text);
  }
}

/* ---- bad files ---- */

/* Line and column in the expected messages are counted by hand in the
 * input text beside them (columns in characters, from 1). */
typedef struct {
  const char *name;
  const char *data;  /* NULL: built by the test */
  gssize length;     /* -1: strlen */
  int code;
  const char *message;
} BadFile;

#define OK_LINE "{\"name\": \"L\", \"material\": {\"roughness_m\": 0}, \"pipe\": {\"inner_diameter_m\": 0.1}, \"length_m\": 10, \"flow\": {\"design_m3_s\": 0.01}}"
#define DOC(lines) "{\"format\": \"rugosa-line-options\", \"version\": 1, \"lines\": [" lines "]}"

static const BadFile bad_files[] = {
  { "empty", "", -1, RUGOSA_PROJECT_ERROR_ENCODING, "The file is empty." },
  { "blank", " \n\t ", -1, RUGOSA_PROJECT_ERROR_ENCODING, "The file is empty." },
  { "truncated", "{\"format\": \"rugosa-line-options\", \"version\": 1, \"lines\": [{\"na", -1,
    RUGOSA_PROJECT_ERROR_SYNTAX, "ends too early at line 1, column 63" },
  { "not-json", "Line options:\n  main, 100 m\n", -1, RUGOSA_PROJECT_ERROR_SYNTAX,
    "not valid JSON: unexpected text at line 1, column 1" },
  { "syntax-position", "{\n  \"format\": ,\n}", -1, RUGOSA_PROJECT_ERROR_SYNTAX,
    "line 2, column 13" },
  { "trailing-garbage", DOC ("") " {}", -1, RUGOSA_PROJECT_ERROR_SYNTAX, "line 1, column 62" },
  { "not-utf8", "{\"format\": \"rugosa-line-options\", \"version\": 1, \"lines\": [], \"x\": \"\xff\"}", -1,
    RUGOSA_PROJECT_ERROR_ENCODING, "not valid UTF-8 text (line 1, column 68)" },
  { "nul-byte", "{\"format\"\0: 1}", 14, RUGOSA_PROJECT_ERROR_ENCODING,
    "NUL byte at line 1, column 10" },
  { "not-an-object", "[1, 2]", -1, RUGOSA_PROJECT_ERROR_FORMAT, "not a Rugosa project" },
  { "wrong-format-name", "{\"format\": \"other\", \"version\": 1, \"lines\": []}", -1,
    RUGOSA_PROJECT_ERROR_FORMAT, "\"format\" must be \"rugosa-line-options\"" },
  { "missing-version", "{\"format\": \"rugosa-line-options\", \"lines\": []}", -1,
    RUGOSA_PROJECT_ERROR_FORMAT, "version: this required field is missing" },
  { "fractional-version", "{\"format\": \"rugosa-line-options\", \"version\": 1.5, \"lines\": []}", -1,
    RUGOSA_PROJECT_ERROR_FORMAT, "version: expected a whole number" },
  { "newer-version", "{\"format\": \"rugosa-line-options\", \"version\": 2, \"lines\": [], \"new\": 1}", -1,
    RUGOSA_PROJECT_ERROR_VERSION,
    "version 2 of the project format, which is newer than this Rugosa reads (version 1)" },
  { "missing-lines", "{\"format\": \"rugosa-line-options\", \"version\": 1}", -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines: this required field is missing" },
  { "wrong-type-number", DOC (OK_LINE ", {\"name\": \"M\", \"material\": {\"roughness_m\": 0}, \"pipe\": {\"inner_diameter_m\": 0.1}, \"length_m\": 10, \"flow\": {\"design_m3_s\": \"0.02\"}}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[1].flow.design_m3_s: expected a number in m³/s, found a string" },
  { "wrong-type-object", DOC ("{\"name\": \"L\", \"material\": 3}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].material: expected an object, found a number" },
  { "wrong-type-string", DOC ("{\"name\": true}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].name: expected a string, found true or false" },
  { "missing-flow", DOC ("{\"name\": \"L\", \"material\": {\"roughness_m\": 0}, \"pipe\": {\"inner_diameter_m\": 0.1}, \"length_m\": 10}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].flow: this required field is missing" },
  { "missing-pipe-values", DOC ("{\"name\": \"L\", \"material\": {\"roughness_m\": 0}, \"pipe\": {}, \"length_m\": 10, \"flow\": {\"design_m3_s\": 0.01}}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].pipe: give \"designation\" or \"inner_diameter_m\"" },
  { "nan-literal", DOC ("{\"name\": \"L\", \"length_m\": NaN}"), -1,
    RUGOSA_PROJECT_ERROR_SYNTAX, "line 1, column 85" },
  { "huge-number", DOC ("{\"name\": \"L\", \"material\": {\"roughness_m\": 1e999}}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].material.roughness_m: the number is too large to be a finite value" },
  { "absurd-number", DOC ("{\"name\": \"L\", \"material\": {\"roughness_m\": 0}, \"pipe\": {\"inner_diameter_m\": 0.1}, \"length_m\": 1e300, \"flow\": {\"design_m3_s\": 0.01}}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].length_m: 1e+300 is out of range: expected 0.001 to 1e+07 m" },
  { "negative-diameter", DOC ("{\"name\": \"L\", \"material\": {\"roughness_m\": 0}, \"pipe\": {\"inner_diameter_m\": -0.1}}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].pipe.inner_diameter_m: -0.1 is out of range" },
  { "negative-flow", DOC ("{\"name\": \"L\", \"material\": {\"roughness_m\": 0}, \"pipe\": {\"inner_diameter_m\": 0.1}, \"length_m\": 10, \"flow\": {\"design_m3_s\": -1}}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].flow.design_m3_s: -1 is out of range: expected more than 0" },
  { "negative-count", DOC ("{\"name\": \"L\", \"material\": {\"roughness_m\": 0}, \"pipe\": {\"inner_diameter_m\": 0.1}, \"length_m\": 10, \"fittings\": [{\"k\": 1, \"count\": -2}]}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].fittings[0].count: -2 is out of range" },
  { "minimum-above-design", DOC ("{\"name\": \"L\", \"material\": {\"roughness_m\": 0}, \"pipe\": {\"inner_diameter_m\": 0.1}, \"length_m\": 10, \"flow\": {\"design_m3_s\": 0.01, \"minimum_m3_s\": 0.02}}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].flow.minimum_m3_s: the minimum flow must not exceed the design flow" },
  { "fitting-both", DOC ("{\"name\": \"L\", \"material\": {\"roughness_m\": 0}, \"pipe\": {\"inner_diameter_m\": 0.1}, \"length_m\": 10, \"fittings\": [{\"k\": 1, \"catalog\": \"x\", \"count\": 1}]}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].fittings[0]: give either \"catalog\"" },
  { "bad-colour", DOC ("{\"name\": \"L\", \"colour\": \"red\"}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].colour: expected a colour as \"#rrggbb\"" },
  { "bad-fluid-kind", DOC ("{\"name\": \"L\", \"fluid\": {\"kind\": \"lava\"}}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].fluid.kind: " },
  { "bad-friction-model", "{\"format\": \"rugosa-line-options\", \"version\": 1, \"settings\": {\"friction_model\": \"guess\"}, \"lines\": []}", -1,
    RUGOSA_PROJECT_ERROR_VALUE, "settings.friction_model: " },
  { "bad-transition-order", "{\"format\": \"rugosa-line-options\", \"version\": 1, \"settings\": {\"transition\": {\"re_laminar_max\": 5000}}, \"lines\": []}", -1,
    RUGOSA_PROJECT_ERROR_VALUE, "settings.transition.re_turbulent_min: " },
  { "bad-unit-system", "{\"format\": \"rugosa-line-options\", \"version\": 1, \"settings\": {\"units\": {\"system\": \"imperial\"}}, \"lines\": []}", -1,
    RUGOSA_PROJECT_ERROR_VALUE, "settings.units.system: expected \"si\" or \"us\", found \"imperial\"" },
  { "override-not-string", "{\"format\": \"rugosa-line-options\", \"version\": 1, \"settings\": {\"units\": {\"overrides\": {\"flow\": 3}}}, \"lines\": []}", -1,
    RUGOSA_PROJECT_ERROR_VALUE, "settings.units.overrides.flow: expected a string, found a number" },
  /* the project's date: ISO text of a real day, or empty */
  { "date-not-iso", "{\"format\": \"rugosa-line-options\", \"version\": 1, \"settings\": {\"project\": {\"date\": \"2.12.2026\"}}, \"lines\": []}", -1,
    RUGOSA_PROJECT_ERROR_VALUE, "settings.project.date: expected a date as \"YYYY-MM-DD\" or an empty string" },
  { "date-no-such-day", "{\"format\": \"rugosa-line-options\", \"version\": 1, \"settings\": {\"project\": {\"date\": \"2026-02-30\"}}, \"lines\": []}", -1,
    RUGOSA_PROJECT_ERROR_VALUE, "settings.project.date: expected a date" },
  { "title-control", "{\"format\": \"rugosa-line-options\", \"version\": 1, \"settings\": {\"project\": {\"title\": \"a\\nb\"}}, \"lines\": []}", -1,
    RUGOSA_PROJECT_ERROR_VALUE, "settings.project.title: the text holds a control character" },
  { "lines-not-array", "{\"format\": \"rugosa-line-options\", \"version\": 1, \"lines\": {}}", -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines: expected an array, found an object" },
  { "duplicate-key-top", "{\"format\": \"rugosa-line-options\", \"version\": 1, \"version\": 2, \"lines\": []}", -1,
    RUGOSA_PROJECT_ERROR_FORMAT, "the key \"version\" appears more than once" },
  { "duplicate-key-nested", DOC ("{\"name\": \"L\", \"flow\": {\"design_m3_s\": 1, \"design_m3_s\": 2}}"), -1,
    RUGOSA_PROJECT_ERROR_FORMAT, "lines[0].flow: the key \"design_m3_s\" appears more than once" },
  { "deep-nesting", NULL, -1, RUGOSA_PROJECT_ERROR_SYNTAX, "nested deeper than 32 levels at line 1, column 98" },
  /* Common practice (no single source): the file format's own limits,
   * RUGOSA_FILE_MAX_LINES (10 000) line options and 200 fittings. */
  { "too-many-lines", NULL, -1, RUGOSA_PROJECT_ERROR_VALUE, "lines: more than 10000 line options" },
  /* Counted while reading: refused before the text after the line option
   * too many is parsed (here it is not even JSON). */
  { "too-many-lines-early", NULL, -1, RUGOSA_PROJECT_ERROR_VALUE, "lines: more than 10000 line options" },
  /* A key spelled with escapes is counted by the loader after parsing. */
  { "too-many-lines-escaped-key", NULL, -1, RUGOSA_PROJECT_ERROR_VALUE, "lines: more than 10000 line options" },
  /* cJSON cuts a string at \u0000: the reader refuses it with its path. */
  { "nul-in-name", DOC ("{\"name\": \"L\\u0000x\"}"), -1, RUGOSA_PROJECT_ERROR_VALUE,
    "lines[0].name: the string holds a NUL character (\\u0000)" },
  { "nul-in-format", "{\"format\": \"rugosa-line-options\\u0000junk\", \"version\": 1, \"lines\": []}", -1,
    RUGOSA_PROJECT_ERROR_VALUE, "format: the string holds a NUL character (\\u0000)" },
  { "nul-in-catalog-id", DOC ("{\"name\": \"L\", \"material\": {\"catalog\": \"pe\\u0000x\"}}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].material.catalog: the string holds a NUL character (\\u0000)" },
  { "nul-in-unknown-field", "{\"format\": \"rugosa-line-options\", \"version\": 1, \"x_extra\": [1, {\"a\": \"\\u0000\"}], \"lines\": []}", -1,
    RUGOSA_PROJECT_ERROR_VALUE, "x_extra[1].a: the string holds a NUL character (\\u0000)" },
  { "nul-in-key", DOC ("{\"name\": \"L\", \"na\\u0000me\": 1}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].na: the key holds a NUL character (\\u0000)" },
  /* Control characters (Unicode Cc: C0, DEL, C1) in every kind of text
   * the file holds; only a note takes line breaks and tabs. */
  { "escape-in-name", DOC ("{\"name\": \"a\\u001b[2Jb\"}"), -1, RUGOSA_PROJECT_ERROR_VALUE,
    "lines[0].name: the text holds a control character (a line break, a tab or another)" },
  { "newline-in-name", DOC ("{\"name\": \"two\\nlines\"}"), -1, RUGOSA_PROJECT_ERROR_VALUE,
    "lines[0].name: the text holds a control character" },
  { "del-in-name", DOC ("{\"name\": \"a\x7f\"}"), -1, RUGOSA_PROJECT_ERROR_VALUE,
    "lines[0].name: the text holds a control character" },
  { "c1-in-designation", DOC ("{\"name\": \"L\", \"material\": {\"roughness_m\": 0}, \"pipe\": {\"designation\": \"NPS 2\\u009b Sch 40\"}}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].pipe.designation: the text holds a control character" },
  { "tab-in-material-id", DOC ("{\"name\": \"L\", \"material\": {\"catalog\": \"cast\\tiron\"}}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].material.catalog: the text holds a control character" },
  { "escape-in-aging-class", DOC ("{\"name\": \"L\", \"material\": {\"roughness_m\": 0}, \"aging\": {\"class\": \"\\u001bmoderate\"}}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].aging.class: the text holds a control character" },
  { "escape-in-fluid-kind", DOC ("{\"name\": \"L\", \"fluid\": {\"kind\": \"water\\u001b\"}}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].fluid.kind: the text holds a control character" },
  { "escape-in-note", DOC ("{\"name\": \"L\", \"note\": \"fine\\n\\tand\\u001b[31m red\"}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].note: the text holds a control character other than a line break or a tab" },
  { "bell-in-fitting-id", DOC ("{\"name\": \"L\", \"material\": {\"roughness_m\": 0}, \"pipe\": {\"inner_diameter_m\": 0.1}, \"length_m\": 10, \"fittings\": [{\"catalog\": \"elbow-90-standard\\u0007\", \"count\": 1}]}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].fittings[0].catalog: expected a fitting id of the catalog" },
  { "escape-in-unit-override", "{\"format\": \"rugosa-line-options\", \"version\": 1, \"settings\": {\"units\": {\"overrides\": {\"flow\": \"L/s\\u001b[0m\"}}}, \"lines\": []}", -1,
    RUGOSA_PROJECT_ERROR_VALUE, "settings.units.overrides.flow: the text holds a control character" },
  { "escape-in-unit-system", "{\"format\": \"rugosa-line-options\", \"version\": 1, \"settings\": {\"units\": {\"system\": \"si\\u009b\"}}, \"lines\": []}", -1,
    RUGOSA_PROJECT_ERROR_VALUE, "settings.units.system: the text holds a control character" },
  /* An escaped backslash before "u0000" is no NUL: the file loads as far
   * as its fields (the name is two backslashes and "u0000"). */
  { "escaped-backslash-not-nul", DOC ("{\"name\": \"\\\\u0000\", \"material\": 3}"), -1,
    RUGOSA_PROJECT_ERROR_VALUE, "lines[0].material: expected an object, found a number" },
  { "too-many-fittings", NULL, -1, RUGOSA_PROJECT_ERROR_VALUE, "lines[0].fittings: more than 200 fittings" },
  { "long-name", NULL, -1, RUGOSA_PROJECT_ERROR_VALUE, "lines[0].name: the string is longer than 200 characters" },
};

static char *
build_bad (const BadFile *bad, gsize *length)
{
  GString *s = g_string_new (NULL);

  if (strcmp (bad->name, "deep-nesting") == 0)
    {
      g_string_append (s, "{\"format\": \"rugosa-line-options\", \"version\": 1, \"lines\": [], \"x\": ");
      for (int i = 0; i < 40; i++)
        g_string_append_c (s, '[');
      for (int i = 0; i < 40; i++)
        g_string_append_c (s, ']');
      g_string_append_c (s, '}');
    }
  else if (g_str_has_prefix (bad->name, "too-many-lines"))
    {
      gboolean escaped = strcmp (bad->name, "too-many-lines-escaped-key") == 0;

      g_string_append_printf (s, "{\"format\": \"rugosa-line-options\", \"version\": 1, \"%s\": [",
                              escaped ? "line\\u0073" : "lines");
      for (int i = 0; i < 10001; i++)
        g_string_append (s, i ? ", {}" : "{}");
      if (strcmp (bad->name, "too-many-lines-early") == 0)
        g_string_append (s, ", this is no JSON");
      else
        g_string_append (s, "]}");
    }
  else if (strcmp (bad->name, "too-many-fittings") == 0)
    {
      g_string_append (s, DOC ("{\"name\": \"L\", \"material\": {\"roughness_m\": 0}, \"pipe\": {\"inner_diameter_m\": 0.1}, \"length_m\": 10, \"fittings\": ["));
      g_string_truncate (s, s->len - 2); /* drop the "]}" of DOC */
      for (int i = 0; i < 201; i++)
        g_string_append (s, i ? ", {\"k\": 1, \"count\": 1}" : "{\"k\": 1, \"count\": 1}");
      g_string_append (s, "]}]}");
    }
  else if (strcmp (bad->name, "long-name") == 0)
    {
      g_string_append (s, "{\"format\": \"rugosa-line-options\", \"version\": 1, \"lines\": [{\"name\": \"");
      for (int i = 0; i < 201; i++)
        g_string_append (s, "é");
      g_string_append (s, "\"}]}");
    }
  else
    g_string_append_len (s, bad->data, bad->length >= 0 ? bad->length : (gssize) strlen (bad->data));
  *length = s->len;
  return g_string_free (s, FALSE);
}

static void
test_bad_file (gconstpointer data)
{
  const BadFile *bad = data;
  g_autoptr (RugosaProject) project = load_demo ();
  g_autofree char *before = rugosa_project_to_data (project, NULL);
  g_autofree char *after = NULL;
  g_autofree char *dir = g_dir_make_tmp ("rugosa-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "bad.rugosa", NULL);
  g_autofree char *content = NULL;
  g_autoptr (GError) error = NULL;
  guint n_before = rugosa_project_get_n_lines (project);
  gsize length;

  content = build_bad (bad, &length);
  g_assert_true (g_file_set_contents (path, content, (gssize) length, NULL));

  g_assert_false (rugosa_project_load (project, path, &error));
  g_assert_error (error, RUGOSA_PROJECT_ERROR, bad->code);
  if (strstr (error->message, bad->message) == NULL)
    g_test_fail_printf ("message “%s” does not contain “%s”", error->message,
                        bad->message);
  g_assert_true (g_str_has_prefix (error->message, "bad.rugosa: "));

  /* The open document is untouched. */
  after = rugosa_project_to_data (project, NULL);
  g_assert_cmpstr (after, ==, before);
  g_assert_cmpuint (rugosa_project_get_n_lines (project), ==, n_before);

  g_unlink (path);
  g_rmdir (dir);
}

/* A note keeps its line breaks and tabs through a save and a load. */
static void
test_note_multiline (void)
{
  static const char doc[] = DOC ("{\"name\": \"L\", \"note\": \"first\\n\\tsecond\", \"material\": {\"roughness_m\": 0}, \"pipe\": {\"inner_diameter_m\": 0.1}, \"length_m\": 10, \"flow\": {\"design_m3_s\": 0.01}}");
  g_autoptr (GError) error = NULL;
  g_autoptr (RugosaProject) p = rugosa_project_new_from_data (doc, strlen (doc), &error);
  g_autofree char *note = NULL;

  g_assert_no_error (error);
  g_object_get (rugosa_project_get_line (p, 0), "note", &note, NULL);
  g_assert_cmpstr (note, ==, "first\n\tsecond");
}

static void
test_missing_file (void)
{
  g_autoptr (RugosaProject) project = rugosa_project_new ();
  g_autoptr (GError) error = NULL;

  g_assert_false (rugosa_project_load (project, "/nonexistent/dir/x.rugosa", &error));
  g_assert_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_IO);
  g_assert_nonnull (strstr (error->message, "Cannot read “x.rugosa”"));
}

/* ---- bounded reading ---- */

/* The most memory a refusal below may cost the process, in KiB of peak
 * resident size (getrusage).  Common practice (no single source): far
 * below the 1 GiB that reading the files whole would take, well above a
 * test program's own size (under AddressSanitizer too). */
#define REFUSAL_RSS_MAX_KIB (256 * 1024)

static long
peak_rss_kib (void)
{
  struct rusage ru;

  g_assert_cmpint (getrusage (RUSAGE_SELF, &ru), ==, 0);
  return ru.ru_maxrss;
}

/* One sentence on one line. */
static void
assert_one_line (const GError *error)
{
  g_assert_nonnull (error);
  g_assert_null (strchr (error->message, '\n'));
  g_assert_true (g_str_has_suffix (error->message, "."));
}

/* A FIFO with no writer would block a plain open() for ever: the load
 * runs in a subprocess with a timeout and must come back refused. */
static void
test_read_fifo (void)
{
  if (g_test_subprocess ())
    {
      g_autoptr (RugosaProject) p = rugosa_project_new ();
      g_autoptr (GError) error = NULL;

      g_assert_false (rugosa_project_load (p, g_getenv ("RUGOSA_READ_PATH"), &error));
      g_assert_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_IO);
      g_assert_cmpstr (error->message, ==,
                       "Cannot read “pipe.rugosa”: it is not a regular file (a pipe, a device or a socket).");
      return;
    }
  {
    g_autofree char *dir = g_dir_make_tmp ("rugosa-XXXXXX", NULL);
    g_autofree char *path = g_build_filename (dir, "pipe.rugosa", NULL);

    g_assert_cmpint (mkfifo (path, 0600), ==, 0);
    g_setenv ("RUGOSA_READ_PATH", path, TRUE);
    /* 10 s: a hang, not a slow machine, fails this */
    g_test_trap_subprocess (NULL, 10 * G_USEC_PER_SEC, G_TEST_SUBPROCESS_INHERIT_STDERR);
    g_unsetenv ("RUGOSA_READ_PATH");
    g_unlink (path);
    g_rmdir (dir);
    g_test_trap_assert_passed ();
  }
}

/* A sparse file of 1 GiB is refused from its size, before a byte is
 * read: no memory, no time. */
static void
test_read_sparse (void)
{
  if (g_test_subprocess ())
    {
      g_autoptr (RugosaProject) p = rugosa_project_new ();
      g_autoptr (GError) error = NULL;
      gint64 start = g_get_monotonic_time ();

      g_assert_false (rugosa_project_load (p, g_getenv ("RUGOSA_READ_PATH"), &error));
      g_test_message ("refused in %.3f ms, peak resident size %ld KiB",
                      (double) (g_get_monotonic_time () - start) / 1000.0, peak_rss_kib ());
      g_assert_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_ENCODING);
      g_assert_cmpstr (error->message, ==, "“sparse.rugosa” is larger than 16 MiB: it is not a Rugosa project.");
      g_assert_cmpint (peak_rss_kib (), <, REFUSAL_RSS_MAX_KIB);
      return;
    }
  {
    g_autofree char *dir = g_dir_make_tmp ("rugosa-XXXXXX", NULL);
    g_autofree char *path = g_build_filename (dir, "sparse.rugosa", NULL);
    int fd = open (path, O_WRONLY | O_CREAT | O_TRUNC, 0600);

    g_assert_cmpint (fd, >=, 0);
    /* 1 GiB of holes: no disk space taken */
    g_assert_cmpint (ftruncate (fd, (off_t) 1 << 30), ==, 0);
    close (fd);
    g_setenv ("RUGOSA_READ_PATH", path, TRUE);
    g_test_trap_subprocess (NULL, 10 * G_USEC_PER_SEC, G_TEST_SUBPROCESS_INHERIT_STDERR);
    g_unsetenv ("RUGOSA_READ_PATH");
    g_unlink (path);
    g_rmdir (dir);
    g_test_trap_assert_passed ();
  }
}

/* A link to /dev/zero (endless) and a folder are refused before reading. */
static void
test_read_not_regular (void)
{
  g_autofree char *dir = g_dir_make_tmp ("rugosa-XXXXXX", NULL);
  g_autofree char *zero = g_build_filename (dir, "zero.rugosa", NULL);
  g_autofree char *folder = g_build_filename (dir, "folder.rugosa", NULL);
  g_autoptr (RugosaProject) p = load_demo ();
  g_autofree char *before = rugosa_project_to_data (p, NULL);
  g_autofree char *after = NULL;
  g_autoptr (GError) error = NULL;

  g_assert_cmpint (symlink ("/dev/zero", zero), ==, 0);
  g_assert_cmpint (g_mkdir (folder, 0700), ==, 0);

  g_assert_false (rugosa_project_load (p, zero, &error));
  g_assert_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_IO);
  g_assert_cmpstr (error->message, ==,
                   "Cannot read “zero.rugosa”: it is not a regular file (a pipe, a device or a socket).");
  g_clear_error (&error);
  g_assert_false (rugosa_project_load (p, folder, &error));
  g_assert_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_IO);
  g_assert_cmpstr (error->message, ==, "Cannot read “folder.rugosa”: it is a folder, not a file.");
  g_clear_error (&error);
  /* a name that would break the line is shown on one line */
  g_assert_false (rugosa_project_load (p, "/nonexistent/two\nlines.rugosa", &error));
  g_assert_cmpstr (error->message, ==, "Cannot read “two?lines.rugosa”: No such file or directory.");
  assert_one_line (error);

  after = rugosa_project_to_data (p, NULL);
  g_assert_cmpstr (after, ==, before);
  g_unlink (zero);
  g_rmdir (folder);
  g_rmdir (dir);
}

/* A stream the user names (standard input) is read to its end but capped
 * while reading: /dev/zero as the stream stops at the limit. */
static void
test_read_stream_capped (void)
{
  if (g_test_subprocess ())
    {
      g_autoptr (RugosaProject) p = rugosa_project_new ();
      g_autoptr (GError) error = NULL;
      int fd = open ("/dev/zero", O_RDONLY);

      g_assert_cmpint (fd, >=, 0);
      g_assert_false (rugosa_project_load_stream (p, fd, "standard input", &error));
      close (fd);
      g_test_message ("peak resident size %ld KiB", peak_rss_kib ());
      g_assert_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_ENCODING);
      g_assert_cmpstr (error->message, ==, "“standard input” is larger than 16 MiB: it is not a Rugosa project.");
      g_assert_cmpint (peak_rss_kib (), <, REFUSAL_RSS_MAX_KIB);
      return;
    }
  g_test_trap_subprocess (NULL, 30 * G_USEC_PER_SEC, G_TEST_SUBPROCESS_INHERIT_STDERR);
  g_test_trap_assert_passed ();
}

/* A stream that holds a project loads it; one behind which a sparse
 * regular file hides is refused from its size. */
static void
test_read_stream (void)
{
  g_autofree char *demo = source_path ("data/demo.rugosa");
  g_autofree char *dir = g_dir_make_tmp ("rugosa-XXXXXX", NULL);
  g_autofree char *sparse = g_build_filename (dir, "sparse", NULL);
  g_autoptr (RugosaProject) from_file = load_demo ();
  g_autoptr (RugosaProject) p = rugosa_project_new ();
  g_autoptr (GError) error = NULL;
  g_autofree char *text = NULL;
  gsize length;
  int fds[2], fd;

  /* a pipe, as a shell's "<" or "|" gives */
  g_assert_true (g_file_get_contents (demo, &text, &length, NULL));
  g_assert_cmpint (pipe (fds), ==, 0);
  g_assert_cmpint (write (fds[1], text, length), ==, (gssize) length);
  close (fds[1]);
  g_assert_true (rugosa_project_load_stream (p, fds[0], "standard input", &error));
  g_assert_no_error (error);
  close (fds[0]);
  g_assert_true (rugosa_project_equal (p, from_file));

  fd = open (sparse, O_RDWR | O_CREAT | O_TRUNC, 0600);
  g_assert_cmpint (fd, >=, 0);
  g_assert_cmpint (ftruncate (fd, (off_t) 1 << 30), ==, 0);
  g_assert_false (rugosa_project_load_stream (p, fd, "standard input", &error));
  g_assert_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_ENCODING);
  close (fd);
  g_assert_true (rugosa_project_equal (p, from_file));
  g_unlink (sparse);
  g_rmdir (dir);
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/project/io/round-trip", test_round_trip);
  g_test_add_func ("/project/io/demo-round-trip", test_demo_round_trip);
  g_test_add_func ("/project/io/unknown-fields-kept", test_unknown_fields_kept);
  g_test_add_func ("/project/io/missing-file", test_missing_file);
  g_test_add_func ("/project/io/note-multiline", test_note_multiline);
  g_test_add_func ("/project/io/read/fifo", test_read_fifo);
  g_test_add_func ("/project/io/read/sparse-1gib", test_read_sparse);
  g_test_add_func ("/project/io/read/not-regular", test_read_not_regular);
  g_test_add_func ("/project/io/read/stream", test_read_stream);
  g_test_add_func ("/project/io/read/stream-capped", test_read_stream_capped);
  for (guint i = 0; i < G_N_ELEMENTS (bad_files); i++)
    {
      g_autofree char *name = g_strdup_printf ("/project/io/bad/%s", bad_files[i].name);
      g_test_add_data_func (name, &bad_files[i], test_bad_file);
    }
  return g_test_run ();
}
