/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Internals shared by the plot views' files (chart-plot*.c). */
#pragma once

#include "chart-private.h"
#include "rugosa-chart-plot.h"

typedef struct {
  RugosaPlotSeries s;              /* strings and arrays point into this copy */
  char *name, *readout, *note;
  RugosaPlotPoint *system_new, *system_aged, *operating, *pump, *pump_points, *cost;
  int shared_pump;                 /* its pump curve is that of an earlier series */
} PlotSeries;

struct RugosaPlot {
  RugosaPlotSpec spec;
  RugosaChart *text;               /* lettering, sizes and the footer of the
                                    * friction chart at this size */
  PlotSeries *series;
  size_t n_series;
  int hover;

  /* layout, valid after plot_layout () */
  int layout_valid;
  RugosaChartRect plot;
  double x0, x1, y0, y1;           /* axis ranges */
  double x_step, y_step;           /* tick spacing */
  double notes_h;                  /* height of the warnings above the plot */
  double gutter;                   /* room right of the plot for end labels */
};

/* chart-plot.c */
void _rugosa_plot_layout (RugosaPlot *plot);
void _rugosa_plot_xy (const RugosaPlot *plot, double x, double y,
                      double *dx, double *dy);
/* "12 500", "0.25": a tick value, spaced in thousands from 10 000 */
char *_rugosa_plot_tick_text (double value, double step);
/* A polyline in data coordinates, clipped by the caller. */
void _rugosa_plot_polyline (const RugosaPlot *plot, cairo_t *cr,
                            const RugosaPlotPoint *pts, size_t n);
/* The order series are drawn in: the others, then the hovered, then the
 * selected one (on top). */
size_t _rugosa_plot_order (const RugosaPlot *plot, size_t k);

/* chart-plot-system.c, chart-plot-cost.c: the data ranges and the series
 * of each view. */
void _rugosa_plot_system_extent (const RugosaPlot *plot, double *x1,
                                 double *y0, double *y1);
void _rugosa_plot_system_draw (RugosaPlot *plot, cairo_t *cr,
                               const RugosaChartPalette *p);
void _rugosa_plot_cost_extent (const RugosaPlot *plot, double *x1, double *y1);
double _rugosa_plot_cost_gutter (RugosaPlot *plot);
void _rugosa_plot_cost_draw (RugosaPlot *plot, cairo_t *cr,
                             const RugosaChartPalette *p);
