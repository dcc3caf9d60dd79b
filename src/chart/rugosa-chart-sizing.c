/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The bridge from a sizing to the chart's ladder (see
 * rugosa-chart-sizing.h).  No computation: the points are the model's. */
#include "config.h"

#include "rugosa-chart-sizing.h"

RugosaChartRung *
rugosa_chart_ladder_from_sizing (const RugosaSizing *sizing, gboolean aged,
                                 const gboolean *selected, size_t *n_rungs)
{
  RugosaChartRung *rungs = g_new0 (RugosaChartRung, MAX (sizing->n_candidates, 1));
  size_t n = 0;

  for (guint i = 0; i < sizing->n_candidates; i++)
    {
      const RugosaSizingCandidate *c = &sizing->candidates[i];
      const RugosaOperatingPoint *p = &c->results.points[RUGOSA_FLOW_DESIGN];
      const RgLineResult *r;

      if (!c->results.ok || !p->ok)
        continue;
      r = aged ? &p->result : &p->result_new;
      rungs[n].label = c->pipe->designation;
      rungs[n].re = r->reynolds;
      rungs[n].f = r->friction.f;
      rungs[n].rr = r->relative_roughness;
      rungs[n].passes = c->passes;
      rungs[n].recommended = (int) i == sizing->recommended;
      rungs[n].selected = selected != NULL && selected[i];
      n++;
    }
  *n_rungs = n;
  return rungs;
}
