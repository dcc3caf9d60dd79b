/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Benchmark of the desktop application, headless: the time from main()
 * to the window's first painted frame with the demo project, then the
 * service-age slider driven from 0 to 50 years over 10 line options, one
 * frame a step.  Prints JSON lines; targets: first frame within 500 ms,
 * each slider frame under 16 ms (one frame at 60 Hz).
 *
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

#include "rugosa-application.h"
#include "rugosa-canvas.h"
#include "rugosa-window.h"

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
  g_autofree char *path = g_build_filename (src ? src : ".", "data", "demo.rugosa", NULL);
  g_autoptr (GFile) file = g_file_new_for_path (path);
  g_autoptr (GError) error = NULL;
  enum { STEPS = 101 };
  double work[STEPS], frame[STEPS], latency[STEPS], sorted[STEPS];
  double first_ms, init_ms, window_ms, load_ms;
  guint n;

  g_setenv ("GSETTINGS_BACKEND", "memory", TRUE);
  g_setenv ("GSK_RENDERER", "cairo", FALSE);
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

  /* Ten line options: the demo's, then copies of them. */
  project = rugosa_window_get_project (win);
  n = rugosa_project_get_n_lines (project);
  for (guint i = 0; rugosa_project_get_n_lines (project) < 10; i++)
    rugosa_history_duplicate_line (rugosa_window_get_history (win), i % n);
  n = rugosa_project_get_n_lines (project);

  canvas = RUGOSA_CANVAS (rugosa_window_get_canvas (win));
  scale = rugosa_window_get_age_scale (win);
  gtk_range_set_value (scale, 0.0);
  wait_paint ();

  for (int i = 0; i < STEPS; i++)
    {
      gint64 t0 = g_get_monotonic_time (), t1;

      gtk_range_set_value (scale, 50.0 * i / (STEPS - 1));
      t1 = g_get_monotonic_time ();
      wait_paint ();
      work[i] = (t1 - t0) / 1000.0 + rugosa_canvas_get_last_draw_us (canvas) / 1000.0;
      latency[i] = (g_get_monotonic_time () - t0) / 1000.0;
      frame[i] = last_paint_cost_us / 1000.0;
      g_print ("{\"bench\":\"ui-slider-frame\",\"step\":%d,\"age_years\":%.1f,\"lines\":%u,"
               "\"work_ms\":%.3f,\"frame_ms\":%.3f,\"latency_ms\":%.3f}\n",
               i, 50.0 * i / (STEPS - 1), n, work[i], frame[i], latency[i]);
    }

  memcpy (sorted, work, sizeof work);
  qsort (sorted, STEPS, sizeof sorted[0], cmp_double);
  g_print ("{\"bench\":\"ui-slider\",\"lines\":%u,\"frames\":%d,\"work_median_ms\":%.3f,"
           "\"work_p95_ms\":%.3f,\"work_max_ms\":%.3f,\"target_ms\":16,\"background_builds\":%u}\n",
           n, STEPS, sorted[STEPS / 2], sorted[(int) (STEPS * 0.95)], sorted[STEPS - 1],
           rugosa_canvas_get_background_builds (canvas));
  memcpy (sorted, frame, sizeof frame);
  qsort (sorted, STEPS, sizeof sorted[0], cmp_double);
  g_print ("{\"bench\":\"ui-slider-paint\",\"frame_median_ms\":%.3f,\"frame_p95_ms\":%.3f,\"frame_max_ms\":%.3f,\"target_ms\":16}\n",
           sorted[STEPS / 2], sorted[(int) (STEPS * 0.95)], sorted[STEPS - 1]);
  memcpy (sorted, latency, sizeof latency);
  qsort (sorted, STEPS, sizeof sorted[0], cmp_double);
  g_print ("{\"bench\":\"ui-slider-latency\",\"latency_median_ms\":%.3f,\"latency_p95_ms\":%.3f,\"latency_max_ms\":%.3f}\n",
           sorted[STEPS / 2], sorted[(int) (STEPS * 0.95)], sorted[STEPS - 1]);

  gtk_window_destroy (GTK_WINDOW (win));
  return 0;
}
