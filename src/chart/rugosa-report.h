/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The client report of a project: pages of a paper size, in points, with
 * a title block from the project's details, the friction chart, one block
 * of inputs and results per line option (new and at the service age, at
 * its lowest, design and highest flow), the life-cycle figures and views
 * when the project has them, the notes and the cautions, every page
 * numbered.
 *
 * The pages are laid out once, when first counted or drawn: every block is
 * measured with Pango first and placed whole (a block, a table row or a
 * line option's block never runs over a page break).  The same pages are
 * drawn into a PDF (rugosa_report_write_pdf) and into a print context
 * (rugosa_report_draw_page).  No GTK: the caller chooses the paper. */
#pragma once

#include <cairo.h>
#include <gio/gio.h>

#include "model/rugosa-project.h"

G_BEGIN_DECLS

typedef enum {
  RUGOSA_PAPER_A4 = 0,
  RUGOSA_PAPER_LETTER,
  RUGOSA_N_PAPERS
} RugosaPaper;

/* "a4", "letter" (rugosa-cli report --paper). */
const char *rugosa_paper_id (RugosaPaper paper);
/* FALSE when `id` names no paper (case-insensitive). */
gboolean rugosa_paper_from_id (const char *id, RugosaPaper *paper);
/* Portrait, in points: A4 595.28 × 841.89 (ISO 216: 210 × 297 mm),
 * US Letter 612 × 792 (8.5 × 11 in). */
void rugosa_paper_size (RugosaPaper paper, double *width_pt, double *height_pt);
/* The paper of a locale name ("en_US.UTF-8", "de_DE@euro"; NULL or "C":
 * A4): US Letter for the territories that use it (US, CA), A4 else. */
RugosaPaper rugosa_paper_for_locale (const char *locale);

typedef struct RugosaReport RugosaReport;

/* The report of `project` at its settings' service age, in its display
 * units.  `today` ("YYYY-MM-DD") is the date the report is made, shown
 * when the project gives no date of its own and written as the PDF's
 * date. */
RugosaReport *rugosa_report_new (RugosaProject *project, RugosaPaper paper,
                                 const char *today);
void          rugosa_report_free (RugosaReport *report);

guint rugosa_report_get_n_pages (RugosaReport *report);
void  rugosa_report_get_page_size (RugosaReport *report, double *width_pt,
                                   double *height_pt);
/* Page `page` (from 0) with its top left at the origin of `cr`, one unit
 * a point. */
void  rugosa_report_draw_page (RugosaReport *report, cairo_t *cr, guint page);

/* Every page to a PDF at `path`, atomically (model/rugosa-file.h): a
 * failure leaves the previous file as it was, with one sentence. */
gboolean rugosa_report_write_pdf (RugosaReport *report, const char *path,
                                  GError **error);

G_DEFINE_AUTOPTR_CLEANUP_FUNC (RugosaReport, rugosa_report_free)

G_END_DECLS
