/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-chart-input"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <math.h>
#include <stdio.h>
#include <string.h>

#include "chart/rugosa-plot-input.h"
#include "model/rugosa-display.h"
#include "model/rugosa-life-cycle.h"
#include "model/rugosa-units.h"

/* The flow axis reaches this far past the largest flow of operation, so
 * the system curves show where they go beyond it (Common practice (no
 * single source): a third of the range again). */
#define FLOW_HEADROOM 1.3

static RugosaChartRgba
colour_of (const char *hex)
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

static const char *
keep (RugosaPlotInput *input, char *owned)
{
  g_ptr_array_add (input->owned, owned);
  return owned;
}

static RugosaPlotPoint *
new_points (RugosaPlotInput *input, size_t n)
{
  RugosaPlotPoint *pts = g_new0 (RugosaPlotPoint, MAX (n, 1));

  g_ptr_array_add (input->owned, pts);
  return pts;
}

/* A value of `dq` in the project's unit for it. */
static double
shown (RugosaSettings *ps, RugosaDisplayQuantity dq, double si)
{
  const RugosaDisplayInfo *info = rugosa_display_info (dq);
  double v = si;

  (void) rg_units_from_si (info->quantity, si, rugosa_settings_get_unit (ps, dq), &v, NULL);
  return v;
}

/* A plain number for a sentence on the chart: up to four figures, no
 * trailing zeros ("25", "4.5"), the locale's decimal separator. */
static char *
plain_screen (double x)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  return rugosa_display_localize (g_strdup (g_ascii_formatd (buf, sizeof buf, "%.4g", x)));
}

static const char *
unit_of (RugosaSettings *ps, RugosaDisplayQuantity dq)
{
  return rugosa_display_unit_label (dq, rugosa_settings_get_unit (ps, dq));
}

/* ---- system curves ------------------------------------------------------ */

static gboolean
is_shown (const RugosaChartInputView *shown, RugosaLine *line)
{
  return shown == NULL || shown->drawn == NULL || shown->drawn (line, shown->user_data);
}

static double
flow_extent (RugosaProject *project, const RugosaChartInputView *shown)
{
  double q_max = 0.0;

  for (guint i = 0; i < rugosa_project_get_n_lines (project); i++)
    {
      RugosaLine *line = rugosa_project_get_line (project, i);
      g_autoptr (GVariant) curve = NULL;
      gsize n;

      if (!is_shown (shown, line))
        continue;

      q_max = fmax (q_max, FLOW_HEADROOM * fmax (rugosa_line_get_double (line, "flow-design"),
                                                 rugosa_line_get_double (line, "flow-maximum")));
      g_object_get (line, "pump-curve", &curve, NULL);
      if ((n = g_variant_n_children (curve)) > 0)
        {
          double q, h;

          g_variant_get_child (curve, n - 1, "(dd)", &q, &h);
          q_max = fmax (q_max, q);
        }
    }
  return q_max;
}

/* A system curve of `line` at `age`, in display units; NULL when the line
 * does not evaluate along it. */
static const RugosaPlotPoint *
system_points (RugosaPlotInput *input, RugosaProject *project, RugosaLine *line,
               double age, double q_max)
{
  RugosaSettings *ps = rugosa_project_get_settings (project);
  double q[RUGOSA_PLOT_CURVE_POINTS], h[RUGOSA_PLOT_CURVE_POINTS];
  RugosaPlotPoint *pts;

  if (!rugosa_project_system_curve (project, line, age, q_max, RUGOSA_PLOT_CURVE_POINTS, q, h, NULL))
    return NULL;
  pts = new_points (input, RUGOSA_PLOT_CURVE_POINTS);
  for (guint i = 0; i < RUGOSA_PLOT_CURVE_POINTS; i++)
    {
      pts[i].x = shown (ps, RUGOSA_DISPLAY_FLOW, q[i]);
      pts[i].y = shown (ps, RUGOSA_DISPLAY_HEAD, h[i]);
    }
  return pts;
}

static void
fill_system (RugosaPlotInput *input, RugosaProject *project, RugosaLine *line,
             const RugosaLineResults *r, RugosaPlotSeries *s, double q_max)
{
  RugosaSettings *ps = rugosa_project_get_settings (project);
  const RugosaLineEnergy *en = &r->energy;
  g_autoptr (GVariant) curve = NULL;
  RugosaPumpFit fit;
  RugosaPlotPoint *op;

  if ((s->system_new = system_points (input, project, line, 0.0, q_max)) != NULL)
    s->n_system_new = RUGOSA_PLOT_CURVE_POINTS;
  if ((s->system_aged = system_points (input, project, line, r->age_years, q_max)) != NULL)
    s->n_system_aged = RUGOSA_PLOT_CURVE_POINTS;

  op = new_points (input, RUGOSA_N_FLOWS);
  for (int c = 0; c < RUGOSA_N_FLOWS; c++)
    {
      const RugosaOperatingPoint *p = &r->points[c];

      if (!p->present || !p->ok)
        continue;
      op[s->n_operating].x = shown (ps, RUGOSA_DISPLAY_FLOW, p->flow_m3_s);
      op[s->n_operating].y = shown (ps, RUGOSA_DISPLAY_HEAD,
                                    p->result.head_loss_total_m
                                    + rugosa_line_get_double (line, "elevation"));
      s->n_operating++;
    }
  s->operating = op;

  g_object_get (line, "pump-curve", &curve, NULL);
  if (rugosa_pump_fit_init (&fit, curve))
    {
      RugosaPlotPoint *pump = new_points (input, RUGOSA_PLOT_CURVE_POINTS);
      RugosaPlotPoint *given = new_points (input, fit.n);

      for (guint i = 0; i < RUGOSA_PLOT_CURVE_POINTS; i++)
        {
          const double q = fit.q[0] + (fit.q[fit.n - 1] - fit.q[0]) * i / (RUGOSA_PLOT_CURVE_POINTS - 1);

          pump[i].x = shown (ps, RUGOSA_DISPLAY_FLOW, q);
          pump[i].y = shown (ps, RUGOSA_DISPLAY_HEAD, rugosa_pump_fit_head (&fit, q));
        }
      for (guint i = 0; i < fit.n; i++)
        {
          given[i].x = shown (ps, RUGOSA_DISPLAY_FLOW, fit.q[i]);
          given[i].y = shown (ps, RUGOSA_DISPLAY_HEAD, fit.h[i]);
        }
      s->pump = pump;
      s->n_pump = RUGOSA_PLOT_CURVE_POINTS;
      s->pump_points = given;
      s->n_pump_points = fit.n;
    }

  if (en->duty_new_ok)
    {
      s->has_duty_new = 1;
      s->duty_new.x = shown (ps, RUGOSA_DISPLAY_FLOW, en->duty_new_flow_m3_s);
      s->duty_new.y = shown (ps, RUGOSA_DISPLAY_HEAD, en->duty_new_head_m);
    }
  if (en->duty_ok)
    {
      s->has_duty = 1;
      s->duty.x = shown (ps, RUGOSA_DISPLAY_FLOW, en->duty_flow_m3_s);
      s->duty.y = shown (ps, RUGOSA_DISPLAY_HEAD, en->duty_head_m);
    }
  {
    const char *u = rugosa_settings_get_unit (ps, RUGOSA_DISPLAY_FLOW);
    g_autofree char *qn = rugosa_display_format_screen (RG_QTY_FLOW, en->duty_new_flow_m3_s, u);
    g_autofree char *qa = rugosa_display_format_screen (RG_QTY_FLOW, en->duty_flow_m3_s, u);

    const double change_pct = en->duty_new_flow_m3_s > 0.0
                              ? 100.0 * (en->duty_flow_m3_s / en->duty_new_flow_m3_s - 1.0) : 0.0;

    /* a change too small to show in tenths of a per cent is no change */
    if (en->duty_ok && en->duty_new_ok && fabs (change_pct) >= 0.05)
      {
        g_autofree char *change = NULL;
        char pct[G_ASCII_DTOSTR_BUF_SIZE];

        g_ascii_formatd (pct, sizeof pct, "%.1f", fabs (change_pct));
        change = rugosa_display_localize (g_strdup_printf ("%s%s %%", change_pct < 0 ? "−" : "+", pct));
        /* TRANSLATORS: beside a duty point: the pump's flow when new, at
         * the service age, and the change in per cent ("duty 31.2 L/s →
         * 28.4 L/s (−9.0 %)") */
        s->readout = keep (input, g_strdup_printf (_("duty %s → %s (%s)"), qn, qa, change));
      }
    else if (en->duty_ok)
      /* TRANSLATORS: beside a duty point at the service age */
      s->readout = keep (input, g_strdup_printf (_("duty %s"), qa));
    else if (en->duty_new_ok)
      /* TRANSLATORS: beside a duty point when new (none at the service age) */
      s->readout = keep (input, g_strdup_printf (_("duty %s when new"), qn));
  }
  if (en->has_pump && !en->duty_ok)
    s->note = rugosa_duty_outcome_sentence (en->duty_outcome, FALSE);
  else if (en->has_pump && !en->duty_new_ok)
    s->note = rugosa_duty_outcome_sentence (en->duty_new_outcome, TRUE);
}

static void
system_spec (RugosaPlotInput *input, RugosaProject *project)
{
  RugosaSettings *ps = rugosa_project_get_settings (project);
  g_autofree char *age = plain_screen (rugosa_settings_get_double (ps, "service-age"));
  g_autofree char *aged = NULL;
  RugosaPlotSpec *spec = &input->spec;

  /* TRANSLATORS: axis titles of the system-curve view, with the unit */
  g_snprintf (spec->x_title, sizeof spec->x_title, _("Flow  Q  [%s]"), unit_of (ps, RUGOSA_DISPLAY_FLOW));
  g_snprintf (spec->y_title, sizeof spec->y_title, _("Head  H  [%s]"), unit_of (ps, RUGOSA_DISPLAY_HEAD));
  g_strlcpy (spec->caption,
             _("The head each option needs, H = Δz + (f·L/D + ΣK)·V²/2g, against flow; pump curves through their points (Steffen 1990); duty points where the curves cross."),
             sizeof spec->caption);
  g_strlcpy (spec->key_new, _("system curve when new"), sizeof spec->key_new);
  /* TRANSLATORS: the key of the aged system curves; %s is the service age in years */
  aged = g_strdup_printf (_("system curve after %s years"), age);
  g_strlcpy (spec->key_aged, aged, sizeof spec->key_aged);
  g_strlcpy (spec->key_pump, _("pump curve and its points"), sizeof spec->key_pump);
  g_strlcpy (spec->key_duty, _("duty point, new → aged"), sizeof spec->key_duty);
}

/* ---- life-cycle cost ---------------------------------------------------- */

static void
fill_cost (RugosaPlotInput *input, RugosaProject *project, RugosaLine *line,
           const RugosaLineResults *r, RugosaPlotSeries *s)
{
  RugosaSettings *ps = rugosa_project_get_settings (project);
  const RugosaLifeCycle *life = rugosa_project_get_life_cycle (project, line);
  const char *currency = rugosa_settings_get_string (ps, "currency");
  RugosaPlotPoint *pts;
  double sum;

  (void) r;
  if (life == NULL || !life->ok)
    return;
  pts = new_points (input, life->n_years + 1);
  pts[0].x = 0.0;
  pts[0].y = sum = life->capital;
  for (guint k = 0; k < life->n_years; k++)
    {
      sum += life->year_cost_pv[k];
      pts[k + 1].x = life->year_end[k];
      pts[k + 1].y = sum;
    }
  s->cost = pts;
  s->n_cost = life->n_years + 1;
  {
    g_autofree char *total = rugosa_display_money_screen (life->life_cycle_cost, currency);

    if (life->has_capital)
      s->readout = keep (input, g_steal_pointer (&total));
    else
      /* TRANSLATORS: beside the end of a cost curve of an option whose
       * capital cost is not given: its energy cost alone */
      s->readout = keep (input, g_strdup_printf (_("%s, energy only"), total));
  }
}

static void
cost_spec (RugosaPlotInput *input, RugosaProject *project)
{
  RugosaSettings *ps = rugosa_project_get_settings (project);
  const char *currency = rugosa_settings_get_string (ps, "currency");
  g_autofree char *rate = plain_screen (rugosa_settings_get_double (ps, "discount-rate"));
  g_autofree char *caption = NULL;
  RugosaPlotSpec *spec = &input->spec;

  g_strlcpy (spec->x_title, _("Years of service"), sizeof spec->x_title);
  if (*currency != '\0')
    /* TRANSLATORS: the cost axis; %s is the currency label */
    g_snprintf (spec->y_title, sizeof spec->y_title, _("Cumulative cost, present value  [%s]"), currency);
  else
    g_strlcpy (spec->y_title, _("Cumulative cost, present value"), sizeof spec->y_title);
  /* TRANSLATORS: %s is the discount rate in per cent */
  caption = g_strdup_printf (_("Capital at year 0, then each year's energy at the roughness of the middle of that year, discounted at %s %% a year; a crossing marks where an option dearer to build pays back."),
                             rate);
  g_strlcpy (spec->caption, caption, sizeof spec->caption);
  /* TRANSLATORS: beside a crossing of two cost curves; %s is the years */
  g_strlcpy (spec->payback_format, _("pays back after %s years"), sizeof spec->payback_format);
}

/* ---- both --------------------------------------------------------------- */

RugosaPlotInput *
rugosa_plot_input_new (RugosaProject *project, RugosaChartView view, int selected,
                       const RugosaChartInputView *shown)
{
  RugosaPlotInput *input = g_new0 (RugosaPlotInput, 1);
  guint n = rugosa_project_get_n_lines (project);
  const double q_max = view == RUGOSA_CHART_VIEW_SYSTEM ? flow_extent (project, shown) : 0.0;

  input->owned = g_ptr_array_new_with_free_func (g_free);
  rugosa_plot_spec_init (&input->spec);
  input->spec.view = view;
  if (view == RUGOSA_CHART_VIEW_COST)
    cost_spec (input, project);
  else
    system_spec (input, project);
  input->series = g_new0 (RugosaPlotSeries, MAX (n, 1));
  input->line_index = g_new0 (guint, MAX (n, 1));

  for (guint i = 0; i < n; i++)
    {
      RugosaLine *line = rugosa_project_get_line (project, i);
      const RugosaLineResults *r;
      RugosaPlotSeries *s = &input->series[input->n_series];

      if (!is_shown (shown, line))
        continue;
      r = rugosa_project_get_results (project, line);
      if (r == NULL || !r->ok || !r->points[RUGOSA_FLOW_DESIGN].ok)
        continue;
      s->name = keep (input, g_strdup (rugosa_line_get_name (line)));
      s->colour = colour_of (rugosa_line_get_colour (line));
      s->selected = (int) i == selected;
      if (view == RUGOSA_CHART_VIEW_COST)
        fill_cost (input, project, line, r, s);
      else
        fill_system (input, project, line, r, s, q_max);
      input->line_index[input->n_series] = i;
      input->n_series++;
    }
  /* the key names only what is drawn */
  if (view == RUGOSA_CHART_VIEW_SYSTEM)
    {
      gboolean pump = FALSE, duty = FALSE;

      for (size_t i = 0; i < input->n_series; i++)
        {
          pump |= input->series[i].n_pump > 0;
          duty |= input->series[i].has_duty || input->series[i].has_duty_new;
        }
      if (!pump)
        input->spec.key_pump[0] = '\0';
      if (!duty)
        input->spec.key_duty[0] = '\0';
    }
  return input;
}

void
rugosa_plot_input_free (RugosaPlotInput *input)
{
  if (input == NULL)
    return;
  g_free (input->series);
  g_free (input->line_index);
  g_ptr_array_unref (input->owned);
  g_free (input);
}
