/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The desktop application in German, driven in-process under Xvfb: the
 * visible labels come from po/de.po, numbers on screen carry a decimal
 * comma, the quantity entries accept "2,5 m" and "2.5 m", the catalog names
 * (po/catalog-names.c) show in German, and the project file stays
 * locale-independent.  Saves a screenshot (rugosa-window-de.png in
 * the build folder) for a look at the German layout.
 *
 * Environment (tests/meson.build): LANGUAGE=de, LANG=de_DE.UTF-8, LOCPATH at
 * the de_DE.UTF-8 locale built into the build folder, RUGOSA_LOCALEDIR at
 * the build folder's po/ (po/de/LC_MESSAGES/rugosa.mo).  Without that locale
 * or without a display the program reports a TAP skip. */
#define G_LOG_DOMAIN "test-l10n-ui"

#include "config.h"

#include <adwaita.h>
#include <glib/gi18n.h>
#include <glib/gstdio.h>
#include <locale.h>
#include <string.h>

#include "core/aging.h"
#include "core/catalog.h"
#include "core/fittings.h"
#include "model/rugosa-display.h"
#include "rugosa-application.h"
#include "rugosa-canvas.h"
#include "rugosa-line-panel.h"
#include "rugosa-preferences-window.h"
#include "rugosa-quantity-entry.h"
#include "rugosa-results-table.h"
#include "rugosa-window.h"
#include "ui-harness.h"

static RugosaApplication *app;
static char *tmpdir;

/* Every GtkLabel under `w`. */
static void
collect_labels (GtkWidget *w, GPtrArray *out)
{
  if (GTK_IS_LABEL (w))
    g_ptr_array_add (out, w);
  for (GtkWidget *c = gtk_widget_get_first_child (w); c != NULL;
       c = gtk_widget_get_next_sibling (c))
    collect_labels (c, out);
}

/* The first line that evaluates. */
static guint
first_ok_line (RugosaWindow *win)
{
  RugosaProject *project = rugosa_window_get_project (win);

  for (guint i = 0; i < rugosa_project_get_n_lines (project); i++)
    {
      const RugosaLineResults *res =
        rugosa_project_get_results (project, rugosa_project_get_line (project, i));
      if (res->ok && res->points[RUGOSA_FLOW_DESIGN].ok)
        return i;
    }
  g_test_fail_printf ("The demo project has no line that evaluates.");
  return 0;
}

static void
test_labels_german (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  g_autoptr (GPtrArray) labels = g_ptr_array_new ();
  gboolean found = FALSE;

  /* The catalog is in use: a message of the window's template reads German. */
  g_assert_cmpstr (_("Service age"), ==, "Betriebsalter");

  gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
  collect_labels (GTK_WIDGET (win), labels);
  g_assert_cmpuint (labels->len, >, 10);
  for (guint i = 0; i < labels->len; i++)
    {
      GtkLabel *label = g_ptr_array_index (labels, i);
      const char *text = gtk_label_get_label (label);

      if (text == NULL || *text == '\0')
        continue;
      if (g_strcmp0 (text, "Betriebsalter") == 0)
        found = TRUE;
      /* A label that still shows an English message of the catalog (one
       * whose German text differs) was not translated on its way. */
      if (strcmp (_(text), text) != 0)
        g_test_fail_printf ("A visible label is still English: \"%s\" (German: \"%s\")",
                            text, _(text));
    }
  g_assert_true (found);
  ui_harness_close_window (win);
}

/* Every GtkDropDown under `w`. */
static void
collect_dropdowns (GtkWidget *w, GPtrArray *out)
{
  if (GTK_IS_DROP_DOWN (w))
    g_ptr_array_add (out, w);
  for (GtkWidget *c = gtk_widget_get_first_child (w); c != NULL;
       c = gtk_widget_get_next_sibling (c))
    collect_dropdowns (c, out);
}

/* Checks the drop-down whose first item is `first` (already translated):
 * item i + 1 must be the German name `name_at (i)`, never the English one.
 * Returns whether that drop-down was found. */
static gboolean
dropdown_is_german (GPtrArray *dropdowns, const char *first, int count,
                    const char *(*name_at) (int))
{
  for (guint d = 0; d < dropdowns->len; d++)
    {
      GListModel *model = gtk_drop_down_get_model (g_ptr_array_index (dropdowns, d));

      if (model == NULL || g_list_model_get_n_items (model) != (guint) count + 1
          || g_strcmp0 (gtk_string_list_get_string (GTK_STRING_LIST (model), 0), first) != 0)
        continue;
      for (int i = 0; i < count; i++)
        {
          const char *english = name_at (i);
          const char *shown = gtk_string_list_get_string (GTK_STRING_LIST (model), (guint) i + 1);

          if (g_strcmp0 (shown, _(english)) != 0 || g_strcmp0 (shown, english) == 0)
            g_test_fail_printf ("Drop-down item \"%s\" is not the German name of \"%s\"",
                                shown, english);
        }
      return TRUE;
    }
  return FALSE;
}

static const char *material_name_at (int i) { return rg_material_at (i)->name; }
static const char *aging_name_at (int i) { return rg_aging_class_at (i)->name; }
static const char *fitting_name_at (int i) { return rg_fitting_at (i)->name; }

static void
test_catalog_names_german (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaProject *project = rugosa_window_get_project (win);
  guint pos = first_ok_line (win);
  RugosaLine *line = rugosa_project_get_line (project, pos);
  GtkWidget *panel;
  const RgMaterial *material = NULL;
  g_autoptr (GPtrArray) labels = g_ptr_array_new ();
  g_autoptr (GPtrArray) dropdowns = g_ptr_array_new ();
  GVariant *fittings;
  GVariantIter iter;
  const char *id;
  double k, count;
  gboolean material_shown = FALSE;
  guint catalog_fittings = 0, fittings_shown = 0;

  gtk_single_selection_set_selected (rugosa_window_get_selection (win), pos);
  gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
  ui_harness_drain ();
  panel = rugosa_window_get_line_panel (win);

  /* The names are translated, not the ids or the core's own text. */
  g_assert_cmpstr (rg_material_at (0)->name, ==, "Copper or brass, drawn tubing");
  g_assert_cmpstr (_(rg_material_at (0)->name), ==, "Kupfer oder Messing, gezogenes Rohr");

  /* Every item of the three catalog drop-downs. */
  collect_dropdowns (panel, dropdowns);
  g_assert_true (dropdown_is_german (dropdowns, _("Custom roughness"), rg_material_count (),
                                     material_name_at));
  g_assert_true (dropdown_is_german (dropdowns, _("Custom rate"), rg_aging_class_count (),
                                     aging_name_at));
  g_assert_true (dropdown_is_german (dropdowns, _("Other loss, K given"), rg_fitting_count (),
                                     fitting_name_at));

  /* The selected material and the line's catalog fittings, as shown. */
  g_assert_nonnull (rugosa_line_get_material_id (line));
  g_assert_cmpint (rg_material_lookup (rugosa_line_get_material_id (line), &material, NULL),
                   ==, RG_OK);
  collect_labels (panel, labels);
  fittings = rugosa_line_get_fittings (line);
  g_assert_nonnull (fittings);
  g_variant_iter_init (&iter, fittings);
  while (g_variant_iter_next (&iter, "(&sdd)", &id, &k, &count))
    {
      const RgFitting *fitting = NULL;

      if (*id == '\0')
        continue;
      g_assert_cmpint (rg_fitting_lookup (id, &fitting, NULL), ==, RG_OK);
      catalog_fittings++;
      for (guint i = 0; i < labels->len; i++)
        if (g_strcmp0 (gtk_label_get_label (g_ptr_array_index (labels, i)),
                       _(fitting->name)) == 0)
          {
            fittings_shown++;
            break;
          }
    }
  for (guint i = 0; i < labels->len; i++)
    {
      const char *text = gtk_label_get_label (g_ptr_array_index (labels, i));

      if (g_strcmp0 (text, _(material->name)) == 0)
        material_shown = TRUE;
      if (g_strcmp0 (text, material->name) == 0)
        g_test_fail_printf ("The material is shown in English: \"%s\"", text);
    }
  g_assert_true (material_shown);
  g_assert_cmpuint (catalog_fittings, >, 0);
  g_assert_cmpuint (fittings_shown, ==, catalog_fittings);
  ui_harness_close_window (win);
}

static void
test_results_decimal_comma (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaResultsTable *table = RUGOSA_RESULTS_TABLE (rugosa_window_get_results (win));
  RugosaProject *project = rugosa_window_get_project (win);
  guint pos = first_ok_line (win);
  RugosaLine *line = rugosa_project_get_line (project, pos);
  g_autofree char *cell = NULL;
  g_autofree char *f_cell = NULL;
  g_autofree char *ascii = NULL;
  g_autofree char *expect = NULL;

  gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
  ui_harness_drain ();
  cell = rugosa_results_table_format_cell (table, line, "f");
  /* The Darcy friction factor lies between 0.006 and 0.1 on the chart, so it
   * always has a fractional part: 4 significant figures, "0,01910". */
  ascii = rugosa_display_significant (rugosa_project_get_results (project, line)
                                        ->points[RUGOSA_FLOW_DESIGN].result.friction.f, 4);
  g_assert_nonnull (strchr (ascii, '.'));
  expect = g_strdelimit (g_strdup (ascii), ".", ',');
  g_assert_cmpstr (cell, ==, expect);
  g_assert_null (strchr (cell, '.'));

  /* The cell as it is on screen, when its row is shown. */
  f_cell = rugosa_results_table_cell_text (table, pos, "f");
  if (f_cell != NULL)
    g_assert_cmpstr (f_cell, ==, expect);
  ui_harness_close_window (win);
}

static void
test_entry_accepts_both (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);
  RugosaLinePanel *panel;
  RugosaQuantityEntry *length;
  const char *error_text;
  g_autofree char *saved = NULL;
  g_autofree char *contents = NULL;
  g_autoptr (GFile) file = NULL;
  g_autoptr (GError) error = NULL;

  gtk_single_selection_set_selected (rugosa_window_get_selection (win), first_ok_line (win));
  ui_harness_drain ();
  panel = RUGOSA_LINE_PANEL (rugosa_window_get_line_panel (win));
  length = rugosa_line_panel_get_entry (panel, "length");
  g_assert_nonnull (length);

  g_assert_true (rugosa_quantity_entry_commit_text (length, "2,5 m"));
  /* 2.5 is exact in binary: "2,5 m" must read as exactly 2.5 m. */
  g_assert_cmpfloat (rugosa_quantity_entry_get_value (length), ==, 2.5);
  {
    /* Shown back in the German form (the entry is the widget's child). */
    GtkWidget *child = gtk_widget_get_first_child (GTK_WIDGET (length));
    g_assert_true (GTK_IS_EDITABLE (child));
    g_assert_cmpstr (gtk_editable_get_text (GTK_EDITABLE (child)), ==, "2,5 m");
  }
  g_assert_true (rugosa_quantity_entry_commit_text (length, "0,75 km"));
  g_assert_cmpfloat_with_epsilon (rugosa_quantity_entry_get_value (length), 750.0, 1e-9);
  g_assert_true (rugosa_quantity_entry_commit_text (length, "1234.5 m"));
  g_assert_cmpfloat (rugosa_quantity_entry_get_value (length), ==, 1234.5);
  /* 1234.25 is exact in binary too; shown back with the comma. */
  g_assert_true (rugosa_quantity_entry_commit_text (length, "1234,25 m"));
  g_assert_cmpfloat (rugosa_quantity_entry_get_value (length), ==, 1234.25);

  /* A refusal from the core arrives in German. */
  g_assert_false (rugosa_quantity_entry_commit_text (length, "viel"));
  error_text = rugosa_quantity_entry_get_error_text (length);
  g_assert_nonnull (error_text);
  g_test_message ("refusal: %s", error_text);
  g_assert_nonnull (strstr (error_text, "keine Zahl"));
  g_assert_cmpfloat (rugosa_quantity_entry_get_value (length), ==, 1234.25);

  /* The project file keeps the C locale: 1234.25 m is written with a
   * point and reads back as the same value. */
  saved = g_build_filename (tmpdir, "de.rugosa", NULL);
  file = g_file_new_for_path (saved);
  g_assert_true (rugosa_window_save_file_sync (win, file, &error));
  g_assert_no_error (error);
  g_assert_true (g_file_get_contents (saved, &contents, NULL, NULL));
  g_assert_true (g_regex_match_simple ("\"length_m\":\\s*1234\\.25[,\\s]", contents, 0, 0));
  g_assert_null (strstr (contents, "1234,25"));
  {
    RugosaWindow *again = rugosa_window_new (app);
    RugosaProject *p2;
    RugosaProject *p1 = rugosa_window_get_project (win);
    guint pos = first_ok_line (win);

    g_assert_true (rugosa_window_load_file_sync (again, file, &error));
    g_assert_no_error (error);
    p2 = rugosa_window_get_project (again);
    g_assert_cmpfloat (rugosa_line_get_double (rugosa_project_get_line (p2, pos), "length"),
                       ==, rugosa_line_get_double (rugosa_project_get_line (p1, pos), "length"));
    ui_harness_close_window (again);
  }
  ui_harness_close_window (win);
}

static void
test_preferences_german (void)
{
  RugosaPreferencesWindow *prefs =
    rugosa_preferences_window_new (rugosa_application_get_settings (app));
  g_autoptr (GPtrArray) labels = g_ptr_array_new ();
  gboolean found = FALSE;

  gtk_window_set_default_size (GTK_WINDOW (prefs), 640, 820);
  gtk_window_present (GTK_WINDOW (prefs));
  gtk_test_widget_wait_for_draw (GTK_WIDGET (prefs));
  ui_harness_drain ();
  collect_labels (GTK_WIDGET (prefs), labels);
  for (guint i = 0; i < labels->len; i++)
    {
      const char *text = gtk_label_get_label (g_ptr_array_index (labels, i));

      if (text == NULL || *text == '\0')
        continue;
      if (g_strcmp0 (text, _("Design limits")) == 0)
        found = TRUE;
      if (strcmp (_(text), text) != 0)
        g_test_fail_printf ("A visible label is still English: \"%s\"", text);
    }
  g_assert_cmpstr (_("Design limits"), ==, "Auslegungsgrenzen");
  g_assert_true (found);
  ui_harness_save_png (GTK_WIDGET (prefs), "rugosa-preferences-de.png");
  gtk_window_destroy (GTK_WINDOW (prefs));
  ui_harness_drain ();
}

static void
test_screenshot (void)
{
  RugosaWindow *win = ui_harness_open_demo (app);

  gtk_single_selection_set_selected (rugosa_window_get_selection (win), first_ok_line (win));
  gtk_range_set_value (rugosa_window_get_age_scale (win), 25.0);
  rugosa_canvas_pointer_at (RUGOSA_CANVAS (rugosa_window_get_canvas (win)), -100, -100);
  ui_harness_save_png (GTK_WIDGET (win), "rugosa-window-de.png");
  ui_harness_close_window (win);
}

int
main (int argc, char *argv[])
{
  const char *localedir = g_getenv ("RUGOSA_LOCALEDIR");
  int status;

  g_test_init (&argc, &argv, NULL);
  /* The program's own set-up (src/app/main.c), with the test's catalog. */
  if (setlocale (LC_ALL, "") == NULL
      || strcmp (localeconv ()->decimal_point, ",") != 0)
    {
      g_print ("1..0 # SKIP the de_DE.UTF-8 locale is not available\n");
      return 0;
    }
  if (localedir == NULL)
    {
      g_print ("1..0 # SKIP RUGOSA_LOCALEDIR is not set\n");
      return 0;
    }
  bindtextdomain (GETTEXT_PACKAGE, localedir);
  bind_textdomain_codeset (GETTEXT_PACKAGE, "UTF-8");
  textdomain (GETTEXT_PACKAGE);

  tmpdir = ui_harness_private_dirs ("rugosa-test-l10n-ui");
  if (!ui_harness_init_gtk ())
    {
      g_print ("1..0 # SKIP no display\n");
      ui_harness_remove_tree (tmpdir);
      return 0;
    }
  app = ui_harness_app_new ("org.rugosa.Rugosa.TestL10n");

  g_test_add_func ("/l10n/ui/labels-german", test_labels_german);
  g_test_add_func ("/l10n/ui/catalog-names-german", test_catalog_names_german);
  g_test_add_func ("/l10n/ui/results-decimal-comma", test_results_decimal_comma);
  g_test_add_func ("/l10n/ui/entry-accepts-both", test_entry_accepts_both);
  g_test_add_func ("/l10n/ui/preferences-german", test_preferences_german);
  g_test_add_func ("/l10n/ui/screenshot", test_screenshot);

  status = g_test_run ();
  g_clear_object (&app);
  ui_harness_remove_tree (tmpdir);
  g_free (tmpdir);
  return status;
}
