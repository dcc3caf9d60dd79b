/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Seawater density and viscosity: Sharqawy, Lienhard and Zubair (2010),
 * Desalination and Water Treatment 16, 354–380. */
#pragma once

#include "fluid.h"
#include "status.h"

/* The range where both correlations hold (Sharqawy et al. 2010: density
 * eq. (8) 0–180 °C, 0–0.16 kg/kg; viscosity eq. (22) 0–180 °C,
 * 0–0.15 kg/kg): the narrower of the two. */
#define RG_SEAWATER_T_MIN_K 273.15
#define RG_SEAWATER_T_MAX_K 453.15
#define RG_SEAWATER_S_MAX_KG_KG 0.15

/* Density at 0.1 MPa (eq. 8); t in K, salinity in kg of salt per kg. */
RgStatus rg_seawater_density (double t_k, double salinity_kg_kg,
                              double *density_kg_m3, RgError *err);
/* Dynamic viscosity (eq. 22 with the pure-water eq. 23). */
RgStatus rg_seawater_viscosity (double t_k, double salinity_kg_kg,
                                double *viscosity_pa_s, RgError *err);
/* Both, and the kinematic viscosity. */
RgStatus rg_seawater_properties (double t_k, double salinity_kg_kg,
                                 RgFluidProps *out, RgError *err);
