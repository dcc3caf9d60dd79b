/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include "rugosa-apply.h"

gboolean
rugosa_apply_row_applies (const RugosaField *row,
                          RugosaLine        *source,
                          RugosaLinePart     part)
{
  if (part == RUGOSA_LINE_PART_NONE || row->part != part)
    return FALSE;
  /* the fluid's kind (a row describing no one kind) and the state of the
   * source's kind */
  return row->fluid_kinds == 0
         || rugosa_field_applies_to_fluid (row, (RgFluidKind) rugosa_line_get_fluid_kind (source));
}

/* The undo step's label: a whole sentence per part, so that each reads
 * right in every language. */
static char *
_rugosa_apply_label (RugosaLinePart part,
                     guint          n)
{
  switch (part)
    {
    case RUGOSA_LINE_PART_FLUID:
      /* TRANSLATORS: an undo step; %u is a number of line options */
      return g_strdup_printf (ngettext ("Apply the fluid to %u line", "Apply the fluid to %u lines", n), n);
    case RUGOSA_LINE_PART_AGING:
      /* TRANSLATORS: an undo step (the roughness growth class or rate); %u is a number of line options */
      return g_strdup_printf (ngettext ("Apply the aging to %u line", "Apply the aging to %u lines", n), n);
    case RUGOSA_LINE_PART_FLOW:
      /* TRANSLATORS: an undo step (lowest, design and highest flow); %u is a number of line options */
      return g_strdup_printf (ngettext ("Apply the flows to %u line", "Apply the flows to %u lines", n), n);
    case RUGOSA_LINE_PART_NONE:
    case RUGOSA_N_LINE_PARTS:
    default:
      g_return_val_if_reached (NULL);
    }
}

guint
rugosa_apply_part (RugosaHistory    *history,
                   RugosaLine       *source,
                   RugosaLinePart    part,
                   RugosaLine *const *targets,
                   guint             n_targets)
{
  RugosaProject *project;
  const RugosaField *rows;
  g_autoptr (GArray) values = NULL;   /* of GValue, one per row applied */
  g_autoptr (GPtrArray) applied = NULL; /* of const RugosaField */
  g_autoptr (GPtrArray) changed = NULL; /* of RugosaLine */
  g_autofree char *label = NULL;
  guint n_rows;

  g_return_val_if_fail (RUGOSA_IS_HISTORY (history), 0);
  g_return_val_if_fail (RUGOSA_IS_LINE (source), 0);
  g_return_val_if_fail (part > RUGOSA_LINE_PART_NONE && part < RUGOSA_N_LINE_PARTS, 0);
  g_return_val_if_fail (targets != NULL || n_targets == 0, 0);

  /* the source's values, read once */
  rows = rugosa_line_fields (&n_rows);
  values = g_array_new (FALSE, TRUE, sizeof (GValue));
  g_array_set_clear_func (values, (GDestroyNotify) g_value_unset);
  applied = g_ptr_array_new ();
  for (guint r = 0; r < n_rows; r++)
    if (rugosa_apply_row_applies (&rows[r], source, part))
      {
        GValue v = G_VALUE_INIT;
        GParamSpec *pspec = g_object_class_find_property (G_OBJECT_GET_CLASS (source), rows[r].property);

        g_value_init (&v, pspec->value_type);
        g_object_get_property (G_OBJECT (source), rows[r].property, &v);
        g_array_append_val (values, v);
        g_ptr_array_add (applied, (gpointer) &rows[r]);
      }

  /* the lines that differ: the step's label counts them */
  changed = g_ptr_array_new ();
  for (guint t = 0; t < n_targets; t++)
    {
      RugosaLine *line = targets[t];

      g_return_val_if_fail (RUGOSA_IS_LINE (line), 0);
      if (line == source)
        continue;
      for (guint r = 0; r < applied->len; r++)
        {
          const RugosaField *row = g_ptr_array_index (applied, r);
          GParamSpec *pspec = g_object_class_find_property (G_OBJECT_GET_CLASS (line), row->property);
          g_auto (GValue) now = G_VALUE_INIT;

          g_value_init (&now, pspec->value_type);
          g_object_get_property (G_OBJECT (line), row->property, &now);
          if (g_param_values_cmp (pspec, &now, &g_array_index (values, GValue, r)) != 0)
            {
              g_ptr_array_add (changed, line);
              break;
            }
        }
    }
  if (changed->len == 0)
    return 0;

  project = rugosa_history_get_project (history);
  label = _rugosa_apply_label (part, changed->len);
  rugosa_project_hold_changed (project);
  rugosa_history_begin_group (history, label);
  for (guint t = 0; t < changed->len; t++)
    for (guint r = 0; r < applied->len; r++)
      {
        const RugosaField *row = g_ptr_array_index (applied, r);

        /* an equal value records nothing */
        rugosa_history_set_value (history, g_ptr_array_index (changed, t), row->property,
                                  &g_array_index (values, GValue, r));
      }
  rugosa_history_end_group (history);
  rugosa_project_release_changed (project);
  return changed->len;
}
