/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Saving never loses data: a failure at any step of a save (write, a
 * short write, fsync, close, keeping the backup, rename), for a file that
 * exists and for one that does not, leaves the previous file and its
 * backup (NAME~) byte for byte as they were, leaves no temporary file, and
 * reports one sentence.  Real failures too: a write cut short by the
 * file-size limit (RLIMIT_FSIZE) and a folder without write permission. */
#include "config.h"

#include <errno.h>
#include <signal.h>
#include <string.h>
#include <sys/resource.h>
#include <unistd.h>

#include <glib/gstdio.h>

#include "model/rugosa-project.h"

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

static char *
read_or_null (const char *path)
{
  char *text = NULL;

  if (!g_file_get_contents (path, &text, NULL, NULL))
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

/* The message is one sentence naming the file, the reason and what is
 * left on disk. */
static void
assert_one_sentence (const GError *error, const char *path, const char *reason,
                     gboolean existed)
{
  g_autofree char *display = g_filename_display_name (path);
  const char *m = error->message;

  g_assert_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_IO);
  g_assert_true (g_str_has_prefix (m, "Cannot save “"));
  g_assert_nonnull (strstr (m, display));
  g_assert_nonnull (strstr (m, reason));
  g_assert_true (g_str_has_suffix (m, existed ? "; the previous file is unchanged."
                                              : "; no file was created."));
  /* one sentence: no full stop before the end */
  g_assert_null (strstr (m, ". "));
  g_assert_null (strchr (m, '\n'));
}

/* Compares file contents without printing kilobytes on failure. */
#define assert_same_text(a, b) \
  G_STMT_START { \
    if (g_strcmp0 ((a), (b)) != 0) \
      g_error ("%s != %s (lengths %zu, %zu)", #a, #b, \
               (a) ? strlen (a) : 0, (b) ? strlen (b) : 0); \
  } G_STMT_END

/* ---- injected failures ---- */

typedef struct {
  RugosaSaveStep step;  /* the step that fails */
  int nth;              /* on its nth call (1 = the first) */
  int cap;              /* > 0: every write takes at most this many bytes */
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
  const char *name;
  RugosaSaveStep step;
  int nth;
  int cap;
  gboolean existed;  /* the file (and a backup) exist before the save */
} Case;

static const Case cases[] = {
  { "write/existing", RUGOSA_SAVE_STEP_WRITE, 1, 0, TRUE },
  { "write/new", RUGOSA_SAVE_STEP_WRITE, 1, 0, FALSE },
  /* two 100-byte short writes, then the disk is full */
  { "write-after-short/existing", RUGOSA_SAVE_STEP_WRITE, 3, 100, TRUE },
  { "write-after-short/new", RUGOSA_SAVE_STEP_WRITE, 3, 100, FALSE },
  { "fsync/existing", RUGOSA_SAVE_STEP_FSYNC, 1, 0, TRUE },
  { "fsync/new", RUGOSA_SAVE_STEP_FSYNC, 1, 0, FALSE },
  { "close/existing", RUGOSA_SAVE_STEP_CLOSE, 1, 0, TRUE },
  { "close/new", RUGOSA_SAVE_STEP_CLOSE, 1, 0, FALSE },
  { "backup/existing", RUGOSA_SAVE_STEP_BACKUP, 1, 0, TRUE },
  { "rename/existing", RUGOSA_SAVE_STEP_RENAME, 1, 0, TRUE },
  { "rename/new", RUGOSA_SAVE_STEP_RENAME, 1, 0, FALSE },
};

/* Two saves, so that both the file (second generation) and its backup
 * (first generation) exist and differ. */
static void
make_two_generations (RugosaProject *p, const char *path,
                      char **gen1, char **gen2)
{
  g_autoptr (GError) error = NULL;
  g_autofree char *backup = g_strconcat (path, RUGOSA_PROJECT_BACKUP_SUFFIX, NULL);

  rugosa_line_set_name (rugosa_project_get_line (p, 0), "First generation");
  g_assert_true (rugosa_project_save (p, path, &error));
  g_assert_no_error (error);
  rugosa_line_set_name (rugosa_project_get_line (p, 0), "Second generation");
  g_assert_true (rugosa_project_save (p, path, &error));
  g_assert_no_error (error);
  *gen1 = read_or_null (backup);
  *gen2 = read_or_null (path);
  g_assert_nonnull (strstr (*gen1, "\"First generation\""));
  g_assert_nonnull (strstr (*gen2, "\"Second generation\""));
}

static void
test_injected (gconstpointer data)
{
  const Case *c = data;
  g_autoptr (RugosaProject) p = load_demo ();
  g_autoptr (GError) error = NULL;
  g_autofree char *dir = g_dir_make_tmp ("rugosa-safety-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "plant.rugosa", NULL);
  g_autofree char *backup = g_strconcat (path, RUGOSA_PROJECT_BACKUP_SUFFIX, NULL);
  g_autofree char *gen1 = NULL, *gen2 = NULL, *expected = NULL;
  g_autofree char *before = NULL, *after = NULL, *now = NULL, *now_backup = NULL;
  Fault fault = { c->step, c->nth, c->cap, 0 };

  if (c->existed)
    make_two_generations (p, path, &gen1, &gen2);
  before = list_dir (dir);

  rugosa_line_set_name (rugosa_project_get_line (p, 0), "Edited");
  rugosa_project_set_save_fault_hook (fault_hook, &fault);
  g_assert_false (rugosa_project_save (p, path, &error));
  rugosa_project_set_save_fault_hook (NULL, NULL);
  g_assert_cmpint (fault.calls, ==, c->nth);
  assert_one_sentence (error, path, "the disk is full", c->existed);
  g_clear_error (&error);

  /* Nothing on disk changed: same names (no temporary file left), same
   * bytes in the file and in its backup. */
  after = list_dir (dir);
  g_assert_cmpstr (after, ==, before);
  now = read_or_null (path);
  now_backup = read_or_null (backup);
  assert_same_text (now, gen2);
  assert_same_text (now_backup, gen1);

  /* The same save without the fault replaces the file whole and keeps
   * the file it replaced as the backup. */
  g_assert_true (rugosa_project_save (p, path, &error));
  g_assert_no_error (error);
  expected = rugosa_project_to_data (p, NULL);
  g_free (now);
  g_free (now_backup);
  now = read_or_null (path);
  now_backup = read_or_null (backup);
  assert_same_text (now, expected);
  assert_same_text (now_backup, gen2);

  remove_dir (dir);
}

/* A first save makes no backup, so a backup fault cannot touch it. */
static void
test_backup_new (void)
{
  g_autoptr (RugosaProject) p = load_demo ();
  g_autoptr (GError) error = NULL;
  g_autofree char *dir = g_dir_make_tmp ("rugosa-safety-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "plant.rugosa", NULL);
  g_autofree char *names = NULL;
  Fault fault = { RUGOSA_SAVE_STEP_BACKUP, 1, 0, 0 };

  rugosa_project_set_save_fault_hook (fault_hook, &fault);
  g_assert_true (rugosa_project_save (p, path, &error));
  rugosa_project_set_save_fault_hook (NULL, NULL);
  g_assert_no_error (error);
  g_assert_cmpint (fault.calls, ==, 0);
  names = list_dir (dir);
  g_assert_cmpstr (names, ==, "plant.rugosa");
  remove_dir (dir);
}

/* Short writes that do not fail still give the whole file. */
static void
test_short_writes (void)
{
  g_autoptr (RugosaProject) p = load_demo ();
  g_autoptr (GError) error = NULL;
  g_autofree char *dir = g_dir_make_tmp ("rugosa-safety-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "plant.rugosa", NULL);
  g_autofree char *backup = g_strconcat (path, RUGOSA_PROJECT_BACKUP_SUFFIX, NULL);
  g_autofree char *gen1 = NULL, *gen2 = NULL, *expected = NULL, *now = NULL, *now_backup = NULL;
  /* 7 bytes: a prime, so no write ends on a line or a UTF-8 boundary by luck */
  Fault fault = { RUGOSA_SAVE_STEP_WRITE, -1, 7, 0 };

  make_two_generations (p, path, &gen1, &gen2);
  rugosa_line_set_name (rugosa_project_get_line (p, 0), "Written seven bytes at a time ü");
  rugosa_project_set_save_fault_hook (fault_hook, &fault);
  g_assert_true (rugosa_project_save (p, path, &error));
  rugosa_project_set_save_fault_hook (NULL, NULL);
  g_assert_no_error (error);
  expected = rugosa_project_to_data (p, NULL);
  /* one write call per 7 bytes, rounded up */
  g_assert_cmpint (fault.calls, ==, (int) ((strlen (expected) + 6) / 7));
  now = read_or_null (path);
  now_backup = read_or_null (backup);
  assert_same_text (now, expected);
  assert_same_text (now_backup, gen2);
  remove_dir (dir);
}

/* ---- real failures, in a subprocess ---- */

/* The kernel cuts the write short at the file-size limit and then refuses
 * more with EFBIG: a disk that fills up in the middle of the file. */
static void
test_size_limit (void)
{
  g_autofree char *dir = NULL, *path = NULL, *gen1 = NULL, *gen2 = NULL;
  g_autofree char *before = NULL, *after = NULL, *now = NULL, *now_backup = NULL, *backup = NULL;

  if (g_test_subprocess ())
    {
      g_autoptr (RugosaProject) p = load_demo ();
      g_autoptr (GError) error = NULL;
      struct rlimit limit = { 512, 512 };

      path = g_strdup (g_getenv ("RUGOSA_SAFETY_PATH"));
      signal (SIGXFSZ, SIG_IGN);
      g_assert_cmpint (setrlimit (RLIMIT_FSIZE, &limit), ==, 0);
      rugosa_line_set_name (rugosa_project_get_line (p, 0), "Edited");
      g_assert_false (rugosa_project_save (p, path, &error));
      assert_one_sentence (error, path, "the file is too large for the disk", TRUE);
      return;
    }

  {
    g_autoptr (RugosaProject) p = load_demo ();
    dir = g_dir_make_tmp ("rugosa-safety-XXXXXX", NULL);
    path = g_build_filename (dir, "plant.rugosa", NULL);
    backup = g_strconcat (path, RUGOSA_PROJECT_BACKUP_SUFFIX, NULL);
    make_two_generations (p, path, &gen1, &gen2);
    /* the limit must fall inside the file for the write to be cut */
    g_assert_cmpuint (strlen (gen2), >, 512);
  }
  before = list_dir (dir);
  g_setenv ("RUGOSA_SAFETY_PATH", path, TRUE);
  g_test_trap_subprocess (NULL, 0, G_TEST_SUBPROCESS_INHERIT_STDERR);
  g_test_trap_assert_passed ();
  g_unsetenv ("RUGOSA_SAFETY_PATH");

  after = list_dir (dir);
  g_assert_cmpstr (after, ==, before);
  now = read_or_null (path);
  now_backup = read_or_null (backup);
  assert_same_text (now, gen2);
  assert_same_text (now_backup, gen1);
  remove_dir (dir);
}

/* A folder the user may not write in.  Root may write anywhere, so when
 * run as root the subprocess first becomes the unprivileged user
 * "nobody" (uid 65534 on Debian). */
static void
test_read_only_folder (void)
{
  g_autofree char *dir = NULL, *path = NULL, *gen1 = NULL, *gen2 = NULL;
  g_autofree char *before = NULL, *after = NULL, *now = NULL, *now_backup = NULL, *backup = NULL;

  if (g_test_subprocess ())
    {
      g_autoptr (RugosaProject) p = load_demo ();
      g_autoptr (GError) error = NULL;
      g_autofree char *fresh = NULL;

      path = g_strdup (g_getenv ("RUGOSA_SAFETY_PATH"));
      if (geteuid () == 0)
        {
          g_assert_cmpint (setgid (65534), ==, 0);
          g_assert_cmpint (setuid (65534), ==, 0);
        }
      rugosa_line_set_name (rugosa_project_get_line (p, 0), "Edited");
      g_assert_false (rugosa_project_save (p, path, &error));
      assert_one_sentence (error, path, "you are not allowed to write in its folder", TRUE);
      g_clear_error (&error);
      /* a new file in the same folder */
      fresh = g_build_filename (g_getenv ("RUGOSA_SAFETY_DIR"), "fresh.rugosa", NULL);
      g_assert_false (rugosa_project_save (p, fresh, &error));
      assert_one_sentence (error, fresh, "you are not allowed to write in its folder", FALSE);
      return;
    }

  {
    g_autoptr (RugosaProject) p = load_demo ();
    dir = g_dir_make_tmp ("rugosa-safety-XXXXXX", NULL);
    path = g_build_filename (dir, "plant.rugosa", NULL);
    backup = g_strconcat (path, RUGOSA_PROJECT_BACKUP_SUFFIX, NULL);
    make_two_generations (p, path, &gen1, &gen2);
  }
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
  now = read_or_null (path);
  now_backup = read_or_null (backup);
  assert_same_text (now, gen2);
  assert_same_text (now_backup, gen1);
  remove_dir (dir);
}

/* ---- refused files are left alone ---- */

/* A file of a newer major version is refused, the open document keeps
 * its content, and the file keeps its bytes. */
static void
test_newer_version (void)
{
  g_autoptr (RugosaProject) p = load_demo ();
  g_autoptr (GError) error = NULL;
  g_autofree char *dir = g_dir_make_tmp ("rugosa-safety-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "future.rugosa", NULL);
  g_autofree char *before = rugosa_project_to_data (p, NULL);
  g_autofree char *after = NULL, *now = NULL, *names = NULL;
  g_autofree char *text = g_strdup_printf ("{\"format\": \"%s\", \"version\": %d, \"lines\": []}\n",
                                           RUGOSA_PROJECT_FORMAT_NAME,
                                           RUGOSA_PROJECT_FORMAT_VERSION + 1);

  g_assert_true (g_file_set_contents (path, text, -1, NULL));
  g_assert_false (rugosa_project_load (p, path, &error));
  g_assert_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_VERSION);
  after = rugosa_project_to_data (p, NULL);
  g_assert_cmpstr (after, ==, before);
  now = read_or_null (path);
  assert_same_text (now, text);
  names = list_dir (dir);
  g_assert_cmpstr (names, ==, "future.rugosa");
  remove_dir (dir);
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autofree char *name = g_strdup_printf ("/data-safety/save/fails/%s", cases[i].name);
      g_test_add_data_func (name, &cases[i], test_injected);
    }
  g_test_add_func ("/data-safety/save/backup/new", test_backup_new);
  g_test_add_func ("/data-safety/save/short-writes", test_short_writes);
  g_test_add_func ("/data-safety/save/size-limit", test_size_limit);
  g_test_add_func ("/data-safety/save/read-only-folder", test_read_only_folder);
  g_test_add_func ("/data-safety/open/newer-version", test_newer_version);
  return g_test_run ();
}
