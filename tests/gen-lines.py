#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""Invented line options in quantity, for the scale tests and benchmarks.

Run:
  gen-lines.py project N OUT.rugosa [SOURCE_ROOT]
      A project of N water lines (rugosa-line-options version 1): catalog
      pipes and materials of data/, flows for a velocity of 0.3-3 m/s,
      lengths of 20 m to 5 km, some fittings, some aging, lowest and
      highest flows on every third line; names "Option 17" and groups
      "Zone A" … "Zone L", all invented.
  gen-lines.py batch N OUT.csv [SOURCE_ROOT]
      A CSV for `rugosa-cli line --batch` with N rows of water lines with
      catalog pipes (the throughput case of the batch benchmark).
  gen-lines.py batch-mixed N OUT.csv [SOURCE_ROOT]
      The same with every option the batch takes in use, and one row in
      fifty refused on purpose (for tests).

The output depends only on N (a fixed seed): the generated files are made
at build or test time and never committed.
"""
import glob
import json
import math
import os
import random
import sys

WATER_DENSITY = 998.0  # kg/m3, near 20 C: only to pick plausible flows


def pipes(root):
    """(designation, inner diameter m, material id) of the catalogs."""
    out = []
    for path in sorted(glob.glob(os.path.join(root, "data", "pipes-*.json"))):
        with open(path, encoding="utf-8") as f:
            d = json.load(f)
        scale = 0.0254 if d.get("units") == "in" else 0.001
        if "outside_diameters" not in d:
            continue  # a catalog that borrows another's diameters
        for s in d["series"]:
            for nominal, wall in s.get("walls", {}).items():
                od = d["outside_diameters"].get(nominal)
                if od is None:
                    continue
                inner = (od - 2 * wall) * scale
                if inner < 0.015 or inner > 0.9:
                    continue
                name = d["designation"].format(nominal=nominal, label=s["label"])
                out.append((name, inner, s.get("material_id", d.get("material_id"))))
    return out


def lines(n, root):
    rnd = random.Random(1000 + n)
    catalog = pipes(root)
    fittings = ["elbow-90-standard", "elbow-45-standard", "valve-gate", "tee-run-flanged"]
    for i in range(n):
        name, inner, material = catalog[rnd.randrange(len(catalog))]
        area = math.pi * inner * inner / 4
        q = area * math.exp(rnd.uniform(math.log(0.3), math.log(3.0)))
        line = {
            "name": f"Option {i + 1}",
            "group": f"Zone {'ABCDEFGHIJKL'[i % 12]}",
            "temperature": rnd.choice([5.0, 10.0, 15.0, 20.0, 40.0, 60.0]),
            "pipe": name,
            "material": material,
            "length": round(math.exp(rnd.uniform(math.log(20), math.log(5000))), 1),
            "flow": q,
            "fittings": [],
            "aging": rnd.random() < 0.4,
        }
        for _ in range(rnd.randrange(3)):
            line["fittings"].append((rnd.choice(fittings), rnd.randrange(1, 6)))
        if i % 3 == 0:
            line["flow_min"] = q * 0.5
            line["flow_max"] = q * 1.4
        yield line


def write_project(n, out, root):
    colours = ["#1b6f9e", "#c2572b", "#2f8f5b", "#8a4fb0", "#b38600",
               "#b0304f", "#3d7d7a", "#6a6fc4", "#7c5a2e", "#5a8f1f"]
    doc = {
        "format": "rugosa-line-options",
        "version": 1,
        "settings": {"service_age_years": 10},
        "lines": [],
    }
    for i, l in enumerate(lines(n, root)):
        obj = {
            "name": l["name"],
            "group": l["group"],
            "colour": colours[i % len(colours)],
            "fluid": {"kind": "water", "temperature_K": 273.15 + l["temperature"],
                      "pressure_Pa": 400000},
            "material": {"catalog": l["material"]},
            "pipe": {"designation": l["pipe"]},
            "length_m": l["length"],
            "elevation_change_m": 0,
            "fittings": [{"catalog": f, "count": c} for f, c in l["fittings"]],
            "flow": {"design_m3_s": l["flow"]},
        }
        if l["aging"]:
            obj["aging"] = {"class": "moderate"}
        if "flow_min" in l:
            obj["flow"]["minimum_m3_s"] = l["flow_min"]
            obj["flow"]["maximum_m3_s"] = l["flow_max"]
        doc["lines"].append(obj)
    with open(out, "w", encoding="utf-8") as f:
        json.dump(doc, f, indent=1)
        f.write("\n")


def write_batch(n, out, root, mixed):
    with open(out, "w", encoding="utf-8", newline="") as f:
        if mixed:
            f.write("flow,pipe,length,fluid,temperature,pressure,fitting,fitting,"
                    "elevation,age,aging,model\r\n")
        else:
            f.write("flow,pipe,length,fluid,temperature\r\n")
        for i, l in enumerate(lines(n, root)):
            flow = f"{l['flow'] * 1000:.4g} L/s"
            temp = f"{l['temperature']:g} C"
            if not mixed:
                f.write(f"{flow},{l['pipe']},{l['length']:g} m,water,{temp}\r\n")
                continue
            fit = [f"{name} x{count}" for name, count in l["fittings"]] + ["", ""]
            age, aging = ("", "")
            if l["aging"]:
                age, aging = ("25", "moderate")
            model = ["", "colebrook", "haaland", "swamee-jain", "churchill"][i % 5]
            if i % 50 == 7:
                temp = "400 C"   # outside the water model: refused
            f.write(f"{flow},\"{l['pipe']}\",{l['length']:g} m,water,{temp},4 bar,"
                    f"{fit[0]},{fit[1]},{(i % 7) - 3} m,{age},{aging},{model}\r\n")


def main(argv):
    if len(argv) < 4 or argv[1] not in ("project", "batch", "batch-mixed"):
        sys.stderr.write(__doc__)
        return 2
    n = int(argv[2])
    root = argv[4] if len(argv) > 4 else os.path.join(os.path.dirname(__file__), "..")
    if argv[1] == "project":
        write_project(n, argv[3], root)
    else:
        write_batch(n, argv[3], root, argv[1] == "batch-mixed")
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
