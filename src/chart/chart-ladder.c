/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The ladder: the sizes a sizing tried, drawn faintly under the user's
 * line options while the sizing is open.
 *
 * Each rung is one size's design point (Re, f) on its own roughness curve
 * (the ε/D of that bore): a short faint stretch of that Colebrook curve
 * through the point, and the point itself, filled when the size keeps
 * within every limit and hollow when it does not.  A thin dotted line
 * joins the rungs in size order, so the eye follows the ladder as the bore
 * grows: Re falls (Re ∝ Q/D for a given flow), so the ladder runs to the
 * left, and ε/D falls, so each rung sits on a smoother curve than the one
 * before; whether f rises or falls from rung to rung shows which of the
 * two wins, and where the ladder crosses into the transitional or laminar
 * band the regime change is seen.  The points are in the chart's ink, so
 * they read on every band.  The recommended size gets a ring in the
 * sizing's colour and its designation; sizes chosen in the sizing's list
 * get their designation too, and the two ends theirs in small muted text.
 * Nothing else is labelled: a ladder of 60 sizes with labels would bury
 * the chart.
 *
 * The ladder is data of its own (rugosa_chart_set_ladder): it never
 * touches the cached background, and it is drawn on the screen only (the
 * exports and the print build their own chart without one).  The line
 * options' labels treat its points as places to keep clear of where they
 * can (chart-overlay.c), as they do the background's labels.
 *
 * Cost per frame: for n rungs, n short curves of RUNG_SAMPLES Colebrook
 * solutions each (a fixed-step solver, well under a microsecond each), so
 * a few hundred solutions for a large catalog. */
#include "chart-private.h"

#include <math.h>
#include <string.h>

#include "core/friction.h"

/* The stretch of a rung's curve: a quarter of a decade of Re each side
 * of its point, in this many samples. */
enum { RUNG_SAMPLES = 9 };
static const double RUNG_HALF_DECADES = 0.25;

void
_rugosa_chart_free_ladder (RugosaChart *chart)
{
  for (size_t i = 0; i < chart->n_ladder; i++)
    g_free (chart->ladder_labels[i]);
  g_clear_pointer (&chart->ladder_labels, g_free);
  g_clear_pointer (&chart->ladder, g_free);
  chart->n_ladder = 0;
}

void
rugosa_chart_set_ladder (RugosaChart *chart, const RugosaChartRung *rungs,
                         size_t n_rungs, RugosaChartRgba colour)
{
  _rugosa_chart_free_ladder (chart);
  /* the lines' labels keep clear of the ladder where they can */
  chart->placement_valid = 0;
  if (n_rungs == 0)
    return;
  chart->ladder = g_new (RugosaChartRung, n_rungs);
  chart->ladder_labels = g_new0 (char *, n_rungs);
  chart->n_ladder = n_rungs;
  chart->ladder_colour = colour;
  for (size_t i = 0; i < n_rungs; i++)
    {
      chart->ladder[i] = rungs[i];
      chart->ladder_labels[i] = g_strdup (rungs[i].label != NULL ? rungs[i].label : "");
      chart->ladder[i].label = chart->ladder_labels[i];
    }
}

size_t
_rugosa_chart_ladder_boxes (RugosaChart *chart, RugosaChartRect *out)
{
  const double r = 5.0 * chart->lay.k;
  size_t n = 0;

  for (size_t i = 0; i < chart->n_ladder; i++)
    {
      double x, y;

      if (!rugosa_chart_ladder_position (chart, i, &x, &y))
        continue;
      out[n].x = x - r;
      out[n].y = y - r;
      out[n].width = 2 * r;
      out[n].height = 2 * r;
      n++;
    }
  return n;
}

size_t
rugosa_chart_ladder_count (const RugosaChart *chart)
{
  return chart->n_ladder;
}

static int
rung_usable (const RugosaChartRung *r)
{
  return r->re > 0 && r->f > 0 && isfinite (r->re) && isfinite (r->f);
}

int
rugosa_chart_ladder_position (RugosaChart *chart, size_t index, double *x,
                              double *y)
{
  const RugosaChartRect *pl = &chart->lay.plot;

  if (index >= chart->n_ladder || !rung_usable (&chart->ladder[index]))
    return 0;
  _rugosa_chart_xy (&chart->lay, chart->ladder[index].re, chart->ladder[index].f, x, y);
  return *x >= pl->x && *x <= pl->x + pl->width && *y >= pl->y
         && *y <= pl->y + pl->height;
}

int
rugosa_chart_ladder_hit_test (RugosaChart *chart, double x, double y,
                              double radius)
{
  int best = -1;
  double best_d = radius;

  for (size_t i = 0; i < chart->n_ladder; i++)
    {
      double px, py, d;

      if (!rugosa_chart_ladder_position (chart, i, &px, &py))
        continue;
      d = hypot (x - px, y - py);
      if (d <= best_d)
        {
          best_d = d;
          best = (int) i;
        }
    }
  return best;
}

/* The friction factor on a rung's curve at `re`, or 0 where the curve
 * does not hold (laminar or transitional: no roughness curve there). */
static double
curve_f (const RugosaChartSpec *spec, double re, double rr)
{
  double f = 0.0;

  if (rg_regime_classify (&spec->transition, re) != RG_REGIME_TURBULENT)
    return 0.0;
  if (rg_friction_colebrook (re, rr, &f, NULL) != RG_OK)
    return 0.0;
  return f;
}

static void
rung_curve (RugosaChart *chart, cairo_t *cr, const RugosaChartRung *r)
{
  int started = 0;

  if (!(r->rr >= 0.0 && r->rr <= 0.1))
    return;
  for (int s = 0; s < RUNG_SAMPLES; s++)
    {
      const double t = -RUNG_HALF_DECADES + 2.0 * RUNG_HALF_DECADES * s / (RUNG_SAMPLES - 1);
      const double re = r->re * pow (10.0, t);
      const double f = curve_f (&chart->spec, re, r->rr);
      double x, y;

      if (f <= 0.0)
        {
          started = 0;
          continue;
        }
      _rugosa_chart_xy (&chart->lay, re, f, &x, &y);
      if (started)
        cairo_line_to (cr, x, y);
      else
        cairo_move_to (cr, x, y);
      started = 1;
    }
}

void
_rugosa_chart_draw_ladder (RugosaChart *chart, cairo_t *cr)
{
  const ChartLayout *lay = &chart->lay;
  const double k = lay->k;
  RugosaChartPalette p;
  RugosaChartRgba faint = chart->ladder_colour, join;
  int started = 0;

  if (chart->n_ladder == 0)
    return;
  rugosa_chart_palette (chart->spec.theme, &p);
  /* Faint, in the chart's own ink so that it reads on every band; the
   * sizing's colour (its line's) marks the recommended and chosen ones. */
  faint = p.ink;
  faint.a = 0.30;
  join = p.ink;
  join.a = 0.35;

  cairo_save (cr);
  cairo_rectangle (cr, lay->plot.x, lay->plot.y, lay->plot.width, lay->plot.height);
  cairo_clip (cr);
  cairo_set_line_cap (cr, CAIRO_LINE_CAP_ROUND);

  /* the curves, one stroke */
  cairo_new_path (cr);
  for (size_t i = 0; i < chart->n_ladder; i++)
    if (rung_usable (&chart->ladder[i]))
      rung_curve (chart, cr, &chart->ladder[i]);
  cairo_set_line_width (cr, 1.3 * k);
  _rugosa_chart_set_rgba (cr, &faint);
  cairo_stroke (cr);

  /* the rungs joined in size order */
  {
    const double dash[] = { 1.2 * k, 3.0 * k };

    cairo_new_path (cr);
    for (size_t i = 0; i < chart->n_ladder; i++)
      {
        double x, y;

        if (!rung_usable (&chart->ladder[i]))
          continue;
        _rugosa_chart_xy (lay, chart->ladder[i].re, chart->ladder[i].f, &x, &y);
        if (started)
          cairo_line_to (cr, x, y);
        else
          cairo_move_to (cr, x, y);
        started = 1;
      }
    cairo_set_dash (cr, dash, 2, 0);
    cairo_set_line_width (cr, 1.0 * k);
    _rugosa_chart_set_rgba (cr, &join);
    cairo_stroke (cr);
    cairo_set_dash (cr, NULL, 0, 0);
  }

  /* the points: filled when the size passes, hollow when not, each on a
   * halo of the plot's colour */
  for (size_t i = 0; i < chart->n_ladder; i++)
    {
      const RugosaChartRung *r = &chart->ladder[i];
      RugosaChartRgba dot = p.ink, halo = p.plot;
      double x, y;

      if (!rung_usable (r))
        continue;
      dot.a = 0.62;
      halo.a = 0.7;
      _rugosa_chart_xy (lay, r->re, r->f, &x, &y);
      cairo_new_path (cr);
      cairo_arc (cr, x, y, 4.6 * k, 0, 2 * G_PI);
      _rugosa_chart_set_rgba (cr, &halo);
      cairo_fill (cr);
      cairo_new_path (cr);
      if (r->passes)
        {
          cairo_arc (cr, x, y, 3.3 * k, 0, 2 * G_PI);
          _rugosa_chart_set_rgba (cr, &dot);
          cairo_fill (cr);
        }
      else
        {
          cairo_arc (cr, x, y, 2.8 * k, 0, 2 * G_PI);
          cairo_set_line_width (cr, 1.3 * k);
          _rugosa_chart_set_rgba (cr, &dot);
          cairo_stroke (cr);
        }
      if (r->recommended || r->selected)
        {
          /* a ring in the full colour on the plot's own colour */
          cairo_new_path (cr);
          cairo_arc (cr, x, y, (r->recommended ? 6.5 : 5.0) * k, 0, 2 * G_PI);
          cairo_set_line_width (cr, (r->recommended ? 2.0 : 1.4) * k);
          _rugosa_chart_set_rgba (cr, &chart->ladder_colour);
          cairo_stroke (cr);
        }
    }

  /* the designations of the recommended and the chosen sizes, and of
   * the two ends, so that it is seen which end is the small one */
  {
    size_t first = chart->n_ladder, last = chart->n_ladder;

    for (size_t i = 0; i < chart->n_ladder; i++)
      if (rung_usable (&chart->ladder[i]))
        {
          if (first == chart->n_ladder)
            first = i;
          last = i;
        }
    for (size_t i = 0; i < chart->n_ladder; i++)
      {
        const RugosaChartRung *r = &chart->ladder[i];
        const int marked = r->recommended || r->selected;
        PangoLayout *l;
        double x, y, w, h;

        if (!rung_usable (r) || r->label[0] == '\0' || !(marked || i == first || i == last))
          continue;
        _rugosa_chart_xy (lay, r->re, r->f, &x, &y);
        l = _rugosa_chart_text (chart, r->label, lay->font_label * (marked ? 0.92 : 0.8),
                                r->recommended ? TEXT_BOLD : TEXT_PLAIN, 0);
        _rugosa_chart_text_size (l, &w, &h);
        /* below and to the right of the point: the next larger size lies
         * to the left, so this side is mostly free; the smallest size's
         * name goes above it, clear of the next one's */
        (void) w;
        _rugosa_chart_show (cr, l, round (x + 8 * k),
                            round (i == first && !marked ? y - h - 6 * k : y + 4 * k),
                            marked ? &chart->ladder_colour : &p.muted, &p.plot, 3.0 * k);
      }
  }
  cairo_restore (cr);
}
