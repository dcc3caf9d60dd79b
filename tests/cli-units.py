#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""rugosa-cli's output units and its warnings about results far beyond any
practical line.

Run: cli-units.py PATH/TO/rugosa-cli
(RUGOSA_SOURCE_DIR: the source tree, for the display-unit table of
src/model/rugosa-units.c, the demo project and the manual page.)

- One option per display quantity of the display-unit table, named after
  its id, on every command; listed by --help and by the manual page.
- The same line and project read in US units give back, converted by hand
  with the exact factors of NIST SP 811, the values of the SI run; JSON
  stays SI whatever the units.
- The defaults: the project's units for eval, SI for the other commands.
- A velocity or gradient far beyond any practical line: exit status 0, the
  warning on stderr and among the warnings, the likely unit mistake named
  for a bare number."""
import csv
import io
import json
import os
import re
import subprocess
import sys
import tempfile

CLI = sys.argv[1]
SRC = os.environ.get("RUGOSA_SOURCE_DIR", os.path.join(os.path.dirname(__file__), ".."))
# The caller's environment (sanitizer options among it), in a fixed locale.
ENV = {**os.environ, "LANG": "C.UTF-8", "LC_ALL": "C.UTF-8", "LANGUAGE": ""}
passed = failed = 0


def check(name, ok, detail=""):
    global passed, failed
    if ok:
        passed += 1
    else:
        failed += 1
        print(f"FAIL {name} {detail}"[:2000])


def run(*args):
    p = subprocess.run([CLI, *args], capture_output=True, text=True, timeout=60, env=ENV)
    return p.returncode, p.stdout, p.stderr


def close(a, b, rel):
    return abs(a - b) <= rel * max(abs(a), abs(b), 1e-300)


# Exact definitions, NIST SP 811 (2008), Appendix B.8 and B.9.
IN = 0.0254                      # Source: NIST SP 811 B.8, inch = 0.0254 m
FT = 0.3048                      # Source: NIST SP 811 B.8, foot = 0.3048 m
GAL = 231 * IN**3                # Source: NIST SP 811 B.8, gallon (US) = 231 in³
LB = 0.45359237                  # Source: NIST SP 811 B.8, pound (avoirdupois)
LBF = LB * 9.80665               # Source: NIST SP 811 B.8, pound-force = lb × standard gravity
DAY = 86400.0                    # Source: NIST SP 811 B.8, day = 86 400 s
# Each unit a column or a row may be written in, as SI per unit.
TO_SI = {
    "L/s": 1e-3,                 # Source: NIST SP 811 B.8, litre = 1e-3 m³
    "gpm": GAL / 60,             # Source: NIST SP 811 B.8, gallon (US), minute
    "m³/d": 1 / DAY,             # Source: NIST SP 811 B.8, day
    "MGD": 1e6 * GAL / DAY,      # Source: NIST SP 811 B.8, gallon (US), day
    "m/s": 1.0, "ft/s": FT,
    "m": 1.0, "ft": FT, "mm": 1e-3, "in": IN,
    "kPa": 1e3,                  # Source: SI prefix kilo
    "psi": LBF / IN**2,          # Source: NIST SP 811 B.8, psi = lbf/in²
    "bar": 1e5,                  # Source: NIST SP 811 B.8, bar = 1e5 Pa
    "m/100 m": 1.0, "ft/100 ft": 1.0,   # the same ratio (units.h)
    "kg/m³": 1.0, "lb/ft³": LB / FT**3,
    "mPa·s": 1e-3, "cP": 1e-3,   # Source: NIST SP 811 B.8, centipoise = 1e-3 Pa·s
    "cSt": 1e-6,                 # Source: NIST SP 811 B.8, centistokes = 1e-6 m²/s
    "kW": 1e3,                   # Source: SI prefix kilo
    "hp": 550 * FT * LBF,        # Source: NIST SP 811 B.8, horsepower = 550 ft·lbf/s
    "kWh/yr": 3.6e6,             # Source: NIST SP 811 B.8, kilowatt hour = 3.6e6 J (a year is a year in both)
}

WATER = ["--flow", "150 gpm", "--diameter", "4 in", "--length", "1000 ft",
         "--roughness", "0.045 mm", "--fluid", "water", "--temperature", "68 F",
         "--k-sum", "2.5", "--elevation", "3 m"]

# ---- one option per display quantity ---------------------------------------
with open(os.path.join(SRC, "src", "model", "rugosa-units.c"), encoding="utf-8") as f:
    table = re.findall(r'\[RUGOSA_DISPLAY_\w+\] = \{\s*"(\w+)",\s*N_\("[^"]*"\),\s*RG_QTY_\w+,\s*"([^"]*)",\s*"([^"]*)"',
                       f.read())
check("display table read", len(table) >= 15, table)
code, help_text, _ = run("--help")
with open(os.path.join(SRC, "doc", "rugosa-cli.1"), encoding="utf-8") as f:
    man = f.read()
# the quantities the manual page lists: ".BR flow ," … ".BR age ." in its
# OUTPUT UNITS section, after "is one of"
section = man.split(".SH OUTPUT UNITS", 1)[-1].split(".SH", 1)[0]
listed = re.findall(r"^\.BR? ([a-z\\-]+)(?: [,.])?$", section.split("is one of", 1)[-1].split(".PP", 1)[0],
                    re.M)
listed = [w.replace("\\-", "-") for w in listed if w != "and"]
check("manual lists the quantities of the table",
      sorted(listed) == sorted(q.replace("_", "-") for q, _, _ in table), listed)
for qid, si_unit, us_unit in table:
    option = "--" + qid.replace("_", "-") + "-unit"
    check(f"help lists {qid}", re.search(r"\b" + re.escape(qid.replace("_", "-")) + r"\b", help_text), help_text)
    for cmd in (["friction", "--re", "1e5", "--rr", "1e-4"],
                ["fluid", "water", "--temperature", "20 C"],
                ["line"] + WATER,
                ["eval", os.path.join(SRC, "data", "demo.rugosa")]):
        code, out, err = run(*cmd, option, us_unit)
        check(f"{cmd[0]} {option} {us_unit}", code == 0 and err == "", err)
        code, out, err = run(*cmd, option, "5 furlongs")
        check(f"{cmd[0]} {option} refused", code == 2 and out == ""
              and err.startswith(f"rugosa-cli: {option}: ") and err.count("\n") == 1, err)
    code, out, err = run("line", *WATER, option, "")
    check(f"{option} empty", code == 2 and err.startswith(f"rugosa-cli: {option}: "), err)
for bad in ("metric", "", "SI"):
    code, out, err = run("line", *WATER, "--units", bad)
    check(f"--units {bad!r} refused", code == 2 and out == ""
          and err.startswith("rugosa-cli: --units: ") and "si, us" in err, err)
code, out, err = run("line", *WATER, "--pressure-unit", "psig")
check("a gauge unit is refused for output", code == 2 and "gauge" in err, err)


# ---- line: the table in US units is the SI table converted ----------------
def table_rows(text):
    """{label: (number, unit)} of a 'label    value unit' table."""
    rows = {}
    for line in text.splitlines():
        m = re.match(r"^(.*?\S)\s+(-?[0-9.]+(?:e[-+]?\d+)?)(?: (.+))?$", line)
        if m:
            rows[m.group(1)] = (float(m.group(2)), m.group(3))
    return rows


code_si, out_si, err_si = run("line", *WATER)
code_us, out_us, err_us = run("line", *WATER, "--units", "us")
check("line si and us run", code_si == 0 and code_us == 0, err_si + err_us)
si_rows, us_rows = table_rows(out_si), table_rows(out_us)
check("line table rows", len(si_rows) >= 18 and si_rows.keys() == us_rows.keys(),
      sorted(set(si_rows) ^ set(us_rows)))
# Source: display-unit table (common practice): the US system's usual units
expected_us = {"Mean velocity": "ft/s", "Head loss, total": "ft", "Pressure drop (with elevation change)": "psi",
               "Pipe-friction gradient": "ft/100 ft", "Density": "lb/ft³", "Dynamic viscosity": "cP",
               "Inner diameter": "in", "Roughness when new": "in"}
for label, unit in expected_us.items():
    check(f"line us unit {label}", us_rows.get(label, (0, None))[1] == unit, us_rows.get(label))
converted = 0
for label, (v_si, u_si) in si_rows.items():
    v_us, u_us = us_rows[label]
    if u_si is None:
        check(f"line plain {label}", u_us is None and v_us == v_si, (v_si, v_us))
        continue
    if u_si == u_us and u_si not in TO_SI:
        # money: the project's currency in both systems, nothing converted
        check(f"line same {label}", v_us == v_si, (v_si, v_us))
        continue
    if u_si not in TO_SI or u_us not in TO_SI:
        check(f"line unit known {label}", False, (u_si, u_us))
        continue
    # both printed with 6 significant digits: half a unit in the 6th digit each
    check(f"line {label} {u_us} → {u_si}", close(v_us * TO_SI[u_us], v_si * TO_SI[u_si], 1.2e-5),
          (v_si, u_si, v_us, u_us))
    converted += 1
check("line rows converted", converted >= 12, converted)

# JSON stays SI, byte for byte, whatever the output units
_, json_si, _ = run("line", *WATER, "--json")
_, json_us, _ = run("line", *WATER, "--json", "--units", "us", "--flow-unit", "MGD")
check("line json is SI whatever the units", json_si == json_us and "velocity_m_s" in json_si)

# fluid: the SI system's units by default, US on request
code, out, _ = run("fluid", "water", "--temperature", "20 C")
rows = table_rows(out)
check("fluid default units", [u for _, u in rows.values()] == ["kg/m³", "mPa·s", "cSt"], rows)
code, out_us, _ = run("fluid", "water", "--temperature", "20 C", "--units", "us")
rows_us = table_rows(out_us)
check("fluid us units", [u for _, u in rows_us.values()] == ["lb/ft³", "cP", "cSt"], rows_us)
for (label, (a, ua)), (b, ub) in zip(rows.items(), rows_us.values()):
    check(f"fluid {label}", close(a * TO_SI[ua], b * TO_SI[ub], 1.2e-5), (a, ua, b, ub))
# friction has no unit: the same output whatever the units
check("friction ignores units", run("friction", "--re", "1e5", "--rr", "1e-4")[1]
      == run("friction", "--re", "1e5", "--rr", "1e-4", "--units", "us")[1])


# ---- eval: CSV in US units against CSV in SI units, exact numbers ---------
DEMO = os.path.join(SRC, "data", "demo.rugosa")


def read_csv(text):
    rows = list(csv.reader(io.StringIO(text)))
    return rows[0], rows[1:]


def header_unit(name):
    m = re.match(r"^(\w+) \((.+)\)$", name)
    return (m.group(1), m.group(2)) if m else (name, None)


code, csv_si, err = run("eval", DEMO, "--format", "csv", "--units", "si")
code2, csv_us, err2 = run("eval", DEMO, "--format", "csv", "--units", "us")
check("eval csv runs", code == 0 and code2 == 0, err + err2)
h_si, r_si = read_csv(csv_si)
h_us, r_us = read_csv(csv_us)
check("eval csv shape", len(h_si) == len(h_us) and len(r_si) == len(r_us) and len(r_si) >= 3)
check("eval csv flow header", h_si[2] == "flow (L/s)" and h_us[2] == "flow (gpm)", (h_si[2], h_us[2]))
check("eval csv velocity header", "velocity (ft/s)" in h_us and "velocity (m/s)" in h_si)
exact = 0
for col, (name_si, name_us) in enumerate(zip(h_si, h_us)):
    key_si, unit_si = header_unit(name_si)
    key_us, unit_us = header_unit(name_us)
    check(f"eval csv column {col}", key_si == key_us, (name_si, name_us))
    for row_si, row_us in zip(r_si, r_us):
        a, b = row_si[col], row_us[col]
        if unit_si is None:
            # plain numbers, ids: identical; warnings are sentences in their units
            if key_si != "warnings":
                check(f"eval csv {key_si} same", a == b, (a, b))
            continue
        if a == "" or b == "":
            check(f"eval csv {key_si} both empty", a == b)
            continue
        if unit_si == unit_us and unit_si not in TO_SI:
            # money: the project's currency in both systems, nothing converted
            check(f"eval csv {key_si} same", a == b, (a, b))
            continue
        # Source: NIST SP 811 B.8 factors (TO_SI); one rounding each way in
        # rugosa, a few in the hand conversion
        check(f"eval csv {key_si} {unit_us} → {unit_si}",
              close(float(b) * TO_SI[unit_us], float(a) * TO_SI[unit_si], 1e-14),
              (a, unit_si, b, unit_us))
        exact += 1
check("eval csv values converted", exact >= 30, exact)

# JSON of eval: SI whatever the units (warnings aside, which are sentences)
def numbers_of(text):
    doc = json.loads(text)
    for r in doc["results"]:
        r.pop("warnings", None)
    return doc


j_si = numbers_of(run("eval", DEMO, "--format", "json", "--units", "si")[1])
j_us = numbers_of(run("eval", DEMO, "--format", "json", "--units", "us")[1])
check("eval json is SI whatever the units", j_si == j_us and "flow_m3_s" in j_si["results"][0])

# per-quantity override on top of --units: flow in m³/d, the rest US
_, csv_d, _ = run("eval", DEMO, "--format", "csv", "--units", "us", "--flow-unit", "m3/d")
h_d, r_d = read_csv(csv_d)
check("eval csv override header", h_d[2] == "flow (m³/d)" and h_d[3] == "velocity (ft/s)", h_d[:4])
for row_si, row_d in zip(r_si, r_d):
    # Source: NIST SP 811 B.8, litre and day
    check("eval csv flow in m³/d", close(float(row_d[2]) * TO_SI["m³/d"], float(row_si[2]) * TO_SI["L/s"], 1e-14),
          (row_si[2], row_d[2]))

# table: every column with a unit names it in parentheses, as CSV does
_, tab_us, _ = run("eval", DEMO, "--units", "us")
head = tab_us.splitlines()[1]
for title in ("Q (gpm)", "V (ft/s)", "h total (ft)", "Δp (psi)", "gradient (ft/100 ft)"):
    check(f"eval table header {title}", title in head, head)

# defaults: eval takes the project's units (the demo: SI with flow in L/s);
# a project in US units gives US columns without any option
_, tab_default, _ = run("eval", DEMO)
check("eval default is the project's units", "Q (L/s)" in tab_default.splitlines()[1])
with open(DEMO, encoding="utf-8") as f:
    project = json.load(f)
project["settings"]["units"] = {"system": "us", "overrides": {"flow": "MGD"}}
with tempfile.TemporaryDirectory() as tmp:
    us_project = os.path.join(tmp, "us.rugosa")
    with open(us_project, "w", encoding="utf-8") as f:
        json.dump(project, f)
    _, tab, err = run("eval", us_project)
    check("eval a US project", "Q (MGD)" in tab and "V (ft/s)" in tab, tab[:300] + err)
    _, tab, _ = run("eval", us_project, "--units", "si")
    # --units drops the project's overrides: the SI system's usual L/s
    check("eval --units si over a US project", "Q (L/s)" in tab and "V (m/s)" in tab, tab[:300])
    _, tab, _ = run("eval", us_project, "--velocity-unit", "m/s")
    check("eval one override over a US project", "Q (MGD)" in tab and "V (m/s)" in tab, tab[:300])
    out_png = os.path.join(tmp, "chart.png")
    code, _, err = run("render", us_project, "-o", out_png, "--units", "si", "--width", "400", "--height", "300")
    check("render takes the unit options", code == 0 and os.path.getsize(out_png) > 0, err)
    code, _, err = run("render", us_project, "-o", out_png, "--units", "imperial")
    check("render refuses a unit system", code == 2 and err.startswith("rugosa-cli: --units: "), err)
# line defaults to SI, whatever unit the input was typed in
check("line default is SI", si_rows["Mean velocity"][1] == "m/s" and si_rows["Inner diameter"][1] == "mm")


# ---- results far beyond any practical line ---------------------------------
BASE = ["--diameter", "100 mm", "--length", "100 m", "--roughness", "0.045 mm",
        "--fluid", "water", "--temperature", "20 C", "--json"]
FAR = "far beyond any practical line"


def line_json(*args):
    code, out, err = run("line", *args)
    doc = json.loads(out) if code == 0 else {}
    return code, doc, err


code, doc, err = line_json("--flow", "18", *BASE)
w = [x for x in doc.get("warnings", []) if FAR in x]
check("bare flow: exit 0", code == 0, err)
check("bare flow: one warning", len(w) == 1, doc.get("warnings"))
check("bare flow: names the mistake", w and "a bare number for --flow is in m³/s; did you mean 18 L/s?" in w[0], w)
check("bare flow: the same sentence on stderr", w and err == f"rugosa-cli: warning: {w[0]}\n", err)
code, doc, err = line_json("--flow", "18", *BASE, "--units", "us")
check("bare flow, US units: gpm suggested", "did you mean 18 gpm?" in err, err)
code, doc, err = line_json("--flow", " 18 ", *BASE, "--flow-unit", "m3/h")
check("bare flow: the flow unit shown is suggested", "did you mean 18 m³/h?" in err, err)
code, doc, err = line_json("--flow", "18", *BASE, "--flow-unit", "m3/s")
check("bare flow in the unit shown: no mistake to name",
      code == 0 and FAR in err and "bare number" not in err, err)
code, doc, err = line_json("--flow", "18 m3/s", *BASE)
check("flow with its unit: checked, no bare number", code == 0 and FAR in err
      and "bare number" not in err and "check the flow and the inner diameter" in err, err)
code, doc, err = line_json("--flow", "0.012", *BASE)
check("bare flow, plausible: nothing said", code == 0 and err == ""
      and not any(FAR in x for x in doc.get("warnings", [])), err)
# the table carries the warning too
code, out, err = run("line", "--flow", "18", *BASE[:-1])
check("bare flow: table warns", code == 0 and FAR in out and FAR in err, out[-400:] + err)

# Thresholds: common practice (no single source), stated in src/cli/cli-plausible.c:
# 30 m/s in a liquid, 100 m/s in a gas (below 100 kg/m³), 1000 m per 100 m in a liquid.
import math
area = math.pi * 0.1**2 / 4
for v, far in ((29.9, False), (30.1, True)):
    _, doc, err = line_json("--flow", f"{v * area!r} m3/s", *BASE)
    check(f"liquid at {v} m/s", (FAR in err) == far and abs(doc["velocity_m_s"] - v) < 1e-9, err)
AIR = ["--diameter", "100 mm", "--length", "10 m", "--roughness", "0.045 mm",
       "--fluid", "air", "--temperature", "20 C", "--pressure", "2 bar", "--json"]
for v, far in ((60.0, False), (99.9, False), (100.1, True)):
    _, doc, err = line_json("--flow", f"{v * area!r} m3/s", *AIR)
    check(f"air at {v} m/s", (FAR in err) == far and doc["density_kg_m3"] < 100, err)
CUSTOM = ["--flow", "12 L/s", "--diameter", "100 mm", "--length", "100 m",
          "--roughness", "0.045 mm", "--fluid", "custom", "--density", "998 kg/m3", "--json"]
code, doc, err = line_json(*CUSTOM, "--viscosity", "100")
check("bare viscosity: gradient far beyond", code == 0 and doc["gradient_m_per_100m"] > 1000
      and "a bare number for --viscosity is in Pa·s; did you mean 100 mPa·s?" in err, err)
code, doc, err = line_json(*CUSTOM, "--viscosity", "100 cP")
check("viscosity with its unit, plausible", code == 0 and err == "", err)
# around the gradient threshold: the viscosity that gives 1000 m per 100 m
# in laminar flow (f = 64/Re, so the gradient is proportional to it)
_, doc, _ = line_json(*CUSTOM, "--viscosity", "10 Pa.s")
mu_edge = 10 * 1000 / doc["gradient_m_per_100m"]
for factor, far in ((0.999, False), (1.001, True)):
    _, doc, err = line_json(*CUSTOM, "--viscosity", f"{mu_edge * factor!r} Pa.s")
    check(f"gradient {doc.get('gradient_m_per_100m')}", (FAR in err) == far
          and doc.get("regime") == "laminar", err)

print(f"{passed} passed, {failed} failed")
sys.exit(1 if failed else 0)
