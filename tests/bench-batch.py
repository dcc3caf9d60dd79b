#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""Throughput of rugosa-cli line --batch (a `meson test --benchmark`).

Run: bench-batch.py PATH/TO/rugosa-cli PATH/TO/gen-lines.py [ROWS]

A CSV of ROWS (100 000) invented water lines with catalog pipes is made in
a temporary folder, then evaluated three times as CSV and three times as
JSON lines, output to /dev/null.  Prints one JSON object per format: rows
per second of the child's CPU time (user + system, median of the three
runs; the build machine's two cores are shared, so wall time measures the
neighbours as much as the batch) and the wall time beside it.  Target: at
least 100 000 rows per second on one core."""
import json
import os
import resource
import statistics
import subprocess
import sys
import tempfile
import time

CLI, GEN = sys.argv[1], sys.argv[2]
ROWS = int(sys.argv[3]) if len(sys.argv) > 3 else 100000
ENV = {**os.environ, "LANG": "C.UTF-8", "LC_ALL": "C.UTF-8"}


def child_cpu():
    r = resource.getrusage(resource.RUSAGE_CHILDREN)
    return r.ru_utime + r.ru_stime


with tempfile.TemporaryDirectory(prefix="rugosa-bench-") as tmp:
    path = os.path.join(tmp, "batch.csv")
    subprocess.run(["/usr/bin/python3", GEN, "batch", str(ROWS), path], check=True)
    for fmt, extra in (("csv", []), ("json", ["--json"])):
        cpu, wall = [], []
        for _ in range(3):
            c0, w0 = child_cpu(), time.monotonic()
            with open(os.devnull, "w") as sink:
                p = subprocess.run([CLI, "line", "--batch", path, *extra], stdout=sink,
                                   stderr=subprocess.PIPE, env=ENV, text=True)
            wall.append(time.monotonic() - w0)
            cpu.append(child_cpu() - c0)
            if p.returncode != 0:
                print(json.dumps({"bench": "batch", "error": p.stderr.strip()}))
                sys.exit(1)
        t = statistics.median(cpu)
        print(json.dumps({"bench": "batch-" + fmt, "rows": ROWS,
                          "rows_per_s": round(ROWS / t), "cpu_s": round(t, 3),
                          "wall_s_median": round(statistics.median(wall), 3),
                          "target_rows_per_s": 100000, "clock": "child-cpu"}))
