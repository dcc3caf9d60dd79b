/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The client report: what it holds, from the project (see rugosa-report.h;
 * the layout is report-layout.c).
 *
 * Every number comes from the one evaluation (rugosa_project_get_results_at):
 * at age 0 for "new" and at the settings' service age, formatted in the
 * project's display units with the display helpers; every label comes
 * from the field rows or the output keys, so the report says what the
 * window and rugosa-cli say.  The chart and the views are drawn by the
 * chart engine from the same inputs as the screen.
 *
 * Cost: one evaluation per line option and age (cached), a block per
 * line option, so pages and time grow in proportion to the number of
 * line options. */
#define G_LOG_DOMAIN "rugosa-report"

#include "config.h"

#include <glib/gi18n-lib.h>
#include <locale.h>
#include <math.h>
#include <stdio.h>
#include <string.h>

#include "chart/report-private.h"
#include "chart-private.h"
#include "chart/rugosa-chart-input.h"
#include "chart/rugosa-plot-input.h"
#include "core/aging.h"
#include "core/catalog.h"
#include "core/fittings.h"
#include "model/rugosa-display.h"
#include "model/rugosa-enums.h"
#include "model/rugosa-fields.h"
#include "model/rugosa-output.h"
#include "model/rugosa-units.h"
#include "chart/rugosa-report.h"

/* --- paper ------------------------------------------------------------- */

static const struct {
  const char *id;
  double width, height;
} papers[RUGOSA_N_PAPERS] = {
  /* ISO 216: 210 × 297 mm, at 72/25.4 points a millimetre */
  [RUGOSA_PAPER_A4] = { "a4", 210.0 * 72.0 / 25.4, 297.0 * 72.0 / 25.4 },
  /* ANSI/ASME Y14.1 size A: 8.5 × 11 in */
  [RUGOSA_PAPER_LETTER] = { "letter", 8.5 * 72.0, 11.0 * 72.0 },
};

const char *
rugosa_paper_id (RugosaPaper paper)
{
  g_return_val_if_fail ((guint) paper < RUGOSA_N_PAPERS, "a4");
  return papers[paper].id;
}

gboolean
rugosa_paper_from_id (const char *id, RugosaPaper *paper)
{
  for (guint i = 0; id != NULL && i < RUGOSA_N_PAPERS; i++)
    if (g_ascii_strcasecmp (id, papers[i].id) == 0)
      {
        *paper = (RugosaPaper) i;
        return TRUE;
      }
  return FALSE;
}

void
rugosa_paper_size (RugosaPaper paper, double *width_pt, double *height_pt)
{
  g_return_if_fail ((guint) paper < RUGOSA_N_PAPERS);
  *width_pt = papers[paper].width;
  *height_pt = papers[paper].height;
}

RugosaPaper
rugosa_paper_for_locale (const char *locale)
{
  const char *u;
  /* Common practice (no single source): US Letter in the United States
   * and Canada, ISO A4 elsewhere (as glibc's LC_PAPER data has it). */
  static const char *const letter[] = { "US", "CA" };

  if (locale == NULL || (u = strchr (locale, '_')) == NULL)
    return RUGOSA_PAPER_A4;
  for (guint i = 0; i < G_N_ELEMENTS (letter); i++)
    if (strncmp (u + 1, letter[i], 2) == 0
        && (u[3] == '\0' || u[3] == '.' || u[3] == '@'))
      return RUGOSA_PAPER_LETTER;
  return RUGOSA_PAPER_A4;
}

/* --- values ------------------------------------------------------------ */

/* A count or a number of years: as few digits as it needs ("4", "2.5"). */
static char *
plain (double x)
{
  char *s = rugosa_display_significant_screen (x, 4);
  const char *point = localeconv ()->decimal_point;

  if (strstr (s, point) != NULL && strchr (s, 'e') == NULL)
    {
      char *end = s + strlen (s) - 1;

      while (end > s && *end == '0')
        *end-- = '\0';
      if (g_str_has_suffix (s, point))
        s[strlen (s) - strlen (point)] = '\0';
    }
  return s;
}

/* A value of `dq` in the project's display unit, the number alone. */
static char *
value_text (RugosaSettings *settings, RugosaDisplayQuantity dq, double si)
{
  const RugosaDisplayInfo *info = rugosa_display_info (dq);

  if (dq == RUGOSA_DISPLAY_MONEY)
    return rugosa_display_money_screen (si, NULL);
  if (info == NULL)
    return rugosa_display_scientific_screen (si, 4);
  return rugosa_display_number_screen (info->quantity, si, rugosa_output_unit (settings, dq));
}

/* The unit beside a value of `dq` ("L/s", "kWh/yr", "€"); "" for a plain
 * number. */
static const char *
unit_text (RugosaSettings *settings, RugosaDisplayQuantity dq)
{
  const char *unit = rugosa_output_unit (settings, dq);

  return unit != NULL ? rugosa_display_unit_label (dq, unit) : "";
}

/* A value with its unit ("25 L/s"). */
static char *
value_with_unit (RugosaSettings *settings, RugosaDisplayQuantity dq, double si)
{
  g_autofree char *v = value_text (settings, dq, si);
  const char *u = unit_text (settings, dq);

  return *u ? g_strdup_printf ("%s %s", v, u) : g_steal_pointer (&v);
}

/* A header "Label (unit)", or the label alone for a plain number. */
static char *
label_with_unit (RugosaSettings *settings, const char *label, RugosaDisplayQuantity dq)
{
  const char *u = unit_text (settings, dq);

  /* TRANSLATORS: a column or row header of the report: a quantity and its unit */
  return *u ? g_strdup_printf (_("%s (%s)"), label, u) : g_strdup (label);
}

static const char *
row_label (const char *property)
{
  return rugosa_field_label (rugosa_field_find (property));
}

/* An output key's value at a point, or NULL when the point has none. */
static char *
key_value (RugosaSettings *settings, const RugosaOutputKey *k,
           const RugosaLineResults *r, const RugosaOperatingPoint *p)
{
  if (!p->present || !p->ok || !rugosa_output_present_for (k, r, p))
    return NULL;
  /* the regime and the zone as the window names them */
  if (g_str_equal (k->name, "regime"))
    return g_strdup (rugosa_regime_title (p->result.friction.regime));
  if (g_str_equal (k->name, "roughness_zone"))
    return g_strdup (rugosa_zone_title (p->result.friction.zone));
  if (k->kind == RUGOSA_OUTPUT_ID)
    return g_strdup (k->id (p));
  return value_text (settings, k->display, k->number (r, p));
}

/* --- the project's details --------------------------------------------- */

static void
title_cell (RugosaReport *report, const char *label, const char *value)
{
  g_ptr_array_add (report->title_cells, g_strdup (label));
  g_ptr_array_add (report->title_cells, g_strdup (value));
}

static void
add (RugosaReport *report, ReportBlock *b)
{
  g_ptr_array_add (report->blocks, b);
}

static ReportBlock *
heading (RugosaReport *report, const char *text)
{
  ReportBlock *b = _rugosa_report_text (report, text, REPORT_TEXT_HEADING);

  b->space_before = 16.0;
  b->keep_with_next = TRUE;
  add (report, b);
  return b;
}

/* Running text, one block a paragraph (a paragraph longer than a page is
 * split between its lines when placed). */
static void
paragraphs (RugosaReport *report, GPtrArray *into, const char *text, ReportTextStyle style,
            double space)
{
  g_auto (GStrv) paras = g_strsplit (text, "\n", -1);

  for (guint i = 0; paras[i] != NULL; i++)
    {
      ReportBlock *b;

      g_strstrip (paras[i]);
      if (*paras[i] == '\0')
        continue;
      b = _rugosa_report_text (report, paras[i], style);
      b->space_before = space;
      g_ptr_array_add (into != NULL ? into : report->blocks, b);
    }
}

/* --- basis of calculation ---------------------------------------------- */

static void
basis_table (RugosaReport *report, RugosaProject *project, gboolean energy)
{
  RugosaSettings *s = rugosa_project_get_settings (project);
  static const double fraction[] = { 0.62, 0.38 };
  ReportTable *t = _rugosa_report_table_new (2, 1, fraction);
  ReportBlock *b = _rugosa_report_block_new (BLOCK_TABLE);
  static const char *const hydraulic[] = {
    "friction-model", "re-laminar-max", "re-turbulent-min", "service-age",
    "velocity-limit", "velocity-minimum", "gradient-limit",
  };
  static const char *const costs[] = {
    "pump-efficiency", "hours-design", "hours-minimum", "hours-maximum",
    "energy-price", "service-life", "discount-rate",
  };

  _rugosa_report_table_add (t, _("Setting"));
  _rugosa_report_table_add (t, _("Value"));
  for (guint pass = 0; pass < (energy ? 2u : 1u); pass++)
    for (guint i = 0; i < (pass == 0 ? G_N_ELEMENTS (hydraulic) : G_N_ELEMENTS (costs)); i++)
      {
        const RugosaField *row = rugosa_field_find (pass == 0 ? hydraulic[i] : costs[i]);
        char *value;

        if (row->kind == RUGOSA_FIELD_ENUM)
          {
            int v;

            g_object_get (s, row->property, &v, NULL);
            value = g_strdup (rugosa_enum_title (row->enum_type (), v));
          }
        else
          {
            const double stored = rugosa_settings_get_double (s, row->property);

            if ((row->flags & RUGOSA_FIELD_ZERO_ABSENT) && stored == 0.0)
              continue;
            if (row->display == RUGOSA_DISPLAY_MONEY)
              {
                g_autofree char *money = rugosa_display_money_screen (stored, NULL);

                value = g_strdup_printf ("%s %s%s", money, rugosa_settings_get_string (s, "currency"),
                                         row->unit_text ? row->unit_text : "");
              }
            else if (row->display == RUGOSA_DISPLAY_NUMBER || row->to_si != 1.0)
              {
                g_autofree char *n = plain (stored);
                const char *u = rugosa_field_si_unit (row);

                value = *u ? g_strdup_printf ("%s %s", n, u) : g_steal_pointer (&n);
              }
            else
              value = value_with_unit (s, row->display, stored * row->to_si);
          }
        _rugosa_report_table_add (t, rugosa_field_label (row));
        _rugosa_report_table_take (t, value);
      }
  t->right[1] = TRUE;
  b->table = t;
  b->space_before = 8.0;
  add (report, b);
}

/* --- a line option ----------------------------------------------------- */

static char *
fittings_text (RugosaLine *line)
{
  GVariant *fittings = rugosa_line_get_fittings (line);
  g_autoptr (GString) out = g_string_new (NULL);
  GVariantIter iter;
  const char *id;
  double k, count;

  g_variant_iter_init (&iter, fittings);
  while (g_variant_iter_next (&iter, "(&sdd)", &id, &k, &count))
    {
      const RgFitting *f = NULL;
      g_autofree char *n = plain (count);

      if (out->len > 0)
        g_string_append_c (out, '\n');
      if (*id != '\0' && rg_fitting_lookup (id, &f, NULL) == RG_OK)
        /* TRANSLATORS: a fitting of a line in the report: the count, then its name */
        g_string_append_printf (out, _("%s × %s"), n, _(f->name));
      else
        {
          g_autofree char *kt = plain (k);

          /* TRANSLATORS: a plain loss coefficient of a line in the report: the count, then K */
          g_string_append_printf (out, _("%s × K %s"), n, kt);
        }
    }
  return out->len > 0 ? g_string_free (g_steal_pointer (&out), FALSE) : g_strdup (_("none"));
}

/* The inputs in two columns of (input, value, unit): the fluid, the run
 * and the flows on the left, the pipe on the right. */
static ReportBlock *
inputs_table (RugosaReport *report, RugosaSettings *s, RugosaLine *line,
              const RugosaLineResults *r, double age)
{
  static const double fraction[] = { 0.16, 0.16, 0.07, 0.19, 0.33, 0.09 };
  ReportTable *t = _rugosa_report_table_new (6, 1, fraction);
  ReportBlock *b = _rugosa_report_block_new (BLOCK_TABLE);
  GPtrArray *left = g_ptr_array_new_with_free_func (g_free);
  GPtrArray *right = g_ptr_array_new_with_free_func (g_free);
  const char *id;
  guint n;

  /* each entry: label, value, unit */
#define ROW(side, label, value, unit) \
  G_STMT_START { g_ptr_array_add (side, g_strdup (label)); g_ptr_array_add (side, value); \
                 g_ptr_array_add (side, g_strdup (unit)); } G_STMT_END
#define NUMBER_ROW(side, label, dq, si) \
  ROW (side, label, value_text (s, dq, si), unit_text (s, dq))

  ROW (left, row_label ("fluid-kind"),
       g_strdup (rugosa_enum_title (RUGOSA_TYPE_FLUID_KIND, rugosa_line_get_fluid_kind (line))), "");
  {
    RgFluidSpec spec;

    rugosa_line_get_fluid_spec (line, &spec);
    if (rugosa_field_applies_to_fluid (rugosa_field_find ("temperature"), spec.kind))
      NUMBER_ROW (left, row_label ("temperature"), RUGOSA_DISPLAY_TEMPERATURE,
                  rugosa_line_get_double (line, "temperature"));
  }
  if (r->ok)
    {
      NUMBER_ROW (left, _(rugosa_display_info (RUGOSA_DISPLAY_DENSITY)->label),
                  RUGOSA_DISPLAY_DENSITY, r->density_kg_m3);
      NUMBER_ROW (left, _(rugosa_display_info (RUGOSA_DISPLAY_DYNAMIC_VISCOSITY)->label),
                  RUGOSA_DISPLAY_DYNAMIC_VISCOSITY, r->dynamic_viscosity_pa_s);
    }
  NUMBER_ROW (left, row_label ("length"), RUGOSA_DISPLAY_LENGTH, rugosa_line_get_double (line, "length"));
  NUMBER_ROW (left, row_label ("elevation"), RUGOSA_DISPLAY_LENGTH, rugosa_line_get_double (line, "elevation"));
  {
    static const char *const flows[] = { "flow-minimum", "flow-design", "flow-maximum" };

    for (guint i = 0; i < G_N_ELEMENTS (flows); i++)
      {
        const double q = rugosa_line_get_double (line, flows[i]);

        if (q > 0.0)
          NUMBER_ROW (left, row_label (flows[i]), RUGOSA_DISPLAY_FLOW, q);
      }
  }

  id = rugosa_line_get_material_id (line);
  {
    const RgMaterial *m = NULL;

    ROW (right, row_label ("material-id"),
         g_strdup (id != NULL && rg_material_lookup (id, &m, NULL) == RG_OK ? _(m->name) : _("given roughness")), "");
  }
  NUMBER_ROW (right, row_label ("roughness"), RUGOSA_DISPLAY_ROUGHNESS,
              r->ok ? r->roughness_new_m : rugosa_line_get_double (line, "roughness"));
  if (r->ok && age > 0.0)
    {
      const RgAgingClass *a = NULL;
      const char *aging = rugosa_line_get_aging_class_id (line);

      ROW (right, row_label ("aging-class-id"),
           g_strdup (aging != NULL && rg_aging_class_lookup (aging, &a, NULL) == RG_OK ? _(a->name)
                                                                                     : _("given growth rate")), "");
      /* kept per year: the row's own factor to SI */
      NUMBER_ROW (right, row_label ("aging-rate"), RUGOSA_DISPLAY_ROUGHNESS_RATE,
                  r->aging_rate_m_per_year * rugosa_field_find ("aging-rate")->to_si);
      {
        g_autofree char *years = plain (age);
        /* TRANSLATORS: a row of the report's inputs: the roughness after %s years */
        g_autofree char *label = g_strdup_printf (_("Roughness after %s years"), years);

        NUMBER_ROW (right, label, RUGOSA_DISPLAY_ROUGHNESS, r->roughness_m);
      }
    }
  id = rugosa_line_get_pipe_designation (line);
  ROW (right, _("Pipe size"), g_strdup (id != NULL ? id : _("given bore")), "");
  NUMBER_ROW (right, row_label ("inner-diameter"), RUGOSA_DISPLAY_DIAMETER,
              r->ok ? r->inner_diameter_m : rugosa_line_get_double (line, "inner-diameter"));
  ROW (right, row_label ("fittings"), fittings_text (line), "");
  if (r->ok && r->points[RUGOSA_FLOW_DESIGN].ok)
    {
      const RugosaOutputKey *k = rugosa_output_key_find ("minor_loss_k_total");

      ROW (right, _(k->label), value_text (s, k->display, r->points[RUGOSA_FLOW_DESIGN].minor_loss_k_total), "");
    }
#undef ROW
#undef NUMBER_ROW

  _rugosa_report_table_add (t, _("Fluid, run and flows"));
  _rugosa_report_table_add (t, _("Value"));
  _rugosa_report_table_add (t, _("Unit"));
  _rugosa_report_table_add (t, _("Pipe"));
  _rugosa_report_table_add (t, _("Value"));
  _rugosa_report_table_add (t, _("Unit"));
  n = MAX (left->len, right->len) / 3;
  for (guint i = 0; i < n; i++)
    for (guint side = 0; side < 2; side++)
      {
        GPtrArray *a = side == 0 ? left : right;

        for (guint c = 0; c < 3; c++)
          _rugosa_report_table_add (t, 3 * i + c < a->len ? g_ptr_array_index (a, 3 * i + c) : "");
      }
  t->right[2] = t->right[5] = FALSE;
  t->right[3] = FALSE;
  g_ptr_array_unref (left);
  g_ptr_array_unref (right);
  b->table = t;
  b->space_before = 5.0;
  return b;
}

/* The results: one row an output key, a column for each flow of the
 * line, new and at the service age. */
static ReportBlock *
results_table (RugosaReport *report, RugosaSettings *s, RugosaLine *line,
               const RugosaLineResults *r_new, const RugosaLineResults *r, double age)
{
  static const char *const keys[] = {
    "velocity", "reynolds", "relative_roughness", "friction_factor", "regime",
    "roughness_zone", "head_loss_major", "head_loss_minor", "head_loss_total",
    "pressure_drop", "gradient", "pump_head", "pump_power",
  };
  static const char *const flows[RUGOSA_N_FLOWS] = {
    [RUGOSA_FLOW_DESIGN] = "flow-design", [RUGOSA_FLOW_MINIMUM] = "flow-minimum",
    [RUGOSA_FLOW_MAXIMUM] = "flow-maximum",
  };
  const RugosaFlowCase order[] = { RUGOSA_FLOW_MINIMUM, RUGOSA_FLOW_DESIGN, RUGOSA_FLOW_MAXIMUM };
  const gboolean aged = age > 0.0;
  RugosaFlowCase cases[RUGOSA_N_FLOWS];
  guint n_cases = 0, n_cols;
  double fraction[REPORT_TABLE_COLUMNS_MAX];
  ReportTable *t;
  ReportBlock *b = _rugosa_report_block_new (BLOCK_TABLE);
  g_autofree char *age_text = NULL;

  for (guint i = 0; i < G_N_ELEMENTS (order); i++)
    if (r->points[order[i]].present)
      cases[n_cases++] = order[i];
  n_cols = 2 + n_cases * (aged ? 2 : 1);
  fraction[0] = 0.22;
  fraction[1] = 0.09;
  for (guint c = 2; c < n_cols; c++)
    fraction[c] = 0.69 / (n_cols - 2);
  t = _rugosa_report_table_new (n_cols, aged ? 2 : 1, fraction);
  t->right[1] = FALSE;

  /* the header: the flows, then new and aged under each */
  _rugosa_report_table_add (t, _("Result"));
  _rugosa_report_table_add (t, _("Unit"));
  for (guint i = 0; i < n_cases; i++)
    {
      _rugosa_report_table_add (t, row_label (flows[cases[i]]));
      if (aged)
        g_ptr_array_add (t->cells, NULL);
    }
  if (aged)
    {
      g_autofree char *years = plain (age);

      /* TRANSLATORS: the column of the report's results at the service age */
      age_text = g_strdup_printf (_("after %s years"), years);
      _rugosa_report_table_add (t, "");
      _rugosa_report_table_add (t, "");
      for (guint i = 0; i < n_cases; i++)
        {
          /* TRANSLATORS: the column of the report's results for a new pipe */
          _rugosa_report_table_add (t, C_("pipe", "new"));
          _rugosa_report_table_add (t, age_text);
        }
    }

  /* the flow itself, then the keys */
  _rugosa_report_table_add (t, _("Flow"));
  _rugosa_report_table_add (t, unit_text (s, RUGOSA_DISPLAY_FLOW));
  for (guint i = 0; i < n_cases; i++)
    for (guint a = 0; a < (aged ? 2u : 1u); a++)
      _rugosa_report_table_take (t, value_text (s, RUGOSA_DISPLAY_FLOW, r->points[cases[i]].flow_m3_s));
  for (guint k = 0; k < G_N_ELEMENTS (keys); k++)
    {
      const RugosaOutputKey *key = rugosa_output_key_find (keys[k]);
      GPtrArray *cells = g_ptr_array_new_with_free_func (g_free);
      gboolean any = FALSE;

      for (guint i = 0; i < n_cases; i++)
        for (guint a = 0; a < (aged ? 2u : 1u); a++)
          {
            const RugosaLineResults *rr = aged && a == 0 ? r_new : aged ? r : r_new;
            char *v = key_value (s, key, rr, &rr->points[cases[i]]);

            any |= v != NULL;
            g_ptr_array_add (cells, v != NULL ? v : g_strdup ("—"));
          }
      if (any)
        {
          _rugosa_report_table_add (t, _(key->label));
          _rugosa_report_table_add (t, unit_text (s, key->display));
          for (guint c = 0; c < cells->len; c++)
            _rugosa_report_table_add (t, g_ptr_array_index (cells, c));
        }
      g_ptr_array_unref (cells);
    }
  (void) line;
  b->table = t;
  b->space_before = 6.0;
  return b;
}

/* The warnings and errors of a line's points, one paragraph each, named
 * by their flow. */
static void
line_messages (RugosaReport *report, GPtrArray *into, const RugosaLineResults *r)
{
  static const char *const flows[RUGOSA_N_FLOWS] = {
    [RUGOSA_FLOW_DESIGN] = "flow-design", [RUGOSA_FLOW_MINIMUM] = "flow-minimum",
    [RUGOSA_FLOW_MAXIMUM] = "flow-maximum",
  };
  g_autoptr (GString) out = g_string_new (NULL);

  if (!r->ok)
    {
      /* TRANSLATORS: a line option the report could not evaluate: the reason */
      g_string_append_printf (out, _("Not evaluated: %s"), r->error);
      g_string_append_c (out, '\n');
    }
  else
    for (guint c = 0; c < RUGOSA_N_FLOWS; c++)
      {
        const RugosaOperatingPoint *p = &r->points[c];

        if (!p->present)
          continue;
        if (!p->ok)
          /* TRANSLATORS: a message of the report: the flow, then the sentence */
          g_string_append_printf (out, _("%s: %s\n"), row_label (flows[c]), p->error);
        for (int w = 0; w < p->warnings.count; w++)
          g_string_append_printf (out, _("%s: %s\n"), row_label (flows[c]), p->warnings.text[w]);
      }
  if (out->len > 0)
    paragraphs (report, into, out->str, REPORT_TEXT_SMALL, 2.0);
}

static void
line_block (RugosaReport *report, RugosaProject *project, guint index, double age)
{
  RugosaSettings *s = rugosa_project_get_settings (project);
  RugosaLine *line = rugosa_project_get_line (project, index);
  RugosaLineResults r_new = *rugosa_project_get_results_at (project, line, 0.0);
  RugosaLineResults r = *rugosa_project_get_results_at (project, line, age);
  ReportBlock *group = _rugosa_report_block_new (BLOCK_GROUP);
  g_autofree char *name = g_strdup_printf ("%u  %s", index + 1, rugosa_line_get_name (line));
  ReportBlock *title = _rugosa_report_text (report, name, REPORT_TEXT_SUBHEADING);
  const char *note = rugosa_line_get_note (line);
  unsigned cr, cg, cb;

  group->children = g_ptr_array_new_with_free_func (_rugosa_report_block_free);
  group->space_before = 14.0;
  title->has_swatch = sscanf (rugosa_line_get_colour (line), "#%02x%02x%02x", &cr, &cg, &cb) == 3;
  title->swatch = (RugosaChartRgba) { cr / 255.0, cg / 255.0, cb / 255.0, 1.0 };
  g_ptr_array_add (group->children, title);
  g_ptr_array_add (group->children, inputs_table (report, s, line, &r, age));
  if (r.ok)
    g_ptr_array_add (group->children, results_table (report, s, line, &r_new, &r, age));
  line_messages (report, group->children, &r);
  add (report, group);
  /* the line's note after its block, as running text */
  if (note != NULL && *note != '\0')
    paragraphs (report, NULL, note, REPORT_TEXT_BODY, 4.0);
}

/* --- life-cycle figures ------------------------------------------------ */

static void
life_cycle_table (RugosaReport *report, RugosaProject *project, double age, gboolean pumps)
{
  RugosaSettings *s = rugosa_project_get_settings (project);
  static const char *const cost_keys[] = {
    "pump_power", "energy", "energy_cost_per_year", "capital_cost",
    "life_energy_cost_pv", "life_cycle_cost",
  };
  static const char *const duty_keys[] = {
    "duty_flow_new", "duty_head_new", "duty_flow", "duty_head",
  };

  for (guint pass = 0; pass < (pumps ? 2u : 1u); pass++)
    {
      const char *const *keys = pass == 0 ? cost_keys : duty_keys;
      const guint n_keys = pass == 0 ? G_N_ELEMENTS (cost_keys) : G_N_ELEMENTS (duty_keys);
      double fraction[REPORT_TABLE_COLUMNS_MAX];
      ReportTable *t;
      ReportBlock *b = _rugosa_report_block_new (BLOCK_TABLE);

      fraction[0] = 0.25;
      for (guint c = 0; c < n_keys; c++)
        fraction[c + 1] = 0.75 / n_keys;
      t = _rugosa_report_table_new (n_keys + 1, 1, fraction);
      _rugosa_report_table_add (t, _("Line option"));
      for (guint c = 0; c < n_keys; c++)
        {
          const RugosaOutputKey *k = rugosa_output_key_find (keys[c]);

          _rugosa_report_table_take (t, label_with_unit (s, _(k->label), k->display));
        }
      for (guint i = 0; i < rugosa_project_get_n_lines (project); i++)
        {
          RugosaLine *line = rugosa_project_get_line (project, i);
          const RugosaLineResults *r = rugosa_project_get_results_at (project, line, age);
          const RugosaOperatingPoint *p = &r->points[RUGOSA_FLOW_DESIGN];

          _rugosa_report_table_take (t, g_strdup_printf ("%u  %s", i + 1, rugosa_line_get_name (line)));
          for (guint c = 0; c < n_keys; c++)
            {
              char *v = r->ok ? key_value (s, rugosa_output_key_find (keys[c]), r, p) : NULL;

              _rugosa_report_table_take (t, v != NULL ? v : g_strdup ("—"));
            }
        }
      b->table = t;
      b->space_before = 8.0;
      add (report, b);
    }
}

/* --- the report -------------------------------------------------------- */

static ReportBlock *
figure_chart (RugosaReport *report, RugosaProject *project, double width)
{
  const RugosaChartInputView every = { NULL, NULL, NULL };
  g_autoptr (RugosaChartInput) input = rugosa_chart_input_new_view (project, -1, NULL, &every);
  ReportBlock *b = _rugosa_report_block_new (BLOCK_CHART);
  RgError err = { 0 };

  input->spec.width = width;
  input->spec.height = round (width * 0.75);
  input->spec.scale = 1;
  input->spec.theme = RUGOSA_CHART_THEME_LIGHT;
  input->spec.footer_date[0] = '\0';
  b->chart = rugosa_chart_new ();
  if (rugosa_chart_set_spec (b->chart, &input->spec, &err) != RG_OK)
    g_warning ("The report's chart: %s", err.text);
  rugosa_chart_set_lines (b->chart, input->lines, input->n_lines);
  b->space_before = 8.0;
  return b;
}

static ReportBlock *
figure_plot (RugosaReport *report, RugosaProject *project, RugosaChartView view, double width)
{
  g_autoptr (RugosaPlotInput) input = rugosa_plot_input_new (project, view, -1, NULL);
  ReportBlock *b = _rugosa_report_block_new (BLOCK_PLOT);
  RgError err = { 0 };

  input->spec.width = width;
  input->spec.height = round (width * 0.58);
  input->spec.scale = 1;
  input->spec.theme = RUGOSA_CHART_THEME_LIGHT;
  input->spec.footer_date[0] = '\0';
  b->plot = rugosa_plot_new ();
  if (rugosa_plot_set_spec (b->plot, &input->spec, &err) != RG_OK)
    g_warning ("The report's plot: %s", err.text);
  rugosa_plot_set_series (b->plot, input->series, input->n_series);
  b->space_before = 8.0;
  return b;
}

RugosaReport *
rugosa_report_new (RugosaProject *project, RugosaPaper paper, const char *today)
{
  RugosaReport *report;
  RugosaSettings *s;
  const guint n = rugosa_project_get_n_lines (project);
  const char *title, *date, *note;
  double age, width;
  gboolean pumps = FALSE, capital = FALSE, energy = FALSE;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (project), NULL);
  g_return_val_if_fail ((guint) paper < RUGOSA_N_PAPERS, NULL);

  s = rugosa_project_get_settings (project);
  report = g_new0 (RugosaReport, 1);
  report->paper = paper;
  rugosa_paper_size (paper, &report->width, &report->height);
  /* 15 mm at the sides; room for the running header and the footer */
  report->margin = 15.0 * 72.0 / 25.4;
  report->top = 56.0;
  report->bottom = 52.0;
  report->today = g_strdup (today);
  report->blocks = g_ptr_array_new_with_free_func (_rugosa_report_block_free);
  report->pages = g_ptr_array_new_with_free_func ((GDestroyNotify) g_array_unref);
  report->title_cells = g_ptr_array_new_with_free_func (g_free);
  width = report->width - 2 * report->margin;
  age = rugosa_settings_get_double (s, "service-age");

  title = rugosa_settings_get_string (s, "project-title");
  report->title = g_strdup (*title ? title : _("Untitled project"));
  report->subtitle = g_strdup (_("Pipe line report"));
  /* TRANSLATORS: the report's footer: the program's version and the day the report was made */
  report->footer_left = g_strdup_printf (_("Rugosa %s · made %s"), PACKAGE_VERSION, today);
  date = rugosa_settings_get_string (s, "project-date");
  title_cell (report, row_label ("project-client"), rugosa_settings_get_string (s, "project-client"));
  title_cell (report, row_label ("project-location"), rugosa_settings_get_string (s, "project-location"));
  title_cell (report, row_label ("project-author"), rugosa_settings_get_string (s, "project-author"));
  title_cell (report, row_label ("project-revision"), rugosa_settings_get_string (s, "project-revision"));
  title_cell (report, row_label ("project-date"), *date ? date : today);
  {
    g_autofree char *count = g_strdup_printf ("%u", n);

    title_cell (report, _("Line options"), count);
  }
  add (report, _rugosa_report_block_new (BLOCK_TITLE));

  for (guint i = 0; i < n; i++)
    {
      const RugosaLineResults *r = rugosa_project_get_results_at (project, rugosa_project_get_line (project, i), age);

      energy |= r->ok && r->energy.ok;
      capital |= r->ok && r->energy.has_capital;
      pumps |= r->ok && r->energy.has_pump;
    }

  note = rugosa_settings_get_string (s, "project-note");
  if (*note != '\0')
    {
      heading (report, row_label ("project-note"));
      paragraphs (report, NULL, note, REPORT_TEXT_BODY, 5.0);
    }
  heading (report, rugosa_chart_view_title (RUGOSA_CHART_VIEW_FRICTION));
  add (report, figure_chart (report, project, width));
  heading (report, _("Basis of calculation"));
  basis_table (report, project, capital || pumps);

  heading (report, _("Line options"))->keep_with_next = TRUE;
  for (guint i = 0; i < n; i++)
    line_block (report, project, i, age);
  if (n == 0)
    add (report, _rugosa_report_text (report, _("The project has no line options."), REPORT_TEXT_BODY));

  if (energy && (capital || pumps))
    {
      heading (report, _("Energy and life-cycle cost"));
      life_cycle_table (report, project, age, pumps);
    }
  if (pumps)
    {
      heading (report, rugosa_chart_view_title (RUGOSA_CHART_VIEW_SYSTEM));
      add (report, figure_plot (report, project, RUGOSA_CHART_VIEW_SYSTEM, width));
    }
  if (capital)
    {
      heading (report, rugosa_chart_view_title (RUGOSA_CHART_VIEW_COST));
      add (report, figure_plot (report, project, RUGOSA_CHART_VIEW_COST, width));
    }

  heading (report, _("Cautions"));
  paragraphs (report, NULL, _(RUGOSA_CHART_CAUTION_FULL), REPORT_TEXT_BODY, 5.0);

  /* laid out when first asked for: a PDF whose file cannot be created
   * is refused before any text is measured */
  return report;
}

static void
ensure_pages (RugosaReport *report)
{
  if (report->pages->len == 0)
    _rugosa_report_paginate (report);
}

void
rugosa_report_free (RugosaReport *report)
{
  if (report == NULL)
    return;
  g_clear_object (&report->pango);
  g_free (report->today);
  g_free (report->title);
  g_free (report->subtitle);
  g_free (report->footer_left);
  g_ptr_array_unref (report->title_cells);
  g_ptr_array_unref (report->pages);
  g_ptr_array_unref (report->blocks);
  g_free (report);
}

guint
rugosa_report_get_n_pages (RugosaReport *report)
{
  g_return_val_if_fail (report != NULL, 0);
  ensure_pages (report);
  return report->pages->len;
}

void
rugosa_report_get_page_size (RugosaReport *report, double *width_pt, double *height_pt)
{
  g_return_if_fail (report != NULL);
  *width_pt = report->width;
  *height_pt = report->height;
}

void
rugosa_report_draw_page (RugosaReport *report, cairo_t *cr, guint page)
{
  g_return_if_fail (report != NULL);
  ensure_pages (report);
  _rugosa_report_draw_page (report, cr, page);
}

static void
draw_all (cairo_t *cr, gpointer data)
{
  RugosaReport *report = data;

  ensure_pages (report);
  for (guint i = 0; i < report->pages->len; i++)
    {
      _rugosa_report_draw_page (report, cr, i);
      cairo_show_page (cr);
    }
}

gboolean
rugosa_report_write_pdf (RugosaReport *report, const char *path, GError **error)
{
  g_return_val_if_fail (report != NULL, FALSE);
  /* the chart's export path: one surface, the atomic writer, the date */
  return _rugosa_chart_export_surface (RUGOSA_CHART_FORMAT_PDF, report->width, report->height,
                                       report->today, report->title, path, draw_all, report, error);
}
