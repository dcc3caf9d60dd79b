/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Minor losses: the 3-K method (Darby 1999/2001), Crane's K = n·f_T for
 * fittings the 3-K table lacks (butterfly valves), and plain K values. */
#pragma once

#include "status.h"

/* How a catalog fitting's K is computed.  Zero (3-K) is the default, so a
 * row that sets only the 3-K constants is a 3-K row. */
typedef enum {
  RG_FITTING_METHOD_3K = 0, /* K = K1/Re + Ki·(1 + Kd/D_in^0.3) */
  RG_FITTING_METHOD_CRANE_FT, /* K = n·f_T(D), n by size band */
} RgFittingMethod;

enum { RG_FITTING_BANDS_MAX = 4 };

typedef struct {
  const char *id;     /* "elbow-90-standard" … */
  const char *name;   /* for people */
  double k1, ki, kd;  /* Darby 3-K constants; kd in inch^0.3 as published;
                       * all zero for a Crane row */
  const char *source;
  /* Crane rows (method RG_FITTING_METHOD_CRANE_FT) only: */
  RgFittingMethod method;
  int n_bands;                                  /* 1 … RG_FITTING_BANDS_MAX */
  const char *band_nominal[RG_FITTING_BANDS_MAX]; /* "NPS 2–8" as published */
  double band_max_bore_m[RG_FITTING_BANDS_MAX]; /* upper bore of band i, ascending */
  double band_n[RG_FITTING_BANDS_MAX];          /* Crane's multiplier n of band i */
  double min_bore_m;  /* lower end of the stated range (upper end: the last band's max) */
} RgFitting;

int rg_fitting_count (void);
const RgFitting *rg_fitting_at (int index);
RgStatus rg_fitting_lookup (const char *id, const RgFitting **out,
                            RgError *err);

/* Clean commercial steel for Crane's f_T: ε = 0.0018 in (from memory of
 * Crane TP-410, 2009 ed.; python3-fluids' K_butterfly_valve_Crane docstring
 * gives the same value). */
#define RG_FITTING_CRANE_ROUGHNESS_M (0.0018 * 0.0254)
/* f_T is computed for relative roughness up to 0.05, the largest curve of
 * Moody's chart (from memory of Moody 1944, Trans. ASME 66; the limit is
 * our choice): a bore below 20·ε = 0.9144 mm is refused. */
#define RG_FITTING_CRANE_RR_MAX 0.05
#define RG_FITTING_CRANE_BORE_MIN_M \
  (RG_FITTING_CRANE_ROUGHNESS_M / RG_FITTING_CRANE_RR_MAX)
/* Below this Reynolds number Crane's turbulent K is flagged.  Common
 * practice (no single source): flow is taken as fully turbulent from
 * Re ≈ 4000, as in the project's default transition settings. */
#define RG_FITTING_CRANE_RE_TURBULENT_MIN 4000.0

/* Crane's friction factor of clean commercial steel in the zone of complete
 * turbulence for a bore of `diameter_m`: f_T = 0.25/[log10(ε/(3.7·D))]²,
 * ε = RG_FITTING_CRANE_ROUGHNESS_M.  Fails (RG_ERR_DOMAIN) unless
 * ε/D ≤ RG_FITTING_CRANE_RR_MAX, i.e. D ≥ RG_FITTING_CRANE_BORE_MIN_M
 * (0.9144 mm). */
RgStatus rg_fitting_crane_ft (double diameter_m, double *ft, RgError *err);

/* The loss coefficient of one fitting in a line of inner diameter
 * `diameter_m` at Reynolds number `re`:
 *   3-K:      K = K1/Re + Ki·(1 + Kd/D_in^0.3), D_in in inches;
 *   Crane:    K = n·f_T, n of the band holding the bore (the nearest band
 *             outside the stated range), independent of Re. */
RgStatus rg_fitting_k (const RgFitting *fitting, double re, double diameter_m,
                       double *k, RgError *err);

/* As rg_fitting_k, and adds to `warnings` (may be NULL) when a Crane
 * fitting is used outside its stated bore range (the nearest band was used)
 * or below Re = 4000 (Crane's K is a turbulent-flow value).  3-K rows give
 * no warning: the method covers laminar and turbulent flow. */
RgStatus rg_fitting_k_checked (const RgFitting *fitting, double re,
                               double diameter_m, double *k,
                               RgWarnings *warnings, RgError *err);

/* One entry of a line's fitting list: a catalog fitting, or a plain K ≥ 0
 * (fitting == NULL, k_plain used) — either with a count ≥ 0. */
typedef struct {
  const RgFitting *fitting;
  double k_plain;
  double count;
} RgFittingUse;

RgStatus rg_fittings_k_sum (const RgFittingUse *uses, int n, double re,
                            double diameter_m, double *k_sum, RgError *err);

/* As rg_fittings_k_sum, with the warnings of rg_fitting_k_checked for each
 * catalog fitting with a count > 0 (each distinct sentence once). */
RgStatus rg_fittings_k_sum_checked (const RgFittingUse *uses, int n,
                                    double re, double diameter_m,
                                    double *k_sum, RgWarnings *warnings,
                                    RgError *err);
