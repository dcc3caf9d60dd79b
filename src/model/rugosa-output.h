/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The results as they leave the program: one table of output keys serves
 * the JSON of `rugosa-cli line` and `eval`, the CSV of `eval` and of the
 * window's export, and the text tables.  A key has a name, a label, the
 * quantity it is shown as, and how to read it from an operating point;
 * its JSON key is the name followed by the SI unit ("velocity_m_s"), its
 * CSV column the name followed by the display unit ("velocity (ft/s)"). */
#pragma once

#include <glib.h>

#include "rugosa-enums.h"
#include "rugosa-evaluation.h"
#include "rugosa-settings.h"

G_BEGIN_DECLS

typedef enum {
  RUGOSA_OUTPUT_NUMBER,
  RUGOSA_OUTPUT_ID,        /* a fixed identifier: the regime, the zone */
  RUGOSA_OUTPUT_WARNINGS,  /* the list of warning sentences */
} RugosaOutputKind;

typedef struct {
  const char *name;                /* "velocity" */
  const char *label;               /* translatable (N_): "Mean velocity" */
  RugosaDisplayQuantity display;   /* NUMBER: a plain number */
  RugosaOutputKind kind;
  double (*number) (const RugosaLineResults *r, const RugosaOperatingPoint *p);
  const char *(*id) (const RugosaOperatingPoint *p);
  /* NULL: always present; else whether the point has this value */
  gboolean (*present) (const RugosaOperatingPoint *p);
  /* NULL: as `present`; else whether the point `p` of the line `r` has
   * this value (a value of the whole line is given with its design point
   * alone) */
  gboolean (*line_present) (const RugosaLineResults *r,
                            const RugosaOperatingPoint *p);
} RugosaOutputKey;

const RugosaOutputKey *rugosa_output_keys (guint *n);
const RugosaOutputKey *rugosa_output_key_find (const char *name);
/* "velocity_m_s"; the name alone for a plain number. */
const char *rugosa_output_json_key (const RugosaOutputKey *key);
gboolean rugosa_output_present (const RugosaOutputKey *key,
                                const RugosaOperatingPoint *p);
/* The same for a point of the line `r` (keys of the whole line are
 * present at its design point only). */
gboolean rugosa_output_present_for (const RugosaOutputKey *key,
                                    const RugosaLineResults *r,
                                    const RugosaOperatingPoint *p);

/* The unit of a display quantity in `units` (NULL: the SI unit), or NULL
 * for a plain number; for money the currency label of `units` (NULL when
 * `units` is NULL or the label is empty). */
const char *rugosa_output_unit (RugosaSettings *units,
                                RugosaDisplayQuantity display);

/* One operating point as the members of a JSON object (no braces),
 * SI, numbers exact and independent of the locale; when the point could
 * not be computed, an "error" member instead. */
void rugosa_output_point_json (GString *out, const RugosaLineResults *r,
                               const RugosaOperatingPoint *p,
                               const char *indent);

/* The CSV columns of the output keys, each after a comma: the name and
 * the unit in `units` (NULL: SI), "velocity (ft/s)". */
void rugosa_output_csv_header (GString *out, RugosaSettings *units);
/* One operating point as CSV cells in the order of the header, each after
 * a comma, numbers exact in `units` (NULL: SI); empty cells when the point
 * could not be computed. */
void rugosa_output_point_csv (GString *out, const RugosaLineResults *r,
                              const RugosaOperatingPoint *p,
                              RugosaSettings *units);
/* A CSV field, quoted when it needs to be; control characters as '?'. */
void rugosa_output_csv_field (GString *out, const char *text);

/* One operating point as "label    value unit" lines, values in `units`
 * (NULL: SI), 4 significant figures. */
/* The width of the label column of that table, in characters: the
 * longest label of the point's keys and a space, at least 38; rows a
 * caller adds above the table pad to it. */
guint rugosa_output_point_table_width (const RugosaLineResults *r,
                                       const RugosaOperatingPoint *p);
void rugosa_output_point_table (GString *out, const RugosaLineResults *r,
                                const RugosaOperatingPoint *p,
                                RugosaSettings *units);

G_END_DECLS
