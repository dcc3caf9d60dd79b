/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Flow regime and roughness zone.
 *
 * Regime: laminar for Re < re_laminar_max, transitional for
 * re_laminar_max ≤ Re < re_turbulent_min, turbulent from re_turbulent_min.
 * Defaults 2000 and 4000: the "critical zone" of Moody's chart (Moody 1944,
 * "Friction factors for pipe flow", Trans. ASME 66(8), 671–684; from memory,
 * not checked against the document).  Texts differ (Munson, Young and
 * Okiishi give about 2100 and 4000, White about 2300 for the onset), so both
 * limits can be set, within 500 ≤ lower ≤ upper ≤ 1e5.
 * In the transitional range the design value is the turbulent one (the
 * conservative choice: it is the larger) and the laminar value 64/Re is
 * reported beside it.  If a lower limit below RG_FRICTION_RE_MIN is set, a
 * transitional point below that Reynolds number takes its turbulent value
 * at RG_FRICTION_RE_MIN, the lowest the correlations are computed for.
 *
 * Roughness zone from ε⁺ = Re·(ε/D)·√(f/8), the roughness Reynolds number
 * k_s·u_τ/ν with friction velocity u_τ = V·√(f/8):
 *   ε⁺ < 5         hydraulically smooth
 *   5 ≤ ε⁺ ≤ 70    transitionally rough
 *   ε⁺ > 70        fully rough
 * Both limits: Nikuradse (1933), "Strömungsgesetze in rauhen Rohren",
 * VDI-Forschungsheft 361, as summarised in Schlichting, Boundary-Layer
 * Theory (the chapter on flow in rough pipes); from memory, edition and
 * section not checked. */
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

/* Bounds on settable transition limits: regime.h (RG_TRANSITION_RE_*). */

RgStatus
rg_transition_check (const RgTransition *t, RgError *err)
{
  if (t == NULL)
    return rg_error_set_on (err, RG_ERR_DOMAIN,
                            RG_SUBJECT_BIT (RG_SUBJECT_RE_LAMINAR_MAX)
                            | RG_SUBJECT_BIT (RG_SUBJECT_RE_TURBULENT_MIN),
                            "The transition limits are missing.");
  const double lo = t->re_laminar_max, hi = t->re_turbulent_min;
  /* written so that NaN fails; the subjects are the limits at fault (both
   * when they are out of order) */
  if (!(lo >= RG_TRANSITION_RE_LOWEST && lo <= hi && hi <= RG_TRANSITION_RE_HIGHEST))
    return rg_error_set_on (err, RG_ERR_DOMAIN,
                            (!(lo >= RG_TRANSITION_RE_LOWEST) || !(lo <= hi)
                             ? RG_SUBJECT_BIT (RG_SUBJECT_RE_LAMINAR_MAX) : 0)
                            | (!(hi <= RG_TRANSITION_RE_HIGHEST) || !(lo <= hi)
                               ? RG_SUBJECT_BIT (RG_SUBJECT_RE_TURBULENT_MIN) : 0),
                            "The transition limits must satisfy %g ≤ lower ≤ upper ≤ %g (Reynolds numbers), not lower %g and upper %g.",
                            RG_TRANSITION_RE_LOWEST, RG_TRANSITION_RE_HIGHEST, lo, hi);
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
  RgFrictionPoint p;
  RgStatus st;

  if (t == NULL)
    {
      rg_transition_default (&def);
      t = &def;
    }
  if ((st = rg_transition_check (t, err)) != RG_OK)
    return st;
  if (!(re > 0.0 && re <= RG_FRICTION_RE_MAX))
    return rg_error_set_on (err, RG_ERR_DOMAIN,
                            RG_SUBJECT_BIT (RG_SUBJECT_REYNOLDS),
                            "The Reynolds number must be a number above 0 and at most %g, not %g.",
                            RG_FRICTION_RE_MAX, re);
  if (!(rr >= 0.0 && rr <= RG_FRICTION_RR_MAX))
    return rg_error_set_on (err, RG_ERR_DOMAIN,
                            RG_SUBJECT_BIT (RG_SUBJECT_RELATIVE_ROUGHNESS),
                            "The relative roughness must be a number between 0 and %g, not %g.",
                            RG_FRICTION_RR_MAX, rr);

  /* Filled here and copied out only on success, so that a failure leaves
   * *out untouched. */
  p.regime = rg_regime_classify (t, re);
  p.zone = RG_ZONE_NONE;
  p.has_laminar = 0;
  p.eps_plus = 0.0;
  p.roughness_elasticity = 0.0;
  if ((st = rg_friction_laminar (re, &p.f_laminar, err)) != RG_OK)
    return st;

  if (p.regime == RG_REGIME_LAMINAR)
    {
      p.f = p.f_laminar;
      *out = p;
      return RG_OK;
    }

  /* see the top of the file for Reynolds numbers below RG_FRICTION_RE_MIN */
  const double re_t = fmax (re, RG_FRICTION_RE_MIN);
  if ((st = rg_friction_model (model, re_t, rr, &p.f, err)) != RG_OK)
    return st;
  if ((st = rg_friction_roughness_elasticity (re_t, rr, &p.roughness_elasticity, err)) != RG_OK)
    return st;
  p.eps_plus = rg_roughness_reynolds (re, rr, p.f);
  if (p.regime == RG_REGIME_TRANSITIONAL)
    p.has_laminar = 1;
  else
    p.zone = rg_roughness_zone_classify (p.eps_plus);
  *out = p;
  return RG_OK;
}

/* Stated ranges of the correlations, for the "outside the range" warning.
 * From memory of Swamee and Jain (1976), J. Hydraul. Div. ASCE 102(5):
 * 5000 ≤ Re ≤ 1e8, 1e-6 ≤ ε/D ≤ 1e-2; of Haaland (1983), J. Fluids Eng.
 * 105(1): 4000 ≤ Re ≤ 1e8, ε/D ≤ 0.05; Colebrook is taken as covering the
 * window of Moody's chart (Moody 1944, Trans. ASME 66), 4000 ≤ Re ≤ 1e8,
 * ε/D ≤ 0.05; Churchill (1977) covers every regime, up to the same window;
 * not checked against the documents. */
static const struct
{
  double re_min, re_max, rr_min, rr_max;
} correlation_ranges[RG_FRICTION_N_MODELS] = {
  [RG_FRICTION_COLEBROOK] = { 4000.0, 1.0e8, 0.0, 0.05 },
  [RG_FRICTION_HAALAND] = { 4000.0, 1.0e8, 0.0, 0.05 },
  [RG_FRICTION_SWAMEE_JAIN] = { 5000.0, 1.0e8, 1.0e-6, 1.0e-2 },
  [RG_FRICTION_CHURCHILL] = { 0.0, 1.0e8, 0.0, 0.05 },
};

void
rg_friction_validity_warnings (RgFrictionModel model, double re, double rr,
                               const RgFrictionPoint *pt, RgWarnings *w)
{
  if (pt->regime == RG_REGIME_LAMINAR || (unsigned) model >= RG_FRICTION_N_MODELS)
    return;

  const double re_lo = correlation_ranges[model].re_min;
  const double re_hi = correlation_ranges[model].re_max;
  const double rr_lo = correlation_ranges[model].rr_min;
  const double rr_hi = correlation_ranges[model].rr_max;

  if (pt->regime == RG_REGIME_TRANSITIONAL)
    rg_warnings_add (w, "The flow is transitional (Re %.0f): the friction factor may lie anywhere from the laminar %.4g to the turbulent %.4g; the turbulent value is used.",
                     re, pt->f_laminar, pt->f);
  /* A transitional point lies below every turbulent correlation's range:
   * the warning above says so already. */
  else if (re < re_lo || re > re_hi)
    rg_warnings_add (w, "The Reynolds number %.3g lies outside %g–%g, the range stated for %s.",
                     re, re_lo, re_hi, rg_friction_model_title (model));
  if (rr > rr_hi)
    rg_warnings_add (w, "The relative roughness %.3g exceeds %g, the largest stated for %s.",
                     rr, rr_hi, rg_friction_model_title (model));
  else if (rr > 0.0 && rr < rr_lo)
    rg_warnings_add (w, "The relative roughness %.3g is below %g, the smallest stated for %s.",
                     rr, rr_lo, rg_friction_model_title (model));
}
