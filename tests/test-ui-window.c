/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The window as a user drives it, through its buttons, lists and dialogs:
 * the searchable catalog drop-downs of the line panel, the enabled state
 * of undo, redo and the line buttons, the chart and CSV export dialogs,
 * quitting through the close guard, the maximized state kept between
 * sessions, and the service-age slider as a view setting.
 *
 * Run through the 'ui' suite (xvfb-run and dbus-run-session); without a
 * display the program reports a skip.  g_test_init() makes every GLib
 * warning and critical fatal, so a test fails on any such message, also
 * one printed while a window is torn down. */
#define G_LOG_DOMAIN "test-ui-window"

#include "config.h"

#include <adwaita.h>
#include <glib/gstdio.h>
#include <math.h>
#include <string.h>

#include "model/rugosa-display.h"
#include "model/rugosa-history.h"
#include "model/rugosa-units.h"
#include "rugosa-application.h"
#include "rugosa-cost-group.h"
#include "rugosa-line-panel.h"
#include "rugosa-plot-view.h"
#include "rugosa-results-table.h"
#include "rugosa-quantity-entry.h"
#include "rugosa-window.h"
/* the window's visibility, to pin a line as its list's pin button does */
#include "rugosa-window-private.h"
#include "ui-harness.h"

static RugosaApplication *app;
static char *tmpdir;

static RugosaLinePanel *
select_line (RugosaWindow *win,
             guint         position)
{
  gtk_single_selection_set_selected (rugosa_window_get_selection (win), position);
  ui_harness_drain ();
  return RUGOSA_LINE_PANEL (rugosa_window_get_line_panel (win));
}

static void
type_into (RugosaWindow *win,
           const char   *property,
           const char   *text)
{
  RugosaLinePanel *panel = RUGOSA_LINE_PANEL (rugosa_window_get_line_panel (win));

  g_assert_true (rugosa_quantity_entry_commit_text (rugosa_line_panel_get_entry (panel, property), text));
  ui_harness_drain ();
}

static GtkWidget *
action_button (RugosaWindow *win,
               const char   *action,
               GVariant     *target)
{
  g_autoptr (GVariant) t = target ? g_variant_ref_sink (target) : NULL;
  GtkWidget *button = ui_harness_find_action_widget (GTK_WIDGET (win), action, t);

  g_assert_nonnull (button);
  return button;
}

/* A copy of the demo project in its own file, opened in a new window. */
static RugosaWindow *
open_demo_copy (const char *name)
{
  g_autofree char *demo = ui_harness_demo_path ();
  g_autofree char *path = g_build_filename (tmpdir, name, NULL);
  g_autoptr (GFile) from = g_file_new_for_path (demo);
  g_autoptr (GFile) to = g_file_new_for_path (path);
  g_autoptr (GError) error = NULL;
  RugosaWindow *win;

  g_assert_true (g_file_copy (from, to, G_FILE_COPY_OVERWRITE, NULL, NULL, NULL, &error));
  g_assert_no_error (error);
  win = rugosa_window_new (app);
  gtk_window_present (GTK_WINDOW (win));
  g_assert_true (rugosa_window_load_file_sync (win, to, &error));
  g_assert_no_error (error);
  ui_harness_drain ();
  return win;
}

static gboolean
window_gone (gpointer data)
{
  return *(gpointer *) data == NULL;
}

static GtkFileChooser *
wait_for_chooser (RugosaWindow *win)
{
  GtkWindow *chooser = NULL;

  for (int i = 0; i < 200 && chooser == NULL; i++)
    {
      ui_harness_wait (10);
      chooser = ui_harness_find_dialog (GTK_WINDOW (win), GTK_TYPE_FILE_CHOOSER_DIALOG);
    }
  g_assert_nonnull (chooser);
  gtk_test_widget_wait_for_draw (GTK_WIDGET (chooser));
  return GTK_FILE_CHOOSER (chooser);
}

/* The drop-down beside the label `label` under `root`. */
static GtkDropDown *
find_labelled_dropdown (GtkWidget  *root,
                        const char *label)
{
  for (GtkWidget *c = gtk_widget_get_first_child (root); c; c = gtk_widget_get_next_sibling (c))
    {
      GtkDropDown *found;

      if (GTK_IS_LABEL (c) && g_strcmp0 (gtk_label_get_text (GTK_LABEL (c)), label) == 0
          && GTK_IS_DROP_DOWN (gtk_widget_get_next_sibling (c)))
        return GTK_DROP_DOWN (gtk_widget_get_next_sibling (c));
      if ((found = find_labelled_dropdown (c, label)) != NULL)
        return found;
    }
  return NULL;
}

/* Picks the entry shown as `shown` in the drop-down labelled `label`. */
static void
pick_shown (GtkWidget  *root,
            const char *label,
            const char *shown)
{
  GtkDropDown *dropdown = find_labelled_dropdown (root, label);
  GListModel *model;

  g_assert_nonnull (dropdown);
  model = gtk_drop_down_get_model (dropdown);
  for (guint i = 0; i < g_list_model_get_n_items (model); i++)
    {
      g_autoptr (GObject) item = g_list_model_get_item (model, i);

      if (g_strcmp0 (gtk_string_object_get_string (GTK_STRING_OBJECT (item)), shown) == 0)
        {
          gtk_drop_down_set_selected (dropdown, i);
          return;
        }
    }
  g_test_fail_printf ("The drop-down %s offers no %s.", label, shown);
}

/* In the open chooser: go to `folder`, pick `shown` in the drop-down
 * labelled `label` (unless NULL), type `name`, press the accept button. */
static void
fill_chooser (GtkFileChooser *chooser,
              const char     *folder,
              const char     *label,
              const char     *shown,
              const char     *name)
{
  g_autoptr (GFile) dir = g_file_new_for_path (folder);
  g_autoptr (GError) error = NULL;

  g_assert_true (gtk_file_chooser_set_current_folder (chooser, dir, &error));
  g_assert_no_error (error);
  if (label != NULL)
    pick_shown (GTK_WIDGET (chooser), label, shown);
  gtk_file_chooser_set_current_name (chooser, name);
  ui_harness_drain ();
  ui_harness_click (gtk_dialog_get_widget_for_response (GTK_DIALOG (chooser), GTK_RESPONSE_ACCEPT));
}

static gboolean
message_shown (gpointer data)
{
  return ui_harness_find_message_dialog (data) != NULL;
}

static AdwMessageDialog *
wait_for_message (RugosaWindow *win)
{
  g_assert_true (ui_harness_wait_until (message_shown, win, 5000));
  return ui_harness_find_message_dialog (GTK_WINDOW (win));
}

static gboolean
file_exists (gpointer data)
{
  return g_file_test (data, G_FILE_TEST_IS_REGULAR);
}

static gboolean
starts_with (const char *path,
             const char *magic,
             gsize       n)
{
  g_autofree char *data = NULL;
  gsize length = 0;

  if (!g_file_get_contents (path, &data, &length, NULL))
    return FALSE;
  return length > n && memcmp (data, magic, n) == 0;
}

/* ---- the searchable drop-downs of the line panel ---- */

static guint
popup_n_items (GtkWidget *list)
{
  return g_list_model_get_n_items (G_LIST_MODEL (gtk_list_view_get_model (GTK_LIST_VIEW (list))));
}

static const char *
popup_item_text (GtkWidget *list,
                 guint      position)
{
  g_autoptr (GObject) item = g_list_model_get_item (G_LIST_MODEL (gtk_list_view_get_model (GTK_LIST_VIEW (list))),
                                                    position);

  g_assert_true (GTK_IS_STRING_OBJECT (item));
  return gtk_string_object_get_string (GTK_STRING_OBJECT (item));
}

/* The rows the open list shows: drawn rows with text in them. */
static guint
popup_rows_shown (GtkWidget *list)
{
  guint n = 0;

  for (GtkWidget *row = gtk_widget_get_first_child (list); row; row = gtk_widget_get_next_sibling (row))
    {
      GtkWidget *label = ui_harness_find_descendant (row, GTK_TYPE_LABEL);

      if (label && gtk_widget_get_mapped (row) && *gtk_label_get_text (GTK_LABEL (label)) != '\0')
        n++;
    }
  return n;
}

typedef struct {
  GtkWidget *button;   /* the drop-down's own button */
  GtkWidget *popover;
  GtkWidget *search;
  GtkWidget *list;
  guint      total;    /* entries in the list without a search */
} Picker;

static gboolean
picker_open (gpointer data)
{
  Picker *p = data;
  return gtk_widget_get_mapped (p->popover);
}

static gboolean
picker_filtered (gpointer data)
{
  Picker *p = data;
  return popup_n_items (p->list) < p->total;
}

static gboolean
picker_closed (gpointer data)
{
  Picker *p = data;
  return !gtk_widget_get_visible (p->popover);
}

static gboolean
in_view (gpointer data)
{
  GtkWidget *widget = data;
  GtkWidget *root = GTK_WIDGET (gtk_widget_get_root (widget));
  graphene_rect_t b;

  return gtk_widget_compute_bounds (widget, root, &b)
         && b.origin.y >= 0 && b.origin.y + b.size.height <= gtk_widget_get_height (root);
}

static void
picker_click_open (Picker *p)
{
  /* Scrolled into view first (the panel scrolls to the focused widget),
   * as a user does before clicking. */
  gtk_widget_grab_focus (p->button);
  g_assert_true (ui_harness_wait_until (in_view, p->button, 2000));
  ui_harness_click (p->button);
  g_assert_true (ui_harness_wait_until (picker_open, p, 2000));
  gtk_test_widget_wait_for_draw (p->popover);
  ui_harness_drain ();
}

/* Type a search, then pick the first row it leaves or close the list;
 * opened again, the list shows every entry and an empty search. */
static void
check_picker (RugosaLinePanel *panel,
              const char      *row_title,
              const char      *expander_title,
              gboolean         pick)
{
  GtkWidget *row = ui_harness_find_row (GTK_WIDGET (panel), row_title);
  GtkDropDown *dropdown;
  Picker p;
  guint total, filtered;
  g_autofree char *search = NULL;
  g_autofree char *picked = NULL;

  if (expander_title != NULL)
    {
      /* Opened, and given time to unfold before its rows are clicked. */
      adw_expander_row_set_expanded (ADW_EXPANDER_ROW (ui_harness_find_row (GTK_WIDGET (panel), expander_title)), TRUE);
      ui_harness_wait (500);
    }
  g_assert_nonnull (row);
  gtk_test_widget_wait_for_draw (row);
  dropdown = GTK_DROP_DOWN (ui_harness_find_descendant (row, GTK_TYPE_DROP_DOWN));
  g_assert_nonnull (dropdown);
  g_assert_true (gtk_drop_down_get_enable_search (dropdown));
  p.button = ui_harness_find_descendant (GTK_WIDGET (dropdown), GTK_TYPE_TOGGLE_BUTTON);
  p.popover = ui_harness_find_descendant (GTK_WIDGET (dropdown), GTK_TYPE_POPOVER);
  g_assert_nonnull (p.popover);
  p.search = ui_harness_find_descendant (p.popover, GTK_TYPE_SEARCH_ENTRY);
  p.list = ui_harness_find_descendant (p.popover, GTK_TYPE_LIST_VIEW);
  g_assert_nonnull (p.search);
  g_assert_nonnull (p.list);

  picker_click_open (&p);
  total = p.total = popup_n_items (p.list);
  g_assert_cmpuint (total, >, 2);
  g_assert_cmpuint (popup_rows_shown (p.list), >, 0);

  /* The first characters of the last entry: a search that matches it and
   * not everything. */
  search = g_utf8_substring (popup_item_text (p.list, total - 1), 0, 4);
  gtk_editable_set_text (GTK_EDITABLE (p.search), search);
  /* The search entry waits for a pause in typing before it filters. */
  g_assert_true (ui_harness_wait_until (picker_filtered, &p, 2000));
  filtered = popup_n_items (p.list);
  g_assert_cmpuint (filtered, >=, 1);
  g_assert_cmpuint (filtered, <, total);

  if (pick)
    {
      /* Pointer over the first row (selects it), then a click on it. */
      picked = g_strdup (popup_item_text (p.list, 0));
      gtk_widget_activate_action (p.list, "list.select-item", "(ubb)", 0u, FALSE, FALSE);
      gtk_widget_activate_action (p.list, "list.activate-item", "u", 0u);
    }
  else
    gtk_popover_popdown (GTK_POPOVER (p.popover));
  g_assert_true (ui_harness_wait_until (picker_closed, &p, 2000));
  ui_harness_drain ();
  if (picked != NULL)
    g_assert_cmpstr (gtk_string_object_get_string (gtk_drop_down_get_selected_item (dropdown)), ==, picked);

  picker_click_open (&p);
  g_assert_cmpstr (gtk_editable_get_text (GTK_EDITABLE (p.search)), ==, "");
  g_assert_cmpuint (popup_n_items (p.list), ==, total);
  g_assert_cmpuint (popup_rows_shown (p.list), >, 0);
  gtk_popover_popdown (GTK_POPOVER (p.popover));
  g_assert_true (ui_harness_wait_until (picker_closed, &p, 2000));
}

static void
test_picker_search_reopens (void)
{
  /* The choosers' titles are their rows' labels (the line field table);
   * the pipe size has a picker of its own: tests/test-ui-sizing.c */
  const struct { const char *row, *expander; } pickers[] = {
    { rugosa_field_label (rugosa_field_find ("material-id")), NULL },
    { "Add", rugosa_field_label (rugosa_field_find ("fittings")) },
  };
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaLinePanel *panel = select_line (win, 0);

  for (gsize i = 0; i < G_N_ELEMENTS (pickers); i++)
    {
      g_test_message ("%s: pick a found entry", pickers[i].row);
      check_picker (panel, pickers[i].row, pickers[i].expander, TRUE);
      g_test_message ("%s: close the list", pickers[i].row);
      check_picker (panel, pickers[i].row, pickers[i].expander, FALSE);
    }
  ui_harness_close_window (win);
}

/* ---- enabled state of the actions ---- */

static void
test_undo_after_duplicate (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaProject *project = rugosa_window_get_project (win);
  GtkWidget *undo = action_button (win, "win.undo", NULL);
  GtkWidget *redo = action_button (win, "win.redo", NULL);
  GtkWidget *duplicate = action_button (win, "win.line-duplicate", NULL);
  guint n = rugosa_project_get_n_lines (project);
  double length;

  select_line (win, 0);
  length = rugosa_line_get_double (rugosa_project_get_line (project, 0), "length");
  /* A project just opened has nothing to undo. */
  g_assert_false (gtk_widget_is_sensitive (undo));
  g_assert_false (gtk_widget_is_sensitive (redo));

  /* Duplicate as the first step, undone with the button. */
  ui_harness_click (duplicate);
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_project_get_n_lines (project), ==, n + 1);
  g_assert_true (gtk_widget_is_sensitive (undo));
  ui_harness_click (undo);
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_project_get_n_lines (project), ==, n);
  g_assert_false (gtk_widget_is_sensitive (undo));
  g_assert_true (gtk_widget_is_sensitive (redo));

  /* Duplicate after an edit: both steps stay undoable, one at a time. */
  select_line (win, 0);
  type_into (win, "length", length > 500 ? "432 m" : "765 m");
  g_assert_true (gtk_widget_is_sensitive (undo));
  ui_harness_click (duplicate);
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_project_get_n_lines (project), ==, n + 1);
  g_assert_true (gtk_widget_is_sensitive (undo));
  g_assert_false (gtk_widget_is_sensitive (redo));
  ui_harness_click (undo);
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_project_get_n_lines (project), ==, n);
  g_assert_cmpfloat (rugosa_line_get_double (rugosa_project_get_line (project, 0), "length"), !=, length);
  g_assert_true (gtk_widget_is_sensitive (undo));
  ui_harness_click (undo);
  ui_harness_drain ();
  g_assert_cmpfloat (rugosa_line_get_double (rugosa_project_get_line (project, 0), "length"), ==, length);
  g_assert_false (gtk_widget_is_sensitive (undo));
  ui_harness_close_window (win);
}

/* The move buttons follow the selected line's place in the list: a line
 * moves neither above the first nor below the last. */
static void
test_move_buttons_follow_lines (void)
{
  RugosaWindow *win = rugosa_window_new (app);
  RugosaProject *project = rugosa_window_get_project (win);
  GtkSingleSelection *selection = rugosa_window_get_selection (win);
  GtkWidget *up, *down, *add, *undo, *redo;
  RugosaLine *first;

  gtk_window_present (GTK_WINDOW (win));
  ui_harness_drain ();
  up = action_button (win, "win.line-move-up", NULL);
  down = action_button (win, "win.line-move-down", NULL);
  add = action_button (win, "win.line-add", NULL);
  undo = action_button (win, "win.undo", NULL);
  redo = action_button (win, "win.redo", NULL);

  /* A new project has one line: nothing to move it past. */
  g_assert_cmpuint (rugosa_project_get_n_lines (project), ==, 1);
  g_assert_false (gtk_widget_is_sensitive (up));
  g_assert_false (gtk_widget_is_sensitive (down));

  /* A second line, selected at the bottom: it can only go up. */
  ui_harness_click (add);
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_project_get_n_lines (project), ==, 2);
  g_assert_cmpuint (gtk_single_selection_get_selected (selection), ==, 1);
  g_assert_true (gtk_widget_is_sensitive (up));
  g_assert_false (gtk_widget_is_sensitive (down));

  /* The first line, at the top: it can only go down; moved down, it can
   * only go up again. */
  select_line (win, 0);
  first = rugosa_project_get_line (project, 0);
  g_assert_false (gtk_widget_is_sensitive (up));
  g_assert_true (gtk_widget_is_sensitive (down));
  ui_harness_click (down);
  ui_harness_drain ();
  g_assert_true (rugosa_project_get_line (project, 1) == first);
  g_assert_cmpuint (gtk_single_selection_get_selected (selection), ==, 1);
  g_assert_true (gtk_widget_is_sensitive (up));
  g_assert_false (gtk_widget_is_sensitive (down));

  /* The move and the added line taken back, the selection left on the
   * line that stays: one line, nothing to move. */
  ui_harness_click (undo);
  ui_harness_drain ();
  select_line (win, 0);
  ui_harness_click (undo);
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_project_get_n_lines (project), ==, 1);
  g_assert_false (gtk_widget_is_sensitive (up));
  g_assert_false (gtk_widget_is_sensitive (down));
  ui_harness_click (redo);
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_project_get_n_lines (project), ==, 2);
  g_assert_cmpuint (gtk_single_selection_get_selected (selection), ==, 1);
  g_assert_true (gtk_widget_is_sensitive (up));
  g_assert_false (gtk_widget_is_sensitive (down));
  ui_harness_close_window (win);
}

/* ---- file dialogs ---- */

/* Sources of the magic numbers:
 * PDF: ISO 32000-1:2008 §7.5.2, a PDF file begins "%PDF-".
 * PNG: ISO/IEC 15948:2004 §5.2, the signature 89 50 4E 47 0D 0A 1A 0A.
 * SVG: W3C XML 1.0 §2.8, the XML declaration Cairo's SVG surface writes
 * first ("<?xml"). */
static const struct {
  const char *shown, *typed, *written, *magic;
  gsize n;
} export_cases[] = {
  { "PDF", "chart-a.png", "chart-a.pdf", "%PDF-", 5 },              /* Source: ISO 32000-1 §7.5.2 */
  { "PNG", "chart-b.svg", "chart-b.png", "\x89PNG\r\n\x1a\n", 8 }, /* Source: ISO/IEC 15948 §5.2 */
  { "SVG", "chart-c", "chart-c.svg", "<?xml", 5 },                  /* Source: XML 1.0 §2.8 */
  { "PDF", "chart-d.PDF", "chart-d.PDF", "%PDF-", 5 },              /* Source: ISO 32000-1 §7.5.2 */
  { "SVG", "chart.e.png", "chart.e.svg", "<?xml", 5 },              /* Source: XML 1.0 §2.8 */
};

/* The Format chosen in the dialog is the format written, and the file's
 * extension says so whatever extension was typed. */
static void
test_export_format_wins (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  g_autofree char *folder = g_build_filename (tmpdir, "export", NULL);

  g_assert_cmpint (g_mkdir_with_parents (folder, 0700), ==, 0);
  for (gsize i = 0; i < G_N_ELEMENTS (export_cases); i++)
    {
      g_autofree char *written = g_build_filename (folder, export_cases[i].written, NULL);
      g_autofree char *typed = g_build_filename (folder, export_cases[i].typed, NULL);
      GtkFileChooser *chooser;

      g_test_message ("Format %s, name typed %s", export_cases[i].shown, export_cases[i].typed);
      ui_harness_click (action_button (win, "win.export-chart", NULL));
      chooser = wait_for_chooser (win);
      fill_chooser (chooser, folder, "Format", export_cases[i].shown, export_cases[i].typed);
      g_assert_true (ui_harness_wait_until (file_exists, written, 5000));
      g_assert_true (starts_with (written, export_cases[i].magic, export_cases[i].n));
      if (strcmp (typed, written) != 0)
        g_assert_false (g_file_test (typed, G_FILE_TEST_EXISTS));
    }
  ui_harness_close_window (win);
}

/* The name written differs from the one typed: a file of that name is not
 * replaced without asking. */
static void
test_export_corrected_name_asks (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  g_autofree char *folder = g_build_filename (tmpdir, "export-ask", NULL);
  g_autofree char *existing = g_build_filename (folder, "kept.pdf", NULL);
  g_autofree char *now = NULL;
  AdwMessageDialog *dialog;

  g_assert_cmpint (g_mkdir_with_parents (folder, 0700), ==, 0);
  g_assert_true (g_file_set_contents (existing, "not a chart", -1, NULL));

  ui_harness_click (action_button (win, "win.export-chart", NULL));
  fill_chooser (wait_for_chooser (win), folder, "Format", "PDF", "kept.png");
  dialog = wait_for_message (win);
  g_assert_nonnull (strstr (adw_message_dialog_get_heading (dialog), "kept.pdf"));
  ui_harness_click_response (dialog, "cancel");
  ui_harness_drain ();
  g_assert_true (g_file_get_contents (existing, &now, NULL, NULL));
  g_assert_cmpstr (now, ==, "not a chart");

  ui_harness_click (action_button (win, "win.export-chart", NULL));
  fill_chooser (wait_for_chooser (win), folder, "Format", "PDF", "kept.png");
  dialog = wait_for_message (win);
  ui_harness_click_response (dialog, "replace");
  ui_harness_drain ();
  /* Source: ISO 32000-1:2008 §7.5.2, a PDF file begins "%PDF-". */
  g_assert_true (starts_with (existing, "%PDF-", 5));
  ui_harness_close_window (win);
}

/* The export dialog opens with the choices of the last export that
 * succeeded: size, format and the heading check button; the name offered
 * carries the format's extension. */
static void
test_export_remembers (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  g_autofree char *folder = g_build_filename (tmpdir, "export-remember", NULL);
  g_autofree char *written = g_build_filename (folder, "remembered.svg", NULL);
  g_autoptr (GSettings) settings = g_settings_new ("org.rugosa.Rugosa");
  g_autofree char *offered = NULL;
  GtkFileChooser *chooser;

  g_assert_cmpint (g_mkdir_with_parents (folder, 0700), ==, 0);
  g_settings_reset (settings, "export-size");
  g_settings_reset (settings, "export-format");
  g_settings_reset (settings, "export-heading");

  ui_harness_click (action_button (win, "win.export-chart", NULL));
  chooser = wait_for_chooser (win);
  /* the schema's defaults */
  g_assert_cmpstr (gtk_file_chooser_get_choice (chooser, "format"), ==, "png");
  g_assert_cmpstr (gtk_file_chooser_get_choice (chooser, "size"), ==, "1280x800");
  g_assert_cmpstr (gtk_file_chooser_get_choice (chooser, "heading"), ==, "false");
  pick_shown (GTK_WIDGET (chooser), "Size", "960 × 600 (slides)");
  gtk_file_chooser_set_choice (chooser, "heading", "true");
  fill_chooser (chooser, folder, "Format", "SVG", "remembered");
  g_assert_true (ui_harness_wait_until (file_exists, written, 5000));
  ui_harness_drain ();
  g_assert_cmpstr (g_settings_get_string (settings, "export-format"), ==, "svg");
  g_assert_cmpstr (g_settings_get_string (settings, "export-size"), ==, "960x600");
  g_assert_true (g_settings_get_boolean (settings, "export-heading"));

  ui_harness_click (action_button (win, "win.export-chart", NULL));
  chooser = wait_for_chooser (win);
  g_assert_cmpstr (gtk_file_chooser_get_choice (chooser, "format"), ==, "svg");
  g_assert_cmpstr (gtk_file_chooser_get_choice (chooser, "size"), ==, "960x600");
  g_assert_cmpstr (gtk_file_chooser_get_choice (chooser, "heading"), ==, "true");
  offered = gtk_file_chooser_get_current_name (chooser);
  g_assert_true (g_str_has_suffix (offered, ".svg"));
  ui_harness_click (gtk_dialog_get_widget_for_response (GTK_DIALOG (chooser), GTK_RESPONSE_CANCEL));
  ui_harness_drain ();
  g_settings_reset (settings, "export-size");
  g_settings_reset (settings, "export-format");
  g_settings_reset (settings, "export-heading");
  ui_harness_close_window (win);
}

/* An exported SVG carries no selection: with line 0 selected and line 1
 * pinned it is the same drawing as with line 1 selected and line 0
 * pinned (each selected line drawn as a pinned one, without its ring). */
static void
test_export_no_selection (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaProject *project = rugosa_window_get_project (win);
  RugosaLine *l0 = rugosa_project_get_line (project, 0), *l1 = rugosa_project_get_line (project, 1);
  g_autofree char *a = g_build_filename (tmpdir, "selected-0.svg", NULL);
  g_autofree char *b = g_build_filename (tmpdir, "selected-1.svg", NULL);
  g_autofree char *da = NULL, *db = NULL;
  g_autofree char *ca = NULL, *cb = NULL;
  g_autoptr (GRegex) ids = g_regex_new ("surface[0-9]+", 0, 0, NULL);
  g_autoptr (GError) error = NULL;

  select_line (win, 0);
  rugosa_visibility_set_pinned (win->visibility, l1, TRUE);
  ui_harness_drain ();
  g_assert_true (rugosa_window_export_chart_to (win, a, RUGOSA_CHART_FORMAT_SVG, 960, 600, &error));
  g_assert_no_error (error);
  select_line (win, 1);
  rugosa_visibility_set_pinned (win->visibility, l1, FALSE);
  rugosa_visibility_set_pinned (win->visibility, l0, TRUE);
  ui_harness_drain ();
  g_assert_true (rugosa_window_export_chart_to (win, b, RUGOSA_CHART_FORMAT_SVG, 960, 600, &error));
  g_assert_no_error (error);
  rugosa_visibility_set_pinned (win->visibility, l0, FALSE);
  g_assert_true (g_file_get_contents (a, &da, NULL, NULL));
  g_assert_true (g_file_get_contents (b, &db, NULL, NULL));
  /* Cairo numbers its SVG surfaces across the process: names aside */
  ca = g_regex_replace_literal (ids, da, -1, 0, "surface", 0, NULL);
  cb = g_regex_replace_literal (ids, db, -1, 0, "surface", 0, NULL);
  g_assert_cmpstr (ca, ==, cb);
  ui_harness_close_window (win);
}

/* The results table is written as CSV into a file named .csv. */
static void
test_export_csv_extension (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  g_autofree char *folder = g_build_filename (tmpdir, "csv", NULL);
  g_autofree char *typed = g_build_filename (folder, "line results", NULL);
  g_autofree char *written = g_build_filename (folder, "line results.csv", NULL);
  g_autofree char *reference = g_build_filename (tmpdir, "reference.csv", NULL);
  g_autofree char *got = NULL, *want = NULL;
  g_autoptr (GError) error = NULL;

  g_assert_cmpint (g_mkdir_with_parents (folder, 0700), ==, 0);
  gtk_widget_activate_action (GTK_WIDGET (win), "win.export-csv", NULL);   /* the menu item */
  fill_chooser (wait_for_chooser (win), folder, NULL, NULL, "line results");
  g_assert_true (ui_harness_wait_until (file_exists, written, 5000));
  g_assert_false (g_file_test (typed, G_FILE_TEST_EXISTS));
  /* The same bytes as the results table written directly. */
  g_assert_true (rugosa_window_export_csv_to (win, reference, &error));
  g_assert_no_error (error);
  g_assert_true (g_file_get_contents (written, &got, NULL, NULL));
  g_assert_true (g_file_get_contents (reference, &want, NULL, NULL));
  g_assert_cmpstr (got, ==, want);
  ui_harness_close_window (win);
}

/* ---- quitting through the close guard ---- */

static void
test_quit_discard (void)
{
  RugosaWindow *win = open_demo_copy ("quit-discard.rugosa");
  g_autofree char *path = g_file_get_path (rugosa_window_get_file (win));
  g_autofree char *before = NULL, *after = NULL;
  AdwMessageDialog *dialog;

  g_assert_true (g_file_get_contents (path, &before, NULL, NULL));
  select_line (win, 0);
  type_into (win, "length", "888 m");
  g_object_add_weak_pointer (G_OBJECT (win), (gpointer *) &win);

  g_action_group_activate_action (G_ACTION_GROUP (app), "quit", NULL);   /* Ctrl+Q */
  ui_harness_drain ();
  dialog = ui_harness_find_message_dialog (GTK_WINDOW (win));
  g_assert_nonnull (dialog);
  ui_harness_click_response (dialog, "discard");
  g_assert_true (ui_harness_wait_until (window_gone, &win, 2000));
  g_assert_true (g_file_get_contents (path, &after, NULL, NULL));
  g_assert_cmpstr (after, ==, before);
}

static void
test_quit_save (void)
{
  RugosaWindow *win = open_demo_copy ("quit-save.rugosa");
  g_autoptr (GFile) file = g_object_ref (rugosa_window_get_file (win));
  g_autofree char *path = g_file_get_path (file);
  g_autoptr (RugosaProject) saved = rugosa_project_new ();
  g_autoptr (GError) error = NULL;
  AdwMessageDialog *dialog;

  select_line (win, 0);
  type_into (win, "length", "888 m");
  g_object_add_weak_pointer (G_OBJECT (win), (gpointer *) &win);

  g_action_group_activate_action (G_ACTION_GROUP (app), "quit", NULL);
  ui_harness_drain ();
  dialog = ui_harness_find_message_dialog (GTK_WINDOW (win));
  g_assert_nonnull (dialog);
  ui_harness_click_response (dialog, "save");
  g_assert_true (ui_harness_wait_until (window_gone, &win, 2000));
  g_assert_true (rugosa_project_load (saved, path, &error));
  g_assert_no_error (error);
  /* Source: the length typed above, 888 m. */
  g_assert_cmpfloat (rugosa_line_get_double (rugosa_project_get_line (saved, 0), "length"), ==, 888.0);
}

/* An unnamed project: Save on quitting asks for a name first. */
static void
test_quit_save_as (void)
{
  RugosaWindow *win = rugosa_window_new (app);
  g_autofree char *path = g_build_filename (tmpdir, "quit-named.rugosa", NULL);
  g_autoptr (RugosaProject) saved = rugosa_project_new ();
  g_autoptr (GError) error = NULL;
  AdwMessageDialog *dialog;

  gtk_window_present (GTK_WINDOW (win));
  ui_harness_drain ();
  select_line (win, 0);
  type_into (win, "length", "777 m");
  g_object_add_weak_pointer (G_OBJECT (win), (gpointer *) &win);

  g_action_group_activate_action (G_ACTION_GROUP (app), "quit", NULL);
  ui_harness_drain ();
  dialog = ui_harness_find_message_dialog (GTK_WINDOW (win));
  g_assert_nonnull (dialog);
  ui_harness_click_response (dialog, "save");
  fill_chooser (wait_for_chooser (win), tmpdir, NULL, NULL, "quit-named");
  g_assert_true (ui_harness_wait_until (window_gone, &win, 5000));
  g_assert_true (rugosa_project_load (saved, path, &error));
  g_assert_no_error (error);
  /* Source: the length typed above, 777 m. */
  g_assert_cmpfloat (rugosa_line_get_double (rugosa_project_get_line (saved, 0), "length"), ==, 777.0);
}

/* ---- window state between sessions ---- */

static gboolean
window_maximized (gpointer data)
{
  return gtk_window_is_maximized (data);
}

static void
test_maximized_restored (void)
{
  GSettings *settings = rugosa_application_get_settings (app);
  RugosaWindow *win;
  int w = 0, h = 0;

  /* Left maximized last time, with a smaller size to come back to. */
  g_settings_set_int (settings, "window-width", 1100);
  g_settings_set_int (settings, "window-height", 720);
  g_settings_set_boolean (settings, "window-maximized", TRUE);
  win = rugosa_window_new (app);
  gtk_window_present (GTK_WINDOW (win));
  g_assert_true (ui_harness_wait_until (window_maximized, win, 2000));
  gtk_window_get_default_size (GTK_WINDOW (win), &w, &h);
  g_assert_cmpint (w, ==, 1100);
  g_assert_cmpint (h, ==, 720);
  /* Closed maximized: the flag is written, the size to come back to
   * stays (not the size of the screen). */
  g_settings_set_boolean (settings, "window-maximized", FALSE);
  gtk_window_close (GTK_WINDOW (win));
  ui_harness_drain ();
  g_assert_true (g_settings_get_boolean (settings, "window-maximized"));
  g_assert_cmpint (g_settings_get_int (settings, "window-width"), ==, 1100);
  g_assert_cmpint (g_settings_get_int (settings, "window-height"), ==, 720);

  /* Left at a size: not maximized next time, and that is written. */
  g_settings_set_boolean (settings, "window-maximized", FALSE);
  win = rugosa_window_new (app);
  gtk_window_present (GTK_WINDOW (win));
  gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
  ui_harness_drain ();
  g_assert_false (gtk_window_is_maximized (GTK_WINDOW (win)));
  g_settings_set_boolean (settings, "window-maximized", TRUE);
  gtk_window_close (GTK_WINDOW (win));
  ui_harness_drain ();
  g_assert_false (g_settings_get_boolean (settings, "window-maximized"));
  /* Not resized: the size it opened at is the size written, session
   * after session. */
  g_assert_cmpint (g_settings_get_int (settings, "window-width"), ==, 1100);
  g_assert_cmpint (g_settings_get_int (settings, "window-height"), ==, 720);

  g_settings_reset (settings, "window-width");
  g_settings_reset (settings, "window-height");
  g_settings_reset (settings, "window-maximized");
}

/* ---- the service-age slider ---- */

static void
drag_slider (RugosaWindow *win,
             double        years)
{
  gboolean handled = FALSE;

  /* What a drag of the slider's knob emits. */
  g_signal_emit_by_name (rugosa_window_get_age_scale (win), "change-value", GTK_SCROLL_JUMP, years, &handled);
  ui_harness_drain ();
}

static void
test_slider_is_a_view (void)
{
  RugosaWindow *win = open_demo_copy ("slider.rugosa");
  g_autoptr (GFile) file = g_object_ref (rugosa_window_get_file (win));
  g_autofree char *path = g_file_get_path (file);
  g_autofree char *before = NULL, *after = NULL;
  g_autoptr (RugosaProject) saved = rugosa_project_new ();
  g_autoptr (GError) error = NULL;
  RugosaSettings *ps = rugosa_project_get_settings (rugosa_window_get_project (win));
  double age = rugosa_settings_get_double (ps, "service-age");
  /* Invented positions, away from the file's own age. */
  double first = age < 20.0 ? 30.0 : 10.0;
  double second = first + 5.0;

  g_assert_true (g_file_get_contents (path, &before, NULL, NULL));
  g_object_add_weak_pointer (G_OBJECT (win), (gpointer *) &win);
  drag_slider (win, first);
  g_assert_cmpfloat (rugosa_settings_get_double (ps, "service-age"), ==, first);
  g_assert_false (rugosa_window_get_modified (win));
  g_assert_false (g_str_has_prefix (gtk_window_get_title (GTK_WINDOW (win)), "• "));
  g_assert_false (gtk_widget_is_sensitive (action_button (win, "win.undo", NULL)));
  /* Closing does not ask, and leaves the file as it was. */
  gtk_window_close (GTK_WINDOW (win));
  ui_harness_drain ();
  g_assert_null (win);
  g_assert_true (g_file_get_contents (path, &after, NULL, NULL));
  g_assert_cmpstr (after, ==, before);

  /* Saved for another reason, the file keeps the age shown. */
  win = rugosa_window_new (app);
  gtk_window_present (GTK_WINDOW (win));
  g_assert_true (rugosa_window_load_file_sync (win, file, &error));
  g_assert_no_error (error);
  ui_harness_drain ();
  drag_slider (win, second);
  g_assert_false (rugosa_window_get_modified (win));
  select_line (win, 0);
  type_into (win, "length", "654 m");
  g_assert_true (rugosa_window_get_modified (win));
  ui_harness_click (action_button (win, "win.save", NULL));
  ui_harness_drain ();
  g_assert_false (rugosa_window_get_modified (win));
  g_assert_true (rugosa_project_load (saved, path, &error));
  g_assert_no_error (error);
  /* Source: the position the slider was dragged to above. */
  g_assert_cmpfloat (rugosa_settings_get_double (rugosa_project_get_settings (saved), "service-age"), ==, second);
  ui_harness_close_window (win);
}

/* ---- the chart area's views, the results and the cost group ---------- */

static RugosaPlotView *
show_view (RugosaWindow   *win,
           RugosaChartView view)
{
  GtkWidget *switcher = ui_harness_find_descendant (GTK_WIDGET (win), GTK_TYPE_STACK_SWITCHER);
  GtkWidget *button = NULL;
  GtkStack *stack;

  g_assert_nonnull (switcher);
  /* the switcher's button that shows the view's name */
  for (GtkWidget *c = gtk_widget_get_first_child (switcher); c != NULL; c = gtk_widget_get_next_sibling (c))
    {
      GtkWidget *label = ui_harness_find_descendant (c, GTK_TYPE_LABEL);

      if (label != NULL && g_strcmp0 (gtk_label_get_text (GTK_LABEL (label)), rugosa_chart_view_title (view)) == 0)
        button = c;
    }
  ui_harness_click (button);
  ui_harness_drain ();
  stack = gtk_stack_switcher_get_stack (GTK_STACK_SWITCHER (switcher));
  g_assert_cmpstr (gtk_stack_get_visible_child_name (stack), ==, rugosa_chart_view_id (view));
  if (view == RUGOSA_CHART_VIEW_FRICTION)
    return NULL;
  gtk_test_widget_wait_for_draw (gtk_stack_get_visible_child (stack));
  return RUGOSA_PLOT_VIEW (gtk_stack_get_visible_child (stack));
}

/* The two views draw every line option of the demo with the numbers of
 * the results (the same the results table and rugosa-cli eval give), and
 * the window exports the view it shows. */
static void
test_views (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaProject *project = rugosa_window_get_project (win);
  RugosaResultsTable *table = RUGOSA_RESULTS_TABLE (rugosa_window_get_results (win));
  g_autofree char *png = g_build_filename (tmpdir, "cost-view.png", NULL);
  g_autoptr (GError) error = NULL;
  const RugosaPlotInput *input;
  RugosaPlotView *view;
  guint n = rugosa_project_get_n_lines (project);

  view = show_view (win, RUGOSA_CHART_VIEW_SYSTEM);
  input = rugosa_plot_view_get_input (view);
  g_assert_nonnull (input);
  g_assert_cmpuint (input->n_series, ==, n);
  for (guint i = 0; i < input->n_series; i++)
    {
      const RugosaLineResults *r = rugosa_project_get_results (project, rugosa_project_get_line (project, input->line_index[i]));
      double q;

      /* Source: data/demo.rugosa gives every option the same pump, which
       * meets every line's system curve when new */
      g_assert_true (input->series[i].has_duty_new);
      g_assert_true (r->energy.duty_new_ok);
      /* Source: the model's results of the line, in the project's unit */
      g_assert_cmpint (rg_units_from_si (RG_QTY_FLOW, r->energy.duty_new_flow_m3_s,
                                         rugosa_settings_get_unit (rugosa_project_get_settings (project), RUGOSA_DISPLAY_FLOW),
                                         &q, NULL), ==, RG_OK);
      g_assert_cmpfloat (input->series[i].duty_new.x, ==, q);
    }
  ui_harness_save_png (GTK_WIDGET (win), "rugosa-window-system.png");

  view = show_view (win, RUGOSA_CHART_VIEW_COST);
  input = rugosa_plot_view_get_input (view);
  g_assert_cmpuint (input->n_series, ==, n);
  for (guint i = 0; i < input->n_series; i++)
    {
      RugosaLine *line = rugosa_project_get_line (project, input->line_index[i]);
      const RugosaLineResults *r = rugosa_project_get_results (project, line);
      const RugosaPlotSeries *s = &input->series[i];
      g_autofree char *cell = rugosa_results_table_format_cell (table, line, "life-cycle-cost");
      g_autofree char *want = rugosa_display_money_screen (r->energy.life_cycle_cost, NULL);

      /* Source: the model's results: the curve starts at the capital and
       * ends at the life-cycle cost, which the table shows */
      g_assert_true (r->energy.has_capital && r->energy.life_ok);
      g_assert_cmpfloat (s->cost[0].y, ==, r->energy.capital);
      g_assert_cmpfloat (fabs (s->cost[s->n_cost - 1].y - r->energy.life_cycle_cost), <=,
                         1e-9 * r->energy.life_cycle_cost);
      g_assert_cmpstr (cell, ==, want);
    }
  ui_harness_save_png (GTK_WIDGET (win), "rugosa-window-cost.png");

  g_assert_true (rugosa_window_export_chart_to (win, png, RUGOSA_CHART_FORMAT_PNG, 960, 600, &error));
  g_assert_no_error (error);
  /* Source: ISO/IEC 15948 §5.2, the PNG signature */
  g_assert_true (starts_with (png, "\x89PNG\r\n\x1a\n", 8));
  show_view (win, RUGOSA_CHART_VIEW_FRICTION);
  ui_harness_close_window (win);
}

/* The cost group edits the line through the undo history, and refuses
 * what the file could not hold with a sentence under the field. */
static void
test_cost_group (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaCostGroup *group = RUGOSA_COST_GROUP (ui_harness_find_descendant (GTK_WIDGET (win), RUGOSA_TYPE_COST_GROUP));
  RugosaLine *line;
  double before;
  g_autoptr (GVariant) curve = NULL;

  g_assert_nonnull (group);
  select_line (win, 1);
  line = rugosa_project_get_line (rugosa_window_get_project (win), 1);
  before = rugosa_line_get_double (line, "cost-per-metre");
  /* an invented price, away from the demo's */
  g_assert_true (rugosa_cost_group_commit_text (group, "cost-per-metre", "287.5"));
  ui_harness_drain ();
  g_assert_cmpfloat (rugosa_line_get_double (line, "cost-per-metre"), ==, 287.5);
  g_assert_true (rugosa_window_get_modified (win));
  rugosa_history_undo (rugosa_window_get_history (win));
  ui_harness_drain ();
  g_assert_cmpfloat (rugosa_line_get_double (line, "cost-per-metre"), ==, before);

  /* not a number, or out of the row's range: refused, the line kept */
  g_assert_false (rugosa_cost_group_commit_text (group, "cost-lump-sum", "lots"));
  g_assert_nonnull (rugosa_cost_group_get_error (group, "cost-lump-sum"));
  g_assert_false (rugosa_cost_group_commit_text (group, "cost-per-metre", "-5"));
  g_assert_nonnull (strstr (rugosa_cost_group_get_error (group, "cost-per-metre"), "must lie between"));
  g_assert_cmpfloat (rugosa_line_get_double (line, "cost-per-metre"), ==, before);

  /* a point of the pump curve, in the display unit; the curve stays in
   * order of flow, and two points may not share a flow */
  g_assert_true (rugosa_cost_group_commit_text (group, "flow:0", "2 L/s"));
  ui_harness_drain ();
  g_object_get (line, "pump-curve", &curve, NULL);
  {
    double q, h;

    g_variant_get_child (curve, 0, "(dd)", &q, &h);
    /* Source: the text typed, 2 L/s = 0.002 m³/s (NIST SP 811 B.8, litre) */
    g_assert_cmpfloat (fabs (q - 0.002), <, 1e-15);
  }
  g_assert_false (rugosa_cost_group_commit_text (group, "flow:1", "2 L/s"));
  g_assert_nonnull (strstr (rugosa_cost_group_get_error (group, "flow:1"), "same flow"));
  adw_expander_row_set_expanded (ADW_EXPANDER_ROW (ui_harness_find_descendant (GTK_WIDGET (group), ADW_TYPE_EXPANDER_ROW)),
                                 TRUE);
  ui_harness_wait (600);
  ui_harness_save_png (GTK_WIDGET (group), "rugosa-cost-group.png");
  ui_harness_close_window (win);
}

int
main (int argc, char *argv[])
{
  int status;

  tmpdir = ui_harness_private_dirs ("rugosa-test-ui-window");
  g_test_init (&argc, &argv, NULL);
  if (!ui_harness_init_gtk ())
    {
      g_print ("1..0 # SKIP no display\n");
      ui_harness_remove_tree (tmpdir);
      return 0;
    }
  app = ui_harness_app_new ("org.rugosa.Rugosa.TestWindow");

  g_test_add_func ("/ui/panel/picker-search-reopens", test_picker_search_reopens);
  g_test_add_func ("/ui/actions/undo-after-duplicate", test_undo_after_duplicate);
  g_test_add_func ("/ui/actions/move-follows-lines", test_move_buttons_follow_lines);
  g_test_add_func ("/ui/files/export-format-wins", test_export_format_wins);
  g_test_add_func ("/ui/files/export-corrected-name-asks", test_export_corrected_name_asks);
  g_test_add_func ("/ui/files/export-csv-extension", test_export_csv_extension);
  g_test_add_func ("/ui/files/export-remembers", test_export_remembers);
  g_test_add_func ("/ui/files/export-no-selection", test_export_no_selection);
  g_test_add_func ("/ui/files/quit-discard", test_quit_discard);
  g_test_add_func ("/ui/files/quit-save", test_quit_save);
  g_test_add_func ("/ui/files/quit-save-as", test_quit_save_as);
  g_test_add_func ("/ui/window/maximized-restored", test_maximized_restored);
  g_test_add_func ("/ui/slider/view-not-edit", test_slider_is_a_view);
  g_test_add_func ("/ui/views/system-and-cost", test_views);
  g_test_add_func ("/ui/panel/cost-group", test_cost_group);

  status = g_test_run ();
  g_object_unref (app);
  ui_harness_remove_tree (tmpdir);
  g_free (tmpdir);
  return status;
}
