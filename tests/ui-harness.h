/* SPDX-License-Identifier: GPL-3.0-or-later */
/* What the in-process UI test programs share: a private environment, the
 * application, the demo window, and pictures of widgets. */
#pragma once

#include <adwaita.h>

#include "rugosa-application.h"
#include "rugosa-window.h"

/* Recovery copies and recent files go to XDG folders under a new temporary
 * folder (returned, owned by the caller); settings stay in memory and GTK
 * draws with Cairo.  Call before GTK starts. */
char *ui_harness_private_dirs (const char *name);
/* GTK (the program keeps its own locale set-up) and libadwaita; FALSE
 * without a display, when the program reports a skip. */
gboolean ui_harness_init_gtk (void);
RugosaApplication *ui_harness_app_new (const char *application_id);

void ui_harness_drain (void);
/* RUGOSA_SOURCE_DIR/data/demo.rugosa */
char *ui_harness_demo_path (void);
/* A 1400 × 900 window with data/demo.rugosa loaded. */
RugosaWindow *ui_harness_open_demo (RugosaApplication *app);
/* Tests leave changes behind on purpose: no save prompt. */
void ui_harness_close_window (RugosaWindow *win);
/* Renders `widget` once drawn to RUGOSA_BUILD_DIR/NAME for people to see. */
void ui_harness_save_png (GtkWidget *widget, const char *name);
void ui_harness_remove_tree (const char *path);
