/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Sizing and the inverse problems of a line option (see rugosa-sizing.h).
 *
 * Sizing lists the pipes of the chosen catalogs in the order of
 * rg_pipe_compare (outside diameter, then wall) and evaluates each once,
 * as the duty with that pipe, through rugosa_project_evaluate_line; one
 * evaluation gives every flow of the duty new and at the service age.  The
 * recommendation is the first candidate that breaks no limit, new or aged:
 * the smallest size, and of its walls the thinnest that passes.  Aging
 * only roughens the wall, so losses and gradients grow with age while
 * velocities stay: whatever passes aged passes new, and the recommendation
 * for a pipe that never ages never comes after the aged one.
 *
 * Cost: one evaluation per catalog size, so linear in the number of sizes
 * n (each evaluation computes the fluid once and up to three flows new and
 * aged at a fixed number of Colebrook steps); the catalog's search and
 * sort add O(n log n), and the pipes are handed to the evaluation by
 * designation through its memo, so no size is parsed.  The benchmark
 * `sizing` (tests/bench-sizing.c) measures it.
 *
 * The inverse problems search the one evaluation by bisection on the
 * logarithm of the unknown within its field's range: 200 steps at most,
 * stopping at 1e-12 relative width.  The total loss grows with the flow
 * and falls with the bore except at the laminar–turbulent switch, where
 * the search reports the edge of the jump. */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <math.h>
#include <string.h>

#include "rugosa-display.h"
#include "rugosa-project-private.h"
#include "rugosa-settings-private.h"
#include "rugosa-sizing.h"

#define SUBJ(s) RG_SUBJECT_BIT (RG_SUBJECT_##s)

/* The head loss a duty may use up is a value of one sizing (it depends on
 * the source's and the delivery's heads), not a project setting.  Range:
 * a millimetre to ten kilometres of head, none when 0 (common practice, no
 * single source: beyond any pumped or gravity main). */
static const RugosaField sizing_fields[] = {
  { "max-head-loss", "max_head_loss_m", RUGOSA_FIELD_NUMBER, RUGOSA_DISPLAY_HEAD, 1.0,
    1.0e-3, 1.0e4, 0.0, NULL, RUGOSA_FIELD_ZERO_ABSENT, N_("Largest total head loss"),
    N_("The most head the line may lose to pipe friction and fittings (the elevation change is not part of it); none when not given."),
    NULL, "--max-head-loss", SUBJ (HEAD_LOSS), NULL, NULL, 0, 0, -1, 0 },
};

const RugosaField *
rugosa_sizing_fields (guint *n)
{
  *n = G_N_ELEMENTS (sizing_fields);
  return sizing_fields;
}

void
rugosa_limits_from_settings (RugosaLimits *limits, RugosaSettings *settings)
{
  g_return_if_fail (RUGOSA_IS_SETTINGS (settings));
  limits->velocity_max = settings->velocity_limit;
  limits->velocity_min = settings->velocity_minimum;
  limits->gradient_max = settings->gradient_limit;
  limits->head_loss_max = 0.0;
}

const char *
rugosa_limit_id (RugosaLimit limit)
{
  switch (limit)
    {
    case RUGOSA_LIMIT_VELOCITY_MAX:
      return "max-velocity";
    case RUGOSA_LIMIT_VELOCITY_MIN:
      return "min-velocity";
    case RUGOSA_LIMIT_GRADIENT_MAX:
      return "max-gradient";
    case RUGOSA_LIMIT_HEAD_LOSS_MAX:
      return "max-head-loss";
    default:
      return "";
    }
}

const RugosaField *
rugosa_limit_field (RugosaLimit limit)
{
  switch (limit)
    {
    case RUGOSA_LIMIT_VELOCITY_MAX:
      return rugosa_field_find ("velocity-limit");
    case RUGOSA_LIMIT_VELOCITY_MIN:
      return rugosa_field_find ("velocity-minimum");
    case RUGOSA_LIMIT_GRADIENT_MAX:
      return rugosa_field_find ("gradient-limit");
    case RUGOSA_LIMIT_HEAD_LOSS_MAX:
      return &sizing_fields[0];
    default:
      return NULL;
    }
}

guint
rugosa_limits_broken (const RugosaLimits *limits,
                      const RugosaLineResults *results, gboolean aged)
{
  guint broken = 0;

  if (!results->ok)
    return 0;
  for (RugosaFlowCase c = 0; c < RUGOSA_N_FLOWS; c++)
    {
      const RugosaOperatingPoint *p = &results->points[c];
      const RgLineResult *r = aged ? &p->result : &p->result_new;

      /* the lowest flow is expected to fall below the upper limits' use
       * and the lowest velocity alike (rugosa-fields.c) */
      if (c == RUGOSA_FLOW_MINIMUM || !p->present || !p->ok)
        continue;
      if (limits->velocity_max > 0.0 && r->velocity_m_s > limits->velocity_max)
        broken |= RUGOSA_LIMIT_VELOCITY_MAX;
      if (limits->gradient_max > 0.0 && r->gradient_m_per_100m > limits->gradient_max)
        broken |= RUGOSA_LIMIT_GRADIENT_MAX;
      if (limits->head_loss_max > 0.0 && r->head_loss_total_m > limits->head_loss_max)
        broken |= RUGOSA_LIMIT_HEAD_LOSS_MAX;
      if (c == RUGOSA_FLOW_DESIGN && limits->velocity_min > 0.0
          && r->velocity_m_s < limits->velocity_min)
        broken |= RUGOSA_LIMIT_VELOCITY_MIN;
    }
  return broken;
}

/* The design point's error, or the line's. */
static gboolean
results_error (const RugosaLineResults *r, RgError *err)
{
  const RugosaOperatingPoint *p = &r->points[RUGOSA_FLOW_DESIGN];

  if (!r->ok)
    {
      rg_error_set_on (err, RG_ERR_DOMAIN, r->error_subjects, "%s", r->error);
      return TRUE;
    }
  for (RugosaFlowCase c = 0; c < RUGOSA_N_FLOWS; c++)
    if (r->points[c].present && !r->points[c].ok)
      {
        p = &r->points[c];
        rg_error_set_on (err, RG_ERR_DOMAIN, p->error_subjects, "%s", p->error);
        return TRUE;
      }
  return FALSE;
}

/* "Velocity limit, Gradient limit": the labels of the limits broken. */
static char *
limit_labels (guint broken)
{
  GString *s = g_string_new (NULL);

  for (guint b = 0; b < RUGOSA_N_LIMITS; b++)
    if (broken & (1u << b))
      {
        if (s->len > 0)
          /* TRANSLATORS: between the names of limits in a list */
          g_string_append (s, _(", "));
        g_string_append (s, rugosa_field_label (rugosa_limit_field ((RugosaLimit) (1u << b))));
      }
  return g_string_free (s, FALSE);
}

static char *
why_none (const RugosaSizing *s)
{
  const RugosaSizingCandidate *first = &s->candidates[0];
  const RugosaSizingCandidate *last = &s->candidates[s->n_candidates - 1];
  g_autofree char *first_broken = limit_labels (first->broken_new | first->broken_aged);
  g_autofree char *last_broken = limit_labels (last->broken_new | last->broken_aged);

  if (s->n_candidates == 1)
    return g_strdup_printf (_("The only size of the chosen catalogs, %s, does not keep within every limit over the service life: it breaks these: %s."),
                            first->pipe->designation, first_broken);
  return g_strdup_printf (_("No size of the chosen catalogs keeps within every limit over the service life: the smallest, %s, breaks these: %s; the largest, %s, breaks these: %s."),
                          first->pipe->designation, first_broken,
                          last->pipe->designation, last_broken);
}

RugosaSizing *
rugosa_sizing_run (RugosaProject *project, RugosaLine *duty,
                   const char *material_id, const char *catalog,
                   const RugosaLimits *limits, double age_years, RgError *err)
{
  g_autoptr (RugosaLine) trial = NULL;
  g_autofree unsigned char *chosen = NULL;
  g_autofree int *found = NULL;
  const RgMaterial *material;
  RugosaSizing *s;
  int n_chosen = 0, n;
  guint n_failed = 0;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (project), NULL);
  g_return_val_if_fail (RUGOSA_IS_LINE (duty), NULL);
  g_return_val_if_fail (limits != NULL, NULL);

  if (rg_material_lookup (material_id, &material, err) != RG_OK)
    return NULL;
  chosen = g_new0 (unsigned char, (gsize) MAX (rg_pipe_catalog_count (), 1));
  if (rg_pipe_catalog_choose (catalog, material->id, chosen, &n_chosen, err) != RG_OK)
    return NULL;
  found = g_new (int, (gsize) MAX (rg_pipe_count (), 1));
  n = rg_pipe_search (chosen, NULL, found, rg_pipe_count ());

  if (age_years < 0.0 || !isfinite (age_years))
    age_years = rugosa_settings_get_double (rugosa_project_get_settings (project), "service-age");

  s = g_new0 (RugosaSizing, 1);
  s->age_years = age_years;
  s->limits = *limits;
  s->n_candidates = (guint) n;
  s->candidates = g_new0 (RugosaSizingCandidate, (gsize) MAX (n, 1));
  s->recommended = s->recommended_new = -1;

  trial = rugosa_line_duplicate (duty);
  g_object_set (trial, "material-id", material->id, NULL);
  for (int i = 0; i < n; i++)
    {
      RugosaSizingCandidate *c = &s->candidates[i];
      RgError cerr = { 0 };

      c->pipe = rg_pipe_at (found[i]);
      _rugosa_project_remember_pipe (project, c->pipe);
      g_object_set (trial, "pipe-designation", c->pipe->designation, NULL);
      rugosa_project_evaluate_line (project, trial, age_years, &c->results);
      if (results_error (&c->results, &cerr))
        {
          n_failed++;
          continue;
        }
      c->broken_new = rugosa_limits_broken (limits, &c->results, FALSE);
      c->broken_aged = rugosa_limits_broken (limits, &c->results, TRUE);
      c->passes = c->broken_new == 0 && c->broken_aged == 0;
      if (c->passes && s->recommended < 0)
        s->recommended = i;
      if (c->broken_new == 0 && s->recommended_new < 0)
        s->recommended_new = i;
    }

  /* No size could be computed: the duty itself is wrong. */
  if (n > 0 && n_failed == (guint) n)
    {
      (void) results_error (&s->candidates[n - 1].results, err);
      rugosa_sizing_free (s);
      return NULL;
    }
  if (s->recommended < 0 && n > 0)
    s->why_none = why_none (s);
  return s;
}

void
rugosa_sizing_free (RugosaSizing *sizing)
{
  if (sizing == NULL)
    return;
  g_free (sizing->candidates);
  g_free (sizing->why_none);
  g_free (sizing);
}

/* ---- inverse problems ---- */

#define SOLVE_STEPS 200
#define SOLVE_REL_WIDTH 1e-12

/* The total head loss at the design flow `q`: FALSE when the evaluation
 * fails there. */
static gboolean
head_loss_at (RugosaProject *project, RugosaLine *trial, double age_years,
              double q, double *h, RgError *err)
{
  RugosaLineResults r;

  g_object_set (trial, "flow-design", q, NULL);
  rugosa_project_evaluate_line (project, trial, age_years, &r);
  if (results_error (&r, err))
    return FALSE;
  *h = r.points[RUGOSA_FLOW_DESIGN].result.head_loss_total_m;
  return TRUE;
}

static char *
head_text (RugosaProject *project, double head_m)
{
  RugosaSettings *settings = rugosa_project_get_settings (project);

  return rugosa_display_format_screen (RG_QTY_LENGTH, head_m,
                                       rugosa_settings_get_unit (settings, RUGOSA_DISPLAY_HEAD));
}

gboolean
rugosa_solve_flow (RugosaProject *project, RugosaLine *line, double age_years,
                   double head_loss_m, double *flow_m3_s, RgError *err)
{
  const RugosaField *row = rugosa_field_find ("flow-design");
  g_autoptr (RugosaLine) trial = NULL;
  double lo, hi, h_lo, h_hi;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (project), FALSE);
  g_return_val_if_fail (RUGOSA_IS_LINE (line), FALSE);

  if (!(head_loss_m > 0.0 && isfinite (head_loss_m)))
    {
      rg_error_set_on (err, RG_ERR_DOMAIN, SUBJ (HEAD_LOSS), "%s",
                       _("The allowed head loss must be a positive value."));
      return FALSE;
    }
  /* The design flow alone: the other flows are not asked for. */
  trial = rugosa_line_duplicate (line);
  g_object_set (trial, "flow-minimum", 0.0, "flow-maximum", 0.0, NULL);

  /* A bracket around the line's own flow, ten times wider at each step,
   * within the field's range. */
  lo = hi = rugosa_line_get_double (line, "flow-design");
  if (!head_loss_at (project, trial, age_years, lo, &h_lo, err))
    return FALSE;
  h_hi = h_lo;
  while (h_lo > head_loss_m && lo > row->max * 1e-15)
    {
      hi = lo;
      h_hi = h_lo;
      lo = MAX (lo / 10.0, row->max * 1e-15);
      if (!head_loss_at (project, trial, age_years, lo, &h_lo, err))
        return FALSE;
    }
  while (h_hi < head_loss_m && hi < row->max)
    {
      RgError step_err = { 0 };

      lo = hi;
      h_lo = h_hi;
      hi = MIN (hi * 10.0, row->max);
      if (!head_loss_at (project, trial, age_years, hi, &h_hi, &step_err))
        break;   /* beyond the correlations: no larger flow to try */
    }
  if (!(h_lo <= head_loss_m && head_loss_m <= h_hi))
    {
      g_autofree char *h = head_text (project, head_loss_m);
      g_autofree char *text = g_strdup_printf (_("No flow within the range of the design flow gives a total head loss of %s."), h);

      rg_error_set_on (err, RG_ERR_DOMAIN, SUBJ (HEAD_LOSS), "%s", text);
      return FALSE;
    }
  for (int step = 0; step < SOLVE_STEPS && hi - lo > SOLVE_REL_WIDTH * hi; step++)
    {
      double mid = sqrt (lo * hi), h;

      if (!(mid > lo && mid < hi))
        break;
      if (!head_loss_at (project, trial, age_years, mid, &h, err))
        return FALSE;
      if (h < head_loss_m)
        lo = mid;
      else
        hi = mid;
    }
  *flow_m3_s = 0.5 * (lo + hi);
  return TRUE;
}

/* Whether a bore keeps within the upper limits, new and aged. */
static gboolean
bore_passes (RugosaProject *project, RugosaLine *trial, double age_years,
             const RugosaLimits *upper, double d)
{
  RugosaLineResults r;
  RgError err = { 0 };

  g_object_set (trial, "inner-diameter", d, NULL);
  rugosa_project_evaluate_line (project, trial, age_years, &r);
  /* a bore the correlations refuse (ε/D too large) is too small */
  if (results_error (&r, &err))
    return FALSE;
  return rugosa_limits_broken (upper, &r, FALSE) == 0
         && rugosa_limits_broken (upper, &r, TRUE) == 0;
}

gboolean
rugosa_solve_diameter (RugosaProject *project, RugosaLine *line,
                       double age_years, const RugosaLimits *limits,
                       double *diameter_m, RgError *err)
{
  const RugosaField *row = rugosa_field_find ("inner-diameter");
  g_autoptr (RugosaLine) trial = NULL;
  RugosaLimits upper = *limits;
  double lo = row->min, hi = row->max;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (project), FALSE);
  g_return_val_if_fail (RUGOSA_IS_LINE (line), FALSE);

  upper.velocity_min = 0.0;
  trial = rugosa_line_duplicate (line);
  g_object_set (trial, "pipe-designation", NULL, NULL);
  {
    /* the line itself must be computable at some bore */
    RugosaLineResults r;

    g_object_set (trial, "inner-diameter", hi, NULL);
    rugosa_project_evaluate_line (project, trial, age_years, &r);
    if (!r.ok)
      {
        rg_error_set_on (err, RG_ERR_DOMAIN, r.error_subjects, "%s", r.error);
        return FALSE;
      }
  }
  if (!bore_passes (project, trial, age_years, &upper, hi))
    {
      g_autofree char *d = rugosa_display_format_screen (RG_QTY_LENGTH, hi,
                                                         rugosa_settings_get_unit (rugosa_project_get_settings (project),
                                                                                   RUGOSA_DISPLAY_DIAMETER));
      g_autofree char *text = g_strdup_printf (_("No bore up to %s keeps within the limits."), d);

      rg_error_set_on (err, RG_ERR_DOMAIN, SUBJ (HEAD_LOSS), "%s", text);
      return FALSE;
    }
  if (bore_passes (project, trial, age_years, &upper, lo))
    {
      *diameter_m = lo;
      return TRUE;
    }
  for (int step = 0; step < SOLVE_STEPS && hi - lo > SOLVE_REL_WIDTH * hi; step++)
    {
      double mid = sqrt (lo * hi);

      if (!(mid > lo && mid < hi))
        break;
      if (bore_passes (project, trial, age_years, &upper, mid))
        hi = mid;
      else
        lo = mid;
    }
  *diameter_m = hi;
  return TRUE;
}
