/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Dry air at low pressure drop: ideal gas and Sutherland's viscosity law. */
#pragma once

#include "fluid.h"
#include "status.h"

/* Specific gas constant of dry air, J/(kg·K): ISO 2533:1975 Standard
 * Atmosphere (R* / M = 8314.32 / 28.9644), the same in the U.S. Standard
 * Atmosphere 1976. */
#define RG_AIR_R_J_KG_K 287.05287

/* Where the model is computed: Sutherland's law with these constants fits
 * within about 2 % from 170 to 1900 K (White, Viscous Fluid Flow, 3rd ed.,
 * 2006, Table 1-2); the ideal gas is kept to pressures up to 10 MPa, with a
 * warning above 1 MPa, where the compressibility factor of air leaves
 * 1 ± 0.005 (common practice, no single source; air.c). */
#define RG_AIR_T_MIN_K 170.0
#define RG_AIR_T_MAX_K 1900.0
#define RG_AIR_P_MIN_PA 100.0
#define RG_AIR_P_MAX_PA 1.0e7
#define RG_AIR_P_IDEAL_GAS_WARN_PA 1.0e6

/* Above this fraction of the inlet pressure the pressure drop makes the
 * incompressible model unreliable (Crane TP-410, 2009, p. 1-9). */
#define RG_AIR_DP_FRACTION_MAX 0.10

RgStatus rg_air_density (double t_k, double p_pa, double *density_kg_m3,
                         RgError *err);
RgStatus rg_air_viscosity (double t_k, double *viscosity_pa_s, RgError *err);
RgStatus rg_air_properties (double t_k, double p_pa, RgFluidProps *out,
                            RgWarnings *warnings, RgError *err);

/* Adds the warning sentence to `warnings` and returns 1 when |Δp| exceeds
 * 10 % of the absolute inlet pressure; returns 0 otherwise (also for
 * non-finite or non-positive arguments, which other checks report). */
int rg_air_compressibility_warning (double pressure_drop_pa,
                                    double inlet_pressure_pa,
                                    RgWarnings *warnings);
