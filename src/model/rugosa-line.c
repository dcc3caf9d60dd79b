/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <math.h>
#include <string.h>

#include "core/fluid.h"
#include "rugosa-double-props.h"
#include "rugosa-model-private.h"

struct _RugosaLine
{
  GObject parent_instance;

  /* owned */
  char *name;
  char *colour;
  char *material_id;     /* NULL: custom roughness */
  char *aging_class_id;  /* NULL: custom rate */
  char *pipe_designation; /* NULL: custom inner diameter */
  char *note;
  GVariant *fittings;    /* RUGOSA_LINE_FITTINGS_TYPE, never NULL */
  cJSON *extra;          /* unknown file fields, or NULL */

  int fluid_kind;
  double temperature, pressure, salinity, density, viscosity;
  double oil_t1, oil_nu1, oil_t2, oil_nu2, oil_density_ref, oil_t_ref,
         oil_expansion;
  double roughness, aging_rate, inner_diameter, length, elevation;
  double flow_design, flow_minimum, flow_maximum;

  guint64 revision;
};

G_DEFINE_FINAL_TYPE (RugosaLine, rugosa_line, G_TYPE_OBJECT)

enum {
  PROP_0,
  PROP_NAME,
  PROP_COLOUR,
  PROP_MATERIAL_ID,
  PROP_AGING_CLASS_ID,
  PROP_PIPE_DESIGNATION,
  PROP_NOTE,
  PROP_FITTINGS,
  PROP_FLUID_KIND,
  PROP_FIRST_DOUBLE,
  N_PROPS = PROP_FIRST_DOUBLE + 20
};

static GParamSpec *properties[N_PROPS];

/* The double properties: name, field, range and default.  The ranges are
 * the "absurd value" limits of the file format (docs/file-format.md); the
 * defaults are only a starting point for a new line (fresh water at room
 * temperature in a 100 m run of 100 mm bore). */

#define F(field) G_STRUCT_OFFSET (RugosaLine, field)
static const RugosaDoubleProp double_props[] = {
  { "temperature", "Fluid temperature, K", F (temperature), 1.0, 2000.0, 293.15 },
  { "pressure", "Absolute pressure, Pa", F (pressure), 1.0, 1.0e9, 101325.0 },
  { "salinity", "Seawater salinity, kg/kg", F (salinity), 0.0, 0.3, 0.035 },
  { "density", "Custom fluid density, kg/m³", F (density), 1.0e-3, 3.0e4, 1000.0 },
  { "viscosity", "Custom fluid dynamic viscosity, Pa·s", F (viscosity), 1.0e-7, 1.0e5, 1.0e-3 },
  { "oil-t1", "Oil: first temperature, K", F (oil_t1), 1.0, 2000.0, 313.15 },
  { "oil-nu1", "Oil: kinematic viscosity at oil-t1, m²/s", F (oil_nu1), 1.0e-9, 1.0, 3.2e-5 },
  { "oil-t2", "Oil: second temperature, K", F (oil_t2), 1.0, 2000.0, 373.15 },
  { "oil-nu2", "Oil: kinematic viscosity at oil-t2, m²/s", F (oil_nu2), 1.0e-9, 1.0, 5.4e-6 },
  { "oil-density-ref", "Oil: density at oil-t-ref, kg/m³", F (oil_density_ref), 1.0, 3.0e4, 870.0 },
  { "oil-t-ref", "Oil: reference temperature, K", F (oil_t_ref), 1.0, 2000.0, 288.15 },
  { "oil-expansion", "Oil: volumetric expansion, 1/K", F (oil_expansion), 0.0, 0.01, 7.0e-4 },
  { "roughness", "Custom absolute roughness when new, m", F (roughness), 0.0, 0.1, 4.5e-5 },
  { "aging-rate", "Custom roughness growth, m/year", F (aging_rate), 0.0, 0.01, 0.0 },
  { "inner-diameter", "Custom inner diameter, m", F (inner_diameter), 1.0e-4, 20.0, 0.1 },
  { "length", "Length, m", F (length), 1.0e-3, 1.0e7, 100.0 },
  { "elevation", "Elevation change outlet minus inlet, m", F (elevation), -1.0e5, 1.0e5, 0.0 },
  { "flow-design", "Design flow, m³/s", F (flow_design), 0.0, 1.0e4, 0.01 },
  { "flow-minimum", "Minimum flow, m³/s (0: none)", F (flow_minimum), 0.0, 1.0e4, 0.0 },
  { "flow-maximum", "Maximum flow, m³/s (0: none)", F (flow_maximum), 0.0, 1.0e4, 0.0 },
};
#undef F

G_STATIC_ASSERT (G_N_ELEMENTS (double_props) == N_PROPS - PROP_FIRST_DOUBLE);

static double *
double_field (RugosaLine *self, guint index)
{
  return _rugosa_double_props_field (double_props, self, index);
}

static char **
string_field (RugosaLine *self, guint prop_id)
{
  switch (prop_id)
    {
    case PROP_NAME: return &self->name;
    case PROP_COLOUR: return &self->colour;
    case PROP_MATERIAL_ID: return &self->material_id;
    case PROP_AGING_CLASS_ID: return &self->aging_class_id;
    case PROP_PIPE_DESIGNATION: return &self->pipe_designation;
    case PROP_NOTE: return &self->note;
    default: return NULL;
    }
}

static void
changed (RugosaLine *self, guint prop_id)
{
  self->revision++;
  g_object_notify_by_pspec (G_OBJECT (self), properties[prop_id]);
}

static void
rugosa_line_finalize (GObject *object)
{
  RugosaLine *self = RUGOSA_LINE (object);

  g_free (self->name);
  g_free (self->colour);
  g_free (self->material_id);
  g_free (self->aging_class_id);
  g_free (self->pipe_designation);
  g_free (self->note);
  g_clear_pointer (&self->fittings, g_variant_unref);
  g_clear_pointer (&self->extra, cJSON_Delete);

  G_OBJECT_CLASS (rugosa_line_parent_class)->finalize (object);
}

static void
rugosa_line_get_property (GObject *object, guint prop_id, GValue *value,
                          GParamSpec *pspec)
{
  RugosaLine *self = RUGOSA_LINE (object);
  char **s;

  if (prop_id >= PROP_FIRST_DOUBLE && prop_id < N_PROPS)
    {
      g_value_set_double (value, *double_field (self, prop_id - PROP_FIRST_DOUBLE));
      return;
    }
  if ((s = string_field (self, prop_id)) != NULL)
    {
      g_value_set_string (value, *s);
      return;
    }
  switch (prop_id)
    {
    case PROP_FITTINGS:
      g_value_set_variant (value, self->fittings);
      break;
    case PROP_FLUID_KIND:
      g_value_set_int (value, self->fluid_kind);
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_line_set_property (GObject *object, guint prop_id, const GValue *value,
                          GParamSpec *pspec)
{
  RugosaLine *self = RUGOSA_LINE (object);
  char **s;

  if (prop_id >= PROP_FIRST_DOUBLE && prop_id < N_PROPS)
    {
      double *d = double_field (self, prop_id - PROP_FIRST_DOUBLE);
      double v = g_value_get_double (value);

      if (*d != v)
        {
          *d = v;
          changed (self, prop_id);
        }
      return;
    }
  if ((s = string_field (self, prop_id)) != NULL)
    {
      const char *v = g_value_get_string (value);

      /* name, colour and note are never NULL; the catalog keys use NULL for
       * "custom" and treat "" the same way. */
      if (prop_id == PROP_NAME || prop_id == PROP_COLOUR || prop_id == PROP_NOTE)
        v = v ? v : "";
      else if (v != NULL && *v == '\0')
        v = NULL;
      if (g_strcmp0 (*s, v) != 0)
        {
          g_free (*s);
          *s = g_strdup (v);
          changed (self, prop_id);
        }
      return;
    }
  switch (prop_id)
    {
    case PROP_FITTINGS:
      {
        GVariant *v = g_value_get_variant (value);

        if (v == NULL)
          v = g_variant_new_array (G_VARIANT_TYPE ("(sdd)"), NULL, 0);
        g_variant_ref_sink (v);
        if (self->fittings == NULL || !g_variant_equal (self->fittings, v))
          {
            g_clear_pointer (&self->fittings, g_variant_unref);
            self->fittings = g_variant_ref (v);
            changed (self, prop_id);
          }
        g_variant_unref (v);
      }
      break;
    case PROP_FLUID_KIND:
      if (self->fluid_kind != g_value_get_int (value))
        {
          self->fluid_kind = g_value_get_int (value);
          changed (self, prop_id);
        }
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_line_class_init (RugosaLineClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  const GParamFlags flags = G_PARAM_READWRITE | G_PARAM_EXPLICIT_NOTIFY
                            | G_PARAM_STATIC_STRINGS;

  object_class->finalize = rugosa_line_finalize;
  object_class->get_property = rugosa_line_get_property;
  object_class->set_property = rugosa_line_set_property;

  properties[PROP_NAME] =
    g_param_spec_string ("name", NULL, "Name shown in lists and on the chart",
                         "", flags);
  properties[PROP_COLOUR] =
    g_param_spec_string ("colour", NULL, "Marker colour as #rrggbb",
                         "#2a7ab0", flags);
  properties[PROP_MATERIAL_ID] =
    g_param_spec_string ("material-id", NULL,
                         "Catalog material id, or NULL for the custom roughness",
                         NULL, flags);
  properties[PROP_AGING_CLASS_ID] =
    g_param_spec_string ("aging-class-id", NULL,
                         "Catalog aging class id, or NULL for the custom rate",
                         NULL, flags);
  properties[PROP_PIPE_DESIGNATION] =
    g_param_spec_string ("pipe-designation", NULL,
                         "Catalog pipe designation, or NULL for the custom inner diameter",
                         NULL, flags);
  properties[PROP_NOTE] =
    g_param_spec_string ("note", NULL, "Free text", "", flags);
  properties[PROP_FITTINGS] =
    g_param_spec_variant ("fittings", NULL,
                          "Fittings: (catalog id or \"\", plain K, count)",
                          G_VARIANT_TYPE (RUGOSA_LINE_FITTINGS_TYPE), NULL,
                          flags);
  properties[PROP_FLUID_KIND] =
    g_param_spec_int ("fluid-kind", NULL, "An RgFluidKind", 0,
                      RG_FLUID_N_KINDS - 1, RG_FLUID_WATER, flags);
  _rugosa_double_props_install (double_props, G_N_ELEMENTS (double_props),
                                properties, PROP_FIRST_DOUBLE, flags);

  g_object_class_install_properties (object_class, N_PROPS, properties);
}

static void
rugosa_line_init (RugosaLine *self)
{
  self->name = g_strdup ("");
  self->colour = g_strdup ("#2a7ab0");
  self->note = g_strdup ("");
  self->fittings = g_variant_ref_sink (
    g_variant_new_array (G_VARIANT_TYPE ("(sdd)"), NULL, 0));
  self->fluid_kind = RG_FLUID_WATER;
  _rugosa_double_props_init (double_props, G_N_ELEMENTS (double_props), self);
}

RugosaLine *
rugosa_line_new (const char *name)
{
  return g_object_new (RUGOSA_TYPE_LINE, "name", name ? name : "", NULL);
}

RugosaLine *
rugosa_line_duplicate (RugosaLine *self)
{
  RugosaLine *copy;
  guint n;
  GParamSpec **specs;

  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);

  copy = g_object_new (RUGOSA_TYPE_LINE, NULL);
  specs = g_object_class_list_properties (G_OBJECT_GET_CLASS (self), &n);
  for (guint i = 0; i < n; i++)
    {
      GValue v = G_VALUE_INIT;

      g_value_init (&v, specs[i]->value_type);
      g_object_get_property (G_OBJECT (self), specs[i]->name, &v);
      g_object_set_property (G_OBJECT (copy), specs[i]->name, &v);
      g_value_unset (&v);
    }
  g_free (specs);
  if (self->extra != NULL)
    copy->extra = cJSON_Duplicate (self->extra, 1);
  return copy;
}

gboolean
rugosa_line_equal (RugosaLine *a, RugosaLine *b)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (a) && RUGOSA_IS_LINE (b), FALSE);

  for (guint i = 0; i < G_N_ELEMENTS (double_props); i++)
    if (*double_field (a, i) != *double_field (b, i))
      return FALSE;
  for (guint p = PROP_NAME; p <= PROP_NOTE; p++)
    if (g_strcmp0 (*string_field (a, p), *string_field (b, p)) != 0)
      return FALSE;
  return a->fluid_kind == b->fluid_kind
         && g_variant_equal (a->fittings, b->fittings);
}

const char *
rugosa_line_get_name (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);
  return self->name;
}

void
rugosa_line_set_name (RugosaLine *self, const char *name)
{
  g_return_if_fail (RUGOSA_IS_LINE (self));
  g_object_set (self, "name", name, NULL);
}

const char *
rugosa_line_get_colour (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);
  return self->colour;
}

int
rugosa_line_get_fluid_kind (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), 0);
  return self->fluid_kind;
}

const char *
rugosa_line_get_material_id (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);
  return self->material_id;
}

const char *
rugosa_line_get_aging_class_id (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);
  return self->aging_class_id;
}

const char *
rugosa_line_get_pipe_designation (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);
  return self->pipe_designation;
}

const char *
rugosa_line_get_note (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);
  return self->note;
}

static int
double_index (const char *property)
{
  return _rugosa_double_props_find (double_props, G_N_ELEMENTS (double_props), property);
}

double
rugosa_line_get_double (RugosaLine *self, const char *property)
{
  int i;

  g_return_val_if_fail (RUGOSA_IS_LINE (self), 0.0);
  i = double_index (property);
  g_return_val_if_fail (i >= 0, 0.0);
  return *double_field (self, (guint) i);
}

void
rugosa_line_set_double (RugosaLine *self, const char *property, double value)
{
  g_return_if_fail (RUGOSA_IS_LINE (self));
  g_object_set (self, property, value, NULL);
}

GVariant *
rugosa_line_get_fittings (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), NULL);
  return self->fittings;
}

void
rugosa_line_set_fittings (RugosaLine *self, GVariant *fittings)
{
  g_return_if_fail (RUGOSA_IS_LINE (self));
  g_object_set (self, "fittings", fittings, NULL);
}

guint64
rugosa_line_get_revision (RugosaLine *self)
{
  g_return_val_if_fail (RUGOSA_IS_LINE (self), 0);
  return self->revision;
}

const cJSON *
_rugosa_line_get_extra (RugosaLine *self)
{
  return self->extra;
}

void
_rugosa_line_take_extra (RugosaLine *self, cJSON *extra)
{
  g_clear_pointer (&self->extra, cJSON_Delete);
  self->extra = extra;
}
