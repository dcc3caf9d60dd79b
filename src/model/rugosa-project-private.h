/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The RugosaProject struct, shared by rugosa-project*.c. */
#pragma once

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
};
