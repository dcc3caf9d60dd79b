/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Tests of src/core/regime.c: regime thresholds (default and custom, with
 * their edges), the roughness Reynolds number, the roughness zones and
 * their edges against an independent evaluation, and the combined friction
 * point.
 *
 * The zone oracle is written apart from the core: Colebrook (1939),
 *     1/√f = −2·log10( (ε/D)/3.7 + 2.51/(Re·√f) ),
 * solved by plain bisection in long double (the core uses Clamond's
 * iteration in double); the smooth-pipe law is the same equation with
 * ε = 0 (Prandtl–von Kármán); the fully rough law is von Kármán–Nikuradse,
 * 1/√f = −2·log10((ε/D)/3.7) (both forms from memory of Schlichting,
 * Boundary-Layer Theory, the chapter on pipe flow; not checked against the
 * document).  The edges are found by bisection on the oracle, not by the
 * core's closed forms. */
#include "core/regime.h"

#include <float.h>
#include <glib.h>
#include <math.h>
#include <string.h>

static void
test_default_thresholds (void)
{
  RgTransition t;

  rg_transition_default (&t);
  /* From memory of Moody (1944), Trans. ASME 66, 671–684: the "critical
   * zone" of the friction chart spans Re 2000 to 4000; not checked against
   * the document */
  g_assert_cmpfloat (t.re_laminar_max, ==, 2000.0);
  g_assert_cmpfloat (t.re_turbulent_min, ==, 4000.0);
  g_assert_cmpint (rg_transition_check (&t, NULL), ==, RG_OK);
}

static void
test_classify_default_edges (void)
{
  RgTransition t;

  rg_transition_default (&t);
  /* Source: the rule documented in regime.h — laminar below the lower
   * limit, transitional from it up to (not including) the upper limit,
   * turbulent from the upper limit on */
  g_assert_cmpint (rg_regime_classify (&t, 1.0), ==, RG_REGIME_LAMINAR);
  g_assert_cmpint (rg_regime_classify (&t, nextafter (2000.0, 0.0)), ==, RG_REGIME_LAMINAR);
  g_assert_cmpint (rg_regime_classify (&t, 2000.0), ==, RG_REGIME_TRANSITIONAL);
  g_assert_cmpint (rg_regime_classify (&t, 3000.0), ==, RG_REGIME_TRANSITIONAL);
  g_assert_cmpint (rg_regime_classify (&t, nextafter (4000.0, 0.0)), ==, RG_REGIME_TRANSITIONAL);
  g_assert_cmpint (rg_regime_classify (&t, 4000.0), ==, RG_REGIME_TURBULENT);
  g_assert_cmpint (rg_regime_classify (&t, 1e9), ==, RG_REGIME_TURBULENT);
}

static void
test_classify_custom (void)
{
  /* From memory of White, Fluid Mechanics (transition near Re 2300); the
   * upper limit kept at 4000 */
  RgTransition t = { 2300.0, 4000.0 };

  g_assert_cmpint (rg_transition_check (&t, NULL), ==, RG_OK);
  g_assert_cmpint (rg_regime_classify (&t, 2200.0), ==, RG_REGIME_LAMINAR);
  g_assert_cmpint (rg_regime_classify (&t, 2300.0), ==, RG_REGIME_TRANSITIONAL);

  /* Common practice (no single source): a sharp switch, both limits equal,
   * leaves no transitional range */
  RgTransition sharp = { 3000.0, 3000.0 };
  g_assert_cmpint (rg_transition_check (&sharp, NULL), ==, RG_OK);
  g_assert_cmpint (rg_regime_classify (&sharp, nextafter (3000.0, 0.0)), ==, RG_REGIME_LAMINAR);
  g_assert_cmpint (rg_regime_classify (&sharp, 3000.0), ==, RG_REGIME_TURBULENT);
}

static void
test_transition_check_errors (void)
{
  /* Source: the settable range documented in regime.h,
   * 500 ≤ lower ≤ upper ≤ 1e5 */
  const RgSubjects lam = RG_SUBJECT_BIT (RG_SUBJECT_RE_LAMINAR_MAX);
  const RgSubjects turb = RG_SUBJECT_BIT (RG_SUBJECT_RE_TURBULENT_MIN);
  /* with the limits at fault: both when they are out of order */
  const struct
  {
    RgTransition t;
    RgSubjects subjects;
  } bad[] = {
    { { 4000.0, 2000.0 }, lam | turb }, { { 499.0, 4000.0 }, lam },
    { { 2000.0, 100001.0 }, turb }, { { NAN, 4000.0 }, lam | turb },
    { { 2000.0, NAN }, lam | turb }, { { -INFINITY, 4000.0 }, lam },
    { { 2000.0, INFINITY }, turb }, { { 0.0, 0.0 }, lam },
  };

  for (size_t i = 0; i < G_N_ELEMENTS (bad); i++)
    {
      RgError err = { 0 };
      g_assert_cmpint (rg_transition_check (&bad[i].t, &err), ==, RG_ERR_DOMAIN);
      g_assert_cmpint (err.status, ==, RG_ERR_DOMAIN);
      g_assert_cmpuint (strlen (err.text), >, 10);
      g_assert_cmpint (err.text[strlen (err.text) - 1], ==, '.');
      g_assert_cmpuint (err.subjects, ==, bad[i].subjects);
    }
  RgError err = { 0 };
  g_assert_cmpint (rg_transition_check (NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (strlen (err.text), >, 0);
  g_assert_cmpuint (err.subjects, ==, lam | turb);
  /* the edges of the settable range are accepted */
  const RgTransition edges = { RG_TRANSITION_RE_LOWEST, RG_TRANSITION_RE_HIGHEST };
  g_assert_cmpint (rg_transition_check (&edges, NULL), ==, RG_OK);
  /* Source: regime.h, 500 ≤ lower ≤ upper ≤ 1e5 */
  g_assert_cmpfloat (RG_TRANSITION_RE_LOWEST, ==, 500.0);
  g_assert_cmpfloat (RG_TRANSITION_RE_HIGHEST, ==, 1e5);
}

static void
test_roughness_reynolds (void)
{
  /* Source: definition ε⁺ = Re·(ε/D)·√(f/8) (regime.h); with Re 1e5,
   * ε/D 1e-3, f 0.02: 100·√0.0025 = 5 */
  g_assert_cmpfloat_with_epsilon (rg_roughness_reynolds (1e5, 1e-3, 0.02), 5.0, 1e-13);
  /* Source: same definition, smooth pipe */
  g_assert_cmpfloat (rg_roughness_reynolds (1e5, 0.0, 0.02), ==, 0.0);
}

/* --- the zone oracle (see the top of the file) --- */

/* 1/√f of Colebrook by bisection: g(x) = x + 2·log10(a + b·x) rises with x. */
static long double
oracle_x (double re, double rr)
{
  const long double a = (long double) rr / 3.7L, b = 2.51L / (long double) re;
  long double lo = 0.1L, hi = 100.0L;
  for (int i = 0; i < 200; i++)
    {
      const long double mid = 0.5L * (lo + hi);
      if (mid + 2.0L * log10l (a + b * mid) > 0.0L)
        hi = mid;
      else
        lo = mid;
    }
  return 0.5L * (lo + hi);
}

static long double
oracle_f (double re, double rr)
{
  const long double x = oracle_x (re, rr);
  return 1.0L / (x * x);
}

static long double
oracle_f_rough (double rr)
{
  const long double x = -2.0L * log10l ((long double) rr / 3.7L);
  return 1.0L / (x * x);
}

/* Common practice (no single source): 2 % in f, the tolerance regime.c
 * states and justifies. */
static const long double TOL = 0.02L;

static RgRoughnessZone
oracle_zone (double re, double rr)
{
  const long double f = oracle_f (re, rr);
  if (f <= (1.0L + TOL) * oracle_f (re, 0.0))
    return RG_ZONE_SMOOTH;
  if (rr > 0.0 && f <= (1.0L + TOL) * oracle_f_rough (rr))
    return RG_ZONE_FULLY_ROUGH;
  return RG_ZONE_TRANSITIONALLY_ROUGH;
}

/* ε/D at which Colebrook's f at re is (1 + TOL)·f_smooth(re), by bisection
 * in log ε/D (f rises with ε/D). */
static double
oracle_smooth_edge (double re)
{
  const long double target = (1.0L + TOL) * oracle_f (re, 0.0);
  long double lo = -12.0L, hi = -1.0L;
  for (int i = 0; i < 120; i++)
    {
      const long double mid = 0.5L * (lo + hi);
      if (oracle_f (re, (double) powl (10.0L, mid)) > target)
        hi = mid;
      else
        lo = mid;
    }
  return (double) powl (10.0L, 0.5L * (lo + hi));
}

/* Re at which Colebrook's f for rr is (1 + TOL)·f_rough(rr), by bisection
 * in log Re (f falls towards f_rough as Re grows). */
static double
oracle_rough_edge (double rr)
{
  const long double target = (1.0L + TOL) * oracle_f_rough (rr);
  long double lo = 3.0L, hi = 12.0L;
  for (int i = 0; i < 120; i++)
    {
      const long double mid = 0.5L * (lo + hi);
      if (oracle_f ((double) powl (10.0L, mid), rr) > target)
        lo = mid;
      else
        hi = mid;
    }
  return (double) powl (10.0L, 0.5L * (lo + hi));
}

static void
test_zone_tolerance (void)
{
  /* Common practice (no single source): 2 % in f, see regime.c */
  g_assert_cmpfloat (RG_ROUGHNESS_ZONE_TOLERANCE, ==, 0.02);
  g_assert_cmpfloat (RG_ROUGHNESS_ZONE_TOLERANCE, ==, (double) TOL);
}

/* New commercial steel, ε = 0.045 mm (from memory of Moody 1944, Trans.
 * ASME 66, the table of roughness of new pipe; not checked against the
 * document), bore 125 mm: ε/D = 3.6e-4, at Re 2.55e5.  Its ε⁺ is 4.3, below
 * the sand-grain limit 5 that used to call it smooth, yet its friction
 * factor lies 18 % above the smooth-pipe law. */
static void
test_zone_steel_example (void)
{
  const double re = 2.55e5, rr = 0.045e-3 / 0.125;
  RgRoughnessZone zone = RG_ZONE_NONE;
  RgFrictionPoint p;

  /* Source: the oracle above (Colebrook 1939 against its ε = 0 form):
   * f/f_smooth − 1 = 0.1817 (mpmath gives 0.18167, the same equations) */
  const double excess = (double) (oracle_f (re, rr) / oracle_f (re, 0.0) - 1.0L);
  g_assert_cmpfloat (fabs (excess - 0.18167), <, 5e-5);
  g_assert_cmpint (rg_roughness_zone_classify (re, rr, &zone, NULL), ==, RG_OK);
  g_assert_cmpint (zone, ==, RG_ZONE_TRANSITIONALLY_ROUGH);
  g_assert_cmpint (oracle_zone (re, rr), ==, RG_ZONE_TRANSITIONALLY_ROUGH);

  for (int m = 0; m < RG_FRICTION_N_MODELS; m++)
    {
      g_assert_cmpint (rg_friction_point ((RgFrictionModel) m, NULL, re, rr, &p, NULL), ==, RG_OK);
      g_assert_cmpint (p.zone, ==, RG_ZONE_TRANSITIONALLY_ROUGH);
      /* Source: ε⁺ = Re·(ε/D)·√(f/8) with f about 0.01763 (Colebrook):
       * 2.55e5·3.6e-4·0.04694 = 4.31; the other models' f differ by a few
       * per cent, so 4.2 to 4.4 */
      g_assert_cmpfloat (p.eps_plus, >, 4.2);
      g_assert_cmpfloat (p.eps_plus, <, 4.4);
    }
}

/* The edge of the smooth zone: the core's closed form against the
 * oracle's bisection, the tolerance it reproduces, and points on either
 * side. */
static void
test_zone_smooth_edge (void)
{
  static const double RE[] = { 1e3, 4e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10 };
  double worst_f = 0, worst_rr = 0;

  for (size_t i = 0; i < G_N_ELEMENTS (RE); i++)
    {
      double rr, f;
      RgRoughnessZone z;
      g_assert_cmpint (rg_roughness_zone_smooth_edge (RE[i], &rr, &f, NULL), ==, RG_OK);
      /* Source: the zone rule (regime.c), evaluated by the oracle: at the
       * edge f = (1 + 2 %)·f_smooth.  Common practice (no single source):
       * 1e-13 relative allows the core's Colebrook error (below 3e-15,
       * friction.c) and rounding in the closed form. */
      const long double f_c = oracle_f (RE[i], rr), f_s = oracle_f (RE[i], 0.0);
      const double e_f = (double) fabsl (f_c / ((1.0L + TOL) * f_s) - 1.0L);
      g_assert_cmpfloat (e_f, <, 1e-13);
      g_assert_cmpfloat (fabs (f / (double) f_c - 1.0), <, 1e-13);
      /* the same edge found by bisection; ε/D moves f little (the
       * elasticity is a few per cent there), hence 1e-10 */
      const double e_rr = fabs (rr / oracle_smooth_edge (RE[i]) - 1.0);
      g_assert_cmpfloat (e_rr, <, 1e-10);
      worst_f = fmax (worst_f, e_f);
      worst_rr = fmax (worst_rr, e_rr);

      /* either side, 1e-6 relative in ε/D: smooth below, not above */
      g_assert_cmpint (oracle_zone (RE[i], rr * (1 - 1e-6)), ==, RG_ZONE_SMOOTH);
      g_assert_cmpint (rg_roughness_zone_classify (RE[i], rr * (1 - 1e-6), &z, NULL), ==, RG_OK);
      g_assert_cmpint (z, ==, RG_ZONE_SMOOTH);
      g_assert_cmpint (oracle_zone (RE[i], rr * (1 + 1e-6)), ==, RG_ZONE_TRANSITIONALLY_ROUGH);
      g_assert_cmpint (rg_roughness_zone_classify (RE[i], rr * (1 + 1e-6), &z, NULL), ==, RG_OK);
      g_assert_cmpint (z, ==, RG_ZONE_TRANSITIONALLY_ROUGH);
    }
  g_test_message ("smooth edge: worst relative error in f %.2g, in ε/D %.2g", worst_f, worst_rr);
}

static void
test_zone_rough_edge (void)
{
  static const double RR[] = { 1e-6, 1e-5, 1e-4, 1e-3, 1e-2, 5e-2, 0.1 };
  double worst_f = 0, worst_re = 0;

  for (size_t i = 0; i < G_N_ELEMENTS (RR); i++)
    {
      double re, f;
      RgRoughnessZone z;
      g_assert_cmpint (rg_roughness_zone_rough_edge (RR[i], &re, &f, NULL), ==, RG_OK);
      g_assert_cmpfloat (re, >=, RG_FRICTION_RE_MIN);
      g_assert_cmpfloat (re, <=, RG_FRICTION_RE_MAX);
      /* Source: the zone rule (regime.c), evaluated by the oracle: at the
       * edge f = (1 + 2 %)·f_rough; 1e-13 as for the smooth edge */
      const long double f_c = oracle_f (re, RR[i]);
      const double e_f = (double) fabsl (f_c / ((1.0L + TOL) * oracle_f_rough (RR[i])) - 1.0L);
      g_assert_cmpfloat (e_f, <, 1e-13);
      g_assert_cmpfloat (fabs (f / (double) f_c - 1.0), <, 1e-13);
      /* Re moves f little near the rough edge, hence 1e-10 */
      const double e_re = fabs (re / oracle_rough_edge (RR[i]) - 1.0);
      g_assert_cmpfloat (e_re, <, 1e-10);
      worst_f = fmax (worst_f, e_f);
      worst_re = fmax (worst_re, e_re);

      /* either side, 1e-6 relative in Re: fully rough from the edge on */
      g_assert_cmpint (oracle_zone (re * (1 - 1e-6), RR[i]), ==, RG_ZONE_TRANSITIONALLY_ROUGH);
      g_assert_cmpint (rg_roughness_zone_classify (re * (1 - 1e-6), RR[i], &z, NULL), ==, RG_OK);
      g_assert_cmpint (z, ==, RG_ZONE_TRANSITIONALLY_ROUGH);
      g_assert_cmpint (oracle_zone (re * (1 + 1e-6), RR[i]), ==, RG_ZONE_FULLY_ROUGH);
      g_assert_cmpint (rg_roughness_zone_classify (re * (1 + 1e-6), RR[i], &z, NULL), ==, RG_OK);
      g_assert_cmpint (z, ==, RG_ZONE_FULLY_ROUGH);
    }
  g_test_message ("rough edge: worst relative error in f %.2g, in Re %.2g", worst_f, worst_re);

  /* below about ε/D 1e-8 the edge lies beyond the computed Reynolds range
   * (friction.h), and the core still gives it */
  double re, f;
  g_assert_cmpint (rg_roughness_zone_rough_edge (1e-9, &re, &f, NULL), ==, RG_OK);
  g_assert_cmpfloat (re, >, RG_FRICTION_RE_MAX);
}

/* The ε⁺ the edges correspond to, as stated at the top of regime.c, with the
 * edges found by the oracle's bisection. */
static void
test_zone_edges_eps_plus (void)
{
  double lo = INFINITY, hi = 0;
  for (double lre = 3.0; lre <= 10.0; lre += 0.5)
    {
      const double re = pow (10.0, lre), rr = oracle_smooth_edge (re);
      const double ep = rg_roughness_reynolds (re, rr, (double) oracle_f (re, rr));
      lo = fmin (lo, ep);
      hi = fmax (hi, ep);
    }
  g_test_message ("smooth edge: ε⁺ %.3f to %.3f for Re 1e3 to 1e10", lo, hi);
  /* Source: regime.c, "ε⁺ ≈ 0.2–0.7 on the smooth edge (Re 1e3 to 1e10)" */
  g_assert_cmpfloat (lo, >, 0.15);
  g_assert_cmpfloat (hi, <, 0.75);

  lo = INFINITY;
  hi = 0;
  for (double lrr = -6.0; lrr <= -1.0 + 1e-9; lrr += 0.5)
    {
      const double rr = pow (10.0, lrr), re = oracle_rough_edge (rr);
      const double ep = rg_roughness_reynolds (re, rr, (double) oracle_f (re, rr));
      lo = fmin (lo, ep);
      hi = fmax (hi, ep);
    }
  g_test_message ("rough edge: ε⁺ %.1f to %.1f for ε/D 1e-6 to 0.1", lo, hi);
  /* Source: regime.c, "ε⁺ ≈ 20–90 on the fully rough edge (ε/D 1e-6 to
   * 0.1)" */
  g_assert_cmpfloat (lo, >, 19.5);
  g_assert_cmpfloat (hi, <, 92.0);
}

/* The core's classification against the oracle over the computed domain;
 * points within 1e-9 of a threshold (where rounding may decide) are left
 * out.  Also: no point is within the tolerance of both laws at once (what
 * lets regime.c test the smooth law first). */
static void
test_zone_grid (void)
{
  int seen[4] = { 0 }, skipped = 0;
  for (double lre = 3.0; lre <= 10.0 + 1e-9; lre += 0.125)
    for (double lrr = -8.0; lrr <= -1.0 + 1e-9; lrr += 0.125)
      {
        const double re = pow (10.0, lre), rr = pow (10.0, lrr);
        const long double f = oracle_f (re, rr);
        const long double r_s = f / oracle_f (re, 0.0) - 1.0L - TOL;
        const long double r_r = f / oracle_f_rough (rr) - 1.0L - TOL;
        /* Source: the zone rule; both laws within 2 % cannot hold at once */
        g_assert_false (r_s <= 0 && r_r <= 0);
        if (fabsl (r_s) < 1e-9L || fabsl (r_r) < 1e-9L)
          {
            skipped++;
            continue;
          }
        RgRoughnessZone z;
        g_assert_cmpint (rg_roughness_zone_classify (re, rr, &z, NULL), ==, RG_OK);
        g_assert_cmpint (z, ==, oracle_zone (re, rr));
        seen[z]++;
      }
  g_test_message ("grid: smooth %d, transitionally rough %d, fully rough %d, skipped %d",
                  seen[RG_ZONE_SMOOTH], seen[RG_ZONE_TRANSITIONALLY_ROUGH],
                  seen[RG_ZONE_FULLY_ROUGH], skipped);
  g_assert_cmpint (seen[RG_ZONE_SMOOTH], >, 50);
  g_assert_cmpint (seen[RG_ZONE_TRANSITIONALLY_ROUGH], >, 50);
  g_assert_cmpint (seen[RG_ZONE_FULLY_ROUGH], >, 50);

  /* Source: the zone rule — a smooth pipe (ε = 0) follows the smooth law */
  RgRoughnessZone z = RG_ZONE_NONE;
  g_assert_cmpint (rg_roughness_zone_classify (1e9, 0.0, &z, NULL), ==, RG_OK);
  g_assert_cmpint (z, ==, RG_ZONE_SMOOTH);
}

static void
test_zone_errors (void)
{
  /* Source: the domain documented in regime.h (that of Colebrook in
   * friction.h) */
  const struct
  {
    double re, rr;
    RgSubject subject;
  } bad[] = {
    { NAN, 1e-3, RG_SUBJECT_REYNOLDS }, { 999.0, 1e-3, RG_SUBJECT_REYNOLDS },
    { 2e10, 1e-3, RG_SUBJECT_REYNOLDS }, { INFINITY, 1e-3, RG_SUBJECT_REYNOLDS },
    { 1e5, -1e-9, RG_SUBJECT_RELATIVE_ROUGHNESS }, { 1e5, 0.2, RG_SUBJECT_RELATIVE_ROUGHNESS },
    { 1e5, NAN, RG_SUBJECT_RELATIVE_ROUGHNESS },
  };
  for (size_t i = 0; i < G_N_ELEMENTS (bad); i++)
    {
      RgError err = { 0 };
      RgRoughnessZone z = RG_ZONE_NONE;
      g_assert_cmpint (rg_roughness_zone_classify (bad[i].re, bad[i].rr, &z, &err), ==, RG_ERR_DOMAIN);
      g_assert_cmpint (z, ==, RG_ZONE_NONE);
      g_assert_cmpuint (strlen (err.text), >, 10);
      g_assert_true (err.subjects & RG_SUBJECT_BIT (bad[i].subject));
    }

  const double bad_re[] = { NAN, 0.0, 999.0, 2e10 };
  for (size_t i = 0; i < G_N_ELEMENTS (bad_re); i++)
    {
      RgError err = { 0 };
      double rr = -1, f = -1;
      g_assert_cmpint (rg_roughness_zone_smooth_edge (bad_re[i], &rr, &f, &err), ==, RG_ERR_DOMAIN);
      g_assert_cmpfloat (rr, ==, -1);
      g_assert_cmpfloat (f, ==, -1);
      g_assert_true (err.subjects & RG_SUBJECT_BIT (RG_SUBJECT_REYNOLDS));
    }

  const double bad_rr[] = { NAN, 0.0, -1e-3, 0.2, INFINITY };
  for (size_t i = 0; i < G_N_ELEMENTS (bad_rr); i++)
    {
      RgError err = { 0 };
      double re = -1, f = -1;
      g_assert_cmpint (rg_roughness_zone_rough_edge (bad_rr[i], &re, &f, &err), ==, RG_ERR_DOMAIN);
      g_assert_cmpfloat (re, ==, -1);
      g_assert_cmpfloat (f, ==, -1);
      g_assert_true (err.subjects & RG_SUBJECT_BIT (RG_SUBJECT_RELATIVE_ROUGHNESS));
    }
  /* the smallest positive double: the edge's Reynolds number overflows, and
   * the core says so instead of returning infinity */
  RgError err = { 0 };
  double re = -1, f = -1;
  g_assert_cmpint (rg_roughness_zone_rough_edge (nextafter (0.0, 1.0), &re, &f, &err), ==, RG_ERR_NUMERIC);
  g_assert_cmpfloat (re, ==, -1);
  g_assert_cmpuint (strlen (err.text), >, 10);
}

static void
test_ids (void)
{
  /* Source: the identifiers documented in regime.h */
  g_assert_cmpstr (rg_regime_id (RG_REGIME_LAMINAR), ==, "laminar");
  g_assert_cmpstr (rg_regime_id (RG_REGIME_TRANSITIONAL), ==, "transitional");
  g_assert_cmpstr (rg_regime_id (RG_REGIME_TURBULENT), ==, "turbulent");
  g_assert_cmpstr (rg_roughness_zone_id (RG_ZONE_NONE), ==, "none");
  g_assert_cmpstr (rg_roughness_zone_id (RG_ZONE_SMOOTH), ==, "smooth");
  g_assert_cmpstr (rg_roughness_zone_id (RG_ZONE_TRANSITIONALLY_ROUGH), ==, "transitionally-rough");
  g_assert_cmpstr (rg_roughness_zone_id (RG_ZONE_FULLY_ROUGH), ==, "fully-rough");
}

static void
test_point_laminar (void)
{
  RgFrictionPoint p;

  g_assert_cmpint (rg_friction_point (RG_FRICTION_COLEBROOK, NULL, 1000.0, 1e-3, &p, NULL), ==, RG_OK);
  g_assert_cmpint (p.regime, ==, RG_REGIME_LAMINAR);
  g_assert_cmpint (p.zone, ==, RG_ZONE_NONE);
  /* Source: Hagen–Poiseuille, f = 64/Re */
  g_assert_cmpfloat_with_epsilon (p.f, 0.064, 1e-16);
  g_assert_cmpfloat (p.f, ==, p.f_laminar);
  g_assert_cmpint (p.has_laminar, ==, 0);
  /* Source: regime.h — ε⁺ and the elasticity are 0 when laminar */
  g_assert_cmpfloat (p.eps_plus, ==, 0.0);
  g_assert_cmpfloat (p.roughness_elasticity, ==, 0.0);
}

static void
test_point_transitional (void)
{
  RgFrictionPoint p;
  double f_turb, e;

  g_assert_cmpint (rg_friction_point (RG_FRICTION_COLEBROOK, NULL, 3000.0, 1e-3, &p, NULL), ==, RG_OK);
  g_assert_cmpint (rg_friction_colebrook (3000.0, 1e-3, &f_turb, NULL), ==, RG_OK);
  g_assert_cmpint (rg_friction_roughness_elasticity (3000.0, 1e-3, &e, NULL), ==, RG_OK);
  g_assert_cmpint (p.regime, ==, RG_REGIME_TRANSITIONAL);
  g_assert_cmpint (p.zone, ==, RG_ZONE_NONE);
  /* Source: regime.c — in the transitional range the design value is the
   * turbulent one and 64/Re is reported beside it */
  g_assert_cmpfloat (p.f, ==, f_turb);
  g_assert_cmpint (p.has_laminar, ==, 1);
  g_assert_cmpfloat_with_epsilon (p.f_laminar, 64.0 / 3000.0, 1e-16);
  /* Common practice (no single source): the turbulent value exceeds the
   * laminar one in this range, which makes it the conservative choice */
  g_assert_cmpfloat (p.f, >, p.f_laminar);
  g_assert_cmpfloat (p.roughness_elasticity, ==, e);
  g_assert_cmpfloat (p.eps_plus, ==, rg_roughness_reynolds (3000.0, 1e-3, p.f));

  /* custom limits move the same point into the laminar regime */
  const RgTransition t = { 3500.0, 5000.0 };
  g_assert_cmpint (rg_friction_point (RG_FRICTION_HAALAND, &t, 3000.0, 1e-3, &p, NULL), ==, RG_OK);
  g_assert_cmpint (p.regime, ==, RG_REGIME_LAMINAR);
  g_assert_cmpfloat (p.f, ==, p.f_laminar);
}

static void
test_point_turbulent_zones (void)
{
  /* each case: Re, ε/D; the zone comes from the oracle, so the test follows
   * the rule, not a table */
  const struct
  {
    double re, rr;
  } cases[] = {
    { 1e5, 0.0 }, { 1e4, 1e-5 }, { 1e5, 1e-3 }, { 1e6, 1e-3 }, { 1e7, 0.05 },
  };
  int seen[4] = { 0 };

  for (size_t i = 0; i < G_N_ELEMENTS (cases); i++)
    for (int m = 0; m < RG_FRICTION_N_MODELS; m++)
      {
        RgFrictionPoint p;
        double f;

        g_assert_cmpint (rg_friction_point ((RgFrictionModel) m, NULL, cases[i].re, cases[i].rr, &p, NULL), ==, RG_OK);
        g_assert_cmpint (rg_friction_model ((RgFrictionModel) m, cases[i].re, cases[i].rr, &f, NULL), ==, RG_OK);
        g_assert_cmpint (p.regime, ==, RG_REGIME_TURBULENT);
        g_assert_cmpint (p.has_laminar, ==, 0);
        g_assert_cmpfloat (p.f, ==, f);
        /* Source: ε⁺ = Re·(ε/D)·√(f/8) with the model's own f (regime.h) */
        const double ep = cases[i].re * cases[i].rr * sqrt (f / 8.0);
        g_assert_cmpfloat_with_epsilon (p.eps_plus, ep, 1e-12 * (1.0 + ep));
        /* Source: the zone rule on Colebrook's f, whatever the model
         * (regime.c), by the oracle */
        const RgRoughnessZone z = oracle_zone (cases[i].re, cases[i].rr);
        g_assert_cmpint (p.zone, ==, z);
        seen[z]++;
      }
  /* the cases were chosen to reach all three zones */
  g_assert_cmpint (seen[RG_ZONE_SMOOTH], >, 0);
  g_assert_cmpint (seen[RG_ZONE_TRANSITIONALLY_ROUGH], >, 0);
  g_assert_cmpint (seen[RG_ZONE_FULLY_ROUGH], >, 0);
}

/* Near an edge the models' friction factors differ by more than the
 * distance to the edge; the zone must not follow them. */
static void
test_point_zone_model_independent (void)
{
  double rr, f;
  g_assert_cmpint (rg_roughness_zone_smooth_edge (1e5, &rr, &f, NULL), ==, RG_OK);
  const double rrs[] = { rr * 0.999, rr * 1.001 };
  for (size_t i = 0; i < G_N_ELEMENTS (rrs); i++)
    {
      const RgRoughnessZone z = oracle_zone (1e5, rrs[i]);
      for (int m = 0; m < RG_FRICTION_N_MODELS; m++)
        {
          RgFrictionPoint p;
          g_assert_cmpint (rg_friction_point ((RgFrictionModel) m, NULL, 1e5, rrs[i], &p, NULL), ==, RG_OK);
          g_assert_cmpint (p.zone, ==, z);
        }
    }
  g_assert_cmpint (oracle_zone (1e5, rrs[0]), !=, oracle_zone (1e5, rrs[1]));
}

static void
test_point_errors (void)
{
  /* Source: domain in friction.h (0 < Re ≤ 1e10, 0 ≤ ε/D ≤ 0.1) and the
   * settable limits in regime.h */
  const RgSubjects re = RG_SUBJECT_BIT (RG_SUBJECT_REYNOLDS);
  const RgSubjects rr = RG_SUBJECT_BIT (RG_SUBJECT_RELATIVE_ROUGHNESS);
  const struct
  {
    double re, rr;
    RgSubjects subjects;
  } bad[] = {
    { NAN, 1e-3, re }, { INFINITY, 1e-3, re }, { 0.0, 1e-3, re }, { -5.0, 1e-3, re },
    { 2e10, 1e-3, re }, { 1e5, -1e-3, rr }, { 1e5, 0.2, rr }, { 1e5, NAN, rr },
  };
  RgFrictionPoint p, before;

  memset (&p, 0x5a, sizeof p);
  before = p;
  for (size_t i = 0; i < G_N_ELEMENTS (bad); i++)
    {
      RgError err = { 0 };
      g_assert_cmpint (rg_friction_point (RG_FRICTION_COLEBROOK, NULL, bad[i].re, bad[i].rr, &p, &err), ==, RG_ERR_DOMAIN);
      g_assert_cmpuint (strlen (err.text), >, 10);
      g_assert_cmpuint (err.subjects, ==, bad[i].subjects);
      g_assert_cmpint (memcmp (&p, &before, sizeof p), ==, 0);
    }

  const RgTransition bad_t = { 5000.0, 3000.0 };
  RgError err = { 0 };
  g_assert_cmpint (rg_friction_point (RG_FRICTION_COLEBROOK, &bad_t, 1e5, 1e-3, &p, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (strlen (err.text), >, 10);
  g_assert_cmpint (memcmp (&p, &before, sizeof p), ==, 0);

  g_assert_cmpint (rg_friction_point (RG_FRICTION_N_MODELS, NULL, 1e5, 1e-3, &p, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpint (memcmp (&p, &before, sizeof p), ==, 0);
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_MODEL));
}

/* The validity warnings: one per condition, none for a laminar point or a
 * point inside the stated window. */
static void
test_validity_warnings (void)
{
  static const struct
  {
    RgFrictionModel model;
    double re, rr;
    int count;
    const char *needle;
  } cases[] = {
    /* Source: Hagen–Poiseuille holds in laminar flow: nothing to warn. */
    { RG_FRICTION_COLEBROOK, 1000.0, 1e-3, 0, NULL },
    /* From memory of Moody (1944): 4000 ≤ Re ≤ 1e8, ε/D ≤ 0.05. */
    { RG_FRICTION_COLEBROOK, 1.0e5, 1e-3, 0, NULL },
    { RG_FRICTION_COLEBROOK, 3000.0, 1e-3, 1, "transitional" },
    { RG_FRICTION_COLEBROOK, 5.0e8, 1e-4, 1, "range stated for Colebrook" },
    { RG_FRICTION_HAALAND, 1.0e5, 0.07, 1, "largest stated for Haaland" },
    /* From memory of Swamee and Jain (1976): 5000 ≤ Re, 1e-6 ≤ ε/D ≤ 1e-2. */
    { RG_FRICTION_SWAMEE_JAIN, 4500.0, 1e-3, 1, "range stated for Swamee" },
    { RG_FRICTION_SWAMEE_JAIN, 1.0e5, 1e-7, 1, "smallest stated for Swamee" },
    { RG_FRICTION_SWAMEE_JAIN, 1.0e5, 0.0, 0, NULL },
  };

  for (gsize i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      RgFrictionPoint pt;
      RgWarnings w = { 0 };
      RgError err = { 0 };

      rg_warnings_clear (&w);
      g_assert_cmpint (rg_friction_point (cases[i].model, NULL, cases[i].re, cases[i].rr,
                                          &pt, &err), ==, RG_OK);
      rg_friction_validity_warnings (cases[i].model, cases[i].re, cases[i].rr, &pt, &w);
      g_test_message ("case %zu: %s", i, w.count > 0 ? w.text[0] : "(none)");
      g_assert_cmpint (w.count, ==, cases[i].count);
      if (cases[i].needle != NULL)
        g_assert_nonnull (strstr (w.text[0], cases[i].needle));
    }
}

int
main (int argc, char *argv[])
{
  g_test_init (&argc, &argv, NULL);

  g_test_add_func ("/regime/transition/default", test_default_thresholds);
  g_test_add_func ("/regime/classify/default-edges", test_classify_default_edges);
  g_test_add_func ("/regime/classify/custom", test_classify_custom);
  g_test_add_func ("/regime/transition/errors", test_transition_check_errors);
  g_test_add_func ("/regime/roughness-reynolds", test_roughness_reynolds);
  g_test_add_func ("/regime/zone/tolerance", test_zone_tolerance);
  g_test_add_func ("/regime/zone/steel-example", test_zone_steel_example);
  g_test_add_func ("/regime/zone/smooth-edge", test_zone_smooth_edge);
  g_test_add_func ("/regime/zone/rough-edge", test_zone_rough_edge);
  g_test_add_func ("/regime/zone/edges-eps-plus", test_zone_edges_eps_plus);
  g_test_add_func ("/regime/zone/grid", test_zone_grid);
  g_test_add_func ("/regime/zone/errors", test_zone_errors);
  g_test_add_func ("/regime/ids", test_ids);
  g_test_add_func ("/regime/point/laminar", test_point_laminar);
  g_test_add_func ("/regime/point/transitional", test_point_transitional);
  g_test_add_func ("/regime/point/turbulent-zones", test_point_turbulent_zones);
  g_test_add_func ("/regime/point/zone-model-independent", test_point_zone_model_independent);
  g_test_add_func ("/regime/point/errors", test_point_errors);
  g_test_add_func ("/regime/validity-warnings", test_validity_warnings);

  return g_test_run ();
}
