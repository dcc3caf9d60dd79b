/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <gtk/gtk.h>

#include "model/rugosa-project.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_RESULTS_TABLE (rugosa_results_table_get_type ())
G_DECLARE_FINAL_TYPE (RugosaResultsTable, rugosa_results_table, RUGOSA, RESULTS_TABLE, GtkWidget)

/* The results of every line option at the service age, in the project's
 * display units: one row a line, sharing the window's selection.  A
 * column's value and quantity come from the output keys
 * (model/rugosa-output.h), its unit from the project's settings. */

GtkWidget  *rugosa_results_table_new           (void);
void        rugosa_results_table_set_context   (RugosaResultsTable *self,
                                                RugosaProject      *project,
                                                GtkSingleSelection *selection);
/* Re-read every shown cell from the project's results, and the units in
 * the column titles from its settings. */
void        rugosa_results_table_refresh       (RugosaResultsTable *self);
/* The text shown in a cell (tests): row `position`, column id such as
 * "head-loss"; NULL when that row is not on screen. */
char       *rugosa_results_table_cell_text     (RugosaResultsTable *self,
                                                guint               position,
                                                const char         *column);
/* The title of a column as shown ("Velocity (ft/s)"), or NULL. */
const char *rugosa_results_table_get_column_title (RugosaResultsTable *self,
                                                   const char         *column);
/* The same text computed directly for any line (no widget needed). */
char       *rugosa_results_table_format_cell   (RugosaResultsTable *self,
                                                RugosaLine         *line,
                                                const char         *column);

G_END_DECLS
