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
 * results and the ladder on the main window's chart. */
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
#include "rugosa-sizing-window.h"

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

G_DEFINE_FINAL_TYPE (RugosaSizingWindow, rugosa_sizing_window, ADW_TYPE_WINDOW)

static const char *const DATA_KEY = "rugosa-sizing-window";

static void _rugosa_sizing_window_run (RugosaSizingWindow *self);
static void _rugosa_sizing_window_update_ladder (RugosaSizingWindow *self);

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

static RugosaSettings *
_settings (RugosaSizingWindow *self)
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
      return rugosa_settings_get_double (_settings (self), form_rows[i].property);
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

      rugosa_quantity_entry_set_unit (entry, rugosa_settings_get_unit (_settings (self), row->display));
      if (rugosa_quantity_entry_get_error_text (entry) == NULL)
        rugosa_quantity_entry_set_value (entry, _rugosa_sizing_window_value (self, i) * row->to_si);
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
  const RugosaField *row = _row_of (form_rows[i].property);

  self->updating = TRUE;
  rugosa_quantity_entry_set_value (entry, _rugosa_sizing_window_value (self, i) * row->to_si);
  self->updating = FALSE;
  rugosa_quantity_entry_set_error (entry, why);
}

static void
_rugosa_sizing_window_committed (RugosaQuantityEntry *entry,
                                 double               si,
                                 RugosaSizingWindow  *self)
{
  const char *property = gtk_widget_get_name (GTK_WIDGET (entry));
  const RugosaField *row = _row_of (property);
  const char *unit = rugosa_quantity_entry_get_unit (entry);
  double v = si / row->to_si;
  RgError err = { 0 };
  guint i;

  if (self->updating)
    return;
  for (i = 0; i < G_N_ELEMENTS (form_rows); i++)
    if (g_str_equal (form_rows[i].property, property))
      break;
  if (!rugosa_field_in_range (row, v, unit, &err))
    {
      _rugosa_sizing_window_refuse (self, entry, i, err.text);
      return;
    }
  /* The highest flow, when given, is at least the design flow (the
   * project file keeps them in order). */
  if (g_str_has_prefix (property, "flow-"))
    {
      double design = g_str_equal (property, "flow-design") ? v : rugosa_line_get_double (self->duty, "flow-design");
      double high = g_str_equal (property, "flow-maximum") ? v : rugosa_line_get_double (self->duty, "flow-maximum");

      if (high > 0.0 && high < design)
        {
          g_autofree char *shown = rugosa_display_format_screen (RG_QTY_FLOW, design,
                                                                 rugosa_settings_get_unit (_settings (self), RUGOSA_DISPLAY_FLOW));
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
      rugosa_history_set (rugosa_window_get_history (self->main_window), _settings (self),
                          property, v, NULL);
      rugosa_history_break_merge (rugosa_window_get_history (self->main_window));
      return;
    case TARGET_VIEW:
      g_object_set (_settings (self), property, v, NULL);
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
      const RugosaDisplayInfo *info = rugosa_display_info (row->display);
      GtkWidget *entry = rugosa_quantity_entry_new (info->quantity);
      GtkWidget *arow = adw_action_row_new ();

      gtk_widget_set_name (entry, row->property);
      gtk_widget_set_valign (entry, GTK_ALIGN_CENTER);
      g_signal_connect (entry, "committed", G_CALLBACK (_rugosa_sizing_window_committed), self);
      adw_preferences_row_set_title (ADW_PREFERENCES_ROW (arow), rugosa_field_label (row));
      gtk_widget_set_tooltip_text (arow, _(row->help));
      adw_action_row_add_suffix (ADW_ACTION_ROW (arow), entry);
      adw_action_row_set_activatable_widget (ADW_ACTION_ROW (arow), entry);
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

static const char *
_rugosa_sizing_window_material (RugosaSizingWindow *self)
{
  guint i = gtk_drop_down_get_selected (self->material_dropdown);

  return i < self->material_ids->len ? g_ptr_array_index (self->material_ids, i) : NULL;
}

static const char *
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

/* ---- results ---- */

static char *
_rugosa_sizing_window_number (RugosaSizingWindow    *self,
                              RugosaDisplayQuantity  dq,
                              double                 si)
{
  const RugosaDisplayInfo *info = rugosa_display_info (dq);

  return rugosa_display_number_screen (info->quantity, si, rugosa_settings_get_unit (_settings (self), dq));
}

static char *
_rugosa_sizing_window_format (RugosaSizingWindow    *self,
                              RugosaDisplayQuantity  dq,
                              double                 si)
{
  const RugosaDisplayInfo *info = rugosa_display_info (dq);

  return rugosa_display_format_screen (info->quantity, si, rugosa_settings_get_unit (_settings (self), dq));
}

static char *
_limit_labels (guint broken)
{
  GString *s = g_string_new (NULL);

  for (guint b = 0; b < RUGOSA_N_LIMITS; b++)
    if (broken & (1u << b))
      {
        if (s->len > 0)
          g_string_append (s, _(", "));
        g_string_append (s, rugosa_field_label (rugosa_limit_field ((RugosaLimit) (1u << b))));
      }
  return g_string_free (s, FALSE);
}

/* The verdict of candidate i, and its style class. */
static char *
_rugosa_sizing_window_verdict (RugosaSizingWindow *self,
                               guint               i,
                               const char        **style)
{
  const RugosaSizingCandidate *c = &self->sizing->candidates[i];
  const RugosaOperatingPoint *p = &c->results.points[RUGOSA_FLOW_DESIGN];
  g_autofree char *labels = NULL;

  if (!c->results.ok || !p->ok)
    {
      *style = "error";
      return g_strdup (c->results.ok ? p->error : c->results.error);
    }
  if ((int) i == self->sizing->recommended)
    {
      *style = "accent";
      return g_strdup (_("Recommended"));
    }
  if (c->passes)
    {
      *style = "success";
      return g_strdup (_("Passes"));
    }
  if (c->broken_new != 0)
    {
      *style = "error";
      labels = _limit_labels (c->broken_new | c->broken_aged);
      /* TRANSLATORS: the limits a size breaks, by their names */
      return g_strdup_printf (_("Breaks: %s"), labels);
    }
  *style = "warning";
  labels = _limit_labels (c->broken_aged);
  return g_strdup_printf (_("Breaks when aged: %s"), labels);
}

/* The verdict comes right after the size: it is what is read first. */
typedef enum {
  COL_CHOOSE, COL_SIZE, COL_VERDICT, COL_BORE, COL_VELOCITY, COL_GRADIENT, COL_LOSS, N_COLS
} Column;

/* The columns: their titles when the service age is 0, and when it is
 * not (a value new → at the age). */
static const struct {
  const char *title;            /* translatable */
  const char *title_aged;       /* translatable, or NULL: the same */
  RugosaDisplayQuantity dq;     /* for the unit in the title */
} columns[N_COLS] = {
  [COL_CHOOSE] = { N_("Add"), NULL, RUGOSA_DISPLAY_NUMBER },
  [COL_SIZE] = { N_("Size"), NULL, RUGOSA_DISPLAY_NUMBER },
  [COL_BORE] = { N_("Bore"), NULL, RUGOSA_DISPLAY_DIAMETER },
  [COL_VELOCITY] = { N_("Velocity"), NULL, RUGOSA_DISPLAY_VELOCITY },
  [COL_GRADIENT] = { N_("Gradient"), N_("Gradient new → aged"), RUGOSA_DISPLAY_GRADIENT },
  [COL_LOSS] = { N_("Head loss"), N_("Head loss new → aged"), RUGOSA_DISPLAY_HEAD },
  [COL_VERDICT] = { N_("Verdict"), NULL, RUGOSA_DISPLAY_NUMBER },
};

static int
_rugosa_sizing_window_index_of (RugosaSizingWindow *self,
                                const char         *designation)
{
  for (guint i = 0; self->sizing != NULL && i < self->sizing->n_candidates; i++)
    if (g_str_equal (self->sizing->candidates[i].pipe->designation, designation))
      return (int) i;
  return -1;
}

static void
_rugosa_sizing_window_update_add (RugosaSizingWindow *self)
{
  guint n = 0;
  g_autofree char *label = NULL;

  for (guint i = 0; self->sizing != NULL && i < self->sizing->n_candidates; i++)
    n += g_hash_table_contains (self->chosen, self->sizing->candidates[i].pipe->designation);
  if (n == 0)
    label = g_strdup (_("Add as Line Options"));
  else
    label = g_strdup_printf (g_dngettext (GETTEXT_PACKAGE, "Add %u Size as a Line Option",
                                          "Add %u Sizes as Line Options", n), n);
  gtk_button_set_label (self->add_button, label);
  gtk_widget_set_sensitive (GTK_WIDGET (self->add_button), n > 0);
}

static void
_rugosa_sizing_window_chose (GtkCheckButton     *check,
                             RugosaSizingWindow *self)
{
  const char *designation = g_object_get_data (G_OBJECT (check), "designation");

  if (self->updating || designation == NULL)
    return;
  if (gtk_check_button_get_active (check))
    g_hash_table_add (self->chosen, g_strdup (designation));
  else
    g_hash_table_remove (self->chosen, designation);
  self->user_chose = TRUE;
  _rugosa_sizing_window_update_add (self);
  _rugosa_sizing_window_update_ladder (self);
}

static void
_rugosa_sizing_window_setup_cell (GtkSignalListItemFactory *factory,
                                  GtkListItem              *item,
                                  RugosaSizingWindow       *self)
{
  Column col = GPOINTER_TO_INT (g_object_get_data (G_OBJECT (factory), "column"));
  GtkWidget *w;

  if (col == COL_CHOOSE)
    {
      w = gtk_check_button_new ();
      g_signal_connect (w, "toggled", G_CALLBACK (_rugosa_sizing_window_chose), self);
    }
  else
    {
      w = gtk_label_new (NULL);
      gtk_label_set_xalign (GTK_LABEL (w), col == COL_SIZE || col == COL_VERDICT ? 0.0f : 1.0f);
      if (col == COL_VERDICT)
        {
          gtk_label_set_ellipsize (GTK_LABEL (w), PANGO_ELLIPSIZE_END);
          gtk_label_set_width_chars (GTK_LABEL (w), 20);
          gtk_label_set_max_width_chars (GTK_LABEL (w), 30);
        }
      else if (col != COL_SIZE)
        gtk_widget_add_css_class (w, "numeric");
    }
  gtk_list_item_set_child (item, w);
}

static void
_rugosa_sizing_window_bind_cell (GtkSignalListItemFactory *factory,
                                 GtkListItem              *item,
                                 RugosaSizingWindow       *self)
{
  Column col = GPOINTER_TO_INT (g_object_get_data (G_OBJECT (factory), "column"));
  GtkWidget *w = gtk_list_item_get_child (item);
  const char *designation = gtk_string_object_get_string (gtk_list_item_get_item (item));
  int i = _rugosa_sizing_window_index_of (self, designation);
  const RugosaSizingCandidate *c;
  const RugosaOperatingPoint *p;
  g_autofree char *text = NULL;
  static const char *const styles[] = { "accent", "success", "error", "warning" };

  if (i < 0)
    return;
  c = &self->sizing->candidates[i];
  p = &c->results.points[RUGOSA_FLOW_DESIGN];
  if (col == COL_CHOOSE)
    {
      self->updating = TRUE;
      g_object_set_data_full (G_OBJECT (w), "designation", g_strdup (designation), g_free);
      gtk_check_button_set_active (GTK_CHECK_BUTTON (w), g_hash_table_contains (self->chosen, designation));
      gtk_widget_set_sensitive (w, c->results.ok && p->ok);
      self->updating = FALSE;
      return;
    }
  if (col == COL_SIZE)
    text = g_strdup (c->pipe->designation);
  else if (col == COL_VERDICT)
    {
      const char *style = NULL;

      text = _rugosa_sizing_window_verdict (self, (guint) i, &style);
      for (gsize s = 0; s < G_N_ELEMENTS (styles); s++)
        gtk_widget_remove_css_class (w, styles[s]);
      gtk_widget_add_css_class (w, style);
      gtk_widget_set_tooltip_text (w, text);
    }
  else if (!c->results.ok || !p->ok)
    text = g_strdup ("—");
  else
    {
      const gboolean aged = self->sizing->age_years > 0.0;

      switch (col)
        {
        case COL_BORE:
          text = _rugosa_sizing_window_number (self, RUGOSA_DISPLAY_DIAMETER, c->results.inner_diameter_m);
          break;
        case COL_VELOCITY:
          text = _rugosa_sizing_window_number (self, RUGOSA_DISPLAY_VELOCITY, p->result.velocity_m_s);
          break;
        case COL_GRADIENT:
        case COL_LOSS:
          {
            const RugosaDisplayQuantity dq = col == COL_GRADIENT ? RUGOSA_DISPLAY_GRADIENT : RUGOSA_DISPLAY_HEAD;
            const double v_new = col == COL_GRADIENT ? p->result_new.gradient_m_per_100m : p->result_new.head_loss_total_m;
            const double v_aged = col == COL_GRADIENT ? p->result.gradient_m_per_100m : p->result.head_loss_total_m;
            g_autofree char *a = _rugosa_sizing_window_number (self, dq, v_new);
            g_autofree char *b = aged ? _rugosa_sizing_window_number (self, dq, v_aged) : NULL;

            text = aged ? g_strdup_printf ("%s → %s", a, b) : g_steal_pointer (&a);
          }
          break;
        case COL_CHOOSE:
        case COL_SIZE:
        case COL_VERDICT:
        case N_COLS:
        default:
          break;
        }
    }
  gtk_label_set_text (GTK_LABEL (w), text != NULL ? text : "");
  if (col == COL_SIZE)
    {
      if (i == self->sizing->recommended)
        gtk_widget_add_css_class (w, "heading");
      else
        gtk_widget_remove_css_class (w, "heading");
    }
}

static void
_rugosa_sizing_window_update_titles (RugosaSizingWindow *self)
{
  GListModel *cols = gtk_column_view_get_columns (self->view);
  const gboolean aged = rugosa_settings_get_double (_settings (self), "service-age") > 0.0;

  for (guint i = 0; i < g_list_model_get_n_items (cols); i++)
    {
      g_autoptr (GtkColumnViewColumn) c = g_list_model_get_item (cols, i);
      const char *unit = rugosa_settings_get_unit (_settings (self), columns[i].dq);
      const char *name = _(aged && columns[i].title_aged ? columns[i].title_aged : columns[i].title);
      g_autofree char *title = unit ? g_strdup_printf ("%s (%s)", name, rugosa_display_unit_symbol (unit))
                                    : g_strdup (name);

      gtk_column_view_column_set_title (c, title);
    }
}

/* The ladder on the main window's chart, at the age shown. */
static void
_rugosa_sizing_window_update_ladder (RugosaSizingWindow *self)
{
  RugosaCanvas *canvas = RUGOSA_CANVAS (rugosa_window_get_canvas (self->main_window));
  g_autofree RugosaChartRung *rungs = NULL;
  g_autofree gboolean *chosen = NULL;
  g_autoptr (GPtrArray) tips = g_ptr_array_new_with_free_func (g_free);
  RugosaChartRgba colour = { 0.2, 0.4, 0.6, 1.0 };
  GdkRGBA rgba;
  size_t n = 0;

  if (self->sizing == NULL)
    {
      rugosa_canvas_set_ladder (canvas, NULL, 0, NULL, NULL);
      return;
    }
  chosen = g_new0 (gboolean, MAX (self->sizing->n_candidates, 1));
  for (guint i = 0; i < self->sizing->n_candidates; i++)
    chosen[i] = g_hash_table_contains (self->chosen, self->sizing->candidates[i].pipe->designation);
  rungs = rugosa_chart_ladder_from_sizing (self->sizing, TRUE, chosen, &n);
  for (size_t r = 0; r < n; r++)
    {
      int i = _rugosa_sizing_window_index_of (self, rungs[r].label);
      const RugosaOperatingPoint *p = &self->sizing->candidates[i].results.points[RUGOSA_FLOW_DESIGN];
      const char *style = NULL;
      g_autofree char *v = _rugosa_sizing_window_format (self, RUGOSA_DISPLAY_VELOCITY, p->result.velocity_m_s);
      g_autofree char *h = _rugosa_sizing_window_format (self, RUGOSA_DISPLAY_HEAD, p->result.head_loss_total_m);
      g_autofree char *verdict = _rugosa_sizing_window_verdict (self, (guint) i, &style);

      /* TRANSLATORS: a size on the chart's ladder: designation, velocity,
       * total head loss at the service age, then its verdict */
      g_ptr_array_add (tips, g_strdup_printf (_("%s: %s, total head loss %s\n%s"), rungs[r].label, v, h, verdict));
    }
  g_ptr_array_add (tips, NULL);
  if (self->source != NULL && gdk_rgba_parse (&rgba, rugosa_line_get_colour (self->source)))
    {
      colour.r = rgba.red;
      colour.g = rgba.green;
      colour.b = rgba.blue;
    }
  rugosa_canvas_set_ladder (canvas, rungs, n, &colour, (const char *const *) tips->pdata);
}

static void
_rugosa_sizing_window_update_texts (RugosaSizingWindow *self)
{
  g_autofree char *summary = NULL;
  g_autoptr (GString) inverse = g_string_new (NULL);
  const double age = rugosa_settings_get_double (_settings (self), "service-age");
  g_autofree char *age_text = _rugosa_sizing_window_format (self, RUGOSA_DISPLAY_AGE,
                                                            age * rugosa_field_find ("service-age")->to_si);

  gtk_widget_remove_css_class (GTK_WIDGET (self->summary_label), "error");
  if (self->sizing == NULL)
    {
      summary = g_strdup (self->error != NULL ? self->error : "");
      gtk_widget_add_css_class (GTK_WIDGET (self->summary_label), "error");
    }
  else if (self->sizing->recommended >= 0)
    {
      const RugosaSizingCandidate *c = &self->sizing->candidates[self->sizing->recommended];
      g_autofree char *bore = _rugosa_sizing_window_format (self, RUGOSA_DISPLAY_DIAMETER, c->results.inner_diameter_m);

      if (self->sizing->recommended_new != self->sizing->recommended && age > 0.0)
        summary = g_strdup_printf (_("Recommended: %s (bore %s), the smallest size within every limit, new and at a service age of %s; new, %s would do."),
                                   c->pipe->designation, bore, age_text,
                                   self->sizing->candidates[self->sizing->recommended_new].pipe->designation);
      else if (age > 0.0)
        summary = g_strdup_printf (_("Recommended: %s (bore %s), the smallest size within every limit, new and at a service age of %s."),
                                   c->pipe->designation, bore, age_text);
      else
        summary = g_strdup_printf (_("Recommended: %s (bore %s), the smallest size within every limit."),
                                   c->pipe->designation, bore);
    }
  else
    {
      summary = g_strdup (self->sizing->why_none != NULL ? self->sizing->why_none : "");
      gtk_widget_add_css_class (GTK_WIDGET (self->summary_label), "error");
    }
  gtk_label_set_text (self->summary_label, summary);

  /* The inverse problems: the smallest bore within the upper limits, and
   * the line option's flow at the head loss allowed. */
  if (self->sizing != NULL)
    {
      const char *material = _rugosa_sizing_window_material (self);
      g_autoptr (RugosaLine) trial = rugosa_line_duplicate (self->duty);
      RugosaLimits limits = self->sizing->limits;
      double d = 0.0, q = 0.0;
      RgError err = { 0 };

      g_object_set (trial, "material-id", material, NULL);
      if (rugosa_solve_diameter (self->project, trial, age, &limits, &d, &err))
        {
          g_autofree char *bore = _rugosa_sizing_window_format (self, RUGOSA_DISPLAY_DIAMETER, d);
          g_autofree char *t = g_strdup_printf (_("The smallest bore within the upper limits is %s."), bore);
          g_string_append (inverse, t);
        }
      else
        g_string_append (inverse, err.text);
      if (self->source != NULL && self->head_loss_max > 0.0
          && rugosa_project_find_line (self->project, self->source) >= 0)
        {
          rg_error_clear (&err);
          if (rugosa_solve_flow (self->project, self->source, age, self->head_loss_max, &q, &err))
            {
              g_autofree char *flow = _rugosa_sizing_window_format (self, RUGOSA_DISPLAY_FLOW, q);
              g_autofree char *head = _rugosa_sizing_window_format (self, RUGOSA_DISPLAY_HEAD, self->head_loss_max);
              /* TRANSLATORS: a line option's name, a flow, a head loss */
              g_autofree char *t = g_strdup_printf (_("“%s” with its own pipe carries %s at a total head loss of %s."),
                                                    rugosa_line_get_name (self->source), flow, head);
              g_string_append_printf (inverse, "\n%s", t);
            }
          else
            g_string_append_printf (inverse, "\n%s", err.text);
        }
    }
  gtk_label_set_text (self->inverse_label, inverse->str);
  gtk_widget_set_visible (GTK_WIDGET (self->inverse_label), inverse->len > 0);
}

static void
_rugosa_sizing_window_run (RugosaSizingWindow *self)
{
  RugosaLimits limits;
  RgError err = { 0 };
  g_autoptr (GPtrArray) designations = g_ptr_array_new ();
  int scroll_to = -1;

  if (self->project == NULL || self->duty == NULL)
    return;
  rugosa_limits_from_settings (&limits, _settings (self));
  limits.head_loss_max = self->head_loss_max;
  g_clear_pointer (&self->sizing, rugosa_sizing_free);
  g_clear_pointer (&self->error, g_free);
  self->sizing = rugosa_sizing_run (self->project, self->duty, _rugosa_sizing_window_material (self),
                                    _rugosa_sizing_window_catalog (self), &limits, -1.0, &err);
  if (self->sizing == NULL)
    self->error = g_strdup (err.text);

  /* Until the user chooses, the recommendation is chosen. */
  if (!self->user_chose)
    {
      g_hash_table_remove_all (self->chosen);
      if (self->sizing != NULL && self->sizing->recommended >= 0)
        g_hash_table_add (self->chosen, g_strdup (self->sizing->candidates[self->sizing->recommended].pipe->designation));
    }
  for (guint i = 0; self->sizing != NULL && i < self->sizing->n_candidates; i++)
    g_ptr_array_add (designations, (gpointer) self->sizing->candidates[i].pipe->designation);
  g_ptr_array_add (designations, NULL);
  gtk_string_list_splice (self->rows, 0, g_list_model_get_n_items (G_LIST_MODEL (self->rows)),
                          (const char *const *) designations->pdata);
  _rugosa_sizing_window_update_titles (self);
  _rugosa_sizing_window_update_texts (self);
  _rugosa_sizing_window_update_add (self);
  _rugosa_sizing_window_update_ladder (self);

  /* The recommended size in view. */
  if (self->sizing != NULL)
    scroll_to = self->sizing->recommended >= 0 ? self->sizing->recommended : 0;
  if (scroll_to >= 0)
    {
      GtkWidget *list = gtk_widget_get_first_child (GTK_WIDGET (self->view));

      while (list != NULL && !GTK_IS_LIST_VIEW (list))
        list = gtk_widget_get_next_sibling (list);
      if (list != NULL)
        gtk_widget_activate_action (list, "list.scroll-to-item", "u", (guint) MAX (scroll_to - 3, 0));
    }
}

/* ---- adding the sizes ---- */

static void
_rugosa_sizing_window_add_clicked (GtkButton          *button,
                                   RugosaSizingWindow *self)
{
  RugosaHistory *history = rugosa_window_get_history (self->main_window);
  const char *material = _rugosa_sizing_window_material (self);
  guint first = rugosa_project_get_n_lines (self->project);
  guint added = 0;

  if (self->sizing == NULL)
    return;
  rugosa_history_begin_group (history, _("Add sizes"));
  for (guint i = 0; i < self->sizing->n_candidates; i++)
    {
      const RgPipe *pipe = self->sizing->candidates[i].pipe;
      g_autoptr (RugosaLine) line = NULL;
      guint n;

      if (!g_hash_table_contains (self->chosen, pipe->designation))
        continue;
      n = rugosa_project_get_n_lines (self->project);
      line = rugosa_line_duplicate (self->duty);
      g_object_set (line, "name", pipe->designation, "colour", rugosa_window_palette_colour (n),
                    "material-id", material, "pipe-designation", pipe->designation, NULL);
      rugosa_history_add_line (history, n, line);
      added++;
    }
  rugosa_history_end_group (history);
  if (added > 0)
    gtk_single_selection_set_selected (rugosa_window_get_selection (self->main_window), first);
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
  GtkNoSelection *selection;

  self->rows = gtk_string_list_new (NULL);
  self->chosen = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, NULL);
  self->entries = g_hash_table_new (g_str_hash, g_str_equal);
  self->material_ids = g_ptr_array_new ();
  self->catalogs = g_ptr_array_new ();
  gtk_widget_init_template (GTK_WIDGET (self));

  for (int c = 0; c < N_COLS; c++)
    {
      GtkListItemFactory *factory = gtk_signal_list_item_factory_new ();
      GtkColumnViewColumn *column;

      g_object_set_data (G_OBJECT (factory), "column", GINT_TO_POINTER (c));
      g_signal_connect (factory, "setup", G_CALLBACK (_rugosa_sizing_window_setup_cell), self);
      g_signal_connect (factory, "bind", G_CALLBACK (_rugosa_sizing_window_bind_cell), self);
      column = gtk_column_view_column_new (_(columns[c].title), factory);
      gtk_column_view_column_set_resizable (column, TRUE);
      if (c == COL_LOSS)
        gtk_column_view_column_set_expand (column, TRUE);
      gtk_column_view_append_column (self->view, column);
      g_object_unref (column);
    }
  selection = gtk_no_selection_new (G_LIST_MODEL (g_object_ref (self->rows)));
  gtk_column_view_set_model (self->view, GTK_SELECTION_MODEL (selection));
  g_object_unref (selection);

  _rugosa_sizing_window_build_form (self);
  _rugosa_sizing_window_fill_dropdowns (self);
}
