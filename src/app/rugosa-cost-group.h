/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <adwaita.h>

#include "model/rugosa-project.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_COST_GROUP (rugosa_cost_group_get_type ())
G_DECLARE_FINAL_TYPE (RugosaCostGroup, rugosa_cost_group, RUGOSA, COST_GROUP, GtkWidget)

/* The side panel's group for one line option's capital cost (per metre
 * laid, lump sum) and its pump curve (points of flow and head).  Like the
 * line panel it never changes the line: every edit is emitted as
 * `edit-line` (line, property name, value: "d" for the costs, "a(dd)" for
 * the pump curve) for the window to route through the undo history. */

GtkWidget  *rugosa_cost_group_new          (void);
void        rugosa_cost_group_set_project  (RugosaCostGroup *self,
                                            RugosaProject   *project);
void        rugosa_cost_group_set_line     (RugosaCostGroup *self,
                                            RugosaLine      *line);
/* Re-read the line, its results and the display units. */
void        rugosa_cost_group_refresh      (RugosaCostGroup *self);
/* Re-read only what the service age changes (the duty flows). */
void        rugosa_cost_group_refresh_results (RugosaCostGroup *self);
/* Commit `text` to a field as if typed and activated (tests): "cost-per-
 * metre", "cost-lump-sum", or "flow:N" / "head:N" of point N. */
gboolean    rugosa_cost_group_commit_text  (RugosaCostGroup *self,
                                            const char      *field,
                                            const char      *text);
/* The sentence under a field that refused its text, or NULL. */
const char *rugosa_cost_group_get_error    (RugosaCostGroup *self,
                                            const char      *field);

G_END_DECLS
