/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The output keys and the text, CSV and JSON forms of the evaluation (see
 * rugosa-output.h). */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <math.h>
#include <string.h>

#include "core/aging.h"
#include "core/hazen-williams.h"
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

/* Pumping (rugosa-life-cycle.c): SI values (W, J, money). */
static double get_pump_head (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return p->pump_head_m; }
static double get_hydraulic_power (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return p->hydraulic_power_w; }
static double get_pump_power (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return p->electric_power_w; }
static double get_pump_power_new (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return p->electric_power_new_w; }
#define E(field) static double get_##field (const RugosaLineResults *r, const RugosaOperatingPoint *p) { (void) p; return r->energy.field; }
E (energy_j_per_year)
E (energy_new_j_per_year)
E (cost_per_year)
E (cost_new_per_year)
E (capital)
E (life_energy_cost)
E (life_energy_cost_pv)
E (life_cycle_cost)
E (duty_flow_m3_s)
E (duty_head_m)
E (duty_new_flow_m3_s)
E (duty_new_head_m)
#undef E

static gboolean
is_design (const RugosaLineResults *r, const RugosaOperatingPoint *p)
{
  return p == &r->points[RUGOSA_FLOW_DESIGN];
}

static gboolean has_energy (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return is_design (r, p) && r->energy.ok; }
static gboolean has_capital (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return is_design (r, p) && r->energy.has_capital; }
static gboolean has_life (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return is_design (r, p) && r->energy.life_ok; }
static gboolean has_life_cycle (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return has_life (r, p) && r->energy.has_capital; }
static gboolean has_duty (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return is_design (r, p) && r->energy.duty_ok; }
static gboolean has_duty_new (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return is_design (r, p) && r->energy.duty_new_ok; }

static double get_hw_c (const RugosaLineResults *r, const RugosaOperatingPoint *p) { return p->hazen_williams_c; }
static gboolean has_hw (const RugosaOperatingPoint *p) { return p->has_hazen_williams; }

/* "usual", or the first note of rg_hazen_williams_notes (in the order of
 * its bits: fluid, regime, velocity, bore). */
static const char *
id_hw_range (const RugosaOperatingPoint *p)
{
  for (unsigned b = 0; b < RG_HW_N_NOTES; b++)
    if (p->hazen_williams_notes & (1u << b))
      return rg_hazen_williams_note_id (1u << b);
  return rg_hazen_williams_note_id (0);
}

static const char *id_regime (const RugosaOperatingPoint *p) { return rg_regime_id (p->result.friction.regime); }
static const char *id_zone (const RugosaOperatingPoint *p) { return rg_roughness_zone_id (p->result.friction.zone); }

static gboolean has_laminar (const RugosaOperatingPoint *p) { return p->result.friction.has_laminar; }
static gboolean is_turbulent (const RugosaOperatingPoint *p) { return p->result.friction.regime == RG_REGIME_TURBULENT; }

#define NUMBER(name, label, disp, get, present) \
  { name, label, RUGOSA_DISPLAY_##disp, RUGOSA_OUTPUT_NUMBER, get, NULL, present, NULL }
/* A value of the whole line, given with its design point. */
#define LINE_NUMBER(name, label, disp, get, present) \
  { name, label, RUGOSA_DISPLAY_##disp, RUGOSA_OUTPUT_NUMBER, get, NULL, NULL, present }

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
  NUMBER ("hazen_williams_c_equivalent", N_("Hazen–Williams C equivalent"), NUMBER, get_hw_c, has_hw),
  { "hazen_williams_range", N_("Hazen–Williams range"), RUGOSA_DISPLAY_NUMBER, RUGOSA_OUTPUT_ID, NULL, id_hw_range, has_hw, NULL },
  NUMBER ("pump_head", N_("Pump head (losses and elevation change)"), HEAD, get_pump_head, NULL),
  NUMBER ("hydraulic_power", N_("Hydraulic power ρgQH"), POWER, get_hydraulic_power, NULL),
  NUMBER ("pump_power", N_("Electric input power"), POWER, get_pump_power, NULL),
  NUMBER ("pump_power_new", N_("Electric input power when new"), POWER, get_pump_power_new, NULL),
  LINE_NUMBER ("energy", N_("Energy per year"), ENERGY_PER_YEAR, get_energy_j_per_year, has_energy),
  LINE_NUMBER ("energy_new", N_("Energy per year when new"), ENERGY_PER_YEAR, get_energy_new_j_per_year, has_energy),
  LINE_NUMBER ("energy_cost_per_year", N_("Energy cost per year"), MONEY, get_cost_per_year, has_energy),
  LINE_NUMBER ("energy_cost_new_per_year", N_("Energy cost per year when new"), MONEY, get_cost_new_per_year, has_energy),
  LINE_NUMBER ("capital_cost", N_("Capital cost"), MONEY, get_capital, has_capital),
  LINE_NUMBER ("life_energy_cost", N_("Energy cost over the service life"), MONEY, get_life_energy_cost, has_life),
  LINE_NUMBER ("life_energy_cost_pv", N_("Present value of the energy cost over the service life"), MONEY, get_life_energy_cost_pv, has_life),
  LINE_NUMBER ("life_cycle_cost", N_("Life-cycle cost (capital and present value of energy)"), MONEY, get_life_cycle_cost, has_life_cycle),
  LINE_NUMBER ("duty_flow", N_("Duty flow at the service age"), FLOW, get_duty_flow_m3_s, has_duty),
  LINE_NUMBER ("duty_head", N_("Duty head at the service age"), HEAD, get_duty_head_m, has_duty),
  LINE_NUMBER ("duty_flow_new", N_("Duty flow when new"), FLOW, get_duty_new_flow_m3_s, has_duty_new),
  LINE_NUMBER ("duty_head_new", N_("Duty head when new"), HEAD, get_duty_new_head_m, has_duty_new),
  { "warnings", N_("Warnings"), RUGOSA_DISPLAY_NUMBER, RUGOSA_OUTPUT_WARNINGS, NULL, NULL, NULL, NULL },
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

gboolean
rugosa_output_present_for (const RugosaOutputKey *key, const RugosaLineResults *r,
                           const RugosaOperatingPoint *p)
{
  if (key->line_present != NULL)
    return key->line_present (r, p);
  return rugosa_output_present (key, p);
}

const char *
rugosa_output_unit (RugosaSettings *units, RugosaDisplayQuantity display)
{
  const RugosaDisplayInfo *info = rugosa_display_info (display);

  if (display == RUGOSA_DISPLAY_MONEY)
    {
      const char *currency = units != NULL ? rugosa_settings_get_unit (units, display) : NULL;

      return currency != NULL && *currency != '\0' ? currency : NULL;
    }

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
/* The last unit each display quantity was converted to, and its factor
 * and offset: a CSV row converts forty values and a batch writes rows by
 * the hundred thousand, while naming a unit costs a search of the core's
 * unit table.  Per thread, so exports on a worker thread are safe. */
typedef struct {
  char unit[32];          /* "" until known */
  gboolean ok;
  double factor, offset;
} ConversionMemo;

static _Thread_local ConversionMemo conversion_memo[RUGOSA_N_DISPLAY];

/* `si` in `unit`, bit for bit as rg_units_from_si gives it; `si` itself
 * when it cannot be converted. */
static double
in_unit (RugosaDisplayQuantity display, double si, const char *unit)
{
  const RugosaDisplayInfo *info = rugosa_display_info (display);
  ConversionMemo *m;
  double v = si;

  if (info == NULL || unit == NULL || (guint) display >= RUGOSA_N_DISPLAY)
    return si;
  if (strlen (unit) >= sizeof conversion_memo[0].unit)
    {
      (void) rg_units_from_si (info->quantity, si, unit, &v, NULL);
      return v;
    }
  m = &conversion_memo[display];
  if (m->unit[0] == '\0' || strcmp (m->unit, unit) != 0)
    {
      g_strlcpy (m->unit, unit, sizeof m->unit);
      m->ok = rg_units_conversion (info->quantity, unit, &m->factor, &m->offset, NULL) == RG_OK;
    }
  /* what rg_units_from_si refuses is left as it is */
  if (!m->ok || !isfinite (si) || (info->quantity == RG_QTY_TEMPERATURE && si < 0.0))
    return si;
  v = si / m->factor - m->offset;
  return isfinite (v) ? v : si;
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
      const RugosaDisplayInfo *info = rugosa_display_info (k->display);

      if (!rugosa_output_present_for (k, r, p))
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
          /* SI, or the unit the key names where that is not SI (kW) */
          append_number (out, info != NULL && info->json_unit != NULL
                                ? in_unit (k->display, k->number (r, p), info->json_unit)
                                : k->number (r, p));
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

guint
rugosa_output_point_table_width (const RugosaLineResults *r, const RugosaOperatingPoint *p)
{
  /* at least the width the shorter tables have always had, so a column of
   * values stays where scripts and eyes expect it */
  guint width = 38;

  for (guint i = 0; i < G_N_ELEMENTS (KEYS); i++)
    if (KEYS[i].kind != RUGOSA_OUTPUT_WARNINGS && rugosa_output_present_for (&KEYS[i], r, p))
      width = MAX (width, (guint) g_utf8_strlen (_(KEYS[i].label), -1) + 1);
  return width;
}

void
rugosa_output_point_table (GString *out, const RugosaLineResults *r,
                           const RugosaOperatingPoint *p, RugosaSettings *units)
{
  const int width = (int) rugosa_output_point_table_width (r, p);

  for (guint i = 0; i < G_N_ELEMENTS (KEYS); i++)
    {
      const RugosaOutputKey *k = &KEYS[i];
      const char *unit = rugosa_output_unit (units, k->display);
      g_autofree char *value = NULL;

      if (!rugosa_output_present_for (k, r, p))
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
      append_cell (out, _(k->label), width);
      g_string_append (out, value);
      if (unit != NULL)
        {
          g_string_append_c (out, ' ');
          g_string_append (out, rugosa_display_unit_label (k->display, unit));
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
    g_string_append_printf (out, " (%s)", rugosa_display_unit_label (display, unit));
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
      if (!ok || !rugosa_output_present_for (key, r, p))
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

/* The pumping energy and costs, one row per line (the values of the whole
 * line, given with its design point). */
static void
format_energy_table (RugosaProject *self, double age, int name_width, GString *out)
{
  static const struct { const char *key; int width; } cols[] = {
    { "pump_power", 9 }, { "energy", 15 }, { "energy_cost_per_year", 11 },
    { "capital_cost", 11 }, { "life_energy_cost_pv", 13 }, { "life_cycle_cost", 14 },
    { "duty_flow_new", 14 }, { "duty_flow", 14 },
  };
  /* TRANSLATORS: short column titles of rugosa-cli's energy table: electric
   * power at the design flow, energy and cost of a year, capital cost,
   * present value of the energy over the service life, life-cycle cost,
   * the pump's duty flow when new and at the service age */
  static const char *const titles[] = {
    N_("P"), N_("energy"), N_("cost/yr"), N_("capital"), N_("energy PV"),
    N_("life cycle"), N_("duty new"), N_("duty aged"),
  };
  RugosaSettings *units = self->settings;

  G_STATIC_ASSERT (G_N_ELEMENTS (cols) == G_N_ELEMENTS (titles));
  {
    char life[G_ASCII_DTOSTR_BUF_SIZE], rate[G_ASCII_DTOSTR_BUF_SIZE];
    g_autofree char *head = NULL;

    g_ascii_formatd (life, sizeof life, "%.4g", rugosa_settings_get_double (units, "service-life"));
    g_ascii_formatd (rate, sizeof rate, "%.4g", rugosa_settings_get_double (units, "discount-rate"));
    /* TRANSLATORS: the service life in years, then the discount rate in per cent */
    head = g_strdup_printf (_("Pumping energy and cost; service life %s years, discount rate %s %% a year."),
                            life, rate);
    g_string_append_c (out, '\n');
    g_string_append (out, head);
    g_string_append_c (out, '\n');
  }
  append_cell (out, _("line"), name_width);
  for (guint c = 0; c < G_N_ELEMENTS (cols); c++)
    {
      const RugosaOutputKey *k = rugosa_output_key_find (cols[c].key);
      const char *unit = rugosa_output_unit (units, k->display);
      g_autofree char *t = unit ? g_strdup_printf ("%s %s", _(titles[c]), rugosa_display_unit_label (k->display, unit))
                                : g_strdup (_(titles[c]));
      append_cell (out, t, cols[c].width);
    }
  g_string_append_c (out, '\n');
  for (guint i = 0; i < self->lines->len; i++)
    {
      RugosaLine *line = g_ptr_array_index (self->lines, i);
      const RugosaLineResults *r = rugosa_project_get_results_at (self, line, age);
      const RugosaOperatingPoint *p = &r->points[RUGOSA_FLOW_DESIGN];
      g_autofree char *name = printable (rugosa_line_get_name (line));

      append_cell (out, name, name_width);
      for (guint c = 0; c < G_N_ELEMENTS (cols); c++)
        {
          const RugosaOutputKey *k = rugosa_output_key_find (cols[c].key);

          g_autofree char *v = NULL;

          /* whole units of money and energy, four figures of the rest */
          if (r->ok && p->ok && rugosa_output_present_for (k, r, p))
            v = rugosa_display_significant (in_unit (k->display, k->number (r, p),
                                                     rugosa_output_unit (units, k->display)), 4);
          append_cell (out, v != NULL ? v : "—", cols[c].width);
        }
      g_string_append_c (out, '\n');
    }
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
  int widths[G_N_ELEMENTS (cols)];
  int flow_width = 10;

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
  /* "V (ft/s)": a column names its unit as a CSV column does; a column is
   * at least as wide as its title and a space */
  {
    g_autofree char *t = g_strdup_printf ("Q (%s)", rugosa_display_unit_symbol (flow_unit));
    flow_width = MAX (flow_width, (int) g_utf8_strlen (t, -1) + 1);
    append_cell (out, t, flow_width);
  }
  for (guint c = 0; c < G_N_ELEMENTS (cols); c++)
    {
      const RugosaOutputKey *k = rugosa_output_key_find (cols[c].key);
      const char *unit = rugosa_output_unit (units, k->display);
      g_autofree char *t = unit ? g_strdup_printf ("%s (%s)", _(titles[c]), rugosa_display_unit_symbol (unit))
                                : g_strdup (_(titles[c]));
      widths[c] = MAX (cols[c].width, (int) g_utf8_strlen (t, -1) + 1);
      append_cell (out, t, widths[c]);
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
                                             in_unit (RUGOSA_DISPLAY_FLOW, point_flow (line, r, c), flow_unit)),
                       flow_width);
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
                append_cell (out, key->id (p), widths[k]);
              else
                append_cell (out, g_ascii_formatd (buf, sizeof buf, "%.4g",
                                                   in_unit (key->display, key->number (r, p),
                                                            rugosa_output_unit (units, key->display))),
                             widths[k]);
            }
          g_string_append_printf (out, "%d\n", p->warnings.count);
          for (int w = 0; w < p->warnings.count; w++)
            g_string_append_printf (out, "    ! %s\n", p->warnings.text[w]);
        }
    }
  format_energy_table (self, age, name_width, out);
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
