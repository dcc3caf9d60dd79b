/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The shortest text of a double that reads back exactly: the first of
 * "%.15g", "%.16g", "%.17g" (C locale) whose text strtod turns back into
 * the same double.  Every number of the JSON, CSV and project files.
 *
 * Method.  The C library's way (print, read back, up to three times)
 * costs about 10 000 instructions a number, most of a batch row's time.
 * The fast path decides each precision P in exact integer arithmetic:
 * with x = m·2^e (2^52 ≤ m < 2^53, e < 0) and k = ⌊log10 x⌋ (from the
 * binary exponent, perhaps one below, then corrected), the number
 * in units of its P-th significant digit is s = x·10^n, n = P − 1 − k,
 * the fraction N/2^−e with N = m·10^n (below 2^127 for n ≤ 22).  Its
 * nearest integer D (from the quotient and remainder) is the digits
 * "%.Pg" prints, and D·10^−n reads back as x exactly when it lies within
 * half a unit in the last place of x: |D − s| < 2^(e−1)·10^n, that is
 * 2·|D·2^−e − N| < 10^n (for a power of two, m = 2^52, the gap below x is
 * half the gap above: 4·|D·2^−e − N| < 10^n when D < s).  No rounding
 * happens anywhere, so the verdict is the C library's.
 *
 * Left to the C library as before: exact ties (of s, or of D against the
 * half gap), x of 2^53 and more or with n outside 0 … 22 (about below
 * 1e−6 at 17 digits, above 1e14 at 15), and compilers without a 128-bit
 * integer.  Zero is "0" (or "-0").  The text is then built as "%.Pg"
 * builds it.
 * tests/test-number.c compares both ways over millions of doubles. */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <math.h>
#include <string.h>

#include "rugosa-model-private.h"

static int
slow_round_trips (char *buf, gsize size, double x, int digits)
{
  char fmt[8];

  g_snprintf (fmt, sizeof fmt, "%%.%dg", digits);
  g_ascii_formatd (buf, (int) size, fmt, x);
  return g_ascii_strtod (buf, NULL) == x;
}

/* "%.Pg" of the value D·10^(k−P+1), D having exactly P digits. */
static void
write_g (char *buf, gsize size, int negative, guint64 d, int p, int k)
{
  char digits[24];
  char out[48];
  int n, len = 0;

  for (int i = p - 1; i >= 0; i--, d /= 10)
    digits[i] = (char) ('0' + (int) (d % 10));
  /* significant digits without trailing zeros */
  n = p;
  while (n > 1 && digits[n - 1] == '0')
    n--;
  if (negative)
    out[len++] = '-';
  if (k < -4 || k >= p)
    {
      const int e = k < 0 ? -k : k;
      out[len++] = digits[0];
      if (n > 1)
        {
          out[len++] = '.';
          memcpy (out + len, digits + 1, (size_t) (n - 1));
          len += n - 1;
        }
      out[len++] = 'e';
      out[len++] = k < 0 ? '-' : '+';
      if (e >= 100)
        out[len++] = (char) ('0' + e / 100);
      out[len++] = (char) ('0' + (e / 10) % 10);
      out[len++] = (char) ('0' + e % 10);
    }
  else if (k >= 0)
    {
      /* k + 1 digits before the point */
      for (int i = 0; i <= k; i++)
        out[len++] = i < n ? digits[i] : '0';
      if (n > k + 1)
        {
          out[len++] = '.';
          memcpy (out + len, digits + k + 1, (size_t) (n - k - 1));
          len += n - k - 1;
        }
    }
  else
    {
      out[len++] = '0';
      out[len++] = '.';
      for (int i = 0; i < -k - 1; i++)
        out[len++] = '0';
      memcpy (out + len, digits, (size_t) n);
      len += n;
    }
  out[len] = '\0';
  g_strlcpy (buf, out, size);
}

#ifdef __SIZEOF_INT128__
__extension__ typedef unsigned __int128 u128;

/* 10^n, n = 0 … 22: a constant table (10^19 is the last below 2^64) */
#define E19 ((u128) 10000000000000000000u)
static const u128 pow10_table[23] = {
  1u, 10u, 100u, 1000u, 10000u, 100000u, 1000000u, 10000000u, 100000000u,
  1000000000u, 10000000000u, 100000000000u, 1000000000000u,
  10000000000000u, 100000000000000u, 1000000000000000u,
  10000000000000000u, 100000000000000000u, 1000000000000000000u,
  E19, E19 * 10u, E19 * 100u, E19 * 1000u,
};
#undef E19

static u128
pow10_u128 (int n)
{
  return pow10_table[n];
}

/* x as m / 2^shift, 2^52 ≤ m < 2^53, and ⌊log10 x⌋ (perhaps one off). */
typedef struct {
  guint64 m;
  int shift;
  int k;
} Parts;

static void
parts_of (double ax, Parts *parts)
{
  int e2;
  const double fr = frexp (ax, &e2);

  parts->m = (guint64) ldexp (fr, 53);
  parts->shift = 53 - e2;
  /* 2^(e2−1) ≤ ax < 2^e2: ⌊(e2 − 1)·log10 2⌋ is ⌊log10 ax⌋ or one
   * below it, which decide() corrects; no log10 a number */
  parts->k = (int) floor ((e2 - 1) * 0.30102999566398120);
}

/* 1 when precision p reads back, 0 when not, -1 when the C library must
 * say; fills the digits D and the decimal exponent of the rounded value. */
static int
decide (const Parts *x, int p, guint64 *d_out, int *k_out)
{
  const guint64 m = x->m;
  const int shift = x->shift;
  int k = x->k;
  const u128 lo = pow10_u128 (p - 1), hi = pow10_u128 (p);

  const unsigned below = m == G_GUINT64_CONSTANT (1) << 52 ? 4u : 2u;

  if (shift <= 0 || shift > 127)
    return -1;
  for (int tries = 0; tries < 3; tries++)
    {
      const int n = p - 1 - k;
      if (n < 0 || n > 22)
        return -1;
      const u128 ten_n = pow10_u128 (n);
      const u128 big = (u128) m * ten_n;
      const u128 one = (u128) 1 << shift;
      u128 q = big >> shift, r = big & (one - 1), diff, d;
      /* log10 may be one off near a power of ten */
      if (q >= hi)
        {
          k++;
          continue;
        }
      if (q < lo)
        {
          k--;
          continue;
        }
      if (2 * r == one)
        return -1;                     /* s ends in exactly one half */
      d = q + (2 * r > one ? 1 : 0);
      diff = d == q ? r : one - r;     /* |D − s| · 2^shift */
      const u128 gaps = (u128) (d == q && r != 0 ? below : 2u) * diff;
      if (gaps == ten_n)
        return -1;                     /* exactly half a gap away */
      if (d == hi)
        {
          /* 9.99…5 rounds up to the next power of ten */
          d = lo;
          k++;
        }
      *d_out = (guint64) d;
      *k_out = k;
      return gaps < ten_n ? 1 : 0;
    }
  return -1;
}
#else
typedef struct {
  int unused;
} Parts;

static void
parts_of (double ax, Parts *parts)
{
}

static int
decide (const Parts *x, int p, guint64 *d_out, int *k_out)
{
  return -1;
}
#endif

void
_rugosa_format_double (char *buf, gsize size, double x)
{
  const double ax = fabs (x);
  const int fast = isfinite (x) && ax > 0;
  Parts parts;

  if (x == 0)
    {
      g_strlcpy (buf, signbit (x) ? "-0" : "0", size);
      return;
    }
  if (fast)
    parts_of (ax, &parts);
  for (int p = 15; p <= 17; p++)
    {
      guint64 d = 0;
      int k = 0, verdict = fast ? decide (&parts, p, &d, &k) : -1;

      if (verdict < 0)
        {
          if (slow_round_trips (buf, size, x, p))
            return;
          continue;
        }
      /* "%.17g" always reads back */
      if (verdict == 1 || p == 17)
        {
          write_g (buf, size, x < 0, d, p, k);
          return;
        }
    }
}
