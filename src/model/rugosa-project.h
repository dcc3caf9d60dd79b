/* SPDX-License-Identifier: GPL-3.0-or-later */
/* A project document: an ordered list of line options (a GListModel of
 * RugosaLine), the project settings, the evaluation of every line (cached),
 * and the JSON file format (docs/file-format.md). */
#pragma once

#include <gio/gio.h>

#include "rugosa-evaluation.h"
#include "rugosa-file.h"
#include "rugosa-line.h"
#include "rugosa-settings.h"

G_BEGIN_DECLS

#define RUGOSA_PROJECT_ERROR (rugosa_project_error_quark ())
GQuark rugosa_project_error_quark (void);

typedef enum {
  RUGOSA_PROJECT_ERROR_IO,       /* cannot read or write the file */
  RUGOSA_PROJECT_ERROR_ENCODING, /* empty, not UTF-8, NUL bytes */
  RUGOSA_PROJECT_ERROR_SYNTAX,   /* not JSON (message has line and column) */
  RUGOSA_PROJECT_ERROR_FORMAT,   /* JSON, but not a Rugosa project */
  RUGOSA_PROJECT_ERROR_VERSION,  /* a newer major version */
  RUGOSA_PROJECT_ERROR_VALUE,    /* a field with a wrong type or value */
} RugosaProjectError;

/* The "format" string and the major version this build reads and writes. */
#define RUGOSA_PROJECT_FORMAT_NAME "rugosa-line-options"
#define RUGOSA_PROJECT_FORMAT_VERSION 1
/* Backup of the previous file kept by a save: the file name plus this. */
#define RUGOSA_PROJECT_BACKUP_SUFFIX RUGOSA_FILE_BACKUP_SUFFIX

#define RUGOSA_TYPE_PROJECT (rugosa_project_get_type ())
G_DECLARE_FINAL_TYPE (RugosaProject, rugosa_project, RUGOSA, PROJECT, GObject)

RugosaProject *rugosa_project_new (void);

RugosaSettings *rugosa_project_get_settings (RugosaProject *self);
guint rugosa_project_get_n_lines (RugosaProject *self);
/* Borrowed. */
RugosaLine *rugosa_project_get_line (RugosaProject *self, guint position);
/* Position of `line`, or -1. */
int rugosa_project_find_line (RugosaProject *self, RugosaLine *line);

/* Structural edits without undo (RugosaHistory wraps them as commands).
 * position == n appends. */
void rugosa_project_insert_line (RugosaProject *self, guint position,
                                 RugosaLine *line);
/* Returns the removed line (full reference). */
RugosaLine *rugosa_project_remove_line (RugosaProject *self, guint position);
void rugosa_project_move_line (RugosaProject *self, guint from, guint to);

/* Many edits as one change: between hold and release (nested pairs
 * allowed) the project emits "changed" at most once, at the outermost
 * release, so that observers refresh once however many lines and fields
 * the edits touched (an edit applied to many lines, its undo). */
void rugosa_project_hold_changed (RugosaProject *self);
void rugosa_project_release_changed (RugosaProject *self);

/* ---- files (rugosa-project-io.c) ---- */

/* Parse `data` (length bytes) into a new project; NULL and a GError whose
 * message names the JSON path, or line and column for a syntax error. */
RugosaProject *rugosa_project_new_from_data (const char *data, gsize length,
                                             GError **error);
/* Replace the content of `self` with the file at `path`.  On any failure
 * `self` is left exactly as it was. */
gboolean rugosa_project_load (RugosaProject *self, const char *path,
                              GError **error);
/* The same from a stream the user named explicitly (standard input: `fd`
 * 0), read to its end and refused as soon as it passes the size limit;
 * `name` names it in messages. */
gboolean rugosa_project_load_stream (RugosaProject *self, int fd,
                                     const char *name, GError **error);
/* The file text (UTF-8, ends with a newline); free with g_free. */
char *rugosa_project_to_data (RugosaProject *self, gsize *length);
/* Write atomically (temporary file in the same folder, fsync, rename) and
 * keep the previous file as path + RUGOSA_PROJECT_BACKUP_SUFFIX. */
gboolean rugosa_project_save (RugosaProject *self, const char *path,
                              GError **error);
/* True when projects a and b hold the same settings and lines. */
gboolean rugosa_project_equal (RugosaProject *a, RugosaProject *b);

/* Test hook: rugosa_file_set_fault_hook (rugosa-file.h), which every
 * file Rugosa writes goes through; kept under this name for the tests of
 * saving. */
void rugosa_project_set_save_fault_hook (RugosaSaveFaultHook hook,
                                         gpointer user_data);

/* ---- evaluation (rugosa-project-eval.c) ---- */

/* The results of `line` at the settings' service age, computed only when
 * the line or the settings changed since the last call.  Borrowed; valid
 * until the next change or call. */
const RugosaLineResults *rugosa_project_get_results (RugosaProject *self,
                                                     RugosaLine *line);
/* The same at any age (age < 0: the settings' service age). */
const RugosaLineResults *rugosa_project_get_results_at (RugosaProject *self,
                                                        RugosaLine *line,
                                                        double age_years);
/* The same evaluation, uncached, of a line that need not be part of the
 * project (a sizing candidate, a step of an inverse problem), with the
 * project's settings, into `out`; without the energy over the service
 * life, which belongs to the project's own lines. */
void rugosa_project_evaluate_line (RugosaProject *self, RugosaLine *line,
                                   double age_years, RugosaLineResults *out);
/* How many line evaluations were computed so far (for tests and
 * diagnostics of the cache). */
guint64 rugosa_project_get_evaluation_count (RugosaProject *self);

/* Append the evaluation of every line at `age_years` (< 0: the settings'
 * service age) to `out` as a text table, CSV or JSON, SI units, numbers
 * independent of the locale. */
gboolean rugosa_project_format_eval (RugosaProject *self, double age_years,
                                     RugosaEvalFormat format, GString *out,
                                     GError **error);
/* The same written to `path` atomically (rugosa-file.h); a failure to
 * write is RUGOSA_PROJECT_ERROR_IO, one sentence naming the file. */
gboolean rugosa_project_export_eval (RugosaProject *self, double age_years,
                                     RugosaEvalFormat format, const char *path,
                                     GError **error);

G_END_DECLS
