/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The sizing assistant's results: the sizing of the duty, the table of
 * sizes with their verdicts, the summary and the inverse results, the
 * ladder on the main window's chart, and adding the chosen sizes as line
 * options (see rugosa-sizing-window.c for the form and the object). */
#define G_LOG_DOMAIN "rugosa-sizing-window"

#include "config.h"

#include <glib/gi18n.h>
#include <math.h>
#include <string.h>

#include "chart/rugosa-chart-sizing.h"
#include "core/catalog.h"
#include "model/rugosa-display.h"
#include "model/rugosa-fields.h"
#include "model/rugosa-history.h"
#include "model/rugosa-units.h"
#include "rugosa-canvas.h"
#include "rugosa-sizing-window-private.h"

/* ---- results ---- */

static char *
_rugosa_sizing_window_number (RugosaSizingWindow    *self,
                              RugosaDisplayQuantity  dq,
                              double                 si)
{
  const RugosaDisplayInfo *info = rugosa_display_info (dq);

  return rugosa_display_number_screen (info->quantity, si, rugosa_settings_get_unit (_rugosa_sizing_window_settings (self), dq));
}

static char *
_rugosa_sizing_window_format (RugosaSizingWindow    *self,
                              RugosaDisplayQuantity  dq,
                              double                 si)
{
  const RugosaDisplayInfo *info = rugosa_display_info (dq);

  return rugosa_display_format_screen (info->quantity, si, rugosa_settings_get_unit (_rugosa_sizing_window_settings (self), dq));
}

static char *
_limit_labels (guint broken)
{
  GString *s = g_string_new (NULL);

  for (guint b = 0; b < RUGOSA_N_LIMITS; b++)
    if (broken & (1u << b))
      {
        if (s->len > 0)
          g_string_append (s, _(", "));
        g_string_append (s, rugosa_field_label (rugosa_limit_field ((RugosaLimit) (1u << b))));
      }
  return g_string_free (s, FALSE);
}

/* The verdict of candidate i, and its style class. */
static char *
_rugosa_sizing_window_verdict (RugosaSizingWindow *self,
                               guint               i,
                               const char        **style)
{
  const RugosaSizingCandidate *c = &self->sizing->candidates[i];
  const RugosaOperatingPoint *p = &c->results.points[RUGOSA_FLOW_DESIGN];
  g_autofree char *labels = NULL;

  if (!c->results.ok || !p->ok)
    {
      *style = "error";
      return g_strdup (c->results.ok ? p->error : c->results.error);
    }
  if ((int) i == self->sizing->recommended)
    {
      *style = "accent";
      return g_strdup (_("Recommended"));
    }
  if (c->passes)
    {
      *style = "success";
      return g_strdup (_("Passes"));
    }
  if (c->broken_new != 0)
    {
      *style = "error";
      labels = _limit_labels (c->broken_new | c->broken_aged);
      /* TRANSLATORS: the limits a size breaks, by their names */
      return g_strdup_printf (_("Breaks: %s"), labels);
    }
  *style = "warning";
  labels = _limit_labels (c->broken_aged);
  return g_strdup_printf (_("Breaks when aged: %s"), labels);
}

/* The verdict comes right after the size: it is what is read first. */
typedef enum {
  COL_CHOOSE, COL_SIZE, COL_VERDICT, COL_BORE, COL_VELOCITY, COL_GRADIENT, COL_LOSS, N_COLS
} Column;

/* The columns: their titles when the service age is 0, and when it is
 * not (a value new → at the age). */
static const struct {
  const char *title;            /* translatable */
  const char *title_aged;       /* translatable, or NULL: the same */
  RugosaDisplayQuantity dq;     /* for the unit in the title */
} columns[N_COLS] = {
  [COL_CHOOSE] = { N_("Add"), NULL, RUGOSA_DISPLAY_NUMBER },
  [COL_SIZE] = { N_("Size"), NULL, RUGOSA_DISPLAY_NUMBER },
  [COL_BORE] = { N_("Bore"), NULL, RUGOSA_DISPLAY_DIAMETER },
  [COL_VELOCITY] = { N_("Velocity"), NULL, RUGOSA_DISPLAY_VELOCITY },
  [COL_GRADIENT] = { N_("Gradient"), N_("Gradient new → aged"), RUGOSA_DISPLAY_GRADIENT },
  [COL_LOSS] = { N_("Head loss"), N_("Head loss new → aged"), RUGOSA_DISPLAY_HEAD },
  [COL_VERDICT] = { N_("Verdict"), NULL, RUGOSA_DISPLAY_NUMBER },
};

static int
_rugosa_sizing_window_index_of (RugosaSizingWindow *self,
                                const char         *designation)
{
  for (guint i = 0; self->sizing != NULL && i < self->sizing->n_candidates; i++)
    if (g_str_equal (self->sizing->candidates[i].pipe->designation, designation))
      return (int) i;
  return -1;
}

static void
_rugosa_sizing_window_update_add (RugosaSizingWindow *self)
{
  guint n = 0;
  g_autofree char *label = NULL;

  for (guint i = 0; self->sizing != NULL && i < self->sizing->n_candidates; i++)
    n += g_hash_table_contains (self->chosen, self->sizing->candidates[i].pipe->designation);
  if (n == 0)
    label = g_strdup (_("Add as Line Options"));
  else
    label = g_strdup_printf (g_dngettext (GETTEXT_PACKAGE, "Add %u Size as a Line Option",
                                          "Add %u Sizes as Line Options", n), n);
  gtk_button_set_label (self->add_button, label);
  gtk_widget_set_sensitive (GTK_WIDGET (self->add_button), n > 0);
}

static void
_rugosa_sizing_window_chose (GtkCheckButton     *check,
                             RugosaSizingWindow *self)
{
  const char *designation = g_object_get_data (G_OBJECT (check), "designation");

  if (self->updating || designation == NULL)
    return;
  if (gtk_check_button_get_active (check))
    g_hash_table_add (self->chosen, g_strdup (designation));
  else
    g_hash_table_remove (self->chosen, designation);
  self->user_chose = TRUE;
  _rugosa_sizing_window_update_add (self);
  _rugosa_sizing_window_update_ladder (self);
}

static void
_rugosa_sizing_window_setup_cell (GtkSignalListItemFactory *factory,
                                  GtkListItem              *item,
                                  RugosaSizingWindow       *self)
{
  Column col = GPOINTER_TO_INT (g_object_get_data (G_OBJECT (factory), "column"));
  GtkWidget *w;

  if (col == COL_CHOOSE)
    {
      w = gtk_check_button_new ();
      g_signal_connect (w, "toggled", G_CALLBACK (_rugosa_sizing_window_chose), self);
    }
  else
    {
      w = gtk_label_new (NULL);
      gtk_label_set_xalign (GTK_LABEL (w), col == COL_SIZE || col == COL_VERDICT ? 0.0f : 1.0f);
      if (col == COL_VERDICT)
        {
          gtk_label_set_ellipsize (GTK_LABEL (w), PANGO_ELLIPSIZE_END);
          gtk_label_set_width_chars (GTK_LABEL (w), 20);
          gtk_label_set_max_width_chars (GTK_LABEL (w), 30);
        }
      else if (col != COL_SIZE)
        gtk_widget_add_css_class (w, "numeric");
    }
  gtk_list_item_set_child (item, w);
}

static void
_rugosa_sizing_window_bind_cell (GtkSignalListItemFactory *factory,
                                 GtkListItem              *item,
                                 RugosaSizingWindow       *self)
{
  Column col = GPOINTER_TO_INT (g_object_get_data (G_OBJECT (factory), "column"));
  GtkWidget *w = gtk_list_item_get_child (item);
  const char *designation = gtk_string_object_get_string (gtk_list_item_get_item (item));
  int i = _rugosa_sizing_window_index_of (self, designation);
  const RugosaSizingCandidate *c;
  const RugosaOperatingPoint *p;
  g_autofree char *text = NULL;
  static const char *const styles[] = { "accent", "success", "error", "warning" };

  if (i < 0)
    return;
  c = &self->sizing->candidates[i];
  p = &c->results.points[RUGOSA_FLOW_DESIGN];
  if (col == COL_CHOOSE)
    {
      self->updating = TRUE;
      g_object_set_data_full (G_OBJECT (w), "designation", g_strdup (designation), g_free);
      gtk_check_button_set_active (GTK_CHECK_BUTTON (w), g_hash_table_contains (self->chosen, designation));
      gtk_widget_set_sensitive (w, c->results.ok && p->ok);
      self->updating = FALSE;
      return;
    }
  if (col == COL_SIZE)
    text = g_strdup (c->pipe->designation);
  else if (col == COL_VERDICT)
    {
      const char *style = NULL;

      text = _rugosa_sizing_window_verdict (self, (guint) i, &style);
      for (gsize s = 0; s < G_N_ELEMENTS (styles); s++)
        gtk_widget_remove_css_class (w, styles[s]);
      gtk_widget_add_css_class (w, style);
      gtk_widget_set_tooltip_text (w, text);
    }
  else if (!c->results.ok || !p->ok)
    text = g_strdup ("—");
  else
    {
      const gboolean aged = self->sizing->age_years > 0.0;

      switch (col)
        {
        case COL_BORE:
          text = _rugosa_sizing_window_number (self, RUGOSA_DISPLAY_DIAMETER, c->results.inner_diameter_m);
          break;
        case COL_VELOCITY:
          text = _rugosa_sizing_window_number (self, RUGOSA_DISPLAY_VELOCITY, p->result.velocity_m_s);
          break;
        case COL_GRADIENT:
        case COL_LOSS:
          {
            const RugosaDisplayQuantity dq = col == COL_GRADIENT ? RUGOSA_DISPLAY_GRADIENT : RUGOSA_DISPLAY_HEAD;
            const double v_new = col == COL_GRADIENT ? p->result_new.gradient_m_per_100m : p->result_new.head_loss_total_m;
            const double v_aged = col == COL_GRADIENT ? p->result.gradient_m_per_100m : p->result.head_loss_total_m;
            g_autofree char *a = _rugosa_sizing_window_number (self, dq, v_new);
            g_autofree char *b = aged ? _rugosa_sizing_window_number (self, dq, v_aged) : NULL;

            text = aged ? g_strdup_printf ("%s → %s", a, b) : g_steal_pointer (&a);
          }
          break;
        case COL_CHOOSE:
        case COL_SIZE:
        case COL_VERDICT:
        case N_COLS:
        default:
          break;
        }
    }
  gtk_label_set_text (GTK_LABEL (w), text != NULL ? text : "");
  if (col == COL_SIZE)
    {
      if (i == self->sizing->recommended)
        gtk_widget_add_css_class (w, "heading");
      else
        gtk_widget_remove_css_class (w, "heading");
    }
}

static void
_rugosa_sizing_window_update_titles (RugosaSizingWindow *self)
{
  GListModel *cols = gtk_column_view_get_columns (self->view);
  const gboolean aged = rugosa_settings_get_double (_rugosa_sizing_window_settings (self), "service-age") > 0.0;

  for (guint i = 0; i < g_list_model_get_n_items (cols); i++)
    {
      g_autoptr (GtkColumnViewColumn) c = g_list_model_get_item (cols, i);
      const char *unit = rugosa_settings_get_unit (_rugosa_sizing_window_settings (self), columns[i].dq);
      const char *name = _(aged && columns[i].title_aged ? columns[i].title_aged : columns[i].title);
      g_autofree char *title = unit ? g_strdup_printf ("%s (%s)", name, rugosa_display_unit_symbol (unit))
                                    : g_strdup (name);

      gtk_column_view_column_set_title (c, title);
    }
}

/* The ladder on the main window's chart, at the age shown. */
void
_rugosa_sizing_window_update_ladder (RugosaSizingWindow *self)
{
  RugosaCanvas *canvas = RUGOSA_CANVAS (rugosa_window_get_canvas (self->main_window));
  g_autofree RugosaChartRung *rungs = NULL;
  g_autofree gboolean *chosen = NULL;
  g_autoptr (GPtrArray) tips = g_ptr_array_new_with_free_func (g_free);
  RugosaChartRgba colour = { 0.2, 0.4, 0.6, 1.0 };
  GdkRGBA rgba;
  size_t n = 0;

  if (self->sizing == NULL)
    {
      rugosa_canvas_set_ladder (canvas, NULL, 0, NULL, NULL);
      return;
    }
  chosen = g_new0 (gboolean, MAX (self->sizing->n_candidates, 1));
  for (guint i = 0; i < self->sizing->n_candidates; i++)
    chosen[i] = g_hash_table_contains (self->chosen, self->sizing->candidates[i].pipe->designation);
  rungs = rugosa_chart_ladder_from_sizing (self->sizing, TRUE, chosen, &n);
  for (size_t r = 0; r < n; r++)
    {
      int i = _rugosa_sizing_window_index_of (self, rungs[r].label);
      const RugosaOperatingPoint *p = &self->sizing->candidates[i].results.points[RUGOSA_FLOW_DESIGN];
      const char *style = NULL;
      g_autofree char *v = _rugosa_sizing_window_format (self, RUGOSA_DISPLAY_VELOCITY, p->result.velocity_m_s);
      g_autofree char *h = _rugosa_sizing_window_format (self, RUGOSA_DISPLAY_HEAD, p->result.head_loss_total_m);
      g_autofree char *verdict = _rugosa_sizing_window_verdict (self, (guint) i, &style);

      /* TRANSLATORS: a size on the chart's ladder: designation, velocity,
       * total head loss at the service age, then its verdict */
      g_ptr_array_add (tips, g_strdup_printf (_("%s: %s, total head loss %s\n%s"), rungs[r].label, v, h, verdict));
    }
  g_ptr_array_add (tips, NULL);
  if (self->source != NULL && gdk_rgba_parse (&rgba, rugosa_line_get_colour (self->source)))
    {
      colour.r = rgba.red;
      colour.g = rgba.green;
      colour.b = rgba.blue;
    }
  rugosa_canvas_set_ladder (canvas, rungs, n, &colour, (const char *const *) tips->pdata);
}

static void
_rugosa_sizing_window_update_texts (RugosaSizingWindow *self)
{
  g_autofree char *summary = NULL;
  g_autoptr (GString) inverse = g_string_new (NULL);
  const double age = rugosa_settings_get_double (_rugosa_sizing_window_settings (self), "service-age");
  g_autofree char *age_text = _rugosa_sizing_window_format (self, RUGOSA_DISPLAY_AGE,
                                                            age * rugosa_field_find ("service-age")->to_si);

  gtk_widget_remove_css_class (GTK_WIDGET (self->summary_label), "error");
  if (self->sizing == NULL)
    {
      summary = g_strdup (self->error != NULL ? self->error : "");
      gtk_widget_add_css_class (GTK_WIDGET (self->summary_label), "error");
    }
  else if (self->sizing->recommended >= 0)
    {
      const RugosaSizingCandidate *c = &self->sizing->candidates[self->sizing->recommended];
      g_autofree char *bore = _rugosa_sizing_window_format (self, RUGOSA_DISPLAY_DIAMETER, c->results.inner_diameter_m);

      if (self->sizing->recommended_new != self->sizing->recommended && age > 0.0)
        summary = g_strdup_printf (_("Recommended: %s (bore %s), the smallest size within every limit, new and at a service age of %s; new, %s would do."),
                                   c->pipe->designation, bore, age_text,
                                   self->sizing->candidates[self->sizing->recommended_new].pipe->designation);
      else if (age > 0.0)
        summary = g_strdup_printf (_("Recommended: %s (bore %s), the smallest size within every limit, new and at a service age of %s."),
                                   c->pipe->designation, bore, age_text);
      else
        summary = g_strdup_printf (_("Recommended: %s (bore %s), the smallest size within every limit."),
                                   c->pipe->designation, bore);
    }
  else
    {
      summary = g_strdup (self->sizing->why_none != NULL ? self->sizing->why_none : "");
      gtk_widget_add_css_class (GTK_WIDGET (self->summary_label), "error");
    }
  gtk_label_set_text (self->summary_label, summary);

  /* The inverse problems: the smallest bore within the upper limits, and
   * the line option's flow at the head loss allowed. */
  if (self->sizing != NULL)
    {
      const char *material = _rugosa_sizing_window_material (self);
      g_autoptr (RugosaLine) trial = rugosa_line_duplicate (self->duty);
      RugosaLimits limits = self->sizing->limits;
      double d = 0.0, q = 0.0;
      RgError err = { 0 };

      g_object_set (trial, "material-id", material, NULL);
      if (rugosa_solve_diameter (self->project, trial, age, &limits, &d, &err))
        {
          g_autofree char *bore = _rugosa_sizing_window_format (self, RUGOSA_DISPLAY_DIAMETER, d);
          g_autofree char *t = g_strdup_printf (_("The smallest bore within the upper limits is %s."), bore);
          g_string_append (inverse, t);
        }
      else
        g_string_append (inverse, err.text);
      if (self->source != NULL && self->head_loss_max > 0.0
          && rugosa_project_find_line (self->project, self->source) >= 0)
        {
          rg_error_clear (&err);
          if (rugosa_solve_flow (self->project, self->source, age, self->head_loss_max, &q, &err))
            {
              g_autofree char *flow = _rugosa_sizing_window_format (self, RUGOSA_DISPLAY_FLOW, q);
              g_autofree char *head = _rugosa_sizing_window_format (self, RUGOSA_DISPLAY_HEAD, self->head_loss_max);
              /* TRANSLATORS: a line option's name, a flow, a head loss */
              g_autofree char *t = g_strdup_printf (_("“%s” with its own pipe carries %s at a total head loss of %s."),
                                                    rugosa_line_get_name (self->source), flow, head);
              g_string_append_printf (inverse, "\n%s", t);
            }
          else
            g_string_append_printf (inverse, "\n%s", err.text);
        }
    }
  gtk_label_set_text (self->inverse_label, inverse->str);
  gtk_widget_set_visible (GTK_WIDGET (self->inverse_label), inverse->len > 0);
}

void
_rugosa_sizing_window_run (RugosaSizingWindow *self)
{
  RugosaLimits limits;
  RgError err = { 0 };
  g_autoptr (GPtrArray) designations = g_ptr_array_new ();
  int scroll_to = -1;

  if (self->project == NULL || self->duty == NULL)
    return;
  rugosa_limits_from_settings (&limits, _rugosa_sizing_window_settings (self));
  limits.head_loss_max = self->head_loss_max;
  g_clear_pointer (&self->sizing, rugosa_sizing_free);
  g_clear_pointer (&self->error, g_free);
  self->sizing = rugosa_sizing_run (self->project, self->duty, _rugosa_sizing_window_material (self),
                                    _rugosa_sizing_window_catalog (self), &limits, -1.0, &err);
  if (self->sizing == NULL)
    self->error = g_strdup (err.text);

  /* Until the user chooses, the recommendation is chosen. */
  if (!self->user_chose)
    {
      g_hash_table_remove_all (self->chosen);
      if (self->sizing != NULL && self->sizing->recommended >= 0)
        g_hash_table_add (self->chosen, g_strdup (self->sizing->candidates[self->sizing->recommended].pipe->designation));
    }
  for (guint i = 0; self->sizing != NULL && i < self->sizing->n_candidates; i++)
    g_ptr_array_add (designations, (gpointer) self->sizing->candidates[i].pipe->designation);
  g_ptr_array_add (designations, NULL);
  gtk_string_list_splice (self->rows, 0, g_list_model_get_n_items (G_LIST_MODEL (self->rows)),
                          (const char *const *) designations->pdata);
  _rugosa_sizing_window_update_titles (self);
  _rugosa_sizing_window_update_texts (self);
  _rugosa_sizing_window_update_add (self);
  _rugosa_sizing_window_update_ladder (self);

  /* The recommended size in view. */
  if (self->sizing != NULL)
    scroll_to = self->sizing->recommended >= 0 ? self->sizing->recommended : 0;
  if (scroll_to >= 0)
    {
      GtkWidget *list = gtk_widget_get_first_child (GTK_WIDGET (self->view));

      while (list != NULL && !GTK_IS_LIST_VIEW (list))
        list = gtk_widget_get_next_sibling (list);
      if (list != NULL)
        gtk_widget_activate_action (list, "list.scroll-to-item", "u", (guint) MAX (scroll_to - 3, 0));
    }
}

/* ---- adding the sizes ---- */

void
_rugosa_sizing_window_add_clicked (GtkButton          *button,
                                   RugosaSizingWindow *self)
{
  RugosaHistory *history = rugosa_window_get_history (self->main_window);
  const char *material = _rugosa_sizing_window_material (self);
  guint first = rugosa_project_get_n_lines (self->project);
  guint added = 0;

  if (self->sizing == NULL)
    return;
  rugosa_history_begin_group (history, _("Add sizes"));
  for (guint i = 0; i < self->sizing->n_candidates; i++)
    {
      const RgPipe *pipe = self->sizing->candidates[i].pipe;
      g_autoptr (RugosaLine) line = NULL;
      guint n;

      if (!g_hash_table_contains (self->chosen, pipe->designation))
        continue;
      n = rugosa_project_get_n_lines (self->project);
      line = rugosa_line_duplicate (self->duty);
      g_object_set (line, "name", pipe->designation, "colour", rugosa_window_palette_colour (n),
                    "material-id", material, "pipe-designation", pipe->designation, NULL);
      rugosa_history_add_line (history, n, line);
      added++;
    }
  rugosa_history_end_group (history);
  if (added > 0)
    gtk_single_selection_set_selected (rugosa_window_get_selection (self->main_window), first);
}

void
_rugosa_sizing_window_results_init (RugosaSizingWindow *self)
{
  GtkNoSelection *selection;

  for (int c = 0; c < N_COLS; c++)
    {
      GtkListItemFactory *factory = gtk_signal_list_item_factory_new ();
      GtkColumnViewColumn *column;

      g_object_set_data (G_OBJECT (factory), "column", GINT_TO_POINTER (c));
      g_signal_connect (factory, "setup", G_CALLBACK (_rugosa_sizing_window_setup_cell), self);
      g_signal_connect (factory, "bind", G_CALLBACK (_rugosa_sizing_window_bind_cell), self);
      column = gtk_column_view_column_new (_(columns[c].title), factory);
      gtk_column_view_column_set_resizable (column, TRUE);
      if (c == COL_LOSS)
        gtk_column_view_column_set_expand (column, TRUE);
      gtk_column_view_append_column (self->view, column);
      g_object_unref (column);
    }
  selection = gtk_no_selection_new (G_LIST_MODEL (g_object_ref (self->rows)));
  gtk_column_view_set_model (self->view, GTK_SELECTION_MODEL (selection));
  g_object_unref (selection);
}
