/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Display units: which unit each quantity is shown in.  A project stores a
 * unit system (SI or US customary) and per-quantity overrides; this table
 * gives each quantity's name, label and usual unit in each system, and is
 * the one place those facts live (the preferences' keys, the project
 * settings dialog, the file format's quantity names derive from it). */
#pragma once

#include <glib.h>

#include "core/units.h"
#include "rugosa-enums.h"

G_BEGIN_DECLS

typedef struct {
  const char *id;       /* name in units.overrides, e.g. "dynamic_viscosity" */
  const char *label;    /* translatable (N_), e.g. "Dynamic viscosity" */
  RgQuantity quantity;  /* how its text is parsed and converted */
  const char *si_unit;  /* usual unit of the SI system (a spelling rg_units accepts) */
  const char *us_unit;  /* usual unit of the US customary system */
  const char *key_unit; /* the unit as JSON keys end ("m3_s" in "flow_m3_s") */
  /* The unit of JSON values when it is not SI (a spelling rg_units accepts,
   * "kW" for "pump_power_kW"); NULL: SI. */
  const char *json_unit;
  /* Shown after the unit for a quantity counted per year ("/yr" in
   * "kWh/yr"); NULL: nothing. */
  const char *per;
} RugosaDisplayInfo;

/* NULL for RUGOSA_DISPLAY_NUMBER and out-of-range values. */
const RugosaDisplayInfo *rugosa_display_info (RugosaDisplayQuantity dq);
/* By id ("flow"), or NULL. */
const RugosaDisplayInfo *rugosa_display_info_find (const char *id,
                                                   RugosaDisplayQuantity *dq);

/* The unit shown for `dq` in `system` when no override is set. */
const char *rugosa_display_default_unit (RugosaDisplayQuantity dq,
                                         RugosaUnitSystem system);

/* The units offered for `dq` (display spellings, from the core's list for
 * its quantity); NULL past the end. */
const char *rugosa_display_unit_choice (RugosaDisplayQuantity dq, int i);

/* True when `unit` is a spelling of a unit of dq's quantity. */
gboolean rugosa_display_unit_valid (RugosaDisplayQuantity dq,
                                    const char *unit);

/* How `unit` (a spelling of dq's quantity, or for RUGOSA_DISPLAY_MONEY the
 * currency label) reads beside a value of dq: "m³/s", "kWh/yr", "€".
 * Interned; "" for NULL. */
const char *rugosa_display_unit_label (RugosaDisplayQuantity dq,
                                       const char *unit);

G_END_DECLS
