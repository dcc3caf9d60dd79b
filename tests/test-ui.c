/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The desktop application, driven in-process under Xvfb: the demo project,
 * editing through the side panel, the service-age slider, refused input,
 * files, undo and redo, autosave, failed saves and refused files, and a
 * screenshot of the main window.
 *
 * Run through the 'ui' suite (xvfb-run and dbus-run-session); without a
 * display the program reports a skip. */
#define G_LOG_DOMAIN "test-ui"

#include "config.h"

#include "core/units.h"
#include "model/rugosa-units.h"

#include <adwaita.h>
#include <errno.h>
#include <glib/gstdio.h>
#include <math.h>
#include <string.h>

#include "rugosa-application.h"
#include "rugosa-canvas.h"
#include "rugosa-line-panel.h"
#include "rugosa-quantity-entry.h"
#include "rugosa-readout.h"
#include "rugosa-results-table.h"
#include "rugosa-window.h"
#include "ui-harness.h"

static RugosaApplication *app;
static char *tmpdir;

/* The first line of the project that evaluates, whose fluid is `kind`
 * (or any kind when kind < 0) and, when `aging` is set, roughens. */
static guint
find_line (RugosaWindow *win,
           int           kind,
           gboolean      aging)
{
  RugosaProject *project = rugosa_window_get_project (win);

  for (guint i = 0; i < rugosa_project_get_n_lines (project); i++)
    {
      RugosaLine *line = rugosa_project_get_line (project, i);
      const RugosaLineResults *res = rugosa_project_get_results (project, line);

      if (!res->ok || !res->points[RUGOSA_FLOW_DESIGN].ok)
        continue;
      if (kind >= 0 && rugosa_line_get_fluid_kind (line) != kind)
        continue;
      if (aging && !(res->aging_rate_m_per_year > 0.0))
        continue;
      return i;
    }
  g_test_fail_printf ("The demo project has no line of the kind this test needs.");
  return 0;
}

static RugosaLinePanel *
select_line (RugosaWindow *win,
             guint         position)
{
  gtk_single_selection_set_selected (rugosa_window_get_selection (win), position);
  ui_harness_drain ();
  return RUGOSA_LINE_PANEL (rugosa_window_get_line_panel (win));
}

static const RugosaOperatingPoint *
design_point (RugosaWindow *win,
              guint         position)
{
  RugosaProject *project = rugosa_window_get_project (win);
  const RugosaLineResults *res =
    rugosa_project_get_results (project, rugosa_project_get_line (project, position));

  g_assert_true (res->ok);
  return &res->points[RUGOSA_FLOW_DESIGN];
}

static void
test_demo_loads (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaProject *project = rugosa_window_get_project (win);
  RugosaCanvas *canvas = RUGOSA_CANVAS (rugosa_window_get_canvas (win));
  RugosaResultsTable *table = RUGOSA_RESULTS_TABLE (rugosa_window_get_results (win));
  const RugosaChartInput *input;
  guint n = rugosa_project_get_n_lines (project);
  guint ok = 0;

  g_assert_cmpuint (n, >=, 2);
  for (guint i = 0; i < n; i++)
    {
      const RugosaLineResults *res = rugosa_project_get_results (project, rugosa_project_get_line (project, i));
      if (res->ok && res->points[RUGOSA_FLOW_DESIGN].ok)
        ok++;
    }
  /* Every line that evaluates is drawn on the chart. */
  input = rugosa_canvas_get_input (canvas);
  g_assert_nonnull (input);
  g_assert_cmpuint (input->n_lines, ==, ok);
  g_assert_cmpuint (ok, >=, 1);
  for (size_t i = 0; i < input->n_lines; i++)
    {
      g_assert_true (isfinite (input->lines[i].re) && input->lines[i].re > 0);
      g_assert_true (isfinite (input->lines[i].f) && input->lines[i].f > 0);
    }
  g_assert_false (rugosa_window_get_modified (win));

  {
    guint i = find_line (win, -1, FALSE);
    g_autofree char *text = rugosa_results_table_format_cell (table, rugosa_project_get_line (project, i), "head-loss");
    g_assert_cmpstr (text, !=, "—");
    g_assert_cmpstr (text, !=, "");
  }
  ui_harness_close_window (win);
}

static void
test_temperature_changes_density (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  guint pos = find_line (win, 0 /* RG_FLUID_WATER */, FALSE);
  RugosaLinePanel *panel = select_line (win, pos);
  RugosaQuantityEntry *entry = rugosa_line_panel_get_entry (panel, "temperature");
  RugosaProject *project = rugosa_window_get_project (win);
  RugosaLine *line = rugosa_project_get_line (project, pos);
  RugosaResultsTable *table = RUGOSA_RESULTS_TABLE (rugosa_window_get_results (win));
  g_autofree char *readout_before = g_strdup (rugosa_line_panel_get_fluid_readout (panel));
  g_autofree char *head_before = rugosa_results_table_format_cell (table, line, "head-loss");
  g_autofree char *re_before = rugosa_results_table_format_cell (table, line, "reynolds");
  g_autofree char *re_after = NULL;
  double rho_before = rugosa_project_get_results (project, line)->density_kg_m3;
  double mu_before = rugosa_project_get_results (project, line)->dynamic_viscosity_pa_s;
  double t_before = rugosa_line_get_double (line, "temperature");
  const char *target = t_before < 330.0 ? "140 F" : "68 F";
  /* Source: NIST SP 811 (2008) B.9, T/K = (t/°F + 459.67)/1.8 */
  double t_expected = t_before < 330.0 ? (140.0 + 459.67) / 1.8 : (68.0 + 459.67) / 1.8;
  const RugosaLineResults *res;

  g_assert_nonnull (entry);
  g_assert_true (rugosa_quantity_entry_commit_text (entry, target));
  ui_harness_drain ();

  g_assert_cmpfloat_with_epsilon (rugosa_line_get_double (line, "temperature"), t_expected, 1e-9);
  res = rugosa_project_get_results (project, line);
  g_assert_true (res->ok);
  /* Common practice (no single source): liquid water gets lighter and
   * thinner as it warms between 0 and 100 °C. */
  if (t_expected > t_before)
    {
      g_assert_cmpfloat (res->density_kg_m3, <, rho_before);
      g_assert_cmpfloat (res->dynamic_viscosity_pa_s, <, mu_before);
    }
  else
    {
      g_assert_cmpfloat (res->density_kg_m3, >, rho_before);
      g_assert_cmpfloat (res->dynamic_viscosity_pa_s, >, mu_before);
    }
  /* The panel's readout and the table follow. */
  g_assert_cmpstr (rugosa_line_panel_get_fluid_readout (panel), !=, readout_before);
  re_after = rugosa_results_table_format_cell (table, line, "reynolds");
  g_assert_cmpstr (re_after, !=, re_before);
  (void) head_before;
  g_assert_true (rugosa_window_get_modified (win));
  ui_harness_close_window (win);
}

static void
test_slider_grows_head_loss (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  guint pos = find_line (win, -1, TRUE);
  GtkRange *scale = rugosa_window_get_age_scale (win);
  RugosaCanvas *canvas = RUGOSA_CANVAS (rugosa_window_get_canvas (win));
  double h0, h40, ratio;
  guint builds;
  const RugosaChartInput *input;

  select_line (win, pos);
  gtk_range_set_value (scale, 0.0);
  ui_harness_drain ();
  h0 = design_point (win, pos)->result.head_loss_total_m;

  gtk_test_widget_wait_for_draw (GTK_WIDGET (canvas));
  builds = rugosa_canvas_get_background_builds (canvas);

  gtk_range_set_value (scale, 40.0);
  ui_harness_drain ();
  gtk_test_widget_wait_for_draw (GTK_WIDGET (canvas));
  h40 = design_point (win, pos)->result.head_loss_total_m;
  ratio = design_point (win, pos)->head_loss_ratio_to_new;

  /* Source: Colebrook and White (1937), roughness grows with age, so at a
   * fixed flow the friction factor and the head loss do not fall. */
  g_assert_cmpfloat (h40, >, h0);
  g_assert_cmpfloat (ratio, >, 1.0);
  /* The summary beside the slider shows the change against new. */
  g_assert_nonnull (strstr (rugosa_window_get_age_summary (win), "+"));
  /* The aging trail reaches the marker; only the overlay was redrawn. */
  input = rugosa_canvas_get_input (canvas);
  for (size_t i = 0; i < input->n_lines; i++)
    if (input->line_index[i] == pos)
      g_assert_cmpuint (input->lines[i].n_trail, >=, 2);
  g_assert_cmpuint (rugosa_canvas_get_background_builds (canvas), ==, builds);
  ui_harness_close_window (win);
}

/* A number typed without a unit means the unit the field shows. */
static void
test_bare_number_display_unit (void)
{
  static const struct { const char *field; const char *text; } cases[] = {
    { "temperature", "30" }, { "flow-design", "18.5" }, { "length", "250" },
  };
  RugosaWindow *win = ui_harness_open_demo (app);
  guint pos = find_line (win, 0 /* RG_FLUID_WATER */, FALSE);
  RugosaLinePanel *panel = select_line (win, pos);
  RugosaLine *line = rugosa_project_get_line (rugosa_window_get_project (win), pos);

  for (gsize i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      RugosaQuantityEntry *entry = rugosa_line_panel_get_entry (panel, cases[i].field);
      const char *unit = rugosa_quantity_entry_get_unit (entry);
      const RugosaField *row = rugosa_quantity_entry_get_field (entry);
      double expected = 0.0;

      g_assert_nonnull (unit);
      g_assert_nonnull (row);
      /* The expected SI value through the core's own conversion of the
       * field's display unit (the conversions are tested in test-units). */
      g_assert_cmpint (rg_units_to_si (rugosa_display_info (row->display)->quantity,
                                       g_ascii_strtod (cases[i].text, NULL), unit,
                                       &expected, NULL), ==, RG_OK);
      g_assert_true (rugosa_quantity_entry_commit_text (entry, cases[i].text));
      ui_harness_drain ();
      g_assert_cmpfloat_with_epsilon (rugosa_line_get_double (line, cases[i].field),
                                      expected, 1e-12 * fabs (expected));
    }
  ui_harness_close_window (win);
}

static void
test_bad_value_keeps_last (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  guint pos = find_line (win, 0 /* RG_FLUID_WATER */, FALSE);
  RugosaLinePanel *panel = select_line (win, pos);
  RugosaProject *project = rugosa_window_get_project (win);
  RugosaLine *line = rugosa_project_get_line (project, pos);
  RugosaQuantityEntry *flow = rugosa_line_panel_get_entry (panel, "flow-design");
  RugosaQuantityEntry *temp = rugosa_line_panel_get_entry (panel, "temperature");
  RugosaCanvas *canvas = RUGOSA_CANVAS (rugosa_window_get_canvas (win));
  double q = rugosa_line_get_double (line, "flow-design");
  double t = rugosa_line_get_double (line, "temperature");
  double re = design_point (win, pos)->result.reynolds;
  GtkWidget *text_widget;
  const RugosaChartInput *input;
  gboolean drawn = FALSE;

  /* Not a number: the parser refuses it. */
  g_assert_false (rugosa_quantity_entry_commit_text (flow, "lots gpm"));
  ui_harness_drain ();
  g_assert_nonnull (rugosa_quantity_entry_get_error_text (flow));
  text_widget = GTK_WIDGET (rugosa_quantity_entry_get_editable (flow));
  g_assert_true (gtk_widget_has_css_class (text_widget, "error"));
  g_assert_cmpfloat (rugosa_line_get_double (line, "flow-design"), ==, q);

  /* A unit of another quantity. */
  g_assert_false (rugosa_quantity_entry_commit_text (flow, "3 m"));
  g_assert_nonnull (rugosa_quantity_entry_get_error_text (flow));
  g_assert_cmpfloat (rugosa_line_get_double (line, "flow-design"), ==, q);

  /* Parsed, but outside the water formulation's range: the core refuses
   * it and the last valid temperature stays.
   * Source: IAPWS-IF97 region 1 covers 273.15 K to 623.15 K; the core's
   * water.h accepts up to 150 °C. */
  g_assert_true (rugosa_quantity_entry_commit_text (temp, "400 C"));
  ui_harness_drain ();
  g_assert_nonnull (rugosa_quantity_entry_get_error_text (temp));
  g_assert_cmpfloat (rugosa_line_get_double (line, "temperature"), ==, t);

  /* The chart still draws the line at its last valid point. */
  input = rugosa_canvas_get_input (canvas);
  for (size_t i = 0; i < input->n_lines; i++)
    if (input->line_index[i] == pos)
      {
        drawn = TRUE;
        g_assert_true (isfinite (input->lines[i].re));
        g_assert_true (isfinite (input->lines[i].f));
        g_assert_cmpfloat_with_epsilon (input->lines[i].re, re, re * 1e-12);
      }
  g_assert_true (drawn);

  /* A good value clears the mark. */
  g_assert_true (rugosa_quantity_entry_commit_text (flow, "20 L/s"));
  ui_harness_drain ();
  g_assert_null (rugosa_quantity_entry_get_error_text (flow));
  g_assert_false (gtk_widget_has_css_class (text_widget, "error"));
  /* Source: SI definition, 1 L = 1e-3 m³ */
  g_assert_cmpfloat_with_epsilon (rugosa_line_get_double (line, "flow-design"), 0.020, 1e-15);
  ui_harness_close_window (win);
}

static void
test_save_reopen (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaWindow *again;
  guint pos = find_line (win, -1, FALSE);
  RugosaLinePanel *panel = select_line (win, pos);
  g_autofree char *path = g_build_filename (tmpdir, "saved.rugosa", NULL);
  g_autoptr (GFile) file = g_file_new_for_path (path);
  g_autoptr (GError) error = NULL;

  g_assert_true (rugosa_quantity_entry_commit_text (rugosa_line_panel_get_entry (panel, "length"), "1234 ft"));
  ui_harness_drain ();
  g_assert_true (rugosa_window_get_modified (win));
  g_assert_true (rugosa_window_save_file_sync (win, file, &error));
  g_assert_no_error (error);
  g_assert_false (rugosa_window_get_modified (win));

  again = rugosa_window_new (app);
  g_assert_true (rugosa_window_load_file_sync (again, file, &error));
  g_assert_no_error (error);
  g_assert_true (rugosa_project_equal (rugosa_window_get_project (win), rugosa_window_get_project (again)));
  /* Source: NIST SP 811 (2008) B.8, 1 ft = 0.3048 m exactly */
  g_assert_cmpfloat_with_epsilon (rugosa_line_get_double (rugosa_project_get_line (rugosa_window_get_project (again), pos), "length"),
                                  1234 * 0.3048, 1e-9);
  ui_harness_close_window (again);
  ui_harness_close_window (win);
}

static void
test_undo_redo (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  guint pos = find_line (win, -1, FALSE);
  RugosaLinePanel *panel = select_line (win, pos);
  RugosaProject *project = rugosa_window_get_project (win);
  RugosaLine *line = rugosa_project_get_line (project, pos);
  RugosaQuantityEntry *length = rugosa_line_panel_get_entry (panel, "length");
  double before = rugosa_line_get_double (line, "length");
  double h_before = design_point (win, pos)->result.head_loss_total_m;
  guint n = rugosa_project_get_n_lines (project);

  g_assert_true (rugosa_quantity_entry_commit_text (length, before > 500 ? "250 m" : "750 m"));
  ui_harness_drain ();
  g_assert_cmpfloat (rugosa_line_get_double (line, "length"), !=, before);
  g_assert_cmpfloat (design_point (win, pos)->result.head_loss_total_m, !=, h_before);

  gtk_widget_activate_action (GTK_WIDGET (win), "win.undo", NULL);
  ui_harness_drain ();
  g_assert_cmpfloat (rugosa_line_get_double (line, "length"), ==, before);
  /* The panel shows the restored value. */
  g_assert_cmpfloat (rugosa_quantity_entry_get_value (length), ==, before);
  g_assert_cmpfloat (design_point (win, pos)->result.head_loss_total_m, ==, h_before);

  gtk_widget_activate_action (GTK_WIDGET (win), "win.redo", NULL);
  ui_harness_drain ();
  g_assert_cmpfloat (rugosa_line_get_double (line, "length"), !=, before);

  /* Structural edits too: add a line, undo it. */
  gtk_widget_activate_action (GTK_WIDGET (win), "win.line-add", NULL);
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_project_get_n_lines (project), ==, n + 1);
  gtk_widget_activate_action (GTK_WIDGET (win), "win.undo", NULL);
  ui_harness_drain ();
  g_assert_cmpuint (rugosa_project_get_n_lines (project), ==, n);
  ui_harness_close_window (win);
}

static void
test_autosave (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  guint pos = find_line (win, -1, FALSE);
  RugosaLinePanel *panel = select_line (win, pos);
  g_autofree char *autosave = rugosa_window_autosave_path (win);
  g_autoptr (RugosaProject) copy = rugosa_project_new ();
  g_autoptr (GError) error = NULL;
  g_autofree char *saved = g_build_filename (tmpdir, "autosaved-then-saved.rugosa", NULL);
  g_autoptr (GFile) file = g_file_new_for_path (saved);

  g_assert_true (rugosa_quantity_entry_commit_text (rugosa_line_panel_get_entry (panel, "length"), "321 m"));
  ui_harness_drain ();
  g_assert_true (rugosa_window_autosave_now (win, &error));
  g_assert_no_error (error);
  g_assert_true (g_file_test (autosave, G_FILE_TEST_EXISTS));
  /* The recovery copy holds the unsaved change. */
  g_assert_true (rugosa_project_load (copy, autosave, &error));
  g_assert_true (rugosa_project_equal (copy, rugosa_window_get_project (win)));
  /* A real save makes the copy unnecessary. */
  g_assert_true (rugosa_window_save_file_sync (win, file, &error));
  g_assert_false (g_file_test (autosave, G_FILE_TEST_EXISTS));
  ui_harness_close_window (win);
}

static void
test_probe_and_keys (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaCanvas *canvas = RUGOSA_CANVAS (rugosa_window_get_canvas (win));
  GtkSingleSelection *sel = rugosa_window_get_selection (win);
  guint n = rugosa_project_get_n_lines (rugosa_window_get_project (win));
  guint pos = find_line (win, -1, FALSE);
  double x, y;

  gtk_test_widget_wait_for_draw (GTK_WIDGET (canvas));
  g_assert_true (rugosa_canvas_marker_position (canvas, pos, &x, &y));
  /* On a marker the tooltip speaks; the pointer readout stays away. */
  rugosa_canvas_pointer_at (canvas, x, y);
  g_assert_null (rugosa_canvas_get_probe_text (canvas));
  /* Somewhere off the markers and labels, inside the plot, the readout
   * names Re, f and ε/D. */
  {
    int w = gtk_widget_get_width (GTK_WIDGET (canvas));
    int h = gtk_widget_get_height (GTK_WIDGET (canvas));
    gboolean found = FALSE;

    for (int i = 1; i < 10 && !found; i++)
      for (int j = 1; j < 10 && !found; j++)
        {
          const char *text;

          rugosa_canvas_pointer_at (canvas, w * i / 10.0, h * j / 10.0);
          text = rugosa_canvas_get_probe_text (canvas);
          found = text && strstr (text, "Re") && strstr (text, "ε/D");
        }
    g_assert_true (found);
  }

  /* A click on a marker selects its line, and the panel follows. */
  gtk_single_selection_set_selected (sel, pos == 0 ? 1 % n : 0);
  ui_harness_drain ();
  g_assert_true (rugosa_canvas_select_at (canvas, x, y));
  ui_harness_drain ();
  g_assert_cmpuint (gtk_single_selection_get_selected (sel), ==, pos);
  g_assert_true (rugosa_line_panel_get_line (RUGOSA_LINE_PANEL (rugosa_window_get_line_panel (win)))
                 == rugosa_project_get_line (rugosa_window_get_project (win), pos));

  /* The marker's tooltip gives the full readout. */
  {
    g_autofree char *tip = rugosa_readout_line_full (rugosa_window_get_project (win),
                                                     rugosa_project_get_line (rugosa_window_get_project (win), pos));
    g_assert_nonnull (strstr (tip, "Reynolds number"));
    g_assert_nonnull (strstr (tip, "Friction factor"));
    g_assert_nonnull (strstr (tip, "Head loss"));
    g_assert_nonnull (strstr (tip, "Velocity"));
    g_assert_nonnull (strstr (tip, "m/s"));
  }

  gtk_single_selection_set_selected (sel, 0);
  gtk_widget_activate_action (GTK_WIDGET (canvas), "canvas.step", "i", 1);
  g_assert_cmpuint (gtk_single_selection_get_selected (sel), ==, 1 % n);
  gtk_widget_activate_action (GTK_WIDGET (canvas), "canvas.step", "i", -1);
  g_assert_cmpuint (gtk_single_selection_get_selected (sel), ==, 0);
  ui_harness_close_window (win);
}

/* The project's unit for a quantity, changed as its settings window
 * does (one undo step), reaches the panel's fields. */
static void
test_project_flow_unit (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaProject *project = rugosa_window_get_project (win);
  guint pos = find_line (win, -1, FALSE);
  RugosaLinePanel *panel = select_line (win, pos);
  RugosaQuantityEntry *flow = rugosa_line_panel_get_entry (panel, "flow-design");
  GVariantBuilder b;
  const char *text;

  g_variant_builder_init (&b, G_VARIANT_TYPE ("a{ss}"));
  g_variant_builder_add (&b, "{ss}", "flow", "gpm");
  rugosa_history_set (rugosa_window_get_history (win), rugosa_project_get_settings (project),
                      "unit-overrides", g_variant_builder_end (&b), NULL);
  ui_harness_drain ();
  text = gtk_editable_get_text (rugosa_quantity_entry_get_editable (flow));
  g_assert_true (g_str_has_suffix (text, " gpm"));
  gtk_widget_activate_action (GTK_WIDGET (win), "win.undo", NULL);
  ui_harness_drain ();
  text = gtk_editable_get_text (rugosa_quantity_entry_get_editable (flow));
  g_assert_false (g_str_has_suffix (text, " gpm"));
  ui_harness_close_window (win);
}

static void
test_recovery (void)
{
  RugosaWindow *crashed = ui_harness_open_demo (app);
  RugosaWindow *fresh;
  guint pos = find_line (crashed, -1, FALSE);
  RugosaLinePanel *panel = select_line (crashed, pos);
  g_autofree char *autosave = rugosa_window_autosave_path (crashed);
  g_autofree char *kept = g_strconcat (autosave, ".kept", NULL);
  g_autofree char *kept_origin = g_strconcat (autosave, ".origin.kept", NULL);
  g_autofree char *origin = g_strconcat (autosave, ".origin", NULL);
  g_autoptr (GError) error = NULL;
  AdwMessageDialog *dialog;

  /* A session with unsaved work, autosaved, that then "crashes": the copy
   * is set aside before the window goes away and put back after. */
  g_assert_true (rugosa_quantity_entry_commit_text (rugosa_line_panel_get_entry (panel, "length"), "777 m"));
  ui_harness_drain ();
  g_assert_true (rugosa_window_autosave_now (crashed, &error));
  g_assert_no_error (error);
  g_assert_cmpint (g_rename (autosave, kept), ==, 0);
  g_assert_cmpint (g_rename (origin, kept_origin), ==, 0);
  ui_harness_close_window (crashed);
  g_assert_cmpint (g_rename (kept, autosave), ==, 0);
  g_assert_cmpint (g_rename (kept_origin, origin), ==, 0);

  fresh = rugosa_window_new (app);
  gtk_window_present (GTK_WINDOW (fresh));
  rugosa_window_offer_recovery (fresh);
  ui_harness_drain ();
  dialog = ui_harness_find_message_dialog (GTK_WINDOW (fresh));
  g_assert_nonnull (dialog);
  adw_message_dialog_response (dialog, "recover");
  ui_harness_drain ();
  /* Source: the value typed before the crash, 777 m. */
  g_assert_cmpfloat (rugosa_line_get_double (rugosa_project_get_line (rugosa_window_get_project (fresh), pos),
                                             "length"), ==, 777.0);
  g_assert_true (rugosa_window_get_modified (fresh));
  /* The file it came from is known again. */
  g_assert_nonnull (rugosa_window_get_file (fresh));
  g_assert_false (g_file_test (autosave, G_FILE_TEST_EXISTS));
  ui_harness_close_window (fresh);
}

/* Earlier tests close windows without the close guard and so leave
 * recovery copies behind; a test that needs one copy clears them. */
static void
clear_recovery_dir (void)
{
  g_autofree char *dir = g_build_filename (g_get_user_state_dir (), "rugosa", "recovery", NULL);
  GDir *d = g_dir_open (dir, 0, NULL);
  const char *name;

  if (d == NULL)
    return;
  while ((name = g_dir_read_name (d)) != NULL)
    {
      g_autofree char *path = g_build_filename (dir, name, NULL);
      g_unlink (path);
    }
  g_dir_close (d);
}

/* Recovering rewrites the copy as the window's own autosave; when that
 * write fails, the old copy is the only one on disk and must stay. */
static void
test_recovery_keeps_copy (void)
{
  RugosaWindow *crashed = ui_harness_open_demo (app);
  RugosaWindow *fresh;
  guint pos = find_line (crashed, -1, FALSE);
  RugosaLinePanel *panel = select_line (crashed, pos);
  g_autofree char *autosave = rugosa_window_autosave_path (crashed);
  g_autofree char *origin = g_strconcat (autosave, ".origin", NULL);
  g_autofree char *kept = g_strconcat (autosave, ".kept", NULL);
  g_autofree char *kept_origin = g_strconcat (origin, ".kept", NULL);
  g_autofree char *blocker = NULL;
  g_autoptr (RugosaProject) copy = rugosa_project_new ();
  g_autoptr (GError) error = NULL;
  AdwMessageDialog *dialog;

  clear_recovery_dir ();
  g_assert_true (rugosa_quantity_entry_commit_text (rugosa_line_panel_get_entry (panel, "length"), "444 m"));
  ui_harness_drain ();
  g_assert_true (rugosa_window_autosave_now (crashed, &error));
  g_assert_no_error (error);
  g_assert_cmpint (g_rename (autosave, kept), ==, 0);
  g_assert_cmpint (g_rename (origin, kept_origin), ==, 0);
  ui_harness_close_window (crashed);
  g_assert_cmpint (g_rename (kept, autosave), ==, 0);
  g_assert_cmpint (g_rename (kept_origin, origin), ==, 0);

  fresh = rugosa_window_new (app);
  gtk_window_present (GTK_WINDOW (fresh));
  /* A folder where the new copy would go makes writing it fail. */
  blocker = rugosa_window_autosave_path (fresh);
  g_assert_cmpint (g_mkdir (blocker, 0700), ==, 0);
  rugosa_window_offer_recovery (fresh);
  ui_harness_drain ();
  dialog = ui_harness_find_message_dialog (GTK_WINDOW (fresh));
  g_assert_nonnull (dialog);
  adw_message_dialog_response (dialog, "recover");
  ui_harness_drain ();
  /* Source: the value typed before the crash, 444 m. */
  g_assert_cmpfloat (rugosa_line_get_double (rugosa_project_get_line (rugosa_window_get_project (fresh), pos),
                                             "length"), ==, 444.0);
  g_assert_true (rugosa_window_get_modified (fresh));
  g_assert_true (rugosa_project_load (copy, autosave, &error));
  g_assert_no_error (error);
  g_assert_true (rugosa_project_equal (copy, rugosa_window_get_project (fresh)));
  g_assert_true (g_file_test (origin, G_FILE_TEST_EXISTS));

  g_assert_cmpint (g_rmdir (blocker), ==, 0);
  g_unlink (autosave);
  g_unlink (origin);
  ui_harness_close_window (fresh);
}

static void
test_close_guard (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  guint pos = find_line (win, -1, FALSE);
  RugosaLinePanel *panel = select_line (win, pos);
  AdwMessageDialog *dialog;
  g_autoptr (GtkWidget) keep G_GNUC_UNUSED = g_object_ref (GTK_WIDGET (win));

  /* Unchanged: closes at once. */
  g_assert_false (rugosa_window_get_modified (win));

  g_assert_true (rugosa_quantity_entry_commit_text (rugosa_line_panel_get_entry (panel, "length"), "888 m"));
  ui_harness_drain ();
  gtk_window_close (GTK_WINDOW (win));
  ui_harness_drain ();
  /* Changed: the window stays and asks. */
  g_assert_true (gtk_widget_get_visible (GTK_WIDGET (win)));
  dialog = ui_harness_find_message_dialog (GTK_WINDOW (win));
  g_assert_nonnull (dialog);
  g_assert_true (adw_message_dialog_has_response (dialog, "save"));
  g_assert_true (adw_message_dialog_has_response (dialog, "discard"));
  g_assert_true (adw_message_dialog_has_response (dialog, "cancel"));

  adw_message_dialog_response (dialog, "cancel");
  ui_harness_drain ();
  g_assert_true (gtk_widget_get_visible (GTK_WIDGET (win)));
  g_assert_cmpfloat (rugosa_line_get_double (rugosa_project_get_line (rugosa_window_get_project (win), pos),
                                             "length"), ==, 888.0);

  gtk_window_close (GTK_WINDOW (win));
  ui_harness_drain ();
  dialog = ui_harness_find_message_dialog (GTK_WINDOW (win));
  g_assert_nonnull (dialog);
  adw_message_dialog_response (dialog, "discard");
  ui_harness_drain ();
  g_assert_false (gtk_widget_get_visible (GTK_WIDGET (win)));
}

/* ---- data safety: failed saves and refused files ---- */

static int
full_disk (RugosaSaveStep step,
           gpointer       user_data)
{
  return step == RUGOSA_SAVE_STEP_WRITE ? ENOSPC : 0;
}

/* The error dialog: one sentence, naming the reason. */
static void
assert_save_error_dialog (RugosaWindow *win)
{
  AdwMessageDialog *dialog = ui_harness_find_message_dialog (GTK_WINDOW (win));
  const char *body;

  g_assert_nonnull (dialog);
  g_assert_true (g_str_has_prefix (adw_message_dialog_get_heading (dialog), "Could not save “"));
  body = adw_message_dialog_get_body (dialog);
  g_assert_true (g_str_has_suffix (body, "because the disk is full; the previous file is unchanged."));
  g_assert_null (strstr (body, ". "));
  g_assert_null (strchr (body, '\n'));
  adw_message_dialog_response (dialog, "close");
  ui_harness_drain ();
}

/* A save that fails (here: a full disk, injected) keeps the document
 * dirty and its autosave going, leaves the file as it was, and does not
 * close a window whose close asked to save first. */
static void
test_save_fails_keeps_dirty (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  guint pos = find_line (win, -1, FALSE);
  RugosaLinePanel *panel = select_line (win, pos);
  g_autofree char *path = g_build_filename (tmpdir, "full-disk.rugosa", NULL);
  g_autofree char *backup = g_strconcat (path, "~", NULL);
  g_autoptr (GFile) file = g_file_new_for_path (path);
  g_autoptr (GError) error = NULL;
  g_autofree char *before = NULL, *now = NULL;
  g_autoptr (RugosaProject) copy = rugosa_project_new ();
  g_autofree char *autosave = rugosa_window_autosave_path (win);
  AdwMessageDialog *dialog;

  g_assert_true (rugosa_window_save_file_sync (win, file, &error));
  g_assert_no_error (error);
  g_assert_true (g_file_get_contents (path, &before, NULL, NULL));
  g_assert_true (rugosa_quantity_entry_commit_text (rugosa_line_panel_get_entry (panel, "length"), "555 m"));
  ui_harness_drain ();

  rugosa_project_set_save_fault_hook (full_disk, NULL);
  gtk_widget_activate_action (GTK_WIDGET (win), "win.save", NULL);
  ui_harness_drain ();
  assert_save_error_dialog (win);
  g_assert_true (rugosa_window_get_modified (win));
  g_assert_true (g_str_has_prefix (gtk_window_get_title (GTK_WINDOW (win)), "• "));
  g_assert_true (g_file_get_contents (path, &now, NULL, NULL));
  g_assert_cmpstr (now, ==, before);
  /* The unsaved change still reaches the recovery copy (on another disk
   * than the project's: the hook fails every file written, the recovery
   * copy too, so it is lifted for this write). */
  rugosa_project_set_save_fault_hook (NULL, NULL);
  g_assert_true (rugosa_window_autosave_now (win, &error));
  rugosa_project_set_save_fault_hook (full_disk, NULL);
  g_assert_no_error (error);
  g_assert_true (rugosa_project_load (copy, autosave, &error));
  g_assert_true (rugosa_project_equal (copy, rugosa_window_get_project (win)));

  /* Close, answer "Save": the save fails, so the window must stay. */
  gtk_window_close (GTK_WINDOW (win));
  ui_harness_drain ();
  dialog = ui_harness_find_message_dialog (GTK_WINDOW (win));
  g_assert_nonnull (dialog);
  adw_message_dialog_response (dialog, "save");
  ui_harness_drain ();
  assert_save_error_dialog (win);
  g_assert_true (gtk_widget_get_visible (GTK_WIDGET (win)));
  g_assert_true (rugosa_window_get_modified (win));
  rugosa_project_set_save_fault_hook (NULL, NULL);

  /* With room on the disk again the same save works and keeps a backup. */
  gtk_widget_activate_action (GTK_WIDGET (win), "win.save", NULL);
  ui_harness_drain ();
  g_assert_false (rugosa_window_get_modified (win));
  g_assert_false (g_file_test (autosave, G_FILE_TEST_EXISTS));
  g_free (now);
  g_assert_true (g_file_get_contents (backup, &now, NULL, NULL));
  g_assert_cmpstr (now, ==, before);
  ui_harness_close_window (win);
}

/* A file written by a newer Rugosa is refused, and nothing is ever
 * written over it: the window keeps its document, file and unsaved
 * state; its saves and autosaves go where they went before. */
static void
test_newer_version_refused (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaWindow *pristine;
  guint pos = find_line (win, -1, FALSE);
  RugosaLinePanel *panel = select_line (win, pos);
  g_autofree char *current = g_build_filename (tmpdir, "current.rugosa", NULL);
  g_autofree char *future = g_build_filename (tmpdir, "future.rugosa", NULL);
  g_autoptr (GFile) current_file = g_file_new_for_path (current);
  g_autoptr (GFile) future_file = g_file_new_for_path (future);
  g_autofree char *text = g_strdup_printf ("{\"format\": \"%s\", \"version\": %d, \"lines\": []}\n",
                                           RUGOSA_PROJECT_FORMAT_NAME,
                                           RUGOSA_PROJECT_FORMAT_VERSION + 1);
  g_autofree char *doc_before = NULL, *doc_after = NULL, *now = NULL, *origin = NULL;
  g_autofree char *autosave = rugosa_window_autosave_path (win);
  g_autofree char *autosave_origin = g_strconcat (autosave, ".origin", NULL);
  g_autoptr (GError) error = NULL;
  GList *windows_before, *l;
  AdwMessageDialog *dialog;

  g_assert_true (rugosa_window_save_file_sync (win, current_file, &error));
  g_assert_no_error (error);
  g_assert_true (rugosa_quantity_entry_commit_text (rugosa_line_panel_get_entry (panel, "length"), "666 m"));
  ui_harness_drain ();
  g_assert_true (g_file_set_contents (future, text, -1, NULL));
  doc_before = rugosa_project_to_data (rugosa_window_get_project (win), NULL);

  rugosa_window_load_file (win, future_file);
  ui_harness_drain ();
  dialog = ui_harness_find_message_dialog (GTK_WINDOW (win));
  g_assert_nonnull (dialog);
  g_assert_nonnull (strstr (adw_message_dialog_get_body (dialog), "future.rugosa"));
  adw_message_dialog_response (dialog, "close");
  ui_harness_drain ();
  doc_after = rugosa_project_to_data (rugosa_window_get_project (win), NULL);
  g_assert_cmpstr (doc_after, ==, doc_before);
  g_assert_true (g_file_equal (rugosa_window_get_file (win), current_file));
  g_assert_true (rugosa_window_get_modified (win));

  /* Autosave names the window's own file as the origin, and Save writes
   * that file; the newer file keeps its bytes. */
  g_assert_true (rugosa_window_autosave_now (win, &error));
  g_assert_no_error (error);
  g_assert_true (g_file_get_contents (autosave_origin, &origin, NULL, NULL));
  g_assert_cmpstr (origin, ==, current);
  gtk_widget_activate_action (GTK_WIDGET (win), "win.save", NULL);
  ui_harness_drain ();
  g_assert_false (rugosa_window_get_modified (win));
  g_assert_true (g_file_get_contents (future, &now, NULL, NULL));
  g_assert_cmpstr (now, ==, text);

  /* An empty window that is refused the file stays empty and unnamed. */
  pristine = rugosa_window_new (app);
  gtk_window_present (GTK_WINDOW (pristine));
  g_assert_false (rugosa_window_load_file_sync (pristine, future_file, &error));
  g_assert_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_VERSION);
  g_clear_error (&error);
  g_assert_true (rugosa_window_is_pristine (pristine));
  g_assert_null (rugosa_window_get_file (pristine));
  ui_harness_close_window (pristine);

  /* `rugosa future.rugosa`: no window takes the file as its own. */
  windows_before = g_list_copy (gtk_application_get_windows (GTK_APPLICATION (app)));
  g_application_open (G_APPLICATION (app), &future_file, 1, "");
  ui_harness_drain ();
  for (l = gtk_application_get_windows (GTK_APPLICATION (app)); l; l = l->next)
    if (RUGOSA_IS_WINDOW (l->data) && rugosa_window_get_file (l->data))
      g_assert_false (g_file_equal (rugosa_window_get_file (l->data), future_file));
  for (l = g_list_copy (gtk_application_get_windows (GTK_APPLICATION (app))); l; l = g_list_delete_link (l, l))
    if (RUGOSA_IS_WINDOW (l->data) && !g_list_find (windows_before, l->data))
      ui_harness_close_window (l->data);
  g_list_free (windows_before);
  g_free (now);
  g_assert_true (g_file_get_contents (future, &now, NULL, NULL));
  g_assert_cmpstr (now, ==, text);
  ui_harness_close_window (win);
}

static void
test_open_from_command_line (void)
{
  g_autofree char *path = ui_harness_demo_path ();
  g_autoptr (GFile) file = g_file_new_for_path (path);
  GList *before = g_list_copy (gtk_application_get_windows (GTK_APPLICATION (app)));
  GList *after;
  RugosaWindow *opened = NULL;

  /* What `rugosa FILE` does through G_APPLICATION_HANDLES_OPEN. */
  g_application_open (G_APPLICATION (app), &file, 1, "");
  ui_harness_drain ();
  after = gtk_application_get_windows (GTK_APPLICATION (app));
  for (GList *l = after; l; l = l->next)
    if (!g_list_find (before, l->data) || (RUGOSA_IS_WINDOW (l->data) && rugosa_window_get_file (l->data)))
      opened = l->data;
  g_list_free (before);
  g_assert_nonnull (opened);
  g_assert_true (g_file_equal (rugosa_window_get_file (opened), file));
  g_assert_cmpuint (rugosa_project_get_n_lines (rugosa_window_get_project (opened)), >=, 1);
  ui_harness_close_window (opened);
}

static void
test_drop_file (void)
{
  RugosaWindow *win = rugosa_window_new (app);
  g_autofree char *path = ui_harness_demo_path ();
  g_autoptr (GFile) file = g_file_new_for_path (path);
  g_autoptr (GListModel) controllers = NULL;
  GtkDropTarget *target = NULL;
  GValue value = G_VALUE_INIT;
  GSList *files = g_slist_prepend (NULL, file);
  gboolean accepted = FALSE;

  gtk_window_present (GTK_WINDOW (win));
  ui_harness_drain ();
  g_assert_true (rugosa_window_is_pristine (win));
  controllers = gtk_widget_observe_controllers (GTK_WIDGET (win));
  for (guint i = 0; i < g_list_model_get_n_items (controllers) && target == NULL; i++)
    {
      g_autoptr (GObject) c = g_list_model_get_item (controllers, i);
      if (GTK_IS_DROP_TARGET (c))
        target = GTK_DROP_TARGET (c);
    }
  g_assert_nonnull (target);
  g_assert_true (g_type_is_a (gtk_drop_target_get_gtypes (target, NULL)[0], GDK_TYPE_FILE_LIST));

  /* What the drop target hands over when a project file is dropped. */
  g_value_init (&value, GDK_TYPE_FILE_LIST);
  g_value_set_boxed (&value, files);
  g_signal_emit_by_name (target, "drop", &value, 100.0, 100.0, &accepted);
  g_value_unset (&value);
  g_slist_free (files);
  ui_harness_drain ();
  g_assert_true (accepted);
  g_assert_nonnull (rugosa_window_get_file (win));
  g_assert_true (g_file_equal (rugosa_window_get_file (win), file));
  g_assert_cmpuint (rugosa_project_get_n_lines (rugosa_window_get_project (win)), >=, 2);
  ui_harness_close_window (win);
}

static gboolean
file_starts_with (const char *path,
                  const char *magic,
                  gsize       n)
{
  g_autofree char *data = NULL;
  gsize length = 0;

  if (!g_file_get_contents (path, &data, &length, NULL))
    return FALSE;
  return length > n && memcmp (data, magic, n) == 0;
}

static void
test_outputs (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  g_autofree char *png = g_build_filename (tmpdir, "chart.png", NULL);
  g_autofree char *svg = g_build_filename (tmpdir, "chart.svg", NULL);
  g_autofree char *pdf = g_build_filename (tmpdir, "chart.pdf", NULL);
  g_autofree char *printed = g_build_filename (tmpdir, "printed.pdf", NULL);
  g_autofree char *report = g_build_filename (tmpdir, "report.pdf", NULL);
  g_autofree char *csv = g_build_filename (tmpdir, "results.csv", NULL);
  g_autofree char *csv_text = NULL;
  g_autoptr (GError) error = NULL;
  g_autoptr (GdkTexture) texture = NULL;
  g_autoptr (GFile) png_file = g_file_new_for_path (png);
  guint n = rugosa_project_get_n_lines (rugosa_window_get_project (win));
  guint rows = 0;

  g_assert_true (rugosa_window_export_chart_to (win, png, RUGOSA_CHART_FORMAT_PNG, 1280, 800, &error));
  g_assert_no_error (error);
  /* The chosen size is the size written. */
  texture = gdk_texture_new_from_file (png_file, &error);
  g_assert_no_error (error);
  g_assert_cmpint (gdk_texture_get_width (texture), ==, 1280);
  g_assert_cmpint (gdk_texture_get_height (texture), ==, 800);

  g_assert_true (rugosa_window_export_chart_to (win, svg, RUGOSA_CHART_FORMAT_SVG, 960, 600, &error));
  g_assert_true (file_starts_with (svg, "<?xml", 5));
  g_assert_true (rugosa_window_export_chart_to (win, pdf, RUGOSA_CHART_FORMAT_PDF, 842, 595, &error));
  g_assert_true (file_starts_with (pdf, "%PDF", 4));

  /* Printing goes through GtkPrintOperation; its export path writes a PDF. */
  g_assert_true (rugosa_window_print_to_pdf (win, printed, &error));
  g_assert_no_error (error);
  g_assert_true (file_starts_with (printed, "%PDF", 4));
  /* The report (win.export-report) writes the same pages as a PDF. */
  g_assert_true (rugosa_window_export_report_to (win, report, &error));
  g_assert_no_error (error);
  g_assert_true (file_starts_with (report, "%PDF", 4));

  /* The results table: one header line and one row a line option. */
  g_assert_true (rugosa_window_export_csv_to (win, csv, &error));
  g_assert_true (g_file_get_contents (csv, &csv_text, NULL, NULL));
  for (const char *c = csv_text; *c; c++)
    rows += *c == '\n';
  g_assert_cmpuint (rows, >=, n + 1);
  ui_harness_close_window (win);
}

static void
test_screenshot (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  int w, h;

  find_line (win, -1, TRUE);
  select_line (win, find_line (win, -1, TRUE));
  gtk_range_set_value (rugosa_window_get_age_scale (win), 25.0);
  /* Wherever the virtual pointer sits, the picture shows no pointer readout. */
  rugosa_canvas_pointer_at (RUGOSA_CANVAS (rugosa_window_get_canvas (win)), -100, -100);
  gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
  ui_harness_drain ();
  /* Without a compositor the window keeps a thin border outside the
   * widget: grow the window until the widget itself is 1400 × 900. */
  for (int tries = 0; tries < 5; tries++)
    {
      w = gtk_widget_get_width (GTK_WIDGET (win));
      h = gtk_widget_get_height (GTK_WIDGET (win));
      if (w == 1400 && h == 900)
        break;
      gtk_window_set_default_size (GTK_WINDOW (win), 1400 + (1400 - w) + (tries ? 0 : 0),
                                   900 + (900 - h));
      gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
      ui_harness_drain ();
    }
  w = gtk_widget_get_width (GTK_WIDGET (win));
  h = gtk_widget_get_height (GTK_WIDGET (win));
  g_assert_cmpint (w, ==, 1400);
  g_assert_cmpint (h, ==, 900);
  /* The resizes may have sent the virtual pointer's motion again. */
  rugosa_canvas_pointer_at (RUGOSA_CANVAS (rugosa_window_get_canvas (win)), -100, -100);
  gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
  ui_harness_drain ();

  ui_harness_save_png (GTK_WIDGET (win), "rugosa-window.png");
  ui_harness_close_window (win);
}

/* The About window shows the version of meson.build (RUGOSA_PROJECT_VERSION,
 * set by tests/meson.build from meson.project_version()), which reaches the
 * program through config.h. */
static void
test_about_version (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  const char *expected = g_getenv ("RUGOSA_PROJECT_VERSION");
  GtkWindow *about;
  g_autofree char *version = NULL;

  g_assert_nonnull (expected);
  gtk_window_present (GTK_WINDOW (win));
  ui_harness_drain ();
  g_action_group_activate_action (G_ACTION_GROUP (app), "about", NULL);
  ui_harness_drain ();
  about = ui_harness_find_dialog (GTK_WINDOW (win), ADW_TYPE_ABOUT_WINDOW);
  g_assert_nonnull (about);
  g_object_get (about, "version", &version, NULL);
  g_assert_cmpstr (version, ==, expected);
  gtk_window_destroy (about);
  ui_harness_close_window (win);
}

int
main (int argc, char *argv[])
{
  int status;

  tmpdir = ui_harness_private_dirs ("rugosa-test-ui");
  g_test_init (&argc, &argv, NULL);
  if (!ui_harness_init_gtk ())
    {
      g_print ("1..0 # SKIP no display\n");
      ui_harness_remove_tree (tmpdir);
      return 0;
    }
  app = ui_harness_app_new ("org.rugosa.Rugosa.Test");

  g_test_add_func ("/ui/demo/loads", test_demo_loads);
  g_test_add_func ("/ui/panel/temperature-changes-density", test_temperature_changes_density);
  g_test_add_func ("/ui/slider/head-loss-grows", test_slider_grows_head_loss);
  g_test_add_func ("/ui/entry/bad-value-keeps-last", test_bad_value_keeps_last);
  g_test_add_func ("/ui/entry/bare-number-display-unit", test_bare_number_display_unit);
  g_test_add_func ("/ui/files/save-reopen", test_save_reopen);
  g_test_add_func ("/ui/history/undo-redo", test_undo_redo);
  g_test_add_func ("/ui/files/autosave", test_autosave);
  g_test_add_func ("/ui/canvas/probe-and-keys", test_probe_and_keys);
  g_test_add_func ("/ui/project-settings/flow-unit", test_project_flow_unit);
  g_test_add_func ("/ui/files/export-print-csv", test_outputs);
  g_test_add_func ("/ui/files/recovery", test_recovery);
  g_test_add_func ("/ui/files/recovery-keeps-copy", test_recovery_keeps_copy);
  g_test_add_func ("/ui/files/close-guard", test_close_guard);
  g_test_add_func ("/ui/files/save-fails-keeps-dirty", test_save_fails_keeps_dirty);
  g_test_add_func ("/ui/files/newer-version-refused", test_newer_version_refused);
  g_test_add_func ("/ui/files/open-command-line", test_open_from_command_line);
  g_test_add_func ("/ui/files/drop", test_drop_file);
  g_test_add_func ("/ui/screenshot", test_screenshot);
  g_test_add_func ("/ui/about/version", test_about_version);

  status = g_test_run ();
  g_object_unref (app);
  ui_harness_remove_tree (tmpdir);
  g_free (tmpdir);
  return status;
}
