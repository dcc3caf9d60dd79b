/* SPDX-License-Identifier: GPL-3.0-or-later */
#include "status.h"

#include <math.h>
#include <stdarg.h>
#include <stdio.h>
#include <string.h>

RgStatus
rg_error_set (RgError *err, RgStatus status, const char *fmt, ...)
{
  va_list ap;

  if (err == NULL)
    return status;
  err->status = status;
  va_start (ap, fmt);
  vsnprintf (err->text, sizeof err->text, fmt, ap);
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
  vsnprintf (w->text[w->count], RG_WARNING_TEXT_MAX, fmt, ap);
  va_end (ap);
  w->count++;
}

int
rg_is_finite (double x)
{
  return isfinite (x);
}
