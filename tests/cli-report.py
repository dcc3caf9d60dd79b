#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""rugosa-cli report: the PDF of a project, read back with poppler-utils.

Run: cli-report.py PATH/TO/rugosa-cli PATH/TO/gen-lines.py SOURCE_ROOT

The demo project's report: the paper's size (pdfinfo), every line's name
and its design head loss as `rugosa-cli eval --json` gives it (pdftotext),
"Page n of N" and the version, every font embedded (pdffonts).  A
generated project of many line options: several pages, and every line's
block whole on one page (its heading and its last results row on the same
page).  What is taller than a page (a life-cycle table of 150 rows, a
long note) runs over pages whole.  US Letter on request and from the
locale; bad input refused."""
import json
import os
import re
import shutil
import subprocess
import sys
import tempfile

CLI, GEN, ROOT = sys.argv[1], sys.argv[2], sys.argv[3]
DEMO = os.path.join(ROOT, "data", "demo.rugosa")
ENV = {**os.environ, "LANG": "C.UTF-8", "LC_ALL": "C.UTF-8",
       "SOURCE_DATE_EPOCH": "1764633600"}
passed = failed = 0


def check(name, ok, detail=""):
    global passed, failed
    if ok:
        passed += 1
    else:
        failed += 1
        print(f"FAIL {name} {detail}")


def run(*args, env=None):
    p = subprocess.run([CLI, *args], capture_output=True, text=True, timeout=120,
                       env=env or ENV)
    return p.returncode, p.stdout, p.stderr


def tool(name, *args):
    return subprocess.run([name, *args], capture_output=True, text=True, timeout=60).stdout


for t in ("pdfinfo", "pdftotext", "pdffonts"):
    if shutil.which(t) is None:
        print(f"SKIP: {t} (poppler-utils) is missing")
        sys.exit(77)

tmp = tempfile.mkdtemp(prefix="rugosa-report-")


def info(path):
    out = tool("pdfinfo", path)
    pages = int(re.search(r"^Pages:\s+(\d+)", out, re.M).group(1))
    w, h = map(float, re.search(r"^Page size:\s+([\d.]+) x ([\d.]+) pts", out, re.M).groups())
    return pages, w, h


def page_texts(path, pages):
    return [tool("pdftotext", "-f", str(i), "-l", str(i), path, "-") for i in range(1, pages + 1)]


# --- the demo project -------------------------------------------------------
a4 = os.path.join(tmp, "demo.pdf")
code, out, err = run("report", DEMO, "-o", a4)
check("demo report written", code == 0 and out == "" and err == "", f"{code} {err!r}")
pages, w, h = info(a4)
# Source: ISO 216, A4 is 210 mm x 297 mm = 595.28 x 841.89 pt at 72 pt/in.
check("A4 by default in the C locale", abs(w - 595.28) < 0.5 and abs(h - 841.89) < 0.5, f"{w} x {h}")
texts = page_texts(a4, pages)
text = "\n".join(texts)

# The known numbers come from the same program's evaluation of the same
# project: the design head loss of each line, shown with four significant
# figures in the project's unit of head.
with open(DEMO, encoding="utf-8") as f:
    demo = json.load(f)
units = demo.get("settings", {}).get("units", {})
check("the demo shows head in metres (the check below assumes it)",
      units.get("system", "si") == "si" and "head" not in units.get("overrides", {}), str(units))
code, out, err = run("eval", DEMO, "--format", "json")
results = json.loads(out)["results"]
names = []
for r in results:
    if r["line"] not in names:
        names.append(r["line"])
    if r["case"] != "design":
        continue
    v = r["head_loss_total_m"]
    shown = {f"{v:.4g}", f"{v:#.4g}"}
    check(f"design head loss of {r['line']} ({sorted(shown)})", any(s in text for s in shown))
for name in names:
    check(f"line name {name}", name in text)
check("every page numbered", all(f"Page {i + 1} of {pages}" in t for i, t in enumerate(texts)))
code, version, err = run("--version")
check("the version", version.split()[-1] in texts[0], version)
check("the cautions in full", "licensed engineer" in texts[-1] and "burst lines" in text)
# Common practice (no single source): a results table names its units.
for unit in ("L/s", "m/s", "kPa"):
    check(f"unit {unit} in the tables", unit in text)

fonts = tool("pdffonts", a4).splitlines()[2:]
check("fonts listed", len(fonts) > 0)
for line in fonts:
    # the columns: name type encoding emb sub uni object ID
    fields = line.split()
    check(f"font embedded: {fields[0]}", len(fields) >= 7 and fields[-5] == "yes", line)

# --- the paper ----------------------------------------------------------------
letter = os.path.join(tmp, "letter.pdf")
code, out, err = run("report", DEMO, "-o", letter, "--paper", "letter")
_, w, h = info(letter)
# Source: ANSI/ASME Y14.1, US Letter is 8.5 in x 11 in = 612 x 792 pt.
check("--paper letter", code == 0 and (w, h) == (612.0, 792.0), f"{w} x {h}")
for env_name, locale, size in (("LC_ALL", "en_US.UTF-8", (612.0, 792.0)),
                               ("LC_PAPER", "fr_CA.UTF-8", (612.0, 792.0)),
                               ("LANG", "de_DE.UTF-8", None)):
    env = {k: v for k, v in ENV.items() if k not in ("LC_ALL", "LC_PAPER", "LANG")}
    env[env_name] = locale
    path = os.path.join(tmp, f"locale-{locale}.pdf")
    code, out, err = run("report", DEMO, "-o", path, env=env)
    _, w, h = info(path)
    ok = (w, h) == size if size else abs(w - 595.28) < 0.5
    check(f"paper of {env_name}={locale}", code == 0 and ok, f"{w} x {h} {err!r}")
code, out, err = run("report", DEMO, "-o", letter, "--paper", "a4", env={**ENV, "LC_ALL": "en_US.UTF-8"})
_, w, h = info(letter)
check("--paper a4 wins over the locale", abs(w - 595.28) < 0.5, f"{w} x {h}")

# --- many line options: several pages, no block split -----------------------
N = 40
many = os.path.join(tmp, "many.rugosa")
subprocess.run([sys.executable, GEN, "project", str(N), many, ROOT], check=True)
many_pdf = os.path.join(tmp, "many.pdf")
code, out, err = run("report", many, "-o", many_pdf)
check("many lines written", code == 0 and err == "", err)
pages, _, _ = info(many_pdf)
check(f"{N} lines give several pages", pages >= N // 4, str(pages))
texts = page_texts(many_pdf, pages)
# A line's block opens with its number and name on a line of their own and
# ends with the last row of its results table.
LAST_ROW = "Electric input power"
found = {}
for p, t in enumerate(texts):
    # the chart's page: its legend numbers and names the lines as the
    # blocks do, and no block opens there
    if "Reynolds number" in t and LAST_ROW not in t:
        continue
    heads = [(m.start(), int(m.group(1))) for m in
             re.finditer(r"^(\d+)\s+Option (\d+)$", t, re.M) if m.group(1) == m.group(2)]
    for i, (start, k) in enumerate(heads):
        end = heads[i + 1][0] if i + 1 < len(heads) else len(t)
        found.setdefault(k, []).append((p + 1, LAST_ROW in t[start:end]))
for k in range(1, N + 1):
    where = found.get(k, [])
    check(f"line {k}: one heading, its last row on its page", len(where) == 1 and where[0][1],
          str(where))

# --- what is taller than a page: divided where it may be ---------------------
# The demo's lines thirty times (a life-cycle table of 150 rows) and a line
# note of 1200 sentences: the table's header is repeated on every page it
# runs over, and not a sentence of the note is lost.
demo["lines"] = [dict(l, name=f"{l['name']} #{i + 1}") for i in range(30) for l in demo["lines"]]
demo["lines"][3]["note"] = ("A long note. " * 40 + "\n") * 30
big = os.path.join(tmp, "big.rugosa")
with open(big, "w", encoding="utf-8") as f:
    json.dump(demo, f)
big_pdf = os.path.join(tmp, "big.pdf")
code, out, err = run("report", big, "-o", big_pdf)
check("150 lines written", code == 0 and err == "", err)
pages, _, _ = info(big_pdf)
texts = page_texts(big_pdf, pages)
first = next(i for i, t in enumerate(texts) if "Energy and life-cycle cost" in t)
last = next(i for i, t in enumerate(texts) if "System curves" in t)
check("the life-cycle table runs over pages", last - first >= 2, f"{first} {last}")
for i in range(first, last):
    check(f"page {i + 1}: the table's header repeated", "Capital cost" in texts[i] or "Duty flow" in texts[i])
text = " ".join(texts)
check("the long note whole", len(re.findall(r"A\s+long\s+note\.", text)) == 1200,
      str(len(re.findall(r"A\s+long\s+note\.", text))))

# --- bad input --------------------------------------------------------------
for name, args in (("no -o", ["report", DEMO]),
                   ("not .pdf", ["report", DEMO, "-o", os.path.join(tmp, "x.svg")]),
                   ("paper", ["report", DEMO, "-o", a4, "--paper", "A5"]),
                   ("age", ["report", DEMO, "-o", a4, "--age", "200"]),
                   ("no project", ["report", os.path.join(tmp, "none.rugosa"), "-o", a4])):
    code, out, err = run(*args)
    check(f"refuses {name}", code == 2 and out == "" and len(err.splitlines()) == 1, f"{code} {err!r}")

shutil.rmtree(tmp)
print(f"{passed} passed, {failed} failed")
sys.exit(1 if failed else 0)
