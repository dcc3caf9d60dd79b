/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Test helper for tests/crosscheck-water.py: reads lines "T_K P_PA" from
 * standard input and prints, for each, "RHO MU" (kg/m³, Pa·s, %.17g) for
 * water through rg_fluid_properties, or "ERR <status> <sentence>". */
#include <stdio.h>
#include <stdlib.h>

#include "core/fluid.h"

int
main (void)
{
  char line[256];

  while (fgets (line, sizeof line, stdin) != NULL)
    {
      RgFluidSpec spec;
      RgFluidProps props;
      RgError err = { 0 };
      double t, p;

      /* the C locale (no setlocale call): '.' is the decimal point */
      if (sscanf (line, "%lf %lf", &t, &p) != 2)
        {
          printf ("ERR input not 'T_K P_PA': %s", line);
          continue;
        }
      rg_fluid_spec_init (&spec, RG_FLUID_WATER);
      spec.temperature_k = t;
      spec.pressure_pa = p;
      if (rg_fluid_properties (&spec, &props, NULL, &err) == RG_OK)
        printf ("%.17g %.17g\n", props.density_kg_m3,
                props.dynamic_viscosity_pa_s);
      else
        printf ("ERR %d %s\n", (int) err.status, err.text);
    }
  return 0;
}
