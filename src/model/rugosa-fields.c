/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The field tables of a line option and of the project settings (see
 * rugosa-fields.h).
 *
 * Ranges: a row's range is what a project may hold and what every face
 * accepts for the field.  Where the core enforces a limit on the same input
 * (the custom fluid, the oil, seawater's salinity, the aging model, the
 * transition range) the row uses the core's constant; a state shared by
 * several fluids (temperature, pressure) spans their ranges.  Whether a value is valid for a correlation (water
 * above its boiling point, an oil outside its viscosity data) is decided by
 * the core when the line is evaluated: such a line loads, and shows the
 * core's sentence.
 *
 * Defaults: a new line is fresh water at room temperature in a 100 m run of
 * 100 mm bore at 10 L/s (a starting point to be changed); the fluid state's
 * defaults are the core's (rg_fluid_spec_init).  The transition range
 * 2000–4000 is the common textbook choice, the chart window spans the usual
 * friction-chart range, and 3 m/s and 5 m per 100 m are rule-of-thumb
 * warning limits for water lines that the user is expected to change.
 * Common practice (no single source) for all of these.
 *
 * Energy and cost (rugosa-life-cycle.c): a pump and motor together turn
 * about 70 % of the electric power into hydraulic power; a pumped main
 * runs most of the year (8000 h of the 8766 h of a Julian year); 0.15 per
 * kWh is a typical tariff; pipe works are judged over 30 years at a 5 %
 * discount rate.  Common practice (no single source), to be changed: the
 * currency label, the price, the service life and the discount rate are
 * the user's or the organisation's, so new projects take them from the
 * preferences (RUGOSA_FIELD_SEEDED); the efficiency and the hours belong
 * to the pump and the duty of one project, so they are not seeded. */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <math.h>
#include <stdlib.h>
#include <string.h>

#include "core/aging.h"
#include "core/air.h"
#include "core/fluid.h"
#include "core/oil.h"
#include "core/regime.h"
#include "core/seawater.h"
#include "core/units.h"
#include "core/water.h"
#include "rugosa-display.h"
#include "rugosa-fields.h"
#include "rugosa-line-private.h"
#include "rugosa-settings-private.h"
#include "rugosa-units.h"

#define SECONDS_PER_YEAR RG_UNITS_SECONDS_PER_YEAR
#define HOURS_PER_YEAR (RG_UNITS_SECONDS_PER_YEAR / 3600.0) /* the same year in hours */

/* The temperature and pressure rows hold the state of several fluids:
 * their range spans the fluids' ranges (the core checks each fluid's). */
#define T_LOWEST MIN (MIN (RG_WATER_T_MIN_K, RG_SEAWATER_T_MIN_K), MIN (RG_OIL_T_MIN_K, RG_AIR_T_MIN_K))
#define T_HIGHEST MAX (MAX (RG_WATER_T_MAX_K, RG_SEAWATER_T_MAX_K), MAX (RG_OIL_T_MAX_K, RG_AIR_T_MAX_K))
#define P_LOWEST RG_AIR_P_MIN_PA
#define P_HIGHEST MAX (MAX (RG_WATER_P_MAX_PA, RG_SEAWATER_P_MAX_PA), RG_AIR_P_MAX_PA)

#define L(field) G_STRUCT_OFFSET (RugosaLine, field)
#define S(field) G_STRUCT_OFFSET (RugosaSettings, field)
#define SPEC(field) ((gssize) G_STRUCT_OFFSET (RgFluidSpec, field))
#define SUBJ(s) RG_SUBJECT_BIT (RG_SUBJECT_##s)

/* Shorthands for the rows: a number, a text. */
#define NUM(prop, path, disp, lo, hi, def, fl, label, help, cli, subj, off, spec) \
  { prop, path, RUGOSA_FIELD_NUMBER, RUGOSA_DISPLAY_##disp, 1.0, lo, hi, def, \
    NULL, fl, label, help, NULL, cli, subj, NULL, NULL, 0, off, spec, 0 }
/* A number that is a state of the fluids `kinds` (part of the fluid). */
#define FLUID_NUM(prop, path, disp, lo, hi, def, fl, label, help, cli, subj, off, spec, kinds) \
  { prop, path, RUGOSA_FIELD_NUMBER, RUGOSA_DISPLAY_##disp, 1.0, lo, hi, def, \
    NULL, fl, label, help, NULL, cli, subj, NULL, NULL, 0, off, spec, kinds, \
    RUGOSA_LINE_PART_FLUID }
/* A number of the flow case. */
#define FLOW_NUM(prop, path, disp, lo, hi, def, fl, label, help, cli, subj, off) \
  { prop, path, RUGOSA_FIELD_NUMBER, RUGOSA_DISPLAY_##disp, 1.0, lo, hi, def, \
    NULL, fl, label, help, NULL, cli, subj, NULL, NULL, 0, off, -1, 0, \
    RUGOSA_LINE_PART_FLOW }
#define WATER RUGOSA_FLUID_BIT (RG_FLUID_WATER)
#define SEAWATER RUGOSA_FLUID_BIT (RG_FLUID_SEAWATER)
#define OIL RUGOSA_FLUID_BIT (RG_FLUID_OIL)
#define AIR RUGOSA_FLUID_BIT (RG_FLUID_AIR)
#define CUSTOM RUGOSA_FLUID_BIT (RG_FLUID_CUSTOM)

static RugosaField line_fields[] = {
  { "name", "name", RUGOSA_FIELD_TEXT, RUGOSA_DISPLAY_NUMBER, 1.0, 0, 0, 0, "",
    RUGOSA_FIELD_REQUIRED, N_("Name"),
    N_("The name shown in the list of line options and on the chart."),
    NULL, NULL, 0, NULL, NULL, 200, L (name), -1 },
  { "colour", "colour", RUGOSA_FIELD_COLOUR, RUGOSA_DISPLAY_NUMBER, 1.0, 0, 0, 0,
    "#2a7ab0", 0, N_("Colour"),
    N_("The colour of the line's marker, as #rrggbb."),
    NULL, NULL, 0, NULL, NULL, 7, L (colour), -1 },
  /* a tag for reading many options: the list shows and hides a group's
   * lines together (not a result: nothing computed depends on it) */
  { "group", "group", RUGOSA_FIELD_TEXT, RUGOSA_DISPLAY_NUMBER, 1.0, 0, 0, 0, "",
    0, N_("Group"),
    N_("A group or tag of the line option; the list of line options filters, shows and hides a group's lines together."),
    NULL, NULL, 0, NULL, NULL, 100, L (group), -1 },
  { "note", "note", RUGOSA_FIELD_TEXT, RUGOSA_DISPLAY_NUMBER, 1.0, 0, 0, 0, "",
    RUGOSA_FIELD_MULTILINE, N_("Note"),
    N_("Free text about the line option."),
    NULL, NULL, 0, NULL, NULL, 20000, L (note), -1 },
  { "fluid-kind", "fluid.kind", RUGOSA_FIELD_ENUM, RUGOSA_DISPLAY_NUMBER, 1.0, 0, 0,
    RG_FLUID_WATER, NULL, RUGOSA_FIELD_REQUIRED_IN_GROUP, N_("Fluid"),
    N_("Which property model gives the fluid's density and viscosity."),
    NULL, "--fluid", SUBJ (FLUID), NULL, rugosa_fluid_kind_get_type, 0,
    L (fluid_kind), -1, 0, RUGOSA_LINE_PART_FLUID },
  FLUID_NUM ("temperature", "fluid.temperature_K", TEMPERATURE, T_LOWEST, T_HIGHEST, 0,
       RUGOSA_FIELD_CORE_DEFAULT | RUGOSA_FIELD_STATE_REQUIRED, N_("Temperature"),
       N_("The fluid's temperature."),
       "--temperature", SUBJ (TEMPERATURE), L (temperature), SPEC (temperature_k), WATER | SEAWATER | OIL | AIR),
  FLUID_NUM ("pressure", "fluid.pressure_Pa", PRESSURE, P_LOWEST, P_HIGHEST, 0,
       RUGOSA_FIELD_CORE_DEFAULT, N_("Pressure"),
       N_("The fluid's absolute pressure."),
       "--pressure", SUBJ (PRESSURE), L (pressure), SPEC (pressure_pa), WATER | SEAWATER | AIR),
  FLUID_NUM ("salinity", "fluid.salinity_kg_kg", SALINITY, RG_SEAWATER_S_MIN_KG_KG, RG_SEAWATER_S_MAX_KG_KG, 0,
       RUGOSA_FIELD_CORE_DEFAULT | RUGOSA_FIELD_STATE_REQUIRED, N_("Salinity"),
       N_("The mass of salt per mass of seawater."),
       "--salinity", SUBJ (SALINITY), L (salinity), SPEC (salinity_kg_kg), SEAWATER),
  FLUID_NUM ("density", "fluid.density_kg_m3", DENSITY, RG_FLUID_CUSTOM_DENSITY_MIN_KG_M3, RG_FLUID_CUSTOM_DENSITY_MAX_KG_M3, 1000.0, RUGOSA_FIELD_STATE_REQUIRED,
       N_("Density"), N_("The density of a fluid given by its properties."),
       "--density", SUBJ (DENSITY), L (density), SPEC (density_kg_m3), CUSTOM),
  FLUID_NUM ("viscosity", "fluid.dynamic_viscosity_Pa_s", DYNAMIC_VISCOSITY, RG_FLUID_CUSTOM_VISCOSITY_MIN_PA_S, RG_FLUID_CUSTOM_VISCOSITY_MAX_PA_S,
       1.0e-3, RUGOSA_FIELD_STATE_REQUIRED, N_("Viscosity"),
       N_("The dynamic viscosity of a fluid given by its properties; a kinematic viscosity (cSt, mm²/s) is converted with the density."),
       "--viscosity", SUBJ (VISCOSITY), L (viscosity), SPEC (viscosity_pa_s), CUSTOM),
  FLUID_NUM ("oil-t1", "fluid.oil.t1_K", TEMPERATURE, RG_OIL_T_MIN_K, RG_OIL_T_MAX_K, 0,
       RUGOSA_FIELD_CORE_DEFAULT | RUGOSA_FIELD_STATE_REQUIRED, N_("First temperature"),
       N_("The temperature of the oil's first viscosity value."),
       "--oil-t1", SUBJ (OIL_T1), L (oil_t1), SPEC (oil_t1_k), OIL),
  FLUID_NUM ("oil-nu1", "fluid.oil.nu1_m2_s", KINEMATIC_VISCOSITY, RG_OIL_NU_MIN_M2_S, RG_OIL_NU_MAX_M2_S, 0,
       RUGOSA_FIELD_CORE_DEFAULT | RUGOSA_FIELD_STATE_REQUIRED, N_("Viscosity at the first temperature"),
       N_("The oil's kinematic viscosity at the first temperature."),
       "--oil-nu1", SUBJ (OIL_NU1), L (oil_nu1), SPEC (oil_nu1_m2_s), OIL),
  FLUID_NUM ("oil-t2", "fluid.oil.t2_K", TEMPERATURE, RG_OIL_T_MIN_K, RG_OIL_T_MAX_K, 0,
       RUGOSA_FIELD_CORE_DEFAULT | RUGOSA_FIELD_STATE_REQUIRED, N_("Second temperature"),
       N_("The temperature of the oil's second viscosity value."),
       "--oil-t2", SUBJ (OIL_T2), L (oil_t2), SPEC (oil_t2_k), OIL),
  FLUID_NUM ("oil-nu2", "fluid.oil.nu2_m2_s", KINEMATIC_VISCOSITY, RG_OIL_NU_MIN_M2_S, RG_OIL_NU_MAX_M2_S, 0,
       RUGOSA_FIELD_CORE_DEFAULT | RUGOSA_FIELD_STATE_REQUIRED, N_("Viscosity at the second temperature"),
       N_("The oil's kinematic viscosity at the second temperature."),
       "--oil-nu2", SUBJ (OIL_NU2), L (oil_nu2), SPEC (oil_nu2_m2_s), OIL),
  FLUID_NUM ("oil-density-ref", "fluid.oil.density_ref_kg_m3", DENSITY, RG_OIL_DENSITY_MIN_KG_M3, RG_OIL_DENSITY_MAX_KG_M3, 0,
       RUGOSA_FIELD_CORE_DEFAULT | RUGOSA_FIELD_STATE_REQUIRED, N_("Oil density"),
       N_("The oil's density at its reference temperature."),
       "--oil-density", SUBJ (OIL_DENSITY_REF), L (oil_density_ref),
       SPEC (oil_density_ref_kg_m3), OIL),
  FLUID_NUM ("oil-t-ref", "fluid.oil.t_ref_K", TEMPERATURE, RG_OIL_T_MIN_K, RG_OIL_T_MAX_K, 0,
       RUGOSA_FIELD_CORE_DEFAULT, N_("Density reference temperature"),
       N_("The temperature at which the oil's density is given."),
       "--oil-density-t", SUBJ (OIL_T_REF), L (oil_t_ref), SPEC (oil_t_ref_k), OIL),
  { "oil-expansion", "fluid.oil.expansion_per_K", RUGOSA_FIELD_NUMBER,
    RUGOSA_DISPLAY_NUMBER, 1.0, RG_OIL_EXPANSION_MIN_PER_K, RG_OIL_EXPANSION_MAX_PER_K, 0, NULL, RUGOSA_FIELD_CORE_DEFAULT,
    N_("Thermal expansion"),
    N_("The oil's volumetric thermal expansion coefficient."),
    "1/K", "--oil-expansion", SUBJ (OIL_EXPANSION), NULL, NULL, 0,
    L (oil_expansion), SPEC (oil_expansion_per_k), OIL, RUGOSA_LINE_PART_FLUID },
  { "material-id", "material.catalog", RUGOSA_FIELD_CATALOG, RUGOSA_DISPLAY_NUMBER,
    1.0, 0, 0, 0, NULL, RUGOSA_FIELD_REQUIRED, N_("Material"),
    N_("A pipe material of the catalog, whose typical roughness when new is used; none: the roughness below."),
    NULL, "--material", SUBJ (MATERIAL), "roughness", NULL, 120,
    L (material_id), -1 },
  NUM ("roughness", "material.roughness_m", ROUGHNESS, 0.0, 0.1, 4.5e-5, 0,
       N_("Roughness when new"),
       N_("The wall's absolute roughness when new, used when no material is chosen."),
       "--roughness", SUBJ (ROUGHNESS), L (roughness), -1),
  { "aging-class-id", "aging.class", RUGOSA_FIELD_CATALOG, RUGOSA_DISPLAY_NUMBER,
    1.0, 0, 0, 0, NULL, 0, N_("Aging"),
    N_("A roughness growth class of the catalog (by the water's aggressiveness); none: the growth rate below."),
    NULL, "--aging", SUBJ (AGING_CLASS), "aging-rate", NULL, 120,
    L (aging_class_id), -1, 0, RUGOSA_LINE_PART_AGING },
  { "aging-rate", "aging.rate_m_per_year", RUGOSA_FIELD_NUMBER,
    RUGOSA_DISPLAY_ROUGHNESS_RATE, 1.0 / SECONDS_PER_YEAR, 0.0, RG_AGING_RATE_MAX_M_PER_YEAR, 0.0, NULL,
    0, N_("Roughness growth"),
    N_("The growth of the roughness per year of service, α in ε(t) = ε₀ + α·t, used when no aging class is chosen."),
    NULL, NULL, SUBJ (AGING_RATE), NULL, NULL, 0, L (aging_rate), -1, 0,
    RUGOSA_LINE_PART_AGING },
  { "pipe-designation", "pipe.designation", RUGOSA_FIELD_CATALOG,
    RUGOSA_DISPLAY_NUMBER, 1.0, 0, 0, 0, NULL, RUGOSA_FIELD_REQUIRED,
    N_("Pipe size"),
    N_("A pipe of the catalogs, written as the trade writes it (\"NPS 4 Sch 40\", \"DN 160 SDR 11\"); none: the inner diameter below."),
    NULL, "--pipe", SUBJ (PIPE), "inner-diameter", NULL, 120,
    L (pipe_designation), -1 },
  NUM ("inner-diameter", "pipe.inner_diameter_m", DIAMETER, 1.0e-4, 20.0, 0.1, 0,
       N_("Inner diameter"),
       N_("The bore, used when no catalog pipe is chosen."),
       "--diameter", SUBJ (DIAMETER), L (inner_diameter), -1),
  NUM ("length", "length_m", LENGTH, 1.0e-3, 1.0e7, 100.0, RUGOSA_FIELD_REQUIRED,
       N_("Length"), N_("The length of the line."),
       "--length", SUBJ (LENGTH), L (length), -1),
  /* Common practice (no single source): no pipeline rises or falls more
   * than the height of the highest mountain; a larger value is a typo. */
  NUM ("elevation", "elevation_change_m", LENGTH, -1.0e4, 1.0e4, 0.0, 0,
       N_("Elevation change"),
       N_("The outlet's height minus the inlet's."),
       "--elevation", SUBJ (ELEVATION), L (elevation), -1),
  { "fittings", "fittings", RUGOSA_FIELD_FITTINGS, RUGOSA_DISPLAY_NUMBER, 1.0, 0,
    0, 0, NULL, 0, N_("Fittings"),
    N_("The minor losses: catalog fittings and plain loss coefficients, each with a count."),
    NULL, "--fitting", SUBJ (FITTING) | SUBJ (K_SUM), NULL, NULL, 0,
    L (fittings), -1 },
  FLOW_NUM ("flow-design", "flow.design_m3_s", FLOW, 0.0, 1.0e4, 0.01,
       RUGOSA_FIELD_REQUIRED | RUGOSA_FIELD_MIN_OPEN, N_("Design flow"),
       N_("The volumetric flow the line is designed for."),
       "--flow", SUBJ (FLOW), L (flow_design)),
  FLOW_NUM ("flow-minimum", "flow.minimum_m3_s", FLOW, 0.0, 1.0e4, 0.0,
       RUGOSA_FIELD_MIN_OPEN | RUGOSA_FIELD_ZERO_ABSENT, N_("Lowest flow"),
       N_("The lowest flow of operation, at most the design flow; none when not given."),
       NULL, SUBJ (FLOW), L (flow_minimum)),
  FLOW_NUM ("flow-maximum", "flow.maximum_m3_s", FLOW, 0.0, 1.0e4, 0.0,
       RUGOSA_FIELD_MIN_OPEN | RUGOSA_FIELD_ZERO_ABSENT, N_("Highest flow"),
       N_("The highest flow of operation, at least the design flow; none when not given."),
       NULL, SUBJ (FLOW), L (flow_maximum)),
  /* Money has no unit to convert: plain numbers in the project's currency
   * (the settings' "currency"). */
  { "cost-per-metre", "cost.price_per_m", RUGOSA_FIELD_NUMBER, RUGOSA_DISPLAY_MONEY,
    1.0, 0.0, 1.0e7, 0.0, NULL, RUGOSA_FIELD_ZERO_ABSENT,
    N_("Capital cost per metre"),
    N_("The cost of laying one metre of the line, in the project's currency; the capital cost is this times the length plus the lump sum. None when not given."),
    "/m", NULL, 0, NULL, NULL, 0, L (cost_per_metre), -1, 0 },
  { "cost-lump-sum", "cost.lump_sum", RUGOSA_FIELD_NUMBER, RUGOSA_DISPLAY_MONEY,
    1.0, 0.0, 1.0e12, 0.0, NULL, RUGOSA_FIELD_ZERO_ABSENT,
    N_("Capital cost, lump sum"),
    N_("A capital cost of the line as a whole (pumps, valves, works), in the project's currency, added to the cost per metre. None when not given."),
    NULL, NULL, 0, NULL, NULL, 0, L (cost_lump_sum), -1, 0 },
  { "pump-curve", "pump.curve", RUGOSA_FIELD_CURVE, RUGOSA_DISPLAY_NUMBER, 1.0, 0,
    0, 0, NULL, 0, N_("Pump curve"),
    N_("The head of the line's pump against its flow: three or more points in order of increasing flow, through which a smooth curve is drawn to find the duty point. None when not given."),
    NULL, NULL, 0, NULL, NULL, 0, L (pump_curve), -1, 0 },
};

/* The project's details, shown in the title block of its report: texts
 * of a printed line's length (a title or a client name of up to 200
 * characters, a revision mark of up to 20), the date as ISO text, and a
 * free note as long as a line option's. */
#define PROJECT_TEXT(prop, path, fl, label, help, max, off) \
  { prop, path, RUGOSA_FIELD_TEXT, RUGOSA_DISPLAY_NUMBER, 1.0, 0, 0, 0, "", \
    fl, label, help, NULL, NULL, 0, NULL, NULL, max, off, -1, 0 }

static RugosaField settings_fields[] = {
  PROJECT_TEXT ("project-title", "project.title", 0, N_("Project title"),
                N_("The title of the project, at the head of its report."),
                200, S (project_title)),
  PROJECT_TEXT ("project-client", "project.client", 0, N_("Client"),
                N_("Who the work is for."), 200, S (project_client)),
  PROJECT_TEXT ("project-location", "project.location", 0, N_("Location"),
                N_("Where the lines are, as a site or a place name."),
                200, S (project_location)),
  PROJECT_TEXT ("project-author", "project.author", 0, N_("Author"),
                N_("Who prepared the calculation."), 200, S (project_author)),
  PROJECT_TEXT ("project-revision", "project.revision", 0, N_("Revision"),
                N_("The revision mark of the calculation (\"A\", \"2\", \"P03\")."),
                20, S (project_revision)),
  PROJECT_TEXT ("project-date", "project.date", RUGOSA_FIELD_DATE, N_("Date"),
                N_("The date of this revision, as YYYY-MM-DD; empty: the report shows the day it is made."),
                10, S (project_date)),
  PROJECT_TEXT ("project-note", "project.note", RUGOSA_FIELD_MULTILINE, N_("Project note"),
                N_("Free text about the project: the purpose, the basis of the data, what is left open."),
                20000, S (project_note)),
  { "unit-system", "units.system", RUGOSA_FIELD_ENUM, RUGOSA_DISPLAY_NUMBER, 1.0,
    0, 0, RUGOSA_UNIT_SYSTEM_SI, NULL, RUGOSA_FIELD_SEEDED, N_("Unit system"),
    N_("The family of units results are shown in: SI, or US customary."),
    NULL, NULL, 0, NULL, rugosa_unit_system_get_type, 0, S (unit_system), -1 },
  { "unit-overrides", "units.overrides", RUGOSA_FIELD_UNIT_MAP,
    RUGOSA_DISPLAY_NUMBER, 1.0, 0, 0, 0, NULL, RUGOSA_FIELD_SEEDED,
    N_("Units of single quantities"),
    N_("A unit for one quantity that differs from the unit system's usual one."),
    NULL, NULL, 0, NULL, NULL, 32, S (unit_overrides), -1 },
  { "friction-model", "friction_model", RUGOSA_FIELD_ENUM, RUGOSA_DISPLAY_NUMBER,
    1.0, 0, 0, RG_FRICTION_COLEBROOK, NULL, RUGOSA_FIELD_SEEDED,
    N_("Friction model"),
    N_("The correlation that gives the turbulent friction factor."),
    NULL, "--model", SUBJ (MODEL), NULL, rugosa_friction_model_get_type, 0,
    S (friction_model), -1 },
  NUM ("re-laminar-max", "transition.re_laminar_max", NUMBER, RG_TRANSITION_RE_LOWEST, RG_TRANSITION_RE_HIGHEST, 2000.0,
       RUGOSA_FIELD_SEEDED, N_("End of laminar flow"),
       N_("The Reynolds number below which the flow is taken as laminar."),
       "--re-laminar-max", SUBJ (RE_LAMINAR_MAX), S (re_laminar_max), -1),
  NUM ("re-turbulent-min", "transition.re_turbulent_min", NUMBER, RG_TRANSITION_RE_LOWEST, RG_TRANSITION_RE_HIGHEST,
       4000.0, RUGOSA_FIELD_SEEDED, N_("Start of turbulent flow"),
       N_("The Reynolds number from which the flow is taken as turbulent; not below the end of laminar flow."),
       "--re-turbulent-min", SUBJ (RE_TURBULENT_MIN), S (re_turbulent_min), -1),
  NUM ("chart-re-min", "chart.re_min", NUMBER, RUGOSA_CHART_RE_LOWEST, RUGOSA_CHART_RE_HIGHEST, 500.0, 0,
       N_("Chart: smallest Reynolds number"),
       N_("The left end of the chart's Reynolds axis; the axis spans at least one decade."),
       NULL, 0, S (chart_re_min), -1),
  NUM ("chart-re-max", "chart.re_max", NUMBER, RUGOSA_CHART_RE_LOWEST, RUGOSA_CHART_RE_HIGHEST, 1.0e8, 0,
       N_("Chart: largest Reynolds number"),
       N_("The right end of the chart's Reynolds axis."),
       NULL, 0, S (chart_re_max), -1),
  NUM ("chart-f-min", "chart.f_min", NUMBER, RUGOSA_CHART_F_LOWEST, RUGOSA_CHART_F_HIGHEST, 0.006, 0,
       N_("Chart: smallest friction factor"),
       N_("The bottom of the chart's friction-factor axis; the top is at least 1.5 times the bottom."),
       NULL, 0, S (chart_f_min), -1),
  NUM ("chart-f-max", "chart.f_max", NUMBER, RUGOSA_CHART_F_LOWEST, RUGOSA_CHART_F_HIGHEST, 0.1, 0,
       N_("Chart: largest friction factor"),
       N_("The top of the chart's friction-factor axis."),
       NULL, 0, S (chart_f_max), -1),
  { "service-age", "service_age_years", RUGOSA_FIELD_NUMBER, RUGOSA_DISPLAY_AGE,
    SECONDS_PER_YEAR, 0.0, RG_AGING_AGE_MAX_YEARS, 0.0, NULL, RUGOSA_FIELD_VIEW,
    N_("Service age"),
    N_("The years of service at which results are shown (the roughness grows with age)."),
    NULL, "--age", SUBJ (AGE), NULL, NULL, 0, S (service_age), -1 },
  NUM ("velocity-limit", "limits.velocity_m_s", VELOCITY, 0.01, 100.0, 3.0,
       RUGOSA_FIELD_SEEDED, N_("Velocity limit"),
       N_("A mean velocity above this gives a warning."),
       "--max-velocity", 0, S (velocity_limit), -1),
  NUM ("gradient-limit", "limits.gradient_m_per_100m", GRADIENT, 0.001, 1000.0, 5.0,
       RUGOSA_FIELD_SEEDED, N_("Gradient limit"),
       N_("A pipe-friction loss per 100 length units of line above this gives a warning."),
       "--max-gradient", 0, S (gradient_limit), -1),
  /* A project's design criterion like the velocity limit (a self-cleansing
   * or water-age velocity the client or the code asks for), so it is a
   * project setting, not a value of one sizing; none by default.  Checked
   * at the design flow: the lowest flow of a main (a night flow) is
   * expected to fall below it. */
  NUM ("velocity-minimum", "limits.velocity_minimum_m_s", VELOCITY, 0.01, 100.0, 0.0,
       RUGOSA_FIELD_ZERO_ABSENT, N_("Lowest velocity"),
       N_("A mean velocity at the design flow below this gives a warning; none when not given."),
       "--min-velocity", 0, S (velocity_minimum), -1),
  { "pump-efficiency", "energy.efficiency_percent", RUGOSA_FIELD_NUMBER,
    RUGOSA_DISPLAY_NUMBER, 1.0, 0.0, 100.0, 70.0, NULL, RUGOSA_FIELD_MIN_OPEN,
    N_("Pump and motor efficiency"),
    N_("The share of the electric power drawn that the pump gives to the water (pump times motor efficiency), in per cent."),
    "%", "--efficiency", 0, NULL, NULL, 0, S (pump_efficiency), -1, 0 },
  { "hours-design", "energy.hours_design_per_year", RUGOSA_FIELD_NUMBER,
    RUGOSA_DISPLAY_NUMBER, 1.0, 0.0, HOURS_PER_YEAR, 8000.0, NULL, 0,
    N_("Hours a year at design flow"),
    N_("How many hours a year the lines run at their design flow."),
    "h/yr", "--hours", 0, NULL, NULL, 0, S (hours_design), -1, 0 },
  { "hours-minimum", "energy.hours_minimum_per_year", RUGOSA_FIELD_NUMBER,
    RUGOSA_DISPLAY_NUMBER, 1.0, 0.0, HOURS_PER_YEAR, 0.0, NULL, 0,
    N_("Hours a year at the lowest flow"),
    N_("How many hours a year the lines run at their lowest flow; a line without a lowest flow runs them at its design flow."),
    "h/yr", "--hours-minimum", 0, NULL, NULL, 0, S (hours_minimum), -1, 0 },
  { "hours-maximum", "energy.hours_maximum_per_year", RUGOSA_FIELD_NUMBER,
    RUGOSA_DISPLAY_NUMBER, 1.0, 0.0, HOURS_PER_YEAR, 0.0, NULL, 0,
    N_("Hours a year at the highest flow"),
    N_("How many hours a year the lines run at their highest flow; a line without a highest flow runs them at its design flow."),
    "h/yr", "--hours-maximum", 0, NULL, NULL, 0, S (hours_maximum), -1, 0 },
  { "currency", "energy.currency", RUGOSA_FIELD_TEXT, RUGOSA_DISPLAY_NUMBER, 1.0,
    0, 0, 0, "€", RUGOSA_FIELD_SEEDED, N_("Currency"),
    N_("The label of the currency that prices and costs are given in, shown beside them (\"€\", \"USD\")."),
    NULL, "--currency", 0, NULL, NULL, 12, S (currency), -1, 0 },
  { "energy-price", "energy.price_per_kWh", RUGOSA_FIELD_NUMBER,
    RUGOSA_DISPLAY_MONEY, 1.0, 0.0, 100.0, 0.15, NULL, RUGOSA_FIELD_SEEDED,
    N_("Energy price"),
    N_("The price of one kilowatt hour of electricity, in the project's currency."),
    "/kWh", "--energy-price", 0, NULL, NULL, 0, S (energy_price), -1, 0 },
  { "service-life", "energy.service_life_years", RUGOSA_FIELD_NUMBER,
    RUGOSA_DISPLAY_AGE, SECONDS_PER_YEAR, 1.0, RUGOSA_LIFE_YEARS_MAX, 30.0, NULL, RUGOSA_FIELD_SEEDED,
    N_("Service life"),
    N_("The years of service over which the energy cost is summed, year by year as the roughness grows, and discounted."),
    NULL, "--life", 0, NULL, NULL, 0, S (service_life), -1, 0 },
  { "discount-rate", "energy.discount_rate_percent", RUGOSA_FIELD_NUMBER,
    RUGOSA_DISPLAY_NUMBER, 1.0, 0.0, 50.0, 5.0, NULL, RUGOSA_FIELD_SEEDED,
    N_("Discount rate"),
    N_("The yearly rate, in per cent, at which a future year's energy cost is discounted to its present value."),
    "%/yr", "--discount-rate", 0, NULL, NULL, 0, S (discount_rate), -1, 0 },
};

/* The core's defaults of the fluid state, read once. */
static void
apply_core_defaults (void)
{
  static gsize done;

  if (g_once_init_enter (&done))
    {
      RgFluidSpec spec;

      rg_fluid_spec_init (&spec, RG_FLUID_WATER);
      for (guint i = 0; i < G_N_ELEMENTS (line_fields); i++)
        if (line_fields[i].flags & RUGOSA_FIELD_CORE_DEFAULT)
          line_fields[i].dflt = *(const double *) G_STRUCT_MEMBER_P (&spec, line_fields[i].spec_offset);
      g_once_init_leave (&done, 1);
    }
}

const RugosaField *
rugosa_line_fields (guint *n)
{
  apply_core_defaults ();
  *n = G_N_ELEMENTS (line_fields);
  return line_fields;
}

const RugosaField *
rugosa_settings_fields (guint *n)
{
  *n = G_N_ELEMENTS (settings_fields);
  return settings_fields;
}

static const RugosaField *
find_by (gboolean (*match) (const RugosaField *, const char *), const char *key,
         gboolean line, gboolean settings)
{
  guint n;
  const RugosaField *rows;

  if (key == NULL)
    return NULL;
  if (line)
    {
      rows = rugosa_line_fields (&n);
      for (guint i = 0; i < n; i++)
        if (match (&rows[i], key))
          return &rows[i];
    }
  if (settings)
    {
      rows = rugosa_settings_fields (&n);
      for (guint i = 0; i < n; i++)
        if (match (&rows[i], key))
          return &rows[i];
    }
  return NULL;
}

static gboolean
match_path (const RugosaField *f, const char *key)
{
  return strcmp (f->path, key) == 0;
}

static gboolean
match_cli (const RugosaField *f, const char *key)
{
  return f->cli != NULL && strcmp (f->cli, key) == 0;
}

/* Every row by its property name, the line's rows first (as find_by
 * searches): a batch row looks up some fifty names. */
static GHashTable *
property_index (void)
{
  static GHashTable *index;
  static gsize done;

  if (g_once_init_enter (&done))
    {
      GHashTable *made = g_hash_table_new (g_str_hash, g_str_equal);
      const RugosaField *tables[2];
      guint sizes[2];

      tables[0] = rugosa_line_fields (&sizes[0]);
      tables[1] = rugosa_settings_fields (&sizes[1]);
      for (int t = 0; t < 2; t++)
        for (guint i = 0; i < sizes[t]; i++)
          if (!g_hash_table_contains (made, tables[t][i].property))
            g_hash_table_insert (made, (gpointer) tables[t][i].property, (gpointer) &tables[t][i]);
      index = made;
      g_once_init_leave (&done, 1);
    }
  return index;
}

const RugosaField *
rugosa_field_find (const char *property)
{
  if (property == NULL)
    return NULL;
  return g_hash_table_lookup (property_index (), property);
}

const RugosaField *
rugosa_field_find_path (gboolean settings, const char *path)
{
  return find_by (match_path, path, !settings, settings);
}

const RugosaField *
rugosa_field_find_cli (const char *option)
{
  return find_by (match_cli, option, TRUE, TRUE);
}

const RugosaField *
rugosa_field_for_subject (RgSubjects subjects, guint index)
{
  const RugosaField *tables[2];
  guint sizes[2];

  tables[0] = rugosa_line_fields (&sizes[0]);
  tables[1] = rugosa_settings_fields (&sizes[1]);
  for (guint t = 0; t < 2; t++)
    for (guint i = 0; i < sizes[t]; i++)
      if ((tables[t][i].subjects & subjects) != 0 && index-- == 0)
        return &tables[t][i];
  return NULL;
}

const char *
rugosa_field_si_unit (const RugosaField *field)
{
  const RugosaDisplayInfo *info = rugosa_display_info (field->display);

  if (field->kind != RUGOSA_FIELD_NUMBER)
    return "";
  if (info == NULL)
    return field->unit_text != NULL ? field->unit_text : "";
  /* A value kept per year is shown per year. */
  if (field->to_si != 1.0 && field->display == RUGOSA_DISPLAY_AGE)
    return _("years");
  if (field->to_si != 1.0)
    return "m/yr";
  return rg_units_si_symbol (info->quantity);
}

const char *
rugosa_field_label (const RugosaField *field)
{
  return _(field->label);
}

/* Four significant figures without trailing zeros ("100", "0.15"). */
static char *
plain_number (double x)
{
  char *s = rugosa_display_significant (x, 4);

  if (strchr (s, '.') != NULL && strchr (s, 'e') == NULL)
    {
      char *end = s + strlen (s) - 1;

      while (*end == '0')
        *end-- = '\0';
      if (*end == '.')
        *end = '\0';
    }
  return s;
}

gboolean
rugosa_field_in_range (const RugosaField *field, double stored,
                       const char *unit, RgError *err)
{
  gboolean lo_ok, hi_ok;
  g_autofree char *lo = NULL;
  g_autofree char *hi = NULL;
  const RugosaDisplayInfo *info = rugosa_display_info (field->display);

  g_return_val_if_fail (field->kind == RUGOSA_FIELD_NUMBER, FALSE);

  if ((field->flags & RUGOSA_FIELD_ZERO_ABSENT) && stored == 0.0)
    return TRUE;
  lo_ok = (field->flags & RUGOSA_FIELD_MIN_OPEN) ? stored > field->min
                                                  : stored >= field->min;
  hi_ok = stored <= field->max;
  if (lo_ok && hi_ok && isfinite (stored))
    return TRUE;
  if (err == NULL)
    return FALSE;

  if (field->display == RUGOSA_DISPLAY_MONEY)
    {
      /* money in whole units, with the currency label given as `unit`
       * ("€", so "€/m" for a price per metre) or the row's unit alone */
      g_autofree char *a = fabs (field->min) >= 1.0e4 ? rugosa_display_money (field->min, NULL)
                                                      : plain_number (field->min);
      g_autofree char *b = fabs (field->max) >= 1.0e4 ? rugosa_display_money (field->max, NULL)
                                                      : plain_number (field->max);
      g_autofree char *label = g_strconcat (unit ? unit : "", field->unit_text ? field->unit_text : "", NULL);

      lo = *label ? g_strdup_printf ("%s %s", a, label) : g_strdup (a);
      hi = *label ? g_strdup_printf ("%s %s", b, label) : g_strdup (b);
    }
  else if (info != NULL && unit == NULL && field->to_si != 1.0)
    {
      /* kept per year (a service age, a life): the range in years, as
       * the row stores it, rather than in seconds */
      g_autofree char *a = plain_number (field->min);
      g_autofree char *b = plain_number (field->max);
      const char *stored_unit = rugosa_field_si_unit (field);

      lo = g_strdup_printf ("%s %s", a, stored_unit);
      hi = g_strdup_printf ("%s %s", b, stored_unit);
    }
  else if (info != NULL)
    {
      lo = rugosa_display_format (info->quantity, field->min * field->to_si, unit);
      hi = rugosa_display_format (info->quantity, field->max * field->to_si, unit);
    }
  else
    {
      g_autofree char *a = plain_number (field->min);
      g_autofree char *b = plain_number (field->max);

      lo = field->unit_text ? g_strdup_printf ("%s %s", a, field->unit_text) : g_strdup (a);
      hi = field->unit_text ? g_strdup_printf ("%s %s", b, field->unit_text) : g_strdup (b);
    }
  {
    g_autofree char *text = NULL;

    if (field->flags & RUGOSA_FIELD_MIN_OPEN)
      /* TRANSLATORS: e.g. "Design flow must be more than 0 L/s and at most 10000000 L/s." */
      text = g_strdup_printf (_("%s must be more than %s and at most %s."),
                              rugosa_field_label (field), lo, hi);
    else
      /* TRANSLATORS: e.g. "Length must lie between 0.001 m and 10000000 m." */
      text = g_strdup_printf (_("%s must lie between %s and %s."),
                              rugosa_field_label (field), lo, hi);
    rg_error_set_on (err, RG_ERR_DOMAIN, field->subjects, "%s", text);
  }
  return FALSE;
}

gboolean
rugosa_field_applies_to_fluid (const RugosaField *field, RgFluidKind kind)
{
  return (field->fluid_kinds & RUGOSA_FLUID_BIT (kind)) != 0;
}

/* True when `text` is a plain decimal number and nothing else. */
static gboolean
is_bare_number (const char *text, double *x)
{
  char *end = NULL;

  while (g_ascii_isspace (*text))
    text++;
  if (*text == '\0')
    return FALSE;
  *x = g_ascii_strtod (text, &end);
  while (end != NULL && g_ascii_isspace (*end))
    end++;
  return end != NULL && end != text && *end == '\0' && isfinite (*x);
}

gboolean
rugosa_field_parse_text (const RugosaField *field, const char *text,
                         const char *bare_unit, double density_kg_m3,
                         double *stored, RgError *err)
{
  const RugosaDisplayInfo *info;
  g_autofree char *with_unit = NULL;
  double x, si;

  g_return_val_if_fail (field->kind == RUGOSA_FIELD_NUMBER, FALSE);
  info = rugosa_display_info (field->display);

  /* A plain number: no unit to read, but the row's own unit may follow
   * it as it is shown ("70 %", "0.15 /kWh"). */
  if (info == NULL)
    {
      g_autofree char *trimmed = g_strstrip (g_strdup (text));

      if (field->unit_text != NULL && *field->unit_text != '\0'
          && g_str_has_suffix (trimmed, field->unit_text)
          && strlen (trimmed) > strlen (field->unit_text))
        trimmed[strlen (trimmed) - strlen (field->unit_text)] = '\0';
      if (!is_bare_number (trimmed, &x))
        {
          g_autofree char *valid = g_utf8_make_valid (text, -1);
          g_autofree char *shown = NULL;
          g_autofree char *msg = NULL;

          /* an excerpt of what was typed, on one line */
          shown = g_utf8_strlen (valid, -1) > 40 ? g_utf8_substring (valid, 0, 40) : g_strdup (valid);
          for (char *c = shown; *c != '\0'; c++)
            if ((unsigned char) *c < 0x20 || *c == 0x7F)
              *c = ' ';
          /* TRANSLATORS: %s is what was typed, e.g. "abc" for a thermal expansion */
          msg = g_strdup_printf (_("“%s” is not a number: type a plain number such as 0.00064."), shown);
          rg_error_set_on (err, RG_ERR_PARSE, field->subjects, "%s", msg);
          return FALSE;
        }
      *stored = x;
      return TRUE;
    }

  /* A bare number is in the unit given, or where the stored unit is not
   * SI (years of service, growth per year) in the stored unit. */
  if (is_bare_number (text, &x))
    {
      if (bare_unit != NULL)
        text = with_unit = g_strdup_printf ("%s %s", text, bare_unit);
      else if (field->to_si != 1.0)
        {
          *stored = x;
          return TRUE;
        }
    }
  if (field->display == RUGOSA_DISPLAY_DYNAMIC_VISCOSITY)
    {
      int kinematic = 0;

      if (rg_units_parse_viscosity (NULL, text, &si, &kinematic, err) != RG_OK)
        {
          if (err != NULL)
            err->subjects = field->subjects;
          return FALSE;
        }
      if (kinematic)
        si *= density_kg_m3;
    }
  else if (rg_units_parse (info->quantity, NULL, text, &si, err) != RG_OK)
    {
      if (err != NULL)
        err->subjects = field->subjects;
      return FALSE;
    }
  *stored = si / field->to_si;
  return TRUE;
}

gboolean
rugosa_field_date_ok (const char *text)
{
  int y, m, d;

  if (text == NULL || strlen (text) != 10 || text[4] != '-' || text[7] != '-')
    return FALSE;
  for (int i = 0; i < 10; i++)
    if (i != 4 && i != 7 && !g_ascii_isdigit (text[i]))
      return FALSE;
  y = atoi (text), m = atoi (text + 5), d = atoi (text + 8);
  return y >= 1000 && g_date_valid_dmy ((GDateDay) d, (GDateMonth) m, (GDateYear) y);
}

gboolean
rugosa_field_text_ok (const RugosaField *field, const char *text)
{
  if (text == NULL || !g_utf8_validate (text, -1, NULL))
    return FALSE;
  if ((field->flags & RUGOSA_FIELD_DATE) && *text != '\0' && !rugosa_field_date_ok (text))
    return FALSE;
  if (field->max_chars > 0 && g_utf8_strlen (text, -1) > field->max_chars)
    return FALSE;
  for (const char *p = text; *p != '\0'; p = g_utf8_next_char (p))
    {
      gunichar c = g_utf8_get_char (p);

      if ((field->flags & RUGOSA_FIELD_MULTILINE) && (c == '\n' || c == '\t'))
        continue;
      if (g_unichar_iscntrl (c))
        return FALSE;
    }
  return TRUE;
}
