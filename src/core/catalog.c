/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The engineering catalogs: materials and pipe sizes.
 *
 * The tables live in the JSON files under data/ and reach us through catalog-data.c,
 * generated at build time by build-aux/gen-catalogs.py; no number is
 * written here.  This file holds the lookups.
 *
 * Pipe designations are matched on a normalised form: the text is folded to
 * lower case and cut into tokens (numbers such as 2, 1/4, 1.25, 10s, and
 * words).  Filler words that carry no information (nps, sch, schedule, in,
 * inch, dn, od, de, mm, type, pe100 …) are dropped; "1 1/4", "1-1/4" and
 * "1.25" become the one token 1-1/4; "sdr" joins the number that follows
 * and a lone "s" the number before it ("10 S" is 10S).
 * The remaining tokens in written order are the key (the size comes before
 * the series; only the word "pvc" may stand anywhere): "NPS 2 Sch 40",
 * "2\" sch40" and "nps2 schedule 40" all give "2 40".  An unknown designation is reported
 * with the three closest designations by edit distance. */
#include "catalog.h"

#include "catalog-data.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>

enum { TOK_MAX = 8, TOK_LEN = 16, KEY_LEN = TOK_MAX * TOK_LEN };

static int
to_lower (int c)
{
  return (c >= 'A' && c <= 'Z') ? c - 'A' + 'a' : c;
}

static int
is_digit (int c)
{
  return c >= '0' && c <= '9';
}

static int
is_alpha (int c)
{
  c = to_lower (c);
  return c >= 'a' && c <= 'z';
}

static int
is_num_char (int c)
{
  return is_digit (c) || c == '.' || c == '/';
}

/* ---- edit distance and closest names ---------------------------------- */

int
rg_catalog_edit_distance (const char *a, const char *b)
{
  enum { N = 64 };
  int prev[N], cur[N];
  size_t la = strlen (a), lb = strlen (b);

  if (la > N - 1)
    la = N - 1;
  if (lb > N - 1)
    lb = N - 1;
  for (size_t j = 0; j <= lb; j++)
    prev[j] = (int) j;
  for (size_t i = 1; i <= la; i++)
    {
      cur[0] = (int) i;
      for (size_t j = 1; j <= lb; j++)
        {
          /* a and b are strings of at least la and lb bytes; clang-analyzer
           * does not tie strlen to the bytes a caller wrote. */
          /* NOLINTBEGIN(clang-analyzer-core.CallAndMessage) */
          int cost = to_lower ((unsigned char) a[i - 1])
                     != to_lower ((unsigned char) b[j - 1]);
          /* NOLINTEND(clang-analyzer-core.CallAndMessage) */
          int best = prev[j - 1] + cost;
          if (prev[j] + 1 < best)
            best = prev[j] + 1;
          if (cur[j - 1] + 1 < best)
            best = cur[j - 1] + 1;
          cur[j] = best;
        }
      memcpy (prev, cur, (lb + 1) * sizeof prev[0]);
    }
  return prev[lb];
}

/* The three best of `count` candidates under a distance function. */
static void
closest3 (const char *query, int count, const char *(*name_at) (int),
          int (*dist) (const char *, const char *), int best[3])
{
  int bd[3] = { 1 << 30, 1 << 30, 1 << 30 };

  best[0] = best[1] = best[2] = -1;
  for (int i = 0; i < count; i++)
    {
      int d = dist (query, name_at (i));
      for (int k = 0; k < 3; k++)
        if (d < bd[k])
          {
            for (int m = 2; m > k; m--)
              {
                bd[m] = bd[m - 1];
                best[m] = best[m - 1];
              }
            bd[k] = d;
            best[k] = i;
            break;
          }
    }
}

static void
format_closest (const int best[3], const char *(*name_at) (int), char *buf,
                size_t len)
{
  int n = 0;

  buf[0] = '\0';
  for (int k = 0; k < 3; k++)
    if (best[k] >= 0)
      n++;
  for (int k = 0; k < n; k++)
    {
      size_t used = strlen (buf);
      /* TRANSLATORS: joins the last two names of a suggestion list,
       * as in "glass, pvc or pe"; keep the spaces. */
      const char *sep = k == 0 ? "" : (k == n - 1 ? rg_gettext (" or ") : ", ");
      (void) snprintf (buf + used, len - used, "%s%s", sep, name_at (best[k]));
    }
}

/* Case-folded substring test. */
static int
contains_fold (const char *hay, const char *needle)
{
  if (*needle == '\0')
    return 0;
  for (; *hay; hay++)
    {
      const char *h = hay, *n = needle;
      while (*h && *n && to_lower ((unsigned char) *h) == to_lower ((unsigned char) *n))
        h++, n++;
      if (*n == '\0')
        return 1;
    }
  return 0;
}

/* Names that contain the query ("steel" in "commercial-steel") come first;
 * the rest by edit distance. */
static int
name_distance (const char *query, const char *name)
{
  return contains_fold (name, query) ? 0 : 1 + rg_catalog_edit_distance (query, name);
}

void
rg_catalog_closest (const char *query, const char *(*name_at) (int),
                    int count, char *buf, size_t len)
{
  int best[3];

  if (len == 0)
    return;
  closest3 (query, count, name_at, name_distance, best);
  format_closest (best, name_at, buf, len);
}

/* ---- materials ---------------------------------------------------------- */

int
rg_material_count (void)
{
  return rg_catalog_materials_count;
}

const RgMaterial *
rg_material_at (int index)
{
  if (index < 0 || index >= rg_catalog_materials_count)
    return NULL;
  return &rg_catalog_materials[index];
}

static int
equal_fold (const char *a, const char *b)
{
  for (; *a && *b; a++, b++)
    if (to_lower ((unsigned char) *a) != to_lower ((unsigned char) *b))
      return 0;
  return *a == *b;
}

static const char *
material_id_at (int i)
{
  return rg_catalog_materials[i].id;
}

RgStatus
rg_material_lookup (const char *name, const RgMaterial **out, RgError *err)
{
  char near[160];

  if (name == NULL)
    name = "";
  for (int i = 0; i < rg_catalog_materials_count; i++)
    if (equal_fold (name, rg_catalog_materials[i].id)
        || equal_fold (name, rg_catalog_materials[i].name))
      {
        *out = &rg_catalog_materials[i];
        return RG_OK;
      }
  rg_catalog_closest (name, material_id_at, rg_catalog_materials_count, near,
                      sizeof near);
  return rg_error_set_on (err, RG_ERR_NOT_FOUND,
                          RG_SUBJECT_BIT (RG_SUBJECT_MATERIAL),
                          "Unknown pipe material \"%.40s\"; the closest are %s.",
                          name, near);
}

/* ---- pipe designations ------------------------------------------------- */

typedef struct {
  int n;
  char t[TOK_MAX][TOK_LEN];
} Tokens;

static void
push (Tokens *tk, const char *s, size_t len)
{
  if (tk->n >= TOK_MAX || len == 0)
    return;
  if (len > TOK_LEN - 1)
    len = TOK_LEN - 1;
  memcpy (tk->t[tk->n], s, len);
  tk->t[tk->n][len] = '\0';
  tk->n++;
}

static void
drop (Tokens *tk, int i)
{
  for (int k = i; k + 1 < tk->n; k++)
    memcpy (tk->t[k], tk->t[k + 1], TOK_LEN);
  tk->n--;
}

static int
is_filler (const char *w)
{
  static const char *const filler[] = {
    "nps", "sch", "schedule", "in", "inch", "inches", "dn", "od", "de", "mm",
    "type", "pipe", "tube", "copper", "cu", "nominal", "size",
  };
  for (size_t i = 0; i < sizeof filler / sizeof filler[0]; i++)
    if (strcmp (w, filler[i]) == 0)
      return 1;
  return 0;
}

static int
is_integer (const char *w)
{
  if (*w == '\0')
    return 0;
  for (; *w; w++)
    if (!is_digit (*w))
      return 0;
  return 1;
}

static int
is_fraction (const char *w)
{
  const char *slash = strchr (w, '/');
  if (slash == NULL || slash == w || slash[1] == '\0')
    return 0;
  for (const char *p = w; *p; p++)
    if (!is_digit (*p) && p != slash)
      return 0;
  return 1;
}

/* "1.25" -> "1-1/4", "0.5" -> "1/2": decimals that are whole eighths. */
static void
decimal_to_fraction (char *w)
{
  const char *dot = strchr (w, '.');
  long whole = 0, num = 0, den = 1;

  if (dot == NULL)
    return;
  for (const char *p = w; p < dot; p++)
    {
      if (!is_digit (*p))
        return;
      whole = whole * 10 + (*p - '0');
      if (whole > 100000)
        return;
    }
  for (const char *p = dot + 1; *p; p++)
    {
      if (!is_digit (*p) || den > 100000)
        return;
      num = num * 10 + (*p - '0');
      den *= 10;
    }
  char tmp[64];
  if (num == 0)
    (void) snprintf (tmp, sizeof tmp, "%ld", whole);
  else if ((num * 8) % den != 0)
    return;
  else
    {
      long eighths = num * 8 / den, d = 8;
      while (eighths % 2 == 0)
        {
          eighths /= 2;
          d /= 2;
        }
      if (whole > 0)
        (void) snprintf (tmp, sizeof tmp, "%ld-%ld/%ld", whole, eighths, d);
      else
        (void) snprintf (tmp, sizeof tmp, "%ld/%ld", eighths, d);
    }
  /* whole ≤ 100000 (checked above): the result fits a token. */
  (void) snprintf (w, TOK_LEN, "%.15s", tmp);
}

static void
tokenize (const char *s, Tokens *tk)
{
  const char *begin = s;

  tk->n = 0;
  while (*s)
    {
      const unsigned char c = (unsigned char) *s;
      /* A number starts with a digit, or with a decimal point followed by a
       * digit and not glued to a word ("Sch.40" is an abbreviation point). */
      if ((c == '/' || c == '.')
          && (c == '/' || !is_digit ((unsigned char) s[1])
              || (s > begin && is_alpha ((unsigned char) s[-1]))))
        {
          s++;
          continue;
        }
      if (is_num_char (c))
        {
          const char *start = s;
          while (is_num_char ((unsigned char) *s))
            s++;
          size_t len = (size_t) (s - start);
          /* "10S", "40s": the stainless schedules keep their S. */
          if (to_lower ((unsigned char) *s) == 's' && !is_alpha ((unsigned char) s[1]))
            {
              char w[TOK_LEN];
              size_t l = len < TOK_LEN - 2 ? len : TOK_LEN - 2;
              memcpy (w, start, l);
              w[l] = 's';
              push (tk, w, l + 1);
              s++;
            }
          else
            push (tk, start, len);
        }
      else if (is_alpha (c))
        {
          char w[TOK_LEN];
          size_t l = 0;
          while (is_alpha ((unsigned char) *s))
            {
              if (l < TOK_LEN - 1)
                w[l++] = (char) to_lower ((unsigned char) *s);
              s++;
            }
          push (tk, w, l);
        }
      else
        s++; /* spaces, quotes, inch marks, dashes, any non-ASCII byte */
    }

  /* "pe 100", "pe 80": the material grade, not a size. */
  for (int i = 0; i < tk->n; i++)
    if (strcmp (tk->t[i], "pe") == 0)
      {
        if (i + 1 < tk->n && (strcmp (tk->t[i + 1], "100") == 0
                              || strcmp (tk->t[i + 1], "80") == 0))
          drop (tk, i + 1);
        drop (tk, i);
        i--;
      }
  for (int i = 0; i < tk->n; i++)
    if (is_filler (tk->t[i]))
      drop (tk, i--);
  for (int i = 0; i < tk->n; i++)
    decimal_to_fraction (tk->t[i]);
  for (int i = 0; i + 1 < tk->n; i++)
    {
      if (strcmp (tk->t[i], "sdr") == 0 && is_integer (tk->t[i + 1]))
        {
          char w[TOK_LEN];
          (void) snprintf (w, sizeof w, "sdr%.10s", tk->t[i + 1]);
          memcpy (tk->t[i], w, TOK_LEN);
          drop (tk, i + 1);
        }
      else if (is_integer (tk->t[i]) && strcmp (tk->t[i + 1], "s") == 0)
        {
          /* "10 S" written apart: the stainless schedule 10S. */
          char w[TOK_LEN];
          (void) snprintf (w, sizeof w, "%.10ss", tk->t[i]);
          memcpy (tk->t[i], w, TOK_LEN);
          drop (tk, i + 1);
        }
      else if (is_integer (tk->t[i]) && is_fraction (tk->t[i + 1]))
        {
          char w[TOK_LEN];
          (void) snprintf (w, sizeof w, "%.5s-%.9s", tk->t[i], tk->t[i + 1]);
          memcpy (tk->t[i], w, TOK_LEN);
          drop (tk, i + 1);
        }
    }
}

/* The key: tokens in written order (size before series), except the
 * material word "pvc", which may stand anywhere and goes last. */
static void
join (const Tokens *tk, char *out)
{
  int pvc = 0;

  out[0] = '\0';
  for (int i = 0; i < tk->n; i++)
    {
      if (strcmp (tk->t[i], "pvc") == 0)
        {
          pvc = 1;
          continue;
        }
      if (out[0] != '\0')
        strcat (out, " ");
      strcat (out, tk->t[i]);
    }
  if (pvc)
    strcat (out, out[0] != '\0' ? " pvc" : "pvc");
}

static void
designation_key (const char *s, char *out)
{
  Tokens tk;
  tokenize (s, &tk);
  join (&tk, out);
}

int
rg_pipe_count (void)
{
  return rg_catalog_pipes_count;
}

const RgPipe *
rg_pipe_at (int index)
{
  if (index < 0 || index >= rg_catalog_pipes_count)
    return NULL;
  return &rg_catalog_pipes[index];
}

static const char *
pipe_designation_at (int i)
{
  return rg_catalog_pipes[i].designation;
}

/* The first pipe whose normalised designation equals `key`, as an index,
 * or -1; then best[] holds the three nearest designations by edit distance
 * between the normalised forms, so a one-digit slip costs one.  One pass
 * that normalises each catalog designation once: the query is normalised
 * by the caller, once (a long query used to be re-read for every entry). */
static int
match_or_closest (const char *key, int best[3])
{
  char other[KEY_LEN + TOK_MAX];
  int bd[3] = { 1 << 30, 1 << 30, 1 << 30 };
  /* the lengths rg_catalog_edit_distance compares (at most 63 bytes) */
  int la = (int) strlen (key) < 63 ? (int) strlen (key) : 63;

  best[0] = best[1] = best[2] = -1;
  for (int i = 0; i < rg_catalog_pipes_count; i++)
    {
      int d, lb;

      designation_key (rg_catalog_pipes[i].designation, other);
      if (key[0] != '\0' && strcmp (key, other) == 0)
        return i;
      /* The difference of the lengths is a lower bound of the edit
       * distance: when it already reaches the third best, this entry
       * cannot enter the three (ties keep the earlier entry). */
      lb = (int) strlen (other) < 63 ? (int) strlen (other) : 63;
      if (abs (la - lb) >= bd[2])
        continue;
      d = rg_catalog_edit_distance (key, other);
      for (int k = 0; k < 3; k++)
        if (d < bd[k])
          {
            for (int m = 2; m > k; m--)
              {
                bd[m] = bd[m - 1];
                best[m] = best[m - 1];
              }
            bd[k] = d;
            best[k] = i;
            break;
          }
    }
  return -1;
}

RgStatus
rg_pipe_lookup (const char *designation, const RgPipe **out, RgError *err)
{
  char key[KEY_LEN + TOK_MAX];
  char near[200];
  int best[3], found;

  if (designation == NULL)
    designation = "";
  designation_key (designation, key);
  found = match_or_closest (key, best);
  if (found >= 0)
    {
      *out = &rg_catalog_pipes[found];
      return RG_OK;
    }
  format_closest (best, pipe_designation_at, near, sizeof near);
  return rg_error_set_on (err, RG_ERR_NOT_FOUND,
                          RG_SUBJECT_BIT (RG_SUBJECT_PIPE),
                          "Unknown pipe designation \"%.40s\"; the closest are %s.",
                          designation, near);
}
