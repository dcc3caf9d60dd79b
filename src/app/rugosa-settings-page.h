/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <adwaita.h>

#include "model/rugosa-settings.h"
#include "rugosa-quantity-entry.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_SETTINGS_PAGE (rugosa_settings_page_get_type ())
G_DECLARE_FINAL_TYPE (RugosaSettingsPage, rugosa_settings_page, RUGOSA, SETTINGS_PAGE, AdwPreferencesPage)

/* A page of rows generated from the settings field table, editing a
 * RugosaSettings: the rows whose flags hold every bit of `required` and
 * none of `excluded`.  An enumeration is a choice of its values' titles;
 * the unit map is one choice of unit a display quantity (the unit
 * system's usual unit first); a number is a RugosaQuantityEntry in the
 * settings' own unit for its quantity.  Every row takes its title and
 * subtitle from the row's label and help.
 *
 * The page never changes the settings itself: an edit that passes the
 * row's range and the relations between fields (rugosa_settings_check,
 * tried on a copy) goes to the apply function, which changes the settings
 * (through the undo history, or the preferences); a refused one is shown
 * beside its field in one sentence.  The page follows every change of the
 * settings, whoever makes it. */

typedef void (*RugosaSettingsApply) (RugosaSettingsPage *page,
                                     const char         *property,
                                     const GValue       *value,
                                     gpointer            user_data);

RugosaSettingsPage  *rugosa_settings_page_new            (RugosaSettings     *settings,
                                                          guint               required,
                                                          guint               excluded);
/* The same for a page made empty (in a .ui file): its rows follow the
 * groups it already holds.  Once only. */
void                 rugosa_settings_page_build          (RugosaSettingsPage *self,
                                                          RugosaSettings     *settings,
                                                          guint               required,
                                                          guint               excluded);
void                 rugosa_settings_page_set_apply_func (RugosaSettingsPage *self,
                                                          RugosaSettingsApply apply,
                                                          gpointer            user_data,
                                                          GDestroyNotify      destroy);
RugosaSettings      *rugosa_settings_page_get_settings   (RugosaSettingsPage *self);
/* The entry of a number row ("velocity-limit"), or NULL. */
RugosaQuantityEntry *rugosa_settings_page_get_entry      (RugosaSettingsPage *self,
                                                          const char         *property);
/* The editor of a text row ("project-title": a GtkEntry; a multi-line
 * row, "project-note": a GtkTextView), or NULL. */
GtkWidget           *rugosa_settings_page_get_text       (RugosaSettingsPage *self,
                                                          const char         *property);
/* The choice of an enumeration row ("friction-model") or of a quantity's
 * unit (named as its preferences key, "unit-flow"), or NULL. */
AdwComboRow         *rugosa_settings_page_get_choice     (RugosaSettingsPage *self,
                                                          const char         *name);
/* The unit spelling offered at `position` of a unit choice; NULL for the
 * unit system's usual unit (position 0). */
const char          *rugosa_settings_page_unit_at        (AdwComboRow        *choice,
                                                          guint               position);

G_END_DECLS
