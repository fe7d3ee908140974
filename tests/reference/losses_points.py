#!/usr/bin/python3
"""Check values for the loss models from Debian's python3-iapws (IAPWS-IF97).

Run with Debian's interpreter: /usr/bin/python3 tests/reference/losses_points.py
Prints the values embedded, with this script named as their source, in
tests/reference/losses-*.spec.ts. Deterministic: no clock, no randomness.
"""
from math import sqrt

import iapws
from iapws import IAPWS97

PSI_MPA = 0.45359237 * 9.80665 / 0.0254**2 / 1e6  # exact psi in MPa (NIST SP 811)
ATM_PSIA = 14.696


def psig(p):
    return (p + ATM_PSIA) * PSI_MPA


def flux(up, p):
    """Ideal isentropic mass flux from stagnation state `up` to throat pressure p, kg/(m2 s)."""
    t = IAPWS97(P=p, s=up.s)
    return sqrt(2 * (up.h - t.h) * 1000) / t.v


def critical(up):
    """Golden-section search of the throat pressure ratio that maximises the mass flux."""
    a, b = 0.3, 0.95
    g = (sqrt(5) - 1) / 2
    c, d = b - g * (b - a), a + g * (b - a)
    fc, fd = flux(up, c * up.P), flux(up, d * up.P)
    while b - a > 1e-6:
        if fc > fd:
            b, d, fd = d, c, fc
            c = b - g * (b - a)
            fc = flux(up, c * up.P)
        else:
            a, c, fc = c, d, fd
            d = a + g * (b - a)
            fd = flux(up, d * up.P)
    r = (a + b) / 2
    return r, flux(up, r * up.P)


print("python3-iapws", iapws.__version__)
print("critical flux of dry saturated steam: bar(g), ratio, G* kg/(m2 s)")
for barg in [1, 2, 5, 10, 20, 30, 40]:
    up = IAPWS97(P=(barg * 1e5 + 101325) / 1e6, x=1)
    r, G = critical(up)
    print(barg, round(r, 5), round(G, 4))

print("flash fraction: psig high, psig low, x")
for hi, lo in [(100, 0), (150, 15), (15, 0), (250, 50)]:
    liquid = IAPWS97(P=psig(hi), x=0)
    f, g = IAPWS97(P=psig(lo), x=0), IAPWS97(P=psig(lo), x=1)
    print(hi, lo, round((liquid.h - f.h) / (g.h - f.h), 6))

print("header states: p MPa, T K or None, Tsat K, h'' kJ/kg, h(p,T) kJ/kg")
for p, T in [(1.1, 500.0), (4.0, 673.15), (0.3, None)]:
    sat = IAPWS97(P=p, x=1)
    print(p, T, round(sat.T, 6), round(sat.h, 4), round(IAPWS97(P=p, T=T).h, 4) if T else None)

print("DOE Table 1 rows, h''(p) - h'(T_fw) in Btu/lb, feedwater 50..250 F")
for p in [150, 450, 600]:
    g = IAPWS97(P=psig(p), x=1)
    row = [(g.h - IAPWS97(T=(F - 32) * 5 / 9 + 273.15, x=0).h) / 2.326 for F in (50, 100, 150, 200, 250)]
    print(p, [round(v, 2) for v in row])
