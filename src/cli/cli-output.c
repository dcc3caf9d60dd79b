/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <math.h>

#include "cli.h"

char *
cli_format_exact (double value, char *buf, gsize len)
{
  return g_ascii_formatd (buf, (int) len, "%.17g", value);
}

char *
cli_format_short (double value, char *buf, gsize len)
{
  return g_ascii_formatd (buf, (int) len, "%.6g", value);
}

void
cli_json_escape (GString *out, const char *s)
{
  g_string_append_c (out, '"');
  for (const char *p = s; *p != '\0'; p++)
    {
      const unsigned char c = (unsigned char) *p;
      switch (c)
        {
        case '"':
          g_string_append (out, "\\\"");
          break;
        case '\\':
          g_string_append (out, "\\\\");
          break;
        case '\n':
          g_string_append (out, "\\n");
          break;
        case '\t':
          g_string_append (out, "\\t");
          break;
        case '\r':
          g_string_append (out, "\\r");
          break;
        default:
          if (c < 0x20)
            g_string_append_printf (out, "\\u%04x", c);
          else
            g_string_append_c (out, (char) c);
        }
    }
  g_string_append_c (out, '"');
}

static void
json_key (CliJson *json, const char *key)
{
  g_string_append (json->out, json->first ? "\n  " : ",\n  ");
  json->first = FALSE;
  cli_json_escape (json->out, key);
  g_string_append (json->out, ": ");
}

void
cli_json_begin (CliJson *json, GString *out)
{
  json->out = out;
  json->first = TRUE;
  g_string_append_c (out, '{');
}

void
cli_json_number (CliJson *json, const char *key, double value)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  json_key (json, key);
  /* The core never hands back a non-finite value; should one slip through,
   * JSON null is written rather than an invalid token. */
  if (!isfinite (value))
    g_string_append (json->out, "null");
  else
    g_string_append (json->out, cli_format_exact (value, buf, sizeof buf));
}

void
cli_json_string (CliJson *json, const char *key, const char *value)
{
  json_key (json, key);
  cli_json_escape (json->out, value);
}

void
cli_json_string_array (CliJson *json, const char *key,
                       const char *const *values, int n)
{
  json_key (json, key);
  g_string_append_c (json->out, '[');
  for (int i = 0; i < n; i++)
    {
      if (i > 0)
        g_string_append (json->out, ", ");
      cli_json_escape (json->out, values[i]);
    }
  g_string_append_c (json->out, ']');
}

void
cli_json_number_array (CliJson *json, const char *key, const double *values,
                       int n)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  json_key (json, key);
  g_string_append_c (json->out, '[');
  for (int i = 0; i < n; i++)
    {
      if (i > 0)
        g_string_append (json->out, ", ");
      if (!isfinite (values[i]))
        g_string_append (json->out, "null");
      else
        g_string_append (json->out, cli_format_exact (values[i], buf, sizeof buf));
    }
  g_string_append_c (json->out, ']');
}

void
cli_json_end (CliJson *json)
{
  g_string_append (json->out, json->first ? "}\n" : "\n}\n");
}

void
cli_pad (GString *out, const char *text, int width)
{
  /* printf pads by bytes; labels hold ε, ∂, Σ, ° … so pad by characters */
  glong n = g_utf8_strlen (text, -1);

  g_string_append (out, text);
  for (; n < width; n++)
    g_string_append_c (out, ' ');
}

void
cli_table_row (GString *out, const char *label, const char *value,
               const char *unit)
{
  cli_pad (out, label, 26);
  g_string_append_printf (out, " %s%s%s\n", value,
                          unit != NULL && *unit != '\0' ? " " : "",
                          unit != NULL ? unit : "");
}

void
cli_table_number (GString *out, const char *label, double value,
                  const char *unit)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  cli_table_row (out, label, cli_format_short (value, buf, sizeof buf), unit);
}
