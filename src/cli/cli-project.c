/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The project commands: eval (and render, with the chart). */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <math.h>
#include <stdio.h>

#include "cli.h"
#include "chart/rugosa-chart-input.h"
#include "chart/rugosa-plot-input.h"
#include "model/rugosa-fields.h"
#include "model/rugosa-project.h"

/* The settings that `eval` may change for one run: the energy settings,
 * each with the option and the range of its row. */
static gboolean
is_energy_row (const RugosaField *row)
{
  return row->cli != NULL && g_str_has_prefix (row->path, "energy.");
}

/* eval's own options, then one per energy row; built once. */
static const CliOption *
eval_options (void)
{
  static CliOption *options;
  GArray *a;
  guint n;
  const RugosaField *rows;

  if (options != NULL)
    return options;
  a = g_array_new (TRUE, TRUE, sizeof (CliOption));
  {
    const CliOption own[] = { { "--age", TRUE, FALSE }, { "--format", TRUE, FALSE } };

    g_array_append_vals (a, own, G_N_ELEMENTS (own));
  }
  rows = rugosa_settings_fields (&n);
  for (guint i = 0; i < n; i++)
    if (is_energy_row (&rows[i]))
      {
        CliOption o = { rows[i].cli, TRUE, FALSE };

        g_array_append_val (a, o);
      }
  options = (CliOption *) g_array_free (a, FALSE);
  return options;
}

/* Set the energy settings given as options on the loaded project, each
 * checked against its row's range, then their relations; CLI_EXIT_OK or
 * the refusal already reported. */
static int
apply_energy_options (const CliArgs *args, RugosaProject *project)
{
  RugosaSettings *settings = rugosa_project_get_settings (project);
  const RugosaField *rows;
  const char *failed = NULL;
  RgError err = { 0 };
  guint n;

  rows = rugosa_settings_fields (&n);
  for (guint i = 0; i < n; i++)
    {
      const RugosaField *row = &rows[i];
      const char *text;

      if (!is_energy_row (row) || (text = cli_args_get (args, row->cli)) == NULL)
        continue;
      if (row->kind == RUGOSA_FIELD_TEXT)
        {
          gboolean control = FALSE;

          for (const char *c = text; *c != '\0'; c++)
            control |= (unsigned char) *c < 0x20 || *c == 0x7f;
          if (!g_utf8_validate (text, -1, NULL) || control
              || g_utf8_strlen (text, -1) > row->max_chars)
            {
              g_autofree char *msg = g_strdup_printf (_("%s must be a text of at most %d characters, without control characters."),
                                                      rugosa_field_label (row), row->max_chars);
              return cli_fail_option (row->cli, msg);
            }
          g_object_set (settings, row->property, text, NULL);
          continue;
        }
      {
        double stored = 0.0;

        if (!rugosa_field_parse_text (row, text, NULL, 0.0, &stored, &err)
            || !rugosa_field_in_range (row, stored, NULL, &err))
          return cli_fail_option (row->cli, err.text);
        g_object_set (settings, row->property, stored, NULL);
      }
    }
  if (rugosa_settings_check (settings, &failed, &err) != RG_OK)
    {
      /* name the options given among the fields of the relation */
      g_autoptr (GString) options = g_string_new (NULL);

      for (guint i = 0; i < n; i++)
        if (is_energy_row (&rows[i]) && cli_args_has (args, rows[i].cli)
            && g_str_has_prefix (rows[i].property, "hours-"))
          g_string_append_printf (options, "%s%s", options->len ? ", " : "", rows[i].cli);
      return cli_fail_option (options->len ? options->str : rugosa_field_find (failed)->cli, err.text);
    }
  return CLI_EXIT_OK;
}

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
  /* "-": standard input, named explicitly, read to its end within the
   * size limit (a file path is refused unless it is a regular file) */
  if (g_str_equal (g_ptr_array_index (args->positional, 0), "-")
      ? !rugosa_project_load_stream (project, 0, _("standard input"), &error)
      : !rugosa_project_load (project, g_ptr_array_index (args->positional, 0), &error))
    {
      cli_fail ("%s", error->message);
      return NULL;
    }
  return g_steal_pointer (&project);
}

/* --age: the service age, a bare number of years or a time ("25 yr"),
 * in the range of the settings row it sets; -1 when not given. */
gboolean
cli_parse_age_option (const CliArgs *args, double *age)
{
  const RugosaField *row = rugosa_field_find_cli ("--age");
  const char *text = cli_args_get (args, "--age");
  RgError err = { 0 };

  *age = -1.0;
  if (text == NULL)
    return TRUE;
  if (!rugosa_field_parse_text (row, text, NULL, 0.0, age, &err)
      || !rugosa_field_in_range (row, *age, NULL, &err))
    {
      *age = -1.0;
      cli_fail_option ("--age", err.text);
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
  int status;

  if (!cli_args_parse (&args, "eval", cli_options_with_units (eval_options ()), argc, argv, 2, msg))
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
    {
      g_autofree char *shown = cli_echo (format_text);
      return cli_fail (_("--format must be table, csv or json, not \"%s\"."), shown);
    }
  if ((project = cli_load_project (&args, "eval")) == NULL)
    return CLI_EXIT_USAGE;
  if ((status = apply_energy_options (&args, project)) != CLI_EXIT_OK)
    return status;
  /* the project's display units, unless the options say otherwise */
  if (!cli_apply_units (&args, rugosa_project_get_settings (project)))
    return CLI_EXIT_USAGE;
  if (!rugosa_project_format_eval (project, age, format, out, &error))
    return cli_fail ("%s", error->message);
  return cli_write_stdout (out->str);
}

static const CliOption render_options[] = {
  { "-o", TRUE, FALSE },
  { "--output", TRUE, FALSE },   /* the same as -o (cli-args.c) */
  { "--width", TRUE, FALSE },
  { "--height", TRUE, FALSE },
  { "--age", TRUE, FALSE },
  { "--theme", TRUE, FALSE },
  { "--view", TRUE, FALSE },
  { "--title", TRUE, FALSE },
  { NULL, FALSE, FALSE },
};

/* The footer date: today, or SOURCE_DATE_EPOCH when set (reproducible
 * output, as the reproducible-builds convention has it). */
char *
cli_today (void)
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
  RugosaChartView view = RUGOSA_CHART_VIEW_FRICTION;
  const char *path, *theme_text, *view_text, *title;
  double age, width, height;
  gboolean ok;

  if (!cli_args_parse (&args, "render", cli_options_with_units (render_options), argc, argv, 2, msg))
    return cli_fail ("%s", msg->str);
  path = cli_args_get (&args, "-o");   /* or --output */
  if (path == NULL || *path == '\0')
    return cli_fail (_("-o is required: the file to write, ending in .png, .svg or .pdf."));
  if (g_str_has_suffix (path, ".png") || g_str_has_suffix (path, ".PNG"))
    format = RUGOSA_CHART_FORMAT_PNG;
  else if (g_str_has_suffix (path, ".svg") || g_str_has_suffix (path, ".SVG"))
    format = RUGOSA_CHART_FORMAT_SVG;
  else if (g_str_has_suffix (path, ".pdf") || g_str_has_suffix (path, ".PDF"))
    format = RUGOSA_CHART_FORMAT_PDF;
  else
    {
      g_autofree char *shown = cli_echo (path);
      return cli_fail (_("-o must name a file ending in .png, .svg or .pdf, not \"%s\"."), shown);
    }
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
    {
      g_autofree char *shown = cli_echo (theme_text);
      return cli_fail (_("--theme must be light or dark, not \"%s\"."), shown);
    }
  view_text = cli_args_get (&args, "--view");
  if (view_text != NULL && !rugosa_chart_view_from_id (view_text, &view))
    {
      g_autofree char *shown = cli_echo (view_text);
      return cli_fail (_("--view must be friction, system or cost, not \"%s\"."), shown);
    }
  title = cli_args_get (&args, "--title");
  if (title != NULL)
    {
      /* one line of text, as a line's name is */
      if (rugosa_field_text_problem (NULL, title) != RUGOSA_TEXT_OK)
        return cli_fail (_("--title must be one line of UTF-8 text without control characters."));
      if (view != RUGOSA_CHART_VIEW_FRICTION)
        return cli_fail (_("--title is drawn on the friction chart only (--view friction)."));
    }
  if ((project = cli_load_project (&args, "render")) == NULL)
    return CLI_EXIT_USAGE;
  /* the readouts of the chart in the project's units, or the options' */
  if (!cli_apply_units (&args, rugosa_project_get_settings (project)))
    return CLI_EXIT_USAGE;
  if (age >= 0.0)
    g_object_set (rugosa_project_get_settings (project), "service-age", age, NULL);

  date = cli_today ();
  if (view == RUGOSA_CHART_VIEW_FRICTION)
    {
      input = rugosa_chart_input_new (project, -1, NULL);
      input->spec.theme = theme;
      /* the title, and under it the conditions the chart is drawn for */
      rugosa_chart_input_set_heading (input, project, title);
      ok = rugosa_chart_export (&input->spec, input->lines, input->n_lines, format,
                                width, height, date, path, &error);
    }
  else
    {
      g_autoptr (RugosaPlotInput) plot = rugosa_plot_input_new (project, view, -1, NULL);

      plot->spec.theme = theme;
      ok = rugosa_plot_export (&plot->spec, plot->series, plot->n_series, format,
                               width, height, date, path, &error);
    }
  if (!ok)
    {
      /* one line, whatever the file name holds */
      cli_fail ("%s", error->message);
      return error->code == RUGOSA_CHART_ERROR_WRITE ? CLI_EXIT_FAILURE : CLI_EXIT_USAGE;
    }
  return CLI_EXIT_OK;
}
