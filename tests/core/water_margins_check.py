#!/usr/bin/python3
"""Water margins of `phasewright-cli classify --input` checked against python3-iapws on a grid.

Reference: python3-iapws (Debian) IAPWS R14-08 functions _Sublimation_Pressure and
_Melting_Pressure (ice Ih), the IAPWS SR1-86 vapor-pressure equation IAPWS95._Vapor_Pressure,
inverted with scipy.optimize.brentq; triple point 273.16 K / 611.657 Pa (R14-08), critical
point 647.096 K / 22.064 MPa (R6-95). Grid: T 200-700 K, p 1 Pa - 200 MPa (the ice Ih region).
Usage: water_margins_check.py PATH/TO/phasewright-cli   (exit 0 when every point agrees)
"""
import csv
import math
import os
import subprocess
import sys
import tempfile

from iapws._iapws import _Melting_Pressure, _Sublimation_Pressure
from iapws.iapws95 import IAPWS95
from scipy.optimize import brentq

TT, PT, TC, PC, T_IH_MIN = 273.16, 611.657, 647.096, 22.064e6, 251.165
TOL_T = 1e-6   # K
TOL_P = 1e-6   # relative


def p_sub(T): return _Sublimation_Pressure(T) * 1e6
def p_vap(T): return IAPWS95._Vapor_Pressure(T) * 1e6
def p_melt(T): return _Melting_Pressure(T, "Ih") * 1e6
def inv(f, p, lo, hi): return brentq(lambda T: f(T) - p, lo, hi, xtol=1e-13)


def melt_margin(T, p, Tm):
    dp = p - p_melt(T) if T_IH_MIN <= T <= TT else math.nan
    return (abs(T - Tm), "melting (ice Ih)", T - Tm, dp)


def reference(T, p):
    if T >= TC and p < PC:
        return "gas", "critical point", T - TC, p - PC
    if p <= PT:
        Tb = inv(p_sub, p, 50.0, TT)
        dp = p - p_sub(T) if T <= TT else math.nan
        return ("solid" if T < Tb else "vapor"), "sublimation (ice Ih)", T - Tb, dp
    Tm = inv(p_melt, p, T_IH_MIN, TT)
    if T < Tm:
        return ("solid",) + melt_margin(T, p, Tm)[1:]
    if p < PC:
        Tv = inv(p_vap, p, TT, TC)
        vap = (abs(T - Tv), "vaporization", T - Tv, p - p_vap(T) if TT <= T <= TC else math.nan)
        if T >= Tv:
            return ("vapor",) + vap[1:]
        return ("liquid",) + min(vap, melt_margin(T, p, Tm))[1:]
    if T < TC:
        crit = (abs(T - TC), "critical point", T - TC, p - PC)
        return ("liquid",) + min(crit, melt_margin(T, p, Tm))[1:]
    return "supercritical", "critical point", T - TC, p - PC


def close(a, b, tol_abs, tol_rel=0.0):
    if math.isnan(a) or math.isnan(b):
        return math.isnan(a) and math.isnan(b)
    return abs(a - b) <= tol_abs + tol_rel * abs(b)


def main():
    cli = sys.argv[1]
    temps = [200.0 + 2.5 * i for i in range(201)]
    pressures = [10 ** (k / 8.0) for k in range(0, 67)]  # 1 Pa .. 2e8 Pa
    points = [(T, p) for T in temps for p in pressures]
    with tempfile.TemporaryDirectory() as tmp:
        src, dst = os.path.join(tmp, "grid.csv"), os.path.join(tmp, "out.csv")
        with open(src, "w") as f:
            f.write("T [K],P [Pa]\n")
            f.writelines(f"{T!r},{p!r}\n" for T, p in points)
        subprocess.run([cli, "classify", "--substance", "water", "--input", src, "--output", dst],
                       check=True)
        with open(dst, newline="") as f:
            rows = list(csv.DictReader(f))
    assert len(rows) == len(points), (len(rows), len(points))
    bad = 0
    for (T, p), row in zip(points, rows):
        phase, label, dT, dP = reference(T, p)
        got_dT = float(row["dT_K"]) if row["dT_K"] else math.nan
        got_dP = float(row["dP_Pa"]) if row["dP_Pa"] else math.nan
        ok = (row["phase"] == phase and row["nearest_boundary"] == label
              and close(got_dT, dT, TOL_T) and close(got_dP, dP, 1e-9, TOL_P))
        if not ok:
            bad += 1
            if bad <= 20:
                print(f"T={T} K p={p:.6g} Pa: got {row['phase']}, {row['nearest_boundary']}, "
                      f"dT={got_dT!r}, dP={got_dP!r}; python3-iapws {phase}, {label}, "
                      f"dT={dT!r}, dP={dP!r}")
    print(f"{len(points) - bad} of {len(points)} grid points agree "
          f"(|ddT| <= {TOL_T} K, |ddP| <= {TOL_P} relative)")
    return 1 if bad else 0


if __name__ == "__main__":
    sys.exit(main())
