/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Label placement for the overlay.
 *
 * What gets a label: the selected line and the pinned lines always; the
 * other lines in list order while labels fit, up to a budget that grows
 * with the plot's area, in full while the callouts cover less than a
 * tenth of the plot, then by name alone up to 15 % (FULL_SHARE,
 * CALLOUT_SHARE).  Every other line whose marker is on the plot gets
 * a small number beside its marker instead, its place in the list.
 *
 * How: greedy, with a spatial index.  Every obstacle (markers, the legend,
 * placed labels and numbers, and softly the background's own labels) goes
 * into a uniform grid of buckets over the plot, so asking whether a box is
 * free costs a handful of bucket visits whatever the number of lines.
 * Each label tries a bounded list of candidate boxes — eight directions on
 * a few rings around its marker, the box it had last time first — full
 * text before the name alone, clear of the background's labels before
 * over them.  A label off the first ring gets a short leader.  The
 * selected and pinned lines may go further out and, as a last resort,
 * over other lines' markers (never over labels or the legend).  Cost:
 * O(N) for the markers and numbers plus O(budget) for the labels, after
 * an O(N log N) sort of the lines by priority.
 *
 * When: only when what it depends on changed — the markers' places (to
 * the pixel), which lines are selected or pinned, the label sizes, the
 * legend or the plot.  Hover never moves a label (markers are reserved at
 * their hovered size), and a new service age that moves no marker and no
 * label size keeps the placement (rugosa_chart_placements counts them). */
#include "chart-private.h"

#include <glib/gi18n-lib.h>
#include <math.h>
#include <stdio.h>
#include <string.h>

/* ---- the spatial index ---- */

typedef enum {
  BOX_MARKER = 1 << 0,
  BOX_LABEL = 1 << 1,
  BOX_LEGEND = 1 << 2,
  BOX_SOFT = 1 << 3,     /* the background's labels: avoided while strict */
  BOX_TAG = 1 << 4,      /* the numbers of unlabelled markers */
} BoxKind;

typedef struct {
  RugosaChartRect r;
  unsigned kind;
} IndexBox;

typedef struct {
  int box;
  int next;
} IndexEntry;

typedef struct {
  double x0, y0, cell;
  int nx, ny;
  int *head;             /* first entry of each bucket, or -1 */
  GArray *entries;       /* IndexEntry */
  GArray *boxes;         /* IndexBox */
} Index;

static void
index_init (Index *ix, const RugosaChartRect *area, double cell)
{
  ix->x0 = area->x;
  ix->y0 = area->y;
  ix->cell = cell;
  ix->nx = (int) fmax (1, ceil (area->width / cell));
  ix->ny = (int) fmax (1, ceil (area->height / cell));
  ix->head = g_new (int, (gsize) ix->nx * (gsize) ix->ny);
  for (int i = 0; i < ix->nx * ix->ny; i++)
    ix->head[i] = -1;
  ix->entries = g_array_new (FALSE, FALSE, sizeof (IndexEntry));
  ix->boxes = g_array_new (FALSE, FALSE, sizeof (IndexBox));
}

static void
index_clear (Index *ix)
{
  g_free (ix->head);
  g_array_unref (ix->entries);
  g_array_unref (ix->boxes);
}

/* The buckets a box touches, clamped to the grid; 0 when none. */
static int
index_span (const Index *ix, const RugosaChartRect *r, int *i0, int *i1, int *j0,
            int *j1)
{
  *i0 = (int) floor ((r->x - ix->x0) / ix->cell);
  *i1 = (int) floor ((r->x + r->width - ix->x0) / ix->cell);
  *j0 = (int) floor ((r->y - ix->y0) / ix->cell);
  *j1 = (int) floor ((r->y + r->height - ix->y0) / ix->cell);
  if (*i1 < 0 || *j1 < 0 || *i0 >= ix->nx || *j0 >= ix->ny)
    return 0;
  *i0 = MAX (*i0, 0);
  *j0 = MAX (*j0, 0);
  *i1 = MIN (*i1, ix->nx - 1);
  *j1 = MIN (*j1, ix->ny - 1);
  return 1;
}

static void
index_add (Index *ix, const RugosaChartRect *r, unsigned kind)
{
  int i0, i1, j0, j1;
  const IndexBox b = { *r, kind };
  const int id = (int) ix->boxes->len;

  if (r->width <= 0 || r->height <= 0 || !index_span (ix, r, &i0, &i1, &j0, &j1))
    return;
  g_array_append_val (ix->boxes, b);
  for (int j = j0; j <= j1; j++)
    for (int i = i0; i <= i1; i++)
      {
        const int cell = j * ix->nx + i;
        const IndexEntry e = { id, ix->head[cell] };
        ix->head[cell] = (int) ix->entries->len;
        g_array_append_val (ix->entries, e);
      }
}

/* Whether `r` overlaps a box of one of the kinds in `mask`.  A box met in
 * several buckets is simply tested again: cheaper than remembering it. */
static int
index_hits (const Index *ix, const RugosaChartRect *r, unsigned mask)
{
  int i0, i1, j0, j1;
  const IndexEntry *entries = (const IndexEntry *) (gpointer) ix->entries->data;
  const IndexBox *boxes = (const IndexBox *) (gpointer) ix->boxes->data;

  if (!index_span (ix, r, &i0, &i1, &j0, &j1))
    return 0;
  for (int j = j0; j <= j1; j++)
    for (int i = i0; i <= i1; i++)
      for (int e = ix->head[j * ix->nx + i]; e >= 0; e = entries[e].next)
        {
          const IndexBox *b = &boxes[entries[e].box];
          if ((b->kind & mask) && _rugosa_chart_rects_overlap (r, &b->r))
            return 1;
        }
  return 0;
}

/* ---- markers and texts ---- */

double
_rugosa_chart_marker_radius (const RugosaChart *chart, size_t i, int hovered)
{
  const double k = chart->lay.k;
  const RugosaChartLine *l = &chart->lines[i].line;
  if (l->selected)
    return 7.0 * k;
  if (hovered)
    return 6.5 * k;
  /* smaller in a large crowd, down to 60 % at 280 lines and more, so
   * that markers stay apart where they can */
  if (!l->pinned && chart->n_lines > 100)
    return 5.5 * k * fmax (0.6, sqrt (100.0 / (double) chart->n_lines));
  return 5.5 * k;
}

static int
point_device (const RugosaChart *chart, double re, double f, double *x, double *y)
{
  if (!(re > 0 && f > 0 && isfinite (re) && isfinite (f)))
    return 0;
  _rugosa_chart_xy (&chart->lay, re, f, x, y);
  return 1;
}

/* The marker's anchor and the box it reserves (at its hovered size, so a
 * hover never overlaps a label); 0 when the point is off the plot. */
static int
marker_geometry (const RugosaChart *chart, size_t i, double *ax, double *ay,
                 RugosaChartRect *box)
{
  const RugosaChartLine *l = &chart->lines[i].line;
  const RugosaChartRect *pl = &chart->lay.plot;
  const double r = _rugosa_chart_marker_radius (chart, i, 1) + 2.0 * chart->lay.k;
  double x, y;

  if (l->regime == RG_REGIME_TRANSITIONAL)
    {
      double y1, y2;
      if (!point_device (chart, l->re, l->f_laminar, &x, &y1)
          || !point_device (chart, l->re, l->f_turbulent, &x, &y2))
        return 0;
      const double top = fmin (y1, y2), bottom = fmax (y1, y2);
      *ax = x;
      *ay = 0.5 * (top + bottom);
      box->x = x - r;
      box->y = top - r;
      box->width = 2 * r;
      box->height = bottom - top + 2 * r;
    }
  else
    {
      if (!point_device (chart, l->re, l->f, &x, &y))
        return 0;
      *ax = x;
      *ay = y;
      box->x = x - r;
      box->y = y - r;
      box->width = 2 * r;
      box->height = 2 * r;
    }
  return *ax >= pl->x && *ax <= pl->x + pl->width && *ay >= pl->y
         && *ay <= pl->y + pl->height;
}

static void
label_text (const ChartLine *cl, int compact, char *buf, size_t size)
{
  snprintf (buf, size, "%s", cl->name ? cl->name : "");
  if (compact)
    return;
  const char *parts[] = { cl->velocity, cl->head100, cl->headtotal };
  for (size_t i = 0; i < G_N_ELEMENTS (parts); i++)
    if (parts[i] != NULL && parts[i][0] != '\0')
      {
        g_strlcat (buf, "\n", size);
        g_strlcat (buf, parts[i], size);
      }
}

PangoLayout *
_rugosa_chart_label_layout (RugosaChart *chart, size_t i, int compact,
                            double *w, double *h)
{
  char text[512];
  const double k = chart->lay.k;
  label_text (&chart->lines[i], compact, text, sizeof text);
  PangoLayout *l = _rugosa_chart_text (chart, text, chart->lay.font_label,
                                       compact ? TEXT_BOLD : TEXT_FIRST_BOLD, 0);
  _rugosa_chart_text_size (l, w, h);
  /* padding and the shape swatch; whole pixels (see draw_label) */
  *w = ceil (*w + 2 * 5 * k + 13 * k);
  *h = ceil (*h + 2 * 3.5 * k);
  return l;
}

/* The box a label takes, measured with every digit written as 0: the
 * chart's font has digits of one width, so the box is the label's own,
 * and a new service age (new digits, same shape) needs no new text
 * shaped to place the labels, and keeps their boxes. */
void
_rugosa_chart_label_size (RugosaChart *chart, size_t i, int compact, double *w,
                          double *h)
{
  char text[512];
  const double k = chart->lay.k;
  label_text (&chart->lines[i], compact, text, sizeof text);
  for (char *c = text; *c != '\0'; c++)
    if (*c >= '1' && *c <= '9')
      *c = '0';
  PangoLayout *l = _rugosa_chart_text (chart, text, chart->lay.font_label,
                                       compact ? TEXT_BOLD : TEXT_FIRST_BOLD, 0);
  _rugosa_chart_text_size (l, w, h);
  /* padding and the shape swatch, whole pixels, and a pixel to spare for
   * the kerning of the real digits */
  *w = ceil (*w + 2 * 5 * k + 13 * k + 1);
  *h = ceil (*h + 2 * 3.5 * k);
}

/* The number beside an unlabelled marker: its text and its layout. */
PangoLayout *
_rugosa_chart_tag_layout (RugosaChart *chart, size_t i, double *w, double *h)
{
  char text[24];
  const int number = chart->lines[i].line.number > 0 ? chart->lines[i].line.number
                                                      : (int) i + 1;
  snprintf (text, sizeof text, "%d", number);
  PangoLayout *l = _rugosa_chart_text (chart, text, chart->lay.font_label * 0.78,
                                       TEXT_BOLD, 0);
  _rugosa_chart_text_size (l, w, h);
  *w = ceil (*w + 2 * chart->lay.k);
  *h = ceil (*h);
  return l;
}

/* ---- candidates ---- */

enum {
  RINGS = 4,             /* for ordinary lines: out to about 60 px */
  RINGS_FAR = 10,        /* for the selected and pinned lines */
  DIRS = 8,
};

static const int DIR_XY[DIRS][2] = {
  { 1, -1 }, { 1, 1 }, { -1, -1 }, { -1, 1 }, { 1, 0 }, { -1, 0 }, { 0, -1 }, { 0, 1 },
};

/* A w × h box `d` away from the anchor in direction `dir`; a diagonal
 * box comes in to 0.72·d (near the circle of radius d) but no nearer than
 * `d_min`, which keeps it off the marker's own square. */
static RugosaChartRect
candidate (double ax, double ay, double d, double d_min, double w, double h,
           int dir)
{
  const int dx = DIR_XY[dir][0], dy = DIR_XY[dir][1];
  const double dd = (dx != 0 && dy != 0) ? fmax (d * 0.72, d_min) : d;
  RugosaChartRect r;
  r.width = w;
  r.height = h;
  r.x = round (dx > 0 ? ax + dd : dx < 0 ? ax - dd - w : ax - w / 2);
  r.y = round (dy > 0 ? ay + dd : dy < 0 ? ay - dd - h : ay - h / 2);
  return r;
}

typedef struct {
  Index ix;
  RugosaChartRect bounds;
} Space;

static int
space_free (const Space *s, const RugosaChartRect *r, unsigned mask)
{
  return _rugosa_chart_rect_inside (r, &s->bounds) && !index_hits (&s->ix, r, mask);
}

/* The first free candidate, the previous one first; 0 on success. */
static int
try_rings (const Space *s, const ChartLabel *lb, double w, double h, double k,
           int rings, unsigned mask, int *ring_out, int *dir_out, RugosaChartRect *out)
{
  const double mr = fmax (lb->info.marker.width, lb->info.marker.height) / 2;
#define RING_D(ring) (mr + 3 * k + (ring) * 16 * k)
  if (lb->ring >= 0 && lb->ring < rings)
    {
      RugosaChartRect r = candidate (lb->ax, lb->ay, RING_D (lb->ring), mr + 1.5 * k, w, h,
                                     lb->dir);
      if (space_free (s, &r, mask))
        {
          *ring_out = lb->ring;
          *dir_out = lb->dir;
          *out = r;
          return 0;
        }
    }
  for (int ring = 0; ring < rings; ring++)
    for (int dir = 0; dir < DIRS; dir++)
      {
        RugosaChartRect r = candidate (lb->ax, lb->ay, RING_D (ring), mr + 1.5 * k, w, h, dir);
        if (space_free (s, &r, mask))
          {
            *ring_out = ring;
            *dir_out = dir;
            *out = r;
            return 0;
          }
      }
#undef RING_D
  return -1;
}

/* Full text then the name alone; clear of the background's labels, then
 * over them; for a line that must be labelled, further out and finally
 * over other markers. */
static int
place_label (RugosaChart *chart, Space *s, size_t i, int must, double room_full,
             double room_compact)
{
  static const struct { int compact; int far; unsigned mask; } ATTEMPTS[] = {
    { 0, 0, BOX_MARKER | BOX_LABEL | BOX_LEGEND | BOX_SOFT | BOX_TAG },
    { 0, 0, BOX_MARKER | BOX_LABEL | BOX_LEGEND | BOX_TAG },
    { 1, 0, BOX_MARKER | BOX_LABEL | BOX_LEGEND | BOX_SOFT | BOX_TAG },
    { 1, 0, BOX_MARKER | BOX_LABEL | BOX_LEGEND | BOX_TAG },
    /* only for the selected and pinned lines */
    { 0, 1, BOX_MARKER | BOX_LABEL | BOX_LEGEND | BOX_TAG },
    { 1, 1, BOX_MARKER | BOX_LABEL | BOX_LEGEND | BOX_TAG },
    { 0, 1, BOX_LABEL | BOX_LEGEND },
    { 1, 1, BOX_LABEL | BOX_LEGEND },
  };
  ChartLabel *lb = &chart->labels[i];
  const double k = chart->lay.k;
  const size_t n_attempts = must ? G_N_ELEMENTS (ATTEMPTS) : 4;

  for (size_t a = 0; a < n_attempts; a++)
    {
      double w, h;
      int ring = 0, dir = 0;
      RugosaChartRect r;
      _rugosa_chart_label_size (chart, i, ATTEMPTS[a].compact, &w, &h);
      if (w * h > (ATTEMPTS[a].compact ? room_compact : room_full))
        continue;
      if (try_rings (s, lb, w, h, k, ATTEMPTS[a].far ? RINGS_FAR : RINGS, ATTEMPTS[a].mask,
                     &ring, &dir, &r) != 0)
        continue;
      lb->info.visible = 1;
      lb->info.compact = ATTEMPTS[a].compact;
      lb->info.has_leader = ring > 0;
      lb->info.box = r;
      lb->ring = (signed char) ring;
      lb->dir = (signed char) dir;
      index_add (&s->ix, &r, BOX_LABEL);
      return 1;
    }
  return 0;
}

/* The number beside an unlabelled marker, touching it. */
static void
place_tag (RugosaChart *chart, Space *s, size_t i)
{
  static const int TAG_DIRS[] = { 4, 0, 1, 5, 2, 3, 6, 7 };
  ChartLabel *lb = &chart->labels[i];
  const double half = fmax (lb->info.marker.width, lb->info.marker.height) / 2;
  const unsigned masks[] = { BOX_MARKER | BOX_LABEL | BOX_LEGEND | BOX_TAG | BOX_SOFT,
                             BOX_MARKER | BOX_LABEL | BOX_LEGEND | BOX_TAG };
  double w, h;

  (void) _rugosa_chart_tag_layout (chart, i, &w, &h);
  for (size_t m = 0; m < G_N_ELEMENTS (masks); m++)
    for (size_t d = 0; d < G_N_ELEMENTS (TAG_DIRS); d++)
      {
        RugosaChartRect r = candidate (lb->ax, lb->ay, half, half, w, h, TAG_DIRS[d]);
        if (space_free (s, &r, masks[m]))
          {
            lb->info.numbered = 1;
            lb->info.tag = r;
            index_add (&s->ix, &r, BOX_TAG);
            return;
          }
      }
}

/* The design rule for callouts: together they cover at most
 * CALLOUT_SHARE of the plot's area, and full callouts (name and readouts)
 * stop at FULL_SHARE; past these a line gets its name alone, then its
 * number beside the marker, keyed to the legend.  The selected and pinned
 * lines are labelled whatever the share (their area counts).  Measured on
 * the demo project: 4.7 % at 1280 × 720, 14.7 % at 640 × 400 before the
 * rule. */
#define FULL_SHARE 0.10
#define CALLOUT_SHARE 0.15

/* How many ordinary labels a plot of this size holds legibly: a label of
 * four short lines takes about 120 × 55 px at k = 1; past a third of the
 * plot's area the chart reads as text rather than as a chart. */
static size_t
label_budget (const ChartLayout *lay)
{
  const double area = lay->plot.width * lay->plot.height;
  const double label = 120 * 55 * lay->k * lay->k;
  return (size_t) fmin (RUGOSA_CHART_LABELS_MAX, fmax (6, floor (area / 3 / label)));
}

static int
priority (const RugosaChartLine *l)
{
  return l->selected ? 0 : l->pinned ? 1 : 2;
}

static int
cmp_priority (gconstpointer a, gconstpointer b, gpointer data)
{
  const RugosaChart *chart = data;
  const size_t i = *(const size_t *) a, j = *(const size_t *) b;
  const int pi = priority (&chart->lines[i].line), pj = priority (&chart->lines[j].line);
  if (pi != pj)
    return pi - pj;
  return (i > j) - (i < j);
}

/* The placement bounds: the plot less a small margin, on whole pixels. */
static RugosaChartRect
placement_bounds (const ChartLayout *lay)
{
  RugosaChartRect b = { lay->plot.x + 3, lay->plot.y + 3, lay->plot.width - 6,
                        lay->plot.height - 6 };
  b.x = ceil (b.x);
  b.y = ceil (b.y);
  b.width = floor (b.width);
  b.height = floor (b.height);
  return b;
}

void
_rugosa_chart_place_labels (RugosaChart *chart)
{
  const ChartLayout *lay = &chart->lay;
  const size_t n = chart->n_lines;
  Space s;
  ChartLabel *old = chart->labels;
  const size_t n_old = chart->n_labels;

  s.bounds = placement_bounds (lay);
  /* buckets about the size of a marker's neighbourhood */
  index_init (&s.ix, &s.bounds, fmax (16.0, 32.0 * lay->k));

  chart->labels = g_new0 (ChartLabel, n ? n : 1);
  chart->n_labels = n;
  if (chart->bg_boxes_valid)
    for (size_t b = 0; b < chart->n_bg_boxes; b++)
      index_add (&s.ix, &chart->bg_boxes[b], BOX_SOFT);
  /* a sizing's ladder (chart-ladder.c) is avoided like the background's
   * labels */
  if (chart->n_ladder > 0)
    {
      RugosaChartRect *rungs = g_new (RugosaChartRect, chart->n_ladder);
      const size_t n_rungs = _rugosa_chart_ladder_boxes (chart, rungs);
      for (size_t b = 0; b < n_rungs; b++)
        index_add (&s.ix, &rungs[b], BOX_SOFT);
      g_free (rungs);
    }

  size_t *order = g_new (size_t, n ? n : 1);
  size_t n_order = 0;
  for (size_t i = 0; i < n; i++)
    {
      ChartLabel *lb = &chart->labels[i];
      /* the same line as last time (same index, same name) keeps trying
       * its previous place first, so labels stay put as markers move */
      lb->ring = lb->dir = -1;
      if (old != NULL && i < n_old && old[i].info.visible
          && old[i].key_name == g_str_hash (chart->lines[i].name))
        {
          lb->ring = old[i].ring;
          lb->dir = old[i].dir;
        }
      lb->key_name = g_str_hash (chart->lines[i].name);
      if (marker_geometry (chart, i, &lb->ax, &lb->ay, &lb->info.marker))
        {
          index_add (&s.ix, &lb->info.marker, BOX_MARKER);
          order[n_order++] = i;
        }
      else
        lb->info.marker = (RugosaChartRect) { 0, 0, 0, 0 };
    }
  g_free (old);
  /* the legend after the markers: it takes the corner that hides least */
  chart->legend = _rugosa_chart_legend_geometry (chart);
  index_add (&s.ix, &chart->legend, BOX_LEGEND);
  g_qsort_with_data (order, (gint) n_order, sizeof *order, cmp_priority, chart);

  /* Labels: the selected and pinned lines whatever it takes, the others
   * while the budget lasts; a failed attempt costs as much as a placed
   * label, so attempts are bounded too. */
  const size_t budget = label_budget (lay);
  const double plot_area = lay->plot.width * lay->plot.height;
  double covered = 0;
  size_t placed = 0, attempts = 0;
  for (size_t o = 0; o < n_order; o++)
    {
      const size_t i = order[o];
      const int must = priority (&chart->lines[i].line) < 2;
      if (!must && (placed >= budget || attempts >= 3 * budget
                    || attempts >= RUGOSA_CHART_LABEL_TRIES))
        continue;
      if (!must)
        attempts++;
      const double room_full = must ? INFINITY : FULL_SHARE * plot_area - covered;
      const double room_compact = must ? INFINITY : CALLOUT_SHARE * plot_area - covered;
      if (!place_label (chart, &s, i, must, room_full, room_compact))
        continue;
      covered += chart->labels[i].info.box.width * chart->labels[i].info.box.height;
      if (!must)
        placed++;
    }
  /* Numbers for the rest, in list order. */
  for (size_t i = 0; i < n; i++)
    if (!chart->labels[i].info.visible && chart->labels[i].info.marker.width > 0)
      place_tag (chart, &s, i);

  g_free (order);
  index_clear (&s.ix);
  for (size_t i = 0; i < n; i++)
    _rugosa_chart_label_key (chart, i, &chart->labels[i]);
  chart->placement_valid = 1;
  chart->placement_stale = 0;
  chart->placement_saw_bg_boxes = chart->bg_boxes_valid;
  chart->placements++;
}

/* ---- when to place again ---- */

void
_rugosa_chart_label_key (RugosaChart *chart, size_t i, ChartLabel *lb)
{
  const RugosaChartLine *l = &chart->lines[i].line;
  lb->key_x = lround (lb->ax);
  lb->key_y = lround (lb->ay);
  lb->key_h = lround (lb->info.marker.height);
  lb->key_flags = (l->selected ? 1u : 0u) | (l->pinned ? 2u : 0u)
                  | (lb->info.marker.width > 0 ? 4u : 0u);
  lb->key_number = l->number;
}

/* After new lines: whether the last placement still holds.  It does when
 * the lines are the same in number, every marker is where it was to the
 * pixel with the same selection, pins and number, the legend is the same
 * box and every placed label measures as its box. */
int
_rugosa_chart_placement_holds (RugosaChart *chart)
{
  if (!chart->placement_valid || chart->labels == NULL
      || chart->n_labels != chart->n_lines)
    return 0;
  for (size_t i = 0; i < chart->n_lines; i++)
    {
      ChartLabel *lb = &chart->labels[i];
      ChartLabel now = *lb;
      RugosaChartRect marker;
      if (!marker_geometry (chart, i, &now.ax, &now.ay, &marker))
        marker = (RugosaChartRect) { 0, 0, 0, 0 };
      now.info.marker = marker;
      _rugosa_chart_label_key (chart, i, &now);
      if (now.key_x != lb->key_x || now.key_y != lb->key_y || now.key_h != lb->key_h
          || now.key_flags != lb->key_flags || now.key_number != lb->key_number
          || lb->key_name != g_str_hash (chart->lines[i].name))
        return 0;
    }
  const RugosaChartRect legend = _rugosa_chart_legend_geometry (chart);
  if (memcmp (&legend, &chart->legend, sizeof legend) != 0)
    return 0;
  for (size_t i = 0; i < chart->n_lines; i++)
    {
      ChartLabel *lb = &chart->labels[i];
      double w, h;
      if (!lb->info.visible)
        continue;
      _rugosa_chart_label_size (chart, i, lb->info.compact, &w, &h);
      if (w != lb->info.box.width || h != lb->info.box.height)
        return 0;
    }
  /* markers keep their places: only their sub-pixel positions move */
  for (size_t i = 0; i < chart->n_lines; i++)
    {
      ChartLabel *lb = &chart->labels[i];
      if (!marker_geometry (chart, i, &lb->ax, &lb->ay, &lb->info.marker))
        lb->info.marker = (RugosaChartRect) { 0, 0, 0, 0 };
    }
  return 1;
}
