/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <string.h>

#include "rugosa-display.h"
#include "rugosa-units.h"

/* The usual unit of each quantity in each system.  SI: the units common in
 * SI practice for pipe work (L/s, mm bores, kPa); US customary: the units of
 * US practice (gpm, inches, psi, feet of head).  Common practice (no single
 * source). */
static const RugosaDisplayInfo DISPLAY[RUGOSA_N_DISPLAY] = {
  [RUGOSA_DISPLAY_FLOW] = { "flow", N_("Flow"), RG_QTY_FLOW, "L/s", "gpm", "m3_s" },
  [RUGOSA_DISPLAY_LENGTH] = { "length", N_("Line length and elevation"), RG_QTY_LENGTH, "m", "ft", "m" },
  [RUGOSA_DISPLAY_DIAMETER] = { "diameter", N_("Inner diameter"), RG_QTY_LENGTH, "mm", "in", "m" },
  [RUGOSA_DISPLAY_ROUGHNESS] = { "roughness", N_("Wall roughness"), RG_QTY_ROUGHNESS, "mm", "in", "m" },
  [RUGOSA_DISPLAY_TEMPERATURE] = { "temperature", N_("Temperature"), RG_QTY_TEMPERATURE, "°C", "°F", "K" },
  [RUGOSA_DISPLAY_PRESSURE] = { "pressure", N_("Pressure and pressure drop"), RG_QTY_PRESSURE, "kPa", "psi", "Pa" },
  [RUGOSA_DISPLAY_DYNAMIC_VISCOSITY] = { "dynamic_viscosity", N_("Dynamic viscosity"), RG_QTY_DYN_VISCOSITY, "mPa·s", "cP", "Pa_s" },
  [RUGOSA_DISPLAY_KINEMATIC_VISCOSITY] = { "kinematic_viscosity", N_("Kinematic viscosity"), RG_QTY_KIN_VISCOSITY, "cSt", "cSt", "m2_s" },
  [RUGOSA_DISPLAY_DENSITY] = { "density", N_("Density"), RG_QTY_DENSITY, "kg/m³", "lb/ft³", "kg_m3" },
  [RUGOSA_DISPLAY_VELOCITY] = { "velocity", N_("Mean velocity"), RG_QTY_VELOCITY, "m/s", "ft/s", "m_s" },
  [RUGOSA_DISPLAY_GRADIENT] = { "gradient", N_("Hydraulic gradient"), RG_QTY_GRADIENT, "m/100 m", "ft/100 ft", "m_per_100m" },
  [RUGOSA_DISPLAY_HEAD] = { "head", N_("Head and head loss"), RG_QTY_LENGTH, "m", "ft", "m" },
  [RUGOSA_DISPLAY_SALINITY] = { "salinity", N_("Salinity"), RG_QTY_SALINITY, "g/kg", "g/kg", "kg_kg" },
  [RUGOSA_DISPLAY_ROUGHNESS_RATE] = { "roughness_rate", N_("Roughness growth"), RG_QTY_ROUGHNESS_RATE, "mm/yr", "in/yr", "m_per_year" },
  [RUGOSA_DISPLAY_AGE] = { "age", N_("Service age"), RG_QTY_TIME, "yr", "yr", "years" },
  /* Pump power in kW, or horsepower in US practice; the JSON keys of
   * eval name the kilowatt ("pump_power_kW"), so their values are in kW. */
  [RUGOSA_DISPLAY_POWER] = { "power", N_("Power"), RG_QTY_POWER, "kW", "hp", "kW", "kW", NULL },
  /* Electricity is billed in kWh in both systems. */
  [RUGOSA_DISPLAY_ENERGY_PER_YEAR] = { "energy_per_year", N_("Energy per year"), RG_QTY_ENERGY,
                                       "kWh", "kWh", "kWh_per_year", "kWh", "/yr" },
};

const RugosaDisplayInfo *
rugosa_display_info (RugosaDisplayQuantity dq)
{
  if ((int) dq < 0 || dq >= RUGOSA_N_DISPLAY || DISPLAY[dq].id == NULL)
    return NULL;
  return &DISPLAY[dq];
}

const RugosaDisplayInfo *
rugosa_display_info_find (const char *id, RugosaDisplayQuantity *dq)
{
  for (int i = 0; i < RUGOSA_N_DISPLAY; i++)
    if (DISPLAY[i].id != NULL && g_strcmp0 (DISPLAY[i].id, id) == 0)
      {
        if (dq != NULL)
          *dq = (RugosaDisplayQuantity) i;
        return &DISPLAY[i];
      }
  return NULL;
}

const char *
rugosa_display_default_unit (RugosaDisplayQuantity dq, RugosaUnitSystem system)
{
  const RugosaDisplayInfo *info = rugosa_display_info (dq);

  if (info == NULL)
    return NULL;
  return system == RUGOSA_UNIT_SYSTEM_US ? info->us_unit : info->si_unit;
}

const char *
rugosa_display_unit_choice (RugosaDisplayQuantity dq, int i)
{
  const RugosaDisplayInfo *info = rugosa_display_info (dq);

  if (info == NULL || i < 0)
    return NULL;
  return rg_units_choice (info->quantity, i);
}

const char *
rugosa_display_unit_label (RugosaDisplayQuantity dq, const char *unit)
{
  const RugosaDisplayInfo *info = rugosa_display_info (dq);
  g_autofree char *label = NULL;

  if (unit == NULL)
    return "";
  if (info == NULL || info->per == NULL)
    return g_intern_string (rugosa_display_unit_symbol (unit));
  label = g_strconcat (rugosa_display_unit_symbol (unit), info->per, NULL);
  return g_intern_string (label);
}

gboolean
rugosa_display_unit_valid (RugosaDisplayQuantity dq, const char *unit)
{
  const RugosaDisplayInfo *info = rugosa_display_info (dq);
  double si;

  if (info == NULL || unit == NULL || *unit == '\0')
    return FALSE;
  return rg_units_to_si (info->quantity, 1.0, unit, &si, NULL) == RG_OK;
}
