/* SPDX-License-Identifier: GPL-3.0-or-later */
/* rugosa-cli report: a project's report as a PDF (chart/rugosa-report.h). */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <locale.h>

#include "cli.h"
#include "chart/rugosa-report.h"
#include "model/rugosa-project.h"

static const CliOption report_options[] = {
  { "-o", TRUE, FALSE },
  { "--output", TRUE, FALSE },   /* the same as -o (cli-args.c) */
  { "--paper", TRUE, FALSE },
  { "--age", TRUE, FALSE },
  { NULL, FALSE, FALSE },
};

/* The paper of the user's locale: LC_ALL, LC_PAPER, then LANG, the order
 * in which POSIX lets them decide a category. */
static RugosaPaper
locale_paper (void)
{
  static const char *const vars[] = { "LC_ALL", "LC_PAPER", "LANG" };

  for (guint i = 0; i < G_N_ELEMENTS (vars); i++)
    {
      const char *v = g_getenv (vars[i]);

      if (v != NULL && *v != '\0')
        return rugosa_paper_for_locale (v);
    }
  return RUGOSA_PAPER_A4;
}

int
cli_cmd_report (int argc, char **argv)
{
  g_auto (CliArgs) args = { 0 };
  g_autoptr (GString) msg = g_string_new (NULL);
  g_autoptr (RugosaProject) project = NULL;
  g_autoptr (RugosaReport) report = NULL;
  g_autoptr (GError) error = NULL;
  g_autofree char *today = NULL;
  RugosaPaper paper = locale_paper ();
  const char *path, *paper_text;
  double age;

  if (!cli_args_parse (&args, "report", cli_options_with_units (report_options), argc, argv, 2, msg))
    return cli_fail ("%s", msg->str);
  path = cli_args_get (&args, "-o");   /* or --output */
  if (path == NULL || *path == '\0')
    return cli_fail (_("-o is required: the PDF file to write, ending in .pdf."));
  if (!g_str_has_suffix (path, ".pdf") && !g_str_has_suffix (path, ".PDF"))
    {
      g_autofree char *shown = cli_echo (path);
      return cli_fail (_("-o must name a file ending in .pdf, not \"%s\"."), shown);
    }
  paper_text = cli_args_get (&args, "--paper");
  if (paper_text != NULL && !rugosa_paper_from_id (paper_text, &paper))
    {
      g_autofree char *shown = cli_echo (paper_text);
      return cli_fail (_("--paper must be a4 or letter, not \"%s\"."), shown);
    }
  if (!cli_parse_age_option (&args, &age))
    return CLI_EXIT_USAGE;
  if ((project = cli_load_project (&args, "report")) == NULL)
    return CLI_EXIT_USAGE;
  /* the project's display units, unless the options say otherwise */
  if (!cli_apply_units (&args, rugosa_project_get_settings (project)))
    return CLI_EXIT_USAGE;
  if (age >= 0.0)
    g_object_set (rugosa_project_get_settings (project), "service-age", age, NULL);

  today = cli_today ();
  report = rugosa_report_new (project, paper, today);
  if (!rugosa_report_write_pdf (report, path, &error))
    {
      /* one line, whatever the file name holds */
      cli_fail ("%s", error->message);
      return CLI_EXIT_FAILURE;
    }
  return CLI_EXIT_OK;
}
