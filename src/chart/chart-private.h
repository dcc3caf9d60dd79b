/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Internals shared by the chart's source files. */
#pragma once

#include <pango/pangocairo.h>

#include "rugosa-chart.h"

enum { CHART_CURVES_MAX = RUGOSA_CHART_FAMILY_MAX * 2 };

/* Past this many lines the chart is a crowd: only the selected, pinned and
 * hovered lines show their flow range at full width, their aging trail and
 * (selected and pinned) their own Colebrook curve; the others are markers
 * with thin flow ranges.  Wide bands, trails and curves of a hundred lines
 * merge into one mass. */
enum { CHART_CROWD = 24 };

/* Device-space geometry of one frame. */
typedef struct {
  double width, height;
  double k;                        /* size factor for fonts and strokes */
  RugosaChartRect plot;
  double lx0, lx1, ly0, ly1;       /* log10 of the axis ranges */
  double font_tick, font_title, font_curve, font_band, font_label, font_footer;
  double footer_h;
  double heading_h;                /* the title and conditions (0: none) */
  double side_w;                   /* a wide chart's column for the legend,
                                    * right of the plot (0: none) */
} ChartLayout;

typedef struct {
  double rr;
  int is_user;                     /* the ε/D of one of the user's lines */
  size_t n;
  double *x, *y;                   /* device points, Re increasing */
} ChartCurve;

typedef struct {
  char *name, *velocity, *head100, *headtotal;
  RugosaChartLine line;            /* strings and trail point into this copy */
  RugosaChartPoint *trail;
} ChartLine;

typedef struct {
  RugosaChartLabelInfo info;
  double ax, ay;                   /* anchor (marker centre) */
  signed char ring, dir;           /* where the label went (-1: none),
                                    * tried first when placed again */
  /* what the placement was made for (chart-labels.c) */
  long key_x, key_y, key_h;
  unsigned key_flags;
  int key_number;
  guint key_name;
} ChartLabel;

struct RugosaChart {
  RugosaChartSpec spec;
  ChartLayout lay;

  /* background: geometry and pixels, keyed by spec + user curves */
  int geom_valid;
  size_t n_curves;
  ChartCurve curves[CHART_CURVES_MAX];
  size_t n_user_rr;
  double user_rr[CHART_CURVES_MAX];
  cairo_surface_t *bg;
  int bg_valid;
  unsigned bg_builds;
  /* boxes of the background's own labels (curves, bands), which the
   * overlay's labels avoid when they can */
  RugosaChartRect bg_boxes[CHART_CURVES_MAX + 16];
  size_t n_bg_boxes;
  int bg_boxes_valid;
  int placement_saw_bg_boxes;

  /* overlay */
  ChartLine *lines;
  size_t n_lines;
  int hover;
  int placement_valid;
  int placement_stale;             /* new lines: check whether it holds */
  unsigned placements;
  ChartLabel *labels;
  size_t n_labels;
  RugosaChartRect legend;
  GArray *legend_entries;          /* chart-legend.c: what it shows, where */
  double legend_rule;              /* the rule over the key (0: none) */
  double legend_num_w;             /* the width of the numbers' column */
  cairo_surface_t *legend_img;     /* the legend as pixels, and its key */
  GString *legend_key;

  /* the ladder of a sizing (chart-ladder.c) */
  RugosaChartRung *ladder;
  char **ladder_labels;
  size_t n_ladder;
  RugosaChartRgba ladder_colour;

  /* text */
  PangoContext *pango;
  GHashTable *layouts;             /* key text → PangoLayout, in use */
  GHashTable *layouts_old;         /* the generation before: moved back
                                    * when asked for, dropped as a whole */
};

/* Boxes the background's text already occupies (tick labels, curve and
 * band names), so that later text keeps clear of them. */
typedef struct {
  RugosaChartRect boxes[256];
  size_t n;
} ChartTaken;

/* chart-geometry.c */
void _rugosa_chart_layout (const RugosaChartSpec *spec, ChartLayout *lay);
void _rugosa_chart_xy (const ChartLayout *lay, double re, double f,
                       double *x, double *y);
void _rugosa_chart_value (const ChartLayout *lay, double x, double y,
                          double *re, double *f);
void _rugosa_chart_classify (const RugosaChartSpec *spec,
                             const ChartLayout *lay, double x, double y,
                             RugosaChartProbe *out);

/* chart-text.c */
typedef enum {
  TEXT_PLAIN = 0,
  TEXT_BOLD,
  TEXT_CAPS,                       /* band names: semibold capitals */
  TEXT_FIRST_BOLD                  /* label: first line bold */
} ChartTextStyle;
PangoLayout *_rugosa_chart_text (RugosaChart *chart, const char *text,
                                 double size_px, ChartTextStyle style,
                                 double wrap_width);
void _rugosa_chart_text_size (PangoLayout *layout, double *w, double *h);
void _rugosa_chart_show (cairo_t *cr, PangoLayout *layout, double x, double y,
                         const RugosaChartRgba *ink,
                         const RugosaChartRgba *halo, double halo_width);
void _rugosa_chart_set_rgba (cairo_t *cr, const RugosaChartRgba *c);
RugosaChartRect _rugosa_chart_turned_box (double cx, double cy, double w,
                                          double h, double angle, double pad);
void _rugosa_chart_show_turned (cairo_t *cr, PangoLayout *layout, double cx,
                                double cy, double angle,
                                const RugosaChartRgba *ink,
                                const RugosaChartRgba *halo, double halo_w);
void _rugosa_chart_show_knockout (cairo_t *cr, PangoLayout *layout, double cx,
                                  double cy, double angle,
                                  const RugosaChartRgba *ink,
                                  const RugosaChartRgba *under, double pad);

/* chart-palette.c */
const RugosaChartRgba *_rugosa_chart_band_colour (const RugosaChartPalette *p,
                                                  const RugosaChartProbe *pr);
cairo_pattern_t *_rugosa_chart_hatch_pattern (cairo_t *cr,
                                              const RugosaChartPalette *p,
                                              RugosaChartTheme theme, double k);

/* chart-bands.c */
void _rugosa_chart_draw_bands (RugosaChart *chart, cairo_t *cr,
                               const RugosaChartPalette *p);
void _rugosa_chart_draw_band_labels (RugosaChart *chart, cairo_t *cr,
                                     const RugosaChartPalette *p,
                                     ChartTaken *taken);

/* chart-axes.c */
void _rugosa_chart_draw_grid (RugosaChart *chart, cairo_t *cr,
                              const RugosaChartPalette *p);
void _rugosa_chart_draw_axes (RugosaChart *chart, cairo_t *cr,
                              const RugosaChartPalette *p);

/* chart-curves.c */
void _rugosa_chart_build_curves (RugosaChart *chart);
void _rugosa_chart_free_curves (RugosaChart *chart);
void _rugosa_chart_draw_curves (RugosaChart *chart, cairo_t *cr,
                                const RugosaChartPalette *p);
void _rugosa_chart_draw_laminar (RugosaChart *chart, cairo_t *cr,
                                 const RugosaChartPalette *p,
                                 ChartTaken *taken);
void _rugosa_chart_draw_curve_labels (RugosaChart *chart, cairo_t *cr,
                                      const RugosaChartPalette *p,
                                      ChartTaken *taken);

/* chart-background.c */
void _rugosa_chart_draw_background (RugosaChart *chart, cairo_t *cr);

/* chart-export.c: the surface of `format` at width × height, `draw`
 * called on it, the file written; FALSE and one sentence otherwise. */
typedef void (*ChartExportDraw) (cairo_t *cr, gpointer data);
gboolean _rugosa_chart_export_surface (RugosaChartFormat format, double width,
                                       double height, const char *date,
                                       const char *title, const char *path,
                                       ChartExportDraw draw, gpointer data,
                                       GError **error);
/* chart-ladder.c */
void _rugosa_chart_draw_ladder (RugosaChart *chart, cairo_t *cr);
void _rugosa_chart_free_ladder (RugosaChart *chart);
/* The boxes of the ladder's points, for the overlay's labels to keep
 * clear of (at most n_ladder written); returns how many. */
size_t _rugosa_chart_ladder_boxes (RugosaChart *chart, RugosaChartRect *out);

/* chart-overlay.c */
/* The marker shape `shape` (a line's index: circle, square, diamond,
 * triangles) of radius r at (x, y), as a path. */
void _rugosa_chart_shape_path (cairo_t *cr, int shape, double x, double y,
                               double r);
/* chart-labels.c */
void _rugosa_chart_place_labels (RugosaChart *chart);
/* Whether the placement made for the previous lines still holds for the
 * present ones (markers on the same pixels, labels of the same size). */
int _rugosa_chart_placement_holds (RugosaChart *chart);
void _rugosa_chart_label_key (RugosaChart *chart, size_t i, ChartLabel *lb);
/* The marker's radius as drawn; `hovered` for the pointer's line. */
double _rugosa_chart_marker_radius (const RugosaChart *chart, size_t i,
                                    int hovered);
PangoLayout *_rugosa_chart_label_layout (RugosaChart *chart, size_t i,
                                         int compact, double *w, double *h);
void _rugosa_chart_label_size (RugosaChart *chart, size_t i, int compact,
                               double *w, double *h);
PangoLayout *_rugosa_chart_tag_layout (RugosaChart *chart, size_t i,
                                       double *w, double *h);

/* chart-legend.c: the legend's entries and its place (the markers, the
 * background's labels and curves are known), its drawing (`cached`: kept
 * as pixels between frames) */
RugosaChartRect _rugosa_chart_legend_geometry (RugosaChart *chart);
void _rugosa_chart_draw_legend (RugosaChart *chart, cairo_t *cr,
                                const RugosaChartPalette *p, int cached);
void _rugosa_chart_free_legend (RugosaChart *chart);

/* chart.c: place the labels unless the last placement still holds */
void _rugosa_chart_ensure_placement (RugosaChart *chart);

/* chart-overlay.c */
void _rugosa_chart_draw_overlay (RugosaChart *chart, cairo_t *cr, int cached);
void _rugosa_chart_draw_footer (RugosaChart *chart, cairo_t *cr);
/* The title and conditions over the plot, when the spec has a title. */
void _rugosa_chart_draw_heading (RugosaChart *chart, cairo_t *cr);

static inline int
_rugosa_chart_rects_overlap (const RugosaChartRect *a, const RugosaChartRect *b)
{
  return a->x < b->x + b->width && b->x < a->x + a->width
         && a->y < b->y + b->height && b->y < a->y + a->height;
}

static inline int
_rugosa_chart_rect_inside (const RugosaChartRect *in, const RugosaChartRect *out)
{
  return in->x >= out->x && in->y >= out->y
         && in->x + in->width <= out->x + out->width
         && in->y + in->height <= out->y + out->height;
}

static inline int
_rugosa_chart_taken_free (const ChartTaken *t, const RugosaChartRect *r)
{
  for (size_t i = 0; i < t->n; i++)
    if (_rugosa_chart_rects_overlap (&t->boxes[i], r))
      return 0;
  return 1;
}

static inline void
_rugosa_chart_taken_add (ChartTaken *t, const RugosaChartRect *r)
{
  if (t->n < G_N_ELEMENTS (t->boxes))
    t->boxes[t->n++] = *r;
}
