/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Liquid water: IAPWS-IF97 region 1 (density), region 4 (saturation
 * pressure) and IAPWS R12-08 (viscosity), 0.01–150 °C, up to 10 MPa. */
#pragma once

#include "status.h"

#define RG_WATER_T_MIN_K 273.16
#define RG_WATER_T_MAX_K 423.15
#define RG_WATER_P_MAX_PA 10.0e6
/* (the lower limit of the pressure is the saturation pressure at T) */

/* Where the saturation pressure is defined: IF97 region 4, 273.15 K to
 * the critical temperature 647.096 K (IF97 eq. 30; critical point from
 * IF97 eq. 3). */
#define RG_WATER_SATURATION_T_MIN_K 273.15
#define RG_WATER_SATURATION_T_MAX_K 647.096

/* Densities accepted by rg_water_viscosity.  Liquid water inside the range
 * above spans 917.0 kg/m³ (150 °C at saturation) to 1004.9 kg/m³ (about
 * 4 °C at 10 MPa), both from IF97 region 1; the bounds leave a margin. */
#define RG_WATER_RHO_MIN_KG_M3 900.0
#define RG_WATER_RHO_MAX_KG_M3 1010.0

/* Saturation pressure (IF97 region 4), RG_WATER_SATURATION_T_MIN_K ≤ T ≤
 * RG_WATER_SATURATION_T_MAX_K. */
RgStatus rg_water_saturation_pressure (double t_k, double *p_pa, RgError *err);

/* Density of liquid water (IF97 region 1). Errors when T or p are outside
 * the range above, or when the water would be vapour (p below saturation). */
RgStatus rg_water_density (double t_k, double p_pa, double *rho, RgError *err);

/* Dynamic viscosity, IAPWS R12-08 (industrial formulation, no critical
 * enhancement), at the density above.  T within the range above, rho within
 * RG_WATER_RHO_MIN_KG_M3 … RG_WATER_RHO_MAX_KG_M3. */
RgStatus rg_water_viscosity (double t_k, double rho, double *mu, RgError *err);

/* Both, with the same range checks. */
RgStatus rg_water_properties (double t_k, double p_pa, double *rho,
                              double *mu, RgError *err);
