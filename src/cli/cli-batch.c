/* SPDX-License-Identifier: GPL-3.0-or-later */
/* rugosa-cli line --batch FILE|-: many `line` computations from a CSV.
 *
 * The header row names `line` options without their dashes ("flow",
 * "pipe", "temperature", "fitting" — a repeatable option may have several
 * columns); each later row is one case, its cells the options' values as
 * on the command line (a blank cell: the option is not given).  Options
 * given on the command line beside --batch apply to every row whose file
 * has no column for them.  Each row goes through cli_line_evaluate, the
 * function `rugosa-cli line` itself uses, in one line and one project set
 * back to their defaults before each row, so a row's result or refusal is
 * the one a single call with the same options gives.
 *
 * Output: CSV (the row's number, then the columns of the model's output
 * keys, each header naming its unit, in the SI system's units or in those
 * of --units and --QUANTITY-unit given on the command line, then "error") or, with --json, one JSON object per row.  A
 * row's number is its record in the file, the header being 1, as a
 * spreadsheet numbers it.  A refused row gets an error naming its row and
 * column and the batch goes on; exit status 2 when any row was refused,
 * with one sentence on stderr.
 *
 * Input is read as a stream (a pipe works), one record at a time; a
 * record is held in memory only up to RECORD_MAX bytes. */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <errno.h>
#include <fcntl.h>
#include <stdio.h>
#include <string.h>
#include <sys/stat.h>
#include <unistd.h>

#include "cli.h"
#include "model/rugosa-output.h"

/* A record longer than this is refused (its bytes are skipped). */
#define RECORD_MAX (1 << 20)
/* Columns a header may name: every `line` option several times over. */
#define COLUMNS_MAX 256
/* Output is written in blocks of about this size. */
#define FLUSH_AT (1 << 16)

typedef enum {
  RECORD_OK,
  RECORD_END,        /* no record: the end of the input */
  RECORD_TOO_LONG,
  RECORD_NUL,        /* a NUL byte: not text */
  RECORD_OPEN_QUOTE, /* the input ended inside a quoted cell */
  RECORD_READ_ERROR,
} RecordStatus;

typedef struct {
  FILE *in;
  GPtrArray *cells;     /* GString, reused from record to record */
  guint n_cells;        /* cells of the record just read */
  gsize record_bytes;
} CsvReader;

static GString *
cell_at (CsvReader *rd, guint i)
{
  while (rd->cells->len <= i)
    g_ptr_array_add (rd->cells, g_string_sized_new (32));
  return g_ptr_array_index (rd->cells, i);
}

/* One record of RFC 4180 CSV: commas between cells, double quotes around
 * a cell that holds commas, quotes or line breaks, a quote doubled inside
 * one; records end with LF or CRLF.  A bad record is read to its end so
 * that the next one starts in the right place. */
static RecordStatus
read_record (CsvReader *rd)
{
  RecordStatus status = RECORD_OK;
  gboolean quoted = FALSE, any = FALSE;
  GString *cell;
  int c;

  rd->n_cells = 1;
  rd->record_bytes = 0;
  cell = cell_at (rd, 0);
  g_string_truncate (cell, 0);
  for (;;)
    {
      c = getc_unlocked (rd->in);
      if (c == EOF)
        {
          if (ferror (rd->in))
            return RECORD_READ_ERROR;
          if (!any)
            return RECORD_END;
          if (quoted && status == RECORD_OK)
            status = RECORD_OPEN_QUOTE;
          return status;
        }
      any = TRUE;
      if (++rd->record_bytes > RECORD_MAX && status == RECORD_OK)
        status = RECORD_TOO_LONG;
      if (c == '\0' && status == RECORD_OK)
        status = RECORD_NUL;
      if (quoted)
        {
          if (c == '"')
            {
              int next = getc_unlocked (rd->in);
              if (next == '"')
                {
                  if (status == RECORD_OK)
                    g_string_append_c (cell, '"');
                  continue;
                }
              quoted = FALSE;
              if (next == EOF)
                continue;
              c = next;
            }
          else
            {
              if (status == RECORD_OK)
                g_string_append_c (cell, (char) c);
              continue;
            }
        }
      if (c == '\n')
        break;
      if (c == '\r')
        {
          int next = getc_unlocked (rd->in);
          if (next == '\n' || next == EOF)
            break;
          /* a lone CR: the byte read ahead goes back (one is guaranteed) */
          (void) ungetc (next, rd->in);
        }
      else if (c == '"' && cell->len == 0)
        quoted = TRUE;
      else if (c == ',')
        {
          if (rd->n_cells >= COLUMNS_MAX && status == RECORD_OK)
            status = RECORD_TOO_LONG;
          if (status == RECORD_OK)
            {
              cell = cell_at (rd, rd->n_cells++);
              g_string_truncate (cell, 0);
            }
        }
      else if (status == RECORD_OK)
        g_string_append_c (cell, (char) c);
    }
  return status;
}

static const char *
record_cell (CsvReader *rd, guint i)
{
  return i < rd->n_cells ? ((GString *) g_ptr_array_index (rd->cells, i))->str : "";
}

static gboolean
is_blank (const char *s)
{
  while (g_ascii_isspace (*s))
    s++;
  return *s == '\0';
}

typedef struct {
  CliArgs row;          /* the options of one row */
  RugosaSettings *units; /* the output units */
  const CliArgs *given; /* the command line's */
  char **column_option; /* per column: "--flow" */
  guint n_columns;
  gboolean json;
  GString *out;
  guint rows, refused;
  int write_status;
} Batch;

static const CliOption *
find_line_option (const char *name)
{
  for (const CliOption *o = cli_line_options (); o->name != NULL; o++)
    if (g_str_equal (o->name, name))
      return o;
  return NULL;
}

/* An output-unit option (--units, --flow-unit …): the whole batch's. */
static gboolean
is_unit_option (const char *option)
{
  if (g_str_equal (option, "--units"))
    return TRUE;
  for (int i = 0; i < RUGOSA_N_DISPLAY; i++)
    {
      const char *name = cli_unit_option ((RugosaDisplayQuantity) i);

      if (name != NULL && g_str_equal (name, option))
        return TRUE;
    }
  return FALSE;
}

/* Options of the batch as a whole, which no row repeats. */
static gboolean
is_batch_only (const char *option)
{
  return g_str_equal (option, "--batch") || g_str_equal (option, "--json")
         || is_unit_option (option);
}

/* The inverse problems find one line's flow or bore: not a batch's. */
static gboolean
is_single_only (const char *option)
{
  return g_str_equal (option, "--solve") || g_str_equal (option, "--head-loss");
}

/* The header: every cell names a `line` option (without its dashes), a
 * non-repeatable one once, and none that the command line gives too. */
static gboolean
read_header (Batch *b, CsvReader *rd, const char *source, GString *msg)
{
  RecordStatus st = read_record (rd);
  g_autoptr (GHashTable) seen = g_hash_table_new (g_str_hash, g_str_equal);

  if (st == RECORD_END)
    {
      g_string_printf (msg, _("The batch “%s” is empty: its first row must name the options of 'line', such as flow,pipe,length,fluid,temperature."),
                       source);
      return FALSE;
    }
  if (st != RECORD_OK)
    {
      g_string_printf (msg, _("The first row of the batch “%s” is not a CSV header row of option names."),
                       source);
      return FALSE;
    }
  b->n_columns = rd->n_cells;
  b->column_option = g_new0 (char *, b->n_columns + 1);
  for (guint i = 0; i < rd->n_cells; i++)
    {
      g_autofree char *name = g_strstrip (g_strdup (record_cell (rd, i)));
      const CliOption *opt;

      /* a spreadsheet may start the file with a byte order mark */
      if (i == 0 && g_str_has_prefix (name, "\xEF\xBB\xBF"))
        memmove (name, name + 3, strlen (name + 3) + 1);
      b->column_option[i] = g_strconcat ("--", name, NULL);
      opt = *name != '\0' && name[0] != '-' ? find_line_option (b->column_option[i]) : NULL;
      if (opt != NULL && (is_unit_option (opt->name) || is_single_only (opt->name)))
        {
          g_string_printf (msg, is_unit_option (opt->name)
                                  ? _("Column %u of the batch header, “%s”, is an output unit: give it on the command line, for the whole batch.")
                                  : _("Column %u of the batch header, “%s”, solves for one line: a batch computes each row as given."),
                           i + 1, name);
          return FALSE;
        }
      if (opt == NULL || is_batch_only (opt->name))
        {
          g_autofree char *shown = cli_echo (name);
          g_string_printf (msg, _("Column %u of the batch header, “%s”, is not an option of 'line' (write them without dashes: flow, pipe, temperature …)."),
                           i + 1, shown);
          return FALSE;
        }
      if (g_hash_table_contains (seen, opt->name) && !opt->repeatable)
        {
          g_string_printf (msg, _("The batch header names “%s” twice; only a repeatable option such as fitting may have several columns."),
                           name);
          return FALSE;
        }
      g_hash_table_add (seen, (gpointer) opt->name);
      if (cli_args_has (b->given, opt->name))
        {
          g_string_printf (msg, _("Option %s is given both on the command line and as a column of the batch."),
                           opt->name);
          return FALSE;
        }
    }
  return TRUE;
}

/* The options every row shares: the command line's (their values
 * borrowed), and an empty list for each column's option. */
static void
row_options_init (Batch *b)
{
  GHashTableIter iter;
  gpointer key, value;

  b->row.command = "line";
  b->row.values = g_hash_table_new_full (g_str_hash, g_str_equal, NULL,
                                         (GDestroyNotify) g_ptr_array_unref);
  b->row.positional = g_ptr_array_new ();
  g_hash_table_iter_init (&iter, b->given->values);
  while (g_hash_table_iter_next (&iter, &key, &value))
    if (!is_batch_only (key))
      g_hash_table_insert (b->row.values, key, g_ptr_array_ref (value));
  for (guint i = 0; i < b->n_columns; i++)
    if (!g_hash_table_contains (b->row.values, b->column_option[i]))
      g_hash_table_insert (b->row.values, b->column_option[i], g_ptr_array_new ());
}

/* The row's options: its non-blank cells (borrowed until the next record
 * is read) beside the command line's; a blank cell leaves its option
 * without a value, which is not given. */
static gboolean
row_options (Batch *b, CsvReader *rd, guint *bad_column)
{
  for (guint i = 0; i < b->n_columns; i++)
    g_ptr_array_set_size (g_hash_table_lookup (b->row.values, b->column_option[i]), 0);
  for (guint i = 0; i < b->n_columns; i++)
    {
      const char *text = record_cell (rd, i);

      if (is_blank (text))
        continue;
      if (!g_utf8_validate (text, -1, NULL))
        {
          *bad_column = i;
          return FALSE;
        }
      g_ptr_array_add (g_hash_table_lookup (b->row.values, b->column_option[i]), (gpointer) text);
    }
  return TRUE;
}

static void
flush (Batch *b)
{
  if (b->out->len == 0 || b->write_status != CLI_EXIT_OK)
    return;
  if (fwrite (b->out->str, 1, b->out->len, stdout) != b->out->len)
    b->write_status = cli_write_stdout (""); /* reports errno */
  g_string_truncate (b->out, 0);
}

/* The options named by a refusal as the batch's columns: "--flow" is the
 * column "flow"; an option of the command line stays as it is. */
static char *
columns_of (Batch *b, const char *options)
{
  g_auto (GStrv) parts = g_strsplit (options, ", ", -1);
  GString *s = g_string_new (NULL);

  for (char **p = parts; *p != NULL; p++)
    {
      gboolean column = FALSE;

      for (guint i = 0; i < b->n_columns; i++)
        column |= g_str_equal (b->column_option[i], *p);
      if (s->len > 0)
        g_string_append (s, ", ");
      g_string_append (s, column && g_str_has_prefix (*p, "--") ? *p + 2 : *p);
    }
  return g_string_free (s, FALSE);
}

static void
write_refusal (Batch *b, guint row, const char *column, const char *sentence)
{
  g_autofree char *text = NULL;

  b->refused++;
  if (b->json)
    {
      g_string_append_printf (b->out, "{\"row\": %u, ", row);
      if (column != NULL)
        {
          cli_json_escape (b->out, "column");
          g_string_append (b->out, ": ");
          cli_json_escape (b->out, column);
          g_string_append (b->out, ", ");
        }
      cli_json_escape (b->out, "error");
      g_string_append (b->out, ": ");
      cli_json_escape (b->out, sentence);
      g_string_append (b->out, "}\n");
      return;
    }
  if (column != NULL)
    /* TRANSLATORS: the error cell of a refused row of a batch: its number,
     * the column(s) at fault, one sentence */
    text = g_strdup_printf (_("Row %u, column %s: %s"), row, column, sentence);
  else
    /* TRANSLATORS: the error cell of a refused row of a batch */
    text = g_strdup_printf (_("Row %u: %s"), row, sentence);
  g_string_append_printf (b->out, "%u", row);
  /* every result cell empty, then the error */
  {
    static guint n_keys;
    if (n_keys == 0)
      rugosa_output_keys (&n_keys);
    for (guint k = 0; k < n_keys; k++)
      g_string_append_c (b->out, ',');
  }
  g_string_append_c (b->out, ',');
  rugosa_output_csv_field (b->out, text);
  g_string_append (b->out, "\r\n");
}

static void
write_results (Batch *b, guint row, const RugosaLineResults *r)
{
  const RugosaOperatingPoint *p = &r->points[RUGOSA_FLOW_DESIGN];

  if (b->json)
    {
      g_string_append_printf (b->out, "{\"row\": %u,", row);
      rugosa_output_point_json (b->out, r, p, " ");
      g_string_append (b->out, "}\n");
      return;
    }
  g_string_append_printf (b->out, "%u", row);
  rugosa_output_point_csv (b->out, r, p, b->units);
  g_string_append (b->out, ",\r\n");
}

static const char *
record_problem (RecordStatus st)
{
  switch (st)
    {
    case RECORD_TOO_LONG:
      return _("The row is too long: a row of a batch holds at most 1 MiB and 256 cells.");
    case RECORD_NUL:
      return _("The row holds a NUL byte: a batch is CSV text.");
    case RECORD_OPEN_QUOTE:
      return _("The file ends inside a quoted cell: a closing double quote is missing.");
    case RECORD_OK:
    case RECORD_END:
    case RECORD_READ_ERROR:
    default:
      return NULL;
    }
}

static void
free_cell (gpointer cell)
{
  g_string_free (cell, TRUE);
}

static FILE *
open_source (const char *source, GString *msg)
{
  struct stat st;
  int fd;
  FILE *in;

  if (g_str_equal (source, "-"))
    return stdin;
  fd = open (source, O_RDONLY | O_CLOEXEC);
  if (fd < 0)
    {
      int e = errno;
      g_autofree char *shown = cli_echo (source);
      g_string_printf (msg, _("The batch “%s” cannot be read: %s."), shown, g_strerror (e));
      return NULL;
    }
  if (fstat (fd, &st) == 0 && S_ISDIR (st.st_mode))
    {
      g_autofree char *shown = cli_echo (source);
      g_string_printf (msg, _("The batch “%s” is a folder, not a CSV file."), shown);
      close (fd);
      return NULL;
    }
  in = fdopen (fd, "r");
  if (in == NULL)
    {
      int e = errno;
      g_autofree char *shown = cli_echo (source);
      g_string_printf (msg, _("The batch “%s” cannot be read: %s."), shown, g_strerror (e));
      close (fd);
    }
  return in;
}

int
cli_line_batch (const CliArgs *args)
{
  const char *source = cli_args_get (args, "--batch");
  g_autoptr (GString) msg = g_string_new (NULL);
  g_autoptr (RugosaProject) project = rugosa_project_new ();
  g_autoptr (RugosaLine) line = rugosa_line_new ("line");
  g_autoptr (RugosaSettings) units = rugosa_settings_new ();
  CsvReader rd = { 0 };
  Batch b = { 0 };
  RecordStatus st;
  guint record = 1;
  int status = CLI_EXIT_OK;

  if (cli_args_has (args, "--solve") || cli_args_has (args, "--head-loss"))
    return cli_fail_option (cli_args_has (args, "--solve") ? "--solve" : "--head-loss",
                            _("--solve finds one line's flow or bore: a batch computes each row as given."));
  /* the output units, the same for every row */
  if (!cli_apply_units (args, units))
    return CLI_EXIT_USAGE;
  b.units = units;
  rd.in = open_source (source, msg);
  if (rd.in == NULL)
    return cli_fail_option ("--batch", msg->str);
  rd.cells = g_ptr_array_new_with_free_func (free_cell);
  b.given = args;
  b.json = cli_args_has (args, "--json");
  b.out = g_string_sized_new (FLUSH_AT + 4096);
  b.write_status = CLI_EXIT_OK;
  rugosa_project_insert_line (project, 0, line);

  if (!read_header (&b, &rd, source, msg))
    {
      status = cli_fail_option ("--batch", msg->str);
      goto done;
    }
  row_options_init (&b);
  if (!b.json)
    {
      g_string_append (b.out, "row");
      rugosa_output_csv_header (b.out, b.units);
      g_string_append (b.out, ",error\r\n");
    }

  while ((st = read_record (&rd)) != RECORD_END)
    {
      g_auto (CliRefusal) why = { 0 };
      const RugosaLineResults *r;
      guint bad_column = 0;

      record++;
      if (st == RECORD_READ_ERROR)
        {
          int e = errno;
          g_autofree char *shown = cli_echo (source);
          flush (&b);
          status = cli_fail (_("The batch “%s” could not be read past row %u: %s."), shown,
                             record - 1, g_strerror (e));
          goto done;
        }
      if (st != RECORD_OK)
        {
          b.rows++;
          write_refusal (&b, record, NULL, record_problem (st));
          continue;
        }
      if (rd.n_cells == 1 && is_blank (record_cell (&rd, 0)))
        continue; /* an empty line: no case */
      b.rows++;
      if (rd.n_cells > b.n_columns)
        {
          g_autofree char *text = g_strdup_printf (_("The row has %u cells, more than the %u columns of the header."),
                                                   rd.n_cells, b.n_columns);
          write_refusal (&b, record, NULL, text);
        }
      else if (!row_options (&b, &rd, &bad_column))
        {
          g_autofree char *text = g_strdup_printf (_("The value of %s is not valid UTF-8 text."),
                                                   b.column_option[bad_column]);
          write_refusal (&b, record, b.column_option[bad_column] + 2, text);
        }
      else if ((r = cli_line_evaluate (&b.row, project, line, units, &why)) == NULL)
        {
          /* "rugosa-cli" stands for no option in particular */
          g_autofree char *columns = why.option && !g_str_equal (why.option, "rugosa-cli")
                                       ? columns_of (&b, why.option) : NULL;
          write_refusal (&b, record, columns, why.sentence);
        }
      else
        write_results (&b, record, r);
      if (b.out->len >= FLUSH_AT)
        flush (&b);
    }
  flush (&b);
  if (b.write_status == CLI_EXIT_OK && fflush (stdout) != 0)
    b.write_status = cli_write_stdout ("");
  if (b.write_status != CLI_EXIT_OK)
    status = b.write_status;
  else if (b.refused > 0)
    status = cli_fail (ngettext ("%u of %u rows of the batch was refused; its error says why.",
                                 "%u of %u rows of the batch were refused; their errors say why.",
                                 b.refused),
                       b.refused, b.rows);

done:
  if (rd.in != stdin)
    (void) fclose (rd.in); /* read only: nothing left to lose */
  g_ptr_array_unref (rd.cells);
  if (b.row.values != NULL)
    cli_args_clear (&b.row);
  g_strfreev (b.column_option);
  g_string_free (b.out, TRUE);
  return status;
}
