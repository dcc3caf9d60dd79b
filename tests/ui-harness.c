/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "test-ui"

#include "config.h"

#include <glib/gstdio.h>

#include "ui-harness.h"

char *
ui_harness_private_dirs (const char *name)
{
  g_autofree char *template = g_strdup_printf ("%s-XXXXXX", name);
  char *tmpdir = g_dir_make_tmp (template, NULL);
  g_autofree char *state = NULL;
  g_autofree char *data = NULL;

  g_assert_nonnull (tmpdir);
  state = g_build_filename (tmpdir, "state", NULL);
  data = g_build_filename (tmpdir, "data", NULL);
  g_setenv ("XDG_STATE_HOME", state, TRUE);
  g_setenv ("XDG_DATA_HOME", data, TRUE);
  g_setenv ("GSETTINGS_BACKEND", "memory", TRUE);
  g_setenv ("GSK_RENDERER", "cairo", FALSE);
  return tmpdir;
}

gboolean
ui_harness_init_gtk (void)
{
  gtk_disable_setlocale ();
  if (!gtk_init_check ())
    return FALSE;
  adw_init ();
  return TRUE;
}

RugosaApplication *
ui_harness_app_new (const char *application_id)
{
  RugosaApplication *app =
    g_object_new (RUGOSA_TYPE_APPLICATION,
                  "application-id", application_id,
                  "flags", G_APPLICATION_NON_UNIQUE | G_APPLICATION_HANDLES_OPEN,
                  "resource-base-path", "/org/rugosa/Rugosa",
                  NULL);

  g_assert_true (g_application_register (G_APPLICATION (app), NULL, NULL));
  return app;
}

void
ui_harness_drain (void)
{
  while (g_main_context_pending (NULL))
    g_main_context_iteration (NULL, FALSE);
}

char *
ui_harness_demo_path (void)
{
  const char *src = g_getenv ("RUGOSA_SOURCE_DIR");

  g_assert_nonnull (src);
  return g_build_filename (src, "data", "demo.rugosa", NULL);
}

RugosaWindow *
ui_harness_open_demo (RugosaApplication *app)
{
  RugosaWindow *win = rugosa_window_new (app);
  g_autofree char *path = ui_harness_demo_path ();
  g_autoptr (GFile) file = g_file_new_for_path (path);
  g_autoptr (GError) error = NULL;

  gtk_window_set_default_size (GTK_WINDOW (win), 1400, 900);
  gtk_window_present (GTK_WINDOW (win));
  g_assert_true (rugosa_window_load_file_sync (win, file, &error));
  g_assert_no_error (error);
  ui_harness_drain ();
  return win;
}

void
ui_harness_close_window (RugosaWindow *win)
{
  gtk_window_destroy (GTK_WINDOW (win));
  ui_harness_drain ();
}

void
ui_harness_save_png (GtkWidget *widget, const char *name)
{
  const char *build = g_getenv ("RUGOSA_BUILD_DIR");
  g_autofree char *path = g_build_filename (build ? build : ".", name, NULL);
  GdkPaintable *paintable;
  GtkSnapshot *snapshot;
  GskRenderNode *node;
  GdkTexture *texture;
  int w, h;

  gtk_test_widget_wait_for_draw (widget);
  ui_harness_drain ();
  w = gtk_widget_get_width (widget);
  h = gtk_widget_get_height (widget);
  g_assert_cmpint (w, >, 0);
  paintable = gtk_widget_paintable_new (widget);
  snapshot = gtk_snapshot_new ();
  gdk_paintable_snapshot (paintable, snapshot, w, h);
  node = gtk_snapshot_free_to_node (snapshot);
  g_assert_nonnull (node);
  texture = gsk_renderer_render_texture (gtk_native_get_renderer (gtk_widget_get_native (widget)),
                                         node, &GRAPHENE_RECT_INIT (0, 0, w, h));
  g_assert_true (gdk_texture_save_to_png (texture, path));
  g_assert_cmpint (gdk_texture_get_width (texture), ==, w);
  g_test_message ("screenshot: %s", path);
  g_object_unref (texture);
  gsk_render_node_unref (node);
  g_object_unref (paintable);
}

void
ui_harness_remove_tree (const char *path)
{
  g_autoptr (GDir) dir = g_dir_open (path, 0, NULL);
  const char *name;

  if (dir != NULL)
    while ((name = g_dir_read_name (dir)) != NULL)
      {
        g_autofree char *child = g_build_filename (path, name, NULL);
        ui_harness_remove_tree (child);
      }
  g_remove (path);
}
