/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Seawater properties.
 *
 * Source: Sharqawy, M. H., Lienhard, J. H. and Zubair, S. M. (2010),
 * "Thermophysical properties of seawater: a review of existing correlations
 * and data", Desalination and Water Treatment 16, 354–380.
 *
 *   Density, eq. (8), at 0.1 MPa (t in °C, S in kg/kg):
 *     ρ = a1 + a2·t + a3·t² + a4·t³ + a5·t⁴
 *         + b1·S + b2·S·t + b3·S·t² + b4·S·t³ + b5·S²·t²
 *     valid 0–180 °C, 0–0.16 kg/kg; accuracy ±0.1 % (the paper).
 *   Viscosity, eq. (22):  μ = μw·(1 + A·S + B·S²),
 *     A = 1.541 + 1.998e-2·t − 9.52e-5·t²,
 *     B = 7.974 − 7.561e-2·t + 4.724e-4·t²,
 *     valid 0–180 °C, 0–0.15 kg/kg; accuracy ±1.5 %.
 *   Pure water, eq. (23):  μw = 4.2844e-5 + 1/(0.157·(t + 64.993)² − 91.296),
 *     a fit of IAPWS data, 0–180 °C.  Measured against IAPWS 2008 (python3-iapws):
 *     within 0.02 % from 0 to 40 °C, 0.06 % at 60 °C, 0.12 % at 100 °C,
 *     0.25 % at 180 °C.
 * The coefficients below were entered from memory of the paper; the tests
 * compare the result with IAPWS at S = 0 and with oceanographic reference
 * values at S = 35 g/kg.
 *
 * Special cases: S = 0 gives the pure-water fits.  Outside the stated
 * ranges the functions return RG_ERR_DOMAIN (no extrapolation).  The
 * pressure is checked apart (rg_seawater_check_state; its range and the
 * reasons for it in seawater.h). */
#include "seawater.h"

#include "message-private.h"
#include "water.h"

#include <math.h>

static const double A1 = 9.999e2, A2 = 2.034e-2, A3 = -6.162e-3,
                    A4 = 2.261e-5, A5 = -4.657e-8;
static const double B1 = 8.020e2, B2 = -2.001, B3 = 1.677e-2,
                    B4 = -3.060e-5, B5 = -1.613e-5;

static RgStatus
check_range (double t_k, double s, RgError *err)
{
  char lo[RG_VALUE_MAX], hi[RG_VALUE_MAX], v[RG_VALUE_MAX];

  if (!isfinite (t_k) || t_k < RG_SEAWATER_T_MIN_K || t_k > RG_SEAWATER_T_MAX_K)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (TEMPERATURE),
                            "Seawater: the temperature must lie between %s "
                            "and %s (Sharqawy et al. 2010), not %s.",
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE,
                                          RG_SEAWATER_T_MIN_K, lo),
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE,
                                          RG_SEAWATER_T_MAX_K, hi),
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE, t_k, v));
  if (!isfinite (s) || s < RG_SEAWATER_S_MIN_KG_KG || s > RG_SEAWATER_S_MAX_KG_KG)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (SALINITY),
                            "Seawater: the salinity must lie between %s and "
                            "%s (Sharqawy et al. 2010), not %s.",
                            RG_ERR_VALUE (err, RG_QTY_SALINITY,
                                          RG_SEAWATER_S_MIN_KG_KG, lo),
                            RG_ERR_VALUE (err, RG_QTY_SALINITY,
                                          RG_SEAWATER_S_MAX_KG_KG, hi),
                            RG_ERR_VALUE (err, RG_QTY_SALINITY, s, v));
  return RG_OK;
}

RgStatus
rg_seawater_check_state (double t_k, double p_pa, RgError *err)
{
  char a[RG_VALUE_MAX], b[RG_VALUE_MAX];
  double p_sat;

  if (!isfinite (p_pa) || p_pa <= 0.0)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (PRESSURE),
                            "The seawater pressure must be a positive "
                            "absolute pressure of at most %s.",
                            RG_ERR_VALUE (err, RG_QTY_PRESSURE,
                                          RG_SEAWATER_P_MAX_PA, a));
  if (p_pa > RG_SEAWATER_P_MAX_PA)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (PRESSURE),
                            "A seawater pressure of %s (absolute) is above "
                            "%s, the limit of the seawater model.",
                            RG_ERR_VALUE (err, RG_QTY_PRESSURE, p_pa, a),
                            RG_ERR_VALUE (err, RG_QTY_PRESSURE,
                                          RG_SEAWATER_P_MAX_PA, b));
  /* outside the correlations' temperatures check_range speaks */
  if (!isfinite (t_k) || t_k < RG_SEAWATER_T_MIN_K || t_k > RG_SEAWATER_T_MAX_K)
    return RG_OK;
  if (rg_water_saturation_pressure (t_k, &p_sat, NULL) == RG_OK
      && p_pa < p_sat)
    return rg_error_set_on (err, RG_ERR_DOMAIN,
                            RG_ON (TEMPERATURE) | RG_ON (PRESSURE),
                            "At %s seawater boils below about %s: raise the "
                            "pressure (absolute) or lower the temperature.",
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE, t_k, a),
                            RG_ERR_VALUE (err, RG_QTY_PRESSURE, p_sat, b));
  return RG_OK;
}

RgStatus
rg_seawater_density (double t_k, double s, double *density_kg_m3, RgError *err)
{
  RgStatus st;

  if ((st = check_range (t_k, s, err)) != RG_OK)
    return st;
  const double t = t_k - 273.15;
  const double rho = A1 + t * (A2 + t * (A3 + t * (A4 + t * A5)))
                     + s * (B1 + t * (B2 + t * (B3 + t * B4)) + B5 * s * t * t);
  *density_kg_m3 = rho;
  return RG_OK;
}

RgStatus
rg_seawater_viscosity (double t_k, double s, double *viscosity_pa_s,
                       RgError *err)
{
  RgStatus st;

  if ((st = check_range (t_k, s, err)) != RG_OK)
    return st;
  const double t = t_k - 273.15;
  const double mu_w = 4.2844e-5 + 1.0 / (0.157 * (t + 64.993) * (t + 64.993) - 91.296);
  const double a = 1.541 + 1.998e-2 * t - 9.52e-5 * t * t;
  const double b = 7.974 - 7.561e-2 * t + 4.724e-4 * t * t;
  *viscosity_pa_s = mu_w * (1.0 + a * s + b * s * s);
  return RG_OK;
}

RgStatus
rg_seawater_properties (double t_k, double s, RgFluidProps *out, RgError *err)
{
  RgStatus st;
  double rho, mu;

  if ((st = rg_seawater_density (t_k, s, &rho, err)) != RG_OK)
    return st;
  if ((st = rg_seawater_viscosity (t_k, s, &mu, err)) != RG_OK)
    return st;
  out->density_kg_m3 = rho;
  out->dynamic_viscosity_pa_s = mu;
  out->kinematic_viscosity_m2_s = mu / rho;
  return RG_OK;
}
