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
#include "core/hazen-williams.h"
#include "core/line.h"
#include "rugosa-display.h"
#include "rugosa-eval-private.h"
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
  RugosaLifeCycle *life;    /* the sums over the service life, or NULL */
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
  g_free (c->life);
  line_cache_forget_fittings (c);
  g_free (c);
}

/* A line's fittings as the core takes them, into `uses` (n entries). */
static RgStatus
resolve_fittings (RugosaLine *line, RgFittingUse **uses, gsize *n_uses,
                  RgError *err)
{
  GVariant *fittings = line->fittings;
  gsize n = g_variant_n_children (fittings);
  RgStatus st = RG_OK;

  *uses = g_new0 (RgFittingUse, MAX (n, 1));
  *n_uses = n;
  for (gsize i = 0; i < n && st == RG_OK; i++)
    {
      const char *fid;
      double k, count;

      g_variant_get_child (fittings, i, "(&sdd)", &fid, &k, &count);
      (*uses)[i].k_plain = k;
      (*uses)[i].count = count;
      if (*fid != '\0')
        st = rg_fitting_lookup (fid, &(*uses)[i].fitting, err);
    }
  return st;
}

/* The properties of the fluid states met last.  Lines of one project (and
 * the rows of a batch) share a few states — water at a handful of
 * temperatures — and the water model is a tenth of a line's evaluation;
 * a state found here is not computed again while the settings (whose
 * units its sentences are written in) are unchanged.  Sixteen states, the
 * least recently used one replaced. */
enum { FLUID_MEMO_SLOTS = 16 };

typedef struct {
  guint64 used;              /* 0: empty */
  guint64 settings_revision;
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
  const guint64 revision = self->settings->revision;

  if (self->fluid_memo == NULL)
    self->fluid_memo = g_new0 (struct FluidMemo, 1);
  memo = self->fluid_memo;
  for (guint i = 0; i < FLUID_MEMO_SLOTS && e == NULL; i++)
    if (memo->slot[i].used != 0 && memo->slot[i].settings_revision == revision
        && spec_equal (&memo->slot[i].spec, spec))
      e = &memo->slot[i];
  if (e == NULL)
    {
      e = &memo->slot[0];
      for (guint i = 1; i < FLUID_MEMO_SLOTS; i++)
        if (memo->slot[i].used < e->used)
          e = &memo->slot[i];
      e->spec = *spec;
      e->settings_revision = revision;
      memset (&e->warnings, 0, sizeof e->warnings);
      memset (&e->err, 0, sizeof e->err);
      e->warnings.units = e->err.units = rugosa_settings_get_unit_choice (self->settings);
      e->status = rg_fluid_properties (spec, &e->props, &e->warnings, &e->err);
    }
  e->used = ++memo->clock;
  *props = e->props;
  for (int w = 0; w < e->warnings.count; w++)
    rg_warnings_add (warnings, "%s", e->warnings.text[w]);
  if (e->status != RG_OK && err != NULL)
    {
      const struct RgUnitChoice *units = err->units;

      *err = e->err;
      err->units = units;
    }
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
_rugosa_project_remember_pipe (RugosaProject *self, const RgPipe *pipe)
{
  /* a catalog designation finds its own row (tests/test-catalog.c) */
  if (!g_hash_table_contains (self->pipe_memo, pipe->designation))
    g_hash_table_insert (self->pipe_memo, g_strdup (pipe->designation), (gpointer) pipe);
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

/* The lowest velocity is a criterion of the design flow (the lowest flow
 * of a main is expected to fall below it: rugosa-fields.c). */
static void
add_minimum_velocity_warning (RugosaOperatingPoint *p, RugosaSettings *settings)
{
  const double v_min = settings->velocity_minimum;

  if (v_min > 0.0 && p->result.velocity_m_s < v_min)
    {
      const char *unit = rugosa_settings_get_unit (settings, RUGOSA_DISPLAY_VELOCITY);
      g_autofree char *v = rugosa_display_format_screen (RG_QTY_VELOCITY, p->result.velocity_m_s, unit);
      g_autofree char *lim = rugosa_display_format_screen (RG_QTY_VELOCITY, v_min, unit);
      g_autofree char *text = g_strdup_printf (_("The velocity %s is below the lowest velocity of %s."), v, lim);

      rg_warnings_add (&p->warnings, "%s", text);
    }
}

/* The Hazen–Williams C of a water line's design point, at the age shown. */
static void
add_hazen_williams (RugosaOperatingPoint *p, const RgFluidSpec *spec,
                    double diameter, double length)
{
  const RgLineResult *r = &p->result;
  double c;

  if (spec->kind != RG_FLUID_WATER && spec->kind != RG_FLUID_SEAWATER)
    return;
  if (rg_hazen_williams_c (r->velocity_m_s, diameter, r->head_loss_major_m, length,
                           &c, NULL) != RG_OK)
    return;
  p->has_hazen_williams = TRUE;
  p->hazen_williams_c = c;
  p->hazen_williams_notes = rg_hazen_williams_notes (spec->kind == RG_FLUID_WATER,
                                                     r->friction.regime,
                                                     r->velocity_m_s, diameter);
}

static void
line_error (RugosaLineResults *r, const RgError *err)
{
  r->ok = FALSE;
  r->error_subjects = err->subjects;
  set_text (r->error, err->text);
}

/* A point's error, its subjects naming what the user can change: a
 * density or viscosity the line computation took as numbers stands for
 * the fluid's state behind it. */
static void
point_error (RugosaOperatingPoint *p, RgFluidKind kind, const RgError *err)
{
  p->error_subjects = rg_fluid_subjects_behind (kind, err->subjects);
  set_text (p->error, err->text);
}

gboolean
_rugosa_line_setup_init (RugosaProject *self, RugosaLine *line,
                         RugosaLineSetup *setup, RgError *err)
{
  RugosaSettings *settings = self->settings;
  LineCache *c;

  memset (setup, 0, sizeof *setup);
  rugosa_line_get_fluid_spec (line, &setup->spec);
  rg_warnings_clear (&setup->fluid_warnings);
  /* the core's sentences show values in the project's units */
  setup->fluid_warnings.units = rugosa_settings_get_unit_choice (settings);
  if (fluid_properties (self, &setup->spec, &setup->props, &setup->fluid_warnings, err) != RG_OK)
    return FALSE;

  if (line->pipe_designation != NULL)
    {
      const RgPipe *pipe;

      if (lookup_pipe (self, line->pipe_designation, &pipe, err) != RG_OK)
        return FALSE;
      setup->diameter_m = pipe->inner_diameter_m;
    }
  else
    setup->diameter_m = line->inner_diameter;

  if (line->material_id != NULL)
    {
      const RgMaterial *material;

      if (rg_material_lookup (line->material_id, &material, err) != RG_OK)
        return FALSE;
      setup->roughness_new_m = material->roughness_m;
    }
  else
    setup->roughness_new_m = line->roughness;

  if (line->aging_class_id != NULL)
    {
      const RgAgingClass *aging;

      if (rg_aging_class_lookup (line->aging_class_id, &aging, err) != RG_OK)
        return FALSE;
      setup->rate_m_per_year = aging->rate_m_per_year;
    }
  else
    setup->rate_m_per_year = line->aging_rate;

  setup->length_m = line->length;
  setup->elevation_m = line->elevation;
  setup->model = (RgFrictionModel) settings->friction_model;
  setup->transition.re_laminar_max = settings->re_laminar_max;
  setup->transition.re_turbulent_min = settings->re_turbulent_min;
  if (rg_transition_check (&setup->transition, err) != RG_OK)
    return FALSE;

  /* The fittings of a line of the project are resolved once a revision,
   * in its cache (borrowed here); another line's, here. */
  c = g_hash_table_lookup (self->eval_cache, line);
  if (c != NULL && c->line_revision == line->revision
      && c->settings_revision == settings->revision)
    {
      if (!c->fittings_known)
        {
          rg_error_clear (&c->fittings_err);
          c->fittings_err.units = err != NULL ? err->units : NULL;
          c->fittings_status = resolve_fittings (line, &c->uses, &c->n_uses, &c->fittings_err);
          c->fittings_known = TRUE;
        }
      setup->uses = c->uses;
      setup->n_uses = c->n_uses;
      setup->uses_borrowed = TRUE;
      if (c->fittings_status != RG_OK)
        {
          if (err != NULL)
            *err = c->fittings_err;
          return FALSE;
        }
      return TRUE;
    }
  if (resolve_fittings (line, &setup->uses, &setup->n_uses, err) != RG_OK)
    {
      _rugosa_line_setup_clear (setup);
      return FALSE;
    }
  return TRUE;
}

void
_rugosa_line_setup_clear (RugosaLineSetup *setup)
{
  if (!setup->uses_borrowed)
    g_free (setup->uses);
  setup->uses = NULL;
  setup->n_uses = 0;
}

RgStatus
_rugosa_line_setup_input (const RugosaLineSetup *setup, double q,
                          RgLineInput *in, RgWarnings *warnings, RgError *err)
{
  const double d = setup->diameter_m;
  /* ΣK of 3-K fittings depends on Re, which does not depend on the
   * roughness: one ΣK serves the new and the aged line. */
  const double re = setup->props.density_kg_m3 * (4.0 * q / (G_PI * d * d)) * d
                    / setup->props.dynamic_viscosity_pa_s;
  double k_sum = 0.0;
  RgWarnings scratch = { 0 };
  RgStatus st;

  if (warnings == NULL)
    {
      rg_warnings_clear (&scratch);
      warnings = &scratch;
    }
  if ((st = rg_fittings_k_sum_checked (setup->uses, (int) setup->n_uses, re, d,
                                       &k_sum, warnings, err)) != RG_OK)
    return st;
  rg_line_input_init (in);
  in->flow_m3_s = q;
  in->diameter_m = d;
  in->length_m = setup->length_m;
  in->roughness_m = setup->roughness_new_m;
  in->k_sum = k_sum;
  in->elevation_m = setup->elevation_m;
  in->density_kg_m3 = setup->props.density_kg_m3;
  in->viscosity_pa_s = setup->props.dynamic_viscosity_pa_s;
  in->model = setup->model;
  in->transition = setup->transition;
  return RG_OK;
}

RgStatus
_rugosa_line_setup_at (const RugosaLineSetup *setup, double q, double age_years,
                       RgAgingResult *out, RgError *err)
{
  RgLineInput in;
  RgStatus st;

  if ((st = _rugosa_line_setup_input (setup, q, &in, NULL, err)) != RG_OK)
    return st;
  return rg_aging_evaluate (&in, setup->rate_m_per_year, age_years, out, err);
}

static void
evaluate_line (RugosaProject *self, RugosaLine *line, double age,
               gboolean in_project, RugosaLineResults *r)
{
  RugosaSettings *settings = self->settings;
  RgError err = { 0 };
  RugosaLineSetup setup;

  const RgUnitChoice *units = rugosa_settings_get_unit_choice (settings);

  memset (r, 0, sizeof *r);
  r->age_years = age;
  self->evaluation_count++;
  /* The core's sentences show values in the project's units. */
  rg_error_clear (&err);
  err.units = units;
  for (RugosaFlowCase c = 0; c < RUGOSA_N_FLOWS; c++)
    r->points[c].warnings.units = units;

  if (!_rugosa_line_setup_init (self, line, &setup, &err))
    return line_error (r, &err);
  r->density_kg_m3 = setup.props.density_kg_m3;
  r->dynamic_viscosity_pa_s = setup.props.dynamic_viscosity_pa_s;
  r->inner_diameter_m = setup.diameter_m;
  r->roughness_new_m = setup.roughness_new_m;
  r->aging_rate_m_per_year = setup.rate_m_per_year;
  if (rg_aging_roughness (setup.roughness_new_m, setup.rate_m_per_year, age,
                          &r->roughness_m, &err) != RG_OK)
    {
      _rugosa_line_setup_clear (&setup);
      return line_error (r, &err);
    }
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

      if (_rugosa_line_setup_input (&setup, q, &in, &p->warnings, &err) != RG_OK)
        {
          point_error (p, setup.spec.kind, &err);
          continue;
        }
      p->minor_loss_k_total = in.k_sum;
      if (rg_aging_evaluate (&in, setup.rate_m_per_year, age, &ar, &err) != RG_OK)
        {
          point_error (p, setup.spec.kind, &err);
          continue;
        }
      p->ok = TRUE;
      p->result = ar.result;
      p->result_new = ar.result_new;
      p->head_loss_ratio_to_new = ar.head_loss_ratio_to_new;
      for (int w = 0; w < setup.fluid_warnings.count; w++)
        rg_warnings_add (&p->warnings, "%s", setup.fluid_warnings.text[w]);
      add_point_warnings (p, &setup.spec, setup.model, settings);
      if (c == RUGOSA_FLOW_DESIGN)
        {
          add_minimum_velocity_warning (p, settings);
          add_hazen_williams (p, &setup.spec, setup.diameter_m, line->length);
        }
    }
  /* The energy over the years is the line's own: a line evaluated outside
   * the project (a sizing's candidate) has none. */
  if (in_project)
    _rugosa_life_cycle_fill (self, line, &setup, r);
  _rugosa_line_setup_clear (&setup);
}

/* The cache of `line`, emptied when the line or a setting changed since
 * it was filled; NULL when the line is not part of the project. */
static LineCache *
line_cache (RugosaProject *self, RugosaLine *line)
{
  LineCache *c = g_hash_table_lookup (self->eval_cache, line);

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
      g_clear_pointer (&c->life, g_free);
      line_cache_forget_fittings (c);
      c->line_revision = line->revision;
      c->settings_revision = self->settings->revision;
    }
  return c;
}

const RugosaLifeCycle *
rugosa_project_get_life_cycle (RugosaProject *self, RugosaLine *line)
{
  LineCache *c;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), NULL);
  g_return_val_if_fail (RUGOSA_IS_LINE (line), NULL);
  if ((c = line_cache (self, line)) == NULL)
    return NULL;
  if (c->life == NULL)
    {
      c->life = g_new0 (RugosaLifeCycle, 1);
      _rugosa_life_cycle_compute (self, line, c->life);
    }
  return c->life;
}

void
rugosa_project_evaluate_line (RugosaProject *self, RugosaLine *line,
                              double age_years, RugosaLineResults *out)
{
  g_return_if_fail (RUGOSA_IS_PROJECT (self));
  g_return_if_fail (RUGOSA_IS_LINE (line));
  g_return_if_fail (out != NULL);

  if (age_years < 0.0 || !isfinite (age_years))
    age_years = self->settings->service_age;
  evaluate_line (self, line, age_years, FALSE, out);
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

  if ((c = line_cache (self, line)) == NULL)
    return NULL;

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
  evaluate_line (self, line, age_years, TRUE, &e->results);
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
