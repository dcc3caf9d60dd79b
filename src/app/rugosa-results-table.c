/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-results-table"

#include "config.h"

#include <glib/gi18n.h>
#include <math.h>
#include <string.h>

#include "model/rugosa-display.h"
#include "rugosa-readout.h"
#include "rugosa-results-table.h"

struct _RugosaResultsTable
{
  GtkWidget parent_instance;

  /* template widgets */
  GtkColumnView *view;

  /* borrowed references */
  RugosaProject *project;
  GSettings     *settings;

  /* owned references */
  GPtrArray  *bound;   /* GtkInscription cells on screen */
  GHashTable *units;   /* settings key -> unit, read once per change */
};

G_DEFINE_FINAL_TYPE (RugosaResultsTable, rugosa_results_table, GTK_TYPE_WIDGET)

typedef struct {
  const char *id;
  const char *title;
  const char *unit_key;   /* GSettings key whose unit goes in the title */
  gboolean numeric;
} Column;

static const Column columns[] = {
  { "name", N_("Line option"), NULL, FALSE },
  { "velocity", N_("Velocity"), "unit-velocity", TRUE },
  { "head-loss", N_("Head loss"), "unit-head", TRUE },
  { "change", N_("Loss vs new"), NULL, TRUE },
  { "gradient", N_("Gradient"), "unit-gradient", TRUE },
  { "pressure-drop", N_("Pressure drop"), "unit-pressure", TRUE },
  { "reynolds", N_("Re"), NULL, TRUE },
  { "f", N_("f (Darcy)"), NULL, TRUE },
  { "regime", N_("Regime"), NULL, FALSE },
  { "zone", N_("Roughness zone"), NULL, FALSE },
  { "elasticity", N_("∂ln f/∂ln ε"), NULL, TRUE },
  { "flow", N_("Design flow"), "unit-flow", TRUE },
  { "warnings", N_("Remarks"), NULL, FALSE },
};

GtkWidget *
rugosa_results_table_new (void)
{
  return g_object_new (RUGOSA_TYPE_RESULTS_TABLE, NULL);
}

static char *
_unit (RugosaResultsTable *self, const char *key)
{
  const char *unit;

  if (self->settings == NULL)
    return NULL;
  /* A slider move refreshes every cell: keep GSettings out of that loop. */
  unit = g_hash_table_lookup (self->units, key);
  if (unit == NULL)
    {
      unit = g_settings_get_string (self->settings, key);
      g_hash_table_insert (self->units, (gpointer) key, (gpointer) unit);
    }
  return g_strdup (unit);
}

char *
rugosa_results_table_format_cell (RugosaResultsTable *self,
                                  RugosaLine         *line,
                                  const char         *column)
{
  const RugosaLineResults *res;
  const RugosaOperatingPoint *p;
  const RgLineResult *r;

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
  r = &p->result;

  if (g_strcmp0 (column, "flow") == 0)
    {
      g_autofree char *u = _unit (self, "unit-flow");
      return rugosa_display_number_screen (RG_QTY_FLOW, p->flow_m3_s, u);
    }
  if (g_strcmp0 (column, "velocity") == 0)
    {
      g_autofree char *u = _unit (self, "unit-velocity");
      return rugosa_display_number_screen (RG_QTY_VELOCITY, r->velocity_m_s, u);
    }
  if (g_strcmp0 (column, "reynolds") == 0)
    {
      char buf[G_ASCII_DTOSTR_BUF_SIZE];
      return g_strdup (g_ascii_formatd (buf, sizeof buf, "%.0f", r->reynolds));
    }
  if (g_strcmp0 (column, "f") == 0)
    return rugosa_display_significant_screen (r->friction.f, 4);
  if (g_strcmp0 (column, "regime") == 0)
    return g_strdup (rugosa_readout_regime (r->friction.regime));
  if (g_strcmp0 (column, "zone") == 0)
    return g_strdup (rugosa_readout_zone (r->friction.zone));
  if (g_strcmp0 (column, "head-loss") == 0)
    {
      g_autofree char *u = _unit (self, "unit-head");
      return rugosa_display_number_screen (RG_QTY_LENGTH, r->head_loss_total_m, u);
    }
  if (g_strcmp0 (column, "pressure-drop") == 0)
    {
      g_autofree char *u = _unit (self, "unit-pressure");
      return rugosa_display_number_screen (RG_QTY_PRESSURE, r->pressure_drop_pa, u);
    }
  if (g_strcmp0 (column, "gradient") == 0)
    /* m per 100 m and ft per 100 ft are the same ratio. */
    return rugosa_display_significant_screen (r->gradient_m_per_100m, 3);
  if (g_strcmp0 (column, "elasticity") == 0)
    return rugosa_display_significant_screen (r->friction.roughness_elasticity, 3);
  if (g_strcmp0 (column, "change") == 0)
    return rugosa_readout_change (p->head_loss_ratio_to_new);
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
}

/* Every warning of the row's line, asked for when the pointer rests on
 * the cell: setting the tooltip at every slider step made GTK query it
 * again each time. */
static gboolean
_rugosa_results_table_warnings_tooltip (GtkWidget          *label,
                                        int                 x,
                                        int                 y,
                                        gboolean            keyboard,
                                        GtkTooltip         *tooltip,
                                        RugosaResultsTable *self)
{
  RugosaLine *line = g_object_get_data (G_OBJECT (label), "line");
  g_autofree char *all = NULL;

  if (line == NULL || self->project == NULL)
    return FALSE;
  all = rugosa_readout_warnings (self->project, line);
  if (all == NULL)
    return FALSE;
  gtk_tooltip_set_text (tooltip, all);
  return TRUE;
}

void
rugosa_results_table_refresh (RugosaResultsTable *self)
{
  g_return_if_fail (RUGOSA_IS_RESULTS_TABLE (self));
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
      gtk_widget_set_has_tooltip (label, TRUE);
      g_signal_connect (label, "query-tooltip", G_CALLBACK (_rugosa_results_table_warnings_tooltip), self);
    }
  if (g_strcmp0 (col->id, "zone") == 0)
    gtk_inscription_set_nat_chars (ins, 20);
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

static void
_rugosa_results_table_update_titles (RugosaResultsTable *self)
{
  GListModel *cols = gtk_column_view_get_columns (self->view);

  for (guint i = 0; i < g_list_model_get_n_items (cols); i++)
    {
      g_autoptr (GtkColumnViewColumn) c = g_list_model_get_item (cols, i);
      const Column *col = g_object_get_data (G_OBJECT (c), "column");
      g_autofree char *unit = col->unit_key ? _unit (self, col->unit_key) : NULL;
      g_autofree char *title = NULL;

      if (unit)
        title = g_strdup_printf ("%s (%s)", _(col->title), rugosa_display_unit_symbol (unit));
      else
        title = g_strdup (_(col->title));
      gtk_column_view_column_set_title (c, title);
    }
}

static void
_rugosa_results_table_settings_changed (GSettings          *settings,
                                        const char         *key,
                                        RugosaResultsTable *self)
{
  if (g_str_has_prefix (key, "unit-"))
    {
      g_hash_table_remove_all (self->units);
      _rugosa_results_table_update_titles (self);
      rugosa_results_table_refresh (self);
    }
}

void
rugosa_results_table_set_context (RugosaResultsTable *self,
                                  RugosaProject      *project,
                                  GSettings          *settings,
                                  GtkSingleSelection *selection)
{
  g_return_if_fail (RUGOSA_IS_RESULTS_TABLE (self));

  if (self->settings)
    g_signal_handlers_disconnect_by_data (self->settings, self);
  self->project = project;
  self->settings = settings;
  if (settings)
    g_signal_connect_object (settings, "changed", G_CALLBACK (_rugosa_results_table_settings_changed), self, 0);
  gtk_column_view_set_model (self->view, GTK_SELECTION_MODEL (selection));
  _rugosa_results_table_update_titles (self);
  rugosa_results_table_refresh (self);
}

static void
rugosa_results_table_dispose (GObject *object)
{
  RugosaResultsTable *self = RUGOSA_RESULTS_TABLE (object);

  if (self->settings)
    g_signal_handlers_disconnect_by_data (self->settings, self);
  self->settings = NULL;
  gtk_widget_dispose_template (GTK_WIDGET (self), RUGOSA_TYPE_RESULTS_TABLE);
  /* Template children without an id are not cleared by the call above. */
  for (GtkWidget *child; (child = gtk_widget_get_first_child (GTK_WIDGET (self))) != NULL;)
    gtk_widget_unparent (child);
  g_clear_pointer (&self->bound, g_ptr_array_unref);
  g_clear_pointer (&self->units, g_hash_table_unref);
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
  self->units = g_hash_table_new_full (g_str_hash, g_str_equal, NULL, g_free);
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
