/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Invented line options for the chart's tests and benchmark.  Each point is
 * consistent with the core's friction functions (Colebrook in turbulent
 * flow, 64/Re in laminar flow, both in the transitional range); names and
 * readouts are made up and only have to look like what the app formats. */
#pragma once

#include <glib.h>
#include <math.h>
#include <stdio.h>

#include "core/friction.h"
#include "core/regime.h"
#include "rugosa-chart.h"

/* Up to a thousand lines: the crowded scenes of the placement test and
 * the benchmark. */
enum { SAMPLE_TRAIL = 6, SAMPLE_MAX = 1000 };

typedef struct {
  RugosaChartLine lines[SAMPLE_MAX];
  RugosaChartPoint trails[SAMPLE_MAX][SAMPLE_TRAIL];
  char names[SAMPLE_MAX][48];
  char vel[SAMPLE_MAX][32], h100[SAMPLE_MAX][32], htot[SAMPLE_MAX][32];
  size_t n;
} SampleSet;

/* Colours for up to eight lines, apart in lightness as well as hue. */
static const RugosaChartRgba SAMPLE_COLOURS[] = {
  { 0.80, 0.40, 0.00, 1 }, { 0.00, 0.45, 0.70, 1 }, { 0.00, 0.60, 0.45, 1 },
  { 0.80, 0.47, 0.65, 1 }, { 0.34, 0.24, 0.60, 1 }, { 0.90, 0.62, 0.00, 1 },
  { 0.35, 0.70, 0.90, 1 }, { 0.45, 0.45, 0.45, 1 },
};

G_GNUC_UNUSED static double
sample_f (double re, double rr, RgRegime regime, double *f_lam, double *f_turb)
{
  double f = 64.0 / re;
  *f_lam = 64.0 / re;
  *f_turb = 0;
  if (regime != RG_REGIME_LAMINAR)
    {
      g_assert_cmpint (rg_friction_colebrook (fmax (re, RG_FRICTION_RE_MIN), rr, f_turb, NULL), ==, RG_OK);
      f = *f_turb;
    }
  return f;
}

/* One line option at (re, rr_new), aged to rr_new·growth. */
G_GNUC_UNUSED static void
sample_add (SampleSet *s, const char *name, double re, double rr_new,
            double growth, int selected)
{
  const size_t i = s->n++;
  RugosaChartLine *l = &s->lines[i];
  RgTransition t;
  rg_transition_default (&t);
  memset (l, 0, sizeof *l);
  g_strlcpy (s->names[i], name, sizeof s->names[i]);
  l->name = s->names[i];
  l->colour = SAMPLE_COLOURS[i % G_N_ELEMENTS (SAMPLE_COLOURS)];
  l->rr_new = rr_new;
  l->rr_aged = fmin (rr_new * growth, RG_FRICTION_RR_MAX);
  l->regime = rg_regime_classify (&t, re);
  l->re = re;
  l->f = sample_f (re, l->rr_aged, l->regime, &l->f_laminar, &l->f_turbulent);
  l->has_flow_min = l->has_flow_max = 1;
  l->flow_min.re = re * 0.55;
  l->flow_max.re = re * 1.5;
  double a, b;
  RgRegime r0 = rg_regime_classify (&t, l->flow_min.re), r1 = rg_regime_classify (&t, l->flow_max.re);
  l->flow_min.f = sample_f (l->flow_min.re, l->rr_aged, r0, &a, &b);
  l->flow_max.f = sample_f (l->flow_max.re, l->rr_aged, r1, &a, &b);
  for (int k = 0; k < SAMPLE_TRAIL; k++)
    {
      /* aging at a constant flow: the Reynolds number stays, f grows */
      const double rr = fmin (RG_FRICTION_RR_MAX, rr_new * pow (l->rr_aged / fmax (rr_new, 1e-12), (double) k / (SAMPLE_TRAIL - 1)));
      s->trails[i][k].re = re;
      s->trails[i][k].f = sample_f (re, rr_new > 0 ? rr : 0, l->regime == RG_REGIME_LAMINAR
                                                           ? RG_REGIME_LAMINAR : RG_REGIME_TURBULENT, &a, &b);
    }
  l->trail = s->trails[i];
  l->n_trail = l->regime == RG_REGIME_TURBULENT && growth > 1 ? SAMPLE_TRAIL : 0;
  /* made-up display strings of the usual shape */
  snprintf (s->vel[i], sizeof s->vel[i], "v = %.2f m/s", 0.4 + fmod (re * 1e-5, 2.6));
  snprintf (s->h100[i], sizeof s->h100[i], "Δh = %.2f m/100 m", l->f * 60.0);
  snprintf (s->htot[i], sizeof s->htot[i], "Δh total = %.1f m", l->f * 410.0);
  l->readout_velocity = s->vel[i];
  l->readout_head_per_100m = s->h100[i];
  l->readout_head_total = s->htot[i];
  l->selected = selected;
}

/* A scene of invented options, as a design meeting might compare. */
G_GNUC_UNUSED static void
sample_scene (SampleSet *s)
{
  s->n = 0;
  sample_add (s, "Option A · DN200 steel", 3.1e5, 2.3e-4, 4.0, 1);
  sample_add (s, "Option B · DN150 steel", 4.2e5, 3.0e-4, 4.0, 0);
  sample_add (s, "Option C · DN250 PE", 2.5e5, 6.0e-6, 1.0, 0);
  sample_add (s, "Bypass · DN50 copper", 2900, 3.0e-5, 1.0, 0);
  sample_add (s, "Old main · DN300 cast iron", 6.0e5, 8.5e-4, 3.0, 0);
  sample_add (s, "Glycol loop · DN25", 1200, 6.0e-5, 1.0, 0);
}

/* Crowded random scenes: n lines spread over the turbulent range. */
G_GNUC_UNUSED static void
sample_random (SampleSet *s, GRand *rand, size_t n)
{
  char name[48];
  s->n = 0;
  for (size_t i = 0; i < n && i < SAMPLE_MAX; i++)
    {
      const double re = pow (10.0, g_rand_double_range (rand, 3.0, 7.7));
      const double rr = pow (10.0, g_rand_double_range (rand, -5.5, -1.6));
      snprintf (name, sizeof name, "Line %zu%s", i + 1,
                g_rand_boolean (rand) ? " · DN100" : "");
      sample_add (s, name, re, rr, g_rand_double_range (rand, 1.0, 5.0),
                  i == 0);
    }
}
