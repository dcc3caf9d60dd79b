/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-quantity-entry"

#include "config.h"

#include <adwaita.h>
#include <glib/gi18n.h>
#include <math.h>
#include <string.h>

#include "model/rugosa-display.h"
#include "model/rugosa-units.h"
#include "rugosa-quantity-entry.h"

struct _RugosaQuantityEntry
{
  GtkWidget parent_instance;

  /* template widgets */
  GtkEntry *entry;
  GtkLabel *unit_label;

  /* borrowed references */
  const RugosaField *field;

  /* owned references */
  char   *unit;
  char   *hint;
  char   *error_text;
  char   *problem;
  double  value;
  double  density;
  gboolean has_value;
};

G_DEFINE_FINAL_TYPE (RugosaQuantityEntry, rugosa_quantity_entry, GTK_TYPE_WIDGET)

enum {
  PROP_0,
  PROP_VALUE,
  PROP_UNIT,
  PROP_ERROR_TEXT,
  PROP_PLACEHOLDER_TEXT,
  N_PROPS
};

enum {
  COMMITTED,
  N_SIGNALS
};

static GParamSpec *properties[N_PROPS];
static guint signals[N_SIGNALS];

GtkWidget *
rugosa_quantity_entry_new (void)
{
  return g_object_new (RUGOSA_TYPE_QUANTITY_ENTRY, NULL);
}

static const RugosaDisplayInfo *
_rugosa_quantity_entry_info (RugosaQuantityEntry *self)
{
  return self->field ? rugosa_display_info (self->field->display) : NULL;
}

char *
rugosa_quantity_entry_format (RugosaQuantityEntry *self,
                              double               value)
{
  const RugosaDisplayInfo *info;
  g_autofree char *plain = NULL;
  char *end;

  g_return_val_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self), NULL);
  info = _rugosa_quantity_entry_info (self);
  if (info != NULL)
    return rugosa_display_format_screen (info->quantity, value * self->field->to_si, self->unit);
  /* A plain number, without the zeros a fixed number of figures adds
   * ("0.006", not "0.006000"), as a quantity's text reads. */
  plain = rugosa_display_significant (value, 4);
  if (strchr (plain, '.') != NULL && strchr (plain, 'e') == NULL)
    {
      end = plain + strlen (plain) - 1;
      while (*end == '0')
        *end-- = '\0';
      if (*end == '.')
        *end = '\0';
    }
  return rugosa_display_localize (g_steal_pointer (&plain));
}

static void
_rugosa_quantity_entry_show (RugosaQuantityEntry *self)
{
  g_autofree char *text = NULL;

  if (!self->has_value || self->field == NULL)
    {
      gtk_editable_set_text (GTK_EDITABLE (self->entry), "");
      return;
    }
  text = rugosa_quantity_entry_format (self, self->value);
  gtk_editable_set_text (GTK_EDITABLE (self->entry), text);
}

/* The row's help, and for a quantity the units the field reads. */
static char *
_rugosa_quantity_entry_plain_tooltip (RugosaQuantityEntry *self)
{
  const RugosaDisplayInfo *info = _rugosa_quantity_entry_info (self);

  if (self->field == NULL)
    return NULL;
  if (info == NULL)
    return g_strdup (_(self->field->help));
  /* TRANSLATORS: a field's tooltip: its help, then the unit spellings it reads */
  return g_strdup_printf (_("%s\nUnits it reads: %s"), _(self->field->help),
                          rg_units_accepted (info->quantity));
}

/* What the entry and its row show: a refusal first, then a problem
 * found elsewhere, else the hint. */
static void
_rugosa_quantity_entry_update_marks (RugosaQuantityEntry *self)
{
  GtkWidget *row = gtk_widget_get_ancestor (GTK_WIDGET (self), ADW_TYPE_ACTION_ROW);
  const char *why = self->error_text ? self->error_text : self->problem;

  if (why != NULL)
    {
      gtk_widget_add_css_class (GTK_WIDGET (self->entry), "error");
      gtk_widget_set_tooltip_text (GTK_WIDGET (self), why);
      gtk_accessible_update_state (GTK_ACCESSIBLE (self->entry),
                                   GTK_ACCESSIBLE_STATE_INVALID, GTK_ACCESSIBLE_INVALID_TRUE, -1);
    }
  else
    {
      g_autofree char *tip = _rugosa_quantity_entry_plain_tooltip (self);

      gtk_widget_remove_css_class (GTK_WIDGET (self->entry), "error");
      gtk_widget_set_tooltip_text (GTK_WIDGET (self), tip);
      gtk_accessible_reset_state (GTK_ACCESSIBLE (self->entry), GTK_ACCESSIBLE_STATE_INVALID);
    }
  if (row != NULL)
    {
      /* The explanation sits under the field's title while it is wrong;
       * it may echo what was typed ("<", "&"), so it is plain text. */
      adw_preferences_row_set_use_markup (ADW_PREFERENCES_ROW (row), FALSE);
      adw_action_row_set_subtitle (ADW_ACTION_ROW (row), why ? why : self->hint ? self->hint : "");
      if (why != NULL)
        gtk_widget_add_css_class (row, "field-error");
      else
        gtk_widget_remove_css_class (row, "field-error");
    }
}

static void
_rugosa_quantity_entry_set_error_text (RugosaQuantityEntry *self,
                                       const char          *text)
{
  if (g_strcmp0 (self->error_text, text) == 0)
    return;
  g_free (self->error_text);
  self->error_text = g_strdup (text);
  _rugosa_quantity_entry_update_marks (self);
  g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_ERROR_TEXT]);
}

void
rugosa_quantity_entry_set_error (RugosaQuantityEntry *self,
                                 const char          *text)
{
  g_return_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self));
  _rugosa_quantity_entry_set_error_text (self, text);
}

void
rugosa_quantity_entry_set_problem (RugosaQuantityEntry *self,
                                   const char          *text)
{
  g_return_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self));
  if (g_strcmp0 (self->problem, text) == 0)
    return;
  g_free (self->problem);
  self->problem = g_strdup (text);
  _rugosa_quantity_entry_update_marks (self);
}

const char *
rugosa_quantity_entry_get_problem (RugosaQuantityEntry *self)
{
  g_return_val_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self), NULL);
  return self->problem;
}

void
rugosa_quantity_entry_set_hint (RugosaQuantityEntry *self,
                                const char          *hint)
{
  g_return_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self));
  if (g_strcmp0 (self->hint, hint) == 0)
    return;
  g_free (self->hint);
  self->hint = g_strdup (hint);
  _rugosa_quantity_entry_update_marks (self);
}

/* A sentence of the core that starts in lower case ("the value is empty:
 * …") stands alone under the field's title: it starts with a capital. */
static char *
_rugosa_quantity_entry_sentence (const char *text)
{
  char *s;

  if (text == NULL || *text == '\0')
    return g_strdup (_("Not a value this field accepts."));
  s = g_strdup (text);
  s[0] = g_ascii_toupper (s[0]);
  /* Numbers in the sentence read as on the rest of the screen. */
  return rugosa_display_localize (s);
}

/* Workaround: for a plain-number row, rugosa_field_parse_text echoes
 * the text through g_utf8_make_valid (text, 40), which reads 40 bytes
 * whatever the text's length, so a short text echoes memory beyond it.
 * Until the model reads at most the string (g_utf8_make_valid (text, -1),
 * then the first 40 characters), text that is not a plain number is
 * answered here, with the model's own sentence and echo length. */
static gboolean
_rugosa_quantity_entry_plain_number (const char *ascii)
{
  char *end = NULL;
  double x;

  while (g_ascii_isspace (*ascii))
    ascii++;
  if (*ascii == '\0')
    return FALSE;
  x = g_ascii_strtod (ascii, &end);
  while (end != NULL && g_ascii_isspace (*end))
    end++;
  return end != NULL && end != ascii && *end == '\0' && isfinite (x);
}

static void
_rugosa_quantity_entry_not_a_number (const RugosaField *field,
                                     const char        *text,
                                     RgError           *err)
{
  g_autofree char *valid = g_utf8_make_valid (text, -1);
  g_autofree char *shown = g_utf8_substring (valid, 0, MIN (g_utf8_strlen (valid, -1), 40));
  g_autofree char *msg = NULL;

  g_strdelimit (shown, "\n\r\t", ' ');
  /* TRANSLATORS: %s is what was typed, e.g. "abc" for a thermal expansion */
  msg = g_strdup_printf (_("“%s” is not a number: type a plain number such as 0.00064."), shown);
  rg_error_set_on (err, RG_ERR_PARSE, field->subjects, "%s", msg);
}

gboolean
rugosa_quantity_entry_commit_text (RugosaQuantityEntry *self,
                                   const char          *text)
{
  RgError err = { 0 };
  double stored = 0.0;
  g_autofree char *stripped = NULL;
  g_autofree char *ascii = NULL;   /* "2,5 m" typed under de_DE: "2.5 m" */

  g_return_val_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self), FALSE);
  g_return_val_if_fail (self->field != NULL, FALSE);

  stripped = g_strstrip (g_strdup (text ? text : ""));
  ascii = rugosa_display_delocalize (stripped);
  /* A bare number means the unit the field shows: someone who sees
   * "102.3 mm" and types "150" means 150 mm, not 150 m. */
  if (_rugosa_quantity_entry_info (self) == NULL && !_rugosa_quantity_entry_plain_number (ascii))
    _rugosa_quantity_entry_not_a_number (self->field, ascii, &err);
  if (err.text[0] != '\0'
      || !rugosa_field_parse_text (self->field, ascii, self->unit, self->density, &stored, &err)
      || !rugosa_field_in_range (self->field, stored, self->unit, &err))
    {
      g_autofree char *why = _rugosa_quantity_entry_sentence (err.text);

      /* The last valid value stays in force; only the field is marked. */
      if (text != gtk_editable_get_text (GTK_EDITABLE (self->entry)))
        gtk_editable_set_text (GTK_EDITABLE (self->entry), stripped);
      _rugosa_quantity_entry_set_error_text (self, why);
      return FALSE;
    }

  _rugosa_quantity_entry_set_error_text (self, NULL);
  if (!self->has_value || stored != self->value)
    {
      self->value = stored;
      self->has_value = TRUE;
      g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_VALUE]);
      _rugosa_quantity_entry_show (self);
      g_signal_emit (self, signals[COMMITTED], 0, stored);
    }
  else
    _rugosa_quantity_entry_show (self);
  return TRUE;
}

static void
_rugosa_quantity_entry_activate (GtkEntry            *entry,
                                 RugosaQuantityEntry *self)
{
  if (self->field != NULL)
    rugosa_quantity_entry_commit_text (self, gtk_editable_get_text (GTK_EDITABLE (entry)));
}

static void
_rugosa_quantity_entry_focus_leave (GtkEventControllerFocus *focus,
                                    RugosaQuantityEntry     *self)
{
  g_autofree char *shown = NULL;
  const char *text = gtk_editable_get_text (GTK_EDITABLE (self->entry));

  if (self->field == NULL)
    return;
  /* Leaving an untouched field must not re-commit a rounded display value. */
  if (self->has_value)
    shown = rugosa_quantity_entry_format (self, self->value);
  if (g_strcmp0 (shown, text) == 0)
    return;
  rugosa_quantity_entry_commit_text (self, text);
}

const RugosaField *
rugosa_quantity_entry_get_field (RugosaQuantityEntry *self)
{
  g_return_val_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self), NULL);
  return self->field;
}

void
rugosa_quantity_entry_set_field (RugosaQuantityEntry *self,
                                 const RugosaField   *field)
{
  GtkWidget *row;
  const char *label;

  g_return_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self));
  g_return_if_fail (field == NULL || field->kind == RUGOSA_FIELD_NUMBER);

  self->field = field;
  if (field == NULL)
    return;
  label = rugosa_field_label (field);
  gtk_widget_set_name (GTK_WIDGET (self), field->property);
  /* A plain number's unit ("1/K") stands beside the text, which holds
   * the number alone. */
  gtk_label_set_text (self->unit_label, field->unit_text ? field->unit_text : "");
  gtk_widget_set_visible (GTK_WIDGET (self->unit_label),
                          rugosa_display_info (field->display) == NULL && field->unit_text != NULL);
  /* Screen readers name the field after its row. */
  gtk_accessible_update_property (GTK_ACCESSIBLE (self->entry),
                                  GTK_ACCESSIBLE_PROPERTY_LABEL, label,
                                  GTK_ACCESSIBLE_PROPERTY_DESCRIPTION, _(field->help),
                                  -1);
  row = gtk_widget_get_ancestor (GTK_WIDGET (self), ADW_TYPE_ACTION_ROW);
  if (row != NULL)
    adw_preferences_row_set_title (ADW_PREFERENCES_ROW (row), label);
  g_free (self->hint);
  self->hint = g_strdup (_(field->help));
  _rugosa_quantity_entry_update_marks (self);
  _rugosa_quantity_entry_show (self);
}

double
rugosa_quantity_entry_get_value (RugosaQuantityEntry *self)
{
  g_return_val_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self), 0.0);
  return self->value;
}

void
rugosa_quantity_entry_set_value (RugosaQuantityEntry *self,
                                 double               value)
{
  g_return_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self));
  self->has_value = TRUE;
  _rugosa_quantity_entry_set_error_text (self, NULL);
  if (self->value != value)
    {
      self->value = value;
      g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_VALUE]);
    }
  _rugosa_quantity_entry_show (self);
}

const char *
rugosa_quantity_entry_get_unit (RugosaQuantityEntry *self)
{
  g_return_val_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self), NULL);
  return self->unit;
}

void
rugosa_quantity_entry_set_unit (RugosaQuantityEntry *self,
                                const char          *unit)
{
  g_return_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self));
  if (g_strcmp0 (self->unit, unit) == 0)
    return;
  g_free (self->unit);
  self->unit = g_strdup (unit);
  if (self->error_text == NULL)
    _rugosa_quantity_entry_show (self);
  g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_UNIT]);
}

void
rugosa_quantity_entry_set_density (RugosaQuantityEntry *self,
                                   double               density_kg_m3)
{
  g_return_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self));
  self->density = density_kg_m3;
}

const char *
rugosa_quantity_entry_get_error_text (RugosaQuantityEntry *self)
{
  g_return_val_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self), NULL);
  return self->error_text;
}

GtkEditable *
rugosa_quantity_entry_get_editable (RugosaQuantityEntry *self)
{
  g_return_val_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self), NULL);
  return GTK_EDITABLE (self->entry);
}

static void
rugosa_quantity_entry_get_property (GObject    *object,
                                    guint       prop_id,
                                    GValue     *value,
                                    GParamSpec *pspec)
{
  RugosaQuantityEntry *self = RUGOSA_QUANTITY_ENTRY (object);

  switch (prop_id)
    {
    case PROP_VALUE: g_value_set_double (value, self->value); break;
    case PROP_UNIT: g_value_set_string (value, self->unit); break;
    case PROP_ERROR_TEXT: g_value_set_string (value, self->error_text); break;
    case PROP_PLACEHOLDER_TEXT:
      g_value_set_string (value, gtk_entry_get_placeholder_text (self->entry));
      break;
    default: G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_quantity_entry_set_property (GObject      *object,
                                    guint         prop_id,
                                    const GValue *value,
                                    GParamSpec   *pspec)
{
  RugosaQuantityEntry *self = RUGOSA_QUANTITY_ENTRY (object);

  switch (prop_id)
    {
    case PROP_VALUE: rugosa_quantity_entry_set_value (self, g_value_get_double (value)); break;
    case PROP_UNIT: rugosa_quantity_entry_set_unit (self, g_value_get_string (value)); break;
    case PROP_PLACEHOLDER_TEXT:
      gtk_entry_set_placeholder_text (self->entry, g_value_get_string (value));
      break;
    default: G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_quantity_entry_dispose (GObject *object)
{
  RugosaQuantityEntry *self = RUGOSA_QUANTITY_ENTRY (object);

  gtk_widget_dispose_template (GTK_WIDGET (self), RUGOSA_TYPE_QUANTITY_ENTRY);
  /* Template children without an id are not cleared by the call above. */
  for (GtkWidget *child; (child = gtk_widget_get_first_child (GTK_WIDGET (self))) != NULL;)
    gtk_widget_unparent (child);
  G_OBJECT_CLASS (rugosa_quantity_entry_parent_class)->dispose (object);
}

static void
rugosa_quantity_entry_finalize (GObject *object)
{
  RugosaQuantityEntry *self = RUGOSA_QUANTITY_ENTRY (object);

  g_free (self->unit);
  g_free (self->hint);
  g_free (self->error_text);
  g_free (self->problem);
  G_OBJECT_CLASS (rugosa_quantity_entry_parent_class)->finalize (object);
}

static gboolean
rugosa_quantity_entry_grab_focus (GtkWidget *widget)
{
  return gtk_widget_grab_focus (GTK_WIDGET (RUGOSA_QUANTITY_ENTRY (widget)->entry));
}

static void
rugosa_quantity_entry_class_init (RugosaQuantityEntryClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->get_property = rugosa_quantity_entry_get_property;
  object_class->set_property = rugosa_quantity_entry_set_property;
  object_class->dispose = rugosa_quantity_entry_dispose;
  object_class->finalize = rugosa_quantity_entry_finalize;
  widget_class->grab_focus = rugosa_quantity_entry_grab_focus;

  properties[PROP_VALUE] =
    g_param_spec_double ("value", NULL, NULL, -G_MAXDOUBLE, G_MAXDOUBLE, 0.0,
                         G_PARAM_READWRITE | G_PARAM_EXPLICIT_NOTIFY | G_PARAM_STATIC_STRINGS);
  properties[PROP_UNIT] =
    g_param_spec_string ("unit", NULL, NULL, NULL,
                         G_PARAM_READWRITE | G_PARAM_EXPLICIT_NOTIFY | G_PARAM_STATIC_STRINGS);
  properties[PROP_ERROR_TEXT] =
    g_param_spec_string ("error-text", NULL, NULL, NULL,
                         G_PARAM_READABLE | G_PARAM_EXPLICIT_NOTIFY | G_PARAM_STATIC_STRINGS);
  properties[PROP_PLACEHOLDER_TEXT] =
    g_param_spec_string ("placeholder-text", NULL, NULL, NULL,
                         G_PARAM_READWRITE | G_PARAM_STATIC_STRINGS);
  g_object_class_install_properties (object_class, N_PROPS, properties);

  /* A new valid value (the row's stored unit) typed by the user. */
  signals[COMMITTED] =
    g_signal_new ("committed", G_TYPE_FROM_CLASS (klass), G_SIGNAL_RUN_LAST,
                  0, NULL, NULL, NULL, G_TYPE_NONE, 1, G_TYPE_DOUBLE);

  gtk_widget_class_set_template_from_resource (widget_class, "/org/rugosa/Rugosa/rugosa-quantity-entry.ui");
  gtk_widget_class_bind_template_child (widget_class, RugosaQuantityEntry, entry);
  gtk_widget_class_bind_template_child (widget_class, RugosaQuantityEntry, unit_label);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_quantity_entry_activate);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_quantity_entry_focus_leave);
  gtk_widget_class_set_layout_manager_type (widget_class, GTK_TYPE_BOX_LAYOUT);
  gtk_widget_class_set_css_name (widget_class, "quantityentry");
}

static void
rugosa_quantity_entry_init (RugosaQuantityEntry *self)
{
  /* Until told otherwise, a kinematic viscosity is converted with the
   * density of the custom fluid's row default. */
  const RugosaField *density = rugosa_field_find ("density");

  self->density = density ? density->dflt : 1000.0;
  gtk_widget_init_template (GTK_WIDGET (self));
  gtk_box_layout_set_spacing (GTK_BOX_LAYOUT (gtk_widget_get_layout_manager (GTK_WIDGET (self))), 6);
}
