/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Minor losses: the 3-K method (Darby 1999/2001) and plain K values. */
#pragma once

#include "status.h"

typedef struct {
  const char *id;     /* "elbow-90-standard" … */
  const char *name;   /* for people */
  double k1, ki, kd;  /* Darby 3-K constants; kd in inch^0.3 as published */
  const char *source;
} RgFitting;

int rg_fitting_count (void);
const RgFitting *rg_fitting_at (int index);
RgStatus rg_fitting_lookup (const char *id, const RgFitting **out,
                            RgError *err);

/* K = K1/Re + Ki·(1 + Kd/D_in^0.3), D_in the inner diameter in inches. */
RgStatus rg_fitting_k (const RgFitting *fitting, double re, double diameter_m,
                       double *k, RgError *err);

/* One entry of a line's fitting list: a catalog fitting, or a plain K
 * (fitting == NULL, k_plain used) — either with a count ≥ 0. */
typedef struct {
  const RgFitting *fitting;
  double k_plain;
  double count;
} RgFittingUse;

RgStatus rg_fittings_k_sum (const RgFittingUse *uses, int n, double re,
                            double diameter_m, double *k_sum, RgError *err);
