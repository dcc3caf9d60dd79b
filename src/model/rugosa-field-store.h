/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Storing field values without GObject notification, for evaluating many
 * inputs one after another in one line and one project (rugosa-cli line,
 * one row of a batch after the other).  A value is stored through its
 * row's offset and the object's revision moves on when it changed, so the
 * evaluation cache sees the change; no "notify" and no project "changed"
 * is emitted.  Not for objects a view listens to (the window's). */
#pragma once

#include "rugosa-fields.h"
#include "rugosa-line.h"
#include "rugosa-settings.h"

G_BEGIN_DECLS

/* `object` is a RugosaLine (a line row) or a RugosaSettings (a settings
 * row); `value` holds the row's type (double, enum as int, string,
 * variant).  TRUE when the stored value changed. */
gboolean rugosa_field_store (gpointer object, const RugosaField *row,
                             const GValue *value);
gboolean rugosa_field_store_double (gpointer object, const RugosaField *row,
                                    double value);
gboolean rugosa_field_store_int (gpointer object, const RugosaField *row,
                                 int value);
/* NULL clears a catalog id (its custom partner value applies). */
gboolean rugosa_field_store_string (gpointer object, const RugosaField *row,
                                    const char *value);
/* `value` may be floating; it is sunk. */
gboolean rugosa_field_store_variant (gpointer object, const RugosaField *row,
                                     GVariant *value);

/* Every field of the line (or settings) back to its default. */
void rugosa_line_store_defaults (RugosaLine *line);
void rugosa_settings_store_defaults (RugosaSettings *settings);

G_END_DECLS
