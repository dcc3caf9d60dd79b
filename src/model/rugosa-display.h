/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Values leaving for the screen: SI to the display unit, as text that the
 * core's parser reads back (ASCII decimal point under any locale). */
#pragma once

#include <glib.h>

#include "core/units.h"

G_BEGIN_DECLS

/* "12.5 L/s"; the unit spelling is the stored one. NULL unit: SI. */
char       *rugosa_display_format        (RgQuantity  q,
                                          double      si,
                                          const char *unit);
/* The number alone, 4 significant figures. */
char       *rugosa_display_number        (RgQuantity  q,
                                          double      si,
                                          const char *unit);
/* "m³/s" for "m3/s": how a stored unit spelling reads on screen. */
const char *rugosa_display_unit_symbol   (const char *unit);
/* Four significant figures, no exponent between 1e-3 and 1e6. */
char       *rugosa_display_significant   (double      x,
                                          int         digits);

/* An amount of money: whole units from 100 up, spaced in thousands from
 * 10 000 by a narrow no-break space ("183 421"), two decimals below 100;
 * then the currency label, when there is one ("183 421 €"). */
char       *rugosa_display_money         (double      amount,
                                          const char *currency);

/* "2.8 × 10⁶", "7.7 × 10⁻⁵" outside 1e-3 … 1e5; plain digits inside. */
char       *rugosa_display_scientific    (double      x,
                                          int         digits);

/* The same for the screen: the number's decimal point becomes the decimal
 * separator of the current LC_NUMERIC locale ("1,861 m/s" under de_DE); no
 * digit grouping.  Files (JSON, CSV, the project) keep the ASCII forms
 * above. */
char       *rugosa_display_format_screen      (RgQuantity  q,
                                               double      si,
                                               const char *unit);
char       *rugosa_display_number_screen      (RgQuantity  q,
                                               double      si,
                                               const char *unit);
char       *rugosa_display_significant_screen (double      x,
                                               int         digits);
char       *rugosa_display_scientific_screen  (double      x,
                                               int         digits);
char       *rugosa_display_money_screen       (double      amount,
                                               const char *currency);
/* An ASCII display text (or any text) for the screen: each '.' between two
 * digits becomes the locale's decimal separator.  Takes `text`. */
char       *rugosa_display_localize           (char       *text);
/* Text typed on the screen, made readable for the core's parser (which
 * refuses commas on purpose): where the locale's decimal separator is not
 * '.', each separator between two digits (or before a digit at the start)
 * becomes '.'.  Only the decimal separator is converted; '.' is accepted as
 * it is, so "2.5 m" and "2,5 m" both read as 2.5 m under de_DE. */
char       *rugosa_display_delocalize         (const char *text);

G_END_DECLS
