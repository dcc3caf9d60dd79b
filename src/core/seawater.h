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
#define RG_SEAWATER_S_MIN_KG_KG 0.0
#define RG_SEAWATER_S_MAX_KG_KG 0.15

/* Pressure (absolute).  Sharqawy et al. (2010) give eq. (8) and eq. (22)
 * at atmospheric pressure, 0.1 MPa, and above the normal boiling
 * temperature at the saturation pressure (from memory of the paper's notes
 * on its correlations; not checked against the document): the pressure is
 * not an argument.  Below the saturation pressure the water boils and is
 * refused (rg_seawater_check_state, with pure water's IF97 saturation
 * pressure: dissolved salt lowers the vapour pressure about 2 % at
 * 35 g/kg by Raoult's law, so the limit is slightly cautious).  Above it
 * the liquid is only compressed: about 0.045 % more density per MPa (the
 * isothermal compressibility of water near 20 °C, about 4.5e-10 1/Pa, from
 * memory of IAPWS-95 property tables; not checked), so up to 10 MPa the
 * density of eq. (8) is low by at most about 0.5 % — the error accepted
 * here, and the same limit as the water model's (water.h). */
#define RG_SEAWATER_P_MAX_PA 10.0e6

/* The pressure for seawater at t_k: positive, at most RG_SEAWATER_P_MAX_PA,
 * and not below the saturation pressure (where it would boil). */
RgStatus rg_seawater_check_state (double t_k, double p_pa, RgError *err);

/* Density at 0.1 MPa (eq. 8); t in K, salinity in kg of salt per kg. */
RgStatus rg_seawater_density (double t_k, double salinity_kg_kg,
                              double *density_kg_m3, RgError *err);
/* Dynamic viscosity (eq. 22 with the pure-water eq. 23). */
RgStatus rg_seawater_viscosity (double t_k, double salinity_kg_kg,
                                double *viscosity_pa_s, RgError *err);
/* Both, and the kinematic viscosity. */
RgStatus rg_seawater_properties (double t_k, double salinity_kg_kg,
                                 RgFluidProps *out, RgError *err);
