/* SPDX-License-Identifier: GPL-3.0-or-later */
/* RugosaLineList is split over rugosa-line-list.c (rows, filter, groups,
 * the object) and rugosa-line-list-selection.c (the selection of several
 * lines and how it follows the window's one line). */
#pragma once

#include "rugosa-line-list.h"

G_BEGIN_DECLS

struct _RugosaLineList
{
  GtkWidget parent_instance;

  /* template widgets */
  GtkToggleButton *only_selected_button;
  GtkMenuButton   *groups_button;
  GtkPopover      *groups_popover;
  GtkListBox      *groups_box;
  GtkSearchEntry  *filter_entry;
  GtkListView     *view;
  GtkEntry        *group_entry;

  /* borrowed references */
  RugosaProject      *project;
  GtkSingleSelection *selection;     /* the window's, over every line */
  RugosaVisibility   *visibility;

  /* owned references */
  GtkCustomFilter    *filter;
  GtkFilterListModel *listed;
  GtkMultiSelection  *list_selection; /* the lines an edit applies to */
  GHashTable         *numbers;       /* RugosaLine -> place in the project + 1 */
  GPtrArray          *bound;         /* rows on screen */
  char               *filter_text;   /* casefolded; NULL: no filter */

  RugosaLine         *pressed_line;  /* the row last pressed; weak */
  guint               n_selected;
  gboolean updating;                 /* rows being set from the model */
  gboolean following;                /* the list's selection being set from the window's */
  gboolean follow_pending;           /* the window's line changed while the project's list did */
};

/* rugosa-line-list.c */
void _rugosa_line_list_refresh_rows       (RugosaLineList *self);
void _rugosa_line_list_show_group         (RugosaLineList *self);
void _rugosa_line_list_notify_n_selected  (RugosaLineList *self);

/* rugosa-line-list-selection.c */
void _rugosa_line_list_set_pressed        (RugosaLineList    *self,
                                           RugosaLine        *line);
void _rugosa_line_list_row_pressed        (GtkGestureClick   *gesture,
                                           int                n_press,
                                           double             x,
                                           double             y,
                                           RugosaLineList    *self);
void _rugosa_line_list_selection_changed  (GtkSelectionModel *model,
                                           guint              position,
                                           guint              n_items,
                                           RugosaLineList    *self);
void _rugosa_line_list_follow_window      (RugosaLineList    *self);
void _rugosa_line_list_project_changed_after (RugosaLineList *self);
void _rugosa_line_list_listed_changed     (RugosaLineList    *self);

G_END_DECLS
