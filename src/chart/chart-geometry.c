/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Chart geometry: the description's defaults and checks, the layout of one
 * frame, the transforms between (Re, f) and device coordinates, and what
 * lies under a point (regime, roughness zone, the ε/D of its curve).
 *
 * Transforms: both axes are logarithmic,
 *   x = plot.x + (log10 Re − log10 Re_min)/(log10 Re_max − log10 Re_min)·plot.w
 *   y = plot.y + plot.h − (log10 f − log10 f_min)/(log10 f_max − log10 f_min)·plot.h
 * and the inverse solves these for Re and f.
 *
 * Inverse Colebrook (ε/D through a point (Re, f)): Colebrook (1939)
 *   1/√f = −2·log10( (ε/D)/3.7 + 2.51/(Re·√f) )
 * is linear in ε/D, so ε/D = 3.7·(10^(−1/(2√f)) − 2.51/(Re·√f)) exactly.
 *
 * Roughness zone under a point: the core's rule (rg_roughness_zone_classify)
 * at the point's Reynolds number and the ε/D of the curve through it. */
#include "chart-private.h"

#include <glib/gi18n-lib.h>
#include <math.h>
#include <string.h>

#include "core/friction.h"
/* for the limits of the chart window alone (macros; nothing is linked) */
#include "model/rugosa-fields.h"

/* The standard family: smooth, then steps of 1–2–5 per decade over the
 * relative roughness met in practice (drawn tubing to corroded cast iron). */
static const double STANDARD_FAMILY[] = {
  0.0, 1e-6, 5e-6, 1e-5, 2e-5, 5e-5, 1e-4, 2e-4, 5e-4,
  1e-3, 2e-3, 5e-3, 1e-2, 2e-2, 5e-2,
};

size_t
rugosa_chart_standard_family (double *out, size_t max)
{
  size_t n = G_N_ELEMENTS (STANDARD_FAMILY);
  if (n > max)
    n = max;
  memcpy (out, STANDARD_FAMILY, n * sizeof *out);
  return n;
}

void
rugosa_chart_spec_init (RugosaChartSpec *spec)
{
  memset (spec, 0, sizeof *spec);
  spec->width = 960;
  spec->height = 600;
  spec->scale = 1;
  spec->theme = RUGOSA_CHART_THEME_LIGHT;
  spec->re_min = 500;
  spec->re_max = 1e8;
  spec->f_min = 0.006;
  spec->f_max = 0.1;
  rg_transition_default (&spec->transition);
  spec->n_family = rugosa_chart_standard_family (spec->family,
                                                 RUGOSA_CHART_FAMILY_MAX);
  spec->show = RUGOSA_CHART_SHOW_ALL;
  spec->magnify = 1;
}

RgStatus
rugosa_chart_spec_check (const RugosaChartSpec *spec, RgError *err)
{
  if (!(spec->width >= 200 && spec->width <= 20000 && spec->height >= 150
        && spec->height <= 20000))
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The chart size must lie between 200 × 150 and 20000 × 20000 pixels.");
  if (!(spec->scale >= 1 && spec->scale <= 4))
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The chart scale factor must lie between 1 and 4.");
  if (!(spec->magnify == 0 || (spec->magnify >= 1 && spec->magnify <= RUGOSA_CHART_MAGNIFY_MAX)))
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The chart's text magnification must lie between 1 and %d.",
                         RUGOSA_CHART_MAGNIFY_MAX);
  /* The window a project may hold (model/rugosa-fields.h) is what the
   * chart draws. */
  if (!(spec->re_min >= RUGOSA_CHART_RE_LOWEST && spec->re_max <= RUGOSA_CHART_RE_HIGHEST
        && spec->re_max >= spec->re_min * RUGOSA_CHART_RE_SPAN_MIN))
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The Reynolds axis must span at least one decade between %g and %g.",
                         RUGOSA_CHART_RE_LOWEST, RUGOSA_CHART_RE_HIGHEST);
  if (!(spec->f_min >= RUGOSA_CHART_F_LOWEST && spec->f_max <= RUGOSA_CHART_F_HIGHEST
        && spec->f_max >= spec->f_min * RUGOSA_CHART_F_SPAN_MIN))
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The friction axis must lie between %g and %g with its top at least %g times its bottom.",
                         RUGOSA_CHART_F_LOWEST, RUGOSA_CHART_F_HIGHEST, RUGOSA_CHART_F_SPAN_MIN);
  if (rg_transition_check (&spec->transition, err) != RG_OK)
    return RG_ERR_DOMAIN;
  if (spec->n_family > RUGOSA_CHART_FAMILY_MAX)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The chart holds at most %d roughness curves.",
                         RUGOSA_CHART_FAMILY_MAX);
  for (size_t i = 0; i < spec->n_family; i++)
    if (!(spec->family[i] >= 0 && spec->family[i] <= RG_FRICTION_RR_MAX))
      return rg_error_set (err, RG_ERR_DOMAIN,
                           "Each curve's relative roughness must lie between 0 and %g.",
                           RG_FRICTION_RR_MAX);
  return RG_OK;
}

double
rugosa_chart_spec_text_size (const RugosaChartSpec *spec)
{
  ChartLayout lay;

  _rugosa_chart_layout (spec, &lay);
  return lay.font_tick;
}

void
_rugosa_chart_layout (const RugosaChartSpec *spec, ChartLayout *lay)
{
  const double w = spec->width, h = spec->height;
  double k = sqrt (w * h) / 1100.0;

  k = fmin (fmax (k, 0.75), 1.6);
  /* every size below follows k: type, markers, strokes, margins */
  if (spec->magnify > 0)
    k *= spec->magnify;
  lay->width = w;
  lay->height = h;
  lay->k = k;
  lay->font_tick = 12.0 * k;
  lay->font_title = 13.0 * k;
  lay->font_curve = 10.5 * k;
  lay->font_band = 11.0 * k;
  lay->font_label = 11.5 * k;
  lay->font_footer = 10.0 * k;

  lay->footer_h = 0;
  if (spec->footer_date[0] != '\0')
    {
      /* The footer wraps; DejaVu Sans averages under 0.62 em per character. */
      const double chars = (double) g_utf8_strlen (_(RUGOSA_CHART_CAUTION), -1) + 24.0;
      const double per_line = fmax (1.0, (w - 32.0 * k) / (0.62 * lay->font_footer));
      const double lines = ceil (chars / per_line);
      lay->footer_h = lines * lay->font_footer * 1.3 + 12.0 * k;
    }

  /* The heading: the title on one line (cut with an ellipsis), the
   * conditions wrapped like the footer. */
  lay->heading_h = 0;
  if (spec->title[0] != '\0')
    {
      lay->heading_h = 10.0 * k + lay->font_title * 1.3 * 1.35;
      if (spec->conditions[0] != '\0')
        {
          const double chars = (double) g_utf8_strlen (spec->conditions, -1);
          const double per_line = fmax (1.0, (w - 32.0 * k) / (0.62 * lay->font_footer * 1.1));
          lay->heading_h += ceil (chars / per_line) * lay->font_footer * 1.1 * 1.35;
        }
      lay->heading_h = ceil (lay->heading_h);
    }

  const double left = 14 * k + lay->font_title * 1.5 + lay->font_tick * 3.6;
  /* A wide chart (twice as wide as high or more) gives the legend a
   * column of its own beside the plot, where it hides nothing. */
  lay->side_w = 0;
  if ((spec->show & RUGOSA_CHART_SHOW_LEGEND) && w >= 2.0 * h)
    lay->side_w = round (fmin (fmax (0.17 * w, 170 * k), 300 * k));
  const double right = 20 * k + lay->side_w;
  const double top = 10 * k + lay->font_title * 1.5 + lay->font_tick * 1.5
                     + lay->heading_h;
  const double bottom = 10 * k + lay->font_tick * 1.9 + lay->font_title * 1.7
                        + lay->footer_h;

  lay->plot.x = round (left);
  lay->plot.y = round (top);
  lay->plot.width = round (w - left - right);
  lay->plot.height = round (h - top - bottom);
  lay->lx0 = log10 (spec->re_min);
  lay->lx1 = log10 (spec->re_max);
  lay->ly0 = log10 (spec->f_min);
  lay->ly1 = log10 (spec->f_max);
}

void
_rugosa_chart_xy (const ChartLayout *lay, double re, double f, double *x,
                  double *y)
{
  *x = lay->plot.x + (log10 (re) - lay->lx0) / (lay->lx1 - lay->lx0) * lay->plot.width;
  *y = lay->plot.y + lay->plot.height
       - (log10 (f) - lay->ly0) / (lay->ly1 - lay->ly0) * lay->plot.height;
}

void
_rugosa_chart_value (const ChartLayout *lay, double x, double y, double *re,
                     double *f)
{
  *re = pow (10.0, lay->lx0 + (x - lay->plot.x) / lay->plot.width * (lay->lx1 - lay->lx0));
  *f = pow (10.0, lay->ly0 + (lay->plot.y + lay->plot.height - y) / lay->plot.height
                              * (lay->ly1 - lay->ly0));
}

RgStatus
rugosa_chart_rr_through (double re, double f, double *rr, RgError *err)
{
  if (!(re >= RG_FRICTION_RE_MIN && re <= RG_FRICTION_RE_MAX))
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The Reynolds number must lie between %g and %g for a Colebrook curve.",
                         RG_FRICTION_RE_MIN, RG_FRICTION_RE_MAX);
  if (!(f > 0 && f <= 1))
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The friction factor must lie between 0 and 1.");
  const double s = sqrt (f);
  const double v = 3.7 * (pow (10.0, -0.5 / s) - 2.51 / (re * s));
  if (v < 0)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The point lies below the smooth-pipe Colebrook curve.");
  if (v > RG_FRICTION_RR_MAX)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The point lies above the Colebrook curve of relative roughness %g.",
                         RG_FRICTION_RR_MAX);
  *rr = v;
  return RG_OK;
}

void
_rugosa_chart_classify (const RugosaChartSpec *spec, const ChartLayout *lay,
                        double x, double y, RugosaChartProbe *out)
{
  memset (out, 0, sizeof *out);
  out->in_plot = x >= lay->plot.x && x <= lay->plot.x + lay->plot.width
                 && y >= lay->plot.y && y <= lay->plot.y + lay->plot.height;
  _rugosa_chart_value (lay, x, y, &out->re, &out->f);
  out->regime = rg_regime_classify (&spec->transition, out->re);
  out->zone = RG_ZONE_NONE;
  if (rugosa_chart_rr_through (out->re, out->f, &out->rr, NULL) == RG_OK)
    {
      out->has_rr = 1;
      /* rr_through has checked re and rr against the core's domain */
      if (out->regime == RG_REGIME_TURBULENT
          && rg_roughness_zone_classify (out->re, out->rr, &out->zone, NULL) != RG_OK)
        out->zone = RG_ZONE_NONE;
    }
}
