/* SPDX-License-Identifier: GPL-3.0-or-later */
/* rugosa-cli: the computation and the chart without a display. */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <glib/gi18n.h>
#include <locale.h>
#include <stdio.h>
#include <string.h>

#include "cli.h"

static const char usage_text[] = N_(
  "Usage: rugosa-cli COMMAND [OPTIONS]\n"
  "\n"
  "Commands:\n"
  "  friction   Darcy friction factor for a Reynolds number and relative roughness\n"
  "             --re RE --rr EPS_OVER_D [--model colebrook|haaland|swamee-jain|churchill] [--json]\n"
  "  fluid      density and viscosity of a fluid\n"
  "             water --temperature T [--pressure P] [--json]\n"
  "             seawater --temperature T --salinity S [--pressure P]\n"
  "             air --temperature T [--pressure P]\n"
  "             oil --temperature T --oil-nu1 NU --oil-t1 T --oil-nu2 NU --oil-t2 T\n"
  "                 --oil-density RHO [--oil-density-t T] [--oil-expansion PER_K]\n"
  "             custom --density RHO --viscosity MU (dynamic \"1 cP\" or kinematic \"1 cSt\")\n"
  "  line       hydraulics of one line\n"
  "             --flow Q (--diameter D | --pipe DESIGNATION) --length L\n"
  "             (--roughness E | --material NAME) --fluid KIND [fluid options]\n"
  "             [--k-sum K] [--fitting NAME[xCOUNT]]... [--elevation DZ]\n"
  "             [--age YEARS --aging CLASS|RATE] [--model M] [--json]\n"
  "             --batch FILE|- [--json]: one line a CSV row, its header naming\n"
  "             the options without dashes (flow,pipe,length,fluid,…)\n"
  "  eval       evaluate every line option of a project file\n"
  "             PROJECT [--age YEARS] [--format table|csv|json]\n"
  "  render     draw the friction chart of a project file\n"
  "             PROJECT -o FILE.png|.svg|.pdf [--width W] [--height H]\n"
  "             [--age YEARS] [--theme light|dark]\n"
  "  catalog    list a catalog: materials, pipes, fittings, fluids or aging [--json]\n"
  "\n"
  "Values take units: \"12 L/s\", \"150 gpm\", \"4 in\", \"0.045 mm\", \"20 C\", \"68 F\".\n"
  "A bare number is SI. Exit status 2 means the input was refused.\n"
  "\n"
  "Results are estimates from published correlations, valid only inside their\n"
  "stated ranges. Check designs against the applicable local codes and have\n"
  "them reviewed by a qualified, licensed engineer.\n");

/* True when the command writes machine-readable output (JSON or CSV). */
static gboolean
machine_output (int argc, char **argv)
{
  for (int i = 2; i < argc; i++)
    if (g_str_equal (argv[i], "--json") || g_str_equal (argv[i], "--batch")
        || (g_str_equal (argv[i], "--format") && i + 1 < argc
            && !g_str_equal (argv[i + 1], "table")))
      return TRUE;
  return FALSE;
}

int
main (int argc, char **argv)
{
  static const struct
  {
    const char *name;
    int (*run) (int argc, char **argv);
  } commands[] = {
    { "friction", cli_cmd_friction },
    { "fluid", cli_cmd_fluid },
    { "line", cli_cmd_line },
    { "catalog", cli_cmd_catalog },
    { "eval", cli_cmd_eval },
    { "render", cli_cmd_render },
  };

  /* Messages may be translated; numbers are always written and read in the
   * C locale (g_ascii_*), so the output does not depend on LC_NUMERIC. */
  /* without the user's locale, messages stay untranslated: not an error */
  (void) setlocale (LC_ALL, "");
  (void) setlocale (LC_NUMERIC, "C");
  /* JSON and CSV are for scripts: their text (warnings, notes) stays in
   * English, byte for byte the same under any locale.  In the C locale of
   * LC_MESSAGES gettext ignores LANGUAGE too. */
  if (machine_output (argc, argv))
    (void) setlocale (LC_MESSAGES, "C");
  {
    /* RUGOSA_LOCALEDIR: the build folder's po/ (tests, running uninstalled). */
    const char *localedir = g_getenv ("RUGOSA_LOCALEDIR");
    bindtextdomain (GETTEXT_PACKAGE,
                    localedir != NULL && *localedir != '\0' ? localedir : LOCALEDIR);
    bind_textdomain_codeset (GETTEXT_PACKAGE, "UTF-8");
    textdomain (GETTEXT_PACKAGE);
  }

  if (argc < 2)
    {
      (void) fputs (_(usage_text), stderr);
      return CLI_EXIT_USAGE;
    }
  if (g_str_equal (argv[1], "--help") || g_str_equal (argv[1], "-h")
      || g_str_equal (argv[1], "help"))
    {
      return cli_write_stdout (_(usage_text));
    }
  if (g_str_equal (argv[1], "--version"))
    {
      return cli_write_stdout ("rugosa-cli " PACKAGE_VERSION "\n");
    }
  for (gsize i = 0; i < G_N_ELEMENTS (commands); i++)
    if (g_str_equal (argv[1], commands[i].name))
      {
        for (int j = 2; j < argc; j++)
          if (g_str_equal (argv[j], "--help") || g_str_equal (argv[j], "-h"))
            {
              return cli_write_stdout (_(usage_text));
            }
        return commands[i].run (argc, argv);
      }
  g_autofree char *shown = cli_echo (argv[1]);
  return cli_fail (_("Unknown command \"%s\"; see 'rugosa-cli --help'."), shown);
}
