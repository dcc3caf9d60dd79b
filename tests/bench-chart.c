/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Chart frame times at 1600 × 1000 with 30 roughness curves and 10 lines.
 *
 *   chart_full:    background recomputed and stroked, then the overlay
 *                  (what a resize, theme or range change costs);
 *   chart_overlay: the cached background blitted, then the overlay, with
 *                  the lines' service age changed every frame (the slider).
 *
 * Prints one JSON object per line with the median in milliseconds.  The
 * text layout cache is kept across frames in both cases (it is part of the
 * chart object, as in the app).
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

int
main (void)
{
  enum { FULL_RUNS = 41, OVERLAY_RUNS = 201, LINES = 10, CURVES = 30 };
  RugosaChartSpec spec;
  RgError err = { 0 };
  static SampleSet sets[2];
  static double t_full[FULL_RUNS], t_over[OVERLAY_RUNS];

  rugosa_chart_spec_init (&spec);
  spec.width = 1600;
  spec.height = 1000;
  /* smooth plus 29 values evenly spread in log ε/D from 1e-6 to 0.05 */
  spec.n_family = CURVES;
  spec.family[0] = 0;
  for (int i = 1; i < CURVES; i++)
    spec.family[i] = 1e-6 * pow (5e4, (double) (i - 1) / (CURVES - 2));

  /* two states of the same lines: new-ish and aged (different readouts) */
  GRand *rand = g_rand_new_with_seed (7);
  sample_random (&sets[0], rand, LINES);
  g_rand_set_seed (rand, 7);
  sample_random (&sets[1], rand, LINES);
  for (size_t i = 0; i < LINES; i++)
    {
      sets[1].lines[i].f *= 1.05;
      snprintf (sets[1].vel[i], sizeof sets[1].vel[i], "v = %.2f m/s", 1.0 + 0.1 * i);
    }
  g_rand_free (rand);

  RugosaChart *chart = rugosa_chart_new ();
  if (rugosa_chart_set_spec (chart, &spec, &err) != RG_OK)
    {
      fprintf (stderr, "%s\n", err.text);
      return 1;
    }
  rugosa_chart_set_lines (chart, sets[0].lines, sets[0].n);
  cairo_surface_t *target = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, 1600, 1000);
  cairo_t *cr = cairo_create (target);
  rugosa_chart_draw (chart, cr); /* warm the text cache and the font files */

  for (int i = 0; i < FULL_RUNS; i++)
    {
      const double t0 = now_ms ();
      rugosa_chart_invalidate_background (chart);
      rugosa_chart_draw (chart, cr);
      cairo_surface_flush (target);
      t_full[i] = now_ms () - t0;
    }
  const unsigned builds = rugosa_chart_background_builds (chart);
  for (int i = 0; i < OVERLAY_RUNS; i++)
    {
      const double t0 = now_ms ();
      rugosa_chart_set_lines (chart, sets[i % 2].lines, sets[i % 2].n);
      rugosa_chart_draw (chart, cr);
      cairo_surface_flush (target);
      t_over[i] = now_ms () - t0;
    }
  if (rugosa_chart_background_builds (chart) != builds)
    {
      fprintf (stderr, "an overlay-only change rebuilt the background\n");
      return 1;
    }

  printf ("{\"bench\":\"chart_full\",\"ms_median\":%.3f,\"clock\":\"thread-cpu\"}\n",
          median (t_full, FULL_RUNS));
  printf ("{\"bench\":\"chart_overlay\",\"ms_median\":%.3f,\"clock\":\"thread-cpu\"}\n",
          median (t_over, OVERLAY_RUNS));

  cairo_destroy (cr);
  cairo_surface_destroy (target);
  rugosa_chart_free (chart);
  return 0;
}
