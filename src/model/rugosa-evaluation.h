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
  /* The Hazen–Williams C that gives the pipe-friction loss at the service
   * age: the design point of a line of water (or seawater) only. */
  gboolean has_hazen_williams;
  double hazen_williams_c;
  guint hazen_williams_notes; /* RgHazenWilliamsNote bits: outside the usual range */
} RugosaOperatingPoint;

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
} RugosaLineResults;

typedef enum {
  RUGOSA_EVAL_FORMAT_TABLE = 0,
  RUGOSA_EVAL_FORMAT_CSV,
  RUGOSA_EVAL_FORMAT_JSON,
} RugosaEvalFormat;

G_END_DECLS
