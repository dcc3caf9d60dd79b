/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The regime and roughness-zone bands and their names.
 *
 * Laminar and transitional are strips of Reynolds number.  The turbulent
 * strip is split into hydraulically smooth, transitionally rough and fully
 * rough zones by the core's rule (regime.c): Colebrook's f within a stated
 * tolerance of the smooth-pipe law, or of the fully rough law.  Their edges
 * come from the core (rg_roughness_zone_smooth_edge, _rough_edge), so the
 * bands follow the same rule as every line's reported zone: the smooth
 * zone is the thin strip just above the smooth-pipe curve, the fully rough
 * zone lies above and to the right of its edge.  The part of the plane
 * below the smooth-pipe curve holds no Colebrook curve and stays plain.
 *
 * Each band's name goes to the free place nearest to a preferred point
 * whose whole (turned) box lies inside the band.  The smooth zone is too
 * thin to hold text, so its name sits in the plain part just under the
 * smooth-pipe curve, along it. */
#include "chart-private.h"

#include <glib/gi18n-lib.h>
#include <math.h>

#include "core/friction.h"

static double
clampd (double v, double lo, double hi)
{
  return v < lo ? lo : v > hi ? hi : v;
}

typedef struct {
  double x[128], y[128];
  size_t n;
} Poly;

static void
poly_add (const ChartLayout *lay, double re, double f, const RugosaChartRect *far,
          Poly *out)
{
  double x, y;
  _rugosa_chart_xy (lay, re, f, &x, &y);
  out->x[out->n] = clampd (x, far->x, far->x + far->width);
  out->y[out->n++] = clampd (y, far->y, far->y + far->height);
}

/* The edge of the fully rough zone from ε/D = 1e-9 (Re far beyond any axis)
 * to the core's largest ε/D: from the bottom right to the top left. */
static void
rough_edge_points (const ChartLayout *lay, const RugosaChartRect *far, Poly *out)
{
  enum { N = 72 };
  out->n = 0;
  for (int i = 0; i < N; i++)
    {
      const double lrr = -9.0 + (log10 (RG_FRICTION_RR_MAX) + 9.0) * i / (N - 1);
      double re, f;
      if (rg_roughness_zone_rough_edge (pow (10.0, lrr), &re, &f, NULL) == RG_OK)
        poly_add (lay, re, f, far, out);
    }
}

/* The edge of the hydraulically smooth zone over the core's whole Reynolds
 * range, from the bottom right to the top left. */
static void
smooth_edge_points (const ChartLayout *lay, const RugosaChartRect *far, Poly *out)
{
  enum { N = 72 };
  const double l0 = log10 (RG_FRICTION_RE_MAX), l1 = log10 (RG_FRICTION_RE_MIN);
  out->n = 0;
  for (int i = 0; i < N; i++)
    {
      /* the ends exactly, whatever log10 and pow round to */
      const double re = i == 0 ? RG_FRICTION_RE_MAX
                        : i == N - 1 ? RG_FRICTION_RE_MIN
                                     : pow (10.0, l0 + (l1 - l0) * i / (N - 1));
      double rr, f;
      if (rg_roughness_zone_smooth_edge (re, &rr, &f, NULL) == RG_OK)
        poly_add (lay, re, f, far, out);
    }
}

/* The smooth-pipe Colebrook curve, left to right. */
static void
smooth_points (const ChartLayout *lay, double re_lo, double re_hi,
               const RugosaChartRect *far, Poly *out)
{
  enum { N = 48 };
  out->n = 0;
  for (int i = 0; i < N; i++)
    {
      const double re = re_lo * pow (re_hi / re_lo, (double) i / (N - 1));
      double f;
      if (rg_friction_colebrook (re, 0.0, &f, NULL) == RG_OK)
        poly_add (lay, re, f, far, out);
    }
}

/* x where a polyline monotone in y (as the edges are) reaches height y;
 * 0 when it does not. */
static int
poly_x_at_y (const Poly *p, double y, double *x)
{
  for (size_t i = 1; i < p->n; i++)
    {
      const double y0 = p->y[i - 1], y1 = p->y[i];
      if ((y - y0) * (y - y1) <= 0 && y0 != y1)
        {
          *x = p->x[i - 1] + (y - y0) / (y1 - y0) * (p->x[i] - p->x[i - 1]);
          return 1;
        }
    }
  return 0;
}

static RugosaChartRect
far_rect (const ChartLayout *lay)
{
  const RugosaChartRect *pl = &lay->plot;
  const double m = 40;
  const RugosaChartRect far = { pl->x - m, pl->y - m, pl->width + 2 * m,
                                pl->height + 2 * m };
  return far;
}

static void
poly_path (cairo_t *cr, const Poly *p, int reverse, int move)
{
  for (size_t i = 0; i < p->n; i++)
    {
      const size_t j = reverse ? p->n - 1 - i : i;
      if (i == 0 && move)
        cairo_move_to (cr, p->x[j], p->y[j]);
      else
        cairo_line_to (cr, p->x[j], p->y[j]);
    }
}

static void
band_edges (const RugosaChart *chart, double *x_lam, double *x_turb)
{
  const ChartLayout *lay = &chart->lay;
  const RugosaChartRect *pl = &lay->plot;
  double yy;
  /* whole pixels: rectangles on the pixel grid composite fastest */
  _rugosa_chart_xy (lay, chart->spec.transition.re_laminar_max, 0.02, x_lam, &yy);
  _rugosa_chart_xy (lay, chart->spec.transition.re_turbulent_min, 0.02, x_turb, &yy);
  *x_lam = round (clampd (*x_lam, pl->x, pl->x + pl->width));
  *x_turb = round (clampd (*x_turb, pl->x, pl->x + pl->width));
}

void
_rugosa_chart_draw_bands (RugosaChart *chart, cairo_t *cr,
                          const RugosaChartPalette *p)
{
  const RugosaChartSpec *spec = &chart->spec;
  const ChartLayout *lay = &chart->lay;
  const RugosaChartRect *pl = &lay->plot;
  const RugosaChartRect far = far_rect (lay);
  const double top = far.y;
  const double left = far.x, right = far.x + far.width;
  const double pb = pl->y + pl->height;
  double x_lam, x_turb;

  band_edges (chart, &x_lam, &x_turb);

  _rugosa_chart_set_rgba (cr, &p->band_laminar);
  cairo_rectangle (cr, pl->x, pl->y, x_lam - pl->x, pl->height);
  cairo_fill (cr);
  _rugosa_chart_set_rgba (cr, &p->band_transitional);
  cairo_rectangle (cr, x_lam, pl->y, x_turb - x_lam, pl->height);
  cairo_fill (cr);

  cairo_pattern_t *pat = _rugosa_chart_hatch_pattern (cr, p, spec->theme, lay->k);
  cairo_matrix_t mat;
  cairo_matrix_init_translate (&mat, -x_lam, -pb);
  cairo_pattern_set_matrix (pat, &mat);
  cairo_set_source (cr, pat);
  cairo_rectangle (cr, x_lam, pl->y, x_turb - x_lam, pl->height);
  cairo_fill (cr);
  cairo_pattern_destroy (pat);

  if (x_turb >= pl->x + pl->width)
    return;
  Poly rough, smooth, sm;
  rough_edge_points (lay, &far, &rough);
  smooth_edge_points (lay, &far, &smooth);
  smooth_points (lay, fmax (spec->transition.re_turbulent_min, RG_FRICTION_RE_MIN) * 0.9,
                 RG_FRICTION_RE_MAX, &far, &sm);
  if (rough.n < 2 || smooth.n < 2 || sm.n < 2)
    return;

  cairo_save (cr);
  cairo_rectangle (cr, x_turb, pl->y, pl->x + pl->width - x_turb, pl->height);
  cairo_clip (cr);
  /* Coarser edge sampling: the zone edges are soft colour changes, and
   * this halves the cost of filling most of the plot. */
  cairo_set_antialias (cr, CAIRO_ANTIALIAS_FAST);
  /* The three zones do not overlap, so each pixel is filled once. */
  /* Fully rough: above and to the right of its edge. */
  poly_path (cr, &rough, 0, 1);
  cairo_line_to (cr, rough.x[rough.n - 1], top);
  cairo_line_to (cr, right, top);
  cairo_line_to (cr, right, rough.y[0]);
  cairo_close_path (cr);
  _rugosa_chart_set_rgba (cr, &p->band_fully_rough);
  cairo_fill (cr);
  /* Transitionally rough: between the two edges. */
  poly_path (cr, &rough, 0, 1);
  cairo_line_to (cr, rough.x[rough.n - 1], top);
  cairo_line_to (cr, smooth.x[smooth.n - 1], top);
  poly_path (cr, &smooth, 1, 0);
  cairo_line_to (cr, right, smooth.y[0]);
  cairo_line_to (cr, right, rough.y[0]);
  cairo_close_path (cr);
  _rugosa_chart_set_rgba (cr, &p->band_transitionally_rough);
  cairo_fill (cr);
  /* Hydraulically smooth: between its edge and the smooth-pipe curve;
   * below that curve no pipe reaches, and the plot stays plain. */
  poly_path (cr, &smooth, 0, 1);
  cairo_line_to (cr, left, smooth.y[smooth.n - 1]);
  cairo_line_to (cr, left, sm.y[0]);
  poly_path (cr, &sm, 0, 0);
  cairo_line_to (cr, right, sm.y[sm.n - 1]);
  cairo_line_to (cr, right, smooth.y[0]);
  cairo_close_path (cr);
  _rugosa_chart_set_rgba (cr, &p->band_smooth);
  cairo_fill (cr);

  /* The zone edges themselves, dotted. */
  RugosaChartRgba edge = p->muted;
  edge.a = 0.75;
  const double dots[] = { 5.0 * lay->k, 3.5 * lay->k };
  cairo_set_dash (cr, dots, 2, 0);
  cairo_set_line_width (cr, 1.3 * lay->k);
  _rugosa_chart_set_rgba (cr, &edge);
  poly_path (cr, &smooth, 0, 1);
  poly_path (cr, &rough, 0, 1);
  cairo_stroke (cr);
  cairo_restore (cr);

  /* Regime thresholds. */
  cairo_save (cr);
  const double dash[] = { 4.0 * lay->k, 3.0 * lay->k };
  cairo_set_dash (cr, dash, 2, 0);
  cairo_set_line_width (cr, 1.0);
  _rugosa_chart_set_rgba (cr, &edge);
  cairo_move_to (cr, x_lam + 0.5, pl->y);
  cairo_line_to (cr, x_lam + 0.5, pb);
  cairo_move_to (cr, x_turb + 0.5, pl->y);
  cairo_line_to (cr, x_turb + 0.5, pb);
  cairo_stroke (cr);
  cairo_restore (cr);
}


/* Band names: for each band, the free place nearest to a preferred point
 * whose whole (turned) box lies inside the band. */
typedef struct {
  const char *text;
  RgRegime regime;
  RgRoughnessZone zone;
} BandName;

/* A probe in the turbulent strip below the smooth-pipe curve, where no
 * Colebrook curve runs. */
static int
below_smooth_curve (const RugosaChartProbe *pr)
{
  double f_s;
  return pr->regime == RG_REGIME_TURBULENT && !pr->has_rr
         && rg_friction_colebrook (pr->re, 0.0, &f_s, NULL) == RG_OK && pr->f < f_s;
}

static int
box_in_band (RugosaChart *chart, double cx, double cy, double w, double h,
             double c, double s, const BandName *b)
{
  for (int i = -1; i <= 1; i++)
    for (int j = -1; j <= 1; j++)
      {
        const double u = i * (w / 2 + 3), v = j * (h / 2 + 2);
        RugosaChartProbe pr;
        _rugosa_chart_classify (&chart->spec, &chart->lay, cx + u * c - v * s,
                                cy + u * s + v * c, &pr);
        if (!pr.in_plot || pr.regime != b->regime)
          return 0;
        /* the smooth zone's name may also lie under its curve (see the top
         * of the file) */
        if (b->regime == RG_REGIME_TURBULENT && pr.zone != b->zone
            && !(b->zone == RG_ZONE_SMOOTH && below_smooth_curve (&pr)))
          return 0;
      }
  return 1;
}

void
_rugosa_chart_draw_band_labels (RugosaChart *chart, cairo_t *cr,
                                const RugosaChartPalette *p,
                                ChartTaken *taken)
{
  const RugosaChartSpec *spec = &chart->spec;
  const ChartLayout *lay = &chart->lay;
  const RugosaChartRect *pl = &lay->plot;
  static const BandName BANDS[] = {
    { N_("laminar"), RG_REGIME_LAMINAR, RG_ZONE_NONE },
    { N_("transitional"), RG_REGIME_TRANSITIONAL, RG_ZONE_NONE },
    { N_("fully rough"), RG_REGIME_TURBULENT, RG_ZONE_FULLY_ROUGH },
    { N_("transitionally rough"), RG_REGIME_TURBULENT, RG_ZONE_TRANSITIONALLY_ROUGH },
    { N_("hydraulically smooth"), RG_REGIME_TURBULENT, RG_ZONE_SMOOTH },
  };
  double x_lam, x_turb, xx, y_high;
  band_edges (chart, &x_lam, &x_turb);
  /* friction factor a sixth of the way down from the top of the axis */
  const double f_high = pow (10.0, lay->ly1 - (lay->ly1 - lay->ly0) / 6.0);
  _rugosa_chart_xy (lay, 1e4, f_high, &xx, &y_high);
  const RugosaChartRect far = far_rect (lay);
  Poly rough, smooth;
  rough_edge_points (lay, &far, &rough);
  smooth_edge_points (lay, &far, &smooth);

  for (size_t bi = 0; bi < G_N_ELEMENTS (BANDS); bi++)
    {
      const BandName *b = &BANDS[bi];
      PangoLayout *l = _rugosa_chart_text (chart, _(b->text), lay->font_band, TEXT_CAPS, 0);
      double w, h, px, py, yy;
      _rugosa_chart_text_size (l, &w, &h);

      /* Preferred places: the two strips low down (under the laminar line,
       * where no pipe runs); the turbulent zones high up, where the
       * Colebrook curves are far apart: fully rough to the right,
       * transitionally rough halfway between the zone edges; the smooth
       * zone's name under the middle of the smooth-pipe curve. */
      switch (bi)
        {
        case 0:
          px = 0.5 * (pl->x + x_lam);
          py = pl->y + pl->height * 0.82;
          break;
        case 1:
          px = 0.5 * (x_lam + x_turb);
          py = pl->y + pl->height * 0.78;
          break;
        case 2:
          px = pl->x + pl->width * 0.8;
          py = pl->y + pl->height * 0.1;
          break;
        case 3:
          {
            double xs, xr;
            py = y_high;
            if (poly_x_at_y (&smooth, y_high, &xs) && poly_x_at_y (&rough, y_high, &xr))
              px = 0.5 * (xs + xr);
            else
              px = 0.5 * (x_turb + pl->x + pl->width);
          }
          break;
        default:
          {
            double re, f, fs;
            px = 0.5 * (x_turb + pl->x + pl->width);
            py = pl->y + pl->height;
            _rugosa_chart_value (lay, px, py, &re, &f);
            if (rg_friction_colebrook (fmax (re, RG_FRICTION_RE_MIN), 0, &fs, NULL) == RG_OK)
              _rugosa_chart_xy (lay, re, fs, &yy, &py);
            py += h / 2 + 3 * lay->k;
          }
          break;
        }

      /* Orientation: upright in the narrow transitional strip; along the
       * smooth-pipe curve in the smooth zone. */
      double angles[2] = { 0, -G_PI / 2 };
      if (b->regime == RG_REGIME_TURBULENT)
        angles[1] = 0;
      if (b->zone == RG_ZONE_SMOOTH)
        {
          double re, f, f1, f2, x1, y1, x2, y2;
          _rugosa_chart_value (lay, px, py, &re, &f);
          re = fmax (re, RG_FRICTION_RE_MIN * 2);
          rg_friction_colebrook (re / 1.5, 0, &f1, NULL);
          rg_friction_colebrook (re * 1.5, 0, &f2, NULL);
          _rugosa_chart_xy (lay, re / 1.5, f1, &x1, &y1);
          _rugosa_chart_xy (lay, re * 1.5, f2, &x2, &y2);
          angles[1] = atan2 (y2 - y1, x2 - x1);
        }

      const double cs[2][2] = { { cos (angles[0]), sin (angles[0]) },
                                { cos (angles[1]), sin (angles[1]) } };
      /* Search outwards from the preferred point, ring by ring, and stop
       * once a ring lies farther than the best place found. */
      const double step = 5 * lay->k;
      const int max_ring = (int) (fmax (pl->width, pl->height) / step) + 1;
      double best_d = INFINITY, bx = 0, by = 0, ba = 0;
      for (int ring = 0; ring <= max_ring && ring * step < best_d; ring++)
        for (int ai = 0; ai < 2; ai++)
          for (int side = 0; side < (ring ? 8 * ring : 1); side++)
            {
              int gx = 0, gy = 0;
              if (ring)
                {
                  const int e = side / (2 * ring), o = side % (2 * ring);
                  gx = e == 0 ? -ring + o : e == 1 ? ring : e == 2 ? ring - o : -ring;
                  gy = e == 0 ? -ring : e == 1 ? -ring + o : e == 2 ? ring : ring - o;
                }
              const double x = px + gx * step, y = py + gy * step;
              /* upright text costs the reader a turn of the head */
              const double d = hypot (x - px, y - py) + (ai ? 12 * lay->k : 0);
              if (d >= best_d)
                continue;
              const double bw = w * fabs (cs[ai][0]) + h * fabs (cs[ai][1]) + 4;
              const double bh = w * fabs (cs[ai][1]) + h * fabs (cs[ai][0]) + 4;
              RugosaChartRect r = { x - bw / 2, y - bh / 2, bw, bh };
              if (!_rugosa_chart_rect_inside (&r, pl) || !_rugosa_chart_taken_free (taken, &r)
                  || !box_in_band (chart, x, y, w, h, cs[ai][0], cs[ai][1], b))
                continue;
              best_d = d;
              bx = x;
              by = y;
              ba = angles[ai];
            }
      if (!isfinite (best_d))
        continue;
      RugosaChartProbe pr;
      _rugosa_chart_classify (spec, lay, bx, by, &pr);
      _rugosa_chart_show_knockout (cr, l, bx, by, ba, &p->muted, _rugosa_chart_band_colour (p, &pr), 2 * lay->k);
      RugosaChartRect r = _rugosa_chart_turned_box (bx, by, w, h, ba, 2);
      _rugosa_chart_taken_add (taken, &r);
    }
}

