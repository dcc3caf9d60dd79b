/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Writing a picture to PNG, SVG or PDF: the surface, the PDF's metadata
 * (title, creator, the caller's date so that output is reproducible) and
 * one sentence when Cairo cannot write the file.  Shared by the friction
 * chart and the other views, so every export is made the same way. */
#include "chart-private.h"

#include <glib/gi18n-lib.h>
#include <math.h>
#include <stdio.h>

#include <cairo-pdf.h>
#include <cairo-svg.h>

gboolean
_rugosa_chart_export_surface (RugosaChartFormat format, double width,
                              double height, const char *date,
                              const char *title, const char *path,
                              ChartExportDraw draw, gpointer data,
                              GError **error)
{
  cairo_surface_t *surface = NULL;
  cairo_status_t cst;

  switch (format)
    {
    case RUGOSA_CHART_FORMAT_SVG:
      surface = cairo_svg_surface_create (path, width, height);
      break;
    case RUGOSA_CHART_FORMAT_PDF:
      surface = cairo_pdf_surface_create (path, width, height);
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
    cst = cairo_surface_write_to_png (surface, path);
  if (cst == CAIRO_STATUS_SUCCESS)
    {
      cairo_surface_finish (surface);
      cst = cairo_surface_status (surface);
    }
  cairo_surface_destroy (surface);

  if (cst != CAIRO_STATUS_SUCCESS)
    {
      g_set_error (error, RUGOSA_CHART_ERROR, RUGOSA_CHART_ERROR_WRITE,
                   _("Could not write the chart to “%s”: %s."), path,
                   cairo_status_to_string (cst));
      return FALSE;
    }
  return TRUE;
}
