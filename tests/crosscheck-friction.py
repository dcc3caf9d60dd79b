#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""Cross-check of the core's friction factors against outside references.

Usage: crosscheck-friction.py PATH/TO/friction-eval

Draws seeded random points over the whole computed domain (friction.h:
Re 1e3..1e10, eD 0..0.1; Churchill also Re 1..1e3), sends them to
friction-eval in one process, and compares:

  colebrook    mpmath at 40 digits, exact closed form through Lambert W
               (x = 1/sqrt(f) = c*W0(exp(r/(b*c))/(b*c)) - r/b with
               c = 2/ln 10, r = eD/3.7, b = 2.51/Re), relative 1e-13;
               and python3-fluids `fluids.friction.Colebrook(Re, eD, tol=0)`
               (its own mpmath Lambert W solution) on a subset, relative
               1e-13 plus that reference's own error: it multiplies by the
               double 18.574 (= 2*2.51*3.7, off by 8.7e-17 relative) before
               a cancellation, which puts an error of
               2*ln(10)*eD*Re*8.7e-17/den into f, den = sqrt(457.28/f)
               (up to ~2e-9 in the rough corner at Re 1e10)
  haaland      python3-fluids `fluids.friction.Haaland`, relative 1e-12
  swamee-jain  python3-fluids `fluids.friction.Swamee_Jain_1976`, relative
               1e-12.  fluids writes the term as (6.97/Re)**0.9, a rounding
               of the published 5.74/Re**0.9 (6.97**0.9 = 5.73997); it is
               called at Re' = Re*6.97/5.74**(1/0.9) so that it evaluates
               the published constant (rounding Re' costs ~1e-16).
  churchill    python3-fluids `fluids.friction.Churchill_1977`, relative
               1e-12
  laminar      64/Re in mpmath, relative 2.3e-16 (one rounding)
  errors       points outside the domain must give "error <sentence>"

Prints one line per failure (at most 20) and a summary "N passed, M failed";
exits 1 on any failure.
"""

from fractions import Fraction
import math
import random
import subprocess
import sys

import mpmath
from fluids import friction as fl

SEED = 20261202
N_COLEBROOK = 10000
N_COLEBROOK_FLUIDS = 1500
N_EXPLICIT = 4000
N_LAMINAR = 500

RE_MIN, RE_MAX, RR_MAX = 1.0e3, 1.0e10, 0.1

mpmath.mp.dps = 40
C = 2 / mpmath.log(10)
SJ_RE_SCALE = float(mpmath.mpf("6.97") / mpmath.mpf("5.74") ** (1 / mpmath.mpf("0.9")))


def colebrook_mpmath(re, rr):
    """Exact Colebrook solution (Lambert W closed form) at 40 digits."""
    re = mpmath.mpf(re)
    r = mpmath.mpf(rr) / mpmath.mpf("3.7")
    b = mpmath.mpf("2.51") / re
    w = mpmath.lambertw(mpmath.exp(r / (b * C)) / (b * C))
    x = C * w.real - r / b
    # the closed form must satisfy the equation to far below 1e-13
    residual = x + C * mpmath.log(r + b * x)
    assert abs(residual) < mpmath.mpf(10) ** -25 * x, (re, rr, residual)
    return 1 / (x * x)


# relative error of the double nearest 18.574 (used by fluids' tol=0 path)
FLUIDS_18574_REL = abs(float((Fraction(18.574) - Fraction("18.574")) / Fraction("18.574")))


def fluids_colebrook_error(re, rr, f):
    """Bound on the error of fluids.friction.Colebrook(tol=0), see above."""
    den = math.sqrt(457.28006463294372 / f)
    return 1.01 * 2 * math.log(10) * rr * re * FLUIDS_18574_REL / den


def log_uniform(rng, lo, hi):
    return 10.0 ** rng.uniform(math.log10(lo), math.log10(hi))


def draw_rr(rng):
    """Relative roughness: one in ten exactly 0, one in ten uniform over the
    whole range, the rest log-uniform 1e-8..0.1."""
    k = rng.random()
    if k < 0.1:
        return 0.0
    if k < 0.2:
        return rng.uniform(0.0, RR_MAX)
    return (log_uniform(rng, 1e-8, RR_MAX))


def main():
    if len(sys.argv) != 2:
        print("usage: crosscheck-friction.py PATH/TO/friction-eval", file=sys.stderr)
        return 2
    rng = random.Random(SEED)

    # each case: (model, Re, eD, reference kind, reference value, rel. tolerance)
    cases = []
    for i in range(N_COLEBROOK):
        re = (log_uniform(rng, RE_MIN, RE_MAX))
        rr = draw_rr(rng)
        cases.append(("colebrook", re, rr, "mpmath", colebrook_mpmath(re, rr), 1e-13))
        if i < N_COLEBROOK_FLUIDS:
            f_fl = fl.Colebrook(re, rr, tol=0)
            cases.append(("colebrook", re, rr, "fluids.friction.Colebrook(tol=0)",
                          f_fl, 1e-13 + fluids_colebrook_error(re, rr, f_fl)))
    # the corners of the domain
    for re in (RE_MIN, RE_MAX):
        for rr in (0.0, RR_MAX):
            cases.append(("colebrook", re, rr, "mpmath", colebrook_mpmath(re, rr), 1e-13))

    for _ in range(N_EXPLICIT):
        re = (log_uniform(rng, RE_MIN, RE_MAX))
        rr = draw_rr(rng)
        cases.append(("haaland", re, rr, "fluids.friction.Haaland",
                      fl.Haaland(re, rr), 1e-12))
        cases.append(("swamee-jain", re, rr, "fluids.friction.Swamee_Jain_1976",
                      fl.Swamee_Jain_1976(re * SJ_RE_SCALE, rr), 1e-12))
        re_all = (log_uniform(rng, 1.0, RE_MAX))
        cases.append(("churchill", re_all, rr, "fluids.friction.Churchill_1977",
                      fl.Churchill_1977(re_all, rr), 1e-12))

    for _ in range(N_LAMINAR):
        re = (log_uniform(rng, 1e-3, 1e4))
        cases.append(("laminar", re, 0.0, "mpmath 64/Re", 64 / mpmath.mpf(re), 2.3e-16))

    # outside the domain: every model must refuse with a sentence
    bad = [("nan", "0.001"), ("inf", "0.001"), ("-inf", "0.001"), ("-1e5", "0.001"),
           ("0", "0.001"), ("1.0000001e10", "0.001"), ("1e5", "nan"), ("1e5", "-1e-12"),
           ("1e5", "0.10000001"), ("1e5", "inf")]
    error_cases = [(m, re, rr) for m in ("colebrook", "haaland", "swamee-jain", "churchill")
                   for re, rr in bad]
    error_cases += [("colebrook", "999.9", "0.001"), ("haaland", "999.9", "0.001"),
                    ("swamee-jain", "999.9", "0.001"), ("laminar", "0", "0"),
                    ("laminar", "nan", "0"), ("no-such-model", "1e5", "0.001")]

    lines = [f"{m} {re!r} {rr!r}\n" for m, re, rr, _, _, _ in cases]
    lines += [f"{m} {re} {rr}\n" for m, re, rr in error_cases]
    proc = subprocess.run([sys.argv[1]], input="".join(lines), capture_output=True,
                          text=True, check=False)
    out = proc.stdout.splitlines()
    if proc.returncode != 0 or len(out) != len(lines):
        print(f"friction-eval failed: exit {proc.returncode}, {len(out)} of {len(lines)} lines",
              file=sys.stderr)
        print(proc.stderr, file=sys.stderr)
        return 1

    passed = failed = 0
    worst = {}

    def fail(msg):
        nonlocal failed
        failed += 1
        if failed <= 20:
            print("FAIL " + msg)

    for (model, re, rr, kind, ref, tol), got in zip(cases, out):
        if got.startswith("error"):
            fail(f"{model} Re={re!r} eD={rr!r}: {got}")
            continue
        rel = float(abs((mpmath.mpf(got) - ref) / ref))
        key = (model, kind)
        worst[key] = max(worst.get(key, 0.0), rel)
        if rel <= tol:
            passed += 1
        else:
            fail(f"{model} Re={re!r} eD={rr!r}: {got} vs {kind} {mpmath.nstr(ref, 17)} "
                 f"(relative {rel:.3g} > {tol:g})")

    for (model, re, rr), got in zip(error_cases, out[len(cases):]):
        sentence = got[len("error "):] if got.startswith("error ") else ""
        if len(sentence) > 10 and sentence.endswith("."):
            passed += 1
        else:
            fail(f"{model} Re={re} eD={rr}: expected an error sentence, got {got!r}")

    for (model, kind), rel in sorted(worst.items()):
        print(f"# {model} vs {kind}: largest relative difference {rel:.3g}")
    print(f"{passed} passed, {failed} failed")
    return 1 if failed else 0


if __name__ == "__main__":
    sys.exit(main())
