#!/usr/bin/python3
"""End-to-end throughput of `phasewright-cli classify --input` against the same classification
with margins done in Python with python3-iapws (IAPWS R14-08 sublimation/melting functions,
the SR1-86 vapor-pressure equation) and scipy.optimize.brentq for the inverses.

Usage: tests/bench/classify_vs_python.py [path/to/phasewright-cli] [rows] [python-sample] [repeat]
Prints rows/s for both and the ratios, for the CLI with one thread and with one thread per core
(best of `repeat` runs each, Python too), by wall clock and by CPU time (on a busy machine the wall clock
measures the queue). Water states: T 200-700 K, p 1 Pa - 200 MPa (log).
"""
import math
import os
import random
import resource
import subprocess
import sys
import tempfile
import time

from iapws._iapws import _Melting_Pressure, _Sublimation_Pressure
from iapws.iapws95 import IAPWS95
from scipy.optimize import brentq

TT, PT = 273.16, 611.657          # IAPWS R14-08 triple point
TC, PC = 647.096, 22.064e6        # IAPWS R6-95 critical point


def p_sub(T): return _Sublimation_Pressure(T) * 1e6
def p_vap(T): return IAPWS95._Vapor_Pressure(T) * 1e6   # SR1-86 auxiliary equation
def p_melt(T): return _Melting_Pressure(T, "Ih") * 1e6


def inverse(f, p, lo, hi):
    return brentq(lambda T: f(T) - p, lo, hi, xtol=2e-12)


def classify(T, p):
    """Phase, nearest boundary, dT, dP (ice Ih region only: p < 208.566 MPa)."""
    if T >= TC and p < PC:
        return "gas", "critical point", T - TC, p - PC
    if p <= PT:
        Tb = inverse(p_sub, p, 50.0, TT)
        dp = p - p_sub(T) if T <= TT else math.nan
        return ("solid" if T < Tb else "vapor"), "sublimation", T - Tb, dp
    Tm = inverse(p_melt, p, 251.165, TT)
    if T < Tm:
        dp = p - p_melt(T) if 251.165 <= T <= TT else math.nan
        return "solid", "melting", T - Tm, dp
    if p < PC:
        Tv = inverse(p_vap, p, TT, TC)
        phase = "liquid" if T < Tv else "vapor"
        cands = [(abs(T - Tv), "vaporization", T - Tv, p - p_vap(T) if T <= TC else math.nan)]
        if phase == "liquid":
            cands.append((abs(T - Tm), "melting", T - Tm,
                          p - p_melt(T) if 251.165 <= T <= TT else math.nan))
        return (phase,) + min(cands)[1:]
    return ("liquid" if T < TC else "supercritical"), "critical point", T - TC, p - PC


def states(n, seed=1):
    rnd = random.Random(seed)
    for _ in range(n):
        yield rnd.uniform(200.0, 700.0), math.exp(rnd.uniform(math.log(1.0), math.log(200e6)))


def main():
    cli = sys.argv[1] if len(sys.argv) > 1 else "build/app/phasewright-cli"
    rows = int(sys.argv[2]) if len(sys.argv) > 2 else 1_000_000
    sample = int(sys.argv[3]) if len(sys.argv) > 3 else 20_000
    repeat = int(sys.argv[4]) if len(sys.argv) > 4 else 3
    with tempfile.TemporaryDirectory() as tmp:
        src, dst = os.path.join(tmp, "states.csv"), os.path.join(tmp, "out.csv")
        with open(src, "w") as f:
            f.write("T [K],P [Pa]\n")
            f.writelines(f"{T:.6f},{p:.6g}\n" for T, p in states(rows))
        runs = {}
        for threads in ("1", "0"):   # one thread; one per core (the default)
            best = None
            for _ in range(repeat):
                cpu0 = resource.getrusage(resource.RUSAGE_CHILDREN)
                start = time.perf_counter()
                subprocess.run([cli, "classify", "--substance", "water", "--input", src,
                                "--output", dst, "--threads", threads], check=True)
                wall = time.perf_counter() - start
                cpu1 = resource.getrusage(resource.RUSAGE_CHILDREN)
                cpu = (cpu1.ru_utime - cpu0.ru_utime) + (cpu1.ru_stime - cpu0.ru_stime)
                if best is None or wall < best[0]:
                    best = (wall, cpu)
            runs[threads] = best
            with open(dst) as f:
                written = sum(1 for _ in f) - 1
            assert written == rows, (written, rows)
        size = os.path.getsize(src) / 1e6
    pts = list(states(sample, seed=2))
    py = py_cpu = math.inf
    for _ in range(repeat):   # best of `repeat`, as for the C++ runs
        start, cpu = time.perf_counter(), time.process_time()
        for T, p in pts:
            classify(T, p)
        py = min(py, time.perf_counter() - start)
        py_cpu = min(py_cpu, time.process_time() - cpu)
    py_rate, py_cpu_rate = sample / py, sample / py_cpu
    print(f"python3-iapws + brentq: {sample} points in {py:.3f} s (best of {repeat}) = "
          f"{py_rate:,.0f} rows/s "
          f"({1e6 * py / sample:.1f} us a point; CPU {py_cpu_rate:,.0f} rows/s)")
    for threads, label in (("1", "one thread"), ("0", f"one thread per core ({os.cpu_count()})")):
        wall, cpu = runs[threads]
        print(f"phasewright-cli classify, {label}: {rows} rows ({size:.1f} MB) in {wall:.3f} s "
              f"(best of {repeat}) = {rows / wall:,.0f} rows/s, ratio {rows / wall / py_rate:.0f}x "
              f"wall clock; CPU {rows / cpu:,.0f} rows/s, ratio "
              f"{rows / cpu / py_cpu_rate:.0f}x CPU time")


if __name__ == "__main__":
    main()
