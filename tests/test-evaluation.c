/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Evaluation of line options: agreement with direct calls of the core,
 * the cache (recomputation only after a change), errors as sentences,
 * warnings, and the table / CSV / JSON output. */
#include "config.h"

#include <locale.h>
#include <math.h>
#include <string.h>

#include <cjson/cJSON.h>

#include "core/aging.h"
#include "core/fluid.h"
#include "core/line.h"
#include "model/rugosa-project.h"

/* A line with custom fluid, bore and roughness and plain K fittings, so
 * that the direct computation below needs no catalog. */
static RugosaLine *
custom_line (const char *name)
{
  RugosaLine *line = rugosa_line_new (name);

  g_object_set (line, "fluid-kind", RG_FLUID_CUSTOM, "density", 998.0,
                "viscosity", 1.0e-3, "inner-diameter", 0.1,
                "roughness", 5.0e-5, "aging-rate", 2.0e-5, "length", 300.0,
                "elevation", 4.0, "flow-design", 0.02, "flow-minimum", 0.01,
                "flow-maximum", 0.03, NULL);
  rugosa_line_set_fittings (line, g_variant_new_parsed ("[('', 0.5, 2.0), ('', 1.0, 1.0)]"));
  return line;
}

static RugosaProject *
project_with (RugosaLine *line)
{
  RugosaProject *p = rugosa_project_new ();

  rugosa_project_insert_line (p, 0, line);
  return p;
}

static void
assert_same_result (const RgLineResult *a, const RgLineResult *b)
{
  /* The model must pass the inputs through unchanged, so the results are
   * identical to the bit, not merely close. */
  g_assert_cmpfloat (a->velocity_m_s, ==, b->velocity_m_s);
  g_assert_cmpfloat (a->reynolds, ==, b->reynolds);
  g_assert_cmpfloat (a->friction.f, ==, b->friction.f);
  g_assert_cmpint (a->friction.regime, ==, b->friction.regime);
  g_assert_cmpint (a->friction.zone, ==, b->friction.zone);
  g_assert_cmpfloat (a->head_loss_major_m, ==, b->head_loss_major_m);
  g_assert_cmpfloat (a->head_loss_minor_m, ==, b->head_loss_minor_m);
  g_assert_cmpfloat (a->pressure_drop_pa, ==, b->pressure_drop_pa);
  g_assert_cmpfloat (a->gradient_m_per_100m, ==, b->gradient_m_per_100m);
  g_assert_cmpfloat (a->wall_shear_pa, ==, b->wall_shear_pa);
}

static void
test_matches_core (void)
{
  g_autoptr (RugosaLine) line = custom_line ("x");
  g_autoptr (RugosaProject) p = project_with (line);
  const double age = 15.0;
  const RugosaLineResults *r = rugosa_project_get_results_at (p, line, age);
  const double flows[] = { 0.02, 0.01, 0.03 };

  g_assert_true (r->ok);
  g_assert_cmpfloat (r->density_kg_m3, ==, 998.0);
  g_assert_cmpfloat (r->inner_diameter_m, ==, 0.1);
  g_assert_cmpfloat (r->roughness_new_m, ==, 5.0e-5);
  for (int c = 0; c < RUGOSA_N_FLOWS; c++)
    {
      const RugosaOperatingPoint *pt = &r->points[c];
      RgLineInput in;
      RgLineResult direct_new, direct_aged;
      double eps;

      g_assert_true (pt->present);
      g_assert_true (pt->ok);
      g_assert_cmpfloat (pt->flow_m3_s, ==, flows[c]);
      /* Plain K values add up regardless of Re: 2·0.5 + 1·1.0. */
      g_assert_cmpfloat_with_epsilon (pt->minor_loss_k_total, 2.0, 1e-15);

      rg_line_input_init (&in);
      in.flow_m3_s = flows[c];
      in.diameter_m = 0.1;
      in.length_m = 300.0;
      in.roughness_m = 5.0e-5;
      in.k_sum = pt->minor_loss_k_total;
      in.elevation_m = 4.0;
      in.density_kg_m3 = 998.0;
      in.viscosity_pa_s = 1.0e-3;
      g_assert_cmpint (rg_line_evaluate (&in, &direct_new, NULL), ==, RG_OK);
      g_assert_cmpint (rg_aging_roughness (5.0e-5, 2.0e-5, age, &eps, NULL), ==, RG_OK);
      in.roughness_m = eps;
      g_assert_cmpint (rg_line_evaluate (&in, &direct_aged, NULL), ==, RG_OK);

      assert_same_result (&pt->result_new, &direct_new);
      assert_same_result (&pt->result, &direct_aged);
      g_assert_cmpfloat (r->roughness_m, ==, eps);
      g_assert_cmpfloat_with_epsilon (pt->head_loss_ratio_to_new,
                                      direct_aged.head_loss_total_m
                                      / direct_new.head_loss_total_m, 1e-12);
      /* A rougher pipe loses more head. */
      g_assert_cmpfloat (pt->head_loss_ratio_to_new, >, 1.0);
    }
}

static void
test_cache (void)
{
  g_autoptr (RugosaLine) a = custom_line ("a");
  g_autoptr (RugosaLine) b = custom_line ("b");
  g_autoptr (RugosaProject) p = project_with (a);
  RugosaSettings *s = rugosa_project_get_settings (p);
  guint64 n;

  rugosa_project_insert_line (p, 1, b);
  n = rugosa_project_get_evaluation_count (p);
  rugosa_project_get_results (p, a);
  rugosa_project_get_results (p, b);
  g_assert_cmpuint (rugosa_project_get_evaluation_count (p), ==, n + 2);
  /* Asking again computes nothing. */
  rugosa_project_get_results (p, a);
  rugosa_project_get_results (p, b);
  g_assert_cmpuint (rugosa_project_get_evaluation_count (p), ==, n + 2);

  /* An edit of a dirties a only; an equal value dirties nothing. */
  rugosa_line_set_double (a, "length", 301.0);
  rugosa_line_set_double (b, "length", 300.0);
  rugosa_project_get_results (p, a);
  rugosa_project_get_results (p, b);
  g_assert_cmpuint (rugosa_project_get_evaluation_count (p), ==, n + 3);
  g_assert_cmpfloat (rugosa_project_get_results (p, a)->points[0].result.head_loss_major_m,
                     >, rugosa_project_get_results (p, b)->points[0].result.head_loss_major_m);

  /* A settings change (here the age) dirties every line. */
  g_object_set (s, "service-age", 5.0, NULL);
  rugosa_project_get_results (p, a);
  rugosa_project_get_results (p, b);
  g_assert_cmpuint (rugosa_project_get_evaluation_count (p), ==, n + 5);
  g_assert_cmpfloat (rugosa_project_get_results (p, a)->age_years, ==, 5.0);
  g_assert_cmpuint (rugosa_project_get_evaluation_count (p), ==, n + 5);

  /* Moving lines is no change of their inputs. */
  rugosa_project_move_line (p, 0, 1);
  rugosa_project_get_results (p, a);
  g_assert_cmpuint (rugosa_project_get_evaluation_count (p), ==, n + 5);
}

static void
assert_no_nan (const RugosaLineResults *r)
{
  const double *x = (const double *) &r->points[0].result;

  for (gsize i = 0; i < sizeof (RgLineResult) / sizeof (double); i++)
    if (r->points[0].ok)
      g_assert_true (isfinite (x[i]) || x[i] == 0.0);
  g_assert_true (isfinite (r->density_kg_m3));
  g_assert_true (isfinite (r->inner_diameter_m));
}

static void
test_errors (void)
{
  g_autoptr (RugosaLine) line = custom_line ("bad");
  g_autoptr (RugosaProject) p = project_with (line);
  const RugosaLineResults *r;
  const char *dot;

  /* An unknown pipe: the line is wrong, one sentence, no numbers. */
  g_object_set (line, "pipe-designation", "NPS 99 Sch 7", NULL);
  r = rugosa_project_get_results (p, line);
  g_assert_false (r->ok);
  g_assert_cmpuint (strlen (r->error), >, 0);
  dot = strchr (r->error, '.');
  g_assert_nonnull (dot);
  assert_no_nan (r);

  /* A roughness too large for the bore: each point carries the core's
   * sentence. */
  g_object_set (line, "pipe-designation", NULL, "inner-diameter", 0.01,
                "roughness", 0.005, NULL);
  r = rugosa_project_get_results (p, line);
  g_assert_true (r->ok);
  g_assert_false (r->points[RUGOSA_FLOW_DESIGN].ok);
  g_assert_nonnull (strstr (r->points[RUGOSA_FLOW_DESIGN].error, "relative roughness"));
  assert_no_nan (r);

  /* A zero design flow. */
  g_object_set (line, "inner-diameter", 0.1, "roughness", 5e-5,
                "flow-design", 0.0, NULL);
  r = rugosa_project_get_results (p, line);
  g_assert_false (r->points[RUGOSA_FLOW_DESIGN].ok);
  g_assert_nonnull (strstr (r->points[RUGOSA_FLOW_DESIGN].error, "Design flow"));
  /* The error names its input, so a face can point at the flow field. */
  g_assert_true (r->points[RUGOSA_FLOW_DESIGN].error_subjects & RG_SUBJECT_BIT (RG_SUBJECT_FLOW));
  g_assert_true (r->points[RUGOSA_FLOW_MINIMUM].ok);

  /* Bad transition thresholds in the settings. */
  g_object_set (line, "flow-design", 0.02, NULL);
  g_object_set (rugosa_project_get_settings (p), "re-laminar-max", 5000.0, NULL);
  r = rugosa_project_get_results (p, line);
  g_assert_false (r->ok);
  g_assert_cmpuint (strlen (r->error), >, 0);
}

static gboolean
has_warning (const RugosaOperatingPoint *pt, const char *text)
{
  for (int i = 0; i < pt->warnings.count; i++)
    if (strstr (pt->warnings.text[i], text) != NULL)
      return TRUE;
  return FALSE;
}

static void
test_warnings (void)
{
  g_autoptr (RugosaLine) line = custom_line ("w");
  g_autoptr (RugosaProject) p = project_with (line);
  RugosaSettings *s = rugosa_project_get_settings (p);
  const RugosaLineResults *r;
  const RugosaOperatingPoint *pt;
  double v, g;

  r = rugosa_project_get_results (p, line);
  pt = &r->points[RUGOSA_FLOW_DESIGN];
  v = pt->result.velocity_m_s;
  g = pt->result.gradient_m_per_100m;
  /* Limits just above the values: no warning; just below: a warning. */
  g_object_set (s, "velocity-limit", v * 1.01, "gradient-limit", g * 1.01, NULL);
  pt = &rugosa_project_get_results (p, line)->points[RUGOSA_FLOW_DESIGN];
  g_assert_false (has_warning (pt, "velocity"));
  g_assert_false (has_warning (pt, "gradient"));
  g_object_set (s, "velocity-limit", v * 0.99, "gradient-limit", g * 0.99, NULL);
  pt = &rugosa_project_get_results (p, line)->points[RUGOSA_FLOW_DESIGN];
  g_assert_true (has_warning (pt, "The velocity"));
  g_assert_true (has_warning (pt, "The pipe-friction gradient"));

  /* A viscous fluid puts the design point in the transitional range,
   * Re = ρVD/μ = 998·(4·0.02/(π·0.01))·0.1/0.08 ≈ 3177, between the
   * default 2000 and 4000 (arithmetic on the inputs): a warning, and
   * f_laminar is given. */
  g_object_set (line, "viscosity", 0.08, NULL);
  pt = &rugosa_project_get_results (p, line)->points[RUGOSA_FLOW_DESIGN];
  g_assert_cmpint (pt->result.friction.regime, ==, RG_REGIME_TRANSITIONAL);
  g_assert_true (has_warning (pt, "transitional"));
  g_assert_true (pt->result.friction.has_laminar);
  /* Swamee–Jain states 5000 ≤ Re: a turbulent point at Re ≈ 3177·0.08/0.055
   * ≈ 4621 (arithmetic on the inputs) lies outside.  From memory of Swamee
   * and Jain (1976); not checked against the document. */
  g_object_set (s, "friction-model", RG_FRICTION_SWAMEE_JAIN, NULL);
  g_object_set (line, "viscosity", 0.055, NULL);
  pt = &rugosa_project_get_results (p, line)->points[RUGOSA_FLOW_DESIGN];
  g_assert_cmpint (pt->result.friction.regime, ==, RG_REGIME_TURBULENT);
  g_assert_true (has_warning (pt, "the range stated for Swamee"));
}

static void
test_format (void)
{
  g_autoptr (RugosaLine) a = custom_line ("Line, \"one\"");
  g_autoptr (RugosaLine) b = custom_line ("broken");
  g_autoptr (RugosaProject) p = project_with (a);
  g_autoptr (GString) json = g_string_new (NULL);
  g_autoptr (GString) csv = g_string_new (NULL);
  g_autoptr (GString) table = g_string_new (NULL);
  g_autoptr (GError) error = NULL;
  static const char *const keys[] = {
    "velocity_m_s", "reynolds", "friction_factor", "regime", "roughness_zone",
    "head_loss_major_m", "head_loss_minor_m", "head_loss_total_m",
    "pressure_drop_Pa", "gradient_m_per_100m", "wall_shear_Pa",
    "density_kg_m3", "dynamic_viscosity_Pa_s", "roughness_elasticity",
    "inner_diameter_m", "roughness_m", "roughness_new_m",
    "head_loss_ratio_to_new", "minor_loss_k_total", "warnings",
  };
  cJSON *root, *results, *first;
  const RugosaLineResults *r;
  g_auto (GStrv) rows = NULL;

  g_object_set (b, "pipe-designation", "no such pipe", NULL);
  rugosa_project_insert_line (p, 1, b);

  g_assert_true (rugosa_project_format_eval (p, 10.0, RUGOSA_EVAL_FORMAT_JSON, json, &error));
  g_assert_no_error (error);
  root = cJSON_Parse (json->str);
  g_assert_nonnull (root);
  results = cJSON_GetObjectItemCaseSensitive (root, "results");
  /* Three points of the good line and one error entry. */
  g_assert_cmpint (cJSON_GetArraySize (results), ==, 4);
  first = cJSON_GetArrayItem (results, 0);
  for (guint i = 0; i < G_N_ELEMENTS (keys); i++)
    g_assert_nonnull (cJSON_GetObjectItemCaseSensitive (first, keys[i]));
  /* Turbulent: no laminar friction factor. */
  g_assert_null (cJSON_GetObjectItemCaseSensitive (first, "friction_factor_laminar"));
  r = rugosa_project_get_results_at (p, a, 10.0);
  /* The JSON number reads back to the same double. */
  g_assert_cmpfloat (cJSON_GetObjectItemCaseSensitive (first, "head_loss_total_m")->valuedouble,
                     ==, r->points[0].result.head_loss_total_m);
  g_assert_cmpstr (cJSON_GetObjectItemCaseSensitive (first, "line")->valuestring, ==, "Line, \"one\"");
  g_assert_nonnull (cJSON_GetObjectItemCaseSensitive (cJSON_GetArrayItem (results, 3), "error"));
  cJSON_Delete (root);

  g_assert_true (rugosa_project_format_eval (p, 10.0, RUGOSA_EVAL_FORMAT_CSV, csv, &error));
  rows = g_strsplit (csv->str, "\r\n", -1);
  g_assert_cmpuint (g_strv_length (rows), ==, 6); /* header, 4 rows, "" */
  /* The columns name their display unit (the SI system shows L/s). */
  g_assert_true (g_str_has_prefix (rows[0], "line,case,flow (L/s),velocity (m/s),reynolds,"));
  g_assert_true (g_str_has_prefix (rows[1], "\"Line, \"\"one\"\"\",design,20,"));
  g_assert_true (g_str_has_prefix (rows[4], "broken,design,20,"));

  g_assert_true (rugosa_project_format_eval (p, 10.0, RUGOSA_EVAL_FORMAT_TABLE, table, &error));
  g_assert_nonnull (strstr (table->str, "Service age 10 years"));
  g_assert_nonnull (strstr (table->str, "broken"));
  g_assert_nonnull (strstr (table->str, "error: "));

  g_assert_false (rugosa_project_format_eval (p, NAN, RUGOSA_EVAL_FORMAT_JSON, json, &error));
  g_assert_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_VALUE);
}

static void
test_format_locale (void)
{
  g_autoptr (RugosaLine) a = custom_line ("a");
  g_autoptr (RugosaProject) p = project_with (a);
  g_autoptr (GString) csv = g_string_new (NULL);
  const char *locales[] = { "de_DE.UTF-8", "fr_FR.UTF-8", "de_DE", NULL };
  const char *used = NULL;

  for (int i = 0; locales[i] != NULL && used == NULL; i++)
    used = setlocale (LC_NUMERIC, locales[i]);
  if (used == NULL)
    {
      g_test_skip ("no locale with a decimal comma is installed");
      return;
    }
  g_assert_true (rugosa_project_format_eval (p, 0.0, RUGOSA_EVAL_FORMAT_CSV, csv, NULL));
  setlocale (LC_NUMERIC, "C");
  g_assert_nonnull (strstr (csv->str, ",20,"));
  g_assert_nonnull (strstr (csv->str, ",0.0"));
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/evaluation/matches-core", test_matches_core);
  g_test_add_func ("/evaluation/cache", test_cache);
  g_test_add_func ("/evaluation/errors", test_errors);
  g_test_add_func ("/evaluation/warnings", test_warnings);
  g_test_add_func ("/evaluation/format", test_format);
  g_test_add_func ("/evaluation/format-locale", test_format_locale);
  return g_test_run ();
}
