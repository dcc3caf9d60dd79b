/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The chart's grid and axes: a quiet logarithmic grid, the frame, tick
 * marks and their labels (decades of Re as powers of ten, f as decimals),
 * the axis titles, the caption and the regime thresholds above the frame. */
#include "chart-private.h"

#include <glib/gi18n-lib.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>

static const char *const SUPERSCRIPT[] = {
  "⁰", "¹", "²", "³", "⁴", "⁵", "⁶", "⁷", "⁸", "⁹",
};

static void
power_of_ten (int e, char *buf, size_t size)
{
  char digits[16];
  size_t n = 0;
  snprintf (buf, size, "10");
  if (e < 0)
    g_strlcat (buf, "⁻", size);
  snprintf (digits, sizeof digits, "%d", abs (e));
  for (n = 0; digits[n] != '\0'; n++)
    g_strlcat (buf, SUPERSCRIPT[digits[n] - '0'], size);
}

void
_rugosa_chart_draw_grid (RugosaChart *chart, cairo_t *cr,
                         const RugosaChartPalette *p)
{
  const ChartLayout *lay = &chart->lay;
  const RugosaChartRect *pl = &lay->plot;
  RugosaChartRgba minor = p->grid, major = p->grid;
  minor.a *= 0.55;
  major.a *= 1.4;

  cairo_save (cr);
  cairo_set_line_width (cr, 1.0);
  for (int pass = 0; pass < 2; pass++)
    {
      for (int e = (int) floor (lay->lx0); e <= (int) ceil (lay->lx1); e++)
        for (int m = 1; m <= 9; m++)
          {
            const double v = log10 (m) + e;
            if ((m == 1) != (pass == 1) || v < lay->lx0 || v > lay->lx1)
              continue;
            double x, y;
            _rugosa_chart_xy (lay, pow (10.0, v), 0.02, &x, &y);
            x = floor (x) + 0.5;
            cairo_move_to (cr, x, pl->y);
            cairo_line_to (cr, x, pl->y + pl->height);
          }
      for (int e = (int) floor (lay->ly0); e <= (int) ceil (lay->ly1); e++)
        for (int m = 1; m <= 9; m++)
          {
            const double v = log10 (m) + e;
            if ((m == 1) != (pass == 1) || v < lay->ly0 || v > lay->ly1)
              continue;
            double x, y;
            _rugosa_chart_xy (lay, 1e4, pow (10.0, v), &x, &y);
            y = floor (y) + 0.5;
            cairo_move_to (cr, pl->x, y);
            cairo_line_to (cr, pl->x + pl->width, y);
          }
      _rugosa_chart_set_rgba (cr, pass == 1 ? &major : &minor);
      cairo_stroke (cr);
    }
  cairo_restore (cr);
}

void
_rugosa_chart_draw_axes (RugosaChart *chart, cairo_t *cr,
                         const RugosaChartPalette *p)
{
  const RugosaChartSpec *spec = &chart->spec;
  const ChartLayout *lay = &chart->lay;
  const RugosaChartRect *pl = &lay->plot;
  const double k = lay->k;
  char buf[64];
  double w, h;

  /* Frame and tick marks. */
  cairo_save (cr);
  RugosaChartRgba frame = p->ink;
  frame.a = 0.7;
  _rugosa_chart_set_rgba (cr, &frame);
  cairo_set_line_width (cr, 1.0);
  cairo_rectangle (cr, pl->x + 0.5, pl->y + 0.5, pl->width - 1, pl->height - 1);
  cairo_stroke (cr);
  cairo_restore (cr);

  /* Reynolds labels: decades as powers of ten; 2 and 5 when a decade is
   * wide enough to hold them without crowding. */
  const double decade_px = pl->width / (lay->lx1 - lay->lx0);
  ChartTaken xt = { .n = 0 };
  for (int pass = 0; pass < 2; pass++)
    for (int e = (int) floor (lay->lx0); e <= (int) ceil (lay->lx1); e++)
      for (int m = 1; m <= 5; m++)
        {
          if ((pass == 0) != (m == 1) || (m != 1 && m != 2 && m != 5))
            continue;
          if (m != 1 && decade_px < 9.0 * lay->font_tick)
            continue;
          const double v = log10 (m) + e;
          if (v < lay->lx0 - 1e-9 || v > lay->lx1 + 1e-9)
            continue;
          double x, y;
          _rugosa_chart_xy (lay, pow (10.0, v), 0.02, &x, &y);
          PangoLayout *l;
          if (m == 1)
            {
              power_of_ten (e, buf, sizeof buf);
              l = _rugosa_chart_text (chart, buf, lay->font_tick, TEXT_PLAIN, 0);
            }
          else
            {
              snprintf (buf, sizeof buf, "%d", m);
              l = _rugosa_chart_text (chart, buf, lay->font_tick * 0.85, TEXT_PLAIN, 0);
            }
          _rugosa_chart_text_size (l, &w, &h);
          RugosaChartRect r = { x - w / 2 - 3 * k, pl->y + pl->height + 5 * k, w + 6 * k, h };
          if (r.x < 2 || r.x + r.width > lay->width - 2 || !_rugosa_chart_taken_free (&xt, &r))
            continue;
          _rugosa_chart_taken_add (&xt, &r);
          _rugosa_chart_show (cr, l, x - w / 2, r.y, m == 1 ? &p->ink : &p->muted, NULL, 0);
          cairo_save (cr);
          _rugosa_chart_set_rgba (cr, &frame);
          cairo_set_line_width (cr, 1.0);
          cairo_move_to (cr, floor (x) + 0.5, pl->y + pl->height);
          cairo_line_to (cr, floor (x) + 0.5, pl->y + pl->height + (m == 1 ? 4 : 2.5) * k);
          cairo_stroke (cr);
          cairo_restore (cr);
        }

  /* Friction labels: decimals, by priority of the mantissa. */
  static const double MANT[] = { 1, 2, 5, 3, 4, 6, 8, 1.5, 2.5, 7, 9, 1.2, 1.4, 1.6, 1.8 };
  ChartTaken yt = { .n = 0 };
  for (size_t mi = 0; mi < G_N_ELEMENTS (MANT); mi++)
    for (int e = (int) floor (lay->ly0); e <= (int) ceil (lay->ly1); e++)
      {
        const double val = MANT[mi] * pow (10.0, e);
        const double v = log10 (val);
        if (v < lay->ly0 - 1e-9 || v > lay->ly1 + 1e-9)
          continue;
        double x, y;
        _rugosa_chart_xy (lay, 1e4, val, &x, &y);
        snprintf (buf, sizeof buf, "%.*f", e < 0 ? -e + (MANT[mi] != floor (MANT[mi])) : 1, val);
        if (e >= 0 && MANT[mi] == floor (MANT[mi]))
          snprintf (buf, sizeof buf, "%g", val);
        PangoLayout *l = _rugosa_chart_text (chart, buf, lay->font_tick, TEXT_PLAIN, 0);
        _rugosa_chart_text_size (l, &w, &h);
        RugosaChartRect r = { pl->x - 7 * k - w, y - h / 2 - 2.5 * k, w, h + 5 * k };
        if (r.y < 1 || r.y + r.height > lay->height - lay->footer_h || !_rugosa_chart_taken_free (&yt, &r))
          continue;
        _rugosa_chart_taken_add (&yt, &r);
        _rugosa_chart_show (cr, l, r.x, y - h / 2, &p->ink, NULL, 0);
        cairo_save (cr);
        _rugosa_chart_set_rgba (cr, &frame);
        cairo_set_line_width (cr, 1.0);
        cairo_move_to (cr, pl->x - 3.5 * k, floor (y) + 0.5);
        cairo_line_to (cr, pl->x, floor (y) + 0.5);
        cairo_stroke (cr);
        /* a labelled value gets a slightly stronger grid line */
        if (spec->show & RUGOSA_CHART_SHOW_GRID)
          {
            _rugosa_chart_set_rgba (cr, &p->grid);
            cairo_move_to (cr, pl->x, floor (y) + 0.5);
            cairo_line_to (cr, pl->x + pl->width, floor (y) + 0.5);
            cairo_stroke (cr);
          }
        cairo_restore (cr);
      }

  /* Axis titles. */
  PangoLayout *tx = _rugosa_chart_text (chart, _("Reynolds number  Re = ρVD/μ  [–]"),
                                        lay->font_title, TEXT_PLAIN, 0);
  _rugosa_chart_text_size (tx, &w, &h);
  _rugosa_chart_show (cr, tx, pl->x + (pl->width - w) / 2,
                      pl->y + pl->height + 7 * k + lay->font_tick * 1.35, &p->ink, NULL, 0);
  PangoLayout *ty = _rugosa_chart_text (chart, _("Darcy friction factor  f  [–]"),
                                        lay->font_title, TEXT_PLAIN, 0);
  _rugosa_chart_text_size (ty, &w, &h);
  _rugosa_chart_show_turned (cr, ty, 8 * k + h / 2, pl->y + pl->height / 2, -G_PI / 2, &p->ink, NULL, 0);

  /* Caption: what the curves and zones are; the tolerance is the core's
   * (regime.c), in per cent. */
  char caption[256];
  snprintf (caption, sizeof caption,
            _("Colebrook (1939) curves by relative roughness ε/D  ·  "
              "zones: f within %g %% of the smooth or the fully rough law"),
            100.0 * RG_ROUGHNESS_ZONE_TOLERANCE);
  PangoLayout *cap = _rugosa_chart_text (chart, caption, lay->font_tick, TEXT_PLAIN, 0);
  _rugosa_chart_text_size (cap, &w, &h);
  if (w < lay->width - pl->x - 160 * k)
    _rugosa_chart_show (cr, cap, pl->x, lay->heading_h + 6 * k, &p->muted, NULL, 0);

  /* Threshold values above the frame. */
  double x_lam, x_turb, yy;
  _rugosa_chart_xy (lay, spec->transition.re_laminar_max, 0.02, &x_lam, &yy);
  _rugosa_chart_xy (lay, spec->transition.re_turbulent_min, 0.02, &x_turb, &yy);
  snprintf (buf, sizeof buf, "Re %g", spec->transition.re_laminar_max);
  PangoLayout *l1 = _rugosa_chart_text (chart, buf, lay->font_tick * 0.85, TEXT_PLAIN, 0);
  _rugosa_chart_text_size (l1, &w, &h);
  if (x_lam - w - 3 * k > pl->x)
    _rugosa_chart_show (cr, l1, x_lam - w - 3 * k, pl->y - h - 2 * k, &p->muted, NULL, 0);
  snprintf (buf, sizeof buf, "%g", spec->transition.re_turbulent_min);
  PangoLayout *l2 = _rugosa_chart_text (chart, buf, lay->font_tick * 0.85, TEXT_PLAIN, 0);
  _rugosa_chart_text_size (l2, &w, &h);
  if (x_turb + w + 3 * k < pl->x + pl->width)
    _rugosa_chart_show (cr, l2, x_turb + 3 * k, pl->y - h - 2 * k, &p->muted, NULL, 0);
}

