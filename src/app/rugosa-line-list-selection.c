/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-line-list"

#include "config.h"

#include "rugosa-line-list-private.h"
#include "rugosa-visibility.h"

void
_rugosa_line_list_set_pressed (RugosaLineList *self,
                               RugosaLine     *line)
{
  if (self->pressed_line != NULL)
    g_object_remove_weak_pointer (G_OBJECT (self->pressed_line), (gpointer *) &self->pressed_line);
  self->pressed_line = line;
  if (line != NULL)
    g_object_add_weak_pointer (G_OBJECT (line), (gpointer *) &self->pressed_line);
}

void
_rugosa_line_list_row_pressed (GtkGestureClick *gesture,
                               int              n_press,
                               double           x,
                               double           y,
                               RugosaLineList  *self)
{
  GtkWidget *box = gtk_event_controller_get_widget (GTK_EVENT_CONTROLLER (gesture));

  _rugosa_line_list_set_pressed (self, g_object_get_data (G_OBJECT (box), "line"));
}


/* The list's own selection (several lines, for an edit applied to them
 * all) and the window's (one line, the "current": the panel edits it, the
 * chart marks it) follow each other.  The current line is the one the
 * user last clicked or moved to in the list; a change of the window's
 * line (picked on the chart, added, brought back by undo) selects that
 * line alone, unless it is one of the lines selected already. */

static void
_rugosa_line_list_count_selected (RugosaLineList *self)
{
  g_autoptr (GtkBitset) set = gtk_selection_model_get_selection (GTK_SELECTION_MODEL (self->list_selection));
  guint n = (guint) gtk_bitset_get_size (set);

  if (n != self->n_selected)
    {
      self->n_selected = n;
      _rugosa_line_list_refresh_rows (self);
      _rugosa_line_list_notify_n_selected (self);
    }
}

/* The line of the list row holding the keyboard focus, or NULL. */
static RugosaLine *
_rugosa_line_list_focused_line (RugosaLineList *self)
{
  GtkRoot *root = gtk_widget_get_root (GTK_WIDGET (self));
  GtkWidget *focus = root != NULL ? gtk_root_get_focus (root) : NULL;

  if (focus == NULL || !gtk_widget_is_ancestor (focus, GTK_WIDGET (self->view)))
    return NULL;
  for (GtkWidget *w = focus; w != NULL && w != GTK_WIDGET (self->view); w = gtk_widget_get_parent (w))
    {
      GtkWidget *child = gtk_widget_get_first_child (w);
      gpointer line = g_object_get_data (G_OBJECT (w), "line");

      /* the focus is on the list's row, which holds our row box */
      if (line == NULL && child != NULL)
        line = g_object_get_data (G_OBJECT (child), "line");
      if (line != NULL)
        return line;
    }
  return NULL;
}

/* The line at `position` of the list, borrowed: the project holds it. */
static RugosaLine *
_rugosa_line_list_line_at (RugosaLineList *self,
                           guint           position)
{
  RugosaLine *line = g_list_model_get_item (G_LIST_MODEL (self->listed), position);

  if (line != NULL)
    g_object_unref (line);
  return line;
}

static gboolean
_rugosa_line_list_selected_in (RugosaLineList *self,
                               RugosaLine     *line,
                               guint           position,
                               guint           n_items)
{
  GListModel *model = G_LIST_MODEL (self->list_selection);

  for (guint i = position; i < position + n_items; i++)
    {
      g_autoptr (GObject) at = g_list_model_get_item (model, i);

      if ((gpointer) at == (gpointer) line)
        return gtk_selection_model_is_selected (GTK_SELECTION_MODEL (self->list_selection), i);
    }
  return FALSE;
}

/* Which selected line becomes the window's after the list's selection
 * changed in position … position + n_items: the row just clicked, else
 * the row the keyboard moved to, else a single line just added, else the
 * window's line while it stays selected, else the first selected. */
static RugosaLine *
_rugosa_line_list_current (RugosaLineList *self,
                           guint           position,
                           guint           n_items)
{
  GtkSelectionModel *model = GTK_SELECTION_MODEL (self->list_selection);
  RugosaLine *line = self->pressed_line;
  RugosaLine *main_line = gtk_single_selection_get_selected_item (self->selection);
  g_autoptr (GtkBitset) set = NULL;
  guint main_pos;

  if (line != NULL && _rugosa_line_list_selected_in (self, line, position, n_items))
    return line;
  line = _rugosa_line_list_focused_line (self);
  if (line != NULL && _rugosa_line_list_selected_in (self, line, position, n_items))
    return line;
  if (n_items == 1 && gtk_selection_model_is_selected (model, position))
    return _rugosa_line_list_line_at (self, position);
  main_pos = main_line != NULL ? rugosa_list_model_find (G_LIST_MODEL (model), main_line)
                               : GTK_INVALID_LIST_POSITION;
  if (main_pos != GTK_INVALID_LIST_POSITION && gtk_selection_model_is_selected (model, main_pos))
    return main_line;
  set = gtk_selection_model_get_selection (model);
  if (gtk_bitset_is_empty (set))
    return NULL;
  return _rugosa_line_list_line_at (self, gtk_bitset_get_minimum (set));
}

static void
_rugosa_line_list_view_changed (RugosaLineList *self,
                                guint           position,
                                guint           n_items)
{
  RugosaLine *line;
  guint pos;

  _rugosa_line_list_count_selected (self);
  if (self->following)
    return;
  line = _rugosa_line_list_current (self, position, n_items);
  _rugosa_line_list_set_pressed (self, NULL);
  if (line == NULL)
    return;
  pos = (guint) rugosa_project_find_line (self->project, line);
  self->following = TRUE;
  if (pos != GTK_INVALID_LIST_POSITION && gtk_single_selection_get_selected (self->selection) != pos)
    gtk_single_selection_set_selected (self->selection, pos);
  self->following = FALSE;
}

void
_rugosa_line_list_selection_changed (GtkSelectionModel *model,
                                     guint              position,
                                     guint              n_items,
                                     RugosaLineList    *self)
{
  _rugosa_line_list_view_changed (self, position, n_items);
}

/* The window's line changed: select it in the list. */
void
_rugosa_line_list_follow_window (RugosaLineList *self)
{
  RugosaLine *line;
  guint pos;

  _rugosa_line_list_show_group (self);
  _rugosa_line_list_refresh_rows (self);
  if (self->following)
    return;
  /* Inside the project's items-changed (a line removed or added) the
   * filtered list may not have followed yet: select once it has. */
  {
    GSignalInvocationHint *hint = g_signal_get_invocation_hint (self->project);

    if (hint != NULL && hint->signal_id == g_signal_lookup ("items-changed", G_TYPE_LIST_MODEL))
      {
        self->follow_pending = TRUE;
        return;
      }
  }
  line = gtk_single_selection_get_selected_item (self->selection);
  pos = line != NULL ? rugosa_list_model_find (G_LIST_MODEL (self->listed), line)
                     : GTK_INVALID_LIST_POSITION;
  self->following = TRUE;
  if (pos == GTK_INVALID_LIST_POSITION)
    gtk_selection_model_unselect_all (GTK_SELECTION_MODEL (self->list_selection));
  else if (!gtk_selection_model_is_selected (GTK_SELECTION_MODEL (self->list_selection), pos))
    gtk_selection_model_select_item (GTK_SELECTION_MODEL (self->list_selection), pos, TRUE);
  self->following = FALSE;
  /* a line picked on the chart comes into view */
  if (pos != GTK_INVALID_LIST_POSITION)
    gtk_widget_activate_action (GTK_WIDGET (self->view), "list.scroll-to-item", "u", pos);
}

void
_rugosa_line_list_project_changed_after (RugosaLineList *self)
{
  if (!self->follow_pending)
    return;
  self->follow_pending = FALSE;
  _rugosa_line_list_follow_window (self);
}

/* The filter moved the rows: the lines it left keep their selection; with
 * none selected, the window's line is selected again when listed. */
void
_rugosa_line_list_listed_changed (RugosaLineList *self)
{
  g_autoptr (GtkBitset) set = gtk_selection_model_get_selection (GTK_SELECTION_MODEL (self->list_selection));
  RugosaLine *line = gtk_single_selection_get_selected_item (self->selection);
  guint pos;

  if (gtk_bitset_is_empty (set) && line != NULL
      && (pos = rugosa_list_model_find (G_LIST_MODEL (self->listed), line)) != GTK_INVALID_LIST_POSITION)
    {
      self->following = TRUE;
      gtk_selection_model_select_item (GTK_SELECTION_MODEL (self->list_selection), pos, TRUE);
      self->following = FALSE;
    }
  _rugosa_line_list_count_selected (self);
}

guint
rugosa_line_list_get_n_selected (RugosaLineList *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE_LIST (self), 0);
  return self->n_selected;
}

GPtrArray *
rugosa_line_list_get_selected_lines (RugosaLineList *self)
{
  GPtrArray *lines = g_ptr_array_new ();
  g_autoptr (GtkBitset) set = NULL;
  GtkBitsetIter iter;
  guint pos;

  g_return_val_if_fail (RUGOSA_IS_LINE_LIST (self), lines);
  if (self->list_selection == NULL)
    return lines;
  set = gtk_selection_model_get_selection (GTK_SELECTION_MODEL (self->list_selection));
  for (gboolean more = gtk_bitset_iter_init_first (&iter, set, &pos); more;
       more = gtk_bitset_iter_next (&iter, &pos))
    {
      g_ptr_array_add (lines, _rugosa_line_list_line_at (self, pos));
    }
  return lines;
}

GtkSelectionModel *
rugosa_line_list_get_selection (RugosaLineList *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE_LIST (self), NULL);
  return GTK_SELECTION_MODEL (self->list_selection);
}
