/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Materials and pipe catalogs: contents, designation parser, closest-match
 * messages. */
#include "core/aging.h"
#include "core/catalog.h"
#include "core/fittings.h"

#include <glib.h>
#include <math.h>
#include <string.h>

/* 1 in = 25.4 mm exactly (international inch, 1959). */
#define IN 0.0254

static void
assert_rel (double got, double want, double tol)
{
  if (!(fabs (got - want) <= tol * fabs (want)))
    g_error ("got %.17g, want %.17g (relative tolerance %g)", got, want, tol);
}

static const RgPipe *
pipe (const char *designation)
{
  const RgPipe *p = NULL;
  RgError err = { 0 };
  if (rg_pipe_lookup (designation, &p, &err) != RG_OK)
    g_error ("\"%s\": %s", designation, err.text);
  return p;
}

static void
test_materials_table (void)
{
  /* Common practice (no single source): the issue asks for at least 15. */
  g_assert_cmpint (rg_material_count (), >=, 15);
  for (int i = 0; i < rg_material_count (); i++)
    {
      const RgMaterial *m = rg_material_at (i);
      g_assert_nonnull (m);
      g_assert_cmpfloat (m->roughness_min_m, >, 0.0);
      g_assert_cmpfloat (m->roughness_min_m, <=, m->roughness_m);
      g_assert_cmpfloat (m->roughness_m, <=, m->roughness_max_m);
      g_assert_true (strlen (m->source) > 20);
    }
  g_assert_null (rg_material_at (-1));
  g_assert_null (rg_material_at (rg_material_count ()));
}

static void
test_materials_lookup (void)
{
  const RgMaterial *m = NULL;
  RgError err = { 0 };

  g_assert_cmpint (rg_material_lookup ("commercial-steel", &m, &err), ==, RG_OK);
  /* From memory of White, Fluid Mechanics, 7th ed., Table 6.1 (commercial
   * steel, new: 0.046 mm); not checked against the document */
  assert_rel (m->roughness_m, 0.046e-3, 1e-12);
  g_assert_cmpint (rg_material_lookup ("CAST IRON, NEW", &m, &err), ==, RG_OK);
  g_assert_cmpstr (m->id, ==, "cast-iron-new");
  /* From memory of White, Fluid Mechanics, 7th ed., Table 6.1 (cast iron,
   * new: 0.26 mm); not checked against the document */
  assert_rel (m->roughness_m, 0.26e-3, 1e-12);

  g_assert_cmpint (rg_material_lookup ("comercial-steel", &m, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_nonnull (strstr (err.text, "commercial-steel"));
  g_assert_nonnull (strstr (err.text, "comercial-steel"));
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_MATERIAL));
  g_assert_cmpint (rg_material_lookup ("steel", &m, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_nonnull (strstr (err.text, "commercial-steel"));
  g_assert_cmpint (rg_material_lookup (NULL, &m, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_MATERIAL));
}

static void
test_edit_distance (void)
{
  /* Source: Levenshtein (1966) distance; the textbook example
   * kitten -> sitting needs 3 edits. */
  g_assert_cmpint (rg_catalog_edit_distance ("kitten", "sitting"), ==, 3);
  g_assert_cmpint (rg_catalog_edit_distance ("", "abc"), ==, 3);
  g_assert_cmpint (rg_catalog_edit_distance ("ABC", "abc"), ==, 0);
}

static void
test_pipes_spellings (void)
{
  static const char *const nps2_40[] = {
    "NPS 2 Sch 40", "nps 2 sch 40", "2\" sch40", "2in SCH 40", "NPS2SCH40",
    "nps2 schedule 40", " 2 inch  Sch.40 ", "2.0\" sch 40",
  };
  const RgPipe *p = pipe ("NPS 2 Sch 40");

  g_assert_cmpstr (p->designation, ==, "NPS 2 Sch 40");
  g_assert_cmpstr (p->standard, ==, "ASME B36.10M");
  /* From memory of ASME B36.10M, Table 1: NPS 2 OD 2.375 in, Sch 40 wall
   * 0.154 in, hence ID 2.067 in; not checked against the document */
  assert_rel (p->outside_diameter_m, 2.375 * IN, 1e-12);
  assert_rel (p->wall_m, 0.154 * IN, 1e-12);
  assert_rel (p->inner_diameter_m, 2.067 * IN, 1e-12);
  for (size_t i = 0; i < G_N_ELEMENTS (nps2_40); i++)
    g_assert_true (pipe (nps2_40[i]) == p);

  /* Weight class STD equals Sch 40 up to NPS 10 (B36.10M, from memory). */
  g_assert_true (pipe ("NPS 2 STD") != p);
  assert_rel (pipe ("2 std")->wall_m, p->wall_m, 1e-15);

  /* Mixed numbers and decimals. */
  p = pipe ("NPS 1-1/4 Sch 80");
  g_assert_true (pipe ("1 1/4 sch 80") == p);
  g_assert_true (pipe ("1.25\" sch80") == p);
  /* From memory of ASME B36.10M, Table 1: NPS 1-1/4 OD 1.660 in, Sch 80
   * wall 0.191 in; not checked against the document */
  assert_rel (p->outside_diameter_m, 1.660 * IN, 1e-12);
  assert_rel (p->wall_m, 0.191 * IN, 1e-12);
  g_assert_true (pipe ("0.5 sch 40") == pipe ("NPS 1/2 Sch 40"));

  /* Stainless. */
  p = pipe ("NPS 2 Sch 10S");
  g_assert_cmpstr (p->standard, ==, "ASME B36.19M");
  g_assert_true (pipe ("2\" 10s") == p);
  g_assert_true (pipe ("nps 2 sch10S") == p);
  g_assert_true (pipe ("NPS 2 Sch 10 S") == p);
  /* From memory of ASME B36.19M, Table 1: NPS 2 10S wall 0.109 in; not
   * checked against the document */
  assert_rel (p->wall_m, 0.109 * IN, 1e-12);

  /* Polyethylene by nominal outside diameter. */
  p = pipe ("DN 110 SDR 11");
  g_assert_true (pipe ("PE100 110 SDR11") == p);
  g_assert_true (pipe ("110 mm SDR 11") == p);
  g_assert_true (pipe ("OD 110 sdr 11") == p);
  g_assert_true (pipe ("110 SDR 11 PE 100") == p);
  /* From memory of ISO 4427-2, Table 2: dn 110, SDR 11, en = 10.0 mm; not
   * checked against the document */
  assert_rel (p->outside_diameter_m, 0.110, 1e-12);
  assert_rel (p->wall_m, 0.0100, 1e-12);
  assert_rel (p->inner_diameter_m, 0.090, 1e-12);

  /* Copper tube. */
  p = pipe ("3/4 Type L");
  g_assert_true (pipe ("3/4\" type l") == p);
  g_assert_true (pipe ("0.75 L") == p);
  /* From memory of ASTM B88, Table 1: 3/4 standard size OD 0.875 in,
   * type L wall 0.045 in; not checked against the document */
  assert_rel (p->outside_diameter_m, 0.875 * IN, 1e-12);
  assert_rel (p->wall_m, 0.045 * IN, 1e-12);

  /* PVC. */
  p = pipe ("2 PVC Sch 80");
  g_assert_true (pipe ("pvc 2\" sch80") == p);
  g_assert_cmpstr (p->standard, ==, "ASTM D1785");
  /* From memory of ASTM D1785, Table 2: 2 in Sch 80 minimum wall 0.218 in;
   * not checked against the document */
  assert_rel (p->wall_m, 0.218 * IN, 1e-12);
  g_assert_true (pipe ("2 sch 80") != p);
}

static void
test_pipes_every_designation (void)
{
  /* Every designation as the catalog writes it finds itself (no two rows
   * share a normalised key), and ID = OD − 2·wall − 2·lining. */
  for (int i = 0; i < rg_pipe_count (); i++)
    {
      const RgPipe *p = rg_pipe_at (i);
      if (pipe (p->designation) != p)
        g_error ("%s finds %s", p->designation, pipe (p->designation)->designation);
      assert_rel (p->inner_diameter_m, p->outside_diameter_m - 2.0 * p->wall_m - 2.0 * p->lining_m, 1e-14);
      g_assert_cmpfloat (p->inner_diameter_m, >, 0.0);
      g_assert_true (strlen (p->source) > 20);
      const RgMaterial *m;
      g_assert_cmpint (rg_material_lookup (p->material_id, &m, NULL), ==, RG_OK);
    }
}

static void
test_pipes_coverage (void)
{
  /* The ranges the issue asks for. */
  static const char *const present[] = {
    "NPS 1/8 Sch 40", "NPS 24 Sch 160", "NPS 24 STD", "NPS 12 XXS",
    "NPS 1/2 Sch 5", "NPS 24 Sch 5S", "NPS 12 Sch 80S", "1/4 Type K",
    "4 Type M", "DN 20 SDR 11", "DN 630 SDR 26", "1/2 PVC Sch 40",
    "12 PVC Sch 80",
  };
  for (size_t i = 0; i < G_N_ELEMENTS (present); i++)
    pipe (present[i]);
  /* From memory of ISO 4427-2 / ISO 4065: the 2.0 mm minimum wall sets
   * dn 20 SDR 11 (20/11 = 1.8 mm); not checked against the document */
  assert_rel (pipe ("DN 20 SDR 11")->wall_m, 0.0020, 1e-12);
}

static void
test_pipes_unknown (void)
{
  const RgPipe *p = NULL;
  RgError err = { 0 };

  g_assert_cmpint (rg_pipe_lookup ("NPS 2 Sch 41", &p, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_nonnull (strstr (err.text, "NPS 2 Sch 40"));
  g_assert_nonnull (strstr (err.text, "closest"));
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_PIPE));
  /* From memory of ASME B36.10M, Table 1: no Sch 40 for NPS 22, no XXS for
   * NPS 3-1/2; not checked against the document */
  g_assert_cmpint (rg_pipe_lookup ("NPS 22 Sch 40", &p, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_nonnull (strstr (err.text, "NPS 22"));
  g_assert_cmpint (rg_pipe_lookup ("NPS 3-1/2 XXS", &p, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_cmpint (rg_pipe_lookup ("DN 111 SDR 11", &p, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_nonnull (strstr (err.text, "DN 110 SDR 11"));
  g_assert_cmpint (rg_pipe_lookup ("3/4 Type Q", &p, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_nonnull (strstr (err.text, "3/4 Type"));
  g_assert_cmpint (rg_pipe_lookup ("", &p, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_cmpint (rg_pipe_lookup (NULL, &p, &err), ==, RG_ERR_NOT_FOUND);
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_PIPE));
  /* broken bytes are no part of a designation: refused as text */
  g_assert_cmpint (rg_pipe_lookup ("\xff\xfe NPS 2 Sch 40 and a lot of extra words after it", &p, &err),
                   ==, RG_ERR_PARSE);
  g_assert_cmpint ((int) strlen (err.text), <, RG_ERROR_TEXT_MAX);
}

/* An error sentence must print on one line as valid UTF-8. */
static void
assert_one_line (const RgError *err)
{
  g_assert_cmpuint (strlen (err->text), >, 0);
  g_assert_true (g_utf8_validate (err->text, -1, NULL));
  for (const char *p = err->text; *p != '\0'; p++)
    g_assert_cmpint ((unsigned char) *p, >=, 0x20);
}

/* The lookups quote the name they did not find: the quote must keep the
 * sentence on one line and in valid UTF-8 (invariants of
 * tests/fuzz/fuzz-pipe-designation.c; the same bytes as its seed corpus). */
static void
test_unknown_one_line (void)
{
  const RgPipe *p = NULL;
  const RgMaterial *m = NULL;
  const RgFitting *f = NULL;
  const RgAgingClass *a = NULL;
  RgError err = { 0 };
  /* 39 ASCII bytes, then "é": "%.40s" cuts the two-byte sequence */
  const char *cut = "NPS 2 Sch 41 and some more words of tex\xc3\xa9";

  g_assert_cmpint (rg_pipe_lookup ("\xff\xfe NPS 2 Sch 41", &p, &err), ==,
                   RG_ERR_PARSE);
  assert_one_line (&err);
  g_assert_cmpint (rg_pipe_lookup ("DN 110 SDR 11\nrm", &p, &err), ==,
                   RG_ERR_PARSE);
  assert_one_line (&err);
  g_assert_cmpint (rg_pipe_lookup (cut, &p, &err), ==, RG_ERR_PARSE);
  assert_one_line (&err);
  g_assert_cmpint (rg_material_lookup ("steel\t\x80", &m, &err), ==,
                   RG_ERR_NOT_FOUND);
  assert_one_line (&err);
  g_assert_cmpint (rg_fitting_lookup (cut, &f, &err), ==, RG_ERR_NOT_FOUND);
  assert_one_line (&err);
  g_assert_cmpint (rg_aging_class_lookup ("\x1b[31mmoderate", &a, &err), ==,
                   RG_ERR_NOT_FOUND);
  assert_one_line (&err);
}

/* The whole designation must be understood: words left over and stray
 * punctuation are refused with a sentence that quotes them; nothing is
 * dropped silently.  The expected texts are this program's own sentences
 * (the contract of docs/bad-input.md), not measurements. */
static void
assert_refused (const char *text, RgStatus status, const char *part)
{
  const RgPipe *p = NULL;
  RgError err;

  if (rg_pipe_lookup (text, &p, &err) != status)
    g_error ("\"%s\": expected status %d, got \"%s\"", text, status, err.text);
  g_assert_null (p);
  assert_one_line (&err);
  /* the parser's own refusals name the pipe as their subject */
  if (status == RG_ERR_PARSE)
    g_assert_true (err.subjects == RG_SUBJECT_BIT (RG_SUBJECT_PIPE));
  if (strstr (err.text, part) == NULL)
    g_error ("\"%s\": the sentence \"%s\" does not show \"%s\"", text, err.text, part);
}

static void
test_pipes_whole_text (void)
{
  g_autoptr (GString) many = g_string_new (NULL);

  /* Tokens past the eighth were once dropped: NPS 4 Sch 40 is named, the
   * rest quoted. */
  assert_refused ("NPS 4 Sch 40 mm mm mm mm Sch 160", RG_ERR_PARSE,
                  "is understood, as NPS 4 Sch 40; the rest, \"mm mm mm mm Sch 160\", is not.");
  assert_refused ("NPS 4 Sch 40 Sch 160", RG_ERR_PARSE, "the rest, \"Sch 160\", is not");
  assert_refused ("1/2 PVC Sch 40 extra", RG_ERR_PARSE, "as 1/2 PVC Sch 40; the rest, \"extra\"");
  assert_refused ("DN 110 SDR 11 SDR 17", RG_ERR_PARSE, "as DN 110 SDR 11; the rest, \"SDR 17\"");
  /* Stray punctuation and letters of other scripts, quoted. */
  assert_refused ("NPS 4 Sch 40!!", RG_ERR_PARSE, "holds \"!!\", which is no part of a designation.");
  assert_refused ("DN 110 (SDR 11)", RG_ERR_PARSE, "holds \"(\"");
  assert_refused ("NPS 2, Sch 40", RG_ERR_PARSE, "holds \",\"");
  assert_refused ("NPS 2 / Sch 40", RG_ERR_PARSE, "holds \"/\"");
  assert_refused ("NPS 2 Sch 40 ;", RG_ERR_PARSE, "holds \";\"");
  assert_refused ("NPS 2 \xe6\xb0\xb4 Sch 40", RG_ERR_PARSE, "holds \"\xe6\xb0\xb4\"");
  /* a control character is shown as '?' in the sentence */
  assert_refused ("NPS 2 Sch 40\x1b[2J", RG_ERR_PARSE, "holds \"?[\"");
  /* More words than any designation has: the start is still named. */
  g_string_append (many, "NPS 2 Sch 40");
  for (int i = 0; i < 40; i++)
    g_string_append (many, " x");
  assert_refused (many->str, RG_ERR_PARSE, "as NPS 2 Sch 40; the rest, \"x x x");
  /* Nothing understood at all: the closest designations, as before. */
  assert_refused ("NPS 2 Sch 41", RG_ERR_NOT_FOUND, "the closest are NPS 2 Sch 40");

  /* Every designation of the catalog with a word after it. */
  for (int i = 0; i < rg_pipe_count (); i++)
    {
      const RgPipe *p = rg_pipe_at (i);
      g_autofree char *text = g_strdup_printf ("%s extra", p->designation);
      g_autofree char *named = g_strdup_printf ("as %s; the rest, \"extra\", is not.", p->designation);

      assert_refused (text, RG_ERR_PARSE, named);
    }

  /* What stays understood: filler words, inch marks, quotes, dashes, an
   * abbreviation point, no-break spaces — and fillers take no room. */
  g_string_truncate (many, 0);
  for (int i = 0; i < 40; i++)
    g_string_append (many, "mm ");
  g_string_append (many, "NPS 2 Sch 40 pipe");
  g_assert_true (pipe (many->str) == pipe ("NPS 2 Sch 40"));
  g_assert_true (pipe ("2\xe2\x80\xb3 sch 40") == pipe ("NPS 2 Sch 40"));
  g_assert_true (pipe ("\xe2\x80\x9c" "2\xe2\x80\x9d sch 40") == pipe ("NPS 2 Sch 40"));
  g_assert_true (pipe ("2'' sch 40") == pipe ("NPS 2 Sch 40"));
  g_assert_true (pipe ("NPS\xc2\xa0" "2\xc2\xa0Sch\xc2\xa0" "40") == pipe ("NPS 2 Sch 40"));
  g_assert_true (pipe ("NPS 1\xe2\x80\x90" "1/4 Sch 80") == pipe ("NPS 1-1/4 Sch 80"));
  g_assert_true (pipe ("NPS 1\xe2\x80\x93" "1/4 Sch 80") == pipe ("NPS 1-1/4 Sch 80"));
  g_assert_true (pipe ("nps 2 sch. 40") == pipe ("NPS 2 Sch 40"));
}

int
main (int argc, char **argv)
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/catalog/materials/table", test_materials_table);
  g_test_add_func ("/catalog/materials/lookup", test_materials_lookup);
  g_test_add_func ("/catalog/edit-distance", test_edit_distance);
  g_test_add_func ("/catalog/pipes/spellings", test_pipes_spellings);
  g_test_add_func ("/catalog/pipes/every-designation", test_pipes_every_designation);
  g_test_add_func ("/catalog/pipes/coverage", test_pipes_coverage);
  g_test_add_func ("/catalog/pipes/unknown", test_pipes_unknown);
  g_test_add_func ("/catalog/unknown/one-line", test_unknown_one_line);
  g_test_add_func ("/catalog/pipes/whole-text", test_pipes_whole_text);
  return g_test_run ();
}
