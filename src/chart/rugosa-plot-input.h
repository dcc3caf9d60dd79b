/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Fill the plot views' plain input from the project (the system curves
 * and the life-cycle cost): curves, points and readouts from the model's
 * results in the project's display units, the texts translated.  Shared
 * by the window's chart area, its export and rugosa-cli render, so all
 * three draw the same. */
#pragma once

#include <gio/gio.h>

#include "chart/rugosa-chart-input.h"
#include "chart/rugosa-chart-plot.h"
#include "model/rugosa-project.h"

G_BEGIN_DECLS

typedef struct {
  RugosaPlotSpec    spec;
  RugosaPlotSeries *series;
  size_t            n_series;
  /* Series i is project line `line_index[i]` (lines that could not be
   * evaluated are left out). */
  guint            *line_index;
  GPtrArray        *owned;   /* strings and points the series point into */
} RugosaPlotInput;

/* The points of each sampled curve (system curves, fitted pump curves). */
#define RUGOSA_PLOT_CURVE_POINTS 81

/* `view` is RUGOSA_CHART_VIEW_SYSTEM or _COST; `selected` the project
 * line drawn on top (-1: none); `shown` the lines the window shows, as
 * for rugosa_chart_input_new_view (NULL: every line).  Size, scale and
 * theme of the spec are the defaults, for the caller to set. */
RugosaPlotInput *rugosa_plot_input_new  (RugosaProject              *project,
                                         RugosaChartView             view,
                                         int                         selected,
                                         const RugosaChartInputView *shown);
void             rugosa_plot_input_free (RugosaPlotInput *input);

G_DEFINE_AUTOPTR_CLEANUP_FUNC (RugosaPlotInput, rugosa_plot_input_free)

G_END_DECLS
