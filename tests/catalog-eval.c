/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Test helper for tests/crosscheck-catalogs.py: prints the compiled-in
 * catalogs through the core API, one tab-separated row per entry, and the
 * loss coefficient of every fitting at a grid of Re and bores (and, for
 * Crane rows, f_T and K over a grid of bores), so the cross-check compares
 * what the program uses (not the JSON files). */
#include "core/aging.h"
#include "core/catalog.h"
#include "core/fittings.h"

#include <stdio.h>

int
main (void)
{
  /* Bores in inches (×0.0254 m) and Reynolds numbers spanning laminar to
   * fully turbulent flow: a grid of our choosing for the comparison. */
  static const double bores_in[] = { 0.5, 1.0, 2.067, 4.026, 12.0, 24.0 };
  static const double res[] = { 100.0, 2.0e3, 1.0e5, 1.0e7 };

  for (int i = 0; i < rg_material_count (); i++)
    {
      const RgMaterial *m = rg_material_at (i);
      printf ("M\t%s\t%.17g\t%.17g\t%.17g\n", m->id, m->roughness_m,
              m->roughness_min_m, m->roughness_max_m);
    }
  for (int i = 0; i < rg_pipe_count (); i++)
    {
      const RgPipe *p = rg_pipe_at (i);
      printf ("P\t%s\t%s\t%s\t%s\t%.17g\t%.17g\t%.17g\t%.17g\n", p->designation,
              p->standard, p->nominal, p->series, p->outside_diameter_m,
              p->wall_m, p->inner_diameter_m, p->lining_m);
    }
  for (int i = 0; i < rg_fitting_count (); i++)
    {
      const RgFitting *f = rg_fitting_at (i);
      if (f->method == RG_FITTING_METHOD_CRANE_FT)
        {
          /* Crane rows: "C id n_bands min_bore band_max… band_n…", then
           * f_T, K and the warning count over a bore grid (inches) of our
           * choosing: 0.5 to 30 in, with both sides of each band split. */
          static const double crane_in[] = {
            0.5, 1.0, 1.5, 1.61, 2.067, 3.068, 4.026, 6.065, 7.981, 8.999,
            9.0, 9.001, 10.02, 11.938, 13.124, 14.999, 15.0, 15.001,
            17.938, 19.25, 21.562, 23.0, 24.0, 24.001, 30.0,
          };
          printf ("C\t%s\t%d\t%.17g", f->id, f->n_bands, f->min_bore_m);
          for (int b = 0; b < f->n_bands; b++)
            printf ("\t%.17g", f->band_max_bore_m[b]);
          for (int b = 0; b < f->n_bands; b++)
            printf ("\t%.17g", f->band_n[b]);
          printf ("\n");
          for (size_t b = 0; b < sizeof crane_in / sizeof crane_in[0]; b++)
            {
              double k, ft;
              RgWarnings w = { 0 };
              RgError err = { 0 };
              rg_warnings_clear (&w);
              if (rg_fitting_crane_ft (crane_in[b] * 0.0254, &ft, &err) != RG_OK
                  || rg_fitting_k_checked (f, 1.0e6, crane_in[b] * 0.0254, &k, &w, &err) != RG_OK)
                {
                  fprintf (stderr, "%s: %s\n", f->id, err.text);
                  return 1;
                }
              printf ("T\t%s\t%.17g\t%.17g\t%.17g\t%d\n", f->id, crane_in[b] * 0.0254,
                      ft, k, w.count);
            }
        }
      else
        printf ("F\t%s\t%.17g\t%.17g\t%.17g\n", f->id, f->k1, f->ki, f->kd);
      for (size_t b = 0; b < sizeof bores_in / sizeof bores_in[0]; b++)
        for (size_t r = 0; r < sizeof res / sizeof res[0]; r++)
          {
            double k;
            RgError err = { 0 };
            if (rg_fitting_k (f, res[r], bores_in[b] * 0.0254, &k, &err) != RG_OK)
              {
                fprintf (stderr, "%s: %s\n", f->id, err.text);
                return 1;
              }
            printf ("K\t%s\t%.17g\t%.17g\t%.17g\n", f->id, res[r], bores_in[b], k);
          }
    }
  for (int i = 0; i < rg_aging_class_count (); i++)
    {
      const RgAgingClass *a = rg_aging_class_at (i);
      printf ("A\t%s\t%.17g\t%.17g\t%.17g\n", a->id, a->rate_m_per_year,
              a->rate_min_m_per_year, a->rate_max_m_per_year);
    }
  return 0;
}
