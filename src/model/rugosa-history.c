/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <gobject/gvaluecollector.h>

#include "rugosa-fields.h"
#include "rugosa-history.h"

typedef enum {
  CMD_SET,
  CMD_INSERT,
  CMD_REMOVE,
  CMD_MOVE,
  CMD_GROUP,
} CommandKind;

typedef struct _Command Command;
struct _Command
{
  CommandKind kind;
  char *label;
  gint64 time_us;
  /* CMD_SET */
  GObject *target;
  GParamSpec *pspec;
  GValue old_value, new_value;
  /* CMD_INSERT, CMD_REMOVE: line at position; CMD_MOVE: from -> to */
  RugosaLine *line;
  guint position, to;
  /* CMD_GROUP */
  GPtrArray *children;
};

struct _RugosaHistory
{
  GObject parent_instance;

  /* owned */
  RugosaProject *project;
  GPtrArray *undo_stack; /* of Command, newest last */
  GPtrArray *redo_stack;
  GPtrArray *open_groups; /* of Command (CMD_GROUP), innermost last */

  gint64 merge_interval_us;
  gboolean merge_broken;
};

G_DEFINE_FINAL_TYPE (RugosaHistory, rugosa_history, G_TYPE_OBJECT)

enum {
  PROP_0,
  PROP_PROJECT,
  PROP_CAN_UNDO,
  PROP_CAN_REDO,
  N_PROPS
};

static GParamSpec *properties[N_PROPS];

static void
command_free (gpointer data)
{
  Command *c = data;

  g_free (c->label);
  g_clear_object (&c->target);
  if (G_IS_VALUE (&c->old_value))
    g_value_unset (&c->old_value);
  if (G_IS_VALUE (&c->new_value))
    g_value_unset (&c->new_value);
  g_clear_object (&c->line);
  g_clear_pointer (&c->children, g_ptr_array_unref);
  g_free (c);
}

static Command *
command_new (CommandKind kind, char *label)
{
  Command *c = g_new0 (Command, 1);

  c->kind = kind;
  c->label = label;
  c->time_us = g_get_monotonic_time ();
  return c;
}

static void
command_apply (RugosaHistory *self, Command *c, gboolean forward)
{
  switch (c->kind)
    {
    case CMD_SET:
      g_object_set_property (c->target, c->pspec->name,
                             forward ? &c->new_value : &c->old_value);
      break;
    case CMD_INSERT:
    case CMD_REMOVE:
      if (forward == (c->kind == CMD_INSERT))
        rugosa_project_insert_line (self->project, c->position, c->line);
      else
        g_object_unref (rugosa_project_remove_line (self->project, c->position));
      break;
    case CMD_MOVE:
      if (forward)
        rugosa_project_move_line (self->project, c->position, c->to);
      else
        rugosa_project_move_line (self->project, c->to, c->position);
      break;
    case CMD_GROUP:
      if (forward)
        for (guint i = 0; i < c->children->len; i++)
          command_apply (self, g_ptr_array_index (c->children, i), TRUE);
      else
        for (guint i = c->children->len; i > 0; i--)
          command_apply (self, g_ptr_array_index (c->children, i - 1), FALSE);
      break;
    default:
      g_assert_not_reached ();
    }
}

static void
notify_state (RugosaHistory *self, gboolean could_undo, gboolean could_redo)
{
  if (could_undo != rugosa_history_can_undo (self))
    g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_CAN_UNDO]);
  if (could_redo != rugosa_history_can_redo (self))
    g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_CAN_REDO]);
}

/* Merge `c` into the previous step when both change the same property of
 * the same object in quick succession. */
static gboolean
try_merge (RugosaHistory *self, GPtrArray *stack, Command *c)
{
  Command *prev;

  if (c->kind != CMD_SET || self->merge_broken || stack->len == 0)
    return FALSE;
  prev = g_ptr_array_index (stack, stack->len - 1);
  if (prev->kind != CMD_SET || prev->target != c->target
      || prev->pspec != c->pspec
      || c->time_us - prev->time_us > self->merge_interval_us)
    return FALSE;
  g_value_copy (&c->new_value, &prev->new_value);
  prev->time_us = c->time_us;
  return TRUE;
}

/* Record an already applied command. */
static void
push (RugosaHistory *self, Command *c)
{
  gboolean could_undo = rugosa_history_can_undo (self);
  gboolean could_redo = rugosa_history_can_redo (self);
  GPtrArray *stack;

  g_ptr_array_set_size (self->redo_stack, 0);
  if (self->open_groups->len > 0)
    {
      Command *g = g_ptr_array_index (self->open_groups, self->open_groups->len - 1);
      stack = g->children;
    }
  else
    stack = self->undo_stack;

  if (try_merge (self, stack, c))
    command_free (c);
  else
    g_ptr_array_add (stack, c);
  self->merge_broken = FALSE;
  notify_state (self, could_undo, could_redo);
}

static void
rugosa_history_dispose (GObject *object)
{
  RugosaHistory *self = RUGOSA_HISTORY (object);

  g_clear_pointer (&self->undo_stack, g_ptr_array_unref);
  g_clear_pointer (&self->redo_stack, g_ptr_array_unref);
  g_clear_pointer (&self->open_groups, g_ptr_array_unref);
  g_clear_object (&self->project);
  G_OBJECT_CLASS (rugosa_history_parent_class)->dispose (object);
}

static void
rugosa_history_get_property (GObject *object, guint prop_id, GValue *value,
                             GParamSpec *pspec)
{
  RugosaHistory *self = RUGOSA_HISTORY (object);

  switch (prop_id)
    {
    case PROP_PROJECT:
      g_value_set_object (value, self->project);
      break;
    case PROP_CAN_UNDO:
      g_value_set_boolean (value, rugosa_history_can_undo (self));
      break;
    case PROP_CAN_REDO:
      g_value_set_boolean (value, rugosa_history_can_redo (self));
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_history_set_property (GObject *object, guint prop_id,
                             const GValue *value, GParamSpec *pspec)
{
  RugosaHistory *self = RUGOSA_HISTORY (object);

  switch (prop_id)
    {
    case PROP_PROJECT:
      self->project = g_value_dup_object (value);
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_history_class_init (RugosaHistoryClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);

  object_class->dispose = rugosa_history_dispose;
  object_class->get_property = rugosa_history_get_property;
  object_class->set_property = rugosa_history_set_property;

  properties[PROP_PROJECT] =
    g_param_spec_object ("project", NULL, "The project edited",
                         RUGOSA_TYPE_PROJECT,
                         G_PARAM_READWRITE | G_PARAM_CONSTRUCT_ONLY
                         | G_PARAM_STATIC_STRINGS);
  properties[PROP_CAN_UNDO] =
    g_param_spec_boolean ("can-undo", NULL, "There is a step to undo", FALSE,
                          G_PARAM_READABLE | G_PARAM_EXPLICIT_NOTIFY
                          | G_PARAM_STATIC_STRINGS);
  properties[PROP_CAN_REDO] =
    g_param_spec_boolean ("can-redo", NULL, "There is a step to redo", FALSE,
                          G_PARAM_READABLE | G_PARAM_EXPLICIT_NOTIFY
                          | G_PARAM_STATIC_STRINGS);
  g_object_class_install_properties (object_class, N_PROPS, properties);
}

static void
rugosa_history_init (RugosaHistory *self)
{
  self->undo_stack = g_ptr_array_new_with_free_func (command_free);
  self->redo_stack = g_ptr_array_new_with_free_func (command_free);
  self->open_groups = g_ptr_array_new_with_free_func (command_free);
  self->merge_interval_us = 1000 * 1000;
}

RugosaHistory *
rugosa_history_new (RugosaProject *project)
{
  g_return_val_if_fail (RUGOSA_IS_PROJECT (project), NULL);
  return g_object_new (RUGOSA_TYPE_HISTORY, "project", project, NULL);
}

RugosaProject *
rugosa_history_get_project (RugosaHistory *self)
{
  g_return_val_if_fail (RUGOSA_IS_HISTORY (self), NULL);
  return self->project;
}

static void open_group (RugosaHistory *self, const char *label);
static void close_group (RugosaHistory *self);

void
rugosa_history_set_value (RugosaHistory *self, gpointer object,
                          const char *property, const GValue *value)
{
  GParamSpec *pspec;
  Command *c;

  g_return_if_fail (RUGOSA_IS_HISTORY (self));
  g_return_if_fail (G_IS_OBJECT (object));

  pspec = g_object_class_find_property (G_OBJECT_GET_CLASS (object), property);
  g_return_if_fail (pspec != NULL && (pspec->flags & G_PARAM_WRITABLE));

  {
    const RugosaField *row = rugosa_field_find (property);

    /* TRANSLATORS: an undo step, e.g. "Change “Design flow”" */
    c = command_new (CMD_SET, g_strdup_printf (_("Change “%s”"),
                                               row != NULL ? rugosa_field_label (row) : property));
  }
  c->target = g_object_ref (object);
  c->pspec = pspec;
  g_value_init (&c->old_value, pspec->value_type);
  g_value_init (&c->new_value, pspec->value_type);
  g_object_get_property (object, property, &c->old_value);
  if (!g_value_transform (value, &c->new_value)
      || g_param_value_validate (pspec, &c->new_value))
    {
      g_critical ("Value for “%s” is out of range or of the wrong type", property);
      command_free (c);
      return;
    }
  if (g_param_values_cmp (pspec, &c->old_value, &c->new_value) == 0)
    {
      command_free (c);
      return;
    }
  command_apply (self, c, TRUE);
  push (self, c);
}

void
rugosa_history_set (RugosaHistory *self, gpointer object,
                    const char *first_property, ...)
{
  va_list ap;
  GPtrArray *stack;
  Command *group;
  gboolean broken, could_undo, could_redo;

  g_return_if_fail (RUGOSA_IS_HISTORY (self));
  g_return_if_fail (G_IS_OBJECT (object));

  /* Several properties make one step: collect them in a group, and unwrap
   * a group of one so that it can still merge with the previous step. */
  broken = self->merge_broken;
  could_undo = rugosa_history_can_undo (self);
  could_redo = rugosa_history_can_redo (self);
  open_group (self, _("Change several values"));
  va_start (ap, first_property);
  for (const char *name = first_property; name != NULL;
       name = va_arg (ap, const char *))
    {
      GParamSpec *pspec = g_object_class_find_property (G_OBJECT_GET_CLASS (object), name);
      GValue value = G_VALUE_INIT;
      char *error = NULL;

      if (pspec == NULL)
        {
          g_critical ("%s has no property “%s”", G_OBJECT_TYPE_NAME (object), name);
          break;
        }
      G_VALUE_COLLECT_INIT (&value, pspec->value_type, ap, 0, &error);
      if (error != NULL)
        {
          g_critical ("%s", error);
          g_free (error);
          break;
        }
      rugosa_history_set_value (self, object, name, &value);
      g_value_unset (&value);
    }
  va_end (ap);

  group = g_ptr_array_index (self->open_groups, self->open_groups->len - 1);
  if (group->children->len != 1)
    {
      close_group (self);
      /* the group was opened without a word: say only what changed */
      notify_state (self, could_undo, could_redo);
      return;
    }
  group = g_ptr_array_steal_index (self->open_groups, self->open_groups->len - 1);
  stack = group->children;
  self->merge_broken = broken;
  push (self, g_ptr_array_steal_index (stack, 0));
  command_free (group);
}

static void
insert_line (RugosaHistory *self, guint position, RugosaLine *line,
             const char *label)
{
  Command *c = command_new (CMD_INSERT, g_strdup (label));

  c->line = g_object_ref (line);
  c->position = position;
  command_apply (self, c, TRUE);
  self->merge_broken = TRUE;
  push (self, c);
}

void
rugosa_history_add_line (RugosaHistory *self, guint position, RugosaLine *line)
{
  g_return_if_fail (RUGOSA_IS_HISTORY (self));
  g_return_if_fail (RUGOSA_IS_LINE (line));
  g_return_if_fail (position <= rugosa_project_get_n_lines (self->project));
  g_return_if_fail (rugosa_project_find_line (self->project, line) < 0);

  insert_line (self, position, line, _("Add a line option"));
}

void
rugosa_history_remove_line (RugosaHistory *self, guint position)
{
  Command *c;

  g_return_if_fail (RUGOSA_IS_HISTORY (self));
  g_return_if_fail (position < rugosa_project_get_n_lines (self->project));

  c = command_new (CMD_REMOVE, g_strdup (_("Remove a line option")));
  c->line = g_object_ref (rugosa_project_get_line (self->project, position));
  c->position = position;
  command_apply (self, c, TRUE);
  self->merge_broken = TRUE;
  push (self, c);
}

void
rugosa_history_move_line (RugosaHistory *self, guint from, guint to)
{
  Command *c;
  guint n;

  g_return_if_fail (RUGOSA_IS_HISTORY (self));
  n = rugosa_project_get_n_lines (self->project);
  g_return_if_fail (from < n && to < n);
  if (from == to)
    return;

  c = command_new (CMD_MOVE, g_strdup (_("Move a line option")));
  c->position = from;
  c->to = to;
  command_apply (self, c, TRUE);
  self->merge_broken = TRUE;
  push (self, c);
}

RugosaLine *
rugosa_history_duplicate_line (RugosaHistory *self, guint position)
{
  g_autoptr (RugosaLine) copy = NULL;
  g_autofree char *name = NULL;

  g_return_val_if_fail (RUGOSA_IS_HISTORY (self), NULL);
  g_return_val_if_fail (position < rugosa_project_get_n_lines (self->project), NULL);

  copy = rugosa_line_duplicate (rugosa_project_get_line (self->project, position));
  /* TRANSLATORS: the name of a duplicated line option */
  name = g_strdup_printf (_("%s (copy)"), rugosa_line_get_name (copy));
  rugosa_line_set_name (copy, name);
  insert_line (self, position + 1, copy, _("Duplicate a line option"));
  return copy;
}

static void
open_group (RugosaHistory *self, const char *label)
{
  Command *g = command_new (CMD_GROUP, g_strdup (label ? label : _("Edit")));

  g->children = g_ptr_array_new_with_free_func (command_free);
  g_ptr_array_add (self->open_groups, g);
  self->merge_broken = TRUE;
}

void
rugosa_history_begin_group (RugosaHistory *self, const char *label)
{
  gboolean could_undo, could_redo;

  g_return_if_fail (RUGOSA_IS_HISTORY (self));
  could_undo = rugosa_history_can_undo (self);
  could_redo = rugosa_history_can_redo (self);
  open_group (self, label);
  /* Nothing can be undone while a group is open: say so, and say so again
   * when it closes (end_group). */
  notify_state (self, could_undo, could_redo);
}

/* Close the innermost group: it becomes one step (none when empty).  The
 * step's push tells observers of a change against the state before the
 * group opened. */
static void
close_group (RugosaHistory *self)
{
  Command *g = g_ptr_array_steal_index (self->open_groups, self->open_groups->len - 1);

  if (g->children->len == 0)
    {
      command_free (g);
      return;
    }
  self->merge_broken = TRUE;
  push (self, g);
  self->merge_broken = TRUE;
}

void
rugosa_history_end_group (RugosaHistory *self)
{
  gboolean could_undo, could_redo;

  g_return_if_fail (RUGOSA_IS_HISTORY (self));
  g_return_if_fail (self->open_groups->len > 0);

  could_undo = rugosa_history_can_undo (self);
  could_redo = rugosa_history_can_redo (self);
  close_group (self);
  notify_state (self, could_undo, could_redo);
}

void
rugosa_history_break_merge (RugosaHistory *self)
{
  g_return_if_fail (RUGOSA_IS_HISTORY (self));
  self->merge_broken = TRUE;
}

void
rugosa_history_set_merge_interval (RugosaHistory *self, guint ms)
{
  g_return_if_fail (RUGOSA_IS_HISTORY (self));
  self->merge_interval_us = (gint64) ms * 1000;
}

gboolean
rugosa_history_can_undo (RugosaHistory *self)
{
  g_return_val_if_fail (RUGOSA_IS_HISTORY (self), FALSE);
  return self->undo_stack->len > 0 && self->open_groups->len == 0;
}

gboolean
rugosa_history_can_redo (RugosaHistory *self)
{
  g_return_val_if_fail (RUGOSA_IS_HISTORY (self), FALSE);
  return self->redo_stack->len > 0 && self->open_groups->len == 0;
}

static const char *
top_label (GPtrArray *stack)
{
  if (stack->len == 0)
    return NULL;
  return ((Command *) g_ptr_array_index (stack, stack->len - 1))->label;
}

const char *
rugosa_history_get_undo_label (RugosaHistory *self)
{
  g_return_val_if_fail (RUGOSA_IS_HISTORY (self), NULL);
  return top_label (self->undo_stack);
}

const char *
rugosa_history_get_redo_label (RugosaHistory *self)
{
  g_return_val_if_fail (RUGOSA_IS_HISTORY (self), NULL);
  return top_label (self->redo_stack);
}

static gboolean
step (RugosaHistory *self, GPtrArray *from, GPtrArray *to, gboolean forward)
{
  gboolean could_undo, could_redo;
  Command *c;

  if (from->len == 0 || self->open_groups->len > 0)
    return FALSE;
  could_undo = rugosa_history_can_undo (self);
  could_redo = rugosa_history_can_redo (self);
  c = g_ptr_array_steal_index (from, from->len - 1);
  /* a step of many edits (one applied to many lines) is one change */
  rugosa_project_hold_changed (self->project);
  command_apply (self, c, forward);
  g_ptr_array_add (to, c);
  rugosa_project_release_changed (self->project);
  self->merge_broken = TRUE;
  notify_state (self, could_undo, could_redo);
  return TRUE;
}

gboolean
rugosa_history_undo (RugosaHistory *self)
{
  g_return_val_if_fail (RUGOSA_IS_HISTORY (self), FALSE);
  return step (self, self->undo_stack, self->redo_stack, FALSE);
}

gboolean
rugosa_history_redo (RugosaHistory *self)
{
  g_return_val_if_fail (RUGOSA_IS_HISTORY (self), FALSE);
  return step (self, self->redo_stack, self->undo_stack, TRUE);
}

void
rugosa_history_clear (RugosaHistory *self)
{
  gboolean could_undo, could_redo;

  g_return_if_fail (RUGOSA_IS_HISTORY (self));
  could_undo = rugosa_history_can_undo (self);
  could_redo = rugosa_history_can_redo (self);
  g_ptr_array_set_size (self->undo_stack, 0);
  g_ptr_array_set_size (self->redo_stack, 0);
  g_ptr_array_set_size (self->open_groups, 0);
  notify_state (self, could_undo, could_redo);
}
