/* SPDX-License-Identifier: GPL-3.0-or-later */
/* rugosa-cli: the computation and the chart without a display. */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <locale.h>
#include <stdio.h>
#include <string.h>

#include "cli.h"

static const char usage_text[] =
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
  "  catalog    list a catalog: materials, pipes, fittings, fluids or aging [--json]\n"
  "\n"
  "Values take units: \"12 L/s\", \"150 gpm\", \"4 in\", \"0.045 mm\", \"20 C\", \"68 F\".\n"
  "A bare number is SI. Exit status 2 means the input was refused.\n"
  "\n"
  "Results are estimates from published correlations, valid only inside their\n"
  "stated ranges. Check designs against the applicable local codes and have\n"
  "them reviewed by a qualified, licensed engineer.\n";

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
  };

  /* Messages may be translated; numbers are always written and read in the
   * C locale (g_ascii_*), so the output does not depend on LC_NUMERIC. */
  /* without the user's locale, messages stay untranslated: not an error */
  (void) setlocale (LC_ALL, "");
  (void) setlocale (LC_NUMERIC, "C");

  if (argc < 2)
    {
      (void) fputs (usage_text, stderr);
      return CLI_EXIT_USAGE;
    }
  if (g_str_equal (argv[1], "--help") || g_str_equal (argv[1], "-h")
      || g_str_equal (argv[1], "help"))
    {
      return cli_write_stdout (usage_text);
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
              return cli_write_stdout (usage_text);
            }
        return commands[i].run (argc, argv);
      }
  g_autofree char *shown = cli_echo (argv[1]);
  return cli_fail ("Unknown command \"%s\"; see 'rugosa-cli --help'.", shown);
}
