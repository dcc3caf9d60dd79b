/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Pumping energy, life-cycle cost, system curves and the pump's duty point
 * (rugosa-life-cycle.h).
 *
 * Every hydraulic value comes from the evaluation's own pieces
 * (rugosa-eval-private.h): the line at a flow Q and an age t is the core's
 * rg_aging_evaluate with ΣK at Q's Reynolds number, exactly as each
 * operating point of the results table is computed.
 *
 * Pump head and power.  The pump adds the head the line needs,
 *   H = h_major + h_minor + Δz   (total head loss plus the elevation
 *                                 change, outlet minus inlet);
 * a line that falls more than it loses needs no pump: H is taken as 0
 * (no power is recovered).  Hydraulic power P_h = ρ·g·Q·H (g = 9.80665
 * m/s², standard gravity), electric input power P_e = P_h/η with η the
 * pump and motor efficiency of the settings.
 *
 * Energy of a year.  E = Σ over the flow cases of P_e(case)·hours(case)·
 * 3600 s, with the hours a year of the settings at the design, lowest and
 * highest flow; a line that gives no lowest (highest) flow runs those hours
 * at its design flow, so every option of a project runs the same hours.
 * The cost is E in kWh (3.6e6 J, NIST SP 811 B.8) times the price per kWh.
 *
 * Service life, year by year.  Year k (k = 1 … ⌈N⌉ for a service life of
 * N years; the last year may be a part w = N − (k − 1) < 1) is costed at
 * the roughness of its middle, ε(k − 1 + w/2) = ε₀ + α·(k − 1 + w/2):
 * the roughness grows linearly (rugosa's aging model), so that is the
 * year's mean roughness, and costing the year at it is the midpoint rule
 * for the year's energy (exact for energy linear in ε, second-order
 * otherwise).  Year k costs w·C(k − 1 + w/2), paid at its end,
 * t_k = k − 1 + w, and is discounted at the rate r to
 * PV_k = w·C/(1 + r)^t_k.  The life sum is Σ w·C, its present value
 * Σ PV_k, and the life-cycle cost the capital (cost per metre × length +
 * lump sum, spent at year 0) plus that present value.  For a cost C that
 * does not change, Σ PV_k = C·(1 − (1 + r)^−N)/r for whole N (the present
 * value of an ordinary annuity), which the tests check.
 *
 * The pump curve.  Its points are joined by Steffen's monotone cubic
 * Hermite interpolation (M. Steffen, "A simple method for monotonic
 * interpolation in one dimension", Astron. Astrophys. 239 (1990)
 * 443–450): the curve passes through every point, its slope is continuous,
 * and between two points it never leaves the range of their heads, so a
 * falling set of points gives a falling curve without the wiggles of a
 * polynomial through them.  Slopes: eq. (11) inside, the "simplest
 * possibility" of section 2.2 at both ends (the secant of the end
 * interval).  Outside its first and last flow the curve is not
 * extrapolated: the pump's range is that of its points.
 *
 * The duty point.  The flow Q* in the pump's range where pump head equals
 * system head, g(Q) = H_pump(Q) − H_sys(Q) = 0.  g is sampled at
 * DUTY_SAMPLES flows across the range; the sign change at the largest
 * flow is refined by Brent's method (R. P. Brent, "Algorithms for
 * Minimization without Derivatives", 1973, ch. 4: bisection, secant and
 * inverse quadratic steps, the bracket kept) to a flow within
 * DUTY_TOL_REL of the range plus four machine epsilons of Q*.  Where g
 * keeps one sign over the whole range the curves do not cross in it and a
 * warning says which way: the pump is too weak for the line, or it would
 * run beyond its largest given flow.  The duty point is found when new and
 * at the service age, so the flow lost to aging shows. */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <float.h>
#include <math.h>
#include <string.h>

#include "core/line.h"
#include "rugosa-eval-private.h"
#include "rugosa-life-cycle.h"
#include "rugosa-line-private.h"
#include "rugosa-project-private.h"
#include "rugosa-settings-private.h"

#define SECONDS_PER_HOUR 3600.0
#define JOULES_PER_KWH 3.6e6        /* NIST SP 811 (2008) B.8, exact */
/* How finely the pump's range is searched for a sign change, and how
 * closely the crossing is then found (a share of the range). */
#define DUTY_SAMPLES 64
#define DUTY_TOL_REL 1.0e-12
#define DUTY_ITER_MAX 200

/* ---- the pump curve ---------------------------------------------------- */

static double
sign_of (double x)
{
  return x < 0.0 ? -1.0 : 1.0;
}

gboolean
rugosa_pump_fit_init (RugosaPumpFit *fit, GVariant *curve)
{
  gsize n = curve != NULL ? g_variant_n_children (curve) : 0;

  memset (fit, 0, sizeof *fit);
  if (n < 3 || n > RUGOSA_CURVE_POINTS_MAX)
    return FALSE;
  for (gsize i = 0; i < n; i++)
    {
      g_variant_get_child (curve, i, "(dd)", &fit->q[i], &fit->h[i]);
      /* the file and the panel keep flows increasing; a curve built
       * otherwise is not fitted */
      if (i > 0 && !(fit->q[i] > fit->q[i - 1]))
        return FALSE;
    }
  fit->n = (guint) n;
  /* Steffen (1990) section 2.2, simplest possibility: the end slopes are
   * the secants of the end intervals. */
  fit->slope[0] = (fit->h[1] - fit->h[0]) / (fit->q[1] - fit->q[0]);
  for (guint i = 1; i + 1 < fit->n; i++)
    {
      const double h0 = fit->q[i] - fit->q[i - 1], h1 = fit->q[i + 1] - fit->q[i];
      const double s0 = (fit->h[i] - fit->h[i - 1]) / h0;
      const double s1 = (fit->h[i + 1] - fit->h[i]) / h1;
      const double p = (s0 * h1 + s1 * h0) / (h0 + h1);     /* eq. (8) */

      /* eq. (11): no slope steeper than allows a monotone interval */
      fit->slope[i] = (sign_of (s0) + sign_of (s1))
                      * fmin (fabs (s0), fmin (fabs (s1), 0.5 * fabs (p)));
    }
  fit->slope[fit->n - 1] = (fit->h[fit->n - 1] - fit->h[fit->n - 2])
                           / (fit->q[fit->n - 1] - fit->q[fit->n - 2]);
  return TRUE;
}

double
rugosa_pump_fit_head (const RugosaPumpFit *fit, double q)
{
  guint i = 0;
  double dx, h, s, a, b;

  if (fit->n < 2)
    return fit->n == 1 ? fit->h[0] : 0.0;
  if (q <= fit->q[0])
    return fit->h[0];
  if (q >= fit->q[fit->n - 1])
    return fit->h[fit->n - 1];
  while (i + 2 < fit->n && q >= fit->q[i + 1])
    i++;
  /* The cubic Hermite of the interval (Steffen 1990, eqs. 2–5):
   * H = a·dx³ + b·dx² + slope_i·dx + h_i. */
  h = fit->q[i + 1] - fit->q[i];
  s = (fit->h[i + 1] - fit->h[i]) / h;
  a = (fit->slope[i] + fit->slope[i + 1] - 2.0 * s) / (h * h);
  b = (3.0 * s - 2.0 * fit->slope[i] - fit->slope[i + 1]) / h;
  dx = q - fit->q[i];
  return ((a * dx + b) * dx + fit->slope[i]) * dx + fit->h[i];
}

/* ---- the system curve -------------------------------------------------- */

/* The head the line needs at q and age (new: the result when new). */
static RgStatus
system_head (const RugosaLineSetup *setup, double q, double age, gboolean new,
             double *head, RgError *err)
{
  RgAgingResult ar;
  RgStatus st;

  if (q <= 0.0)
    {
      *head = setup->elevation_m;
      return RG_OK;
    }
  if ((st = _rugosa_line_setup_at (setup, q, age, &ar, err)) != RG_OK)
    return st;
  *head = setup->elevation_m + (new ? ar.result_new.head_loss_total_m
                                    : ar.result.head_loss_total_m);
  return RG_OK;
}

gboolean
rugosa_project_system_curve (RugosaProject *self, RugosaLine *line,
                             double age_years, double q_max, guint n,
                             double *q, double *head, RgError *err)
{
  RugosaLineSetup setup;
  gboolean ok = TRUE;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), FALSE);
  g_return_val_if_fail (RUGOSA_IS_LINE (line), FALSE);
  g_return_val_if_fail (n >= 2 && q_max >= 0.0, FALSE);

  if (!_rugosa_line_setup_init (self, line, &setup, err))
    return FALSE;
  for (guint i = 0; i < n && ok; i++)
    {
      q[i] = q_max * (double) i / (double) (n - 1);
      ok = system_head (&setup, q[i], age_years, FALSE, &head[i], err) == RG_OK;
    }
  _rugosa_line_setup_clear (&setup);
  return ok;
}

gboolean
rugosa_project_system_head (RugosaProject *self, RugosaLine *line, double q,
                            double age_years, double *head_m, RgError *err)
{
  double qs[2], hs[2];

  if (!rugosa_project_system_curve (self, line, age_years, q, 2, qs, hs, err))
    return FALSE;
  *head_m = hs[1];
  return TRUE;
}

/* ---- power and energy -------------------------------------------------- */

/* The pump head and the hydraulic power of a result at flow q. */
static void
pump_power (const RugosaLineSetup *setup, double q, const RgLineResult *r,
            double *head, double *hydraulic)
{
  const double h = fmax (0.0, r->head_loss_total_m + setup->elevation_m);

  *head = h;
  *hydraulic = setup->props.density_kg_m3 * RG_GRAVITY * q * h;
}

/* The pump and motor efficiency as a fraction; its row keeps it above 0
 * (a value set around the row would give no energy, not an infinite one:
 * the callers check `usable_efficiency` first). */
static double
efficiency (RugosaSettings *settings)
{
  return settings->pump_efficiency / 100.0;
}

static gboolean
usable_efficiency (RugosaSettings *settings)
{
  return settings->pump_efficiency > 0.0 && settings->pump_efficiency <= 100.0;
}

/* The hours a year at each flow case of a line with the cases `present`. */
static void
case_hours (RugosaSettings *settings, const gboolean present[RUGOSA_N_FLOWS],
            double hours[RUGOSA_N_FLOWS])
{
  hours[RUGOSA_FLOW_DESIGN] = settings->hours_design;
  hours[RUGOSA_FLOW_MINIMUM] = settings->hours_minimum;
  hours[RUGOSA_FLOW_MAXIMUM] = settings->hours_maximum;
  for (int c = RUGOSA_FLOW_MINIMUM; c < RUGOSA_N_FLOWS; c++)
    if (!present[c])
      {
        hours[RUGOSA_FLOW_DESIGN] += hours[c];
        hours[c] = 0.0;
      }
}

static double
cost_of (RugosaSettings *settings, double joules)
{
  return joules / JOULES_PER_KWH * settings->energy_price;
}

/* ---- the duty point ---------------------------------------------------- */

typedef struct {
  const RugosaLineSetup *setup;
  const RugosaPumpFit *fit;
  double age;
  gboolean new;
  RgError *err;
  gboolean failed;
} DutyFunction;

static double
duty_g (DutyFunction *f, double q)
{
  double hs = 0.0;

  if (f->failed)
    return 0.0;
  if (system_head (f->setup, q, f->age, f->new, &hs, f->err) != RG_OK)
    {
      f->failed = TRUE;
      return 0.0;
    }
  return rugosa_pump_fit_head (f->fit, q) - hs;
}

/* Brent's method: the state of the bracket [b, c] around the root, b the
 * best estimate, a the previous one. */
typedef struct {
  double a, b, c, fa, fb, fc, d, e;
} Brent;

/* The convergence test: the bracket is narrower than `tol` or b is a root. */
static gboolean
brent_converged (const Brent *s, double tol)
{
  return fabs (0.5 * (s->c - s->b)) <= tol || s->fb == 0.0;
}

static void
brent_step (Brent *s, DutyFunction *f, double tol)
{
  const double m = 0.5 * (s->c - s->b);

  if (fabs (s->e) < tol || fabs (s->fa) <= fabs (s->fb))
    s->d = s->e = m;                     /* bisection */
  else
    {
      double p, q, r, t = s->fb / s->fa;

      if (s->a == s->c)
        {
          p = 2.0 * m * t;               /* secant */
          q = 1.0 - t;
        }
      else
        {
          q = s->fa / s->fc;             /* inverse quadratic */
          r = s->fb / s->fc;
          p = t * (2.0 * m * q * (q - r) - (s->b - s->a) * (r - 1.0));
          q = (q - 1.0) * (r - 1.0) * (t - 1.0);
        }
      if (p > 0.0)
        q = -q;
      else
        p = -p;
      if (2.0 * p < 3.0 * m * q - fabs (tol * q) && p < fabs (0.5 * s->e * q))
        {
          s->e = s->d;
          s->d = p / q;
        }
      else
        s->d = s->e = m;
    }
  s->a = s->b;
  s->fa = s->fb;
  s->b += fabs (s->d) > tol ? s->d : (m > 0.0 ? tol : -tol);
  s->fb = duty_g (f, s->b);
  if ((s->fb > 0.0) == (s->fc > 0.0))
    {
      s->c = s->a;
      s->fc = s->fa;
      s->d = s->e = s->b - s->a;
    }
}

static RugosaDutyOutcome
duty_point (const RugosaLineSetup *setup, const RugosaPumpFit *fit, double age,
            gboolean new, double *flow, double *head, RgError *err)
{
  DutyFunction f = { setup, fit, age, new, err, FALSE };
  const double q0 = fit->q[0], q1 = fit->q[fit->n - 1];
  double g[DUTY_SAMPLES + 1], qs[DUTY_SAMPLES + 1];
  int crossing = -1;
  gboolean any_above = FALSE;
  Brent s;

  for (int i = 0; i <= DUTY_SAMPLES; i++)
    {
      qs[i] = q0 + (q1 - q0) * i / DUTY_SAMPLES;
      g[i] = duty_g (&f, qs[i]);
      if (f.failed)
        return RUGOSA_DUTY_FAILED;
      any_above |= g[i] >= 0.0;
      /* the crossing at the largest flow: where a rising system curve meets
       * a falling pump curve, the stable point of operation */
      if (i > 0 && (g[i - 1] >= 0.0) != (g[i] >= 0.0))
        crossing = i - 1;
    }
  if (crossing < 0)
    return any_above ? RUGOSA_DUTY_PUMP_ABOVE : RUGOSA_DUTY_PUMP_BELOW;

  s.a = s.c = qs[crossing];
  s.fa = s.fc = g[crossing];
  s.b = qs[crossing + 1];
  s.fb = g[crossing + 1];
  s.d = s.e = s.b - s.a;
  for (int it = 0; it < DUTY_ITER_MAX; it++)
    {
      double tol;

      /* keep b the better end */
      if (fabs (s.fc) < fabs (s.fb))
        {
          s.a = s.b;
          s.b = s.c;
          s.c = s.a;
          s.fa = s.fb;
          s.fb = s.fc;
          s.fc = s.fa;
        }
      tol = 2.0 * DBL_EPSILON * fabs (s.b) + 0.5 * DUTY_TOL_REL * (q1 - q0);
      if (brent_converged (&s, tol))
        break;
      brent_step (&s, &f, tol);
      if (f.failed)
        return RUGOSA_DUTY_FAILED;
    }
  *flow = s.b;
  *head = rugosa_pump_fit_head (fit, s.b);
  return RUGOSA_DUTY_FOUND;
}

const char *
rugosa_duty_outcome_sentence (RugosaDutyOutcome outcome, gboolean new)
{
  switch (outcome)
    {
    case RUGOSA_DUTY_PUMP_BELOW:
      return new
        ? _("When new, the pump curve lies below the system curve over the pump's whole range of flow: the curves do not cross, and there is no duty point.")
        : _("At the service age, the pump curve lies below the system curve over the pump's whole range of flow: the curves do not cross, and there is no duty point.");
    case RUGOSA_DUTY_PUMP_ABOVE:
      return new
        ? _("When new, the pump curve lies above the system curve up to the pump's largest given flow: the curves do not cross in the pump's range, and there is no duty point.")
        : _("At the service age, the pump curve lies above the system curve up to the pump's largest given flow: the curves do not cross in the pump's range, and there is no duty point.");
    case RUGOSA_DUTY_NONE:
    case RUGOSA_DUTY_FOUND:
    case RUGOSA_DUTY_FAILED:
    default:
      return NULL;
    }
}

static void
duty_warning (RugosaOperatingPoint *p, RugosaDutyOutcome outcome, gboolean new,
              const RgError *err)
{
  const char *sentence = rugosa_duty_outcome_sentence (outcome, new);

  if (sentence != NULL)
    rg_warnings_add (&p->warnings, "%s", sentence);
  else if (outcome == RUGOSA_DUTY_FAILED && err != NULL)
    rg_warnings_add (&p->warnings, "%s", err->text);
}

/* ---- the service life -------------------------------------------------- */

/* The energy of one year of the line at `age`, as evaluate_line computes
 * each flow case. */
static RgStatus
energy_at (RugosaProject *self, RugosaLine *line, const RugosaLineSetup *setup,
           double age, double *joules, RgError *err)
{
  RugosaSettings *settings = self->settings;
  const double flows[RUGOSA_N_FLOWS] = {
    line->flow_design, line->flow_minimum, line->flow_maximum
  };
  gboolean present[RUGOSA_N_FLOWS];
  double hours[RUGOSA_N_FLOWS];
  double e = 0.0;

  for (int c = 0; c < RUGOSA_N_FLOWS; c++)
    present[c] = c == RUGOSA_FLOW_DESIGN || flows[c] > 0.0;
  case_hours (settings, present, hours);
  for (int c = 0; c < RUGOSA_N_FLOWS; c++)
    {
      RgAgingResult ar;
      RgStatus st;
      double head, hydraulic;

      if (!present[c] || hours[c] <= 0.0)
        continue;
      if ((st = _rugosa_line_setup_at (setup, flows[c], age, &ar, err)) != RG_OK)
        return st;
      pump_power (setup, flows[c], &ar.result, &head, &hydraulic);
      e += hydraulic / efficiency (settings) * hours[c] * SECONDS_PER_HOUR;
    }
  *joules = e;
  return RG_OK;
}

void
_rugosa_life_cycle_compute (RugosaProject *self, RugosaLine *line,
                            RugosaLifeCycle *life)
{
  RugosaSettings *settings = self->settings;
  const double n = settings->service_life;
  const double rate = settings->discount_rate / 100.0;
  RugosaLineSetup setup;
  RugosaPumpFit fit;
  RgError err = { 0 };
  double constant_joules = 0.0;

  memset (life, 0, sizeof *life);
  rg_error_clear (&err);
  life->service_life_years = n;
  life->capital = line->cost_per_metre * line->length + line->cost_lump_sum;
  life->has_capital = line->cost_per_metre > 0.0 || line->cost_lump_sum > 0.0;
  if (!usable_efficiency (settings))
    {
      rugosa_field_in_range (rugosa_field_find ("pump-efficiency"), settings->pump_efficiency, NULL, &err);
      g_strlcpy (life->error, err.text, sizeof life->error);
      return;
    }
  if (!_rugosa_line_setup_init (self, line, &setup, &err))
    {
      g_strlcpy (life->error, err.text, sizeof life->error);
      return;
    }

  life->ok = TRUE;
  life->n_years = (guint) MIN (ceil (n), (double) RUGOSA_LIFE_YEARS_MAX);
  for (guint k = 1; k <= life->n_years && life->ok; k++)
    {
      const double w = fmin (1.0, n - (double) (k - 1));
      double joules = 0.0;
      RgStatus st = RG_OK;

      /* A wall that does not roughen costs the same every year: its year
       * is computed once (the same inputs give the same bits), which makes
       * a line without aging as cheap as three operating points. */
      if (k == 1 || setup.rate_m_per_year != 0.0)
        st = energy_at (self, line, &setup, (double) (k - 1) + 0.5 * w, &joules, &err);
      else
        joules = constant_joules;
      if (k == 1)
        constant_joules = joules;
      if (st != RG_OK)
        {
          life->ok = FALSE;
          g_strlcpy (life->error, err.text, sizeof life->error);
          break;
        }
      life->year_end[k - 1] = (double) (k - 1) + w;
      life->year_cost[k - 1] = w * cost_of (settings, joules);
      life->year_cost_pv[k - 1] = life->year_cost[k - 1] / pow (1.0 + rate, life->year_end[k - 1]);
      life->total += life->year_cost[k - 1];
      life->total_pv += life->year_cost_pv[k - 1];
    }
  life->life_cycle_cost = life->capital + life->total_pv;

  life->has_pump = rugosa_pump_fit_init (&fit, line->pump_curve);
  if (life->has_pump)
    {
      rg_error_clear (&life->duty_new_error);
      life->duty_new_outcome = duty_point (&setup, &fit, 0.0, TRUE, &life->duty_new_flow_m3_s,
                                           &life->duty_new_head_m, &life->duty_new_error);
      life->duty_new_ok = life->duty_new_outcome == RUGOSA_DUTY_FOUND;
    }
  _rugosa_line_setup_clear (&setup);
}

/* ---- the results of one age -------------------------------------------- */

void
_rugosa_life_cycle_fill (RugosaProject *self, RugosaLine *line,
                         const RugosaLineSetup *setup, RugosaLineResults *r)
{
  RugosaSettings *settings = self->settings;
  RugosaLineEnergy *en = &r->energy;
  RugosaOperatingPoint *design = &r->points[RUGOSA_FLOW_DESIGN];
  const RugosaLifeCycle *life;
  gboolean present[RUGOSA_N_FLOWS];
  double hours[RUGOSA_N_FLOWS];
  RugosaPumpFit fit;
  gsize n_points;

  if (!r->ok || !usable_efficiency (settings))
    return;
  en->ok = TRUE;
  for (int c = 0; c < RUGOSA_N_FLOWS; c++)
    {
      RugosaOperatingPoint *p = &r->points[c];
      double head_new, hydraulic_new;

      present[c] = p->present;
      if (!p->ok)
        continue;
      pump_power (setup, p->flow_m3_s, &p->result, &p->pump_head_m, &p->hydraulic_power_w);
      pump_power (setup, p->flow_m3_s, &p->result_new, &head_new, &hydraulic_new);
      p->electric_power_w = p->hydraulic_power_w / efficiency (settings);
      p->electric_power_new_w = hydraulic_new / efficiency (settings);
    }
  case_hours (settings, present, hours);
  for (int c = 0; c < RUGOSA_N_FLOWS; c++)
    {
      const RugosaOperatingPoint *p = &r->points[c];

      if (hours[c] <= 0.0)
        continue;
      if (!p->ok)
        {
          en->ok = FALSE;
          break;
        }
      en->energy_j_per_year += p->electric_power_w * hours[c] * SECONDS_PER_HOUR;
      en->energy_new_j_per_year += p->electric_power_new_w * hours[c] * SECONDS_PER_HOUR;
    }
  en->cost_per_year = cost_of (settings, en->energy_j_per_year);
  en->cost_new_per_year = cost_of (settings, en->energy_new_j_per_year);

  life = rugosa_project_get_life_cycle (self, line);
  en->has_capital = life->has_capital;
  en->capital = life->capital;
  en->life_ok = life->ok && en->ok;
  en->life_energy_cost = life->total;
  en->life_energy_cost_pv = life->total_pv;
  en->life_cycle_cost = life->life_cycle_cost;
  if (en->ok && !life->ok)
    {
      rg_warnings_add (&design->warnings, "%s",
                       _("The energy over the service life is not summed: the line does not evaluate at every year of it."));
      rg_warnings_add (&design->warnings, "%s", life->error);
    }

  n_points = g_variant_n_children (line->pump_curve);
  if (n_points > 0 && n_points < 3 && design->ok)
    rg_warnings_add (&design->warnings, "%s",
                     _("The pump curve has fewer than three points: no duty point is found."));
  en->has_pump = rugosa_pump_fit_init (&fit, line->pump_curve);
  if (en->has_pump && design->ok)
    {
      RgError err = { 0 };

      rg_error_clear (&err);
      /* when new: the same search at age 0, cached with the life sums */
      en->duty_new_ok = life->duty_new_ok;
      en->duty_new_outcome = life->duty_new_outcome;
      en->duty_new_flow_m3_s = life->duty_new_flow_m3_s;
      en->duty_new_head_m = life->duty_new_head_m;
      en->duty_outcome = duty_point (setup, &fit, r->age_years, FALSE, &en->duty_flow_m3_s,
                                     &en->duty_head_m, &err);
      en->duty_ok = en->duty_outcome == RUGOSA_DUTY_FOUND;
      /* at age 0 the two searches are one: said once */
      if (r->age_years > 0.0)
        duty_warning (design, life->duty_new_outcome, TRUE, &life->duty_new_error);
      duty_warning (design, en->duty_outcome, FALSE, &err);
    }
}
