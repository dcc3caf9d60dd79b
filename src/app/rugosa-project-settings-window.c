/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-project-settings"

#include "config.h"

#include <glib/gi18n.h>

#include "model/rugosa-fields.h"
#include "rugosa-project-settings-window.h"
#include "rugosa-seed.h"

struct _RugosaProjectSettingsWindow
{
  AdwPreferencesWindow parent_instance;

  /* template widgets */
  RugosaSettingsPage  *page;
  AdwPreferencesGroup *seed_group;

  /* owned references */
  RugosaHistory *history;
  GSettings     *prefs;
};

G_DEFINE_FINAL_TYPE (RugosaProjectSettingsWindow, rugosa_project_settings_window, ADW_TYPE_PREFERENCES_WINDOW)

/* An edit the page has checked: one undo step, whose label the history
 * takes from the row's label. */
static void
_rugosa_project_settings_apply (RugosaSettingsPage *page,
                                const char         *property,
                                const GValue       *value,
                                gpointer            user_data)
{
  RugosaProjectSettingsWindow *self = user_data;
  RugosaSettings *settings = rugosa_project_get_settings (rugosa_history_get_project (self->history));

  rugosa_history_set_value (self->history, settings, property, value);
  rugosa_history_break_merge (self->history);
}

static void
_rugosa_project_settings_use_for_new (GtkWidget  *widget,
                                      const char *action_name,
                                      GVariant   *param)
{
  RugosaProjectSettingsWindow *self = RUGOSA_PROJECT_SETTINGS_WINDOW (widget);
  RugosaSettings *settings = rugosa_project_get_settings (rugosa_history_get_project (self->history));

  rugosa_seed_store (settings, self->prefs);
  adw_preferences_window_add_toast (ADW_PREFERENCES_WINDOW (self),
                                    adw_toast_new (_("New projects will start with these settings.")));
}

/* Undo and redo reach the project from here as from its window. */
static void
_rugosa_project_settings_history (GtkWidget  *widget,
                                  const char *action_name,
                                  GVariant   *param)
{
  RugosaProjectSettingsWindow *self = RUGOSA_PROJECT_SETTINGS_WINDOW (widget);

  if (g_str_equal (action_name, "settings.undo"))
    rugosa_history_undo (self->history);
  else
    rugosa_history_redo (self->history);
}

RugosaProjectSettingsWindow *
rugosa_project_settings_window_new (RugosaHistory *history,
                                    GSettings     *prefs)
{
  RugosaProjectSettingsWindow *self;
  RugosaSettings *settings;

  g_return_val_if_fail (RUGOSA_IS_HISTORY (history), NULL);
  g_return_val_if_fail (G_IS_SETTINGS (prefs), NULL);

  self = g_object_new (RUGOSA_TYPE_PROJECT_SETTINGS_WINDOW, NULL);
  self->history = g_object_ref (history);
  self->prefs = g_object_ref (prefs);
  settings = rugosa_project_get_settings (rugosa_history_get_project (history));

  rugosa_settings_page_build (self->page, settings, 0, RUGOSA_FIELD_VIEW);
  rugosa_settings_page_set_apply_func (self->page, _rugosa_project_settings_apply, self, NULL);
  /* "Use for New Projects" closes the page, after the generated rows. */
  g_object_ref (self->seed_group);
  adw_preferences_page_remove (ADW_PREFERENCES_PAGE (self->page), self->seed_group);
  adw_preferences_page_add (ADW_PREFERENCES_PAGE (self->page), self->seed_group);
  g_object_unref (self->seed_group);
  return self;
}

RugosaSettingsPage *
rugosa_project_settings_window_get_page (RugosaProjectSettingsWindow *self)
{
  g_return_val_if_fail (RUGOSA_IS_PROJECT_SETTINGS_WINDOW (self), NULL);
  return self->page;
}

static void
rugosa_project_settings_window_dispose (GObject *object)
{
  RugosaProjectSettingsWindow *self = RUGOSA_PROJECT_SETTINGS_WINDOW (object);

  if (self->page != NULL)
    rugosa_settings_page_set_apply_func (self->page, NULL, NULL, NULL);
  gtk_widget_dispose_template (GTK_WIDGET (self), RUGOSA_TYPE_PROJECT_SETTINGS_WINDOW);
  g_clear_object (&self->history);
  g_clear_object (&self->prefs);
  G_OBJECT_CLASS (rugosa_project_settings_window_parent_class)->dispose (object);
}

static void
rugosa_project_settings_window_class_init (RugosaProjectSettingsWindowClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = rugosa_project_settings_window_dispose;

  g_type_ensure (RUGOSA_TYPE_SETTINGS_PAGE);
  gtk_widget_class_set_template_from_resource (widget_class, "/org/rugosa/Rugosa/rugosa-project-settings-window.ui");
  gtk_widget_class_bind_template_child (widget_class, RugosaProjectSettingsWindow, page);
  gtk_widget_class_bind_template_child (widget_class, RugosaProjectSettingsWindow, seed_group);

  gtk_widget_class_install_action (widget_class, "settings.use-for-new", NULL, _rugosa_project_settings_use_for_new);
  gtk_widget_class_install_action (widget_class, "settings.undo", NULL, _rugosa_project_settings_history);
  gtk_widget_class_install_action (widget_class, "settings.redo", NULL, _rugosa_project_settings_history);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_z, GDK_CONTROL_MASK, "settings.undo", NULL);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_z, GDK_CONTROL_MASK | GDK_SHIFT_MASK, "settings.redo", NULL);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_y, GDK_CONTROL_MASK, "settings.redo", NULL);
}

static void
rugosa_project_settings_window_init (RugosaProjectSettingsWindow *self)
{
  gtk_widget_init_template (GTK_WIDGET (self));
}
