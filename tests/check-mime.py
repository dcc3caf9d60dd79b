#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""The MIME type of project files: well-formed, complete, and resolving.

Run: check-mime.py MIME_PACKAGE_XML

Checks the shared-mime-info package with xml.etree; then, when
update-mime-database (package shared-mime-info) is present, builds a MIME
database from it in a temporary folder and checks what was written; and,
when `gio` is present too, asks GIO for the type of a few sample files with
that database first in XDG_DATA_DIRS: by name (*.rugosa) and, for a file
with an unrelated name, by content (the magic string).
"""
import os
import shutil
import subprocess
import sys
import tempfile
import xml.etree.ElementTree as ET

NS = '{http://www.freedesktop.org/standards/shared-mime-info}'
TYPE = 'application/x-rugosa-project'
MAGIC = 'rugosa-line-options'

passed = 0
failed = 0


def check(name, ok, detail=""):
    global passed, failed
    if ok:
        passed += 1
    else:
        failed += 1
        print(f"FAIL {name}" + (f": {detail}" if detail else ""))
    return ok


# A project as the format defines it (top-level "format" and "version"), with
# one invented line option.
PROJECT = ('{\n  "format": "rugosa-line-options",\n  "version": 1,\n'
           '  "lines": [ { "name": "Option A" } ]\n}\n')
OTHER_JSON = '{\n  "name": "not a project",\n  "values": [1, 2, 3]\n}\n'


def static_checks(path):
    try:
        root = ET.parse(path).getroot()
    except (ET.ParseError, OSError) as e:
        check("well-formed XML", False, str(e))
        return
    check("root element is mime-info in the shared-mime-info namespace",
          root.tag == NS + 'mime-info', root.tag)
    types = [t for t in root.findall(NS + 'mime-type') if t.get('type') == TYPE]
    if not check(f"defines {TYPE}", len(types) == 1):
        return
    t = types[0]
    check("has a comment", bool((t.findtext(NS + 'comment') or '').strip()))
    check("sub-class of application/json",
          any(s.get('type') == 'application/json' for s in t.findall(NS + 'sub-class-of')))
    check("glob *.rugosa", any(g.get('pattern') == '*.rugosa' for g in t.findall(NS + 'glob')))
    check("icon application-x-rugosa-project",
          any(i.get('name') == 'application-x-rugosa-project' for i in t.findall(NS + 'icon')))
    check("generic icon named", any(g.get('name') for g in t.findall(NS + 'generic-icon')))
    matches = [m for mg in t.findall(NS + 'magic') for m in mg.iter(NS + 'match')]
    check(f"magic matches the string {MAGIC!r} near the start",
          any(m.get('type') == 'string' and m.get('value') == MAGIC
              and int(m.get('offset', '0').split(':')[0]) == 0 for m in matches),
          str([m.attrib for m in matches]))


def gio_type(gio, env, path):
    r = subprocess.run([gio, 'info', '-a', 'standard::content-type', path],
                       capture_output=True, text=True, env=env, timeout=30)
    for line in r.stdout.splitlines():
        line = line.strip()
        if line.startswith('standard::content-type:'):
            return line.split(':', 3)[-1].strip()
    return r.stderr.strip() or '(none)'


def database_checks(path):
    umd = shutil.which('update-mime-database')
    if umd is None:
        print("# update-mime-database not found: the database is not checked")
        return
    with tempfile.TemporaryDirectory(prefix='rugosa-mime-') as tmp:
        share = os.path.join(tmp, 'share')
        packages = os.path.join(share, 'mime', 'packages')
        os.makedirs(packages)
        shutil.copy(path, os.path.join(packages, 'org.rugosa.Rugosa.xml'))
        # The temporary database comes first in the search path, for
        # update-mime-database (which warns otherwise) and for GIO below.
        env = dict(os.environ)
        env['XDG_DATA_HOME'] = os.path.join(tmp, 'home')
        env['XDG_DATA_DIRS'] = share + ':' + env.get('XDG_DATA_DIRS', '/usr/local/share:/usr/share')
        r = subprocess.run([umd, os.path.join(share, 'mime')],
                           capture_output=True, text=True, env=env, timeout=60)
        check("update-mime-database accepts the package",
              r.returncode == 0 and not r.stderr.strip(), r.stdout + r.stderr)

        def read(name):
            p = os.path.join(share, 'mime', name)
            return open(p, encoding='utf-8').read() if os.path.exists(p) else ''

        check("the database has the type",
              os.path.isfile(os.path.join(share, 'mime', 'application', 'x-rugosa-project.xml')))
        check("globs2 maps *.rugosa", f':{TYPE}:*.rugosa' in read('globs2'), read('globs2'))
        check("subclasses names application/json",
              f'{TYPE} application/json' in read('subclasses').splitlines())
        check("icons names the MIME icon",
              f'{TYPE}:application-x-rugosa-project' in read('icons').splitlines())

        gio = shutil.which('gio')
        if gio is None:
            print("# gio not found: type resolution is not checked")
            return
        samples = os.path.join(tmp, 'samples')
        os.makedirs(samples)
        files = {
            'pump-station.rugosa': (PROJECT, TYPE),           # by name
            'saved-project.dat': (PROJECT, TYPE),             # by content
            'settings.json': (OTHER_JSON, 'application/json'),  # not ours
        }
        for name, (text, expected) in files.items():
            p = os.path.join(samples, name)
            with open(p, 'w', encoding='utf-8') as f:
                f.write(text)
            got = gio_type(gio, env, p)
            check(f"GIO resolves {name} to {expected}", got == expected, got)


def main():
    if len(sys.argv) != 2:
        print("usage: check-mime.py MIME_PACKAGE_XML", file=sys.stderr)
        return 2
    static_checks(sys.argv[1])
    database_checks(sys.argv[1])
    print(f"{passed} passed, {failed} failed")
    return 1 if failed else 0


if __name__ == '__main__':
    sys.exit(main())
