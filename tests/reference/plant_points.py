#!/usr/bin/python3
"""Reference values for the plant module from Debian's python3-iapws (IAPWS-IF97).

Run with Debian's interpreter: /usr/bin/python3 tests/reference/plant_points.py [out.json]
Writes tests/reference/.cache/plant-points.json by default. Deterministic: a fixed grid, no
clock, no randomness; the same library version always gives the same file.

Each case is worked here with python3-iapws's own states and the textbook equations the
engine uses (src/lib/steam/plant/), so the spec compares two independent implementations:
  expansion  inlet IAPWS97(P=p1, T=T1) or (P=p1, x=x1); isentropic end IAPWS97(P=p2, s=s1);
             h2 = h1 - eta (h1 - h2s); actual end IAPWS97(P=p2, h=h2)
  pump       inlet saturated liquid IAPWS97(P=p1, x=0) or IAPWS97(P=p1, T=T1);
             exact rise IAPWS97(P=p2, s=s1).h - h1; v1 (p2 - p1) * 1000
  rankine    the two above chained: w_t, w_p, q_in = h3 - h2, q_out = h4 - h1, eta, SSC
  dome       saturated liquid and vapour entropy at saturationDome()'s default temperatures

What is left out, and why (counted in meta.dropped):
  * Grid cases whose end state lies within BOUNDARY_K of saturation or within DRY_X of the
    dome's edges: on a boundary either neighbouring equation is a legitimate answer and the
    two differ by more than the tolerance.
  * Inversions python3-iapws gets wrong by its own standard: an IAPWS97(P, s) or
    IAPWS97(P, h) state whose forward recomputation (IAPWS97(P, T) or IAPWS97(P, x)) misses
    the s or h asked for by more than 1e-9 relative (fsolve landing on another root).
  * Pressures above ps(623.15 K) = 16.529 MPa for two-phase end states: python3-iapws's
    two-phase states there are not iterated onto the region-3 equation (iapws_points.py).
  * The dome's last point, the critical point itself: see iapws_points.py's critical box.
"""

import json
import os
import sys

from iapws import IAPWS97
from iapws import iapws97 as if97

from iapws_points import library_version  # this folder is on the path of a script run here

BOUNDARY_K = 0.01
DRY_X = 1e-4
TC = 647.096
TRIPLE = 273.16
P623 = if97._PSat_T(623.15)
DOME_POINTS = 80  # saturationDome()'s default count
dropped = {}


def drop(kind):
    dropped[kind] = dropped.get(kind, 0) + 1


def dryness(st):
    """The dryness of a two-phase state; None off the dome (python3-iapws says 0 or 1 there)."""
    return st.x if st.region == 4 else None


def near_boundary(st):
    """True for a state a hair from the saturation line, where region choice is ambiguous."""
    if st.region == 4:
        return st.x < DRY_X or st.x > 1 - DRY_X
    if st.P >= 22.064:
        return False
    return abs(st.T - if97._TSat_P(st.P)) < BOUNDARY_K


def consistent(st, key, value):
    """Whether python3-iapws's inverted state really has the h or s it was asked for."""
    back = IAPWS97(P=st.P, x=st.x) if st.region == 4 else IAPWS97(P=st.P, T=st.T)
    return abs(getattr(back, key) - value) <= 1e-9 * max(abs(value), 1.0)


def invert(p, key, value, kind):
    st = IAPWS97(P=p, **{key: value})
    if not consistent(st, key, value):
        drop(kind)
        return None
    if st.region == 4 and p > P623:
        drop(kind)
        return None
    if near_boundary(st):
        drop(kind)
        return None
    return st


def expansion(p1, T1, x1, p2, eta):
    inlet = IAPWS97(P=p1, T=T1) if T1 is not None else IAPWS97(P=p1, x=x1)
    ideal = invert(p2, "s", inlet.s, "expansion")
    if ideal is None:
        return None
    h2 = inlet.h - eta * (inlet.h - ideal.h)
    actual = ideal if eta == 1 else invert(p2, "h", h2, "expansion")
    if actual is None:
        return None
    return {
        "p1": p1, "T1": T1, "x1": x1, "p2": p2, "eta": eta,
        "ref": {"h1": inlet.h, "s1": inlet.s, "h2s": ideal.h, "T2s": ideal.T,
                "x2s": dryness(ideal), "h2": h2, "T2": actual.T, "s2": actual.s,
                "x2": dryness(actual), "work": inlet.h - h2},
    }


def pump(p1, T1, p2, eta):
    inlet = IAPWS97(P=p1, x=0) if T1 is None else IAPWS97(P=p1, T=T1)
    ideal = invert(p2, "s", inlet.s, "pump")
    if ideal is None:
        return None
    exact = ideal.h - inlet.h
    return {
        "p1": p1, "T1": T1, "p2": p2, "eta": eta,
        "ref": {"h1": inlet.h, "v1": inlet.v, "vdp": inlet.v * (p2 - p1) * 1000,
                "isentropic": exact, "work": exact / eta, "h2": inlet.h + exact / eta},
    }


def rankine(pb, pc, inlet, eta_t, eta_p):
    T1, x1 = (inlet, None) if inlet is not None else (None, 1)
    turbine = expansion(pb, T1, x1, pc, eta_t)
    feed = pump(pc, None, pb, eta_p)
    if turbine is None or feed is None:
        drop("rankine")
        return None
    t, f = turbine["ref"], feed["ref"]
    net = t["work"] - f["work"]
    q_in = t["h1"] - f["h2"]
    return {
        "boilerPressure": pb, "condenserPressure": pc, "temperature": T1, "dryness": x1,
        "eta_t": eta_t, "eta_p": eta_p,
        "ref": {"turbineWork": t["work"], "pumpWork": f["work"], "netWork": net,
                "heatSupplied": q_in, "heatRejected": t["h2"] - f["h1"],
                "thermalEfficiency": net / q_in, "specificSteamConsumption": 3600 / net,
                "exhaustDryness": t["x2"]},
    }


def dome():
    """Saturated entropies at saturationDome(80)'s temperatures, below the critical box."""
    points = []
    for i in range(DOME_POINTS - 1):
        u = 1 - i / (DOME_POINTS - 1)
        T = TC - (TC - TRIPLE) * u * u
        if TC - T < 0.05:
            drop("dome")
            continue
        if T > 623.15:  # iterated saturated states by pressure, as iapws_points.py does
            p = if97._PSat_T(T)
            liq, vap = IAPWS97(P=p, x=0), IAPWS97(P=p, x=1)
        else:
            liq, vap = IAPWS97(T=T, x=0), IAPWS97(T=T, x=1)
        points.append({"i": i, "T": T, "sLiquid": liq.s, "sVapour": vap.s})
    return points


def expansion_grid():
    cases = []
    for p1 in (0.3, 1, 2, 4, 8, 12, 16):
        ts = if97._TSat_P(p1)
        inlets = [(None, 1.0), (None, 0.97)]
        inlets += [(T, None) for T in (ts + 10, 573.15, 673.15, 773.15, 873.15) if T > ts + 1]
        for T1, x1 in inlets:
            for ratio in (0.6, 0.25, 0.05, 0.005):
                p2 = p1 * ratio
                if p2 < 0.002:
                    continue
                for eta in (1, 0.85, 0.55):
                    case = expansion(p1, T1, x1, p2, eta)
                    if case is not None:
                        cases.append(case)
    return cases


def pump_grid():
    cases = []
    for p1 in (0.005, 0.02, 0.1, 0.5, 2):
        ts = if97._TSat_P(p1)
        for T1 in (None, 300.0, 330.0):
            if T1 is not None and T1 > ts - 1:
                continue
            for p2 in (1, 3, 8, 15, 25, 40, 60, 100):
                if p2 <= p1:
                    continue
                for eta in (1, 0.75):
                    case = pump(p1, T1, p2, eta)
                    if case is not None:
                        cases.append(case)
    return cases


def rankine_grid():
    cases = []
    for pb in (1, 3, 6, 10, 15):
        ts = if97._TSat_P(pb)
        for inlet in (None, 623.15, 773.15, 873.15):
            if inlet is not None and inlet < ts + 1:
                continue
            for pc in (0.005, 0.01, 0.05, 0.1):
                for eta_t in (1, 0.85):
                    for eta_p in (1, 0.8):
                        case = rankine(pb, pc, inlet, eta_t, eta_p)
                        if case is not None:
                            cases.append(case)
    return cases


def main():
    data = {"expansions": expansion_grid(), "pumps": pump_grid(), "cycles": rankine_grid(),
            "dome": dome()}
    meta = {
        "library": "Debian python3-iapws " + library_version(),
        "formulation": "IAPWS-IF97 (IAPWS R7-97(2012))",
        "domePoints": DOME_POINTS, "dropped": dropped,
    }
    here = os.path.dirname(os.path.abspath(__file__))
    out = sys.argv[1] if len(sys.argv) > 1 else os.path.join(here, ".cache", "plant-points.json")
    os.makedirs(os.path.dirname(out), exist_ok=True)
    tmp = f"{out}.{os.getpid()}.tmp"  # concurrent test runs must not share a half-written file
    with open(tmp, "w") as f:
        json.dump({"meta": meta, **data}, f)
    os.replace(tmp, out)
    counts = {k: len(v) for k, v in data.items()}
    print(f"{counts} -> {out}; dropped {dropped}")


if __name__ == "__main__":
    main()
