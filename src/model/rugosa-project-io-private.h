/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Shared by the files of the project file format: reading
 * (rugosa-project-read.c: bytes to a checked JSON tree), loading
 * (rugosa-project-load.c: the tree to a project, through the field tables),
 * writing (rugosa-project-write.c) and saving (rugosa-project-save.c). */
#pragma once

#include <cjson/cJSON.h>

#include "rugosa-project-private.h"

G_BEGIN_DECLS

/* Limits that keep a hostile or broken file from costing much; generous
 * for any real project. */
#define RUGOSA_FILE_MAX_BYTES (16 * 1024 * 1024)
#define RUGOSA_FILE_MAX_DEPTH 32
#define RUGOSA_FILE_MAX_LINES 10000
#define RUGOSA_FILE_MAX_FITTINGS 200

/* Where in the document an error is: the JSON path being read. */
typedef struct {
  GString *path;
  GError **error;
} RugosaJsonCtx;

gboolean _rugosa_json_fail (RugosaJsonCtx *ctx, int code, const char *fmt, ...)
  G_GNUC_PRINTF (3, 4);
gsize _rugosa_json_push_key (RugosaJsonCtx *ctx, const char *key);
gsize _rugosa_json_push_index (RugosaJsonCtx *ctx, int index);
void _rugosa_json_pop (RugosaJsonCtx *ctx, gsize len);
/* "a number", "a string", … (translated) */
const char *_rugosa_json_type_name (const cJSON *v);

/* The checked JSON tree of a file's text: size, encoding, depth, syntax
 * and duplicate keys, in that order (docs/file-format.md); NULL and an
 * error otherwise. */
cJSON *_rugosa_project_parse (const char *data, gsize length, GError **error);

/* "lines: more than N line options": the reader refuses a list that long
 * while reading, the loader one that the reader could not count. */
gboolean _rugosa_project_fail_lines (RugosaJsonCtx *ctx);

/* Fill `project` (new and empty) from the tree. */
gboolean _rugosa_project_load_tree (RugosaJsonCtx *ctx, const cJSON *root,
                                    RugosaProject *project);

G_END_DECLS
