/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Saving a project atomically: a temporary file in the same folder,
 * fsync, the previous file kept as the backup NAME~, rename over the
 * target, fsync of the folder (docs/file-format.md, docs/data-safety.md). */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <errno.h>
#include <fcntl.h>
#include <string.h>
#include <sys/stat.h>
#include <unistd.h>

#include <glib/gstdio.h>

#include "rugosa-project-io-private.h"

static RugosaSaveFaultHook fault_hook;
static gpointer fault_hook_data;

void
rugosa_project_set_save_fault_hook (RugosaSaveFaultHook hook,
                                    gpointer user_data)
{
  fault_hook = hook;
  fault_hook_data = user_data;
}

static int
injected (RugosaSaveStep step)
{
  return fault_hook != NULL ? fault_hook (step, fault_hook_data) : 0;
}

/* The reason a save failed, in words a user can act on. */
static char *
io_reason (int errsv, const char *what)
{
  switch (errsv)
    {
    case ENOSPC:
#ifdef EDQUOT
    case EDQUOT:
#endif
      return g_strdup (_("the disk is full"));
    case EFBIG:
      return g_strdup (_("the file is too large for the disk"));
    case EACCES:
    case EPERM:
      return g_strdup (_("you are not allowed to write in its folder"));
    case EROFS:
      return g_strdup (_("the disk is read-only"));
    default:
      return g_strdup_printf (_("%s failed (%s)"), what, g_strerror (errsv));
    }
}

/* One sentence: which file, why, and that nothing on disk was harmed. */
static gboolean
io_error (GError **error, int errsv, const char *what, const char *path,
          gboolean existed)
{
  g_autofree char *display = g_filename_display_name (path);
  g_autofree char *reason = io_reason (errsv, what);

  g_set_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_IO,
               _("Cannot save “%s” because %s; %s."), display, reason,
               existed ? _("the previous file is unchanged") : _("no file was created"));
  return FALSE;
}

/* Keep the current file under the name `fresh`, to become the backup once
 * the new file is in place: a hard link where the file system has them, a
 * copy otherwise.  Nothing visible changes until the renames. */
static gboolean
stage_backup (const char *path, const char *fresh, GError **error)
{
  g_autofree char *old = NULL;
  gsize n;
  int errsv;

  if ((errsv = injected (RUGOSA_SAVE_STEP_BACKUP)) != 0)
    return io_error (error, errsv, "keeping a backup", path, TRUE);
  if (g_unlink (fresh) != 0 && errno != ENOENT)
    return io_error (error, errno, "keeping a backup", path, TRUE);
  if (link (path, fresh) == 0)
    return TRUE;
  if (!g_file_get_contents (path, &old, &n, NULL)
      || !g_file_set_contents (fresh, old, (gssize) n, NULL))
    {
      g_unlink (fresh);
      return io_error (error, EIO, "keeping a backup", path, TRUE);
    }
  return TRUE;
}

gboolean
rugosa_project_save (RugosaProject *self, const char *path, GError **error)
{
  g_autofree char *data = NULL;
  g_autofree char *dir = NULL;
  g_autofree char *base = NULL;
  g_autofree char *tmp = NULL;
  g_autofree char *backup = NULL;
  g_autofree char *fresh = NULL;
  gsize length, done = 0;
  struct stat st;
  gboolean existed;
  int fd, errsv;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), FALSE);
  g_return_val_if_fail (path != NULL, FALSE);

  data = rugosa_project_to_data (self, &length);
  dir = g_path_get_dirname (path);
  base = g_path_get_basename (path);
  tmp = g_strdup_printf ("%s/.%s.XXXXXX", dir, base);
  backup = g_strconcat (path, RUGOSA_PROJECT_BACKUP_SUFFIX, NULL);
  fresh = g_strdup_printf ("%s/.%s%s.new", dir, base, RUGOSA_PROJECT_BACKUP_SUFFIX);
  existed = stat (path, &st) == 0;

  fd = g_mkstemp_full (tmp, O_WRONLY | O_CLOEXEC, 0644);
  if (fd < 0)
    return io_error (error, errno, "creating a temporary file", path, existed);
  /* Keep the permissions of the file being replaced. */
  if (existed)
    (void) fchmod (fd, st.st_mode & 07777);

  while (done < length)
    {
      gsize chunk = length - done;
      int cap;
      ssize_t w;

      if ((errsv = injected (RUGOSA_SAVE_STEP_WRITE)) != 0)
        goto failed_write;
      if ((cap = injected (RUGOSA_SAVE_STEP_SHORT_WRITE)) > 0)
        chunk = MIN (chunk, (gsize) cap);
      w = write (fd, data + done, chunk);
      if (w < 0)
        {
          if (errno == EINTR)
            continue;
          errsv = errno;
          goto failed_write;
        }
      /* A regular file that takes nothing is as good as full. */
      if (w == 0)
        {
          errsv = ENOSPC;
          goto failed_write;
        }
      done += (gsize) w;
    }
  if ((errsv = injected (RUGOSA_SAVE_STEP_FSYNC)) != 0
      || (fsync (fd) != 0 && (errsv = errno) != 0))
    {
      close (fd);
      g_unlink (tmp);
      return io_error (error, errsv, "flushing to disk (fsync)", path, existed);
    }
  /* Some file systems (NFS, quotas) report a failed write only here. */
  if ((errsv = injected (RUGOSA_SAVE_STEP_CLOSE)) != 0)
    {
      close (fd);
      g_unlink (tmp);
      return io_error (error, errsv, "closing the temporary file", path, existed);
    }
  if (close (fd) != 0)
    {
      errsv = errno;
      g_unlink (tmp);
      return io_error (error, errsv, "closing the temporary file", path, existed);
    }

  /* The file and its backup change only now, each by one rename: the new
   * file over the old, then the old over the backup.  A failure before
   * the first rename leaves both as they were. */
  if (existed && !stage_backup (path, fresh, error))
    {
      g_unlink (tmp);
      return FALSE;
    }
  if ((errsv = injected (RUGOSA_SAVE_STEP_RENAME)) != 0
      || (g_rename (tmp, path) != 0 && (errsv = errno) != 0))
    {
      g_unlink (tmp);
      if (existed)
        g_unlink (fresh);
      return io_error (error, errsv, "renaming the temporary file", path, existed);
    }
  /* The save is done; should this rename fail, the backup is merely one
   * generation older. */
  if (existed && g_rename (fresh, backup) != 0)
    {
      g_debug ("Cannot update the backup %s: %s", backup, g_strerror (errno));
      g_unlink (fresh);
    }

  /* Make the rename itself durable. */
  if ((fd = open (dir, O_RDONLY | O_DIRECTORY | O_CLOEXEC)) >= 0)
    {
      (void) fsync (fd);
      close (fd);
    }
  return TRUE;

failed_write:
  close (fd);
  g_unlink (tmp);
  return io_error (error, errsv, "writing", path, existed);
}
