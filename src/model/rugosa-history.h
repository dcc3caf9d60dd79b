/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Undo and redo for one project: every edit is a command on one stack.
 * Consecutive changes of the same property of the same object within the
 * merge interval (a slider drag, typing) merge into one step; an explicit
 * group (begin_group … end_group) makes several edits one step. */
#pragma once

#include <glib-object.h>

#include "rugosa-project.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_HISTORY (rugosa_history_get_type ())
G_DECLARE_FINAL_TYPE (RugosaHistory, rugosa_history, RUGOSA, HISTORY, GObject)

RugosaHistory *rugosa_history_new (RugosaProject *project);
RugosaProject *rugosa_history_get_project (RugosaHistory *self);

/* Change properties of a line, or of the project's settings, as one undo
 * step; pairs of name and value as for g_object_set(), NULL-terminated.
 * A value equal to the current one records nothing. */
void rugosa_history_set (RugosaHistory *self, gpointer object,
                         const char *first_property, ...) G_GNUC_NULL_TERMINATED;
void rugosa_history_set_value (RugosaHistory *self, gpointer object,
                               const char *property, const GValue *value);

/* Structural edits. */
void rugosa_history_add_line (RugosaHistory *self, guint position,
                              RugosaLine *line);
void rugosa_history_remove_line (RugosaHistory *self, guint position);
void rugosa_history_move_line (RugosaHistory *self, guint from, guint to);
/* Inserts a copy after `position`, named "<name> (copy)"; borrowed. */
RugosaLine *rugosa_history_duplicate_line (RugosaHistory *self,
                                           guint position);

/* Everything between begin and end is one step (nesting allowed). */
void rugosa_history_begin_group (RugosaHistory *self, const char *label);
void rugosa_history_end_group (RugosaHistory *self);
/* The next change starts a new step even if it could merge (call at the
 * end of a drag or when a text field loses focus). */
void rugosa_history_break_merge (RugosaHistory *self);
/* Changes of the same property closer in time than this merge
 * (milliseconds; default 1000; 0 never merges by time). */
void rugosa_history_set_merge_interval (RugosaHistory *self, guint ms);

gboolean rugosa_history_can_undo (RugosaHistory *self);
gboolean rugosa_history_can_redo (RugosaHistory *self);
/* A short text for the menu ("Change length"), or NULL. */
const char *rugosa_history_get_undo_label (RugosaHistory *self);
const char *rugosa_history_get_redo_label (RugosaHistory *self);
gboolean rugosa_history_undo (RugosaHistory *self);
gboolean rugosa_history_redo (RugosaHistory *self);
/* Forget every step (after loading another file). */
void rugosa_history_clear (RugosaHistory *self);

G_END_DECLS
