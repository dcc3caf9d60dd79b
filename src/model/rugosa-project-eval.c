/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The evaluation of the line options: the one function that turns a line
 * and the project settings into results, for the window, its exports,
 * every rugosa-cli command and the report.
 *
 * Results are cached per line and per service age: an entry remembers the
 * line and settings revisions it was computed for, so a result is computed
 * again only when the line or a setting that changes results moved on, or
 * for an age not asked for lately.  A slider drag thus evaluates each line
 * once per age shown, and the chart's aging trail (other ages) does not
 * push the current age out of the cache. */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <math.h>
#include <string.h>

#include "core/aging.h"
#include "core/air.h"
#include "core/catalog.h"
#include "core/fittings.h"
#include "core/fluid.h"
#include "core/line.h"
#include "rugosa-display.h"
#include "rugosa-fields.h"
#include "rugosa-line-private.h"
#include "rugosa-project-private.h"
#include "rugosa-settings-private.h"

/* The ages remembered per line: the age shown, the age before it (a
 * slider moving back), and a few ages of the aging trail. */
#define AGES_PER_LINE 4

typedef struct {
  double age_years;
  guint64 used;             /* for least-recently-used replacement */
  RugosaLineResults results;
} AgeEntry;

typedef struct {
  guint64 line_revision;
  guint64 settings_revision;
  guint n;
  AgeEntry *ages[AGES_PER_LINE];
  /* the line's fittings resolved against the catalog, for its revision:
   * the same at every age (a slider drag evaluates the line again and
   * again) */
  gboolean fittings_known;
  RgStatus fittings_status;
  RgError fittings_err;
  RgFittingUse *uses;
  gsize n_uses;
} LineCache;

static void
line_cache_forget_fittings (LineCache *c)
{
  g_clear_pointer (&c->uses, g_free);
  c->n_uses = 0;
  c->fittings_known = FALSE;
}

static void
line_cache_free (gpointer data)
{
  LineCache *c = data;

  for (guint i = 0; i < c->n; i++)
    g_free (c->ages[i]);
  line_cache_forget_fittings (c);
  g_free (c);
}

/* The line's fittings as the core takes them, resolved once a revision. */
static RgStatus
line_fittings (LineCache *c, RugosaLine *line, const RgFittingUse **uses,
               gsize *n_uses, RgError *err)
{
  if (!c->fittings_known)
    {
      GVariant *fittings = line->fittings;
      gsize n = g_variant_n_children (fittings);

      c->uses = g_new0 (RgFittingUse, MAX (n, 1));
      c->n_uses = n;
      c->fittings_status = RG_OK;
      rg_error_clear (&c->fittings_err);
      for (gsize i = 0; i < n && c->fittings_status == RG_OK; i++)
        {
          const char *fid;
          double k, count;

          g_variant_get_child (fittings, i, "(&sdd)", &fid, &k, &count);
          c->uses[i].k_plain = k;
          c->uses[i].count = count;
          if (*fid != '\0')
            c->fittings_status = rg_fitting_lookup (fid, &c->uses[i].fitting, &c->fittings_err);
        }
      c->fittings_known = TRUE;
    }
  *uses = c->uses;
  *n_uses = c->n_uses;
  if (c->fittings_status != RG_OK && err != NULL)
    *err = c->fittings_err;
  return c->fittings_status;
}

/* The properties of the fluid states met last.  Lines of one project (and
 * the rows of a batch) share a few states — water at a handful of
 * temperatures — and the water model is a tenth of a line's evaluation;
 * a state found here is not computed again.  Sixteen states, the least
 * recently used one replaced. */
enum { FLUID_MEMO_SLOTS = 16 };

typedef struct {
  guint64 used;              /* 0: empty */
  RgFluidSpec spec;
  RgStatus status;
  RgFluidProps props;
  RgWarnings warnings;
  RgError err;
} FluidMemoEntry;

struct FluidMemo {
  guint64 clock;
  FluidMemoEntry slot[FLUID_MEMO_SLOTS];
};

/* Every member from the temperature on is a double, with no padding
 * between them: compared as bytes. */
static gboolean
spec_equal (const RgFluidSpec *a, const RgFluidSpec *b)
{
  const gsize size = sizeof *a - G_STRUCT_OFFSET (RgFluidSpec, temperature_k);

  return a->kind == b->kind && a->temperature_k == b->temperature_k
         && memcmp (&a->temperature_k, &b->temperature_k, size) == 0;
}

static RgStatus
fluid_properties (RugosaProject *self, const RgFluidSpec *spec, RgFluidProps *props,
                  RgWarnings *warnings, RgError *err)
{
  struct FluidMemo *memo;
  FluidMemoEntry *e = NULL;

  if (self->fluid_memo == NULL)
    self->fluid_memo = g_new0 (struct FluidMemo, 1);
  memo = self->fluid_memo;
  for (guint i = 0; i < FLUID_MEMO_SLOTS && e == NULL; i++)
    if (memo->slot[i].used != 0 && spec_equal (&memo->slot[i].spec, spec))
      e = &memo->slot[i];
  if (e == NULL)
    {
      e = &memo->slot[0];
      for (guint i = 1; i < FLUID_MEMO_SLOTS; i++)
        if (memo->slot[i].used < e->used)
          e = &memo->slot[i];
      e->spec = *spec;
      rg_warnings_clear (&e->warnings);
      rg_error_clear (&e->err);
      e->status = rg_fluid_properties (spec, &e->props, &e->warnings, &e->err);
    }
  e->used = ++memo->clock;
  *props = e->props;
  for (int w = 0; w < e->warnings.count; w++)
    rg_warnings_add (warnings, "%s", e->warnings.text[w]);
  if (e->status != RG_OK && err != NULL)
    *err = e->err;
  return e->status;
}

void
_rugosa_project_eval_init (RugosaProject *self)
{
  self->eval_cache = g_hash_table_new_full (NULL, NULL, NULL, line_cache_free);
  self->pipe_memo = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, NULL);
}

void
_rugosa_project_eval_finalize (RugosaProject *self)
{
  g_clear_pointer (&self->eval_cache, g_hash_table_unref);
  g_clear_pointer (&self->pipe_memo, g_hash_table_unref);
  g_clear_pointer (&self->fluid_memo, g_free);
}

/* Parsing a designation compares it with every catalog entry; remember
 * what a text resolved to (the catalog is compiled in and never changes). */
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
add_point_warnings (RugosaOperatingPoint *p, const RgFluidSpec *spec,
                    RgFrictionModel model, RugosaSettings *settings)
{
  const RgLineResult *r = &p->result;
  const double v_limit = settings->velocity_limit;
  const double g_limit = settings->gradient_limit;

  if (r->velocity_m_s > v_limit)
    {
      const char *unit = rugosa_settings_get_unit (settings, RUGOSA_DISPLAY_VELOCITY);
      g_autofree char *v = rugosa_display_format_screen (RG_QTY_VELOCITY, r->velocity_m_s, unit);
      g_autofree char *lim = rugosa_display_format_screen (RG_QTY_VELOCITY, v_limit, unit);
      g_autofree char *text = g_strdup_printf (_("The velocity %s is above the limit of %s."), v, lim);

      rg_warnings_add (&p->warnings, "%s", text);
    }
  if (r->gradient_m_per_100m > g_limit)
    {
      const char *unit = rugosa_settings_get_unit (settings, RUGOSA_DISPLAY_GRADIENT);
      g_autofree char *g = rugosa_display_format_screen (RG_QTY_GRADIENT, r->gradient_m_per_100m, unit);
      g_autofree char *lim = rugosa_display_format_screen (RG_QTY_GRADIENT, g_limit, unit);
      g_autofree char *text = g_strdup_printf (_("The pipe-friction gradient %s is above the limit of %s."), g, lim);

      rg_warnings_add (&p->warnings, "%s", text);
    }
  rg_friction_validity_warnings (model, r->reynolds, r->relative_roughness,
                                 &r->friction, &p->warnings);
  /* A gas is computed as incompressible: say when that no longer holds. */
  if (spec->kind == RG_FLUID_AIR)
    (void) rg_air_compressibility_warning (r->pressure_drop_pa, spec->pressure_pa,
                                           &p->warnings);
}

static void
line_error (RugosaLineResults *r, const RgError *err)
{
  r->ok = FALSE;
  r->error_subjects = err->subjects;
  set_text (r->error, err->text);
}

static void
evaluate_line (RugosaProject *self, RugosaLine *line, LineCache *cache,
               double age, RugosaLineResults *r)
{
  RugosaSettings *settings = self->settings;
  RgError err;
  RgFluidSpec spec;
  RgFluidProps props;
  RgWarnings fluid_warnings;
  RgTransition transition;
  RgFrictionModel model;
  double diameter, roughness_new, rate;
  const RgFittingUse *uses;
  gsize n_uses;

  memset (r, 0, sizeof *r);
  r->age_years = age;
  self->evaluation_count++;
  rg_error_clear (&err);

  rugosa_line_get_fluid_spec (line, &spec);
  rg_warnings_clear (&fluid_warnings);
  if (fluid_properties (self, &spec, &props, &fluid_warnings, &err) != RG_OK)
    return line_error (r, &err);
  r->density_kg_m3 = props.density_kg_m3;
  r->dynamic_viscosity_pa_s = props.dynamic_viscosity_pa_s;

  if (line->pipe_designation != NULL)
    {
      const RgPipe *pipe;

      if (lookup_pipe (self, line->pipe_designation, &pipe, &err) != RG_OK)
        return line_error (r, &err);
      diameter = pipe->inner_diameter_m;
    }
  else
    diameter = line->inner_diameter;
  r->inner_diameter_m = diameter;

  if (line->material_id != NULL)
    {
      const RgMaterial *material;

      if (rg_material_lookup (line->material_id, &material, &err) != RG_OK)
        return line_error (r, &err);
      roughness_new = material->roughness_m;
    }
  else
    roughness_new = line->roughness;
  r->roughness_new_m = roughness_new;

  if (line->aging_class_id != NULL)
    {
      const RgAgingClass *aging;

      if (rg_aging_class_lookup (line->aging_class_id, &aging, &err) != RG_OK)
        return line_error (r, &err);
      rate = aging->rate_m_per_year;
    }
  else
    rate = line->aging_rate;
  r->aging_rate_m_per_year = rate;
  if (rg_aging_roughness (roughness_new, rate, age, &r->roughness_m, &err) != RG_OK)
    return line_error (r, &err);

  model = (RgFrictionModel) settings->friction_model;
  transition.re_laminar_max = settings->re_laminar_max;
  transition.re_turbulent_min = settings->re_turbulent_min;
  if (rg_transition_check (&transition, &err) != RG_OK)
    return line_error (r, &err);

  if (line_fittings (cache, line, &uses, &n_uses, &err) != RG_OK)
    return line_error (r, &err);
  r->ok = TRUE;

  for (RugosaFlowCase c = 0; c < RUGOSA_N_FLOWS; c++)
    {
      const double flows[RUGOSA_N_FLOWS] = {
        line->flow_design, line->flow_minimum, line->flow_maximum
      };
      RugosaOperatingPoint *p = &r->points[c];
      RgLineInput in;
      RgAgingResult ar;
      double q = flows[c];

      /* A minimum or maximum flow of 0 means "not given"; a design flow is
       * always present and must be positive. */
      if (c != RUGOSA_FLOW_DESIGN && q <= 0.0)
        continue;
      p->present = TRUE;
      p->flow_m3_s = q;
      if (!(q > 0.0))
        {
          rugosa_field_in_range (rugosa_field_find ("flow-design"), q, NULL, &err);
          p->error_subjects = err.subjects;
          set_text (p->error, err.text);
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
          p->error_subjects = err.subjects;
          set_text (p->error, err.text);
          continue;
        }

      rg_line_input_init (&in);
      in.flow_m3_s = q;
      in.diameter_m = diameter;
      in.length_m = line->length;
      in.roughness_m = roughness_new;
      in.k_sum = p->minor_loss_k_total;
      in.elevation_m = line->elevation;
      in.density_kg_m3 = props.density_kg_m3;
      in.viscosity_pa_s = props.dynamic_viscosity_pa_s;
      in.model = model;
      in.transition = transition;
      if (rg_aging_evaluate (&in, rate, age, &ar, &err) != RG_OK)
        {
          p->error_subjects = err.subjects;
          set_text (p->error, err.text);
          continue;
        }
      p->ok = TRUE;
      p->result = ar.result;
      p->result_new = ar.result_new;
      p->head_loss_ratio_to_new = ar.head_loss_ratio_to_new;
      for (int w = 0; w < fluid_warnings.count; w++)
        rg_warnings_add (&p->warnings, "%s", fluid_warnings.text[w]);
      add_point_warnings (p, &spec, model, settings);
    }
}

const RugosaLineResults *
rugosa_project_get_results_at (RugosaProject *self, RugosaLine *line,
                               double age_years)
{
  LineCache *c;
  AgeEntry *e = NULL;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), NULL);
  g_return_val_if_fail (RUGOSA_IS_LINE (line), NULL);

  if (age_years < 0.0 || !isfinite (age_years))
    age_years = self->settings->service_age;

  c = g_hash_table_lookup (self->eval_cache, line);
  if (c == NULL)
    {
      /* A line of the project is one the project listens to: asked in
       * constant time, so that the first evaluation of N lines costs N,
       * not N² (rugosa_project_find_line walks the list). */
      g_return_val_if_fail (g_signal_handler_find (line, G_SIGNAL_MATCH_DATA, 0, 0, NULL, NULL, self) != 0,
                            NULL);
      c = g_new0 (LineCache, 1);
      g_hash_table_insert (self->eval_cache, line, c);
    }
  if (c->line_revision != line->revision
      || c->settings_revision != self->settings->revision)
    {
      for (guint i = 0; i < c->n; i++)
        g_clear_pointer (&c->ages[i], g_free);
      c->n = 0;
      line_cache_forget_fittings (c);
      c->line_revision = line->revision;
      c->settings_revision = self->settings->revision;
    }

  self->eval_clock++;
  for (guint i = 0; i < c->n; i++)
    if (c->ages[i]->age_years == age_years)
      {
        c->ages[i]->used = self->eval_clock;
        return &c->ages[i]->results;
      }
  if (c->n < AGES_PER_LINE)
    e = c->ages[c->n++] = g_new (AgeEntry, 1);
  else
    {
      e = c->ages[0];
      for (guint i = 1; i < c->n; i++)
        if (c->ages[i]->used < e->used)
          e = c->ages[i];
    }
  e->age_years = age_years;
  e->used = self->eval_clock;
  evaluate_line (self, line, c, age_years, &e->results);
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
