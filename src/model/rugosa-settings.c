/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <string.h>

#include "core/friction.h"
#include "rugosa-double-props.h"
#include "rugosa-model-private.h"

struct _RugosaSettings
{
  GObject parent_instance;

  /* owned */
  GVariant *unit_overrides; /* a{ss}, never NULL */
  cJSON *extra;

  int unit_system;
  int friction_model;
  double re_laminar_max, re_turbulent_min;
  double chart_re_min, chart_re_max, chart_f_min, chart_f_max;
  double service_age, velocity_limit, gradient_limit;

  guint64 revision;
};

G_DEFINE_FINAL_TYPE (RugosaSettings, rugosa_settings, G_TYPE_OBJECT)

enum {
  PROP_0,
  PROP_UNIT_SYSTEM,
  PROP_UNIT_OVERRIDES,
  PROP_FRICTION_MODEL,
  PROP_FIRST_DOUBLE,
  N_PROPS = PROP_FIRST_DOUBLE + 9
};

static GParamSpec *properties[N_PROPS];


/* Defaults: the transition range 2000–4000 is the common textbook choice
 * (Common practice (no single source)); the chart range spans the usual
 * friction-chart window; 3 m/s and 5 m per 100 m are rule-of-thumb limits
 * for water mains that a user is expected to change. */
#define F(field) G_STRUCT_OFFSET (RugosaSettings, field)
static const RugosaDoubleProp double_props[] = {
  { "re-laminar-max", "Upper Reynolds number of laminar flow", F (re_laminar_max), 1.0, 1.0e6, 2000.0 },
  { "re-turbulent-min", "Lower Reynolds number of turbulent flow", F (re_turbulent_min), 1.0, 1.0e6, 4000.0 },
  { "chart-re-min", "Chart: smallest Reynolds number", F (chart_re_min), 1.0, 1.0e12, 500.0 },
  { "chart-re-max", "Chart: largest Reynolds number", F (chart_re_max), 1.0, 1.0e12, 1.0e8 },
  { "chart-f-min", "Chart: smallest friction factor", F (chart_f_min), 1.0e-4, 1.0, 0.006 },
  { "chart-f-max", "Chart: largest friction factor", F (chart_f_max), 1.0e-4, 1.0, 0.1 },
  { "service-age", "Service age shown, years", F (service_age), 0.0, 200.0, 0.0 },
  { "velocity-limit", "Velocity above which a warning is given, m/s", F (velocity_limit), 0.01, 1000.0, 3.0 },
  { "gradient-limit", "Major-loss gradient above which a warning is given, m per 100 m", F (gradient_limit), 0.001, 1.0e4, 5.0 },
};
#undef F

G_STATIC_ASSERT (G_N_ELEMENTS (double_props) == N_PROPS - PROP_FIRST_DOUBLE);

static const char *const unit_quantities[] = {
  "flow", "length", "diameter", "roughness", "temperature", "pressure",
  "dynamic_viscosity", "kinematic_viscosity", "density", "velocity",
  "gradient", "head", "salinity", "roughness_rate", NULL
};

const char *const *
rugosa_settings_unit_quantities (void)
{
  return unit_quantities;
}

static double *
double_field (RugosaSettings *self, guint index)
{
  return _rugosa_double_props_field (double_props, self, index);
}

static void
changed (RugosaSettings *self, guint prop_id)
{
  self->revision++;
  g_object_notify_by_pspec (G_OBJECT (self), properties[prop_id]);
}

static void
rugosa_settings_finalize (GObject *object)
{
  RugosaSettings *self = RUGOSA_SETTINGS (object);

  g_clear_pointer (&self->unit_overrides, g_variant_unref);
  g_clear_pointer (&self->extra, cJSON_Delete);
  G_OBJECT_CLASS (rugosa_settings_parent_class)->finalize (object);
}

static void
rugosa_settings_get_property (GObject *object, guint prop_id, GValue *value,
                              GParamSpec *pspec)
{
  RugosaSettings *self = RUGOSA_SETTINGS (object);

  if (prop_id >= PROP_FIRST_DOUBLE && prop_id < N_PROPS)
    {
      g_value_set_double (value, *double_field (self, prop_id - PROP_FIRST_DOUBLE));
      return;
    }
  switch (prop_id)
    {
    case PROP_UNIT_SYSTEM:
      g_value_set_int (value, self->unit_system);
      break;
    case PROP_UNIT_OVERRIDES:
      g_value_set_variant (value, self->unit_overrides);
      break;
    case PROP_FRICTION_MODEL:
      g_value_set_int (value, self->friction_model);
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
set_int (RugosaSettings *self, int *field, int v, guint prop_id)
{
  if (*field != v)
    {
      *field = v;
      changed (self, prop_id);
    }
}

static void
rugosa_settings_set_property (GObject *object, guint prop_id,
                              const GValue *value, GParamSpec *pspec)
{
  RugosaSettings *self = RUGOSA_SETTINGS (object);

  if (prop_id >= PROP_FIRST_DOUBLE && prop_id < N_PROPS)
    {
      double *d = double_field (self, prop_id - PROP_FIRST_DOUBLE);
      double v = g_value_get_double (value);

      if (*d != v)
        {
          *d = v;
          changed (self, prop_id);
        }
      return;
    }
  switch (prop_id)
    {
    case PROP_UNIT_SYSTEM:
      set_int (self, &self->unit_system, g_value_get_int (value), prop_id);
      break;
    case PROP_FRICTION_MODEL:
      set_int (self, &self->friction_model, g_value_get_int (value), prop_id);
      break;
    case PROP_UNIT_OVERRIDES:
      {
        GVariant *v = g_value_get_variant (value);

        if (v == NULL)
          v = g_variant_new_array (G_VARIANT_TYPE ("{ss}"), NULL, 0);
        g_variant_ref_sink (v);
        if (!g_variant_equal (self->unit_overrides, v))
          {
            g_variant_unref (self->unit_overrides);
            self->unit_overrides = g_variant_ref (v);
            changed (self, prop_id);
          }
        g_variant_unref (v);
      }
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_settings_class_init (RugosaSettingsClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  const GParamFlags flags = G_PARAM_READWRITE | G_PARAM_EXPLICIT_NOTIFY
                            | G_PARAM_STATIC_STRINGS;

  object_class->finalize = rugosa_settings_finalize;
  object_class->get_property = rugosa_settings_get_property;
  object_class->set_property = rugosa_settings_set_property;

  properties[PROP_UNIT_SYSTEM] =
    g_param_spec_int ("unit-system", NULL, "A RugosaUnitSystem",
                      RUGOSA_UNIT_SYSTEM_SI, RUGOSA_UNIT_SYSTEM_US,
                      RUGOSA_UNIT_SYSTEM_SI, flags);
  properties[PROP_UNIT_OVERRIDES] =
    g_param_spec_variant ("unit-overrides", NULL,
                          "Quantity name to unit spelling",
                          G_VARIANT_TYPE (RUGOSA_SETTINGS_UNIT_OVERRIDES_TYPE),
                          NULL, flags);
  properties[PROP_FRICTION_MODEL] =
    g_param_spec_int ("friction-model", NULL, "An RgFrictionModel", 0,
                      RG_FRICTION_N_MODELS - 1, RG_FRICTION_COLEBROOK, flags);
  _rugosa_double_props_install (double_props, G_N_ELEMENTS (double_props),
                                properties, PROP_FIRST_DOUBLE, flags);
  g_object_class_install_properties (object_class, N_PROPS, properties);
}

static void
rugosa_settings_init (RugosaSettings *self)
{
  self->unit_overrides = g_variant_ref_sink (
    g_variant_new_array (G_VARIANT_TYPE ("{ss}"), NULL, 0));
  self->unit_system = RUGOSA_UNIT_SYSTEM_SI;
  self->friction_model = RG_FRICTION_COLEBROOK;
  _rugosa_double_props_init (double_props, G_N_ELEMENTS (double_props), self);
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

GVariant *
rugosa_settings_get_unit_overrides (RugosaSettings *self)
{
  g_return_val_if_fail (RUGOSA_IS_SETTINGS (self), NULL);
  return self->unit_overrides;
}

const char *
rugosa_settings_get_unit_override (RugosaSettings *self, const char *quantity)
{
  const char *unit = NULL;

  g_return_val_if_fail (RUGOSA_IS_SETTINGS (self), NULL);
  if (!g_variant_lookup (self->unit_overrides, quantity, "&s", &unit))
    return NULL;
  return unit;
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
  int i;

  g_return_val_if_fail (RUGOSA_IS_SETTINGS (self), 0.0);
  i = _rugosa_double_props_find (double_props, G_N_ELEMENTS (double_props), property);
  g_return_val_if_fail (i >= 0, 0.0);
  return *double_field (self, (guint) i);
}

gboolean
rugosa_settings_equal (RugosaSettings *a, RugosaSettings *b)
{
  g_return_val_if_fail (RUGOSA_IS_SETTINGS (a) && RUGOSA_IS_SETTINGS (b), FALSE);
  for (guint i = 0; i < G_N_ELEMENTS (double_props); i++)
    if (*double_field (a, i) != *double_field (b, i))
      return FALSE;
  return a->unit_system == b->unit_system
         && a->friction_model == b->friction_model
         && g_variant_equal (a->unit_overrides, b->unit_overrides);
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
  g_object_set (dst,
                "unit-system", src->unit_system,
                "unit-overrides", src->unit_overrides,
                "friction-model", src->friction_model,
                NULL);
  for (guint i = 0; i < G_N_ELEMENTS (double_props); i++)
    g_object_set (dst, double_props[i].name, *double_field (src, i), NULL);
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
