/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Minor losses by the 3-K method, and by Crane's K = n·f_T.
 *
 * 3-K (method RG_FITTING_METHOD_3K, the default).  Darby, R. (2001),
 * "Correlate pressure drops through fittings", Chemical Engineering 108(4),
 * 127–130; also Darby, Chemical Engineering Fluid Mechanics, 2nd ed. (2001),
 * eq. (7-39):
 *
 *   K = K1/Re + Ki·(1 + Kd/D^0.3),   D the bore in inches (Kd in in^0.3).
 *
 * Darby fitted the method over laminar and turbulent flow and over bores of
 * about 1/2 to 24 in; quoted accuracy about ±10 % (Darby 2001).  Outside that
 * bore range the formula is still computed (it stays finite for any D > 0)
 * and the caller may warn.  Entrances and the exit are Hooper's 2-K values
 * written with Kd = 0 (see data/fittings.json).
 *
 * Crane (method RG_FITTING_METHOD_CRANE_FT), for fittings Darby's table
 * lacks (butterfly valves).  Crane Co., Flow of Fluids Through Valves,
 * Fittings, and Pipe, Technical Paper No. 410, 2009 edition (from memory;
 * not checked against the document):
 *
 *   K = n·f_T,   f_T = 0.25 / [log10(ε/(3.7·D))]²,
 *
 * f_T the Darcy friction factor of clean commercial steel in the zone of
 * complete turbulence (the Re → ∞ limit of Colebrook), ε = 0.0018 in, D the
 * bore; n depends on the valve style and the nominal size band.  We compute
 * f_T from the bore instead of reading Crane's table by nominal size: the
 * table (from memory of the 1988 edition) is up to about 5 % higher than the
 * formula at some sizes (4 in: 0.017 against 0.0163), python3-fluids'
 * ft_Crane (a fit to the 2009 table) is within 1 % of the formula over bores
 * of 1.5–24 in.  The band is chosen by the bore (data/fittings.json says
 * how); outside the stated bore range the nearest band is used and
 * rg_fitting_k_checked warns.  Crane's K does not depend on Re: it is a
 * turbulent-flow value.  Accuracy: Crane states none; treat it as no better
 * than the 3-K method's ±10 %.
 *
 * The constants of both methods are in data/fittings.json (generated into
 * catalog-data.c).
 *
 * Special cases: a plain K (fitting == NULL) is used as given, independent
 * of Re and D.  Counts may be fractional (a share of a fitting) but not
 * negative. */
#include "fittings.h"

#include "catalog.h"
#include "catalog-data.h"
#include "message-private.h"

#include <math.h>
#include <string.h>

/* The 3-K method is published with the bore in inches (1 in = 0.0254 m
 * exactly, international inch 1959). */
static const double INCH_M = 0.0254;

/* Crane's roughness, its largest ε/D and the turbulent Reynolds number,
 * with their sources: fittings.h (RG_FITTING_CRANE_*). */

int
rg_fitting_count (void)
{
  return rg_catalog_fittings_count;
}

const RgFitting *
rg_fitting_at (int index)
{
  if (index < 0 || index >= rg_catalog_fittings_count)
    return NULL;
  return &rg_catalog_fittings[index];
}

static int
equal_fold (const char *a, const char *b)
{
  for (; *a && *b; a++, b++)
    {
      int ca = (unsigned char) *a, cb = (unsigned char) *b;
      if (ca >= 'A' && ca <= 'Z')
        ca += 'a' - 'A';
      if (cb >= 'A' && cb <= 'Z')
        cb += 'a' - 'A';
      if (ca != cb)
        return 0;
    }
  return *a == *b;
}

static const char *
fitting_id_at (int i)
{
  return rg_catalog_fittings[i].id;
}

RgStatus
rg_fitting_lookup (const char *id, const RgFitting **out, RgError *err)
{
  char near[160];

  if (id == NULL)
    id = "";
  for (int i = 0; i < rg_catalog_fittings_count; i++)
    if (equal_fold (id, rg_catalog_fittings[i].id))
      {
        *out = &rg_catalog_fittings[i];
        return RG_OK;
      }
  rg_catalog_closest (id, fitting_id_at, rg_catalog_fittings_count, near,
                      sizeof near);
  return rg_error_set_on (err, RG_ERR_NOT_FOUND, RG_ON (FITTING),
                          "Unknown fitting \"%.40s\"; the closest are %s.", id, near);
}

RgStatus
rg_fitting_crane_ft (double diameter_m, double *ft, RgError *err)
{
  char lo[RG_VALUE_MAX], v[RG_VALUE_MAX];

  if (!isfinite (diameter_m) || diameter_m <= 0.0)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (DIAMETER),
                            "The inner diameter for the fitting loss must be a positive number.");
  if (RG_FITTING_CRANE_ROUGHNESS_M / diameter_m > RG_FITTING_CRANE_RR_MAX)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (DIAMETER),
                            "Crane's friction factor f_T needs a bore of at least %s, not %s.",
                            RG_ERR_VALUE (err, RG_QTY_LENGTH,
                                          RG_FITTING_CRANE_BORE_MIN_M, lo),
                            RG_ERR_VALUE (err, RG_QTY_LENGTH, diameter_m, v));
  /* Crane TP-410 (2009): the fully rough limit of Colebrook. */
  const double lg = log10 (RG_FITTING_CRANE_ROUGHNESS_M / (3.7 * diameter_m));
  *ft = 0.25 / (lg * lg);
  return RG_OK;
}

/* The band of a Crane row holding the bore; `outside` tells whether the
 * bore lies outside the stated range (then the nearest band is returned). */
static int
crane_band (const RgFitting *f, double diameter_m, int *outside)
{
  const int last = f->n_bands - 1;

  *outside = 0;
  if (diameter_m < f->min_bore_m)
    {
      *outside = 1;
      return 0;
    }
  for (int i = 0; i < last; i++)
    if (diameter_m <= f->band_max_bore_m[i])
      return i;
  *outside = diameter_m > f->band_max_bore_m[last];
  return last;
}

RgStatus
rg_fitting_k_checked (const RgFitting *fitting, double re, double diameter_m,
                      double *k, RgWarnings *warnings, RgError *err)
{
  double kf;

  if (fitting == NULL)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (FITTING),
                            "No fitting was given.");
  if (!isfinite (re) || re <= 0.0)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (REYNOLDS),
                            "The Reynolds number for the fitting loss must be a positive number.");
  if (!isfinite (diameter_m) || diameter_m <= 0.0)
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (DIAMETER),
                            "The inner diameter for the fitting loss must be a positive number.");

  if (fitting->method == RG_FITTING_METHOD_CRANE_FT)
    {
      double ft = 0.0; /* for clang-analyzer: rg_error_set never returns RG_OK */
      int outside, band;
      RgStatus st;

      if (fitting->n_bands < 1 || fitting->n_bands > RG_FITTING_BANDS_MAX)
        return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (FITTING),
                                "The fitting \"%s\" has no size bands.", fitting->id);
      if ((st = rg_fitting_crane_ft (diameter_m, &ft, err)) != RG_OK)
        return st;
      band = crane_band (fitting, diameter_m, &outside);
      kf = fitting->band_n[band] * ft;
      if (outside && warnings != NULL)
        {
          char d[RG_VALUE_MAX], lo[RG_VALUE_MAX], hi[RG_VALUE_MAX];
          /* TRANSLATORS: the first %s is a fitting's catalog id, the last
           * a nominal size band as published ("NPS 2–8"). */
          rg_warnings_add (warnings,
                           "%s: the bore %s is outside the published sizes (%s to %s); K uses the %s value.",
                           fitting->id,
                           RG_WARN_VALUE (warnings, RG_QTY_LENGTH, diameter_m, d),
                           RG_WARN_VALUE (warnings, RG_QTY_LENGTH, fitting->min_bore_m, lo),
                           RG_WARN_VALUE (warnings, RG_QTY_LENGTH,
                                          fitting->band_max_bore_m[fitting->n_bands - 1], hi),
                           fitting->band_nominal[band]);
        }
      if (re < RG_FITTING_CRANE_RE_TURBULENT_MIN)
        /* TRANSLATORS: %s is a fitting's catalog id. */
        rg_warnings_add (warnings,
                         "%s: Crane's K is a turbulent-flow value; at Re = %.3g the loss may be larger.",
                         fitting->id, re);
    }
  else
    {
      const double d_in = diameter_m / INCH_M;
      kf = fitting->k1 / re + fitting->ki * (1.0 + fitting->kd / pow (d_in, 0.3));
    }
  if (!isfinite (kf))
    return rg_error_set_on (err, RG_ERR_NUMERIC,
                            RG_ON (FITTING) | RG_ON (REYNOLDS) | RG_ON (DIAMETER),
                            "The loss coefficient of \"%s\" is too large to compute.",
                            fitting->id);
  *k = kf;
  return RG_OK;
}

RgStatus
rg_fitting_k (const RgFitting *fitting, double re, double diameter_m,
              double *k, RgError *err)
{
  return rg_fitting_k_checked (fitting, re, diameter_m, k, NULL, err);
}

/* Adds the new warnings of `fresh` to `out`, each distinct sentence once
 * (a fitting listed twice warns once). */
static void
merge_warnings (RgWarnings *out, const RgWarnings *fresh)
{
  for (int i = 0; i < fresh->count; i++)
    {
      int seen = 0;
      for (int j = 0; j < out->count && !seen; j++)
        seen = strcmp (out->text[j], fresh->text[i]) == 0;
      if (!seen)
        rg_warnings_add (out, "%s", fresh->text[i]);
    }
}

RgStatus
rg_fittings_k_sum_checked (const RgFittingUse *uses, int n, double re,
                           double diameter_m, double *k_sum,
                           RgWarnings *warnings, RgError *err)
{
  double sum = 0.0;
  RgStatus st;

  if (n < 0 || (n > 0 && uses == NULL))
    return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (FITTING),
                            "The fitting list is not valid.");
  for (int i = 0; i < n; i++)
    {
      const RgFittingUse *u = &uses[i];
      double k = 0.0; /* for clang-analyzer: rg_error_set never returns RG_OK */
      RgWarnings own = { 0 };

      own.units = warnings != NULL ? warnings->units : NULL;
      if (!isfinite (u->count) || u->count < 0.0)
        return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (FITTING),
                                "Fitting %d: the count must be zero or a positive number.",
                                i + 1);
      if (u->fitting == NULL)
        {
          if (!isfinite (u->k_plain) || u->k_plain < 0.0)
            return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (FITTING),
                                    "Fitting %d: the loss coefficient K must be zero or a positive number.",
                                    i + 1);
          k = u->k_plain;
        }
      else if ((st = rg_fitting_k_checked (u->fitting, re, diameter_m, &k, &own, err)) != RG_OK)
        return st;
      if (warnings != NULL && u->count > 0.0)
        merge_warnings (warnings, &own);
      sum += u->count * k;
    }
  if (!isfinite (sum))
    return rg_error_set_on (err, RG_ERR_NUMERIC, RG_ON (FITTING),
                            "The sum of the fitting loss coefficients is too large to compute.");
  *k_sum = sum;
  return RG_OK;
}

RgStatus
rg_fittings_k_sum (const RgFittingUse *uses, int n, double re,
                   double diameter_m, double *k_sum, RgError *err)
{
  return rg_fittings_k_sum_checked (uses, n, re, diameter_m, k_sum, NULL, err);
}
