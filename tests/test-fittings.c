/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Fittings: catalog, the 3-K formula, Crane's K = n·f_T (butterfly
 * valves), sums with counts and plain K, warnings. */
#include "core/catalog.h"
#include "core/fittings.h"
#include "core/units.h"

#include <glib.h>
#include <math.h>
#include <string.h>

#define FITTING RG_SUBJECT_BIT (RG_SUBJECT_FITTING)
#define DIAMETER RG_SUBJECT_BIT (RG_SUBJECT_DIAMETER)
#define REYNOLDS RG_SUBJECT_BIT (RG_SUBJECT_REYNOLDS)

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
  RgError err = { 0 };
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
    "entrance-rounded", "exit", "valve-butterfly",
    "valve-butterfly-double-offset", "valve-butterfly-triple-offset",
  };
  for (size_t i = 0; i < G_N_ELEMENTS (needed); i++)
    fitting (needed[i]);
  for (int i = 0; i < rg_fitting_count (); i++)
    {
      const RgFitting *f = rg_fitting_at (i);
      g_assert_true (f == fitting (f->id));
      g_assert_true (strlen (f->source) > 20);
      if (f->method == RG_FITTING_METHOD_CRANE_FT)
        {
          g_assert_cmpint (f->n_bands, >=, 1);
          g_assert_cmpint (f->n_bands, <=, RG_FITTING_BANDS_MAX);
          g_assert_cmpfloat (f->min_bore_m, >, 0.0);
          for (int b = 0; b < f->n_bands; b++)
            {
              g_assert_cmpfloat (f->band_n[b], >, 0.0);
              g_assert_cmpfloat (f->band_max_bore_m[b], >,
                                 b > 0 ? f->band_max_bore_m[b - 1] : f->min_bore_m);
              g_assert_nonnull (f->band_nominal[b]);
            }
        }
      else
        g_assert_cmpint (f->method, ==, RG_FITTING_METHOD_3K);
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
  RgError err = { 0 };
  g_assert_cmpint (rg_fitting_lookup ("elbow-90-standrd", &g, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_nonnull (strstr (err.text, "elbow-90-standard"));
  g_assert_cmpuint (err.subjects, ==, FITTING);
  g_assert_cmpint (rg_fitting_lookup (NULL, &g, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_cmpuint (err.subjects, ==, FITTING);
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
  RgError err = { 0 };

  g_assert_cmpint (rg_fitting_k (f, 0.0, 0.05, &k, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "Reynolds"));
  g_assert_cmpuint (err.subjects, ==, REYNOLDS);
  g_assert_cmpint (rg_fitting_k (f, NAN, 0.05, &k, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, REYNOLDS);
  g_assert_cmpint (rg_fitting_k (f, 1e5, -0.05, &k, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "diameter"));
  g_assert_cmpuint (err.subjects, ==, DIAMETER);
  g_assert_cmpint (rg_fitting_k (f, 1e5, INFINITY, &k, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, DIAMETER);
  g_assert_cmpint (rg_fitting_k (NULL, 1e5, 0.05, &k, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, FITTING);
  g_assert_cmpfloat (k, ==, -1.0);
}

static void
test_sum (void)
{
  const double re = 2.0e5, d = 0.1023;
  const RgFitting *elbow = fitting ("elbow-90-long-radius");
  const RgFitting *gate = fitting ("valve-gate");
  double ke, kg, sum;
  RgError err = { 0 };

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
  g_assert_cmpuint (err.subjects, ==, FITTING);
  RgFittingUse bad_k[] = { { NULL, -0.2, 1.0 } };
  g_assert_cmpint (rg_fittings_k_sum (bad_k, 1, re, d, &sum, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "K"));
  g_assert_cmpuint (err.subjects, ==, FITTING);
  g_assert_cmpint (rg_fittings_k_sum (uses, -1, re, d, &sum, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, FITTING);
  g_assert_cmpint (rg_fittings_k_sum (uses, 2, -5.0, d, &sum, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, REYNOLDS);
}

static const double INCH = 0.0254; /* m, exact (international inch, 1959) */

static double
sch40_bore (const char *designation)
{
  const RgPipe *p = NULL;
  RgError err = { 0 };
  if (rg_pipe_lookup (designation, &p, &err) != RG_OK)
    g_error ("%s: %s", designation, err.text);
  return p->inner_diameter_m;
}

static double
crane_ft (double d)
{
  double ft = -1.0;
  RgError err = { 0 };
  if (rg_fitting_crane_ft (d, &ft, &err) != RG_OK)
    g_error ("f_T at %g m: %s", d, err.text);
  return ft;
}

static void
test_crane_ft (void)
{
  /* Source: Crane TP-410 (2009 ed.), f_T = 0.25/[log10(ε/(3.7 D))]² with
   * ε = 0.0018 in (from memory; not checked against the document); hand
   * calculation for D = 4.026 in (NPS 4 Sch 40): 3.7·4.026 = 14.8962,
   * ε/(3.7 D) = 1.2083619e-4, log10 = -3.9178030, squared 15.349180,
   * f_T = 0.25/15.349180 = 0.01628751 */
  assert_rel (crane_ft (4.026 * INCH), 0.01628751, 1e-6);
  /* Source: as above, D = 12 in: ε/(3.7 D) = 4.0540541e-5,
   * log10 = -4.3921105, squared 19.290634, f_T = 0.01295966 */
  assert_rel (crane_ft (12.0 * INCH), 0.01295966, 1e-6);

  /* From memory of Crane TP-410 (1988 ed.), table "friction factors for
   * clean commercial steel pipe with flow in the zone of complete
   * turbulence", by nominal size; not checked against the document.  The
   * printed values are rounded to 0.001 and are up to about 5 % above the
   * formula at Sch 40 bores (NPS 4: 0.017 against 0.0163, NPS 16: 0.013
   * against 0.0124), so the tolerance is 5 %: it catches a wrong roughness,
   * unit or logarithm base, not the table's rounding. */
  static const struct { const char *pipe; double ft; } table[] = {
    { "NPS 2 Sch 40", 0.019 }, { "NPS 4 Sch 40", 0.017 },
    { "NPS 6 Sch 40", 0.015 }, { "NPS 8 Sch 40", 0.014 },
    { "NPS 10 Sch 40", 0.014 }, { "NPS 12 Sch 40", 0.013 },
    { "NPS 16 Sch 40", 0.013 }, { "NPS 24 Sch 40", 0.012 },
  };
  for (size_t i = 0; i < G_N_ELEMENTS (table); i++)
    assert_rel (crane_ft (sch40_bore (table[i].pipe)), table[i].ft, 0.05);

  /* Source: Colebrook (1939): in the fully rough zone a larger bore (smaller
   * ε/D) has a smaller friction factor. */
  g_assert_cmpfloat (crane_ft (0.6), <, crane_ft (0.05));

  double ft = -1.0;
  RgUnitChoice mm = { { NULL } };
  RgError err = { 0 };
  /* From memory of Moody (1944), Trans. ASME 66, the chart's largest
   * relative roughness ε/D = 0.05 (the limit fittings.c adopts); not checked
   * against the document: the bore must be at least 0.0018 in / 0.05 =
   * 0.9144 mm, in the unit the caller chose (the bore in mm here). */
  mm.unit[RG_QTY_LENGTH] = "mm";
  err.units = &mm;
  g_assert_cmpint (rg_fitting_crane_ft (0.0005, &ft, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "at least 0.9144 mm, not 0.5 mm"));
  g_assert_cmpuint (err.subjects, ==, DIAMETER);
  g_assert_cmpfloat (RG_FITTING_CRANE_BORE_MIN_M, ==, 0.0018 * 0.0254 / 0.05);
  g_assert_cmpint (rg_fitting_crane_ft (0.0, &ft, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpint (rg_fitting_crane_ft (NAN, &ft, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpint (rg_fitting_crane_ft (-INFINITY, &ft, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpfloat (ft, ==, -1.0);
  g_assert_cmpint (rg_fitting_crane_ft (0.0009144 * 1.000001, &ft, &err), ==, RG_OK);
}

static void
test_crane_butterfly (void)
{
  static const struct
  {
    const char *id;
    double n[3]; /* NPS 2–8, 10–14, 16–24 */
  } styles[] = {
    /* From memory of Crane TP-410 (1988 and 2009 eds.), butterfly valve,
     * centric: K = 45 f_T, 35 f_T, 25 f_T; not checked against the document
     * (python3-fluids K_butterfly_valve_Crane agrees: crosscheck) */
    { "valve-butterfly", { 45.0, 35.0, 25.0 } },
    /* From memory of Crane TP-410 (2009 ed.), high-performance butterfly
     * valves, double offset 74, 52, 43 and triple offset 218, 96, 55 times
     * f_T; not checked against the document (python3-fluids
     * K_butterfly_valve_Crane style=1, 2 agrees: crosscheck) */
    { "valve-butterfly-double-offset", { 74.0, 52.0, 43.0 } },
    { "valve-butterfly-triple-offset", { 218.0, 96.0, 55.0 } },
  };
  /* Bores inside each band, and at the band splits of data/fittings.json
   * (9 in and 15 in, halfway between NPS 8 and 10 and NPS 14 and 16). */
  static const struct { double bore_in; int band; } bores[] = {
    { 1.5, 0 }, { 4.026, 0 }, { 9.0, 0 }, { 9.001, 1 }, { 11.938, 1 },
    { 15.0, 1 }, { 15.001, 2 }, { 19.25, 2 }, { 24.0, 2 },
  };

  for (size_t s = 0; s < G_N_ELEMENTS (styles); s++)
    {
      const RgFitting *f = fitting (styles[s].id);
      g_assert_cmpint (f->method, ==, RG_FITTING_METHOD_CRANE_FT);
      g_assert_cmpint (f->n_bands, ==, 3);
      for (int b = 0; b < 3; b++)
        g_assert_cmpfloat (f->band_n[b], ==, styles[s].n[b]);
      for (size_t i = 0; i < G_N_ELEMENTS (bores); i++)
        {
          const double d = bores[i].bore_in * INCH;
          double k = -1.0, k_laminar_re = -1.0;
          RgWarnings w = { 0 };

          rg_warnings_clear (&w);
          /* Source: Crane TP-410 (2009 ed.): K = n·f_T, n of the band. */
          g_assert_cmpint (rg_fitting_k_checked (f, 1.0e6, d, &k, &w, NULL), ==, RG_OK);
          assert_rel (k, styles[s].n[bores[i].band] * crane_ft (d), 1e-15);
          g_assert_cmpint (w.count, ==, 0);
          /* Source: Crane TP-410: K does not depend on Re. */
          g_assert_cmpint (rg_fitting_k (f, 5.0e4, d, &k_laminar_re, NULL), ==, RG_OK);
          g_assert_cmpfloat (k_laminar_re, ==, k);
        }
    }

  /* Source: Crane TP-410 (2009 ed.), K = 45 f_T; hand calculation for NPS 4
   * Sch 40 (4.026 in): 45 × 0.01628751 = 0.7329381 */
  double k;
  g_assert_cmpint (rg_fitting_k (fitting ("valve-butterfly"), 2.0e5, 4.026 * INCH, &k, NULL), ==, RG_OK);
  assert_rel (k, 0.7329381, 1e-6);
}

static void
test_crane_warnings (void)
{
  const RgFitting *f = fitting ("valve-butterfly");
  const RgFitting *elbow = fitting ("elbow-90-standard");
  RgWarnings w = { 0 };
  RgError err = { 0 };
  RgUnitChoice mm = { { NULL } };
  double k = -1.0, k_plain_api = -1.0;

  mm.unit[RG_QTY_LENGTH] = "mm";
  w.units = &mm;

  /* Below the stated range: the NPS 2–8 multiplier, with a warning.
   * Source: Crane TP-410 (2009 ed.), K = 45 f_T for the smallest band;
   * the nearest-band rule is ours (docs/catalogs.md). */
  rg_warnings_clear (&w);
  g_assert_cmpint (rg_fitting_k_checked (f, 1.0e5, 1.049 * INCH, &k, &w, &err), ==, RG_OK);
  assert_rel (k, 45.0 * crane_ft (1.049 * INCH), 1e-15);
  g_assert_cmpint (w.count, ==, 1);
  g_assert_nonnull (strstr (w.text[0], "valve-butterfly"));
  g_assert_nonnull (strstr (w.text[0], "NPS 2–8"));
  /* Source: NIST SP 811 B.8, 1.049 in = 26.6446 mm, 4 figures */
  g_assert_nonnull (strstr (w.text[0], "26.64 mm"));
  /* The plain API gives the same K, without warnings. */
  g_assert_cmpint (rg_fitting_k (f, 1.0e5, 1.049 * INCH, &k_plain_api, &err), ==, RG_OK);
  g_assert_cmpfloat (k_plain_api, ==, k);

  /* Above it: the NPS 16–24 multiplier (Crane TP-410, 25 f_T), warned. */
  rg_warnings_clear (&w);
  g_assert_cmpint (rg_fitting_k_checked (f, 1.0e6, 30.0 * INCH, &k, &w, &err), ==, RG_OK);
  assert_rel (k, 25.0 * crane_ft (30.0 * INCH), 1e-15);
  g_assert_cmpint (w.count, ==, 1);
  g_assert_nonnull (strstr (w.text[0], "NPS 16–24"));

  /* Common practice (no single source): fully turbulent from Re ≈ 4000;
   * below, Crane's constant K is flagged. */
  rg_warnings_clear (&w);
  g_assert_cmpint (rg_fitting_k_checked (f, 3999.0, 4.026 * INCH, &k, &w, &err), ==, RG_OK);
  g_assert_cmpint (w.count, ==, 1);
  g_assert_nonnull (strstr (w.text[0], "turbulent"));
  rg_warnings_clear (&w);
  g_assert_cmpint (rg_fitting_k_checked (f, 4000.0, 4.026 * INCH, &k, &w, &err), ==, RG_OK);
  g_assert_cmpint (w.count, ==, 0);

  /* Source: Darby (2001): the 3-K method covers laminar flow and bores of
   * 1/2–24 in; it gives no warning here (the caller judges the range). */
  rg_warnings_clear (&w);
  g_assert_cmpint (rg_fitting_k_checked (elbow, 100.0, 0.01, &k, &w, &err), ==, RG_OK);
  g_assert_cmpint (w.count, ==, 0);

  /* Errors: a bore too small for f_T; bad Re; k untouched. */
  k = -1.0;
  g_assert_cmpint (rg_fitting_k_checked (f, 1.0e5, 0.0005, &k, &w, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "f_T"));
  g_assert_cmpuint (err.subjects, ==, DIAMETER);
  g_assert_cmpint (rg_fitting_k_checked (f, 0.0, 0.1, &k, &w, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpint (rg_fitting_k_checked (f, 1.0e5, NAN, &k, &w, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpfloat (k, ==, -1.0);

  /* A sum: the same out-of-range valve listed twice warns once, a count
   * of zero does not warn; Source: Darby (2001), losses in series add. */
  const double d = 1.049 * INCH;
  double kv, ke, sum;
  rg_fitting_k (f, 2.0e5, d, &kv, NULL);
  rg_fitting_k (elbow, 2.0e5, d, &ke, NULL);
  RgFittingUse uses[] = {
    { f, 0.0, 2.0 },
    { elbow, 0.0, 3.0 },
    { f, 0.0, 1.0 },
    { fitting ("valve-butterfly-triple-offset"), 0.0, 0.0 },
  };
  rg_warnings_clear (&w);
  g_assert_cmpint (rg_fittings_k_sum_checked (uses, 4, 2.0e5, d, &sum, &w, &err), ==, RG_OK);
  assert_rel (sum, 3.0 * kv + 3.0 * ke, 1e-14);
  g_assert_cmpint (w.count, ==, 1);
  g_assert_nonnull (strstr (w.text[0], "valve-butterfly:"));
  /* the warnings of the sum are written in the caller's units too */
  g_assert_nonnull (strstr (w.text[0], "26.64 mm"));
  g_assert_cmpint (rg_fittings_k_sum_checked (uses, 4, 2.0e5, d, &sum, NULL, &err), ==, RG_OK);
  g_assert_cmpint (rg_fittings_k_sum_checked (uses, 4, 2.0e5, 0.0005, &sum, &w, &err), ==, RG_ERR_DOMAIN);
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/fittings/catalog", test_catalog);
  g_test_add_func ("/fittings/three-k", test_three_k);
  g_test_add_func ("/fittings/three-k/errors", test_three_k_errors);
  g_test_add_func ("/fittings/sum", test_sum);
  g_test_add_func ("/fittings/crane/ft", test_crane_ft);
  g_test_add_func ("/fittings/crane/butterfly", test_crane_butterfly);
  g_test_add_func ("/fittings/crane/warnings", test_crane_warnings);
  return g_test_run ();
}
