/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Sizing: from a duty (a line option's fluid, flows, run, fittings and
 * aging) and a material to the right catalog size, over the pipe's whole
 * service life; and the two inverse problems of a line option (the flow
 * for an allowed head loss, the smallest bore within the limits).
 *
 * Every candidate and every step of an inverse problem is evaluated by the
 * project's one evaluation (rugosa_project_evaluate_line), with the
 * project's settings: no second hydraulics. */
#pragma once

#include <glib.h>

#include "core/catalog.h"
#include "rugosa-evaluation.h"
#include "rugosa-fields.h"
#include "rugosa-project.h"

G_BEGIN_DECLS

/* The limits a size must keep within (bits, for what a candidate breaks). */
typedef enum {
  RUGOSA_LIMIT_VELOCITY_MAX = 1 << 0,
  RUGOSA_LIMIT_VELOCITY_MIN = 1 << 1,
  RUGOSA_LIMIT_GRADIENT_MAX = 1 << 2,
  RUGOSA_LIMIT_HEAD_LOSS_MAX = 1 << 3,
} RugosaLimit;

#define RUGOSA_N_LIMITS 4

typedef struct {
  double velocity_max;   /* m/s */
  double velocity_min;   /* m/s, at the design flow; 0: none */
  double gradient_max;   /* m per 100 m of pipe friction */
  double head_loss_max;  /* m, total (pipe friction and fittings); 0: none */
} RugosaLimits;

/* The limits of the project settings (velocity-limit, velocity-minimum,
 * gradient-limit); no head-loss limit, which belongs to one duty. */
void rugosa_limits_from_settings (RugosaLimits *limits,
                                  RugosaSettings *settings);

/* "max-velocity", "min-velocity", "max-gradient", "max-head-loss": the
 * identifier in JSON, and rugosa-cli's option without its dashes. */
const char *rugosa_limit_id (RugosaLimit limit);
/* The field row of a limit: the settings row (velocity-limit,
 * velocity-minimum, gradient-limit) or, for the head loss, the row of
 * rugosa_sizing_fields, which holds its range, label and CLI option. */
const RugosaField *rugosa_limit_field (RugosaLimit limit);

/* The rows of the sizing's own inputs that are no project setting and no
 * field of a line: the largest total head loss of one duty. */
const RugosaField *rugosa_sizing_fields (guint *n);

/* The limits that results break (RugosaLimit bits): the upper limits at
 * the design and the highest flow, the lowest velocity at the design
 * flow; `aged` picks the results at the service age, else those when new.
 * A point that could not be computed breaks nothing here (its error is
 * its own). */
guint rugosa_limits_broken (const RugosaLimits *limits,
                            const RugosaLineResults *results, gboolean aged);

typedef struct {
  const RgPipe *pipe;
  RugosaLineResults results;  /* new and at the age, every flow of the duty */
  guint broken_new;           /* RugosaLimit bits when new */
  guint broken_aged;          /* … at the service age */
  gboolean passes;            /* computed, and nothing broken new or aged */
} RugosaSizingCandidate;

typedef struct {
  double age_years;
  RugosaLimits limits;
  guint n_candidates;
  RugosaSizingCandidate *candidates;  /* in the order of rg_pipe_compare */
  /* The first candidate (the smallest size, the thinnest wall of it) that
   * passes over the whole service life, or -1; and the same for a pipe
   * that never ages (never after `recommended` in the list). */
  int recommended;
  int recommended_new;
  char *why_none;             /* a sentence when recommended is -1 */
} RugosaSizing;

/* Every size of the catalogs that `catalog` chooses among those made of
 * `material_id` (rg_pipe_catalog_choose: NULL for the usual ones), each
 * as `duty` with that pipe and material, evaluated with the project's
 * settings at `age_years` (< 0: the settings' service age), checked
 * against `limits`.  The duty's own pipe, bore and material are not used.
 * NULL with `err` (and its subjects) when the material or catalog is
 * unknown or the duty itself cannot be evaluated. */
RugosaSizing *rugosa_sizing_run (RugosaProject *project, RugosaLine *duty,
                                 const char *material_id, const char *catalog,
                                 const RugosaLimits *limits, double age_years,
                                 RgError *err);
void rugosa_sizing_free (RugosaSizing *sizing);
G_DEFINE_AUTOPTR_CLEANUP_FUNC (RugosaSizing, rugosa_sizing_free)

/* The flow at which `line`'s total head loss at `age_years` is
 * `head_loss_m`.  FALSE with `err` (subject RG_SUBJECT_HEAD_LOSS, or the
 * line's own) when none within the flow field's range gives it. */
gboolean rugosa_solve_flow (RugosaProject *project, RugosaLine *line,
                            double age_years, double head_loss_m,
                            double *flow_m3_s, RgError *err);

/* The smallest inner diameter with which `line` keeps within the upper
 * limits (velocity, gradient, head loss; 0 for a limit leaves it out) at
 * its design and highest flows, new and at `age_years`, to 1e-12 relative.
 * The lowest velocity bounds the bore from above and is not used.  FALSE
 * with `err` when no bore within the inner-diameter field's range does. */
gboolean rugosa_solve_diameter (RugosaProject *project, RugosaLine *line,
                                double age_years, const RugosaLimits *limits,
                                double *diameter_m, RgError *err);

G_END_DECLS
