/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Properties of an object whose fields are rows of a field table
 * (RugosaLine, RugosaSettings): installation, defaults, get, set, compare
 * and copy, all driven by the rows. */
#pragma once

#include "rugosa-fields.h"

G_BEGIN_DECLS

/* Creates one GParamSpec per row into properties[first …]. */
void _rugosa_fields_install (const RugosaField *rows, guint n,
                             GParamSpec **properties, guint first,
                             GParamFlags flags);
/* Sets every field of `instance` to its default. */
void _rugosa_fields_init (const RugosaField *rows, guint n, gpointer instance);
/* Frees the fields' strings and variants. */
void _rugosa_fields_clear (const RugosaField *rows, guint n, gpointer instance);
void _rugosa_fields_get (const RugosaField *row, gpointer instance,
                         GValue *value);
/* TRUE when the value changed. */
gboolean _rugosa_fields_set (const RugosaField *row, gpointer instance,
                             const GValue *value);
gboolean _rugosa_fields_equal (const RugosaField *rows, guint n, gpointer a,
                               gpointer b);

static inline double *
_rugosa_fields_double (const RugosaField *row, gpointer instance)
{
  return (double *) G_STRUCT_MEMBER_P (instance, row->offset);
}

static inline char **
_rugosa_fields_string (const RugosaField *row, gpointer instance)
{
  return (char **) G_STRUCT_MEMBER_P (instance, row->offset);
}

static inline int *
_rugosa_fields_int (const RugosaField *row, gpointer instance)
{
  return (int *) G_STRUCT_MEMBER_P (instance, row->offset);
}

static inline GVariant **
_rugosa_fields_variant (const RugosaField *row, gpointer instance)
{
  return (GVariant **) G_STRUCT_MEMBER_P (instance, row->offset);
}

/* The GVariant type of a FITTINGS, UNIT_MAP or CURVE row. */
const GVariantType *_rugosa_fields_variant_type (const RugosaField *row);

G_END_DECLS
