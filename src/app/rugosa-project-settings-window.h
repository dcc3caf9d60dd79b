/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <adwaita.h>

#include "model/rugosa-history.h"
#include "rugosa-settings-page.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_PROJECT_SETTINGS_WINDOW (rugosa_project_settings_window_get_type ())
G_DECLARE_FINAL_TYPE (RugosaProjectSettingsWindow, rugosa_project_settings_window, RUGOSA, PROJECT_SETTINGS_WINDOW, AdwPreferencesWindow)

/* The settings of one open project (every row of the settings field table
 * but the view settings): each edit is one undo step of `history`; a
 * refused value or relation is shown beside its field and not applied.
 * "Use for New Projects" writes the settings that seed new projects to
 * `prefs`.  Ctrl+Z and Ctrl+Shift+Z undo and redo here too. */
RugosaProjectSettingsWindow *rugosa_project_settings_window_new      (RugosaHistory *history,
                                                                       GSettings     *prefs);
RugosaSettingsPage          *rugosa_project_settings_window_get_page (RugosaProjectSettingsWindow *self);

G_END_DECLS
