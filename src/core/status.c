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

RgStatus
rg_error_set (RgError *err, RgStatus status, const char *fmt, ...)
{
  va_list ap;

  if (err == NULL)
    return status;
  err->status = status;
  va_start (ap, fmt);
  /* a longer text is cut; make_one_line repairs a cut character */
  (void) vsnprintf (err->text, sizeof err->text, RG_TRANSLATE (fmt), ap);
  va_end (ap);
  make_one_line (err->text);
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
