/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The friction chart: Darcy friction factor against Reynolds number on
 * log–log axes, with the laminar line, a family of Colebrook curves, the
 * regime bands and the user's line options as an overlay.
 *
 * Plain C over Cairo and PangoCairo; no GTK.  The caller (app or CLI) fills
 * a RugosaChartSpec (what the background shows) and an array of
 * RugosaChartLine (the overlay); the chart never computes hydraulics beyond
 * the curves it draws.
 *
 * Coordinates: "device" coordinates are the caller's logical pixels, origin
 * at the top left of the chart, y downwards (a widget's coordinates).  The
 * scale factor only sets the resolution of the cached background. */
#pragma once

#include <cairo.h>
#include <glib.h>
#include <stddef.h>

#include "core/regime.h"
#include "core/status.h"

typedef struct { double r, g, b, a; } RugosaChartRgba;
typedef struct { double re, f; } RugosaChartPoint;
typedef struct { double x, y, width, height; } RugosaChartRect;

typedef enum {
  RUGOSA_CHART_THEME_LIGHT = 0,
  RUGOSA_CHART_THEME_DARK
} RugosaChartTheme;

/* What the background shows (bits of RugosaChartSpec.show). */
typedef enum {
  RUGOSA_CHART_SHOW_BANDS        = 1 << 0,
  RUGOSA_CHART_SHOW_BAND_LABELS  = 1 << 1,
  RUGOSA_CHART_SHOW_CURVES       = 1 << 2,
  RUGOSA_CHART_SHOW_CURVE_LABELS = 1 << 3,
  RUGOSA_CHART_SHOW_GRID         = 1 << 4,
  RUGOSA_CHART_SHOW_LAMINAR      = 1 << 5,
  RUGOSA_CHART_SHOW_LEGEND       = 1 << 6,
  RUGOSA_CHART_SHOW_ALL          = (1 << 7) - 1
} RugosaChartShow;

enum {
  RUGOSA_CHART_FAMILY_MAX = 64,
  RUGOSA_CHART_DATE_MAX = 40,
  RUGOSA_CHART_TITLE_MAX = 160,
  RUGOSA_CHART_CONDITIONS_MAX = 320,
  /* Lines other than the selected and pinned ones that the overlay tries
   * to label, in list order: past 80 labels a chart reads as text, and a
   * label is tried at most three times for each placed.  A line past
   * these needs no readouts. */
  RUGOSA_CHART_LABELS_MAX = 80,
  RUGOSA_CHART_LABEL_TRIES = 3 * RUGOSA_CHART_LABELS_MAX,
  /* Past three times, axis numbers and titles take more of a small
   * chart than its plot. */
  RUGOSA_CHART_MAGNIFY_MAX = 3
};

/* The background description.  Everything here is part of the background
 * cache key: changing any field rebuilds the background. */
typedef struct {
  double width, height;          /* device (logical) pixels, ≥ 200 × 150 */
  double scale;                  /* device scale factor of the cache, 1..4 */
  RugosaChartTheme theme;
  double re_min, re_max;         /* Reynolds axis, 1 ≤ re_min < re_max ≤ 1e10 */
  double f_min, f_max;           /* friction axis, 0.001 ≤ f_min < f_max ≤ 1 */
  RgTransition transition;       /* laminar / transitional / turbulent */
  size_t n_family;               /* Colebrook curves; 0 in the family = smooth */
  double family[RUGOSA_CHART_FAMILY_MAX];
  unsigned show;                 /* RugosaChartShow bits */
  /* Type, markers and strokes enlarged by this factor over the size the
   * chart's own size gives them (a projected chart); 1 (the default; 0
   * counts as 1) changes nothing, up to RUGOSA_CHART_MAGNIFY_MAX. */
  double magnify;
  /* Non-empty: a footer with the caution and this date (exports). */
  char footer_date[RUGOSA_CHART_DATE_MAX];
  /* Non-empty: a heading over the plot (exports that ask for it): the
   * title, and under it the conditions (service age, fluid, friction
   * model) in a smaller line.  Text longer than the field is cut. */
  char title[RUGOSA_CHART_TITLE_MAX];
  char conditions[RUGOSA_CHART_CONDITIONS_MAX];
  /* The service age as shown ("25 years"), for the legend's aging key;
   * empty: the key shows no age.  The one field outside the background's
   * key: a new age redraws the legend, not the background. */
  char age_text[RUGOSA_CHART_DATE_MAX];
} RugosaChartSpec;

/* One line option on the overlay.  Strings are copied by
 * rugosa_chart_set_lines; NULL strings are left out of the label. */
typedef struct {
  const char *name;
  RugosaChartRgba colour;
  double rr_new;                 /* ε/D when new: its curve joins the background */
  double rr_aged;                /* ε/D at the selected service age */
  RgRegime regime;               /* of the design operating point */
  double re;                     /* design operating point */
  double f;                      /* design friction factor */
  double f_laminar;              /* transitional range only: 64/Re */
  double f_turbulent;            /* transitional range only: turbulent value */
  int has_flow_min, has_flow_max;
  RugosaChartPoint flow_min, flow_max;
  const RugosaChartPoint *trail; /* from new to the selected age */
  size_t n_trail;
  const char *readout_velocity;  /* already formatted in display units */
  const char *readout_head_per_100m;
  const char *readout_head_total;
  int selected;
  int pinned;                    /* labelled whatever the crowd, like the
                                  * selected line */
  int number;                    /* shown beside the marker when it gets
                                  * no label: its place in the caller's
                                  * list (0: index + 1) */
} RugosaChartLine;

/* One rung of the ladder (chart-ladder.c): a size a sizing tried, as its
 * design point on its own roughness curve.  The label is copied by
 * rugosa_chart_set_ladder. */
typedef struct {
  const char *label;       /* the designation, shown for marked rungs */
  double re, f;            /* the design point (in the transitional range,
                            * the turbulent value) */
  double rr;               /* ε/D of its curve */
  int passes;              /* keeps within every limit */
  int recommended;
  int selected;            /* chosen in the sizing's list */
} RugosaChartRung;

/* Colours of a theme (for tests and for an app that matches its panels). */
typedef struct {
  RugosaChartRgba page, plot, ink, muted, grid;
  RugosaChartRgba band_laminar, band_transitional;
  RugosaChartRgba band_smooth, band_transitionally_rough, band_fully_rough;
  RugosaChartRgba laminar_line, curve, smooth_curve;
} RugosaChartPalette;

typedef struct RugosaChart RugosaChart;

/* Defaults: 960 × 600, scale 1, light, Re 500–1e8, f 0.006–0.1,
 * transition 2000–4000, the standard family, everything shown, no footer,
 * magnify 1. */
void rugosa_chart_spec_init (RugosaChartSpec *spec);
/* The size, in device pixels, of the axis numbers (the chart's body
 * text) a chart of `spec` draws: what a caller weighs against a screen's
 * legibility to choose `magnify`. */
double rugosa_chart_spec_text_size (const RugosaChartSpec *spec);
/* The standard family of relative roughness values (smooth first). */
size_t rugosa_chart_standard_family (double *out, size_t max);
RgStatus rugosa_chart_spec_check (const RugosaChartSpec *spec, RgError *err);
void rugosa_chart_palette (RugosaChartTheme theme, RugosaChartPalette *out);

RugosaChart *rugosa_chart_new (void);
void rugosa_chart_free (RugosaChart *chart);

/* Background.  An identical spec keeps the cached background. */
RgStatus rugosa_chart_set_spec (RugosaChart *chart, const RugosaChartSpec *spec,
                                RgError *err);
const RugosaChartSpec *rugosa_chart_get_spec (const RugosaChart *chart);
/* Overlay: copied.  Only a change of the set of rr_new values touches the
 * background (their curves are drawn there). */
void rugosa_chart_set_lines (RugosaChart *chart, const RugosaChartLine *lines,
                             size_t n_lines);
/* Index of the hovered line, or -1.  Only redraws: a hover never moves a
 * label. */
void rugosa_chart_set_hover (RugosaChart *chart, int index);
/* The ladder of a sizing, drawn faintly in `colour` under the lines, in
 * size order (copied; n_rungs 0 removes it).  The background stays. */
void rugosa_chart_set_ladder (RugosaChart *chart, const RugosaChartRung *rungs,
                              size_t n_rungs, RugosaChartRgba colour);
size_t rugosa_chart_ladder_count (const RugosaChart *chart);
/* Device point of rung `index`; 0 when it is off the plot. */
int rugosa_chart_ladder_position (RugosaChart *chart, size_t index,
                                  double *x, double *y);
/* The rung nearest (x, y) within `radius` device pixels, or -1. */
int rugosa_chart_ladder_hit_test (RugosaChart *chart, double x, double y,
                                  double radius);
/* How many times the labels were placed (tests, benchmark): new lines
 * whose markers stay on the same pixels with labels of the same size keep
 * the placement. */
unsigned rugosa_chart_placements (const RugosaChart *chart);

/* Paint the cached background (rebuilt only when stale) then the overlay.
 * `cr` is in device coordinates. */
void rugosa_chart_draw (RugosaChart *chart, cairo_t *cr);
/* Same picture, the background stroked directly (vector outputs). */
void rugosa_chart_draw_direct (RugosaChart *chart, cairo_t *cr);
/* Drop the cached background and its geometry (benchmark, theme reload). */
void rugosa_chart_invalidate_background (RugosaChart *chart);
/* How many times the background has been computed and stroked. */
unsigned rugosa_chart_background_builds (const RugosaChart *chart);

/* Layout and transforms. */
RugosaChartRect rugosa_chart_plot_area (RugosaChart *chart);
void rugosa_chart_to_device (RugosaChart *chart, double re, double f,
                             double *x, double *y);
void rugosa_chart_from_device (RugosaChart *chart, double x, double y,
                               double *re, double *f);

/* The hover readout at a device point. */
typedef struct {
  int in_plot;
  double re, f;
  RgRegime regime;
  RgRoughnessZone zone;    /* RG_ZONE_NONE unless turbulent and has_rr */
  int has_rr;              /* 0 below the smooth-pipe curve or out of range */
  double rr;               /* ε/D of the Colebrook curve through (re, f) */
} RugosaChartProbe;
void rugosa_chart_probe (RugosaChart *chart, double x, double y,
                         RugosaChartProbe *out);

/* ε/D of the Colebrook curve through (re, f), explicitly:
 * ε/D = 3.7·(10^(−1/(2√f)) − 2.51/(Re·√f)).  RG_ERR_DOMAIN when the point
 * lies below the smooth-pipe curve or outside 1e3 ≤ re ≤ 1e10. */
RgStatus rugosa_chart_rr_through (double re, double f, double *rr,
                                  RgError *err);

/* Hit testing: the line whose marker is nearest to (x, y) within `radius`
 * device pixels, else the line whose label box holds (x, y), else -1. */
int rugosa_chart_hit_test (RugosaChart *chart, double x, double y,
                           double radius);

/* Where the overlay put things (after a draw or a call to this function). */
typedef struct {
  int visible;             /* 0 when the line got no label */
  int compact;             /* name only */
  int has_leader;
  RugosaChartRect box;
  RugosaChartRect marker;  /* the marker's (or transitional bar's) box */
  int numbered;            /* no label: the line's number beside its marker */
  RugosaChartRect tag;     /* the number's box */
} RugosaChartLabelInfo;
int rugosa_chart_get_label (RugosaChart *chart, size_t index,
                            RugosaChartLabelInfo *out);
/* The legend box (empty when hidden). */
RugosaChartRect rugosa_chart_legend_box (RugosaChart *chart);
/* The legend's entries as drawn, one text per entry in drawing order:
 * each line's name (with its number when the legend shows numbers), then
 * the key's entries.  NULL-terminated; free with g_strfreev. */
char **rugosa_chart_legend_entries (RugosaChart *chart);
/* The share of the plot's area the callouts (labels and numbers) cover,
 * 0..1; they never overlap, so their areas add (tests and measurements). */
double rugosa_chart_callout_share (RugosaChart *chart);

/* Export: the same drawing code at width × height logical pixels (PNG at
 * scale 1), with the caution footer carrying `date`.  An export shows no
 * selection: a selected line is drawn as a pinned one (labelled, no
 * ring); the spec's title, conditions and age text are drawn as given. */
typedef enum {
  RUGOSA_CHART_FORMAT_PNG = 0,
  RUGOSA_CHART_FORMAT_SVG,
  RUGOSA_CHART_FORMAT_PDF
} RugosaChartFormat;

extern const char *const RUGOSA_CHART_CAUTION;
/* The cautions in full (the About window, the report), untranslated. */
extern const char *const RUGOSA_CHART_CAUTION_FULL;

/* Lines as a picture that leaves the program shows them: no selection
 * (a selected line becomes a pinned one, labelled without the ring).
 * rugosa_chart_export does this itself; a caller that draws an export or
 * a print with its own chart calls it first. */
void rugosa_chart_lines_for_export (RugosaChartLine *lines, size_t n_lines);

#define RUGOSA_CHART_ERROR (rugosa_chart_error_quark ())
typedef enum {
  RUGOSA_CHART_ERROR_INVALID,    /* a size, range or date out of bounds */
  RUGOSA_CHART_ERROR_WRITE       /* Cairo could not create or write the file */
} RugosaChartError;
GQuark rugosa_chart_error_quark (void);

gboolean rugosa_chart_export (const RugosaChartSpec *spec,
                              const RugosaChartLine *lines, size_t n_lines,
                              RugosaChartFormat format, double width,
                              double height, const char *date,
                              const char *path, GError **error);
