/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Chart text: one Pango context with fixed font options (no hinting, so
 * the same layout measures the same on screen, PNG, SVG and PDF), a cache
 * of laid-out strings, kept across background rebuilds because shaping
 * text is the dearest part of a frame, and the ways text is shown (plain,
 * with a halo, turned, on a knockout box). */
#include "chart-private.h"

#include <math.h>
#include <stdio.h>
#include <string.h>

/* A fixed family so that output is the same on every machine that has the
 * Debian package fonts-dejavu-core. */
#define CHART_FONT_FAMILY "DejaVu Sans"

static GQuark
size_quark (void)
{
  return g_quark_from_static_string ("rugosa-chart-text-size");
}

static void
ensure_context (RugosaChart *chart)
{
  if (chart->pango != NULL)
    return;
  PangoFontMap *map = pango_cairo_font_map_get_default ();
  chart->pango = pango_font_map_create_context (map);
  cairo_font_options_t *opt = cairo_font_options_create ();
  cairo_font_options_set_hint_style (opt, CAIRO_HINT_STYLE_NONE);
  cairo_font_options_set_hint_metrics (opt, CAIRO_HINT_METRICS_OFF);
  cairo_font_options_set_antialias (opt, CAIRO_ANTIALIAS_GRAY);
  pango_cairo_context_set_font_options (chart->pango, opt);
  cairo_font_options_destroy (opt);
  pango_context_set_language (chart->pango, pango_language_from_string ("en"));
  chart->layouts = g_hash_table_new_full (g_str_hash, g_str_equal, g_free,
                                          g_object_unref);
}

PangoLayout *
_rugosa_chart_text (RugosaChart *chart, const char *text, double size_px,
                    ChartTextStyle style, double wrap_width)
{
  ensure_context (chart);

  char stack_key[256];
  char *key = stack_key;
  int len = snprintf (stack_key, sizeof stack_key, "%d|%.3f|%.1f|%s",
                      (int) style, size_px, wrap_width, text);
  if (len < 0 || (size_t) len >= sizeof stack_key)
    key = g_strdup_printf ("%d|%.3f|%.1f|%s", (int) style, size_px,
                           wrap_width, text);

  PangoLayout *layout = g_hash_table_lookup (chart->layouts, key);
  if (layout != NULL)
    {
      if (key != stack_key)
        g_free (key);
      return layout;
    }
  /* still wanted: back from the older generation, which a trim drops */
  if (chart->layouts_old != NULL)
    {
      gpointer old_key, old_layout;
      if (g_hash_table_steal_extended (chart->layouts_old, key, &old_key, &old_layout))
        {
          g_hash_table_insert (chart->layouts, old_key, old_layout);
          if (key != stack_key)
            g_free (key);
          return old_layout;
        }
    }

  layout = pango_layout_new (chart->pango);
  PangoFontDescription *fd = pango_font_description_from_string (CHART_FONT_FAMILY);
  pango_font_description_set_absolute_size (fd, size_px * PANGO_SCALE);
  if (style == TEXT_BOLD)
    pango_font_description_set_weight (fd, PANGO_WEIGHT_BOLD);
  if (style == TEXT_CAPS)
    pango_font_description_set_weight (fd, PANGO_WEIGHT_SEMIBOLD);
  pango_layout_set_font_description (layout, fd);
  pango_font_description_free (fd);

  PangoAttrList *attrs = pango_attr_list_new ();
  if (style == TEXT_CAPS)
    {
      char *up = g_utf8_strup (text, -1);
      /* no letter spacing: spaced letters come out of a PDF as separate
       * words and the names could no longer be searched for */
      pango_layout_set_text (layout, up, -1);
      g_free (up);
    }
  else
    pango_layout_set_text (layout, text, -1);
  if (style == TEXT_FIRST_BOLD)
    {
      const char *nl = strchr (text, '\n');
      PangoAttribute *a = pango_attr_weight_new (PANGO_WEIGHT_BOLD);
      a->start_index = 0;
      a->end_index = nl ? (guint) (nl - text) : (guint) strlen (text);
      pango_attr_list_insert (attrs, a);
      pango_layout_set_spacing (layout, (int) (0.15 * size_px * PANGO_SCALE));
    }
  pango_layout_set_attributes (layout, attrs);
  pango_attr_list_unref (attrs);
  if (wrap_width > 0)
    {
      pango_layout_set_width (layout, (int) (wrap_width * PANGO_SCALE));
      pango_layout_set_wrap (layout, PANGO_WRAP_WORD);
    }

  /* Its size, measured once: pango_layout_get_size walks the lines on
   * every call, and label placement asks often. */
  int pw, ph;
  pango_layout_get_size (layout, &pw, &ph);
  double *size = g_new (double, 2);
  size[0] = (double) pw / PANGO_SCALE;
  size[1] = (double) ph / PANGO_SCALE;
  g_object_set_qdata_full (G_OBJECT (layout), size_quark (), size, g_free);

  g_hash_table_insert (chart->layouts,
                       key == stack_key ? g_strdup (key) : key, layout);
  return layout;
}

void
_rugosa_chart_text_size (PangoLayout *layout, double *w, double *h)
{
  const double *size = g_object_get_qdata (G_OBJECT (layout), size_quark ());
  if (size != NULL)
    {
      *w = size[0];
      *h = size[1];
      return;
    }
  int pw, ph;
  pango_layout_get_size (layout, &pw, &ph);
  *w = (double) pw / PANGO_SCALE;
  *h = (double) ph / PANGO_SCALE;
}

void
_rugosa_chart_set_rgba (cairo_t *cr, const RugosaChartRgba *c)
{
  cairo_set_source_rgba (cr, c->r, c->g, c->b, c->a);
}

void
_rugosa_chart_show (cairo_t *cr, PangoLayout *layout, double x, double y,
                    const RugosaChartRgba *ink, const RugosaChartRgba *halo,
                    double halo_width)
{
  if (halo != NULL && halo_width > 0)
    {
      cairo_save (cr);
      cairo_move_to (cr, x, y);
      pango_cairo_layout_path (cr, layout);
      _rugosa_chart_set_rgba (cr, halo);
      cairo_set_line_width (cr, halo_width);
      cairo_set_line_join (cr, CAIRO_LINE_JOIN_ROUND);
      cairo_stroke (cr);
      cairo_restore (cr);
    }
  cairo_move_to (cr, x, y);
  _rugosa_chart_set_rgba (cr, ink);
  pango_cairo_show_layout (cr, layout);
}

/* Bounding box of a w × h box centred at (cx, cy) and turned by `angle`. */
RugosaChartRect
_rugosa_chart_turned_box (double cx, double cy, double w, double h,
                          double angle, double pad)
{
  const double c = fabs (cos (angle)), s = fabs (sin (angle));
  const double bw = w * c + h * s + 2 * pad, bh = w * s + h * c + 2 * pad;
  RugosaChartRect r = { cx - bw / 2, cy - bh / 2, bw, bh };
  return r;
}

void
_rugosa_chart_show_turned (cairo_t *cr, PangoLayout *layout, double cx,
                           double cy, double angle, const RugosaChartRgba *ink,
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
void
_rugosa_chart_show_knockout (cairo_t *cr, PangoLayout *layout, double cx,
                             double cy, double angle,
                             const RugosaChartRgba *ink,
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
