/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-application"

#include "config.h"

#include <glib/gi18n.h>

#include "chart/rugosa-chart.h"
#include "rugosa-application.h"
#include "rugosa-preferences-window.h"
#include "rugosa-window.h"

struct _RugosaApplication
{
  AdwApplication parent_instance;

  /* owned references */
  GSettings *settings;
};

G_DEFINE_FINAL_TYPE (RugosaApplication, rugosa_application, ADW_TYPE_APPLICATION)

/* The preferences' schema (data/org.rugosa.Rugosa.gschema.xml), the same
 * for the development profile. */
#define RUGOSA_SCHEMA_ID "org.rugosa.Rugosa"

RugosaApplication *
rugosa_application_new (void)
{
  return g_object_new (RUGOSA_TYPE_APPLICATION,
                       "application-id", APPLICATION_ID,
                       "flags", G_APPLICATION_HANDLES_OPEN,
                       "resource-base-path", "/org/rugosa/Rugosa",
                       NULL);
}

GSettings *
rugosa_application_get_settings (RugosaApplication *self)
{
  g_return_val_if_fail (RUGOSA_IS_APPLICATION (self), NULL);
  return self->settings;
}

static void
_rugosa_application_apply_color_scheme (RugosaApplication *self)
{
  AdwStyleManager *manager = adw_style_manager_get_default ();
  int scheme = g_settings_get_enum (self->settings, "color-scheme");

  switch (scheme)
    {
    case 1:
      adw_style_manager_set_color_scheme (manager, ADW_COLOR_SCHEME_FORCE_LIGHT);
      break;
    case 2:
      adw_style_manager_set_color_scheme (manager, ADW_COLOR_SCHEME_FORCE_DARK);
      break;
    default:
      adw_style_manager_set_color_scheme (manager, ADW_COLOR_SCHEME_DEFAULT);
      break;
    }
}

static RugosaWindow *
_rugosa_application_new_window (RugosaApplication *self)
{
  RugosaWindow *window = rugosa_window_new (self);
  return window;
}

static RugosaWindow *
_rugosa_application_reusable_window (RugosaApplication *self)
{
  /* An untouched, unnamed project can take the file instead of opening a
   * second window beside it. */
  GtkWindow *active = gtk_application_get_active_window (GTK_APPLICATION (self));
  if (RUGOSA_IS_WINDOW (active) && rugosa_window_is_pristine (RUGOSA_WINDOW (active)))
    return RUGOSA_WINDOW (active);
  return _rugosa_application_new_window (self);
}

static void
rugosa_application_activate (GApplication *app)
{
  RugosaApplication *self = RUGOSA_APPLICATION (app);
  GtkWindow *window = gtk_application_get_active_window (GTK_APPLICATION (app));

  if (window == NULL)
    {
      RugosaWindow *w = _rugosa_application_new_window (self);
      gtk_window_present (GTK_WINDOW (w));
      rugosa_window_offer_recovery (w);
      return;
    }
  gtk_window_present (window);
}

static void
rugosa_application_open (GApplication  *app,
                         GFile        **files,
                         int            n_files,
                         const char    *hint)
{
  RugosaApplication *self = RUGOSA_APPLICATION (app);
  gboolean starting = gtk_application_get_windows (GTK_APPLICATION (app)) == NULL;

  for (int i = 0; i < n_files; i++)
    {
      RugosaWindow *w = _rugosa_application_reusable_window (self);
      rugosa_window_load_file (w, files[i]);
      gtk_window_present (GTK_WINDOW (w));
    }
  /* Started with files after a session that did not end cleanly: offer
   * the unsaved work too, in a window of its own so that the files just
   * opened stay as they are. */
  if (starting && rugosa_window_recovery_pending ())
    {
      RugosaWindow *w = _rugosa_application_new_window (self);
      gtk_window_present (GTK_WINDOW (w));
      rugosa_window_offer_recovery (w);
    }
}

static void
_rugosa_application_on_color_scheme (GSettings         *settings,
                                     const char        *key,
                                     RugosaApplication *self)
{
  _rugosa_application_apply_color_scheme (self);
}

static void
rugosa_application_startup (GApplication *app)
{
  RugosaApplication *self = RUGOSA_APPLICATION (app);

  G_APPLICATION_CLASS (rugosa_application_parent_class)->startup (app);

  /* This instance's recovery copies are live until it ends: the lock that
   * says so is held from now on (rugosa-window-files.c). */
  {
    g_autoptr (GError) error = NULL;
    if (!rugosa_window_recovery_hold (&error))
      g_message ("Recovery copies are not locked: %s", error->message);
  }

  self->settings = g_settings_new (RUGOSA_SCHEMA_ID);
  g_signal_connect (self->settings, "changed::color-scheme",
                    G_CALLBACK (_rugosa_application_on_color_scheme), self);
  _rugosa_application_apply_color_scheme (self);

  g_action_map_add_action (G_ACTION_MAP (app),
                           g_settings_create_action (self->settings, "color-scheme"));

  static const char *quit_accels[] = { "<Control>q", NULL };
  static const char *new_accels[] = { "<Control>n", NULL };
  static const char *open_accels[] = { "<Control>o", NULL };
  static const char *save_accels[] = { "<Control>s", NULL };
  static const char *save_as_accels[] = { "<Control><Shift>s", NULL };
  static const char *undo_accels[] = { "<Control>z", NULL };
  static const char *redo_accels[] = { "<Control><Shift>z", "<Control>y", NULL };
  static const char *prefs_accels[] = { "<Control>comma", NULL };
  static const char *print_accels[] = { "<Control>p", NULL };
  static const char *export_accels[] = { "<Control>e", NULL };
  static const char *add_accels[] = { "<Control>plus", "<Control>equal", NULL };
  static const char *dup_accels[] = { "<Control>d", NULL };
  static const char *close_accels[] = { "<Control>w", NULL };
  static const char *help_accels[] = { "<Control>question", NULL };

  gtk_application_set_accels_for_action (GTK_APPLICATION (app), "app.quit", quit_accels);
  gtk_application_set_accels_for_action (GTK_APPLICATION (app), "app.preferences", prefs_accels);
  gtk_application_set_accels_for_action (GTK_APPLICATION (app), "win.show-help-overlay", help_accels);
  gtk_application_set_accels_for_action (GTK_APPLICATION (app), "win.new", new_accels);
  gtk_application_set_accels_for_action (GTK_APPLICATION (app), "win.open", open_accels);
  gtk_application_set_accels_for_action (GTK_APPLICATION (app), "win.save", save_accels);
  gtk_application_set_accels_for_action (GTK_APPLICATION (app), "win.save-as", save_as_accels);
  gtk_application_set_accels_for_action (GTK_APPLICATION (app), "win.undo", undo_accels);
  gtk_application_set_accels_for_action (GTK_APPLICATION (app), "win.redo", redo_accels);
  gtk_application_set_accels_for_action (GTK_APPLICATION (app), "win.print", print_accels);
  gtk_application_set_accels_for_action (GTK_APPLICATION (app), "win.export-chart", export_accels);
  gtk_application_set_accels_for_action (GTK_APPLICATION (app), "win.line-add", add_accels);
  gtk_application_set_accels_for_action (GTK_APPLICATION (app), "win.line-duplicate", dup_accels);
  gtk_application_set_accels_for_action (GTK_APPLICATION (app), "window.close", close_accels);
}

static void
rugosa_application_shutdown (GApplication *app)
{
  rugosa_window_recovery_release ();
  G_APPLICATION_CLASS (rugosa_application_parent_class)->shutdown (app);
}

static void
_rugosa_application_quit (GSimpleAction *action,
                          GVariant      *param,
                          gpointer       user_data)
{
  GtkApplication *app = GTK_APPLICATION (user_data);
  GList *windows = g_list_copy (gtk_application_get_windows (app));

  /* Each window runs its own unsaved-changes guard on close. */
  for (GList *l = windows; l; l = l->next)
    gtk_window_close (GTK_WINDOW (l->data));
  g_list_free (windows);
}

static void
_rugosa_application_preferences (GSimpleAction *action,
                                 GVariant      *param,
                                 gpointer       user_data)
{
  RugosaApplication *self = RUGOSA_APPLICATION (user_data);
  GtkWindow *parent = gtk_application_get_active_window (GTK_APPLICATION (self));
  RugosaPreferencesWindow *prefs = rugosa_preferences_window_new (self->settings);

  gtk_window_set_transient_for (GTK_WINDOW (prefs), parent);
  gtk_window_present (GTK_WINDOW (prefs));
}

static const char *about_sources =
  "C. F. Colebrook (1939). Turbulent flow in pipes, with particular reference to the transition region between the smooth and rough pipe laws. J. Inst. Civil Engineers 11(4).\n"
  "S. E. Haaland (1983). Simple and explicit formulas for the friction factor in turbulent pipe flow. J. Fluids Eng. 105(1).\n"
  "P. K. Swamee and A. K. Jain (1976). Explicit equations for pipe-flow problems. J. Hydraulics Div. ASCE 102(5).\n"
  "S. W. Churchill (1977). Friction-factor equation spans all fluid-flow regimes. Chemical Engineering 84(24).\n"
  "IAPWS-IF97: Revised release on the IAPWS Industrial Formulation 1997 for the thermodynamic properties of water and steam.\n"
  "IAPWS R12-08: Release on the IAPWS formulation 2008 for the viscosity of ordinary water substance.\n"
  "R. Darby (2001). Correlate pressure drops through fittings (3-K method). Chemical Engineering 108(4); Chemical Engineering Fluid Mechanics, 2nd ed.\n"
  "M. H. Sharqawy, J. H. Lienhard V and S. M. Zubair (2010). Thermophysical properties of seawater. Desalination and Water Treatment 16.\n"
  "ASTM D341: Standard practice for viscosity–temperature equations and charts for liquid petroleum or hydrocarbon products.\n"
  "ASME B36.10M and B36.19M: Welded and seamless wrought steel pipe; stainless steel pipe.\n"
  "ASTM B88: Standard specification for seamless copper water tube.\n"
  "ISO 4427: Plastics piping systems — polyethylene (PE) pipes and fittings for water supply.\n"
  "ASTM D1785: Standard specification for poly(vinyl chloride) (PVC) plastic pipe, schedules 40, 80 and 120.";

static void
_rugosa_application_about (GSimpleAction *action,
                           GVariant      *param,
                           gpointer       user_data)
{
  RugosaApplication *self = RUGOSA_APPLICATION (user_data);
  GtkWindow *parent = gtk_application_get_active_window (GTK_APPLICATION (self));
  static const char *developers[] = { "The Rugosa contributors", NULL };
  GtkWidget *about;

  about = g_object_new (ADW_TYPE_ABOUT_WINDOW,
                        "transient-for", parent,
                        "application-name", "Rugosa",
                        "application-icon", APPLICATION_ID,
                        "version", PACKAGE_VERSION,
                        "developer-name", _("The Rugosa contributors"),
                        "developers", developers,
                        "license-type", GTK_LICENSE_GPL_3_0,
                        "comments",
                        _("Friction factor, head loss and service-age roughening for pressurised pipe lines, "
                          "drawn on a chart of Reynolds number against the Darcy friction factor.\n\n"
                          "Caution: results are estimates from published correlations, valid only inside "
                          "their stated ranges. Check every design against the applicable local codes and "
                          "have it reviewed by a qualified, licensed engineer."),
                        NULL);
  adw_about_window_add_legal_section (ADW_ABOUT_WINDOW (about),
                                      _("Published sources"),
                                      NULL, GTK_LICENSE_CUSTOM, about_sources);
  adw_about_window_add_legal_section (ADW_ABOUT_WINDOW (about),
                                      _("Cautions"),
                                      NULL, GTK_LICENSE_CUSTOM,
                                      _(RUGOSA_CHART_CAUTION_FULL));
  gtk_window_present (GTK_WINDOW (about));
}

static const GActionEntry app_entries[] = {
  { "quit", _rugosa_application_quit, NULL, NULL, NULL },
  { "preferences", _rugosa_application_preferences, NULL, NULL, NULL },
  { "about", _rugosa_application_about, NULL, NULL, NULL },
};

static void
rugosa_application_dispose (GObject *object)
{
  RugosaApplication *self = RUGOSA_APPLICATION (object);

  g_clear_object (&self->settings);
  G_OBJECT_CLASS (rugosa_application_parent_class)->dispose (object);
}

/* Whether GSettings can find the preferences' schema.  Without it
 * g_settings_new aborts the program with a GLib error, as happens when the
 * program is started straight from a build folder. */
static gboolean
_rugosa_application_schema_found (void)
{
  GSettingsSchemaSource *source = g_settings_schema_source_get_default ();
  g_autoptr (GSettingsSchema) schema = NULL;

  if (source != NULL)
    schema = g_settings_schema_source_lookup (source, RUGOSA_SCHEMA_ID, TRUE);
  return schema != NULL;
}

static int
rugosa_application_handle_local_options (GApplication *app,
                                         GVariantDict *options)
{
  if (g_variant_dict_contains (options, "version"))
    {
      g_print ("%s %s\n", PACKAGE_NAME, PACKAGE_VERSION);
      return 0;
    }
  /* Say what is missing and how to run the program, rather than abort in
   * g_settings_new.  The preferences are not replaced by defaults in
   * memory: settings changed in such a session would be lost unseen. */
  if (!_rugosa_application_schema_found ())
    {
      /* TRANSLATORS: %s is the schema's id, "org.rugosa.Rugosa" */
      g_printerr (_("rugosa: The settings schema %s is not installed: install Rugosa, "
                    "or start it from a build folder with GSETTINGS_SCHEMA_DIR set to "
                    "that folder's data directory, as “build-aux/dev run” does.\n"),
                  RUGOSA_SCHEMA_ID);
      return 1;
    }
  return G_APPLICATION_CLASS (rugosa_application_parent_class)->handle_local_options (app, options);
}

static void
rugosa_application_class_init (RugosaApplicationClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GApplicationClass *app_class = G_APPLICATION_CLASS (klass);

  object_class->dispose = rugosa_application_dispose;
  app_class->activate = rugosa_application_activate;
  app_class->open = rugosa_application_open;
  app_class->startup = rugosa_application_startup;
  app_class->shutdown = rugosa_application_shutdown;
  app_class->handle_local_options = rugosa_application_handle_local_options;
}

static void
rugosa_application_init (RugosaApplication *self)
{
  g_action_map_add_action_entries (G_ACTION_MAP (self), app_entries,
                                   G_N_ELEMENTS (app_entries), self);
  g_application_add_main_option (G_APPLICATION (self), "version", 0,
                                 G_OPTION_FLAG_NONE, G_OPTION_ARG_NONE,
                                 _("Show the program version and quit"), NULL);
  g_application_set_option_context_parameter_string (G_APPLICATION (self), _("[PROJECT…]"));
}
