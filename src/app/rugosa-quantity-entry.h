/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <gtk/gtk.h>

#include "model/rugosa-fields.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_QUANTITY_ENTRY (rugosa_quantity_entry_get_type ())
G_DECLARE_FINAL_TYPE (RugosaQuantityEntry, rugosa_quantity_entry, RUGOSA, QUANTITY_ENTRY, GtkWidget)

/* A text field for one NUMBER row of a field table (model/rugosa-fields.h).
 * The row decides everything about the value: its quantity, how typed text
 * is read (rugosa_field_parse_text: any unit of the quantity, a bare
 * number in the unit shown), its range (rugosa_field_in_range, the
 * sentence in the unit shown), and the row's label and help, which name
 * the field for screen readers, fill its tooltip and, when the entry sits
 * in an AdwActionRow, that row's title and subtitle.  `value` is the
 * row's stored value (SI, or per year where the row keeps it so).
 *
 * A refused entry keeps the last valid value in force, adds the `error`
 * style class and says why in `error-text`, the tooltip and the row's
 * subtitle, until a value is taken. */

GtkWidget         *rugosa_quantity_entry_new            (void);
/* The row edited; NULL until set.  Setting it also names the widget
 * after the row's property. */
const RugosaField *rugosa_quantity_entry_get_field      (RugosaQuantityEntry *self);
void               rugosa_quantity_entry_set_field      (RugosaQuantityEntry *self,
                                                         const RugosaField   *field);
double             rugosa_quantity_entry_get_value      (RugosaQuantityEntry *self);
/* Show a value (stored unit) without emitting `committed`; clears the error. */
void               rugosa_quantity_entry_set_value      (RugosaQuantityEntry *self,
                                                         double               value);
/* The display unit (a spelling of the row's quantity; NULL: SI). */
const char        *rugosa_quantity_entry_get_unit       (RugosaQuantityEntry *self);
void               rugosa_quantity_entry_set_unit       (RugosaQuantityEntry *self,
                                                         const char          *unit);
/* The density a kinematic viscosity typed into a dynamic-viscosity row
 * is converted with (kg/m³). */
void               rugosa_quantity_entry_set_density    (RugosaQuantityEntry *self,
                                                         double               density_kg_m3);
/* The row's subtitle while nothing is wrong (default: the row's help). */
void               rugosa_quantity_entry_set_hint       (RugosaQuantityEntry *self,
                                                         const char          *hint);
const char        *rugosa_quantity_entry_get_error_text (RugosaQuantityEntry *self);
/* Parse `text` as if typed and activated (used by tests and drops). */
gboolean           rugosa_quantity_entry_commit_text    (RugosaQuantityEntry *self,
                                                         const char          *text);
/* Mark the field as wrong with a sentence from elsewhere (e.g. the model
 * refused a parsed value), keeping the last valid value shown. */
void               rugosa_quantity_entry_set_error      (RugosaQuantityEntry *self,
                                                         const char          *text);
/* Mark the field as the cause of a problem found elsewhere (a line that
 * cannot be evaluated because of it), or clear that mark with NULL.  The
 * value shown stays the model's. */
void               rugosa_quantity_entry_set_problem    (RugosaQuantityEntry *self,
                                                         const char          *text);
const char        *rugosa_quantity_entry_get_problem    (RugosaQuantityEntry *self);
GtkEditable       *rugosa_quantity_entry_get_editable   (RugosaQuantityEntry *self);
/* The text of a value as the field shows it ("20 °C", "0.0007"). */
char              *rugosa_quantity_entry_format         (RugosaQuantityEntry *self,
                                                         double               value);

G_END_DECLS
