/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Fluids: state in, density and viscosity out.
 *
 * Water: water.c (IAPWS-IF97 region 1 density, IAPWS R12-08 viscosity),
 *   at spec->temperature_k and spec->pressure_pa (absolute).
 * Custom: the density and dynamic viscosity given, checked against broad
 *   plausibility bounds (RG_FLUID_CUSTOM_*, with their sources, in
 *   fluid.h) so that a unit slip is caught at entry.
 *   The kinematic viscosity is μ/ρ.
 * Seawater, oil and air live in their own files (seawater.c, oil.c, air.c);
 *   this file maps the shared RgFluidSpec onto them.
 *
 * Seawater also has its pressure checked (rg_seawater_check_state).
 *
 * rg_fluid_spec_init gives every kind a usable state: 293.15 K (20 °C) and
 * 101 325 Pa absolute (one standard atmosphere).  A pressure of 0 is not
 * taken to mean "default": it is refused like any other impossible value. */
#include "fluid.h"

#include "air.h"
#include "message-private.h"
#include "oil.h"
#include "seawater.h"
#include "water.h"

#include <math.h>
#include <string.h>

static const double DEFAULT_T_K = 293.15;   /* 20 °C */
static const double DEFAULT_P_PA = 101325.0; /* 1 atm, NIST SP 811 B.8 */

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
  return rg_error_set_on (err, RG_ERR_NOT_FOUND, RG_ON (FLUID),
                          "Unknown fluid '%.40s': use water, custom, "
                          "seawater, oil or air.", id != NULL ? id : "");
}

static RgStatus
custom_properties (const RgFluidSpec *spec, RgFluidProps *out, RgError *err)
{
  double rho = spec->density_kg_m3;
  double mu = spec->viscosity_pa_s;
  char lo[RG_VALUE_MAX], hi[RG_VALUE_MAX], v[RG_VALUE_MAX];

  if (!isfinite (rho) || rho < RG_FLUID_CUSTOM_DENSITY_MIN_KG_M3
      || rho > RG_FLUID_CUSTOM_DENSITY_MAX_KG_M3)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (DENSITY),
                            "The custom fluid's density must lie between %s "
                            "and %s (plausible fluids), not %s.",
                            RG_ERR_VALUE (err, RG_QTY_DENSITY,
                                          RG_FLUID_CUSTOM_DENSITY_MIN_KG_M3, lo),
                            RG_ERR_VALUE (err, RG_QTY_DENSITY,
                                          RG_FLUID_CUSTOM_DENSITY_MAX_KG_M3, hi),
                            RG_ERR_VALUE (err, RG_QTY_DENSITY, rho, v));
  if (!isfinite (mu) || mu < RG_FLUID_CUSTOM_VISCOSITY_MIN_PA_S
      || mu > RG_FLUID_CUSTOM_VISCOSITY_MAX_PA_S)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (VISCOSITY),
                            "The custom fluid's dynamic viscosity must lie "
                            "between %s and %s (plausible fluids), not %s.",
                            RG_ERR_VALUE (err, RG_QTY_DYN_VISCOSITY,
                                          RG_FLUID_CUSTOM_VISCOSITY_MIN_PA_S, lo),
                            RG_ERR_VALUE (err, RG_QTY_DYN_VISCOSITY,
                                          RG_FLUID_CUSTOM_VISCOSITY_MAX_PA_S, hi),
                            RG_ERR_VALUE (err, RG_QTY_DYN_VISCOSITY, mu, v));
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

RgStatus
rg_fluid_properties (const RgFluidSpec *spec, RgFluidProps *out,
                     RgWarnings *warnings, RgError *err)
{
  RgFluidProps p = { 0 }; /* for clang-analyzer: rg_error_set never returns RG_OK */
  RgStatus st;

  /* a misuse of the API: no input a user can change (subjects 0) */
  if (spec == NULL || out == NULL)
    return rg_error_set_on (err, RG_ERR_DOMAIN, 0, "No fluid was given.");
  switch (spec->kind)
    {
    case RG_FLUID_WATER:
      st = water_properties (spec, &p, err);
      break;
    case RG_FLUID_CUSTOM:
      st = custom_properties (spec, &p, err);
      break;
    case RG_FLUID_SEAWATER:
      st = rg_seawater_check_state (spec->temperature_k, spec->pressure_pa, err);
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
      return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (FLUID),
                              "Unknown fluid kind %d.", (int) spec->kind);
    }
  if (st != RG_OK)
    return st;
  if (!isfinite (p.kinematic_viscosity_m2_s))
    return rg_error_set_on (err, RG_ERR_NUMERIC,
                            rg_fluid_property_subjects (spec->kind),
                            "The kinematic viscosity could not be computed.");
  *out = p;
  return RG_OK;
}

RgSubjects
rg_fluid_property_subjects (RgFluidKind kind)
{
  switch (kind)
    {
    case RG_FLUID_WATER:
    case RG_FLUID_AIR:
      return RG_ON (TEMPERATURE) | RG_ON (PRESSURE);
    case RG_FLUID_CUSTOM:
      return RG_ON (DENSITY) | RG_ON (VISCOSITY);
    case RG_FLUID_SEAWATER:
      return RG_ON (TEMPERATURE) | RG_ON (SALINITY);
    case RG_FLUID_OIL:
      return RG_ON (TEMPERATURE) | RG_ON (OIL_T1) | RG_ON (OIL_NU1)
             | RG_ON (OIL_T2) | RG_ON (OIL_NU2) | RG_ON (OIL_DENSITY_REF)
             | RG_ON (OIL_T_REF) | RG_ON (OIL_EXPANSION);
    case RG_FLUID_N_KINDS:
    default:
      return 0;
    }
}

RgSubjects
rg_fluid_subjects_behind (RgFluidKind kind, RgSubjects subjects)
{
  const RgSubjects props = RG_ON (DENSITY) | RG_ON (VISCOSITY);

  if ((subjects & props) == 0)
    return subjects;
  return (subjects & ~props) | rg_fluid_property_subjects (kind);
}
