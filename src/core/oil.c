/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Petroleum oil: viscosity by ASTM D341, density by linear expansion.
 *
 * Viscosity: ASTM D341, Standard Practice for Viscosity–Temperature
 * Extrapolation of Liquid Petroleum Products (the Walther equation):
 *
 *   log10 log10 (ν + 0.7) = A − B·log10 T,   ν in cSt (mm²/s), T in K.
 *
 * A and B come from the two given points; ν at any T follows.  The
 * constant 0.7 is the form D341 gives for ν ≥ 2.0 cSt (later editions add a
 * correction term below that): computed viscosities under 2 cSt, and
 * temperatures outside the two given ones, get a warning.  The two points
 * must have the higher viscosity at the lower temperature (B > 0).
 *
 * Density: ρ(T) = ρref / (1 + β·(T − Tref)), the definition of a constant
 * volumetric expansion coefficient β (for mineral oils β ≈ 6.4e-4 to
 * 7.5e-4 1/K; common practice, no single source).
 *
 * Range: 200–600 K covers liquid petroleum products from pour point to
 * initial boiling point (common practice, no single source). */
#include "oil.h"

#include <math.h>

static const double CST = 1.0e-6; /* 1 cSt = 1 mm²/s = 1e-6 m²/s */
static const double WALTHER_C = 0.7;

static RgStatus
check_t (const char *what, double t, RgError *err)
{
  if (!isfinite (t) || t < RG_OIL_T_MIN_K || t > RG_OIL_T_MAX_K)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "Oil: the %s must lie between %g and %g K.", what,
                         RG_OIL_T_MIN_K, RG_OIL_T_MAX_K);
  return RG_OK;
}

RgStatus
rg_oil_check (const RgOilSpec *o, RgError *err)
{
  RgStatus st;

  if ((st = check_t ("first temperature", o->t1_k, err)) != RG_OK
      || (st = check_t ("second temperature", o->t2_k, err)) != RG_OK
      || (st = check_t ("reference temperature", o->t_ref_k, err)) != RG_OK)
    return st;
  if (!isfinite (o->nu1_m2_s) || !isfinite (o->nu2_m2_s)
      || o->nu1_m2_s < RG_OIL_NU_MIN_M2_S || o->nu2_m2_s < RG_OIL_NU_MIN_M2_S
      || o->nu1_m2_s > 1.0 || o->nu2_m2_s > 1.0)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "Oil: both kinematic viscosities must lie between 2 cSt and 1e6 cSt (ASTM D341).");
  if (fabs (o->t1_k - o->t2_k) < 1.0)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "Oil: the two temperatures must differ by at least 1 K.");
  if ((o->t1_k < o->t2_k) != (o->nu1_m2_s > o->nu2_m2_s))
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "Oil: the viscosity must be higher at the lower of the two temperatures.");
  if (!isfinite (o->density_ref_kg_m3) || o->density_ref_kg_m3 < 500.0
      || o->density_ref_kg_m3 > 1200.0)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "Oil: the reference density must lie between 500 and 1200 kg/m³.");
  if (!isfinite (o->expansion_per_k) || o->expansion_per_k < 0.0
      || o->expansion_per_k > RG_OIL_EXPANSION_MAX_PER_K)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "Oil: the thermal expansion coefficient must lie between 0 and %g 1/K.",
                         RG_OIL_EXPANSION_MAX_PER_K);
  return RG_OK;
}

static double
walther (double nu_m2_s)
{
  return log10 (log10 (nu_m2_s / CST + WALTHER_C));
}

RgStatus
rg_oil_kinematic_viscosity (const RgOilSpec *o, double t_k, double *nu_m2_s,
                            RgWarnings *warnings, RgError *err)
{
  RgStatus st;

  if ((st = rg_oil_check (o, err)) != RG_OK
      || (st = check_t ("temperature", t_k, err)) != RG_OK)
    return st;

  const double x1 = log10 (o->t1_k), x2 = log10 (o->t2_k);
  const double w1 = walther (o->nu1_m2_s), w2 = walther (o->nu2_m2_s);
  const double b = (w1 - w2) / (x2 - x1);
  const double a = w1 + b * x1;
  const double nu = (pow (10.0, pow (10.0, a - b * log10 (t_k))) - WALTHER_C) * CST;

  if (!isfinite (nu) || nu <= 0.0)
    return rg_error_set (err, RG_ERR_NUMERIC,
                         "Oil: the viscosity at %.1f K could not be computed from the two given points.",
                         t_k);
  if (t_k < fmin (o->t1_k, o->t2_k) || t_k > fmax (o->t1_k, o->t2_k))
    rg_warnings_add (warnings,
                     "Oil: %.1f K lies outside the two given temperatures; the viscosity is extrapolated (ASTM D341).",
                     t_k);
  if (nu < RG_OIL_NU_MIN_M2_S)
    rg_warnings_add (warnings,
                     "Oil: the viscosity %.2f cSt is below 2 cSt, where the ASTM D341 form used loses accuracy.",
                     nu / CST);
  *nu_m2_s = nu;
  return RG_OK;
}

RgStatus
rg_oil_density (const RgOilSpec *o, double t_k, double *density_kg_m3,
                RgError *err)
{
  RgStatus st;

  if ((st = rg_oil_check (o, err)) != RG_OK
      || (st = check_t ("temperature", t_k, err)) != RG_OK)
    return st;
  const double grow = 1.0 + o->expansion_per_k * (t_k - o->t_ref_k);
  /* β ≤ 2e-3 and |ΔT| ≤ 400 K keep grow ≥ 0.2. */
  *density_kg_m3 = o->density_ref_kg_m3 / grow;
  return RG_OK;
}

RgStatus
rg_oil_properties (const RgOilSpec *o, double t_k, RgFluidProps *out,
                   RgWarnings *warnings, RgError *err)
{
  RgStatus st;
  double rho = 0.0, nu = 0.0; /* for clang-analyzer: rg_error_set never returns RG_OK */

  if ((st = rg_oil_density (o, t_k, &rho, err)) != RG_OK)
    return st;
  if ((st = rg_oil_kinematic_viscosity (o, t_k, &nu, warnings, err)) != RG_OK)
    return st;
  out->density_kg_m3 = rho;
  out->kinematic_viscosity_m2_s = nu;
  out->dynamic_viscosity_pa_s = nu * rho;
  return RG_OK;
}
