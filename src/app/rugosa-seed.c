/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-seed"

#include "config.h"

#include "model/rugosa-fields.h"
#include "model/rugosa-units.h"
#include "rugosa-seed.h"

char *
rugosa_seed_unit_key (RugosaDisplayQuantity dq)
{
  const RugosaDisplayInfo *info = rugosa_display_info (dq);
  char *key;

  g_return_val_if_fail (info != NULL, NULL);
  /* The schema's keys are generated from the same table (gen-fields). */
  key = g_strconcat ("unit-", info->id, NULL);
  g_strdelimit (key, "_", '-');
  return key;
}

static void
_rugosa_seed_reset (RugosaSettings    *settings,
                    const RugosaField *row)
{
  GParamSpec *pspec = g_object_class_find_property (G_OBJECT_GET_CLASS (settings), row->property);
  g_auto (GValue) v = G_VALUE_INIT;

  g_value_init (&v, pspec->value_type);
  g_param_value_set_default (pspec, &v);
  g_object_set_property (G_OBJECT (settings), row->property, &v);
}

void
rugosa_seed_settings (GSettings      *prefs,
                      RugosaSettings *settings)
{
  guint n;
  const RugosaField *rows = rugosa_settings_fields (&n);
  const char *failed = NULL;

  g_return_if_fail (G_IS_SETTINGS (prefs));
  g_return_if_fail (RUGOSA_IS_SETTINGS (settings));

  g_object_freeze_notify (G_OBJECT (settings));
  for (guint i = 0; i < n; i++)
    {
      const RugosaField *row = &rows[i];

      if (!(row->flags & RUGOSA_FIELD_SEEDED))
        continue;
      switch (row->kind)
        {
        case RUGOSA_FIELD_ENUM:
          g_object_set (settings, row->property, g_settings_get_enum (prefs, row->property), NULL);
          break;
        case RUGOSA_FIELD_NUMBER:
          {
            double v = g_settings_get_double (prefs, row->property);

            if (rugosa_field_in_range (row, v, NULL, NULL))
              g_object_set (settings, row->property, v, NULL);
            else
              _rugosa_seed_reset (settings, row);
          }
          break;
        case RUGOSA_FIELD_TEXT:
          {
            g_autofree char *text = g_settings_get_string (prefs, row->property);

            /* a text the row would refuse in a file is not taken */
            if (rugosa_field_text_ok (row, text))
              g_object_set (settings, row->property, text, NULL);
          }
          break;
        case RUGOSA_FIELD_UNIT_MAP:
          {
            GVariantBuilder b;

            g_variant_builder_init (&b, G_VARIANT_TYPE ("a{ss}"));
            for (int q = 0; q < RUGOSA_N_DISPLAY; q++)
              {
                const RugosaDisplayInfo *info = rugosa_display_info ((RugosaDisplayQuantity) q);
                g_autofree char *key = NULL;
                g_autofree char *unit = NULL;

                if (info == NULL)
                  continue;
                key = rugosa_seed_unit_key ((RugosaDisplayQuantity) q);
                unit = g_settings_get_string (prefs, key);
                /* '' is the unit system's usual unit. */
                if (*unit != '\0' && rugosa_display_unit_valid ((RugosaDisplayQuantity) q, unit))
                  g_variant_builder_add (&b, "{ss}", info->id, unit);
              }
            g_object_set (settings, row->property, g_variant_builder_end (&b), NULL);
          }
          break;
        default:
          g_warn_if_reached ();
          break;
        }
    }
  /* Keys written by hand may hold a pair out of order: the field the
   * check names goes back to its default, and if that is not enough every
   * seeded number does (the rows' defaults are in order). */
  if (rugosa_settings_check (settings, &failed, NULL) != RG_OK)
    {
      const RugosaField *row = rugosa_field_find (failed);

      if (row != NULL)
        _rugosa_seed_reset (settings, row);
      if (rugosa_settings_check (settings, NULL, NULL) != RG_OK)
        for (guint i = 0; i < n; i++)
          if ((rows[i].flags & RUGOSA_FIELD_SEEDED) && rows[i].kind == RUGOSA_FIELD_NUMBER)
            _rugosa_seed_reset (settings, &rows[i]);
    }
  g_object_thaw_notify (G_OBJECT (settings));
}

void
rugosa_seed_store (RugosaSettings *settings,
                   GSettings      *prefs)
{
  guint n;
  const RugosaField *rows = rugosa_settings_fields (&n);

  g_return_if_fail (RUGOSA_IS_SETTINGS (settings));
  g_return_if_fail (G_IS_SETTINGS (prefs));

  g_settings_delay (prefs);
  for (guint i = 0; i < n; i++)
    {
      const RugosaField *row = &rows[i];

      if (!(row->flags & RUGOSA_FIELD_SEEDED))
        continue;
      switch (row->kind)
        {
        case RUGOSA_FIELD_ENUM:
          {
            int v = 0;

            g_object_get (settings, row->property, &v, NULL);
            g_settings_set_enum (prefs, row->property, v);
          }
          break;
        case RUGOSA_FIELD_NUMBER:
          g_settings_set_double (prefs, row->property, rugosa_settings_get_double (settings, row->property));
          break;
        case RUGOSA_FIELD_TEXT:
          {
            g_autofree char *text = NULL;

            g_object_get (settings, row->property, &text, NULL);
            g_settings_set_string (prefs, row->property, text ? text : "");
          }
          break;
        case RUGOSA_FIELD_UNIT_MAP:
          {
            g_autoptr (GVariant) map = NULL;

            g_object_get (settings, row->property, &map, NULL);
            for (int q = 0; q < RUGOSA_N_DISPLAY; q++)
              {
                const RugosaDisplayInfo *info = rugosa_display_info ((RugosaDisplayQuantity) q);
                g_autofree char *key = NULL;
                const char *unit = NULL;

                if (info == NULL)
                  continue;
                key = rugosa_seed_unit_key ((RugosaDisplayQuantity) q);
                if (map == NULL || !g_variant_lookup (map, info->id, "&s", &unit))
                  unit = "";
                g_settings_set_string (prefs, key, unit);
              }
          }
          break;
        default:
          g_warn_if_reached ();
          break;
        }
    }
  g_settings_apply (prefs);
}

gboolean
rugosa_seed_is_seed_key (const char *key)
{
  const RugosaField *row;

  if (key == NULL)
    return FALSE;
  if (g_str_has_prefix (key, "unit-") && !g_str_equal (key, "unit-system"))
    return TRUE;
  row = rugosa_field_find (key);
  return row != NULL && (row->flags & RUGOSA_FIELD_SEEDED) != 0;
}
