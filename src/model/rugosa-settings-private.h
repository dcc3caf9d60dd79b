/* SPDX-License-Identifier: GPL-3.0-or-later */
/* The RugosaSettings struct, for the field table (offsets) and the
 * evaluation. */
#pragma once

#include <cjson/cJSON.h>

#include "core/units.h"
#include "rugosa-settings.h"

G_BEGIN_DECLS

struct _RugosaSettings
{
  GObject parent_instance;

  /* owned; each field below is a row of the settings field table */
  char *project_title, *project_client, *project_location, *project_author;
  char *project_revision, *project_date, *project_note;
  int unit_system;
  GVariant *unit_overrides; /* a{ss}, never NULL */
  int friction_model;
  double re_laminar_max, re_turbulent_min;
  double chart_re_min, chart_re_max, chart_f_min, chart_f_max;
  double service_age;
  double velocity_limit, gradient_limit;
  double pump_efficiency;   /* per cent */
  double hours_design, hours_minimum, hours_maximum; /* hours per year */
  char *currency;
  double energy_price;      /* currency per kWh */
  double service_life;      /* years */
  double discount_rate;     /* per cent per year */
  double velocity_minimum;        /* 0: none */

  /* owned, not fields */
  cJSON *extra;
  guint64 revision;
  RgUnitChoice unit_choice;       /* cache of rugosa_settings_get_unit_choice */
  guint64 unit_choice_revision;   /* revision + 1 it was made for; 0: none */
  /* cache of rugosa_settings_get_unit, each NULL until asked (an entry
   * may point into unit_overrides, which a new revision replaces) */
  const char *unit_of[RUGOSA_N_DISPLAY];
  guint64 unit_of_revision;       /* revision + 1 it was made for; 0: none */
};

G_END_DECLS
