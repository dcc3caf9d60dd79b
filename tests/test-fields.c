/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The field tables against every layer that derives from them: the
 * properties of RugosaLine and RugosaSettings, the project file reader and
 * writer, the fluid state handed to the core, the core's defaults and the
 * settings schema of the preferences.  (The file-format document and
 * rugosa-cli are checked by tests/check-fields-doc.py and
 * tests/cli-fields.py, the window's panel by the UI tests.)
 *
 * The expected values here are the table's own rows: what is checked is
 * that no layer keeps a range, default or name of its own. */
#include "config.h"

#include <math.h>
#include <string.h>

#include <cjson/cJSON.h>
#include <gio/gio.h>

#include "model/rugosa-fields.h"
#include "model/rugosa-project.h"
#include "model/rugosa-units.h"

static const RugosaField *
rows_of (gboolean settings, guint *n)
{
  return settings ? rugosa_settings_fields (n) : rugosa_line_fields (n);
}

/* Every row is a property of its object, of the kind and range the row
 * gives, with the row's default. */
static void
test_properties (void)
{
  for (int t = 0; t < 2; t++)
    {
      guint n;
      const RugosaField *rows = rows_of (t, &n);
      g_autoptr (GObject) object = t ? G_OBJECT (rugosa_settings_new ())
                                     : G_OBJECT (rugosa_line_new (NULL));
      GObjectClass *klass = G_OBJECT_GET_CLASS (object);
      guint n_specs;
      g_autofree GParamSpec **specs = g_object_class_list_properties (klass, &n_specs);

      /* no property without a row */
      g_assert_cmpuint (n_specs, ==, n);
      for (guint i = 0; i < n; i++)
        {
          const RugosaField *f = &rows[i];
          GParamSpec *p = g_object_class_find_property (klass, f->property);

          g_test_message ("%s", f->property);
          g_assert_nonnull (p);
          g_assert_nonnull (f->label);
          g_assert_nonnull (f->help);
          g_assert_true (rugosa_field_find (f->property) == f);
          g_assert_true (rugosa_field_find_path (t, f->path) == f);
          if (f->cli != NULL)
            g_assert_true (rugosa_field_find_cli (f->cli) == f);
          switch (f->kind)
            {
            case RUGOSA_FIELD_NUMBER:
              {
                GParamSpecDouble *d = G_PARAM_SPEC_DOUBLE (p);
                double v;

                g_assert_cmpfloat (d->maximum, ==, f->max);
                g_assert_cmpfloat (d->minimum, ==, (f->flags & RUGOSA_FIELD_ZERO_ABSENT) ? 0.0 : f->min);
                g_assert_cmpfloat (d->default_value, ==, f->dflt);
                g_object_get (object, f->property, &v, NULL);
                g_assert_cmpfloat (v, ==, f->dflt);
                /* the default itself is a valid value */
                g_assert_true (rugosa_field_in_range (f, f->dflt, NULL, NULL));
              }
              break;
            case RUGOSA_FIELD_ENUM:
              g_assert_true (G_IS_PARAM_SPEC_ENUM (p));
              g_assert_true (G_PARAM_SPEC_VALUE_TYPE (p) == f->enum_type ());
              g_assert_cmpint (G_PARAM_SPEC_ENUM (p)->default_value, ==, (int) f->dflt);
              break;
            case RUGOSA_FIELD_TEXT:
            case RUGOSA_FIELD_COLOUR:
            case RUGOSA_FIELD_CATALOG:
              g_assert_true (G_IS_PARAM_SPEC_STRING (p));
              g_assert_cmpstr (G_PARAM_SPEC_STRING (p)->default_value, ==, f->dflt_text);
              break;
            case RUGOSA_FIELD_FITTINGS:
            case RUGOSA_FIELD_UNIT_MAP:
            case RUGOSA_FIELD_CURVE:
              g_assert_true (G_IS_PARAM_SPEC_VARIANT (p));
              break;
            default:
              g_assert_not_reached ();
            }
        }
    }
}

/* The fluid state's defaults are the core's, and every state row reaches
 * the core's RgFluidSpec. */
static void
test_fluid_spec (void)
{
  guint n;
  const RugosaField *rows = rugosa_line_fields (&n);
  g_autoptr (RugosaLine) line = rugosa_line_new (NULL);
  RgFluidSpec core, spec;

  rg_fluid_spec_init (&core, RG_FLUID_WATER);
  for (guint i = 0; i < n; i++)
    {
      const RugosaField *f = &rows[i];

      if (f->flags & RUGOSA_FIELD_CORE_DEFAULT)
        g_assert_cmpfloat (f->dflt, ==, *(double *) G_STRUCT_MEMBER_P (&core, f->spec_offset));
      if (f->spec_offset >= 0)
        {
          /* a value of its own, inside the range */
          double v = f->max > 0 ? f->max : f->min;

          g_object_set (line, f->property, v, NULL);
          rugosa_line_get_fluid_spec (line, &spec);
          g_assert_cmpfloat (*(double *) G_STRUCT_MEMBER_P (&spec, f->spec_offset), ==, v);
        }
      /* every state of a fluid names the fluids it describes, and back */
      g_assert_true ((f->spec_offset >= 0) == (f->fluid_kinds != 0));
    }
}

/* A minimal valid document with `value` (JSON text) at the row's path in
 * the settings or in its only line. */
static char *
document_with (const RugosaField *f, gboolean settings, const char *value)
{
  static const char base[] =
    "{\"format\": \"rugosa-line-options\", \"version\": 1, \"settings\": {},"
    " \"lines\": [{\"name\": \"L\", \"material\": {\"roughness_m\": 4.5e-5},"
    " \"pipe\": {\"inner_diameter_m\": 0.1}, \"length_m\": 100,"
    " \"flow\": {\"design_m3_s\": 0.01}}]}";
  cJSON *root = cJSON_Parse (base);
  cJSON *obj = settings ? cJSON_GetObjectItemCaseSensitive (root, "settings")
                        : cJSON_GetArrayItem (cJSON_GetObjectItemCaseSensitive (root, "lines"), 0);
  g_auto (GStrv) parts = g_strsplit (f->path, ".", -1);
  guint depth = g_strv_length (parts);
  char *text;

  for (guint i = 0; i + 1 < depth; i++)
    {
      cJSON *sub = cJSON_GetObjectItemCaseSensitive (obj, parts[i]);

      if (sub == NULL)
        sub = cJSON_AddObjectToObject (obj, parts[i]);
      obj = sub;
    }
  cJSON_DeleteItemFromObjectCaseSensitive (obj, parts[depth - 1]);
  cJSON_AddItemToObject (obj, parts[depth - 1], cJSON_Parse (value));
  /* an object that is present needs its required members (fluid.kind) */
  {
    guint n;
    const RugosaField *rows = rows_of (settings, &n);
    cJSON *top = settings ? cJSON_GetObjectItemCaseSensitive (root, "settings")
                          : cJSON_GetArrayItem (cJSON_GetObjectItemCaseSensitive (root, "lines"), 0);

    for (guint i = 0; i < n; i++)
      {
        const char *dot = strrchr (rows[i].path, '.');
        g_autofree char *group = NULL;
        g_auto (GStrv) gparts = NULL;
        cJSON *g = top;

        if (!(rows[i].flags & RUGOSA_FIELD_REQUIRED_IN_GROUP) || dot == NULL || &rows[i] == f)
          continue;
        group = g_strndup (rows[i].path, (gsize) (dot - rows[i].path));
        if (!g_str_has_prefix (f->path, group) || f->path[strlen (group)] != '.')
          continue;
        gparts = g_strsplit (group, ".", -1);
        for (guint k = 0; gparts[k] != NULL; k++)
          g = cJSON_GetObjectItemCaseSensitive (g, gparts[k]);
        cJSON_AddStringToObject (g, dot + 1, rugosa_enum_nick (rows[i].enum_type (), (int) rows[i].dflt));
      }
  }
  text = cJSON_PrintUnformatted (root);
  cJSON_Delete (root);
  return text;
}

static gboolean
loads (const char *text, GError **error)
{
  g_autoptr (RugosaProject) p = rugosa_project_new_from_data (text, strlen (text), error);

  return p != NULL;
}

static char *
json_number (double x)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  return g_strdup (g_ascii_formatd (buf, sizeof buf, "%.17g", x));
}

/* The reader takes every number row's range, ends included (the lower end
 * excluded where the row says so), and refuses just outside it, naming
 * the row's path. */
static void
test_reader_ranges (void)
{
  for (int t = 0; t < 2; t++)
    {
      guint n;
      const RugosaField *rows = rows_of (t, &n);

      for (guint i = 0; i < n; i++)
        {
          const RugosaField *f = &rows[i];
          double step_lo = fmax (fabs (f->min) * 1e-6, 1e-12);
          double step_hi = fmax (fabs (f->max) * 1e-6, 1e-12);
          g_autofree char *lo = NULL, *hi = NULL, *below = NULL, *above = NULL;
          g_autofree char *d_lo = NULL, *d_hi = NULL, *d_below = NULL, *d_above = NULL;

          g_autofree char *prefix = NULL;
          g_autoptr (GError) error = NULL;

          if (f->kind != RUGOSA_FIELD_NUMBER)
            continue;
          g_test_message ("%s", f->path);
          lo = json_number ((f->flags & RUGOSA_FIELD_MIN_OPEN) ? f->min + step_lo : f->min);
          hi = json_number (f->max);
          below = json_number ((f->flags & RUGOSA_FIELD_MIN_OPEN) ? f->min : f->min - step_lo);
          above = json_number (f->max + step_hi);
          d_hi = document_with (f, t, hi);
          d_above = document_with (f, t, above);
          d_below = document_with (f, t, below);
          d_lo = document_with (f, t, lo);
          /* the settings' relations (the transition in order, the chart's
           * axes wide enough, the hours within a year) refuse some lone
           * ends; the flows' order too: the range alone is checked for
           * those by the refusals below */
          if (!g_str_has_prefix (f->path, "chart.") && !g_str_has_prefix (f->path, "transition.")
              && !g_str_has_prefix (f->path, "flow.") && !g_str_has_prefix (f->path, "energy.hours"))
            {
              g_assert_true (loads (d_lo, &error));
              g_assert_no_error (error);
              g_assert_true (loads (d_hi, &error));
              g_assert_no_error (error);
            }
          prefix = g_strdup_printf ("%s%s: ", t ? "settings." : "lines[0].", f->path);
          g_assert_false (loads (d_below, &error));
          g_assert_true (g_str_has_prefix (error->message, prefix));
          g_clear_error (&error);
          g_assert_false (loads (d_above, &error));
          g_assert_true (g_str_has_prefix (error->message, prefix));
        }
    }
}

/* The writer writes every row at its path: a project whose every number
 * lies away from its default reads back equal. */
static void
test_writer (void)
{
  g_autoptr (RugosaProject) p = rugosa_project_new ();
  g_autoptr (RugosaLine) line = rugosa_line_new ("L");
  g_autoptr (RugosaProject) q = NULL;
  g_autoptr (GError) error = NULL;
  g_autofree char *text = NULL;
  gsize length;

  rugosa_project_insert_line (p, 0, line);
  for (int t = 0; t < 2; t++)
    {
      guint n;
      const RugosaField *rows = rows_of (t, &n);
      GObject *target = t ? G_OBJECT (rugosa_project_get_settings (p)) : G_OBJECT (line);

      for (guint i = 0; i < n; i++)
        if (rows[i].kind == RUGOSA_FIELD_NUMBER)
          {
            /* between the default and the upper end, for rows whose
             * relations allow it */
            double v = rows[i].dflt + 0.25 * (rows[i].max - rows[i].dflt);

            if (g_str_has_prefix (rows[i].path, "chart.") || g_str_has_prefix (rows[i].path, "transition.")
                || g_str_has_prefix (rows[i].path, "flow.") || g_str_has_prefix (rows[i].path, "energy.hours"))
              continue;
            g_object_set (target, rows[i].property, v, NULL);
          }
    }
  g_object_set (line, "flow-minimum", 0.005, "flow-maximum", 0.02,
                "pump-curve", g_variant_new_parsed ("[(0.0, 40.0), (0.01, 35.5), (0.02, 22.25)]"), NULL);
  g_object_set (rugosa_project_get_settings (p), "currency", "Ł$",
                "hours-design", 5000.0, "hours-minimum", 1500.5, "hours-maximum", 250.0, NULL);
  text = rugosa_project_to_data (p, &length);
  q = rugosa_project_new_from_data (text, length, &error);
  g_assert_no_error (error);
  g_assert_true (rugosa_project_equal (p, q));
}

/* The preferences' schema holds, for each row that seeds new projects, a
 * key of that name with the row's range and default (the schema is
 * generated from the rows; this checks the generation). */
static void
test_schema (void)
{
  const char *dir = g_getenv ("RUGOSA_SCHEMA_DIR");
  g_autoptr (GSettingsSchemaSource) source = NULL;
  g_autoptr (GSettingsSchema) schema = NULL;
  g_autoptr (GError) error = NULL;
  guint n;
  const RugosaField *rows = rugosa_settings_fields (&n);

  if (dir == NULL)
    {
      g_test_skip ("RUGOSA_SCHEMA_DIR is not set");
      return;
    }
  source = g_settings_schema_source_new_from_directory (dir, NULL, TRUE, &error);
  g_assert_no_error (error);
  schema = g_settings_schema_source_lookup (source, "org.rugosa.Rugosa", FALSE);
  g_assert_nonnull (schema);
  for (guint i = 0; i < n; i++)
    {
      const RugosaField *f = &rows[i];
      g_autoptr (GSettingsSchemaKey) key = NULL;
      g_autoptr (GVariant) dflt = NULL;
      g_autoptr (GVariant) range = NULL;

      if (!(f->flags & RUGOSA_FIELD_SEEDED) || f->kind == RUGOSA_FIELD_UNIT_MAP)
        continue;
      g_test_message ("%s", f->property);
      g_assert_true (g_settings_schema_has_key (schema, f->property));
      key = g_settings_schema_get_key (schema, f->property);
      dflt = g_settings_schema_key_get_default_value (key);
      range = g_settings_schema_key_get_range (key);
      if (f->kind == RUGOSA_FIELD_NUMBER)
        {
          const char *type;
          g_autoptr (GVariant) detail = NULL;
          double lo, hi;

          g_assert_cmpfloat (g_variant_get_double (dflt), ==, f->dflt);
          g_variant_get (range, "(&sv)", &type, &detail);
          g_assert_cmpstr (type, ==, "range");
          g_variant_get (detail, "(dd)", &lo, &hi);
          g_assert_cmpfloat (lo, ==, f->min);
          g_assert_cmpfloat (hi, ==, f->max);
        }
      else if (f->kind == RUGOSA_FIELD_ENUM)
        g_assert_cmpstr (g_variant_get_string (dflt, NULL), ==,
                         rugosa_enum_nick (f->enum_type (), (int) f->dflt));
      else if (f->kind == RUGOSA_FIELD_TEXT)
        g_assert_cmpstr (g_variant_get_string (dflt, NULL), ==, f->dflt_text);
    }
  /* a unit key for every display quantity */
  for (int q = 0; q < RUGOSA_N_DISPLAY; q++)
    {
      const RugosaDisplayInfo *d = rugosa_display_info ((RugosaDisplayQuantity) q);
      g_autofree char *name = NULL;

      if (d == NULL)
        continue;
      name = g_strdup_printf ("unit-%s", d->id);
      g_strdelimit (name, "_", '-');
      g_assert_true (g_settings_schema_has_key (schema, name));
    }
}

/* A curve row (the pump curve): points read in order with their kept
 * members, written back, and every malformed point refused at its path.
 * The expected values are the document's own. */
static void
test_curve (void)
{
  const RugosaField *row = rugosa_field_find ("pump-curve");
  static const struct { const char *value; const char *where; } bad[] = {
    { "{}", "lines[0].pump.curve: " },
    { "[{\"flow_m3_s\": 0.02, \"head_m\": 30}, {\"flow_m3_s\": 0.01, \"head_m\": 35}]",
      "lines[0].pump.curve[1].flow_m3_s: " },
    { "[{\"flow_m3_s\": 0.01, \"head_m\": 30}, {\"flow_m3_s\": 0.01, \"head_m\": 35}]",
      "lines[0].pump.curve[1].flow_m3_s: " },
    { "[{\"flow_m3_s\": 0.01}]", "lines[0].pump.curve[0].head_m: " },
    { "[{\"flow_m3_s\": -0.01, \"head_m\": 3}]", "lines[0].pump.curve[0].flow_m3_s: " },
    { "[{\"flow_m3_s\": 0.01, \"head_m\": 1e5}]", "lines[0].pump.curve[0].head_m: " },
    { "[{\"flow_m3_s\": \"10 L/s\", \"head_m\": 3}]", "lines[0].pump.curve[0].flow_m3_s: " },
    { "[3]", "lines[0].pump.curve[0]: " },
  };
  g_autofree char *good = document_with (row, FALSE,
                                         "[{\"flow_m3_s\": 0, \"head_m\": 40, \"x_rated\": true},"
                                         " {\"flow_m3_s\": 0.01, \"head_m\": 35.5},"
                                         " {\"flow_m3_s\": 0.02, \"head_m\": 22.25}]");
  g_autoptr (GError) error = NULL;
  g_autoptr (RugosaProject) p = rugosa_project_new_from_data (good, strlen (good), &error);
  g_autoptr (GVariant) curve = NULL;
  g_autofree char *text = NULL;
  g_autoptr (RugosaProject) empty = rugosa_project_new ();
  g_autoptr (RugosaLine) plain = rugosa_line_new ("L");
  g_autofree char *plain_text = NULL;
  GString *many = g_string_new ("[");

  g_assert_no_error (error);
  g_object_get (rugosa_project_get_line (p, 0), "pump-curve", &curve, NULL);
  g_assert_cmpuint (g_variant_n_children (curve), ==, 3);
  {
    double q, h;

    g_variant_get_child (curve, 2, "(dd)", &q, &h);
    g_assert_cmpfloat (q, ==, 0.02);
    g_assert_cmpfloat (h, ==, 22.25);
  }
  /* a member this build does not know stays with its point */
  text = rugosa_project_to_data (p, NULL);
  g_assert_nonnull (strstr (text, "\"x_rated\""));
  g_assert_nonnull (strstr (text, "22.25"));

  for (guint i = 0; i < G_N_ELEMENTS (bad); i++)
    {
      g_autofree char *doc = document_with (row, FALSE, bad[i].value);

      g_test_message ("%s", bad[i].value);
      g_assert_false (loads (doc, &error));
      g_assert_true (g_str_has_prefix (error->message, bad[i].where));
      g_clear_error (&error);
    }
  for (int i = 0; i <= RUGOSA_CURVE_POINTS_MAX; i++)
    g_string_append_printf (many, "%s{\"flow_m3_s\": %d, \"head_m\": 1}", i ? ", " : "", i);
  g_string_append_c (many, ']');
  {
    g_autofree char *doc = document_with (row, FALSE, many->str);

    g_assert_false (loads (doc, &error));
    g_assert_true (g_str_has_prefix (error->message, "lines[0].pump.curve: "));
    g_clear_error (&error);
  }
  g_string_free (many, TRUE);

  /* a line with no cost and no pump writes neither object */
  rugosa_project_insert_line (empty, 0, plain);
  plain_text = rugosa_project_to_data (empty, NULL);
  g_assert_null (strstr (plain_text, "\"cost\""));
  g_assert_null (strstr (plain_text, "\"pump\""));
}

/* Each display quantity's usual units are units of its quantity. */
static void
test_display_units (void)
{
  for (int q = 0; q < RUGOSA_N_DISPLAY; q++)
    {
      const RugosaDisplayInfo *d = rugosa_display_info ((RugosaDisplayQuantity) q);

      if (d == NULL)
        continue;
      g_assert_true (rugosa_display_unit_valid ((RugosaDisplayQuantity) q, d->si_unit));
      g_assert_true (rugosa_display_unit_valid ((RugosaDisplayQuantity) q, d->us_unit));
      g_assert_cmpstr (rugosa_enum_nick (RUGOSA_TYPE_DISPLAY_QUANTITY, q), ==, d->id);
    }
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/fields/properties", test_properties);
  g_test_add_func ("/fields/fluid-spec", test_fluid_spec);
  g_test_add_func ("/fields/reader-ranges", test_reader_ranges);
  g_test_add_func ("/fields/writer", test_writer);
  g_test_add_func ("/fields/schema", test_schema);
  g_test_add_func ("/fields/display-units", test_display_units);
  g_test_add_func ("/fields/curve", test_curve);
  return g_test_run ();
}
