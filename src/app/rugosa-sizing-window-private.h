/* SPDX-License-Identifier: GPL-3.0-or-later */
/* RugosaSizingWindow is split over rugosa-sizing-window.c (the form, the
 * duty, the object, the main window's action) and
 * rugosa-sizing-window-results.c (the sizing and what shows it). */
#pragma once

#include "model/rugosa-sizing.h"
#include "rugosa-sizing-window.h"

G_BEGIN_DECLS

struct _RugosaSizingWindow
{
  AdwWindow parent_instance;

  /* template widgets */
  AdwWindowTitle      *window_title;
  GtkButton           *add_button;
  AdwPreferencesGroup *duty_group;
  AdwPreferencesGroup *pipe_group;
  AdwPreferencesGroup *limits_group;
  AdwActionRow        *material_row;
  AdwActionRow        *aging_row;
  GtkDropDown         *material_dropdown;
  GtkDropDown         *catalog_dropdown;
  GtkDropDown         *aging_dropdown;
  GtkLabel            *summary_label;
  GtkLabel            *inverse_label;
  GtkColumnView       *view;

  /* borrowed references */
  RugosaWindow  *main_window;
  RugosaProject *project;

  /* owned references */
  RugosaLine    *duty;         /* the copy being sized */
  RugosaLine    *source;       /* the line option it came from, or NULL */
  RugosaSizing  *sizing;       /* NULL when the duty cannot be sized */
  GtkStringList *rows;         /* the candidates' designations */
  GHashTable    *chosen;       /* designations chosen for adding */
  GHashTable    *entries;      /* property -> RugosaQuantityEntry */
  GPtrArray     *material_ids; /* the materials offered (static strings) */
  GPtrArray     *catalogs;     /* the catalog dropdown: NULL (usual), names…, "all" */
  char          *error;        /* why the duty cannot be sized */

  double   head_loss_max;      /* m; 0: none */
  gboolean user_chose;         /* the choice is the user's, not the recommendation */
  gboolean updating;
};

/* rugosa-sizing-window.c */
RugosaSettings *_rugosa_sizing_window_settings (RugosaSizingWindow *self);
/* The material and the catalog name (rg_pipe_catalog_choose) chosen. */
const char     *_rugosa_sizing_window_material (RugosaSizingWindow *self);
const char     *_rugosa_sizing_window_catalog  (RugosaSizingWindow *self);

/* rugosa-sizing-window-results.c */
/* The columns of the table (from init). */
void _rugosa_sizing_window_results_init  (RugosaSizingWindow *self);
/* Size the duty again and show it all. */
void _rugosa_sizing_window_run           (RugosaSizingWindow *self);
/* The ladder on the main window's chart, after a change of the choice. */
void _rugosa_sizing_window_update_ladder (RugosaSizingWindow *self);
void _rugosa_sizing_window_add_clicked   (GtkButton          *button,
                                          RugosaSizingWindow *self);

G_END_DECLS
