/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Saving a project: its text written atomically by the file writer
 * (rugosa-file.c: temporary file in the same folder, fsync, the previous
 * file kept as the backup NAME~, rename over the target, fsync of the
 * folder; docs/file-format.md, docs/data-safety.md), and the evaluation
 * exported the same way. */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include "rugosa-project-io-private.h"

void
rugosa_project_set_save_fault_hook (RugosaSaveFaultHook hook,
                                    gpointer user_data)
{
  rugosa_file_set_fault_hook (hook, user_data);
}

/* The writer's sentence, in the project's error domain. */
static gboolean
project_io_error (GError **error, GError *local)
{
  g_set_error_literal (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_IO,
                       local->message);
  g_error_free (local);
  return FALSE;
}

gboolean
rugosa_project_save (RugosaProject *self, const char *path, GError **error)
{
  g_autofree char *data = NULL;
  GError *local = NULL;
  gsize length;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), FALSE);
  g_return_val_if_fail (path != NULL, FALSE);

  data = rugosa_project_to_data (self, &length);
  if (!rugosa_file_write_atomic (path, data, length, RUGOSA_FILE_WRITE_BACKUP, &local))
    return project_io_error (error, local);
  return TRUE;
}

gboolean
rugosa_project_export_eval (RugosaProject *self, double age_years,
                            RugosaEvalFormat format, const char *path,
                            GError **error)
{
  g_autoptr (GString) out = g_string_new (NULL);
  GError *local = NULL;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), FALSE);
  g_return_val_if_fail (path != NULL, FALSE);

  if (!rugosa_project_format_eval (self, age_years, format, out, error))
    return FALSE;
  if (!rugosa_file_write_atomic (path, out->str, out->len, RUGOSA_FILE_WRITE_DEFAULT, &local))
    return project_io_error (error, local);
  return TRUE;
}
