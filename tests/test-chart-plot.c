/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Tests of the plot views of the chart engine (src/chart/chart-plot*.c):
 * view names, the frame's ranges, the cost view's crossings against hand
 * arithmetic, pixels where the data say, hit testing, and the three export
 * formats with their text. */
#include <glib/gstdio.h>
#include <math.h>
#include <string.h>

#include "chart/rugosa-chart-plot.h"

#define TEST_DATE "2026-12-02"

static const RugosaChartRgba RED = { 0.8, 0.1, 0.1, 1.0 };
static const RugosaChartRgba BLUE = { 0.1, 0.2, 0.8, 1.0 };

static void
test_views (void)
{
  RugosaChartView v;

  for (int i = 0; i < RUGOSA_CHART_N_VIEWS; i++)
    {
      g_assert_true (rugosa_chart_view_from_id (rugosa_chart_view_id ((RugosaChartView) i), &v));
      g_assert_cmpint (v, ==, i);
      g_assert_cmpstr (rugosa_chart_view_title ((RugosaChartView) i), !=, "");
    }
  /* the names of rugosa-cli render --view */
  g_assert_cmpstr (rugosa_chart_view_id (RUGOSA_CHART_VIEW_SYSTEM), ==, "system");
  g_assert_cmpstr (rugosa_chart_view_id (RUGOSA_CHART_VIEW_COST), ==, "cost");
  g_assert_false (rugosa_chart_view_from_id ("pump", &v));
  g_assert_false (rugosa_chart_view_from_id (NULL, &v));
}

static void
test_spec_check (void)
{
  RugosaPlotSpec spec;
  RgError err = { 0 };

  rugosa_plot_spec_init (&spec);
  g_assert_cmpint (rugosa_plot_spec_check (&spec, &err), ==, RG_OK);
  spec.width = 100;
  g_assert_cmpint (rugosa_plot_spec_check (&spec, &err), !=, RG_OK);
  rugosa_plot_spec_init (&spec);
  spec.view = RUGOSA_CHART_VIEW_FRICTION;
  g_assert_cmpint (rugosa_plot_spec_check (&spec, &err), !=, RG_OK);
  g_assert_cmpstr (err.text, !=, "");
}

/* Two cost curves given at whole years: A = 100 + 10·t, B = 50 + 20·t. */
static void
cost_series (RugosaPlotSeries s[2], RugosaPlotPoint a[11], RugosaPlotPoint b[11])
{
  memset (s, 0, 2 * sizeof *s);
  for (int t = 0; t <= 10; t++)
    {
      a[t] = (RugosaPlotPoint) { t, 100.0 + 10.0 * t };
      b[t] = (RugosaPlotPoint) { t, 50.0 + 20.0 * t };
    }
  s[0] = (RugosaPlotSeries) { .name = "A", .colour = RED, .cost = a, .n_cost = 11, .readout = "200" };
  s[1] = (RugosaPlotSeries) { .name = "B", .colour = BLUE, .cost = b, .n_cost = 11, .readout = "250" };
}

static RugosaPlot *
plot_with (RugosaChartView view, const RugosaPlotSeries *s, size_t n)
{
  RugosaPlot *plot = rugosa_plot_new ();
  RugosaPlotSpec spec;

  rugosa_plot_spec_init (&spec);
  spec.view = view;
  g_strlcpy (spec.x_title, "Years of service", sizeof spec.x_title);
  g_strlcpy (spec.y_title, "Cumulative cost", sizeof spec.y_title);
  g_strlcpy (spec.payback_format, "pays back after %s years", sizeof spec.payback_format);
  g_assert_cmpint (rugosa_plot_set_spec (plot, &spec, NULL), ==, RG_OK);
  rugosa_plot_set_series (plot, s, n);
  return plot;
}

static void
test_crossings (void)
{
  RugosaPlotSeries s[2];
  RugosaPlotPoint a[11], b[11];
  RugosaPlotCrossing found[4];
  RugosaPlot *plot;
  double x0, x1, y0, y1;

  cost_series (s, a, b);
  plot = plot_with (RUGOSA_CHART_VIEW_COST, s, 2);
  g_assert_cmpuint (rugosa_plot_crossings (plot, found, 4), ==, 1);
  /* Source: hand arithmetic: 100 + 10·t = 50 + 20·t at t = 5, cost 150;
   * A, dearer to build, is the one that pays back */
  g_assert_cmpuint (found[0].dearer, ==, 0);
  g_assert_cmpuint (found[0].cheaper, ==, 1);
  g_assert_cmpfloat (fabs (found[0].years - 5.0), <, 1e-12);
  g_assert_cmpfloat (fabs (found[0].cost - 150.0), <, 1e-12);

  /* Common practice (no single source): the axes start at 0 and end on a
   * tick that holds the data (B reaches 250 at 10 years) */
  rugosa_plot_ranges (plot, &x0, &x1, &y0, &y1);
  g_assert_cmpfloat (x0, ==, 0.0);
  g_assert_cmpfloat (x1, >=, 10.0);
  g_assert_cmpfloat (y0, ==, 0.0);
  g_assert_cmpfloat (y1, >=, 250.0);
  g_assert_cmpfloat (y1, <=, 400.0);
  rugosa_plot_free (plot);

  /* B made as dear as A: no payback */
  for (int t = 0; t <= 10; t++)
    b[t].y = 100.0 + 20.0 * t;
  plot = plot_with (RUGOSA_CHART_VIEW_COST, s, 2);
  g_assert_cmpuint (rugosa_plot_crossings (plot, found, 4), ==, 0);
  rugosa_plot_free (plot);
}

static cairo_surface_t *
render (RugosaPlot *plot)
{
  const RugosaPlotSpec *spec = rugosa_plot_get_spec (plot);
  cairo_surface_t *surface = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, (int) spec->width,
                                                         (int) spec->height);
  cairo_t *cr = cairo_create (surface);

  rugosa_plot_draw (plot, cr);
  cairo_destroy (cr);
  cairo_surface_flush (surface);
  return surface;
}

/* The colour of the pixel at device (x, y) is close to `want`. */
static gboolean
pixel_is (cairo_surface_t *s, double x, double y, const RugosaChartRgba *want)
{
  const unsigned char *data = cairo_image_surface_get_data (s);
  const int stride = cairo_image_surface_get_stride (s);
  const guint32 px = *(const guint32 *) (data + (int) y * stride + 4 * (int) x);
  const double r = ((px >> 16) & 0xff) / 255.0, g = ((px >> 8) & 0xff) / 255.0, b = (px & 0xff) / 255.0;

  return fabs (r - want->r) < 0.12 && fabs (g - want->g) < 0.12 && fabs (b - want->b) < 0.12;
}

/* A system curve is drawn where its data lie; hit testing finds it. */
static void
test_system_pixels_and_hits (void)
{
  RugosaPlotPoint aged[3] = { { 0, 5 }, { 10, 15 }, { 20, 25 } };
  RugosaPlotPoint pump[3] = { { 0, 40 }, { 10, 35 }, { 20, 20 } };
  RugosaPlotSeries s = { .name = "A", .colour = RED, .system_aged = aged, .n_system_aged = 3,
                         .has_duty = 1, .duty = { 15, 20 } };
  RugosaPlotSeries t = { .name = "B", .colour = BLUE, .pump = pump, .n_pump = 3 };
  RugosaPlotSeries both[2] = { s, t };
  RugosaPlot *plot = plot_with (RUGOSA_CHART_VIEW_SYSTEM, both, 2);
  cairo_surface_t *surface;
  double x, y, x0, x1, y0, y1;

  rugosa_plot_ranges (plot, &x0, &x1, &y0, &y1);
  /* Common practice (no single source): the frame holds the pump curve */
  g_assert_cmpfloat (y1, >=, 40.0);
  g_assert_cmpfloat (x1, >=, 20.0);
  surface = render (plot);
  /* the middle of the straight aged curve, (5, 10), is red */
  rugosa_plot_to_device (plot, 5.0, 10.0, &x, &y);
  g_assert_true (pixel_is (surface, x, y, &RED));
  g_assert_cmpint (rugosa_plot_hit_test (plot, x + 2, y, 6), ==, 0);
  /* the duty marker */
  rugosa_plot_to_device (plot, 15.0, 20.0, &x, &y);
  g_assert_cmpint (rugosa_plot_hit_test (plot, x, y, 6), ==, 0);
  /* far from everything */
  rugosa_plot_to_device (plot, 18.0, 2.0, &x, &y);
  g_assert_cmpint (rugosa_plot_hit_test (plot, x, y, 6), ==, -1);
  {
    double dx, dy;

    rugosa_plot_from_device (plot, x, y, &dx, &dy);
    g_assert_cmpfloat (fabs (dx - 18.0), <, 1e-9);
    g_assert_cmpfloat (fabs (dy - 2.0), <, 1e-9);
  }
  cairo_surface_destroy (surface);
  rugosa_plot_free (plot);
}

static char *
tmp_path (const char *dir, const char *name)
{
  return g_build_filename (dir, name, NULL);
}

static void
test_export (void)
{
  RugosaPlotSeries s[2];
  RugosaPlotPoint a[11], b[11];
  RugosaPlotSpec spec;
  g_autofree char *dir = g_dir_make_tmp ("rugosa-plot-XXXXXX", NULL);
  g_autofree char *png1 = tmp_path (dir, "a.png"), *png2 = tmp_path (dir, "b.png");
  g_autofree char *svg = tmp_path (dir, "c.svg"), *pdf = tmp_path (dir, "d.pdf");
  g_autoptr (GError) error = NULL;
  g_autofree char *one = NULL, *two = NULL;
  gsize n1, n2;

  cost_series (s, a, b);
  rugosa_plot_spec_init (&spec);
  spec.view = RUGOSA_CHART_VIEW_COST;
  g_strlcpy (spec.x_title, "Years of service", sizeof spec.x_title);
  g_strlcpy (spec.y_title, "Cumulative cost", sizeof spec.y_title);
  g_strlcpy (spec.payback_format, "pays back after %s years", sizeof spec.payback_format);
  g_assert_true (rugosa_plot_export (&spec, s, 2, RUGOSA_CHART_FORMAT_PNG, 800, 500, TEST_DATE, png1, &error));
  g_assert_true (rugosa_plot_export (&spec, s, 2, RUGOSA_CHART_FORMAT_PNG, 800, 500, TEST_DATE, png2, &error));
  g_assert_true (rugosa_plot_export (&spec, s, 2, RUGOSA_CHART_FORMAT_SVG, 800, 500, TEST_DATE, svg, &error));
  g_assert_true (rugosa_plot_export (&spec, s, 2, RUGOSA_CHART_FORMAT_PDF, 800, 500, TEST_DATE, pdf, &error));
  g_assert_no_error (error);
  /* the same input gives the same bytes */
  g_assert_true (g_file_get_contents (png1, &one, &n1, NULL));
  g_assert_true (g_file_get_contents (png2, &two, &n2, NULL));
  g_assert_cmpuint (n1, ==, n2);
  g_assert_true (memcmp (one, two, n1) == 0);
  g_assert_true (g_str_has_prefix (one, "\x89PNG"));

  /* Common practice (no single source): an exported chart carries its
   * axis titles, its curves' names, the caution and the date (PDF text is
   * searchable) */
  {
    g_autofree char *out = NULL;
    g_autofree char *cmd = g_find_program_in_path ("pdftotext");

    if (cmd != NULL)
      {
        const char *argv[] = { cmd, pdf, "-", NULL };

        g_assert_true (g_spawn_sync (NULL, (char **) argv, NULL, G_SPAWN_STDERR_TO_DEV_NULL,
                                     NULL, NULL, &out, NULL, NULL, NULL));
        g_assert_nonnull (strstr (out, "Years of service"));
        g_assert_nonnull (strstr (out, "Cumulative cost"));
        g_assert_nonnull (strstr (out, "pays back after 5.0 years"));
        g_assert_nonnull (strstr (out, "licensed engineer"));
        g_assert_nonnull (strstr (out, TEST_DATE));
      }
  }
  /* no date: refused, nothing written */
  g_clear_error (&error);
  {
    g_autofree char *none = tmp_path (dir, "none.png");

    g_assert_false (rugosa_plot_export (&spec, s, 2, RUGOSA_CHART_FORMAT_PNG, 800, 500, "", none, &error));
    g_assert_error (error, RUGOSA_CHART_ERROR, RUGOSA_CHART_ERROR_INVALID);
    g_assert_false (g_file_test (none, G_FILE_TEST_EXISTS));
  }
  g_remove (png1);
  g_remove (png2);
  g_remove (svg);
  g_remove (pdf);
  g_rmdir (dir);
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/chart-plot/views", test_views);
  g_test_add_func ("/chart-plot/spec-check", test_spec_check);
  g_test_add_func ("/chart-plot/crossings", test_crossings);
  g_test_add_func ("/chart-plot/system/pixels-and-hits", test_system_pixels_and_hits);
  g_test_add_func ("/chart-plot/export", test_export);
  return g_test_run ();
}
