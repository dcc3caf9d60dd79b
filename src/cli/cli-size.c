/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The size command: every catalog size of a material for a duty, each
 * with its verdict new and at the service age, and the recommendation.
 *
 * The duty's options are the field rows' (cli-line.c builds them from the
 * line and settings tables: the fluid, flow, run, fittings, aging and the
 * limits of the project settings); the largest total head loss is the
 * sizing's own row (rugosa-sizing.c).  The sizing itself is the model's
 * (rugosa_sizing_run), which evaluates every size with the one
 * evaluation; this file only reads the options and writes the result. */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <math.h>
#include <string.h>

#include "cli.h"
#include "core/catalog.h"
#include "model/rugosa-display.h"
#include "model/rugosa-fields.h"
#include "model/rugosa-output.h"
#include "model/rugosa-sizing.h"
#include "model/rugosa-units.h"

/* Options of the field rows that name the pipe, which sizing chooses. */
static const char *const not_for_size[] = { "--pipe", "--diameter", "--roughness" };

static const CliOption *
size_options (void)
{
  static CliOption *options;
  GArray *a;

  if (options != NULL)
    return options;
  a = cli_field_options (FALSE);
  for (guint i = a->len; i-- > 0;)
    for (gsize k = 0; k < G_N_ELEMENTS (not_for_size); k++)
      if (g_str_equal (g_array_index (a, CliOption, i).name, not_for_size[k]))
        g_array_remove_index (a, i);
  {
    guint n;
    const RugosaField *rows = rugosa_sizing_fields (&n);
    CliOption catalog = { "--catalog", TRUE, FALSE };
    CliOption json = { "--json", FALSE, FALSE };

    for (guint i = 0; i < n; i++)
      {
        CliOption o = { rows[i].cli, TRUE, FALSE };
        g_array_append_val (a, o);
      }
    g_array_append_val (a, catalog);
    g_array_append_val (a, json);
  }
  options = (CliOption *) g_array_free (a, FALSE);
  return options;
}

/* The largest total head loss (0: none), from its row. */
static gboolean
read_head_loss (const CliArgs *args, double *h, RgError *err)
{
  guint n;
  const RugosaField *row = rugosa_sizing_fields (&n);

  *h = 0.0;
  if (!cli_args_has (args, row->cli))
    return TRUE;
  if (!rugosa_field_parse_text (row, cli_args_get (args, row->cli), NULL, 0.0, h, err))
    return FALSE;
  /* 0 stands for "none" in the row; given as an option it is a slip */
  if (*h == 0.0)
    return rugosa_field_in_range (row, -1.0, NULL, err);
  return rugosa_field_in_range (row, *h, NULL, err);
}

/* ---- JSON ---- */

static void
json_number (GString *out, double x)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  if (!isfinite (x))
    g_string_append (out, "null");
  else
    g_string_append (out, cli_format_exact (x, buf, sizeof buf));
}

/* "max_velocity_m_s": the limit's id with its row's SI unit. */
static char *
limit_json_key (RugosaLimit limit)
{
  const RugosaField *row = rugosa_limit_field (limit);
  const RugosaDisplayInfo *info = rugosa_display_info (row->display);
  g_autofree char *id = g_strdup (rugosa_limit_id (limit));

  g_strdelimit (id, "-", '_');
  return g_strdup_printf ("%s_%s", id, info->key_unit);
}

static void
json_limit_ids (GString *out, guint broken)
{
  gboolean first = TRUE;

  g_string_append_c (out, '[');
  for (guint b = 0; b < RUGOSA_N_LIMITS; b++)
    if (broken & (1u << b))
      {
        g_string_append (out, first ? "" : ", ");
        cli_json_escape (out, rugosa_limit_id ((RugosaLimit) (1u << b)));
        first = FALSE;
      }
  g_string_append_c (out, ']');
}

/* The keys of a candidate, from the output table, at the design flow. */
static const char *const candidate_keys[] = {
  "inner_diameter", "velocity", "reynolds", "friction_factor", "regime",
  "head_loss_major", "head_loss_minor", "head_loss_total", "gradient",
  "pressure_drop", "hazen_williams_c_equivalent", "hazen_williams_range",
};
/* … and those that change with age, when new. */
static const char *const new_keys[] = {
  "friction_factor", "head_loss_major", "head_loss_total", "gradient", "pressure_drop",
};

static void
json_point_keys (GString *out, const RugosaLineResults *r,
                 const RugosaOperatingPoint *p, const char *const *keys,
                 gsize n_keys, const char *indent)
{
  for (gsize k = 0; k < n_keys; k++)
    {
      const RugosaOutputKey *key = rugosa_output_key_find (keys[k]);

      if (!rugosa_output_present (key, p))
        continue;
      g_string_append_printf (out, ",%s\"%s\": ", indent, rugosa_output_json_key (key));
      if (key->kind == RUGOSA_OUTPUT_ID)
        cli_json_escape (out, key->id (p));
      else
        json_number (out, key->number (r, p));
    }
}

static void
json_candidate (GString *out, const RugosaSizing *s, guint i)
{
  const RugosaSizingCandidate *c = &s->candidates[i];
  const RugosaOperatingPoint *p = &c->results.points[RUGOSA_FLOW_DESIGN];
  const RgPipeCatalog *cat = rg_pipe_catalog_at (c->pipe->catalog);

  g_string_append (out, "\n    {\"designation\": ");
  cli_json_escape (out, c->pipe->designation);
  g_string_append (out, ", \"catalog\": ");
  cli_json_escape (out, cat->name);
  g_string_append (out, ", \"outside_diameter_m\": ");
  json_number (out, c->pipe->outside_diameter_m);
  g_string_append (out, ", \"wall_m\": ");
  json_number (out, c->pipe->wall_m);
  if (!c->results.ok || !p->ok)
    {
      g_string_append (out, ",\n     \"error\": ");
      cli_json_escape (out, c->results.ok ? p->error : c->results.error);
      g_string_append (out, ", \"passes\": false, \"passes_new\": false, \"breaks\": [], \"breaks_new\": []}");
      return;
    }
  json_point_keys (out, &c->results, p, candidate_keys, G_N_ELEMENTS (candidate_keys), "\n     ");
  if (s->age_years > 0.0)
    {
      RugosaOperatingPoint when_new = *p;

      /* the same keys of the pipe when new */
      when_new.result = p->result_new;
      g_string_append (out, ",\n     \"new\": {\"service_age_years\": 0");
      json_point_keys (out, &c->results, &when_new, new_keys, G_N_ELEMENTS (new_keys), " ");
      g_string_append_c (out, '}');
    }
  g_string_append_printf (out, ",\n     \"passes\": %s, \"passes_new\": %s, \"breaks\": ",
                          c->passes ? "true" : "false", c->broken_new == 0 ? "true" : "false");
  json_limit_ids (out, c->broken_new | c->broken_aged);
  g_string_append (out, ", \"breaks_new\": ");
  json_limit_ids (out, c->broken_new);
  g_string_append_c (out, '}');
}

static void
format_json (GString *out, const RugosaSizing *s, const char *material_id)
{
  const double values[RUGOSA_N_LIMITS] = {
    s->limits.velocity_max, s->limits.velocity_min, s->limits.gradient_max, s->limits.head_loss_max
  };
  gboolean first = TRUE;

  g_string_append (out, "{\n  \"service_age_years\": ");
  json_number (out, s->age_years);
  g_string_append (out, ",\n  \"material\": ");
  cli_json_escape (out, material_id);
  g_string_append (out, ",\n  \"catalogs\": [");
  /* the catalogs tried, in catalog order */
  for (int k = 0; k < rg_pipe_catalog_count (); k++)
    for (guint i = 0; i < s->n_candidates; i++)
      if (s->candidates[i].pipe->catalog == k)
        {
          g_string_append (out, first ? "" : ", ");
          cli_json_escape (out, rg_pipe_catalog_at (k)->name);
          first = FALSE;
          break;
        }
  g_string_append (out, "],\n  \"limits\": {");
  first = TRUE;
  for (guint b = 0; b < RUGOSA_N_LIMITS; b++)
    {
      g_autofree char *key = limit_json_key ((RugosaLimit) (1u << b));

      /* a lowest velocity or head loss of 0 is none */
      if (values[b] <= 0.0)
        continue;
      g_string_append_printf (out, "%s\"%s\": ", first ? "" : ", ", key);
      json_number (out, values[b]);
      first = FALSE;
    }
  g_string_append (out, "},\n  \"candidates\": [");
  for (guint i = 0; i < s->n_candidates; i++)
    {
      if (i > 0)
        g_string_append_c (out, ',');
      json_candidate (out, s, i);
    }
  g_string_append (out, s->n_candidates > 0 ? "\n  ],\n  \"recommended\": " : "],\n  \"recommended\": ");
  if (s->recommended >= 0)
    cli_json_escape (out, s->candidates[s->recommended].pipe->designation);
  else
    g_string_append (out, "null");
  g_string_append (out, ",\n  \"recommended_new\": ");
  if (s->recommended_new >= 0)
    cli_json_escape (out, s->candidates[s->recommended_new].pipe->designation);
  else
    g_string_append (out, "null");
  if (s->why_none != NULL)
    {
      g_string_append (out, ",\n  \"why_none\": ");
      cli_json_escape (out, s->why_none);
    }
  g_string_append (out, "\n}\n");
}

/* ---- table ---- */

static void
append_cell (GString *out, const char *text, int width)
{
  cli_pad (out, text, width);
  if ((int) g_utf8_strlen (text, -1) >= width)
    g_string_append_c (out, ' ');
}

static char *
ids_text (guint broken)
{
  GString *s = g_string_new (NULL);

  for (guint b = 0; b < RUGOSA_N_LIMITS; b++)
    if (broken & (1u << b))
      g_string_append_printf (s, "%s%s", s->len ? ", " : "", rugosa_limit_id ((RugosaLimit) (1u << b)));
  return g_string_free (s, FALSE);
}

static char *
in_unit_text (RugosaSettings *units, RugosaDisplayQuantity dq, double si)
{
  const RugosaDisplayInfo *info = rugosa_display_info (dq);
  double v = si;
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  (void) rg_units_from_si (info->quantity, si, rugosa_output_unit (units, dq), &v, NULL);
  return g_strdup (g_ascii_formatd (buf, sizeof buf, "%.4g", v));
}

static void
format_table (GString *out, const RugosaSizing *s, RugosaSettings *units)
{
  /* TRANSLATORS: column titles of rugosa-cli's size table */
  static const struct { const char *title; RugosaDisplayQuantity dq; int width; } cols[] = {
    { N_("ID"), RUGOSA_DISPLAY_DIAMETER, 10 },
    { N_("V"), RUGOSA_DISPLAY_VELOCITY, 10 },
    { N_("gradient"), RUGOSA_DISPLAY_GRADIENT, 18 },
    { N_("h total"), RUGOSA_DISPLAY_HEAD, 11 },
    { N_("h total new"), RUGOSA_DISPLAY_HEAD, 14 },
  };
  const gboolean aged = s->age_years > 0.0;
  int name_width = 4;

  for (guint i = 0; i < s->n_candidates; i++)
    name_width = MAX (name_width, (int) g_utf8_strlen (s->candidates[i].pipe->designation, -1));
  name_width += 2;
  {
    char buf[G_ASCII_DTOSTR_BUF_SIZE];
    g_autofree char *head = g_strdup_printf (_("Service age %s years; values at the design flow."),
                                             g_ascii_formatd (buf, sizeof buf, "%.4g", s->age_years));
    g_string_append_printf (out, "%s\n", head);
  }
  append_cell (out, "", 2);
  append_cell (out, _("size"), name_width);
  for (gsize k = 0; k < G_N_ELEMENTS (cols); k++)
    {
      g_autofree char *t = NULL;

      if (k == 4 && !aged)
        continue;
      t = g_strdup_printf ("%s %s", _(cols[k].title),
                           rugosa_display_unit_symbol (rugosa_output_unit (units, cols[k].dq)));
      append_cell (out, t, cols[k].width);
    }
  g_string_append_printf (out, "%s\n", _("verdict"));

  for (guint i = 0; i < s->n_candidates; i++)
    {
      const RugosaSizingCandidate *c = &s->candidates[i];
      const RugosaOperatingPoint *p = &c->results.points[RUGOSA_FLOW_DESIGN];

      append_cell (out, (int) i == s->recommended ? "*" : "", 2);
      append_cell (out, c->pipe->designation, name_width);
      if (!c->results.ok || !p->ok)
        {
          g_autofree char *e = g_strdup_printf (_("error: %s"), c->results.ok ? p->error : c->results.error);
          g_string_append_printf (out, "%s\n", e);
          continue;
        }
      {
        const double v[] = {
          c->results.inner_diameter_m, p->result.velocity_m_s, p->result.gradient_m_per_100m,
          p->result.head_loss_total_m, p->result_new.head_loss_total_m,
        };

        for (gsize k = 0; k < G_N_ELEMENTS (cols); k++)
          {
            g_autofree char *t = NULL;

            if (k == 4 && !aged)
              continue;
            t = in_unit_text (units, cols[k].dq, v[k]);
            append_cell (out, t, cols[k].width);
          }
      }
      {
        g_autofree char *ids = NULL;
        g_autofree char *verdict = NULL;

        if (c->passes)
          verdict = g_strdup (_("passes"));
        else if (c->broken_new != 0)
          {
            ids = ids_text (c->broken_new | c->broken_aged);
            /* TRANSLATORS: the limits a size breaks, by their option names */
            verdict = g_strdup_printf (_("breaks %s"), ids);
          }
        else
          {
            ids = ids_text (c->broken_aged);
            verdict = g_strdup_printf (_("breaks %s when aged"), ids);
          }
        g_string_append_printf (out, "%s\n", verdict);
      }
    }
  if (s->recommended >= 0)
    {
      char buf[G_ASCII_DTOSTR_BUF_SIZE];
      g_autofree char *line = g_strdup_printf (_("Recommended: %s, the smallest size within every limit, new and at %s years."),
                                               s->candidates[s->recommended].pipe->designation,
                                               g_ascii_formatd (buf, sizeof buf, "%.4g", s->age_years));
      g_string_append_printf (out, "%s\n", line);
    }
  else if (s->why_none != NULL)
    g_string_append_printf (out, "%s\n", s->why_none);
}

int
cli_cmd_size (int argc, char **argv)
{
  g_auto (CliArgs) args = { 0 };
  g_autoptr (GString) msg = g_string_new (NULL);
  g_autoptr (GString) out = g_string_new (NULL);
  g_autoptr (RugosaProject) project = rugosa_project_new ();
  g_autoptr (RugosaLine) duty = rugosa_line_new ("duty");
  g_autoptr (RugosaSettings) units = rugosa_settings_new ();
  g_autoptr (RugosaSizing) sizing = NULL;
  RugosaSettings *settings = rugosa_project_get_settings (project);
  RugosaLimits limits;
  RgError err = { 0 };
  const char *option = NULL, *fluid, *failed = NULL;
  int status;

  if (!cli_args_parse (&args, "size", size_options (), argc, argv, 2, msg))
    return cli_fail ("%s", msg->str);
  if (args.positional->len > 0)
    {
      g_autofree char *shown = cli_echo (g_ptr_array_index (args.positional, 0));
      return cli_fail (_("Unexpected argument \"%s\" for 'size'."), shown);
    }
  if (!cli_args_has (&args, "--flow"))
    return cli_fail (_("--flow is required: give the volumetric flow, e.g. --flow \"12 L/s\"."));
  if (!cli_args_has (&args, "--length"))
    return cli_fail (_("--length is required: give the line length, e.g. --length \"250 m\"."));
  if (!cli_args_has (&args, "--material"))
    return cli_fail (_("--material is required: the pipe material whose catalog sizes are tried (see 'rugosa-cli catalog materials')."));
  if (cli_args_has (&args, "--age") && !cli_args_has (&args, "--aging"))
    return cli_fail (_("--age needs --aging: a growth-rate class (see 'rugosa-cli catalog aging') or a rate such as \"0.05 mm/yr\"."));
  if ((fluid = cli_args_get (&args, "--fluid")) == NULL)
    return cli_fail (_("--fluid is required: water, seawater, oil, air or custom."));

  if ((status = cli_set_fluid (&args, fluid, duty)) != CLI_EXIT_OK)
    return status;
  if (!cli_apply_field_options (&args, FALSE, duty, settings, &option, &err))
    return cli_fail_option (option, err.text);
  if (rugosa_settings_check (settings, &failed, &err) != RG_OK)
    return cli_fail_subjects (&args, err.subjects | rugosa_field_find (failed)->subjects, err.text);
  rugosa_limits_from_settings (&limits, settings);
  if (!read_head_loss (&args, &limits.head_loss_max, &err))
    return cli_fail_option ("--max-head-loss", err.text);

  sizing = rugosa_sizing_run (project, duty, rugosa_line_get_material_id (duty),
                              cli_args_get (&args, "--catalog"), &limits, -1.0, &err);
  if (sizing == NULL)
    {
      /* a catalog name that chooses nothing names the pipe */
      if (err.subjects & RG_SUBJECT_BIT (RG_SUBJECT_PIPE))
        return cli_fail_option ("--catalog", err.text);
      return cli_fail_subjects (&args, err.subjects, err.text);
    }

  if (cli_args_has (&args, "--json"))
    format_json (out, sizing, rugosa_line_get_material_id (duty));
  else
    format_table (out, sizing, units);
  return cli_write_stdout (out->str);
}
