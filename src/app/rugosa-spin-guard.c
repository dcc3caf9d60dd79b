/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-spin-guard"

#include "config.h"

#include <adwaita.h>
#include <glib/gi18n.h>
#include <math.h>

#include "model/rugosa-display.h"
#include "rugosa-spin-guard.h"

/* Typed text is echoed in the sentence up to this many characters, so
 * 100 kB pasted into the field makes a short tooltip. */
#define ECHO_CHARS 24

void
rugosa_spin_guard_mark (GtkSpinButton *spin,
                        const char    *why)
{
  const char *plain = g_object_get_data (G_OBJECT (spin), "rugosa-plain-tooltip");
  GtkWidget *row = gtk_widget_get_ancestor (GTK_WIDGET (spin), ADW_TYPE_ACTION_ROW);

  /* In a row, the sentence also stands under the row's title, as the
   * line panel's fields show theirs; the row's own subtitle comes back
   * with the next value taken. */
  if (why != NULL)
    {
      if (row != NULL && !gtk_widget_has_css_class (row, "field-error"))
        g_object_set_data_full (G_OBJECT (spin), "rugosa-plain-subtitle",
                                g_strdup (adw_action_row_get_subtitle (ADW_ACTION_ROW (row))), g_free);
      gtk_widget_add_css_class (GTK_WIDGET (spin), "error");
      gtk_widget_set_tooltip_text (GTK_WIDGET (spin), why);
      if (row != NULL)
        {
          /* The sentence echoes the text typed: plain text. */
          adw_preferences_row_set_use_markup (ADW_PREFERENCES_ROW (row), FALSE);
          adw_action_row_set_subtitle (ADW_ACTION_ROW (row), why);
          gtk_widget_add_css_class (row, "field-error");
        }
    }
  else if (gtk_widget_has_css_class (GTK_WIDGET (spin), "error"))
    {
      const char *subtitle = g_object_get_data (G_OBJECT (spin), "rugosa-plain-subtitle");

      gtk_widget_remove_css_class (GTK_WIDGET (spin), "error");
      gtk_widget_set_tooltip_text (GTK_WIDGET (spin), plain);
      if (row != NULL)
        {
          adw_action_row_set_subtitle (ADW_ACTION_ROW (row), subtitle ? subtitle : "");
          gtk_widget_remove_css_class (row, "field-error");
        }
    }
}

static int
_rugosa_spin_guard_input (GtkSpinButton *spin,
                          double        *new_value,
                          gpointer       user_data)
{
  const char *text = gtk_editable_get_text (GTK_EDITABLE (spin));
  g_autofree char *ascii = g_strstrip (rugosa_display_delocalize (text));
  gboolean whole = gtk_spin_button_get_digits (spin) == 0;
  char *end = NULL;
  double v, lo, hi;

  gtk_spin_button_get_range (spin, &lo, &hi);
  v = g_ascii_strtod (ascii, &end);
  if (end == ascii || *end != '\0' || !isfinite (v) || v < lo || v > hi
      || (whole && v != floor (v)))
    {
      g_autofree char *echo = NULL;
      g_autofree char *slo = NULL;
      g_autofree char *shi = NULL;
      g_autofree char *why = NULL;
      char buf[G_ASCII_DTOSTR_BUF_SIZE];

      /* The ends as short as they are (500, 0.01), in the screen's
       * decimal separator. */
      slo = rugosa_display_localize (g_strdup (g_ascii_formatd (buf, sizeof buf, "%g", lo)));
      shi = rugosa_display_localize (g_strdup (g_ascii_formatd (buf, sizeof buf, "%g", hi)));
      if (g_utf8_strlen (text, -1) > ECHO_CHARS)
        {
          g_autofree char *head = g_utf8_substring (text, 0, ECHO_CHARS);
          echo = g_strconcat (head, "…", NULL);
        }
      else
        echo = g_strdup (text);
      if (*ascii == '\0')
        why = g_strdup_printf (_("The field is empty: type a number from %s to %s; the last value is kept."),
                               slo, shi);
      else if (whole)
        why = g_strdup_printf (_("'%s' is not a whole number from %s to %s: the last value is kept."),
                               echo, slo, shi);
      else
        why = g_strdup_printf (_("'%s' is not a number from %s to %s: the last value is kept."),
                               echo, slo, shi);
      rugosa_spin_guard_mark (spin, why);
      return GTK_INPUT_ERROR;
    }
  rugosa_spin_guard_mark (spin, NULL);
  *new_value = v;
  return TRUE;
}

void
rugosa_spin_guard (GtkSpinButton *spin)
{
  g_return_if_fail (GTK_IS_SPIN_BUTTON (spin));

  g_object_set_data_full (G_OBJECT (spin), "rugosa-plain-tooltip",
                          g_strdup (gtk_widget_get_tooltip_text (GTK_WIDGET (spin))), g_free);
  /* With IF_VALID a refused text puts the last value back; ALWAYS would
   * clamp it to an end of the range. */
  gtk_spin_button_set_update_policy (spin, GTK_UPDATE_IF_VALID);
  g_signal_connect (spin, "input", G_CALLBACK (_rugosa_spin_guard_input), NULL);
}
