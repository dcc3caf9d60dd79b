/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Results of one line option: every operating point (design, minimum and
 * maximum flow), each when new and at a service age.  Plain data, filled by
 * rugosa_project_get_results(); never holds NaN: a point that could not be
 * computed has ok = FALSE and one sentence in `error`. */
#pragma once

#include <glib.h>

#include "core/line.h"
#include "core/status.h"

G_BEGIN_DECLS

typedef enum {
  RUGOSA_FLOW_DESIGN = 0,
  RUGOSA_FLOW_MINIMUM,
  RUGOSA_FLOW_MAXIMUM,
  RUGOSA_N_FLOWS
} RugosaFlowCase;

/* "design", "minimum", "maximum" */
const char *rugosa_flow_case_id (RugosaFlowCase flow_case);

typedef struct {
  gboolean present;           /* FALSE when the line sets no such flow */
  gboolean ok;
  char error[RG_ERROR_TEXT_MAX];
  RgSubjects error_subjects;  /* the inputs the error is about */
  double flow_m3_s;
  double minor_loss_k_total;  /* ΣK at this Reynolds number (3-K depends on Re) */
  RgLineResult result;        /* at the service age */
  RgLineResult result_new;    /* when new */
  double head_loss_ratio_to_new;
  RgWarnings warnings;        /* at the service age */
  /* The pump at this flow (rugosa-life-cycle.c), when ok: the head it adds,
   * H = total head loss + elevation change (0 when the line falls enough
   * to need no pump), and the power it takes. */
  double pump_head_m;         /* at the service age */
  double hydraulic_power_w;   /* ρ·g·Q·H at the service age */
  double electric_power_w;    /* hydraulic power / pump and motor efficiency */
  double electric_power_new_w; /* the same when new */
  /* The Hazen–Williams C that gives the pipe-friction loss at the service
   * age: the design point of a line of water (or seawater) only. */
  gboolean has_hazen_williams;
  double hazen_williams_c;
  guint hazen_williams_notes; /* RgHazenWilliamsNote bits: outside the usual range */
} RugosaOperatingPoint;

/* How the search for a duty point ended. */
typedef enum {
  RUGOSA_DUTY_NONE = 0,       /* no pump curve of three or more points */
  RUGOSA_DUTY_FOUND,
  RUGOSA_DUTY_PUMP_BELOW,     /* the pump's head is below the line's over
                               * the pump's whole range: no crossing */
  RUGOSA_DUTY_PUMP_ABOVE,     /* … above it up to the pump's largest flow */
  RUGOSA_DUTY_FAILED,         /* the line did not evaluate in that range */
} RugosaDutyOutcome;

/* Pumping energy, costs and the pump's duty point of a line (computed by
 * rugosa-life-cycle.c, whose opening comment gives the methods).  Money is
 * in the project's currency. */
typedef struct {
  gboolean ok;                /* FALSE: a flow case the hours need failed */
  double energy_j_per_year;   /* at the service age */
  double energy_new_j_per_year;
  double cost_per_year;       /* energy cost of a year at the service age */
  double cost_new_per_year;
  gboolean has_capital;       /* a cost per metre or a lump sum is given */
  double capital;
  gboolean life_ok;           /* the sums over the service life */
  double life_energy_cost;    /* summed year by year, not discounted */
  double life_energy_cost_pv; /* its present value */
  double life_cycle_cost;     /* capital + present value of energy */
  gboolean has_pump;          /* a pump curve of three or more points */
  gboolean duty_ok;           /* the curves cross at the service age */
  double duty_flow_m3_s, duty_head_m;
  gboolean duty_new_ok;       /* … and when new */
  double duty_new_flow_m3_s, duty_new_head_m;
  RugosaDutyOutcome duty_outcome, duty_new_outcome;
} RugosaLineEnergy;

typedef struct {
  gboolean ok;                /* FALSE: the line itself is wrong (fluid, pipe …) */
  char error[RG_ERROR_TEXT_MAX];
  RgSubjects error_subjects;  /* the inputs the error is about */
  double age_years;
  double density_kg_m3;
  double dynamic_viscosity_pa_s;
  double inner_diameter_m;
  double roughness_new_m;
  double roughness_m;         /* at age_years */
  double aging_rate_m_per_year;
  RugosaOperatingPoint points[RUGOSA_N_FLOWS];
  RugosaLineEnergy energy;
} RugosaLineResults;

typedef enum {
  RUGOSA_EVAL_FORMAT_TABLE = 0,
  RUGOSA_EVAL_FORMAT_CSV,
  RUGOSA_EVAL_FORMAT_JSON,
} RugosaEvalFormat;

G_END_DECLS
