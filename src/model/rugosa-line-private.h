/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The RugosaLine struct, for the field table (offsets) and the evaluation
 * (which reads the fields directly). */
#pragma once

#include <cjson/cJSON.h>

#include "rugosa-line.h"

G_BEGIN_DECLS

struct _RugosaLine
{
  GObject parent_instance;

  /* owned; each field below is described by a row of the line field table
   * (rugosa-fields.c), which installs its property */
  char *name;
  char *colour;
  char *group;
  char *note;
  int fluid_kind;
  double temperature, pressure, salinity, density, viscosity;
  double oil_t1, oil_nu1, oil_t2, oil_nu2, oil_density_ref, oil_t_ref,
         oil_expansion;
  char *material_id;      /* NULL: custom roughness */
  double roughness;
  char *aging_class_id;   /* NULL: custom rate */
  double aging_rate;      /* m per year */
  char *pipe_designation; /* NULL: custom inner diameter */
  double inner_diameter, length, elevation;
  GVariant *fittings;     /* RUGOSA_LINE_FITTINGS_TYPE, never NULL */
  double flow_design, flow_minimum, flow_maximum;
  double cost_per_metre, cost_lump_sum; /* in the project's currency */
  GVariant *pump_curve;   /* RUGOSA_LINE_CURVE_TYPE, never NULL */

  /* owned, not fields */
  cJSON *extra;           /* unknown file fields, or NULL */
  guint64 revision;
};

G_END_DECLS
