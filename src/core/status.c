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

RgStatus
rg_error_set (RgError *err, RgStatus status, const char *fmt, ...)
{
  va_list ap;

  if (err == NULL)
    return status;
  err->status = status;
  va_start (ap, fmt);
  vsnprintf (err->text, sizeof err->text, RG_TRANSLATE (fmt), ap);
  va_end (ap);
  return status;
}

void
rg_error_clear (RgError *err)
{
  if (err == NULL)
    return;
  err->status = RG_OK;
  err->text[0] = '\0';
}

void
rg_warnings_clear (RgWarnings *w)
{
  if (w != NULL)
    memset (w, 0, sizeof *w);
}

void
rg_warnings_add (RgWarnings *w, const char *fmt, ...)
{
  va_list ap;

  if (w == NULL || w->count >= RG_WARNINGS_MAX)
    return;
  va_start (ap, fmt);
  vsnprintf (w->text[w->count], RG_WARNING_TEXT_MAX, RG_TRANSLATE (fmt), ap);
  va_end (ap);
  w->count++;
}

int
rg_is_finite (double x)
{
  return isfinite (x);
}
