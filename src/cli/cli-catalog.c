/* SPDX-License-Identifier: GPL-3.0-or-later */
/* rugosa-cli catalog materials|pipes|fittings|fluids|aging [--json] */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <stdio.h>

#include "cli.h"
#include "core/aging.h"
#include "core/catalog.h"
#include "core/fittings.h"
#include "core/fluid.h"

static const CliOption catalog_options[] = {
  { "--json", FALSE, FALSE },
  { NULL, FALSE, FALSE },
};

static void
list_begin (GString *out, gboolean json)
{
  if (json)
    g_string_append (out, "[");
}

static void
item_begin (CliJson *json, GString *out, int index)
{
  if (index > 0)
    g_string_append (out, ",");
  g_string_append (out, "\n");
  cli_json_begin (json, out);
}

static void
item_end (CliJson *json, GString *out)
{
  cli_json_end (json);
  g_string_truncate (out, out->len - 1); /* the newline after "}" */
}

static void
list_end (GString *out, gboolean json)
{
  if (json)
    g_string_append (out, "\n]\n");
}

static void
materials (GString *out, gboolean json)
{
  char a[G_ASCII_DTOSTR_BUF_SIZE], b[G_ASCII_DTOSTR_BUF_SIZE], c[G_ASCII_DTOSTR_BUF_SIZE];

  list_begin (out, json);
  if (!json)
    g_string_append_printf (out, "%-28s %-44s %12s  %s\n", "id", "material",
                            "new (mm)", "published range (mm)");
  for (int i = 0; i < rg_material_count (); i++)
    {
      const RgMaterial *m = rg_material_at (i);
      if (json)
        {
          CliJson j;
          item_begin (&j, out, i);
          cli_json_string (&j, "id", m->id);
          cli_json_string (&j, "name", m->name);
          cli_json_number (&j, "roughness_m", m->roughness_m);
          cli_json_number (&j, "roughness_min_m", m->roughness_min_m);
          cli_json_number (&j, "roughness_max_m", m->roughness_max_m);
          cli_json_string (&j, "source", m->source);
          item_end (&j, out);
        }
      else
        {
          cli_pad (out, m->id, 28);
          g_string_append_c (out, ' ');
          cli_pad (out, _(m->name), 44);
          g_string_append_printf (out, " %12s  %s – %s\n",
                                cli_format_short (m->roughness_m * 1e3, a, sizeof a),
                                cli_format_short (m->roughness_min_m * 1e3, b, sizeof b),
                                cli_format_short (m->roughness_max_m * 1e3, c, sizeof c));
        }
    }
  list_end (out, json);
}

static void
pipes (GString *out, gboolean json)
{
  char a[G_ASCII_DTOSTR_BUF_SIZE], b[G_ASCII_DTOSTR_BUF_SIZE], c[G_ASCII_DTOSTR_BUF_SIZE];

  list_begin (out, json);
  if (!json)
    g_string_append_printf (out, "%-28s %-14s %10s %9s %10s\n", "designation", "standard",
                            "OD (mm)", "wall (mm)", "ID (mm)");
  for (int i = 0; i < rg_pipe_count (); i++)
    {
      const RgPipe *p = rg_pipe_at (i);
      if (json)
        {
          CliJson j;
          item_begin (&j, out, i);
          cli_json_string (&j, "designation", p->designation);
          cli_json_string (&j, "standard", p->standard);
          cli_json_string (&j, "nominal", p->nominal);
          cli_json_string (&j, "series", p->series);
          cli_json_string (&j, "material", p->material_id);
          cli_json_number (&j, "outside_diameter_m", p->outside_diameter_m);
          cli_json_number (&j, "wall_m", p->wall_m);
          cli_json_number (&j, "lining_m", p->lining_m);
          cli_json_number (&j, "inner_diameter_m", p->inner_diameter_m);
          cli_json_string (&j, "catalog", rg_pipe_catalog_at (p->catalog)->name);
          cli_json_string (&j, "source", p->source);
          item_end (&j, out);
        }
      else
        g_string_append_printf (out, "%-28s %-14s %10s %9s %10s\n", p->designation, p->standard,
                                cli_format_short (p->outside_diameter_m * 1e3, a, sizeof a),
                                cli_format_short (p->wall_m * 1e3, b, sizeof b),
                                cli_format_short (p->inner_diameter_m * 1e3, c, sizeof c));
    }
  list_end (out, json);
}

static void
fittings (GString *out, gboolean json)
{
  char a[G_ASCII_DTOSTR_BUF_SIZE], b[G_ASCII_DTOSTR_BUF_SIZE], c[G_ASCII_DTOSTR_BUF_SIZE];

  list_begin (out, json);
  if (!json)
    g_string_append_printf (out, "%-30s %-50s %-6s %8s %8s %8s\n", "id", "fitting", "method",
                            "K1", "Ki", "Kd");
  for (int i = 0; i < rg_fitting_count (); i++)
    {
      const RgFitting *f = rg_fitting_at (i);
      const gboolean crane = f->method == RG_FITTING_METHOD_CRANE_FT;
      if (json)
        {
          CliJson j;
          item_begin (&j, out, i);
          cli_json_string (&j, "id", f->id);
          cli_json_string (&j, "name", f->name);
          cli_json_string (&j, "method", crane ? "crane-ft" : "3k");
          if (crane)
            {
              /* No k1/ki/kd here: zeros would read as a lossless fitting. */
              cli_json_number (&j, "min_bore_m", f->min_bore_m);
              cli_json_string_array (&j, "band_nominal", f->band_nominal, f->n_bands);
              cli_json_number_array (&j, "band_max_bore_m", f->band_max_bore_m, f->n_bands);
              cli_json_number_array (&j, "band_n", f->band_n, f->n_bands);
            }
          else
            {
              cli_json_number (&j, "k1", f->k1);
              cli_json_number (&j, "ki", f->ki);
              cli_json_number (&j, "kd", f->kd);
            }
          cli_json_string (&j, "source", f->source);
          item_end (&j, out);
        }
      else
        {
          cli_pad (out, f->id, 30);
          g_string_append_c (out, ' ');
          cli_pad (out, _(f->name), 50);
          if (crane)
            {
              g_string_append (out, " Crane  n·f_T, n =");
              for (int k = 0; k < f->n_bands; k++)
                g_string_append_printf (out, "%s %s (%s)", k > 0 ? "," : "",
                                        cli_format_short (f->band_n[k], a, sizeof a),
                                        f->band_nominal[k]);
              g_string_append_c (out, '\n');
            }
          else
            g_string_append_printf (out, " 3-K    %8s %8s %8s\n",
                                    cli_format_short (f->k1, a, sizeof a),
                                    cli_format_short (f->ki, b, sizeof b),
                                    cli_format_short (f->kd, c, sizeof c));
        }
    }
  if (!json)
    {
      g_string_append (out, _("\n3-K: K = K1/Re + Ki·(1 + Kd/D^0.3), D the bore in inches (Darby 2001; Hooper 1981 for entrances and the exit)."));
      g_string_append (out, _("\nCrane: K = n·f_T, f_T = 0.25/[log10(ε/(3.7·D))]² with ε = 0.0018 in (clean commercial steel), n of the size band holding the bore; independent of Re (Crane TP-410, 2009)."));
      g_string_append (out, _("\nUse --fitting NAME[xCOUNT]; a plain coefficient as --fitting \"K=0.8x2\".\n"));
    }
  list_end (out, json);
}

static void
aging (GString *out, gboolean json)
{
  char a[G_ASCII_DTOSTR_BUF_SIZE];

  list_begin (out, json);
  if (!json)
    g_string_append_printf (out, "%-24s %-70s %12s\n", "id", "class", "rate (mm/yr)");
  for (int i = 0; i < rg_aging_class_count (); i++)
    {
      const RgAgingClass *k = rg_aging_class_at (i);
      if (json)
        {
          CliJson j;
          item_begin (&j, out, i);
          cli_json_string (&j, "id", k->id);
          cli_json_string (&j, "name", k->name);
          cli_json_number (&j, "rate_m_per_year", k->rate_m_per_year);
          cli_json_string (&j, "source", k->source);
          item_end (&j, out);
        }
      else
        {
          cli_pad (out, k->id, 24);
          g_string_append_c (out, ' ');
          cli_pad (out, _(k->name), 70);
          g_string_append_printf (out, " %12s\n",
                                cli_format_short (k->rate_m_per_year * 1e3, a, sizeof a));
        }
    }
  list_end (out, json);
}

static void
fluids (GString *out, gboolean json)
{
  static const char *const needs[RG_FLUID_N_KINDS] = {
    [RG_FLUID_WATER] = "--temperature [--pressure]",
    [RG_FLUID_CUSTOM] = "--density --viscosity",
    [RG_FLUID_SEAWATER] = "--temperature --salinity [--pressure]",
    [RG_FLUID_OIL] = "--temperature --oil-nu1 --oil-t1 --oil-nu2 --oil-t2 --oil-density [--oil-density-t] [--oil-expansion]",
    [RG_FLUID_AIR] = "--temperature [--pressure]",
  };

  list_begin (out, json);
  for (int i = 0; i < RG_FLUID_N_KINDS; i++)
    {
      if (json)
        {
          CliJson j;
          item_begin (&j, out, i);
          cli_json_string (&j, "id", rg_fluid_kind_id ((RgFluidKind) i));
          cli_json_string (&j, "options", needs[i]);
          item_end (&j, out);
        }
      else
        g_string_append_printf (out, "%-10s %s\n", rg_fluid_kind_id ((RgFluidKind) i), needs[i]);
    }
  list_end (out, json);
}

int
cli_cmd_catalog (int argc, char **argv)
{
  static const struct
  {
    const char *name;
    void (*list) (GString *out, gboolean json);
  } lists[] = {
    { "materials", materials },
    { "pipes", pipes },
    { "fittings", fittings },
    { "fluids", fluids },
    { "aging", aging },
  };
  g_auto (CliArgs) args = { 0 };
  g_autoptr (GString) msg = g_string_new (NULL);
  g_autoptr (GString) out = g_string_new (NULL);

  if (!cli_args_parse (&args, "catalog", catalog_options, argc, argv, 2, msg))
    return cli_fail ("%s", msg->str);
  if (args.positional->len != 1)
    return cli_fail (_("'catalog' needs one of: materials, pipes, fittings, fluids, aging."));

  const char *which = g_ptr_array_index (args.positional, 0);
  for (gsize i = 0; i < G_N_ELEMENTS (lists); i++)
    if (g_str_equal (which, lists[i].name))
      {
        lists[i].list (out, cli_args_has (&args, "--json"));
        return cli_write_stdout (out->str);
      }
  g_autofree char *shown = cli_echo (which);
  return cli_fail (_("Unknown catalog \"%s\": use materials, pipes, fittings, fluids or aging."), shown);
}
