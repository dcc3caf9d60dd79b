/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Flow regime (laminar / transitional / turbulent) and, in turbulent flow,
 * the roughness zone: how close Colebrook's friction factor lies to the
 * smooth-pipe law and to the fully rough law (regime.c).  The roughness
 * Reynolds number ε⁺ = Re·(ε/D)·√(f/8) is reported beside it. */
#pragma once

#include "friction.h"
#include "status.h"

typedef enum {
  RG_REGIME_LAMINAR = 0,
  RG_REGIME_TRANSITIONAL,
  RG_REGIME_TURBULENT
} RgRegime;

typedef enum {
  RG_ZONE_NONE = 0,           /* not turbulent */
  RG_ZONE_SMOOTH,             /* hydraulically smooth */
  RG_ZONE_TRANSITIONALLY_ROUGH,
  RG_ZONE_FULLY_ROUGH
} RgRoughnessZone;

/* Reynolds numbers bounding the transitional range. */
typedef struct {
  double re_laminar_max;   /* default 2000 */
  double re_turbulent_min; /* default 4000 */
} RgTransition;

/* Relative tolerance on the friction factor that bounds the hydraulically
 * smooth and the fully rough zones: 0.02 (regime.c says why). */
extern const double RG_ROUGHNESS_ZONE_TOLERANCE;

/* Bounds on settable transition limits: a sanity range, not physics.
 * Below about 2000 pipe flow stays laminar whatever the disturbances, and
 * with great care it has been kept laminar to about 1e5 (from memory of
 * Pfenninger's 1961 experiments as cited by White, Viscous Fluid Flow; not
 * checked against the document); 500 leaves room for cautious choices. */
#define RG_TRANSITION_RE_LOWEST 500.0
#define RG_TRANSITION_RE_HIGHEST 1.0e5

void rg_transition_default (RgTransition *t);
/* RG_TRANSITION_RE_LOWEST ≤ re_laminar_max ≤ re_turbulent_min ≤
 * RG_TRANSITION_RE_HIGHEST (equal limits: no transitional range).  NULL or
 * NaN fails. */
RgStatus rg_transition_check (const RgTransition *t, RgError *err);

/* Laminar for re < re_laminar_max, transitional up to (not including)
 * re_turbulent_min, turbulent from there.  `re` must be a number (callers
 * check it; rg_friction_point does). */
RgRegime rg_regime_classify (const RgTransition *t, double re);
/* ε⁺ = re·rr·√(f/8) */
double rg_roughness_reynolds (double re, double rr, double f);

/* The roughness zone of a turbulent point, from Colebrook's friction factor
 * f at (re, rr) whatever model gives the design value: hydraulically
 * smooth when f ≤ (1 + RG_ROUGHNESS_ZONE_TOLERANCE) times the smooth-pipe
 * value at re (Colebrook with ε = 0), else fully rough when f ≤ (1 + tol)
 * times the fully rough value of rr (von Kármán–Nikuradse), else
 * transitionally rough.  rr = 0 is smooth.  Domain: RG_FRICTION_RE_MIN ≤
 * re ≤ RG_FRICTION_RE_MAX, 0 ≤ rr ≤ RG_FRICTION_RR_MAX (NaN fails);
 * `*zone` is never RG_ZONE_NONE and is left untouched on failure. */
RgStatus rg_roughness_zone_classify (double re, double rr,
                                     RgRoughnessZone *zone, RgError *err);
/* The edge of the hydraulically smooth zone at Reynolds number re (same
 * range as above): the relative roughness `*rr` at which Colebrook's f is
 * (1 + tol) times the smooth-pipe value, and that f.  At re a smaller ε/D
 * is smooth, a larger one is not. */
RgStatus rg_roughness_zone_smooth_edge (double re, double *rr, double *f,
                                        RgError *err);
/* The edge of the fully rough zone for relative roughness rr
 * (0 < rr ≤ RG_FRICTION_RR_MAX): the Reynolds number `*re` at which
 * Colebrook's f is (1 + tol) times the fully rough value, and that f.
 * From *re on the pipe is fully rough.  *re exceeds RG_FRICTION_RE_MAX for
 * ε/D below about 1e-8 (a point beyond the friction functions' domain). */
RgStatus rg_roughness_zone_rough_edge (double rr, double *re, double *f,
                                       RgError *err);

/* "laminar", "transitional", "turbulent" */
const char *rg_regime_id (RgRegime regime);
/* "none", "smooth", "transitionally-rough", "fully-rough" */
const char *rg_roughness_zone_id (RgRoughnessZone zone);

/* Everything the friction side knows about one operating point. */
typedef struct {
  RgRegime regime;
  RgRoughnessZone zone;        /* RG_ZONE_NONE unless turbulent; by
                                  rg_roughness_zone_classify */
  double f;                    /* design value: 64/Re when laminar, else the model */
  double f_laminar;            /* 64/Re; meaningful when has_laminar */
  int has_laminar;             /* 1 in the transitional range */
  double eps_plus;             /* roughness Reynolds number (0 when laminar) */
  double roughness_elasticity; /* ∂ln f/∂ln(ε/D); 0 when laminar */
} RgFrictionPoint;

RgStatus rg_friction_point (RgFrictionModel model, const RgTransition *t,
                            double re, double rr, RgFrictionPoint *out,
                            RgError *err);

/* Warnings for an operating point (re, rr) evaluated as `pt` with `model`:
 * the transitional range (laminar and turbulent values named), and a
 * Reynolds number or relative roughness outside the range the model's
 * authors state (sources in regime.c).  Laminar points get none. */
void rg_friction_validity_warnings (RgFrictionModel model, double re,
                                    double rr, const RgFrictionPoint *pt,
                                    RgWarnings *warnings);
