/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Liquid water: density, saturation pressure and viscosity.
 *
 * Density: IAPWS-IF97 region 1, the dimensionless Gibbs free energy
 *   γ(π, τ) = Σ n_i (7.1 − π)^I_i (τ − 1.222)^J_i   (34 terms, eq. 7,
 *   Table 2), π = p/16.53 MPa, τ = 1386 K/T, and
 *   v = (R·T/p)·π·γ_π  (Table 3), R = 0.461526 kJ/(kg·K) (eq. 1).
 * Saturation pressure: IF97 region 4, eq. 30 with the coefficients of
 *   Table 34, used here only to tell liquid from vapour.
 * Viscosity: IAPWS R12-08, "Release on the IAPWS Formulation 2008 for the
 *   Viscosity of Ordinary Water Substance", μ = μ0(T̄)·μ1(T̄, ρ̄)·μ2 with
 *   μ2 = 1, the choice the release makes for industrial use (the critical
 *   enhancement is negligible far from 647 K); eqs. (10)–(12), Tables 1
 *   and 2; T̄ = T/647.096 K, ρ̄ = ρ/322 kg/m³, μ* = 1 µPa·s.
 *
 * Sources: IAPWS, Revised Release on the IAPWS Industrial Formulation 1997
 * for the Thermodynamic Properties of Water and Steam (IAPWS-IF97), Lucerne,
 * August 2007; IAPWS R12-08, Berlin, September 2008.
 *
 * Range accepted (water.h): 273.16 K ≤ T ≤ 423.15 K (0.01–150 °C),
 * p_sat(T) ≤ p ≤ 10 MPa absolute.  Accuracy: IF97 region 1 agrees with
 * the scientific formulation IAPWS-95 to about 1e-6 in density here (e.g.
 * 998.2061 against 998.2072 kg/m³ at 20 °C, 101.325 kPa, computed with
 * python3-iapws); for the viscosity R12-08 states an uncertainty of the
 * order of 1 % for liquid water at these conditions (from memory of the
 * release's uncertainty figure; not re-checked).  The arithmetic follows
 * the standards term by term in double precision; tests/crosscheck-water.py
 * compares it with python3-iapws.
 *
 * Special cases: non-finite arguments and states outside the range return
 * RG_ERR_DOMAIN with a sentence that says which way to move. */
#include "water.h"
#include "water-private.h"

#include "message-private.h"

#include <math.h>

/* IF97 eq. 1: specific gas constant of water, J/(kg·K). */
static const double IF97_R = 461.526;
/* IF97 region 1 reducing quantities (eq. 7). */
static const double IF97_R1_PSTAR = 16.53e6; /* Pa */
static const double IF97_R1_TSTAR = 1386.0;  /* K */

/* IF97 Table 2: exponents and coefficients of the region-1 Gibbs equation. */
static const int IF97_R1_I[34] = {
  0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2,
  2, 2, 3, 3, 3, 4, 4, 4, 5, 8, 8, 21, 23, 29, 30, 31, 32,
};
static const int IF97_R1_J[34] = {
  -2, -1, 0, 1, 2, 3, 4, 5, -9, -7, -1, 0, 1, 3, -3, 0, 1,
  3, 17, -4, 0, 6, -5, -2, 10, -8, -11, -6, -29, -31, -38, -39, -40, -41,
};
static const double IF97_R1_N[34] = {
  0.14632971213167, -0.84548187169114, -0.37563603672040e1,
  0.33855169168385e1, -0.95791963387872, 0.15772038513228,
  -0.16616417199501e-1, 0.81214629983568e-3, 0.28319080123804e-3,
  -0.60706301565874e-3, -0.18990068218419e-1, -0.32529748770505e-1,
  -0.21841717175414e-1, -0.52838357969930e-4, -0.47184321073267e-3,
  -0.30001780793026e-3, 0.47661393906987e-4, -0.44141845330846e-5,
  -0.72694996297594e-15, -0.31679644845054e-4, -0.28270797985312e-5,
  -0.85205128120103e-9, -0.22425281908000e-5, -0.65171222895601e-6,
  -0.14341729937924e-12, -0.40516996860117e-6, -0.12734301741641e-8,
  -0.17424871230634e-9, -0.68762131295531e-18, 0.14478307828521e-19,
  0.26335781662795e-22, -0.11947622640071e-22, 0.18228094581404e-23,
  -0.93537087292458e-25,
};

/* IF97 Table 34: coefficients n1 … n10 of the saturation-pressure equation
 * (index 0 unused so that the indices match the standard). */
static const double IF97_R4_N[11] = {
  0.0,
  0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2,
  0.12020824702470e5, -0.32325550322333e7, 0.14915108613530e2,
  -0.48232657361591e4, 0.40511340542057e6, -0.23855557567849,
  0.65017534844798e3,
};
/* IF97 region 4 validity: water.h (RG_WATER_SATURATION_T_*). */

/* R12-08 reference constants (Section 2.2): critical temperature and
 * density; the viscosity is reduced by 1e-6 Pa·s. */
static const double R1208_TC = 647.096;
static const double R1208_RHOC = 322.0;
static const double R1208_MUSTAR = 1.0e-6;

/* R12-08 Table 1: H_i of the dilute-gas term μ0, eq. (11). */
static const double R1208_H0[4] = {
  1.67752, 2.20462, 0.6366564, -0.241605,
};

/* R12-08 Table 2: the 21 non-zero H_ij of the residual term μ1, eq. (12). */
static const int R1208_I[21] = {
  0, 1, 2, 3, 0, 1, 2, 3, 5, 0, 1, 2, 3, 4, 0, 1, 0, 3, 4, 3, 5,
};
static const int R1208_J[21] = {
  0, 0, 0, 0, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 4, 4, 5, 6, 6,
};
static const double R1208_H1[21] = {
  5.20094e-1, 8.50895e-2, -1.08374, -2.89555e-1, 2.22531e-1, 9.99115e-1,
  1.88797, 1.26613, 1.20573e-1, -2.81378e-1, -9.06851e-1, -7.72479e-1,
  -4.89837e-1, -2.57040e-1, 1.61913e-1, 2.57399e-1, -3.25372e-2,
  6.98452e-2, 8.72102e-3, -4.35673e-3, -5.93264e-4,
};

double
rg_water_region1_volume_unchecked (double t_k, double p_pa)
{
  double pi = p_pa / IF97_R1_PSTAR;
  double tau = IF97_R1_TSTAR / t_k;
  double a = 7.1 - pi;
  double b = tau - 1.222;
  double gamma_pi = 0.0;

  /* γ_π = Σ −n_i I_i (7.1 − π)^(I_i − 1) (τ − 1.222)^J_i  (IF97 Table 4);
   * the eight terms with I_i = 0 do not depend on π. */
  for (int i = 0; i < 34; i++)
    {
      if (IF97_R1_I[i] == 0)
        continue;
      gamma_pi -= IF97_R1_N[i] * IF97_R1_I[i]
                  * pow (a, IF97_R1_I[i] - 1) * pow (b, IF97_R1_J[i]);
    }
  return IF97_R * t_k * pi * gamma_pi / p_pa;
}

double
rg_water_viscosity_unchecked (double t_k, double rho)
{
  double tr = t_k / R1208_TC;
  double dr = rho / R1208_RHOC;
  double den = 0.0;
  double sum = 0.0;
  double mu0, mu1;

  /* eq. (11) */
  for (int i = 0; i < 4; i++)
    den += R1208_H0[i] / pow (tr, i);
  mu0 = 100.0 * sqrt (tr) / den;

  /* eq. (12) */
  for (int k = 0; k < 21; k++)
    sum += R1208_H1[k] * pow (1.0 / tr - 1.0, R1208_I[k])
           * pow (dr - 1.0, R1208_J[k]);
  mu1 = exp (dr * sum);

  /* eq. (10) with μ2 = 1 */
  return mu0 * mu1 * R1208_MUSTAR;
}

/* IF97 eq. 30, without range check; p in Pa. */
static double
saturation_pressure (double t_k)
{
  const double *n = IF97_R4_N;
  double th = t_k + n[9] / (t_k - n[10]);
  double a = th * th + n[1] * th + n[2];
  double b = n[3] * th * th + n[4] * th + n[5];
  double c = n[6] * th * th + n[7] * th + n[8];
  double x = 2.0 * c / (-b + sqrt (b * b - 4.0 * a * c));

  return x * x * x * x * 1.0e6; /* p* = 1 MPa */
}

RgStatus
rg_water_saturation_pressure (double t_k, double *p_pa, RgError *err)
{
  char a[RG_VALUE_MAX], b[RG_VALUE_MAX], c[RG_VALUE_MAX];
  double p;

  if (!isfinite (t_k) || t_k < RG_WATER_SATURATION_T_MIN_K
      || t_k > RG_WATER_SATURATION_T_MAX_K)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (TEMPERATURE),
                            "The saturation pressure of water is defined "
                            "from %s to %s, not at %s.",
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE,
                                          RG_WATER_SATURATION_T_MIN_K, a),
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE,
                                          RG_WATER_SATURATION_T_MAX_K, b),
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE, t_k, c));
  p = saturation_pressure (t_k);
  if (!isfinite (p) || p <= 0.0)
    return rg_error_set_on (err, RG_ERR_NUMERIC, RG_ON (TEMPERATURE),
                            "The saturation pressure of water at %s could "
                            "not be computed.",
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE, t_k, a));
  *p_pa = p;
  return RG_OK;
}

static RgStatus
check_temperature (double t_k, RgError *err)
{
  char a[RG_VALUE_MAX], b[RG_VALUE_MAX], c[RG_VALUE_MAX];

  if (!isfinite (t_k))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (TEMPERATURE),
                            "The water temperature must be a finite number "
                            "between %s and %s.",
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE,
                                          RG_WATER_T_MIN_K, a),
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE,
                                          RG_WATER_T_MAX_K, b));
  if (t_k < RG_WATER_T_MIN_K || t_k > RG_WATER_T_MAX_K)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (TEMPERATURE),
                            "A water temperature of %s lies outside the "
                            "range of the water model, %s to %s.",
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE, t_k, a),
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE,
                                          RG_WATER_T_MIN_K, b),
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE,
                                          RG_WATER_T_MAX_K, c));
  return RG_OK;
}

static RgStatus
check_state (double t_k, double p_pa, RgError *err)
{
  RgStatus st = check_temperature (t_k, err);
  char a[RG_VALUE_MAX], b[RG_VALUE_MAX];
  double ps;

  if (st != RG_OK)
    return st;
  if (!isfinite (p_pa) || p_pa <= 0.0)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (PRESSURE),
                            "The water pressure must be a positive absolute "
                            "pressure of at most %s.",
                            RG_ERR_VALUE (err, RG_QTY_PRESSURE,
                                          RG_WATER_P_MAX_PA, a));
  if (p_pa > RG_WATER_P_MAX_PA)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (PRESSURE),
                            "A water pressure of %s (absolute) is above %s, "
                            "the limit of the water model.",
                            RG_ERR_VALUE (err, RG_QTY_PRESSURE, p_pa, a),
                            RG_ERR_VALUE (err, RG_QTY_PRESSURE,
                                          RG_WATER_P_MAX_PA, b));
  ps = saturation_pressure (t_k);
  if (p_pa < ps)
    return rg_error_set_on (err, RG_ERR_DOMAIN,
                            RG_ON (TEMPERATURE) | RG_ON (PRESSURE),
                            "At %s water boils below %s: raise the pressure "
                            "(absolute) or lower the temperature.",
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE, t_k, a),
                            RG_ERR_VALUE (err, RG_QTY_PRESSURE, ps, b));
  return RG_OK;
}

RgStatus
rg_water_density (double t_k, double p_pa, double *rho, RgError *err)
{
  RgStatus st = check_state (t_k, p_pa, err);
  char a[RG_VALUE_MAX], b[RG_VALUE_MAX];
  double v;

  if (st != RG_OK)
    return st;
  v = rg_water_region1_volume_unchecked (t_k, p_pa);
  if (!isfinite (v) || v <= 0.0)
    return rg_error_set_on (err, RG_ERR_NUMERIC,
                            RG_ON (TEMPERATURE) | RG_ON (PRESSURE),
                            "The density of water at %s and %s could not be "
                            "computed.",
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE, t_k, a),
                            RG_ERR_VALUE (err, RG_QTY_PRESSURE, p_pa, b));
  *rho = 1.0 / v;
  return RG_OK;
}

/* The density is an argument here; rg_water_properties computes it from
 * the temperature and pressure inside the range, so that only a direct
 * caller can pass one out of range (subject RG_SUBJECT_DENSITY). */
RgStatus
rg_water_viscosity (double t_k, double rho, double *mu, RgError *err)
{
  RgStatus st = check_temperature (t_k, err);
  char a[RG_VALUE_MAX], b[RG_VALUE_MAX], c[RG_VALUE_MAX];
  double m;

  if (st != RG_OK)
    return st;
  if (!isfinite (rho) || rho < RG_WATER_RHO_MIN_KG_M3
      || rho > RG_WATER_RHO_MAX_KG_M3)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (DENSITY),
                            "The density for the water viscosity must lie "
                            "between %s and %s (liquid water), not %s.",
                            RG_ERR_VALUE (err, RG_QTY_DENSITY,
                                          RG_WATER_RHO_MIN_KG_M3, a),
                            RG_ERR_VALUE (err, RG_QTY_DENSITY,
                                          RG_WATER_RHO_MAX_KG_M3, b),
                            RG_ERR_VALUE (err, RG_QTY_DENSITY, rho, c));
  m = rg_water_viscosity_unchecked (t_k, rho);
  if (!isfinite (m) || m <= 0.0)
    return rg_error_set_on (err, RG_ERR_NUMERIC, RG_ON (TEMPERATURE),
                            "The viscosity of water at %s could not be "
                            "computed.",
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE, t_k, a));
  *mu = m;
  return RG_OK;
}

RgStatus
rg_water_properties (double t_k, double p_pa, double *rho, double *mu,
                     RgError *err)
{
  double r = 0.0, m = 0.0; /* for clang-analyzer: rg_error_set never returns RG_OK */
  RgStatus st = rg_water_density (t_k, p_pa, &r, err);

  if (st != RG_OK)
    return st;
  st = rg_water_viscosity (t_k, r, &m, err);
  if (st != RG_OK)
    {
      /* the density came from the temperature and the pressure */
      if (err != NULL && (err->subjects & RG_ON (DENSITY)) != 0)
        err->subjects = (err->subjects & ~RG_ON (DENSITY))
                        | RG_ON (TEMPERATURE) | RG_ON (PRESSURE);
      return st;
    }
  *rho = r;
  *mu = m;
  return RG_OK;
}
