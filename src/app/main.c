/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-main"

#include "config.h"

#include <glib/gi18n.h>
#include <locale.h>

#include "rugosa-application.h"

int
main (int argc, char *argv[])
{
  g_autoptr (RugosaApplication) app = NULL;

  const char *localedir = g_getenv ("RUGOSA_LOCALEDIR");

  /* RUGOSA_LOCALEDIR: the build folder's po/ (tests, running uninstalled). */
  setlocale (LC_ALL, "");
  bindtextdomain (GETTEXT_PACKAGE,
                  localedir != NULL && *localedir != '\0' ? localedir : LOCALEDIR);
  bind_textdomain_codeset (GETTEXT_PACKAGE, "UTF-8");
  textdomain (GETTEXT_PACKAGE);

  app = rugosa_application_new ();
  return g_application_run (G_APPLICATION (app), argc, argv);
}
