/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include "rugosa-model-private.h"
#include "rugosa-project-private.h"

static void rugosa_project_list_model_init (GListModelInterface *iface);

G_DEFINE_FINAL_TYPE_WITH_CODE (RugosaProject, rugosa_project, G_TYPE_OBJECT,
  G_IMPLEMENT_INTERFACE (G_TYPE_LIST_MODEL, rugosa_project_list_model_init))

G_DEFINE_QUARK (rugosa-project-error-quark, rugosa_project_error)

enum {
  PROP_0,
  PROP_SETTINGS,
  PROP_N_ITEMS,
  N_PROPS
};

static GParamSpec *properties[N_PROPS];

enum {
  SIGNAL_CHANGED,
  N_SIGNALS
};

static guint signals[N_SIGNALS];

static void
on_child_notify (GObject *object, GParamSpec *pspec, RugosaProject *self)
{
  if (self->changed_holds > 0)
    {
      self->changed_pending = TRUE;
      return;
    }
  g_signal_emit (self, signals[SIGNAL_CHANGED], 0);
}

void
rugosa_project_hold_changed (RugosaProject *self)
{
  g_return_if_fail (RUGOSA_IS_PROJECT (self));
  self->changed_holds++;
}

void
rugosa_project_release_changed (RugosaProject *self)
{
  g_return_if_fail (RUGOSA_IS_PROJECT (self));
  g_return_if_fail (self->changed_holds > 0);
  if (--self->changed_holds > 0 || !self->changed_pending)
    return;
  self->changed_pending = FALSE;
  g_signal_emit (self, signals[SIGNAL_CHANGED], 0);
}

static void
rugosa_project_dispose (GObject *object)
{
  RugosaProject *self = RUGOSA_PROJECT (object);

  if (self->lines != NULL)
    for (guint i = 0; i < self->lines->len; i++)
      g_signal_handlers_disconnect_by_data (g_ptr_array_index (self->lines, i),
                                            self);
  g_clear_pointer (&self->lines, g_ptr_array_unref);
  if (self->settings != NULL)
    g_signal_handlers_disconnect_by_data (self->settings, self);
  g_clear_object (&self->settings);
  G_OBJECT_CLASS (rugosa_project_parent_class)->dispose (object);
}

static void
rugosa_project_finalize (GObject *object)
{
  RugosaProject *self = RUGOSA_PROJECT (object);

  _rugosa_project_eval_finalize (self);
  g_clear_pointer (&self->extra, cJSON_Delete);
  G_OBJECT_CLASS (rugosa_project_parent_class)->finalize (object);
}

static void
rugosa_project_get_property (GObject *object, guint prop_id, GValue *value,
                             GParamSpec *pspec)
{
  RugosaProject *self = RUGOSA_PROJECT (object);

  switch (prop_id)
    {
    case PROP_SETTINGS:
      g_value_set_object (value, self->settings);
      break;
    case PROP_N_ITEMS:
      g_value_set_uint (value, self->lines->len);
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_project_class_init (RugosaProjectClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);

  object_class->dispose = rugosa_project_dispose;
  object_class->finalize = rugosa_project_finalize;
  object_class->get_property = rugosa_project_get_property;

  properties[PROP_SETTINGS] =
    g_param_spec_object ("settings", NULL, "The project settings",
                         RUGOSA_TYPE_SETTINGS,
                         G_PARAM_READABLE | G_PARAM_STATIC_STRINGS);
  properties[PROP_N_ITEMS] =
    g_param_spec_uint ("n-items", NULL, "Number of line options", 0,
                       G_MAXUINT, 0,
                       G_PARAM_READABLE | G_PARAM_EXPLICIT_NOTIFY
                       | G_PARAM_STATIC_STRINGS);
  g_object_class_install_properties (object_class, N_PROPS, properties);

  /* Emitted after any change of the document (a line's or the settings'
   * property, or the list): a place to hook a dirty flag or autosave. */
  signals[SIGNAL_CHANGED] =
    g_signal_new ("changed", G_TYPE_FROM_CLASS (klass), G_SIGNAL_RUN_LAST, 0,
                  NULL, NULL, NULL, G_TYPE_NONE, 0);
}

static void
rugosa_project_init (RugosaProject *self)
{
  self->lines = g_ptr_array_new_with_free_func (g_object_unref);
  self->settings = rugosa_settings_new ();
  g_signal_connect (self->settings, "notify", G_CALLBACK (on_child_notify),
                    self);
  _rugosa_project_eval_init (self);
}

static GType
list_get_item_type (GListModel *list)
{
  return RUGOSA_TYPE_LINE;
}

static guint
list_get_n_items (GListModel *list)
{
  return RUGOSA_PROJECT (list)->lines->len;
}

static gpointer
list_get_item (GListModel *list, guint position)
{
  RugosaProject *self = RUGOSA_PROJECT (list);

  if (position >= self->lines->len)
    return NULL;
  return g_object_ref (g_ptr_array_index (self->lines, position));
}

static void
rugosa_project_list_model_init (GListModelInterface *iface)
{
  iface->get_item_type = list_get_item_type;
  iface->get_n_items = list_get_n_items;
  iface->get_item = list_get_item;
}

RugosaProject *
rugosa_project_new (void)
{
  return g_object_new (RUGOSA_TYPE_PROJECT, NULL);
}

RugosaSettings *
rugosa_project_get_settings (RugosaProject *self)
{
  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), NULL);
  return self->settings;
}

guint
rugosa_project_get_n_lines (RugosaProject *self)
{
  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), 0);
  return self->lines->len;
}

RugosaLine *
rugosa_project_get_line (RugosaProject *self, guint position)
{
  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), NULL);
  g_return_val_if_fail (position < self->lines->len, NULL);
  return g_ptr_array_index (self->lines, position);
}

int
rugosa_project_find_line (RugosaProject *self, RugosaLine *line)
{
  guint index;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), -1);
  if (!g_ptr_array_find (self->lines, line, &index))
    return -1;
  return (int) index;
}

static void
list_changed (RugosaProject *self, guint position, guint removed, guint added)
{
  g_list_model_items_changed (G_LIST_MODEL (self), position, removed, added);
  if (removed != added)
    g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_N_ITEMS]);
  g_signal_emit (self, signals[SIGNAL_CHANGED], 0);
}

void
rugosa_project_insert_line (RugosaProject *self, guint position,
                            RugosaLine *line)
{
  g_return_if_fail (RUGOSA_IS_PROJECT (self));
  g_return_if_fail (RUGOSA_IS_LINE (line));
  g_return_if_fail (position <= self->lines->len);
  g_return_if_fail (rugosa_project_find_line (self, line) < 0);

  g_ptr_array_insert (self->lines, (int) position, g_object_ref (line));
  g_signal_connect (line, "notify", G_CALLBACK (on_child_notify), self);
  list_changed (self, position, 0, 1);
}

RugosaLine *
rugosa_project_remove_line (RugosaProject *self, guint position)
{
  RugosaLine *line;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), NULL);
  g_return_val_if_fail (position < self->lines->len, NULL);

  line = g_ptr_array_steal_index (self->lines, position);
  g_signal_handlers_disconnect_by_data (line, self);
  _rugosa_project_eval_forget (self, line);
  list_changed (self, position, 1, 0);
  return line;
}

void
rugosa_project_move_line (RugosaProject *self, guint from, guint to)
{
  gpointer line;

  g_return_if_fail (RUGOSA_IS_PROJECT (self));
  g_return_if_fail (from < self->lines->len && to < self->lines->len);
  if (from == to)
    return;

  line = g_ptr_array_steal_index (self->lines, from);
  g_ptr_array_insert (self->lines, (int) to, line);
  /* One items-changed covering the moved span keeps list views simple. */
  guint lo = MIN (from, to), n = MAX (from, to) - lo + 1;
  list_changed (self, lo, n, n);
}

void
_rugosa_project_take_content (RugosaProject *dst, RugosaProject *src)
{
  guint old_n = dst->lines->len;
  GPtrArray *old = dst->lines;

  for (guint i = 0; i < old->len; i++)
    {
      g_signal_handlers_disconnect_by_data (g_ptr_array_index (old, i), dst);
      _rugosa_project_eval_forget (dst, g_ptr_array_index (old, i));
    }
  for (guint i = 0; i < src->lines->len; i++)
    {
      gpointer line = g_ptr_array_index (src->lines, i);

      g_signal_handlers_disconnect_by_data (line, src);
      _rugosa_project_eval_forget (src, line);
      g_signal_connect (line, "notify", G_CALLBACK (on_child_notify), dst);
    }
  dst->lines = src->lines;
  src->lines = old;
  g_ptr_array_set_size (src->lines, 0);

  g_clear_pointer (&dst->extra, cJSON_Delete);
  dst->extra = g_steal_pointer (&src->extra);

  /* The settings object of dst stays the same object (views hold it). */
  _rugosa_settings_copy (dst->settings, src->settings);

  g_list_model_items_changed (G_LIST_MODEL (dst), 0, old_n, dst->lines->len);
  if (old_n != dst->lines->len)
    g_object_notify_by_pspec (G_OBJECT (dst), properties[PROP_N_ITEMS]);
  g_signal_emit (dst, signals[SIGNAL_CHANGED], 0);
}

const cJSON *
_rugosa_project_get_extra (RugosaProject *self)
{
  return self->extra;
}

void
_rugosa_project_take_extra (RugosaProject *self, cJSON *extra)
{
  g_clear_pointer (&self->extra, cJSON_Delete);
  self->extra = extra;
}

gboolean
rugosa_project_equal (RugosaProject *a, RugosaProject *b)
{
  g_return_val_if_fail (RUGOSA_IS_PROJECT (a) && RUGOSA_IS_PROJECT (b), FALSE);

  if (a->lines->len != b->lines->len
      || !rugosa_settings_equal (a->settings, b->settings))
    return FALSE;
  for (guint i = 0; i < a->lines->len; i++)
    if (!rugosa_line_equal (g_ptr_array_index (a->lines, i),
                            g_ptr_array_index (b->lines, i)))
      return FALSE;
  return TRUE;
}
