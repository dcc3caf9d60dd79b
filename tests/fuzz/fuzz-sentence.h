/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Checks shared by the core's fuzz harnesses: what a failing core call must
 * leave in its RgError (src/core/status.h): the status it returned and one
 * sentence a person can read on one line. */
#pragma once

#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "core/status.h"

static void
fuzz_fail (const char *call, const char *what)
{
  fprintf (stderr, "invariant broken in %s: %s\n", call, what);
  abort ();
}

/* Length of the valid UTF-8 sequence at s (1 to 4), or 0 when s does not
 * start one (RFC 3629: no overlongs, no surrogates, at most U+10FFFF). */
static size_t
fuzz_utf8_len (const unsigned char *s)
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

static void
fuzz_check_error (RgStatus st, const RgError *err, const char *call)
{
  const char *t = err->text;
  size_t len = strnlen (t, sizeof err->text);

  if (st == RG_OK)
    return;
  if ((int) st < (int) RG_ERR_DOMAIN || (int) st > (int) RG_ERR_NUMERIC)
    fuzz_fail (call, "an unknown status");
  if (err->status != st)
    fuzz_fail (call, "RgError.status differs from the returned status");
  if (len == sizeof err->text)
    fuzz_fail (call, "the error text is not NUL-terminated");
  if (len == 0)
    fuzz_fail (call, "the error text is empty");
  for (size_t i = 0; i < len;)
    {
      size_t n = fuzz_utf8_len ((const unsigned char *) t + i);
      if (n == 0)
        {
          fprintf (stderr, "text: %s\n", t);
          fuzz_fail (call, "the error text is not valid UTF-8");
        }
      if ((unsigned char) t[i] < 0x20 || t[i] == 0x7F)
        {
          fprintf (stderr, "text: %s\n", t);
          fuzz_fail (call, "the error text holds a control character");
        }
      i += n;
    }
  if (t[len - 1] != '.')
    {
      fprintf (stderr, "text: %s\n", t);
      fuzz_fail (call, "the error text does not end a sentence");
    }
}
