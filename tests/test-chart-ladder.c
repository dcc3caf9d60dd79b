/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The ladder layer of the chart: rungs where the transforms put them, the
 * lookup used for tooltips, drawn over the cached background without
 * rebuilding it, and gone when cleared. */
#include "chart/rugosa-chart.h"
#include "core/friction.h"

#include <glib.h>
#include <math.h>

static double
colebrook (double re, double rr)
{
  double f = 0.0;

  g_assert_cmpint (rg_friction_colebrook (re, rr, &f, NULL), ==, RG_OK);
  return f;
}

static RugosaChart *
chart_with_spec (void)
{
  RugosaChart *chart = rugosa_chart_new ();
  RugosaChartSpec spec;

  rugosa_chart_spec_init (&spec);
  g_assert_cmpint (rugosa_chart_set_spec (chart, &spec, NULL), ==, RG_OK);
  return chart;
}

/* Three sizes of one flow: Re ∝ 1/D and ε/D ∝ 1/D (a bore of 100, 150
 * and 200 mm with ε = 0.05 mm), and a rung that cannot be drawn. */
static void
fill_rungs (RugosaChartRung *r)
{
  static const double d[3] = { 0.10, 0.15, 0.20 };

  for (int i = 0; i < 3; i++)
    {
      r[i].label = i == 0 ? "small" : i == 1 ? "middle" : "large";
      r[i].re = 2.0e5 * 0.10 / d[i];
      r[i].rr = 5.0e-5 / d[i];
      r[i].f = colebrook (r[i].re, r[i].rr);
      r[i].passes = i > 0;
      r[i].recommended = i == 1;
      r[i].selected = i == 2;
    }
  r[3].label = "none";
  r[3].re = 0.0;
  r[3].f = 0.02;
  r[3].rr = 1e-4;
}

static void
test_positions_and_lookup (void)
{
  RugosaChart *chart = chart_with_spec ();
  RugosaChartRung rungs[4] = { 0 };
  const RugosaChartRgba ink = { 0.1, 0.3, 0.6, 1.0 };
  double x, y, ex, ey;

  fill_rungs (rungs);
  rugosa_chart_set_ladder (chart, rungs, 4, ink);
  g_assert_cmpuint (rugosa_chart_ladder_count (chart), ==, 4);
  for (int i = 0; i < 3; i++)
    {
      g_assert_true (rugosa_chart_ladder_position (chart, (size_t) i, &x, &y));
      rugosa_chart_to_device (chart, rungs[i].re, rungs[i].f, &ex, &ey);
      g_assert_cmpfloat (x, ==, ex);
      g_assert_cmpfloat (y, ==, ey);
      /* the lookup finds the rung at its point, and not far away */
      g_assert_cmpint (rugosa_chart_ladder_hit_test (chart, x + 2.0, y - 2.0, 8.0), ==, i);
    }
  /* A larger bore lies to the left (lower Re): the ladder runs to the
   * left as the bore grows. */
  {
    double x0, y0, x2, y2;

    g_assert_true (rugosa_chart_ladder_position (chart, 0, &x0, &y0));
    g_assert_true (rugosa_chart_ladder_position (chart, 2, &x2, &y2));
    g_assert_cmpfloat (x2, <, x0);
  }
  g_assert_false (rugosa_chart_ladder_position (chart, 3, &x, &y));
  g_assert_false (rugosa_chart_ladder_position (chart, 4, &x, &y));
  g_assert_cmpint (rugosa_chart_ladder_hit_test (chart, 5.0, 5.0, 8.0), ==, -1);
  /* the label is a copy */
  rungs[1].label = "changed";
  rugosa_chart_set_ladder (chart, NULL, 0, ink);
  g_assert_cmpuint (rugosa_chart_ladder_count (chart), ==, 0);
  g_assert_cmpint (rugosa_chart_ladder_hit_test (chart, ex, ey, 8.0), ==, -1);
  rugosa_chart_free (chart);
}

static void
pixel_at (cairo_surface_t *s, double x, double y, guint8 out[4])
{
  const int stride = cairo_image_surface_get_stride (s);
  const guint8 *data = cairo_image_surface_get_data (s);
  const int px = (int) lround (x), py = (int) lround (y);

  cairo_surface_flush (s);
  for (int c = 0; c < 4; c++)
    out[c] = data[py * stride + px * 4 + c];
}

static void
draw_into (RugosaChart *chart, cairo_surface_t *s)
{
  cairo_t *cr = cairo_create (s);

  rugosa_chart_draw (chart, cr);
  cairo_destroy (cr);
}

static void
test_drawn_over_the_cached_background (void)
{
  RugosaChart *chart = chart_with_spec ();
  const RugosaChartSpec *spec = rugosa_chart_get_spec (chart);
  cairo_surface_t *plain = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, (int) spec->width, (int) spec->height);
  cairo_surface_t *with = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, (int) spec->width, (int) spec->height);
  RugosaChartRung rungs[4] = { 0 };
  const RugosaChartRgba ink = { 0.8, 0.1, 0.1, 1.0 };
  unsigned builds;
  double x, y;
  guint8 a[4], b[4];

  fill_rungs (rungs);
  draw_into (chart, plain);
  builds = rugosa_chart_background_builds (chart);
  rugosa_chart_set_ladder (chart, rungs, 4, ink);
  draw_into (chart, with);
  /* the ladder is overlay: the background is not built again */
  g_assert_cmpuint (rugosa_chart_background_builds (chart), ==, builds);
  /* each drawable rung changed the pixels at its point: the passing ones
   * are filled there; the failing one is a ring, drawn 2.8 px around */
  for (size_t i = 0; i < 3; i++)
    {
      g_assert_true (rugosa_chart_ladder_position (chart, i, &x, &y));
      if (!rungs[i].passes)
        x += 2.8;
      pixel_at (plain, x, y, a);
      pixel_at (with, x, y, b);
      g_assert_true (a[0] != b[0] || a[1] != b[1] || a[2] != b[2]);
    }
  /* cleared: the picture is the plain one again */
  rugosa_chart_set_ladder (chart, NULL, 0, ink);
  draw_into (chart, with);
  g_assert_true (rugosa_chart_ladder_position (chart, 0, &x, &y) == 0);
  rugosa_chart_to_device (chart, rungs[1].re, rungs[1].f, &x, &y);
  pixel_at (plain, x, y, a);
  pixel_at (with, x, y, b);
  g_assert_cmpmem (a, 4, b, 4);
  cairo_surface_destroy (plain);
  cairo_surface_destroy (with);
  rugosa_chart_free (chart);
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/chart/ladder/positions", test_positions_and_lookup);
  g_test_add_func ("/chart/ladder/drawn", test_drawn_over_the_cached_background);
  return g_test_run ();
}
