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
 * with the three closest designations by edit distance.
 *
 * The whole text must be understood: besides letters and digits it may
 * hold only spaces, inch marks and quotes (" ' ″ “ ”), dashes (- ‐ ‑ –), an
 * abbreviation point after a word ("Sch.40") and the decimal point or
 * fraction bar of a number.  Any other character is refused, quoted; so
 * are words left over after a designation ("NPS 4 Sch 40 Sch 160": the
 * longest start of the tokens that is a designation is named, and the
 * rest quoted) — nothing is dropped silently. */
#include "catalog.h"

#include "catalog-data.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>

/* TOK_MAX: far more words than any designation has, so that a long text
 * is read whole and what is left over can be named. */
enum { TOK_MAX = 32, TOK_LEN = 16, KEY_LEN = TOK_MAX * TOK_LEN };

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
  /* where each token stands in the text: bytes [start, end) */
  size_t start[TOK_MAX], end[TOK_MAX];
  /* more tokens than TOK_MAX: where the first one not kept starts */
  int overflow;
  size_t overflow_at;
  /* the first run of characters that belong to no designation */
  int stray;
  size_t stray_at, stray_len;
} Tokens;

static void
push (Tokens *tk, const char *s, size_t len, size_t start, size_t end)
{
  if (len == 0)
    return;
  if (tk->n >= TOK_MAX)
    {
      if (!tk->overflow)
        {
          tk->overflow = 1;
          tk->overflow_at = start;
        }
      return;
    }
  if (len > TOK_LEN - 1)
    len = TOK_LEN - 1;
  memcpy (tk->t[tk->n], s, len);
  tk->t[tk->n][len] = '\0';
  tk->start[tk->n] = start;
  tk->end[tk->n] = end;
  tk->n++;
}

static void
drop (Tokens *tk, int i)
{
  for (int k = i; k + 1 < tk->n; k++)
    {
      memcpy (tk->t[k], tk->t[k + 1], TOK_LEN);
      tk->start[k] = tk->start[k + 1];
      tk->end[k] = tk->end[k + 1];
    }
  tk->n--;
}

/* Token i becomes the text `w` and reaches to the end of token i + 1,
 * which goes. */
static void
merge_next (Tokens *tk, int i, const char *w)
{
  memcpy (tk->t[i], w, TOK_LEN);
  tk->end[i] = tk->end[i + 1];
  drop (tk, i + 1);
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

/* The bytes of a character that may stand between the words of a
 * designation (spaces, inch marks, quotes, dashes), or 0. */
static size_t
separator_len (const char *s)
{
  static const char *const wide[] = {
    "\xc2\xa0",     /* U+00A0 no-break space */
    "\xe2\x80\x90", /* U+2010 hyphen */
    "\xe2\x80\x91", /* U+2011 non-breaking hyphen */
    "\xe2\x80\x93", /* U+2013 en dash */
    "\xe2\x80\x9c", /* U+201C left double quotation mark */
    "\xe2\x80\x9d", /* U+201D right double quotation mark */
    "\xe2\x80\xb3", /* U+2033 double prime, the inch mark */
  };
  const unsigned char c = (unsigned char) *s;

  if (c == ' ' || c == '\t' || c == '"' || c == '\'' || c == '-')
    return 1;
  for (size_t i = 0; i < sizeof wide / sizeof wide[0]; i++)
    if (strncmp (s, wide[i], strlen (wide[i])) == 0)
      return strlen (wide[i]);
  return 0;
}

/* The bytes of one character at s (a broken byte counts alone). */
static size_t
char_len (const char *s)
{
  const unsigned char c = (unsigned char) *s;
  size_t n = c >= 0xF0 ? 4 : c >= 0xE0 ? 3 : c >= 0xC0 ? 2 : 1;

  for (size_t i = 1; i < n; i++)
    if (((unsigned char) s[i] & 0xC0) != 0x80)
      return 1;
  return n;
}

/* Note the run of characters at s that belong to no designation (up to
 * the next letter, digit or separator, at most 12 bytes of whole
 * characters); returns its length. */
static size_t
note_stray (Tokens *tk, const char *begin, const char *s)
{
  size_t len = 0;

  while (s[len] != '\0' && !is_alpha ((unsigned char) s[len])
         && !is_digit ((unsigned char) s[len]) && separator_len (s + len) == 0)
    {
      size_t n = char_len (s + len);
      if (!tk->stray && len + n > 12)
        break;
      len += n;
    }
  if (len == 0)
    len = char_len (s);
  if (!tk->stray)
    {
      tk->stray = 1;
      tk->stray_at = (size_t) (s - begin);
      tk->stray_len = len;
    }
  return len;
}

static void
tokenize (const char *s, Tokens *tk)
{
  const char *begin = s;

  memset (tk, 0, sizeof *tk);
  while (*s)
    {
      const unsigned char c = (unsigned char) *s;
      size_t sep;

      /* A point glued to a word is an abbreviation point ("Sch.40"). */
      if (c == '.' && s > begin && is_alpha ((unsigned char) s[-1]))
        {
          s++;
          continue;
        }
      /* A number starts with a digit, or with a decimal point followed by
       * a digit; a bar or a point elsewhere is no part of a designation. */
      if (c == '/' || (c == '.' && !is_digit ((unsigned char) s[1])))
        {
          s += note_stray (tk, begin, s);
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
              s++;
              push (tk, w, l + 1, (size_t) (start - begin), (size_t) (s - begin));
            }
          else
            push (tk, start, len, (size_t) (start - begin), (size_t) (s - begin));
        }
      else if (is_alpha (c))
        {
          const char *start = s;
          char w[TOK_LEN];
          size_t l = 0;
          while (is_alpha ((unsigned char) *s))
            {
              if (l < TOK_LEN - 1)
                w[l++] = (char) to_lower ((unsigned char) *s);
              s++;
            }
          /* Filler words carry nothing: they are understood, and they
           * take no room among the tokens. */
          w[l] = '\0';
          if (!is_filler (w))
            push (tk, w, l, (size_t) (start - begin), (size_t) (s - begin));
        }
      else if ((sep = separator_len (s)) > 0)
        s += sep;
      else
        s += note_stray (tk, begin, s);
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
    decimal_to_fraction (tk->t[i]);
  for (int i = 0; i + 1 < tk->n; i++)
    {
      char w[TOK_LEN];

      if (strcmp (tk->t[i], "sdr") == 0 && is_integer (tk->t[i + 1]))
        {
          (void) snprintf (w, sizeof w, "sdr%.10s", tk->t[i + 1]);
          merge_next (tk, i, w);
        }
      else if (is_integer (tk->t[i]) && strcmp (tk->t[i + 1], "s") == 0)
        {
          /* "10 S" written apart: the stainless schedule 10S. */
          (void) snprintf (w, sizeof w, "%.10ss", tk->t[i]);
          merge_next (tk, i, w);
        }
      else if (is_integer (tk->t[i]) && is_fraction (tk->t[i + 1]))
        {
          (void) snprintf (w, sizeof w, "%.5s-%.9s", tk->t[i], tk->t[i + 1]);
          merge_next (tk, i, w);
        }
    }
}

/* The key of the first `n` tokens: in written order (size before series),
 * except the material word "pvc", which may stand anywhere and goes
 * last. */
static void
join (const Tokens *tk, int n, char *out)
{
  int pvc = 0;

  out[0] = '\0';
  for (int i = 0; i < n; i++)
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
  join (&tk, tk.n, out);
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

static int exact_match (const char *key);

/* The first pipe whose normalised designation equals `key`, as an index,
 * or -1; then best[] holds the three nearest designations by edit distance
 * between the normalised forms, so a one-digit slip costs one.  The query
 * is normalised by the caller, once (a long query used to be re-read for
 * every entry).  The exact match is looked for first, on its own: a name
 * that is in the catalog costs no edit distance at all. */
static int
match_or_closest (const char *key, int best[3])
{
  char other[KEY_LEN + TOK_MAX];
  int bd[3] = { 1 << 30, 1 << 30, 1 << 30 };
  /* the lengths rg_catalog_edit_distance compares (at most 63 bytes) */
  int la = (int) strlen (key) < 63 ? (int) strlen (key) : 63;
  int found;

  best[0] = best[1] = best[2] = -1;
  if (key[0] != '\0' && (found = exact_match (key)) >= 0)
    return found;
  for (int i = 0; i < rg_catalog_pipes_count; i++)
    {
      int d, lb;

      designation_key (rg_catalog_pipes[i].designation, other);
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

/* The first pipe whose normalised designation is exactly `key`, or -1. */
static int
exact_match (const char *key)
{
  char other[KEY_LEN + TOK_MAX];

  for (int i = 0; i < rg_catalog_pipes_count; i++)
    {
      designation_key (rg_catalog_pipes[i].designation, other);
      if (strcmp (key, other) == 0)
        return i;
    }
  return -1;
}

RgStatus
rg_pipe_lookup (const char *designation, const RgPipe **out, RgError *err)
{
  char key[KEY_LEN + TOK_MAX];
  char near[200];
  int best[3], found;
  Tokens tk;

  if (designation == NULL)
    designation = "";
  /* A designation written as the catalog writes it (as a project file or
   * a batch holds it) is found without parsing: a byte compare with each
   * entry, where parsing would normalise every entry. */
  for (int i = 0; i < rg_catalog_pipes_count; i++)
    if (strcmp (designation, rg_catalog_pipes[i].designation) == 0)
      {
        *out = &rg_catalog_pipes[i];
        return RG_OK;
      }
  tokenize (designation, &tk);
  if (tk.stray)
    return rg_error_set_on (err, RG_ERR_PARSE, RG_SUBJECT_BIT (RG_SUBJECT_PIPE),
                            "The pipe designation \"%.40s\" holds \"%.*s\", which is no part of a designation.",
                            designation, (int) tk.stray_len, designation + tk.stray_at);
  join (&tk, tk.n, key);
  found = tk.overflow ? -1 : match_or_closest (key, best);
  if (found >= 0)
    {
      *out = &rg_catalog_pipes[found];
      return RG_OK;
    }
  /* Words left over after a designation: the longest start of the tokens
   * that is one is named, and the rest of the text quoted from the end of
   * its last token. */
  for (int n = tk.overflow ? tk.n : tk.n - 1; n >= 1; n--)
    {
      int i;
      const char *rest;

      join (&tk, n, key);
      if ((i = exact_match (key)) < 0)
        continue;
      rest = designation + tk.end[n - 1];
      while (*rest != '\0' && separator_len (rest) > 0)
        rest += separator_len (rest);
      return rg_error_set_on (err, RG_ERR_PARSE, RG_SUBJECT_BIT (RG_SUBJECT_PIPE),
                              "Only the start of the pipe designation \"%.40s\" is understood, as %s; the rest, \"%.30s\", is not.",
                              designation, rg_catalog_pipes[i].designation, rest);
    }
  if (tk.overflow)
    {
      join (&tk, tk.n, key);
      match_or_closest (key, best);
    }
  format_closest (best, pipe_designation_at, near, sizeof near);
  return rg_error_set_on (err, RG_ERR_NOT_FOUND,
                          RG_SUBJECT_BIT (RG_SUBJECT_PIPE),
                          "Unknown pipe designation \"%.40s\"; the closest are %s.",
                          designation, near);
}
