/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Tests for src/core/status.c and the sentences of the whole core: the
 * subjects of an error, the units of the values in a sentence, and, over
 * every error path of the core that a test can reach:
 *   - each names the inputs a user can change (subjects ≠ 0), except the
 *     few misuses of the API the core documents as having no subject;
 *   - the sources do the same (no plain rg_error_set, no subjects of 0
 *     outside those misuses);
 *   - under the German locale each comes out as a German sentence with no
 *     English fragment inside (/status/error-paths/german, run by the test
 *     status-de_DE with the build folder's locale and catalogs). */
#include <glib.h>
#include <libintl.h>
#include <locale.h>
#include <math.h>
#include <string.h>

#include "core/aging.h"
#include "core/air.h"
#include "core/catalog.h"
#include "core/fittings.h"
#include "core/fluid.h"
#include "core/friction.h"
#include "core/line.h"
#include "core/oil.h"
#include "core/regime.h"
#include "core/seawater.h"
#include "core/status.h"
#include "core/units.h"
#include "core/water.h"

#define ON(s) RG_SUBJECT_BIT (RG_SUBJECT_##s)

/* ---- status.c itself --------------------------------------------------- */

static void
test_subjects (void)
{
  RgError err = { 0 };

  g_assert_cmpint (rg_error_set_on (&err, RG_ERR_DOMAIN, ON (FLOW),
                                    "The flow must be a positive number."),
                   ==, RG_ERR_DOMAIN);
  g_assert_cmpint (err.status, ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (FLOW));
  g_assert_cmpint (rg_error_add_subjects (&err, ON (DIAMETER)), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, ON (FLOW) | ON (DIAMETER));
  /* a later error replaces the subjects; rg_error_set names none */
  rg_error_set (&err, RG_ERR_PARSE, "%s", "Not a number.");
  g_assert_cmpuint (err.subjects, ==, 0);
  g_assert_cmpint (rg_error_set_on (NULL, RG_ERR_UNIT, ON (VALUE), "x"), ==, RG_ERR_UNIT);

  /* every subject has its own identifier; none past the end */
  for (int s = RG_SUBJECT_NONE + 1; s < RG_SUBJECT_N; s++)
    {
      const char *id = rg_subject_id ((RgSubject) s);
      g_assert_cmpuint (strlen (id), >, 0);
      for (int t = RG_SUBJECT_NONE + 1; t < s; t++)
        g_assert_cmpstr (rg_subject_id ((RgSubject) t), !=, id);
    }
  g_assert_cmpstr (rg_subject_id (RG_SUBJECT_NONE), ==, "");
  g_assert_cmpstr (rg_subject_id (RG_SUBJECT_N), ==, "");
  /* the set holds every subject */
  g_assert_cmpuint (RG_SUBJECT_N, <=, 64);
}

static void
test_clear_keeps_units (void)
{
  RgUnitChoice us = { { NULL } };
  RgError err = { 0 };
  RgWarnings w = { 0 };

  us.unit[RG_QTY_PRESSURE] = "psi";
  err.units = &us;
  rg_error_set_on (&err, RG_ERR_DOMAIN, ON (PRESSURE), "x");
  rg_error_clear (&err);
  g_assert_true (err.units == &us);
  g_assert_cmpint (err.status, ==, RG_OK);
  g_assert_cmpuint (err.subjects, ==, 0);
  g_assert_cmpstr (err.text, ==, "");

  w.units = &us;
  rg_warnings_add (&w, "%s", "one");
  rg_warnings_clear (&w);
  g_assert_true (w.units == &us);
  g_assert_cmpint (w.count, ==, 0);
}

/* ---- every error path of the core ------------------------------------- */

/* One error path: a call that fails, and the subjects its error must name
 * (NO_SUBJECT: a misuse of the API, documented in status.h as having
 * none). */
typedef RgStatus (*PathFn) (RgError *err);

typedef struct {
  const char *name;
  PathFn fn;
  RgSubjects subjects;
} ErrorPath;

#define NO_SUBJECT ((RgSubjects) 0)

static RgLineInput
a_line (void)
{
  RgLineInput in;

  rg_line_input_init (&in);
  /* Common practice (no single source): 12 L/s of water at 20 °C in a
   * 100 mm steel line, the project's working example */
  in.flow_m3_s = 0.012;
  in.diameter_m = 0.1;
  in.length_m = 100.0;
  in.roughness_m = 4.5e-5;
  in.density_kg_m3 = 998.2;
  in.viscosity_pa_s = 1.0e-3;
  return in;
}

static RgOilSpec
an_oil (void)
{
  RgFluidSpec f;
  rg_fluid_spec_init (&f, RG_FLUID_OIL);
  const RgOilSpec o = {
    .t1_k = f.oil_t1_k, .nu1_m2_s = f.oil_nu1_m2_s, .t2_k = f.oil_t2_k,
    .nu2_m2_s = f.oil_nu2_m2_s, .density_ref_kg_m3 = f.oil_density_ref_kg_m3,
    .t_ref_k = f.oil_t_ref_k, .expansion_per_k = f.oil_expansion_per_k,
  };
  return o;
}

static double x_out;

/* A path: the call and what it needs; its subjects are in PATHS below. */
#define PATH(name, ...) \
  static RgStatus name (RgError *err) { __VA_ARGS__ }

/* units.c */
PATH (u_empty, return rg_units_parse (RG_QTY_FLOW, "--q", "", &x_out, err);)
PATH (u_empty_anon, return rg_units_parse (RG_QTY_FLOW, NULL, " ", &x_out, err);)
PATH (u_comma, return rg_units_parse (RG_QTY_FLOW, "--q", "2,5", &x_out, err);)
PATH (u_comma_anon, return rg_units_parse (RG_QTY_FLOW, NULL, "2,5", &x_out, err);)
PATH (u_nan, return rg_units_parse (RG_QTY_FLOW, "--q", "nan", &x_out, err);)
PATH (u_nan_anon, return rg_units_parse (RG_QTY_FLOW, NULL, "nan", &x_out, err);)
PATH (u_over, return rg_units_parse (RG_QTY_FLOW, "--q", "1e999", &x_out, err);)
PATH (u_over_anon, return rg_units_parse (RG_QTY_FLOW, NULL, "1e999", &x_out, err);)
PATH (u_under, return rg_units_parse (RG_QTY_FLOW, "--q", "1e-999", &x_out, err);)
PATH (u_under_anon, return rg_units_parse (RG_QTY_FLOW, NULL, "1e-999", &x_out, err);)
PATH (u_div0, return rg_units_parse (RG_QTY_LENGTH, "--l", "1/0", &x_out, err);)
PATH (u_div0_anon, return rg_units_parse (RG_QTY_LENGTH, NULL, "1/0", &x_out, err);)
PATH (u_nonum, return rg_units_parse (RG_QTY_FLOW, "--q", "xyz", &x_out, err);)
PATH (u_nonum_anon, return rg_units_parse (RG_QTY_FLOW, NULL, "xyz", &x_out, err);)
PATH (u_kind, return rg_units_parse (RG_QTY_FLOW, "--q", "2 m", &x_out, err);)
PATH (u_kind_anon, return rg_units_parse (RG_QTY_FLOW, NULL, "2 m", &x_out, err);)
PATH (u_gauge, return rg_units_parse (RG_QTY_PRESSURE, "--p", "2 barg", &x_out, err);)
PATH (u_gauge_anon, return rg_units_parse (RG_QTY_PRESSURE, NULL, "2 barg", &x_out, err);)
PATH (u_gauge_kind, return rg_units_parse (RG_QTY_FLOW, NULL, "2 barg", &x_out, err);)
PATH (u_unknown, return rg_units_parse (RG_QTY_FLOW, "--q", "2 xyz", &x_out, err);)
PATH (u_unknown_anon, return rg_units_parse (RG_QTY_FLOW, NULL, "2 xyz", &x_out, err);)
PATH (u_large, return rg_units_parse (RG_QTY_LENGTH, "--l", "1e308 km", &x_out, err);)
PATH (u_large_anon, return rg_units_parse (RG_QTY_LENGTH, NULL, "1e308 km", &x_out, err);)
PATH (u_zero, return rg_units_parse (RG_QTY_TEMPERATURE, "--t", "-300 C", &x_out, err);)
PATH (u_zero_anon, return rg_units_parse (RG_QTY_TEMPERATURE, NULL, "-300 C", &x_out, err);)
PATH (u_visc, return rg_units_parse_viscosity ("--v", "1 Pa", &x_out, NULL, err);)
PATH (u_qty, return rg_units_parse (RG_QTY_N, "--x", "1", &x_out, err);)
PATH (c_kind, return rg_units_to_si (RG_QTY_FLOW, 1.0, "ft", &x_out, err);)
PATH (c_gauge, return rg_units_to_si (RG_QTY_PRESSURE, 1.0, "psig", &x_out, err);)
PATH (c_unknown, return rg_units_from_si (RG_QTY_FLOW, 1.0, "xyz", &x_out, err);)
PATH (c_nan, return rg_units_to_si (RG_QTY_FLOW, NAN, "gpm", &x_out, err);)
PATH (c_large, return rg_units_to_si (RG_QTY_LENGTH, 1e308, "km", &x_out, err);)
PATH (c_zero, return rg_units_to_si (RG_QTY_TEMPERATURE, -300.0, "°C", &x_out, err);)
PATH (c_zero_from, return rg_units_from_si (RG_QTY_TEMPERATURE, -1.0, "°C", &x_out, err);)
PATH (c_qty, return rg_units_from_si (RG_QTY_N, 1.0, NULL, &x_out, err);)
/* water.c */
PATH (w_sat, return rg_water_saturation_pressure (700.0, &x_out, err);)
PATH (w_tnan, return rg_water_density (NAN, 1e5, &x_out, err);)
PATH (w_t, return rg_water_density (500.0, 1e5, &x_out, err);)
PATH (w_p, return rg_water_density (300.0, 0.0, &x_out, err);)
PATH (w_pmax, return rg_water_density (300.0, 2e7, &x_out, err);)
PATH (w_boil, return rg_water_density (400.0, 1e5, &x_out, err);)
PATH (w_rho, return rg_water_viscosity (300.0, 1200.0, &x_out, err);)
/* seawater.c */
PATH (s_t, return rg_seawater_density (500.0, 0.035, &x_out, err);)
PATH (s_s, return rg_seawater_density (300.0, 0.2, &x_out, err);)
PATH (s_p, return rg_seawater_check_state (300.0, -1.0, err);)
PATH (s_pmax, return rg_seawater_check_state (300.0, 2e7, err);)
PATH (s_boil, return rg_seawater_check_state (400.0, 1e5, err);)
/* oil.c */
PATH (o_t1, RgOilSpec o = an_oil (); o.t1_k = 100.0; return rg_oil_check (&o, err);)
PATH (o_t2, RgOilSpec o = an_oil (); o.t2_k = 900.0; return rg_oil_check (&o, err);)
PATH (o_tref, RgOilSpec o = an_oil (); o.t_ref_k = NAN; return rg_oil_check (&o, err);)
PATH (o_t, RgOilSpec o = an_oil (); return rg_oil_density (&o, 700.0, &x_out, err);)
PATH (o_nu1, RgOilSpec o = an_oil (); o.nu1_m2_s = 1e-6; return rg_oil_check (&o, err);)
PATH (o_nu2, RgOilSpec o = an_oil (); o.nu2_m2_s = 2.0; return rg_oil_check (&o, err);)
PATH (o_dt, RgOilSpec o = an_oil (); o.t2_k = o.t1_k + 0.5; return rg_oil_check (&o, err);)
PATH (o_order,
      RgOilSpec o = an_oil (); o.nu2_m2_s = 2.0 * o.nu1_m2_s; return rg_oil_check (&o, err);)
PATH (o_rho, RgOilSpec o = an_oil (); o.density_ref_kg_m3 = 100.0; return rg_oil_check (&o, err);)
PATH (o_beta, RgOilSpec o = an_oil (); o.expansion_per_k = -1.0; return rg_oil_check (&o, err);)
/* air.c */
PATH (a_t, return rg_air_viscosity (100.0, &x_out, err);)
PATH (a_p, return rg_air_density (300.0, 1.0, &x_out, err);)
/* fluid.c */
PATH (f_id, RgFluidKind k; return rg_fluid_kind_from_id ("lava", &k, err);)
PATH (f_kind, RgFluidSpec s; RgFluidProps p;
      rg_fluid_spec_init (&s, RG_FLUID_WATER); s.kind = RG_FLUID_N_KINDS;
      return rg_fluid_properties (&s, &p, NULL, err);)
PATH (f_null, RgFluidProps p; return rg_fluid_properties (NULL, &p, NULL, err);)
PATH (f_rho, RgFluidSpec s; RgFluidProps p;
      rg_fluid_spec_init (&s, RG_FLUID_CUSTOM); s.density_kg_m3 = 1e6; s.viscosity_pa_s = 1e-3;
      return rg_fluid_properties (&s, &p, NULL, err);)
PATH (f_mu, RgFluidSpec s; RgFluidProps p;
      rg_fluid_spec_init (&s, RG_FLUID_CUSTOM); s.density_kg_m3 = 998.0;
      s.viscosity_pa_s = 1e6; return rg_fluid_properties (&s, &p, NULL, err);)
/* friction.c */
PATH (fr_re, return rg_friction_colebrook (10.0, 1e-4, &x_out, err);)
PATH (fr_rr, return rg_friction_haaland (1e5, 0.5, &x_out, err);)
PATH (fr_lam, return rg_friction_laminar (-1.0, &x_out, err);)
PATH (fr_lam_small, return rg_friction_laminar (1e-310, &x_out, err);)
PATH (fr_ch_re, return rg_friction_churchill (0.0, 1e-4, &x_out, err);)
PATH (fr_ch_rr, return rg_friction_churchill (1e5, -1.0, &x_out, err);)
PATH (fr_el, return rg_friction_roughness_elasticity (1e5, 0.5, &x_out, err);)
PATH (fr_model, return rg_friction_model (RG_FRICTION_N_MODELS, 1e5, 1e-4, &x_out, err);)
PATH (fr_id, RgFrictionModel m; return rg_friction_model_from_id ("xyz", &m, err);)
/* regime.c */
PATH (r_null, return rg_transition_check (NULL, err);)
PATH (r_order,
      const RgTransition t = { 5000.0, 3000.0 }; return rg_transition_check (&t, err);)
PATH (r_re, RgFrictionPoint p;
      return rg_friction_point (RG_FRICTION_COLEBROOK, NULL, -1.0, 1e-4, &p, err);)
PATH (r_rr, RgFrictionPoint p;
      return rg_friction_point (RG_FRICTION_COLEBROOK, NULL, 1e5, 1.0, &p, err);)
/* line.c */
#define LINE_PATH(name, ...) \
  PATH (name, RgLineInput in = a_line (); RgLineResult r; __VA_ARGS__; \
        return rg_line_evaluate (&in, &r, err);)
LINE_PATH (l_flow, in.flow_m3_s = 0.0)
LINE_PATH (l_dia, in.diameter_m = -1.0)
LINE_PATH (l_len, in.length_m = NAN)
LINE_PATH (l_rho, in.density_kg_m3 = 0.0)
LINE_PATH (l_mu, in.viscosity_pa_s = 0.0)
LINE_PATH (l_eps, in.roughness_m = -1.0)
LINE_PATH (l_k, in.k_sum = -1.0)
LINE_PATH (l_dz, in.elevation_m = INFINITY)
LINE_PATH (l_v, in.flow_m3_s = 1e308)
LINE_PATH (l_rr, in.roughness_m = 0.05)
LINE_PATH (l_re, in.flow_m3_s = 1e4)
LINE_PATH (l_h,
           in.length_m = 1e308; in.flow_m3_s = 1.0)
PATH (l_hl, RgLineInput in = a_line ();
      return rg_line_flow_for_head_loss (&in, -1.0, &x_out, err);)
PATH (l_noflow,
      RgLineInput in = a_line (); return rg_line_flow_for_head_loss (&in, 1e-300, &x_out, err);)
PATH (l_nodia,
      RgLineInput in = a_line (); return rg_line_diameter_for_head_loss (&in, 1e-300, &x_out, err);)
PATH (l_nosuit,
      RgLineInput in = a_line (); in.flow_m3_s = 1e-9; in.roughness_m = 1.0;
      return rg_line_diameter_for_head_loss (&in, 1.0, &x_out, err);)
/* aging.c */
PATH (g_class, const RgAgingClass *c; return rg_aging_class_lookup ("xyz", &c, err);)
PATH (g_eps, return rg_aging_roughness (-1.0, 1e-4, 1.0, &x_out, err);)
PATH (g_rate, return rg_aging_roughness (1e-4, 0.5, 1.0, &x_out, err);)
PATH (g_age, return rg_aging_roughness (1e-4, 1e-4, 500.0, &x_out, err);)
PATH (g_after,
      RgLineInput in = a_line (); RgAgingResult r; in.diameter_m = 0.02;
      return rg_aging_evaluate (&in, 2e-3, 10.0, &r, err);)
/* catalog.c */
PATH (k_material, const RgMaterial *m; return rg_material_lookup ("xyz", &m, err);)
PATH (k_pipe, const RgPipe *p; return rg_pipe_lookup ("xyz", &p, err);)
/* fittings.c */
PATH (t_lookup, const RgFitting *f; return rg_fitting_lookup ("xyz", &f, err);)
PATH (t_ft_d, return rg_fitting_crane_ft (-1.0, &x_out, err);)
PATH (t_ft_min, return rg_fitting_crane_ft (1e-4, &x_out, err);)
PATH (t_null, return rg_fitting_k (NULL, 1e5, 0.1, &x_out, err);)
PATH (t_re, return rg_fitting_k (rg_fitting_at (0), -1.0, 0.1, &x_out, err);)
PATH (t_d, return rg_fitting_k (rg_fitting_at (0), 1e5, 0.0, &x_out, err);)
PATH (t_list, return rg_fittings_k_sum (NULL, 2, 1e5, 0.1, &x_out, err);)
PATH (t_count, const RgFittingUse u = { NULL, 1.0, -1.0 };
      return rg_fittings_k_sum (&u, 1, 1e5, 0.1, &x_out, err);)
PATH (t_plain, const RgFittingUse u = { NULL, -1.0, 1.0 };
      return rg_fittings_k_sum (&u, 1, 1e5, 0.1, &x_out, err);)
PATH (t_sum, const RgFittingUse u[2] = { { NULL, 1e4, 1e305 }, { NULL, 1e4, 1e305 } };
      return rg_fittings_k_sum (u, 2, 1e5, 0.1, &x_out, err);)

#define P(fn, subjects) { #fn, fn, subjects }

static const ErrorPath PATHS[] = {
  P (u_empty, ON (VALUE)), P (u_empty_anon, ON (VALUE)), P (u_comma, ON (VALUE)),
  P (u_comma_anon, ON (VALUE)), P (u_nan, ON (VALUE)), P (u_nan_anon, ON (VALUE)),
  P (u_over, ON (VALUE)), P (u_over_anon, ON (VALUE)), P (u_under, ON (VALUE)),
  P (u_under_anon, ON (VALUE)), P (u_div0, ON (VALUE)), P (u_div0_anon, ON (VALUE)),
  P (u_nonum, ON (VALUE)), P (u_nonum_anon, ON (VALUE)), P (u_kind, ON (VALUE)),
  P (u_kind_anon, ON (VALUE)), P (u_gauge, ON (VALUE)), P (u_gauge_anon, ON (VALUE)),
  P (u_gauge_kind, ON (VALUE)), P (u_unknown, ON (VALUE)), P (u_unknown_anon, ON (VALUE)),
  P (u_large, ON (VALUE)), P (u_large_anon, ON (VALUE)), P (u_zero, ON (VALUE)),
  P (u_zero_anon, ON (VALUE)), P (u_visc, ON (VALUE)), P (u_qty, NO_SUBJECT),
  P (c_kind, ON (VALUE)), P (c_gauge, ON (VALUE)), P (c_unknown, ON (VALUE)),
  P (c_nan, ON (VALUE)), P (c_large, ON (VALUE)), P (c_zero, ON (VALUE)),
  P (c_zero_from, ON (VALUE)), P (c_qty, NO_SUBJECT),
  P (w_sat, ON (TEMPERATURE)), P (w_tnan, ON (TEMPERATURE)), P (w_t, ON (TEMPERATURE)),
  P (w_p, ON (PRESSURE)), P (w_pmax, ON (PRESSURE)),
  P (w_boil, ON (TEMPERATURE) | ON (PRESSURE)), P (w_rho, ON (DENSITY)),
  P (s_t, ON (TEMPERATURE)), P (s_s, ON (SALINITY)), P (s_p, ON (PRESSURE)),
  P (s_pmax, ON (PRESSURE)), P (s_boil, ON (TEMPERATURE) | ON (PRESSURE)),
  P (o_t1, ON (OIL_T1)), P (o_t2, ON (OIL_T2)), P (o_tref, ON (OIL_T_REF)),
  P (o_t, ON (TEMPERATURE)), P (o_nu1, ON (OIL_NU1)), P (o_nu2, ON (OIL_NU2)),
  P (o_dt, ON (OIL_T1) | ON (OIL_T2)),
  P (o_order, ON (OIL_T1) | ON (OIL_NU1) | ON (OIL_T2) | ON (OIL_NU2)),
  P (o_rho, ON (OIL_DENSITY_REF)), P (o_beta, ON (OIL_EXPANSION)),
  P (a_t, ON (TEMPERATURE)), P (a_p, ON (PRESSURE)),
  P (f_id, ON (FLUID)), P (f_kind, ON (FLUID)), P (f_null, NO_SUBJECT),
  P (f_rho, ON (DENSITY)), P (f_mu, ON (VISCOSITY)),
  P (fr_re, ON (REYNOLDS)), P (fr_rr, ON (RELATIVE_ROUGHNESS)), P (fr_lam, ON (REYNOLDS)),
  P (fr_lam_small, ON (REYNOLDS)), P (fr_ch_re, ON (REYNOLDS)),
  P (fr_ch_rr, ON (RELATIVE_ROUGHNESS)), P (fr_el, ON (RELATIVE_ROUGHNESS)),
  P (fr_model, ON (MODEL)), P (fr_id, ON (MODEL)),
  P (r_null, ON (RE_LAMINAR_MAX) | ON (RE_TURBULENT_MIN)),
  P (r_order, ON (RE_LAMINAR_MAX) | ON (RE_TURBULENT_MIN)),
  P (r_re, ON (REYNOLDS)), P (r_rr, ON (RELATIVE_ROUGHNESS)),
  P (l_flow, ON (FLOW)), P (l_dia, ON (DIAMETER)), P (l_len, ON (LENGTH)),
  P (l_rho, ON (DENSITY)), P (l_mu, ON (VISCOSITY)), P (l_eps, ON (ROUGHNESS)),
  P (l_k, ON (K_SUM) | ON (FITTING)), P (l_dz, ON (ELEVATION)),
  P (l_v, ON (FLOW) | ON (DIAMETER) | ON (DENSITY) | ON (VISCOSITY)),
  P (l_rr, ON (ROUGHNESS) | ON (DIAMETER)),
  P (l_re, ON (FLOW) | ON (DIAMETER) | ON (DENSITY) | ON (VISCOSITY)),
  P (l_h, ON (FLOW) | ON (DIAMETER) | ON (LENGTH) | ON (K_SUM) | ON (FITTING)),
  P (l_hl, ON (HEAD_LOSS)),
  P (l_noflow, ON (HEAD_LOSS) | ON (LENGTH) | ON (ROUGHNESS) | ON (K_SUM) | ON (DIAMETER)),
  P (l_nodia, ON (HEAD_LOSS) | ON (LENGTH) | ON (ROUGHNESS) | ON (K_SUM) | ON (FLOW)),
  P (l_nosuit, ON (FLOW) | ON (ROUGHNESS) | ON (DENSITY) | ON (VISCOSITY)),
  P (g_class, ON (AGING_CLASS)), P (g_eps, ON (ROUGHNESS)), P (g_rate, ON (AGING_RATE)),
  P (g_age, ON (AGE)), P (g_after, ON (AGE) | ON (AGING_RATE) | ON (ROUGHNESS) | ON (DIAMETER)),
  P (k_material, ON (MATERIAL)), P (k_pipe, ON (PIPE)),
  P (t_lookup, ON (FITTING)), P (t_ft_d, ON (DIAMETER)), P (t_ft_min, ON (DIAMETER)),
  P (t_null, ON (FITTING)), P (t_re, ON (REYNOLDS)), P (t_d, ON (DIAMETER)),
  P (t_list, ON (FITTING)), P (t_count, ON (FITTING)), P (t_plain, ON (FITTING)),
  P (t_sum, ON (FITTING)),
};

static void
test_error_paths_subjects (void)
{
  for (gsize i = 0; i < G_N_ELEMENTS (PATHS); i++)
    {
      RgError err = { 0 };
      RgStatus st = PATHS[i].fn (&err);

      if (st == RG_OK || err.status != st || err.text[0] == '\0')
        g_error ("%s: status %d, text '%s'", PATHS[i].name, st, err.text);
      if (err.subjects != PATHS[i].subjects)
        g_error ("%s: '%s': subjects %#llx, want %#llx", PATHS[i].name,
                 err.text, err.subjects, PATHS[i].subjects);
      /* a subject wherever an input a user can change is at fault */
      if (PATHS[i].subjects == NO_SUBJECT)
        g_assert_true (PATHS[i].fn == u_qty || PATHS[i].fn == c_qty
                       || PATHS[i].fn == f_null);
      /* with err NULL the same path fails the same way */
      g_assert_cmpint (PATHS[i].fn (NULL), ==, st);
    }
}

/* The sources agree: the core calls rg_error_set_on only (rg_error_set is
 * for callers outside it), and with a subject of 0 only for the misuses
 * of the API above. */
static void
test_sources_name_subjects (void)
{
  static const char *const no_subject_ok[] = {
    "\"Unknown kind of quantity %d.\"",
    "\"No fluid was given.\"",
  };
  const char *root = g_getenv ("RUGOSA_SOURCE_DIR");
  g_autofree char *dir = NULL;
  GDir *d;
  const char *name;
  int calls = 0, files = 0;

  if (root == NULL)
    {
      g_test_skip ("RUGOSA_SOURCE_DIR is not set");
      return;
    }
  dir = g_build_filename (root, "src", "core", NULL);
  d = g_dir_open (dir, 0, NULL);
  g_assert_nonnull (d);
  while ((name = g_dir_read_name (d)) != NULL)
    {
      g_autofree char *path = NULL;
      g_autofree char *text = NULL;

      if (!g_str_has_suffix (name, ".c") || g_str_equal (name, "status.c"))
        continue;
      path = g_build_filename (dir, name, NULL);
      g_assert_true (g_file_get_contents (path, &text, NULL, NULL));
      files++;
      if (strstr (text, "rg_error_set (") != NULL)
        g_error ("%s calls rg_error_set: use rg_error_set_on with the subjects", name);
      for (const char *p = strstr (text, "rg_error_set_on ("); p != NULL;
           p = strstr (p + 1, "rg_error_set_on ("))
        {
          /* the top-level arguments: err, status, subjects, format */
          const char *a = p + strlen ("rg_error_set_on (");
          const char *args[4] = { a, NULL, NULL, NULL };
          int depth = 0, n = 1;
          gboolean in_string = FALSE;

          for (const char *q = a; *q != '\0' && n < 4; q++)
            {
              if (in_string)
                {
                  if (*q == '\\')
                    q++;
                  else if (*q == '"')
                    in_string = FALSE;
                  continue;
                }
              if (*q == '"')
                in_string = TRUE;
              else if (*q == '(')
                depth++;
              else if (*q == ')')
                depth--;
              else if (*q == ',' && depth == 0)
                args[n++] = q + 1;
            }
          g_assert_cmpint (n, ==, 4);
          g_autofree char *subjects = g_strstrip (g_strndup (args[2], (gsize) (args[3] - args[2] - 1)));
          calls++;
          if (g_str_equal (subjects, "0"))
            {
              gboolean ok = FALSE;
              const char *fmt = args[3];
              while (*fmt == ' ' || *fmt == '\n')
                fmt++;
              for (gsize k = 0; k < G_N_ELEMENTS (no_subject_ok); k++)
                ok |= g_str_has_prefix (fmt, no_subject_ok[k]);
              if (!ok)
                g_error ("%s: an error without a subject: %.80s", name, fmt);
            }
        }
    }
  g_dir_close (d);
  g_assert_cmpint (files, >=, 12);
  /* as many calls as there are error sentences in the core, roughly: a
   * scanner that stopped finding them would pass everything */
  g_assert_cmpint (calls, >, 100);
}

/* ---- values in the user's units --------------------------------------- */

/* The same error and warnings in SI and with a US choice.  Every expected
 * number follows from the exact definitions of NIST SP 811 (2008),
 * Appendix B.8/B.9: foot = 0.3048 m, inch = 0.0254 m, pound-force =
 * 0.45359237 kg × 9.80665 m/s² (1 psi = 6894.757… Pa),
 * T/K = (t/°F + 459.67)/1.8; rounded by hand to 4 significant figures. */
static void
test_units_in_messages (void)
{
  RgUnitChoice us = { { NULL } };
  RgError si = { 0 }, usa = { 0 };
  RgWarnings wsi = { 0 }, wus = { 0 };
  const double psi = 0.45359237 * 9.80665 / (0.0254 * 0.0254);

  us.unit[RG_QTY_TEMPERATURE] = "°F";
  us.unit[RG_QTY_PRESSURE] = "psi";
  us.unit[RG_QTY_LENGTH] = "ft";
  us.unit[RG_QTY_FLOW] = "gpm";
  usa.units = &us;
  wus.units = &us;

  /* water above 10 MPa: 20 MPa = 2901 psi, 10 MPa = 1450 psi */
  g_assert_cmpint (rg_water_density (300.0, 20.0e6, &x_out, &si), ==, RG_ERR_DOMAIN);
  g_assert_cmpint (rg_water_density (300.0, 20.0e6, &x_out, &usa), ==, RG_ERR_DOMAIN);
  g_assert_cmpstr (si.text, ==, "A water pressure of 2e+07 Pa (absolute) is above 1e+07 Pa, the limit of the water model.");
  g_assert_cmpstr (usa.text, ==, "A water pressure of 2901 psi (absolute) is above 1450 psi, the limit of the water model.");
  g_assert_cmpuint (si.subjects, ==, usa.subjects);

  /* water at 200 °C = 392 °F; the range 273.16–423.15 K = 32.02–302 °F */
  g_assert_cmpint (rg_water_density (473.15, 1.0e6, &x_out, &si), ==, RG_ERR_DOMAIN);
  g_assert_cmpint (rg_water_density (473.15, 1.0e6, &x_out, &usa), ==, RG_ERR_DOMAIN);
  g_assert_cmpstr (si.text, ==, "A water temperature of 473.1 K lies outside the range of the water model, 273.2 K to 423.1 K.");
  g_assert_cmpstr (usa.text, ==, "A water temperature of 392 °F lies outside the range of the water model, 32.02 °F to 302 °F.");

  /* a 0.5 mm bore for Crane's f_T: 0.9144 mm = 0.003 ft, 0.5 mm = 0.00164 ft */
  g_assert_cmpint (rg_fitting_crane_ft (0.5e-3, &x_out, &usa), ==, RG_ERR_DOMAIN);
  g_assert_cmpstr (usa.text, ==, "Crane's friction factor f_T needs a bore of at least 0.003 ft, not 0.00164 ft.");

  /* the air compressibility warning: a drop of 30 psi at 150 psi inlet */
  g_assert_cmpint (rg_air_compressibility_warning (30.0 * psi, 150.0 * psi, &wsi), ==, 1);
  g_assert_cmpint (rg_air_compressibility_warning (30.0 * psi, 150.0 * psi, &wus), ==, 1);
  g_assert_cmpstr (wus.text[0], ==, "The pressure drop of 30 psi is 20 % of the inlet pressure 150 psi, above 10 %: the incompressible model no longer holds; split the line into shorter parts or use a compressible-flow method.");
  /* 30 psi = 206 842.7 Pa (206 800 to 4 figures), 150 psi = 1 034 214 Pa */
  g_assert_nonnull (strstr (wsi.text[0], "The pressure drop of 206800 Pa is 20 % of the inlet pressure 1.034e+06 Pa"));

  /* the ideal-gas warning above 1 MPa = 145 psi */
  rg_warnings_clear (&wus);
  RgFluidProps p;
  g_assert_cmpint (rg_air_properties (300.0, 2.0e6, &p, &wus, NULL), ==, RG_OK);
  g_assert_cmpstr (wus.text[0], ==, "Air: above 145 psi the ideal-gas density may be off by more than 0.5 %.");

  /* the oil outside its two viscosity points: 68 °F, points at 104 °F and
   * 212 °F (40 °C and 100 °C, fluid.c's default oil) */
  RgOilSpec o = an_oil ();
  rg_warnings_clear (&wus);
  rg_warnings_clear (&wsi);
  g_assert_cmpint (rg_oil_properties (&o, 293.15, &p, &wus, NULL), ==, RG_OK);
  g_assert_cmpint (rg_oil_properties (&o, 293.15, &p, &wsi, NULL), ==, RG_OK);
  g_assert_cmpstr (wus.text[0], ==, "Oil: 68 °F lies outside the temperatures of the two given viscosities (104 °F and 212 °F); the viscosity is extrapolated (ASTM D341).");
  g_assert_cmpstr (wsi.text[0], ==, "Oil: 293.1 K lies outside the temperatures of the two given viscosities (313.1 K and 373.1 K); the viscosity is extrapolated (ASTM D341).");
}

/* ---- German ------------------------------------------------------------ */

/* Words that mark an English fragment inside a German sentence. */
static const char *const ENGLISH[] = {
  " the ", " The ", " must ", " is ", " are ", " value", " and ", " not ",
  " or ", " between ", " of ", " for ", " be ", " to ", " could ", " with ",
  " lies ", " outside ", " above ", " below ", " unknown ", " closest ",
  " number", " temperature", " pressure", " flow", " length", " all ",
  "(dynamic)", "(kinematic)",
};

static const char *
english_fragment (const char *text)
{
  g_autofree char *padded = g_strdup_printf (" %s ", text);

  for (gsize k = 0; k < G_N_ELEMENTS (ENGLISH); k++)
    if (strstr (padded, ENGLISH[k]) != NULL)
      return ENGLISH[k];
  return NULL;
}

/* Whether the process speaks German: the locale of the build folder
 * (LOCPATH), the catalog of the build folder (RUGOSA_LOCALEDIR). */
static gboolean
german (void)
{
  const char *localedir = g_getenv ("RUGOSA_LOCALEDIR");
  g_autofree char *mo = NULL;

  if (localedir == NULL)
    return FALSE;
  mo = g_build_filename (localedir, "de", "LC_MESSAGES", "rugosa.mo", NULL);
  if (!g_file_test (mo, G_FILE_TEST_IS_REGULAR))
    return FALSE;
  g_setenv ("LANGUAGE", "de", TRUE);
  if (setlocale (LC_ALL, "de_DE.UTF-8") == NULL)
    return FALSE;
  bindtextdomain ("rugosa", localedir);
  bind_textdomain_codeset ("rugosa", "UTF-8");
  return g_str_equal (rg_gettext ("flow"), "Volumenstrom");
}

static void
assert_german (const char *what, const char *text)
{
  const char *bad = english_fragment (text);

  g_test_message ("%s: %s", what, text);
  g_assert_true (g_utf8_validate (text, -1, NULL));
  if (bad != NULL)
    g_error ("%s: '%s' holds the English '%s'", what, text, bad);
}

static void
test_error_paths_german (void)
{
  RgWarnings w = { 0 };
  RgFluidProps p;
  RgOilSpec o = an_oil ();
  const double psi = 0.45359237 * 9.80665 / (0.0254 * 0.0254);

  if (!german ())
    {
      g_test_skip ("no de_DE.UTF-8 locale or German catalog here "
                   "(the test status-de_DE provides both)");
      return;
    }
  for (gsize i = 0; i < G_N_ELEMENTS (PATHS); i++)
    {
      RgError err = { 0 };

      PATHS[i].fn (&err);
      assert_german (PATHS[i].name, err.text);
    }
  /* the warnings too */
  rg_oil_properties (&o, 293.15, &p, &w, NULL);
  o.t1_k = 500.0;
  o.t2_k = 550.0;
  o.nu1_m2_s = 3.0e-6;
  o.nu2_m2_s = 2.5e-6;
  rg_oil_properties (&o, 590.0, &p, &w, NULL);
  rg_air_properties (300.0, 2.0e6, &p, &w, NULL);
  rg_air_compressibility_warning (30.0 * psi, 150.0 * psi, &w);
  g_assert_cmpint (w.count, >=, 4);
  for (int i = 0; i < w.count; i++)
    assert_german ("warning", w.text[i]);
  /* the quantity names and unit lists inside the sentences are German */
  assert_german ("accepted", rg_units_accepted (RG_QTY_PRESSURE));
  /* numbers follow the German decimal comma there */
  {
    RgError err = { 0 };
    RgUnitChoice metric = { { NULL } };
    metric.unit[RG_QTY_TEMPERATURE] = "°C";
    err.units = &metric;
    rg_water_density (273.15, 1.0e5, &x_out, &err);
    g_assert_nonnull (strstr (err.text, "0,01 °C"));
  }
  setlocale (LC_ALL, "C");
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/status/subjects", test_subjects);
  g_test_add_func ("/status/clear-keeps-units", test_clear_keeps_units);
  g_test_add_func ("/status/error-paths/subjects", test_error_paths_subjects);
  g_test_add_func ("/status/error-paths/sources", test_sources_name_subjects);
  g_test_add_func ("/status/error-paths/units", test_units_in_messages);
  g_test_add_func ("/status/error-paths/german", test_error_paths_german);
  return g_test_run ();
}
