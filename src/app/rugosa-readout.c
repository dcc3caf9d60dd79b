/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-readout"

#include "config.h"

#include <glib/gi18n.h>
#include <math.h>

#include "core/hazen-williams.h"
#include "model/rugosa-display.h"
#include "model/rugosa-enums.h"
#include "model/rugosa-life-cycle.h"
#include "model/rugosa-units.h"
#include "rugosa-readout.h"

const RugosaLineResults *
rugosa_readout_results (RugosaProject *project,
                        RugosaLine    *line)
{
  if (project == NULL || line == NULL || rugosa_project_find_line (project, line) < 0)
    return NULL;
  return rugosa_project_get_results (project, line);
}

const char *
rugosa_readout_regime (RgRegime regime)
{
  return rugosa_regime_title (regime);
}

const char *
rugosa_readout_zone (RgRoughnessZone zone)
{
  return rugosa_zone_title (zone);
}

char *
rugosa_readout_change (double ratio_to_new)
{
  char buf[G_ASCII_DTOSTR_BUF_SIZE];

  if (!isfinite (ratio_to_new) || ratio_to_new <= 0.0)
    return g_strdup ("—");
  g_ascii_formatd (buf, sizeof buf, "%+.1f", (ratio_to_new - 1.0) * 100.0);
  return rugosa_display_localize (g_strdup_printf ("%s %%", buf));
}

char *
rugosa_readout_format (RugosaProject        *project,
                       RugosaDisplayQuantity dq,
                       double                si)
{
  const RugosaDisplayInfo *info = rugosa_display_info (dq);
  RugosaSettings *ps = project ? rugosa_project_get_settings (project) : NULL;

  if (info == NULL)
    return rugosa_display_significant_screen (si, 4);
  return rugosa_display_format_screen (info->quantity, si, ps ? rugosa_settings_get_unit (ps, dq) : NULL);
}

/* The pumping lines of the readout, in the project's units: power,
 * energy and cost of a year, the costs over the service life, the duty
 * point. */
static void
_rugosa_readout_energy (GString                    *s,
                        RugosaProject              *project,
                        const RugosaLineResults    *res,
                        const RugosaOperatingPoint *p)
{
  RugosaSettings *ps = rugosa_project_get_settings (project);
  const RugosaLineEnergy *en = &res->energy;
  const char *currency = rugosa_settings_get_string (ps, "currency");
  const char *u_power = rugosa_settings_get_unit (ps, RUGOSA_DISPLAY_POWER);
  g_autofree char *power = rugosa_display_format_screen (RG_QTY_POWER, p->electric_power_w, u_power);
  g_autofree char *power_new = rugosa_display_format_screen (RG_QTY_POWER, p->electric_power_new_w, u_power);

  if (!en->ok)
    {
      g_string_append_c (s, '\n');
      /* TRANSLATORS: the electric input power at the design flow, at the
       * service age and when new */
      g_string_append_printf (s, _("Pump power %s at the design flow (new: %s)"), power, power_new);
      return;
    }
  {
    const char *u_energy = rugosa_settings_get_unit (ps, RUGOSA_DISPLAY_ENERGY_PER_YEAR);
    g_autofree char *energy = rugosa_display_format_screen (RG_QTY_ENERGY, en->energy_j_per_year, u_energy);
    g_autofree char *cost = rugosa_display_money_screen (en->cost_per_year, currency);

    g_string_append_c (s, '\n');
    /* TRANSLATORS: electric power at the design flow (at the service age,
     * when new), then the energy and its cost of a year of operation */
    g_string_append_printf (s, _("Pump power %s at the design flow (new: %s); a year takes %s and costs %s"),
                            power, power_new, energy, cost);
  }
  if (en->life_ok)
    {
      g_autofree char *years = rugosa_display_significant_screen (rugosa_settings_get_double (ps, "service-life"), 3);
      g_autofree char *pv = rugosa_display_money_screen (en->life_energy_cost_pv, currency);

      g_string_append_c (s, '\n');
      if (en->has_capital)
        {
          g_autofree char *capital = rugosa_display_money_screen (en->capital, currency);
          g_autofree char *lcc = rugosa_display_money_screen (en->life_cycle_cost, currency);

          /* TRANSLATORS: life-cycle cost, then the capital cost, the
           * present value of the energy and the service life in years */
          g_string_append_printf (s, _("Life-cycle cost %s: capital %s and energy %s (present value over %s years)"),
                                  lcc, capital, pv, years);
        }
      else
        /* TRANSLATORS: the present value of the energy and the service life */
        g_string_append_printf (s, _("Energy %s (present value over %s years); no capital cost given"), pv, years);
    }
  if (en->has_pump)
    {
      const char *u_flow = rugosa_settings_get_unit (ps, RUGOSA_DISPLAY_FLOW);
      g_autofree char *qn = rugosa_display_format_screen (RG_QTY_FLOW, en->duty_new_flow_m3_s, u_flow);
      g_autofree char *qa = rugosa_display_format_screen (RG_QTY_FLOW, en->duty_flow_m3_s, u_flow);
      g_autofree char *age = rugosa_display_significant_screen (res->age_years, 3);

      if (en->duty_ok && en->duty_new_ok)
        {
          g_string_append_c (s, '\n');
          /* TRANSLATORS: the pump's duty flow when new and at the service age */
          g_string_append_printf (s, _("Duty flow %s when new, %s after %s years"), qn, qa, age);
        }
    }
}

char *
rugosa_readout_line_full (RugosaProject *project,
                          RugosaLine    *line)
{
  const RugosaLineResults *res = rugosa_readout_results (project, line);
  const RugosaOperatingPoint *p;
  GString *s = g_string_new (NULL);
  g_autofree char *flow = NULL, *vel = NULL, *head = NULL, *newhead = NULL;
  g_autofree char *dp = NULL, *grad = NULL, *re = NULL, *f = NULL, *change = NULL;
  g_autofree char *rr = NULL, *age = NULL;

  g_string_append_printf (s, "%s\n", rugosa_line_get_name (line));
  if (res == NULL || !res->ok)
    {
      g_string_append (s, res ? res->error : _("Not evaluated."));
      return g_string_free (s, FALSE);
    }
  p = &res->points[RUGOSA_FLOW_DESIGN];
  if (!p->present || !p->ok)
    {
      g_string_append (s, p->present ? p->error : _("No design flow."));
      return g_string_free (s, FALSE);
    }

  flow = rugosa_readout_format (project, RUGOSA_DISPLAY_FLOW, p->flow_m3_s);
  vel = rugosa_readout_format (project, RUGOSA_DISPLAY_VELOCITY, p->result.velocity_m_s);
  head = rugosa_readout_format (project, RUGOSA_DISPLAY_HEAD, p->result.head_loss_total_m);
  newhead = rugosa_readout_format (project, RUGOSA_DISPLAY_HEAD, p->result_new.head_loss_total_m);
  dp = rugosa_readout_format (project, RUGOSA_DISPLAY_PRESSURE, p->result.pressure_drop_pa);
  /* A gradient is a ratio: converted as one, whatever the head unit, as
   * the chart's callout and the results table do. */
  grad = rugosa_readout_format (project, RUGOSA_DISPLAY_GRADIENT, p->result.gradient_m_per_100m);
  re = rugosa_display_significant_screen (p->result.reynolds, 4);
  f = rugosa_display_significant_screen (p->result.friction.f, 4);
  rr = rugosa_display_significant_screen (p->result.relative_roughness, 3);
  change = rugosa_readout_change (p->head_loss_ratio_to_new);

  age = rugosa_display_significant_screen (res->age_years, 3);
  g_string_append_printf (s, _("Design flow %s after %s years of service\n"), flow, age);
  g_string_append_printf (s, _("Velocity %s\n"), vel);
  g_string_append_printf (s, _("Reynolds number %s, ε/D %s\n"), re, rr);
  g_string_append_printf (s, _("Friction factor f %s (%s, %s)\n"), f,
                          rugosa_readout_regime (p->result.friction.regime),
                          rugosa_readout_zone (p->result.friction.zone));
  g_string_append_printf (s, _("Head loss %s (new: %s, change %s)\n"), head, newhead, change);
  /* TRANSLATORS: the pipe-friction gradient, e.g. "Gradient 3.4 m/100 m" */
  g_string_append_printf (s, _("Gradient %s\n"), grad);
  g_string_append_printf (s, _("Pressure drop %s"), dp);
  _rugosa_readout_energy (s, project, res, p);
  if (p->has_hazen_williams)
    {
      g_autofree char *c = rugosa_readout_hazen_williams (p);
      g_autofree char *notes = rugosa_readout_hazen_williams_notes (p);

      g_string_append_printf (s, "\n");
      g_string_append_printf (s, _("Hazen–Williams C equivalent %s"), c);
      if (notes != NULL)
        g_string_append_printf (s, "\n%s", notes);
    }
  if (p->warnings.count > 0)
    for (int i = 0; i < p->warnings.count; i++)
      g_string_append_printf (s, "\n⚠ %s", p->warnings.text[i]);
  return g_string_free (s, FALSE);
}

char *
rugosa_readout_warnings (RugosaProject *project,
                         RugosaLine    *line)
{
  const RugosaLineResults *res = rugosa_readout_results (project, line);
  GString *s;
  g_autoptr (GPtrArray) seen = g_ptr_array_new ();

  if (res == NULL)
    return NULL;
  s = g_string_new (NULL);
  if (!res->ok)
    g_string_append (s, res->error);
  for (int k = 0; k < RUGOSA_N_FLOWS; k++)
    {
      const RugosaOperatingPoint *p = &res->points[k];

      if (!p->present)
        continue;
      if (!p->ok)
        {
          if (s->len)
            g_string_append_c (s, '\n');
          g_string_append (s, p->error);
          continue;
        }
      for (int i = 0; i < p->warnings.count; i++)
        {
          static const char *const where[RUGOSA_N_FLOWS] = {
            NULL, N_("At the lowest flow: "), N_("At the highest flow: ")
          };
          gboolean dup = FALSE;

          /* The same remark at two flows is shown once. */
          for (guint j = 0; j < seen->len; j++)
            dup |= g_strcmp0 (g_ptr_array_index (seen, j), p->warnings.text[i]) == 0;
          if (dup)
            continue;
          g_ptr_array_add (seen, (gpointer) p->warnings.text[i]);
          if (s->len)
            g_string_append_c (s, '\n');
          if (where[k] != NULL)
            g_string_append (s, _(where[k]));
          g_string_append (s, p->warnings.text[i]);
        }
    }
  if (s->len == 0)
    {
      g_string_free (s, TRUE);
      return NULL;
    }
  return g_string_free (s, FALSE);
}

char *
rugosa_readout_hazen_williams (const RugosaOperatingPoint *p)
{
  if (!p->has_hazen_williams)
    return NULL;
  /* C is quoted to whole numbers in the trade's tables */
  return rugosa_display_significant_screen (round (p->hazen_williams_c), 3);
}

char *
rugosa_readout_hazen_williams_notes (const RugosaOperatingPoint *p)
{
  GString *s;

  if (!p->has_hazen_williams)
    return NULL;
  if (p->hazen_williams_notes == 0)
    return g_strdup (_("Inside the usual range of the Hazen–Williams formula."));
  s = g_string_new (NULL);
  for (unsigned b = 0; b < RG_HW_N_NOTES; b++)
    if (p->hazen_williams_notes & (1u << b))
      g_string_append_printf (s, "%s%s", s->len ? "\n" : "", rg_hazen_williams_note_text (1u << b));
  return g_string_free (s, FALSE);
}
