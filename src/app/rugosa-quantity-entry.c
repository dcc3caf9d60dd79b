/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-quantity-entry"

#include "config.h"

#include <math.h>

#include <glib/gi18n.h>

#include "core/units.h"
#include "model/rugosa-display.h"
#include "rugosa-quantity-entry.h"

struct _RugosaQuantityEntry
{
  GtkWidget parent_instance;

  /* template widgets */
  GtkEntry *entry;

  /* owned references */
  char   *unit;
  char   *error_text;
  int     quantity;
  double  value;
  gboolean has_value;
};

G_DEFINE_FINAL_TYPE (RugosaQuantityEntry, rugosa_quantity_entry, GTK_TYPE_WIDGET)

enum {
  PROP_0,
  PROP_QUANTITY,
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
rugosa_quantity_entry_new (int quantity)
{
  return g_object_new (RUGOSA_TYPE_QUANTITY_ENTRY, "quantity", quantity, NULL);
}

static void
_rugosa_quantity_entry_show (RugosaQuantityEntry *self)
{
  g_autofree char *text = NULL;

  if (!self->has_value)
    {
      gtk_editable_set_text (GTK_EDITABLE (self->entry), "");
      return;
    }
  text = rugosa_display_format_screen (self->quantity, self->value, self->unit);
  gtk_editable_set_text (GTK_EDITABLE (self->entry), text);
}

static void
_rugosa_quantity_entry_set_error_text (RugosaQuantityEntry *self,
                                       const char          *text)
{
  if (g_strcmp0 (self->error_text, text) == 0)
    return;
  g_free (self->error_text);
  self->error_text = g_strdup (text);
  if (text != NULL)
    {
      gtk_widget_add_css_class (GTK_WIDGET (self->entry), "error");
      gtk_widget_set_tooltip_text (GTK_WIDGET (self), text);
      gtk_accessible_update_state (GTK_ACCESSIBLE (self->entry),
                                   GTK_ACCESSIBLE_STATE_INVALID, GTK_ACCESSIBLE_INVALID_TRUE, -1);
    }
  else
    {
      gtk_widget_remove_css_class (GTK_WIDGET (self->entry), "error");
      gtk_widget_set_tooltip_text (GTK_WIDGET (self),
                                   rg_units_accepted (self->quantity));
      gtk_accessible_reset_state (GTK_ACCESSIBLE (self->entry), GTK_ACCESSIBLE_STATE_INVALID);
    }
  g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_ERROR_TEXT]);
}

void
rugosa_quantity_entry_set_error (RugosaQuantityEntry *self,
                                 const char          *text)
{
  g_return_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self));
  _rugosa_quantity_entry_set_error_text (self, text);
}

gboolean
rugosa_quantity_entry_commit_text (RugosaQuantityEntry *self,
                                   const char          *text)
{
  RgError err = { 0 };
  double si = 0.0;
  g_autofree char *stripped = NULL;
  g_autofree char *ascii = NULL;   /* "2,5 m" typed under de_DE: "2.5 m" */

  g_return_val_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self), FALSE);

  stripped = g_strstrip (g_strdup (text ? text : ""));
  ascii = rugosa_display_delocalize (stripped);
  /* A bare number means the unit the field shows: someone who sees
   * "102.3 mm" and types "150" means 150 mm, not 150 m. */
  if (self->unit != NULL && *self->unit != '\0' && *ascii != '\0')
    {
      char *end = NULL;
      double x = g_ascii_strtod (ascii, &end);

      if (end != NULL && *end == '\0' && isfinite (x))
        {
          char *with_unit = g_strdup_printf ("%s %s", ascii, self->unit);
          g_free (ascii);
          ascii = with_unit;
        }
    }
  if (rg_units_parse (self->quantity, NULL, ascii, &si, &err) != RG_OK)
    {
      /* The last valid value stays in force; only the field is marked. */
      if (text != gtk_editable_get_text (GTK_EDITABLE (self->entry)))
        gtk_editable_set_text (GTK_EDITABLE (self->entry), stripped);
      /* The parser names no field here ("the value is empty: …"); shown
       * as a sentence of its own under the field's title, it starts with
       * a capital. */
      err.text[0] = g_ascii_toupper (err.text[0]);
      _rugosa_quantity_entry_set_error_text (self, err.text[0] ? err.text : _("Not a value this field accepts."));
      return FALSE;
    }

  _rugosa_quantity_entry_set_error_text (self, NULL);
  if (!self->has_value || si != self->value)
    {
      self->value = si;
      self->has_value = TRUE;
      g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_VALUE]);
      _rugosa_quantity_entry_show (self);
      g_signal_emit (self, signals[COMMITTED], 0, si);
    }
  else
    _rugosa_quantity_entry_show (self);
  return TRUE;
}

static void
_rugosa_quantity_entry_activate (GtkEntry            *entry,
                                 RugosaQuantityEntry *self)
{
  rugosa_quantity_entry_commit_text (self, gtk_editable_get_text (GTK_EDITABLE (entry)));
}

static void
_rugosa_quantity_entry_focus_leave (GtkEventControllerFocus *focus,
                                    RugosaQuantityEntry     *self)
{
  g_autofree char *shown = NULL;
  const char *text = gtk_editable_get_text (GTK_EDITABLE (self->entry));

  /* Leaving an untouched field must not re-commit a rounded display value. */
  if (self->has_value)
    shown = rugosa_display_format_screen (self->quantity, self->value, self->unit);
  if (g_strcmp0 (shown, text) == 0)
    return;
  rugosa_quantity_entry_commit_text (self, text);
}

int
rugosa_quantity_entry_get_quantity (RugosaQuantityEntry *self)
{
  g_return_val_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self), 0);
  return self->quantity;
}

void
rugosa_quantity_entry_set_quantity (RugosaQuantityEntry *self,
                                    int                  quantity)
{
  g_return_if_fail (RUGOSA_IS_QUANTITY_ENTRY (self));
  if (self->quantity == quantity)
    return;
  self->quantity = quantity;
  _rugosa_quantity_entry_show (self);
  if (self->error_text == NULL)
    gtk_widget_set_tooltip_text (GTK_WIDGET (self), rg_units_accepted (quantity));
  g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_QUANTITY]);
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
    case PROP_QUANTITY: g_value_set_int (value, self->quantity); break;
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
    case PROP_QUANTITY: rugosa_quantity_entry_set_quantity (self, g_value_get_int (value)); break;
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
  g_free (self->error_text);
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

  properties[PROP_QUANTITY] =
    g_param_spec_int ("quantity", NULL, NULL, 0, RG_QTY_N - 1, 0,
                      G_PARAM_READWRITE | G_PARAM_EXPLICIT_NOTIFY | G_PARAM_STATIC_STRINGS);
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

  /* A new valid value (SI) typed by the user. */
  signals[COMMITTED] =
    g_signal_new ("committed", G_TYPE_FROM_CLASS (klass), G_SIGNAL_RUN_LAST,
                  0, NULL, NULL, NULL, G_TYPE_NONE, 1, G_TYPE_DOUBLE);

  gtk_widget_class_set_template_from_resource (widget_class, "/org/rugosa/Rugosa/rugosa-quantity-entry.ui");
  gtk_widget_class_bind_template_child (widget_class, RugosaQuantityEntry, entry);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_quantity_entry_activate);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_quantity_entry_focus_leave);
  gtk_widget_class_set_layout_manager_type (widget_class, GTK_TYPE_BIN_LAYOUT);
  gtk_widget_class_set_css_name (widget_class, "quantityentry");
}

static void
rugosa_quantity_entry_init (RugosaQuantityEntry *self)
{
  gtk_widget_init_template (GTK_WIDGET (self));
}
