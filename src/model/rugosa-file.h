/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Writing a file atomically: every file Rugosa writes (the project, its
 * recovery copy, an exported chart or table, a report) goes through here,
 * so that a failure at any step leaves the previous file as it was and no
 * temporary file behind (docs/data-safety.md). */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* The backup of the file a write replaced (RUGOSA_FILE_WRITE_BACKUP):
 * the file name plus this. */
#define RUGOSA_FILE_BACKUP_SUFFIX "~"

typedef enum {
  RUGOSA_FILE_WRITE_DEFAULT = 0,
  /* keep the file being replaced as NAME + RUGOSA_FILE_BACKUP_SUFFIX */
  RUGOSA_FILE_WRITE_BACKUP = 1 << 0,
  /* a new file is readable by its owner only (recovery copies) */
  RUGOSA_FILE_WRITE_PRIVATE = 1 << 1,
} RugosaFileWriteFlags;

/* A file being written: a temporary file in the folder of the target,
 * renamed over it by rugosa_file_writer_commit.  Errors are in
 * G_FILE_ERROR, one sentence naming the file, the reason and what is left
 * on disk: "Cannot save “/home/ana/chart.png” because the disk is full;
 * the previous file is unchanged." */
typedef struct RugosaFileWriter RugosaFileWriter;

/* Creates the temporary file; NULL and an error when it cannot. */
RugosaFileWriter *rugosa_file_writer_new (const char *path,
                                          RugosaFileWriteFlags flags,
                                          GError **error);
/* Appends `length` bytes.  After a failure the temporary file is gone and
 * every later call fails; the writer must still be given to _abort. */
gboolean rugosa_file_writer_write (RugosaFileWriter *writer, const void *data,
                                   gsize length, GError **error);
/* fsync, close, keep the backup (if asked), rename over the target, fsync
 * the folder.  Frees the writer, whatever the outcome. */
gboolean rugosa_file_writer_commit (RugosaFileWriter *writer, GError **error);
/* Removes the temporary file and frees the writer (NULL is allowed). */
void rugosa_file_writer_abort (RugosaFileWriter *writer);
G_DEFINE_AUTOPTR_CLEANUP_FUNC (RugosaFileWriter, rugosa_file_writer_abort)

/* The whole of a write in one call. */
gboolean rugosa_file_write_atomic (const char *path, const void *data,
                                   gsize length, RugosaFileWriteFlags flags,
                                   GError **error);

/* Reading a file of bounded size without blocking.  Errors are in
 * RUGOSA_FILE_ERROR, one sentence naming the file (its base name). */
#define RUGOSA_FILE_ERROR (rugosa_file_error_quark ())
GQuark rugosa_file_error_quark (void);
typedef enum {
  RUGOSA_FILE_ERROR_READ,  /* the system's reason: missing, not allowed, I/O */
  RUGOSA_FILE_ERROR_KIND,  /* a folder, a pipe, a device or a socket */
  RUGOSA_FILE_ERROR_SIZE,  /* more than the limit */
} RugosaFileError;

/* The whole regular file at `path`, at most `limit` bytes: opened without
 * blocking (a FIFO with no writer cannot hang it), checked to be a
 * regular file and to be no larger than `limit` before a byte is read,
 * and never more than `limit` bytes read should it grow meanwhile.
 * *data is NUL-terminated; free with g_free. */
gboolean rugosa_file_read_bounded (const char *path, gsize limit, char **data,
                                   gsize *length, GError **error);
/* The same from a stream the user named explicitly (standard input):
 * read to its end, and refused as soon as more than `limit` bytes came
 * (a regular file behind the stream is measured first).  `name` names it
 * in messages. */
gboolean rugosa_file_read_stream (int fd, const char *name, gsize limit,
                                  char **data, gsize *length, GError **error);

/* `path` as a message shows it: in UTF-8, control characters shown as '?'
 * (one line whatever the name holds), at most 120 characters (a longer
 * path keeps its end, where the file name is).  Free with g_free. */
char *rugosa_file_display_name (const char *path);

/* Test hook: called before each step of a write; returning an errno value
 * makes that step fail with it.  For RUGOSA_SAVE_STEP_SHORT_WRITE (asked
 * before every write ()) a positive return is no error but the most bytes
 * that write may take, as a signal or a nearly full disk can cause.
 * RUGOSA_SAVE_STEP_BACKUP is asked only for a write that keeps a backup of
 * an existing file.  NULL restores normal writing. */
typedef enum {
  RUGOSA_SAVE_STEP_WRITE,
  RUGOSA_SAVE_STEP_FSYNC,
  RUGOSA_SAVE_STEP_RENAME,
  RUGOSA_SAVE_STEP_CLOSE,
  RUGOSA_SAVE_STEP_BACKUP,
  RUGOSA_SAVE_STEP_SHORT_WRITE,
} RugosaSaveStep;
typedef int (*RugosaSaveFaultHook) (RugosaSaveStep step, gpointer user_data);
void rugosa_file_set_fault_hook (RugosaSaveFaultHook hook, gpointer user_data);

G_END_DECLS
