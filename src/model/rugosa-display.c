/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-display"

#include "config.h"

#include <locale.h>
#include <math.h>
#include <string.h>

#include "rugosa-display.h"

const char *
rugosa_display_unit_symbol (const char *unit)
{
  static const struct { const char *key, *shown; } pretty[] = {
    { "m3/s", "m³/s" }, { "m3/h", "m³/h" }, { "ft3/min", "ft³/min" },
    { "cfs", "ft³/s" }, { "um", "µm" }, { "C", "°C" }, { "F", "°F" },
    { "kg/m3", "kg/m³" }, { "lb/ft3", "lb/ft³" }, { "mPa.s", "mPa·s" },
    { "Pa.s", "Pa·s" }, { "m/100m", "m/100 m" }, { "ft/100ft", "ft/100 ft" }, { "mm/yr", "mm/yr" },
    { "mm2/s", "mm²/s" },
    { "m2/s", "m²/s" },
  };

  if (unit == NULL)
    return "";
  for (guint i = 0; i < G_N_ELEMENTS (pretty); i++)
    if (g_strcmp0 (pretty[i].key, unit) == 0)
      return pretty[i].shown;
  return unit;
}

char *
rugosa_display_significant (double x,
                            int    digits)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];
  double ax = fabs (x);
  char fmt[16];

  if (!isfinite (x))
    return g_strdup ("—");
  if (x == 0.0)
    return g_strdup ("0");
  if (ax >= 1e-3 && ax < 1e6)
    {
      /* Fixed notation with `digits` significant figures. */
      int decimals = digits - 1 - (int) floor (log10 (ax));
      if (decimals < 0)
        decimals = 0;
      g_snprintf (fmt, sizeof fmt, "%%.%df", decimals);
    }
  else
    g_snprintf (fmt, sizeof fmt, "%%.%dg", digits);
  g_ascii_formatd (buf, sizeof buf, fmt, x);
  return g_strdup (buf);
}

char *
rugosa_display_number (RgQuantity  q,
                       double      si,
                       const char *unit)
{
  double v = si;

  if (unit != NULL && rg_units_from_si (q, si, unit, &v, NULL) != RG_OK)
    v = si;
  return rugosa_display_significant (v, 4);
}

char *
rugosa_display_format (RgQuantity  q,
                       double      si,
                       const char *unit)
{
  double v = si;
  const char *shown = unit;
  g_autofree char *num = NULL;

  if (unit == NULL || rg_units_from_si (q, si, unit, &v, NULL) != RG_OK)
    {
      v = si;
      shown = rg_units_si_symbol (q);
    }
  num = rugosa_display_significant (v, 4);
  /* A field reads "0.007 mm", not "0.007000 mm". */
  if (strchr (num, '.') != NULL && strchr (num, 'e') == NULL)
    {
      char *end = num + strlen (num) - 1;
      while (*end == '0')
        *end-- = '\0';
      if (*end == '.')
        *end = '\0';
    }
  if (shown == NULL || *shown == '\0')
    return g_steal_pointer (&num);
  /* The core's parser reads these symbols back (°C, m³/s, mPa·s, µm). */
  return g_strdup_printf ("%s %s", num, rugosa_display_unit_symbol (shown));
}

char *
rugosa_display_money (double amount, const char *currency)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];
  GString *out = g_string_new (NULL);
  const char *digits, *end;

  if (!isfinite (amount))
    g_string_append (out, "—");
  else
    {
      g_ascii_formatd (buf, sizeof buf, fabs (amount) < 100.0 ? "%.2f" : "%.0f", amount);
      digits = buf[0] == '-' ? buf + 1 : buf;
      if (digits != buf)
        g_string_append (out, "−");
      end = digits;
      while (g_ascii_isdigit (*end))
        end++;
      for (const char *c = digits; c < end; c++)
        {
          /* Common practice (no single source): no grouping below 10 000 */
          if (c > digits && (end - c) % 3 == 0 && end - digits > 4)
            g_string_append (out, "\u202f");
          g_string_append_c (out, *c);
        }
      g_string_append (out, end);
    }
  if (currency != NULL && *currency != '\0')
    g_string_append_printf (out, " %s", currency);
  return g_string_free (out, FALSE);
}

char *
rugosa_display_money_screen (double amount, const char *currency)
{
  return rugosa_display_localize (rugosa_display_money (amount, currency));
}

char *
rugosa_display_scientific (double x,
                           int    digits)
{
  static const char *const sup[] = { "⁰", "¹", "²", "³", "⁴", "⁵", "⁶", "⁷", "⁸", "⁹" };
  GString *out;
  char buf[G_ASCII_DTOSTR_BUF_SIZE];
  char fmt[16];
  double ax = fabs (x);
  int e;
  char digits_e[16];

  if (!isfinite (x) || x == 0.0 || (ax >= 1e-3 && ax < 1e5))
    return rugosa_display_significant (x, digits);
  e = (int) floor (log10 (ax));
  /* 9.995e5 rounds up to 10.0 × 10⁵: carry into the exponent. */
  g_snprintf (fmt, sizeof fmt, "%%.%df", MAX (digits - 1, 0));
  g_ascii_formatd (buf, sizeof buf, fmt, x / pow (10.0, e));
  if (fabs (g_ascii_strtod (buf, NULL)) >= 10.0)
    {
      e++;
      g_ascii_formatd (buf, sizeof buf, fmt, x / pow (10.0, e));
    }
  out = g_string_new (buf);
  g_string_append (out, " × 10");
  if (e < 0)
    g_string_append (out, "⁻");
  g_snprintf (digits_e, sizeof digits_e, "%d", ABS (e));
  for (const char *c = digits_e; *c; c++)
    g_string_append (out, sup[*c - '0']);
  return g_string_free (out, FALSE);
}

/* The decimal separator of LC_NUMERIC as set by the program (setlocale). */
static const char *
screen_decimal_point (void)
{
  const struct lconv *lc = localeconv ();

  if (lc == NULL || lc->decimal_point == NULL || lc->decimal_point[0] == '\0')
    return ".";
  return lc->decimal_point;
}

char *
rugosa_display_localize (char *text)
{
  const char *dp = screen_decimal_point ();
  GString *out;

  if (text == NULL || strcmp (dp, ".") == 0 || strchr (text, '.') == NULL)
    return text;
  out = g_string_sized_new (strlen (text) + 4);
  for (const char *c = text; *c != '\0'; c++)
    {
      if (*c == '.' && c > text && g_ascii_isdigit (c[-1]) && g_ascii_isdigit (c[1]))
        g_string_append (out, dp);
      else
        g_string_append_c (out, *c);
    }
  g_free (text);
  return g_string_free (out, FALSE);
}

char *
rugosa_display_delocalize (const char *text)
{
  const char *dp = screen_decimal_point ();
  const size_t n = strlen (dp);
  GString *out;

  if (text == NULL)
    return NULL;
  if (strcmp (dp, ".") == 0)
    return g_strdup (text);
  out = g_string_sized_new (strlen (text));
  for (const char *c = text; *c != '\0'; c++)
    {
      const gboolean before_ok = c == text || g_ascii_isdigit (c[-1])
                                 || c[-1] == ' ' || c[-1] == '-' || c[-1] == '+';
      if (strncmp (c, dp, n) == 0 && g_ascii_isdigit (c[n]) && before_ok)
        {
          g_string_append_c (out, '.');
          c += n - 1;
        }
      else
        g_string_append_c (out, *c);
    }
  return g_string_free (out, FALSE);
}

char *
rugosa_display_format_screen (RgQuantity  q,
                              double      si,
                              const char *unit)
{
  return rugosa_display_localize (rugosa_display_format (q, si, unit));
}

char *
rugosa_display_number_screen (RgQuantity  q,
                              double      si,
                              const char *unit)
{
  return rugosa_display_localize (rugosa_display_number (q, si, unit));
}

char *
rugosa_display_significant_screen (double x,
                                   int    digits)
{
  return rugosa_display_localize (rugosa_display_significant (x, digits));
}

char *
rugosa_display_scientific_screen (double x,
                                  int    digits)
{
  return rugosa_display_localize (rugosa_display_scientific (x, digits));
}
