/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-line-panel"

#include "config.h"

#include <glib/gi18n.h>
#include <math.h>

#include "core/aging.h"
#include "core/catalog.h"
#include "core/fittings.h"
#include "core/fluid.h"
#include "model/rugosa-display.h"
#include "model/rugosa-enums.h"
#include "model/rugosa-fields.h"
#include "rugosa-field-choices.h"
#include "rugosa-line-panel.h"
#include "rugosa-readout.h"
#include "rugosa-size-picker.h"
#include "rugosa-spin-guard.h"

struct _RugosaLinePanel
{
  GtkWidget parent_instance;

  /* template widgets */
  GtkColorButton   *colour_button;
  GtkEntry         *name_entry;
  GtkBox           *warnings_box;
  GtkLabel         *warnings_label;
  AdwComboRow      *fluid_kind_row;
  AdwActionRow     *fluid_props_row;
  GtkDropDown      *material_dropdown;
  GtkDropDown      *aging_dropdown;
  RugosaSizePicker *pipe_picker;
  AdwExpanderRow   *fittings_row;
  GtkDropDown      *fitting_add_dropdown;
  GtkBox           *apply_box;
  GtkLabel         *apply_label;

  /* borrowed references */
  RugosaProject *project;

  /* owned references */
  RugosaLine *line;
  GHashTable *entries;       /* property name -> RugosaQuantityEntry */
  GHashTable *choosers;      /* property name -> the row choosing it */
  GPtrArray  *fitting_rows;  /* rows added to fittings_row */
  gboolean    updating;      /* set while widgets follow the line */
};

G_DEFINE_FINAL_TYPE (RugosaLinePanel, rugosa_line_panel, GTK_TYPE_WIDGET)

enum {
  EDIT_LINE,
  N_SIGNALS
};

static guint signals[N_SIGNALS];

GtkWidget *
rugosa_line_panel_new (void)
{
  return g_object_new (RUGOSA_TYPE_LINE_PANEL, NULL);
}

RugosaQuantityEntry *
rugosa_line_panel_get_entry (RugosaLinePanel *self,
                             const char      *property)
{
  g_return_val_if_fail (RUGOSA_IS_LINE_PANEL (self), NULL);
  return g_hash_table_lookup (self->entries, property);
}

const char *
rugosa_line_panel_get_warnings (RugosaLinePanel *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE_PANEL (self), NULL);
  if (!gtk_widget_get_visible (GTK_WIDGET (self->warnings_box)))
    return NULL;
  return gtk_label_get_text (self->warnings_label);
}

const char *
rugosa_line_panel_get_fluid_readout (RugosaLinePanel *self)
{
  return adw_action_row_get_subtitle (self->fluid_props_row);
}

void
rugosa_line_panel_set_n_others (RugosaLinePanel *self,
                                guint            n)
{
  g_autofree char *label = NULL;

  g_return_if_fail (RUGOSA_IS_LINE_PANEL (self));
  /* TRANSLATORS: above three buttons, "Fluid", "Aging" and "Flows", that
   * give other line options this line's values; %u is how many */
  label = g_strdup_printf (ngettext ("Apply to the %u other selected line:",
                                     "Apply to the %u other selected lines:", n), n);
  gtk_label_set_text (self->apply_label, label);
  gtk_widget_set_visible (GTK_WIDGET (self->apply_box), n > 0);
}

RugosaLine *
rugosa_line_panel_get_line (RugosaLinePanel *self)
{
  return self->line;
}

static void
_rugosa_line_panel_emit (RugosaLinePanel *self,
                         const char      *property,
                         GVariant        *value)
{
  g_autoptr (GVariant) v = g_variant_ref_sink (value);

  if (self->updating || self->line == NULL)
    return;
  g_signal_emit (self, signals[EDIT_LINE], 0, self->line, property, v);
}

/* The project file keeps lowest ≤ design ≤ highest flow (0: not given)
 * and refuses to read anything else, so the panel does not take a flow
 * out of that order.  Returns the sentence, or NULL when in order. */
static char *
_rugosa_line_panel_flow_order (RugosaLinePanel     *self,
                               RugosaQuantityEntry *entry,
                               const char          *property,
                               double               v)
{
  double design = rugosa_line_get_double (self->line, "flow-design");
  double lo = rugosa_line_get_double (self->line, "flow-minimum");
  double hi = rugosa_line_get_double (self->line, "flow-maximum");
  g_autofree char *shown = NULL;

  if (g_strcmp0 (property, "flow-minimum") == 0 && v > 0.0 && v > design)
    {
      shown = rugosa_quantity_entry_format (entry, design);
      return g_strdup_printf (_("The lowest flow must not exceed the design flow, %s."), shown);
    }
  if (g_strcmp0 (property, "flow-maximum") == 0 && v > 0.0 && v < design)
    {
      shown = rugosa_quantity_entry_format (entry, design);
      return g_strdup_printf (_("The highest flow must not be below the design flow, %s."), shown);
    }
  if (g_strcmp0 (property, "flow-design") == 0 && lo > 0.0 && v < lo)
    {
      shown = rugosa_quantity_entry_format (entry, lo);
      return g_strdup_printf (_("The design flow must not be below the lowest flow, %s."), shown);
    }
  if (g_strcmp0 (property, "flow-design") == 0 && hi > 0.0 && v > hi)
    {
      shown = rugosa_quantity_entry_format (entry, hi);
      return g_strdup_printf (_("The design flow must not exceed the highest flow, %s."), shown);
    }
  return NULL;
}

static void
_rugosa_line_panel_committed (RugosaQuantityEntry *entry,
                              double               value,
                              RugosaLinePanel     *self)
{
  const char *property = gtk_widget_get_name (GTK_WIDGET (entry));

  /* The entry has read the text and checked the row's range; the flows'
   * order is a relation between rows. */
  if (self->line && g_str_has_prefix (property, "flow-"))
    {
      g_autofree char *why = _rugosa_line_panel_flow_order (self, entry, property, value);

      if (why != NULL)
        {
          rugosa_quantity_entry_set_error (entry, why);
          return;
        }
    }
  _rugosa_line_panel_emit (self, property, g_variant_new_double (value));
}

static void
_rugosa_line_panel_fluid_kind_changed (AdwComboRow     *row,
                                       GParamSpec      *pspec,
                                       RugosaLinePanel *self)
{
  int kind = rugosa_field_choice_value (RUGOSA_TYPE_FLUID_KIND, adw_combo_row_get_selected (row));

  if (kind < 0)
    return;
  _rugosa_line_panel_emit (self, "fluid-kind", g_variant_new_int32 (kind));
}

/* The name field marked as refused, with the sentence why (NULL: not). */
static void
_rugosa_line_panel_name_error (RugosaLinePanel *self,
                               const char      *why)
{
  GtkWidget *entry = GTK_WIDGET (self->name_entry);

  if (why != NULL)
    {
      gtk_widget_add_css_class (entry, "error");
      gtk_widget_set_tooltip_text (entry, why);
      gtk_accessible_update_state (GTK_ACCESSIBLE (entry),
                                   GTK_ACCESSIBLE_STATE_INVALID, GTK_ACCESSIBLE_INVALID_TRUE, -1);
    }
  else if (gtk_widget_has_css_class (entry, "error"))
    {
      gtk_widget_remove_css_class (entry, "error");
      gtk_widget_set_tooltip_text (entry, NULL);
      gtk_accessible_reset_state (GTK_ACCESSIBLE (entry), GTK_ACCESSIBLE_STATE_INVALID);
    }
}

static void
_rugosa_line_panel_name_commit (RugosaLinePanel *self)
{
  const char *text = gtk_editable_get_text (GTK_EDITABLE (self->name_entry));
  const RugosaField *row = rugosa_field_find ("name");
  g_autofree char *why = NULL;

  if (self->line == NULL || g_strcmp0 (text, rugosa_line_get_name (self->line)) == 0)
    {
      _rugosa_line_panel_name_error (self, NULL);
      return;
    }
  if (*text == '\0')
    {
      /* A line keeps a name: an emptied field returns to the old one. */
      gtk_editable_set_text (GTK_EDITABLE (self->name_entry), rugosa_line_get_name (self->line));
      _rugosa_line_panel_name_error (self, NULL);
      return;
    }
  /* What the project file refuses to read is refused here too, so that
   * a saved file always opens again (rugosa_field_text_problem). */
  switch (rugosa_field_text_problem (row, text))
    {
    case RUGOSA_TEXT_CONTROL:
      why = g_strdup_printf (_("%s cannot hold a control character (a line break, a tab or another): the last name is kept."),
                             rugosa_field_label (row));
      break;
    case RUGOSA_TEXT_TOO_LONG:
    case RUGOSA_TEXT_NOT_UTF8:
      why = g_strdup_printf (_("%s may be at most %d characters long: the last name is kept."),
                             rugosa_field_label (row), row->max_chars);
      break;
    case RUGOSA_TEXT_OK:
    default:
      break;
    }
  _rugosa_line_panel_name_error (self, why);
  if (why == NULL)
    _rugosa_line_panel_emit (self, "name", g_variant_new_string (text));
}

static void
_rugosa_line_panel_name_activate (GtkEntry        *entry,
                                  RugosaLinePanel *self)
{
  _rugosa_line_panel_name_commit (self);
}

static void
_rugosa_line_panel_name_leave (GtkEventControllerFocus *focus,
                               RugosaLinePanel         *self)
{
  _rugosa_line_panel_name_commit (self);
}

static void
_rugosa_line_panel_colour_set (GtkColorButton  *button,
                               RugosaLinePanel *self)
{
  GdkRGBA rgba;
  g_autofree char *hex = NULL;

  gtk_color_chooser_get_rgba (GTK_COLOR_CHOOSER (button), &rgba);
  hex = g_strdup_printf ("#%02x%02x%02x",
                         (int) lround (rgba.red * 255), (int) lround (rgba.green * 255),
                         (int) lround (rgba.blue * 255));
  _rugosa_line_panel_emit (self, "colour", g_variant_new_string (hex));
}

/* Dropdown index 0 is "custom"; index i ≥ 1 is catalog entry i − 1. */
static void
_rugosa_line_panel_dropdown_changed (GtkDropDown     *dropdown,
                                     GParamSpec      *pspec,
                                     RugosaLinePanel *self)
{
  guint i = gtk_drop_down_get_selected (dropdown);
  const char *id = NULL;
  const char *property;

  if (i == GTK_INVALID_LIST_POSITION || self->updating)
    return;
  if (dropdown == self->material_dropdown)
    {
      property = "material-id";
      if (i > 0)
        id = rg_material_at (i - 1)->id;
    }
  else
    {
      property = "aging-class-id";
      if (i > 0)
        id = rg_aging_class_at (i - 1)->id;
    }
  _rugosa_line_panel_emit (self, property, g_variant_new_maybe (G_VARIANT_TYPE_STRING,
                                                                id ? g_variant_new_string (id) : NULL));
}

static void
_rugosa_line_panel_fitting_add (GtkButton       *button,
                                RugosaLinePanel *self)
{
  guint i = gtk_drop_down_get_selected (self->fitting_add_dropdown);
  GVariant *old;
  GVariantBuilder b;
  GVariantIter iter;
  const char *id;
  double k, count;

  if (self->line == NULL || i == GTK_INVALID_LIST_POSITION)
    return;
  old = rugosa_line_get_fittings (self->line);
  g_variant_builder_init (&b, G_VARIANT_TYPE (RUGOSA_LINE_FITTINGS_TYPE));
  if (old != NULL)
    {
      g_variant_iter_init (&iter, old);
      while (g_variant_iter_next (&iter, "(&sdd)", &id, &k, &count))
        g_variant_builder_add (&b, "(sdd)", id, k, count);
    }
  /* Entry 0 of the list is a loss given by its K alone. */
  if (i == 0)
    g_variant_builder_add (&b, "(sdd)", "", 1.0, 1.0);
  else
    g_variant_builder_add (&b, "(sdd)", rg_fitting_at (i - 1)->id, 0.0, 1.0);
  _rugosa_line_panel_emit (self, "fittings", g_variant_builder_end (&b));
}

/* Rebuild the fitting list with one entry changed (count or K), or
 * removed when `remove` is set. */
static void
_rugosa_line_panel_fitting_edit (RugosaLinePanel *self,
                                 guint            index,
                                 gboolean         remove,
                                 double           new_count,
                                 double           new_k)
{
  GVariant *old = rugosa_line_get_fittings (self->line);
  GVariantBuilder b;
  GVariantIter iter;
  const char *id;
  double k, count;
  guint j = 0;
  gboolean changed = remove;

  g_variant_builder_init (&b, G_VARIANT_TYPE (RUGOSA_LINE_FITTINGS_TYPE));
  g_variant_iter_init (&iter, old);
  while (g_variant_iter_next (&iter, "(&sdd)", &id, &k, &count))
    {
      if (j == index)
        {
          if (!remove)
            g_variant_builder_add (&b, "(sdd)", id, new_k >= 0 ? new_k : k,
                                   new_count >= 0 ? new_count : count);
          changed |= (new_k >= 0 && new_k != k) || (new_count >= 0 && new_count != count);
        }
      else
        g_variant_builder_add (&b, "(sdd)", id, k, count);
      j++;
    }
  /* A spin button putting back a refused text re-emits its old value: no
   * edit, so the list (and the field's error mark) is not rebuilt. */
  if (!changed)
    {
      g_variant_builder_clear (&b);
      return;
    }
  _rugosa_line_panel_emit (self, "fittings", g_variant_builder_end (&b));
}

static void
_rugosa_line_panel_fitting_count (GtkSpinButton   *spin,
                                  RugosaLinePanel *self)
{
  guint index = GPOINTER_TO_UINT (g_object_get_data (G_OBJECT (spin), "index"));
  _rugosa_line_panel_fitting_edit (self, index, FALSE, gtk_spin_button_get_value (spin), -1);
}

static void
_rugosa_line_panel_fitting_k (GtkEntry        *entry,
                              RugosaLinePanel *self)
{
  guint index = GPOINTER_TO_UINT (g_object_get_data (G_OBJECT (entry), "index"));
  const char *text = gtk_editable_get_text (GTK_EDITABLE (entry));
  char *end = NULL;
  double k = g_ascii_strtod (text, &end);

  /* A plain K is a bare number: no unit to parse. */
  while (end && *end == ' ')
    end++;
  if (end == text || (end && *end != '\0') || !isfinite (k) || k < 0.0 || k > RUGOSA_FITTING_K_MAX)
    {
      GtkWidget *row = gtk_widget_get_ancestor (GTK_WIDGET (entry), ADW_TYPE_ACTION_ROW);
      g_autofree char *echo = g_utf8_strlen (text, -1) > 24 ? g_utf8_substring (text, 0, 24) : g_strdup (text);
      g_autofree char *why = NULL;
      g_autofree char *most = rugosa_display_significant_screen (RUGOSA_FITTING_K_MAX, 4);

      if (end == text && *g_strstrip (echo) == '\0')
        /* TRANSLATORS: %s is the largest K taken, e.g. "10000" */
        why = g_strdup_printf (_("The loss coefficient is empty: type a number K from 0 to %s."), most);
      else
        /* TRANSLATORS: the text typed, "…" when cut short, and the largest K taken */
        why = g_strdup_printf (_("'%s%s' is not a loss coefficient: type a number K from 0 to %s."),
                               echo, g_utf8_strlen (text, -1) > 24 ? "…" : "", most);

      /* The sentence sits under the row's title and in the tooltip. */
      gtk_widget_add_css_class (GTK_WIDGET (entry), "error");
      gtk_widget_set_tooltip_text (GTK_WIDGET (entry), why);
      if (row)
        {
          adw_action_row_set_subtitle (ADW_ACTION_ROW (row), why);
          gtk_widget_add_css_class (row, "field-error");
        }
      return;
    }
  {
    /* Taken: the mark goes (the row keeps no subtitle of its own). */
    GtkWidget *row = gtk_widget_get_ancestor (GTK_WIDGET (entry), ADW_TYPE_ACTION_ROW);

    gtk_widget_remove_css_class (GTK_WIDGET (entry), "error");
    gtk_widget_set_tooltip_text (GTK_WIDGET (entry), _("Loss coefficient K of one such loss (a number ≥ 0)"));
    if (row && gtk_widget_has_css_class (row, "field-error"))
      {
        adw_action_row_set_subtitle (ADW_ACTION_ROW (row), "");
        gtk_widget_remove_css_class (row, "field-error");
      }
  }
  _rugosa_line_panel_fitting_edit (self, index, FALSE, -1, k);
}

static void
_rugosa_line_panel_fitting_remove (GtkButton       *button,
                                   RugosaLinePanel *self)
{
  guint index = GPOINTER_TO_UINT (g_object_get_data (G_OBJECT (button), "index"));
  _rugosa_line_panel_fitting_edit (self, index, TRUE, -1, -1);
}

static void
_rugosa_line_panel_fill_fittings (RugosaLinePanel *self)
{
  GVariant *fittings;
  GVariantIter iter;
  const char *id;
  double k, count, total = 0;
  guint index = 0;

  for (guint i = 0; i < self->fitting_rows->len; i++)
    adw_expander_row_remove (self->fittings_row, g_ptr_array_index (self->fitting_rows, i));
  g_ptr_array_set_size (self->fitting_rows, 0);

  fittings = self->line ? rugosa_line_get_fittings (self->line) : NULL;
  if (fittings == NULL)
    {
      adw_expander_row_set_subtitle (self->fittings_row, _("None"));
      return;
    }

  g_variant_iter_init (&iter, fittings);
  while (g_variant_iter_next (&iter, "(&sdd)", &id, &k, &count))
    {
      GtkWidget *row = adw_action_row_new ();
      GtkWidget *spin = gtk_spin_button_new_with_range (0, RUGOSA_FITTING_COUNT_MAX, 1);

      /* A refusal under the title echoes the text typed: plain text. */
      adw_preferences_row_set_use_markup (ADW_PREFERENCES_ROW (row), FALSE);
      GtkWidget *remove = gtk_button_new_from_icon_name ("user-trash-symbolic");
      const RgFitting *fitting = NULL;

      if (*id != '\0' && rg_fitting_lookup (id, &fitting, NULL) == RG_OK)
        adw_preferences_row_set_title (ADW_PREFERENCES_ROW (row), _(fitting->name));
      else
        {
          GtkWidget *kentry = gtk_entry_new ();
          char buf[G_ASCII_DTOSTR_BUF_SIZE];

          adw_preferences_row_set_title (ADW_PREFERENCES_ROW (row), _("Other loss, K ="));
          gtk_editable_set_text (GTK_EDITABLE (kentry), g_ascii_formatd (buf, sizeof buf, "%g", k));
          gtk_editable_set_width_chars (GTK_EDITABLE (kentry), 5);
          gtk_entry_set_alignment (GTK_ENTRY (kentry), 1.0);
          gtk_widget_set_valign (kentry, GTK_ALIGN_CENTER);
          gtk_widget_set_tooltip_text (kentry, _("Loss coefficient K of one such loss (a number ≥ 0)"));
          g_object_set_data (G_OBJECT (kentry), "index", GUINT_TO_POINTER (index));
          g_signal_connect (kentry, "activate", G_CALLBACK (_rugosa_line_panel_fitting_k), self);
          adw_action_row_add_suffix (ADW_ACTION_ROW (row), kentry);
        }
      gtk_spin_button_set_value (GTK_SPIN_BUTTON (spin), count);
      gtk_editable_set_width_chars (GTK_EDITABLE (spin), 2);
      gtk_widget_set_valign (spin, GTK_ALIGN_CENTER);
      gtk_widget_set_tooltip_text (spin, _("How many"));
      g_object_set_data (G_OBJECT (spin), "index", GUINT_TO_POINTER (index));
      rugosa_spin_guard (GTK_SPIN_BUTTON (spin));
      g_signal_connect (spin, "value-changed", G_CALLBACK (_rugosa_line_panel_fitting_count), self);
      adw_action_row_add_suffix (ADW_ACTION_ROW (row), spin);

      gtk_widget_set_valign (remove, GTK_ALIGN_CENTER);
      gtk_widget_add_css_class (remove, "flat");
      gtk_widget_set_tooltip_text (remove, _("Remove from the line"));
      g_object_set_data (G_OBJECT (remove), "index", GUINT_TO_POINTER (index));
      g_signal_connect (remove, "clicked", G_CALLBACK (_rugosa_line_panel_fitting_remove), self);
      adw_action_row_add_suffix (ADW_ACTION_ROW (row), remove);

      adw_expander_row_add_row (self->fittings_row, row);
      g_ptr_array_add (self->fitting_rows, row);
      total += count;
      index++;
    }

  {
    const RugosaLineResults *res = rugosa_readout_results (self->project, self->line);
    g_autofree char *sub = NULL;

    if (res && res->ok && res->points[RUGOSA_FLOW_DESIGN].ok)
      {
        const RugosaOperatingPoint *p = &res->points[RUGOSA_FLOW_DESIGN];
        g_autofree char *ksum = rugosa_display_significant_screen (p->minor_loss_k_total, 3);
        g_autofree char *loss = rugosa_readout_format (self->project, RUGOSA_DISPLAY_HEAD, p->result.head_loss_minor_m);

        /* TRANSLATORS: the fittings of a line: their count, the sum of
         * their loss coefficients and the head they cost, e.g.
         * "3 items, ΣK 1.45, loss 0.312 m at the design flow" */
        sub = g_strdup_printf (ngettext ("%d item, ΣK %s, loss %s at the design flow",
                                         "%d items, ΣK %s, loss %s at the design flow", (int) total),
                               (int) total, ksum, loss);
      }
    else
      sub = g_strdup_printf (ngettext ("%d item", "%d items", (int) total), (int) total);
    adw_expander_row_set_subtitle (self->fittings_row, index ? sub : _("None"));
  }
}

/* Each field is shown in the project's unit for its row's quantity. */
static void
_rugosa_line_panel_update_units (RugosaLinePanel *self)
{
  GHashTableIter iter;
  const char *property;
  RugosaQuantityEntry *entry;
  RugosaSettings *ps = self->project ? rugosa_project_get_settings (self->project) : NULL;

  g_hash_table_iter_init (&iter, self->entries);
  while (g_hash_table_iter_next (&iter, (gpointer *) &property, (gpointer *) &entry))
    {
      const RugosaField *row = rugosa_field_find (property);

      if (row == NULL)
        continue;
      rugosa_quantity_entry_set_unit (entry, ps ? rugosa_settings_get_unit (ps, row->display) : NULL);
    }
}

void
rugosa_line_panel_set_context (RugosaLinePanel *self,
                               RugosaProject   *project)
{
  g_return_if_fail (RUGOSA_IS_LINE_PANEL (self));

  self->project = project;
  _rugosa_line_panel_update_units (self);
}

/* Catalog references are looked up the way the model looks them up
 * (tolerant of spelling), then found in the list by identity. */
static void
_rugosa_line_panel_select (GtkDropDown *dropdown,
                           const void  *entry,
                           int          n,
                           const void *(*at) (int))
{
  guint sel = 0;

  if (entry != NULL)
    for (int i = 0; i < n; i++)
      if (at (i) == entry)
        {
          sel = i + 1;
          break;
        }
  gtk_drop_down_set_selected (dropdown, sel);
}

static const void *_material_at (int i) { return rg_material_at (i); }
static const void *_aging_at (int i) { return rg_aging_class_at (i); }

static void
_rugosa_line_panel_select_catalogs (RugosaLinePanel *self)
{
  const RgMaterial *material = NULL;
  const RgAgingClass *aging = NULL;
  const RgPipe *pipe = NULL;
  const char *id;

  if ((id = rugosa_line_get_material_id (self->line)) != NULL)
    rg_material_lookup (id, &material, NULL);
  if ((id = rugosa_line_get_aging_class_id (self->line)) != NULL)
    rg_aging_class_lookup (id, &aging, NULL);
  if ((id = rugosa_line_get_pipe_designation (self->line)) != NULL)
    rg_pipe_lookup (id, &pipe, NULL);
  _rugosa_line_panel_select (self->material_dropdown, material, rg_material_count (), _material_at);
  _rugosa_line_panel_select (self->aging_dropdown, aging, rg_aging_class_count (), _aging_at);
  /* the sizes of the material's catalogs, the bores in the field's unit */
  rugosa_size_picker_set_material_id (self->pipe_picker, material != NULL ? material->id : NULL);
  if (self->project != NULL)
    rugosa_size_picker_set_diameter_unit (self->pipe_picker,
                                          rugosa_settings_get_unit (rugosa_project_get_settings (self->project),
                                                                    RUGOSA_DISPLAY_DIAMETER));
  rugosa_size_picker_set_designation (self->pipe_picker, pipe != NULL ? pipe->designation : id);
}

/* A size chosen in the picker.  "Custom bore" keeps the bore the line
 * has now (the catalog pipe's): the bore is set first, then the pipe is
 * let go, so the line never jumps to another bore on the way. */
static void
_rugosa_line_panel_pipe_chosen (RugosaSizePicker *picker,
                                const char       *designation,
                                RugosaLinePanel  *self)
{
  if (self->updating || self->line == NULL)
    return;
  if (designation == NULL && rugosa_line_get_pipe_designation (self->line) != NULL)
    {
      const RugosaLineResults *res = rugosa_readout_results (self->project, self->line);

      if (res != NULL && res->inner_diameter_m > 0.0)
        _rugosa_line_panel_emit (self, "inner-diameter", g_variant_new_double (res->inner_diameter_m));
    }
  _rugosa_line_panel_emit (self, "pipe-designation",
                           g_variant_new_maybe (G_VARIANT_TYPE_STRING,
                                                designation ? g_variant_new_string (designation) : NULL));
}

/* The row choosing a catalog entry for `row` (a custom value such as the
 * roughness), when that chooser has an entry chosen; else NULL. */
static const RugosaField *
_rugosa_line_panel_chosen_partner (RugosaLinePanel   *self,
                                   const RugosaField *row)
{
  guint n;
  const RugosaField *rows = rugosa_line_fields (&n);

  for (guint i = 0; i < n; i++)
    if (rows[i].kind == RUGOSA_FIELD_CATALOG && g_strcmp0 (rows[i].partner, row->property) == 0)
      {
        g_autofree char *id = NULL;

        g_object_get (self->line, rows[i].property, &id, NULL);
        return id != NULL ? &rows[i] : NULL;
      }
  return NULL;
}

static void
_rugosa_line_panel_mark_chooser (GtkWidget  *row,
                                 const char *why)
{
  GtkWidget *suffix = g_object_get_data (G_OBJECT (row), "rugosa-chooser");

  /* The model's sentence may hold "<" or "&": plain text. */
  adw_preferences_row_set_use_markup (ADW_PREFERENCES_ROW (row), FALSE);
  adw_action_row_set_subtitle (ADW_ACTION_ROW (row), why ? why : "");
  if (why != NULL)
    gtk_widget_add_css_class (row, "field-error");
  else
    gtk_widget_remove_css_class (row, "field-error");
  if (suffix != NULL && why != NULL)
    gtk_widget_add_css_class (suffix, "error");
  else if (suffix != NULL)
    gtk_widget_remove_css_class (suffix, "error");
}

/* An evaluation error names the inputs it is about (its subjects): the
 * fields of those inputs are marked with the sentence, and where a custom
 * value comes from a chosen catalog entry, its chooser is.  Marks of the
 * last call that no longer apply go. */
void
rugosa_line_panel_mark_subjects (RugosaLinePanel *self,
                                 RgSubjects       subjects,
                                 const char      *why)
{
  g_autoptr (GHashTable) marked = g_hash_table_new (g_str_hash, g_str_equal);
  GHashTableIter iter;
  const char *property;
  gpointer widget;

  g_return_if_fail (RUGOSA_IS_LINE_PANEL (self));
  if (why == NULL)
    subjects = 0;
  for (guint i = 0; subjects != 0 && self->line != NULL; i++)
    {
      const RugosaField *row = rugosa_field_for_subject (subjects, i);
      const RugosaField *partner;

      if (row == NULL)
        break;
      if ((partner = _rugosa_line_panel_chosen_partner (self, row)) != NULL)
        row = partner;
      g_hash_table_add (marked, (gpointer) row->property);
    }

  g_hash_table_iter_init (&iter, self->entries);
  while (g_hash_table_iter_next (&iter, (gpointer *) &property, &widget))
    rugosa_quantity_entry_set_problem (widget, g_hash_table_contains (marked, property) ? why : NULL);
  g_hash_table_iter_init (&iter, self->choosers);
  while (g_hash_table_iter_next (&iter, (gpointer *) &property, &widget))
    {
      gboolean mark = g_hash_table_contains (marked, property);

      if (mark || gtk_widget_has_css_class (widget, "field-error"))
        _rugosa_line_panel_mark_chooser (widget, mark ? why : NULL);
    }
}

/* The error of the line, or of its first operating point that failed. */
static void
_rugosa_line_panel_mark_results (RugosaLinePanel         *self,
                                 const RugosaLineResults *res)
{
  RgSubjects subjects = 0;
  const char *why = NULL;

  if (res != NULL && !res->ok)
    {
      subjects = res->error_subjects;
      why = res->error;
    }
  else if (res != NULL)
    for (int k = 0; k < RUGOSA_N_FLOWS && why == NULL; k++)
      if (res->points[k].present && !res->points[k].ok)
        {
          subjects = res->points[k].error_subjects;
          why = res->points[k].error;
        }
  rugosa_line_panel_mark_subjects (self, subjects, why);
}

void
rugosa_line_panel_refresh (RugosaLinePanel *self)
{
  const RugosaLineResults *res;
  int kind;
  GHashTableIter iter;
  const char *property;
  RugosaQuantityEntry *entry;
  g_autofree char *warnings = NULL;

  g_return_if_fail (RUGOSA_IS_LINE_PANEL (self));

  gtk_widget_set_sensitive (GTK_WIDGET (self), self->line != NULL);
  if (self->line == NULL || self->project == NULL)
    return;

  self->updating = TRUE;
  _rugosa_line_panel_update_units (self);

  if (!gtk_widget_has_focus (GTK_WIDGET (self->name_entry))
      || g_strcmp0 (gtk_editable_get_text (GTK_EDITABLE (self->name_entry)), rugosa_line_get_name (self->line)) != 0)
    {
      gtk_editable_set_text (GTK_EDITABLE (self->name_entry), rugosa_line_get_name (self->line));
      _rugosa_line_panel_name_error (self, NULL);
    }
  {
    GdkRGBA rgba;
    if (gdk_rgba_parse (&rgba, rugosa_line_get_colour (self->line)))
      gtk_color_chooser_set_rgba (GTK_COLOR_CHOOSER (self->colour_button), &rgba);
  }

  kind = rugosa_line_get_fluid_kind (self->line);
  adw_combo_row_set_selected (self->fluid_kind_row, rugosa_field_choice_position (RUGOSA_TYPE_FLUID_KIND, kind));

  _rugosa_line_panel_select_catalogs (self);

  res = rugosa_readout_results (self->project, self->line);

  /* Entries show the line's own values; where a catalog entry decides a
   * value, the entry shows that value and is read-only.  A field of the
   * fluid's state is shown for the fluids its row describes. */
  g_hash_table_iter_init (&iter, self->entries);
  while (g_hash_table_iter_next (&iter, (gpointer *) &property, (gpointer *) &entry))
    {
      const RugosaField *row = rugosa_quantity_entry_get_field (entry);
      GtkWidget *arow = gtk_widget_get_ancestor (GTK_WIDGET (entry), ADW_TYPE_ACTION_ROW);
      double v = rugosa_line_get_double (self->line, property);
      gboolean from_catalog = FALSE;

      gtk_widget_set_visible (arow ? arow : GTK_WIDGET (entry),
                              row->fluid_kinds == 0 || rugosa_field_applies_to_fluid (row, (RgFluidKind) kind));
      if (res != NULL && _rugosa_line_panel_chosen_partner (self, row) != NULL)
        {
          /* The results hold the catalog's value in the row's stored unit. */
          from_catalog = TRUE;
          if (g_str_equal (property, "roughness"))
            v = res->roughness_new_m;
          else if (g_str_equal (property, "aging-rate"))
            v = res->aging_rate_m_per_year;
          else if (g_str_equal (property, "inner-diameter"))
            v = res->inner_diameter_m;
          else
            from_catalog = FALSE;
        }
      /* A field showing an error keeps the user's text until it is fixed. */
      if (rugosa_quantity_entry_get_error_text (entry) == NULL)
        rugosa_quantity_entry_set_value (entry, v);
      /* A catalog value is shown, greyed, with where it comes from;
       * choosing "Custom …" above makes the field editable again. */
      gtk_widget_set_sensitive (GTK_WIDGET (entry), !from_catalog);
      rugosa_quantity_entry_set_hint (entry, from_catalog ? _("From the catalog entry chosen above") : _(row->help));
    }
  /* A kinematic viscosity typed for the custom fluid is converted with
   * its density. */
  entry = g_hash_table_lookup (self->entries, "viscosity");
  if (entry != NULL)
    rugosa_quantity_entry_set_density (entry, rugosa_line_get_double (self->line, "density"));

  if (res != NULL && res->ok)
    {
      g_autofree char *rho = rugosa_readout_format (self->project, RUGOSA_DISPLAY_DENSITY, res->density_kg_m3);
      g_autofree char *mu = rugosa_readout_format (self->project, RUGOSA_DISPLAY_DYNAMIC_VISCOSITY, res->dynamic_viscosity_pa_s);
      g_autofree char *text = g_strdup_printf (_("ρ = %s · μ = %s"), rho, mu);

      adw_action_row_set_subtitle (self->fluid_props_row, text);
    }
  else
    adw_action_row_set_subtitle (self->fluid_props_row, res ? res->error : "");
  _rugosa_line_panel_mark_results (self, res);

  _rugosa_line_panel_fill_fittings (self);

  warnings = rugosa_readout_warnings (self->project, self->line);
  gtk_widget_set_visible (GTK_WIDGET (self->warnings_box), warnings != NULL);
  gtk_label_set_text (self->warnings_label, warnings ? warnings : "");

  self->updating = FALSE;
}

void
rugosa_line_panel_refresh_results (RugosaLinePanel *self)
{
  g_autofree char *warnings = NULL;

  g_return_if_fail (RUGOSA_IS_LINE_PANEL (self));
  if (self->line == NULL || self->project == NULL)
    return;
  _rugosa_line_panel_mark_results (self, rugosa_readout_results (self->project, self->line));
  warnings = rugosa_readout_warnings (self->project, self->line);
  gtk_widget_set_visible (GTK_WIDGET (self->warnings_box), warnings != NULL);
  if (g_strcmp0 (gtk_label_get_text (self->warnings_label), warnings ? warnings : "") != 0)
    gtk_label_set_text (self->warnings_label, warnings ? warnings : "");
}

void
rugosa_line_panel_set_line (RugosaLinePanel *self,
                            RugosaLine      *line)
{
  GHashTableIter iter;
  gpointer entry;

  g_return_if_fail (RUGOSA_IS_LINE_PANEL (self));

  if (self->line != line)
    {
      /* Errors belong to the line being edited. */
      g_hash_table_iter_init (&iter, self->entries);
      while (g_hash_table_iter_next (&iter, NULL, &entry))
        rugosa_quantity_entry_set_error (entry, NULL);
    }
  g_set_object (&self->line, line);
  rugosa_line_panel_refresh (self);
}

/* Every widget named after a row of the line field table takes its
 * title and help from that row: the quantity entries (through the entry),
 * the choosers (whose rows are also where an evaluation error about them
 * is shown), the name, the colour and the fittings. */
static void
_rugosa_line_panel_collect_fields (RugosaLinePanel *self,
                                   GtkWidget       *widget)
{
  for (GtkWidget *child = gtk_widget_get_first_child (widget); child; child = gtk_widget_get_next_sibling (child))
    {
      const RugosaField *row = rugosa_field_find (gtk_widget_get_name (child));

      if (RUGOSA_IS_QUANTITY_ENTRY (child))
        {
          g_return_if_fail (row != NULL);
          rugosa_quantity_entry_set_field (RUGOSA_QUANTITY_ENTRY (child), row);
          g_hash_table_insert (self->entries, (gpointer) row->property, child);
          continue;
        }
      if (row != NULL)
        {
          const char *label = rugosa_field_label (row);

          gtk_widget_set_tooltip_text (child, _(row->help));
          if (ADW_IS_PREFERENCES_ROW (child))
            adw_preferences_row_set_title (ADW_PREFERENCES_ROW (child), label);
          if (ADW_IS_ACTION_ROW (child))
            g_hash_table_insert (self->choosers, (gpointer) row->property, child);
          else if (GTK_IS_DROP_DOWN (child) || RUGOSA_IS_SIZE_PICKER (child))
            {
              GtkWidget *arow = gtk_widget_get_ancestor (child, ADW_TYPE_ACTION_ROW);

              if (arow != NULL)
                {
                  adw_preferences_row_set_title (ADW_PREFERENCES_ROW (arow), label);
                  g_object_set_data (G_OBJECT (arow), "rugosa-chooser", child);
                  g_hash_table_insert (self->choosers, (gpointer) row->property, arow);
                }
            }
          gtk_accessible_update_property (GTK_ACCESSIBLE (child),
                                          GTK_ACCESSIBLE_PROPERTY_LABEL, label,
                                          GTK_ACCESSIBLE_PROPERTY_DESCRIPTION, _(row->help), -1);
        }
      _rugosa_line_panel_collect_fields (self, child);
    }
}

/* The closed drop-down shows an ellipsized name so the row keeps room for
 * its title; the open list shows names whole. */
static void
_rugosa_line_panel_label_setup (GtkSignalListItemFactory *factory,
                                GtkListItem              *item,
                                gpointer                  user_data)
{
  GtkWidget *label = gtk_label_new (NULL);

  gtk_label_set_xalign (GTK_LABEL (label), 0);
  if (GPOINTER_TO_INT (user_data))
    {
      gtk_label_set_ellipsize (GTK_LABEL (label), PANGO_ELLIPSIZE_END);
      gtk_label_set_max_width_chars (GTK_LABEL (label), 16);
      gtk_label_set_width_chars (GTK_LABEL (label), 10);
    }
  gtk_list_item_set_child (item, label);
}

static void
_rugosa_line_panel_label_bind (GtkSignalListItemFactory *factory,
                               GtkListItem              *item,
                               gpointer                  user_data)
{
  GtkStringObject *obj = gtk_list_item_get_item (item);
  GtkWidget *label = gtk_list_item_get_child (item);

  gtk_label_set_text (GTK_LABEL (label), gtk_string_object_get_string (obj));
  gtk_widget_set_tooltip_text (label, gtk_string_object_get_string (obj));
}

static void
_rugosa_line_panel_compact_dropdown (GtkDropDown *dropdown)
{
  GtkListItemFactory *button = gtk_signal_list_item_factory_new ();
  GtkListItemFactory *list = gtk_signal_list_item_factory_new ();

  g_signal_connect (button, "setup", G_CALLBACK (_rugosa_line_panel_label_setup), GINT_TO_POINTER (1));
  g_signal_connect (button, "bind", G_CALLBACK (_rugosa_line_panel_label_bind), NULL);
  g_signal_connect (list, "setup", G_CALLBACK (_rugosa_line_panel_label_setup), GINT_TO_POINTER (0));
  g_signal_connect (list, "bind", G_CALLBACK (_rugosa_line_panel_label_bind), NULL);
  gtk_drop_down_set_factory (dropdown, button);
  gtk_drop_down_set_list_factory (dropdown, list);
  g_object_unref (button);
  g_object_unref (list);
}

static GtkWidget *
_rugosa_line_panel_find (GtkWidget *root,
                         GType      type)
{
  for (GtkWidget *c = gtk_widget_get_first_child (root); c; c = gtk_widget_get_next_sibling (c))
    {
      GtkWidget *found = G_TYPE_CHECK_INSTANCE_TYPE (c, type) ? c : _rugosa_line_panel_find (c, type);

      if (found)
        return found;
    }
  return NULL;
}

/* GTK 4.8: after a search, the drop-down resets its list while the popup
 * is closed, and the list shows no rows when opened again until it is
 * told where to scroll.  Scroll it to the current choice on opening. */
static void
_rugosa_line_panel_popup_mapped (GtkWidget   *popover,
                                 GtkDropDown *dropdown)
{
  GtkWidget *list = _rugosa_line_panel_find (popover, GTK_TYPE_LIST_VIEW);
  guint selected = gtk_drop_down_get_selected (dropdown);
  GListModel *shown;

  if (list == NULL || (shown = G_LIST_MODEL (gtk_list_view_get_model (GTK_LIST_VIEW (list)))) == NULL
      || g_list_model_get_n_items (shown) == 0)
    return;
  /* The list shows the whole catalog by now (the search is cleared on
   * closing), so the choice's position is its row. */
  if (selected >= g_list_model_get_n_items (shown))
    selected = 0;
  gtk_widget_activate_action (list, "list.scroll-to-item", "u", selected);
}

static void
_rugosa_line_panel_fill_catalogs (RugosaLinePanel *self)
{
  g_autoptr (GtkStringList) kinds = NULL;
  g_autoptr (GtkStringList) materials = gtk_string_list_new (NULL);
  g_autoptr (GtkStringList) agings = gtk_string_list_new (NULL);
  g_autoptr (GtkStringList) fittings = gtk_string_list_new (NULL);
  GtkExpression *expr;

  kinds = rugosa_field_choice_titles (RUGOSA_TYPE_FLUID_KIND);
  adw_combo_row_set_model (self->fluid_kind_row, G_LIST_MODEL (kinds));

  gtk_string_list_append (materials, _("Custom roughness"));
  for (int i = 0; i < rg_material_count (); i++)
    gtk_string_list_append (materials, _(rg_material_at (i)->name));
  gtk_string_list_append (agings, _("Custom rate"));
  for (int i = 0; i < rg_aging_class_count (); i++)
    gtk_string_list_append (agings, _(rg_aging_class_at (i)->name));
  gtk_string_list_append (fittings, _("Other loss, K given"));
  for (int i = 0; i < rg_fitting_count (); i++)
    gtk_string_list_append (fittings, _(rg_fitting_at (i)->name));

  gtk_drop_down_set_model (self->material_dropdown, G_LIST_MODEL (materials));
  gtk_drop_down_set_model (self->aging_dropdown, G_LIST_MODEL (agings));
  gtk_drop_down_set_model (self->fitting_add_dropdown, G_LIST_MODEL (fittings));

  /* Searchable lists match on the shown text. */
  expr = gtk_property_expression_new (GTK_TYPE_STRING_OBJECT, NULL, "string");
  gtk_drop_down_set_expression (self->material_dropdown, expr);
  gtk_drop_down_set_expression (self->fitting_add_dropdown, expr);
  gtk_expression_unref (expr);

  _rugosa_line_panel_compact_dropdown (self->material_dropdown);
  _rugosa_line_panel_compact_dropdown (self->aging_dropdown);
  _rugosa_line_panel_compact_dropdown (self->fitting_add_dropdown);

  {
    GtkDropDown *searchable[] = { self->material_dropdown, self->fitting_add_dropdown };

    for (guint i = 0; i < G_N_ELEMENTS (searchable); i++)
      {
        GtkWidget *popover = _rugosa_line_panel_find (GTK_WIDGET (searchable[i]), GTK_TYPE_POPOVER);

        if (popover != NULL)
          g_signal_connect_object (popover, "map", G_CALLBACK (_rugosa_line_panel_popup_mapped), searchable[i], 0);
      }
  }
}

static void
rugosa_line_panel_dispose (GObject *object)
{
  RugosaLinePanel *self = RUGOSA_LINE_PANEL (object);

  g_clear_object (&self->line);
  g_clear_pointer (&self->entries, g_hash_table_unref);
  g_clear_pointer (&self->choosers, g_hash_table_unref);
  g_clear_pointer (&self->fitting_rows, g_ptr_array_unref);
  gtk_widget_dispose_template (GTK_WIDGET (self), RUGOSA_TYPE_LINE_PANEL);
  /* Template children without an id are not cleared by the call above. */
  for (GtkWidget *child; (child = gtk_widget_get_first_child (GTK_WIDGET (self))) != NULL;)
    gtk_widget_unparent (child);
  G_OBJECT_CLASS (rugosa_line_panel_parent_class)->dispose (object);
}

static void
rugosa_line_panel_class_init (RugosaLinePanelClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = rugosa_line_panel_dispose;

  signals[EDIT_LINE] =
    g_signal_new ("edit-line", G_TYPE_FROM_CLASS (klass), G_SIGNAL_RUN_LAST,
                  0, NULL, NULL, NULL, G_TYPE_NONE, 3,
                  RUGOSA_TYPE_LINE, G_TYPE_STRING, G_TYPE_VARIANT);

  g_type_ensure (RUGOSA_TYPE_QUANTITY_ENTRY);
  g_type_ensure (RUGOSA_TYPE_SIZE_PICKER);
  gtk_widget_class_set_template_from_resource (widget_class, "/org/rugosa/Rugosa/rugosa-line-panel.ui");
#define BIND(name) gtk_widget_class_bind_template_child (widget_class, RugosaLinePanel, name)
  BIND (colour_button);
  BIND (name_entry);
  BIND (warnings_box);
  BIND (warnings_label);
  BIND (fluid_kind_row);
  BIND (fluid_props_row);
  BIND (material_dropdown);
  BIND (aging_dropdown);
  BIND (pipe_picker);
  BIND (fittings_row);
  BIND (fitting_add_dropdown);
  BIND (apply_box);
  BIND (apply_label);
#undef BIND
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_line_panel_committed);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_line_panel_fluid_kind_changed);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_line_panel_name_activate);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_line_panel_name_leave);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_line_panel_colour_set);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_line_panel_dropdown_changed);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_line_panel_fitting_add);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_line_panel_pipe_chosen);

  gtk_widget_class_set_layout_manager_type (widget_class, GTK_TYPE_BOX_LAYOUT);
  gtk_widget_class_set_css_name (widget_class, "linepanel");
}

static void
rugosa_line_panel_init (RugosaLinePanel *self)
{
  GtkLayoutManager *layout;

  self->entries = g_hash_table_new (g_str_hash, g_str_equal);
  self->choosers = g_hash_table_new (g_str_hash, g_str_equal);
  self->fitting_rows = g_ptr_array_new ();
  self->updating = TRUE;
  gtk_widget_init_template (GTK_WIDGET (self));
  layout = gtk_widget_get_layout_manager (GTK_WIDGET (self));
  gtk_orientable_set_orientation (GTK_ORIENTABLE (layout), GTK_ORIENTATION_VERTICAL);
  gtk_box_layout_set_spacing (GTK_BOX_LAYOUT (layout), 18);
  _rugosa_line_panel_fill_catalogs (self);
  _rugosa_line_panel_collect_fields (self, GTK_WIDGET (self));
  /* It shows the model's sentences, which may hold "<" or "&". */
  adw_preferences_row_set_use_markup (ADW_PREFERENCES_ROW (self->fluid_props_row), FALSE);
  self->updating = FALSE;
  gtk_widget_set_sensitive (GTK_WIDGET (self), FALSE);
}
