/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Status codes and error text shared by every function of the core.
 *
 * A core function that can fail returns an RgStatus and, when `err` is not
 * NULL, fills it with one sentence a person can act on (which value, which
 * range), on one line and in valid UTF-8 (rg_error_set turns control
 * characters and bytes of broken UTF-8 into '?').  The core never hands
 * back NaN or infinity: a non-finite result is
 * reported as RG_ERR_NUMERIC instead. */
#pragma once

#include <stddef.h>

typedef enum {
  RG_OK = 0,
  RG_ERR_DOMAIN,    /* an argument lies outside the valid range */
  RG_ERR_PARSE,     /* text is not a number or a known designation */
  RG_ERR_UNIT,      /* unknown unit, or a unit of the wrong kind */
  RG_ERR_NOT_FOUND, /* a catalog name that is not in the catalog */
  RG_ERR_NUMERIC,   /* a non-finite intermediate value or a solver failure */
} RgStatus;

enum { RG_ERROR_TEXT_MAX = 320 };

typedef struct {
  RgStatus status;
  char text[RG_ERROR_TEXT_MAX];
} RgError;

/* The translation of a short text of the core in the "rugosa" catalog
 * (dgettext when built with RG_ENABLE_NLS), else `msgid` itself.
 * rg_error_set and rg_warnings_add look their format up the same way. */
const char *rg_gettext (const char *msgid);

/* Fill `err` (if not NULL) and return `status`; the format is translated
 * (rg_gettext) before formatting. */
RgStatus rg_error_set (RgError *err, RgStatus status, const char *fmt, ...)
  __attribute__ ((format (printf, 3, 4)));

void rg_error_clear (RgError *err);

/* Short non-fatal remarks (outside a correlation's stated range, high
 * velocity, compressibility): a fixed list so the core needs no allocation. */
enum { RG_WARNINGS_MAX = 8, RG_WARNING_TEXT_MAX = 200 };

typedef struct {
  int count;
  char text[RG_WARNINGS_MAX][RG_WARNING_TEXT_MAX];
} RgWarnings;

void rg_warnings_clear (RgWarnings *w);
void rg_warnings_add (RgWarnings *w, const char *fmt, ...)
  __attribute__ ((format (printf, 2, 3)));

/* True when x is a finite number (not NaN, not infinite). */
int rg_is_finite (double x);
