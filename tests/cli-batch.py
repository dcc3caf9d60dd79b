#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""rugosa-cli line --batch: the same results and refusals as single calls.

Run: cli-batch.py PATH/TO/rugosa-cli PATH/TO/gen-lines.py

The oracle is `rugosa-cli line` itself, called once per sampled row with
the row's cells as options: the batch must give exactly its JSON members
(numbers compared as doubles, bit for bit) or its refusal sentence.  Then
the batch's own contract: a bad row between good ones leaves them
computed, exit status 2 with one sentence on stderr, the row's number and
column in its error; CSV and JSON carry the same numbers; a bad header,
file or option refuses the whole batch with nothing on stdout; CSV
quoting, CRLF, a byte order mark, blank lines and standard input."""
import csv
import io
import json
import os
import random
import subprocess
import sys
import tempfile

CLI, GEN = sys.argv[1], sys.argv[2]
BASE_ENV = {**os.environ, "LANG": "C.UTF-8", "LC_ALL": "C.UTF-8"}
passed = 0
failed = 0


def run(*args, stdin=None):
    p = subprocess.run([CLI, *args], capture_output=True, text=True,
                       timeout=120, env=BASE_ENV, input=stdin)
    return p.returncode, p.stdout, p.stderr


def check(name, ok, detail=""):
    global passed, failed
    if ok:
        passed += 1
    else:
        failed += 1
        print(f"FAIL {name} {detail}")


def single_line_args(header, cells):
    args = ["line", "--json"]
    for name, value in zip(header, cells):
        if value.strip():
            args += ["--" + name, value]
    return args


tmp = tempfile.mkdtemp(prefix="rugosa-batch-")


def write(name, text):
    path = os.path.join(tmp, name)
    with open(path, "w", encoding="utf-8", newline="") as f:
        f.write(text)
    return path


# --- the batch equals single calls, row by row -----------------------------
mixed = os.path.join(tmp, "mixed.csv")
subprocess.run(["/usr/bin/python3", GEN, "batch-mixed", "300", mixed], check=True)
with open(mixed, encoding="utf-8", newline="") as f:
    records = list(csv.reader(f))
header, rows = records[0], records[1:]
code, out, err = run("line", "--batch", mixed, "--json")
batch = {}
for text in out.splitlines():
    obj = json.loads(text)
    batch[obj.pop("row")] = obj
check("mixed: one output per row", len(batch) == len(rows), f"{len(batch)} of {len(rows)}")
refused = sum(1 for obj in batch.values() if "error" in obj)
check("mixed: some rows refused (the generator refuses one in fifty)", refused > 0)
check("mixed: exit 2 when a row is refused", code == 2, str(code))
check("mixed: one sentence on stderr", err.count("\n") == 1 and str(refused) in err, err)

sample = random.Random(15).sample(range(len(rows)), 60)
sample += [i for i in range(len(rows)) if "error" in batch.get(i + 2, {})][:5]
for i in sample:
    number = i + 2          # the header is row 1
    single = run(*single_line_args(header, rows[i]))
    got = batch.get(number)
    if single[0] == 0:
        want = json.loads(single[1])
        check(f"row {number}: the members of a single call", got == want,
              f"\n batch  {got}\n single {want}")
    else:
        sentence = single[2].strip().split(": ", 2)[-1]
        check(f"row {number}: the single call's refusal", got is not None
              and got.get("error") == sentence, f"\n batch  {got}\n single {single[2]}")

# --- CSV carries the JSON's numbers ------------------------------------------
code_csv, out_csv, _ = run("line", "--batch", mixed)
table = list(csv.reader(io.StringIO(out_csv)))
columns = table[0]
check("csv: row first, error last", columns[0] == "row" and columns[-1] == "error", str(columns))


# The CSV's columns are in the output units (by default the SI system's:
# "pressure_drop (kPa)"); JSON keys end in theirs ("_Pa", "_kW").  Both to
# base SI units by the prefixes and NIST SP 811 B.8 (kWh = 3.6e6 J).
CSV_UNIT = {"kPa": 1e3, "mPa·s": 1e-3, "mm": 1e-3, "L/s": 1e-3, "kW": 1e3,
            "kWh/yr": 3.6e6}
JSON_SUFFIX = {"_kW": 1e3, "_kWh_per_year": 3.6e6}


def csv_numbers(header, cells):
    out = []
    for name, cell in zip(header, cells):
        try:
            value = float(cell)
        except ValueError:
            continue
        unit = name[name.index("(") + 1:-1] if name.endswith(")") else ""
        out.append(value * CSV_UNIT.get(unit, 1.0))
    return out


def json_numbers(obj):
    out = []
    for key, value in obj.items():
        if key == "row" or not isinstance(value, (int, float)):
            continue
        out.append(value * next((f for s, f in JSON_SUFFIX.items() if key.endswith(s)), 1.0))
    return out


# both follow the order of the output keys: the numbers line up
same = len(table) - 1 == len(batch)
for record in table[1:]:
    obj = batch[int(record[0])]
    if "error" in obj:
        same &= record[-1] != "" and csv_numbers(columns[1:-1], record[1:-1]) == []
        continue
    got = csv_numbers(columns[1:-1], record[1:-1])
    want = json_numbers(obj)
    # one rounding in each unit conversion
    same &= len(got) == len(want) and all(abs(a - b) <= 4e-16 * max(abs(a), abs(b)) + 1e-300
                                          for a, b in zip(got, want))
check("csv: the same numbers as JSON", same and code_csv == code)
check("csv: in the SI system's units by default",
      "pressure_drop (kPa)" in columns and "velocity (m/s)" in columns, str(columns))
code_us, out_us, _ = run("line", "--batch", mixed, "--units", "us")
check("csv: --units us for the whole batch",
      "velocity (ft/s)" in next(csv.reader(io.StringIO(out_us))) and code_us == code_csv)
units_col = write("units-column.csv", "flow,pipe,length,fluid,units\n12 L/s,NPS 4 Sch 40,250 m,water,us\n")
code_uc, out_uc, err_uc = run("line", "--batch", units_col)
check("a units column is refused: units are the whole batch's",
      code_uc == 2 and out_uc == "" and "output unit" in err_uc, err_uc)
code_solve, out_solve, err_solve = run("line", "--batch", mixed, "--solve", "flow", "--head-loss", "5 m")
check("--solve is refused in a batch", code_solve == 2 and out_solve == "" and "--solve" in err_solve,
      err_solve)

# --- a bad row in the middle ---------------------------------------------------
middle = write("middle.csv",
               "flow,pipe,length,fluid,temperature\r\n"
               "12 L/s,NPS 4 Sch 40,250 m,water,20 C\r\n"
               "12 L/s,NPS 4 Sch 40,-5 m,water,20 C\r\n"
               "9 L/s,NPS 3 Sch 40,120 m,water,15 C\r\n")
code, out, err = run("line", "--batch", middle, "--json")
objs = [json.loads(t) for t in out.splitlines()]
check("middle: three rows out", [o["row"] for o in objs] == [2, 3, 4], out)
check("middle: rows around the bad one computed",
      "velocity_m_s" in objs[0] and "velocity_m_s" in objs[2], out)
check("middle: the bad row names its column", objs[1].get("column") == "length"
      and "error" in objs[1] and "velocity_m_s" not in objs[1], str(objs[1]))
check("middle: exit 2, one sentence", code == 2 and err.count("\n") == 1, err)
code, out, err = run("line", "--batch", middle)
lines = out.splitlines()
check("middle csv: the error cell names row and column",
      lines[2].startswith("3,") and "Row 3, column length:" in lines[2], lines[2])
check("middle csv: the rows around it have no error", lines[1].endswith(",")
      and lines[3].endswith(","), out)

# --- options on the command line apply to every row ------------------------------
shared = write("shared.csv", "flow,pipe,length\n12 L/s,NPS 4 Sch 40,250 m\n")
code, out, err = run("line", "--batch", shared, "--json", "--fluid", "water",
                     "--temperature", "20 C")
ref = run("line", "--json", "--flow", "12 L/s", "--pipe", "NPS 4 Sch 40", "--length", "250 m",
          "--fluid", "water", "--temperature", "20 C")
got = json.loads(out.splitlines()[0]) if out else {}
got.pop("row", None)
check("command-line options apply to every row", code == 0 and got == json.loads(ref[1]), out + err)

# --- CSV details: quotes, CRLF, BOM, blank lines, standard input -----------------
detail = ('\ufeffflow,pipe,length,fluid,temperature,fitting\r\n'
          '"12 L/s","NPS 4 Sch 40","250 m",water,"20 C","elbow-90-standard x2"\n'
          '\r\n'
          '12 L/s,NPS 4 Sch 40,250 m,water,20 C,\r\n')
code, out, err = run("line", "--batch", "-", "--json", stdin=detail)
objs = [json.loads(t) for t in out.splitlines()]
check("details: rows 2 and 4, the blank line skipped", [o["row"] for o in objs] == [2, 4],
      out + err)
check("details: a quoted fitting applied", code == 0 and objs[0]["minor_loss_k_total"] > 0
      and objs[1]["minor_loss_k_total"] == 0, out)

code, out, err = run("line", "--batch", "-", "--json", stdin='flow,pipe\n"unterminated')
check("an open quote at the end is a refused row", code == 2
      and "closing double quote" in json.loads(out)["error"] and "1 of 1 rows" in err, out + err)

wide = write("wide.csv", "flow,pipe,length,fluid,temperature\n12 L/s,NPS 4 Sch 40,250 m,water,20 C,x\n")
code, out, err = run("line", "--batch", wide, "--json")
check("a row wider than the header is refused", code == 2 and "error" in json.loads(out), out)

# --- refusals of the whole batch -------------------------------------------------
for name, text, extra in [
    ("unknown column", "flow,speed\n1 L/s,2\n", []),
    ("column with dashes", "--flow\n1 L/s\n", []),
    ("non-repeatable column twice", "flow,flow\n1 L/s,2 L/s\n", []),
    ("column also on the command line", "flow\n1 L/s\n", ["--flow", "2 L/s"]),
    ("empty file", "", []),
    ("json as a column", "json\nx\n", []),
]:
    path = write("bad.csv", text)
    code, out, err = run("line", "--batch", path, *extra)
    check(f"whole batch refused: {name}", code == 2 and out == "" and err.count("\n") == 1
          and err.startswith("rugosa-cli: --batch: "), f"{code} {out!r} {err!r}")
code, out, err = run("line", "--batch", tmp)
check("a folder is refused", code == 2 and out == "" and "folder" in err, err)
code, out, err = run("line", "--batch", os.path.join(tmp, "missing.csv"))
check("a missing file is refused", code == 2 and out == "" and err.count("\n") == 1, err)

print(f"{passed} passed, {failed} failed")
sys.exit(1 if failed else 0)
