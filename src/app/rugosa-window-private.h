/* SPDX-License-Identifier: GPL-3.0-or-later */
/* RugosaWindow is split over rugosa-window.c (layout, selection, editing),
 * rugosa-window-files.c (open, save, recent, drop, autosave, close guard),
 * rugosa-window-output.c (chart export, CSV, print),
 * rugosa-window-edits.c (edits applied to several lines) and
 * rugosa-window-present.c (presentation mode). */
#pragma once

#include "rugosa-canvas.h"
#include "rugosa-cost-group.h"
#include "rugosa-line-list.h"
#include "rugosa-line-panel.h"
#include "rugosa-plot-view.h"
#include "rugosa-results-table.h"
#include "rugosa-window.h"

G_BEGIN_DECLS

/* What presentation mode puts back on leaving (rugosa-window-present.c). */
typedef struct _RugosaPresentation RugosaPresentation;

struct _RugosaWindow
{
  AdwApplicationWindow parent_instance;

  /* template widgets */
  AdwWindowTitle     *window_title;
  AdwToastOverlay    *toast_overlay;
  RugosaLineList     *line_list;
  RugosaCanvas       *canvas;
  GtkLabel           *probe_label;
  GtkScale           *age_scale;
  GtkAdjustment      *age_adjustment;
  GtkInscription     *age_label;
  GtkInscription     *age_change_label;
  RugosaResultsTable *results_table;
  RugosaLinePanel    *line_panel;
  GtkMenuButton      *primary_menu_button;
  GMenu              *recent_section;
  GtkStack           *chart_stack;
  GtkStackPage       *friction_page;
  RugosaCostGroup    *cost_group;
  /* hidden while presenting, and the hint shown then */
  GtkWidget          *header_bar;
  GtkWidget          *sidebar;
  GtkWidget          *panel_scroller;
  GtkWidget          *view_switcher;
  GtkPaned           *outer_paned;
  GtkPaned           *inner_paned;
  GtkPaned           *centre_paned;
  GtkRevealer        *present_hint;
  /* the chart area's other views, added to chart_stack by the window */
  RugosaPlotView     *plot_views[RUGOSA_CHART_N_VIEWS];

  /* borrowed references */
  GSettings *settings;

  /* owned references */
  RugosaProject      *project;
  RugosaHistory      *history;
  GtkSingleSelection *selection;
  RugosaVisibility   *visibility;   /* which lines the chart and table show */
  GFile              *file;
  GtkWindow          *project_settings; /* while open; weak */
  char               *autosave_id;  /* unique per window */
  RugosaPresentation *presentation; /* while presenting: what to put back */
  RugosaPresentation *restoring;    /* after: the dividers, while the size settles */

  guint    autosave_source;
  guint    actions_source;   /* a pending update of the actions' state */
  guint    hint_source;      /* the presentation's key hint fading */
  guint    restore_tick;     /* the dividers put back, frame by frame */
  guint    restore_frames;
  int      restore_width, restore_height;
  gboolean modified;
  gboolean close_confirmed;
  gboolean close_after_save;
  gboolean following_model;  /* widgets being set from the model */
  gboolean age_changing;     /* the slider is moving the service age */
};

/* rugosa-window.c */
void     _rugosa_window_refresh_all       (RugosaWindow  *self);
void     _rugosa_window_update_title      (RugosaWindow  *self);
/* Brings the actions' enabled state up to date once the change in
 * progress is complete (before the next input event). */
void     _rugosa_window_update_actions    (RugosaWindow  *self);
/* The same, at once. */
void     _rugosa_window_apply_actions     (RugosaWindow  *self);
void     _rugosa_window_toast             (RugosaWindow  *self,
                                           const char    *text);
/* Whether `line` evaluates (at the design flow too, when it has one). */
gboolean _rugosa_window_line_ok           (RugosaWindow  *self,
                                           RugosaLine    *line);
/* Replace the project's content (load, new, recovery) and reset history. */
void     _rugosa_window_project_replaced  (RugosaWindow  *self);

/* rugosa-window-files.c */
void     _rugosa_window_files_class_init  (GtkWidgetClass *widget_class);
void     _rugosa_window_files_init        (RugosaWindow   *self);
void     _rugosa_window_files_dispose     (RugosaWindow   *self);
void     _rugosa_window_mark_modified     (RugosaWindow   *self);
void     _rugosa_window_set_file          (RugosaWindow   *self,
                                           GFile          *file);
void     _rugosa_window_remove_autosave   (RugosaWindow   *self);

/* The view the chart area shows (the one exports and prints draw). */
RugosaChartView _rugosa_window_chart_view (RugosaWindow *self);

/* rugosa-window-edits.c: a line's fluid, aging or flows applied to the
 * other selected lines */
void     _rugosa_window_edits_class_init  (GtkWidgetClass *widget_class);
void     _rugosa_window_edits_init        (RugosaWindow   *self);
void     _rugosa_window_edits_update_actions (RugosaWindow *self);

/* rugosa-window-output.c */
void     _rugosa_window_output_class_init (GtkWidgetClass *widget_class);

/* rugosa-window-present.c */
void     _rugosa_window_present_class_init (GtkWidgetClass *widget_class);
void     _rugosa_window_present_init      (RugosaWindow   *self);
void     _rugosa_window_present_dispose   (RugosaWindow   *self);
/* While presenting, the actions that edit or replace the project off. */
void     _rugosa_window_present_lock_actions (RugosaWindow *self);

G_END_DECLS
