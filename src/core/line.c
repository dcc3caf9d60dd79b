/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Line hydraulics (Darcy–Weisbach).
 *
 *   V = 4Q/(πD²),  Re = ρVD/μ,  h_major = f·(L/D)·V²/(2g),
 *   h_minor = ΣK·V²/(2g),  Δp = ρg(h_major + h_minor + Δz),
 *   gradient = 100·h_major/L,  τw = f·ρV²/8.
 *
 * Inverse problems: the total loss h(Q) grows with Q and falls with D; it
 * jumps upward where the design friction factor switches from 64/Re to the
 * turbulent value.  Each inverse is a bracketed root search on the
 * logarithm of the unknown with a fixed budget of steps (bisection
 * safeguarding secant steps); a target inside a jump is reported as the
 * edge of the jump. */
#include "line.h"

#include "message-private.h"

#include <math.h>

void
rg_line_input_init (RgLineInput *in)
{
  in->flow_m3_s = 0.0;
  in->diameter_m = 0.0;
  in->length_m = 0.0;
  in->roughness_m = 0.0;
  in->k_sum = 0.0;
  in->elevation_m = 0.0;
  in->density_kg_m3 = 0.0;
  in->viscosity_pa_s = 0.0;
  in->model = RG_FRICTION_COLEBROOK;
  rg_transition_default (&in->transition);
}

/* The inputs behind the dimensionless numbers of the friction side: a
 * failure of rg_friction_point names the Reynolds number or the relative
 * roughness, and the line knows what they were made of. */
static const RgSubjects RE_INPUTS = RG_ON (FLOW) | RG_ON (DIAMETER)
                                    | RG_ON (DENSITY) | RG_ON (VISCOSITY);
static const RgSubjects RR_INPUTS = RG_ON (ROUGHNESS) | RG_ON (DIAMETER);

static void
add_line_subjects (RgError *err)
{
  if (err == NULL)
    return;
  if (err->subjects & RG_ON (REYNOLDS))
    err->subjects |= RE_INPUTS;
  if (err->subjects & RG_ON (RELATIVE_ROUGHNESS))
    err->subjects |= RR_INPUTS;
}

static int
positive (double x)
{
  return isfinite (x) && x > 0.0;
}

static RgStatus
check_input (const RgLineInput *in, int need_flow, int need_diameter,
             RgError *err)
{
  if (need_flow && !positive (in->flow_m3_s))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (FLOW),
                            "The flow must be a positive number.");
  if (need_diameter && !positive (in->diameter_m))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (DIAMETER),
                            "The inner diameter must be a positive number.");
  if (!positive (in->length_m))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (LENGTH),
                            "The length must be a positive number.");
  if (!positive (in->density_kg_m3))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (DENSITY),
                            "The density must be a positive number.");
  if (!positive (in->viscosity_pa_s))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (VISCOSITY),
                            "The viscosity must be a positive number.");
  if (!isfinite (in->roughness_m) || in->roughness_m < 0.0)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (ROUGHNESS),
                            "The roughness must be zero or a positive number.");
  if (!isfinite (in->k_sum) || in->k_sum < 0.0)
    return rg_error_set_on (err, RG_ERR_DOMAIN,
                            RG_ON (K_SUM) | RG_ON (FITTING),
                            "The sum of fitting loss coefficients must be zero or positive.");
  if (!isfinite (in->elevation_m))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (ELEVATION),
                            "The elevation change must be a finite number.");
  return rg_transition_check (&in->transition, err);
}

static RgStatus
check_head_loss (double head_loss_m, RgError *err)
{
  if (!positive (head_loss_m))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (HEAD_LOSS),
                            "The allowed head loss must be a positive number.");
  return RG_OK;
}

RgStatus
rg_line_evaluate (const RgLineInput *in, RgLineResult *out, RgError *err)
{
  RgStatus st;

  if ((st = check_input (in, 1, 1, err)) != RG_OK)
    return st;

  const double d = in->diameter_m;
  const double area = M_PI * d * d / 4.0;
  const double v = in->flow_m3_s / area;
  const double re = in->density_kg_m3 * v * d / in->viscosity_pa_s;
  const double rr = in->roughness_m / d;

  if (!isfinite (v) || !isfinite (re))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RE_INPUTS,
                            "The flow and diameter give a velocity that cannot be computed.");
  if (rr > RG_FRICTION_RR_MAX)
    {
      char eps[RG_VALUE_MAX], dia[RG_VALUE_MAX];
      return rg_error_set_on (err, RG_ERR_DOMAIN, RR_INPUTS,
                              "The roughness %s is too large for the inner diameter %s: the relative roughness ε/D = %.3g exceeds %g.",
                              RG_ERR_VALUE (err, RG_QTY_ROUGHNESS, in->roughness_m, eps),
                              RG_ERR_VALUE (err, RG_QTY_LENGTH, d, dia),
                              rr, RG_FRICTION_RR_MAX);
    }
  if (re > RG_FRICTION_RE_MAX)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RE_INPUTS,
                            "The Reynolds number %.3g exceeds %g, the largest the friction factor is computed for.",
                            re, RG_FRICTION_RE_MAX);

  if ((st = rg_friction_point (in->model, &in->transition, re, rr,
                               &out->friction, err)) != RG_OK)
    {
      add_line_subjects (err);
      return st;
    }

  const double vh = v * v / (2.0 * RG_GRAVITY);
  const double f = out->friction.f;

  out->velocity_m_s = v;
  out->reynolds = re;
  out->relative_roughness = rr;
  out->head_loss_major_m = f * (in->length_m / d) * vh;
  out->head_loss_minor_m = in->k_sum * vh;
  out->head_loss_total_m = out->head_loss_major_m + out->head_loss_minor_m;
  out->pressure_drop_pa = in->density_kg_m3 * RG_GRAVITY
                          * (out->head_loss_total_m + in->elevation_m);
  out->gradient_m_per_100m = 100.0 * out->head_loss_major_m / in->length_m;
  out->wall_shear_pa = f * in->density_kg_m3 * v * v / 8.0;

  if (!isfinite (out->head_loss_total_m) || !isfinite (out->pressure_drop_pa)
      || !isfinite (out->wall_shear_pa))
    return rg_error_set_on (err, RG_ERR_NUMERIC,
                            RG_ON (FLOW) | RG_ON (DIAMETER) | RG_ON (LENGTH)
                            | RG_ON (K_SUM) | RG_ON (FITTING),
                            "The head loss is too large to compute.");
  return RG_OK;
}

/* The root search shared by both inverse problems: find x in [lo, hi] (log
 * space) where g(x) = h(x) − target changes sign.  `increasing` says whether
 * h grows with x.  A fixed budget of 200 steps; each halves the bracket at
 * worst, and the bracket starts at most ~60 natural-log units wide, so the
 * budget reaches the double-precision limit of the bracket. */
typedef RgStatus (*LossFn) (const RgLineInput *in, double x, double *h,
                            RgError *err);

static RgStatus
loss_at_flow (const RgLineInput *in, double q, double *h, RgError *err)
{
  RgLineInput t = *in;
  RgLineResult r = { 0 }; /* for clang-analyzer: rg_error_set never returns RG_OK */
  RgStatus st;

  t.flow_m3_s = q;
  if ((st = rg_line_evaluate (&t, &r, err)) != RG_OK)
    return st;
  *h = r.head_loss_total_m;
  return RG_OK;
}

static RgStatus
loss_at_diameter (const RgLineInput *in, double d, double *h, RgError *err)
{
  RgLineInput t = *in;
  RgLineResult r = { 0 }; /* for clang-analyzer: rg_error_set never returns RG_OK */
  RgStatus st;

  t.diameter_m = d;
  if ((st = rg_line_evaluate (&t, &r, err)) != RG_OK)
    return st;
  *h = r.head_loss_total_m;
  return RG_OK;
}

static int
converged (double lo, double hi)
{
  /* Relative bracket width in log space: 4 ulps of the unknown. */
  return hi - lo <= 4.0 * 2.220446049250313e-16 * (1.0 + fabs (hi));
}

static RgStatus
solve_log (LossFn fn, const RgLineInput *in, double target, double lo,
           double hi, int increasing, double *root, RgError *err)
{
  double glo, ghi;
  RgStatus st;

  if ((st = fn (in, exp (lo), &glo, err)) != RG_OK)
    return st;
  if ((st = fn (in, exp (hi), &ghi, err)) != RG_OK)
    return st;
  glo -= target;
  ghi -= target;
  if ((glo > 0.0) == (ghi > 0.0))
    {
      const RgSubjects others = RG_ON (HEAD_LOSS) | RG_ON (LENGTH)
                                | RG_ON (ROUGHNESS) | RG_ON (K_SUM);
      if (fn == loss_at_flow)
        return rg_error_set_on (err, RG_ERR_DOMAIN, others | RG_ON (DIAMETER),
                                "No flow within the computable range gives this head loss.");
      return rg_error_set_on (err, RG_ERR_DOMAIN, others | RG_ON (FLOW),
                              "No diameter within the computable range gives this head loss.");
    }

  for (int i = 0; i < 200 && !converged (lo, hi); i++)
    {
      /* secant in log space, kept inside the middle 80 % of the bracket */
      double x = lo - glo * (hi - lo) / (ghi - glo);
      const double w = hi - lo;
      if (!isfinite (x) || x < lo + 0.1 * w || x > hi - 0.1 * w)
        x = 0.5 * (lo + hi);
      double gx;
      if ((st = fn (in, exp (x), &gx, err)) != RG_OK)
        return st;
      gx -= target;
      if ((gx > 0.0) == (glo > 0.0))
        {
          lo = x;
          glo = gx;
        }
      else
        {
          hi = x;
          ghi = gx;
        }
    }
  /* The side that keeps the loss within the target. */
  (void) increasing;
  *root = exp ((glo <= 0.0) ? lo : hi);
  return RG_OK;
}

RgStatus
rg_line_flow_for_head_loss (const RgLineInput *in, double head_loss_m,
                            double *flow_m3_s, RgError *err)
{
  RgStatus st;

  if ((st = check_input (in, 0, 1, err)) != RG_OK)
    return st;
  if ((st = check_head_loss (head_loss_m, err)) != RG_OK)
    return st;

  /* Bracket by Reynolds number 1 … RE_MAX. */
  const double d = in->diameter_m;
  const double q_per_re = in->viscosity_pa_s * M_PI * d / (4.0 * in->density_kg_m3);
  const double lo = log (q_per_re * 1.0);
  const double hi = log (q_per_re * RG_FRICTION_RE_MAX * 0.999);
  return solve_log (loss_at_flow, in, head_loss_m, lo, hi, 1, flow_m3_s, err);
}

RgStatus
rg_line_diameter_for_head_loss (const RgLineInput *in, double head_loss_m,
                                double *diameter_m, RgError *err)
{
  RgStatus st;

  if ((st = check_input (in, 1, 0, err)) != RG_OK)
    return st;
  if ((st = check_head_loss (head_loss_m, err)) != RG_OK)
    return st;

  /* Smallest diameter: Re ≤ RE_MAX and ε/D ≤ RR_MAX; largest: Re ≥ 1. */
  const double re_d = 4.0 * in->density_kg_m3 * in->flow_m3_s / (M_PI * in->viscosity_pa_s);
  double dmin = fmax (re_d / (RG_FRICTION_RE_MAX * 0.999),
                      in->roughness_m / (RG_FRICTION_RR_MAX * 0.999));
  double dmax = re_d;
  if (!(dmin < dmax))
    return rg_error_set_on (err, RG_ERR_DOMAIN,
                            RG_ON (FLOW) | RG_ON (ROUGHNESS) | RG_ON (DENSITY)
                            | RG_ON (VISCOSITY),
                            "No diameter within the computable range suits this flow.");
  double root = 0.0; /* for clang-analyzer: rg_error_set never returns RG_OK */
  /* h falls as D grows: solve on the loss at each diameter, then take the
   * side of the bracket within the allowed loss (the larger diameter). */
  if ((st = solve_log (loss_at_diameter, in, head_loss_m, log (dmin),
                       log (dmax), 0, &root, err)) != RG_OK)
    return st;
  *diameter_m = root;
  return RG_OK;
}
