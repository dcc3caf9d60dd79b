/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Presentation mode as a presenter drives it: win.present (F5) hides the
 * panels, the table, the header bar and the view switcher, asks for full
 * screen and enlarges the chart's type; its keys show and hide lines by
 * number, step the service age and the selected line, toggle the key
 * hint; nothing of it reaches the project (no undo step, no modified
 * mark), the editing actions are off, and Escape puts the window back as
 * it was: panels, dividers, view, selection, lines shown, service age,
 * type.  Saves rugosa-present.png (rugosa-present-de.png under
 * LANGUAGE=de) in the build folder: the demo presented at the screen's
 * size (run under a 1920 × 1080 Xvfb screen to see it as a projector
 * would).
 *
 * Run through the 'ui' suite (xvfb-run and dbus-run-session); without a
 * display the program reports a skip.  Without a window manager the
 * full-screen request is not answered (gtk_window_is_fullscreen stays
 * FALSE): the test checks the window's own mode and what is shown. */
#define G_LOG_DOMAIN "test-ui-present"

#include "config.h"

#include <adwaita.h>
#include <glib/gi18n.h>
#include <locale.h>
#include <string.h>

#include "chart/rugosa-chart-plot.h"
#include "model/rugosa-history.h"
#include "rugosa-application.h"
#include "rugosa-canvas.h"
#include "rugosa-line-list.h"
#include "rugosa-project-settings-window.h"
#include "rugosa-sizing-window.h"
#include "rugosa-window.h"
#include "ui-harness.h"

static RugosaApplication *app;
static char *tmpdir;

/* The window's capture-phase key controller: presentation's keys. */
static GtkEventController *
present_keys (RugosaWindow *win)
{
  g_autoptr (GListModel) controllers = gtk_widget_observe_controllers (GTK_WIDGET (win));

  for (guint i = 0; i < g_list_model_get_n_items (controllers); i++)
    {
      g_autoptr (GObject) c = g_list_model_get_item (controllers, i);

      if (GTK_IS_EVENT_CONTROLLER_KEY (c)
          && gtk_event_controller_get_propagation_phase (GTK_EVENT_CONTROLLER (c)) == GTK_PHASE_CAPTURE)
        return GTK_EVENT_CONTROLLER (c);
    }
  g_assert_not_reached ();
  return NULL;
}

/* A key as the window receives it; whether it was taken. */
static gboolean
press (RugosaWindow    *win,
       guint            keyval,
       GdkModifierType  state)
{
  gboolean handled = FALSE;

  g_signal_emit_by_name (present_keys (win), "key-pressed", keyval, 0u, state, &handled);
  ui_harness_drain ();
  return handled;
}

/* Project line `position` drawn on the chart. */
static gboolean
drawn (RugosaWindow *win,
       guint         position)
{
  const RugosaChartInput *input;

  rugosa_canvas_refresh (RUGOSA_CANVAS (rugosa_window_get_canvas (win)));
  input = rugosa_canvas_get_input (RUGOSA_CANVAS (rugosa_window_get_canvas (win)));
  g_assert_nonnull (input);
  for (gsize i = 0; i < input->n_lines; i++)
    if (input->line_index[i] == position)
      return TRUE;
  return FALSE;
}

static double
service_age (RugosaWindow *win)
{
  return rugosa_settings_get_double (rugosa_project_get_settings (rugosa_window_get_project (win)),
                                     "service-age");
}

/* Every GtkPaned of the window, in tree order. */
static void
collect_paneds (GtkWidget *w,
                GPtrArray *out)
{
  if (GTK_IS_PANED (w))
    g_ptr_array_add (out, w);
  for (GtkWidget *c = gtk_widget_get_first_child (w); c != NULL; c = gtk_widget_get_next_sibling (c))
    collect_paneds (c, out);
}

/* The revealer of presentation's key hint (its label has the class
 * "present-hint"). */
static GtkRevealer *
find_hint (GtkWidget *w)
{
  if (GTK_IS_REVEALER (w))
    {
      GtkWidget *child = gtk_revealer_get_child (GTK_REVEALER (w));

      if (child != NULL && gtk_widget_has_css_class (child, "present-hint"))
        return GTK_REVEALER (w);
    }
  for (GtkWidget *c = gtk_widget_get_first_child (w); c != NULL; c = gtk_widget_get_next_sibling (c))
    {
      GtkRevealer *r = find_hint (c);

      if (r != NULL)
        return r;
    }
  return NULL;
}

static GtkWidget *
find (RugosaWindow *win,
      GType         type)
{
  GtkWidget *w = ui_harness_find_descendant (GTK_WIDGET (win), type);

  g_assert_nonnull (w);
  return w;
}

static void
test_present_and_back (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaProject *project = rugosa_window_get_project (win);
  RugosaHistory *history = rugosa_window_get_history (win);
  RugosaCanvas *canvas = RUGOSA_CANVAS (rugosa_window_get_canvas (win));
  GtkSingleSelection *selection = rugosa_window_get_selection (win);
  GtkWidget *header = find (win, ADW_TYPE_HEADER_BAR);
  GtkWidget *list = find (win, RUGOSA_TYPE_LINE_LIST);
  GtkWidget *panel = rugosa_window_get_line_panel (win);
  GtkWidget *results = rugosa_window_get_results (win);
  GtkWidget *switcher = find (win, GTK_TYPE_STACK_SWITCHER);
  GtkWidget *add = ui_harness_find_action_widget (GTK_WIDGET (win), "win.line-add", NULL);
  GtkStack *stack = GTK_STACK (gtk_widget_get_ancestor (GTK_WIDGET (canvas), GTK_TYPE_STACK));
  g_autoptr (GPtrArray) paneds = g_ptr_array_new ();
  int positions[8];
  guint n = rugosa_project_get_n_lines (project);
  gboolean was_fullscreen, was_maximized;
  g_autofree char *undo_label = NULL;
  gboolean could_undo;
  int width, height;
  double age;

  g_assert_nonnull (add);
  collect_paneds (GTK_WIDGET (win), paneds);
  g_assert_cmpuint (paneds->len, ==, 3);
  /* the dividers where a user left them, not at the template's values */
  for (guint i = 0; i < paneds->len; i++)
    {
      gtk_paned_set_position (g_ptr_array_index (paneds, i), gtk_paned_get_position (g_ptr_array_index (paneds, i)) - 13);
      ui_harness_drain ();
    }
  gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
  for (guint i = 0; i < paneds->len; i++)
    positions[i] = gtk_paned_get_position (g_ptr_array_index (paneds, i));
  /* another view of the chart area, the second line selected, one edit
   * to undo: all of it must stay */
  gtk_stack_set_visible_child_name (stack, rugosa_chart_view_id (RUGOSA_CHART_VIEW_SYSTEM));
  gtk_single_selection_set_selected (selection, 1);
  rugosa_history_set (history, rugosa_project_get_line (project, 2), "note", "to be undone", NULL);
  ui_harness_drain ();
  /* saved under a folder of the test's own: not modified, the undo step kept */
  {
    g_autofree char *path = g_build_filename (tmpdir, "Pumpwerk-Demo.rugosa", NULL);
    g_autoptr (GFile) copy = g_file_new_for_path (path);
    g_autoptr (GError) error = NULL;

    g_assert_true (rugosa_window_save_file_sync (win, copy, &error));
    g_assert_no_error (error);
    g_assert_false (rugosa_window_get_modified (win));
  }
  could_undo = rugosa_history_can_undo (history);
  undo_label = g_strdup (rugosa_history_get_undo_label (history));
  g_assert_true (could_undo);
  was_fullscreen = gtk_window_is_fullscreen (GTK_WINDOW (win));
  was_maximized = gtk_window_is_maximized (GTK_WINDOW (win));
  gtk_window_get_default_size (GTK_WINDOW (win), &width, &height);
  age = service_age (win);
  g_assert_cmpuint (n, >=, 3);
  for (guint i = 0; i < n; i++)
    g_assert_true (drawn (win, i));
  /* Common practice (no single source): a chart on a desk screen draws
   * its type at its own size, magnification 1. */
  g_assert_cmpfloat (rugosa_canvas_get_magnify (canvas), ==, 1.0);

  /* in */
  g_assert_true (gtk_widget_activate_action (GTK_WIDGET (win), "win.present", NULL));
  gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
  ui_harness_drain ();
  g_assert_true (rugosa_window_get_presenting (win));
  g_assert_true (gtk_widget_has_css_class (GTK_WIDGET (win), "presenting"));
  if (!gtk_window_is_fullscreen (GTK_WINDOW (win)))
    {
      /* what a window manager does: the window at the screen's size */
      GdkMonitor *monitor = gdk_display_get_monitor_at_surface (gtk_widget_get_display (GTK_WIDGET (win)),
                                                                gtk_native_get_surface (GTK_NATIVE (win)));
      GdkRectangle screen;

      g_test_message ("no window manager answered the full-screen request");
      gdk_monitor_get_geometry (monitor, &screen);
      g_assert_cmpint (screen.width, >, width);
      gtk_window_set_default_size (GTK_WINDOW (win), screen.width, screen.height);
      ui_harness_wait (200);
      gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
      g_assert_cmpint (gtk_widget_get_width (GTK_WIDGET (win)), >, width);
    }
  g_assert_false (gtk_widget_get_mapped (header));
  g_assert_false (gtk_widget_get_mapped (list));
  g_assert_false (gtk_widget_get_mapped (panel));
  g_assert_false (gtk_widget_get_mapped (results));
  g_assert_false (gtk_widget_get_mapped (switcher));
  g_assert_true (gtk_widget_get_mapped (GTK_WIDGET (canvas)));
  g_assert_true (gtk_widget_get_mapped (GTK_WIDGET (rugosa_window_get_age_scale (win))));
  g_assert_cmpstr (gtk_stack_get_visible_child_name (stack), ==,
                   rugosa_chart_view_id (RUGOSA_CHART_VIEW_FRICTION));
  /* Common practice (no single source): a projected chart is read from
   * farther than a desk screen, so its type is larger (rugosa-canvas.c:
   * at least a quarter larger, its axis numbers 1/42 of the screen's
   * height). */
  g_assert_cmpfloat (rugosa_canvas_get_magnify (canvas), >=, 1.25);
  g_assert_true (rugosa_canvas_get_projector (canvas));
  {
    /* Common practice (no single source): the farthest seat at six image
     * heights, capitals of 10′ there, DejaVu Sans capitals 0.73 em: the
     * axis numbers at 1/42 of the screen's height (rugosa-canvas.c). */
    GdkMonitor *monitor = gdk_display_get_monitor_at_surface (gtk_widget_get_display (GTK_WIDGET (win)),
                                                              gtk_native_get_surface (GTK_NATIVE (win)));
    GdkRectangle screen;
    RugosaChartSpec spec;
    double want;

    gdk_monitor_get_geometry (monitor, &screen);
    rugosa_chart_spec_init (&spec);
    spec.width = gtk_widget_get_width (GTK_WIDGET (canvas));
    spec.height = gtk_widget_get_height (GTK_WIDGET (canvas));
    want = CLAMP (screen.height / 42.0 / rugosa_chart_spec_text_size (&spec), 1.25, RUGOSA_CHART_MAGNIFY_MAX);
    g_assert_cmpfloat_with_epsilon (rugosa_canvas_get_magnify (canvas), want, 1e-9);
  }
  /* the editing actions are off: the sidebar's Add and the shortcut */
  g_assert_false (gtk_widget_get_sensitive (add));
  gtk_widget_activate_action (GTK_WIDGET (win), "win.line-delete", NULL);
  gtk_widget_activate_action (GTK_WIDGET (win), "win.undo", NULL);
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_project_get_n_lines (project), ==, n);
  g_assert_true (rugosa_history_can_undo (history));
  /* nothing replaces the project on show */
  g_assert_false (rugosa_window_is_pristine (win));

  /* 2 hides the second line of the list, 2 again shows it */
  g_assert_true (press (win, GDK_KEY_2, 0));
  g_assert_false (drawn (win, 1));
  g_assert_true (drawn (win, 0));
  g_assert_true (press (win, GDK_KEY_KP_2, 0));
  g_assert_true (drawn (win, 1));
  /* a number past the list is refused, nothing changes */
  g_assert_true (press (win, GDK_KEY_9, 0));
  for (guint i = 0; i < n; i++)
    g_assert_true (drawn (win, i));
  /* 1 and 3 hidden, 0 shows every line again */
  press (win, GDK_KEY_1, 0);
  press (win, GDK_KEY_3, 0);
  g_assert_false (drawn (win, 0));
  g_assert_false (drawn (win, 2));
  /* Right steps over the hidden third line to the fourth */
  g_assert_cmpuint (gtk_single_selection_get_selected (selection), ==, 1);
  g_assert_true (press (win, GDK_KEY_Right, 0));
  g_assert_cmpuint (gtk_single_selection_get_selected (selection), ==, 3);
  g_assert_true (press (win, GDK_KEY_Page_Up, 0));
  g_assert_cmpuint (gtk_single_selection_get_selected (selection), ==, 1);
  g_assert_true (press (win, GDK_KEY_0, 0));
  for (guint i = 0; i < n; i++)
    g_assert_true (drawn (win, i));

  /* the service age: a year per Up or ], a page of the slider with
   * Shift, back with Down or [ */
  g_assert_true (press (win, GDK_KEY_Up, 0));
  /* Source: data/demo.rugosa, service_age_years 25; one step is a year. */
  g_assert_cmpfloat (service_age (win), ==, age + 1);
  g_assert_true (press (win, GDK_KEY_bracketright, 0));
  g_assert_cmpfloat (service_age (win), ==, age + 2);
  g_assert_true (press (win, GDK_KEY_Down, GDK_SHIFT_MASK));
  /* Source: ui/rugosa-window.ui, the slider's page-increment of 5 years. */
  g_assert_cmpfloat (service_age (win), ==, age + 2 - 5);
  g_assert_true (press (win, GDK_KEY_bracketleft, 0));
  g_assert_cmpfloat (service_age (win), ==, age + 2 - 5 - 1);

  /* the hint: shown on entering, ? hides it, F1 brings it back */
  {
    GtkRevealer *hint = find_hint (GTK_WIDGET (win));

    g_assert_nonnull (hint);
    g_assert_true (gtk_widget_get_mapped (GTK_WIDGET (hint)));
    g_assert_true (gtk_revealer_get_reveal_child (hint));
    g_assert_true (press (win, GDK_KEY_question, GDK_SHIFT_MASK));
    g_assert_false (gtk_revealer_get_reveal_child (hint));
    g_assert_true (press (win, GDK_KEY_F1, 0));
    g_assert_true (gtk_revealer_get_reveal_child (hint));
  }
  /* a shortcut with Ctrl is not presentation's */
  g_assert_false (press (win, GDK_KEY_1, GDK_CONTROL_MASK));

  /* none of it touched the project */
  g_assert_false (rugosa_window_get_modified (win));
  g_assert_true (rugosa_history_can_undo (history) == could_undo);
  g_assert_cmpstr (rugosa_history_get_undo_label (history), ==, undo_label);
  g_assert_false (rugosa_history_can_redo (history));
  g_assert_cmpuint (rugosa_project_get_n_lines (project), ==, n);

  ui_harness_save_png (GTK_WIDGET (win), "rugosa-present-window.png");

  /* out, with Escape */
  g_assert_true (press (win, GDK_KEY_Escape, 0));
  if (!was_fullscreen && !gtk_window_is_fullscreen (GTK_WINDOW (win)))
    {
      /* a window manager answers a few frames later: the panels are
       * back while the window still has the screen's size, then it
       * shrinks, and the dividers must still come back where they were */
      GdkMonitor *monitor = gdk_display_get_monitor_at_surface (gtk_widget_get_display (GTK_WIDGET (win)),
                                                                gtk_native_get_surface (GTK_NATIVE (win)));
      GdkRectangle screen;

      gdk_monitor_get_geometry (monitor, &screen);
      gtk_window_set_default_size (GTK_WINDOW (win), screen.width, screen.height);
      ui_harness_wait (150);
      gtk_window_set_default_size (GTK_WINDOW (win), width, height);
    }
  gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
  ui_harness_wait (600);
  g_assert_false (rugosa_window_get_presenting (win));
  g_assert_false (gtk_widget_has_css_class (GTK_WIDGET (win), "presenting"));
  g_assert_false (gtk_widget_get_mapped (GTK_WIDGET (find_hint (GTK_WIDGET (win)))));
  g_assert_true (gtk_window_is_fullscreen (GTK_WINDOW (win)) == was_fullscreen);
  g_assert_true (gtk_window_is_maximized (GTK_WINDOW (win)) == was_maximized);
  {
    int w2, h2;

    gtk_window_get_default_size (GTK_WINDOW (win), &w2, &h2);
    g_assert_cmpint (w2, ==, width);
    g_assert_cmpint (h2, ==, height);
  }
  g_assert_true (gtk_widget_get_mapped (header));
  g_assert_true (gtk_widget_get_mapped (list));
  g_assert_true (gtk_widget_get_mapped (results));
  g_assert_true (gtk_widget_get_mapped (switcher));
  g_assert_true (gtk_widget_get_mapped (gtk_widget_get_parent (panel)));
  g_assert_true (gtk_widget_get_sensitive (add));
  for (guint i = 0; i < paneds->len; i++)
    g_assert_cmpint (gtk_paned_get_position (g_ptr_array_index (paneds, i)), ==, positions[i]);
  g_assert_cmpstr (gtk_stack_get_visible_child_name (stack), ==,
                   rugosa_chart_view_id (RUGOSA_CHART_VIEW_SYSTEM));
  g_assert_cmpuint (gtk_single_selection_get_selected (selection), ==, 1);
  g_assert_cmpfloat (service_age (win), ==, age);
  /* Common practice (no single source): back at the desk, type at the
   * chart's own size. */
  g_assert_cmpfloat (rugosa_canvas_get_magnify (canvas), ==, 1.0);
  for (guint i = 0; i < n; i++)
    g_assert_true (drawn (win, i));
  g_assert_false (rugosa_window_get_modified (win));
  g_assert_cmpstr (rugosa_history_get_undo_label (history), ==, undo_label);
  /* the editing actions are back: undo undoes the edit made before */
  g_assert_true (gtk_widget_activate_action (GTK_WIDGET (win), "win.undo", NULL));
  ui_harness_drain ();
  g_assert_false (rugosa_history_can_undo (history));

  ui_harness_close_window (win);
}

/* Hidden lines stay hidden for the audience and come back hidden; F5
 * toggles both ways; a window closed while presenting is put back first. */
static void
test_hidden_lines_kept (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);

  gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
  gtk_widget_activate_action (GTK_WIDGET (win), "win.present", NULL);
  ui_harness_drain ();
  g_assert_true (press (win, GDK_KEY_2, 0));
  g_assert_false (drawn (win, 1));
  g_assert_true (press (win, GDK_KEY_F5, 0));
  g_assert_false (rugosa_window_get_presenting (win));
  /* the line hidden while presenting is shown again */
  g_assert_true (drawn (win, 1));
  /* a key outside presentation is not taken */
  g_assert_false (press (win, GDK_KEY_2, 0));
  g_assert_true (drawn (win, 1));

  rugosa_window_set_presenting (win, TRUE);
  ui_harness_drain ();
  g_assert_true (rugosa_window_get_presenting (win));
  gtk_window_close (GTK_WINDOW (win));
  ui_harness_drain ();
}

/* The project's settings and the sizing assistant, open before
 * presenting, would edit the project: they close when it starts. */
/* The open windows of `type` transient for `win`. */
static guint
open_windows (RugosaWindow *win,
              GType         type)
{
  GList *tops = gtk_window_list_toplevels ();
  guint n = 0;

  for (GList *l = tops; l != NULL; l = l->next)
    n += G_TYPE_CHECK_INSTANCE_TYPE (l->data, type) && gtk_widget_get_visible (l->data)
         && gtk_window_get_transient_for (l->data) == GTK_WINDOW (win);
  g_list_free (tops);
  return n;
}

static void
test_editing_windows_close (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);

  gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
  gtk_widget_activate_action (GTK_WIDGET (win), "win.project-settings", NULL);
  gtk_widget_activate_action (GTK_WIDGET (win), "win.size-pipe", NULL);
  ui_harness_drain ();
  g_assert_cmpuint (open_windows (win, RUGOSA_TYPE_PROJECT_SETTINGS_WINDOW), ==, 1);
  g_assert_cmpuint (open_windows (win, RUGOSA_TYPE_SIZING_WINDOW), ==, 1);

  gtk_widget_activate_action (GTK_WIDGET (win), "win.present", NULL);
  ui_harness_drain ();
  g_assert_cmpuint (open_windows (win, RUGOSA_TYPE_PROJECT_SETTINGS_WINDOW), ==, 0);
  g_assert_cmpuint (open_windows (win, RUGOSA_TYPE_SIZING_WINDOW), ==, 0);
  g_assert_false (rugosa_window_get_modified (win));

  rugosa_window_set_presenting (win, FALSE);
  gtk_window_close (GTK_WINDOW (win));
  ui_harness_drain ();
}

/* The demo presented at the screen's size (what a window manager gives a
 * full-screen window), saved for people to look at. */
static void
test_screenshot (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  GdkDisplay *display = gtk_widget_get_display (GTK_WIDGET (win));
  GdkMonitor *monitor;
  GdkRectangle geometry;
  const char *language = g_getenv ("LANGUAGE");
  g_autofree char *name = NULL;

  gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
  monitor = gdk_display_get_monitor_at_surface (display, gtk_native_get_surface (GTK_NATIVE (win)));
  g_assert_nonnull (monitor);
  gdk_monitor_get_geometry (monitor, &geometry);
  rugosa_window_set_presenting (win, TRUE);
  ui_harness_wait (300);
  if (!gtk_window_is_fullscreen (GTK_WINDOW (win)))
    gtk_window_set_default_size (GTK_WINDOW (win), geometry.width, geometry.height);
  ui_harness_wait (300);
  gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
  g_test_message ("screen %d × %d, chart magnified %.2f×", geometry.width, geometry.height,
                  rugosa_canvas_get_magnify (RUGOSA_CANVAS (rugosa_window_get_canvas (win))));
  name = g_strdup_printf ("rugosa-present%s%s.png", language && *language ? "-" : "",
                          language && *language ? language : "");
  ui_harness_save_png (GTK_WIDGET (win), name);
  rugosa_window_set_presenting (win, FALSE);
  ui_harness_close_window (win);
}

int
main (int argc, char *argv[])
{
  const char *localedir = g_getenv ("RUGOSA_LOCALEDIR");
  int status;

  g_test_init (&argc, &argv, NULL);
  /* the program's own set-up (src/app/main.c); a German run for the
   * screenshot sets LANGUAGE, LANG and RUGOSA_LOCALEDIR */
  setlocale (LC_ALL, "");
  if (localedir != NULL && *localedir != '\0')
    {
      bindtextdomain (GETTEXT_PACKAGE, localedir);
      bind_textdomain_codeset (GETTEXT_PACKAGE, "UTF-8");
      textdomain (GETTEXT_PACKAGE);
    }
  tmpdir = ui_harness_private_dirs ("rugosa-test-ui-present");
  if (!ui_harness_init_gtk ())
    {
      g_print ("1..0 # SKIP no display\n");
      ui_harness_remove_tree (tmpdir);
      return 0;
    }
  app = ui_harness_app_new ("org.rugosa.Rugosa.TestPresent");

  g_test_add_func ("/ui/present/in-and-back", test_present_and_back);
  g_test_add_func ("/ui/present/hidden-lines-kept", test_hidden_lines_kept);
  g_test_add_func ("/ui/present/editing-windows-close", test_editing_windows_close);
  g_test_add_func ("/ui/present/screenshot", test_screenshot);

  status = g_test_run ();
  g_clear_object (&app);
  ui_harness_remove_tree (tmpdir);
  return status;
}
