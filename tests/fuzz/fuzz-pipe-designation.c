/* SPDX-License-Identifier: GPL-3.0-or-later */
/* libFuzzer harness for the catalog name parsers: rg_pipe_lookup (the pipe
 * designation tokenizer of src/core/catalog.c), rg_material_lookup,
 * rg_fitting_lookup and rg_aging_class_lookup.
 *
 * The whole input, copied into a NUL-terminated buffer, is given to all
 * four lookups.  Invariants (a failure aborts, which libFuzzer reports as a
 * crash):
 *  - RG_OK implies an entry of the catalog: a pointer that rg_*_at returns
 *    for some index, whose numbers are finite and positive where the
 *    catalog promises it (diameters, wall, roughness >= 0, 3-K constants,
 *    aging rates);
 *  - a found pipe is found again from its own canonical designation (the
 *    normalised key is stable);
 *  - an error fills RgError with the same status and one sentence: not
 *    empty, NUL-terminated, valid UTF-8, no control character, ending
 *    with '.'; `out` is left untouched.
 * How to build and run: tests/fuzz/README-core.md. */
#include <math.h>
#include <stdint.h>
#include <stdlib.h>
#include <string.h>

#include "core/aging.h"
#include "core/catalog.h"
#include "core/fittings.h"

#include "fuzz-sentence.h"

static int
finite_nonneg (double x)
{
  return isfinite (x) && x >= 0.0;
}

static void
check_pipe (const char *text)
{
  static const RgPipe sentinel;
  const RgPipe *p = &sentinel, *again = &sentinel;
  RgError err = { 0 };
  RgStatus st;
  int i, n = rg_pipe_count ();

  memset (&err, 0x5A, sizeof err);
  st = rg_pipe_lookup (text, &p, &err);
  if (st != RG_OK)
    {
      if (p != &sentinel)
        fuzz_fail ("rg_pipe_lookup", "out was written although it failed");
      fuzz_check_error (st, &err, "rg_pipe_lookup");
      return;
    }
  for (i = 0; i < n && rg_pipe_at (i) != p; i++)
    ;
  if (i == n)
    fuzz_fail ("rg_pipe_lookup", "RG_OK with a pointer outside the catalog");
  if (!(isfinite (p->inner_diameter_m) && p->inner_diameter_m > 0.0
        && isfinite (p->outside_diameter_m)
        && p->outside_diameter_m > p->inner_diameter_m
        && isfinite (p->wall_m) && p->wall_m > 0.0))
    fuzz_fail ("rg_pipe_lookup", "RG_OK with a non-finite or bad size");
  if (rg_pipe_lookup (p->designation, &again, &err) != RG_OK || again != p)
    fuzz_fail ("rg_pipe_lookup", "the found pipe's own designation does "
               "not find it again");
}

static void
check_material (const char *text)
{
  static const RgMaterial sentinel;
  const RgMaterial *m = &sentinel;
  RgError err = { 0 };
  RgStatus st;
  int i, n = rg_material_count ();

  memset (&err, 0x5A, sizeof err);
  st = rg_material_lookup (text, &m, &err);
  if (st != RG_OK)
    {
      if (m != &sentinel)
        fuzz_fail ("rg_material_lookup", "out written although it failed");
      fuzz_check_error (st, &err, "rg_material_lookup");
      return;
    }
  for (i = 0; i < n && rg_material_at (i) != m; i++)
    ;
  if (i == n)
    fuzz_fail ("rg_material_lookup", "RG_OK with a pointer outside the "
               "catalog");
  if (!finite_nonneg (m->roughness_m) || !finite_nonneg (m->roughness_min_m)
      || !finite_nonneg (m->roughness_max_m))
    fuzz_fail ("rg_material_lookup", "RG_OK with a bad roughness");
}

static void
check_fitting (const char *text)
{
  static const RgFitting sentinel;
  const RgFitting *f = &sentinel;
  RgError err = { 0 };
  RgStatus st;
  int i, n = rg_fitting_count ();

  memset (&err, 0x5A, sizeof err);
  st = rg_fitting_lookup (text, &f, &err);
  if (st != RG_OK)
    {
      if (f != &sentinel)
        fuzz_fail ("rg_fitting_lookup", "out written although it failed");
      fuzz_check_error (st, &err, "rg_fitting_lookup");
      return;
    }
  for (i = 0; i < n && rg_fitting_at (i) != f; i++)
    ;
  if (i == n)
    fuzz_fail ("rg_fitting_lookup", "RG_OK with a pointer outside the "
               "catalog");
  if (!finite_nonneg (f->k1) || !finite_nonneg (f->ki)
      || !finite_nonneg (f->kd))
    fuzz_fail ("rg_fitting_lookup", "RG_OK with a bad 3-K constant");
}

static void
check_aging (const char *text)
{
  static const RgAgingClass sentinel;
  const RgAgingClass *a = &sentinel;
  RgError err = { 0 };
  RgStatus st;
  int i, n = rg_aging_class_count ();

  memset (&err, 0x5A, sizeof err);
  st = rg_aging_class_lookup (text, &a, &err);
  if (st != RG_OK)
    {
      if (a != &sentinel)
        fuzz_fail ("rg_aging_class_lookup", "out written although it "
                   "failed");
      fuzz_check_error (st, &err, "rg_aging_class_lookup");
      return;
    }
  for (i = 0; i < n && rg_aging_class_at (i) != a; i++)
    ;
  if (i == n)
    fuzz_fail ("rg_aging_class_lookup", "RG_OK with a pointer outside the "
               "catalog");
  if (!finite_nonneg (a->rate_m_per_year)
      || !finite_nonneg (a->rate_min_m_per_year)
      || !finite_nonneg (a->rate_max_m_per_year))
    fuzz_fail ("rg_aging_class_lookup", "RG_OK with a bad rate");
}

int LLVMFuzzerTestOneInput (const uint8_t *data, size_t size);

int
LLVMFuzzerTestOneInput (const uint8_t *data, size_t size)
{
  char *text = malloc (size + 1);

  if (text == NULL)
    return 0;
  memcpy (text, data, size);
  text[size] = '\0';
  check_pipe (text);
  check_material (text);
  check_fitting (text);
  check_aging (text);
  free (text);
  return 0;
}
