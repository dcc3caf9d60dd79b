/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The pipe catalogs: the ductile iron and PVC water catalogs against the
 * standards' tables, which catalogs fit a material, which a name chooses,
 * the order of sizes and the search by any part of a designation. */
#include "core/catalog.h"

#include <glib.h>
#include <math.h>
#include <string.h>

#define MM 1.0e-3
#define IN 0.0254

static const RgPipe *
pipe (const char *designation)
{
  const RgPipe *p = NULL;
  RgError err = { 0 };

  if (rg_pipe_lookup (designation, &p, &err) != RG_OK)
    g_error ("%s: %s", designation, err.text);
  return p;
}

/* ---- ductile iron, ISO 2531 with ISO 4179 lining ---- */

typedef struct {
  int dn;
  double de_mm;      /* external diameter */
  double e_mm;       /* nominal wall of the class */
  double lining_mm;  /* nominal cement-mortar lining */
  double id_mm;      /* DE − 2e − 2·lining, by hand */
} Ductile;

/* From memory of ISO 2531:2009, the table of external diameters DE and the
 * table of nominal wall thicknesses of the preferred pressure classes (C40
 * to DN 300, C30 from DN 350), and of ISO 4179:2005, Table 1 (nominal
 * lining 3 mm to DN 300, 5 mm to DN 600); not checked against the document.
 * The inner diameters were computed by hand from those three columns. */
static const Ductile preferred[] = {
  { 80, 98.0, 4.4, 3.0, 83.2 },
  { 100, 118.0, 4.4, 3.0, 103.2 },
  { 125, 144.0, 4.5, 3.0, 129.0 },
  { 150, 170.0, 4.5, 3.0, 155.0 },
  { 200, 222.0, 4.7, 3.0, 206.6 },
  { 250, 274.0, 5.5, 3.0, 257.0 },
  { 300, 326.0, 6.2, 3.0, 307.6 },
  { 350, 378.0, 5.7, 5.0, 356.6 },
  { 400, 429.0, 6.3, 5.0, 406.4 },
  { 450, 480.0, 6.9, 5.0, 456.2 },
  { 500, 532.0, 7.5, 5.0, 507.0 },
  { 600, 635.0, 8.7, 5.0, 607.6 },
};

/* From memory of ISO 2531:1998, the K9 thickness class (e = 9(0.5 +
 * 0.001 DN), at least 6 mm, as the table prints it), the same external
 * diameters, and ISO 4179:2005, Table 1 (6 mm lining from DN 700); not
 * checked against the document.  Inner diameters by hand. */
static const Ductile k9[] = {
  { 80, 98.0, 6.0, 3.0, 80.0 },
  { 100, 118.0, 6.0, 3.0, 100.0 },
  { 150, 170.0, 6.0, 3.0, 152.0 },
  { 200, 222.0, 6.3, 3.0, 203.4 },
  { 250, 274.0, 6.8, 3.0, 254.4 },
  { 300, 326.0, 7.2, 3.0, 305.6 },
  { 400, 429.0, 8.1, 5.0, 402.8 },
  { 500, 532.0, 9.0, 5.0, 504.0 },
  { 600, 635.0, 9.9, 5.0, 605.2 },
  { 800, 842.0, 11.7, 6.0, 806.6 },
  { 1000, 1048.0, 13.5, 6.0, 1009.0 },
};

static void
check_ductile (const Ductile *rows, gsize n, const char *klass_for_300,
               const char *klass_above)
{
  for (gsize i = 0; i < n; i++)
    {
      const Ductile *d = &rows[i];
      g_autofree char *name = g_strdup_printf ("DN %d %s", d->dn,
                                               d->dn <= 300 ? klass_for_300 : klass_above);
      const RgPipe *p = pipe (name);

      g_assert_cmpstr (p->designation, ==, name);
      g_assert_cmpstr (p->standard, ==, "ISO 2531");
      g_assert_cmpstr (p->material_id, ==, "ductile-iron-cement-lined");
      /* The table's values are whole tenths of a millimetre: the catalog
       * holds them to the last bit of their conversion to metres. */
      g_assert_cmpfloat_with_epsilon (p->outside_diameter_m, d->de_mm * MM, 1e-12);
      g_assert_cmpfloat_with_epsilon (p->wall_m, d->e_mm * MM, 1e-12);
      g_assert_cmpfloat_with_epsilon (p->lining_m, d->lining_mm * MM, 1e-12);
      g_assert_cmpfloat_with_epsilon (p->inner_diameter_m, d->id_mm * MM, 1e-12);
      g_assert_true (strstr (p->source, "ISO 2531") != NULL);
      g_assert_true (strstr (rg_pipe_catalog_at (p->catalog)->lining_source, "ISO 4179") != NULL);
    }
}

static void
test_ductile_preferred_classes (void)
{
  check_ductile (preferred, G_N_ELEMENTS (preferred), "C40", "C30");
}

static void
test_ductile_k9 (void)
{
  check_ductile (k9, G_N_ELEMENTS (k9), "K9", "K9");
}

static void
test_ductile_coverage (void)
{
  /* What a water catalog of ductile iron must hold: DN 80 to DN 600 in a
   * common pressure class, every DN of the series between (common
   * practice, no single source). */
  static const int dn[] = { 80, 100, 125, 150, 200, 250, 300, 350, 400, 450, 500, 600 };
  unsigned char chosen[256];
  int n = 0, found[512];

  g_assert_cmpint (rg_pipe_catalog_count (), <=, (int) sizeof chosen);
  g_assert_cmpint (rg_pipe_catalog_choose (NULL, "ductile-iron-cement-lined", chosen, &n, NULL), ==, RG_OK);
  /* the usual catalogs of ductile iron: the preferred classes */
  g_assert_cmpint (n, ==, 2);
  g_assert_cmpint (rg_pipe_search (chosen, NULL, found, G_N_ELEMENTS (found)), ==, (int) G_N_ELEMENTS (dn));
  for (gsize i = 0; i < G_N_ELEMENTS (dn); i++)
    {
      g_autofree char *want = g_strdup_printf ("DN %d ", dn[i]);
      g_assert_true (g_str_has_prefix (rg_pipe_at (found[i])->designation, want));
    }
  /* The lining reaches no unlined pipe. */
  for (int i = 0; i < rg_pipe_count (); i++)
    if (strcmp (rg_pipe_at (i)->standard, "ISO 2531") != 0)
      g_assert_cmpfloat (rg_pipe_at (i)->lining_m, ==, 0.0);
}

static void
test_c900 (void)
{
  /* From memory of AWWA C900-07, Table 2; not checked against the
   * document: 6 in DR 18, OD 6.90 in (cast-iron OD), minimum wall 0.383 in;
   * 12 in DR 14, OD 13.20 in, wall 0.943 in. */
  const RgPipe *p = pipe ("6 C900 DR 18");

  g_assert_cmpfloat_with_epsilon (p->outside_diameter_m, 6.90 * IN, 1e-12);
  g_assert_cmpfloat_with_epsilon (p->wall_m, 0.383 * IN, 1e-12);
  g_assert_cmpstr (p->material_id, ==, "pvc");
  p = pipe ("12 C900 DR 14");
  g_assert_cmpfloat_with_epsilon (p->outside_diameter_m, 13.20 * IN, 1e-12);
  g_assert_cmpfloat_with_epsilon (p->wall_m, 0.943 * IN, 1e-12);
}

/* ---- catalogs and materials ---- */

static void
test_catalogs_consistent (void)
{
  int next = 0;

  for (int c = 0; c < rg_pipe_catalog_count (); c++)
    {
      const RgPipeCatalog *cat = rg_pipe_catalog_at (c);
      const RgMaterial *m;

      /* catalogs cover the pipe table in order, each pipe once */
      g_assert_cmpint (cat->first_pipe, ==, next);
      g_assert_cmpint (cat->n_pipes, >, 0);
      next += cat->n_pipes;
      g_assert_nonnull (cat->material_ids[0]);
      for (const char *const *id = cat->material_ids; *id != NULL; id++)
        g_assert_cmpint (rg_material_lookup (*id, &m, NULL), ==, RG_OK);
      g_assert_true (g_str_has_prefix (cat->name, cat->standard));
      for (int i = cat->first_pipe; i < cat->first_pipe + cat->n_pipes; i++)
        {
          const RgPipe *p = rg_pipe_at (i);
          g_assert_cmpint (p->catalog, ==, c);
          g_assert_cmpstr (p->series, ==, cat->series);
          g_assert_cmpstr (p->material_id, ==, cat->material_ids[0]);
          g_assert_true (rg_pipe_catalog_fits (cat, p->material_id));
        }
    }
  g_assert_cmpint (next, ==, rg_pipe_count ());
  g_assert_null (rg_pipe_catalog_at (-1));
  g_assert_null (rg_pipe_catalog_at (rg_pipe_catalog_count ()));
}

static int
n_chosen_of (const char *name, const char *material, RgStatus want_status)
{
  unsigned char chosen[256];
  int n = -1;
  RgError err = { 0 };

  g_assert_cmpint (rg_pipe_catalog_choose (name, material, chosen, &n, &err), ==, want_status);
  if (want_status != RG_OK)
    g_assert_cmpstr (err.text, !=, "");
  return n;
}

static void
test_choose (void)
{
  unsigned char chosen[256];
  int n = 0;
  RgError err = { 0 };

  /* The usual series of PE: SDR 11 alone (data/pipes-iso-4427.json). */
  g_assert_cmpint (rg_pipe_catalog_choose ("", "pe", chosen, &n, NULL), ==, RG_OK);
  g_assert_cmpint (n, ==, 1);
  for (int c = 0; c < rg_pipe_catalog_count (); c++)
    if (chosen[c])
      g_assert_cmpstr (rg_pipe_catalog_at (c)->name, ==, "ISO 4427-2 SDR 11");
  /* A standard chooses its series, "all" every catalog of the material. */
  /* (data: ISO 4427-2 lists SDR 11, 17 and 26; C900 DR 14, 18, 25) */
  g_assert_cmpint (n_chosen_of ("ISO 4427-2", "pe", RG_OK), ==, 3);
  g_assert_cmpint (n_chosen_of ("all", "pe", RG_OK), ==, 3);
  g_assert_cmpint (n_chosen_of ("iso 4427-2 sdr17", "pe", RG_OK), ==, 1);
  g_assert_cmpint (n_chosen_of ("awwa c900", "pvc", RG_OK), ==, 3);
  /* PVC has two standards, each marking its usual series. */
  g_assert_cmpint (n_chosen_of (NULL, "pvc", RG_OK), ==, 2);
  /* Any material when none is named. */
  g_assert_cmpint (n_chosen_of ("all", NULL, RG_OK), ==, rg_pipe_catalog_count ());

  /* A catalog of another material is not chosen; the sentence names the
   * catalogs that fit. */
  g_assert_cmpint (rg_pipe_catalog_choose ("ASME B36.10M Sch 40", "pe", chosen, &n, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_true (err.subjects & RG_SUBJECT_BIT (RG_SUBJECT_PIPE));
  g_assert_true (strstr (err.text, "ISO 4427-2") != NULL);
  /* A material no catalog is made of. */
  rg_error_clear (&err);
  g_assert_cmpint (rg_pipe_catalog_choose (NULL, "glass", chosen, &n, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_true (err.subjects & RG_SUBJECT_BIT (RG_SUBJECT_MATERIAL));
  g_assert_cmpint (n, ==, 0);
}

/* ---- order and search ---- */

static int
search_all (const char *material, const char *query, int *out, int max)
{
  unsigned char chosen[256];
  int n = 0;

  if (material != NULL)
    {
      g_assert_cmpint (rg_pipe_catalog_choose ("all", material, chosen, &n, NULL), ==, RG_OK);
      return rg_pipe_search (chosen, query, out, max);
    }
  return rg_pipe_search (NULL, query, out, max);
}

static int
position_of (const int *found, int n, const char *designation)
{
  const RgPipe *p = pipe (designation);

  for (int i = 0; i < n; i++)
    if (rg_pipe_at (found[i]) == p)
      return i;
  return -1;
}

static void
test_order_size_then_wall (void)
{
  int found[1024];
  int n = search_all (NULL, "", found, G_N_ELEMENTS (found));

  g_assert_cmpint (n, ==, rg_pipe_count ());
  for (int i = 1; i < n; i++)
    g_assert_cmpint (rg_pipe_compare (rg_pipe_at (found[i - 1]), rg_pipe_at (found[i])), <, 0);

  /* Steel: every schedule of NPS 2 before any of NPS 2-1/2; within a size
   * the thinner wall first (the complaint: every Sch 5 came first). */
  n = search_all ("commercial-steel", NULL, found, G_N_ELEMENTS (found));
  g_assert_cmpint (position_of (found, n, "NPS 2 XXS"), <, position_of (found, n, "NPS 2-1/2 Sch 5"));
  g_assert_cmpint (position_of (found, n, "NPS 2 Sch 5"), <, position_of (found, n, "NPS 2 Sch 40"));
  g_assert_cmpint (position_of (found, n, "NPS 2 Sch 40"), <, position_of (found, n, "NPS 2 Sch 80"));
  /* PE: by outside diameter, then the thinner wall (higher SDR). */
  n = search_all ("pe", NULL, found, G_N_ELEMENTS (found));
  g_assert_cmpint (position_of (found, n, "DN 110 SDR 26"), <, position_of (found, n, "DN 110 SDR 17"));
  g_assert_cmpint (position_of (found, n, "DN 110 SDR 17"), <, position_of (found, n, "DN 110 SDR 11"));
  g_assert_cmpint (position_of (found, n, "DN 110 SDR 11"), <, position_of (found, n, "DN 125 SDR 26"));
}

static void
test_search_any_part (void)
{
  int found[1024], n;

  /* The complaint: "140 SDR 11" found nothing (matched from the start). */
  n = search_all (NULL, "140 SDR 11", found, G_N_ELEMENTS (found));
  g_assert_cmpint (n, >=, 1);
  g_assert_cmpstr (rg_pipe_at (found[0])->designation, ==, "DN 140 SDR 11");
  n = search_all ("pe", "140 SDR 11", found, G_N_ELEMENTS (found));
  g_assert_cmpint (n, ==, 1);
  /* Any order, spaces and case aside. */
  n = search_all ("pe", "sdr11 140", found, G_N_ELEMENTS (found));
  g_assert_cmpint (n, ==, 1);
  g_assert_cmpstr (rg_pipe_at (found[0])->designation, ==, "DN 140 SDR 11");
  /* The catalog's name is searched too: every C900 size (data: five
   * sizes in each of DR 14, 18 and 25). */
  n = search_all (NULL, "C900", found, G_N_ELEMENTS (found));
  g_assert_cmpint (n, ==, 15);
  n = search_all (NULL, "B36.19M 10S", found, G_N_ELEMENTS (found));
  g_assert_cmpint (n, >, 0);
  for (int i = 0; i < n; i++)
    g_assert_cmpstr (rg_pipe_at (found[i])->series, ==, "10S");
  /* A size written with a fraction, joined or apart: NPS 1-1/4 (and NPS
   * 1/4, whose words hold "1" and "1/4" too), Sch 40 alone. */
  n = search_all ("commercial-steel", "1-1/4 sch 40", found, G_N_ELEMENTS (found));
  g_assert_cmpint (position_of (found, n, "NPS 1-1/4 Sch 40"), >=, 0);
  g_assert_cmpint (n, ==, search_all ("commercial-steel", "1 1/4 Sch 40", found, G_N_ELEMENTS (found)));
  for (int i = 0; i < n; i++)
    {
      g_assert_cmpstr (rg_pipe_at (found[i])->series, ==, "40");
      g_assert_true (strstr (rg_pipe_at (found[i])->designation, "1/4") != NULL);
    }
  /* Nothing, and a short buffer: the count (data: 24 + 22 + 20 sizes of
   * SDR 11, 17 and 26 in ISO 4427-2), the first ones written. */
  g_assert_cmpint (search_all (NULL, "no such pipe", found, G_N_ELEMENTS (found)), ==, 0);
  n = search_all ("pe", "", found, 3);
  g_assert_cmpint (n, ==, 66);
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/pipe-catalogs/ductile/preferred-classes", test_ductile_preferred_classes);
  g_test_add_func ("/pipe-catalogs/ductile/k9", test_ductile_k9);
  g_test_add_func ("/pipe-catalogs/ductile/coverage", test_ductile_coverage);
  g_test_add_func ("/pipe-catalogs/c900", test_c900);
  g_test_add_func ("/pipe-catalogs/consistent", test_catalogs_consistent);
  g_test_add_func ("/pipe-catalogs/choose", test_choose);
  g_test_add_func ("/pipe-catalogs/order", test_order_size_then_wall);
  g_test_add_func ("/pipe-catalogs/search", test_search_any_part);
  return g_test_run ();
}
