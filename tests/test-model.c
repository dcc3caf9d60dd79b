/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The document objects: line and settings properties, the project as a
 * GListModel of lines, and its change signals. */
#include "config.h"

#include "model/rugosa-project.h"

static void
count_notify (GObject *object, GParamSpec *pspec, int *count)
{
  (*count)++;
}

static void
test_line_notify (void)
{
  g_autoptr (RugosaLine) line = rugosa_line_new ("A");
  int count = 0;
  guint64 rev;

  g_signal_connect (line, "notify", G_CALLBACK (count_notify), &count);
  rev = rugosa_line_get_revision (line);

  rugosa_line_set_double (line, "length", 250.0);
  g_assert_cmpint (count, ==, 1);
  g_assert_cmpfloat (rugosa_line_get_double (line, "length"), ==, 250.0);
  /* The same value again is not a change. */
  rugosa_line_set_double (line, "length", 250.0);
  rugosa_line_set_name (line, "A");
  g_assert_cmpint (count, ==, 1);
  g_assert_cmpuint (rugosa_line_get_revision (line), ==, rev + 1);

  /* "" for a catalog key means custom, the same as NULL. */
  g_object_set (line, "pipe-designation", "NPS 4 Sch 40", NULL);
  g_assert_cmpstr (rugosa_line_get_pipe_designation (line), ==, "NPS 4 Sch 40");
  g_object_set (line, "pipe-designation", "", NULL);
  g_assert_null (rugosa_line_get_pipe_designation (line));
  g_assert_cmpint (count, ==, 3);

  rugosa_line_set_fittings (line, g_variant_new_parsed ("[('', 0.5, 2.0)]"));
  g_assert_cmpint (count, ==, 4);
  rugosa_line_set_fittings (line, g_variant_new_parsed ("[('', 0.5, 2.0)]"));
  g_assert_cmpint (count, ==, 4);
  g_assert_cmpuint (g_variant_n_children (rugosa_line_get_fittings (line)), ==, 1);
}

static void
test_line_duplicate (void)
{
  g_autoptr (RugosaLine) line = rugosa_line_new ("Main");
  g_autoptr (RugosaLine) copy = NULL;

  g_object_set (line, "colour", "#102030", "material-id", "cast-iron",
                "aging-rate", 1e-4, "fluid-kind", 3, "note", "n", NULL);
  rugosa_line_set_fittings (line, g_variant_new_parsed ("[('elbow-90-standard', 0.0, 3.0)]"));
  copy = rugosa_line_duplicate (line);
  g_assert_true (rugosa_line_equal (line, copy));
  rugosa_line_set_double (copy, "elevation", -2.0);
  g_assert_false (rugosa_line_equal (line, copy));
}

typedef struct {
  guint position, removed, added;
  int calls;
} ItemsChanged;

static void
on_items_changed (GListModel *model, guint position, guint removed,
                  guint added, ItemsChanged *ic)
{
  ic->position = position;
  ic->removed = removed;
  ic->added = added;
  ic->calls++;
}

static void
on_changed (RugosaProject *project, int *count)
{
  (*count)++;
}

static void
test_project_list_model (void)
{
  g_autoptr (RugosaProject) project = rugosa_project_new ();
  g_autoptr (RugosaLine) a = rugosa_line_new ("a");
  g_autoptr (RugosaLine) b = rugosa_line_new ("b");
  g_autoptr (RugosaLine) c = rugosa_line_new ("c");
  g_autoptr (RugosaLine) item = NULL;
  g_autoptr (RugosaLine) removed = NULL;
  ItemsChanged ic = { 0 };
  int changed = 0;

  g_signal_connect (project, "items-changed", G_CALLBACK (on_items_changed), &ic);
  g_signal_connect (project, "changed", G_CALLBACK (on_changed), &changed);
  g_assert_true (g_list_model_get_item_type (G_LIST_MODEL (project)) == RUGOSA_TYPE_LINE);

  rugosa_project_insert_line (project, 0, a);
  rugosa_project_insert_line (project, 1, c);
  rugosa_project_insert_line (project, 1, b);
  g_assert_cmpint (ic.calls, ==, 3);
  g_assert_cmpuint (ic.position, ==, 1);
  g_assert_cmpuint (ic.added, ==, 1);
  g_assert_cmpuint (g_list_model_get_n_items (G_LIST_MODEL (project)), ==, 3);
  item = g_list_model_get_item (G_LIST_MODEL (project), 1);
  g_assert_true (item == b);
  g_assert_null (g_list_model_get_item (G_LIST_MODEL (project), 3));

  rugosa_project_move_line (project, 0, 2);
  g_assert_cmpint (rugosa_project_find_line (project, a), ==, 2);
  g_assert_cmpint (rugosa_project_find_line (project, b), ==, 0);
  g_assert_cmpuint (ic.position, ==, 0);
  g_assert_cmpuint (ic.removed, ==, 3);
  g_assert_cmpuint (ic.added, ==, 3);

  removed = rugosa_project_remove_line (project, 1);
  g_assert_true (removed == c);
  g_assert_cmpuint (ic.removed, ==, 1);
  g_assert_cmpuint (ic.added, ==, 0);
  g_assert_cmpint (ic.calls, ==, 5);

  /* A line's edit is a document change; a removed line's is not. */
  changed = 0;
  rugosa_line_set_double (a, "length", 12.0);
  g_assert_cmpint (changed, ==, 1);
  rugosa_line_set_double (c, "length", 12.0);
  g_assert_cmpint (changed, ==, 1);
  g_object_set (rugosa_project_get_settings (project), "service-age", 10.0, NULL);
  g_assert_cmpint (changed, ==, 2);
}

static void
test_settings (void)
{
  g_autoptr (RugosaSettings) s = rugosa_settings_new ();
  g_autoptr (RugosaSettings) t = rugosa_settings_new ();
  int count = 0;

  g_signal_connect (s, "notify", G_CALLBACK (count_notify), &count);
  g_assert_true (rugosa_settings_equal (s, t));
  g_object_set (s, "unit-system", RUGOSA_UNIT_SYSTEM_US, NULL);
  g_object_set (s, "unit-overrides", g_variant_new_parsed ("{'flow': 'gpm'}"), NULL);
  g_object_set (s, "unit-overrides", g_variant_new_parsed ("{'flow': 'gpm'}"), NULL);
  g_assert_cmpint (count, ==, 2);
  /* The override for flow, the US system's usual unit for the rest. */
  g_assert_cmpstr (rugosa_settings_get_unit (s, RUGOSA_DISPLAY_FLOW), ==, "gpm");
  g_assert_cmpstr (rugosa_settings_get_unit (s, RUGOSA_DISPLAY_LENGTH), ==, "ft");
  g_object_set (s, "unit-overrides", g_variant_new_parsed ("{'flow': 'm3/h'}"), NULL);
  g_assert_cmpstr (rugosa_settings_get_unit (s, RUGOSA_DISPLAY_FLOW), ==, "m3/h");
  /* An override this build cannot read is not used. */
  g_object_set (s, "unit-overrides", g_variant_new_parsed ("{'flow': 'furlong'}"), NULL);
  g_assert_cmpstr (rugosa_settings_get_unit (s, RUGOSA_DISPLAY_FLOW), ==, "gpm");
  g_assert_false (rugosa_settings_equal (s, t));
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/model/line/notify", test_line_notify);
  g_test_add_func ("/model/line/duplicate", test_line_duplicate);
  g_test_add_func ("/model/project/list-model", test_project_list_model);
  g_test_add_func ("/model/settings/notify", test_settings);
  return g_test_run ();
}
