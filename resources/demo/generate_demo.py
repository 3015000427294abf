#!/usr/bin/env python3
"""Generate the bundled demo run logs of Phasewright (invented data, see README.txt).

Deterministic: fixed seeds, no clock, no network. Run from anywhere:
    python3 resources/demo/generate_demo.py
and commit the regenerated CSV files. The script checks its own output against the real
phase boundaries (equations below) and fails loudly if a run would not show the intended
events exactly once, so a changed seed or profile cannot silently produce a misleading demo.

Boundary equations used for the checks (coefficients as published):
- Ice Ih sublimation pressure: IAPWS R14-08(2011), "Revised Release on the Pressure along the
  Melting and Sublimation Curves of Ordinary Water Substance", eq. (6):
  ln(p/pt) = theta^-1 * sum a_i theta^b_i, theta = T/Tt, Tt = 273.16 K, pt = 611.657 Pa.
- CO2 vapor pressure: Span & Wagner (1996), J. Phys. Chem. Ref. Data 25, 1509, eq. (3.13):
  ln(p/pc) = (Tc/T) sum a_i (1 - T/Tc)^t_i, Tc = 304.1282 K, pc = 7.3773 MPa.
"""
import math
import os
import random

HERE = os.path.dirname(os.path.abspath(__file__))

# IAPWS R14-08, eq. (6) and Table 2 of the release.
ICE_TT, ICE_PT = 273.16, 611.657
ICE_A = (-0.212144006e2, 0.273203819e2, -0.610598130e1)
ICE_B = (0.333333333e-2, 0.120666667e1, 0.170333333e1)

# Span & Wagner (1996), eq. (3.13) and Table 3.
CO2_TC, CO2_PC = 304.1282, 7.3773e6
CO2_A = (-7.0602087, 1.9391218, -1.6463597, -3.2995634)
CO2_T = (1.0, 1.5, 2.0, 4.0)


def ice_sublimation_pa(T):
    th = T / ICE_TT
    return ICE_PT * math.exp(sum(a * th ** b for a, b in zip(ICE_A, ICE_B)) / th)


def co2_vapor_pa(T):
    tau = 1.0 - T / CO2_TC
    return CO2_PC * math.exp(CO2_TC / T * sum(a * tau ** t for a, t in zip(CO2_A, CO2_T)))


def lag(value, target, dt, tau):
    """First-order response of a sensor/product to its driver over one step dt (s)."""
    return target + (value - target) * math.exp(-dt / tau)


def ramp(t, t0, v0, rate, v1):
    """Linear ramp from v0 starting at t0 with rate (per s), limited at v1."""
    if t <= t0:
        return v0
    v = v0 + rate * (t - t0)
    return min(v, v1) if rate > 0 else max(v, v1)


def smoothstep(t, t0, t1):
    x = min(1.0, max(0.0, (t - t0) / (t1 - t0)))
    return x * x * (3 - 2 * x)


def iso(seconds, start="2026-03-14", hour0=6):
    s = int(round(seconds)) + hour0 * 3600
    d, s = divmod(s, 86400)
    h, s = divmod(s, 3600)
    m, s = divmod(s, 60)
    return f"{start[:8]}{int(start[8:]) + d:02d}T{h:02d}:{m:02d}:{s:02d}Z"


# ---------------------------------------------------------------------------------------------
# (a) Freeze-drying run LYO-03, product TB-2207 of Tarnbrook Process Labs (fictional), 30 s samples over 36 h.
H = 3600.0
FD_DT = 30.0
FD_END = 36 * H
P_ATM = 101325.0
P_SET = 10.0  # Pa, primary and secondary drying


def fd_shelf_c(t):
    if t < 0.25 * H:
        return 20.0
    if t < 4.0 * H:  # freezing ramp 0.5 K/min to -45 degC, hold
        return ramp(t, 0.25 * H, 20.0, -0.5 / 60, -45.0)
    if t < 28.0 * H:  # primary drying: 1 K/min to -10 degC, hold
        return ramp(t, 4.0 * H, -45.0, 1.0 / 60, -10.0)
    return ramp(t, 28.0 * H, -10.0, 0.2 / 60, 30.0)  # secondary drying to +30 degC


def fd_pressure_pa(t):
    if t < 3.5 * H:
        return P_ATM
    return max(P_SET, P_ATM * math.exp(-(t - 3.5 * H) / 70.0))  # pump-down, then controlled


def fd_product_target_c(t, shelf):
    """Where the product thermocouple heads: the shelf, or the sublimation-limited ice
    temperature during primary drying (rising slowly as the dried layer grows)."""
    if 4.0 * H <= t < 24.0 * H:
        return min(shelf, -33.0 + 3.0 * (t - 4.0 * H) / (20.0 * H))
    return shelf


def freeze_drying_rows():
    rng = random.Random(2207)
    rows, T, frozen, plateau_end = [], 20.0, False, None
    n = int(FD_END / FD_DT)
    for i in range(n + 1):
        t = i * FD_DT
        shelf = fd_shelf_c(t)
        if not frozen and T <= -7.0:  # nucleation after supercooling: latent heat release
            frozen, T, plateau_end = True, -1.0, t + 45 * 60
        if plateau_end is not None and t < plateau_end:
            T = -1.0 - 1.0 * (1 - (plateau_end - t) / (45 * 60))  # freezing plateau
        elif i > 0:
            tau = 10 * 60 if 4.0 * H <= t < 24.0 * H else (25 * 60 if t >= 24 * H else 12 * 60)
            T = lag(T, fd_product_target_c(t, shelf), FD_DT, tau)
        P = fd_pressure_pa(t)
        sublimating = 3.9 * H < t < 26.0 * H
        pirani_factor = 1.0 + 0.6 * (1 - smoothstep(t, 23.5 * H, 26.5 * H)) if sublimating else 1.0
        noise_p = 25.0 if P > 1000 else 0.03  # capacitance manometer noise
        p_cm = P + rng.gauss(0, noise_p)
        rows.append((iso(t), shelf + rng.gauss(0, 0.05), T + rng.gauss(0, 0.05),
                     p_cm / 0.133322368, P * pirani_factor * (1 + rng.gauss(0, 0.01)) / 0.133322368))
    return rows


def check_freeze_drying(rows):
    """Exactly one freezing (0 degC at 1 atm) and one sublimation crossing, no melting."""
    def state(r):
        return r[2] + 273.15, r[3] * 0.133322368
    fr = sum(1 for a, b in zip(rows, rows[1:]) if a[2] > 0.0 >= b[2])
    first_frozen = next(i for i, r in enumerate(rows) if r[2] <= 0.0)
    side = [state(r)[1] < ice_sublimation_pa(state(r)[0]) if state(r)[0] < ICE_TT else None for r in rows]
    crossings = sum(1 for a, b in zip(side, side[1:]) if a is not None and b is not None and a != b)
    melt = sum(1 for r in rows[first_frozen:] if state(r)[1] > ICE_PT and r[2] > 0.0)
    assert fr == 1 and crossings == 1 and melt == 0, (fr, crossings, melt)


# ---------------------------------------------------------------------------------------------
# (b) Supercritical CO2 drying in autoclave SCD-1 of Tarnbrook Process Labs (fictional), 10 s samples over 8 h.
CO_DT = 10.0


def co2_setpoints(t):
    """(jacket temperature degC, pressure bar) schedule."""
    if t < 2.0 * H:  # liquid CO2 solvent exchange at 60 bar, 15 degC, with flush pulses
        return 15.0, 60.0 + 1.5 * math.sin(2 * math.pi * t / 900.0) ** 2
    if t < 2.0 * H + 20 * 60:  # pressurise to 100 bar
        return 15.0, 60.0 + 40.0 * (t - 2.0 * H) / (20 * 60)
    if t < 4.5 * H:  # heat to 40 degC (0.5 K/min on the jacket), hold
        return ramp(t, 2.0 * H + 20 * 60, 15.0, 0.5 / 60, 40.0), 100.0
    if t < 7.75 * H:  # isothermal vent at 0.5 bar/min to 1 bar
        return 40.0, max(1.013, 100.0 - 0.5 * (t - 4.5 * H) / 60)
    return ramp(t, 7.75 * H, 40.0, -0.5 / 60, 25.0), 1.013  # cool down at ambient pressure


def co2_rows():
    rng = random.Random(118)
    rows, T = [], 15.0
    for i in range(int(8.25 * H / CO_DT) + 1):
        t = i * CO_DT
        jacket, p_bar = co2_setpoints(t)
        T = lag(T, jacket, CO_DT, 6 * 60) if i else jacket
        rows.append((t, jacket + rng.gauss(0, 0.05), T + rng.gauss(0, 0.02), p_bar + rng.gauss(0, 0.02)))
    return rows


def check_co2(rows):
    """Enters and leaves the supercritical region once; never on the wrong side of the
    vapor-pressure curve while liquid (T < Tc and P > P_vap) turns to vapor."""
    states = [(r[2] + 273.15, r[3] * 1e5) for r in rows]
    sc = [T >= CO2_TC and P >= CO2_PC for T, P in states]
    changes = sum(1 for a, b in zip(sc, sc[1:]) if a != b)
    liquid = [T < CO2_TC and P > co2_vapor_pa(T) for T, P in states]
    vapor = [T < CO2_TC and P < co2_vapor_pa(T) for T, P in states]
    lv = sum(1 for i in range(1, len(states)) if (liquid[i - 1] and vapor[i]) or (vapor[i - 1] and liquid[i]))
    assert changes == 2 and lv == 0 and liquid[0], (changes, lv)


def write(name, header, rows, fmt):
    with open(os.path.join(HERE, name), "w", newline="\n") as f:
        f.write(header + "\n")
        for r in rows:
            f.write(fmt.format(*r) + "\n")


def main():
    fd = freeze_drying_rows()
    check_freeze_drying(fd)
    write("freeze-drying-run.csv", "timestamp,shelf_T [degC],product_T [degC],chamber_P [mTorr],pirani_P [mTorr]",
          fd, "{},{:.2f},{:.2f},{:.1f},{:.1f}")
    co = co2_rows()
    check_co2(co)
    write("co2-drying-run.csv", "time [s],jacket_T [degC],vessel_T [degC],vessel_P [bar]",
          co, "{:.0f},{:.2f},{:.2f},{:.3f}")


if __name__ == "__main__":
    main()
