/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-window"

#include "config.h"

#include <glib/gi18n.h>
#include <string.h>

#include "chart/rugosa-chart-input.h"
#include "chart/rugosa-plot-input.h"
#include "chart/rugosa-report.h"
#include "rugosa-window-private.h"

/* Sizes offered for an exported chart, logical pixels (PNG pixels; SVG and
 * PDF points). */
static const struct { const char *id; const char *label; double w, h; } export_sizes[] = {
  { "960x600", N_("960 × 600 (slides)"), 960, 600 },
  { "1280x800", N_("1280 × 800"), 1280, 800 },
  { "1920x1200", N_("1920 × 1200 (large screen)"), 1920, 1200 },
  { "842x595", N_("842 × 595 (A4 landscape, points)"), 842, 595 },
  { "792x612", N_("792 × 612 (US Letter landscape, points)"), 792, 612 },
};

static char *
_rugosa_window_today (void)
{
  g_autoptr (GDateTime) now = g_date_time_new_now_local ();
  return g_date_time_format (now, "%Y-%m-%d");
}

/* The title of an exported chart: the project's file name without its
 * extension, or what the window calls an unsaved project. */
static char *
_rugosa_window_export_title (RugosaWindow *self)
{
  g_autofree char *base = NULL;
  const char *title = rugosa_settings_get_string (rugosa_project_get_settings (self->project), "project-title");
  char *dot;

  /* the project's own title, else its file's name */
  if (title != NULL && *title != '\0')
    return g_strdup (title);
  if (self->file == NULL)
    return g_strdup (_("Unsaved project"));
  base = g_file_get_basename (self->file);
  dot = strrchr (base, '.');
  if (dot != NULL && dot != base)
    *dot = '\0';
  return g_steal_pointer (&base);
}

gboolean
rugosa_window_export_chart_to (RugosaWindow       *self,
                               const char         *path,
                               RugosaChartFormat   format,
                               double              width,
                               double              height,
                               GError            **error)
{
  return rugosa_window_export_chart_with (self, path, format, width, height, FALSE, error);
}

gboolean
rugosa_window_export_chart_with (RugosaWindow       *self,
                                 const char         *path,
                                 RugosaChartFormat   format,
                                 double              width,
                                 double              height,
                                 gboolean            heading,
                                 GError            **error)
{
  guint pos = gtk_single_selection_get_selected (self->selection);
  const int selected = pos == GTK_INVALID_LIST_POSITION ? -1 : (int) pos;
  const RugosaChartView view = _rugosa_window_chart_view (self);
  g_autoptr (RugosaChartInput) input = NULL;
  g_autofree char *date = _rugosa_window_today ();

  /* the view the chart area shows, of the lines it shows */
  if (view != RUGOSA_CHART_VIEW_FRICTION)
    {
      g_autoptr (RugosaPlotInput) plot = rugosa_plot_input_new (self->project, view, selected,
                                                                rugosa_visibility_chart_view (self->visibility));

      return rugosa_plot_export (&plot->spec, plot->series, plot->n_series, format,
                                 width, height, date, path, error);
    }
  input = rugosa_chart_input_new_view (self->project, selected, NULL,
                                       rugosa_visibility_chart_view (self->visibility));
  if (heading)
    {
      g_autofree char *title = _rugosa_window_export_title (self);
      rugosa_chart_input_set_heading (input, self->project, title);
    }
  /* no selection ring in the file (rugosa_chart_export drops it) */
  return rugosa_chart_export (&input->spec, input->lines, input->n_lines, format,
                              width, height, date, path, error);
}

/* The paper of the locale (LC_PAPER), as GTK knows it. */
static RugosaPaper
_rugosa_window_paper (void)
{
  return g_strcmp0 (gtk_paper_size_get_default (), GTK_PAPER_NAME_LETTER) == 0
         ? RUGOSA_PAPER_LETTER : RUGOSA_PAPER_A4;
}

static RugosaReport *
_rugosa_window_report (RugosaWindow *self)
{
  g_autofree char *date = _rugosa_window_today ();

  return rugosa_report_new (self->project, _rugosa_window_paper (), date);
}

gboolean
rugosa_window_export_report_to (RugosaWindow  *self,
                                const char    *path,
                                GError       **error)
{
  g_autoptr (RugosaReport) report = _rugosa_window_report (self);

  /* Written atomically: a failure leaves the previous file as it was. */
  return rugosa_report_write_pdf (report, path, error);
}

gboolean
rugosa_window_export_csv_to (RugosaWindow  *self,
                             const char    *path,
                             GError       **error)
{
  /* Written atomically: a failure leaves the previous file as it was. */
  return rugosa_project_export_eval (self->project, -1.0, RUGOSA_EVAL_FORMAT_CSV, path, error);
}

/* The formats offered, the name shown in the dialog and the extension the
 * written file gets. */
static const struct { const char *id; const char *label; const char *ext; RugosaChartFormat format; } export_formats[] = {
  { "png", "PNG", ".png", RUGOSA_CHART_FORMAT_PNG },
  { "svg", "SVG", ".svg", RUGOSA_CHART_FORMAT_SVG },
  { "pdf", "PDF", ".pdf", RUGOSA_CHART_FORMAT_PDF },
};

/* `path` with the extension `ext`: kept as typed when it has it already
 * (in any case), put in place of an extension of another chart format,
 * added otherwise ("chart.v2" becomes "chart.v2.pdf"). */
static char *
_rugosa_window_with_extension (const char *path,
                               const char *ext,
                               gboolean    chart)
{
  const char *base = strrchr (path, G_DIR_SEPARATOR);
  const char *dot;

  base = base ? base + 1 : path;
  dot = strrchr (base, '.');
  if (dot != NULL && dot != base)
    {
      if (g_ascii_strcasecmp (dot, ext) == 0)
        return g_strdup (path);
      for (guint i = 0; chart && i < G_N_ELEMENTS (export_formats); i++)
        if (g_ascii_strcasecmp (dot, export_formats[i].ext) == 0)
          {
            g_autofree char *stem = g_strndup (path, (gsize) (dot - path));
            return g_strconcat (stem, ext, NULL);
          }
    }
  return g_strconcat (path, ext, NULL);
}

/* One export the file dialog has settled. */
typedef struct
{
  char              *path;
  gboolean           csv;
  gboolean           report;
  RugosaChartFormat  format;
  double             width;
  double             height;
  gboolean           heading;
  gboolean           offered_heading;   /* the friction chart's dialog */
  /* the dialog's choices, remembered once the export succeeds */
  const char        *size_id;
  const char        *format_id;
} RugosaExportJob;

static void
_rugosa_export_job_free (RugosaExportJob *job)
{
  g_free (job->path);
  g_free (job);
}

static void
_rugosa_window_export_run (RugosaWindow    *self,
                           RugosaExportJob *job)
{
  g_autoptr (GError) error = NULL;
  gboolean ok;

  if (job->csv)
    ok = rugosa_window_export_csv_to (self, job->path, &error);
  else if (job->report)
    ok = rugosa_window_export_report_to (self, job->path, &error);
  else
    ok = rugosa_window_export_chart_with (self, job->path, job->format, job->width, job->height,
                                          job->heading, &error);
  if (!ok)
    {
      const char *heading = job->csv ? _("Could not export the results")
                            : job->report ? _("Could not write the report")
                            : _("Could not export the chart");
      GtkWidget *msg = adw_message_dialog_new (GTK_WINDOW (self), heading, error->message);

      adw_message_dialog_add_response (ADW_MESSAGE_DIALOG (msg), "close", _("_Close"));
      gtk_window_present (GTK_WINDOW (msg));
    }
  else if (job->csv)
    /* The CSV's columns name their units: the project's (model/rugosa-output.h). */
    _rugosa_window_toast (self, _("Results exported as CSV, in the project’s units."));
  else if (job->report)
    {
      g_autofree char *base = g_path_get_basename (job->path);
      g_autofree char *text = g_strdup_printf (_("Report written to %s."), base);
      _rugosa_window_toast (self, text);
    }
  else
    {
      g_autofree char *base = g_path_get_basename (job->path);
      g_autofree char *text = g_strdup_printf (_("Chart exported to %s."), base);

      /* the next export starts from the choices that worked */
      g_settings_set_string (self->settings, "export-size", job->size_id);
      g_settings_set_string (self->settings, "export-format", job->format_id);
      if (job->offered_heading)
        g_settings_set_boolean (self->settings, "export-heading", job->heading);
      _rugosa_window_toast (self, text);
    }
}

static void
_rugosa_window_replace_response (AdwMessageDialog *dialog,
                                 const char       *response,
                                 RugosaWindow     *self)
{
  if (g_str_equal (response, "replace"))
    _rugosa_window_export_run (self, g_object_get_data (G_OBJECT (dialog), "job"));
}

/* The file dialog asked before replacing the name typed; a name changed
 * after it (its extension) is asked about here. */
static void
_rugosa_window_export_settled (RugosaWindow    *self,
                               const char      *typed,
                               RugosaExportJob *job)
{
  GtkWidget *dialog;
  g_autofree char *base = NULL;

  if (g_str_equal (typed, job->path) || !g_file_test (job->path, G_FILE_TEST_EXISTS))
    {
      _rugosa_window_export_run (self, job);
      _rugosa_export_job_free (job);
      return;
    }
  base = g_path_get_basename (job->path);
  dialog = adw_message_dialog_new (GTK_WINDOW (self), NULL, NULL);
  adw_message_dialog_format_heading (ADW_MESSAGE_DIALOG (dialog), _("Replace “%s”?"), base);
  adw_message_dialog_set_body (ADW_MESSAGE_DIALOG (dialog),
                               _("The name was given the extension of the format written, and a file "
                                 "of that name already exists. Replacing it overwrites that file."));
  adw_message_dialog_add_responses (ADW_MESSAGE_DIALOG (dialog),
                                    "cancel", _("_Cancel"),
                                    "replace", _("_Replace"),
                                    NULL);
  adw_message_dialog_set_response_appearance (ADW_MESSAGE_DIALOG (dialog), "replace", ADW_RESPONSE_DESTRUCTIVE);
  adw_message_dialog_set_default_response (ADW_MESSAGE_DIALOG (dialog), "cancel");
  adw_message_dialog_set_close_response (ADW_MESSAGE_DIALOG (dialog), "cancel");
  g_object_set_data_full (G_OBJECT (dialog), "job", job, (GDestroyNotify) _rugosa_export_job_free);
  g_signal_connect (dialog, "response", G_CALLBACK (_rugosa_window_replace_response), self);
  gtk_window_present (GTK_WINDOW (dialog));
}

static void
_rugosa_window_export_response (GtkNativeDialog *dialog,
                                int              response,
                                RugosaWindow    *self)
{
  g_autoptr (GFile) file = NULL;
  g_autofree char *typed = NULL;
  RugosaExportJob *job;
  const char *size_id, *format_id;
  guint f = 0;

  if (response != GTK_RESPONSE_ACCEPT)
    {
      g_object_unref (dialog);
      return;
    }
  file = gtk_file_chooser_get_file (GTK_FILE_CHOOSER (dialog));
  typed = g_file_get_path (file);
  size_id = gtk_file_chooser_get_choice (GTK_FILE_CHOOSER (dialog), "size");
  format_id = gtk_file_chooser_get_choice (GTK_FILE_CHOOSER (dialog), "format");

  job = g_new0 (RugosaExportJob, 1);
  job->width = export_sizes[0].w, job->height = export_sizes[0].h;
  job->size_id = export_sizes[0].id;
  for (guint i = 0; i < G_N_ELEMENTS (export_sizes); i++)
    if (g_strcmp0 (size_id, export_sizes[i].id) == 0)
      {
        job->width = export_sizes[i].w, job->height = export_sizes[i].h;
        job->size_id = export_sizes[i].id;
      }
  for (guint i = 0; i < G_N_ELEMENTS (export_formats); i++)
    if (g_strcmp0 (format_id, export_formats[i].id) == 0)
      f = i;
  /* The Format shown in the dialog is the format written; the file's
   * extension is made to say the same, whatever extension was typed. */
  job->format = export_formats[f].format;
  job->format_id = export_formats[f].id;
  {
    const char *heading = gtk_file_chooser_get_choice (GTK_FILE_CHOOSER (dialog), "heading");

    job->offered_heading = heading != NULL;
    job->heading = g_strcmp0 (heading, "true") == 0;
  }
  job->path = _rugosa_window_with_extension (typed, export_formats[f].ext, TRUE);
  g_object_unref (dialog);
  _rugosa_window_export_settled (self, typed, job);
}

static void
_rugosa_window_export_chart (GtkWidget  *widget,
                             const char *action_name,
                             GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  GtkFileChooserNative *dialog;
  const char *size_ids[G_N_ELEMENTS (export_sizes) + 1] = { 0 };
  const char *size_labels[G_N_ELEMENTS (export_sizes) + 1] = { 0 };
  const char *format_ids[G_N_ELEMENTS (export_formats) + 1] = { 0 };
  const char *format_labels[G_N_ELEMENTS (export_formats) + 1] = { 0 };
  g_autofree char *size = g_settings_get_string (self->settings, "export-size");
  g_autofree char *format = g_settings_get_string (self->settings, "export-format");
  guint f = 0;

  /* The last export's choices first: GTK 4.8's own dialog shows the
   * first option of a drop-down whatever gtk_file_chooser_set_choice
   * asks, so the remembered one leads its list; the others keep their
   * order. */
  for (guint i = 0; i < G_N_ELEMENTS (export_formats); i++)
    if (g_str_equal (format, export_formats[i].id))
      f = i;
  for (guint i = 0, n = 0; i < G_N_ELEMENTS (export_sizes); i++)
    if (g_str_equal (size, export_sizes[i].id))
      {
        size_ids[n] = export_sizes[i].id;
        size_labels[n++] = _(export_sizes[i].label);
      }
  for (guint i = 0, n = size_ids[0] != NULL ? 1 : 0; i < G_N_ELEMENTS (export_sizes); i++)
    if (!g_str_equal (size, export_sizes[i].id))
      {
        size_ids[n] = export_sizes[i].id;
        size_labels[n++] = _(export_sizes[i].label);
      }
  format_ids[0] = export_formats[f].id;
  format_labels[0] = export_formats[f].label;
  for (guint i = 0, n = 1; i < G_N_ELEMENTS (export_formats); i++)
    if (i != f)
      {
        format_ids[n] = export_formats[i].id;
        format_labels[n++] = export_formats[i].label;
      }
  dialog = gtk_file_chooser_native_new (_("Export the Chart"), GTK_WINDOW (self),
                                        GTK_FILE_CHOOSER_ACTION_SAVE, _("_Export"), _("_Cancel"));
  gtk_file_chooser_add_choice (GTK_FILE_CHOOSER (dialog), "format", _("Format"), format_ids, format_labels);
  /* the last export's choices (the schema's choices keep them valid) */
  gtk_file_chooser_set_choice (GTK_FILE_CHOOSER (dialog), "format", export_formats[f].id);
  gtk_file_chooser_add_choice (GTK_FILE_CHOOSER (dialog), "size", _("Size"), size_ids, size_labels);
  gtk_file_chooser_set_choice (GTK_FILE_CHOOSER (dialog), "size", size);
  if (_rugosa_window_chart_view (self) == RUGOSA_CHART_VIEW_FRICTION)
    {
      /* a check button: the title and the conditions over the chart */
      gtk_file_chooser_add_choice (GTK_FILE_CHOOSER (dialog), "heading",
                                   _("Title and conditions"), NULL, NULL);
      gtk_file_chooser_set_choice (GTK_FILE_CHOOSER (dialog), "heading",
                                   g_settings_get_boolean (self->settings, "export-heading") ? "true" : "false");
    }
  {
    /* the view's name and the format's extension, e.g. "System curves.png" */
    g_autofree char *name = g_strconcat (rugosa_chart_view_title (_rugosa_window_chart_view (self)),
                                         export_formats[f].ext, NULL);

    gtk_file_chooser_set_current_name (GTK_FILE_CHOOSER (dialog), name);
  }
  g_signal_connect (dialog, "response", G_CALLBACK (_rugosa_window_export_response), self);
  gtk_native_dialog_show (GTK_NATIVE_DIALOG (dialog));
}

/* The results table as CSV, or the report as PDF: a file asked for, then
 * settled as every export is. */
static void
_rugosa_window_file_response (GtkNativeDialog *dialog,
                              int              response,
                              RugosaWindow    *self)
{
  if (response == GTK_RESPONSE_ACCEPT)
    {
      g_autoptr (GFile) file = gtk_file_chooser_get_file (GTK_FILE_CHOOSER (dialog));
      g_autofree char *typed = g_file_get_path (file);
      RugosaExportJob *job = g_new0 (RugosaExportJob, 1);

      /* each named as what it holds */
      job->report = GPOINTER_TO_INT (g_object_get_data (G_OBJECT (dialog), "report"));
      job->csv = !job->report;
      job->path = _rugosa_window_with_extension (typed, job->report ? ".pdf" : ".csv", FALSE);
      _rugosa_window_export_settled (self, typed, job);
    }
  g_object_unref (dialog);
}

static void
_rugosa_window_ask_file (RugosaWindow *self,
                         const char   *title,
                         const char   *accept,
                         const char   *name,
                         gboolean      report)
{
  GtkFileChooserNative *dialog;

  dialog = gtk_file_chooser_native_new (title, GTK_WINDOW (self), GTK_FILE_CHOOSER_ACTION_SAVE,
                                        accept, _("_Cancel"));
  gtk_file_chooser_set_current_name (GTK_FILE_CHOOSER (dialog), name);
  g_object_set_data (G_OBJECT (dialog), "report", GINT_TO_POINTER (report));
  g_signal_connect (dialog, "response", G_CALLBACK (_rugosa_window_file_response), self);
  gtk_native_dialog_show (GTK_NATIVE_DIALOG (dialog));
}

static void
_rugosa_window_export_csv (GtkWidget  *widget,
                           const char *action_name,
                           GVariant   *param)
{
  _rugosa_window_ask_file (RUGOSA_WINDOW (widget), _("Export the Results Table"), _("_Export"),
                           _("line results.csv"), FALSE);
}

static void
_rugosa_window_export_report (GtkWidget  *widget,
                              const char *action_name,
                              GVariant   *param)
{
  _rugosa_window_ask_file (RUGOSA_WINDOW (widget), _("Write the Report"), _("_Save"),
                           _("report.pdf"), TRUE);
}

/* --- print ----------------------------------------------------------- */

/* Each page of the report, scaled to the printable area (the report's
 * own margins stay inside it). */
static void
_rugosa_window_draw_page (GtkPrintOperation *op,
                          GtkPrintContext   *context,
                          int                page_nr,
                          RugosaReport      *report)
{
  cairo_t *cr = gtk_print_context_get_cairo_context (context);
  double w = gtk_print_context_get_width (context);
  double h = gtk_print_context_get_height (context);
  double pw, ph, k;

  if (page_nr < 0 || (guint) page_nr >= rugosa_report_get_n_pages (report))
    return;
  rugosa_report_get_page_size (report, &pw, &ph);
  k = MIN (w / pw, h / ph);
  cairo_save (cr);
  cairo_translate (cr, (w - pw * k) / 2.0, (h - ph * k) / 2.0);
  cairo_scale (cr, k, k);
  rugosa_report_draw_page (report, cr, (guint) page_nr);
  cairo_restore (cr);
}

static GtkPrintOperation *
_rugosa_window_print_operation (RugosaWindow *self)
{
  GtkPrintOperation *op = gtk_print_operation_new ();
  g_autoptr (GtkPageSetup) setup = gtk_page_setup_new ();
  RugosaReport *report = _rugosa_window_report (self);
  GtkPaperSize *paper = gtk_paper_size_new (_rugosa_window_paper () == RUGOSA_PAPER_LETTER
                                            ? GTK_PAPER_NAME_LETTER : GTK_PAPER_NAME_A4);

  /* the report's pages, on its paper */
  gtk_page_setup_set_orientation (setup, GTK_PAGE_ORIENTATION_PORTRAIT);
  gtk_page_setup_set_paper_size_and_default_margins (setup, paper);
  gtk_paper_size_free (paper);
  gtk_print_operation_set_default_page_setup (op, setup);
  gtk_print_operation_set_use_full_page (op, TRUE);
  gtk_print_operation_set_n_pages (op, (int) rugosa_report_get_n_pages (report));
  gtk_print_operation_set_job_name (op, _("Pipe line report"));
  gtk_print_operation_set_embed_page_setup (op, TRUE);
  g_object_set_data_full (G_OBJECT (op), "rugosa-report", report, (GDestroyNotify) rugosa_report_free);
  g_signal_connect (op, "draw-page", G_CALLBACK (_rugosa_window_draw_page), report);
  return op;
}

gboolean
rugosa_window_print_to_pdf (RugosaWindow  *self,
                            const char    *path,
                            GError       **error)
{
  g_autoptr (GtkPrintOperation) op = _rugosa_window_print_operation (self);

  /* The same page as printing, written through GTK's print path. */
  gtk_print_operation_set_export_filename (op, path);
  return gtk_print_operation_run (op, GTK_PRINT_OPERATION_ACTION_EXPORT, GTK_WINDOW (self), error)
         != GTK_PRINT_OPERATION_RESULT_ERROR;
}

static void
_rugosa_window_print (GtkWidget  *widget,
                      const char *action_name,
                      GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  g_autoptr (GtkPrintOperation) op = _rugosa_window_print_operation (self);
  g_autoptr (GError) error = NULL;

  if (gtk_print_operation_run (op, GTK_PRINT_OPERATION_ACTION_PRINT_DIALOG, GTK_WINDOW (self), &error)
      == GTK_PRINT_OPERATION_RESULT_ERROR)
    _rugosa_window_toast (self, error->message);
}

void
_rugosa_window_output_class_init (GtkWidgetClass *widget_class)
{
  gtk_widget_class_install_action (widget_class, "win.export-chart", NULL, _rugosa_window_export_chart);
  gtk_widget_class_install_action (widget_class, "win.export-csv", NULL, _rugosa_window_export_csv);
  gtk_widget_class_install_action (widget_class, "win.export-report", NULL, _rugosa_window_export_report);
  gtk_widget_class_install_action (widget_class, "win.print", NULL, _rugosa_window_print);
}
