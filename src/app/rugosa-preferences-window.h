/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <adwaita.h>

G_BEGIN_DECLS

#define RUGOSA_TYPE_PREFERENCES_WINDOW (rugosa_preferences_window_get_type ())
G_DECLARE_FINAL_TYPE (RugosaPreferencesWindow, rugosa_preferences_window, RUGOSA, PREFERENCES_WINDOW, AdwPreferencesWindow)

RugosaPreferencesWindow *rugosa_preferences_window_new (GSettings *settings);

/* Write the per-quantity unit keys of a unit system ("si" or
 * "us-customary"); other values leave the keys alone. */
void rugosa_preferences_apply_unit_system (GSettings  *settings,
                                           const char *system);

G_END_DECLS
