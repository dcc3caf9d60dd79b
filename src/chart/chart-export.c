/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Writing a picture to PNG, SVG or PDF: the surface, the PDF's metadata
 * (title, creator, the caller's date so that output is reproducible) and
 * one sentence when the file cannot be written.  Shared by the friction
 * chart and the other views, so every export is made the same way.
 *
 * The bytes go to an atomic file writer (model/rugosa-file.h): the target
 * is replaced only once the whole file is written and flushed, so a full
 * disk or any other failure leaves the previous file as it was and no
 * temporary file behind. */
#include "chart-private.h"

#include <glib/gi18n-lib.h>
#include <math.h>
#include <stdio.h>

#include <cairo-pdf.h>
#include <cairo-svg.h>

#include "model/rugosa-file.h"

typedef struct {
  RugosaFileWriter *writer;
  GError *error;   /* the writer's first failure */
} ExportSink;

static cairo_status_t
sink_write (void *closure, const unsigned char *data, unsigned int length)
{
  ExportSink *sink = closure;

  if (sink->error != NULL
      || !rugosa_file_writer_write (sink->writer, data, length, &sink->error))
    return CAIRO_STATUS_WRITE_ERROR;
  return CAIRO_STATUS_SUCCESS;
}

static gboolean
fail_with_writer (ExportSink *sink, GError **error)
{
  /* the writer's own sentence: the file, the reason, what is left */
  rugosa_file_writer_abort (sink->writer);
  g_set_error_literal (error, RUGOSA_CHART_ERROR, RUGOSA_CHART_ERROR_WRITE,
                       sink->error->message);
  g_clear_error (&sink->error);
  return FALSE;
}

gboolean
_rugosa_chart_export_surface (RugosaChartFormat format, double width,
                              double height, const char *date,
                              const char *title, const char *path,
                              ChartExportDraw draw, gpointer data,
                              GError **error)
{
  ExportSink sink = { NULL, NULL };
  cairo_surface_t *surface = NULL;
  cairo_status_t cst;

  if ((sink.writer = rugosa_file_writer_new (path, RUGOSA_FILE_WRITE_DEFAULT, &sink.error)) == NULL)
    {
      g_set_error_literal (error, RUGOSA_CHART_ERROR, RUGOSA_CHART_ERROR_WRITE,
                           sink.error->message);
      g_clear_error (&sink.error);
      return FALSE;
    }

  switch (format)
    {
    case RUGOSA_CHART_FORMAT_SVG:
      surface = cairo_svg_surface_create_for_stream (sink_write, &sink, width, height);
      break;
    case RUGOSA_CHART_FORMAT_PDF:
      surface = cairo_pdf_surface_create_for_stream (sink_write, &sink, width, height);
      if (cairo_surface_status (surface) == CAIRO_STATUS_SUCCESS)
        {
          int yy, mm, dd;

          cairo_pdf_surface_set_metadata (surface, CAIRO_PDF_METADATA_TITLE, title);
          cairo_pdf_surface_set_metadata (surface, CAIRO_PDF_METADATA_CREATOR, "Rugosa");
          /* the caller's date, so that output is reproducible */
          if (date != NULL && sscanf (date, "%4d-%2d-%2d", &yy, &mm, &dd) == 3)
            {
              char iso[40];

              snprintf (iso, sizeof iso, "%04d-%02d-%02dT00:00:00Z", yy, mm, dd);
              cairo_pdf_surface_set_metadata (surface, CAIRO_PDF_METADATA_CREATE_DATE, iso);
            }
        }
      break;
    case RUGOSA_CHART_FORMAT_PNG:
    default:
      surface = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, (int) ceil (width),
                                            (int) ceil (height));
      break;
    }

  cst = cairo_surface_status (surface);
  if (cst == CAIRO_STATUS_SUCCESS)
    {
      cairo_t *cr = cairo_create (surface);

      draw (cr, data);
      cst = cairo_status (cr);
      cairo_destroy (cr);
    }
  if (cst == CAIRO_STATUS_SUCCESS && format == RUGOSA_CHART_FORMAT_PNG)
    cst = cairo_surface_write_to_png_stream (surface, sink_write, &sink);
  if (cst == CAIRO_STATUS_SUCCESS)
    {
      cairo_surface_finish (surface);
      cst = cairo_surface_status (surface);
    }
  cairo_surface_destroy (surface);

  if (sink.error != NULL)
    return fail_with_writer (&sink, error);
  if (cst != CAIRO_STATUS_SUCCESS)
    {
      g_autofree char *display = rugosa_file_display_name (path);

      rugosa_file_writer_abort (sink.writer);
      g_set_error (error, RUGOSA_CHART_ERROR, RUGOSA_CHART_ERROR_WRITE,
                   _("The chart for “%s” could not be drawn (%s); nothing was written."),
                   display, cairo_status_to_string (cst));
      return FALSE;
    }
  if (!rugosa_file_writer_commit (sink.writer, &sink.error))
    {
      g_set_error_literal (error, RUGOSA_CHART_ERROR, RUGOSA_CHART_ERROR_WRITE,
                           sink.error->message);
      g_clear_error (&sink.error);
      return FALSE;
    }
  return TRUE;
}
