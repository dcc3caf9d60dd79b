/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Undo and redo: property edits, merges of quick edits, groups and the
 * structural edits of the line list. */
#include "config.h"

#include "model/rugosa-history.h"

typedef struct {
  RugosaProject *project;
  RugosaHistory *history;
  RugosaLine *a, *b, *c; /* borrowed from the project */
} Fixture;

static void
fixture_setup (Fixture *f, gconstpointer data)
{
  const char *names[] = { "a", "b", "c" };
  RugosaLine **slots[] = { &f->a, &f->b, &f->c };

  f->project = rugosa_project_new ();
  for (guint i = 0; i < 3; i++)
    {
      g_autoptr (RugosaLine) line = rugosa_line_new (names[i]);

      rugosa_project_insert_line (f->project, i, line);
      *slots[i] = line;
    }
  f->history = rugosa_history_new (f->project);
  /* Merging by time is tested explicitly; elsewhere every edit is a step. */
  rugosa_history_set_merge_interval (f->history, 0);
}

static void
fixture_teardown (Fixture *f, gconstpointer data)
{
  g_clear_object (&f->history);
  g_clear_object (&f->project);
}

static double
length_of (RugosaLine *line)
{
  return rugosa_line_get_double (line, "length");
}

static void
test_set_undo_redo (Fixture *f, gconstpointer data)
{
  double l0 = length_of (f->a);

  g_assert_false (rugosa_history_can_undo (f->history));
  rugosa_history_set (f->history, f->a, "length", 250.0, NULL);
  rugosa_history_set (f->history, f->a, "name", "renamed", NULL);
  g_assert_cmpfloat (length_of (f->a), ==, 250.0);
  g_assert_true (rugosa_history_can_undo (f->history));
  g_assert_cmpstr (rugosa_history_get_undo_label (f->history), ==, "Change “Name”");

  g_assert_true (rugosa_history_undo (f->history));
  g_assert_cmpstr (rugosa_line_get_name (f->a), ==, "a");
  g_assert_cmpfloat (length_of (f->a), ==, 250.0);
  g_assert_true (rugosa_history_undo (f->history));
  g_assert_cmpfloat (length_of (f->a), ==, l0);
  g_assert_false (rugosa_history_undo (f->history));
  g_assert_true (rugosa_history_can_redo (f->history));

  g_assert_true (rugosa_history_redo (f->history));
  g_assert_cmpfloat (length_of (f->a), ==, 250.0);
  /* A new edit drops the redo branch. */
  rugosa_history_set (f->history, f->b, "length", 3.0, NULL);
  g_assert_false (rugosa_history_can_redo (f->history));
  g_assert_false (rugosa_history_redo (f->history));

  /* Setting the current value records nothing. */
  rugosa_history_set (f->history, f->b, "length", 3.0, NULL);
  g_assert_true (rugosa_history_undo (f->history));
  g_assert_cmpfloat (length_of (f->b), ==, l0);
  g_assert_true (rugosa_history_undo (f->history));
  g_assert_cmpfloat (length_of (f->a), ==, l0);
  g_assert_false (rugosa_history_can_undo (f->history));
}

static void
test_merge_by_time (Fixture *f, gconstpointer data)
{
  double l0 = length_of (f->a);

  /* An hour-long window: a slider drag of many values is one step. */
  rugosa_history_set_merge_interval (f->history, 3600 * 1000);
  for (int i = 1; i <= 50; i++)
    rugosa_history_set (f->history, f->a, "length", 100.0 + i, NULL);
  /* Another property, or another line, starts a new step. */
  rugosa_history_set (f->history, f->a, "elevation", 1.0, NULL);
  rugosa_history_set (f->history, f->b, "elevation", 2.0, NULL);
  rugosa_history_set (f->history, f->b, "elevation", 3.0, NULL);

  g_assert_true (rugosa_history_undo (f->history));
  g_assert_cmpfloat (rugosa_line_get_double (f->b, "elevation"), ==, 0.0);
  g_assert_true (rugosa_history_undo (f->history));
  g_assert_cmpfloat (rugosa_line_get_double (f->a, "elevation"), ==, 0.0);
  g_assert_true (rugosa_history_undo (f->history));
  g_assert_cmpfloat (length_of (f->a), ==, l0);
  g_assert_false (rugosa_history_can_undo (f->history));
  g_assert_true (rugosa_history_redo (f->history));
  g_assert_cmpfloat (length_of (f->a), ==, 150.0);
}

static void
test_merge_broken (Fixture *f, gconstpointer data)
{
  rugosa_history_set_merge_interval (f->history, 3600 * 1000);
  rugosa_history_set (f->history, f->a, "length", 10.0, NULL);
  rugosa_history_set (f->history, f->a, "length", 11.0, NULL);
  /* The drag ended: the next change is a step of its own. */
  rugosa_history_break_merge (f->history);
  rugosa_history_set (f->history, f->a, "length", 12.0, NULL);
  rugosa_history_set (f->history, f->a, "length", 13.0, NULL);

  g_assert_true (rugosa_history_undo (f->history));
  g_assert_cmpfloat (length_of (f->a), ==, 11.0);
  /* An undo also ends merging. */
  rugosa_history_set (f->history, f->a, "length", 20.0, NULL);
  g_assert_true (rugosa_history_undo (f->history));
  g_assert_cmpfloat (length_of (f->a), ==, 11.0);
}

static void
test_no_merge_without_window (Fixture *f, gconstpointer data)
{
  rugosa_history_set (f->history, f->a, "length", 10.0, NULL);
  rugosa_history_set (f->history, f->a, "length", 11.0, NULL);
  g_assert_true (rugosa_history_undo (f->history));
  g_assert_cmpfloat (length_of (f->a), ==, 10.0);
}

static void
test_group (Fixture *f, gconstpointer data)
{
  RugosaSettings *s = rugosa_project_get_settings (f->project);
  double age0 = rugosa_settings_get_double (s, "service-age");

  rugosa_history_begin_group (f->history, "Switch to steel");
  rugosa_history_set (f->history, f->a, "material-id", "commercial-steel", NULL);
  rugosa_history_set (f->history, f->a, "pipe-designation", "NPS 4 Sch 40", NULL);
  rugosa_history_begin_group (f->history, "inner");
  rugosa_history_set (f->history, s, "service-age", 12.0, NULL);
  rugosa_history_end_group (f->history);
  /* No undo while a group is open. */
  g_assert_false (rugosa_history_can_undo (f->history));
  rugosa_history_end_group (f->history);

  g_assert_cmpstr (rugosa_history_get_undo_label (f->history), ==, "Switch to steel");
  g_assert_true (rugosa_history_undo (f->history));
  g_assert_null (rugosa_line_get_material_id (f->a));
  g_assert_null (rugosa_line_get_pipe_designation (f->a));
  g_assert_cmpfloat (rugosa_settings_get_double (s, "service-age"), ==, age0);
  g_assert_false (rugosa_history_can_undo (f->history));
  g_assert_true (rugosa_history_redo (f->history));
  g_assert_cmpstr (rugosa_line_get_pipe_designation (f->a), ==, "NPS 4 Sch 40");
  g_assert_cmpfloat (rugosa_settings_get_double (s, "service-age"), ==, 12.0);

  /* Several properties in one call are one step too; an empty group none. */
  rugosa_history_begin_group (f->history, "nothing");
  rugosa_history_end_group (f->history);
  rugosa_history_set (f->history, f->b, "length", 1.0, "elevation", 2.0, NULL);
  g_assert_true (rugosa_history_undo (f->history));
  g_assert_cmpfloat (rugosa_line_get_double (f->b, "elevation"), ==, 0.0);
  g_assert_cmpfloat (length_of (f->b), !=, 1.0);
  g_assert_cmpstr (rugosa_history_get_undo_label (f->history), ==, "Switch to steel");
}

static void count_notify (GObject *object, GParamSpec *pspec, int *count);

/* Someone who shows "can undo" hears of every change of it: a group that
 * opens hides the steps before it, and its end shows them again. */
static void
test_group_notifies (Fixture *f, gconstpointer data)
{
  int count = 0;

  rugosa_history_set (f->history, f->a, "length", 12.0, NULL);
  g_signal_connect (f->history, "notify::can-undo", G_CALLBACK (count_notify), &count);
  rugosa_history_begin_group (f->history, "duplicate");
  g_assert_false (rugosa_history_can_undo (f->history));
  g_assert_cmpint (count, ==, 1);
  rugosa_history_set (f->history, f->a, "length", 13.0, NULL);
  rugosa_history_end_group (f->history);
  g_assert_true (rugosa_history_can_undo (f->history));
  g_assert_cmpint (count, ==, 2);
  /* an empty group changes nothing in the end, but is heard both ways */
  rugosa_history_begin_group (f->history, "nothing");
  rugosa_history_end_group (f->history);
  g_assert_true (rugosa_history_can_undo (f->history));
  g_assert_cmpint (count, ==, 4);
}

static char *
names (RugosaProject *p)
{
  GString *s = g_string_new (NULL);

  for (guint i = 0; i < rugosa_project_get_n_lines (p); i++)
    g_string_append_printf (s, "%s%s", i ? "," : "",
                            rugosa_line_get_name (rugosa_project_get_line (p, i)));
  return g_string_free (s, FALSE);
}

#define ASSERT_NAMES(f, expected) \
  G_STMT_START { g_autofree char *n_ = names ((f)->project); \
                 g_assert_cmpstr (n_, ==, expected); } G_STMT_END

static void
test_structural (Fixture *f, gconstpointer data)
{
  g_autoptr (RugosaLine) d = rugosa_line_new ("d");
  RugosaLine *copy;

  rugosa_history_add_line (f->history, 1, d);
  ASSERT_NAMES (f, "a,d,b,c");
  rugosa_history_remove_line (f->history, 0);
  ASSERT_NAMES (f, "d,b,c");
  rugosa_history_move_line (f->history, 0, 2);
  ASSERT_NAMES (f, "b,c,d");
  copy = rugosa_history_duplicate_line (f->history, 1);
  ASSERT_NAMES (f, "b,c,c (copy),d");
  g_assert_cmpstr (rugosa_history_get_undo_label (f->history), ==, "Duplicate a line option");
  /* Edit the copy, then a removed line's edit survives remove + undo. */
  rugosa_history_set (f->history, copy, "length", 42.0, NULL);
  rugosa_history_remove_line (f->history, 2);
  ASSERT_NAMES (f, "b,c,d");

  g_assert_true (rugosa_history_undo (f->history));
  ASSERT_NAMES (f, "b,c,c (copy),d");
  g_assert_cmpfloat (length_of (rugosa_project_get_line (f->project, 2)), ==, 42.0);
  g_assert_true (rugosa_history_undo (f->history));
  g_assert_true (rugosa_history_undo (f->history));
  ASSERT_NAMES (f, "b,c,d");
  g_assert_true (rugosa_history_undo (f->history));
  ASSERT_NAMES (f, "d,b,c");
  g_assert_true (rugosa_history_undo (f->history));
  ASSERT_NAMES (f, "a,d,b,c");
  g_assert_true (rugosa_history_undo (f->history));
  ASSERT_NAMES (f, "a,b,c");
  g_assert_false (rugosa_history_can_undo (f->history));

  for (int i = 0; i < 6; i++)
    g_assert_true (rugosa_history_redo (f->history));
  ASSERT_NAMES (f, "b,c,d");
  g_assert_false (rugosa_history_can_redo (f->history));
}

static void
count_notify (GObject *object, GParamSpec *pspec, int *count)
{
  (*count)++;
}

static void
test_notify_and_clear (Fixture *f, gconstpointer data)
{
  int undo_changes = 0, redo_changes = 0;

  g_signal_connect (f->history, "notify::can-undo", G_CALLBACK (count_notify), &undo_changes);
  g_signal_connect (f->history, "notify::can-redo", G_CALLBACK (count_notify), &redo_changes);
  rugosa_history_set (f->history, f->a, "length", 5.0, NULL);
  rugosa_history_set (f->history, f->a, "length", 6.0, NULL);
  g_assert_cmpint (undo_changes, ==, 1);
  rugosa_history_undo (f->history);
  g_assert_cmpint (redo_changes, ==, 1);
  rugosa_history_clear (f->history);
  g_assert_false (rugosa_history_can_undo (f->history));
  g_assert_false (rugosa_history_can_redo (f->history));
  g_assert_cmpint (undo_changes, ==, 2);
  g_assert_cmpint (redo_changes, ==, 2);
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
#define ADD(path, fn) g_test_add (path, Fixture, NULL, fixture_setup, fn, fixture_teardown)
  ADD ("/history/set/undo-redo", test_set_undo_redo);
  ADD ("/history/merge/by-time", test_merge_by_time);
  ADD ("/history/merge/broken", test_merge_broken);
  ADD ("/history/merge/no-window", test_no_merge_without_window);
  ADD ("/history/group", test_group);
  ADD ("/history/group-notifies", test_group_notifies);
  ADD ("/history/structural", test_structural);
  ADD ("/history/notify-and-clear", test_notify_and_clear);
#undef ADD
  return g_test_run ();
}
