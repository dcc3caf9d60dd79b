#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""The core links libm and the C library only: no GLib, GTK, Cairo or cJSON.

Run: check-core-deps.py SOURCE_DIR PATH/TO/librugosa-core.a
Checks the sources' #include lines and the library's undefined symbols."""
import re
import subprocess
import sys
from pathlib import Path

src, lib = Path(sys.argv[1]) / "src" / "core", sys.argv[2]
passed = failed = 0


def check(name, ok, detail=""):
    global passed, failed
    if ok:
        passed += 1
    else:
        failed += 1
        print(f"FAIL {name} {detail}")


ALLOWED = {"math.h", "stddef.h", "stdio.h", "stdlib.h", "string.h", "stdarg.h",
           "float.h", "limits.h", "stdint.h", "errno.h", "locale.h", "libintl.h",
           "ctype.h", "stdbool.h"}
for f in sorted(src.glob("*.[ch]")):
    for inc in re.findall(r'#\s*include\s*<([^>]+)>', f.read_text()):
        check(f"{f.name} includes <{inc}>", inc in ALLOWED, "(the core is C11 + libm)")

nm = subprocess.run(["nm", "-u", "--format=posix", lib], capture_output=True, text=True)
check("nm runs", nm.returncode == 0, nm.stderr)
bad = sorted({line.split()[0] for line in nm.stdout.splitlines()
              if line and re.match(r"(g_|gtk_|gdk_|cairo_|pango_|cJSON_|adw_)", line.split()[0])})
check("no GLib/GTK/Cairo/cJSON symbols", not bad, ", ".join(bad[:10]))

print(f"{passed} passed, {failed} failed")
sys.exit(1 if failed else 0)
