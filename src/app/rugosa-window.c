/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-window"

#include "config.h"

#include <glib/gi18n.h>
#include <math.h>

#include "model/rugosa-display.h"
#include "model/rugosa-fields.h"
#include "rugosa-project-settings-window.h"
#include "rugosa-readout.h"
#include "rugosa-seed.h"
#include "rugosa-sizing-window.h"
#include "rugosa-window-private.h"

G_DEFINE_FINAL_TYPE (RugosaWindow, rugosa_window, ADW_TYPE_APPLICATION_WINDOW)

/* Marker colours handed to new lines in turn: our own set, chosen to stay
 * apart from each other and from the chart's regime bands. */
static const char *line_palette[] = {
  "#1b6f9e", "#c2572b", "#2f8f5b", "#8a4fb0", "#b38600",
  "#b0304f", "#3d7d7a", "#6a6fc4", "#7c5a2e", "#5a8f1f",
};

static void _rugosa_window_setup (RugosaWindow *self);

const char *
rugosa_window_palette_colour (guint position)
{
  return line_palette[position % G_N_ELEMENTS (line_palette)];
}

RugosaWindow *
rugosa_window_new (RugosaApplication *application)
{
  RugosaWindow *self = g_object_new (RUGOSA_TYPE_WINDOW, "application", application, NULL);

  /* GObject sets "application" after constructed(): the rest of the set-up
   * needs the application's settings, so it runs here. */
  _rugosa_window_setup (self);
  return self;
}

RugosaProject *
rugosa_window_get_project (RugosaWindow *self)
{
  return self->project;
}

RugosaHistory *
rugosa_window_get_history (RugosaWindow *self)
{
  return self->history;
}

GFile *
rugosa_window_get_file (RugosaWindow *self)
{
  return self->file;
}

gboolean
rugosa_window_get_modified (RugosaWindow *self)
{
  return self->modified;
}

/* Never while presenting: nothing replaces the project on show. */
gboolean
rugosa_window_is_pristine (RugosaWindow *self)
{
  return self->file == NULL && !self->modified && self->presentation == NULL;
}

GtkWidget *
rugosa_window_get_canvas (RugosaWindow *self)
{
  return GTK_WIDGET (self->canvas);
}

GtkWidget *
rugosa_window_get_line_panel (RugosaWindow *self)
{
  return GTK_WIDGET (self->line_panel);
}

GtkWidget *
rugosa_window_get_results (RugosaWindow *self)
{
  return GTK_WIDGET (self->results_table);
}

GtkRange *
rugosa_window_get_age_scale (RugosaWindow *self)
{
  return GTK_RANGE (self->age_scale);
}

GtkSingleSelection *
rugosa_window_get_selection (RugosaWindow *self)
{
  return self->selection;
}

GtkWindow *
rugosa_window_get_project_settings (RugosaWindow *self)
{
  return self->project_settings;
}

const char *
rugosa_window_get_age_summary (RugosaWindow *self)
{
  const char *text = gtk_inscription_get_text (self->age_change_label);
  return text ? text : "";
}

void
_rugosa_window_toast (RugosaWindow *self,
                      const char   *text)
{
  AdwToast *toast = adw_toast_new (text);

  adw_toast_set_timeout (toast, 6);
  adw_toast_overlay_add_toast (self->toast_overlay, toast);
}

static RugosaLine *
_rugosa_window_selected_line (RugosaWindow *self)
{
  return gtk_single_selection_get_selected_item (self->selection);
}

void
_rugosa_window_update_title (RugosaWindow *self)
{
  g_autofree char *name = NULL;
  g_autofree char *title = NULL;
  g_autofree char *folder = NULL;

  if (self->file)
    {
      name = g_file_get_basename (self->file);
      g_autoptr (GFile) parent = g_file_get_parent (self->file);
      if (parent)
        folder = g_file_get_parse_name (parent);
    }
  else
    name = g_strdup (_("Unsaved project"));
  /* The bullet tells the project has changes not yet saved. */
  title = self->modified ? g_strdup_printf ("• %s", name) : g_strdup (name);
  adw_window_title_set_title (self->window_title, title);
  adw_window_title_set_subtitle (self->window_title, folder ? folder : "");
  gtk_window_set_title (GTK_WINDOW (self), title);
}

void
_rugosa_window_apply_actions (RugosaWindow *self)
{
  guint n = rugosa_project_get_n_lines (self->project);
  guint pos = gtk_single_selection_get_selected (self->selection);
  gboolean has = pos != GTK_INVALID_LIST_POSITION;

  gtk_widget_action_set_enabled (GTK_WIDGET (self), "win.undo", rugosa_history_can_undo (self->history));
  gtk_widget_action_set_enabled (GTK_WIDGET (self), "win.redo", rugosa_history_can_redo (self->history));
  gtk_widget_action_set_enabled (GTK_WIDGET (self), "win.line-duplicate", has);
  gtk_widget_action_set_enabled (GTK_WIDGET (self), "win.line-delete", has);
  gtk_widget_action_set_enabled (GTK_WIDGET (self), "win.line-rename", has);
  /* Each direction on its own: at the top of the list there is no "up". */
  gtk_widget_action_set_enabled (GTK_WIDGET (self), "win.line-move-up", has && pos > 0);
  gtk_widget_action_set_enabled (GTK_WIDGET (self), "win.line-move-down", has && pos + 1 < n);
  _rugosa_window_edits_update_actions (self);
  _rugosa_window_present_lock_actions (self);
}

static gboolean
_rugosa_window_actions_due (gpointer user_data)
{
  RugosaWindow *self = RUGOSA_WINDOW (user_data);

  self->actions_source = 0;
  _rugosa_window_apply_actions (self);
  return G_SOURCE_REMOVE;
}

/* The one place that sets the actions' enabled state.  Every undo step
 * changes the document, so the project's "changed" (through
 * _rugosa_window_refresh_all) hears each history change, and the
 * history's notifications hear undo, redo and clearing.  The state is
 * read once the change in progress is complete: inside a group of edits
 * (Duplicate) the history reports nothing to undo, and closing the group
 * may notify nothing.  G_PRIORITY_HIGH runs the update before the next
 * input event is handled. */
void
_rugosa_window_update_actions (RugosaWindow *self)
{
  if (self->actions_source == 0)
    self->actions_source = g_idle_add_full (G_PRIORITY_HIGH, _rugosa_window_actions_due, self, NULL);
}

/* The pointer readout follows the pointer, below and to the right of it,
 * turning back at the canvas edges. */
static gboolean
_rugosa_window_place_probe (GtkOverlay   *overlay,
                            GtkWidget    *child,
                            GdkRectangle *allocation,
                            RugosaWindow *self)
{
  GtkRequisition nat;
  double px, py;
  int w = gtk_widget_get_width (GTK_WIDGET (overlay));
  int h = gtk_widget_get_height (GTK_WIDGET (overlay));

  if (child != GTK_WIDGET (self->probe_label))
    return FALSE;
  gtk_widget_get_preferred_size (child, NULL, &nat);
  rugosa_canvas_get_pointer (self->canvas, &px, &py);
  allocation->width = nat.width;
  allocation->height = nat.height;
  allocation->x = (int) px + 16;
  allocation->y = (int) py + 18;
  if (allocation->x + nat.width > w)
    allocation->x = MAX (0, (int) px - 16 - nat.width);
  if (allocation->y + nat.height > h)
    allocation->y = MAX (0, (int) py - 18 - nat.height);
  return TRUE;
}

static void
_rugosa_window_probe_moved (RugosaWindow *self)
{
  gtk_widget_queue_allocate (gtk_widget_get_parent (GTK_WIDGET (self->probe_label)));
}

/* --- refreshing ------------------------------------------------------ */

static void
_rugosa_window_update_age_summary (RugosaWindow *self)
{
  RugosaSettings *ps = rugosa_project_get_settings (self->project);
  double age = rugosa_settings_get_double (ps, "service-age");
  RugosaLine *line = _rugosa_window_selected_line (self);
  g_autofree char *years = rugosa_display_significant_screen (age, 3);
  g_autofree char *age_text = g_strdup_printf (ngettext ("%s year", "%s years", age == 1.0 ? 1 : 2), years);

  gtk_inscription_set_text (self->age_label, age_text);
  if (line != NULL)
    {
      const RugosaLineResults *res = rugosa_readout_results (self->project, line);

      if (res && res->ok && res->points[RUGOSA_FLOW_DESIGN].ok)
        {
          const RugosaOperatingPoint *p = &res->points[RUGOSA_FLOW_DESIGN];
          g_autofree char *h = rugosa_readout_format (self->project, RUGOSA_DISPLAY_HEAD, p->result.head_loss_total_m);
          g_autofree char *change = rugosa_readout_change (p->head_loss_ratio_to_new);
          g_autofree char *text = g_strdup_printf (_("%s: head loss %s, %s vs new"),
                                                   rugosa_line_get_name (line), h, change);

          gtk_inscription_set_text (self->age_change_label, text);
          return;
        }
    }
  gtk_inscription_set_text (self->age_change_label, "");
}

void
_rugosa_window_refresh_all (RugosaWindow *self)
{
  rugosa_canvas_refresh (self->canvas);
  for (int v = 0; v < RUGOSA_CHART_N_VIEWS; v++)
    if (self->plot_views[v] != NULL)
      rugosa_plot_view_refresh (self->plot_views[v]);
  rugosa_results_table_refresh (self->results_table);
  /* A slider move changes results, not inputs: the panel's fields stay. */
  if (self->age_changing)
    {
      rugosa_line_panel_refresh_results (self->line_panel);
      rugosa_cost_group_refresh_results (self->cost_group);
    }
  else
    {
      rugosa_line_panel_refresh (self->line_panel);
      rugosa_cost_group_refresh (self->cost_group);
    }
  rugosa_line_list_refresh (self->line_list);
  _rugosa_window_update_age_summary (self);
  _rugosa_window_update_actions (self);
}

static void
_rugosa_window_sync_age_scale (RugosaWindow *self)
{
  double age = rugosa_settings_get_double (rugosa_project_get_settings (self->project), "service-age");

  self->following_model = TRUE;
  if (age > gtk_adjustment_get_upper (self->age_adjustment))
    gtk_adjustment_set_upper (self->age_adjustment, age);
  gtk_adjustment_set_value (self->age_adjustment, age);
  self->following_model = FALSE;
}

static void
_rugosa_window_age_changed (RugosaWindow *self)
{
  double age = gtk_adjustment_get_value (self->age_adjustment);

  if (self->following_model)
    return;
  /* The service age is a view of the document, not an edit: it does not
   * fill the undo history nor mark the project modified (closing does
   * not ask about it), yet a save made for another reason keeps it. */
  self->age_changing = TRUE;
  g_object_set (rugosa_project_get_settings (self->project), "service-age", age, NULL);
  self->age_changing = FALSE;
}

static void
_rugosa_window_project_changed (RugosaWindow *self)
{
  if (!self->age_changing)
    _rugosa_window_mark_modified (self);
  _rugosa_window_refresh_all (self);
}

static void
_rugosa_window_selection_changed (RugosaWindow *self)
{
  rugosa_line_panel_set_line (self->line_panel, _rugosa_window_selected_line (self));
  rugosa_cost_group_set_line (self->cost_group, _rugosa_window_selected_line (self));
  _rugosa_window_update_age_summary (self);
  _rugosa_window_update_actions (self);
}

void
_rugosa_window_project_replaced (RugosaWindow *self)
{
  rugosa_history_clear (self->history);
  /* another document: every line shown (visibility is not saved) */
  rugosa_visibility_reset (self->visibility);
  _rugosa_window_sync_age_scale (self);
  if (rugosa_project_get_n_lines (self->project) > 0)
    gtk_single_selection_set_selected (self->selection, 0);
  _rugosa_window_selection_changed (self);
  _rugosa_window_refresh_all (self);
}

/* --- edits from the panel -------------------------------------------- */

static void
_rugosa_window_copy_settings (RugosaSettings *dst,
                              RugosaSettings *src)
{
  guint n;
  g_autofree GParamSpec **specs = g_object_class_list_properties (G_OBJECT_GET_CLASS (src), &n);

  for (guint i = 0; i < n; i++)
    {
      g_auto (GValue) v = G_VALUE_INIT;

      if (!(specs[i]->flags & G_PARAM_WRITABLE) || !(specs[i]->flags & G_PARAM_READABLE))
        continue;
      g_value_init (&v, specs[i]->value_type);
      g_object_get_property (G_OBJECT (src), specs[i]->name, &v);
      g_object_set_property (G_OBJECT (dst), specs[i]->name, &v);
    }
}

/* Would the line still evaluate with this change?  Tried on a copy in a
 * scratch project, so the document and its history stay untouched. */
static gboolean
_rugosa_window_trial (RugosaWindow *self,
                      RugosaLine   *line,
                      const char   *property,
                      const GValue *value,
                      char        **why)
{
  g_autoptr (RugosaProject) scratch = rugosa_project_new ();
  g_autoptr (RugosaLine) copy = rugosa_line_duplicate (line);
  const RugosaLineResults *res;

  _rugosa_window_copy_settings (rugosa_project_get_settings (scratch),
                                rugosa_project_get_settings (self->project));
  g_object_set_property (G_OBJECT (copy), property, value);
  rugosa_project_insert_line (scratch, 0, copy);
  res = rugosa_project_get_results (scratch, copy);
  if (!res->ok)
    {
      *why = g_strdup (res->error);
      return FALSE;
    }
  if (res->points[RUGOSA_FLOW_DESIGN].present && !res->points[RUGOSA_FLOW_DESIGN].ok)
    {
      *why = g_strdup (res->points[RUGOSA_FLOW_DESIGN].error);
      return FALSE;
    }
  return TRUE;
}

gboolean
_rugosa_window_line_ok (RugosaWindow *self,
                        RugosaLine   *line)
{
  const RugosaLineResults *res = rugosa_readout_results (self->project, line);

  return res && res->ok
         && (!res->points[RUGOSA_FLOW_DESIGN].present || res->points[RUGOSA_FLOW_DESIGN].ok);
}

static void
_rugosa_window_refuse (RugosaWindow *self,
                       const char   *property,
                       const char   *why)
{
  RugosaQuantityEntry *entry = rugosa_line_panel_get_entry (self->line_panel, property);

  if (entry)
    rugosa_quantity_entry_set_error (entry, why);
  else
    _rugosa_window_toast (self, why);
}

static void
_rugosa_window_edit_line (RugosaWindow *self,
                          RugosaLine   *line,
                          const char   *property,
                          GVariant     *value)
{
  GParamSpec *pspec = g_object_class_find_property (G_OBJECT_GET_CLASS (line), property);
  g_auto (GValue) v = G_VALUE_INIT;
  g_autofree char *why = NULL;

  if (pspec == NULL)
    {
      g_warning ("The line has no property %s", property);
      return;
    }
  g_value_init (&v, pspec->value_type);
  if (g_variant_is_of_type (value, G_VARIANT_TYPE_DOUBLE))
    g_value_set_double (&v, g_variant_get_double (value));
  else if (g_variant_is_of_type (value, G_VARIANT_TYPE_INT32) && G_VALUE_HOLDS_ENUM (&v))
    g_value_set_enum (&v, g_variant_get_int32 (value));
  else if (g_variant_is_of_type (value, G_VARIANT_TYPE_INT32))
    g_value_set_int (&v, g_variant_get_int32 (value));
  else if (g_variant_is_of_type (value, G_VARIANT_TYPE_STRING))
    g_value_set_string (&v, g_variant_get_string (value, NULL));
  else if (g_variant_is_of_type (value, G_VARIANT_TYPE ("ms")))
    {
      g_autoptr (GVariant) inner = g_variant_get_maybe (value);
      g_value_set_string (&v, inner ? g_variant_get_string (inner, NULL) : NULL);
    }
  else
    g_value_set_variant (&v, value);

  /* Out of the row's range (the panel's entries check it already; other
   * senders may not): refuse before the model warns, in the row's words
   * and the project's unit. */
  {
    const RugosaField *row = rugosa_field_find (property);

    if (row != NULL && row->kind == RUGOSA_FIELD_NUMBER)
      {
        RgError err = { 0 };
        RugosaSettings *ps = rugosa_project_get_settings (self->project);

        if (!rugosa_field_in_range (row, g_value_get_double (&v), rugosa_settings_get_unit (ps, row->display), &err))
          {
            _rugosa_window_refuse (self, property, err.text);
            return;
          }
      }
    else if (g_param_value_validate (pspec, &v))
      {
        why = g_strdup_printf (_("Not an accepted value for %s."),
                               row ? rugosa_field_label (row) : property);
        _rugosa_window_refuse (self, property, why);
        return;
      }
  }

  /* A value the core cannot evaluate leaves the last valid one in force,
   * so the chart and the table never lose the line. */
  if (_rugosa_window_line_ok (self, line) && !_rugosa_window_trial (self, line, property, &v, &why))
    {
      _rugosa_window_refuse (self, property, why);
      return;
    }

  rugosa_history_set_value (self->history, line, property, &v);
  rugosa_history_break_merge (self->history);
}

/* --- line actions ---------------------------------------------------- */

static void
_rugosa_window_line_add (GtkWidget  *widget,
                         const char *action_name,
                         GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  guint n = rugosa_project_get_n_lines (self->project);
  g_autofree char *name = g_strdup_printf (_("Line option %u"), n + 1);
  g_autoptr (RugosaLine) line = rugosa_line_new (name);
  RugosaLine *selected = _rugosa_window_selected_line (self);

  /* A new option starts as a copy of the selected one's fluid and run,
   * which is what one usually compares against. */
  if (selected != NULL)
    {
      g_clear_object (&line);
      line = rugosa_line_duplicate (selected);
      rugosa_line_set_name (line, name);
    }
  g_object_set (line, "colour", line_palette[n % G_N_ELEMENTS (line_palette)], NULL);
  rugosa_history_add_line (self->history, n, line);
  gtk_single_selection_set_selected (self->selection, n);
}

static void
_rugosa_window_line_duplicate (GtkWidget  *widget,
                               const char *action_name,
                               GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  guint pos = gtk_single_selection_get_selected (self->selection);
  guint n = rugosa_project_get_n_lines (self->project);
  RugosaLine *copy;

  if (pos == GTK_INVALID_LIST_POSITION)
    return;
  rugosa_history_begin_group (self->history, _("Duplicate line"));
  copy = rugosa_history_duplicate_line (self->history, pos);
  if (copy)
    rugosa_history_set (self->history, copy, "colour", line_palette[n % G_N_ELEMENTS (line_palette)], NULL);
  rugosa_history_end_group (self->history);
  gtk_single_selection_set_selected (self->selection, pos + 1);
}

static void
_rugosa_window_line_delete (GtkWidget  *widget,
                            const char *action_name,
                            GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  guint pos = gtk_single_selection_get_selected (self->selection);
  guint n;

  if (pos == GTK_INVALID_LIST_POSITION)
    return;
  rugosa_history_remove_line (self->history, pos);
  n = rugosa_project_get_n_lines (self->project);
  if (n > 0)
    gtk_single_selection_set_selected (self->selection, MIN (pos, n - 1));
  _rugosa_window_toast (self, _("Line deleted. Ctrl+Z brings it back."));
}

static void
_rugosa_window_line_move (GtkWidget  *widget,
                          const char *action_name,
                          GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  guint pos = gtk_single_selection_get_selected (self->selection);
  int step = g_str_equal (action_name, "win.line-move-up") ? -1 : 1;
  guint n = rugosa_project_get_n_lines (self->project);
  int to;

  if (pos == GTK_INVALID_LIST_POSITION)
    return;
  to = (int) pos + step;
  if (to < 0 || to >= (int) n)
    return;
  rugosa_history_move_line (self->history, pos, to);
  gtk_single_selection_set_selected (self->selection, to);
}

static void
_rugosa_window_line_rename (GtkWidget  *widget,
                            const char *action_name,
                            GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  GtkWidget *w = GTK_WIDGET (self->line_panel);

  /* The name field is the first entry of the panel. */
  w = gtk_widget_get_first_child (gtk_widget_get_first_child (w));
  while (w && !GTK_IS_ENTRY (w))
    w = gtk_widget_get_next_sibling (w);
  if (w)
    gtk_widget_grab_focus (w);
}

static void
_rugosa_window_undo (GtkWidget  *widget,
                     const char *action_name,
                     GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  rugosa_history_undo (self->history);
}

static void
_rugosa_window_redo (GtkWidget  *widget,
                     const char *action_name,
                     GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  rugosa_history_redo (self->history);
}

/* One settings window a project window, brought back when asked again. */
static void
_rugosa_window_project_settings (GtkWidget  *widget,
                                 const char *action_name,
                                 GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);

  if (self->project_settings == NULL)
    {
      self->project_settings = GTK_WINDOW (rugosa_project_settings_window_new (self->history, self->settings));
      gtk_window_set_transient_for (self->project_settings, GTK_WINDOW (self));
      gtk_window_set_destroy_with_parent (self->project_settings, TRUE);
      g_object_add_weak_pointer (G_OBJECT (self->project_settings), (gpointer *) &self->project_settings);
    }
  gtk_window_present (self->project_settings);
}

static void
_rugosa_window_age_step (GtkWidget  *widget,
                         const char *action_name,
                         GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  gtk_adjustment_set_value (self->age_adjustment,
                            gtk_adjustment_get_value (self->age_adjustment) + g_variant_get_int32 (param));
}

static void
_rugosa_window_history_changed (RugosaWindow *self)
{
  _rugosa_window_update_actions (self);
}

static void
_rugosa_window_items_changed (RugosaWindow *self,
                              guint         position,
                              guint         removed,
                              guint         added)
{
  /* An undo that brings a line back selects it. */
  if (added == 1 && removed == 0)
    gtk_single_selection_set_selected (self->selection, position);
}

/* --- a new project ------------------------------------------------------ */

/* A new project starts from the preferences (rugosa-seed.h) and one line
 * option; nothing else reads them, so an open project keeps its own. */
static void
_rugosa_window_fill_new_project (RugosaWindow *self)
{
  g_autoptr (RugosaLine) line = rugosa_line_new (_("Line option 1"));

  g_object_set (line, "colour", line_palette[0], NULL);
  rugosa_seed_settings (self->settings, rugosa_project_get_settings (self->project));
  rugosa_project_insert_line (self->project, 0, line);
}

/* --- the chart area's views ----------------------------------------- */

/* The views beside the friction chart, one page each, named and titled
 * as the chart engine names them. */
static void
_rugosa_window_add_views (RugosaWindow *self)
{
  gtk_stack_page_set_name (self->friction_page, rugosa_chart_view_id (RUGOSA_CHART_VIEW_FRICTION));
  gtk_stack_page_set_title (self->friction_page, rugosa_chart_view_title (RUGOSA_CHART_VIEW_FRICTION));
  for (int v = 0; v < RUGOSA_CHART_N_VIEWS; v++)
    {
      GtkWidget *view;

      if (v == RUGOSA_CHART_VIEW_FRICTION)
        continue;
      view = g_object_new (RUGOSA_TYPE_PLOT_VIEW, "view-id", rugosa_chart_view_id ((RugosaChartView) v), NULL);
      self->plot_views[v] = RUGOSA_PLOT_VIEW (view);
      gtk_stack_add_titled (self->chart_stack, view, rugosa_chart_view_id ((RugosaChartView) v),
                            rugosa_chart_view_title ((RugosaChartView) v));
      rugosa_plot_view_set_project (self->plot_views[v], self->project, self->settings);
      rugosa_plot_view_set_selection (self->plot_views[v], self->selection);
      rugosa_plot_view_set_visibility (self->plot_views[v], self->visibility);
    }
}

RugosaChartView
_rugosa_window_chart_view (RugosaWindow *self)
{
  RugosaChartView view = RUGOSA_CHART_VIEW_FRICTION;

  if (!rugosa_chart_view_from_id (gtk_stack_get_visible_child_name (self->chart_stack), &view))
    view = RUGOSA_CHART_VIEW_FRICTION;
  return view;
}

/* --- object ---------------------------------------------------------- */

static gboolean
_rugosa_window_probe_visible (GBinding     *binding,
                              const GValue *from,
                              GValue       *to,
                              gpointer      user_data)
{
  g_value_set_boolean (to, g_value_get_string (from) != NULL);
  return TRUE;
}

static void
_rugosa_window_setup (RugosaWindow *self)
{
  GtkApplication *app = gtk_window_get_application (GTK_WINDOW (self));

  self->settings = rugosa_application_get_settings (RUGOSA_APPLICATION (app));
  g_settings_bind (self->settings, "service-age-max", self->age_adjustment, "upper", G_SETTINGS_BIND_GET);
  g_settings_bind (self->settings, "window-width", self, "default-width", G_SETTINGS_BIND_GET_NO_CHANGES);
  g_settings_bind (self->settings, "window-height", self, "default-height", G_SETTINGS_BIND_GET_NO_CHANGES);
  /* Maximized over the size above, which unmaximizing comes back to. */
  g_settings_bind (self->settings, "window-maximized", self, "maximized", G_SETTINGS_BIND_GET_NO_CHANGES);

  self->project = rugosa_project_new ();
  self->history = rugosa_history_new (self->project);
  _rugosa_window_fill_new_project (self);
  self->selection = gtk_single_selection_new (g_object_ref (G_LIST_MODEL (self->project)));
  gtk_single_selection_set_autoselect (self->selection, TRUE);
  gtk_single_selection_set_can_unselect (self->selection, FALSE);

  self->visibility = rugosa_visibility_new (self->selection);
  rugosa_line_list_set_context (self->line_list, self->project, self->selection,
                                self->visibility);

  rugosa_canvas_set_project (self->canvas, self->project);
  rugosa_canvas_set_selection (self->canvas, self->selection);
  rugosa_canvas_set_visibility (self->canvas, self->visibility);
  /* the table lists the lines the chart draws */
  rugosa_results_table_set_context (self->results_table, self->project,
                                    rugosa_visibility_drawn_selection (self->visibility, self->project));
  rugosa_line_panel_set_context (self->line_panel, self->project);
  rugosa_cost_group_set_project (self->cost_group, self->project);
  _rugosa_window_add_views (self);
  g_object_bind_property (self->canvas, "probe-text", self->probe_label, "label", G_BINDING_DEFAULT);
  g_object_bind_property_full (self->canvas, "probe-text", self->probe_label, "visible", G_BINDING_DEFAULT,
                               _rugosa_window_probe_visible, NULL, NULL, NULL);

  g_signal_connect_object (self->canvas, "notify::probe-text", G_CALLBACK (_rugosa_window_probe_moved), self, G_CONNECT_SWAPPED);
  g_signal_connect_object (self->project, "changed", G_CALLBACK (_rugosa_window_project_changed), self, G_CONNECT_SWAPPED);
  g_signal_connect_object (self->project, "items-changed", G_CALLBACK (_rugosa_window_items_changed), self, G_CONNECT_SWAPPED | G_CONNECT_AFTER);
  g_signal_connect_object (self->selection, "notify::selected", G_CALLBACK (_rugosa_window_selection_changed), self, G_CONNECT_SWAPPED);
  g_signal_connect_object (self->history, "notify::can-undo", G_CALLBACK (_rugosa_window_history_changed), self, G_CONNECT_SWAPPED);
  g_signal_connect_object (self->history, "notify::can-redo", G_CALLBACK (_rugosa_window_history_changed), self, G_CONNECT_SWAPPED);

  /* before the files' close guard: a window closed while presenting
   * keeps the size it had before */
  _rugosa_window_present_init (self);
  _rugosa_window_files_init (self);
  _rugosa_window_edits_init (self);
  _rugosa_window_project_replaced (self);
  self->modified = FALSE;
  _rugosa_window_update_title (self);
  _rugosa_window_apply_actions (self);
}

static void
rugosa_window_dispose (GObject *object)
{
  RugosaWindow *self = RUGOSA_WINDOW (object);

  _rugosa_window_files_dispose (self);
  _rugosa_window_present_dispose (self);
  if (self->project_settings != NULL)
    {
      g_object_remove_weak_pointer (G_OBJECT (self->project_settings), (gpointer *) &self->project_settings);
      gtk_window_destroy (self->project_settings);
      self->project_settings = NULL;
    }
  g_clear_handle_id (&self->actions_source, g_source_remove);
  if (self->canvas)
    rugosa_canvas_set_selection (self->canvas, NULL);
  for (int v = 0; v < RUGOSA_CHART_N_VIEWS; v++)
    if (self->plot_views[v] != NULL)
      {
        rugosa_plot_view_set_selection (self->plot_views[v], NULL);
        self->plot_views[v] = NULL;
      }
  gtk_widget_dispose_template (GTK_WIDGET (self), RUGOSA_TYPE_WINDOW);
  g_clear_object (&self->visibility);
  g_clear_object (&self->selection);
  g_clear_object (&self->history);
  g_clear_object (&self->project);
  g_clear_object (&self->file);
  g_clear_pointer (&self->autosave_id, g_free);
  G_OBJECT_CLASS (rugosa_window_parent_class)->dispose (object);
}

static void
rugosa_window_class_init (RugosaWindowClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = rugosa_window_dispose;

  g_type_ensure (RUGOSA_TYPE_CANVAS);
  g_type_ensure (RUGOSA_TYPE_LINE_LIST);
  g_type_ensure (RUGOSA_TYPE_LINE_PANEL);
  g_type_ensure (RUGOSA_TYPE_RESULTS_TABLE);
  g_type_ensure (RUGOSA_TYPE_COST_GROUP);

  gtk_widget_class_set_template_from_resource (widget_class, "/org/rugosa/Rugosa/rugosa-window.ui");
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, window_title);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, toast_overlay);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, line_list);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, canvas);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, probe_label);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, age_scale);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, age_adjustment);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, age_label);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, age_change_label);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, results_table);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, line_panel);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, primary_menu_button);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, recent_section);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, chart_stack);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, friction_page);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, cost_group);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_window_place_probe);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_window_age_changed);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_window_edit_line);

  gtk_widget_class_install_action (widget_class, "win.undo", NULL, _rugosa_window_undo);
  gtk_widget_class_install_action (widget_class, "win.redo", NULL, _rugosa_window_redo);
  gtk_widget_class_install_action (widget_class, "win.line-add", NULL, _rugosa_window_line_add);
  gtk_widget_class_install_action (widget_class, "win.line-duplicate", NULL, _rugosa_window_line_duplicate);
  gtk_widget_class_install_action (widget_class, "win.line-delete", NULL, _rugosa_window_line_delete);
  gtk_widget_class_install_action (widget_class, "win.line-move-up", NULL, _rugosa_window_line_move);
  gtk_widget_class_install_action (widget_class, "win.line-move-down", NULL, _rugosa_window_line_move);
  gtk_widget_class_install_action (widget_class, "win.line-rename", NULL, _rugosa_window_line_rename);
  gtk_widget_class_install_action (widget_class, "win.age-step", "i", _rugosa_window_age_step);
  gtk_widget_class_install_action (widget_class, "win.project-settings", NULL, _rugosa_window_project_settings);

  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_F2, 0, "win.line-rename", NULL);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_Up, GDK_ALT_MASK, "win.line-move-up", NULL);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_Down, GDK_ALT_MASK, "win.line-move-down", NULL);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_Delete, GDK_CONTROL_MASK, "win.line-delete", NULL);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_bracketright, GDK_CONTROL_MASK, "win.age-step", "i", 1);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_bracketleft, GDK_CONTROL_MASK, "win.age-step", "i", -1);

  _rugosa_window_files_class_init (widget_class);
  _rugosa_window_output_class_init (widget_class);
  _rugosa_window_edits_class_init (widget_class);
  _rugosa_window_sizing_class_init (widget_class);
  _rugosa_window_present_class_init (widget_class);
}

static void
rugosa_window_init (RugosaWindow *self)
{
  gtk_widget_init_template (GTK_WIDGET (self));
  if (g_str_has_suffix (APPLICATION_ID, ".Devel"))
    gtk_widget_add_css_class (GTK_WIDGET (self), "devel");
}
