/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Pipe catalogs and the search of pipes: which catalogs fit a material,
 * which a name chooses, the order of pipes in lists and the search by any
 * part of a designation.
 *
 * A pipe catalog is one series of one standard (the generator makes one of
 * each series of data/pipes-*.json, with the materials its pipe is made of
 * and whether it is offered by default).  The designation parser
 * (rg_pipe_lookup, catalog.c) is not used here: a search matches text, a
 * lookup names one pipe.
 *
 * Cost: a search normalises each designation once and sorts what it finds,
 * O(n log n) for n catalog pipes (a few hundred). */
#include "catalog.h"

#include "catalog-data.h"
#include "message-private.h"

#include <stdio.h>
#include <stdlib.h>
#include <string.h>

enum { NORM_MAX = 96 };

static int
fold (int c)
{
  return (c >= 'A' && c <= 'Z') ? c - 'A' + 'a' : c;
}

/* Case folded, without the characters people write or leave out at will
 * between the parts of a designation: spaces, '-', inch marks, '.'-less
 * punctuation stays (1/4, 1.25). */
static void
normalise (const char *s, char *out, size_t len)
{
  size_t n = 0;

  for (; *s != '\0' && n + 1 < len; s++)
    {
      const unsigned char c = (unsigned char) *s;

      if (c == ' ' || c == '\t' || c == '-' || c == '"' || c == '\'')
        continue;
      out[n++] = (char) fold (c);
    }
  out[n] = '\0';
}

int
rg_pipe_catalog_count (void)
{
  return rg_catalog_pipe_catalogs_count;
}

const RgPipeCatalog *
rg_pipe_catalog_at (int index)
{
  if (index < 0 || index >= rg_catalog_pipe_catalogs_count)
    return NULL;
  return &rg_catalog_pipe_catalogs[index];
}

int
rg_pipe_catalog_fits (const RgPipeCatalog *catalog, const char *material_id)
{
  if (catalog == NULL || material_id == NULL)
    return 0;
  for (const char *const *m = catalog->material_ids; *m != NULL; m++)
    if (strcmp (*m, material_id) == 0)
      return 1;
  return 0;
}

/* Catalogs that fit the material (any, when none is given). */
static int
fits_or_any (const RgPipeCatalog *c, const char *material_id)
{
  return material_id == NULL || rg_pipe_catalog_fits (c, material_id);
}

static const char *
catalog_name_at (int i)
{
  return rg_catalog_pipe_catalogs[i].name;
}

RgStatus
rg_pipe_catalog_choose (const char *name, const char *material_id,
                        unsigned char *chosen, int *n_chosen, RgError *err)
{
  char want[NORM_MAX], have[NORM_MAX];
  int n = 0, any_fits = 0;

  normalise (name != NULL ? name : "", want, sizeof want);
  for (int i = 0; i < rg_catalog_pipe_catalogs_count; i++)
    {
      const RgPipeCatalog *c = &rg_catalog_pipe_catalogs[i];
      int take = 0;

      chosen[i] = 0;
      if (!fits_or_any (c, material_id))
        continue;
      any_fits = 1;
      if (want[0] == '\0')
        take = c->usual;
      else if (strcmp (want, "all") == 0)
        take = 1;
      else
        {
          normalise (c->name, have, sizeof have);
          take = strcmp (want, have) == 0;
          normalise (c->standard, have, sizeof have);
          take = take || strcmp (want, have) == 0;
        }
      chosen[i] = (unsigned char) take;
      n += take;
    }
  /* A material whose catalogs mark no usual series: all of them. */
  if (n == 0 && want[0] == '\0' && any_fits)
    for (int i = 0; i < rg_catalog_pipe_catalogs_count; i++)
      if (fits_or_any (&rg_catalog_pipe_catalogs[i], material_id))
        {
          chosen[i] = 1;
          n++;
        }
  *n_chosen = n;
  if (n > 0)
    return RG_OK;
  if (!any_fits)
    return rg_error_set_on (err, RG_ERR_NOT_FOUND, RG_ON (MATERIAL),
                            "No pipe catalog holds pipe of the material \"%.40s\".",
                            material_id != NULL ? material_id : "");
  {
    /* the three closest names among the catalogs that fit: names holding
     * the text first, then by edit distance */
    int best[3] = { -1, -1, -1 }, bd[3] = { 1 << 30, 1 << 30, 1 << 30 };
    char near[200];

    for (int i = 0; i < rg_catalog_pipe_catalogs_count; i++)
      {
        const char *cn = catalog_name_at (i);
        int d;

        if (!fits_or_any (&rg_catalog_pipe_catalogs[i], material_id))
          continue;
        normalise (cn, have, sizeof have);
        d = strstr (have, want) != NULL ? 0 : 1 + rg_catalog_edit_distance (name, cn);
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
    near[0] = '\0';
    for (int k = 0, shown = 0; k < 3; k++)
      {
        size_t used = strlen (near);
        int last = k == 2 || best[k + 1] < 0;

        if (best[k] < 0)
          break;
        /* TRANSLATORS: joins the last two names of a suggestion list,
         * as in "glass, pvc or pe"; keep the spaces. */
        (void) snprintf (near + used, sizeof near - used, "%s%s",
                         shown == 0 ? "" : (last ? rg_gettext (" or ") : ", "),
                         catalog_name_at (best[k]));
        shown++;
      }
    return rg_error_set_on (err, RG_ERR_NOT_FOUND, RG_ON (PIPE),
                            "Unknown pipe catalog \"%.40s\"; the closest are %s.",
                            name, near);
  }
}

int
rg_pipe_compare (const RgPipe *a, const RgPipe *b)
{
  if (a->outside_diameter_m != b->outside_diameter_m)
    return a->outside_diameter_m < b->outside_diameter_m ? -1 : 1;
  if (a->wall_m != b->wall_m)
    return a->wall_m < b->wall_m ? -1 : 1;
  if (a->catalog != b->catalog)
    return a->catalog < b->catalog ? -1 : 1;
  return a < b ? -1 : (a > b);
}

/* A text cut into folded words at spaces, '-' and inch marks. */
typedef struct {
  int n;
  char w[16][24];
} Words;

static int
is_separator (int c)
{
  return c == ' ' || c == '\t' || c == '-' || c == '"' || c == '\'';
}

static void
split_words (const char *s, Words *out)
{
  out->n = 0;
  while (*s != '\0')
    {
      size_t n = 0;

      while (*s != '\0' && is_separator ((unsigned char) *s))
        s++;
      if (*s == '\0' || out->n == 16)
        break;
      while (*s != '\0' && !is_separator ((unsigned char) *s))
        {
          if (n + 1 < sizeof out->w[0])
            out->w[out->n][n++] = (char) fold ((unsigned char) *s);
          s++;
        }
      out->w[out->n][n] = '\0';
      out->n++;
    }
}

/* Whether `q` (folded, no separators) is spelt by words of `t` from a
 * word's start: the start of one word ("sd" of "SDR"), or whole words
 * joined ("sdr11" by "SDR" "11"; "10s" by "10S" but not by "10" "Sch"). */
static int
spelt_from_word_start (const char *q, const Words *t)
{
  const size_t lq = strlen (q);

  for (int i = 0; i < t->n; i++)
    {
      size_t pos = 0;

      for (int k = i; k < t->n && pos < lq; k++)
        {
          const size_t lw = strlen (t->w[k]);
          const size_t rest = lq - pos;

          /* the start of a word only as the query's whole word; a word
           * joined to those before it is whole */
          if (rest <= lw)
            {
              if (strncmp (t->w[k], q + pos, rest) == 0 && (k == i || rest == lw))
                return 1;
              break;
            }
          if (strncmp (t->w[k], q + pos, lw) != 0)
            break;
          pos += lw;
        }
    }
  return 0;
}

/* Each word of the query spelt in one of the texts. */
static int
words_found (const char *query, const char *text1, const char *text2)
{
  Words q, t1, t2;

  split_words (query, &q);
  split_words (text1, &t1);
  split_words (text2, &t2);
  for (int i = 0; i < q.n; i++)
    if (!spelt_from_word_start (q.w[i], &t1) && !spelt_from_word_start (q.w[i], &t2))
      return 0;
  return 1;
}

int
rg_pipe_matches (const RgPipe *pipe, const char *query)
{
  const RgPipeCatalog *c;

  if (pipe == NULL)
    return 0;
  if (query == NULL)
    return 1;
  c = rg_pipe_catalog_at (pipe->catalog);
  return words_found (query, pipe->designation, c != NULL ? c->name : "");
}

static int
compare_index (const void *a, const void *b)
{
  return rg_pipe_compare (&rg_catalog_pipes[*(const int *) a],
                          &rg_catalog_pipes[*(const int *) b]);
}

int
rg_pipe_search (const unsigned char *catalogs, const char *query, int *out,
                int max)
{
  int n = 0;

  for (int c = 0; c < rg_catalog_pipe_catalogs_count; c++)
    {
      const RgPipeCatalog *cat = &rg_catalog_pipe_catalogs[c];

      if (catalogs != NULL && !catalogs[c])
        continue;
      for (int i = cat->first_pipe; i < cat->first_pipe + cat->n_pipes; i++)
        if (rg_pipe_matches (&rg_catalog_pipes[i], query))
          {
            if (n < max)
              out[n] = i;
            n++;
          }
    }
  qsort (out, (size_t) (n < max ? n : max), sizeof out[0], compare_index);
  return n;
}
