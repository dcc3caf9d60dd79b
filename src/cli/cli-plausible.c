/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Results far beyond any practical line.
 *
 * On the command line a bare number is SI, so "--flow 18" is 18 m³/s, and
 * the line computes without complaint: 2190 m/s through a 100 mm bore.  A
 * velocity or a pipe-friction gradient far beyond what any line is built
 * for is almost always such a unit mistake, so rugosa-cli says so, on
 * standard error and among the result's warnings, and names the likely
 * mistake when the option behind it was a bare number.  The exit status
 * stays 0: the numbers are what was asked for.
 *
 * This lives in the CLI, not in the one evaluation: a bare number is SI
 * only here.  The window reads a bare number in the unit it shows beside
 * the field, and a project file names the unit of every value in its keys,
 * so neither can make this mistake; both keep the project's own velocity
 * and gradient limits (the settings' velocity-limit and gradient-limit),
 * which the evaluation reports for every face.
 *
 * The thresholds, common practice (no single source):
 * - A liquid line is designed for about 0.5–3 m/s; pump discharges,
 *   penstocks and boiler feed lines stay below about 10 m/s.  Above
 *   30 m/s a liquid would erode and cavitate any fitting: no practical
 *   liquid line runs so fast.
 * - Gas and vapour lines run at up to 20–60 m/s.  At 100 m/s air at 20 °C
 *   moves at about Mach 0.3, past which the incompressible treatment used
 *   here no longer holds either.
 * - A fluid lighter than 100 kg/m³ is taken as a gas or vapour: liquids,
 *   liquefied gases among them, are denser than about 400 kg/m³.
 * - A liquid line losing more than 10 m of head per metre of pipe
 *   (1000 m per 100 m; about 1 bar per metre of water) is beyond practice:
 *   design gradients are a few m per 100 m, and even small tubes at high
 *   velocity or warm heavy oils stay below about 100 m per 100 m.  For a
 *   gas the head of the gas itself is large by nature; its pressure drop is
 *   checked by the core's compressibility warning instead. */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <stdio.h>
#include <string.h>

#include "cli.h"
#include "model/rugosa-display.h"
#include "model/rugosa-fields.h"
#include "model/rugosa-units.h"

static const double LIQUID_VELOCITY_MAX_M_S = 30.0;
static const double GAS_VELOCITY_MAX_M_S = 100.0;
static const double GAS_DENSITY_MAX_KG_M3 = 100.0;
static const double LIQUID_GRADIENT_MAX_M_PER_100M = 1000.0;

/* The text of the row's option when it is a bare number ("18"), else
 * NULL. */
static const char *
bare_number (const CliArgs *args, const char *property)
{
  const RugosaField *row = rugosa_field_find (property);
  const char *text;
  char *end = NULL;

  if (row == NULL || row->cli == NULL
      || (text = cli_args_get (args, row->cli)) == NULL)
    return NULL;
  (void) g_ascii_strtod (text, &end);
  if (end == text)
    return NULL;
  while (g_ascii_isspace (*end))
    end++;
  return *end == '\0' ? text : NULL;
}

/* An option given as a bare number, and what it likely meant. */
typedef struct {
  const char *option;    /* "--flow" */
  const char *si_unit;   /* what the bare number was read in: "m³/s" */
  char *number;          /* the number as typed: "18" */
  const char *meant;     /* the unit the output shows: "L/s" */
} BareNumber;

/* Whether the option of the row `property` was a bare number in another
 * unit than the one the output shows for it (a bare number in the unit
 * shown was no mistake).  Free `bare->number` with g_free. */
static gboolean
find_bare (const CliArgs *args, const char *property, RugosaSettings *units,
           BareNumber *bare)
{
  const RugosaField *row = rugosa_field_find (property);
  const RugosaDisplayInfo *info = rugosa_display_info (row->display);
  const char *text = bare_number (args, property);
  const char *unit;

  if (text == NULL || info == NULL)
    return FALSE;
  unit = rugosa_settings_get_unit (units, row->display);
  if (g_strcmp0 (rg_units_display_spelling (info->quantity, unit),
                 rg_units_si_symbol (info->quantity)) == 0)
    return FALSE;
  bare->option = row->cli;
  bare->si_unit = rg_units_si_symbol (info->quantity);
  bare->number = g_strstrip (g_strdup (text));
  bare->meant = rugosa_display_unit_symbol (unit);
  return TRUE;
}

static void
warn (RugosaOperatingPoint *p, const char *text)
{
  g_autofree char *line = g_strdup_printf (_("warning: %s"), text);

  rg_warnings_add (&p->warnings, "%s", text);
  /* nowhere left to report a failure to write to stderr */
  (void) fprintf (stderr, "rugosa-cli: %s\n", line);
}

void
cli_check_plausible (const CliArgs *args, const RugosaLineResults *r,
                     RugosaOperatingPoint *p, RugosaSettings *units)
{
  const gboolean gas = r->density_kg_m3 < GAS_DENSITY_MAX_KG_M3;
  const double v_max = gas ? GAS_VELOCITY_MAX_M_S : LIQUID_VELOCITY_MAX_M_S;
  const double v = p->result.velocity_m_s;
  const double gradient = p->result.gradient_m_per_100m;

  if (!r->ok || !p->ok)
    return;
  /* One mistake, one warning: a flow too large shows in the velocity
   * first, and the gradient then says nothing new. */
  if (v > v_max)
    {
      const char *vu = rugosa_settings_get_unit (units, RUGOSA_DISPLAY_VELOCITY);
      g_autofree char *shown = rugosa_display_format_screen (RG_QTY_VELOCITY, v, vu);
      g_autofree char *limit = rugosa_display_format_screen (RG_QTY_VELOCITY, v_max, vu);
      g_autofree char *text = NULL;
      BareNumber bare = { 0 };

      if (find_bare (args, "flow-design", units, &bare))
        /* TRANSLATORS: a velocity, the threshold, an option, the SI unit,
         * the number typed and the unit shown: "2190 m/s", "30 m/s",
         * "--flow", "m³/s", "18", "L/s" */
        text = g_strdup_printf (_("The velocity %s is far beyond any practical line (above %s): a bare number for %s is in %s; did you mean %s %s?"),
                                shown, limit, bare.option, bare.si_unit, bare.number, bare.meant);
      else
        text = g_strdup_printf (_("The velocity %s is far beyond any practical line (above %s): check the flow and the inner diameter, and their units."),
                                shown, limit);
      warn (p, text);
      g_free (bare.number);
    }
  else if (!gas && gradient > LIQUID_GRADIENT_MAX_M_PER_100M)
    {
      const char *gu = rugosa_settings_get_unit (units, RUGOSA_DISPLAY_GRADIENT);
      g_autofree char *shown = rugosa_display_format_screen (RG_QTY_GRADIENT, gradient, gu);
      g_autofree char *limit = rugosa_display_format_screen (RG_QTY_GRADIENT,
                                                             LIQUID_GRADIENT_MAX_M_PER_100M, gu);
      g_autofree char *text = NULL;
      BareNumber bare = { 0 };

      if (find_bare (args, "flow-design", units, &bare)
          || find_bare (args, "viscosity", units, &bare))
        /* TRANSLATORS: a gradient, the threshold, an option, the SI unit,
         * the number typed and the unit shown: "4996 m/100 m",
         * "1000 m/100 m", "--viscosity", "Pa·s", "100", "mPa·s" */
        text = g_strdup_printf (_("The pipe-friction gradient %s is far beyond any practical line (above %s): a bare number for %s is in %s; did you mean %s %s?"),
                                shown, limit, bare.option, bare.si_unit, bare.number, bare.meant);
      else
        text = g_strdup_printf (_("The pipe-friction gradient %s is far beyond any practical line (above %s): check the flow, the inner diameter and the viscosity, and their units."),
                                shown, limit);
      warn (p, text);
      g_free (bare.number);
    }
}
