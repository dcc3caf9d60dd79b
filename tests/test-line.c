/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Line hydraulics: Darcy–Weisbach, minor losses, inverse problems. */
#include <float.h>
#include <glib.h>
#include <math.h>
#include <string.h>

#include "core/line.h"
#include "core/units.h"

static void
water_like (RgLineInput *in)
{
  rg_line_input_init (in);
  in->flow_m3_s = 0.012;
  in->diameter_m = 0.1023;
  in->length_m = 250.0;
  in->roughness_m = 4.5e-5;
  in->density_kg_m3 = 998.2;
  in->viscosity_pa_s = 1.0016e-3;
}

static void
test_identities (void)
{
  RgLineInput in;
  RgLineResult r;
  RgError err = { 0 };

  water_like (&in);
  in.k_sum = 3.5;
  in.elevation_m = 12.0;
  g_assert_cmpint (rg_line_evaluate (&in, &r, &err), ==, RG_OK);

  const double area = M_PI * in.diameter_m * in.diameter_m / 4.0;
  const double v = in.flow_m3_s / area;
  /* Source: definitions of mean velocity, Reynolds number and the
   * Darcy–Weisbach equation (e.g. White, Fluid Mechanics, eq. 6.10). */
  g_assert_cmpfloat_with_epsilon (r.velocity_m_s, v, 1e-15 * v);
  g_assert_cmpfloat_with_epsilon (r.reynolds, in.density_kg_m3 * v * in.diameter_m / in.viscosity_pa_s,
                                  1e-12 * r.reynolds);
  const double vh = v * v / (2 * RG_GRAVITY);
  g_assert_cmpfloat_with_epsilon (r.head_loss_major_m,
                                  r.friction.f * in.length_m / in.diameter_m * vh,
                                  1e-13 * r.head_loss_major_m);
  /* Source: the definition of the resistance coefficient, h = K·V²/(2g)
   * (from memory of Crane TP-410, "Flow of Fluids", chapter 2). */
  g_assert_cmpfloat_with_epsilon (r.head_loss_minor_m, 3.5 * vh, 1e-13 * r.head_loss_minor_m);
  g_assert_cmpfloat_with_epsilon (r.head_loss_total_m, r.head_loss_major_m + r.head_loss_minor_m,
                                  1e-13 * r.head_loss_total_m);
  /* Source: steady-flow energy equation, Δp = ρg(h_L + Δz). */
  g_assert_cmpfloat_with_epsilon (r.pressure_drop_pa,
                                  in.density_kg_m3 * RG_GRAVITY * (r.head_loss_total_m + 12.0),
                                  1e-12 * r.pressure_drop_pa);
  g_assert_cmpfloat_with_epsilon (r.gradient_m_per_100m, 100.0 * r.head_loss_major_m / in.length_m,
                                  1e-13 * r.gradient_m_per_100m);
  /* Source: force balance on a pipe segment, τw = Δp_f·D/(4L), with
   * Δp_f = ρg·h_major (White, Fluid Mechanics, eq. 6.9b). */
  const double tau_balance = in.density_kg_m3 * RG_GRAVITY * r.head_loss_major_m
                             * in.diameter_m / (4.0 * in.length_m);
  g_assert_cmpfloat_with_epsilon (r.wall_shear_pa, tau_balance, 1e-12 * tau_balance);
  g_assert_cmpint (r.friction.regime, ==, RG_REGIME_TURBULENT);
}

static void
test_laminar_poiseuille (void)
{
  RgLineInput in;
  RgLineResult r;
  RgError err = { 0 };

  /* A viscous oil: Re well below 2000. */
  rg_line_input_init (&in);
  in.flow_m3_s = 1.0e-3;
  in.diameter_m = 0.05;
  in.length_m = 100.0;
  in.density_kg_m3 = 880.0;
  in.viscosity_pa_s = 0.3;
  g_assert_cmpint (rg_line_evaluate (&in, &r, &err), ==, RG_OK);
  g_assert_cmpint (r.friction.regime, ==, RG_REGIME_LAMINAR);
  g_assert_cmpint (r.friction.zone, ==, RG_ZONE_NONE);
  /* Source: Hagen–Poiseuille law, Δp = 128·μ·L·Q/(π·D⁴). */
  const double dp = 128.0 * in.viscosity_pa_s * in.length_m * in.flow_m3_s
                    / (M_PI * pow (in.diameter_m, 4));
  g_assert_cmpfloat_with_epsilon (r.pressure_drop_pa, dp, 1e-12 * dp);
}

static void
test_worked_example (void)
{
  RgLineInput in;
  RgLineResult r;
  RgError err = { 0 };

  /* From memory of White, Fluid Mechanics (4th–7th ed.), the worked example
   * of oil (ρ = 900 kg/m³, ν = 1e-5 m²/s) at 0.2 m³/s in 500 m of 200-mm
   * cast-iron pipe (ε = 0.26 mm): V ≈ 6.37 m/s, Re ≈ 127 000, f ≈ 0.0227,
   * h_f ≈ 117 m; not checked against the document (hence 1 % tolerance). */
  rg_line_input_init (&in);
  in.flow_m3_s = 0.2;
  in.diameter_m = 0.2;
  in.length_m = 500.0;
  in.roughness_m = 0.26e-3;
  in.density_kg_m3 = 900.0;
  in.viscosity_pa_s = 900.0 * 1e-5;
  g_assert_cmpint (rg_line_evaluate (&in, &r, &err), ==, RG_OK);
  g_assert_cmpfloat_with_epsilon (r.velocity_m_s, 6.37, 0.01 * 6.37);
  g_assert_cmpfloat_with_epsilon (r.reynolds, 127000.0, 0.01 * 127000.0);
  g_assert_cmpfloat_with_epsilon (r.friction.f, 0.0227, 0.01 * 0.0227);
  g_assert_cmpfloat_with_epsilon (r.head_loss_major_m, 117.0, 0.01 * 117.0);
}

static void
test_transitional (void)
{
  RgLineInput in;
  RgLineResult r;
  RgError err = { 0 };

  water_like (&in);
  in.flow_m3_s = 2.4e-4; /* Re ≈ 3000 */
  g_assert_cmpint (rg_line_evaluate (&in, &r, &err), ==, RG_OK);
  g_assert_cmpint (r.friction.regime, ==, RG_REGIME_TRANSITIONAL);
  g_assert_true (r.friction.has_laminar);
  /* Source: Hagen–Poiseuille, f = 64/Re. */
  g_assert_cmpfloat_with_epsilon (r.friction.f_laminar, 64.0 / r.reynolds, 1e-15);
  /* Design value is the turbulent one, which is the larger near Re 3000
   * (Common practice (no single source): design on the turbulent value in the
   * transitional range, the conservative side). */
  g_assert_cmpfloat (r.friction.f, >, r.friction.f_laminar);
}

#define ON(s) RG_SUBJECT_BIT (RG_SUBJECT_##s)

static void
test_bad_input (void)
{
  /* each bad input, and the inputs its error names (line.h, status.h) */
  static const struct {
    const char *what;
    gsize offset;
    double value;
    RgSubjects subjects;
  } cases[] = {
    { "flow zero", G_STRUCT_OFFSET (RgLineInput, flow_m3_s), 0.0, ON (FLOW) },
    { "flow negative", G_STRUCT_OFFSET (RgLineInput, flow_m3_s), -1.0, ON (FLOW) },
    { "flow NaN", G_STRUCT_OFFSET (RgLineInput, flow_m3_s), NAN, ON (FLOW) },
    { "flow inf", G_STRUCT_OFFSET (RgLineInput, flow_m3_s), INFINITY, ON (FLOW) },
    { "diameter zero", G_STRUCT_OFFSET (RgLineInput, diameter_m), 0.0, ON (DIAMETER) },
    { "diameter negative", G_STRUCT_OFFSET (RgLineInput, diameter_m), -0.1, ON (DIAMETER) },
    { "length zero", G_STRUCT_OFFSET (RgLineInput, length_m), 0.0, ON (LENGTH) },
    { "length NaN", G_STRUCT_OFFSET (RgLineInput, length_m), NAN, ON (LENGTH) },
    { "roughness negative", G_STRUCT_OFFSET (RgLineInput, roughness_m), -1e-5, ON (ROUGHNESS) },
    { "roughness huge", G_STRUCT_OFFSET (RgLineInput, roughness_m), 0.05,
      ON (ROUGHNESS) | ON (DIAMETER) },
    { "k negative", G_STRUCT_OFFSET (RgLineInput, k_sum), -1.0, ON (K_SUM) | ON (FITTING) },
    { "elevation inf", G_STRUCT_OFFSET (RgLineInput, elevation_m), INFINITY, ON (ELEVATION) },
    { "density zero", G_STRUCT_OFFSET (RgLineInput, density_kg_m3), 0.0, ON (DENSITY) },
    { "viscosity zero", G_STRUCT_OFFSET (RgLineInput, viscosity_pa_s), 0.0, ON (VISCOSITY) },
    /* the Reynolds number overflows: the inputs behind it */
    { "flow huge", G_STRUCT_OFFSET (RgLineInput, flow_m3_s), 1e300,
      ON (FLOW) | ON (DIAMETER) | ON (DENSITY) | ON (VISCOSITY) },
    /* Re = 4ρQ/(πμD) ≈ 1.2e10 with 1000 m³/s in 0.1023 m: above 1e10 */
    { "flow too fast", G_STRUCT_OFFSET (RgLineInput, flow_m3_s), 1000.0,
      ON (FLOW) | ON (DIAMETER) | ON (DENSITY) | ON (VISCOSITY) },
    /* the transition limits out of order (regime.h) */
    { "transition", G_STRUCT_OFFSET (RgLineInput, transition.re_laminar_max), 5000.0,
      ON (RE_LAMINAR_MAX) | ON (RE_TURBULENT_MIN) },
    { "transition low", G_STRUCT_OFFSET (RgLineInput, transition.re_laminar_max), 100.0,
      ON (RE_LAMINAR_MAX) },
    { "transition high", G_STRUCT_OFFSET (RgLineInput, transition.re_turbulent_min), 2e5,
      ON (RE_TURBULENT_MIN) },
  };

  for (gsize i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      RgLineInput in;
      RgLineResult r;
      RgError err = { 0 };

      water_like (&in);
      *(double *) G_STRUCT_MEMBER_P (&in, cases[i].offset) = cases[i].value;
      g_test_message ("case %s", cases[i].what);
      g_assert_cmpint (rg_line_evaluate (&in, &r, &err), !=, RG_OK);
      g_assert_cmpstr (err.text, !=, "");
      if (err.subjects != cases[i].subjects)
        g_error ("case %s: '%s': subjects %#llx, want %#llx", cases[i].what,
                 err.text, err.subjects, cases[i].subjects);
    }
}

/* The roughness and the bore of "ε/D too large" in the caller's units.
 * Source: NIST SP 811 B.8, 0.05 m = 0.164 ft and 0.1 m = 0.3281 ft (foot =
 * 0.3048 m exactly), 4 figures. */
static void
test_message_units (void)
{
  RgLineInput in;
  RgLineResult r;
  RgUnitChoice us = { { NULL } };
  RgError err = { 0 };

  water_like (&in);
  in.diameter_m = 0.1;
  in.roughness_m = 0.05;
  us.unit[RG_QTY_LENGTH] = "ft";
  us.unit[RG_QTY_ROUGHNESS] = "ft";
  err.units = &us;
  g_assert_cmpint (rg_line_evaluate (&in, &r, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "The roughness 0.164 ft is too large for the inner diameter 0.3281 ft"));
  err.units = NULL;
  g_assert_cmpint (rg_line_evaluate (&in, &r, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "The roughness 0.05 m is too large for the inner diameter 0.1 m"));
}

static void
test_flow_for_head_loss (void)
{
  RgLineInput in;
  RgLineResult r;
  RgError err = { 0 };
  double q;

  water_like (&in);
  g_assert_cmpint (rg_line_flow_for_head_loss (&in, 5.0, &q, &err), ==, RG_OK);
  in.flow_m3_s = q;
  g_assert_cmpint (rg_line_evaluate (&in, &r, &err), ==, RG_OK);
  g_assert_cmpfloat_with_epsilon (r.head_loss_total_m, 5.0, 1e-12 * 5.0);

  /* Source: with no minor loss, Colebrook gives the flow explicitly
   * (Swamee and Jain 1976, eq. for Q; it is Colebrook rearranged):
   * Q = −0.965·D²·√(gDh/L)·ln(ε/(3.7D) + 1.784ν/(D√(gDh/L)))
   * — written here in its exact form with 2/ln10 and 2.51/√2. */
  const double d = in.diameter_m, h = 5.0, l = in.length_m;
  const double nu = in.viscosity_pa_s / in.density_kg_m3;
  const double s = sqrt (2.0 * RG_GRAVITY * d * h / l); /* V·√f */
  const double v = -2.0 * s * log10 (in.roughness_m / (3.7 * d) + 2.51 * nu / (d * s));
  const double q_exact = v * M_PI * d * d / 4.0;
  g_assert_cmpfloat_with_epsilon (q, q_exact, 1e-12 * q_exact);

  /* With minor losses the search still lands on the target. */
  water_like (&in);
  in.k_sum = 12.0;
  g_assert_cmpint (rg_line_flow_for_head_loss (&in, 5.0, &q, &err), ==, RG_OK);
  in.flow_m3_s = q;
  g_assert_cmpint (rg_line_evaluate (&in, &r, &err), ==, RG_OK);
  g_assert_cmpfloat_with_epsilon (r.head_loss_total_m, 5.0, 1e-12 * 5.0);

  g_assert_cmpint (rg_line_flow_for_head_loss (&in, -1.0, &q, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (HEAD_LOSS));
  g_assert_cmpint (rg_line_flow_for_head_loss (&in, NAN, &q, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (HEAD_LOSS));
  in.length_m = -1.0;
  g_assert_cmpint (rg_line_flow_for_head_loss (&in, 5.0, &q, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (LENGTH));
}

static void
test_diameter_for_head_loss (void)
{
  RgLineInput in;
  RgLineResult r;
  RgError err = { 0 };
  double d;

  water_like (&in);
  in.k_sum = 4.0;
  g_assert_cmpint (rg_line_diameter_for_head_loss (&in, 2.0, &d, &err), ==, RG_OK);
  in.diameter_m = d;
  g_assert_cmpint (rg_line_evaluate (&in, &r, &err), ==, RG_OK);
  /* the smallest diameter within the allowed loss: at d the loss is within,
   * a hair smaller it is not */
  g_assert_cmpfloat (r.head_loss_total_m, <=, 2.0);
  g_assert_cmpfloat_with_epsilon (r.head_loss_total_m, 2.0, 1e-11 * 2.0);
  in.diameter_m = d * (1.0 - 1e-9);
  g_assert_cmpint (rg_line_evaluate (&in, &r, &err), ==, RG_OK);
  g_assert_cmpfloat (r.head_loss_total_m, >, 2.0);

  g_assert_cmpint (rg_line_diameter_for_head_loss (&in, 0.0, &d, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (HEAD_LOSS));
  in.flow_m3_s = -1.0;
  g_assert_cmpint (rg_line_diameter_for_head_loss (&in, 2.0, &d, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (FLOW));
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/line/identities", test_identities);
  g_test_add_func ("/line/laminar-poiseuille", test_laminar_poiseuille);
  g_test_add_func ("/line/worked-example", test_worked_example);
  g_test_add_func ("/line/transitional", test_transitional);
  g_test_add_func ("/line/bad-input", test_bad_input);
  g_test_add_func ("/line/message-units", test_message_units);
  g_test_add_func ("/line/inverse/flow", test_flow_for_head_loss);
  g_test_add_func ("/line/inverse/diameter", test_diameter_for_head_loss);
  return g_test_run ();
}
