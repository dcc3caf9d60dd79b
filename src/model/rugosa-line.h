/* SPDX-License-Identifier: GPL-3.0-or-later */
/* One line option of a project: fluid, material, pipe, geometry, fittings
 * and flows.  Every value is a GObject property in SI units; a change emits
 * notify only when the value really changed. */
#pragma once

#include <glib-object.h>

#include "core/fluid.h"

G_BEGIN_DECLS

#define RUGOSA_TYPE_LINE (rugosa_line_get_type ())
G_DECLARE_FINAL_TYPE (RugosaLine, rugosa_line, RUGOSA, LINE, GObject)

/* The GVariant type of the "fittings" property: an array of
 * (catalog id or "" for a plain K, plain K, count). */
#define RUGOSA_LINE_FITTINGS_TYPE "a(sdd)"
/* The GVariant type of a curve ("pump-curve"): an array of (flow m³/s,
 * head m), flows increasing. */
#define RUGOSA_LINE_CURVE_TYPE "a(dd)"

RugosaLine *rugosa_line_new (const char *name);
/* A deep copy (all properties and the kept unknown file fields). */
RugosaLine *rugosa_line_duplicate (RugosaLine *self);

const char *rugosa_line_get_name (RugosaLine *self);
void rugosa_line_set_name (RugosaLine *self, const char *name);
const char *rugosa_line_get_colour (RugosaLine *self);
int rugosa_line_get_fluid_kind (RugosaLine *self);
const char *rugosa_line_get_material_id (RugosaLine *self);
const char *rugosa_line_get_aging_class_id (RugosaLine *self);
const char *rugosa_line_get_pipe_designation (RugosaLine *self);
const char *rugosa_line_get_note (RugosaLine *self);
/* Any double property by name (e.g. "flow-design"); 0 for an unknown name. */
double rugosa_line_get_double (RugosaLine *self, const char *property);
void rugosa_line_set_double (RugosaLine *self, const char *property,
                             double value);
/* Floating-free: the returned variant is owned by the line. */
GVariant *rugosa_line_get_fittings (RugosaLine *self);
void rugosa_line_set_fittings (RugosaLine *self, GVariant *fittings);

/* True when every property of a and b is equal (unknown file fields are
 * not compared). */
gboolean rugosa_line_equal (RugosaLine *a, RugosaLine *b);

/* The fluid's state as the core takes it (kind, temperature, …). */
void rugosa_line_get_fluid_spec (RugosaLine *self, RgFluidSpec *spec);

/* Bumped on every real property change; the evaluation cache compares it. */
guint64 rugosa_line_get_revision (RugosaLine *self);

G_END_DECLS
