/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Tests of the friction chart (src/chart): transforms, the zone bands as
 * drawn against the core's zone rule (regime.c), pixel probes, label
 * placement on crowded scenes, hit testing, the background cache and the
 * three export formats. */
#include <gdk-pixbuf/gdk-pixbuf.h>
#include <glib/gstdio.h>
#include <math.h>
#include <string.h>

#include "test-chart-sample.h"

/* Date passed to exports, so that output is reproducible. */
#define TEST_DATE "2026-12-02"

static RugosaChart *
chart_with (double w, double h, unsigned show, RugosaChartTheme theme)
{
  RugosaChartSpec spec;
  RgError err = { 0 };
  rugosa_chart_spec_init (&spec);
  spec.width = w;
  spec.height = h;
  spec.show = show;
  spec.theme = theme;
  RugosaChart *chart = rugosa_chart_new ();
  g_assert_cmpint (rugosa_chart_set_spec (chart, &spec, &err), ==, RG_OK);
  return chart;
}

static cairo_surface_t *
render (RugosaChart *chart)
{
  const RugosaChartSpec *spec = rugosa_chart_get_spec (chart);
  cairo_surface_t *s = cairo_image_surface_create (CAIRO_FORMAT_ARGB32,
                                                   (int) spec->width, (int) spec->height);
  cairo_t *cr = cairo_create (s);
  rugosa_chart_draw (chart, cr);
  cairo_destroy (cr);
  cairo_surface_flush (s);
  return s;
}

/* The pixel holding device point (x, y), as 0–255 RGB. */
static void
pixel (cairo_surface_t *s, double x, double y, int rgb[3])
{
  const int ix = (int) floor (x), iy = (int) floor (y);
  const unsigned char *d = cairo_image_surface_get_data (s);
  const int stride = cairo_image_surface_get_stride (s);
  g_assert_cmpint (ix, >=, 0);
  g_assert_cmpint (iy, >=, 0);
  g_assert_cmpint (ix, <, cairo_image_surface_get_width (s));
  g_assert_cmpint (iy, <, cairo_image_surface_get_height (s));
  const guint32 v = *(const guint32 *) (d + iy * stride + ix * 4);
  rgb[0] = (v >> 16) & 0xff;
  rgb[1] = (v >> 8) & 0xff;
  rgb[2] = v & 0xff;
}

static int
colour_distance (const int rgb[3], const RugosaChartRgba *c)
{
  const int e[3] = { (int) lround (c->r * 255), (int) lround (c->g * 255),
                     (int) lround (c->b * 255) };
  int d = 0;
  for (int i = 0; i < 3; i++)
    d = MAX (d, abs (rgb[i] - e[i]));
  return d;
}

/* --- description and transforms --- */

static void
test_spec_defaults (void)
{
  RugosaChartSpec spec;
  RgError err = { 0 };
  rugosa_chart_spec_init (&spec);
  /* Common practice (no single source): friction charts run Re from the
   * laminar range (a few hundred) to 1e8 and f from about 0.006 to 0.1. */
  g_assert_cmpfloat (spec.re_min, ==, 500);
  g_assert_cmpfloat (spec.re_max, ==, 1e8);
  g_assert_cmpfloat (spec.f_min, ==, 0.006);
  g_assert_cmpfloat (spec.f_max, ==, 0.1);
  /* Common practice (no single source): laminar below Re 2000, turbulent
   * above Re 4000 (the core's rg_transition_default). */
  g_assert_cmpfloat (spec.transition.re_laminar_max, ==, 2000);
  g_assert_cmpfloat (spec.transition.re_turbulent_min, ==, 4000);
  g_assert_cmpfloat (spec.family[0], ==, 0);
  g_assert_cmpint (rugosa_chart_spec_check (&spec, &err), ==, RG_OK);

  RugosaChartSpec bad = spec;
  bad.re_max = bad.re_min; /* an empty axis */
  g_assert_cmpint (rugosa_chart_spec_check (&bad, &err), ==, RG_ERR_DOMAIN);
  g_assert_true (strstr (err.text, "Reynolds") != NULL);
  bad = spec;
  bad.family[3] = 0.5; /* beyond the core's ε/D maximum */
  g_assert_cmpint (rugosa_chart_spec_check (&bad, &err), ==, RG_ERR_DOMAIN);
  bad = spec;
  bad.width = 10;
  g_assert_cmpint (rugosa_chart_spec_check (&bad, &err), ==, RG_ERR_DOMAIN);
}

static void
test_transform_roundtrip (void)
{
  RugosaChart *chart = chart_with (1600, 1000, RUGOSA_CHART_SHOW_ALL, RUGOSA_CHART_THEME_LIGHT);
  const RugosaChartRect pl = rugosa_chart_plot_area (chart);
  double x, y, re, f;

  /* The axis ends map to the plot corners.  Common practice (no single
   * source): a round trip through log10 and pow loses a few ulps, so 1e-9
   * pixel and 1e-12 relative are generous. */
  rugosa_chart_to_device (chart, 500, 0.006, &x, &y);
  g_assert_cmpfloat_with_epsilon (x, pl.x, 1e-9);
  g_assert_cmpfloat_with_epsilon (y, pl.y + pl.height, 1e-9);
  rugosa_chart_to_device (chart, 1e8, 0.1, &x, &y);
  g_assert_cmpfloat_with_epsilon (x, pl.x + pl.width, 1e-9);
  g_assert_cmpfloat_with_epsilon (y, pl.y, 1e-9);

  GRand *rand = g_rand_new_with_seed (11);
  for (int i = 0; i < 1000; i++)
    {
      const double re0 = pow (10.0, g_rand_double_range (rand, 2.0, 8.5));
      const double f0 = pow (10.0, g_rand_double_range (rand, -2.5, -0.8));
      rugosa_chart_to_device (chart, re0, f0, &x, &y);
      rugosa_chart_from_device (chart, x, y, &re, &f);
      g_assert_cmpfloat (fabs (re / re0 - 1), <, 1e-12);
      g_assert_cmpfloat (fabs (f / f0 - 1), <, 1e-12);
      const double x0 = g_rand_double_range (rand, 0, 1600), y0 = g_rand_double_range (rand, 0, 1000);
      rugosa_chart_from_device (chart, x0, y0, &re, &f);
      rugosa_chart_to_device (chart, re, f, &x, &y);
      g_assert_cmpfloat (fabs (x - x0), <, 1e-9);
      g_assert_cmpfloat (fabs (y - y0), <, 1e-9);
    }
  g_rand_free (rand);
  rugosa_chart_free (chart);
}

/* --- curves and zones against the core --- */

static void
test_rr_through (void)
{
  /* Source: Colebrook (1939) is linear in ε/D, so the inverse must return
   * the ε/D the core's rg_friction_colebrook was given.  Common practice
   * (no single source): 1e-6 relative, since near the smooth curve f hardly
   * depends on ε/D (elasticity down to about 1e-3), which magnifies the
   * solver's 1e-13 in f by up to 1e3 in ε/D, plus cancellation. */
  static const double RE[] = { 4e3, 1e4, 1e5, 1e6, 1e7, 1e8 };
  static const double RR[] = { 1e-5, 1e-4, 1e-3, 1e-2, 5e-2 };
  RgError err = { 0 };
  for (size_t i = 0; i < G_N_ELEMENTS (RE); i++)
    for (size_t j = 0; j < G_N_ELEMENTS (RR); j++)
      {
        double f, rr;
        g_assert_cmpint (rg_friction_colebrook (RE[i], RR[j], &f, NULL), ==, RG_OK);
        g_assert_cmpint (rugosa_chart_rr_through (RE[i], f, &rr, &err), ==, RG_OK);
        g_assert_cmpfloat (fabs (rr / RR[j] - 1), <, 1e-6);
      }
  /* below the smooth-pipe curve: no ε/D */
  double f_smooth, rr;
  g_assert_cmpint (rg_friction_colebrook (1e5, 0, &f_smooth, NULL), ==, RG_OK);
  g_assert_cmpint (rugosa_chart_rr_through (1e5, f_smooth * 0.9, &rr, &err), ==, RG_ERR_DOMAIN);
  g_assert_true (strstr (err.text, "smooth") != NULL);
}

/* The chart's hover probe agrees with the core's classification at random
 * points of the turbulent part of the plot. */
static void
test_probe_zones (void)
{
  RugosaChart *chart = chart_with (1600, 1000, RUGOSA_CHART_SHOW_ALL, RUGOSA_CHART_THEME_LIGHT);
  const RugosaChartRect pl = rugosa_chart_plot_area (chart);
  GRand *rand = g_rand_new_with_seed (5);
  int checked = 0, seen[4] = { 0 };
  for (int i = 0; i < 2000; i++)
    {
      const double x = pl.x + g_rand_double (rand) * pl.width;
      const double y = pl.y + g_rand_double (rand) * pl.height;
      RugosaChartProbe pr;
      rugosa_chart_probe (chart, x, y, &pr);
      g_assert_true (pr.in_plot);
      if (pr.regime != RG_REGIME_TURBULENT || !pr.has_rr)
        continue;
      double f;
      g_assert_cmpint (rg_friction_colebrook (pr.re, pr.rr, &f, NULL), ==, RG_OK);
      /* Common practice (no single source): 1e-9 relative, as above */
      g_assert_cmpfloat (fabs (f / pr.f - 1), <, 1e-9);
      /* Source: the core's zone rule at the probe's (Re, ε/D) */
      RgRoughnessZone zone;
      g_assert_cmpint (rg_roughness_zone_classify (pr.re, pr.rr, &zone, NULL), ==, RG_OK);
      g_assert_cmpint (pr.zone, ==, zone);
      seen[zone]++;
      checked++;
    }
  g_test_message ("probe: %d checked; smooth %d, transitionally rough %d, fully rough %d",
                  checked, seen[RG_ZONE_SMOOTH], seen[RG_ZONE_TRANSITIONALLY_ROUGH],
                  seen[RG_ZONE_FULLY_ROUGH]);
  g_assert_cmpint (checked, >, 500);
  /* the smooth zone is a thin strip: random points seldom fall in it */
  g_assert_cmpint (seen[RG_ZONE_TRANSITIONALLY_ROUGH], >, 100);
  g_assert_cmpint (seen[RG_ZONE_FULLY_ROUGH], >, 100);
  g_rand_free (rand);
  rugosa_chart_free (chart);
}

/* --- pixels --- */

static void
test_pixel_laminar_line (void)
{
  for (int theme = 0; theme < 2; theme++)
    {
      RugosaChart *chart = chart_with (1600, 1000, RUGOSA_CHART_SHOW_ALL, theme);
      RugosaChartPalette pal;
      rugosa_chart_palette (theme, &pal);
      cairo_surface_t *s = render (chart);
      double x, y;
      int rgb[3];
      /* From memory of White, Fluid Mechanics (laminar pipe flow,
       * Hagen–Poiseuille): f = 64/Re, so f = 0.064 at Re = 1000; not checked
       * against the document. */
      rugosa_chart_to_device (chart, 1000, 0.064, &x, &y);
      pixel (s, x, y, rgb);
      /* Common practice (no single source): the centre pixel of a 2.5 px
       * line is fully covered; 6 levels allow for edge antialiasing */
      g_assert_cmpint (colour_distance (rgb, &pal.laminar_line), <=, 6);
      /* 12 px beside the line is band, not line */
      pixel (s, x + 12, y, rgb);
      g_assert_cmpint (colour_distance (rgb, &pal.laminar_line), >, 40);
      cairo_surface_destroy (s);
      rugosa_chart_free (chart);
    }
}

/* At scale factor 2 the cached background has twice the pixels, and the
 * line at Re 1000 and each line option's marker still sit at the
 * transform's position. */
static void
test_pixel_scale2 (void)
{
  static SampleSet set;
  RugosaChartSpec spec;
  RugosaChartPalette pal;
  sample_scene (&set);
  rugosa_chart_spec_init (&spec);
  spec.width = 900;
  spec.height = 560;
  spec.scale = 2;
  RugosaChart *chart = rugosa_chart_new ();
  g_assert_cmpint (rugosa_chart_set_spec (chart, &spec, NULL), ==, RG_OK);
  rugosa_chart_palette (spec.theme, &pal);
  cairo_surface_t *s = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, 1800, 1120);
  cairo_surface_set_device_scale (s, 2, 2);
  cairo_t *cr = cairo_create (s);
  rugosa_chart_draw (chart, cr);
  cairo_surface_flush (s);

  double x, y;
  int rgb[3];
  /* From memory of White, Fluid Mechanics: f = 64/Re in laminar flow; not
   * checked against the document.  6 levels as in /chart/pixels/laminar-line */
  rugosa_chart_to_device (chart, 1000, 0.064, &x, &y);
  pixel (s, 2 * x, 2 * y, rgb);
  g_assert_cmpint (colour_distance (rgb, &pal.laminar_line), <=, 6);

  /* the line options, drawn over the same surface */
  rugosa_chart_set_lines (chart, set.lines, set.n);
  rugosa_chart_draw (chart, cr);
  cairo_destroy (cr);
  cairo_surface_flush (s);
  for (size_t i = 0; i < set.n; i++)
    {
      if (set.lines[i].regime == RG_REGIME_TRANSITIONAL)
        continue;
      rugosa_chart_to_device (chart, set.lines[i].re, set.lines[i].f, &x, &y);
      pixel (s, 2 * x, 2 * y, rgb);
      /* Common practice (no single source): the centre of a filled marker
       * is its colour to within rounding */
      g_assert_cmpint (colour_distance (rgb, &set.lines[i].colour), <=, 2);
    }
  cairo_surface_destroy (s);
  rugosa_chart_free (chart);
}

typedef struct {
  double re, f;
  RgRegime regime;
  RgRoughnessZone zone;
} BandPoint;

static const RugosaChartRgba *
expected_band (const RugosaChartPalette *p, RgRegime regime, RgRoughnessZone zone)
{
  if (regime == RG_REGIME_LAMINAR)
    return &p->band_laminar;
  if (regime == RG_REGIME_TRANSITIONAL)
    return &p->band_transitional;
  switch (zone)
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

/* Re where the Colebrook curve of rr crosses the edge of the smooth zone,
 * by bisection on the core's edge (its ε/D falls as Re grows). */
static double
smooth_edge_re (double rr)
{
  double lo = log10 (RG_FRICTION_RE_MIN), hi = log10 (RG_FRICTION_RE_MAX);
  for (int i = 0; i < 100; i++)
    {
      const double mid = 0.5 * (lo + hi);
      double rr_edge, f;
      g_assert_cmpint (rg_roughness_zone_smooth_edge (pow (10.0, mid), &rr_edge, &f, NULL), ==, RG_OK);
      if (rr_edge > rr)
        lo = mid;
      else
        hi = mid;
    }
  return pow (10.0, 0.5 * (lo + hi));
}

static void
test_pixel_bands (void)
{
  RgTransition tr;
  rg_transition_default (&tr);
  for (int theme = 0; theme < 2; theme++)
    {
      RugosaChart *chart = chart_with (1600, 1000, RUGOSA_CHART_SHOW_BANDS, theme);
      RugosaChartPalette pal;
      rugosa_chart_palette (theme, &pal);
      cairo_surface_t *s = render (chart);
      /* Points well inside each zone, placed by the core's zone edges
       * (Source: the zone rule of regime.c): halfway across the thin smooth
       * strip (f = √1.02 times the smooth-pipe value) at Re 1e5 and 1e6; on
       * the curves of ε/D 1e-3 and 1e-5 halfway (in log Re) between the two
       * edges; and at ten times the Reynolds number of the fully rough edge
       * for ε/D 1e-3 and 1e-2. */
      struct { double re, f; RgRoughnessZone zone; } pts[6];
      size_t n = 0;
      static const double RE_SMOOTH[] = { 1e5, 1e6 };
      for (size_t i = 0; i < G_N_ELEMENTS (RE_SMOOTH); i++)
        {
          double rr, f_edge, f_s;
          g_assert_cmpint (rg_roughness_zone_smooth_edge (RE_SMOOTH[i], &rr, &f_edge, NULL), ==, RG_OK);
          g_assert_cmpint (rg_friction_colebrook (RE_SMOOTH[i], 0, &f_s, NULL), ==, RG_OK);
          pts[n].re = RE_SMOOTH[i];
          pts[n].f = sqrt (f_s * f_edge);
          pts[n++].zone = RG_ZONE_SMOOTH;
        }
      static const double RR_MID[] = { 1e-3, 1e-5 };
      for (size_t i = 0; i < G_N_ELEMENTS (RR_MID); i++)
        {
          double re_r, f_r;
          g_assert_cmpint (rg_roughness_zone_rough_edge (RR_MID[i], &re_r, &f_r, NULL), ==, RG_OK);
          pts[n].re = sqrt (smooth_edge_re (RR_MID[i]) * re_r);
          g_assert_cmpint (rg_friction_colebrook (pts[n].re, RR_MID[i], &pts[n].f, NULL), ==, RG_OK);
          pts[n++].zone = RG_ZONE_TRANSITIONALLY_ROUGH;
        }
      static const double RR_ROUGH[] = { 1e-3, 1e-2 };
      for (size_t i = 0; i < G_N_ELEMENTS (RR_ROUGH); i++)
        {
          double re_r, f_r;
          g_assert_cmpint (rg_roughness_zone_rough_edge (RR_ROUGH[i], &re_r, &f_r, NULL), ==, RG_OK);
          pts[n].re = 10 * re_r;
          g_assert_cmpint (rg_friction_colebrook (pts[n].re, RR_ROUGH[i], &pts[n].f, NULL), ==, RG_OK);
          pts[n++].zone = RG_ZONE_FULLY_ROUGH;
        }
      for (size_t i = 0; i < n; i++)
        {
          double x, y, rr;
          int rgb[3];
          RgRoughnessZone zone;
          g_assert_cmpint (rugosa_chart_rr_through (pts[i].re, pts[i].f, &rr, NULL), ==, RG_OK);
          g_assert_cmpint (rg_roughness_zone_classify (pts[i].re, rr, &zone, NULL), ==, RG_OK);
          g_assert_cmpint (zone, ==, pts[i].zone);
          g_assert_cmpint (rg_regime_classify (&tr, pts[i].re), ==, RG_REGIME_TURBULENT);
          rugosa_chart_to_device (chart, pts[i].re, pts[i].f, &x, &y);
          pixel (s, x, y, rgb);
          /* Common practice (no single source): a flat fill reproduces its
           * colour to within rounding (2 levels) */
          g_assert_cmpint (colour_distance (rgb, expected_band (&pal, RG_REGIME_TURBULENT, zone)), <=, 2);
        }
      /* the strips; the transitional one is hatched, so a hatch line may
       * darken the probed pixel: Common practice (no single source): an 8 %
       * ink hatch moves a channel by at most about 20 levels */
      double x, y;
      int rgb[3];
      rugosa_chart_to_device (chart, 1000, 0.015, &x, &y);
      pixel (s, x, y, rgb);
      g_assert_cmpint (colour_distance (rgb, &pal.band_laminar), <=, 2);
      rugosa_chart_to_device (chart, 2800, 0.08, &x, &y);
      pixel (s, x, y, rgb);
      g_assert_cmpint (colour_distance (rgb, &pal.band_transitional), <=, 22);
      /* below the smooth-pipe curve: plain plot */
      rugosa_chart_to_device (chart, 1e5, 0.008, &x, &y);
      pixel (s, x, y, rgb);
      g_assert_cmpint (colour_distance (rgb, &pal.plot), <=, 2);
      cairo_surface_destroy (s);
      rugosa_chart_free (chart);
    }
}

/* The drawn zone edges follow the core's rule: a pixel a few pixels to
 * either side of an edge point that the core computes shows the colour of
 * the zone the core gives its centre.  On the default axes and on a
 * narrow friction axis, where the thin smooth strip is wider on screen. */
static void
check_edge_side (RugosaChart *chart, cairo_surface_t *s, const RugosaChartPalette *pal,
                 double x, double y, double nx, double ny, double d,
                 RgRoughnessZone want, int *checked)
{
  const RugosaChartRect pl = rugosa_chart_plot_area (chart);
  const double cx = floor (x + d * nx) + 0.5, cy = floor (y + d * ny) + 0.5;
  if (cx < pl.x + 4 || cx > pl.x + pl.width - 4 || cy < pl.y + 4 || cy > pl.y + pl.height - 4)
    return;
  RugosaChartProbe pr;
  rugosa_chart_probe (chart, cx, cy, &pr);
  if (pr.regime != RG_REGIME_TURBULENT)
    return;
  double re, f, rr;
  RgRoughnessZone zone;
  rugosa_chart_from_device (chart, cx, cy, &re, &f);
  /* Source: the core's zone rule at the pixel's centre */
  g_assert_cmpint (rugosa_chart_rr_through (re, f, &rr, NULL), ==, RG_OK);
  g_assert_cmpint (rg_roughness_zone_classify (re, rr, &zone, NULL), ==, RG_OK);
  g_assert_cmpint (zone, ==, want);
  int rgb[3];
  pixel (s, cx, cy, rgb);
  const int dist = colour_distance (rgb, expected_band (pal, RG_REGIME_TURBULENT, zone));
  if (dist > 2)
    g_test_fail_printf ("pixel (%.1f, %.1f), Re %.4g, f %.5g: colour off the %s band by %d levels",
                        cx, cy, re, f, rg_roughness_zone_id (zone), dist);
  (*checked)++;
}

static void
test_pixel_zone_edges (void)
{
  static const double F_AXES[2][2] = { { 0.006, 0.1 }, { 0.01, 0.03 } };
  for (size_t a = 0; a < G_N_ELEMENTS (F_AXES); a++)
    {
      RugosaChartSpec spec;
      RugosaChartPalette pal;
      rugosa_chart_spec_init (&spec);
      spec.width = 1600;
      spec.height = 1000;
      spec.show = RUGOSA_CHART_SHOW_BANDS;
      spec.f_min = F_AXES[a][0];
      spec.f_max = F_AXES[a][1];
      RugosaChart *chart = rugosa_chart_new ();
      g_assert_cmpint (rugosa_chart_set_spec (chart, &spec, NULL), ==, RG_OK);
      rugosa_chart_palette (spec.theme, &pal);
      cairo_surface_t *s = render (chart);
      int checked_smooth = 0, checked_rough = 0;

      /* Smooth edge: the strip between it and the smooth-pipe curve is a
       * few pixels high, so the inside probe goes 40 % of the way across;
       * the outside one 3 px beyond the edge (clear of its dotted line). */
      for (double lre = 4.0; lre <= 8.0; lre += 0.25)
        {
          const double re = pow (10.0, lre);
          double rr, f, f_s, x, y, xs, ys, x1, y1, x2, y2, r1, r2, fa, fb;
          g_assert_cmpint (rg_roughness_zone_smooth_edge (re, &rr, &f, NULL), ==, RG_OK);
          g_assert_cmpint (rg_friction_colebrook (re, 0, &f_s, NULL), ==, RG_OK);
          rugosa_chart_to_device (chart, re, f, &x, &y);
          rugosa_chart_to_device (chart, re, f_s, &xs, &ys);
          g_assert_cmpint (rg_roughness_zone_smooth_edge (re / 1.05, &r1, &fa, NULL), ==, RG_OK);
          g_assert_cmpint (rg_roughness_zone_smooth_edge (re * 1.05, &r2, &fb, NULL), ==, RG_OK);
          rugosa_chart_to_device (chart, re / 1.05, fa, &x1, &y1);
          rugosa_chart_to_device (chart, re * 1.05, fb, &x2, &y2);
          const double len = hypot (x2 - x1, y2 - y1);
          /* normal pointing up, towards larger f */
          const double nx = (y2 - y1) / len, ny = -(x2 - x1) / len;
          const double across = (ys - y) * -ny; /* the strip's width along the normal */
          check_edge_side (chart, s, &pal, x, y, nx, ny, -0.4 * across,
                           RG_ZONE_SMOOTH, &checked_smooth);
          check_edge_side (chart, s, &pal, x, y, nx, ny, 3.0,
                           RG_ZONE_TRANSITIONALLY_ROUGH, &checked_smooth);
        }
      /* Fully rough edge, 3 px to either side. */
      for (double lrr = -6.0; lrr <= -1.25 + 1e-9; lrr += 0.25)
        {
          const double rr = pow (10.0, lrr);
          double re, f, x, y, x1, y1, x2, y2, ra, rb, fa, fb;
          g_assert_cmpint (rg_roughness_zone_rough_edge (rr, &re, &f, NULL), ==, RG_OK);
          rugosa_chart_to_device (chart, re, f, &x, &y);
          g_assert_cmpint (rg_roughness_zone_rough_edge (rr * 1.05, &ra, &fa, NULL), ==, RG_OK);
          g_assert_cmpint (rg_roughness_zone_rough_edge (rr / 1.05, &rb, &fb, NULL), ==, RG_OK);
          rugosa_chart_to_device (chart, ra, fa, &x1, &y1);
          rugosa_chart_to_device (chart, rb, fb, &x2, &y2);
          const double len = hypot (x2 - x1, y2 - y1);
          /* from larger to smaller ε/D the edge runs down to the right; the
           * normal (dy, −dx) points up and right, into the fully rough zone */
          const double nx = (y2 - y1) / len, ny = -(x2 - x1) / len;
          check_edge_side (chart, s, &pal, x, y, nx, ny, 3.0, RG_ZONE_FULLY_ROUGH, &checked_rough);
          check_edge_side (chart, s, &pal, x, y, nx, ny, -3.0,
                           RG_ZONE_TRANSITIONALLY_ROUGH, &checked_rough);
        }
      g_test_message ("f axis %g–%g: %d probes at the smooth edge, %d at the rough edge",
                      spec.f_min, spec.f_max, checked_smooth, checked_rough);
      g_assert_cmpint (checked_smooth, >=, 10);
      g_assert_cmpint (checked_rough, >=, 10);
      cairo_surface_destroy (s);
      rugosa_chart_free (chart);
    }
}

/* --- overlay: labels, hit testing --- */

static gboolean
overlap (const RugosaChartRect *a, const RugosaChartRect *b)
{
  return a->x < b->x + b->width && b->x < a->x + a->width
         && a->y < b->y + b->height && b->y < a->y + a->height;
}

/* No label or number leaves the plot or overlaps the legend, another
 * label or number, or a marker: its own never, another line's only for
 * the selected or a pinned line placed over the crowd as a last resort. */
static void
check_labels (RugosaChart *chart, const RugosaChartLine *lines, size_t n, size_t *shown)
{
  const RugosaChartRect pl = rugosa_chart_plot_area (chart);
  const RugosaChartRect legend = rugosa_chart_legend_box (chart);
  RugosaChartLabelInfo *info = g_new0 (RugosaChartLabelInfo, n);
  for (size_t i = 0; i < n; i++)
    g_assert_true (rugosa_chart_get_label (chart, i, &info[i]));
  for (size_t i = 0; i < n; i++)
    {
      const RugosaChartRect *boxes[2] = { info[i].visible ? &info[i].box : NULL,
                                          info[i].numbered ? &info[i].tag : NULL };
      g_assert_false (info[i].visible && info[i].numbered);
      if (info[i].visible)
        (*shown)++;
      for (int b = 0; b < 2; b++)
        {
          const RugosaChartRect *a = boxes[b];
          if (a == NULL)
            continue;
          g_assert_cmpfloat (a->x, >=, pl.x);
          g_assert_cmpfloat (a->y, >=, pl.y);
          g_assert_cmpfloat (a->x + a->width, <=, pl.x + pl.width);
          g_assert_cmpfloat (a->y + a->height, <=, pl.y + pl.height);
          g_assert_false (legend.width > 0 && overlap (a, &legend));
          for (size_t j = 0; j < n; j++)
            {
              const gboolean may_cover = b == 0 && j != i
                                         && (lines[i].selected || lines[i].pinned);
              if (info[j].marker.width > 0 && !may_cover)
                g_assert_false (overlap (a, &info[j].marker));
              if (j != i && info[j].visible)
                g_assert_false (overlap (a, &info[j].box));
              if (j != i && info[j].numbered)
                g_assert_false (overlap (a, &info[j].tag));
            }
        }
    }
  g_free (info);
}

/* A projected chart: magnify enlarges type and markers by its factor,
 * 0 and 1 leave the chart as it was, and the labels still keep apart. */
static void
test_magnify (void)
{
  static SampleSet set;
  RugosaChartSpec spec;
  RgError err = { 0 };
  RugosaChart *plain = chart_with (1920, 960, RUGOSA_CHART_SHOW_ALL, RUGOSA_CHART_THEME_LIGHT);
  RugosaChart *big = rugosa_chart_new ();
  RugosaChartLabelInfo a, b;
  RugosaChartRect pa, pb;
  size_t shown = 0;
  double t1, t0;

  rugosa_chart_spec_init (&spec);
  g_assert_cmpfloat (spec.magnify, ==, 1);
  spec.width = 1920;
  spec.height = 960;
  t1 = rugosa_chart_spec_text_size (&spec);
  spec.magnify = 0;
  t0 = rugosa_chart_spec_text_size (&spec);
  g_assert_cmpfloat (t0, ==, t1);
  g_assert_cmpint (rugosa_chart_spec_check (&spec, &err), ==, RG_OK);
  /* the factor itself: type 1.75 times the size */
  spec.magnify = 1.75;
  g_assert_cmpfloat_with_epsilon (rugosa_chart_spec_text_size (&spec) / t1, 1.75, 1e-12);
  g_assert_cmpint (rugosa_chart_set_spec (big, &spec, &err), ==, RG_OK);

  sample_scene (&set);
  rugosa_chart_set_lines (plain, set.lines, set.n);
  rugosa_chart_set_lines (big, set.lines, set.n);
  cairo_surface_destroy (render (plain));
  cairo_surface_destroy (render (big));
  g_assert_true (rugosa_chart_get_label (plain, 0, &a));
  g_assert_true (rugosa_chart_get_label (big, 0, &b));
  /* the selected marker (a circle) grows with the type, to the pixel */
  g_assert_cmpfloat (fabs (b.marker.width - 1.75 * a.marker.width), <=, 1.0);
  /* wider margins for larger axis numbers: a smaller plot */
  pa = rugosa_chart_plot_area (plain);
  pb = rugosa_chart_plot_area (big);
  g_assert_cmpfloat (pb.width, <, pa.width);
  g_assert_cmpfloat (pb.height, <, pa.height);
  check_labels (big, set.lines, set.n, &shown);
  g_assert_true (b.visible);

  spec.magnify = 0.5;
  g_assert_cmpint (rugosa_chart_spec_check (&spec, &err), ==, RG_ERR_DOMAIN);
  g_assert_true (strstr (err.text, "magnification") != NULL);
  spec.magnify = RUGOSA_CHART_MAGNIFY_MAX + 0.5;
  g_assert_cmpint (rugosa_chart_spec_check (&spec, &err), ==, RG_ERR_DOMAIN);
  spec.magnify = NAN;
  g_assert_cmpint (rugosa_chart_spec_check (&spec, &err), ==, RG_ERR_DOMAIN);
  rugosa_chart_free (plain);
  rugosa_chart_free (big);
}

static void
test_labels_crowded (void)
{
  GRand *rand = g_rand_new_with_seed (2026);
  static SampleSet set;
  size_t total = 0, shown = 0, total_small = 0, shown_small = 0;
  RugosaChart *chart = chart_with (1600, 1000, RUGOSA_CHART_SHOW_ALL, RUGOSA_CHART_THEME_LIGHT);
  for (int c = 0; c < 200; c++)
    {
      const size_t n = (size_t) g_rand_int_range (rand, 10, 31);
      sample_random (&set, rand, n);
      rugosa_chart_set_lines (chart, set.lines, set.n);
      check_labels (chart, set.lines, set.n, &shown);
      total += set.n;
      if (n <= 12)
        {
          size_t s = 0;
          check_labels (chart, set.lines, set.n, &s);
          shown_small += s;
          total_small += n;
        }
    }
  g_test_message ("labels shown: %zu of %zu (%.1f %%); with 10–12 lines %zu of %zu",
                  shown, total, 100.0 * shown / total, shown_small, total_small);
  /* Common practice (no single source): a placement that drops more than a
   * tenth of the labels of a crowded chart is not doing its job */
  g_assert_cmpfloat ((double) shown / total, >, 0.9);
  g_rand_free (rand);
  rugosa_chart_free (chart);
}

/* The design rule for callouts (chart-labels.c): on a small plot they fall
 * back to names alone and then to numbers keyed to the legend before they
 * cover more than 15 % of the plot, and the legend then shows the numbers. */
static void
test_labels_small_share (void)
{
  static SampleSet set;
  GRand *rand = g_rand_new_with_seed (640);
  size_t fallbacks = 0;
  for (int scene = 0; scene < 20; scene++)
    {
      RugosaChart *chart = chart_with (640, 400, RUGOSA_CHART_SHOW_ALL, RUGOSA_CHART_THEME_LIGHT);
      size_t shown = 0, compact = 0, numbered = 0, full = 0;
      double labels = 0;
      sample_random (&set, rand, 12);
      rugosa_chart_set_lines (chart, set.lines, set.n);
      check_labels (chart, set.lines, set.n, &shown);
      for (size_t i = 0; i < set.n; i++)
        {
          RugosaChartLabelInfo info;
          g_assert_true (rugosa_chart_get_label (chart, i, &info));
          compact += info.visible && info.compact;
          full += info.visible && !info.compact;
          numbered += info.numbered;
          labels += info.visible ? info.box.width * info.box.height : 0;
        }
      const RugosaChartRect pl = rugosa_chart_plot_area (chart);
      const double share = rugosa_chart_callout_share (chart);
      labels /= pl.width * pl.height;
      g_test_message ("640 × 400, 12 lines: %zu full, %zu names, %zu numbers; labels %.1f %%, "
                      "with the numbers %.1f %% of the plot", full, compact, numbered,
                      100 * labels, 100 * share);
      /* Common practice (no single source): our design rule, labels over
       * at most 15 % of the plot (a chart under its labels no longer
       * reads as a chart); the numbers beside the other markers add a
       * little more */
      g_assert_cmpfloat (labels, <=, 0.15);
      g_assert_cmpfloat (share, >=, labels);
      fallbacks += compact + numbered;
      /* a number on the plot is keyed to the legend: its row there, or
       * the last row saying the rest are numbered as in the list */
      char **entries = rugosa_chart_legend_entries (chart);
      gboolean has_more = FALSE;
      for (char **e = entries; *e != NULL; e++)
        has_more |= strstr (*e, "numbered as in the list") != NULL;
      for (size_t i = 0; i < set.n; i++)
        {
          RugosaChartLabelInfo info;
          g_assert_true (rugosa_chart_get_label (chart, i, &info));
          if (info.numbered)
            {
              char *row = g_strdup_printf ("%zu %s", i + 1, set.names[i]);
              g_assert_true (has_more || g_strv_contains ((const char *const *) entries, row));
              g_free (row);
            }
        }
      g_strfreev (entries);
      rugosa_chart_free (chart);
    }
  /* twelve full callouts of this size would cover a third of the plot */
  g_assert_cmpuint (fallbacks, >, 0);
  g_rand_free (rand);
}

/* A thousand lines: the selected and a pinned line are labelled wherever
 * they are in the list, nothing overlaps, and lines without a label carry
 * their number when there is room beside the marker. */
static void
test_labels_thousand (void)
{
  static SampleSet set;
  static const double SIZES[][2] = { { 1600, 1000 }, { 800, 500 } };
  GRand *rand = g_rand_new_with_seed (1000);
  for (size_t z = 0; z < G_N_ELEMENTS (SIZES); z++)
    for (int scene = 0; scene < 4; scene++)
      {
        RugosaChart *chart = chart_with (SIZES[z][0], SIZES[z][1], RUGOSA_CHART_SHOW_ALL,
                                         RUGOSA_CHART_THEME_LIGHT);
        const size_t n = 1000;
        const size_t selected = (size_t) g_rand_int_range (rand, 0, (gint32) n);
        const size_t pinned = (size_t) g_rand_int_range (rand, 0, (gint32) n);
        size_t shown = 0, numbered = 0, on_plot = 0;
        sample_random (&set, rand, n);
        for (size_t i = 0; i < n; i++)
          set.lines[i].selected = i == selected;
        set.lines[pinned].pinned = pinned != selected;
        rugosa_chart_set_lines (chart, set.lines, set.n);
        check_labels (chart, set.lines, set.n, &shown);
        for (size_t i = 0; i < n; i++)
          {
            RugosaChartLabelInfo info;
            g_assert_true (rugosa_chart_get_label (chart, i, &info));
            on_plot += info.marker.width > 0;
            numbered += info.numbered;
            if ((i == selected || i == pinned) && info.marker.width > 0)
              g_assert_true (info.visible);
          }
        g_test_message ("%g × %g, selected %zu: %zu labels, %zu numbers, %zu markers on the plot",
                        SIZES[z][0], SIZES[z][1], selected, shown, numbered, on_plot);
        /* Common practice (no single source): a chart of a thousand
         * options still names ten of them outright */
        g_assert_cmpuint (shown, >=, 10);
        g_assert_cmpuint (numbered, >, 0);
        rugosa_chart_free (chart);
      }
  g_rand_free (rand);
}

/* The labels are placed once per change of layout: not on hover, not when
 * only the readouts change at the same size; again when a marker moves or
 * the selection changes. */
static void
test_placement_cache (void)
{
  static SampleSet set;
  GRand *rand = g_rand_new_with_seed (100);
  RugosaChart *chart = chart_with (1600, 1000, RUGOSA_CHART_SHOW_ALL, RUGOSA_CHART_THEME_LIGHT);
  sample_random (&set, rand, 100);
  rugosa_chart_set_lines (chart, set.lines, set.n);
  cairo_surface_destroy (render (chart));
  const unsigned p0 = rugosa_chart_placements (chart);
  g_assert_cmpuint (p0, >=, 1);

  for (int i = 0; i < 5; i++)
    {
      rugosa_chart_set_hover (chart, i * 7);
      cairo_surface_destroy (render (chart));
    }
  g_assert_cmpuint (rugosa_chart_placements (chart), ==, p0);

  /* a new service age over lines whose markers stay: new digits only */
  for (size_t i = 0; i < set.n; i++)
    snprintf (set.vel[i], sizeof set.vel[i], "v = %.2f m/s", 1.11 + 0.01 * (double) (i % 80));
  rugosa_chart_set_lines (chart, set.lines, set.n);
  cairo_surface_destroy (render (chart));
  g_assert_cmpuint (rugosa_chart_placements (chart), ==, p0);

  /* one marker moves: placed again, once */
  set.lines[3].f *= 1.2;
  rugosa_chart_set_lines (chart, set.lines, set.n);
  cairo_surface_destroy (render (chart));
  cairo_surface_destroy (render (chart));
  g_assert_cmpuint (rugosa_chart_placements (chart), ==, p0 + 1);

  /* another line selected */
  set.lines[0].selected = 0;
  set.lines[50].selected = 1;
  rugosa_chart_set_lines (chart, set.lines, set.n);
  cairo_surface_destroy (render (chart));
  g_assert_cmpuint (rugosa_chart_placements (chart), ==, p0 + 2);
  RugosaChartLabelInfo info;
  g_assert_true (rugosa_chart_get_label (chart, 50, &info));
  g_assert_true (info.visible || info.marker.width == 0);

  /* a click on a number selects its line */
  for (size_t i = 0; i < set.n; i++)
    {
      g_assert_true (rugosa_chart_get_label (chart, i, &info));
      if (!info.numbered)
        continue;
      const double x = info.tag.x + info.tag.width / 2, y = info.tag.y + info.tag.height / 2;
      const int hit = rugosa_chart_hit_test (chart, x, y, 0);
      g_assert_cmpint (hit, >=, 0);
      break;
    }
  g_rand_free (rand);
  rugosa_chart_free (chart);
}

static void
test_hit_test (void)
{
  static SampleSet set;
  sample_scene (&set);
  RugosaChart *chart = chart_with (1600, 1000, RUGOSA_CHART_SHOW_ALL, RUGOSA_CHART_THEME_LIGHT);
  rugosa_chart_set_lines (chart, set.lines, set.n);
  for (size_t i = 0; i < set.n; i++)
    {
      double x, y;
      const RugosaChartLine *l = &set.lines[i];
      if (l->regime == RG_REGIME_TRANSITIONAL)
        {
          /* anywhere on the bar between f_laminar and f_turbulent */
          rugosa_chart_to_device (chart, l->re, sqrt (l->f_laminar * l->f_turbulent), &x, &y);
        }
      else
        rugosa_chart_to_device (chart, l->re, l->f, &x, &y);
      g_assert_cmpint (rugosa_chart_hit_test (chart, x + 2, y - 1, 8), ==, (int) i);
      /* the label box hits its line too */
      RugosaChartLabelInfo info;
      g_assert_true (rugosa_chart_get_label (chart, i, &info));
      if (info.visible)
        g_assert_cmpint (rugosa_chart_hit_test (chart, info.box.x + info.box.width - 2,
                                                info.box.y + info.box.height - 2, 0), ==, (int) i);
    }
  /* the top right corner of the plot holds nothing */
  const RugosaChartRect pl = rugosa_chart_plot_area (chart);
  g_assert_cmpint (rugosa_chart_hit_test (chart, pl.x + pl.width - 3, pl.y + 3, 8), ==, -1);
  rugosa_chart_free (chart);
}

/* --- the cache --- */

static void
test_cache (void)
{
  static SampleSet set;
  sample_scene (&set);
  RugosaChart *chart = chart_with (800, 500, RUGOSA_CHART_SHOW_ALL, RUGOSA_CHART_THEME_LIGHT);
  rugosa_chart_set_lines (chart, set.lines, set.n);
  cairo_surface_t *s = render (chart);
  g_assert_cmpuint (rugosa_chart_background_builds (chart), ==, 1);

  /* overlay-only changes: age (aged roughness, point, trail), selection,
   * hover */
  set.lines[0].rr_aged *= 1.5;
  set.lines[0].f *= 1.04;
  set.lines[0].n_trail = 3;
  set.lines[0].selected = 0;
  set.lines[2].selected = 1;
  rugosa_chart_set_lines (chart, set.lines, set.n);
  rugosa_chart_set_hover (chart, 1);
  cairo_surface_destroy (s);
  s = render (chart);
  g_assert_cmpuint (rugosa_chart_background_builds (chart), ==, 1);

  /* an identical spec keeps the cache; a new theme, size or new-pipe
   * roughness does not */
  RugosaChartSpec spec = *rugosa_chart_get_spec (chart);
  g_assert_cmpint (rugosa_chart_set_spec (chart, &spec, NULL), ==, RG_OK);
  cairo_surface_destroy (s);
  s = render (chart);
  g_assert_cmpuint (rugosa_chart_background_builds (chart), ==, 1);
  spec.theme = RUGOSA_CHART_THEME_DARK;
  g_assert_cmpint (rugosa_chart_set_spec (chart, &spec, NULL), ==, RG_OK);
  cairo_surface_destroy (s);
  s = render (chart);
  g_assert_cmpuint (rugosa_chart_background_builds (chart), ==, 2);
  set.lines[1].rr_new = 4.4e-4;
  rugosa_chart_set_lines (chart, set.lines, set.n);
  cairo_surface_destroy (s);
  s = render (chart);
  g_assert_cmpuint (rugosa_chart_background_builds (chart), ==, 3);

  /* the cached picture matches the directly drawn one */
  cairo_surface_t *d = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, 800, 500);
  cairo_t *cr = cairo_create (d);
  rugosa_chart_draw_direct (chart, cr);
  cairo_destroy (cr);
  cairo_surface_flush (d);
  int worst = 0, wx = -1, wy = -1;
  for (int y = 0; y < 500; y += 1)
    for (int x = 0; x < 800; x += 1)
      {
        int a[3], b[3];
        pixel (s, x, y, a);
        pixel (d, x, y, b);
        for (int c = 0; c < 3; c++)
          if (abs (a[c] - b[c]) > worst)
            {
              worst = abs (a[c] - b[c]);
              wx = x;
              wy = y;
            }
      }
  g_test_message ("cached vs direct: worst difference %d at (%d, %d)", worst, wx, wy);
  /* Common practice (no single source): the same operations on the same
   * surface type give the same pixels; 1 level allows for rounding in the
   * blit of an opaque surface */
  g_assert_cmpint (worst, <=, 1);
  cairo_surface_destroy (d);
  cairo_surface_destroy (s);
  rugosa_chart_free (chart);
}

/* --- export --- */

static char *tmp_dir = NULL;
static const char *const TMP_FILES[] = { "a.png", "b.png", "c.png", "chart.pdf",
                                         "chart.svg", "chart.png", "sel.svg", "pin.svg",
                                         "legend.pdf", "legend.svg", "legend.png" };

static char *
tmp_path (const char *name)
{
  if (tmp_dir == NULL)
    tmp_dir = g_dir_make_tmp ("rugosa-chart-XXXXXX", NULL);
  g_assert_nonnull (tmp_dir);
  return g_build_filename (tmp_dir, name, NULL);
}

static void
remove_tmp (void)
{
  if (tmp_dir == NULL)
    return;
  for (size_t i = 0; i < G_N_ELEMENTS (TMP_FILES); i++)
    {
      char *p = g_build_filename (tmp_dir, TMP_FILES[i], NULL);
      g_unlink (p);
      g_free (p);
    }
  g_rmdir (tmp_dir);
  g_clear_pointer (&tmp_dir, g_free);
}

static void
export_scene (RugosaChartFormat format, const char *date, const char *path,
              RugosaChartTheme theme)
{
  static SampleSet set;
  RugosaChartSpec spec;
  GError *error = NULL;
  sample_scene (&set);
  rugosa_chart_spec_init (&spec);
  spec.theme = theme;
  g_assert_true (rugosa_chart_export (&spec, set.lines, set.n, format, 1200, 760,
                                      date, path, &error));
  g_assert_no_error (error);
}

static void
test_export_png_reproducible (void)
{
  char *a = tmp_path ("a.png"), *b = tmp_path ("b.png"), *c = tmp_path ("c.png");
  char *da, *db, *dc;
  gsize na, nb, nc;
  export_scene (RUGOSA_CHART_FORMAT_PNG, TEST_DATE, a, RUGOSA_CHART_THEME_LIGHT);
  export_scene (RUGOSA_CHART_FORMAT_PNG, TEST_DATE, b, RUGOSA_CHART_THEME_LIGHT);
  export_scene (RUGOSA_CHART_FORMAT_PNG, "2031-05-17", c, RUGOSA_CHART_THEME_LIGHT);
  g_assert_true (g_file_get_contents (a, &da, &na, NULL));
  g_assert_true (g_file_get_contents (b, &db, &nb, NULL));
  g_assert_true (g_file_get_contents (c, &dc, &nc, NULL));
  g_assert_cmpmem (da, na, db, nb);
  /* the date is in the picture */
  g_assert_false (na == nc && memcmp (da, dc, na) == 0);

  GError *error = NULL;
  RugosaChartSpec spec;
  rugosa_chart_spec_init (&spec);
  g_assert_false (rugosa_chart_export (&spec, NULL, 0, RUGOSA_CHART_FORMAT_PNG, 800, 500,
                                       TEST_DATE, "/nonexistent-dir/x.png", &error));
  g_assert_error (error, RUGOSA_CHART_ERROR, RUGOSA_CHART_ERROR_WRITE);
  g_clear_error (&error);
  g_assert_false (rugosa_chart_export (&spec, NULL, 0, RUGOSA_CHART_FORMAT_PNG, 800, 500,
                                       "", a, &error));
  g_assert_error (error, RUGOSA_CHART_ERROR, RUGOSA_CHART_ERROR_INVALID);
  g_clear_error (&error);
  g_free (da);
  g_free (db);
  g_free (dc);
  g_free (a);
  g_free (b);
  g_free (c);
}

static void
test_export_pdf_text (void)
{
  char *path = tmp_path ("chart.pdf");
  char *out = NULL, *err = NULL;
  int status;
  char *prog = g_find_program_in_path ("pdftotext");
  if (prog == NULL)
    {
      g_test_skip ("pdftotext (poppler-utils) is not installed");
      g_free (path);
      return;
    }
  export_scene (RUGOSA_CHART_FORMAT_PDF, TEST_DATE, path, RUGOSA_CHART_THEME_LIGHT);
  const char *argv[] = { prog, path, "-", NULL };
  g_assert_true (g_spawn_sync (NULL, (char **) argv, NULL, G_SPAWN_DEFAULT, NULL, NULL,
                               &out, &err, &status, NULL));
  g_assert_true (g_spawn_check_wait_status (status, NULL));
  g_test_message ("pdftotext: %.200s", out);
  /* the axis titles, a curve label, a band name, a line option, the
   * caution and the date are text, not outlines */
  g_assert_nonnull (strstr (out, "Reynolds number"));
  g_assert_nonnull (strstr (out, "Darcy friction factor"));
  g_assert_nonnull (strstr (out, "ε/D"));
  g_assert_nonnull (strstr (out, "FULLY ROUGH"));
  g_assert_nonnull (strstr (out, "Option A"));
  g_assert_nonnull (strstr (out, "licensed engineer"));
  g_assert_nonnull (strstr (out, TEST_DATE));
  g_free (out);
  g_free (err);
  g_free (prog);
  g_free (path);
}

/* Mean of a block of pixels of a GdkPixbuf (RGB, alpha composited on
 * white) or of a PNG file loaded the same way. */
static void
block_means (GdkPixbuf *pb, int bs, double *out)
{
  const int w = gdk_pixbuf_get_width (pb), h = gdk_pixbuf_get_height (pb);
  const int n = gdk_pixbuf_get_n_channels (pb), rs = gdk_pixbuf_get_rowstride (pb);
  const guchar *px = gdk_pixbuf_read_pixels (pb);
  for (int by = 0; by < h / bs; by++)
    for (int bx = 0; bx < w / bs; bx++)
      for (int c = 0; c < 3; c++)
        {
          double sum = 0;
          for (int y = by * bs; y < (by + 1) * bs; y++)
            for (int x = bx * bs; x < (bx + 1) * bs; x++)
              {
                const guchar *p = px + y * rs + x * n;
                const double a = n == 4 ? p[3] / 255.0 : 1.0;
                sum += p[c] * a + 255 * (1 - a);
              }
          out[(by * (w / bs) + bx) * 3 + c] = sum / (bs * bs);
        }
}

static void
test_export_svg (void)
{
  char *svg = tmp_path ("chart.svg"), *png = tmp_path ("chart.png");
  export_scene (RUGOSA_CHART_FORMAT_SVG, TEST_DATE, svg, RUGOSA_CHART_THEME_LIGHT);
  export_scene (RUGOSA_CHART_FORMAT_PNG, TEST_DATE, png, RUGOSA_CHART_THEME_LIGHT);

  /* well-formed XML with an <svg> root, by Python's xml.etree */
  char *script = g_strdup_printf (
      "import sys, xml.etree.ElementTree as E\n"
      "r = E.parse(sys.argv[1]).getroot()\n"
      "sys.exit(0 if r.tag.endswith('svg') else 3)\n");
  const char *argv[] = { "/usr/bin/python3", "-c", script, svg, NULL };
  int status;
  char *err = NULL;
  g_assert_true (g_spawn_sync (NULL, (char **) argv, NULL, G_SPAWN_STDOUT_TO_DEV_NULL,
                               NULL, NULL, NULL, &err, &status, NULL));
  if (!g_spawn_check_wait_status (status, NULL))
    g_test_fail_printf ("the SVG export is not well-formed XML: %s", err);
  g_free (err);
  g_free (script);

  /* renders like the PNG: through gdk-pixbuf's SVG loader (librsvg) */
  GError *error = NULL;
  GdkPixbuf *a = gdk_pixbuf_new_from_file_at_size (svg, 1200, 760, &error);
  if (a == NULL)
    {
      g_test_skip_printf ("no SVG loader for gdk-pixbuf: %s", error->message);
      g_clear_error (&error);
      g_free (svg);
      g_free (png);
      return;
    }
  GdkPixbuf *b = gdk_pixbuf_new_from_file (png, &error);
  g_assert_no_error (error);
  g_assert_cmpint (gdk_pixbuf_get_width (a), ==, gdk_pixbuf_get_width (b));
  g_assert_cmpint (gdk_pixbuf_get_height (a), ==, gdk_pixbuf_get_height (b));
  enum { BS = 8 };
  const size_t nb = (1200 / BS) * (760 / BS) * 3;
  double *ma = g_new (double, nb), *mb = g_new (double, nb);
  block_means (a, BS, ma);
  block_means (b, BS, mb);
  double sum = 0, worst = 0;
  size_t over = 0;
  for (size_t i = 0; i < nb; i++)
    {
      const double d = fabs (ma[i] - mb[i]);
      sum += d;
      worst = MAX (worst, d);
      over += d > 24;
    }
  g_test_message ("SVG vs PNG, %d px blocks: mean |Δ| %.2f, worst %.1f, blocks over 24: %zu of %zu",
                  BS, sum / nb, worst, over, nb);
  /* Common practice (no single source): two rasterisers of the same
   * vector picture differ at antialiased edges and in glyph rendering;
   * averaged over 8 × 8 blocks the difference stays within a few levels,
   * and a misplaced element would move whole blocks by 50 or more. */
  g_assert_cmpfloat (sum / nb, <, 3.0);
  g_assert_cmpfloat ((double) over / nb, <, 0.01);
  g_free (ma);
  g_free (mb);
  g_object_unref (a);
  g_object_unref (b);
  g_free (svg);
  g_free (png);
}

/* The legend names every line and explains every symbol the chart
 * draws; its entries are text in a PDF export and drawn alike in SVG. */
static void
test_legend_entries (void)
{
  static SampleSet set;
  RugosaChartSpec spec;
  GError *error = NULL;
  sample_scene (&set);
  rugosa_chart_spec_init (&spec);
  spec.width = 1200;
  spec.height = 760;
  g_strlcpy (spec.age_text, "25 years", sizeof spec.age_text);
  RugosaChart *chart = rugosa_chart_new ();
  g_assert_cmpint (rugosa_chart_set_spec (chart, &spec, NULL), ==, RG_OK);
  rugosa_chart_set_lines (chart, set.lines, set.n);
  char **entries = rugosa_chart_legend_entries (chart);
  const char *const KEY[] = {
    "flow range, minimum to maximum", "aging, new → 25 years",
    "transitional: laminar to turbulent f", "curve of a line’s ε/D, new",
    "laminar", "transitional", "turbulent:", "hydraulically smooth",
    "transitionally rough", "fully rough",
  };
  /* each line by its number in the list and its name */
  for (size_t i = 0; i < set.n; i++)
    {
      char *row = g_strdup_printf ("%zu %s", i + 1, set.names[i]);
      g_assert_true (g_strv_contains ((const char *const *) entries, row));
      g_free (row);
    }
  for (size_t i = 0; i < G_N_ELEMENTS (KEY); i++)
    g_assert_true (g_strv_contains ((const char *const *) entries, KEY[i]));
  /* the legend hides no operating point */
  const RugosaChartRect legend = rugosa_chart_legend_box (chart);
  g_assert_cmpfloat (legend.width, >, 0);
  for (size_t i = 0; i < set.n; i++)
    {
      double x, y;
      rugosa_chart_to_device (chart, set.lines[i].re, set.lines[i].f, &x, &y);
      g_assert_false (x >= legend.x && x <= legend.x + legend.width
                      && y >= legend.y && y <= legend.y + legend.height);
    }

  /* a wide chart gives the legend a column beside the plot */
  RugosaChartSpec wide = spec;
  wide.width = 1800;
  wide.height = 800;
  RugosaChart *wchart = rugosa_chart_new ();
  g_assert_cmpint (rugosa_chart_set_spec (wchart, &wide, NULL), ==, RG_OK);
  rugosa_chart_set_lines (wchart, set.lines, set.n);
  const RugosaChartRect wl = rugosa_chart_legend_box (wchart);
  const RugosaChartRect wp = rugosa_chart_plot_area (wchart);
  g_assert_cmpfloat (wl.width, >, 0);
  g_assert_cmpfloat (wl.x, >=, wp.x + wp.width);
  g_assert_cmpfloat (wl.x + wl.width, <=, wide.width);
  g_assert_cmpfloat (wl.y + wl.height, <=, wp.y + wp.height);
  rugosa_chart_free (wchart);

  /* in the PDF export, as text */
  char *pdf = tmp_path ("legend.pdf"), *svg = tmp_path ("legend.svg"), *png = tmp_path ("legend.png");
  g_assert_true (rugosa_chart_export (&spec, set.lines, set.n, RUGOSA_CHART_FORMAT_PDF, 1200, 760,
                                      TEST_DATE, pdf, &error));
  g_assert_true (rugosa_chart_export (&spec, set.lines, set.n, RUGOSA_CHART_FORMAT_SVG, 1200, 760,
                                      TEST_DATE, svg, &error));
  g_assert_true (rugosa_chart_export (&spec, set.lines, set.n, RUGOSA_CHART_FORMAT_PNG, 1200, 760,
                                      TEST_DATE, png, &error));
  g_assert_no_error (error);
  char *prog = g_find_program_in_path ("pdftotext");
  if (prog != NULL)
    {
      char *out = NULL;
      int status;
      const char *argv[] = { prog, "-raw", pdf, "-", NULL };
      g_assert_true (g_spawn_sync (NULL, (char **) argv, NULL, G_SPAWN_STDERR_TO_DEV_NULL, NULL,
                                   NULL, &out, NULL, &status, NULL));
      g_assert_true (g_spawn_check_wait_status (status, NULL));
      for (char **e = entries; *e != NULL; e++)
        if (strstr (out, *e) == NULL)
          g_test_fail_printf ("the PDF's text lacks the legend entry “%s”", *e);
      g_free (out);
      g_free (prog);
    }
  else
    g_test_message ("pdftotext (poppler-utils) is not installed: PDF text not checked");

  /* in the SVG export, drawn as in the PNG: Cairo's SVG writes glyphs as
   * shapes, so the legend's box is compared as pixels (gdk-pixbuf's SVG
   * loader) with the PNG export's */
  GdkPixbuf *a = gdk_pixbuf_new_from_file_at_size (svg, 1200, 760, NULL);
  GdkPixbuf *b = gdk_pixbuf_new_from_file (png, &error);
  g_assert_no_error (error);
  if (a != NULL)
    {
      GdkPixbuf *la = gdk_pixbuf_new_subpixbuf (a, (int) legend.x, (int) legend.y,
                                                (int) legend.width / 8 * 8, (int) legend.height / 8 * 8);
      GdkPixbuf *lb = gdk_pixbuf_new_subpixbuf (b, (int) legend.x, (int) legend.y,
                                                (int) legend.width / 8 * 8, (int) legend.height / 8 * 8);
      const size_t nb = (size_t) (legend.width / 8) * (size_t) (legend.height / 8) * 3;
      double *ma = g_new (double, nb), *mb = g_new (double, nb), sum = 0, ink = 0;
      block_means (la, 8, ma);
      block_means (lb, 8, mb);
      for (size_t i = 0; i < nb; i++)
        {
          sum += fabs (ma[i] - mb[i]);
          ink += 255 - mb[i];
        }
      g_test_message ("legend box, SVG vs PNG: mean |Δ| %.2f over %zu block channels", sum / nb, nb);
      /* Common practice (no single source): as in /chart/export/svg, two
       * rasterisers of one picture agree within a few levels over 8 × 8
       * blocks; a legend missing from either would differ by tens */
      g_assert_cmpfloat (sum / nb, <, 4.0);
      g_assert_cmpfloat (ink / nb, >, 5.0);   /* and the box is not blank */
      g_free (ma);
      g_free (mb);
      g_object_unref (la);
      g_object_unref (lb);
      g_object_unref (a);
    }
  else
    g_test_message ("no SVG loader for gdk-pixbuf: the SVG legend not compared");
  g_object_unref (b);
  g_strfreev (entries);
  rugosa_chart_free (chart);
  g_free (pdf);
  g_free (svg);
  g_free (png);
}

/* An export carries no selection: the scene with its selected line
 * exports exactly as with that line pinned instead, while the window's
 * drawing of the same scene shows the ring. */
/* A crowded chart keeps the key to its symbols: when not every line can
 * have a row, the legend shows three lines and counts the rest (numbered
 * on the plot as in the list) rather than dropping the key. */
static void
test_legend_crowded (void)
{
  static SampleSet set;
  GRand *rand = g_rand_new_with_seed (7);
  RugosaChart *chart = chart_with (1000, 620, RUGOSA_CHART_SHOW_ALL, RUGOSA_CHART_THEME_LIGHT);
  size_t line_rows = 0;

  sample_random (&set, rand, 100);
  rugosa_chart_set_lines (chart, set.lines, set.n);
  char **entries = rugosa_chart_legend_entries (chart);
  for (char **e = entries; *e != NULL; e++)
    line_rows += g_str_has_prefix (*e, "Line ") || strstr (*e, " Line ") != NULL;
  g_assert_true (g_strv_contains ((const char *const *) entries, "flow range, minimum to maximum"));
  g_assert_true (g_strv_contains ((const char *const *) entries, "97 more, numbered as in the list"));
  g_assert_cmpuint (line_rows, ==, 3);
  g_strfreev (entries);
  rugosa_chart_free (chart);
  g_rand_free (rand);
}

static void
test_export_no_selection (void)
{
  static SampleSet set;
  RugosaChartSpec spec;
  GError *error = NULL;
  char *sel = tmp_path ("sel.svg"), *pin = tmp_path ("pin.svg");
  char *da, *db;
  gsize na, nb;
  size_t selected = G_MAXSIZE;
  sample_scene (&set);
  for (size_t i = 0; i < set.n; i++)
    if (set.lines[i].selected)
      selected = i;
  g_assert_cmpuint (selected, <, set.n);
  rugosa_chart_spec_init (&spec);
  g_assert_true (rugosa_chart_export (&spec, set.lines, set.n, RUGOSA_CHART_FORMAT_SVG, 1200, 760,
                                      TEST_DATE, sel, &error));
  set.lines[selected].selected = 0;
  set.lines[selected].pinned = 1;
  g_assert_true (rugosa_chart_export (&spec, set.lines, set.n, RUGOSA_CHART_FORMAT_SVG, 1200, 760,
                                      TEST_DATE, pin, &error));
  g_assert_no_error (error);
  g_assert_true (g_file_get_contents (sel, &da, &na, NULL));
  g_assert_true (g_file_get_contents (pin, &db, &nb, NULL));
  /* Cairo numbers its SVG surfaces across the process: the names aside,
   * the two files are the same drawing */
  GRegex *ids = g_regex_new ("surface[0-9]+", 0, 0, NULL);
  char *ca = g_regex_replace_literal (ids, da, (gssize) na, 0, "surface", 0, NULL);
  char *cb = g_regex_replace_literal (ids, db, (gssize) nb, 0, "surface", 0, NULL);
  g_assert_cmpstr (ca, ==, cb);
  g_regex_unref (ids);
  g_free (ca);
  g_free (cb);
  g_free (da);
  g_free (db);

  /* the control: drawn for the window, the selection shows */
  spec.width = 1200;
  spec.height = 760;
  RugosaChart *chart = rugosa_chart_new ();
  g_assert_cmpint (rugosa_chart_set_spec (chart, &spec, NULL), ==, RG_OK);
  rugosa_chart_set_lines (chart, set.lines, set.n);
  cairo_surface_t *pinned = render (chart);
  set.lines[selected].selected = 1;
  set.lines[selected].pinned = 0;
  rugosa_chart_set_lines (chart, set.lines, set.n);
  cairo_surface_t *ring = render (chart);
  const int stride = cairo_image_surface_get_stride (ring);
  g_assert_true (memcmp (cairo_image_surface_get_data (ring), cairo_image_surface_get_data (pinned),
                         (size_t) stride * 760) != 0);
  cairo_surface_destroy (ring);
  cairo_surface_destroy (pinned);
  rugosa_chart_free (chart);
  g_free (sel);
  g_free (pin);
}

/* The heading: a title and the conditions over the plot, which moves
 * down to make room; without a title nothing changes. */
static void
test_export_heading (void)
{
  RugosaChartSpec spec;
  rugosa_chart_spec_init (&spec);
  RugosaChart *chart = rugosa_chart_new ();
  g_assert_cmpint (rugosa_chart_set_spec (chart, &spec, NULL), ==, RG_OK);
  const RugosaChartRect plain = rugosa_chart_plot_area (chart);
  g_strlcpy (spec.title, "Riser options", sizeof spec.title);
  g_strlcpy (spec.conditions, "Service age: 25 years  ·  Friction model: Colebrook (1939)",
             sizeof spec.conditions);
  g_assert_cmpint (rugosa_chart_set_spec (chart, &spec, NULL), ==, RG_OK);
  const RugosaChartRect headed = rugosa_chart_plot_area (chart);
  g_assert_cmpfloat (headed.y, >, plain.y);
  g_assert_cmpfloat (headed.y + headed.height, ==, plain.y + plain.height);
  /* a new age text redraws the legend only, never the background */
  const unsigned builds = rugosa_chart_background_builds (chart);
  cairo_surface_t *s = render (chart);
  cairo_surface_destroy (s);
  g_strlcpy (spec.age_text, "7 years", sizeof spec.age_text);
  g_assert_cmpint (rugosa_chart_set_spec (chart, &spec, NULL), ==, RG_OK);
  s = render (chart);
  cairo_surface_destroy (s);
  g_assert_cmpuint (rugosa_chart_background_builds (chart), ==, builds + 1);
  rugosa_chart_free (chart);
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/chart/spec/defaults", test_spec_defaults);
  g_test_add_func ("/chart/transform/roundtrip", test_transform_roundtrip);
  g_test_add_func ("/chart/colebrook/rr-through", test_rr_through);
  g_test_add_func ("/chart/zones/probe", test_probe_zones);
  g_test_add_func ("/chart/pixels/laminar-line", test_pixel_laminar_line);
  g_test_add_func ("/chart/pixels/bands", test_pixel_bands);
  g_test_add_func ("/chart/pixels/zone-edges", test_pixel_zone_edges);
  g_test_add_func ("/chart/pixels/scale-2", test_pixel_scale2);
  g_test_add_func ("/chart/overlay/labels-crowded", test_labels_crowded);
  g_test_add_func ("/chart/overlay/labels-thousand", test_labels_thousand);
  g_test_add_func ("/chart/overlay/placement-cache", test_placement_cache);
  g_test_add_func ("/chart/overlay/hit-test", test_hit_test);
  g_test_add_func ("/chart/cache/overlay-only", test_cache);
  g_test_add_func ("/chart/export/png-reproducible", test_export_png_reproducible);
  g_test_add_func ("/chart/export/pdf-text", test_export_pdf_text);
  g_test_add_func ("/chart/export/svg", test_export_svg);
  g_test_add_func ("/chart/spec/magnify", test_magnify);
  g_test_add_func ("/chart/export/no-selection", test_export_no_selection);
  g_test_add_func ("/chart/export/heading", test_export_heading);
  g_test_add_func ("/chart/legend/entries", test_legend_entries);
  g_test_add_func ("/chart/legend/crowded", test_legend_crowded);
  g_test_add_func ("/chart/overlay/small-share", test_labels_small_share);
  const int result = g_test_run ();
  if (g_getenv ("RUGOSA_CHART_KEEP") == NULL)
    remove_tmp ();
  else if (tmp_dir != NULL)
    g_print ("# exports kept in %s\n", tmp_dir);
  return result;
}
