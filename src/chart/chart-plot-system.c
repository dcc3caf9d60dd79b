/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The system-curve view: for each line option the head it needs against
 * flow, when new (dashed) and at the service age (solid), its operating
 * flows on the aged curve (small squares), its pump curve (dash-dot,
 * through the given points) and the duty points where they cross (hollow
 * when new, filled when aged, an arrow from one to the other: the flow the
 * pump loses as the pipe ages).
 *
 * The head axis is framed on what decides the pump: the pump curves and
 * the duty points, with half as much again above them (the operating
 * points, with a quarter more, when no pump is given); a steep system
 * curve of a small pipe leaves the plot at the top rather than squeezing
 * the rest to the bottom. */
#include "chart-plot-private.h"

#include <math.h>
#include <string.h>

static void
extend (const RugosaPlotPoint *pts, size_t n, double *x1, double *y0, double *y1)
{
  for (size_t i = 0; i < n; i++)
    {
      *x1 = fmax (*x1, pts[i].x);
      *y0 = fmin (*y0, pts[i].y);
      if (y1 != NULL)
        *y1 = fmax (*y1, pts[i].y);
    }
}

void
_rugosa_plot_system_extent (const RugosaPlot *plot, double *x1, double *y0, double *y1)
{
  double pump = 0.0, operating = 0.0, all = 0.0;

  *x1 = 0.0;
  *y0 = 0.0;
  for (size_t i = 0; i < plot->n_series; i++)
    {
      const RugosaPlotSeries *s = &plot->series[i].s;

      extend (s->system_new, s->n_system_new, x1, y0, &all);
      extend (s->system_aged, s->n_system_aged, x1, y0, &all);
      extend (s->pump, s->n_pump, x1, y0, &pump);
      extend (s->pump_points, s->n_pump_points, x1, y0, &pump);
      extend (s->operating, s->n_operating, x1, y0, &operating);
      if (s->has_duty)
        extend (&s->duty, 1, x1, y0, &pump);
      if (s->has_duty_new)
        extend (&s->duty_new, 1, x1, y0, &pump);
    }
  if (pump > 0.0)
    *y1 = fmin (fmax (all, pump), 1.5 * pump);
  else
    *y1 = operating > 0.0 ? fmin (all, 1.25 * operating) : all;
  if (!(*x1 > 0.0))
    *x1 = 1.0;
  if (!(*y1 > *y0))
    *y1 = *y0 + 1.0;
}

static void
dash (cairo_t *cr, double k, int style)
{
  const double dashed[] = { 6 * k, 4 * k };
  const double dash_dot[] = { 10 * k, 3 * k, 2 * k, 3 * k };

  if (style == 1)
    cairo_set_dash (cr, dashed, 2, 0);
  else if (style == 2)
    cairo_set_dash (cr, dash_dot, 4, 0);
  else
    cairo_set_dash (cr, NULL, 0, 0);
}

/* The colour a shared pump curve is drawn in: the ink, as it belongs to
 * no one option. */
static const RugosaChartRgba *
pump_colour (const RugosaPlot *plot, size_t i, const RugosaChartPalette *p)
{
  for (size_t j = i + 1; j < plot->n_series; j++)
    if (plot->series[j].shared_pump
        && plot->series[j].s.n_pump_points == plot->series[i].s.n_pump_points
        && memcmp (plot->series[j].s.pump_points, plot->series[i].s.pump_points,
                   plot->series[i].s.n_pump_points * sizeof (RugosaPlotPoint)) == 0)
      return &p->ink;
  return &plot->series[i].s.colour;
}

static void
marker (RugosaPlot *plot, cairo_t *cr, size_t i, double x, double y, double r,
        const RugosaChartRgba *fill, const RugosaChartRgba *halo, gboolean hollow)
{
  const double k = plot->text->lay.k;

  _rugosa_chart_shape_path (cr, (int) i, x, y, r + 1.8 * k);
  _rugosa_chart_set_rgba (cr, halo);
  cairo_fill (cr);
  _rugosa_chart_shape_path (cr, (int) i, x, y, hollow ? r - 0.8 * k : r);
  _rugosa_chart_set_rgba (cr, fill);
  if (hollow)
    {
      cairo_set_line_width (cr, 1.8 * k);
      cairo_stroke (cr);
    }
  else
    cairo_fill (cr);
}

static void
arrow (cairo_t *cr, double ax, double ay, double bx, double by, double k)
{
  const double len = hypot (bx - ax, by - ay);
  const double ux = (bx - ax) / len, uy = (by - ay) / len;
  const double head = 5 * k;

  if (!(len > 14 * k))
    return;
  /* from the rim of one marker to that of the other */
  ax += ux * 7 * k;
  ay += uy * 7 * k;
  bx -= ux * 8 * k;
  by -= uy * 8 * k;
  cairo_move_to (cr, ax, ay);
  cairo_line_to (cr, bx, by);
  cairo_stroke (cr);
  cairo_move_to (cr, bx + ux * 2 * k, by + uy * 2 * k);
  cairo_line_to (cr, bx - ux * head - uy * head * 0.55, by - uy * head + ux * head * 0.55);
  cairo_line_to (cr, bx - ux * head + uy * head * 0.55, by - uy * head - ux * head * 0.55);
  cairo_close_path (cr);
  cairo_fill (cr);
}

static void
draw_series (RugosaPlot *plot, cairo_t *cr, size_t i, const RugosaChartPalette *p)
{
  const PlotSeries *ps = &plot->series[i];
  const RugosaPlotSeries *s = &ps->s;
  const double k = plot->text->lay.k;
  const double weight = s->selected ? 1.4 : (int) i == plot->hover ? 1.2 : 1.0;

  cairo_save (cr);
  cairo_set_line_join (cr, CAIRO_LINE_JOIN_ROUND);
  _rugosa_chart_set_rgba (cr, &s->colour);
  if (s->n_system_new > 1)
    {
      dash (cr, k, 1);
      cairo_set_line_width (cr, 1.5 * k * weight);
      _rugosa_plot_polyline (plot, cr, s->system_new, s->n_system_new);
      cairo_stroke (cr);
    }
  if (s->n_system_aged > 1)
    {
      dash (cr, k, 0);
      cairo_set_line_width (cr, 2.2 * k * weight);
      _rugosa_plot_polyline (plot, cr, s->system_aged, s->n_system_aged);
      cairo_stroke (cr);
    }
  if (s->n_pump > 1 && !ps->shared_pump)
    {
      const RugosaChartRgba *c = pump_colour (plot, i, p);

      _rugosa_chart_set_rgba (cr, c);
      dash (cr, k, 2);
      cairo_set_line_width (cr, 2.2 * k);
      _rugosa_plot_polyline (plot, cr, s->pump, s->n_pump);
      cairo_stroke (cr);
      dash (cr, k, 0);
      for (size_t j = 0; j < s->n_pump_points; j++)
        {
          double x, y;

          _rugosa_plot_xy (plot, s->pump_points[j].x, s->pump_points[j].y, &x, &y);
          cairo_new_sub_path (cr);
          cairo_arc (cr, x, y, 2.8 * k, 0, 2 * G_PI);
        }
      cairo_fill (cr);
    }
  dash (cr, k, 0);
  /* operating flows: small squares on the aged curve */
  for (size_t j = 0; j < s->n_operating; j++)
    {
      double x, y;

      _rugosa_plot_xy (plot, s->operating[j].x, s->operating[j].y, &x, &y);
      cairo_rectangle (cr, x - 3.2 * k, y - 3.2 * k, 6.4 * k, 6.4 * k);
      _rugosa_chart_set_rgba (cr, &p->plot);
      cairo_fill_preserve (cr);
      _rugosa_chart_set_rgba (cr, &s->colour);
      cairo_set_line_width (cr, 1.5 * k);
      cairo_stroke (cr);
    }
  /* duty points and the flow lost to aging */
  {
    double nx = 0, ny = 0, ax = 0, ay = 0;

    if (s->has_duty_new)
      _rugosa_plot_xy (plot, s->duty_new.x, s->duty_new.y, &nx, &ny);
    if (s->has_duty)
      _rugosa_plot_xy (plot, s->duty.x, s->duty.y, &ax, &ay);
    if (s->has_duty_new && s->has_duty)
      {
        _rugosa_chart_set_rgba (cr, &s->colour);
        cairo_set_line_width (cr, 1.4 * k);
        arrow (cr, nx, ny, ax, ay, k);
      }
    if (s->has_duty_new)
      marker (plot, cr, i, nx, ny, 5.2 * k * weight, &s->colour, &p->plot, TRUE);
    if (s->has_duty)
      marker (plot, cr, i, ax, ay, 5.2 * k * weight, &s->colour, &p->plot, FALSE);
  }
  cairo_restore (cr);
}

/* A box of `w` × `h` in the corner of the plot that the curves cross
 * least. */
static RugosaChartRect
free_corner (const RugosaPlot *plot, double w, double h)
{
  const RugosaChartRect *pl = &plot->plot;
  const double m = 8 * plot->text->lay.k;
  RugosaChartRect best = { pl->x + m, pl->y + m, w, h };
  size_t best_hits = G_MAXSIZE;

  for (int c = 0; c < 4; c++)
    {
      RugosaChartRect r = { (c & 1) ? pl->x + pl->width - w - m : pl->x + m,
                            (c & 2) ? pl->y + pl->height - h - m : pl->y + m, w, h };
      size_t hits = 0;

      for (size_t i = 0; i < plot->n_series; i++)
        {
          const RugosaPlotSeries *s = &plot->series[i].s;
          const RugosaPlotPoint *lists[] = { s->system_new, s->system_aged, s->pump };
          const size_t counts[] = { s->n_system_new, s->n_system_aged, s->n_pump };

          for (size_t l = 0; l < G_N_ELEMENTS (lists); l++)
            for (size_t j = 0; j < counts[l]; j++)
              {
                double x, y;

                _rugosa_plot_xy (plot, lists[l][j].x, lists[l][j].y, &x, &y);
                if (x >= r.x && x <= r.x + r.width && y >= r.y && y <= r.y + r.height)
                  hits++;
              }
          if (s->has_duty || s->has_duty_new)
            {
              const RugosaPlotPoint *d = s->has_duty ? &s->duty : &s->duty_new;
              double x, y;

              _rugosa_plot_xy (plot, d->x, d->y, &x, &y);
              /* a duty point under the box is worse than a curve */
              if (x >= r.x && x <= r.x + r.width && y >= r.y && y <= r.y + r.height)
                hits += 20;
            }
        }
      if (hits < best_hits)
        {
          best_hits = hits;
          best = r;
        }
    }
  return best;
}

/* The key: each option's colour and marker, then what the line styles
 * mean. */
static void
draw_key (RugosaPlot *plot, cairo_t *cr, const RugosaChartPalette *p,
          RugosaChartRect *taken)
{
  const ChartLayout *lay = &plot->text->lay;
  const double k = lay->k, row = lay->font_label * 1.45, sample = 26 * k;
  const char *keys[] = { plot->spec.key_new, plot->spec.key_aged,
                         plot->spec.key_pump, plot->spec.key_duty };
  double w = 0, h, y;
  size_t rows = 0;
  RugosaChartRect box;
  RugosaChartRgba border = p->grid;

  for (size_t i = 0; i < plot->n_series; i++)
    {
      double tw, th;

      _rugosa_chart_text_size (_rugosa_chart_text (plot->text, plot->series[i].name,
                                                   lay->font_label * 0.95, TEXT_PLAIN, 0), &tw, &th);
      w = fmax (w, tw);
      rows++;
    }
  for (size_t j = 0; j < G_N_ELEMENTS (keys); j++)
    if (keys[j][0] != '\0')
      {
        double tw, th;

        _rugosa_chart_text_size (_rugosa_chart_text (plot->text, keys[j], lay->font_label * 0.95,
                                                     TEXT_PLAIN, 0), &tw, &th);
        w = fmax (w, tw);
        rows++;
      }
  if (rows == 0)
    return;
  w = ceil (w + sample + 22 * k);
  h = ceil ((double) rows * row + 10 * k + (plot->n_series > 0 ? 4 * k : 0));
  box = free_corner (plot, w, h);
  *taken = box;

  border.a = fmin (1, border.a * 3);
  cairo_save (cr);
  cairo_rectangle (cr, box.x, box.y, box.width, box.height);
  _rugosa_chart_set_rgba (cr, &p->plot);
  cairo_fill_preserve (cr);
  _rugosa_chart_set_rgba (cr, &border);
  cairo_set_line_width (cr, 1.0);
  cairo_stroke (cr);

  y = box.y + 5 * k;
  for (size_t i = 0; i < plot->n_series; i++)
    {
      const RugosaPlotSeries *s = &plot->series[i].s;
      PangoLayout *l = _rugosa_chart_text (plot->text, plot->series[i].name, lay->font_label * 0.95,
                                           s->selected ? TEXT_BOLD : TEXT_PLAIN, 0);
      double tw, th;

      _rugosa_chart_set_rgba (cr, &s->colour);
      cairo_set_line_width (cr, 2.2 * k);
      cairo_move_to (cr, box.x + 8 * k, y + row / 2);
      cairo_line_to (cr, box.x + 8 * k + sample, y + row / 2);
      cairo_stroke (cr);
      marker (plot, cr, i, box.x + 8 * k + sample / 2, y + row / 2, 3.6 * k, &s->colour, &p->plot, FALSE);
      _rugosa_chart_text_size (l, &tw, &th);
      _rugosa_chart_show (cr, l, box.x + 14 * k + sample, y + (row - th) / 2, &p->ink, NULL, 0);
      y += row;
    }
  if (plot->n_series > 0)
    y += 4 * k;
  for (size_t j = 0; j < G_N_ELEMENTS (keys); j++)
    {
      const double x0 = box.x + 8 * k, yc = y + row / 2;
      PangoLayout *l;
      double tw, th;

      if (keys[j][0] == '\0')
        continue;
      _rugosa_chart_set_rgba (cr, &p->muted);
      cairo_set_line_width (cr, (j == 0 ? 1.5 : 2.2) * k);
      switch (j)
        {
        case 0:
        case 1:
        case 2:
          dash (cr, k, j == 0 ? 1 : j == 1 ? 0 : 2);
          cairo_move_to (cr, x0, yc);
          cairo_line_to (cr, x0 + sample, yc);
          cairo_stroke (cr);
          dash (cr, k, 0);
          if (j == 2)
            {
              cairo_new_sub_path (cr);
              cairo_arc (cr, x0 + sample / 2, yc, 2.8 * k, 0, 2 * G_PI);
              cairo_fill (cr);
            }
          break;
        default:
          {
            RugosaChartRgba c = p->muted;

            marker (plot, cr, 0, x0 + 5 * k, yc, 3.6 * k, &c, &p->plot, TRUE);
            marker (plot, cr, 0, x0 + sample - 5 * k, yc, 3.6 * k, &c, &p->plot, FALSE);
            cairo_set_line_width (cr, 1.2 * k);
            _rugosa_chart_set_rgba (cr, &c);
            arrow (cr, x0 + 5 * k, yc, x0 + sample - 5 * k, yc, k * 0.6);
          }
          break;
        }
      l = _rugosa_chart_text (plot->text, keys[j], lay->font_label * 0.95, TEXT_PLAIN, 0);
      _rugosa_chart_text_size (l, &tw, &th);
      _rugosa_chart_show (cr, l, box.x + 14 * k + sample, y + (row - th) / 2, &p->ink, NULL, 0);
      y += row;
    }
  cairo_restore (cr);
}

static gboolean
overlaps_any (const RugosaChartRect *r, const RugosaChartRect *taken, size_t n)
{
  for (size_t i = 0; i < n; i++)
    if (_rugosa_chart_rects_overlap (r, &taken[i]))
      return TRUE;
  return FALSE;
}

/* The readouts beside the duty points: the first of a few places around
 * the marker that stays in the plot and clear of the key and the other
 * readouts; none when there is no such place. */
static void
draw_readouts (RugosaPlot *plot, cairo_t *cr, const RugosaChartPalette *p,
               const RugosaChartRect *key)
{
  const ChartLayout *lay = &plot->text->lay;
  const RugosaChartRect *pl = &plot->plot;
  const double k = lay->k;
  RugosaChartRect *taken = g_new0 (RugosaChartRect, 3 * plot->n_series + 1);
  size_t n_taken = 0;

  if (key->width > 0)
    taken[n_taken++] = *key;
  /* the duty markers stay visible */
  for (size_t i = 0; i < plot->n_series; i++)
    {
      const RugosaPlotSeries *s = &plot->series[i].s;
      const RugosaPlotPoint *pts[] = { s->has_duty ? &s->duty : NULL, s->has_duty_new ? &s->duty_new : NULL };

      for (size_t j = 0; j < G_N_ELEMENTS (pts); j++)
        if (pts[j] != NULL)
          {
            double x, y;

            _rugosa_plot_xy (plot, pts[j]->x, pts[j]->y, &x, &y);
            taken[n_taken++] = (RugosaChartRect) { x - 7 * k, y - 7 * k, 14 * k, 14 * k };
          }
    }
  for (size_t o = 0; o < plot->n_series; o++)
    {
      const size_t i = _rugosa_plot_order (plot, plot->n_series - 1 - o);
      const RugosaPlotSeries *s = &plot->series[i].s;
      const RugosaPlotPoint *at = s->has_duty ? &s->duty : s->has_duty_new ? &s->duty_new : NULL;
      PangoLayout *l;
      double x, y, w, h;
      const double dirs[][2] = { { 1, 1 }, { 1, -1 }, { -1, -1 }, { -1, 1 }, { 1, 2.6 }, { 1, -2.6 },
                                 { -1, -2.6 }, { -1, 2.6 }, { 1, 4.2 }, { 1, -4.2 } };

      if (at == NULL || s->readout == NULL || s->readout[0] == '\0')
        continue;
      _rugosa_plot_xy (plot, at->x, at->y, &x, &y);
      l = _rugosa_chart_text (plot->text, s->readout, lay->font_label * 0.92,
                              s->selected ? TEXT_BOLD : TEXT_PLAIN, 0);
      _rugosa_chart_text_size (l, &w, &h);
      for (size_t d = 0; d < G_N_ELEMENTS (dirs); d++)
        {
          /* beside the marker, one or more label heights up or down */
          RugosaChartRect r = { dirs[d][0] > 0 ? x + 9 * k : x - 9 * k - w,
                                y - h / 2 + dirs[d][1] * (0.5 * h + 3 * k), w, h };

          if (!_rugosa_chart_rect_inside (&r, pl) || overlaps_any (&r, taken, n_taken))
            continue;
          _rugosa_chart_show (cr, l, r.x, r.y, &p->ink, &p->plot, 3.0 * k);
          taken[n_taken++] = r;
          break;
        }
    }
  g_free (taken);
}

void
_rugosa_plot_system_draw (RugosaPlot *plot, cairo_t *cr, const RugosaChartPalette *p)
{
  const RugosaChartRect *pl = &plot->plot;
  RugosaChartRect key = { 0, 0, 0, 0 };

  cairo_save (cr);
  cairo_rectangle (cr, pl->x, pl->y, pl->width, pl->height);
  cairo_clip (cr);
  for (size_t o = 0; o < plot->n_series; o++)
    draw_series (plot, cr, _rugosa_plot_order (plot, o), p);
  draw_key (plot, cr, p, &key);
  draw_readouts (plot, cr, p, &key);
  cairo_restore (cr);
}
