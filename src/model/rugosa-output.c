/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The output keys and the text, CSV and JSON forms of the evaluation (see
 * rugosa-output.h). */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <math.h>
#include <string.h>

#include "core/aging.h"
#include "rugosa-display.h"
#include "rugosa-fields.h"
#include "rugosa-model-private.h"
#include "rugosa-output.h"
#include "rugosa-project-private.h"
#include "rugosa-units.h"

#define R(field) static double get_##field (const RugosaLineResults *r, const RugosaOperatingPoint *p) { (void) r; return p->result.field; }
R (velocity_m_s)
R (reynolds)
R (relative_roughness)
R (head_loss_major_m)
R (head_loss_minor_m)
R (head_loss_total_m)
R (pressure_drop_pa)
R (gradient_m_per_100m)
R (wall_shear_pa)
#undef R

static double get_f (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return p->result.friction.f; }
static double get_f_laminar (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return p->result.friction.f_laminar; }
static double get_eps_plus (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return p->result.friction.eps_plus; }
static double get_elasticity (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return p->result.friction.roughness_elasticity; }
static double get_density (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return r->density_kg_m3; }
static double get_viscosity (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return r->dynamic_viscosity_pa_s; }
static double get_diameter (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return r->inner_diameter_m; }
static double get_roughness (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return r->roughness_m; }
static double get_roughness_new (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return r->roughness_new_m; }
static double get_ratio (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return p->head_loss_ratio_to_new; }
static double get_k_total (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return p->minor_loss_k_total; }

static const char *id_regime (const RugosaOperatingPoint *p) { return rg_regime_id (p->result.friction.regime); }
static const char *id_zone (const RugosaOperatingPoint *p) { return rg_roughness_zone_id (p->result.friction.zone); }

static gboolean has_laminar (const RugosaOperatingPoint *p) { return p->result.friction.has_laminar; }
static gboolean is_turbulent (const RugosaOperatingPoint *p) { return p->result.friction.regime == RG_REGIME_TURBULENT; }

#define NUMBER(name, label, disp, get, present) \
  { name, label, RUGOSA_DISPLAY_##disp, RUGOSA_OUTPUT_NUMBER, get, NULL, present }

static const RugosaOutputKey KEYS[] = {
  NUMBER ("velocity", N_("Mean velocity"), VELOCITY, get_velocity_m_s, NULL),
  NUMBER ("reynolds", N_("Reynolds number"), NUMBER, get_reynolds, NULL),
  NUMBER ("relative_roughness", N_("Relative roughness ε/D"), NUMBER, get_relative_roughness, NULL),
  NUMBER ("friction_factor", N_("Friction factor (Darcy)"), NUMBER, get_f, NULL),
  NUMBER ("friction_factor_laminar", N_("Laminar value 64/Re"), NUMBER, get_f_laminar, has_laminar),
  { "regime", N_("Regime"), RUGOSA_DISPLAY_NUMBER, RUGOSA_OUTPUT_ID, NULL, id_regime, NULL },
  { "roughness_zone", N_("Roughness zone"), RUGOSA_DISPLAY_NUMBER, RUGOSA_OUTPUT_ID, NULL, id_zone, is_turbulent },
  NUMBER ("roughness_reynolds", N_("Roughness Reynolds number ε⁺"), NUMBER, get_eps_plus, is_turbulent),
  NUMBER ("head_loss_major", N_("Head loss, pipe friction"), HEAD, get_head_loss_major_m, NULL),
  NUMBER ("head_loss_minor", N_("Head loss, fittings"), HEAD, get_head_loss_minor_m, NULL),
  NUMBER ("head_loss_total", N_("Head loss, total"), HEAD, get_head_loss_total_m, NULL),
  NUMBER ("pressure_drop", N_("Pressure drop (with elevation change)"), PRESSURE, get_pressure_drop_pa, NULL),
  NUMBER ("gradient", N_("Pipe-friction gradient"), GRADIENT, get_gradient_m_per_100m, NULL),
  NUMBER ("wall_shear", N_("Wall shear stress"), PRESSURE, get_wall_shear_pa, NULL),
  NUMBER ("density", N_("Density"), DENSITY, get_density, NULL),
  NUMBER ("dynamic_viscosity", N_("Dynamic viscosity"), DYNAMIC_VISCOSITY, get_viscosity, NULL),
  NUMBER ("roughness_elasticity", N_("Roughness elasticity ∂ln f/∂ln(ε/D)"), NUMBER, get_elasticity, NULL),
  NUMBER ("inner_diameter", N_("Inner diameter"), DIAMETER, get_diameter, NULL),
  NUMBER ("roughness", N_("Roughness at the service age"), ROUGHNESS, get_roughness, NULL),
  NUMBER ("roughness_new", N_("Roughness when new"), ROUGHNESS, get_roughness_new, NULL),
  NUMBER ("head_loss_ratio_to_new", N_("Head loss, ratio to new"), NUMBER, get_ratio, NULL),
  NUMBER ("minor_loss_k_total", N_("ΣK of fittings"), NUMBER, get_k_total, NULL),
  { "warnings", N_("Warnings"), RUGOSA_DISPLAY_NUMBER, RUGOSA_OUTPUT_WARNINGS, NULL, NULL, NULL },
};

const RugosaOutputKey *
rugosa_output_keys (guint *n)
{
  *n = G_N_ELEMENTS (KEYS);
  return KEYS;
}

const RugosaOutputKey *
rugosa_output_key_find (const char *name)
{
  for (guint i = 0; i < G_N_ELEMENTS (KEYS); i++)
    if (g_strcmp0 (KEYS[i].name, name) == 0)
      return &KEYS[i];
  return NULL;
}

const char *
rugosa_output_json_key (const RugosaOutputKey *key)
{
  static const char *json_keys[G_N_ELEMENTS (KEYS)];
  static gsize done;

  g_return_val_if_fail (key >= KEYS && key < KEYS + G_N_ELEMENTS (KEYS), key->name);
  /* "velocity" + "_" + "m_s", made once for every key (a batch asks for
   * them row after row) */
  if (g_once_init_enter (&done))
    {
      for (guint i = 0; i < G_N_ELEMENTS (KEYS); i++)
        {
          const RugosaDisplayInfo *info = rugosa_display_info (KEYS[i].display);
          g_autofree char *s = info != NULL ? g_strconcat (KEYS[i].name, "_", info->key_unit, NULL)
                                            : g_strdup (KEYS[i].name);
          json_keys[i] = g_intern_string (s);
        }
      g_once_init_leave (&done, 1);
    }
  return json_keys[key - KEYS];
}

gboolean
rugosa_output_present (const RugosaOutputKey *key, const RugosaOperatingPoint *p)
{
  return key->present == NULL || key->present (p);
}

const char *
rugosa_output_unit (RugosaSettings *units, RugosaDisplayQuantity display)
{
  const RugosaDisplayInfo *info = rugosa_display_info (display);

  if (info == NULL)
    return NULL;
  if (units == NULL)
    return rg_units_si_symbol (info->quantity);
  return rugosa_settings_get_unit (units, display);
}

/* ---- pieces ---- */

/* Shortest text that reads back to the same double, "." as decimal point. */
static void
append_number (GString *out, double x)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  _rugosa_format_double (buf, sizeof buf, x);
  g_string_append (out, buf);
}

static void
append_json_string (GString *out, const char *s)
{
  g_string_append_c (out, '"');
  for (const unsigned char *p = (const unsigned char *) s; *p; p++)
    {
      if (*p == '"' || *p == '\\')
        g_string_append_printf (out, "\\%c", *p);
      else if (*p < 0x20 || *p == 0x7F)
        g_string_append_printf (out, "\\u%04x", *p);
      else
        g_string_append_c (out, (char) *p);
    }
  g_string_append_c (out, '"');
}

/* A CSV field: quoted when needed; control characters (a line name could
 * hold an escape sequence) are shown as '?' so nothing reaches a terminal
 * raw. */
static void
append_csv_field (GString *out, const char *s)
{
  gboolean quote = strpbrk (s, ",\"\r\n") != NULL;

  if (quote)
    g_string_append_c (out, '"');
  for (const char *p = s; *p; p++)
    {
      if (*p == '"')
        g_string_append (out, "\"\"");
      else if ((unsigned char) *p < 0x20 || *p == 0x7F)
        g_string_append_c (out, '?');
      else
        g_string_append_c (out, *p);
    }
  if (quote)
    g_string_append_c (out, '"');
}

/* The value in the display unit, as a number that reads back exactly in
 * that unit. */
static double
in_unit (RugosaDisplayQuantity display, double si, const char *unit)
{
  const RugosaDisplayInfo *info = rugosa_display_info (display);
  double v = si;

  if (info != NULL && unit != NULL)
    (void) rg_units_from_si (info->quantity, si, unit, &v, NULL);
  return v;
}

static const char *
point_error (const RugosaLineResults *r, const RugosaOperatingPoint *p)
{
  return r->ok ? p->error : r->error;
}

void
rugosa_output_point_json (GString *out, const RugosaLineResults *r,
                          const RugosaOperatingPoint *p, const char *indent)
{
  gboolean first = TRUE;

  if (!r->ok || !p->ok)
    {
      g_string_append_printf (out, "%s\"error\": ", indent);
      append_json_string (out, point_error (r, p));
      return;
    }
  for (guint i = 0; i < G_N_ELEMENTS (KEYS); i++)
    {
      const RugosaOutputKey *k = &KEYS[i];

      if (!rugosa_output_present (k, p))
        continue;
      if (!first)
        g_string_append_c (out, ',');
      g_string_append (out, indent);
      g_string_append_c (out, '"');
      g_string_append (out, rugosa_output_json_key (k));
      g_string_append (out, "\": ");
      first = FALSE;
      switch (k->kind)
        {
        case RUGOSA_OUTPUT_NUMBER:
          append_number (out, k->number (r, p));
          break;
        case RUGOSA_OUTPUT_ID:
          append_json_string (out, k->id (p));
          break;
        case RUGOSA_OUTPUT_WARNINGS:
          g_string_append_c (out, '[');
          for (int w = 0; w < p->warnings.count; w++)
            {
              if (w > 0)
                g_string_append (out, ", ");
              append_json_string (out, p->warnings.text[w]);
            }
          g_string_append_c (out, ']');
          break;
        default:
          g_assert_not_reached ();
        }
    }
}

static void
append_cell (GString *out, const char *text, int width)
{
  /* Pad by characters, not bytes: names and units may hold non-ASCII. */
  glong n = g_utf8_strlen (text, -1);

  g_string_append (out, text);
  for (glong i = n; i < width; i++)
    g_string_append_c (out, ' ');
  if (n >= width)
    g_string_append_c (out, ' '); /* a wide value still leaves a gap */
}

void
rugosa_output_point_table (GString *out, const RugosaLineResults *r,
                           const RugosaOperatingPoint *p, RugosaSettings *units)
{
  for (guint i = 0; i < G_N_ELEMENTS (KEYS); i++)
    {
      const RugosaOutputKey *k = &KEYS[i];
      const char *unit = rugosa_output_unit (units, k->display);
      g_autofree char *value = NULL;

      if (!rugosa_output_present (k, p))
        continue;
      if (k->kind == RUGOSA_OUTPUT_WARNINGS)
        {
          for (int w = 0; w < p->warnings.count; w++)
            {
              /* TRANSLATORS: a warning line of rugosa-cli's table output */
              g_autofree char *line = g_strdup_printf (_("warning: %s"), p->warnings.text[w]);
              g_string_append (out, line);
              g_string_append_c (out, '\n');
            }
          continue;
        }
      if (k->kind == RUGOSA_OUTPUT_ID)
        value = g_strdup (k->id (p));
      else
        {
          char buf[G_ASCII_DTOSTR_BUF_SIZE];
          value = g_strdup (g_ascii_formatd (buf, sizeof buf, "%.6g",
                                             in_unit (k->display, k->number (r, p), unit)));
        }
      append_cell (out, _(k->label), 38);
      g_string_append (out, value);
      if (unit != NULL)
        {
          g_string_append_c (out, ' ');
          g_string_append (out, rugosa_display_unit_symbol (unit));
        }
      g_string_append_c (out, '\n');
    }
}

/* ---- the whole project ---- */

/* The points of a line that appear in the output: every present point,
 * or the design point alone (with the error) when the line is wrong. */
static gboolean
point_listed (const RugosaLineResults *r, RugosaFlowCase c)
{
  return r->ok ? r->points[c].present : c == RUGOSA_FLOW_DESIGN;
}

static double
point_flow (RugosaLine *line, const RugosaLineResults *r, RugosaFlowCase c)
{
  return r->points[c].flow_m3_s > 0.0 ? r->points[c].flow_m3_s
                                      : rugosa_line_get_double (line, "flow-design");
}

static void
format_json (RugosaProject *self, double age, GString *out)
{
  gboolean first = TRUE;

  g_string_append (out, "{\n  \"service_age_years\": ");
  append_number (out, age);
  g_string_append (out, ",\n  \"results\": [");
  for (guint i = 0; i < self->lines->len; i++)
    {
      RugosaLine *line = g_ptr_array_index (self->lines, i);
      const RugosaLineResults *r = rugosa_project_get_results_at (self, line, age);

      for (RugosaFlowCase c = 0; c < RUGOSA_N_FLOWS; c++)
        {
          if (!point_listed (r, c))
            continue;
          g_string_append (out, first ? "\n    {" : ",\n    {");
          first = FALSE;
          g_string_append (out, "\"line\": ");
          append_json_string (out, rugosa_line_get_name (line));
          g_string_append_printf (out, ", \"case\": \"%s\", \"flow_m3_s\": ",
                                  rugosa_flow_case_id (c));
          append_number (out, point_flow (line, r, c));
          g_string_append (out, ",");
          rugosa_output_point_json (out, r, &r->points[c], " ");
          g_string_append_c (out, '}');
        }
    }
  g_string_append (out, first ? "]\n}\n" : "\n  ]\n}\n");
}

/* "velocity (ft/s)": a CSV column names its unit. */
static void
append_csv_header (GString *out, const char *name, RugosaDisplayQuantity display,
                   RugosaSettings *units)
{
  const char *unit = rugosa_output_unit (units, display);

  g_string_append_c (out, ',');
  g_string_append (out, name);
  if (unit != NULL)
    g_string_append_printf (out, " (%s)", rugosa_display_unit_symbol (unit));
}

void
rugosa_output_csv_header (GString *out, RugosaSettings *units)
{
  for (guint k = 0; k < G_N_ELEMENTS (KEYS); k++)
    append_csv_header (out, KEYS[k].name, KEYS[k].display, units);
}

void
rugosa_output_point_csv (GString *out, const RugosaLineResults *r,
                         const RugosaOperatingPoint *p, RugosaSettings *units)
{
  const gboolean ok = r->ok && p->ok;

  for (guint k = 0; k < G_N_ELEMENTS (KEYS); k++)
    {
      const RugosaOutputKey *key = &KEYS[k];

      g_string_append_c (out, ',');
      if (!ok || !rugosa_output_present (key, p))
        continue;
      if (key->kind == RUGOSA_OUTPUT_ID)
        g_string_append (out, key->id (p));
      else if (key->kind == RUGOSA_OUTPUT_WARNINGS)
        {
          g_autoptr (GString) w = g_string_new (NULL);

          for (int j = 0; j < p->warnings.count; j++)
            g_string_append_printf (w, "%s%s", j ? " " : "", p->warnings.text[j]);
          append_csv_field (out, w->str);
        }
      else if (units == NULL)
        append_number (out, key->number (r, p)); /* SI as computed */
      else
        append_number (out, in_unit (key->display, key->number (r, p),
                                     rugosa_output_unit (units, key->display)));
    }
}

void
rugosa_output_csv_field (GString *out, const char *text)
{
  append_csv_field (out, text);
}

static void
format_csv (RugosaProject *self, double age, GString *out)
{
  RugosaSettings *units = self->settings;

  g_string_append (out, "line,case");
  append_csv_header (out, "flow", RUGOSA_DISPLAY_FLOW, units);
  rugosa_output_csv_header (out, units);
  g_string_append (out, ",error\r\n");

  for (guint i = 0; i < self->lines->len; i++)
    {
      RugosaLine *line = g_ptr_array_index (self->lines, i);
      const RugosaLineResults *r = rugosa_project_get_results_at (self, line, age);

      for (RugosaFlowCase c = 0; c < RUGOSA_N_FLOWS; c++)
        {
          const RugosaOperatingPoint *p = &r->points[c];
          gboolean ok = r->ok && p->ok;

          if (!point_listed (r, c))
            continue;
          append_csv_field (out, rugosa_line_get_name (line));
          g_string_append_printf (out, ",%s,", rugosa_flow_case_id (c));
          append_number (out, in_unit (RUGOSA_DISPLAY_FLOW, point_flow (line, r, c),
                                       rugosa_output_unit (units, RUGOSA_DISPLAY_FLOW)));
          rugosa_output_point_csv (out, r, p, units);
          g_string_append_c (out, ',');
          if (!ok)
            append_csv_field (out, point_error (r, p));
          g_string_append (out, "\r\n");
        }
    }
}

/* A name for a terminal: control characters shown as '?'. */
static char *
printable (const char *s)
{
  g_autofree char *valid = g_utf8_make_valid (s, -1);
  GString *out = g_string_new (NULL);

  for (const char *p = valid; *p != '\0'; p = g_utf8_next_char (p))
    {
      gunichar c = g_utf8_get_char (p);

      if (g_unichar_iscntrl (c))
        g_string_append_c (out, '?');
      else
        g_string_append_unichar (out, c);
    }
  return g_string_free (out, FALSE);
}

static void
format_table (RugosaProject *self, double age, GString *out)
{
  static const struct { const char *key; int width; } cols[] = {
    { "velocity", 10 }, { "reynolds", 10 }, { "friction_factor", 9 },
    { "regime", 13 }, { "head_loss_major", 11 }, { "head_loss_minor", 11 },
    { "head_loss_total", 11 }, { "pressure_drop", 12 }, { "gradient", 13 },
    { "head_loss_ratio_to_new", 7 },
  };
  /* TRANSLATORS: short column titles of rugosa-cli's eval table */
  static const char *const titles[] = {
    N_("V"), N_("Re"), N_("f"), N_("regime"), N_("h pipe"), N_("h fittings"),
    N_("h total"), N_("Δp"), N_("gradient"), N_("×new"),
  };
  RugosaSettings *units = self->settings;
  int name_width = 4;
  char buf[G_ASCII_DTOSTR_BUF_SIZE];
  const char *flow_unit = rugosa_output_unit (units, RUGOSA_DISPLAY_FLOW);

  G_STATIC_ASSERT (G_N_ELEMENTS (cols) == G_N_ELEMENTS (titles));
  for (guint i = 0; i < self->lines->len; i++)
    name_width = MAX (name_width,
                      (int) g_utf8_strlen (rugosa_line_get_name (g_ptr_array_index (self->lines, i)), -1));
  name_width = MIN (name_width, 40) + 2;

  {
    g_autofree char *head = g_strdup_printf (_("Service age %s years."),
                                             g_ascii_formatd (buf, sizeof buf, "%.4g", age));
    g_string_append (out, head);
    g_string_append_c (out, '\n');
  }
  append_cell (out, _("line"), name_width);
  append_cell (out, _("case"), 9);
  {
    g_autofree char *t = g_strdup_printf ("Q %s", rugosa_display_unit_symbol (flow_unit));
    append_cell (out, t, 10);
  }
  for (guint c = 0; c < G_N_ELEMENTS (cols); c++)
    {
      const RugosaOutputKey *k = rugosa_output_key_find (cols[c].key);
      const char *unit = rugosa_output_unit (units, k->display);
      g_autofree char *t = unit ? g_strdup_printf ("%s %s", _(titles[c]), rugosa_display_unit_symbol (unit))
                                : g_strdup (_(titles[c]));
      append_cell (out, t, cols[c].width);
    }
  g_string_append (out, _("warnings"));
  g_string_append_c (out, '\n');

  for (guint i = 0; i < self->lines->len; i++)
    {
      RugosaLine *line = g_ptr_array_index (self->lines, i);
      const RugosaLineResults *r = rugosa_project_get_results_at (self, line, age);
      g_autofree char *name = printable (rugosa_line_get_name (line));

      for (RugosaFlowCase c = 0; c < RUGOSA_N_FLOWS; c++)
        {
          const RugosaOperatingPoint *p = &r->points[c];

          if (!point_listed (r, c))
            continue;
          append_cell (out, name, name_width);
          append_cell (out, rugosa_flow_case_id (c), 9);
          append_cell (out, g_ascii_formatd (buf, sizeof buf, "%.4g",
                                             in_unit (RUGOSA_DISPLAY_FLOW, point_flow (line, r, c), flow_unit)), 10);
          if (!r->ok || !p->ok)
            {
              g_autofree char *e = g_strdup_printf (_("error: %s"), point_error (r, p));
              g_string_append (out, e);
              g_string_append_c (out, '\n');
              continue;
            }
          for (guint k = 0; k < G_N_ELEMENTS (cols); k++)
            {
              const RugosaOutputKey *key = rugosa_output_key_find (cols[k].key);

              if (key->kind == RUGOSA_OUTPUT_ID)
                append_cell (out, key->id (p), cols[k].width);
              else
                append_cell (out, g_ascii_formatd (buf, sizeof buf, "%.4g",
                                                   in_unit (key->display, key->number (r, p),
                                                            rugosa_output_unit (units, key->display))),
                             cols[k].width);
            }
          g_string_append_printf (out, "%d\n", p->warnings.count);
          for (int w = 0; w < p->warnings.count; w++)
            g_string_append_printf (out, "    ! %s\n", p->warnings.text[w]);
        }
    }
}

gboolean
rugosa_project_format_eval (RugosaProject *self, double age_years,
                            RugosaEvalFormat format, GString *out,
                            GError **error)
{
  const RugosaField *age_row = rugosa_field_find ("service-age");

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), FALSE);
  g_return_val_if_fail (out != NULL, FALSE);

  if (age_years < 0.0)
    age_years = rugosa_settings_get_double (self->settings, "service-age");
  {
    RgError err = { 0 };

    if (!isfinite (age_years) || !rugosa_field_in_range (age_row, age_years, NULL, &err))
      {
        if (!isfinite (age_years))
          rugosa_field_in_range (age_row, -1.0, NULL, &err);
        g_set_error_literal (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_VALUE, err.text);
        return FALSE;
      }
  }

  switch (format)
    {
    case RUGOSA_EVAL_FORMAT_TABLE:
      format_table (self, age_years, out);
      return TRUE;
    case RUGOSA_EVAL_FORMAT_CSV:
      format_csv (self, age_years, out);
      return TRUE;
    case RUGOSA_EVAL_FORMAT_JSON:
      format_json (self, age_years, out);
      return TRUE;
    default:
      g_set_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_VALUE,
                   _("Unknown output format %d: use table, CSV or JSON."),
                   (int) format);
      return FALSE;
    }
}
