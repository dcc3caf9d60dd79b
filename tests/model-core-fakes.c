/* SPDX-License-Identifier: GPL-3.0-or-later */
/* TEST DOUBLES ONLY — not part of any program.
 *
 * Minimal stand-ins for core files that are being written on other
 * branches (fluid.c, catalog.c, fittings.c, aging.c), so that the model's
 * tests link before those arrive.  tests/meson.build compiles each section
 * only while the real src/core/<name>.c is absent.  The values here are
 * placeholders with no engineering standing: the model tests never check a
 * number produced by these doubles against a fixed expected value; they
 * compare the model's evaluation with direct calls of the same functions. */
#include <math.h>
#include <string.h>
#include <strings.h>

#include "core/aging.h"
#include "core/catalog.h"
#include "core/fittings.h"
#include "core/fluid.h"
#include "core/line.h"

#ifdef RUGOSA_FAKE_FLUID
static const char *const fake_kind_ids[RG_FLUID_N_KINDS] = {
  "water", "custom", "seawater", "oil", "air"
};

void
rg_fluid_spec_init (RgFluidSpec *spec, RgFluidKind kind)
{
  memset (spec, 0, sizeof *spec);
  spec->kind = kind;
  spec->temperature_k = 293.15;
  spec->pressure_pa = 101325.0;
}

RgStatus
rg_fluid_properties (const RgFluidSpec *spec, RgFluidProps *out,
                     RgWarnings *warnings, RgError *err)
{
  /* Test double: a constant "water-like" liquid; no temperature model. */
  switch (spec->kind)
    {
    case RG_FLUID_CUSTOM:
      out->density_kg_m3 = spec->density_kg_m3;
      out->dynamic_viscosity_pa_s = spec->viscosity_pa_s;
      break;
    case RG_FLUID_OIL:
      out->density_kg_m3 = spec->oil_density_ref_kg_m3;
      out->dynamic_viscosity_pa_s = spec->oil_nu1_m2_s * spec->oil_density_ref_kg_m3;
      break;
    case RG_FLUID_AIR:
      out->density_kg_m3 = spec->pressure_pa / (287.0 * spec->temperature_k);
      out->dynamic_viscosity_pa_s = 1.8e-5;
      break;
    case RG_FLUID_WATER:
    case RG_FLUID_SEAWATER:
    case RG_FLUID_N_KINDS:
    default:
      if (spec->temperature_k < 273.16 || spec->temperature_k > 423.15)
        return rg_error_set (err, RG_ERR_DOMAIN,
                             "The water temperature must lie between 273.16 and 423.15 K.");
      out->density_kg_m3 = 1000.0;
      out->dynamic_viscosity_pa_s = 1.0e-3;
      if (spec->temperature_k > 373.15)
        rg_warnings_add (warnings, "Test double: hot water.");
      break;
    }
  if (!(out->density_kg_m3 > 0.0) || !(out->dynamic_viscosity_pa_s > 0.0))
    return rg_error_set (err, RG_ERR_DOMAIN, "Test double: bad fluid.");
  out->kinematic_viscosity_m2_s = out->dynamic_viscosity_pa_s / out->density_kg_m3;
  return RG_OK;
}

const char *
rg_fluid_kind_id (RgFluidKind kind)
{
  return kind < RG_FLUID_N_KINDS ? fake_kind_ids[kind] : "water";
}

RgStatus
rg_fluid_kind_from_id (const char *id, RgFluidKind *kind, RgError *err)
{
  for (int i = 0; i < RG_FLUID_N_KINDS; i++)
    if (strcmp (id, fake_kind_ids[i]) == 0)
      {
        *kind = (RgFluidKind) i;
        return RG_OK;
      }
  return rg_error_set (err, RG_ERR_NOT_FOUND,
                       "Unknown fluid \"%s\": use water, custom, seawater, oil or air.",
                       id);
}
#endif

#ifdef RUGOSA_FAKE_CATALOG
static const RgMaterial fake_materials[] = {
  { "commercial-steel", "Test double steel", 4.5e-5, 3e-5, 9e-5, "test double" },
  { "polyethylene", "Test double PE", 7e-6, 1.5e-6, 2e-5, "test double" },
  { "cast-iron", "Test double cast iron", 2.6e-4, 1e-4, 5e-4, "test double" },
};

static const RgPipe fake_pipes[] = {
  { "NPS 4 Sch 40", "test double", "4", "40", "commercial-steel", 0.1143, 0.00602, 0.10226, "test double" },
  { "NPS 6 Sch 40", "test double", "6", "40", "commercial-steel", 0.1683, 0.00711, 0.15408, "test double" },
  { "PE100 DN 160 SDR 11", "test double", "DN 160", "SDR 11", "polyethylene", 0.160, 0.0146, 0.1308, "test double" },
  { "PE100 DN 200 SDR 11", "test double", "DN 200", "SDR 11", "polyethylene", 0.200, 0.0182, 0.1636, "test double" },
};

int rg_material_count (void) { return (int) (sizeof fake_materials / sizeof fake_materials[0]); }
const RgMaterial *rg_material_at (int i) { return &fake_materials[i]; }

RgStatus
rg_material_lookup (const char *name, const RgMaterial **out, RgError *err)
{
  for (int i = 0; i < rg_material_count (); i++)
    if (strcasecmp (name, fake_materials[i].id) == 0)
      {
        *out = &fake_materials[i];
        return RG_OK;
      }
  return rg_error_set (err, RG_ERR_NOT_FOUND, "Unknown material \"%s\".", name);
}

int rg_pipe_count (void) { return (int) (sizeof fake_pipes / sizeof fake_pipes[0]); }
const RgPipe *rg_pipe_at (int i) { return &fake_pipes[i]; }

RgStatus
rg_pipe_lookup (const char *designation, const RgPipe **out, RgError *err)
{
  for (int i = 0; i < rg_pipe_count (); i++)
    if (strcasecmp (designation, fake_pipes[i].designation) == 0)
      {
        *out = &fake_pipes[i];
        return RG_OK;
      }
  return rg_error_set (err, RG_ERR_NOT_FOUND, "Unknown pipe \"%s\".", designation);
}
#endif

#ifdef RUGOSA_FAKE_FITTINGS
static const RgFitting fake_fittings[] = {
  { "elbow-90-standard", "Test double elbow", 800.0, 0.14, 4.0, "test double" },
  { "gate-valve-open", "Test double valve", 300.0, 0.037, 3.9, "test double" },
};

int rg_fitting_count (void) { return 2; }
const RgFitting *rg_fitting_at (int i) { return &fake_fittings[i]; }

RgStatus
rg_fitting_lookup (const char *id, const RgFitting **out, RgError *err)
{
  for (int i = 0; i < 2; i++)
    if (strcmp (id, fake_fittings[i].id) == 0)
      {
        *out = &fake_fittings[i];
        return RG_OK;
      }
  return rg_error_set (err, RG_ERR_NOT_FOUND, "Unknown fitting \"%s\".", id);
}

RgStatus
rg_fitting_k (const RgFitting *f, double re, double d, double *k, RgError *err)
{
  if (!(re > 0.0) || !(d > 0.0))
    return rg_error_set (err, RG_ERR_DOMAIN, "Test double: bad fitting input.");
  *k = f->k1 / re + f->ki * (1.0 + f->kd / pow (d / 0.0254, 0.3));
  return RG_OK;
}

RgStatus
rg_fittings_k_sum (const RgFittingUse *uses, int n, double re, double d,
                   double *k_sum, RgError *err)
{
  double sum = 0.0, k = 0.0;

  for (int i = 0; i < n; i++)
    {
      if (uses[i].fitting == NULL)
        k = uses[i].k_plain;
      else if (rg_fitting_k (uses[i].fitting, re, d, &k, err) != RG_OK)
        return err ? err->status : RG_ERR_DOMAIN;
      sum += uses[i].count * k;
    }
  *k_sum = sum;
  return RG_OK;
}
#endif

#ifdef RUGOSA_FAKE_AGING
static const RgAgingClass fake_classes[] = {
  { "moderate", "Test double class", 1.0e-4, "test double" },
};

int rg_aging_class_count (void) { return 1; }
const RgAgingClass *rg_aging_class_at (int i) { return &fake_classes[i]; }

RgStatus
rg_aging_class_lookup (const char *id, const RgAgingClass **out, RgError *err)
{
  if (strcmp (id, fake_classes[0].id) == 0)
    {
      *out = &fake_classes[0];
      return RG_OK;
    }
  return rg_error_set (err, RG_ERR_NOT_FOUND, "Unknown aging class \"%s\".", id);
}

RgStatus
rg_aging_roughness (double e0, double rate, double age, double *e, RgError *err)
{
  if (!(e0 >= 0.0) || !(rate >= 0.0) || !(age >= 0.0))
    return rg_error_set (err, RG_ERR_DOMAIN, "Test double: bad aging input.");
  *e = e0 + rate * age;
  return RG_OK;
}

RgStatus
rg_aging_evaluate (const RgLineInput *in, double rate, double age,
                   RgAgingResult *out, RgError *err)
{
  RgLineInput aged = *in;
  RgStatus st;

  if ((st = rg_aging_roughness (in->roughness_m, rate, age, &aged.roughness_m, err)))
    return st;
  if ((st = rg_line_evaluate (in, &out->result_new, err)))
    return st;
  if ((st = rg_line_evaluate (&aged, &out->result, err)))
    return st;
  out->roughness_m = aged.roughness_m;
  out->head_loss_ratio_to_new = out->result.head_loss_total_m
                                / out->result_new.head_loss_total_m;
  out->head_loss_rate_m_per_year = 0.0;
  return RG_OK;
}
#endif
