/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The output units of every command: --units si|us, and one option per
 * display quantity of the display-unit table (rugosa-units.c), named after
 * the quantity's id ("dynamic_viscosity" gives --dynamic-viscosity-unit).
 * The options set the unit system and the overrides of a RugosaSettings,
 * the same settings a project shows its results in, so the tables, the
 * CSV, the chart's readouts and the sentences of warnings all follow them;
 * JSON stays in SI with the unit in its keys. */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <string.h>

#include "cli.h"
#include "core/units.h"
#include "model/rugosa-settings.h"
#include "model/rugosa-units.h"

const char *
cli_unit_option (RugosaDisplayQuantity dq)
{
  const RugosaDisplayInfo *info = rugosa_display_info (dq);
  g_autofree char *name = NULL;

  if (info == NULL)
    return NULL;
  name = g_strdup_printf ("--%s-unit", info->id);
  g_strdelimit (name, "_", '-');
  return g_intern_string (name);
}

void
cli_unit_options_append (GArray *options)
{
  CliOption system = { "--units", TRUE, FALSE };

  g_array_append_val (options, system);
  for (int dq = 0; dq < RUGOSA_N_DISPLAY; dq++)
    {
      CliOption o = { cli_unit_option ((RugosaDisplayQuantity) dq), TRUE, FALSE };

      if (o.name != NULL)
        g_array_append_val (options, o);
    }
}

const CliOption *
cli_options_with_units (const CliOption *options)
{
  /* one combined table per command's table, for the life of the process */
  static GHashTable *cache;
  GArray *a;
  CliOption *combined;

  if (cache == NULL)
    cache = g_hash_table_new (NULL, NULL);
  combined = g_hash_table_lookup (cache, options);
  if (combined != NULL)
    return combined;
  a = g_array_new (TRUE, TRUE, sizeof (CliOption));
  for (const CliOption *o = options; o->name != NULL; o++)
    g_array_append_vals (a, o, 1);
  cli_unit_options_append (a);
  combined = (CliOption *) g_array_free (a, FALSE);
  g_hash_table_insert (cache, (gpointer) options, combined);
  return combined;
}

/* "si|us": the nicks of the unit systems, as the project file writes them. */
static char *
system_choices (const char *separator)
{
  GEnumClass *klass = g_type_class_ref (RUGOSA_TYPE_UNIT_SYSTEM);
  GString *s = g_string_new (NULL);

  for (guint i = 0; i < klass->n_values; i++)
    g_string_append_printf (s, "%s%s", i > 0 ? separator : "",
                            klass->values[i].value_nick);
  g_type_class_unref (klass);
  return g_string_free (s, FALSE);
}

/* Whether any output-unit option was given. */
static gboolean
any_unit_option (const CliArgs *args)
{
  if (cli_args_has (args, "--units"))
    return TRUE;
  for (int dq = 0; dq < RUGOSA_N_DISPLAY; dq++)
    {
      const char *option = cli_unit_option ((RugosaDisplayQuantity) dq);

      if (option != NULL && cli_args_has (args, option))
        return TRUE;
    }
  return FALSE;
}

gboolean
cli_apply_units (const CliArgs *args, RugosaSettings *settings)
{
  const char *system_text = cli_args_get (args, "--units");
  g_autoptr (GVariant) old = NULL;
  GVariantBuilder overrides;
  int system = (int) rugosa_settings_get_unit_system (settings);

  if (!any_unit_option (args))
    return TRUE;
  if (system_text != NULL
      && !rugosa_enum_from_nick (RUGOSA_TYPE_UNIT_SYSTEM, system_text, &system))
    {
      g_autofree char *choices = system_choices (", ");
      g_autofree char *shown = cli_echo (system_text);
      /* TRANSLATORS: the first %s lists the unit systems ("si, us") */
      g_autofree char *msg = g_strdup_printf (_("The unit system must be one of %s, not “%s”."),
                                              choices, shown);

      cli_fail_option ("--units", msg);
      return FALSE;
    }

  g_variant_builder_init (&overrides, G_VARIANT_TYPE ("a{ss}"));
  /* Without --units the project's own overrides stay, but for the
   * quantities named by an option; --units starts from the system's usual
   * units, as the overrides belong to the project's system. */
  g_object_get (settings, "unit-overrides", &old, NULL);
  if (system_text == NULL && old != NULL)
    {
      GVariantIter iter;
      const char *id, *unit;

      g_variant_iter_init (&iter, old);
      while (g_variant_iter_next (&iter, "{&s&s}", &id, &unit))
        {
          RugosaDisplayQuantity dq;

          if (rugosa_display_info_find (id, &dq) == NULL
              || !cli_args_has (args, cli_unit_option (dq)))
            g_variant_builder_add (&overrides, "{ss}", id, unit);
        }
    }

  for (int i = 0; i < RUGOSA_N_DISPLAY; i++)
    {
      const RugosaDisplayQuantity dq = (RugosaDisplayQuantity) i;
      const RugosaDisplayInfo *info = rugosa_display_info (dq);
      const char *option = cli_unit_option (dq);
      const char *text, *spelling;
      RgError err = { 0 };
      double si;

      if (option == NULL || (text = cli_args_get (args, option)) == NULL)
        continue;
      {
        g_autofree char *stripped = g_strstrip (g_strdup (text));

        if (*stripped == '\0')
          {
            /* TRANSLATORS: %s lists the accepted units */
            g_autofree char *msg = g_strdup_printf (_("The unit is empty: use one of %s."),
                                                    rg_units_accepted (info->quantity));

            g_variant_builder_clear (&overrides);
            cli_fail_option (option, msg);
            return FALSE;
          }
      }
      if (rg_units_to_si (info->quantity, 1.0, text, &si, &err) != RG_OK)
        {
          g_variant_builder_clear (&overrides);
          cli_fail_option (option, err.text);
          return FALSE;
        }
      /* kept as a reader writes it ("m³/d" for "m3/d") */
      spelling = rg_units_display_spelling (info->quantity, text);
      g_variant_builder_add (&overrides, "{ss}", info->id,
                             spelling != NULL ? spelling : text);
    }
  g_object_set (settings, "unit-system", system,
                "unit-overrides", g_variant_builder_end (&overrides), NULL);
  return TRUE;
}

char *
cli_units_help (void)
{
  g_autofree char *systems = system_choices ("|");
  g_autoptr (GString) quantities = g_string_new (NULL);

  gsize line_start = 0;

  for (int dq = 0; dq < RUGOSA_N_DISPLAY; dq++)
    {
      const char *option = cli_unit_option ((RugosaDisplayQuantity) dq);
      /* "--dynamic-viscosity-unit" → "dynamic-viscosity" */
      const int len = option != NULL ? (int) (strlen (option) - strlen ("--unit") - 1) : 0;

      if (option == NULL)
        continue;
      if (quantities->len > 0)
        g_string_append_c (quantities, ',');
      /* lines of at most 52 characters, under the column of the options' help */
      if (quantities->len > 0 && quantities->len - line_start + (gsize) len + 1 > 52)
        {
          g_string_append (quantities, "\n                        ");
          line_start = quantities->len;
        }
      g_string_append_printf (quantities, "%s%.*s",
                              quantities->len > line_start ? " " : "", len,
                              option + strlen ("--"));
    }
  /* TRANSLATORS: the first %s is "si|us", the second the list of
   * quantities ("flow, length, diameter, …"); option names stay English */
  return g_strdup_printf (_("Output units, for every command:\n"
                            "  --units %s         the unit system of tables and CSV; JSON stays\n"
                            "                        in SI, its keys naming the unit (velocity_m_s)\n"
                            "  --QUANTITY-unit UNIT  one quantity's unit, e.g. --flow-unit gpm;\n"
                            "                        QUANTITY is one of:\n"
                            "                        %s\n"
                            "eval and render start from the project's units, the other commands\n"
                            "from SI.\n"),
                          systems, quantities->str);
}
