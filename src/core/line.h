/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Line hydraulics: Darcy–Weisbach for one straight line of constant bore. */
#pragma once

#include "friction.h"
#include "regime.h"
#include "status.h"

/* Standard gravity, m/s² (CGPM 1901; ISO 80000-3). */
#define RG_GRAVITY 9.80665

typedef struct {
  double flow_m3_s;      /* > 0 */
  double diameter_m;     /* inner diameter, > 0 */
  double length_m;       /* > 0 */
  double roughness_m;    /* absolute roughness ε, ≥ 0 */
  double k_sum;          /* ΣK of fittings, ≥ 0 */
  double elevation_m;    /* outlet minus inlet */
  double density_kg_m3;  /* > 0 */
  double viscosity_pa_s; /* dynamic, > 0 */
  RgFrictionModel model;
  RgTransition transition;
} RgLineInput;

typedef struct {
  double velocity_m_s;
  double reynolds;
  double relative_roughness;
  RgFrictionPoint friction;    /* f, regime, zone, ε⁺, elasticity */
  double head_loss_major_m;    /* f·(L/D)·V²/2g */
  double head_loss_minor_m;    /* ΣK·V²/2g */
  double head_loss_total_m;    /* major + minor (energy lost; not Δz) */
  double pressure_drop_pa;     /* ρg(h_major + h_minor + Δz) */
  double gradient_m_per_100m;  /* major loss per 100 m of line */
  double wall_shear_pa;        /* τw = f·ρV²/8 */
} RgLineResult;

/* Fill `in` with defaults: no fittings, no elevation, Colebrook, 2000/4000. */
void rg_line_input_init (RgLineInput *in);

RgStatus rg_line_evaluate (const RgLineInput *in, RgLineResult *out,
                           RgError *err);

/* Inverse problems.  The flow whose total head loss (major + minor) equals
 * `head_loss_m` (in->flow_m3_s is ignored). */
RgStatus rg_line_flow_for_head_loss (const RgLineInput *in, double head_loss_m,
                                     double *flow_m3_s, RgError *err);
/* The smallest inner diameter whose total head loss does not exceed
 * `head_loss_m` at in->flow_m3_s (in->diameter_m is ignored; the roughness
 * stays absolute). */
RgStatus rg_line_diameter_for_head_loss (const RgLineInput *in,
                                         double head_loss_m,
                                         double *diameter_m, RgError *err);
