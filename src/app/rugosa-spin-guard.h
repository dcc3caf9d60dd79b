/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <gtk/gtk.h>

G_BEGIN_DECLS

/* Make a spin button refuse text it cannot hold instead of guessing.
 * Left to itself GtkSpinButton reads "abc" as 0 and "-5" or "1e300" as the
 * nearest end of its range; guarded, it takes only a finite number inside
 * its range (a whole number when it shows no decimals), and otherwise puts
 * its last value back, adds the `error` style class and says why in its
 * tooltip until the next value it takes.  Call after setting the range and
 * the tooltip. */
void rugosa_spin_guard      (GtkSpinButton *spin);
/* Mark a guarded spin button as refused with `why` (a sentence), or clear
 * the mark with NULL (for checks the spin button cannot make alone). */
void rugosa_spin_guard_mark (GtkSpinButton *spin,
                             const char    *why);

G_END_DECLS
