/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The curves of the background: the Colebrook family (the standard values
 * and the new-pipe roughness of each line option), sampled, stroked and
 * named inline, and the laminar line f = 64/Re with its name.
 *
 * Colebrook curves are sampled adaptively in device space: an interval of
 * log Re is halved while its midpoint lies more than CURVE_TOL pixels from
 * the chord, so flat parts of a curve cost few points.
 *
 * Inline names: the user's curves first, then the family from the roughest
 * down; each takes the rightmost free place on its curve where the
 * neighbouring curves clear the text. */
#include "chart-private.h"

#include <glib/gi18n-lib.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "core/friction.h"

/* Pixels a sampled curve may stray from the true one between samples. */
static const double CURVE_TOL = 0.25;

/* --- sampling --- */

typedef struct {
  double *x, *y;
  size_t n, cap;
} PointBuf;

static void
push (PointBuf *b, double x, double y)
{
  if (b->n == b->cap)
    {
      b->cap = b->cap ? b->cap * 2 : 64;
      b->x = g_renew (double, b->x, b->cap);
      b->y = g_renew (double, b->y, b->cap);
    }
  b->x[b->n] = x;
  b->y[b->n] = y;
  b->n++;
}

static void
eval_curve (const ChartLayout *lay, double rr, double lre, double *x, double *y)
{
  const double re = pow (10.0, lre);
  double f = 0.02;
  if (rg_friction_colebrook (re, rr, &f, NULL) != RG_OK)
    f = 0.02; /* not reached: the Re range is clamped to the domain */
  _rugosa_chart_xy (lay, re, f, x, y);
}

static void
subdivide (const ChartLayout *lay, double rr, PointBuf *b, double u0,
           double x0, double y0, double u1, double x1, double y1, int depth)
{
  const double um = 0.5 * (u0 + u1);
  double xm, ym;
  eval_curve (lay, rr, um, &xm, &ym);
  const double dx = xm - 0.5 * (x0 + x1), dy = ym - 0.5 * (y0 + y1);
  if (depth < 8 && dx * dx + dy * dy > CURVE_TOL * CURVE_TOL)
    {
      subdivide (lay, rr, b, u0, x0, y0, um, xm, ym, depth + 1);
      subdivide (lay, rr, b, um, xm, ym, u1, x1, y1, depth + 1);
    }
  else
    push (b, x1, y1);
}

static int
cmp_double (const void *a, const void *b)
{
  const double x = *(const double *) a, y = *(const double *) b;
  return (x > y) - (x < y);
}

void
_rugosa_chart_free_curves (RugosaChart *chart)
{
  for (size_t i = 0; i < chart->n_curves; i++)
    {
      g_free (chart->curves[i].x);
      g_free (chart->curves[i].y);
    }
  chart->n_curves = 0;
  chart->geom_valid = 0;
}

void
_rugosa_chart_build_curves (RugosaChart *chart)
{
  const RugosaChartSpec *spec = &chart->spec;
  const ChartLayout *lay = &chart->lay;
  /* (ε/D, is the user's) pairs, sorted by ε/D; a tie keeps one curve. */
  double pairs[CHART_CURVES_MAX][2];
  size_t n = 0;

  _rugosa_chart_free_curves (chart);

  for (size_t i = 0; i < spec->n_family; i++)
    {
      pairs[n][0] = spec->family[i];
      pairs[n++][1] = 0;
    }
  for (size_t i = 0; i < chart->n_user_rr && n < CHART_CURVES_MAX; i++)
    {
      pairs[n][0] = chart->user_rr[i];
      pairs[n++][1] = 1;
    }
  qsort (pairs, n, sizeof pairs[0], cmp_double);

  const double u_lo = log10 (fmax (fmax (spec->re_min, spec->transition.re_turbulent_min),
                                   RG_FRICTION_RE_MIN));
  const double u_hi = log10 (spec->re_max);
  for (size_t i = 0; i < n; i++)
    {
      const double rr = pairs[i][0];
      if (chart->n_curves > 0)
        {
          ChartCurve *prev = &chart->curves[chart->n_curves - 1];
          if (fabs (prev->rr - rr) <= 1e-9 * fmax (rr, 1e-12))
            {
              prev->is_user |= pairs[i][1] != 0;
              continue;
            }
        }
      ChartCurve *c = &chart->curves[chart->n_curves++];
      PointBuf b = { 0 };
      c->rr = rr;
      c->is_user = pairs[i][1] != 0;
      if (u_hi > u_lo)
        {
          /* Eight even steps first, so no feature hides between samples. */
          enum { STEPS = 8 };
          double x0, y0;
          eval_curve (lay, rr, u_lo, &x0, &y0);
          push (&b, x0, y0);
          for (int s = 1; s <= STEPS; s++)
            {
              const double ua = u_lo + (u_hi - u_lo) * (s - 1) / STEPS;
              const double ub = u_lo + (u_hi - u_lo) * s / STEPS;
              double x1, y1;
              eval_curve (lay, rr, ub, &x1, &y1);
              subdivide (lay, rr, &b, ua, b.x[b.n - 1], b.y[b.n - 1], ub, x1, y1, 0);
            }
        }
      c->n = b.n;
      c->x = b.x;
      c->y = b.y;
    }
  chart->geom_valid = 1;
}

/* --- drawing and names --- */

/* ε/D > 0 as plain decimals with three significant digits at most,
 * trailing zeros dropped: 0.00015, 0.002, 0.05. */
static void
format_rr (double rr, char *buf, size_t size)
{
  int decimals = (int) ceil (-log10 (rr) - 1e-9) + 2;
  if (decimals < 1)
    decimals = 1;
  if (decimals > 12)
    decimals = 12;
  char tmp[48];
  snprintf (tmp, sizeof tmp, "%.*f", decimals, rr);
  size_t n = strlen (tmp);
  while (n > 1 && tmp[n - 1] == '0')
    tmp[--n] = '\0';
  if (n > 0 && tmp[n - 1] == '.')
    tmp[--n] = '\0';
  snprintf (buf, size, "%s", tmp);
}

/* y of a sampled curve at device x (NAN outside its span). */
static double
curve_y_at (const ChartCurve *c, double x)
{
  if (c->n < 2 || x < c->x[0] || x > c->x[c->n - 1])
    return NAN;
  size_t lo = 0, hi = c->n - 1;
  while (hi - lo > 1)
    {
      const size_t mid = (lo + hi) / 2;
      if (c->x[mid] <= x)
        lo = mid;
      else
        hi = mid;
    }
  const double t = (x - c->x[lo]) / fmax (c->x[hi] - c->x[lo], 1e-12);
  return c->y[lo] + t * (c->y[hi] - c->y[lo]);
}

void
_rugosa_chart_draw_curves (RugosaChart *chart, cairo_t *cr,
                           const RugosaChartPalette *p)
{
  const ChartLayout *lay = &chart->lay;
  cairo_save (cr);
  cairo_set_line_join (cr, CAIRO_LINE_JOIN_BEVEL); /* round joins cost arcs at every sample */
  /* Coarser edge sampling and one path per stroke style: measured with
   * Cairo 1.16 (callgrind, 30 curves at 1600 × 1000) this costs about half
   * of one finely antialiased stroke per curve, and looks the same. */
  cairo_set_antialias (cr, CAIRO_ANTIALIAS_FAST);
  for (int style = 0; style < 3; style++)
    {
      int any = 0;
      for (size_t i = 0; i < chart->n_curves; i++)
        {
          const ChartCurve *c = &chart->curves[i];
          const int s = c->rr == 0 ? 2 : c->is_user ? 1 : 0;
          if (s != style || c->n < 2)
            continue;
          cairo_move_to (cr, c->x[0], c->y[0]);
          for (size_t j = 1; j < c->n; j++)
            cairo_line_to (cr, c->x[j], c->y[j]);
          any = 1;
        }
      if (!any)
        continue;
      _rugosa_chart_set_rgba (cr, style == 0 ? &p->curve : &p->smooth_curve);
      cairo_set_line_width (cr, (style == 0 ? 0.9 : style == 1 ? 1.5 : 1.8) * lay->k);
      cairo_stroke (cr);
    }
  cairo_restore (cr);
}

void
_rugosa_chart_draw_laminar (RugosaChart *chart, cairo_t *cr,
                            const RugosaChartPalette *p, ChartTaken *taken)
{
  const RugosaChartSpec *spec = &chart->spec;
  const ChartLayout *lay = &chart->lay;
  const double k = lay->k;
  const double re_a = spec->re_min, re_b = spec->transition.re_laminar_max;
  const double re_c = fmin (spec->transition.re_turbulent_min, spec->re_max);
  double xa, ya, xb, yb, xc, yc;

  /* 64/Re is a straight line on log–log axes. */
  _rugosa_chart_xy (lay, re_a, 64.0 / re_a, &xa, &ya);
  _rugosa_chart_xy (lay, re_b, 64.0 / re_b, &xb, &yb);
  _rugosa_chart_xy (lay, re_c, 64.0 / re_c, &xc, &yc);
  cairo_save (cr);
  _rugosa_chart_set_rgba (cr, &p->laminar_line);
  cairo_set_line_width (cr, 2.2 * k);
  cairo_move_to (cr, xa, ya);
  cairo_line_to (cr, xb, yb);
  cairo_stroke (cr);
  /* continued, dashed, across the transitional strip */
  const double dash[] = { 5 * k, 4 * k };
  cairo_set_dash (cr, dash, 2, 0);
  cairo_set_line_width (cr, 1.6 * k);
  cairo_move_to (cr, xb, yb);
  cairo_line_to (cr, xc, yc);
  cairo_stroke (cr);
  cairo_restore (cr);

  if (!(spec->show & RUGOSA_CHART_SHOW_CURVE_LABELS))
    return;
  /* The label runs parallel to the line, just below it, in the visible
   * part of the laminar strip. */
  const RugosaChartRect *pl = &lay->plot;
  const double re_top = fmax (re_a, 64.0 / spec->f_max);
  if (re_top >= re_b)
    return;
  double x0, y0, x1, y1;
  _rugosa_chart_xy (lay, re_top, 64.0 / re_top, &x0, &y0);
  _rugosa_chart_xy (lay, re_b, 64.0 / re_b, &x1, &y1);
  const double seg = hypot (x1 - x0, y1 - y0);
  const double angle = atan2 (y1 - y0, x1 - x0);
  static const char *const TEXTS[] = { N_("laminar  f = 64/Re"), "f = 64/Re" };
  for (size_t i = 0; i < G_N_ELEMENTS (TEXTS); i++)
    {
      PangoLayout *l = _rugosa_chart_text (chart, _(TEXTS[i]), lay->font_curve, TEXT_PLAIN, 0);
      double w, h;
      _rugosa_chart_text_size (l, &w, &h);
      if (w > 0.9 * seg)
        continue;
      /* normal pointing down-left of the line */
      const double nx = -sin (angle), ny = cos (angle);
      const double off = h / 2 + 3 * k;
      const double cx = 0.5 * (x0 + x1) + nx * off, cy = 0.5 * (y0 + y1) + ny * off;
      RugosaChartRect r = _rugosa_chart_turned_box (cx, cy, w, h, angle, 0);
      if (!_rugosa_chart_rect_inside (&r, pl))
        continue;
      _rugosa_chart_show_turned (cr, l, cx, cy, angle, &p->laminar_line, NULL, 0);
      _rugosa_chart_taken_add (taken, &r);
      break;
    }
}

void
_rugosa_chart_draw_curve_labels (RugosaChart *chart, cairo_t *cr,
                                 const RugosaChartPalette *p,
                                 ChartTaken *taken)
{
  const RugosaChartSpec *spec = &chart->spec;
  const ChartLayout *lay = &chart->lay;
  const RugosaChartRect *pl = &lay->plot;
  const RugosaChartRect inner = { pl->x + 2, pl->y + 2, pl->width - 4, pl->height - 4 };
  const double k = lay->k;

  /* The user's curves first, then the family from the roughest down. */
  for (int pass = 0; pass < 2; pass++)
    for (size_t ii = chart->n_curves; ii-- > 0;)
      {
        const ChartCurve *c = &chart->curves[ii];
        if ((pass == 0) != (c->is_user != 0 || c->rr == 0) || c->n < 2)
          continue;
        char num[32], text[48];
        if (c->rr == 0)
          snprintf (text, sizeof text, "%s", _("smooth pipe"));
        else
          {
            format_rr (c->rr, num, sizeof num);
            snprintf (text, sizeof text, "ε/D %s", num);
          }
        PangoLayout *l = _rugosa_chart_text (chart, text, lay->font_curve,
                                             c->is_user ? TEXT_BOLD : TEXT_PLAIN, 0);
        double w, h;
        _rugosa_chart_text_size (l, &w, &h);
        const double step = fmax (w * 0.5, 16 * k);
        for (double cx = pl->x + pl->width - 8 * k - w / 2;
             cx > pl->x + pl->width * 0.3; cx -= step)
          {
            double cy = curve_y_at (c, cx);
            const double ya = curve_y_at (c, cx - w / 2), yb = curve_y_at (c, cx + w / 2);
            if (isnan (cy) || isnan (ya) || isnan (yb))
              continue;
            const double angle = atan2 (yb - ya, w);
            /* The smooth-pipe curve is the lowest: its label sits under it,
             * in the empty part of the plot, clear of the crowd above. */
            const int below = c->rr == 0;
            if (below)
              cy += (h / 2 + 2 * k) / cos (angle);
            RugosaChartRect r = _rugosa_chart_turned_box (cx, cy, w, h, angle, 1.5 * k);
            if (!_rugosa_chart_rect_inside (&r, &inner) || !_rugosa_chart_taken_free (taken, &r))
              continue;
            /* Neighbouring curves must clear the text. */
            int clear = 1;
            /* Curves of a family never cross, so the nearest ones in y are
             * the neighbours in ε/D order. */
            for (size_t j = ii > 0 ? ii - 1 : 0; j <= ii + 1 && j < chart->n_curves && clear && !below; j++)
              {
                if (j == ii)
                  continue;
                for (int s = -1; s <= 1 && clear; s++)
                  {
                    const double xs = cx + s * w / 2 * cos (angle);
                    const double yo = curve_y_at (&chart->curves[j], xs);
                    const double ys = curve_y_at (c, xs);
                    if (!isnan (yo) && !isnan (ys) && fabs (yo - ys) < 0.62 * h + 1.5 * k)
                      clear = 0;
                  }
              }
            if (!clear)
              continue;
            RugosaChartProbe pr;
            _rugosa_chart_classify (spec, lay, cx, cy - h, &pr);
            const RugosaChartRgba *under = (spec->show & RUGOSA_CHART_SHOW_BANDS)
                                           ? _rugosa_chart_band_colour (p, &pr) : &p->plot;
            RugosaChartRgba ink = p->ink;
            ink.a = c->is_user || c->rr == 0 ? 1.0 : 0.8;
            _rugosa_chart_show_knockout (cr, l, cx, cy, angle, &ink, under, 2.0 * k);
            _rugosa_chart_taken_add (taken, &r);
            break;
          }
      }
}

