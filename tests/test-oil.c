/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Petroleum oil: ASTM D341 viscosity and linear-expansion density.
 *
 * No worked example of ASTM D341 with a printed third-temperature result was
 * at hand, so the viscosity is checked against the defining equation: it
 * must pass through both given points and every other value must lie on the
 * same straight line in (log T, log log(ν + 0.7)). */
#include "core/oil.h"
#include "core/units.h"

#include <glib.h>
#include <math.h>
#include <string.h>

#define CST 1.0e-6

static void
assert_rel (double got, double want, double tol)
{
  if (!(fabs (got - want) <= tol * fabs (want)))
    g_error ("got %.17g, want %.17g (relative tolerance %g)", got, want, tol);
}

/* An ISO VG 46 mineral oil. */
static void
vg46 (RgOilSpec *o)
{
  /* Common practice (no single source): ISO 3448 grade VG 46 is 46 cSt at
   * 40 °C (midpoint); a viscosity index near 100 gives about 6.8 cSt at
   * 100 °C; 870 kg/m³ at 15 °C and β = 6.5e-4 1/K are typical of such an
   * oil. */
  o->t1_k = 313.15;
  o->nu1_m2_s = 46.0 * CST;
  o->t2_k = 373.15;
  o->nu2_m2_s = 6.8 * CST;
  o->density_ref_kg_m3 = 870.0;
  o->t_ref_k = 288.15;
  o->expansion_per_k = 6.5e-4;
}

static double
walther (double nu)
{
  return log10 (log10 (nu / CST + 0.7));
}

static void
test_d341 (void)
{
  RgOilSpec o;
  RgWarnings w = { 0 };
  double nu, nu1, nu2;

  vg46 (&o);
  rg_warnings_clear (&w);
  /* Source: ASTM D341, log log(ν + 0.7) = A − B log T through both points. */
  g_assert_cmpint (rg_oil_kinematic_viscosity (&o, o.t1_k, &nu1, &w, NULL), ==, RG_OK);
  assert_rel (nu1, o.nu1_m2_s, 1e-12);
  g_assert_cmpint (rg_oil_kinematic_viscosity (&o, o.t2_k, &nu2, &w, NULL), ==, RG_OK);
  assert_rel (nu2, o.nu2_m2_s, 1e-12);
  g_assert_cmpint (w.count, ==, 0);

  /* Source: ASTM D341: the points lie on one straight line. */
  const double slope = (walther (o.nu2_m2_s) - walther (o.nu1_m2_s))
                       / (log10 (o.t2_k) - log10 (o.t1_k));
  for (double t = 293.15; t <= 423.15; t += 10.0)
    {
      rg_warnings_clear (&w);
      g_assert_cmpint (rg_oil_kinematic_viscosity (&o, t, &nu, &w, NULL), ==, RG_OK);
      const double want = walther (o.nu1_m2_s) + slope * (log10 (t) - log10 (o.t1_k));
      assert_rel (walther (nu), want, 1e-12);
      /* extrapolation outside 40–100 °C is flagged */
      g_assert_cmpint (w.count, ==, (t < o.t1_k || t > o.t2_k) ? 1 : 0);
    }
  rg_warnings_clear (&w);
  rg_oil_kinematic_viscosity (&o, 283.15, &nu, &w, NULL);
  g_assert_cmpint (w.count, ==, 1);
  g_assert_nonnull (strstr (w.text[0], "extrapolated"));

  /* Source: ASTM D341: viscosity falls as temperature rises. */
  double prev = INFINITY;
  for (double t = 253.15; t <= 473.15; t += 20.0)
    {
      g_assert_cmpint (rg_oil_kinematic_viscosity (&o, t, &nu, NULL, NULL), ==, RG_OK);
      g_assert_cmpfloat (nu, <, prev);
      prev = nu;
    }

  /* Source: ASTM D341: the 0.7 form holds from 2 cSt; below, a warning. */
  rg_warnings_clear (&w);
  g_assert_cmpint (rg_oil_kinematic_viscosity (&o, 560.0, &nu, &w, NULL), ==, RG_OK);
  g_assert_cmpfloat (nu, <, 2.0 * CST);
  g_assert_cmpint (w.count, ==, 2);
}

static void
test_density (void)
{
  RgOilSpec o;
  double rho;

  vg46 (&o);
  /* Source: definition of the volumetric expansion coefficient,
   * ρ(T) = ρref/(1 + β(T − Tref)). */
  g_assert_cmpint (rg_oil_density (&o, o.t_ref_k, &rho, NULL), ==, RG_OK);
  g_assert_cmpfloat (rho, ==, 870.0);
  g_assert_cmpint (rg_oil_density (&o, 353.15, &rho, NULL), ==, RG_OK);
  assert_rel (rho, 870.0 / (1.0 + 6.5e-4 * 65.0), 1e-14);

  RgFluidProps p;
  g_assert_cmpint (rg_oil_properties (&o, 333.15, &p, NULL, NULL), ==, RG_OK);
  assert_rel (p.dynamic_viscosity_pa_s, p.kinematic_viscosity_m2_s * p.density_kg_m3, 1e-15);
}

#define ON(s) RG_SUBJECT_BIT (RG_SUBJECT_##s)

static void
test_errors (void)
{
  RgOilSpec o;
  RgFluidProps p;
  RgUnitChoice cst = { { NULL } };
  RgError err = { 0 };
  double nu;

  cst.unit[RG_QTY_KIN_VISCOSITY] = "cSt";
  cst.unit[RG_QTY_TEMPERATURE] = "°C";
  err.units = &cst;
  vg46 (&o);
  o.nu2_m2_s = 60.0 * CST; /* thicker when hotter */
  g_assert_cmpint (rg_oil_properties (&o, 330.0, &p, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "higher at the lower"));
  g_assert_cmpuint (err.subjects, ==, ON (OIL_NU1) | ON (OIL_NU2) | ON (OIL_T1) | ON (OIL_T2));
  vg46 (&o);
  o.t2_k = o.t1_k;
  g_assert_cmpint (rg_oil_properties (&o, 330.0, &p, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (OIL_T1) | ON (OIL_T2));
  /* Source: oil.h, the points at least 1 K apart; a difference of 1 K is
   * one of 1 °C */
  g_assert_nonnull (strstr (err.text, "at least 1 °C"));
  vg46 (&o);
  o.nu2_m2_s = 1.5 * CST;
  g_assert_cmpint (rg_oil_properties (&o, 330.0, &p, NULL, &err), ==, RG_ERR_DOMAIN);
  /* Source: oil.h, 2 cSt to 1e6 cSt (ASTM D341's 0.7 form from 2 cSt) */
  g_assert_nonnull (strstr (err.text, "between 2 cSt and 1e+06 cSt"));
  g_assert_nonnull (strstr (err.text, "not 1.5 cSt"));
  g_assert_cmpuint (err.subjects, ==, ON (OIL_NU2));
  vg46 (&o);
  o.nu1_m2_s = 2.0; /* 2 m²/s */
  g_assert_cmpint (rg_oil_properties (&o, 330.0, &p, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (OIL_NU1));
  vg46 (&o);
  o.expansion_per_k = 0.01;
  g_assert_cmpint (rg_oil_density (&o, 330.0, &nu, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (OIL_EXPANSION));
  vg46 (&o);
  o.density_ref_kg_m3 = NAN;
  g_assert_cmpint (rg_oil_properties (&o, 330.0, &p, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (OIL_DENSITY_REF));
  vg46 (&o);
  o.t1_k = 100.0;
  g_assert_cmpint (rg_oil_properties (&o, 330.0, &p, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (OIL_T1));
  vg46 (&o);
  o.t2_k = 900.0;
  g_assert_cmpint (rg_oil_properties (&o, 330.0, &p, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (OIL_T2));
  vg46 (&o);
  o.t_ref_k = -1.0;
  g_assert_cmpint (rg_oil_properties (&o, 330.0, &p, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (OIL_T_REF));
  vg46 (&o);
  g_assert_cmpint (rg_oil_kinematic_viscosity (&o, 700.0, &nu, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "temperature"));
  g_assert_cmpuint (err.subjects, ==, ON (TEMPERATURE));
  /* Source: oil.h, 200–600 K = −73.15–326.85 °C (4 figures) */
  g_assert_nonnull (strstr (err.text, "between -73.15 °C and 326.9 °C, not 426.9 °C"));
  g_assert_cmpint (rg_oil_kinematic_viscosity (&o, NAN, &nu, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (TEMPERATURE));
}

/* The extrapolation warning in the units of the warnings: the line's
 * temperature and the two points.  Source: NIST SP 811 B.9, 283.15 K =
 * 10 °C = 50 °F, 313.15 K = 40 °C = 104 °F, 373.15 K = 100 °C = 212 °F. */
static void
test_warning_units (void)
{
  RgOilSpec o;
  RgUnitChoice us = { { NULL } };
  RgWarnings w = { 0 };
  double nu;

  vg46 (&o);
  us.unit[RG_QTY_TEMPERATURE] = "°F";
  w.units = &us;
  rg_warnings_clear (&w);
  g_assert_true (w.units == &us); /* clearing keeps the units */
  g_assert_cmpint (rg_oil_kinematic_viscosity (&o, 283.15, &nu, &w, NULL), ==, RG_OK);
  g_assert_cmpint (w.count, ==, 1);
  g_assert_nonnull (strstr (w.text[0], "Oil: 50 °F lies outside"));
  g_assert_nonnull (strstr (w.text[0], "(104 °F and 212 °F)"));
  g_assert_null (strstr (w.text[0], " K "));
  w.units = NULL;
  rg_warnings_clear (&w);
  g_assert_cmpint (rg_oil_kinematic_viscosity (&o, 283.15, &nu, &w, NULL), ==, RG_OK);
  /* in SI: 313.15 K and 373.15 K with 4 figures */
  g_assert_nonnull (strstr (w.text[0], "(313.1 K and 373.1 K)"));
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/oil/d341", test_d341);
  g_test_add_func ("/oil/density", test_density);
  g_test_add_func ("/oil/errors", test_errors);
  g_test_add_func ("/oil/warning-units", test_warning_units);
  return g_test_run ();
}
