/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Presentation: the friction chart alone, full screen, in type and markers
 * for a projector (rugosa-canvas.c has the rule), with the service-age
 * slider large under it, driven from the keyboard:
 *
 *   1–9   show or hide the line of that number in the list
 *   0     every line shown (and "only the selected line" off)
 *   Up Down, ] [           the service age a year older or younger
 *                          (Shift: a page of the slider, five years)
 *   Left Right, Page Up/Down  the previous or next line drawn
 *   ? F1  the key hint shown or hidden (it fades by itself)
 *   Esc F5  back to the window as it was
 *
 * A view only: the service age, the lines shown and the selection are the
 * window's way of reading the project, never an edit (no undo step, no
 * modified mark), and every one of them, the window's size, full-screen
 * and maximized state, its panels and their dividers, the chart area's
 * view and the focus come back as they were on leaving.  The actions that
 * edit or replace the project are disabled meanwhile.
 *
 * Cost: entering and leaving touch each line once (the visibility kept
 * and given back), O(n) in the number of lines; a key touches one line,
 * or steps over the hidden ones to the next drawn. */
#define G_LOG_DOMAIN "rugosa-window"

#include "config.h"

#include "rugosa-window-private.h"

/* Seconds the key hint stays before it fades. */
#define HINT_SECONDS 8
/* Frames over which the dividers are put back while the window returns to
 * its size (a window manager answers the full-screen request a few frames
 * later; without one the size never changes).  GtkPaned's own arithmetic
 * mostly brings them back by itself, but a divider between two children
 * that both resize is scaled in proportion and rounded each way: the
 * saved positions make it exact. */
#define RESTORE_FRAMES 30

/* The actions that edit the project or replace it. */
static const char *const locked_actions[] = {
  "win.undo", "win.redo", "win.line-add", "win.line-duplicate", "win.line-delete",
  "win.line-move-up", "win.line-move-down", "win.line-rename", "win.project-settings",
  "win.size-pipe", "win.new", "win.open", "win.open-recent", "win.apply-part",
};

struct _RugosaPresentation
{
  gboolean    fullscreen, maximized;
  int         width, height;
  int         outer, inner, centre;     /* paned positions */
  gboolean    header, sidebar, panel, results, switcher;
  char       *view;                     /* the chart area's page */
  RugosaLine *selected;                 /* owned */
  GtkWidget  *focus;                    /* weak */
  double      service_age;
  GPtrArray  *shown, *hidden;           /* of RugosaLine, owned */
  gboolean    only_selected;
};

gboolean
rugosa_window_get_presenting (RugosaWindow *self)
{
  g_return_val_if_fail (RUGOSA_IS_WINDOW (self), FALSE);
  return self->presentation != NULL;
}

static void
_rugosa_presentation_free (RugosaPresentation *p)
{
  if (p->focus != NULL)
    g_object_remove_weak_pointer (G_OBJECT (p->focus), (gpointer *) &p->focus);
  g_clear_object (&p->selected);
  g_clear_pointer (&p->shown, g_ptr_array_unref);
  g_clear_pointer (&p->hidden, g_ptr_array_unref);
  g_free (p->view);
  g_free (p);
}

/* Called by the one update of the actions' state while presenting. */
void
_rugosa_window_present_lock_actions (RugosaWindow *self)
{
  if (self->presentation == NULL)
    return;
  for (gsize i = 0; i < G_N_ELEMENTS (locked_actions); i++)
    gtk_widget_action_set_enabled (GTK_WIDGET (self), locked_actions[i], FALSE);
}

/* --- the key hint ------------------------------------------------------ */

static gboolean
_rugosa_window_hint_due (gpointer user_data)
{
  RugosaWindow *self = RUGOSA_WINDOW (user_data);

  self->hint_source = 0;
  gtk_revealer_set_reveal_child (self->present_hint, FALSE);
  return G_SOURCE_REMOVE;
}

static void
_rugosa_window_show_hint (RugosaWindow *self,
                          gboolean      shown)
{
  g_clear_handle_id (&self->hint_source, g_source_remove);
  gtk_revealer_set_reveal_child (self->present_hint, shown);
  if (shown)
    self->hint_source = g_timeout_add_seconds (HINT_SECONDS, _rugosa_window_hint_due, self);
}

/* --- what the keys do ---------------------------------------------------- */

/* Line `number` of the list (1-based) shown or hidden; FALSE when there
 * is no such line. */
gboolean
rugosa_window_present_toggle_line (RugosaWindow *self,
                                   guint         number)
{
  RugosaLine *line;

  g_return_val_if_fail (RUGOSA_IS_WINDOW (self), FALSE);
  if (number == 0 || number > rugosa_project_get_n_lines (self->project))
    return FALSE;
  line = rugosa_project_get_line (self->project, number - 1);
  /* asked for by number: the line must be able to show */
  rugosa_visibility_set_only_selected (self->visibility, FALSE);
  rugosa_visibility_set_shown (self->visibility, line, !rugosa_visibility_get_shown (self->visibility, line));
  return TRUE;
}

static void
_rugosa_window_show_every_line (RugosaWindow *self)
{
  rugosa_visibility_set_only_selected (self->visibility, FALSE);
  rugosa_visibility_set_shown_all (self->visibility, G_LIST_MODEL (self->project), TRUE);
}

/* The next (step 1) or previous (-1) line drawn on the chart, around the
 * end of the list. */
static void
_rugosa_window_step_line (RugosaWindow *self,
                          int           step)
{
  guint n = rugosa_project_get_n_lines (self->project);
  guint pos = gtk_single_selection_get_selected (self->selection);

  if (n == 0)
    return;
  if (pos == GTK_INVALID_LIST_POSITION)
    pos = step > 0 ? n - 1 : 0;
  for (guint k = 1; k <= n; k++)
    {
      guint at = (guint) (((int) pos + (int) n + step * (int) k) % (int) n);
      RugosaLine *line = rugosa_project_get_line (self->project, at);

      if (rugosa_visibility_get_shown (self->visibility, line))
        {
          gtk_single_selection_set_selected (self->selection, at);
          return;
        }
    }
}

static void
_rugosa_window_step_age (RugosaWindow *self,
                         int           years)
{
  gtk_widget_activate_action (GTK_WIDGET (self), "win.age-step", "i", years);
}

static gboolean
_rugosa_window_present_key (GtkEventControllerKey *controller,
                            guint                  keyval,
                            guint                  keycode,
                            GdkModifierType        state,
                            RugosaWindow          *self)
{
  int page, age_step;

  if (self->presentation == NULL
      || (state & (GDK_CONTROL_MASK | GDK_ALT_MASK | GDK_SUPER_MASK | GDK_META_MASK)))
    return FALSE;
  /* a year, or with Shift a page of the slider in whole years */
  page = MAX (1, (int) gtk_adjustment_get_page_increment (self->age_adjustment));
  age_step = (state & GDK_SHIFT_MASK) ? page : 1;
  switch (keyval)
    {
    case GDK_KEY_Escape:
    case GDK_KEY_F5:
      rugosa_window_set_presenting (self, FALSE);
      return TRUE;
    case GDK_KEY_question:
    case GDK_KEY_F1:
      _rugosa_window_show_hint (self, !gtk_revealer_get_reveal_child (self->present_hint));
      return TRUE;
    case GDK_KEY_0:
    case GDK_KEY_KP_0:
      _rugosa_window_show_every_line (self);
      return TRUE;
    case GDK_KEY_Up:
    case GDK_KEY_KP_Up:
    case GDK_KEY_bracketright:
      _rugosa_window_step_age (self, age_step);
      return TRUE;
    case GDK_KEY_Down:
    case GDK_KEY_KP_Down:
    case GDK_KEY_bracketleft:
      _rugosa_window_step_age (self, -age_step);
      return TRUE;
    case GDK_KEY_Left:
    case GDK_KEY_KP_Left:
    case GDK_KEY_Page_Up:
    case GDK_KEY_KP_Page_Up:
      _rugosa_window_step_line (self, -1);
      return TRUE;
    case GDK_KEY_Right:
    case GDK_KEY_KP_Right:
    case GDK_KEY_Page_Down:
    case GDK_KEY_KP_Page_Down:
      _rugosa_window_step_line (self, 1);
      return TRUE;
    default:
      break;
    }
  if (keyval >= GDK_KEY_1 && keyval <= GDK_KEY_9)
    {
      if (!rugosa_window_present_toggle_line (self, keyval - GDK_KEY_0))
        gtk_widget_error_bell (GTK_WIDGET (self));
      return TRUE;
    }
  if (keyval >= GDK_KEY_KP_1 && keyval <= GDK_KEY_KP_9)
    {
      if (!rugosa_window_present_toggle_line (self, keyval - GDK_KEY_KP_0))
        gtk_widget_error_bell (GTK_WIDGET (self));
      return TRUE;
    }
  return FALSE;
}

/* --- entering and leaving ----------------------------------------------- */

static void
_rugosa_window_put_dividers (RugosaWindow *self)
{
  RugosaPresentation *p = self->restoring;

  gtk_paned_set_position (self->outer_paned, p->outer);
  gtk_paned_set_position (self->inner_paned, p->inner);
  gtk_paned_set_position (self->centre_paned, p->centre);
}

static void
_rugosa_window_restore_done (RugosaWindow *self)
{
  if (self->restore_tick != 0)
    gtk_widget_remove_tick_callback (GTK_WIDGET (self), self->restore_tick);
  self->restore_tick = 0;
  g_clear_pointer (&self->restoring, _rugosa_presentation_free);
}

/* The dividers follow the window's size: put them back each frame in
 * which the size has changed, until the window has settled. */
static gboolean
_rugosa_window_restore_tick (GtkWidget     *widget,
                             GdkFrameClock *clock,
                             gpointer       user_data)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  int w = gtk_widget_get_width (widget), h = gtk_widget_get_height (widget);

  if (w != self->restore_width || h != self->restore_height)
    {
      self->restore_width = w;
      self->restore_height = h;
      _rugosa_window_put_dividers (self);
    }
  if (++self->restore_frames < RESTORE_FRAMES)
    return G_SOURCE_CONTINUE;
  self->restore_tick = 0;
  g_clear_pointer (&self->restoring, _rugosa_presentation_free);
  return G_SOURCE_REMOVE;
}

/* Marks along the slider for the room to read the age between its ends:
 * every ten years (the unit is in the large value beside it). */
static void
_rugosa_window_mark_ages (RugosaWindow *self)
{
  double upper = gtk_adjustment_get_upper (self->age_adjustment);

  for (double years = 0; years <= upper + 1e-9; years += 10)
    {
      g_autofree char *text = g_strdup_printf ("%.0f", years);

      gtk_scale_add_mark (self->age_scale, years, GTK_POS_BOTTOM, text);
    }
}

static void
_rugosa_window_present_enter (RugosaWindow *self)
{
  RugosaPresentation *p = g_new0 (RugosaPresentation, 1);
  GtkWidget *focus = gtk_root_get_focus (GTK_ROOT (self));
  guint n = rugosa_project_get_n_lines (self->project);

  /* a quick F5 F5: the last leaving is over */
  _rugosa_window_restore_done (self);
  /* The project's other windows (its settings, the sizing assistant)
   * edit it, and editing is off while presenting: they close. */
  {
    GList *tops = gtk_window_list_toplevels ();

    for (GList *l = tops; l != NULL; l = l->next)
      if (l->data != (gpointer) self && gtk_window_get_transient_for (l->data) == GTK_WINDOW (self))
        gtk_window_close (l->data);
    g_list_free (tops);
  }

  p->fullscreen = gtk_window_is_fullscreen (GTK_WINDOW (self));
  p->maximized = gtk_window_is_maximized (GTK_WINDOW (self));
  gtk_window_get_default_size (GTK_WINDOW (self), &p->width, &p->height);
  p->outer = gtk_paned_get_position (self->outer_paned);
  p->inner = gtk_paned_get_position (self->inner_paned);
  p->centre = gtk_paned_get_position (self->centre_paned);
  p->header = gtk_widget_get_visible (self->header_bar);
  p->sidebar = gtk_widget_get_visible (self->sidebar);
  p->panel = gtk_widget_get_visible (self->panel_scroller);
  p->results = gtk_widget_get_visible (GTK_WIDGET (self->results_table));
  p->switcher = gtk_widget_get_visible (self->view_switcher);
  p->view = g_strdup (gtk_stack_get_visible_child_name (self->chart_stack));
  p->selected = gtk_single_selection_get_selected_item (self->selection);
  if (p->selected != NULL)
    g_object_ref (p->selected);
  if (focus != NULL)
    {
      p->focus = focus;
      g_object_add_weak_pointer (G_OBJECT (focus), (gpointer *) &p->focus);
    }
  p->service_age = rugosa_settings_get_double (rugosa_project_get_settings (self->project), "service-age");
  p->only_selected = rugosa_visibility_get_only_selected (self->visibility);
  p->shown = g_ptr_array_new_with_free_func (g_object_unref);
  p->hidden = g_ptr_array_new_with_free_func (g_object_unref);
  for (guint i = 0; i < n; i++)
    {
      RugosaLine *line = rugosa_project_get_line (self->project, i);

      g_ptr_array_add (rugosa_visibility_get_shown (self->visibility, line) ? p->shown : p->hidden,
                       g_object_ref (line));
    }
  self->presentation = p;

  gtk_widget_add_css_class (GTK_WIDGET (self), "presenting");
  gtk_widget_set_visible (self->header_bar, FALSE);
  gtk_widget_set_visible (self->sidebar, FALSE);
  gtk_widget_set_visible (self->panel_scroller, FALSE);
  gtk_widget_set_visible (GTK_WIDGET (self->results_table), FALSE);
  gtk_widget_set_visible (self->view_switcher, FALSE);
  gtk_stack_set_visible_child_name (self->chart_stack, rugosa_chart_view_id (RUGOSA_CHART_VIEW_FRICTION));
  rugosa_canvas_set_projector (self->canvas, TRUE);
  _rugosa_window_mark_ages (self);
  gtk_widget_set_visible (GTK_WIDGET (self->present_hint), TRUE);
  _rugosa_window_show_hint (self, TRUE);
  _rugosa_window_present_lock_actions (self);
  gtk_window_fullscreen (GTK_WINDOW (self));
  gtk_widget_grab_focus (GTK_WIDGET (self->canvas));
}

static void
_rugosa_window_present_leave (RugosaWindow *self)
{
  RugosaPresentation *p = self->presentation;
  g_autoptr (GListStore) shown = g_list_store_new (RUGOSA_TYPE_LINE);
  g_autoptr (GListStore) hidden = g_list_store_new (RUGOSA_TYPE_LINE);
  guint pos;

  self->presentation = NULL;

  if (!p->fullscreen)
    gtk_window_unfullscreen (GTK_WINDOW (self));
  if (p->maximized)
    gtk_window_maximize (GTK_WINDOW (self));
  else
    gtk_window_set_default_size (GTK_WINDOW (self), p->width, p->height);

  g_clear_handle_id (&self->hint_source, g_source_remove);
  gtk_revealer_set_reveal_child (self->present_hint, FALSE);
  gtk_widget_set_visible (GTK_WIDGET (self->present_hint), FALSE);
  rugosa_canvas_set_projector (self->canvas, FALSE);
  gtk_scale_clear_marks (self->age_scale);
  gtk_widget_remove_css_class (GTK_WIDGET (self), "presenting");
  gtk_widget_set_visible (self->header_bar, p->header);
  gtk_widget_set_visible (self->sidebar, p->sidebar);
  gtk_widget_set_visible (self->panel_scroller, p->panel);
  gtk_widget_set_visible (GTK_WIDGET (self->results_table), p->results);
  gtk_widget_set_visible (self->view_switcher, p->switcher);
  if (p->view != NULL)
    gtk_stack_set_visible_child_name (self->chart_stack, p->view);

  /* the view as it was: lines shown, service age, selection */
  for (guint i = 0; i < p->shown->len; i++)
    g_list_store_append (shown, g_ptr_array_index (p->shown, i));
  for (guint i = 0; i < p->hidden->len; i++)
    g_list_store_append (hidden, g_ptr_array_index (p->hidden, i));
  rugosa_visibility_set_shown_all (self->visibility, G_LIST_MODEL (shown), TRUE);
  rugosa_visibility_set_shown_all (self->visibility, G_LIST_MODEL (hidden), FALSE);
  rugosa_visibility_set_only_selected (self->visibility, p->only_selected);
  gtk_adjustment_set_value (self->age_adjustment, p->service_age);
  for (pos = 0; p->selected != NULL && pos < rugosa_project_get_n_lines (self->project); pos++)
    if (rugosa_project_get_line (self->project, pos) == p->selected)
      {
        gtk_single_selection_set_selected (self->selection, pos);
        break;
      }

  for (gsize i = 0; i < G_N_ELEMENTS (locked_actions); i++)
    gtk_widget_action_set_enabled (GTK_WIDGET (self), locked_actions[i], TRUE);
  _rugosa_window_apply_actions (self);

  if (p->focus != NULL && gtk_widget_get_mapped (p->focus))
    gtk_widget_grab_focus (p->focus);

  /* the dividers now, and again while the window finds its size */
  self->restoring = p;
  _rugosa_window_put_dividers (self);
  self->restore_width = gtk_widget_get_width (GTK_WIDGET (self));
  self->restore_height = gtk_widget_get_height (GTK_WIDGET (self));
  self->restore_frames = 0;
  self->restore_tick = gtk_widget_add_tick_callback (GTK_WIDGET (self), _rugosa_window_restore_tick, NULL, NULL);
}

void
rugosa_window_set_presenting (RugosaWindow *self,
                              gboolean      presenting)
{
  g_return_if_fail (RUGOSA_IS_WINDOW (self));

  if (!!presenting == (self->presentation != NULL))
    return;
  if (presenting)
    _rugosa_window_present_enter (self);
  else
    _rugosa_window_present_leave (self);
}

static void
_rugosa_window_present (GtkWidget  *widget,
                        const char *action_name,
                        GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);

  rugosa_window_set_presenting (self, self->presentation == NULL);
}

/* Closing while presenting keeps the window's own size and state for the
 * next session: the window is put back first. */
static gboolean
_rugosa_window_present_close (GtkWindow *window,
                              gpointer   user_data)
{
  rugosa_window_set_presenting (RUGOSA_WINDOW (window), FALSE);
  return FALSE;
}

void
_rugosa_window_present_init (RugosaWindow *self)
{
  GtkEventController *keys = gtk_event_controller_key_new ();

  /* before the focused widget's own keys (the canvas's and the slider's
   * arrows), and only while presenting */
  gtk_event_controller_set_propagation_phase (keys, GTK_PHASE_CAPTURE);
  g_signal_connect (keys, "key-pressed", G_CALLBACK (_rugosa_window_present_key), self);
  gtk_widget_add_controller (GTK_WIDGET (self), keys);
  g_signal_connect (self, "close-request", G_CALLBACK (_rugosa_window_present_close), NULL);
}

void
_rugosa_window_present_dispose (RugosaWindow *self)
{
  g_clear_handle_id (&self->hint_source, g_source_remove);
  _rugosa_window_restore_done (self);
  g_clear_pointer (&self->presentation, _rugosa_presentation_free);
}

void
_rugosa_window_present_class_init (GtkWidgetClass *widget_class)
{
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, header_bar);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, sidebar);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, panel_scroller);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, view_switcher);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, outer_paned);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, inner_paned);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, centre_paned);
  gtk_widget_class_bind_template_child (widget_class, RugosaWindow, present_hint);

  gtk_widget_class_install_action (widget_class, "win.present", NULL, _rugosa_window_present);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_F5, 0, "win.present", NULL);
}
