/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The report's pieces: blocks (a heading, a paragraph, a table, a figure,
 * a group kept together), measured with Pango and placed on pages by
 * report-layout.c; rugosa-report.c fills them from the project. */
#pragma once

#include <pango/pangocairo.h>

#include "chart/rugosa-chart-plot.h"
#include "chart/rugosa-chart.h"
#include "chart/rugosa-report.h"

G_BEGIN_DECLS

typedef enum {
  REPORT_TEXT_BODY = 0,   /* running text */
  REPORT_TEXT_SMALL,      /* notes under a table, warnings */
  REPORT_TEXT_HEADING,    /* a section */
  REPORT_TEXT_SUBHEADING, /* a line option's name */
  REPORT_TEXT_TITLE,      /* the project's title */
  REPORT_TEXT_LABEL,      /* the small caps above a value of the title block */
  REPORT_TEXT_CELL,       /* a table's body */
  REPORT_TEXT_CELL_HEAD,  /* a table's header */
  REPORT_N_TEXT
} ReportTextStyle;

typedef enum {
  BLOCK_TEXT,     /* a paragraph, or a run of its lines */
  BLOCK_TABLE,
  BLOCK_CHART,    /* the friction chart */
  BLOCK_PLOT,     /* a view of rugosa-chart-plot.h */
  BLOCK_GROUP,    /* blocks kept together on one page */
  BLOCK_TITLE,    /* the title block */
  BLOCK_SPACE,
} ReportBlockKind;

#define REPORT_TABLE_COLUMNS_MAX 8

/* A table: header rows then body rows, `n_cols` cells each (NULL: the
 * cell is spanned by the one to its left).  Columns get fractions of the
 * width; a column is aligned left or right. */
typedef struct {
  guint n_cols;
  guint n_header;
  double fraction[REPORT_TABLE_COLUMNS_MAX];
  gboolean right[REPORT_TABLE_COLUMNS_MAX];
  GPtrArray *cells;          /* char *, row after row */
  double *row_height;        /* measured */
  guint n_rows;
} ReportTable;

typedef struct ReportBlock ReportBlock;
struct ReportBlock {
  ReportBlockKind kind;
  double height;             /* measured at the content width */
  double space_before;
  gboolean keep_with_next;   /* a heading: on the page of what follows */
  /* TEXT */
  char *text;
  ReportTextStyle style;
  RugosaChartRgba swatch;    /* SUBHEADING: the line's colour */
  gboolean has_swatch;
  int first_line, n_lines;   /* the run of the paragraph's lines; n_lines -1: all */
  double clip_top;           /* y of the run's first line in the paragraph */
  /* TABLE */
  ReportTable *table;
  /* CHART, PLOT */
  RugosaChart *chart;
  RugosaPlot *plot;
  /* GROUP */
  GPtrArray *children;       /* ReportBlock * */
};

typedef struct {
  ReportBlock *block;
  double y;
} ReportPlaced;

struct RugosaReport {
  RugosaPaper paper;
  double width, height;      /* the page, points */
  double margin, top, bottom; /* content area: margin left and right, from
                              * `top` to `height - bottom` */
  PangoContext *pango;
  char *today;
  /* what the pages show */
  char *title, *subtitle;    /* running header */
  char *footer_left;         /* the program and its version, the date */
  GPtrArray *title_cells;    /* label, value, label, value … (char *) */
  GPtrArray *blocks;         /* ReportBlock *, in reading order */
  GPtrArray *pages;          /* GArray of ReportPlaced, one a page */
};

/* report-layout.c */
PangoLayout *_rugosa_report_layout (RugosaReport *report, const char *text,
                                    ReportTextStyle style, double width);
ReportBlock *_rugosa_report_block_new (ReportBlockKind kind);
void _rugosa_report_block_free (gpointer block);
ReportBlock *_rugosa_report_text (RugosaReport *report, const char *text,
                                  ReportTextStyle style);
ReportTable *_rugosa_report_table_new (guint n_cols, guint n_header,
                                       const double *fraction);
void _rugosa_report_table_add (ReportTable *table, const char *cell);
void _rugosa_report_table_take (ReportTable *table, char *cell);
void _rugosa_report_paginate (RugosaReport *report);
void _rugosa_report_draw_page (RugosaReport *report, cairo_t *cr, guint page);

G_END_DECLS
