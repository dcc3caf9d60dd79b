/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Tests of src/core/friction.c: laminar 64/Re, Colebrook against an exact
 * closed-form solution (Lambert W from GSL) and against its own residual,
 * the roughness elasticity against finite differences, the explicit
 * correlations against published example values and against Colebrook,
 * and every domain error. */
#include "core/friction.h"

#include <float.h>
#include <glib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_sf_lambert.h>
#include <math.h>
#include <string.h>

/* Accuracy promised by friction.h for Colebrook. */
#define COLEBROOK_REL_TOL 1e-13

/* Result slot sentinel: a failing call must leave it as it was. */
#define UNTOUCHED (-12345.0)

static double
rel_diff (double a, double b)
{
  return fabs (a - b) / fabs (b);
}

/* Log-spaced value i of n+1 between lo and hi. */
static double
log_space (double lo, double hi, int i, int n)
{
  /* exact ends: exp(log(hi)) may round above hi */
  if (i == 0)
    return lo;
  if (i == n)
    return hi;
  return exp (log (lo) + (log (hi) - log (lo)) * i / n);
}

/* Relative roughness for grid index j of n+1: j = 0 is a smooth pipe, the
 * rest log-spaced between lo and hi. */
static double
rr_grid (double lo, double hi, int j, int n)
{
  return j == 0 ? 0.0 : log_space (lo, hi, j - 1, n - 1);
}

static void
test_laminar (void)
{
  /* Source: Hagen–Poiseuille law, f = 64/Re (any fluid-mechanics text,
   * e.g. White, Fluid Mechanics, eq. for laminar pipe flow) */
  const double re[] = { 1e-6, 0.5, 1.0, 100.0, 1999.0, 2000.0, 1e7 };
  for (size_t i = 0; i < G_N_ELEMENTS (re); i++)
    {
      double f = UNTOUCHED;
      g_assert_cmpint (rg_friction_laminar (re[i], &f, NULL), ==, RG_OK);
      g_assert_cmpfloat (rel_diff (f * re[i], 64.0), <=, 2 * DBL_EPSILON);
    }
}

/* Exact Colebrook through the Lambert W function.  With x = 1/√f,
 * c = 2/ln10, r = (ε/D)/3.7, b = 2.51/Re, Colebrook reads x = −c·ln(r + b·x).
 * Put z = r + b·x: z = r − b·c·ln z, i.e. (z/(bc))·e^(z/(bc)) = e^(r/(bc))/(bc),
 * so z = bc·W0(e^(r/(bc))/(bc)) and x = c·W0(…) − r/b.
 * The subtraction loses about log10((c·W + r/b)/x) digits, so the check
 * allows that much on top of COLEBROOK_REL_TOL; GSL states W0 to a few
 * DBL_EPSILON (its own error estimate is added too). */
static gboolean
colebrook_lambert (double re, double rr, double *f, double *rel_tol)
{
  const long double c = 2.0L / logl (10.0L);
  const long double r = rr / 3.7L, b = 2.51L / re;
  const long double arg_log = r / (b * c) - logl (b * c);
  gsl_sf_result w;

  if (arg_log > 700.0L) /* e^arg would overflow a double */
    return FALSE;
  if (gsl_sf_lambert_W0_e ((double) expl (arg_log), &w) != GSL_SUCCESS)
    return FALSE;
  const long double cw = c * w.val, rb = r / b;
  const long double x = cw - rb;
  *f = (double) (1.0L / (x * x));
  /* relative error of x from the subtraction and from W, doubled for f */
  *rel_tol = (double) (2.0L * ((cw + rb) / x) * (4 * DBL_EPSILON + w.err / w.val));
  return TRUE;
}

static void
test_colebrook_lambert (void)
{
  int checked = 0;

  gsl_set_error_handler_off ();
  for (int i = 0; i <= 120; i++)
    for (int j = 0; j <= 60; j++)
      {
        const double re = log_space (RG_FRICTION_RE_MIN, RG_FRICTION_RE_MAX, i, 120);
        const double rr = rr_grid (1e-9, RG_FRICTION_RR_MAX, j, 60);
        double f = UNTOUCHED, f_exact, tol;

        if (!colebrook_lambert (re, rr, &f_exact, &tol))
          continue;
        /* skip points where the closed form itself is too imprecise to
         * judge 1e-13 (deep in the fully rough zone, where the residual
         * test and the mpmath cross-check cover the solver) */
        if (tol > COLEBROOK_REL_TOL)
          continue;
        g_assert_cmpint (rg_friction_colebrook (re, rr, &f, NULL), ==, RG_OK);
        /* Source: GSL gsl_sf_lambert_W0, exact closed form above */
        if (rel_diff (f, f_exact) > COLEBROOK_REL_TOL + tol)
          g_test_fail_printf ("Re %.17g, ε/D %.17g: f %.17g, Lambert W %.17g",
                              re, rr, f, f_exact);
        checked++;
      }
  /* the smooth column and the moderately rough part must be covered */
  g_test_message ("%d points checked against the Lambert W solution", checked);
  g_assert_cmpint (checked, >, 3000);
}

/* Colebrook's residual x + c·ln(r + b·x) in long double, divided by the
 * derivative 1 + c·b/(r + b·x): the first-order relative error of x. */
static long double
colebrook_relative_error (double re, double rr, double f)
{
  const long double c = 2.0L / logl (10.0L);
  const long double x = 1.0L / sqrtl ((long double) f);
  const long double r = rr / 3.7L, b = 2.51L / re;
  const long double u = r + b * x;
  return (x + c * logl (u)) / (1.0L + c * b / u) / x;
}

static void
test_colebrook_residual (void)
{
  double worst = 0.0;

  for (int i = 0; i <= 150; i++)
    for (int j = 0; j <= 80; j++)
      {
        const double re = log_space (RG_FRICTION_RE_MIN, RG_FRICTION_RE_MAX, i, 150);
        const double rr = rr_grid (1e-10, RG_FRICTION_RR_MAX, j, 80);
        double f = UNTOUCHED;

        g_assert_cmpint (rg_friction_colebrook (re, rr, &f, NULL), ==, RG_OK);
        /* f ∝ x⁻², so its relative error is twice that of x */
        const double e = 2.0 * fabs ((double) colebrook_relative_error (re, rr, f));
        worst = fmax (worst, e);
        /* Source: Colebrook (1939) equation; tolerance from friction.h */
        if (e > COLEBROOK_REL_TOL)
          g_test_fail_printf ("Re %.17g, ε/D %.17g: relative error %.3g", re, rr, e);
      }
  g_test_message ("largest relative error from the residual: %.3g", worst);
}

static void
test_colebrook_reference_value (void)
{
  double f = UNTOUCHED;

  g_assert_cmpint (rg_friction_colebrook (1e5, 1e-4, &f, NULL), ==, RG_OK);
  /* Source: python3-fluids 1.0.22, `fluids.friction.Colebrook` docstring
   * example, Colebrook(1E5, 1E-4) = 0.018513866077471 (15 digits shown) */
  g_assert_cmpfloat (rel_diff (f, 0.018513866077471), <=, 1e-13);
}

static void
test_elasticity (void)
{
  /* Common practice (no single source): a central difference in ln(ε/D)
   * with step h has truncation error O(h²) and rounding error about
   * DBL_EPSILON/h; h = 1e-4 puts both near 1e-9 here. */
  const double h = 1e-4;

  for (int i = 0; i <= 40; i++)
    for (int j = 1; j <= 30; j++)
      {
        const double re = log_space (RG_FRICTION_RE_MIN, RG_FRICTION_RE_MAX, i, 40);
        /* keep rr·e^h inside the domain */
        const double rr = log_space (1e-8, RG_FRICTION_RR_MAX * exp (-2 * h), j - 1, 29);
        double e = UNTOUCHED, f_hi, f_lo;

        g_assert_cmpint (rg_friction_roughness_elasticity (re, rr, &e, NULL), ==, RG_OK);
        g_assert_cmpint (rg_friction_colebrook (re, rr * exp (h), &f_hi, NULL), ==, RG_OK);
        g_assert_cmpint (rg_friction_colebrook (re, rr * exp (-h), &f_lo, NULL), ==, RG_OK);
        const double fd = (log (f_hi) - log (f_lo)) / (2.0 * h);
        /* Source: central finite difference of Colebrook, tolerance above */
        if (fabs (e - fd) > 1e-7)
          g_test_fail_printf ("Re %g, ε/D %g: elasticity %.12g, difference quotient %.12g",
                              re, rr, e, fd);
        /* Source: the fully rough limit −2/ln((ε/D)/3.7) bounds it (implicit
         * differentiation of Colebrook, see friction.c) */
        g_assert_cmpfloat (e, >, 0.0);
        g_assert_cmpfloat (e, <, -2.0 / log (rr / 3.7));
      }
}

static void
test_elasticity_smooth (void)
{
  double e = UNTOUCHED;

  g_assert_cmpint (rg_friction_roughness_elasticity (1e5, 0.0, &e, NULL), ==, RG_OK);
  /* Source: Colebrook (1939) — ε/D enters only through (ε/D)/3.7, so the
   * derivative times ε/D is exactly 0 at ε/D = 0 */
  g_assert_cmpfloat (e, ==, 0.0);
}

static void
test_haaland_deviation (void)
{
  /* Range: Haaland's stated range, 4000 ≤ Re ≤ 1e8 and 1e-6 ≤ ε/D ≤ 0.05
   * (as given in the python3-fluids `fluids.friction.Haaland` docstring),
   * plus the smooth pipe. */
  double worst = 0.0;

  for (int i = 0; i <= 200; i++)
    for (int j = 0; j <= 200; j++)
      {
        const double re = log_space (4000.0, 1e8, i, 200);
        const double rr = rr_grid (1e-6, 0.05, j, 200);
        double fc, fh;

        g_assert_cmpint (rg_friction_colebrook (re, rr, &fc, NULL), ==, RG_OK);
        g_assert_cmpint (rg_friction_haaland (re, rr, &fh, NULL), ==, RG_OK);
        worst = fmax (worst, rel_diff (fh, fc));
      }
  g_test_message ("largest Haaland deviation from Colebrook: %.4f", worst);
  /* From memory of Haaland (1983): within about 1.5 % of Colebrook in the
   * range above; not checked against the document.  2 % leaves margin. */
  g_assert_cmpfloat (worst, <, 0.02);
}

static void
test_explicit_reference_values (void)
{
  double f;

  g_assert_cmpint (rg_friction_haaland (1e5, 1e-4, &f, NULL), ==, RG_OK);
  /* Source: python3-fluids 1.0.22, `fluids.friction.Haaland` docstring
   * example, Haaland(1E5, 1E-4) = 0.018265053014793857 */
  g_assert_cmpfloat (rel_diff (f, 0.018265053014793857), <=, 1e-14);

  g_assert_cmpint (rg_friction_churchill (1e5, 1e-4, &f, NULL), ==, RG_OK);
  /* Source: python3-fluids 1.0.22, `fluids.friction.Churchill_1977`
   * docstring example, Churchill_1977(1E5, 1E-4) = 0.018462624566280075 */
  g_assert_cmpfloat (rel_diff (f, 0.018462624566280075), <=, 1e-13);

  g_assert_cmpint (rg_friction_swamee_jain (1e5, 1e-4, &f, NULL), ==, RG_OK);
  /* Source: Swamee and Jain (1976), f = 0.25/[log10(ε/D/3.7 + 5.74/Re^0.9)]²,
   * evaluated with mpmath at 40 digits: 0.018452445307566379 (python3-fluids
   * writes (6.97/Re)^0.9, i.e. 5.73997 for 5.74, and differs by 1e-6) */
  g_assert_cmpfloat (rel_diff (f, 0.018452445307566379), <=, 1e-14);
}

static void
test_churchill_laminar (void)
{
  /* Source: Churchill (1977) equation.  With A ≥ 0, (A + B)^(−3/2) ≤
   * B^(−3/2) = (Re/37530)^24, so f differs from 8·(8/Re) = 64/Re by at
   * most (1/12)·(Re/37530)^24·(Re/8)^12: about 2e-14 at Re 1000 and
   * 1.4e-3 at Re 2000. */
  for (int i = 0; i <= 300; i++)
    {
      const double re = log_space (1.0, 2000.0, i, 300);
      const double bound = pow (re / 37530.0, 24) * pow (re / 8.0, 12) / 12.0;
      double f = UNTOUCHED;

      g_assert_cmpint (rg_friction_churchill (re, 0.01, &f, NULL), ==, RG_OK);
      const double dev = f * re / 64.0 - 1.0;
      g_assert_cmpfloat (dev, >=, -1e-14);
      g_assert_cmpfloat (dev, <=, bound * (1.0 + 1e-6) + 1e-14);
    }
}

static void
test_domain_edges_accepted (void)
{
  /* Source: the computed domain in friction.h (edges included) */
  const double re[] = { RG_FRICTION_RE_MIN, RG_FRICTION_RE_MAX };
  const double rr[] = { 0.0, RG_FRICTION_RR_MAX };

  for (size_t i = 0; i < G_N_ELEMENTS (re); i++)
    for (size_t j = 0; j < G_N_ELEMENTS (rr); j++)
      for (int m = 0; m < RG_FRICTION_N_MODELS; m++)
        {
          double f = UNTOUCHED, e = UNTOUCHED;
          RgError err = { 0 };

          g_assert_cmpint (rg_friction_model ((RgFrictionModel) m, re[i], rr[j], &f, &err), ==, RG_OK);
          g_assert_true (isfinite (f) && f > 0.0 && f < 1.0);
          g_assert_cmpint (rg_friction_roughness_elasticity (re[i], rr[j], &e, &err), ==, RG_OK);
          g_assert_true (isfinite (e) && e >= 0.0);
        }
}

typedef RgStatus (*TwoArgFn) (double, double, double *, RgError *);

/* The subjects a domain error of the friction functions may name: the
 * Reynolds number, the relative roughness, or the model. */
static const RgSubjects FRICTION_SUBJECTS
  = RG_SUBJECT_BIT (RG_SUBJECT_REYNOLDS) | RG_SUBJECT_BIT (RG_SUBJECT_RELATIVE_ROUGHNESS)
    | RG_SUBJECT_BIT (RG_SUBJECT_MODEL);

static void
assert_domain_error (const char *what, RgStatus st, const RgError *err,
                     double out)
{
  if (st != RG_ERR_DOMAIN)
    g_test_fail_printf ("%s: status %d, expected RG_ERR_DOMAIN", what, st);
  g_assert_cmpint (err->status, ==, st);
  /* exactly one argument at fault */
  g_assert_cmpuint (err->subjects, !=, 0);
  g_assert_cmpuint (err->subjects & ~FRICTION_SUBJECTS, ==, 0);
  g_assert_cmpuint (err->subjects & (err->subjects - 1), ==, 0);
  /* one sentence: starts with a capital letter, ends with a full stop */
  const size_t n = strlen (err->text);
  g_assert_cmpuint (n, >, 10);
  g_assert_true (g_ascii_isupper (err->text[0]));
  g_assert_cmpint (err->text[n - 1], ==, '.');
  g_assert_cmpfloat (out, ==, UNTOUCHED);
}

static void
test_domain_errors (void)
{
  /* Source: the computed domain in friction.h: Re in [1e3, 1e10],
   * ε/D in [0, 0.1]; Churchill any 0 < Re ≤ 1e10 */
  const struct
  {
    double re, rr;
  } bad_turbulent[] = {
    { NAN, 1e-4 }, { INFINITY, 1e-4 }, { -INFINITY, 1e-4 }, { -1e5, 1e-4 },
    { 0.0, 1e-4 }, { 999.999, 1e-4 }, { 1.0000001e10, 1e-4 },
    { 1e5, NAN }, { 1e5, INFINITY }, { 1e5, -INFINITY }, { 1e5, -1e-9 },
    { 1e5, 0.1000001 }, { NAN, NAN },
  };
  const struct
  {
    const char *name;
    TwoArgFn fn;
  } fns[] = {
    { "colebrook", rg_friction_colebrook },
    { "haaland", rg_friction_haaland },
    { "swamee-jain", rg_friction_swamee_jain },
    { "churchill", rg_friction_churchill },
    { "elasticity", rg_friction_roughness_elasticity },
  };

  for (size_t k = 0; k < G_N_ELEMENTS (fns); k++)
    for (size_t i = 0; i < G_N_ELEMENTS (bad_turbulent); i++)
      {
        const double re = bad_turbulent[i].re, rr = bad_turbulent[i].rr;
        double out = UNTOUCHED;
        RgError err = { 0 };

        /* Churchill accepts 0 < Re < 1000 (all regimes) */
        if (fns[k].fn == rg_friction_churchill && re == 999.999)
          continue;
        g_autofree char *what = g_strdup_printf ("%s(%g, %g)", fns[k].name, re, rr);
        assert_domain_error (what, fns[k].fn (re, rr, &out, &err), &err, out);
        /* the argument at fault: the Reynolds number is checked first */
        g_assert_cmpuint (err.subjects, ==,
                          (fns[k].fn == rg_friction_churchill
                           ? (re > 0.0 && re <= RG_FRICTION_RE_MAX)
                           : (re >= RG_FRICTION_RE_MIN && re <= RG_FRICTION_RE_MAX))
                          ? RG_SUBJECT_BIT (RG_SUBJECT_RELATIVE_ROUGHNESS)
                          : RG_SUBJECT_BIT (RG_SUBJECT_REYNOLDS));
        /* err may be NULL */
        g_assert_cmpint (fns[k].fn (re, rr, &out, NULL), ==, RG_ERR_DOMAIN);
        g_assert_cmpfloat (out, ==, UNTOUCHED);
      }

  /* the model dispatcher passes the errors on */
  for (int m = 0; m < RG_FRICTION_N_MODELS; m++)
    {
      double out = UNTOUCHED;
      RgError err = { 0 };
      assert_domain_error ("model", rg_friction_model ((RgFrictionModel) m, 1e5, -1.0, &out, &err),
                           &err, out);
    }

  /* laminar: any finite positive Re */
  const double bad_laminar[] = { NAN, INFINITY, -INFINITY, -1.0, 0.0, -0.0, 1e-310 };
  for (size_t i = 0; i < G_N_ELEMENTS (bad_laminar); i++)
    {
      double out = UNTOUCHED;
      RgError err = { 0 };
      assert_domain_error ("laminar", rg_friction_laminar (bad_laminar[i], &out, &err), &err, out);
    }
}

static void
test_unknown_model (void)
{
  double out = UNTOUCHED;
  RgError err = { 0 };
  RgFrictionModel model = RG_FRICTION_HAALAND;

  assert_domain_error ("model N", rg_friction_model (RG_FRICTION_N_MODELS, 1e5, 1e-4, &out, &err),
                       &err, out);
  assert_domain_error ("model 99", rg_friction_model ((RgFrictionModel) 99, 1e5, 1e-4, &out, &err),
                       &err, out);

  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_MODEL));
  g_assert_cmpint (rg_friction_model_from_id ("moody", &model, &err), ==, RG_ERR_PARSE);
  g_assert_cmpuint (strlen (err.text), >, 0);
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_MODEL));
  g_assert_cmpint (model, ==, RG_FRICTION_HAALAND);
  g_assert_cmpint (rg_friction_model_from_id (NULL, &model, &err), ==, RG_ERR_PARSE);
  g_assert_cmpint (model, ==, RG_FRICTION_HAALAND);
  g_assert_cmpstr (rg_friction_model_id (RG_FRICTION_N_MODELS), ==, "unknown");
}

static void
test_model_ids (void)
{
  /* Source: the identifiers documented in friction.h */
  const char *ids[] = { "colebrook", "haaland", "swamee-jain", "churchill" };

  for (int m = 0; m < RG_FRICTION_N_MODELS; m++)
    {
      RgFrictionModel back = RG_FRICTION_N_MODELS;
      g_assert_cmpstr (rg_friction_model_id ((RgFrictionModel) m), ==, ids[m]);
      g_assert_cmpint (rg_friction_model_from_id (ids[m], &back, NULL), ==, RG_OK);
      g_assert_cmpint (back, ==, m);
      g_assert_cmpuint (strlen (rg_friction_model_title ((RgFrictionModel) m)), >, 0);
    }
}

static void
test_model_dispatch (void)
{
  const TwoArgFn fns[RG_FRICTION_N_MODELS] = {
    [RG_FRICTION_COLEBROOK] = rg_friction_colebrook,
    [RG_FRICTION_HAALAND] = rg_friction_haaland,
    [RG_FRICTION_SWAMEE_JAIN] = rg_friction_swamee_jain,
    [RG_FRICTION_CHURCHILL] = rg_friction_churchill,
  };

  for (int m = 0; m < RG_FRICTION_N_MODELS; m++)
    {
      double a, b;
      g_assert_cmpint (rg_friction_model ((RgFrictionModel) m, 3e4, 2e-3, &a, NULL), ==, RG_OK);
      g_assert_cmpint (fns[m] (3e4, 2e-3, &b, NULL), ==, RG_OK);
      g_assert_cmpfloat (a, ==, b);
    }
}

int
main (int argc, char *argv[])
{
  g_test_init (&argc, &argv, NULL);

  g_test_add_func ("/friction/laminar/64-over-re", test_laminar);
  g_test_add_func ("/friction/colebrook/lambert-w", test_colebrook_lambert);
  g_test_add_func ("/friction/colebrook/residual", test_colebrook_residual);
  g_test_add_func ("/friction/colebrook/reference-value", test_colebrook_reference_value);
  g_test_add_func ("/friction/elasticity/finite-difference", test_elasticity);
  g_test_add_func ("/friction/elasticity/smooth", test_elasticity_smooth);
  g_test_add_func ("/friction/haaland/deviation", test_haaland_deviation);
  g_test_add_func ("/friction/explicit/reference-values", test_explicit_reference_values);
  g_test_add_func ("/friction/churchill/laminar", test_churchill_laminar);
  g_test_add_func ("/friction/domain/edges", test_domain_edges_accepted);
  g_test_add_func ("/friction/domain/errors", test_domain_errors);
  g_test_add_func ("/friction/model/unknown", test_unknown_model);
  g_test_add_func ("/friction/model/ids", test_model_ids);
  g_test_add_func ("/friction/model/dispatch", test_model_dispatch);

  return g_test_run ();
}
