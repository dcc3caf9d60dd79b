/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Minor losses by the 3-K method.
 *
 * Darby, R. (2001), "Correlate pressure drops through fittings", Chemical
 * Engineering 108(4), 127–130; also Darby, Chemical Engineering Fluid
 * Mechanics, 2nd ed. (2001), eq. (7-39):
 *
 *   K = K1/Re + Ki·(1 + Kd/D^0.3),   D the bore in inches (Kd in in^0.3).
 *
 * The constants are in data/fittings.json (generated into catalog-data.c).
 * Darby fitted the method over laminar and turbulent flow and over bores of
 * about 1/2 to 24 in; quoted accuracy about ±10 % (Darby 2001).  Outside that
 * bore range the formula is still computed (it stays finite for any D > 0)
 * and the caller may warn.  Entrances and the exit are Hooper's 2-K values
 * written with Kd = 0 (see data/fittings.json).
 *
 * Special cases: a plain K (fitting == NULL) is used as given, independent
 * of Re and D.  Counts may be fractional (a share of a fitting) but not
 * negative. */
#include "fittings.h"

#include "catalog.h"
#include "catalog-data.h"

#include <math.h>

/* The 3-K method is published with the bore in inches (1 in = 0.0254 m
 * exactly, international inch 1959). */
static const double INCH_M = 0.0254;

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
  return rg_error_set (err, RG_ERR_NOT_FOUND,
                       "Unknown fitting \"%.40s\"; the closest are %s.", id, near);
}

RgStatus
rg_fitting_k (const RgFitting *fitting, double re, double diameter_m,
              double *k, RgError *err)
{
  if (fitting == NULL)
    return rg_error_set (err, RG_ERR_DOMAIN, "No fitting was given.");
  if (!isfinite (re) || re <= 0.0)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The Reynolds number for the fitting loss must be a positive number.");
  if (!isfinite (diameter_m) || diameter_m <= 0.0)
    return rg_error_set (err, RG_ERR_DOMAIN,
                         "The inner diameter for the fitting loss must be a positive number (m).");

  const double d_in = diameter_m / INCH_M;
  const double kf = fitting->k1 / re + fitting->ki * (1.0 + fitting->kd / pow (d_in, 0.3));
  if (!isfinite (kf))
    return rg_error_set (err, RG_ERR_NUMERIC,
                         "The loss coefficient of \"%s\" is too large to compute: check the Reynolds number and diameter.",
                         fitting->id);
  *k = kf;
  return RG_OK;
}

RgStatus
rg_fittings_k_sum (const RgFittingUse *uses, int n, double re,
                   double diameter_m, double *k_sum, RgError *err)
{
  double sum = 0.0;
  RgStatus st;

  if (n < 0 || (n > 0 && uses == NULL))
    return rg_error_set (err, RG_ERR_DOMAIN, "The fitting list is not valid.");
  for (int i = 0; i < n; i++)
    {
      const RgFittingUse *u = &uses[i];
      double k = 0.0; /* for clang-analyzer: rg_error_set never returns RG_OK */

      if (!isfinite (u->count) || u->count < 0.0)
        return rg_error_set (err, RG_ERR_DOMAIN,
                             "Fitting %d: the count must be zero or a positive number.",
                             i + 1);
      if (u->fitting == NULL)
        {
          if (!isfinite (u->k_plain) || u->k_plain < 0.0)
            return rg_error_set (err, RG_ERR_DOMAIN,
                                 "Fitting %d: the loss coefficient K must be zero or a positive number.",
                                 i + 1);
          k = u->k_plain;
        }
      else if ((st = rg_fitting_k (u->fitting, re, diameter_m, &k, err)) != RG_OK)
        return st;
      sum += u->count * k;
    }
  if (!isfinite (sum))
    return rg_error_set (err, RG_ERR_NUMERIC,
                         "The sum of the fitting loss coefficients is too large to compute.");
  *k_sum = sum;
  return RG_OK;
}
