/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Tests for src/core/fluid.c: the water and custom kinds through the fluid
 * API, the kinds this build does not provide, and the kind names. */
#include <glib.h>
#include <float.h>
#include <math.h>
#include <string.h>

#include "core/air.h"
#include "core/fluid.h"
#include "core/oil.h"
#include "core/seawater.h"
#include "core/water.h"

static void
test_init (void)
{
  RgFluidSpec spec;

  memset (&spec, 0x55, sizeof spec);
  rg_fluid_spec_init (&spec, RG_FLUID_CUSTOM);
  g_assert_cmpint (spec.kind, ==, RG_FLUID_CUSTOM);
  /* Source: fluid.c's documented defaults, 20 °C and one standard
   * atmosphere (NIST SP 811 (2008) B.8: 1 atm = 101 325 Pa) */
  g_assert_cmpfloat (spec.temperature_k, ==, 293.15);
  g_assert_cmpfloat (spec.pressure_pa, ==, 101325.0);
  g_assert_cmpfloat (spec.density_kg_m3, ==, 0.0);
  g_assert_cmpfloat (spec.viscosity_pa_s, ==, 0.0);
}

static void
test_water (void)
{
  RgFluidSpec spec;
  RgFluidProps props;
  RgError err = { 0 };
  double rho, mu;

  rg_fluid_spec_init (&spec, RG_FLUID_WATER);
  g_assert_cmpint (rg_fluid_properties (&spec, &props, NULL, &err), ==, RG_OK);
  g_assert_cmpint (rg_water_properties (293.15, 101325.0, &rho, &mu, &err),
                   ==, RG_OK);
  /* the fluid API passes water.c's values through unchanged */
  g_assert_cmpfloat (props.density_kg_m3, ==, rho);
  g_assert_cmpfloat (props.dynamic_viscosity_pa_s, ==, mu);
  /* Source: definition ν = μ/ρ */
  g_assert_cmpfloat (props.kinematic_viscosity_m2_s, ==, mu / rho);

  /* Cross-check: python3-iapws iapws.IAPWS95(T=293.15, P=0.101325).rho
   * = 998.20715 kg/m³ (the scientific formulation); IF97 region 1 agrees
   * with it to about 1e-6 here, 1e-5 leaves a margin. */
  g_assert_cmpfloat (fabs (props.density_kg_m3 / 998.20715 - 1.0), <, 1e-5);
  /* From memory of ISO/TR 3666:1998 (viscosity of water at 20 °C and
   * 101.325 kPa: 1.0016 mPa·s); not checked against the document.  Five
   * digits: within half a unit of the last one. */
  g_assert_cmpfloat (fabs (props.dynamic_viscosity_pa_s - 1.0016e-3), <=,
                     0.5e-7);

  /* errors of water.c come through */
  spec.temperature_k = 373.15 + 10.0;
  g_assert_cmpint (rg_fluid_properties (&spec, &props, NULL, &err), ==,
                   RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "boils below"));
  spec.pressure_pa = 0.0;
  g_assert_cmpint (rg_fluid_properties (&spec, &props, NULL, &err), ==,
                   RG_ERR_DOMAIN);
}

static void
test_custom (void)
{
  RgFluidSpec spec;
  RgFluidProps props;
  RgError err = { 0 };

  rg_fluid_spec_init (&spec, RG_FLUID_CUSTOM);
  /* Common practice (no single source): a light oil, 850 kg/m³, 10 mPa·s */
  spec.density_kg_m3 = 850.0;
  spec.viscosity_pa_s = 0.010;
  g_assert_cmpint (rg_fluid_properties (&spec, &props, NULL, &err), ==, RG_OK);
  g_assert_cmpfloat (props.density_kg_m3, ==, 850.0);
  g_assert_cmpfloat (props.dynamic_viscosity_pa_s, ==, 0.010);
  /* Source: definition ν = μ/ρ */
  g_assert_cmpfloat (fabs (props.kinematic_viscosity_m2_s - 0.010 / 850.0),
                     <=, DBL_EPSILON * 0.010 / 850.0);
}

static void
test_custom_errors (void)
{
  /* Bounds of fluid.h: 0.01–25 000 kg/m³ and 1e-6–1e5 Pa·s, written in SI
   * with 4 significant figures (units.h) */
  static const struct {
    double rho, mu;
    const char *needle;
    RgSubject subject;
  } bad[] = {
    { 0.0, 1e-3, "density", RG_SUBJECT_DENSITY },
    { -998.0, 1e-3, "not -998 kg/m³", RG_SUBJECT_DENSITY },
    { NAN, 1e-3, "density", RG_SUBJECT_DENSITY },
    { INFINITY, 1e-3, "density", RG_SUBJECT_DENSITY },
    { 0.005, 1e-3, "between 0.01 kg/m³ and 25000 kg/m³", RG_SUBJECT_DENSITY },
    { 998.0e3, 1e-3, "between 0.01 kg/m³ and 25000 kg/m³", RG_SUBJECT_DENSITY },
    { 998.0, 0.0, "viscosity", RG_SUBJECT_VISCOSITY },
    { 998.0, -1e-3, "viscosity", RG_SUBJECT_VISCOSITY },
    { 998.0, NAN, "not —", RG_SUBJECT_VISCOSITY },
    { 998.0, 1e-7, "between 1e-06 Pa·s and 100000 Pa·s", RG_SUBJECT_VISCOSITY },
    { 998.0, 1e6, "between 1e-06 Pa·s and 100000 Pa·s", RG_SUBJECT_VISCOSITY },
  };

  for (gsize i = 0; i < G_N_ELEMENTS (bad); i++)
    {
      RgFluidSpec spec;
      RgFluidProps props = { -1.0, -1.0, -1.0 };
      RgError err = { 0 };

      rg_fluid_spec_init (&spec, RG_FLUID_CUSTOM);
      spec.density_kg_m3 = bad[i].rho;
      spec.viscosity_pa_s = bad[i].mu;
      g_assert_cmpint (rg_fluid_properties (&spec, &props, NULL, &err), ==,
                       RG_ERR_DOMAIN);
      if (strstr (err.text, bad[i].needle) == NULL)
        g_error ("case %u: '%s' lacks '%s'", (unsigned) i, err.text,
                 bad[i].needle);
      g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (bad[i].subject));
      g_assert_cmpfloat (props.density_kg_m3, ==, -1.0);
    }
}

/* The fluid API hands each kind to its own model with the state from the
 * spec: the result equals a direct call (no second copy of any model). */
static void
test_dispatch (void)
{
  RgFluidSpec spec;
  RgFluidProps via, direct;
  RgError err = { 0 };

  rg_fluid_spec_init (&spec, RG_FLUID_SEAWATER);
  spec.temperature_k = 288.15;
  spec.salinity_kg_kg = 0.030;
  g_assert_cmpint (rg_fluid_properties (&spec, &via, NULL, &err), ==, RG_OK);
  g_assert_cmpint (rg_seawater_properties (288.15, 0.030, &direct, &err), ==, RG_OK);
  g_assert_cmpfloat (via.density_kg_m3, ==, direct.density_kg_m3);
  g_assert_cmpfloat (via.dynamic_viscosity_pa_s, ==, direct.dynamic_viscosity_pa_s);

  rg_fluid_spec_init (&spec, RG_FLUID_AIR);
  spec.temperature_k = 300.0;
  spec.pressure_pa = 2.0e5;
  g_assert_cmpint (rg_fluid_properties (&spec, &via, NULL, &err), ==, RG_OK);
  g_assert_cmpint (rg_air_properties (300.0, 2.0e5, &direct, NULL, &err), ==, RG_OK);
  g_assert_cmpfloat (via.density_kg_m3, ==, direct.density_kg_m3);
  g_assert_cmpfloat (via.dynamic_viscosity_pa_s, ==, direct.dynamic_viscosity_pa_s);

  rg_fluid_spec_init (&spec, RG_FLUID_OIL);
  spec.temperature_k = 330.0;
  const RgOilSpec oil = {
    .t1_k = spec.oil_t1_k, .nu1_m2_s = spec.oil_nu1_m2_s,
    .t2_k = spec.oil_t2_k, .nu2_m2_s = spec.oil_nu2_m2_s,
    .density_ref_kg_m3 = spec.oil_density_ref_kg_m3, .t_ref_k = spec.oil_t_ref_k,
    .expansion_per_k = spec.oil_expansion_per_k,
  };
  g_assert_cmpint (rg_fluid_properties (&spec, &via, NULL, &err), ==, RG_OK);
  g_assert_cmpint (rg_oil_properties (&oil, 330.0, &direct, NULL, &err), ==, RG_OK);
  g_assert_cmpfloat (via.density_kg_m3, ==, direct.density_kg_m3);
  g_assert_cmpfloat (via.kinematic_viscosity_m2_s, ==, direct.kinematic_viscosity_m2_s);

  /* Seawater is refused where it would boil.  From memory of the steam
   * tables (IAPWS-IF97 region 4): water boils at about 476 kPa at 150 °C, so
   * 1 atm is far below and 6 bar above. */
  rg_fluid_spec_init (&spec, RG_FLUID_SEAWATER);
  spec.temperature_k = 423.15;
  g_assert_cmpint (rg_fluid_properties (&spec, &via, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_nonnull (strstr (err.text, "boils"));
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_TEMPERATURE)
                                      | RG_SUBJECT_BIT (RG_SUBJECT_PRESSURE));
  spec.pressure_pa = 6.0e5;
  g_assert_cmpint (rg_fluid_properties (&spec, &via, NULL, &err), ==, RG_OK);

  /* A state outside a model's range is refused with its sentence. */
  rg_fluid_spec_init (&spec, RG_FLUID_SEAWATER);
  spec.salinity_kg_kg = 0.5;
  g_assert_cmpint (rg_fluid_properties (&spec, &via, NULL, &err), !=, RG_OK);
  g_assert_cmpstr (err.text, !=, "");
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_SALINITY));
  /* the seawater pressure is checked too (seawater.h) */
  rg_fluid_spec_init (&spec, RG_FLUID_SEAWATER);
  spec.pressure_pa = 2.0 * RG_SEAWATER_P_MAX_PA;
  g_assert_cmpint (rg_fluid_properties (&spec, &via, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_PRESSURE));
  /* each model's errors name its inputs */
  rg_fluid_spec_init (&spec, RG_FLUID_AIR);
  spec.pressure_pa = 1.0;
  g_assert_cmpint (rg_fluid_properties (&spec, &via, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_PRESSURE));
  rg_fluid_spec_init (&spec, RG_FLUID_OIL);
  spec.oil_density_ref_kg_m3 = 2000.0;
  g_assert_cmpint (rg_fluid_properties (&spec, &via, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_OIL_DENSITY_REF));
  rg_fluid_spec_init (&spec, RG_FLUID_WATER);
  spec.temperature_k = 200.0;
  g_assert_cmpint (rg_fluid_properties (&spec, &via, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_TEMPERATURE));
  /* a misuse of the API names no input */
  g_assert_cmpint (rg_fluid_properties (NULL, &via, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, 0);
  spec.kind = RG_FLUID_N_KINDS;
  g_assert_cmpint (rg_fluid_properties (&spec, &via, NULL, &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_FLUID));
}

/* The inputs behind a fluid's density and viscosity replace those two in
 * the subjects of a line's error (fluid.h). */
static void
test_subjects_behind (void)
{
  const RgSubjects rho_mu = RG_SUBJECT_BIT (RG_SUBJECT_DENSITY)
                            | RG_SUBJECT_BIT (RG_SUBJECT_VISCOSITY);
  const RgSubjects flow = RG_SUBJECT_BIT (RG_SUBJECT_FLOW);
  const RgSubjects t = RG_SUBJECT_BIT (RG_SUBJECT_TEMPERATURE);

  g_assert_cmpuint (rg_fluid_subjects_behind (RG_FLUID_CUSTOM, flow | rho_mu),
                    ==, flow | rho_mu);
  g_assert_cmpuint (rg_fluid_subjects_behind (RG_FLUID_WATER, flow | rho_mu),
                    ==, flow | t | RG_SUBJECT_BIT (RG_SUBJECT_PRESSURE));
  g_assert_cmpuint (rg_fluid_subjects_behind (RG_FLUID_SEAWATER, rho_mu),
                    ==, t | RG_SUBJECT_BIT (RG_SUBJECT_SALINITY));
  g_assert_cmpuint (rg_fluid_subjects_behind (RG_FLUID_OIL, rho_mu)
                    & RG_SUBJECT_BIT (RG_SUBJECT_OIL_NU1), !=, 0);
  g_assert_cmpuint (rg_fluid_subjects_behind (RG_FLUID_OIL, rho_mu) & rho_mu,
                    ==, 0);
  /* subjects without the two are left as they are */
  g_assert_cmpuint (rg_fluid_subjects_behind (RG_FLUID_WATER, flow), ==, flow);
  g_assert_cmpuint (rg_fluid_property_subjects (RG_FLUID_N_KINDS), ==, 0);
}

static void
test_kind_ids (void)
{
  RgFluidKind k = RG_FLUID_N_KINDS;
  RgError err = { 0 };

  for (int i = 0; i < RG_FLUID_N_KINDS; i++)
    {
      const char *id = rg_fluid_kind_id ((RgFluidKind) i);

      g_assert_nonnull (id);
      g_assert_cmpint (rg_fluid_kind_from_id (id, &k, &err), ==, RG_OK);
      g_assert_cmpint (k, ==, i);
    }
  /* Source: fluid.h, the ids are "water", "custom", "seawater", "oil",
   * "air" */
  g_assert_cmpstr (rg_fluid_kind_id (RG_FLUID_WATER), ==, "water");
  g_assert_cmpstr (rg_fluid_kind_id (RG_FLUID_AIR), ==, "air");
  g_assert_null (rg_fluid_kind_id (RG_FLUID_N_KINDS));
  g_assert_cmpint (rg_fluid_kind_from_id ("brine", &k, &err), ==,
                   RG_ERR_NOT_FOUND);
  g_assert_nonnull (strstr (err.text, "'brine'"));
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_FLUID));
  g_assert_cmpint (rg_fluid_kind_from_id (NULL, &k, &err), ==,
                   RG_ERR_NOT_FOUND);
}

int
main (int argc, char *argv[])
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/fluid/init", test_init);
  g_test_add_func ("/fluid/water", test_water);
  g_test_add_func ("/fluid/custom", test_custom);
  g_test_add_func ("/fluid/custom/errors", test_custom_errors);
  g_test_add_func ("/fluid/not-available", test_dispatch);
  g_test_add_func ("/fluid/kind-ids", test_kind_ids);
  g_test_add_func ("/fluid/subjects-behind", test_subjects_behind);
  return g_test_run ();
}
