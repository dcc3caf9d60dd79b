/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The preferences seed new projects: the settings rows flagged
 * RUGOSA_FIELD_SEEDED (unit system, units, friction model, transition,
 * warning limits) start a new project with the values of their keys.
 * Nothing else reads those keys, so an open project keeps its own. */
#pragma once

#include <gio/gio.h>

#include "model/rugosa-settings.h"

G_BEGIN_DECLS

/* The key of a display quantity's unit: "unit-" and its id with '-' for
 * '_' ("unit-dynamic-viscosity"). */
char    *rugosa_seed_unit_key      (RugosaDisplayQuantity dq);

/* Sets every seeded row of `settings` from `prefs`.  A unit key holding a
 * spelling this build cannot read, or a pair of values out of order, is
 * left at the row's default. */
void     rugosa_seed_settings      (GSettings      *prefs,
                                    RugosaSettings *settings);

/* Writes every seeded row of `settings` to `prefs` (one change). */
void     rugosa_seed_store         (RugosaSettings *settings,
                                    GSettings      *prefs);

/* The preferences key of `property` (a seeded row) or of one of its
 * unit keys: TRUE for the keys rugosa_seed_settings reads. */
gboolean rugosa_seed_is_seed_key   (const char     *key);

G_END_DECLS
