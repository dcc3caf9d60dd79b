/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>
#include <string.h>

#include "core/fluid.h"
#include "core/friction.h"
#include "core/regime.h"

#include "rugosa-enums.h"
#include "rugosa-units.h"

/* A GEnum whose values are 0 … n-1 and whose nicks come from `nick_at`:
 * the nicks stay where they are defined (the core's id functions, the
 * display table) instead of being copied into a second list. */
static GType
register_enum (const char *type_name, const char *prefix, int n,
               const char *(*nick_at) (int))
{
  /* Registered once per process and never freed, as GLib requires of the
   * values of a static enum type. */
  GEnumValue *values = g_new0 (GEnumValue, (gsize) n + 1);

  for (int i = 0; i < n; i++)
    {
      g_autofree char *upper = g_ascii_strup (nick_at (i), -1);
      g_autofree char *name = NULL;

      g_strdelimit (upper, "-", '_');
      name = g_strconcat (prefix, upper, NULL);
      values[i].value = i;
      values[i].value_name = g_intern_string (name);
      values[i].value_nick = g_intern_string (nick_at (i));
    }
  return g_enum_register_static (type_name, values);
}

static const char *
fluid_nick (int i)
{
  return rg_fluid_kind_id ((RgFluidKind) i);
}

static const char *
model_nick (int i)
{
  return rg_friction_model_id ((RgFrictionModel) i);
}

static const char *
system_nick (int i)
{
  static const char *const nicks[] = { "si", "us" };
  return nicks[i];
}

static const char *
part_nick (int i)
{
  static const char *const nicks[] = { "none", "fluid", "aging", "flow" };
  G_STATIC_ASSERT (G_N_ELEMENTS (nicks) == RUGOSA_N_LINE_PARTS);
  return nicks[i];
}

static const char *
display_nick (int i)
{
  const RugosaDisplayInfo *info = rugosa_display_info ((RugosaDisplayQuantity) i);

  if (info != NULL)
    return info->id;
  return i == RUGOSA_DISPLAY_MONEY ? "money" : "number";
}

#define DEFINE_ENUM(func, name, prefix, n, nick)                        \
  GType                                                                 \
  func (void)                                                           \
  {                                                                     \
    static gsize type_id;                                               \
    if (g_once_init_enter (&type_id))                                   \
      g_once_init_leave (&type_id, register_enum (name, prefix, n, nick)); \
    return type_id;                                                     \
  }

DEFINE_ENUM (rugosa_fluid_kind_get_type, "RugosaFluidKind",
             "RUGOSA_FLUID_KIND_", RG_FLUID_N_KINDS, fluid_nick)
DEFINE_ENUM (rugosa_friction_model_get_type, "RugosaFrictionModel",
             "RUGOSA_FRICTION_MODEL_", RG_FRICTION_N_MODELS, model_nick)
DEFINE_ENUM (rugosa_unit_system_get_type, "RugosaUnitSystem",
             "RUGOSA_UNIT_SYSTEM_", 2, system_nick)
DEFINE_ENUM (rugosa_line_part_get_type, "RugosaLinePart",
             "RUGOSA_LINE_PART_", RUGOSA_N_LINE_PARTS, part_nick)
DEFINE_ENUM (rugosa_display_quantity_get_type, "RugosaDisplayQuantity",
             "RUGOSA_DISPLAY_", RUGOSA_N_DISPLAY, display_nick)

const char *
rugosa_enum_nick (GType enum_type, int value)
{
  GEnumClass *klass = g_type_class_ref (enum_type);
  GEnumValue *v = g_enum_get_value (klass, value);
  const char *nick = v != NULL ? v->value_nick : NULL;

  /* the nicks are interned: they outlive the class reference */
  g_type_class_unref (klass);
  return nick;
}

gboolean
rugosa_enum_from_nick (GType enum_type, const char *nick, int *value)
{
  GEnumClass *klass = g_type_class_ref (enum_type);
  GEnumValue *v = nick != NULL ? g_enum_get_value_by_nick (klass, nick) : NULL;

  if (v != NULL)
    *value = v->value;
  g_type_class_unref (klass);
  return v != NULL;
}

/* The fluids by the property model behind each. */
static const char *fluid_titles[RG_FLUID_N_KINDS] = {
  [RG_FLUID_WATER] = N_("Water (IAPWS-IF97)"),
  [RG_FLUID_CUSTOM] = N_("Given density and viscosity"),
  [RG_FLUID_SEAWATER] = N_("Seawater (Sharqawy et al. 2010)"),
  [RG_FLUID_OIL] = N_("Petroleum oil (ASTM D341)"),
  [RG_FLUID_AIR] = N_("Air (ideal gas)"),
};

static const char *system_titles[] = {
  [RUGOSA_UNIT_SYSTEM_SI] = N_("SI (metric)"),
  [RUGOSA_UNIT_SYSTEM_US] = N_("US customary"),
};

const char *
rugosa_enum_title (GType enum_type, int value)
{
  if (enum_type == RUGOSA_TYPE_FLUID_KIND && value >= 0 && value < RG_FLUID_N_KINDS)
    return _(fluid_titles[value]);
  if (enum_type == RUGOSA_TYPE_UNIT_SYSTEM && value >= 0 && value < (int) G_N_ELEMENTS (system_titles))
    return _(system_titles[value]);
  /* Published names, the same in every language. */
  if (enum_type == RUGOSA_TYPE_FRICTION_MODEL && value >= 0 && value < RG_FRICTION_N_MODELS)
    return rg_friction_model_title ((RgFrictionModel) value);
  return rugosa_enum_nick (enum_type, value);
}

const char *
rugosa_regime_title (RgRegime regime)
{
  switch (regime)
    {
    case RG_REGIME_LAMINAR: return _("laminar");
    case RG_REGIME_TRANSITIONAL: return _("transitional");
    case RG_REGIME_TURBULENT: return _("turbulent");
    default: return "—";
    }
}

const char *
rugosa_zone_title (RgRoughnessZone zone)
{
  switch (zone)
    {
    case RG_ZONE_SMOOTH: return _("smooth");
    case RG_ZONE_TRANSITIONALLY_ROUGH: return _("transitionally rough");
    case RG_ZONE_FULLY_ROUGH: return _("fully rough");
    case RG_ZONE_NONE:
    default: return "—";
    }
}
