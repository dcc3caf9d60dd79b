/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The field tables: one row for every field of a line option and of the
 * project settings, holding everything the program knows about it — the
 * GObject property, the key and JSON path in the project file, the kind
 * of value, the quantity and unit, the valid range, the default, the
 * translatable label and help, the rugosa-cli option and the core
 * subjects it answers to.
 *
 * Every layer derives from these rows instead of repeating them:
 * RugosaLine and RugosaSettings install their properties from them, the
 * file reader and writer walk them, the window's panels take their labels,
 * units and ranges from them, rugosa-cli builds its options from them, and
 * the file-format document's tables and the settings schema are generated
 * from them (tests/test-fields.c fails if any layer disagrees). */
#pragma once

#include <glib-object.h>

#include "core/fluid.h"
#include "core/friction.h"
#include "core/status.h"
#include "rugosa-enums.h"

G_BEGIN_DECLS

typedef enum {
  RUGOSA_FIELD_NUMBER = 0, /* a double; SI (or the unit in `unit_text`) */
  RUGOSA_FIELD_TEXT,       /* a string, never NULL */
  RUGOSA_FIELD_COLOUR,     /* "#rrggbb" */
  RUGOSA_FIELD_ENUM,       /* an enum property; the file stores its nick */
  RUGOSA_FIELD_CATALOG,    /* a catalog id, or NULL for the custom value `partner` */
  RUGOSA_FIELD_FITTINGS,   /* the fittings list, RUGOSA_LINE_FITTINGS_TYPE */
  RUGOSA_FIELD_UNIT_MAP,   /* quantity id -> unit spelling, "a{ss}" */
  RUGOSA_FIELD_CURVE,      /* (flow, head) points in SI, flows increasing,
                            * RUGOSA_LINE_CURVE_TYPE */
} RugosaFieldKind;

typedef enum {
  /* the file must hold it (for a CATALOG field: it or its partner) */
  RUGOSA_FIELD_REQUIRED = 1 << 0,
  /* the value must be larger than `min`, not equal */
  RUGOSA_FIELD_MIN_OPEN = 1 << 1,
  /* 0 means "not given": the file omits it, and a value in the file must
   * lie in the range */
  RUGOSA_FIELD_ZERO_ABSENT = 1 << 2,
  /* a whole number */
  RUGOSA_FIELD_WHOLE = 1 << 3,
  /* a view setting: changing it does not make the project "modified" and
   * is not an undo step (it is still saved with the project) */
  RUGOSA_FIELD_VIEW = 1 << 4,
  /* a project setting that new projects take from the preferences */
  RUGOSA_FIELD_SEEDED = 1 << 5,
  /* a text that may hold line breaks and tabs (a note); other text fields
   * refuse every control character */
  RUGOSA_FIELD_MULTILINE = 1 << 6,
  /* the default is the core's (rg_fluid_spec_init), read at start-up */
  RUGOSA_FIELD_CORE_DEFAULT = 1 << 7,
  /* required when the object holding it is present (that object itself
   * may be left out) */
  RUGOSA_FIELD_REQUIRED_IN_GROUP = 1 << 8,
  /* a state of the fluid that rugosa-cli asks for when the line's fluid
   * is one of `fluid_kinds` (the others have a usable default) */
  RUGOSA_FIELD_STATE_REQUIRED = 1 << 9,
  /* a TEXT holding a calendar date as ISO 8601 "YYYY-MM-DD", or empty */
  RUGOSA_FIELD_DATE = 1 << 10,
} RugosaFieldFlags;

typedef struct {
  const char *property;   /* GObject property, e.g. "flow-design" */
  const char *path;       /* JSON path in the line or settings object */
  RugosaFieldKind kind;
  RugosaDisplayQuantity display; /* NUMBER: how it is shown and parsed */
  double to_si;           /* stored value × to_si = SI value of `display`'s
                           * quantity (1 except for values kept per year) */
  double min, max;        /* NUMBER: valid range of the stored value */
  double dflt;            /* NUMBER, ENUM: default (an enum's value) */
  const char *dflt_text;  /* TEXT, COLOUR, CATALOG: default (NULL: none) */
  guint flags;            /* RugosaFieldFlags */
  const char *label;      /* translatable (N_), sentence case */
  const char *help;       /* translatable (N_), one or two sentences */
  const char *unit_text;  /* NUMBER without a display quantity: its unit
                           * as shown, e.g. "1/K" (not translated) */
  const char *cli;        /* the rugosa-cli option that sets it, or NULL */
  RgSubjects subjects;    /* the core subjects it answers to */
  const char *partner;    /* CATALOG: the property of the custom value */
  GType (*enum_type) (void); /* ENUM */
  int max_chars;          /* TEXT, CATALOG */
  gsize offset;           /* of its storage in the object's struct */
  gssize spec_offset;     /* of the same value in RgFluidSpec, or -1 */
  guint fluid_kinds;      /* the fluids (bits 1 << RgFluidKind) this field
                           * describes; 0: it is not a fluid's state */
  RugosaLinePart part;    /* the part of a line option it belongs to, which
                           * is applied to other lines as a whole */
} RugosaField;

#define RUGOSA_FLUID_BIT(kind) (1u << (unsigned) (kind))

/* Whether `text` is a value the TEXT, COLOUR or CATALOG row takes: valid
 * UTF-8, within its length, without control characters (but line breaks
 * and tabs in a multi-line text). */
gboolean rugosa_field_text_ok (const RugosaField *field, const char *text);

/* Whether the row is part of the state of `kind` (shown for it, taken by
 * rugosa-cli for it). */
gboolean rugosa_field_applies_to_fluid (const RugosaField *field,
                                        RgFluidKind kind);

/* Parse what a person typed for a NUMBER row: a number with a unit of the
 * row's quantity.  A bare number is in `bare_unit` (NULL: SI, or the
 * stored unit where that is not SI, as years for a service age).  The
 * custom fluid's viscosity also takes a kinematic viscosity ("1 cSt"),
 * converted with `density_kg_m3`.  Fills the stored value; the range is
 * not checked (rugosa_field_in_range).  Errors carry the row's subjects. */
gboolean rugosa_field_parse_text (const RugosaField *field, const char *text,
                                  const char *bare_unit, double density_kg_m3,
                                  double *stored, RgError *err);

/* The tables, in file order. */
const RugosaField *rugosa_line_fields (guint *n);
const RugosaField *rugosa_settings_fields (guint *n);

/* A row by property name, JSON path or CLI option, in either table (line
 * rows first); NULL when none. */
const RugosaField *rugosa_field_find (const char *property);
const RugosaField *rugosa_field_find_path (gboolean settings,
                                           const char *path);
const RugosaField *rugosa_field_find_cli (const char *option);

/* The first row (line rows first) answering to any of `subjects`, or NULL;
 * with `index`, the index-th such row (for errors about several inputs). */
const RugosaField *rugosa_field_for_subject (RgSubjects subjects, guint index);

/* The unit shown beside the field's values when displayed in SI ("m³/s",
 * "years", "1/K"; "" for a plain number). */
const char *rugosa_field_si_unit (const RugosaField *field);

/* The field's translated label. */
const char *rugosa_field_label (const RugosaField *field);

/* Limits and relations between fields that are not one field's range. */
/* An entry of a line's fittings: a plain loss coefficient K and a count
 * each lie in 0 … this (far above any single fitting's published K). */
#define RUGOSA_FITTING_K_MAX 1.0e4
#define RUGOSA_FITTING_COUNT_MAX 1.0e4
/* A point of a pump curve: its flow lies in the range of a line's flows
 * (the row "flow-design"), its head in 0 … this many metres (Common
 * practice (no single source): far above any single pump's head, about
 * 1000 bar of water); a curve holds at most this many points. */
#define RUGOSA_CURVE_HEAD_MAX 1.0e4
#define RUGOSA_CURVE_POINTS_MAX 50
/* The longest service life whose energy is summed, years (the range of
 * the row "service-life"; the year-by-year costs are kept in arrays of
 * this size). */
#define RUGOSA_LIFE_YEARS_MAX 100
/* The chart window a project may ask for, which the chart engine draws
 * (src/chart includes this header for these numbers alone): the Reynolds
 * axis within the turbulent correlations' domain and spanning at least
 * one decade, the friction axis within 0.001 … 1 with its top at least
 * 1.5 times its bottom. */
#define RUGOSA_CHART_RE_LOWEST 1.0
#define RUGOSA_CHART_RE_HIGHEST RG_FRICTION_RE_MAX
#define RUGOSA_CHART_F_LOWEST 0.001
#define RUGOSA_CHART_F_HIGHEST 1.0
#define RUGOSA_CHART_RE_SPAN_MIN 10.0
#define RUGOSA_CHART_F_SPAN_MIN 1.5

/* Whether `stored` lies in the field's range; with `why` (may be NULL),
 * one sentence naming the field by its label and giving the range in
 * `unit` (a display spelling for the field's quantity, the currency label
 * for money; NULL: SI), and
 * `err` (may be NULL) filled the same way with the field's subjects. */
gboolean rugosa_field_in_range (const RugosaField *field, double stored,
                                const char *unit, RgError *err);

/* Whether a text takes `text` as it is, on load and on entry: valid
 * UTF-8, no control character (Unicode Cc: C0, DEL and C1; a MULTILINE
 * row takes line breaks and tabs), at most the row's `max_chars`
 * characters and, for a DATE row, empty or a real calendar date
 * "YYYY-MM-DD" (rugosa_field_date_ok).  `field` may be NULL: one line, no length limit.  Each face
 * words the refusal its own way (rugosa-project-load.c). */
typedef enum {
  RUGOSA_TEXT_OK,
  RUGOSA_TEXT_NOT_UTF8,
  RUGOSA_TEXT_CONTROL,
  RUGOSA_TEXT_TOO_LONG,
  RUGOSA_TEXT_NOT_DATE,    /* a DATE row: neither empty nor "YYYY-MM-DD" */
} RugosaTextProblem;
RugosaTextProblem rugosa_field_text_problem (const RugosaField *field,
                                             const char *text);

/* Whether `text` is a calendar date written as ISO 8601 "YYYY-MM-DD"
 * (years 1000–9999, a day that exists in its month). */
gboolean rugosa_field_date_ok (const char *text);

G_END_DECLS
