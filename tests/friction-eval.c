/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Test-only helper for tests/crosscheck-friction.py: evaluates the friction
 * models of the core for many points in one process.
 *
 * Input, one point a line on stdin:   MODEL RE RR
 *   MODEL is a model id of friction.h (colebrook, haaland, swamee-jain,
 *   churchill) or "laminar" (RR is then ignored).
 * Output, one line per input line:   f printed with %.17g (round-trips a
 *   double), or "error <the core's sentence>".
 * Numbers are read with strtod in the C locale (the program never calls
 * setlocale), so Python's repr() of a float is read back exactly. */
#include "core/friction.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>

int
main (void)
{
  char line[512];

  while (fgets (line, sizeof line, stdin) != NULL)
    {
      char model_id[64], re_text[128], rr_text[128];
      RgError err = { 0 };
      RgStatus st;
      double f = 0.0;

      if (sscanf (line, "%63s %127s %127s", model_id, re_text, rr_text) != 3)
        {
          printf ("error The line does not hold a model, a Reynolds number and a relative roughness.\n");
          continue;
        }
      /* strtod accepts "nan" and "inf", which the core must then refuse */
      const double re = strtod (re_text, NULL);
      const double rr = strtod (rr_text, NULL);

      if (strcmp (model_id, "laminar") == 0)
        st = rg_friction_laminar (re, &f, &err);
      else
        {
          RgFrictionModel model;
          st = rg_friction_model_from_id (model_id, &model, &err);
          if (st == RG_OK)
            st = rg_friction_model (model, re, rr, &f, &err);
        }
      if (st == RG_OK)
        printf ("%.17g\n", f);
      else
        printf ("error %s\n", err.text);
    }
  return ferror (stdin) ? 1 : 0;
}
