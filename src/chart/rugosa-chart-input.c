/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-chart-input"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <math.h>
#include <stdio.h>
#include <string.h>

#include "chart/rugosa-chart-input.h"
#include "model/rugosa-display.h"
#include "model/rugosa-enums.h"
#include "model/rugosa-fields.h"

/* "25 years", as the window's service-age slider says it. */
static char *
_rugosa_chart_input_years (double age)
{
  g_autofree char *years = rugosa_display_significant_screen (age, 3);

  return g_strdup_printf (ngettext ("%s year", "%s years", age == 1.0 ? 1 : 2), years);
}

void
rugosa_chart_input_fill_spec (RugosaChartSpec *spec,
                              RugosaProject   *project)
{
  RugosaSettings *ps = rugosa_project_get_settings (project);

  spec->re_min = rugosa_settings_get_double (ps, "chart-re-min");
  spec->re_max = rugosa_settings_get_double (ps, "chart-re-max");
  spec->f_min = rugosa_settings_get_double (ps, "chart-f-min");
  spec->f_max = rugosa_settings_get_double (ps, "chart-f-max");
  spec->transition.re_laminar_max = rugosa_settings_get_double (ps, "re-laminar-max");
  spec->transition.re_turbulent_min = rugosa_settings_get_double (ps, "re-turbulent-min");
  /* the legend's aging key names the age shown (no background change) */
  spec->age_text[0] = '\0';
  if (rugosa_settings_get_double (ps, "service-age") > 0.0)
    {
      g_autofree char *years = _rugosa_chart_input_years (rugosa_settings_get_double (ps, "service-age"));
      g_strlcpy (spec->age_text, years, sizeof spec->age_text);
    }
}

static RugosaChartRgba
_rugosa_chart_input_colour (const char *hex)
{
  RugosaChartRgba c = { 0.2, 0.4, 0.7, 1.0 };
  unsigned r, g, b;

  if (hex != NULL && sscanf (hex, "#%02x%02x%02x", &r, &g, &b) == 3)
    {
      c.r = r / 255.0;
      c.g = g / 255.0;
      c.b = b / 255.0;
    }
  return c;
}

struct RugosaTrailCache
{
  GHashTable *entries;   /* RugosaLine (ref held) -> TrailEntry */
};

typedef struct {
  RugosaLine *line;
  guint64     revision;
  int         model;
  double      re_laminar_max, re_turbulent_min;
  GArray     *points;    /* RugosaChartPoint at 0, 1, 2 … years */
  gboolean    broken;    /* an age that would not evaluate was met */
} TrailEntry;

static void
_trail_entry_free (gpointer data)
{
  TrailEntry *e = data;

  g_object_unref (e->line);
  g_array_unref (e->points);
  g_free (e);
}

RugosaTrailCache *
rugosa_trail_cache_new (void)
{
  RugosaTrailCache *cache = g_new0 (RugosaTrailCache, 1);

  cache->entries = g_hash_table_new_full (NULL, NULL, NULL, _trail_entry_free);
  return cache;
}

void
rugosa_trail_cache_free (RugosaTrailCache *cache)
{
  if (cache == NULL)
    return;
  g_hash_table_unref (cache->entries);
  g_free (cache);
}

static gboolean
_trail_point_at (RugosaProject    *project,
                 RugosaLine       *line,
                 double            age,
                 RugosaChartPoint *out)
{
  const RugosaLineResults *ra = rugosa_project_get_results_at (project, line, age);
  const RugosaOperatingPoint *pa;

  if (ra == NULL || !ra->ok)
    return FALSE;
  pa = &ra->points[RUGOSA_FLOW_DESIGN];
  if (!pa->present || !pa->ok)
    return FALSE;
  out->re = pa->result.reynolds;
  out->f = pa->result.friction.f;
  return TRUE;
}

/* The cached yearly samples of `line` up to `age`, computed as needed. */
static TrailEntry *
_trail_cache_get (RugosaTrailCache *cache,
                  RugosaProject    *project,
                  RugosaLine       *line,
                  double            age)
{
  RugosaSettings *ps = rugosa_project_get_settings (project);
  TrailEntry *e = g_hash_table_lookup (cache->entries, line);
  int model = rugosa_settings_get_friction_model (ps);
  double lam = rugosa_settings_get_double (ps, "re-laminar-max");
  double turb = rugosa_settings_get_double (ps, "re-turbulent-min");
  guint need = (guint) floor (age) + 1;

  if (e != NULL && (e->revision != rugosa_line_get_revision (line) || e->model != model
                    || e->re_laminar_max != lam || e->re_turbulent_min != turb))
    {
      g_hash_table_remove (cache->entries, line);
      e = NULL;
    }
  if (e == NULL)
    {
      e = g_new0 (TrailEntry, 1);
      e->line = g_object_ref (line);
      e->revision = rugosa_line_get_revision (line);
      e->model = model;
      e->re_laminar_max = lam;
      e->re_turbulent_min = turb;
      e->points = g_array_new (FALSE, FALSE, sizeof (RugosaChartPoint));
      g_hash_table_insert (cache->entries, line, e);
    }
  while (!e->broken && e->points->len < need)
    {
      RugosaChartPoint p;

      if (_trail_point_at (project, line, (double) e->points->len, &p))
        g_array_append_val (e->points, p);
      else
        e->broken = TRUE;
    }
  return e;
}

/* Forget lines that left the project (deleted, or a file was loaded);
 * linear in the lines, as a refresh must be. */
static void
_trail_cache_prune (RugosaTrailCache *cache,
                    RugosaProject    *project)
{
  GHashTableIter iter;
  gpointer key;
  g_autoptr (GHashTable) present = NULL;
  guint n = rugosa_project_get_n_lines (project);

  if (g_hash_table_size (cache->entries) == 0)
    return;
  present = g_hash_table_new (NULL, NULL);
  for (guint i = 0; i < n; i++)
    g_hash_table_add (present, rugosa_project_get_line (project, i));
  g_hash_table_iter_init (&iter, cache->entries);
  while (g_hash_table_iter_next (&iter, &key, NULL))
    if (!g_hash_table_contains (present, key))
      g_hash_table_iter_remove (&iter);
}

static const char *
_rugosa_chart_input_keep (RugosaChartInput *input,
                          char             *owned)
{
  g_ptr_array_add (input->owned, owned);
  return owned;
}

RugosaChartInput *
rugosa_chart_input_new (RugosaProject    *project,
                        int               selected,
                        RugosaTrailCache *cache)
{
  return rugosa_chart_input_new_view (project, selected, cache, NULL);
}

RugosaChartInput *
rugosa_chart_input_new_view (RugosaProject              *project,
                             int                         selected,
                             RugosaTrailCache           *cache,
                             const RugosaChartInputView *view)
{
  RugosaChartInput *input = g_new0 (RugosaChartInput, 1);
  RugosaSettings *ps = rugosa_project_get_settings (project);
  guint n = rugosa_project_get_n_lines (project);
  double age = rugosa_settings_get_double (ps, "service-age");
  /* Readouts in the project's display units, as the table shows them. */
  const char *u_vel = rugosa_settings_get_unit (ps, RUGOSA_DISPLAY_VELOCITY);
  const char *u_grad = rugosa_settings_get_unit (ps, RUGOSA_DISPLAY_GRADIENT);
  const char *u_head = rugosa_settings_get_unit (ps, RUGOSA_DISPLAY_HEAD);
  guint readouts_left = RUGOSA_CHART_LABEL_TRIES;

  input->owned = g_ptr_array_new_with_free_func (g_free);
  if (cache != NULL)
    _trail_cache_prune (cache, project);
  rugosa_chart_spec_init (&input->spec);
  rugosa_chart_input_fill_spec (&input->spec, project);
  input->lines = g_new0 (RugosaChartLine, MAX (n, 1));
  input->line_index = g_new0 (guint, MAX (n, 1));

  for (guint i = 0; i < n; i++)
    {
      RugosaLine *line = rugosa_project_get_line (project, i);
      const RugosaLineResults *res;
      const RugosaOperatingPoint *design, *pmin, *pmax;
      RugosaChartLine *cl;
      RugosaChartPoint *trail;
      double d, rr_new, rr_aged;

      if (view != NULL && view->drawn != NULL && !view->drawn (line, view->user_data))
        continue;
      res = rugosa_project_get_results (project, line);
      if (res == NULL || !res->ok)
        continue;
      design = &res->points[RUGOSA_FLOW_DESIGN];
      if (!design->present || !design->ok)
        continue;
      d = res->inner_diameter_m;
      rr_new = d > 0 ? res->roughness_new_m / d : 0.0;
      rr_aged = d > 0 ? res->roughness_m / d : 0.0;

      cl = &input->lines[input->n_lines];
      input->line_index[input->n_lines] = i;
      input->n_lines++;

      cl->name = _rugosa_chart_input_keep (input, g_strdup (rugosa_line_get_name (line)));
      cl->colour = _rugosa_chart_input_colour (rugosa_line_get_colour (line));
      cl->rr_new = rr_new;
      cl->rr_aged = rr_aged;
      cl->regime = design->result.friction.regime;
      cl->re = design->result.reynolds;
      cl->f = design->result.friction.f;
      if (design->result.friction.has_laminar)
        {
          cl->f_laminar = design->result.friction.f_laminar;
          /* In the transitional range the design value is the turbulent one. */
          cl->f_turbulent = design->result.friction.f;
        }
      pmin = &res->points[RUGOSA_FLOW_MINIMUM];
      pmax = &res->points[RUGOSA_FLOW_MAXIMUM];
      if (pmin->present && pmin->ok)
        {
          cl->has_flow_min = 1;
          cl->flow_min.re = pmin->result.reynolds;
          cl->flow_min.f = pmin->result.friction.f;
        }
      if (pmax->present && pmax->ok)
        {
          cl->has_flow_max = 1;
          cl->flow_max.re = pmax->result.reynolds;
          cl->flow_max.f = pmax->result.friction.f;
        }

      /* The aging trail: the design point from new to the service age. */
      cl->n_trail = 0;
      if (age > 0.0 && cache != NULL)
        {
          TrailEntry *e = _trail_cache_get (cache, project, line, age);
          guint whole = MIN (e->points->len, (guint) floor (age) + 1);

          trail = g_new0 (RugosaChartPoint, whole + 1);
          memcpy (trail, e->points->data, whole * sizeof *trail);
          cl->n_trail = whole;
          /* The last point is the marker itself, at the exact age. */
          trail[cl->n_trail].re = design->result.reynolds;
          trail[cl->n_trail].f = design->result.friction.f;
          cl->n_trail++;
          /* get_results_at may reuse its buffer: read the selected age again. */
          res = rugosa_project_get_results (project, line);
          design = &res->points[RUGOSA_FLOW_DESIGN];
        }
      else if (age > 0.0)
        {
          trail = g_new0 (RugosaChartPoint, RUGOSA_CHART_TRAIL_POINTS);
          for (guint k = 0; k < RUGOSA_CHART_TRAIL_POINTS; k++)
            if (_trail_point_at (project, line, age * k / (RUGOSA_CHART_TRAIL_POINTS - 1), &trail[cl->n_trail]))
              cl->n_trail++;
            else
              break;
          res = rugosa_project_get_results (project, line);
          design = &res->points[RUGOSA_FLOW_DESIGN];
        }
      else
        trail = g_new0 (RugosaChartPoint, 1);
      g_ptr_array_add (input->owned, trail);
      cl->trail = trail;

      cl->selected = ((int) i == selected);
      cl->pinned = view != NULL && view->pinned != NULL && view->pinned (line, view->user_data);
      /* the number beside an unlabelled marker: its place in the list */
      cl->number = (int) i + 1;
      /* Readouts only where a label may go: the chart labels the selected
       * and pinned lines and tries the others in list order, never more
       * than RUGOSA_CHART_LABEL_TRIES of them; formatting three numbers
       * for each of a thousand lines was a third of a slider step. */
      if (!cl->selected && !cl->pinned && readouts_left == 0)
        continue;
      if (!cl->selected && !cl->pinned)
        readouts_left--;
      {
        g_autofree char *v = rugosa_display_format_screen (RG_QTY_VELOCITY, design->result.velocity_m_s, u_vel);
        /* TRANSLATORS: mean velocity readout on the chart, e.g. "V 1.42 m/s"; the
         * number follows the locale (the screen variant of rugosa-display) */
        cl->readout_velocity = _rugosa_chart_input_keep (input, g_strdup_printf (_("V %s"), v));
      }
      {
        /* A gradient is a ratio: converted as one, whatever the head unit. */
        g_autofree char *g = rugosa_display_format_screen (RG_QTY_GRADIENT, design->result.gradient_m_per_100m, u_grad);
        cl->readout_head_per_100m =
          /* TRANSLATORS: pipe-friction gradient readout, e.g. "loss 3.4 m/100 m" */
          _rugosa_chart_input_keep (input, g_strdup_printf (_("loss %s"), g));
      }
      {
        g_autofree char *h = rugosa_display_format_screen (RG_QTY_LENGTH, design->result.head_loss_total_m, u_head);
        /* TRANSLATORS: total head loss of the line (pipe and fittings) */
        cl->readout_head_total = _rugosa_chart_input_keep (input, g_strdup_printf (_("total %s"), h));
      }
    }
  return input;
}

void
rugosa_chart_input_free (RugosaChartInput *input)
{
  if (input == NULL)
    return;
  g_free (input->lines);
  g_free (input->line_index);
  g_ptr_array_unref (input->owned);
  g_free (input);
}

/* "Label: value", the pairs of the conditions line. */
static void
_rugosa_chart_input_pair (GString    *out,
                          const char *property,
                          const char *value)
{
  if (out->len > 0)
    g_string_append (out, "  ·  ");
  /* TRANSLATORS: one condition of an exported chart, a field's label and
   * its value, e.g. "Friction model: Colebrook (1939)" */
  g_string_append_printf (out, _("%s: %s"), rugosa_field_label (rugosa_field_find (property)), value);
}

char *
rugosa_chart_input_conditions (RugosaChartInput *input,
                               RugosaProject    *project)
{
  RugosaSettings *ps = rugosa_project_get_settings (project);
  const char *u_temp = rugosa_settings_get_unit (ps, RUGOSA_DISPLAY_TEMPERATURE);
  g_autoptr (GString) out = g_string_new (NULL);
  g_autoptr (GString) fluids = g_string_new (NULL);
  g_autofree char *years = _rugosa_chart_input_years (rugosa_settings_get_double (ps, "service-age"));
  const int model = rugosa_settings_get_friction_model (ps);

  _rugosa_chart_input_pair (out, "service-age", years);
  /* each kind of fluid of the lines drawn once, in list order, with the
   * range of its temperatures: linear in the lines */
  double t_min[RG_FLUID_N_KINDS], t_max[RG_FLUID_N_KINDS];
  int order[RG_FLUID_N_KINDS], n_kinds = 0;
  for (int k = 0; k < RG_FLUID_N_KINDS; k++)
    t_min[k] = t_max[k] = -1.0;
  for (size_t i = 0; i < input->n_lines; i++)
    {
      RugosaLine *line = rugosa_project_get_line (project, input->line_index[i]);
      RgFluidSpec fs;

      rugosa_line_get_fluid_spec (line, &fs);
      if ((int) fs.kind < 0 || fs.kind >= RG_FLUID_N_KINDS)
        continue;
      if (t_min[fs.kind] < 0.0)
        {
          order[n_kinds++] = (int) fs.kind;
          t_min[fs.kind] = t_max[fs.kind] = fs.temperature_k;
        }
      t_min[fs.kind] = MIN (t_min[fs.kind], fs.temperature_k);
      t_max[fs.kind] = MAX (t_max[fs.kind], fs.temperature_k);
    }
  for (int o = 0; o < n_kinds; o++)
    {
      const int kind = order[o];
      g_autofree char *lo = rugosa_display_format_screen (RG_QTY_TEMPERATURE, t_min[kind], u_temp);
      g_autofree char *hi = rugosa_display_format_screen (RG_QTY_TEMPERATURE, t_max[kind], u_temp);
      g_autofree char *one = NULL;

      if (kind == RG_FLUID_CUSTOM)
        /* a fluid given by its properties has no temperature to name */
        one = g_strdup (rugosa_enum_title (RUGOSA_TYPE_FLUID_KIND, kind));
      else if (g_str_equal (lo, hi))
        /* TRANSLATORS: a fluid of an exported chart's conditions: its
         * property model and temperature, e.g. "Water (IAPWS-IF97) at 15 °C" */
        one = g_strdup_printf (_("%s at %s"), rugosa_enum_title (RUGOSA_TYPE_FLUID_KIND, kind), lo);
      else
        /* TRANSLATORS: the same for lines at several temperatures, e.g.
         * "Water (IAPWS-IF97) at 5 °C to 60 °C" */
        one = g_strdup_printf (_("%s at %s to %s"), rugosa_enum_title (RUGOSA_TYPE_FLUID_KIND, kind), lo, hi);
      if (fluids->len > 0)
        g_string_append (fluids, "; ");
      g_string_append (fluids, one);
    }
  if (fluids->len > 0)
    _rugosa_chart_input_pair (out, "fluid-kind", fluids->str);
  _rugosa_chart_input_pair (out, "friction-model", rg_friction_model_title ((RgFrictionModel) model));
  return g_strdup (out->str);
}

void
rugosa_chart_input_set_heading (RugosaChartInput *input,
                                RugosaProject    *project,
                                const char       *title)
{
  g_autofree char *conditions = NULL;

  input->spec.title[0] = '\0';
  input->spec.conditions[0] = '\0';
  if (title == NULL || *title == '\0')
    return;
  /* cut on a character, never inside one */
  g_utf8_strncpy (input->spec.title, title,
                  MIN ((gsize) g_utf8_strlen (title, -1), (sizeof input->spec.title - 4) / 4));
  conditions = rugosa_chart_input_conditions (input, project);
  if (strlen (conditions) < sizeof input->spec.conditions)
    g_strlcpy (input->spec.conditions, conditions, sizeof input->spec.conditions);
  else
    g_utf8_strncpy (input->spec.conditions, conditions, (sizeof input->spec.conditions - 4) / 4);
}
