/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-results-table"

#include "config.h"

#include <glib/gi18n.h>
#include <math.h>
#include <string.h>

#include "model/rugosa-display.h"
#include "model/rugosa-output.h"
#include "model/rugosa-units.h"
#include "rugosa-readout.h"
#include "rugosa-results-table.h"

struct _RugosaResultsTable
{
  GtkWidget parent_instance;

  /* template widgets */
  GtkColumnView *view;

  /* borrowed references */
  RugosaProject *project;

  /* owned references */
  GPtrArray  *bound;   /* GtkInscription cells on screen */
};

G_DEFINE_FINAL_TYPE (RugosaResultsTable, rugosa_results_table, GTK_TYPE_WIDGET)

typedef struct {
  const char *id;
  const char *title;      /* the compact table's own short heading */
  const char *output;     /* the output key of its value, or NULL */
  gboolean numeric;
  /* pumping and cost columns: the title names the project's unit of
   * `project_unit` (rugosa_settings_get_unit) */
  gboolean by_project;
  RugosaDisplayQuantity project_unit;
} Column;

static const Column columns[] = {
  { "name", N_("Line option"), NULL, FALSE },
  { "velocity", N_("Velocity"), "velocity", TRUE },
  { "head-loss", N_("Head loss"), "head_loss_total", TRUE },
  { "change", N_("Loss vs new"), NULL, TRUE },
  /* the pumping energy and cost of the line (rugosa-life-cycle.c) */
  { "pump-power", N_("Pump power"), "pump_power", TRUE },
  { "energy", N_("Energy"), "energy", TRUE },
  { "energy-cost", N_("Energy cost a year"), "energy_cost_per_year", TRUE },
  { "life-cycle-cost", N_("Life-cycle cost"), "life_cycle_cost", TRUE },
  { "duty-flow", N_("Duty flow, new → aged"), NULL, TRUE },
  { "gradient", N_("Gradient"), "gradient", TRUE },
  { "pressure-drop", N_("Pressure drop"), "pressure_drop", TRUE },
  { "reynolds", N_("Re"), "reynolds", TRUE },
  { "f", N_("f (Darcy)"), "friction_factor", TRUE },
  { "hw-c", N_("Hazen–Williams C"), NULL, TRUE },
  { "regime", N_("Regime"), NULL, FALSE },
  { "zone", N_("Roughness zone"), NULL, FALSE },
  { "elasticity", N_("∂ln f/∂ln ε"), "roughness_elasticity", TRUE },
  { "flow", N_("Design flow"), NULL, TRUE },
  { "warnings", N_("Remarks"), NULL, FALSE },
};

GtkWidget *
rugosa_results_table_new (void)
{
  return g_object_new (RUGOSA_TYPE_RESULTS_TABLE, NULL);
}

static const Column *
_rugosa_results_table_column (const char *id)
{
  for (guint i = 0; i < G_N_ELEMENTS (columns); i++)
    if (g_strcmp0 (columns[i].id, id) == 0)
      return &columns[i];
  return NULL;
}

/* The display quantity of a column (RUGOSA_DISPLAY_NUMBER: none). */
static RugosaDisplayQuantity
_rugosa_results_table_display (const Column *col)
{
  const RugosaOutputKey *key = col->output ? rugosa_output_key_find (col->output) : NULL;

  if (key != NULL)
    return key->display;
  /* The design flow is an input, the duty flows a pair of output keys. */
  if (g_strcmp0 (col->id, "flow") == 0 || g_strcmp0 (col->id, "duty-flow") == 0)
    return RUGOSA_DISPLAY_FLOW;
  return RUGOSA_DISPLAY_NUMBER;
}

/* A number in the project's unit for `display`, for the screen. */
static char *
_rugosa_results_table_number (RugosaResultsTable   *self,
                              RugosaDisplayQuantity display,
                              double                si)
{
  const RugosaDisplayInfo *info = rugosa_display_info (display);

  if (info == NULL)
    return rugosa_display_significant_screen (si, 4);
  return rugosa_display_number_screen (info->quantity, si,
                                       rugosa_settings_get_unit (rugosa_project_get_settings (self->project), display));
}

char *
rugosa_results_table_format_cell (RugosaResultsTable *self,
                                  RugosaLine         *line,
                                  const char         *column)
{
  const RugosaLineResults *res;
  const RugosaOperatingPoint *p;
  const Column *col = _rugosa_results_table_column (column);
  const RugosaOutputKey *key;

  if (col == NULL)
    return g_strdup ("");
  if (g_strcmp0 (column, "name") == 0)
    return g_strdup (rugosa_line_get_name (line));
  if (self->project == NULL)
    return g_strdup ("");
  res = rugosa_readout_results (self->project, line);
  if (g_strcmp0 (column, "warnings") == 0)
    {
      g_autofree char *w = rugosa_readout_warnings (self->project, line);
      char *nl;

      if (w == NULL)
        return g_strdup ("");
      /* One line in the table; the tooltip and the panel show all. */
      if ((nl = strchr (w, '\n')) != NULL)
        {
          *nl = '\0';
          return g_strdup_printf ("%s …", w);
        }
      return g_steal_pointer (&w);
    }
  if (res == NULL || !res->ok)
    return g_strdup ("—");
  p = &res->points[RUGOSA_FLOW_DESIGN];
  if (!p->present || !p->ok)
    return g_strdup ("—");

  if (g_strcmp0 (column, "flow") == 0)
    return _rugosa_results_table_number (self, RUGOSA_DISPLAY_FLOW, p->flow_m3_s);
  if (g_strcmp0 (column, "reynolds") == 0)
    {
      char buf[G_ASCII_DTOSTR_BUF_SIZE];
      /* Whole, as the trade writes it. */
      return g_strdup (g_ascii_formatd (buf, sizeof buf, "%.0f", p->result.reynolds));
    }
  if (g_strcmp0 (column, "hw-c") == 0)
    {
      /* water lines only; the tooltip says where the formula stands */
      char *c = rugosa_readout_hazen_williams (p);
      return c != NULL ? c : g_strdup ("—");
    }
  if (g_strcmp0 (column, "regime") == 0)
    return g_strdup (rugosa_readout_regime (p->result.friction.regime));
  if (g_strcmp0 (column, "zone") == 0)
    return g_strdup (rugosa_readout_zone (p->result.friction.zone));
  if (g_strcmp0 (column, "change") == 0)
    return rugosa_readout_change (p->head_loss_ratio_to_new);
  if (g_strcmp0 (column, "duty-flow") == 0)
    {
      const RugosaOutputKey *kn = rugosa_output_key_find ("duty_flow_new");
      const RugosaOutputKey *ka = rugosa_output_key_find ("duty_flow");
      g_autofree char *qn = rugosa_output_present_for (kn, res, p)
                              ? _rugosa_results_table_number (self, RUGOSA_DISPLAY_FLOW, kn->number (res, p))
                              : g_strdup ("—");
      g_autofree char *qa = rugosa_output_present_for (ka, res, p)
                              ? _rugosa_results_table_number (self, RUGOSA_DISPLAY_FLOW, ka->number (res, p))
                              : g_strdup ("—");

      if (!res->energy.has_pump)
        return g_strdup ("—");
      /* TRANSLATORS: the duty flow when new and at the service age */
      return g_strdup_printf (_("%s → %s"), qn, qa);
    }
  key = col->output ? rugosa_output_key_find (col->output) : NULL;
  if (key != NULL && key->kind == RUGOSA_OUTPUT_NUMBER)
    {
      if (!rugosa_output_present_for (key, res, p))
        return g_strdup ("—");
      if (key->display == RUGOSA_DISPLAY_MONEY)
        return rugosa_display_money_screen (key->number (res, p), NULL);
      return _rugosa_results_table_number (self, key->display, key->number (res, p));
    }
  return g_strdup ("");
}

/* Cells are GtkInscriptions: their size does not follow their text, so a
 * slider move that changes every number repaints the table without laying
 * out the window again. */
static void
_rugosa_results_table_update_label (RugosaResultsTable *self,
                                    GtkInscription     *label)
{
  RugosaLine *line = g_object_get_data (G_OBJECT (label), "line");
  const char *column = g_object_get_data (G_OBJECT (label), "column");
  g_autofree char *text = NULL;

  if (line == NULL)
    return;
  text = rugosa_results_table_format_cell (self, line, column);
  if (g_strcmp0 (gtk_inscription_get_text (label), text) != 0)
    gtk_inscription_set_text (label, text);
  if (g_strcmp0 (column, "hw-c") == 0)
    {
      /* a C outside the formula's range is shown as such; the reason is
       * the cell's tooltip (_rugosa_results_table_tooltip) */
      const RugosaLineResults *res = self->project ? rugosa_readout_results (self->project, line) : NULL;

      if (res != NULL && res->ok && res->points[RUGOSA_FLOW_DESIGN].hazen_williams_notes != 0)
        gtk_widget_add_css_class (GTK_WIDGET (label), "dim-label");
      else
        gtk_widget_remove_css_class (GTK_WIDGET (label), "dim-label");
    }
}

/* The cell's tooltip — every warning of the row's line, or where the
 * Hazen–Williams C stands — asked for when the pointer rests on the cell:
 * setting the tooltip at every slider step made GTK query it again each
 * time. */
static gboolean
_rugosa_results_table_tooltip (GtkWidget          *label,
                               int                 x,
                               int                 y,
                               gboolean            keyboard,
                               GtkTooltip         *tooltip,
                               RugosaResultsTable *self)
{
  RugosaLine *line = g_object_get_data (G_OBJECT (label), "line");
  const char *column = g_object_get_data (G_OBJECT (label), "column");
  g_autofree char *text = NULL;

  if (line == NULL || self->project == NULL)
    return FALSE;
  if (g_strcmp0 (column, "warnings") == 0)
    text = rugosa_readout_warnings (self->project, line);
  else if (g_strcmp0 (column, "hw-c") == 0)
    {
      const RugosaLineResults *res = rugosa_readout_results (self->project, line);

      if (res != NULL && res->ok)
        text = rugosa_readout_hazen_williams_notes (&res->points[RUGOSA_FLOW_DESIGN]);
    }
  if (text == NULL)
    return FALSE;
  gtk_tooltip_set_text (tooltip, text);
  return TRUE;
}

static void _rugosa_results_table_update_titles (RugosaResultsTable *self);

void
rugosa_results_table_refresh (RugosaResultsTable *self)
{
  g_return_if_fail (RUGOSA_IS_RESULTS_TABLE (self));
  /* the project's units and currency may have changed */
  _rugosa_results_table_update_titles (self);
  for (guint i = 0; i < self->bound->len; i++)
    _rugosa_results_table_update_label (self, GTK_INSCRIPTION (g_ptr_array_index (self->bound, i)));
}

char *
rugosa_results_table_cell_text (RugosaResultsTable *self,
                                guint               position,
                                const char         *column)
{
  RugosaLine *line;

  if (self->project == NULL || position >= rugosa_project_get_n_lines (self->project))
    return NULL;
  line = rugosa_project_get_line (self->project, position);
  for (guint i = 0; i < self->bound->len; i++)
    {
      GtkInscription *label = g_ptr_array_index (self->bound, i);
      if (g_object_get_data (G_OBJECT (label), "line") == line
          && g_strcmp0 (g_object_get_data (G_OBJECT (label), "column"), column) == 0)
        return g_strdup (gtk_inscription_get_text (label));
    }
  return NULL;
}

static void
_rugosa_results_table_setup (GtkSignalListItemFactory *factory,
                             GtkListItem              *item,
                             RugosaResultsTable       *self)
{
  const Column *col = g_object_get_data (G_OBJECT (factory), "column");
  GtkWidget *label = gtk_inscription_new (NULL);
  GtkInscription *ins = GTK_INSCRIPTION (label);

  gtk_inscription_set_xalign (ins, col->numeric ? 1.0 : 0.0);
  gtk_inscription_set_text_overflow (ins, GTK_INSCRIPTION_OVERFLOW_ELLIPSIZE_END);
  gtk_inscription_set_min_chars (ins, col->numeric ? 6 : 8);
  gtk_inscription_set_nat_chars (ins, col->numeric ? 9 : 14);
  if (col->numeric)
    gtk_widget_add_css_class (label, "numeric");
  if (g_strcmp0 (col->id, "warnings") == 0)
    {
      gtk_inscription_set_nat_chars (ins, 40);
      gtk_widget_add_css_class (label, "warning");
    }
  if (g_strcmp0 (col->id, "warnings") == 0 || g_strcmp0 (col->id, "hw-c") == 0)
    {
      gtk_widget_set_has_tooltip (label, TRUE);
      g_signal_connect (label, "query-tooltip", G_CALLBACK (_rugosa_results_table_tooltip), self);
    }
  if (g_strcmp0 (col->id, "zone") == 0)
    gtk_inscription_set_nat_chars (ins, 20);
  if (g_strcmp0 (col->id, "duty-flow") == 0)
    gtk_inscription_set_nat_chars (ins, 15);
  g_object_set_data (G_OBJECT (label), "column", (gpointer) col->id);
  gtk_list_item_set_child (item, label);
}

static void
_rugosa_results_table_bind (GtkSignalListItemFactory *factory,
                            GtkListItem              *item,
                            RugosaResultsTable       *self)
{
  GtkWidget *label = gtk_list_item_get_child (item);

  g_object_set_data (G_OBJECT (label), "line", gtk_list_item_get_item (item));
  g_ptr_array_add (self->bound, label);
  _rugosa_results_table_update_label (self, GTK_INSCRIPTION (label));
}

static void
_rugosa_results_table_unbind (GtkSignalListItemFactory *factory,
                              GtkListItem              *item,
                              RugosaResultsTable       *self)
{
  GtkWidget *label = gtk_list_item_get_child (item);

  g_ptr_array_remove_fast (self->bound, label);
  g_object_set_data (G_OBJECT (label), "line", NULL);
}

static char *
_rugosa_results_table_title (RugosaResultsTable *self,
                             const Column       *col)
{
  RugosaDisplayQuantity display = _rugosa_results_table_display (col);
  const char *unit = NULL;

  /* money shows the project's currency label */
  if (self->project != NULL
      && (rugosa_display_info (display) != NULL || display == RUGOSA_DISPLAY_MONEY))
    unit = rugosa_settings_get_unit (rugosa_project_get_settings (self->project), display);
  if (unit != NULL)
    /* TRANSLATORS: a column title and its unit, e.g. "Velocity (ft/s)" */
    return g_strdup_printf (_("%s (%s)"), _(col->title), rugosa_display_unit_label (display, unit));
  return g_strdup (_(col->title));
}

static void
_rugosa_results_table_update_titles (RugosaResultsTable *self)
{
  GListModel *cols = gtk_column_view_get_columns (self->view);

  for (guint i = 0; i < g_list_model_get_n_items (cols); i++)
    {
      g_autoptr (GtkColumnViewColumn) c = g_list_model_get_item (cols, i);
      g_autofree char *title = _rugosa_results_table_title (self, g_object_get_data (G_OBJECT (c), "column"));

      /* Titles change with the project's units only: a slider move
       * leaves the header alone. */
      if (g_strcmp0 (gtk_column_view_column_get_title (c), title) != 0)
        gtk_column_view_column_set_title (c, title);
    }
}

const char *
rugosa_results_table_get_column_title (RugosaResultsTable *self,
                                       const char         *column)
{
  GListModel *cols;

  g_return_val_if_fail (RUGOSA_IS_RESULTS_TABLE (self), NULL);
  cols = gtk_column_view_get_columns (self->view);
  for (guint i = 0; i < g_list_model_get_n_items (cols); i++)
    {
      g_autoptr (GtkColumnViewColumn) c = g_list_model_get_item (cols, i);
      const Column *col = g_object_get_data (G_OBJECT (c), "column");

      if (g_strcmp0 (col->id, column) == 0)
        return gtk_column_view_column_get_title (c);
    }
  return NULL;
}

void
rugosa_results_table_set_context (RugosaResultsTable *self,
                                  RugosaProject      *project,
                                  GtkSingleSelection *selection)
{
  g_return_if_fail (RUGOSA_IS_RESULTS_TABLE (self));

  self->project = project;
  gtk_column_view_set_model (self->view, GTK_SELECTION_MODEL (selection));
  rugosa_results_table_refresh (self);
}

static void
rugosa_results_table_dispose (GObject *object)
{
  RugosaResultsTable *self = RUGOSA_RESULTS_TABLE (object);

  gtk_widget_dispose_template (GTK_WIDGET (self), RUGOSA_TYPE_RESULTS_TABLE);
  /* Template children without an id are not cleared by the call above. */
  for (GtkWidget *child; (child = gtk_widget_get_first_child (GTK_WIDGET (self))) != NULL;)
    gtk_widget_unparent (child);
  g_clear_pointer (&self->bound, g_ptr_array_unref);
  G_OBJECT_CLASS (rugosa_results_table_parent_class)->dispose (object);
}

static void
rugosa_results_table_class_init (RugosaResultsTableClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = rugosa_results_table_dispose;
  gtk_widget_class_set_template_from_resource (widget_class, "/org/rugosa/Rugosa/rugosa-results-table.ui");
  gtk_widget_class_bind_template_child (widget_class, RugosaResultsTable, view);
  gtk_widget_class_set_layout_manager_type (widget_class, GTK_TYPE_BIN_LAYOUT);
  gtk_widget_class_set_css_name (widget_class, "resultstable");
}

static void
rugosa_results_table_init (RugosaResultsTable *self)
{
  self->bound = g_ptr_array_new ();
  gtk_widget_init_template (GTK_WIDGET (self));

  for (guint i = 0; i < G_N_ELEMENTS (columns); i++)
    {
      GtkListItemFactory *factory = gtk_signal_list_item_factory_new ();
      GtkColumnViewColumn *c;

      g_object_set_data (G_OBJECT (factory), "column", (gpointer) &columns[i]);
      g_signal_connect (factory, "setup", G_CALLBACK (_rugosa_results_table_setup), self);
      g_signal_connect (factory, "bind", G_CALLBACK (_rugosa_results_table_bind), self);
      g_signal_connect (factory, "unbind", G_CALLBACK (_rugosa_results_table_unbind), self);
      c = gtk_column_view_column_new (_(columns[i].title), factory);
      g_object_set_data (G_OBJECT (c), "column", (gpointer) &columns[i]);
      gtk_column_view_column_set_resizable (c, TRUE);
      if (g_strcmp0 (columns[i].id, "warnings") == 0)
        gtk_column_view_column_set_expand (c, TRUE);
      if (g_strcmp0 (columns[i].id, "name") == 0)
        gtk_column_view_column_set_fixed_width (c, 170);
      gtk_column_view_append_column (self->view, c);
      g_object_unref (c);
    }
}
