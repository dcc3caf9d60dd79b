/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Units: parse value-with-unit text and convert to and from SI.
 * The core works in SI only; conversion happens where a value enters or
 * leaves.  Parsing never follows the process locale ("2.5" always). */
#pragma once

#include "status.h"

/* The year of the time units ("yr", "a") and of the rates per year: the
 * Julian year of 365.25 d (units.c says why). */
#define RG_UNITS_SECONDS_PER_YEAR 31557600.0

typedef enum {
  RG_QTY_FLOW = 0,         /* m3/s */
  RG_QTY_LENGTH,           /* m (lengths, diameters, elevation, head) */
  RG_QTY_ROUGHNESS,        /* m (as length, plus µm/um) */
  RG_QTY_TEMPERATURE,      /* K */
  RG_QTY_PRESSURE,         /* Pa */
  RG_QTY_DYN_VISCOSITY,    /* Pa·s */
  RG_QTY_KIN_VISCOSITY,    /* m2/s */
  RG_QTY_DENSITY,          /* kg/m3 */
  RG_QTY_VELOCITY,         /* m/s */
  RG_QTY_GRADIENT,         /* m per 100 m */
  RG_QTY_TIME,             /* s */
  RG_QTY_ROUGHNESS_RATE,   /* m/s (aging rate) */
  RG_QTY_SALINITY,         /* kg/kg */
  RG_QTY_POWER,            /* W (pump power) */
  RG_QTY_ENERGY,           /* J (pumping energy) */
  RG_QTY_N
} RgQuantity;

/* The unit a person reads each quantity in, for the values the core writes
 * into its sentences (RgError.units, RgWarnings.units): one spelling per
 * quantity as rg_units_to_si accepts ("gpm", "°F", "psi"); a NULL entry,
 * or a spelling the core does not know, is SI. */
typedef struct RgUnitChoice {
  const char *unit[RG_QTY_N];
} RgUnitChoice;

/* Writes `si` (a value of q in SI) converted to the unit `choice` gives for
 * q (SI when `choice` is NULL), with 4 significant figures and the unit's
 * display symbol: "150 gpm", "68 °F", "1.2 m³/s".  Numbers follow the
 * decimal point of LC_NUMERIC, as the rest of a sentence of the core does.
 * Never writes NaN or infinity: a non-finite value is written "—", and a
 * value too large for the chosen unit is written in SI.  Returns buf
 * (cut to len bytes); 48 bytes hold any value. */
const char *rg_units_format (const RgUnitChoice *choice, RgQuantity q,
                             double si, char *buf, size_t len);

/* As rg_units_format for a difference of two values of q (no offset: a
 * temperature difference of 1 K is written "1.8 °F"). */
const char *rg_units_format_difference (const RgUnitChoice *choice,
                                        RgQuantity q, double si_delta,
                                        char *buf, size_t len);

/* Parse "150 gpm", "2 in", "68 F", "1.5e-3" (a bare number is SI) into SI.
 * Errors name the quantity (`what`, e.g. "--flow"; NULL or "" when the
 * caller shows the sentence beside its own field) and list the accepted
 * units; they carry the subject RG_SUBJECT_VALUE, which a caller that knows
 * its own subject may replace. */
RgStatus rg_units_parse (RgQuantity q, const char *what, const char *text,
                         double *si, RgError *err);

/* A viscosity that may be dynamic or kinematic ("1 cP", "1 cSt", "1e-6 m2/s").
 * A bare number is taken as dynamic (Pa·s). */
RgStatus rg_units_parse_viscosity (const char *what, const char *text,
                                   double *si, int *is_kinematic,
                                   RgError *err);

/* value [unit] -> SI and back; `unit` is one of the spellings parse accepts. */
RgStatus rg_units_to_si (RgQuantity q, double value, const char *unit,
                         double *si, RgError *err);
RgStatus rg_units_from_si (RgQuantity q, double si, const char *unit,
                           double *value, RgError *err);
/* The conversion of `unit` as those two use it: value = si / factor −
 * offset (NULL or blank is SI: 1 and 0).  For callers that convert many
 * values to one unit and must give the same bits as rg_units_from_si. */
RgStatus rg_units_conversion (RgQuantity q, const char *unit, double *factor,
                              double *offset, RgError *err);

/* Canonical display symbol of the SI unit of q ("m³/s", "K", …). */
const char *rg_units_si_symbol (RgQuantity q);
/* Comma-separated list of the accepted unit spellings for messages,
 * translated (rg_gettext). */
const char *rg_units_accepted (RgQuantity q);

/* The i-th unit offered for q, counting from 0, in its display spelling
 * ("m³/h", "°C"), for unit pickers and tables; NULL past the end or for an
 * unknown q.  Every choice is accepted by rg_units_to_si/_from_si. */
const char *rg_units_choice (RgQuantity q, int i);

/* How `unit`, a spelling rg_units_to_si accepts for q, is written for a
 * reader: the offered choice spelled the same once normalised ("m3/d" is
 * "m³/d", "um" is "µm"), else the first offered choice of the same size
 * ("USgpm" is "gpm", "bara" is "bar"); NULL when `unit` is no unit of q or
 * no offered choice has its size. */
const char *rg_units_display_spelling (RgQuantity q, const char *unit);

/* Pressures are absolute everywhere in Rugosa: "psi" and "psia" both mean
 * pound-force per square inch absolute, "bar" is absolute, and absolute may
 * be said outright ("bara", "psi(a)", "kPa(a)", "MPa a"); gauge spellings
 * ("psig", "barg", "kPag", "bar(g)", …) are refused with a sentence that
 * says to add the atmospheric pressure.  They are refused rather than
 * converted with an assumed atmosphere because the atmosphere of the site
 * is not known here: it is 101.325 kPa at sea level but about 84 kPa at
 * 1500 m, and an air line's density would shift with the guess unseen.
 * A difference of pressures (a pressure drop) has no gauge or absolute
 * reading: "psi" and "kPa" serve it as they are. */
