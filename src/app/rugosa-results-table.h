/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <gtk/gtk.h>

#include "model/rugosa-project.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_RESULTS_TABLE (rugosa_results_table_get_type ())
G_DECLARE_FINAL_TYPE (RugosaResultsTable, rugosa_results_table, RUGOSA, RESULTS_TABLE, GtkWidget)

/* The results of every line option at the service age, in the display
 * units: one row a line, sharing the window's selection. */

GtkWidget  *rugosa_results_table_new           (void);
void        rugosa_results_table_set_context   (RugosaResultsTable *self,
                                                RugosaProject      *project,
                                                GSettings          *settings,
                                                GtkSingleSelection *selection);
/* Re-read every shown cell from the project's results. */
void        rugosa_results_table_refresh       (RugosaResultsTable *self);
/* The text shown in a cell (tests): row `position`, column id such as
 * "head-loss"; NULL when that row is not on screen. */
char       *rugosa_results_table_cell_text     (RugosaResultsTable *self,
                                                guint               position,
                                                const char         *column);
/* The same text computed directly for any line (no widget needed). */
char       *rugosa_results_table_format_cell   (RugosaResultsTable *self,
                                                RugosaLine         *line,
                                                const char         *column);

G_END_DECLS
