#!/usr/bin/python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""Cross-check of Rugosa's water properties against python3-iapws.

Runs tests/fluid-eval (path in argv[1]) on a grid of temperatures
273.16-423.15 K and pressures 0.1-10 MPa and compares, point by point:
  density   with iapws.IAPWS97(T=T, P=p/1e6).rho   (IF97 region 1)
  viscosity with iapws._iapws._Viscosity(rho, T)    (IAPWS 2008, mu2 = 1)
Both sides evaluate the same published formulas in double precision, so
they agree to rounding; the tolerance REL_TOL leaves room for different
summation order and pow() only.  Grid points where iapws says the water is
vapour (p < iapws.iapws97._PSat_T(T)) must be refused by Rugosa, and all
liquid points must be accepted.  Prints "N passed, M failed"; exits
non-zero on any failure.  Run with /usr/bin/python3 (Debian's iapws).
"""
import subprocess
import sys

from iapws import IAPWS97
from iapws._iapws import _Viscosity
from iapws.iapws97 import _PSat_T

REL_TOL = 1e-12

def main():
    exe = sys.argv[1]
    n_t = 61
    temps = [273.16 + (423.15 - 273.16) * i / (n_t - 1) for i in range(n_t)]
    temps += [277.15, 293.15, 373.15]
    pressures = [0.1e6, 0.101325e6, 0.2e6, 0.35e6, 0.5e6, 1e6, 2e6, 3e6,
                 5e6, 7.5e6, 10e6]
    points = [(t, p) for t in temps for p in pressures]
    text = "".join("%.17g %.17g\n" % pt for pt in points)
    out = subprocess.run([exe], input=text, capture_output=True, text=True,
                         check=True).stdout.splitlines()
    if len(out) != len(points):
        print("fluid-eval printed %d lines for %d points" % (len(out), len(points)))
        return 1

    passed = failed = 0
    worst_rho = worst_mu = 0.0
    for (t, p), line in zip(points, out):
        psat = _PSat_T(t) * 1e6
        liquid = p >= psat
        if abs(p - psat) < 1e-6 * psat:
            continue  # too close to the boundary to expect the same verdict
        if not liquid:
            if line.startswith("ERR 1 ") and "boils below" in line:
                passed += 1
            else:
                failed += 1
                print("FAIL T=%g p=%g: vapour per iapws, got %r" % (t, p, line))
            continue
        if line.startswith("ERR"):
            failed += 1
            print("FAIL T=%g p=%g: liquid per iapws, got %r" % (t, p, line))
            continue
        rho, mu = (float(x) for x in line.split())
        ref = IAPWS97(T=t, P=p / 1e6)
        rho_ref = ref.rho
        mu_ref = _Viscosity(rho_ref, t)
        e_rho = abs(rho / rho_ref - 1)
        e_mu = abs(mu / mu_ref - 1)
        worst_rho = max(worst_rho, e_rho)
        worst_mu = max(worst_mu, e_mu)
        if ref.region != 1 or e_rho > REL_TOL or e_mu > REL_TOL:
            failed += 1
            print("FAIL T=%g p=%g: rho %.17g vs %.17g (%.2g), mu %.17g vs %.17g (%.2g)"
                  % (t, p, rho, rho_ref, e_rho, mu, mu_ref, e_mu))
        else:
            passed += 1
    print("largest relative difference: density %.2g, viscosity %.2g"
          % (worst_rho, worst_mu))
    print("%d passed, %d failed" % (passed, failed))
    return 1 if failed else 0

if __name__ == "__main__":
    sys.exit(main())
