/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <gtk/gtk.h>

#include "model/rugosa-project.h"
#include "rugosa-visibility.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_LINE_LIST (rugosa_line_list_get_type ())
G_DECLARE_FINAL_TYPE (RugosaLineList, rugosa_line_list, RUGOSA, LINE_LIST, GtkWidget)

/* The list of line options in the window's sidebar, for projects of a few
 * or of thousands of options: a GtkListView over the project (rows are
 * made only for what is on screen), a filter by name, group or number,
 * each row's number (the one the chart writes beside a marker that has no
 * label), a show/hide and a pin toggle per line, the groups shown or
 * hidden together, "only the selected line", and the selected line's
 * group.  Several lines may be selected (Ctrl- and Shift-click, Ctrl+A),
 * for an edit applied to them all; the window's selection is the one line
 * last clicked or moved to among them, and a line the window selects
 * (on the chart, by undo) is selected in the list.  Like
 * the panel it never edits a line: the group is emitted as `edit-line`
 * (line, "group", a "s" variant) for the window's undo history. */

GtkWidget *rugosa_line_list_new           (void);
void       rugosa_line_list_set_context   (RugosaLineList     *self,
                                           RugosaProject      *project,
                                           GtkSingleSelection *selection,
                                           RugosaVisibility   *visibility);
/* Re-read the rows on screen (results, names, visibility). */
void       rugosa_line_list_refresh       (RugosaLineList     *self);
/* The filter's text, as typed in its entry (tests). */
void       rugosa_line_list_set_filter    (RugosaLineList     *self,
                                           const char         *text);
/* The lines the filter leaves, in project order (tests, "show the
 * listed"). */
GListModel *rugosa_line_list_get_listed   (RugosaLineList     *self);
/* How many lines are selected in the list (property "n-selected"). */
guint       rugosa_line_list_get_n_selected (RugosaLineList *self);
/* The lines selected in the list, in list order; the array is new, the
 * lines borrowed (the project holds them). */
GPtrArray  *rugosa_line_list_get_selected_lines (RugosaLineList *self);
/* The list's selection model (tests). */
GtkSelectionModel *rugosa_line_list_get_selection (RugosaLineList *self);
/* The list view (tests). */
GtkWidget  *rugosa_line_list_get_view     (RugosaLineList     *self);

G_END_DECLS
