/* SPDX-License-Identifier: GPL-3.0-or-later */
/* rugosa-cli internals: argument parsing, output and the commands. */
#pragma once

#include <glib.h>
#include <glib/gi18n.h>

#include "core/status.h"
#include "model/rugosa-enums.h"
#include "model/rugosa-project.h"
#include "model/rugosa-settings.h"

/* Exit statuses: 0 success, 1 an internal failure (I/O), 2 bad input. */
enum { CLI_EXIT_OK = 0, CLI_EXIT_FAILURE = 1, CLI_EXIT_USAGE = 2 };

typedef struct {
  const char *name;   /* "--flow", or "-o" */
  gboolean has_value;
  gboolean repeatable;
} CliOption;

typedef struct {
  const char *command;
  GHashTable *values;      /* option name -> GPtrArray of values ("" for flags) */
  GPtrArray *positional;
} CliArgs;

/* Parses argv[first..argc) against `options`.  On failure fills `message`
 * with one sentence and returns FALSE.  An option that takes a value
 * takes the next argument, whatever it looks like ("-o --help" names a
 * file).  --help or -h where an option stands prints the usage and ends
 * the program (cli_usage).  An option given twice, in one spelling or in
 * two ("-o" and "--output"), is refused unless it is repeatable. */
gboolean cli_args_parse (CliArgs *args, const char *command,
                         const CliOption *options, int argc, char **argv,
                         int first, GString *message);
void cli_args_clear (CliArgs *args);
G_DEFINE_AUTO_CLEANUP_CLEAR_FUNC (CliArgs, cli_args_clear)

gboolean cli_args_has (const CliArgs *args, const char *name);
/* The (last) value of an option, or NULL. */
const char *cli_args_get (const CliArgs *args, const char *name);
/* All values of a repeatable option (never NULL). */
GPtrArray *cli_args_get_all (const CliArgs *args, const char *name);

/* User text quoted in a message, made safe for one line: at most 40
 * characters (then "…"), broken UTF-8 and control characters shown as '?'.
 * Free with g_free. */
char *cli_echo (const char *text);

/* `text` safe for a terminal: valid UTF-8, and every control character
 * (C0, DEL, C1) but tab and line ends shown as '?', or, in JSON (text that
 * begins with '{' or '['), written as a \u escape.  Free with g_free. */
char *cli_terminal_text (const char *text);

/* Writes `out`, made safe for a terminal (cli_terminal_text), to stdout
 * and flushes it: CLI_EXIT_OK, or CLI_EXIT_FAILURE with a sentence on
 * stderr when the output cannot be written (a full disk, a closed pipe). */
int cli_write_stdout (const char *out);

/* Prints the usage to stdout: CLI_EXIT_OK, or CLI_EXIT_FAILURE when it
 * cannot be written (rugosa-cli.c). */
int cli_usage (void);

/* Reports a usage error: "rugosa-cli: <sentence>" on stderr. */
int cli_fail (const char *fmt, ...) G_GNUC_PRINTF (1, 2);
int cli_fail_error (const RgError *err);
/* "rugosa-cli: OPTION: SENTENCE" — a refusal that names its option(s). */
int cli_fail_option (const char *option, const char *sentence);

/* Required option: fails with a sentence naming it and `hint`. */
const char *cli_require (const CliArgs *args, const char *name,
                         const char *hint, GString *message);

/* A dimensionless number written in the C locale ("1e5", "0.0001"); the
 * whole text must be a finite number. */
gboolean cli_parse_number (const char *what, const char *text, double *out,
                           GString *message);

/* JSON writer: an object of fixed keys, numbers in the C locale with 17
 * significant digits (round-trip exact); NaN/inf are never written. */
typedef struct {
  GString *out;
  int depth;
  gboolean first;
} CliJson;

void cli_json_begin (CliJson *json, GString *out);
void cli_json_number (CliJson *json, const char *key, double value);
void cli_json_string (CliJson *json, const char *key, const char *value);
void cli_json_string_array (CliJson *json, const char *key,
                            const char *const *values, int n);
void cli_json_number_array (CliJson *json, const char *key,
                            const double *values, int n);
void cli_json_end (CliJson *json);
void cli_json_escape (GString *out, const char *s);

/* "%.17g" in the C locale. */
char *cli_format_exact (double value, char *buf, gsize len);
/* "%.6g" in the C locale. */
char *cli_format_short (double value, char *buf, gsize len);

/* Appends text padded with spaces to `width` characters (not bytes). */
void cli_pad (GString *out, const char *text, int width);

/* Table writer: "label    value unit" lines. */
void cli_table_row (GString *out, const char *label, const char *value,
                    const char *unit);
void cli_table_number (GString *out, const char *label, double value,
                       const char *unit);

/* Output units (cli-units.c): --units si|us and one --QUANTITY-unit option
 * per display quantity, named after the quantity's id. */
/* "--flow-unit" for RUGOSA_DISPLAY_FLOW; NULL for a plain number. */
const char *cli_unit_option (RugosaDisplayQuantity dq);
/* Appends the output-unit options to a GArray of CliOption. */
void cli_unit_options_append (GArray *options);
/* `options` (ending with a NULL name) followed by the output-unit options;
 * made once per table. */
const CliOption *cli_options_with_units (const CliOption *options);
/* Sets the unit system and overrides of `settings` from the options given
 * (none given: `settings` is left alone).  --units replaces the system and
 * drops the overrides it had; each --QUANTITY-unit overrides its quantity.
 * FALSE after writing the refusal to stderr (exit status 2). */
gboolean cli_apply_units (const CliArgs *args, RugosaSettings *settings);
/* The paragraph of --help about the output units, translated. */
char *cli_units_help (void);

/* Results far beyond any practical line (cli-plausible.c, which states
 * the thresholds): a warning on stderr and among the point's warnings,
 * naming the likely unit mistake when the option behind it was a bare
 * number; `units` are those the warning is written in. */
void cli_check_plausible (const CliArgs *args, const RugosaLineResults *r,
                          RugosaOperatingPoint *p, RugosaSettings *units);
/* The options built from the field rows (cli-line.c), shared by the
 * commands that describe a line: every row of the line and settings
 * tables with a CLI option (`fluid_only`: the fluid's state alone), in
 * table order, in a new array (zero-terminated). */
GArray *cli_field_options (gboolean fluid_only);
/* The fluid kind from `text` (--fluid) set on `line`, and a refusal for a
 * state that kind needs and `args` lacks: CLI_EXIT_OK or the exit status
 * of the refusal written. */
int cli_set_fluid (const CliArgs *args, const char *text, RugosaLine *line);
/* Every row option given, parsed with its row's quantity and checked
 * against its range, set on the line and the settings.  On a refusal
 * FALSE, the option in *option and the sentence in `err`. */
gboolean cli_apply_field_options (const CliArgs *args, gboolean fluid_only,
                                  RugosaLine *line, RugosaSettings *settings,
                                  const char **option, RgError *err);
/* A refusal naming the options behind `subjects` (those given first). */
int cli_fail_subjects (const CliArgs *args, RgSubjects subjects,
                       const char *sentence);
/* Why `line` refused its input: the option(s) at fault ("--flow",
 * "--a, --b"; NULL when the refusal names none) and one sentence. */
typedef struct {
  char *option;
  char *sentence;
} CliRefusal;
void cli_refusal_clear (CliRefusal *why);
G_DEFINE_AUTO_CLEANUP_CLEAR_FUNC (CliRefusal, cli_refusal_clear)
/* Reports a refusal on stderr as cli_fail_option or cli_fail does. */
int cli_fail_refusal (const CliRefusal *why);

/* The options of `line` (every field row with an option, --k-sum, --json,
 * --batch). */
const CliOption *cli_line_options (void);
/* The `line` computation for one set of options: `line` (in `project`)
 * and the project's settings are set back to their defaults, the units
 * of `units` (NULL: SI) set on the settings, every option of `args`
 * applied, --solve solved (the flow or the bore set on the line), and the
 * line evaluated by the model.  The results (borrowed from the project),
 * or NULL with `why` filled. */
const RugosaLineResults *cli_line_evaluate (const CliArgs *args,
                                            RugosaProject *project,
                                            RugosaLine *line,
                                            RugosaSettings *units,
                                            CliRefusal *why);
/* rugosa-cli line --batch FILE|- (cli-batch.c); `args` holds --batch. */
int cli_line_batch (const CliArgs *args);

int cli_cmd_friction (int argc, char **argv);
int cli_cmd_fluid (int argc, char **argv);
int cli_cmd_line (int argc, char **argv);
int cli_cmd_size (int argc, char **argv);
int cli_cmd_catalog (int argc, char **argv);
int cli_cmd_eval (int argc, char **argv);
int cli_cmd_render (int argc, char **argv);
int cli_cmd_report (int argc, char **argv);

/* The date of a drawing or report, "YYYY-MM-DD": today, or the day of
 * SOURCE_DATE_EPOCH when set (reproducible output). */
char *cli_today (void);

/* Shared by the project commands (cli-project.c). */
RugosaProject *cli_load_project (const CliArgs *args, const char *command);
gboolean cli_parse_age_option (const CliArgs *args, double *age);
