/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Reading a project file: from the path to a checked JSON tree.
 *
 * The file is opened without blocking and checked to be a regular file of
 * at most RUGOSA_FILE_MAX_BYTES before a byte is read (a FIFO, a device or
 * a directory is refused with one sentence, so nothing can hang or fill the
 * memory), then read up to that limit.  Its text is checked, in order:
 * size, encoding (UTF-8, no NUL byte), nesting depth, JSON syntax (line and
 * column), duplicate keys.  The tree then goes to the loader
 * (rugosa-project-load.c), which builds a new project; the open one is
 * replaced only on success. */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <errno.h>
#include <fcntl.h>
#include <string.h>
#include <sys/stat.h>
#include <unistd.h>

#include "rugosa-project-io-private.h"

/* ---- where an error is ---- */

gboolean
_rugosa_json_fail (RugosaJsonCtx *ctx, int code, const char *fmt, ...)
{
  va_list ap;
  g_autofree char *msg = NULL;

  va_start (ap, fmt);
  msg = g_strdup_vprintf (fmt, ap);
  va_end (ap);
  if (ctx->path->len > 0)
    g_set_error (ctx->error, RUGOSA_PROJECT_ERROR, code, "%s: %s",
                 ctx->path->str, msg);
  else
    g_set_error_literal (ctx->error, RUGOSA_PROJECT_ERROR, code, msg);
  return FALSE;
}

gsize
_rugosa_json_push_key (RugosaJsonCtx *ctx, const char *key)
{
  gsize len = ctx->path->len;

  if (len > 0)
    g_string_append_c (ctx->path, '.');
  g_string_append (ctx->path, key);
  return len;
}

gsize
_rugosa_json_push_index (RugosaJsonCtx *ctx, int index)
{
  gsize len = ctx->path->len;

  g_string_append_printf (ctx->path, "[%d]", index);
  return len;
}

void
_rugosa_json_pop (RugosaJsonCtx *ctx, gsize len)
{
  g_string_truncate (ctx->path, len);
}

const char *
_rugosa_json_type_name (const cJSON *v)
{
  /* TRANSLATORS: the kinds of JSON value, in "expected a number, found %s" */
  if (cJSON_IsNumber (v)) return _("a number");
  if (cJSON_IsString (v)) return _("a string");
  if (cJSON_IsBool (v)) return _("true or false");
  if (cJSON_IsNull (v)) return _("null");
  if (cJSON_IsArray (v)) return _("an array");
  return _("an object");
}

/* ---- checks before and after parsing ---- */

static void
line_column (const char *data, gsize offset, int *line, int *column)
{
  *line = 1;
  *column = 1;
  for (gsize i = 0; i < offset; i++)
    {
      if (data[i] == '\n')
        {
          (*line)++;
          *column = 1;
        }
      else if (((unsigned char) data[i] & 0xC0) != 0x80)
        (*column)++;
    }
}

/* The deepest nesting of [ and { outside strings; stops at the limit + 1
 * and reports where. */
static gboolean
check_depth (const char *data, gsize length, gsize *where, gboolean *unclosed)
{
  int depth = 0;
  gboolean in_string = FALSE;

  for (gsize i = 0; i < length; i++)
    {
      char c = data[i];

      if (in_string)
        {
          if (c == '\\')
            i++;
          else if (c == '"')
            in_string = FALSE;
        }
      else if (c == '"')
        in_string = TRUE;
      else if (c == '[' || c == '{')
        {
          if (++depth > RUGOSA_FILE_MAX_DEPTH)
            {
              *where = i;
              return FALSE;
            }
        }
      else if (c == ']' || c == '}')
        depth--;
    }
  /* An open string or bracket at the end: the text was cut short. */
  *unclosed = in_string || depth > 0;
  return TRUE;
}

/* Refuse repeated keys anywhere in the tree (cJSON keeps both and a lookup
 * finds the first, which would silently ignore the second). */
static gboolean
check_duplicates (RugosaJsonCtx *ctx, const cJSON *node)
{
  if (cJSON_IsObject (node))
    {
      g_autoptr (GHashTable) seen = g_hash_table_new (g_str_hash, g_str_equal);

      for (const cJSON *m = node->child; m != NULL; m = m->next)
        {
          if (!g_hash_table_add (seen, m->string))
            return _rugosa_json_fail (ctx, RUGOSA_PROJECT_ERROR_FORMAT,
                                      _("the key \"%s\" appears more than once"),
                                      m->string);
          gsize len = _rugosa_json_push_key (ctx, m->string);
          if (!check_duplicates (ctx, m))
            return FALSE;
          _rugosa_json_pop (ctx, len);
        }
    }
  else if (cJSON_IsArray (node))
    {
      int i = 0;

      for (const cJSON *m = node->child; m != NULL; m = m->next, i++)
        {
          gsize len = _rugosa_json_push_index (ctx, i);
          if (!check_duplicates (ctx, m))
            return FALSE;
          _rugosa_json_pop (ctx, len);
        }
    }
  return TRUE;
}

cJSON *
_rugosa_project_parse (const char *data, gsize length, GError **error)
{
  g_autoptr (GString) path = g_string_new (NULL);
  RugosaJsonCtx ctx = { path, error };
  g_autofree char *copy = NULL;
  const char *text = data, *end = NULL;
  const char *bad = NULL;
  cJSON *root;
  gsize where, blank = 0;
  gboolean unclosed = FALSE;
  int line, column;

  /* A UTF-8 byte order mark is allowed and skipped. */
  if (length >= 3 && memcmp (data, "\xEF\xBB\xBF", 3) == 0)
    {
      text += 3;
      length -= 3;
    }
  if (length > RUGOSA_FILE_MAX_BYTES)
    {
      _rugosa_json_fail (&ctx, RUGOSA_PROJECT_ERROR_ENCODING,
                         _("The file is larger than %d MiB: it is not a Rugosa project."),
                         RUGOSA_FILE_MAX_BYTES / (1024 * 1024));
      return NULL;
    }
  while (blank < length && g_ascii_isspace (text[blank]))
    blank++;
  if (blank == length)
    {
      _rugosa_json_fail (&ctx, RUGOSA_PROJECT_ERROR_ENCODING, _("The file is empty."));
      return NULL;
    }
  if (!g_utf8_validate (text, (gssize) length, &bad))
    {
      line_column (text, (gsize) (bad - text), &line, &column);
      if (*bad == '\0')
        _rugosa_json_fail (&ctx, RUGOSA_PROJECT_ERROR_ENCODING,
                           _("The file holds a NUL byte at line %d, column %d: it is not a text file."),
                           line, column);
      else
        _rugosa_json_fail (&ctx, RUGOSA_PROJECT_ERROR_ENCODING,
                           _("The file is not valid UTF-8 text (line %d, column %d)."),
                           line, column);
      return NULL;
    }
  if (!check_depth (text, length, &where, &unclosed))
    {
      line_column (text, where, &line, &column);
      _rugosa_json_fail (&ctx, RUGOSA_PROJECT_ERROR_SYNTAX,
                         _("The JSON is nested deeper than %d levels at line %d, column %d."),
                         RUGOSA_FILE_MAX_DEPTH, line, column);
      return NULL;
    }

  /* cJSON needs the terminating NUL inside the length it is given to
   * check that nothing follows the value. */
  copy = g_malloc (length + 1);
  memcpy (copy, text, length);
  copy[length] = '\0';
  root = cJSON_ParseWithLengthOpts (copy, length + 1, &end, 1);
  if (root == NULL)
    {
      gsize offset = end != NULL ? (gsize) (end - copy) : 0;

      if (unclosed)
        offset = length;
      line_column (copy, MIN (offset, length), &line, &column);
      if (offset >= length)
        _rugosa_json_fail (&ctx, RUGOSA_PROJECT_ERROR_SYNTAX,
                           _("The JSON text ends too early at line %d, column %d (is the file truncated?)."),
                           line, column);
      else
        _rugosa_json_fail (&ctx, RUGOSA_PROJECT_ERROR_SYNTAX,
                           _("The file is not valid JSON: unexpected text at line %d, column %d."),
                           line, column);
      return NULL;
    }
  if (!check_duplicates (&ctx, root))
    {
      cJSON_Delete (root);
      return NULL;
    }
  return root;
}

RugosaProject *
rugosa_project_new_from_data (const char *data, gsize length, GError **error)
{
  g_autoptr (GString) path = g_string_new (NULL);
  RugosaJsonCtx ctx = { path, error };
  g_autoptr (RugosaProject) project = NULL;
  cJSON *root;

  g_return_val_if_fail (data != NULL || length == 0, NULL);

  if ((root = _rugosa_project_parse (data, length, error)) == NULL)
    return NULL;
  project = rugosa_project_new ();
  if (!_rugosa_project_load_tree (&ctx, root, project))
    {
      cJSON_Delete (root);
      return NULL;
    }
  cJSON_Delete (root);
  return g_steal_pointer (&project);
}

/* Read at most `limit` bytes of a regular file without blocking on a FIFO
 * or device; the error says in one sentence why not. */
static gboolean
read_bounded (const char *path, gsize limit, char **data, gsize *length,
              GError **error)
{
  g_autofree char *display = g_filename_display_basename (path);
  g_autofree char *buf = NULL;
  struct stat st;
  gsize done = 0;
  int fd;

  fd = open (path, O_RDONLY | O_NONBLOCK | O_CLOEXEC | O_NOCTTY);
  if (fd < 0)
    {
      int errsv = errno;
      g_set_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_IO,
                   _("Cannot read “%s”: %s."), display, g_strerror (errsv));
      return FALSE;
    }
  if (fstat (fd, &st) != 0)
    {
      int errsv = errno;
      close (fd);
      g_set_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_IO,
                   _("Cannot read “%s”: %s."), display, g_strerror (errsv));
      return FALSE;
    }
  if (!S_ISREG (st.st_mode))
    {
      close (fd);
      g_set_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_IO,
                   S_ISDIR (st.st_mode)
                     ? _("Cannot read “%s”: it is a folder, not a project file.")
                     : _("Cannot read “%s”: it is not a regular file (a pipe, a device or a socket)."),
                   display);
      return FALSE;
    }
  if ((guint64) st.st_size > limit)
    {
      close (fd);
      g_set_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_ENCODING,
                   _("“%s” is larger than %d MiB: it is not a Rugosa project."),
                   display, (int) (limit / (1024 * 1024)));
      return FALSE;
    }
  /* The size may change while reading: never take more than the limit. */
  buf = g_malloc ((gsize) st.st_size + 1);
  for (;;)
    {
      ssize_t n;

      if (done == (gsize) st.st_size)
        break;
      n = read (fd, buf + done, (gsize) st.st_size - done);
      if (n < 0 && errno == EINTR)
        continue;
      if (n < 0)
        {
          int errsv = errno;
          close (fd);
          g_set_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_IO,
                       _("Cannot read “%s”: %s."), display, g_strerror (errsv));
          return FALSE;
        }
      if (n == 0)
        break;
      done += (gsize) n;
    }
  close (fd);
  buf[done] = '\0';
  *data = g_steal_pointer (&buf);
  *length = done;
  return TRUE;
}

gboolean
rugosa_project_load (RugosaProject *self, const char *path, GError **error)
{
  g_autofree char *data = NULL;
  g_autofree char *display = NULL;
  g_autoptr (GError) local = NULL;
  g_autoptr (RugosaProject) loaded = NULL;
  gsize length;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), FALSE);
  g_return_val_if_fail (path != NULL, FALSE);

  if (!read_bounded (path, RUGOSA_FILE_MAX_BYTES, &data, &length, error))
    return FALSE;
  display = g_filename_display_basename (path);
  loaded = rugosa_project_new_from_data (data, length, &local);
  if (loaded == NULL)
    {
      g_set_error (error, RUGOSA_PROJECT_ERROR, local->code, "%s: %s",
                   display, local->message);
      return FALSE;
    }
  _rugosa_project_take_content (self, loaded);
  return TRUE;
}
