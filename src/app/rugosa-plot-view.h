/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <gtk/gtk.h>

#include "chart/rugosa-plot-input.h"
#include "model/rugosa-project.h"
#include "rugosa-visibility.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_PLOT_VIEW (rugosa_plot_view_get_type ())
G_DECLARE_FINAL_TYPE (RugosaPlotView, rugosa_plot_view, RUGOSA, PLOT_VIEW, GtkWidget)

/* One of the chart area's other views on screen, the system curves or the
 * life-cycle cost ("view-id" "system" or "cost", the ids of rugosa-cli
 * render --view), drawn by the chart engine from the project's results.
 * It follows `selection` (the selected line is drawn on top; a click on a
 * curve selects its line) and shows the line's readout as a tooltip. */

GtkWidget  *rugosa_plot_view_new           (void);
void        rugosa_plot_view_set_project   (RugosaPlotView     *self,
                                            RugosaProject      *project,
                                            GSettings          *settings);
void        rugosa_plot_view_set_selection (RugosaPlotView     *self,
                                            GtkSingleSelection *selection);
/* The lines the window shows (the hidden ones are left out); NULL: every
 * line.  Redrawn when it changes. */
void        rugosa_plot_view_set_visibility (RugosaPlotView   *self,
                                             RugosaVisibility *visibility);
/* Read the results again and draw; only while the view is on screen (a
 * hidden view refreshes when it is shown). */
void        rugosa_plot_view_refresh       (RugosaPlotView     *self);
RugosaChartView rugosa_plot_view_get_view  (RugosaPlotView     *self);
/* The input last drawn (tests); NULL before the first refresh. */
const RugosaPlotInput *rugosa_plot_view_get_input (RugosaPlotView *self);
/* What a click at (x, y) does: select the line whose curve is there. */
gboolean    rugosa_plot_view_select_at     (RugosaPlotView     *self,
                                            double              x,
                                            double              y);

G_END_DECLS
