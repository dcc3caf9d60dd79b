/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <adwaita.h>

#include "model/rugosa-sizing.h"
#include "rugosa-window.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_SIZING_WINDOW (rugosa_sizing_window_get_type ())
G_DECLARE_FINAL_TYPE (RugosaSizingWindow, rugosa_sizing_window, RUGOSA, SIZING_WINDOW, AdwWindow)

/* The sizing assistant of a main window: the duty of the line option
 * selected there (its fluid, flows, run, fittings, aging), a material and
 * the limits, and every size of that material's catalogs with its verdict
 * new and at the service age, the recommended one marked; while it is
 * open, its sizes stand on the main window's chart as a ladder.  It adds
 * the sizes chosen as line options, as one step of the window's undo.
 * Everything it shows comes from the model's sizing (rugosa-sizing.h). */

/* The assistant of `window`, made when first asked for; presenting it
 * again takes the duty of the line option selected now. */
RugosaSizingWindow *rugosa_sizing_window_present (RugosaWindow *window);

/* What it shows (tests): the sizing, NULL when the duty cannot be sized,
 * and whether candidate `index` is chosen for adding. */
const RugosaSizing *rugosa_sizing_window_get_sizing  (RugosaSizingWindow *self);
gboolean            rugosa_sizing_window_get_chosen  (RugosaSizingWindow *self,
                                                      guint               index);
/* The quantity entry of a field ("flow-design", "velocity-limit",
 * "max-head-loss", "service-age", …), as a user finds it by its row. */
GtkWidget          *rugosa_sizing_window_get_entry   (RugosaSizingWindow *self,
                                                      const char         *property);
const char         *rugosa_sizing_window_get_summary (RugosaSizingWindow *self);
const char         *rugosa_sizing_window_get_inverse (RugosaSizingWindow *self);

/* Installs the main window's action win.size-pipe (rugosa-window.c calls
 * it from its class_init). */
void _rugosa_window_sizing_class_init (GtkWidgetClass *widget_class);

G_END_DECLS
