#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""The rugosa-cli contract: output keys, exactness and bad input.

Run: cli-contract.py PATH/TO/rugosa-cli
Every expected value is computed here independently (mpmath for Colebrook,
python3-iapws for water, the defining formulas for the line) or is a unit
definition (NIST SP 811)."""
import json
import math
import subprocess
import sys

import mpmath

CLI = sys.argv[1]
passed = 0
failed = 0


import os

# The caller's environment (sanitizer options among it), in a fixed locale.
BASE_ENV = {**os.environ, "LANG": "C.UTF-8", "LC_ALL": "C.UTF-8"}


def run(*args):
    p = subprocess.run([CLI, *args], capture_output=True, text=True,
                       timeout=60, env=BASE_ENV)
    return p.returncode, p.stdout, p.stderr


def check(name, ok, detail=""):
    global passed, failed
    if ok:
        passed += 1
    else:
        failed += 1
        print(f"FAIL {name} {detail}")


def close(a, b, rel):
    return abs(a - b) <= rel * abs(b)


mpmath.mp.dps = 40


def colebrook_mp(re, rr):
    """Colebrook (1939) solved with mpmath to 40 digits."""
    re, rr = mpmath.mpf(re), mpmath.mpf(rr)
    g = lambda x: x + 2 * mpmath.log10(rr / mpmath.mpf("3.7") + mpmath.mpf("2.51") * x / re)
    x = mpmath.findroot(g, 8)
    return float(1 / x**2)


# --- friction -----------------------------------------------------------
for re, rr in [(1e5, 1e-4), (4000, 0.0), (2.5e7, 0.05), (3000, 0.001), (1e8, 1e-6)]:
    code, out, err = run("friction", "--re", repr(re), "--rr", repr(rr))
    first = out.split()[0] if out.split() else ""
    check(f"friction exit {re} {rr}", code == 0, err)
    try:
        f = float(first)
    except ValueError:
        f = float("nan")
    # Source: mpmath, Colebrook solved to 40 digits (reference, not the code under test)
    check(f"friction value {re} {rr}", close(f, colebrook_mp(re, rr), 1e-13), f"{first}")
    mant = first.lower().split("e")[0].replace("-", "").replace(".", "").lstrip("0")
    check(f"friction 17 digits {re} {rr}", len(mant) >= 15, first)

# laminar: Source: Hagen–Poiseuille, f = 64/Re
code, out, _ = run("friction", "--re", "1000", "--rr", "0.001")
check("friction laminar", code == 0 and close(float(out.split()[0]), 0.064, 1e-15), out)

code, out, _ = run("friction", "--re", "1e5", "--rr", "1e-4", "--json")
doc = json.loads(out)
check("friction json", code == 0 and close(doc["friction_factor"], colebrook_mp(1e5, 1e-4), 1e-13)
      and doc["regime"] == "turbulent", out)

# --- fluid ----------------------------------------------------------------
from iapws import IAPWS97
from iapws._iapws import _Viscosity

code, out, err = run("fluid", "water", "--temperature", "20 C", "--json")
check("fluid exit", code == 0, err)
doc = json.loads(out) if code == 0 else {}
check("fluid keys", set(doc) == {"density_kg_m3", "dynamic_viscosity_Pa_s", "kinematic_viscosity_m2_s"}, out)
w = IAPWS97(T=293.15, P=0.101325)
# Source: python3-iapws, IAPWS97(T, P).rho (IF97 region 1) and _Viscosity(rho, T) (R12-08)
check("fluid density", close(doc.get("density_kg_m3", 0), w.rho, 1e-9), out)
check("fluid viscosity", close(doc.get("dynamic_viscosity_Pa_s", 0), _Viscosity(w.rho, 293.15), 1e-7), out)
check("fluid kinematic", close(doc.get("kinematic_viscosity_m2_s", 0),
                               doc.get("dynamic_viscosity_Pa_s", 0) / doc.get("density_kg_m3", 1), 1e-15), out)

# 68 °F is 20 °C exactly (Source: NIST SP 811, B.9: t/°C = (t/°F − 32)/1.8)
code, out2, _ = run("fluid", "water", "--temperature", "68 F", "--json")
check("fluid 68 F", code == 0 and close(json.loads(out2)["density_kg_m3"], doc.get("density_kg_m3", 0), 1e-14), out2)

# --- line -------------------------------------------------------------------
LINE_KEYS = {"velocity_m_s", "reynolds", "relative_roughness", "friction_factor", "regime",
             "roughness_zone", "roughness_reynolds",
             "head_loss_major_m", "head_loss_minor_m", "head_loss_total_m", "pressure_drop_Pa",
             "gradient_m_per_100m", "wall_shear_Pa", "density_kg_m3", "dynamic_viscosity_Pa_s",
             "roughness_elasticity", "inner_diameter_m", "roughness_m", "roughness_new_m",
             "head_loss_ratio_to_new", "minor_loss_k_total",
             # pumping (the default energy settings); values of the whole
             # line come with its design point
             "pump_head_m", "hydraulic_power_kW", "pump_power_kW", "pump_power_new_kW",
             "energy_kWh_per_year", "energy_new_kWh_per_year", "energy_cost_per_year",
             "energy_cost_new_per_year", "life_energy_cost", "life_energy_cost_pv",
             "warnings"}
G = 9.80665  # Source: standard gravity, CGPM 1901

# The text table: every value starts in the same column, however long the
# longest label (a life-cycle label is longer than the physical ones).
code, out, err = run("line", "--flow", "12 L/s", "--pipe", "NPS 4 Sch 40", "--length", "300 m",
                     "--fluid", "water", "--temperature", "15 C")
rows = [r for r in out.splitlines() if r and not r.startswith("warning")]
# columns where every row has a space and then a value
starts = [w for w in range(1, 80)
          if all(len(r) > w and r[w - 1] == " " and r[w] != " " for r in rows)]
check("line table: values in one column", code == 0 and len(starts) >= 1 and len(rows) > 20,
      f"{starts}\n{out}")

code, out, err = run("line", "--flow", "150 gpm", "--diameter", "4 in", "--length", "1000 ft",
                     "--roughness", "0.045 mm", "--fluid", "water", "--temperature", "68 F",
                     "--k-sum", "2.5", "--elevation", "3 m", "--json")
check("line exit", code == 0, err)
doc = json.loads(out) if code == 0 else {}
# A water line's design point also carries its Hazen-Williams C equivalent.
HW_KEYS = {"hazen_williams_c_equivalent", "hazen_williams_range"}
check("line keys", set(doc) == LINE_KEYS | HW_KEYS, sorted(set(doc) ^ (LINE_KEYS | HW_KEYS)))
if doc:
    # Source: NIST SP 811 Appendix B: 1 gal (US) = 3.785411784e-3 m³, 1 in = 0.0254 m, 1 ft = 0.3048 m
    q = 150 * 3.785411784e-3 / 60
    d = 4 * 0.0254
    length = 1000 * 0.3048
    v = q / (math.pi * d * d / 4)
    rho, mu = doc["density_kg_m3"], doc["dynamic_viscosity_Pa_s"]
    re = rho * v * d / mu
    f = colebrook_mp(re, 0.045e-3 / d)
    hmaj = f * length / d * v * v / (2 * G)
    hmin = 2.5 * v * v / (2 * G)
    check("line velocity", close(doc["velocity_m_s"], v, 1e-14))
    check("line reynolds", close(doc["reynolds"], re, 1e-13))
    check("line f", close(doc["friction_factor"], f, 1e-13))
    check("line h major", close(doc["head_loss_major_m"], hmaj, 1e-12))
    check("line h minor", close(doc["head_loss_minor_m"], hmin, 1e-12))
    check("line dp", close(doc["pressure_drop_Pa"], rho * G * (hmaj + hmin + 3.0), 1e-12))
    check("line gradient", close(doc["gradient_m_per_100m"], 100 * hmaj / length, 1e-12))
    check("line shear", close(doc["wall_shear_Pa"], f * rho * v * v / 8, 1e-12))
    check("line regime", doc["regime"] == "turbulent")
    # Source: hand arithmetic: H = losses + Δz, P_h = ρ·g·Q·H, P_e = P_h/η
    # with the default η = 70 %, E = P_e · 8000 h (the default hours), in kW
    # and kWh as the keys say, cost at the default 0.15 per kWh
    head = hmaj + hmin + 3.0
    p_e = rho * G * q * head / 0.70 / 1000.0
    check("line pump head", close(doc["pump_head_m"], head, 1e-12))
    check("line pump power kW", close(doc["pump_power_kW"], p_e, 1e-12))
    check("line energy kWh", close(doc["energy_kWh_per_year"], p_e * 8000.0, 1e-12))
    check("line energy cost", close(doc["energy_cost_per_year"], p_e * 8000.0 * 0.15, 1e-12))
    # Source: Hazen-Williams in SI as published, V = 0.849 C R^0.63 S^0.54
    # (R = D/4, S = h_major/L): the C equivalent gives back the Colebrook loss.
    c = doc["hazen_williams_c_equivalent"]
    check("line hw round trip",
          close(length * (v / (0.849 * c * (d / 4) ** 0.63)) ** (1 / 0.54), hmaj, 1e-12))
    # Common practice (no single source): 1.2 m/s of water in a 4 in bore,
    # turbulent, lies inside the formula's usual range.
    check("line hw range", doc["hazen_williams_range"] == "usual", doc["hazen_williams_range"])

# custom fluid with kinematic viscosity: μ = ν·ρ
code, out, err = run("line", "--flow", "0.2", "--diameter", "0.2", "--length", "500",
                     "--roughness", "0.26 mm", "--fluid", "custom", "--density", "900",
                     "--viscosity", "10 cSt", "--json")
doc = json.loads(out) if code == 0 else {}
check("line custom kinematic", code == 0 and close(doc["dynamic_viscosity_Pa_s"], 900 * 1e-5, 1e-14), err)

# transitional: the laminar value is reported beside (Source: Hagen–Poiseuille 64/Re)
code, out, err = run("line", "--flow", "0.1 L/s", "--diameter", "40 mm", "--length", "10 m",
                     "--roughness", "0", "--fluid", "water", "--temperature", "20 C", "--json")
doc = json.loads(out) if code == 0 else {}
check("line transitional", code == 0 and doc.get("regime") == "transitional"
      and close(doc["friction_factor_laminar"], 64 / doc["reynolds"], 1e-14)
      and "roughness_zone" not in doc, out + err)

# --- a Crane-method fitting: K = 45·f_T for a centric butterfly valve, NPS 2–8
# Source: Crane TP-410 (2009), butterfly valve K = 45 f_T (from memory; the
# catalog's JSON names it); f_T = 0.25/[log10(ε/3.7D)]², ε = 0.0018 in.
code, out, err = run("line", "--flow", "20 L/s", "--pipe", "NPS 4 Sch 40", "--length", "20",
                     "--fluid", "water", "--temperature", "20 C", "--fitting", "valve-butterfly x2", "--json")
doc = json.loads(out) if code == 0 else {}
d_in = doc.get("inner_diameter_m", 1) / 0.0254
ft = 0.25 / math.log10(0.0018 / (3.7 * d_in)) ** 2
check("butterfly K", code == 0 and close(doc["minor_loss_k_total"], 2 * 45 * ft, 1e-12), out + err)
code, out, err = run("line", "--flow", "0.5 L/s", "--pipe", "NPS 1 Sch 40", "--length", "20",
                     "--fluid", "water", "--temperature", "20 C", "--fitting", "valve-butterfly", "--json")
doc = json.loads(out) if code == 0 else {}
check("butterfly outside sizes warns", code == 0 and any("valve-butterfly" in w for w in doc["warnings"]), out + err)

# --- eval: the project path gives what the line command gives --------------
import os
demo = os.path.join(os.environ.get("RUGOSA_SOURCE_DIR", os.path.dirname(__file__) + "/.."), "data", "demo.rugosa")
code, out, err = run("eval", demo, "--format", "json", "--age", "25")
check("eval exit", code == 0, err)
doc = json.loads(out) if code == 0 else {"results": []}
project = json.load(open(demo))
for line in project["lines"]:
    rows = [r for r in doc["results"] if r["line"] == line["name"] and r["case"] == "design"]
    check(f"eval row {line['name']}", len(rows) == 1)
    if not rows:
        continue
    row = rows[0]
    check(f"eval keys {line['name']}", LINE_KEYS <= set(row), sorted(LINE_KEYS - set(row)))
    args = ["line", "--flow", repr(line["flow"]["design_m3_s"]), "--length", repr(line["length_m"]),
            "--elevation", repr(line.get("elevation_change_m", 0.0)),
            "--fluid", line["fluid"]["kind"], "--temperature", repr(line["fluid"]["temperature_K"]),
            "--pressure", repr(line["fluid"]["pressure_Pa"]), "--json", "--age", "25"]
    pipe = line["pipe"]
    args += ["--pipe", pipe["designation"]] if "designation" in pipe else ["--diameter", repr(pipe["inner_diameter_m"])]
    mat = line["material"]
    args += ["--material", mat["catalog"]] if "catalog" in mat else ["--roughness", repr(mat["roughness_m"])]
    args += ["--aging", "%r mm/yr" % (line["aging"]["rate_m_per_year"] * 1e3)]
    for fit in line.get("fittings", []):
        name = fit["catalog"] if "catalog" in fit else "K=%r" % fit["k"]
        args += ["--fitting", "%s x%d" % (name, fit["count"])]
    code, out, err = run(*args)
    ref = json.loads(out) if code == 0 else {}
    check(f"eval vs line exit {line['name']}", code == 0, err)
    for key in ("velocity_m_s", "reynolds", "friction_factor", "head_loss_total_m", "pressure_drop_Pa",
                "roughness_m", "head_loss_ratio_to_new", "minor_loss_k_total"):
        check(f"eval vs line {line['name']} {key}", key in ref and close(row[key], ref[key], 1e-12),
              f"{row.get(key)} vs {ref.get(key)}")

# --- eval: pumping energy, life-cycle cost and the duty point ---------------
ENERGY_KEYS = {"pump_power_kW", "energy_kWh_per_year", "energy_cost_per_year", "life_energy_cost",
               "life_energy_cost_pv", "life_cycle_cost", "capital_cost", "duty_flow_m3_s", "duty_head_m",
               "duty_flow_new_m3_s", "duty_head_new_m"}
code, out, err = run("eval", demo, "--format", "json")
doc = json.loads(out) if code == 0 else {"results": []}
for line in project["lines"]:
    rows = {r["case"]: r for r in doc["results"] if r["line"] == line["name"]}
    design = rows.get("design", {})
    # the demo gives every line a capital cost and a pump that meets it
    check(f"eval energy keys {line['name']}", ENERGY_KEYS <= set(design), sorted(ENERGY_KEYS - set(design)))
    for case, row in rows.items():
        if case != "design":
            check(f"eval line values only at design {line['name']} {case}",
                  "life_cycle_cost" not in row and "duty_flow_m3_s" not in row and "pump_power_kW" in row)
    if ENERGY_KEYS <= set(design):
        cost = line["cost"]
        capital = cost.get("price_per_m", 0) * line["length_m"] + cost.get("lump_sum", 0)
        # Source: hand arithmetic: capital = price per metre × length + lump sum;
        # life-cycle cost = capital + present value of the energy
        check(f"eval capital {line['name']}", close(design["capital_cost"], capital, 1e-15))
        check(f"eval life-cycle {line['name']}",
              close(design["life_cycle_cost"], capital + design["life_energy_cost_pv"], 1e-14))
        # Common practice (no single source): a rougher pipe delivers less
        # from the same pump (the demo's lines do not get smoother)
        check(f"eval duty aged <= new {line['name']}",
              design["duty_flow_m3_s"] <= design["duty_flow_new_m3_s"] * (1 + 1e-12))

# one run's energy settings: a doubled price doubles the cost (Source: hand
# arithmetic, cost = energy × price), the file is not changed
code, out2, err = run("eval", demo, "--format", "json", "--energy-price", "0.32 /kWh", "--currency", "USD")
doc2 = json.loads(out2) if code == 0 else {"results": []}
check("eval --energy-price exit", code == 0, err)
before = open(demo, encoding="utf-8").read()
for a, b in zip(doc["results"], doc2["results"]):
    if a["case"] == "design" and "energy_cost_per_year" in a:
        check(f"eval --energy-price {a['line']}",
              close(b["energy_cost_per_year"], a["energy_cost_per_year"] * 2.0, 1e-14)
              and close(b["energy_kWh_per_year"], a["energy_kWh_per_year"], 1e-15))
check("eval overrides leave the file alone", open(demo, encoding="utf-8").read() == before)
code, out, err = run("eval", demo, "--format", "csv", "--currency", "USD")
check("eval csv names the currency", code == 0 and "life_cycle_cost (USD)" in out.splitlines()[0], out[:300])
check("eval csv names kWh per year", code == 0 and "energy (kWh/yr)" in out.splitlines()[0], out[:300])
for name, args, needle in [
    ("efficiency 0", ["--efficiency", "0"], "--efficiency"),
    ("efficiency above 100", ["--efficiency", "101 %"], "--efficiency"),
    ("hours beyond a year", ["--hours", "8000", "--hours-maximum", "1000"], "--hours"),
    ("negative price", ["--energy-price", "-1"], "--energy-price"),
    ("life 0", ["--life", "0"], "--life"),
    ("rate not a number", ["--discount-rate", "five"], "--discount-rate"),
    ("currency too long", ["--currency", "X" * 40], "--currency"),
]:
    code, out, err = run("eval", demo, *args)
    check(f"eval refuses {name}", code == 2 and out == "" and len(err.splitlines()) == 1
          and err.startswith("rugosa-cli: " + needle), f"{code} {err!r}")

code, out, err = run("eval", "/nonexistent/x.rugosa")
check("eval missing file", code == 2 and out == "" and len(err.splitlines()) == 1, err)

# --- render: the chart in three formats, with the caution footer ------------
import shutil
import tempfile
tmp = tempfile.mkdtemp(prefix="rugosa-render-")
env_date = {"SOURCE_DATE_EPOCH": "1764633600"}  # 2025-12-02, a fixed footer date


def run_env(extra, *args):
    env = {**BASE_ENV, **extra}
    p = subprocess.run([CLI, *args], capture_output=True, text=True, timeout=60, env=env)
    return p.returncode, p.stdout, p.stderr


for view in ("friction", "system", "cost"):
    for ext, magic in (("png", b"\x89PNG"), ("svg", b"<?xml"), ("pdf", b"%PDF")):
        path = os.path.join(tmp, f"demo-{view}." + ext)
        code, out, err = run_env(env_date, "render", demo, "-o", path, "--width", "1200",
                                 "--height", "800", "--view", view)
        ok = code == 0 and out == "" and os.path.exists(path)
        check(f"render {view} {ext}", ok and open(path, "rb").read(5).startswith(magic), err)
    if view == "friction":
        shutil.copyfile(os.path.join(tmp, "demo-friction.pdf"), os.path.join(tmp, "demo.pdf"))
pdftotext_views = shutil.which("pdftotext")
if pdftotext_views:
    # Common practice (no single source): each view carries its axis titles,
    # the caution with the date, and the system view the names of the lines
    for view, needles in (("system", ("Flow", "Head", "PE100 200 SDR 11", "licensed engineer", "2025-12-02")),
                          ("cost", ("Years of service", "Cumulative cost", "pays back after", "licensed engineer"))):
        text = subprocess.run([pdftotext_views, os.path.join(tmp, f"demo-{view}.pdf"), "-"],
                              capture_output=True, text=True).stdout
        for needle in needles:
            check(f"render {view} pdf text {needle}", needle in text, text[:200])
pdftotext = shutil.which("pdftotext")
if pdftotext:
    text = subprocess.run([pdftotext, os.path.join(tmp, "demo.pdf"), "-"], capture_output=True,
                          text=True).stdout
    # Common practice (no single source): an exported chart carries its axis
    # titles, the line names and the caution with the date.
    for needle in ("Reynolds number", "Darcy friction factor", "Steel NPS 6 Sch 40",
                   "licensed engineer", "2025-12-02"):
        check(f"render pdf text {needle}", needle in text, text[:200])
    # The legend names every line and explains the chart's symbols; with
    # --title a heading carries the title and the conditions.
    titled = os.path.join(tmp, "titled.pdf")
    code, out, err = run_env(env_date, "render", demo, "-o", titled, "--age", "25",
                             "--title", "Riser options")
    check("render --title", code == 0 and out == "" and err == "", err)
    text = subprocess.run([pdftotext, "-raw", titled, "-"], capture_output=True, text=True).stdout
    names = [line["name"] for line in json.load(open(demo, encoding="utf-8"))["lines"]]
    for needle in names + ["Riser options", "Service age: 25.0 years",
                           "Friction model: Colebrook (1939)", "Water (IAPWS-IF97) at",
                           "flow range, minimum to maximum", "aging, new → 25.0 years",
                           "curve of a line’s ε/D, new", "turbulent:", "transitionally rough"]:
        check(f"render --title pdf text {needle}", needle in text, text[:300])
a, b = os.path.join(tmp, "a.png"), os.path.join(tmp, "b.png")
run_env(env_date, "render", demo, "-o", a, "--theme", "dark", "--age", "40")
run_env(env_date, "render", demo, "-o", b, "--theme", "dark", "--age", "40")
check("render reproducible", os.path.exists(a) and open(a, "rb").read() == open(b, "rb").read())
for name, args, needle in [
    ("no output", ["render", demo], "-o"),
    ("bad extension", ["render", demo, "-o", os.path.join(tmp, "x.jpg")], "-o"),
    ("tiny width", ["render", demo, "-o", a, "--width", "10"], "--width"),
    ("nan height", ["render", demo, "-o", a, "--height", "nan"], "--height"),
    ("bad theme", ["render", demo, "-o", a, "--theme", "sepia"], "--theme"),
    ("bad view", ["render", demo, "-o", a, "--view", "pump"], "--view"),
    ("bad age", ["render", demo, "-o", a, "--age", "-3"], "--age"),
    ("missing project", ["render", "/nonexistent.rugosa", "-o", a], "nonexistent"),
    ("title with a control character", ["render", demo, "-o", a, "--title", "a\x01b"], "--title"),
    ("title on another view", ["render", demo, "-o", a, "--view", "cost", "--title", "x"], "--title"),
]:
    code, out, err = run(*args)
    check(f"render refuses {name}", code == 2 and out == "" and len(err.splitlines()) == 1
          and needle in err, f"{code} {err!r}")
# --- report: the PDF of a project (its contents: tests/cli-report.py) ------
r1, r2 = os.path.join(tmp, "r1.pdf"), os.path.join(tmp, "r2.pdf")
code, out, err = run_env(env_date, "report", demo, "-o", r1)
check("report writes a PDF", code == 0 and out == "" and err == ""
      and open(r1, "rb").read(5) == b"%PDF-", f"{code} {err!r}")
run_env(env_date, "report", demo, "-o", r2)
check("report reproducible", os.path.exists(r2) and open(r1, "rb").read() == open(r2, "rb").read())
for name, args, needle in [
    ("no output", ["report", demo], "-o"),
    ("bad extension", ["report", demo, "-o", os.path.join(tmp, "x.png")], "-o"),
    ("bad paper", ["report", demo, "-o", r1, "--paper", "legal"], "--paper"),
    ("bad age", ["report", demo, "-o", r1, "--age", "forty"], "--age"),
    ("unknown option", ["report", demo, "-o", r1, "--view", "cost"], "--view"),
    ("missing project", ["report", "/nonexistent.rugosa", "-o", r1], "nonexistent"),
    ("two projects", ["report", demo, demo, "-o", r1], "report"),
]:
    code, out, err = run(*args)
    check(f"report refuses {name}", code == 2 and out == "" and len(err.splitlines()) == 1
          and needle in err, f"{code} {err!r}")

# The chart window a project may hold (its settings rows) is what render
# draws: the widest window renders; a window under one decade is refused
# when the file is read, with its path.
wide = os.path.join(tmp, "wide.rugosa")
narrow = os.path.join(tmp, "narrow.rugosa")
doc = json.load(open(demo, encoding="utf-8"))
doc["settings"]["chart"] = {"re_min": 1, "re_max": 1e10, "f_min": 0.001, "f_max": 1}
json.dump(doc, open(wide, "w", encoding="utf-8"))
code, out, err = run_env(env_date, "render", wide, "-o", a)
check("render draws the widest chart window a file may hold", code == 0 and err == "", err)
doc["settings"]["chart"] = {"re_min": 1000, "re_max": 5000, "f_min": 0.01, "f_max": 0.1}
json.dump(doc, open(narrow, "w", encoding="utf-8"))
code, out, err = run_env(env_date, "render", narrow, "-o", a)
check("a chart window under one decade is refused with its path",
      code == 2 and "settings.chart.re_max" in err, err)
shutil.rmtree(tmp)

# --- bad input: exit 2, one sentence naming the option, nothing on stdout -----
BASE = ["line", "--flow", "12 L/s", "--diameter", "100 mm", "--length", "250 m",
        "--roughness", "0.045 mm", "--fluid", "water", "--temperature", "15 C"]


def with_opt(opt, value):
    args = list(BASE)
    i = args.index(opt)
    args[i + 1] = value
    return args


def without(opt):
    args = list(BASE)
    i = args.index(opt)
    del args[i:i + 2]
    return args


bad = [
    ("zero diameter", with_opt("--diameter", "0"), "--diameter"),
    ("negative diameter", with_opt("--diameter", "-5 mm"), "--diameter"),
    ("zero flow", with_opt("--flow", "0 L/s"), "--flow"),
    ("negative flow", with_opt("--flow", "-3"), "--flow"),
    ("zero length", with_opt("--length", "0 m"), "--length"),
    ("negative length", with_opt("--length", "-1 km"), "--length"),
    ("nan flow", with_opt("--flow", "nan"), "--flow"),
    ("inf diameter", with_opt("--diameter", "inf"), "--diameter"),
    ("nan length", with_opt("--length", "NaN m"), "--length"),
    ("huge flow", with_opt("--flow", "1e999 L/s"), "--flow"),
    ("unknown unit", with_opt("--flow", "12 furlongs"), "--flow"),
    ("wrong kind", with_opt("--flow", "2 in"), "--flow"),
    ("wrong kind diameter", with_opt("--diameter", "3 L/s"), "--diameter"),
    ("wrong kind temperature", with_opt("--temperature", "3 bar"), "--temperature"),
    ("temperature too hot", with_opt("--temperature", "200 C"), "temperature"),
    ("temperature frozen", with_opt("--temperature", "-10 C"), "temperature"),
    ("missing flow", without("--flow"), "--flow"),
    ("missing length", without("--length"), "--length"),
    ("missing diameter", without("--diameter"), "--diameter"),
    ("missing fluid", without("--fluid"), "--fluid"),
    ("missing temperature", without("--temperature"), "--temperature"),
    ("empty flow", with_opt("--flow", ""), "--flow"),
    ("negative roughness", with_opt("--roughness", "-1 mm"), "--roughness"),
    ("unknown fluid", with_opt("--fluid", "lava"), "lava"),
    ("bad model", BASE + ["--model", "guesswork"], "guesswork"),
    ("friction nan", ["friction", "--re", "nan", "--rr", "0.001"], "--re"),
    ("friction negative", ["friction", "--re", "-5", "--rr", "0.001"], "--re"),
    ("friction rr", ["friction", "--re", "1e5", "--rr", "0.5"], "--rr"),
    ("friction missing", ["friction", "--rr", "0.001"], "--re"),
    ("friction inf", ["friction", "--re", "1e5", "--rr", "inf"], "--rr"),
    ("fluid missing T", ["fluid", "water"], "--temperature"),
    ("fluid bad T unit", ["fluid", "water", "--temperature", "20 Q"], "--temperature"),
    ("fluid pressure too high", ["fluid", "water", "--temperature", "20 C", "--pressure", "50 MPa"], "pressure"),
    ("unknown option", BASE + ["--colour", "red"], "--colour"),
    ("unknown command", ["frobnicate"], "frobnicate"),
]
for name, args, needle in bad:
    code, out, err = run(*args)
    lines = [l for l in err.splitlines() if l.strip()]
    check(f"bad {name}: exit 2", code == 2, f"exit {code} stderr {err!r}")
    check(f"bad {name}: no stdout", out == "", repr(out))
    check(f"bad {name}: one line", len(lines) == 1, repr(err))
    check(f"bad {name}: names it", needle.lower() in err.lower(), repr(err))

print(f"{passed} passed, {failed} failed")
sys.exit(1 if failed else 0)
