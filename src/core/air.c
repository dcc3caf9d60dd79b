/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Dry air for lines with a small pressure drop.
 *
 * Density: ideal gas, ρ = p/(R·T), R = 287.05287 J/(kg·K) (ISO 2533:1975;
 * U.S. Standard Atmosphere 1976).  The compressibility factor of air stays
 * within about 0.5 % of 1 from 250 to 1000 K below 1 MPa (common practice,
 * no single source); above 1 MPa a warning is added.
 *
 * Viscosity: Sutherland's law in the form of ISO 2533 and the U.S.
 * Standard Atmosphere 1976,
 *   μ = βs·T^(3/2) / (T + S),  βs = 1.458e-6 kg/(m·s·K^½),  S = 110.4 K,
 * independent of pressure; within about 2 % from 170 to 1900 K (White,
 * Viscous Fluid Flow, 3rd ed., 2006, Table 1-2).
 *
 * The incompressible line model holds while the pressure drop stays below
 * about 10 % of the inlet pressure (Crane TP-410, 2009, p. 1-9):
 * rg_air_compressibility_warning gives the sentence beyond that. */
#include "air.h"

#include "message-private.h"

#include <math.h>

static const double SUTHERLAND_BETA = 1.458e-6; /* kg/(m·s·K^½), ISO 2533 */
static const double SUTHERLAND_S = 110.4;       /* K, ISO 2533 */

static RgStatus
check_t (double t_k, RgError *err)
{
  char lo[RG_VALUE_MAX], hi[RG_VALUE_MAX], v[RG_VALUE_MAX];

  if (!isfinite (t_k) || t_k < RG_AIR_T_MIN_K || t_k > RG_AIR_T_MAX_K)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (TEMPERATURE),
                            "Air: the temperature must lie between %s and "
                            "%s, not %s.",
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE,
                                          RG_AIR_T_MIN_K, lo),
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE,
                                          RG_AIR_T_MAX_K, hi),
                            RG_ERR_VALUE (err, RG_QTY_TEMPERATURE, t_k, v));
  return RG_OK;
}

static RgStatus
check_p (double p_pa, RgError *err)
{
  char lo[RG_VALUE_MAX], hi[RG_VALUE_MAX], v[RG_VALUE_MAX];

  if (!isfinite (p_pa) || p_pa < RG_AIR_P_MIN_PA || p_pa > RG_AIR_P_MAX_PA)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (PRESSURE),
                            "Air: the absolute pressure must lie between %s "
                            "and %s, not %s.",
                            RG_ERR_VALUE (err, RG_QTY_PRESSURE,
                                          RG_AIR_P_MIN_PA, lo),
                            RG_ERR_VALUE (err, RG_QTY_PRESSURE,
                                          RG_AIR_P_MAX_PA, hi),
                            RG_ERR_VALUE (err, RG_QTY_PRESSURE, p_pa, v));
  return RG_OK;
}

RgStatus
rg_air_density (double t_k, double p_pa, double *density_kg_m3, RgError *err)
{
  RgStatus st;

  if ((st = check_t (t_k, err)) != RG_OK || (st = check_p (p_pa, err)) != RG_OK)
    return st;
  *density_kg_m3 = p_pa / (RG_AIR_R_J_KG_K * t_k);
  return RG_OK;
}

RgStatus
rg_air_viscosity (double t_k, double *viscosity_pa_s, RgError *err)
{
  RgStatus st;

  if ((st = check_t (t_k, err)) != RG_OK)
    return st;
  *viscosity_pa_s = SUTHERLAND_BETA * t_k * sqrt (t_k) / (t_k + SUTHERLAND_S);
  return RG_OK;
}

RgStatus
rg_air_properties (double t_k, double p_pa, RgFluidProps *out,
                   RgWarnings *warnings, RgError *err)
{
  RgStatus st;
  double rho, mu;

  if ((st = rg_air_density (t_k, p_pa, &rho, err)) != RG_OK)
    return st;
  if ((st = rg_air_viscosity (t_k, &mu, err)) != RG_OK)
    return st;
  if (warnings != NULL && p_pa > RG_AIR_P_IDEAL_GAS_WARN_PA)
    {
      char v[RG_VALUE_MAX];
      rg_warnings_add (warnings,
                       "Air: above %s the ideal-gas density may be off by "
                       "more than 0.5 %%.",
                       RG_WARN_VALUE (warnings, RG_QTY_PRESSURE,
                                      RG_AIR_P_IDEAL_GAS_WARN_PA, v));
    }
  out->density_kg_m3 = rho;
  out->dynamic_viscosity_pa_s = mu;
  out->kinematic_viscosity_m2_s = mu / rho;
  return RG_OK;
}

int
rg_air_compressibility_warning (double pressure_drop_pa,
                                double inlet_pressure_pa, RgWarnings *warnings)
{
  if (!isfinite (pressure_drop_pa) || !isfinite (inlet_pressure_pa)
      || inlet_pressure_pa <= 0.0)
    return 0;
  const double share = fabs (pressure_drop_pa) / inlet_pressure_pa;
  char dp[RG_VALUE_MAX], p[RG_VALUE_MAX];

  if (share <= RG_AIR_DP_FRACTION_MAX)
    return 0;
  rg_warnings_add (warnings,
                   "The pressure drop of %s is %.0f %% of the inlet pressure "
                   "%s, above %.0f %%: the incompressible model no longer "
                   "holds; split the line into shorter parts or use a "
                   "compressible-flow method.",
                   RG_WARN_VALUE (warnings, RG_QTY_PRESSURE,
                                  fabs (pressure_drop_pa), dp),
                   100.0 * share,
                   RG_WARN_VALUE (warnings, RG_QTY_PRESSURE,
                                  inlet_pressure_pa, p),
                   100.0 * RG_AIR_DP_FRACTION_MAX);
  return 1;
}
