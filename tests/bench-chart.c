/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Chart frame times at 1600 × 1000 with 30 roughness curves and 10, 100
 * and 1000 invented lines.
 *
 *   chart_full:      background recomputed and stroked, then the overlay
 *                    (what a resize, theme or range change costs);
 *   chart_overlay:   the cached background blitted, then the overlay, with
 *                    the lines' service age changed every frame so that
 *                    their markers move (a slider step that moves labels);
 *   chart_still:     the same with only the readouts changed (a slider
 *                    step over lines whose markers stay): no placement;
 *   chart_hover:     the hovered line changed every frame: no placement;
 *   chart_placement: label placement alone, markers moved every time.
 *
 * Prints one JSON object per line with the median in milliseconds and how
 * many placements the frames asked for.  The text layout cache is kept
 * across frames (it is part of the chart object, as in the app).
 *
 * Times are the drawing thread's CPU time (CLOCK_THREAD_CPUTIME_ID): the
 * project builds and tests on two shared cores, where wall-clock medians
 * measure the neighbours' load as much as the chart.  The work done per
 * frame is the same either way; on an idle machine the two agree. */
#include <stdlib.h>
#include <string.h>
#include <time.h>

#include "test-chart-sample.h"

static double
now_ms (void)
{
  struct timespec ts;
  clock_gettime (CLOCK_THREAD_CPUTIME_ID, &ts);
  return ts.tv_sec * 1e3 + ts.tv_nsec * 1e-6;
}

static int
cmp_double (const void *a, const void *b)
{
  const double x = *(const double *) a, y = *(const double *) b;
  return (x > y) - (x < y);
}

static double
median (double *v, size_t n)
{
  qsort (v, n, sizeof *v, cmp_double);
  return n % 2 ? v[n / 2] : 0.5 * (v[n / 2 - 1] + v[n / 2]);
}

static double
maximum (const double *v, size_t n)
{
  double m = 0;
  for (size_t i = 0; i < n; i++)
    m = fmax (m, v[i]);
  return m;
}

static void
report (const char *name, size_t lines, double *t, size_t runs, unsigned placements)
{
  const double worst = maximum (t, runs);
  printf ("{\"bench\":\"%s\",\"lines\":%zu,\"ms_median\":%.3f,\"ms_max\":%.3f,"
          "\"runs\":%zu,\"placements\":%u,\"clock\":\"thread-cpu\"}\n",
          name, lines, median (t, runs), worst, runs, placements);
}

/* three states of the same lines: as made, aged (markers moved, other
 * readouts) and as made with other readouts of the same width */
static SampleSet sets[3];

static int
bench_lines (const RugosaChartSpec *spec, size_t n)
{
  const size_t full_runs = n <= 100 ? 41 : 11;
  const size_t runs = n <= 100 ? 201 : 41;
  double *t = g_new0 (double, runs);
  RgError err = { 0 };

  GRand *rand = g_rand_new_with_seed (7);
  sample_random (&sets[0], rand, n);
  g_rand_set_seed (rand, 7);
  sample_random (&sets[1], rand, n);
  g_rand_set_seed (rand, 7);
  sample_random (&sets[2], rand, n);
  for (size_t i = 0; i < n; i++)
    {
      sets[1].lines[i].f *= 1.05;
      snprintf (sets[1].vel[i], sizeof sets[1].vel[i], "v = %.2f m/s", 1.0 + 0.01 * (double) i);
      snprintf (sets[2].vel[i], sizeof sets[2].vel[i], "v = %.2f m/s", 2.0 + 0.01 * (double) i);
    }
  g_rand_free (rand);

  RugosaChart *chart = rugosa_chart_new ();
  if (rugosa_chart_set_spec (chart, spec, &err) != RG_OK)
    {
      fprintf (stderr, "%s\n", err.text);
      return 1;
    }
  rugosa_chart_set_lines (chart, sets[0].lines, sets[0].n);
  cairo_surface_t *target = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, 1600, 1000);
  cairo_t *cr = cairo_create (target);
  rugosa_chart_draw (chart, cr); /* warm the text cache and the font files */

  unsigned p0 = rugosa_chart_placements (chart);
  for (size_t i = 0; i < full_runs; i++)
    {
      const double t0 = now_ms ();
      rugosa_chart_invalidate_background (chart);
      rugosa_chart_draw (chart, cr);
      cairo_surface_flush (target);
      t[i] = now_ms () - t0;
    }
  report ("chart_full", n, t, full_runs, rugosa_chart_placements (chart) - p0);
  const unsigned builds = rugosa_chart_background_builds (chart);

  p0 = rugosa_chart_placements (chart);
  for (size_t i = 0; i < runs; i++)
    {
      const double t0 = now_ms ();
      rugosa_chart_set_lines (chart, sets[i % 2].lines, sets[i % 2].n);
      rugosa_chart_draw (chart, cr);
      cairo_surface_flush (target);
      t[i] = now_ms () - t0;
    }
  report ("chart_overlay", n, t, runs, rugosa_chart_placements (chart) - p0);

  rugosa_chart_set_lines (chart, sets[0].lines, sets[0].n);
  rugosa_chart_draw (chart, cr);
  p0 = rugosa_chart_placements (chart);
  for (size_t i = 0; i < runs; i++)
    {
      const double t0 = now_ms ();
      rugosa_chart_set_lines (chart, sets[i % 2 ? 2 : 0].lines, n);
      rugosa_chart_draw (chart, cr);
      cairo_surface_flush (target);
      t[i] = now_ms () - t0;
    }
  report ("chart_still", n, t, runs, rugosa_chart_placements (chart) - p0);

  p0 = rugosa_chart_placements (chart);
  for (size_t i = 0; i < runs; i++)
    {
      const double t0 = now_ms ();
      rugosa_chart_set_hover (chart, (int) (i % n));
      rugosa_chart_draw (chart, cr);
      cairo_surface_flush (target);
      t[i] = now_ms () - t0;
    }
  rugosa_chart_set_hover (chart, -1);
  report ("chart_hover", n, t, runs, rugosa_chart_placements (chart) - p0);

  p0 = rugosa_chart_placements (chart);
  for (size_t i = 0; i < runs; i++)
    {
      rugosa_chart_set_lines (chart, sets[(i + 1) % 2].lines, n);
      const double t0 = now_ms ();
      (void) rugosa_chart_legend_box (chart); /* asks for the placement */
      t[i] = now_ms () - t0;
    }
  report ("chart_placement", n, t, runs, rugosa_chart_placements (chart) - p0);

  int status = 0;
  if (rugosa_chart_background_builds (chart) != builds)
    {
      fprintf (stderr, "an overlay-only change rebuilt the background\n");
      status = 1;
    }
  cairo_destroy (cr);
  cairo_surface_destroy (target);
  rugosa_chart_free (chart);
  g_free (t);
  return status;
}

int
main (void)
{
  enum { CURVES = 30 };
  static const size_t COUNTS[] = { 10, 100, 1000 };
  RugosaChartSpec spec;
  int status = 0;

  rugosa_chart_spec_init (&spec);
  spec.width = 1600;
  spec.height = 1000;
  /* smooth plus 29 values evenly spread in log ε/D from 1e-6 to 0.05 */
  spec.n_family = CURVES;
  spec.family[0] = 0;
  for (int i = 1; i < CURVES; i++)
    spec.family[i] = 1e-6 * pow (5e4, (double) (i - 1) / (CURVES - 2));

  for (size_t c = 0; c < G_N_ELEMENTS (COUNTS); c++)
    status |= bench_lines (&spec, COUNTS[c]);
  return status;
}
