/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The overlay: the user's line options as markers with labels (placed by
 * chart-labels.c) or numbers, their flow ranges and aging trails, the
 * legend, and the caution footer.  Markers never move: they are data. */
#include "chart-private.h"

#include <glib/gi18n-lib.h>
#include <math.h>
#include <stdio.h>
#include <string.h>

#include "core/friction.h"

enum { SHAPES = 5 };

static int
point_device (const RugosaChart *chart, double re, double f, double *x, double *y)
{
  if (!(re > 0 && f > 0 && isfinite (re) && isfinite (f)))
    return 0;
  _rugosa_chart_xy (&chart->lay, re, f, x, y);
  return 1;
}

static double
marker_radius (const RugosaChart *chart, size_t i)
{
  return _rugosa_chart_marker_radius (chart, i, (int) i == chart->hover);
}

static int
prominent (const RugosaChart *chart, size_t i)
{
  const RugosaChartLine *l = &chart->lines[i].line;
  return chart->n_lines <= CHART_CROWD || l->selected || l->pinned || (int) i == chart->hover;
}

/* --- drawing --- */

static void
shape_path (cairo_t *cr, int shape, double x, double y, double r)
{
  switch (shape % SHAPES)
    {
    case 0:
      cairo_new_sub_path (cr);
      cairo_arc (cr, x, y, r, 0, 2 * G_PI);
      break;
    case 1:
      cairo_rectangle (cr, x - r * 0.88, y - r * 0.88, r * 1.76, r * 1.76);
      break;
    case 2:
      cairo_move_to (cr, x, y - r * 1.2);
      cairo_line_to (cr, x + r * 1.2, y);
      cairo_line_to (cr, x, y + r * 1.2);
      cairo_line_to (cr, x - r * 1.2, y);
      cairo_close_path (cr);
      break;
    case 3:
      cairo_move_to (cr, x, y - r * 1.25);
      cairo_line_to (cr, x + r * 1.15, y + r * 0.8);
      cairo_line_to (cr, x - r * 1.15, y + r * 0.8);
      cairo_close_path (cr);
      break;
    default:
      cairo_move_to (cr, x, y + r * 1.25);
      cairo_line_to (cr, x + r * 1.15, y - r * 0.8);
      cairo_line_to (cr, x - r * 1.15, y - r * 0.8);
      cairo_close_path (cr);
      break;
    }
}

void
_rugosa_chart_shape_path (cairo_t *cr, int shape, double x, double y, double r)
{
  shape_path (cr, shape, x, y, r);
}

static void
draw_marker (cairo_t *cr, int shape, double x, double y, double r,
             const RugosaChartRgba *fill, const RugosaChartRgba *halo,
             double k, int hollow)
{
  if (halo != NULL)
    {
      shape_path (cr, shape, x, y, r + 1.8 * k);
      _rugosa_chart_set_rgba (cr, halo);
      cairo_fill (cr);
    }
  shape_path (cr, shape, x, y, hollow ? r - 0.8 * k : r);
  if (hollow)
    {
      _rugosa_chart_set_rgba (cr, fill);
      cairo_set_line_width (cr, 1.8 * k);
      cairo_stroke (cr);
    }
  else
    {
      _rugosa_chart_set_rgba (cr, fill);
      cairo_fill (cr);
    }
}

static double
flow_f (const RugosaChartSpec *spec, double re, double rr, int *regime)
{
  double f = 0.02;
  *regime = (int) rg_regime_classify (&spec->transition, re);
  if (*regime == RG_REGIME_LAMINAR)
    return 64.0 / re;
  if (rg_friction_colebrook (fmax (re, RG_FRICTION_RE_MIN), rr, &f, NULL) != RG_OK)
    return 64.0 / re;
  return f;
}

static void
draw_line_paths (RugosaChart *chart, cairo_t *cr, size_t i,
                 const RugosaChartPalette *p)
{
  const RugosaChartSpec *spec = &chart->spec;
  const RugosaChartLine *l = &chart->lines[i].line;
  const double k = chart->lay.k;
  RugosaChartRgba band = l->colour;
  double x, y;

  /* Flow range: along the line's own Colebrook curve (at its present
   * roughness); the transitional part is left open, since no single curve
   * holds there. */
  if (l->has_flow_min || l->has_flow_max)
    {
      const double re0 = l->has_flow_min ? l->flow_min.re : l->re;
      const double re1 = l->has_flow_max ? l->flow_max.re : l->re;
      if (re0 > 0 && re1 > re0)
        {
          enum { N = 10 };
          int prev_regime = -1;
          /* an opaque tint of the line's colour over the plot colour: a
           * translucent stroke costs Cairo a separate mask per line */
          band.r = 0.42 * l->colour.r + 0.58 * p->plot.r;
          band.g = 0.42 * l->colour.g + 0.58 * p->plot.g;
          band.b = 0.42 * l->colour.b + 0.58 * p->plot.b;
          band.a = 1;
          cairo_save (cr);
          cairo_set_line_cap (cr, CAIRO_LINE_CAP_ROUND);
          cairo_set_line_width (cr, (l->selected ? 7.0 : prominent (chart, i) ? 5.0 : 2.0) * k);
          for (int s = 0; s < N; s++)
            {
              const double re = re0 * pow (re1 / re0, (double) s / (N - 1));
              int regime;
              const double f = flow_f (spec, re, l->rr_aged, &regime);
              _rugosa_chart_xy (&chart->lay, re, f, &x, &y);
              if (regime == RG_REGIME_TRANSITIONAL)
                {
                  prev_regime = regime;
                  continue;
                }
              if (regime != prev_regime)
                cairo_move_to (cr, x, y);
              else
                cairo_line_to (cr, x, y);
              prev_regime = regime;
            }
          _rugosa_chart_set_rgba (cr, &band);
          cairo_stroke (cr);
          cairo_restore (cr);
        }
      /* the given end points as small dots, one fill for both */
      const RugosaChartPoint *ends[2] = { l->has_flow_min ? &l->flow_min : NULL,
                                          l->has_flow_max ? &l->flow_max : NULL };
      for (int e = 0; e < 2; e++)
        if (ends[e] != NULL && point_device (chart, ends[e]->re, ends[e]->f, &x, &y))
          {
            cairo_new_sub_path (cr);
            cairo_arc (cr, x, y, 2.4 * k, 0, 2 * G_PI);
          }
      _rugosa_chart_set_rgba (cr, &l->colour);
      cairo_fill (cr);
    }

  /* Aging trail: new (hollow ring) to the selected age; in a crowd only
   * for the lines that stand out. */
  if (l->n_trail >= 2 && prominent (chart, i))
    {
      cairo_save (cr);
      cairo_set_line_width (cr, 1.6 * k);
      const double dash[] = { 3.5 * k, 2.5 * k };
      cairo_set_dash (cr, dash, 2, 0);
      int started = 0;
      for (size_t t = 0; t < l->n_trail; t++)
        {
          if (!point_device (chart, l->trail[t].re, l->trail[t].f, &x, &y))
            continue;
          if (!started)
            cairo_move_to (cr, x, y);
          else
            cairo_line_to (cr, x, y);
          started = 1;
        }
      _rugosa_chart_set_rgba (cr, &l->colour);
      cairo_stroke (cr);
      cairo_restore (cr);
      if (point_device (chart, l->trail[0].re, l->trail[0].f, &x, &y))
        {
          cairo_new_sub_path (cr);
          cairo_arc (cr, x, y, 3.0 * k, 0, 2 * G_PI);
          _rugosa_chart_set_rgba (cr, &l->colour);
          cairo_set_line_width (cr, 1.5 * k);
          cairo_stroke (cr);
        }
    }
}

static void
draw_line_marker (RugosaChart *chart, cairo_t *cr, size_t i,
                  const RugosaChartPalette *p)
{
  const RugosaChartLine *l = &chart->lines[i].line;
  const ChartLabel *lb = &chart->labels[i];
  const double k = chart->lay.k;
  const double r = marker_radius (chart, i);
  if (lb->info.marker.width == 0)
    return;

  if (l->selected)
    {
      /* a ring in the ink colour: selection reads without colour */
      cairo_new_sub_path (cr);
      if (l->regime == RG_REGIME_TRANSITIONAL)
        {
          const RugosaChartRect *m = &lb->info.marker;
          cairo_rectangle (cr, m->x - 2 * k, m->y - 2 * k, m->width + 4 * k, m->height + 4 * k);
        }
      else
        cairo_arc (cr, lb->ax, lb->ay, r + 5 * k, 0, 2 * G_PI);
      _rugosa_chart_set_rgba (cr, &p->ink);
      cairo_set_line_width (cr, 2.0 * k);
      cairo_stroke (cr);
    }

  if (l->regime == RG_REGIME_TRANSITIONAL)
    {
      double x, y1, y2;
      _rugosa_chart_xy (&chart->lay, l->re, l->f_laminar, &x, &y1);
      _rugosa_chart_xy (&chart->lay, l->re, l->f_turbulent, &x, &y2);
      cairo_save (cr);
      cairo_set_line_cap (cr, CAIRO_LINE_CAP_BUTT);
      cairo_move_to (cr, x, y1);
      cairo_line_to (cr, x, y2);
      _rugosa_chart_set_rgba (cr, &p->plot);
      cairo_set_line_width (cr, 7 * k);
      cairo_stroke_preserve (cr);
      _rugosa_chart_set_rgba (cr, &l->colour);
      cairo_set_line_width (cr, 3 * k);
      cairo_stroke (cr);
      cairo_restore (cr);
      /* both ends hollow: a range, not a value */
      draw_marker (cr, (int) i, x, y1, r * 0.8, &l->colour, &p->plot, k, 1);
      draw_marker (cr, (int) i, x, y2, r * 0.8, &l->colour, &p->plot, k, 1);
    }
  else
    draw_marker (cr, (int) i, lb->ax, lb->ay, r, &l->colour, &p->plot, k, 0);
}

static void
draw_label (RugosaChart *chart, cairo_t *cr, size_t i, const RugosaChartPalette *p)
{
  const RugosaChartLine *l = &chart->lines[i].line;
  const ChartLabel *lb = &chart->labels[i];
  const double k = chart->lay.k;
  const RugosaChartRect *b = &lb->info.box;
  double tw, th;
  if (!lb->info.visible)
    return;
  PangoLayout *layout = _rugosa_chart_label_layout (chart, i, lb->info.compact, &tw, &th);

  if (lb->info.has_leader)
    {
      const double nx = fmin (fmax (lb->ax, b->x), b->x + b->width);
      const double ny = fmin (fmax (lb->ay, b->y), b->y + b->height);
      const double dx = nx - lb->ax, dy = ny - lb->ay, d = hypot (dx, dy);
      const double r0 = marker_radius (chart, i) + 2.5 * k;
      if (d > r0)
        {
          cairo_move_to (cr, lb->ax + dx / d * r0, lb->ay + dy / d * r0);
          cairo_line_to (cr, nx, ny);
          _rugosa_chart_set_rgba (cr, &l->colour);
          cairo_set_line_width (cr, 1.2 * k);
          cairo_stroke (cr);
        }
    }

  /* Square corners on whole pixels (placement rounds the boxes): Cairo
   * fills pixel-aligned rectangles without scan conversion, so the border
   * is the box in the line's colour with the plot colour inset. */
  const double bw = round (fmax (1.0, 1.2 * k)) + (l->selected ? 1 : 0);
  _rugosa_chart_set_rgba (cr, &l->colour);
  cairo_rectangle (cr, b->x, b->y, b->width, b->height);
  cairo_fill (cr);
  RugosaChartRgba bg = p->plot;
  _rugosa_chart_set_rgba (cr, &bg);
  cairo_rectangle (cr, b->x + bw, b->y + bw, b->width - 2 * bw, b->height - 2 * bw);
  cairo_fill (cr);

  draw_marker (cr, (int) i, b->x + 5 * k + 4.5 * k, b->y + 3.5 * k + chart->lay.font_label * 0.62,
               3.6 * k, &l->colour, NULL, k, 0);
  _rugosa_chart_show (cr, layout, b->x + 5 * k + 13 * k, b->y + 3.5 * k, &p->ink, NULL, 0);
}

/* The number of an unlabelled marker, keyed to the list: ink on a patch
 * of the plot colour, the patch edged in the line's colour. */
static void
draw_tag (RugosaChart *chart, cairo_t *cr, size_t i, const RugosaChartPalette *p)
{
  const ChartLabel *lb = &chart->labels[i];
  const RugosaChartRect *b = &lb->info.tag;
  double w, h;
  if (!lb->info.numbered)
    return;
  PangoLayout *layout = _rugosa_chart_tag_layout (chart, i, &w, &h);
  _rugosa_chart_set_rgba (cr, &p->plot);
  cairo_rectangle (cr, b->x, b->y + 0.15 * b->height, b->width, 0.75 * b->height);
  cairo_fill (cr);
  double tw, th;
  _rugosa_chart_text_size (layout, &tw, &th);
  _rugosa_chart_show (cr, layout, b->x + (b->width - tw) / 2, b->y, &p->ink, NULL, 0);
}

/* Drawing order: 0 the crowd, 1 pinned or hovered, 2 the selected line. */
static int
layer (const RugosaChart *chart, size_t i)
{
  const RugosaChartLine *l = &chart->lines[i].line;
  return l->selected ? 2 : (l->pinned || (int) i == chart->hover) ? 1 : 0;
}

void
_rugosa_chart_draw_overlay (RugosaChart *chart, cairo_t *cr, int cached)
{
  const ChartLayout *lay = &chart->lay;
  RugosaChartPalette p;
  if (chart->n_lines == 0)
    return;
  _rugosa_chart_ensure_placement (chart);
  rugosa_chart_palette (chart->spec.theme, &p);

  cairo_save (cr);
  cairo_rectangle (cr, lay->plot.x, lay->plot.y, lay->plot.width, lay->plot.height);
  cairo_clip (cr);
  /* Coarser edge sampling for the geometry (not the text): wide strokes
   * and small circles cost several times less, and look the same. */
  cairo_set_antialias (cr, CAIRO_ANTIALIAS_FAST);
  /* the others under the lines that stand out, those under the hovered
   * and the selected line */
  for (int pass = 0; pass < 3; pass++)
    for (size_t i = 0; i < chart->n_lines; i++)
      if (layer (chart, i) == pass)
        draw_line_paths (chart, cr, i, &p);
  for (int pass = 0; pass < 3; pass++)
    for (size_t i = 0; i < chart->n_lines; i++)
      if (layer (chart, i) == pass)
        draw_line_marker (chart, cr, i, &p);
  for (size_t i = 0; i < chart->n_lines; i++)
    draw_tag (chart, cr, i, &p);
  for (int pass = 0; pass < 3; pass++)
    for (size_t i = 0; i < chart->n_lines; i++)
      if (layer (chart, i) == pass)
        draw_label (chart, cr, i, &p);
  cairo_restore (cr);
  /* outside the plot's clip: a wide chart's legend stands beside it; no
   * label or number ever overlaps it */
  _rugosa_chart_draw_legend (chart, cr, &p, cached);
}

void
_rugosa_chart_draw_footer (RugosaChart *chart, cairo_t *cr)
{
  const ChartLayout *lay = &chart->lay;
  RugosaChartPalette p;
  char text[512];
  if (chart->spec.footer_date[0] == '\0')
    return;
  rugosa_chart_palette (chart->spec.theme, &p);
  snprintf (text, sizeof text, "%s  ·  %s", _(RUGOSA_CHART_CAUTION),
            chart->spec.footer_date);
  const double k = lay->k;
  PangoLayout *l = _rugosa_chart_text (chart, text, lay->font_footer, TEXT_PLAIN,
                                       lay->width - 32 * k);
  _rugosa_chart_show (cr, l, 16 * k, lay->height - lay->footer_h + 5 * k,
                      &p.muted, NULL, 0);
}

void
_rugosa_chart_draw_heading (RugosaChart *chart, cairo_t *cr)
{
  const ChartLayout *lay = &chart->lay;
  const double k = lay->k;
  RugosaChartPalette p;
  double w, h;
  if (chart->spec.title[0] == '\0')
    return;
  rugosa_chart_palette (chart->spec.theme, &p);
  PangoLayout *t = _rugosa_chart_text (chart, chart->spec.title, lay->font_title * 1.3,
                                       TEXT_BOLD, 0);
  pango_layout_set_width (t, (int) ((lay->width - 32 * k) * PANGO_SCALE));
  pango_layout_set_ellipsize (t, PANGO_ELLIPSIZE_END);
  _rugosa_chart_text_size (t, &w, &h);
  _rugosa_chart_show (cr, t, 16 * k, 8 * k, &p.ink, NULL, 0);
  if (chart->spec.conditions[0] != '\0')
    {
      PangoLayout *c = _rugosa_chart_text (chart, chart->spec.conditions, lay->font_footer * 1.1,
                                           TEXT_PLAIN, lay->width - 32 * k);
      _rugosa_chart_show (cr, c, 16 * k, 8 * k + h + 1 * k, &p.muted, NULL, 0);
    }
}
