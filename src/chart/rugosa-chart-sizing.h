/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The ladder of a sizing as the chart engine's plain input: one rung per
 * size that could be evaluated, at the design flow. */
#pragma once

#include <glib.h>

#include "chart/rugosa-chart.h"
#include "model/rugosa-sizing.h"

G_BEGIN_DECLS

/* Rungs in the sizing's order; `aged`: the point and roughness curve at
 * the sizing's service age, else when new; `selected` (may be NULL) flags
 * the candidates chosen in a list, one per candidate.  The labels point
 * into the catalog (static).  Free with g_free. */
RugosaChartRung *rugosa_chart_ladder_from_sizing (const RugosaSizing *sizing,
                                                  gboolean aged,
                                                  const gboolean *selected,
                                                  size_t *n_rungs);

G_END_DECLS
