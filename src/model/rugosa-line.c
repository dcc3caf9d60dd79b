/* SPDX-License-Identifier: GPL-3.0-or-later */
/* A line option.  Its fields and their properties come from the line field
 * table (rugosa-fields.c); this file only stores them. */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <string.h>

#include "rugosa-field-object.h"
#include "rugosa-line-private.h"
#include "rugosa-model-private.h"

G_DEFINE_FINAL_TYPE (RugosaLine, rugosa_line, G_TYPE_OBJECT)

/* Property i (from 1) is row i − 1 of the line field table. */
static const RugosaField *rows;
static guint n_rows;
static GParamSpec **properties;

static const RugosaField *
row_of (guint prop_id)
{
  g_assert (prop_id >= 1 && prop_id <= n_rows);
  return &rows[prop_id - 1];
}

static void
rugosa_line_finalize (GObject *object)
{
  RugosaLine *self = RUGOSA_LINE (object);

  _rugosa_fields_clear (rows, n_rows, self);
  g_clear_pointer (&self->extra, cJSON_Delete);
  G_OBJECT_CLASS (rugosa_line_parent_class)->finalize (object);
}

static void
rugosa_line_get_property (GObject *object, guint prop_id, GValue *value,
                          GParamSpec *pspec)
{
  if (prop_id < 1 || prop_id > n_rows)
    {
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
      return;
    }
  _rugosa_fields_get (row_of (prop_id), object, value);
}

static void
rugosa_line_set_property (GObject *object, guint prop_id, const GValue *value,
                          GParamSpec *pspec)
{
  RugosaLine *self = RUGOSA_LINE (object);

  if (prop_id < 1 || prop_id > n_rows)
    {
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
      return;
    }
  if (_rugosa_fields_set (row_of (prop_id), object, value))
    {
      self->revision++;
      g_object_notify_by_pspec (object, pspec);
    }
}

static void
rugosa_line_class_init (RugosaLineClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);

  object_class->finalize = rugosa_line_finalize;
  object_class->get_property = rugosa_line_get_property;
  object_class->set_property = rugosa_line_set_property;

  rows = rugosa_line_fields (&n_rows);
  properties = g_new0 (GParamSpec *, n_rows + 1);
  _rugosa_fields_install (rows, n_rows, properties, 1,
                          G_PARAM_READWRITE | G_PARAM_EXPLICIT_NOTIFY
                          | G_PARAM_STATIC_STRINGS);
  g_object_class_install_properties (object_class, n_rows + 1, properties);
}

static void
rugosa_line_init (RugosaLine *self)
{
  _rugosa_fields_init (rows, n_rows, self);
}

RugosaLine *
rugosa_line_new (const char *name)
{
  return g_object_new (RUGOSA_TYPE_LINE, "name", name ? name : "", NULL);
}

RugosaLine *
rugosa_line_duplicate (RugosaLine *self)
{
  RugosaLine *copy;

  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);

  copy = g_object_new (RUGOSA_TYPE_LINE, NULL);
  for (guint i = 0; i < n_rows; i++)
    {
      GValue v = G_VALUE_INIT;

      g_value_init (&v, properties[i + 1]->value_type);
      _rugosa_fields_get (&rows[i], self, &v);
      _rugosa_fields_set (&rows[i], copy, &v);
      g_value_unset (&v);
    }
  if (self->extra != NULL)
    copy->extra = cJSON_Duplicate (self->extra, 1);
  return copy;
}

gboolean
rugosa_line_equal (RugosaLine *a, RugosaLine *b)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (a) && RUGOSA_IS_LINE (b), FALSE);
  return _rugosa_fields_equal (rows, n_rows, a, b);
}

const char *
rugosa_line_get_name (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);
  return self->name;
}

void
rugosa_line_set_name (RugosaLine *self, const char *name)
{
  g_return_if_fail (RUGOSA_IS_LINE (self));
  g_object_set (self, "name", name, NULL);
}

const char *
rugosa_line_get_colour (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);
  return self->colour;
}

int
rugosa_line_get_fluid_kind (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), 0);
  return self->fluid_kind;
}

const char *
rugosa_line_get_material_id (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);
  return self->material_id;
}

const char *
rugosa_line_get_aging_class_id (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);
  return self->aging_class_id;
}

const char *
rugosa_line_get_pipe_designation (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);
  return self->pipe_designation;
}

const char *
rugosa_line_get_note (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);
  return self->note;
}

double
rugosa_line_get_double (RugosaLine *self, const char *property)
{
  const RugosaField *row = rugosa_field_find (property);

  g_return_val_if_fail (RUGOSA_IS_LINE (self), 0.0);
  g_return_val_if_fail (row != NULL && row >= rows && row < rows + n_rows
                        && row->kind == RUGOSA_FIELD_NUMBER, 0.0);
  return *_rugosa_fields_double (row, self);
}

void
rugosa_line_set_double (RugosaLine *self, const char *property, double value)
{
  g_return_if_fail (RUGOSA_IS_LINE (self));
  g_object_set (self, property, value, NULL);
}

GVariant *
rugosa_line_get_fittings (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);
  return self->fittings;
}

void
rugosa_line_set_fittings (RugosaLine *self, GVariant *fittings)
{
  g_return_if_fail (RUGOSA_IS_LINE (self));
  g_object_set (self, "fittings", fittings, NULL);
}

void
rugosa_line_get_fluid_spec (RugosaLine *self, RgFluidSpec *spec)
{
  g_return_if_fail (RUGOSA_IS_LINE (self));

  /* Every row with a place in RgFluidSpec is copied there. */
  rg_fluid_spec_init (spec, (RgFluidKind) self->fluid_kind);
  for (guint i = 0; i < n_rows; i++)
    if (rows[i].spec_offset >= 0)
      *(double *) G_STRUCT_MEMBER_P (spec, rows[i].spec_offset) =
        *_rugosa_fields_double (&rows[i], self);
}

guint64
rugosa_line_get_revision (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), 0);
  return self->revision;
}

const cJSON *
_rugosa_line_get_extra (RugosaLine *self)
{
  return self->extra;
}

void
_rugosa_line_take_extra (RugosaLine *self, cJSON *extra)
{
  g_clear_pointer (&self->extra, cJSON_Delete);
  self->extra = extra;
}
