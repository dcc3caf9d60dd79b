/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The friction command: the Darcy friction factor of one point. */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <math.h>
#include <stdio.h>

#include "cli.h"
#include "core/friction.h"
#include "core/regime.h"

/* ---- friction ---------------------------------------------------------- */

static gboolean
parse_model (const CliArgs *args, RgFrictionModel *model, RgError *err)
{
  const char *id = cli_args_get (args, "--model");

  *model = RG_FRICTION_COLEBROOK;
  if (id == NULL)
    return TRUE;
  return rg_friction_model_from_id (id, model, err) == RG_OK;
}

static const CliOption friction_options[] = {
  { "--re", TRUE, FALSE },
  { "--rr", TRUE, FALSE },
  { "--model", TRUE, FALSE },
  { "--json", FALSE, FALSE },
  { NULL, FALSE, FALSE },
};

int
cli_cmd_friction (int argc, char **argv)
{
  g_auto (CliArgs) args = { 0 };
  g_autoptr (GString) msg = g_string_new (NULL);
  g_autoptr (GString) out = g_string_new (NULL);
  RgError err = { 0 };
  RgFrictionModel model;
  RgFrictionPoint pt;
  const char *re_text, *rr_text;
  double re, rr;

  /* The unit options are taken for the same command line to work on every
   * command; the friction factor's inputs and results have no unit. */
  if (!cli_args_parse (&args, "friction", cli_options_with_units (friction_options),
                       argc, argv, 2, msg))
    return cli_fail ("%s", msg->str);
  {
    g_autoptr (RugosaSettings) units = rugosa_settings_new ();

    if (!cli_apply_units (&args, units))
      return CLI_EXIT_USAGE;
  }
  if (args.positional->len > 0)
    {
      g_autofree char *shown = cli_echo (g_ptr_array_index (args.positional, 0));
      return cli_fail (_("Unexpected argument \"%s\" for 'friction'."), shown);
    }
  if ((re_text = cli_require (&args, "--re", _("give the Reynolds number, e.g. --re 1e5"), msg)) == NULL
      || (rr_text = cli_require (&args, "--rr", _("give the relative roughness ε/D, e.g. --rr 0.0002"), msg)) == NULL)
    return cli_fail ("%s", msg->str);
  if (!cli_parse_number ("--re", re_text, &re, msg)
      || !cli_parse_number ("--rr", rr_text, &rr, msg))
    return cli_fail ("%s", msg->str);
  if (!(re > 0.0 && re <= RG_FRICTION_RE_MAX))
    return cli_fail (_("--re must lie between 0 (exclusive) and %g."), RG_FRICTION_RE_MAX);
  if (!(rr >= 0.0 && rr <= RG_FRICTION_RR_MAX))
    return cli_fail (_("--rr must lie between 0 and %g."), RG_FRICTION_RR_MAX);
  if (!parse_model (&args, &model, &err))
    return cli_fail_option ("--model", err.text);
  if (rg_friction_point (model, NULL, re, rr, &pt, &err) != RG_OK)
    return cli_fail_error (&err);

  if (cli_args_has (&args, "--json"))
    {
      CliJson json;
      cli_json_begin (&json, out);
      cli_json_number (&json, "friction_factor", pt.f);
      cli_json_string (&json, "model", rg_friction_model_id (model));
      cli_json_number (&json, "reynolds", re);
      cli_json_number (&json, "relative_roughness", rr);
      cli_json_string (&json, "regime", rg_regime_id (pt.regime));
      if (pt.has_laminar)
        cli_json_number (&json, "friction_factor_laminar", pt.f_laminar);
      if (pt.regime == RG_REGIME_TURBULENT)
        {
          cli_json_string (&json, "roughness_zone", rg_roughness_zone_id (pt.zone));
          cli_json_number (&json, "roughness_reynolds", pt.eps_plus);
        }
      cli_json_number (&json, "roughness_elasticity", pt.roughness_elasticity);
      cli_json_end (&json);
    }
  else
    {
      char buf[G_ASCII_DTOSTR_BUF_SIZE];
      /* f first, alone on the first line, with 17 significant digits */
      g_string_append_printf (out, "%s\n", cli_format_exact (pt.f, buf, sizeof buf));
      cli_table_row (out, _("model"), rg_friction_model_title (model), NULL);
      cli_table_row (out, _("regime"), rg_regime_id (pt.regime), NULL);
      if (pt.has_laminar)
        cli_table_number (out, _("laminar value (64/Re)"), pt.f_laminar, NULL);
      if (pt.regime == RG_REGIME_TURBULENT)
        {
          cli_table_row (out, _("roughness zone"), rg_roughness_zone_id (pt.zone), NULL);
          cli_table_number (out, _("roughness Reynolds ε⁺"), pt.eps_plus, NULL);
        }
      cli_table_number (out, _("∂ln f/∂ln(ε/D)"), pt.roughness_elasticity, NULL);
    }
  return cli_write_stdout (out->str);
}

