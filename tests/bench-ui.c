/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Benchmark of the desktop application, headless: the time from main()
 * to the window's first painted frame with a project (the demo, or the
 * file given as the first argument), then the service-age slider driven
 * from 0 to 50 years, one frame a step (over 10 line options for the
 * demo: its own and copies), then the pointer moved from marker to
 * marker and to empty places (hover), then presentation mode entered,
 * a line toggled by its number and left.  Prints JSON lines; targets: first
 * frame within 500 ms (the demo), slider work under 16 ms and hover work
 * under 8 ms at 100 lines, no frame over 100 ms at 1000 lines.
 *
 * "cpu_ms" is the main thread's CPU time for the whole step, from the
 * change to the end of its frame: the application's work, GTK's layout,
 * snapshot and Cairo rendering (the build machine's two cores are shared,
 * so wall times below measure the neighbours as much as the program);
 * "work_ms" is the time the application spends on a step outside GTK's
 * own drawing (the model's evaluation, the overlay, the table and panels)
 * plus the chart's snapshot; "frame_ms" is the whole frame as the frame
 * clock runs it (layout, snapshot, rendering with the Cairo renderer and
 * the upload to the X server), from before-paint to after-paint;
 * "latency_ms" is from the slider change to the end of that frame, which
 * also holds the wait for the frame clock's next tick. */
#define G_LOG_DOMAIN "bench-ui"

#include "config.h"

#include <adwaita.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>
/* Under callgrind (--collect-atstart=no) only the slider and hover steps
 * are counted. */
#if defined(__has_include)
#if __has_include(<valgrind/callgrind.h>)
#include <valgrind/callgrind.h>
#endif
#endif
#ifndef CALLGRIND_TOGGLE_COLLECT
#define CALLGRIND_TOGGLE_COLLECT
#endif

#include "rugosa-application.h"
#include "rugosa-canvas.h"
#include "rugosa-window.h"
#include "ui-harness.h"

static guint paints;
static gint64 before_paint_us, last_paint_cost_us;

static void
before_paint (GdkFrameClock *clock,
              gpointer       user_data)
{
  before_paint_us = g_get_monotonic_time ();
}

static void
after_paint (GdkFrameClock *clock,
             gpointer       user_data)
{
  last_paint_cost_us = g_get_monotonic_time () - before_paint_us;
  paints++;
}

static void
wait_paint (void)
{
  guint start = paints;

  while (paints == start)
    g_main_context_iteration (NULL, TRUE);
}

static double
cpu_ms (void)
{
  struct timespec ts;

  clock_gettime (CLOCK_THREAD_CPUTIME_ID, &ts);
  return (double) ts.tv_sec * 1e3 + (double) ts.tv_nsec * 1e-6;
}

static int
cmp_double (const void *a,
            const void *b)
{
  double x = *(const double *) a, y = *(const double *) b;
  return (x > y) - (x < y);
}

int
main (int argc, char *argv[])
{
  gint64 t_start = g_get_monotonic_time ();
  g_autoptr (RugosaApplication) app = NULL;
  RugosaWindow *win;
  RugosaProject *project;
  RugosaCanvas *canvas;
  GtkRange *scale;
  const char *src = g_getenv ("RUGOSA_SOURCE_DIR");
  g_autofree char *path = argc > 1 ? g_strdup (argv[1])
                                   : g_build_filename (src ? src : ".", "data", "demo.rugosa", NULL);
  g_autoptr (GFile) file = g_file_new_for_path (path);
  g_autoptr (GError) error = NULL;
  enum { STEPS = 101 };
  /* fewer steps under a profiler */
  const int steps = g_getenv ("RUGOSA_BENCH_STEPS") ? CLAMP (atoi (g_getenv ("RUGOSA_BENCH_STEPS")), 2, STEPS) : STEPS;
  double work[STEPS], frame[STEPS], latency[STEPS], cpu[STEPS], sorted[STEPS];
  double first_ms, init_ms, window_ms, load_ms;
  guint n, placements;

  /* settings in memory, and the autosave and recent files in a folder of
   * its own: a benchmark leaves nothing in the user's state */
  g_free (ui_harness_private_dirs ("rugosa-bench-ui"));
  gtk_disable_setlocale ();
  if (!gtk_init_check ())
    {
      g_print ("{\"bench\":\"ui\",\"skipped\":\"no display\"}\n");
      return 0;
    }
  adw_init ();
  init_ms = (g_get_monotonic_time () - t_start) / 1000.0;
  app = g_object_new (RUGOSA_TYPE_APPLICATION,
                      "application-id", "org.rugosa.Rugosa.Bench",
                      "flags", G_APPLICATION_NON_UNIQUE,
                      "resource-base-path", "/org/rugosa/Rugosa",
                      NULL);
  g_application_register (G_APPLICATION (app), NULL, NULL);

  win = rugosa_window_new (app);
  window_ms = (g_get_monotonic_time () - t_start) / 1000.0;
  gtk_window_set_default_size (GTK_WINDOW (win), 1400, 900);
  if (!rugosa_window_load_file_sync (win, file, &error))
    {
      g_printerr ("bench-ui: %s\n", error->message);
      return 1;
    }
  load_ms = (g_get_monotonic_time () - t_start) / 1000.0;
  gtk_window_present (GTK_WINDOW (win));
  g_signal_connect (gtk_widget_get_frame_clock (GTK_WIDGET (win)), "before-paint",
                    G_CALLBACK (before_paint), NULL);
  g_signal_connect (gtk_widget_get_frame_clock (GTK_WIDGET (win)), "after-paint",
                    G_CALLBACK (after_paint), NULL);
  wait_paint ();
  first_ms = (g_get_monotonic_time () - t_start) / 1000.0;
  g_print ("{\"bench\":\"ui-first-frame\",\"ms\":%.1f,\"target_ms\":500,\"from\":\"main\","
           "\"gtk_init_ms\":%.1f,\"window_built_ms\":%.1f,\"demo_loaded_ms\":%.1f}\n",
           first_ms, init_ms, window_ms, load_ms);

  /* At least ten line options: the file's, then copies of them. */
  project = rugosa_window_get_project (win);
  n = rugosa_project_get_n_lines (project);
  for (guint i = 0; rugosa_project_get_n_lines (project) < 10; i++)
    rugosa_history_duplicate_line (rugosa_window_get_history (win), i % n);
  n = rugosa_project_get_n_lines (project);

  canvas = RUGOSA_CANVAS (rugosa_window_get_canvas (win));
  scale = rugosa_window_get_age_scale (win);
  gtk_range_set_value (scale, 0.0);
  wait_paint ();
  placements = rugosa_canvas_get_placements (canvas);

  CALLGRIND_TOGGLE_COLLECT;
  for (int i = 0; i < steps; i++)
    {
      gint64 t0 = g_get_monotonic_time (), t1;
      double c0 = cpu_ms ();

      gtk_range_set_value (scale, 50.0 * i / (steps - 1));
      t1 = g_get_monotonic_time ();
      wait_paint ();
      cpu[i] = cpu_ms () - c0;
      work[i] = (t1 - t0) / 1000.0 + rugosa_canvas_get_last_draw_us (canvas) / 1000.0;
      latency[i] = (g_get_monotonic_time () - t0) / 1000.0;
      frame[i] = last_paint_cost_us / 1000.0;
      g_print ("{\"bench\":\"ui-slider-frame\",\"step\":%d,\"age_years\":%.1f,\"lines\":%u,"
               "\"cpu_ms\":%.3f,\"work_ms\":%.3f,\"frame_ms\":%.3f,\"latency_ms\":%.3f}\n",
               i, 50.0 * i / (steps - 1), n, cpu[i], work[i], frame[i], latency[i]);
    }

  CALLGRIND_TOGGLE_COLLECT;
  memcpy (sorted, cpu, sizeof cpu[0] * steps);
  qsort (sorted, steps, sizeof sorted[0], cmp_double);
  g_print ("{\"bench\":\"ui-slider-cpu\",\"lines\":%u,\"cpu_median_ms\":%.3f,\"cpu_p95_ms\":%.3f,"
           "\"cpu_max_ms\":%.3f,\"target_ms\":16,\"clock\":\"thread-cpu\"}\n",
           n, sorted[steps / 2], sorted[(int) (steps * 0.95)], sorted[steps - 1]);
  memcpy (sorted, work, sizeof work[0] * steps);
  qsort (sorted, steps, sizeof sorted[0], cmp_double);
  g_print ("{\"bench\":\"ui-slider\",\"lines\":%u,\"frames\":%d,\"work_median_ms\":%.3f,"
           "\"work_p95_ms\":%.3f,\"work_max_ms\":%.3f,\"target_ms\":16,\"background_builds\":%u,"
           "\"placements\":%u}\n",
           n, steps, sorted[steps / 2], sorted[(int) (steps * 0.95)], sorted[steps - 1],
           rugosa_canvas_get_background_builds (canvas),
           rugosa_canvas_get_placements (canvas) - placements);
  memcpy (sorted, frame, sizeof frame[0] * steps);
  qsort (sorted, steps, sizeof sorted[0], cmp_double);
  g_print ("{\"bench\":\"ui-slider-paint\",\"frame_median_ms\":%.3f,\"frame_p95_ms\":%.3f,\"frame_max_ms\":%.3f,\"target_ms\":16}\n",
           sorted[steps / 2], sorted[(int) (steps * 0.95)], sorted[steps - 1]);
  memcpy (sorted, latency, sizeof latency[0] * steps);
  qsort (sorted, steps, sizeof sorted[0], cmp_double);
  g_print ("{\"bench\":\"ui-slider-latency\",\"latency_median_ms\":%.3f,\"latency_p95_ms\":%.3f,\"latency_max_ms\":%.3f}\n",
           sorted[steps / 2], sorted[(int) (steps * 0.95)], sorted[steps - 1]);

  /* Hover: the pointer from marker to marker, and to a place between
   * them every other step.  Work: the canvas's hit test and probe, and
   * its snapshot; the labels must not be placed again. */
  placements = rugosa_canvas_get_placements (canvas);
  {
    double hover_work[STEPS], hover_frame[STEPS], hover_cpu[STEPS];
    int w = gtk_widget_get_width (GTK_WIDGET (canvas));
    int h = gtk_widget_get_height (GTK_WIDGET (canvas));

    for (int i = 0; i < steps; i++)
      {
        double x = w * (0.1 + 0.8 * ((i * 37) % 101) / 100.0), y = h * (0.1 + 0.6 * ((i * 53) % 101) / 100.0);
        gint64 t0, t1;

        if (i % 2 == 0)
          (void) rugosa_canvas_marker_position (canvas, (guint) (i * 7) % n, &x, &y);
        double c0 = cpu_ms ();
        t0 = g_get_monotonic_time ();
        rugosa_canvas_pointer_at (canvas, x, y);
        t1 = g_get_monotonic_time ();
        gtk_widget_queue_draw (GTK_WIDGET (canvas));
        wait_paint ();
        hover_cpu[i] = cpu_ms () - c0;
        hover_work[i] = (t1 - t0) / 1000.0 + rugosa_canvas_get_last_draw_us (canvas) / 1000.0;
        hover_frame[i] = last_paint_cost_us / 1000.0;
      }
    qsort (hover_work, steps, sizeof hover_work[0], cmp_double);
    qsort (hover_frame, steps, sizeof hover_frame[0], cmp_double);
    qsort (hover_cpu, steps, sizeof hover_cpu[0], cmp_double);
    g_print ("{\"bench\":\"ui-hover-cpu\",\"lines\":%u,\"cpu_median_ms\":%.3f,\"cpu_p95_ms\":%.3f,"
             "\"cpu_max_ms\":%.3f,\"target_ms\":8,\"clock\":\"thread-cpu\"}\n",
             n, hover_cpu[steps / 2], hover_cpu[(int) (steps * 0.95)], hover_cpu[steps - 1]);
    g_print ("{\"bench\":\"ui-hover\",\"lines\":%u,\"moves\":%d,\"work_median_ms\":%.3f,"
             "\"work_p95_ms\":%.3f,\"work_max_ms\":%.3f,\"target_ms\":8,\"frame_max_ms\":%.3f,"
             "\"placements\":%u}\n",
             n, steps, hover_work[steps / 2], hover_work[(int) (steps * 0.95)], hover_work[steps - 1],
             hover_frame[steps - 1], rugosa_canvas_get_placements (canvas) - placements);
  }

  /* Presentation: entering (the frame at the larger type, the background
   * rebuilt), a line hidden and shown again by its number key, leaving
   * (the window's lines shown, selection and age put back).  Entering
   * and leaving visit each line once. */
  {
    double enter_cpu, enter_ms, toggle_cpu = 0, toggle_ms = 0, leave_cpu, leave_ms, magnify, c0;
    gint64 t0;

    c0 = cpu_ms ();
    t0 = g_get_monotonic_time ();
    rugosa_window_set_presenting (win, TRUE);
    wait_paint ();
    enter_cpu = cpu_ms () - c0;
    enter_ms = (g_get_monotonic_time () - t0) / 1000.0;
    magnify = rugosa_canvas_get_magnify (canvas);
    for (int k = 0; k < 2; k++)
      {
        c0 = cpu_ms ();
        t0 = g_get_monotonic_time ();
        rugosa_window_present_toggle_line (win, 1);
        wait_paint ();
        toggle_cpu = MAX (toggle_cpu, cpu_ms () - c0);
        toggle_ms = MAX (toggle_ms, (g_get_monotonic_time () - t0) / 1000.0);
      }
    c0 = cpu_ms ();
    t0 = g_get_monotonic_time ();
    rugosa_window_set_presenting (win, FALSE);
    wait_paint ();
    leave_cpu = cpu_ms () - c0;
    leave_ms = (g_get_monotonic_time () - t0) / 1000.0;
    g_print ("{\"bench\":\"ui-present\",\"lines\":%u,\"magnify\":%.2f,\"enter_cpu_ms\":%.3f,"
             "\"enter_ms\":%.3f,\"toggle_cpu_max_ms\":%.3f,\"toggle_max_ms\":%.3f,"
             "\"leave_cpu_ms\":%.3f,\"leave_ms\":%.3f,\"clock\":\"thread-cpu\"}\n",
             n, magnify, enter_cpu, enter_ms, toggle_cpu, toggle_ms,
             leave_cpu, leave_ms);
  }

  gtk_window_destroy (GTK_WINDOW (win));
  return 0;
}
