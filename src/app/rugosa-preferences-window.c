/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-preferences"

#include "config.h"

#include <glib/gi18n.h>

#include "rugosa-preferences-window.h"
#include "rugosa-spin-guard.h"

struct _RugosaPreferencesWindow
{
  AdwPreferencesWindow parent_instance;

  /* template widgets */
  AdwPreferencesGroup *units_group;
  AdwComboRow         *unit_system_row;
  AdwComboRow         *friction_model_row;
  GtkSpinButton       *laminar_spin;
  GtkSpinButton       *turbulent_spin;
  GtkSpinButton       *velocity_limit_spin;
  GtkSpinButton       *gradient_limit_spin;
  GtkSpinButton       *age_max_spin;
  AdwComboRow         *color_scheme_row;

  /* owned references */
  GSettings *settings;
  GPtrArray *unit_rows;  /* AdwComboRow, in unit_keys order */
  gboolean   applying_system;
  double     good_laminar, good_turbulent;  /* the last pair in order */
  GtkSpinButton *refused_spin;              /* to put back, or NULL */
};

G_DEFINE_FINAL_TYPE (RugosaPreferencesWindow, rugosa_preferences_window, ADW_TYPE_PREFERENCES_WINDOW)

typedef struct {
  const char *key;
  const char *title;
  const char *si;
  const char *us;
} UnitKey;

/* The usual unit of each quantity in each system. */
static const UnitKey unit_keys[] = {
  { "unit-flow",        N_("Flow"),               "L/s",    "gpm" },
  { "unit-length",      N_("Line length, elevation"), "m",  "ft" },
  { "unit-diameter",    N_("Inner diameter"),     "mm",     "in" },
  { "unit-roughness",   N_("Wall roughness ε"),   "mm",     "in" },
  { "unit-temperature", N_("Temperature"),        "C",      "F" },
  { "unit-pressure",    N_("Pressure, pressure drop"), "kPa", "psi" },
  { "unit-head",        N_("Head loss"),          "m",      "ft" },
  { "unit-velocity",    N_("Mean velocity"),      "m/s",    "ft/s" },
  { "unit-density",     N_("Density"),            "kg/m3",  "lb/ft3" },
  { "unit-dynamic-viscosity",   N_("Dynamic viscosity"),  "mPa.s",  "cP" },
  { "unit-gradient",    N_("Hydraulic gradient"), "m/100m", "ft/100ft" },
};

static const char *system_nicks[] = { "si", "us-customary", "mixed", NULL };
static const char *model_nicks[] = { "colebrook", "haaland", "swamee-jain", "churchill", NULL };
static const char *scheme_nicks[] = { "follow-system", "light", "dark", NULL };

void
rugosa_preferences_apply_unit_system (GSettings  *settings,
                                      const char *system)
{
  gboolean us;

  if (g_strcmp0 (system, "si") == 0)
    us = FALSE;
  else if (g_strcmp0 (system, "us-customary") == 0)
    us = TRUE;
  else
    return;

  g_settings_delay (settings);
  for (guint i = 0; i < G_N_ELEMENTS (unit_keys); i++)
    g_settings_set_string (settings, unit_keys[i].key,
                           us ? unit_keys[i].us : unit_keys[i].si);
  g_settings_apply (settings);
}

/* GSettings string/enum <-> AdwComboRow:selected over a fixed list. */
static gboolean
_rugosa_prefs_get_index (GValue   *value,
                         GVariant *variant,
                         gpointer  user_data)
{
  const char * const *choices = user_data;
  const char *s = g_variant_get_string (variant, NULL);

  for (guint i = 0; choices[i]; i++)
    if (g_strcmp0 (choices[i], s) == 0)
      {
        g_value_set_uint (value, i);
        return TRUE;
      }
  return FALSE;
}

static GVariant *
_rugosa_prefs_set_index (const GValue       *value,
                         const GVariantType *type,
                         gpointer            user_data)
{
  const char * const *choices = user_data;
  guint i = g_value_get_uint (value);

  if (i >= g_strv_length ((char **) choices))
    return NULL;
  return g_variant_new_string (choices[i]);
}

static char **
_rugosa_prefs_key_choices (GSettings  *settings,
                           const char *key)
{
  g_autoptr (GSettingsSchema) schema = NULL;
  g_autoptr (GSettingsSchemaKey) skey = NULL;
  g_autoptr (GVariant) range = NULL;
  g_autoptr (GVariant) values = NULL;
  const char *kind;

  g_object_get (settings, "settings-schema", &schema, NULL);
  skey = g_settings_schema_get_key (schema, key);
  range = g_settings_schema_key_get_range (skey);
  g_variant_get (range, "(&sv)", &kind, &values);
  return g_variant_dup_strv (values, NULL);
}

static const char *
_rugosa_prefs_unit_title (const char *unit)
{
  /* How the stored spelling reads on screen. */
  static const struct { const char *key, *shown; } pretty[] = {
    { "m3/s", "m³/s" }, { "m3/h", "m³/h" }, { "ft3/min", "ft³/min" },
    { "um", "µm" }, { "C", "°C" }, { "F", "°F" }, { "K", "K" },
    { "kg/m3", "kg/m³" }, { "lb/ft3", "lb/ft³" }, { "mPa.s", "mPa·s" },
    { "Pa.s", "Pa·s" }, { "m/100m", "m per 100 m" }, { "ft/100ft", "ft per 100 ft" },
    { "gpm", "US gal/min" }, { "cfs", "ft³/s" },
  };
  for (guint i = 0; i < G_N_ELEMENTS (pretty); i++)
    if (g_strcmp0 (pretty[i].key, unit) == 0)
      return pretty[i].shown;
  return unit;
}

static void
_rugosa_prefs_unit_changed (GSettings               *settings,
                            const char              *key,
                            RugosaPreferencesWindow *self)
{
  gboolean all_si = TRUE, all_us = TRUE;
  const char *system;

  if (!g_str_has_prefix (key, "unit-") || g_strcmp0 (key, "unit-system") == 0)
    return;
  for (guint i = 0; i < G_N_ELEMENTS (unit_keys); i++)
    {
      g_autofree char *v = g_settings_get_string (settings, unit_keys[i].key);
      all_si &= g_strcmp0 (v, unit_keys[i].si) == 0;
      all_us &= g_strcmp0 (v, unit_keys[i].us) == 0;
    }
  system = all_si ? "si" : all_us ? "us-customary" : "mixed";
  self->applying_system = TRUE;
  g_settings_set_string (settings, "unit-system", system);
  self->applying_system = FALSE;
}

static void
_rugosa_prefs_system_changed (GSettings               *settings,
                              const char              *key,
                              RugosaPreferencesWindow *self)
{
  g_autofree char *system = NULL;

  if (self->applying_system)
    return;
  system = g_settings_get_string (settings, "unit-system");
  rugosa_preferences_apply_unit_system (settings, system);
}

static GtkStringList *
_rugosa_prefs_titles (const char * const *titles)
{
  return gtk_string_list_new (titles);
}

static void
_rugosa_prefs_bind_spin (GSettings     *settings,
                         const char    *key,
                         GtkSpinButton *spin)
{
  g_autoptr (GSettingsSchema) schema = NULL;
  g_autoptr (GSettingsSchemaKey) skey = NULL;
  g_autoptr (GVariant) range = NULL;
  g_autoptr (GVariant) limits = NULL;
  const char *kind;
  double lo, hi;

  g_object_get (settings, "settings-schema", &schema, NULL);
  skey = g_settings_schema_get_key (schema, key);
  range = g_settings_schema_key_get_range (skey);
  g_variant_get (range, "(&sv)", &kind, &limits);
  g_variant_get (limits, "(dd)", &lo, &hi);
  gtk_spin_button_set_range (spin, lo, hi);
  g_settings_bind (settings, key, spin, "value", G_SETTINGS_BIND_DEFAULT);
  gtk_widget_set_tooltip_text (GTK_WIDGET (spin),
                               g_settings_schema_key_get_description (skey));
  rugosa_spin_guard (spin);
}

static gboolean
_rugosa_prefs_limits_put_back (gpointer user_data)
{
  RugosaPreferencesWindow *self = user_data;
  GtkSpinButton *spin = self->refused_spin;

  if (spin == NULL)
    return G_SOURCE_REMOVE;
  self->refused_spin = NULL;
  gtk_spin_button_set_value (spin, spin == self->laminar_spin ? self->good_laminar : self->good_turbulent);
  rugosa_spin_guard_mark (spin, _("The laminar limit must lie below the turbulent limit: the last value is kept."));
  return G_SOURCE_REMOVE;
}

/* The two ranges overlap (2100 to 3000): a laminar limit at or above the
 * turbulent one is put back, with the reason beside the field. */
static void
_rugosa_prefs_limits_changed (GSettings               *settings,
                              const char              *key,
                              RugosaPreferencesWindow *self)
{
  gboolean laminar = g_strcmp0 (key, "re-laminar-max") == 0;
  double lam, turb;

  if (!laminar && g_strcmp0 (key, "re-turbulent-min") != 0)
    return;
  lam = g_settings_get_double (settings, "re-laminar-max");
  turb = g_settings_get_double (settings, "re-turbulent-min");
  if (lam < turb)
    {
      self->good_laminar = lam;
      self->good_turbulent = turb;
      return;
    }
  /* The binding that wrote the key ignores a write-back from inside its
   * own notification: put the value back once it has returned. */
  self->refused_spin = laminar ? self->laminar_spin : self->turbulent_spin;
  g_idle_add_full (G_PRIORITY_DEFAULT, _rugosa_prefs_limits_put_back,
                   g_object_ref (self), g_object_unref);
}

static void
_rugosa_prefs_build_unit_rows (RugosaPreferencesWindow *self)
{
  for (guint i = 0; i < G_N_ELEMENTS (unit_keys); i++)
    {
      char **choices = _rugosa_prefs_key_choices (self->settings, unit_keys[i].key);
      g_autoptr (GtkStringList) titles = gtk_string_list_new (NULL);
      AdwComboRow *row = ADW_COMBO_ROW (adw_combo_row_new ());

      for (guint j = 0; choices[j]; j++)
        gtk_string_list_append (titles, _rugosa_prefs_unit_title (choices[j]));
      adw_preferences_row_set_title (ADW_PREFERENCES_ROW (row), _(unit_keys[i].title));
      adw_combo_row_set_model (row, G_LIST_MODEL (titles));
      /* The row keeps the choices alive for the mapping functions. */
      g_object_set_data_full (G_OBJECT (row), "choices", choices, (GDestroyNotify) g_strfreev);
      g_settings_bind_with_mapping (self->settings, unit_keys[i].key, row, "selected",
                                    G_SETTINGS_BIND_DEFAULT,
                                    _rugosa_prefs_get_index, _rugosa_prefs_set_index,
                                    choices, NULL);
      adw_preferences_group_add (self->units_group, GTK_WIDGET (row));
      g_ptr_array_add (self->unit_rows, row);
    }
}

RugosaPreferencesWindow *
rugosa_preferences_window_new (GSettings *settings)
{
  RugosaPreferencesWindow *self;
  static const char *system_titles[] = { N_("SI (metric)"), N_("US customary"), N_("Chosen one by one"), NULL };
  static const char *model_titles[] = { "Colebrook (1939)", "Haaland (1983)", "Swamee–Jain (1976)", "Churchill (1977)", NULL };
  static const char *scheme_titles[] = { N_("Follow the desktop"), N_("Light"), N_("Dark"), NULL };
  g_autoptr (GtkStringList) systems = NULL;
  g_autoptr (GtkStringList) models = NULL;
  g_autoptr (GtkStringList) schemes = NULL;

  g_return_val_if_fail (G_IS_SETTINGS (settings), NULL);

  self = g_object_new (RUGOSA_TYPE_PREFERENCES_WINDOW, NULL);
  self->settings = g_object_ref (settings);

  systems = gtk_string_list_new (NULL);
  for (guint i = 0; system_titles[i]; i++)
    gtk_string_list_append (systems, _(system_titles[i]));
  schemes = gtk_string_list_new (NULL);
  for (guint i = 0; scheme_titles[i]; i++)
    gtk_string_list_append (schemes, _(scheme_titles[i]));
  models = _rugosa_prefs_titles (model_titles);

  adw_combo_row_set_model (self->unit_system_row, G_LIST_MODEL (systems));
  adw_combo_row_set_model (self->friction_model_row, G_LIST_MODEL (models));
  adw_combo_row_set_model (self->color_scheme_row, G_LIST_MODEL (schemes));

  g_settings_bind_with_mapping (settings, "unit-system", self->unit_system_row, "selected",
                                G_SETTINGS_BIND_DEFAULT, _rugosa_prefs_get_index,
                                _rugosa_prefs_set_index, (gpointer) system_nicks, NULL);
  g_settings_bind_with_mapping (settings, "friction-model", self->friction_model_row, "selected",
                                G_SETTINGS_BIND_DEFAULT, _rugosa_prefs_get_index,
                                _rugosa_prefs_set_index, (gpointer) model_nicks, NULL);
  g_settings_bind_with_mapping (settings, "color-scheme", self->color_scheme_row, "selected",
                                G_SETTINGS_BIND_DEFAULT, _rugosa_prefs_get_index,
                                _rugosa_prefs_set_index, (gpointer) scheme_nicks, NULL);

  _rugosa_prefs_bind_spin (settings, "re-laminar-max", self->laminar_spin);
  _rugosa_prefs_bind_spin (settings, "re-turbulent-min", self->turbulent_spin);
  _rugosa_prefs_bind_spin (settings, "velocity-limit", self->velocity_limit_spin);
  _rugosa_prefs_bind_spin (settings, "gradient-limit", self->gradient_limit_spin);
  _rugosa_prefs_bind_spin (settings, "service-age-max", self->age_max_spin);

  _rugosa_prefs_build_unit_rows (self);

  self->good_laminar = g_settings_get_double (settings, "re-laminar-max");
  self->good_turbulent = g_settings_get_double (settings, "re-turbulent-min");
  if (self->good_laminar >= self->good_turbulent)
    {
      g_autoptr (GVariant) lam = g_settings_get_default_value (settings, "re-laminar-max");
      g_autoptr (GVariant) turb = g_settings_get_default_value (settings, "re-turbulent-min");
      self->good_laminar = g_variant_get_double (lam);
      self->good_turbulent = g_variant_get_double (turb);
    }
  g_signal_connect_object (settings, "changed", G_CALLBACK (_rugosa_prefs_limits_changed), self, 0);

  g_signal_connect_object (settings, "changed", G_CALLBACK (_rugosa_prefs_unit_changed), self, 0);
  g_signal_connect_object (settings, "changed::unit-system", G_CALLBACK (_rugosa_prefs_system_changed), self, 0);

  return self;
}

static void
rugosa_preferences_window_dispose (GObject *object)
{
  RugosaPreferencesWindow *self = RUGOSA_PREFERENCES_WINDOW (object);

  self->refused_spin = NULL;
  gtk_widget_dispose_template (GTK_WIDGET (self), RUGOSA_TYPE_PREFERENCES_WINDOW);
  g_clear_pointer (&self->unit_rows, g_ptr_array_unref);
  g_clear_object (&self->settings);
  G_OBJECT_CLASS (rugosa_preferences_window_parent_class)->dispose (object);
}

static void
rugosa_preferences_window_class_init (RugosaPreferencesWindowClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = rugosa_preferences_window_dispose;

  gtk_widget_class_set_template_from_resource (widget_class, "/org/rugosa/Rugosa/rugosa-preferences-window.ui");
  gtk_widget_class_bind_template_child (widget_class, RugosaPreferencesWindow, units_group);
  gtk_widget_class_bind_template_child (widget_class, RugosaPreferencesWindow, unit_system_row);
  gtk_widget_class_bind_template_child (widget_class, RugosaPreferencesWindow, friction_model_row);
  gtk_widget_class_bind_template_child (widget_class, RugosaPreferencesWindow, laminar_spin);
  gtk_widget_class_bind_template_child (widget_class, RugosaPreferencesWindow, turbulent_spin);
  gtk_widget_class_bind_template_child (widget_class, RugosaPreferencesWindow, velocity_limit_spin);
  gtk_widget_class_bind_template_child (widget_class, RugosaPreferencesWindow, gradient_limit_spin);
  gtk_widget_class_bind_template_child (widget_class, RugosaPreferencesWindow, age_max_spin);
  gtk_widget_class_bind_template_child (widget_class, RugosaPreferencesWindow, color_scheme_row);
}

static void
rugosa_preferences_window_init (RugosaPreferencesWindow *self)
{
  self->unit_rows = g_ptr_array_new ();
  gtk_widget_init_template (GTK_WIDGET (self));
}
