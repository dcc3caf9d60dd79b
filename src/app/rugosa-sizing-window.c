/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The sizing assistant (see rugosa-sizing-window.h).
 *
 * The form is built from the field rows: each number is a row of the line
 * table (the duty's flows, length and elevation), of the settings table
 * (the project's limits and the service age) or of the sizing's own table
 * (the head loss of this duty), with the row's label, help, range and the
 * project's unit of its quantity.  The duty is a copy of the line option
 * selected when the assistant was presented: editing it here changes no
 * line; the project's limits are the project's, changed through the undo
 * history, and the service age is the view setting the slider moves.
 *
 * Every edit sizes the duty again (a few milliseconds: one evaluation per
 * size, rugosa-sizing.c) and refreshes the table, the summary, the inverse
 * results and the ladder on the main window's chart.
 *
 * This file holds the form, the duty, the object and the main window's
 * action; rugosa-sizing-window-results.c the sizing and what shows it. */
#define G_LOG_DOMAIN "rugosa-sizing-window"

#include "config.h"

#include <glib/gi18n.h>
#include <math.h>
#include <string.h>

#include "chart/rugosa-chart-sizing.h"
#include "core/aging.h"
#include "core/catalog.h"
#include "model/rugosa-display.h"
#include "model/rugosa-fields.h"
#include "model/rugosa-history.h"
#include "model/rugosa-units.h"
#include "rugosa-canvas.h"
#include "rugosa-quantity-entry.h"
#include "rugosa-sizing-window-private.h"

/* Where a number of the form goes. */
typedef enum {
  TARGET_DUTY,       /* a field of the duty line */
  TARGET_SETTINGS,   /* a project setting, through the undo history */
  TARGET_VIEW,       /* the service age shown (a view setting) */
  TARGET_OWN,        /* the head loss of this duty */
} Target;

static const struct {
  const char *property;
  Target target;
  int group;         /* 0 duty, 1 pipe and service life, 2 limits */
} form_rows[] = {
  { "flow-design", TARGET_DUTY, 0 },
  { "flow-maximum", TARGET_DUTY, 0 },
  { "length", TARGET_DUTY, 0 },
  { "elevation", TARGET_DUTY, 0 },
  { "service-age", TARGET_VIEW, 1 },
  { "velocity-limit", TARGET_SETTINGS, 2 },
  { "velocity-minimum", TARGET_SETTINGS, 2 },
  { "gradient-limit", TARGET_SETTINGS, 2 },
  { "max-head-loss", TARGET_OWN, 2 },
};


G_DEFINE_FINAL_TYPE (RugosaSizingWindow, rugosa_sizing_window, ADW_TYPE_WINDOW)

static const char *const DATA_KEY = "rugosa-sizing-window";


/* ---- the form ---- */

static const RugosaField *
_row_of (const char *property)
{
  const RugosaField *row = rugosa_field_find (property);
  guint n;

  if (row == NULL)
    {
      const RugosaField *own = rugosa_sizing_fields (&n);

      for (guint i = 0; i < n; i++)
        if (g_str_equal (own[i].property, property))
          return &own[i];
    }
  return row;
}

RugosaSettings *
_rugosa_sizing_window_settings (RugosaSizingWindow *self)
{
  return rugosa_project_get_settings (self->project);
}

/* The stored value a form row shows now. */
static double
_rugosa_sizing_window_value (RugosaSizingWindow *self,
                             guint               i)
{
  switch (form_rows[i].target)
    {
    case TARGET_DUTY:
      return rugosa_line_get_double (self->duty, form_rows[i].property);
    case TARGET_SETTINGS:
    case TARGET_VIEW:
      return rugosa_settings_get_double (_rugosa_sizing_window_settings (self), form_rows[i].property);
    case TARGET_OWN:
    default:
      return self->head_loss_max;
    }
}

/* Show the document's values in the project's units. */
static void
_rugosa_sizing_window_show_values (RugosaSizingWindow *self)
{
  self->updating = TRUE;
  for (guint i = 0; i < G_N_ELEMENTS (form_rows); i++)
    {
      const RugosaField *row = _row_of (form_rows[i].property);
      RugosaQuantityEntry *entry = g_hash_table_lookup (self->entries, form_rows[i].property);

      rugosa_quantity_entry_set_unit (entry, rugosa_settings_get_unit (_rugosa_sizing_window_settings (self), row->display));
      if (rugosa_quantity_entry_get_error_text (entry) == NULL)
        rugosa_quantity_entry_set_value (entry, _rugosa_sizing_window_value (self, i));
    }
  self->updating = FALSE;
}

/* A value refused: the field keeps the value in force (the entry has
 * taken the new one already) and shows why. */
static void
_rugosa_sizing_window_refuse (RugosaSizingWindow  *self,
                              RugosaQuantityEntry *entry,
                              guint                i,
                              const char          *why)
{
  self->updating = TRUE;
  rugosa_quantity_entry_set_value (entry, _rugosa_sizing_window_value (self, i));
  self->updating = FALSE;
  rugosa_quantity_entry_set_error (entry, why);
}

static void
_rugosa_sizing_window_committed (RugosaQuantityEntry *entry,
                                 double               stored,
                                 RugosaSizingWindow  *self)
{
  const char *property = gtk_widget_get_name (GTK_WIDGET (entry));
  /* the entry has read the text and checked the row's range */
  double v = stored;
  guint i;

  if (self->updating)
    return;
  for (i = 0; i < G_N_ELEMENTS (form_rows); i++)
    if (g_str_equal (form_rows[i].property, property))
      break;
  /* The highest flow, when given, is at least the design flow (the
   * project file keeps them in order). */
  if (g_str_has_prefix (property, "flow-"))
    {
      double design = g_str_equal (property, "flow-design") ? v : rugosa_line_get_double (self->duty, "flow-design");
      double high = g_str_equal (property, "flow-maximum") ? v : rugosa_line_get_double (self->duty, "flow-maximum");

      if (high > 0.0 && high < design)
        {
          g_autofree char *shown = rugosa_display_format_screen (RG_QTY_FLOW, design,
                                                                 rugosa_settings_get_unit (_rugosa_sizing_window_settings (self), RUGOSA_DISPLAY_FLOW));
          g_autofree char *why = g_strdup_printf (_("The highest flow must not be below the design flow, %s."), shown);

          _rugosa_sizing_window_refuse (self, entry, i, why);
          return;
        }
    }
  switch (form_rows[i].target)
    {
    case TARGET_DUTY:
      g_object_set (self->duty, property, v, NULL);
      break;
    case TARGET_SETTINGS:
      /* the settings' notify sizes again */
      rugosa_history_set (rugosa_window_get_history (self->main_window), _rugosa_sizing_window_settings (self),
                          property, v, NULL);
      rugosa_history_break_merge (rugosa_window_get_history (self->main_window));
      return;
    case TARGET_VIEW:
      g_object_set (_rugosa_sizing_window_settings (self), property, v, NULL);
      return;
    case TARGET_OWN:
    default:
      self->head_loss_max = v;
      break;
    }
  _rugosa_sizing_window_run (self);
}

static void
_rugosa_sizing_window_build_form (RugosaSizingWindow *self)
{
  AdwPreferencesGroup *groups[3] = { self->duty_group, self->pipe_group, self->limits_group };

  for (guint i = 0; i < G_N_ELEMENTS (form_rows); i++)
    {
      const RugosaField *row = _row_of (form_rows[i].property);
      GtkWidget *entry = rugosa_quantity_entry_new ();
      GtkWidget *arow = adw_action_row_new ();

      gtk_widget_set_valign (entry, GTK_ALIGN_CENTER);
      g_signal_connect (entry, "committed", G_CALLBACK (_rugosa_sizing_window_committed), self);
      adw_action_row_add_suffix (ADW_ACTION_ROW (arow), entry);
      adw_action_row_set_activatable_widget (ADW_ACTION_ROW (arow), entry);
      /* in its row: the row takes the field's label and help from it */
      rugosa_quantity_entry_set_field (RUGOSA_QUANTITY_ENTRY (entry), row);
      adw_preferences_group_add (groups[form_rows[i].group], arow);
      g_hash_table_insert (self->entries, (gpointer) row->property, entry);
    }
  /* the catalog rows take their titles from the line table too */
  adw_preferences_row_set_title (ADW_PREFERENCES_ROW (self->material_row),
                                 rugosa_field_label (rugosa_field_find ("material-id")));
  adw_preferences_row_set_title (ADW_PREFERENCES_ROW (self->aging_row),
                                 rugosa_field_label (rugosa_field_find ("aging-class-id")));
}

/* ---- the catalog choices ---- */

const char *
_rugosa_sizing_window_material (RugosaSizingWindow *self)
{
  guint i = gtk_drop_down_get_selected (self->material_dropdown);

  return i < self->material_ids->len ? g_ptr_array_index (self->material_ids, i) : NULL;
}

const char *
_rugosa_sizing_window_catalog (RugosaSizingWindow *self)
{
  guint i = gtk_drop_down_get_selected (self->catalog_dropdown);

  return i < self->catalogs->len ? g_ptr_array_index (self->catalogs, i) : NULL;
}

/* The catalogs of the material: its usual series, each series, every one. */
static void
_rugosa_sizing_window_fill_catalogs (RugosaSizingWindow *self)
{
  g_autoptr (GtkStringList) names = gtk_string_list_new (NULL);
  const char *material = _rugosa_sizing_window_material (self);
  g_autofree unsigned char *usual = g_new0 (unsigned char, MAX (rg_pipe_catalog_count (), 1));
  g_autoptr (GString) usual_names = g_string_new (NULL);
  int n = 0;

  g_ptr_array_set_size (self->catalogs, 0);
  (void) rg_pipe_catalog_choose (NULL, material, usual, &n, NULL);
  for (int c = 0; c < rg_pipe_catalog_count (); c++)
    if (usual[c])
      g_string_append_printf (usual_names, "%s%s", usual_names->len ? ", " : "",
                              rg_pipe_catalog_at (c)->name);
  {
    /* TRANSLATORS: the first choice of catalogs, e.g. "Usual: ISO 4427-2 SDR 11" */
    g_autofree char *first = g_strdup_printf (_("Usual: %s"), usual_names->str);
    gtk_string_list_append (names, first);
    g_ptr_array_add (self->catalogs, NULL);
  }
  for (int c = 0; c < rg_pipe_catalog_count (); c++)
    if (rg_pipe_catalog_fits (rg_pipe_catalog_at (c), material))
      {
        gtk_string_list_append (names, rg_pipe_catalog_at (c)->name);
        g_ptr_array_add (self->catalogs, (gpointer) rg_pipe_catalog_at (c)->name);
      }
  gtk_string_list_append (names, _("Every series of the material"));
  g_ptr_array_add (self->catalogs, (gpointer) "all");
  self->updating = TRUE;
  gtk_drop_down_set_model (self->catalog_dropdown, G_LIST_MODEL (names));
  gtk_drop_down_set_selected (self->catalog_dropdown, 0);
  self->updating = FALSE;
}

static void
_rugosa_sizing_window_material_changed (GtkDropDown        *dropdown,
                                        GParamSpec         *pspec,
                                        RugosaSizingWindow *self)
{
  if (self->updating)
    return;
  _rugosa_sizing_window_fill_catalogs (self);
  self->user_chose = FALSE;
  _rugosa_sizing_window_run (self);
}

static void
_rugosa_sizing_window_catalog_changed (GtkDropDown        *dropdown,
                                       GParamSpec         *pspec,
                                       RugosaSizingWindow *self)
{
  if (self->updating)
    return;
  self->user_chose = FALSE;
  _rugosa_sizing_window_run (self);
}

/* Aging: 0 keeps the duty's own growth (a class or a rate), 1 none, then
 * the classes. */
static void
_rugosa_sizing_window_aging_changed (GtkDropDown        *dropdown,
                                     GParamSpec         *pspec,
                                     RugosaSizingWindow *self)
{
  guint i = gtk_drop_down_get_selected (dropdown);

  if (self->updating || i == GTK_INVALID_LIST_POSITION)
    return;
  if (i == 0)
    {
      const char *klass = self->source ? rugosa_line_get_aging_class_id (self->source) : NULL;
      double rate = self->source ? rugosa_line_get_double (self->source, "aging-rate") : 0.0;

      g_object_set (self->duty, "aging-class-id", klass, "aging-rate", rate, NULL);
    }
  else if (i == 1)
    g_object_set (self->duty, "aging-class-id", NULL, "aging-rate", 0.0, NULL);
  else
    g_object_set (self->duty, "aging-class-id", rg_aging_class_at ((int) i - 2)->id, NULL);
  _rugosa_sizing_window_run (self);
}

/* Drop-downs whose button shows a long choice cut short, and whose list
 * shows it whole. */
static void
_rugosa_sizing_window_label_setup (GtkSignalListItemFactory *factory,
                                   GtkListItem              *item,
                                   gpointer                  button)
{
  GtkWidget *label = gtk_label_new (NULL);

  gtk_label_set_xalign (GTK_LABEL (label), 0);
  if (button != NULL)
    {
      gtk_label_set_ellipsize (GTK_LABEL (label), PANGO_ELLIPSIZE_END);
      gtk_label_set_max_width_chars (GTK_LABEL (label), 22);
      gtk_label_set_width_chars (GTK_LABEL (label), 12);
    }
  else
    {
      gtk_label_set_wrap (GTK_LABEL (label), TRUE);
      gtk_label_set_max_width_chars (GTK_LABEL (label), 40);
    }
  gtk_list_item_set_child (item, label);
}

static void
_rugosa_sizing_window_label_bind (GtkSignalListItemFactory *factory,
                                  GtkListItem              *item,
                                  gpointer                  unused)
{
  GtkWidget *label = gtk_list_item_get_child (item);
  const char *text = gtk_string_object_get_string (gtk_list_item_get_item (item));

  gtk_label_set_text (GTK_LABEL (label), text);
  gtk_widget_set_tooltip_text (label, text);
}

static void
_rugosa_sizing_window_compact (GtkDropDown *dropdown)
{
  GtkListItemFactory *button = gtk_signal_list_item_factory_new ();
  GtkListItemFactory *list = gtk_signal_list_item_factory_new ();

  g_signal_connect (button, "setup", G_CALLBACK (_rugosa_sizing_window_label_setup), GINT_TO_POINTER (1));
  g_signal_connect (button, "bind", G_CALLBACK (_rugosa_sizing_window_label_bind), NULL);
  g_signal_connect (list, "setup", G_CALLBACK (_rugosa_sizing_window_label_setup), NULL);
  g_signal_connect (list, "bind", G_CALLBACK (_rugosa_sizing_window_label_bind), NULL);
  gtk_drop_down_set_factory (dropdown, button);
  gtk_drop_down_set_list_factory (dropdown, list);
  g_object_unref (button);
  g_object_unref (list);
}

static void
_rugosa_sizing_window_fill_dropdowns (RugosaSizingWindow *self)
{
  g_autoptr (GtkStringList) materials = gtk_string_list_new (NULL);
  g_autoptr (GtkStringList) agings = gtk_string_list_new (NULL);

  /* the materials some pipe catalog is made of */
  for (int m = 0; m < rg_material_count (); m++)
    for (int c = 0; c < rg_pipe_catalog_count (); c++)
      if (rg_pipe_catalog_fits (rg_pipe_catalog_at (c), rg_material_at (m)->id))
        {
          g_ptr_array_add (self->material_ids, (gpointer) rg_material_at (m)->id);
          gtk_string_list_append (materials, _(rg_material_at (m)->name));
          break;
        }
  gtk_string_list_append (agings, _("As the line option"));
  gtk_string_list_append (agings, _("No roughness growth"));
  for (int i = 0; i < rg_aging_class_count (); i++)
    gtk_string_list_append (agings, _(rg_aging_class_at (i)->name));
  _rugosa_sizing_window_compact (self->material_dropdown);
  _rugosa_sizing_window_compact (self->catalog_dropdown);
  _rugosa_sizing_window_compact (self->aging_dropdown);
  self->updating = TRUE;
  gtk_drop_down_set_model (self->material_dropdown, G_LIST_MODEL (materials));
  gtk_drop_down_set_model (self->aging_dropdown, G_LIST_MODEL (agings));
  self->updating = FALSE;
}

/* ---- the duty ---- */

static void
_rugosa_sizing_window_take_duty (RugosaSizingWindow *self,
                                 RugosaLine         *line)
{
  const char *material = line ? rugosa_line_get_material_id (line) : NULL;
  const RgPipe *pipe = NULL;
  guint pick = 0;

  g_clear_object (&self->duty);
  g_set_object (&self->source, line);
  self->duty = line ? rugosa_line_duplicate (line) : rugosa_line_new ("");
  /* a line without a catalog material: that of its catalog pipe */
  if (material == NULL && line != NULL && rugosa_line_get_pipe_designation (line) != NULL
      && rg_pipe_lookup (rugosa_line_get_pipe_designation (line), &pipe, NULL) == RG_OK)
    material = pipe->material_id;
  for (guint i = 0; i < self->material_ids->len; i++)
    if (g_strcmp0 (g_ptr_array_index (self->material_ids, i), material) == 0)
      pick = i;
  {
    g_autofree char *subtitle = line ? g_strdup_printf (_("The duty of “%s”"), rugosa_line_get_name (line)) : NULL;

    adw_window_title_set_subtitle (self->window_title, subtitle ? subtitle : "");
    /* TRANSLATORS: %s is a line option's name */
    subtitle = line ? g_strdup_printf (_("The fluid and the fittings are those of “%s”; the values below apply to the sizes only."),
                                       rugosa_line_get_name (line)) : NULL;
    adw_preferences_group_set_description (self->duty_group, subtitle);
  }
  self->updating = TRUE;
  gtk_drop_down_set_selected (self->material_dropdown, pick);
  gtk_drop_down_set_selected (self->aging_dropdown, 0);
  self->updating = FALSE;
  _rugosa_sizing_window_fill_catalogs (self);
  g_hash_table_remove_all (self->chosen);
  self->user_chose = FALSE;
  _rugosa_sizing_window_show_values (self);
  _rugosa_sizing_window_run (self);
}

/* ---- the document ---- */

static void
_rugosa_sizing_window_settings_changed (RugosaSizingWindow *self)
{
  if (self->updating)
    return;
  _rugosa_sizing_window_show_values (self);
  _rugosa_sizing_window_run (self);
}

static void
_rugosa_sizing_window_main_gone (RugosaSizingWindow *self)
{
  self->main_window = NULL;
  self->project = NULL;
}

/* ---- public ---- */

RugosaSizingWindow *
rugosa_sizing_window_present (RugosaWindow *window)
{
  RugosaSizingWindow *self;
  GtkSingleSelection *selection;
  RugosaLine *line = NULL;

  g_return_val_if_fail (RUGOSA_IS_WINDOW (window), NULL);

  self = g_object_get_data (G_OBJECT (window), DATA_KEY);
  if (self == NULL)
    {
      self = g_object_new (RUGOSA_TYPE_SIZING_WINDOW,
                           "application", gtk_window_get_application (GTK_WINDOW (window)), NULL);
      self->main_window = window;
      self->project = rugosa_window_get_project (window);
      g_object_set_data (G_OBJECT (window), DATA_KEY, self);
      /* Let go of the main window before it goes: connected before the
       * transient-for link, whose handler then destroys the assistant. */
      g_signal_connect_object (window, "destroy", G_CALLBACK (_rugosa_sizing_window_main_gone),
                               self, G_CONNECT_SWAPPED);
      gtk_window_set_transient_for (GTK_WINDOW (self), GTK_WINDOW (window));
      g_signal_connect_object (rugosa_project_get_settings (self->project), "notify",
                               G_CALLBACK (_rugosa_sizing_window_settings_changed), self,
                               G_CONNECT_SWAPPED);
    }
  selection = rugosa_window_get_selection (window);
  line = gtk_single_selection_get_selected_item (selection);
  _rugosa_sizing_window_take_duty (self, line);
  gtk_window_present (GTK_WINDOW (self));
  return self;
}

const RugosaSizing *
rugosa_sizing_window_get_sizing (RugosaSizingWindow *self)
{
  g_return_val_if_fail (RUGOSA_IS_SIZING_WINDOW (self), NULL);
  return self->sizing;
}

gboolean
rugosa_sizing_window_get_chosen (RugosaSizingWindow *self,
                                 guint               index)
{
  g_return_val_if_fail (RUGOSA_IS_SIZING_WINDOW (self), FALSE);
  if (self->sizing == NULL || index >= self->sizing->n_candidates)
    return FALSE;
  return g_hash_table_contains (self->chosen, self->sizing->candidates[index].pipe->designation);
}

GtkWidget *
rugosa_sizing_window_get_entry (RugosaSizingWindow *self,
                                const char         *property)
{
  g_return_val_if_fail (RUGOSA_IS_SIZING_WINDOW (self), NULL);
  return g_hash_table_lookup (self->entries, property);
}

const char *
rugosa_sizing_window_get_summary (RugosaSizingWindow *self)
{
  g_return_val_if_fail (RUGOSA_IS_SIZING_WINDOW (self), NULL);
  return gtk_label_get_text (self->summary_label);
}

const char *
rugosa_sizing_window_get_inverse (RugosaSizingWindow *self)
{
  g_return_val_if_fail (RUGOSA_IS_SIZING_WINDOW (self), NULL);
  return gtk_label_get_text (self->inverse_label);
}

/* ---- the main window's action ---- */

static void
_rugosa_window_size_pipe (GtkWidget  *widget,
                          const char *action_name,
                          GVariant   *param)
{
  rugosa_sizing_window_present (RUGOSA_WINDOW (widget));
}

void
_rugosa_window_sizing_class_init (GtkWidgetClass *widget_class)
{
  gtk_widget_class_install_action (widget_class, "win.size-pipe", NULL, _rugosa_window_size_pipe);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_k, GDK_CONTROL_MASK, "win.size-pipe", NULL);
}

/* ---- object ---- */

static void
rugosa_sizing_window_dispose (GObject *object)
{
  RugosaSizingWindow *self = RUGOSA_SIZING_WINDOW (object);

  if (self->main_window != NULL)
    {
      /* the ladder leaves the chart with the assistant */
      if (g_object_get_data (G_OBJECT (self->main_window), DATA_KEY) == self)
        {
          g_object_set_data (G_OBJECT (self->main_window), DATA_KEY, NULL);
          rugosa_canvas_set_ladder (RUGOSA_CANVAS (rugosa_window_get_canvas (self->main_window)),
                                    NULL, 0, NULL, NULL);
        }
      self->main_window = NULL;
    }
  g_clear_object (&self->duty);
  g_clear_object (&self->source);
  gtk_widget_dispose_template (GTK_WIDGET (self), RUGOSA_TYPE_SIZING_WINDOW);
  G_OBJECT_CLASS (rugosa_sizing_window_parent_class)->dispose (object);
}

static void
rugosa_sizing_window_finalize (GObject *object)
{
  RugosaSizingWindow *self = RUGOSA_SIZING_WINDOW (object);

  g_clear_pointer (&self->sizing, rugosa_sizing_free);
  g_clear_object (&self->rows);
  g_clear_pointer (&self->chosen, g_hash_table_unref);
  g_clear_pointer (&self->entries, g_hash_table_unref);
  g_clear_pointer (&self->material_ids, g_ptr_array_unref);
  g_clear_pointer (&self->catalogs, g_ptr_array_unref);
  g_free (self->error);
  G_OBJECT_CLASS (rugosa_sizing_window_parent_class)->finalize (object);
}

static void
rugosa_sizing_window_class_init (RugosaSizingWindowClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = rugosa_sizing_window_dispose;
  object_class->finalize = rugosa_sizing_window_finalize;

  gtk_widget_class_set_template_from_resource (widget_class, "/org/rugosa/Rugosa/rugosa-sizing-window.ui");
#define BIND(name) gtk_widget_class_bind_template_child (widget_class, RugosaSizingWindow, name)
  BIND (window_title);
  BIND (add_button);
  BIND (duty_group);
  BIND (pipe_group);
  BIND (limits_group);
  BIND (material_row);
  BIND (aging_row);
  BIND (material_dropdown);
  BIND (catalog_dropdown);
  BIND (aging_dropdown);
  BIND (summary_label);
  BIND (inverse_label);
  BIND (view);
#undef BIND
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_sizing_window_add_clicked);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_sizing_window_material_changed);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_sizing_window_catalog_changed);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_sizing_window_aging_changed);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_Escape, 0, "window.close", NULL);
}

static void
rugosa_sizing_window_init (RugosaSizingWindow *self)
{
  self->rows = gtk_string_list_new (NULL);
  self->chosen = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, NULL);
  self->entries = g_hash_table_new (g_str_hash, g_str_equal);
  self->material_ids = g_ptr_array_new ();
  self->catalogs = g_ptr_array_new ();
  gtk_widget_init_template (GTK_WIDGET (self));

  _rugosa_sizing_window_results_init (self);
  _rugosa_sizing_window_build_form (self);
  _rugosa_sizing_window_fill_dropdowns (self);
}
