#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""The rugosa-cli bad-input matrix: every input option against every class of
bad value, and values outside each correlation's stated range.

Run: cli-bad-input.py PATH/TO/rugosa-cli           (checks every row)
     cli-bad-input.py --markdown PATH/TO/rugosa-cli (prints docs/bad-input.md)

Each row names an option, a class, the value given and what must happen:
  refuse  exit status 2, nothing on stdout, exactly one line on stderr that
          names the option (and, for a number, the accepted range or units);
  warn    exit status 0, JSON on stdout that parses, one or more entries in
          "warnings"; stderr empty, or (a result far beyond any practical
          line) lines "rugosa-cli: warning: W" whose W is one of them;
  accept  exit status 0, JSON on stdout that parses, no warning, nothing
          on stderr.
No stdout may ever hold "nan" or "inf", and no refusal may show one outside
the quotes of the value it echoes, or hold a control character.  The
expectations are the program's contract (docs/bad-input.md), not
measurements: a row fails when the program does something else.

Beside the option rows: project files and standard input that must be
refused without hanging or reading them whole (a FIFO with a timeout, a
folder, /dev/zero, a sparse 1 GiB file — refused with the peak resident
size of the process under 256 MiB — NUL and control characters, too many
line options), and the corners of the argument parser."""
import concurrent.futures
import json
import os
import re
import subprocess
import sys
import tempfile
import threading
import time

MARKDOWN = len(sys.argv) > 2 and sys.argv[1] == "--markdown"
CLI = os.path.abspath(sys.argv[-1])
LONG = "9" * 100_000  # 100 kB, below the 128 kB limit of one argv string

FRICTION = ["friction", "--re", "1e5", "--rr", "1e-4", "--json"]
WATER = ["line", "--flow", "12 L/s", "--diameter", "100 mm", "--length",
         "100 m", "--roughness", "0.045 mm", "--fluid", "water",
         "--temperature", "20 C", "--json"]


def replace(base, drop=(), add=()):
    """base without the options in drop, then the pairs in add."""
    out, i = [], 0
    while i < len(base):
        if base[i] in drop:
            i += 2
            continue
        out.append(base[i])
        i += 1
    return out + list(add)


SEA = replace(WATER, ["--fluid"], ["--fluid", "seawater", "--salinity", "35 g/kg"])
AIR = replace(WATER, ["--fluid", "--flow"], ["--fluid", "air", "--flow", "0.1 m3/s",
                                            "--pressure", "2 bar"])
CUSTOM = replace(WATER, ["--fluid", "--temperature"],
                 ["--fluid", "custom", "--density", "998 kg/m3", "--viscosity", "1 cP"])
# An invented lubricating oil: 100 cSt at 40 °C, 10 cSt at 100 °C.
OIL = replace(WATER, ["--fluid", "--temperature"],
              ["--fluid", "oil", "--temperature", "60 C", "--oil-nu1", "100 cSt",
               "--oil-t1", "40 C", "--oil-nu2", "10 cSt", "--oil-t2", "100 C",
               "--oil-density", "870 kg/m3", "--oil-density-t", "15 C",
               "--oil-expansion", "0.00064"])
AGED = WATER + ["--age", "10", "--aging", "moderate"]
PIPE = replace(WATER, ["--diameter"], ["--pipe", "NPS 4 Sch 40"])
MATERIAL = replace(WATER, ["--roughness"], ["--material", "commercial-steel"])

# option -> (base command, unit of a good value, unit of another kind,
#            expectations of the generic classes that differ from "refuse")
# A unit of "" means a plain number (or a name, for the catalog options).
OPTIONS = {
    "--re": (FRICTION, "", "m", {"tiny": "accept"}),
    "--rr": (FRICTION, "", "mm", {"zero": "accept", "tiny": "accept"}),
    "--model": (WATER, "name", "", {}),
    # 1e-300 L/s: v² underflows, no head loss at all (ratio to new 1)
    "--flow": (WATER, "L/s", "m", {"tiny": "accept"}),
    "--diameter": (WATER, "mm", "L/s", {}),
    "--pipe": (PIPE, "name", "", {}),
    # the length's range starts at 1 mm (its row of the field table)
    "--length": (WATER, "m", "gpm", {}),
    "--roughness": (WATER, "mm", "bar", {"zero": "accept", "tiny": "accept"}),
    "--material": (MATERIAL, "name", "", {}),
    "--age": (AGED, "", "m", {"zero": "accept", "tiny": "accept"}),
    "--aging": (AGED, "mm/yr", "m", {"zero": "accept", "tiny": "accept"}),
    "--fitting": (WATER, "name", "", {}),
    "--k-sum": (WATER, "", "m", {"zero": "accept", "tiny": "accept"}),
    "--elevation": (WATER, "m", "kPa", {"zero": "accept", "negative": "accept",
                                        "tiny": "accept"}),
    "--fluid": (WATER, "name", "", {}),
    # 0 °C lies below the water model's 0.01 °C (the triple point)
    "--temperature": (WATER, "C", "bar", {}),
    "--pressure": (WATER, "bar", "C", {}),
    "--salinity": (SEA, "g/kg", "kg/m3", {"zero": "accept", "tiny": "accept"}),
    "--density": (CUSTOM, "kg/m3", "cP", {}),
    "--viscosity": (CUSTOM, "cP", "kg/m3", {}),
    "--oil-nu1": (OIL, "cSt", "kg/m3", {}),
    "--oil-t1": (OIL, "C", "cSt", {"zero": "accept", "negative": "accept",
                                   "tiny": "accept"}),
    "--oil-nu2": (OIL, "cSt", "kg/m3", {}),
    "--oil-t2": (OIL, "C", "cSt", {}),
    "--oil-density": (OIL, "kg/m3", "cSt", {}),
    "--oil-density-t": (OIL, "C", "cSt", {"zero": "accept", "negative": "accept",
                                          "tiny": "accept"}),
    "--oil-expansion": (OIL, "", "m", {"zero": "accept", "tiny": "accept"}),
    "--re-laminar-max": (WATER, "", "m", {}),
    "--re-turbulent-min": (WATER, "", "m", {}),
}

# Values outside (or at the edge of) each correlation's stated range:
# option -> [(label, base, value, expectation)]
RANGE = {
    "--re": [("above the largest Reynolds number", FRICTION, "1e12", "refuse")],
    "--rr": [("relative roughness above the largest", FRICTION, "0.5", "refuse")],
    "--model": [("Swamee-Jain beyond its ε/D ≤ 0.01",
                 replace(WATER, ["--roughness"], ["--roughness", "2 mm"]), "swamee-jain",
                 "warn")],
    "--flow": [("transitional Reynolds number (about 3000)", WATER, "0.24 L/s", "warn"),
               ("laminar flow (Re about 250)", WATER, "0.02 L/s", "accept"),
               ("Re about 2.5e8, above Colebrook's stated 1e8", WATER, "20 m3/s", "warn"),
               # 18 m³/s through 100 mm: 2300 m/s, far beyond any line
               ("a bare number, far beyond any practical line", WATER, "18", "warn")],
    "--diameter": [("ε/D above 0.1 (0.045 mm in 0.1 mm)", WATER, "0.1 mm", "refuse")],
    "--pipe": [("a designation not in the catalog", PIPE, "NPS 2 Sch 41", "refuse"),
               ("words after a designation (once dropped after the eighth token)", PIPE,
                "NPS 4 Sch 40 mm mm mm mm Sch 160", "refuse"),
               ("a second schedule", PIPE, "NPS 4 Sch 40 Sch 160", "refuse"),
               ("stray punctuation", PIPE, "NPS 4 Sch 40!!", "refuse"),
               ("brackets", PIPE, "DN 110 (SDR 11)", "refuse"),
               ("filler words and an inch mark", PIPE, "4\u2033 nominal size sch. 40 pipe",
                "accept")],
    "--length": [("a length beyond 1e7 m", WATER, "1e9 m", "refuse")],
    "--roughness": [("ε/D 0.06, above Colebrook's stated 0.05", WATER, "6 mm", "warn")],
    "--material": [("a name not in the catalog", MATERIAL, "unobtainium", "refuse")],
    "--age": [("older than 200 years", AGED, "300", "refuse"),
              # 25 years of moderate growth take the line above the default
              # gradient limit of 5 m per 100 m: a warning, as in a project
              ("age as a time", AGED, "25 yr", "warn")],
    "--aging": [("faster than 10 mm/yr", AGED, "20 mm/yr", "refuse"),
                ("an unknown class", AGED, "corrosive", "refuse")],
    "--fitting": [("count 0", WATER, "elbow-90-standard x0", "refuse"),
                  ("plain K above 10000", WATER, "K=2e4", "refuse"),
                  ("a known fitting three times", WATER, "elbow-90-standard x3", "accept")],
    "--k-sum": [("above 100000", WATER, "2e5", "refuse")],
    "--elevation": [("beyond 10 km", WATER, "2e4 m", "refuse")],
    "--fluid": [("a fluid that is not offered", WATER, "mercury", "refuse")],
    "--temperature": [("water above its model's range", WATER, "400 C", "refuse"),
                      ("water boiling at the given pressure",
                       WATER + ["--pressure", "1 bar"], "150 C", "refuse"),
                      ("air below its range", AIR, "-200 C", "refuse"),
                      ("oil outside its two viscosity points (extrapolated)", OIL,
                       "20 C", "warn")],
    "--pressure": [("water above 10 MPa", WATER, "20 MPa", "refuse"),
                   ("air above 1 MPa (ideal gas off by more than 0.5 %)", AIR,
                    "1.5 MPa", "warn")],
    "--salinity": [("above 150 g/kg", SEA, "160 g/kg", "refuse")],
    "--density": [("above any plausible fluid", CUSTOM, "1e5 kg/m3", "refuse")],
    "--viscosity": [("above any plausible fluid", CUSTOM, "1e9 Pa.s", "refuse"),
                    # 100 Pa·s at 1.5 m/s in 100 mm: about 5000 m per 100 m
                    ("a bare number, far beyond any practical line", CUSTOM, "100", "warn"),
                    ("kinematic", CUSTOM, "1 cSt", "accept")],
    "--oil-nu1": [("below 2 cSt (ASTM D341)", OIL, "1 cSt", "refuse"),
                  ("lower than at the higher temperature", OIL, "5 cSt", "refuse")],
    "--oil-t1": [("equal to --oil-t2", OIL, "100 C", "refuse")],
    "--oil-nu2": [("above 1e6 cSt", OIL, "2e6 cSt", "refuse")],
    "--oil-t2": [("above the oil model's range", OIL, "1000 C", "refuse")],
    "--oil-density": [("above 1200 kg/m3", OIL, "1500 kg/m3", "refuse")],
    "--oil-density-t": [("above the oil model's range", OIL, "1000 C", "refuse")],
    "--oil-expansion": [("above the largest coefficient", OIL, "0.1", "refuse")],
    "--re-laminar-max": [("above --re-turbulent-min", WATER, "5000", "refuse"),
                         ("below 500", WATER, "100", "refuse"),
                         ("inside the range", WATER, "2300", "accept")],
    "--re-turbulent-min": [("above 100000", WATER, "2e5", "refuse"),
                           ("inside the range", WATER, "3000", "accept")],
}

CLASSES = ["zero", "negative", "NaN", "inf", "huge", "tiny", "empty",
           "wrong unit", "unit of the wrong kind", "non-ASCII", "control characters",
           "100 kB"]


def generic_value(cls, unit, other):
    u = "" if unit in ("", "name") else " " + unit
    return {
        "zero": "0" + u,
        "negative": "-1" + u,
        "NaN": "nan" + u,
        "inf": "inf" + u,
        "huge": "1e300" + u,
        "tiny": "1e-300" + u,
        "empty": "",
        "wrong unit": "5 furlongs",
        "unit of the wrong kind": "5 " + (other or "m"),
        "non-ASCII": "\uff15" + u + " \u6c34",  # fullwidth 5, a CJK letter
        # an escape sequence that would clear the screen, a line break, a
        # C1 control (CSI)
        "control characters": "5" + u + "\x1b[2J\n\u009b1m",
        "100 kB": LONG,
    }[cls]


def rows():
    out = []
    for opt, (base, unit, other, special) in OPTIONS.items():
        for cls in CLASSES:
            if unit == "name" and cls == "unit of the wrong kind":
                continue  # a name has no unit
            value = generic_value(cls, unit, other)
            out.append((opt, cls, base, value, special.get(cls, "refuse")))
        for label, b, value, expect in RANGE.get(opt, []):
            out.append((opt, "range: " + label, b, value, expect))
    return out


NONFINITE = re.compile(r"(?i)(?<![a-z])-?(nan|inf|infinity)(?![a-z])")
# the value a refusal echoes, in double or single quotes (not apostrophes)
QUOTED = re.compile(r'"[^"]*"|\u201c[^\u201d]*\u201d|(?<!\w)\'[^\']*\'(?!\w)')
# a control character a terminal would act on: C0 but the final line end,
# DEL, C1
CONTROL = re.compile("[\x00-\x09\x0b-\x1f\x7f-\x9f]")
ENV = {"LANG": "C.UTF-8", "PATH": "/usr/bin:/bin"}


def message_problems(err):
    """What a refusal's stderr must not do: more than one line, nan or inf
    outside the quoted value, control characters, more than 600 bytes."""
    problems = []
    if err.count("\n") != 1 or not err.endswith("\n"):
        problems.append(f"stderr is {err.count(chr(10))} lines, not one")
    if NONFINITE.search(QUOTED.sub("", err)):
        problems.append("stderr shows nan or inf")
    if CONTROL.search(err[:-1] if err.endswith("\n") else err):
        problems.append("stderr holds a control character")
    # no row gives broken UTF-8: a replacement character means bytes that
    # were never text (a read past the end of a string)
    if "\ufffd" in err:
        problems.append("stderr holds a replacement character")
    if len(err.encode("utf-8")) > 600:
        problems.append(f"stderr is {len(err)} bytes long")
    return problems


def run_row(row):
    opt, cls, base, value, expect = row
    argv = [CLI] + replace(base, [opt], [opt, value]) if opt != "--fitting" \
        else [CLI] + base + [opt, value]
    p = subprocess.run(argv, capture_output=True, timeout=60, env=ENV)
    out = p.stdout.decode("utf-8", "replace")
    err = p.stderr.decode("utf-8", "replace")
    problems = []
    if NONFINITE.search(out):
        problems.append("stdout holds nan or inf")
    if expect == "refuse":
        if p.returncode != 2:
            problems.append(f"exit {p.returncode}, not 2")
        if out:
            problems.append("stdout is not empty")
        problems += message_problems(err)
        if opt not in err:
            problems.append("stderr does not name " + opt)
        try:
            p.stderr.decode("utf-8")
        except UnicodeDecodeError:
            problems.append("stderr is not UTF-8")
    else:
        if p.returncode != 0:
            problems.append(f"exit {p.returncode}, not 0")
        try:
            doc = json.loads(out)
            warnings = doc.get("warnings", [])
            if expect == "warn" and not warnings:
                problems.append("no warning")
            if expect == "accept" and warnings:
                problems.append("unexpected warning: " + "; ".join(warnings))
            # stderr holds nothing but warnings that are also in the JSON
            for line in err.splitlines():
                w = line.removeprefix("rugosa-cli: warning: ")
                if expect != "warn" or w == line or w not in warnings:
                    problems.append("stderr holds more than the JSON's warnings")
                    break
        except ValueError:
            problems.append("stdout is not JSON")
    return row, problems, err.strip()


def shown(value):
    if value == LONG:
        return "`9…9` (100 000 digits)"
    if value == "":
        return "(empty)"
    value = (value.replace("\x1b", "\\e").replace("\n", "\\n")
             .replace("\u009b", "\\u009b"))
    return "`" + value.replace("|", "\\|") + "`"


# ---- files, standard input and the argument parser ------------------------

# Common practice (no single source): far below the 1 GiB that reading the
# sparse file whole would take, well above the program's own size.
RSS_MAX_KIB = 256 * 1024
FIFO_TIMEOUT_S = 10
DEMO = os.path.join(os.environ.get("RUGOSA_SOURCE_DIR",
                                   os.path.join(os.path.dirname(__file__), "..")),
                    "data", "demo.rugosa")
DOC_HEAD = '{"format": "rugosa-line-options", "version": 1, "lines": ['


def run_measured(argv, stdin=None, cwd=None, timeout=60):
    """(exit status or None when killed at the timeout, stdout, stderr,
    peak resident size in KiB, seconds) of one run of the program."""
    start = time.monotonic()
    proc = subprocess.Popen(argv, stdin=stdin if stdin is not None else subprocess.DEVNULL,
                            stdout=subprocess.PIPE, stderr=subprocess.PIPE, env=ENV, cwd=cwd)
    got = {}
    readers = [threading.Thread(target=lambda k=k, f=f: got.__setitem__(k, f.read()))
               for k, f in (("out", proc.stdout), ("err", proc.stderr))]
    for t in readers:
        t.start()
    status, usage, killed = None, None, False
    while True:
        pid, status, usage = os.wait4(proc.pid, os.WNOHANG)
        if pid == proc.pid:
            break
        if time.monotonic() - start > timeout:
            proc.kill()
            killed = True
            _, status, usage = os.wait4(proc.pid, 0)
            break
        time.sleep(0.005)
    elapsed = time.monotonic() - start
    proc.returncode = os.waitstatus_to_exitcode(status)
    for t in readers:
        t.join()
    proc.stdout.close()
    proc.stderr.close()
    return (None if killed else proc.returncode, got.get("out", b""), got.get("err", b""),
            usage.ru_maxrss, elapsed)


def make_files(tmp):
    """The bad project files the rows below give rugosa-cli."""
    files = {}

    def doc(path, text):
        with open(path, "w", encoding="utf-8") as f:
            f.write(text)
        return path

    files["fifo"] = os.path.join(tmp, "pipe.rugosa")
    os.mkfifo(files["fifo"])
    files["folder"] = os.path.join(tmp, "folder.rugosa")
    os.mkdir(files["folder"])
    files["zero"] = os.path.join(tmp, "zero.rugosa")
    os.symlink("/dev/zero", files["zero"])
    files["sparse"] = os.path.join(tmp, "sparse.rugosa")
    with open(files["sparse"], "wb") as f:
        f.truncate(1 << 30)
    files["nul-name"] = doc(os.path.join(tmp, "nul-name.rugosa"),
                            DOC_HEAD + '{"name": "cut\\u0000here"}]}')
    files["nul-format"] = doc(os.path.join(tmp, "nul-format.rugosa"),
                              '{"format": "rugosa-line-options\\u0000junk", "version": 1, "lines": []}')
    files["nul-id"] = doc(os.path.join(tmp, "nul-id.rugosa"),
                          DOC_HEAD + '{"name": "L", "material": {"catalog": "pe\\u0000x"}}]}')
    files["escape-name"] = doc(os.path.join(tmp, "escape-name.rugosa"),
                               DOC_HEAD + '{"name": "red\\u001b[31m"}]}')
    files["c1-name"] = doc(os.path.join(tmp, "c1-name.rugosa"),
                           DOC_HEAD + '{"name": "csi\\u009b2J"}]}')
    files["lines"] = doc(os.path.join(tmp, "lines.rugosa"),
                         DOC_HEAD + ", ".join(["{}"] * 10001) + "]}")
    files["cwd"] = os.path.join(tmp, "cwd")
    os.mkdir(files["cwd"])
    return files


# (section, case, argv after the program, stdin (a path or None), expect,
#  checks): expect is refuse (exit 2, nothing on stdout, one line on
#  stderr), fail (exit 1: the output could not be written; the same
#  otherwise), accept (exit 0, output, nothing on stderr) or help (exit 0,
#  the usage on stdout).  checks: "says" (text stderr must hold), "rss"
#  (the peak resident size is checked), "no-file" (a name that must not
#  appear in the working folder), "no-minus-zero" (stdout never prints -0).
def special_rows(files):
    f = files
    long_value = "x" * 131000
    rows = [
        ("files", "a FIFO with no writer (timeout 10 s)", ["eval", f["fifo"]], None, "refuse",
         {"says": "not a regular file"}),
        ("files", "a folder", ["eval", f["folder"]], None, "refuse", {"says": "it is a folder"}),
        ("files", "a link to /dev/zero", ["eval", f["zero"]], None, "refuse",
         {"says": "not a regular file", "rss": True}),
        ("files", "a sparse file of 1 GiB", ["eval", f["sparse"]], None, "refuse",
         {"says": "larger than 16 MiB", "rss": True}),
        ("files", "a sparse file of 1 GiB, rendered", ["render", f["sparse"], "-o", "x.png"], None,
         "refuse", {"says": "larger than 16 MiB", "rss": True, "no-file": "x.png"}),
        ("files", "a sparse file of 1 GiB, reported", ["report", f["sparse"], "-o", "x.pdf"], None,
         "refuse", {"says": "larger than 16 MiB", "rss": True, "no-file": "x.pdf"}),
        ("files", "a report into a missing folder", ["report", DEMO, "-o", "/nonexistent/r.pdf"], None,
         "fail", {"says": "because its folder does not exist; no file was created"}),
        ("files", "standard input from /dev/zero", ["eval", "-"], "/dev/zero", "refuse",
         {"says": "“standard input” is larger than 16 MiB", "rss": True}),
        ("files", "standard input from a sparse file of 1 GiB", ["eval", "-"], f["sparse"], "refuse",
         {"says": "larger than 16 MiB", "rss": True}),
        ("files", "standard input holding a project", ["eval", "-", "--format", "json"], DEMO,
         "accept", {}),
        ("files", "\\u0000 in a line name", ["eval", f["nul-name"]], None, "refuse",
         {"says": "lines[0].name: the string holds a NUL character"}),
        ("files", "\\u0000 in the format name", ["eval", f["nul-format"]], None, "refuse",
         {"says": "format: the string holds a NUL character"}),
        ("files", "\\u0000 in a catalog id", ["eval", f["nul-id"]], None, "refuse",
         {"says": "lines[0].material.catalog: the string holds a NUL character"}),
        ("files", "an escape sequence in a line name", ["eval", f["escape-name"]], None, "refuse",
         {"says": "lines[0].name: the text holds a control character"}),
        ("files", "a C1 control (CSI) in a line name", ["eval", f["c1-name"], "--format", "csv"], None,
         "refuse", {"says": "lines[0].name: the text holds a control character"}),
        ("files", "10 001 line options", ["eval", f["lines"]], None, "refuse",
         {"says": "lines: more than 10000 line options"}),
        ("files", "a line break in the file name", ["eval", "/nonexistent/two\nlines.rugosa"], None,
         "refuse", {"says": "two?lines.rugosa"}),
        ("files", "a line break in the output name, its folder missing",
         ["render", DEMO, "-o", "/nonexistent/two\nlines.png"], None, "fail",
         {"says": "because its folder does not exist; no file was created"}),
        ("parser", "no arguments", [], None, "refuse", {"says": "see 'rugosa-cli --help'"}),
        ("parser", "--version with a word after it", ["--version", "extra"], None, "refuse",
         {"says": "--version takes no other argument"}),
        ("parser", "--help with a word after it", ["--help", "extra"], None, "refuse",
         {"says": "--help takes no other argument"}),
        ("parser", "--help as the value of -o", ["render", DEMO, "-o", "--help"], None, "refuse",
         {"says": "-o must name a file ending in .png", "no-file": "--help"}),
        ("parser", "--help where an option stands", ["render", DEMO, "--help"], None, "help", {}),
        ("parser", "-o and --output both", ["render", DEMO, "-o", "a.png", "--output", "b.png"], None,
         "refuse", {"says": "Options -o and --output are the same option", "no-file": "a.png"}),
        ("parser", "-o twice", ["render", DEMO, "-o", "a.png", "-o", "b.png"], None, "refuse",
         {"says": "Option -o is given more than once", "no-file": "b.png"}),
        ("parser", "--format twice, two spellings", ["eval", DEMO, "--format=json", "--format", "csv"],
         None, "refuse", {"says": "Option --format is given more than once"}),
        ("parser", "a 131 kB --format value", ["eval", DEMO, "--format", long_value], None, "refuse",
         {"says": "--format must be table, csv or json"}),
        ("parser", "a 131 kB --theme value", ["render", DEMO, "-o", "a.png", "--theme", long_value],
         None, "refuse", {"says": "--theme must be light or dark", "no-file": "a.png"}),
        ("parser", "a 131 kB -o value", ["render", DEMO, "-o", long_value], None, "refuse",
         {"says": "-o must name a file ending in .png"}),
        ("parser", "a report of another paper", ["report", DEMO, "-o", "r.pdf", "--paper", "a3"], None,
         "refuse", {"says": "--paper must be a4 or letter", "no-file": "r.pdf"}),
        ("parser", "a report not named .pdf", ["report", DEMO, "-o", "r.png"], None, "refuse",
         {"says": "-o must name a file ending in .pdf", "no-file": "r.png"}),
        ("parser", "an unknown option with an escape sequence",
         ["eval", DEMO, "--\x1b[2Jformat", "json"], None, "refuse", {"says": "Unknown option"}),
        ("parser", "-0 as a relative roughness", ["friction", "--re", "1e5", "--rr", "-0"], None,
         "accept", {"no-minus-zero": True}),
        ("parser", "-0 as a relative roughness, JSON",
         ["friction", "--re", "1e5", "--rr", "-0", "--json"], None, "accept", {"no-minus-zero": True}),
    ]
    return rows


MINUS_ZERO = re.compile(r"(?<![\w.])-0(?![\w.])")


def run_special(row, files):
    section, case, args, stdin, expect, checks = row
    cwd = files["cwd"]
    stdin_file = open(stdin, "rb") if stdin else None
    try:
        timeout = FIFO_TIMEOUT_S if "FIFO" in case else 60
        code, out_b, err_b, rss, secs = run_measured([CLI] + args, stdin=stdin_file, cwd=cwd,
                                                     timeout=timeout)
    finally:
        if stdin_file:
            stdin_file.close()
    out = out_b.decode("utf-8", "replace")
    err = err_b.decode("utf-8", "replace")
    problems = []
    if code is None:
        problems.append(f"did not end within {timeout} s")
    elif expect in ("refuse", "fail"):
        want = 2 if expect == "refuse" else 1
        if code != want:
            problems.append(f"exit {code}, not {want}")
        if out:
            problems.append("stdout is not empty")
        problems += message_problems(err)
    elif expect == "help":
        if code != 0 or not out.startswith("Usage: rugosa-cli"):
            problems.append(f"exit {code}, not the usage")
    else:
        if code != 0 or not out:
            problems.append(f"exit {code}, stdout {len(out)} bytes")
        if err:
            problems.append("stderr is not empty")
    if "says" in checks and checks["says"] not in err:
        problems.append("stderr does not say " + repr(checks["says"]))
    if checks.get("rss") and rss > RSS_MAX_KIB:
        problems.append(f"peak resident size {rss} KiB, above {RSS_MAX_KIB} KiB")
    if "no-file" in checks and os.path.lexists(os.path.join(cwd, checks["no-file"])):
        problems.append("wrote " + checks["no-file"])
        os.unlink(os.path.join(cwd, checks["no-file"]))
    if checks.get("no-minus-zero") and MINUS_ZERO.search(out):
        problems.append("stdout prints -0")
    if NONFINITE.search(out):
        problems.append("stdout holds nan or inf")
    return row, problems, err.strip(), rss, secs


def special_command(args, stdin):
    words = []
    for a in args:
        if len(a) > 60:
            a = a[:3] + "…" + f" ({len(a)} characters)"
        a = a.replace("\n", "\\n").replace("\x1b", "\\e")
        a = re.sub(r"^/tmp/[^/]+/", "", a)
        a = a.replace(DEMO, "demo.rugosa")
        words.append(a)
    cmd = " ".join(["rugosa-cli"] + words)
    if stdin:
        cmd += " < " + ("/dev/zero" if stdin == "/dev/zero" else
                        "demo.rugosa" if stdin == DEMO else os.path.basename(stdin))
    return "`" + cmd.replace("|", "\\|") + "`"


def special_markdown(results):
    titles = {
        "files": ("Project files and standard input",
                  "`eval` and `render` read a project file, or standard input given as `-`. "
                  "A file is opened without blocking and refused unless it is a regular "
                  "file of at most 16 MiB, before a byte is read; standard input is read "
                  "to its end but refused as soon as it passes 16 MiB. The rows marked "
                  "with the resident size also check that the refusal keeps the process's "
                  f"peak resident size under {RSS_MAX_KIB // 1024} MiB; the FIFO row fails "
                  f"if the program does not end within {FIFO_TIMEOUT_S} s. **fail**: exit "
                  "status 1 (the output could not be written), one line on stderr."),
        "parser": ("The argument parser",
                   "An option that takes a value takes the next argument, whatever it "
                   "looks like; `--help` or `-h` where an option stands prints the usage "
                   "(exit status 0); an option given twice, in one spelling or two, is "
                   "refused; a message quotes at most 40 characters of a value, with "
                   "control characters shown as `?`, on one line. **help**: exit status 0, "
                   "the usage on stdout."),
    }
    current = None
    for (section, case, args, stdin, expect, checks), problems, err, rss, secs in results:
        if section != current:
            current = section
            title, text = titles[section]
            print(f"\n## {title}\n")
            print(text + "\n")
            print("| case | command | expected | message (refusals) |")
            print("|---|---|---|---|")
        msg = err.replace("rugosa-cli: ", "").replace("|", "\\|")
        if len(msg) > 200:
            msg = msg[:197] + "…"
        status = expect + (", peak resident size under 256 MiB" if checks.get("rss") else "")
        if problems:
            status += " (FAILS: " + "; ".join(problems) + ")"
        print(f"| {case} | {special_command(args, stdin)} | {status} | "
              f"{msg if expect in ('refuse', 'fail') else ''} |")


def markdown(results):
    print("# rugosa-cli: bad input\n")
    print("The application's fields have their own matrix: [docs/bad-input-app.md](bad-input-app.md).\n")
    print("What `rugosa-cli` does with every class of bad value for each of its "
          "inputs. Generated by `tests/cli-bad-input.py --markdown "
          "build/src/cli/rugosa-cli`; the same rows are checked by the test "
          "`cli-bad-input` (`meson test -C build cli-bad-input`), whose row "
          "names are the first two columns.\n")
    print("**refuse**: exit status 2, nothing on stdout, one line on stderr "
          "naming the option and the accepted range or units. "
          "**warn**: exit status 0, the result, and a sentence in `warnings`; "
          "a velocity or gradient far beyond any practical line (the "
          "thresholds are in the manual page, rugosa-cli(1), under WARNINGS) "
          "also puts its sentence on stderr, naming the likely unit mistake "
          "when the option was a bare number. "
          "**accept**: exit status 0, the result, no warning. "
          "No output ever holds `nan` or `inf`.\n")
    print("The other options of each row are a working line: 12 L/s of water "
          "at 20 °C through 100 m of 100 mm pipe with 0.045 mm roughness "
          "(the friction rows: Re 1e5, ε/D 1e-4); seawater with 35 g/kg, "
          "air at 2 bar, a custom fluid of 998 kg/m³ and 1 cP, and an oil of "
          "100 cSt at 40 °C and 10 cSt at 100 °C (870 kg/m³) where the option "
          "needs them.\n")
    print("Output that cannot be written (stdout on `/dev/full`, a closed "
          "pipe): exit status 1 and one line on stderr, \"The result could not "
          "be written to the standard output: …\", for every command and for "
          "`--help` and `--version` (checked as the row \"output to a full "
          "disk\").\n")
    current = None
    for (opt, cls, base, value, expect), problems, err in results:
        if opt != current:
            current = opt
            print(f"\n## `{opt}`\n")
            print("| class | value | expected | message on stderr (refusals, and warnings far beyond practice) |")
            print("|---|---|---|---|")
        msg = err.replace("rugosa-cli: ", "").replace("|", "\\|")
        if len(msg) > 160:
            msg = msg[:157] + "…"
        status = expect if not problems else expect + " (FAILS: " + "; ".join(problems) + ")"
        # a warning on stderr is shown too: it is the contract of that row
        print(f"| {cls} | {shown(value)} | {status} | {msg} |")


def full_disk():
    """Output that cannot be written (stdout on /dev/full): exit status 1 and
    one line on stderr, for every command and for --help and --version."""
    problems = []
    for args in (FRICTION, WATER, ["fluid", "water", "--temperature", "20 C"],
                 ["catalog", "pipes"], ["--help"], ["--version"]):
        with open("/dev/full", "w") as full:
            p = subprocess.run([CLI] + args, stdout=full, stderr=subprocess.PIPE,
                               timeout=60, env={"LANG": "C.UTF-8", "PATH": "/usr/bin:/bin"})
        err = p.stderr.decode("utf-8", "replace")
        if p.returncode != 1 or err.count("\n") != 1 or "written" not in err:
            problems.append(f"{args[0]}: exit {p.returncode}, stderr {err.strip()!r}")
    return problems


def main():
    all_rows = rows()
    with concurrent.futures.ThreadPoolExecutor(2) as pool:
        results = list(pool.map(run_row, all_rows))
    with tempfile.TemporaryDirectory(prefix="rugosa-bad-input-") as tmp:
        files = make_files(tmp)
        # one at a time: each measures its own process
        specials = [run_special(row, files) for row in special_rows(files)]
    if MARKDOWN:
        markdown(results)
        special_markdown(specials)
        return 0
    failed = 0
    for (section, case, *_), problems, err, rss, secs in specials:
        print(f"{section} / {case}: {secs * 1000:.1f} ms, peak resident size {rss} KiB")
        if problems:
            failed += 1
            print(f"FAIL {section} / {case}: " + "; ".join(problems)
                  + (f" [{err[:200]}]" if err else ""))
    disk = full_disk()
    if disk:
        failed += 1
        print("FAIL output to a full disk: " + "; ".join(disk))
    for (opt, cls, base, value, expect), problems, err in results:
        if problems:
            failed += 1
            v = shown(value)
            print(f"FAIL {opt} / {cls} {v[:60]}: expected {expect}: "
                  + "; ".join(problems) + (f" [{err[:200]}]" if err else ""))
    print(f"{len(results) + len(specials) + 1 - failed} passed, {failed} failed")
    return 1 if failed else 0


sys.exit(main())
