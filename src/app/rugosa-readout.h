/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Human-readable readouts of model results in the project's display
 * units (its settings: rugosa_settings_get_unit). */
#pragma once

#include <gio/gio.h>

#include "model/rugosa-project.h"

G_BEGIN_DECLS

/* Several lines of text: the full readout of the design point of `line`
 * at the settings' service age (used by the chart tooltip). */
char *rugosa_readout_line_full   (RugosaProject *project,
                                  RugosaLine    *line);
/* "1.42 m/s": an SI value of `dq` in the project's unit for it, for the
 * screen (the locale's decimal separator). */
char *rugosa_readout_format      (RugosaProject        *project,
                                  RugosaDisplayQuantity dq,
                                  double                si);
/* The model's results of `line`, or NULL when the line is no longer part
 * of the project (a row or panel may still hold it while a load or an
 * undo replaces the lines). */
const RugosaLineResults *rugosa_readout_results (RugosaProject *project,
                                                 RugosaLine    *line);
/* "laminar", "transitional", "turbulent" for people. */
const char *rugosa_readout_regime (RgRegime regime);
/* "smooth", "transitionally rough", "fully rough", "—". */
const char *rugosa_readout_zone   (RgRoughnessZone zone);
/* Every warning of the line (fluid, velocity, gradient, ranges) as one text
 * with one warning a line; NULL when there is none. */
char *rugosa_readout_warnings    (RugosaProject *project,
                                  RugosaLine    *line);
/* The Hazen–Williams C equivalent of a water line's design point ("138"),
 * and the sentences on where it stands against the formula's usual range
 * (one a line); NULL for a point without one. */
char *rugosa_readout_hazen_williams       (const RugosaOperatingPoint *p);
char *rugosa_readout_hazen_williams_notes (const RugosaOperatingPoint *p);
/* "+12.3 %" change of the total head loss since new. */
char *rugosa_readout_change      (double ratio_to_new);

G_END_DECLS
