/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Roughness growth with service age.
 *
 * Model: Colebrook, C. F. and White, C. M. (1937), "The reduction of
 * carrying capacity of pipes with age", J. Inst. Civil Eng. 7(1), 99–118:
 * the absolute roughness grows linearly,  ε(t) = ε₀ + α·t.
 * Growth-rate classes (data/aging.json): Lamont, P. A. (1981), J. AWWA
 * 73(5), 274–280, water groups 1–5.
 *
 * rg_aging_evaluate gives the line at age t, the ratio of its total head
 * loss to the new line's, and d h_total/dt.  Only the major loss depends on
 * ε (fitting K values depend on Re and D), so
 *
 *   d h_total/dt = h_major · (∂ln f/∂(ε/D)) · α / D.
 *
 * ∂ln f/∂(ε/D):
 *   - laminar regime: 0 (64/Re does not depend on roughness);
 *   - Colebrook: analytic, by implicit differentiation of the Colebrook
 *     equation (the same derivation as rg_friction_roughness_elasticity,
 *     without the factor ε/D, so it stays finite for a smooth new pipe);
 *   - the explicit correlations (Haaland, Swamee–Jain, Churchill): a central
 *     difference of ln f in ε/D with step 1e-4·ε/D (forward difference from
 *     a smooth pipe); truncation error O(step²), about 1e-8 relative.
 * In the transitional range the design value is the turbulent model at
 * max(Re, RG_FRICTION_RE_MIN), as in rg_friction_point; the derivative
 * follows it.
 *
 * Special cases: t = 0 or α = 0 give ratio 1 exactly; ages beyond the
 * point where ε/D exceeds RG_FRICTION_RR_MAX are refused with an error that
 * names the age. */
#include "aging.h"

#include "catalog.h"
#include "catalog-data.h"
#include "message-private.h"

#include <math.h>

/* The ranges of the age and of the growth rate, with their reasons:
 * aging.h (RG_AGING_AGE_MAX_YEARS, RG_AGING_RATE_MAX_M_PER_YEAR). */

int
rg_aging_class_count (void)
{
  return rg_catalog_aging_classes_count;
}

const RgAgingClass *
rg_aging_class_at (int index)
{
  if (index < 0 || index >= rg_catalog_aging_classes_count)
    return NULL;
  return &rg_catalog_aging_classes[index];
}

static const char *
class_id_at (int i)
{
  return rg_catalog_aging_classes[i].id;
}

RgStatus
rg_aging_class_lookup (const char *id, const RgAgingClass **out, RgError *err)
{
  char near[160];

  if (id == NULL)
    id = "";
  for (int i = 0; i < rg_catalog_aging_classes_count; i++)
    {
      const char *a = id, *b = rg_catalog_aging_classes[i].id;
      while (*a && *b && ((*a | 0x20) == (*b | 0x20)))
        a++, b++;
      if (*a == '\0' && *b == '\0')
        {
          *out = &rg_catalog_aging_classes[i];
          return RG_OK;
        }
    }
  rg_catalog_closest (id, class_id_at, rg_catalog_aging_classes_count, near,
                      sizeof near);
  return rg_error_set_on (err, RG_ERR_NOT_FOUND, RG_ON (AGING_CLASS),
                          "Unknown water aggressiveness class \"%.40s\"; the closest are %s.",
                          id, near);
}

RgStatus
rg_aging_roughness (double roughness_new_m, double rate_m_per_year,
                    double age_years, double *roughness_m, RgError *err)
{
  if (!isfinite (roughness_new_m) || roughness_new_m < 0.0)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (ROUGHNESS),
                            "The roughness when new must be zero or a positive number.");
  if (!isfinite (rate_m_per_year) || rate_m_per_year < 0.0
      || rate_m_per_year > RG_AGING_RATE_MAX_M_PER_YEAR)
    {
      char lo[RG_VALUE_MAX], hi[RG_VALUE_MAX], v[RG_VALUE_MAX];
      return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (AGING_RATE),
                              "The roughness growth rate must lie between %s and %s, not %s.",
                              RG_ERR_VALUE (err, RG_QTY_ROUGHNESS_RATE, 0.0, lo),
                              RG_ERR_VALUE (err, RG_QTY_ROUGHNESS_RATE,
                                            RG_AGING_RATE_MAX_M_PER_YEAR / RG_UNITS_SECONDS_PER_YEAR, hi),
                              RG_ERR_VALUE (err, RG_QTY_ROUGHNESS_RATE,
                                            rate_m_per_year / RG_UNITS_SECONDS_PER_YEAR, v));
    }
  if (!isfinite (age_years) || age_years < 0.0 || age_years > RG_AGING_AGE_MAX_YEARS)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (AGE),
                            "The age must lie between 0 and %g years.",
                            RG_AGING_AGE_MAX_YEARS);
  const double eps = roughness_new_m + rate_m_per_year * age_years;
  if (!isfinite (eps))
    return rg_error_set_on (err, RG_ERR_NUMERIC,
                            RG_ON (ROUGHNESS) | RG_ON (AGING_RATE) | RG_ON (AGE),
                            "The aged roughness is too large to compute.");
  *roughness_m = eps;
  return RG_OK;
}

/* What the derivative of the loss with age is made of. */
static const RgSubjects DERIVATIVE_INPUTS
  = RG_ON (FLOW) | RG_ON (DIAMETER) | RG_ON (ROUGHNESS) | RG_ON (AGING_RATE)
    | RG_ON (AGE) | RG_ON (MODEL);

/* ∂ln f/∂(ε/D) of the design friction factor at this point. */
static RgStatus
dlnf_drr (const RgLineInput *in, const RgLineResult *r, double *out,
          RgError *err)
{
  const double re_t = fmax (r->reynolds, RG_FRICTION_RE_MIN);
  const double rr = r->relative_roughness;

  if (r->friction.regime == RG_REGIME_LAMINAR)
    {
      *out = 0.0;
      return RG_OK;
    }
  if (in->model == RG_FRICTION_COLEBROOK)
    {
      /* x = 1/√f = −c·ln u,  u = rr/3.7 + 2.51·x/Re,  c = 2/ln 10:
       * ∂x/∂rr = −(c/(3.7u)) / (1 + 2.51c/(Re·u)),  ∂ln f/∂rr = −(2/x)·∂x/∂rr. */
      const double c = 2.0 / log (10.0);
      const double x = 1.0 / sqrt (r->friction.f);
      const double u = rr / 3.7 + 2.51 * x / re_t;
      const double dx = -(c / (3.7 * u)) / (1.0 + 2.51 * c / (re_t * u));
      *out = -2.0 / x * dx;
    }
  else
    {
      RgStatus st;
      double fp, fm, h = 1.0e-4 * rr, lo = rr;
      if (h < 1.0e-10)
        h = 1.0e-10;
      if (rr - h >= 0.0)
        lo = rr - h;
      const double hi = fmin (rr + h, RG_FRICTION_RR_MAX);
      if ((st = rg_friction_model (in->model, re_t, hi, &fp, err)) != RG_OK
          || (st = rg_friction_model (in->model, re_t, lo, &fm, err)) != RG_OK)
        {
          rg_error_add_subjects (err, DERIVATIVE_INPUTS);
          return st;
        }
      *out = (log (fp) - log (fm)) / (hi - lo);
    }
  if (!isfinite (*out))
    return rg_error_set_on (err, RG_ERR_NUMERIC, DERIVATIVE_INPUTS,
                            "The rate of change of the head loss could not be computed.");
  return RG_OK;
}

RgStatus
rg_aging_evaluate (const RgLineInput *in, double rate_m_per_year,
                   double age_years, RgAgingResult *out, RgError *err)
{
  RgLineInput aged;
  double eps = 0.0, slope = 0.0; /* for clang-analyzer: rg_error_set never returns RG_OK */
  RgStatus st;

  if ((st = rg_aging_roughness (in->roughness_m, rate_m_per_year, age_years,
                                &eps, err)) != RG_OK)
    return st;
  if ((st = rg_line_evaluate (in, &out->result_new, err)) != RG_OK)
    return st;
  if (isfinite (in->diameter_m) && in->diameter_m > 0.0
      && eps / in->diameter_m > RG_FRICTION_RR_MAX)
    {
      char e[RG_VALUE_MAX];
      return rg_error_set_on (err, RG_ERR_DOMAIN,
                              RG_ON (AGE) | RG_ON (AGING_RATE) | RG_ON (ROUGHNESS)
                              | RG_ON (DIAMETER),
                              "After %g years the roughness grows to %s, a relative roughness of %.3g, above the limit %g.",
                              age_years, RG_ERR_VALUE (err, RG_QTY_ROUGHNESS, eps, e),
                              eps / in->diameter_m, RG_FRICTION_RR_MAX);
    }
  aged = *in;
  aged.roughness_m = eps;
  if ((st = rg_line_evaluate (&aged, &out->result, err)) != RG_OK)
    {
      /* the aged roughness is the new one grown at this rate for this age */
      if (err != NULL && (err->subjects & RG_ON (ROUGHNESS)) != 0)
        rg_error_add_subjects (err, RG_ON (AGING_RATE) | RG_ON (AGE));
      return st;
    }
  if ((st = dlnf_drr (&aged, &out->result, &slope, err)) != RG_OK)
    return st;

  out->roughness_m = eps;
  /* A flow so small that v² underflows gives no head loss at either age;
   * the limit of the ratio for a vanishing (laminar) flow is 1, as the
   * laminar loss does not depend on the roughness. */
  if (out->result.head_loss_total_m == 0.0
      && out->result_new.head_loss_total_m == 0.0)
    out->head_loss_ratio_to_new = 1.0;
  else
    out->head_loss_ratio_to_new = out->result.head_loss_total_m
                                  / out->result_new.head_loss_total_m;
  out->head_loss_rate_m_per_year = out->result.head_loss_major_m * slope
                                   * rate_m_per_year / in->diameter_m;
  if (!isfinite (out->head_loss_ratio_to_new)
      || !isfinite (out->head_loss_rate_m_per_year))
    return rg_error_set_on (err, RG_ERR_NUMERIC,
                            RG_ON (FLOW) | RG_ON (LENGTH) | RG_ON (AGING_RATE) | RG_ON (AGE),
                            "The aged head loss could not be computed.");
  return RG_OK;
}
