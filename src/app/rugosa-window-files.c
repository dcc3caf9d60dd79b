/* SPDX-License-Identifier: GPL-3.0-or-later */
#define G_LOG_DOMAIN "rugosa-window"

#include "config.h"

#include <glib/gi18n.h>
#include <glib/gstdio.h>
#include <errno.h>
#include <fcntl.h>
#include <sys/file.h>
#include <sys/stat.h>
#include <unistd.h>

#include "rugosa-window-private.h"

/* Seconds of quiet after the last change before the autosave copy is
 * written: long enough to coalesce a burst of edits, short enough that a
 * crash loses little. */
#define AUTOSAVE_DELAY_S 5

#define PROJECT_SUFFIX ".rugosa"

static char *
_rugosa_window_recovery_dir (void)
{
  return g_build_filename (g_get_user_state_dir (), "rugosa", "recovery", NULL);
}

/* --- who owns a recovery copy ----------------------------------------- *
 *
 * A recovery copy belongs to the running instance that wrote it until that
 * instance ends, whatever D-Bus session it runs in (two logins, a remote
 * session and a local one share the state folder but not the bus).  Each
 * instance has an owner id, holds an exclusive flock(2) on
 * "owner-ID.lock" in the recovery folder from before its first copy is
 * written until it ends, and names its copies "unsaved-ID-N.rugosa".  The
 * kernel drops the lock when the process ends in any way (SIGKILL, a
 * crash), so a copy is another instance's live work exactly while its
 * owner's lock is held; it is offered only when the lock can be taken,
 * and the instance that offers it holds that lock (claims the copy) until
 * the offer is answered, so two instances never offer the same copy
 * (docs/data-safety.md). */

#define OWNER_PREFIX "owner-"
#define OWNER_SUFFIX ".lock"
#define COPY_PREFIX "unsaved-"

static char *owner_id;      /* this instance's */
static int owner_fd = -1;   /* the lock held on it */

static const char *
_rugosa_recovery_owner_id (void)
{
  /* No '-' in it: a copy's name ends in "-N". */
  if (owner_id == NULL)
    owner_id = g_strdup_printf ("P%dR%08x", (int) getpid (), g_random_int ());
  return owner_id;
}

static char *
_rugosa_recovery_lock_path (const char *owner)
{
  g_autofree char *dir = _rugosa_window_recovery_dir ();
  g_autofree char *name = g_strconcat (OWNER_PREFIX, owner, OWNER_SUFFIX, NULL);

  return g_build_filename (dir, name, NULL);
}

/* The owner in a copy's file name ("unsaved-OWNER-N.rugosa"), or NULL. */
static char *
_rugosa_recovery_copy_owner (const char *name)
{
  const char *dash;

  if (!g_str_has_prefix (name, COPY_PREFIX) || !g_str_has_suffix (name, PROJECT_SUFFIX))
    return NULL;
  dash = strrchr (name, '-');
  if (dash == NULL || dash < name + strlen (COPY_PREFIX) + 1)
    return NULL;
  return g_strndup (name + strlen (COPY_PREFIX), (gsize) (dash - name) - strlen (COPY_PREFIX));
}

/* An exclusive lock on `path` (made if missing): the descriptor holding
 * it, or -1 with errno (EWOULDBLOCK: another process holds it).  The path
 * must still name the file locked: one removed by its last holder in the
 * meantime is made again. */
static int
_rugosa_recovery_lock (const char *path,
                       gboolean    wait)
{
  for (int attempt = 0; attempt < 5; attempt++)
    {
      struct stat held, named;
      int fd = open (path, O_RDWR | O_CREAT | O_CLOEXEC | O_NOFOLLOW, 0600);
      int errsv;

      if (fd < 0)
        return -1;
      while (flock (fd, wait ? LOCK_EX : LOCK_EX | LOCK_NB) != 0)
        if (errno != EINTR)
          {
            errsv = errno;
            close (fd);
            errno = errsv;
            return -1;
          }
      if (fstat (fd, &held) == 0 && stat (path, &named) == 0
          && held.st_dev == named.st_dev && held.st_ino == named.st_ino)
        return fd;
      close (fd);
    }
  errno = EAGAIN;
  return -1;
}

/* Whether `owner` still has a copy in the recovery folder. */
static gboolean
_rugosa_recovery_owner_has_copies (const char *owner)
{
  g_autofree char *dir = _rugosa_window_recovery_dir ();
  g_autoptr (GDir) d = g_dir_open (dir, 0, NULL);
  const char *name;

  while (d != NULL && (name = g_dir_read_name (d)) != NULL)
    {
      g_autofree char *of = _rugosa_recovery_copy_owner (name);

      if (g_strcmp0 (of, owner) == 0)
        return TRUE;
    }
  return FALSE;
}

/* Let go of a lock taken on `owner`; its lock file goes with it once no
 * copy of that owner is left (removed while still locked, so that nobody
 * can hold a lock on a file that is no longer there). */
static void
_rugosa_recovery_unlock (const char *owner,
                         int         fd)
{
  if (fd < 0)
    return;
  if (!_rugosa_recovery_owner_has_copies (owner))
    {
      g_autofree char *path = _rugosa_recovery_lock_path (owner);
      g_unlink (path);
    }
  close (fd);
}

gboolean
rugosa_window_recovery_hold (GError **error)
{
  g_autofree char *dir = _rugosa_window_recovery_dir ();
  g_autofree char *path = NULL;
  g_autoptr (GDir) d = NULL;
  const char *name;

  if (owner_fd >= 0)
    return TRUE;
  if (g_mkdir_with_parents (dir, 0700) != 0)
    {
      int errsv = errno;
      g_set_error (error, G_FILE_ERROR, g_file_error_from_errno (errsv),
                   _("Cannot create the recovery folder %s."), dir);
      return FALSE;
    }
  path = _rugosa_recovery_lock_path (_rugosa_recovery_owner_id ());
  /* Waits at most for another instance sweeping stale lock files: no
   * one else has a reason to hold an id nobody has written copies of. */
  owner_fd = _rugosa_recovery_lock (path, TRUE);
  if (owner_fd < 0)
    {
      int errsv = errno;
      g_set_error (error, G_FILE_ERROR, g_file_error_from_errno (errsv),
                   _("Cannot lock %s: %s."), path, g_strerror (errsv));
      return FALSE;
    }
  /* Lock files of instances that ended and left no copy go. */
  d = g_dir_open (dir, 0, NULL);
  while (d != NULL && (name = g_dir_read_name (d)) != NULL)
    if (g_str_has_prefix (name, OWNER_PREFIX) && g_str_has_suffix (name, OWNER_SUFFIX))
      {
        g_autofree char *owner = g_strndup (name + strlen (OWNER_PREFIX),
                                            strlen (name) - strlen (OWNER_PREFIX) - strlen (OWNER_SUFFIX));
        g_autofree char *other = NULL;
        int fd;

        if (g_str_equal (owner, owner_id) || _rugosa_recovery_owner_has_copies (owner))
          continue;
        other = g_build_filename (dir, name, NULL);
        if ((fd = _rugosa_recovery_lock (other, FALSE)) >= 0)
          _rugosa_recovery_unlock (owner, fd);
      }
  return TRUE;
}

void
rugosa_window_recovery_release (void)
{
  if (owner_fd < 0)
    return;
  _rugosa_recovery_unlock (owner_id, owner_fd);
  owner_fd = -1;
}

/* A copy offered: the lock held on its owner while the offer is open. */
typedef struct
{
  char *path;
  char *owner;   /* NULL: this instance's own copy, no lock taken */
  int   fd;
} RugosaRecoveryClaim;

static void
_rugosa_recovery_claim_free (RugosaRecoveryClaim *claim)
{
  if (claim->owner != NULL)
    _rugosa_recovery_unlock (claim->owner, claim->fd);
  g_free (claim->path);
  g_free (claim->owner);
  g_free (claim);
}

char *
rugosa_window_autosave_path (RugosaWindow *self)
{
  g_autofree char *dir = _rugosa_window_recovery_dir ();
  g_autofree char *name = g_strconcat (self->autosave_id, PROJECT_SUFFIX, NULL);

  return g_build_filename (dir, name, NULL);
}

static char *
_rugosa_window_meta_path (const char *autosave_path)
{
  return g_strconcat (autosave_path, ".origin", NULL);
}

void
_rugosa_window_remove_autosave (RugosaWindow *self)
{
  g_autofree char *path = rugosa_window_autosave_path (self);
  g_autofree char *meta = _rugosa_window_meta_path (path);

  g_clear_handle_id (&self->autosave_source, g_source_remove);
  g_unlink (path);
  g_unlink (meta);
}

gboolean
rugosa_window_autosave_now (RugosaWindow  *self,
                            GError       **error)
{
  g_autofree char *path = rugosa_window_autosave_path (self);
  g_autofree char *meta = _rugosa_window_meta_path (path);
  g_autofree char *dir = _rugosa_window_recovery_dir ();
  g_autofree char *origin = self->file ? g_file_get_path (self->file) : g_strdup ("");
  g_autofree char *data = NULL;
  gsize length = 0;

  g_clear_handle_id (&self->autosave_source, g_source_remove);
  if (g_mkdir_with_parents (dir, 0700) != 0)
    {
      g_set_error (error, G_FILE_ERROR, g_file_error_from_errno (errno),
                   _("Cannot create the recovery folder %s."), dir);
      return FALSE;
    }
  /* The copy is this instance's from its first byte: the lock comes
   * first.  Without it (a file system without locks) the copy is still
   * written — the work matters more — and others treat it as live. */
  {
    g_autoptr (GError) lock_error = NULL;
    if (!rugosa_window_recovery_hold (&lock_error))
      g_message ("Recovery copies are not locked: %s", lock_error->message);
  }
  data = rugosa_project_to_data (self->project, &length);
  /* Written atomically: a crash during the write leaves the previous copy
   * whole.  The origin first, so that whoever finds a copy finds where it
   * came from beside it. */
  if (!rugosa_file_write_atomic (meta, origin, strlen (origin), RUGOSA_FILE_WRITE_PRIVATE, error))
    return FALSE;
  return rugosa_file_write_atomic (path, data, length, RUGOSA_FILE_WRITE_PRIVATE, error);
}

static gboolean
_rugosa_window_autosave_timeout (gpointer user_data)
{
  RugosaWindow *self = RUGOSA_WINDOW (user_data);
  g_autoptr (GError) error = NULL;

  self->autosave_source = 0;
  if (self->modified && !rugosa_window_autosave_now (self, &error))
    g_warning ("Autosave failed: %s", error->message);
  return G_SOURCE_REMOVE;
}

void
_rugosa_window_mark_modified (RugosaWindow *self)
{
  gboolean was = self->modified;

  self->modified = TRUE;
  g_clear_handle_id (&self->autosave_source, g_source_remove);
  self->autosave_source = g_timeout_add_seconds (AUTOSAVE_DELAY_S, _rugosa_window_autosave_timeout, self);
  if (!was)
    _rugosa_window_update_title (self);
}

static void
_rugosa_window_set_clean (RugosaWindow *self)
{
  self->modified = FALSE;
  _rugosa_window_remove_autosave (self);
  _rugosa_window_update_title (self);
}

void
_rugosa_window_set_file (RugosaWindow *self,
                         GFile        *file)
{
  g_set_object (&self->file, file);
  if (file)
    {
      g_autofree char *uri = g_file_get_uri (file);
      gtk_recent_manager_add_item (gtk_recent_manager_get_default (), uri);
    }
  _rugosa_window_update_title (self);
}

gboolean
rugosa_window_load_file_sync (RugosaWindow  *self,
                              GFile         *file,
                              GError       **error)
{
  g_autofree char *path = g_file_get_path (file);

  if (path == NULL)
    {
      g_set_error (error, G_IO_ERROR, G_IO_ERROR_NOT_SUPPORTED,
                   _("Only local files can be opened."));
      return FALSE;
    }
  if (!rugosa_project_load (self->project, path, error))
    return FALSE;
  _rugosa_window_project_replaced (self);
  _rugosa_window_set_file (self, file);
  _rugosa_window_set_clean (self);
  return TRUE;
}

static void
_rugosa_window_show_error (RugosaWindow *self,
                           const char   *heading,
                           const char   *body)
{
  GtkWidget *dialog = adw_message_dialog_new (GTK_WINDOW (self), heading, body);

  adw_message_dialog_add_response (ADW_MESSAGE_DIALOG (dialog), "close", _("_Close"));
  gtk_window_present (GTK_WINDOW (dialog));
}

void
rugosa_window_load_file (RugosaWindow *self,
                         GFile        *file)
{
  g_autoptr (GError) error = NULL;

  if (!rugosa_window_load_file_sync (self, file, &error))
    {
      g_autofree char *name = g_file_get_parse_name (file);
      g_autofree char *heading = g_strdup_printf (_("Could not open “%s”"), name);
      _rugosa_window_show_error (self, heading, error->message);
    }
}

gboolean
rugosa_window_save_file_sync (RugosaWindow  *self,
                              GFile         *file,
                              GError       **error)
{
  g_autofree char *path = g_file_get_path (file);

  if (path == NULL)
    {
      g_set_error (error, G_IO_ERROR, G_IO_ERROR_NOT_SUPPORTED,
                   _("Only local files can be written."));
      return FALSE;
    }
  if (!rugosa_project_save (self->project, path, error))
    return FALSE;
  _rugosa_window_set_file (self, file);
  _rugosa_window_set_clean (self);
  return TRUE;
}

/* --- choosers -------------------------------------------------------- */

static GtkFileFilter *
_rugosa_window_project_filter (void)
{
  GtkFileFilter *filter = gtk_file_filter_new ();

  gtk_file_filter_set_name (filter, _("Rugosa projects"));
  gtk_file_filter_add_suffix (filter, "rugosa");
  return filter;
}

static void
_rugosa_window_open_response (GtkNativeDialog *dialog,
                              int              response,
                              RugosaWindow    *self)
{
  if (response == GTK_RESPONSE_ACCEPT)
    {
      g_autoptr (GFile) file = gtk_file_chooser_get_file (GTK_FILE_CHOOSER (dialog));
      /* Unsaved work stays: the file opens in a window of its own. */
      if (rugosa_window_is_pristine (self))
        rugosa_window_load_file (self, file);
      else
        g_application_open (g_application_get_default (), &file, 1, "new-window");
    }
  g_object_unref (dialog);
}

static void
_rugosa_window_open (GtkWidget  *widget,
                     const char *action_name,
                     GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  GtkFileChooserNative *dialog;
  g_autoptr (GtkFileFilter) filter = _rugosa_window_project_filter ();

  dialog = gtk_file_chooser_native_new (_("Open a Project"), GTK_WINDOW (self),
                                        GTK_FILE_CHOOSER_ACTION_OPEN, _("_Open"), _("_Cancel"));
  gtk_file_chooser_add_filter (GTK_FILE_CHOOSER (dialog), filter);
  g_signal_connect (dialog, "response", G_CALLBACK (_rugosa_window_open_response), self);
  gtk_native_dialog_show (GTK_NATIVE_DIALOG (dialog));
}

static void _rugosa_window_save_as (GtkWidget *widget, const char *action_name, GVariant *param);

static void
_rugosa_window_after_save (RugosaWindow *self)
{
  if (self->close_after_save && !self->modified)
    {
      self->close_confirmed = TRUE;
      gtk_window_close (GTK_WINDOW (self));
    }
  self->close_after_save = FALSE;
}

static void
_rugosa_window_save_to (RugosaWindow *self,
                        GFile        *file)
{
  g_autoptr (GError) error = NULL;

  if (!rugosa_window_save_file_sync (self, file, &error))
    {
      g_autofree char *name = g_file_get_parse_name (file);
      g_autofree char *heading = g_strdup_printf (_("Could not save “%s”"), name);
      self->close_after_save = FALSE;
      _rugosa_window_show_error (self, heading, error->message);
      return;
    }
  _rugosa_window_toast (self, _("Saved."));
  _rugosa_window_after_save (self);
}

static void
_rugosa_window_save_as_response (GtkNativeDialog *dialog,
                                 int              response,
                                 RugosaWindow    *self)
{
  if (response == GTK_RESPONSE_ACCEPT)
    {
      g_autoptr (GFile) file = gtk_file_chooser_get_file (GTK_FILE_CHOOSER (dialog));
      g_autofree char *base = g_file_get_basename (file);

      if (!g_str_has_suffix (base, PROJECT_SUFFIX))
        {
          g_autofree char *with = g_strconcat (base, PROJECT_SUFFIX, NULL);
          g_autoptr (GFile) parent = g_file_get_parent (file);
          g_autoptr (GFile) fixed = g_file_get_child (parent, with);
          _rugosa_window_save_to (self, fixed);
        }
      else
        _rugosa_window_save_to (self, file);
    }
  else
    self->close_after_save = FALSE;
  g_object_unref (dialog);
}

static void
_rugosa_window_save_as (GtkWidget  *widget,
                        const char *action_name,
                        GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  GtkFileChooserNative *dialog;
  g_autoptr (GtkFileFilter) filter = _rugosa_window_project_filter ();

  dialog = gtk_file_chooser_native_new (_("Save the Project"), GTK_WINDOW (self),
                                        GTK_FILE_CHOOSER_ACTION_SAVE, _("_Save"), _("_Cancel"));
  gtk_file_chooser_add_filter (GTK_FILE_CHOOSER (dialog), filter);
  if (self->file)
    gtk_file_chooser_set_file (GTK_FILE_CHOOSER (dialog), self->file, NULL);
  else
    gtk_file_chooser_set_current_name (GTK_FILE_CHOOSER (dialog), _("Line options.rugosa"));
  g_signal_connect (dialog, "response", G_CALLBACK (_rugosa_window_save_as_response), self);
  gtk_native_dialog_show (GTK_NATIVE_DIALOG (dialog));
}

static void
_rugosa_window_save (GtkWidget  *widget,
                     const char *action_name,
                     GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);

  if (self->file == NULL)
    _rugosa_window_save_as (widget, action_name, param);
  else
    _rugosa_window_save_to (self, self->file);
}

static void
_rugosa_window_new (GtkWidget  *widget,
                    const char *action_name,
                    GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  GtkApplication *app = gtk_window_get_application (GTK_WINDOW (self));
  RugosaWindow *w = rugosa_window_new (RUGOSA_APPLICATION (app));

  gtk_window_present (GTK_WINDOW (w));
}

static void
_rugosa_window_open_recent (GtkWidget  *widget,
                            const char *action_name,
                            GVariant   *param)
{
  RugosaWindow *self = RUGOSA_WINDOW (widget);
  g_autoptr (GFile) file = g_file_new_for_uri (g_variant_get_string (param, NULL));

  if (rugosa_window_is_pristine (self))
    rugosa_window_load_file (self, file);
  else
    g_application_open (g_application_get_default (), &file, 1, "new-window");
}

static gint
_rugosa_window_recent_newer (gconstpointer a,
                             gconstpointer b)
{
  GtkRecentInfo *ia = *(GtkRecentInfo **) a;
  GtkRecentInfo *ib = *(GtkRecentInfo **) b;
  GDateTime *ta = gtk_recent_info_get_modified (ia);
  GDateTime *tb = gtk_recent_info_get_modified (ib);

  return g_date_time_compare (tb, ta);
}

static void
_rugosa_window_fill_recent (RugosaWindow *self)
{
  GList *items = gtk_recent_manager_get_items (gtk_recent_manager_get_default ());
  g_autoptr (GPtrArray) ours = g_ptr_array_new ();
  guint shown = 0;

  g_menu_remove_all (self->recent_section);
  for (GList *l = items; l; l = l->next)
    if (g_str_has_suffix (gtk_recent_info_get_uri (l->data), PROJECT_SUFFIX)
        && gtk_recent_info_exists (l->data))
      g_ptr_array_add (ours, l->data);
  g_ptr_array_sort (ours, _rugosa_window_recent_newer);
  for (guint i = 0; i < ours->len && shown < 8; i++, shown++)
    {
      GtkRecentInfo *info = g_ptr_array_index (ours, i);
      g_autoptr (GMenuItem) item = g_menu_item_new (gtk_recent_info_get_display_name (info), NULL);

      g_menu_item_set_action_and_target_value (item, "win.open-recent",
                                               g_variant_new_string (gtk_recent_info_get_uri (info)));
      g_menu_append_item (self->recent_section, item);
    }
  if (shown == 0)
    {
      g_autoptr (GMenuItem) item = g_menu_item_new (_("No recent projects"), "win.none");
      g_menu_append_item (self->recent_section, item);
    }
  g_list_free_full (items, (GDestroyNotify) gtk_recent_info_unref);
}

static void
_rugosa_window_recent_changed (GtkRecentManager *manager,
                               RugosaWindow     *self)
{
  _rugosa_window_fill_recent (self);
}

/* --- drop ------------------------------------------------------------ */

static gboolean
_rugosa_window_drop (GtkDropTarget *target,
                     const GValue  *value,
                     double         x,
                     double         y,
                     RugosaWindow  *self)
{
  GSList *files;

  if (!G_VALUE_HOLDS (value, GDK_TYPE_FILE_LIST))
    return FALSE;
  files = g_value_get_boxed (value);
  for (GSList *l = files; l; l = l->next)
    {
      GFile *file = l->data;
      if (l == files && rugosa_window_is_pristine (self))
        rugosa_window_load_file (self, file);
      else
        g_application_open (g_application_get_default (), &file, 1, "new-window");
    }
  return files != NULL;
}

/* --- close guard ----------------------------------------------------- */

static void
_rugosa_window_close_response (AdwMessageDialog *dialog,
                               const char       *response,
                               RugosaWindow     *self)
{
  /* The dialog is closed already, but libadwaita drops its last
   * reference only after this handler returns, and GTK 4.8 keeps the
   * transient parent as a plain pointer that the dialog's dispose then
   * uses.  Discard and Save may destroy this window right here, so the
   * dialog lets go of it first. */
  gtk_window_set_transient_for (GTK_WINDOW (dialog), NULL);

  if (g_str_equal (response, "discard"))
    {
      _rugosa_window_remove_autosave (self);
      self->close_confirmed = TRUE;
      gtk_window_close (GTK_WINDOW (self));
    }
  else if (g_str_equal (response, "save"))
    {
      self->close_after_save = TRUE;
      gtk_widget_activate_action (GTK_WIDGET (self), "win.save", NULL);
    }
}

/* A value the key's range (in the schema) accepts is written; another is
 * left out rather than refused with a critical. */
static void
_rugosa_window_keep_int (RugosaWindow *self,
                         const char   *key,
                         int           value)
{
  g_autoptr (GSettingsSchema) schema = NULL;
  g_autoptr (GSettingsSchemaKey) skey = NULL;
  g_autoptr (GVariant) v = g_variant_ref_sink (g_variant_new_int32 (value));

  g_object_get (self->settings, "settings-schema", &schema, NULL);
  skey = g_settings_schema_get_key (schema, key);
  if (g_settings_schema_key_range_check (skey, v))
    g_settings_set_value (self->settings, key, v);
}

/* The window's state for the next one opened.  GTK keeps the default size
 * as the size the window last had while neither maximized nor tiled: the
 * size to come back to when unmaximized.  (The widget's own size leaves
 * out the window's shadow, and writing it shrank the window each
 * session.) */
static void
_rugosa_window_keep_state (RugosaWindow *self)
{
  int width = 0, height = 0;

  gtk_window_get_default_size (GTK_WINDOW (self), &width, &height);
  _rugosa_window_keep_int (self, "window-width", width);
  _rugosa_window_keep_int (self, "window-height", height);
  g_settings_set_boolean (self->settings, "window-maximized", gtk_window_is_maximized (GTK_WINDOW (self)));
}

static gboolean
_rugosa_window_close_request (GtkWindow *window,
                              gpointer   user_data)
{
  RugosaWindow *self = RUGOSA_WINDOW (window);
  GtkWidget *dialog;
  g_autofree char *name = NULL;

  if (!self->modified || self->close_confirmed)
    {
      if (!self->modified)
        _rugosa_window_remove_autosave (self);
      _rugosa_window_keep_state (self);
      return FALSE;
    }

  name = self->file ? g_file_get_basename (self->file) : g_strdup (_("this project"));
  dialog = adw_message_dialog_new (window, _("Save changes before closing?"), NULL);
  adw_message_dialog_format_body (ADW_MESSAGE_DIALOG (dialog),
                                  _("Changes to %s since it was last saved will be lost otherwise."), name);
  adw_message_dialog_add_responses (ADW_MESSAGE_DIALOG (dialog),
                                    "cancel", _("_Cancel"),
                                    "discard", _("_Discard Changes"),
                                    "save", _("_Save"),
                                    NULL);
  adw_message_dialog_set_response_appearance (ADW_MESSAGE_DIALOG (dialog), "discard", ADW_RESPONSE_DESTRUCTIVE);
  adw_message_dialog_set_response_appearance (ADW_MESSAGE_DIALOG (dialog), "save", ADW_RESPONSE_SUGGESTED);
  adw_message_dialog_set_default_response (ADW_MESSAGE_DIALOG (dialog), "save");
  adw_message_dialog_set_close_response (ADW_MESSAGE_DIALOG (dialog), "cancel");
  g_signal_connect (dialog, "response", G_CALLBACK (_rugosa_window_close_response), self);
  gtk_window_present (GTK_WINDOW (dialog));
  return TRUE;
}

/* --- recovery -------------------------------------------------------- */

/* The project file a copy came from (its ".origin"), read within bounds:
 * the folder is shared with other instances and other programs.  NULL
 * for an unnamed project or a file that is no name. */
static char *
_rugosa_window_read_origin (const char *copy)
{
  g_autofree char *meta = _rugosa_window_meta_path (copy);
  g_autofree char *origin = NULL;
  gsize length;

  if (!rugosa_file_read_bounded (meta, 64 * 1024, &origin, &length, NULL)
      || length == 0 || strlen (origin) != length || !g_utf8_validate (origin, -1, NULL))
    return NULL;
  return g_steal_pointer (&origin);
}

/* Whether an open window of this instance writes its copy to `path`. */
static gboolean
_rugosa_window_copy_is_open (const char *path)
{
  GApplication *app = g_application_get_default ();

  if (!GTK_IS_APPLICATION (app))
    return FALSE;
  for (GList *l = gtk_application_get_windows (GTK_APPLICATION (app)); l; l = l->next)
    if (RUGOSA_IS_WINDOW (l->data))
      {
        g_autofree char *own = rugosa_window_autosave_path (RUGOSA_WINDOW (l->data));
        if (g_str_equal (own, path))
          return TRUE;
      }
  return FALSE;
}

/* A copy that no running instance owns, claimed (see above), or NULL.
 * A copy of this instance's that no open window writes is offered too (a
 * window closed without its guard). */
static RugosaRecoveryClaim *
_rugosa_window_find_leftover (void)
{
  g_autofree char *dir = _rugosa_window_recovery_dir ();
  g_autoptr (GDir) d = g_dir_open (dir, 0, NULL);
  const char *name;

  if (d == NULL)
    return NULL;
  while ((name = g_dir_read_name (d)) != NULL)
    if (g_str_has_suffix (name, PROJECT_SUFFIX))
      {
        g_autofree char *path = g_build_filename (dir, name, NULL);
        g_autofree char *owner = _rugosa_recovery_copy_owner (name);
        g_autofree char *lock = NULL;
        RugosaRecoveryClaim *claim;
        int fd = -1;

        if (!g_file_test (path, G_FILE_TEST_IS_REGULAR) || owner == NULL)
          continue;
        if (g_str_equal (owner, _rugosa_recovery_owner_id ()))
          {
            if (_rugosa_window_copy_is_open (path))
              continue;
            g_clear_pointer (&owner, g_free);
          }
        else
          {
            lock = _rugosa_recovery_lock_path (owner);
            /* Held: its owner runs (or another instance offers it). */
            if ((fd = _rugosa_recovery_lock (lock, FALSE)) < 0)
              continue;
          }
        claim = g_new0 (RugosaRecoveryClaim, 1);
        claim->path = g_steal_pointer (&path);
        claim->owner = g_steal_pointer (&owner);
        claim->fd = fd;
        return claim;
      }
  return NULL;
}

static void
_rugosa_window_recovery_response (AdwMessageDialog *dialog,
                                  const char       *response,
                                  RugosaWindow     *self)
{
  RugosaRecoveryClaim *claim = g_object_get_data (G_OBJECT (dialog), "claim");
  const char *path = claim->path;
  g_autofree char *meta = _rugosa_window_meta_path (path);
  g_autofree char *origin = NULL;
  g_autoptr (GError) error = NULL;

  if (g_str_equal (response, "recover"))
    {
      if (!rugosa_project_load (self->project, path, &error))
        {
          _rugosa_window_show_error (self, _("Could not recover the unsaved work"), error->message);
          return;
        }
      _rugosa_window_project_replaced (self);
      if ((origin = _rugosa_window_read_origin (path)) != NULL)
        {
          g_autoptr (GFile) file = g_file_new_for_path (origin);
          _rugosa_window_set_file (self, file);
        }
      _rugosa_window_mark_modified (self);
      /* The copy becomes this window's own autosave.  The old one goes
       * only once the new one is written: until then it is the only copy
       * on disk. */
      if (!rugosa_window_autosave_now (self, &error))
        {
          g_message ("The recovered work stays in %s: %s", path, error->message);
          return;
        }
    }
  if (!g_str_equal (response, "later"))
    {
      g_unlink (path);
      g_unlink (meta);
    }
}

gboolean
rugosa_window_recovery_pending (void)
{
  RugosaRecoveryClaim *claim = _rugosa_window_find_leftover ();

  if (claim == NULL)
    return FALSE;
  _rugosa_recovery_claim_free (claim);
  return TRUE;
}

void
rugosa_window_offer_recovery (RugosaWindow *self)
{
  RugosaRecoveryClaim *claim = _rugosa_window_find_leftover ();
  g_autofree char *origin = NULL;
  GtkWidget *dialog;

  if (claim == NULL)
    return;
  origin = _rugosa_window_read_origin (claim->path);

  dialog = adw_message_dialog_new (GTK_WINDOW (self), _("Recover unsaved work?"), NULL);
  if (origin && *origin)
    adw_message_dialog_format_body (ADW_MESSAGE_DIALOG (dialog),
                                    _("Rugosa did not close normally last time. Changes to %s were kept "
                                      "in a recovery copy."), origin);
  else
    adw_message_dialog_set_body (ADW_MESSAGE_DIALOG (dialog),
                                 _("Rugosa did not close normally last time. An unsaved project was kept "
                                   "in a recovery copy."));
  adw_message_dialog_add_responses (ADW_MESSAGE_DIALOG (dialog),
                                    "discard", _("_Discard"),
                                    "recover", _("_Recover"),
                                    NULL);
  adw_message_dialog_set_response_appearance (ADW_MESSAGE_DIALOG (dialog), "discard", ADW_RESPONSE_DESTRUCTIVE);
  adw_message_dialog_set_response_appearance (ADW_MESSAGE_DIALOG (dialog), "recover", ADW_RESPONSE_SUGGESTED);
  adw_message_dialog_set_default_response (ADW_MESSAGE_DIALOG (dialog), "recover");
  adw_message_dialog_set_close_response (ADW_MESSAGE_DIALOG (dialog), "later");
  /* The claim is held until the dialog goes, answered or not. */
  g_object_set_data_full (G_OBJECT (dialog), "claim", claim,
                          (GDestroyNotify) _rugosa_recovery_claim_free);
  g_signal_connect (dialog, "response", G_CALLBACK (_rugosa_window_recovery_response), self);
  gtk_window_present (GTK_WINDOW (dialog));
}

/* --- setup ----------------------------------------------------------- */

void
_rugosa_window_files_class_init (GtkWidgetClass *widget_class)
{
  gtk_widget_class_install_action (widget_class, "win.new", NULL, _rugosa_window_new);
  gtk_widget_class_install_action (widget_class, "win.open", NULL, _rugosa_window_open);
  gtk_widget_class_install_action (widget_class, "win.open-recent", "s", _rugosa_window_open_recent);
  gtk_widget_class_install_action (widget_class, "win.save", NULL, _rugosa_window_save);
  gtk_widget_class_install_action (widget_class, "win.save-as", NULL, _rugosa_window_save_as);
}

void
_rugosa_window_files_init (RugosaWindow *self)
{
  GtkDropTarget *drop;
  static guint counter;

  /* Unique among windows and instances: one recovery copy per window,
   * named after the instance that owns it (see above). */
  self->autosave_id = g_strdup_printf (COPY_PREFIX "%s-%u", _rugosa_recovery_owner_id (), ++counter);

  drop = gtk_drop_target_new (GDK_TYPE_FILE_LIST, GDK_ACTION_COPY);
  g_signal_connect (drop, "drop", G_CALLBACK (_rugosa_window_drop), self);
  gtk_widget_add_controller (GTK_WIDGET (self), GTK_EVENT_CONTROLLER (drop));

  g_signal_connect (self, "close-request", G_CALLBACK (_rugosa_window_close_request), NULL);
  g_signal_connect_object (gtk_recent_manager_get_default (), "changed",
                           G_CALLBACK (_rugosa_window_recent_changed), self, 0);
  _rugosa_window_fill_recent (self);
}

void
_rugosa_window_files_dispose (RugosaWindow *self)
{
  g_clear_handle_id (&self->autosave_source, g_source_remove);
}
