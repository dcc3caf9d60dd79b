/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Pumping energy, life-cycle cost, system curves and the duty point
 * (src/model/rugosa-life-cycle.c), each against a source outside the code
 * under test: hand arithmetic written out beside the check (power and
 * energy of a laminar line, whose loss has the closed form of
 * Hagen–Poiseuille), the closed form of the present value of an annuity,
 * bounds that follow from the roughness growing, GSL's Steffen
 * interpolation and Brent root finder with the core's line evaluation
 * called directly (the duty point), and the evaluation's own results (the
 * system curve through the design point). */
#include "config.h"

#include <float.h>
#include <math.h>
#include <string.h>

#include <gsl/gsl_errno.h>
#include <gsl/gsl_interp.h>
#include <gsl/gsl_roots.h>

#include "core/line.h"
#include "model/rugosa-life-cycle.h"
#include "model/rugosa-output.h"
#include "model/rugosa-project.h"

/* Source: NIST SP 811 (2008) B.8: kilowatt hour = 3.6e6 J; standard
 * gravity 9.80665 m/s² (CGPM 1901) */
#define KWH 3.6e6
#define G 9.80665

static RugosaProject *
project_with (RugosaLine *line)
{
  RugosaProject *p = rugosa_project_new ();

  rugosa_project_insert_line (p, 0, line);
  return p;
}

static void
assert_rel (double got, double want, double rel, const char *what)
{
  if (!(fabs (got - want) <= rel * fmax (fabs (want), DBL_MIN)))
    g_error ("%s: got %.17g, want %.17g (relative %g)", what, got, want, rel);
}

/* A viscous fluid in a small bore: laminar at every flow used below, so
 * the loss is Hagen–Poiseuille's and the arithmetic can be done by hand. */
static RugosaLine *
laminar_line (void)
{
  RugosaLine *line = rugosa_line_new ("laminar");

  g_object_set (line, "fluid-kind", RG_FLUID_CUSTOM, "density", 900.0,
                "viscosity", 0.1, "inner-diameter", 0.05, "roughness", 0.0,
                "length", 100.0, "elevation", 10.0, "flow-design", 1.0e-3,
                NULL);
  return line;
}

/* Power and energy of one year against hand arithmetic. */
static void
test_power_energy (void)
{
  g_autoptr (RugosaLine) line = laminar_line ();
  g_autoptr (RugosaProject) p = project_with (line);
  RugosaSettings *s = rugosa_project_get_settings (p);
  const RugosaLineResults *r;
  const RugosaOperatingPoint *d;
  const double mu = 0.1, rho = 900.0, len = 100.0, dia = 0.05, q = 1.0e-3, dz = 10.0;
  double hf, ph, pe, e_kwh;

  g_object_set (s, "pump-efficiency", 60.0, "hours-design", 8766.0,
                "energy-price", 0.2, "service-age", 0.0, NULL);
  r = rugosa_project_get_results (p, line);
  d = &r->points[RUGOSA_FLOW_DESIGN];
  g_assert_true (r->ok && d->ok);
  g_assert_cmpint (d->result.friction.regime, ==, RG_REGIME_LAMINAR);

  /* Source: hand arithmetic.  Hagen–Poiseuille (f = 64/Re):
   *   h_f = 32·μ·L·V/(ρ·g·D²),  V = 4Q/(πD²) = 0.50930 m/s,
   *   h_f = 32·0.1·100·0.50930/(900·9.80665·0.0025) = 7.3863 m;
   *   H = h_f + Δz = 17.3863 m;
   *   P_h = ρ·g·Q·H = 900·9.80665·0.001·17.3863 = 153.45 W
   *       (= 128·μ·L·Q²/(π·D⁴) + ρ·g·Q·Δz = 65.19 W + 88.26 W);
   *   P_e = P_h/0.60 = 255.75 W;
   *   E = 0.25575 kW · 8766 h = 2241.9 kWh a year; cost · 0.2 = 448.4. */
  hf = 32.0 * mu * len * (4.0 * q / (G_PI * dia * dia)) / (rho * G * dia * dia);
  ph = 128.0 * mu * len * q * q / (G_PI * pow (dia, 4)) + rho * G * q * dz;
  pe = ph / 0.60;
  e_kwh = pe / 1000.0 * 8766.0;
  assert_rel (d->pump_head_m, hf + dz, 1e-13, "pump head");
  assert_rel (d->hydraulic_power_w, ph, 1e-13, "hydraulic power");
  assert_rel (d->electric_power_w, pe, 1e-13, "electric power");
  assert_rel (r->energy.energy_j_per_year / KWH, e_kwh, 1e-13, "energy of a year");
  assert_rel (r->energy.cost_per_year, 0.2 * e_kwh, 1e-13, "cost of a year");
  /* the rounded figures of the comment, as a check on the comment */
  g_assert_cmpfloat (fabs (ph - 153.45), <, 0.01);
  g_assert_cmpfloat (fabs (e_kwh - 2241.9), <, 0.1);

  /* Source: hand arithmetic.  Output keys: the power in kW and the energy
   * in kWh as their JSON keys say (255.75 W is 0.25575 kW). */
  {
    const RugosaOutputKey *k = rugosa_output_key_find ("pump_power");

    g_assert_cmpstr (rugosa_output_json_key (k), ==, "pump_power_kW");
    g_assert_cmpstr (rugosa_output_json_key (rugosa_output_key_find ("energy")), ==, "energy_kWh_per_year");
    g_assert_cmpstr (rugosa_output_json_key (rugosa_output_key_find ("life_cycle_cost")), ==, "life_cycle_cost");
    g_assert_cmpstr (rugosa_output_json_key (rugosa_output_key_find ("duty_flow_new")), ==, "duty_flow_new_m3_s");
  }
}

/* Hours at the lowest and highest flow; a line without one of them runs
 * those hours at its design flow. */
static void
test_hours_split (void)
{
  g_autoptr (RugosaLine) line = laminar_line ();
  g_autoptr (RugosaProject) p = project_with (line);
  RugosaSettings *s = rugosa_project_get_settings (p);
  const RugosaLineResults *r;
  double p_design, p_low, p_high;

  g_object_set (line, "flow-minimum", 0.5e-3, "flow-maximum", 1.5e-3, NULL);
  g_object_set (s, "pump-efficiency", 80.0, "hours-design", 4000.0,
                "hours-minimum", 3000.0, "hours-maximum", 1000.0,
                "energy-price", 0.1, NULL);
  r = rugosa_project_get_results (p, line);
  g_assert_true (r->energy.ok);
  p_design = r->points[RUGOSA_FLOW_DESIGN].electric_power_w;
  p_low = r->points[RUGOSA_FLOW_MINIMUM].electric_power_w;
  p_high = r->points[RUGOSA_FLOW_MAXIMUM].electric_power_w;
  /* Source: hand arithmetic: E = Σ P_e·hours·3600 s over the three flows */
  assert_rel (r->energy.energy_j_per_year,
              (p_design * 4000.0 + p_low * 3000.0 + p_high * 1000.0) * 3600.0, 1e-14,
              "energy with three flows");
  /* Source: hand arithmetic (laminar: P_h = 128μLQ²/(πD⁴) + ρgQΔz), the
   * power at the lowest flow, half the design flow */
  assert_rel (p_low, (128.0 * 0.1 * 100.0 * 0.25e-6 / (G_PI * pow (0.05, 4))
                      + 900.0 * G * 0.5e-3 * 10.0) / 0.8, 1e-13, "power at the lowest flow");

  /* no highest flow: its 1000 h run at the design flow */
  g_object_set (line, "flow-maximum", 0.0, NULL);
  r = rugosa_project_get_results (p, line);
  /* Source: hand arithmetic: E = P_design·(4000 + 1000) h + P_low·3000 h */
  assert_rel (r->energy.energy_j_per_year,
              (p_design * 5000.0 + p_low * 3000.0) * 3600.0, 1e-14, "hours moved to the design flow");
}

/* The present value of a cost that is the same every year (no aging)
 * against the closed form of an annuity. */
static void
test_present_value (void)
{
  g_autoptr (RugosaLine) line = laminar_line ();
  g_autoptr (RugosaProject) p = project_with (line);
  RugosaSettings *s = rugosa_project_get_settings (p);
  static const struct { double life, rate_percent; } cases[] = {
    { 30.0, 5.0 }, { 1.0, 8.0 }, { 100.0, 2.5 }, { 20.0, 0.0 }, { 12.5, 6.0 },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      const double n = cases[i].life, rate = cases[i].rate_percent / 100.0;
      const RugosaLineResults *r;
      const RugosaLifeCycle *life;
      double c, annuity;

      g_object_set (s, "service-life", n, "discount-rate", cases[i].rate_percent, NULL);
      r = rugosa_project_get_results (p, line);
      life = rugosa_project_get_life_cycle (p, line);
      g_assert_true (life->ok);
      c = r->energy.cost_per_year;
      /* Source: the present value of an ordinary annuity, payments C at the
       * end of years 1 … N: PV = C·(1 − (1 + r)^−N)/r, and N·C at r = 0
       * (any text on engineering economics); a last part-year w of N is
       * w·C paid at N: + w·C·(1 + r)^−N on the whole years before it. */
      {
        const double whole = floor (n), w = n - whole;

        annuity = rate > 0.0 ? c * (1.0 - pow (1.0 + rate, -whole)) / rate : c * whole;
        annuity += w * c * pow (1.0 + rate, -n);
      }
      assert_rel (life->total_pv, annuity, 1e-12, "present value");
      /* Source: hand arithmetic: N years of the same cost */
      assert_rel (life->total, n * c, 1e-12, "life sum");
      assert_rel (r->energy.life_energy_cost_pv, annuity, 1e-12, "present value in the results");
    }
}

/* A line whose roughness grows: each year is costed at its mid-year
 * roughness, and the life sum lies between "always new" and "always at the
 * end of life". */
static void
test_life_bounds (void)
{
  g_autoptr (RugosaLine) line = rugosa_line_new ("aging");
  g_autoptr (RugosaProject) p = project_with (line);
  RugosaSettings *s = rugosa_project_get_settings (p);
  const RugosaLifeCycle *life;
  double c_new, c_end;

  g_object_set (line, "fluid-kind", RG_FLUID_CUSTOM, "density", 998.0,
                "viscosity", 1.0e-3, "inner-diameter", 0.15, "roughness", 5.0e-5,
                "aging-rate", 1.0e-4, "length", 2000.0, "elevation", 15.0,
                "flow-design", 0.03, NULL);
  g_object_set (s, "service-life", 40.0, "discount-rate", 0.0, NULL);
  life = rugosa_project_get_life_cycle (p, line);
  g_assert_true (life->ok);
  g_assert_cmpuint (life->n_years, ==, 40);
  c_new = rugosa_project_get_results_at (p, line, 0.0)->energy.cost_per_year;
  c_end = rugosa_project_get_results_at (p, line, 40.0)->energy.cost_per_year;
  /* Common practice (no single source): the head loss, hence the energy,
   * grows with the roughness, and the roughness grows with age. */
  g_assert_cmpfloat (c_new, <, c_end);
  g_assert_cmpfloat (40.0 * c_new, <, life->total);
  g_assert_cmpfloat (life->total, <, 40.0 * c_end);
  /* Source: the method (rugosa-life-cycle.c): year k at the roughness of
   * age k − ½, the cost of a year at that age */
  for (guint k = 1; k <= life->n_years; k += 13)
    assert_rel (life->year_cost[k - 1],
                rugosa_project_get_results_at (p, line, k - 0.5)->energy.cost_per_year,
                1e-13, "year at its middle");
}

/* Capital: per metre × length + lump sum; the life-cycle cost only where
 * a capital cost is given. */
static void
test_capital (void)
{
  g_autoptr (RugosaLine) line = laminar_line ();
  g_autoptr (RugosaProject) p = project_with (line);
  const RugosaOutputKey *lcc = rugosa_output_key_find ("life_cycle_cost");
  const RugosaOutputKey *cap = rugosa_output_key_find ("capital_cost");
  const RugosaLineResults *r = rugosa_project_get_results (p, line);

  g_assert_false (r->energy.has_capital);
  g_assert_false (rugosa_output_present_for (lcc, r, &r->points[RUGOSA_FLOW_DESIGN]));
  g_assert_false (rugosa_output_present_for (cap, r, &r->points[RUGOSA_FLOW_DESIGN]));
  g_object_set (line, "cost-per-metre", 120.0, "cost-lump-sum", 5000.0, NULL);
  r = rugosa_project_get_results (p, line);
  /* Source: hand arithmetic: 120 per m × 100 m + 5000 = 17000 */
  g_assert_cmpfloat (r->energy.capital, ==, 17000.0);
  assert_rel (r->energy.life_cycle_cost, 17000.0 + r->energy.life_energy_cost_pv, 1e-15, "life-cycle cost");
  g_assert_true (rugosa_output_present_for (lcc, r, &r->points[RUGOSA_FLOW_DESIGN]));
  /* a value of the whole line is given with the design point alone */
  g_object_set (line, "flow-minimum", 0.5e-3, NULL);
  r = rugosa_project_get_results (p, line);
  g_assert_false (rugosa_output_present_for (lcc, r, &r->points[RUGOSA_FLOW_MINIMUM]));
}

/* An efficiency of 0 set around its row (which refuses it) gives no
 * energy rather than an infinite one: nothing that is not a number
 * leaves the program. */
static void
test_no_efficiency (void)
{
  g_autoptr (RugosaLine) line = laminar_line ();
  g_autoptr (RugosaProject) p = project_with (line);
  g_autoptr (GString) out = g_string_new (NULL);
  const RugosaLineResults *r;

  g_object_set (rugosa_project_get_settings (p), "pump-efficiency", 0.0, NULL);
  r = rugosa_project_get_results (p, line);
  g_assert_true (r->ok);
  g_assert_false (r->energy.ok);
  g_assert_false (r->energy.life_ok);
  g_assert_true (rugosa_project_format_eval (p, -1.0, RUGOSA_EVAL_FORMAT_JSON, out, NULL));
  g_assert_null (strstr (out->str, "inf"));
  g_assert_null (strstr (out->str, "nan"));
  g_assert_null (strstr (out->str, "null"));
  g_assert_null (strstr (out->str, "energy_kWh_per_year"));
}

/* ---- the duty point -------------------------------------------------- */

/* A water-like line with plain K fittings (no catalog) and aging, and a
 * pump whose curve falls through the design flow. */
static RugosaLine *
pumped_line (void)
{
  RugosaLine *line = rugosa_line_new ("pumped");

  g_object_set (line, "fluid-kind", RG_FLUID_CUSTOM, "density", 999.0,
                "viscosity", 1.14e-3, "inner-diameter", 0.15, "roughness", 2.6e-4,
                "aging-rate", 1.2e-4, "length", 480.0, "elevation", 6.0,
                "flow-design", 0.025, NULL);
  rugosa_line_set_fittings (line, g_variant_new_parsed ("[('', 0.9, 6.0), ('', 0.5, 1.0)]"));
  g_object_set (line, "pump-curve",
                g_variant_new_parsed ("[(0.0, 42.0), (0.015, 39.0), (0.025, 33.5), (0.035, 24.0), (0.045, 10.0)]"),
                NULL);
  return line;
}

/* The oracle: the same line built for the core by hand, the pump curve by
 * GSL, the crossing by GSL's Brent solver. */
typedef struct {
  gsl_interp *interp;
  gsl_interp_accel *acc;
  double q[5], h[5];
  double eps;      /* the roughness at the age searched */
} Oracle;

static double
oracle_system (double q, double eps)
{
  RgLineInput in;
  RgLineResult out;
  double re;

  if (q <= 0.0)
    return 6.0;
  rg_line_input_init (&in);
  in.flow_m3_s = q;
  in.diameter_m = 0.15;
  in.length_m = 480.0;
  in.roughness_m = eps;
  in.k_sum = 0.9 * 6.0 + 0.5;
  in.elevation_m = 6.0;
  in.density_kg_m3 = 999.0;
  in.viscosity_pa_s = 1.14e-3;
  re = 999.0 * (4.0 * q / (G_PI * 0.15 * 0.15)) * 0.15 / 1.14e-3;
  g_assert_cmpfloat (re, >, 4000.0);
  g_assert_cmpint (rg_line_evaluate (&in, &out, NULL), ==, RG_OK);
  return 6.0 + out.head_loss_total_m;
}

static double
oracle_g (double q, void *data)
{
  Oracle *o = data;

  return gsl_interp_eval (o->interp, o->q, o->h, q, o->acc) - oracle_system (q, o->eps);
}

static double
oracle_duty (Oracle *o, double lo, double hi)
{
  gsl_root_fsolver *solver = gsl_root_fsolver_alloc (gsl_root_fsolver_brent);
  gsl_function fn = { oracle_g, o };
  double root = 0.0;
  int status = GSL_CONTINUE;

  gsl_root_fsolver_set (solver, &fn, lo, hi);
  for (int it = 0; it < 200 && status == GSL_CONTINUE; it++)
    {
      gsl_root_fsolver_iterate (solver);
      root = gsl_root_fsolver_root (solver);
      status = gsl_root_test_interval (gsl_root_fsolver_x_lower (solver),
                                       gsl_root_fsolver_x_upper (solver), 0.0, 1e-14);
    }
  g_assert_cmpint (status, ==, GSL_SUCCESS);
  gsl_root_fsolver_free (solver);
  return root;
}

static void
test_duty_point (void)
{
  g_autoptr (RugosaLine) line = pumped_line ();
  g_autoptr (RugosaProject) p = project_with (line);
  const RugosaLineResults *r;
  RugosaPumpFit fit;
  Oracle o;
  GVariant *curve;

  curve = g_variant_ref_sink (g_variant_new_parsed ("[(0.0, 42.0), (0.015, 39.0), (0.025, 33.5), (0.035, 24.0), (0.045, 10.0)]"));
  g_assert_true (rugosa_pump_fit_init (&fit, curve));
  for (int i = 0; i < 5; i++)
    g_variant_get_child (curve, (gsize) i, "(dd)", &o.q[i], &o.h[i]);
  g_variant_unref (curve);
  o.interp = gsl_interp_alloc (gsl_interp_steffen, 5);
  o.acc = gsl_interp_accel_alloc ();
  gsl_interp_init (o.interp, o.q, o.h, 5);

  /* Source: GSL gsl_interp_steffen (Steffen 1990): the fit is that curve */
  for (int i = 0; i <= 450; i++)
    {
      double q = 0.045 * i / 450.0;
      double want = gsl_interp_eval (o.interp, o.q, o.h, q, o.acc);

      if (fabs (rugosa_pump_fit_head (&fit, q) - want) > 1e-12 * 42.0)
        g_error ("fit at %g: %.17g, GSL Steffen %.17g", q, rugosa_pump_fit_head (&fit, q), want);
    }

  g_object_set (rugosa_project_get_settings (p), "service-age", 30.0, NULL);
  r = rugosa_project_get_results (p, line);
  g_assert_true (r->energy.has_pump);
  g_assert_true (r->energy.duty_ok && r->energy.duty_new_ok);

  /* Source: GSL gsl_root_fsolver_brent on GSL's Steffen curve minus the
   * core's rg_line_evaluate of the same line (roughness ε₀ + α·t, the
   * aging model of core/aging.h), both ages. */
  o.eps = 2.6e-4;
  assert_rel (r->energy.duty_new_flow_m3_s, oracle_duty (&o, 0.0, 0.045), 1e-10, "duty flow when new");
  o.eps = 2.6e-4 + 1.2e-4 * 30.0;
  assert_rel (r->energy.duty_flow_m3_s, oracle_duty (&o, 0.0, 0.045), 1e-10, "duty flow at 30 years");
  /* pump head = system head at the duty point, to a tight tolerance */
  g_assert_cmpfloat (fabs (r->energy.duty_head_m - oracle_system (r->energy.duty_flow_m3_s, o.eps)), <, 1e-9);
  g_assert_cmpfloat (fabs (r->energy.duty_new_head_m - oracle_system (r->energy.duty_new_flow_m3_s, 2.6e-4)), <, 1e-9);
  /* Common practice (no single source): a rougher line delivers less
   * from the same pump */
  g_assert_cmpfloat (r->energy.duty_flow_m3_s, <, r->energy.duty_new_flow_m3_s);

  gsl_interp_accel_free (o.acc);
  gsl_interp_free (o.interp);
}

static gboolean
has_warning (const RugosaOperatingPoint *pt, const char *needle)
{
  for (int i = 0; i < pt->warnings.count; i++)
    if (strstr (pt->warnings.text[i], needle) != NULL)
      return TRUE;
  return FALSE;
}

/* Curves that do not cross in the pump's range: no duty point, a warning
 * saying which way. */
static void
test_no_crossing (void)
{
  g_autoptr (RugosaLine) line = pumped_line ();
  g_autoptr (RugosaProject) p = project_with (line);
  const RugosaLineResults *r;
  const RugosaOutputKey *duty = rugosa_output_key_find ("duty_flow");

  /* too weak: shut-off head below the line's static head Δz = 6 m */
  g_object_set (line, "pump-curve", g_variant_new_parsed ("[(0.0, 5.0), (0.01, 4.0), (0.02, 2.0)]"), NULL);
  g_object_set (rugosa_project_get_settings (p), "service-age", 10.0, NULL);
  r = rugosa_project_get_results (p, line);
  g_assert_true (r->energy.has_pump);
  g_assert_false (r->energy.duty_ok || r->energy.duty_new_ok);
  g_assert_false (rugosa_output_present_for (duty, r, &r->points[RUGOSA_FLOW_DESIGN]));
  g_assert_true (has_warning (&r->points[RUGOSA_FLOW_DESIGN], "lies below the system curve"));
  g_assert_true (has_warning (&r->points[RUGOSA_FLOW_DESIGN], "When new"));

  /* too strong for its given range: still far above the line at its
   * largest given flow */
  g_object_set (line, "pump-curve", g_variant_new_parsed ("[(0.0, 90.0), (0.005, 89.0), (0.01, 88.0)]"), NULL);
  r = rugosa_project_get_results (p, line);
  g_assert_false (r->energy.duty_ok);
  g_assert_true (has_warning (&r->points[RUGOSA_FLOW_DESIGN], "lies above the system curve"));

  /* two points: no curve, and it is said */
  g_object_set (line, "pump-curve", g_variant_new_parsed ("[(0.0, 40.0), (0.04, 10.0)]"), NULL);
  r = rugosa_project_get_results (p, line);
  g_assert_false (r->energy.has_pump);
  g_assert_true (has_warning (&r->points[RUGOSA_FLOW_DESIGN], "fewer than three points"));

  /* none: nothing said */
  g_object_set (line, "pump-curve", NULL, NULL);
  r = rugosa_project_get_results (p, line);
  g_assert_false (r->energy.has_pump);
  g_assert_cmpint (r->points[RUGOSA_FLOW_DESIGN].warnings.count, ==, 0);
}

/* The system curve at the design flow is the line's head loss plus Δz;
 * at no flow it is Δz. */
static void
test_system_curve (void)
{
  g_autoptr (RugosaLine) line = pumped_line ();
  g_autoptr (RugosaProject) p = project_with (line);
  const double ages[] = { 0.0, 17.5 };

  for (guint i = 0; i < G_N_ELEMENTS (ages); i++)
    {
      const RugosaLineResults *r = rugosa_project_get_results_at (p, line, ages[i]);
      double h = 0.0, qs[5], hs[5];

      g_assert_true (rugosa_project_system_head (p, line, 0.025, ages[i], &h, NULL));
      /* Source: the evaluation's results (results table) of the same line:
       * H(Q_design) = h_total + Δz, to the bit (one function) */
      g_assert_cmpfloat (h, ==, r->points[RUGOSA_FLOW_DESIGN].result.head_loss_total_m + 6.0);
      g_assert_true (rugosa_project_system_curve (p, line, ages[i], 0.04, 5, qs, hs, NULL));
      /* Source: the definition H(0) = Δz (no flow, no loss) */
      g_assert_cmpfloat (qs[0], ==, 0.0);
      g_assert_cmpfloat (hs[0], ==, 6.0);
      g_assert_cmpfloat (qs[4], ==, 0.04);
      for (int k = 1; k < 5; k++)
        g_assert_cmpfloat (hs[k], >, hs[k - 1]);
    }
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/life-cycle/power-energy", test_power_energy);
  g_test_add_func ("/life-cycle/hours-split", test_hours_split);
  g_test_add_func ("/life-cycle/present-value", test_present_value);
  g_test_add_func ("/life-cycle/life-bounds", test_life_bounds);
  g_test_add_func ("/life-cycle/capital", test_capital);
  g_test_add_func ("/life-cycle/no-efficiency", test_no_efficiency);
  g_test_add_func ("/life-cycle/duty-point", test_duty_point);
  g_test_add_func ("/life-cycle/no-crossing", test_no_crossing);
  g_test_add_func ("/life-cycle/system-curve", test_system_curve);
  return g_test_run ();
}
