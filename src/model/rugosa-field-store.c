/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Storing field values without notification (see rugosa-field-store.h). */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include "rugosa-field-object.h"
#include "rugosa-field-store.h"
#include "rugosa-line-private.h"
#include "rugosa-settings-private.h"

/* The revision of the object holding `row`, and whether the row changes
 * results (a view setting, the service age shown, does not: the
 * evaluation keys results by age instead). */
static guint64 *
revision_of (gpointer object, const RugosaField *row)
{
  if (RUGOSA_IS_LINE (object))
    return &((RugosaLine *) object)->revision;
  g_return_val_if_fail (RUGOSA_IS_SETTINGS (object), NULL);
  if (row->flags & RUGOSA_FIELD_VIEW)
    return NULL;
  return &((RugosaSettings *) object)->revision;
}

gboolean
rugosa_field_store (gpointer object, const RugosaField *row, const GValue *value)
{
  guint64 *revision;

  if (!_rugosa_fields_set (row, object, value))
    return FALSE;
  revision = revision_of (object, row);
  if (revision != NULL)
    (*revision)++;
  return TRUE;
}

gboolean
rugosa_field_store_double (gpointer object, const RugosaField *row, double value)
{
  GValue v = G_VALUE_INIT;

  g_return_val_if_fail (row->kind == RUGOSA_FIELD_NUMBER, FALSE);
  g_value_init (&v, G_TYPE_DOUBLE);
  g_value_set_double (&v, value);
  return rugosa_field_store (object, row, &v);
}

gboolean
rugosa_field_store_int (gpointer object, const RugosaField *row, int value)
{
  GValue v = G_VALUE_INIT;
  gboolean changed;

  g_return_val_if_fail (row->kind == RUGOSA_FIELD_ENUM, FALSE);
  g_value_init (&v, row->enum_type ());
  g_value_set_enum (&v, value);
  changed = rugosa_field_store (object, row, &v);
  g_value_unset (&v);
  return changed;
}

gboolean
rugosa_field_store_string (gpointer object, const RugosaField *row, const char *value)
{
  GValue v = G_VALUE_INIT;
  gboolean changed;

  g_value_init (&v, G_TYPE_STRING);
  g_value_set_static_string (&v, value);
  changed = rugosa_field_store (object, row, &v);
  g_value_unset (&v);
  return changed;
}

gboolean
rugosa_field_store_variant (gpointer object, const RugosaField *row, GVariant *value)
{
  GValue v = G_VALUE_INIT;
  gboolean changed;

  g_value_init (&v, G_TYPE_VARIANT);
  g_value_set_variant (&v, value);
  changed = rugosa_field_store (object, row, &v);
  g_value_unset (&v);
  return changed;
}

/* Only the fields away from their default are stored again: a batch row
 * sets a handful of the forty. */
static void
store_defaults (gpointer object, const RugosaField *rows, guint n)
{
  for (guint i = 0; i < n; i++)
    {
      const RugosaField *row = &rows[i];

      switch (row->kind)
        {
        case RUGOSA_FIELD_NUMBER:
          if (*_rugosa_fields_double (row, object) != row->dflt)
            rugosa_field_store_double (object, row, row->dflt);
          break;
        case RUGOSA_FIELD_TEXT:
        case RUGOSA_FIELD_COLOUR:
          if (g_strcmp0 (*_rugosa_fields_string (row, object),
                         row->dflt_text != NULL ? row->dflt_text : "") != 0)
            rugosa_field_store_string (object, row, row->dflt_text);
          break;
        case RUGOSA_FIELD_CATALOG:
          if (g_strcmp0 (*_rugosa_fields_string (row, object), row->dflt_text) != 0)
            rugosa_field_store_string (object, row, row->dflt_text);
          break;
        case RUGOSA_FIELD_ENUM:
          if (*_rugosa_fields_int (row, object) != (int) row->dflt)
            rugosa_field_store_int (object, row, (int) row->dflt);
          break;
        case RUGOSA_FIELD_FITTINGS:
        case RUGOSA_FIELD_UNIT_MAP:
        case RUGOSA_FIELD_CURVE:
          /* an empty list: the row's default */
          if (g_variant_n_children (*_rugosa_fields_variant (row, object)) != 0)
            rugosa_field_store_variant (object, row,
                                        g_variant_new_array (g_variant_type_element (_rugosa_fields_variant_type (row)),
                                                             NULL, 0));
          break;
        default:
          g_assert_not_reached ();
        }
    }
}

void
rugosa_line_store_defaults (RugosaLine *line)
{
  guint n;
  const RugosaField *rows = rugosa_line_fields (&n);

  g_return_if_fail (RUGOSA_IS_LINE (line));
  store_defaults (line, rows, n);
}

void
rugosa_settings_store_defaults (RugosaSettings *settings)
{
  guint n;
  const RugosaField *rows = rugosa_settings_fields (&n);

  g_return_if_fail (RUGOSA_IS_SETTINGS (settings));
  store_defaults (settings, rows, n);
}
