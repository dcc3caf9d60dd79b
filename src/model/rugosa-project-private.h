/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The RugosaProject struct, shared by rugosa-project*.c. */
#pragma once

#include "core/catalog.h"
#include "rugosa-model-private.h"

struct _RugosaProject
{
  GObject parent_instance;

  /* owned */
  GPtrArray *lines;           /* of RugosaLine */
  RugosaSettings *settings;
  cJSON *extra;               /* unknown top-level file fields */
  GHashTable *eval_cache;     /* RugosaLine* (not a ref) -> LineCache* */
  GHashTable *pipe_memo;      /* designation text -> const RgPipe* (catalog) */
  struct FluidMemo *fluid_memo; /* the last fluid states and their properties */

  guint64 evaluation_count;
  guint64 eval_clock;         /* counts cache lookups, for LRU */
  guint changed_holds;        /* rugosa_project_hold_changed, nested */
  gboolean changed_pending;   /* a change seen while held */
};

/* Remember a catalog pipe under its own designation, so that evaluating
 * lines named by catalog designations skips the parser (sizing). */
void _rugosa_project_remember_pipe (RugosaProject *self, const RgPipe *pipe);
