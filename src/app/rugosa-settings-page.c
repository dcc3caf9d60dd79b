/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-settings-page"

#include "config.h"

#include <glib/gi18n.h>
#include <string.h>

#include "model/rugosa-display.h"
#include "model/rugosa-fields.h"
#include "model/rugosa-units.h"
#include "rugosa-field-choices.h"
#include "rugosa-seed.h"
#include "rugosa-settings-page.h"

struct _RugosaSettingsPage
{
  AdwPreferencesPage parent_instance;

  /* owned references */
  RugosaSettings *settings;
  GHashTable     *entries;   /* property -> RugosaQuantityEntry */
  GHashTable     *choices;   /* property or unit key -> AdwComboRow */
  GHashTable     *texts;     /* property -> GtkEntry */
  GHashTable     *groups;    /* group title -> AdwPreferencesGroup */
  RugosaSettingsApply apply;
  gpointer        apply_data;
  GDestroyNotify  apply_destroy;
  gboolean        updating;  /* widgets following the settings */
};

G_DEFINE_FINAL_TYPE (RugosaSettingsPage, rugosa_settings_page, ADW_TYPE_PREFERENCES_PAGE)

/* Which group a row goes in, by the start of its path in the project
 * file, in the order the groups are shown. */
static const struct {
  const char *path_prefix;
  const char *title;
} groups[] = {
  { "project.", N_("Project details") },
  { "units.", N_("Units") },
  { "friction_model", N_("Friction factor") },
  { "transition.", N_("Regime thresholds") },
  { "limits.", N_("Design limits") },
  { "chart.", N_("Chart window") },
  { "energy.", N_("Energy and costs") },
};

static AdwPreferencesGroup *
_rugosa_settings_page_group (RugosaSettingsPage *self,
                             const RugosaField  *row)
{
  /* A row of no group above: a group of its own, named after it. */
  const char *title = row->label;
  AdwPreferencesGroup *group;

  for (guint i = 0; i < G_N_ELEMENTS (groups); i++)
    if (g_str_has_prefix (row->path, groups[i].path_prefix))
      title = groups[i].title;
  group = g_hash_table_lookup (self->groups, title);
  if (group == NULL)
    {
      group = ADW_PREFERENCES_GROUP (adw_preferences_group_new ());
      adw_preferences_group_set_title (group, _(title));
      adw_preferences_page_add (ADW_PREFERENCES_PAGE (self), group);
      g_hash_table_insert (self->groups, (gpointer) title, group);
    }
  return group;
}

/* --- trying an edit ------------------------------------------------------ */

/* A copy of the settings with `property` set to `value`: whether the
 * fields' relations still hold there. */
static gboolean
_rugosa_settings_page_try (RugosaSettingsPage *self,
                           const char         *property,
                           const GValue       *value,
                           RgError            *err)
{
  g_autoptr (RugosaSettings) trial = rugosa_settings_new ();
  guint n;
  g_autofree GParamSpec **specs = g_object_class_list_properties (G_OBJECT_GET_CLASS (self->settings), &n);

  for (guint i = 0; i < n; i++)
    {
      g_auto (GValue) v = G_VALUE_INIT;

      g_value_init (&v, specs[i]->value_type);
      g_object_get_property (G_OBJECT (self->settings), specs[i]->name, &v);
      g_object_set_property (G_OBJECT (trial), specs[i]->name, &v);
    }
  g_object_set_property (G_OBJECT (trial), property, value);
  return rugosa_settings_check (trial, NULL, err) == RG_OK;
}

static void
_rugosa_settings_page_apply (RugosaSettingsPage *self,
                             const char         *property,
                             const GValue       *value)
{
  if (self->updating || self->apply == NULL)
    return;
  self->apply (self, property, value, self->apply_data);
}

/* --- numbers ------------------------------------------------------------- */

static void
_rugosa_settings_page_committed (RugosaQuantityEntry *entry,
                                 double               stored,
                                 RugosaSettingsPage  *self)
{
  const RugosaField *row = rugosa_quantity_entry_get_field (entry);
  g_auto (GValue) v = G_VALUE_INIT;
  RgError err = { 0 };

  g_value_init (&v, G_TYPE_DOUBLE);
  g_value_set_double (&v, stored);
  /* In its own range (the entry checked), but the fields' relations
   * decide too: "the start of turbulent flow not below the end of
   * laminar flow".  A refused value is not applied; the last one stays. */
  if (!_rugosa_settings_page_try (self, row->property, &v, &err))
    {
      g_autofree char *why = rugosa_display_localize (g_strdup (err.text));

      rugosa_quantity_entry_set_error (entry, why);
      return;
    }
  _rugosa_settings_page_apply (self, row->property, &v);
}

static void
_rugosa_settings_page_add_number (RugosaSettingsPage *self,
                                  const RugosaField  *row)
{
  GtkWidget *arow = adw_action_row_new ();
  GtkWidget *entry = rugosa_quantity_entry_new ();

  adw_action_row_set_subtitle_lines (ADW_ACTION_ROW (arow), 4);
  gtk_widget_set_valign (entry, GTK_ALIGN_CENTER);
  adw_action_row_add_suffix (ADW_ACTION_ROW (arow), entry);
  adw_action_row_set_activatable_widget (ADW_ACTION_ROW (arow), entry);
  /* In its row: the row takes the row's label and help from the entry. */
  rugosa_quantity_entry_set_field (RUGOSA_QUANTITY_ENTRY (entry), row);
  g_signal_connect_object (entry, "committed", G_CALLBACK (_rugosa_settings_page_committed), self, 0);
  adw_preferences_group_add (_rugosa_settings_page_group (self, row), arow);
  g_hash_table_insert (self->entries, (gpointer) row->property, entry);
}

/* --- texts -------------------------------------------------------------- */

/* The text of a text row's editor: an entry, or a multi-line view. */
static char *
_rugosa_settings_page_text_of (GtkWidget *widget)
{
  GtkTextIter start, end;
  GtkTextBuffer *buffer;

  if (GTK_IS_EDITABLE (widget))
    return g_strdup (gtk_editable_get_text (GTK_EDITABLE (widget)));
  buffer = gtk_text_view_get_buffer (GTK_TEXT_VIEW (widget));
  gtk_text_buffer_get_bounds (buffer, &start, &end);
  return gtk_text_buffer_get_text (buffer, &start, &end, FALSE);
}

static void
_rugosa_settings_page_text_commit (RugosaSettingsPage *self,
                                   GtkWidget          *widget)
{
  const RugosaField *row = g_object_get_data (G_OBJECT (widget), "rugosa-field");
  g_autofree char *text = _rugosa_settings_page_text_of (widget);
  g_autofree char *current = NULL;
  g_auto (GValue) v = G_VALUE_INIT;

  g_object_get (self->settings, row->property, &current, NULL);
  if (self->updating || g_strcmp0 (text, current) == 0)
    return;
  if (!rugosa_field_text_ok (row, text))
    {
      g_autofree char *why = (row->flags & RUGOSA_FIELD_DATE)
        ? g_strdup_printf (_("%s takes a date as YYYY-MM-DD, or nothing."), rugosa_field_label (row))
        : g_strdup_printf (_("%s takes at most %d characters, without control characters."),
                           rugosa_field_label (row), row->max_chars);

      gtk_widget_add_css_class (widget, "error");
      gtk_widget_set_tooltip_text (widget, why);
      return;
    }
  gtk_widget_remove_css_class (widget, "error");
  gtk_widget_set_tooltip_text (widget, _(row->help));
  g_value_init (&v, G_TYPE_STRING);
  g_value_set_string (&v, text);
  _rugosa_settings_page_apply (self, row->property, &v);
}

static void
_rugosa_settings_page_text_activate (GtkEntry           *entry,
                                     RugosaSettingsPage *self)
{
  _rugosa_settings_page_text_commit (self, GTK_WIDGET (entry));
}

static void
_rugosa_settings_page_text_leave (GtkEventControllerFocus *focus,
                                  RugosaSettingsPage      *self)
{
  _rugosa_settings_page_text_commit (self, gtk_event_controller_get_widget (GTK_EVENT_CONTROLLER (focus)));
}

static void
_rugosa_settings_page_add_text (RugosaSettingsPage *self,
                                const RugosaField  *row)
{
  GtkWidget *arow = adw_action_row_new ();
  GtkWidget *entry = gtk_entry_new ();
  GtkEventController *focus = gtk_event_controller_focus_new ();

  adw_preferences_row_set_title (ADW_PREFERENCES_ROW (arow), rugosa_field_label (row));
  adw_action_row_set_subtitle (ADW_ACTION_ROW (arow), _(row->help));
  adw_action_row_set_subtitle_lines (ADW_ACTION_ROW (arow), 4);
  /* a currency label or a revision mark is short; a title or a name
   * needs room */
  gtk_editable_set_width_chars (GTK_EDITABLE (entry), row->max_chars > 20 ? 24 : row->max_chars > 10 ? 10 : 8);
  gtk_widget_set_valign (entry, GTK_ALIGN_CENTER);
  gtk_widget_set_tooltip_text (entry, _(row->help));
  gtk_widget_set_name (entry, row->property);
  g_object_set_data (G_OBJECT (entry), "rugosa-field", (gpointer) row);
  g_signal_connect_object (entry, "activate", G_CALLBACK (_rugosa_settings_page_text_activate), self, 0);
  g_signal_connect_object (focus, "leave", G_CALLBACK (_rugosa_settings_page_text_leave), self, 0);
  gtk_widget_add_controller (entry, focus);
  adw_action_row_add_suffix (ADW_ACTION_ROW (arow), entry);
  adw_action_row_set_activatable_widget (ADW_ACTION_ROW (arow), entry);
  adw_preferences_group_add (_rugosa_settings_page_group (self, row), arow);
  g_hash_table_insert (self->texts, (gpointer) row->property, entry);
}

/* A text of several lines (a note): its row names it, the view below
 * holds it; committed when the focus leaves. */
static void
_rugosa_settings_page_add_multiline (RugosaSettingsPage *self,
                                     const RugosaField  *row)
{
  GtkWidget *arow = adw_action_row_new ();
  GtkWidget *scroll = gtk_scrolled_window_new ();
  GtkWidget *view = gtk_text_view_new ();
  GtkEventController *focus = gtk_event_controller_focus_new ();
  AdwPreferencesGroup *group = _rugosa_settings_page_group (self, row);

  adw_preferences_row_set_title (ADW_PREFERENCES_ROW (arow), rugosa_field_label (row));
  adw_action_row_set_subtitle (ADW_ACTION_ROW (arow), _(row->help));
  adw_action_row_set_subtitle_lines (ADW_ACTION_ROW (arow), 4);
  gtk_text_view_set_wrap_mode (GTK_TEXT_VIEW (view), GTK_WRAP_WORD_CHAR);
  gtk_text_view_set_top_margin (GTK_TEXT_VIEW (view), 6);
  gtk_text_view_set_bottom_margin (GTK_TEXT_VIEW (view), 6);
  gtk_text_view_set_left_margin (GTK_TEXT_VIEW (view), 8);
  gtk_text_view_set_right_margin (GTK_TEXT_VIEW (view), 8);
  gtk_widget_set_tooltip_text (view, _(row->help));
  gtk_widget_set_name (view, row->property);
  g_object_set_data (G_OBJECT (view), "rugosa-field", (gpointer) row);
  g_signal_connect_object (focus, "leave", G_CALLBACK (_rugosa_settings_page_text_leave), self, 0);
  gtk_widget_add_controller (view, focus);
  gtk_scrolled_window_set_child (GTK_SCROLLED_WINDOW (scroll), view);
  gtk_scrolled_window_set_policy (GTK_SCROLLED_WINDOW (scroll), GTK_POLICY_NEVER, GTK_POLICY_AUTOMATIC);
  gtk_scrolled_window_set_min_content_height (GTK_SCROLLED_WINDOW (scroll), 90);
  gtk_widget_add_css_class (scroll, "card");
  gtk_widget_set_margin_top (scroll, 6);
  adw_preferences_group_add (group, arow);
  /* not a row: placed under the group's list */
  adw_preferences_group_add (group, scroll);
  g_hash_table_insert (self->texts, (gpointer) row->property, view);
}

/* --- enumerations -------------------------------------------------------- */

static void
_rugosa_settings_page_enum_changed (AdwComboRow        *combo,
                                    GParamSpec         *pspec,
                                    RugosaSettingsPage *self)
{
  const RugosaField *row = g_object_get_data (G_OBJECT (combo), "rugosa-field");
  int value = rugosa_field_choice_value (row->enum_type (), adw_combo_row_get_selected (combo));
  g_auto (GValue) v = G_VALUE_INIT;

  if (value < 0 || self->updating)
    return;
  g_value_init (&v, row->enum_type ());
  g_value_set_enum (&v, value);
  _rugosa_settings_page_apply (self, row->property, &v);
}

static void
_rugosa_settings_page_add_enum (RugosaSettingsPage *self,
                                const RugosaField  *row)
{
  AdwComboRow *combo = ADW_COMBO_ROW (adw_combo_row_new ());
  g_autoptr (GtkStringList) titles = rugosa_field_choice_titles (row->enum_type ());

  adw_preferences_row_set_title (ADW_PREFERENCES_ROW (combo), rugosa_field_label (row));
  adw_action_row_set_subtitle (ADW_ACTION_ROW (combo), _(row->help));
  adw_action_row_set_subtitle_lines (ADW_ACTION_ROW (combo), 4);
  adw_combo_row_set_model (combo, G_LIST_MODEL (titles));
  gtk_widget_set_name (GTK_WIDGET (combo), row->property);
  g_object_set_data (G_OBJECT (combo), "rugosa-field", (gpointer) row);
  g_signal_connect_object (combo, "notify::selected", G_CALLBACK (_rugosa_settings_page_enum_changed), self, 0);
  adw_preferences_group_add (_rugosa_settings_page_group (self, row), GTK_WIDGET (combo));
  g_hash_table_insert (self->choices, g_strdup (row->property), combo);
}

/* --- units of single quantities ------------------------------------------ */

/* Each unit choice keeps the spellings it offers, parallel to its list:
 * NULL first (the unit system's usual unit), then rugosa_display_unit_choice,
 * then any spelling a file held that the list lacks. */
const char *
rugosa_settings_page_unit_at (AdwComboRow *choice,
                              guint        position)
{
  GPtrArray *units = g_object_get_data (G_OBJECT (choice), "rugosa-units");

  if (units == NULL || position >= units->len)
    return NULL;
  return g_ptr_array_index (units, position);
}

static char *
_rugosa_settings_page_usual_title (RugosaSettingsPage   *self,
                                   RugosaDisplayQuantity dq)
{
  const char *unit = rugosa_display_default_unit (dq, rugosa_settings_get_unit_system (self->settings));

  /* TRANSLATORS: the first choice of a quantity's unit: the unit system's
   * usual one, whatever the system is, e.g. "°C (usual)" */
  return g_strdup_printf (_("%s (usual)"), rugosa_display_unit_symbol (unit));
}

static void
_rugosa_settings_page_unit_changed (AdwComboRow        *combo,
                                    GParamSpec         *pspec,
                                    RugosaSettingsPage *self)
{
  const RugosaField *row = g_object_get_data (G_OBJECT (combo), "rugosa-field");
  RugosaDisplayQuantity dq = (RugosaDisplayQuantity) GPOINTER_TO_INT (g_object_get_data (G_OBJECT (combo), "rugosa-quantity"));
  const RugosaDisplayInfo *info = rugosa_display_info (dq);
  const char *unit = rugosa_settings_page_unit_at (combo, adw_combo_row_get_selected (combo));
  g_autoptr (GVariant) old = NULL;
  g_auto (GValue) v = G_VALUE_INIT;
  GVariantBuilder b;
  GVariantIter iter;
  const char *id, *u;

  if (self->updating || adw_combo_row_get_selected (combo) == GTK_INVALID_LIST_POSITION)
    return;
  /* The map with this quantity's entry replaced (or taken out). */
  g_object_get (self->settings, row->property, &old, NULL);
  g_variant_builder_init (&b, G_VARIANT_TYPE ("a{ss}"));
  if (old != NULL)
    {
      g_variant_iter_init (&iter, old);
      while (g_variant_iter_next (&iter, "{&s&s}", &id, &u))
        if (!g_str_equal (id, info->id))
          g_variant_builder_add (&b, "{ss}", id, u);
    }
  if (unit != NULL)
    g_variant_builder_add (&b, "{ss}", info->id, unit);
  g_value_init (&v, G_TYPE_VARIANT);
  g_value_take_variant (&v, g_variant_ref_sink (g_variant_builder_end (&b)));
  _rugosa_settings_page_apply (self, row->property, &v);
}

static void
_rugosa_settings_page_add_units (RugosaSettingsPage *self,
                                 const RugosaField  *row)
{
  AdwPreferencesGroup *group = _rugosa_settings_page_group (self, row);
  AdwExpanderRow *expander = ADW_EXPANDER_ROW (adw_expander_row_new ());

  adw_preferences_row_set_title (ADW_PREFERENCES_ROW (expander), rugosa_field_label (row));
  adw_expander_row_set_subtitle (expander, _(row->help));
  gtk_widget_set_name (GTK_WIDGET (expander), row->property);
  adw_preferences_group_add (group, GTK_WIDGET (expander));

  for (int q = 0; q < RUGOSA_N_DISPLAY; q++)
    {
      RugosaDisplayQuantity dq = (RugosaDisplayQuantity) q;
      const RugosaDisplayInfo *info = rugosa_display_info (dq);
      AdwComboRow *combo;
      g_autoptr (GtkStringList) titles = NULL;
      GPtrArray *units;
      g_autofree char *usual = NULL;
      char *key;

      if (info == NULL)
        continue;
      combo = ADW_COMBO_ROW (adw_combo_row_new ());
      titles = gtk_string_list_new (NULL);
      units = g_ptr_array_new_with_free_func (g_free);
      usual = _rugosa_settings_page_usual_title (self, dq);
      gtk_string_list_append (titles, usual);
      g_ptr_array_add (units, NULL);
      for (int i = 0; rugosa_display_unit_choice (dq, i) != NULL; i++)
        {
          gtk_string_list_append (titles, rugosa_display_unit_choice (dq, i));
          g_ptr_array_add (units, g_strdup (rugosa_display_unit_choice (dq, i)));
        }
      adw_preferences_row_set_title (ADW_PREFERENCES_ROW (combo), _(info->label));
      adw_combo_row_set_model (combo, G_LIST_MODEL (titles));
      key = rugosa_seed_unit_key (dq);
      gtk_widget_set_name (GTK_WIDGET (combo), key);
      g_object_set_data_full (G_OBJECT (combo), "rugosa-units", units, (GDestroyNotify) g_ptr_array_unref);
      g_object_set_data (G_OBJECT (combo), "rugosa-field", (gpointer) row);
      g_object_set_data (G_OBJECT (combo), "rugosa-quantity", GINT_TO_POINTER (q));
      g_signal_connect_object (combo, "notify::selected", G_CALLBACK (_rugosa_settings_page_unit_changed), self, 0);
      adw_expander_row_add_row (expander, GTK_WIDGET (combo));
      g_hash_table_insert (self->choices, key, combo);
    }
}

/* --- following the settings ---------------------------------------------- */

static void
_rugosa_settings_page_show_unit (RugosaSettingsPage *self,
                                 AdwComboRow        *combo)
{
  RugosaDisplayQuantity dq = (RugosaDisplayQuantity) GPOINTER_TO_INT (g_object_get_data (G_OBJECT (combo), "rugosa-quantity"));
  const RugosaField *row = g_object_get_data (G_OBJECT (combo), "rugosa-field");
  const RugosaDisplayInfo *info = rugosa_display_info (dq);
  GPtrArray *units = g_object_get_data (G_OBJECT (combo), "rugosa-units");
  GtkStringList *titles = GTK_STRING_LIST (adw_combo_row_get_model (combo));
  g_autoptr (GVariant) map = NULL;
  g_autofree char *usual = _rugosa_settings_page_usual_title (self, dq);
  const char *override = NULL;
  guint position = 0;

  g_object_get (self->settings, row->property, &map, NULL);
  /* An override this build cannot read is kept in the file, not used:
   * the field shows the system's unit, as every view does. */
  if (map != NULL && g_variant_lookup (map, info->id, "&s", &override)
      && rugosa_display_unit_valid (dq, override))
    {
      const char *shown = rugosa_display_unit_symbol (override);

      position = GTK_INVALID_LIST_POSITION;
      for (guint i = 1; i < units->len && position == GTK_INVALID_LIST_POSITION; i++)
        if (g_strcmp0 (g_ptr_array_index (units, i), override) == 0
            || g_strcmp0 (g_ptr_array_index (units, i), shown) == 0)
          position = i;
      if (position == GTK_INVALID_LIST_POSITION)
        {
          /* A spelling from a file that the list lacks ("gal/min"). */
          gtk_string_list_append (titles, shown);
          g_ptr_array_add (units, g_strdup (override));
          position = units->len - 1;
        }
    }
  if (g_strcmp0 (gtk_string_list_get_string (titles, 0), usual) != 0)
    {
      const char *replace[] = { usual, NULL };

      gtk_string_list_splice (titles, 0, 1, replace);
    }
  if (adw_combo_row_get_selected (combo) != position)
    adw_combo_row_set_selected (combo, position);
}

static void
_rugosa_settings_page_refresh (RugosaSettingsPage *self)
{
  GHashTableIter iter;
  gpointer key, widget;

  self->updating = TRUE;
  g_hash_table_iter_init (&iter, self->entries);
  while (g_hash_table_iter_next (&iter, &key, &widget))
    {
      RugosaQuantityEntry *entry = widget;
      const RugosaField *row = rugosa_quantity_entry_get_field (entry);

      rugosa_quantity_entry_set_unit (entry, rugosa_settings_get_unit (self->settings, row->display));
      /* A field showing a refusal keeps the text typed until it is fixed. */
      if (rugosa_quantity_entry_get_error_text (entry) == NULL)
        rugosa_quantity_entry_set_value (entry, rugosa_settings_get_double (self->settings, row->property));
    }
  g_hash_table_iter_init (&iter, self->texts);
  while (g_hash_table_iter_next (&iter, &key, &widget))
    {
      const RugosaField *row = g_object_get_data (G_OBJECT (widget), "rugosa-field");
      g_autofree char *text = NULL;

      g_autofree char *shown = _rugosa_settings_page_text_of (widget);

      g_object_get (self->settings, row->property, &text, NULL);
      if (gtk_widget_has_css_class (widget, "error") || g_strcmp0 (shown, text ? text : "") == 0)
        continue;
      if (GTK_IS_EDITABLE (widget))
        gtk_editable_set_text (GTK_EDITABLE (widget), text ? text : "");
      else
        gtk_text_buffer_set_text (gtk_text_view_get_buffer (GTK_TEXT_VIEW (widget)), text ? text : "", -1);
    }
  g_hash_table_iter_init (&iter, self->choices);
  while (g_hash_table_iter_next (&iter, &key, &widget))
    {
      AdwComboRow *combo = widget;
      const RugosaField *row = g_object_get_data (G_OBJECT (combo), "rugosa-field");

      if (row->kind == RUGOSA_FIELD_ENUM)
        {
          int value = 0;
          guint position;

          g_object_get (self->settings, row->property, &value, NULL);
          position = rugosa_field_choice_position (row->enum_type (), value);
          if (adw_combo_row_get_selected (combo) != position)
            adw_combo_row_set_selected (combo, position);
        }
      else
        _rugosa_settings_page_show_unit (self, combo);
    }
  self->updating = FALSE;
}

/* --- object -------------------------------------------------------------- */

void
rugosa_settings_page_build (RugosaSettingsPage *self,
                            RugosaSettings     *settings,
                            guint               required,
                            guint               excluded)
{
  guint n;
  const RugosaField *rows = rugosa_settings_fields (&n);

  g_return_if_fail (RUGOSA_IS_SETTINGS_PAGE (self));
  g_return_if_fail (RUGOSA_IS_SETTINGS (settings));
  g_return_if_fail (self->settings == NULL);

  self->settings = g_object_ref (settings);
  /* Groups in their order, rows in the table's order within each; then
   * any row of no group. */
  for (guint g = 0; g <= G_N_ELEMENTS (groups); g++)
    for (guint i = 0; i < n; i++)
      {
        const RugosaField *row = &rows[i];
        gboolean grouped = FALSE;

        for (guint k = 0; k < G_N_ELEMENTS (groups); k++)
          grouped |= g_str_has_prefix (row->path, groups[k].path_prefix);
        if ((row->flags & required) != required || (row->flags & excluded) != 0)
          continue;
        if (g < G_N_ELEMENTS (groups) ? !g_str_has_prefix (row->path, groups[g].path_prefix) : grouped)
          continue;
        switch (row->kind)
          {
          case RUGOSA_FIELD_NUMBER:
            _rugosa_settings_page_add_number (self, row);
            break;
          case RUGOSA_FIELD_ENUM:
            _rugosa_settings_page_add_enum (self, row);
            break;
          case RUGOSA_FIELD_UNIT_MAP:
            _rugosa_settings_page_add_units (self, row);
            break;
          case RUGOSA_FIELD_TEXT:
            if (row->flags & RUGOSA_FIELD_MULTILINE)
              _rugosa_settings_page_add_multiline (self, row);
            else
              _rugosa_settings_page_add_text (self, row);
            break;
          default:
            g_warn_if_reached ();
            break;
          }
      }
  g_signal_connect_object (settings, "notify", G_CALLBACK (_rugosa_settings_page_refresh), self, G_CONNECT_SWAPPED);
  _rugosa_settings_page_refresh (self);
}

RugosaSettingsPage *
rugosa_settings_page_new (RugosaSettings *settings,
                          guint           required,
                          guint           excluded)
{
  RugosaSettingsPage *self = g_object_new (RUGOSA_TYPE_SETTINGS_PAGE, NULL);

  rugosa_settings_page_build (self, settings, required, excluded);
  return self;
}

void
rugosa_settings_page_set_apply_func (RugosaSettingsPage *self,
                                     RugosaSettingsApply apply,
                                     gpointer            user_data,
                                     GDestroyNotify      destroy)
{
  g_return_if_fail (RUGOSA_IS_SETTINGS_PAGE (self));

  if (self->apply_destroy != NULL)
    self->apply_destroy (self->apply_data);
  self->apply = apply;
  self->apply_data = user_data;
  self->apply_destroy = destroy;
}

RugosaSettings *
rugosa_settings_page_get_settings (RugosaSettingsPage *self)
{
  g_return_val_if_fail (RUGOSA_IS_SETTINGS_PAGE (self), NULL);
  return self->settings;
}

RugosaQuantityEntry *
rugosa_settings_page_get_entry (RugosaSettingsPage *self,
                                const char         *property)
{
  g_return_val_if_fail (RUGOSA_IS_SETTINGS_PAGE (self), NULL);
  return g_hash_table_lookup (self->entries, property);
}

GtkWidget *
rugosa_settings_page_get_text (RugosaSettingsPage *self,
                               const char         *property)
{
  g_return_val_if_fail (RUGOSA_IS_SETTINGS_PAGE (self), NULL);
  return g_hash_table_lookup (self->texts, property);
}

AdwComboRow *
rugosa_settings_page_get_choice (RugosaSettingsPage *self,
                                 const char         *name)
{
  g_return_val_if_fail (RUGOSA_IS_SETTINGS_PAGE (self), NULL);
  return g_hash_table_lookup (self->choices, name);
}

static void
rugosa_settings_page_dispose (GObject *object)
{
  RugosaSettingsPage *self = RUGOSA_SETTINGS_PAGE (object);

  rugosa_settings_page_set_apply_func (self, NULL, NULL, NULL);
  g_clear_pointer (&self->entries, g_hash_table_unref);
  g_clear_pointer (&self->choices, g_hash_table_unref);
  g_clear_pointer (&self->texts, g_hash_table_unref);
  g_clear_pointer (&self->groups, g_hash_table_unref);
  g_clear_object (&self->settings);
  G_OBJECT_CLASS (rugosa_settings_page_parent_class)->dispose (object);
}

static void
rugosa_settings_page_class_init (RugosaSettingsPageClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);

  object_class->dispose = rugosa_settings_page_dispose;
}

static void
rugosa_settings_page_init (RugosaSettingsPage *self)
{
  self->entries = g_hash_table_new (g_str_hash, g_str_equal);
  self->choices = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, NULL);
  self->texts = g_hash_table_new (g_str_hash, g_str_equal);
  self->groups = g_hash_table_new (g_str_hash, g_str_equal);
}
