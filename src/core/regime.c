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
 * Roughness zone, in turbulent flow, from the friction factor itself.
 * Colebrook's equation (1939, J. ICE 11(4), 133–156; friction.c)
 *     1/√f = −2·log10( (ε/D)/3.7 + 2.51/(Re·√f) )
 * joins two limiting laws (their form from memory of Schlichting,
 * Boundary-Layer Theory, the chapter on pipe flow; not checked against the
 * document):
 *     hydraulically smooth (Prandtl–von Kármán, Colebrook with ε = 0)
 *         1/√f_s = −2·log10( 2.51/(Re·√f_s) ),
 *     fully rough (von Kármán–Nikuradse)
 *         1/√f_r = −2·log10( (ε/D)/3.7 ).
 * Colebrook's f lies above both, since the argument of its logarithm is the
 * sum of theirs.  With f Colebrook's value at (Re, ε/D), a point is
 *     hydraulically smooth   when f ≤ (1 + τ)·f_s(Re),
 *     fully rough            when f ≤ (1 + τ)·f_r(ε/D),
 *     transitionally rough   otherwise,
 * the smooth test first (both cannot hold at once: at 2 % each needs its own
 * term to make up more than about 80 % of the logarithm's argument).  f is
 * Colebrook's whatever model gives the design value, so a point does not
 * change zone with the model; ε/D = 0 is smooth.
 *
 * τ = RG_ROUGHNESS_ZONE_TOLERANCE = 2 %.  Common practice (no single
 * source): 2 % in f is within the scatter of the measurements behind these
 * laws and near the explicit correlations' own departure from Colebrook
 * (Haaland about 1.5 %, friction.c), so a point that close to a limiting law
 * behaves as that law in design; a wider tolerance would call a pipe smooth
 * whose loss is visibly above the smooth law's.  In terms of the roughness
 * Reynolds number ε⁺ = Re·(ε/D)·√(f/8) (computed and reported as before,
 * eps_plus) the edges fall at roughly
 *     ε⁺ ≈ 0.2–0.7 on the smooth edge (Re 1e3 to 1e10),
 *     ε⁺ ≈ 20–90 on the fully rough edge (ε/D 1e-6 to 0.1; 15 at 1e-8)
 * (evaluated with the formulas below).  The sand-grain limits 5 and 70
 * (Nikuradse 1933, VDI-Forschungsheft 361; from memory) describe uniform
 * sand, whose friction leaves the smooth law abruptly; Colebrook's law for
 * commercial pipe leaves it gradually, and at ε⁺ = 5 its f already lies
 * 15–20 % above the smooth law (new commercial steel, ε/D 3.6e-4 at Re
 * 2.55e5: ε⁺ 4.3, f 18 % above).
 *
 * Edges, explicit.  With q = 1/√(1 + τ): on the smooth edge 1/√f = q·x_s,
 * x_s = 1/√f_s(Re), and Colebrook there gives
 *     ε/D = 3.7·( 10^(−q·x_s/2) − q·2.51·x_s/Re );
 * on the fully rough edge 1/√f = q·x_r, x_r = −2·log10((ε/D)/3.7), and
 *     Re = 2.51·q·x_r / ( (ε/D)/3.7 · (10^((1 − q)·x_r/2) − 1) ),
 * the last bracket by expm1, as it is small.  Both are exact given x_s (the
 * core's Colebrook solve, relative error below 3e-15) or x_r; they lose at
 * most a digit to cancellation. */
#include "regime.h"

#include <math.h>

/* See the top of the file. */
const double RG_ROUGHNESS_ZONE_TOLERANCE = 0.02;

/* ln(10)/2; mpmath, 40 digits */
static const double HALF_LN10 = 1.151292546497022842008995727342182103801;

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

/* Domain of the zone functions: that of Colebrook in friction.h.  Written so
 * that NaN fails. */
static RgStatus
zone_check_re (double re, RgError *err)
{
  if (!(re >= RG_FRICTION_RE_MIN && re <= RG_FRICTION_RE_MAX))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_SUBJECT_BIT (RG_SUBJECT_REYNOLDS),
                            "The Reynolds number must be a number between %g and %g, not %g.",
                            RG_FRICTION_RE_MIN, RG_FRICTION_RE_MAX, re);
  return RG_OK;
}

/* 1/√f of the fully rough law, x_r = −2·log10((ε/D)/3.7), for rr > 0. */
static double
rough_law_x (double rr)
{
  return -2.0 * log10 (rr / 3.7);
}

RgStatus
rg_roughness_zone_classify (double re, double rr, RgRoughnessZone *zone,
                            RgError *err)
{
  double f, f_s;
  RgStatus st;

  if ((st = zone_check_re (re, err)) != RG_OK)
    return st;
  if (!(rr >= 0.0 && rr <= RG_FRICTION_RR_MAX))
    return rg_error_set_on (err, RG_ERR_DOMAIN,
                            RG_SUBJECT_BIT (RG_SUBJECT_RELATIVE_ROUGHNESS),
                            "The relative roughness must be a number between 0 and %g, not %g.",
                            RG_FRICTION_RR_MAX, rr);
  if ((st = rg_friction_colebrook (re, rr, &f, err)) != RG_OK
      || (st = rg_friction_colebrook (re, 0.0, &f_s, err)) != RG_OK)
    return st;

  const double limit = 1.0 + RG_ROUGHNESS_ZONE_TOLERANCE;
  if (f <= limit * f_s)
    *zone = RG_ZONE_SMOOTH;
  else
    {
      /* rr > 0 here: for rr = 0 the two Colebrook values are equal */
      const double x_r = rough_law_x (rr);
      *zone = f * x_r * x_r <= limit ? RG_ZONE_FULLY_ROUGH
                                     : RG_ZONE_TRANSITIONALLY_ROUGH;
    }
  return RG_OK;
}

RgStatus
rg_roughness_zone_smooth_edge (double re, double *rr, double *f, RgError *err)
{
  double f_s;
  RgStatus st;

  if ((st = zone_check_re (re, err)) != RG_OK
      || (st = rg_friction_colebrook (re, 0.0, &f_s, err)) != RG_OK)
    return st;
  const double limit = 1.0 + RG_ROUGHNESS_ZONE_TOLERANCE;
  const double q = 1.0 / sqrt (limit);
  const double x_s = 1.0 / sqrt (f_s);
  const double v = 3.7 * (exp (-HALF_LN10 * q * x_s) - q * 2.51 * x_s / re);
  /* v > 0 for any τ > 0 over the whole domain; also false for NaN */
  if (!(v > 0.0 && v <= RG_FRICTION_RR_MAX))
    return rg_error_set_on (err, RG_ERR_NUMERIC, RG_SUBJECT_BIT (RG_SUBJECT_REYNOLDS),
                            "The edge of the hydraulically smooth zone could not be computed at Reynolds number %g.",
                            re);
  *rr = v;
  *f = limit * f_s;
  return RG_OK;
}

RgStatus
rg_roughness_zone_rough_edge (double rr, double *re, double *f, RgError *err)
{
  if (!(rr > 0.0 && rr <= RG_FRICTION_RR_MAX))
    return rg_error_set_on (err, RG_ERR_DOMAIN,
                            RG_SUBJECT_BIT (RG_SUBJECT_RELATIVE_ROUGHNESS),
                            "The relative roughness must be a number above 0 and at most %g, not %g.",
                            RG_FRICTION_RR_MAX, rr);
  const double limit = 1.0 + RG_ROUGHNESS_ZONE_TOLERANCE;
  const double q = 1.0 / sqrt (limit);
  const double x_r = rough_law_x (rr);
  const double v = 2.51 * q * x_r / (rr / 3.7 * expm1 (HALF_LN10 * (1.0 - q) * x_r));
  /* overflows only for subnormal ε/D; also false for NaN */
  if (!(v > 0.0 && rg_is_finite (v)))
    return rg_error_set_on (err, RG_ERR_NUMERIC,
                            RG_SUBJECT_BIT (RG_SUBJECT_RELATIVE_ROUGHNESS),
                            "The edge of the fully rough zone could not be computed for relative roughness %g.",
                            rr);
  const double x = q * x_r;
  *re = v;
  *f = 1.0 / (x * x);
  return RG_OK;
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
  else if ((st = rg_roughness_zone_classify (re_t, rr, &p.zone, err)) != RG_OK)
    return st;
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
