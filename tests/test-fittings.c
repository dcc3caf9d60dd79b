/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Fittings: catalog, the 3-K formula, sums with counts and plain K. */
#include "core/fittings.h"

#include <glib.h>
#include <math.h>
#include <string.h>

static void
assert_rel (double got, double want, double tol)
{
  if (!(fabs (got - want) <= tol * fabs (want)))
    g_error ("got %.17g, want %.17g (relative tolerance %g)", got, want, tol);
}

static const RgFitting *
fitting (const char *id)
{
  const RgFitting *f = NULL;
  RgError err;
  if (rg_fitting_lookup (id, &f, &err) != RG_OK)
    g_error ("%s: %s", id, err.text);
  return f;
}

static void
test_catalog (void)
{
  static const char *const needed[] = {
    "elbow-90-standard", "elbow-90-long-radius", "elbow-45-standard",
    "tee-run-threaded", "tee-branch-threaded", "valve-gate", "valve-globe",
    "valve-ball", "check-swing", "check-lift", "entrance-sharp",
    "entrance-rounded", "exit",
  };
  for (size_t i = 0; i < G_N_ELEMENTS (needed); i++)
    fitting (needed[i]);
  for (int i = 0; i < rg_fitting_count (); i++)
    {
      const RgFitting *f = rg_fitting_at (i);
      g_assert_true (f == fitting (f->id));
      g_assert_true (strlen (f->source) > 20);
    }
  g_assert_null (rg_fitting_at (rg_fitting_count ()));
  g_assert_true (fitting ("Valve-Gate") == fitting ("valve-gate"));

  const RgFitting *f = fitting ("elbow-90-standard");
  /* From memory of Darby (2001), Chem. Eng. 108(4), Table 1: standard
   * threaded 90° elbow K1 = 800, Ki = 0.14, Kd = 4.0; not checked against
   * the document (python3-fluids fluids.fittings.Darby agrees: crosscheck) */
  g_assert_cmpfloat (f->k1, ==, 800.0);
  g_assert_cmpfloat (f->ki, ==, 0.14);
  g_assert_cmpfloat (f->kd, ==, 4.0);

  const RgFitting *g = NULL;
  RgError err;
  g_assert_cmpint (rg_fitting_lookup ("elbow-90-standrd", &g, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_nonnull (strstr (err.text, "elbow-90-standard"));
  g_assert_cmpint (rg_fitting_lookup (NULL, &g, &err), ==, RG_ERR_NOT_FOUND);
}

static void
test_three_k (void)
{
  const RgFitting *f = fitting ("elbow-90-standard");
  double k;

  /* Source: Darby (2001), K = K1/Re + Ki(1 + Kd/D^0.3), D in inches; hand
   * calculation for Re = 1e5, D = 2.067 in:
   * 800/1e5 + 0.14·(1 + 4/2.067^0.3) = 0.008 + 0.14·(1 + 4/1.243375) = 0.598387 */
  g_assert_cmpint (rg_fitting_k (f, 1.0e5, 2.067 * 0.0254, &k, NULL), ==, RG_OK);
  assert_rel (k, 0.598387, 1e-6);

  /* Source: Darby (2001): at low Re the K1/Re term dominates; hand
   * calculation at Re = 10, D = 1 in: 80 + 0.14·5 = 80.7 */
  g_assert_cmpint (rg_fitting_k (f, 10.0, 0.0254, &k, NULL), ==, RG_OK);
  assert_rel (k, 80.7, 1e-12);

  /* Source: Hooper (1981) exit, K1 = 0, Kinf = 1: K = 1 at any Re and D. */
  g_assert_cmpint (rg_fitting_k (fitting ("exit"), 3.0e4, 0.3, &k, NULL), ==, RG_OK);
  assert_rel (k, 1.0, 1e-15);

  /* Larger bores lose less (Darby 2001: the Kd/D^0.3 term). */
  double k_small, k_large;
  rg_fitting_k (f, 1.0e6, 0.025, &k_small, NULL);
  rg_fitting_k (f, 1.0e6, 0.5, &k_large, NULL);
  g_assert_cmpfloat (k_large, <, k_small);
}

static void
test_three_k_errors (void)
{
  const RgFitting *f = fitting ("valve-globe");
  double k = -1.0;
  RgError err;

  g_assert_cmpint (rg_fitting_k (f, 0.0, 0.05, &k, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "Reynolds"));
  g_assert_cmpint (rg_fitting_k (f, NAN, 0.05, &k, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpint (rg_fitting_k (f, 1e5, -0.05, &k, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "diameter"));
  g_assert_cmpint (rg_fitting_k (f, 1e5, INFINITY, &k, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpint (rg_fitting_k (NULL, 1e5, 0.05, &k, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpfloat (k, ==, -1.0);
}

static void
test_sum (void)
{
  const double re = 2.0e5, d = 0.1023;
  const RgFitting *elbow = fitting ("elbow-90-long-radius");
  const RgFitting *gate = fitting ("valve-gate");
  double ke, kg, sum;
  RgError err;

  rg_fitting_k (elbow, re, d, &ke, NULL);
  rg_fitting_k (gate, re, d, &kg, NULL);
  RgFittingUse uses[] = {
    { elbow, 0.0, 4.0 },
    { gate, 0.0, 1.0 },
    { NULL, 0.5, 2.0 },   /* a plain K of 0.5, twice */
    { gate, 0.0, 0.0 },   /* a zero count adds nothing */
  };
  /* Source: Darby (2001): the losses of fittings in series add. */
  g_assert_cmpint (rg_fittings_k_sum (uses, 4, re, d, &sum, &err), ==, RG_OK);
  assert_rel (sum, 4.0 * ke + kg + 1.0, 1e-14);

  g_assert_cmpint (rg_fittings_k_sum (NULL, 0, re, d, &sum, &err), ==, RG_OK);
  g_assert_cmpfloat (sum, ==, 0.0);

  RgFittingUse bad_count[] = { { elbow, 0.0, -1.0 } };
  g_assert_cmpint (rg_fittings_k_sum (bad_count, 1, re, d, &sum, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "count"));
  RgFittingUse bad_k[] = { { NULL, -0.2, 1.0 } };
  g_assert_cmpint (rg_fittings_k_sum (bad_k, 1, re, d, &sum, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "K"));
  g_assert_cmpint (rg_fittings_k_sum (uses, -1, re, d, &sum, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpint (rg_fittings_k_sum (uses, 2, -5.0, d, &sum, &err), ==, RG_ERR_DOMAIN);
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/fittings/catalog", test_catalog);
  g_test_add_func ("/fittings/three-k", test_three_k);
  g_test_add_func ("/fittings/three-k/errors", test_three_k_errors);
  g_test_add_func ("/fittings/sum", test_sum);
  return g_test_run ();
}
