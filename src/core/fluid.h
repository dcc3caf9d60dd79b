/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Fluids: state in, density and viscosity out. */
#pragma once

#include "status.h"

typedef enum {
  RG_FLUID_WATER = 0, /* IAPWS-IF97 region 1 density, IAPWS 2008 viscosity */
  RG_FLUID_CUSTOM,    /* density and viscosity given */
  RG_FLUID_SEAWATER,  /* Sharqawy, Lienhard and Zubair (2010) */
  RG_FLUID_OIL,       /* ASTM D341 viscosity, linear thermal expansion */
  RG_FLUID_AIR,       /* ideal gas, Sutherland viscosity */
  RG_FLUID_N_KINDS
} RgFluidKind;

typedef struct {
  RgFluidKind kind;
  double temperature_k;
  double pressure_pa;        /* absolute */
  double salinity_kg_kg;     /* seawater */
  /* custom */
  double density_kg_m3;
  double viscosity_pa_s;     /* dynamic; a kinematic input is converted at entry */
  /* oil: two kinematic viscosities at two temperatures, a reference density */
  double oil_t1_k, oil_nu1_m2_s, oil_t2_k, oil_nu2_m2_s;
  double oil_density_ref_kg_m3, oil_t_ref_k, oil_expansion_per_k;
} RgFluidSpec;

typedef struct {
  double density_kg_m3;
  double dynamic_viscosity_pa_s;
  double kinematic_viscosity_m2_s;
} RgFluidProps;

void rg_fluid_spec_init (RgFluidSpec *spec, RgFluidKind kind);
RgStatus rg_fluid_properties (const RgFluidSpec *spec, RgFluidProps *out,
                              RgWarnings *warnings, RgError *err);

/* "water", "custom", "seawater", "oil", "air" */
const char *rg_fluid_kind_id (RgFluidKind kind);
RgStatus rg_fluid_kind_from_id (const char *id, RgFluidKind *kind, RgError *err);
