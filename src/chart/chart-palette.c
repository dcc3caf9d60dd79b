/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The chart's colours: the light and dark palettes, the band colour under a
 * point, and the hatching of the transitional strip.
 *
 * The band fills differ in lightness as well as hue (smooth lightest, fully
 * rough darkest, laminar and transitional in separate hues with the
 * transitional strip hatched), so they stay apart for readers with any
 * common colour-vision deficiency and in greyscale print. */
#include "chart-private.h"

#include <math.h>

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

const RugosaChartRgba *
_rugosa_chart_band_colour (const RugosaChartPalette *p, const RugosaChartProbe *pr)
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

/* Hatching: the transitional strip reads as "in between" without relying
 * on its hue.  One repeated tile with a 45° line: far cheaper than stroking
 * each line across the strip, and a vector pattern in SVG and PDF.  The
 * tile starts at the origin; the caller moves it with the pattern matrix. */
cairo_pattern_t *
_rugosa_chart_hatch_pattern (cairo_t *cr, const RugosaChartPalette *p,
                             RugosaChartTheme theme, double k)
{
  const int step = (int) fmax (4, round (7.0 * k));
  cairo_surface_t *tile = cairo_surface_create_similar (cairo_get_target (cr),
                                                        CAIRO_CONTENT_COLOR_ALPHA,
                                                        step, step);
  cairo_t *tc = cairo_create (tile);
  RugosaChartRgba hatch = p->ink;
  hatch.a = theme == RUGOSA_CHART_THEME_DARK ? 0.10 : 0.08;
  _rugosa_chart_set_rgba (tc, &hatch);
  cairo_set_line_width (tc, 1.0 * k);
  for (int o = -1; o <= 1; o++)
    {
      cairo_move_to (tc, o * step - 1, step + 1);
      cairo_line_to (tc, o * step + step + 1, -1);
    }
  cairo_stroke (tc);
  cairo_destroy (tc);
  cairo_pattern_t *pat = cairo_pattern_create_for_surface (tile);
  cairo_surface_destroy (tile);
  cairo_pattern_set_extend (pat, CAIRO_EXTEND_REPEAT);
  return pat;
}
