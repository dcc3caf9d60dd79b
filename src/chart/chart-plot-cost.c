/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The cost view: each line option's cumulative cost against years of
 * service — its capital at year 0, then its energy cost year by year —
 * with each curve's name and end value in a column right of the plot, and
 * the crossings where an option that is dearer to build becomes the
 * cheaper one over its life (it pays back) marked with their year.
 *
 * Crossings: between the points given (the ends of the years) a curve is
 * taken as straight, so a crossing lies where the difference of two
 * curves changes sign, found on that straight piece.  Only the first
 * such change from dearer to cheaper counts for a pair. */
#include "chart-plot-private.h"

#include <math.h>
#include <stdio.h>
#include <string.h>

void
_rugosa_plot_cost_extent (const RugosaPlot *plot, double *x1, double *y1)
{
  *x1 = 0.0;
  *y1 = 0.0;
  for (size_t i = 0; i < plot->n_series; i++)
    for (size_t j = 0; j < plot->series[i].s.n_cost; j++)
      {
        *x1 = fmax (*x1, plot->series[i].s.cost[j].x);
        *y1 = fmax (*y1, plot->series[i].s.cost[j].y);
      }
  if (!(*x1 > 0.0))
    *x1 = 1.0;
  if (!(*y1 > 0.0))
    *y1 = 1.0;
}

static char *
end_label_text (const PlotSeries *ps)
{
  if (ps->s.readout != NULL && ps->s.readout[0] != '\0')
    return g_strdup_printf ("%s\n%s", ps->name, ps->s.readout);
  return g_strdup (ps->name);
}

/* The widest end label, with its leader, at most a third of the width. */
double
_rugosa_plot_cost_gutter (RugosaPlot *plot)
{
  const ChartLayout *lay = &plot->text->lay;
  double w = 0.0;

  for (size_t i = 0; i < plot->n_series; i++)
    {
      g_autofree char *text = NULL;
      double tw, th;

      if (plot->series[i].s.n_cost == 0)
        continue;
      text = end_label_text (&plot->series[i]);
      _rugosa_chart_text_size (_rugosa_chart_text (plot->text, text, lay->font_label * 0.92,
                                                   TEXT_FIRST_BOLD, 0), &tw, &th);
      w = fmax (w, tw);
    }
  if (w == 0.0)
    return 0.0;
  return fmin (ceil (w + 16 * lay->k), lay->width / 3.0);
}

/* The cost of series s at x (straight between its points); FALSE outside
 * its years. */
static gboolean
cost_at (const RugosaPlotSeries *s, double x, double *y)
{
  if (s->n_cost == 0 || x < s->cost[0].x || x > s->cost[s->n_cost - 1].x)
    return FALSE;
  for (size_t j = 1; j < s->n_cost; j++)
    if (x <= s->cost[j].x)
      {
        const double dx = s->cost[j].x - s->cost[j - 1].x;
        const double t = dx > 0 ? (x - s->cost[j - 1].x) / dx : 1.0;

        *y = s->cost[j - 1].y + t * (s->cost[j].y - s->cost[j - 1].y);
        return TRUE;
      }
  *y = s->cost[0].y;
  return TRUE;
}

size_t
rugosa_plot_crossings (RugosaPlot *plot, RugosaPlotCrossing *out, size_t max)
{
  size_t n = 0;

  for (size_t a = 0; a < plot->n_series; a++)
    for (size_t b = 0; b < plot->n_series; b++)
      {
        const RugosaPlotSeries *sa = &plot->series[a].s, *sb = &plot->series[b].s;
        double prev_x = 0.0, prev_d = 0.0;
        gboolean have_prev = FALSE;

        /* a is dearer to build than b */
        if (a == b || sa->n_cost < 2 || sb->n_cost < 2 || !(sa->cost[0].y > sb->cost[0].y))
          continue;
        for (size_t j = 0; j < sa->n_cost; j++)
          {
            double yb, d;

            if (!cost_at (sb, sa->cost[j].x, &yb))
              continue;
            d = sa->cost[j].y - yb;
            if (have_prev && prev_d > 0.0 && d <= 0.0)
              {
                const double t = prev_d / (prev_d - d);
                const double x = prev_x + t * (sa->cost[j].x - prev_x);
                double y = 0.0;

                (void) cost_at (sa, x, &y);
                if (n < max)
                  {
                    out[n].dearer = a;
                    out[n].cheaper = b;
                    out[n].years = x;
                    out[n].cost = y;
                  }
                n++;
                break;
              }
            prev_x = sa->cost[j].x;
            prev_d = d;
            have_prev = TRUE;
          }
      }
  return n;
}

static void
draw_curves (RugosaPlot *plot, cairo_t *cr, const RugosaChartPalette *p)
{
  const double k = plot->text->lay.k;

  for (size_t o = 0; o < plot->n_series; o++)
    {
      const size_t i = _rugosa_plot_order (plot, o);
      const RugosaPlotSeries *s = &plot->series[i].s;
      const double weight = s->selected ? 1.4 : (int) i == plot->hover ? 1.2 : 1.0;
      double x, y;

      if (s->n_cost == 0)
        continue;
      cairo_save (cr);
      cairo_set_line_join (cr, CAIRO_LINE_JOIN_ROUND);
      _rugosa_chart_set_rgba (cr, &s->colour);
      cairo_set_line_width (cr, 2.2 * k * weight);
      _rugosa_plot_polyline (plot, cr, s->cost, s->n_cost);
      cairo_stroke (cr);
      /* the capital, spent at year 0 */
      _rugosa_plot_xy (plot, s->cost[0].x, s->cost[0].y, &x, &y);
      _rugosa_chart_shape_path (cr, (int) i, x, y, 4.6 * k * weight + 1.8 * k);
      _rugosa_chart_set_rgba (cr, &p->plot);
      cairo_fill (cr);
      _rugosa_chart_shape_path (cr, (int) i, x, y, 4.6 * k * weight);
      _rugosa_chart_set_rgba (cr, &s->colour);
      cairo_fill (cr);
      cairo_restore (cr);
    }
}

/* The caller's format with its one "%s" replaced by `value` (a format
 * string that is not a literal is not given to printf). */
static char *
fill_format (const char *format, const char *value)
{
  const char *at = strstr (format, "%s");

  if (at == NULL)
    return g_strdup (format);
  return g_strdup_printf ("%.*s%s%s", (int) (at - format), format, value, at + 2);
}

static void
draw_crossings (RugosaPlot *plot, cairo_t *cr, const RugosaChartPalette *p)
{
  const ChartLayout *lay = &plot->text->lay;
  const RugosaChartRect *pl = &plot->plot;
  const double k = lay->k;
  RugosaPlotCrossing found[64];
  RugosaChartRect taken[64];
  size_t n_taken = 0, n;
  int selected = -1;
  const double dots[] = { 2 * k, 3 * k };

  if (strstr (plot->spec.payback_format, "%s") == NULL)
    return;
  for (size_t i = 0; i < plot->n_series; i++)
    if (plot->series[i].s.selected)
      selected = (int) i;
  n = MIN (rugosa_plot_crossings (plot, found, G_N_ELEMENTS (found)), G_N_ELEMENTS (found));
  for (size_t c = 0; c < n; c++)
    {
      const RugosaPlotCrossing *x = &found[c];
      char years[32];
      g_autofree char *text = NULL;
      PangoLayout *l;
      double dx, dy, bx, by, w, h;

      /* with a selection, its own crossings; else all of them */
      if (selected >= 0 && (int) x->dearer != selected && (int) x->cheaper != selected)
        continue;
      _rugosa_plot_xy (plot, x->years, x->cost, &dx, &dy);
      _rugosa_plot_xy (plot, x->years, plot->y0, &bx, &by);
      cairo_save (cr);
      cairo_set_dash (cr, dots, 2, 0);
      cairo_set_line_width (cr, 1.0 * k);
      _rugosa_chart_set_rgba (cr, &p->muted);
      cairo_move_to (cr, dx, dy + 5 * k);
      cairo_line_to (cr, bx, by);
      cairo_stroke (cr);
      cairo_restore (cr);
      cairo_new_sub_path (cr);
      cairo_arc (cr, dx, dy, 4.5 * k, 0, 2 * G_PI);
      _rugosa_chart_set_rgba (cr, &p->plot);
      cairo_fill_preserve (cr);
      cairo_set_line_width (cr, 2.0 * k);
      _rugosa_chart_set_rgba (cr, &plot->series[x->dearer].s.colour);
      cairo_stroke (cr);

      snprintf (years, sizeof years, "%.1f", x->years);
      text = fill_format (plot->spec.payback_format, years);
      l = _rugosa_chart_text (plot->text, text, lay->font_label * 0.9, TEXT_PLAIN, 0);
      _rugosa_chart_text_size (l, &w, &h);
      {
        const double offs[][2] = { { 7 * k, -h - 6 * k }, { -w - 7 * k, -h - 6 * k },
                                   { 7 * k, 6 * k }, { -w - 7 * k, 6 * k } };

        for (size_t o = 0; o < G_N_ELEMENTS (offs); o++)
          {
            RugosaChartRect r = { dx + offs[o][0], dy + offs[o][1], w, h };
            gboolean clear = _rugosa_chart_rect_inside (&r, pl);

            for (size_t t = 0; t < n_taken && clear; t++)
              clear = !_rugosa_chart_rects_overlap (&r, &taken[t]);
            if (!clear)
              continue;
            _rugosa_chart_show (cr, l, r.x, r.y, &p->ink, &p->plot, 3.0 * k);
            if (n_taken < G_N_ELEMENTS (taken))
              taken[n_taken++] = r;
            break;
          }
      }
    }
}

/* The names and end values right of the plot, each at its curve's end,
 * moved apart where they would overlap, with a leader when moved. */
typedef struct {
  size_t i;
  double anchor, y, h;
  PangoLayout *l;
} EndLabel;

static void
draw_end_labels (RugosaPlot *plot, cairo_t *cr, const RugosaChartPalette *p)
{
  const ChartLayout *lay = &plot->text->lay;
  const RugosaChartRect *pl = &plot->plot;
  const double k = lay->k, gap = 3 * k;
  size_t n = 0;
  EndLabel *labels;

  if (plot->gutter <= 0.0)
    return;
  labels = g_new0 (EndLabel, MAX (plot->n_series, 1));
  for (size_t i = 0; i < plot->n_series; i++)
    {
      const RugosaPlotSeries *s = &plot->series[i].s;
      g_autofree char *text = NULL;
      double x, y, w, h;

      if (s->n_cost == 0)
        continue;
      text = end_label_text (&plot->series[i]);
      _rugosa_plot_xy (plot, s->cost[s->n_cost - 1].x, s->cost[s->n_cost - 1].y, &x, &y);
      labels[n].i = i;
      labels[n].anchor = y;
      labels[n].l = _rugosa_chart_text (plot->text, text, lay->font_label * 0.92, TEXT_FIRST_BOLD,
                                        plot->gutter - 14 * k);
      _rugosa_chart_text_size (labels[n].l, &w, &h);
      labels[n].h = h;
      labels[n].y = y - h / 2;
      n++;
    }
  /* in order down the page, then pushed apart, then back inside */
  for (size_t a = 1; a < n; a++)
    for (size_t b = a; b > 0 && labels[b].anchor < labels[b - 1].anchor; b--)
      {
        EndLabel t = labels[b];

        labels[b] = labels[b - 1];
        labels[b - 1] = t;
      }
  for (size_t a = 1; a < n; a++)
    labels[a].y = fmax (labels[a].y, labels[a - 1].y + labels[a - 1].h + gap);
  if (n > 0 && labels[n - 1].y + labels[n - 1].h > pl->y + pl->height)
    {
      labels[n - 1].y = pl->y + pl->height - labels[n - 1].h;
      for (size_t a = n - 1; a > 0; a--)
        labels[a - 1].y = fmin (labels[a - 1].y, labels[a].y - labels[a - 1].h - gap);
    }
  for (size_t a = 0; a < n; a++)
    {
      const RugosaPlotSeries *s = &plot->series[labels[a].i].s;
      const double x0 = pl->x + pl->width, lx = x0 + 12 * k;
      const double ly = labels[a].y + labels[a].h / 2;

      cairo_save (cr);
      _rugosa_chart_set_rgba (cr, &s->colour);
      cairo_set_line_width (cr, 1.2 * k);
      cairo_move_to (cr, x0 + 1 * k, labels[a].anchor);
      cairo_line_to (cr, lx - 3 * k, ly);
      cairo_stroke (cr);
      cairo_rectangle (cr, lx - 3 * k, labels[a].y + 2 * k, 2.5 * k, labels[a].h - 4 * k);
      cairo_fill (cr);
      cairo_restore (cr);
      _rugosa_chart_show (cr, labels[a].l, lx + 2 * k, labels[a].y, &p->ink, NULL, 0);
    }
  g_free (labels);
}

void
_rugosa_plot_cost_draw (RugosaPlot *plot, cairo_t *cr, const RugosaChartPalette *p)
{
  const RugosaChartRect *pl = &plot->plot;

  cairo_save (cr);
  cairo_rectangle (cr, pl->x, pl->y, pl->width, pl->height);
  cairo_clip (cr);
  draw_curves (plot, cr, p);
  draw_crossings (plot, cr, p);
  cairo_restore (cr);
  draw_end_labels (plot, cr, p);
}
