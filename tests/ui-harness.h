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

/* Runs the main loop for `ms` milliseconds (timeouts such as a search
 * entry's delay fire). */
void ui_harness_wait (guint ms);
/* Runs the main loop until `done (data)` or `ms` milliseconds pass;
 * returns the last answer of `done`. */
gboolean ui_harness_wait_until (gboolean (*done) (gpointer data), gpointer data, guint ms);

/* Finding what a user sees: the first descendant of `root` of a type;
 * the preferences row titled `title`; the button (or other actionable)
 * bound to `action` (with `target`, or any target when NULL). */
GtkWidget *ui_harness_find_descendant (GtkWidget *root, GType type);
GtkWidget *ui_harness_find_row (GtkWidget *root, const char *title);
GtkWidget *ui_harness_find_action_widget (GtkWidget *root, const char *action, GVariant *target);
/* The visible message dialog `parent` has presented, or NULL. */
AdwMessageDialog *ui_harness_find_message_dialog (GtkWindow *parent);
/* The visible toplevel of `type` transient for `parent`, or NULL. */
GtkWindow *ui_harness_find_dialog (GtkWindow *parent, GType type);

/* A click on a button the user can press (asserts it is sensitive). */
void ui_harness_click (GtkWidget *button);
/* A click on the button of a message dialog's response. */
void ui_harness_click_response (AdwMessageDialog *dialog, const char *response);
