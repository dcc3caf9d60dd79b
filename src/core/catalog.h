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
  double inner_diameter_m;
  const char *source;
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
