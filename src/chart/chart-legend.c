/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The legend: one row per line (its marker shape and colour, its number
 * when some markers carry numbers instead of labels, its name), then a key
 * to the symbols the chart draws — the flow range, the aging trail, a
 * transitional operating point, the lines' own roughness curves — and to
 * the fills of the regime and roughness-zone bands.  The key shows only
 * what the chart shows.
 *
 * Size: rows of one height; the band swatches flow several to a row.  The
 * whole legend takes at most LEGEND_SHARE of the plot's height: the lines'
 * rows give way first (the last one counts the lines left out); the band
 * key goes when the lines would not all fit or the legend would cover
 * more than a tenth of the plot; the symbols' key stays while three
 * lines keep their rows within 15 % of the plot — when not every line
 * can have a row, the legend then shows three and counts the rest, whose
 * markers carry their numbers in the list.
 *
 * Place: on a wide chart, a column of its own beside the plot
 * (chart-geometry.c); else a few candidate corners, the one covering the
 * least data winning —
 * operating points and flow-range ends count most, then the background's
 * own labels, the laminar line and the roughness curves; ties go to the
 * first candidate, the foot of the turbulent strip, which on default axes
 * lies below the smooth-pipe curve where no operating point can fall.
 * Cost: O(N) per candidate for N lines, plus the curves' samples. */
#include "chart-private.h"

#include <glib/gi18n-lib.h>
#include <math.h>
#include <stdio.h>
#include <string.h>

/* The legend's height at most, as a share of the plot's. */
#define LEGEND_SHARE 0.62
/* The legend's area at most, as a share of the plot's, with the whole
 * key and with the symbols' key alone; past both, no key. */
static const double KEY_AREA_SHARE[] = { 0.10, 0.15 };

typedef enum {
  ENTRY_LINE,
  ENTRY_MORE,
  ENTRY_FLOW,
  ENTRY_TRAIL,
  ENTRY_RANGE,
  ENTRY_CURVE,
  ENTRY_HEADING,
  ENTRY_BAND,
} EntryKind;

typedef struct {
  EntryKind kind;
  int line;              /* ENTRY_LINE: the line's index */
  int band;              /* ENTRY_BAND: index into BANDS */
  double x, y;           /* top left, from the legend's top left */
  char *text;
} LegendEntry;

/* The band names are the ones the chart writes on its bands
 * (chart-bands.c): the same translatable strings. */
static const struct { const char *name; int hatched; } BANDS[] = {
  { N_("laminar"), 0 },
  { N_("transitional"), 1 },
  { N_("hydraulically smooth"), 0 },
  { N_("transitionally rough"), 0 },
  { N_("fully rough"), 0 },
};

static const RugosaChartRgba *
band_fill (const RugosaChartPalette *p, int band)
{
  switch (band)
    {
    case 0:
      return &p->band_laminar;
    case 1:
      return &p->band_transitional;
    case 2:
      return &p->band_smooth;
    case 3:
      return &p->band_transitionally_rough;
    default:
      return &p->band_fully_rough;
    }
}

static void
entries_clear (RugosaChart *chart)
{
  if (chart->legend_entries == NULL)
    return;
  for (guint i = 0; i < chart->legend_entries->len; i++)
    g_free (g_array_index (chart->legend_entries, LegendEntry, i).text);
  g_array_set_size (chart->legend_entries, 0);
}

void
_rugosa_chart_free_legend (RugosaChart *chart)
{
  entries_clear (chart);
  g_clear_pointer (&chart->legend_entries, g_array_unref);
}

static double
font (const RugosaChart *chart)
{
  return chart->lay.font_label * 0.95;
}

static double
row_height (const RugosaChart *chart)
{
  return ceil (chart->lay.font_label * 1.45);
}

static double
text_width (RugosaChart *chart, const char *text, ChartTextStyle style)
{
  double w, h;
  PangoLayout *l = _rugosa_chart_text (chart, text, font (chart), style, 0);
  _rugosa_chart_text_size (l, &w, &h);
  return w;
}

/* Line `row` of the legend: the selected line first, then the pinned
 * ones, then the others in list order; -1 past the end. */
static int
legend_line (const RugosaChart *chart, size_t row)
{
  size_t seen = 0;
  for (int pass = 0; pass < 3; pass++)
    for (size_t i = 0; i < chart->n_lines; i++)
      {
        const RugosaChartLine *l = &chart->lines[i].line;
        const int p = l->selected ? 0 : l->pinned ? 1 : 2;
        if (p != pass)
          continue;
        if (seen++ == row)
          return (int) i;
      }
  return -1;
}

static int
line_number (const RugosaChart *chart, size_t i)
{
  return chart->lines[i].line.number > 0 ? chart->lines[i].line.number : (int) i + 1;
}

/* Whether the legend shows the lines' numbers, their places in the list:
 * whenever there are several lines, so that a marker that carries its
 * number instead of a label (decided after the legend is placed) is
 * always keyed, and the legend reads like the window's list. */
static int
shows_numbers (const RugosaChart *chart)
{
  return chart->n_lines > 1;
}

/* What the chart draws, so the key explains only that. */
typedef struct {
  int flow, trail, range, curve, bands;
} KeyNeeds;

static void
key_needs (const RugosaChart *chart, KeyNeeds *n)
{
  memset (n, 0, sizeof *n);
  for (size_t i = 0; i < chart->n_lines; i++)
    {
      const RugosaChartLine *l = &chart->lines[i].line;
      n->flow |= l->has_flow_min || l->has_flow_max;
      n->trail |= l->n_trail >= 2;
      n->range |= l->regime == RG_REGIME_TRANSITIONAL;
    }
  n->curve = (chart->spec.show & RUGOSA_CHART_SHOW_CURVES) && chart->n_user_rr > 0;
  n->bands = (chart->spec.show & RUGOSA_CHART_SHOW_BANDS) != 0;
}

static void
add (RugosaChart *chart, EntryKind kind, int line, int band, double x, double y,
     char *text)
{
  const LegendEntry e = { kind, line, band, x, y, text };
  g_array_append_val (chart->legend_entries, e);
}

/* The key's entries from `y` down; returns the height used.  The band
 * swatches wrap to the width the other rows take (at least `width`, at
 * most `max_width`), so they never make the legend wider than it is. */
static double
plan_key (RugosaChart *chart, const KeyNeeds *need, double y0, double width,
          double max_width, double *wmax)
{
  const double k = chart->lay.k, row = row_height (chart);
  const double sample = 24 * k;   /* a symbol's sample, then the text */
  double y = y0;
  struct { int on; EntryKind kind; char *text; } rows[] = {
    /* TRANSLATORS: the legend's key to the wide stroke along a line's
     * curve from its minimum to its maximum flow */
    { need->flow, ENTRY_FLOW, g_strdup (_("flow range, minimum to maximum")) },
    { need->trail, ENTRY_TRAIL,
      chart->spec.age_text[0] != '\0'
        /* TRANSLATORS: the legend's key to the dashed aging trail; %s is
         * the service age shown, e.g. "25 years" */
        ? g_strdup_printf (_("aging, new → %s"), chart->spec.age_text)
        /* TRANSLATORS: the same without a known service age */
        : g_strdup (_("aging, new → service age")) },
    /* TRANSLATORS: the legend's key to a point in the transitional range,
     * drawn as a bar from the laminar to the turbulent value */
    { need->range, ENTRY_RANGE, g_strdup (_("transitional: laminar to turbulent f")) },
    /* TRANSLATORS: the legend's key to the bold Colebrook curve drawn
     * through each line's relative roughness when new */
    { need->curve, ENTRY_CURVE, g_strdup (_("curve of a line’s ε/D, new")) },
  };

  for (size_t r = 0; r < G_N_ELEMENTS (rows); r++)
    {
      if (!rows[r].on)
        {
          g_free (rows[r].text);
          continue;
        }
      *wmax = fmax (*wmax, sample + text_width (chart, rows[r].text, TEXT_PLAIN));
      add (chart, rows[r].kind, -1, -1, 0, y, rows[r].text);
      y += row;
    }
  if (!need->bands)
    return y - y0;

  /* Swatches flow left to right, wrapping at the inner width; the
   * turbulent zones start a row of their own under a short heading. */
  const double swatch = 18 * k, gap = 10 * k;
  double x = 0;
  width = fmax (width, *wmax);
  for (size_t b = 0; b < G_N_ELEMENTS (BANDS); b++)
    width = fmax (width, swatch + text_width (chart, _(BANDS[b].name), TEXT_PLAIN));
  width = fmin (width, max_width);
  for (size_t b = 0; b < G_N_ELEMENTS (BANDS); b++)
    {
      if (b == 2)
        {
          /* TRANSLATORS: in the legend, before the fills of the three
           * roughness zones of the turbulent range */
          const char *heading = _("turbulent:");
          y += x > 0 ? row : 0;
          x = 0;
          add (chart, ENTRY_HEADING, -1, -1, 0, y, g_strdup (heading));
          x = text_width (chart, heading, TEXT_PLAIN) + gap;
          *wmax = fmax (*wmax, x);
        }
      const char *name = _(BANDS[b].name);
      const double w = swatch + text_width (chart, name, TEXT_PLAIN);
      if (x > 0 && x + w > width)
        {
          y += row;
          x = 0;
        }
      add (chart, ENTRY_BAND, -1, (int) b, x, y, g_strdup (name));
      *wmax = fmax (*wmax, x + w);
      x += w + gap;
    }
  y += row;
  return y - y0;
}

/* The entries and the legend's size; 0 when there is no legend. */
static int
plan (RugosaChart *chart, double *width, double *height)
{
  const ChartLayout *lay = &chart->lay;
  const double k = lay->k, row = row_height (chart), pad = 5 * k;
  KeyNeeds need;

  if (chart->legend_entries == NULL)
    chart->legend_entries = g_array_new (FALSE, FALSE, sizeof (LegendEntry));
  entries_clear (chart);
  if (!(chart->spec.show & RUGOSA_CHART_SHOW_LEGEND) || chart->n_lines == 0)
    return 0;

  /* the width the lines' rows ask for: marker, number, name; numbers
   * measured as zeros (digits of one width) */
  char num[24];
  int max_number = 0;
  for (size_t i = 0; i < chart->n_lines; i++)
    max_number = MAX (max_number, line_number (chart, i));
  snprintf (num, sizeof num, "%d", max_number);
  for (char *c = num; *c; c++)
    *c = '0';
  const double num_w = text_width (chart, num, TEXT_BOLD) + 5 * k;
  const int side = lay->side_w > 0;
  const double max_w = side ? lay->side_w - 12 * k - 2 * pad
                            : fmax (120 * k, 0.42 * lay->plot.width) - 2 * pad;
  double wmax = 0;

  /* the key first: it is what the lines' rows must leave room for */
  key_needs (chart, &need);
  const size_t max_rows = (size_t) fmax (1, floor (((side ? 1.0 : LEGEND_SHARE) * lay->plot.height
                                                     - 2 * pad) / row));
  double lines_w = 0;
  for (size_t r = 0; r < MIN (chart->n_lines, max_rows); r++)
    lines_w = fmax (lines_w, 16 * k + num_w
                               + text_width (chart, chart->lines[legend_line (chart, r)].name, TEXT_BOLD));
  /* The whole key while every line keeps its row; else the symbols
   * without the bands (whose names the chart writes on them) while three
   * lines keep theirs; else no key. */
  double key_w = 0, key_h = 0;
  GArray *key = NULL;
  size_t line_rows = MIN (chart->n_lines, max_rows);
  for (int variant = 0; variant < 2; variant++)
    {
      GArray *saved = chart->legend_entries;
      KeyNeeds try = need;
      double w = 0;
      try.bands = variant == 0 && need.bands;
      chart->legend_entries = g_array_new (FALSE, FALSE, sizeof (LegendEntry));
      const double h = plan_key (chart, &try, 0, lines_w, max_w, &w);
      GArray *entries = chart->legend_entries;
      chart->legend_entries = saved;
      const size_t rows = (size_t) lround (h / row);
      const size_t keep = variant == 0 ? chart->n_lines : MIN (chart->n_lines, 3);
      /* the lines' rows beside this key; when they cannot all have one,
       * the symbols' key keeps three and the count of the rest (the
       * others are numbered on the plot as in the list) */
      const size_t fit = max_rows - MIN (rows + 1, max_rows);
      const size_t shown = variant == 1 && chart->n_lines > fit ? MIN (fit, keep + 1)
                                                                 : MIN (chart->n_lines, fit);
      /* the legend's area with this key, at most KEY_AREA_SHARE[variant]
       * of the plot's: on a small plot the key gives way first */
      const double area = (fmax (fmin (fmax (lines_w, w), max_w), 70 * k) + 2 * pad)
                          * ((double) (rows + shown) * row + 6 * k + 2 * pad);
      if (entries->len > 0 && rows + keep + 1 <= max_rows
          && (side || area <= KEY_AREA_SHARE[variant] * lay->plot.width * lay->plot.height))
        {
          key = entries;
          key_w = w;
          key_h = h;
          line_rows = shown;
          break;
        }
      for (guint i = 0; i < entries->len; i++)
        g_free (g_array_index (entries, LegendEntry, i).text);
      g_array_unref (entries);
    }

  double y = 0;
  for (size_t r = 0; r < line_rows; r++)
    {
      if (r == line_rows - 1 && chart->n_lines > line_rows)
        {
          const size_t n_more = chart->n_lines - line_rows + 1;
          /* TRANSLATORS: the last row of the chart's legend when not every
           * line fits; the lines without a label carry their number in
           * the list */
          char *more = g_strdup_printf (ngettext ("%zu more, numbered as in the list",
                                                  "%zu more, numbered as in the list", n_more),
                                        n_more);
          wmax = fmax (wmax, text_width (chart, more, TEXT_PLAIN));
          add (chart, ENTRY_MORE, -1, -1, 0, y, more);
        }
      else
        {
          const int i = legend_line (chart, r);
          /* measured bold: the selected line's name is drawn bold */
          wmax = fmax (wmax, 16 * k + num_w + text_width (chart, chart->lines[i].name, TEXT_BOLD));
          add (chart, ENTRY_LINE, i, -1, 0, y, g_strdup (chart->lines[i].name));
        }
      y += row;
    }
  if (key != NULL)
    {
      y += 6 * k;   /* the rule between the lines and the key */
      chart->legend_rule = y - 3 * k;
      for (guint i = 0; i < key->len; i++)
        {
          LegendEntry e = g_array_index (key, LegendEntry, i);
          e.y += y;
          g_array_append_val (chart->legend_entries, e);
        }
      y += key_h;
      wmax = fmax (wmax, key_w);
      g_array_unref (key);
    }
  else
    chart->legend_rule = 0;
  chart->legend_num_w = num_w;

  *width = ceil (fmin (fmax (wmax, 70 * k), max_w) + 2 * pad);
  *height = ceil (y + 2 * pad);
  return 1;
}

/* ---- the place ---- */

static double
cover_points (const RugosaChart *chart, const RugosaChartRect *r)
{
  const ChartLayout *lay = &chart->lay;
  const double m = 6 * lay->k;
  const RugosaChartRect g = { r->x - m, r->y - m, r->width + 2 * m, r->height + 2 * m };
  double score = 0, x, y;

#define INSIDE(px, py) ((px) >= g.x && (px) <= g.x + g.width && (py) >= g.y && (py) <= g.y + g.height)
  for (size_t i = 0; i < chart->n_lines; i++)
    {
      const RugosaChartLine *l = &chart->lines[i].line;
      if (l->re > 0 && l->f > 0)
        {
          _rugosa_chart_xy (lay, l->re, l->f, &x, &y);
          score += INSIDE (x, y) ? 100 : 0;
        }
      if (l->has_flow_min && l->flow_min.re > 0 && l->flow_min.f > 0)
        {
          _rugosa_chart_xy (lay, l->flow_min.re, l->flow_min.f, &x, &y);
          score += INSIDE (x, y) ? 30 : 0;
        }
      if (l->has_flow_max && l->flow_max.re > 0 && l->flow_max.f > 0)
        {
          _rugosa_chart_xy (lay, l->flow_max.re, l->flow_max.f, &x, &y);
          score += INSIDE (x, y) ? 30 : 0;
        }
    }
  /* the background's labels (curve and band names) */
  if (chart->bg_boxes_valid)
    for (size_t b = 0; b < chart->n_bg_boxes; b++)
      score += _rugosa_chart_rects_overlap (&chart->bg_boxes[b], &g) ? 10 : 0;
  /* the laminar line, sampled */
  const double lam_max = chart->spec.transition.re_laminar_max;
  for (int s = 0; s <= 16; s++)
    {
      const double re = chart->spec.re_min * pow (lam_max / chart->spec.re_min, s / 16.0);
      _rugosa_chart_xy (lay, re, 64.0 / re, &x, &y);
      score += INSIDE (x, y) ? 3 : 0;
    }
  /* the roughness curves, lightly: they fill most of the plot; about 32
   * samples a curve, since this runs whenever a slider step asks whether
   * the placement holds */
  if (chart->geom_valid)
    for (size_t c = 0; c < chart->n_curves; c++)
      {
        const ChartCurve *cv = &chart->curves[c];
        const size_t step = MAX ((size_t) 1, cv->n / 32);
        for (size_t j = 0; j < cv->n; j += step)
          score += INSIDE (cv->x[j], cv->y[j]) ? (cv->is_user ? 1.0 : 0.2) * (double) step : 0;
      }
#undef INSIDE
  return score;
}

RugosaChartRect
_rugosa_chart_legend_geometry (RugosaChart *chart)
{
  const ChartLayout *lay = &chart->lay;
  const RugosaChartRect *pl = &lay->plot;
  const double k = lay->k, m = 10 * k;
  RugosaChartRect r = { 0, 0, 0, 0 }, best = r;
  double w, h, x, y;

  if (!plan (chart, &w, &h))
    return r;
  if (lay->side_w > 0)
    {
      /* beside the plot, level with its top */
      r.x = round (pl->x + pl->width + 12 * k);
      r.y = pl->y;
      r.width = w;
      r.height = h;
      return r;
    }
  _rugosa_chart_xy (lay, chart->spec.transition.re_turbulent_min, 0.02, &x, &y);
  const double foot = x + m + w <= pl->x + pl->width - m ? x + m : pl->x + m;
  const double left = pl->x + m, right = pl->x + pl->width - m - w;
  const double top = pl->y + m, bottom = pl->y + pl->height - m - h;
  const double cand[][2] = {
    { foot, bottom }, { right, bottom }, { right, top }, { left, top }, { left, bottom },
  };
  double best_score = INFINITY;
  for (size_t c = 0; c < G_N_ELEMENTS (cand); c++)
    {
      r.x = round (cand[c][0]);
      r.y = round (cand[c][1]);
      r.width = w;
      r.height = h;
      const double score = cover_points (chart, &r);
      if (score < best_score)
        {
          best_score = score;
          best = r;
        }
    }
  return best;
}

/* ---- drawing ---- */

static void
draw_sample (RugosaChart *chart, cairo_t *cr, const LegendEntry *e, double x0,
             double yc, const RugosaChartPalette *p)
{
  const double k = chart->lay.k;
  const double x1 = x0 + 18 * k;
  RugosaChartRgba tint = p->muted;

  /* as the overlay draws them, in a neutral ink (chart-overlay.c) */
  tint.r = 0.42 * p->muted.r + 0.58 * p->plot.r;
  tint.g = 0.42 * p->muted.g + 0.58 * p->plot.g;
  tint.b = 0.42 * p->muted.b + 0.58 * p->plot.b;
  cairo_save (cr);
  switch (e->kind)
    {
    case ENTRY_FLOW:
      cairo_set_line_cap (cr, CAIRO_LINE_CAP_ROUND);
      cairo_set_line_width (cr, 5 * k);
      cairo_move_to (cr, x0 + 2 * k, yc + 2 * k);
      cairo_line_to (cr, x1 - 2 * k, yc - 2 * k);
      _rugosa_chart_set_rgba (cr, &tint);
      cairo_stroke (cr);
      cairo_new_sub_path (cr);
      cairo_arc (cr, x0 + 2 * k, yc + 2 * k, 2.4 * k, 0, 2 * G_PI);
      cairo_new_sub_path (cr);
      cairo_arc (cr, x1 - 2 * k, yc - 2 * k, 2.4 * k, 0, 2 * G_PI);
      _rugosa_chart_set_rgba (cr, &p->muted);
      cairo_fill (cr);
      break;
    case ENTRY_TRAIL:
      {
        const double dash[] = { 3.5 * k, 2.5 * k };
        cairo_set_line_width (cr, 1.6 * k);
        cairo_set_dash (cr, dash, 2, 0);
        cairo_move_to (cr, x0 + 5 * k, yc + 2 * k);
        cairo_line_to (cr, x1 - 3 * k, yc - 2 * k);
        _rugosa_chart_set_rgba (cr, &p->muted);
        cairo_stroke (cr);
        cairo_set_dash (cr, NULL, 0, 0);
        cairo_new_sub_path (cr);
        cairo_arc (cr, x0 + 3 * k, yc + 2.4 * k, 2.6 * k, 0, 2 * G_PI);
        cairo_set_line_width (cr, 1.4 * k);
        cairo_stroke (cr);
        cairo_new_sub_path (cr);
        cairo_arc (cr, x1 - 2 * k, yc - 2.4 * k, 3 * k, 0, 2 * G_PI);
        cairo_fill (cr);
      }
      break;
    case ENTRY_RANGE:
      {
        const double xm = 0.5 * (x0 + x1), r = 2.6 * k;
        cairo_set_line_width (cr, 3 * k);
        cairo_move_to (cr, xm, yc - 4.5 * k);
        cairo_line_to (cr, xm, yc + 4.5 * k);
        _rugosa_chart_set_rgba (cr, &p->muted);
        cairo_stroke (cr);
        cairo_set_line_width (cr, 1.5 * k);
        for (int end = -1; end <= 1; end += 2)
          {
            cairo_new_sub_path (cr);
            cairo_arc (cr, xm, yc + end * 4.5 * k, r, 0, 2 * G_PI);
            _rugosa_chart_set_rgba (cr, &p->plot);
            cairo_fill_preserve (cr);
            _rugosa_chart_set_rgba (cr, &p->muted);
            cairo_stroke (cr);
          }
      }
      break;
    case ENTRY_CURVE:
      /* the bold stroke of chart-curves.c, gently bent like a curve */
      cairo_set_line_width (cr, 1.5 * k);
      cairo_move_to (cr, x0, yc - 4 * k);
      cairo_curve_to (cr, x0 + 7 * k, yc - 1 * k, x1 - 6 * k, yc + 3 * k, x1, yc + 3 * k);
      _rugosa_chart_set_rgba (cr, &p->smooth_curve);
      cairo_stroke (cr);
      break;
    default:
      break;
    }
  cairo_restore (cr);
}

static void
draw_swatch (RugosaChart *chart, cairo_t *cr, int band, double x, double yc,
             const RugosaChartPalette *p, const RugosaChartRgba *edge)
{
  const double k = chart->lay.k;
  const double w = round (13 * k), h = round (9 * k);
  const double sx = round (x), sy = round (yc - h / 2);

  _rugosa_chart_set_rgba (cr, band_fill (p, band));
  cairo_rectangle (cr, sx, sy, w, h);
  cairo_fill (cr);
  if (BANDS[band].hatched)
    {
      cairo_pattern_t *pat = _rugosa_chart_hatch_pattern (cr, p, chart->spec.theme, k);
      cairo_matrix_t mat;
      cairo_matrix_init_translate (&mat, -sx, -sy);
      cairo_pattern_set_matrix (pat, &mat);
      cairo_set_source (cr, pat);
      cairo_rectangle (cr, sx, sy, w, h);
      cairo_fill (cr);
      cairo_pattern_destroy (pat);
    }
  cairo_rectangle (cr, sx + 0.5, sy + 0.5, w - 1, h - 1);
  _rugosa_chart_set_rgba (cr, edge);
  cairo_set_line_width (cr, 1.0);
  cairo_stroke (cr);
}

static void
draw_legend (RugosaChart *chart, cairo_t *cr, const RugosaChartPalette *p)
{
  const ChartLayout *lay = &chart->lay;
  const RugosaChartRect *r = &chart->legend;
  const double k = lay->k, pad = 5 * k, row = row_height (chart);
  const int numbers = shows_numbers (chart);
  RugosaChartRgba border = p->grid;

  if (r->width <= 0 || chart->legend_entries == NULL)
    return;
  border.a = fmin (1, border.a * 3);
  /* everything inside the box, so its cached image is opaque */
  cairo_rectangle (cr, r->x, r->y, r->width, r->height);
  _rugosa_chart_set_rgba (cr, &p->plot);
  cairo_fill (cr);
  cairo_rectangle (cr, r->x + 0.5, r->y + 0.5, r->width - 1, r->height - 1);
  _rugosa_chart_set_rgba (cr, &border);
  cairo_set_line_width (cr, 1.0);
  cairo_stroke (cr);
  if (chart->legend_rule > 0)
    {
      const double yr = round (r->y + pad + chart->legend_rule) + 0.5;
      cairo_move_to (cr, r->x + pad, yr);
      cairo_line_to (cr, r->x + r->width - pad, yr);
      cairo_stroke (cr);
    }

  cairo_save (cr);
  cairo_rectangle (cr, r->x, r->y, r->width - 2 * k, r->height);
  cairo_clip (cr);
  for (guint n = 0; n < chart->legend_entries->len; n++)
    {
      const LegendEntry *e = &g_array_index (chart->legend_entries, LegendEntry, n);
      const double x = r->x + pad + e->x, y = r->y + pad + e->y, yc = y + row / 2;
      double tx = x + 24 * k, w, h;
      ChartTextStyle style = TEXT_PLAIN;
      const RugosaChartRgba *ink = &p->ink;

      switch (e->kind)
        {
        case ENTRY_LINE:
          {
            const RugosaChartLine *l = &chart->lines[e->line].line;
            _rugosa_chart_shape_path (cr, e->line, x + 6 * k, yc, 3.8 * k);
            _rugosa_chart_set_rgba (cr, &l->colour);
            cairo_fill (cr);
            tx = x + 16 * k;
            if (numbers)
              {
                char num[24];
                snprintf (num, sizeof num, "%d", line_number (chart, (size_t) e->line));
                PangoLayout *nl = _rugosa_chart_text (chart, num, font (chart), TEXT_BOLD, 0);
                _rugosa_chart_text_size (nl, &w, &h);
                _rugosa_chart_show (cr, nl, tx + chart->legend_num_w - 5 * k - w,
                                    y + (row - h) / 2, &p->muted, NULL, 0);
              }
            tx += chart->legend_num_w;
            style = l->selected ? TEXT_BOLD : TEXT_PLAIN;
          }
          break;
        case ENTRY_MORE:
          tx = x;
          ink = &p->muted;
          break;
        case ENTRY_HEADING:
          tx = x;
          ink = &p->muted;
          break;
        case ENTRY_BAND:
          draw_swatch (chart, cr, e->band, x, yc, p, &border);
          tx = x + 18 * k;
          break;
        default:
          draw_sample (chart, cr, e, x, yc, p);
          break;
        }
      PangoLayout *tl = _rugosa_chart_text (chart, e->text, font (chart), style, 0);
      _rugosa_chart_text_size (tl, &w, &h);
      _rugosa_chart_show (cr, tl, tx, y + (row - h) / 2, ink, NULL, 0);
    }
  cairo_restore (cr);
}

void
_rugosa_chart_draw_legend (RugosaChart *chart, cairo_t *cr, const RugosaChartPalette *p,
                           int cached)
{
  const RugosaChartRect *r = &chart->legend;
  if (r->width <= 0 || chart->legend_entries == NULL)
    return;
  if (!cached)
    {
      /* as its cached image is drawn, so both pictures agree */
      cairo_save (cr);
      cairo_set_antialias (cr, CAIRO_ANTIALIAS_FAST);
      draw_legend (chart, cr, p);
      cairo_restore (cr);
      return;
    }
  /* The legend changes only with the lines' names, shapes, colours,
   * numbers and selection, and with what the key shows: kept as pixels
   * between frames. */
  GString *key = g_string_new (NULL);
  g_string_append_printf (key, "%d|%.3f|%.3f|%g|%g|%g|%g|%d", chart->spec.theme, chart->lay.k,
                          chart->spec.scale, r->x, r->y, r->width, r->height,
                          shows_numbers (chart));
  for (guint n = 0; n < chart->legend_entries->len; n++)
    {
      const LegendEntry *e = &g_array_index (chart->legend_entries, LegendEntry, n);
      g_string_append_printf (key, "|%d|%g|%g|%s", (int) e->kind, e->x, e->y, e->text);
      if (e->kind == ENTRY_LINE)
        {
          const RugosaChartLine *l = &chart->lines[e->line].line;
          g_string_append_printf (key, "|%d|%d|%a|%a|%a|%a|%d", e->line, line_number (chart, (size_t) e->line),
                                  l->colour.r, l->colour.g, l->colour.b, l->colour.a, l->selected);
        }
    }
  if (chart->legend_img == NULL || chart->legend_key == NULL
      || !g_string_equal (key, chart->legend_key))
    {
      const double s = chart->spec.scale;
      g_clear_pointer (&chart->legend_img, cairo_surface_destroy);
      chart->legend_img = cairo_image_surface_create (CAIRO_FORMAT_ARGB32,
                                                      (int) ceil (r->width * s),
                                                      (int) ceil (r->height * s));
      cairo_surface_set_device_scale (chart->legend_img, s, s);
      cairo_t *lc = cairo_create (chart->legend_img);
      cairo_translate (lc, -r->x, -r->y);
      cairo_set_antialias (lc, CAIRO_ANTIALIAS_FAST); /* as in the overlay */
      draw_legend (chart, lc, p);
      cairo_destroy (lc);
      if (chart->legend_key)
        g_string_free (chart->legend_key, TRUE);
      chart->legend_key = key;
    }
  else
    g_string_free (key, TRUE);
  cairo_save (cr);
  cairo_set_source_surface (cr, chart->legend_img, r->x, r->y);
  cairo_set_operator (cr, CAIRO_OPERATOR_SOURCE);
  cairo_rectangle (cr, r->x, r->y, r->width, r->height);
  cairo_fill (cr);
  cairo_restore (cr);
}

char **
rugosa_chart_legend_entries (RugosaChart *chart)
{
  GPtrArray *out = g_ptr_array_new ();

  _rugosa_chart_ensure_placement (chart);
  const int numbers = shows_numbers (chart);
  for (guint n = 0; chart->legend.width > 0 && n < chart->legend_entries->len; n++)
    {
      const LegendEntry *e = &g_array_index (chart->legend_entries, LegendEntry, n);
      if (e->kind == ENTRY_LINE && numbers)
        g_ptr_array_add (out, g_strdup_printf ("%d %s", line_number (chart, (size_t) e->line),
                                               e->text));
      else
        g_ptr_array_add (out, g_strdup (e->text));
    }
  g_ptr_array_add (out, NULL);
  return (char **) g_ptr_array_free (out, FALSE);
}
