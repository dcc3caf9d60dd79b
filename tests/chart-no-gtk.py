#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""Fail when a source under src/chart includes a GTK, GDK or libadwaita
header: the chart is drawn by the CLI too, without a display."""
import pathlib
import re
import sys

FORBIDDEN = re.compile(r'^\s*#\s*include\s*[<"](gtk/|gdk/|adwaita\.h|libadwaita)', re.M)

root = pathlib.Path(sys.argv[1])
files = sorted(p for p in root.rglob('*') if p.suffix in ('.c', '.h'))
if not files:
    print(f'no sources found under {root}')
    sys.exit(1)
bad = [str(p) for p in files if FORBIDDEN.search(p.read_text(encoding='utf-8'))]
for p in bad:
    print(f'{p}: includes a GTK header')
print(f'checked {len(files)} files')
sys.exit(1 if bad else 0)
