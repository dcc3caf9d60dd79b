/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Roughness aging: linear growth, classes, head-loss ratio and its rate. */
#include "core/aging.h"
#include "core/units.h"

#include <glib.h>
#include <math.h>
#include <string.h>

static void
assert_rel (double got, double want, double tol)
{
  if (!(fabs (got - want) <= tol * fabs (want)))
    g_error ("got %.17g, want %.17g (relative tolerance %g)", got, want, tol);
}

/* A 150 mm water main, 1 km, 20 L/s, water at 20 °C: a scenario of our own.
 * Density and viscosity: IAPWS-95 and IAPWS 2008 at 20 °C, 0.1 MPa. */
static void
water_main (RgLineInput *in)
{
  rg_line_input_init (in);
  in->flow_m3_s = 0.020;
  in->diameter_m = 0.150;
  in->length_m = 1000.0;
  in->roughness_m = 0.26e-3;
  in->k_sum = 3.0;
  /* From memory of IAPWS-95 (Wagner and Pruss 2002): 998.21 kg/m³ at
   * 20 °C, 0.101325 MPa; not checked against the document */
  in->density_kg_m3 = 998.21;
  /* From memory of IAPWS 2008 (Huber et al. 2009): 1.0016 mPa·s at 20 °C,
   * 0.1 MPa; not checked against the document */
  in->viscosity_pa_s = 1.0016e-3;
}

#define ON(s) RG_SUBJECT_BIT (RG_SUBJECT_##s)

static void
test_classes (void)
{
  const RgAgingClass *c = NULL;
  RgError err = { 0 };

  /* From memory of Lamont (1981), J. AWWA 73(5): five water groups; not
   * checked against the document */
  g_assert_cmpint (rg_aging_class_count (), ==, 5);
  double prev = 0.0;
  for (int i = 0; i < rg_aging_class_count (); i++)
    {
      const RgAgingClass *a = rg_aging_class_at (i);
      g_assert_cmpfloat (a->rate_m_per_year, >, prev);
      g_assert_cmpfloat (a->rate_min_m_per_year, <=, a->rate_m_per_year);
      g_assert_cmpfloat (a->rate_m_per_year, <=, a->rate_max_m_per_year);
      g_assert_true (strstr (a->source, "Lamont") != NULL
                     || strstr (a->source, "lamont") != NULL);
      prev = a->rate_m_per_year;
    }
  g_assert_cmpint (rg_aging_class_lookup ("Moderate", &c, &err), ==, RG_OK);
  /* From memory of Lamont (1981), group 2: 0.07 mm per year; not checked
   * against the document */
  assert_rel (c->rate_m_per_year, 0.07e-3, 1e-12);
  g_assert_cmpint (rg_aging_class_lookup ("severre", &c, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_nonnull (strstr (err.text, "severe"));
  g_assert_cmpuint (err.subjects, ==, ON (AGING_CLASS));
}

static void
test_roughness_linear (void)
{
  double e0, e10, e20;

  /* Source: Colebrook and White (1937): ε(t) = ε₀ + α·t. */
  g_assert_cmpint (rg_aging_roughness (0.26e-3, 0.07e-3, 0.0, &e0, NULL), ==, RG_OK);
  g_assert_cmpint (rg_aging_roughness (0.26e-3, 0.07e-3, 10.0, &e10, NULL), ==, RG_OK);
  g_assert_cmpint (rg_aging_roughness (0.26e-3, 0.07e-3, 20.0, &e20, NULL), ==, RG_OK);
  assert_rel (e0, 0.26e-3, 1e-15);
  assert_rel (e10, 0.96e-3, 1e-14);
  assert_rel (e20 - e10, e10 - e0, 1e-12);

  RgError err = { 0 };
  double e;
  RgUnitChoice mm = { { NULL } };
  mm.unit[RG_QTY_ROUGHNESS_RATE] = "mm/yr";
  err.units = &mm;
  g_assert_cmpint (rg_aging_roughness (-1e-3, 0.07e-3, 1.0, &e, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (ROUGHNESS));
  g_assert_cmpint (rg_aging_roughness (1e-3, -0.07e-3, 1.0, &e, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "rate"));
  g_assert_cmpuint (err.subjects, ==, ON (AGING_RATE));
  /* Source: aging.h, at most 10 mm per (Julian) year, written in mm/yr */
  g_assert_cmpint (rg_aging_roughness (1e-3, 0.02, 1.0, &e, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "between 0 mm/yr and 10 mm/yr, not 20 mm/yr"));
  g_assert_cmpuint (err.subjects, ==, ON (AGING_RATE));
  g_assert_cmpint (rg_aging_roughness (1e-3, RG_AGING_RATE_MAX_M_PER_YEAR, 1.0, &e, &err), ==, RG_OK);
  g_assert_cmpint (rg_aging_roughness (1e-3, 0.07e-3, -1.0, &e, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "age"));
  g_assert_cmpuint (err.subjects, ==, ON (AGE));
  g_assert_cmpint (rg_aging_roughness (1e-3, 0.07e-3, NAN, &e, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (AGE));
  g_assert_cmpint (rg_aging_roughness (1e-3, 0.07e-3, RG_AGING_AGE_MAX_YEARS, &e, &err), ==, RG_OK);
}

static void
test_ratio (void)
{
  RgLineInput in;
  RgAgingResult r0, r, rn;

  water_main (&in);
  /* Common practice (no single source): a new line is its own reference. */
  g_assert_cmpint (rg_aging_evaluate (&in, 0.2e-3, 0.0, &r0, NULL), ==, RG_OK);
  g_assert_cmpfloat (r0.head_loss_ratio_to_new, ==, 1.0);
  g_assert_cmpint (rg_aging_evaluate (&in, 0.0, 40.0, &rn, NULL), ==, RG_OK);
  g_assert_cmpfloat (rn.head_loss_ratio_to_new, ==, 1.0);
  g_assert_cmpfloat (rn.head_loss_rate_m_per_year, ==, 0.0);

  /* Source: Colebrook and White (1937): the loss grows with age. */
  double prev = 1.0;
  for (double t = 5.0; t <= 50.0; t += 5.0)
    {
      g_assert_cmpint (rg_aging_evaluate (&in, 0.2e-3, t, &r, NULL), ==, RG_OK);
      g_assert_cmpfloat (r.head_loss_ratio_to_new, >, prev);
      assert_rel (r.head_loss_ratio_to_new,
                  r.result.head_loss_total_m / r.result_new.head_loss_total_m, 1e-15);
      assert_rel (r.roughness_m, 0.26e-3 + 0.2e-3 * t, 1e-14);
      prev = r.head_loss_ratio_to_new;
    }
}

/* d h_total/dt against a central difference of h_total(t). */
static void
check_rate (const RgLineInput *in, double rate, double t)
{
  RgAgingResult r, rp, rm;
  const double dt = 1e-3 * (t > 1.0 ? t : 1.0);

  g_assert_cmpint (rg_aging_evaluate (in, rate, t, &r, NULL), ==, RG_OK);
  g_assert_cmpint (rg_aging_evaluate (in, rate, t + dt, &rp, NULL), ==, RG_OK);
  if (t - dt >= 0.0)
    {
      g_assert_cmpint (rg_aging_evaluate (in, rate, t - dt, &rm, NULL), ==, RG_OK);
      /* Common practice (no single source): central difference, error O(dt²). */
      assert_rel (r.head_loss_rate_m_per_year,
                  (rp.result.head_loss_total_m - rm.result.head_loss_total_m) / (2 * dt),
                  1e-5);
    }
  else
    /* Common practice (no single source): forward difference, error O(dt). */
    assert_rel (r.head_loss_rate_m_per_year,
                (rp.result.head_loss_total_m - r.result.head_loss_total_m) / dt, 2e-2);
}

static void
test_rate_vs_difference (void)
{
  RgLineInput in;

  water_main (&in);
  check_rate (&in, 0.2e-3, 0.0);
  check_rate (&in, 0.2e-3, 10.0);
  check_rate (&in, 0.025e-3, 30.0);
  check_rate (&in, 2.0e-3, 5.0);

  /* A smooth new pipe (ε₀ = 0): the analytic slope stays finite. */
  in.roughness_m = 0.0;
  check_rate (&in, 0.07e-3, 0.0);
  check_rate (&in, 0.07e-3, 3.0);

  /* The explicit correlations use a numerical slope. */
  water_main (&in);
  in.model = RG_FRICTION_HAALAND;
  check_rate (&in, 0.2e-3, 10.0);
  in.model = RG_FRICTION_SWAMEE_JAIN;
  check_rate (&in, 0.2e-3, 10.0);
  in.model = RG_FRICTION_CHURCHILL;
  check_rate (&in, 0.2e-3, 10.0);
}

static void
test_laminar (void)
{
  RgLineInput in;
  RgAgingResult r;

  water_main (&in);
  in.flow_m3_s = 1.0e-4; /* Re ≈ 850 */
  /* Source: Hagen–Poiseuille, f = 64/Re does not depend on roughness. */
  g_assert_cmpint (rg_aging_evaluate (&in, 0.2e-3, 30.0, &r, NULL), ==, RG_OK);
  g_assert_cmpfloat (r.head_loss_ratio_to_new, ==, 1.0);
  g_assert_cmpfloat (r.head_loss_rate_m_per_year, ==, 0.0);

  /* Found by tests/cli-bad-input.py (--flow "1e-300 L/s"): v² underflows to
   * zero, both head losses are 0 and their ratio was 0/0, refused as "could
   * not be computed".  Source: Hagen–Poiseuille again, the laminar ratio
   * is 1 for any flow. */
  in.flow_m3_s = 1.0e-303;
  g_assert_cmpint (rg_aging_evaluate (&in, 0.2e-3, 30.0, &r, NULL), ==, RG_OK);
  g_assert_cmpfloat (r.head_loss_ratio_to_new, ==, 1.0);
  g_assert_true (isfinite (r.head_loss_rate_m_per_year));
}

static void
test_errors (void)
{
  RgLineInput in;
  RgAgingResult r;
  RgError err = { 0 };

  water_main (&in);
  in.diameter_m = 0.02;
  /* Common practice (no single source): ε/D above 0.1 is off the chart. */
  g_assert_cmpint (rg_aging_evaluate (&in, 2.0e-3, 10.0, &r, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "years"));
  g_assert_cmpuint (err.subjects, ==, ON (AGE) | ON (AGING_RATE) | ON (ROUGHNESS) | ON (DIAMETER));
  water_main (&in);
  in.length_m = -1.0;
  g_assert_cmpint (rg_aging_evaluate (&in, 2.0e-3, 10.0, &r, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (LENGTH));
  water_main (&in);
  g_assert_cmpint (rg_aging_evaluate (&in, 2.0e-3, 1000.0, &r, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (AGE));
  /* the line's own errors come through with their subjects, the Reynolds
   * number's with the inputs behind it */
  water_main (&in);
  in.flow_m3_s = 1.0e6;
  g_assert_cmpint (rg_aging_evaluate (&in, 0.1e-3, 10.0, &r, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects & ON (FLOW), !=, 0);
  g_assert_cmpuint (err.subjects & ON (DIAMETER), !=, 0);
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/aging/classes", test_classes);
  g_test_add_func ("/aging/roughness/linear", test_roughness_linear);
  g_test_add_func ("/aging/ratio", test_ratio);
  g_test_add_func ("/aging/rate/finite-difference", test_rate_vs_difference);
  g_test_add_func ("/aging/laminar", test_laminar);
  g_test_add_func ("/aging/errors", test_errors);
  return g_test_run ();
}
