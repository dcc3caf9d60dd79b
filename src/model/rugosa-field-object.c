/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <string.h>

#include "rugosa-field-object.h"
#include "rugosa-line.h"

const GVariantType *
_rugosa_fields_variant_type (const RugosaField *row)
{
  switch (row->kind)
    {
    case RUGOSA_FIELD_FITTINGS:
      return G_VARIANT_TYPE (RUGOSA_LINE_FITTINGS_TYPE);
    case RUGOSA_FIELD_CURVE:
      return G_VARIANT_TYPE (RUGOSA_LINE_CURVE_TYPE);
    case RUGOSA_FIELD_UNIT_MAP:
    default:
      return G_VARIANT_TYPE ("a{ss}");
    }
}

static GVariant *
empty_variant (const RugosaField *row)
{
  return g_variant_ref_sink (g_variant_new_array (
    g_variant_type_element (_rugosa_fields_variant_type (row)), NULL, 0));
}

void
_rugosa_fields_install (const RugosaField *rows, guint n,
                        GParamSpec **properties, guint first,
                        GParamFlags flags)
{
  for (guint i = 0; i < n; i++)
    {
      const RugosaField *r = &rows[i];
      GParamSpec *p = NULL;

      switch (r->kind)
        {
        case RUGOSA_FIELD_NUMBER:
          /* A field where 0 means "not given" must take 0. */
          p = g_param_spec_double (r->property, NULL, r->help,
                                   (r->flags & RUGOSA_FIELD_ZERO_ABSENT) ? MIN (0.0, r->min) : r->min,
                                   r->max, r->dflt, flags);
          break;
        case RUGOSA_FIELD_TEXT:
        case RUGOSA_FIELD_COLOUR:
        case RUGOSA_FIELD_CATALOG:
          p = g_param_spec_string (r->property, NULL, r->help, r->dflt_text, flags);
          break;
        case RUGOSA_FIELD_ENUM:
          p = g_param_spec_enum (r->property, NULL, r->help, r->enum_type (),
                                 (int) r->dflt, flags);
          break;
        case RUGOSA_FIELD_FITTINGS:
        case RUGOSA_FIELD_UNIT_MAP:
        case RUGOSA_FIELD_CURVE:
          p = g_param_spec_variant (r->property, NULL, r->help,
                                    _rugosa_fields_variant_type (r), NULL, flags);
          break;
        default:
          g_assert_not_reached ();
        }
      properties[first + i] = p;
    }
}

void
_rugosa_fields_init (const RugosaField *rows, guint n, gpointer instance)
{
  for (guint i = 0; i < n; i++)
    {
      const RugosaField *r = &rows[i];

      switch (r->kind)
        {
        case RUGOSA_FIELD_NUMBER:
          *_rugosa_fields_double (r, instance) = r->dflt;
          break;
        case RUGOSA_FIELD_TEXT:
        case RUGOSA_FIELD_COLOUR:
        case RUGOSA_FIELD_CATALOG:
          *_rugosa_fields_string (r, instance) = g_strdup (r->dflt_text);
          break;
        case RUGOSA_FIELD_ENUM:
          *_rugosa_fields_int (r, instance) = (int) r->dflt;
          break;
        case RUGOSA_FIELD_FITTINGS:
        case RUGOSA_FIELD_UNIT_MAP:
        case RUGOSA_FIELD_CURVE:
          *_rugosa_fields_variant (r, instance) = empty_variant (r);
          break;
        default:
          g_assert_not_reached ();
        }
    }
}

void
_rugosa_fields_clear (const RugosaField *rows, guint n, gpointer instance)
{
  for (guint i = 0; i < n; i++)
    switch (rows[i].kind)
      {
      case RUGOSA_FIELD_TEXT:
      case RUGOSA_FIELD_COLOUR:
      case RUGOSA_FIELD_CATALOG:
        g_clear_pointer (_rugosa_fields_string (&rows[i], instance), g_free);
        break;
      case RUGOSA_FIELD_FITTINGS:
      case RUGOSA_FIELD_UNIT_MAP:
      case RUGOSA_FIELD_CURVE:
        g_clear_pointer (_rugosa_fields_variant (&rows[i], instance), g_variant_unref);
        break;
      case RUGOSA_FIELD_NUMBER:
      case RUGOSA_FIELD_ENUM:
      default:
        break;
      }
}

void
_rugosa_fields_get (const RugosaField *r, gpointer instance, GValue *value)
{
  switch (r->kind)
    {
    case RUGOSA_FIELD_NUMBER:
      g_value_set_double (value, *_rugosa_fields_double (r, instance));
      break;
    case RUGOSA_FIELD_TEXT:
    case RUGOSA_FIELD_COLOUR:
    case RUGOSA_FIELD_CATALOG:
      g_value_set_string (value, *_rugosa_fields_string (r, instance));
      break;
    case RUGOSA_FIELD_ENUM:
      g_value_set_enum (value, *_rugosa_fields_int (r, instance));
      break;
    case RUGOSA_FIELD_FITTINGS:
    case RUGOSA_FIELD_UNIT_MAP:
    case RUGOSA_FIELD_CURVE:
      g_value_set_variant (value, *_rugosa_fields_variant (r, instance));
      break;
    default:
      g_assert_not_reached ();
    }
}

gboolean
_rugosa_fields_set (const RugosaField *r, gpointer instance,
                    const GValue *value)
{
  switch (r->kind)
    {
    case RUGOSA_FIELD_NUMBER:
      {
        double *d = _rugosa_fields_double (r, instance);
        double v = g_value_get_double (value);

        if (*d == v)
          return FALSE;
        *d = v;
        return TRUE;
      }
    case RUGOSA_FIELD_TEXT:
    case RUGOSA_FIELD_COLOUR:
    case RUGOSA_FIELD_CATALOG:
      {
        char **s = _rugosa_fields_string (r, instance);
        const char *v = g_value_get_string (value);

        /* Texts are never NULL; a catalog id uses NULL for "custom" and
         * takes "" the same way. */
        if (r->kind != RUGOSA_FIELD_CATALOG)
          v = v ? v : (r->dflt_text ? r->dflt_text : "");
        else if (v != NULL && *v == '\0')
          v = NULL;
        if (g_strcmp0 (*s, v) == 0)
          return FALSE;
        g_free (*s);
        *s = g_strdup (v);
        return TRUE;
      }
    case RUGOSA_FIELD_ENUM:
      {
        int *e = _rugosa_fields_int (r, instance);
        int v = g_value_get_enum (value);

        if (*e == v)
          return FALSE;
        *e = v;
        return TRUE;
      }
    case RUGOSA_FIELD_FITTINGS:
    case RUGOSA_FIELD_UNIT_MAP:
    case RUGOSA_FIELD_CURVE:
      {
        GVariant **slot = _rugosa_fields_variant (r, instance);
        GVariant *v = g_value_get_variant (value);
        gboolean changed;

        v = v != NULL ? g_variant_ref_sink (v) : empty_variant (r);
        changed = *slot == NULL || !g_variant_equal (*slot, v);
        if (changed)
          {
            g_clear_pointer (slot, g_variant_unref);
            *slot = g_variant_ref (v);
          }
        g_variant_unref (v);
        return changed;
      }
    default:
      g_assert_not_reached ();
    }
  return FALSE;
}

gboolean
_rugosa_fields_equal (const RugosaField *rows, guint n, gpointer a, gpointer b)
{
  for (guint i = 0; i < n; i++)
    {
      const RugosaField *r = &rows[i];

      switch (r->kind)
        {
        case RUGOSA_FIELD_NUMBER:
          if (*_rugosa_fields_double (r, a) != *_rugosa_fields_double (r, b))
            return FALSE;
          break;
        case RUGOSA_FIELD_TEXT:
        case RUGOSA_FIELD_COLOUR:
        case RUGOSA_FIELD_CATALOG:
          if (g_strcmp0 (*_rugosa_fields_string (r, a), *_rugosa_fields_string (r, b)) != 0)
            return FALSE;
          break;
        case RUGOSA_FIELD_ENUM:
          if (*_rugosa_fields_int (r, a) != *_rugosa_fields_int (r, b))
            return FALSE;
          break;
        case RUGOSA_FIELD_FITTINGS:
        case RUGOSA_FIELD_UNIT_MAP:
        case RUGOSA_FIELD_CURVE:
          if (!g_variant_equal (*_rugosa_fields_variant (r, a), *_rugosa_fields_variant (r, b)))
            return FALSE;
          break;
        default:
          g_assert_not_reached ();
        }
    }
  return TRUE;
}
