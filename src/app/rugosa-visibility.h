/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <gtk/gtk.h>

#include "chart/rugosa-chart-input.h"
#include "model/rugosa-project.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_VISIBILITY (rugosa_visibility_get_type ())
G_DECLARE_FINAL_TYPE (RugosaVisibility, rugosa_visibility, RUGOSA, VISIBILITY, GObject)

/* Which line options the window shows: a way of reading the project, not
 * part of it.  A line may be hidden (off the chart and out of the results
 * table, still in the list) or pinned (always labelled on the chart), and
 * "only-selected" shows the selected line alone.  Not saved with the
 * project: hiding changes no result, an edit's undo step or the file's
 * modified state would be wrong for it, and a colleague who opens the
 * file must see every option it holds; within a session the state follows
 * the line objects through edits, undo and moves.
 *
 * The chart (rugosa_visibility_chart_view), the results table (a filter
 * model, rugosa_visibility_drawn_selection) and the list read it; each
 * change emits "changed" once, however many lines it touched. */

RugosaVisibility *rugosa_visibility_new           (GtkSingleSelection *selection);
gboolean          rugosa_visibility_get_shown     (RugosaVisibility *self,
                                                   RugosaLine       *line);
void              rugosa_visibility_set_shown     (RugosaVisibility *self,
                                                   RugosaLine       *line,
                                                   gboolean          shown);
/* Many lines at once (a group, the lines a filter leaves). */
void              rugosa_visibility_set_shown_all (RugosaVisibility *self,
                                                   GListModel       *lines,
                                                   gboolean          shown);
gboolean          rugosa_visibility_get_pinned    (RugosaVisibility *self,
                                                   RugosaLine       *line);
void              rugosa_visibility_set_pinned    (RugosaVisibility *self,
                                                   RugosaLine       *line,
                                                   gboolean          pinned);
gboolean          rugosa_visibility_get_only_selected (RugosaVisibility *self);
void              rugosa_visibility_set_only_selected (RugosaVisibility *self,
                                                       gboolean          only);
/* Drawn on the chart and listed in the table: shown, or with
 * "only-selected" the selected line alone. */
gboolean          rugosa_visibility_is_drawn      (RugosaVisibility *self,
                                                   RugosaLine       *line);
/* Every line shown and none pinned (a new or loaded project). */
void              rugosa_visibility_reset         (RugosaVisibility *self);
/* The view for rugosa_chart_input_new_view; valid while `self` lives. */
const RugosaChartInputView *rugosa_visibility_chart_view (RugosaVisibility *self);
/* A selection of the drawn lines of `project` that follows the window's
 * selection both ways (the results table's model); owned by `self`. */
GtkSingleSelection *rugosa_visibility_drawn_selection (RugosaVisibility *self,
                                                       RugosaProject    *project);

/* Keep `view`, a selection of a filtered model of the lines, in step with
 * `main`, the window's selection of every line: each follows the other's
 * selected line; a line `view` does not hold leaves it unselected. */
void rugosa_selection_link (GtkSingleSelection *main,
                            GtkSingleSelection *view);
/* The position of `item` in `model`, or GTK_INVALID_LIST_POSITION; linear,
 * for a selection change, not a frame. */
guint rugosa_list_model_find (GListModel *model,
                              gpointer    item);

G_END_DECLS
