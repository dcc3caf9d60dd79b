/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-canvas"

#include "config.h"

#include <adwaita.h>
#include <glib/gi18n.h>
#include <math.h>

#include "rugosa-canvas.h"
#include "model/rugosa-display.h"
#include "rugosa-readout.h"

/* Pointer distance, in logical pixels, within which a marker counts as hit
 * (at magnify 1; it grows with the markers). */
#define HIT_RADIUS 12.0

/* Type for a projector.  Common practice (no single source): the farthest
 * seat of a meeting room is no farther than about six image heights from
 * a projected image (the "4-6-8" rule of thumb, its general-viewing case:
 * a 1920 × 1080 image 1 m high, read from 6 m), and a letter reads there
 * when its capitals subtend about 10 minutes of arc: 6 m × tan 10′ =
 * 17.5 mm, 1/57 of the image height.  The chart's capitals are 0.73 em
 * high (DejaVu Sans), so its body text, the axis numbers, gets an em of
 * 1/42 of the image height: 26 px on a 1080-line projector, about 1.75
 * times what the chart gives itself at that size.  Never less than a
 * quarter larger than at the desk (a projected chart is always read from
 * farther away than a monitor), never past the engine's maximum. */
#define PROJECTOR_TEXT_OF_HEIGHT (1.0 / 42.0)
#define PROJECTOR_MAGNIFY_MIN 1.25

struct _RugosaCanvas
{
  GtkWidget parent_instance;

  /* borrowed references */
  RugosaProject      *project;
  GtkSingleSelection *selection;
  RugosaVisibility   *visibility;

  /* owned references */
  RugosaChart      *chart;
  RugosaChartInput *input;
  RugosaTrailCache *trails;
  char             *probe_text;
  GStrv             ladder_tips;   /* a tooltip per rung of the ladder, or NULL */

  int      hover;          /* overlay index under the pointer, or -1 */
  gboolean projector;      /* type and markers for a projected screen */
  double   magnify;        /* the chart's, as last set */
  double   pointer_x, pointer_y;
  gboolean frame_log;
  gint64   last_draw_us;
  gint64   dirty_since_us; /* when the last refresh asked for a frame */
  gulong   after_paint_id;
};

G_DEFINE_FINAL_TYPE (RugosaCanvas, rugosa_canvas, GTK_TYPE_WIDGET)

enum {
  PROP_0,
  PROP_PROBE_TEXT,
  N_PROPS
};

static GParamSpec *properties[N_PROPS];

GtkWidget *
rugosa_canvas_new (void)
{
  return g_object_new (RUGOSA_TYPE_CANVAS, NULL);
}

static int
_rugosa_canvas_selected (RugosaCanvas *self)
{
  guint pos;

  if (self->selection == NULL)
    return -1;
  pos = gtk_single_selection_get_selected (self->selection);
  return pos == GTK_INVALID_LIST_POSITION ? -1 : (int) pos;
}

void
rugosa_canvas_refresh (RugosaCanvas *self)
{
  g_return_if_fail (RUGOSA_IS_CANVAS (self));

  g_clear_pointer (&self->input, rugosa_chart_input_free);
  if (self->project == NULL)
    {
      rugosa_chart_set_lines (self->chart, NULL, 0);
      gtk_widget_queue_draw (GTK_WIDGET (self));
      return;
    }
  /* The chart keeps its label placement when the lines' markers stay on
   * the same pixels: a new input every frame is no new layout. */
  self->input = rugosa_chart_input_new_view (self->project, _rugosa_canvas_selected (self), self->trails,
                                             self->visibility ? rugosa_visibility_chart_view (self->visibility)
                                                              : NULL);
  rugosa_chart_set_lines (self->chart, self->input->lines, self->input->n_lines);
  if (self->hover >= (int) self->input->n_lines)
    self->hover = -1;
  rugosa_chart_set_hover (self->chart, self->hover);
  if (self->dirty_since_us == 0)
    self->dirty_since_us = g_get_monotonic_time ();
  gtk_widget_queue_draw (GTK_WIDGET (self));
}

static void _rugosa_canvas_update_spec (RugosaCanvas *self);
static void _rugosa_canvas_set_probe_text (RugosaCanvas *self,
                                           char         *text);

void
rugosa_canvas_set_ladder (RugosaCanvas           *self,
                          const RugosaChartRung  *rungs,
                          gsize                   n_rungs,
                          const RugosaChartRgba  *colour,
                          const char *const      *tips)
{
  const RugosaChartRgba muted = { 0.35, 0.4, 0.45, 1.0 };

  g_return_if_fail (RUGOSA_IS_CANVAS (self));

  rugosa_chart_set_ladder (self->chart, rungs, n_rungs, colour != NULL ? *colour : muted);
  g_clear_pointer (&self->ladder_tips, g_strfreev);
  if (tips != NULL && n_rungs > 0)
    self->ladder_tips = g_strdupv ((char **) tips);
  gtk_widget_queue_draw (GTK_WIDGET (self));
}

gsize
rugosa_canvas_get_ladder_count (RugosaCanvas *self)
{
  g_return_val_if_fail (RUGOSA_IS_CANVAS (self), 0);
  return rugosa_chart_ladder_count (self->chart);
}

gboolean
rugosa_canvas_ladder_position (RugosaCanvas *self,
                               guint         index,
                               double       *x,
                               double       *y)
{
  g_return_val_if_fail (RUGOSA_IS_CANVAS (self), FALSE);
  _rugosa_canvas_update_spec (self);
  return rugosa_chart_ladder_position (self->chart, index, x, y);
}

static void
_rugosa_canvas_selection_changed (RugosaCanvas *self)
{
  rugosa_canvas_refresh (self);
}

void
rugosa_canvas_set_project (RugosaCanvas  *self,
                           RugosaProject *project)
{
  g_return_if_fail (RUGOSA_IS_CANVAS (self));

  self->project = project;
  rugosa_canvas_refresh (self);
}

void
rugosa_canvas_set_selection (RugosaCanvas       *self,
                             GtkSingleSelection *selection)
{
  g_return_if_fail (RUGOSA_IS_CANVAS (self));

  if (self->selection)
    g_signal_handlers_disconnect_by_data (self->selection, self);
  self->selection = selection;
  if (selection)
    g_signal_connect_swapped (selection, "notify::selected",
                              G_CALLBACK (_rugosa_canvas_selection_changed), self);
}

static void
_rugosa_canvas_drop_visibility (RugosaCanvas *self)
{
  if (self->visibility == NULL)
    return;
  g_signal_handlers_disconnect_by_data (self->visibility, self);
  g_object_remove_weak_pointer (G_OBJECT (self->visibility), (gpointer *) &self->visibility);
  self->visibility = NULL;
}

void
rugosa_canvas_set_visibility (RugosaCanvas     *self,
                              RugosaVisibility *visibility)
{
  g_return_if_fail (RUGOSA_IS_CANVAS (self));

  _rugosa_canvas_drop_visibility (self);
  self->visibility = visibility;
  if (visibility)
    {
      /* the window may drop it first */
      g_object_add_weak_pointer (G_OBJECT (visibility), (gpointer *) &self->visibility);
      g_signal_connect_object (visibility, "changed", G_CALLBACK (rugosa_canvas_refresh), self,
                               G_CONNECT_SWAPPED);
    }
  rugosa_canvas_refresh (self);
}

unsigned
rugosa_canvas_get_placements (RugosaCanvas *self)
{
  g_return_val_if_fail (RUGOSA_IS_CANVAS (self), 0);
  return rugosa_chart_placements (self->chart);
}

void
rugosa_canvas_get_pointer (RugosaCanvas *self,
                           double       *x,
                           double       *y)
{
  *x = self->pointer_x;
  *y = self->pointer_y;
}

const char *
rugosa_canvas_get_probe_text (RugosaCanvas *self)
{
  g_return_val_if_fail (RUGOSA_IS_CANVAS (self), NULL);
  return self->probe_text;
}

gint64
rugosa_canvas_get_last_draw_us (RugosaCanvas *self)
{
  return self->last_draw_us;
}

guint
rugosa_canvas_get_background_builds (RugosaCanvas *self)
{
  return rugosa_chart_background_builds (self->chart);
}

const RugosaChartInput *
rugosa_canvas_get_input (RugosaCanvas *self)
{
  return self->input;
}

/* The height of the screen the canvas is on, in logical pixels: the
 * projected image in presentation. */
static double
_rugosa_canvas_screen_height (RugosaCanvas *self)
{
  GtkNative *native = gtk_widget_get_native (GTK_WIDGET (self));
  GdkSurface *surface = native ? gtk_native_get_surface (native) : NULL;
  GdkMonitor *monitor = surface ? gdk_display_get_monitor_at_surface (gdk_surface_get_display (surface), surface)
                                : NULL;
  GdkRectangle geometry;

  if (monitor != NULL)
    {
      gdk_monitor_get_geometry (monitor, &geometry);
      if (geometry.height > 0)
        return geometry.height;
    }
  return native ? gtk_widget_get_height (GTK_WIDGET (native)) : gtk_widget_get_height (GTK_WIDGET (self));
}

/* The magnification PROJECTOR_TEXT_OF_HEIGHT asks of `spec` (at magnify 1). */
static double
_rugosa_canvas_projector_magnify (RugosaCanvas    *self,
                                  RugosaChartSpec *spec)
{
  double text, want;

  spec->magnify = 1;
  text = rugosa_chart_spec_text_size (spec);
  want = _rugosa_canvas_screen_height (self) * PROJECTOR_TEXT_OF_HEIGHT;
  return CLAMP (want / text, PROJECTOR_MAGNIFY_MIN, (double) RUGOSA_CHART_MAGNIFY_MAX);
}

static void
_rugosa_canvas_update_spec (RugosaCanvas *self)
{
  RugosaChartSpec spec = *rugosa_chart_get_spec (self->chart);
  int w = gtk_widget_get_width (GTK_WIDGET (self));
  int h = gtk_widget_get_height (GTK_WIDGET (self));
  RgError err = { 0 };

  if (self->project)
    rugosa_chart_input_fill_spec (&spec, self->project);
  /* The engine refuses charts smaller than 200 × 150; draw it clipped. */
  spec.width = MAX (w, 200);
  spec.height = MAX (h, 150);
  spec.scale = CLAMP (gtk_widget_get_scale_factor (GTK_WIDGET (self)), 1, 4);
  spec.theme = adw_style_manager_get_dark (adw_style_manager_get_default ())
               ? RUGOSA_CHART_THEME_DARK : RUGOSA_CHART_THEME_LIGHT;
  spec.footer_date[0] = '\0';
  spec.magnify = self->projector ? _rugosa_canvas_projector_magnify (self, &spec) : 1.0;
  self->magnify = spec.magnify;
  if (rugosa_chart_set_spec (self->chart, &spec, &err) != RG_OK)
    g_debug ("chart spec refused: %s", err.text);
}

static void
rugosa_canvas_snapshot (GtkWidget   *widget,
                        GtkSnapshot *snapshot)
{
  RugosaCanvas *self = RUGOSA_CANVAS (widget);
  int w = gtk_widget_get_width (widget);
  int h = gtk_widget_get_height (widget);
  gint64 t0 = g_get_monotonic_time ();
  cairo_t *cr;

  if (w <= 0 || h <= 0)
    return;
  _rugosa_canvas_update_spec (self);
  cr = gtk_snapshot_append_cairo (snapshot, &GRAPHENE_RECT_INIT (0.f, 0.f, (float) w, (float) h));
  rugosa_chart_draw (self->chart, cr);
  cairo_destroy (cr);
  self->last_draw_us = g_get_monotonic_time () - t0;
}

static void
_rugosa_canvas_after_paint (GdkFrameClock *clock,
                            RugosaCanvas  *self)
{
  gint64 now = g_get_monotonic_time ();

  if (self->frame_log && self->dirty_since_us != 0)
    g_printerr ("{\"event\":\"rugosa-frame\",\"draw_ms\":%.3f,\"frame_ms\":%.3f,\"lines\":%u}\n",
                (double) self->last_draw_us / 1000.0,
                (double) (now - self->dirty_since_us) / 1000.0,
                self->input ? (guint) self->input->n_lines : 0u);
  self->dirty_since_us = 0;
}

static void
rugosa_canvas_realize (GtkWidget *widget)
{
  RugosaCanvas *self = RUGOSA_CANVAS (widget);

  GTK_WIDGET_CLASS (rugosa_canvas_parent_class)->realize (widget);
  self->after_paint_id = g_signal_connect (gtk_widget_get_frame_clock (widget), "after-paint",
                                           G_CALLBACK (_rugosa_canvas_after_paint), self);
}

static void
rugosa_canvas_unrealize (GtkWidget *widget)
{
  RugosaCanvas *self = RUGOSA_CANVAS (widget);

  g_clear_signal_handler (&self->after_paint_id, gtk_widget_get_frame_clock (widget));
  GTK_WIDGET_CLASS (rugosa_canvas_parent_class)->unrealize (widget);
}

void
rugosa_canvas_set_projector (RugosaCanvas *self,
                             gboolean      projector)
{
  g_return_if_fail (RUGOSA_IS_CANVAS (self));

  projector = !!projector;
  if (self->projector == projector)
    return;
  self->projector = projector;
  if (projector)
    _rugosa_canvas_set_probe_text (self, NULL);
  _rugosa_canvas_update_spec (self);
  gtk_widget_queue_draw (GTK_WIDGET (self));
}

gboolean
rugosa_canvas_get_projector (RugosaCanvas *self)
{
  g_return_val_if_fail (RUGOSA_IS_CANVAS (self), FALSE);
  return self->projector;
}

double
rugosa_canvas_get_magnify (RugosaCanvas *self)
{
  g_return_val_if_fail (RUGOSA_IS_CANVAS (self), 1.0);
  _rugosa_canvas_update_spec (self);
  return self->magnify;
}

gboolean
rugosa_canvas_marker_position (RugosaCanvas *self,
                               guint         position,
                               double       *x,
                               double       *y)
{
  if (self->input == NULL)
    return FALSE;
  _rugosa_canvas_update_spec (self);
  for (size_t i = 0; i < self->input->n_lines; i++)
    if (self->input->line_index[i] == position)
      {
        rugosa_chart_to_device (self->chart, self->input->lines[i].re,
                                self->input->lines[i].f, x, y);
        return TRUE;
      }
  return FALSE;
}

gboolean
rugosa_canvas_get_label (RugosaCanvas         *self,
                         guint                 position,
                         RugosaChartLabelInfo *out)
{
  if (self->input == NULL)
    return FALSE;
  _rugosa_canvas_update_spec (self);
  for (size_t i = 0; i < self->input->n_lines; i++)
    if (self->input->line_index[i] == position)
      return rugosa_chart_get_label (self->chart, i, out);
  return FALSE;
}

static void
_rugosa_canvas_set_probe_text (RugosaCanvas *self,
                               char         *text)
{
  if (g_strcmp0 (self->probe_text, text) == 0)
    {
      g_free (text);
      return;
    }
  g_free (self->probe_text);
  self->probe_text = text;
  g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_PROBE_TEXT]);
}

void
rugosa_canvas_pointer_at (RugosaCanvas *self,
                          double        x,
                          double        y)
{
  RugosaChartProbe probe = { 0 };
  int hover;

  _rugosa_canvas_update_spec (self);
  self->pointer_x = x;
  self->pointer_y = y;
  hover = rugosa_chart_hit_test (self->chart, x, y, HIT_RADIUS * self->magnify);
  if (hover != self->hover)
    {
      self->hover = hover;
      rugosa_chart_set_hover (self->chart, hover);
      gtk_widget_queue_draw (GTK_WIDGET (self));
    }

  rugosa_chart_probe (self->chart, x, y, &probe);
  /* Over a marker the tooltip speaks for the line instead.  Presenting,
   * none: at a projector's size the readout would cover the callouts
   * the room reads, wherever the pointer was left. */
  if (!probe.in_plot || hover >= 0 || self->projector)
    {
      _rugosa_canvas_set_probe_text (self, NULL);
      return;
    }
  {
    g_autofree char *re = rugosa_display_scientific_screen (probe.re, 2);
    g_autofree char *f = rugosa_display_significant_screen (probe.f, 3);
    g_autofree char *rr = probe.has_rr ? rugosa_display_scientific_screen (probe.rr, 2) : g_strdup ("—");
    const char *where = probe.regime == RG_REGIME_TURBULENT && probe.has_rr
                        ? rugosa_readout_zone (probe.zone)
                        : rugosa_readout_regime (probe.regime);

    _rugosa_canvas_set_probe_text (self,
                                   g_strdup_printf (_("Pointer: Re %s · f %s · ε/D %s · %s"),
                                                    re, f, rr, where));
  }
}

static void
_rugosa_canvas_motion (GtkEventControllerMotion *motion,
                       double                    x,
                       double                    y,
                       RugosaCanvas             *self)
{
  rugosa_canvas_pointer_at (self, x, y);
}

static void
_rugosa_canvas_leave (GtkEventControllerMotion *motion,
                      RugosaCanvas             *self)
{
  if (self->hover != -1)
    {
      self->hover = -1;
      rugosa_chart_set_hover (self->chart, -1);
      gtk_widget_queue_draw (GTK_WIDGET (self));
    }
  _rugosa_canvas_set_probe_text (self, NULL);
}

gboolean
rugosa_canvas_select_at (RugosaCanvas *self,
                         double        x,
                         double        y)
{
  int hit;

  g_return_val_if_fail (RUGOSA_IS_CANVAS (self), FALSE);
  _rugosa_canvas_update_spec (self);
  hit = rugosa_chart_hit_test (self->chart, x, y, HIT_RADIUS * self->magnify);
  if (hit < 0 || self->selection == NULL || self->input == NULL || hit >= (int) self->input->n_lines)
    return FALSE;
  gtk_single_selection_set_selected (self->selection, self->input->line_index[hit]);
  return TRUE;
}

static void
_rugosa_canvas_pressed (GtkGestureClick *click,
                        int              n_press,
                        double           x,
                        double           y,
                        RugosaCanvas    *self)
{
  gtk_widget_grab_focus (GTK_WIDGET (self));
  rugosa_canvas_select_at (self, x, y);
}

static gboolean
rugosa_canvas_query_tooltip (GtkWidget  *widget,
                             int         x,
                             int         y,
                             gboolean    keyboard,
                             GtkTooltip *tooltip)
{
  RugosaCanvas *self = RUGOSA_CANVAS (widget);
  int hit;
  g_autofree char *text = NULL;
  RugosaLine *line;

  if (self->input == NULL || self->project == NULL)
    return FALSE;
  _rugosa_canvas_update_spec (self);
  if (keyboard)
    hit = -1;
  else
    hit = rugosa_chart_hit_test (self->chart, x, y, HIT_RADIUS * self->magnify);
  if (keyboard)
    {
      int sel = _rugosa_canvas_selected (self);
      for (size_t i = 0; i < self->input->n_lines; i++)
        if ((int) self->input->line_index[i] == sel)
          hit = (int) i;
    }
  if (hit < 0 || hit >= (int) self->input->n_lines)
    {
      /* a rung of a sizing's ladder speaks for its size */
      int rung = keyboard ? -1 : rugosa_chart_ladder_hit_test (self->chart, x, y, HIT_RADIUS * self->magnify / 2);

      if (rung < 0 || self->ladder_tips == NULL
          || rung >= (int) g_strv_length (self->ladder_tips))
        return FALSE;
      gtk_tooltip_set_text (tooltip, self->ladder_tips[rung]);
      return TRUE;
    }
  line = rugosa_project_get_line (self->project, self->input->line_index[hit]);
  text = rugosa_readout_line_full (self->project, line);
  gtk_tooltip_set_text (tooltip, text);
  return TRUE;
}

static void
_rugosa_canvas_step (GtkWidget  *widget,
                     const char *action_name,
                     GVariant   *param)
{
  RugosaCanvas *self = RUGOSA_CANVAS (widget);
  int step = g_variant_get_int32 (param);
  guint n, pos;

  if (self->selection == NULL)
    return;
  n = g_list_model_get_n_items (G_LIST_MODEL (self->selection));
  if (n == 0)
    return;
  pos = gtk_single_selection_get_selected (self->selection);
  if (pos == GTK_INVALID_LIST_POSITION)
    pos = step > 0 ? n - 1 : 0;
  pos = (pos + n + step) % n;
  gtk_single_selection_set_selected (self->selection, pos);
}

static void
_rugosa_canvas_style_changed (RugosaCanvas *self)
{
  gtk_widget_queue_draw (GTK_WIDGET (self));
}

static void
rugosa_canvas_get_property (GObject    *object,
                            guint       prop_id,
                            GValue     *value,
                            GParamSpec *pspec)
{
  RugosaCanvas *self = RUGOSA_CANVAS (object);

  switch (prop_id)
    {
    case PROP_PROBE_TEXT: g_value_set_string (value, self->probe_text); break;
    default: G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_canvas_dispose (GObject *object)
{
  RugosaCanvas *self = RUGOSA_CANVAS (object);

  rugosa_canvas_set_selection (self, NULL);
  _rugosa_canvas_drop_visibility (self);
  g_signal_handlers_disconnect_by_data (adw_style_manager_get_default (), self);
  G_OBJECT_CLASS (rugosa_canvas_parent_class)->dispose (object);
}

static void
rugosa_canvas_finalize (GObject *object)
{
  RugosaCanvas *self = RUGOSA_CANVAS (object);

  g_clear_pointer (&self->input, rugosa_chart_input_free);
  g_clear_pointer (&self->chart, rugosa_chart_free);
  g_clear_pointer (&self->trails, rugosa_trail_cache_free);
  g_free (self->probe_text);
  g_strfreev (self->ladder_tips);
  G_OBJECT_CLASS (rugosa_canvas_parent_class)->finalize (object);
}

static void
rugosa_canvas_class_init (RugosaCanvasClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->get_property = rugosa_canvas_get_property;
  object_class->dispose = rugosa_canvas_dispose;
  object_class->finalize = rugosa_canvas_finalize;
  widget_class->snapshot = rugosa_canvas_snapshot;
  widget_class->realize = rugosa_canvas_realize;
  widget_class->unrealize = rugosa_canvas_unrealize;
  widget_class->query_tooltip = rugosa_canvas_query_tooltip;

  properties[PROP_PROBE_TEXT] =
    g_param_spec_string ("probe-text", NULL, NULL, NULL,
                         G_PARAM_READABLE | G_PARAM_EXPLICIT_NOTIFY | G_PARAM_STATIC_STRINGS);
  g_object_class_install_properties (object_class, N_PROPS, properties);

  gtk_widget_class_install_action (widget_class, "canvas.step", "i", _rugosa_canvas_step);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_Right, 0, "canvas.step", "i", 1);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_Down, 0, "canvas.step", "i", 1);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_Left, 0, "canvas.step", "i", -1);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_Up, 0, "canvas.step", "i", -1);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_Tab, GDK_CONTROL_MASK, "canvas.step", "i", 1);

  gtk_widget_class_set_css_name (widget_class, "frictionchart");
  gtk_widget_class_set_accessible_role (widget_class, GTK_ACCESSIBLE_ROLE_IMG);
}

static void
rugosa_canvas_init (RugosaCanvas *self)
{
  GtkEventController *motion;
  GtkGesture *click;

  self->hover = -1;
  self->magnify = 1.0;
  self->chart = rugosa_chart_new ();
  self->trails = rugosa_trail_cache_new ();
  self->frame_log = g_getenv ("RUGOSA_FRAME_LOG") != NULL && g_strcmp0 (g_getenv ("RUGOSA_FRAME_LOG"), "0") != 0;

  gtk_widget_set_focusable (GTK_WIDGET (self), TRUE);
  gtk_widget_set_has_tooltip (GTK_WIDGET (self), TRUE);
  gtk_widget_set_hexpand (GTK_WIDGET (self), TRUE);
  gtk_widget_set_vexpand (GTK_WIDGET (self), TRUE);
  gtk_widget_set_size_request (GTK_WIDGET (self), 320, 240);

  motion = gtk_event_controller_motion_new ();
  g_signal_connect (motion, "motion", G_CALLBACK (_rugosa_canvas_motion), self);
  g_signal_connect (motion, "leave", G_CALLBACK (_rugosa_canvas_leave), self);
  gtk_widget_add_controller (GTK_WIDGET (self), motion);

  click = gtk_gesture_click_new ();
  g_signal_connect (click, "pressed", G_CALLBACK (_rugosa_canvas_pressed), self);
  gtk_widget_add_controller (GTK_WIDGET (self), GTK_EVENT_CONTROLLER (click));

  g_signal_connect_swapped (adw_style_manager_get_default (), "notify::dark",
                            G_CALLBACK (_rugosa_canvas_style_changed), self);
  gtk_accessible_update_property (GTK_ACCESSIBLE (self),
                                  GTK_ACCESSIBLE_PROPERTY_LABEL, _("Friction chart"),
                                  GTK_ACCESSIBLE_PROPERTY_DESCRIPTION,
                                  _("Darcy friction factor against Reynolds number with the line options as markers; arrow keys move the selection."),
                                  -1);
}
