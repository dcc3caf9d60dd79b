/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <gtk/gtk.h>

G_BEGIN_DECLS

#define RUGOSA_TYPE_QUANTITY_ENTRY (rugosa_quantity_entry_get_type ())
G_DECLARE_FINAL_TYPE (RugosaQuantityEntry, rugosa_quantity_entry, RUGOSA, QUANTITY_ENTRY, GtkWidget)

/* A text field for one physical quantity.  It accepts a number with any
 * unit the core's parser knows ("150 gpm", "2 in", "68 F"), shows the value
 * back in the display unit, and on a bad entry keeps its last valid value,
 * adds the `error` style class and explains the problem in `error-text`
 * and the tooltip.  `quantity` is an RgQuantity; `value` is in SI. */

GtkWidget  *rugosa_quantity_entry_new            (int                  quantity);
int         rugosa_quantity_entry_get_quantity   (RugosaQuantityEntry *self);
void        rugosa_quantity_entry_set_quantity   (RugosaQuantityEntry *self,
                                                  int                  quantity);
double      rugosa_quantity_entry_get_value      (RugosaQuantityEntry *self);
/* Show a value (SI) without emitting `committed`; clears the error. */
void        rugosa_quantity_entry_set_value      (RugosaQuantityEntry *self,
                                                  double               value);
const char *rugosa_quantity_entry_get_unit       (RugosaQuantityEntry *self);
void        rugosa_quantity_entry_set_unit       (RugosaQuantityEntry *self,
                                                  const char          *unit);
const char *rugosa_quantity_entry_get_error_text (RugosaQuantityEntry *self);
/* Parse `text` as if typed and activated (used by tests and drops). */
gboolean    rugosa_quantity_entry_commit_text    (RugosaQuantityEntry *self,
                                                  const char          *text);
/* Mark the field as wrong with a sentence from elsewhere (e.g. the model
 * refused a parsed value), keeping the last valid value shown. */
void        rugosa_quantity_entry_set_error      (RugosaQuantityEntry *self,
                                                  const char          *text);
GtkEditable *rugosa_quantity_entry_get_editable  (RugosaQuantityEntry *self);

G_END_DECLS
