/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Shared by the files of the core that write sentences: the values in an
 * error or a warning are written in the units the caller chose
 * (RgError.units, RgWarnings.units; NULL: SI) by rg_units_format. */
#pragma once

#include "status.h"
#include "units.h"

/* Room for one value written by rg_units_format ("−1.235e+05 mm²/s"). */
enum { RG_VALUE_MAX = 48 };

static inline const RgUnitChoice *
rg_error_units (const RgError *err)
{
  return err != NULL ? err->units : NULL;
}

static inline const RgUnitChoice *
rg_warnings_units (const RgWarnings *w)
{
  return w != NULL ? w->units : NULL;
}

/* A value of quantity q (SI) written in the units of an error or of the
 * warnings into `buf`, a char array of RG_VALUE_MAX. */
#define RG_ERR_VALUE(err, q, si, buf) \
  rg_units_format (rg_error_units (err), (q), (si), (buf), sizeof (buf))
#define RG_WARN_VALUE(w, q, si, buf) \
  rg_units_format (rg_warnings_units (w), (q), (si), (buf), sizeof (buf))

/* Shorthands for one subject and for the set of several. */
#define RG_ON(s) RG_SUBJECT_BIT (RG_SUBJECT_##s)
