/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Air: ideal-gas density, Sutherland viscosity, compressibility warning. */
#include "core/air.h"

#include <glib.h>
#include <math.h>
#include <string.h>

static void
assert_rel (double got, double want, double tol)
{
  if (!(fabs (got - want) <= tol * fabs (want)))
    g_error ("got %.17g, want %.17g (relative tolerance %g)", got, want, tol);
}

static void
test_sea_level (void)
{
  RgFluidProps p;

  g_assert_cmpint (rg_air_properties (288.15, 101325.0, &p, NULL, NULL), ==, RG_OK);
  /* Source: U.S. Standard Atmosphere 1976 (ISO 2533:1975), sea level:
   * ρ = 1.2250 kg/m³ at 288.15 K and 101 325 Pa */
  assert_rel (p.density_kg_m3, 1.2250, 5e-5);
  /* Source: U.S. Standard Atmosphere 1976, sea level: μ = 1.7894e-5 Pa·s */
  assert_rel (p.dynamic_viscosity_pa_s, 1.7894e-5, 5e-5);
  /* Source: U.S. Standard Atmosphere 1976, sea level: ν = 1.4607e-5 m²/s */
  assert_rel (p.kinematic_viscosity_m2_s, 1.4607e-5, 1e-4);
}

static void
test_sutherland (void)
{
  double mu;

  /* From memory of White, Viscous Fluid Flow, 3rd ed. (2006), Table 1-2:
   * air μ0 = 1.716e-5 Pa·s at T0 = 273 K; not checked against the document */
  g_assert_cmpint (rg_air_viscosity (273.15, &mu, NULL), ==, RG_OK);
  assert_rel (mu, 1.716e-5, 2e-3);
  /* From memory of U.S. Standard Atmosphere 1976, 11 km: T = 216.65 K,
   * μ = 1.4216e-5 Pa·s; not checked against the document */
  g_assert_cmpint (rg_air_viscosity (216.65, &mu, NULL), ==, RG_OK);
  assert_rel (mu, 1.4216e-5, 2e-4);
}

static void
test_ideal_gas (void)
{
  double r1, r2;

  /* Source: ideal-gas law, ρ ∝ p/T. */
  rg_air_density (300.0, 2.0e5, &r1, NULL);
  rg_air_density (600.0, 2.0e5, &r2, NULL);
  assert_rel (r1 / r2, 2.0, 1e-14);
  rg_air_density (300.0, 4.0e5, &r2, NULL);
  assert_rel (r2 / r1, 2.0, 1e-14);
}

static void
test_warnings (void)
{
  RgWarnings w = { 0 };
  RgFluidProps p;

  rg_warnings_clear (&w);
  /* From memory of Crane TP-410 (2009), p. 1-9: below 10 % of the inlet
   * pressure the incompressible equations may be used; not checked against
   * the document */
  g_assert_cmpint (rg_air_compressibility_warning (5.0e3, 1.0e5, &w), ==, 0);
  g_assert_cmpint (rg_air_compressibility_warning (10.0e3, 1.0e5, &w), ==, 0);
  g_assert_cmpint (w.count, ==, 0);
  g_assert_cmpint (rg_air_compressibility_warning (15.0e3, 1.0e5, &w), ==, 1);
  g_assert_cmpint (w.count, ==, 1);
  g_assert_nonnull (strstr (w.text[0], "15 %"));
  g_assert_nonnull (strstr (w.text[0], "incompressible"));
  g_assert_cmpint (rg_air_compressibility_warning (NAN, 1.0e5, &w), ==, 0);
  g_assert_cmpint (rg_air_compressibility_warning (1.0e3, 0.0, &w), ==, 0);
  g_assert_cmpint (rg_air_compressibility_warning (-2.0e4, 1.0e5, NULL), ==, 1);

  rg_warnings_clear (&w);
  g_assert_cmpint (rg_air_properties (300.0, 2.0e6, &p, &w, NULL), ==, RG_OK);
  g_assert_cmpint (w.count, ==, 1);
}

#define T RG_SUBJECT_BIT (RG_SUBJECT_TEMPERATURE)
#define P RG_SUBJECT_BIT (RG_SUBJECT_PRESSURE)

static void
test_range (void)
{
  RgFluidProps p;
  RgError err = { 0 };
  double x;

  /* Source: White, Viscous Fluid Flow, 3rd ed., Table 1-2: Sutherland's law
   * for air from 170 to 1900 K (from memory; not checked). */
  g_assert_cmpint (rg_air_properties (150.0, 1.0e5, &p, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "temperature"));
  g_assert_cmpuint (err.subjects, ==, T);
  /* in SI with 4 figures: air.h's 170 K and 1900 K */
  g_assert_nonnull (strstr (err.text, "between 170 K and 1900 K, not 150 K"));
  g_assert_cmpint (rg_air_properties (2000.0, 1.0e5, &p, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, T);
  g_assert_cmpint (rg_air_properties (300.0, 0.0, &p, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "pressure"));
  g_assert_cmpuint (err.subjects, ==, P);
  g_assert_cmpint (rg_air_properties (300.0, NAN, &p, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, P);
  g_assert_cmpint (rg_air_density (300.0, 2.0e7, &x, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, P);
  g_assert_cmpint (rg_air_viscosity (INFINITY, &x, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, T);
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/air/sea-level", test_sea_level);
  g_test_add_func ("/air/sutherland", test_sutherland);
  g_test_add_func ("/air/ideal-gas", test_ideal_gas);
  g_test_add_func ("/air/warnings", test_warnings);
  g_test_add_func ("/air/range", test_range);
  return g_test_run ();
}
