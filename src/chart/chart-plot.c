/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The plot views (rugosa-chart-plot.h): the object, the frame they share
 * and its export.
 *
 * Frame: linear axes whose ranges take the data and end on a tick; the
 * ticks are spaced 1, 2, 2.5 or 5 times a power of ten, about seven to an
 * axis (a common rule for readable scales).  Lettering, line weights and
 * the caution footer come from a friction chart of the same size
 * (chart-text.c, chart-geometry.c), and the colours from its palette, so
 * the three views of the chart area read as one. */
#include "chart-plot-private.h"

#include <glib/gi18n-lib.h>
#include <math.h>
#include <stdio.h>
#include <string.h>

static const char *const VIEW_IDS[RUGOSA_CHART_N_VIEWS] = {
  [RUGOSA_CHART_VIEW_FRICTION] = "friction",
  [RUGOSA_CHART_VIEW_SYSTEM] = "system",
  [RUGOSA_CHART_VIEW_COST] = "cost",
};

static const char *const VIEW_TITLES[RUGOSA_CHART_N_VIEWS] = {
  [RUGOSA_CHART_VIEW_FRICTION] = N_("Friction chart"),
  [RUGOSA_CHART_VIEW_SYSTEM] = N_("System curves"),
  [RUGOSA_CHART_VIEW_COST] = N_("Life-cycle cost"),
};

const char *
rugosa_chart_view_id (RugosaChartView view)
{
  return (int) view >= 0 && view < RUGOSA_CHART_N_VIEWS ? VIEW_IDS[view] : "";
}

gboolean
rugosa_chart_view_from_id (const char *id, RugosaChartView *view)
{
  for (int i = 0; i < RUGOSA_CHART_N_VIEWS; i++)
    if (g_strcmp0 (id, VIEW_IDS[i]) == 0)
      {
        *view = (RugosaChartView) i;
        return TRUE;
      }
  return FALSE;
}

const char *
rugosa_chart_view_title (RugosaChartView view)
{
  return (int) view >= 0 && view < RUGOSA_CHART_N_VIEWS ? _(VIEW_TITLES[view]) : "";
}

/* ---- object ------------------------------------------------------------ */

void
rugosa_plot_spec_init (RugosaPlotSpec *spec)
{
  memset (spec, 0, sizeof *spec);
  spec->view = RUGOSA_CHART_VIEW_SYSTEM;
  spec->width = 960;
  spec->height = 600;
  spec->scale = 1;
  spec->theme = RUGOSA_CHART_THEME_LIGHT;
}

RgStatus
rugosa_plot_spec_check (const RugosaPlotSpec *spec, RgError *err)
{
  if (spec->view != RUGOSA_CHART_VIEW_SYSTEM && spec->view != RUGOSA_CHART_VIEW_COST)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "A plot view is the system curves or the life-cycle cost.");
  /* the friction chart's limits (rugosa_chart_spec_check) */
  if (!(spec->width >= 200 && spec->width <= 20000 && spec->height >= 150
        && spec->height <= 20000))
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The chart size must lie between 200 × 150 and 20000 × 20000 pixels.");
  if (!(spec->scale >= 1 && spec->scale <= 4))
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The chart scale factor must lie between 1 and 4.");
  return RG_OK;
}

RugosaPlot *
rugosa_plot_new (void)
{
  RugosaPlot *plot = g_new0 (RugosaPlot, 1);

  rugosa_plot_spec_init (&plot->spec);
  plot->text = rugosa_chart_new ();
  plot->hover = -1;
  return plot;
}

static void
free_series (RugosaPlot *plot)
{
  for (size_t i = 0; i < plot->n_series; i++)
    {
      PlotSeries *ps = &plot->series[i];

      g_free (ps->name);
      g_free (ps->readout);
      g_free (ps->note);
      g_free (ps->system_new);
      g_free (ps->system_aged);
      g_free (ps->operating);
      g_free (ps->pump);
      g_free (ps->pump_points);
      g_free (ps->cost);
    }
  g_clear_pointer (&plot->series, g_free);
  plot->n_series = 0;
}

void
rugosa_plot_free (RugosaPlot *plot)
{
  if (plot == NULL)
    return;
  free_series (plot);
  rugosa_chart_free (plot->text);
  g_free (plot);
}

RgStatus
rugosa_plot_set_spec (RugosaPlot *plot, const RugosaPlotSpec *spec, RgError *err)
{
  RugosaChartSpec text;
  RgStatus st;

  if ((st = rugosa_plot_spec_check (spec, err)) != RG_OK)
    return st;
  plot->spec = *spec;
  plot->spec.footer_date[RUGOSA_CHART_DATE_MAX - 1] = '\0';
  /* the friction chart of this size lends its lettering and footer */
  text = *rugosa_chart_get_spec (plot->text);
  text.width = spec->width;
  text.height = spec->height;
  text.scale = spec->scale;
  text.theme = spec->theme;
  g_strlcpy (text.footer_date, plot->spec.footer_date, sizeof text.footer_date);
  (void) rugosa_chart_set_spec (plot->text, &text, NULL);
  plot->layout_valid = 0;
  return RG_OK;
}

const RugosaPlotSpec *
rugosa_plot_get_spec (const RugosaPlot *plot)
{
  return &plot->spec;
}

static RugosaPlotPoint *
copy_points (const RugosaPlotPoint *pts, size_t n)
{
  return n > 0 && pts != NULL ? g_memdup2 (pts, n * sizeof *pts) : NULL;
}

static gboolean
same_points (const PlotSeries *a, const PlotSeries *b)
{
  return a->s.n_pump_points > 0 && a->s.n_pump_points == b->s.n_pump_points
         && memcmp (a->pump_points, b->pump_points,
                    a->s.n_pump_points * sizeof *a->pump_points) == 0;
}

void
rugosa_plot_set_series (RugosaPlot *plot, const RugosaPlotSeries *series,
                        size_t n_series)
{
  free_series (plot);
  plot->series = g_new0 (PlotSeries, MAX (n_series, 1));
  plot->n_series = n_series;
  for (size_t i = 0; i < n_series; i++)
    {
      PlotSeries *ps = &plot->series[i];
      const RugosaPlotSeries *s = &series[i];

      ps->s = *s;
      ps->s.name = ps->name = g_strdup (s->name ? s->name : "");
      ps->s.readout = ps->readout = g_strdup (s->readout);
      ps->s.note = ps->note = g_strdup (s->note);
      ps->s.system_new = ps->system_new = copy_points (s->system_new, s->n_system_new);
      ps->s.system_aged = ps->system_aged = copy_points (s->system_aged, s->n_system_aged);
      ps->s.operating = ps->operating = copy_points (s->operating, s->n_operating);
      ps->s.pump = ps->pump = copy_points (s->pump, s->n_pump);
      ps->s.pump_points = ps->pump_points = copy_points (s->pump_points, s->n_pump_points);
      ps->s.cost = ps->cost = copy_points (s->cost, s->n_cost);
      if (ps->s.system_new == NULL)
        ps->s.n_system_new = 0;
      if (ps->s.system_aged == NULL)
        ps->s.n_system_aged = 0;
      if (ps->s.operating == NULL)
        ps->s.n_operating = 0;
      if (ps->s.pump == NULL)
        ps->s.n_pump = 0;
      if (ps->s.pump_points == NULL)
        ps->s.n_pump_points = 0;
      if (ps->s.cost == NULL)
        ps->s.n_cost = 0;
      /* one pump serving several options is drawn once */
      for (size_t j = 0; j < i && !ps->shared_pump; j++)
        ps->shared_pump = same_points (&plot->series[j], ps);
    }
  if (plot->hover >= (int) n_series)
    plot->hover = -1;
  plot->layout_valid = 0;
}

void
rugosa_plot_set_hover (RugosaPlot *plot, int index)
{
  plot->hover = index >= 0 && index < (int) plot->n_series ? index : -1;
}

size_t
_rugosa_plot_order (const RugosaPlot *plot, size_t k)
{
  /* the others in their order, then the hovered one, then the selected
   * one, so that those two lie on top */
  size_t seen = 0;

  for (int pass = 0; pass < 3; pass++)
    for (size_t i = 0; i < plot->n_series; i++)
      {
        const gboolean sel = plot->series[i].s.selected != 0;
        const int which = sel ? 2 : (int) i == plot->hover ? 1 : 0;

        if (which != pass)
          continue;
        if (seen == k)
          return i;
        seen++;
      }
  return k;
}

/* ---- frame -------------------------------------------------------------- */

/* The tick spacing for about `target` ticks over `span`: 1, 2, 2.5 or 5
 * times a power of ten. */
static double
nice_step (double span, double target)
{
  static const double m[] = { 1.0, 2.0, 2.5, 5.0, 10.0 };
  const double raw = span / target;
  const double mag = pow (10.0, floor (log10 (raw)));

  for (size_t i = 0; i < G_N_ELEMENTS (m); i++)
    if (m[i] * mag >= raw * (1.0 - 1e-9))
      return m[i] * mag;
  return 10.0 * mag;
}

static void
nice_range (double lo, double hi, double target, double *a, double *b, double *step)
{
  if (!(hi > lo))
    {
      const double pad = fabs (hi) > 0 ? fabs (hi) * 0.5 : 1.0;

      lo -= lo == 0.0 ? 0.0 : pad;
      hi += pad;
    }
  *step = nice_step (hi - lo, target);
  *a = floor (lo / *step + 1e-9) * *step;
  *b = ceil (hi / *step - 1e-9) * *step;
}

char *
_rugosa_plot_tick_text (double value, double step)
{
  int decimals = 0;
  char buf[64];
  GString *out;
  const char *digits, *dot;

  while (decimals < 6)
    {
      const double scaled = step * pow (10.0, decimals);

      if (fabs (scaled - round (scaled)) <= 1e-6 * scaled)
        break;
      decimals++;
    }
  if (fabs (value) < step * 1e-9)
    value = 0.0;
  snprintf (buf, sizeof buf, "%.*f", decimals, value);
  if (fabs (value) < 10000.0)
    return g_strdup (buf);
  /* thousands spaced by a narrow no-break space: "125 000" */
  out = g_string_new (NULL);
  digits = buf[0] == '-' ? buf + 1 : buf;
  if (digits != buf)
    g_string_append (out, "−");
  dot = digits;
  while (*dot >= '0' && *dot <= '9')
    dot++;
  for (const char *c = digits; c < dot; c++)
    {
      if (c > digits && (dot - c) % 3 == 0)
        g_string_append (out, "\u202f");
      g_string_append_c (out, *c);
    }
  g_string_append (out, dot);
  return g_string_free (out, FALSE);
}

static size_t
note_count (const RugosaPlot *plot)
{
  size_t n = 0;

  for (size_t i = 0; i < plot->n_series; i++)
    n += plot->series[i].s.note != NULL && plot->series[i].s.note[0] != '\0';
  return MIN (n, RUGOSA_PLOT_NOTE_MAX);
}

void
_rugosa_plot_layout (RugosaPlot *plot)
{
  const ChartLayout *lay = &plot->text->lay;
  const double k = lay->k;
  double x1 = 1.0, y0 = 0.0, y1 = 1.0, tick_w = 0.0;
  double top, left, right, bottom;

  if (plot->spec.view == RUGOSA_CHART_VIEW_COST)
    _rugosa_plot_cost_extent (plot, &x1, &y1);
  else
    _rugosa_plot_system_extent (plot, &x1, &y0, &y1);
  nice_range (0.0, x1, 7.0, &plot->x0, &plot->x1, &plot->x_step);
  nice_range (y0, y1 * 1.04, 6.0, &plot->y0, &plot->y1, &plot->y_step);

  for (double v = plot->y0; v <= plot->y1 + 0.5 * plot->y_step; v += plot->y_step)
    {
      g_autofree char *t = _rugosa_plot_tick_text (v, plot->y_step);
      double w, h;

      _rugosa_chart_text_size (_rugosa_chart_text (plot->text, t, lay->font_tick, TEXT_PLAIN, 0), &w, &h);
      tick_w = fmax (tick_w, w);
    }

  plot->notes_h = note_count (plot) > 0 ? (double) note_count (plot) * lay->font_tick * 1.45 + 6 * k : 0.0;
  plot->gutter = plot->spec.view == RUGOSA_CHART_VIEW_COST ? _rugosa_plot_cost_gutter (plot) : 0.0;
  top = 10 * k + lay->font_title * 1.5 + lay->font_tick * 1.5 + plot->notes_h;
  left = 14 * k + lay->font_title * 1.5 + tick_w + 10 * k;
  right = 20 * k + plot->gutter;
  bottom = 10 * k + lay->font_tick * 1.9 + lay->font_title * 1.7 + lay->footer_h;
  plot->plot.x = round (left);
  plot->plot.y = round (top);
  plot->plot.width = fmax (40.0, round (lay->width - left - right));
  plot->plot.height = fmax (40.0, round (lay->height - top - bottom));
  plot->layout_valid = 1;
}

void
_rugosa_plot_xy (const RugosaPlot *plot, double x, double y, double *dx, double *dy)
{
  *dx = plot->plot.x + (x - plot->x0) / (plot->x1 - plot->x0) * plot->plot.width;
  *dy = plot->plot.y + plot->plot.height - (y - plot->y0) / (plot->y1 - plot->y0) * plot->plot.height;
}

void
_rugosa_plot_polyline (const RugosaPlot *plot, cairo_t *cr,
                       const RugosaPlotPoint *pts, size_t n)
{
  for (size_t i = 0; i < n; i++)
    {
      double x, y;

      _rugosa_plot_xy (plot, pts[i].x, pts[i].y, &x, &y);
      if (i == 0)
        cairo_move_to (cr, x, y);
      else
        cairo_line_to (cr, x, y);
    }
}

static void
ensure_layout (RugosaPlot *plot)
{
  if (!plot->layout_valid)
    _rugosa_plot_layout (plot);
}

RugosaChartRect
rugosa_plot_area (RugosaPlot *plot)
{
  ensure_layout (plot);
  return plot->plot;
}

void
rugosa_plot_to_device (RugosaPlot *plot, double x, double y, double *dx, double *dy)
{
  ensure_layout (plot);
  _rugosa_plot_xy (plot, x, y, dx, dy);
}

void
rugosa_plot_from_device (RugosaPlot *plot, double dx, double dy, double *x, double *y)
{
  ensure_layout (plot);
  *x = plot->x0 + (dx - plot->plot.x) / plot->plot.width * (plot->x1 - plot->x0);
  *y = plot->y0 + (plot->plot.y + plot->plot.height - dy) / plot->plot.height * (plot->y1 - plot->y0);
}

void
rugosa_plot_ranges (RugosaPlot *plot, double *x0, double *x1, double *y0, double *y1)
{
  ensure_layout (plot);
  *x0 = plot->x0;
  *x1 = plot->x1;
  *y0 = plot->y0;
  *y1 = plot->y1;
}

static void
draw_grid_and_axes (RugosaPlot *plot, cairo_t *cr, const RugosaChartPalette *p)
{
  const ChartLayout *lay = &plot->text->lay;
  const RugosaChartRect *pl = &plot->plot;
  const double k = lay->k;
  RugosaChartRgba frame = p->ink, major = p->grid;
  double w, h;

  frame.a = 0.7;
  major.a *= 1.4;
  cairo_save (cr);
  cairo_set_line_width (cr, 1.0);
  _rugosa_chart_set_rgba (cr, &major);
  for (double v = plot->x0; v <= plot->x1 + 0.5 * plot->x_step; v += plot->x_step)
    {
      double x, y;

      _rugosa_plot_xy (plot, v, plot->y0, &x, &y);
      cairo_move_to (cr, floor (x) + 0.5, pl->y);
      cairo_line_to (cr, floor (x) + 0.5, pl->y + pl->height);
    }
  for (double v = plot->y0; v <= plot->y1 + 0.5 * plot->y_step; v += plot->y_step)
    {
      double x, y;

      _rugosa_plot_xy (plot, plot->x0, v, &x, &y);
      cairo_move_to (cr, pl->x, floor (y) + 0.5);
      cairo_line_to (cr, pl->x + pl->width, floor (y) + 0.5);
    }
  cairo_stroke (cr);
  /* the zero of a head axis that goes below it */
  if (plot->y0 < 0.0 && plot->y1 > 0.0)
    {
      double x, y;

      _rugosa_plot_xy (plot, plot->x0, 0.0, &x, &y);
      _rugosa_chart_set_rgba (cr, &frame);
      cairo_move_to (cr, pl->x, floor (y) + 0.5);
      cairo_line_to (cr, pl->x + pl->width, floor (y) + 0.5);
      cairo_stroke (cr);
    }
  _rugosa_chart_set_rgba (cr, &frame);
  cairo_rectangle (cr, pl->x + 0.5, pl->y + 0.5, pl->width - 1, pl->height - 1);
  cairo_stroke (cr);
  cairo_restore (cr);

  /* tick labels */
  for (double v = plot->x0; v <= plot->x1 + 0.5 * plot->x_step; v += plot->x_step)
    {
      g_autofree char *t = _rugosa_plot_tick_text (v, plot->x_step);
      PangoLayout *l = _rugosa_chart_text (plot->text, t, lay->font_tick, TEXT_PLAIN, 0);
      double x, y;

      _rugosa_plot_xy (plot, v, plot->y0, &x, &y);
      _rugosa_chart_text_size (l, &w, &h);
      _rugosa_chart_show (cr, l, x - w / 2, pl->y + pl->height + 5 * k, &p->ink, NULL, 0);
    }
  for (double v = plot->y0; v <= plot->y1 + 0.5 * plot->y_step; v += plot->y_step)
    {
      g_autofree char *t = _rugosa_plot_tick_text (v, plot->y_step);
      PangoLayout *l = _rugosa_chart_text (plot->text, t, lay->font_tick, TEXT_PLAIN, 0);
      double x, y;

      _rugosa_plot_xy (plot, plot->x0, v, &x, &y);
      _rugosa_chart_text_size (l, &w, &h);
      _rugosa_chart_show (cr, l, pl->x - 7 * k - w, y - h / 2, &p->ink, NULL, 0);
    }

  /* axis titles and the caption */
  {
    PangoLayout *tx = _rugosa_chart_text (plot->text, plot->spec.x_title, lay->font_title, TEXT_PLAIN, 0);
    PangoLayout *ty = _rugosa_chart_text (plot->text, plot->spec.y_title, lay->font_title, TEXT_PLAIN, 0);
    PangoLayout *cap = _rugosa_chart_text (plot->text, plot->spec.caption, lay->font_tick, TEXT_PLAIN,
                                           lay->width - pl->x - 20 * k);

    _rugosa_chart_text_size (tx, &w, &h);
    _rugosa_chart_show (cr, tx, pl->x + (pl->width - w) / 2,
                        pl->y + pl->height + 7 * k + lay->font_tick * 1.35, &p->ink, NULL, 0);
    _rugosa_chart_text_size (ty, &w, &h);
    _rugosa_chart_show_turned (cr, ty, 8 * k + h / 2, pl->y + pl->height / 2, -G_PI / 2, &p->ink, NULL, 0);
    _rugosa_chart_text_size (cap, &w, &h);
    /* one line of it: a long caption is cut rather than laid over the plot */
    cairo_save (cr);
    cairo_rectangle (cr, 0, 0, lay->width, pl->y - plot->notes_h - 2 * k);
    cairo_clip (cr);
    _rugosa_chart_show (cr, cap, pl->x, 6 * k, &p->muted, NULL, 0);
    cairo_restore (cr);
  }

  /* warnings, above the plot */
  {
    double y = pl->y - plot->notes_h + 2 * k;
    size_t shown = 0;

    for (size_t i = 0; i < plot->n_series && shown < RUGOSA_PLOT_NOTE_MAX; i++)
      {
        const PlotSeries *ps = &plot->series[i];
        g_autofree char *text = NULL;
        PangoLayout *l;

        if (ps->s.note == NULL || ps->s.note[0] == '\0')
          continue;
        /* TRANSLATORS: a warning above the chart: the line option's name
         * and the warning's sentence */
        text = g_strdup_printf (_("⚠ %s: %s"), ps->name, ps->s.note);
        l = _rugosa_chart_text (plot->text, text, lay->font_tick, TEXT_PLAIN, 0);
        cairo_save (cr);
        cairo_rectangle (cr, pl->x, y, lay->width - pl->x - 10 * k, lay->font_tick * 1.45);
        cairo_clip (cr);
        _rugosa_chart_show (cr, l, pl->x, y, &p->ink, NULL, 0);
        cairo_restore (cr);
        y += lay->font_tick * 1.45;
        shown++;
      }
  }
}

void
rugosa_plot_draw (RugosaPlot *plot, cairo_t *cr)
{
  RugosaChartPalette p;
  const RugosaChartRect *pl;

  ensure_layout (plot);
  pl = &plot->plot;
  rugosa_chart_palette (plot->spec.theme, &p);
  cairo_save (cr);
  _rugosa_chart_set_rgba (cr, &p.page);
  cairo_paint (cr);
  cairo_rectangle (cr, pl->x, pl->y, pl->width, pl->height);
  _rugosa_chart_set_rgba (cr, &p.plot);
  cairo_fill (cr);
  draw_grid_and_axes (plot, cr, &p);
  if (plot->spec.view == RUGOSA_CHART_VIEW_COST)
    _rugosa_plot_cost_draw (plot, cr, &p);
  else
    _rugosa_plot_system_draw (plot, cr, &p);
  _rugosa_chart_draw_footer (plot->text, cr);
  cairo_restore (cr);
}

/* ---- hit testing -------------------------------------------------------- */

static double
segment_distance (double px, double py, double ax, double ay, double bx, double by)
{
  const double dx = bx - ax, dy = by - ay;
  const double len2 = dx * dx + dy * dy;
  double t = len2 > 0 ? ((px - ax) * dx + (py - ay) * dy) / len2 : 0.0;

  t = fmin (1.0, fmax (0.0, t));
  return hypot (px - (ax + t * dx), py - (ay + t * dy));
}

static double
polyline_distance (const RugosaPlot *plot, const RugosaPlotPoint *pts, size_t n,
                   double x, double y)
{
  double best = G_MAXDOUBLE, ax = 0, ay = 0;

  for (size_t i = 0; i < n; i++)
    {
      double bx, by;

      _rugosa_plot_xy (plot, pts[i].x, pts[i].y, &bx, &by);
      if (i > 0)
        best = fmin (best, segment_distance (x, y, ax, ay, bx, by));
      ax = bx;
      ay = by;
    }
  return best;
}

int
rugosa_plot_hit_test (RugosaPlot *plot, double x, double y, double radius)
{
  int best = -1;
  double best_d = radius;

  ensure_layout (plot);
  if (x < plot->plot.x - radius || x > plot->plot.x + plot->plot.width + radius
      || y < plot->plot.y - radius || y > plot->plot.y + plot->plot.height + radius)
    return -1;
  for (size_t i = 0; i < plot->n_series; i++)
    {
      const RugosaPlotSeries *s = &plot->series[i].s;
      double d;

      if (plot->spec.view == RUGOSA_CHART_VIEW_COST)
        d = polyline_distance (plot, s->cost, s->n_cost, x, y);
      else
        {
          d = polyline_distance (plot, s->system_aged, s->n_system_aged, x, y);
          if (s->has_duty)
            {
              double dx, dy;

              _rugosa_plot_xy (plot, s->duty.x, s->duty.y, &dx, &dy);
              d = fmin (d, hypot (x - dx, y - dy));
            }
        }
      if (d <= best_d)
        {
          best_d = d;
          best = (int) i;
        }
    }
  return best;
}

/* ---- export ------------------------------------------------------------- */

static void
export_draw (cairo_t *cr, gpointer data)
{
  rugosa_plot_draw (data, cr);
}

gboolean
rugosa_plot_export (const RugosaPlotSpec *spec, const RugosaPlotSeries *series,
                    size_t n_series, RugosaChartFormat format, double width,
                    double height, const char *date, const char *path,
                    GError **error)
{
  RugosaPlotSpec s = *spec;
  RugosaPlot *plot;
  RgError err = { 0 };
  gboolean ok;

  s.width = width;
  s.height = height;
  s.scale = 1;
  g_strlcpy (s.footer_date, date ? date : "", sizeof s.footer_date);
  if (s.footer_date[0] == '\0')
    {
      g_set_error (error, RUGOSA_CHART_ERROR, RUGOSA_CHART_ERROR_INVALID,
                   _("An exported chart needs a date for its footer."));
      return FALSE;
    }
  if (rugosa_plot_spec_check (&s, &err) != RG_OK)
    {
      g_set_error_literal (error, RUGOSA_CHART_ERROR, RUGOSA_CHART_ERROR_INVALID, err.text);
      return FALSE;
    }
  plot = rugosa_plot_new ();
  (void) rugosa_plot_set_spec (plot, &s, NULL);
  rugosa_plot_set_series (plot, series, n_series);
  ok = _rugosa_chart_export_surface (format, width, height, s.footer_date,
                                     rugosa_chart_view_title (s.view), path,
                                     export_draw, plot, error);
  rugosa_plot_free (plot);
  return ok;
}
