/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Project settings: display units, friction model, transition thresholds,
 * chart ranges, the service age shown, and the warning limits.  Every
 * field is a row of the settings field table (rugosa-fields.c). */
#pragma once

#include <glib-object.h>

#include "core/status.h"
#include "core/units.h"
#include "rugosa-enums.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_SETTINGS (rugosa_settings_get_type ())
G_DECLARE_FINAL_TYPE (RugosaSettings, rugosa_settings, RUGOSA, SETTINGS, GObject)

RugosaSettings *rugosa_settings_new (void);

RugosaUnitSystem rugosa_settings_get_unit_system (RugosaSettings *self);
/* An RgFrictionModel. */
int rugosa_settings_get_friction_model (RugosaSettings *self);
/* Any number field by property name ("service-age", "velocity-limit", …). */
double rugosa_settings_get_double (RugosaSettings *self, const char *property);
/* Any text field by property name ("currency"); never NULL. */
const char *rugosa_settings_get_string (RugosaSettings *self,
                                        const char *property);

/* The unit `dq` is shown in: the project's override for it when one is set
 * (and valid), else the unit system's usual unit; for money the project's
 * currency label (a text, not a unit to convert); NULL for a plain number.
 * The string lives as long as the settings are unchanged. */
const char *rugosa_settings_get_unit (RugosaSettings *self,
                                      RugosaDisplayQuantity dq);

/* The unit of each core quantity for the core's sentences (warnings and
 * errors format their values with it): the unit of the first display
 * quantity of that core quantity.  Owned by the settings; valid until the
 * next change. */
const RgUnitChoice *rugosa_settings_get_unit_choice (RugosaSettings *self);

/* The relations between fields that no single range expresses (the
 * transition limits in order, the chart's axes wide enough, the hours of
 * operation within a year); RG_OK or
 * one sentence in `err` whose subjects point at the field to change.
 * `failed_property` (may be NULL) receives that field's property name. */
RgStatus rugosa_settings_check (RugosaSettings *self,
                                const char **failed_property, RgError *err);

gboolean rugosa_settings_equal (RugosaSettings *a, RugosaSettings *b);
/* Bumped on every change of a field that can change a result (every field
 * but the view settings, such as the service age shown). */
guint64 rugosa_settings_get_revision (RugosaSettings *self);

G_END_DECLS
