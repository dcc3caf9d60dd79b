/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Flow regime and roughness zone.
 *
 * Regime: laminar below re_laminar_max, turbulent above re_turbulent_min,
 * transitional between.  Defaults 2000 and 4000: the range most
 * engineering texts give for pipe flow (e.g. Munson, Young and Okiishi,
 * Fundamentals of Fluid Mechanics, §8.1; White, Fluid Mechanics, §6.1).
 * In the transitional range the design value is the turbulent one and the
 * laminar value is reported beside it.
 *
 * Roughness zone from ε⁺ = Re·(ε/D)·√(f/8) (the roughness Reynolds number
 * k_s·u_τ/ν with u_τ = V·√(f/8)):
 *   ε⁺ < 5    hydraulically smooth   (Nikuradse 1933; Schlichting,
 *             Boundary-Layer Theory, 8th ed., §17.2)
 *   ε⁺ > 70   fully rough            (same sources)
 *   between   transitionally rough. */
#include "regime.h"

#include <math.h>

const double RG_EPS_PLUS_SMOOTH_MAX = 5.0;
const double RG_EPS_PLUS_FULLY_ROUGH_MIN = 70.0;

void
rg_transition_default (RgTransition *t)
{
  t->re_laminar_max = 2000.0;
  t->re_turbulent_min = 4000.0;
}

RgStatus
rg_transition_check (const RgTransition *t, RgError *err)
{
  if (!isfinite (t->re_laminar_max) || !isfinite (t->re_turbulent_min)
      || t->re_laminar_max < 500.0 || t->re_turbulent_min > 1.0e5
      || t->re_laminar_max > t->re_turbulent_min)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The transition thresholds must satisfy 500 ≤ lower ≤ upper ≤ 100000 (Reynolds numbers).");
  return RG_OK;
}

RgRegime
rg_regime_classify (const RgTransition *t, double re)
{
  if (re < t->re_laminar_max)
    return RG_REGIME_LAMINAR;
  if (re < t->re_turbulent_min)
    return RG_REGIME_TRANSITIONAL;
  return RG_REGIME_TURBULENT;
}

double
rg_roughness_reynolds (double re, double rr, double f)
{
  return re * rr * sqrt (f / 8.0);
}

RgRoughnessZone
rg_roughness_zone_classify (double eps_plus)
{
  if (eps_plus < RG_EPS_PLUS_SMOOTH_MAX)
    return RG_ZONE_SMOOTH;
  if (eps_plus > RG_EPS_PLUS_FULLY_ROUGH_MIN)
    return RG_ZONE_FULLY_ROUGH;
  return RG_ZONE_TRANSITIONALLY_ROUGH;
}

const char *
rg_regime_id (RgRegime regime)
{
  switch (regime)
    {
    case RG_REGIME_LAMINAR:
      return "laminar";
    case RG_REGIME_TRANSITIONAL:
      return "transitional";
    case RG_REGIME_TURBULENT:
      return "turbulent";
    default:
      return "unknown";
    }
}

const char *
rg_roughness_zone_id (RgRoughnessZone zone)
{
  switch (zone)
    {
    case RG_ZONE_SMOOTH:
      return "smooth";
    case RG_ZONE_TRANSITIONALLY_ROUGH:
      return "transitionally-rough";
    case RG_ZONE_FULLY_ROUGH:
      return "fully-rough";
    case RG_ZONE_NONE:
    default:
      return "none";
    }
}

RgStatus
rg_friction_point (RgFrictionModel model, const RgTransition *t, double re,
                   double rr, RgFrictionPoint *out, RgError *err)
{
  RgTransition def;
  RgStatus st;

  if (t == NULL)
    {
      rg_transition_default (&def);
      t = &def;
    }
  if ((st = rg_transition_check (t, err)) != RG_OK)
    return st;
  if (!isfinite (re) || re <= 0.0 || re > RG_FRICTION_RE_MAX)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The Reynolds number must lie between 0 and %g.",
                         RG_FRICTION_RE_MAX);
  if (!isfinite (rr) || rr < 0.0 || rr > RG_FRICTION_RR_MAX)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The relative roughness must lie between 0 and %g.",
                         RG_FRICTION_RR_MAX);

  out->regime = rg_regime_classify (t, re);
  out->zone = RG_ZONE_NONE;
  out->has_laminar = 0;
  out->eps_plus = 0.0;
  out->roughness_elasticity = 0.0;
  if ((st = rg_friction_laminar (re, &out->f_laminar, err)) != RG_OK)
    return st;

  if (out->regime == RG_REGIME_LAMINAR)
    {
      out->f = out->f_laminar;
      return RG_OK;
    }

  /* The turbulent correlations are computed from RG_FRICTION_RE_MIN; a lower
   * laminar limit than that (settable) still needs a design value. */
  const double re_t = fmax (re, RG_FRICTION_RE_MIN);
  if ((st = rg_friction_model (model, re_t, rr, &out->f, err)) != RG_OK)
    return st;
  if ((st = rg_friction_roughness_elasticity (re_t, rr, &out->roughness_elasticity, err)) != RG_OK)
    return st;
  out->eps_plus = rg_roughness_reynolds (re, rr, out->f);
  if (out->regime == RG_REGIME_TRANSITIONAL)
    out->has_laminar = 1;
  else
    out->zone = rg_roughness_zone_classify (out->eps_plus);
  return RG_OK;
}
