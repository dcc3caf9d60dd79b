/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Sizing and the inverse problems of a line option: candidates against
 * the single-line evaluation, the recommendation on cases known by hand,
 * the aged recommendation never smaller than the new one, the refusals;
 * the Hazen–Williams C and the lowest velocity of the evaluation. */
#include "config.h"

#include <math.h>
#include <string.h>

#include "core/catalog.h"
#include "core/fluid.h"
#include "core/hazen-williams.h"
#include "model/rugosa-output.h"
#include "model/rugosa-project.h"
#include "model/rugosa-sizing.h"

/* Source: standard gravity, CGPM 1901 (ISO 80000-3). */
#define G 9.80665
#define IN 0.0254

static void
assert_rel (double got, double want, double tol)
{
  if (!(fabs (got - want) <= tol * fabs (want)))
    g_error ("got %.17g, want %.17g (relative tolerance %g)", got, want, tol);
}

/* Water at 20 °C through 1 km, no fittings. */
static RugosaLine *
water_duty (double flow)
{
  RugosaLine *line = rugosa_line_new ("duty");

  g_object_set (line, "fluid-kind", RG_FLUID_WATER, "temperature", 293.15,
                "length", 1000.0, "flow-design", flow, NULL);
  return line;
}

/* A very viscous liquid given by its properties (laminar in every bore
 * below), so the loss follows Hagen–Poiseuille in closed form. */
#define VISC_RHO 900.0
#define VISC_MU 0.5
static RugosaLine *
viscous_duty (double flow, double length)
{
  RugosaLine *line = rugosa_line_new ("duty");

  g_object_set (line, "fluid-kind", RG_FLUID_CUSTOM, "density", VISC_RHO,
                "viscosity", VISC_MU, "length", length, "flow-design", flow, NULL);
  return line;
}

/* Source: Hagen–Poiseuille, h = 128·μ·L·Q/(π·ρ·g·D⁴) (laminar flow in a
 * round pipe; any fluid mechanics text). */
static double
poiseuille_head (double mu, double rho, double length, double q, double d)
{
  return 128.0 * mu * length * q / (G_PI * rho * G * pow (d, 4.0));
}

static RugosaLimits
limits (double v_max, double v_min, double g_max, double h_max)
{
  RugosaLimits l = { v_max, v_min, g_max, h_max };
  return l;
}

static RugosaSizing *
size (RugosaProject *p, RugosaLine *duty, const char *material,
      const char *catalog, RugosaLimits l, double age)
{
  RgError err = { 0 };
  RugosaSizing *s = rugosa_sizing_run (p, duty, material, catalog, &l, age, &err);

  if (s == NULL)
    g_error ("%s", err.text);
  return s;
}

static const char *
recommended (const RugosaSizing *s)
{
  return s->recommended >= 0 ? s->candidates[s->recommended].pipe->designation : NULL;
}

/* ---- candidates are the single-line evaluation ---- */

static void
test_candidates_are_the_line_evaluation (void)
{
  g_autoptr (RugosaProject) p = rugosa_project_new ();
  g_autoptr (RugosaLine) duty = water_duty (0.03);
  g_autoptr (RugosaSizing) s = NULL;

  g_object_set (duty, "aging-class-id", "moderate", "elevation", 5.0,
                "flow-maximum", 0.045, NULL);
  rugosa_line_set_fittings (duty, g_variant_new_parsed ("[('elbow-90-long-radius', 0.0, 6.0), ('valve-gate', 0.0, 2.0)]"));
  s = size (p, duty, "ductile-iron-cement-lined", "all", limits (2.0, 0.0, 5.0, 0.0), 30.0);
  g_assert_cmpuint (s->n_candidates, >, 20);

  for (guint i = 0; i < s->n_candidates; i++)
    {
      const RugosaSizingCandidate *c = &s->candidates[i];
      g_autoptr (RugosaLine) line = rugosa_line_duplicate (duty);
      const RugosaLineResults *r;

      /* the line as a user would enter it, in a project: the cached path
       * of the window and every CLI command */
      g_object_set (line, "material-id", "ductile-iron-cement-lined",
                    "pipe-designation", c->pipe->designation, NULL);
      rugosa_project_insert_line (p, 0, line);
      r = rugosa_project_get_results_at (p, line, 30.0);
      g_assert_true (r->ok);
      g_assert_cmpfloat (c->results.inner_diameter_m, ==, r->inner_diameter_m);
      for (RugosaFlowCase f = 0; f < RUGOSA_N_FLOWS; f++)
        {
          const RugosaOperatingPoint *a = &c->results.points[f], *b = &r->points[f];

          g_assert_cmpint (a->present, ==, b->present);
          if (!a->present)
            continue;
          /* identical to the bit: the same function on the same inputs */
          g_assert_cmpfloat (a->result.velocity_m_s, ==, b->result.velocity_m_s);
          g_assert_cmpfloat (a->result.gradient_m_per_100m, ==, b->result.gradient_m_per_100m);
          g_assert_cmpfloat (a->result.head_loss_total_m, ==, b->result.head_loss_total_m);
          g_assert_cmpfloat (a->result_new.head_loss_total_m, ==, b->result_new.head_loss_total_m);
        }
      /* Source: V = 4Q/(πD²), the catalog's inner diameter. */
      assert_rel (c->results.points[RUGOSA_FLOW_DESIGN].result.velocity_m_s,
                  0.03 / (G_PI * c->pipe->inner_diameter_m * c->pipe->inner_diameter_m / 4.0), 1e-14);
      g_object_unref (rugosa_project_remove_line (p, 0));
    }
  /* ordered by size then wall */
  for (guint i = 1; i < s->n_candidates; i++)
    g_assert_cmpint (rg_pipe_compare (s->candidates[i - 1].pipe, s->candidates[i].pipe), <, 0);
}

/* ---- the recommendation on cases known by hand ---- */

static void
test_velocity_limited (void)
{
  g_autoptr (RugosaProject) p = rugosa_project_new ();
  g_autoptr (RugosaLine) duty = water_duty (0.05);
  g_autoptr (RugosaSizing) s = size (p, duty, "pe", NULL, limits (1.5, 0.0, 1000.0, 0.0), 0.0);

  /* By hand, V = 4Q/(πD²) with the ISO 4427-2 SDR 11 walls (from memory
   * of Table 2; not checked against the document): 50 L/s gives 1.52 m/s
   * in DN 250 (ID 204.6 mm) and 1.21 m/s in DN 280 (ID 229.2 mm); a limit
   * of 1.5 m/s first passes DN 280. */
  g_assert_cmpstr (recommended (s), ==, "DN 280 SDR 11");
  g_assert_cmpint (s->recommended, ==, s->recommended_new);
  for (guint i = 0; i < (guint) s->recommended; i++)
    g_assert_true (s->candidates[i].broken_new & RUGOSA_LIMIT_VELOCITY_MAX);
  for (guint i = (guint) s->recommended; i < s->n_candidates; i++)
    g_assert_true (s->candidates[i].passes);
  g_assert_null (s->why_none);
}

static void
test_head_loss_limited_laminar (void)
{
  g_autoptr (RugosaProject) p = rugosa_project_new ();
  g_autoptr (RugosaLine) duty = viscous_duty (0.002, 1000.0);
  g_autoptr (RugosaSizing) s = size (p, duty, "commercial-steel", NULL,
                                     limits (3.0, 0.0, 5.0, 20.0), 0.0);

  /* By hand, Hagen–Poiseuille: 2 L/s of 0.5 Pa·s, 900 kg/m³ through 1 km
   * loses 20 m at D = 123.3 mm; ASME B36.10M STD (from memory of Table 1):
   * NPS 4 is 4.026 in (102.3 mm, 42.2 m), NPS 5 is 5.047 in (128.2 mm,
   * 17.1 m).  The head-loss limit first passes NPS 5 STD. */
  g_assert_cmpstr (recommended (s), ==, "NPS 5 STD");
  for (guint i = 0; i < s->n_candidates; i++)
    {
      const RugosaSizingCandidate *c = &s->candidates[i];
      const double d = c->pipe->inner_diameter_m;

      /* the laminar loss to rounding (64/Re exactly) */
      assert_rel (c->results.points[RUGOSA_FLOW_DESIGN].result.head_loss_total_m,
                  poiseuille_head (VISC_MU, VISC_RHO, 1000.0, 0.002, d), 1e-12);
      g_assert_cmpint (c->passes, ==, poiseuille_head (VISC_MU, VISC_RHO, 1000.0, 0.002, d) <= 20.0);
    }
}

static void
test_lowest_velocity (void)
{
  g_autoptr (RugosaProject) p = rugosa_project_new ();
  g_autoptr (RugosaLine) duty = water_duty (0.01);
  g_autoptr (RugosaSizing) s = size (p, duty, "pe", "ISO 4427-2 SDR 11",
                                     limits (1.0, 0.6, 1000.0, 0.0), 0.0);
  const RgPipe *dn180 = NULL;

  /* By hand, V = 4Q/(πD²) with the SDR 11 walls: 10 L/s gives 1.22 m/s
   * in DN 125, 0.97 in DN 140, 0.74 in DN 160 and 0.59 in DN 180: between
   * 0.6 and 1.0 m/s only DN 140 and DN 160 pass. */
  g_assert_cmpstr (recommended (s), ==, "DN 140 SDR 11");
  g_assert_cmpint (rg_pipe_lookup ("DN 180 SDR 11", &dn180, NULL), ==, RG_OK);
  for (guint i = 0; i < s->n_candidates; i++)
    {
      const RugosaSizingCandidate *c = &s->candidates[i];
      const double od = c->pipe->outside_diameter_m;

      g_assert_cmpint (c->passes, ==, od >= 0.140 - 1e-9 && od <= 0.160 + 1e-9);
      if (od >= dn180->outside_diameter_m - 1e-9)
        g_assert_cmpuint (c->broken_new, ==, RUGOSA_LIMIT_VELOCITY_MIN);
    }
}

static void
test_none_passes (void)
{
  g_autoptr (RugosaProject) p = rugosa_project_new ();
  g_autoptr (RugosaLine) duty = water_duty (0.01);
  g_autoptr (RugosaSizing) s = size (p, duty, "pe", NULL, limits (1.0, 2.0, 1000.0, 0.0), 0.0);

  /* A lowest velocity above the highest: no size can pass. */
  g_assert_cmpint (s->recommended, ==, -1);
  g_assert_cmpint (s->recommended_new, ==, -1);
  g_assert_nonnull (s->why_none);
  g_assert_nonnull (strstr (s->why_none, s->candidates[0].pipe->designation));
  g_assert_nonnull (strstr (s->why_none, s->candidates[s->n_candidates - 1].pipe->designation));
}

/* ---- aging ---- */

static void
test_aged_never_smaller (void)
{
  g_autoptr (RugosaProject) p = rugosa_project_new ();
  int later = 0;

  /* A sweep of flows through cement-lined ductile iron and through steel
   * in aggressive water, limited by the gradient: at each flow the
   * recommendation for the whole service life is never a smaller size
   * than for the new pipe, and aging does move it for some flows. */
  for (int k = 0; k < 24; k++)
    {
      const double q = 0.005 * pow (1.25, k);
      static const char *const materials[] = { "ductile-iron-cement-lined", "commercial-steel" };

      for (gsize m = 0; m < G_N_ELEMENTS (materials); m++)
        {
          g_autoptr (RugosaLine) duty = water_duty (q);
          g_autoptr (RugosaSizing) s = NULL;

          g_object_set (duty, "aging-class-id", "severe", NULL);
          s = size (p, duty, materials[m], NULL, limits (3.0, 0.0, 1.0, 0.0), 50.0);
          if (s->recommended < 0)
            continue;
          g_assert_cmpint (s->recommended_new, >=, 0);
          g_assert_cmpint (s->recommended_new, <=, s->recommended);
          g_assert_cmpfloat (s->candidates[s->recommended_new].pipe->outside_diameter_m, <=,
                             s->candidates[s->recommended].pipe->outside_diameter_m);
          /* what passes aged passes new */
          for (guint i = 0; i < s->n_candidates; i++)
            if (s->candidates[i].broken_aged == 0)
              g_assert_cmpuint (s->candidates[i].broken_new, ==, 0);
          later += s->recommended > s->recommended_new;
        }
    }
  g_assert_cmpint (later, >, 0);
}

/* ---- refusals ---- */

static void
test_refusals (void)
{
  g_autoptr (RugosaProject) p = rugosa_project_new ();
  g_autoptr (RugosaLine) duty = water_duty (0.01);
  RugosaLimits l = limits (3.0, 0.0, 5.0, 0.0);
  RgError err = { 0 };

  g_assert_null (rugosa_sizing_run (p, duty, "unobtainium", NULL, &l, 0.0, &err));
  g_assert_true (err.subjects & RG_SUBJECT_BIT (RG_SUBJECT_MATERIAL));
  rg_error_clear (&err);
  /* glass is in the material catalog; no pipe catalog is made of it */
  g_assert_null (rugosa_sizing_run (p, duty, "glass", NULL, &l, 0.0, &err));
  g_assert_true (err.subjects & RG_SUBJECT_BIT (RG_SUBJECT_MATERIAL));
  rg_error_clear (&err);
  g_assert_null (rugosa_sizing_run (p, duty, "pe", "ASTM B88 Type L", &l, 0.0, &err));
  g_assert_true (err.subjects & RG_SUBJECT_BIT (RG_SUBJECT_PIPE));
  rg_error_clear (&err);
  /* Water at 150 °C and 1 bar is steam: the duty itself is wrong (IAPWS-IF97
   * region 1 ends at the saturation line). */
  g_object_set (duty, "temperature", 423.15, "pressure", 1.0e5, NULL);
  g_assert_null (rugosa_sizing_run (p, duty, "pe", NULL, &l, 0.0, &err));
  g_assert_true (err.subjects & RG_SUBJECT_BIT (RG_SUBJECT_TEMPERATURE));
}

/* ---- inverse problems ---- */

static void
test_solve_flow (void)
{
  g_autoptr (RugosaProject) p = rugosa_project_new ();
  g_autoptr (RugosaLine) line = viscous_duty (0.001, 500.0);
  g_autoptr (RugosaLine) water = water_duty (0.02);
  RgError err = { 0 };
  double q = 0.0, d = 0.1;

  g_object_set (line, "inner-diameter", d, "roughness", 4.5e-5, NULL);
  /* Hagen–Poiseuille solved for Q by hand: Q = h·π·ρ·g·D⁴/(128·μ·L). */
  g_assert_true (rugosa_solve_flow (p, line, 0.0, 12.0, &q, &err));
  assert_rel (q, 12.0 * G_PI * VISC_RHO * G * pow (d, 4.0) / (128.0 * VISC_MU * 500.0), 1e-10);

  /* Turbulent water with fittings and aging: the flow found, put back
   * into the one evaluation, gives the head loss asked for. */
  g_object_set (water, "inner-diameter", 0.15, "roughness", 4.5e-5, "aging-rate", 2.0e-5, NULL);
  rugosa_line_set_fittings (water, g_variant_new_parsed ("[('elbow-90-standard', 0.0, 4.0)]"));
  g_assert_true (rugosa_solve_flow (p, water, 40.0, 7.5, &q, &err));
  {
    RugosaLineResults r;

    g_object_set (water, "flow-design", q, NULL);
    rugosa_project_evaluate_line (p, water, 40.0, &r);
    assert_rel (r.points[RUGOSA_FLOW_DESIGN].result.head_loss_total_m, 7.5, 1e-9);
  }
  g_assert_false (rugosa_solve_flow (p, water, 0.0, -1.0, &q, &err));
  g_assert_true (err.subjects & RG_SUBJECT_BIT (RG_SUBJECT_HEAD_LOSS));
}

static void
test_solve_diameter (void)
{
  g_autoptr (RugosaProject) p = rugosa_project_new ();
  g_autoptr (RugosaLine) line = viscous_duty (0.002, 1000.0);
  g_autoptr (RugosaLine) water = water_duty (0.05);
  RugosaLimits only_head = limits (0.0, 0.0, 0.0, 20.0);
  RugosaLimits only_speed = limits (1.5, 0.3, 0.0, 0.0);
  RgError err = { 0 };
  double d = 0.0;

  g_object_set (line, "roughness", 4.5e-5, NULL);
  /* Hagen–Poiseuille solved for D by hand: D = (128·μ·L·Q/(π·ρ·g·h))^¼,
   * 123.26 mm for the duty of test_head_loss_limited_laminar. */
  g_assert_true (rugosa_solve_diameter (p, line, 0.0, &only_head, &d, &err));
  assert_rel (d, pow (128.0 * VISC_MU * 1000.0 * 0.002 / (G_PI * VISC_RHO * G * 20.0), 0.25), 1e-10);
  /* A velocity limit alone, by hand: D = √(4Q/(π·V)); the lowest
   * velocity plays no part. */
  g_object_set (water, "roughness", 4.5e-5, NULL);
  g_assert_true (rugosa_solve_diameter (p, water, 0.0, &only_speed, &d, &err));
  assert_rel (d, sqrt (4.0 * 0.05 / (G_PI * 1.5)), 1e-10);
  /* the catalog sizes above it pass, the one below it does not */
  {
    g_autoptr (RugosaSizing) s = size (p, water, "pe", NULL, only_speed, 0.0);
    const RgPipe *rec = s->candidates[s->recommended].pipe;

    g_assert_cmpfloat (rec->inner_diameter_m, >=, d);
    g_assert_cmpfloat (s->candidates[s->recommended - 1].pipe->inner_diameter_m, <, d);
  }
}

/* ---- what the evaluation adds ---- */

static void
test_hazen_williams_of_the_evaluation (void)
{
  g_autoptr (RugosaProject) p = rugosa_project_new ();
  RugosaLine *water = water_duty (0.02);
  RugosaLine *oil = viscous_duty (0.002, 100.0);
  const RugosaLineResults *r;
  const RugosaOperatingPoint *d;
  double h = 0.0;

  g_object_set (water, "inner-diameter", 0.15, "roughness", 4.5e-5,
                "aging-rate", 2.0e-5, "flow-maximum", 0.03, NULL);
  g_object_set (oil, "inner-diameter", 0.1, "roughness", 4.5e-5, NULL);
  rugosa_project_insert_line (p, 0, water);
  rugosa_project_insert_line (p, 1, oil);

  r = rugosa_project_get_results_at (p, water, 25.0);
  d = &r->points[RUGOSA_FLOW_DESIGN];
  g_assert_true (d->has_hazen_williams);
  /* Put back into Hazen–Williams, the C gives the Colebrook pipe-friction
   * loss at the service age (the round trip of test-hazen-williams). */
  g_assert_cmpint (rg_hazen_williams_head_loss (d->hazen_williams_c, d->result.velocity_m_s,
                                                0.15, 1000.0, &h, NULL), ==, RG_OK);
  assert_rel (h, d->result.head_loss_major_m, 1e-12);
  /* Common practice (no single source): 1.1 m/s of water in 150 mm,
   * turbulent, is inside the usual range. */
  g_assert_cmpuint (d->hazen_williams_notes, ==, 0);
  /* the design point only */
  g_assert_false (r->points[RUGOSA_FLOW_MAXIMUM].has_hazen_williams);
  /* no C for another fluid (the key is absent from its output) */
  r = rugosa_project_get_results_at (p, oil, 0.0);
  g_assert_false (r->points[RUGOSA_FLOW_DESIGN].has_hazen_williams);
  g_assert_false (rugosa_output_present (rugosa_output_key_find ("hazen_williams_c_equivalent"),
                                         &r->points[RUGOSA_FLOW_DESIGN]));

  /* Laminar water: a C with its note. */
  g_object_set (water, "flow-design", 1.0e-5, "flow-maximum", 0.0, NULL);
  r = rugosa_project_get_results_at (p, water, 0.0);
  d = &r->points[RUGOSA_FLOW_DESIGN];
  g_assert_true (d->has_hazen_williams);
  g_assert_cmpuint (d->hazen_williams_notes, ==, RG_HW_NOTE_NOT_TURBULENT);
  g_assert_cmpstr (rugosa_output_key_find ("hazen_williams_range")->id (d), ==, "not-turbulent");
}

static void
test_lowest_velocity_warning (void)
{
  g_autoptr (RugosaProject) p = rugosa_project_new ();
  RugosaLine *water = water_duty (0.01);
  RugosaSettings *settings = rugosa_project_get_settings (p);
  const RugosaLineResults *r;
  int before;

  /* By hand, V = 4Q/(πD²): 10 L/s in 150 mm is 0.566 m/s. */
  g_object_set (water, "inner-diameter", 0.15, "roughness", 4.5e-5, NULL);
  rugosa_project_insert_line (p, 0, water);
  r = rugosa_project_get_results (p, water);
  before = r->points[RUGOSA_FLOW_DESIGN].warnings.count;
  g_object_set (settings, "velocity-minimum", 0.5, NULL);
  r = rugosa_project_get_results (p, water);
  g_assert_cmpint (r->points[RUGOSA_FLOW_DESIGN].warnings.count, ==, before);
  g_object_set (settings, "velocity-minimum", 0.6, NULL);
  r = rugosa_project_get_results (p, water);
  g_assert_cmpint (r->points[RUGOSA_FLOW_DESIGN].warnings.count, ==, before + 1);
  {
    RugosaLimits l;

    rugosa_limits_from_settings (&l, settings);
    g_assert_cmpfloat (l.velocity_min, ==, 0.6);
    g_assert_cmpuint (rugosa_limits_broken (&l, r, TRUE), ==, RUGOSA_LIMIT_VELOCITY_MIN);
  }
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/sizing/candidates-are-the-line-evaluation", test_candidates_are_the_line_evaluation);
  g_test_add_func ("/sizing/by-hand/velocity", test_velocity_limited);
  g_test_add_func ("/sizing/by-hand/head-loss-laminar", test_head_loss_limited_laminar);
  g_test_add_func ("/sizing/by-hand/lowest-velocity", test_lowest_velocity);
  g_test_add_func ("/sizing/none-passes", test_none_passes);
  g_test_add_func ("/sizing/aged-never-smaller", test_aged_never_smaller);
  g_test_add_func ("/sizing/refusals", test_refusals);
  g_test_add_func ("/solve/flow", test_solve_flow);
  g_test_add_func ("/solve/diameter", test_solve_diameter);
  g_test_add_func ("/evaluation/hazen-williams", test_hazen_williams_of_the_evaluation);
  g_test_add_func ("/evaluation/lowest-velocity", test_lowest_velocity_warning);
  return g_test_run ();
}
