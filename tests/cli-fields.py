#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""rugosa-cli's options against the field tables (rugosa-gen-fields json):
every number option takes the range of its field, as the project file and
the window do.  Just outside the range, the option is refused with the
field's range sentence naming the option; at the ends of the range, that
sentence never comes (the core may still refuse a value outside the range
of its correlation, with a sentence of its own).

Run: cli-fields.py GEN CLI"""
import json
import subprocess
import sys

GEN, CLI = sys.argv[1], sys.argv[2]
rows = json.loads(subprocess.run([GEN, "json"], capture_output=True, text=True,
                                 check=True).stdout)

WATER = ["--flow", "12 L/s", "--diameter", "100 mm", "--length", "100 m",
         "--roughness", "0.045 mm", "--fluid", "water", "--temperature", "20 C"]
BASES = {
    1: WATER,  # water
    2: ["--flow", "12 L/s", "--diameter", "100 mm", "--length", "100 m",
        "--roughness", "0.045 mm", "--fluid", "custom", "--density", "998 kg/m3",
        "--viscosity", "1 cP"],
    4: WATER[:-4] + ["--fluid", "seawater", "--temperature", "20 C", "--salinity", "35 g/kg"],
    8: WATER[:-4] + ["--fluid", "oil", "--temperature", "60 C", "--oil-nu1", "100 cSt",
                     "--oil-t1", "40 C", "--oil-nu2", "10 cSt", "--oil-t2", "100 C",
                     "--oil-density", "870 kg/m3"],
    16: WATER[:-4] + ["--fluid", "air", "--temperature", "20 C", "--flow", "0.1 m3/s"],
}
AGED = ["--aging", "moderate"]

passed = failed = 0


def check(name, ok, detail=""):
    global passed, failed
    if ok:
        passed += 1
    else:
        failed += 1
        print(f"FAIL {name} {detail}")


def base_for(row):
    kinds = row["fluid_kinds"]
    for bit, base in BASES.items():
        if kinds == 0 or kinds & bit:
            return list(base)
    return list(WATER)


def with_option(base, option, value):
    out, i = [], 0
    while i < len(base):
        if base[i] == option:
            i += 2
            continue
        out.append(base[i])
        i += 1
    return out + [option, value]


def run(args):
    p = subprocess.run([CLI, "line", *args, "--json"], capture_output=True,
                       text=True, timeout=60, env={"LANG": "C.UTF-8", "PATH": "/usr/bin:/bin"})
    return p.returncode, p.stderr.strip()


def text(x, row):
    unit = row["unit"]
    s = repr(float(x))
    # a bare number is SI, or the stored unit where that is not SI (years)
    if unit in ("", "1/K") or row["to_si"] != 1.0:
        return s
    return s + " " + unit


for row in rows:
    option = row["cli"]
    if option is None or row["kind"] != 0:  # numbers with an option
        continue
    base = base_for(row)
    if option == "--age":
        base += AGED
    lo, hi = row["min"], row["max"]
    step_lo = max(abs(lo) * 1e-3, 1e-9)
    step_hi = max(abs(hi) * 1e-3, 1e-9)
    min_open = bool(row["flags"] & 2)
    below = lo if min_open else lo - step_lo
    for label, value in (("below", below), ("above", hi + step_hi)):
        code, err = run(with_option(base, option, text(value, row)))
        check(f"{option} {label} its range is refused", code == 2, err)
        check(f"{option} {label}: the message names the option",
              err.startswith("rugosa-cli: " + option), err)
        check(f"{option} {label}: the range sentence is the field's",
              err.startswith(f"rugosa-cli: {option}: {row['label']} must "), err)
    ends = [hi] if min_open else [lo, hi]
    for value in ends:
        code, err = run(with_option(base, option, text(value, row)))
        check(f"{option} at the end {value} of its range passes the field's check",
              f"{row['label']} must " not in err, err)

print(f"{passed} passed, {failed} failed")
sys.exit(1 if failed else 0)
