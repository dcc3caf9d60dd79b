/* SPDX-License-Identifier: GPL-3.0-or-later */
/* libFuzzer harness for the unit parser (src/core/units.c).
 *
 * The first input byte picks the entry point: rg_units_parse for one of the
 * RG_QTY_N quantities, or rg_units_parse_viscosity; its high bit passes a
 * NULL option name instead of "--fuzz".  The rest is the text, copied into
 * a NUL-terminated buffer (embedded NULs end it early, as in C).  The same
 * text is then given as a unit name to rg_units_to_si and rg_units_from_si.
 *
 * Invariants, checked on every call (a failure aborts, which libFuzzer
 * reports as a crash):
 *  - RG_OK implies a finite result, and for a temperature one >= 0 K;
 *  - an error fills RgError with the same status and one sentence: not
 *    empty, NUL-terminated inside the buffer, valid UTF-8, no control
 *    character (so it stays on one line), ending with '.';
 *  - the result variable is untouched on error (callers keep their value).
 * How to build and run: tests/fuzz/README-core.md. */
#include <math.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "core/units.h"

#include "fuzz-sentence.h"

/* A value no parse produces by chance: checks "untouched on error". */
#define UNTOUCHED (-7.25e-300)

static void
check (RgStatus st, double v, RgQuantity q, const RgError *err,
       const char *call)
{
  if (st == RG_OK)
    {
      if (!isfinite (v))
        fuzz_fail (call, "RG_OK with a non-finite result");
      if (q == RG_QTY_TEMPERATURE && v < 0.0)
        fuzz_fail (call, "RG_OK with a temperature below 0 K");
      return;
    }
  if (v != UNTOUCHED)
    fuzz_fail (call, "the result was written although the call failed");
  fuzz_check_error (st, err, call);
}

int LLVMFuzzerTestOneInput (const uint8_t *data, size_t size);

int
LLVMFuzzerTestOneInput (const uint8_t *data, size_t size)
{
  char *text;
  const char *what;
  unsigned sel;
  RgError err = { 0 };
  RgStatus st;
  double v;

  if (size < 1)
    return 0;
  sel = data[0] & 0x7Fu;
  what = (data[0] & 0x80u) ? NULL : "--fuzz";
  text = malloc (size);
  if (text == NULL)
    return 0;
  memcpy (text, data + 1, size - 1);
  text[size - 1] = '\0';

  sel %= (unsigned) RG_QTY_N + 1;
  memset (&err, 0x5A, sizeof err); /* no NUL: a missing terminator shows */
  v = UNTOUCHED;
  if (sel < (unsigned) RG_QTY_N)
    {
      RgQuantity q = (RgQuantity) sel;

      st = rg_units_parse (q, what, text, &v, &err);
      check (st, v, q, &err, "rg_units_parse");

      /* the text as a unit name for conversion, both ways */
      memset (&err, 0x5A, sizeof err);
      v = UNTOUCHED;
      st = rg_units_to_si (q, 1.0, text, &v, &err);
      check (st, v, q, &err, "rg_units_to_si");
      memset (&err, 0x5A, sizeof err);
      v = UNTOUCHED;
      st = rg_units_from_si (q, 300.0, text, &v, &err);
      /* from_si yields a value in the named unit: °C may be negative */
      check (st, v, RG_QTY_N, &err, "rg_units_from_si");
    }
  else
    {
      int kin = -1;

      st = rg_units_parse_viscosity (what, text, &v, &kin, &err);
      check (st, v, RG_QTY_N, &err, "rg_units_parse_viscosity");
      if (st == RG_OK && kin != 0 && kin != 1)
        fuzz_fail ("rg_units_parse_viscosity", "is_kinematic is not 0 or 1");
    }
  free (text);
  return 0;
}
