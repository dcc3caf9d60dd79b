/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Darcy friction factor.
 *
 * Laminar: f = 64/Re (Hagen–Poiseuille).
 *
 * Colebrook (1939):  1/√f = −2·log10( (ε/D)/3.7 + 2.51/(Re·√f) ).
 *   Method (Clamond 2009, "Efficient resolution of the Colebrook equation",
 *   Ind. Eng. Chem. Res. 48(7), 3665–3671): with a = ln(10)/2 and
 *   F = a/√f the equation becomes   ln(X1 + F) + F − X2 = 0,
 *   X1 = (ε/D)·Re·a/(3.7·2.51),  X2 = ln(Re·a/2.51).
 *   From F0 = X2 − 0.2 two steps of a third-order (Householder-type)
 *   correction reach double precision; there is no open-ended loop.
 *   Cost: three logarithms.
 *
 * Explicit correlations:
 *   Haaland (1983), J. Fluids Eng. 105(1), 89–90, eq. (10).
 *   Swamee and Jain (1976), J. Hydraulics Div. ASCE 102(HY5), 657–664.
 *   Churchill (1977), Chem. Eng. 84(24), 91–92: all regimes.
 *
 * Special cases: ε/D = 0 is allowed (smooth pipe) everywhere; arguments
 * outside the computed domain (friction.h) return RG_ERR_DOMAIN. */
#include "friction.h"

#include <math.h>
#include <string.h>

/* ln(10)/2 */
static const double HALF_LN10 = 1.151292546497022842008995727342182103801;

static RgStatus
check_turbulent_args (const char *who, double re, double rr, RgError *err)
{
  if (!isfinite (re) || re < RG_FRICTION_RE_MIN || re > RG_FRICTION_RE_MAX)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "%s: the Reynolds number must lie between %g and %g.",
                         who, RG_FRICTION_RE_MIN, RG_FRICTION_RE_MAX);
  if (!isfinite (rr) || rr < 0.0 || rr > RG_FRICTION_RR_MAX)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "%s: the relative roughness must lie between 0 and %g.",
                         who, RG_FRICTION_RR_MAX);
  return RG_OK;
}

static RgStatus
finish (const char *who, double f, double *out, RgError *err)
{
  if (!isfinite (f) || f <= 0.0)
    return rg_error_set (err, RG_ERR_NUMERIC,
                         "%s: the friction factor could not be computed.", who);
  *out = f;
  return RG_OK;
}

RgStatus
rg_friction_laminar (double re, double *f, RgError *err)
{
  if (!isfinite (re) || re <= 0.0)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "Laminar friction: the Reynolds number must be a positive number.");
  return finish ("Laminar friction", 64.0 / re, f, err);
}

RgStatus
rg_friction_colebrook (double re, double rr, double *f, RgError *err)
{
  RgStatus st = check_turbulent_args ("Colebrook", re, rr, err);
  if (st != RG_OK)
    return st;

  /* a/(3.7·2.51) and ln(a/2.51) */
  const double x1 = rr * re * 0.1239681863354175460160858261654858382699;
  const double x2 = log (re) - 0.7793974884556819406441139701653776731705;
  double F = x2 - 0.2;

  for (int step = 0; step < 2; step++)
    {
      const double x1f = x1 + F;
      const double x1f1 = 1.0 + x1f;
      const double e = (log (x1f) + F - x2) / x1f1;
      F -= (x1f1 + 0.5 * e) * e * x1f / (x1f1 + e * (1.0 + e / 3.0));
    }

  const double inv = HALF_LN10 / F;
  return finish ("Colebrook", inv * inv, f, err);
}

RgStatus
rg_friction_haaland (double re, double rr, double *f, RgError *err)
{
  RgStatus st = check_turbulent_args ("Haaland", re, rr, err);
  if (st != RG_OK)
    return st;
  /* 1/√f = −1.8·log10[ (ε/D/3.7)^1.11 + 6.9/Re ] */
  const double x = -1.8 * log10 (pow (rr / 3.7, 1.11) + 6.9 / re);
  return finish ("Haaland", 1.0 / (x * x), f, err);
}

RgStatus
rg_friction_swamee_jain (double re, double rr, double *f, RgError *err)
{
  RgStatus st = check_turbulent_args ("Swamee–Jain", re, rr, err);
  if (st != RG_OK)
    return st;
  /* f = 0.25 / [log10(ε/D/3.7 + 5.74/Re^0.9)]² */
  const double l = log10 (rr / 3.7 + 5.74 / pow (re, 0.9));
  return finish ("Swamee–Jain", 0.25 / (l * l), f, err);
}

RgStatus
rg_friction_churchill (double re, double rr, double *f, RgError *err)
{
  if (!isfinite (re) || re <= 0.0 || re > RG_FRICTION_RE_MAX)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "Churchill: the Reynolds number must lie between 0 and %g.",
                         RG_FRICTION_RE_MAX);
  if (!isfinite (rr) || rr < 0.0 || rr > RG_FRICTION_RR_MAX)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "Churchill: the relative roughness must lie between 0 and %g.",
                         RG_FRICTION_RR_MAX);
  /* f = 8·[ (8/Re)^12 + (A + B)^(−3/2) ]^(1/12),
   * A = [2.457·ln(1/((7/Re)^0.9 + 0.27ε/D))]^16, B = (37530/Re)^16.
   * Powers of 16 overflow at small Re: work with logarithms. */
  const double inner = pow (7.0 / re, 0.9) + 0.27 * rr;
  /* the base is squared away by the even power: fabs keeps small Re defined */
  const double la = 16.0 * log (fabs (2.457 * log (1.0 / inner)));
  const double lb = 16.0 * log (37530.0 / re);
  const double lmax = fmax (la, lb);
  const double lab = lmax + log (exp (la - lmax) + exp (lb - lmax));
  /* (A+B)^(-3/2) */
  const double t2 = exp (-1.5 * lab);
  const double t1 = pow (8.0 / re, 12.0);
  return finish ("Churchill", 8.0 * pow (t1 + t2, 1.0 / 12.0), f, err);
}

RgStatus
rg_friction_model (RgFrictionModel model, double re, double rr, double *f,
                   RgError *err)
{
  switch (model)
    {
    case RG_FRICTION_COLEBROOK:
      return rg_friction_colebrook (re, rr, f, err);
    case RG_FRICTION_HAALAND:
      return rg_friction_haaland (re, rr, f, err);
    case RG_FRICTION_SWAMEE_JAIN:
      return rg_friction_swamee_jain (re, rr, f, err);
    case RG_FRICTION_CHURCHILL:
      return rg_friction_churchill (re, rr, f, err);
    case RG_FRICTION_N_MODELS:
    default:
      return rg_error_set (err, RG_ERR_DOMAIN, "Unknown friction model.");
    }
}

RgStatus
rg_friction_roughness_elasticity (double re, double rr, double *elasticity,
                                  RgError *err)
{
  double f;
  RgStatus st = rg_friction_colebrook (re, rr, &f, err);
  if (st != RG_OK)
    return st;
  /* x = 1/√f = −c·ln(u), u = rr/3.7 + 2.51x/Re, c = 2/ln10.
   * ∂x/∂rr = −(c/(3.7u)) / (1 + 2.51c/(Re·u));  ∂ln f/∂ln rr = −2(rr/x)·∂x/∂rr */
  const double c = 2.0 / log (10.0);
  const double x = 1.0 / sqrt (f);
  const double u = rr / 3.7 + 2.51 * x / re;
  const double dxdrr = -(c / (3.7 * u)) / (1.0 + 2.51 * c / (re * u));
  const double e = -2.0 * rr / x * dxdrr;
  if (!isfinite (e))
    return rg_error_set (err, RG_ERR_NUMERIC,
                         "The roughness elasticity could not be computed.");
  *elasticity = e;
  return RG_OK;
}

static const struct
{
  const char *id;
  const char *title;
} model_names[RG_FRICTION_N_MODELS] = {
  [RG_FRICTION_COLEBROOK] = { "colebrook", "Colebrook (1939)" },
  [RG_FRICTION_HAALAND] = { "haaland", "Haaland (1983)" },
  [RG_FRICTION_SWAMEE_JAIN] = { "swamee-jain", "Swamee–Jain (1976)" },
  [RG_FRICTION_CHURCHILL] = { "churchill", "Churchill (1977)" },
};

const char *
rg_friction_model_id (RgFrictionModel model)
{
  return (unsigned) model < RG_FRICTION_N_MODELS ? model_names[model].id : "unknown";
}

const char *
rg_friction_model_title (RgFrictionModel model)
{
  return (unsigned) model < RG_FRICTION_N_MODELS ? model_names[model].title : "unknown";
}

RgStatus
rg_friction_model_from_id (const char *id, RgFrictionModel *model, RgError *err)
{
  for (int i = 0; i < RG_FRICTION_N_MODELS && id != NULL; i++)
    if (strcmp (id, model_names[i].id) == 0)
      {
        *model = (RgFrictionModel) i;
        return RG_OK;
      }
  return rg_error_set (err, RG_ERR_PARSE,
                       "Unknown friction model \"%s\"; use colebrook, haaland, swamee-jain or churchill.",
                       id != NULL ? id : "");
}
