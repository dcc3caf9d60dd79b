/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-line-list"

#include "config.h"

#include <glib/gi18n.h>

#include "model/rugosa-display.h"
#include "rugosa-line-list-private.h"
#include "rugosa-readout.h"

/* Groups listed in the groups popover; past these the filter finds them. */
#define GROUPS_SHOWN_MAX 200

G_DEFINE_FINAL_TYPE (RugosaLineList, rugosa_line_list, GTK_TYPE_WIDGET)

enum {
  SIGNAL_EDIT_LINE,
  N_SIGNALS
};

static guint signals[N_SIGNALS];

enum {
  PROP_0,
  PROP_N_SELECTED,
  N_PROPS
};

static GParamSpec *properties[N_PROPS];

typedef struct {
  GtkWidget *number, *swatch, *name, *readout, *warn, *pin, *eye;
} Row;

GtkWidget *
rugosa_line_list_new (void)
{
  return g_object_new (RUGOSA_TYPE_LINE_LIST, NULL);
}

static guint
_rugosa_line_list_number (RugosaLineList *self,
                          RugosaLine     *line)
{
  return GPOINTER_TO_UINT (g_hash_table_lookup (self->numbers, line));
}

/* --- the filter ---------------------------------------------------------- */

static gboolean
_rugosa_line_list_contains (const char *text,
                            const char *needle)
{
  g_autofree char *folded = g_utf8_casefold (text, -1);
  return strstr (folded, needle) != NULL;
}

static gboolean
_rugosa_line_list_match (gpointer item,
                         gpointer user_data)
{
  RugosaLineList *self = user_data;
  RugosaLine *line = item;
  const char *t = self->filter_text;
  g_autofree char *group = NULL;
  char *end = NULL;
  guint64 number;

  if (t == NULL)
    return TRUE;
  /* a number finds the line of the chart's numbered marker */
  number = g_ascii_strtoull (t, &end, 10);
  if (end != t && *end == '\0' && number == _rugosa_line_list_number (self, line))
    return TRUE;
  if (_rugosa_line_list_contains (rugosa_line_get_name (line), t))
    return TRUE;
  g_object_get (line, "group", &group, NULL);
  return group != NULL && _rugosa_line_list_contains (group, t);
}

static void
_rugosa_line_list_filter_changed (RugosaLineList *self)
{
  const char *text = gtk_editable_get_text (GTK_EDITABLE (self->filter_entry));
  g_autofree char *stripped = g_strstrip (g_strdup (text));

  g_clear_pointer (&self->filter_text, g_free);
  if (*stripped != '\0')
    self->filter_text = g_utf8_casefold (stripped, -1);
  gtk_filter_changed (GTK_FILTER (self->filter), GTK_FILTER_CHANGE_DIFFERENT);
}

void
rugosa_line_list_set_filter (RugosaLineList *self,
                             const char     *text)
{
  g_return_if_fail (RUGOSA_IS_LINE_LIST (self));
  gtk_editable_set_text (GTK_EDITABLE (self->filter_entry), text ? text : "");
  /* the entry reports a search after a delay: apply it now */
  _rugosa_line_list_filter_changed (self);
}

GListModel *
rugosa_line_list_get_listed (RugosaLineList *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE_LIST (self), NULL);
  return G_LIST_MODEL (self->listed);
}

GtkWidget *
rugosa_line_list_get_view (RugosaLineList *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE_LIST (self), NULL);
  return GTK_WIDGET (self->view);
}

/* --- rows ------------------------------------------------------------------ */

static void
_rugosa_line_list_swatch_draw (GtkDrawingArea *area,
                               cairo_t        *cr,
                               int             width,
                               int             height,
                               gpointer        user_data)
{
  RugosaLine *line = g_object_get_data (G_OBJECT (area), "line");
  GdkRGBA rgba = { 0.5, 0.5, 0.5, 1 };

  if (line)
    gdk_rgba_parse (&rgba, rugosa_line_get_colour (line));
  gdk_cairo_set_source_rgba (cr, &rgba);
  cairo_arc (cr, width / 2.0, height / 2.0, MIN (width, height) / 2.0 - 1, 0, 2 * G_PI);
  cairo_fill (cr);
}

static void
_rugosa_line_list_update_row (RugosaLineList *self,
                              GtkWidget      *widget)
{
  RugosaLine *line = g_object_get_data (G_OBJECT (widget), "line");
  Row *row = g_object_get_data (G_OBJECT (widget), "row");
  const RugosaLineResults *res;
  g_autofree char *warnings = NULL;
  g_autofree char *sub = NULL;
  g_autofree char *group = NULL;
  char number[16];
  gboolean shown, pinned;

  if (line == NULL || self->project == NULL)
    return;
  g_snprintf (number, sizeof number, "%u", _rugosa_line_list_number (self, line));
  if (g_strcmp0 (gtk_label_get_text (GTK_LABEL (row->number)), number) != 0)
    gtk_label_set_text (GTK_LABEL (row->number), number);
  g_object_set_data (G_OBJECT (row->swatch), "line", line);
  gtk_widget_queue_draw (row->swatch);
  if (g_strcmp0 (gtk_label_get_text (GTK_LABEL (row->name)), rugosa_line_get_name (line)) != 0)
    gtk_label_set_text (GTK_LABEL (row->name), rugosa_line_get_name (line));
  /* among several selected lines, the one the panel edits stands out */
  {
    gboolean current = self->n_selected > 1 && self->selection != NULL
                       && gtk_single_selection_get_selected_item (self->selection) == (gpointer) line;

    if (gtk_widget_has_css_class (row->name, "heading") != current)
      {
        if (current)
          gtk_widget_add_css_class (row->name, "heading");
        else
          gtk_widget_remove_css_class (row->name, "heading");
      }
  }

  g_object_get (line, "group", &group, NULL);
  res = rugosa_readout_results (self->project, line);
  if (res && res->ok && res->points[RUGOSA_FLOW_DESIGN].ok)
    {
      const RugosaOperatingPoint *p = &res->points[RUGOSA_FLOW_DESIGN];
      /* in the project's units, as the chart's callouts and the table */
      g_autofree char *v = rugosa_readout_format (self->project, RUGOSA_DISPLAY_VELOCITY,
                                                  p->result.velocity_m_s);
      g_autofree char *h = rugosa_readout_format (self->project, RUGOSA_DISPLAY_HEAD,
                                                  p->result.head_loss_total_m);

      if (group != NULL && *group != '\0')
        /* TRANSLATORS: a row of the line list: group, velocity, head loss */
        sub = g_strdup_printf (_("%s · %s · loss %s"), group, v, h);
      else
        sub = g_strdup_printf (_("%s · loss %s"), v, h);
    }
  else if (group != NULL && *group != '\0')
    /* TRANSLATORS: a row of the line list: group, then why there are no results */
    sub = g_strdup_printf (_("%s · cannot be evaluated"), group);
  else
    sub = g_strdup (_("cannot be evaluated"));
  if (g_strcmp0 (gtk_inscription_get_text (GTK_INSCRIPTION (row->readout)), sub) != 0)
    gtk_inscription_set_text (GTK_INSCRIPTION (row->readout), sub);

  /* the sentences themselves only when the pointer asks (query-tooltip):
   * setting a tooltip at every slider step makes GTK query it again */
  warnings = rugosa_readout_warnings (self->project, line);
  if (gtk_widget_get_visible (row->warn) != (warnings != NULL))
    gtk_widget_set_visible (row->warn, warnings != NULL);

  shown = self->visibility == NULL || rugosa_visibility_get_shown (self->visibility, line);
  pinned = self->visibility != NULL && rugosa_visibility_get_pinned (self->visibility, line);
  self->updating = TRUE;
  gtk_toggle_button_set_active (GTK_TOGGLE_BUTTON (row->eye), shown);
  gtk_toggle_button_set_active (GTK_TOGGLE_BUTTON (row->pin), pinned);
  self->updating = FALSE;
  if (gtk_widget_has_css_class (widget, "line-hidden") == shown)
    {
      gtk_button_set_icon_name (GTK_BUTTON (row->eye), shown ? "view-reveal-symbolic" : "view-conceal-symbolic");
      if (shown)
        gtk_widget_remove_css_class (widget, "line-hidden");
      else
        gtk_widget_add_css_class (widget, "line-hidden");
    }
}

static void
_rugosa_line_list_eye_toggled (GtkToggleButton *button,
                               RugosaLineList  *self)
{
  RugosaLine *line = g_object_get_data (G_OBJECT (button), "line");

  if (self->updating || line == NULL || self->visibility == NULL)
    return;
  rugosa_visibility_set_shown (self->visibility, line, gtk_toggle_button_get_active (button));
}

static void
_rugosa_line_list_pin_toggled (GtkToggleButton *button,
                               RugosaLineList  *self)
{
  RugosaLine *line = g_object_get_data (G_OBJECT (button), "line");

  if (self->updating || line == NULL || self->visibility == NULL)
    return;
  rugosa_visibility_set_pinned (self->visibility, line, gtk_toggle_button_get_active (button));
}


static gboolean
_rugosa_line_list_warn_tooltip (GtkWidget      *warn,
                                int             x,
                                int             y,
                                gboolean        keyboard,
                                GtkTooltip     *tooltip,
                                RugosaLineList *self)
{
  RugosaLine *line = g_object_get_data (G_OBJECT (warn), "line");
  g_autofree char *warnings = NULL;

  if (line == NULL || self->project == NULL)
    return FALSE;
  warnings = rugosa_readout_warnings (self->project, line);
  if (warnings == NULL)
    return FALSE;
  gtk_tooltip_set_text (tooltip, warnings);
  return TRUE;
}

static void
_rugosa_line_list_row_setup (GtkSignalListItemFactory *factory,
                             GtkListItem              *item,
                             RugosaLineList           *self)
{
  GtkWidget *box = gtk_box_new (GTK_ORIENTATION_HORIZONTAL, 6);
  GtkWidget *texts = gtk_box_new (GTK_ORIENTATION_VERTICAL, 0);
  Row *row = g_new0 (Row, 1);

  row->number = gtk_label_new (NULL);
  gtk_label_set_width_chars (GTK_LABEL (row->number), 4);
  gtk_label_set_xalign (GTK_LABEL (row->number), 1);
  gtk_widget_add_css_class (row->number, "dim-label");
  gtk_widget_add_css_class (row->number, "numeric");
  gtk_widget_add_css_class (row->number, "line-row-number");

  row->swatch = gtk_drawing_area_new ();
  gtk_drawing_area_set_content_width (GTK_DRAWING_AREA (row->swatch), 14);
  gtk_drawing_area_set_content_height (GTK_DRAWING_AREA (row->swatch), 14);
  gtk_drawing_area_set_draw_func (GTK_DRAWING_AREA (row->swatch), _rugosa_line_list_swatch_draw, NULL, NULL);
  gtk_widget_set_valign (row->swatch, GTK_ALIGN_CENTER);

  row->name = gtk_label_new (NULL);
  gtk_label_set_xalign (GTK_LABEL (row->name), 0);
  gtk_label_set_ellipsize (GTK_LABEL (row->name), PANGO_ELLIPSIZE_END);
  /* An inscription: its text changes with every slider move, its size
   * does not. */
  row->readout = gtk_inscription_new (NULL);
  gtk_inscription_set_text_overflow (GTK_INSCRIPTION (row->readout), GTK_INSCRIPTION_OVERFLOW_ELLIPSIZE_END);
  gtk_inscription_set_nat_chars (GTK_INSCRIPTION (row->readout), 24);
  gtk_widget_add_css_class (row->readout, "dim-label");
  gtk_widget_add_css_class (row->readout, "line-row-readout");
  gtk_widget_set_hexpand (texts, TRUE);
  gtk_box_append (GTK_BOX (texts), row->name);
  gtk_box_append (GTK_BOX (texts), row->readout);

  row->warn = gtk_image_new_from_icon_name ("dialog-warning-symbolic");
  gtk_widget_set_has_tooltip (row->warn, TRUE);
  g_signal_connect (row->warn, "query-tooltip", G_CALLBACK (_rugosa_line_list_warn_tooltip), self);
  gtk_widget_add_css_class (row->warn, "warning");
  gtk_widget_set_valign (row->warn, GTK_ALIGN_CENTER);

  row->pin = gtk_toggle_button_new ();
  gtk_button_set_icon_name (GTK_BUTTON (row->pin), "view-pin-symbolic");
  gtk_widget_set_tooltip_text (row->pin, _("Pin: always label this line on the chart"));
  row->eye = gtk_toggle_button_new ();
  gtk_button_set_icon_name (GTK_BUTTON (row->eye), "view-reveal-symbolic");
  gtk_widget_set_tooltip_text (row->eye, _("Show this line on the chart and in the table"));
  for (GtkWidget **b = (GtkWidget *[]) { row->pin, row->eye, NULL }; *b != NULL; b++)
    {
      gtk_widget_add_css_class (*b, "flat");
      gtk_widget_add_css_class (*b, "line-row-toggle");
      gtk_widget_set_valign (*b, GTK_ALIGN_CENTER);
      gtk_widget_set_focus_on_click (*b, FALSE);
    }
  g_signal_connect (row->eye, "toggled", G_CALLBACK (_rugosa_line_list_eye_toggled), self);
  g_signal_connect (row->pin, "toggled", G_CALLBACK (_rugosa_line_list_pin_toggled), self);

  gtk_box_append (GTK_BOX (box), row->number);
  gtk_box_append (GTK_BOX (box), row->swatch);
  gtk_box_append (GTK_BOX (box), texts);
  gtk_box_append (GTK_BOX (box), row->warn);
  gtk_box_append (GTK_BOX (box), row->pin);
  gtk_box_append (GTK_BOX (box), row->eye);
  g_object_set_data_full (G_OBJECT (box), "row", row, g_free);
  /* which row a click selects, before the list selects it: that line
   * becomes the window's (see _rugosa_line_list_current) */
  {
    GtkGesture *press = gtk_gesture_click_new ();

    gtk_gesture_single_set_button (GTK_GESTURE_SINGLE (press), GDK_BUTTON_PRIMARY);
    gtk_event_controller_set_propagation_phase (GTK_EVENT_CONTROLLER (press), GTK_PHASE_CAPTURE);
    g_signal_connect (press, "pressed", G_CALLBACK (_rugosa_line_list_row_pressed), self);
    gtk_widget_add_controller (box, GTK_EVENT_CONTROLLER (press));
  }
  gtk_list_item_set_child (item, box);
}

static void
_rugosa_line_list_row_bind (GtkSignalListItemFactory *factory,
                            GtkListItem              *item,
                            RugosaLineList           *self)
{
  GtkWidget *box = gtk_list_item_get_child (item);
  Row *row = g_object_get_data (G_OBJECT (box), "row");
  gpointer line = gtk_list_item_get_item (item);

  g_object_set_data (G_OBJECT (box), "line", line);
  g_object_set_data (G_OBJECT (row->eye), "line", line);
  g_object_set_data (G_OBJECT (row->pin), "line", line);
  g_object_set_data (G_OBJECT (row->warn), "line", line);
  g_ptr_array_add (self->bound, box);
  _rugosa_line_list_update_row (self, box);
}

static void
_rugosa_line_list_row_unbind (GtkSignalListItemFactory *factory,
                              GtkListItem              *item,
                              RugosaLineList           *self)
{
  GtkWidget *box = gtk_list_item_get_child (item);
  Row *row = g_object_get_data (G_OBJECT (box), "row");

  if (self->bound)
    g_ptr_array_remove_fast (self->bound, box);
  g_object_set_data (G_OBJECT (box), "line", NULL);
  g_object_set_data (G_OBJECT (row->eye), "line", NULL);
  g_object_set_data (G_OBJECT (row->pin), "line", NULL);
  g_object_set_data (G_OBJECT (row->warn), "line", NULL);
}

void
_rugosa_line_list_refresh_rows (RugosaLineList *self)
{
  for (guint i = 0; i < self->bound->len; i++)
    _rugosa_line_list_update_row (self, g_ptr_array_index (self->bound, i));
}

/* --- the selected line's group ----------------------------------------------- */

void
_rugosa_line_list_show_group (RugosaLineList *self)
{
  RugosaLine *line = self->selection ? gtk_single_selection_get_selected_item (self->selection) : NULL;
  g_autofree char *group = NULL;

  if (gtk_widget_get_sensitive (GTK_WIDGET (self->group_entry)) != (line != NULL))
    gtk_widget_set_sensitive (GTK_WIDGET (self->group_entry), line != NULL);
  if (line != NULL)
    g_object_get (line, "group", &group, NULL);
  if (gtk_widget_has_focus (GTK_WIDGET (self->group_entry))
      && g_object_get_data (G_OBJECT (self->group_entry), "line") == (gpointer) line)
    return;
  g_object_set_data (G_OBJECT (self->group_entry), "line", line);
  if (g_strcmp0 (gtk_editable_get_text (GTK_EDITABLE (self->group_entry)), group ? group : "") != 0)
    gtk_editable_set_text (GTK_EDITABLE (self->group_entry), group ? group : "");
}

static void
_rugosa_line_list_group_commit (RugosaLineList *self)
{
  RugosaLine *line = g_object_get_data (G_OBJECT (self->group_entry), "line");
  g_autofree char *text = g_strstrip (g_strdup (gtk_editable_get_text (GTK_EDITABLE (self->group_entry))));
  g_autofree char *group = NULL;

  if (line == NULL)
    return;
  g_object_get (line, "group", &group, NULL);
  if (g_strcmp0 (group, text) == 0)
    return;
  g_signal_emit (self, signals[SIGNAL_EDIT_LINE], 0, line, "group", g_variant_new_string (text));
}

static void
_rugosa_line_list_group_activate (RugosaLineList *self)
{
  _rugosa_line_list_group_commit (self);
}

static void
_rugosa_line_list_group_leave (RugosaLineList *self)
{
  _rugosa_line_list_group_commit (self);
}

/* --- groups ------------------------------------------------------------------ */

typedef struct {
  char *name;
  GListStore *lines;
  guint shown;
} Group;

static void
_rugosa_group_free (gpointer data)
{
  Group *g = data;

  g_free (g->name);
  g_object_unref (g->lines);
  g_free (g);
}

static void
_rugosa_line_list_group_toggled (GtkCheckButton *check,
                                 RugosaLineList *self)
{
  GListModel *lines = g_object_get_data (G_OBJECT (check), "lines");

  if (self->updating || lines == NULL)
    return;
  gtk_check_button_set_inconsistent (check, FALSE);
  rugosa_visibility_set_shown_all (self->visibility, lines, gtk_check_button_get_active (check));
}

static void
_rugosa_line_list_groups_show (RugosaLineList *self)
{
  g_autoptr (GPtrArray) groups = g_ptr_array_new_with_free_func (_rugosa_group_free);
  g_autoptr (GHashTable) by_name = g_hash_table_new (g_str_hash, g_str_equal);
  guint n;
  GtkWidget *child;

  while ((child = gtk_widget_get_first_child (GTK_WIDGET (self->groups_box))) != NULL)
    gtk_list_box_remove (self->groups_box, child);
  if (self->project == NULL)
    return;
  n = rugosa_project_get_n_lines (self->project);
  for (guint i = 0; i < n; i++)
    {
      RugosaLine *line = rugosa_project_get_line (self->project, i);
      g_autofree char *name = NULL;
      Group *g;

      g_object_get (line, "group", &name, NULL);
      g = g_hash_table_lookup (by_name, name ? name : "");
      if (g == NULL)
        {
          g = g_new0 (Group, 1);
          g->name = g_strdup (name ? name : "");
          g->lines = g_list_store_new (RUGOSA_TYPE_LINE);
          g_ptr_array_add (groups, g);
          g_hash_table_insert (by_name, g->name, g);
        }
      g_list_store_append (g->lines, line);
      g->shown += rugosa_visibility_get_shown (self->visibility, line);
    }
  self->updating = TRUE;
  for (guint i = 0; i < groups->len && i < GROUPS_SHOWN_MAX; i++)
    {
      Group *g = g_ptr_array_index (groups, i);
      guint total = g_list_model_get_n_items (G_LIST_MODEL (g->lines));
      /* TRANSLATORS: a group of line options and how many lines it has */
      g_autofree char *label = g_strdup_printf (_("%s (%u)"), *g->name ? g->name : _("Without a group"), total);
      GtkWidget *check = gtk_check_button_new_with_label (label);

      gtk_check_button_set_active (GTK_CHECK_BUTTON (check), g->shown > 0);
      gtk_check_button_set_inconsistent (GTK_CHECK_BUTTON (check), g->shown > 0 && g->shown < total);
      g_object_set_data_full (G_OBJECT (check), "lines", g_object_ref (g->lines), g_object_unref);
      g_signal_connect (check, "toggled", G_CALLBACK (_rugosa_line_list_group_toggled), self);
      gtk_widget_set_margin_start (check, 6);
      gtk_widget_set_margin_end (check, 6);
      gtk_list_box_append (self->groups_box, check);
    }
  if (groups->len > GROUPS_SHOWN_MAX)
    {
      guint more = groups->len - GROUPS_SHOWN_MAX;
      g_autofree char *text = g_strdup_printf (ngettext ("%u more group: filter the list by its name.",
                                                         "%u more groups: filter the list by their names.",
                                                         more), more);
      GtkWidget *label = gtk_label_new (text);

      gtk_label_set_wrap (GTK_LABEL (label), TRUE);
      gtk_widget_add_css_class (label, "dim-label");
      gtk_list_box_append (self->groups_box, label);
    }
  self->updating = FALSE;
}

static void
_rugosa_line_list_show_listed (RugosaLineList *self)
{
  if (self->visibility != NULL)
    rugosa_visibility_set_shown_all (self->visibility, G_LIST_MODEL (self->listed), TRUE);
  _rugosa_line_list_groups_show (self);
}

static void
_rugosa_line_list_hide_listed (RugosaLineList *self)
{
  if (self->visibility != NULL)
    rugosa_visibility_set_shown_all (self->visibility, G_LIST_MODEL (self->listed), FALSE);
  _rugosa_line_list_groups_show (self);
}

/* --- following the window ------------------------------------------------------ */

static void
_rugosa_line_list_renumber (RugosaLineList *self)
{
  guint n = self->project ? rugosa_project_get_n_lines (self->project) : 0;

  g_hash_table_remove_all (self->numbers);
  for (guint i = 0; i < n; i++)
    g_hash_table_insert (self->numbers, rugosa_project_get_line (self->project, i),
                         GUINT_TO_POINTER (i + 1));
}

static void
_rugosa_line_list_items_changed (RugosaLineList *self)
{
  _rugosa_line_list_renumber (self);
  _rugosa_line_list_refresh_rows (self);
}

static void
_rugosa_line_list_activated (RugosaLineList *self,
                             guint           position)
{
  gtk_widget_activate_action (GTK_WIDGET (self), "win.line-rename", NULL);
}

void
rugosa_line_list_refresh (RugosaLineList *self)
{
  g_return_if_fail (RUGOSA_IS_LINE_LIST (self));
  /* a new name or group may move a line in or out of the filter */
  if (self->filter_text != NULL)
    gtk_filter_changed (GTK_FILTER (self->filter), GTK_FILTER_CHANGE_DIFFERENT);
  _rugosa_line_list_refresh_rows (self);
  _rugosa_line_list_show_group (self);
}

void
rugosa_line_list_set_context (RugosaLineList     *self,
                              RugosaProject      *project,
                              GtkSingleSelection *selection,
                              RugosaVisibility   *visibility)
{
  g_return_if_fail (RUGOSA_IS_LINE_LIST (self));
  g_return_if_fail (self->project == NULL);

  self->project = project;
  self->selection = selection;
  self->visibility = visibility;
  self->listed = gtk_filter_list_model_new (g_object_ref (G_LIST_MODEL (project)),
                                            g_object_ref (GTK_FILTER (self->filter)));
  self->list_selection = gtk_multi_selection_new (g_object_ref (G_LIST_MODEL (self->listed)));
  gtk_list_view_set_model (self->view, GTK_SELECTION_MODEL (self->list_selection));
  /* the binding goes with whichever of the two is finalized first */
  g_object_bind_property (visibility, "only-selected", self->only_selected_button, "active",
                          G_BINDING_BIDIRECTIONAL | G_BINDING_SYNC_CREATE);

  g_signal_connect_object (project, "items-changed", G_CALLBACK (_rugosa_line_list_items_changed),
                           self, G_CONNECT_SWAPPED);
  g_signal_connect_object (visibility, "changed", G_CALLBACK (_rugosa_line_list_refresh_rows),
                           self, G_CONNECT_SWAPPED);
  g_signal_connect_object (self->list_selection, "selection-changed",
                           G_CALLBACK (_rugosa_line_list_selection_changed), self, 0);
  g_signal_connect_object (selection, "notify::selected",
                           G_CALLBACK (_rugosa_line_list_follow_window), self, G_CONNECT_SWAPPED);
  g_signal_connect_object (project, "items-changed",
                           G_CALLBACK (_rugosa_line_list_project_changed_after), self,
                           G_CONNECT_SWAPPED | G_CONNECT_AFTER);
  g_signal_connect_object (self->listed, "items-changed",
                           G_CALLBACK (_rugosa_line_list_listed_changed), self,
                           G_CONNECT_SWAPPED | G_CONNECT_AFTER);
  _rugosa_line_list_renumber (self);
  _rugosa_line_list_follow_window (self);
}

/* --- object ------------------------------------------------------------------ */

static void
rugosa_line_list_dispose (GObject *object)
{
  RugosaLineList *self = RUGOSA_LINE_LIST (object);

  if (self->view != NULL)
    gtk_list_view_set_model (self->view, NULL);
  gtk_widget_dispose_template (GTK_WIDGET (self), RUGOSA_TYPE_LINE_LIST);
  /* Template children without an id are not cleared by the call above. */
  for (GtkWidget *child; (child = gtk_widget_get_first_child (GTK_WIDGET (self))) != NULL;)
    gtk_widget_unparent (child);
  _rugosa_line_list_set_pressed (self, NULL);
  g_clear_object (&self->list_selection);
  g_clear_object (&self->listed);
  g_clear_object (&self->filter);
  g_clear_pointer (&self->numbers, g_hash_table_unref);
  g_clear_pointer (&self->bound, g_ptr_array_unref);
  g_clear_pointer (&self->filter_text, g_free);
  G_OBJECT_CLASS (rugosa_line_list_parent_class)->dispose (object);
}

void
_rugosa_line_list_notify_n_selected (RugosaLineList *self)
{
  g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_N_SELECTED]);
}

static void
rugosa_line_list_get_property (GObject    *object,
                               guint       prop_id,
                               GValue     *value,
                               GParamSpec *pspec)
{
  RugosaLineList *self = RUGOSA_LINE_LIST (object);

  switch (prop_id)
    {
    case PROP_N_SELECTED: g_value_set_uint (value, self->n_selected); break;
    default: G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_line_list_class_init (RugosaLineListClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = rugosa_line_list_dispose;
  object_class->get_property = rugosa_line_list_get_property;

  properties[PROP_N_SELECTED] =
    g_param_spec_uint ("n-selected", NULL, "How many lines are selected in the list",
                       0, G_MAXUINT, 0,
                       G_PARAM_READABLE | G_PARAM_EXPLICIT_NOTIFY | G_PARAM_STATIC_STRINGS);
  g_object_class_install_properties (object_class, N_PROPS, properties);

  signals[SIGNAL_EDIT_LINE] =
    g_signal_new ("edit-line", G_TYPE_FROM_CLASS (klass), G_SIGNAL_RUN_LAST,
                  0, NULL, NULL, NULL, G_TYPE_NONE, 3,
                  RUGOSA_TYPE_LINE, G_TYPE_STRING, G_TYPE_VARIANT);

  gtk_widget_class_set_template_from_resource (widget_class, "/org/rugosa/Rugosa/rugosa-line-list.ui");
  gtk_widget_class_bind_template_child (widget_class, RugosaLineList, only_selected_button);
  gtk_widget_class_bind_template_child (widget_class, RugosaLineList, groups_button);
  gtk_widget_class_bind_template_child (widget_class, RugosaLineList, groups_popover);
  gtk_widget_class_bind_template_child (widget_class, RugosaLineList, groups_box);
  gtk_widget_class_bind_template_child (widget_class, RugosaLineList, filter_entry);
  gtk_widget_class_bind_template_child (widget_class, RugosaLineList, view);
  gtk_widget_class_bind_template_child (widget_class, RugosaLineList, group_entry);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_line_list_filter_changed);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_line_list_activated);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_line_list_group_activate);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_line_list_group_leave);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_line_list_groups_show);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_line_list_show_listed);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_line_list_hide_listed);
  gtk_widget_class_set_layout_manager_type (widget_class, GTK_TYPE_BOX_LAYOUT);
  gtk_widget_class_set_css_name (widget_class, "linelist");
}

static void
rugosa_line_list_init (RugosaLineList *self)
{
  GtkListItemFactory *factory;

  gtk_widget_init_template (GTK_WIDGET (self));
  gtk_orientable_set_orientation (GTK_ORIENTABLE (gtk_widget_get_layout_manager (GTK_WIDGET (self))),
                                  GTK_ORIENTATION_VERTICAL);
  self->bound = g_ptr_array_new ();
  self->numbers = g_hash_table_new (NULL, NULL);
  self->filter = gtk_custom_filter_new (_rugosa_line_list_match, self, NULL);

  factory = gtk_signal_list_item_factory_new ();
  g_signal_connect (factory, "setup", G_CALLBACK (_rugosa_line_list_row_setup), self);
  g_signal_connect (factory, "bind", G_CALLBACK (_rugosa_line_list_row_bind), self);
  g_signal_connect (factory, "unbind", G_CALLBACK (_rugosa_line_list_row_unbind), self);
  gtk_list_view_set_factory (self->view, factory);
  g_object_unref (factory);
}
