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

/* Plausibility bounds of a custom fluid's density and dynamic viscosity,
 * so that a unit slip (g/cm³ typed as kg/m³, cP as Pa·s) is caught at
 * entry:
 *   density 0.01 … 25 000 kg/m³ — Common practice (no single source): a
 *     gas near vacuum is about 0.01 kg/m³, mercury 13 546 kg/m³;
 *   viscosity 1e-6 … 1e5 Pa·s — Common practice (no single source): the
 *     least viscous gases (hydrogen) are near 9e-6 Pa·s, pumped heavy
 *     residues and bitumens stay well below 1e5 Pa·s. */
#define RG_FLUID_CUSTOM_DENSITY_MIN_KG_M3 0.01
#define RG_FLUID_CUSTOM_DENSITY_MAX_KG_M3 25000.0
#define RG_FLUID_CUSTOM_VISCOSITY_MIN_PA_S 1.0e-6
#define RG_FLUID_CUSTOM_VISCOSITY_MAX_PA_S 1.0e5

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

/* The one home of the defaults of every kind (fluid.c). */
void rg_fluid_spec_init (RgFluidSpec *spec, RgFluidKind kind);
RgStatus rg_fluid_properties (const RgFluidSpec *spec, RgFluidProps *out,
                              RgWarnings *warnings, RgError *err);

/* "water", "custom", "seawater", "oil", "air" */
const char *rg_fluid_kind_id (RgFluidKind kind);
RgStatus rg_fluid_kind_from_id (const char *id, RgFluidKind *kind, RgError *err);

/* The inputs behind a fluid's density and viscosity: RG_SUBJECT_DENSITY
 * and RG_SUBJECT_VISCOSITY for a custom fluid; the temperature and the
 * other state for the others (water and air: the pressure; seawater: the
 * salinity; oil: its data).  0 for an unknown kind. */
RgSubjects rg_fluid_property_subjects (RgFluidKind kind);

/* The subjects of an error of a computation that took a fluid's density
 * and viscosity as numbers (rg_line_evaluate names RG_SUBJECT_DENSITY and
 * RG_SUBJECT_VISCOSITY), with those two replaced by the inputs behind them
 * for a fluid of `kind` (rg_fluid_property_subjects): for the caller that
 * knows the fluid. */
RgSubjects rg_fluid_subjects_behind (RgFluidKind kind, RgSubjects subjects);
