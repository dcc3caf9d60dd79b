/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-cost-group"

#include "config.h"

#include <glib/gi18n.h>
#include <math.h>

#include "model/rugosa-display.h"
#include "model/rugosa-fields.h"
#include "model/rugosa-life-cycle.h"
#include "model/rugosa-units.h"
#include "rugosa-cost-group.h"
#include "rugosa-readout.h"

struct _RugosaCostGroup
{
  GtkWidget parent_instance;

  /* template widgets */
  AdwPreferencesGroup *group;
  AdwActionRow        *per_metre_row;
  GtkEntry            *per_metre_entry;
  GtkLabel            *per_metre_unit;
  AdwActionRow        *lump_sum_row;
  GtkEntry            *lump_sum_entry;
  GtkLabel            *lump_sum_unit;
  AdwExpanderRow      *pump_row;
  AdwActionRow        *point_add_row;

  /* borrowed references */
  RugosaProject *project;

  /* owned references */
  RugosaLine *line;
  GPtrArray  *point_rows;   /* rows added to pump_row, in point order */
  GVariant   *shown_curve;  /* the curve the rows show, or NULL */
  char       *shown_units;  /* the flow and head units they show it in */
  GHashTable *errors;       /* field -> sentence (owned) */
  gboolean    updating;     /* set while widgets follow the line */
};

G_DEFINE_FINAL_TYPE (RugosaCostGroup, rugosa_cost_group, GTK_TYPE_WIDGET)

enum {
  EDIT_LINE,
  N_SIGNALS
};

static guint signals[N_SIGNALS];

GtkWidget *
rugosa_cost_group_new (void)
{
  return g_object_new (RUGOSA_TYPE_COST_GROUP, NULL);
}

static void
_rugosa_cost_group_emit (RugosaCostGroup *self,
                         const char      *property,
                         GVariant        *value)
{
  g_autoptr (GVariant) v = g_variant_ref_sink (value);

  if (self->updating || self->line == NULL)
    return;
  g_signal_emit (self, signals[EDIT_LINE], 0, self->line, property, v);
}

static RugosaSettings *
_rugosa_cost_group_settings (RugosaCostGroup *self)
{
  return self->project ? rugosa_project_get_settings (self->project) : NULL;
}

static const char *
_rugosa_cost_group_unit (RugosaCostGroup     *self,
                         RugosaDisplayQuantity dq)
{
  RugosaSettings *s = _rugosa_cost_group_settings (self);
  const RugosaDisplayInfo *info = rugosa_display_info (dq);

  if (s != NULL)
    return rugosa_settings_get_unit (s, dq);
  return info ? info->si_unit : NULL;
}

/* ---- errors under the fields --------------------------------------------- */

static void
_rugosa_cost_group_mark (RugosaCostGroup *self,
                         const char      *field,
                         GtkWidget       *entry,
                         AdwActionRow    *row,
                         const char      *why)
{
  const char *plain = g_object_get_data (G_OBJECT (row), "plain-subtitle");

  if (why != NULL)
    g_hash_table_replace (self->errors, g_strdup (field), g_strdup (why));
  else
    g_hash_table_remove (self->errors, field);
  /* the sentence sits under the row's title and in the tooltip */
  adw_action_row_set_subtitle (row, why ? why : plain ? plain : "");
  gtk_widget_set_tooltip_text (entry, why);
  if (why != NULL)
    {
      gtk_widget_add_css_class (entry, "error");
      gtk_widget_add_css_class (GTK_WIDGET (row), "field-error");
    }
  else
    {
      gtk_widget_remove_css_class (entry, "error");
      gtk_widget_remove_css_class (GTK_WIDGET (row), "field-error");
    }
}

const char *
rugosa_cost_group_get_error (RugosaCostGroup *self,
                             const char      *field)
{
  g_return_val_if_fail (RUGOSA_IS_COST_GROUP (self), NULL);
  return g_hash_table_lookup (self->errors, field);
}

/* ---- capital cost -------------------------------------------------------- */

static const char *
_rugosa_cost_group_money_property (RugosaCostGroup *self,
                                   GtkEntry        *entry)
{
  return entry == self->per_metre_entry ? "cost-per-metre" : "cost-lump-sum";
}

/* The text of a money field: a plain number in the project's currency
 * (the row's own unit may follow it); empty is "not given". */
static gboolean
_rugosa_cost_group_money_commit (RugosaCostGroup *self,
                                 GtkEntry        *entry)
{
  const char *property = _rugosa_cost_group_money_property (self, entry);
  const RugosaField *row = rugosa_field_find (property);
  AdwActionRow *arow = entry == self->per_metre_entry ? self->per_metre_row : self->lump_sum_row;
  g_autofree char *text = rugosa_display_delocalize (gtk_editable_get_text (GTK_EDITABLE (entry)));
  RgError err = { 0 };
  double v = 0.0;

  if (self->line == NULL || self->updating)
    return FALSE;
  g_strstrip (text);
  /* the currency label may follow the number as it is shown */
  {
    const char *currency = _rugosa_cost_group_unit (self, RUGOSA_DISPLAY_MONEY);

    if (currency != NULL && *currency != '\0' && g_str_has_suffix (text, currency)
        && strlen (text) > strlen (currency))
      {
        text[strlen (text) - strlen (currency)] = '\0';
        g_strstrip (text);
      }
  }
  if (*text != '\0'
      && (!rugosa_field_parse_text (row, text, NULL, 0.0, &v, &err)
          || !rugosa_field_in_range (row, v, _rugosa_cost_group_unit (self, RUGOSA_DISPLAY_MONEY), &err)))
    {
      _rugosa_cost_group_mark (self, property, GTK_WIDGET (entry), arow, err.text);
      return FALSE;
    }
  _rugosa_cost_group_mark (self, property, GTK_WIDGET (entry), arow, NULL);
  if (v != rugosa_line_get_double (self->line, property))
    _rugosa_cost_group_emit (self, property, g_variant_new_double (v));
  return TRUE;
}

static void
_rugosa_cost_group_money_activate (GtkEntry        *entry,
                                   RugosaCostGroup *self)
{
  _rugosa_cost_group_money_commit (self, entry);
}

static void
_rugosa_cost_group_money_leave (GtkEventControllerFocus *focus,
                                RugosaCostGroup         *self)
{
  _rugosa_cost_group_money_commit (self, GTK_ENTRY (gtk_event_controller_get_widget (GTK_EVENT_CONTROLLER (focus))));
}

/* ---- the pump curve ------------------------------------------------------ */

typedef struct {
  double q, h;
} Point;

static GArray *
_rugosa_cost_group_points (RugosaCostGroup *self)
{
  g_autoptr (GVariant) curve = NULL;
  GArray *points = g_array_new (FALSE, FALSE, sizeof (Point));

  if (self->line == NULL)
    return points;
  g_object_get (self->line, "pump-curve", &curve, NULL);
  for (gsize i = 0; curve != NULL && i < g_variant_n_children (curve); i++)
    {
      Point p;

      g_variant_get_child (curve, i, "(dd)", &p.q, &p.h);
      g_array_append_val (points, p);
    }
  return points;
}

static int
_rugosa_cost_group_cmp_point (gconstpointer a,
                              gconstpointer b)
{
  const Point *pa = a, *pb = b;

  return (pa->q > pb->q) - (pa->q < pb->q);
}

/* Emit the curve in order of flow; FALSE with a sentence when two points
 * share a flow. */
static gboolean
_rugosa_cost_group_emit_points (RugosaCostGroup *self,
                                GArray          *points,
                                char           **why)
{
  GVariantBuilder b;

  g_array_sort (points, _rugosa_cost_group_cmp_point);
  for (guint i = 1; i < points->len; i++)
    if (g_array_index (points, Point, i).q == g_array_index (points, Point, i - 1).q)
      {
        *why = g_strdup (_("Two points of the pump curve have the same flow: give each point a flow of its own."));
        return FALSE;
      }
  g_variant_builder_init (&b, G_VARIANT_TYPE (RUGOSA_LINE_CURVE_TYPE));
  for (guint i = 0; i < points->len; i++)
    g_variant_builder_add (&b, "(dd)", g_array_index (points, Point, i).q, g_array_index (points, Point, i).h);
  _rugosa_cost_group_emit (self, "pump-curve", g_variant_builder_end (&b));
  return TRUE;
}

/* Read a flow or a head typed for a point: a bare number is in the
 * display unit; the range is the file's (rugosa-fields.h). */
static gboolean
_rugosa_cost_group_parse_point_value (RugosaCostGroup *self,
                                      gboolean         flow,
                                      const char      *typed,
                                      double          *si,
                                      char           **why)
{
  const RugosaDisplayQuantity dq = flow ? RUGOSA_DISPLAY_FLOW : RUGOSA_DISPLAY_HEAD;
  const RugosaDisplayInfo *info = rugosa_display_info (dq);
  const char *unit = _rugosa_cost_group_unit (self, dq);
  const double max = flow ? rugosa_field_find ("flow-design")->max : RUGOSA_CURVE_HEAD_MAX;
  g_autofree char *text = rugosa_display_delocalize (typed);
  g_autofree char *with_unit = NULL;
  const char *parsed;
  RgError err = { 0 };
  char *end = NULL;

  g_strstrip (text);
  parsed = text;
  g_ascii_strtod (text, &end);
  if (end != NULL && end != text && *end == '\0' && unit != NULL)
    parsed = with_unit = g_strdup_printf ("%s %s", text, unit);
  if (rg_units_parse (info->quantity, NULL, parsed, si, &err) != RG_OK)
    {
      *why = g_strdup (err.text);
      return FALSE;
    }
  if (!(*si >= 0.0 && *si <= max))
    {
      g_autofree char *lo = rugosa_display_format_screen (info->quantity, 0.0, unit);
      g_autofree char *hi = rugosa_display_format_screen (info->quantity, max, unit);

      *why = flow ? g_strdup_printf (_("A flow of the pump curve must lie between %s and %s."), lo, hi)
                  : g_strdup_printf (_("A head of the pump curve must lie between %s and %s."), lo, hi);
      return FALSE;
    }
  return TRUE;
}

static gboolean
_rugosa_cost_group_point_commit (RugosaCostGroup *self,
                                 GtkEntry        *entry)
{
  guint index = GPOINTER_TO_UINT (g_object_get_data (G_OBJECT (entry), "index"));
  gboolean flow = g_object_get_data (G_OBJECT (entry), "is-flow") != NULL;
  AdwActionRow *row = ADW_ACTION_ROW (gtk_widget_get_ancestor (GTK_WIDGET (entry), ADW_TYPE_ACTION_ROW));
  g_autofree char *field = g_strdup_printf ("%s:%u", flow ? "flow" : "head", index);
  g_autoptr (GArray) points = NULL;
  g_autofree char *why = NULL;
  double v = 0.0;
  Point *p;

  if (self->line == NULL || self->updating)
    return FALSE;
  points = _rugosa_cost_group_points (self);
  if (index >= points->len)
    return FALSE;
  if (!_rugosa_cost_group_parse_point_value (self, flow, gtk_editable_get_text (GTK_EDITABLE (entry)), &v, &why))
    {
      _rugosa_cost_group_mark (self, field, GTK_WIDGET (entry), row, why);
      return FALSE;
    }
  p = &g_array_index (points, Point, index);
  if ((flow ? p->q : p->h) == v)
    {
      _rugosa_cost_group_mark (self, field, GTK_WIDGET (entry), row, NULL);
      return TRUE;
    }
  if (flow)
    p->q = v;
  else
    p->h = v;
  if (!_rugosa_cost_group_emit_points (self, points, &why))
    {
      _rugosa_cost_group_mark (self, field, GTK_WIDGET (entry), row, why);
      return FALSE;
    }
  return TRUE;
}

static void
_rugosa_cost_group_point_activate (GtkEntry        *entry,
                                   RugosaCostGroup *self)
{
  _rugosa_cost_group_point_commit (self, entry);
}

static void
_rugosa_cost_group_point_leave (GtkEventControllerFocus *focus,
                                RugosaCostGroup         *self)
{
  _rugosa_cost_group_point_commit (self, GTK_ENTRY (gtk_event_controller_get_widget (GTK_EVENT_CONTROLLER (focus))));
}

static void
_rugosa_cost_group_point_remove (GtkButton       *button,
                                 RugosaCostGroup *self)
{
  guint index = GPOINTER_TO_UINT (g_object_get_data (G_OBJECT (button), "index"));
  g_autoptr (GArray) points = _rugosa_cost_group_points (self);
  g_autofree char *why = NULL;

  if (index >= points->len)
    return;
  g_array_remove_index (points, index);
  _rugosa_cost_group_emit_points (self, points, &why);
}

static void
_rugosa_cost_group_point_add (GtkButton       *button,
                              RugosaCostGroup *self)
{
  g_autoptr (GArray) points = _rugosa_cost_group_points (self);
  g_autofree char *why = NULL;
  Point p;

  if (self->line == NULL)
    return;
  if (points->len == 0)
    {
      /* a first point where the line runs: its design flow and the head
       * the pump must give there, to be changed to the maker's figures */
      const RugosaLineResults *r = rugosa_readout_results (self->project, self->line);

      p.q = rugosa_line_get_double (self->line, "flow-design");
      p.h = r != NULL && r->ok && r->points[RUGOSA_FLOW_DESIGN].ok
              ? r->points[RUGOSA_FLOW_DESIGN].pump_head_m : 0.0;
    }
  else
    {
      /* beyond the last point: more flow, less head */
      const Point *last = &g_array_index (points, Point, points->len - 1);

      p.q = last->q > 0.0 ? last->q * 1.25 : rugosa_line_get_double (self->line, "flow-design");
      p.h = last->h * 0.8;
    }
  if (points->len >= RUGOSA_CURVE_POINTS_MAX
      || p.q > rugosa_field_find ("flow-design")->max)
    return;
  g_array_append_val (points, p);
  _rugosa_cost_group_emit_points (self, points, &why);
}

static GtkWidget *
_rugosa_cost_group_value_entry (RugosaCostGroup *self,
                                guint            index,
                                gboolean         flow,
                                double           si)
{
  const RugosaDisplayQuantity dq = flow ? RUGOSA_DISPLAY_FLOW : RUGOSA_DISPLAY_HEAD;
  const char *unit = _rugosa_cost_group_unit (self, dq);
  GtkWidget *entry = gtk_entry_new ();
  GtkEventController *focus = gtk_event_controller_focus_new ();
  g_autofree char *text = rugosa_display_format_screen (rugosa_display_info (dq)->quantity, si, unit);

  gtk_editable_set_text (GTK_EDITABLE (entry), text);
  gtk_editable_set_width_chars (GTK_EDITABLE (entry), 6);
  gtk_editable_set_max_width_chars (GTK_EDITABLE (entry), 8);
  gtk_entry_set_alignment (GTK_ENTRY (entry), 1.0);
  gtk_widget_set_valign (entry, GTK_ALIGN_CENTER);
  gtk_widget_set_tooltip_text (entry, flow ? _("The pump's flow at this point") : _("The pump's head at this point"));
  gtk_accessible_update_property (GTK_ACCESSIBLE (entry), GTK_ACCESSIBLE_PROPERTY_LABEL,
                                  flow ? _("Flow of the pump curve's point") : _("Head of the pump curve's point"), -1);
  g_object_set_data (G_OBJECT (entry), "index", GUINT_TO_POINTER (index));
  if (flow)
    g_object_set_data (G_OBJECT (entry), "is-flow", GINT_TO_POINTER (1));
  g_signal_connect (entry, "activate", G_CALLBACK (_rugosa_cost_group_point_activate), self);
  g_signal_connect (focus, "leave", G_CALLBACK (_rugosa_cost_group_point_leave), self);
  gtk_widget_add_controller (entry, focus);
  return entry;
}

static void
_rugosa_cost_group_fill_points (RugosaCostGroup *self)
{
  g_autoptr (GArray) points = _rugosa_cost_group_points (self);
  g_autoptr (GVariant) curve = NULL;
  g_autofree char *units = g_strdup_printf ("%s|%s", _rugosa_cost_group_unit (self, RUGOSA_DISPLAY_FLOW),
                                            _rugosa_cost_group_unit (self, RUGOSA_DISPLAY_HEAD));

  /* rows are rebuilt only when the curve or its units changed: a slider
   * move or an edit elsewhere leaves them (and a field being typed in)
   * alone */
  if (self->line != NULL)
    g_object_get (self->line, "pump-curve", &curve, NULL);
  if (curve != NULL && self->shown_curve != NULL && g_variant_equal (curve, self->shown_curve)
      && g_strcmp0 (units, self->shown_units) == 0)
    return;
  g_clear_pointer (&self->shown_curve, g_variant_unref);
  if (curve != NULL)
    self->shown_curve = g_variant_ref (curve);
  g_free (self->shown_units);
  self->shown_units = g_steal_pointer (&units);

  for (guint i = 0; i < self->point_rows->len; i++)
    adw_expander_row_remove (self->pump_row, g_ptr_array_index (self->point_rows, i));
  g_ptr_array_set_size (self->point_rows, 0);
  /* rebuilt rows hold the model's values: the marks of refused texts go */
  {
    GHashTableIter iter;
    gpointer key;

    g_hash_table_iter_init (&iter, self->errors);
    while (g_hash_table_iter_next (&iter, &key, NULL))
      if (g_str_has_prefix (key, "flow:") || g_str_has_prefix (key, "head:"))
        g_hash_table_iter_remove (&iter);
  }

  for (guint i = 0; i < points->len; i++)
    {
      const Point *p = &g_array_index (points, Point, i);
      GtkWidget *row = adw_action_row_new ();
      GtkWidget *remove = gtk_button_new_from_icon_name ("user-trash-symbolic");
      g_autofree char *title = g_strdup_printf (_("Point %u"), i + 1);

      adw_preferences_row_set_title (ADW_PREFERENCES_ROW (row), title);
      adw_action_row_set_subtitle_lines (ADW_ACTION_ROW (row), 4);
      adw_action_row_add_suffix (ADW_ACTION_ROW (row), _rugosa_cost_group_value_entry (self, i, TRUE, p->q));
      adw_action_row_add_suffix (ADW_ACTION_ROW (row), _rugosa_cost_group_value_entry (self, i, FALSE, p->h));
      gtk_widget_set_valign (remove, GTK_ALIGN_CENTER);
      gtk_widget_add_css_class (remove, "flat");
      gtk_widget_set_tooltip_text (remove, _("Remove this point"));
      g_object_set_data (G_OBJECT (remove), "index", GUINT_TO_POINTER (i));
      g_signal_connect (remove, "clicked", G_CALLBACK (_rugosa_cost_group_point_remove), self);
      adw_action_row_add_suffix (ADW_ACTION_ROW (row), remove);
      adw_expander_row_add_row (self->pump_row, row);
      g_ptr_array_add (self->point_rows, row);
    }
  /* the row that adds a point comes after the points */
  g_object_ref (self->point_add_row);
  adw_expander_row_remove (self->pump_row, GTK_WIDGET (self->point_add_row));
  adw_expander_row_add_row (self->pump_row, GTK_WIDGET (self->point_add_row));
  g_object_unref (self->point_add_row);
  gtk_widget_set_sensitive (GTK_WIDGET (self->point_add_row), points->len < RUGOSA_CURVE_POINTS_MAX);
}

/* "5 points · duty 39.0 L/s when new, 35.1 L/s after 25 years" */
static char *
_rugosa_cost_group_pump_summary (RugosaCostGroup *self)
{
  g_autoptr (GArray) points = _rugosa_cost_group_points (self);
  const RugosaLineResults *r = rugosa_readout_results (self->project, self->line);
  const char *unit = _rugosa_cost_group_unit (self, RUGOSA_DISPLAY_FLOW);
  g_autofree char *count = NULL;

  if (points->len == 0)
    return g_strdup (_("None"));
  count = g_strdup_printf (ngettext ("%u point", "%u points", points->len), points->len);
  if (r != NULL && r->ok && r->energy.duty_ok && r->energy.duty_new_ok)
    {
      g_autofree char *qn = rugosa_display_format_screen (RG_QTY_FLOW, r->energy.duty_new_flow_m3_s, unit);
      g_autofree char *qa = rugosa_display_format_screen (RG_QTY_FLOW, r->energy.duty_flow_m3_s, unit);
      g_autofree char *age = rugosa_display_significant_screen (r->age_years, 3);

      /* TRANSLATORS: the number of points, then the duty flow when new and
       * at the service age in years */
      return g_strdup_printf (_("%s · duty %s when new, %s after %s years"), count, qn, qa, age);
    }
  if (r != NULL && r->ok && r->energy.has_pump)
    /* TRANSLATORS: %s is the number of points */
    return g_strdup_printf (_("%s · no duty point (see the warnings)"), count);
  return g_steal_pointer (&count);
}

void
rugosa_cost_group_refresh (RugosaCostGroup *self)
{
  const char *currency;

  g_return_if_fail (RUGOSA_IS_COST_GROUP (self));

  self->updating = TRUE;
  gtk_widget_set_sensitive (GTK_WIDGET (self), self->line != NULL);
  currency = _rugosa_cost_group_unit (self, RUGOSA_DISPLAY_MONEY);
  {
    g_autofree char *per_m = g_strdup_printf ("%s%s", currency ? currency : "",
                                              rugosa_field_find ("cost-per-metre")->unit_text);

    gtk_label_set_text (self->per_metre_unit, per_m);
    gtk_label_set_text (self->lump_sum_unit, currency ? currency : "");
  }
  if (self->line != NULL)
    {
      const char *properties[] = { "cost-per-metre", "cost-lump-sum" };
      GtkEntry *entries[] = { self->per_metre_entry, self->lump_sum_entry };
      g_autofree char *summary = _rugosa_cost_group_pump_summary (self);

      for (guint i = 0; i < G_N_ELEMENTS (properties); i++)
        {
          double v = rugosa_line_get_double (self->line, properties[i]);
          g_autofree char *text = NULL;

          /* a refused text stays as typed, beside its sentence */
          if (g_hash_table_contains (self->errors, properties[i]))
            continue;
          if (v > 0.0)
            {
              char buf[G_ASCII_DTOSTR_BUF_SIZE];

              text = rugosa_display_localize (g_strdup (g_ascii_formatd (buf, sizeof buf, "%.10g", v)));
            }
          if (g_strcmp0 (gtk_editable_get_text (GTK_EDITABLE (entries[i])), text ? text : "") != 0)
            gtk_editable_set_text (GTK_EDITABLE (entries[i]), text ? text : "");
        }
      if (g_strcmp0 (adw_expander_row_get_subtitle (self->pump_row), summary) != 0)
        adw_expander_row_set_subtitle (self->pump_row, summary);
      _rugosa_cost_group_fill_points (self);
    }
  self->updating = FALSE;
}

void
rugosa_cost_group_set_project (RugosaCostGroup *self,
                               RugosaProject   *project)
{
  g_return_if_fail (RUGOSA_IS_COST_GROUP (self));
  self->project = project;
  rugosa_cost_group_refresh (self);
}

void
rugosa_cost_group_set_line (RugosaCostGroup *self,
                            RugosaLine      *line)
{
  g_return_if_fail (RUGOSA_IS_COST_GROUP (self));

  if (self->line != line)
    {
      /* errors belong to the line being edited */
      g_hash_table_remove_all (self->errors);
      _rugosa_cost_group_mark (self, "cost-per-metre", GTK_WIDGET (self->per_metre_entry), self->per_metre_row, NULL);
      _rugosa_cost_group_mark (self, "cost-lump-sum", GTK_WIDGET (self->lump_sum_entry), self->lump_sum_row, NULL);
    }
  if (self->line != line)
    g_clear_pointer (&self->shown_curve, g_variant_unref);
  g_set_object (&self->line, line);
  rugosa_cost_group_refresh (self);
}

void
rugosa_cost_group_refresh_results (RugosaCostGroup *self)
{
  g_autofree char *summary = NULL;

  g_return_if_fail (RUGOSA_IS_COST_GROUP (self));
  if (self->line == NULL)
    return;
  summary = _rugosa_cost_group_pump_summary (self);
  if (g_strcmp0 (adw_expander_row_get_subtitle (self->pump_row), summary) != 0)
    adw_expander_row_set_subtitle (self->pump_row, summary);
}

gboolean
rugosa_cost_group_commit_text (RugosaCostGroup *self,
                               const char      *field,
                               const char      *text)
{
  g_return_val_if_fail (RUGOSA_IS_COST_GROUP (self), FALSE);

  if (g_str_equal (field, "cost-per-metre") || g_str_equal (field, "cost-lump-sum"))
    {
      GtkEntry *entry = g_str_equal (field, "cost-per-metre") ? self->per_metre_entry : self->lump_sum_entry;

      gtk_editable_set_text (GTK_EDITABLE (entry), text);
      return _rugosa_cost_group_money_commit (self, entry);
    }
  for (guint i = 0; i < self->point_rows->len; i++)
    {
      GtkWidget *row = g_ptr_array_index (self->point_rows, i);
      g_autofree char *flow = g_strdup_printf ("flow:%u", i);
      g_autofree char *head = g_strdup_printf ("head:%u", i);
      gboolean want_flow = g_str_equal (field, flow);

      if (!want_flow && !g_str_equal (field, head))
        continue;
      /* the row's suffixes: the flow's entry, the head's, the button */
      for (GtkWidget *w = gtk_widget_get_first_child (row); w != NULL;)
        {
          GtkWidget *found = NULL;
          GtkWidget *stack[64];
          int top = 0;

          stack[top++] = w;
          while (top > 0 && found == NULL)
            {
              GtkWidget *c = stack[--top];

              if (GTK_IS_ENTRY (c) && (g_object_get_data (G_OBJECT (c), "is-flow") != NULL) == want_flow
                  && g_object_get_data (G_OBJECT (c), "index") == GUINT_TO_POINTER (i))
                found = c;
              for (GtkWidget *k = gtk_widget_get_first_child (c); k != NULL && top < 64; k = gtk_widget_get_next_sibling (k))
                stack[top++] = k;
            }
          if (found != NULL)
            {
              gtk_editable_set_text (GTK_EDITABLE (found), text);
              return _rugosa_cost_group_point_commit (self, GTK_ENTRY (found));
            }
          w = gtk_widget_get_next_sibling (w);
        }
    }
  return FALSE;
}

static void
rugosa_cost_group_dispose (GObject *object)
{
  RugosaCostGroup *self = RUGOSA_COST_GROUP (object);

  g_clear_object (&self->line);
  g_clear_pointer (&self->shown_curve, g_variant_unref);
  g_clear_pointer (&self->shown_units, g_free);
  g_clear_pointer (&self->point_rows, g_ptr_array_unref);
  g_clear_pointer (&self->errors, g_hash_table_unref);
  gtk_widget_dispose_template (GTK_WIDGET (self), RUGOSA_TYPE_COST_GROUP);
  G_OBJECT_CLASS (rugosa_cost_group_parent_class)->dispose (object);
}

static void
rugosa_cost_group_class_init (RugosaCostGroupClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = rugosa_cost_group_dispose;

  signals[EDIT_LINE] =
    g_signal_new ("edit-line", G_TYPE_FROM_CLASS (klass), G_SIGNAL_RUN_LAST,
                  0, NULL, NULL, NULL, G_TYPE_NONE, 3,
                  RUGOSA_TYPE_LINE, G_TYPE_STRING, G_TYPE_VARIANT);

  gtk_widget_class_set_template_from_resource (widget_class, "/org/rugosa/Rugosa/rugosa-cost-group.ui");
#define BIND(name) gtk_widget_class_bind_template_child (widget_class, RugosaCostGroup, name)
  BIND (group);
  BIND (per_metre_row);
  BIND (per_metre_entry);
  BIND (per_metre_unit);
  BIND (lump_sum_row);
  BIND (lump_sum_entry);
  BIND (lump_sum_unit);
  BIND (pump_row);
  BIND (point_add_row);
#undef BIND
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_cost_group_money_activate);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_cost_group_point_add);

  gtk_widget_class_set_layout_manager_type (widget_class, GTK_TYPE_BIN_LAYOUT);
  gtk_widget_class_set_css_name (widget_class, "costgroup");
}

static void
rugosa_cost_group_init (RugosaCostGroup *self)
{
  const RugosaField *curve = rugosa_field_find ("pump-curve");

  self->point_rows = g_ptr_array_new ();
  self->errors = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, g_free);
  gtk_widget_init_template (GTK_WIDGET (self));

  /* titles and explanations from the field tables */
  {
    AdwActionRow *rows[] = { self->per_metre_row, self->lump_sum_row };
    GtkEntry *entries[] = { self->per_metre_entry, self->lump_sum_entry };
    const char *properties[] = { "cost-per-metre", "cost-lump-sum" };

    for (guint i = 0; i < G_N_ELEMENTS (rows); i++)
      {
        const RugosaField *row = rugosa_field_find (properties[i]);
        GtkEventController *focus = gtk_event_controller_focus_new ();

        adw_preferences_row_set_title (ADW_PREFERENCES_ROW (rows[i]), rugosa_field_label (row));
        adw_action_row_set_subtitle (rows[i], _(row->help));
        g_object_set_data_full (G_OBJECT (rows[i]), "plain-subtitle", g_strdup (_(row->help)), g_free);
        gtk_accessible_update_property (GTK_ACCESSIBLE (entries[i]), GTK_ACCESSIBLE_PROPERTY_LABEL,
                                        rugosa_field_label (row), -1);
        g_signal_connect (focus, "leave", G_CALLBACK (_rugosa_cost_group_money_leave), self);
        gtk_widget_add_controller (GTK_WIDGET (entries[i]), focus);
      }
  }
  adw_preferences_row_set_title (ADW_PREFERENCES_ROW (self->pump_row), rugosa_field_label (curve));
  gtk_widget_set_tooltip_text (GTK_WIDGET (self->pump_row), _(curve->help));
  gtk_widget_set_sensitive (GTK_WIDGET (self), FALSE);
}
