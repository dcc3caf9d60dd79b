/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The report's layout: text with one Pango context of fixed font options
 * (no hinting, so that a block measures the same when placed and when
 * drawn, on paper or in a PDF), tables, the placing of blocks on pages
 * and the page's frame (running header, footer with the page number).
 *
 * Every block is measured before it is placed and placed whole: a page
 * ends before a block that does not fit.  Only running text taller than
 * what is left of a page is split, between its lines.  The cost is linear
 * in the number of blocks (one measure and one draw each). */
#define G_LOG_DOMAIN "rugosa-report"

#include "config.h"

#include <glib/gi18n-lib.h>
#include <math.h>
#include <string.h>

#include "chart/report-private.h"
#include "chart/rugosa-chart.h"

/* The chart's lettering (chart-text.c), present wherever the Debian
 * package fonts-dejavu-core is. */
#define REPORT_FONT_FAMILY "DejaVu Sans"

/* Points. */
#define CELL_PAD_X 4.0
#define CELL_PAD_Y 1.3
#define TITLE_CELL_PAD 5.0

/* The report's own colours: dark ink, a muted grey for labels, hairline
 * rules, and one deep teal for the accents. */
static const RugosaChartRgba INK = { 0.12, 0.16, 0.20, 1.0 };
static const RugosaChartRgba MUTED = { 0.36, 0.40, 0.44, 1.0 };
static const RugosaChartRgba RULE = { 0.72, 0.76, 0.79, 1.0 };
static const RugosaChartRgba HEAD_FILL = { 0.90, 0.93, 0.945, 1.0 };
static const RugosaChartRgba ACCENT = { 0.09, 0.40, 0.43, 1.0 };

static const struct {
  double size;
  gboolean bold;
  gboolean italic;
} styles[REPORT_N_TEXT] = {
  [REPORT_TEXT_BODY] = { 8.6, FALSE, FALSE },
  [REPORT_TEXT_SMALL] = { 7.2, FALSE, FALSE },
  [REPORT_TEXT_HEADING] = { 11.5, TRUE, FALSE },
  [REPORT_TEXT_SUBHEADING] = { 9.8, TRUE, FALSE },
  [REPORT_TEXT_TITLE] = { 18.0, TRUE, FALSE },
  [REPORT_TEXT_LABEL] = { 6.4, TRUE, FALSE },
  [REPORT_TEXT_CELL] = { 7.0, FALSE, FALSE },
  [REPORT_TEXT_CELL_HEAD] = { 6.8, TRUE, FALSE },
};

static void
set_colour (cairo_t *cr, RugosaChartRgba c)
{
  cairo_set_source_rgba (cr, c.r, c.g, c.b, c.a);
}

static PangoContext *
report_context (RugosaReport *report)
{
  if (report->pango == NULL)
    {
      cairo_font_options_t *opt = cairo_font_options_create ();

      report->pango = pango_font_map_create_context (pango_cairo_font_map_get_default ());
      cairo_font_options_set_hint_style (opt, CAIRO_HINT_STYLE_NONE);
      cairo_font_options_set_hint_metrics (opt, CAIRO_HINT_METRICS_OFF);
      pango_cairo_context_set_font_options (report->pango, opt);
      /* one unit a point */
      pango_cairo_context_set_resolution (report->pango, 72.0);
      cairo_font_options_destroy (opt);
    }
  return report->pango;
}

PangoLayout *
_rugosa_report_layout (RugosaReport *report, const char *text,
                       ReportTextStyle style, double width)
{
  PangoLayout *layout = pango_layout_new (report_context (report));
  PangoFontDescription *fd = pango_font_description_from_string (REPORT_FONT_FAMILY);

  pango_font_description_set_absolute_size (fd, styles[style].size * PANGO_SCALE);
  if (styles[style].bold)
    pango_font_description_set_weight (fd, PANGO_WEIGHT_BOLD);
  if (styles[style].italic)
    pango_font_description_set_style (fd, PANGO_STYLE_ITALIC);
  pango_layout_set_font_description (layout, fd);
  pango_font_description_free (fd);
  if (width > 0.0)
    {
      pango_layout_set_width (layout, (int) (width * PANGO_SCALE));
      pango_layout_set_wrap (layout, PANGO_WRAP_WORD_CHAR);
    }
  pango_layout_set_text (layout, text != NULL ? text : "", -1);
  return layout;
}

static double
layout_height (PangoLayout *layout)
{
  int h;

  pango_layout_get_size (layout, NULL, &h);
  return (double) h / PANGO_SCALE;
}

static double
layout_width (PangoLayout *layout)
{
  int w;

  pango_layout_get_size (layout, &w, NULL);
  return (double) w / PANGO_SCALE;
}

static void
show (cairo_t *cr, PangoLayout *layout, double x, double y, RugosaChartRgba colour)
{
  set_colour (cr, colour);
  cairo_move_to (cr, x, y);
  pango_cairo_show_layout (cr, layout);
}

static void
hline (cairo_t *cr, double x0, double x1, double y, double width, RugosaChartRgba colour)
{
  set_colour (cr, colour);
  cairo_set_line_width (cr, width);
  cairo_move_to (cr, x0, y);
  cairo_line_to (cr, x1, y);
  cairo_stroke (cr);
}

/* --- blocks ------------------------------------------------------------ */

ReportBlock *
_rugosa_report_block_new (ReportBlockKind kind)
{
  ReportBlock *b = g_new0 (ReportBlock, 1);

  b->kind = kind;
  b->n_lines = -1;
  return b;
}

static void
table_free (ReportTable *table)
{
  if (table == NULL)
    return;
  g_ptr_array_unref (table->cells);
  g_free (table->row_height);
  g_free (table);
}

void
_rugosa_report_block_free (gpointer data)
{
  ReportBlock *b = data;

  g_free (b->text);
  table_free (b->table);
  if (b->chart != NULL)
    rugosa_chart_free (b->chart);
  if (b->plot != NULL)
    rugosa_plot_free (b->plot);
  if (b->children != NULL)
    g_ptr_array_unref (b->children);
  g_free (b);
}

ReportBlock *
_rugosa_report_text (RugosaReport *report, const char *text, ReportTextStyle style)
{
  ReportBlock *b = _rugosa_report_block_new (BLOCK_TEXT);

  b->text = g_strdup (text);
  b->style = style;
  return b;
}

ReportTable *
_rugosa_report_table_new (guint n_cols, guint n_header, const double *fraction)
{
  ReportTable *t = g_new0 (ReportTable, 1);

  g_assert (n_cols <= REPORT_TABLE_COLUMNS_MAX);
  t->n_cols = n_cols;
  t->n_header = n_header;
  for (guint i = 0; i < n_cols; i++)
    {
      t->fraction[i] = fraction[i];
      t->right[i] = i > 0;
    }
  t->cells = g_ptr_array_new_with_free_func (g_free);
  return t;
}

void
_rugosa_report_table_add (ReportTable *table, const char *cell)
{
  g_ptr_array_add (table->cells, g_strdup (cell));
}

void
_rugosa_report_table_take (ReportTable *table, char *cell)
{
  g_ptr_array_add (table->cells, cell);
}

/* The width of cell (row, col) with the cells it spans, and how many. */
static double
cell_width (const ReportTable *t, guint row, guint col, double width, guint *span)
{
  double w = t->fraction[col] * width;
  guint c = col + 1;

  while (c < t->n_cols && g_ptr_array_index (t->cells, row * t->n_cols + c) == NULL)
    w += t->fraction[c++] * width;
  if (span != NULL)
    *span = c - col;
  return w;
}

/* Measure (cr NULL) or draw a table; its height either way. */
static double
table_render (RugosaReport *report, ReportTable *t, cairo_t *cr, double x, double y, double width)
{
  guint n_rows = t->cells->len / t->n_cols;
  double top = y;

  if (cr == NULL)
    {
      g_free (t->row_height);
      t->row_height = g_new0 (double, n_rows);
      t->n_rows = n_rows;
    }
  for (guint r = 0; r < n_rows; r++)
    {
      const gboolean head = r < t->n_header;
      const ReportTextStyle style = head ? REPORT_TEXT_CELL_HEAD : REPORT_TEXT_CELL;
      double cx = x;

      if (cr != NULL && head)
        {
          set_colour (cr, HEAD_FILL);
          cairo_rectangle (cr, x, y, width, t->row_height[r]);
          cairo_fill (cr);
        }
      for (guint c = 0; c < t->n_cols; c++)
        {
          const char *text = g_ptr_array_index (t->cells, r * t->n_cols + c);
          guint span;
          double w;

          if (text == NULL)
            continue;
          w = cell_width (t, r, c, width, &span);
          if (*text != '\0')
            {
              g_autoptr (PangoLayout) layout = _rugosa_report_layout (report, text, style,
                                                                      w - 2 * CELL_PAD_X);

              /* a header spanning columns is centred over them */
              pango_layout_set_alignment (layout, head && span > 1 ? PANGO_ALIGN_CENTER
                                                  : t->right[c] ? PANGO_ALIGN_RIGHT
                                                  : PANGO_ALIGN_LEFT);
              if (cr == NULL)
                t->row_height[r] = MAX (t->row_height[r], layout_height (layout) + 2 * CELL_PAD_Y);
              else
                show (cr, layout, cx + CELL_PAD_X, y + CELL_PAD_Y, INK);
            }
          if (cr != NULL && head && span > 1 && r + 1 < t->n_header)
            /* a rule under a spanning header, short of its ends */
            hline (cr, cx + CELL_PAD_X, cx + w - CELL_PAD_X, y + t->row_height[r] - 0.5, 0.4, RULE);
          cx += w;
        }
      if (cr != NULL)
        hline (cr, x, x + width, y + t->row_height[r],
               r + 1 == t->n_header ? 0.8 : r + 1 == n_rows ? 0.8 : 0.3,
               r + 1 == t->n_header || r + 1 == n_rows ? INK : RULE);
      y += t->row_height[r];
    }
  if (cr != NULL)
    hline (cr, x, x + width, top, 0.8, INK);
  return y - top;
}

static double block_render (RugosaReport *report, ReportBlock *b, cairo_t *cr,
                            double x, double y, double width);

/* The title block: the kind of document, the project's title, then its
 * details in a grid of three columns. */
static double
title_render (RugosaReport *report, cairo_t *cr, double x, double y, double width)
{
  const guint n = report->title_cells->len / 2;
  const double cw = width / 3.0;
  double top = y;
  g_autoptr (PangoLayout) kind = _rugosa_report_layout (report, report->subtitle, REPORT_TEXT_LABEL, width);
  g_autoptr (PangoLayout) title = _rugosa_report_layout (report, report->title, REPORT_TEXT_TITLE, width);

  if (cr != NULL)
    {
      set_colour (cr, ACCENT);
      cairo_rectangle (cr, x, y, width, 3.0);
      cairo_fill (cr);
    }
  y += 9.0;
  if (cr != NULL)
    show (cr, kind, x, y, ACCENT);
  y += layout_height (kind) + 3.0;
  if (cr != NULL)
    show (cr, title, x, y, INK);
  y += layout_height (title) + 8.0;

  for (guint row = 0; row * 3 < n; row++)
    {
      double h = 0.0;

      /* measure the row, then draw it */
      for (int pass = 0; pass < (cr != NULL ? 2 : 1); pass++)
        for (guint c = 0; c < 3 && row * 3 + c < n; c++)
          {
            const char *label = g_ptr_array_index (report->title_cells, 2 * (row * 3 + c));
            const char *value = g_ptr_array_index (report->title_cells, 2 * (row * 3 + c) + 1);
            g_autoptr (PangoLayout) l = _rugosa_report_layout (report, label, REPORT_TEXT_LABEL,
                                                               cw - 2 * TITLE_CELL_PAD);
            g_autoptr (PangoLayout) v = _rugosa_report_layout (report, *value ? value : "—",
                                                               REPORT_TEXT_BODY, cw - 2 * TITLE_CELL_PAD);
            const double cx = x + c * cw;

            if (pass == 0)
              h = MAX (h, layout_height (l) + 2.0 + layout_height (v) + 2 * TITLE_CELL_PAD);
            else
              {
                show (cr, l, cx + TITLE_CELL_PAD, y + TITLE_CELL_PAD, MUTED);
                show (cr, v, cx + TITLE_CELL_PAD, y + TITLE_CELL_PAD + layout_height (l) + 2.0,
                      *value ? INK : MUTED);
                if (c > 0)
                  {
                    set_colour (cr, RULE);
                    cairo_set_line_width (cr, 0.4);
                    cairo_move_to (cr, cx, y + 3.0);
                    cairo_line_to (cr, cx, y + h - 3.0);
                    cairo_stroke (cr);
                  }
              }
          }
      if (cr != NULL)
        hline (cr, x, x + width, y, row == 0 ? 0.8 : 0.3, row == 0 ? INK : RULE);
      y += h;
    }
  if (cr != NULL)
    hline (cr, x, x + width, y, 0.8, INK);
  return y - top;
}

static double
text_render (RugosaReport *report, ReportBlock *b, cairo_t *cr, double x, double y, double width)
{
  const double indent = b->has_swatch ? 13.0 : 0.0;
  g_autoptr (PangoLayout) layout = _rugosa_report_layout (report, b->text, b->style, width - indent);
  const RugosaChartRgba colour = b->style == REPORT_TEXT_HEADING ? ACCENT
                                 : b->style == REPORT_TEXT_SMALL ? MUTED : INK;
  double h = layout_height (layout);

  if (b->n_lines >= 0)
    h = b->height;
  if (cr == NULL)
    return h;
  if (b->has_swatch)
    {
      /* the line's colour, as its marker on the chart */
      set_colour (cr, b->swatch);
      cairo_rectangle (cr, x, y + 1.5, 8.5, 8.5);
      cairo_fill (cr);
    }
  cairo_save (cr);
  cairo_rectangle (cr, x, y, width, h);
  cairo_clip (cr);
  show (cr, layout, x + indent, y - b->clip_top, colour);
  cairo_restore (cr);
  if (b->style == REPORT_TEXT_HEADING)
    hline (cr, x, x + width, y + h + 2.0, 0.6, ACCENT);
  return h;
}

static double
block_render (RugosaReport *report, ReportBlock *b, cairo_t *cr, double x, double y, double width)
{
  switch (b->kind)
    {
    case BLOCK_TEXT:
      return text_render (report, b, cr, x, y, width);
    case BLOCK_TABLE:
      return table_render (report, b->table, cr, x, y, width);
    case BLOCK_TITLE:
      return title_render (report, cr, x, y, width);
    case BLOCK_CHART:
      if (cr != NULL)
        {
          /* the chart engine, as on screen, stroked directly (vector) */
          /* the engine paints its whole surface: keep it to the figure */
          cairo_save (cr);
          cairo_rectangle (cr, x, y, rugosa_chart_get_spec (b->chart)->width,
                           rugosa_chart_get_spec (b->chart)->height);
          cairo_clip (cr);
          cairo_translate (cr, x, y);
          rugosa_chart_draw_direct (b->chart, cr);
          cairo_restore (cr);
        }
      return rugosa_chart_get_spec (b->chart)->height;
    case BLOCK_PLOT:
      if (cr != NULL)
        {
          cairo_save (cr);
          cairo_rectangle (cr, x, y, rugosa_plot_get_spec (b->plot)->width,
                           rugosa_plot_get_spec (b->plot)->height);
          cairo_clip (cr);
          cairo_translate (cr, x, y);
          rugosa_plot_draw (b->plot, cr);
          cairo_restore (cr);
        }
      return rugosa_plot_get_spec (b->plot)->height;
    case BLOCK_GROUP:
      {
        double top = y;

        for (guint i = 0; i < b->children->len; i++)
          {
            ReportBlock *child = g_ptr_array_index (b->children, i);

            double h;

            if (i > 0)
              y += child->space_before;
            h = block_render (report, child, cr, x, y, width);
            if (cr == NULL)
              child->height = h;
            y += h;
          }
        return y - top;
      }
    case BLOCK_SPACE:
    default:
      return b->height;
    }
}

/* --- pages ------------------------------------------------------------- */

/* The run of lines of `b` (a paragraph) from line `first` that fits in
 * `space` points: a new block, or NULL when not even one line fits. */
static ReportBlock *
text_run (RugosaReport *report, ReportBlock *b, int first, double space, double width,
          int *next)
{
  g_autoptr (PangoLayout) layout = _rugosa_report_layout (report, b->text, b->style, width);
  PangoLayoutIter *iter = pango_layout_get_iter (layout);
  double top = -1.0, bottom = 0.0;
  int line = 0, n = 0;
  ReportBlock *run;

  do
    {
      int y0, y1;

      pango_layout_iter_get_line_yrange (iter, &y0, &y1);
      if (line >= first)
        {
          if (top < 0.0)
            top = (double) y0 / PANGO_SCALE;
          if ((double) y1 / PANGO_SCALE - top > space && n > 0)
            break;
          if ((double) y1 / PANGO_SCALE - top > space)
            break;
          bottom = (double) y1 / PANGO_SCALE;
          n++;
        }
      line++;
    }
  while (pango_layout_iter_next_line (iter));
  pango_layout_iter_free (iter);
  *next = first + n;
  if (n == 0)
    return NULL;
  run = _rugosa_report_text (report, b->text, b->style);
  run->first_line = first;
  run->n_lines = n;
  run->clip_top = top;
  run->height = bottom - top;
  run->space_before = first == 0 ? b->space_before : 0.0;
  return run;
}

static void
new_page (RugosaReport *report, double *y)
{
  g_ptr_array_add (report->pages, g_array_new (FALSE, FALSE, sizeof (ReportPlaced)));
  *y = report->top;
}

static void
place (RugosaReport *report, ReportBlock *b, double *y)
{
  GArray *page = g_ptr_array_index (report->pages, report->pages->len - 1);
  ReportPlaced p = { b, *y + (page->len > 0 ? b->space_before : 0.0) };

  g_array_append_val (page, p);
  *y = p.y + b->height;
}

/* Rows r0 … r1 - 1 of a table under its header rows, measured. */
static ReportBlock *
table_slice (RugosaReport *report, ReportBlock *b, guint r0, guint r1, double width)
{
  const ReportTable *t = b->table;
  ReportTable *part = _rugosa_report_table_new (t->n_cols, t->n_header, t->fraction);
  ReportBlock *slice = _rugosa_report_block_new (BLOCK_TABLE);

  memcpy (part->right, t->right, sizeof part->right);
  for (guint r = 0; r < t->n_rows; r++)
    if (r < t->n_header || (r >= r0 && r < r1))
      for (guint c = 0; c < t->n_cols; c++)
        {
          const char *cell = g_ptr_array_index (t->cells, r * t->n_cols + c);

          g_ptr_array_add (part->cells, cell != NULL ? g_strdup (cell) : NULL);
        }
  slice->table = part;
  slice->space_before = r0 == t->n_header ? b->space_before : 0.0;
  slice->height = table_render (report, part, NULL, 0, 0, width);
  return slice;
}

typedef struct {
  RugosaReport *report;
  double width, bottom;
  double y;
  GPtrArray *runs;    /* blocks made while placing, owned by the report */
} Flow;

static GArray *
current_page (Flow *f)
{
  return g_ptr_array_index (f->report->pages, f->report->pages->len - 1);
}

/* Place `b` (followed by `next`, or NULL) whole on the current page or
 * the next; what is taller than a page is divided where it may be:
 * running text between its lines, a table between its rows (its header
 * repeated), a group between its parts. */
static void
flow_block (Flow *f, ReportBlock *b, ReportBlock *next)
{
  RugosaReport *report = f->report;
  const double page_height = f->bottom - report->top;
  double need = (current_page (f)->len > 0 ? b->space_before : 0.0) + b->height;

  if (b->keep_with_next && next != NULL)
    /* a heading goes with what follows: all of it when that is placed
     * whole, else its first lines (text) or rows (a table, a group) */
    need += next->space_before + (next->height <= page_height ? next->height
                                  : next->kind == BLOCK_TEXT ? 40.0 : 80.0);
  if (b->height <= page_height || b->kind == BLOCK_CHART || b->kind == BLOCK_PLOT
      || b->kind == BLOCK_TITLE || b->kind == BLOCK_SPACE)
    {
      if (f->y + need > f->bottom && current_page (f)->len > 0)
        new_page (report, &f->y);
      place (report, b, &f->y);
      return;
    }
  switch (b->kind)
    {
    case BLOCK_GROUP:
      for (guint i = 0; i < b->children->len; i++)
        {
          ReportBlock *child = g_ptr_array_index (b->children, i);

          if (i == 0)
            child->space_before = b->space_before;
          flow_block (f, child, i + 1 < b->children->len ? g_ptr_array_index (b->children, i + 1) : next);
        }
      break;
    case BLOCK_TABLE:
      {
        const ReportTable *t = b->table;
        double head = 0.0;
        guint r = t->n_header;

        for (guint i = 0; i < t->n_header; i++)
          head += t->row_height[i];
        while (r < t->n_rows)
          {
            const gboolean empty = current_page (f)->len == 0;
            double space = f->bottom - f->y - (empty ? 0.0 : b->space_before) - head;
            guint r1 = r;
            ReportBlock *slice;

            while (r1 < t->n_rows && t->row_height[r1] <= space)
              space -= t->row_height[r1++];
            if (r1 == r && !empty)
              {
                new_page (report, &f->y);
                continue;
              }
            /* a row taller than a page is placed on a page of its own */
            r1 = MAX (r1, r + 1);
            slice = table_slice (report, b, r, r1, f->width);
            g_ptr_array_add (f->runs, slice);
            place (report, slice, &f->y);
            r = r1;
            if (r < t->n_rows)
              new_page (report, &f->y);
          }
      }
      break;
    case BLOCK_TEXT:
      {
        const double width = f->width - (b->has_swatch ? 13.0 : 0.0);
        g_autoptr (PangoLayout) whole = _rugosa_report_layout (report, b->text, b->style, width);
        const int n_lines = pango_layout_get_line_count (whole);
        int first = 0;

        while (first < n_lines)
          {
            const gboolean empty = current_page (f)->len == 0;
            int after;
            ReportBlock *run = text_run (report, b, first,
                                         f->bottom - f->y - (!empty && first == 0 ? b->space_before : 0.0),
                                         width, &after);

            if (run == NULL)
              {
                if (empty)
                  break;   /* not one line fits an empty page: nothing to do */
                new_page (report, &f->y);
                continue;
              }
            g_ptr_array_add (f->runs, run);
            place (report, run, &f->y);
            first = after;
            if (first < n_lines)
              new_page (report, &f->y);
          }
      }
      break;
    default:
      place (report, b, &f->y);
      break;
    }
}

void
_rugosa_report_paginate (RugosaReport *report)
{
  Flow f = { report, report->width - 2 * report->margin, report->height - report->bottom,
             0.0, g_ptr_array_new_with_free_func (_rugosa_report_block_free) };

  for (guint i = 0; i < report->blocks->len; i++)
    {
      ReportBlock *b = g_ptr_array_index (report->blocks, i);
      b->height = block_render (report, b, NULL, 0, 0, f.width);
    }
  new_page (report, &f.y);
  for (guint i = 0; i < report->blocks->len; i++)
    flow_block (&f, g_ptr_array_index (report->blocks, i),
                i + 1 < report->blocks->len ? g_ptr_array_index (report->blocks, i + 1) : NULL);
  /* the pieces live as long as the report's blocks */
  for (guint i = 0; i < f.runs->len; i++)
    g_ptr_array_add (report->blocks, g_ptr_array_index (f.runs, i));
  g_ptr_array_set_free_func (f.runs, NULL);
  g_ptr_array_unref (f.runs);
}

/* The frame of every page: the running header from the second page on,
 * the caution and the program at the foot, the page number. */
static void
draw_frame (RugosaReport *report, cairo_t *cr, guint page)
{
  const double x = report->margin;
  const double width = report->width - 2 * report->margin;
  const double foot = report->height - report->bottom + 12.0;
  g_autofree char *number = g_strdup_printf (_("Page %u of %u"), page + 1, report->pages->len);
  g_autoptr (PangoLayout) num = _rugosa_report_layout (report, number, REPORT_TEXT_CELL_HEAD, -1);
  g_autoptr (PangoLayout) caution = _rugosa_report_layout (report, _(RUGOSA_CHART_CAUTION),
                                                           REPORT_TEXT_LABEL, width * 0.78);
  g_autoptr (PangoLayout) left = _rugosa_report_layout (report, report->footer_left,
                                                        REPORT_TEXT_LABEL, width * 0.78);

  /* the caution and the program in the normal weight */
  {
    PangoFontDescription *fd = pango_font_description_copy (pango_layout_get_font_description (caution));

    pango_font_description_set_weight (fd, PANGO_WEIGHT_NORMAL);
    pango_layout_set_font_description (caution, fd);
    pango_layout_set_font_description (left, fd);
    pango_font_description_free (fd);
  }
  hline (cr, x, x + width, foot, 0.5, RULE);
  show (cr, caution, x, foot + 4.0, MUTED);
  show (cr, left, x, foot + 5.0 + layout_height (caution), MUTED);
  show (cr, num, x + width - layout_width (num), foot + 4.0, INK);

  if (page > 0)
    {
      g_autoptr (PangoLayout) title = _rugosa_report_layout (report, report->title,
                                                             REPORT_TEXT_CELL_HEAD, width * 0.6);
      g_autoptr (PangoLayout) kind = _rugosa_report_layout (report, report->subtitle,
                                                            REPORT_TEXT_LABEL, width * 0.38);
      const double head = report->top - 16.0;

      pango_layout_set_ellipsize (title, PANGO_ELLIPSIZE_END);
      pango_layout_set_height (title, -1);
      show (cr, title, x, head - layout_height (title), INK);
      show (cr, kind, x + width - layout_width (kind), head - layout_height (kind), ACCENT);
      hline (cr, x, x + width, head + 3.0, 0.5, RULE);
    }
}

void
_rugosa_report_draw_page (RugosaReport *report, cairo_t *cr, guint page)
{
  GArray *placed;
  const double width = report->width - 2 * report->margin;

  g_return_if_fail (page < report->pages->len);
  placed = g_ptr_array_index (report->pages, page);
  cairo_save (cr);
  cairo_set_source_rgb (cr, 1, 1, 1);
  cairo_rectangle (cr, 0, 0, report->width, report->height);
  cairo_fill (cr);
  for (guint i = 0; i < placed->len; i++)
    {
      ReportPlaced *p = &g_array_index (placed, ReportPlaced, i);

      block_render (report, p->block, cr, report->margin, p->y, width);
    }
  draw_frame (report, cr, page);
  cairo_restore (cr);
}
