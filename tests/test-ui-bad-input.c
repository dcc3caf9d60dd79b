/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The bad-input matrix of the application's fields, driven in-process
 * under Xvfb: every quantity field of the line panel, the fitting counts
 * and plain K values, the oil expansion and the numeric preferences, each
 * given every class of bad value (zero, negative, nan, inf, huge, tiny,
 * empty, an unknown unit, a unit of another kind, non-ASCII text, 100 kB of
 * digits) and the values that leave a correlation's range.
 *
 * One test path a row: /ui/bad-input/<field>/<class>.  Each row states one
 * outcome:
 *   refused  — the field is marked (`error` class) and says why in one
 *              sentence beside it; the line keeps its last valid value;
 *              nothing enters the undo history;
 *   warning  — the value is taken (one undo step) and a warning is shown
 *              above the line's fields;
 *   accepted — the value is taken (one undo step), no warning.
 * Spin buttons cannot hold bad text: "refused" there means the button puts
 * its last valid value back and nothing changes.
 * Whatever the outcome, no number on screen or in the line's results is
 * NaN or infinite: the results of every line, every results-table cell, the
 * chart's operating points and the warnings are scanned.
 *
 * /ui/bad-input/pictures saves two refusals on screen as PNG files in the
 * build folder (bad-input-panel.png, bad-input-preferences.png) for people
 * to look at.
 *
 * Run with --markdown=PATH to also write the table of rows, their outcome
 * and the sentence shown (docs/bad-input-app.md is made so).
 *
 * The expected outcomes are the contract of docs/bad-input-app.md, not
 * measurements; the physical limits behind the "validity" rows are named
 * beside each row. */
#define G_LOG_DOMAIN "test-ui-bad-input"

#include "config.h"

#include <adwaita.h>
#include <glib/gstdio.h>
#include <math.h>
#include <string.h>

#include "core/fittings.h"
#include "core/fluid.h"
#include "rugosa-application.h"
#include "rugosa-canvas.h"
#include "rugosa-line-panel.h"
#include "rugosa-preferences-window.h"
#include "rugosa-quantity-entry.h"
#include "rugosa-readout.h"
#include "rugosa-results-table.h"
#include "rugosa-window.h"
#include "ui-harness.h"

#define LONG_DIGITS 100000

static RugosaApplication *app;
static RugosaWindow *win;
static char *long_text;   /* LONG_DIGITS digits */
static GString *markdown; /* rows for --markdown, or NULL */

/* --- the matrix ------------------------------------------------------- */

enum {
  C_ZERO, C_NEGATIVE, C_NAN, C_INF, C_HUGE, C_TINY, C_EMPTY,
  C_WRONG_UNIT, C_WRONG_KIND, C_NON_ASCII, C_LONG, N_CLASSES
};

static const char *class_ids[N_CLASSES] = {
  "zero", "negative", "nan", "inf", "huge", "tiny", "empty",
  "wrong-unit", "wrong-kind", "non-ascii", "long",
};

/* What each class types, given the field's own unit and a unit of
 * another kind.  NULL: the 100 kB of digits. */
static char *
class_text (int cls, const char *unit, const char *other)
{
  switch (cls)
    {
    case C_ZERO: return g_strdup_printf ("0 %s", unit);
    case C_NEGATIVE: return g_strdup_printf ("-5 %s", unit);
    case C_NAN: return g_strdup ("nan");
    case C_INF: return g_strdup ("inf");
    case C_HUGE: return g_strdup_printf ("1e300 %s", unit);
    case C_TINY: return g_strdup_printf ("1e-300 %s", unit);
    case C_EMPTY: return g_strdup ("");
    case C_WRONG_UNIT: return g_strdup ("12 furlongs");
    case C_WRONG_KIND: return g_strdup_printf ("2 %s", other);
    case C_NON_ASCII: return g_strdup ("５ 水");
    case C_LONG: return NULL;
    default: g_assert_not_reached ();
    }
}

/* Spin buttons take a bare number: the same classes without units. */
static char *
class_number (int cls)
{
  switch (cls)
    {
    case C_ZERO: return g_strdup ("0");
    case C_NEGATIVE: return g_strdup ("-5");
    case C_HUGE: return g_strdup ("1e300");
    case C_TINY: return g_strdup ("1e-300");
    case C_WRONG_KIND: return g_strdup ("2 L/s");
    default: return class_text (cls, "", "");
    }
}

/* Outcomes: 'r' refused, 'w' accepted with a warning, 'a' accepted. */

/* A quantity field of the line panel: the property it edits, the fluid
 * the line needs for the field to be shown, a unit of the field, a unit of
 * another kind, and the outcome of each class in class order. */
typedef struct {
  const char *property;
  int kind;
  const char *unit;
  const char *other_unit;
  const char *expect;
} Field;

/* Zero and tiny values are refused where the model needs a positive
 * value; where zero means something ("no minimum flow", "level line", a
 * smooth wall, no aging) it is accepted.  Temperatures are typed in °C, so
 * "0 C" and "1e-300 C" are 0 °C: below the water model's 0.01 °C, fine as
 * an oil's reference temperature, refused as the oil's second temperature
 * (below the first, with the lower viscosity).  A design flow of 1e-300 L/s
 * lies below the lowest flow, a highest flow of 1e-300 L/s below the
 * design flow: both refused.  A negative elevation is a line running
 * downhill. */
static const Field fields[] = {
  /*                                          z  n  N  i  h  t  e  u  k  a  l */
  { "temperature", RG_FLUID_WATER, "C", "kPa", "rrrrrrrrrrr" },
  { "pressure", RG_FLUID_WATER, "kPa", "C", "rrrrrrrrrrr" },
  { "salinity", RG_FLUID_SEAWATER, "g/kg", "m", "arrrrarrrrr" },
  { "density", RG_FLUID_CUSTOM, "kg/m3", "m", "rrrrrrrrrrr" },
  { "viscosity", RG_FLUID_CUSTOM, "mPa.s", "m", "rrrrrrrrrrr" },
  { "oil-t1", RG_FLUID_OIL, "C", "kPa", "aarrrarrrrr" },
  { "oil-nu1", RG_FLUID_OIL, "cSt", "m", "rrrrrrrrrrr" },
  { "oil-t2", RG_FLUID_OIL, "C", "kPa", "rrrrrrrrrrr" },
  { "oil-nu2", RG_FLUID_OIL, "cSt", "m", "rrrrrrrrrrr" },
  { "oil-density-ref", RG_FLUID_OIL, "kg/m3", "m", "rrrrrrrrrrr" },
  { "oil-t-ref", RG_FLUID_OIL, "C", "kPa", "aarrrarrrrr" },
  { "roughness", RG_FLUID_WATER, "mm", "L/s", "arrrrarrrrr" },
  { "aging-rate", RG_FLUID_WATER, "mm/yr", "L/s", "arrrrarrrrr" },
  { "inner-diameter", RG_FLUID_WATER, "mm", "L/s", "rrrrrrrrrrr" },
  { "length", RG_FLUID_WATER, "m", "L/s", "rrrrrrrrrrr" },
  { "elevation", RG_FLUID_WATER, "m", "L/s", "aarrrarrrrr" },
  { "flow-design", RG_FLUID_WATER, "L/s", "m", "rrrrrrrrrrr" },
  { "flow-minimum", RG_FLUID_WATER, "L/s", "m", "arrrrarrrrr" },
  { "flow-maximum", RG_FLUID_WATER, "L/s", "m", "arrrrrrrrrr" },
};

/* Values a field reads, but outside (or at the edge of) the range of the
 * correlation or of the hydraulics behind it. */
typedef struct {
  const char *property;
  int kind;
  const char *id;
  const char *text;
  char expect;
  const char *why;   /* for the table: the limit that decides */
} Special;

static const Special specials[] = {
  /* Source: IAPWS-IF97 (2007) region 1: liquid water between 273.15 K and
   * the saturation temperature, 373.12 K at 101.325 kPa. */
  { "temperature", RG_FLUID_WATER, "boiling", "200 C", 'r',
    "water at 200 °C and 1 atm is steam (IAPWS-IF97 region 1 ends at saturation)" },
  { "temperature", RG_FLUID_WATER, "frozen", "-10 C", 'r',
    "below 0 °C water is ice (IAPWS-IF97 region 1 starts at 273.15 K)" },
  /* From memory of IAPWS-IF97 (2007) saturation line: about 2.34 kPa at 20 °C. */
  { "pressure", RG_FLUID_WATER, "below-vapour", "1 kPa", 'r',
    "20 °C water boils below about 2.3 kPa" },
  /* Source: IAPWS-IF97 (2007) region 1 extends to 100 MPa. */
  { "pressure", RG_FLUID_WATER, "above-if97", "200 MPa", 'r',
    "IAPWS-IF97 region 1 ends at 100 MPa" },
  /* From memory of Sharqawy, Lienhard and Zubair (2010), Desalination and
   * Water Treatment 16: correlations valid for S up to 120–160 g/kg. */
  { "salinity", RG_FLUID_SEAWATER, "200-g-kg", "200 g/kg", 'r',
    "beyond the Sharqawy et al. (2010) salinity range" },
  /* From memory of the steam tables (IAPWS-IF97 region 4): water boils at
   * about 476 kPa at 150 °C; seawater is refused where pure water boils. */
  { "temperature", RG_FLUID_SEAWATER, "seawater-150-C-1-atm", "150 C", 'r',
    "inside Sharqawy et al. (2010) 0–180 °C, but it boils at 1 atm" },
  /* Source: ASTM D341 needs two distinct temperatures. */
  { "oil-t2", RG_FLUID_OIL, "same-as-t1", "40 C", 'r',
    "ASTM D341 needs two different temperatures" },
  /* Common practice (no single source): an oil thins as it warms. */
  { "oil-nu2", RG_FLUID_OIL, "thicker-when-hot", "500 cSt", 'r',
    "the oil would thicken as it warms" },
  { "temperature", RG_FLUID_OIL, "outside-d341-points", "150 C", 'w',
    "ASTM D341 extrapolated beyond the two given temperatures" },
  { "viscosity", RG_FLUID_CUSTOM, "kinematic-unit", "2 cSt", 'r',
    "a kinematic viscosity in the dynamic-viscosity field" },
  /* From memory of Moody (1944), Trans. ASME 66: the chart's curves stop
   * at ε/D = 0.05; Colebrook (1939) was fitted for ε/D below about 0.05. */
  { "inner-diameter", RG_FLUID_WATER, "eps-over-d-above-0.1", "0.4 mm", 'r',
    "ε/D = 0.045 mm / 0.4 mm > 0.1" },
  { "roughness", RG_FLUID_WATER, "eps-over-d-0.13", "20 mm", 'r',
    "ε/D = 20 mm / 150 mm ≈ 0.13" },
  /* The velocity and gradient limits are the preferences' (the demo
   * project's settings): 5.7 m/s in 150 mm lies above any of them. */
  { "flow-maximum", RG_FLUID_WATER, "fast", "100 L/s", 'w',
    "5.7 m/s in 150 mm at the highest flow, above the velocity limit" },
  /* Source: laminar below Re ≈ 2000 (Reynolds 1883; any fluid mechanics
   * text); here Re = ρVD/μ ≈ 998 · 0.68 · 0.15 / 5 ≈ 20. */
  { "viscosity", RG_FLUID_CUSTOM, "laminar-syrup", "5000 mPa.s", 'w',
    "Re ≈ 20: laminar (f = 64/Re) and evaluated; its gradient is above the limit" },
  /* The project file refuses flows out of order (docs/file-format.md), so
   * the panel does too. */
  { "flow-minimum", RG_FLUID_WATER, "above-design", "50 L/s", 'r',
    "a lowest flow above the design flow" },
  { "flow-maximum", RG_FLUID_WATER, "below-design", "1 L/s", 'r',
    "a highest flow below the design flow" },
  { "flow-design", RG_FLUID_WATER, "below-minimum", "1 L/s", 'r',
    "a design flow below the lowest flow" },
  { "temperature", RG_FLUID_WATER, "bare-number-in-shown-unit", "30", 'a',
    "a number without unit is read in the unit the field shows (°C here)" },
};

/* A spin button: where it is, its classes' outcomes (bare numbers). */
typedef enum {
  SPIN_FITTING_COUNT,
  SPIN_OIL_EXPANSION,
  SPIN_PREFERENCE,
} SpinKind;

typedef struct {
  const char *id;       /* row name and, for preferences, the key */
  SpinKind where;
  const char *expect;
} Spin;

/* A spin button keeps its own range: out-of-range and unreadable text
 * puts the last value back. */
static const Spin spins[] = {
  /*                                                  z  n  N  i  h  t  e  u  k  a  l */
  { "fitting-count", SPIN_FITTING_COUNT,            "arrrrrrrrrr" },
  { "oil-expansion", SPIN_OIL_EXPANSION,            "arrrrarrrrr" },
  { "re-laminar-max", SPIN_PREFERENCE,               "rrrrrrrrrrr" },
  { "re-turbulent-min", SPIN_PREFERENCE,             "rrrrrrrrrrr" },
  { "velocity-limit", SPIN_PREFERENCE,              "rrrrrrrrrrr" },
  { "gradient-limit", SPIN_PREFERENCE,              "rrrrrrrrrrr" },
  { "service-age-max", SPIN_PREFERENCE,             "rrrrrrrrrrr" },
};

/* The plain K of an "other loss" fitting: a bare number ≥ 0. */
static const char k_expect[] = "arrrrarrrrr";

/* The opening of docs/bad-input-app.md (written with --markdown=PATH). */
#define DOC_HEADER \
  "## The application's fields\n\n" \
  "What the application does with every class of bad value typed into each of its " \
  "fields: the line panel's quantity fields, the plain K and the count of each fitting, " \
  "the oil's expansion, and the numeric preferences. Written by " \
  "`xvfb-run -a dbus-run-session -- build/tests/test-ui-bad-input --markdown=docs/bad-input-app.md` " \
  "(with the environment of the `ui-bad-input` test in tests/meson.build); the same rows are " \
  "checked by that test (`meson test -C build ui-bad-input`), one test path a row: " \
  "`/ui/bad-input/` and the first column. The last column is the sentence the run " \
  "showed (a refusal) or the warning text (a warning). rugosa-cli has its own matrix: " \
  "[docs/bad-input.md](bad-input.md).\n\n" \
  "**refused**: the field gets the `error` style class and one sentence, shown under the " \
  "field's title and in its tooltip; the line keeps its last valid value; nothing enters " \
  "the undo history. Spin buttons (fitting counts, the oil's expansion, the preferences) " \
  "put their last value back and show the sentence the same way. " \
  "**warning**: the value is taken (one undo step) and the warning stands above the " \
  "line's fields. **accepted**: the value is taken (one undo step), no warning. " \
  "Whatever the outcome, the run scans the results of every line, every cell of the " \
  "results table, the chart's operating points and the warnings: none holds NaN or an " \
  "infinity.\n\n" \
  "Every row starts from the same line: 12 L/s (lowest 6, highest 15 L/s) through 100 m " \
  "of 150 mm pipe with 0.045 mm roughness growing 0.01 mm a year, rising 2 m, a 90° " \
  "elbow and one other loss of K 0.5; water at 20 °C and 1 atm, or where the field " \
  "needs it seawater of 35 g/kg, a custom fluid of 998 kg/m³ and 1 mPa·s, or an " \
  "invented oil of 10 cSt at 40 °C and 3 cSt at 100 °C (870 kg/m³ at 15 °C) run at " \
  "50 °C. Temperatures are typed in °C, so `0 C` and `1e-300 C` mean 0 °C. Spin buttons " \
  "that take whole numbers only let digits and a sign be typed: other text leaves them " \
  "empty, and empty is refused.\n\n" \
  "A number typed without a unit is read in the unit the field shows (`30` in the " \
  "temperature field shown in °C is 30 °C). Seawater is refused where pure water would " \
  "boil at the line's pressure (its vapour pressure is about 2 % lower: a cautious " \
  "limit).\n\n"

/* --- helpers ---------------------------------------------------------- */

static RugosaLine *
the_line (void)
{
  return rugosa_project_get_line (rugosa_window_get_project (win), 0);
}

static RugosaLinePanel *
the_panel (void)
{
  return RUGOSA_LINE_PANEL (rugosa_window_get_line_panel (win));
}

/* The line every row starts from: 12 L/s through 100 m of 150 mm pipe,
 * 0.045 mm wall, rising 2 m, minimum 6 and maximum 15 L/s, one 90° elbow
 * and one other loss of K 0.5; the fluid of `kind` at conditions inside
 * its correlation (water 20 °C, seawater 35 g/kg, an invented light oil of
 * 10 cSt at 40 °C and 3 cSt at 100 °C run at 50 °C, turbulent at every
 * flow; a custom fluid like water).
 * Example data, not checked values. */
static void
set_base (int kind)
{
  RugosaLine *line = the_line ();
  GVariantBuilder b;

  g_variant_builder_init (&b, G_VARIANT_TYPE (RUGOSA_LINE_FITTINGS_TYPE));
  g_variant_builder_add (&b, "(sdd)", rg_fitting_at (0)->id, 0.0, 1.0);
  g_variant_builder_add (&b, "(sdd)", "", 0.5, 1.0);
  g_object_set (line,
                "fluid-kind", kind,
                "material-id", NULL, "aging-class-id", NULL, "pipe-designation", NULL,
                "temperature", kind == RG_FLUID_OIL ? 323.15 : 293.15,
                "pressure", 101325.0, "salinity", 0.035,
                "density", 998.0, "viscosity", 1.0e-3,
                "oil-t1", 313.15, "oil-nu1", 1.0e-5, "oil-t2", 373.15, "oil-nu2", 3.0e-6,
                "oil-density-ref", 870.0, "oil-t-ref", 288.15, "oil-expansion", 7.0e-4,
                "roughness", 4.5e-5, "aging-rate", 1.0e-5,
                "inner-diameter", 0.15, "length", 100.0, "elevation", 2.0,
                "flow-design", 0.012, "flow-minimum", 0.006, "flow-maximum", 0.015,
                "fittings", g_variant_builder_end (&b),
                NULL);
  rugosa_history_clear (rugosa_window_get_history (win));
  /* Errors belong to the line shown: showing it again clears them. */
  rugosa_line_panel_set_line (the_panel (), NULL);
  rugosa_line_panel_set_line (the_panel (), line);
  ui_harness_drain ();
}

/* Every double property of the line, to see that nothing moved. */
static GArray *
line_values (void)
{
  guint n;
  g_autofree GParamSpec **specs = g_object_class_list_properties (G_OBJECT_GET_CLASS (the_line ()), &n);
  GArray *values = g_array_new (FALSE, FALSE, sizeof (double));

  for (guint i = 0; i < n; i++)
    if (G_IS_PARAM_SPEC_DOUBLE (specs[i]))
      {
        double v = rugosa_line_get_double (the_line (), specs[i]->name);
        g_array_append_val (values, v);
      }
  return values;
}

static gboolean
same_values (GArray *a,
             GArray *b)
{
  return a->len == b->len && memcmp (a->data, b->data, a->len * sizeof (double)) == 0;
}

static gboolean
text_has_non_finite (const char *text)
{
  g_autofree char *lower = text ? g_ascii_strdown (text, -1) : NULL;

  return lower != NULL && (strstr (lower, "nan") != NULL || strstr (lower, "inf") != NULL
                           || strstr (lower, "∞") != NULL);
}

static void
assert_result_finite (const RgLineResult *r)
{
  const double v[] = {
    r->velocity_m_s, r->reynolds, r->relative_roughness, r->friction.f,
    r->friction.f_laminar, r->friction.eps_plus, r->friction.roughness_elasticity,
    r->head_loss_major_m, r->head_loss_minor_m, r->head_loss_total_m,
    r->pressure_drop_pa, r->gradient_m_per_100m, r->wall_shear_pa,
  };
  for (guint i = 0; i < G_N_ELEMENTS (v); i++)
    g_assert_true (isfinite (v[i]));
}

/* No NaN or infinity anywhere the user can see it: the results of every
 * line, every cell of the results table, the chart's points, the panel's
 * warnings. */
static void
assert_nothing_non_finite (void)
{
  RugosaProject *project = rugosa_window_get_project (win);
  RugosaResultsTable *table = RUGOSA_RESULTS_TABLE (rugosa_window_get_results (win));
  const RugosaChartInput *input = rugosa_canvas_get_input (RUGOSA_CANVAS (rugosa_window_get_canvas (win)));
  static const char *columns[] = {
    "velocity", "head-loss", "change", "gradient", "pressure-drop", "reynolds",
    "f", "regime", "zone", "elasticity", "flow", "warnings",
  };

  for (guint i = 0; i < rugosa_project_get_n_lines (project); i++)
    {
      RugosaLine *line = rugosa_project_get_line (project, i);
      const RugosaLineResults *res = rugosa_project_get_results (project, line);
      g_autofree char *warnings = rugosa_readout_warnings (project, line);

      if (res->ok)
        {
          const double v[] = {
            res->age_years, res->density_kg_m3, res->dynamic_viscosity_pa_s,
            res->inner_diameter_m, res->roughness_new_m, res->roughness_m,
            res->aging_rate_m_per_year,
          };
          for (guint j = 0; j < G_N_ELEMENTS (v); j++)
            g_assert_true (isfinite (v[j]));
          for (int p = 0; p < RUGOSA_N_FLOWS; p++)
            if (res->points[p].present && res->points[p].ok)
              {
                g_assert_true (isfinite (res->points[p].flow_m3_s));
                g_assert_true (isfinite (res->points[p].minor_loss_k_total));
                g_assert_true (isfinite (res->points[p].head_loss_ratio_to_new));
                assert_result_finite (&res->points[p].result);
                assert_result_finite (&res->points[p].result_new);
              }
        }
      for (guint c = 0; c < G_N_ELEMENTS (columns); c++)
        {
          g_autofree char *cell = rugosa_results_table_format_cell (table, line, columns[c]);
          if (text_has_non_finite (cell))
            g_test_fail_printf ("table cell %s of line %u reads \"%s\"", columns[c], i, cell);
        }
      if (text_has_non_finite (warnings))
        g_test_fail_printf ("warnings of line %u read \"%s\"", i, warnings);
    }
  g_assert_nonnull (input);
  for (size_t i = 0; i < input->n_lines; i++)
    {
      g_assert_true (isfinite (input->lines[i].re));
      g_assert_true (isfinite (input->lines[i].f));
      g_assert_true (isfinite (input->lines[i].rr_new));
      g_assert_true (isfinite (input->lines[i].rr_aged));
    }
}

/* One clear sentence: a capital or a quote first, a full stop last, one
 * line, short enough for a tooltip or a row subtitle, no format or SI
 * leftovers. */
static void
assert_one_sentence (const char *text)
{
  gunichar first;

  g_assert_nonnull (text);
  g_assert_cmpuint (strlen (text), >=, 10);
  g_assert_cmpuint (g_utf8_strlen (text, -1), <=, 300);
  g_assert_null (strchr (text, '\n'));
  first = g_utf8_get_char (text);
  g_assert_true (g_unichar_isupper (first) || first == '\'' || first == 0x2018 || first == '"');
  g_assert_true (g_str_has_suffix (text, "."));
  g_assert_null (strstr (text, "(SI)"));
  g_assert_null (strstr (text, "(null)"));
  g_assert_null (strchr (text, '%'));
}

/* The visible label of `root`'s tree whose text is `text`. */
static gboolean
shows_label (GtkWidget  *root,
             const char *text)
{
  for (GtkWidget *c = gtk_widget_get_first_child (root); c; c = gtk_widget_get_next_sibling (c))
    {
      if (GTK_IS_LABEL (c) && gtk_widget_is_visible (c)
          && g_strcmp0 (gtk_label_get_text (GTK_LABEL (c)), text) == 0)
        return TRUE;
      if (shows_label (c, text))
        return TRUE;
    }
  return FALSE;
}

static void
collect (GtkWidget *root,
         GType      type,
         GPtrArray *out)
{
  for (GtkWidget *c = gtk_widget_get_first_child (root); c; c = gtk_widget_get_next_sibling (c))
    {
      if (G_TYPE_CHECK_INSTANCE_TYPE (c, type))
        g_ptr_array_add (out, c);
      collect (c, type, out);
    }
}

static const char *
outcome_name (char o)
{
  return o == 'r' ? "refused" : o == 'w' ? "warning" : o == 'a' ? "accepted" : "?";
}

static char *
shown_text (const char *text)
{
  if (text == NULL)
    return g_strdup_printf ("%d × `1`", LONG_DIGITS);
  if (*text == '\0')
    return g_strdup ("(empty)");
  return g_strdup_printf ("`%s`", text);
}

/* One row of the table: what was typed, what happened, the note of a
 * validity row and what the user reads (one line; "|" would end a cell). */
static void
record (const char *path,
        const char *text,
        char        outcome,
        const char *note,
        const char *message)
{
  g_autofree char *shown = shown_text (text);
  g_autofree char *msg = g_strdup (message ? message : "");
  g_auto (GStrv) lines = NULL;
  g_autofree char *joined = NULL;

  if (markdown == NULL)
    return;
  g_strdelimit (msg, "|", '/');
  lines = g_strsplit (msg, "\n", -1);
  joined = g_strjoinv (" ", lines);
  g_string_append_printf (markdown, "| `%s` | %s | %s | %s | %s |\n", path, shown,
                          outcome_name (outcome), note ? note : "", joined);
}

/* --- line panel fields ------------------------------------------------ */

typedef struct {
  char *path;
  const char *property;
  int kind;
  char *text;      /* NULL: long_text */
  char expect;
  const char *note;
} LineRow;

static void
test_line_row (gconstpointer data)
{
  const LineRow *row = data;
  RugosaLinePanel *panel;
  RugosaQuantityEntry *entry;
  RugosaHistory *history = rugosa_window_get_history (win);
  RugosaLine *line = the_line ();
  g_autoptr (GArray) before = NULL;
  g_autoptr (GArray) after = NULL;
  g_autofree char *warnings = NULL;
  const char *error;
  char outcome;

  set_base (row->kind);
  panel = the_panel ();
  entry = rugosa_line_panel_get_entry (panel, row->property);
  g_assert_nonnull (entry);
  g_assert_true (gtk_widget_is_visible (GTK_WIDGET (entry)));
  g_assert_true (gtk_widget_is_sensitive (GTK_WIDGET (entry)));
  /* The starting line evaluates and warns of nothing. */
  {
    g_autofree char *base_warnings = rugosa_readout_warnings (rugosa_window_get_project (win), line);
    g_assert_cmpstr (base_warnings, ==, NULL);
  }
  before = line_values ();

  rugosa_quantity_entry_commit_text (entry, row->text ? row->text : long_text);
  ui_harness_drain ();

  error = rugosa_quantity_entry_get_error_text (entry);
  warnings = rugosa_readout_warnings (rugosa_window_get_project (win), line);
  after = line_values ();
  outcome = error ? 'r' : warnings ? 'w' : 'a';
  record (row->path + strlen ("/ui/bad-input/"), row->text, outcome, row->note,
          error ? error : warnings);

  assert_nothing_non_finite ();
  g_assert_false (text_has_non_finite (gtk_editable_get_text (rugosa_quantity_entry_get_editable (entry)))
                  && error == NULL);

  if (outcome != row->expect)
    {
      g_test_fail_printf ("%s: expected %s, got %s (%s)", row->path, outcome_name (row->expect),
                          outcome_name (outcome), error ? error : warnings ? warnings : "");
      return;
    }

  if (outcome == 'r')
    {
      GtkWidget *field = GTK_WIDGET (rugosa_quantity_entry_get_editable (entry));
      GtkWidget *arow = gtk_widget_get_ancestor (GTK_WIDGET (entry), ADW_TYPE_ACTION_ROW);

      g_assert_true (gtk_widget_has_css_class (field, "error"));
      assert_one_sentence (error);
      /* Beside the field: the row's subtitle and the tooltip say it. */
      g_assert_nonnull (arow);
      g_assert_cmpstr (adw_action_row_get_subtitle (ADW_ACTION_ROW (arow)), ==, error);
      g_assert_cmpstr (gtk_widget_get_tooltip_text (GTK_WIDGET (entry)), ==, error);
      /* The last valid value stays in force. */
      g_assert_true (same_values (before, after));
      g_assert_false (rugosa_history_can_undo (history));
    }
  else
    {
      double v = rugosa_line_get_double (line, row->property);

      g_assert_true (isfinite (v));
      g_assert_false (same_values (before, after));
      g_assert_true (rugosa_history_can_undo (history));
      if (outcome == 'w')
        g_assert_true (shows_label (GTK_WIDGET (panel), warnings));
    }
}

/* --- plain K of an "other loss" --------------------------------------- */

typedef struct {
  char *path;
  char *text;
  char expect;
} KRow;

/* The K entry of the fitting list: the plain GtkEntry that carries an
 * index (quantity entries and the name hold none). */
static GtkEntry *
find_k_entry (void)
{
  g_autoptr (GPtrArray) entries = g_ptr_array_new ();

  collect (GTK_WIDGET (the_panel ()), GTK_TYPE_ENTRY, entries);
  for (guint i = 0; i < entries->len; i++)
    if (g_object_get_data (entries->pdata[i], "index") != NULL
        || (gtk_widget_get_ancestor (entries->pdata[i], RUGOSA_TYPE_QUANTITY_ENTRY) == NULL
            && gtk_widget_get_ancestor (entries->pdata[i], ADW_TYPE_EXPANDER_ROW) != NULL))
      return entries->pdata[i];
  return NULL;
}

static double
k_plain (void)
{
  GVariant *fittings = rugosa_line_get_fittings (the_line ());
  GVariantIter iter;
  const char *id;
  double k, count;

  g_variant_iter_init (&iter, fittings);
  while (g_variant_iter_next (&iter, "(&sdd)", &id, &k, &count))
    if (*id == '\0')
      return k;
  g_assert_not_reached ();
}

static void
test_k_row (gconstpointer data)
{
  const KRow *row = data;
  RugosaHistory *history = rugosa_window_get_history (win);
  GtkEntry *entry;
  GtkWidget *arow;
  g_autofree char *message = NULL;
  double k_before;
  char outcome;

  set_base (RG_FLUID_WATER);
  entry = find_k_entry ();
  g_assert_nonnull (entry);
  arow = gtk_widget_get_ancestor (GTK_WIDGET (entry), ADW_TYPE_ACTION_ROW);
  k_before = k_plain ();

  g_object_ref (entry);
  gtk_editable_set_text (GTK_EDITABLE (entry), row->text ? row->text : long_text);
  g_signal_emit_by_name (entry, "activate");
  ui_harness_drain ();

  if (rugosa_history_can_undo (history))
    outcome = 'a';
  else
    {
      outcome = 'r';
      message = g_strdup (arow ? adw_action_row_get_subtitle (ADW_ACTION_ROW (arow)) : NULL);
    }
  record (row->path + strlen ("/ui/bad-input/"), row->text, outcome, NULL, message);
  assert_nothing_non_finite ();

  if (outcome != row->expect)
    g_test_fail_printf ("%s: expected %s, got %s", row->path, outcome_name (row->expect), outcome_name (outcome));
  else if (outcome == 'r')
    {
      g_assert_true (gtk_widget_has_css_class (GTK_WIDGET (entry), "error"));
      assert_one_sentence (message);
      g_assert_cmpstr (gtk_widget_get_tooltip_text (GTK_WIDGET (entry)), ==, message);
      g_assert_cmpfloat (k_plain (), ==, k_before);
      /* Typing the old K back is no edit, but clears the mark. */
      gtk_editable_set_text (GTK_EDITABLE (entry), "0.5");
      g_signal_emit_by_name (entry, "activate");
      ui_harness_drain ();
      g_assert_false (gtk_widget_has_css_class (GTK_WIDGET (entry), "error"));
      g_assert_false (arow != NULL && gtk_widget_has_css_class (arow, "field-error"));
      g_assert_false (rugosa_history_can_undo (history));
    }
  else
    g_assert_true (isfinite (k_plain ()));
  g_object_unref (entry);
}

/* --- spin buttons ----------------------------------------------------- */

typedef struct {
  char *path;
  const Spin *spin;
  char *text;
  char expect;
} SpinRow;

static GtkSpinButton *
find_spin (GtkWidget  *root,
           const Spin *spin)
{
  g_autoptr (GPtrArray) found = g_ptr_array_new ();

  collect (root, GTK_TYPE_SPIN_BUTTON, found);
  for (guint i = 0; i < found->len; i++)
    {
      GtkSpinButton *s = found->pdata[i];
      gboolean has_index = g_object_get_data (G_OBJECT (s), "index") != NULL
                           || gtk_widget_get_ancestor (GTK_WIDGET (s), ADW_TYPE_EXPANDER_ROW) != NULL;

      if (spin->where == SPIN_FITTING_COUNT && has_index)
        return s;
      if (spin->where == SPIN_OIL_EXPANSION && !has_index)
        return s;
    }
  return NULL;
}

/* A preference's spin button: the one whose range is the key's range. */
static GtkSpinButton *
find_pref_spin (GtkWidget  *prefs,
                GSettings  *settings,
                const char *key)
{
  g_autoptr (GPtrArray) found = g_ptr_array_new ();
  g_autoptr (GSettingsSchema) schema = NULL;
  g_autoptr (GSettingsSchemaKey) skey = NULL;
  g_autoptr (GVariant) range = NULL;
  g_autoptr (GVariant) limits = NULL;
  const char *kind;
  double lo, hi;

  g_object_get (settings, "settings-schema", &schema, NULL);
  skey = g_settings_schema_get_key (schema, key);
  range = g_settings_schema_key_get_range (skey);
  g_variant_get (range, "(&sv)", &kind, &limits);
  g_variant_get (limits, "(dd)", &lo, &hi);
  collect (prefs, GTK_TYPE_SPIN_BUTTON, found);
  for (guint i = 0; i < found->len; i++)
    {
      double a, b;
      gtk_spin_button_get_range (found->pdata[i], &a, &b);
      if (a == lo && b == hi)
        return found->pdata[i];
    }
  return NULL;
}

static void
test_spin_row (gconstpointer data)
{
  const SpinRow *row = data;
  GSettings *settings = rugosa_application_get_settings (app);
  RugosaHistory *history = rugosa_window_get_history (win);
  RugosaPreferencesWindow *prefs = NULL;
  GtkSpinButton *spin;
  g_autoptr (GArray) before = NULL;
  g_autoptr (GArray) after = NULL;
  double lo, hi, v_before, v_after;
  char outcome;

  if (row->spin->where == SPIN_PREFERENCE)
    {
      set_base (RG_FLUID_WATER);
      g_settings_reset (settings, row->spin->id);
      prefs = rugosa_preferences_window_new (settings);
      spin = find_pref_spin (GTK_WIDGET (prefs), settings, row->spin->id);
    }
  else
    {
      set_base (row->spin->where == SPIN_OIL_EXPANSION ? RG_FLUID_OIL : RG_FLUID_WATER);
      spin = find_spin (GTK_WIDGET (the_panel ()), row->spin);
    }
  g_assert_nonnull (spin);
  gtk_spin_button_get_range (spin, &lo, &hi);
  v_before = row->spin->where == SPIN_PREFERENCE ? g_settings_get_double (settings, row->spin->id)
                                                 : gtk_spin_button_get_value (spin);
  before = line_values ();

  g_object_ref (spin);
  gtk_editable_set_text (GTK_EDITABLE (spin), row->text ? row->text : long_text);
  gtk_spin_button_update (spin);
  ui_harness_drain ();

  /* The panel may have rebuilt its rows: what the user sees now is the
   * spin button found now. */
  if (row->spin->where != SPIN_PREFERENCE)
    {
      g_object_unref (spin);
      spin = g_object_ref (find_spin (GTK_WIDGET (the_panel ()), row->spin));
    }
  v_after = row->spin->where == SPIN_PREFERENCE ? g_settings_get_double (settings, row->spin->id)
                                                : gtk_spin_button_get_value (spin);
  after = line_values ();
  outcome = v_after == v_before && same_values (before, after) && !rugosa_history_can_undo (history) ? 'r' : 'a';
  record (row->path + strlen ("/ui/bad-input/"), row->text, outcome, NULL,
          outcome == 'r' ? gtk_widget_get_tooltip_text (GTK_WIDGET (spin)) : NULL);

  g_assert_true (isfinite (v_after));
  g_assert_cmpfloat (v_after, >=, lo);
  g_assert_cmpfloat (v_after, <=, hi);
  g_assert_false (text_has_non_finite (gtk_editable_get_text (GTK_EDITABLE (spin))));
  assert_nothing_non_finite ();
  if (outcome != row->expect)
    g_test_fail_printf ("%s: expected %s, got %s (%g -> %g)", row->path, outcome_name (row->expect),
                        outcome_name (outcome), v_before, v_after);
  else if (outcome == 'r')
    {
      GtkWidget *arow = gtk_widget_get_ancestor (GTK_WIDGET (spin), ADW_TYPE_ACTION_ROW);

      /* The last value is back in the field, marked, with the reason in
       * the tooltip and under the row's title. */
      g_assert_true (gtk_widget_has_css_class (GTK_WIDGET (spin), "error"));
      assert_one_sentence (gtk_widget_get_tooltip_text (GTK_WIDGET (spin)));
      g_assert_nonnull (arow);
      g_assert_cmpstr (adw_action_row_get_subtitle (ADW_ACTION_ROW (arow)), ==,
                       gtk_widget_get_tooltip_text (GTK_WIDGET (spin)));
    }
  else
    g_assert_false (gtk_widget_has_css_class (GTK_WIDGET (spin), "error"));
  g_object_unref (spin);
  if (prefs != NULL)
    {
      gtk_window_destroy (GTK_WINDOW (prefs));
      g_settings_reset (settings, row->spin->id);
      ui_harness_drain ();
    }
}

/* The laminar limit typed above the turbulent one: both lie inside their
 * own ranges (2100 to 3000 overlap), but not in order. */
static void
test_limits_out_of_order (void)
{
  GSettings *settings = rugosa_application_get_settings (app);
  RugosaPreferencesWindow *prefs;
  GtkSpinButton *spin;
  RugosaSettings *ps = NULL;
  double lam, turb, re_lam;

  set_base (RG_FLUID_WATER);
  g_settings_reset (settings, "re-laminar-max");
  g_settings_set_double (settings, "re-turbulent-min", 2500.0);
  ui_harness_drain ();
  prefs = rugosa_preferences_window_new (settings);
  spin = find_pref_spin (GTK_WIDGET (prefs), settings, "re-laminar-max");
  g_assert_nonnull (spin);
  ps = rugosa_project_get_settings (rugosa_window_get_project (win));
  g_object_get (ps, "re-laminar-max", &re_lam, NULL);

  gtk_editable_set_text (GTK_EDITABLE (spin), "2900");
  gtk_spin_button_update (spin);
  ui_harness_drain ();

  lam = g_settings_get_double (settings, "re-laminar-max");
  turb = g_settings_get_double (settings, "re-turbulent-min");
  record ("laminar-limit/above-turbulent", "2900", lam < turb ? 'r' : 'a',
          "inside its own range, but above the turbulent limit of 2500",
          gtk_widget_get_tooltip_text (GTK_WIDGET (spin)));
  g_assert_cmpfloat (lam, <, turb);
  g_assert_cmpfloat (gtk_spin_button_get_value (spin), ==, lam);
  g_assert_true (gtk_widget_has_css_class (GTK_WIDGET (spin), "error"));
  assert_one_sentence (gtk_widget_get_tooltip_text (GTK_WIDGET (spin)));
  {
    double after;
    g_object_get (ps, "re-laminar-max", &after, NULL);
    g_assert_cmpfloat (after, ==, re_lam);
  }
  assert_nothing_non_finite ();

  gtk_window_destroy (GTK_WINDOW (prefs));
  g_settings_reset (settings, "re-laminar-max");
  g_settings_reset (settings, "re-turbulent-min");
  ui_harness_drain ();
}

/* Two refusals on screen at once: a length out of range and a plain K
 * that is not a number; then the preferences with a refused limit. */
static void
test_pictures (void)
{
  GSettings *settings = rugosa_application_get_settings (app);
  RugosaPreferencesWindow *prefs;
  GtkSpinButton *spin;
  GtkEntry *k;
  GtkWidget *expander;

  set_base (RG_FLUID_WATER);
  g_assert_false (rugosa_quantity_entry_commit_text (rugosa_line_panel_get_entry (the_panel (), "length"), "12 furlongs"));
  k = find_k_entry ();
  g_assert_nonnull (k);
  expander = gtk_widget_get_ancestor (GTK_WIDGET (k), ADW_TYPE_EXPANDER_ROW);
  adw_expander_row_set_expanded (ADW_EXPANDER_ROW (expander), TRUE);
  gtk_editable_set_text (GTK_EDITABLE (k), "lots");
  g_signal_emit_by_name (k, "activate");
  ui_harness_drain ();
  g_assert_true (gtk_widget_has_css_class (GTK_WIDGET (k), "error"));
  {
    /* Scroll the panel so that the length row is at its top. */
    GtkWidget *length = GTK_WIDGET (rugosa_line_panel_get_entry (the_panel (), "length"));
    GtkWidget *scroller = gtk_widget_get_ancestor (length, GTK_TYPE_SCROLLED_WINDOW);
    graphene_point_t at;

    gtk_test_widget_wait_for_draw (GTK_WIDGET (win));
    g_assert_nonnull (scroller);
    g_assert_true (gtk_widget_compute_point (length, gtk_scrolled_window_get_child (GTK_SCROLLED_WINDOW (scroller)),
                                             &GRAPHENE_POINT_INIT (0, 0), &at));
    gtk_adjustment_set_value (gtk_scrolled_window_get_vadjustment (GTK_SCROLLED_WINDOW (scroller)), at.y - 60);
    /* Let the expander's reveal animation finish. */
    for (int i = 0; i < 40; i++)
      {
        g_usleep (10000);
        ui_harness_drain ();
      }
  }
  ui_harness_save_png (GTK_WIDGET (win), "bad-input-panel.png");

  prefs = rugosa_preferences_window_new (settings);
  gtk_window_set_default_size (GTK_WINDOW (prefs), 700, 900);
  gtk_window_present (GTK_WINDOW (prefs));
  spin = find_pref_spin (GTK_WIDGET (prefs), settings, "velocity-limit");
  adw_preferences_window_set_visible_page (ADW_PREFERENCES_WINDOW (prefs),
                                           ADW_PREFERENCES_PAGE (gtk_widget_get_ancestor (GTK_WIDGET (spin), ADW_TYPE_PREFERENCES_PAGE)));
  gtk_editable_set_text (GTK_EDITABLE (spin), "fast");
  gtk_spin_button_update (spin);
  ui_harness_drain ();
  g_assert_true (gtk_widget_has_css_class (GTK_WIDGET (spin), "error"));
  ui_harness_save_png (GTK_WIDGET (prefs), "bad-input-preferences.png");
  gtk_window_destroy (GTK_WINDOW (prefs));
  ui_harness_drain ();
}

/* --- main ------------------------------------------------------------- */

static void
add_rows (void)
{
  for (guint f = 0; f < G_N_ELEMENTS (fields); f++)
    for (int c = 0; c < N_CLASSES; c++)
      {
        LineRow *row = g_new0 (LineRow, 1);

        row->path = g_strdup_printf ("/ui/bad-input/%s/%s", fields[f].property, class_ids[c]);
        row->property = fields[f].property;
        row->kind = fields[f].kind;
        row->text = class_text (c, fields[f].unit, fields[f].other_unit);
        row->expect = fields[f].expect[c];
        g_test_add_data_func (row->path, row, test_line_row);
      }
  for (guint s = 0; s < G_N_ELEMENTS (specials); s++)
    {
      LineRow *row = g_new0 (LineRow, 1);

      row->path = g_strdup_printf ("/ui/bad-input/%s/%s", specials[s].property, specials[s].id);
      row->property = specials[s].property;
      row->kind = specials[s].kind;
      row->text = g_strdup (specials[s].text);
      row->expect = specials[s].expect;
      row->note = specials[s].why;
      g_test_add_data_func (row->path, row, test_line_row);
    }
  for (int c = 0; c < N_CLASSES; c++)
    {
      KRow *row = g_new0 (KRow, 1);

      row->path = g_strdup_printf ("/ui/bad-input/fitting-k/%s", class_ids[c]);
      row->text = class_number (c);
      row->expect = k_expect[c];
      g_test_add_data_func (row->path, row, test_k_row);
    }
  for (guint s = 0; s < G_N_ELEMENTS (spins); s++)
    for (int c = 0; c < N_CLASSES; c++)
      {
        SpinRow *row = g_new0 (SpinRow, 1);

        row->path = g_strdup_printf ("/ui/bad-input/%s/%s", spins[s].id, class_ids[c]);
        row->spin = &spins[s];
        row->text = class_number (c);
        row->expect = spins[s].expect[c];
        g_test_add_data_func (row->path, row, test_spin_row);
      }
  g_test_add_func ("/ui/bad-input/laminar-limit/above-turbulent", test_limits_out_of_order);
  g_test_add_func ("/ui/bad-input/pictures", test_pictures);
}

int
main (int argc, char *argv[])
{
  const char *markdown_path = NULL;
  g_autofree char *tmpdir = NULL;
  int status;

  for (int i = 1; i < argc; i++)
    if (g_str_has_prefix (argv[i], "--markdown="))
      {
        markdown_path = argv[i] + strlen ("--markdown=");
        for (int j = i; j < argc; j++)
          argv[j] = argv[j + 1];
        argc--;
        break;
      }

  tmpdir = ui_harness_private_dirs ("rugosa-test-bad-input");
  g_test_init (&argc, &argv, NULL);
  /* A row reports every check that fails, not only the first. */
  g_test_set_nonfatal_assertions ();
  if (!ui_harness_init_gtk ())
    {
      g_print ("1..0 # SKIP no display\n");
      ui_harness_remove_tree (tmpdir);
      return 0;
    }
  app = ui_harness_app_new ("org.rugosa.Rugosa.TestBadInput");

  long_text = g_malloc (LONG_DIGITS + 1);
  memset (long_text, '1', LONG_DIGITS);
  long_text[LONG_DIGITS] = '\0';
  if (markdown_path != NULL)
    markdown = g_string_new (NULL);

  win = ui_harness_open_demo (app);
  gtk_single_selection_set_selected (rugosa_window_get_selection (win), 0);
  ui_harness_drain ();

  add_rows ();
  status = g_test_run ();

  if (markdown != NULL)
    {
      g_autoptr (GError) error = NULL;

      g_string_prepend (markdown, DOC_HEADER
                        "| row: `/ui/bad-input/…` | typed | outcome | why (validity rows) | what the user reads |\n"
                        "|---|---|---|---|---|\n");
      if (!g_file_set_contents (markdown_path, markdown->str, -1, &error))
        g_printerr ("%s\n", error->message);
      g_string_free (markdown, TRUE);
    }
  gtk_window_destroy (GTK_WINDOW (win));
  ui_harness_drain ();
  g_object_unref (app);
  g_free (long_text);
  ui_harness_remove_tree (tmpdir);
  return status;
}
