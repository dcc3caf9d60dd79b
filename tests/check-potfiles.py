#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""Keeps po/POTFILES.in complete and true.

Run: check-potfiles.py SOURCE_ROOT

Fails when a file with strings marked for translation is not listed in
po/POTFILES.in, when POTFILES.in names a file that does not exist or names a
file twice, or when xgettext (with the keywords of Meson's 'glib' preset)
cannot extract the listed files or finds nothing in a listed file that has
marked strings.  A self-test first runs the same scanner on small made-up
trees, so a scanner that stopped seeing marks would fail here too.

Marked strings:
  C sources under src/      _("…"), N_("…"), C_("…"), NC_("…"), ngettext ("…"),
                            g_dngettext, g_dpgettext2, g_dcgettext — outside
                            comments, with or without a space before "(";
                            and the format of rg_error_set (err, STATUS, "…"),
                            rg_error_set_on (err, STATUS, SUBJECTS, "…")
                            and rg_warnings_add (w, "…"), which the core
                            translates, and the core's table marks
                            RG_N_ ("…")
  GtkBuilder files (ui/, src/)  translatable="yes"
  data/*.desktop.in         always (Name, GenericName, Comment, Keywords)
  data/*.metainfo.xml.in    always (name, summary, description)
  data/*.gschema.xml        when it has <summary> or <description>
  data/*.xml with <mime-info>  when it has <comment>
"""
import os
import re
import shutil
import subprocess
import sys
import tempfile

C_MARK = re.compile(
    r'(?<![A-Za-z0-9_])(?:_|N_|C_|NC_|ngettext|g_dngettext|g_dpgettext2|g_dcgettext)'
    r'\s*\(\s*(?:[A-Za-z_][A-Za-z0-9_]*\s*,\s*)?"'
    # the core translates inside these (src/core/status.c; po/meson.build)
    r'|(?<![A-Za-z0-9_])(?:rg_gettext|RG_N_)\s*\(\s*"'
    r'|(?<![A-Za-z0-9_])(?:rg_error_set\s*\([^,;()"]*,[^,;()"]*,|rg_warnings_add\s*\([^,;()"]*,)'
    r'\s*"'
    # rg_error_set_on: the subjects may hold calls and parentheses
    r'|(?<![A-Za-z0-9_])rg_error_set_on\s*\([^;"]*?,[^;"]*?,[^;"]*?,\s*"')
UI_MARK = re.compile(r'translatable\s*=\s*["\']yes["\']')

# The keywords of Meson's i18n 'glib' preset (mesonbuild/modules/i18n.py).
XGETTEXT_ARGS = [
    '--from-code=UTF-8', '--add-comments',
    '--keyword=_', '--keyword=N_', '--keyword=C_:1c,2', '--keyword=NC_:1c,2',
    '--keyword=g_dcgettext:2', '--keyword=g_dngettext:2,3',
    '--keyword=g_dpgettext2:2c,3',
    '--flag=N_:1:pass-c-format', '--flag=C_:2:pass-c-format',
    '--flag=NC_:2:pass-c-format', '--flag=g_dngettext:2:pass-c-format',
    '--flag=g_strdup_printf:1:c-format', '--flag=g_string_printf:2:c-format',
    '--flag=g_string_append_printf:2:c-format', '--flag=g_error_new:3:c-format',
    '--flag=g_set_error:4:c-format',
    # po/meson.build adds these for the core
    '--keyword=rg_error_set:3', '--keyword=rg_error_set_on:4',
    '--keyword=rg_warnings_add:2', '--keyword=rg_gettext', '--keyword=RG_N_',
]

passed = 0
failed = 0


def check(name, ok, detail=""):
    global passed, failed
    if ok:
        passed += 1
    else:
        failed += 1
        print(f"FAIL {name}" + (f": {detail}" if detail else ""))


def strip_c_comments(text):
    """The C text with comments removed and the insides of string and
    character literals blanked (their quotes kept), so that only code can
    hold a mark."""
    out = []
    i, n = 0, len(text)
    while i < n:
        c = text[i]
        if c == '/' and text.startswith('/*', i):
            j = text.find('*/', i + 2)
            j = n if j < 0 else j + 2
            out.append(' ')
            i = j
        elif c == '/' and text.startswith('//', i):
            j = text.find('\n', i)
            i = n if j < 0 else j
        elif c in '"\'':
            j = i + 1
            while j < n and text[j] != c:
                j += 2 if text[j] == '\\' else 1
            out.append(c + ' ' * (min(j, n) - i - 1) + (c if j < n else ''))
            i = j + 1
        else:
            out.append(c)
            i += 1
    return ''.join(out)


def has_marks(root, rel):
    path = os.path.join(root, rel)
    try:
        with open(path, encoding='utf-8', errors='replace') as f:
            text = f.read()
    except OSError:
        return False
    name = os.path.basename(rel)
    if name.endswith(('.c', '.h')):
        return C_MARK.search(strip_c_comments(text)) is not None
    if name.endswith('.ui'):
        return UI_MARK.search(text) is not None
    if name.endswith(('.desktop.in', '.metainfo.xml.in')):
        return True
    if name.endswith(('.gschema.xml', '.gschema.xml.in')):
        return re.search(r'<(summary|description)[\s>]', text) is not None
    if name.endswith(('.xml', '.xml.in')) and '<mime-info' in text:
        return re.search(r'<comment[\s>]', text) is not None
    return False


def candidates(root):
    """Source-root-relative paths of every file that could hold marks."""
    found = []
    for top, exts in (('src', ('.c', '.h', '.ui')), ('ui', ('.ui',))):
        for dirpath, dirnames, filenames in os.walk(os.path.join(root, top)):
            dirnames.sort()
            for fn in sorted(filenames):
                if fn.endswith(exts):
                    found.append(os.path.relpath(os.path.join(dirpath, fn), root))
    data = os.path.join(root, 'data')
    if os.path.isdir(data):
        for fn in sorted(os.listdir(data)):
            if fn.endswith(('.desktop.in', '.metainfo.xml.in', '.gschema.xml',
                            '.gschema.xml.in', '.xml', '.xml.in')):
                found.append(os.path.join('data', fn))
    return found


def read_potfiles(root):
    entries = []
    with open(os.path.join(root, 'po', 'POTFILES.in'), encoding='utf-8') as f:
        for line in f:
            line = line.strip()
            if line and not line.startswith('#'):
                entries.append(line)
    return entries


def problems(root):
    """The list of problems of the tree at `root` (empty when it is fine)."""
    out = []
    entries = read_potfiles(root)
    seen = set()
    for e in entries:
        if e in seen:
            out.append(f"{e} is listed twice in po/POTFILES.in")
        seen.add(e)
        if not os.path.isfile(os.path.join(root, e)):
            out.append(f"po/POTFILES.in names {e}, which does not exist")
    for rel in candidates(root):
        if has_marks(root, rel) and rel not in seen:
            out.append(f"{rel} has strings marked for translation but is not in po/POTFILES.in")
    return out


def self_test():
    """The scanner on made-up trees: each planted fault must be reported."""
    def tree(files):
        d = tempfile.mkdtemp(prefix='rugosa-potfiles-')
        for rel, text in files.items():
            p = os.path.join(d, rel)
            os.makedirs(os.path.dirname(p), exist_ok=True)
            with open(p, 'w', encoding='utf-8') as f:
                f.write(text)
        return d

    cases = [
        # (name, files, expected substrings of problems; [] = clean)
        ('clean tree', {
            'po/POTFILES.in': 'src/app/a.c\n',
            'src/app/a.c': 'x = _("Open");\n',
        }, []),
        ('GNU spacing before the parenthesis', {
            'po/POTFILES.in': '',
            'src/app/a.c': 'x = _ ("Open");\n',
        }, ['src/app/a.c has strings marked']),
        ('N_ and C_ marks', {
            'po/POTFILES.in': '',
            'src/model/m.c': 'static const char *k = N_("Water");\n',
            'src/cli/c.c': 'puts (C_("unit", "m"));\n',
        }, ['src/cli/c.c has strings marked', 'src/model/m.c has strings marked']),
        ('core messages through rg_error_set and rg_warnings_add', {
            'po/POTFILES.in': '',
            'src/core/f.c': 'return rg_error_set (err, RG_ERR_DOMAIN,\n    "Re must be positive.");\n',
            'src/core/g.c': 'rg_warnings_add (w, "Outside the range.");\n',
        }, ['src/core/f.c has strings marked', 'src/core/g.c has strings marked']),
        ('core messages with subjects, and the marks of the core\'s tables', {
            'po/POTFILES.in': '',
            'src/core/h.c': 'return rg_error_set_on (err, RG_ERR_DOMAIN, RG_ON (FLOW) | f (x),\n'
                            '    "The flow must be positive.");\n',
            'src/core/k.c': 'static const char *const N[] = { RG_N_ ("flow") };\n',
        }, ['src/core/h.c has strings marked', 'src/core/k.c has strings marked']),
        ('marks inside comments only', {
            'po/POTFILES.in': '',
            'src/app/a.c': '/* wrap with _("…") */\n// N_("x")\nx = rg_foo_(1);\n',
        }, []),
        ('a mark-like text inside a string literal is not a mark', {
            'po/POTFILES.in': '',
            'src/app/a.c': 'puts ("use _(\\"text\\") to mark");\n',
        }, []),
        ('translatable ui file', {
            'po/POTFILES.in': '',
            'ui/w.ui': '<object><property name="title" translatable="yes">Rugosa</property></object>\n',
        }, ['ui/w.ui has strings marked']),
        ('schema with a summary', {
            'po/POTFILES.in': '',
            'data/x.gschema.xml': '<schemalist><schema><key><summary>S</summary></key></schema></schemalist>\n',
        }, ['data/x.gschema.xml has strings marked']),
        ('desktop file always needs listing', {
            'po/POTFILES.in': '',
            'data/x.desktop.in': '[Desktop Entry]\nName=X\n',
        }, ['data/x.desktop.in has strings marked']),
        ('listed file that does not exist', {
            'po/POTFILES.in': 'src/app/gone.c\n',
        }, ['names src/app/gone.c, which does not exist']),
        ('listed twice', {
            'po/POTFILES.in': 'src/app/a.c\nsrc/app/a.c\n',
            'src/app/a.c': 'x = _("Open");\n',
        }, ['listed twice']),
    ]
    for name, files, expected in cases:
        d = tree(files)
        try:
            got = problems(d)
        finally:
            shutil.rmtree(d)
        if not expected:
            check(f"self-test: {name}", got == [], "; ".join(got))
        else:
            ok = len(got) == len(expected) and all(
                any(e in g for g in got) for e in expected)
            check(f"self-test: {name}", ok, "; ".join(got) or "nothing reported")


def extraction(root):
    """xgettext over POTFILES.in: it must succeed and extract every listed
    file that has marks."""
    xgettext = shutil.which('xgettext')
    if xgettext is None:
        print("# xgettext not found: extraction not checked")
        return
    entries = [e for e in read_potfiles(root) if os.path.isfile(os.path.join(root, e))]
    with tempfile.TemporaryDirectory(prefix='rugosa-pot-') as tmp:
        pot = os.path.join(tmp, 'rugosa.pot')
        p = subprocess.run([xgettext, '--package-name=rugosa', '--directory', root,
                            '--output', pot, *XGETTEXT_ARGS, *entries],
                           capture_output=True, text=True, timeout=60)
        check("xgettext extracts POTFILES.in", p.returncode == 0, p.stderr.strip())
        text = ''
        if os.path.exists(pot):
            with open(pot, encoding='utf-8') as f:
                text = f.read()
        for e in entries:
            if has_marks(root, e):
                check(f"xgettext finds strings in {e}", f"#: {e}:" in text or f" {e}:" in text,
                      "no message refers to this file")
        if os.path.isfile(os.path.join(root, 'data', 'org.rugosa.Rugosa.metainfo.xml.in')):
            # The caution must reach translators with the rest of the description.
            check("the caution in the metainfo is translatable",
                  'qualified, licensed engineer' in text)


def main():
    if len(sys.argv) != 2:
        print("usage: check-potfiles.py SOURCE_ROOT", file=sys.stderr)
        return 2
    root = sys.argv[1]
    self_test()
    for p in problems(root):
        check("POTFILES.in", False, p)
    check("POTFILES.in matches the sources", not problems(root))
    extraction(root)
    print(f"{passed} passed, {failed} failed")
    return 1 if failed else 0


if __name__ == '__main__':
    sys.exit(main())
