/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The chart area's other views, drawn by the chart engine with the
 * friction chart's palette, lettering, footer and export:
 *
 *   system  the head each line option needs against flow, new (dashed)
 *           and at the service age (solid), with its operating flows
 *           marked, the pump curves through their points and the duty
 *           points where they cross (hollow when new, filled when aged);
 *   cost    the cumulative cost of each option against years of service:
 *           its capital at year 0, then its energy cost year by year
 *           (present values), so that where a dearer option pays back
 *           shows as a crossing, marked with its year.
 *
 * Plain C input on linear axes, already in display units: the caller
 * (rugosa-plot-input.c for a project) converts and labels; the engine
 * computes no hydraulics.  No GTK. */
#pragma once

#include <cairo.h>
#include <glib.h>
#include <stddef.h>

#include "rugosa-chart.h"

typedef enum {
  RUGOSA_CHART_VIEW_FRICTION = 0,
  RUGOSA_CHART_VIEW_SYSTEM,
  RUGOSA_CHART_VIEW_COST,
  RUGOSA_CHART_N_VIEWS
} RugosaChartView;

/* "friction", "system", "cost" (rugosa-cli render --view, tests). */
const char *rugosa_chart_view_id (RugosaChartView view);
/* FALSE when `id` names no view. */
gboolean rugosa_chart_view_from_id (const char *id, RugosaChartView *view);
/* The view's name for people ("System curves"), translated. */
const char *rugosa_chart_view_title (RugosaChartView view);

typedef struct { double x, y; } RugosaPlotPoint;

enum {
  RUGOSA_PLOT_TEXT_MAX = 320,
  RUGOSA_PLOT_NOTE_MAX = 6
};

/* What the plot shows around its series.  Texts are already translated
 * and in display units. */
typedef struct {
  RugosaChartView view;          /* SYSTEM or COST */
  double width, height;          /* device (logical) pixels, ≥ 200 × 150 */
  double scale;                  /* device scale factor, 1..4 */
  RugosaChartTheme theme;
  char x_title[RUGOSA_PLOT_TEXT_MAX];
  char y_title[RUGOSA_PLOT_TEXT_MAX];
  char caption[RUGOSA_PLOT_TEXT_MAX];     /* what the view shows */
  /* the system view's key: the new and aged curves, the pump, the duty
   * points (empty: that entry is left out) */
  char key_new[RUGOSA_PLOT_TEXT_MAX];
  char key_aged[RUGOSA_PLOT_TEXT_MAX];
  char key_pump[RUGOSA_PLOT_TEXT_MAX];
  char key_duty[RUGOSA_PLOT_TEXT_MAX];
  /* the cost view's crossings: a format with one %s for the years */
  char payback_format[RUGOSA_PLOT_TEXT_MAX];
  /* Non-empty: a footer with the caution and this date (exports). */
  char footer_date[RUGOSA_CHART_DATE_MAX];
} RugosaPlotSpec;

/* One line option.  Strings and arrays are copied by
 * rugosa_plot_set_series; NULL or 0 leaves a part out. */
typedef struct {
  const char *name;
  RugosaChartRgba colour;
  int selected;
  /* system view: x flow, y head */
  const RugosaPlotPoint *system_new;
  size_t n_system_new;
  const RugosaPlotPoint *system_aged;
  size_t n_system_aged;
  const RugosaPlotPoint *operating;     /* the design, lowest, highest flow
                                         * on the aged curve */
  size_t n_operating;
  const RugosaPlotPoint *pump;          /* the fitted curve, sampled */
  size_t n_pump;
  const RugosaPlotPoint *pump_points;   /* the points given */
  size_t n_pump_points;
  int has_duty_new, has_duty;
  RugosaPlotPoint duty_new, duty;
  /* cost view: x years, y cumulative cost */
  const RugosaPlotPoint *cost;
  size_t n_cost;
  /* shown beside the curve's end (cost) or the duty point (system) */
  const char *readout;
  /* a warning shown above the plot (curves that do not cross) */
  const char *note;
} RugosaPlotSeries;

typedef struct RugosaPlot RugosaPlot;

RugosaPlot *rugosa_plot_new (void);
void rugosa_plot_free (RugosaPlot *plot);

/* Defaults: the system view, 960 × 600, scale 1, light, no texts. */
void rugosa_plot_spec_init (RugosaPlotSpec *spec);
RgStatus rugosa_plot_spec_check (const RugosaPlotSpec *spec, RgError *err);
RgStatus rugosa_plot_set_spec (RugosaPlot *plot, const RugosaPlotSpec *spec,
                               RgError *err);
const RugosaPlotSpec *rugosa_plot_get_spec (const RugosaPlot *plot);
void rugosa_plot_set_series (RugosaPlot *plot, const RugosaPlotSeries *series,
                             size_t n_series);
/* Index of the hovered series (drawn on top, thicker), or -1. */
void rugosa_plot_set_hover (RugosaPlot *plot, int index);

/* Draw the whole picture; `cr` in device coordinates. */
void rugosa_plot_draw (RugosaPlot *plot, cairo_t *cr);

/* Where things are (after a draw or a call to this function). */
RugosaChartRect rugosa_plot_area (RugosaPlot *plot);
/* Data coordinates (x, y) to device and back. */
void rugosa_plot_to_device (RugosaPlot *plot, double x, double y,
                            double *dx, double *dy);
void rugosa_plot_from_device (RugosaPlot *plot, double dx, double dy,
                              double *x, double *y);
/* The axes' ranges chosen for the data. */
void rugosa_plot_ranges (RugosaPlot *plot, double *x0, double *x1,
                         double *y0, double *y1);
/* The series whose curve or duty marker passes within `radius` device
 * pixels of (x, y), the nearest; -1 when none. */
int rugosa_plot_hit_test (RugosaPlot *plot, double x, double y, double radius);

/* The crossings of the cost view: where the series `dearer`, dearer to
 * build, becomes cheaper over its life than `cheaper`, at `years`.  Fills
 * up to `max` and returns how many there are (drawn: those of the
 * selected series, or all when none is selected). */
typedef struct {
  size_t dearer, cheaper;
  double years, cost;
} RugosaPlotCrossing;
size_t rugosa_plot_crossings (RugosaPlot *plot, RugosaPlotCrossing *out,
                              size_t max);

/* Export: the same drawing at width × height logical pixels (PNG at
 * scale 1), with the caution footer carrying `date`. */
gboolean rugosa_plot_export (const RugosaPlotSpec *spec,
                             const RugosaPlotSeries *series, size_t n_series,
                             RugosaChartFormat format, double width,
                             double height, const char *date,
                             const char *path, GError **error);
