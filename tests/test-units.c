/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Tests for src/core/units.c: conversion factors with their sources, round
 * trips for every offered unit, the spellings practitioners type, every
 * class of bad input, and independence from the process locale. */
#include <glib.h>
#include <float.h>
#include <locale.h>
#include <math.h>
#include <string.h>

#include "core/units.h"

/* Exact definitions, all from NIST SP 811 (2008), Appendix B.8/B.9:
 * international inch and foot, US gallon = 231 in³, avoirdupois pound,
 * standard gravity. */
#define IN 0.0254
#define FT 0.3048
#define GAL (231.0 * IN * IN * IN)
#define LB 0.45359237
#define LBF (LB * 9.80665)
#define DAY 86400.0
/* Julian year, 365.25 d: the year units.c documents (not in SP 811, which
 * lists 365-day and tropical years). */
#define YEAR (365.25 * 86400.0)

static void
assert_close (double got, double want, double rel, const char *what)
{
  double tol = rel * fmax (fabs (want), DBL_MIN);

  if (!(fabs (got - want) <= tol))
    g_error ("%s: got %.17g, want %.17g (relative tolerance %g)", what, got,
             want, rel);
}

/* Every unit with offset 0: SI per unit. */
typedef struct {
  RgQuantity q;
  const char *unit;
  double factor;
} Factor;

static const Factor FACTORS[] = {
  /* Source: SI definition (coherent unit, factor 1) */
  { RG_QTY_FLOW, "m³/s", 1.0 },
  /* Source: NIST SP 811 (2008) B.8, litre = 1e-3 m³ */
  { RG_QTY_FLOW, "L/s", 1.0e-3 },
  /* Source: NIST SP 811 (2008) B.8, litre = 1e-3 m³; minute = 60 s */
  { RG_QTY_FLOW, "L/min", 1.0e-3 / 60.0 },
  /* Source: NIST SP 811 (2008) B.8, hour = 3600 s */
  { RG_QTY_FLOW, "m³/h", 1.0 / 3600.0 },
  /* Source: NIST SP 811 (2008) B.8, gallon (US) = 231 in³, inch = 0.0254 m */
  { RG_QTY_FLOW, "gpm", GAL / 60.0 },
  /* Source: NIST SP 811 (2008) B.8, foot = 0.3048 m */
  { RG_QTY_FLOW, "cfs", FT * FT * FT },
  /* Source: NIST SP 811 (2008) B.8, day = 86 400 s; litre = 1e-3 m³ */
  { RG_QTY_FLOW, "m³/d", 1.0 / DAY },
  { RG_QTY_FLOW, "ML/d", 1.0e6 * 1.0e-3 / DAY },
  /* Source: NIST SP 811 (2008) B.8, gallon (US) = 231 in³, day = 86 400 s */
  { RG_QTY_FLOW, "MGD", 1.0e6 * GAL / DAY },
  /* Source: NIST SP 811 (2008) B.8, barrel [for petroleum] = 42 gallons
   * (US), day = 86 400 s */
  { RG_QTY_FLOW, "bbl/d", 42.0 * GAL / DAY },
  /* Source: SI definition */
  { RG_QTY_LENGTH, "m", 1.0 },
  /* Source: SI prefixes (SI Brochure, 9th ed., Table 7) */
  { RG_QTY_LENGTH, "cm", 1.0e-2 },
  { RG_QTY_LENGTH, "mm", 1.0e-3 },
  { RG_QTY_LENGTH, "km", 1.0e3 },
  /* Source: NIST SP 811 (2008) B.8, inch = 0.0254 m exactly */
  { RG_QTY_LENGTH, "in", IN },
  /* Source: NIST SP 811 (2008) B.8, foot = 0.3048 m exactly */
  { RG_QTY_LENGTH, "ft", FT },
  /* Source: as the lengths above; µm by SI prefix (SI Brochure, Table 7) */
  { RG_QTY_ROUGHNESS, "m", 1.0 },
  { RG_QTY_ROUGHNESS, "mm", 1.0e-3 },
  { RG_QTY_ROUGHNESS, "µm", 1.0e-6 },
  { RG_QTY_ROUGHNESS, "cm", 1.0e-2 },
  { RG_QTY_ROUGHNESS, "in", IN },
  { RG_QTY_ROUGHNESS, "ft", FT },
  /* Source: SI definition */
  { RG_QTY_PRESSURE, "Pa", 1.0 },
  { RG_QTY_PRESSURE, "kPa", 1.0e3 },
  { RG_QTY_PRESSURE, "MPa", 1.0e6 },
  /* Source: NIST SP 811 (2008) B.8, bar = 1e5 Pa */
  { RG_QTY_PRESSURE, "bar", 1.0e5 },
  /* Source: NIST SP 811 (2008) B.8, standard atmosphere = 101 325 Pa */
  { RG_QTY_PRESSURE, "atm", 101325.0 },
  /* Source: NIST SP 811 (2008) B.8, lbf = 0.45359237 kg × 9.80665 m/s²,
   * psi = lbf/in² (6.894 757 E+03 Pa in the table) */
  { RG_QTY_PRESSURE, "psi", LBF / (IN * IN) },
  /* Source: SI definition */
  { RG_QTY_DYN_VISCOSITY, "Pa·s", 1.0 },
  { RG_QTY_DYN_VISCOSITY, "mPa·s", 1.0e-3 },
  /* Source: NIST SP 811 (2008) B.8, centipoise = 1e-3 Pa·s */
  { RG_QTY_DYN_VISCOSITY, "cP", 1.0e-3 },
  /* Source: SI definition */
  { RG_QTY_KIN_VISCOSITY, "m²/s", 1.0 },
  { RG_QTY_KIN_VISCOSITY, "mm²/s", 1.0e-6 },
  /* Source: NIST SP 811 (2008) B.8, centistokes = 1e-6 m²/s */
  { RG_QTY_KIN_VISCOSITY, "cSt", 1.0e-6 },
  /* Source: SI definition and prefixes */
  { RG_QTY_DENSITY, "kg/m³", 1.0 },
  { RG_QTY_DENSITY, "g/cm³", 1.0e3 },
  /* Source: NIST SP 811 (2008) B.8, litre = 1e-3 m³ */
  { RG_QTY_DENSITY, "kg/L", 1.0e3 },
  /* Source: NIST SP 811 (2008) B.8, pound = 0.45359237 kg, foot = 0.3048 m
   * (1.601 846 E+01 kg/m³ in the table) */
  { RG_QTY_DENSITY, "lb/ft³", LB / (FT * FT * FT) },
  /* Source: SI definition; NIST SP 811 (2008) B.8, foot = 0.3048 m */
  { RG_QTY_VELOCITY, "m/s", 1.0 },
  { RG_QTY_VELOCITY, "ft/s", FT },
  /* Source: units.h, the core's gradient unit is m per 100 m; the others by
   * ratio (ft/100 ft and % are the same ratio, 1 m/km = 0.1 m/100 m) */
  { RG_QTY_GRADIENT, "m/100 m", 1.0 },
  { RG_QTY_GRADIENT, "ft/100 ft", 1.0 },
  { RG_QTY_GRADIENT, "m/km", 0.1 },
  { RG_QTY_GRADIENT, "%", 1.0 },
  { RG_QTY_GRADIENT, "m/m", 100.0 },
  /* Source: NIST SP 811 (2008) B.8, minute, hour, day */
  { RG_QTY_TIME, "s", 1.0 },
  { RG_QTY_TIME, "min", 60.0 },
  { RG_QTY_TIME, "h", 3600.0 },
  { RG_QTY_TIME, "d", 86400.0 },
  /* Source: Julian year 365.25 d (IAU), the year units.c documents */
  { RG_QTY_TIME, "yr", YEAR },
  { RG_QTY_ROUGHNESS_RATE, "m/s", 1.0 },
  { RG_QTY_ROUGHNESS_RATE, "mm/yr", 1.0e-3 / YEAR },
  { RG_QTY_ROUGHNESS_RATE, "µm/yr", 1.0e-6 / YEAR },
  /* Source: NIST SP 811 (2008) B.8, inch = 0.0254 m, mil = 0.001 in */
  { RG_QTY_ROUGHNESS_RATE, "in/yr", 0.0254 / YEAR },
  { RG_QTY_ROUGHNESS_RATE, "mil/yr", 2.54e-5 / YEAR },
  { RG_QTY_ROUGHNESS_RATE, "mpy", 2.54e-5 / YEAR },
  /* Source: SI definition; g/kg and parts per thousand by mass = 1e-3 */
  { RG_QTY_SALINITY, "kg/kg", 1.0 },
  { RG_QTY_SALINITY, "g/kg", 1.0e-3 },
  { RG_QTY_SALINITY, "ppt", 1.0e-3 },
  /* Source: SI definition and prefixes (SI Brochure, 9th ed., Table 7) */
  { RG_QTY_POWER, "W", 1.0 },
  { RG_QTY_POWER, "kW", 1.0e3 },
  { RG_QTY_POWER, "MW", 1.0e6 },
  /* Source: NIST SP 811 (2008) B.8, horsepower (550 ft·lbf/s) =
   * 7.456 999 E+02 W; exactly 550 ft × lbf per second with the foot and
   * the pound-force above */
  { RG_QTY_POWER, "hp", 550.0 * FT * LBF },
  /* Source: SI definition and prefixes */
  { RG_QTY_ENERGY, "J", 1.0 },
  { RG_QTY_ENERGY, "MJ", 1.0e6 },
  { RG_QTY_ENERGY, "GJ", 1.0e9 },
  /* Source: NIST SP 811 (2008) B.8, kilowatt hour = 3.6 E+06 J (exact) */
  { RG_QTY_ENERGY, "kWh", 3.6e6 },
  { RG_QTY_ENERGY, "MWh", 3.6e9 },
  { RG_QTY_ENERGY, "GWh", 3.6e12 },
};

static const Factor *
find_factor (RgQuantity q, const char *unit)
{
  for (gsize i = 0; i < G_N_ELEMENTS (FACTORS); i++)
    if (FACTORS[i].q == q && strcmp (FACTORS[i].unit, unit) == 0)
      return &FACTORS[i];
  return NULL;
}

static void
test_factors (void)
{
  for (gsize i = 0; i < G_N_ELEMENTS (FACTORS); i++)
    {
      double si = 0.0;
      RgError err = { 0 };

      g_assert_cmpint (rg_units_to_si (FACTORS[i].q, 1.0, FACTORS[i].unit,
                                       &si, &err), ==, RG_OK);
      /* two roundings in the definition above, one or two in units.c */
      assert_close (si, FACTORS[i].factor, 4 * DBL_EPSILON, FACTORS[i].unit);
    }
}

static void
test_temperature_points (void)
{
  static const struct {
    const char *unit;
    double value, kelvin;
  } pts[] = {
    /* Source: NIST SP 811 (2008) B.9, T/K = t/°C + 273.15 */
    { "°C", 0.0, 273.15 },
    { "°C", 100.0, 373.15 },
    { "°C", -273.15, 0.0 },
    /* Source: NIST SP 811 (2008) B.9, T/K = (t/°F + 459.67)/1.8 */
    { "°F", 32.0, 273.15 },
    { "°F", 212.0, 373.15 },
    { "°F", -40.0, 233.15 },
    { "°F", -459.67, 0.0 },
    /* Source: SI definition */
    { "K", 293.15, 293.15 },
  };

  for (gsize i = 0; i < G_N_ELEMENTS (pts); i++)
    {
      double k = -1.0, back = 0.0;

      g_assert_cmpint (rg_units_to_si (RG_QTY_TEMPERATURE, pts[i].value,
                                       pts[i].unit, &k, NULL), ==, RG_OK);
      if (pts[i].kelvin == 0.0)
        g_assert_cmpfloat (fabs (k), <=, 1e-12);
      else
        assert_close (k, pts[i].kelvin, 4 * DBL_EPSILON, pts[i].unit);
      g_assert_cmpint (rg_units_from_si (RG_QTY_TEMPERATURE, pts[i].kelvin,
                                         pts[i].unit, &back, NULL), ==, RG_OK);
      g_assert_cmpfloat (fabs (back - pts[i].value), <=,
                         1e-12 * fmax (1.0, fabs (pts[i].value)));
    }
}

/* Every offered unit converts both ways and is listed in the accepted list;
 * every offered unit has a checked factor above. */
static void
test_choices_round_trip (void)
{
  /* Common practice (no single source): a spread of magnitudes */
  static const double values[] = { 1.0, 0.37, 1234.5, 2.5e-7, 6.02e5 };
  int n_total = 0;

  for (int q = 0; q < RG_QTY_N; q++)
    {
      const char *accepted = rg_units_accepted ((RgQuantity) q);
      const char *u;

      g_assert_nonnull (rg_units_si_symbol ((RgQuantity) q));
      g_assert_cmpstr (rg_units_si_symbol ((RgQuantity) q), !=, "");
      for (int i = 0; (u = rg_units_choice ((RgQuantity) q, i)) != NULL; i++)
        {
          n_total++;
          if (strstr (accepted, u) == NULL)
            g_error ("unit '%s' offered but not in the accepted list '%s'",
                     u, accepted);
          if (q != RG_QTY_TEMPERATURE && find_factor ((RgQuantity) q, u) == NULL)
            g_error ("unit '%s' (quantity %d) has no checked factor", u, q);
          for (gsize k = 0; k < G_N_ELEMENTS (values); k++)
            {
              double si = 0.0, back = 0.0;
              RgError err = { 0 };

              g_assert_cmpint (rg_units_to_si ((RgQuantity) q, values[k], u,
                                               &si, &err), ==, RG_OK);
              g_assert_cmpint (rg_units_from_si ((RgQuantity) q, si, u, &back,
                                                 &err), ==, RG_OK);
              /* one rounding each way; for °C and °F the offset (at most
               * 459.67) costs its own rounding, hence an absolute term */
              if (q == RG_QTY_TEMPERATURE)
                g_assert_cmpfloat (fabs (back - values[k]), <=,
                                   8 * DBL_EPSILON * (fabs (values[k]) + 460.0));
              else
                assert_close (back, values[k], 4 * DBL_EPSILON, u);
            }
        }
      g_assert_null (rg_units_choice ((RgQuantity) q, -1));
    }
  g_assert_cmpint (n_total, >=, 50);
  g_assert_null (rg_units_choice (RG_QTY_N, 0));
}

/* Text as people type it. */
static void
test_spellings (void)
{
  static const struct {
    RgQuantity q;
    const char *text;
    double si;
  } cases[] = {
    /* Source: NIST SP 811 (2008) B.8, gallon (US) = 231 in³, inch = 0.0254 m */
    { RG_QTY_FLOW, "150 gpm", 150.0 * GAL / 60.0 },
    { RG_QTY_FLOW, "150gpm", 150.0 * GAL / 60.0 },
    { RG_QTY_FLOW, "150 GPM", 150.0 * GAL / 60.0 },
    { RG_QTY_FLOW, "150 US gpm", 150.0 * GAL / 60.0 },
    /* Source: NIST SP 811 (2008) B.8, litre = 1e-3 m³ */
    { RG_QTY_FLOW, " 12 L/s ", 12.0e-3 },
    { RG_QTY_FLOW, "12 l/s", 12.0e-3 },
    { RG_QTY_FLOW, "12 L / s", 12.0e-3 },
    { RG_QTY_FLOW, "600 L/min", 600.0e-3 / 60.0 },
    /* Source: NIST SP 811 (2008) B.8, hour = 3600 s */
    { RG_QTY_FLOW, "36 m³/h", 0.01 },
    { RG_QTY_FLOW, "36 m3/h", 0.01 },
    /* Source: NIST SP 811 (2008) B.8, foot = 0.3048 m */
    { RG_QTY_FLOW, "2 cfs", 2.0 * FT * FT * FT },
    { RG_QTY_FLOW, "2 ft3/s", 2.0 * FT * FT * FT },
    /* Source: SI (a bare number is SI, units.h) */
    { RG_QTY_FLOW, "1.5e-3", 1.5e-3 },
    { RG_QTY_FLOW, "1.5E-3", 1.5e-3 },
    { RG_QTY_FLOW, ".5", 0.5 },
    { RG_QTY_FLOW, "+2.", 2.0 },
    /* Source: NIST SP 811 (2008) B.8, inch = 0.0254 m */
    { RG_QTY_LENGTH, "2 in", 2.0 * IN },
    { RG_QTY_LENGTH, "2\"", 2.0 * IN },
    { RG_QTY_LENGTH, "2''", 2.0 * IN },
    { RG_QTY_LENGTH, "2 in.", 2.0 * IN },
    { RG_QTY_LENGTH, "2 inches", 2.0 * IN },
    { RG_QTY_LENGTH, "2″", 2.0 * IN },
    { RG_QTY_LENGTH, "3/4 in", 0.75 * IN },
    { RG_QTY_LENGTH, "3/4\"", 0.75 * IN },
    { RG_QTY_LENGTH, "1 1/2 in", 1.5 * IN },
    { RG_QTY_LENGTH, "1-1/2\"", 1.5 * IN },
    { RG_QTY_LENGTH, "-1 1/2 in", -1.5 * IN },
    /* Source: NIST SP 811 (2008) B.8, foot = 0.3048 m */
    { RG_QTY_LENGTH, "10 ft", 10.0 * FT },
    { RG_QTY_LENGTH, "10 feet", 10.0 * FT },
    { RG_QTY_LENGTH, "10'", 10.0 * FT },
    /* Source: SI prefixes (SI Brochure, 9th ed., Table 7) */
    { RG_QTY_LENGTH, "250 mm", 0.25 },
    { RG_QTY_LENGTH, "250 MM", 0.25 },
    { RG_QTY_LENGTH, "2 km", 2000.0 },
    { RG_QTY_LENGTH, "-3.5 m", -3.5 },
    { RG_QTY_ROUGHNESS, "45 µm", 45.0e-6 },  /* U+00B5 MICRO SIGN */
    { RG_QTY_ROUGHNESS, "45 μm", 45.0e-6 },  /* U+03BC GREEK MU */
    { RG_QTY_ROUGHNESS, "45 um", 45.0e-6 },
    { RG_QTY_ROUGHNESS, "0.045 mm", 45.0e-6 },
    { RG_QTY_ROUGHNESS, "0.0018 in", 0.0018 * IN },
    /* Source: NIST SP 811 (2008) B.9, T/K = (t/°F + 459.67)/1.8 */
    { RG_QTY_TEMPERATURE, "68 F", 293.15 },
    { RG_QTY_TEMPERATURE, "68 °F", 293.15 },
    { RG_QTY_TEMPERATURE, "68°F", 293.15 },
    { RG_QTY_TEMPERATURE, "68 degF", 293.15 },
    { RG_QTY_TEMPERATURE, "68 ℉", 293.15 },
    /* Source: NIST SP 811 (2008) B.9, T/K = t/°C + 273.15 */
    { RG_QTY_TEMPERATURE, "20 C", 293.15 },
    { RG_QTY_TEMPERATURE, "20 °C", 293.15 },
    { RG_QTY_TEMPERATURE, "20°C", 293.15 },
    { RG_QTY_TEMPERATURE, "20 ° C", 293.15 },
    { RG_QTY_TEMPERATURE, "20 ºC", 293.15 },   /* U+00BA ordinal */
    { RG_QTY_TEMPERATURE, "20 c", 293.15 },
    { RG_QTY_TEMPERATURE, "-10 °C", 263.15 },
    /* Source: SI (a bare temperature is kelvin, units.h) */
    { RG_QTY_TEMPERATURE, "293.15 K", 293.15 },
    { RG_QTY_TEMPERATURE, "293.15", 293.15 },
    /* Source: NIST SP 811 (2008) B.8, bar = 1e5 Pa; SI prefixes */
    { RG_QTY_PRESSURE, "3 bar", 3.0e5 },
    { RG_QTY_PRESSURE, "3 bara", 3.0e5 },
    { RG_QTY_PRESSURE, "500 kPa", 5.0e5 },
    { RG_QTY_PRESSURE, "1.2 MPa", 1.2e6 },
    { RG_QTY_PRESSURE, "1.2 mpa", 1.2e6 },
    /* Source: NIST SP 811 (2008) B.8, lbf = 0.45359237 kg × 9.80665 m/s² */
    { RG_QTY_PRESSURE, "14.7 psi", 14.7 * LBF / (IN * IN) },
    { RG_QTY_PRESSURE, "14.7 psia", 14.7 * LBF / (IN * IN) },
    /* Source: SI; NIST SP 811 (2008) B.8, centipoise = 1e-3 Pa·s */
    { RG_QTY_DYN_VISCOSITY, "0.001 Pa·s", 1.0e-3 },
    { RG_QTY_DYN_VISCOSITY, "0.001 Pa.s", 1.0e-3 },
    { RG_QTY_DYN_VISCOSITY, "0.001 Pa s", 1.0e-3 },
    { RG_QTY_DYN_VISCOSITY, "0.001 Pa⋅s", 1.0e-3 },  /* U+22C5 */
    { RG_QTY_DYN_VISCOSITY, "1 mPa·s", 1.0e-3 },
    { RG_QTY_DYN_VISCOSITY, "1 mPa.s", 1.0e-3 },
    { RG_QTY_DYN_VISCOSITY, "1 cP", 1.0e-3 },
    { RG_QTY_DYN_VISCOSITY, "1 cp", 1.0e-3 },
    /* Source: SI; NIST SP 811 (2008) B.8, centistokes = 1e-6 m²/s */
    { RG_QTY_KIN_VISCOSITY, "1e-6 m2/s", 1.0e-6 },
    { RG_QTY_KIN_VISCOSITY, "1e-6 m²/s", 1.0e-6 },
    { RG_QTY_KIN_VISCOSITY, "1 cSt", 1.0e-6 },
    { RG_QTY_KIN_VISCOSITY, "1 mm2/s", 1.0e-6 },
    /* Source: SI prefixes; NIST SP 811 (2008) B.8, pound and foot */
    { RG_QTY_DENSITY, "998 kg/m3", 998.0 },
    { RG_QTY_DENSITY, "998 kg/m³", 998.0 },
    { RG_QTY_DENSITY, "0.998 g/cm3", 998.0 },
    { RG_QTY_DENSITY, "62.3 lb/ft3", 62.3 * LB / (FT * FT * FT) },
    /* Source: NIST SP 811 (2008) B.8, foot = 0.3048 m */
    { RG_QTY_VELOCITY, "3 m/s", 3.0 },
    { RG_QTY_VELOCITY, "10 ft/s", 10.0 * FT },
    /* Source: units.h (m per 100 m); ratio definitions */
    { RG_QTY_GRADIENT, "2 m/100m", 2.0 },
    { RG_QTY_GRADIENT, "2 m/100 m", 2.0 },
    { RG_QTY_GRADIENT, "2 ft/100ft", 2.0 },
    { RG_QTY_GRADIENT, "20 m/km", 2.0 },
    /* Source: NIST SP 811 (2008) B.8, hour, day; Julian year (units.c) */
    { RG_QTY_TIME, "2 h", 7200.0 },
    { RG_QTY_TIME, "1 d", 86400.0 },
    { RG_QTY_TIME, "30 years", 30.0 * YEAR },
    { RG_QTY_TIME, "30 year", 30.0 * YEAR },
    { RG_QTY_TIME, "30 yr", 30.0 * YEAR },
    { RG_QTY_TIME, "30 a", 30.0 * YEAR },
    { RG_QTY_ROUGHNESS_RATE, "0.025 mm/yr", 0.025e-3 / YEAR },
    { RG_QTY_ROUGHNESS_RATE, "25 µm/yr", 25.0e-6 / YEAR },
    /* Source: salinity in g/kg = parts per thousand by mass = 1e-3 kg/kg */
    { RG_QTY_SALINITY, "35 g/kg", 0.035 },
    { RG_QTY_SALINITY, "35 ppt", 0.035 },
    { RG_QTY_SALINITY, "35 ‰", 0.035 },
    { RG_QTY_SALINITY, "0.035 kg/kg", 0.035 },
    /* Source: SI prefixes; NIST SP 811 (2008) B.8, horsepower (550 ft·lbf/s) */
    { RG_QTY_POWER, "15 kW", 15.0e3 },
    { RG_QTY_POWER, "15 KW", 15.0e3 },
    { RG_QTY_POWER, "20 hp", 20.0 * 550.0 * FT * LBF },
    /* Source: NIST SP 811 (2008) B.8, kilowatt hour = 3.6 E+06 J */
    { RG_QTY_ENERGY, "12 kWh", 12.0 * 3.6e6 },
    { RG_QTY_ENERGY, "12 kW·h", 12.0 * 3.6e6 },
    { RG_QTY_ENERGY, "12 kW h", 12.0 * 3.6e6 },
    { RG_QTY_ENERGY, "12 kwh", 12.0 * 3.6e6 },
    { RG_QTY_ENERGY, "3 MWh", 3.0 * 3.6e9 },
  };

  for (gsize i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      double si = -12345.0;
      RgError err = { 0 };
      RgStatus st = rg_units_parse (cases[i].q, "--value", cases[i].text, &si,
                                    &err);

      if (st != RG_OK)
        g_error ("'%s': %s", cases[i].text, err.text);
      assert_close (si, cases[i].si, 4 * DBL_EPSILON, cases[i].text);
    }
}

static void
expect_error (RgQuantity q, const char *text, RgStatus status,
              const char *needle1, const char *needle2)
{
  double si = 42.0;
  RgError err = { 0 };
  RgStatus st = rg_units_parse (q, "--flow", text, &si, &err);

  if (st != status)
    g_error ("'%s': status %d, want %d (%s)", text ? text : "(null)", st,
             status, err.text);
  g_assert_cmpint (err.status, ==, status);
  /* the value is untouched and the sentence names the option */
  g_assert_cmpfloat (si, ==, 42.0);
  g_assert_nonnull (strstr (err.text, "--flow"));
  /* the text the caller passed is at fault (units.h) */
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_VALUE));
  if (needle1 != NULL && strstr (err.text, needle1) == NULL)
    g_error ("'%s': message '%s' lacks '%s'", text, err.text, needle1);
  if (needle2 != NULL && strstr (err.text, needle2) == NULL)
    g_error ("'%s': message '%s' lacks '%s'", text, err.text, needle2);
  g_assert_true (g_utf8_validate (err.text, -1, NULL));
  g_assert_cmpint (err.text[strlen (err.text) - 1], ==, '.');
}

static void
test_bad_input (void)
{
  expect_error (RG_QTY_FLOW, "", RG_ERR_PARSE, "empty", "gpm");
  expect_error (RG_QTY_FLOW, "   ", RG_ERR_PARSE, "empty", NULL);
  expect_error (RG_QTY_FLOW, NULL, RG_ERR_PARSE, "empty", NULL);
  expect_error (RG_QTY_FLOW, "abc", RG_ERR_PARSE, "not a number", "L/s");
  expect_error (RG_QTY_FLOW, "-", RG_ERR_PARSE, "not a number", NULL);
  expect_error (RG_QTY_FLOW, "+", RG_ERR_PARSE, "not a number", NULL);
  expect_error (RG_QTY_FLOW, ".", RG_ERR_PARSE, "not a number", NULL);
  expect_error (RG_QTY_FLOW, "e5", RG_ERR_PARSE, "not a number", NULL);
  expect_error (RG_QTY_FLOW, "1.2.3", RG_ERR_PARSE, "not a number", NULL);
  expect_error (RG_QTY_FLOW, "2 100", RG_ERR_PARSE, "not a number", NULL);
  expect_error (RG_QTY_FLOW, "1e999", RG_ERR_PARSE, "too large", NULL);
  expect_error (RG_QTY_FLOW, "-1e999", RG_ERR_PARSE, "too large", NULL);
  expect_error (RG_QTY_FLOW, "1e-999", RG_ERR_PARSE, "too small", NULL);
  /* finite in the unit, infinite in SI */
  expect_error (RG_QTY_LENGTH, "1e308 km", RG_ERR_PARSE, "too large", NULL);
  expect_error (RG_QTY_FLOW, "nan", RG_ERR_PARSE, "not a finite number", NULL);
  expect_error (RG_QTY_FLOW, "NaN gpm", RG_ERR_PARSE, "not a finite", NULL);
  expect_error (RG_QTY_FLOW, "inf", RG_ERR_PARSE, "not a finite number", NULL);
  expect_error (RG_QTY_FLOW, "-Infinity", RG_ERR_PARSE, "not a finite", NULL);
  expect_error (RG_QTY_FLOW, "2,5", RG_ERR_PARSE, "comma", NULL);
  expect_error (RG_QTY_FLOW, "1,500 gpm", RG_ERR_PARSE, "comma", NULL);
  expect_error (RG_QTY_LENGTH, "1/0 in", RG_ERR_PARSE, "zero", NULL);
  expect_error (RG_QTY_FLOW, "12 furlongs", RG_ERR_UNIT, "'furlongs'",
                rg_units_accepted (RG_QTY_FLOW));
  expect_error (RG_QTY_FLOW, "2 in", RG_ERR_UNIT, "another quantity (length)",
                rg_units_accepted (RG_QTY_FLOW));
  expect_error (RG_QTY_FLOW, "3 m/s", RG_ERR_UNIT, "(velocity)", "m³/s");
  expect_error (RG_QTY_LENGTH, "5 gpm", RG_ERR_UNIT, "(flow)",
                rg_units_accepted (RG_QTY_LENGTH));
  expect_error (RG_QTY_PRESSURE, "20 °C", RG_ERR_UNIT, "(temperature)",
                NULL);
  expect_error (RG_QTY_PRESSURE, "30 psig", RG_ERR_UNIT, "gauge", "absolute");
  expect_error (RG_QTY_PRESSURE, "2 barg", RG_ERR_UNIT, "gauge", NULL);
  expect_error (RG_QTY_PRESSURE, "2 bar(g)", RG_ERR_UNIT, "gauge", NULL);
  expect_error (RG_QTY_FLOW, "2 psig", RG_ERR_UNIT, "(pressure)", NULL);
  expect_error (RG_QTY_POWER, "12 kWh", RG_ERR_UNIT, "(energy)", "kW");
  expect_error (RG_QTY_ENERGY, "15 kW", RG_ERR_UNIT, "(power)", "kWh");
  expect_error (RG_QTY_TEMPERATURE, "-300 °C", RG_ERR_DOMAIN,
                "absolute zero", NULL);
  expect_error (RG_QTY_TEMPERATURE, "-500 F", RG_ERR_DOMAIN,
                "absolute zero", NULL);
  expect_error (RG_QTY_TEMPERATURE, "-1", RG_ERR_DOMAIN, "absolute zero",
                NULL);
  expect_error (RG_QTY_TEMPERATURE, "-0.001 K", RG_ERR_DOMAIN,
                "absolute zero", NULL);
  /* the quoted text is cut on a character boundary */
  expect_error (RG_QTY_FLOW,
                "12 µµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµµ",
                RG_ERR_UNIT, "unknown unit", NULL);
  expect_error (RG_QTY_FLOW, "12 gpm\nrm", RG_ERR_UNIT, "unknown unit",
                NULL);
}

/* The flow units of water supply and oil fields, every spelling, against
 * the exact definitions they are made of, and against the rounded value
 * NIST prints for the unit per day where it prints one. */
static void
test_per_day_flow (void)
{
  static const struct {
    const char *text;
    double si;
  } exact[] = {
    /* Source: NIST SP 811 (2008) B.8, day = 86 400 s */
    { "864 m³/d", 864.0 / DAY },
    { "864 m3/d", 864.0 / DAY },
    { "864 m3/day", 864.0 / DAY },
    /* Source: NIST SP 811 (2008) B.8, litre = 1e-3 m³; SI prefix mega = 1e6 */
    { "2.5 ML/d", 2.5e3 / DAY },
    { "2.5 Ml/d", 2.5e3 / DAY },
    { "2.5 MLD", 2.5e3 / DAY },
    { "2.5 mL/d", 2.5e-6 / DAY },
    /* Source: NIST SP 811 (2008) B.8, gallon (US) = 231 in³, inch = 0.0254 m */
    { "3 MGD", 3.0e6 * GAL / DAY },
    { "3 mgd", 3.0e6 * GAL / DAY },
    { "3 Mgal/d", 3.0e6 * GAL / DAY },
    { "3 US MGD", 3.0e6 * GAL / DAY },
    /* Source: NIST SP 811 (2008) B.8, barrel [for petroleum] = 42 gal (US) */
    { "5000 bbl/d", 5000.0 * 42.0 * GAL / DAY },
    { "5000 bbl/day", 5000.0 * 42.0 * GAL / DAY },
    { "5000 BPD", 5000.0 * 42.0 * GAL / DAY },
    { "5000 US bbl/d", 5000.0 * 42.0 * GAL / DAY },
    /* Source: NIST SP 811 (2008) B.8, litre = 1e-3 m³, minute = 60 s */
    { "600 L/min", 600.0e-3 / 60.0 },
    { "600 l/min", 600.0e-3 / 60.0 },
    { "600 lpm", 600.0e-3 / 60.0 },
    /* Source: NIST SP 811 (2008) B.8, foot = 0.3048 m */
    { "2 ft³/s", 2.0 * FT * FT * FT },
    { "2 ft3/s", 2.0 * FT * FT * FT },
    { "2 cfs", 2.0 * FT * FT * FT },
  };
  static const struct {
    const char *unit;
    double printed;
  } nist[] = {
    /* From memory of NIST SP 811 (2008) B.8, "gallon (U.S.) per day" =
     * 4.381 264 E-08 m³/s; not checked against the document.  MGD is 1e6 of it. */
    { "MGD", 4.381264e-2 },
    /* From memory of NIST SP 811 (2008) B.8, "barrel [for petroleum, 42
     * gallons (U.S.)]" = 1.589 873 E-01 m³; not checked against the
     * document.  Per day: divided by 86 400 s. */
    { "bbl/d", 1.589873e-1 / DAY },
    /* From memory of NIST SP 811 (2008) B.8, "cubic foot per second" =
     * 2.831 685 E-02 m³/s; not checked against the document */
    { "ft3/s", 2.831685e-2 },
  };

  for (gsize i = 0; i < G_N_ELEMENTS (exact); i++)
    {
      double si = 0.0;
      RgError err = { 0 };

      if (rg_units_parse (RG_QTY_FLOW, "--flow", exact[i].text, &si, &err) != RG_OK)
        g_error ("%s: %s", exact[i].text, err.text);
      /* two or three roundings in the definition, one or two in units.c */
      assert_close (si, exact[i].si, 6 * DBL_EPSILON, exact[i].text);
    }
  for (gsize i = 0; i < G_N_ELEMENTS (nist); i++)
    {
      double si = 0.0;

      g_assert_cmpint (rg_units_to_si (RG_QTY_FLOW, 1.0, nist[i].unit, &si,
                                       NULL), ==, RG_OK);
      /* the printed values have 7 significant digits */
      assert_close (si, nist[i].printed, 5e-7, nist[i].unit);
    }
  /* "ml/d" with case ignored could be millilitres or megalitres: refused,
   * never read as the larger one */
  expect_error (RG_QTY_FLOW, "2 ml/d", RG_ERR_UNIT, "unknown unit", "ML/d");
  expect_error (RG_QTY_FLOW, "2 ML/D", RG_ERR_UNIT, "unknown unit", "ML/d");
  /* every unit per day is listed in the refusal's list of units */
  expect_error (RG_QTY_FLOW, "2 acre-ft/d", RG_ERR_UNIT, "unknown unit",
                "m³/d, ML/d");
  expect_error (RG_QTY_FLOW, "2 acre-ft/d", RG_ERR_UNIT, "unknown unit",
                "MGD");
  expect_error (RG_QTY_FLOW, "2 acre-ft/d", RG_ERR_UNIT, "unknown unit",
                "bbl/d");
}

/* How a unit is written for a reader: the offered choice of the same
 * spelling, else of the same size. */
static void
test_display_spelling (void)
{
  static const struct {
    RgQuantity q;
    const char *unit, *shown;
  } cases[] = {
    { RG_QTY_FLOW, "m3/d", "m³/d" },
    { RG_QTY_FLOW, "m3/day", "m³/d" },
    { RG_QTY_FLOW, "MLD", "ML/d" },
    { RG_QTY_FLOW, "USgpm", "gpm" },
    { RG_QTY_FLOW, "Mgal/d", "MGD" },
    { RG_QTY_FLOW, "BPD", "bbl/d" },
    { RG_QTY_FLOW, "ft3/s", "cfs" },
    { RG_QTY_ROUGHNESS, "um", "µm" },
    { RG_QTY_TEMPERATURE, "F", "°F" },
    { RG_QTY_PRESSURE, "bara", "bar" },
    { RG_QTY_PRESSURE, "kPa(a)", "kPa" },
    { RG_QTY_DYN_VISCOSITY, "mPa.s", "mPa·s" },
    { RG_QTY_GRADIENT, "m/100m", "m/100 m" },
    /* not a unit of the quantity, a gauge pressure, nothing */
    { RG_QTY_LENGTH, "gpm", NULL },
    { RG_QTY_FLOW, "furlongs", NULL },
    { RG_QTY_PRESSURE, "psig", NULL },
    { RG_QTY_FLOW, "", NULL },
    { RG_QTY_FLOW, NULL, NULL },
    { RG_QTY_N, "m", NULL },
  };

  for (gsize i = 0; i < G_N_ELEMENTS (cases); i++)
    g_assert_cmpstr (rg_units_display_spelling (cases[i].q, cases[i].unit), ==,
                     cases[i].shown);
}

/* Pressures are absolute (units.h): absolute may be said outright, a gauge
 * pressure is refused with a sentence that names the atmosphere to add. */
static void
test_pressure_absolute (void)
{
  static const char *const absolute[] = {
    "2 bar", "2 bara", "2 bar(a)", "2 bar a", "2 bar·a",
  };
  static const char *const absolute_kpa[] = {
    "200 kPa", "200 kPa(a)", "200 kPa a", "0.2 MPa(a)", "0.2 MPa a",
  };
  static const char *const gauge[] = {
    "30 psig", "30 psi(g)", "30 psi g", "30 PSIG", "2 barg", "2 bar(g)",
    "2 bar g", "200 kPag", "200 kPa(g)", "200 kPa g", "0.2 MPag",
    "0.2 MPa(g)", "0.2 MPa g",
  };
  double si = 0.0;

  for (gsize i = 0; i < G_N_ELEMENTS (absolute); i++)
    {
      RgError err = { 0 };

      if (rg_units_parse (RG_QTY_PRESSURE, "--pressure", absolute[i], &si, &err) != RG_OK)
        g_error ("%s: %s", absolute[i], err.text);
      /* Source: NIST SP 811 (2008) B.8, bar = 1e5 Pa */
      assert_close (si, 2.0e5, 2 * DBL_EPSILON, absolute[i]);
    }
  for (gsize i = 0; i < G_N_ELEMENTS (absolute_kpa); i++)
    {
      RgError err = { 0 };

      if (rg_units_parse (RG_QTY_PRESSURE, "--pressure", absolute_kpa[i], &si, &err) != RG_OK)
        g_error ("%s: %s", absolute_kpa[i], err.text);
      /* Source: SI prefixes (SI Brochure, 9th ed., Table 7) */
      assert_close (si, 2.0e5, 2 * DBL_EPSILON, absolute_kpa[i]);
    }
  /* Source: NIST SP 811 (2008) B.8, lbf = 0.45359237 kg × 9.80665 m/s² */
  g_assert_cmpint (rg_units_parse (RG_QTY_PRESSURE, NULL, "30 psi(a)", &si, NULL), ==, RG_OK);
  assert_close (si, 30.0 * LBF / (IN * IN), 4 * DBL_EPSILON, "30 psi(a)");
  g_assert_cmpint (rg_units_parse (RG_QTY_PRESSURE, NULL, "30 psi a", &si, NULL), ==, RG_OK);
  assert_close (si, 30.0 * LBF / (IN * IN), 4 * DBL_EPSILON, "30 psi a");
  for (gsize i = 0; i < G_N_ELEMENTS (gauge); i++)
    {
      /* Source: NIST SP 811 (2008) B.8, standard atmosphere = 101 325 Pa,
       * the atmosphere the sentence names */
      expect_error (RG_QTY_PRESSURE, gauge[i], RG_ERR_UNIT, "gauge",
                    "101.325 kPa");
    }
  /* the same refusal where a unit is named for a conversion */
  {
    RgError err = { 0 };

    g_assert_cmpint (rg_units_from_si (RG_QTY_PRESSURE, 1.0e5, "barg", &si, &err),
                     ==, RG_ERR_UNIT);
    g_assert_nonnull (strstr (err.text, "gauge"));
    g_assert_nonnull (strstr (err.text, "absolute"));
  }
}

static void
test_viscosity (void)
{
  double v = 0.0;
  int kin = -1;
  RgError err = { 0 };

  /* Source: NIST SP 811 (2008) B.8, centipoise = 1e-3 Pa·s */
  g_assert_cmpint (rg_units_parse_viscosity ("--visc", "1.5 cP", &v, &kin,
                                             &err), ==, RG_OK);
  assert_close (v, 1.5e-3, 4 * DBL_EPSILON, "1.5 cP");
  g_assert_cmpint (kin, ==, 0);
  /* Source: NIST SP 811 (2008) B.8, centistokes = 1e-6 m²/s */
  g_assert_cmpint (rg_units_parse_viscosity ("--visc", "32 cSt", &v, &kin,
                                             &err), ==, RG_OK);
  assert_close (v, 32.0e-6, 4 * DBL_EPSILON, "32 cSt");
  g_assert_cmpint (kin, ==, 1);
  /* Source: units.h, a bare viscosity is dynamic, in Pa·s */
  g_assert_cmpint (rg_units_parse_viscosity ("--visc", "0.002", &v, &kin,
                                             &err), ==, RG_OK);
  g_assert_cmpfloat (v, ==, 0.002);
  g_assert_cmpint (kin, ==, 0);
  g_assert_cmpint (rg_units_parse_viscosity ("--visc", "1e-6 m²/s", &v, &kin,
                                             &err), ==, RG_OK);
  g_assert_cmpint (kin, ==, 1);

  g_assert_cmpint (rg_units_parse_viscosity ("--visc", "3 gpm", &v, &kin,
                                             &err), ==, RG_ERR_UNIT);
  g_assert_nonnull (strstr (err.text, "(flow)"));
  g_assert_nonnull (strstr (err.text, "(kinematic)"));
  g_assert_nonnull (strstr (err.text, "--visc"));
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_VALUE));
  /* a pressure unit for a viscosity names the pressure as what it is */
  g_assert_cmpint (rg_units_parse_viscosity ("--visc", "1 Pa", &v, &kin,
                                             &err), ==, RG_ERR_UNIT);
  g_assert_nonnull (strstr (err.text, "(pressure)"));
  g_assert_cmpint (rg_units_parse_viscosity ("--visc", "", &v, &kin, &err),
                   ==, RG_ERR_PARSE);
}

static void
test_conversion_errors (void)
{
  double v = 0.0;
  RgError err = { 0 };

  g_assert_cmpint (rg_units_to_si (RG_QTY_FLOW, 1.0, "ft", &v, &err), ==,
                   RG_ERR_UNIT);
  g_assert_nonnull (strstr (err.text, "(length)"));
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_VALUE));
  g_assert_cmpint (rg_units_to_si (RG_QTY_FLOW, 1.0, "furlong", &v, &err), ==,
                   RG_ERR_UNIT);
  g_assert_cmpint (rg_units_from_si (RG_QTY_FLOW, 1.0, "psig", &v, &err), ==,
                   RG_ERR_UNIT);
  g_assert_cmpint (rg_units_to_si (RG_QTY_FLOW, NAN, "gpm", &v, &err), ==,
                   RG_ERR_DOMAIN);
  g_assert_cmpint (rg_units_from_si (RG_QTY_FLOW, INFINITY, "gpm", &v, &err),
                   ==, RG_ERR_DOMAIN);
  g_assert_cmpint (rg_units_to_si (RG_QTY_LENGTH, DBL_MAX, "km", &v, &err),
                   ==, RG_ERR_DOMAIN);
  g_assert_cmpint (rg_units_to_si (RG_QTY_TEMPERATURE, -300.0, "°C", &v,
                                   &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpint (rg_units_to_si (RG_QTY_TEMPERATURE, -1.0, NULL, &v, &err),
                   ==, RG_ERR_DOMAIN);
  g_assert_cmpint (rg_units_from_si (RG_QTY_TEMPERATURE, -1.0, "°C", &v,
                                     &err), ==, RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, RG_SUBJECT_BIT (RG_SUBJECT_VALUE));
  /* an unknown kind of quantity is a misuse of the API: no subject */
  g_assert_cmpint (rg_units_to_si (RG_QTY_N, 1.0, "m", &v, &err), ==,
                   RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, 0);
  g_assert_cmpint (rg_units_parse (RG_QTY_N, "--x", "1 m", &v, &err), ==,
                   RG_ERR_DOMAIN);
  g_assert_cmpuint (err.subjects, ==, 0);
  /* Source: SI (no unit, or a blank one, means SI) */
  g_assert_cmpint (rg_units_from_si (RG_QTY_FLOW, 0.25, "", &v, &err), ==,
                   RG_OK);
  g_assert_cmpfloat (v, ==, 0.25);
  g_assert_cmpint (rg_units_to_si (RG_QTY_FLOW, 0.25, NULL, &v, &err), ==,
                   RG_OK);
  g_assert_cmpfloat (v, ==, 0.25);
}

/* rg_units_format: the value in the chosen unit, 4 significant figures,
 * the display symbol.  Every expected value follows from the exact
 * definitions of NIST SP 811 (2008), Appendix B.8/B.9 (inch, foot, US
 * gallon = 231 in³, pound-force = 0.45359237 kg × 9.80665 m/s², standard
 * atmosphere = 101 325 Pa, T/K = (t/°F + 459.67)/1.8, T/K = t/°C + 273.15),
 * rounded by hand to 4 significant figures. */
static void
test_format (void)
{
  RgUnitChoice us = { { NULL } };
  RgUnitChoice odd = { { NULL } };
  RgUnitChoice micro = { { NULL } };
  char buf[48];
  const struct
  {
    const RgUnitChoice *choice;
    RgQuantity q;
    double si;
    const char *want;
  } cases[] = {
    /* Source: NIST SP 811 B.8: 150 US gal/min = 150·231·0.0254³/60 m³/s */
    { &us, RG_QTY_FLOW, 150.0 * GAL / 60.0, "150 gpm" },
    /* Source: NIST SP 811 B.9: 68 °F = (68 + 459.67)/1.8 K = 293.15 K */
    { &us, RG_QTY_TEMPERATURE, (68.0 + 459.67) / 1.8, "68 °F" },
    /* Source: NIST SP 811 B.9: −40 °F = −40 °C = 233.15 K */
    { &us, RG_QTY_TEMPERATURE, 233.15, "-40 °F" },
    /* Source: NIST SP 811 B.8: 101 325 Pa / (4.4482216152605 N / 6.4516e-4
     * m²) = 14.6959… psi */
    { &us, RG_QTY_PRESSURE, 101325.0, "14.7 psi" },
    /* Source: NIST SP 811 B.8: 10 MPa = 1450.377… psi */
    { &us, RG_QTY_PRESSURE, 10.0e6, "1450 psi" },
    /* Source: NIST SP 811 B.8: 0.9144 mm = 0.036 in = 0.003 ft */
    { &us, RG_QTY_LENGTH, 0.9144e-3, "0.003 ft" },
    /* Source: NIST SP 811 B.8: 1e9 m / 0.3048 m = 3.2808…e9 ft */
    { &us, RG_QTY_LENGTH, 1.0e9, "3.281e+09 ft" },
    /* Source: SI (the quantity has no entry in the choice) */
    { &us, RG_QTY_DENSITY, 998.2, "998.2 kg/m³" },
    /* Source: SI, no choice at all */
    { NULL, RG_QTY_FLOW, 1.2, "1.2 m³/s" },
    { NULL, RG_QTY_PRESSURE, 12345.0, "12350 Pa" },
    { NULL, RG_QTY_LENGTH, 4.5e-5, "4.5e-05 m" },
    { NULL, RG_QTY_LENGTH, 0.0, "0 m" },
    { NULL, RG_QTY_LENGTH, -0.25, "-0.25 m" },
    /* Source: SI prefixes: 4.5e-5 m = 0.045 mm */
    { &odd, RG_QTY_ROUGHNESS, 4.5e-5, "0.045 mm" },
    /* Source: SI prefixes: 4.5e-5 m = 45 µm ("um" is shown "µm") */
    { &micro, RG_QTY_ROUGHNESS, 4.5e-5, "45 µm" },
    /* Source: NIST SP 811 B.9: 273.16 K = 0.01 °C */
    { &odd, RG_QTY_TEMPERATURE, 273.16, "0.01 °C" },
    /* spellings shown in the display form of the same unit */
    { &odd, RG_QTY_FLOW, 150.0 * GAL / 60.0, "150 gpm" },
    { &odd, RG_QTY_PRESSURE, 1.0e5, "1 bar" },
    /* a spelling the core does not know: SI */
    { &odd, RG_QTY_LENGTH, 2.0, "2 m" },
    /* never NaN or infinity */
    { &us, RG_QTY_FLOW, NAN, "—" },
    { NULL, RG_QTY_PRESSURE, INFINITY, "—" },
    { &us, RG_QTY_PRESSURE, -INFINITY, "—" },
  };

  us.unit[RG_QTY_FLOW] = "gpm";
  us.unit[RG_QTY_TEMPERATURE] = "°F";
  us.unit[RG_QTY_PRESSURE] = "psi";
  us.unit[RG_QTY_LENGTH] = "ft";
  odd.unit[RG_QTY_ROUGHNESS] = "mm";
  odd.unit[RG_QTY_TEMPERATURE] = "degC";
  odd.unit[RG_QTY_FLOW] = "USgpm";
  odd.unit[RG_QTY_PRESSURE] = "bara";
  odd.unit[RG_QTY_LENGTH] = "furlong";
  micro.unit[RG_QTY_ROUGHNESS] = "um";

  for (gsize i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      const char *got = rg_units_format (cases[i].choice, cases[i].q,
                                         cases[i].si, buf, sizeof buf);
      g_assert_true (got == buf);
      if (strcmp (got, cases[i].want) != 0)
        g_error ("case %" G_GSIZE_FORMAT ": got '%s', want '%s'", i, got,
                 cases[i].want);
    }

  /* A temperature difference has no offset.  Source: NIST SP 811 B.9,
   * a difference of 1 K is one of 1.8 °F. */
  g_assert_cmpstr (rg_units_format_difference (&us, RG_QTY_TEMPERATURE, 1.0,
                                               buf, sizeof buf), ==, "1.8 °F");
  g_assert_cmpstr (rg_units_format_difference (NULL, RG_QTY_TEMPERATURE, 1.0,
                                               buf, sizeof buf), ==, "1 K");
  /* a short buffer is cut, never overrun */
  {
    char small[4] = { 'x', 'x', 'x', 'x' };
    rg_units_format (&us, RG_QTY_FLOW, 150.0 * GAL / 60.0, small, 3);
    g_assert_cmpint (small[2], ==, '\0');
    g_assert_cmpint (small[3], ==, 'x');
  }
}

/* Parsing must not follow LC_NUMERIC: under de_DE the C library reads
 * "2.5" as 2 and writes 2,5. */
static void
test_locale (void)
{
  static const char *const names[] = { "de_DE.UTF-8", "de_DE.utf8",
                                       "de_DE" };
  char *saved = g_strdup (setlocale (LC_NUMERIC, NULL));
  const char *got = NULL;
  double v = 0.0;
  RgError err = { 0 };

  for (gsize i = 0; i < G_N_ELEMENTS (names) && got == NULL; i++)
    got = setlocale (LC_NUMERIC, names[i]);
  if (got == NULL || strcmp (localeconv ()->decimal_point, ",") != 0)
    {
      setlocale (LC_NUMERIC, saved);
      g_free (saved);
      g_test_skip ("no de_DE locale with a decimal comma is installed");
      return;
    }
  /* Source: SI (bare metres); the text is "2.5 m" */
  g_assert_cmpint (rg_units_parse (RG_QTY_LENGTH, "--length", "2.5 m", &v,
                                   &err), ==, RG_OK);
  g_assert_cmpfloat (v, ==, 2.5);
  g_assert_cmpint (rg_units_parse (RG_QTY_FLOW, "--flow", "1.5e-3", &v, &err),
                   ==, RG_OK);
  g_assert_cmpfloat (v, ==, 1.5e-3);
  g_assert_cmpint (rg_units_parse (RG_QTY_LENGTH, "--length", "2,5 m", &v,
                                   &err), ==, RG_ERR_PARSE);
  setlocale (LC_NUMERIC, saved);
  g_free (saved);
}

/* An error sentence must print on one line as valid UTF-8. */
static void
assert_one_line (const RgError *err)
{
  g_assert_cmpuint (strlen (err->text), >, 0);
  g_assert_true (g_utf8_validate (err->text, -1, NULL));
  for (const char *p = err->text; *p != '\0'; p++)
    g_assert_cmpint ((unsigned char) *p, >=, 0x20);
}

/* Inputs found by tests/fuzz/fuzz-units.c (libFuzzer), kept as regressions. */
static void
test_fuzz_regressions (void)
{
  RgError err = { 0 };
  double v = 0.0;

  /* From the fuzzer: bytes that are not UTF-8 before the number were echoed
   * as they were, so the sentence was not valid UTF-8. */
  g_assert_cmpint (rg_units_parse (RG_QTY_FLOW, "--fuzz", "\xff\xfe 2 m", &v,
                                   &err), ==, RG_ERR_PARSE);
  assert_one_line (&err);
  /* the same through the unit text and a conversion unit name */
  g_assert_cmpint (rg_units_parse (RG_QTY_LENGTH, NULL, "2 \xc3(m", &v, &err),
                   ==, RG_ERR_UNIT);
  assert_one_line (&err);
  g_assert_cmpint (rg_units_to_si (RG_QTY_LENGTH, 1.0, "\xe2\x82 m\n", &v,
                                   &err), ==, RG_ERR_UNIT);
  assert_one_line (&err);
  g_assert_cmpint (rg_units_parse_viscosity ("--viscosity", "\xf0\x9f 1 cP",
                                             &v, NULL, &err), ==, RG_ERR_PARSE);
  assert_one_line (&err);
}

int
main (int argc, char *argv[])
{
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/units/factors", test_factors);
  g_test_add_func ("/units/temperature/points", test_temperature_points);
  g_test_add_func ("/units/choices/round-trip", test_choices_round_trip);
  g_test_add_func ("/units/parse/spellings", test_spellings);
  g_test_add_func ("/units/parse/per-day-flow", test_per_day_flow);
  g_test_add_func ("/units/parse/pressure-absolute", test_pressure_absolute);
  g_test_add_func ("/units/display-spelling", test_display_spelling);
  g_test_add_func ("/units/parse/bad-input", test_bad_input);
  g_test_add_func ("/units/parse/viscosity", test_viscosity);
  g_test_add_func ("/units/convert/errors", test_conversion_errors);
  g_test_add_func ("/units/format", test_format);
  g_test_add_func ("/units/parse/locale", test_locale);
  g_test_add_func ("/units/parse/fuzz-regressions", test_fuzz_regressions);
  return g_test_run ();
}
