/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The bare formulas behind water.c, without range checks, so that tests can
 * reproduce the standards' verification tables, several of whose points lie
 * outside the range Rugosa accepts (e.g. IF97 Table 5 at 80 MPa, R12-08
 * Table 4 at 1200 kg/m³).  Not for use outside water.c and tests. */
#pragma once

/* Specific volume in m³/kg from IAPWS-IF97 region 1 (eq. 7, Table 2),
 * T in K, p in Pa.  Meaningful for 273.15 K ≤ T ≤ 623.15 K and
 * p_sat(T) ≤ p ≤ 100 MPa; no check is made. */
double rg_water_region1_volume_unchecked (double t_k, double p_pa);

/* Viscosity in Pa·s from IAPWS R12-08 eqs. (10)–(12) with μ2 = 1; T in K,
 * rho in kg/m³ (> 0).  No check is made. */
double rg_water_viscosity_unchecked (double t_k, double rho);
