/* SPDX-License-Identifier: GPL-3.0-or-later */
/* What rugosa-cli lets reach a terminal: output made safe (control
 * characters shown as '?', or as \u escapes inside JSON), values echoed
 * short and on one line, "-0" read as 0.  The expected texts are the
 * program's own contract (docs/bad-input.md), not measurements. */
#include "config.h"

#include <math.h>
#include <string.h>

#include "cli/cli.h"

/* cli-args.c prints the usage through rugosa-cli.c, not linked here. */
int
cli_usage (void)
{
  return CLI_EXIT_OK;
}

static void
test_terminal_text (void)
{
  static const struct { const char *in, *out; } cases[] = {
    /* tab, line ends and text stay */
    { "line\tcase\r\nA,1\r\n", "line\tcase\r\nA,1\r\n" },
    { "Main ü ５ 水\n", "Main ü ５ 水\n" },
    /* ESC (C0), DEL, CSI (C1, U+009B) and NUL-free C0 controls go */
    { "red\x1b[31m\n", "red?[31m\n" },
    { "del\x7f\n", "del?\n" },
    { "csi\xc2\x9b" "2J\n", "csi?2J\n" },
    { "bell\a back\b\n", "bell? back?\n" },
    /* broken UTF-8 is shown as U+FFFD, never passed on */
    { "bad\xff\n", "bad\xef\xbf\xbd\n" },
    /* JSON: inside strings, the same character as an escape */
    { "{\"line\": \"red\x1b[31m\"}\n", "{\"line\": \"red\\u001b[31m\"}\n" },
    { "[\"csi\xc2\x9b\"]\n", "[\"csi\\u009b\"]\n" },
    { "  {\"del\": \"\x7f\"}", "  {\"del\": \"\\u007f\"}" },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autofree char *got = cli_terminal_text (cases[i].in);
      g_assert_cmpstr (got, ==, cases[i].out);
    }
}

static void
test_echo (void)
{
  g_autofree char *long_text = g_strnfill (131000, 'x');
  g_autofree char *shown = cli_echo (long_text);
  g_autofree char *ctl = cli_echo ("a\nb\x1b[2J\xc2\x9b" "c");

  /* 40 characters, then an ellipsis */
  g_assert_cmpint (g_utf8_strlen (shown, -1), ==, 41);
  g_assert_true (g_str_has_suffix (shown, "…"));
  g_assert_cmpstr (ctl, ==, "a?b?[2J?c");
}

static void
test_minus_zero (void)
{
  g_autoptr (GString) msg = g_string_new (NULL);
  double v = 1.0;

  g_assert_true (cli_parse_number ("--rr", "-0", &v, msg));
  g_assert_cmpfloat (v, ==, 0.0);
  g_assert_false (signbit (v));
  g_assert_true (cli_parse_number ("--rr", "-0.0e5", &v, msg));
  g_assert_false (signbit (v));
  g_assert_true (cli_parse_number ("--rr", "-1e-3", &v, msg));
  g_assert_true (signbit (v));
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/cli/text/terminal", test_terminal_text);
  g_test_add_func ("/cli/text/echo", test_echo);
  g_test_add_func ("/cli/text/minus-zero", test_minus_zero);
  return g_test_run ();
}
