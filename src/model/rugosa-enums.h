/* SPDX-License-Identifier: GPL-3.0-or-later */
/* GEnum types of the document's enumerations, for properties, .ui files
 * and GSettings.  Each nick is the identifier the core already gives the
 * value (rg_fluid_kind_id, rg_friction_model_id, …) or the project file
 * stores, so a name is written once: the core or the tables below. */
#pragma once

#include <glib-object.h>

#include "core/regime.h"

#include "core/fluid.h"
#include "core/friction.h"

G_BEGIN_DECLS

/* The kinds of fluid: the values of RgFluidKind, nicks "water", "custom",
 * "seawater", "oil", "air". */
#define RUGOSA_TYPE_FLUID_KIND (rugosa_fluid_kind_get_type ())
GType rugosa_fluid_kind_get_type (void) G_GNUC_CONST;
/* The friction models: the values of RgFrictionModel, nicks "colebrook",
 * "haaland", "swamee-jain", "churchill". */
#define RUGOSA_TYPE_FRICTION_MODEL (rugosa_friction_model_get_type ())
GType rugosa_friction_model_get_type (void) G_GNUC_CONST;

typedef enum {
  RUGOSA_UNIT_SYSTEM_SI = 0,
  RUGOSA_UNIT_SYSTEM_US,
} RugosaUnitSystem;

/* Nicks "si", "us" (as in the project file). */
#define RUGOSA_TYPE_UNIT_SYSTEM (rugosa_unit_system_get_type ())
GType rugosa_unit_system_get_type (void) G_GNUC_CONST;

/* The quantities as the user sees them: each has its own display unit, so
 * a diameter (mm) and a line length (m) differ though both are lengths. */
typedef enum {
  RUGOSA_DISPLAY_FLOW = 0,
  RUGOSA_DISPLAY_LENGTH,         /* line length, elevation change */
  RUGOSA_DISPLAY_DIAMETER,
  RUGOSA_DISPLAY_ROUGHNESS,
  RUGOSA_DISPLAY_TEMPERATURE,
  RUGOSA_DISPLAY_PRESSURE,
  RUGOSA_DISPLAY_DYNAMIC_VISCOSITY,
  RUGOSA_DISPLAY_KINEMATIC_VISCOSITY,
  RUGOSA_DISPLAY_DENSITY,
  RUGOSA_DISPLAY_VELOCITY,
  RUGOSA_DISPLAY_GRADIENT,
  RUGOSA_DISPLAY_HEAD,           /* head loss, head */
  RUGOSA_DISPLAY_SALINITY,
  RUGOSA_DISPLAY_ROUGHNESS_RATE,
  RUGOSA_DISPLAY_AGE,            /* years of service */
  RUGOSA_DISPLAY_POWER,          /* pump power */
  RUGOSA_DISPLAY_ENERGY_PER_YEAR, /* pumping energy of one year */
  RUGOSA_DISPLAY_MONEY,          /* no unit to convert: shown with the
                                  * project's currency label (no entry in
                                  * the display table, rugosa-units.h) */
  RUGOSA_DISPLAY_NUMBER,         /* dimensionless: shown as it is */
  RUGOSA_N_DISPLAY
} RugosaDisplayQuantity;

/* Nicks are the quantity names of the project file's units.overrides
 * ("flow", "dynamic_viscosity", …; see rugosa-units.h). */
#define RUGOSA_TYPE_DISPLAY_QUANTITY (rugosa_display_quantity_get_type ())
GType rugosa_display_quantity_get_type (void) G_GNUC_CONST;

/* The parts of a line option that are applied from one line to others
 * at once (rugosa-apply.h): each row of the line field table belongs to
 * at most one (RugosaField.part).  Nicks "none", "fluid", "aging",
 * "flow" (the window's action targets). */
typedef enum {
  RUGOSA_LINE_PART_NONE = 0,
  RUGOSA_LINE_PART_FLUID,        /* the fluid and its state */
  RUGOSA_LINE_PART_AGING,        /* the roughness growth: class or rate */
  RUGOSA_LINE_PART_FLOW,         /* the flow case: lowest, design, highest */
  RUGOSA_N_LINE_PARTS
} RugosaLinePart;

#define RUGOSA_TYPE_LINE_PART (rugosa_line_part_get_type ())
GType rugosa_line_part_get_type (void) G_GNUC_CONST;

/* The nick of `value` in `enum_type`, or NULL. */
/* How a value reads for people, translated ("US customary", "Colebrook
 * (1939)", "Water (IAPWS-IF97)"); its nick when the type has no titles. */
/* A flow regime and a roughness zone as people read them, translated
 * ("turbulent", "transitionally rough"); "—" for none. */
const char *rugosa_regime_title (RgRegime regime);
const char *rugosa_zone_title (RgRoughnessZone zone);
const char *rugosa_enum_title (GType enum_type, int value);
const char *rugosa_enum_nick (GType enum_type, int value);
/* The value whose nick is `nick`; FALSE when there is none. */
gboolean rugosa_enum_from_nick (GType enum_type, const char *nick,
                                int *value);

G_END_DECLS
