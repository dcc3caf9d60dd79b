/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The chart object: the background cache, drawing, hit testing and export.
 *
 * Cache: the background (bands, grid, curves, their labels, axes, footer)
 * is painted once into an opaque image surface at the spec's scale factor
 * and kept until the spec, or the set of the lines' new-pipe roughness
 * values whose curves it shows, changes.  A change of the overlay only
 * (age, selection, hover) blits that surface and redraws the overlay. */
#include "chart-private.h"

#include <glib/gi18n-lib.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>



/* Marked for translation; shown through _() where drawn. */
const char *const RUGOSA_CHART_CAUTION =
  N_("Estimates from published correlations, valid only inside their stated "
     "ranges. Check designs against local codes and have them reviewed by a "
     "qualified, licensed engineer.");

const char *const RUGOSA_CHART_CAUTION_FULL =
  N_("Rugosa's numbers are estimates from published correlations and "
     "property formulations, each valid only inside its stated range; "
     "lines outside those ranges are flagged, not refused. Pipe sizing "
     "mistakes can hurt people: burst lines, starved fire protection, "
     "unsafe velocities in hazardous fluids. Check every design against "
     "the applicable local codes and have it reviewed by a qualified, "
     "licensed engineer.");

/* The text cache keeps two generations of layouts: when the one in use
 * grows past this many (an age slider makes new readout strings at every
 * step), the older one is dropped and a new one begun; a layout asked for
 * again moves back into use.  Dropping everything at once made the next
 * frame lay out every label and number again (115 ms at 1000 lines). */
enum { TEXT_CACHE_MAX = 4096 };

GQuark
rugosa_chart_error_quark (void)
{
  return g_quark_from_static_string ("rugosa-chart-error-quark");
}

RugosaChart *
rugosa_chart_new (void)
{
  RugosaChart *chart = g_new0 (RugosaChart, 1);
  rugosa_chart_spec_init (&chart->spec);
  _rugosa_chart_layout (&chart->spec, &chart->lay);
  chart->hover = -1;
  return chart;
}

static void
free_lines (RugosaChart *chart)
{
  for (size_t i = 0; i < chart->n_lines; i++)
    {
      ChartLine *cl = &chart->lines[i];
      g_free (cl->name);
      g_free (cl->velocity);
      g_free (cl->head100);
      g_free (cl->headtotal);
      g_free (cl->trail);
    }
  g_free (chart->lines);
  chart->lines = NULL;
  chart->n_lines = 0;
}

void
rugosa_chart_free (RugosaChart *chart)
{
  if (chart == NULL)
    return;
  free_lines (chart);
  _rugosa_chart_free_ladder (chart);
  _rugosa_chart_free_curves (chart);
  g_clear_pointer (&chart->bg, cairo_surface_destroy);
  g_clear_pointer (&chart->legend_img, cairo_surface_destroy);
  _rugosa_chart_free_legend (chart);
  if (chart->legend_key)
    g_string_free (chart->legend_key, TRUE);
  g_free (chart->labels);
  if (chart->layouts)
    g_hash_table_destroy (chart->layouts);
  if (chart->layouts_old)
    g_hash_table_destroy (chart->layouts_old);
  g_clear_object (&chart->pango);
  g_free (chart);
}

static void
invalidate_all (RugosaChart *chart)
{
  _rugosa_chart_free_curves (chart);
  chart->n_bg_boxes = 0;
  chart->bg_boxes_valid = 0;
  /* the surface itself is kept for reuse: a new 1600 × 1000 image costs
   * as much as filling the bands */
  chart->bg_valid = 0;
  chart->placement_valid = 0;
}

static void
trim_text_cache (RugosaChart *chart)
{
  if (chart->layouts != NULL && g_hash_table_size (chart->layouts) > TEXT_CACHE_MAX)
    {
      /* labels look their layouts up again when drawn: none is borrowed */
      if (chart->layouts_old != NULL)
        g_hash_table_destroy (chart->layouts_old);
      chart->layouts_old = chart->layouts;
      chart->layouts = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, g_object_unref);
    }
}

static int
spec_equal (const RugosaChartSpec *a, const RugosaChartSpec *b)
{
  if (a->width != b->width || a->height != b->height || a->scale != b->scale
      || a->theme != b->theme || a->re_min != b->re_min || a->re_max != b->re_max
      || a->f_min != b->f_min || a->f_max != b->f_max
      || a->transition.re_laminar_max != b->transition.re_laminar_max
      || a->transition.re_turbulent_min != b->transition.re_turbulent_min
      || a->n_family != b->n_family || a->show != b->show
      || a->magnify != b->magnify
      || strcmp (a->footer_date, b->footer_date) != 0
      || strcmp (a->title, b->title) != 0
      || strcmp (a->conditions, b->conditions) != 0)
    return 0;
  for (size_t i = 0; i < a->n_family; i++)
    if (a->family[i] != b->family[i])
      return 0;
  return 1;
}

RgStatus
rugosa_chart_set_spec (RugosaChart *chart, const RugosaChartSpec *spec,
                       RgError *err)
{
  RgStatus st = rugosa_chart_spec_check (spec, err);
  if (st != RG_OK)
    return st;
  if (spec_equal (spec, &chart->spec))
    {
      /* the age only names the legend's aging key: the legend may change
       * size, the background stays */
      if (strncmp (spec->age_text, chart->spec.age_text, RUGOSA_CHART_DATE_MAX) != 0)
        {
          g_strlcpy (chart->spec.age_text, spec->age_text, RUGOSA_CHART_DATE_MAX);
          chart->placement_stale = 1;
        }
      return RG_OK;
    }
  chart->spec = *spec;
  chart->spec.footer_date[RUGOSA_CHART_DATE_MAX - 1] = '\0';
  chart->spec.title[RUGOSA_CHART_TITLE_MAX - 1] = '\0';
  chart->spec.conditions[RUGOSA_CHART_CONDITIONS_MAX - 1] = '\0';
  chart->spec.age_text[RUGOSA_CHART_DATE_MAX - 1] = '\0';
  _rugosa_chart_layout (&chart->spec, &chart->lay);
  trim_text_cache (chart);
  invalidate_all (chart);
  return RG_OK;
}

const RugosaChartSpec *
rugosa_chart_get_spec (const RugosaChart *chart)
{
  return &chart->spec;
}

static int
cmp_double (const void *a, const void *b)
{
  const double x = *(const double *) a, y = *(const double *) b;
  return (x > y) - (x < y);
}

void
rugosa_chart_set_lines (RugosaChart *chart, const RugosaChartLine *lines,
                        size_t n_lines)
{
  double rr[CHART_CURVES_MAX];
  size_t n_rr = 0;

  free_lines (chart);
  chart->lines = g_new0 (ChartLine, n_lines ? n_lines : 1);
  chart->n_lines = n_lines;
  for (size_t i = 0; i < n_lines; i++)
    {
      ChartLine *cl = &chart->lines[i];
      cl->line = lines[i];
      cl->name = g_strdup (lines[i].name ? lines[i].name : "");
      cl->velocity = g_strdup (lines[i].readout_velocity);
      cl->head100 = g_strdup (lines[i].readout_head_per_100m);
      cl->headtotal = g_strdup (lines[i].readout_head_total);
      cl->trail = lines[i].n_trail
                    ? g_memdup2 (lines[i].trail, lines[i].n_trail * sizeof (RugosaChartPoint))
                    : NULL;
      cl->line.name = cl->name;
      cl->line.readout_velocity = cl->velocity;
      cl->line.readout_head_per_100m = cl->head100;
      cl->line.readout_head_total = cl->headtotal;
      cl->line.trail = cl->trail;
      const double v = lines[i].rr_new;
      /* in a crowd, only the curves of the lines that stand out */
      const int shown = n_lines <= CHART_CROWD || lines[i].selected || lines[i].pinned;
      if (shown && v >= 0 && v <= 0.1 && n_rr < CHART_CURVES_MAX - RUGOSA_CHART_FAMILY_MAX)
        rr[n_rr++] = v;
    }
  qsort (rr, n_rr, sizeof rr[0], cmp_double);
  size_t m = 0;
  for (size_t i = 0; i < n_rr; i++)
    if (m == 0 || rr[i] != rr[m - 1])
      rr[m++] = rr[i];

  if (m != chart->n_user_rr || memcmp (rr, chart->user_rr, m * sizeof rr[0]) != 0)
    {
      memcpy (chart->user_rr, rr, m * sizeof rr[0]);
      chart->n_user_rr = m;
      invalidate_all (chart);
    }
  if (chart->hover >= (int) n_lines)
    chart->hover = -1;
  trim_text_cache (chart);
  /* placed again only if the labels would move (ensure_placement) */
  chart->placement_stale = 1;
}

void
rugosa_chart_set_hover (RugosaChart *chart, int index)
{
  if (index < -1 || index >= (int) chart->n_lines)
    index = -1;
  chart->hover = index;
}

unsigned
rugosa_chart_placements (const RugosaChart *chart)
{
  return chart->placements;
}

void
rugosa_chart_invalidate_background (RugosaChart *chart)
{
  invalidate_all (chart);
}

unsigned
rugosa_chart_background_builds (const RugosaChart *chart)
{
  return chart->bg_builds;
}

static void
build_background (RugosaChart *chart)
{
  const double s = chart->spec.scale;
  const int w = (int) ceil (chart->spec.width * s);
  const int h = (int) ceil (chart->spec.height * s);
  /* ARGB32 like the surfaces GTK and the exports draw on, so the blit is
   * a plain copy (an RGB24 source would need its alpha set per pixel). */
  if (chart->bg != NULL
      && (cairo_image_surface_get_width (chart->bg) != w
          || cairo_image_surface_get_height (chart->bg) != h))
    g_clear_pointer (&chart->bg, cairo_surface_destroy);
  if (chart->bg == NULL)
    chart->bg = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, w, h);
  cairo_surface_set_device_scale (chart->bg, s, s);
  cairo_t *cr = cairo_create (chart->bg);
  _rugosa_chart_draw_background (chart, cr);
  _rugosa_chart_draw_footer (chart, cr);
  _rugosa_chart_draw_heading (chart, cr);
  cairo_destroy (cr);
  cairo_surface_flush (chart->bg);
  chart->bg_valid = 1;
  chart->bg_builds++;
}

void
_rugosa_chart_ensure_placement (RugosaChart *chart)
{
  /* a placement made before the background's labels were known is made
   * again once they are */
  if (chart->placement_valid && chart->bg_boxes_valid && !chart->placement_saw_bg_boxes)
    chart->placement_valid = 0;
  if (chart->placement_valid && chart->placement_stale)
    {
      chart->placement_valid = _rugosa_chart_placement_holds (chart);
      chart->placement_stale = 0;
    }
  if (!chart->placement_valid)
    _rugosa_chart_place_labels (chart);
}

void
rugosa_chart_draw (RugosaChart *chart, cairo_t *cr)
{
  if (!chart->bg_valid)
    build_background (chart);
  cairo_save (cr);
  cairo_rectangle (cr, 0, 0, chart->spec.width, chart->spec.height);
  cairo_clip (cr);
  cairo_set_source_surface (cr, chart->bg, 0, 0);
  /* the background is opaque: copy it rather than blend it */
  cairo_set_operator (cr, CAIRO_OPERATOR_SOURCE);
  cairo_paint (cr);
  cairo_restore (cr);
  _rugosa_chart_draw_ladder (chart, cr);
  _rugosa_chart_draw_overlay (chart, cr, 1);
}

void
rugosa_chart_draw_direct (RugosaChart *chart, cairo_t *cr)
{
  if (!chart->geom_valid)
    _rugosa_chart_build_curves (chart);
  cairo_save (cr);
  _rugosa_chart_draw_background (chart, cr);
  _rugosa_chart_draw_footer (chart, cr);
  _rugosa_chart_draw_heading (chart, cr);
  cairo_restore (cr);
  _rugosa_chart_draw_ladder (chart, cr);
  _rugosa_chart_draw_overlay (chart, cr, 0);
}

RugosaChartRect
rugosa_chart_plot_area (RugosaChart *chart)
{
  return chart->lay.plot;
}

void
rugosa_chart_to_device (RugosaChart *chart, double re, double f, double *x,
                        double *y)
{
  _rugosa_chart_xy (&chart->lay, re, f, x, y);
}

void
rugosa_chart_from_device (RugosaChart *chart, double x, double y, double *re,
                          double *f)
{
  _rugosa_chart_value (&chart->lay, x, y, re, f);
}

void
rugosa_chart_probe (RugosaChart *chart, double x, double y,
                    RugosaChartProbe *out)
{
  _rugosa_chart_classify (&chart->spec, &chart->lay, x, y, out);
}


int
rugosa_chart_hit_test (RugosaChart *chart, double x, double y, double radius)
{
  _rugosa_chart_ensure_placement (chart);
  int best = -1;
  double best_d = radius;
  for (size_t i = 0; i < chart->n_lines; i++)
    {
      const RugosaChartLabelInfo *li = &chart->labels[i].info;
      const RugosaChartRect *m = &li->marker;
      if (m->width == 0)
        continue;
      /* distance to the marker's centre line (a point, or the bar of a
       * transitional point), less its half width */
      const double cx = m->x + m->width / 2;
      const double half = m->width / 2;
      const double cy = fmin (fmax (y, m->y + half), m->y + m->height - half);
      const double d = fmax (0.0, hypot (x - cx, y - cy) - half);
      if (d <= best_d)
        {
          best_d = d;
          best = (int) i;
        }
    }
  if (best >= 0)
    return best;
  /* labels drawn last (the selected one) lie on top */
  for (int pass = 0; pass < 2; pass++)
    for (size_t i = 0; i < chart->n_lines; i++)
      {
        const RugosaChartLabelInfo *li = &chart->labels[i].info;
        if ((pass == 0) != (chart->lines[i].line.selected != 0) || !li->visible)
          continue;
        if (x >= li->box.x && x <= li->box.x + li->box.width && y >= li->box.y
            && y <= li->box.y + li->box.height)
          return (int) i;
      }
  /* then the numbers beside unlabelled markers */
  for (size_t i = 0; i < chart->n_lines; i++)
    {
      const RugosaChartLabelInfo *li = &chart->labels[i].info;
      if (li->numbered && x >= li->tag.x && x <= li->tag.x + li->tag.width
          && y >= li->tag.y && y <= li->tag.y + li->tag.height)
        return (int) i;
    }
  return -1;
}

int
rugosa_chart_get_label (RugosaChart *chart, size_t index,
                        RugosaChartLabelInfo *out)
{
  if (index >= chart->n_lines)
    return 0;
  _rugosa_chart_ensure_placement (chart);
  *out = chart->labels[index].info;
  return 1;
}

RugosaChartRect
rugosa_chart_legend_box (RugosaChart *chart)
{
  _rugosa_chart_ensure_placement (chart);
  return chart->legend;
}

double
rugosa_chart_callout_share (RugosaChart *chart)
{
  _rugosa_chart_ensure_placement (chart);
  const RugosaChartRect *pl = &chart->lay.plot;
  double covered = 0;
  for (size_t i = 0; i < chart->n_lines; i++)
    {
      const RugosaChartLabelInfo *li = &chart->labels[i].info;
      if (li->visible)
        covered += li->box.width * li->box.height;
      if (li->numbered)
        covered += li->tag.width * li->tag.height;
    }
  return pl->width > 0 && pl->height > 0 ? covered / (pl->width * pl->height) : 0;
}

/* --- export --- */

static void
export_draw (cairo_t *cr, gpointer data)
{
  rugosa_chart_draw_direct (data, cr);
}

void
rugosa_chart_lines_for_export (RugosaChartLine *lines, size_t n_lines)
{
  /* the selected line keeps its label, as a pinned one, without the ring */
  for (size_t i = 0; i < n_lines; i++)
    if (lines[i].selected)
      {
        lines[i].selected = 0;
        lines[i].pinned = 1;
      }
}

gboolean
rugosa_chart_export (const RugosaChartSpec *spec, const RugosaChartLine *lines,
                     size_t n_lines, RugosaChartFormat format, double width,
                     double height, const char *date, const char *path,
                     GError **error)
{
  RugosaChartSpec s = *spec;
  RgError err = { 0 };
  RugosaChart *chart;
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
  if (rugosa_chart_spec_check (&s, &err) != RG_OK)
    {
      g_set_error_literal (error, RUGOSA_CHART_ERROR, RUGOSA_CHART_ERROR_INVALID,
                           err.text);
      return FALSE;
    }

  /* hover and the probe belong to the window's chart and never reach a
   * new one; the selection is dropped here */
  RugosaChartLine *shown = g_memdup2 (lines, (n_lines ? n_lines : 1) * sizeof *lines);
  rugosa_chart_lines_for_export (shown, n_lines);
  chart = rugosa_chart_new ();
  rugosa_chart_set_spec (chart, &s, NULL);
  rugosa_chart_set_lines (chart, shown, n_lines);
  g_free (shown);
  ok = _rugosa_chart_export_surface (format, width, height, s.footer_date,
                                     _("Friction chart"), path, export_draw, chart, error);
  rugosa_chart_free (chart);
  return ok;
}
