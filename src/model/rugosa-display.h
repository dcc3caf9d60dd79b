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

/* "2.8 × 10⁶", "7.7 × 10⁻⁵" outside 1e-3 … 1e5; plain digits inside. */
char       *rugosa_display_scientific    (double      x,
                                          int         digits);

G_END_DECLS
