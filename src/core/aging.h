/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Roughness growth with service age: the linear model of Colebrook and
 * White (1937), ε(t) = ε₀ + α·t. */
#pragma once

#include "line.h"
#include "status.h"

/* The oldest service age computed: a century and a half covers any pipe
 * still in service (common practice, no single source). */
#define RG_AGING_AGE_MAX_YEARS 150.0
/* The largest roughness growth rate accepted, 10 mm per year: about three
 * times the top of the fastest published class (Lamont 1981, water group
 * 5: 1–3 mm/yr, data/aging.json), so that a rate in the wrong unit (m/yr
 * for mm/yr) is caught (common practice, no single source). */
#define RG_AGING_RATE_MAX_M_PER_YEAR 0.01

typedef struct {
  const char *id;            /* stable key */
  const char *name;          /* for people */
  double rate_m_per_year;    /* α, the typical rate of the class */
  double rate_min_m_per_year; /* the published spread of the class */
  double rate_max_m_per_year;
  const char *source;
} RgAgingClass;

int rg_aging_class_count (void);
const RgAgingClass *rg_aging_class_at (int index);
RgStatus rg_aging_class_lookup (const char *id, const RgAgingClass **out,
                                RgError *err);

/* ε(t) = ε₀ + α·t, for 0 ≤ α ≤ RG_AGING_RATE_MAX_M_PER_YEAR and
 * 0 ≤ t ≤ RG_AGING_AGE_MAX_YEARS. */
RgStatus rg_aging_roughness (double roughness_new_m, double rate_m_per_year,
                             double age_years, double *roughness_m,
                             RgError *err);

typedef struct {
  double roughness_m;            /* ε(t) */
  RgLineResult result;           /* the line at age t */
  RgLineResult result_new;       /* the line when new */
  double head_loss_ratio_to_new; /* h_total(t) / h_total(0) */
  double head_loss_rate_m_per_year; /* d h_total / dt at t */
} RgAgingResult;

/* `in` describes the line when new (in->roughness_m = ε₀). */
RgStatus rg_aging_evaluate (const RgLineInput *in, double rate_m_per_year,
                            double age_years, RgAgingResult *out,
                            RgError *err);
