/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-preferences"

#include "config.h"

#include <glib/gi18n.h>

#include "model/rugosa-fields.h"
#include "rugosa-preferences-window.h"
#include "rugosa-seed.h"
#include "rugosa-spin-guard.h"

struct _RugosaPreferencesWindow
{
  AdwPreferencesWindow parent_instance;

  /* template widgets */
  RugosaSettingsPage *seed_page;
  AdwComboRow        *color_scheme_row;
  GtkSpinButton      *age_max_spin;

  /* owned references */
  GSettings      *settings;
  RugosaSettings *seed;     /* what a new project would start with */
  gboolean        storing;  /* the page's edit is being written */
};

G_DEFINE_FINAL_TYPE (RugosaPreferencesWindow, rugosa_preferences_window, ADW_TYPE_PREFERENCES_WINDOW)

static const char *scheme_nicks[] = { "follow-system", "light", "dark", NULL };

/* GSettings enum <-> AdwComboRow:selected over a fixed list. */
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

/* An edit of the page, in range and in order with the other fields:
 * written to the preferences, which the page then follows. */
static void
_rugosa_prefs_apply (RugosaSettingsPage *page,
                     const char         *property,
                     const GValue       *value,
                     gpointer            user_data)
{
  RugosaPreferencesWindow *self = user_data;

  g_object_set_property (G_OBJECT (self->seed), property, value);
  self->storing = TRUE;
  rugosa_seed_store (self->seed, self->settings);
  self->storing = FALSE;
}

/* A key changed elsewhere ("Use these for new projects", another
 * window): the page shows it. */
static void
_rugosa_prefs_changed (GSettings               *settings,
                       const char              *key,
                       RugosaPreferencesWindow *self)
{
  if (!self->storing && rugosa_seed_is_seed_key (key))
    rugosa_seed_settings (settings, self->seed);
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

  /* The range is the schema's, written once there. */
  g_object_get (settings, "settings-schema", &schema, NULL);
  skey = g_settings_schema_get_key (schema, key);
  range = g_settings_schema_key_get_range (skey);
  g_variant_get (range, "(&sv)", &kind, &limits);
  g_variant_get (limits, "(dd)", &lo, &hi);
  gtk_spin_button_set_range (spin, lo, hi);
  g_settings_bind (settings, key, spin, "value", G_SETTINGS_BIND_DEFAULT);
  gtk_widget_set_tooltip_text (GTK_WIDGET (spin), g_settings_schema_key_get_description (skey));
  rugosa_spin_guard (spin);
}

RugosaPreferencesWindow *
rugosa_preferences_window_new (GSettings *settings)
{
  RugosaPreferencesWindow *self;
  static const char *scheme_titles[] = { N_("Follow the desktop"), N_("Light"), N_("Dark"), NULL };
  g_autoptr (GtkStringList) schemes = NULL;

  g_return_val_if_fail (G_IS_SETTINGS (settings), NULL);

  self = g_object_new (RUGOSA_TYPE_PREFERENCES_WINDOW, NULL);
  self->settings = g_object_ref (settings);

  self->seed = rugosa_settings_new ();
  rugosa_seed_settings (settings, self->seed);
  rugosa_settings_page_build (self->seed_page, self->seed, RUGOSA_FIELD_SEEDED, RUGOSA_FIELD_VIEW);
  rugosa_settings_page_set_apply_func (self->seed_page, _rugosa_prefs_apply, self, NULL);
  g_signal_connect_object (settings, "changed", G_CALLBACK (_rugosa_prefs_changed), self, 0);

  schemes = gtk_string_list_new (NULL);
  for (guint i = 0; scheme_titles[i]; i++)
    gtk_string_list_append (schemes, _(scheme_titles[i]));
  adw_combo_row_set_model (self->color_scheme_row, G_LIST_MODEL (schemes));
  g_settings_bind_with_mapping (settings, "color-scheme", self->color_scheme_row, "selected",
                                G_SETTINGS_BIND_DEFAULT, _rugosa_prefs_get_index,
                                _rugosa_prefs_set_index, (gpointer) scheme_nicks, NULL);
  _rugosa_prefs_bind_spin (settings, "service-age-max", self->age_max_spin);
  return self;
}

RugosaSettingsPage *
rugosa_preferences_window_get_seed_page (RugosaPreferencesWindow *self)
{
  g_return_val_if_fail (RUGOSA_IS_PREFERENCES_WINDOW (self), NULL);
  return self->seed_page;
}

static void
rugosa_preferences_window_dispose (GObject *object)
{
  RugosaPreferencesWindow *self = RUGOSA_PREFERENCES_WINDOW (object);

  if (self->seed_page != NULL)
    rugosa_settings_page_set_apply_func (self->seed_page, NULL, NULL, NULL);
  gtk_widget_dispose_template (GTK_WIDGET (self), RUGOSA_TYPE_PREFERENCES_WINDOW);
  g_clear_object (&self->seed);
  g_clear_object (&self->settings);
  G_OBJECT_CLASS (rugosa_preferences_window_parent_class)->dispose (object);
}

static void
rugosa_preferences_window_class_init (RugosaPreferencesWindowClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = rugosa_preferences_window_dispose;

  g_type_ensure (RUGOSA_TYPE_SETTINGS_PAGE);
  gtk_widget_class_set_template_from_resource (widget_class, "/org/rugosa/Rugosa/rugosa-preferences-window.ui");
  gtk_widget_class_bind_template_child (widget_class, RugosaPreferencesWindow, seed_page);
  gtk_widget_class_bind_template_child (widget_class, RugosaPreferencesWindow, color_scheme_row);
  gtk_widget_class_bind_template_child (widget_class, RugosaPreferencesWindow, age_max_spin);
}

static void
rugosa_preferences_window_init (RugosaPreferencesWindow *self)
{
  gtk_widget_init_template (GTK_WIDGET (self));
}
