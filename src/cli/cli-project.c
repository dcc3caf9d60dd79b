/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The project commands: eval (and render, with the chart). */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <math.h>
#include <stdio.h>

#include "cli.h"
#include "chart/rugosa-chart-input.h"
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
      cli_fail (_("'%s' needs one project file, e.g. 'rugosa-cli %s lines.rugosa'."),
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
      cli_fail (_("%s (years)"), msg->str);
      return FALSE;
    }
  if (!(*age >= 0.0 && *age <= 200.0))
    {
      cli_fail (_("--age must lie between 0 and 200 years."));
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

  if (!cli_args_parse (&args, "eval", cli_options_with_units (eval_options), argc, argv, 2, msg))
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
    return cli_fail (_("--format must be table, csv or json, not \"%s\"."), format_text);
  if ((project = cli_load_project (&args, "eval")) == NULL)
    return CLI_EXIT_USAGE;
  /* the project's display units, unless the options say otherwise */
  if (!cli_apply_units (&args, rugosa_project_get_settings (project)))
    return CLI_EXIT_USAGE;
  if (!rugosa_project_format_eval (project, age, format, out, &error))
    return cli_fail ("%s", error->message);
  return cli_write_stdout (out->str);
}

static const CliOption render_options[] = {
  { "-o", TRUE, FALSE },
  { "--output", TRUE, FALSE },
  { "--width", TRUE, FALSE },
  { "--height", TRUE, FALSE },
  { "--age", TRUE, FALSE },
  { "--theme", TRUE, FALSE },
  { NULL, FALSE, FALSE },
};

/* The footer date: today, or SOURCE_DATE_EPOCH when set (reproducible
 * output, as the reproducible-builds convention has it). */
static char *
footer_date (void)
{
  const char *epoch = g_getenv ("SOURCE_DATE_EPOCH");
  g_autoptr (GDateTime) when = NULL;

  if (epoch != NULL && *epoch != '\0')
    when = g_date_time_new_from_unix_utc (g_ascii_strtoll (epoch, NULL, 10));
  if (when == NULL)
    when = g_date_time_new_now_local ();
  return g_date_time_format (when, "%Y-%m-%d");
}

static gboolean
parse_size (const CliArgs *args, const char *name, double fallback, double *out)
{
  g_autoptr (GString) msg = g_string_new (NULL);
  const char *text = cli_args_get (args, name);

  *out = fallback;
  if (text == NULL)
    return TRUE;
  if (!cli_parse_number (name, text, out, msg))
    {
      cli_fail (_("%s (pixels, or points for PDF and SVG)"), msg->str);
      return FALSE;
    }
  if (!(*out >= 200.0 && *out <= 10000.0) || *out != floor (*out))
    {
      cli_fail (_("%s must be a whole number from 200 to 10000."), name);
      return FALSE;
    }
  return TRUE;
}

int
cli_cmd_render (int argc, char **argv)
{
  g_auto (CliArgs) args = { 0 };
  g_autoptr (GString) msg = g_string_new (NULL);
  g_autoptr (RugosaProject) project = NULL;
  g_autoptr (RugosaChartInput) input = NULL;
  g_autoptr (GError) error = NULL;
  g_autofree char *date = NULL;
  RugosaChartFormat format;
  RugosaChartTheme theme = RUGOSA_CHART_THEME_LIGHT;
  const char *path, *theme_text;
  double age, width, height;

  if (!cli_args_parse (&args, "render", cli_options_with_units (render_options), argc, argv, 2, msg))
    return cli_fail ("%s", msg->str);
  path = cli_args_get (&args, "-o");
  if (path == NULL)
    path = cli_args_get (&args, "--output");
  if (path == NULL || *path == '\0')
    return cli_fail (_("-o is required: the file to write, ending in .png, .svg or .pdf."));
  if (g_str_has_suffix (path, ".png") || g_str_has_suffix (path, ".PNG"))
    format = RUGOSA_CHART_FORMAT_PNG;
  else if (g_str_has_suffix (path, ".svg") || g_str_has_suffix (path, ".SVG"))
    format = RUGOSA_CHART_FORMAT_SVG;
  else if (g_str_has_suffix (path, ".pdf") || g_str_has_suffix (path, ".PDF"))
    format = RUGOSA_CHART_FORMAT_PDF;
  else
    return cli_fail (_("-o must name a file ending in .png, .svg or .pdf, not \"%s\"."), path);
  if (!parse_size (&args, "--width", 1600.0, &width)
      || !parse_size (&args, "--height", 1000.0, &height)
      || !cli_parse_age_option (&args, &age))
    return CLI_EXIT_USAGE;
  theme_text = cli_args_get (&args, "--theme");
  if (theme_text == NULL || g_str_equal (theme_text, "light"))
    theme = RUGOSA_CHART_THEME_LIGHT;
  else if (g_str_equal (theme_text, "dark"))
    theme = RUGOSA_CHART_THEME_DARK;
  else
    return cli_fail (_("--theme must be light or dark, not \"%s\"."), theme_text);
  if ((project = cli_load_project (&args, "render")) == NULL)
    return CLI_EXIT_USAGE;
  /* the readouts of the chart in the project's units, or the options' */
  if (!cli_apply_units (&args, rugosa_project_get_settings (project)))
    return CLI_EXIT_USAGE;
  if (age >= 0.0)
    g_object_set (rugosa_project_get_settings (project), "service-age", age, NULL);

  input = rugosa_chart_input_new (project, -1, NULL);
  input->spec.theme = theme;
  date = footer_date ();
  if (!rugosa_chart_export (&input->spec, input->lines, input->n_lines, format,
                            width, height, date, path, &error))
    {
      (void) fprintf (stderr, "rugosa-cli: %s\n", error->message);
      return error->code == RUGOSA_CHART_ERROR_WRITE ? CLI_EXIT_FAILURE : CLI_EXIT_USAGE;
    }
  return CLI_EXIT_OK;
}
