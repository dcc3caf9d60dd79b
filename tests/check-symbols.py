#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""No function or variable is defined twice in rugosa's static libraries.

Run: check-symbols.py LIBRARY.a...

Two objects of one static library (or of two libraries linked together)
that define the same global symbol link without a word: the linker takes
the first object it meets and the other definition is silently dropped —
a merge once left an old, slow copy of a function in place of its
replacement that way.  Every global symbol defined (text, data, read-only
data, bss) must be defined once over all the libraries given."""
import subprocess
import sys

seen = {}
dupes = []
for lib in sys.argv[1:]:
    out = subprocess.run(["nm", "-g", "--defined-only", "-A", lib],
                         capture_output=True, text=True, check=True).stdout
    for line in out.splitlines():
        parts = line.split()
        if len(parts) < 3 or parts[-2] not in "TDBRV":
            continue
        where, name = parts[0], parts[-1]
        if name in seen and seen[name] != where:
            dupes.append(f"{name}: {seen[name]} and {where}")
        seen.setdefault(name, where)
for d in dupes:
    print("defined twice:", d)
print(f"{len(seen)} symbols, {len(dupes)} defined twice")
sys.exit(1 if dupes else 0)
