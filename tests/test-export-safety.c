/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Exports never destroy a file: a failure at any step of writing a chart
 * (PNG, SVG, PDF), the results table (CSV) or the report (PDF) — the first write, a write
 * after short writes, fsync, close, rename — over an existing file and
 * into a new name leaves the previous file byte for byte as it was (or no
 * file at all), leaves no temporary file, and reports one sentence naming
 * the file and the reason.  The same export without the fault then
 * replaces the file whole.  Real failures too: the file-size limit
 * (RLIMIT_FSIZE, as a disk that fills up mid-file) and a folder without
 * write permission.  (The project save: tests/test-data-safety.c.) */
#include "config.h"

#include <errno.h>
#include <signal.h>
#include <string.h>
#include <sys/resource.h>
#include <unistd.h>

#include <glib/gstdio.h>

#include "chart/rugosa-chart-input.h"
#include "chart/rugosa-report.h"
#include "model/rugosa-project.h"

/* A fixed footer date, so that two exports of one project are the same. */
#define EXPORT_DATE "2026-03-14"

typedef enum { FMT_PNG, FMT_SVG, FMT_PDF, FMT_CSV, FMT_REPORT, N_FMTS } Fmt;

static const struct {
  const char *id;
  const char *file;
  const char *magic;    /* how a whole file of the format begins */
  const char *ending;   /* how it ends (NULL: not checked) */
} fmts[N_FMTS] = {
  /* Source: PNG specification (ISO/IEC 15948), 5.2 signature; 11.2.5 IEND */
  { "png", "chart.png", "\x89PNG\r\n\x1a\n", "IEND\xae\x42\x60\x82" },
  /* Source: Cairo 1.16 SVG surface output (an XML declaration first) */
  { "svg", "chart.svg", "<?xml", "</svg>\n" },
  /* Source: ISO 32000-1, 7.5.2 header and 7.5.5 "%%EOF" trailer */
  { "pdf", "chart.pdf", "%PDF-", "%%EOF\n" },
  /* Source: the first column names of rugosa-cli eval --format csv */
  { "csv", "results.csv", "line,case", "\r\n" },
  /* Source: ISO 32000-1, 7.5.2 header and 7.5.5 "%%EOF" trailer */
  { "report", "report.pdf", "%PDF-", "%%EOF\n" },
};

static RugosaProject *
load_demo (void)
{
  const char *root = g_getenv ("RUGOSA_SOURCE_DIR");
  g_autofree char *path = g_build_filename (root ? root : "..", "data", "demo.rugosa", NULL);
  g_autoptr (GError) error = NULL;
  RugosaProject *project = rugosa_project_new ();

  g_assert_true (rugosa_project_load (project, path, &error));
  g_assert_no_error (error);
  return project;
}

/* One export of the demo project; `variant` changes what is drawn or
 * listed, so that two generations of a file differ. */
static gboolean
export (Fmt fmt, const char *path, int variant, GError **error)
{
  g_autoptr (RugosaProject) p = load_demo ();
  g_autoptr (RugosaChartInput) input = NULL;
  static const RugosaChartFormat chart[] = {
    RUGOSA_CHART_FORMAT_PNG, RUGOSA_CHART_FORMAT_SVG, RUGOSA_CHART_FORMAT_PDF,
  };

  rugosa_line_set_name (rugosa_project_get_line (p, 0),
                        variant == 0 ? "First generation" : "Second generation");
  if (fmt == FMT_CSV)
    return rugosa_project_export_eval (p, (double) variant, RUGOSA_EVAL_FORMAT_CSV, path, error);
  if (fmt == FMT_REPORT)
    {
      g_autoptr (RugosaReport) report = rugosa_report_new (p, RUGOSA_PAPER_A4, EXPORT_DATE);

      return rugosa_report_write_pdf (report, path, error);
    }
  input = rugosa_chart_input_new (p, variant, NULL);
  return rugosa_chart_export (&input->spec, input->lines, input->n_lines, chart[fmt],
                              640, 400, EXPORT_DATE, path, error);
}

static char *
read_or_null (const char *path, gsize *length)
{
  char *text = NULL;

  if (!g_file_get_contents (path, &text, length, NULL))
    return NULL;
  return text;
}

static int
compare_names (gconstpointer a, gconstpointer b)
{
  return strcmp (*(char *const *) a, *(char *const *) b);
}

/* The names in `dir`, sorted and joined by spaces. */
static char *
list_dir (const char *dir)
{
  g_autoptr (GPtrArray) names = g_ptr_array_new_with_free_func (g_free);
  GDir *d = g_dir_open (dir, 0, NULL);
  const char *entry;

  g_assert_nonnull (d);
  while ((entry = g_dir_read_name (d)) != NULL)
    g_ptr_array_add (names, g_strdup (entry));
  g_dir_close (d);
  g_ptr_array_sort (names, compare_names);
  g_ptr_array_add (names, NULL);
  return g_strjoinv (" ", (char **) names->pdata);
}

static void
remove_dir (const char *dir)
{
  GDir *d = g_dir_open (dir, 0, NULL);
  const char *entry;

  g_assert_nonnull (d);
  while ((entry = g_dir_read_name (d)) != NULL)
    {
      g_autofree char *p = g_build_filename (dir, entry, NULL);
      g_unlink (p);
    }
  g_dir_close (d);
  g_assert_cmpint (g_rmdir (dir), ==, 0);
}

/* A whole file of the format: its signature first, its trailer last. */
static void
assert_whole (Fmt fmt, const char *data, gsize length)
{
  gsize m = strlen (fmts[fmt].magic), e = strlen (fmts[fmt].ending);

  g_assert_nonnull (data);
  g_assert_cmpuint (length, >, m + e);
  g_assert_cmpmem (data, m, fmts[fmt].magic, m);
  g_assert_cmpmem (data + length - e, e, fmts[fmt].ending, e);
}

/* One sentence naming the file, the reason and what is left on disk. */
static void
assert_one_sentence (Fmt fmt, const GError *error, const char *path,
                     const char *reason, gboolean existed)
{
  g_autofree char *display = g_filename_display_name (path);
  const char *m = error->message;

  if (fmt == FMT_CSV)
    g_assert_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_IO);
  else
    g_assert_error (error, RUGOSA_CHART_ERROR, RUGOSA_CHART_ERROR_WRITE);
  g_assert_true (g_str_has_prefix (m, "Cannot save “"));
  g_assert_nonnull (strstr (m, display));
  g_assert_nonnull (strstr (m, reason));
  g_assert_true (g_str_has_suffix (m, existed ? "; the previous file is unchanged."
                                              : "; no file was created."));
  g_assert_null (strstr (m, ". "));
  g_assert_null (strchr (m, '\n'));
}

/* ---- injected failures ---- */

typedef struct {
  RugosaSaveStep step;
  int nth;
  int cap;
  int calls;
} Fault;

static int
fault_hook (RugosaSaveStep step, gpointer user_data)
{
  Fault *f = user_data;

  if (step == RUGOSA_SAVE_STEP_SHORT_WRITE)
    return f->cap;
  if (step == f->step && ++f->calls == f->nth)
    return ENOSPC;
  return 0;
}

typedef struct {
  Fmt fmt;
  const char *step_id;
  RugosaSaveStep step;
  int nth;
  int cap;
  gboolean existed;
  char *path;   /* test path, owned */
} Case;

static const struct {
  const char *id;
  RugosaSaveStep step;
  int nth;
  int cap;
} steps[] = {
  { "write", RUGOSA_SAVE_STEP_WRITE, 1, 0 },
  /* two 100-byte short writes, then the disk is full */
  { "write-after-short", RUGOSA_SAVE_STEP_WRITE, 3, 100 },
  { "fsync", RUGOSA_SAVE_STEP_FSYNC, 1, 0 },
  { "close", RUGOSA_SAVE_STEP_CLOSE, 1, 0 },
  { "rename", RUGOSA_SAVE_STEP_RENAME, 1, 0 },
};

static void
test_injected (gconstpointer data)
{
  const Case *c = data;
  g_autoptr (GError) error = NULL;
  g_autofree char *dir = g_dir_make_tmp ("rugosa-export-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, fmts[c->fmt].file, NULL);
  g_autofree char *gen1 = NULL, *before = NULL, *after = NULL, *now = NULL;
  gsize n1 = 0, n_now = 0;
  Fault fault = { c->step, c->nth, c->cap, 0 };

  if (c->existed)
    {
      g_assert_true (export (c->fmt, path, 0, &error));
      g_assert_no_error (error);
      gen1 = read_or_null (path, &n1);
      assert_whole (c->fmt, gen1, n1);
    }
  before = list_dir (dir);

  rugosa_file_set_fault_hook (fault_hook, &fault);
  g_assert_false (export (c->fmt, path, 1, &error));
  rugosa_file_set_fault_hook (NULL, NULL);
  g_assert_cmpint (fault.calls, ==, c->nth);
  assert_one_sentence (c->fmt, error, path, "the disk is full", c->existed);
  g_clear_error (&error);

  /* Nothing on disk changed: the same names (no temporary file left) and
   * the same bytes in the previous file. */
  after = list_dir (dir);
  g_assert_cmpstr (after, ==, before);
  now = read_or_null (path, &n_now);
  if (c->existed)
    g_assert_cmpmem (now, n_now, gen1, n1);
  else
    g_assert_null (now);
  g_clear_pointer (&now, g_free);

  /* Without the fault the export replaces the file whole. */
  g_assert_true (export (c->fmt, path, 1, &error));
  g_assert_no_error (error);
  now = read_or_null (path, &n_now);
  assert_whole (c->fmt, now, n_now);
  if (c->existed)
    g_assert_false (n_now == n1 && memcmp (now, gen1, n1) == 0);
  g_clear_pointer (&after, g_free);
  after = list_dir (dir);
  g_assert_cmpstr (after, ==, fmts[c->fmt].file);
  remove_dir (dir);
}

/* ---- real failures, in a subprocess ---- */

/* The kernel cuts the write short at the file-size limit and then refuses
 * more with EFBIG: a disk that fills up in the middle of the file. */
static void
test_size_limit (gconstpointer data)
{
  Fmt fmt = GPOINTER_TO_INT (data);
  g_autofree char *dir = NULL, *path = NULL, *gen1 = NULL, *now = NULL;
  g_autofree char *before = NULL, *after = NULL;
  g_autoptr (GError) error = NULL;
  gsize n1 = 0, n_now = 0;

  if (g_test_subprocess ())
    {
      /* Below every export of the demo, above none of them. */
      struct rlimit limit = { 512, 512 };

      path = g_strdup (g_getenv ("RUGOSA_SAFETY_PATH"));
      signal (SIGXFSZ, SIG_IGN);
      g_assert_cmpint (setrlimit (RLIMIT_FSIZE, &limit), ==, 0);
      g_assert_false (export (fmt, path, 1, &error));
      assert_one_sentence (fmt, error, path, "the file is too large for the disk", TRUE);
      return;
    }

  dir = g_dir_make_tmp ("rugosa-export-XXXXXX", NULL);
  path = g_build_filename (dir, fmts[fmt].file, NULL);
  g_assert_true (export (fmt, path, 0, &error));
  g_assert_no_error (error);
  gen1 = read_or_null (path, &n1);
  /* the limit must fall inside the file for the write to be cut */
  g_assert_cmpuint (n1, >, 512);
  before = list_dir (dir);
  g_setenv ("RUGOSA_SAFETY_PATH", path, TRUE);
  g_test_trap_subprocess (NULL, 0, G_TEST_SUBPROCESS_INHERIT_STDERR);
  g_test_trap_assert_passed ();
  g_unsetenv ("RUGOSA_SAFETY_PATH");

  after = list_dir (dir);
  g_assert_cmpstr (after, ==, before);
  now = read_or_null (path, &n_now);
  g_assert_cmpmem (now, n_now, gen1, n1);
  remove_dir (dir);
}

/* A folder the user may not write in; as root the subprocess becomes the
 * unprivileged user "nobody" (uid 65534 on Debian) first. */
static void
test_read_only_folder (gconstpointer data)
{
  Fmt fmt = GPOINTER_TO_INT (data);
  g_autofree char *dir = NULL, *path = NULL, *gen1 = NULL, *now = NULL;
  g_autofree char *before = NULL, *after = NULL;
  g_autoptr (GError) error = NULL;
  gsize n1 = 0, n_now = 0;

  if (g_test_subprocess ())
    {
      g_autofree char *fresh = NULL;

      path = g_strdup (g_getenv ("RUGOSA_SAFETY_PATH"));
      if (geteuid () == 0)
        {
          g_assert_cmpint (setgid (65534), ==, 0);
          g_assert_cmpint (setuid (65534), ==, 0);
        }
      g_assert_false (export (fmt, path, 1, &error));
      assert_one_sentence (fmt, error, path, "you are not allowed to write in its folder", TRUE);
      g_clear_error (&error);
      fresh = g_build_filename (g_getenv ("RUGOSA_SAFETY_DIR"), "fresh", NULL);
      g_assert_false (export (fmt, fresh, 1, &error));
      assert_one_sentence (fmt, error, fresh, "you are not allowed to write in its folder", FALSE);
      return;
    }

  dir = g_dir_make_tmp ("rugosa-export-XXXXXX", NULL);
  path = g_build_filename (dir, fmts[fmt].file, NULL);
  g_assert_true (export (fmt, path, 0, &error));
  g_assert_no_error (error);
  gen1 = read_or_null (path, &n1);
  before = list_dir (dir);
  g_assert_cmpint (g_chmod (dir, 0555), ==, 0);
  g_setenv ("RUGOSA_SAFETY_PATH", path, TRUE);
  g_setenv ("RUGOSA_SAFETY_DIR", dir, TRUE);
  g_test_trap_subprocess (NULL, 0, G_TEST_SUBPROCESS_INHERIT_STDERR);
  g_assert_cmpint (g_chmod (dir, 0700), ==, 0);
  g_test_trap_assert_passed ();
  g_unsetenv ("RUGOSA_SAFETY_PATH");
  g_unsetenv ("RUGOSA_SAFETY_DIR");

  after = list_dir (dir);
  g_assert_cmpstr (after, ==, before);
  now = read_or_null (path, &n_now);
  g_assert_cmpmem (now, n_now, gen1, n1);
  remove_dir (dir);
}

/* A folder where the file should go: refused before anything is made,
 * the folder untouched. */
static void
test_target_is_folder (gconstpointer data)
{
  Fmt fmt = GPOINTER_TO_INT (data);
  g_autofree char *dir = g_dir_make_tmp ("rugosa-export-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, fmts[fmt].file, NULL);
  g_autofree char *names = NULL;
  g_autoptr (GError) error = NULL;

  g_assert_cmpint (g_mkdir (path, 0700), ==, 0);
  g_assert_false (export (fmt, path, 0, &error));
  g_assert_nonnull (strstr (error->message, "because a folder has that name"));
  g_assert_null (strchr (error->message, '\n'));
  names = list_dir (dir);
  g_assert_cmpstr (names, ==, fmts[fmt].file);
  g_assert_true (g_file_test (path, G_FILE_TEST_IS_DIR));
  g_assert_cmpint (g_rmdir (path), ==, 0);
  remove_dir (dir);
}

static void
case_free (gpointer data)
{
  Case *c = data;

  g_free (c->path);
  g_free (c);
}

int
main (int argc, char **argv)
{
  g_autoptr (GPtrArray) cases = g_ptr_array_new_with_free_func (case_free);

  g_test_init (&argc, &argv, NULL);
  for (int f = 0; f < N_FMTS; f++)
    {
      for (guint s = 0; s < G_N_ELEMENTS (steps); s++)
        for (int existed = 1; existed >= 0; existed--)
          {
            Case *c = g_new0 (Case, 1);

            c->fmt = (Fmt) f;
            c->step_id = steps[s].id;
            c->step = steps[s].step;
            c->nth = steps[s].nth;
            c->cap = steps[s].cap;
            c->existed = existed;
            c->path = g_strdup_printf ("/data-safety/export/%s/fails/%s/%s", fmts[f].id,
                                       steps[s].id, existed ? "existing" : "new");
            g_test_add_data_func (c->path, c, test_injected);
            g_ptr_array_add (cases, c);
          }
      {
        g_autofree char *a = g_strdup_printf ("/data-safety/export/%s/size-limit", fmts[f].id);
        g_autofree char *b = g_strdup_printf ("/data-safety/export/%s/read-only-folder", fmts[f].id);
        g_autofree char *d = g_strdup_printf ("/data-safety/export/%s/target-is-folder", fmts[f].id);

        g_test_add_data_func (a, GINT_TO_POINTER (f), test_size_limit);
        g_test_add_data_func (b, GINT_TO_POINTER (f), test_read_only_folder);
        g_test_add_data_func (d, GINT_TO_POINTER (f), test_target_is_folder);
      }
    }
  return g_test_run ();
}
