/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Project settings.  Their fields and properties come from the settings
 * field table (rugosa-fields.c); this file stores them and answers the
 * questions that involve more than one field. */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <string.h>

#include "core/regime.h"
#include "rugosa-display.h"
#include "rugosa-field-object.h"
#include "rugosa-model-private.h"
#include "rugosa-settings-private.h"
#include "rugosa-units.h"

G_DEFINE_FINAL_TYPE (RugosaSettings, rugosa_settings, G_TYPE_OBJECT)

static const RugosaField *rows;
static guint n_rows;
static GParamSpec **properties;

static void
rugosa_settings_finalize (GObject *object)
{
  RugosaSettings *self = RUGOSA_SETTINGS (object);

  _rugosa_fields_clear (rows, n_rows, self);
  g_clear_pointer (&self->extra, cJSON_Delete);
  G_OBJECT_CLASS (rugosa_settings_parent_class)->finalize (object);
}

static void
rugosa_settings_get_property (GObject *object, guint prop_id, GValue *value,
                              GParamSpec *pspec)
{
  if (prop_id < 1 || prop_id > n_rows)
    {
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
      return;
    }
  _rugosa_fields_get (&rows[prop_id - 1], object, value);
}

static void
rugosa_settings_set_property (GObject *object, guint prop_id,
                              const GValue *value, GParamSpec *pspec)
{
  RugosaSettings *self = RUGOSA_SETTINGS (object);

  if (prop_id < 1 || prop_id > n_rows)
    {
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
      return;
    }
  if (_rugosa_fields_set (&rows[prop_id - 1], object, value))
    {
      /* A view setting (the service age shown) changes no result: the
       * evaluation keys results by age instead. */
      if (!(rows[prop_id - 1].flags & RUGOSA_FIELD_VIEW))
        self->revision++;
      g_object_notify_by_pspec (object, pspec);
    }
}

static void
rugosa_settings_class_init (RugosaSettingsClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);

  object_class->finalize = rugosa_settings_finalize;
  object_class->get_property = rugosa_settings_get_property;
  object_class->set_property = rugosa_settings_set_property;

  rows = rugosa_settings_fields (&n_rows);
  properties = g_new0 (GParamSpec *, n_rows + 1);
  _rugosa_fields_install (rows, n_rows, properties, 1,
                          G_PARAM_READWRITE | G_PARAM_EXPLICIT_NOTIFY
                          | G_PARAM_STATIC_STRINGS);
  g_object_class_install_properties (object_class, n_rows + 1, properties);
}

static void
rugosa_settings_init (RugosaSettings *self)
{
  _rugosa_fields_init (rows, n_rows, self);
}

RugosaSettings *
rugosa_settings_new (void)
{
  return g_object_new (RUGOSA_TYPE_SETTINGS, NULL);
}

RugosaUnitSystem
rugosa_settings_get_unit_system (RugosaSettings *self)
{
  g_return_val_if_fail (RUGOSA_IS_SETTINGS (self), RUGOSA_UNIT_SYSTEM_SI);
  return (RugosaUnitSystem) self->unit_system;
}

int
rugosa_settings_get_friction_model (RugosaSettings *self)
{
  g_return_val_if_fail (RUGOSA_IS_SETTINGS (self), 0);
  return self->friction_model;
}

double
rugosa_settings_get_double (RugosaSettings *self, const char *property)
{
  const RugosaField *row = rugosa_field_find (property);

  g_return_val_if_fail (RUGOSA_IS_SETTINGS (self), 0.0);
  g_return_val_if_fail (row != NULL && row >= rows && row < rows + n_rows
                        && row->kind == RUGOSA_FIELD_NUMBER, 0.0);
  return *_rugosa_fields_double (row, self);
}

const char *
rugosa_settings_get_string (RugosaSettings *self, const char *property)
{
  const RugosaField *row = rugosa_field_find (property);
  const char *s;

  g_return_val_if_fail (RUGOSA_IS_SETTINGS (self), "");
  g_return_val_if_fail (row != NULL && row >= rows && row < rows + n_rows
                        && row->kind == RUGOSA_FIELD_TEXT, "");
  s = *_rugosa_fields_string (row, self);
  return s != NULL ? s : "";
}

const char *
rugosa_settings_get_unit (RugosaSettings *self, RugosaDisplayQuantity dq)
{
  const RugosaDisplayInfo *info = rugosa_display_info (dq);
  const char *unit = NULL;

  g_return_val_if_fail (RUGOSA_IS_SETTINGS (self), NULL);
  if (dq == RUGOSA_DISPLAY_MONEY)
    return self->currency;
  if (info == NULL)
    return NULL;
  /* asked for every number written: a batch row asks some twenty times */
  if (self->unit_of_revision != self->revision + 1)
    {
      memset (self->unit_of, 0, sizeof self->unit_of);
      self->unit_of_revision = self->revision + 1;
    }
  if (self->unit_of[dq] != NULL)
    return self->unit_of[dq];
  /* An override this build cannot read (a later build's unit, a hand
   * edit) is kept in the file but not used. */
  if (!(g_variant_n_children (self->unit_overrides) > 0
        && g_variant_lookup (self->unit_overrides, info->id, "&s", &unit)
        && rugosa_display_unit_valid (dq, unit)))
    unit = rugosa_display_default_unit (dq, (RugosaUnitSystem) self->unit_system);
  self->unit_of[dq] = unit;
  return unit;
}

const RgUnitChoice *
rugosa_settings_get_unit_choice (RugosaSettings *self)
{
  g_return_val_if_fail (RUGOSA_IS_SETTINGS (self), NULL);

  if (self->unit_choice_revision != self->revision + 1)
    {
      memset (&self->unit_choice, 0, sizeof self->unit_choice);
      for (int dq = 0; dq < RUGOSA_N_DISPLAY; dq++)
        {
          const RugosaDisplayInfo *info = rugosa_display_info ((RugosaDisplayQuantity) dq);

          if (info != NULL && self->unit_choice.unit[info->quantity] == NULL)
            self->unit_choice.unit[info->quantity] =
              rugosa_settings_get_unit (self, (RugosaDisplayQuantity) dq);
        }
      self->unit_choice_revision = self->revision + 1;
    }
  return &self->unit_choice;
}

RgStatus
rugosa_settings_check (RugosaSettings *self, const char **failed_property,
                       RgError *err)
{
  RgTransition t = { self->re_laminar_max, self->re_turbulent_min };
  const char *failed = NULL;

  g_return_val_if_fail (RUGOSA_IS_SETTINGS (self), RG_ERR_DOMAIN);

  if (rg_transition_check (&t, err) != RG_OK)
    failed = "re-turbulent-min";
  else if (!(self->chart_re_max >= RUGOSA_CHART_RE_SPAN_MIN * self->chart_re_min))
    {
      failed = "chart-re-max";
      rg_error_set_on (err, RG_ERR_DOMAIN, 0, "%s",
                       _("The chart's largest Reynolds number must be at least ten times its smallest."));
    }
  else if (!(self->chart_f_max >= RUGOSA_CHART_F_SPAN_MIN * self->chart_f_min))
    {
      failed = "chart-f-max";
      rg_error_set_on (err, RG_ERR_DOMAIN, 0, "%s",
                       _("The chart's largest friction factor must be at least 1.5 times its smallest."));
    }
  else if (!(self->hours_design + self->hours_minimum + self->hours_maximum
             <= rugosa_field_find ("hours-design")->max))
    {
      /* A year holds as many hours as one of the rows may: the rows' range
       * is that year. */
      g_autofree char *year = rugosa_display_significant (rugosa_field_find ("hours-design")->max, 4);
      g_autofree char *text = NULL;

      failed = "hours-design";
      /* TRANSLATORS: %s is the hours of a year, "8766" */
      text = g_strdup_printf (_("The hours a year at the design, lowest and highest flow add up to more than the %s hours of a year."),
                              year);
      rg_error_set_on (err, RG_ERR_DOMAIN, 0, "%s", text);
    }
  if (failed_property != NULL)
    *failed_property = failed;
  return failed != NULL ? RG_ERR_DOMAIN : RG_OK;
}

gboolean
rugosa_settings_equal (RugosaSettings *a, RugosaSettings *b)
{
  g_return_val_if_fail (RUGOSA_IS_SETTINGS (a) && RUGOSA_IS_SETTINGS (b), FALSE);
  return _rugosa_fields_equal (rows, n_rows, a, b);
}

guint64
rugosa_settings_get_revision (RugosaSettings *self)
{
  g_return_val_if_fail (RUGOSA_IS_SETTINGS (self), 0);
  return self->revision;
}

void
_rugosa_settings_copy (RugosaSettings *dst, RugosaSettings *src)
{
  g_object_freeze_notify (G_OBJECT (dst));
  for (guint i = 0; i < n_rows; i++)
    {
      GValue v = G_VALUE_INIT;

      g_value_init (&v, properties[i + 1]->value_type);
      _rugosa_fields_get (&rows[i], src, &v);
      g_object_set_property (G_OBJECT (dst), rows[i].property, &v);
      g_value_unset (&v);
    }
  g_clear_pointer (&dst->extra, cJSON_Delete);
  if (src->extra != NULL)
    dst->extra = cJSON_Duplicate (src->extra, 1);
  g_object_thaw_notify (G_OBJECT (dst));
}

const cJSON *
_rugosa_settings_get_extra (RugosaSettings *self)
{
  return self->extra;
}

void
_rugosa_settings_take_extra (RugosaSettings *self, cJSON *extra)
{
  g_clear_pointer (&self->extra, cJSON_Delete);
  self->extra = extra;
}
