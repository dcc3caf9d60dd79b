/* SPDX-License-Identifier: GPL-3.0-or-later */
/* A table of double-valued GObject properties stored in struct fields:
 * shared by RugosaLine and RugosaSettings, whose many quantities all have a
 * name, a range and a default. */
#pragma once

#include <glib-object.h>

G_BEGIN_DECLS

typedef struct {
  const char *name;
  const char *blurb;
  gsize offset;          /* of the double field in the instance struct */
  double min, max, dflt;
} RugosaDoubleProp;

/* Creates one GParamSpec per entry into properties[first …]. */
void _rugosa_double_props_install (const RugosaDoubleProp *props, guint n,
                                   GParamSpec **properties, guint first,
                                   GParamFlags flags);
/* Sets every field of `instance` to its default. */
void _rugosa_double_props_init (const RugosaDoubleProp *props, guint n,
                                gpointer instance);
/* Index of the entry named `property`, or -1. */
int _rugosa_double_props_find (const RugosaDoubleProp *props, guint n,
                               const char *property);

static inline double *
_rugosa_double_props_field (const RugosaDoubleProp *props, gpointer instance,
                            guint index)
{
  return (double *) G_STRUCT_MEMBER_P (instance, props[index].offset);
}

G_END_DECLS
