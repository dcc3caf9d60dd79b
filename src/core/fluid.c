/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Fluids: state in, density and viscosity out.
 *
 * Water: water.c (IAPWS-IF97 region 1 density, IAPWS R12-08 viscosity),
 *   at spec->temperature_k and spec->pressure_pa (absolute).
 * Custom: the density and dynamic viscosity given, checked against broad
 *   plausibility bounds so that a unit slip (g/cm³ typed as kg/m³, cP as
 *   Pa·s) is caught at entry:
 *     density 0.01 … 25 000 kg/m³ — Common practice (no single source): a
 *       gas near vacuum is about 0.01 kg/m³, mercury 13 546 kg/m³;
 *     viscosity 1e-6 … 1e5 Pa·s — Common practice (no single source): the
 *       least viscous gases (hydrogen) are near 9e-6 Pa·s, pumped heavy
 *       residues and bitumens stay well below 1e5 Pa·s.
 *   The kinematic viscosity is μ/ρ.
 * Seawater, oil and air live in their own files (seawater.c, oil.c, air.c);
 *   this file maps the shared RgFluidSpec onto them.
 *
 * rg_fluid_spec_init gives every kind a usable state: 293.15 K (20 °C) and
 * 101 325 Pa absolute (one standard atmosphere).  A pressure of 0 is not
 * taken to mean "default": it is refused like any other impossible value. */
#include "fluid.h"

#include "air.h"
#include "oil.h"
#include "seawater.h"
#include "water.h"

#include <math.h>
#include <string.h>

static const double DEFAULT_T_K = 293.15;   /* 20 °C */
static const double DEFAULT_P_PA = 101325.0; /* 1 atm, NIST SP 811 B.8 */

static const double CUSTOM_RHO_MIN = 0.01;
static const double CUSTOM_RHO_MAX = 25000.0;
static const double CUSTOM_MU_MIN = 1.0e-6;
static const double CUSTOM_MU_MAX = 1.0e5;

static const char *const KIND_ID[RG_FLUID_N_KINDS] = {
  [RG_FLUID_WATER] = "water",
  [RG_FLUID_CUSTOM] = "custom",
  [RG_FLUID_SEAWATER] = "seawater",
  [RG_FLUID_OIL] = "oil",
  [RG_FLUID_AIR] = "air",
};

void
rg_fluid_spec_init (RgFluidSpec *spec, RgFluidKind kind)
{
  memset (spec, 0, sizeof *spec);
  spec->kind = kind;
  spec->temperature_k = DEFAULT_T_K;
  spec->pressure_pa = DEFAULT_P_PA;
  /* Common practice (no single source): standard seawater is taken at an
   * absolute salinity of 35 g/kg. */
  spec->salinity_kg_kg = 0.035;
  /* Common practice (no single source): a mineral oil of ISO VG 46 (ISO 3448
   * midpoint 46 mm²/s at 40 °C), about 6.8 mm²/s at 100 °C for a viscosity
   * index near 100, 870 kg/m³ at 15 °C, β = 0.00064 per K.  A starting point
   * to be replaced by the oil's data sheet. */
  spec->oil_t1_k = 313.15;
  spec->oil_nu1_m2_s = 46.0e-6;
  spec->oil_t2_k = 373.15;
  spec->oil_nu2_m2_s = 6.8e-6;
  spec->oil_density_ref_kg_m3 = 870.0;
  spec->oil_t_ref_k = 288.15;
  spec->oil_expansion_per_k = 0.00064;
}

const char *
rg_fluid_kind_id (RgFluidKind kind)
{
  if ((int) kind < 0 || kind >= RG_FLUID_N_KINDS)
    return NULL;
  return KIND_ID[kind];
}

RgStatus
rg_fluid_kind_from_id (const char *id, RgFluidKind *kind, RgError *err)
{
  if (id != NULL)
    for (int k = 0; k < RG_FLUID_N_KINDS; k++)
      if (strcmp (id, KIND_ID[k]) == 0)
        {
          *kind = (RgFluidKind) k;
          return RG_OK;
        }
  return rg_error_set (err, RG_ERR_NOT_FOUND,
                       "Unknown fluid '%.40s': use water, custom, seawater, "
                       "oil or air.", id != NULL ? id : "");
}

static RgStatus
custom_properties (const RgFluidSpec *spec, RgFluidProps *out, RgError *err)
{
  double rho = spec->density_kg_m3;
  double mu = spec->viscosity_pa_s;

  if (!isfinite (rho) || rho < CUSTOM_RHO_MIN || rho > CUSTOM_RHO_MAX)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The custom fluid's density must lie between %g and "
                         "%g kg/m³ (plausible fluids), not %g kg/m³.",
                         CUSTOM_RHO_MIN, CUSTOM_RHO_MAX, rho);
  if (!isfinite (mu) || mu < CUSTOM_MU_MIN || mu > CUSTOM_MU_MAX)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The custom fluid's dynamic viscosity must lie "
                         "between %g and %g Pa·s (plausible fluids), not "
                         "%g Pa·s.", CUSTOM_MU_MIN, CUSTOM_MU_MAX, mu);
  out->density_kg_m3 = rho;
  out->dynamic_viscosity_pa_s = mu;
  out->kinematic_viscosity_m2_s = mu / rho;
  return RG_OK;
}

static RgStatus
water_properties (const RgFluidSpec *spec, RgFluidProps *out, RgError *err)
{
  double rho, mu;
  RgStatus st = rg_water_properties (spec->temperature_k, spec->pressure_pa,
                                     &rho, &mu, err);

  if (st != RG_OK)
    return st;
  out->density_kg_m3 = rho;
  out->dynamic_viscosity_pa_s = mu;
  out->kinematic_viscosity_m2_s = mu / rho;
  return RG_OK;
}

/* The seawater correlations hold for the liquid only, and they do not take
 * the pressure.  Dissolved salt lowers the vapour pressure a little (about
 * 2 % at 35 g/kg, Raoult's law with the salt's mole fraction), so pure
 * water's saturation pressure (IAPWS-IF97 region 4) is a slightly cautious
 * boiling limit: seawater is refused where pure water would boil. */
static RgStatus
seawater_liquid (const RgFluidSpec *spec, RgError *err)
{
  double p_sat;

  if (!isfinite (spec->pressure_pa) || spec->pressure_pa <= 0.0)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The pressure must be a positive absolute pressure (Pa).");
  if (!isfinite (spec->temperature_k) || spec->temperature_k < 273.15
      || spec->temperature_k > 647.0)
    return RG_OK; /* the seawater model reports its own temperature range */
  if (rg_water_saturation_pressure (spec->temperature_k, &p_sat, NULL) == RG_OK
      && spec->pressure_pa < p_sat)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "At %.4g °C seawater boils below about %.4g kPa: raise the pressure (absolute) or lower the temperature.",
                         spec->temperature_k - 273.15, p_sat / 1000.0);
  return RG_OK;
}

RgStatus
rg_fluid_properties (const RgFluidSpec *spec, RgFluidProps *out,
                     RgWarnings *warnings, RgError *err)
{
  RgFluidProps p = { 0 }; /* for clang-analyzer: rg_error_set never returns RG_OK */
  RgStatus st;

  if (spec == NULL || out == NULL)
    return rg_error_set (err, RG_ERR_DOMAIN, "No fluid was given.");
  switch (spec->kind)
    {
    case RG_FLUID_WATER:
      st = water_properties (spec, &p, err);
      break;
    case RG_FLUID_CUSTOM:
      st = custom_properties (spec, &p, err);
      break;
    case RG_FLUID_SEAWATER:
      st = seawater_liquid (spec, err);
      if (st == RG_OK)
        st = rg_seawater_properties (spec->temperature_k, spec->salinity_kg_kg, &p, err);
      break;
    case RG_FLUID_OIL:
      {
        const RgOilSpec oil = {
          .t1_k = spec->oil_t1_k, .nu1_m2_s = spec->oil_nu1_m2_s,
          .t2_k = spec->oil_t2_k, .nu2_m2_s = spec->oil_nu2_m2_s,
          .density_ref_kg_m3 = spec->oil_density_ref_kg_m3,
          .t_ref_k = spec->oil_t_ref_k,
          .expansion_per_k = spec->oil_expansion_per_k,
        };
        st = rg_oil_properties (&oil, spec->temperature_k, &p, warnings, err);
      }
      break;
    case RG_FLUID_AIR:
      st = rg_air_properties (spec->temperature_k, spec->pressure_pa, &p, warnings, err);
      break;
    case RG_FLUID_N_KINDS:
    default:
      return rg_error_set (err, RG_ERR_DOMAIN,
                           "Unknown fluid kind %d.", (int) spec->kind);
    }
  if (st != RG_OK)
    return st;
  if (!isfinite (p.kinematic_viscosity_m2_s))
    return rg_error_set (err, RG_ERR_NUMERIC,
                         "The kinematic viscosity could not be computed.");
  *out = p;
  return RG_OK;
}
