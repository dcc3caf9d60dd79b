/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Reading many line options in the window: a project of a thousand
 * options in the list (a model-backed list view), its filter by name,
 * group or number, show and hide per line and per group, "only the
 * selected line", pins, the group entry (an undoable edit), and the chart
 * and results table following what is shown; the chart keeps its label
 * placement across a hover; several lines selected and one line's fluid
 * applied to them as one undo step.
 *
 * Run through the 'ui' suite (xvfb-run and dbus-run-session); without a
 * display the program reports a skip.  g_test_init() makes every GLib
 * warning and critical fatal. */
#define G_LOG_DOMAIN "test-ui-lines"

#include "config.h"

#include <adwaita.h>
#include <glib/gstdio.h>
#include <string.h>

#include "rugosa-application.h"
#include "rugosa-canvas.h"
#include "rugosa-line-list.h"
#include "rugosa-line-panel.h"
#include "rugosa-window.h"
#include "ui-harness.h"

enum { LINES = 1000, GROUPS = 8 };

static RugosaApplication *app;
static char *tmpdir;
static char *project_path;

/* A project of LINES invented options, copies of the demo's first line
 * with other flows, named "Option N" in groups "Zone A" … "Zone H". */
static void
write_project (void)
{
  g_autoptr (GError) error = NULL;
  g_autofree char *demo = ui_harness_demo_path ();
  g_autoptr (RugosaProject) source = rugosa_project_new ();
  g_autoptr (RugosaProject) project = rugosa_project_new ();
  RugosaLine *first;

  g_assert_true (rugosa_project_load (source, demo, &error));
  first = rugosa_project_get_line (source, 0);
  for (guint i = 0; i < LINES; i++)
    {
      g_autoptr (RugosaLine) line = rugosa_line_duplicate (first);
      g_autofree char *name = g_strdup_printf ("Option %u", i + 1);
      g_autofree char *group = g_strdup_printf ("Zone %c", 'A' + (int) (i % GROUPS));

      rugosa_line_set_name (line, name);
      /* other design flows, without the demo's lowest and highest */
      g_object_set (line, "group", group, "flow-minimum", 0.0, "flow-maximum", 0.0,
                    "flow-design", rugosa_line_get_double (first, "flow-design") * (0.5 + (double) i / LINES),
                    NULL);
      rugosa_project_insert_line (project, i, line);
    }
  project_path = g_build_filename (tmpdir, "thousand.rugosa", NULL);
  g_assert_true (rugosa_project_save (project, project_path, &error));
}

static RugosaWindow *
open_thousand (void)
{
  RugosaWindow *win = rugosa_window_new (app);
  g_autoptr (GFile) file = g_file_new_for_path (project_path);
  g_autoptr (GError) error = NULL;

  gtk_window_set_default_size (GTK_WINDOW (win), 1400, 900);
  if (!rugosa_window_load_file_sync (win, file, &error))
    g_error ("%s", error->message);
  gtk_window_present (GTK_WINDOW (win));
  gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
  ui_harness_drain ();
  return win;
}

static RugosaLineList *
line_list (RugosaWindow *win)
{
  GtkWidget *list = ui_harness_find_descendant (GTK_WIDGET (win), RUGOSA_TYPE_LINE_LIST);

  g_assert_nonnull (list);
  return RUGOSA_LINE_LIST (list);
}

/* How many rows the results table lists. */
static guint
table_rows (RugosaWindow *win)
{
  GtkWidget *view = ui_harness_find_descendant (rugosa_window_get_results (win), GTK_TYPE_COLUMN_VIEW);

  return g_list_model_get_n_items (G_LIST_MODEL (gtk_column_view_get_model (GTK_COLUMN_VIEW (view))));
}

/* How many lines the chart draws, and whether project line `position` is
 * one of them. */
static guint
chart_lines (RugosaWindow *win,
             int           position,
             gboolean     *drawn)
{
  RugosaCanvas *canvas = RUGOSA_CANVAS (rugosa_window_get_canvas (win));
  const RugosaChartInput *input = rugosa_canvas_get_input (canvas);

  if (drawn != NULL)
    {
      *drawn = FALSE;
      for (size_t i = 0; i < input->n_lines; i++)
        *drawn |= (int) input->line_index[i] == position;
    }
  return (guint) input->n_lines;
}

static const char *
group_of (RugosaWindow *win,
          guint         position)
{
  static char buf[64];
  g_autofree char *group = NULL;

  g_object_get (rugosa_project_get_line (rugosa_window_get_project (win), position), "group", &group, NULL);
  g_strlcpy (buf, group ? group : "", sizeof buf);
  return buf;
}

/* The eye (show) toggle of the first row on screen. */
static GtkToggleButton *
first_row_eye (RugosaLineList *list)
{
  GtkWidget *pin = ui_harness_find_descendant (rugosa_line_list_get_view (list), GTK_TYPE_TOGGLE_BUTTON);

  g_assert_nonnull (pin);
  return GTK_TOGGLE_BUTTON (gtk_widget_get_next_sibling (pin));
}

static void
test_filter (void)
{
  RugosaWindow *win = open_thousand ();
  RugosaLineList *list = line_list (win);
  GListModel *listed = rugosa_line_list_get_listed (list);
  GtkListView *view = GTK_LIST_VIEW (rugosa_line_list_get_view (list));

  g_assert_cmpuint (rugosa_project_get_n_lines (rugosa_window_get_project (win)), ==, LINES);
  g_assert_cmpuint (g_list_model_get_n_items (G_LIST_MODEL (gtk_list_view_get_model (view))), ==, LINES);
  /* a list view makes rows for what is on screen, not for every line */
  {
    guint rows = 0;
    for (GtkWidget *w = gtk_widget_get_first_child (GTK_WIDGET (view)); w; w = gtk_widget_get_next_sibling (w))
      rows++;
    g_assert_cmpuint (rows, <, 400);
  }

  rugosa_line_list_set_filter (list, "zone c");
  ui_harness_drain ();
  g_assert_cmpuint (g_list_model_get_n_items (listed), ==, LINES / GROUPS);
  for (guint i = 0; i < g_list_model_get_n_items (listed); i++)
    {
      g_autoptr (RugosaLine) line = g_list_model_get_item (listed, i);
      g_autofree char *group = NULL;
      g_object_get (line, "group", &group, NULL);
      g_assert_cmpstr (group, ==, "Zone C");
    }

  /* a number finds the line with that number (and names holding it) */
  rugosa_line_list_set_filter (list, "577");
  ui_harness_drain ();
  {
    gboolean found = FALSE;
    for (guint i = 0; i < g_list_model_get_n_items (listed); i++)
      {
        g_autoptr (RugosaLine) line = g_list_model_get_item (listed, i);
        found |= g_str_equal (rugosa_line_get_name (line), "Option 577");
      }
    g_assert_true (found);
  }

  rugosa_line_list_set_filter (list, "");
  ui_harness_drain ();
  g_assert_cmpuint (g_list_model_get_n_items (listed), ==, LINES);
  ui_harness_close_window (win);
}

static void
test_show_hide (void)
{
  RugosaWindow *win = open_thousand ();
  RugosaLineList *list = line_list (win);
  guint drawn_all = chart_lines (win, -1, NULL), table_all = table_rows (win);
  gboolean drawn;
  GtkToggleButton *eye;

  g_assert_cmpuint (drawn_all, ==, LINES);
  g_assert_cmpuint (table_all, ==, LINES);

  /* one line hidden from its row */
  eye = first_row_eye (list);
  g_assert_true (gtk_toggle_button_get_active (eye));
  gtk_toggle_button_set_active (eye, FALSE);
  ui_harness_drain ();
  g_assert_cmpuint (chart_lines (win, 0, &drawn), ==, LINES - 1);
  g_assert_false (drawn);
  g_assert_cmpuint (table_rows (win), ==, LINES - 1);
  /* hiding is a view: nothing to save, nothing to undo */
  g_assert_false (rugosa_window_get_modified (win));
  g_assert_false (rugosa_history_can_undo (rugosa_window_get_history (win)));
  gtk_toggle_button_set_active (first_row_eye (list), TRUE);
  ui_harness_drain ();
  g_assert_cmpuint (chart_lines (win, 0, &drawn), ==, LINES);
  g_assert_true (drawn);

  /* a group hidden: filter it, hide the listed lines */
  rugosa_line_list_set_filter (list, "Zone B");
  ui_harness_drain ();
  {
    GtkWidget *hide = NULL;
    GtkWidget *popover = ui_harness_find_descendant (GTK_WIDGET (list), GTK_TYPE_MENU_BUTTON);

    g_assert_nonnull (popover);
    gtk_menu_button_popup (GTK_MENU_BUTTON (popover));
    ui_harness_drain ();
    popover = GTK_WIDGET (gtk_menu_button_get_popover (GTK_MENU_BUTTON (popover)));
    for (GtkWidget *b = ui_harness_find_descendant (popover, GTK_TYPE_BUTTON); b != NULL;
         b = gtk_widget_get_next_sibling (b))
      if (GTK_IS_BUTTON (b) && g_strcmp0 (gtk_button_get_label (GTK_BUTTON (b)), "Hide the listed") == 0)
        hide = b;
    g_assert_nonnull (hide);
    ui_harness_click (hide);
    ui_harness_drain ();
    gtk_popover_popdown (GTK_POPOVER (popover));
  }
  g_assert_cmpuint (chart_lines (win, 1, &drawn), ==, LINES - LINES / GROUPS);
  g_assert_cmpstr (group_of (win, 1), ==, "Zone B");
  g_assert_false (drawn);
  g_assert_cmpuint (table_rows (win), ==, LINES - LINES / GROUPS);
  rugosa_line_list_set_filter (list, "");
  ui_harness_drain ();
  ui_harness_close_window (win);
}

static void
test_groups_popover (void)
{
  RugosaWindow *win = open_thousand ();
  RugosaLineList *list = line_list (win);
  GtkWidget *button = ui_harness_find_descendant (GTK_WIDGET (list), GTK_TYPE_MENU_BUTTON);
  GtkWidget *popover, *check = NULL;
  gboolean drawn;
  guint checks = 0;

  gtk_menu_button_popup (GTK_MENU_BUTTON (button));
  ui_harness_drain ();
  popover = GTK_WIDGET (gtk_menu_button_get_popover (GTK_MENU_BUTTON (button)));
  /* one check a group, all shown */
  for (GtkWidget *row = gtk_widget_get_first_child (ui_harness_find_descendant (popover, GTK_TYPE_LIST_BOX));
       row != NULL; row = gtk_widget_get_next_sibling (row))
    {
      GtkWidget *c = gtk_list_box_row_get_child (GTK_LIST_BOX_ROW (row));
      if (!GTK_IS_CHECK_BUTTON (c))
        continue;
      checks++;
      g_assert_true (gtk_check_button_get_active (GTK_CHECK_BUTTON (c)));
      if (g_str_has_prefix (gtk_check_button_get_label (GTK_CHECK_BUTTON (c)), "Zone A"))
        check = c;
    }
  g_assert_cmpuint (checks, ==, GROUPS);
  g_assert_nonnull (check);
  gtk_check_button_set_active (GTK_CHECK_BUTTON (check), FALSE);
  ui_harness_drain ();
  g_assert_cmpstr (group_of (win, 0), ==, "Zone A");
  g_assert_cmpuint (chart_lines (win, 0, &drawn), ==, LINES - LINES / GROUPS);
  g_assert_false (drawn);
  gtk_check_button_set_active (GTK_CHECK_BUTTON (check), TRUE);
  ui_harness_drain ();
  g_assert_cmpuint (chart_lines (win, 0, &drawn), ==, LINES);
  g_assert_true (drawn);
  gtk_popover_popdown (GTK_POPOVER (popover));
  ui_harness_close_window (win);
}

static void
test_only_selected_and_pin (void)
{
  RugosaWindow *win = open_thousand ();
  RugosaLineList *list = line_list (win);
  RugosaCanvas *canvas = RUGOSA_CANVAS (rugosa_window_get_canvas (win));
  GtkSingleSelection *sel = rugosa_window_get_selection (win);
  GtkWidget *only = ui_harness_find_descendant (GTK_WIDGET (list), GTK_TYPE_TOGGLE_BUTTON);
  RugosaChartLabelInfo info;
  gboolean drawn;

  /* the first toggle of the list is "only the selected line" */
  g_assert_cmpstr (gtk_widget_get_tooltip_text (only), ==,
                   "Show only the selected line on the chart and in the table");
  gtk_single_selection_set_selected (sel, 700);
  ui_harness_drain ();
  ui_harness_click (only);
  ui_harness_drain ();
  g_assert_cmpuint (chart_lines (win, 700, &drawn), ==, 1);
  g_assert_true (drawn);
  g_assert_cmpuint (table_rows (win), ==, 1);
  gtk_single_selection_set_selected (sel, 5);
  ui_harness_drain ();
  g_assert_cmpuint (chart_lines (win, 5, &drawn), ==, 1);
  g_assert_true (drawn);
  ui_harness_click (only);
  ui_harness_drain ();
  g_assert_cmpuint (chart_lines (win, -1, NULL), ==, LINES);

  /* the selected line is labelled among a thousand */
  gtk_test_widget_wait_for_draw (GTK_WIDGET (canvas));
  g_assert_true (rugosa_canvas_get_label (canvas, 5, &info));
  g_assert_true (info.visible);

  /* a pinned line too; its list row says so */
  {
    GtkWidget *pin = ui_harness_find_descendant (rugosa_line_list_get_view (list), GTK_TYPE_TOGGLE_BUTTON);
    g_assert_nonnull (pin);
    gtk_toggle_button_set_active (GTK_TOGGLE_BUTTON (pin), TRUE);
    ui_harness_drain ();
    for (size_t i = 0; i < rugosa_canvas_get_input (canvas)->n_lines; i++)
      if (rugosa_canvas_get_input (canvas)->lines[i].pinned)
        {
          guint position = rugosa_canvas_get_input (canvas)->line_index[i];
          g_assert_true (rugosa_canvas_get_label (canvas, position, &info));
          g_assert_true (info.visible);
        }
    gtk_toggle_button_set_active (GTK_TOGGLE_BUTTON (pin), FALSE);
    ui_harness_drain ();
  }

  /* a hover redraws without placing the labels again (the frame after
   * the unpinning placed them) */
  gtk_widget_queue_draw (GTK_WIDGET (canvas));
  gtk_test_widget_wait_for_draw (GTK_WIDGET (canvas));
  {
    unsigned placements = rugosa_canvas_get_placements (canvas);
    double x, y;

    g_assert_true (rugosa_canvas_marker_position (canvas, 5, &x, &y));
    for (int i = 0; i < 5; i++)
      {
        rugosa_canvas_pointer_at (canvas, x + i, y);
        gtk_widget_queue_draw (GTK_WIDGET (canvas));
        gtk_test_widget_wait_for_draw (GTK_WIDGET (canvas));
      }
    g_assert_cmpuint (rugosa_canvas_get_placements (canvas), ==, placements);
  }
  ui_harness_close_window (win);
}

static void
test_group_entry (void)
{
  RugosaWindow *win = open_thousand ();
  RugosaLineList *list = line_list (win);
  GtkWidget *entry = ui_harness_find_descendant (GTK_WIDGET (list), GTK_TYPE_ENTRY);

  gtk_single_selection_set_selected (rugosa_window_get_selection (win), 3);
  ui_harness_drain ();
  g_assert_cmpstr (gtk_editable_get_text (GTK_EDITABLE (entry)), ==, "Zone D");
  gtk_editable_set_text (GTK_EDITABLE (entry), "Pump station ⟨east⟩");
  g_signal_emit_by_name (entry, "activate");
  ui_harness_drain ();
  g_assert_cmpstr (group_of (win, 3), ==, "Pump station ⟨east⟩");
  g_assert_true (rugosa_window_get_modified (win));
  /* an edit of the document: undone like any other */
  g_assert_true (rugosa_history_can_undo (rugosa_window_get_history (win)));
  rugosa_history_undo (rugosa_window_get_history (win));
  ui_harness_drain ();
  g_assert_cmpstr (group_of (win, 3), ==, "Zone D");
  g_assert_cmpstr (gtk_editable_get_text (GTK_EDITABLE (entry)), ==, "Zone D");
  ui_harness_close_window (win);
}

/* The label under `root` showing `text`, or NULL. */
static GtkWidget *
find_label (GtkWidget  *root,
            const char *text)
{
  for (GtkWidget *c = gtk_widget_get_first_child (root); c; c = gtk_widget_get_next_sibling (c))
    {
      GtkWidget *found;

      if (GTK_IS_LABEL (c) && g_strcmp0 (gtk_label_get_text (GTK_LABEL (c)), text) == 0)
        return c;
      if ((found = find_label (c, text)) != NULL)
        return found;
    }
  return NULL;
}

/* The label above the panel's "Fluid", "Aging" and "Flows" buttons. */
static GtkLabel *
apply_label (GtkWidget *button)
{
  GtkWidget *box = gtk_widget_get_parent (gtk_widget_get_parent (button));

  return GTK_LABEL (gtk_widget_get_first_child (box));
}

/* The fluid of one line given to three others, along the user's path:
 * the lines selected in the list (Ctrl-click: the line clicked last is
 * the one the panel edits), the panel's "Apply to the 3 other selected
 * lines: Fluid", and one undo. */
static void
test_apply_fluid (void)
{
  RugosaWindow *win = open_thousand ();
  RugosaLineList *list = line_list (win);
  RugosaProject *project = rugosa_window_get_project (win);
  RugosaHistory *history = rugosa_window_get_history (win);
  GtkSelectionModel *selected = rugosa_line_list_get_selection (list);
  GtkWidget *panel = rugosa_window_get_line_panel (win);
  g_autoptr (GVariant) fluid = g_variant_ref_sink (g_variant_new_string ("fluid"));
  GtkWidget *apply = ui_harness_find_action_widget (panel, "win.apply-part", fluid);
  RugosaLine *source = rugosa_project_get_line (project, 0);
  g_autofree char *before = NULL;
  guint64 one_line;
  gsize n;

  g_assert_nonnull (apply);
  /* one line selected: nothing to apply to */
  g_assert_cmpuint (rugosa_line_list_get_n_selected (list), ==, 1);
  g_assert_false (gtk_widget_is_visible (apply));

  /* what one edit of one line costs the window in evaluations */
  {
    RugosaLine *other = rugosa_project_get_line (project, 4);
    guint64 count = rugosa_project_get_evaluation_count (project);

    rugosa_history_set (history, other, "length", 1.5 * rugosa_line_get_double (other, "length"), NULL);
    ui_harness_drain ();
    one_line = rugosa_project_get_evaluation_count (project) - count;
    g_assert_cmpuint (one_line, >, 0);
  }

  /* the first line made seawater, as the panel would (one edit each) */
  rugosa_history_set (history, source, "fluid-kind", RG_FLUID_SEAWATER, NULL);
  rugosa_history_break_merge (history);
  /* an invented input, 30 g/kg (not the default) */
  rugosa_history_set (history, source, "salinity", 0.030, NULL);
  ui_harness_drain ();
  before = rugosa_project_to_data (project, &n);

  /* lines 2, 3 and 4 selected, then the first added last */
  gtk_selection_model_select_item (selected, 1, TRUE);
  gtk_selection_model_select_item (selected, 2, FALSE);
  gtk_selection_model_select_item (selected, 3, FALSE);
  gtk_selection_model_select_item (selected, 0, FALSE);
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_line_list_get_n_selected (list), ==, 4);
  g_assert_cmpuint (gtk_single_selection_get_selected (rugosa_window_get_selection (win)), ==, 0);
  g_assert_true (rugosa_line_panel_get_line (RUGOSA_LINE_PANEL (panel)) == source);
  g_assert_true (gtk_widget_is_visible (apply));
  g_assert_cmpstr (gtk_label_get_text (apply_label (apply)), ==, "Apply to the 3 other selected lines:");
  ui_harness_save_png (GTK_WIDGET (win), "rugosa-apply.png");
  /* in the list, the line the panel edits stands out */
  g_assert_true (gtk_widget_has_css_class (find_label (rugosa_line_list_get_view (list), "Option 1"), "heading"));
  g_assert_false (gtk_widget_has_css_class (find_label (rugosa_line_list_get_view (list), "Option 2"), "heading"));

  {
    guint64 count = rugosa_project_get_evaluation_count (project);

    ui_harness_click (apply);
    ui_harness_drain ();
    /* one refresh: each of the three lines evaluated as after one edit,
     * not once for each of the values it took */
    g_print ("# evaluations: one edit %" G_GUINT64_FORMAT ", apply to 3 %" G_GUINT64_FORMAT "\n",
             one_line, rugosa_project_get_evaluation_count (project) - count);
    g_assert_cmpuint (rugosa_project_get_evaluation_count (project) - count, ==, 3 * one_line);
  }
  for (guint i = 1; i <= 3; i++)
    {
      RugosaLine *line = rugosa_project_get_line (project, i);

      g_assert_cmpint (rugosa_line_get_fluid_kind (line), ==, RG_FLUID_SEAWATER);
      /* Expected: the first line's own values (a copy) */
      g_assert_cmpfloat (rugosa_line_get_double (line, "salinity"), ==, rugosa_line_get_double (source, "salinity"));
      g_assert_cmpfloat (rugosa_line_get_double (line, "temperature"), ==, rugosa_line_get_double (source, "temperature"));
    }
  g_assert_cmpint (rugosa_line_get_fluid_kind (rugosa_project_get_line (project, 4)), ==, RG_FLUID_WATER);
  g_assert_cmpstr (rugosa_history_get_undo_label (history), ==, "Apply the fluid to 3 lines");
  /* the selection stays for the next part */
  g_assert_cmpuint (rugosa_line_list_get_n_selected (list), ==, 4);

  /* one undo brings every value back */
  gtk_widget_activate_action (GTK_WIDGET (win), "win.undo", NULL);
  ui_harness_drain ();
  {
    g_autofree char *undone = rugosa_project_to_data (project, &n);
    g_assert_cmpstr (undone, ==, before);
  }
  g_assert_cmpstr (rugosa_history_get_undo_label (history), ==, "Change “Salinity”");

  /* Ctrl+A selects every listed line; the panel's line stays */
  gtk_widget_activate_action (rugosa_line_list_get_view (list), "list.select-all", NULL);
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_line_list_get_n_selected (list), ==, LINES);
  g_assert_cmpuint (gtk_single_selection_get_selected (rugosa_window_get_selection (win)), ==, 0);
  g_assert_cmpstr (gtk_label_get_text (apply_label (apply)), ==, "Apply to the 999 other selected lines:");

  /* a line picked elsewhere (the chart) among the selected keeps them;
   * one outside them is selected alone, as a plain click does */
  gtk_single_selection_set_selected (rugosa_window_get_selection (win), 7);
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_line_list_get_n_selected (list), ==, LINES);
  rugosa_line_list_set_filter (list, "zone b");
  ui_harness_drain ();
  /* the filter leaves Zone B's lines, still selected */
  g_assert_cmpuint (rugosa_line_list_get_n_selected (list), ==, LINES / GROUPS);
  gtk_selection_model_select_item (selected, 2, TRUE);
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_line_list_get_n_selected (list), ==, 1);
  g_assert_cmpstr (rugosa_line_get_name (rugosa_line_panel_get_line (RUGOSA_LINE_PANEL (panel))), ==, "Option 18");
  g_assert_false (gtk_widget_is_visible (apply));
  rugosa_line_list_set_filter (list, "");
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_line_list_get_n_selected (list), ==, 1);
  ui_harness_close_window (win);
}

/* Whether a label under `root` shows `text` (a toast's title). */
static gboolean
shows_text (GtkWidget  *root,
            const char *text)
{
  for (GtkWidget *c = gtk_widget_get_first_child (root); c; c = gtk_widget_get_next_sibling (c))
    if ((GTK_IS_LABEL (c) && g_strcmp0 (gtk_label_get_text (GTK_LABEL (c)), text) == 0)
        || shows_text (c, text))
      return TRUE;
  return FALSE;
}

/* Flows that suit a wide line given to a narrow one: applied, undoable,
 * and the line that stops evaluating is counted. */
static void
test_apply_flows_beyond_range (void)
{
  RugosaWindow *win = open_thousand ();
  RugosaLineList *list = line_list (win);
  RugosaProject *project = rugosa_window_get_project (win);
  RugosaHistory *history = rugosa_window_get_history (win);
  GtkSelectionModel *selected = rugosa_line_list_get_selection (list);
  g_autoptr (GVariant) flow = g_variant_ref_sink (g_variant_new_string ("flow"));
  GtkWidget *apply = ui_harness_find_action_widget (rugosa_window_get_line_panel (win), "win.apply-part", flow);
  RugosaLine *wide = rugosa_project_get_line (project, 0);
  RugosaLine *narrow = rugosa_project_get_line (project, 1);
  g_autofree char *before = NULL;
  gsize n;

  /* invented inputs: 100 m³/s in a 2 m bore is Re ≈ 6e7, in a 10 mm bore
   * Re ≈ 1e10, beyond the friction correlations' range (RG_FRICTION_RE_MAX) */
  rugosa_history_set (history, wide, "pipe-designation", NULL, "inner-diameter", 2.0,
                      "flow-design", 100.0, NULL);
  rugosa_history_set (history, narrow, "pipe-designation", NULL, "inner-diameter", 0.01, NULL);
  ui_harness_drain ();
  before = rugosa_project_to_data (project, &n);

  gtk_selection_model_select_item (selected, 1, TRUE);
  gtk_selection_model_select_item (selected, 2, FALSE);
  gtk_selection_model_select_item (selected, 0, FALSE);
  ui_harness_drain ();
  g_assert_true (rugosa_line_panel_get_line (RUGOSA_LINE_PANEL (rugosa_window_get_line_panel (win))) == wide);
  ui_harness_click (apply);
  ui_harness_drain ();
  g_assert_cmpfloat (rugosa_line_get_double (narrow, "flow-design"), ==, 100.0);
  g_assert_cmpfloat (rugosa_line_get_double (rugosa_project_get_line (project, 2), "flow-design"), ==, 100.0);
  g_assert_cmpstr (rugosa_history_get_undo_label (history), ==, "Apply the flows to 2 lines");
  g_assert_true (shows_text (GTK_WIDGET (win), "1 line cannot be evaluated with these values: Ctrl+Z takes them back."));

  gtk_widget_activate_action (GTK_WIDGET (win), "win.undo", NULL);
  ui_harness_drain ();
  {
    g_autofree char *undone = rugosa_project_to_data (project, &n);
    g_assert_cmpstr (undone, ==, before);
  }
  ui_harness_close_window (win);
}

int
main (int argc, char *argv[])
{
  int status;

  tmpdir = ui_harness_private_dirs ("rugosa-test-ui-lines");
  g_test_init (&argc, &argv, NULL);
  if (!ui_harness_init_gtk ())
    {
      g_print ("1..0 # SKIP no display\n");
      ui_harness_remove_tree (tmpdir);
      return 0;
    }
  app = ui_harness_app_new ("org.rugosa.Rugosa.TestLines");
  write_project ();

  g_test_add_func ("/ui/lines/filter", test_filter);
  g_test_add_func ("/ui/lines/show-hide", test_show_hide);
  g_test_add_func ("/ui/lines/groups", test_groups_popover);
  g_test_add_func ("/ui/lines/only-selected-and-pin", test_only_selected_and_pin);
  g_test_add_func ("/ui/lines/group-entry", test_group_entry);
  g_test_add_func ("/ui/lines/apply-fluid", test_apply_fluid);
  g_test_add_func ("/ui/lines/apply-flows-beyond-range", test_apply_flows_beyond_range);

  status = g_test_run ();
  g_object_unref (app);
  ui_harness_remove_tree (tmpdir);
  g_free (tmpdir);
  g_free (project_path);
  return status;
}
