/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The project commands: eval (and render, with the chart). */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <stdio.h>

#include "cli.h"
#include "model/rugosa-project.h"

static const CliOption eval_options[] = {
  { "--age", TRUE, FALSE },
  { "--format", TRUE, FALSE },
  { NULL, FALSE, FALSE },
};

/* Loads PROJECT (the one positional argument) or reports why not. */
RugosaProject *
cli_load_project (const CliArgs *args, const char *command)
{
  g_autoptr (RugosaProject) project = NULL;
  g_autoptr (GError) error = NULL;

  if (args->positional->len != 1)
    {
      cli_fail ("'%s' needs one project file, e.g. 'rugosa-cli %s lines.rugosa'.",
                command, command);
      return NULL;
    }
  project = rugosa_project_new ();
  if (!rugosa_project_load (project, g_ptr_array_index (args->positional, 0), &error))
    {
      cli_fail ("%s", error->message);
      return NULL;
    }
  return g_steal_pointer (&project);
}

/* --age YEARS: a bare number of years, 0 to 200; -1 when not given. */
gboolean
cli_parse_age_option (const CliArgs *args, double *age)
{
  g_autoptr (GString) msg = g_string_new (NULL);
  const char *text = cli_args_get (args, "--age");

  *age = -1.0;
  if (text == NULL)
    return TRUE;
  if (!cli_parse_number ("--age", text, age, msg))
    {
      cli_fail ("%s (years)", msg->str);
      return FALSE;
    }
  if (!(*age >= 0.0 && *age <= 200.0))
    {
      cli_fail ("--age must lie between 0 and 200 years.");
      return FALSE;
    }
  return TRUE;
}

int
cli_cmd_eval (int argc, char **argv)
{
  g_auto (CliArgs) args = { 0 };
  g_autoptr (GString) msg = g_string_new (NULL);
  g_autoptr (GString) out = g_string_new (NULL);
  g_autoptr (RugosaProject) project = NULL;
  g_autoptr (GError) error = NULL;
  RugosaEvalFormat format = RUGOSA_EVAL_FORMAT_TABLE;
  const char *format_text;
  double age;

  if (!cli_args_parse (&args, "eval", eval_options, argc, argv, 2, msg))
    return cli_fail ("%s", msg->str);
  if (!cli_parse_age_option (&args, &age))
    return CLI_EXIT_USAGE;
  format_text = cli_args_get (&args, "--format");
  if (format_text == NULL || g_str_equal (format_text, "table"))
    format = RUGOSA_EVAL_FORMAT_TABLE;
  else if (g_str_equal (format_text, "csv"))
    format = RUGOSA_EVAL_FORMAT_CSV;
  else if (g_str_equal (format_text, "json"))
    format = RUGOSA_EVAL_FORMAT_JSON;
  else
    return cli_fail ("--format must be table, csv or json, not \"%s\".", format_text);
  if ((project = cli_load_project (&args, "eval")) == NULL)
    return CLI_EXIT_USAGE;
  if (!rugosa_project_format_eval (project, age, format, out, &error))
    return cli_fail ("%s", error->message);
  fputs (out->str, stdout);
  return fflush (stdout) == 0 ? CLI_EXIT_OK : CLI_EXIT_FAILURE;
}
