/* SPDX-License-Identifier: GPL-3.0-or-later */
/* A part of a line option (fluid, aging, flow case) applied to several
 * lines at once: only the chosen lines change, only in the part's fields,
 * as one undo step that restores every value exactly.
 *
 * Nothing here is computed: every expected value is the source line's own
 * value, read back at run time (a copy), or a value the line held before
 * (the project's file text, compared byte for byte). */
#include "config.h"

#include "model/rugosa-apply.h"

#define N_LINES 5

typedef struct {
  RugosaProject *project;
  RugosaHistory *history;
  RugosaLine *lines[N_LINES]; /* borrowed from the project */
  guint changed;              /* "changed" emissions */
} Fixture;

static void
count_changed (RugosaProject *project, Fixture *f)
{
  f->changed++;
}

static void
fixture_setup (Fixture *f, gconstpointer data)
{
  f->project = rugosa_project_new ();
  for (guint i = 0; i < N_LINES; i++)
    {
      g_autofree char *name = g_strdup_printf ("option %u", i);
      g_autoptr (RugosaLine) line = rugosa_line_new (name);

      /* each line its own water temperature, run and flow (invented
       * inputs, 10 … 50 °C) */
      g_object_set (line,
                    "temperature", 283.15 + 10.0 * i,
                    "length", 100.0 + 50.0 * i,
                    "flow-design", 0.01 + 0.005 * i,
                    NULL);
      rugosa_project_insert_line (f->project, i, line);
      f->lines[i] = line;
    }
  /* the source: seawater, with a state of its own */
  g_object_set (f->lines[0],
                "fluid-kind", RG_FLUID_SEAWATER,
                "temperature", 288.15,
                "pressure", 2.0e5,
                /* an invented input, 30 g/kg: not the default, so that
                 * the copy shows */
                "salinity", 0.030,
                "aging-class-id", "moderate",
                "flow-minimum", 0.004,
                "flow-maximum", 0.012,
                NULL);
  /* a target that is oil keeps its oil data when it becomes seawater */
  g_object_set (f->lines[2], "fluid-kind", RG_FLUID_OIL, "oil-density-ref", 870.0, NULL);
  f->history = rugosa_history_new (f->project);
  rugosa_history_set_merge_interval (f->history, 0);
  g_signal_connect (f->project, "changed", G_CALLBACK (count_changed), f);
}

static void
fixture_teardown (Fixture *f, gconstpointer data)
{
  g_clear_object (&f->history);
  g_clear_object (&f->project);
}

static char *
file_text (Fixture *f)
{
  gsize n;
  return rugosa_project_to_data (f->project, &n);
}

/* Whether `line` holds `source`'s value in `row` (exact for numbers). */
static gboolean
same_value (RugosaLine *line, RugosaLine *source, const RugosaField *row)
{
  GParamSpec *pspec = g_object_class_find_property (G_OBJECT_GET_CLASS (line), row->property);
  g_auto (GValue) a = G_VALUE_INIT;
  g_auto (GValue) b = G_VALUE_INIT;

  g_value_init (&a, pspec->value_type);
  g_value_init (&b, pspec->value_type);
  g_object_get_property (G_OBJECT (line), row->property, &a);
  g_object_get_property (G_OBJECT (source), row->property, &b);
  if (G_VALUE_HOLDS_DOUBLE (&a))
    return g_value_get_double (&a) == g_value_get_double (&b);
  return g_param_values_cmp (pspec, &a, &b) == 0;
}

/* The values of every line field but `part`'s, in `line`, as text. */
static char *
others_text (RugosaLine *line, RugosaLinePart part)
{
  GString *s = g_string_new (NULL);
  guint n;
  const RugosaField *rows = rugosa_line_fields (&n);

  for (guint r = 0; r < n; r++)
    {
      g_auto (GValue) v = G_VALUE_INIT;
      g_autofree char *text = NULL;

      if (rows[r].part == part)
        continue;
      g_value_init (&v, G_TYPE_STRING);
      if (rows[r].kind == RUGOSA_FIELD_NUMBER)
        text = g_strdup_printf ("%.17g", rugosa_line_get_double (line, rows[r].property));
      else if (rows[r].kind == RUGOSA_FIELD_TEXT || rows[r].kind == RUGOSA_FIELD_COLOUR
               || rows[r].kind == RUGOSA_FIELD_CATALOG)
        g_object_get (line, rows[r].property, &text, NULL);
      else if (rows[r].kind == RUGOSA_FIELD_ENUM)
        {
          int e = 0;
          g_object_get (line, rows[r].property, &e, NULL);
          text = g_strdup_printf ("%d", e);
        }
      g_string_append_printf (s, "%s=%s\n", rows[r].property, text ? text : "(none)");
    }
  return g_string_free (s, FALSE);
}

/* The fluid of line 0 to lines 1, 2, 3 of 5. */
static void
test_fluid_three_of_five (Fixture *f, gconstpointer data)
{
  RugosaLine *targets[] = { f->lines[1], f->lines[2], f->lines[3] };
  g_autofree char *before = file_text (f);
  g_autofree char *after = NULL;
  g_autofree char *untouched = others_text (f->lines[4], RUGOSA_LINE_PART_NONE);
  g_autofree char *source_before = others_text (f->lines[0], RUGOSA_LINE_PART_NONE);
  char *others_before[N_LINES];
  guint n, applied = 0;
  const RugosaField *rows = rugosa_line_fields (&n);
  double oil_density = rugosa_line_get_double (f->lines[2], "oil-density-ref");

  for (guint i = 0; i < N_LINES; i++)
    others_before[i] = others_text (f->lines[i], RUGOSA_LINE_PART_FLUID);
  /* the targets' salinity differs from the source's before */
  g_assert_cmpfloat (rugosa_line_get_double (f->lines[3], "salinity"), !=,
                     rugosa_line_get_double (f->lines[0], "salinity"));
  f->changed = 0;
  g_assert_cmpuint (rugosa_apply_part (f->history, f->lines[0], RUGOSA_LINE_PART_FLUID,
                                       targets, G_N_ELEMENTS (targets)), ==, 3);
  /* one change for the observers, one undo step saying what it did */
  g_assert_cmpuint (f->changed, ==, 1);
  g_assert_true (rugosa_history_can_undo (f->history));
  g_assert_cmpstr (rugosa_history_get_undo_label (f->history), ==, "Apply the fluid to 3 lines");

  /* the targets hold the source's fluid: the kind, and the state of
   * seawater, salinity included */
  for (guint t = 1; t <= 3; t++)
    {
      g_assert_cmpint (rugosa_line_get_fluid_kind (f->lines[t]), ==, RG_FLUID_SEAWATER);
      for (guint r = 0; r < n; r++)
        if (rugosa_apply_row_applies (&rows[r], f->lines[0], RUGOSA_LINE_PART_FLUID))
          {
            g_assert_true (same_value (f->lines[t], f->lines[0], &rows[r]));
            applied += t == 1;
          }
    }
  /* the rows applied are the kind and seawater's temperature, pressure
   * and salinity, as the field table marks them */
  g_assert_cmpuint (applied, ==, 4);
  g_assert_cmpfloat (rugosa_line_get_double (f->lines[3], "salinity"), ==,
                     rugosa_line_get_double (f->lines[0], "salinity"));
  /* the former oil keeps its oil data (not seawater's state) */
  g_assert_cmpfloat (rugosa_line_get_double (f->lines[2], "oil-density-ref"), ==, oil_density);
  /* no other field of any line changed; the source and line 4 not at all */
  for (guint i = 0; i < N_LINES; i++)
    {
      g_autofree char *now = others_text (f->lines[i], RUGOSA_LINE_PART_FLUID);
      g_assert_cmpstr (now, ==, others_before[i]);
    }
  {
    g_autofree char *l4 = others_text (f->lines[4], RUGOSA_LINE_PART_NONE);
    g_autofree char *l0 = others_text (f->lines[0], RUGOSA_LINE_PART_NONE);
    g_assert_cmpstr (l4, ==, untouched);
    g_assert_cmpstr (l0, ==, source_before);
  }
  after = file_text (f);

  /* one undo restores every value exactly: the file text byte for byte */
  g_assert_true (rugosa_history_undo (f->history));
  {
    g_autofree char *undone = file_text (f);
    g_assert_cmpstr (undone, ==, before);
  }
  g_assert_false (rugosa_history_can_undo (f->history));
  g_assert_true (rugosa_history_can_redo (f->history));
  g_assert_cmpstr (rugosa_history_get_redo_label (f->history), ==, "Apply the fluid to 3 lines");

  /* redo applies it again, exactly */
  f->changed = 0;
  g_assert_true (rugosa_history_redo (f->history));
  g_assert_cmpuint (f->changed, ==, 1);
  {
    g_autofree char *redone = file_text (f);
    g_assert_cmpstr (redone, ==, after);
  }
  for (guint i = 0; i < N_LINES; i++)
    g_free (others_before[i]);
}

/* Each changed line is evaluated again once; the others come from the
 * cache. */
static void
test_evaluations (Fixture *f, gconstpointer data)
{
  RugosaLine *targets[] = { f->lines[1], f->lines[2], f->lines[3], f->lines[4] };
  guint64 count;

  for (guint i = 0; i < N_LINES; i++)
    rugosa_project_get_results (f->project, f->lines[i]);
  count = rugosa_project_get_evaluation_count (f->project);
  /* line 4 already holds the source's flows: three lines change */
  g_object_set (f->lines[4], "flow-design", rugosa_line_get_double (f->lines[0], "flow-design"),
                "flow-minimum", rugosa_line_get_double (f->lines[0], "flow-minimum"),
                "flow-maximum", rugosa_line_get_double (f->lines[0], "flow-maximum"), NULL);
  rugosa_project_get_results (f->project, f->lines[4]);
  count = rugosa_project_get_evaluation_count (f->project);
  g_assert_cmpuint (rugosa_apply_part (f->history, f->lines[0], RUGOSA_LINE_PART_FLOW,
                                       targets, G_N_ELEMENTS (targets)), ==, 3);
  g_assert_cmpstr (rugosa_history_get_undo_label (f->history), ==, "Apply the flows to 3 lines");
  for (guint i = 0; i < N_LINES; i++)
    rugosa_project_get_results (f->project, f->lines[i]);
  g_assert_cmpuint (rugosa_project_get_evaluation_count (f->project) - count, ==, 3);
}

/* The aging: the class, and the rate kept for no class. */
static void
test_aging (Fixture *f, gconstpointer data)
{
  RugosaLine *targets[] = { f->lines[0], f->lines[3] };
  g_autofree char *before = file_text (f);

  g_object_set (f->lines[3], "aging-rate", 1.0e-4, NULL);
  g_object_set (f->lines[1], "aging-class-id", NULL, "aging-rate", 2.0e-5, NULL);
  g_clear_pointer (&before, g_free);
  before = file_text (f);
  /* from a line with a rate and no class; the source in the targets is
   * skipped */
  targets[0] = f->lines[1];
  g_assert_cmpuint (rugosa_apply_part (f->history, f->lines[1], RUGOSA_LINE_PART_AGING,
                                       targets, G_N_ELEMENTS (targets)), ==, 1);
  g_assert_null (rugosa_line_get_aging_class_id (f->lines[3]));
  g_assert_cmpfloat (rugosa_line_get_double (f->lines[3], "aging-rate"), ==,
                     rugosa_line_get_double (f->lines[1], "aging-rate"));
  g_assert_cmpstr (rugosa_history_get_undo_label (f->history), ==, "Apply the aging to 1 line");
  g_assert_true (rugosa_history_undo (f->history));
  {
    g_autofree char *undone = file_text (f);
    g_assert_cmpstr (undone, ==, before);
  }
}

/* Nothing to change records nothing and tells nobody. */
static void
test_nothing_to_change (Fixture *f, gconstpointer data)
{
  RugosaLine *targets[] = { f->lines[0] };

  f->changed = 0;
  g_assert_cmpuint (rugosa_apply_part (f->history, f->lines[0], RUGOSA_LINE_PART_FLUID, targets, 1), ==, 0);
  g_assert_cmpuint (rugosa_apply_part (f->history, f->lines[0], RUGOSA_LINE_PART_FLOW, NULL, 0), ==, 0);
  g_assert_false (rugosa_history_can_undo (f->history));
  g_assert_cmpuint (f->changed, ==, 0);
}

/* The parts are marked in the field table, and agree with the file's
 * objects: a row belongs to the fluid, the aging or the flows exactly when
 * its JSON path lies in the "fluid", "aging" or "flow" object, and every
 * row describing a fluid's state is part of the fluid. */
static void
test_parts_in_table (void)
{
  guint n;
  const RugosaField *rows = rugosa_line_fields (&n);
  guint counts[RUGOSA_N_LINE_PARTS] = { 0 };

  for (guint r = 0; r < n; r++)
    {
      const char *nick = rugosa_enum_nick (RUGOSA_TYPE_LINE_PART, rows[r].part);
      g_autofree char *prefix = g_strconcat (nick, ".", NULL);

      counts[rows[r].part]++;
      if (rows[r].fluid_kinds != 0)
        g_assert_cmpint (rows[r].part, ==, RUGOSA_LINE_PART_FLUID);
      if (rows[r].part != RUGOSA_LINE_PART_NONE)
        g_assert_true (g_str_has_prefix (rows[r].path, prefix));
      else
        for (int p = RUGOSA_LINE_PART_NONE + 1; p < RUGOSA_N_LINE_PARTS; p++)
          {
            g_autofree char *other = g_strconcat (rugosa_enum_nick (RUGOSA_TYPE_LINE_PART, p), ".", NULL);
            g_assert_false (g_str_has_prefix (rows[r].path, other));
          }
    }
  for (int p = RUGOSA_LINE_PART_NONE + 1; p < RUGOSA_N_LINE_PARTS; p++)
    g_assert_cmpuint (counts[p], >, 0);
  /* the settings are no line's part */
  rows = rugosa_settings_fields (&n);
  for (guint r = 0; r < n; r++)
    g_assert_cmpint (rows[r].part, ==, RUGOSA_LINE_PART_NONE);
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
#define ADD(path, fn) g_test_add (path, Fixture, NULL, fixture_setup, fn, fixture_teardown)
  ADD ("/apply/fluid/three-of-five", test_fluid_three_of_five);
  ADD ("/apply/flow/evaluations", test_evaluations);
  ADD ("/apply/aging/rate", test_aging);
  ADD ("/apply/nothing", test_nothing_to_change);
  g_test_add_func ("/apply/parts-in-table", test_parts_in_table);
  return g_test_run ();
}
