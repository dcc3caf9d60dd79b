/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Edits of several line options at once: the current line's fluid, aging
 * or flows applied to the other lines selected in the list, as one undo
 * step (rugosa-apply.h).  The panel's groups offer it while other lines
 * are selected; "win.apply-part" takes the part's nick ("fluid", "aging",
 * "flow"). */
#define G_LOG_DOMAIN "rugosa-window"

#include "config.h"

#include <glib/gi18n.h>

#include "model/rugosa-apply.h"
#include "rugosa-window-private.h"

/* How many selected lines the current one's part would go to. */
static guint
_rugosa_window_edits_n_others (RugosaWindow *self)
{
  g_autoptr (GPtrArray) lines = rugosa_line_list_get_selected_lines (self->line_list);
  RugosaLine *current = gtk_single_selection_get_selected_item (self->selection);

  if (current == NULL)
    return 0;
  return lines->len - (g_ptr_array_find (lines, current, NULL) ? 1 : 0);
}

void
_rugosa_window_edits_update_actions (RugosaWindow *self)
{
  gtk_widget_action_set_enabled (GTK_WIDGET (self), "win.apply-part",
                                 _rugosa_window_edits_n_others (self) > 0);
}

static void
_rugosa_window_edits_selection_changed (RugosaWindow *self)
{
  rugosa_line_panel_set_n_others (self->line_panel, _rugosa_window_edits_n_others (self));
  _rugosa_window_update_actions (self);
}

static void
_rugosa_window_apply_part (GtkWidget  *widget,
                           const char *action_name,
                           GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  RugosaLine *current = gtk_single_selection_get_selected_item (self->selection);
  g_autoptr (GPtrArray) lines = NULL;
  g_autofree gboolean *ok_before = NULL;
  int part = RUGOSA_LINE_PART_NONE;
  guint broken = 0;

  if (!rugosa_enum_from_nick (RUGOSA_TYPE_LINE_PART, g_variant_get_string (param, NULL), &part)
      || part == RUGOSA_LINE_PART_NONE)
    {
      g_warning ("No part of a line option is called “%s”", g_variant_get_string (param, NULL));
      return;
    }
  if (current == NULL)
    return;
  lines = rugosa_line_list_get_selected_lines (self->line_list);
  /* Values that suit the current line may not suit another (a flow beyond
   * the correlations' range in a narrow bore, a gas's pressure drop along
   * a long run): applied all the same, as one step to take back, and the
   * lines that stop evaluating are counted for the user. */
  ok_before = g_new (gboolean, lines->len);
  for (guint i = 0; i < lines->len; i++)
    ok_before[i] = _rugosa_window_line_ok (self, g_ptr_array_index (lines, i));
  if (rugosa_apply_part (self->history, current, (RugosaLinePart) part,
                         (RugosaLine *const *) lines->pdata, lines->len) == 0)
    _rugosa_window_toast (self, _("The other selected lines hold these values already."));
  rugosa_history_break_merge (self->history);
  for (guint i = 0; i < lines->len; i++)
    broken += ok_before[i] && !_rugosa_window_line_ok (self, g_ptr_array_index (lines, i));
  if (broken > 0)
    {
      g_autofree char *text = g_strdup_printf (ngettext ("%u line cannot be evaluated with these values: Ctrl+Z takes them back.",
                                                         "%u lines cannot be evaluated with these values: Ctrl+Z takes them back.",
                                                         broken), broken);
      _rugosa_window_toast (self, text);
    }
}

void
_rugosa_window_edits_class_init (GtkWidgetClass *widget_class)
{
  gtk_widget_class_install_action (widget_class, "win.apply-part", "s", _rugosa_window_apply_part);
}

void
_rugosa_window_edits_init (RugosaWindow *self)
{
  g_signal_connect_object (self->line_list, "notify::n-selected",
                           G_CALLBACK (_rugosa_window_edits_selection_changed), self, G_CONNECT_SWAPPED);
  g_signal_connect_object (self->selection, "notify::selected",
                           G_CALLBACK (_rugosa_window_edits_selection_changed), self, G_CONNECT_SWAPPED);
  _rugosa_window_edits_selection_changed (self);
}
