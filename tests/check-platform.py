#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""The version written once, and the application without its schema.

Run: check-platform.py VERSION RELEASE_DATE RUGOSA_CLI RUGOSA|'' METAINFO MAN_PAGE...

VERSION and RELEASE_DATE are meson.build's (project version, release_date);
every other place that names the release must name the same: both
programs' --version, the metainfo's release, the manual pages' .TH lines.
(The About window is checked by the UI test /ui/about/version.)

Started without its compiled settings schema, rugosa says in one line what
is missing and how to run it, and exits with status 1, instead of aborting
in GSettings.  RUGOSA is '' when the application is not built."""
import datetime
import os
import re
import subprocess
import sys
import tempfile
import xml.etree.ElementTree as ET

version, release_date, cli, app, metainfo, *man_pages = sys.argv[1:]
passed = failed = 0


def check(name, ok, detail=""):
    global passed, failed
    if ok:
        passed += 1
    else:
        failed += 1
        print(f"FAIL {name} {detail}")


check("meson version is a release number", re.fullmatch(r"\d+\.\d+\.\d+", version), version)
try:
    datetime.date.fromisoformat(release_date)
    check("release date", True)
except ValueError:
    check("release date", False, release_date)

p = subprocess.run([cli, "--version"], capture_output=True, text=True, timeout=60)
check("rugosa-cli --version", p.returncode == 0 and p.stdout == f"rugosa-cli {version}\n", p.stdout + p.stderr)

# the newest release of the metainfo is this one
releases = ET.parse(metainfo).getroot().findall("./releases/release")
check("metainfo has releases", len(releases) >= 1)
if releases:
    newest = releases[0].attrib
    check("metainfo release version", newest.get("version") == version, newest)
    check("metainfo release date", newest.get("date") == release_date, newest)

for page in man_pages:
    with open(page, encoding="utf-8") as f:
        th = next((line for line in f if line.startswith(".TH ")), "")
    check(f"{os.path.basename(page)} .TH", f' {release_date} "Rugosa {version}" ' in th, th)

if app:
    with tempfile.TemporaryDirectory() as empty:
        # no schema anywhere: neither a schema folder nor a data folder to search
        env = {"PATH": "/usr/bin:/bin", "LANG": "C.UTF-8", "HOME": empty,
               "GSETTINGS_SCHEMA_DIR": empty, "XDG_DATA_DIRS": empty,
               "XDG_DATA_HOME": empty, "GSETTINGS_BACKEND": "memory"}
        p = subprocess.run([app, "--version"], capture_output=True, text=True, timeout=60, env=env)
        check("rugosa --version (needs no schema)", p.returncode == 0 and p.stdout == f"rugosa {version}\n",
              p.stdout + p.stderr)
        p = subprocess.run([app], capture_output=True, text=True, timeout=60, env=env)
        check("without the schema: exit status 1, not a signal", p.returncode == 1, p.returncode)
        check("without the schema: one line on stderr", p.stderr.count("\n") == 1 and p.stderr.endswith("\n"),
              p.stderr)
        check("without the schema: nothing on stdout", p.stdout == "", p.stdout)
        check("without the schema: says what is missing", "org.rugosa.Rugosa" in p.stderr
              and "not installed" in p.stderr, p.stderr)
        check("without the schema: says how to run it", "GSETTINGS_SCHEMA_DIR" in p.stderr
              and "build-aux/dev run" in p.stderr, p.stderr)
        check("without the schema: no GLib error", "GLib" not in p.stderr and "ERROR" not in p.stderr,
              p.stderr)

print(f"{passed} passed, {failed} failed")
sys.exit(1 if failed else 0)
