/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The engineering catalogs: pipe materials and pipe sizes.
 * One source of truth: the JSON files under data/, compiled into the
 * binaries at build time; this API is the only way to read them. */
#pragma once

#include "status.h"

typedef struct {
  const char *id;          /* stable key, e.g. "commercial-steel" */
  const char *name;        /* for people, e.g. "Commercial steel, new" */
  double roughness_m;      /* typical absolute roughness when new */
  double roughness_min_m;  /* published range */
  double roughness_max_m;
  const char *source;      /* handbook, edition, table — or "From memory of …" */
} RgMaterial;

int rg_material_count (void);
const RgMaterial *rg_material_at (int index);
/* By id or name, case-insensitive.  Unknown names give RG_ERR_NOT_FOUND
 * with the closest matches listed in the sentence. */
RgStatus rg_material_lookup (const char *name, const RgMaterial **out,
                             RgError *err);

typedef struct {
  const char *designation;   /* canonical, as the trade writes it: "NPS 2 Sch 40" */
  const char *standard;      /* "ASME B36.10M" … */
  const char *nominal;       /* "2", "DN 110", "3/4" */
  const char *series;        /* "40", "STD", "SDR 11", "Type L" */
  const char *material_id;   /* the RgMaterial the pipe is usually made of */
  double outside_diameter_m;
  double wall_m;
  double inner_diameter_m;   /* the bore: OD − 2·wall − 2·lining */
  const char *source;
  double lining_m;           /* a cement-mortar lining's nominal thickness; 0: none */
  int catalog;               /* index of its RgPipeCatalog */
} RgPipe;

int rg_pipe_count (void);
const RgPipe *rg_pipe_at (int index);
/* Parse a designation ("NPS 2 Sch 40", "2\" sch40", "DN 110 SDR 11",
 * "3/4 Type L", …), tolerant of case and spacing. */
RgStatus rg_pipe_lookup (const char *designation, const RgPipe **out,
                         RgError *err);

/* Helpers shared by the catalog lookups (materials, pipes, fittings, aging
 * classes).  Levenshtein distance between two strings, ASCII case folded;
 * only the first 63 bytes of each are compared. */
int rg_catalog_edit_distance (const char *a, const char *b);

/* Write into `buf` the (up to) three names of `count` candidates nearest to
 * `query`, as "a, b or c": names containing the query first, then by edit
 * distance.  `name_at(i)` gives the i-th
 * candidate. */
void rg_catalog_closest (const char *query, const char *(*name_at) (int),
                         int count, char *buf, size_t len);

/* ---- pipe catalogs: one series of one standard (catalog-search.c) ---- */

typedef struct {
  const char *name;          /* standard and series: "ISO 4427-2 SDR 11" */
  const char *standard;      /* "ISO 4427-2" */
  const char *series;        /* "SDR 11" */
  const char *title;         /* what the standard covers, for people */
  /* the materials (RgMaterial ids) whose pipe is made to this catalog,
   * NULL-terminated; the first is RgPipe.material_id */
  const char *const *material_ids;
  int usual;                 /* offered by default when sizing for a material */
  int first_pipe, n_pipes;   /* its pipes: rg_pipe_at (first_pipe …) */
  const char *source;
  const char *lining_source; /* "" when the pipes are unlined */
} RgPipeCatalog;

int rg_pipe_catalog_count (void);
const RgPipeCatalog *rg_pipe_catalog_at (int index);
/* Whether pipe of `catalog` is made of the material `material_id`. */
int rg_pipe_catalog_fits (const RgPipeCatalog *catalog, const char *material_id);

/* Which catalogs a name chooses, as flags in `chosen` (one per catalog,
 * rg_pipe_catalog_count () of them), among those that fit `material_id`
 * (NULL: any material).  A name is a catalog's name ("ISO 4427-2 SDR 11"),
 * a standard ("ISO 4427-2": all its series) or "all" (every catalog that
 * fits), case and spacing aside; NULL or "" chooses the usual catalogs
 * that fit.  Returns how many were chosen.  A name that chooses none gives
 * RG_ERR_NOT_FOUND (subject RG_SUBJECT_PIPE) with the closest names of the
 * catalogs that fit. */
RgStatus rg_pipe_catalog_choose (const char *name, const char *material_id,
                                 unsigned char *chosen, int *n_chosen,
                                 RgError *err);

/* The order of pipes in lists: by outside diameter (the size), then by
 * wall, then catalog order; negative, 0 or positive as for qsort. */
int rg_pipe_compare (const RgPipe *a, const RgPipe *b);

/* Whether `query` names part of the pipe's designation or catalog: every
 * word of the query (case folded; words cut at spaces, '-' and inch marks)
 * is spelt, from the start of a word, by the words of the designation or
 * of the catalog's name, in any order: "140 SDR 11", "sdr11 140" and "140
 * sdr 1" find "DN 140 SDR 11" (a word of the query is the start of a word
 * of the text, or whole words of it joined), "1 1/4" and "1-1/4" find "NPS 1-1/4 …",
 * "C900" every AWWA C900 size, "10S" Sch 10S and not "NPS 10 Sch 5S".
 * An empty query matches every pipe. */
int rg_pipe_matches (const RgPipe *pipe, const char *query);

/* The indexes of the pipes that match `query` (rg_pipe_matches) and whose
 * catalog is flagged in `catalogs` (NULL: every catalog), in the order of
 * rg_pipe_compare, written to `out` (at most `max`; give max ≥
 * rg_pipe_count () to have every one, in order).  Returns the number found
 * (which may exceed max: then only max were written). */
int rg_pipe_search (const unsigned char *catalogs, const char *query,
                    int *out, int max);
