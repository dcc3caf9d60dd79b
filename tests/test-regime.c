/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Tests of src/core/regime.c: regime thresholds (default and custom, with
 * their edges), the roughness Reynolds number and zone limits, and the
 * combined friction point. */
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

static void
test_zone_edges (void)
{
  /* From memory of Nikuradse (1933) as summarised in Schlichting,
   * Boundary-Layer Theory: smooth for ε⁺ < 5, fully rough for ε⁺ > 70;
   * edition and section not checked */
  g_assert_cmpfloat (RG_EPS_PLUS_SMOOTH_MAX, ==, 5.0);
  g_assert_cmpfloat (RG_EPS_PLUS_FULLY_ROUGH_MIN, ==, 70.0);
  /* Source: the edge rule documented in regime.h (both limits belong to
   * the transitionally rough zone) */
  g_assert_cmpint (rg_roughness_zone_classify (0.0), ==, RG_ZONE_SMOOTH);
  g_assert_cmpint (rg_roughness_zone_classify (nextafter (5.0, 0.0)), ==, RG_ZONE_SMOOTH);
  g_assert_cmpint (rg_roughness_zone_classify (5.0), ==, RG_ZONE_TRANSITIONALLY_ROUGH);
  g_assert_cmpint (rg_roughness_zone_classify (70.0), ==, RG_ZONE_TRANSITIONALLY_ROUGH);
  g_assert_cmpint (rg_roughness_zone_classify (nextafter (70.0, 100.0)), ==, RG_ZONE_FULLY_ROUGH);
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
  /* each case: Re, ε/D, the zone its own ε⁺ gives (checked against the
   * limits directly, so the test follows the definition, not a table) */
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
        /* Source: ε⁺ = Re·(ε/D)·√(f/8) and the limits 5 and 70 (regime.c) */
        const double ep = cases[i].re * cases[i].rr * sqrt (f / 8.0);
        g_assert_cmpfloat_with_epsilon (p.eps_plus, ep, 1e-12 * (1.0 + ep));
        const RgRoughnessZone z = ep < 5.0 ? RG_ZONE_SMOOTH
                                  : ep > 70.0 ? RG_ZONE_FULLY_ROUGH
                                              : RG_ZONE_TRANSITIONALLY_ROUGH;
        g_assert_cmpint (p.zone, ==, z);
        seen[z]++;
      }
  /* the cases were chosen to reach all three zones */
  g_assert_cmpint (seen[RG_ZONE_SMOOTH], >, 0);
  g_assert_cmpint (seen[RG_ZONE_TRANSITIONALLY_ROUGH], >, 0);
  g_assert_cmpint (seen[RG_ZONE_FULLY_ROUGH], >, 0);
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
  g_test_add_func ("/regime/zone/edges", test_zone_edges);
  g_test_add_func ("/regime/ids", test_ids);
  g_test_add_func ("/regime/point/laminar", test_point_laminar);
  g_test_add_func ("/regime/point/transitional", test_point_transitional);
  g_test_add_func ("/regime/point/turbulent-zones", test_point_turbulent_zones);
  g_test_add_func ("/regime/point/errors", test_point_errors);
  g_test_add_func ("/regime/validity-warnings", test_validity_warnings);

  return g_test_run ();
}
