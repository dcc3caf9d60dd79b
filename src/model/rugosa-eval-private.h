/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The pieces of the one evaluation (rugosa-project-eval.c) that the energy
 * and curve computations (rugosa-life-cycle.c) share: what a line resolves
 * to once (fluid properties, catalog values, the settings' friction model
 * and transition), and the line at any flow and age from it.  The results
 * table, the system curve, the duty point and the year-by-year energy all
 * come from the same function, so they agree to the last bit. */
#pragma once

#include "core/aging.h"
#include "core/fittings.h"
#include "core/fluid.h"
#include "core/line.h"
#include "rugosa-life-cycle.h"
#include "rugosa-project.h"

G_BEGIN_DECLS

typedef struct {
  RgFluidSpec spec;
  RgFluidProps props;
  RgWarnings fluid_warnings;
  double diameter_m, roughness_new_m, rate_m_per_year;
  double length_m, elevation_m;
  RgFrictionModel model;
  RgTransition transition;
  RgFittingUse *uses;
  gsize n_uses;
  gboolean uses_borrowed;    /* the line's cache owns `uses` */
} RugosaLineSetup;

/* Resolve `line` under the project's settings; FALSE with the sentence
 * (and its subjects) in `err`.  Clear with _rugosa_line_setup_clear. */
gboolean _rugosa_line_setup_init (RugosaProject *self, RugosaLine *line,
                                  RugosaLineSetup *setup, RgError *err);
void _rugosa_line_setup_clear (RugosaLineSetup *setup);

/* The core's input for the line at flow `q` (> 0) when new, with ΣK at the
 * flow's Reynolds number (3-K fittings depend on it); warnings of the
 * fittings go to `warnings` (may be NULL). */
RgStatus _rugosa_line_setup_input (const RugosaLineSetup *setup, double q,
                                   RgLineInput *in, RgWarnings *warnings,
                                   RgError *err);

/* The line at flow `q` (> 0) and `age_years`, new and aged, as the
 * evaluation computes each operating point. */
RgStatus _rugosa_line_setup_at (const RugosaLineSetup *setup, double q,
                                double age_years, RgAgingResult *out,
                                RgError *err);

/* rugosa-life-cycle.c: fill the pump power of every operating point and
 * the line's energy, costs and duty points, once the points are computed
 * (called by the evaluation for each age it computes). */
void _rugosa_life_cycle_fill (RugosaProject *self, RugosaLine *line,
                              const RugosaLineSetup *setup,
                              RugosaLineResults *r);
/* rugosa-life-cycle.c: the sums over the service life (and the duty point
 * when new), for rugosa_project_get_life_cycle's cache. */
void _rugosa_life_cycle_compute (RugosaProject *self, RugosaLine *line,
                                 RugosaLifeCycle *life);

G_END_DECLS
