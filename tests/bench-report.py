#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""The cost of rugosa-cli report against the number of line options (a
`meson test --benchmark`).

Run: bench-report.py PATH/TO/rugosa-cli PATH/TO/gen-lines.py SOURCE_ROOT

Invented projects of 10, 100 and 300 line options (tests/gen-lines.py) are
reported three times each to a temporary folder.  Prints one JSON object a
size: the pages, the child's CPU time (user + system, median of three; the
machine's cores are shared, so wall time measures the neighbours too) and
the wall time, and the CPU time per line option and per page, which stay
near constant when the cost grows in proportion to the lines."""
import json
import os
import re
import resource
import statistics
import subprocess
import sys
import tempfile
import time

CLI, GEN, ROOT = sys.argv[1], sys.argv[2], sys.argv[3]
ENV = {**os.environ, "LANG": "C.UTF-8", "LC_ALL": "C.UTF-8"}


def child_cpu():
    r = resource.getrusage(resource.RUSAGE_CHILDREN)
    return r.ru_utime + r.ru_stime


with tempfile.TemporaryDirectory(prefix="rugosa-bench-report-") as tmp:
    for n in (10, 100, 300):
        project = os.path.join(tmp, f"lines-{n}.rugosa")
        pdf = os.path.join(tmp, f"lines-{n}.pdf")
        subprocess.run([sys.executable, GEN, "project", str(n), project, ROOT], check=True)
        cpu, wall = [], []
        for _ in range(3):
            c0, w0 = child_cpu(), time.monotonic()
            subprocess.run([CLI, "report", project, "-o", pdf], check=True, env=ENV)
            cpu.append(child_cpu() - c0)
            wall.append(time.monotonic() - w0)
        info = subprocess.run(["pdfinfo", pdf], capture_output=True, text=True).stdout
        pages = int(re.search(r"^Pages:\s+(\d+)", info, re.M).group(1))
        c = statistics.median(cpu)
        print(json.dumps({"lines": n, "pages": pages, "cpu_s": round(c, 3),
                          "wall_s": round(statistics.median(wall), 3),
                          "cpu_ms_per_line": round(1000 * c / n, 2),
                          "cpu_ms_per_page": round(1000 * c / pages, 2),
                          "bytes": os.path.getsize(pdf)}))
