/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-field-choices"

#include "config.h"

#include <glib/gi18n.h>

#include "model/rugosa-enums.h"
#include "rugosa-field-choices.h"

const char *
rugosa_field_choice_title (GType enum_type,
                           int   value)
{
  return rugosa_enum_title (enum_type, value);
}

GtkStringList *
rugosa_field_choice_titles (GType enum_type)
{
  GEnumClass *klass = g_type_class_ref (enum_type);
  GtkStringList *list = gtk_string_list_new (NULL);

  for (guint i = 0; i < klass->n_values; i++)
    gtk_string_list_append (list, rugosa_field_choice_title (enum_type, klass->values[i].value));
  g_type_class_unref (klass);
  return list;
}

int
rugosa_field_choice_value (GType enum_type,
                           guint position)
{
  GEnumClass *klass = g_type_class_ref (enum_type);
  int value = position < klass->n_values ? klass->values[position].value : -1;

  g_type_class_unref (klass);
  return value;
}

guint
rugosa_field_choice_position (GType enum_type,
                              int   value)
{
  GEnumClass *klass = g_type_class_ref (enum_type);
  guint position = GTK_INVALID_LIST_POSITION;

  for (guint i = 0; i < klass->n_values; i++)
    if (klass->values[i].value == value)
      position = i;
  g_type_class_unref (klass);
  return position;
}
