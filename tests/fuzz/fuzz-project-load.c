/* SPDX-License-Identifier: GPL-3.0-or-later */
/* libFuzzer harness for the project loader (see README.md here).
 *
 * For any input: load it; when it loads, save it to text, load that text
 * again and require the same document (a loaded file must round-trip), then
 * evaluate every line and format the evaluation.  Any crash, leak,
 * undefined behaviour or broken round trip is a finding. */
#include <stdint.h>
#include <stdlib.h>
#include <string.h>

#include "model/rugosa-project.h"

int LLVMFuzzerTestOneInput (const uint8_t *data, size_t size);

int
LLVMFuzzerTestOneInput (const uint8_t *data, size_t size)
{
  GError *error = NULL;
  RugosaProject *project;
  RugosaProject *again;
  char *text;
  gsize length;
  GString *out;

  project = rugosa_project_new_from_data ((const char *) data, size, &error);
  if (project == NULL)
    {
      /* Every refusal carries a message. */
      if (error == NULL || error->message[0] == '\0')
        abort ();
      g_error_free (error);
      return 0;
    }

  text = rugosa_project_to_data (project, &length);
  again = rugosa_project_new_from_data (text, length, &error);
  if (again == NULL || !rugosa_project_equal (project, again))
    abort ();

  for (guint i = 0; i < rugosa_project_get_n_lines (project); i++)
    rugosa_project_get_results (project, rugosa_project_get_line (project, i));
  out = g_string_new (NULL);
  rugosa_project_format_eval (project, -1.0, RUGOSA_EVAL_FORMAT_JSON, out, NULL);
  rugosa_project_format_eval (project, -1.0, RUGOSA_EVAL_FORMAT_CSV, out, NULL);
  g_string_free (out, TRUE);

  g_free (text);
  g_object_unref (again);
  g_object_unref (project);
  return 0;
}
