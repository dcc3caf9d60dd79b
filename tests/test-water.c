/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Tests for src/core/water.c against the computer-program verification
 * tables of the standards it implements, and its range errors.
 *
 * Points of those tables that lie outside the range Rugosa accepts (80 MPa,
 * 500 K, 1200 kg/m³, 433.15 K and above) are checked through the unchecked
 * formulas of water-private.h; the in-range points also through the public
 * functions. */
#include <glib.h>
#include <math.h>
#include <string.h>

#include "core/units.h"
#include "core/water.h"
#include "core/water-private.h"

/* A published value with n significant digits: the computed value must
 * round to it, i.e. lie within half a unit of its last digit. */
static void
assert_digits (double got, double published, int n, const char *what)
{
  double half_unit = 0.5 * pow (10.0, floor (log10 (fabs (published))) - n + 1);

  /* 1e-6 of a unit of slack for the binary representation of `published` */
  if (!(fabs (got - published) <= half_unit * (1.0 + 1e-6)))
    g_error ("%s: got %.12g, published %.12g (%d digits)", what, got,
             published, n);
}

static void
test_region1_table5 (void)
{
  static const struct {
    double t_k, p_pa, v;
  } pts[] = {
    /* Source: IAPWS-IF97 (2007 revision), Table 5, v in m³/kg */
    { 300.0, 3.0e6, 0.100215168e-2 },
    { 300.0, 80.0e6, 0.971180894e-3 },
    { 500.0, 3.0e6, 0.120241800e-2 },
  };

  for (gsize i = 0; i < G_N_ELEMENTS (pts); i++)
    assert_digits (rg_water_region1_volume_unchecked (pts[i].t_k, pts[i].p_pa),
                   pts[i].v, 9, "IF97 Table 5 v");

  /* the first point is inside Rugosa's range: the public function too */
  {
    double rho = 0.0;
    RgError err = { 0 };

    g_assert_cmpint (rg_water_density (300.0, 3.0e6, &rho, &err), ==, RG_OK);
    /* Source: IAPWS-IF97 (2007 revision), Table 5, v = 0.100215168e-2 */
    assert_digits (1.0 / rho, 0.100215168e-2, 9, "IF97 Table 5 via density");
  }
}

static void
test_region4_table35 (void)
{
  static const struct {
    double t_k, p_mpa;
  } pts[] = {
    /* Source: IAPWS-IF97 (2007 revision), Table 35, p_s in MPa */
    { 300.0, 0.353658941e-2 },
    { 500.0, 0.263889776e1 },
    { 600.0, 0.123443146e2 },
  };

  for (gsize i = 0; i < G_N_ELEMENTS (pts); i++)
    {
      double p = 0.0;
      RgError err = { 0 };

      g_assert_cmpint (rg_water_saturation_pressure (pts[i].t_k, &p, &err),
                       ==, RG_OK);
      assert_digits (p / 1.0e6, pts[i].p_mpa, 9, "IF97 Table 35 p_s");
    }
}

static void
test_viscosity_r1208_table4 (void)
{
  static const struct {
    double t_k, rho, mu_upas;
    gboolean in_range;
  } pts[] = {
    /* Source: IAPWS R12-08, Table 4 (μ2 = 1), μ in µPa·s */
    { 298.15, 998.0, 889.735100, TRUE },
    { 298.15, 1200.0, 1437.649467, FALSE },
    { 373.15, 1000.0, 307.883622, TRUE },
    { 433.15, 1.0, 14.538324, FALSE },
    { 433.15, 1000.0, 217.685358, FALSE },
    { 873.15, 1.0, 32.619287, FALSE },
    { 873.15, 100.0, 35.802262, FALSE },
    { 873.15, 600.0, 77.430195, FALSE },
    { 1173.15, 1.0, 44.217245, FALSE },
    { 1173.15, 100.0, 47.640433, FALSE },
    { 1173.15, 400.0, 64.154608, FALSE },
  };

  for (gsize i = 0; i < G_N_ELEMENTS (pts); i++)
    {
      /* the table gives six decimals of µPa·s */
      int digits = (int) floor (log10 (pts[i].mu_upas)) + 1 + 6;
      double mu = rg_water_viscosity_unchecked (pts[i].t_k, pts[i].rho);

      assert_digits (mu * 1.0e6, pts[i].mu_upas, digits, "R12-08 Table 4");
      if (pts[i].in_range)
        {
          RgError err = { 0 };

          g_assert_cmpint (rg_water_viscosity (pts[i].t_k, pts[i].rho, &mu,
                                               &err), ==, RG_OK);
          assert_digits (mu * 1.0e6, pts[i].mu_upas, digits,
                         "R12-08 Table 4 via the public function");
        }
    }
}

#define T RG_SUBJECT_BIT (RG_SUBJECT_TEMPERATURE)
#define P RG_SUBJECT_BIT (RG_SUBJECT_PRESSURE)
#define RHO RG_SUBJECT_BIT (RG_SUBJECT_DENSITY)

/* The error, its sentence and the inputs it names. */
static void
expect_error (RgStatus st, const RgError *err, const char *needle,
              RgSubjects subjects)
{
  g_assert_cmpint (st, ==, RG_ERR_DOMAIN);
  g_assert_cmpint (err->status, ==, RG_ERR_DOMAIN);
  if (strstr (err->text, needle) == NULL)
    g_error ("message '%s' lacks '%s'", err->text, needle);
  if (err->subjects != subjects)
    g_error ("message '%s': subjects %#llx, want %#llx", err->text,
             err->subjects, subjects);
}

static void
test_range (void)
{
  double rho = -1.0, mu = -1.0, p = -1.0;
  /* the values in the sentences in °C and kPa, as an engineer reads them */
  RgUnitChoice metric = { { NULL } };
  RgError err = { 0 };

  metric.unit[RG_QTY_TEMPERATURE] = "°C";
  metric.unit[RG_QTY_PRESSURE] = "kPa";
  err.units = &metric;

  /* the ends of the range are accepted (water.h) */
  g_assert_cmpint (rg_water_properties (RG_WATER_T_MIN_K, 101325.0, &rho, &mu,
                                        &err), ==, RG_OK);
  g_assert_cmpint (rg_water_properties (RG_WATER_T_MAX_K, 0.5e6, &rho, &mu,
                                        &err), ==, RG_OK);
  g_assert_cmpint (rg_water_properties (RG_WATER_T_MIN_K, RG_WATER_P_MAX_PA,
                                        &rho, &mu, &err), ==, RG_OK);

  rho = mu = -1.0;
  /* Source: water.h, 0.01–150 °C (273.16–423.15 K) */
  expect_error (rg_water_properties (273.15, 101325.0, &rho, &mu, &err), &err,
                "0.01 °C to 150 °C", T);
  expect_error (rg_water_properties (423.16, 1.0e6, &rho, &mu, &err), &err,
                "0.01 °C to 150 °C", T);
  expect_error (rg_water_density (NAN, 101325.0, &rho, &err), &err,
                "finite", T);
  /* Source: water.h, 10 MPa = 10 000 kPa */
  expect_error (rg_water_density (300.0, 10.5e6, &rho, &err), &err,
                "10500 kPa (absolute) is above 10000 kPa", P);
  expect_error (rg_water_density (300.0, 0.0, &rho, &err), &err, "positive", P);
  expect_error (rg_water_density (300.0, -1.0, &rho, &err), &err, "positive", P);
  expect_error (rg_water_density (300.0, INFINITY, &rho, &err), &err,
                "positive", P);
  /* 150 °C at 4 bar: vapour.  Cross-check: python3-iapws
   * iapws.iapws97._PSat_T(423.15) = 0.476101 MPa, printed with 4 digits */
  expect_error (rg_water_density (423.15, 0.4e6, &rho, &err), &err,
                "At 150 °C water boils below 476.1 kPa: raise the pressure "
                "(absolute) or lower the temperature.", T | P);
  /* 100.01 °C at one atmosphere: just past the boiling point */
  expect_error (rg_water_density (373.16, 101325.0, &rho, &err), &err,
                "boils below", T | P);
  expect_error (rg_water_viscosity (298.15, 1200.0, &mu, &err), &err,
                "kg/m³", RHO);
  expect_error (rg_water_viscosity (298.15, NAN, &mu, &err), &err, "kg/m³",
                RHO);
  expect_error (rg_water_viscosity (500.0, 950.0, &mu, &err), &err,
                "0.01 °C to 150 °C", T);
  /* Source: IAPWS-IF97 eq. 30 holds from 273.15 K (0 °C) to 647.096 K
   * (373.946 °C, shown with 4 figures) */
  expect_error (rg_water_saturation_pressure (273.0, &p, &err), &err,
                "from 0 °C to 373.9 °C, not at -0.15 °C", T);
  expect_error (rg_water_saturation_pressure (700.0, &p, &err), &err,
                "373.9 °C", T);
  /* in SI when the caller chose no units */
  err.units = NULL;
  expect_error (rg_water_density (300.0, 10.5e6, &rho, &err), &err,
                "1.05e+07 Pa (absolute) is above 1e+07 Pa", P);
  /* outputs are untouched on error */
  g_assert_cmpfloat (rho, ==, -1.0);
  g_assert_cmpfloat (mu, ==, -1.0);
  g_assert_cmpfloat (p, ==, -1.0);
}

int
main (int argc, char *argv[])
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/water/if97/region1-table5", test_region1_table5);
  g_test_add_func ("/water/if97/region4-table35", test_region4_table35);
  g_test_add_func ("/water/r1208/table4", test_viscosity_r1208_table4);
  g_test_add_func ("/water/range", test_range);
  return g_test_run ();
}
