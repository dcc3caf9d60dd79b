/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Flow regime (laminar / transitional / turbulent) and, in turbulent flow,
 * the roughness zone from the roughness Reynolds number
 * ε⁺ = Re·(ε/D)·√(f/8). */
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

/* Roughness Reynolds number thresholds (sources in regime.c). */
extern const double RG_EPS_PLUS_SMOOTH_MAX;      /* 5 */
extern const double RG_EPS_PLUS_FULLY_ROUGH_MIN; /* 70 */

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
/* Smooth for ε⁺ < 5, fully rough for ε⁺ > 70, transitionally rough between
 * (both limits included).  Never RG_ZONE_NONE. */
RgRoughnessZone rg_roughness_zone_classify (double eps_plus);

/* "laminar", "transitional", "turbulent" */
const char *rg_regime_id (RgRegime regime);
/* "none", "smooth", "transitionally-rough", "fully-rough" */
const char *rg_roughness_zone_id (RgRoughnessZone zone);

/* Everything the friction side knows about one operating point. */
typedef struct {
  RgRegime regime;
  RgRoughnessZone zone;        /* RG_ZONE_NONE unless turbulent */
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
