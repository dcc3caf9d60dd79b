/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Pumping energy, life-cycle cost, system curves and the pump's duty point
 * of a line option.  The methods are stated at the top of
 * rugosa-life-cycle.c; every value comes from the one evaluation of the
 * line (rugosa-project-eval.c), at whatever flow and age it is needed.
 *
 * The per-age results (power at each flow case, the energy and cost of a
 * year new and at the service age, the duty points) are part of
 * RugosaLineResults (rugosa-evaluation.h); the year-by-year sums over the
 * service life, which do not depend on the age shown, are kept per line
 * (rugosa_project_get_life_cycle). */
#pragma once

#include <glib.h>

#include "core/status.h"
#include "rugosa-fields.h"
#include "rugosa-project.h"

G_BEGIN_DECLS

/* A pump curve fitted through its points (Steffen 1990; see the .c). */
typedef struct {
  guint n;                                  /* ≥ 3 when fitted */
  double q[RUGOSA_CURVE_POINTS_MAX];        /* flows, m³/s, increasing */
  double h[RUGOSA_CURVE_POINTS_MAX];        /* heads, m */
  double slope[RUGOSA_CURVE_POINTS_MAX];    /* dH/dQ at each point */
} RugosaPumpFit;

/* Fit `curve` (RUGOSA_LINE_CURVE_TYPE, flows increasing); FALSE when it
 * holds fewer than three points (no duty point can be found then). */
gboolean rugosa_pump_fit_init (RugosaPumpFit *fit, GVariant *curve);
/* The fitted head at `q`, taken at the nearest end outside the points. */
double rugosa_pump_fit_head (const RugosaPumpFit *fit, double q);

/* The head the line needs at flow `q` (≥ 0) and `age_years`:
 * H(Q) = Δz + (f·L/D + ΣK)·V²/2g, f from the project's friction model at
 * that flow; H(0) = Δz.  FALSE with the evaluation's sentence in `err`. */
gboolean rugosa_project_system_head (RugosaProject *self, RugosaLine *line,
                                     double q, double age_years,
                                     double *head_m, RgError *err);
/* The same at `n` (≥ 2) flows evenly spaced from 0 to `q_max`, into `q`
 * and `head` (n values each). */
gboolean rugosa_project_system_curve (RugosaProject *self, RugosaLine *line,
                                      double age_years, double q_max,
                                      guint n, double *q, double *head,
                                      RgError *err);

/* The energy cost of the line year by year over the service life. */
typedef struct {
  gboolean ok;                 /* FALSE: see `error` */
  char error[RG_ERROR_TEXT_MAX];
  double service_life_years;
  guint n_years;               /* the years (the last one may be a part) */
  /* year k = 1 … n_years at index k − 1: */
  double year_end[RUGOSA_LIFE_YEARS_MAX];     /* when it ends, years */
  double year_cost[RUGOSA_LIFE_YEARS_MAX];    /* its energy cost */
  double year_cost_pv[RUGOSA_LIFE_YEARS_MAX]; /* discounted to year 0 */
  gboolean has_capital;
  double capital;              /* spent at year 0 */
  double total;                /* Σ year_cost */
  double total_pv;             /* Σ year_cost_pv */
  double life_cycle_cost;      /* capital + total_pv */
  /* the duty point when new (it does not depend on the age shown) */
  gboolean has_pump;
  gboolean duty_new_ok;
  double duty_new_flow_m3_s, duty_new_head_m;
  RugosaDutyOutcome duty_new_outcome;
  RgError duty_new_error;      /* when the outcome is RUGOSA_DUTY_FAILED */
} RugosaLifeCycle;

/* The warning for a duty point not found (the sentence the results give),
 * when new or at the service age; NULL for RUGOSA_DUTY_NONE, _FOUND and
 * _FAILED (whose sentence is the evaluation's). */
const char *rugosa_duty_outcome_sentence (RugosaDutyOutcome outcome,
                                          gboolean new);

/* Computed once per change of the line or the settings; borrowed. */
const RugosaLifeCycle *rugosa_project_get_life_cycle (RugosaProject *self,
                                                      RugosaLine *line);

G_END_DECLS
