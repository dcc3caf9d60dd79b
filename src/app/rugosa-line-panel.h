/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <adwaita.h>

#include "model/rugosa-project.h"
#include "rugosa-quantity-entry.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_LINE_PANEL (rugosa_line_panel_get_type ())
G_DECLARE_FINAL_TYPE (RugosaLinePanel, rugosa_line_panel, RUGOSA, LINE_PANEL, GtkWidget)

/* The side panel editing one line option: fluid, pipe wall, bore and run,
 * fittings and flows.  It never changes the line itself: every edit is
 * emitted as `edit-line` (line, property name, value as a GVariant — "d"
 * for numbers, "i" for the fluid kind, "ms" for catalog ids where nothing
 * means custom, "s" for name and colour, "a(sdd)" for fittings) so the
 * window can route it through the undo history. */

GtkWidget  *rugosa_line_panel_new          (void);
void        rugosa_line_panel_set_context  (RugosaLinePanel *self,
                                            RugosaProject   *project);
void        rugosa_line_panel_set_line     (RugosaLinePanel *self,
                                            RugosaLine      *line);
RugosaLine *rugosa_line_panel_get_line     (RugosaLinePanel *self);
/* How many other lines the list has selected besides the panel's: with
 * one or more, the panel offers under the line's name to apply its
 * fluid, aging or flows to them (the window's "win.apply-part"). */
void        rugosa_line_panel_set_n_others (RugosaLinePanel *self,
                                            guint            n);
/* Re-read the line and its results (after any change). */
void        rugosa_line_panel_refresh      (RugosaLinePanel *self);
/* Re-read only what the service age changes (the warnings). */
void        rugosa_line_panel_refresh_results (RugosaLinePanel *self);
/* The quantity entry editing a double property ("temperature", …). */
RugosaQuantityEntry *rugosa_line_panel_get_entry (RugosaLinePanel *self,
                                                  const char      *property);
/* Mark the fields of an error's subjects (rugosa_field_for_subject) with
 * `why`, or for a custom value whose catalog entry is chosen, that
 * chooser; clear the other marks.  Each refresh does this with the
 * line's results; public for tests. */
void        rugosa_line_panel_mark_subjects (RugosaLinePanel *self,
                                             RgSubjects       subjects,
                                             const char      *why);
/* The warnings shown above the fields, one a line, or NULL when none is
 * shown (tests). */
const char *rugosa_line_panel_get_warnings (RugosaLinePanel *self);
/* The density · viscosity readout text (tests). */
const char *rugosa_line_panel_get_fluid_readout (RugosaLinePanel *self);

G_END_DECLS
