/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Project settings: display units, friction model, transition thresholds,
 * chart ranges, the service age shown, and the warning limits. */
#pragma once

#include <glib-object.h>

G_BEGIN_DECLS

typedef enum {
  RUGOSA_UNIT_SYSTEM_SI = 0,
  RUGOSA_UNIT_SYSTEM_US,
} RugosaUnitSystem;

#define RUGOSA_TYPE_SETTINGS (rugosa_settings_get_type ())
G_DECLARE_FINAL_TYPE (RugosaSettings, rugosa_settings, RUGOSA, SETTINGS, GObject)

/* The GVariant type of "unit-overrides": quantity name -> unit spelling,
 * quantity names as listed in docs/file-format.md ("flow", "length", …). */
#define RUGOSA_SETTINGS_UNIT_OVERRIDES_TYPE "a{ss}"

RugosaSettings *rugosa_settings_new (void);

RugosaUnitSystem rugosa_settings_get_unit_system (RugosaSettings *self);
GVariant *rugosa_settings_get_unit_overrides (RugosaSettings *self);
/* The unit chosen for one quantity, or NULL when the system's default is
 * used. */
const char *rugosa_settings_get_unit_override (RugosaSettings *self,
                                               const char *quantity);
/* An RgFrictionModel. */
int rugosa_settings_get_friction_model (RugosaSettings *self);
/* Any double property by name ("service-age", "velocity-limit", …). */
double rugosa_settings_get_double (RugosaSettings *self, const char *property);

gboolean rugosa_settings_equal (RugosaSettings *a, RugosaSettings *b);
guint64 rugosa_settings_get_revision (RugosaSettings *self);

/* The quantity names accepted in "unit-overrides", NULL-terminated. */
const char *const *rugosa_settings_unit_quantities (void);

G_END_DECLS
