/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The computation commands: friction, fluid, line. */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <math.h>
#include <stdio.h>
#include <string.h>

#include "cli.h"
#include "core/aging.h"
#include "core/catalog.h"
#include "core/fittings.h"
#include "core/fluid.h"
#include "core/line.h"
#include "core/units.h"

static int
finish_output (GString *out)
{
  return cli_write_stdout (out->str);
}

/* The units of the values in the core's sentences (RgError.units,
 * RgWarnings.units): for each quantity the unit the user typed last, else
 * the unit the table shows it in, else SI.  The process runs one command,
 * so one table serves it. */
static RgUnitChoice cli_units = {
  .unit = {
    [RG_QTY_TEMPERATURE] = "°C",
    [RG_QTY_PRESSURE] = "kPa",
    [RG_QTY_ROUGHNESS] = "mm",
  },
};

/* Remembers the unit of `text`, a value of q the core has just read: the
 * longest ending of the text after a digit that is a unit of q. */
static void
remember_unit (RgQuantity q, const char *text)
{
  gboolean digit = FALSE;

  for (const char *p = text; p != NULL && *p != '\0'; p++)
    {
      double x;

      if (digit && *p != ' ' && !g_ascii_isdigit (*p)
          && rg_units_to_si (q, 1.0, p, &x, NULL) == RG_OK)
        {
          cli_units.unit[q] = p;
          return;
        }
      digit |= g_ascii_isdigit (*p);
    }
}

static gboolean
parse_quantity (const CliArgs *args, const char *name, RgQuantity q,
                double *si, RgError *err)
{
  const char *text = cli_args_get (args, name);

  if (rg_units_parse (q, name, text, si, err) != RG_OK)
    return FALSE;
  remember_unit (q, text);
  return TRUE;
}

/* A quantity that must be greater than zero (or, with allow_zero, not
 * negative); the sentence names the option, as the core cannot. */
static gboolean
parse_positive (const CliArgs *args, const char *name, RgQuantity q,
                gboolean allow_zero, const char *example, double *si,
                RgError *err)
{
  if (!parse_quantity (args, name, q, si, err))
    return FALSE;
  if (allow_zero ? *si < 0.0 : *si <= 0.0)
    {
      rg_error_set (err, RG_ERR_DOMAIN, "%s must be %s, e.g. %s \"%s\".", name,
                    allow_zero ? _("zero or greater") : _("greater than zero"), name, example);
      return FALSE;
    }
  return TRUE;
}

/* The option of `line` and `fluid` that sets the input a core error is
 * about (RgError.subjects), or NULL when no option does.  Where two
 * options can set the same input (--diameter or --pipe, --roughness or
 * --material) the one given wins; the options of optional inputs are named
 * only when given.  One small table, so that it can later come from the
 * field table of a line option. */
static const char *
subject_option (RgSubject subject, const CliArgs *args)
{
  static const struct
  {
    const char *option, *or_option;
    RgSubject subject;
    gboolean only_if_given;
  } options[] = {
    { "--flow", NULL, RG_SUBJECT_FLOW, FALSE },
    { "--diameter", "--pipe", RG_SUBJECT_DIAMETER, FALSE },
    { "--length", NULL, RG_SUBJECT_LENGTH, FALSE },
    { "--roughness", "--material", RG_SUBJECT_ROUGHNESS, FALSE },
    { "--elevation", NULL, RG_SUBJECT_ELEVATION, TRUE },
    { "--fitting", NULL, RG_SUBJECT_FITTING, TRUE },
    { "--k-sum", NULL, RG_SUBJECT_K_SUM, TRUE },
    { "--material", NULL, RG_SUBJECT_MATERIAL, FALSE },
    { "--pipe", NULL, RG_SUBJECT_PIPE, FALSE },
    { "--aging", NULL, RG_SUBJECT_AGING_CLASS, FALSE },
    { "--aging", NULL, RG_SUBJECT_AGING_RATE, TRUE },
    { "--age", NULL, RG_SUBJECT_AGE, TRUE },
    { "--fluid", NULL, RG_SUBJECT_FLUID, FALSE },
    { "--temperature", NULL, RG_SUBJECT_TEMPERATURE, FALSE },
    { "--pressure", NULL, RG_SUBJECT_PRESSURE, FALSE },
    { "--salinity", NULL, RG_SUBJECT_SALINITY, FALSE },
    { "--density", NULL, RG_SUBJECT_DENSITY, FALSE },
    { "--viscosity", NULL, RG_SUBJECT_VISCOSITY, FALSE },
    { "--oil-t1", NULL, RG_SUBJECT_OIL_T1, FALSE },
    { "--oil-nu1", NULL, RG_SUBJECT_OIL_NU1, FALSE },
    { "--oil-t2", NULL, RG_SUBJECT_OIL_T2, FALSE },
    { "--oil-nu2", NULL, RG_SUBJECT_OIL_NU2, FALSE },
    { "--oil-density", NULL, RG_SUBJECT_OIL_DENSITY_REF, FALSE },
    { "--oil-density-t", NULL, RG_SUBJECT_OIL_T_REF, FALSE },
    { "--oil-expansion", NULL, RG_SUBJECT_OIL_EXPANSION, FALSE },
    { "--model", NULL, RG_SUBJECT_MODEL, FALSE },
    { "--re-laminar-max", NULL, RG_SUBJECT_RE_LAMINAR_MAX, FALSE },
    { "--re-turbulent-min", NULL, RG_SUBJECT_RE_TURBULENT_MIN, FALSE },
    { "--re", NULL, RG_SUBJECT_REYNOLDS, TRUE },
    { "--rr", NULL, RG_SUBJECT_RELATIVE_ROUGHNESS, TRUE },
  };

  for (gsize i = 0; i < G_N_ELEMENTS (options); i++)
    if (options[i].subject == subject)
      {
        if (options[i].or_option != NULL && cli_args_has (args, options[i].or_option)
            && !cli_args_has (args, options[i].option))
          return options[i].or_option;
        if (options[i].only_if_given && !cli_args_has (args, options[i].option))
          return NULL;
        return options[i].option;
      }
  return NULL;
}

/* Whether `text` names `option` as a whole word ("--oil-density" is not
 * named by "--oil-density-t"). */
static gboolean
names_option (const char *text, const char *option)
{
  const size_t n = strlen (option);

  for (const char *p = strstr (text, option); p != NULL; p = strstr (p + 1, option))
    if (!g_ascii_isalnum (p[n]) && p[n] != '-')
      return TRUE;
  return FALSE;
}

/* The core's sentences name a quantity ("the salinity"), in the user's
 * language, not the option that set it: add the options of the error's
 * subjects the sentence does not name yet, so the user knows what to
 * change. */
static int
fail_naming_option (const RgError *err, const CliArgs *args)
{
  g_autoptr (GString) options = g_string_new (NULL);
  const char *text = err->text;
  size_t len = strlen (text);

  for (int s = RG_SUBJECT_NONE + 1; s < RG_SUBJECT_N; s++)
    {
      const char *option;

      if ((err->subjects & RG_SUBJECT_BIT (s)) == 0
          || (option = subject_option ((RgSubject) s, args)) == NULL
          || names_option (text, option) || names_option (options->str, option))
        continue;
      if (options->len > 0)
        g_string_append (options, ", ");
      g_string_append (options, option);
    }
  if (options->len == 0 || len == 0 || text[len - 1] != '.')
    return cli_fail_error (err);
  return cli_fail (_("%.*s; check %s."), (int) (len - 1), text, options->str);
}

static gboolean
parse_model (const CliArgs *args, RgFrictionModel *model, RgError *err)
{
  const char *id = cli_args_get (args, "--model");

  *model = RG_FRICTION_COLEBROOK;
  if (id == NULL)
    return TRUE;
  return rg_friction_model_from_id (id, model, err) == RG_OK;
}

/* ---- friction ---------------------------------------------------------- */

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

  if (!cli_args_parse (&args, "friction", friction_options, argc, argv, 2, msg))
    return cli_fail ("%s", msg->str);
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
    return fail_naming_option (&err, &args);
  if (rg_friction_point (model, NULL, re, rr, &pt, &err) != RG_OK)
    return fail_naming_option (&err, &args);

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
  return finish_output (out);
}

/* ---- fluids ------------------------------------------------------------ */

#define FLUID_OPTIONS \
  { "--temperature", TRUE, FALSE }, \
  { "--pressure", TRUE, FALSE }, \
  { "--salinity", TRUE, FALSE }, \
  { "--density", TRUE, FALSE }, \
  { "--viscosity", TRUE, FALSE }, \
  { "--oil-nu1", TRUE, FALSE }, \
  { "--oil-t1", TRUE, FALSE }, \
  { "--oil-nu2", TRUE, FALSE }, \
  { "--oil-t2", TRUE, FALSE }, \
  { "--oil-density", TRUE, FALSE }, \
  { "--oil-density-t", TRUE, FALSE }, \
  { "--oil-expansion", TRUE, FALSE }

/* Fills `spec` for the fluid `kind_text` from the options.  Unused options
 * of another fluid are refused, so a typo cannot pass unnoticed. */
static gboolean
fluid_from_args (const CliArgs *args, const char *kind_text, RgFluidSpec *spec,
                 RgError *err)
{
  static const char *const per_kind[RG_FLUID_N_KINDS][8] = {
    [RG_FLUID_WATER] = { "--temperature", "--pressure" },
    [RG_FLUID_CUSTOM] = { "--density", "--viscosity" },
    [RG_FLUID_SEAWATER] = { "--temperature", "--pressure", "--salinity" },
    [RG_FLUID_OIL] = { "--temperature", "--oil-nu1", "--oil-t1", "--oil-nu2",
                       "--oil-t2", "--oil-density", "--oil-density-t",
                       "--oil-expansion" },
    [RG_FLUID_AIR] = { "--temperature", "--pressure" },
  };
  static const char *const all[] = {
    "--temperature", "--pressure", "--salinity", "--density", "--viscosity",
    "--oil-nu1", "--oil-t1", "--oil-nu2", "--oil-t2", "--oil-density",
    "--oil-density-t", "--oil-expansion",
  };
  RgFluidKind kind;

  if (rg_fluid_kind_from_id (kind_text, &kind, err) != RG_OK)
    return FALSE;
  rg_fluid_spec_init (spec, kind);

  for (gsize i = 0; i < G_N_ELEMENTS (all); i++)
    {
      gboolean allowed = FALSE;
      if (!cli_args_has (args, all[i]))
        continue;
      for (int j = 0; j < 8 && per_kind[kind][j] != NULL; j++)
        allowed |= g_str_equal (per_kind[kind][j], all[i]);
      if (!allowed)
        {
          rg_error_set (err, RG_ERR_DOMAIN, "%s does not apply to the fluid '%s'.",
                        all[i], rg_fluid_kind_id (kind));
          return FALSE;
        }
    }

  switch (kind)
    {
    case RG_FLUID_CUSTOM:
      {
        const char *visc = cli_args_get (args, "--viscosity");
        int kinematic = 0;
        double mu;
        if (!cli_args_has (args, "--density") || visc == NULL)
          {
            rg_error_set (err, RG_ERR_DOMAIN,
                          "A custom fluid needs --density (e.g. \"998 kg/m3\") and --viscosity (dynamic, e.g. \"1 cP\", or kinematic, e.g. \"1 cSt\").");
            return FALSE;
          }
        if (!parse_quantity (args, "--density", RG_QTY_DENSITY, &spec->density_kg_m3, err))
          return FALSE;
        if (rg_units_parse_viscosity ("--viscosity", visc, &mu, &kinematic, err) != RG_OK)
          return FALSE;
        remember_unit (kinematic ? RG_QTY_KIN_VISCOSITY : RG_QTY_DYN_VISCOSITY, visc);
        spec->viscosity_pa_s = kinematic ? mu * spec->density_kg_m3 : mu;
        return TRUE;
      }
    case RG_FLUID_OIL:
      {
        static const struct { const char *name; RgQuantity q; gboolean required; gsize offset; } oil[] = {
          { "--oil-nu1", RG_QTY_KIN_VISCOSITY, TRUE, G_STRUCT_OFFSET (RgFluidSpec, oil_nu1_m2_s) },
          { "--oil-t1", RG_QTY_TEMPERATURE, TRUE, G_STRUCT_OFFSET (RgFluidSpec, oil_t1_k) },
          { "--oil-nu2", RG_QTY_KIN_VISCOSITY, TRUE, G_STRUCT_OFFSET (RgFluidSpec, oil_nu2_m2_s) },
          { "--oil-t2", RG_QTY_TEMPERATURE, TRUE, G_STRUCT_OFFSET (RgFluidSpec, oil_t2_k) },
          { "--oil-density", RG_QTY_DENSITY, TRUE, G_STRUCT_OFFSET (RgFluidSpec, oil_density_ref_kg_m3) },
          { "--oil-density-t", RG_QTY_TEMPERATURE, FALSE, G_STRUCT_OFFSET (RgFluidSpec, oil_t_ref_k) },
        };
        for (gsize i = 0; i < G_N_ELEMENTS (oil); i++)
          {
            if (!cli_args_has (args, oil[i].name))
              {
                if (!oil[i].required)
                  continue;
                rg_error_set (err, RG_ERR_DOMAIN,
                              "An oil needs --oil-nu1 and --oil-t1, --oil-nu2 and --oil-t2 (two kinematic viscosities at two temperatures) and --oil-density; %s is missing.",
                              oil[i].name);
                return FALSE;
              }
            if (!parse_quantity (args, oil[i].name, oil[i].q,
                                 G_STRUCT_MEMBER_P (spec, oil[i].offset), err))
              return FALSE;
          }
        if (cli_args_has (args, "--oil-expansion"))
          {
            g_autoptr (GString) m = g_string_new (NULL);
            if (!cli_parse_number ("--oil-expansion (per kelvin, e.g. 0.00064)",
                                   cli_args_get (args, "--oil-expansion"),
                                   &spec->oil_expansion_per_k, m))
              {
                rg_error_set (err, RG_ERR_PARSE, "%s", m->str);
                return FALSE;
              }
          }
      }
      break;
    case RG_FLUID_WATER:
    case RG_FLUID_SEAWATER:
    case RG_FLUID_AIR:
    case RG_FLUID_N_KINDS:
    default:
      break;
    }

  if (kind != RG_FLUID_CUSTOM)
    {
      if (!cli_args_has (args, "--temperature"))
        {
          rg_error_set (err, RG_ERR_DOMAIN,
                        "--temperature is required for %s: e.g. --temperature \"20 C\".",
                        rg_fluid_kind_id (kind));
          return FALSE;
        }
      if (!parse_quantity (args, "--temperature", RG_QTY_TEMPERATURE, &spec->temperature_k, err))
        return FALSE;
    }
  if (cli_args_has (args, "--pressure")
      && !parse_quantity (args, "--pressure", RG_QTY_PRESSURE, &spec->pressure_pa, err))
    return FALSE;
  if (kind == RG_FLUID_SEAWATER)
    {
      if (!cli_args_has (args, "--salinity"))
        {
          rg_error_set (err, RG_ERR_DOMAIN,
                        "--salinity is required for seawater: e.g. --salinity \"35 g/kg\".");
          return FALSE;
        }
      if (!parse_quantity (args, "--salinity", RG_QTY_SALINITY, &spec->salinity_kg_kg, err))
        return FALSE;
    }
  return TRUE;
}

static const CliOption fluid_options[] = {
  FLUID_OPTIONS,
  { "--json", FALSE, FALSE },
  { NULL, FALSE, FALSE },
};

int
cli_cmd_fluid (int argc, char **argv)
{
  g_auto (CliArgs) args = { 0 };
  g_autoptr (GString) msg = g_string_new (NULL);
  g_autoptr (GString) out = g_string_new (NULL);
  RgError err = { .units = &cli_units };
  RgWarnings warnings = { .units = &cli_units };
  RgFluidSpec spec;
  RgFluidProps props;

  if (!cli_args_parse (&args, "fluid", fluid_options, argc, argv, 2, msg))
    return cli_fail ("%s", msg->str);
  if (args.positional->len != 1)
    return cli_fail (_("'fluid' needs exactly one fluid name: water, seawater, oil, air or custom."));
  if (!fluid_from_args (&args, g_ptr_array_index (args.positional, 0), &spec, &err))
    return fail_naming_option (&err, &args);
  rg_warnings_clear (&warnings);
  if (rg_fluid_properties (&spec, &props, &warnings, &err) != RG_OK)
    return fail_naming_option (&err, &args);

  if (cli_args_has (&args, "--json"))
    {
      CliJson json;
      const char *w[RG_WARNINGS_MAX];
      for (int i = 0; i < warnings.count; i++)
        w[i] = warnings.text[i];
      cli_json_begin (&json, out);
      cli_json_number (&json, "density_kg_m3", props.density_kg_m3);
      cli_json_number (&json, "dynamic_viscosity_Pa_s", props.dynamic_viscosity_pa_s);
      cli_json_number (&json, "kinematic_viscosity_m2_s", props.kinematic_viscosity_m2_s);
      if (warnings.count > 0)
        cli_json_string_array (&json, "warnings", w, warnings.count);
      cli_json_end (&json);
    }
  else
    {
      cli_table_number (out, _("density"), props.density_kg_m3, "kg/m³");
      cli_table_number (out, _("dynamic viscosity"), props.dynamic_viscosity_pa_s, "Pa·s");
      cli_table_number (out, _("kinematic viscosity"), props.kinematic_viscosity_m2_s, "m²/s");
      for (int i = 0; i < warnings.count; i++)
        g_string_append_printf (out, _("warning: %s\n"), warnings.text[i]);
    }
  return finish_output (out);
}

/* ---- line -------------------------------------------------------------- */

static const CliOption line_options[] = {
  { "--flow", TRUE, FALSE },
  { "--diameter", TRUE, FALSE },
  { "--pipe", TRUE, FALSE },
  { "--length", TRUE, FALSE },
  { "--roughness", TRUE, FALSE },
  { "--material", TRUE, FALSE },
  { "--age", TRUE, FALSE },
  { "--aging", TRUE, FALSE },
  { "--fitting", TRUE, TRUE },
  { "--k-sum", TRUE, FALSE },
  { "--elevation", TRUE, FALSE },
  { "--model", TRUE, FALSE },
  { "--re-laminar-max", TRUE, FALSE },
  { "--re-turbulent-min", TRUE, FALSE },
  { "--fluid", TRUE, FALSE },
  FLUID_OPTIONS,
  { "--json", FALSE, FALSE },
  { NULL, FALSE, FALSE },
};

/* "NAME", "NAME x3", "NAMEx3", "NAME*3", "K=0.5", "K=0.5 x2". */
static gboolean
parse_fitting (const char *text, RgFittingUse *use, RgError *err)
{
  g_autofree char *s = g_strstrip (g_strdup (text));
  g_autofree char *name = NULL;
  double count = 1.0;
  char *sep = NULL;

  for (char *p = s + strlen (s); p > s; p--)
    {
      if (!g_ascii_isdigit (p[-1]) && p[-1] != '.')
        {
          if ((p[-1] == 'x' || p[-1] == 'X' || p[-1] == '*') && *p != '\0')
            sep = p - 1;
          break;
        }
    }
  if (sep != NULL && sep > s)
    {
      g_autoptr (GString) m = g_string_new (NULL);
      if (!cli_parse_number ("--fitting count", sep + 1, &count, m))
        {
          rg_error_set (err, RG_ERR_PARSE, "%s", m->str);
          return FALSE;
        }
      if (!(count >= 1.0 && count <= 10000.0 && count == floor (count)))
        {
          g_autofree char *shown = cli_echo (text);
          rg_error_set (err, RG_ERR_DOMAIN,
                        "--fitting \"%s\": the count must be a whole number from 1 to 10000.", shown);
          return FALSE;
        }
      name = g_strstrip (g_strndup (s, (gsize) (sep - s)));
    }
  else
    name = g_strdup (s);

  use->count = count;
  use->fitting = NULL;
  use->k_plain = 0.0;
  if (g_ascii_strncasecmp (name, "K=", 2) == 0 || g_ascii_strncasecmp (name, "K ", 2) == 0)
    {
      g_autoptr (GString) m = g_string_new (NULL);
      if (!cli_parse_number ("--fitting K", name + 2, &use->k_plain, m))
        {
          rg_error_set (err, RG_ERR_PARSE, "%s", m->str);
          return FALSE;
        }
      if (!(use->k_plain >= 0.0 && use->k_plain <= 1.0e4))
        {
          g_autofree char *shown = cli_echo (text);
          rg_error_set (err, RG_ERR_DOMAIN,
                        "--fitting \"%s\": a plain K must lie between 0 and 10000.", shown);
          return FALSE;
        }
      return TRUE;
    }
  return rg_fitting_lookup (name, &use->fitting, err) == RG_OK;
}

/* Age in years: a bare number is years; "10 yr" and other times convert. */
static gboolean
parse_age (const char *text, double *years, RgError *err)
{
  g_autoptr (GString) m = g_string_new (NULL);
  double si;

  if (cli_parse_number ("--age", text, years, m))
    ;
  else if (rg_units_parse (RG_QTY_TIME, "--age", text, &si, err) == RG_OK)
    rg_units_from_si (RG_QTY_TIME, si, "yr", years, err);
  else
    return FALSE;
  if (!(*years >= 0.0 && *years <= 200.0))
    {
      rg_error_set (err, RG_ERR_DOMAIN, "%s", _("--age must lie between 0 and 200 years."));
      return FALSE;
    }
  return TRUE;
}

/* A class of the aging catalog, or a rate ("0.05 mm/yr"). */
static gboolean
parse_aging (const char *text, double *rate_m_per_year, RgError *err)
{
  const RgAgingClass *klass;
  RgError lookup_err = { 0 };
  double si;

  if (rg_aging_class_lookup (text, &klass, &lookup_err) == RG_OK)
    {
      *rate_m_per_year = klass->rate_m_per_year;
      return TRUE;
    }
  /* Not a class: a rate with a unit, or else the class error stands. */
  if (strpbrk (text, "0123456789") == NULL)
    {
      *err = lookup_err;
      return FALSE;
    }
  if (rg_units_parse (RG_QTY_ROUGHNESS_RATE, "--aging", text, &si, err) != RG_OK)
    return FALSE;
  if (rg_units_from_si (RG_QTY_ROUGHNESS_RATE, si, "mm/yr", rate_m_per_year, err) != RG_OK)
    return FALSE;
  *rate_m_per_year *= 1.0e-3; /* mm -> m */
  if (!(*rate_m_per_year >= 0.0 && *rate_m_per_year <= 0.01))
    {
      rg_error_set (err, RG_ERR_DOMAIN,
                    "--aging must be a growth rate between 0 and 10 mm/yr, or a class name.");
      return FALSE;
    }
  return TRUE;
}

int
cli_cmd_line (int argc, char **argv)
{
  g_auto (CliArgs) args = { 0 };
  g_autoptr (GString) msg = g_string_new (NULL);
  g_autoptr (GString) out = g_string_new (NULL);
  g_autoptr (GArray) uses = g_array_new (FALSE, TRUE, sizeof (RgFittingUse));
  RgError err = { .units = &cli_units };
  RgWarnings warnings = { .units = &cli_units };
  RgFluidSpec spec;
  RgFluidProps props;
  RgLineInput in;
  RgAgingResult aged;
  const RgPipe *pipe = NULL;
  const RgMaterial *material = NULL;
  const char *fluid;
  double age = 0.0, rate = 0.0, k_extra = 0.0, k_fittings = 0.0;

  rg_warnings_clear (&warnings);
  rg_line_input_init (&in);

  if (!cli_args_parse (&args, "line", line_options, argc, argv, 2, msg))
    return cli_fail ("%s", msg->str);
  if (args.positional->len > 0)
    {
      g_autofree char *shown = cli_echo (g_ptr_array_index (args.positional, 0));
      return cli_fail (_("Unexpected argument \"%s\" for 'line'."), shown);
    }

  /* Pipe: catalog designation or inner diameter (not both). */
  if (cli_args_has (&args, "--pipe") && cli_args_has (&args, "--diameter"))
    return cli_fail (_("Give either --pipe (a catalog designation) or --diameter (an inner diameter), not both."));
  if (cli_args_has (&args, "--pipe"))
    {
      if (rg_pipe_lookup (cli_args_get (&args, "--pipe"), &pipe, &err) != RG_OK)
        return fail_naming_option (&err, &args);
      in.diameter_m = pipe->inner_diameter_m;
    }
  else if (!cli_args_has (&args, "--diameter"))
    return cli_fail (_("--diameter is required (inner diameter, e.g. --diameter \"102.3 mm\"), or name a catalog pipe with --pipe \"NPS 4 Sch 40\"."));
  else if (!parse_positive (&args, "--diameter", RG_QTY_LENGTH, FALSE, "102.3 mm", &in.diameter_m, &err))
    return cli_fail_error (&err);

  /* Roughness: a value, a material, or the pipe's usual material. */
  if (cli_args_has (&args, "--roughness") && cli_args_has (&args, "--material"))
    return cli_fail (_("Give either --roughness (a value) or --material (a catalog name), not both."));
  if (cli_args_has (&args, "--roughness"))
    {
      if (!parse_positive (&args, "--roughness", RG_QTY_ROUGHNESS, TRUE, "0.045 mm", &in.roughness_m, &err))
        return cli_fail_error (&err);
    }
  else
    {
      const char *name = cli_args_get (&args, "--material");
      if (name == NULL && pipe != NULL)
        name = pipe->material_id;
      if (name == NULL)
        return cli_fail (_("--roughness is required (absolute roughness, e.g. --roughness \"0.045 mm\"), or name a catalog material with --material."));
      if (rg_material_lookup (name, &material, &err) != RG_OK)
        return fail_naming_option (&err, &args);
      in.roughness_m = material->roughness_m;
    }

  if (!cli_args_has (&args, "--flow"))
    return cli_fail (_("--flow is required: give the volumetric flow, e.g. --flow \"12 L/s\"."));
  if (!parse_positive (&args, "--flow", RG_QTY_FLOW, FALSE, "12 L/s", &in.flow_m3_s, &err))
    return cli_fail_error (&err);
  if (!cli_args_has (&args, "--length"))
    return cli_fail (_("--length is required: give the line length, e.g. --length \"250 m\"."));
  if (!parse_positive (&args, "--length", RG_QTY_LENGTH, FALSE, "250 m", &in.length_m, &err))
    return cli_fail_error (&err);
  /* Common practice (no single source): the longest pipelines run a few
   * thousand kilometres; a longer line is a typo or a wrong unit. */
  if (!(in.length_m <= 1.0e7))
    return cli_fail ("%s", _("--length must lie between 0 (exclusive) and 10000 km."));
  if (cli_args_has (&args, "--elevation")
      && !parse_quantity (&args, "--elevation", RG_QTY_LENGTH, &in.elevation_m, &err))
    return cli_fail_error (&err);
  /* Common practice (no single source): no pipeline rises or falls more
   * than the height of the highest mountain; a larger value is a typo. */
  if (!(fabs (in.elevation_m) <= 1.0e4))
    return cli_fail ("%s", _("--elevation must lie between -10000 m and 10000 m (outlet height minus inlet height)."));
  if (cli_args_has (&args, "--k-sum"))
    {
      if (!cli_parse_number ("--k-sum", cli_args_get (&args, "--k-sum"), &k_extra, msg))
        return cli_fail ("%s", msg->str);
      if (!(k_extra >= 0.0 && k_extra <= 1.0e5))
        return cli_fail (_("--k-sum must lie between 0 and 100000."));
    }
  if (!parse_model (&args, &in.model, &err))
    return fail_naming_option (&err, &args);
  if (cli_args_has (&args, "--re-laminar-max")
      && !cli_parse_number ("--re-laminar-max", cli_args_get (&args, "--re-laminar-max"),
                            &in.transition.re_laminar_max, msg))
    return cli_fail ("%s", msg->str);
  if (cli_args_has (&args, "--re-turbulent-min")
      && !cli_parse_number ("--re-turbulent-min", cli_args_get (&args, "--re-turbulent-min"),
                            &in.transition.re_turbulent_min, msg))
    return cli_fail ("%s", msg->str);

  /* Aging */
  if (cli_args_has (&args, "--age") && !cli_args_has (&args, "--aging"))
    return cli_fail (_("--age needs --aging: a growth-rate class (see 'rugosa-cli catalog aging') or a rate such as \"0.05 mm/yr\"."));
  if (cli_args_has (&args, "--age") && !parse_age (cli_args_get (&args, "--age"), &age, &err))
    return cli_fail_error (&err);
  if (cli_args_has (&args, "--aging") && !parse_aging (cli_args_get (&args, "--aging"), &rate, &err))
    return fail_naming_option (&err, &args);

  /* Fluid */
  if ((fluid = cli_args_get (&args, "--fluid")) == NULL)
    return cli_fail (_("--fluid is required: water, seawater, oil, air or custom."));
  if (!fluid_from_args (&args, fluid, &spec, &err))
    return fail_naming_option (&err, &args);
  if (rg_fluid_properties (&spec, &props, &warnings, &err) != RG_OK)
    return fail_naming_option (&err, &args);
  in.density_kg_m3 = props.density_kg_m3;
  in.viscosity_pa_s = props.dynamic_viscosity_pa_s;

  /* Fittings: 3-K values depend on the Reynolds number, which does not
   * depend on K, so a first evaluation gives Re for the fittings. */
  GPtrArray *fittings = cli_args_get_all (&args, "--fitting");
  for (guint i = 0; i < fittings->len; i++)
    {
      RgFittingUse use;
      if (!parse_fitting (g_ptr_array_index (fittings, i), &use, &err))
        return fail_naming_option (&err, &args);
      g_array_append_val (uses, use);
    }
  in.k_sum = k_extra;
  if (uses->len > 0)
    {
      RgLineResult first;
      if (rg_line_evaluate (&in, &first, &err) != RG_OK)
        {
          err.subjects = rg_fluid_subjects_behind (spec.kind, err.subjects);
          return fail_naming_option (&err, &args);
        }
      if (rg_fittings_k_sum_checked ((RgFittingUse *) uses->data, (int) uses->len,
                                     first.reynolds, in.diameter_m, &k_fittings,
                                     &warnings, &err) != RG_OK)
        return fail_naming_option (&err, &args);
      in.k_sum = k_extra + k_fittings;
    }

  if (rg_aging_evaluate (&in, rate, age, &aged, &err) != RG_OK)
    {
      /* the line took the fluid's density and viscosity as numbers */
      err.subjects = rg_fluid_subjects_behind (spec.kind, err.subjects);
      return fail_naming_option (&err, &args);
    }

  const RgLineResult *r = &aged.result;
  rg_friction_validity_warnings (in.model, r->reynolds, r->relative_roughness,
                                 &r->friction, &warnings);
  if (spec.kind == RG_FLUID_AIR && r->pressure_drop_pa > 0.1 * spec.pressure_pa)
    rg_warnings_add (&warnings,
                     "The pressure drop is %.1f %% of the inlet pressure: above 10 %% the incompressible model no longer holds for a gas.",
                     100.0 * r->pressure_drop_pa / spec.pressure_pa);

  if (cli_args_has (&args, "--json"))
    {
      CliJson json;
      const char *w[RG_WARNINGS_MAX];
      for (int i = 0; i < warnings.count; i++)
        w[i] = warnings.text[i];
      cli_json_begin (&json, out);
      cli_json_number (&json, "velocity_m_s", r->velocity_m_s);
      cli_json_number (&json, "reynolds", r->reynolds);
      cli_json_number (&json, "friction_factor", r->friction.f);
      if (r->friction.has_laminar)
        cli_json_number (&json, "friction_factor_laminar", r->friction.f_laminar);
      cli_json_string (&json, "regime", rg_regime_id (r->friction.regime));
      if (r->friction.regime == RG_REGIME_TURBULENT)
        cli_json_string (&json, "roughness_zone", rg_roughness_zone_id (r->friction.zone));
      cli_json_number (&json, "head_loss_major_m", r->head_loss_major_m);
      cli_json_number (&json, "head_loss_minor_m", r->head_loss_minor_m);
      cli_json_number (&json, "head_loss_total_m", r->head_loss_total_m);
      cli_json_number (&json, "pressure_drop_Pa", r->pressure_drop_pa);
      cli_json_number (&json, "gradient_m_per_100m", r->gradient_m_per_100m);
      cli_json_number (&json, "wall_shear_Pa", r->wall_shear_pa);
      cli_json_number (&json, "density_kg_m3", props.density_kg_m3);
      cli_json_number (&json, "dynamic_viscosity_Pa_s", props.dynamic_viscosity_pa_s);
      cli_json_number (&json, "roughness_elasticity", r->friction.roughness_elasticity);
      cli_json_number (&json, "inner_diameter_m", in.diameter_m);
      cli_json_number (&json, "roughness_m", aged.roughness_m);
      cli_json_number (&json, "roughness_new_m", in.roughness_m);
      cli_json_number (&json, "head_loss_ratio_to_new", aged.head_loss_ratio_to_new);
      cli_json_number (&json, "minor_loss_k_total", in.k_sum);
      cli_json_string_array (&json, "warnings", w, warnings.count);
      cli_json_end (&json);
    }
  else
    {
      if (pipe != NULL)
        cli_table_row (out, _("pipe"), pipe->designation, NULL);
      if (material != NULL)
        cli_table_row (out, _("material"), _(material->name), NULL);
      cli_table_number (out, _("inner diameter"), in.diameter_m * 1e3, "mm");
      cli_table_number (out, _("roughness"), aged.roughness_m * 1e3, "mm");
      if (age > 0.0)
        cli_table_number (out, _("roughness when new"), in.roughness_m * 1e3, "mm");
      cli_table_number (out, _("density"), props.density_kg_m3, "kg/m³");
      cli_table_number (out, _("dynamic viscosity"), props.dynamic_viscosity_pa_s, "Pa·s");
      cli_table_number (out, _("velocity"), r->velocity_m_s, "m/s");
      cli_table_number (out, _("Reynolds number"), r->reynolds, NULL);
      cli_table_number (out, _("relative roughness ε/D"), r->relative_roughness, NULL);
      cli_table_number (out, _("friction factor (Darcy)"), r->friction.f, NULL);
      if (r->friction.has_laminar)
        cli_table_number (out, _("laminar value (64/Re)"), r->friction.f_laminar, NULL);
      cli_table_row (out, _("regime"), rg_regime_id (r->friction.regime), NULL);
      if (r->friction.regime == RG_REGIME_TURBULENT)
        cli_table_row (out, _("roughness zone"), rg_roughness_zone_id (r->friction.zone), NULL);
      cli_table_number (out, _("head loss, pipe friction"), r->head_loss_major_m, "m");
      cli_table_number (out, _("head loss, fittings"), r->head_loss_minor_m, "m");
      cli_table_number (out, _("head loss, total"), r->head_loss_total_m, "m");
      cli_table_number (out, _("ΣK of fittings"), in.k_sum, NULL);
      cli_table_number (out, _("pressure drop (with Δz)"), r->pressure_drop_pa / 1e3, "kPa");
      cli_table_number (out, _("hydraulic gradient"), r->gradient_m_per_100m, "m/100 m");
      cli_table_number (out, _("wall shear stress"), r->wall_shear_pa, "Pa");
      cli_table_number (out, _("∂ln f/∂ln(ε/D)"), r->friction.roughness_elasticity, NULL);
      if (age > 0.0)
        cli_table_number (out, _("head loss relative to new"), aged.head_loss_ratio_to_new, NULL);
      for (int i = 0; i < warnings.count; i++)
        g_string_append_printf (out, _("warning: %s\n"), warnings.text[i]);
    }
  return finish_output (out);
}
