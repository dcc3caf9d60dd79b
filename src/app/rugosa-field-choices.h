/* SPDX-License-Identifier: GPL-3.0-or-later */
/* How the values of an enumerated field read on screen: one title for
 * every value of the document's GEnum types (model/rugosa-enums.h), used
 * by every chooser of such a field (the line panel's fluid, the unit
 * system and the friction model in the preferences and the project
 * settings). */
#pragma once

#include <gtk/gtk.h>

G_BEGIN_DECLS

/* The translated title of `value` of `enum_type` ("US customary",
 * "Colebrook (1939)"); its nick when the type has no titles. */
const char    *rugosa_field_choice_title  (GType    enum_type,
                                           int      value);
/* The titles of every value, in the order of the GEnum's values. */
GtkStringList *rugosa_field_choice_titles (GType    enum_type);
/* Position in that list <-> value. */
int            rugosa_field_choice_value  (GType    enum_type,
                                           guint    position);
guint          rugosa_field_choice_position (GType  enum_type,
                                             int    value);

G_END_DECLS
