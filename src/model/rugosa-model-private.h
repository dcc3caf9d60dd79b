/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Internal interfaces shared by the files of src/model/. */
#pragma once

#include <cjson/cJSON.h>

#include "rugosa-line.h"
#include "rugosa-settings.h"
#include "rugosa-project.h"

G_BEGIN_DECLS

/* Unknown file fields kept for the next save: a cJSON object mirroring the
 * layout of the line's (or settings', or project's) JSON object; owned. */
const cJSON *_rugosa_line_get_extra (RugosaLine *self);
void _rugosa_line_take_extra (RugosaLine *self, cJSON *extra);
const cJSON *_rugosa_settings_get_extra (RugosaSettings *self);
void _rugosa_settings_take_extra (RugosaSettings *self, cJSON *extra);
const cJSON *_rugosa_project_get_extra (RugosaProject *self);
void _rugosa_project_take_extra (RugosaProject *self, cJSON *extra);

/* Copy every property (and the extras) of `src` onto `dst`. */
void _rugosa_settings_copy (RugosaSettings *dst, RugosaSettings *src);

/* Move the whole content (lines, settings, extras) of `src` into `dst`,
 * emitting items-changed and notify on `dst`; `src` is left empty. */
void _rugosa_project_take_content (RugosaProject *dst, RugosaProject *src);

/* Add `b` into `a`, member by member, where `a` lacks the member; objects
 * merge recursively, arrays of equal length element by element. */
void _rugosa_json_merge_missing (cJSON *a, const cJSON *b);

/* The shortest decimal text (15 to 17 significant digits, "." as the
 * decimal point) that reads back to exactly x; x must be finite. */
void _rugosa_format_double (char *buf, gsize size, double x);

/* The evaluation cache is dropped with the line. */
void _rugosa_project_eval_forget (RugosaProject *self, RugosaLine *line);
void _rugosa_project_eval_init (RugosaProject *self);
void _rugosa_project_eval_finalize (RugosaProject *self);

G_END_DECLS
