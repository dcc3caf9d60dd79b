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

/* The input an error is about, so that each face (a CLI option, a field of
 * the window, a key of the project file) can point at its own control
 * without reading the sentence.  An error may concern several inputs (a
 * relative roughness too large: the roughness and the diameter), so an
 * error carries a set of subjects (RgSubjects, one bit per RgSubject).
 * Subjects name what the user can change: a Reynolds number out of range
 * in a line evaluation names the flow, the diameter and the fluid's state,
 * not only RG_SUBJECT_REYNOLDS. */
typedef enum {
  RG_SUBJECT_NONE = 0,
  /* the line */
  RG_SUBJECT_FLOW,
  RG_SUBJECT_DIAMETER,
  RG_SUBJECT_LENGTH,
  RG_SUBJECT_ROUGHNESS,
  RG_SUBJECT_ELEVATION,
  RG_SUBJECT_FITTING,        /* a catalog fitting, its count or a plain K */
  RG_SUBJECT_K_SUM,          /* a ΣK given as one number */
  RG_SUBJECT_MATERIAL,       /* a catalog material name */
  RG_SUBJECT_PIPE,           /* a pipe designation */
  RG_SUBJECT_AGING_CLASS,    /* a catalog aging class name */
  RG_SUBJECT_AGING_RATE,     /* a roughness growth rate */
  RG_SUBJECT_AGE,            /* a service age */
  /* the fluid */
  RG_SUBJECT_FLUID,          /* the fluid kind */
  RG_SUBJECT_TEMPERATURE,
  RG_SUBJECT_PRESSURE,
  RG_SUBJECT_SALINITY,
  RG_SUBJECT_DENSITY,        /* a custom fluid's density */
  RG_SUBJECT_VISCOSITY,      /* a custom fluid's viscosity */
  RG_SUBJECT_OIL_T1,
  RG_SUBJECT_OIL_NU1,
  RG_SUBJECT_OIL_T2,
  RG_SUBJECT_OIL_NU2,
  RG_SUBJECT_OIL_DENSITY_REF,
  RG_SUBJECT_OIL_T_REF,
  RG_SUBJECT_OIL_EXPANSION,
  /* the method */
  RG_SUBJECT_MODEL,          /* the friction model name */
  RG_SUBJECT_RE_LAMINAR_MAX,
  RG_SUBJECT_RE_TURBULENT_MIN,
  /* dimensionless arguments of the friction functions */
  RG_SUBJECT_REYNOLDS,
  RG_SUBJECT_RELATIVE_ROUGHNESS,
  /* targets of the inverse problems */
  RG_SUBJECT_HEAD_LOSS,
  /* a unit or number text whose quantity is given by the caller */
  RG_SUBJECT_VALUE,
  RG_SUBJECT_N
} RgSubject;

typedef unsigned long long RgSubjects;
#define RG_SUBJECT_BIT(s) (1ULL << (unsigned) (s))

/* The unit to write each quantity in (units.h); NULL means SI. */
struct RgUnitChoice;

/* Start every RgError and RgWarnings from zero (`RgError err = { 0 };`):
 * the core reads `units` before it writes a sentence, and the clear
 * functions keep it. */
typedef struct {
  RgStatus status;
  RgSubjects subjects;       /* 0 only for a misuse of the API (a NULL
                              * argument, an unknown enum value): no input a
                              * user can change is at fault */
  /* Set by the caller before a call: the values and ranges in the sentence
   * are written in these units (rg_units_format); NULL: SI. */
  const struct RgUnitChoice *units;
  char text[RG_ERROR_TEXT_MAX];
} RgError;

/* The translation of a short text of the core in the "rugosa" catalog
 * (dgettext when built with RG_ENABLE_NLS), else `msgid` itself.
 * rg_error_set, rg_error_set_on and rg_warnings_add look their format up
 * the same way. */
const char *rg_gettext (const char *msgid);

/* Marks a string of a table for translation without translating it there
 * (the xgettext keyword RG_N_ in po/meson.build, like GLib's N_); the code
 * that uses the string passes it through rg_gettext. */
#define RG_N_(text) (text)

/* Fill `err` (if not NULL) and return `status`; the format is translated
 * (rg_gettext) before formatting.  The error names no subject: for callers
 * outside the core (the core itself uses rg_error_set_on). */
RgStatus rg_error_set (RgError *err, RgStatus status, const char *fmt, ...)
  __attribute__ ((format (printf, 3, 4)));

/* As rg_error_set, and records the inputs the error is about. */
RgStatus rg_error_set_on (RgError *err, RgStatus status, RgSubjects subjects,
                          const char *fmt, ...)
  __attribute__ ((format (printf, 4, 5)));

/* Adds subjects to an error already set (a caller that knows more inputs
 * behind a derived value, e.g. the flow and diameter behind a Reynolds
 * number); returns err->status. */
RgStatus rg_error_add_subjects (RgError *err, RgSubjects subjects);

/* A stable identifier of one subject ("flow", "oil-t1", …) for logs and
 * tests; "" for RG_SUBJECT_NONE. */
const char *rg_subject_id (RgSubject subject);

/* Empties the status, the subjects and the text; keeps `units`. */
void rg_error_clear (RgError *err);

/* Short non-fatal remarks (outside a correlation's stated range, high
 * velocity, compressibility): a fixed list so the core needs no allocation. */
enum { RG_WARNINGS_MAX = 8, RG_WARNING_TEXT_MAX = RG_ERROR_TEXT_MAX };

typedef struct {
  int count;
  /* as RgError's: the units of the values in the sentences; NULL: SI */
  const struct RgUnitChoice *units;
  char text[RG_WARNINGS_MAX][RG_WARNING_TEXT_MAX];
} RgWarnings;

/* Removes every sentence; keeps `units`. */
void rg_warnings_clear (RgWarnings *w);
void rg_warnings_add (RgWarnings *w, const char *fmt, ...)
  __attribute__ ((format (printf, 2, 3)));

/* True when x is a finite number (not NaN, not infinite). */
int rg_is_finite (double x);
