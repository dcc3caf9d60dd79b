/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Writing a file atomically (docs/data-safety.md):
 *
 *  1. the bytes go to a temporary file ".NAME.XXXXXX" in the folder of
 *     NAME (same file system, so the rename below is atomic), with the
 *     permissions of the file it replaces; short writes are continued and
 *     a write that takes nothing counts as a full disk;
 *  2. fsync and close it (some file systems report a failed write only
 *     there);
 *  3. for a write that keeps a backup: stage the current NAME as
 *     ".NAME~.new" (a hard link, or a copy where there are none);
 *  4. rename the temporary file over NAME — the moment the write happens;
 *     before it nothing visible has changed;
 *  5. rename the staged file over NAME~, then fsync the folder so that the
 *     renames last.
 * Any failure before step 4 removes every file the write made and leaves
 * NAME (and NAME~) byte for byte as they were.
 *
 * Reading is bounded: a file is opened without blocking and checked to be
 * a regular file of at most the caller's limit before a byte is read; a
 * stream the user named is read in chunks and refused as soon as it
 * passes the limit.  Nothing can hang on a FIFO or fill the memory from a
 * sparse file or /dev/zero. */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <errno.h>
#include <fcntl.h>
#include <poll.h>
#include <string.h>
#include <sys/stat.h>
#include <unistd.h>

#include <glib/gstdio.h>

#include "rugosa-file.h"

struct RugosaFileWriter {
  char *path;
  char *tmp;          /* the temporary file; NULL once removed or renamed */
  int fd;             /* -1 once closed */
  gboolean existed;   /* a file was at `path` when the write began */
  gboolean failed;
  RugosaFileWriteFlags flags;
};

static RugosaSaveFaultHook fault_hook;
static gpointer fault_hook_data;

void
rugosa_file_set_fault_hook (RugosaSaveFaultHook hook, gpointer user_data)
{
  fault_hook = hook;
  fault_hook_data = user_data;
}

static int
injected (RugosaSaveStep step)
{
  return fault_hook != NULL ? fault_hook (step, fault_hook_data) : 0;
}

char *
rugosa_file_display_name (const char *path)
{
  enum { MAX_CHARS = 120 };
  g_autofree char *name = g_filename_display_name (path);
  GString *out = g_string_new (NULL);
  glong n = g_utf8_strlen (name, -1);
  const char *p = name;

  if (n > MAX_CHARS)
    {
      g_string_append (out, "…");
      p = g_utf8_offset_to_pointer (name, n - (MAX_CHARS - 1));
    }
  for (; *p != '\0'; p = g_utf8_next_char (p))
    {
      gunichar c = g_utf8_get_char (p);

      /* g_filename_display_name shows broken bytes as U+FFFD already */
      if (g_unichar_iscntrl (c))
        g_string_append_c (out, '?');
      else
        g_string_append_unichar (out, c);
    }
  return g_string_free (out, FALSE);
}

/* The reason a write failed, in words a user can act on.  `what` is the
 * step (N_), named only for a reason without words of its own. */
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
    case EISDIR:
      return g_strdup (_("a folder has that name"));
    case ENOENT:
    case ENOTDIR:
      return g_strdup (_("its folder does not exist"));
    case ENAMETOOLONG:
      return g_strdup (_("its name is too long"));
    default:
      return g_strdup_printf (_("%s failed (%s)"), _(what), g_strerror (errsv));
    }
}

/* One sentence: which file, why, and that nothing on disk was harmed. */
static gboolean
io_error (GError **error, int errsv, const char *what, const char *path,
          gboolean existed)
{
  g_autofree char *display = rugosa_file_display_name (path);
  g_autofree char *reason = io_reason (errsv, what);

  g_set_error (error, G_FILE_ERROR, g_file_error_from_errno (errsv),
               _("Cannot save “%s” because %s; %s."), display, reason,
               existed ? _("the previous file is unchanged") : _("no file was created"));
  return FALSE;
}

/* Remove the temporary file; the error (if any) is set already. */
static void
discard (RugosaFileWriter *w)
{
  if (w->fd >= 0)
    {
      close (w->fd);
      w->fd = -1;
    }
  if (w->tmp != NULL)
    {
      g_unlink (w->tmp);
      g_clear_pointer (&w->tmp, g_free);
    }
  w->failed = TRUE;
}

static void
writer_free (RugosaFileWriter *w)
{
  g_free (w->path);
  g_free (w->tmp);
  g_free (w);
}

RugosaFileWriter *
rugosa_file_writer_new (const char *path, RugosaFileWriteFlags flags,
                        GError **error)
{
  g_autofree char *dir = NULL;
  g_autofree char *base = NULL;
  RugosaFileWriter *w;
  struct stat st;

  g_return_val_if_fail (path != NULL, NULL);

  w = g_new0 (RugosaFileWriter, 1);
  w->path = g_strdup (path);
  w->flags = flags;
  w->fd = -1;
  w->existed = stat (path, &st) == 0;
  if (w->existed && S_ISDIR (st.st_mode))
    {
      io_error (error, EISDIR, N_("replacing the file"), path, FALSE);
      writer_free (w);
      return NULL;
    }
  dir = g_path_get_dirname (path);
  base = g_path_get_basename (path);
  w->tmp = g_strdup_printf ("%s/.%s.XXXXXX", dir, base);
  w->fd = g_mkstemp_full (w->tmp, O_WRONLY | O_CLOEXEC,
                          (flags & RUGOSA_FILE_WRITE_PRIVATE) ? 0600 : 0644);
  if (w->fd < 0)
    {
      int errsv = errno;

      /* nothing was created: do not remove a file of that name */
      g_clear_pointer (&w->tmp, g_free);
      io_error (error, errsv, N_("creating a temporary file"), path, w->existed);
      writer_free (w);
      return NULL;
    }
  /* Keep the permissions of the file being replaced. */
  if (w->existed)
    (void) fchmod (w->fd, st.st_mode & 07777);
  return w;
}

gboolean
rugosa_file_writer_write (RugosaFileWriter *w, const void *data, gsize length,
                          GError **error)
{
  const char *bytes = data;
  gsize done = 0;

  g_return_val_if_fail (w != NULL, FALSE);

  if (w->failed)
    return io_error (error, EIO, N_("writing"), w->path, w->existed);
  while (done < length)
    {
      gsize chunk = length - done;
      int cap, errsv;
      ssize_t n;

      if ((errsv = injected (RUGOSA_SAVE_STEP_WRITE)) != 0)
        {
          discard (w);
          return io_error (error, errsv, N_("writing"), w->path, w->existed);
        }
      if ((cap = injected (RUGOSA_SAVE_STEP_SHORT_WRITE)) > 0)
        chunk = MIN (chunk, (gsize) cap);
      n = write (w->fd, bytes + done, chunk);
      if (n < 0 && errno == EINTR)
        continue;
      /* A regular file that takes nothing is as good as full. */
      if (n <= 0)
        {
          errsv = n < 0 ? errno : ENOSPC;
          discard (w);
          return io_error (error, errsv, N_("writing"), w->path, w->existed);
        }
      done += (gsize) n;
    }
  return TRUE;
}

/* Keep the current file under the name `fresh`, to become the backup once
 * the new file is in place: a hard link where the file system has them, a
 * copy otherwise.  Nothing visible changes until the renames. */
static gboolean
stage_backup (RugosaFileWriter *w, const char *fresh, GError **error)
{
  g_autofree char *old = NULL;
  gsize n;
  int errsv;

  if ((errsv = injected (RUGOSA_SAVE_STEP_BACKUP)) != 0)
    return io_error (error, errsv, N_("keeping a backup"), w->path, TRUE);
  if (g_unlink (fresh) != 0 && errno != ENOENT)
    return io_error (error, errno, N_("keeping a backup"), w->path, TRUE);
  if (link (w->path, fresh) == 0)
    return TRUE;
  if (!g_file_get_contents (w->path, &old, &n, NULL)
      || !g_file_set_contents (fresh, old, (gssize) n, NULL))
    {
      g_unlink (fresh);
      return io_error (error, EIO, N_("keeping a backup"), w->path, TRUE);
    }
  return TRUE;
}

gboolean
rugosa_file_writer_commit (RugosaFileWriter *w, GError **error)
{
  g_autofree char *dir = NULL;
  g_autofree char *base = NULL;
  g_autofree char *backup = NULL;
  g_autofree char *fresh = NULL;
  gboolean keep_backup;
  int errsv, fd;

  g_return_val_if_fail (w != NULL, FALSE);

  if (w->failed)
    {
      io_error (error, EIO, N_("writing"), w->path, w->existed);
      writer_free (w);
      return FALSE;
    }
  if ((errsv = injected (RUGOSA_SAVE_STEP_FSYNC)) != 0
      || (fsync (w->fd) != 0 && (errsv = errno) != 0))
    {
      discard (w);
      io_error (error, errsv, N_("flushing to disk (fsync)"), w->path, w->existed);
      writer_free (w);
      return FALSE;
    }
  /* Some file systems (NFS, quotas) report a failed write only here. */
  errsv = injected (RUGOSA_SAVE_STEP_CLOSE);
  if (close (w->fd) != 0 && errsv == 0)
    errsv = errno;
  w->fd = -1;
  if (errsv != 0)
    {
      discard (w);
      io_error (error, errsv, N_("closing the temporary file"), w->path, w->existed);
      writer_free (w);
      return FALSE;
    }

  /* The file and its backup change only now, each by one rename: the new
   * file over the old, then the old over the backup.  A failure before
   * the first rename leaves both as they were. */
  dir = g_path_get_dirname (w->path);
  base = g_path_get_basename (w->path);
  keep_backup = w->existed && (w->flags & RUGOSA_FILE_WRITE_BACKUP);
  if (keep_backup)
    {
      backup = g_strconcat (w->path, RUGOSA_FILE_BACKUP_SUFFIX, NULL);
      fresh = g_strdup_printf ("%s/.%s%s.new", dir, base, RUGOSA_FILE_BACKUP_SUFFIX);
      if (!stage_backup (w, fresh, error))
        {
          discard (w);
          writer_free (w);
          return FALSE;
        }
    }
  if ((errsv = injected (RUGOSA_SAVE_STEP_RENAME)) != 0
      || (g_rename (w->tmp, w->path) != 0 && (errsv = errno) != 0))
    {
      discard (w);
      if (keep_backup)
        g_unlink (fresh);
      io_error (error, errsv, N_("renaming the temporary file"), w->path, w->existed);
      writer_free (w);
      return FALSE;
    }
  /* The write is done; should this rename fail, the backup is merely one
   * generation older. */
  if (keep_backup && g_rename (fresh, backup) != 0)
    {
      g_debug ("Cannot update the backup %s: %s", backup, g_strerror (errno));
      g_unlink (fresh);
    }

  /* Make the renames themselves durable. */
  if ((fd = open (dir, O_RDONLY | O_DIRECTORY | O_CLOEXEC)) >= 0)
    {
      (void) fsync (fd);
      close (fd);
    }
  writer_free (w);
  return TRUE;
}

void
rugosa_file_writer_abort (RugosaFileWriter *w)
{
  if (w == NULL)
    return;
  discard (w);
  writer_free (w);
}

gboolean
rugosa_file_write_atomic (const char *path, const void *data, gsize length,
                          RugosaFileWriteFlags flags, GError **error)
{
  g_autoptr (RugosaFileWriter) w = NULL;

  g_return_val_if_fail (path != NULL, FALSE);
  g_return_val_if_fail (data != NULL || length == 0, FALSE);

  if ((w = rugosa_file_writer_new (path, flags, error)) == NULL)
    return FALSE;
  if (!rugosa_file_writer_write (w, data, length, error))
    return FALSE;
  return rugosa_file_writer_commit (g_steal_pointer (&w), error);
}

/* ---- reading ---- */

G_DEFINE_QUARK (rugosa-file-error-quark, rugosa_file_error)

static gboolean
read_error (GError **error, int code, int errsv, const char *display)
{
  g_set_error (error, RUGOSA_FILE_ERROR, code, _("Cannot read “%s”: %s."),
               display, g_strerror (errsv));
  return FALSE;
}

static gboolean
kind_error (GError **error, mode_t mode, const char *display)
{
  g_set_error (error, RUGOSA_FILE_ERROR, RUGOSA_FILE_ERROR_KIND,
               S_ISDIR (mode)
                 ? _("Cannot read “%s”: it is a folder, not a file.")
                 : _("Cannot read “%s”: it is not a regular file (a pipe, a device or a socket)."),
               display);
  return FALSE;
}

static gboolean
size_error (GError **error, gsize limit, const char *display)
{
  g_autofree char *size = g_format_size_full (limit, G_FORMAT_SIZE_IEC_UNITS);

  g_set_error (error, RUGOSA_FILE_ERROR, RUGOSA_FILE_ERROR_SIZE,
               _("Cannot read “%s”: it is larger than %s."), display, size);
  return FALSE;
}

gboolean
rugosa_file_read_bounded (const char *path, gsize limit, char **data,
                          gsize *length, GError **error)
{
  g_autofree char *base = NULL;
  g_autofree char *display = NULL;
  g_autofree char *buf = NULL;
  struct stat st;
  gsize want, done = 0;
  int fd;

  g_return_val_if_fail (path != NULL && data != NULL && length != NULL, FALSE);

  base = g_path_get_basename (path);
  display = rugosa_file_display_name (base);
  /* O_NONBLOCK: opening a FIFO with no writer returns at once (and is
   * then refused below) instead of waiting for one. */
  fd = open (path, O_RDONLY | O_NONBLOCK | O_CLOEXEC | O_NOCTTY);
  if (fd < 0)
    return read_error (error, RUGOSA_FILE_ERROR_READ, errno, display);
  if (fstat (fd, &st) != 0)
    {
      int errsv = errno;
      close (fd);
      return read_error (error, RUGOSA_FILE_ERROR_READ, errsv, display);
    }
  if (!S_ISREG (st.st_mode))
    {
      close (fd);
      return kind_error (error, st.st_mode, display);
    }
  /* The size before a byte is read: a sparse file of a terabyte costs
   * nothing to refuse. */
  if ((guint64) st.st_size > limit)
    {
      close (fd);
      return size_error (error, limit, display);
    }
  /* The size may change while reading: never take more than it had. */
  want = (gsize) st.st_size;
  buf = g_malloc (want + 1);
  while (done < want)
    {
      ssize_t n = read (fd, buf + done, want - done);

      if (n < 0 && errno == EINTR)
        continue;
      if (n < 0)
        {
          int errsv = errno;
          close (fd);
          return read_error (error, RUGOSA_FILE_ERROR_READ, errsv, display);
        }
      if (n == 0)
        break;
      done += (gsize) n;
    }
  close (fd);
  buf[done] = '\0';
  *data = g_steal_pointer (&buf);
  *length = done;
  return TRUE;
}

gboolean
rugosa_file_read_stream (int fd, const char *name, gsize limit, char **data,
                         gsize *length, GError **error)
{
  enum { CHUNK = 64 * 1024 };
  g_autofree char *display = NULL;
  g_autoptr (GByteArray) buf = NULL;
  struct stat st;

  g_return_val_if_fail (fd >= 0 && name != NULL, FALSE);
  g_return_val_if_fail (data != NULL && length != NULL, FALSE);

  display = rugosa_file_display_name (name);
  if (fstat (fd, &st) != 0)
    return read_error (error, RUGOSA_FILE_ERROR_READ, errno, display);
  if (S_ISDIR (st.st_mode))
    return kind_error (error, st.st_mode, display);
  if (S_ISREG (st.st_mode) && (guint64) st.st_size > limit)
    return size_error (error, limit, display);

  buf = g_byte_array_new ();
  for (;;)
    {
      ssize_t n;

      /* never hold more than the limit and one chunk */
      g_byte_array_set_size (buf, buf->len + CHUNK);
      n = read (fd, buf->data + buf->len - CHUNK, CHUNK);
      g_byte_array_set_size (buf, buf->len - CHUNK + (guint) MAX (n, 0));
      if (n < 0 && errno == EINTR)
        continue;
      if (n < 0 && (errno == EAGAIN || errno == EWOULDBLOCK))
        {
          /* a stream left non-blocking by whoever passed it: wait for it */
          struct pollfd pfd = { fd, POLLIN, 0 };
          (void) poll (&pfd, 1, -1);
          continue;
        }
      if (n < 0)
        return read_error (error, RUGOSA_FILE_ERROR_READ, errno, display);
      if (n == 0)
        break;
      if (buf->len > limit)
        return size_error (error, limit, display);
    }
  *length = buf->len;
  g_byte_array_append (buf, (const guint8 *) "", 1);
  *data = (char *) g_byte_array_free (g_steal_pointer (&buf), FALSE);
  return TRUE;
}
