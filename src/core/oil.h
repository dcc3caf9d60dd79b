/* SPDX-License-Identifier: GPL-3.0-or-later */
/* A petroleum oil given by two kinematic viscosities (ASTM D341) and a
 * reference density with a thermal expansion coefficient. */
#pragma once

#include "fluid.h"
#include "status.h"

typedef struct {
  double t1_k, nu1_m2_s;       /* first point: temperature, kinematic viscosity */
  double t2_k, nu2_m2_s;       /* second point */
  double density_ref_kg_m3;    /* density at t_ref_k */
  double t_ref_k;
  double expansion_per_k;      /* volumetric thermal expansion coefficient β */
} RgOilSpec;

/* Where the core computes the oil model.
 * Temperatures (the two points, the reference and the line's): 200–600 K
 * covers liquid petroleum products from pour point to initial boiling
 * point (common practice, no single source). */
#define RG_OIL_T_MIN_K 200.0
#define RG_OIL_T_MAX_K 600.0
/* The two points must lie at least this far apart, or B of ASTM D341 is
 * lost in rounding (our choice). */
#define RG_OIL_T_DIFF_MIN_K 1.0
/* Kinematic viscosities of the two points: 2 cSt is the lower limit of the
 * D341 form used (oil.c); 1e6 cSt (1 m²/s) lies above any pumped oil
 * (common practice, no single source). */
#define RG_OIL_NU_MIN_M2_S 2.0e-6
#define RG_OIL_NU_MAX_M2_S 1.0
/* Reference density: light naphthas are near 650 kg/m³, heavy residues
 * near 1050 kg/m³; 500–1200 kg/m³ leaves a margin and catches a unit slip
 * (common practice, no single source). */
#define RG_OIL_DENSITY_MIN_KG_M3 500.0
#define RG_OIL_DENSITY_MAX_KG_M3 1200.0
/* Volumetric expansion coefficient β: mineral oils are near 6.4e-4 to
 * 7.5e-4 1/K (common practice, no single source); up to 2e-3 1/K, which
 * with |T − Tref| ≤ 400 K keeps 1 + β·ΔT ≥ 0.2 (oil.c). */
#define RG_OIL_EXPANSION_MIN_PER_K 0.0
#define RG_OIL_EXPANSION_MAX_PER_K 2.0e-3

RgStatus rg_oil_check (const RgOilSpec *spec, RgError *err);
/* ASTM D341 interpolation (or extrapolation, with a warning). */
RgStatus rg_oil_kinematic_viscosity (const RgOilSpec *spec, double t_k,
                                     double *nu_m2_s, RgWarnings *warnings,
                                     RgError *err);
/* ρ(T) = ρref / (1 + β·(T − Tref)). */
RgStatus rg_oil_density (const RgOilSpec *spec, double t_k,
                         double *density_kg_m3, RgError *err);
RgStatus rg_oil_properties (const RgOilSpec *spec, double t_k,
                            RgFluidProps *out, RgWarnings *warnings,
                            RgError *err);
