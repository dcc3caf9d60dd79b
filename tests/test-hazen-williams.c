/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Hazen–Williams: the loss against the published forms of the formula,
 * the C equivalent of a Colebrook loss put back into the formula, the
 * usual range and the refusals. */
#include "core/hazen-williams.h"
#include "core/line.h"

#include <glib.h>
#include <math.h>

static void
assert_rel (double got, double want, double tol)
{
  if (!(fabs (got - want) <= tol * fabs (want)))
    g_error ("got %.17g, want %.17g (relative tolerance %g)", got, want, tol);
}

static double
velocity_of (double q, double d)
{
  return q / (G_PI * d * d / 4.0);
}

static void
test_published_q_form (void)
{
  /* Source: the Q form of Hazen–Williams in SI as water-supply handbooks
   * print it, h_f = 10.67·L·Q^1.852/(C^1.852·D^4.8704), evaluated by hand
   * for Q = 0.1 m³/s, D = 0.3 m, L = 1000 m, C = 120: 7.4499 m.  The
   * constants 10.67 and 0.849 are each rounded to three or four figures
   * and the exponents to 1.852 and 4.87: the two forms differ by about
   * 0.15 %, so 0.3 % is allowed. */
  const double q = 0.1, d = 0.3, l = 1000.0, c = 120.0;
  double h = 0.0;

  g_assert_cmpint (rg_hazen_williams_head_loss (c, velocity_of (q, d), d, l, &h, NULL), ==, RG_OK);
  assert_rel (h, 7.4499, 3e-3);
  assert_rel (h, 10.67 * l * pow (q, 1.852) / (pow (c, 1.852) * pow (d, 4.8704)), 3e-3);
}

static void
test_us_form (void)
{
  /* Source: Williams and Hazen's form in feet and seconds, V = 1.318·C·
   * R^0.63·S^0.54 (from memory of Williams and Hazen, Hydraulic Tables;
   * not checked against the document), computed by hand for the same
   * line.  0.849 rounds 1.318·0.3048^0.37 = 0.84927: 0.03 % in V, about
   * 0.06 % in the loss; 0.1 % is allowed. */
  const double q = 0.1, d = 0.3, l = 1000.0, c = 120.0;
  const double ft = 0.3048;
  const double v_ft = velocity_of (q, d) / ft, r_ft = d / ft / 4.0;
  const double h_us = l * pow (v_ft / (1.318 * c * pow (r_ft, 0.63)), 1.0 / 0.54);
  double h = 0.0;

  g_assert_cmpint (rg_hazen_williams_head_loss (c, velocity_of (q, d), d, l, &h, NULL), ==, RG_OK);
  assert_rel (h, h_us, 1e-3);
}

/* A line of water at 20 °C: IAPWS-IF97 at 0.1 MPa, ρ = 998.21 kg/m³ and
 * μ = 1.0016 mPa·s (Source: IAPWS R12-08, Table 4, and IAPWS-IF97; the
 * values to the digits the round trip needs). */
static void
colebrook_line (double q, double d, double eps, double l, RgLineResult *r)
{
  RgLineInput in;
  RgError err = { 0 };

  rg_line_input_init (&in);
  in.flow_m3_s = q;
  in.diameter_m = d;
  in.length_m = l;
  in.roughness_m = eps;
  in.density_kg_m3 = 998.21;
  in.viscosity_pa_s = 1.0016e-3;
  if (rg_line_evaluate (&in, r, &err) != RG_OK)
    g_error ("%s", err.text);
}

static void
test_round_trip (void)
{
  /* The C equivalent of a Colebrook loss, put back into Hazen–Williams,
   * gives that loss: only rounding in pow (a few ulps each way). */
  static const struct { double q, d, eps, l; } lines[] = {
    { 0.070, 0.300, 4.6e-5, 1000.0 },   /* new commercial steel, 1 m/s */
    { 0.010, 0.0902, 7.0e-6, 250.0 },   /* PE DN 110 SDR 11 */
    { 0.150, 0.4028, 1.5e-3, 2500.0 },  /* tuberculated DN 400 */
    { 0.002, 0.020, 1.5e-6, 10.0 },     /* copper, small bore */
    { 0.5e-4, 0.050, 4.6e-5, 100.0 },   /* laminar: outside the range, still exact */
  };

  for (gsize i = 0; i < G_N_ELEMENTS (lines); i++)
    {
      RgLineResult r;
      double c = 0.0, h = 0.0;

      colebrook_line (lines[i].q, lines[i].d, lines[i].eps, lines[i].l, &r);
      g_assert_cmpint (rg_hazen_williams_c (r.velocity_m_s, lines[i].d, r.head_loss_major_m,
                                            lines[i].l, &c, NULL), ==, RG_OK);
      g_assert_cmpint (rg_hazen_williams_head_loss (c, r.velocity_m_s, lines[i].d, lines[i].l,
                                                    &h, NULL), ==, RG_OK);
      assert_rel (h, r.head_loss_major_m, 1e-13);
    }
}

static void
test_trade_values (void)
{
  RgLineResult r;
  double c = 0.0;

  /* Common practice (no single source): published C of new steel and
   * ductile pipe lies between about 120 and 150; Colebrook with White's
   * 0.046 mm for new commercial steel, 300 mm at 1 m/s, falls there. */
  colebrook_line (0.0707, 0.300, 4.6e-5, 1000.0, &r);
  g_assert_cmpint (rg_hazen_williams_c (r.velocity_m_s, 0.300, r.head_loss_major_m, 1000.0, &c, NULL), ==, RG_OK);
  g_assert_cmpfloat (c, >, 120.0);
  g_assert_cmpfloat (c, <, 150.0);
  /* The same pipe roughened to 1.5 mm (tuberculated) has a lower C:
   * what a C means in the trade. */
  {
    double c_new = c;

    colebrook_line (0.0707, 0.300, 1.5e-3, 1000.0, &r);
    g_assert_cmpint (rg_hazen_williams_c (r.velocity_m_s, 0.300, r.head_loss_major_m, 1000.0, &c, NULL), ==, RG_OK);
    g_assert_cmpfloat (c, <, c_new);
  }
}

static void
test_notes (void)
{
  /* The limits of rg_hazen_williams_notes (common practice, no single
   * source: fresh water, turbulent, D ≥ 50 mm, V ≤ 3 m/s). */
  g_assert_cmpuint (rg_hazen_williams_notes (1, RG_REGIME_TURBULENT, 1.0, 0.3), ==, 0);
  g_assert_cmpuint (rg_hazen_williams_notes (0, RG_REGIME_TURBULENT, 1.0, 0.3), ==, RG_HW_NOTE_FLUID);
  g_assert_cmpuint (rg_hazen_williams_notes (1, RG_REGIME_LAMINAR, 0.01, 0.3), ==, RG_HW_NOTE_NOT_TURBULENT);
  g_assert_cmpuint (rg_hazen_williams_notes (1, RG_REGIME_TRANSITIONAL, 0.02, 0.3), ==, RG_HW_NOTE_NOT_TURBULENT);
  g_assert_cmpuint (rg_hazen_williams_notes (1, RG_REGIME_TURBULENT, 3.5, 0.3), ==, RG_HW_NOTE_VELOCITY);
  g_assert_cmpuint (rg_hazen_williams_notes (1, RG_REGIME_TURBULENT, 3.0, 0.05), ==, 0);
  g_assert_cmpuint (rg_hazen_williams_notes (1, RG_REGIME_TURBULENT, 1.0, 0.04), ==, RG_HW_NOTE_DIAMETER);
  for (unsigned b = 0; b < RG_HW_N_NOTES; b++)
    {
      g_assert_cmpstr (rg_hazen_williams_note_id (1u << b), !=, "");
      g_assert_cmpstr (rg_hazen_williams_note_text (1u << b), !=, "");
    }
  g_assert_cmpstr (rg_hazen_williams_note_id (0), ==, "usual");
}

static void
test_refusals (void)
{
  RgError err = { 0 };
  double c = -1.0, h = -1.0;

  g_assert_cmpint (rg_hazen_williams_c (0.0, 0.3, 1.0, 100.0, &c, &err), ==, RG_ERR_DOMAIN);
  g_assert_true (err.subjects & RG_SUBJECT_BIT (RG_SUBJECT_FLOW));
  rg_error_clear (&err);
  g_assert_cmpint (rg_hazen_williams_c (1.0, NAN, 1.0, 100.0, &c, &err), ==, RG_ERR_DOMAIN);
  g_assert_true (err.subjects & RG_SUBJECT_BIT (RG_SUBJECT_DIAMETER));
  rg_error_clear (&err);
  g_assert_cmpint (rg_hazen_williams_c (1.0, 0.3, 0.0, 100.0, &c, &err), ==, RG_ERR_DOMAIN);
  g_assert_true (err.subjects & RG_SUBJECT_BIT (RG_SUBJECT_HEAD_LOSS));
  rg_error_clear (&err);
  g_assert_cmpint (rg_hazen_williams_c (1.0, 0.3, 1.0, INFINITY, &c, &err), ==, RG_ERR_DOMAIN);
  g_assert_true (err.subjects & RG_SUBJECT_BIT (RG_SUBJECT_LENGTH));
  rg_error_clear (&err);
  g_assert_cmpint (rg_hazen_williams_head_loss (0.0, 1.0, 0.3, 100.0, &h, &err), ==, RG_ERR_DOMAIN);
  /* outputs untouched on failure */
  g_assert_cmpfloat (c, ==, -1.0);
  g_assert_cmpfloat (h, ==, -1.0);
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/hazen-williams/published-q-form", test_published_q_form);
  g_test_add_func ("/hazen-williams/us-form", test_us_form);
  g_test_add_func ("/hazen-williams/round-trip", test_round_trip);
  g_test_add_func ("/hazen-williams/trade-values", test_trade_values);
  g_test_add_func ("/hazen-williams/notes", test_notes);
  g_test_add_func ("/hazen-williams/refusals", test_refusals);
  return g_test_run ();
}
