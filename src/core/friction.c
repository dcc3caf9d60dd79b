/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Darcy friction factor.
 *
 * Laminar: f = 64/Re (Hagen–Poiseuille), any 0 < Re.
 *
 * Colebrook (1939), J. ICE 11(4), 133–156:
 *     1/√f = −2·log10( (ε/D)/3.7 + 2.51/(Re·√f) ).
 *   Method (Clamond 2009, "Efficient resolution of the Colebrook equation",
 *   Ind. Eng. Chem. Res. 48(7), 3665–3671): with a = ln(10)/2 and
 *   F = a/√f the equation becomes
 *       g(F) = ln(X1 + F) + F − X2 = 0,
 *       X1 = (ε/D)·Re·a/(3.7·2.51),  X2 = ln(Re·a/2.51).
 *   From Clamond's start F0 = X2 − 1/5, two steps of his third-order
 *   correction
 *       F ← F − (s + e/2)·e·t / (s + e·(1 + e/3)),  t = X1 + F, s = 1 + t,
 *                                                 e = g(F)/s
 *   reach double precision.  There is no loop: the cost is fixed at three
 *   logarithms and two divisions.  To save divisions (they, not the
 *   logarithms, were the largest part of the cost) each step is written
 *   over one common denominator,
 *       F ← F − N/D,  N = (3/2)·g·t·(2s² + g),  D = 3s³ + 3g·s + g²,
 *   which is the same step with e = g/s put in and both of its terms
 *   multiplied by 3s², and the last step is folded into the final
 *   division: f = a²·D²/(F·D − N)².  Measured cost (tests/bench-colebrook.c,
 *   gcc 12 -O2, x86-64): about 1.1 times that of Haaland's formula.
 *   Accuracy, measured against Newton's method in long double and against
 *   mpmath at 40 digits (tests/bench-colebrook.c,
 *   tests/crosscheck-friction.py): relative error in f below 3e-15 over the
 *   whole computed domain (Re 1e3…1e10, ε/D 0…0.1), i.e. a few units in the
 *   last place; the promise in friction.h is 1e-13.
 *
 * Explicit correlations (their stated ranges are the authors'; the
 * functions compute them over the whole domain in friction.h):
 *   Haaland (1983), J. Fluids Eng. 105(1), 89–90:
 *       1/√f = −1.8·log10[ ((ε/D)/3.7)^1.11 + 6.9/Re ];
 *       within about ±1.5 % of Colebrook for 4000 ≤ Re ≤ 1e8,
 *       1e-6 ≤ ε/D ≤ 0.05 (from memory of the paper; not checked against the
 *       document).
 *   Swamee and Jain (1976), J. Hydraulics Div. ASCE 102(HY5), 657–664:
 *       f = 0.25 / [log10( (ε/D)/3.7 + 5.74/Re^0.9 )]²;
 *       stated for 5000 ≤ Re ≤ 1e8, 1e-6 ≤ ε/D ≤ 0.01.
 *   Churchill (1977), Chem. Eng. 84(24), 91–92, all regimes:
 *       f = 8·[ (8/Re)^12 + (A + B)^(−3/2) ]^(1/12),
 *       A = [2.457·ln(1/((7/Re)^0.9 + 0.27·ε/D))]^16,  B = (37530/Re)^16;
 *       tends to 64/Re as Re → 0.  A and B overflow at small Re, so they are
 *       combined as logarithms.
 *
 * Roughness elasticity ∂ln f/∂ln(ε/D) of Colebrook, by implicit
 * differentiation: with x = 1/√f, c = 2/ln10, u = (ε/D)/3.7 + 2.51·x/Re,
 *       x = −c·ln u  ⇒  ∂ln f/∂ln(ε/D) = 2c·((ε/D)/3.7) / (x·(u + 2.51·c/Re)),
 *   0 for a smooth pipe; it rises towards the fully rough limit
 *   −2/ln((ε/D)/3.7), so it stays below 0.554 over the computed domain.
 *
 * Special cases: ε/D = 0 is allowed (smooth pipe) everywhere.  Arguments
 * outside the computed domain (friction.h), NaN and infinity return
 * RG_ERR_DOMAIN and leave the result untouched. */
#include "friction.h"

#include "message-private.h"

#include <float.h>
#include <math.h>
#include <string.h>

/* a² with a = ln(10)/2; mpmath, 40 digits */
static const double HALF_LN10_SQ = 1.325474527619599502640416597148504422899;
/* a/(3.7·2.51) and ln(a/2.51) (Clamond's X1 and X2 factors); mpmath, 40 digits */
static const double COLEBROOK_X1_FACTOR = 0.1239681863354175559393771645679102082266;
static const double COLEBROOK_X2_OFFSET = -0.7793974884556820277966214032401622986458;
/* Clamond (2009): start value F0 = X2 − 1/5 */
static const double COLEBROOK_F0_SHIFT = 0.2;
/* 2/ln(10); mpmath, 40 digits */
static const double TWO_OVER_LN10 = 0.8685889638065036553022578378332101645888;

/* Out of the hot path: which argument is wrong, as one sentence.  `who`
 * is the name of a published equation ("Colebrook", "Haaland"): a proper
 * name, the same in every language. */
static RgStatus
turbulent_domain_error (const char *who, double re, double rr, RgError *err)
{
  /* TRANSLATORS: the first %s names a published equation, e.g.
   * "Colebrook". */
  if (!(re >= RG_FRICTION_RE_MIN && re <= RG_FRICTION_RE_MAX))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (REYNOLDS),
                            "%s: the Reynolds number must be a number between %g and %g, not %g.",
                            who, RG_FRICTION_RE_MIN, RG_FRICTION_RE_MAX, re);
  /* TRANSLATORS: the first %s names a published equation, e.g.
   * "Colebrook". */
  return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (RELATIVE_ROUGHNESS),
                          "%s: the relative roughness must be a number between 0 and %g, not %g.",
                          who, RG_FRICTION_RR_MAX, rr);
}

/* One comparison chain; written so that NaN fails it. */
static inline int
turbulent_args_ok (double re, double rr)
{
  return re >= RG_FRICTION_RE_MIN && re <= RG_FRICTION_RE_MAX
         && rr >= 0.0 && rr <= RG_FRICTION_RR_MAX;
}

static RgStatus
finish (const char *who, double f, double *out, RgError *err)
{
  /* also false for NaN */
  if (!(f > 0.0 && f <= DBL_MAX))
    return rg_error_set_on (err, RG_ERR_NUMERIC,
                            RG_ON (REYNOLDS) | RG_ON (RELATIVE_ROUGHNESS),
                            "%s: the friction factor could not be computed (it is not a finite positive number).",
                            who);
  *out = f;
  return RG_OK;
}

RgStatus
rg_friction_laminar (double re, double *f, RgError *err)
{
  if (!(re > 0.0 && re <= DBL_MAX))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (REYNOLDS),
                            "Laminar friction: the Reynolds number must be a finite positive number, not %g.",
                            re);
  /* 64/re overflows only for re below 64/DBL_MAX */
  if (re < 64.0 / DBL_MAX)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (REYNOLDS),
                            "Laminar friction: the Reynolds number %g is too small to give a finite friction factor.",
                            re);
  *f = 64.0 / re;
  return RG_OK;
}

/* Clamond's solution without argument checks; see the top of the file. */
static double
colebrook_solve (double re, double rr)
{
  const double x1 = rr * re * COLEBROOK_X1_FACTOR;
  const double x2 = log (re) + COLEBROOK_X2_OFFSET;
  double F = x2 - COLEBROOK_F0_SHIFT;
  double t, s, g, num, den;

  /* step 1 */
  t = x1 + F;
  s = 1.0 + t;
  g = log (t) - COLEBROOK_F0_SHIFT;
  num = 1.5 * g * t * (2.0 * s * s + g);
  den = 3.0 * s * (s * s + g) + g * g;
  F -= num / den;

  /* step 2, folded into f = a²/(F − N/D)² = a²·D²/(F·D − N)² */
  t = x1 + F;
  s = 1.0 + t;
  g = log (t) + F - x2;
  num = 1.5 * g * t * (2.0 * s * s + g);
  den = 3.0 * s * (s * s + g) + g * g;
  const double p = F * den - num;
  return HALF_LN10_SQ * (den * den) / (p * p);
}

RgStatus
rg_friction_colebrook (double re, double rr, double *f, RgError *err)
{
  if (!turbulent_args_ok (re, rr))
    return turbulent_domain_error ("Colebrook", re, rr, err);
  return finish ("Colebrook", colebrook_solve (re, rr), f, err);
}

RgStatus
rg_friction_haaland (double re, double rr, double *f, RgError *err)
{
  if (!turbulent_args_ok (re, rr))
    return turbulent_domain_error ("Haaland", re, rr, err);
  /* Haaland (1983): 1/√f = −1.8·log10[ (ε/D/3.7)^1.11 + 6.9/Re ] */
  const double x = -1.8 * log10 (pow (rr / 3.7, 1.11) + 6.9 / re);
  return finish ("Haaland", 1.0 / (x * x), f, err);
}

RgStatus
rg_friction_swamee_jain (double re, double rr, double *f, RgError *err)
{
  if (!turbulent_args_ok (re, rr))
    return turbulent_domain_error ("Swamee–Jain", re, rr, err);
  /* Swamee and Jain (1976): f = 0.25 / [log10(ε/D/3.7 + 5.74/Re^0.9)]² */
  const double l = log10 (rr / 3.7 + 5.74 / pow (re, 0.9));
  return finish ("Swamee–Jain", 0.25 / (l * l), f, err);
}

/* ln(e^la + e^lb) without overflow; la may be −inf. */
static double
log_add_exp (double la, double lb)
{
  const double hi = fmax (la, lb), lo = fmin (la, lb);
  return hi + log1p (exp (lo - hi));
}

RgStatus
rg_friction_churchill (double re, double rr, double *f, RgError *err)
{
  if (!(re > 0.0 && re <= RG_FRICTION_RE_MAX))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (REYNOLDS),
                            "Churchill: the Reynolds number must be a number above 0 and at most %g, not %g.",
                            RG_FRICTION_RE_MAX, re);
  if (!(rr >= 0.0 && rr <= RG_FRICTION_RR_MAX))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (RELATIVE_ROUGHNESS),
                            "Churchill: the relative roughness must be a number between 0 and %g, not %g.",
                            RG_FRICTION_RR_MAX, rr);
  /* Churchill (1977), worked in logarithms:
   *   ln A = 16·ln|2.457·ln(1/w)|, w = (7/Re)^0.9 + 0.27·ε/D
   *   (the even power makes the sign of ln(1/w) irrelevant; w = 1 gives
   *   ln A = −inf, i.e. A = 0, which log_add_exp accepts),
   *   ln B = 16·ln(37530/Re),
   *   f = 8·exp( ln[ (8/Re)^12 + (A + B)^(−3/2) ] / 12 ). */
  const double w = pow (7.0 / re, 0.9) + 0.27 * rr;
  const double la = 16.0 * log (fabs (2.457 * log (w)));
  const double lb = 16.0 * log (37530.0 / re);
  const double l_turb = -1.5 * log_add_exp (la, lb);
  const double l_lam = 12.0 * log (8.0 / re);
  const double l_sum = log_add_exp (l_lam, l_turb);
  return finish ("Churchill", 8.0 * exp (l_sum / 12.0), f, err);
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
      return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (MODEL),
                              "Unknown friction model number %d; use colebrook, haaland, swamee-jain or churchill.",
                              (int) model);
    }
}

RgStatus
rg_friction_roughness_elasticity (double re, double rr, double *elasticity,
                                  RgError *err)
{
  /* the elasticity is that of the Colebrook equation */
  if (!turbulent_args_ok (re, rr))
    return turbulent_domain_error ("Colebrook", re, rr, err);
  double f;
  RgStatus st = rg_friction_colebrook (re, rr, &f, err);
  if (st != RG_OK)
    return st;
  /* see the top of the file */
  const double x = 1.0 / sqrt (f);
  const double r = rr / 3.7;
  const double u = r + 2.51 * x / re;
  const double e = 2.0 * TWO_OVER_LN10 * r / (x * (u + 2.51 * TWO_OVER_LN10 / re));
  if (!(e >= 0.0 && e <= DBL_MAX))
    return rg_error_set_on (err, RG_ERR_NUMERIC,
                            RG_ON (REYNOLDS) | RG_ON (RELATIVE_ROUGHNESS),
                            "The roughness elasticity could not be computed (it is not a finite number).");
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
  return rg_error_set_on (err, RG_ERR_PARSE, RG_ON (MODEL),
                          "Unknown friction model \"%.40s\"; use colebrook, haaland, swamee-jain or churchill.",
                          id != NULL ? id : "");
}
