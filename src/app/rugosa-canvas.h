/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <gtk/gtk.h>

#include "model/rugosa-project.h"
#include "chart/rugosa-chart-input.h"
#include "rugosa-visibility.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_CANVAS (rugosa_canvas_get_type ())
G_DECLARE_FINAL_TYPE (RugosaCanvas, rugosa_canvas, RUGOSA, CANVAS, GtkWidget)

/* The friction chart on screen.  The canvas draws through the chart engine
 * (cached background, overlay on top); it follows `selection` (a
 * GtkSingleSelection over the project's lines) and changes it on a click or
 * the arrow keys.  `probe-text` holds the (Re, f, ε/D) under the pointer. */

GtkWidget  *rugosa_canvas_new             (void);
void        rugosa_canvas_set_project     (RugosaCanvas       *self,
                                           RugosaProject      *project);
void        rugosa_canvas_set_selection   (RugosaCanvas       *self,
                                           GtkSingleSelection *selection);
/* Which lines are drawn and pinned; NULL: all drawn, none pinned.  A
 * change of it refreshes the chart. */
void        rugosa_canvas_set_visibility  (RugosaCanvas       *self,
                                           RugosaVisibility   *visibility);
/* How many times the chart placed its labels (tests, benchmark): not on
 * a hover, nor on a frame whose markers and labels stay. */
unsigned    rugosa_canvas_get_placements  (RugosaCanvas       *self);
/* Rebuild the overlay from the project's results (cheap; the background is
 * rebuilt by the engine only when its spec changed). */
void        rugosa_canvas_refresh         (RugosaCanvas       *self);
const char *rugosa_canvas_get_probe_text  (RugosaCanvas       *self);
/* Where the pointer was last seen over the canvas (widget coordinates). */
void        rugosa_canvas_get_pointer     (RugosaCanvas       *self,
                                           double             *x,
                                           double             *y);
/* Duration of the last snapshot, microseconds (diagnostics, benchmark). */
gint64      rugosa_canvas_get_last_draw_us (RugosaCanvas      *self);
/* How many times the chart background was built (tests). */
guint       rugosa_canvas_get_background_builds (RugosaCanvas *self);
/* The input the canvas last drew (tests); NULL before the first refresh. */
const RugosaChartInput *rugosa_canvas_get_input (RugosaCanvas *self);
/* Device point of a line's design marker; FALSE when not drawn. */
gboolean    rugosa_canvas_marker_position (RugosaCanvas *self,
                                           guint         position,
                                           double       *x,
                                           double       *y);
/* Where the chart put the label (or number) of project line `position`;
 * FALSE when the line is not drawn (tests). */
gboolean    rugosa_canvas_get_label       (RugosaCanvas         *self,
                                           guint                 position,
                                           RugosaChartLabelInfo *out);
/* What a click at (x, y) does: select the line whose marker or label is
 * there.  FALSE when nothing is hit. */
gboolean    rugosa_canvas_select_at       (RugosaCanvas *self,
                                           double        x,
                                           double        y);
/* The ladder of a sizing under the lines (rugosa-chart.h; copied, 0 rungs
 * clear it), in `colour` (NULL: a muted ink), with a tooltip per rung
 * (`tips`, NULL-terminated, n_rungs of them, or NULL). */
void        rugosa_canvas_set_ladder      (RugosaCanvas          *self,
                                           const RugosaChartRung *rungs,
                                           gsize                  n_rungs,
                                           const RugosaChartRgba *colour,
                                           const char *const     *tips);
gsize       rugosa_canvas_get_ladder_count (RugosaCanvas         *self);
/* Device point of rung `index`; FALSE when it is off the plot. */
gboolean    rugosa_canvas_ladder_position (RugosaCanvas *self,
                                           guint         index,
                                           double       *x,
                                           double       *y);
/* Presentation: type and markers enlarged for a projected screen, by a
 * rule of the screen's height (rugosa-canvas.c); FALSE: as the widget's
 * size gives them.  A view: no change to the project. */
void        rugosa_canvas_set_projector   (RugosaCanvas *self,
                                           gboolean      projector);
gboolean    rugosa_canvas_get_projector   (RugosaCanvas *self);
/* The chart's magnification (rugosa-chart.h): 1 unless presenting. */
double      rugosa_canvas_get_magnify     (RugosaCanvas *self);
/* What a pointer at (x, y) would show (hover/probe), as if it moved there. */
void        rugosa_canvas_pointer_at      (RugosaCanvas *self,
                                           double        x,
                                           double        y);

G_END_DECLS
