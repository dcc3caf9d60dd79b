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
 * volumetric expansion coefficient β.
 *
 * Ranges of every input, with their sources: oil.h (RG_OIL_*). */
#include "oil.h"

#include "message-private.h"

#include <math.h>

static const double CST = 1.0e-6; /* 1 cSt = 1 mm²/s = 1e-6 m²/s */
static const double WALTHER_C = 0.7;

/* Which temperature of the oil model a range check is about. */
typedef enum {
  OIL_T1,
  OIL_T2,
  OIL_T_REF,
  OIL_T_LINE,
} OilTemperature;

static RgStatus
check_t (OilTemperature which, double t, RgError *err)
{
  char lo[RG_VALUE_MAX], hi[RG_VALUE_MAX], v[RG_VALUE_MAX];

  if (isfinite (t) && t >= RG_OIL_T_MIN_K && t <= RG_OIL_T_MAX_K)
    return RG_OK;
  RG_ERR_VALUE (err, RG_QTY_TEMPERATURE, RG_OIL_T_MIN_K, lo);
  RG_ERR_VALUE (err, RG_QTY_TEMPERATURE, RG_OIL_T_MAX_K, hi);
  RG_ERR_VALUE (err, RG_QTY_TEMPERATURE, t, v);
  switch (which)
    {
    case OIL_T1:
      return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (OIL_T1),
                              "Oil: the temperature of the first viscosity "
                              "must lie between %s and %s, not %s.",
                              lo, hi, v);
    case OIL_T2:
      return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (OIL_T2),
                              "Oil: the temperature of the second viscosity "
                              "must lie between %s and %s, not %s.",
                              lo, hi, v);
    case OIL_T_REF:
      return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (OIL_T_REF),
                              "Oil: the temperature of the reference density "
                              "must lie between %s and %s, not %s.",
                              lo, hi, v);
    case OIL_T_LINE:
    default:
      return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (TEMPERATURE),
                              "Oil: the temperature must lie between %s and "
                              "%s, not %s.", lo, hi, v);
    }
}

static int
nu_ok (double nu)
{
  return isfinite (nu) && nu >= RG_OIL_NU_MIN_M2_S && nu <= RG_OIL_NU_MAX_M2_S;
}

RgStatus
rg_oil_check (const RgOilSpec *o, RgError *err)
{
  char lo[RG_VALUE_MAX], hi[RG_VALUE_MAX], v[RG_VALUE_MAX];
  RgStatus st;

  if ((st = check_t (OIL_T1, o->t1_k, err)) != RG_OK
      || (st = check_t (OIL_T2, o->t2_k, err)) != RG_OK
      || (st = check_t (OIL_T_REF, o->t_ref_k, err)) != RG_OK)
    return st;
  if (!nu_ok (o->nu1_m2_s))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (OIL_NU1),
                            "Oil: the first kinematic viscosity must lie "
                            "between %s and %s (ASTM D341), not %s.",
                            RG_ERR_VALUE (err, RG_QTY_KIN_VISCOSITY,
                                          RG_OIL_NU_MIN_M2_S, lo),
                            RG_ERR_VALUE (err, RG_QTY_KIN_VISCOSITY,
                                          RG_OIL_NU_MAX_M2_S, hi),
                            RG_ERR_VALUE (err, RG_QTY_KIN_VISCOSITY,
                                          o->nu1_m2_s, v));
  if (!nu_ok (o->nu2_m2_s))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (OIL_NU2),
                            "Oil: the second kinematic viscosity must lie "
                            "between %s and %s (ASTM D341), not %s.",
                            RG_ERR_VALUE (err, RG_QTY_KIN_VISCOSITY,
                                          RG_OIL_NU_MIN_M2_S, lo),
                            RG_ERR_VALUE (err, RG_QTY_KIN_VISCOSITY,
                                          RG_OIL_NU_MAX_M2_S, hi),
                            RG_ERR_VALUE (err, RG_QTY_KIN_VISCOSITY,
                                          o->nu2_m2_s, v));
  if (fabs (o->t1_k - o->t2_k) < RG_OIL_T_DIFF_MIN_K)
    return rg_error_set_on (err, RG_ERR_DOMAIN,
                            RG_ON (OIL_T1) | RG_ON (OIL_T2),
                            "Oil: the temperatures of the two viscosities "
                            "must differ by at least %s.",
                            rg_units_format_difference (rg_error_units (err),
                                                        RG_QTY_TEMPERATURE,
                                                        RG_OIL_T_DIFF_MIN_K,
                                                        v, sizeof v));
  if ((o->t1_k < o->t2_k) != (o->nu1_m2_s > o->nu2_m2_s))
    return rg_error_set_on (err, RG_ERR_DOMAIN,
                            RG_ON (OIL_NU1) | RG_ON (OIL_NU2) | RG_ON (OIL_T1)
                            | RG_ON (OIL_T2),
                            "Oil: the viscosity must be higher at the lower "
                            "of the two temperatures.");
  if (!isfinite (o->density_ref_kg_m3)
      || o->density_ref_kg_m3 < RG_OIL_DENSITY_MIN_KG_M3
      || o->density_ref_kg_m3 > RG_OIL_DENSITY_MAX_KG_M3)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (OIL_DENSITY_REF),
                            "Oil: the reference density must lie between %s "
                            "and %s, not %s.",
                            RG_ERR_VALUE (err, RG_QTY_DENSITY,
                                          RG_OIL_DENSITY_MIN_KG_M3, lo),
                            RG_ERR_VALUE (err, RG_QTY_DENSITY,
                                          RG_OIL_DENSITY_MAX_KG_M3, hi),
                            RG_ERR_VALUE (err, RG_QTY_DENSITY,
                                          o->density_ref_kg_m3, v));
  /* β has no quantity of its own in units.h: it is written per kelvin */
  if (!isfinite (o->expansion_per_k)
      || o->expansion_per_k < RG_OIL_EXPANSION_MIN_PER_K
      || o->expansion_per_k > RG_OIL_EXPANSION_MAX_PER_K)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (OIL_EXPANSION),
                            "Oil: the thermal expansion coefficient must lie "
                            "between %g and %g 1/K.",
                            RG_OIL_EXPANSION_MIN_PER_K,
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
      || (st = check_t (OIL_T_LINE, t_k, err)) != RG_OK)
    return st;

  const double x1 = log10 (o->t1_k), x2 = log10 (o->t2_k);
  const double w1 = walther (o->nu1_m2_s), w2 = walther (o->nu2_m2_s);
  const double b = (w1 - w2) / (x2 - x1);
  const double a = w1 + b * x1;
  const double nu = (pow (10.0, pow (10.0, a - b * log10 (t_k))) - WALTHER_C) * CST;

  char va[RG_VALUE_MAX], vb[RG_VALUE_MAX], vc[RG_VALUE_MAX];

  if (!isfinite (nu) || nu <= 0.0)
    return rg_error_set_on (err, RG_ERR_NUMERIC,
                            RG_ON (TEMPERATURE) | RG_ON (OIL_T1)
                            | RG_ON (OIL_NU1) | RG_ON (OIL_T2)
                            | RG_ON (OIL_NU2),
                            "Oil: the viscosity at %s could not be computed "
                            "from the two given points.",
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE, t_k, va));
  if (warnings != NULL
      && (t_k < fmin (o->t1_k, o->t2_k) || t_k > fmax (o->t1_k, o->t2_k)))
    rg_warnings_add (warnings,
                     "Oil: %s lies outside the temperatures of the two given "
                     "viscosities (%s and %s); the viscosity is extrapolated "
                     "(ASTM D341).",
                     RG_WARN_VALUE (warnings, RG_QTY_TEMPERATURE, t_k, va),
                     RG_WARN_VALUE (warnings, RG_QTY_TEMPERATURE,
                                    fmin (o->t1_k, o->t2_k), vb),
                     RG_WARN_VALUE (warnings, RG_QTY_TEMPERATURE,
                                    fmax (o->t1_k, o->t2_k), vc));
  if (warnings != NULL && nu < RG_OIL_NU_MIN_M2_S)
    rg_warnings_add (warnings,
                     "Oil: the viscosity %s is below %s, where the ASTM D341 "
                     "form used loses accuracy.",
                     RG_WARN_VALUE (warnings, RG_QTY_KIN_VISCOSITY, nu, va),
                     RG_WARN_VALUE (warnings, RG_QTY_KIN_VISCOSITY,
                                    RG_OIL_NU_MIN_M2_S, vb));
  *nu_m2_s = nu;
  return RG_OK;
}

RgStatus
rg_oil_density (const RgOilSpec *o, double t_k, double *density_kg_m3,
                RgError *err)
{
  RgStatus st;

  if ((st = rg_oil_check (o, err)) != RG_OK
      || (st = check_t (OIL_T_LINE, t_k, err)) != RG_OK)
    return st;
  const double grow = 1.0 + o->expansion_per_k * (t_k - o->t_ref_k);
  /* β ≤ RG_OIL_EXPANSION_MAX_PER_K and |ΔT| ≤ 400 K keep grow ≥ 0.2. */
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
