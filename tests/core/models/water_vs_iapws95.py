#!/usr/bin/python3
"""Water's vaporization curve in Phasewright (IAPWS SR1-86 auxiliary equation, Wagner & Pruss
1993, eq. 2.5) against the IAPWS-95 saturation pressure computed by Debian's python3-iapws.

Acceptance (issue 3): relative deviation <= 1e-4 at >= 50 temperatures over 273.16-646 K.
The critical point itself is left out: python3-iapws returns IAPWS95(T=Tc, x=0).P 1000x too
small (FIELD-NOTES.md). Usage: water_vs_iapws95.py <path of water_vapor_points>
"""
import subprocess
import sys

from iapws import IAPWS95

T_MIN, T_MAX, COUNT, TOLERANCE = 273.16, 646.0, 60, 1e-4


def main():
    if len(sys.argv) != 2:
        sys.exit(__doc__)
    temps = [T_MIN + (T_MAX - T_MIN) * i / (COUNT - 1) for i in range(COUNT)]
    run = subprocess.run([sys.argv[1]], input="\n".join(f"{t:.17g}" for t in temps),
                         capture_output=True, text=True, check=True)
    rows = [tuple(map(float, line.split())) for line in run.stdout.splitlines()]
    if len(rows) != COUNT:
        sys.exit(f"expected {COUNT} rows from {sys.argv[1]}, got {len(rows)}")
    worst = (0.0, None)
    failures = 0
    for T, p in rows:
        reference = IAPWS95(T=T, x=0).P * 1e6  # MPa -> Pa
        dev = abs(p / reference - 1.0)
        if dev > worst[0]:
            worst = (dev, T)
        if not dev <= TOLERANCE:
            failures += 1
            print(f"FAIL T = {T:.4f} K: phasewright {p:.8g} Pa, IAPWS-95 {reference:.8g} Pa, "
                  f"deviation {dev:.2e}")
    print(f"{len(rows)} temperatures {T_MIN}-{T_MAX} K, largest deviation {worst[0]:.2e} "
          f"at {worst[1]:.3f} K (tolerance {TOLERANCE:g})")
    sys.exit(1 if failures else 0)


if __name__ == "__main__":
    main()
