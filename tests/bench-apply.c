/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Benchmark: the cost of applying one line's fluid to every line of a
 * project, and of its undo, against the number of lines.
 *
 * rugosa_apply_part (rugosa-apply.c) makes one pass over the targets
 * times the fluid's rows (a comparison each, then one recorded change per
 * value that differs) and the project emits "changed" once; each changed
 * line is evaluated again once, when asked.  So apply, undo and the
 * evaluation after either should all grow linearly with the number of
 * lines n.  Measured over the invented projects of tests/gen-lines.py
 * (every line water at its own temperature), the first line made seawater
 * (its kind, temperature, pressure and salinity: four rows to change in
 * every other line) and applied to all n lines.
 *
 * Timing: the median of BENCH_REPS rounds of apply, evaluation of every
 * line, undo, evaluation of every line.  apply_ms and undo_ms are the
 * history's work alone (the model, no window); eval_ms the one
 * re-evaluation per changed line that follows (what a window's refresh
 * costs on top, chart drawing aside).
 *
 * Measured on the development machine (2 cores shared with other work,
 * load near 2), three runs: n = 100: apply 0.29–0.48 ms, undo 0.13–0.18
 * ms, evaluation after either 1.1–1.7 ms; n = 1000: apply 3.3–5.4 ms,
 * undo 1.5–2.4 ms, evaluation 11–17 ms (apply 9.7 ms under heavier
 * load).  Per line: 3–5 µs to apply, 1.3–2.4 µs to undo, 12–17 µs to
 * evaluate, the same at both sizes within the noise: linear.
 *
 * Output: one JSON line per project on stdout.  Exit status 0 whatever
 * the figures: a measurement, not a test. */
#include "config.h"

#include <glib.h>
#include <stdio.h>
#include <stdlib.h>

#include "core/fluid.h"
#include "model/rugosa-apply.h"

enum { BENCH_REPS = 15 };

static int
cmp_double (const void *a, const void *b)
{
  const double x = *(const double *) a, y = *(const double *) b;
  return (x > y) - (x < y);
}

static double
median (double *v)
{
  qsort (v, BENCH_REPS, sizeof v[0], cmp_double);
  return v[BENCH_REPS / 2];
}

static double
ms_since (gint64 t0)
{
  return (double) (g_get_monotonic_time () - t0) / 1000.0;
}

static void
evaluate_all (RugosaProject *project)
{
  guint n = rugosa_project_get_n_lines (project);

  for (guint i = 0; i < n; i++)
    rugosa_project_get_results (project, rugosa_project_get_line (project, i));
}

static int
bench (const char *path)
{
  g_autoptr (RugosaProject) project = rugosa_project_new ();
  g_autoptr (RugosaHistory) history = NULL;
  g_autoptr (GError) error = NULL;
  g_autofree RugosaLine **targets = NULL;
  double apply_ms[BENCH_REPS], undo_ms[BENCH_REPS];
  double eval_apply_ms[BENCH_REPS], eval_undo_ms[BENCH_REPS];
  guint n, changed = 0;
  RugosaLine *source;

  if (!rugosa_project_load (project, path, &error))
    {
      fprintf (stderr, "bench-apply: %s\n", error->message);
      return 1;
    }
  n = rugosa_project_get_n_lines (project);
  if (n < 2)
    {
      fprintf (stderr, "bench-apply: %s holds fewer than two lines\n", path);
      return 1;
    }
  source = rugosa_project_get_line (project, 0);
  g_object_set (source, "fluid-kind", RG_FLUID_SEAWATER, "temperature", 288.15,
                "pressure", 2.0e5, "salinity", 0.035, NULL);
  targets = g_new (RugosaLine *, n);
  for (guint i = 0; i < n; i++)
    targets[i] = rugosa_project_get_line (project, i);
  history = rugosa_history_new (project);
  evaluate_all (project);

  for (int r = 0; r < BENCH_REPS; r++)
    {
      gint64 t0 = g_get_monotonic_time ();

      changed = rugosa_apply_part (history, source, RUGOSA_LINE_PART_FLUID, targets, n);
      apply_ms[r] = ms_since (t0);
      t0 = g_get_monotonic_time ();
      evaluate_all (project);
      eval_apply_ms[r] = ms_since (t0);
      t0 = g_get_monotonic_time ();
      rugosa_history_undo (history);
      undo_ms[r] = ms_since (t0);
      t0 = g_get_monotonic_time ();
      evaluate_all (project);
      eval_undo_ms[r] = ms_since (t0);
    }
  {
    double a = median (apply_ms), u = median (undo_ms);

    printf ("{\"lines\": %u, \"lines_changed\": %u, \"apply_ms\": %.3f, \"undo_ms\": %.3f, "
            "\"eval_after_apply_ms\": %.3f, \"eval_after_undo_ms\": %.3f, "
            "\"apply_us_per_line\": %.2f, \"undo_us_per_line\": %.2f}\n",
            n, changed, a, u, median (eval_apply_ms), median (eval_undo_ms),
            1000.0 * a / changed, 1000.0 * u / changed);
  }
  return 0;
}

int
main (int argc, char **argv)
{
  if (argc < 2)
    {
      fprintf (stderr, "usage: bench-apply PROJECT…\n");
      return 2;
    }
  for (int i = 1; i < argc; i++)
    if (bench (argv[i]) != 0)
      return 1;
  return 0;
}
