/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <adwaita.h>

#include "chart/rugosa-chart.h"
#include "model/rugosa-history.h"
#include "model/rugosa-project.h"
#include "rugosa-application.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_WINDOW (rugosa_window_get_type ())
G_DECLARE_FINAL_TYPE (RugosaWindow, rugosa_window, RUGOSA, WINDOW, AdwApplicationWindow)

RugosaWindow  *rugosa_window_new            (RugosaApplication *application);
RugosaProject *rugosa_window_get_project    (RugosaWindow *self);
RugosaHistory *rugosa_window_get_history    (RugosaWindow *self);
/* The file the project was read from or last saved to, or NULL. */
GFile         *rugosa_window_get_file       (RugosaWindow *self);
gboolean       rugosa_window_get_modified   (RugosaWindow *self);
/* An unnamed, unmodified project: a file to open may replace it. */
gboolean       rugosa_window_is_pristine    (RugosaWindow *self);

/* Read `file` into this window (errors are shown in the window). */
void           rugosa_window_load_file      (RugosaWindow *self,
                                             GFile        *file);
/* The same, synchronously, reporting the error (tests, recovery). */
gboolean       rugosa_window_load_file_sync (RugosaWindow *self,
                                             GFile        *file,
                                             GError      **error);
gboolean       rugosa_window_save_file_sync (RugosaWindow *self,
                                             GFile        *file,
                                             GError      **error);
/* On start: if an autosaved copy of unsaved work is left over from a
 * session that did not end cleanly, ask whether to recover it. */
void           rugosa_window_offer_recovery (RugosaWindow *self);
/* Whether such a copy is there. */
gboolean       rugosa_window_recovery_pending (void);
/* The lock that marks this instance's recovery copies as live for every
 * other instance (docs/data-safety.md): taken at start-up (and before the
 * first copy is written, whatever comes first), let go when the instance
 * ends.  Other instances never offer, open or delete a copy whose owner
 * holds it. */
gboolean       rugosa_window_recovery_hold    (GError **error);
void           rugosa_window_recovery_release (void);
/* Write the autosave copy now (tests; normally on a coalesced timeout). */
gboolean       rugosa_window_autosave_now   (RugosaWindow *self,
                                             GError      **error);
/* Where the autosave copy of this window goes. */
char          *rugosa_window_autosave_path  (RugosaWindow *self);

/* Output without dialogs (the menu's dialogs end here; tests). */
gboolean       rugosa_window_export_chart_to (RugosaWindow      *self,
                                              const char        *path,
                                              RugosaChartFormat  format,
                                              double             width,
                                              double             height,
                                              GError           **error);
/* The same, with the title (the project's file name) and the conditions
 * over the chart when `heading` (the friction chart only). */
gboolean       rugosa_window_export_chart_with (RugosaWindow    *self,
                                                const char      *path,
                                                RugosaChartFormat format,
                                                double           width,
                                                double           height,
                                                gboolean         heading,
                                                GError         **error);
gboolean       rugosa_window_export_csv_to   (RugosaWindow      *self,
                                              const char        *path,
                                              GError           **error);
/* The project's report (chart/rugosa-report.h) on the paper of the
 * locale's default paper size; printing draws the same pages. */
gboolean       rugosa_window_export_report_to (RugosaWindow     *self,
                                               const char       *path,
                                               GError          **error);
gboolean       rugosa_window_print_to_pdf    (RugosaWindow      *self,
                                              const char        *path,
                                              GError           **error);

/* The colour of the line option at `position` in a project: the
 * window's palette, in turn (for lines added by other windows). */
const char    *rugosa_window_palette_colour (guint position);

/* Presentation mode (win.present, F5): the chart alone, full screen, in
 * large type, driven from the keyboard; leaving puts the window back as
 * it was.  Nothing in it changes the project. */
gboolean       rugosa_window_get_presenting (RugosaWindow *self);
void           rugosa_window_set_presenting (RugosaWindow *self,
                                             gboolean      presenting);
/* What key `number` (1–9) does while presenting: line `number` of the
 * list shown or hidden; FALSE when there is no such line. */
gboolean       rugosa_window_present_toggle_line (RugosaWindow *self,
                                                  guint         number);

/* Pieces, for tests and the benchmark. */
GtkWidget     *rugosa_window_get_canvas     (RugosaWindow *self);
GtkWidget     *rugosa_window_get_line_panel (RugosaWindow *self);
GtkWidget     *rugosa_window_get_results    (RugosaWindow *self);
GtkRange      *rugosa_window_get_age_scale  (RugosaWindow *self);
GtkSingleSelection *rugosa_window_get_selection (RugosaWindow *self);
/* The project settings window, opened by the menu's Project Settings
 * (tests: present it through "win.project-settings" first); or NULL. */
GtkWindow     *rugosa_window_get_project_settings (RugosaWindow *self);
/* The text beside the slider ("+18.2 % head loss against new"). */
const char    *rugosa_window_get_age_summary (RugosaWindow *self);

G_END_DECLS
