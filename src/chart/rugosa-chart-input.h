/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Fill the chart engine's plain C input from the project: the background
 * spec from the project settings and one RugosaChartLine per line option
 * from the model's results, with readouts in the display units.  Shared by
 * the canvas, the export and the print code so all three draw the same. */
#pragma once

#include <gio/gio.h>

#include "chart/rugosa-chart.h"
#include "model/rugosa-project.h"

G_BEGIN_DECLS

typedef struct {
  RugosaChartSpec  spec;
  RugosaChartLine *lines;
  size_t           n_lines;
  /* Line i of `lines` is project line `line_index[i]` (lines that could
   * not be evaluated are left out of the overlay). */
  guint           *line_index;
  GPtrArray       *owned;   /* strings and trails the lines point into */
} RugosaChartInput;

/* The number of points of an aging trail, new to the selected age, when
 * no trail cache is given (exports, printing). */
#define RUGOSA_CHART_TRAIL_POINTS 16

/* Aging trails sampled once a year of service and kept per line until the
 * line or the friction settings change, so a slider move asks the model
 * for one new point a line instead of a whole trail. */
typedef struct RugosaTrailCache RugosaTrailCache;
RugosaTrailCache *rugosa_trail_cache_new  (void);
void              rugosa_trail_cache_free (RugosaTrailCache *cache);

/* `cache` may be NULL.  Readouts are in the project's display units. */
RugosaChartInput *rugosa_chart_input_new  (RugosaProject    *project,
                                           int               selected,
                                           RugosaTrailCache *cache);

/* What a view shows of the project (the window's visibility): the lines
 * drawn, and the pinned ones, labelled whatever the crowd.  A NULL
 * function: every line drawn, none pinned. */
typedef struct {
  gboolean (*drawn)  (RugosaLine *line, gpointer user_data);
  gboolean (*pinned) (RugosaLine *line, gpointer user_data);
  gpointer   user_data;
} RugosaChartInputView;

/* The same for a view: lines not drawn are left out (and not evaluated);
 * every line carries its place in the project as its number. */
RugosaChartInput *rugosa_chart_input_new_view (RugosaProject              *project,
                                               int                         selected,
                                               RugosaTrailCache           *cache,
                                               const RugosaChartInputView *view);
void              rugosa_chart_input_free (RugosaChartInput *input);

/* The heading of an exported chart: `title` over the plot and under it
 * the conditions the chart is drawn for — the service age, the fluids of
 * the lines drawn (by property model, with their temperatures) and the
 * friction model — in the project's display units.  An empty or NULL
 * title clears the heading. */
void rugosa_chart_input_set_heading (RugosaChartInput *input,
                                     RugosaProject    *project,
                                     const char       *title);
/* The conditions line alone (newly allocated). */
char *rugosa_chart_input_conditions (RugosaChartInput *input,
                                     RugosaProject    *project);

/* The spec's background fields from the project settings, and the
 * service age the legend names (size, scale and theme are left as they
 * are). */
void rugosa_chart_input_fill_spec (RugosaChartSpec *spec,
                                   RugosaProject   *project);

G_DEFINE_AUTOPTR_CLEANUP_FUNC (RugosaChartInput, rugosa_chart_input_free)

G_END_DECLS
