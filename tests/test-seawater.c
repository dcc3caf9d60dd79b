/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Seawater (Sharqawy, Lienhard and Zubair 2010) against reference values.
 *
 * The check values printed in Sharqawy et al. (2010) were not at hand; the
 * references below are pure-water IAPWS values (S = 0) and oceanographic
 * standard-seawater values, each within the paper's stated accuracy
 * (density ±0.1 %, viscosity ±1.5 %); the pure-water viscosity fit is held
 * to what we measured against python3-iapws (see seawater.c). */
#include "core/seawater.h"
#include "core/units.h"

#include <glib.h>
#include <math.h>
#include <string.h>

/* Reference-composition absolute salinity of standard seawater with
 * practical salinity 35: 35.16504 g/kg (Millero et al. 2008, Deep-Sea
 * Research I 55, 50–72, eq. 5.1: S_R = (35.16504/35)·S_P). */
#define S35 0.03516504

static void
assert_rel (double got, double want, double tol)
{
  if (!(fabs (got - want) <= tol * fabs (want)))
    g_error ("got %.17g, want %.17g (relative tolerance %g)", got, want, tol);
}

static void
test_pure_water (void)
{
  double rho, mu;

  g_assert_cmpint (rg_seawater_density (293.15, 0.0, &rho, NULL), ==, RG_OK);
  /* From memory of IAPWS-95 (Wagner and Pruss 2002): 998.207 kg/m³ at
   * 20 °C, 0.101325 MPa; python3-iapws iapws.IAPWS95 gives 998.2072 */
  assert_rel (rho, 998.207, 1e-3);
  g_assert_cmpint (rg_seawater_viscosity (293.15, 0.0, &mu, NULL), ==, RG_OK);
  /* From memory of IAPWS 2008 viscosity (Huber et al. 2009): 1.0016 mPa·s
   * at 20 °C, 0.1 MPa; python3-iapws iapws.IAPWS95 gives 1.001596e-3 */
  assert_rel (mu, 1.001596e-3, 5e-4);
  g_assert_cmpint (rg_seawater_viscosity (353.15, 0.0, &mu, NULL), ==, RG_OK);
  /* python3-iapws iapws.IAPWS95 (IAPWS 2008 viscosity): 0.354050 mPa·s at
   * 80 °C, 0.1 MPa.  Eq. (23) departs by 0.11 % here (measured against
   * python3-iapws; up to 0.25 % at 180 °C), so the tolerance is 0.2 %. */
  assert_rel (mu, 0.354050e-3, 2e-3);
}

static void
test_standard_seawater (void)
{
  double rho;
  RgFluidProps p;

  g_assert_cmpint (rg_seawater_density (278.15, S35, &rho, NULL), ==, RG_OK);
  /* From memory of the UNESCO (1981) EOS-80 check value: S = 35, 5 °C,
   * 0 dbar, 1027.67547 kg/m³; python3-iapws iapws.SeaWater (IAPWS 2008)
   * gives 1027.6756 */
  assert_rel (rho, 1027.67547, 1e-3);
  g_assert_cmpint (rg_seawater_density (298.15, S35, &rho, NULL), ==, RG_OK);
  /* python3-iapws iapws.SeaWater (IAPWS 2008): 1023.3436 kg/m³ at S_R =
   * 35.16504 g/kg, 25 °C, 0.101325 MPa */
  assert_rel (rho, 1023.3436, 1e-3);

  g_assert_cmpint (rg_seawater_properties (288.15, S35, &p, NULL), ==, RG_OK);
  /* From memory of ITTC Recommended Procedure 7.5-02-01-03 (2011), Fresh
   * water and seawater properties: 15 °C, S = 35: ρ = 1025.9 kg/m³,
   * ν = 1.18831e-6 m²/s; not checked against the document */
  assert_rel (p.density_kg_m3, 1025.9, 1e-3);
  assert_rel (p.kinematic_viscosity_m2_s, 1.18831e-6, 1.5e-2);
  assert_rel (p.dynamic_viscosity_pa_s, p.kinematic_viscosity_m2_s * p.density_kg_m3, 1e-15);
}

static void
test_trends (void)
{
  double r1, r2, m1, m2;

  /* Source: Sharqawy et al. (2010), Figs. 2 and 7: density and viscosity
   * rise with salinity at fixed temperature. */
  for (double t = 275.0; t <= 450.0; t += 25.0)
    {
      rg_seawater_density (t, 0.01, &r1, NULL);
      rg_seawater_density (t, 0.12, &r2, NULL);
      g_assert_cmpfloat (r2, >, r1);
      rg_seawater_viscosity (t, 0.01, &m1, NULL);
      rg_seawater_viscosity (t, 0.12, &m2, NULL);
      g_assert_cmpfloat (m2, >, m1);
    }
}

#define T RG_SUBJECT_BIT (RG_SUBJECT_TEMPERATURE)
#define P RG_SUBJECT_BIT (RG_SUBJECT_PRESSURE)
#define S RG_SUBJECT_BIT (RG_SUBJECT_SALINITY)

static void
test_range (void)
{
  double x;
  RgFluidProps p;
  RgError err = { 0 };

  /* Source: Sharqawy et al. (2010): eq. (8) 0–180 °C, 0–0.16 kg/kg; eq. (22)
   * 0–180 °C, 0–0.15 kg/kg. */
  g_assert_cmpint (rg_seawater_density (273.15, 0.15, &x, NULL), ==, RG_OK);
  g_assert_cmpint (rg_seawater_density (453.15, 0.0, &x, NULL), ==, RG_OK);
  g_assert_cmpint (rg_seawater_density (272.0, 0.035, &x, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "temperature"));
  g_assert_cmpuint (err.subjects, ==, T);
  g_assert_cmpint (rg_seawater_viscosity (454.0, 0.035, &x, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, T);
  g_assert_cmpint (rg_seawater_properties (300.0, 0.16, &p, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "salinity"));
  g_assert_cmpuint (err.subjects, ==, S);
  g_assert_cmpint (rg_seawater_properties (300.0, -0.001, &p, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, S);
  g_assert_cmpint (rg_seawater_properties (NAN, 0.035, &p, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, T);
  g_assert_cmpint (rg_seawater_properties (300.0, NAN, &p, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, S);
  /* in the caller's units: Source: Sharqawy et al. (2010), 0–180 °C and
   * 0–150 g/kg, the ends written in °C and g/kg */
  RgUnitChoice metric = { { NULL } };
  metric.unit[RG_QTY_TEMPERATURE] = "°C";
  metric.unit[RG_QTY_SALINITY] = "g/kg";
  err.units = &metric;
  g_assert_cmpint (rg_seawater_properties (300.0, 0.16, &p, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "between 0 g/kg and 150 g/kg (Sharqawy et al. 2010), not 160 g/kg"));
  g_assert_cmpint (rg_seawater_properties (500.0, 0.035, &p, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "between 0 °C and 180 °C"));
}

/* The pressure: positive, at most RG_SEAWATER_P_MAX_PA (seawater.h gives
 * the reasons), and not below the saturation pressure. */
static void
test_pressure (void)
{
  RgUnitChoice metric = { { NULL } };
  RgError err = { 0 };

  metric.unit[RG_QTY_TEMPERATURE] = "°C";
  metric.unit[RG_QTY_PRESSURE] = "MPa";
  err.units = &metric;
  /* Source: seawater.h, the correlations hold at 0.1 MPa; accepted up to
   * 10 MPa */
  g_assert_cmpfloat (RG_SEAWATER_P_MAX_PA, ==, 10.0e6);
  g_assert_cmpint (rg_seawater_check_state (293.15, 101325.0, &err), ==, RG_OK);
  g_assert_cmpint (rg_seawater_check_state (293.15, RG_SEAWATER_P_MAX_PA, &err), ==, RG_OK);
  g_assert_cmpint (rg_seawater_check_state (293.15, 10.5e6, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, P);
  g_assert_nonnull (strstr (err.text, "10.5 MPa (absolute) is above 10 MPa"));
  g_assert_cmpint (rg_seawater_check_state (293.15, 0.0, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, P);
  g_assert_cmpint (rg_seawater_check_state (293.15, -1.0, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpint (rg_seawater_check_state (293.15, NAN, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpint (rg_seawater_check_state (293.15, INFINITY, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, P);
  /* Cross-check: python3-iapws iapws.iapws97._PSat_T(423.15) = 0.476101 MPa:
   * at 150 °C seawater is refused below it (pure water's saturation
   * pressure, seawater.h), accepted above */
  g_assert_cmpint (rg_seawater_check_state (423.15, 0.45e6, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, T | P);
  g_assert_nonnull (strstr (err.text, "At 150 °C seawater boils below about 0.4761 MPa"));
  g_assert_cmpint (rg_seawater_check_state (423.15, 0.5e6, &err), ==, RG_OK);
  /* outside the correlations' temperatures the range check speaks */
  g_assert_cmpint (rg_seawater_check_state (500.0, 101325.0, &err), ==, RG_OK);
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/seawater/pure-water", test_pure_water);
  g_test_add_func ("/seawater/standard-seawater", test_standard_seawater);
  g_test_add_func ("/seawater/trends", test_trends);
  g_test_add_func ("/seawater/range", test_range);
  g_test_add_func ("/seawater/pressure", test_pressure);
  return g_test_run ();
}
