/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Writing a project as JSON text: every row of the field tables at its
 * path, in table order, then the unknown fields kept from the file. */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <string.h>

#include "rugosa-field-object.h"
#include "rugosa-project-io-private.h"

void
_rugosa_json_merge_missing (cJSON *a, const cJSON *b)
{
  if (b == NULL)
    return;
  for (const cJSON *m = b->child; m != NULL; m = m->next)
    {
      cJSON *have = cJSON_GetObjectItemCaseSensitive (a, m->string);

      if (have == NULL)
        cJSON_AddItemToObject (a, m->string, cJSON_Duplicate (m, 1));
      else if (cJSON_IsObject (have) && cJSON_IsObject (m))
        _rugosa_json_merge_missing (have, m);
      else if (cJSON_IsArray (have) && cJSON_IsArray (m)
               && cJSON_GetArraySize (have) == cJSON_GetArraySize (m))
        {
          cJSON *x = have->child;

          for (const cJSON *y = m->child; x && y; x = x->next, y = y->next)
            if (cJSON_IsObject (x) && cJSON_IsObject (y))
              _rugosa_json_merge_missing (x, y);
        }
    }
}

/* cJSON prints 15 significant digits when the value reads back within an
 * epsilon, which loses the last bit (0.1 + 0.2 becomes 0.3).  Write the
 * shortest text that reads back exactly, independent of the locale. */
static void
add_number (cJSON *obj, const char *key, double x)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  _rugosa_format_double (buf, sizeof buf, x);
  cJSON_AddRawToObject (obj, key, buf);
}

/* The object at the dotted path's parent below `obj` (created as needed)
 * and the path's last component. */
static cJSON *
group_for (cJSON *obj, const char *path, const char **leaf)
{
  const char *start = path, *dot;

  while ((dot = strchr (start, '.')) != NULL)
    {
      g_autofree char *name = g_strndup (start, (gsize) (dot - start));
      cJSON *sub = cJSON_GetObjectItemCaseSensitive (obj, name);

      if (sub == NULL)
        sub = cJSON_AddObjectToObject (obj, name);
      obj = sub;
      start = dot + 1;
    }
  *leaf = start;
  return obj;
}

/* Drop the objects that hold rows but received none of them (every member
 * absent: a line with no cost given writes no "cost": {}), deepest first. */
static void
prune_empty_groups (cJSON *o, const RugosaField *rows, guint n)
{
  for (int pass = 0; pass < 4; pass++)
    for (guint i = 0; i < n; i++)
      {
        g_auto (GStrv) parts = g_strsplit (rows[i].path, ".", -1);
        guint depth = g_strv_length (parts);
        cJSON *parent = o, *group = NULL;

        /* the group `pass` levels above the row's value */
        if (depth < 2 + (guint) pass)
          continue;
        for (guint k = 0; k + 1 + (guint) pass < depth && parent != NULL; k++)
          {
            group = cJSON_GetObjectItemCaseSensitive (parent, parts[k]);
            if (k + 2 + (guint) pass < depth)
              parent = group;
          }
        if (group != NULL && parent != NULL && cJSON_IsObject (group) && group->child == NULL)
          cJSON_DeleteItemFromObjectCaseSensitive (parent, parts[depth - 2 - (guint) pass]);
      }
}

static cJSON *
object_to_json (gpointer instance, const RugosaField *rows, guint n,
                const cJSON *extra)
{
  cJSON *o = cJSON_CreateObject ();

  for (guint i = 0; i < n; i++)
    {
      const RugosaField *row = &rows[i];
      const char *leaf;
      cJSON *g = group_for (o, row->path, &leaf);

      switch (row->kind)
        {
        case RUGOSA_FIELD_NUMBER:
          {
            double x = *_rugosa_fields_double (row, instance);

            if (!((row->flags & RUGOSA_FIELD_ZERO_ABSENT) && x == 0.0))
              add_number (g, leaf, x);
          }
          break;
        case RUGOSA_FIELD_TEXT:
        case RUGOSA_FIELD_COLOUR:
        case RUGOSA_FIELD_CATALOG:
          {
            const char *s = *_rugosa_fields_string (row, instance);

            if (s != NULL)
              cJSON_AddStringToObject (g, leaf, s);
          }
          break;
        case RUGOSA_FIELD_ENUM:
          cJSON_AddStringToObject (g, leaf, rugosa_enum_nick (row->enum_type (),
                                                              *_rugosa_fields_int (row, instance)));
          break;
        case RUGOSA_FIELD_FITTINGS:
          {
            cJSON *arr = cJSON_AddArrayToObject (g, leaf);
            GVariantIter iter;
            const char *id;
            double k, count;

            g_variant_iter_init (&iter, *_rugosa_fields_variant (row, instance));
            while (g_variant_iter_next (&iter, "(&sdd)", &id, &k, &count))
              {
                cJSON *e = cJSON_CreateObject ();

                if (*id != '\0')
                  cJSON_AddStringToObject (e, "catalog", id);
                else
                  add_number (e, "k", k);
                add_number (e, "count", count);
                cJSON_AddItemToArray (arr, e);
              }
          }
          break;
        case RUGOSA_FIELD_CURVE:
          {
            GVariant *curve = *_rugosa_fields_variant (row, instance);
            GVariantIter iter;
            double q, h;

            /* an empty curve (none given) is left out */
            if (g_variant_n_children (curve) == 0)
              break;
            {
              cJSON *arr = cJSON_AddArrayToObject (g, leaf);

              g_variant_iter_init (&iter, curve);
              while (g_variant_iter_next (&iter, "(dd)", &q, &h))
                {
                  cJSON *e = cJSON_CreateObject ();

                  add_number (e, "flow_m3_s", q);
                  add_number (e, "head_m", h);
                  cJSON_AddItemToArray (arr, e);
                }
            }
          }
          break;
        case RUGOSA_FIELD_UNIT_MAP:
          {
            cJSON *map = cJSON_AddObjectToObject (g, leaf);
            GVariantIter iter;
            const char *q, *u;

            g_variant_iter_init (&iter, *_rugosa_fields_variant (row, instance));
            while (g_variant_iter_next (&iter, "{&s&s}", &q, &u))
              cJSON_AddStringToObject (map, q, u);
          }
          break;
        default:
          g_assert_not_reached ();
        }
    }
  prune_empty_groups (o, rows, n);
  _rugosa_json_merge_missing (o, extra);
  return o;
}

char *
rugosa_project_to_data (RugosaProject *self, gsize *length)
{
  const RugosaField *line_rows, *settings_rows;
  guint n_line, n_settings;
  cJSON *root, *lines;
  char *text, *result;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), NULL);

  line_rows = rugosa_line_fields (&n_line);
  settings_rows = rugosa_settings_fields (&n_settings);
  root = cJSON_CreateObject ();
  cJSON_AddStringToObject (root, "format", RUGOSA_PROJECT_FORMAT_NAME);
  add_number (root, "version", RUGOSA_PROJECT_FORMAT_VERSION);
  cJSON_AddItemToObject (root, "settings",
                         object_to_json (self->settings, settings_rows, n_settings,
                                         _rugosa_settings_get_extra (self->settings)));
  lines = cJSON_AddArrayToObject (root, "lines");
  for (guint i = 0; i < self->lines->len; i++)
    {
      RugosaLine *line = g_ptr_array_index (self->lines, i);

      cJSON_AddItemToArray (lines, object_to_json (line, line_rows, n_line,
                                                   _rugosa_line_get_extra (line)));
    }
  _rugosa_json_merge_missing (root, self->extra);

  text = cJSON_Print (root);
  cJSON_Delete (root);
  result = g_strconcat (text, "\n", NULL);
  cJSON_free (text);
  if (length != NULL)
    *length = strlen (result);
  return result;
}
