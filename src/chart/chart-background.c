/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The chart's background: the page and the plot, then its layers in order
 * (bands, grid, Colebrook curves, the laminar line, the curves' and bands'
 * names), then the axes.  The boxes its text occupies are kept for the
 * overlay's labels to avoid. */
#include "chart-private.h"

#include <string.h>

void
_rugosa_chart_draw_background (RugosaChart *chart, cairo_t *cr)
{
  const RugosaChartSpec *spec = &chart->spec;
  const ChartLayout *lay = &chart->lay;
  const RugosaChartRect *pl = &lay->plot;
  RugosaChartPalette p;
  ChartTaken taken = { .n = 0 };

  rugosa_chart_palette (spec->theme, &p);
  if (!chart->geom_valid)
    _rugosa_chart_build_curves (chart);

  cairo_save (cr);
  _rugosa_chart_set_rgba (cr, &p.page);
  cairo_paint (cr);

  cairo_save (cr);
  cairo_rectangle (cr, pl->x, pl->y, pl->width, pl->height);
  cairo_clip (cr);
  _rugosa_chart_set_rgba (cr, &p.plot);
  cairo_paint (cr);
  if (spec->show & RUGOSA_CHART_SHOW_BANDS)
    _rugosa_chart_draw_bands (chart, cr, &p);
  if (spec->show & RUGOSA_CHART_SHOW_GRID)
    _rugosa_chart_draw_grid (chart, cr, &p);
  if (spec->show & RUGOSA_CHART_SHOW_CURVES)
    _rugosa_chart_draw_curves (chart, cr, &p);
  if (spec->show & RUGOSA_CHART_SHOW_LAMINAR)
    _rugosa_chart_draw_laminar (chart, cr, &p, &taken);
  if ((spec->show & RUGOSA_CHART_SHOW_CURVES)
      && (spec->show & RUGOSA_CHART_SHOW_CURVE_LABELS))
    _rugosa_chart_draw_curve_labels (chart, cr, &p, &taken);
  if ((spec->show & RUGOSA_CHART_SHOW_BANDS)
      && (spec->show & RUGOSA_CHART_SHOW_BAND_LABELS))
    _rugosa_chart_draw_band_labels (chart, cr, &p, &taken);
  cairo_restore (cr);

  _rugosa_chart_draw_axes (chart, cr, &p);
  cairo_restore (cr);

  chart->n_bg_boxes = MIN (taken.n, G_N_ELEMENTS (chart->bg_boxes));
  memcpy (chart->bg_boxes, taken.boxes, chart->n_bg_boxes * sizeof taken.boxes[0]);
  chart->bg_boxes_valid = 1;
  if (chart->placement_valid && !chart->placement_saw_bg_boxes)
    chart->placement_valid = 0;
}

