/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Loading a project from its checked JSON tree (rugosa-project-read.c).
 *
 * Lines and settings are read row by row from their field tables
 * (rugosa-fields.c): each row's JSON path, kind and range decide what is
 * accepted, and every error names the JSON path of the value.  Members
 * that no row knows are kept beside the object they came from and written
 * back on save (docs/file-format.md). */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <math.h>
#include <string.h>

#include "rugosa-field-object.h"
#include "rugosa-project-io-private.h"
#include "rugosa-units.h"

typedef RugosaJsonCtx Ctx;
#define fail _rugosa_json_fail
#define push_key _rugosa_json_push_key
#define push_index _rugosa_json_push_index
#define pop _rugosa_json_pop
#define type_name _rugosa_json_type_name

static gboolean
expect_object (Ctx *ctx, const cJSON *v)
{
  if (!cJSON_IsObject (v))
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("expected an object, found %s"), type_name (v));
  return TRUE;
}

/* Push every component of a dotted path; returns the length to pop to. */
static gsize
push_path (Ctx *ctx, const char *path)
{
  gsize len = ctx->path->len;
  g_auto (GStrv) parts = g_strsplit (path, ".", -1);

  for (guint i = 0; parts[i] != NULL; i++)
    push_key (ctx, parts[i]);
  return len;
}

/* The object holding the last component of `path` below `obj` and that
 * component's name, or *group NULL when an object on the way is absent.
 * Fails when one on the way is not an object. */
static gboolean
find_group (Ctx *ctx, const cJSON *obj, const char *path, const cJSON **group,
            const char **leaf, char **missing_group)
{
  const char *dot;
  const char *start = path;

  *group = obj;
  *missing_group = NULL;
  while ((dot = strchr (start, '.')) != NULL)
    {
      g_autofree char *name = g_strndup (start, (gsize) (dot - start));
      const cJSON *sub = cJSON_GetObjectItemCaseSensitive (*group, name);

      if (sub == NULL)
        {
          *missing_group = g_strndup (path, (gsize) (dot - path));
          *group = NULL;
          return TRUE;
        }
      if (!cJSON_IsObject (sub))
        {
          g_autofree char *where = g_strndup (path, (gsize) (dot - path));
          push_path (ctx, where);
          return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                       _("expected an object, found %s"), type_name (sub));
        }
      *group = sub;
      start = dot + 1;
    }
  *leaf = start;
  return TRUE;
}

/* How a number's unit reads in messages ("m³/s", "years", or none). */
static gboolean
number_out_of_range (Ctx *ctx, const RugosaField *row, double x)
{
  char a[G_ASCII_DTOSTR_BUF_SIZE], b[G_ASCII_DTOSTR_BUF_SIZE],
       c[G_ASCII_DTOSTR_BUF_SIZE];
  const char *unit = rugosa_field_si_unit (row);

  g_ascii_formatd (a, sizeof a, "%.6g", x);
  g_ascii_formatd (b, sizeof b, "%g", row->min);
  g_ascii_formatd (c, sizeof c, "%g", row->max);
  if (row->flags & RUGOSA_FIELD_MIN_OPEN)
    {
      if (*unit != '\0')
        return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                     _("%s is out of range: expected more than %s and at most %s %s"),
                     a, b, c, unit);
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("%s is out of range: expected more than %s and at most %s"),
                   a, b, c);
    }
  if (*unit != '\0')
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("%s is out of range: expected %s to %s %s"), a, b, c, unit);
  return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
               _("%s is out of range: expected %s to %s"), a, b, c);
}

/* A number in [min, max] (or (min, max]); `what` names it in messages. */
static gboolean
read_number (Ctx *ctx, const cJSON *v, const RugosaField *row, double *out)
{
  const char *unit = rugosa_field_si_unit (row);
  double x;

  if (!cJSON_IsNumber (v))
    {
      if (*unit != '\0')
        return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                     _("expected a number in %s, found %s"), unit, type_name (v));
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("expected a number, found %s"), type_name (v));
    }
  x = v->valuedouble;
  if (!isfinite (x))
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("the number is too large to be a finite value"));
  /* In the file, a field where 0 means "not given" is simply left out. */
  if (!(row->flags & RUGOSA_FIELD_MIN_OPEN ? x > row->min : x >= row->min)
      || !(x <= row->max))
    return number_out_of_range (ctx, row, x);
  *out = x;
  return TRUE;
}

RugosaTextProblem
rugosa_field_text_problem (const RugosaField *field, const char *text)
{
  gboolean multiline = field != NULL && (field->flags & RUGOSA_FIELD_MULTILINE);
  glong n = 0;

  /* cJSON decodes a lone surrogate escape as bytes that are not UTF-8. */
  if (!g_utf8_validate (text, -1, NULL))
    return RUGOSA_TEXT_NOT_UTF8;
  for (const char *p = text; *p != '\0'; p = g_utf8_next_char (p), n++)
    {
      gunichar c = g_utf8_get_char (p);

      if (multiline && (c == '\n' || c == '\t'))
        continue;
      /* Cc: C0, DEL and C1, among them ESC and CSI, which a terminal or a
       * CSV reader would act on */
      if (g_unichar_iscntrl (c))
        return RUGOSA_TEXT_CONTROL;
    }
  if (field != NULL && field->max_chars > 0 && n > field->max_chars)
    return RUGOSA_TEXT_TOO_LONG;
  if (field != NULL && (field->flags & RUGOSA_FIELD_DATE) && *text != '\0'
      && !rugosa_field_date_ok (text))
    return RUGOSA_TEXT_NOT_DATE;
  return RUGOSA_TEXT_OK;
}

static gboolean
read_string (Ctx *ctx, const cJSON *v, const RugosaField *row, const char **out)
{
  if (!cJSON_IsString (v))
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("expected a string, found %s"), type_name (v));
  switch (rugosa_field_text_problem (row, v->valuestring))
    {
    case RUGOSA_TEXT_NOT_UTF8:
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("the string is not valid UTF-8"));
    case RUGOSA_TEXT_TOO_LONG:
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("the string is longer than %d characters"), row->max_chars);
    case RUGOSA_TEXT_CONTROL:
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   (row->flags & RUGOSA_FIELD_MULTILINE)
                     ? _("the text holds a control character other than a line break or a tab")
                     : _("the text holds a control character (a line break, a tab or another)"));
    case RUGOSA_TEXT_NOT_DATE:
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("expected a date as \"YYYY-MM-DD\" or an empty string"));
    case RUGOSA_TEXT_OK:
    default:
      break;
    }
  *out = v->valuestring;
  return TRUE;
}

static gboolean
is_colour (const char *s)
{
  if (strlen (s) != 7 || s[0] != '#')
    return FALSE;
  for (int i = 1; i < 7; i++)
    if (!g_ascii_isxdigit (s[i]))
      return FALSE;
  return TRUE;
}

/* "\"a\", \"b\" or \"c\"": the nicks of an enum, for a message. */
static char *
nick_list (GType type)
{
  GEnumClass *klass = g_type_class_ref (type);
  g_autoptr (GString) s = g_string_new (NULL);

  for (guint i = 0; i < klass->n_values; i++)
    {
      if (i > 0 && i + 1 == klass->n_values)
        /* TRANSLATORS: between the last two of a list of choices */
        g_string_append (s, _(" or "));
      else if (i > 0)
        g_string_append (s, ", ");
      g_string_append_printf (s, "\"%s\"", klass->values[i].value_nick);
    }
  g_type_class_unref (klass);
  return g_string_free (g_steal_pointer (&s), FALSE);
}

static gboolean
load_fittings (Ctx *ctx, const cJSON *arr, GVariant **out, cJSON **extras_out)
{
  static const char *const known[] = { "catalog", "k", "count", NULL };
  GVariantBuilder b;
  cJSON *extras = cJSON_CreateArray ();
  gboolean any_extra = FALSE;
  int i = 0;

  if (!cJSON_IsArray (arr))
    {
      cJSON_Delete (extras);
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("expected an array, found %s"), type_name (arr));
    }
  if (cJSON_GetArraySize (arr) > RUGOSA_FILE_MAX_FITTINGS)
    {
      cJSON_Delete (extras);
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("more than %d fittings"), RUGOSA_FILE_MAX_FITTINGS);
    }
  g_variant_builder_init (&b, G_VARIANT_TYPE (RUGOSA_LINE_FITTINGS_TYPE));
  for (const cJSON *e = arr->child; e != NULL; e = e->next, i++)
    {
      const cJSON *id = NULL, *k = NULL, *count = NULL;
      cJSON *e_extra = NULL;
      gsize len = push_index (ctx, i), len2;

      if (!expect_object (ctx, e))
        goto error;
      id = cJSON_GetObjectItemCaseSensitive (e, "catalog");
      k = cJSON_GetObjectItemCaseSensitive (e, "k");
      count = cJSON_GetObjectItemCaseSensitive (e, "count");
      if (id != NULL)
        {
          len2 = push_key (ctx, "catalog");
          if (!cJSON_IsString (id))
            {
              fail (ctx, RUGOSA_PROJECT_ERROR_VALUE, _("expected a string, found %s"), type_name (id));
              goto error;
            }
          /* an id: one line, as short as the catalog's (no row of its own) */
          if (rugosa_field_text_problem (NULL, id->valuestring) != RUGOSA_TEXT_OK
              || g_utf8_strlen (id->valuestring, -1) > 120)
            {
              fail (ctx, RUGOSA_PROJECT_ERROR_VALUE, _("expected a fitting id of the catalog"));
              goto error;
            }
          pop (ctx, len2);
        }
      if (k != NULL)
        {
          len2 = push_key (ctx, "k");
          if (!cJSON_IsNumber (k))
            {
              fail (ctx, RUGOSA_PROJECT_ERROR_VALUE, _("expected a number, found %s"), type_name (k));
              goto error;
            }
          if (!(k->valuedouble >= 0.0 && k->valuedouble <= RUGOSA_FITTING_K_MAX))
            {
              char a[G_ASCII_DTOSTR_BUF_SIZE], hi[G_ASCII_DTOSTR_BUF_SIZE];
              fail (ctx, RUGOSA_PROJECT_ERROR_VALUE, _("%s is out of range: expected %s to %s"),
                    g_ascii_formatd (a, sizeof a, "%.6g", k->valuedouble), "0",
                    g_ascii_formatd (hi, sizeof hi, "%g", RUGOSA_FITTING_K_MAX));
              goto error;
            }
          pop (ctx, len2);
        }
      len2 = push_key (ctx, "count");
      if (count == NULL)
        {
          fail (ctx, RUGOSA_PROJECT_ERROR_VALUE, _("this required field is missing (a whole number)"));
          goto error;
        }
      if (!cJSON_IsNumber (count))
        {
          fail (ctx, RUGOSA_PROJECT_ERROR_VALUE, _("expected a number, found %s"), type_name (count));
          goto error;
        }
      if (!(count->valuedouble >= 0.0 && count->valuedouble <= RUGOSA_FITTING_COUNT_MAX))
        {
          char a[G_ASCII_DTOSTR_BUF_SIZE], hi[G_ASCII_DTOSTR_BUF_SIZE];
          fail (ctx, RUGOSA_PROJECT_ERROR_VALUE, _("%s is out of range: expected %s to %s"),
                g_ascii_formatd (a, sizeof a, "%.6g", count->valuedouble), "0",
                g_ascii_formatd (hi, sizeof hi, "%g", RUGOSA_FITTING_COUNT_MAX));
          goto error;
        }
      if (count->valuedouble != floor (count->valuedouble))
        {
          fail (ctx, RUGOSA_PROJECT_ERROR_VALUE, _("expected a whole number"));
          goto error;
        }
      pop (ctx, len2);
      if ((id != NULL) == (k != NULL) || (id != NULL && *id->valuestring == '\0'))
        {
          fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                _("give either \"catalog\" (a fitting id) or \"k\" (a plain loss coefficient), not both or neither"));
          goto error;
        }
      for (const cJSON *m = e->child; m != NULL; m = m->next)
        if (!g_strv_contains (known, m->string))
          {
            if (e_extra == NULL)
              e_extra = cJSON_CreateObject ();
            cJSON_AddItemToObject (e_extra, m->string, cJSON_Duplicate (m, 1));
          }
      any_extra |= e_extra != NULL;
      cJSON_AddItemToArray (extras, e_extra ? e_extra : cJSON_CreateObject ());
      g_variant_builder_add (&b, "(sdd)", id != NULL ? id->valuestring : "",
                             k != NULL ? k->valuedouble : 0.0, count->valuedouble);
      pop (ctx, len);
    }
  *out = g_variant_ref_sink (g_variant_builder_end (&b));
  if (any_extra)
    *extras_out = extras;
  else
    cJSON_Delete (extras);
  return TRUE;

error:
  g_variant_builder_clear (&b);
  cJSON_Delete (extras);
  return FALSE;
}

/* A number member of a curve point, in 0 … max. */
static gboolean
curve_number (Ctx *ctx, const cJSON *e, const char *key, const char *unit,
              double max, double *out)
{
  const cJSON *v = cJSON_GetObjectItemCaseSensitive (e, key);
  gsize len = push_key (ctx, key);

  if (v == NULL)
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("this required field is missing (a number in %s)"), unit);
  if (!cJSON_IsNumber (v))
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("expected a number in %s, found %s"), unit, type_name (v));
  if (!(v->valuedouble >= 0.0 && v->valuedouble <= max))
    {
      char a[G_ASCII_DTOSTR_BUF_SIZE], hi[G_ASCII_DTOSTR_BUF_SIZE];

      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("%s is out of range: expected %s to %s %s"),
                   g_ascii_formatd (a, sizeof a, "%.6g", v->valuedouble), "0",
                   g_ascii_formatd (hi, sizeof hi, "%g", max), unit);
    }
  *out = v->valuedouble;
  pop (ctx, len);
  return TRUE;
}

/* A curve: an array of {"flow_m3_s", "head_m"} objects, flows increasing;
 * members no build knows yet are kept in *extras_out (an array mirroring
 * the points), as for the fittings. */
static gboolean
load_curve (Ctx *ctx, const cJSON *arr, GVariant **out, cJSON **extras_out)
{
  static const char *const known[] = { "flow_m3_s", "head_m", NULL };
  const double flow_max = rugosa_field_find ("flow-design")->max;
  GVariantBuilder b;
  cJSON *extras = NULL;
  gboolean any_extra = FALSE;
  double last_flow = -1.0;
  int i = 0;

  if (!cJSON_IsArray (arr))
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("expected an array, found %s"), type_name (arr));
  if (cJSON_GetArraySize (arr) > RUGOSA_CURVE_POINTS_MAX)
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("more than %d points"), RUGOSA_CURVE_POINTS_MAX);
  extras = cJSON_CreateArray ();
  g_variant_builder_init (&b, G_VARIANT_TYPE (RUGOSA_LINE_CURVE_TYPE));
  for (const cJSON *e = arr->child; e != NULL; e = e->next, i++)
    {
      gsize len = push_index (ctx, i);
      cJSON *e_extra = NULL;
      double q = 0.0, h = 0.0;

      if (!expect_object (ctx, e)
          || !curve_number (ctx, e, "flow_m3_s", "m³/s", flow_max, &q)
          || !curve_number (ctx, e, "head_m", "m", RUGOSA_CURVE_HEAD_MAX, &h))
        {
          g_variant_builder_clear (&b);
          cJSON_Delete (extras);
          return FALSE;
        }
      if (!(q > last_flow))
        {
          push_key (ctx, "flow_m3_s");
          g_variant_builder_clear (&b);
          cJSON_Delete (extras);
          return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                       _("the flows of a curve must increase from one point to the next"));
        }
      last_flow = q;
      for (const cJSON *m = e->child; m != NULL; m = m->next)
        if (!g_strv_contains (known, m->string))
          {
            if (e_extra == NULL)
              e_extra = cJSON_CreateObject ();
            cJSON_AddItemToObject (e_extra, m->string, cJSON_Duplicate (m, 1));
          }
      any_extra |= e_extra != NULL;
      cJSON_AddItemToArray (extras, e_extra ? e_extra : cJSON_CreateObject ());
      g_variant_builder_add (&b, "(dd)", q, h);
      pop (ctx, len);
    }
  *out = g_variant_ref_sink (g_variant_builder_end (&b));
  if (any_extra)
    *extras_out = extras;
  else
    cJSON_Delete (extras);
  return TRUE;
}

/* Put `item` at the dotted `path` below *obj (created as needed). */
static void
add_at_path (cJSON **obj, const char *path, cJSON *item)
{
  g_auto (GStrv) parts = g_strsplit (path, ".", -1);
  cJSON *o;

  if (*obj == NULL)
    *obj = cJSON_CreateObject ();
  o = *obj;
  for (guint k = 0; parts[k + 1] != NULL; k++)
    {
      cJSON *sub = cJSON_GetObjectItemCaseSensitive (o, parts[k]);

      if (sub == NULL)
        sub = cJSON_AddObjectToObject (o, parts[k]);
      o = sub;
    }
  cJSON_AddItemToObject (o, parts[g_strv_length (parts) - 1], item);
}

static gboolean
load_unit_map (Ctx *ctx, const cJSON *obj, const RugosaField *row,
               GVariant **out)
{
  GVariantBuilder b;

  if (!expect_object (ctx, obj))
    return FALSE;
  g_variant_builder_init (&b, G_VARIANT_TYPE ("a{ss}"));
  for (const cJSON *m = obj->child; m != NULL; m = m->next)
    {
      const char *s;
      gsize len;

      /* Names this build does not know are kept as unknown fields. */
      if (rugosa_display_info_find (m->string, NULL) == NULL)
        continue;
      len = push_key (ctx, m->string);
      if (!read_string (ctx, m, row, &s))
        {
          g_variant_builder_clear (&b);
          return FALSE;
        }
      g_variant_builder_add (&b, "{ss}", m->string, s);
      pop (ctx, len);
    }
  *out = g_variant_ref_sink (g_variant_builder_end (&b));
  return TRUE;
}

/* Is `path` a row's path, or the path of an object holding rows? */
static int
path_role (const RugosaField *rows, guint n, const char *path)
{
  gsize len = strlen (path);

  for (guint i = 0; i < n; i++)
    {
      if (strcmp (rows[i].path, path) == 0)
        return rows[i].kind == RUGOSA_FIELD_UNIT_MAP ? 3 : 1; /* a field */
      if (strncmp (rows[i].path, path, len) == 0 && rows[i].path[len] == '.')
        return 2; /* a group */
    }
  return 0;
}

/* Copy the members of `obj` (at `prefix`) that no row knows into *extra,
 * mirroring the layout of the object. */
static void
collect_unknown (const RugosaField *rows, guint n, const cJSON *obj,
                 const char *prefix, cJSON **extra)
{
  for (const cJSON *m = obj->child; m != NULL; m = m->next)
    {
      g_autofree char *path = *prefix ? g_strconcat (prefix, ".", m->string, NULL)
                                      : g_strdup (m->string);
      int role = path_role (rows, n, path);
      cJSON *sub = NULL;

      if (role == 1)
        continue;
      if (role == 2 && cJSON_IsObject (m))
        collect_unknown (rows, n, m, path, &sub);
      else if (role == 3 && cJSON_IsObject (m))
        {
          for (const cJSON *q = m->child; q != NULL; q = q->next)
            if (rugosa_display_info_find (q->string, NULL) == NULL)
              {
                if (sub == NULL)
                  sub = cJSON_CreateObject ();
                cJSON_AddItemToObject (sub, q->string, cJSON_Duplicate (q, 1));
              }
        }
      else
        sub = cJSON_Duplicate (m, 1);
      if (sub == NULL)
        continue;
      if (*extra == NULL)
        *extra = cJSON_CreateObject ();
      /* a group may hold kept members of a curve's points already */
      {
        cJSON *have = cJSON_GetObjectItemCaseSensitive (*extra, m->string);

        if (have != NULL && cJSON_IsObject (have) && cJSON_IsObject (sub))
          {
            _rugosa_json_merge_missing (have, sub);
            cJSON_Delete (sub);
          }
        else
          cJSON_AddItemToObject (*extra, m->string, sub);
      }
    }
}

/* Read every row of `rows` from `obj` into `target`. */
static gboolean
load_rows (Ctx *ctx, const cJSON *obj, const RugosaField *rows, guint n,
           GObject *target, cJSON **extra)
{
  for (guint i = 0; i < n; i++)
    {
      const RugosaField *row = &rows[i];
      const cJSON *group, *v;
      const char *leaf = NULL;
      g_autofree char *missing = NULL;
      gsize len = ctx->path->len;

      if (!find_group (ctx, obj, row->path, &group, &leaf, &missing))
        return FALSE;
      if (group == NULL)
        {
          if (row->flags & RUGOSA_FIELD_REQUIRED)
            {
              push_path (ctx, missing);
              return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                           _("this required field is missing (an object)"));
            }
          continue;
        }
      v = cJSON_GetObjectItemCaseSensitive (group, leaf);
      if (row->kind == RUGOSA_FIELD_CATALOG)
        {
          const cJSON *custom = NULL;
          const RugosaField *partner = rugosa_field_find (row->partner);
          const char *custom_leaf = strrchr (partner->path, '.');

          custom = cJSON_GetObjectItemCaseSensitive (group, custom_leaf ? custom_leaf + 1 : partner->path);
          if (v == NULL && custom == NULL && (row->flags & RUGOSA_FIELD_REQUIRED || group != obj))
            {
              g_autofree char *where = g_strndup (row->path, (gsize) (leaf - row->path - 1));

              push_path (ctx, where);
              return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                           _("give \"%s\" or \"%s\" (or both)"), leaf,
                           custom_leaf ? custom_leaf + 1 : partner->path);
            }
        }
      if (v == NULL)
        {
          if (row->flags & (RUGOSA_FIELD_REQUIRED | RUGOSA_FIELD_REQUIRED_IN_GROUP)
              && row->kind != RUGOSA_FIELD_CATALOG)
            {
              const char *unit = rugosa_field_si_unit (row);

              push_path (ctx, row->path);
              if (row->kind == RUGOSA_FIELD_NUMBER && *unit != '\0')
                return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                             _("this required field is missing (a number in %s)"), unit);
              if (row->kind == RUGOSA_FIELD_NUMBER)
                return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                             _("this required field is missing (a number)"));
              return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                           _("this required field is missing (a string)"));
            }
          continue;
        }

      push_path (ctx, row->path);
      switch (row->kind)
        {
        case RUGOSA_FIELD_NUMBER:
          {
            double x = 0.0;

            if (!read_number (ctx, v, row, &x))
              return FALSE;
            g_object_set (target, row->property, x, NULL);
          }
          break;
        case RUGOSA_FIELD_TEXT:
        case RUGOSA_FIELD_COLOUR:
        case RUGOSA_FIELD_CATALOG:
          {
            const char *s;

            if (!read_string (ctx, v, row, &s))
              return FALSE;
            if (row->kind == RUGOSA_FIELD_COLOUR && !is_colour (s))
              return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                           _("expected a colour as \"#rrggbb\", found \"%s\""), s);
            if (row->kind == RUGOSA_FIELD_CATALOG && *s == '\0')
              return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                           _("expected a catalog name, found an empty string"));
            g_object_set (target, row->property, s, NULL);
          }
          break;
        case RUGOSA_FIELD_ENUM:
          {
            const char *s;
            int value;

            if (!read_string (ctx, v, row, &s))
              return FALSE;
            if (!rugosa_enum_from_nick (row->enum_type (), s, &value))
              {
                g_autofree char *choices = nick_list (row->enum_type ());
                return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                             _("expected %s, found \"%s\""), choices, s);
              }
            g_object_set (target, row->property, value, NULL);
          }
          break;
        case RUGOSA_FIELD_FITTINGS:
          {
            GVariant *fittings = NULL;
            cJSON *fit_extra = NULL;

            if (!load_fittings (ctx, v, &fittings, &fit_extra))
              return FALSE;
            g_object_set (target, row->property, fittings, NULL);
            g_variant_unref (fittings);
            if (fit_extra != NULL)
              {
                if (*extra == NULL)
                  *extra = cJSON_CreateObject ();
                cJSON_AddItemToObject (*extra, row->path, fit_extra);
              }
          }
          break;
        case RUGOSA_FIELD_UNIT_MAP:
          {
            GVariant *map = NULL;

            if (!load_unit_map (ctx, v, row, &map))
              return FALSE;
            g_object_set (target, row->property, map, NULL);
            g_variant_unref (map);
          }
          break;
        case RUGOSA_FIELD_CURVE:
          {
            GVariant *curve = NULL;
            cJSON *curve_extra = NULL;

            if (!load_curve (ctx, v, &curve, &curve_extra))
              return FALSE;
            g_object_set (target, row->property, curve, NULL);
            g_variant_unref (curve);
            if (curve_extra != NULL)
              add_at_path (extra, row->path, curve_extra);
          }
          break;
        default:
          g_assert_not_reached ();
        }
      pop (ctx, len);
    }
  return TRUE;
}

/* The document's relations between fields. */
static gboolean
check_line (Ctx *ctx, RugosaLine *line)
{
  double design = rugosa_line_get_double (line, "flow-design");
  double lo = rugosa_line_get_double (line, "flow-minimum");
  double hi = rugosa_line_get_double (line, "flow-maximum");

  if (lo > 0.0 && lo > design)
    {
      push_path (ctx, rugosa_field_find ("flow-minimum")->path);
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("the minimum flow must not exceed the design flow"));
    }
  if (hi > 0.0 && hi < design)
    {
      push_path (ctx, rugosa_field_find ("flow-maximum")->path);
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("the maximum flow must not be below the design flow"));
    }
  return TRUE;
}

static gboolean
load_object (Ctx *ctx, const cJSON *obj, gboolean settings, GObject *target)
{
  const RugosaField *rows;
  guint n;
  cJSON *extra = NULL;

  if (!expect_object (ctx, obj))
    return FALSE;
  rows = settings ? rugosa_settings_fields (&n) : rugosa_line_fields (&n);
  if (!load_rows (ctx, obj, rows, n, target, &extra))
    {
      cJSON_Delete (extra);
      return FALSE;
    }
  collect_unknown (rows, n, obj, "", &extra);
  if (settings)
    {
      const char *failed = NULL;
      RgError err = { 0 };

      if (rugosa_settings_check (RUGOSA_SETTINGS (target), &failed, &err) != RG_OK)
        {
          cJSON_Delete (extra);
          push_path (ctx, rugosa_field_find (failed)->path);
          return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE, "%s", err.text);
        }
      _rugosa_settings_take_extra (RUGOSA_SETTINGS (target), extra);
    }
  else
    {
      if (!check_line (ctx, RUGOSA_LINE (target)))
        {
          cJSON_Delete (extra);
          return FALSE;
        }
      _rugosa_line_take_extra (RUGOSA_LINE (target), extra);
    }
  return TRUE;
}

gboolean
_rugosa_project_load_tree (Ctx *ctx, const cJSON *root, RugosaProject *project)
{
  static const char *const known[] = { "format", "version", "settings",
                                       "lines", NULL };
  const cJSON *v, *lines;
  cJSON *extra = NULL;
  double version;
  int i = 0;

  if (!cJSON_IsObject (root))
    return fail (ctx, RUGOSA_PROJECT_ERROR_FORMAT,
                 _("This is JSON but not a Rugosa project: expected an object with \"format\": \"%s\"."),
                 RUGOSA_PROJECT_FORMAT_NAME);
  v = cJSON_GetObjectItemCaseSensitive (root, "format");
  if (!cJSON_IsString (v) || strcmp (v->valuestring, RUGOSA_PROJECT_FORMAT_NAME) != 0)
    return fail (ctx, RUGOSA_PROJECT_ERROR_FORMAT,
                 _("This is JSON but not a Rugosa project: \"format\" must be \"%s\"."),
                 RUGOSA_PROJECT_FORMAT_NAME);
  v = cJSON_GetObjectItemCaseSensitive (root, "version");
  push_key (ctx, "version");
  if (v == NULL)
    return fail (ctx, RUGOSA_PROJECT_ERROR_FORMAT,
                 _("this required field is missing (a whole number)"));
  if (!cJSON_IsNumber (v) || !isfinite (v->valuedouble)
      || v->valuedouble != floor (v->valuedouble) || v->valuedouble < 1.0)
    return fail (ctx, RUGOSA_PROJECT_ERROR_FORMAT,
                 _("expected a whole number of 1 or more"));
  version = v->valuedouble;
  if (version > RUGOSA_PROJECT_FORMAT_VERSION)
    {
      g_string_truncate (ctx->path, 0);
      return fail (ctx, RUGOSA_PROJECT_ERROR_VERSION,
                   _("This file uses version %.0f of the project format, which is newer than this Rugosa reads (version %d): open it with a newer Rugosa."),
                   MIN (version, 1e15), RUGOSA_PROJECT_FORMAT_VERSION);
    }
  g_string_truncate (ctx->path, 0);

  v = cJSON_GetObjectItemCaseSensitive (root, "settings");
  if (v != NULL)
    {
      push_key (ctx, "settings");
      if (!load_object (ctx, v, TRUE, G_OBJECT (rugosa_project_get_settings (project))))
        return FALSE;
      g_string_truncate (ctx->path, 0);
    }

  lines = cJSON_GetObjectItemCaseSensitive (root, "lines");
  push_key (ctx, "lines");
  if (lines == NULL)
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("this required field is missing (an array of line options)"));
  if (!cJSON_IsArray (lines))
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("expected an array, found %s"), type_name (lines));
  /* The reader counts them before parsing; a key it could not see
   * (spelled with escapes) is counted here. */
  if (cJSON_GetArraySize (lines) > RUGOSA_FILE_MAX_LINES)
    return _rugosa_project_fail_lines (ctx);
  for (const cJSON *e = lines->child; e != NULL; e = e->next, i++)
    {
      g_autoptr (RugosaLine) line = rugosa_line_new (NULL);
      gsize len = push_index (ctx, i);

      if (!load_object (ctx, e, FALSE, G_OBJECT (line)))
        return FALSE;
      rugosa_project_insert_line (project, (guint) i, line);
      pop (ctx, len);
    }
  g_string_truncate (ctx->path, 0);

  for (const cJSON *m = root->child; m != NULL; m = m->next)
    if (!g_strv_contains (known, m->string))
      {
        if (extra == NULL)
          extra = cJSON_CreateObject ();
        cJSON_AddItemToObject (extra, m->string, cJSON_Duplicate (m, 1));
      }
  _rugosa_project_take_extra (project, extra);
  return TRUE;
}
