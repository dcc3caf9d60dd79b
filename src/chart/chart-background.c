/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The chart's background: page, regime bands, quiet grid, the laminar
 * line, the Colebrook family, inline labels, axes and titles.
 *
 * Bands: laminar and transitional are strips of Reynolds number; the
 * turbulent strip is split by the loci ε⁺ = 5 and ε⁺ = 70 (chart-geometry.c)
 * into hydraulically smooth, transitionally rough and fully rough zones.
 * The part of the plane below the smooth-pipe curve holds no Colebrook
 * curve and stays plain.
 *
 * Palette: the band fills differ in lightness as well as hue (smooth
 * lightest, fully rough darkest, laminar and transitional in separate hues
 * with the transitional strip hatched), so they stay apart for readers with
 * any common colour-vision deficiency and in greyscale print. */
#include "chart-private.h"

#include <glib/gi18n-lib.h>
#include <math.h>
#include <stdio.h>
#include <string.h>

#include "core/friction.h"

static RugosaChartRgba
hex (unsigned rgb, double a)
{
  RugosaChartRgba c = { ((rgb >> 16) & 0xff) / 255.0, ((rgb >> 8) & 0xff) / 255.0,
                        (rgb & 0xff) / 255.0, a };
  return c;
}

void
rugosa_chart_palette (RugosaChartTheme theme, RugosaChartPalette *p)
{
  if (theme == RUGOSA_CHART_THEME_DARK)
    {
      p->page = hex (0x15171b, 1);
      p->plot = hex (0x1b1e23, 1);
      p->ink = hex (0xe4e7eb, 1);
      p->muted = hex (0xa3abb6, 1);
      p->grid = hex (0xe4e7eb, 0.11);
      p->band_laminar = hex (0x1d3550, 1);
      p->band_transitional = hex (0x3e3520, 1);
      p->band_smooth = hex (0x262c28, 1);
      p->band_transitionally_rough = hex (0x313b2c, 1);
      p->band_fully_rough = hex (0x435137, 1);
      p->laminar_line = hex (0x86b9ea, 1);
      p->curve = hex (0xe4e7eb, 0.50);
      p->smooth_curve = hex (0xe4e7eb, 0.90);
    }
  else
    {
      p->page = hex (0xf7f7f4, 1);
      p->plot = hex (0xffffff, 1);
      p->ink = hex (0x1e2227, 1);
      p->muted = hex (0x535c68, 1);
      p->grid = hex (0x1e2227, 0.10);
      p->band_laminar = hex (0xd5e5f5, 1);
      p->band_transitional = hex (0xf5e2bb, 1);
      p->band_smooth = hex (0xf6f7f1, 1);
      p->band_transitionally_rough = hex (0xe3e8d9, 1);
      p->band_fully_rough = hex (0xcbd5bf, 1);
      p->laminar_line = hex (0x1f5a96, 1);
      p->curve = hex (0x1e2227, 0.55);
      p->smooth_curve = hex (0x1e2227, 0.90);
    }
}

/* --- helpers --- */

typedef struct {
  RugosaChartRect boxes[256];
  size_t n;
} Taken;

static int
taken_free (const Taken *t, const RugosaChartRect *r)
{
  for (size_t i = 0; i < t->n; i++)
    if (_rugosa_chart_rects_overlap (&t->boxes[i], r))
      return 0;
  return 1;
}

static void
taken_add (Taken *t, const RugosaChartRect *r)
{
  if (t->n < G_N_ELEMENTS (t->boxes))
    t->boxes[t->n++] = *r;
}

/* Bounding box of a w × h box centred at (cx, cy) and turned by `angle`. */
static RugosaChartRect
turned_box (double cx, double cy, double w, double h, double angle, double pad)
{
  const double c = fabs (cos (angle)), s = fabs (sin (angle));
  const double bw = w * c + h * s + 2 * pad, bh = w * s + h * c + 2 * pad;
  RugosaChartRect r = { cx - bw / 2, cy - bh / 2, bw, bh };
  return r;
}

static void
show_turned (cairo_t *cr, PangoLayout *layout, double cx, double cy,
             double angle, const RugosaChartRgba *ink,
             const RugosaChartRgba *halo, double halo_w)
{
  double w, h;
  _rugosa_chart_text_size (layout, &w, &h);
  cairo_save (cr);
  cairo_translate (cr, cx, cy);
  cairo_rotate (cr, angle);
  _rugosa_chart_show (cr, layout, -w / 2, -h / 2, ink, halo, halo_w);
  cairo_restore (cr);
}

/* Text on a knockout box of the colour beneath it: it hides the lines under
 * the text like a halo, at the cost of one rectangle instead of stroking
 * every glyph outline. */
static void
show_knockout (cairo_t *cr, PangoLayout *layout, double cx, double cy,
               double angle, const RugosaChartRgba *ink,
               const RugosaChartRgba *under, double pad)
{
  double w, h;
  _rugosa_chart_text_size (layout, &w, &h);
  cairo_save (cr);
  cairo_translate (cr, cx, cy);
  cairo_rotate (cr, angle);
  cairo_rectangle (cr, -w / 2 - pad, -h / 2 + 0.12 * h, w + 2 * pad, h * 0.8);
  _rugosa_chart_set_rgba (cr, under);
  cairo_fill (cr);
  _rugosa_chart_show (cr, layout, -w / 2, -h / 2, ink, NULL, 0);
  cairo_restore (cr);
}

static const RugosaChartRgba *
band_colour (const RugosaChartPalette *p, const RugosaChartProbe *pr)
{
  switch (pr->regime)
    {
    case RG_REGIME_LAMINAR:
      return &p->band_laminar;
    case RG_REGIME_TRANSITIONAL:
      return &p->band_transitional;
    case RG_REGIME_TURBULENT:
    default:
      break;
    }
  switch (pr->zone)
    {
    case RG_ZONE_SMOOTH:
      return &p->band_smooth;
    case RG_ZONE_TRANSITIONALLY_ROUGH:
      return &p->band_transitionally_rough;
    case RG_ZONE_FULLY_ROUGH:
      return &p->band_fully_rough;
    case RG_ZONE_NONE:
    default:
      return &p->plot;
    }
}

static double
clampd (double v, double lo, double hi)
{
  return v < lo ? lo : v > hi ? hi : v;
}

/* --- bands --- */

typedef struct {
  double x[128], y[128];
  size_t n;
} Poly;

/* The locus ε⁺ = eps_plus from ε/D = 1e-9 (Re far beyond any axis) to the
 * core's largest ε/D: from the bottom right to the top left. */
static void
locus_points (const ChartLayout *lay, double eps_plus, const RugosaChartRect *far,
              Poly *out)
{
  enum { N = 72 };
  out->n = 0;
  for (int i = 0; i < N; i++)
    {
      const double lrr = -9.0 + (log10 (RG_FRICTION_RR_MAX) + 9.0) * i / (N - 1);
      double re, f, x, y;
      if (rugosa_chart_zone_boundary (eps_plus, pow (10.0, lrr), &re, &f, NULL) != RG_OK)
        continue;
      _rugosa_chart_xy (lay, re, f, &x, &y);
      out->x[out->n] = clampd (x, far->x, far->x + far->width);
      out->y[out->n++] = clampd (y, far->y, far->y + far->height);
    }
}

/* The smooth-pipe Colebrook curve, left to right. */
static void
smooth_points (const ChartLayout *lay, double re_lo, double re_hi,
               const RugosaChartRect *far, Poly *out)
{
  enum { N = 48 };
  out->n = 0;
  for (int i = 0; i < N; i++)
    {
      const double re = re_lo * pow (re_hi / re_lo, (double) i / (N - 1));
      double f, x, y;
      if (rg_friction_colebrook (re, 0.0, &f, NULL) != RG_OK)
        continue;
      _rugosa_chart_xy (lay, re, f, &x, &y);
      out->x[out->n] = clampd (x, far->x, far->x + far->width);
      out->y[out->n++] = clampd (y, far->y, far->y + far->height);
    }
}

static void
poly_path (cairo_t *cr, const Poly *p, int reverse, int move)
{
  for (size_t i = 0; i < p->n; i++)
    {
      const size_t j = reverse ? p->n - 1 - i : i;
      if (i == 0 && move)
        cairo_move_to (cr, p->x[j], p->y[j]);
      else
        cairo_line_to (cr, p->x[j], p->y[j]);
    }
}

static void
band_edges (const RugosaChart *chart, double *x_lam, double *x_turb)
{
  const ChartLayout *lay = &chart->lay;
  const RugosaChartRect *pl = &lay->plot;
  double yy;
  /* whole pixels: rectangles on the pixel grid composite fastest */
  _rugosa_chart_xy (lay, chart->spec.transition.re_laminar_max, 0.02, x_lam, &yy);
  _rugosa_chart_xy (lay, chart->spec.transition.re_turbulent_min, 0.02, x_turb, &yy);
  *x_lam = round (clampd (*x_lam, pl->x, pl->x + pl->width));
  *x_turb = round (clampd (*x_turb, pl->x, pl->x + pl->width));
}

static void
draw_bands (RugosaChart *chart, cairo_t *cr, const RugosaChartPalette *p)
{
  const RugosaChartSpec *spec = &chart->spec;
  const ChartLayout *lay = &chart->lay;
  const RugosaChartRect *pl = &lay->plot;
  const double m = 40;
  const RugosaChartRect far = { pl->x - m, pl->y - m, pl->width + 2 * m,
                                pl->height + 2 * m };
  const double top = far.y, bottom = far.y + far.height;
  const double left = far.x, right = far.x + far.width;
  const double pb = pl->y + pl->height;
  double x_lam, x_turb;

  band_edges (chart, &x_lam, &x_turb);

  _rugosa_chart_set_rgba (cr, &p->band_laminar);
  cairo_rectangle (cr, pl->x, pl->y, x_lam - pl->x, pl->height);
  cairo_fill (cr);
  _rugosa_chart_set_rgba (cr, &p->band_transitional);
  cairo_rectangle (cr, x_lam, pl->y, x_turb - x_lam, pl->height);
  cairo_fill (cr);

  /* Hatching: the strip reads as "in between" without relying on its hue.
   * One repeated tile with a 45° line: far cheaper than stroking each line
   * across the strip, and a vector pattern in SVG and PDF. */
  const int step = (int) fmax (4, round (7.0 * lay->k));
  cairo_surface_t *tile = cairo_surface_create_similar (cairo_get_target (cr),
                                                        CAIRO_CONTENT_COLOR_ALPHA,
                                                        step, step);
  cairo_t *tc = cairo_create (tile);
  RugosaChartRgba hatch = p->ink;
  hatch.a = spec->theme == RUGOSA_CHART_THEME_DARK ? 0.10 : 0.08;
  _rugosa_chart_set_rgba (tc, &hatch);
  cairo_set_line_width (tc, 1.0 * lay->k);
  for (int o = -1; o <= 1; o++)
    {
      cairo_move_to (tc, o * step - 1, step + 1);
      cairo_line_to (tc, o * step + step + 1, -1);
    }
  cairo_stroke (tc);
  cairo_destroy (tc);
  cairo_pattern_t *pat = cairo_pattern_create_for_surface (tile);
  cairo_pattern_set_extend (pat, CAIRO_EXTEND_REPEAT);
  cairo_matrix_t mat;
  cairo_matrix_init_translate (&mat, -x_lam, -pb);
  cairo_pattern_set_matrix (pat, &mat);
  cairo_set_source (cr, pat);
  cairo_rectangle (cr, x_lam, pl->y, x_turb - x_lam, pl->height);
  cairo_fill (cr);
  cairo_pattern_destroy (pat);
  cairo_surface_destroy (tile);

  if (x_turb >= pl->x + pl->width)
    return;
  Poly l70, l5, sm;
  locus_points (lay, RG_EPS_PLUS_FULLY_ROUGH_MIN, &far, &l70);
  locus_points (lay, RG_EPS_PLUS_SMOOTH_MAX, &far, &l5);
  smooth_points (lay, fmax (spec->transition.re_turbulent_min, RG_FRICTION_RE_MIN) * 0.9,
                 RG_FRICTION_RE_MAX, &far, &sm);
  if (l70.n < 2 || l5.n < 2 || sm.n < 2)
    return;

  cairo_save (cr);
  cairo_rectangle (cr, x_turb, pl->y, pl->x + pl->width - x_turb, pl->height);
  cairo_clip (cr);
  /* Coarser edge sampling: the zone edges are soft colour changes, and
   * this halves the cost of filling most of the plot. */
  cairo_set_antialias (cr, CAIRO_ANTIALIAS_FAST);
  /* The three zones do not overlap, so each pixel is filled once. */
  /* ε⁺ > 70: above and to the right of its locus. */
  poly_path (cr, &l70, 0, 1);
  cairo_line_to (cr, l70.x[l70.n - 1], top);
  cairo_line_to (cr, right, top);
  cairo_line_to (cr, right, l70.y[0]);
  cairo_close_path (cr);
  _rugosa_chart_set_rgba (cr, &p->band_fully_rough);
  cairo_fill (cr);
  /* 5 ≤ ε⁺ ≤ 70: between the two loci. */
  poly_path (cr, &l70, 0, 1);
  cairo_line_to (cr, l70.x[l70.n - 1], top);
  cairo_line_to (cr, l5.x[l5.n - 1], top);
  poly_path (cr, &l5, 1, 0);
  cairo_line_to (cr, right, l5.y[0]);
  cairo_line_to (cr, right, l70.y[0]);
  cairo_close_path (cr);
  _rugosa_chart_set_rgba (cr, &p->band_transitionally_rough);
  cairo_fill (cr);
  /* ε⁺ < 5: between its locus and the smooth-pipe curve; below that curve
   * no pipe reaches, and the plot stays plain. */
  poly_path (cr, &l5, 0, 1);
  cairo_line_to (cr, left, l5.y[l5.n - 1]);
  cairo_line_to (cr, left, sm.y[0]);
  poly_path (cr, &sm, 0, 0);
  cairo_line_to (cr, right, sm.y[sm.n - 1]);
  cairo_line_to (cr, right, l5.y[0]);
  cairo_close_path (cr);
  _rugosa_chart_set_rgba (cr, &p->band_smooth);
  cairo_fill (cr);
  (void) bottom;

  /* The zone boundaries themselves, dotted. */
  RugosaChartRgba edge = p->muted;
  edge.a = 0.75;
  const double dots[] = { 5.0 * lay->k, 3.5 * lay->k };
  cairo_set_dash (cr, dots, 2, 0);
  cairo_set_line_width (cr, 1.3 * lay->k);
  _rugosa_chart_set_rgba (cr, &edge);
  poly_path (cr, &l5, 0, 1);
  poly_path (cr, &l70, 0, 1);
  cairo_stroke (cr);
  cairo_restore (cr);

  /* Regime thresholds. */
  cairo_save (cr);
  const double dash[] = { 4.0 * lay->k, 3.0 * lay->k };
  cairo_set_dash (cr, dash, 2, 0);
  cairo_set_line_width (cr, 1.0);
  _rugosa_chart_set_rgba (cr, &edge);
  cairo_move_to (cr, x_lam + 0.5, pl->y);
  cairo_line_to (cr, x_lam + 0.5, pb);
  cairo_move_to (cr, x_turb + 0.5, pl->y);
  cairo_line_to (cr, x_turb + 0.5, pb);
  cairo_stroke (cr);
  cairo_restore (cr);
}

/* --- grid and axes --- */

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

static void
draw_grid (RugosaChart *chart, cairo_t *cr, const RugosaChartPalette *p)
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

static void
draw_axes (RugosaChart *chart, cairo_t *cr, const RugosaChartPalette *p)
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
  Taken xt = { .n = 0 };
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
          if (r.x < 2 || r.x + r.width > lay->width - 2 || !taken_free (&xt, &r))
            continue;
          taken_add (&xt, &r);
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
  Taken yt = { .n = 0 };
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
        if (r.y < 1 || r.y + r.height > lay->height - lay->footer_h || !taken_free (&yt, &r))
          continue;
        taken_add (&yt, &r);
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
  show_turned (cr, ty, 8 * k + h / 2, pl->y + pl->height / 2, -G_PI / 2, &p->ink, NULL, 0);

  /* Caption: what the curves and zones are. */
  PangoLayout *cap = _rugosa_chart_text (
      chart,
      _("Colebrook (1939) curves by relative roughness ε/D  ·  "
        "roughness zones where ε⁺ = Re·(ε/D)·√(f/8) crosses 5 and 70"),
      lay->font_tick, TEXT_PLAIN, 0);
  _rugosa_chart_text_size (cap, &w, &h);
  if (w < lay->width - pl->x - 160 * k)
    _rugosa_chart_show (cr, cap, pl->x, 6 * k, &p->muted, NULL, 0);

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

/* --- curves and their labels --- */

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

static void
draw_curves (RugosaChart *chart, cairo_t *cr, const RugosaChartPalette *p)
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

static void
draw_laminar (RugosaChart *chart, cairo_t *cr, const RugosaChartPalette *p,
              Taken *taken)
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
      RugosaChartRect r = turned_box (cx, cy, w, h, angle, 0);
      if (!_rugosa_chart_rect_inside (&r, pl))
        continue;
      show_turned (cr, l, cx, cy, angle, &p->laminar_line, NULL, 0);
      taken_add (taken, &r);
      break;
    }
}

static void
draw_curve_labels (RugosaChart *chart, cairo_t *cr, const RugosaChartPalette *p,
                   Taken *taken)
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
        _rugosa_chart_format_rr (c->rr, num, sizeof num);
        if (c->rr == 0)
          snprintf (text, sizeof text, "%s", _("smooth pipe"));
        else
          snprintf (text, sizeof text, "ε/D %s", num);
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
            RugosaChartRect r = turned_box (cx, cy, w, h, angle, 1.5 * k);
            if (!_rugosa_chart_rect_inside (&r, &inner) || !taken_free (taken, &r))
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
                                           ? band_colour (p, &pr) : &p->plot;
            RugosaChartRgba ink = p->ink;
            ink.a = c->is_user || c->rr == 0 ? 1.0 : 0.8;
            show_knockout (cr, l, cx, cy, angle, &ink, under, 2.0 * k);
            taken_add (taken, &r);
            break;
          }
      }
}

/* Band names: for each band, the free place nearest to a preferred point
 * whose whole (turned) box lies inside the band. */
typedef struct {
  const char *text;
  RgRegime regime;
  RgRoughnessZone zone;
} BandName;

static int
box_in_band (RugosaChart *chart, double cx, double cy, double w, double h,
             double c, double s, const BandName *b)
{
  for (int i = -1; i <= 1; i++)
    for (int j = -1; j <= 1; j++)
      {
        const double u = i * (w / 2 + 3), v = j * (h / 2 + 2);
        RugosaChartProbe pr;
        _rugosa_chart_classify (&chart->spec, &chart->lay, cx + u * c - v * s,
                                cy + u * s + v * c, &pr);
        if (!pr.in_plot || pr.regime != b->regime
            || (b->regime == RG_REGIME_TURBULENT && pr.zone != b->zone))
          return 0;
      }
  return 1;
}

/* A point of the locus ε⁺ = c at the height of friction factor f
 * (chart-geometry.c: along the locus 1/√f = −2·log10((ε/D)·K)). */
static void
locus_at_f (const ChartLayout *lay, double c, double f, double *x, double *y)
{
  const double kk = 1.0 / 3.7 + 2.51 / (c * sqrt (8.0));
  const double rr = pow (10.0, -0.5 / sqrt (f)) / kk;
  const double re = c * sqrt (8.0) / (rr * sqrt (f));
  _rugosa_chart_xy (lay, re, f, x, y);
}

static void
draw_band_labels (RugosaChart *chart, cairo_t *cr, const RugosaChartPalette *p,
                  Taken *taken)
{
  const RugosaChartSpec *spec = &chart->spec;
  const ChartLayout *lay = &chart->lay;
  const RugosaChartRect *pl = &lay->plot;
  static const BandName BANDS[] = {
    { N_("laminar"), RG_REGIME_LAMINAR, RG_ZONE_NONE },
    { N_("transitional"), RG_REGIME_TRANSITIONAL, RG_ZONE_NONE },
    { N_("fully rough"), RG_REGIME_TURBULENT, RG_ZONE_FULLY_ROUGH },
    { N_("transitionally rough"), RG_REGIME_TURBULENT, RG_ZONE_TRANSITIONALLY_ROUGH },
    { N_("hydraulically smooth"), RG_REGIME_TURBULENT, RG_ZONE_SMOOTH },
  };
  double x_lam, x_turb;
  band_edges (chart, &x_lam, &x_turb);
  /* friction factor a sixth of the way down from the top of the axis */
  const double f_high = pow (10.0, lay->ly1 - (lay->ly1 - lay->ly0) / 6.0);

  for (size_t bi = 0; bi < G_N_ELEMENTS (BANDS); bi++)
    {
      const BandName *b = &BANDS[bi];
      PangoLayout *l = _rugosa_chart_text (chart, _(b->text), lay->font_band, TEXT_CAPS, 0);
      double w, h, px, py, yy;
      _rugosa_chart_text_size (l, &w, &h);

      /* Preferred places: the two strips low down (under the laminar line,
       * where no pipe runs); the turbulent zones high up, where the
       * Colebrook curves are far apart: fully rough to the right, the
       * others on the middle of their zone (ε⁺ = 1.5 and √(5·70)). */
      switch (bi)
        {
        case 0:
          px = 0.5 * (pl->x + x_lam);
          py = pl->y + pl->height * 0.82;
          break;
        case 1:
          px = 0.5 * (x_lam + x_turb);
          py = pl->y + pl->height * 0.78;
          break;
        case 2:
          px = pl->x + pl->width * 0.8;
          py = pl->y + pl->height * 0.1;
          break;
        case 3:
          locus_at_f (lay, sqrt (RG_EPS_PLUS_SMOOTH_MAX * RG_EPS_PLUS_FULLY_ROUGH_MIN),
                      f_high, &px, &py);
          break;
        default:
          locus_at_f (lay, 1.5, f_high, &px, &py);
          {
            /* the smooth zone is a sliver: aim just above its curve */
            double re, f, fs;
            _rugosa_chart_value (lay, px, py, &re, &f);
            if (rg_friction_colebrook (fmax (re, RG_FRICTION_RE_MIN), 0, &fs, NULL) == RG_OK)
              _rugosa_chart_xy (lay, re, fs, &yy, &py);
            py -= h;
          }
          break;
        }

      /* Orientation: upright in the narrow transitional strip; along the
       * smooth-pipe curve in the smooth zone. */
      double angles[2] = { 0, -G_PI / 2 };
      if (b->regime == RG_REGIME_TURBULENT)
        angles[1] = 0;
      if (b->zone == RG_ZONE_SMOOTH)
        {
          double re, f, f1, f2, x1, y1, x2, y2;
          _rugosa_chart_value (lay, px, py, &re, &f);
          re = fmax (re, RG_FRICTION_RE_MIN * 2);
          rg_friction_colebrook (re / 1.5, 0, &f1, NULL);
          rg_friction_colebrook (re * 1.5, 0, &f2, NULL);
          _rugosa_chart_xy (lay, re / 1.5, f1, &x1, &y1);
          _rugosa_chart_xy (lay, re * 1.5, f2, &x2, &y2);
          angles[1] = atan2 (y2 - y1, x2 - x1);
        }

      const double cs[2][2] = { { cos (angles[0]), sin (angles[0]) },
                                { cos (angles[1]), sin (angles[1]) } };
      /* Search outwards from the preferred point, ring by ring, and stop
       * once a ring lies farther than the best place found. */
      const double step = 5 * lay->k;
      const int max_ring = (int) (fmax (pl->width, pl->height) / step) + 1;
      double best_d = INFINITY, bx = 0, by = 0, ba = 0;
      for (int ring = 0; ring <= max_ring && ring * step < best_d; ring++)
        for (int ai = 0; ai < 2; ai++)
          for (int side = 0; side < (ring ? 8 * ring : 1); side++)
            {
              int gx = 0, gy = 0;
              if (ring)
                {
                  const int e = side / (2 * ring), o = side % (2 * ring);
                  gx = e == 0 ? -ring + o : e == 1 ? ring : e == 2 ? ring - o : -ring;
                  gy = e == 0 ? -ring : e == 1 ? -ring + o : e == 2 ? ring : ring - o;
                }
              const double x = px + gx * step, y = py + gy * step;
              /* upright text costs the reader a turn of the head */
              const double d = hypot (x - px, y - py) + (ai ? 12 * lay->k : 0);
              if (d >= best_d)
                continue;
              const double bw = w * fabs (cs[ai][0]) + h * fabs (cs[ai][1]) + 4;
              const double bh = w * fabs (cs[ai][1]) + h * fabs (cs[ai][0]) + 4;
              RugosaChartRect r = { x - bw / 2, y - bh / 2, bw, bh };
              if (!_rugosa_chart_rect_inside (&r, pl) || !taken_free (taken, &r)
                  || !box_in_band (chart, x, y, w, h, cs[ai][0], cs[ai][1], b))
                continue;
              best_d = d;
              bx = x;
              by = y;
              ba = angles[ai];
            }
      if (!isfinite (best_d))
        continue;
      RugosaChartProbe pr;
      _rugosa_chart_classify (spec, lay, bx, by, &pr);
      show_knockout (cr, l, bx, by, ba, &p->muted, band_colour (p, &pr), 2 * lay->k);
      RugosaChartRect r = turned_box (bx, by, w, h, ba, 2);
      taken_add (taken, &r);
    }
}

void
_rugosa_chart_draw_background (RugosaChart *chart, cairo_t *cr)
{
  const RugosaChartSpec *spec = &chart->spec;
  const ChartLayout *lay = &chart->lay;
  const RugosaChartRect *pl = &lay->plot;
  RugosaChartPalette p;
  Taken taken = { .n = 0 };

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
    draw_bands (chart, cr, &p);
  if (spec->show & RUGOSA_CHART_SHOW_GRID)
    draw_grid (chart, cr, &p);
  if (spec->show & RUGOSA_CHART_SHOW_CURVES)
    draw_curves (chart, cr, &p);
  if (spec->show & RUGOSA_CHART_SHOW_LAMINAR)
    draw_laminar (chart, cr, &p, &taken);
  if ((spec->show & RUGOSA_CHART_SHOW_CURVES)
      && (spec->show & RUGOSA_CHART_SHOW_CURVE_LABELS))
    draw_curve_labels (chart, cr, &p, &taken);
  if ((spec->show & RUGOSA_CHART_SHOW_BANDS)
      && (spec->show & RUGOSA_CHART_SHOW_BAND_LABELS))
    draw_band_labels (chart, cr, &p, &taken);
  cairo_restore (cr);

  draw_axes (chart, cr, &p);
  cairo_restore (cr);

  chart->n_bg_boxes = MIN (taken.n, G_N_ELEMENTS (chart->bg_boxes));
  memcpy (chart->bg_boxes, taken.boxes, chart->n_bg_boxes * sizeof taken.boxes[0]);
  chart->bg_boxes_valid = 1;
  if (chart->placement_valid && !chart->placement_saw_bg_boxes)
    chart->placement_valid = 0;
}
