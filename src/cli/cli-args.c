/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <errno.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "cli.h"

static const CliOption *
find_option (const CliOption *options, const char *name)
{
  for (const CliOption *o = options; o->name != NULL; o++)
    if (g_str_equal (o->name, name))
      return o;
  return NULL;
}

/* Options spelled two ways: the values of both are kept under the first
 * name, so that giving both is refused as giving one twice. */
static const struct {
  const char *spelling;
  const char *name;
} same_option[] = {
  { "--output", "-o" },
};

static const char *
canonical_name (const CliOption *options, const char *name)
{
  for (gsize i = 0; i < G_N_ELEMENTS (same_option); i++)
    if (g_str_equal (name, same_option[i].spelling)
        && find_option (options, same_option[i].name) != NULL)
      return same_option[i].name;
  return name;
}

gboolean
cli_args_parse (CliArgs *args, const char *command, const CliOption *options,
                int argc, char **argv, int first, GString *message)
{
  /* the spelling each option was first given in, for messages */
  g_autoptr (GHashTable) spelled = g_hash_table_new_full (g_str_hash, g_str_equal,
                                                          g_free, g_free);

  args->command = command;
  args->values = g_hash_table_new_full (g_str_hash, g_str_equal, g_free,
                                        (GDestroyNotify) g_ptr_array_unref);
  args->positional = g_ptr_array_new_with_free_func (g_free);

  for (int i = first; i < argc; i++)
    {
      const char *arg = argv[i];
      g_autofree char *name = NULL;
      const char *value = NULL;
      const char *key;
      const CliOption *opt;

      if (arg[0] != '-' || arg[1] == '\0' || g_ascii_isdigit (arg[1])
          || (arg[1] == '.' && g_ascii_isdigit (arg[2])))
        {
          g_ptr_array_add (args->positional, g_strdup (arg));
          continue;
        }
      const char *eq = strchr (arg, '=');
      if (g_str_has_prefix (arg, "--") && eq != NULL)
        {
          name = g_strndup (arg, (gsize) (eq - arg));
          value = eq + 1;
        }
      else
        name = g_strdup (arg);

      opt = find_option (options, name);
      /* Help where an option stands (not as the value of one: "-o
       * --help" names a file): the usage, and nothing else is done. */
      if (opt == NULL && (g_str_equal (name, "--help") || g_str_equal (name, "-h")))
        {
          if (value != NULL)
            {
              g_string_printf (message, _("Option %s takes no value."), name);
              return FALSE;
            }
          exit (cli_usage ());
        }
      if (opt == NULL)
        {
          g_autofree char *shown = cli_echo (name);
          g_string_printf (message,
                           _("Unknown option %s for '%s'; see 'rugosa-cli %s --help'."),
                           shown, command, command);
          return FALSE;
        }
      if (opt->has_value && value == NULL)
        {
          if (i + 1 >= argc)
            {
              g_string_printf (message, _("Option %s needs a value."), name);
              return FALSE;
            }
          value = argv[++i];
        }
      else if (!opt->has_value && value != NULL)
        {
          g_string_printf (message, _("Option %s takes no value."), name);
          return FALSE;
        }
      if (value != NULL && !g_utf8_validate (value, -1, NULL))
        {
          g_string_printf (message, _("The value of %s is not valid UTF-8 text."), name);
          return FALSE;
        }

      key = canonical_name (options, name);
      GPtrArray *list = g_hash_table_lookup (args->values, key);
      if (list != NULL && !opt->repeatable)
        {
          const char *before = g_hash_table_lookup (spelled, key);

          if (before != NULL && !g_str_equal (before, name))
            g_string_printf (message, _("Options %s and %s are the same option, given twice; give it once."),
                             before, name);
          else
            g_string_printf (message, _("Option %s is given more than once."), name);
          return FALSE;
        }
      if (list == NULL)
        {
          list = g_ptr_array_new_with_free_func (g_free);
          g_hash_table_insert (args->values, g_strdup (key), list);
          g_hash_table_insert (spelled, g_strdup (key), g_strdup (name));
        }
      g_ptr_array_add (list, g_strdup (value != NULL ? value : ""));
    }
  return TRUE;
}

void
cli_args_clear (CliArgs *args)
{
  /* GLib's g_clear_pointer asserts sizeof *pp == sizeof (gpointer) */
  g_clear_pointer (&args->values, g_hash_table_unref); /* NOLINT(bugprone-sizeof-expression) */
  g_clear_pointer (&args->positional, g_ptr_array_unref); /* NOLINT(bugprone-sizeof-expression) */
}

gboolean
cli_args_has (const CliArgs *args, const char *name)
{
  /* an option with no value left (a blank cell of a batch) is not given */
  GPtrArray *list = g_hash_table_lookup (args->values, name);
  return list != NULL && list->len > 0;
}

const char *
cli_args_get (const CliArgs *args, const char *name)
{
  GPtrArray *list = g_hash_table_lookup (args->values, name);
  return list != NULL && list->len > 0 ? g_ptr_array_index (list, list->len - 1) : NULL;
}

GPtrArray *
cli_args_get_all (const CliArgs *args, const char *name)
{
  static GPtrArray *empty;
  GPtrArray *list = g_hash_table_lookup (args->values, name);

  if (list != NULL)
    return list;
  if (empty == NULL)
    empty = g_ptr_array_new ();
  return empty;
}

char *
cli_echo (const char *text)
{
  enum { ECHO_CHARS = 40 };
  g_autofree char *valid = g_utf8_make_valid (text, -1);
  GString *out = g_string_new (NULL);
  int n = 0;

  for (const char *p = valid; *p != '\0'; p = g_utf8_next_char (p), n++)
    {
      gunichar c = g_utf8_get_char (p);

      if (n == ECHO_CHARS)
        {
          g_string_append (out, "…");
          break;
        }
      /* g_utf8_make_valid shows broken bytes as U+FFFD: a plain '?' here */
      if (g_unichar_iscntrl (c) || c == 0xFFFD)
        g_string_append_c (out, '?');
      else
        g_string_append_unichar (out, c);
    }
  return g_string_free (out, FALSE);
}

/* Is `c` a character a terminal may act on rather than show: a C0 or C1
 * control or DEL (Unicode category Cc)?  Tabs and line ends are layout. */
static gboolean
acts_on_terminal (gunichar c)
{
  return g_unichar_iscntrl (c) && c != '\t' && c != '\n' && c != '\r';
}

char *
cli_terminal_text (const char *text)
{
  g_autofree char *valid = g_utf8_make_valid (text, -1);
  const char *p = valid;
  gboolean json;
  GString *out;

  while (g_ascii_isspace (*p))
    p++;
  /* JSON keeps such characters only inside its strings (its syntax is
   * ASCII), where an escape is the same character to a reader. */
  json = *p == '{' || *p == '[';
  out = g_string_sized_new (strlen (valid));
  for (p = valid; *p != '\0'; p = g_utf8_next_char (p))
    {
      gunichar c = g_utf8_get_char (p);

      if (!acts_on_terminal (c))
        g_string_append_unichar (out, c);
      else if (json)
        g_string_append_printf (out, "\\u%04x", (unsigned) c);
      else
        g_string_append_c (out, '?');
    }
  return g_string_free (out, FALSE);
}

int
cli_write_stdout (const char *out)
{
  g_autofree char *safe = cli_terminal_text (out);

  if (fputs (safe, stdout) != EOF && fflush (stdout) == 0)
    return CLI_EXIT_OK;
  /* nowhere left to report a failure to write to stderr */
  (void) fprintf (stderr, "rugosa-cli: The result could not be written to "
                  "the standard output: %s.\n", g_strerror (errno));
  return CLI_EXIT_FAILURE;
}

int
cli_fail (const char *fmt, ...)
{
  va_list ap;
  g_autofree char *text = NULL;

  va_start (ap, fmt);
  text = g_strdup_vprintf (fmt, ap);
  va_end (ap);
  /* one line on stderr, whatever a message quoted: no line end and no
   * other control character (C0, DEL, C1) reaches the terminal */
  {
    g_autofree char *valid = g_utf8_make_valid (text, -1);
    GString *line = g_string_sized_new (strlen (valid));

    for (const char *p = valid; *p != '\0'; p = g_utf8_next_char (p))
      {
        gunichar c = g_utf8_get_char (p);

        if (g_unichar_iscntrl (c))
          g_string_append_c (line, '?');
        else
          g_string_append_unichar (line, c);
      }
    g_free (text);
    text = g_string_free (line, FALSE);
  }
  /* nowhere left to report a failure to write to stderr */
  (void) fprintf (stderr, "rugosa-cli: %s\n", text);
  return CLI_EXIT_USAGE;
}

int
cli_fail_error (const RgError *err)
{
  return cli_fail ("%s", err->text[0] != '\0' ? err->text : _("The computation failed."));
}

int
cli_fail_option (const char *option, const char *sentence)
{
  /* TRANSLATORS: an option of rugosa-cli, then one sentence about it */
  return cli_fail (_("%s: %s"), option,
                   sentence != NULL && *sentence != '\0' ? sentence : _("The computation failed."));
}

const char *
cli_require (const CliArgs *args, const char *name, const char *hint,
             GString *message)
{
  const char *v = cli_args_get (args, name);

  if (v == NULL)
    g_string_printf (message, _("%s is required: %s."), name, hint);
  return v;
}

gboolean
cli_parse_number (const char *what, const char *text, double *out,
                  GString *message)
{
  char *end = NULL;
  double v;

  while (g_ascii_isspace (*text))
    text++;
  if (*text == '\0')
    {
      g_string_printf (message, _("%s needs a number; the value is empty."), what);
      return FALSE;
    }
  v = g_ascii_strtod (text, &end);
  while (end != NULL && g_ascii_isspace (*end))
    end++;
  if (end == text || (end != NULL && *end != '\0'))
    {
      g_autofree char *shown = cli_echo (text);
      g_string_printf (message, _("%s needs a plain number, not \"%s\"."), what, shown);
      return FALSE;
    }
  if (!isfinite (v))
    {
      g_autofree char *shown = cli_echo (text);
      g_string_printf (message, _("%s must be a finite number, not \"%s\"."), what, shown);
      return FALSE;
    }
  /* "-0" is zero: nothing downstream should print a sign for it */
  *out = v == 0.0 ? 0.0 : v;
  return TRUE;
}
