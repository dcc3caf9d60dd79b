/* SPDX-License-Identifier: GPL-3.0-or-later */
/* Reading a project file: from the path to a checked JSON tree.
 *
 * The file is read by rugosa_file_read_bounded (rugosa-file.c): opened
 * without blocking and checked to be a regular file of at most
 * RUGOSA_FILE_MAX_BYTES before a byte is read (a FIFO, a device or a
 * directory is refused with one sentence, so nothing can hang or fill the
 * memory), then read up to that limit; a stream the user named (standard
 * input) is capped while it is read.  Its text is checked, in order:
 * size, encoding (UTF-8, no NUL byte), then one pass over the text before
 * any tree is built — nesting depth, and the number of line options,
 * counted as they go by, so that a list too long is refused before it
 * costs memory — then JSON syntax (line and column), no NUL character
 * (\u0000) in any string (cJSON would cut the string there; the pass
 * above finds the string, the tree gives its path), and duplicate keys.
 * The tree then goes to the loader (rugosa-project-load.c), which builds a
 * new project; the open one is replaced only on success. */
#define G_LOG_DOMAIN "rugosa-model"

#include "config.h"

#include <glib/gi18n-lib.h>

#include <string.h>

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

gboolean
_rugosa_project_fail_lines (RugosaJsonCtx *ctx)
{
  g_string_assign (ctx->path, "lines");
  return _rugosa_json_fail (ctx, RUGOSA_PROJECT_ERROR_VALUE,
                            _("more than %d line options"), RUGOSA_FILE_MAX_LINES);
}

/* What one pass over the text finds before cJSON builds a tree. */
typedef struct {
  gsize deep_at;        /* where nesting passes the limit, or G_MAXSIZE */
  gsize lines_at;       /* where line option MAX + 1 begins, or G_MAXSIZE */
  gboolean unclosed;    /* a string or bracket still open at the end */
  gssize nul_string;    /* the first string holding \u0000, counted in
                         * document order (keys and values alike), or -1 */
} Prescan;

/* One pass outside and inside strings: the nesting depth (stops at the
 * limit + 1), the members of the top-level "lines" array (stops at the
 * comma that would start one line option too many) and the strings that
 * hold the escape \u0000.  The text need not be valid JSON yet: where it
 * is not, the syntax check that follows says so. */
static void
prescan (const char *data, gsize length, Prescan *out)
{
  char container[RUGOSA_FILE_MAX_DEPTH + 1];
  int depth = 0, lines_depth = 0;
  gboolean in_string = FALSE, expect_key = FALSE, string_is_key = FALSE;
  gboolean key_is_lines = FALSE, value_is_lines = FALSE;
  gssize strings = 0;
  gsize string_start = 0;
  guint commas = 0;

  out->deep_at = out->lines_at = G_MAXSIZE;
  out->unclosed = FALSE;
  out->nul_string = -1;
  for (gsize i = 0; i < length; i++)
    {
      char c = data[i];

      if (in_string)
        {
          if (c == '\\')
            {
              if (out->nul_string < 0 && length - i > 5
                  && memcmp (data + i + 1, "u0000", 5) == 0)
                out->nul_string = strings - 1;
              i++;
            }
          else if (c == '"')
            {
              in_string = FALSE;
              /* the raw spelling: an escaped "lines" is counted by the
               * loader instead, after parsing */
              if (string_is_key && depth == 1)
                key_is_lines = i - string_start == 5
                               && memcmp (data + string_start, "lines", 5) == 0;
            }
          continue;
        }
      switch (c)
        {
        case '"':
          in_string = TRUE;
          strings++;
          string_start = i + 1;
          string_is_key = expect_key;
          expect_key = FALSE;
          value_is_lines = FALSE;
          break;
        case ':':
          value_is_lines = depth == 1 && key_is_lines;
          key_is_lines = FALSE;
          break;
        case '[':
        case '{':
          if (++depth > RUGOSA_FILE_MAX_DEPTH)
            {
              out->deep_at = i;
              return;
            }
          container[depth] = c;
          if (c == '[' && value_is_lines)
            {
              lines_depth = depth;
              commas = 0;
            }
          value_is_lines = FALSE;
          expect_key = c == '{';
          break;
        case ']':
        case '}':
          if (depth == lines_depth)
            lines_depth = 0;
          if (depth > 0)
            depth--;
          expect_key = FALSE;
          break;
        case ',':
          if (depth > 0 && container[depth] == '{')
            expect_key = TRUE;
          /* n commas between members: n + 1 line options */
          if (lines_depth > 0 && depth == lines_depth && ++commas >= RUGOSA_FILE_MAX_LINES)
            {
              out->lines_at = i;
              return;
            }
          break;
        default:
          if (!g_ascii_isspace (c))
            value_is_lines = FALSE;
          break;
        }
    }
  /* An open string or bracket at the end: the text was cut short. */
  out->unclosed = in_string || depth > 0;
}

/* The path of the string number `*left` (document order, keys and values
 * alike) below `node`; *is_key tells which it is. */
static gboolean
find_string (RugosaJsonCtx *ctx, const cJSON *node, gssize *left,
             gboolean *is_key)
{
  if (cJSON_IsObject (node))
    {
      for (const cJSON *m = node->child; m != NULL; m = m->next)
        {
          gsize len = _rugosa_json_push_key (ctx, m->string);

          if ((*left)-- == 0)
            {
              *is_key = TRUE;
              return TRUE;
            }
          if (find_string (ctx, m, left, is_key))
            return TRUE;
          _rugosa_json_pop (ctx, len);
        }
    }
  else if (cJSON_IsArray (node))
    {
      int i = 0;

      for (const cJSON *m = node->child; m != NULL; m = m->next, i++)
        {
          gsize len = _rugosa_json_push_index (ctx, i);

          if (find_string (ctx, m, left, is_key))
            return TRUE;
          _rugosa_json_pop (ctx, len);
        }
    }
  else if (cJSON_IsString (node) && (*left)-- == 0)
    {
      *is_key = FALSE;
      return TRUE;
    }
  return FALSE;
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
  Prescan scan;
  gsize blank = 0;
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
  prescan (text, length, &scan);
  if (scan.deep_at != G_MAXSIZE)
    {
      line_column (text, scan.deep_at, &line, &column);
      _rugosa_json_fail (&ctx, RUGOSA_PROJECT_ERROR_SYNTAX,
                         _("The JSON is nested deeper than %d levels at line %d, column %d."),
                         RUGOSA_FILE_MAX_DEPTH, line, column);
      return NULL;
    }
  if (scan.lines_at != G_MAXSIZE)
    {
      _rugosa_project_fail_lines (&ctx);
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

      if (scan.unclosed)
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
  if (scan.nul_string >= 0)
    {
      gssize left = scan.nul_string;
      gboolean is_key = FALSE;

      /* The string is in the tree (the syntax is valid): its path. */
      find_string (&ctx, root, &left, &is_key);
      cJSON_Delete (root);
      if (is_key)
        _rugosa_json_fail (&ctx, RUGOSA_PROJECT_ERROR_VALUE,
                           _("the key holds a NUL character (\\u0000), which no text of a project may hold"));
      else
        _rugosa_json_fail (&ctx, RUGOSA_PROJECT_ERROR_VALUE,
                           _("the string holds a NUL character (\\u0000), which no text of a project may hold"));
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

/* The project in `data`, or a message prefixed with `display`. */
static gboolean
load_data (RugosaProject *self, const char *data, gsize length,
           const char *display, GError **error)
{
  g_autoptr (GError) local = NULL;
  g_autoptr (RugosaProject) loaded = NULL;

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

/* A reading error in the project's domain: larger than a project can be
 * is RUGOSA_PROJECT_ERROR_ENCODING, as for the text. */
static gboolean
read_failed (GError **error, GError *local, const char *display)
{
  if (g_error_matches (local, RUGOSA_FILE_ERROR, RUGOSA_FILE_ERROR_SIZE))
    g_set_error (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_ENCODING,
                 _("“%s” is larger than %d MiB: it is not a Rugosa project."),
                 display, RUGOSA_FILE_MAX_BYTES / (1024 * 1024));
  else
    g_set_error_literal (error, RUGOSA_PROJECT_ERROR, RUGOSA_PROJECT_ERROR_IO,
                         local->message);
  g_error_free (local);
  return FALSE;
}

gboolean
rugosa_project_load (RugosaProject *self, const char *path, GError **error)
{
  g_autofree char *data = NULL;
  g_autofree char *base = NULL;
  g_autofree char *display = NULL;
  GError *local = NULL;
  gsize length;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), FALSE);
  g_return_val_if_fail (path != NULL, FALSE);

  base = g_path_get_basename (path);
  display = rugosa_file_display_name (base);
  if (!rugosa_file_read_bounded (path, RUGOSA_FILE_MAX_BYTES, &data, &length, &local))
    return read_failed (error, local, display);
  return load_data (self, data, length, display, error);
}

gboolean
rugosa_project_load_stream (RugosaProject *self, int fd, const char *name,
                            GError **error)
{
  g_autofree char *data = NULL;
  g_autofree char *display = NULL;
  GError *local = NULL;
  gsize length;

  g_return_val_if_fail (RUGOSA_IS_PROJECT (self), FALSE);
  g_return_val_if_fail (fd >= 0 && name != NULL, FALSE);

  display = rugosa_file_display_name (name);
  if (!rugosa_file_read_stream (fd, name, RUGOSA_FILE_MAX_BYTES, &data, &length, &local))
    return read_failed (error, local, display);
  return load_data (self, data, length, display, error);
}
