/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Evaluation of the line options, with a cache per line, and its text,
 * CSV and JSON forms.
 *
 * A line's results depend on the line's properties, the settings and the
 * service age; each cache entry remembers the line and settings revisions
 * and the age it was computed for, so a result is recomputed only when one
 * of them changed (a "dirty" line is one whose revision moved on). */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <math.h>
#include <string.h>

#include "core/aging.h"
#include "core/catalog.h"
#include "core/fittings.h"
#include "core/fluid.h"
#include "core/line.h"
#include "rugosa-project-private.h"

typedef struct {
  guint64 line_revision;
  guint64 settings_revision;
  double age_years;
  RugosaLineResults results;
} EvalEntry;

void
_rugosa_project_eval_init (RugosaProject *self)
{
  self->eval_cache = g_hash_table_new_full (NULL, NULL, NULL, g_free);
  self->pipe_memo = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, NULL);
}

void
_rugosa_project_eval_finalize (RugosaProject *self)
{
  g_clear_pointer (&self->eval_cache, g_hash_table_unref);
  g_clear_pointer (&self->pipe_memo, g_hash_table_unref);
}

/* Parsing a designation compares it with every catalog entry; a slider drag
 * evaluates each line many times with the same text, so remember what a
 * text resolved to (the catalog is compiled in and never changes). */
static RgStatus
lookup_pipe (RugosaProject *self, const char *designation, const RgPipe **pipe,
             RgError *err)
{
  RgStatus st;

  *pipe = g_hash_table_lookup (self->pipe_memo, designation);
  if (*pipe != NULL)
    return RG_OK;
  if ((st = rg_pipe_lookup (designation, pipe, err)) == RG_OK)
    g_hash_table_insert (self->pipe_memo, g_strdup (designation), (gpointer) *pipe);
  return st;
}

void
_rugosa_project_eval_forget (RugosaProject *self, RugosaLine *line)
{
  g_hash_table_remove (self->eval_cache, line);
}

void
_rugosa_format_double (char *buf, gsize size, double x)
{
  for (int digits = 15; digits <= 17; digits++)
    {
      char fmt[8];

      g_snprintf (fmt, sizeof fmt, "%%.%dg", digits);
      g_ascii_formatd (buf, (int) size, fmt, x);
      if (g_ascii_strtod (buf, NULL) == x)
        return;
    }
}

const char *
rugosa_flow_case_id (RugosaFlowCase flow_case)
{
  static const char *const ids[RUGOSA_N_FLOWS] = { "design", "minimum", "maximum" };

  g_return_val_if_fail (flow_case < RUGOSA_N_FLOWS, "");
  return ids[flow_case];
}

static void
set_text (char *dst, const char *text)
{
  g_strlcpy (dst, text, RG_ERROR_TEXT_MAX);
}

static void
add_point_warnings (RugosaOperatingPoint *p, RgFrictionModel model,
                    RugosaSettings *settings)
{
  const RgLineResult *r = &p->result;
  const double v_limit = rugosa_settings_get_double (settings, "velocity-limit");
  const double g_limit = rugosa_settings_get_double (settings, "gradient-limit");

  if (r->velocity_m_s > v_limit)
    rg_warnings_add (&p->warnings,
                     "The velocity %.3g m/s is above the limit of %.3g m/s.",
                     r->velocity_m_s, v_limit);
  if (r->gradient_m_per_100m > g_limit)
    rg_warnings_add (&p->warnings,
                     "The gradient %.3g m per 100 m is above the limit of %.3g m per 100 m.",
                     r->gradient_m_per_100m, g_limit);
  rg_friction_validity_warnings (model, r->reynolds, r->relative_roughness,
                                 &r->friction, &p->warnings);
}

static void
line_error (RugosaLineResults *r, const char *text)
{
  r->ok = FALSE;
  set_text (r->error, text);
}

static void
evaluate_line (RugosaProject *self, RugosaLine *line, double age,
               RugosaLineResults *r)
{
  RugosaSettings *settings = self->settings;
  RgError err = { 0 };
  RgFluidSpec spec;
  RgFluidProps props;
  RgWarnings fluid_warnings = { 0 };
  RgTransition transition;
  RgFrictionModel model;
  double diameter, roughness_new, rate;
  const char *id;
  GVariant *fittings;
  RgFittingUse *uses;
  gsize n_uses;

  memset (r, 0, sizeof *r);
  r->age_years = age;
  self->evaluation_count++;
  rg_error_clear (&err);

  rg_fluid_spec_init (&spec, (RgFluidKind) rugosa_line_get_fluid_kind (line));
  spec.temperature_k = rugosa_line_get_double (line, "temperature");
  spec.pressure_pa = rugosa_line_get_double (line, "pressure");
  spec.salinity_kg_kg = rugosa_line_get_double (line, "salinity");
  spec.density_kg_m3 = rugosa_line_get_double (line, "density");
  spec.viscosity_pa_s = rugosa_line_get_double (line, "viscosity");
  spec.oil_t1_k = rugosa_line_get_double (line, "oil-t1");
  spec.oil_nu1_m2_s = rugosa_line_get_double (line, "oil-nu1");
  spec.oil_t2_k = rugosa_line_get_double (line, "oil-t2");
  spec.oil_nu2_m2_s = rugosa_line_get_double (line, "oil-nu2");
  spec.oil_density_ref_kg_m3 = rugosa_line_get_double (line, "oil-density-ref");
  spec.oil_t_ref_k = rugosa_line_get_double (line, "oil-t-ref");
  spec.oil_expansion_per_k = rugosa_line_get_double (line, "oil-expansion");
  rg_warnings_clear (&fluid_warnings);
  if (rg_fluid_properties (&spec, &props, &fluid_warnings, &err) != RG_OK)
    return line_error (r, err.text);
  r->density_kg_m3 = props.density_kg_m3;
  r->dynamic_viscosity_pa_s = props.dynamic_viscosity_pa_s;

  if ((id = rugosa_line_get_pipe_designation (line)) != NULL)
    {
      const RgPipe *pipe;

      if (lookup_pipe (self, id, &pipe, &err) != RG_OK)
        return line_error (r, err.text);
      diameter = pipe->inner_diameter_m;
    }
  else
    diameter = rugosa_line_get_double (line, "inner-diameter");
  r->inner_diameter_m = diameter;

  if ((id = rugosa_line_get_material_id (line)) != NULL)
    {
      const RgMaterial *material;

      if (rg_material_lookup (id, &material, &err) != RG_OK)
        return line_error (r, err.text);
      roughness_new = material->roughness_m;
    }
  else
    roughness_new = rugosa_line_get_double (line, "roughness");
  r->roughness_new_m = roughness_new;

  if ((id = rugosa_line_get_aging_class_id (line)) != NULL)
    {
      const RgAgingClass *aging;

      if (rg_aging_class_lookup (id, &aging, &err) != RG_OK)
        return line_error (r, err.text);
      rate = aging->rate_m_per_year;
    }
  else
    rate = rugosa_line_get_double (line, "aging-rate");
  r->aging_rate_m_per_year = rate;
  if (rg_aging_roughness (roughness_new, rate, age, &r->roughness_m, &err) != RG_OK)
    return line_error (r, err.text);

  model = (RgFrictionModel) rugosa_settings_get_friction_model (settings);
  transition.re_laminar_max = rugosa_settings_get_double (settings, "re-laminar-max");
  transition.re_turbulent_min = rugosa_settings_get_double (settings, "re-turbulent-min");
  if (rg_transition_check (&transition, &err) != RG_OK)
    return line_error (r, err.text);

  fittings = rugosa_line_get_fittings (line);
  n_uses = g_variant_n_children (fittings);
  uses = g_new0 (RgFittingUse, MAX (n_uses, 1));
  for (gsize i = 0; i < n_uses; i++)
    {
      const char *fid;
      double k, count;

      g_variant_get_child (fittings, i, "(&sdd)", &fid, &k, &count);
      uses[i].k_plain = k;
      uses[i].count = count;
      if (*fid != '\0' && rg_fitting_lookup (fid, &uses[i].fitting, &err) != RG_OK)
        {
          g_free (uses);
          return line_error (r, err.text);
        }
    }
  r->ok = TRUE;

  for (RugosaFlowCase c = 0; c < RUGOSA_N_FLOWS; c++)
    {
      static const char *const flow_props[RUGOSA_N_FLOWS] = {
        "flow-design", "flow-minimum", "flow-maximum"
      };
      RugosaOperatingPoint *p = &r->points[c];
      RgLineInput in;
      RgAgingResult ar;
      double q = rugosa_line_get_double (line, flow_props[c]);

      /* A minimum or maximum flow of 0 means "not given"; a design flow is
       * always present and must be positive. */
      if (c != RUGOSA_FLOW_DESIGN && q <= 0.0)
        continue;
      p->present = TRUE;
      p->flow_m3_s = q;
      if (!(q > 0.0))
        {
          set_text (p->error, _("The design flow must be a positive number (m³/s)."));
          continue;
        }

      /* ΣK of 3-K fittings depends on Re, which does not depend on the
       * roughness: one ΣK serves the new and the aged line. */
      double re = props.density_kg_m3 * (4.0 * q / (G_PI * diameter * diameter))
                  * diameter / props.dynamic_viscosity_pa_s;
      if (rg_fittings_k_sum_checked (uses, (int) n_uses, re, diameter,
                                     &p->minor_loss_k_total, &p->warnings,
                                     &err) != RG_OK)
        {
          set_text (p->error, err.text);
          continue;
        }

      rg_line_input_init (&in);
      in.flow_m3_s = q;
      in.diameter_m = diameter;
      in.length_m = rugosa_line_get_double (line, "length");
      in.roughness_m = roughness_new;
      in.k_sum = p->minor_loss_k_total;
      in.elevation_m = rugosa_line_get_double (line, "elevation");
      in.density_kg_m3 = props.density_kg_m3;
      in.viscosity_pa_s = props.dynamic_viscosity_pa_s;
      in.model = model;
      in.transition = transition;
      if (rg_aging_evaluate (&in, rate, age, &ar, &err) != RG_OK)
        {
          set_text (p->error, err.text);
          continue;
        }
      p->ok = TRUE;
      p->result = ar.result;
      p->result_new = ar.result_new;
      p->head_loss_ratio_to_new = ar.head_loss_ratio_to_new;
      for (int w = 0; w < fluid_warnings.count; w++)
        rg_warnings_add (&p->warnings, "%s", fluid_warnings.text[w]);
      add_point_warnings (p, model, settings);
    }
  g_free (uses);
}

const RugosaLineResults *
rugosa_project_get_results_at (RugosaProject *self, RugosaLine *line,
                               double age_years)
{
  EvalEntry *e;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), NULL);
  g_return_val_if_fail (rugosa_project_find_line (self, line) >= 0, NULL);

  if (age_years < 0.0 || !isfinite (age_years))
    age_years = rugosa_settings_get_double (self->settings, "service-age");

  e = g_hash_table_lookup (self->eval_cache, line);
  if (e != NULL
      && e->line_revision == rugosa_line_get_revision (line)
      && e->settings_revision == rugosa_settings_get_revision (self->settings)
      && e->age_years == age_years)
    return &e->results;

  if (e == NULL)
    {
      e = g_new0 (EvalEntry, 1);
      g_hash_table_insert (self->eval_cache, line, e);
    }
  e->line_revision = rugosa_line_get_revision (line);
  e->settings_revision = rugosa_settings_get_revision (self->settings);
  e->age_years = age_years;
  evaluate_line (self, line, age_years, &e->results);
  return &e->results;
}

const RugosaLineResults *
rugosa_project_get_results (RugosaProject *self, RugosaLine *line)
{
  return rugosa_project_get_results_at (self, line, -1.0);
}

guint64
rugosa_project_get_evaluation_count (RugosaProject *self)
{
  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), 0);
  return self->evaluation_count;
}

/* ---- output ---- */

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
      else if (*p < 0x20)
        g_string_append_printf (out, "\\u%04x", *p);
      else
        g_string_append_c (out, (char) *p);
    }
  g_string_append_c (out, '"');
}

static void
append_csv_field (GString *out, const char *s)
{
  if (strpbrk (s, ",\"\r\n") == NULL)
    {
      g_string_append (out, s);
      return;
    }
  g_string_append_c (out, '"');
  for (const char *p = s; *p; p++)
    {
      if (*p == '"')
        g_string_append_c (out, '"');
      g_string_append_c (out, *p);
    }
  g_string_append_c (out, '"');
}

/* The numeric keys of the CLI `line` contract, in output order. */
typedef enum {
  K_VELOCITY, K_REYNOLDS, K_F, K_F_LAMINAR, K_REGIME, K_ZONE, K_H_MAJOR,
  K_H_MINOR, K_H_TOTAL, K_DP, K_GRADIENT, K_TAU, K_RHO, K_MU, K_ELASTICITY,
  K_D, K_EPS, K_EPS_NEW, K_RATIO, K_K_TOTAL, K_WARNINGS, N_KEYS
} Key;

static const char *const key_names[N_KEYS] = {
  "velocity_m_s", "reynolds", "friction_factor", "friction_factor_laminar",
  "regime", "roughness_zone", "head_loss_major_m", "head_loss_minor_m",
  "head_loss_total_m", "pressure_drop_Pa", "gradient_m_per_100m",
  "wall_shear_Pa", "density_kg_m3", "dynamic_viscosity_Pa_s",
  "roughness_elasticity", "inner_diameter_m", "roughness_m",
  "roughness_new_m", "head_loss_ratio_to_new", "minor_loss_k_total",
  "warnings",
};

static double
key_number (Key k, const RugosaLineResults *r, const RugosaOperatingPoint *p)
{
  const RgLineResult *x = &p->result;

  switch (k)
    {
    case K_VELOCITY: return x->velocity_m_s;
    case K_REYNOLDS: return x->reynolds;
    case K_F: return x->friction.f;
    case K_F_LAMINAR: return x->friction.f_laminar;
    case K_H_MAJOR: return x->head_loss_major_m;
    case K_H_MINOR: return x->head_loss_minor_m;
    case K_H_TOTAL: return x->head_loss_total_m;
    case K_DP: return x->pressure_drop_pa;
    case K_GRADIENT: return x->gradient_m_per_100m;
    case K_TAU: return x->wall_shear_pa;
    case K_RHO: return r->density_kg_m3;
    case K_MU: return r->dynamic_viscosity_pa_s;
    case K_ELASTICITY: return x->friction.roughness_elasticity;
    case K_D: return r->inner_diameter_m;
    case K_EPS: return r->roughness_m;
    case K_EPS_NEW: return r->roughness_new_m;
    case K_RATIO: return p->head_loss_ratio_to_new;
    case K_K_TOTAL: return p->minor_loss_k_total;
    case K_REGIME: case K_ZONE: case K_WARNINGS: case N_KEYS: default:
      return 0.0;
    }
}

static const char *
point_error (const RugosaLineResults *r, const RugosaOperatingPoint *p)
{
  return r->ok ? p->error : r->error;
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
          const RugosaOperatingPoint *p = &r->points[c];

          if (r->ok && !p->present)
            continue;
          if (!r->ok && c != RUGOSA_FLOW_DESIGN)
            continue;
          g_string_append (out, first ? "\n    {" : ",\n    {");
          first = FALSE;
          g_string_append (out, "\"line\": ");
          append_json_string (out, rugosa_line_get_name (line));
          g_string_append_printf (out, ", \"case\": \"%s\", \"flow_m3_s\": ",
                                  rugosa_flow_case_id (c));
          append_number (out, rugosa_line_get_double (line, c == 0 ? "flow-design"
                                                      : c == 1 ? "flow-minimum"
                                                      : "flow-maximum"));
          if (!r->ok || !p->ok)
            {
              g_string_append (out, ", \"error\": ");
              append_json_string (out, point_error (r, p));
              g_string_append_c (out, '}');
              continue;
            }
          for (Key k = 0; k < N_KEYS; k++)
            {
              if (k == K_F_LAMINAR && !p->result.friction.has_laminar)
                continue;
              g_string_append_printf (out, ", \"%s\": ", key_names[k]);
              if (k == K_REGIME)
                append_json_string (out, rg_regime_id (p->result.friction.regime));
              else if (k == K_ZONE)
                append_json_string (out, rg_roughness_zone_id (p->result.friction.zone));
              else if (k == K_WARNINGS)
                {
                  g_string_append_c (out, '[');
                  for (int w = 0; w < p->warnings.count; w++)
                    {
                      if (w > 0)
                        g_string_append (out, ", ");
                      append_json_string (out, p->warnings.text[w]);
                    }
                  g_string_append_c (out, ']');
                }
              else
                append_number (out, key_number (k, r, p));
            }
          g_string_append_c (out, '}');
        }
    }
  g_string_append (out, first ? "]\n}\n" : "\n  ]\n}\n");
}

static void
format_csv (RugosaProject *self, double age, GString *out)
{
  g_string_append (out, "line,case,flow_m3_s");
  for (Key k = 0; k < N_KEYS; k++)
    g_string_append_printf (out, ",%s", key_names[k]);
  g_string_append (out, ",error\r\n");

  for (guint i = 0; i < self->lines->len; i++)
    {
      RugosaLine *line = g_ptr_array_index (self->lines, i);
      const RugosaLineResults *r = rugosa_project_get_results_at (self, line, age);

      for (RugosaFlowCase c = 0; c < RUGOSA_N_FLOWS; c++)
        {
          const RugosaOperatingPoint *p = &r->points[c];
          gboolean ok = r->ok && p->ok;

          if ((r->ok && !p->present) || (!r->ok && c != RUGOSA_FLOW_DESIGN))
            continue;
          append_csv_field (out, rugosa_line_get_name (line));
          g_string_append_printf (out, ",%s,", rugosa_flow_case_id (c));
          append_number (out, p->flow_m3_s > 0.0 ? p->flow_m3_s
                         : rugosa_line_get_double (line, "flow-design"));
          for (Key k = 0; k < N_KEYS; k++)
            {
              g_string_append_c (out, ',');
              if (!ok || (k == K_F_LAMINAR && !p->result.friction.has_laminar))
                continue;
              if (k == K_REGIME)
                g_string_append (out, rg_regime_id (p->result.friction.regime));
              else if (k == K_ZONE)
                g_string_append (out, rg_roughness_zone_id (p->result.friction.zone));
              else if (k == K_WARNINGS)
                {
                  g_autoptr (GString) w = g_string_new (NULL);

                  for (int j = 0; j < p->warnings.count; j++)
                    g_string_append_printf (w, "%s%s", j ? " " : "",
                                            p->warnings.text[j]);
                  append_csv_field (out, w->str);
                }
              else
                append_number (out, key_number (k, r, p));
            }
          g_string_append_c (out, ',');
          if (!ok)
            append_csv_field (out, point_error (r, p));
          g_string_append (out, "\r\n");
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

static void
format_table (RugosaProject *self, double age, GString *out)
{
  static const struct { const char *title; Key key; int width; } cols[] = {
    { "V m/s", K_VELOCITY, 9 }, { "Re", K_REYNOLDS, 10 },
    { "f", K_F, 9 }, { "regime", K_REGIME, 13 },
    { "h_major m", K_H_MAJOR, 10 }, { "h_minor m", K_H_MINOR, 10 },
    { "h_total m", K_H_TOTAL, 10 }, { "Δp Pa", K_DP, 10 },
    { "m/100 m", K_GRADIENT, 9 }, { "×new", K_RATIO, 7 },
  };
  int name_width = 4;
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  for (guint i = 0; i < self->lines->len; i++)
    name_width = MAX (name_width,
                      (int) g_utf8_strlen (rugosa_line_get_name (g_ptr_array_index (self->lines, i)), -1));
  name_width = MIN (name_width, 40) + 2;

  g_string_append (out, "Service age ");
  g_string_append (out, g_ascii_formatd (buf, sizeof buf, "%.4g", age));
  g_string_append (out, " years; SI units.\n");
  append_cell (out, "line", name_width);
  append_cell (out, "case", 9);
  append_cell (out, "Q m³/s", 10);
  for (guint c = 0; c < G_N_ELEMENTS (cols); c++)
    append_cell (out, cols[c].title, cols[c].width);
  g_string_append (out, "warnings\n");

  for (guint i = 0; i < self->lines->len; i++)
    {
      RugosaLine *line = g_ptr_array_index (self->lines, i);
      const RugosaLineResults *r = rugosa_project_get_results_at (self, line, age);

      for (RugosaFlowCase c = 0; c < RUGOSA_N_FLOWS; c++)
        {
          const RugosaOperatingPoint *p = &r->points[c];

          if ((r->ok && !p->present) || (!r->ok && c != RUGOSA_FLOW_DESIGN))
            continue;
          append_cell (out, rugosa_line_get_name (line), name_width);
          append_cell (out, rugosa_flow_case_id (c), 9);
          append_cell (out, g_ascii_formatd (buf, sizeof buf, "%.4g",
                                             rugosa_line_get_double (line, c == 0 ? "flow-design"
                                                                     : c == 1 ? "flow-minimum"
                                                                     : "flow-maximum")), 10);
          if (!r->ok || !p->ok)
            {
              g_string_append_printf (out, "error: %s\n", point_error (r, p));
              continue;
            }
          for (guint k = 0; k < G_N_ELEMENTS (cols); k++)
            {
              if (cols[k].key == K_REGIME)
                append_cell (out, rg_regime_id (p->result.friction.regime), cols[k].width);
              else
                append_cell (out, g_ascii_formatd (buf, sizeof buf, "%.4g",
                                                   key_number (cols[k].key, r, p)),
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
  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), FALSE);
  g_return_val_if_fail (out != NULL, FALSE);

  if (age_years < 0.0)
    age_years = rugosa_settings_get_double (self->settings, "service-age");
  if (!isfinite (age_years) || age_years > 200.0)
    {
      g_set_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_VALUE,
                   _("The service age must lie between 0 and 200 years."));
      return FALSE;
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
