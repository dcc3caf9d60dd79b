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

/* Where the core computes the oil model (sources in oil.c). */
#define RG_OIL_T_MIN_K 200.0
#define RG_OIL_T_MAX_K 600.0
#define RG_OIL_NU_MIN_M2_S 2.0e-6        /* 2 cSt: lower limit of the D341 form used */
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
