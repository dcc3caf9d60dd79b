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
  "             --solve flow --head-loss H: the flow for a total head loss H\n"
  "             --solve diameter [--head-loss H] [--max-velocity V] [--max-gradient G]:\n"
  "                 the smallest bore within the limits given (no --diameter, --pipe)\n"
  "             --batch FILE|- [--json]: one line a CSV row, its header naming\n"
  "             the options without dashes (flow,pipe,length,fluid,…)\n"
  "  size       every catalog size of a material for a duty, and the recommended one\n"
  "             --flow Q --length L --material ID --fluid KIND [fluid options]\n"
  "             [--catalog NAME] [--fitting NAME[xN]]... [--elevation DZ]\n"
  "             [--max-velocity V] [--min-velocity V] [--max-gradient G]\n"
  "             [--max-head-loss H] [--age YEARS --aging CLASS|RATE] [--json]\n"
  "  eval       evaluate every line option of a project file\n"
  "             PROJECT [--age YEARS] [--format table|csv|json]\n"
  "             energy settings for this run: [--efficiency PERCENT] [--hours H]\n"
  "             [--hours-minimum H] [--hours-maximum H] [--energy-price PRICE]\n"
  "             [--currency LABEL] [--life YEARS] [--discount-rate PERCENT]\n"
  "  render     draw a view of a project file: the friction chart, the system\n"
  "             curves with the pumps, or the life-cycle cost\n"
  "             PROJECT -o FILE.png|.svg|.pdf [--view friction|system|cost]\n"
  "             [--width W] [--height H] [--age YEARS] [--theme light|dark]\n"
  "             [--title TEXT] (a heading: TEXT and the chart's conditions)\n"
  "  report     the report of a project file as a PDF: its details, the chart,\n"
  "             each line option's inputs and results, the cautions\n"
  "             PROJECT -o FILE.pdf [--paper a4|letter] [--age YEARS]\n"
  "  catalog    list a catalog: materials, pipes, fittings, fluids or aging [--json]\n"
  "\n"
  "Values take units: \"12 L/s\", \"150 gpm\", \"4 in\", \"0.045 mm\", \"20 C\", \"68 F\".\n"
  "A bare number is SI. Exit status 2 means the input was refused.\n"
  "\n"
  "Results are estimates from published correlations, valid only inside their\n"
  "stated ranges. Check designs against the applicable local codes and have\n"
  "them reviewed by a qualified, licensed engineer.\n");

/* The usage, then the output units (their options are derived from the
 * display-unit table, so their paragraph is written at run time). */
int
cli_usage (void)
{
  g_autofree char *units = cli_units_help ();
  g_autofree char *text = g_strconcat (_(usage_text), "\n", units, NULL);

  return cli_write_stdout (text);
}

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
    { "size", cli_cmd_size },
    { "catalog", cli_cmd_catalog },
    { "eval", cli_cmd_eval },
    { "render", cli_cmd_render },
    { "report", cli_cmd_report },
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

  /* A short hint, not thirty lines of usage on stderr. */
  if (argc < 2)
    return cli_fail (_("No command given; see 'rugosa-cli --help'."));
  if (g_str_equal (argv[1], "--help") || g_str_equal (argv[1], "-h")
      || g_str_equal (argv[1], "help") || g_str_equal (argv[1], "--version"))
    {
      if (argc > 2)
        {
          g_autofree char *shown = cli_echo (argv[2]);
          return cli_fail (_("%s takes no other argument, not \"%s\"."), argv[1], shown);
        }
      if (g_str_equal (argv[1], "--version"))
        return cli_write_stdout ("rugosa-cli " PACKAGE_VERSION "\n");
      return cli_usage ();
    }
  /* Each command's parser prints the usage for --help where an option
   * stands, and not for the value of an option (cli_args_parse). */
  for (gsize i = 0; i < G_N_ELEMENTS (commands); i++)
    if (g_str_equal (argv[1], commands[i].name))
      return commands[i].run (argc, argv);
  g_autofree char *shown = cli_echo (argv[1]);
  return cli_fail (_("Unknown command \"%s\"; see 'rugosa-cli --help'."), shown);
}
