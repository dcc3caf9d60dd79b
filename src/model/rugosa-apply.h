/* SPDX-License-Identifier: GPL-3.0-or-later */
/* One part of a line option — its fluid, its aging or its flow case —
 * applied to other line options at once, as one undo step.  The fields of
 * a part are the rows of the line field table that belong to it
 * (RugosaField.part); of the fluid, the kind and the rows describing the
 * source's kind of fluid (rugosa_field_applies_to_fluid), so that a target
 * takes the source's fluid exactly and keeps what it held for the other
 * kinds (an oil's viscosity data while it is water).
 *
 * Cost: one pass over the targets times the part's rows, a comparison of
 * two values each, and one recorded change per value that differs; the
 * project emits "changed" once (rugosa_project_hold_changed), and each
 * changed line is evaluated again once, when its results are next asked
 * for.  Undo and redo cost the same. */
#pragma once

#include "rugosa-fields.h"
#include "rugosa-history.h"

G_BEGIN_DECLS

/* Give every line of `targets` (other than `source` itself) the values of
 * `source`'s `part`, through `history` as one step whose label says how
 * many lines changed ("Apply the fluid to 4 lines").  A target that holds
 * those values already is left alone; none changed records no step.
 * Returns the number of lines changed. */
guint rugosa_apply_part (RugosaHistory    *history,
                         RugosaLine       *source,
                         RugosaLinePart    part,
                         RugosaLine *const *targets,
                         guint             n_targets);

/* Whether `row` is one of the fields of `part` that applying `source`'s
 * part sets. */
gboolean rugosa_apply_row_applies (const RugosaField *row,
                                   RugosaLine        *source,
                                   RugosaLinePart     part);

G_END_DECLS
