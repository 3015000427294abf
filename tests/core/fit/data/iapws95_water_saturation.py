#!/usr/bin/python3
"""Water saturation pressures from IAPWS-95 (python3-iapws, used only as a reference library).

Prints a CSV table with unit brackets: 33 points, 280 K to 600 K in steps of 10 K.
python3-iapws returns the pressure in MPa.
"""
import sys

try:
    from iapws import IAPWS95
except ImportError:
    sys.exit("python3-iapws is not installed (apt-get install python3-iapws)")

print("T [K],P [MPa]")
for T in range(280, 601, 10):
    state = IAPWS95(T=float(T), x=0)
    print(f"{T:.2f},{state.P!r}")
