/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The project file: JSON of our own layout, described field by field in
 * docs/file-format.md.
 *
 * Loading checks, in order: size, encoding (UTF-8, no NUL byte), nesting
 * depth, JSON syntax (line and column), duplicate keys, the format name,
 * the major version, then every field with its JSON path.  It builds a new
 * project and only swaps it into the open one on success.  Unknown fields
 * are kept beside the object they came from and written back on save.
 *
 * Saving writes a temporary file in the same folder, fsyncs it, keeps the
 * previous file as a hard link (or copy) named path + "~", renames the
 * temporary file over the path and fsyncs the folder. */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <errno.h>
#include <fcntl.h>
#include <math.h>
#include <string.h>
#include <sys/stat.h>
#include <unistd.h>

#include <glib/gstdio.h>

#include "core/fluid.h"
#include "core/friction.h"
#include "rugosa-project-private.h"

/* Limits that keep a hostile or broken file from costing much; generous
 * for any real project. */
#define MAX_FILE_BYTES (16 * 1024 * 1024)
#define MAX_DEPTH 32
#define MAX_LINES 1000
#define MAX_FITTINGS 200
#define MAX_NAME_CHARS 200
#define MAX_NOTE_CHARS 20000
#define MAX_ID_CHARS 120

typedef struct {
  GString *path;
  GError **error;
} Ctx;

static gboolean
fail (Ctx *ctx, int code, const char *fmt, ...) G_GNUC_PRINTF (3, 4);

static gboolean
fail (Ctx *ctx, int code, const char *fmt, ...)
{
  va_list ap;
  g_autofree char *msg = NULL;

  va_start (ap, fmt);
  msg = g_strdup_vprintf (fmt, ap);
  va_end (ap);
  if (ctx->path->len > 0)
    g_set_error (ctx->error, RUGOSA_PROJECT_ERROR, code, "%s: %s",
                 ctx->path->str, msg);
  else
    g_set_error_literal (ctx->error, RUGOSA_PROJECT_ERROR, code, msg);
  return FALSE;
}

static gsize
push_key (Ctx *ctx, const char *key)
{
  gsize len = ctx->path->len;

  if (len > 0)
    g_string_append_c (ctx->path, '.');
  g_string_append (ctx->path, key);
  return len;
}

static gsize
push_index (Ctx *ctx, int index)
{
  gsize len = ctx->path->len;

  g_string_append_printf (ctx->path, "[%d]", index);
  return len;
}

static void
pop (Ctx *ctx, gsize len)
{
  g_string_truncate (ctx->path, len);
}

/* ---- pre-parse checks ---- */

static void
line_column (const char *data, gsize offset, int *line, int *column)
{
  *line = 1;
  *column = 1;
  for (gsize i = 0; i < offset; i++)
    {
      if (data[i] == '\n')
        {
          (*line)++;
          *column = 1;
        }
      else if (((unsigned char) data[i] & 0xC0) != 0x80)
        (*column)++;
    }
}

/* The deepest nesting of [ and { outside strings; stops at MAX_DEPTH + 1
 * and reports where. */
static gboolean
check_depth (const char *data, gsize length, gsize *where, gboolean *unclosed)
{
  int depth = 0;
  gboolean in_string = FALSE;

  for (gsize i = 0; i < length; i++)
    {
      char c = data[i];

      if (in_string)
        {
          if (c == '\\')
            i++;
          else if (c == '"')
            in_string = FALSE;
        }
      else if (c == '"')
        in_string = TRUE;
      else if (c == '[' || c == '{')
        {
          if (++depth > MAX_DEPTH)
            {
              *where = i;
              return FALSE;
            }
        }
      else if (c == ']' || c == '}')
        depth--;
    }
  /* An open string or bracket at the end: the text was cut short. */
  *unclosed = in_string || depth > 0;
  return TRUE;
}

/* Refuse repeated keys anywhere in the tree (cJSON keeps both and a lookup
 * finds the first, which would silently ignore the second). */
static gboolean
check_duplicates (Ctx *ctx, const cJSON *node)
{
  if (cJSON_IsObject (node))
    {
      g_autoptr (GHashTable) seen = g_hash_table_new (g_str_hash, g_str_equal);

      for (const cJSON *m = node->child; m != NULL; m = m->next)
        {
          if (!g_hash_table_add (seen, m->string))
            return fail (ctx, RUGOSA_PROJECT_ERROR_FORMAT,
                         _("the key \"%s\" appears more than once"), m->string);
          gsize len = push_key (ctx, m->string);
          if (!check_duplicates (ctx, m))
            return FALSE;
          pop (ctx, len);
        }
    }
  else if (cJSON_IsArray (node))
    {
      int i = 0;

      for (const cJSON *m = node->child; m != NULL; m = m->next, i++)
        {
          gsize len = push_index (ctx, i);
          if (!check_duplicates (ctx, m))
            return FALSE;
          pop (ctx, len);
        }
    }
  return TRUE;
}

/* ---- field readers ---- */

static const char *
type_name (const cJSON *v)
{
  if (cJSON_IsNumber (v)) return "a number";
  if (cJSON_IsString (v)) return "a string";
  if (cJSON_IsBool (v)) return "true or false";
  if (cJSON_IsNull (v)) return "null";
  if (cJSON_IsArray (v)) return "an array";
  return "an object";
}

static gboolean
expect_object (Ctx *ctx, const cJSON *v)
{
  if (!cJSON_IsObject (v))
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("expected an object, found %s"), type_name (v));
  return TRUE;
}

/* Copy the members of `obj` not in `known` into *extra (created on
 * demand). */
static void
collect_unknown (const cJSON *obj, const char *const *known, cJSON **extra)
{
  for (const cJSON *m = obj->child; m != NULL; m = m->next)
    {
      if (g_strv_contains (known, m->string))
        continue;
      if (*extra == NULL)
        *extra = cJSON_CreateObject ();
      cJSON_AddItemToObject (*extra, m->string, cJSON_Duplicate (m, 1));
    }
}

static void
add_sub_extra (cJSON **extra, const char *key, cJSON *sub)
{
  if (sub == NULL)
    return;
  if (*extra == NULL)
    *extra = cJSON_CreateObject ();
  cJSON_AddItemToObject (*extra, key, sub);
}

/* A number member.  `present` (may be NULL) tells whether it was there;
 * without it, a missing member is an error.  The range is inclusive unless
 * `min_open` (then value > min). */
static gboolean
get_number (Ctx *ctx, const cJSON *obj, const char *key, gboolean *present,
            double min, gboolean min_open, double max, const char *unit,
            double *out)
{
  const cJSON *v = cJSON_GetObjectItemCaseSensitive (obj, key);
  gsize len = push_key (ctx, key);
  double x;

  if (present != NULL)
    *present = v != NULL;
  if (v == NULL)
    {
      if (present != NULL)
        {
          pop (ctx, len);
          return TRUE;
        }
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("this required field is missing (a number in %s)"), unit);
    }
  if (!cJSON_IsNumber (v))
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("expected a number in %s, found %s"), unit, type_name (v));
  x = v->valuedouble;
  if (!isfinite (x))
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("the number is too large to be a finite value (%s)"), unit);
  if ((min_open ? !(x > min) : !(x >= min)) || !(x <= max))
    {
      char a[G_ASCII_DTOSTR_BUF_SIZE], b[G_ASCII_DTOSTR_BUF_SIZE],
           c[G_ASCII_DTOSTR_BUF_SIZE];

      g_ascii_formatd (a, sizeof a, "%.6g", x);
      g_ascii_formatd (b, sizeof b, "%g", min);
      g_ascii_formatd (c, sizeof c, "%g", max);
      if (min_open)
        return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                     _("%s is out of range: expected more than %s and at most %s %s"),
                     a, b, c, unit);
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("%s is out of range: expected %s to %s %s"), a, b, c, unit);
    }
  *out = x;
  pop (ctx, len);
  return TRUE;
}

static gboolean
get_string (Ctx *ctx, const cJSON *obj, const char *key, gboolean *present,
            glong max_chars, const char **out)
{
  const cJSON *v = cJSON_GetObjectItemCaseSensitive (obj, key);
  gsize len = push_key (ctx, key);

  if (present != NULL)
    *present = v != NULL;
  if (v == NULL)
    {
      if (present != NULL)
        {
          pop (ctx, len);
          return TRUE;
        }
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("this required field is missing (a string)"));
    }
  if (!cJSON_IsString (v))
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("expected a string, found %s"), type_name (v));
  /* cJSON decodes \u0000 as the end of the string, and a lone surrogate
   * escape as bytes that are not UTF-8: refuse both. */
  if (!g_utf8_validate (v->valuestring, -1, NULL))
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("the string is not valid UTF-8"));
  if (g_utf8_strlen (v->valuestring, -1) > max_chars)
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("the string is longer than %ld characters"), max_chars);
  *out = v->valuestring;
  pop (ctx, len);
  return TRUE;
}

/* An optional sub-object: *sub is NULL when absent. */
static gboolean
get_object (Ctx *ctx, const cJSON *obj, const char *key, gboolean required,
            const cJSON **sub)
{
  const cJSON *v = cJSON_GetObjectItemCaseSensitive (obj, key);
  gsize len = push_key (ctx, key);

  *sub = NULL;
  if (v == NULL)
    {
      if (required)
        return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                     _("this required field is missing (an object)"));
      pop (ctx, len);
      return TRUE;
    }
  if (!expect_object (ctx, v))
    return FALSE;
  *sub = v;
  pop (ctx, len);
  return TRUE;
}

/* A number written to a property of `target` when present. */
static gboolean
opt_number_prop (Ctx *ctx, const cJSON *obj, const char *key, GObject *target,
                 const char *prop, double min, gboolean min_open, double max,
                 const char *unit)
{
  gboolean present;
  double x;

  if (!get_number (ctx, obj, key, &present, min, min_open, max, unit, &x))
    return FALSE;
  if (present)
    g_object_set (target, prop, x, NULL);
  return TRUE;
}

/* ---- settings ---- */

static gboolean
load_settings (Ctx *ctx, const cJSON *obj, RugosaSettings *settings)
{
  static const char *const known[] = { "units", "friction_model", "transition",
                                       "chart", "service_age_years", "limits",
                                       NULL };
  static const char *const units_known[] = { "system", "overrides", NULL };
  static const char *const transition_known[] = { "re_laminar_max",
                                                  "re_turbulent_min", NULL };
  static const char *const chart_known[] = { "re_min", "re_max", "f_min",
                                             "f_max", NULL };
  static const char *const limits_known[] = { "velocity_m_s",
                                              "gradient_m_per_100m", NULL };
  GObject *target = G_OBJECT (settings);
  cJSON *extra = NULL;
  const cJSON *sub;
  const char *s;
  gboolean present;
  gsize len;

  if (!expect_object (ctx, obj))
    return FALSE;
  collect_unknown (obj, known, &extra);

  if (!get_object (ctx, obj, "units", FALSE, &sub))
    goto error;
  if (sub != NULL)
    {
      cJSON *sub_extra = NULL;
      const cJSON *overrides;

      len = push_key (ctx, "units");
      collect_unknown (sub, units_known, &sub_extra);
      if (!get_string (ctx, sub, "system", &present, 8, &s))
        goto error_sub;
      if (present)
        {
          if (strcmp (s, "si") != 0 && strcmp (s, "us") != 0)
            {
              push_key (ctx, "system");
              fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                    _("expected \"si\" or \"us\", found \"%s\""), s);
              goto error_sub;
            }
          g_object_set (target, "unit-system",
                        strcmp (s, "us") == 0 ? RUGOSA_UNIT_SYSTEM_US
                                              : RUGOSA_UNIT_SYSTEM_SI, NULL);
        }
      if (!get_object (ctx, sub, "overrides", FALSE, &overrides))
        goto error_sub;
      if (overrides != NULL)
        {
          GVariantBuilder b;
          cJSON *ov_extra = NULL;
          gsize len2 = push_key (ctx, "overrides");

          g_variant_builder_init (&b, G_VARIANT_TYPE ("a{ss}"));
          for (const cJSON *m = overrides->child; m != NULL; m = m->next)
            {
              if (!g_strv_contains (rugosa_settings_unit_quantities (), m->string))
                continue;
              if (!get_string (ctx, overrides, m->string, NULL, 32, &s))
                {
                  g_variant_builder_clear (&b);
                  goto error_sub;
                }
              g_variant_builder_add (&b, "{ss}", m->string, s);
            }
          collect_unknown (overrides, rugosa_settings_unit_quantities (), &ov_extra);
          add_sub_extra (&sub_extra, "overrides", ov_extra);
          g_object_set (target, "unit-overrides", g_variant_builder_end (&b), NULL);
          pop (ctx, len2);
        }
      add_sub_extra (&extra, "units", sub_extra);
      pop (ctx, len);
      if (FALSE)
        {
        error_sub:
          cJSON_Delete (sub_extra);
          goto error;
        }
    }

  if (!get_string (ctx, obj, "friction_model", &present, MAX_ID_CHARS, &s))
    goto error;
  if (present)
    {
      RgFrictionModel model;
      RgError err;

      if (rg_friction_model_from_id (s, &model, &err) != RG_OK)
        {
          push_key (ctx, "friction_model");
          fail (ctx, RUGOSA_PROJECT_ERROR_VALUE, "%s", err.text);
          goto error;
        }
      g_object_set (target, "friction-model", (int) model, NULL);
    }

  /* Groups of plain numbers: settings property, key, range. */
  static const struct {
    const char *group;
    const char *key;
    const char *prop;
    double min, max;
    const char *unit;
  } numbers[] = {
    { "transition", "re_laminar_max", "re-laminar-max", 1.0, 1.0e6, "(Reynolds number)" },
    { "transition", "re_turbulent_min", "re-turbulent-min", 1.0, 1.0e6, "(Reynolds number)" },
    { "chart", "re_min", "chart-re-min", 1.0, 1.0e12, "(Reynolds number)" },
    { "chart", "re_max", "chart-re-max", 1.0, 1.0e12, "(Reynolds number)" },
    { "chart", "f_min", "chart-f-min", 1.0e-4, 1.0, "(friction factor)" },
    { "chart", "f_max", "chart-f-max", 1.0e-4, 1.0, "(friction factor)" },
    { "limits", "velocity_m_s", "velocity-limit", 0.01, 1000.0, "m/s" },
    { "limits", "gradient_m_per_100m", "gradient-limit", 0.001, 1.0e4, "m per 100 m" },
  };
  static const struct {
    const char *name;
    const char *const *known;
  } groups[] = {
    { "transition", transition_known },
    { "chart", chart_known },
    { "limits", limits_known },
  };
  for (guint g = 0; g < G_N_ELEMENTS (groups); g++)
    {
      cJSON *sub_extra = NULL;

      if (!get_object (ctx, obj, groups[g].name, FALSE, &sub))
        goto error;
      if (sub == NULL)
        continue;
      len = push_key (ctx, groups[g].name);
      collect_unknown (sub, groups[g].known, &sub_extra);
      add_sub_extra (&extra, groups[g].name, sub_extra);
      for (guint i = 0; i < G_N_ELEMENTS (numbers); i++)
        if (strcmp (numbers[i].group, groups[g].name) == 0
            && !opt_number_prop (ctx, sub, numbers[i].key, target,
                                 numbers[i].prop, numbers[i].min, FALSE,
                                 numbers[i].max, numbers[i].unit))
          goto error;
      pop (ctx, len);
    }
  if (!opt_number_prop (ctx, obj, "service_age_years", target, "service-age",
                        0.0, FALSE, 200.0, "years"))
    goto error;

  /* Orders between fields. */
  static const struct { const char *lo, *hi, *path; } orders[] = {
    { "re-laminar-max", "re-turbulent-min", "transition.re_turbulent_min" },
    { "chart-re-min", "chart-re-max", "chart.re_max" },
    { "chart-f-min", "chart-f-max", "chart.f_max" },
  };
  for (guint i = 0; i < G_N_ELEMENTS (orders); i++)
    if (!(rugosa_settings_get_double (settings, orders[i].lo)
          < rugosa_settings_get_double (settings, orders[i].hi)))
      {
        push_key (ctx, orders[i].path);
        fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
              _("must be larger than the lower bound of its range"));
        goto error;
      }

  _rugosa_settings_take_extra (settings, extra);
  return TRUE;

error:
  cJSON_Delete (extra);
  return FALSE;
}

/* ---- lines ---- */

static gboolean
load_fittings (Ctx *ctx, const cJSON *arr, RugosaLine *line, cJSON **extra)
{
  static const char *const known[] = { "catalog", "k", "count", NULL };
  GVariantBuilder b;
  cJSON *extras = cJSON_CreateArray ();
  gboolean any_extra = FALSE;
  int i = 0;
  gsize len;

  if (!cJSON_IsArray (arr))
    {
      cJSON_Delete (extras);
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("expected an array, found %s"), type_name (arr));
    }
  if (cJSON_GetArraySize (arr) > MAX_FITTINGS)
    {
      cJSON_Delete (extras);
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("more than %d fittings"), MAX_FITTINGS);
    }
  g_variant_builder_init (&b, G_VARIANT_TYPE (RUGOSA_LINE_FITTINGS_TYPE));
  for (const cJSON *e = arr->child; e != NULL; e = e->next, i++)
    {
      const char *id = "";
      double k = 0.0, count;
      gboolean has_id, has_k;
      cJSON *e_extra = NULL;

      len = push_index (ctx, i);
      if (!expect_object (ctx, e)
          || !get_string (ctx, e, "catalog", &has_id, MAX_ID_CHARS, &id)
          || !get_number (ctx, e, "k", &has_k, 0.0, FALSE, 1.0e4, "(loss coefficient)", &k)
          || !get_number (ctx, e, "count", NULL, 0.0, FALSE, 1.0e4, "(count)", &count))
        goto error;
      if (has_id == has_k || (has_id && *id == '\0'))
        {
          fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                _("give either \"catalog\" (a fitting id) or \"k\" (a plain loss coefficient), not both or neither"));
          goto error;
        }
      if (count != floor (count))
        {
          push_key (ctx, "count");
          fail (ctx, RUGOSA_PROJECT_ERROR_VALUE, _("expected a whole number"));
          goto error;
        }
      collect_unknown (e, known, &e_extra);
      any_extra |= e_extra != NULL;
      cJSON_AddItemToArray (extras, e_extra ? e_extra : cJSON_CreateObject ());
      g_variant_builder_add (&b, "(sdd)", has_id ? id : "", k, count);
      pop (ctx, len);
    }
  rugosa_line_set_fittings (line, g_variant_builder_end (&b));
  if (any_extra)
    add_sub_extra (extra, "fittings", extras);
  else
    cJSON_Delete (extras);
  return TRUE;

error:
  g_variant_builder_clear (&b);
  cJSON_Delete (extras);
  return FALSE;
}

/* One member group of a line: key, known members, and its numbers. */
typedef struct {
  const char *key;
  const char *prop;
  double min;
  gboolean min_open;
  double max;
  const char *unit;
} NumberField;

static gboolean
load_numbers (Ctx *ctx, const cJSON *obj, GObject *target,
              const NumberField *fields, guint n)
{
  for (guint i = 0; i < n; i++)
    if (!opt_number_prop (ctx, obj, fields[i].key, target, fields[i].prop,
                          fields[i].min, fields[i].min_open, fields[i].max,
                          fields[i].unit))
      return FALSE;
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

/* A catalog reference with a custom value beside it ("material", "aging",
 * "pipe"): at least one of the two must be given. */
static gboolean
load_choice (Ctx *ctx, const cJSON *line_obj, const char *group,
             gboolean required, const char *id_key, const char *id_prop,
             const NumberField *value, GObject *target, cJSON **extra)
{
  const char *const known[] = { id_key, value->key, NULL };
  const cJSON *sub;
  const char *id;
  gboolean has_id, has_value;
  double x;
  cJSON *sub_extra = NULL;
  gsize len;

  if (!get_object (ctx, line_obj, group, required, &sub))
    return FALSE;
  if (sub == NULL)
    return TRUE;
  len = push_key (ctx, group);
  if (!get_string (ctx, sub, id_key, &has_id, MAX_ID_CHARS, &id)
      || !get_number (ctx, sub, value->key, &has_value, value->min,
                      value->min_open, value->max, value->unit, &x))
    return FALSE;
  if (!has_id && !has_value)
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("give \"%s\" or \"%s\" (or both)"), id_key, value->key);
  if (has_id && *id == '\0')
    {
      push_key (ctx, id_key);
      return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                   _("expected a catalog name, found an empty string"));
    }
  g_object_set (target, id_prop, has_id ? id : NULL, NULL);
  if (has_value)
    g_object_set (target, value->prop, x, NULL);
  collect_unknown (sub, known, &sub_extra);
  add_sub_extra (extra, group, sub_extra);
  pop (ctx, len);
  return TRUE;
}

static gboolean
load_line (Ctx *ctx, const cJSON *obj, RugosaLine *line)
{
  static const char *const known[] = { "name", "colour", "note", "fluid",
                                       "material", "aging", "pipe", "length_m",
                                       "elevation_change_m", "fittings",
                                       "flow", NULL };
  static const char *const fluid_known[] = { "kind", "temperature_K",
                                             "pressure_Pa", "salinity_kg_kg",
                                             "density_kg_m3",
                                             "dynamic_viscosity_Pa_s", "oil",
                                             NULL };
  static const char *const oil_known[] = { "t1_K", "nu1_m2_s", "t2_K",
                                           "nu2_m2_s", "density_ref_kg_m3",
                                           "t_ref_K", "expansion_per_K", NULL };
  static const char *const flow_known[] = { "design_m3_s", "minimum_m3_s",
                                            "maximum_m3_s", NULL };
  static const NumberField fluid_numbers[] = {
    { "temperature_K", "temperature", 1.0, FALSE, 2000.0, "K" },
    { "pressure_Pa", "pressure", 1.0, FALSE, 1.0e9, "Pa" },
    { "salinity_kg_kg", "salinity", 0.0, FALSE, 0.3, "kg/kg" },
    { "density_kg_m3", "density", 1.0e-3, FALSE, 3.0e4, "kg/m³" },
    { "dynamic_viscosity_Pa_s", "viscosity", 1.0e-7, FALSE, 1.0e5, "Pa·s" },
  };
  static const NumberField oil_numbers[] = {
    { "t1_K", "oil-t1", 1.0, FALSE, 2000.0, "K" },
    { "nu1_m2_s", "oil-nu1", 1.0e-9, FALSE, 1.0, "m²/s" },
    { "t2_K", "oil-t2", 1.0, FALSE, 2000.0, "K" },
    { "nu2_m2_s", "oil-nu2", 1.0e-9, FALSE, 1.0, "m²/s" },
    { "density_ref_kg_m3", "oil-density-ref", 1.0, FALSE, 3.0e4, "kg/m³" },
    { "t_ref_K", "oil-t-ref", 1.0, FALSE, 2000.0, "K" },
    { "expansion_per_K", "oil-expansion", 0.0, FALSE, 0.01, "1/K" },
  };
  static const NumberField roughness = { "roughness_m", "roughness", 0.0, FALSE, 0.1, "m" };
  static const NumberField rate = { "rate_m_per_year", "aging-rate", 0.0, FALSE, 0.01, "m/year" };
  static const NumberField diameter = { "inner_diameter_m", "inner-diameter", 1.0e-4, FALSE, 20.0, "m" };
  static const NumberField length = { "length_m", "length", 1.0e-3, FALSE, 1.0e7, "m" };
  static const NumberField elevation = { "elevation_change_m", "elevation", -1.0e5, FALSE, 1.0e5, "m" };
  static const NumberField flows[] = {
    { "minimum_m3_s", "flow-minimum", 0.0, TRUE, 1.0e4, "m³/s" },
    { "maximum_m3_s", "flow-maximum", 0.0, TRUE, 1.0e4, "m³/s" },
  };
  GObject *target = G_OBJECT (line);
  cJSON *extra = NULL;
  const cJSON *sub, *fittings;
  const char *s;
  gboolean present;
  double x;
  gsize len;

  if (!expect_object (ctx, obj))
    return FALSE;
  collect_unknown (obj, known, &extra);

  if (!get_string (ctx, obj, "name", NULL, MAX_NAME_CHARS, &s))
    goto error;
  g_object_set (target, "name", s, NULL);
  if (!get_string (ctx, obj, "colour", &present, 7, &s))
    goto error;
  if (present)
    {
      if (!is_colour (s))
        {
          push_key (ctx, "colour");
          fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                _("expected a colour as \"#rrggbb\", found \"%s\""), s);
          goto error;
        }
      g_object_set (target, "colour", s, NULL);
    }
  if (!get_string (ctx, obj, "note", &present, MAX_NOTE_CHARS, &s))
    goto error;
  if (present)
    g_object_set (target, "note", s, NULL);

  if (!get_object (ctx, obj, "fluid", FALSE, &sub))
    goto error;
  if (sub != NULL)
    {
      cJSON *sub_extra = NULL, *oil_extra = NULL;
      const cJSON *oil;
      gboolean ok;

      len = push_key (ctx, "fluid");
      collect_unknown (sub, fluid_known, &sub_extra);
      ok = get_string (ctx, sub, "kind", NULL, MAX_ID_CHARS, &s);
      if (ok)
        {
          RgFluidKind kind;
          RgError err;

          if (rg_fluid_kind_from_id (s, &kind, &err) != RG_OK)
            {
              push_key (ctx, "kind");
              ok = fail (ctx, RUGOSA_PROJECT_ERROR_VALUE, "%s", err.text);
            }
          else
            g_object_set (target, "fluid-kind", (int) kind, NULL);
        }
      ok = ok && load_numbers (ctx, sub, target, fluid_numbers,
                               G_N_ELEMENTS (fluid_numbers));
      ok = ok && get_object (ctx, sub, "oil", FALSE, &oil);
      if (ok && oil != NULL)
        {
          gsize len2 = push_key (ctx, "oil");

          collect_unknown (oil, oil_known, &oil_extra);
          add_sub_extra (&sub_extra, "oil", oil_extra);
          ok = load_numbers (ctx, oil, target, oil_numbers,
                             G_N_ELEMENTS (oil_numbers));
          if (ok)
            pop (ctx, len2);
        }
      add_sub_extra (&extra, "fluid", sub_extra);
      if (!ok)
        goto error;
      pop (ctx, len);
    }

  if (!load_choice (ctx, obj, "material", TRUE, "catalog", "material-id",
                    &roughness, target, &extra)
      || !load_choice (ctx, obj, "aging", FALSE, "class", "aging-class-id",
                       &rate, target, &extra)
      || !load_choice (ctx, obj, "pipe", TRUE, "designation",
                       "pipe-designation", &diameter, target, &extra))
    goto error;

  if (!get_number (ctx, obj, length.key, NULL, length.min, FALSE, length.max,
                   length.unit, &x))
    goto error;
  g_object_set (target, "length", x, NULL);
  if (!opt_number_prop (ctx, obj, elevation.key, target, elevation.prop,
                        elevation.min, FALSE, elevation.max, elevation.unit))
    goto error;

  fittings = cJSON_GetObjectItemCaseSensitive (obj, "fittings");
  if (fittings != NULL)
    {
      len = push_key (ctx, "fittings");
      if (!load_fittings (ctx, fittings, line, &extra))
        goto error;
      pop (ctx, len);
    }

  if (!get_object (ctx, obj, "flow", TRUE, &sub))
    goto error;
  len = push_key (ctx, "flow");
  {
    cJSON *sub_extra = NULL;
    double design, lo, hi;
    gboolean has_lo, has_hi;

    collect_unknown (sub, flow_known, &sub_extra);
    add_sub_extra (&extra, "flow", sub_extra);
    if (!get_number (ctx, sub, "design_m3_s", NULL, 0.0, TRUE, 1.0e4, "m³/s", &design)
        || !get_number (ctx, sub, flows[0].key, &has_lo, 0.0, TRUE, 1.0e4, "m³/s", &lo)
        || !get_number (ctx, sub, flows[1].key, &has_hi, 0.0, TRUE, 1.0e4, "m³/s", &hi))
      goto error;
    if (has_lo && lo > design)
      {
        push_key (ctx, "minimum_m3_s");
        fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
              _("the minimum flow must not exceed the design flow"));
        goto error;
      }
    if (has_hi && hi < design)
      {
        push_key (ctx, "maximum_m3_s");
        fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
              _("the maximum flow must not be below the design flow"));
        goto error;
      }
    g_object_set (target, "flow-design", design,
                  "flow-minimum", has_lo ? lo : 0.0,
                  "flow-maximum", has_hi ? hi : 0.0, NULL);
  }
  pop (ctx, len);

  _rugosa_line_take_extra (line, extra);
  return TRUE;

error:
  cJSON_Delete (extra);
  return FALSE;
}

/* ---- the document ---- */

static gboolean
load_root (Ctx *ctx, const cJSON *root, RugosaProject *project)
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
      if (!load_settings (ctx, v, rugosa_project_get_settings (project)))
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
  if (cJSON_GetArraySize (lines) > MAX_LINES)
    return fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                 _("more than %d line options"), MAX_LINES);
  for (const cJSON *e = lines->child; e != NULL; e = e->next, i++)
    {
      g_autoptr (RugosaLine) line = rugosa_line_new (NULL);
      gsize len = push_index (ctx, i);

      if (!load_line (ctx, e, line))
        return FALSE;
      rugosa_project_insert_line (project, (guint) i, line);
      pop (ctx, len);
    }
  g_string_truncate (ctx->path, 0);

  collect_unknown (root, known, &extra);
  _rugosa_project_take_extra (project, extra);
  return TRUE;
}

RugosaProject *
rugosa_project_new_from_data (const char *data, gsize length, GError **error)
{
  g_autoptr (GString) path = g_string_new (NULL);
  Ctx ctx = { path, error };
  g_autofree char *copy = NULL;
  const char *text = data, *end = NULL;
  const char *bad = NULL;
  g_autoptr (RugosaProject) project = NULL;
  cJSON *root;
  gsize where;
  gboolean unclosed = FALSE;
  int line, column;

  g_return_val_if_fail (data != NULL || length == 0, NULL);

  /* A UTF-8 byte order mark is allowed and skipped. */
  if (length >= 3 && memcmp (data, "\xEF\xBB\xBF", 3) == 0)
    {
      text += 3;
      length -= 3;
    }
  if (length > MAX_FILE_BYTES)
    {
      fail (&ctx, RUGOSA_PROJECT_ERROR_ENCODING,
            _("The file is larger than %d MiB: it is not a Rugosa project."),
            MAX_FILE_BYTES / (1024 * 1024));
      return NULL;
    }
  gsize blank = 0;
  while (blank < length && g_ascii_isspace (text[blank]))
    blank++;
  if (blank == length)
    {
      fail (&ctx, RUGOSA_PROJECT_ERROR_ENCODING, _("The file is empty."));
      return NULL;
    }
  if (!g_utf8_validate (text, (gssize) length, &bad))
    {
      line_column (text, (gsize) (bad - text), &line, &column);
      fail (&ctx, RUGOSA_PROJECT_ERROR_ENCODING,
            *bad == '\0'
              ? _("The file holds a NUL byte at line %d, column %d: it is not a text file.")
              : _("The file is not valid UTF-8 text (line %d, column %d)."),
            line, column);
      return NULL;
    }
  if (!check_depth (text, length, &where, &unclosed))
    {
      line_column (text, where, &line, &column);
      fail (&ctx, RUGOSA_PROJECT_ERROR_SYNTAX,
            _("The JSON is nested deeper than %d levels at line %d, column %d."),
            MAX_DEPTH, line, column);
      return NULL;
    }

  /* cJSON needs the terminating NUL inside the length it is given to
   * check that nothing follows the value. */
  copy = g_malloc (length + 1);
  memcpy (copy, text, length);
  copy[length] = '\0';
  root = cJSON_ParseWithLengthOpts (copy, length + 1, &end, 1);
  if (root == NULL)
    {
      gsize offset = end != NULL ? (gsize) (end - copy) : 0;

      if (unclosed)
        offset = length;
      line_column (copy, MIN (offset, length), &line, &column);
      if (offset >= length)
        fail (&ctx, RUGOSA_PROJECT_ERROR_SYNTAX,
              _("The JSON text ends too early at line %d, column %d (is the file truncated?)."),
              line, column);
      else
        fail (&ctx, RUGOSA_PROJECT_ERROR_SYNTAX,
              _("The file is not valid JSON: unexpected text at line %d, column %d."),
              line, column);
      return NULL;
    }

  project = rugosa_project_new ();
  if (!check_duplicates (&ctx, root) || !load_root (&ctx, root, project))
    {
      cJSON_Delete (root);
      return NULL;
    }
  cJSON_Delete (root);
  return g_steal_pointer (&project);
}

gboolean
rugosa_project_load (RugosaProject *self, const char *path, GError **error)
{
  g_autofree char *data = NULL;
  g_autofree char *display = NULL;
  g_autoptr (GError) local = NULL;
  g_autoptr (RugosaProject) loaded = NULL;
  gsize length;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), FALSE);
  g_return_val_if_fail (path != NULL, FALSE);

  display = g_filename_display_basename (path);
  if (!g_file_get_contents (path, &data, &length, &local))
    {
      g_set_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_IO,
                   _("Cannot read “%s”: %s"), display, local->message);
      return FALSE;
    }
  loaded = rugosa_project_new_from_data (data, length, &local);
  if (loaded == NULL)
    {
      g_set_error (error, RUGOSA_PROJECT_ERROR, local->code, "%s: %s",
                   display, local->message);
      return FALSE;
    }
  _rugosa_project_take_content (self, loaded);
  return TRUE;
}

/* ---- writing ---- */

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
static cJSON *
add_number (cJSON *obj, const char *key, double x)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  _rugosa_format_double (buf, sizeof buf, x);
  return cJSON_AddRawToObject (obj, key, buf);
}

static double
get_d (gpointer object, const char *prop)
{
  double x;

  g_object_get (object, prop, &x, NULL);
  return x;
}

static cJSON *
settings_to_json (RugosaSettings *s)
{
  cJSON *o = cJSON_CreateObject ();
  cJSON *units = cJSON_AddObjectToObject (o, "units");
  cJSON *ov = cJSON_AddObjectToObject (units, "overrides");
  cJSON *g;
  GVariantIter iter;
  const char *q, *u;

  cJSON_AddStringToObject (units, "system",
                           rugosa_settings_get_unit_system (s) == RUGOSA_UNIT_SYSTEM_US
                             ? "us" : "si");
  g_variant_iter_init (&iter, rugosa_settings_get_unit_overrides (s));
  while (g_variant_iter_next (&iter, "{&s&s}", &q, &u))
    cJSON_AddStringToObject (ov, q, u);
  cJSON_AddStringToObject (o, "friction_model",
                           rg_friction_model_id ((RgFrictionModel) rugosa_settings_get_friction_model (s)));
  g = cJSON_AddObjectToObject (o, "transition");
  add_number (g, "re_laminar_max", get_d (s, "re-laminar-max"));
  add_number (g, "re_turbulent_min", get_d (s, "re-turbulent-min"));
  g = cJSON_AddObjectToObject (o, "chart");
  add_number (g, "re_min", get_d (s, "chart-re-min"));
  add_number (g, "re_max", get_d (s, "chart-re-max"));
  add_number (g, "f_min", get_d (s, "chart-f-min"));
  add_number (g, "f_max", get_d (s, "chart-f-max"));
  add_number (o, "service_age_years", get_d (s, "service-age"));
  g = cJSON_AddObjectToObject (o, "limits");
  add_number (g, "velocity_m_s", get_d (s, "velocity-limit"));
  add_number (g, "gradient_m_per_100m", get_d (s, "gradient-limit"));
  _rugosa_json_merge_missing (o, _rugosa_settings_get_extra (s));
  return o;
}

static cJSON *
line_to_json (RugosaLine *l)
{
  cJSON *o = cJSON_CreateObject ();
  cJSON *g, *oil, *arr;
  GVariantIter iter;
  const char *id;
  double k, count;

  cJSON_AddStringToObject (o, "name", rugosa_line_get_name (l));
  cJSON_AddStringToObject (o, "colour", rugosa_line_get_colour (l));
  cJSON_AddStringToObject (o, "note", rugosa_line_get_note (l));

  g = cJSON_AddObjectToObject (o, "fluid");
  cJSON_AddStringToObject (g, "kind", rg_fluid_kind_id ((RgFluidKind) rugosa_line_get_fluid_kind (l)));
  add_number (g, "temperature_K", get_d (l, "temperature"));
  add_number (g, "pressure_Pa", get_d (l, "pressure"));
  add_number (g, "salinity_kg_kg", get_d (l, "salinity"));
  add_number (g, "density_kg_m3", get_d (l, "density"));
  add_number (g, "dynamic_viscosity_Pa_s", get_d (l, "viscosity"));
  oil = cJSON_AddObjectToObject (g, "oil");
  add_number (oil, "t1_K", get_d (l, "oil-t1"));
  add_number (oil, "nu1_m2_s", get_d (l, "oil-nu1"));
  add_number (oil, "t2_K", get_d (l, "oil-t2"));
  add_number (oil, "nu2_m2_s", get_d (l, "oil-nu2"));
  add_number (oil, "density_ref_kg_m3", get_d (l, "oil-density-ref"));
  add_number (oil, "t_ref_K", get_d (l, "oil-t-ref"));
  add_number (oil, "expansion_per_K", get_d (l, "oil-expansion"));

  g = cJSON_AddObjectToObject (o, "material");
  if (rugosa_line_get_material_id (l) != NULL)
    cJSON_AddStringToObject (g, "catalog", rugosa_line_get_material_id (l));
  add_number (g, "roughness_m", get_d (l, "roughness"));
  g = cJSON_AddObjectToObject (o, "aging");
  if (rugosa_line_get_aging_class_id (l) != NULL)
    cJSON_AddStringToObject (g, "class", rugosa_line_get_aging_class_id (l));
  add_number (g, "rate_m_per_year", get_d (l, "aging-rate"));
  g = cJSON_AddObjectToObject (o, "pipe");
  if (rugosa_line_get_pipe_designation (l) != NULL)
    cJSON_AddStringToObject (g, "designation", rugosa_line_get_pipe_designation (l));
  add_number (g, "inner_diameter_m", get_d (l, "inner-diameter"));

  add_number (o, "length_m", get_d (l, "length"));
  add_number (o, "elevation_change_m", get_d (l, "elevation"));

  arr = cJSON_AddArrayToObject (o, "fittings");
  g_variant_iter_init (&iter, rugosa_line_get_fittings (l));
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

  g = cJSON_AddObjectToObject (o, "flow");
  add_number (g, "design_m3_s", get_d (l, "flow-design"));
  if (get_d (l, "flow-minimum") > 0.0)
    add_number (g, "minimum_m3_s", get_d (l, "flow-minimum"));
  if (get_d (l, "flow-maximum") > 0.0)
    add_number (g, "maximum_m3_s", get_d (l, "flow-maximum"));

  _rugosa_json_merge_missing (o, _rugosa_line_get_extra (l));
  return o;
}

char *
rugosa_project_to_data (RugosaProject *self, gsize *length)
{
  cJSON *root, *lines;
  char *text, *result;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), NULL);

  root = cJSON_CreateObject ();
  cJSON_AddStringToObject (root, "format", RUGOSA_PROJECT_FORMAT_NAME);
  add_number (root, "version", RUGOSA_PROJECT_FORMAT_VERSION);
  cJSON_AddItemToObject (root, "settings", settings_to_json (self->settings));
  lines = cJSON_AddArrayToObject (root, "lines");
  for (guint i = 0; i < self->lines->len; i++)
    cJSON_AddItemToArray (lines, line_to_json (g_ptr_array_index (self->lines, i)));
  _rugosa_json_merge_missing (root, self->extra);

  text = cJSON_Print (root);
  cJSON_Delete (root);
  result = g_strconcat (text, "\n", NULL);
  cJSON_free (text);
  if (length != NULL)
    *length = strlen (result);
  return result;
}

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
