#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""Installs the build into a temporary folder and checks the tree.

Run: check-install.py BUILD_DIR [APPLICATION_ID]

`meson install --destdir TMP --no-rebuild` from BUILD_DIR (with the Meson
that configured it, read from build.ninja), then checks what
a desktop needs: the installed programs, the desktop entry, the AppStream
metainfo, the GSettings schema (when the source tree has one), the icons,
the MIME type, the manual pages and, for each language in po/LINGUAS, the
message catalog.  Paths follow the build's own prefix and directories, read
from BUILD_DIR/meson-info.  The post-install scripts (icon cache, desktop
and MIME databases) are skipped by Meson under a DESTDIR.
"""
import glob
import json
import os
import re
import shlex
import shutil
import subprocess
import sys
import tempfile
import xml.etree.ElementTree as ET

passed = 0
failed = 0

CAUTION = 'qualified, licensed engineer'
MIME_TYPE = 'application/x-rugosa-project'
MIME_NS = '{http://www.freedesktop.org/standards/shared-mime-info}'


def check(name, ok, detail=""):
    global passed, failed
    if ok:
        passed += 1
    else:
        failed += 1
        print(f"FAIL {name}" + (f": {detail}" if detail else ""))
    return ok


def load_json(build, name):
    with open(os.path.join(build, 'meson-info', name), encoding='utf-8') as f:
        return json.load(f)


def desktop_entry(path):
    """The keys of the [Desktop Entry] group, untranslated ones only."""
    keys, group = {}, None
    with open(path, encoding='utf-8') as f:
        for line in f:
            line = line.strip()
            if line.startswith('['):
                group = line
            elif group == '[Desktop Entry]' and '=' in line and not line.startswith('#'):
                k, v = line.split('=', 1)
                if '[' not in k:
                    keys[k.strip()] = v.strip()
    return keys


def meson_command(build):
    """The command of the Meson that configured `build`, as its
    regeneration rule in build.ninja runs it: another Meson on PATH may
    refuse the build folder."""
    with open(os.path.join(build, 'build.ninja'), encoding='utf-8') as f:
        lines = f.read().splitlines()
    for i, line in enumerate(lines):
        if line.strip() == 'rule REGENERATE_BUILD':
            words = shlex.split(lines[i + 1].split('=', 1)[1])
            return words[:words.index('--internal')]
    return [shutil.which('meson') or 'meson']


def parse_xml(path):
    try:
        return ET.parse(path).getroot()
    except (ET.ParseError, OSError) as e:
        check(f"{path} is well-formed XML", False, str(e))
        return None


def main():
    if len(sys.argv) < 2:
        print("usage: check-install.py BUILD_DIR [APPLICATION_ID]", file=sys.stderr)
        return 2
    build = os.path.abspath(sys.argv[1])
    app_id = sys.argv[2] if len(sys.argv) > 2 else 'org.rugosa.Rugosa'
    meson = meson_command(build)

    options = {o['name']: o['value'] for o in load_json(build, 'intro-buildoptions.json')}
    info = load_json(build, 'meson-info.json')
    source = info['directories']['source']
    version = load_json(build, 'intro-projectinfo.json')['version']
    targets = load_json(build, 'intro-targets.json')

    prefix = options['prefix']

    def under_prefix(opt):
        value = options[opt]
        return value if os.path.isabs(value) else os.path.join(prefix, value)

    with tempfile.TemporaryDirectory(prefix='rugosa-install-') as destdir:
        def dest(path):
            return os.path.join(destdir, os.path.relpath(path, '/'))

        bindir = dest(under_prefix('bindir'))
        datadir = dest(under_prefix('datadir'))
        mandir = dest(under_prefix('mandir'))
        localedir = dest(under_prefix('localedir'))

        p = subprocess.run([*meson, 'install', '-C', build, '--destdir', destdir,
                            '--no-rebuild', '--quiet'],
                           capture_output=True, text=True, timeout=300)
        if not check("meson install --destdir", p.returncode == 0,
                     (p.stdout + p.stderr).strip()):
            print(f"{passed} passed, {failed} failed")
            return 1

        # Everything Meson means to install is there, and nothing lands
        # outside the prefix.
        installed = load_json(build, 'intro-installed.json')
        missing = [d for d in installed.values() if not os.path.lexists(dest(d))]
        check("every file Meson lists is installed", not missing, ", ".join(missing))
        outside = []
        for dirpath, _, filenames in os.walk(destdir):
            for fn in filenames:
                real = '/' + os.path.relpath(os.path.join(dirpath, fn), destdir)
                if not real.startswith(prefix.rstrip('/') + '/'):
                    outside.append(real)
        check("nothing is installed outside the prefix", not outside, ", ".join(outside))

        # Programs: every installed executable target, runnable.
        programs = [t for t in targets if t['type'] == 'executable' and t['installed']]
        for t in programs:
            for path in t['install_filename']:
                check(f"program {os.path.basename(path)} installed and executable",
                      os.access(dest(path), os.X_OK), dest(path))
        cli = os.path.join(bindir, 'rugosa-cli')
        if os.access(cli, os.X_OK):
            r = subprocess.run([cli, '--version'], capture_output=True, text=True, timeout=30)
            check("installed rugosa-cli --version names the version",
                  r.returncode == 0 and version in r.stdout, r.stdout + r.stderr)
            r = subprocess.run([cli, '--help'], capture_output=True, text=True, timeout=30)
            commands = re.findall(r'^  ([a-z][a-z-]+)\s', r.stdout, re.M)
            check("rugosa-cli --help lists its commands", r.returncode == 0 and commands,
                  r.stdout + r.stderr)
            page = os.path.join(mandir, 'man1', 'rugosa-cli.1')
            text = open(page, encoding='utf-8').read() if os.path.exists(page) else ''
            for c in commands:
                check(f"rugosa-cli.1 documents the command '{c}'",
                      re.search(r'^\.SS ' + re.escape(c) + r'\s*$', text, re.M) is not None)
        else:
            print("# rugosa-cli is not built here: its run checks are skipped")
        if not any(os.path.basename(p) == 'rugosa'
                   for t in programs for p in t['install_filename']):
            print("# the application rugosa is not built here: its binary is not checked")

        # Desktop entry.
        desktop = os.path.join(datadir, 'applications', app_id + '.desktop')
        if check("desktop entry installed", os.path.isfile(desktop), desktop):
            keys = desktop_entry(desktop)
            check("desktop entry: Exec=rugosa %F", keys.get('Exec') == 'rugosa %F', keys.get('Exec'))
            check("desktop entry: Icon is the application id", keys.get('Icon') == app_id,
                  keys.get('Icon'))
            check("desktop entry: opens project files",
                  MIME_TYPE in keys.get('MimeType', '').split(';'), keys.get('MimeType'))
            validate = shutil.which('desktop-file-validate')
            if validate:
                r = subprocess.run([validate, desktop], capture_output=True, text=True, timeout=30)
                check("installed desktop entry validates", r.returncode == 0 and not r.stdout.strip(),
                      r.stdout + r.stderr)

        # AppStream metainfo.
        metainfo = os.path.join(datadir, 'metainfo', app_id + '.metainfo.xml')
        if check("metainfo installed", os.path.isfile(metainfo), metainfo):
            root = parse_xml(metainfo)
            if root is not None:
                check("metainfo: id is the application id", root.findtext('id') == app_id,
                      root.findtext('id'))
                check("metainfo: launchable is the desktop entry",
                      root.findtext('launchable') == app_id + '.desktop', root.findtext('launchable'))
                binaries = {b.text for b in root.iter('binary')}
                check("metainfo: provides rugosa and rugosa-cli",
                      {'rugosa', 'rugosa-cli'} <= binaries, str(binaries))
                releases = [r.get('version') for r in root.iter('release')]
                check("metainfo: the project version is a release", version in releases,
                      f"{version} not in {releases}")
                desc = ' '.join(''.join(d.itertext()) for d in root.findall('description'))
                check("metainfo: the description carries the caution",
                      CAUTION in ' '.join(desc.split()))

        # GSettings schema, when the source tree has one.
        schemas = glob.glob(os.path.join(source, 'data', '*.gschema.xml'))
        if schemas:
            installed_schemas = glob.glob(os.path.join(datadir, 'glib-2.0', 'schemas', '*.gschema.xml'))
            check("GSettings schema installed", installed_schemas,
                  os.path.join(datadir, 'glib-2.0', 'schemas'))
        else:
            print("# no GSettings schema in the source tree: not checked")

        # Icons.
        hicolor = os.path.join(datadir, 'icons', 'hicolor')
        for rel, size in ((f'scalable/apps/{app_id}.svg', None),
                          (f'symbolic/apps/{app_id}-symbolic.svg', '0 0 16 16'),
                          ('scalable/mimetypes/application-x-rugosa-project.svg', None)):
            path = os.path.join(hicolor, rel)
            if check(f"icon {rel} installed", os.path.isfile(path), path):
                root = parse_xml(path)
                if root is not None:
                    check(f"icon {rel} is an SVG", root.tag == '{http://www.w3.org/2000/svg}svg', root.tag)
                    if size:
                        check(f"icon {rel} has a {size} viewBox", root.get('viewBox') == size,
                              root.get('viewBox'))

        # MIME type.
        mime = os.path.join(datadir, 'mime', 'packages', app_id + '.xml')
        if check("MIME package installed", os.path.isfile(mime), mime):
            root = parse_xml(mime)
            if root is not None:
                types = {t.get('type'): t for t in root.iter(MIME_NS + 'mime-type')}
                t = types.get(MIME_TYPE)
                if check(f"MIME package defines {MIME_TYPE}", t is not None, str(list(types))):
                    globs = [g.get('pattern') for g in t.iter(MIME_NS + 'glob')]
                    check("MIME type matches *.rugosa", '*.rugosa' in globs, str(globs))

        # Manual pages.
        for page in ('rugosa.1', 'rugosa-cli.1'):
            path = os.path.join(mandir, 'man1', page)
            check(f"manual page {page} installed", os.path.isfile(path), path)

        # Message catalogs, one per language of po/LINGUAS.
        linguas = []
        with open(os.path.join(source, 'po', 'LINGUAS'), encoding='utf-8') as f:
            for line in f:
                if not line.lstrip().startswith('#'):
                    linguas += line.split()
        for lang in linguas:
            mo = os.path.join(localedir, lang, 'LC_MESSAGES', 'rugosa.mo')
            check(f"translation {lang} installed", os.path.isfile(mo), mo)
        if not linguas:
            print("# po/LINGUAS lists no language yet: no message catalog to check")

    print(f"{passed} passed, {failed} failed")
    return 1 if failed else 0


if __name__ == '__main__':
    sys.exit(main())
