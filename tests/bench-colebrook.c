/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Benchmark: cost of rg_friction_colebrook against rg_friction_haaland, and
 * the accuracy of the Colebrook solution over the same points.
 *
 * Points: BENCH_POINTS pairs drawn with a fixed seed (a 64-bit xorshift, so
 * the set is the same on every machine): Re log-uniform in 2000 … 1e8;
 * ε/D exactly 0 for one point in ten, otherwise log-uniform in 1e-6 … 0.05.
 *
 * Timing: both go through the public functions of the core library
 * (compiled separately, so neither call is inlined or hoisted), over the
 * same points.  Each repetition walks the points in chunks of BENCH_CHUNK
 * and times Colebrook and Haaland on each chunk back to back (alternating
 * which goes first), so that both meet the same machine load on a shared
 * machine.  Every result is added to a volatile sink so the work cannot be
 * dropped.  ns_per_solve and haaland_ns_per_solve are the medians over
 * BENCH_REPS repetitions; ratio_to_haaland is the median of the
 * per-repetition ratios (paired, hence steadier than the ratio of medians).
 *
 * Accuracy: the reference is Newton's method on Colebrook in `long double`
 * (x86-64: 64-bit mantissa, unit round-off 5.4e-20), iterated until the
 * step is below 1e-19 relative (or 60 steps), i.e. far below the 1e-13 being
 * measured.  max_rel_err is max |f − f_ref| / f_ref over all points.
 *
 * Output: one JSON line on stdout.  Exit status is 0 whatever the figures:
 * this is a measurement, not a test; the figures are read by people. */
#include "core/friction.h"

#include <math.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <time.h>

enum { BENCH_POINTS = 1000000, BENCH_REPS = 11, BENCH_CHUNK = 8192 };

static uint64_t
next_u64 (uint64_t *s)
{
  /* xorshift64* (Vigna 2016) */
  uint64_t x = *s;
  x ^= x >> 12;
  x ^= x << 25;
  x ^= x >> 27;
  *s = x;
  return x * UINT64_C (2685821657736338717);
}

static double
next_unit (uint64_t *s)
{
  return (double) (next_u64 (s) >> 11) * 0x1.0p-53;
}

static double
log_uniform (uint64_t *s, double lo, double hi)
{
  return exp (log (lo) + (log (hi) - log (lo)) * next_unit (s));
}

/* Colebrook in long double: x = 1/√f solves x + (2/ln10)·ln(rr/3.7 + 2.51x/Re) = 0. */
static long double
colebrook_reference (long double re, long double rr)
{
  const long double c = 2.0L / logl (10.0L);
  long double x = 8.0L;

  for (int i = 0; i < 60; i++)
    {
      const long double u = rr / 3.7L + 2.51L * x / re;
      const long double g = x + c * logl (u);
      const long double dg = 1.0L + c * (2.51L / re) / u;
      const long double dx = g / dg;
      x -= dx;
      if (fabsl (dx) < 1e-19L * x)
        break;
    }
  return 1.0L / (x * x);
}

static double
now_ns (void)
{
  struct timespec ts;
  clock_gettime (CLOCK_MONOTONIC, &ts);
  return (double) ts.tv_sec * 1e9 + (double) ts.tv_nsec;
}

static int
cmp_double (const void *a, const void *b)
{
  const double x = *(const double *) a, y = *(const double *) b;
  return (x > y) - (x < y);
}

static double
median (double *v, int n)
{
  qsort (v, (size_t) n, sizeof *v, cmp_double);
  return n % 2 ? v[n / 2] : 0.5 * (v[n / 2 - 1] + v[n / 2]);
}

int
main (void)
{
  double *re = malloc (BENCH_POINTS * sizeof *re);
  double *rr = malloc (BENCH_POINTS * sizeof *rr);
  double t_cb[BENCH_REPS], t_ha[BENCH_REPS], ratio[BENCH_REPS];
  volatile double sink = 0.0;
  uint64_t seed = UINT64_C (0x9e3779b97f4a7c15);
  RgError err = { 0 };

  if (re == NULL || rr == NULL)
    {
      fprintf (stderr, "bench-colebrook: out of memory\n");
      return 1;
    }
  for (int i = 0; i < BENCH_POINTS; i++)
    {
      re[i] = log_uniform (&seed, 2000.0, 1.0e8);
      rr[i] = next_u64 (&seed) % 10 == 0 ? 0.0 : log_uniform (&seed, 1.0e-6, 0.05);
    }

  for (int r = 0; r < BENCH_REPS; r++)
    {
      double ns_cb = 0.0, ns_ha = 0.0;

      for (int c0 = 0; c0 < BENCH_POINTS; c0 += BENCH_CHUNK)
        {
          const int c1 = c0 + BENCH_CHUNK < BENCH_POINTS ? c0 + BENCH_CHUNK : BENCH_POINTS;
          /* alternate which one runs first, so neither always finds the
           * chunk already in cache */
          for (int k = 0; k < 2; k++)
            {
              const int colebrook_now = (k == 0) == ((c0 / BENCH_CHUNK + r) % 2 == 0);
              double acc = 0.0, f = 0.0;
              const double t0 = now_ns ();

              if (colebrook_now)
                for (int i = c0; i < c1; i++)
                  {
                    rg_friction_colebrook (re[i], rr[i], &f, &err);
                    acc += f;
                  }
              else
                for (int i = c0; i < c1; i++)
                  {
                    rg_friction_haaland (re[i], rr[i], &f, &err);
                    acc += f;
                  }
              const double dt = now_ns () - t0;
              if (colebrook_now)
                ns_cb += dt;
              else
                ns_ha += dt;
              sink += acc;
            }
        }
      t_cb[r] = ns_cb / BENCH_POINTS;
      t_ha[r] = ns_ha / BENCH_POINTS;
      ratio[r] = ns_cb / ns_ha;
    }

  double max_rel = 0.0;
  for (int i = 0; i < BENCH_POINTS; i++)
    {
      double f;
      if (rg_friction_colebrook (re[i], rr[i], &f, &err) != RG_OK)
        {
          fprintf (stderr, "bench-colebrook: %s\n", err.text);
          return 1;
        }
      const long double ref = colebrook_reference (re[i], rr[i]);
      const double rel = (double) fabsl (((long double) f - ref) / ref);
      if (rel > max_rel)
        max_rel = rel;
    }

  const double ns_cb = median (t_cb, BENCH_REPS);
  const double ns_ha = median (t_ha, BENCH_REPS);
  printf ("{\"bench\":\"colebrook\",\"ns_per_solve\":%.2f,"
          "\"haaland_ns_per_solve\":%.2f,\"ratio_to_haaland\":%.3f,"
          "\"max_rel_err\":%.3e}\n",
          ns_cb, ns_ha, median (ratio, BENCH_REPS), max_rel);
  free (re);
  free (rr);
  return sink == 0.0 ? 1 : 0;
}
