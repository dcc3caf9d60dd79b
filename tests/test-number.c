/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The shortest exact text of a double (_rugosa_format_double, the numbers
 * of every JSON, CSV and project file) against the C library: the first of
 * "%.15g", "%.16g", "%.17g" that strtod reads back to the same double,
 * over doubles of every kind the program writes and random bit patterns. */
#include <float.h>
#include <glib.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "model/rugosa-model-private.h"

/* Source: ISO C 7.21.6.1 (printf "%.Ng" rounds correctly in glibc) and
 * 7.22.1.3 (strtod rounds correctly): the definition of the text the
 * fast path must reproduce, computed the slow way. */
static void
oracle (char *buf, size_t size, double x)
{
  for (int digits = 15; digits <= 17; digits++)
    {
      char fmt[8];
      snprintf (fmt, sizeof fmt, "%%.%dg", digits);
      g_ascii_formatd (buf, (int) size, fmt, x);
      if (g_ascii_strtod (buf, NULL) == x)
        return;
    }
}

static guint64 checked;

static void
check (double x)
{
  char a[G_ASCII_DTOSTR_BUF_SIZE], b[G_ASCII_DTOSTR_BUF_SIZE];
  if (!isfinite (x))
    return;
  _rugosa_format_double (a, sizeof a, x);
  oracle (b, sizeof b, x);
  if (strcmp (a, b) != 0)
    g_error ("%.17g (%a): \"%s\" where the C library gives \"%s\"", x, x, a, b);
  checked++;
}

static void
test_edges (void)
{
  /* Common practice (no single source): the values where digit counts,
   * exponents and formats change */
  static const double values[] = {
    0.0, -0.0, 1.0, -1.0, 0.1, 0.2, 0.3, 0.1 + 0.2, 1.0 / 3.0, 2.0 / 3.0,
    4.6e-05, 0.0014460000000000002, 998.2060924679472, 1e-4, 1e-5, 9.999e-5,
    0.00010000000000000001, 123456789012345.0, 1234567890123456.0, 12345678901234567.0,
    1e15, 1e16, 1e17, 9.999999999999999e14, 9.999999999999999e15, 1e21, 1e22,
    1e-11, 1e-12, 1e41, 1e42, 5e-324, DBL_MIN, DBL_MAX, 0.5, 0.25, 1024.0, 3.0,
    100.0, 99.99999999999999, 999999999999999.9, 0.9999999999999999, 7e-06,
  };
  for (gsize i = 0; i < G_N_ELEMENTS (values); i++)
    {
      check (values[i]);
      check (-values[i]);
      check (nextafter (values[i], INFINITY));
      check (nextafter (values[i], -INFINITY));
    }
  /* every power of ten and of two in range, and their neighbours */
  for (int e = -320; e <= 308; e++)
    {
      const double p = pow (10.0, e);
      check (p);
      check (nextafter (p, 0));
      check (nextafter (p, INFINITY));
    }
  for (int e = -1074; e <= 1023; e++)
    {
      const double p = ldexp (1.0, e);
      check (p);
      check (nextafter (p, 0));
      check (nextafter (p, INFINITY));
    }
}

static void
test_random (void)
{
  GRand *rand = g_rand_new_with_seed (20261202);
  const int n = g_test_slow () ? 20000000 : 1000000;
  for (int i = 0; i < n; i++)
    {
      double x;
      switch (i % 4)
        {
        case 0:
          /* what the program writes: 1e-12 … 1e12, any digits */
          x = pow (10.0, g_rand_double_range (rand, -12.0, 12.0));
          break;
        case 1:
          /* short decimals, as typed: 1 to 6 digits times a power of ten */
          x = (double) g_rand_int_range (rand, 1, 1000000) * pow (10.0, g_rand_int_range (rand, -12, 8));
          break;
        case 2:
          /* results of arithmetic on short decimals */
          x = ((double) g_rand_int_range (rand, 1, 10000) / 1000.0) * ((double) g_rand_int_range (rand, 1, 10000) / 7.0);
          break;
        default:
          {
            /* any bit pattern */
            guint64 bits = ((guint64) g_rand_int (rand) << 32) | g_rand_int (rand);
            memcpy (&x, &bits, sizeof x);
          }
          break;
        }
      check (g_rand_boolean (rand) ? x : -x);
    }
  g_test_message ("%" G_GUINT64_FORMAT " doubles checked", checked);
  g_rand_free (rand);
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/number/shortest/edges", test_edges);
  g_test_add_func ("/number/shortest/random", test_random);
  return g_test_run ();
}
