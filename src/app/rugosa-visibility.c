/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-visibility"

#include "config.h"

#include "rugosa-visibility.h"

struct _RugosaVisibility
{
  GObject parent_instance;

  /* borrowed references */
  GtkSingleSelection *selection;   /* the window's, over every line */

  /* owned references; the lines are held so that a freed line's address
   * never stands for a new one */
  GHashTable         *hidden;
  GHashTable         *pinned;
  GtkCustomFilter    *drawn_filter;
  GtkSingleSelection *drawn_selection;
  RugosaChartInputView view;
  gboolean            only_selected;
};

G_DEFINE_FINAL_TYPE (RugosaVisibility, rugosa_visibility, G_TYPE_OBJECT)

enum {
  PROP_0,
  PROP_ONLY_SELECTED,
  N_PROPS
};

static GParamSpec *properties[N_PROPS];

enum {
  SIGNAL_CHANGED,
  N_SIGNALS
};

static guint signals[N_SIGNALS];

static void
_rugosa_visibility_changed (RugosaVisibility *self)
{
  if (self->drawn_filter != NULL)
    gtk_filter_changed (GTK_FILTER (self->drawn_filter), GTK_FILTER_CHANGE_DIFFERENT);
  g_signal_emit (self, signals[SIGNAL_CHANGED], 0);
}

static gboolean
_rugosa_visibility_set_in (GHashTable *set,
                           RugosaLine *line,
                           gboolean    in)
{
  if (in == g_hash_table_contains (set, line))
    return FALSE;
  if (in)
    g_hash_table_add (set, g_object_ref (line));
  else
    g_hash_table_remove (set, line);
  return TRUE;
}

gboolean
rugosa_visibility_get_shown (RugosaVisibility *self,
                             RugosaLine       *line)
{
  g_return_val_if_fail (RUGOSA_IS_VISIBILITY (self), TRUE);
  return !g_hash_table_contains (self->hidden, line);
}

void
rugosa_visibility_set_shown (RugosaVisibility *self,
                             RugosaLine       *line,
                             gboolean          shown)
{
  g_return_if_fail (RUGOSA_IS_VISIBILITY (self));
  if (_rugosa_visibility_set_in (self->hidden, line, !shown))
    _rugosa_visibility_changed (self);
}

void
rugosa_visibility_set_shown_all (RugosaVisibility *self,
                                 GListModel       *lines,
                                 gboolean          shown)
{
  guint n;
  gboolean any = FALSE;

  g_return_if_fail (RUGOSA_IS_VISIBILITY (self));
  n = g_list_model_get_n_items (lines);
  for (guint i = 0; i < n; i++)
    {
      g_autoptr (RugosaLine) line = g_list_model_get_item (lines, i);
      any |= _rugosa_visibility_set_in (self->hidden, line, !shown);
    }
  if (any)
    _rugosa_visibility_changed (self);
}

gboolean
rugosa_visibility_get_pinned (RugosaVisibility *self,
                              RugosaLine       *line)
{
  g_return_val_if_fail (RUGOSA_IS_VISIBILITY (self), FALSE);
  return g_hash_table_contains (self->pinned, line);
}

void
rugosa_visibility_set_pinned (RugosaVisibility *self,
                              RugosaLine       *line,
                              gboolean          pinned)
{
  gboolean changed;

  g_return_if_fail (RUGOSA_IS_VISIBILITY (self));
  changed = _rugosa_visibility_set_in (self->pinned, line, pinned);
  /* a pinned line is one to see */
  if (pinned)
    changed |= _rugosa_visibility_set_in (self->hidden, line, FALSE);
  if (changed)
    _rugosa_visibility_changed (self);
}

gboolean
rugosa_visibility_get_only_selected (RugosaVisibility *self)
{
  g_return_val_if_fail (RUGOSA_IS_VISIBILITY (self), FALSE);
  return self->only_selected;
}

void
rugosa_visibility_set_only_selected (RugosaVisibility *self,
                                     gboolean          only)
{
  g_return_if_fail (RUGOSA_IS_VISIBILITY (self));
  only = !!only;
  if (only == self->only_selected)
    return;
  self->only_selected = only;
  g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_ONLY_SELECTED]);
  _rugosa_visibility_changed (self);
}

gboolean
rugosa_visibility_is_drawn (RugosaVisibility *self,
                            RugosaLine       *line)
{
  g_return_val_if_fail (RUGOSA_IS_VISIBILITY (self), TRUE);
  if (self->only_selected)
    return self->selection != NULL
           && gtk_single_selection_get_selected_item (self->selection) == (gpointer) line;
  return !g_hash_table_contains (self->hidden, line);
}

void
rugosa_visibility_reset (RugosaVisibility *self)
{
  g_return_if_fail (RUGOSA_IS_VISIBILITY (self));
  if (g_hash_table_size (self->hidden) == 0 && g_hash_table_size (self->pinned) == 0)
    return;
  g_hash_table_remove_all (self->hidden);
  g_hash_table_remove_all (self->pinned);
  _rugosa_visibility_changed (self);
}

static gboolean
_rugosa_visibility_view_drawn (RugosaLine *line,
                               gpointer    user_data)
{
  return rugosa_visibility_is_drawn (user_data, line);
}

static gboolean
_rugosa_visibility_view_pinned (RugosaLine *line,
                                gpointer    user_data)
{
  return rugosa_visibility_get_pinned (user_data, line);
}

const RugosaChartInputView *
rugosa_visibility_chart_view (RugosaVisibility *self)
{
  g_return_val_if_fail (RUGOSA_IS_VISIBILITY (self), NULL);
  return &self->view;
}

static gboolean
_rugosa_visibility_filter (gpointer item,
                           gpointer user_data)
{
  return rugosa_visibility_is_drawn (user_data, item);
}

static void
_rugosa_visibility_selection_changed (RugosaVisibility *self)
{
  /* with "only-selected" the selection decides what is drawn */
  if (self->only_selected)
    _rugosa_visibility_changed (self);
}

GtkSingleSelection *
rugosa_visibility_drawn_selection (RugosaVisibility *self,
                                   RugosaProject    *project)
{
  GtkFilterListModel *drawn;

  g_return_val_if_fail (RUGOSA_IS_VISIBILITY (self), NULL);
  if (self->drawn_selection != NULL)
    return self->drawn_selection;
  self->drawn_filter = gtk_custom_filter_new (_rugosa_visibility_filter, self, NULL);
  drawn = gtk_filter_list_model_new (g_object_ref (G_LIST_MODEL (project)),
                                     g_object_ref (GTK_FILTER (self->drawn_filter)));
  self->drawn_selection = gtk_single_selection_new (G_LIST_MODEL (drawn));
  gtk_single_selection_set_autoselect (self->drawn_selection, FALSE);
  gtk_single_selection_set_can_unselect (self->drawn_selection, TRUE);
  rugosa_selection_link (self->selection, self->drawn_selection);
  return self->drawn_selection;
}

/* --- selections in step ------------------------------------------------ */

typedef struct {
  GtkSingleSelection *main;        /* weak */
  GtkSingleSelection *view;        /* the link's owner */
  GListModel         *view_model;  /* held */
  gulong              main_handler;
  gulong              model_handler;
  gboolean            busy;
} SelectionLink;

guint
rugosa_list_model_find (GListModel *model,
                        gpointer    item)
{
  guint n = g_list_model_get_n_items (model);

  /* linear: once per selection change, not per frame */
  for (guint i = 0; i < n; i++)
    {
      g_autoptr (GObject) at = g_list_model_get_item (model, i);
      if ((gpointer) at == item)
        return i;
    }
  return GTK_INVALID_LIST_POSITION;
}

static void
_rugosa_link_main_to_view (SelectionLink *link)
{
  gpointer item;
  guint pos;

  if (link->busy)
    return;
  link->busy = TRUE;
  item = gtk_single_selection_get_selected_item (link->main);
  pos = item != NULL ? rugosa_list_model_find (gtk_single_selection_get_model (link->view), item)
                     : GTK_INVALID_LIST_POSITION;
  if (gtk_single_selection_get_selected (link->view) != pos)
    gtk_single_selection_set_selected (link->view, pos);
  link->busy = FALSE;
}

static void
_rugosa_link_view_to_main (SelectionLink *link)
{
  gpointer item;
  guint pos;

  if (link->busy)
    return;
  item = gtk_single_selection_get_selected_item (link->view);
  if (item == NULL)
    return;
  link->busy = TRUE;
  pos = rugosa_list_model_find (gtk_single_selection_get_model (link->main), item);
  if (pos != GTK_INVALID_LIST_POSITION && gtk_single_selection_get_selected (link->main) != pos)
    gtk_single_selection_set_selected (link->main, pos);
  link->busy = FALSE;
}

static void
_rugosa_link_view_items_changed (SelectionLink *link)
{
  /* the filter moved the rows: select the main selection's line again */
  _rugosa_link_main_to_view (link);
}

static void
_rugosa_link_free (gpointer data)
{
  SelectionLink *link = data;

  if (link->main != NULL)
    {
      g_clear_signal_handler (&link->main_handler, link->main);
      g_object_remove_weak_pointer (G_OBJECT (link->main), (gpointer *) &link->main);
    }
  g_clear_signal_handler (&link->model_handler, link->view_model);
  g_clear_object (&link->view_model);
  g_free (link);
}

void
rugosa_selection_link (GtkSingleSelection *main,
                       GtkSingleSelection *view)
{
  SelectionLink *link = g_new0 (SelectionLink, 1);

  link->main = main;
  link->view = view;
  g_object_add_weak_pointer (G_OBJECT (main), (gpointer *) &link->main);
  link->main_handler = g_signal_connect_swapped (main, "notify::selected",
                                                 G_CALLBACK (_rugosa_link_main_to_view), link);
  g_signal_connect_swapped (view, "notify::selected", G_CALLBACK (_rugosa_link_view_to_main), link);
  link->view_model = g_object_ref (gtk_single_selection_get_model (view));
  link->model_handler = g_signal_connect_data (link->view_model, "items-changed",
                                               G_CALLBACK (_rugosa_link_view_items_changed), link,
                                               NULL, G_CONNECT_SWAPPED | G_CONNECT_AFTER);
  g_object_set_data_full (G_OBJECT (view), "rugosa-selection-link", link, _rugosa_link_free);
  _rugosa_link_main_to_view (link);
}

/* --- object ------------------------------------------------------------ */

RugosaVisibility *
rugosa_visibility_new (GtkSingleSelection *selection)
{
  RugosaVisibility *self = g_object_new (RUGOSA_TYPE_VISIBILITY, NULL);

  self->selection = selection;
  g_object_add_weak_pointer (G_OBJECT (selection), (gpointer *) &self->selection);
  g_signal_connect_object (selection, "notify::selected",
                           G_CALLBACK (_rugosa_visibility_selection_changed), self,
                           G_CONNECT_SWAPPED);
  return self;
}

static void
rugosa_visibility_get_property (GObject    *object,
                                guint       prop_id,
                                GValue     *value,
                                GParamSpec *pspec)
{
  RugosaVisibility *self = RUGOSA_VISIBILITY (object);

  switch (prop_id)
    {
    case PROP_ONLY_SELECTED: g_value_set_boolean (value, self->only_selected); break;
    default: G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_visibility_set_property (GObject      *object,
                                guint         prop_id,
                                const GValue *value,
                                GParamSpec   *pspec)
{
  RugosaVisibility *self = RUGOSA_VISIBILITY (object);

  switch (prop_id)
    {
    case PROP_ONLY_SELECTED: rugosa_visibility_set_only_selected (self, g_value_get_boolean (value)); break;
    default: G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_visibility_dispose (GObject *object)
{
  RugosaVisibility *self = RUGOSA_VISIBILITY (object);

  if (self->selection != NULL)
    {
      g_object_remove_weak_pointer (G_OBJECT (self->selection), (gpointer *) &self->selection);
      self->selection = NULL;
    }
  g_clear_object (&self->drawn_selection);
  g_clear_object (&self->drawn_filter);
  g_clear_pointer (&self->hidden, g_hash_table_unref);
  g_clear_pointer (&self->pinned, g_hash_table_unref);
  G_OBJECT_CLASS (rugosa_visibility_parent_class)->dispose (object);
}

static void
rugosa_visibility_class_init (RugosaVisibilityClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);

  object_class->get_property = rugosa_visibility_get_property;
  object_class->set_property = rugosa_visibility_set_property;
  object_class->dispose = rugosa_visibility_dispose;

  properties[PROP_ONLY_SELECTED] =
    g_param_spec_boolean ("only-selected", NULL, NULL, FALSE,
                          G_PARAM_READWRITE | G_PARAM_EXPLICIT_NOTIFY | G_PARAM_STATIC_STRINGS);
  g_object_class_install_properties (object_class, N_PROPS, properties);

  /* Emitted once after any change of what is shown or pinned. */
  signals[SIGNAL_CHANGED] =
    g_signal_new ("changed", G_TYPE_FROM_CLASS (klass), G_SIGNAL_RUN_LAST, 0,
                  NULL, NULL, NULL, G_TYPE_NONE, 0);
}

static void
rugosa_visibility_init (RugosaVisibility *self)
{
  self->hidden = g_hash_table_new_full (NULL, NULL, g_object_unref, NULL);
  self->pinned = g_hash_table_new_full (NULL, NULL, g_object_unref, NULL);
  self->view.drawn = _rugosa_visibility_view_drawn;
  self->view.pinned = _rugosa_visibility_view_pinned;
  self->view.user_data = self;
}
