/* SPDX-License-Identifier: GPL-3.0-or-later */
/* rugosa-gen-fields: what the field tables (rugosa-fields.c) say, in the
 * forms other places need, so those places derive from the tables:
 *
 *   rugosa-gen-fields markdown            the field tables of
 *                                         docs/file-format.md
 *   rugosa-gen-fields gschema TEMPLATE    the settings schema: TEMPLATE
 *                                         with the keys that seed new
 *                                         projects put at its marker
 *   rugosa-gen-fields json                every row, for tests of other
 *                                         layers (rugosa-cli)
 *
 * Run at build time (the schema) and by tests (the document, the CLI). */
#define G_LOG_DOMAIN "rugosa-gen-fields"

#include "config.h"

#include <locale.h>
#include <stdio.h>
#include <string.h>

#include "model/rugosa-fields.h"
#include "model/rugosa-units.h"
#include "model/rugosa-model-private.h"

static const char *
kind_name (const RugosaField *f)
{
  switch (f->kind)
    {
    case RUGOSA_FIELD_NUMBER: return (f->flags & RUGOSA_FIELD_WHOLE) ? "whole number" : "number";
    case RUGOSA_FIELD_TEXT: return "string";
    case RUGOSA_FIELD_COLOUR: return "string `\"#rrggbb\"`";
    case RUGOSA_FIELD_ENUM: return "string";
    case RUGOSA_FIELD_CATALOG: return "string (catalog id)";
    case RUGOSA_FIELD_FITTINGS: return "array";
    case RUGOSA_FIELD_UNIT_MAP: return "object of strings";
    case RUGOSA_FIELD_CURVE: return "array of points";
    default: return "?";
    }
}

static char *
number (double x)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  return g_strdup (g_ascii_formatd (buf, sizeof buf, "%g", x));
}

static char *
nicks (GType type, const char *sep)
{
  GEnumClass *klass = g_type_class_ref (type);
  GString *s = g_string_new (NULL);

  for (guint i = 0; i < klass->n_values; i++)
    g_string_append_printf (s, "%s`\"%s\"`", i ? sep : "", klass->values[i].value_nick);
  g_type_class_unref (klass);
  return g_string_free (s, FALSE);
}

static char *
range_text (const RugosaField *f)
{
  const char *unit = rugosa_field_si_unit (f);

  switch (f->kind)
    {
    case RUGOSA_FIELD_NUMBER:
      {
        g_autofree char *lo = number (f->min);
        g_autofree char *hi = number (f->max);

        return g_strdup_printf ("%s%s … %s%s%s",
                                (f->flags & RUGOSA_FIELD_MIN_OPEN) ? "> " : "",
                                lo, hi, *unit ? " " : "", unit);
      }
    case RUGOSA_FIELD_ENUM:
      return nicks (f->enum_type (), ", ");
    case RUGOSA_FIELD_TEXT:
      if (f->flags & RUGOSA_FIELD_DATE)
        return g_strdup ("`\"YYYY-MM-DD\"` or `\"\"`");
      return g_strdup_printf ("≤ %d characters", f->max_chars);
    case RUGOSA_FIELD_CATALOG:
      return g_strdup_printf ("≤ %d characters", f->max_chars);
    case RUGOSA_FIELD_UNIT_MAP:
      return g_strdup_printf ("≤ %d characters each", f->max_chars);
    case RUGOSA_FIELD_FITTINGS:
    case RUGOSA_FIELD_CURVE:
      return g_strdup ("see below");
    case RUGOSA_FIELD_COLOUR:
    default:
      return g_strdup ("");
    }
}

static char *
default_text (const RugosaField *f)
{
  switch (f->kind)
    {
    case RUGOSA_FIELD_NUMBER:
      if (f->flags & RUGOSA_FIELD_ZERO_ABSENT)
        return g_strdup ("none");
      return number (f->dflt);
    case RUGOSA_FIELD_ENUM:
      return g_strdup_printf ("`\"%s\"`", rugosa_enum_nick (f->enum_type (), (int) f->dflt));
    case RUGOSA_FIELD_TEXT:
    case RUGOSA_FIELD_COLOUR:
      return f->dflt_text && *f->dflt_text ? g_strdup_printf ("`\"%s\"`", f->dflt_text) : g_strdup ("`\"\"`");
    case RUGOSA_FIELD_CATALOG:
      return g_strdup ("none");
    case RUGOSA_FIELD_FITTINGS:
    case RUGOSA_FIELD_UNIT_MAP:
    case RUGOSA_FIELD_CURVE:
    default:
      return g_strdup ("empty");
    }
}

static void
markdown_table (GString *out, const RugosaField *rows, guint n)
{
  g_string_append (out, "| key | type | required | range | default | meaning |\n");
  g_string_append (out, "|---|---|---|---|---|---|\n");
  for (guint i = 0; i < n; i++)
    {
      const RugosaField *f = &rows[i];
      g_autofree char *range = range_text (f);
      g_autofree char *dflt = default_text (f);
      const char *required = (f->flags & RUGOSA_FIELD_REQUIRED)
                               ? (f->kind == RUGOSA_FIELD_CATALOG ? "this or its custom value" : "yes")
                               : (f->flags & RUGOSA_FIELD_REQUIRED_IN_GROUP) ? "in its object" : "no";

      g_string_append_printf (out, "| `%s` | %s | %s | %s | %s | %s%s%s |\n",
                              f->path, kind_name (f), required, range, dflt,
                              f->help,
                              f->fluid_kinds ? " Fluids: " : "",
                              "");
      if (f->fluid_kinds)
        {
          gsize len = out->len;
          gboolean first = TRUE;

          /* "… | Fluids: water, oil |": the fluids it describes */
          g_string_truncate (out, len - 3);
          for (int k = 0; k < RG_FLUID_N_KINDS; k++)
            if (f->fluid_kinds & RUGOSA_FLUID_BIT (k))
              {
                g_string_append_printf (out, "%s%s", first ? "" : ", ", rg_fluid_kind_id ((RgFluidKind) k));
                first = FALSE;
              }
          g_string_append (out, ". |\n");
        }
    }
}

static int
cmd_markdown (void)
{
  g_autoptr (GString) out = g_string_new (NULL);
  const RugosaField *rows;
  guint n;

  g_string_append (out, "<!-- generated by rugosa-gen-fields markdown: do not edit -->\n\n");
  g_string_append (out, "### `settings`\n\nEvery member is optional; a missing one keeps its default.\n\n");
  rows = rugosa_settings_fields (&n);
  markdown_table (out, rows, n);
  g_string_append (out, "\nQuantity names of `units.overrides`:");
  for (int i = 0; i < RUGOSA_N_DISPLAY; i++)
    {
      const RugosaDisplayInfo *d = rugosa_display_info ((RugosaDisplayQuantity) i);
      if (d != NULL)
        g_string_append_printf (out, "%s `%s`", i ? "," : "", d->id);
    }
  g_string_append (out, ". A unit is a spelling the unit parser accepts (`\"L/s\"`, `\"gpm\"`); "
                        "one this build cannot read is kept but not used.\n\n");
  g_string_append (out, "### `lines[i]`\n\n");
  rows = rugosa_line_fields (&n);
  markdown_table (out, rows, n);
  g_string_append (out, "\n<!-- end of generated tables -->\n");
  fputs (out->str, stdout);
  return 0;
}

static void
xml_escape_append (GString *out, const char *s)
{
  g_autofree char *e = g_markup_escape_text (s, -1);
  g_string_append (out, e);
}

static void
schema_enum (GString *out, GType type, const char *id)
{
  GEnumClass *klass = g_type_class_ref (type);

  g_string_append_printf (out, "  <enum id=\"%s\">\n", id);
  for (guint i = 0; i < klass->n_values; i++)
    g_string_append_printf (out, "    <value nick=\"%s\" value=\"%d\"/>\n",
                            klass->values[i].value_nick, klass->values[i].value);
  g_string_append (out, "  </enum>\n");
  g_type_class_unref (klass);
}

/* A key whose summary and description are msgids of the field tables, so
 * that tools showing the schema translate them from the same catalog. */
static void
schema_key (GString *out, const char *name, const char *type_attr,
            const char *dflt, const char *range, const char *summary,
            const char *description)
{
  g_string_append_printf (out, "    <key name=\"%s\" %s>\n", name, type_attr);
  if (range != NULL)
    g_string_append (out, range);
  g_string_append_printf (out, "      <default>%s</default>\n      <summary>", dflt);
  xml_escape_append (out, summary);
  g_string_append (out, "</summary>\n      <description>");
  xml_escape_append (out, description);
  g_string_append (out, "</description>\n    </key>\n");
}

static int
cmd_gschema (const char *template_path, const char *app_id)
{
  g_autofree char *template = NULL;
  g_autoptr (GString) enums = g_string_new (NULL);
  g_autoptr (GString) keys = g_string_new (NULL);
  g_autoptr (GError) error = NULL;
  const RugosaField *rows;
  guint n;
  char *marker, *enum_marker;

  if (!g_file_get_contents (template_path, &template, NULL, &error))
    {
      g_printerr ("rugosa-gen-fields: %s\n", error->message);
      return 1;
    }
  rows = rugosa_settings_fields (&n);
  for (guint i = 0; i < n; i++)
    {
      const RugosaField *f = &rows[i];

      if (!(f->flags & RUGOSA_FIELD_SEEDED))
        continue;
      switch (f->kind)
        {
        case RUGOSA_FIELD_ENUM:
          {
            g_autofree char *enum_id = g_strdup_printf ("%s.%s", app_id, g_type_name (f->enum_type ()) + strlen ("Rugosa"));
            g_autofree char *attr = g_strdup_printf ("enum=\"%s\"", enum_id);

            g_autofree char *dflt = g_strdup_printf ("'%s'", rugosa_enum_nick (f->enum_type (), (int) f->dflt));

            schema_enum (enums, f->enum_type (), enum_id);
            schema_key (keys, f->property, attr, dflt, NULL, f->label, f->help);
          }
          break;
        case RUGOSA_FIELD_NUMBER:
          {
            g_autofree char *lo = number (f->min);
            g_autofree char *hi = number (f->max);
            g_autofree char *d = number (f->dflt);

            g_autofree char *range = g_strdup_printf ("      <range min=\"%s\" max=\"%s\"/>\n", lo, hi);

            schema_key (keys, f->property, "type=\"d\"", d, range, f->label, f->help);
          }
          break;
        case RUGOSA_FIELD_TEXT:
          {
            g_autoptr (GVariant) v = g_variant_ref_sink (g_variant_new_string (f->dflt_text ? f->dflt_text : ""));
            g_autofree char *d = g_variant_print (v, FALSE);
            g_autofree char *escaped = g_markup_escape_text (d, -1);

            schema_key (keys, f->property, "type=\"s\"", escaped, NULL, f->label, f->help);
          }
          break;
        case RUGOSA_FIELD_UNIT_MAP:
          /* one key per quantity: its unit, or "" for the system's usual one */
          for (int q = 0; q < RUGOSA_N_DISPLAY; q++)
            {
              const RugosaDisplayInfo *d = rugosa_display_info ((RugosaDisplayQuantity) q);
              g_autofree char *name = NULL;

              if (d == NULL)
                continue;
              name = g_strdup_printf ("unit-%s", d->id);
              g_strdelimit (name, "_", '-');
              /* '' is the unit system's usual unit */
              schema_key (keys, name, "type=\"s\"", "''", NULL, d->label, f->help);
            }
          break;
        default:
          break;
        }
    }
  marker = strstr (template, "<!-- @SEEDED_KEYS@ -->");
  enum_marker = strstr (template, "<!-- @SEEDED_ENUMS@ -->");
  if (marker == NULL || enum_marker == NULL || enum_marker > marker)
    {
      g_printerr ("rugosa-gen-fields: %s lacks the markers <!-- @SEEDED_ENUMS@ --> and <!-- @SEEDED_KEYS@ -->\n",
                  template_path);
      return 1;
    }
  *enum_marker = '\0';
  *marker = '\0';
  fputs (template, stdout);
  fputs (enums->str, stdout);
  fputs (enum_marker + strlen ("<!-- @SEEDED_ENUMS@ -->"), stdout);
  fputs (keys->str, stdout);
  fputs (marker + strlen ("<!-- @SEEDED_KEYS@ -->"), stdout);
  return 0;
}

static void
json_string (GString *out, const char *s)
{
  g_string_append_c (out, '"');
  for (const char *p = s; p && *p; p++)
    {
      if (*p == '"' || *p == '\\')
        g_string_append_c (out, '\\');
      g_string_append_c (out, *p);
    }
  g_string_append_c (out, '"');
}

static int
cmd_json (void)
{
  g_autoptr (GString) out = g_string_new ("[\n");
  gboolean first = TRUE;

  for (int t = 0; t < 2; t++)
    {
      guint n;
      const RugosaField *rows = t == 0 ? rugosa_line_fields (&n) : rugosa_settings_fields (&n);

      for (guint i = 0; i < n; i++)
        {
          const RugosaField *f = &rows[i];
          char a[G_ASCII_DTOSTR_BUF_SIZE], b[G_ASCII_DTOSTR_BUF_SIZE], c[G_ASCII_DTOSTR_BUF_SIZE];

          g_string_append (out, first ? "  {" : ",\n  {");
          first = FALSE;
          g_string_append (out, "\"table\": ");
          json_string (out, t == 0 ? "line" : "settings");
          g_string_append (out, ", \"property\": ");
          json_string (out, f->property);
          g_string_append (out, ", \"path\": ");
          json_string (out, f->path);
          g_string_append_printf (out, ", \"kind\": %d, \"flags\": %u", (int) f->kind, f->flags);
          g_string_append (out, ", \"cli\": ");
          if (f->cli)
            json_string (out, f->cli);
          else
            g_string_append (out, "null");
          g_string_append (out, ", \"label\": ");
          json_string (out, f->label);
          g_string_append (out, ", \"unit\": ");
          json_string (out, rugosa_field_si_unit (f));
          g_string_append_printf (out, ", \"to_si\": %s, \"min\": %s, \"max\": %s, \"default\": %s, \"fluid_kinds\": %u}",
                                  g_ascii_formatd (a, sizeof a, "%.17g", f->to_si),
                                  g_ascii_formatd (b, sizeof b, "%.17g", f->min),
                                  g_ascii_formatd (c, sizeof c, "%.17g", f->max),
                                  f->kind == RUGOSA_FIELD_NUMBER || f->kind == RUGOSA_FIELD_ENUM
                                    ? g_ascii_formatd ((char[G_ASCII_DTOSTR_BUF_SIZE]) { 0 }, G_ASCII_DTOSTR_BUF_SIZE, "%.17g", f->dflt)
                                    : "null",
                                  f->fluid_kinds);
        }
    }
  g_string_append (out, "\n]\n");
  fputs (out->str, stdout);
  return 0;
}

int
main (int argc, char **argv)
{
  setlocale (LC_ALL, "C");
  if (argc == 2 && g_str_equal (argv[1], "markdown"))
    return cmd_markdown ();
  if (argc == 4 && g_str_equal (argv[1], "gschema"))
    return cmd_gschema (argv[2], argv[3]);
  if (argc == 2 && g_str_equal (argv[1], "json"))
    return cmd_json ();
  g_printerr ("usage: rugosa-gen-fields markdown | gschema TEMPLATE APP_ID | json\n");
  return 2;
}
