/* SPDX-License-Identifier: GPL-3.0-or-later */
#pragma once

#include <gtk/gtk.h>

G_BEGIN_DECLS

#define RUGOSA_TYPE_SIZE_PICKER (rugosa_size_picker_get_type ())
G_DECLARE_FINAL_TYPE (RugosaSizePicker, rugosa_size_picker, RUGOSA, SIZE_PICKER, GtkWidget)

/* A catalog pipe size, chosen from the catalogs that fit a material.
 *
 * A button names the size chosen (`designation`, NULL for a custom bore);
 * its popover lists "custom bore" and the sizes of every catalog made of
 * `material-id` (all catalogs when none fits, or with `show-all`), ordered
 * by size then wall, and a search by any part of a designation or catalog
 * name ("140 SDR 11", "C900").  Inner diameters are shown in
 * `diameter-unit`.  Choosing a row emits `chosen` (the designation, or
 * NULL for a custom bore); the picker does not change its own
 * `designation`: the owner sets it from the document. */

GtkWidget  *rugosa_size_picker_new               (void);
const char *rugosa_size_picker_get_designation   (RugosaSizePicker *self);
void        rugosa_size_picker_set_designation   (RugosaSizePicker *self,
                                                  const char       *designation);
const char *rugosa_size_picker_get_material_id   (RugosaSizePicker *self);
void        rugosa_size_picker_set_material_id   (RugosaSizePicker *self,
                                                  const char       *material_id);
gboolean    rugosa_size_picker_get_show_all      (RugosaSizePicker *self);
void        rugosa_size_picker_set_show_all      (RugosaSizePicker *self,
                                                  gboolean          show_all);
void        rugosa_size_picker_set_diameter_unit (RugosaSizePicker *self,
                                                  const char       *unit);
/* The search text, as if typed (the list follows at once). */
void        rugosa_size_picker_set_search        (RugosaSizePicker *self,
                                                  const char       *text);
/* What the list shows now: its rows (the first is "custom bore"), and
 * the designation of row `position` (NULL for custom). */
guint       rugosa_size_picker_get_n_rows        (RugosaSizePicker *self);
const char *rugosa_size_picker_get_row           (RugosaSizePicker *self,
                                                  guint             position);
/* Choose row `position`, as a click on it does. */
void        rugosa_size_picker_activate_row      (RugosaSizePicker *self,
                                                  guint             position);

G_END_DECLS
