/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-size-picker"

#include "config.h"

#include <glib/gi18n.h>

#include "core/catalog.h"
#include "model/rugosa-display.h"
#include "rugosa-size-picker.h"

struct _RugosaSizePicker
{
  GtkWidget parent_instance;

  /* template widgets */
  GtkMenuButton  *button;
  GtkLabel       *button_label;
  GtkPopover     *popover;
  GtkSearchEntry *search;
  GtkCheckButton *show_all_check;
  GtkLabel       *note_label;
  GtkListView    *list;

  /* owned */
  char          *designation;   /* NULL: a custom bore */
  char          *material_id;
  char          *unit;          /* of the inner diameters shown */
  gboolean       show_all;
  GtkStringList *rows;          /* "" for the custom bore, then designations */
  GArray        *pipes;         /* int: the catalog index of each row, -1 first */
  gboolean       updating;
};

G_DEFINE_FINAL_TYPE (RugosaSizePicker, rugosa_size_picker, GTK_TYPE_WIDGET)

enum {
  PROP_0,
  PROP_DESIGNATION,
  PROP_MATERIAL_ID,
  PROP_SHOW_ALL,
  N_PROPS
};

enum {
  CHOSEN,
  N_SIGNALS
};

static GParamSpec *properties[N_PROPS];
static guint signals[N_SIGNALS];

GtkWidget *
rugosa_size_picker_new (void)
{
  return g_object_new (RUGOSA_TYPE_SIZE_PICKER, NULL);
}

/* The catalogs the list draws from: those made of the material, or all
 * (flags as rg_pipe_catalog_choose fills them); FALSE for all. */
static gboolean
_rugosa_size_picker_catalogs (RugosaSizePicker *self,
                              unsigned char    *chosen)
{
  int n = 0;

  if (self->show_all || self->material_id == NULL)
    return FALSE;
  return rg_pipe_catalog_choose ("all", self->material_id, chosen, &n, NULL) == RG_OK && n > 0;
}

static void
_rugosa_size_picker_fill (RugosaSizePicker *self)
{
  g_autofree unsigned char *chosen = g_new0 (unsigned char, MAX (rg_pipe_catalog_count (), 1));
  g_autofree int *found = g_new (int, MAX (rg_pipe_count (), 1));
  g_autoptr (GPtrArray) texts = g_ptr_array_new ();
  const char *query = gtk_editable_get_text (GTK_EDITABLE (self->search));
  gboolean fits = _rugosa_size_picker_catalogs (self, chosen);
  int n, minus_one = -1;

  n = rg_pipe_search (fits ? chosen : NULL, query, found, rg_pipe_count ());
  g_array_set_size (self->pipes, 0);
  g_array_append_val (self->pipes, minus_one);
  g_ptr_array_add (texts, (gpointer) "");
  for (int i = 0; i < n; i++)
    {
      g_array_append_val (self->pipes, found[i]);
      g_ptr_array_add (texts, (gpointer) rg_pipe_at (found[i])->designation);
    }
  g_ptr_array_add (texts, NULL);
  gtk_string_list_splice (self->rows, 0, g_list_model_get_n_items (G_LIST_MODEL (self->rows)),
                          (const char *const *) texts->pdata);

  /* Say why the list is what it is. */
  {
    g_autofree char *note = NULL;

    if (!self->show_all && self->material_id != NULL && !fits)
      note = g_strdup (_("No catalog is made of this material: the sizes of every material are listed."));
    else if (n == 0 && *query != '\0')
      note = g_strdup_printf (_("No size matches “%s”."), query);
    gtk_label_set_text (self->note_label, note != NULL ? note : "");
    gtk_widget_set_visible (GTK_WIDGET (self->note_label), note != NULL);
  }
}

static void
_rugosa_size_picker_update_button (RugosaSizePicker *self)
{
  const RgPipe *pipe = NULL;

  if (self->designation != NULL)
    (void) rg_pipe_lookup (self->designation, &pipe, NULL);
  gtk_label_set_text (self->button_label, pipe != NULL ? pipe->designation
                                          : self->designation != NULL ? self->designation
                                          : _("Custom bore"));
}

/* ---- rows ---- */

static void
_rugosa_size_picker_setup_row (GtkSignalListItemFactory *factory,
                               GtkListItem              *item,
                               RugosaSizePicker         *self)
{
  GtkWidget *box = gtk_box_new (GTK_ORIENTATION_HORIZONTAL, 8);
  GtkWidget *texts = gtk_box_new (GTK_ORIENTATION_VERTICAL, 1);
  GtkWidget *title = gtk_label_new (NULL);
  GtkWidget *subtitle = gtk_label_new (NULL);
  GtkWidget *mark = gtk_image_new_from_icon_name ("object-select-symbolic");

  gtk_label_set_xalign (GTK_LABEL (title), 0);
  gtk_label_set_xalign (GTK_LABEL (subtitle), 0);
  gtk_label_set_ellipsize (GTK_LABEL (subtitle), PANGO_ELLIPSIZE_END);
  gtk_widget_add_css_class (subtitle, "dim-label");
  gtk_widget_add_css_class (subtitle, "caption");
  gtk_widget_set_hexpand (texts, TRUE);
  gtk_box_append (GTK_BOX (texts), title);
  gtk_box_append (GTK_BOX (texts), subtitle);
  gtk_box_append (GTK_BOX (box), texts);
  gtk_box_append (GTK_BOX (box), mark);
  gtk_widget_set_margin_top (box, 3);
  gtk_widget_set_margin_bottom (box, 3);
  gtk_list_item_set_child (item, box);
}

static void
_rugosa_size_picker_bind_row (GtkSignalListItemFactory *factory,
                              GtkListItem              *item,
                              RugosaSizePicker         *self)
{
  GtkWidget *box = gtk_list_item_get_child (item);
  GtkWidget *texts = gtk_widget_get_first_child (box);
  GtkLabel *title = GTK_LABEL (gtk_widget_get_first_child (texts));
  GtkLabel *subtitle = GTK_LABEL (gtk_widget_get_last_child (texts));
  GtkWidget *mark = gtk_widget_get_last_child (box);
  guint position = gtk_list_item_get_position (item);
  int index = position < self->pipes->len ? g_array_index (self->pipes, int, position) : -1;
  const RgPipe *pipe = rg_pipe_at (index);

  if (pipe == NULL)
    {
      gtk_label_set_text (title, _("Custom bore"));
      gtk_label_set_text (subtitle, _("Keeps the bore shown; type another below"));
      gtk_widget_set_visible (mark, self->designation == NULL);
      return;
    }
  {
    g_autofree char *bore = rugosa_display_format_screen (RG_QTY_LENGTH, pipe->inner_diameter_m, self->unit);
    /* TRANSLATORS: under a pipe size in the size picker: its inner
     * diameter and its catalog, e.g. "bore 90.0 mm · ISO 4427-2 SDR 11" */
    g_autofree char *sub = g_strdup_printf (_("bore %s · %s"), bore,
                                            rg_pipe_catalog_at (pipe->catalog)->name);

    gtk_label_set_text (title, pipe->designation);
    gtk_label_set_text (subtitle, sub);
  }
  gtk_widget_set_visible (mark, self->designation != NULL
                                && g_ascii_strcasecmp (self->designation, pipe->designation) == 0);
}

/* ---- signals of the template ---- */

static void
_rugosa_size_picker_search_changed (GtkSearchEntry   *entry,
                                    RugosaSizePicker *self)
{
  _rugosa_size_picker_fill (self);
}

static void
_rugosa_size_picker_choose (RugosaSizePicker *self,
                            guint             position)
{
  int index;

  if (position >= self->pipes->len)
    return;
  index = g_array_index (self->pipes, int, position);
  gtk_popover_popdown (self->popover);
  g_signal_emit (self, signals[CHOSEN], 0, index >= 0 ? rg_pipe_at (index)->designation : NULL);
}

static void
_rugosa_size_picker_row_activated (GtkListView      *list,
                                   guint             position,
                                   RugosaSizePicker *self)
{
  _rugosa_size_picker_choose (self, position);
}

/* Enter in the search takes the first size found. */
static void
_rugosa_size_picker_search_activate (GtkSearchEntry   *entry,
                                     RugosaSizePicker *self)
{
  if (self->pipes->len > 1)
    _rugosa_size_picker_choose (self, 1);
}

static void
_rugosa_size_picker_show_all_toggled (GtkCheckButton   *check,
                                      RugosaSizePicker *self)
{
  if (!self->updating)
    rugosa_size_picker_set_show_all (self, gtk_check_button_get_active (check));
}

/* Opened: an empty search, the whole list, scrolled to the size chosen. */
static void
_rugosa_size_picker_popover_mapped (GtkPopover       *popover,
                                    RugosaSizePicker *self)
{
  guint at = 0;

  if (*gtk_editable_get_text (GTK_EDITABLE (self->search)) != '\0')
    gtk_editable_set_text (GTK_EDITABLE (self->search), "");
  _rugosa_size_picker_fill (self);
  for (guint i = 1; i < self->pipes->len && self->designation != NULL; i++)
    if (g_ascii_strcasecmp (rg_pipe_at (g_array_index (self->pipes, int, i))->designation,
                            self->designation) == 0)
      at = i;
  gtk_widget_activate_action (GTK_WIDGET (self->list), "list.scroll-to-item", "u", at);
  gtk_widget_grab_focus (GTK_WIDGET (self->search));
}

/* ---- API ---- */

const char *
rugosa_size_picker_get_designation (RugosaSizePicker *self)
{
  g_return_val_if_fail (RUGOSA_IS_SIZE_PICKER (self), NULL);
  return self->designation;
}

void
rugosa_size_picker_set_designation (RugosaSizePicker *self,
                                    const char       *designation)
{
  g_return_if_fail (RUGOSA_IS_SIZE_PICKER (self));
  if (g_strcmp0 (self->designation, designation) == 0)
    return;
  g_free (self->designation);
  self->designation = g_strdup (designation);
  _rugosa_size_picker_update_button (self);
  g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_DESIGNATION]);
}

const char *
rugosa_size_picker_get_material_id (RugosaSizePicker *self)
{
  g_return_val_if_fail (RUGOSA_IS_SIZE_PICKER (self), NULL);
  return self->material_id;
}

void
rugosa_size_picker_set_material_id (RugosaSizePicker *self,
                                    const char       *material_id)
{
  g_return_if_fail (RUGOSA_IS_SIZE_PICKER (self));
  if (g_strcmp0 (self->material_id, material_id) == 0)
    return;
  g_free (self->material_id);
  self->material_id = g_strdup (material_id);
  _rugosa_size_picker_fill (self);
  g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_MATERIAL_ID]);
}

gboolean
rugosa_size_picker_get_show_all (RugosaSizePicker *self)
{
  g_return_val_if_fail (RUGOSA_IS_SIZE_PICKER (self), FALSE);
  return self->show_all;
}

void
rugosa_size_picker_set_show_all (RugosaSizePicker *self,
                                 gboolean          show_all)
{
  g_return_if_fail (RUGOSA_IS_SIZE_PICKER (self));
  show_all = !!show_all;
  if (self->show_all == show_all)
    return;
  self->show_all = show_all;
  self->updating = TRUE;
  gtk_check_button_set_active (self->show_all_check, show_all);
  self->updating = FALSE;
  _rugosa_size_picker_fill (self);
  g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_SHOW_ALL]);
}

void
rugosa_size_picker_set_diameter_unit (RugosaSizePicker *self,
                                      const char       *unit)
{
  g_return_if_fail (RUGOSA_IS_SIZE_PICKER (self));
  if (g_strcmp0 (self->unit, unit) == 0)
    return;
  g_free (self->unit);
  self->unit = g_strdup (unit);
  _rugosa_size_picker_fill (self);
}

void
rugosa_size_picker_set_search (RugosaSizePicker *self,
                               const char       *text)
{
  g_return_if_fail (RUGOSA_IS_SIZE_PICKER (self));
  gtk_editable_set_text (GTK_EDITABLE (self->search), text);
  _rugosa_size_picker_fill (self);
}

guint
rugosa_size_picker_get_n_rows (RugosaSizePicker *self)
{
  g_return_val_if_fail (RUGOSA_IS_SIZE_PICKER (self), 0);
  return self->pipes->len;
}

const char *
rugosa_size_picker_get_row (RugosaSizePicker *self,
                            guint             position)
{
  const RgPipe *pipe;

  g_return_val_if_fail (RUGOSA_IS_SIZE_PICKER (self), NULL);
  if (position >= self->pipes->len)
    return NULL;
  pipe = rg_pipe_at (g_array_index (self->pipes, int, position));
  return pipe != NULL ? pipe->designation : NULL;
}

void
rugosa_size_picker_activate_row (RugosaSizePicker *self,
                                 guint             position)
{
  g_return_if_fail (RUGOSA_IS_SIZE_PICKER (self));
  _rugosa_size_picker_choose (self, position);
}

/* ---- object ---- */

static void
rugosa_size_picker_get_property (GObject    *object,
                                 guint       prop_id,
                                 GValue     *value,
                                 GParamSpec *pspec)
{
  RugosaSizePicker *self = RUGOSA_SIZE_PICKER (object);

  switch (prop_id)
    {
    case PROP_DESIGNATION: g_value_set_string (value, self->designation); break;
    case PROP_MATERIAL_ID: g_value_set_string (value, self->material_id); break;
    case PROP_SHOW_ALL: g_value_set_boolean (value, self->show_all); break;
    default: G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_size_picker_set_property (GObject      *object,
                                 guint         prop_id,
                                 const GValue *value,
                                 GParamSpec   *pspec)
{
  RugosaSizePicker *self = RUGOSA_SIZE_PICKER (object);

  switch (prop_id)
    {
    case PROP_DESIGNATION: rugosa_size_picker_set_designation (self, g_value_get_string (value)); break;
    case PROP_MATERIAL_ID: rugosa_size_picker_set_material_id (self, g_value_get_string (value)); break;
    case PROP_SHOW_ALL: rugosa_size_picker_set_show_all (self, g_value_get_boolean (value)); break;
    default: G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
rugosa_size_picker_dispose (GObject *object)
{
  RugosaSizePicker *self = RUGOSA_SIZE_PICKER (object);

  gtk_widget_dispose_template (GTK_WIDGET (self), RUGOSA_TYPE_SIZE_PICKER);
  G_OBJECT_CLASS (rugosa_size_picker_parent_class)->dispose (object);
}

static void
rugosa_size_picker_finalize (GObject *object)
{
  RugosaSizePicker *self = RUGOSA_SIZE_PICKER (object);

  g_free (self->designation);
  g_free (self->material_id);
  g_free (self->unit);
  g_clear_object (&self->rows);
  g_array_unref (self->pipes);
  G_OBJECT_CLASS (rugosa_size_picker_parent_class)->finalize (object);
}

static void
rugosa_size_picker_class_init (RugosaSizePickerClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->get_property = rugosa_size_picker_get_property;
  object_class->set_property = rugosa_size_picker_set_property;
  object_class->dispose = rugosa_size_picker_dispose;
  object_class->finalize = rugosa_size_picker_finalize;

  properties[PROP_DESIGNATION] =
    g_param_spec_string ("designation", NULL, NULL, NULL,
                         G_PARAM_READWRITE | G_PARAM_EXPLICIT_NOTIFY | G_PARAM_STATIC_STRINGS);
  properties[PROP_MATERIAL_ID] =
    g_param_spec_string ("material-id", NULL, NULL, NULL,
                         G_PARAM_READWRITE | G_PARAM_EXPLICIT_NOTIFY | G_PARAM_STATIC_STRINGS);
  properties[PROP_SHOW_ALL] =
    g_param_spec_boolean ("show-all", NULL, NULL, FALSE,
                          G_PARAM_READWRITE | G_PARAM_EXPLICIT_NOTIFY | G_PARAM_STATIC_STRINGS);
  g_object_class_install_properties (object_class, N_PROPS, properties);

  /* (picker, designation or NULL for a custom bore) */
  signals[CHOSEN] =
    g_signal_new ("chosen", G_TYPE_FROM_CLASS (klass), G_SIGNAL_RUN_LAST,
                  0, NULL, NULL, NULL, G_TYPE_NONE, 1, G_TYPE_STRING);

  gtk_widget_class_set_template_from_resource (widget_class, "/org/rugosa/Rugosa/rugosa-size-picker.ui");
  gtk_widget_class_bind_template_child (widget_class, RugosaSizePicker, button);
  gtk_widget_class_bind_template_child (widget_class, RugosaSizePicker, button_label);
  gtk_widget_class_bind_template_child (widget_class, RugosaSizePicker, popover);
  gtk_widget_class_bind_template_child (widget_class, RugosaSizePicker, search);
  gtk_widget_class_bind_template_child (widget_class, RugosaSizePicker, show_all_check);
  gtk_widget_class_bind_template_child (widget_class, RugosaSizePicker, note_label);
  gtk_widget_class_bind_template_child (widget_class, RugosaSizePicker, list);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_size_picker_search_changed);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_size_picker_search_activate);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_size_picker_show_all_toggled);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_size_picker_row_activated);
  gtk_widget_class_bind_template_callback (widget_class, _rugosa_size_picker_popover_mapped);
  gtk_widget_class_set_layout_manager_type (widget_class, GTK_TYPE_BIN_LAYOUT);
  gtk_widget_class_set_css_name (widget_class, "sizepicker");
}

static void
rugosa_size_picker_init (RugosaSizePicker *self)
{
  GtkListItemFactory *factory;
  GtkSingleSelection *selection;

  self->pipes = g_array_new (FALSE, FALSE, sizeof (int));
  self->rows = gtk_string_list_new (NULL);
  self->unit = g_strdup ("mm");
  gtk_widget_init_template (GTK_WIDGET (self));

  factory = gtk_signal_list_item_factory_new ();
  g_signal_connect (factory, "setup", G_CALLBACK (_rugosa_size_picker_setup_row), self);
  g_signal_connect (factory, "bind", G_CALLBACK (_rugosa_size_picker_bind_row), self);
  gtk_list_view_set_factory (self->list, factory);
  g_object_unref (factory);
  selection = gtk_single_selection_new (G_LIST_MODEL (g_object_ref (self->rows)));
  gtk_single_selection_set_autoselect (selection, FALSE);
  gtk_single_selection_set_can_unselect (selection, TRUE);
  gtk_list_view_set_model (self->list, GTK_SELECTION_MODEL (selection));
  g_object_unref (selection);

  _rugosa_size_picker_fill (self);
  _rugosa_size_picker_update_button (self);
}
