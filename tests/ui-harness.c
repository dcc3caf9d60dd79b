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

void
ui_harness_wait (guint ms)
{
  gint64 end = g_get_monotonic_time () + (gint64) ms * 1000;

  while (g_get_monotonic_time () < end)
    {
      if (!g_main_context_iteration (NULL, FALSE))
        g_usleep (2000);
    }
}

gboolean
ui_harness_wait_until (gboolean (*done) (gpointer data),
                       gpointer   data,
                       guint      ms)
{
  gint64 end = g_get_monotonic_time () + (gint64) ms * 1000;

  while (!done (data))
    {
      if (g_get_monotonic_time () >= end)
        return done (data);
      if (!g_main_context_iteration (NULL, FALSE))
        g_usleep (2000);
    }
  return TRUE;
}

GtkWidget *
ui_harness_find_descendant (GtkWidget *root,
                            GType      type)
{
  for (GtkWidget *c = gtk_widget_get_first_child (root); c; c = gtk_widget_get_next_sibling (c))
    {
      GtkWidget *found;

      if (G_TYPE_CHECK_INSTANCE_TYPE (c, type))
        return c;
      if ((found = ui_harness_find_descendant (c, type)) != NULL)
        return found;
    }
  return NULL;
}

GtkWidget *
ui_harness_find_row (GtkWidget  *root,
                     const char *title)
{
  for (GtkWidget *c = gtk_widget_get_first_child (root); c; c = gtk_widget_get_next_sibling (c))
    {
      GtkWidget *found;

      if (ADW_IS_PREFERENCES_ROW (c)
          && g_strcmp0 (adw_preferences_row_get_title (ADW_PREFERENCES_ROW (c)), title) == 0)
        return c;
      if ((found = ui_harness_find_row (c, title)) != NULL)
        return found;
    }
  return NULL;
}

GtkWidget *
ui_harness_find_action_widget (GtkWidget  *root,
                               const char *action,
                               GVariant   *target)
{
  for (GtkWidget *c = gtk_widget_get_first_child (root); c; c = gtk_widget_get_next_sibling (c))
    {
      GtkWidget *found;

      if (GTK_IS_ACTIONABLE (c)
          && g_strcmp0 (gtk_actionable_get_action_name (GTK_ACTIONABLE (c)), action) == 0)
        {
          GVariant *t = gtk_actionable_get_action_target_value (GTK_ACTIONABLE (c));

          if (target == NULL || (t != NULL && g_variant_equal (t, target)))
            return c;
        }
      if ((found = ui_harness_find_action_widget (c, action, target)) != NULL)
        return found;
    }
  return NULL;
}

GtkWindow *
ui_harness_find_dialog (GtkWindow *parent,
                        GType      type)
{
  GListModel *tops = gtk_window_get_toplevels ();  /* borrowed */

  for (guint i = 0; i < g_list_model_get_n_items (tops); i++)
    {
      g_autoptr (GtkWindow) w = g_list_model_get_item (tops, i);

      if (G_TYPE_CHECK_INSTANCE_TYPE (w, type) && gtk_window_get_transient_for (w) == parent
          && gtk_widget_get_visible (GTK_WIDGET (w)))
        return w;
    }
  return NULL;
}

AdwMessageDialog *
ui_harness_find_message_dialog (GtkWindow *parent)
{
  return (AdwMessageDialog *) ui_harness_find_dialog (parent, ADW_TYPE_MESSAGE_DIALOG);
}

void
ui_harness_click (GtkWidget *button)
{
  g_assert_nonnull (button);
  g_assert_true (GTK_IS_BUTTON (button));
  g_assert_true (gtk_widget_is_sensitive (button));
  /* What a press and release on the button ends in. */
  g_signal_emit_by_name (button, "clicked");
}

static GtkWidget *
_ui_harness_find_button (GtkWidget  *root,
                         const char *label)
{
  for (GtkWidget *c = gtk_widget_get_first_child (root); c; c = gtk_widget_get_next_sibling (c))
    {
      GtkWidget *found;

      if (GTK_IS_BUTTON (c) && g_strcmp0 (gtk_button_get_label (GTK_BUTTON (c)), label) == 0)
        return c;
      if ((found = _ui_harness_find_button (c, label)) != NULL)
        return found;
    }
  return NULL;
}

void
ui_harness_click_response (AdwMessageDialog *dialog,
                           const char       *response)
{
  const char *label;

  g_assert_nonnull (dialog);
  g_assert_true (adw_message_dialog_has_response (dialog, response));
  label = adw_message_dialog_get_response_label (dialog, response);
  ui_harness_click (_ui_harness_find_button (GTK_WIDGET (dialog), label));
}
