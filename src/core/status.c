/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Errors and warnings of the core.
 *
 * Translation: when built with RG_ENABLE_NLS (the C library provides
 * dgettext, as glibc does), the format string is looked up in the "rugosa"
 * message catalog before formatting, so every sentence of the core can be
 * translated without the core knowing about locales.  The program that links
 * the core binds the domain (bindtextdomain) and sets the locale; when it
 * does neither, dgettext returns the English text unchanged.  Without
 * RG_ENABLE_NLS the English text is used as it is. */
#include "status.h"

#include <math.h>
#include <stdarg.h>
#include <stdio.h>
#include <string.h>

#ifdef RG_ENABLE_NLS
#include <libintl.h>
#define RG_TRANSLATE(fmt) dgettext ("rugosa", fmt)
#else
#define RG_TRANSLATE(fmt) (fmt)
#endif

const char *
rg_gettext (const char *msgid)
{
  return RG_TRANSLATE (msgid);
}

/* Length of the valid UTF-8 sequence at s (1 to 4 bytes), or 0 when s does
 * not start one.  Source: RFC 3629, section 4 (no overlong forms, no
 * surrogates, nothing above U+10FFFF).  A NUL inside a sequence ends the
 * test early, so the read never passes the terminator. */
static size_t
utf8_len (const unsigned char *s)
{
  unsigned c = s[0];

  if (c < 0x80)
    return 1;
  if (c >= 0xC2 && c <= 0xDF)
    return (s[1] & 0xC0) == 0x80 ? 2 : 0;
  if (c >= 0xE0 && c <= 0xEF)
    {
      if ((s[1] & 0xC0) != 0x80 || (s[2] & 0xC0) != 0x80)
        return 0;
      if ((c == 0xE0 && s[1] < 0xA0) || (c == 0xED && s[1] > 0x9F))
        return 0;
      return 3;
    }
  if (c >= 0xF0 && c <= 0xF4)
    {
      if ((s[1] & 0xC0) != 0x80 || (s[2] & 0xC0) != 0x80
          || (s[3] & 0xC0) != 0x80)
        return 0;
      if ((c == 0xF0 && s[1] < 0x90) || (c == 0xF4 && s[1] > 0x8F))
        return 0;
      return 4;
    }
  return 0;
}

/* Messages quote what the user typed, and callers print them as one line
 * (a terminal, a JSON string, a status bar): every byte that does not
 * belong to valid UTF-8, and every control character, becomes '?'.  This
 * also repairs a sequence cut by "%.40s" or by the length limit. */
static void
make_one_line (char *text)
{
  unsigned char *s = (unsigned char *) text;
  size_t i = 0;

  while (s[i] != '\0')
    {
      size_t n = utf8_len (s + i);
      if (n == 0 || s[i] < 0x20 || s[i] == 0x7F)
        {
          s[i] = '?';
          n = 1;
        }
      i += n;
    }
}

static RgStatus
error_set_va (RgError *err, RgStatus status, RgSubjects subjects,
              const char *fmt, va_list ap)
{
  if (err == NULL)
    return status;
  err->status = status;
  err->subjects = subjects;
  /* a longer text is cut; make_one_line repairs a cut character */
  (void) vsnprintf (err->text, sizeof err->text, RG_TRANSLATE (fmt), ap);
  make_one_line (err->text);
  return status;
}

RgStatus
rg_error_set (RgError *err, RgStatus status, const char *fmt, ...)
{
  va_list ap;
  RgStatus st;

  va_start (ap, fmt);
  st = error_set_va (err, status, 0, fmt, ap);
  va_end (ap);
  return st;
}

RgStatus
rg_error_set_on (RgError *err, RgStatus status, RgSubjects subjects,
                 const char *fmt, ...)
{
  va_list ap;
  RgStatus st;

  va_start (ap, fmt);
  st = error_set_va (err, status, subjects, fmt, ap);
  va_end (ap);
  return st;
}

RgStatus
rg_error_add_subjects (RgError *err, RgSubjects subjects)
{
  if (err == NULL)
    return RG_ERR_NUMERIC;
  err->subjects |= subjects;
  return err->status;
}

const char *
rg_subject_id (RgSubject subject)
{
  static const char *const ids[RG_SUBJECT_N] = {
    [RG_SUBJECT_NONE] = "",
    [RG_SUBJECT_FLOW] = "flow",
    [RG_SUBJECT_DIAMETER] = "diameter",
    [RG_SUBJECT_LENGTH] = "length",
    [RG_SUBJECT_ROUGHNESS] = "roughness",
    [RG_SUBJECT_ELEVATION] = "elevation",
    [RG_SUBJECT_FITTING] = "fitting",
    [RG_SUBJECT_K_SUM] = "k-sum",
    [RG_SUBJECT_MATERIAL] = "material",
    [RG_SUBJECT_PIPE] = "pipe",
    [RG_SUBJECT_AGING_CLASS] = "aging-class",
    [RG_SUBJECT_AGING_RATE] = "aging-rate",
    [RG_SUBJECT_AGE] = "age",
    [RG_SUBJECT_FLUID] = "fluid",
    [RG_SUBJECT_TEMPERATURE] = "temperature",
    [RG_SUBJECT_PRESSURE] = "pressure",
    [RG_SUBJECT_SALINITY] = "salinity",
    [RG_SUBJECT_DENSITY] = "density",
    [RG_SUBJECT_VISCOSITY] = "viscosity",
    [RG_SUBJECT_OIL_T1] = "oil-t1",
    [RG_SUBJECT_OIL_NU1] = "oil-nu1",
    [RG_SUBJECT_OIL_T2] = "oil-t2",
    [RG_SUBJECT_OIL_NU2] = "oil-nu2",
    [RG_SUBJECT_OIL_DENSITY_REF] = "oil-density-ref",
    [RG_SUBJECT_OIL_T_REF] = "oil-t-ref",
    [RG_SUBJECT_OIL_EXPANSION] = "oil-expansion",
    [RG_SUBJECT_MODEL] = "model",
    [RG_SUBJECT_RE_LAMINAR_MAX] = "re-laminar-max",
    [RG_SUBJECT_RE_TURBULENT_MIN] = "re-turbulent-min",
    [RG_SUBJECT_REYNOLDS] = "reynolds",
    [RG_SUBJECT_RELATIVE_ROUGHNESS] = "relative-roughness",
    [RG_SUBJECT_HEAD_LOSS] = "head-loss",
    [RG_SUBJECT_VALUE] = "value",
  };

  if ((int) subject < 0 || subject >= RG_SUBJECT_N)
    return "";
  return ids[subject];
}

void
rg_error_clear (RgError *err)
{
  if (err == NULL)
    return;
  err->status = RG_OK;
  err->subjects = 0;
  err->text[0] = '\0';
}

void
rg_warnings_clear (RgWarnings *w)
{
  const struct RgUnitChoice *units;

  if (w == NULL)
    return;
  units = w->units;
  memset (w, 0, sizeof *w);
  w->units = units;
}

void
rg_warnings_add (RgWarnings *w, const char *fmt, ...)
{
  va_list ap;

  if (w == NULL || w->count >= RG_WARNINGS_MAX)
    return;
  va_start (ap, fmt);
  (void) vsnprintf (w->text[w->count], RG_WARNING_TEXT_MAX, RG_TRANSLATE (fmt), ap);
  va_end (ap);
  make_one_line (w->text[w->count]);
  w->count++;
}

int
rg_is_finite (double x)
{
  return isfinite (x);
}
