/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The fluid and line commands.
 *
 * Their options are the rows of the model's field tables that name a CLI
 * option (rugosa-fields.c): each option is parsed with its row's quantity,
 * checked against its row's range and set on a one-line project, which is
 * then evaluated by the model's evaluation — the one the window and every
 * export use.  A refusal names the option(s) behind the error's subjects;
 * no message text is read. */
#define G_LOG_DOMAIN "rugosa-cli"

#include "config.h"

#include <math.h>
#include <stdio.h>
#include <string.h>

#include "cli.h"
#include "core/aging.h"
#include "core/catalog.h"
#include "core/fittings.h"
#include "core/fluid.h"
#include "core/units.h"
#include "model/rugosa-display.h"
#include "model/rugosa-field-store.h"
#include "model/rugosa-fields.h"
#include "model/rugosa-output.h"
#include "model/rugosa-units.h"
#include "model/rugosa-sizing.h"

/* Options of the CLI's own that are no field: what they stand for. */
static const struct {
  const char *option;
  RgSubjects subjects;
} own_options[] = {
  { "--k-sum", RG_SUBJECT_BIT (RG_SUBJECT_K_SUM) },
  /* the inverse problems: what to solve for, and the head loss allowed */
  { "--solve", 0 },
  { "--head-loss", RG_SUBJECT_BIT (RG_SUBJECT_HEAD_LOSS) },
};

GArray *
cli_field_options (gboolean fluid_only)
{
  GArray *a = g_array_new (TRUE, TRUE, sizeof (CliOption));

  for (int table = 0; table < 2; table++)
    {
      guint n;
      const RugosaField *rows = table == 0 ? rugosa_line_fields (&n)
                                           : rugosa_settings_fields (&n);

      for (guint i = 0; i < n; i++)
        {
          CliOption o = { rows[i].cli, TRUE, rows[i].kind == RUGOSA_FIELD_FITTINGS };

          if (rows[i].cli == NULL)
            continue;
          if (fluid_only && (rows[i].fluid_kinds == 0 || table == 1))
            continue;
          g_array_append_val (a, o);
        }
    }
  return a;
}

/* The options of `line` (or of `fluid`): every row with a CLI option, then
 * the CLI's own; built once. */
static const CliOption *
options_for (gboolean fluid_only)
{
  static CliOption *cache[2];
  GArray *a;

  if (cache[fluid_only] != NULL)
    return cache[fluid_only];
  a = cli_field_options (fluid_only);
  if (!fluid_only)
    {
      CliOption batch = { "--batch", TRUE, FALSE };

      for (gsize i = 0; i < G_N_ELEMENTS (own_options); i++)
        {
          CliOption o = { own_options[i].option, TRUE, FALSE };
          g_array_append_val (a, o);
        }
      g_array_append_val (a, batch);
    }
  {
    CliOption json = { "--json", FALSE, FALSE };
    g_array_append_val (a, json);
  }
  cli_unit_options_append (a);
  cache[fluid_only] = (CliOption *) g_array_free (a, FALSE);
  return cache[fluid_only];
}

/* The options behind an error's subjects: those the user gave (or, for
 * a custom value, the catalog option given instead), as "--a, --b". */
static char *
options_of_subjects (const CliArgs *args, RgSubjects subjects)
{
  g_autoptr (GString) s = g_string_new (NULL);
  g_autoptr (GString) any = g_string_new (NULL);

  for (guint k = 0;; k++)
    {
      const RugosaField *row = rugosa_field_for_subject (subjects, k);
      const char *option;

      if (row == NULL)
        break;
      option = row->cli;
      if (option == NULL && row->kind == RUGOSA_FIELD_NUMBER)
        {
          /* a value without an option of its own (the growth rate) is set
           * by its catalog partner's option */
          guint n;
          const RugosaField *rows = rugosa_line_fields (&n);

          for (guint i = 0; i < n; i++)
            if (rows[i].partner != NULL && g_str_equal (rows[i].partner, row->property))
              option = rows[i].cli;
        }
      if (option == NULL)
        continue;
      if (!cli_args_has (args, option))
        {
          /* a custom value's catalog partner may stand in for it */
          guint n;
          const RugosaField *rows = rugosa_line_fields (&n);

          for (guint i = 0; i < n; i++)
            if (rows[i].partner != NULL && g_str_equal (rows[i].partner, row->property)
                && cli_args_has (args, rows[i].cli))
              option = rows[i].cli;
        }
      if (strstr (any->str, option) == NULL)
        g_string_append_printf (any, "%s%s", any->len ? ", " : "", option);
      if (cli_args_has (args, option) && strstr (s->str, option) == NULL)
        g_string_append_printf (s, "%s%s", s->len ? ", " : "", option);
    }
  for (gsize i = 0; i < G_N_ELEMENTS (own_options); i++)
    if ((subjects & own_options[i].subjects) && cli_args_has (args, own_options[i].option))
      g_string_append_printf (s, "%s%s", s->len ? ", " : "", own_options[i].option);
  if (s->len == 0 && any->len > 0)
    return g_strdup (any->str);
  if (s->len == 0)
    return g_strdup ("rugosa-cli");
  return g_strdup (s->str);
}

const CliOption *
cli_line_options (void)
{
  return options_for (FALSE);
}

void
cli_refusal_clear (CliRefusal *why)
{
  g_clear_pointer (&why->option, g_free);
  g_clear_pointer (&why->sentence, g_free);
}

int
cli_fail_refusal (const CliRefusal *why)
{
  if (why->option == NULL)
    return cli_fail ("%s", why->sentence);
  return cli_fail_option (why->option, why->sentence);
}

/* Fills `why` (FALSE, for a tail call). */
static gboolean
refuse (CliRefusal *why, const char *option, const char *sentence)
{
  cli_refusal_clear (why);
  why->option = g_strdup (option);
  why->sentence = g_strdup (sentence);
  return FALSE;
}

static gboolean
refuse_subjects (const CliArgs *args, RgSubjects subjects, const char *sentence,
                 CliRefusal *why)
{
  cli_refusal_clear (why);
  why->option = options_of_subjects (args, subjects);
  why->sentence = g_strdup (sentence);
  return FALSE;
}

int
cli_fail_subjects (const CliArgs *args, RgSubjects subjects, const char *sentence)
{
  g_autofree char *options = options_of_subjects (args, subjects);

  return cli_fail_option (options, sentence);
}

/* Catalog look-ups compare a text with every entry (a pipe designation is
 * parsed first): the rows of a batch repeat the same few names, so what
 * each text found is remembered for the life of the process.  Refusals
 * are not: their sentences are wanted. */
static GHashTable *
memo_table (GHashTable **memo)
{
  if (*memo == NULL)
    *memo = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, NULL);
  return *memo;
}

#define MEMO_LOOKUP(fn, type)                                             \
  static RgStatus                                                         \
  memo_##fn (const char *text, const type **out, RgError *err)            \
  {                                                                       \
    static GHashTable *memo;                                              \
    RgStatus st;                                                          \
    if ((*out = g_hash_table_lookup (memo_table (&memo), text)) != NULL)  \
      return RG_OK;                                                       \
    if ((st = fn (text, out, err)) == RG_OK)                              \
      g_hash_table_insert (memo, g_strdup (text), (gpointer) *out);       \
    return st;                                                            \
  }
MEMO_LOOKUP (rg_pipe_lookup, RgPipe)
MEMO_LOOKUP (rg_material_lookup, RgMaterial)
MEMO_LOOKUP (rg_aging_class_lookup, RgAgingClass)
MEMO_LOOKUP (rg_fitting_lookup, RgFitting)
#undef MEMO_LOOKUP

/* "NAME", "NAME x3", "NAMEx3", "NAME*3", "K=0.5", "K=0.5 x2". */
static gboolean
parse_fitting (const char *text, const char **id, double *k, double *count,
               RgError *err)
{
  g_autofree char *s = g_strstrip (g_strdup (text));
  g_autofree char *name = NULL;
  char *sep = NULL;
  const RgFitting *fitting;

  *count = 1.0;
  *k = 0.0;
  *id = "";
  for (char *p = s + strlen (s); p > s; p--)
    {
      if (!g_ascii_isdigit (p[-1]) && p[-1] != '.')
        {
          if ((p[-1] == 'x' || p[-1] == 'X' || p[-1] == '*') && *p != '\0')
            sep = p - 1;
          break;
        }
    }
  if (sep != NULL && sep > s)
    {
      g_autoptr (GString) m = g_string_new (NULL);
      if (!cli_parse_number (_("The count"), sep + 1, count, m)
          || !(*count >= 1.0 && *count <= RUGOSA_FITTING_COUNT_MAX && *count == floor (*count)))
        {
          g_autofree char *msg = g_strdup_printf (_("The count of a fitting must be a whole number from 1 to %g."),
                                                  RUGOSA_FITTING_COUNT_MAX);
          rg_error_set_on (err, RG_ERR_DOMAIN, RG_SUBJECT_BIT (RG_SUBJECT_FITTING), "%s", msg);
          return FALSE;
        }
      name = g_strstrip (g_strndup (s, (gsize) (sep - s)));
    }
  else
    name = g_strdup (s);

  if (g_ascii_strncasecmp (name, "K=", 2) == 0 || g_ascii_strncasecmp (name, "K ", 2) == 0)
    {
      g_autoptr (GString) m = g_string_new (NULL);
      if (!cli_parse_number ("K", name + 2, k, m) || !(*k >= 0.0 && *k <= RUGOSA_FITTING_K_MAX))
        {
          g_autofree char *msg = g_strdup_printf (_("A plain loss coefficient K must be a number from 0 to %g."),
                                                  RUGOSA_FITTING_K_MAX);
          rg_error_set_on (err, RG_ERR_DOMAIN, RG_SUBJECT_BIT (RG_SUBJECT_FITTING), "%s", msg);
          return FALSE;
        }
      return TRUE;
    }
  if (memo_rg_fitting_lookup (name, &fitting, err) != RG_OK)
    return FALSE;
  *id = fitting->id;
  return TRUE;
}

/* Set the row's value from the option's text; FALSE and a sentence in
 * `err` when refused. */
static gboolean
apply_number (const CliArgs *args, const RugosaField *row, GObject *target,
              double density, RgError *err)
{
  double stored = 0.0;

  if (!rugosa_field_parse_text (row, cli_args_get (args, row->cli), NULL,
                                density, &stored, err)
      || !rugosa_field_in_range (row, stored, NULL, err))
    return FALSE;
  rugosa_field_store_double (target, row, stored);
  return TRUE;
}

static gboolean
apply_catalog (const CliArgs *args, const RugosaField *row, RugosaLine *line,
               RgError *err)
{
  const char *text = cli_args_get (args, row->cli);

  if (g_str_equal (row->property, "material-id"))
    {
      const RgMaterial *m;

      if (memo_rg_material_lookup (text, &m, err) != RG_OK)
        return FALSE;
      rugosa_field_store_string (line, row, m->id);
    }
  else if (g_str_equal (row->property, "pipe-designation"))
    {
      const RgPipe *p;

      if (memo_rg_pipe_lookup (text, &p, err) != RG_OK)
        return FALSE;
      rugosa_field_store_string (line, row, p->designation);
    }
  else
    {
      /* an aging class, or a growth rate with its unit ("0.05 mm/yr") */
      const RgAgingClass *klass;
      RgError lookup_err = { 0 };
      const RugosaField *rate = rugosa_field_find (row->partner);
      double stored = 0.0;

      if (memo_rg_aging_class_lookup (text, &klass, &lookup_err) == RG_OK)
        {
          rugosa_field_store_string (line, row, klass->id);
          return TRUE;
        }
      if (strpbrk (text, "0123456789") == NULL)
        {
          *err = lookup_err;
          return FALSE;
        }
      if (!rugosa_field_parse_text (rate, text, NULL, 0.0, &stored, err)
          || !rugosa_field_in_range (rate, stored, NULL, err))
        {
          err->subjects = row->subjects;
          return FALSE;
        }
      rugosa_field_store_string (line, row, NULL);
      rugosa_field_store_double (line, rate, stored);
    }
  return TRUE;
}

static gboolean
apply_enum (const CliArgs *args, const RugosaField *row, GObject *target,
            RgError *err)
{
  const char *text = cli_args_get (args, row->cli);
  int value;

  /* The core's sentences list what it offers. */
  if (row->enum_type () == RUGOSA_TYPE_FLUID_KIND)
    {
      RgFluidKind kind;
      if (rg_fluid_kind_from_id (text, &kind, err) != RG_OK)
        return FALSE;
      value = (int) kind;
    }
  else if (row->enum_type () == RUGOSA_TYPE_FRICTION_MODEL)
    {
      RgFrictionModel model;
      if (rg_friction_model_from_id (text, &model, err) != RG_OK)
        return FALSE;
      value = (int) model;
    }
  else if (!rugosa_enum_from_nick (row->enum_type (), text, &value))
    {
      rg_error_set_on (err, RG_ERR_PARSE, row->subjects, "%s", _("This value is not one of the choices."));
      return FALSE;
    }
  rugosa_field_store_int (target, row, value);
  return TRUE;
}

/* The rows of both field tables each option names (one option may name
 * several rows), made once. */
static GHashTable *
rows_by_option (void)
{
  static GHashTable *index;
  static gsize done;

  if (g_once_init_enter (&done))
    {
      GHashTable *made = g_hash_table_new_full (g_str_hash, g_str_equal, NULL,
                                                (GDestroyNotify) g_ptr_array_unref);

      for (int table = 0; table < 2; table++)
        {
          guint n;
          const RugosaField *rows = table == 0 ? rugosa_line_fields (&n)
                                               : rugosa_settings_fields (&n);

          for (guint i = 0; i < n; i++)
            {
              GPtrArray *named;

              if (rows[i].cli == NULL)
                continue;
              if ((named = g_hash_table_lookup (made, rows[i].cli)) == NULL)
                {
                  named = g_ptr_array_new ();
                  g_hash_table_insert (made, (gpointer) rows[i].cli, named);
                }
              g_ptr_array_add (named, (gpointer) &rows[i]);
            }
        }
      index = made;
      g_once_init_leave (&done, 1);
    }
  return index;
}

gboolean
cli_apply_field_options (const CliArgs *args, gboolean fluid_only, RugosaLine *line,
                         RugosaSettings *settings, const char **option, RgError *err)
{
  /* Which rows the given options name: a call gives a few options where
   * the tables have some sixty rows (a batch row asks once per row). */
  enum { ROWS_MAX = 512 };
  guint8 given[ROWS_MAX] = { 0 };
  guint n_line, n_settings;
  const RugosaField *line_rows = rugosa_line_fields (&n_line);
  const RugosaField *settings_rows = rugosa_settings_fields (&n_settings);
  GHashTableIter iter;
  gpointer key, value;

  g_return_val_if_fail (n_line + n_settings <= ROWS_MAX, FALSE);
  g_hash_table_iter_init (&iter, args->values);
  while (g_hash_table_iter_next (&iter, &key, &value))
    {
      GPtrArray *named = ((GPtrArray *) value)->len > 0 ? g_hash_table_lookup (rows_by_option (), key) : NULL;

      for (guint k = 0; named != NULL && k < named->len; k++)
        {
          const RugosaField *row = g_ptr_array_index (named, k);
          gsize at = row >= line_rows && row < line_rows + n_line
                       ? (gsize) (row - line_rows)
                       : n_line + (gsize) (row - settings_rows);

          if (at < ROWS_MAX)
            given[at] = 1;
        }
    }

  for (int table = 0; table < 2; table++)
    {
      guint n;
      const RugosaField *rows = table == 0 ? rugosa_line_fields (&n)
                                           : rugosa_settings_fields (&n);
      GObject *target = table == 0 ? G_OBJECT (line) : G_OBJECT (settings);

      for (guint i = 0; i < n; i++)
        {
          const RugosaField *row = &rows[i];
          gboolean ok = TRUE;

          if (!given[(table == 0 ? 0 : n_line) + i]
              || g_str_equal (row->property, "fluid-kind"))
            continue;
          *option = row->cli;
          if (row->fluid_kinds != 0
              && !rugosa_field_applies_to_fluid (row, (RgFluidKind) rugosa_line_get_fluid_kind (line)))
            {
              g_autofree char *msg = g_strdup_printf (_("This option does not apply to the fluid “%s”."),
                                                      rg_fluid_kind_id ((RgFluidKind) rugosa_line_get_fluid_kind (line)));
              rg_error_set_on (err, RG_ERR_DOMAIN, row->subjects, "%s", msg);
              return FALSE;
            }
          switch (row->kind)
            {
            case RUGOSA_FIELD_NUMBER:
              ok = apply_number (args, row, target, rugosa_line_get_double (line, "density"), err);
              break;
            case RUGOSA_FIELD_CATALOG:
              ok = apply_catalog (args, row, line, err);
              break;
            case RUGOSA_FIELD_ENUM:
              ok = apply_enum (args, row, target, err);
              break;
            case RUGOSA_FIELD_FITTINGS:
              {
                GPtrArray *all = cli_args_get_all (args, row->cli);
                GVariantBuilder b;

                g_variant_builder_init (&b, G_VARIANT_TYPE (RUGOSA_LINE_FITTINGS_TYPE));
                for (guint f = 0; f < all->len && ok; f++)
                  {
                    const char *id;
                    double k, count;

                    ok = parse_fitting (g_ptr_array_index (all, f), &id, &k, &count, err);
                    if (ok)
                      g_variant_builder_add (&b, "(sdd)", id, k, count);
                  }
                if (ok && cli_args_has (args, "--k-sum"))
                  {
                    double k;
                    g_autoptr (GString) m = g_string_new (NULL);

                    *option = "--k-sum";
                    if (!cli_parse_number ("--k-sum", cli_args_get (args, "--k-sum"), &k, m)
                        || !(k >= 0.0 && k <= 1.0e5))
                      {
                        rg_error_set_on (err, RG_ERR_DOMAIN, RG_SUBJECT_BIT (RG_SUBJECT_K_SUM), "%s",
                                         _("The sum of the loss coefficients must be a number from 0 to 100000."));
                        ok = FALSE;
                      }
                    else
                      g_variant_builder_add (&b, "(sdd)", "", k, 1.0);
                  }
                if (ok)
                  rugosa_field_store_variant (line, row, g_variant_builder_end (&b));
                else
                  g_variant_builder_clear (&b);
              }
              break;
            case RUGOSA_FIELD_TEXT:
            case RUGOSA_FIELD_COLOUR:
            case RUGOSA_FIELD_UNIT_MAP:
            default:
              break;
            }
          if (!ok)
            return FALSE;
        }
    }
  /* --k-sum alone (no --fitting) */
  if (!fluid_only && cli_args_has (args, "--k-sum") && !cli_args_has (args, "--fitting"))
    {
      double k;
      g_autoptr (GString) m = g_string_new (NULL);

      *option = "--k-sum";
      if (!cli_parse_number ("--k-sum", cli_args_get (args, "--k-sum"), &k, m)
          || !(k >= 0.0 && k <= 1.0e5))
        {
          rg_error_set_on (err, RG_ERR_DOMAIN, RG_SUBJECT_BIT (RG_SUBJECT_K_SUM), "%s",
                           _("The sum of the loss coefficients must be a number from 0 to 100000."));
          return FALSE;
        }
      rugosa_field_store_variant (line, rugosa_field_find ("fittings"),
                                  g_variant_new_parsed ("[('', %d, 1.0)]", k));
    }
  return TRUE;
}

/* The fluid kind from `text`, and the states that kind needs. */
static gboolean
set_fluid (const CliArgs *args, const char *text, RugosaLine *line, CliRefusal *why)
{
  RgFluidKind kind;
  RgError err = { 0 };
  guint n;
  const RugosaField *rows = rugosa_line_fields (&n);

  if (rg_fluid_kind_from_id (text, &kind, &err) != RG_OK)
    return refuse (why, "--fluid", err.text);
  rugosa_field_store_int (line, rugosa_field_find ("fluid-kind"), (int) kind);
  for (guint i = 0; i < n; i++)
    if ((rows[i].flags & RUGOSA_FIELD_STATE_REQUIRED)
        && rugosa_field_applies_to_fluid (&rows[i], kind)
        && !cli_args_has (args, rows[i].cli))
      {
        /* TRANSLATORS: an option, a fluid id, then what the option gives */
        g_autofree char *msg = g_strdup_printf (_("This option is required for the fluid “%s”: %s"),
                                                rg_fluid_kind_id (kind), _(rows[i].help));
        return refuse (why, rows[i].cli, msg);
      }
  return TRUE;
}

int
cli_set_fluid (const CliArgs *args, const char *text, RugosaLine *line)
{
  g_auto (CliRefusal) why = { 0 };

  return set_fluid (args, text, line, &why) ? CLI_EXIT_OK : cli_fail_refusal (&why);
}

/* A row of the fluid table in the unit `units` show `dq` in. */
static void
fluid_table_number (GString *out, const char *label, double si,
                    RugosaSettings *units, RugosaDisplayQuantity dq)
{
  const char *unit = rugosa_output_unit (units, dq);
  double v = si;

  (void) rg_units_from_si (rugosa_display_info (dq)->quantity, si, unit, &v, NULL);
  cli_table_number (out, label, v, rugosa_display_unit_symbol (unit));
}

int
cli_cmd_fluid (int argc, char **argv)
{
  g_auto (CliArgs) args = { 0 };
  g_autoptr (GString) msg = g_string_new (NULL);
  g_autoptr (GString) out = g_string_new (NULL);
  g_autoptr (RugosaLine) line = rugosa_line_new (NULL);
  g_autoptr (RugosaSettings) settings = rugosa_settings_new ();
  RgError err = { 0 };
  RgWarnings warnings = { 0 };
  RgFluidSpec spec;
  RgFluidProps props;
  const char *option = NULL;
  g_auto (CliRefusal) why = { 0 };

  if (!cli_args_parse (&args, "fluid", options_for (TRUE), argc, argv, 2, msg))
    return cli_fail ("%s", msg->str);
  if (args.positional->len != 1)
    return cli_fail (_("'fluid' needs exactly one fluid name: water, seawater, oil, air or custom."));
  if (!set_fluid (&args, g_ptr_array_index (args.positional, 0), line, &why))
    return cli_fail_refusal (&why);
  if (!cli_apply_field_options (&args, TRUE, line, settings, &option, &err))
    return cli_fail_option (option, err.text);
  if (!cli_apply_units (&args, settings))
    return CLI_EXIT_USAGE;
  rugosa_line_get_fluid_spec (line, &spec);
  rg_warnings_clear (&warnings);
  /* the core's sentences in the output units (by default the SI system's:
   * °C, kPa …) */
  err.units = warnings.units = rugosa_settings_get_unit_choice (settings);
  if (rg_fluid_properties (&spec, &props, &warnings, &err) != RG_OK)
    return cli_fail_subjects (&args, rg_fluid_subjects_behind (spec.kind, err.subjects), err.text);

  if (cli_args_has (&args, "--json"))
    {
      CliJson json;
      const char *w[RG_WARNINGS_MAX];
      for (int i = 0; i < warnings.count; i++)
        w[i] = warnings.text[i];
      cli_json_begin (&json, out);
      cli_json_number (&json, "density_kg_m3", props.density_kg_m3);
      cli_json_number (&json, "dynamic_viscosity_Pa_s", props.dynamic_viscosity_pa_s);
      cli_json_number (&json, "kinematic_viscosity_m2_s", props.kinematic_viscosity_m2_s);
      if (warnings.count > 0)
        cli_json_string_array (&json, "warnings", w, warnings.count);
      cli_json_end (&json);
    }
  else
    {
      fluid_table_number (out, _("density"), props.density_kg_m3,
                          settings, RUGOSA_DISPLAY_DENSITY);
      fluid_table_number (out, _("dynamic viscosity"), props.dynamic_viscosity_pa_s,
                          settings, RUGOSA_DISPLAY_DYNAMIC_VISCOSITY);
      fluid_table_number (out, _("kinematic viscosity"), props.kinematic_viscosity_m2_s,
                          settings, RUGOSA_DISPLAY_KINEMATIC_VISCOSITY);
      for (int i = 0; i < warnings.count; i++)
        {
          g_autofree char *line_text = g_strdup_printf (_("warning: %s"), warnings.text[i]);
          g_string_append_printf (out, "%s\n", line_text);
        }
    }
  return cli_write_stdout (out->str);
}

/* The unit system and overrides of `units` on `settings` (stored as the
 * batch stores every field: without notification, nothing listens). */
static void
copy_units (RugosaSettings *settings, RugosaSettings *units)
{
  const RugosaUnitSystem system = rugosa_settings_get_unit_system (units);
  g_autoptr (GVariant) have = NULL;
  g_autoptr (GVariant) want = NULL;

  if (rugosa_settings_get_unit_system (settings) != system)
    rugosa_field_store_int (settings, rugosa_field_find ("unit-system"), (int) system);
  g_object_get (settings, "unit-overrides", &have, NULL);
  g_object_get (units, "unit-overrides", &want, NULL);
  if (!g_variant_equal (have, want))
    rugosa_field_store_variant (settings, rugosa_field_find ("unit-overrides"), want);
}

/* --solve and --head-loss: what they ask checked, the head loss parsed. */
static gboolean
check_solve (const CliArgs *args, const char *solve, double *head_loss, CliRefusal *why)
{
  RgError err = { 0 };

  if (solve != NULL && !g_str_equal (solve, "flow") && !g_str_equal (solve, "diameter"))
    return refuse (why, "--solve", _("Solve for “flow” (with --head-loss) or for “diameter” (with --head-loss, --max-velocity or --max-gradient)."));
  if (cli_args_has (args, "--head-loss"))
    {
      guint n;
      const RugosaField *row = rugosa_sizing_fields (&n);

      if (solve == NULL)
        return refuse (why, "--head-loss", _("The head loss is what --solve flow or --solve diameter works to: give one of them."));
      if (!rugosa_field_parse_text (row, cli_args_get (args, "--head-loss"), NULL, 0.0, head_loss, &err)
          || *head_loss == 0.0 || !rugosa_field_in_range (row, *head_loss, NULL, &err))
        {
          if (*head_loss == 0.0 && err.text[0] == '\0')
            (void) rugosa_field_in_range (row, -1.0, NULL, &err);
          return refuse (why, "--head-loss", err.text);
        }
    }
  if (solve != NULL && g_str_equal (solve, "flow") && !cli_args_has (args, "--head-loss"))
    return refuse (why, "--solve", _("--solve flow needs the total head loss to find the flow for: add --head-loss, e.g. --head-loss \"12 m\"."));
  if (solve != NULL && g_str_equal (solve, "diameter"))
    {
      if (cli_args_has (args, "--pipe") || cli_args_has (args, "--diameter"))
        return refuse (why, "--solve", _("--solve diameter finds the bore: give neither --diameter nor --pipe."));
      if (!cli_args_has (args, "--head-loss") && !cli_args_has (args, "--max-velocity")
          && !cli_args_has (args, "--max-gradient"))
        return refuse (why, "--solve", _("--solve diameter needs a limit to keep within: --head-loss, --max-velocity or --max-gradient."));
    }
  return TRUE;
}

/* The flow for the head loss, or the smallest bore within the limits
 * given, set on the line. */
static gboolean
solve_line (const CliArgs *args, RugosaProject *project, RugosaLine *line,
            const char *solve, double head_loss, CliRefusal *why)
{
  RugosaSettings *settings = rugosa_project_get_settings (project);
  RgError err = { 0 };
  double solved = 0.0;

  if (g_str_equal (solve, "flow"))
    {
      if (!rugosa_solve_flow (project, line, -1.0, head_loss, &solved, &err))
        return refuse_subjects (args, err.subjects, err.text, why);
      rugosa_field_store_double (line, rugosa_field_find ("flow-design"), solved);
    }
  else
    {
      RugosaLimits limits = { 0.0, 0.0, 0.0, head_loss };

      /* the limits given, and no other */
      if (cli_args_has (args, "--max-velocity"))
        limits.velocity_max = rugosa_settings_get_double (settings, "velocity-limit");
      if (cli_args_has (args, "--max-gradient"))
        limits.gradient_max = rugosa_settings_get_double (settings, "gradient-limit");
      if (!rugosa_solve_diameter (project, line, -1.0, &limits, &solved, &err))
        return refuse_subjects (args, err.subjects, err.text, why);
      rugosa_field_store_double (line, rugosa_field_find ("inner-diameter"), solved);
    }
  return TRUE;
}

const RugosaLineResults *
cli_line_evaluate (const CliArgs *args, RugosaProject *project, RugosaLine *line,
                   RugosaSettings *units, CliRefusal *why)
{
  RugosaSettings *settings = rugosa_project_get_settings (project);
  const RugosaLineResults *r;
  const RugosaOperatingPoint *p;
  RgError err = { 0 };
  const char *option = NULL, *fluid, *failed = NULL;
  const char *solve = cli_args_get (args, "--solve");
  double head_loss = 0.0;

  /* The inverse problems: the flow for a head loss, or the smallest bore
   * within the limits given. */
  if (!check_solve (args, solve, &head_loss, why))
    return NULL;

  /* What must be given, and what excludes what. */
  if (cli_args_has (args, "--pipe") && cli_args_has (args, "--diameter"))
    return refuse (why, NULL, _("Give either --pipe (a catalog designation) or --diameter (an inner diameter), not both.")), NULL;
  if (!cli_args_has (args, "--pipe") && !cli_args_has (args, "--diameter")
      && !(solve != NULL && g_str_equal (solve, "diameter")))
    return refuse (why, NULL, _("--diameter is required (inner diameter, e.g. --diameter \"102.3 mm\"), or name a catalog pipe with --pipe \"NPS 4 Sch 40\".")), NULL;
  if (cli_args_has (args, "--roughness") && cli_args_has (args, "--material"))
    return refuse (why, NULL, _("Give either --roughness (a value) or --material (a catalog name), not both.")), NULL;
  if (!cli_args_has (args, "--flow") && !(solve != NULL && g_str_equal (solve, "flow")))
    return refuse (why, NULL, _("--flow is required: give the volumetric flow, e.g. --flow \"12 L/s\".")), NULL;
  if (!cli_args_has (args, "--length"))
    return refuse (why, NULL, _("--length is required: give the line length, e.g. --length \"250 m\".")), NULL;
  if (cli_args_has (args, "--age") && !cli_args_has (args, "--aging"))
    return refuse (why, NULL, _("--age needs --aging: a growth-rate class (see 'rugosa-cli catalog aging') or a rate such as \"0.05 mm/yr\".")), NULL;
  if ((fluid = cli_args_get (args, "--fluid")) == NULL)
    return refuse (why, NULL, _("--fluid is required: water, seawater, oil, air or custom.")), NULL;

  /* A line and settings as new: one row of a batch leaves nothing behind
   * for the next.  The output units are the settings' too, so that the
   * warnings are written in them. */
  rugosa_line_store_defaults (line);
  rugosa_settings_store_defaults (settings);
  if (units != NULL)
    copy_units (settings, units);
  if (!set_fluid (args, fluid, line, why))
    return NULL;
  if (!cli_apply_field_options (args, FALSE, line, settings, &option, &err))
    return refuse (why, option, err.text), NULL;
  /* Without a roughness or material, the pipe's usual material. */
  if (!cli_args_has (args, "--roughness") && !cli_args_has (args, "--material"))
    {
      const RgPipe *pipe = NULL;

      if (cli_args_has (args, "--pipe"))
        (void) memo_rg_pipe_lookup (rugosa_line_get_pipe_designation (line), &pipe, NULL);
      if (pipe == NULL)
        return refuse (why, NULL, _("--roughness is required (absolute roughness, e.g. --roughness \"0.045 mm\"), or name a catalog material with --material.")), NULL;
      rugosa_field_store_string (line, rugosa_field_find ("material-id"), pipe->material_id);
    }
  if (rugosa_settings_check (settings, &failed, &err) != RG_OK)
    return refuse_subjects (args, err.subjects | rugosa_field_find (failed)->subjects, err.text, why), NULL;
  if (solve != NULL && !solve_line (args, project, line, solve, head_loss, why))
    return NULL;

  r = rugosa_project_get_results (project, line);
  p = &r->points[RUGOSA_FLOW_DESIGN];
  if (!r->ok)
    return refuse_subjects (args, r->error_subjects, r->error, why), NULL;
  if (!p->ok)
    return refuse_subjects (args, p->error_subjects, p->error, why), NULL;
  return r;
}

int
cli_cmd_line (int argc, char **argv)
{
  g_auto (CliArgs) args = { 0 };
  g_autoptr (GString) msg = g_string_new (NULL);
  g_autoptr (GString) out = g_string_new (NULL);
  g_autoptr (RugosaProject) project = rugosa_project_new ();
  g_autoptr (RugosaLine) line = rugosa_line_new ("line");
  g_autoptr (RugosaSettings) units = rugosa_settings_new ();
  g_autofree RugosaLineResults *copy = NULL;
  g_auto (CliRefusal) why = { 0 };
  RugosaSettings *settings = rugosa_project_get_settings (project);
  const RugosaLineResults *r;
  const RugosaOperatingPoint *p;
  const char *solve;

  if (!cli_args_parse (&args, "line", options_for (FALSE), argc, argv, 2, msg))
    return cli_fail ("%s", msg->str);
  if (args.positional->len > 0)
    {
      g_autofree char *shown = cli_echo (g_ptr_array_index (args.positional, 0));
      return cli_fail (_("Unexpected argument \"%s\" for 'line'."), shown);
    }
  if (cli_args_has (&args, "--batch"))
    return cli_line_batch (&args);
  if (!cli_apply_units (&args, units))
    return CLI_EXIT_USAGE;

  rugosa_project_insert_line (project, 0, line);
  r = cli_line_evaluate (&args, project, line, units, &why);
  if (r == NULL)
    return cli_fail_refusal (&why);
  /* a copy of the results, to add the warnings of the command line's own
   * (whole, so that its design point is still the design point) */
  copy = g_memdup2 (r, sizeof *r);
  r = copy;
  p = &copy->points[RUGOSA_FLOW_DESIGN];
  cli_check_plausible (&args, copy, &copy->points[RUGOSA_FLOW_DESIGN], settings);
  solve = cli_args_get (&args, "--solve");

  if (cli_args_has (&args, "--json"))
    {
      g_string_append_c (out, '{');
      if (solve != NULL)
        {
          char buf[G_ASCII_DTOSTR_BUF_SIZE];

          /* what was solved for; the flow is no key of a point */
          g_string_append_printf (out, "\n  \"solved\": \"%s\",", solve);
          if (g_str_equal (solve, "flow"))
            g_string_append_printf (out, "\n  \"flow_m3_s\": %s,",
                                    cli_format_exact (rugosa_line_get_double (line, "flow-design"),
                                                      buf, sizeof buf));
        }
      rugosa_output_point_json (out, r, p, "\n  ");
      g_string_append (out, "\n}\n");
    }
  else
    {
      const char *designation = rugosa_line_get_pipe_designation (line);
      const char *material_id = rugosa_line_get_material_id (line);
      const RgMaterial *material = NULL;
      const int width = (int) rugosa_output_point_table_width (r, p);

      if (solve != NULL)
        {
          gboolean flow = g_str_equal (solve, "flow");
          RugosaDisplayQuantity dq = flow ? RUGOSA_DISPLAY_FLOW : RUGOSA_DISPLAY_DIAMETER;
          const char *unit = rugosa_output_unit (settings, dq);
          double solved = rugosa_line_get_double (line, flow ? "flow-design" : "inner-diameter");
          double shown = solved;
          char buf[G_ASCII_DTOSTR_BUF_SIZE];

          (void) rg_units_from_si (flow ? RG_QTY_FLOW : RG_QTY_LENGTH, solved, unit, &shown, NULL);
          cli_pad (out, flow ? _("Flow for the head loss") : _("Smallest bore within the limits"), width);
          g_string_append_printf (out, "%s %s\n", cli_format_short (shown, buf, sizeof buf),
                                  rugosa_display_unit_symbol (unit));
        }

      /* what the catalogs chose, named by the rows' labels */
      if (designation != NULL)
        {
          cli_pad (out, rugosa_field_label (rugosa_field_find ("pipe-designation")), width);
          g_string_append_printf (out, "%s\n", designation);
        }
      if (material_id != NULL && memo_rg_material_lookup (material_id, &material, NULL) == RG_OK)
        {
          cli_pad (out, rugosa_field_label (rugosa_field_find ("material-id")), width);
          g_string_append_printf (out, "%s\n", _(material->name));
        }
      rugosa_output_point_table (out, r, p, settings);
    }
  return cli_write_stdout (out->str);
}
