/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The sizing assistant and the size picker as a user drives them: the
 * assistant opened from the header bar for the selected line option, its
 * duty and limits typed, the material changed, sizes ticked and added as
 * line options in one undo step, the ladder on the chart while it is open
 * and gone when it closes; the picker of the side panel filtered by the
 * line's material, searched by any part of a designation, ordered by size
 * then wall, and a custom bore that keeps the bore.
 *
 * Writes build/sizing-assistant.png, build/sizing-ladder.png and
 * build/size-picker.png for people to look at.  Run through the 'ui'
 * suite; without a display the program reports a skip. */
#define G_LOG_DOMAIN "test-ui-sizing"

#include "config.h"

#include <adwaita.h>
#include <glib/gi18n.h>
#include <math.h>
#include <string.h>

#include "core/aging.h"
#include "core/catalog.h"
#include "core/hazen-williams.h"
#include "model/rugosa-history.h"
#include "rugosa-application.h"
#include "rugosa-canvas.h"
#include "rugosa-line-panel.h"
#include "rugosa-quantity-entry.h"
#include "rugosa-readout.h"
#include "rugosa-results-table.h"
#include "rugosa-size-picker.h"
#include "rugosa-sizing-window.h"
#include "rugosa-window.h"
#include "ui-harness.h"

static RugosaApplication *app;
static char *tmpdir;

static RugosaSizingWindow *
open_assistant (RugosaWindow *win,
                guint         line)
{
  GtkWidget *button = ui_harness_find_action_widget (GTK_WIDGET (win), "win.size-pipe", NULL);
  RugosaSizingWindow *sizing;

  gtk_single_selection_set_selected (rugosa_window_get_selection (win), line);
  ui_harness_drain ();
  /* the header bar's button */
  ui_harness_click (button);
  ui_harness_drain ();
  sizing = RUGOSA_SIZING_WINDOW (ui_harness_find_dialog (GTK_WINDOW (win), RUGOSA_TYPE_SIZING_WINDOW));
  g_assert_nonnull (sizing);
  gtk_window_set_default_size (GTK_WINDOW (sizing), 1260, 760);
  gtk_test_widget_wait_for_draw (GTK_WIDGET (sizing));
  return sizing;
}

static void
type_into (RugosaSizingWindow *sizing,
           const char         *property,
           const char         *text)
{
  GtkWidget *entry = rugosa_sizing_window_get_entry (sizing, property);

  g_assert_nonnull (entry);
  g_assert_true (rugosa_quantity_entry_commit_text (RUGOSA_QUANTITY_ENTRY (entry), text));
  ui_harness_drain ();
}

/* Choose in the drop-down of the row titled `row` the entry shown as `shown`. */
static void
choose_in_row (GtkWidget  *root,
               const char *row,
               const char *shown)
{
  GtkWidget *r = ui_harness_find_row (root, row);
  GtkDropDown *dd;
  GListModel *model;

  g_assert_nonnull (r);
  dd = GTK_DROP_DOWN (ui_harness_find_descendant (r, GTK_TYPE_DROP_DOWN));
  model = gtk_drop_down_get_model (dd);
  for (guint i = 0; i < g_list_model_get_n_items (model); i++)
    {
      g_autoptr (GtkStringObject) s = g_list_model_get_item (model, i);

      if (g_str_equal (gtk_string_object_get_string (s), shown))
        {
          gtk_drop_down_set_selected (dd, i);
          ui_harness_drain ();
          return;
        }
    }
  g_error ("no “%s” in the row “%s”", shown, row);
}

/* The tick box of a size in the assistant's table (rows on screen). */
static GtkCheckButton *
find_tick (GtkWidget  *root,
           const char *designation)
{
  for (GtkWidget *c = gtk_widget_get_first_child (root); c; c = gtk_widget_get_next_sibling (c))
    {
      GtkCheckButton *found;

      if (GTK_IS_CHECK_BUTTON (c)
          && g_strcmp0 (g_object_get_data (G_OBJECT (c), "designation"), designation) == 0)
        return GTK_CHECK_BUTTON (c);
      if ((found = find_tick (c, designation)) != NULL)
        return found;
    }
  return NULL;
}

/* The window's main button (the one styled as its suggested action). */
static GtkWidget *
find_suggested (GtkWidget *root)
{
  for (GtkWidget *c = gtk_widget_get_first_child (root); c; c = gtk_widget_get_next_sibling (c))
    {
      GtkWidget *found;

      if (GTK_IS_BUTTON (c) && gtk_widget_has_css_class (c, "suggested-action"))
        return c;
      if ((found = find_suggested (c)) != NULL)
        return found;
    }
  return NULL;
}

static int
index_of (const RugosaSizing *s,
          const char         *designation)
{
  for (guint i = 0; i < s->n_candidates; i++)
    if (g_str_equal (s->candidates[i].pipe->designation, designation))
      return (int) i;
  return -1;
}

static void
test_assistant (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaProject *project = rugosa_window_get_project (win);
  RugosaHistory *history = rugosa_window_get_history (win);
  RugosaCanvas *canvas = RUGOSA_CANVAS (rugosa_window_get_canvas (win));
  RugosaSettings *settings = rugosa_project_get_settings (project);
  RugosaSizingWindow *sizing = open_assistant (win, 0);
  const RugosaSizing *s = rugosa_sizing_window_get_sizing (sizing);
  guint lines = rugosa_project_get_n_lines (project);
  guint evaluated = 0;
  int rec;

  /* The demo's first line is PE: its usual catalog, and the first size
   * that passes is the one recommended and chosen. */
  g_assert_nonnull (s);
  g_assert_cmpuint (s->n_candidates, >, 10);
  g_assert_cmpstr (rg_pipe_catalog_at (s->candidates[0].pipe->catalog)->name, ==, "ISO 4427-2 SDR 11");
  rec = s->recommended;
  g_assert_cmpint (rec, >=, 0);
  for (int i = 0; i < rec; i++)
    g_assert_false (s->candidates[i].passes);
  g_assert_true (rugosa_sizing_window_get_chosen (sizing, (guint) rec));
  g_assert_nonnull (strstr (rugosa_sizing_window_get_summary (sizing), s->candidates[rec].pipe->designation));
  /* the ladder: every size that could be computed, on the chart */
  for (guint i = 0; i < s->n_candidates; i++)
    evaluated += s->candidates[i].results.ok && s->candidates[i].results.points[RUGOSA_FLOW_DESIGN].ok;
  g_assert_cmpuint (rugosa_canvas_get_ladder_count (canvas), ==, evaluated);

  /* A new duty: 60 L/s, velocity at most 1.5 m/s (a project setting,
   * undoable), 15 m of head over the run. */
  /* (above the demo's highest flow, 35 L/s: refused until that goes) */
  {
    GtkWidget *entry = rugosa_sizing_window_get_entry (sizing, "flow-design");

    g_assert_true (rugosa_quantity_entry_commit_text (RUGOSA_QUANTITY_ENTRY (entry), "60 L/s"));
    ui_harness_drain ();
    g_assert_nonnull (rugosa_quantity_entry_get_error_text (RUGOSA_QUANTITY_ENTRY (entry)));
  }
  type_into (sizing, "flow-maximum", "0");
  type_into (sizing, "flow-design", "60 L/s");
  type_into (sizing, "velocity-limit", "1.5 m/s");
  type_into (sizing, "max-head-loss", "15 m");
  g_assert_cmpfloat (rugosa_settings_get_double (settings, "velocity-limit"), ==, 1.5);
  s = rugosa_sizing_window_get_sizing (sizing);
  for (guint i = 0; i < s->n_candidates; i++)
    {
      const RugosaSizingCandidate *c = &s->candidates[i];
      const double d = c->pipe->inner_diameter_m;

      /* Source: V = 4Q/(πD²) */
      g_assert_cmpfloat_with_epsilon (c->results.points[RUGOSA_FLOW_DESIGN].result.velocity_m_s,
                                      0.06 / (G_PI * d * d / 4.0), 1e-12);
      g_assert_cmpint ((c->broken_new & RUGOSA_LIMIT_VELOCITY_MAX) != 0, ==,
                       0.06 / (G_PI * d * d / 4.0) > 1.5);
      if (c->passes)
        g_assert_cmpfloat (c->results.points[RUGOSA_FLOW_DESIGN].result.head_loss_total_m, <=, 15.0);
    }
  g_assert_true (strlen (rugosa_sizing_window_get_inverse (sizing)) > 0);
  /* the line itself is untouched: the duty is a copy (25 L/s, the
   * demo's own value in data/demo.rugosa) */
  g_assert_cmpfloat (rugosa_line_get_double (rugosa_project_get_line (project, 0), "flow-design"), ==, 0.025);

  /* Another material: ductile iron, its preferred classes. */
  choose_in_row (GTK_WIDGET (sizing), "Material", _("Ductile iron, cement-mortar lined"));
  s = rugosa_sizing_window_get_sizing (sizing);
  g_assert_cmpstr (s->candidates[0].pipe->standard, ==, "ISO 2531");
  rec = s->recommended;
  g_assert_cmpint (rec, >=, 0);
  ui_harness_save_png (GTK_WIDGET (sizing), "sizing-assistant.png");
  ui_harness_save_png (GTK_WIDGET (canvas), "sizing-ladder.png");

  /* Tick the size above the recommended one too, and add both. */
  {
    const char *next = s->candidates[rec + 1].pipe->designation;
    const char *first = s->candidates[rec].pipe->designation;
    GtkCheckButton *tick = find_tick (GTK_WIDGET (sizing), next);
    GtkWidget *add = find_suggested (GTK_WIDGET (sizing));
    g_autofree char *want_first = g_strdup (first);
    g_autofree char *want_next = g_strdup (next);

    g_assert_nonnull (tick);
    gtk_check_button_set_active (tick, TRUE);
    ui_harness_drain ();
    g_assert_true (rugosa_sizing_window_get_chosen (sizing, (guint) rec + 1));
    g_assert_nonnull (add);
    ui_harness_click (add);
    ui_harness_drain ();
    g_assert_cmpuint (rugosa_project_get_n_lines (project), ==, lines + 2);
    {
      RugosaLine *a = rugosa_project_get_line (project, lines);
      RugosaLine *b = rugosa_project_get_line (project, lines + 1);

      g_assert_cmpstr (rugosa_line_get_pipe_designation (a), ==, want_first);
      g_assert_cmpstr (rugosa_line_get_pipe_designation (b), ==, want_next);
      g_assert_cmpstr (rugosa_line_get_material_id (a), ==, "ductile-iron-cement-lined");
      /* the duty typed in the assistant */
      g_assert_cmpfloat (rugosa_line_get_double (a, "flow-design"), ==, 0.06);
      /* each added line, evaluated by the window, is the candidate */
      {
        const RugosaLineResults *r = rugosa_project_get_results (project, a);
        const RugosaSizingCandidate *c = &rugosa_sizing_window_get_sizing (sizing)->candidates[index_of (rugosa_sizing_window_get_sizing (sizing), want_first)];

        g_assert_cmpfloat (r->points[RUGOSA_FLOW_DESIGN].result.head_loss_total_m, ==,
                           c->results.points[RUGOSA_FLOW_DESIGN].result.head_loss_total_m);
      }
    }
    /* one undo step takes both away */
    g_assert_true (rugosa_history_undo (history));
    ui_harness_drain ();
    g_assert_cmpuint (rugosa_project_get_n_lines (project), ==, lines);
    /* and one more, the velocity limit typed in the assistant: back to
     * the demo's 2.5 m/s (data/demo.rugosa) */
    g_assert_true (rugosa_history_undo (history));
    ui_harness_drain ();
    g_assert_cmpfloat (rugosa_settings_get_double (settings, "velocity-limit"), ==, 2.5);
  }

  /* Closed: the ladder leaves the chart. */
  gtk_window_close (GTK_WINDOW (sizing));
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_canvas_get_ladder_count (canvas), ==, 0);
  ui_harness_close_window (win);
}

static void
test_ladder_follows_age (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaProject *project = rugosa_window_get_project (win);
  RugosaCanvas *canvas = RUGOSA_CANVAS (rugosa_window_get_canvas (win));
  RugosaSizingWindow *sizing = open_assistant (win, 0);
  double x0, y0, x1, y1;

  /* With roughness growth, the ladder's points move up their aging as
   * the service age grows (the rougher wall gives a larger f). */
  choose_in_row (GTK_WIDGET (sizing), "Aging", _(rg_aging_class_at (2)->name));
  type_into (sizing, "service-age", "0");
  g_assert_cmpfloat (rugosa_settings_get_double (rugosa_project_get_settings (project), "service-age"), ==, 0.0);
  /* the largest size: no age makes it too rough to compute */
  g_assert_true (rugosa_canvas_ladder_position (canvas, (guint) rugosa_canvas_get_ladder_count (canvas) - 1, &x0, &y0));
  type_into (sizing, "service-age", "40");
  g_assert_true (rugosa_canvas_ladder_position (canvas, (guint) rugosa_canvas_get_ladder_count (canvas) - 1, &x1, &y1));
  g_assert_cmpfloat (x1, ==, x0);   /* the same Re */
  g_assert_cmpfloat (y1, <, y0);    /* a larger f is higher on the chart */
  gtk_window_close (GTK_WINDOW (sizing));
  ui_harness_drain ();
  ui_harness_close_window (win);
}

/* ---- the size picker ---- */

static RugosaSizePicker *
panel_picker (RugosaWindow *win,
              guint         line)
{
  GtkWidget *panel;
  GtkWidget *row;

  gtk_single_selection_set_selected (rugosa_window_get_selection (win), line);
  ui_harness_drain ();
  panel = rugosa_window_get_line_panel (win);
  row = ui_harness_find_row (panel, "Pipe size");
  g_assert_nonnull (row);
  return RUGOSA_SIZE_PICKER (ui_harness_find_descendant (row, RUGOSA_TYPE_SIZE_PICKER));
}

static void
open_picker (RugosaSizePicker *picker)
{
  GtkWidget *button = ui_harness_find_descendant (GTK_WIDGET (picker), GTK_TYPE_MENU_BUTTON);
  GtkWidget *toggle = ui_harness_find_descendant (button, GTK_TYPE_TOGGLE_BUTTON);

  g_assert_nonnull (toggle);
  gtk_toggle_button_set_active (GTK_TOGGLE_BUTTON (toggle), TRUE);
  ui_harness_drain ();
}

static void
test_picker (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaProject *project = rugosa_window_get_project (win);
  RugosaLine *line = rugosa_project_get_line (project, 0);
  RugosaSizePicker *picker = panel_picker (win, 0);
  GtkWidget *search;
  guint n, pe = 0;
  double bore;

  g_assert_nonnull (picker);
  /* the demo's PE line: its size shown by its canonical designation */
  g_assert_cmpstr (rugosa_size_picker_get_designation (picker), ==, "DN 160 SDR 11");
  open_picker (picker);
  search = ui_harness_find_descendant (GTK_WIDGET (picker), GTK_TYPE_SEARCH_ENTRY);
  g_assert_nonnull (search);
  ui_harness_save_png (gtk_widget_get_ancestor (search, GTK_TYPE_POPOVER), "size-picker.png");

  /* Only the catalogs made of PE, every series, by size then wall. */
  n = rugosa_size_picker_get_n_rows (picker);
  for (int c = 0; c < rg_pipe_catalog_count (); c++)
    if (rg_pipe_catalog_fits (rg_pipe_catalog_at (c), "pe"))
      pe += (guint) rg_pipe_catalog_at (c)->n_pipes;
  g_assert_cmpuint (n, ==, pe + 1);
  g_assert_null (rugosa_size_picker_get_row (picker, 0));
  for (guint i = 1; i < n; i++)
    {
      const RgPipe *p = NULL;

      g_assert_cmpint (rg_pipe_lookup (rugosa_size_picker_get_row (picker, i), &p, NULL), ==, RG_OK);
      g_assert_cmpstr (p->material_id, ==, "pe");
      if (i > 1)
        {
          const RgPipe *q = NULL;

          g_assert_cmpint (rg_pipe_lookup (rugosa_size_picker_get_row (picker, i - 1), &q, NULL), ==, RG_OK);
          g_assert_cmpint (rg_pipe_compare (q, p), <, 0);
        }
    }

  /* Typed as the trade writes it, from any part: "140 SDR 11". */
  gtk_editable_set_text (GTK_EDITABLE (search), "140 SDR 11");
  ui_harness_wait (400);
  g_assert_cmpuint (rugosa_size_picker_get_n_rows (picker), ==, 2);
  g_assert_cmpstr (rugosa_size_picker_get_row (picker, 1), ==, "DN 140 SDR 11");
  /* Enter takes it */
  g_signal_emit_by_name (search, "activate");
  ui_harness_drain ();
  g_assert_cmpstr (rugosa_line_get_pipe_designation (line), ==, "DN 140 SDR 11");
  g_assert_cmpstr (rugosa_size_picker_get_designation (picker), ==, "DN 140 SDR 11");

  /* Every material's sizes on request. */
  open_picker (picker);
  rugosa_size_picker_set_show_all (picker, TRUE);
  g_assert_cmpuint (rugosa_size_picker_get_n_rows (picker), ==, (guint) rg_pipe_count () + 1);
  rugosa_size_picker_set_show_all (picker, FALSE);

  /* Custom bore keeps the bore of the size it leaves (not a default). */
  bore = rugosa_project_get_results (project, line)->inner_diameter_m;
  rugosa_size_picker_activate_row (picker, 0);
  ui_harness_drain ();
  g_assert_null (rugosa_line_get_pipe_designation (line));
  g_assert_cmpfloat (rugosa_line_get_double (line, "inner-diameter"), ==, bore);
  g_assert_cmpfloat (rugosa_project_get_results (project, line)->inner_diameter_m, ==, bore);
  g_assert_null (rugosa_size_picker_get_designation (picker));

  /* A steel line lists steel: another material, other catalogs. */
  {
    RugosaHistory *history = rugosa_window_get_history (win);

    rugosa_history_set (history, line, "material-id", "commercial-steel", NULL);
    ui_harness_drain ();
    open_picker (picker);
    for (guint i = 1; i < rugosa_size_picker_get_n_rows (picker); i++)
      {
        const RgPipe *p = NULL;

        g_assert_cmpint (rg_pipe_lookup (rugosa_size_picker_get_row (picker, i), &p, NULL), ==, RG_OK);
        g_assert_true (rg_pipe_catalog_fits (rg_pipe_catalog_at (p->catalog), "commercial-steel"));
      }
    /* a material no catalog is made of: every size, and a note */
    rugosa_history_set (history, line, "material-id", "glass", NULL);
    ui_harness_drain ();
    open_picker (picker);
    g_assert_cmpuint (rugosa_size_picker_get_n_rows (picker), ==, (guint) rg_pipe_count () + 1);
  }
  ui_harness_close_window (win);
}

/* ---- the Hazen–Williams C in the results ---- */

static void
test_hazen_williams_in_the_results (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaProject *project = rugosa_window_get_project (win);
  RugosaResultsTable *table = RUGOSA_RESULTS_TABLE (rugosa_window_get_results (win));
  RugosaLine *line = rugosa_project_get_line (project, 0);
  const RugosaOperatingPoint *p = &rugosa_project_get_results (project, line)->points[RUGOSA_FLOW_DESIGN];
  g_autofree char *cell = rugosa_results_table_cell_text (table, 0, "hw-c");
  g_autofree char *want = NULL;
  g_autofree char *full = NULL;
  double h = 0.0;

  /* the demo's lines carry water: each shows its C, the one that gives
   * back its pipe-friction loss (the model's round trip) */
  g_assert_true (p->has_hazen_williams);
  g_assert_cmpint (rg_hazen_williams_head_loss (p->hazen_williams_c, p->result.velocity_m_s,
                                                rugosa_project_get_results (project, line)->inner_diameter_m,
                                                rugosa_line_get_double (line, "length"), &h, NULL), ==, RG_OK);
  g_assert_cmpfloat_with_epsilon (h / p->result.head_loss_major_m, 1.0, 1e-12);
  want = g_strdup_printf ("%.0f", round (p->hazen_williams_c));
  g_assert_cmpstr (cell, ==, want);
  full = rugosa_readout_line_full (project, line);
  g_assert_nonnull (strstr (full, want));

  /* another fluid: no C */
  rugosa_history_set (rugosa_window_get_history (win), line, "fluid-kind", RG_FLUID_CUSTOM, NULL);
  ui_harness_drain ();
  g_free (cell);
  cell = rugosa_results_table_cell_text (table, 0, "hw-c");
  g_assert_cmpstr (cell, ==, "—");
  ui_harness_close_window (win);
}

int
main (int argc, char *argv[])
{
  int status;

  tmpdir = ui_harness_private_dirs ("rugosa-test-ui-sizing");
  g_test_init (&argc, &argv, NULL);
  if (!ui_harness_init_gtk ())
    {
      g_print ("1..0 # SKIP no display\n");
      ui_harness_remove_tree (tmpdir);
      return 0;
    }
  app = ui_harness_app_new ("org.rugosa.Rugosa.TestSizing");

  g_test_add_func ("/ui/sizing/assistant", test_assistant);
  g_test_add_func ("/ui/sizing/ladder-follows-age", test_ladder_follows_age);
  g_test_add_func ("/ui/sizing/picker", test_picker);
  g_test_add_func ("/ui/results/hazen-williams", test_hazen_williams_in_the_results);

  status = g_test_run ();
  g_object_unref (app);
  ui_harness_remove_tree (tmpdir);
  g_free (tmpdir);
  return status;
}
