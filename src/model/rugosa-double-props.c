/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <string.h>

#include "rugosa-double-props.h"

void
_rugosa_double_props_install (const RugosaDoubleProp *props, guint n,
                              GParamSpec **properties, guint first,
                              GParamFlags flags)
{
  for (guint i = 0; i < n; i++)
    properties[first + i] =
      g_param_spec_double (props[i].name, NULL, props[i].blurb, props[i].min,
                           props[i].max, props[i].dflt, flags);
}

void
_rugosa_double_props_init (const RugosaDoubleProp *props, guint n,
                           gpointer instance)
{
  for (guint i = 0; i < n; i++)
    *_rugosa_double_props_field (props, instance, i) = props[i].dflt;
}

int
_rugosa_double_props_find (const RugosaDoubleProp *props, guint n,
                           const char *property)
{
  for (guint i = 0; i < n; i++)
    if (strcmp (props[i].name, property) == 0)
      return (int) i;
  return -1;
}
