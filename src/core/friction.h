/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Darcy friction factor: laminar, Colebrook and the explicit correlations.
 * All arguments are dimensionless: Reynolds number `re` and relative
 * roughness `rr` = ε/D.  The functions never return NaN: outside their
 * domain they return RG_ERR_DOMAIN with a sentence in `err`. */
#pragma once

#include "status.h"

typedef enum {
  RG_FRICTION_COLEBROOK = 0,
  RG_FRICTION_HAALAND,
  RG_FRICTION_SWAMEE_JAIN,
  RG_FRICTION_CHURCHILL,
  RG_FRICTION_N_MODELS
} RgFrictionModel;

/* Domain accepted by the turbulent correlations (the accuracy statements in
 * friction.c say where each is *valid*; this is where it is *computed*). */
#define RG_FRICTION_RE_MIN 1.0e3
#define RG_FRICTION_RE_MAX 1.0e10
#define RG_FRICTION_RR_MAX 0.1

/* Laminar (Hagen–Poiseuille) f = 64/Re, for 0 < re (down to 64/DBL_MAX). */
RgStatus rg_friction_laminar (double re, double *f, RgError *err);

/* Colebrook (1939), solved to a relative error ≤ 1e-13 in a fixed number of
 * steps. */
RgStatus rg_friction_colebrook (double re, double rr, double *f, RgError *err);

/* Explicit correlations. */
RgStatus rg_friction_haaland (double re, double rr, double *f, RgError *err);
RgStatus rg_friction_swamee_jain (double re, double rr, double *f, RgError *err);
/* Churchill (1977): valid in all regimes, so it accepts any 0 < re. */
RgStatus rg_friction_churchill (double re, double rr, double *f, RgError *err);

/* The turbulent (design) value of the chosen model. */
RgStatus rg_friction_model (RgFrictionModel model, double re, double rr,
                            double *f, RgError *err);

/* ∂ln f / ∂ln(ε/D) of the Colebrook equation, by implicit differentiation;
 * 0 for a smooth pipe, below 0.554 over the computed domain. */
RgStatus rg_friction_roughness_elasticity (double re, double rr,
                                           double *elasticity, RgError *err);

/* "colebrook", "haaland", "swamee-jain", "churchill" */
const char *rg_friction_model_id (RgFrictionModel model);
/* "Colebrook (1939)", … for people */
const char *rg_friction_model_title (RgFrictionModel model);
RgStatus rg_friction_model_from_id (const char *id, RgFrictionModel *model,
                                    RgError *err);
