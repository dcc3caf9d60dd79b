/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Benchmark: the cost of sizing against the number of catalog sizes.
 *
 * rugosa_sizing_run evaluates each size once through the one evaluation
 * (rugosa-sizing.c), so its cost should grow linearly with the number of
 * sizes n.  Measured here for four choices of catalogs of growing n: PE's
 * usual series (SDR 11), every PE series, steel's usual series (STD) and
 * every series of ASME B36.10M, each for a water duty with a design and a
 * highest flow, two kinds of fittings and 50 years of aging (so every size
 * computes the fluid, two flows, new and aged).  A fresh project for each
 * repetition: the first lookup of each designation is part of the cost.
 *
 * Timing: the median of BENCH_REPS runs of each choice; us_per_size is
 * that median over n.  The cost of one evaluation differs from size to
 * size (a tiny bore at a large flow fills its warnings and errors with
 * formatted values), so the same sizes are also evaluated one by one
 * through rugosa_project_evaluate_line alone (evaluations_ms, the median
 * of BENCH_REPS passes): overhead = ms / evaluations_ms close to 1 says
 * that sizing costs its n evaluations and nothing that grows faster.  The
 * smallest bore within the limits (rugosa_solve_diameter, a bisection of
 * about 45 evaluations) is timed too, for comparison.
 *
 * Measured on the development machine (2 cores shared with other work):
 * 12, 12, 8 and 11 µs per size for n = 24, 66, 24 and 244 (2.6 ms for all
 * 244 steel sizes), overhead 1.06 to 1.23; under load from other work the
 * figures rose to 9–41 µs per size with overhead up to 1.6.  The part
 * above 1 is the memory of the candidates (each keeps its whole results,
 * about 10 kB, so 2.4 MB for 244 sizes, touched for the first time) and
 * the first lookup of each designation, both linear in n.
 *
 * Output: one JSON line per choice on stdout.  Exit status 0 whatever the
 * figures: a measurement, not a test. */
#include "config.h"

#include <glib.h>
#include <stdio.h>
#include <stdlib.h>

#include "core/fluid.h"
#include "model/rugosa-project.h"
#include "model/rugosa-sizing.h"

enum { BENCH_REPS = 15 };

static int
cmp_double (const void *a, const void *b)
{
  const double x = *(const double *) a, y = *(const double *) b;
  return (x > y) - (x < y);
}

static RugosaLine *
duty (void)
{
  RugosaLine *line = rugosa_line_new ("duty");

  g_object_set (line, "fluid-kind", RG_FLUID_WATER, "temperature", 288.15,
                "length", 1500.0, "elevation", 8.0, "flow-design", 0.04,
                "flow-maximum", 0.06, "aging-class-id", "moderate", NULL);
  rugosa_line_set_fittings (line, g_variant_new_parsed ("[('elbow-90-long-radius', 0.0, 8.0), ('valve-gate', 0.0, 2.0)]"));
  return line;
}

int
main (void)
{
  static const struct { const char *material, *catalog; } choices[] = {
    { "pe", NULL },
    { "pe", "all" },
    { "commercial-steel", NULL },
    { "commercial-steel", "ASME B36.10M" },
  };
  g_autoptr (RugosaLine) line = duty ();
  const RugosaLimits limits = { 2.0, 0.3, 1.0, 25.0 };

  for (gsize k = 0; k < G_N_ELEMENTS (choices); k++)
    {
      double us[BENCH_REPS];
      guint n = 0;

      for (int r = 0; r < BENCH_REPS; r++)
        {
          g_autoptr (RugosaProject) project = rugosa_project_new ();
          RgError err = { 0 };
          gint64 t0 = g_get_monotonic_time ();
          RugosaSizing *s = rugosa_sizing_run (project, line, choices[k].material,
                                               choices[k].catalog, &limits, 50.0, &err);

          us[r] = (double) (g_get_monotonic_time () - t0);
          if (s == NULL)
            {
              fprintf (stderr, "bench-sizing: %s\n", err.text);
              return 1;
            }
          n = s->n_candidates;
          rugosa_sizing_free (s);
        }
      qsort (us, BENCH_REPS, sizeof us[0], cmp_double);
      {
        /* the same sizes, each evaluated alone */
        double ev[BENCH_REPS];
        g_autoptr (RugosaProject) project = rugosa_project_new ();
        g_autoptr (RugosaLine) trial = rugosa_line_duplicate (line);
        RugosaSizing *s = rugosa_sizing_run (project, line, choices[k].material,
                                             choices[k].catalog, &limits, 50.0, NULL);
        RugosaLineResults *r = g_new (RugosaLineResults, 1);

        g_object_set (trial, "material-id", choices[k].material, NULL);
        for (int rep = 0; rep < BENCH_REPS; rep++)
          {
            gint64 total = 0;

            for (guint i = 0; i < s->n_candidates; i++)
              {
                gint64 t0;

                g_object_set (trial, "pipe-designation", s->candidates[i].pipe->designation, NULL);
                t0 = g_get_monotonic_time ();
                rugosa_project_evaluate_line (project, trial, 50.0, r);
                total += g_get_monotonic_time () - t0;
              }
            ev[rep] = (double) total;
          }
        qsort (ev, BENCH_REPS, sizeof ev[0], cmp_double);
        printf ("{\"material\": \"%s\", \"catalog\": \"%s\", \"sizes\": %u, \"ms\": %.3f, \"us_per_size\": %.2f, "
                "\"evaluations_ms\": %.3f, \"overhead\": %.2f}\n",
                choices[k].material, choices[k].catalog ? choices[k].catalog : "usual", n,
                us[BENCH_REPS / 2] / 1000.0, us[BENCH_REPS / 2] / (double) n,
                ev[BENCH_REPS / 2] / 1000.0, us[BENCH_REPS / 2] / ev[BENCH_REPS / 2]);
        g_free (r);
        rugosa_sizing_free (s);
      }
    }
  {
    double us[BENCH_REPS], d = 0.0;
    g_autoptr (RugosaProject) project = rugosa_project_new ();

    g_object_set (line, "material-id", "pe", NULL);
    for (int r = 0; r < BENCH_REPS; r++)
      {
        gint64 t0 = g_get_monotonic_time ();

        if (!rugosa_solve_diameter (project, line, 50.0, &limits, &d, NULL))
          return 1;
        us[r] = (double) (g_get_monotonic_time () - t0);
      }
    qsort (us, BENCH_REPS, sizeof us[0], cmp_double);
    printf ("{\"solve\": \"diameter\", \"ms\": %.3f, \"diameter_m\": %.6g}\n",
            us[BENCH_REPS / 2] / 1000.0, d);
  }
  return 0;
}
