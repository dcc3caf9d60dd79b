/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Units: value-with-unit text to SI, and SI to and from named units.
 *
 * Method: a value is SI = (x + offset)·factor, with offset = 0 except for
 * °C and °F.  The text is read as
 *     [sign] number [unit]
 * where number is a decimal ("2", "2.5", ".5", "1.5e-3"), a simple fraction
 * ("3/4") or a mixed number ("1 1/2", "1-1/2"), and the unit is matched
 * after normalisation: Unicode spellings become ASCII (µ and μ → u, ³ → 3,
 * ² → 2, · and ⋅ → ., ° → deg, ″ → ", ′ → '), spaces between two letters
 * become "." ("Pa s" = "Pa.s") and other spaces go ("L / s" = "L/s").
 * The unit is looked up exactly first, then ignoring ASCII case when that
 * is unambiguous for the quantity ("MPA", "cst", "Gpm").  A bare number is
 * SI (kelvin for a temperature, m per 100 m for a gradient).
 *
 * Numbers never follow the process locale: the syntax is checked here
 * (a point is the only decimal separator) and the digits are converted by
 * strtod inside uselocale() of the C locale, so "2.5" is 2.5 under de_DE.
 *
 * Special cases refused with one sentence naming the value: empty text,
 * not a number, a comma ("2,5" or "1,500"), NaN and infinity, overflow
 * ("1e999") and underflow to zero or subnormal ("1e-999"), a zero
 * denominator, an unknown unit, a unit of another quantity, a gauge
 * pressure, a temperature below 0 K, a result that overflows in SI.
 *
 * Accuracy: factors are exact decimal definitions rounded once to double
 * (or a quotient of two such); a conversion adds one or two roundings.
 *
 * Sources of the factors: NIST Special Publication 811 (2008 edition),
 * "Guide for the Use of the International System of Units", Appendix B.8
 * and B.9 (international inch = 0.0254 m exactly, foot = 0.3048 m
 * exactly, US gallon = 231 in³ = 3.785411784e-3 m³ exactly,
 * pound (avoirdupois) = 0.45359237 kg exactly, standard acceleration of
 * gravity 9.80665 m/s² exactly, atmosphere = 101325 Pa exactly,
 * bar = 1e5 Pa, poise = 0.1 Pa·s, stokes = 1e-4 m²/s, °F and °C as
 * T/K = (t/°F + 459.67)/1.8 and T/K = t/°C + 273.15, day = 86 400 s,
 * barrel for petroleum = 42 US gallons = 0.158987294928 m³).  The year is the
 * Julian year of 365.25 d = 31 557 600 s (the "a" of the IAU; NIST SP 811
 * lists 365-day and tropical years too, so the choice is ours and stated
 * here).  Salinity: 1 g/kg = 1 ppt (parts per thousand by mass) = 1e-3.
 * Power and energy: NIST SP 811 (2008) B.8, horsepower (550 ft·lbf/s)
 * = 550 × 0.3048 m × 4.4482216152605 N per second = 745.69987158227022 W
 * exactly (the mechanical horsepower of US pump and motor practice; the
 * table rounds it to 7.456 999 E+02 W), and kilowatt hour = 3.6 E+06 J
 * exactly (1 W·h = 3600 J). */
#include "units.h"

#include <errno.h>
#include <locale.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

/* Exact definitions, NIST SP 811 (2008) Appendix B. */
#define M_PER_IN 0.0254
#define M_PER_FT 0.3048
#define M3_PER_USGAL 3.785411784e-3
#define M3_PER_FT3 0.028316846592          /* 0.3048³, exact decimal */
#define KG_PER_LB 0.45359237
#define N_PER_LBF 4.4482216152605          /* 0.45359237 · 9.80665, exact */
#define M2_PER_IN2 6.4516e-4               /* 0.0254², exact */
#define PA_PER_ATM 101325.0
#define S_PER_DAY 86400.0
#define S_PER_YEAR RG_UNITS_SECONDS_PER_YEAR /* Julian year, 365.25 d */
/* 3.785411784e-3 / 60 is the exact decimal 6.30901964e-5. */
#define M3S_PER_GPM 6.30901964e-5
/* 550 ft·lbf/s = 550 × 0.3048 × 4.4482216152605 W, an exact decimal. */
#define W_PER_HP 745.69987158227022
#define J_PER_WH 3600.0
/* The barrel for petroleum, 42 US gallons: the exact decimal
 * 0.158987294928 m³ (NIST SP 811, B.8). */
#define M3_PER_BBL 0.158987294928

typedef struct {
  RgQuantity q;
  const char *spelling; /* normalised form (see normalise_unit) */
  double factor;
  double offset;
} UnitDef;

static const UnitDef UNITS[] = {
  /* flow, m³/s */
  { RG_QTY_FLOW, "m3/s", 1.0, 0.0 },
  { RG_QTY_FLOW, "L/s", 1.0e-3, 0.0 },
  { RG_QTY_FLOW, "L/min", 1.0e-3 / 60.0, 0.0 },
  { RG_QTY_FLOW, "lpm", 1.0e-3 / 60.0, 0.0 },
  { RG_QTY_FLOW, "m3/h", 1.0 / 3600.0, 0.0 },
  { RG_QTY_FLOW, "m3/hr", 1.0 / 3600.0, 0.0 },
  { RG_QTY_FLOW, "gpm", M3S_PER_GPM, 0.0 },
  { RG_QTY_FLOW, "USgpm", M3S_PER_GPM, 0.0 },
  { RG_QTY_FLOW, "US.gpm", M3S_PER_GPM, 0.0 },
  { RG_QTY_FLOW, "gal/min", M3S_PER_GPM, 0.0 },
  { RG_QTY_FLOW, "cfs", M3_PER_FT3, 0.0 },
  { RG_QTY_FLOW, "ft3/s", M3_PER_FT3, 0.0 },
  /* flow per day, as water supply and oil fields count it: the day is
   * 86 400 s, a megalitre 1e3 m³, MGD a million US gallons (NIST SP 811,
   * B.8); "MGD" is always the US gallon here */
  { RG_QTY_FLOW, "m3/d", 1.0 / S_PER_DAY, 0.0 },
  { RG_QTY_FLOW, "m3/day", 1.0 / S_PER_DAY, 0.0 },
  { RG_QTY_FLOW, "ML/d", 1.0e3 / S_PER_DAY, 0.0 },
  { RG_QTY_FLOW, "Ml/d", 1.0e3 / S_PER_DAY, 0.0 },
  { RG_QTY_FLOW, "MLD", 1.0e3 / S_PER_DAY, 0.0 },
  /* millilitres per day: here so that "ml/d" (case ignored) matches two
   * units and is refused, rather than read as megalitres */
  { RG_QTY_FLOW, "mL/d", 1.0e-6 / S_PER_DAY, 0.0 },
  { RG_QTY_FLOW, "MGD", 1.0e6 * M3_PER_USGAL / S_PER_DAY, 0.0 },
  { RG_QTY_FLOW, "Mgal/d", 1.0e6 * M3_PER_USGAL / S_PER_DAY, 0.0 },
  { RG_QTY_FLOW, "US.MGD", 1.0e6 * M3_PER_USGAL / S_PER_DAY, 0.0 },
  { RG_QTY_FLOW, "bbl/d", M3_PER_BBL / S_PER_DAY, 0.0 },
  { RG_QTY_FLOW, "bbl/day", M3_PER_BBL / S_PER_DAY, 0.0 },
  { RG_QTY_FLOW, "BPD", M3_PER_BBL / S_PER_DAY, 0.0 },
  { RG_QTY_FLOW, "US.bbl/d", M3_PER_BBL / S_PER_DAY, 0.0 },
  /* length, m */
  { RG_QTY_LENGTH, "m", 1.0, 0.0 },
  { RG_QTY_LENGTH, "cm", 1.0e-2, 0.0 },
  { RG_QTY_LENGTH, "mm", 1.0e-3, 0.0 },
  { RG_QTY_LENGTH, "km", 1.0e3, 0.0 },
  { RG_QTY_LENGTH, "in", M_PER_IN, 0.0 },
  { RG_QTY_LENGTH, "inch", M_PER_IN, 0.0 },
  { RG_QTY_LENGTH, "inches", M_PER_IN, 0.0 },
  { RG_QTY_LENGTH, "\"", M_PER_IN, 0.0 },
  { RG_QTY_LENGTH, "ft", M_PER_FT, 0.0 },
  { RG_QTY_LENGTH, "foot", M_PER_FT, 0.0 },
  { RG_QTY_LENGTH, "feet", M_PER_FT, 0.0 },
  { RG_QTY_LENGTH, "'", M_PER_FT, 0.0 },
  /* roughness, m: the lengths plus micrometres */
  { RG_QTY_ROUGHNESS, "m", 1.0, 0.0 },
  { RG_QTY_ROUGHNESS, "cm", 1.0e-2, 0.0 },
  { RG_QTY_ROUGHNESS, "mm", 1.0e-3, 0.0 },
  { RG_QTY_ROUGHNESS, "um", 1.0e-6, 0.0 },
  { RG_QTY_ROUGHNESS, "micron", 1.0e-6, 0.0 },
  { RG_QTY_ROUGHNESS, "microns", 1.0e-6, 0.0 },
  { RG_QTY_ROUGHNESS, "km", 1.0e3, 0.0 },
  { RG_QTY_ROUGHNESS, "in", M_PER_IN, 0.0 },
  { RG_QTY_ROUGHNESS, "inch", M_PER_IN, 0.0 },
  { RG_QTY_ROUGHNESS, "inches", M_PER_IN, 0.0 },
  { RG_QTY_ROUGHNESS, "\"", M_PER_IN, 0.0 },
  { RG_QTY_ROUGHNESS, "ft", M_PER_FT, 0.0 },
  { RG_QTY_ROUGHNESS, "foot", M_PER_FT, 0.0 },
  { RG_QTY_ROUGHNESS, "feet", M_PER_FT, 0.0 },
  { RG_QTY_ROUGHNESS, "'", M_PER_FT, 0.0 },
  /* temperature, K */
  { RG_QTY_TEMPERATURE, "K", 1.0, 0.0 },
  { RG_QTY_TEMPERATURE, "kelvin", 1.0, 0.0 },
  { RG_QTY_TEMPERATURE, "C", 1.0, 273.15 },
  { RG_QTY_TEMPERATURE, "degC", 1.0, 273.15 },
  { RG_QTY_TEMPERATURE, "deg.C", 1.0, 273.15 },
  { RG_QTY_TEMPERATURE, "celsius", 1.0, 273.15 },
  { RG_QTY_TEMPERATURE, "F", 5.0 / 9.0, 459.67 },
  { RG_QTY_TEMPERATURE, "degF", 5.0 / 9.0, 459.67 },
  { RG_QTY_TEMPERATURE, "deg.F", 5.0 / 9.0, 459.67 },
  { RG_QTY_TEMPERATURE, "fahrenheit", 5.0 / 9.0, 459.67 },
  /* pressure, Pa, absolute */
  { RG_QTY_PRESSURE, "Pa", 1.0, 0.0 },
  { RG_QTY_PRESSURE, "kPa", 1.0e3, 0.0 },
  { RG_QTY_PRESSURE, "MPa", 1.0e6, 0.0 },
  { RG_QTY_PRESSURE, "bar", 1.0e5, 0.0 },
  { RG_QTY_PRESSURE, "bara", 1.0e5, 0.0 },
  { RG_QTY_PRESSURE, "bar(a)", 1.0e5, 0.0 },
  { RG_QTY_PRESSURE, "atm", PA_PER_ATM, 0.0 },
  { RG_QTY_PRESSURE, "psi", N_PER_LBF / M2_PER_IN2, 0.0 },
  { RG_QTY_PRESSURE, "psia", N_PER_LBF / M2_PER_IN2, 0.0 },
  { RG_QTY_PRESSURE, "psi(a)", N_PER_LBF / M2_PER_IN2, 0.0 },
  /* absolute said outright ("kPa(a)", "bar a"): the counterparts of the
   * gauge spellings refused below */
  { RG_QTY_PRESSURE, "psi.a", N_PER_LBF / M2_PER_IN2, 0.0 },
  { RG_QTY_PRESSURE, "bar.a", 1.0e5, 0.0 },
  { RG_QTY_PRESSURE, "kPa(a)", 1.0e3, 0.0 },
  { RG_QTY_PRESSURE, "kPa.a", 1.0e3, 0.0 },
  { RG_QTY_PRESSURE, "MPa(a)", 1.0e6, 0.0 },
  { RG_QTY_PRESSURE, "MPa.a", 1.0e6, 0.0 },
  /* dynamic viscosity, Pa·s */
  { RG_QTY_DYN_VISCOSITY, "Pa.s", 1.0, 0.0 },
  { RG_QTY_DYN_VISCOSITY, "mPa.s", 1.0e-3, 0.0 },
  { RG_QTY_DYN_VISCOSITY, "cP", 1.0e-3, 0.0 },
  { RG_QTY_DYN_VISCOSITY, "cPs", 1.0e-3, 0.0 },
  /* kinematic viscosity, m²/s */
  { RG_QTY_KIN_VISCOSITY, "m2/s", 1.0, 0.0 },
  { RG_QTY_KIN_VISCOSITY, "mm2/s", 1.0e-6, 0.0 },
  { RG_QTY_KIN_VISCOSITY, "cSt", 1.0e-6, 0.0 },
  /* density, kg/m³ */
  { RG_QTY_DENSITY, "kg/m3", 1.0, 0.0 },
  { RG_QTY_DENSITY, "g/cm3", 1.0e3, 0.0 },
  { RG_QTY_DENSITY, "g/cc", 1.0e3, 0.0 },
  { RG_QTY_DENSITY, "g/mL", 1.0e3, 0.0 },
  { RG_QTY_DENSITY, "kg/L", 1.0e3, 0.0 },
  { RG_QTY_DENSITY, "lb/ft3", KG_PER_LB / M3_PER_FT3, 0.0 },
  /* velocity, m/s */
  { RG_QTY_VELOCITY, "m/s", 1.0, 0.0 },
  { RG_QTY_VELOCITY, "ft/s", M_PER_FT, 0.0 },
  { RG_QTY_VELOCITY, "fps", M_PER_FT, 0.0 },
  /* hydraulic gradient, m per 100 m (the core's unit, units.h) */
  { RG_QTY_GRADIENT, "m/100m", 1.0, 0.0 },
  { RG_QTY_GRADIENT, "ft/100ft", 1.0, 0.0 },
  { RG_QTY_GRADIENT, "%", 1.0, 0.0 },
  { RG_QTY_GRADIENT, "m/km", 0.1, 0.0 },
  { RG_QTY_GRADIENT, "m/m", 100.0, 0.0 },
  { RG_QTY_GRADIENT, "ft/ft", 100.0, 0.0 },
  /* time, s */
  { RG_QTY_TIME, "s", 1.0, 0.0 },
  { RG_QTY_TIME, "min", 60.0, 0.0 },
  { RG_QTY_TIME, "h", 3600.0, 0.0 },
  { RG_QTY_TIME, "hr", 3600.0, 0.0 },
  { RG_QTY_TIME, "d", S_PER_DAY, 0.0 },
  { RG_QTY_TIME, "day", S_PER_DAY, 0.0 },
  { RG_QTY_TIME, "days", S_PER_DAY, 0.0 },
  { RG_QTY_TIME, "yr", S_PER_YEAR, 0.0 },
  { RG_QTY_TIME, "yrs", S_PER_YEAR, 0.0 },
  { RG_QTY_TIME, "year", S_PER_YEAR, 0.0 },
  { RG_QTY_TIME, "years", S_PER_YEAR, 0.0 },
  { RG_QTY_TIME, "a", S_PER_YEAR, 0.0 },
  { RG_QTY_TIME, "y", S_PER_YEAR, 0.0 },
  /* roughness growth rate, m/s */
  { RG_QTY_ROUGHNESS_RATE, "m/s", 1.0, 0.0 },
  { RG_QTY_ROUGHNESS_RATE, "mm/yr", 1.0e-3 / S_PER_YEAR, 0.0 },
  { RG_QTY_ROUGHNESS_RATE, "mm/year", 1.0e-3 / S_PER_YEAR, 0.0 },
  { RG_QTY_ROUGHNESS_RATE, "mm/a", 1.0e-3 / S_PER_YEAR, 0.0 },
  { RG_QTY_ROUGHNESS_RATE, "mm/y", 1.0e-3 / S_PER_YEAR, 0.0 },
  { RG_QTY_ROUGHNESS_RATE, "um/yr", 1.0e-6 / S_PER_YEAR, 0.0 },
  { RG_QTY_ROUGHNESS_RATE, "um/year", 1.0e-6 / S_PER_YEAR, 0.0 },
  { RG_QTY_ROUGHNESS_RATE, "um/a", 1.0e-6 / S_PER_YEAR, 0.0 },
  /* US customary: the inch of the roughness, and the mil (a thousandth of
   * an inch, NIST SP 811 B.8) of corrosion rates */
  { RG_QTY_ROUGHNESS_RATE, "in/yr", M_PER_IN / S_PER_YEAR, 0.0 },
  { RG_QTY_ROUGHNESS_RATE, "in/year", M_PER_IN / S_PER_YEAR, 0.0 },
  { RG_QTY_ROUGHNESS_RATE, "in/a", M_PER_IN / S_PER_YEAR, 0.0 },
  { RG_QTY_ROUGHNESS_RATE, "mil/yr", 1.0e-3 * M_PER_IN / S_PER_YEAR, 0.0 },
  { RG_QTY_ROUGHNESS_RATE, "mil/year", 1.0e-3 * M_PER_IN / S_PER_YEAR, 0.0 },
  { RG_QTY_ROUGHNESS_RATE, "mpy", 1.0e-3 * M_PER_IN / S_PER_YEAR, 0.0 },
  /* salinity, kg/kg */
  { RG_QTY_SALINITY, "kg/kg", 1.0, 0.0 },
  { RG_QTY_SALINITY, "g/kg", 1.0e-3, 0.0 },
  { RG_QTY_SALINITY, "ppt", 1.0e-3, 0.0 },
  { RG_QTY_SALINITY, "permil", 1.0e-3, 0.0 },
  /* power, W */
  { RG_QTY_POWER, "W", 1.0, 0.0 },
  { RG_QTY_POWER, "kW", 1.0e3, 0.0 },
  { RG_QTY_POWER, "MW", 1.0e6, 0.0 },
  { RG_QTY_POWER, "hp", W_PER_HP, 0.0 },
  /* energy, J */
  { RG_QTY_ENERGY, "J", 1.0, 0.0 },
  { RG_QTY_ENERGY, "kJ", 1.0e3, 0.0 },
  { RG_QTY_ENERGY, "MJ", 1.0e6, 0.0 },
  { RG_QTY_ENERGY, "GJ", 1.0e9, 0.0 },
  { RG_QTY_ENERGY, "Wh", J_PER_WH, 0.0 },
  { RG_QTY_ENERGY, "W.h", J_PER_WH, 0.0 },
  { RG_QTY_ENERGY, "kWh", 1.0e3 * J_PER_WH, 0.0 },
  { RG_QTY_ENERGY, "kW.h", 1.0e3 * J_PER_WH, 0.0 },
  { RG_QTY_ENERGY, "MWh", 1.0e6 * J_PER_WH, 0.0 },
  { RG_QTY_ENERGY, "MW.h", 1.0e6 * J_PER_WH, 0.0 },
  { RG_QTY_ENERGY, "GWh", 1.0e9 * J_PER_WH, 0.0 },
};
enum { N_UNITS = sizeof UNITS / sizeof UNITS[0] };

/* Gauge-pressure spellings, refused (compared ignoring case). */
static const char *const GAUGE[] = {
  "psig", "psi(g)", "psi.g", "barg", "bar(g)", "bar.g",
  "kPag", "kPa(g)", "kPa.g", "MPag", "MPa(g)", "MPa.g",
};

/* Display spellings offered per quantity (rg_units_choice). */
static const char *const CHOICES[RG_QTY_N][12] = {
  [RG_QTY_FLOW] = { "m³/s", "L/s", "L/min", "m³/h", "gpm", "cfs",
                    "m³/d", "ML/d", "MGD", "bbl/d" },
  [RG_QTY_LENGTH] = { "m", "cm", "mm", "km", "in", "ft" },
  [RG_QTY_ROUGHNESS] = { "m", "mm", "µm", "cm", "in", "ft" },
  [RG_QTY_TEMPERATURE] = { "K", "°C", "°F" },
  [RG_QTY_PRESSURE] = { "Pa", "kPa", "MPa", "bar", "atm", "psi" },
  [RG_QTY_DYN_VISCOSITY] = { "Pa·s", "mPa·s", "cP" },
  [RG_QTY_KIN_VISCOSITY] = { "m²/s", "mm²/s", "cSt" },
  [RG_QTY_DENSITY] = { "kg/m³", "g/cm³", "kg/L", "lb/ft³" },
  [RG_QTY_VELOCITY] = { "m/s", "ft/s" },
  [RG_QTY_GRADIENT] = { "m/100 m", "ft/100 ft", "m/km", "%", "m/m" },
  [RG_QTY_TIME] = { "s", "min", "h", "d", "yr" },
  [RG_QTY_ROUGHNESS_RATE] = { "m/s", "mm/yr", "µm/yr", "in/yr", "mil/yr" },
  [RG_QTY_SALINITY] = { "kg/kg", "g/kg", "ppt" },
  [RG_QTY_POWER] = { "W", "kW", "MW", "hp" },
  [RG_QTY_ENERGY] = { "J", "MJ", "GJ", "kWh", "MWh", "GWh" },
};

/* The accepted units as a list for messages; the words in parentheses are
 * translated (rg_gettext), the unit symbols stay as they are. */
static const char *const ACCEPTED[RG_QTY_N] = {
  [RG_QTY_FLOW] = RG_N_ ("m³/s, L/s, L/min, m³/h, m³/d, ML/d, gpm (US gal/min), "
                         "MGD (million US gal/d), cfs (ft³/s), bbl/d (US oil barrels "
                         "per day)"),
  [RG_QTY_LENGTH] = RG_N_ ("m, cm, mm, km, in (or \"), ft"),
  [RG_QTY_ROUGHNESS] = RG_N_ ("m, mm, µm (or um), cm, in, ft"),
  [RG_QTY_TEMPERATURE] = RG_N_ ("K, °C (or C), °F (or F)"),
  [RG_QTY_PRESSURE] = RG_N_ ("Pa, kPa, MPa, bar, atm, psi (all absolute)"),
  [RG_QTY_DYN_VISCOSITY] = RG_N_ ("Pa·s (or Pa.s), mPa·s, cP"),
  [RG_QTY_KIN_VISCOSITY] = RG_N_ ("m²/s (or m2/s), mm²/s, cSt"),
  [RG_QTY_DENSITY] = RG_N_ ("kg/m³ (or kg/m3), g/cm³, kg/L, lb/ft³"),
  [RG_QTY_VELOCITY] = RG_N_ ("m/s, ft/s"),
  [RG_QTY_GRADIENT] = RG_N_ ("m/100 m (or %), ft/100 ft, m/km, m/m"),
  [RG_QTY_TIME] = RG_N_ ("s, min, h, d, yr (or year, a)"),
  [RG_QTY_ROUGHNESS_RATE] = RG_N_ ("m/s, mm/yr, µm/yr, in/yr, mil/yr, mpy"),
  [RG_QTY_SALINITY] = RG_N_ ("kg/kg, g/kg, ppt"),
  [RG_QTY_POWER] = RG_N_ ("W, kW, MW, hp (550 ft·lbf/s)"),
  [RG_QTY_ENERGY] = RG_N_ ("J, kJ, MJ, GJ, Wh, kWh, MWh, GWh"),
};

static const char *const SI_SYMBOL[RG_QTY_N] = {
  [RG_QTY_FLOW] = "m³/s",
  [RG_QTY_LENGTH] = "m",
  [RG_QTY_ROUGHNESS] = "m",
  [RG_QTY_TEMPERATURE] = "K",
  [RG_QTY_PRESSURE] = "Pa",
  [RG_QTY_DYN_VISCOSITY] = "Pa·s",
  [RG_QTY_KIN_VISCOSITY] = "m²/s",
  [RG_QTY_DENSITY] = "kg/m³",
  [RG_QTY_VELOCITY] = "m/s",
  [RG_QTY_GRADIENT] = "m/100 m",
  [RG_QTY_TIME] = "s",
  [RG_QTY_ROUGHNESS_RATE] = "m/s",
  [RG_QTY_SALINITY] = "kg/kg",
  [RG_QTY_POWER] = "W",
  [RG_QTY_ENERGY] = "J",
};

/* The name of each quantity, shown in parentheses inside a sentence ("has
 * a unit of another quantity (length)"), so that a translation needs no
 * article or case for it. */
static const char *const QTY_NAME[RG_QTY_N] = {
  [RG_QTY_FLOW] = RG_N_ ("flow"),
  [RG_QTY_LENGTH] = RG_N_ ("length"),
  [RG_QTY_ROUGHNESS] = RG_N_ ("roughness"),
  [RG_QTY_TEMPERATURE] = RG_N_ ("temperature"),
  [RG_QTY_PRESSURE] = RG_N_ ("pressure"),
  [RG_QTY_DYN_VISCOSITY] = RG_N_ ("dynamic viscosity"),
  [RG_QTY_KIN_VISCOSITY] = RG_N_ ("kinematic viscosity"),
  [RG_QTY_DENSITY] = RG_N_ ("density"),
  [RG_QTY_VELOCITY] = RG_N_ ("velocity"),
  [RG_QTY_GRADIENT] = RG_N_ ("hydraulic gradient"),
  [RG_QTY_TIME] = RG_N_ ("time"),
  [RG_QTY_ROUGHNESS_RATE] = RG_N_ ("roughness growth rate"),
  [RG_QTY_SALINITY] = RG_N_ ("salinity"),
  [RG_QTY_POWER] = RG_N_ ("power"),
  [RG_QTY_ENERGY] = RG_N_ ("energy"),
};

/* The accepted units of a viscosity that may be dynamic or kinematic. */
static const char VISCOSITY_ACCEPTED[] =
  RG_N_ ("Pa·s, mPa·s, cP (dynamic) or m²/s, mm²/s, cSt (kinematic)");

/* ---- characters, without <ctype.h> (it follows the locale) ------------ */

static int
is_digit (char c)
{
  return c >= '0' && c <= '9';
}

static int
is_letter (char c)
{
  return (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z');
}

static int
is_space (char c)
{
  return c == ' ' || c == '\t' || c == '\n' || c == '\r' || c == '\v'
         || c == '\f';
}

static char
lower (char c)
{
  if (c >= 'A' && c <= 'Z')
    return (char) (c - 'A' + 'a');
  return c;
}

/* prefix is lower case */
static int
starts_nocase (const char *s, const char *prefix)
{
  for (; *prefix != '\0'; s++, prefix++)
    if (lower (*s) != *prefix)
      return 0;
  return 1;
}

static int
equal_nocase (const char *a, const char *b)
{
  for (; *a != '\0' && *b != '\0'; a++, b++)
    if (lower (*a) != lower (*b))
      return 0;
  return *a == *b;
}

/* Length of a Unicode space at s (no-break, thin, narrow no-break), or 0. */
static size_t
unicode_space (const char *s)
{
  if ((unsigned char) s[0] == 0xC2 && (unsigned char) s[1] == 0xA0)
    return 2; /* U+00A0 */
  if ((unsigned char) s[0] == 0xE2 && (unsigned char) s[1] == 0x80
      && ((unsigned char) s[2] == 0x89 || (unsigned char) s[2] == 0xAF))
    return 3; /* U+2009, U+202F */
  return 0;
}

static const char *
skip_spaces (const char *s)
{
  for (;;)
    {
      size_t n = unicode_space (s);
      if (n > 0)
        s += n;
      else if (is_space (*s))
        s++;
      else
        return s;
    }
}

/* ---- the unit text ---------------------------------------------------- */

static const struct {
  const char *utf8;
  const char *ascii;
} UNICODE_MAP[] = {
  { "\xC2\xB5", "u" },         /* µ MICRO SIGN */
  { "\xCE\xBC", "u" },         /* μ GREEK SMALL LETTER MU */
  { "\xC2\xB2", "2" },         /* ² */
  { "\xC2\xB3", "3" },         /* ³ */
  { "\xC2\xB7", "." },         /* · MIDDLE DOT */
  { "\xE2\x8B\x85", "." },     /* ⋅ DOT OPERATOR */
  { "\xE2\x88\x99", "." },     /* ∙ BULLET OPERATOR */
  { "\xC2\xB0", "deg" },       /* ° */
  { "\xC2\xBA", "deg" },       /* º, typed for ° on some keyboards */
  { "\xE2\x84\x83", "degC" },  /* ℃ */
  { "\xE2\x84\x89", "degF" },  /* ℉ */
  { "\xE2\x80\xB3", "\"" },    /* ″ DOUBLE PRIME */
  { "\xE2\x80\x9D", "\"" },    /* ” as typed by autocorrecting editors */
  { "\xE2\x80\xB2", "'" },     /* ′ PRIME */
  { "\xE2\x80\x99", "'" },     /* ’ */
  { "\xE2\x80\xB0", "permil" }, /* ‰ */
  { "*", "." },
};

enum { UNIT_MAX = 32 };

/* Normalise the unit text [s, s+len) into out (see the top comment).
 * Returns 0, or -1 when it does not fit (then no unit can match). */
static int
normalise_unit (const char *s, size_t len, char out[UNIT_MAX])
{
  char tmp[UNIT_MAX];
  size_t n = 0, m = 0;
  const char *end = s + len;

  while (s < end)
    {
      size_t sp = unicode_space (s);
      const char *rep = NULL;
      size_t used = 1;

      if (sp > 0)
        {
          rep = " ";
          used = sp;
        }
      else if (is_space (*s))
        rep = " ";
      else
        for (size_t k = 0; k < sizeof UNICODE_MAP / sizeof UNICODE_MAP[0]; k++)
          {
            size_t ul = strlen (UNICODE_MAP[k].utf8);
            if ((size_t) (end - s) >= ul
                && memcmp (s, UNICODE_MAP[k].utf8, ul) == 0)
              {
                rep = UNICODE_MAP[k].ascii;
                used = ul;
                break;
              }
          }
      if (rep != NULL)
        {
          size_t rl = strlen (rep);
          if (n + rl >= UNIT_MAX)
            return -1;
          /* tmp is a byte buffer, not a string: out is terminated below */
          memcpy (tmp + n, rep, rl); /* NOLINT(bugprone-not-null-terminated-result) */
          n += rl;
        }
      else
        {
          if (n + 1 >= UNIT_MAX)
            return -1;
          tmp[n++] = *s;
        }
      s += used;
    }

  for (size_t i = 0; i < n; i++)
    {
      if (tmp[i] == ' ')
        {
          size_t j = i;
          while (j < n && tmp[j] == ' ')
            j++;
          if (m > 0 && j < n && is_letter (out[m - 1]) && is_letter (tmp[j]))
            out[m++] = '.';
          i = j - 1;
          continue;
        }
      out[m++] = tmp[i];
    }
  out[m] = '\0';

  /* "in." and "ft." as abbreviations; two apostrophes for inches */
  if (m > 1 && out[m - 1] == '.')
    out[--m] = '\0';
  if (strcmp (out, "''") == 0)
    strcpy (out, "\"");
  return 0;
}

typedef enum {
  LOOKUP_FOUND,
  LOOKUP_OTHER_KIND,
  LOOKUP_GAUGE,
  LOOKUP_UNKNOWN,
} Lookup;

static int
in_list (RgQuantity q, const RgQuantity *qs, int nq)
{
  for (int i = 0; i < nq; i++)
    if (qs[i] == q)
      return 1;
  return 0;
}

/* Find the normalised unit among the quantities qs; *def is the match, or
 * *other the quantity it belongs to instead. */
static Lookup
lookup (const RgQuantity *qs, int nq, const char *norm, const UnitDef **def,
        RgQuantity *other)
{
  const UnitDef *hit = NULL;
  int ambiguous = 0;

  for (int i = 0; i < N_UNITS; i++)
    if (in_list (UNITS[i].q, qs, nq) && strcmp (UNITS[i].spelling, norm) == 0)
      {
        *def = &UNITS[i];
        return LOOKUP_FOUND;
      }
  for (int i = 0; i < N_UNITS; i++)
    if (strcmp (UNITS[i].spelling, norm) == 0)
      {
        *other = UNITS[i].q;
        return LOOKUP_OTHER_KIND;
      }
  /* ignoring case, when all matches for the quantity mean the same */
  for (int i = 0; i < N_UNITS; i++)
    if (in_list (UNITS[i].q, qs, nq) && equal_nocase (UNITS[i].spelling, norm))
      {
        if (hit != NULL
            && (hit->q != UNITS[i].q || hit->factor != UNITS[i].factor
                || hit->offset != UNITS[i].offset))
          ambiguous = 1;
        if (hit == NULL)
          hit = &UNITS[i];
      }
  if (hit != NULL && !ambiguous)
    {
      *def = hit;
      return LOOKUP_FOUND;
    }
  for (size_t i = 0; i < sizeof GAUGE / sizeof GAUGE[0]; i++)
    if (equal_nocase (GAUGE[i], norm))
      {
        *other = RG_QTY_PRESSURE;
        return LOOKUP_GAUGE;
      }
  if (hit == NULL)
    for (int i = 0; i < N_UNITS; i++)
      if (equal_nocase (UNITS[i].spelling, norm))
        {
          *other = UNITS[i].q;
          return LOOKUP_OTHER_KIND;
        }
  return LOOKUP_UNKNOWN;
}

/* ---- the number ------------------------------------------------------- */

typedef enum {
  NUM_OK,
  NUM_EMPTY,
  NUM_NOT_NUMBER,
  NUM_COMMA,
  NUM_NONFINITE,
  NUM_OVERFLOW,
  NUM_UNDERFLOW,
  NUM_DIV_ZERO,
  NUM_NO_LOCALE,
} NumResult;

enum { NUMBER_MAX = 80 };

/* strtod of a checked ASCII decimal, in the C locale whatever the process
 * locale is. */
static NumResult
c_strtod (const char *buf, double *x)
{
  locale_t c = newlocale (LC_NUMERIC_MASK, "C", (locale_t) 0);
  locale_t old;
  double v;
  int e;

  if (c == (locale_t) 0)
    return NUM_NO_LOCALE;
  old = uselocale (c);
  errno = 0;
  v = strtod (buf, NULL);
  e = errno;
  uselocale (old);
  freelocale (c);
  if (e == ERANGE || !isfinite (v))
    {
      if (!isfinite (v) || fabs (v) > 1.0)
        return NUM_OVERFLOW;
      return NUM_UNDERFLOW;
    }
  *x = v;
  return NUM_OK;
}

static size_t
count_digits (const char *s)
{
  size_t n = 0;
  while (is_digit (s[n]))
    n++;
  return n;
}

static NumResult
convert_span (const char *s, size_t len, double *x)
{
  char buf[NUMBER_MAX];

  if (len >= sizeof buf)
    return NUM_NOT_NUMBER;
  memcpy (buf, s, len);
  buf[len] = '\0';
  return c_strtod (buf, x);
}

/* Read [sign] number from s; *rest points after it. */
static NumResult
parse_number (const char *s, double *value, const char **rest)
{
  const char *p = skip_spaces (s);
  int negative = 0;
  size_t nd;

  if (*p == '\0')
    return NUM_EMPTY;
  if (*p == '+' || *p == '-')
    {
      negative = (*p == '-');
      p++;
    }
  if (starts_nocase (p, "nan") || starts_nocase (p, "inf"))
    return NUM_NONFINITE;

  nd = count_digits (p);

  /* simple fraction "3/4" or mixed number "1 1/2", "1-1/2" */
  if (nd > 0)
    {
      const char *q = p + nd;
      const char *whole = NULL, *num, *den;
      size_t nw = 0, nn, nden;

      if (*q == '/' && is_digit (q[1]))
        num = p, nn = nd;
      else
        {
          const char *t = q;
          if (*t == '-')
            t++;
          else
            while (is_space (*t))
              t++;
          nn = count_digits (t);
          if (t > q && nn > 0 && t[nn] == '/' && is_digit (t[nn + 1]))
            whole = p, nw = nd, num = t;
          else
            num = NULL;
        }
      if (num != NULL)
        {
          double w = 0.0, a, b;
          NumResult r;

          den = num + nn + 1;
          nden = count_digits (den);
          if ((whole != NULL && (r = convert_span (whole, nw, &w)) != NUM_OK)
              || (r = convert_span (num, nn, &a)) != NUM_OK
              || (r = convert_span (den, nden, &b)) != NUM_OK)
            return r;
          if (b == 0.0)
            return NUM_DIV_ZERO;
          if (den[nden] == '.' || den[nden] == ',')
            return NUM_NOT_NUMBER;
          *value = negative ? -(w + a / b) : w + a / b;
          *rest = den + nden;
          return NUM_OK;
        }
    }

  /* decimal: digits [. digits] | . digits, then [e [sign] digits] */
  {
    const char *q = p + nd;
    size_t nf = 0;
    NumResult r;
    double x;

    if (*q == '.')
      {
        nf = count_digits (q + 1);
        q += 1 + nf;
      }
    if (nd + nf == 0)
      return NUM_NOT_NUMBER;
    if ((*q == 'e' || *q == 'E')
        && (is_digit (q[1])
            || ((q[1] == '+' || q[1] == '-') && is_digit (q[2]))))
      {
        q += (q[1] == '+' || q[1] == '-') ? 2 : 1;
        q += count_digits (q);
      }
    if (*q == ',' && is_digit (q[1]))
      return NUM_COMMA;
    if (*q == '/' || *q == '.' || is_digit (*q))
      return NUM_NOT_NUMBER;
    r = convert_span (p, (size_t) (q - p), &x);
    if (r != NUM_OK)
      return r;
    *value = negative ? -x : x;
    *rest = q;
    return NUM_OK;
  }
}

/* ---- messages --------------------------------------------------------- */

enum { ECHO_MAX = 48 };

/* Copy the trimmed text for quoting in a message: at most ECHO_MAX bytes,
 * cut on a UTF-8 boundary, control characters shown as '?'. */
static void
echo_text (const char *s, size_t len, char out[ECHO_MAX + 4])
{
  size_t n = 0;
  const char *end = s + len;

  s = skip_spaces (s);
  while (end > s && is_space (end[-1]))
    end--;
  len = (size_t) (end - s);
  if (len > ECHO_MAX)
    {
      len = ECHO_MAX;
      while (len > 0 && ((unsigned char) s[len] & 0xC0) == 0x80)
        len--;
    }
  for (size_t i = 0; i < len; i++)
    {
      char c = s[i];
      if ((unsigned char) c < 0x20 || c == 0x7F)
        c = '?';
      out[n++] = c;
    }
  if ((size_t) (end - s) > len)
    {
      memcpy (out + n, "\xE2\x80\xA6", 3); /* … */
      n += 3;
    }
  out[n] = '\0';
}

/* A caller's name for the value ("--flow"), or NULL when it gave none:
 * every message below comes in two whole sentences, with the name and
 * without it. */
static const char *
name_or_null (const char *what)
{
  return (what != NULL && what[0] != '\0') ? what : NULL;
}

/* Parse errors carry RG_SUBJECT_VALUE: the text the caller passed. */
#define VALUE_SUBJECT RG_SUBJECT_BIT (RG_SUBJECT_VALUE)

static RgStatus
number_error (NumResult r, const char *what, const char *text,
              const char *accepted, RgError *err)
{
  char t[ECHO_MAX + 4];
  const char *w = name_or_null (what);

  echo_text (text, strlen (text), t);
  accepted = rg_gettext (accepted);
  switch (r)
    {
    case NUM_EMPTY:
      if (w != NULL)
        return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                                "%s is empty: give a number followed by a "
                                "unit (%s).", w, accepted);
      return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                              "The value is empty: give a number followed by "
                              "a unit (%s).", accepted);
    case NUM_COMMA:
      if (w != NULL)
        return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                                "'%s' for %s contains a comma: write decimals "
                                "with a point (2.5) and no thousands "
                                "separator.", t, w);
      return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                              "'%s' contains a comma: write decimals with a "
                              "point (2.5) and no thousands separator.", t);
    case NUM_NONFINITE:
      if (w != NULL)
        return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                                "'%s' for %s is not a finite number.", t, w);
      return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                              "'%s' is not a finite number.", t);
    case NUM_OVERFLOW:
      if (w != NULL)
        return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                                "'%s' for %s is too large a number.", t, w);
      return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                              "'%s' is too large a number.", t);
    case NUM_UNDERFLOW:
      if (w != NULL)
        return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                                "'%s' for %s is too small a number to "
                                "represent (write 0 for zero).", t, w);
      return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                              "'%s' is too small a number to represent "
                              "(write 0 for zero).", t);
    case NUM_DIV_ZERO:
      if (w != NULL)
        return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                                "'%s' for %s divides by zero.", t, w);
      return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                              "'%s' divides by zero.", t);
    case NUM_NO_LOCALE:
      if (w != NULL)
        return rg_error_set_on (err, RG_ERR_NUMERIC, VALUE_SUBJECT,
                                "'%s' for %s could not be read: the C locale "
                                "is not available.", t, w);
      return rg_error_set_on (err, RG_ERR_NUMERIC, VALUE_SUBJECT,
                              "'%s' could not be read: the C locale is not "
                              "available.", t);
    case NUM_NOT_NUMBER:
    case NUM_OK:
    default:
      if (w != NULL)
        return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                                "'%s' for %s is not a number: give a number "
                                "followed by a unit (%s).", t, w, accepted);
      return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                              "'%s' is not a number: give a number followed "
                              "by a unit (%s).", t, accepted);
    }
}

/* The unit of `t` belongs to the quantity `other`, not to any of those the
 * caller accepts. */
static RgStatus
other_kind_error (const char *t, const char *w, RgQuantity other,
                  const char *accepted, RgError *err)
{
  /* TRANSLATORS: the second (or third) %s is the name of a quantity, e.g.
   * "length"; the last %s lists the units to use instead. */
  if (w != NULL)
    return rg_error_set_on (err, RG_ERR_UNIT, VALUE_SUBJECT,
                            "'%s' for %s has a unit of another quantity "
                            "(%s): use %s.", t, w, rg_gettext (QTY_NAME[other]),
                            accepted);
  return rg_error_set_on (err, RG_ERR_UNIT, VALUE_SUBJECT,
                          "'%s' has a unit of another quantity (%s): use %s.",
                          t, rg_gettext (QTY_NAME[other]), accepted);
}

static int
valid_quantity (RgQuantity q)
{
  return (int) q >= 0 && q < RG_QTY_N;
}

/* Parse text as a value of one of the quantities qs (a bare number is
 * qs[0] in SI); *found is the quantity of the unit given. */
static RgStatus
parse_as (const RgQuantity *qs, int nq, const char *what, const char *text,
          const char *accepted_msgid, double *si, RgQuantity *found,
          RgError *err)
{
  double x = 0.0, v;
  const char *rest = NULL;
  const char *u, *uend;
  const char *w = name_or_null (what);
  const char *accepted;
  char norm[UNIT_MAX];
  char t[ECHO_MAX + 4];
  NumResult r;
  const UnitDef *def = NULL;
  RgQuantity q = qs[0], other = qs[0];
  double factor = 1.0, offset = 0.0;

  if (text == NULL)
    text = "";
  r = parse_number (text, &x, &rest);
  if (r != NUM_OK)
    return number_error (r, what, text, accepted_msgid, err);

  accepted = rg_gettext (accepted_msgid);
  echo_text (text, strlen (text), t);
  u = skip_spaces (rest);
  uend = u + strlen (u);
  while (uend > u && is_space (uend[-1]))
    uend--;
  /* no unit starts so: "2 100", "1-2", "1.2.3" are malformed numbers */
  if (*u != '\0' && (is_digit (*u) || strchr (".,+-/", *u) != NULL))
    return number_error (NUM_NOT_NUMBER, what, text, accepted_msgid, err);
  if (uend > u)
    {
      char ut[ECHO_MAX + 4];
      Lookup l = LOOKUP_UNKNOWN;

      if (normalise_unit (u, (size_t) (uend - u), norm) == 0)
        l = lookup (qs, nq, norm, &def, &other);
      switch (l)
        {
        case LOOKUP_FOUND:
          q = def->q;
          factor = def->factor;
          offset = def->offset;
          break;
        case LOOKUP_OTHER_KIND:
          return other_kind_error (t, w, other, accepted, err);
        case LOOKUP_GAUGE:
          if (!in_list (RG_QTY_PRESSURE, qs, nq))
            return other_kind_error (t, w, RG_QTY_PRESSURE, accepted, err);
          if (w != NULL)
            return rg_error_set_on (err, RG_ERR_UNIT, VALUE_SUBJECT,
                                    "'%s' for %s is a gauge pressure, but "
                                    "pressures here are absolute: add the "
                                    "atmospheric pressure (101.325 kPa at "
                                    "sea level) and use %s.", t, w, accepted);
          return rg_error_set_on (err, RG_ERR_UNIT, VALUE_SUBJECT,
                                  "'%s' is a gauge pressure, but pressures "
                                  "here are absolute: add the atmospheric "
                                  "pressure (101.325 kPa at sea level) and "
                                  "use %s.", t, accepted);
        case LOOKUP_UNKNOWN:
        default:
          echo_text (u, (size_t) (uend - u), ut);
          if (w != NULL)
            return rg_error_set_on (err, RG_ERR_UNIT, VALUE_SUBJECT,
                                    "'%s' for %s has an unknown unit '%s': "
                                    "use %s.", t, w, ut, accepted);
          return rg_error_set_on (err, RG_ERR_UNIT, VALUE_SUBJECT,
                                  "'%s' has an unknown unit '%s': use %s.", t,
                                  ut, accepted);
        }
    }

  v = (x + offset) * factor;
  if (!isfinite (v))
    {
      if (w != NULL)
        return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                                "'%s' for %s is too large.", t, w);
      return rg_error_set_on (err, RG_ERR_PARSE, VALUE_SUBJECT,
                              "'%s' is too large.", t);
    }
  if (q == RG_QTY_TEMPERATURE && v < 0.0)
    {
      if (w != NULL)
        return rg_error_set_on (err, RG_ERR_DOMAIN, VALUE_SUBJECT,
                                "'%s' for %s is below absolute zero (0 K, "
                                "−273.15 °C, −459.67 °F).", t, w);
      return rg_error_set_on (err, RG_ERR_DOMAIN, VALUE_SUBJECT,
                              "'%s' is below absolute zero (0 K, −273.15 °C, "
                              "−459.67 °F).", t);
    }
  *si = v;
  if (found != NULL)
    *found = q;
  return RG_OK;
}

/* ---- public ----------------------------------------------------------- */

/* A quantity that is not one of RgQuantity is a misuse of the API: no
 * input a user can change is at fault (subjects 0). */
static RgStatus
unknown_quantity (RgQuantity q, RgError *err)
{
  return rg_error_set_on (err, RG_ERR_DOMAIN, 0,
                          "Unknown kind of quantity %d.", (int) q);
}

RgStatus
rg_units_parse (RgQuantity q, const char *what, const char *text, double *si,
                RgError *err)
{
  if (!valid_quantity (q))
    return unknown_quantity (q, err);
  return parse_as (&q, 1, what, text, ACCEPTED[q], si, NULL, err);
}

RgStatus
rg_units_parse_viscosity (const char *what, const char *text, double *si,
                          int *is_kinematic, RgError *err)
{
  static const RgQuantity qs[2] = { RG_QTY_DYN_VISCOSITY,
                                    RG_QTY_KIN_VISCOSITY };
  RgQuantity found = RG_QTY_DYN_VISCOSITY;
  double v = 0.0; /* for clang-analyzer: rg_error_set never returns RG_OK */
  RgStatus st = parse_as (qs, 2, what, text, VISCOSITY_ACCEPTED, &v, &found,
                          err);

  if (st != RG_OK)
    return st;
  *si = v;
  if (is_kinematic != NULL)
    *is_kinematic = (found == RG_QTY_KIN_VISCOSITY);
  return RG_OK;
}

/* The unit definition named by `unit` for q: NULL or blank is SI (*def
 * NULL); returns the lookup result. */
static Lookup
find_unit (RgQuantity q, const char *unit, const UnitDef **def,
           RgQuantity *other, char norm[UNIT_MAX])
{
  const char *u, *uend;

  *def = NULL;
  norm[0] = '\0';
  if (unit == NULL)
    return LOOKUP_FOUND;
  u = skip_spaces (unit);
  uend = u + strlen (u);
  while (uend > u && is_space (uend[-1]))
    uend--;
  if (uend == u)
    return LOOKUP_FOUND;
  if (normalise_unit (u, (size_t) (uend - u), norm) != 0)
    return LOOKUP_UNKNOWN;
  return lookup (&q, 1, norm, def, other);
}

/* The unit named for conversion: NULL or blank is SI. */
static RgStatus
conversion_unit (RgQuantity q, const char *unit, double *factor,
                 double *offset, RgError *err)
{
  char norm[UNIT_MAX];
  char ut[ECHO_MAX + 4];
  const UnitDef *def = NULL;
  RgQuantity other = q;
  Lookup l;

  if (!valid_quantity (q))
    return unknown_quantity (q, err);
  *factor = 1.0;
  *offset = 0.0;
  l = find_unit (q, unit, &def, &other, norm);
  if (l == LOOKUP_FOUND && def == NULL)
    return RG_OK;
  echo_text (unit, strlen (unit), ut);
  switch (l)
    {
    case LOOKUP_FOUND:
      *factor = def->factor;
      *offset = def->offset;
      return RG_OK;
    case LOOKUP_OTHER_KIND:
      /* TRANSLATORS: the second %s is the name of a quantity, e.g.
       * "length"; the last lists the units to use instead. */
      return rg_error_set_on (err, RG_ERR_UNIT, VALUE_SUBJECT,
                              "The unit '%s' measures another quantity (%s): "
                              "use %s.", ut, rg_gettext (QTY_NAME[other]),
                              rg_gettext (ACCEPTED[q]));
    case LOOKUP_GAUGE:
      return rg_error_set_on (err, RG_ERR_UNIT, VALUE_SUBJECT,
                              "The unit '%s' is a gauge pressure, but "
                              "pressures here are absolute: use %s.", ut,
                              rg_gettext (ACCEPTED[q]));
    case LOOKUP_UNKNOWN:
    default:
      /* TRANSLATORS: the second %s is the name of a quantity, e.g.
       * "length". */
      return rg_error_set_on (err, RG_ERR_UNIT, VALUE_SUBJECT,
                              "The unit '%s' is unknown for this quantity "
                              "(%s): use %s.", ut, rg_gettext (QTY_NAME[q]),
                              rg_gettext (ACCEPTED[q]));
    }
}

RgStatus
rg_units_to_si (RgQuantity q, double value, const char *unit, double *si,
                RgError *err)
{
  double factor = 1.0, offset = 0.0, v; /* for clang-analyzer: rg_error_set never returns RG_OK */
  RgStatus st = conversion_unit (q, unit, &factor, &offset, err);

  if (st != RG_OK)
    return st;
  if (unit == NULL || *skip_spaces (unit) == '\0')
    unit = SI_SYMBOL[q];
  if (!isfinite (value))
    /* TRANSLATORS: %s is the name of a quantity, e.g. "length". */
    return rg_error_set_on (err, RG_ERR_DOMAIN, VALUE_SUBJECT,
                            "The value to convert (%s) is not a finite "
                            "number.", rg_gettext (QTY_NAME[q]));
  v = (value + offset) * factor;
  if (!isfinite (v))
    return rg_error_set_on (err, RG_ERR_DOMAIN, VALUE_SUBJECT,
                            "The value %g %s is too large to convert.",
                            value, unit);
  if (q == RG_QTY_TEMPERATURE && v < 0.0)
    return rg_error_set_on (err, RG_ERR_DOMAIN, VALUE_SUBJECT,
                            "The temperature %g %s is below absolute zero.",
                            value, unit);
  *si = v;
  return RG_OK;
}

RgStatus
rg_units_from_si (RgQuantity q, double si, const char *unit, double *value,
                  RgError *err)
{
  double factor = 1.0, offset = 0.0, v; /* for clang-analyzer: rg_error_set never returns RG_OK */
  RgStatus st = conversion_unit (q, unit, &factor, &offset, err);

  if (st != RG_OK)
    return st;
  if (!isfinite (si))
    /* TRANSLATORS: %s is the name of a quantity, e.g. "length". */
    return rg_error_set_on (err, RG_ERR_DOMAIN, VALUE_SUBJECT,
                            "The value to convert (%s) is not a finite "
                            "number.", rg_gettext (QTY_NAME[q]));
  if (q == RG_QTY_TEMPERATURE && si < 0.0)
    return rg_error_set_on (err, RG_ERR_DOMAIN, VALUE_SUBJECT,
                            "The temperature %g K is below absolute zero.",
                            si);
  v = si / factor - offset;
  if (!isfinite (v))
    return rg_error_set_on (err, RG_ERR_DOMAIN, VALUE_SUBJECT,
                            "The value %g %s is too large to convert.", si,
                            SI_SYMBOL[q]);
  *value = v;
  return RG_OK;
}

RgStatus
rg_units_conversion (RgQuantity q, const char *unit, double *factor,
                     double *offset, RgError *err)
{
  return conversion_unit (q, unit, factor, offset, err);
}

const char *
rg_units_si_symbol (RgQuantity q)
{
  return valid_quantity (q) ? SI_SYMBOL[q] : "";
}

const char *
rg_units_accepted (RgQuantity q)
{
  return valid_quantity (q) ? rg_gettext (ACCEPTED[q]) : "";
}

enum { N_CHOICES = sizeof CHOICES[0] / sizeof CHOICES[0][0] };

const char *
rg_units_choice (RgQuantity q, int i)
{
  if (!valid_quantity (q) || i < 0 || i >= (int) N_CHOICES)
    return NULL;
  return CHOICES[q][i];
}

/* ---- values written into sentences ------------------------------------ */

/* The display spelling of a unit found as `def` from the normalised text
 * `norm`: the offered choice spelled the same ("um" is "µm"), else the
 * first offered choice of the same size ("USgpm" is "gpm", "psia" "psi"),
 * else NULL. */
static const char *
display_symbol (RgQuantity q, const UnitDef *def, const char *norm)
{
  char cn[UNIT_MAX];

  for (int i = 0; i < (int) N_CHOICES && CHOICES[q][i] != NULL; i++)
    if (normalise_unit (CHOICES[q][i], strlen (CHOICES[q][i]), cn) == 0
        && strcmp (cn, norm) == 0)
      return CHOICES[q][i];
  for (int i = 0; i < (int) N_CHOICES && CHOICES[q][i] != NULL; i++)
    {
      const UnitDef *c = NULL;
      RgQuantity other = q;

      if (normalise_unit (CHOICES[q][i], strlen (CHOICES[q][i]), cn) == 0
          && lookup (&q, 1, cn, &c, &other) == LOOKUP_FOUND
          && c->factor == def->factor && c->offset == def->offset)
        return CHOICES[q][i];
    }
  return NULL;
}

const char *
rg_units_display_spelling (RgQuantity q, const char *unit)
{
  char norm[UNIT_MAX];
  const UnitDef *def = NULL;
  RgQuantity other = q;

  if (!valid_quantity (q) || unit == NULL
      || find_unit (q, unit, &def, &other, norm) != LOOKUP_FOUND || def == NULL)
    return NULL;
  return display_symbol (q, def, norm);
}

/* Strips the zeros that end the decimals of a number written with
 * "%.*f" (and the decimal separator itself when nothing is left after it);
 * the separator is whatever is not a digit or a sign. */
static void
strip_zeros (char *s, size_t end)
{
  size_t sep = end;

  for (size_t i = 0; i < end; i++)
    if (!is_digit (s[i]) && s[i] != '-' && s[i] != '+')
      {
        sep = i;
        break;
      }
  if (sep == end)
    return;
  while (end > sep + 1 && s[end - 1] == '0')
    end--;
  if (end == sep + 1)
    end = sep;
  s[end] = '\0';
}

/* x with 4 significant figures: fixed notation from 1e-3 to below 1e6
 * (trailing zeros dropped: "150", "1.2", "0.0454"), else "1.235e+07". */
static void
format_significant (double x, char *out, size_t len)
{
  double a = fabs (x);

  if (a == 0.0)
    {
      (void) snprintf (out, len, "0");
      return;
    }
  if (a >= 1.0e-3 && a < 1.0e6)
    {
      int e = (int) floor (log10 (a));
      int decimals = e >= 3 ? 0 : 3 - e;
      double r = x;

      /* 12345 → 12350: the digits past the fourth are rounded away too */
      if (e > 3)
        {
          const double p = pow (10.0, e - 3);
          r = round (x / p) * p;
        }
      (void) snprintf (out, len, "%.*f", decimals, r);
      if (decimals > 0)
        strip_zeros (out, strlen (out));
      return;
    }
  {
    char mant[32];
    char *e;

    (void) snprintf (mant, sizeof mant, "%.3e", x);
    e = strchr (mant, 'e');
    if (e == NULL)
      {
        (void) snprintf (out, len, "%s", mant);
        return;
      }
    {
      char exp_part[16];
      (void) snprintf (exp_part, sizeof exp_part, "%s", e);
      *e = '\0';
      strip_zeros (mant, strlen (mant));
      (void) snprintf (out, len, "%s%s", mant, exp_part);
    }
  }
}

/* Shared by rg_units_format and rg_units_format_difference. */
static const char *
format_value (const RgUnitChoice *choice, RgQuantity q, double si,
              int difference, char *buf, size_t len)
{
  const char *symbol;
  const UnitDef *def = NULL;
  double v = si;
  char num[48];

  if (buf == NULL || len == 0)
    return buf;
  if (!isfinite (si))
    {
      (void) snprintf (buf, len, "—");
      return buf;
    }
  if (!valid_quantity (q))
    {
      format_significant (si, num, sizeof num);
      (void) snprintf (buf, len, "%s", num);
      return buf;
    }
  symbol = SI_SYMBOL[q];
  if (choice != NULL && choice->unit[q] != NULL)
    {
      char norm[UNIT_MAX];
      RgQuantity other = q;

      if (find_unit (q, choice->unit[q], &def, &other, norm) == LOOKUP_FOUND
          && def != NULL)
        {
          const char *shown = display_symbol (q, def, norm);
          /* offset 0 except for °C and °F; a difference has none */
          const double x = difference ? si / def->factor
                                      : si / def->factor - def->offset;

          if (isfinite (x))
            {
              v = x;
              symbol = shown != NULL ? shown : choice->unit[q];
            }
        }
    }
  format_significant (v, num, sizeof num);
  (void) snprintf (buf, len, "%s %s", num, symbol);
  return buf;
}

const char *
rg_units_format (const RgUnitChoice *choice, RgQuantity q, double si,
                 char *buf, size_t len)
{
  return format_value (choice, q, si, 0, buf, len);
}

const char *
rg_units_format_difference (const RgUnitChoice *choice, RgQuantity q,
                            double si_delta, char *buf, size_t len)
{
  return format_value (choice, q, si_delta, 1, buf, len);
}
