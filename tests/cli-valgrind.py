#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""rugosa-cli under valgrind: memory errors and definite leaks fail.

Run: cli-valgrind.py PATH/TO/rugosa-cli
Each case runs once under memcheck (--error-exitcode=99, --leak-check=full,
--errors-for-leak-kinds=definite): every command, success and refusal, JSON
and table output.  Two cases run at a time.  The exit status must be the one
the case expects (0 or 2); 99 means valgrind found an error."""
import concurrent.futures
import shutil
import subprocess
import sys

CLI = sys.argv[1]
VALGRIND = shutil.which("valgrind")
if VALGRIND is None:
    print("1..0 # SKIP valgrind is not installed")
    sys.exit(77)

LINE = ["line", "--flow", "12 L/s", "--diameter", "100 mm", "--length", "100 m",
        "--roughness", "0.045 mm", "--fluid", "water", "--temperature", "20 C"]
CASES = [
    ("friction json", ["friction", "--re", "1e5", "--rr", "1e-4", "--json"], 0),
    ("friction table, laminar", ["friction", "--re", "1500", "--rr", "0"], 0),
    ("friction refused", ["friction", "--re", "nan", "--rr", "1e-4"], 2),
    ("fluid water json", ["fluid", "water", "--temperature", "20 C", "--json"], 0),
    ("fluid oil table", ["fluid", "oil", "--temperature", "20 C", "--oil-nu1", "100 cSt",
                         "--oil-t1", "40 C", "--oil-nu2", "10 cSt", "--oil-t2", "100 C",
                         "--oil-density", "870 kg/m3"], 0),
    ("fluid seawater refused", ["fluid", "seawater", "--temperature", "20 C",
                                "--salinity", "200 g/kg"], 2),
    ("line json", LINE + ["--json"], 0),
    ("line table with pipe, material, fittings, age",
     ["line", "--flow", "150 gpm", "--pipe", "NPS 4 Sch 40", "--length", "300 ft",
      "--fluid", "custom", "--density", "998 kg/m3", "--viscosity", "1 cSt",
      "--fitting", "elbow-90-standard x4", "--fitting", "K=0.5", "--k-sum", "1",
      "--elevation", "5 m", "--age", "20", "--aging", "moderate"], 0),
    ("line air json with warning", ["line", "--flow", "0.5 m3/s", "--diameter", "100 mm",
                                    "--length", "100 m", "--roughness", "0.045 mm",
                                    "--fluid", "air", "--temperature", "20 C",
                                    "--pressure", "1.5 MPa", "--json"], 0),
    ("line refused: unknown pipe", ["line", "--flow", "1 L/s", "--pipe", "NPS 2 Sch 41",
                                    "--length", "1 m", "--fluid", "water",
                                    "--temperature", "20 C"], 2),
    ("line refused: 100 kB value", LINE + ["--k-sum", "9" * 100_000], 2),
    ("catalog pipes json", ["catalog", "pipes", "--json"], 0),
    ("catalog materials table", ["catalog", "materials"], 0),
    ("catalog fittings, aging, fluids", ["catalog", "fittings"], 0),
    ("catalog refused", ["catalog", "valves"], 2),
    ("unknown command", ["teleport"], 2),
    ("help", ["--help"], 0),
]


def run(case):
    name, args, want = case
    p = subprocess.run([VALGRIND, "-q", "--error-exitcode=99", "--leak-check=full",
                        "--errors-for-leak-kinds=definite", CLI] + args,
                       capture_output=True, timeout=240,
                       env={"LANG": "C.UTF-8", "PATH": "/usr/bin:/bin"})
    return name, want, p.returncode, p.stderr.decode("utf-8", "replace")


def main():
    passed = failed = 0
    with concurrent.futures.ThreadPoolExecutor(2) as pool:
        for name, want, rc, err in pool.map(run, CASES):
            if rc == want:
                passed += 1
            else:
                failed += 1
                print(f"FAIL {name}: exit {rc}, expected {want}\n{err[-3000:]}")
    print(f"{passed} passed, {failed} failed")
    return 1 if failed else 0


sys.exit(main())
