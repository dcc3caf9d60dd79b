/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <adwaita.h>

#include "rugosa-settings-page.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_PREFERENCES_WINDOW (rugosa_preferences_window_get_type ())
G_DECLARE_FINAL_TYPE (RugosaPreferencesWindow, rugosa_preferences_window, RUGOSA, PREFERENCES_WINDOW, AdwPreferencesWindow)

/* The preferences: the settings that seed new projects (rugosa-seed.h),
 * generated from the settings field table, and what belongs to the
 * program alone (light or dark, the slider's length).  Nothing here
 * changes an open project. */
RugosaPreferencesWindow *rugosa_preferences_window_new (GSettings *settings);

/* The page of the settings new projects start with (tests). */
RugosaSettingsPage *rugosa_preferences_window_get_seed_page (RugosaPreferencesWindow *self);

G_END_DECLS
