/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-plot-view"

#include "config.h"

#include <adwaita.h>
#include <glib/gi18n.h>

#include "rugosa-plot-view.h"
#include "rugosa-readout.h"

/* Pointer distance, in logical pixels, within which a curve counts as hit
 * (as for the friction chart's markers). */
#define HIT_RADIUS 8.0

struct _RugosaPlotView
{
  GtkWidget parent_instance;

  /* borrowed references */
  RugosaProject      *project;
  GSettings          *settings;
  GtkSingleSelection *selection;
  RugosaVisibility   *visibility;   /* weak; NULL: every line */

  /* owned references */
  RugosaPlot      *plot;
  RugosaPlotInput *input;

  RugosaChartView view;
  int             hover;     /* series under the pointer, or -1 */
  gboolean        stale;     /* results changed while hidden */
};

G_DEFINE_FINAL_TYPE (RugosaPlotView, rugosa_plot_view, GTK_TYPE_WIDGET)

enum {
  PROP_0,
  PROP_VIEW_ID,
  N_PROPS
};

static GParamSpec *properties[N_PROPS];

GtkWidget *
rugosa_plot_view_new (void)
{
  return g_object_new (RUGOSA_TYPE_PLOT_VIEW, NULL);
}

static int
_rugosa_plot_view_selected (RugosaPlotView *self)
{
  guint pos;

  if (self->selection == NULL)
    return -1;
  pos = gtk_single_selection_get_selected (self->selection);
  return pos == GTK_INVALID_LIST_POSITION ? -1 : (int) pos;
}

void
rugosa_plot_view_refresh (RugosaPlotView *self)
{
  g_return_if_fail (RUGOSA_IS_PLOT_VIEW (self));

  /* The system curves cost a line evaluation per point: a view off
   * screen waits until it is shown. */
  if (!gtk_widget_get_mapped (GTK_WIDGET (self)))
    {
      self->stale = TRUE;
      return;
    }
  self->stale = FALSE;
  g_clear_pointer (&self->input, rugosa_plot_input_free);
  if (self->project != NULL)
    {
      self->input = rugosa_plot_input_new (self->project, self->view, _rugosa_plot_view_selected (self),
                                           self->visibility != NULL
                                             ? rugosa_visibility_chart_view (self->visibility)
                                             : NULL);
      rugosa_plot_set_series (self->plot, self->input->series, self->input->n_series);
    }
  else
    rugosa_plot_set_series (self->plot, NULL, 0);
  if (self->hover >= (int) (self->input ? self->input->n_series : 0))
    self->hover = -1;
  rugosa_plot_set_hover (self->plot, self->hover);
  gtk_widget_queue_draw (GTK_WIDGET (self));
}

void
rugosa_plot_view_set_project (RugosaPlotView *self,
                              RugosaProject  *project,
                              GSettings      *settings)
{
  g_return_if_fail (RUGOSA_IS_PLOT_VIEW (self));

  self->project = project;
  self->settings = settings;
  rugosa_plot_view_refresh (self);
}

static void
_rugosa_plot_view_selection_changed (RugosaPlotView *self)
{
  rugosa_plot_view_refresh (self);
}

void
rugosa_plot_view_set_selection (RugosaPlotView     *self,
                                GtkSingleSelection *selection)
{
  g_return_if_fail (RUGOSA_IS_PLOT_VIEW (self));

  if (self->selection)
    g_signal_handlers_disconnect_by_data (self->selection, self);
  self->selection = selection;
  if (selection)
    g_signal_connect_swapped (selection, "notify::selected",
                              G_CALLBACK (_rugosa_plot_view_selection_changed), self);
}

void
rugosa_plot_view_set_visibility (RugosaPlotView   *self,
                                 RugosaVisibility *visibility)
{
  g_return_if_fail (RUGOSA_IS_PLOT_VIEW (self));

  if (self->visibility != NULL)
    {
      g_signal_handlers_disconnect_by_data (self->visibility, self);
      g_object_remove_weak_pointer (G_OBJECT (self->visibility), (gpointer *) &self->visibility);
    }
  self->visibility = visibility;
  if (visibility != NULL)
    {
      g_object_add_weak_pointer (G_OBJECT (visibility), (gpointer *) &self->visibility);
      g_signal_connect_object (visibility, "changed", G_CALLBACK (rugosa_plot_view_refresh), self,
                               G_CONNECT_SWAPPED);
    }
  rugosa_plot_view_refresh (self);
}

RugosaChartView
rugosa_plot_view_get_view (RugosaPlotView *self)
{
  g_return_val_if_fail (RUGOSA_IS_PLOT_VIEW (self), RUGOSA_CHART_VIEW_SYSTEM);
  return self->view;
}

const RugosaPlotInput *
rugosa_plot_view_get_input (RugosaPlotView *self)
{
  return self->input;
}

/* The spec for the widget's size, scale and theme around the input's texts. */
static void
_rugosa_plot_view_update_spec (RugosaPlotView *self)
{
  RugosaPlotSpec spec;
  RgError err = { 0 };

  if (self->input != NULL)
    spec = self->input->spec;
  else
    {
      rugosa_plot_spec_init (&spec);
      spec.view = self->view;
    }
  /* The engine refuses plots smaller than 200 × 150; draw it clipped. */
  spec.width = MAX (gtk_widget_get_width (GTK_WIDGET (self)), 200);
  spec.height = MAX (gtk_widget_get_height (GTK_WIDGET (self)), 150);
  spec.scale = CLAMP (gtk_widget_get_scale_factor (GTK_WIDGET (self)), 1, 4);
  spec.theme = adw_style_manager_get_dark (adw_style_manager_get_default ())
               ? RUGOSA_CHART_THEME_DARK : RUGOSA_CHART_THEME_LIGHT;
  spec.footer_date[0] = '\0';
  if (rugosa_plot_set_spec (self->plot, &spec, &err) != RG_OK)
    g_debug ("plot spec refused: %s", err.text);
}

static void
rugosa_plot_view_snapshot (GtkWidget   *widget,
                           GtkSnapshot *snapshot)
{
  RugosaPlotView *self = RUGOSA_PLOT_VIEW (widget);
  int w = gtk_widget_get_width (widget);
  int h = gtk_widget_get_height (widget);
  cairo_t *cr;

  if (w <= 0 || h <= 0)
    return;
  _rugosa_plot_view_update_spec (self);
  cr = gtk_snapshot_append_cairo (snapshot, &GRAPHENE_RECT_INIT (0.f, 0.f, (float) w, (float) h));
  rugosa_plot_draw (self->plot, cr);
  cairo_destroy (cr);
}

static void
rugosa_plot_view_map (GtkWidget *widget)
{
  RugosaPlotView *self = RUGOSA_PLOT_VIEW (widget);

  GTK_WIDGET_CLASS (rugosa_plot_view_parent_class)->map (widget);
  if (self->stale || self->input == NULL)
    rugosa_plot_view_refresh (self);
}

static int
_rugosa_plot_view_hit (RugosaPlotView *self,
                       double          x,
                       double          y)
{
  if (self->input == NULL)
    return -1;
  _rugosa_plot_view_update_spec (self);
  return rugosa_plot_hit_test (self->plot, x, y, HIT_RADIUS);
}

static void
_rugosa_plot_view_motion (GtkEventControllerMotion *motion,
                          double                    x,
                          double                    y,
                          RugosaPlotView           *self)
{
  int hover = _rugosa_plot_view_hit (self, x, y);

  if (hover != self->hover)
    {
      self->hover = hover;
      rugosa_plot_set_hover (self->plot, hover);
      gtk_widget_queue_draw (GTK_WIDGET (self));
    }
}

static void
_rugosa_plot_view_leave (GtkEventControllerMotion *motion,
                         RugosaPlotView           *self)
{
  if (self->hover != -1)
    {
      self->hover = -1;
      rugosa_plot_set_hover (self->plot, -1);
      gtk_widget_queue_draw (GTK_WIDGET (self));
    }
}

gboolean
rugosa_plot_view_select_at (RugosaPlotView *self,
                            double          x,
                            double          y)
{
  int hit;

  g_return_val_if_fail (RUGOSA_IS_PLOT_VIEW (self), FALSE);
  hit = _rugosa_plot_view_hit (self, x, y);
  if (hit < 0 || self->selection == NULL || hit >= (int) self->input->n_series)
    return FALSE;
  gtk_single_selection_set_selected (self->selection, self->input->line_index[hit]);
  return TRUE;
}

static void
_rugosa_plot_view_pressed (GtkGestureClick *click,
                           int              n_press,
                           double           x,
                           double           y,
                           RugosaPlotView  *self)
{
  rugosa_plot_view_select_at (self, x, y);
}

static gboolean
rugosa_plot_view_query_tooltip (GtkWidget  *widget,
                                int         x,
                                int         y,
                                gboolean    keyboard,
                                GtkTooltip *tooltip)
{
  RugosaPlotView *self = RUGOSA_PLOT_VIEW (widget);
  int hit = keyboard ? -1 : _rugosa_plot_view_hit (self, x, y);
  g_autofree char *text = NULL;

  if (hit < 0 || self->project == NULL)
    return FALSE;
  text = rugosa_readout_line_full (self->project,
                                   rugosa_project_get_line (self->project, self->input->line_index[hit]));
  gtk_tooltip_set_text (tooltip, text);
  return TRUE;
}

static void
_rugosa_plot_view_style_changed (RugosaPlotView *self)
{
  gtk_widget_queue_draw (GTK_WIDGET (self));
}

static void
rugosa_plot_view_get_property (GObject    *object,
                               guint       prop_id,
                               GValue     *value,
                               GParamSpec *pspec)
{
  RugosaPlotView *self = RUGOSA_PLOT_VIEW (object);

  switch (prop_id)
    {
    case PROP_VIEW_ID: g_value_set_string (value, rugosa_chart_view_id (self->view)); break;
    default: G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_plot_view_set_property (GObject      *object,
                               guint         prop_id,
                               const GValue *value,
                               GParamSpec   *pspec)
{
  RugosaPlotView *self = RUGOSA_PLOT_VIEW (object);
  RugosaChartView view;

  switch (prop_id)
    {
    case PROP_VIEW_ID:
      /* the friction chart is RugosaCanvas's */
      if (!rugosa_chart_view_from_id (g_value_get_string (value), &view) || view == RUGOSA_CHART_VIEW_FRICTION)
        {
          g_warning ("RugosaPlotView: no plot view “%s”", g_value_get_string (value));
          return;
        }
      self->view = view;
      gtk_accessible_update_property (GTK_ACCESSIBLE (self),
                                      GTK_ACCESSIBLE_PROPERTY_LABEL, rugosa_chart_view_title (view), -1);
      rugosa_plot_view_refresh (self);
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_plot_view_dispose (GObject *object)
{
  RugosaPlotView *self = RUGOSA_PLOT_VIEW (object);

  rugosa_plot_view_set_selection (self, NULL);
  rugosa_plot_view_set_visibility (self, NULL);
  g_signal_handlers_disconnect_by_data (adw_style_manager_get_default (), self);
  G_OBJECT_CLASS (rugosa_plot_view_parent_class)->dispose (object);
}

static void
rugosa_plot_view_finalize (GObject *object)
{
  RugosaPlotView *self = RUGOSA_PLOT_VIEW (object);

  g_clear_pointer (&self->input, rugosa_plot_input_free);
  g_clear_pointer (&self->plot, rugosa_plot_free);
  G_OBJECT_CLASS (rugosa_plot_view_parent_class)->finalize (object);
}

static void
rugosa_plot_view_class_init (RugosaPlotViewClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->get_property = rugosa_plot_view_get_property;
  object_class->set_property = rugosa_plot_view_set_property;
  object_class->dispose = rugosa_plot_view_dispose;
  object_class->finalize = rugosa_plot_view_finalize;
  widget_class->snapshot = rugosa_plot_view_snapshot;
  widget_class->map = rugosa_plot_view_map;
  widget_class->query_tooltip = rugosa_plot_view_query_tooltip;

  properties[PROP_VIEW_ID] =
    g_param_spec_string ("view-id", NULL, NULL, "system",
                         G_PARAM_READWRITE | G_PARAM_EXPLICIT_NOTIFY | G_PARAM_STATIC_STRINGS);
  g_object_class_install_properties (object_class, N_PROPS, properties);

  gtk_widget_class_set_css_name (widget_class, "plotview");
  gtk_widget_class_set_accessible_role (widget_class, GTK_ACCESSIBLE_ROLE_IMG);
}

static void
rugosa_plot_view_init (RugosaPlotView *self)
{
  GtkEventController *motion;
  GtkGesture *click;

  self->view = RUGOSA_CHART_VIEW_SYSTEM;
  self->hover = -1;
  self->plot = rugosa_plot_new ();

  gtk_widget_set_has_tooltip (GTK_WIDGET (self), TRUE);
  gtk_widget_set_hexpand (GTK_WIDGET (self), TRUE);
  gtk_widget_set_vexpand (GTK_WIDGET (self), TRUE);
  gtk_widget_set_size_request (GTK_WIDGET (self), 320, 240);

  motion = gtk_event_controller_motion_new ();
  g_signal_connect (motion, "motion", G_CALLBACK (_rugosa_plot_view_motion), self);
  g_signal_connect (motion, "leave", G_CALLBACK (_rugosa_plot_view_leave), self);
  gtk_widget_add_controller (GTK_WIDGET (self), motion);

  click = gtk_gesture_click_new ();
  g_signal_connect (click, "pressed", G_CALLBACK (_rugosa_plot_view_pressed), self);
  gtk_widget_add_controller (GTK_WIDGET (self), GTK_EVENT_CONTROLLER (click));

  g_signal_connect_swapped (adw_style_manager_get_default (), "notify::dark",
                            G_CALLBACK (_rugosa_plot_view_style_changed), self);
  gtk_accessible_update_property (GTK_ACCESSIBLE (self),
                                  GTK_ACCESSIBLE_PROPERTY_LABEL, rugosa_chart_view_title (self->view),
                                  GTK_ACCESSIBLE_PROPERTY_DESCRIPTION,
                                  _("The line options' system curves or cumulative costs; a click on a curve selects its line."),
                                  -1);
}
