#!/usr/bin/python3
"""Reference states from Debian's python3-iapws (IAPWS-IF97) for the engine cross-check.

Run with Debian's interpreter: /usr/bin/python3 tests/reference/iapws_points.py [out.json]
Writes tests/reference/.cache/iapws-points.json by default. Deterministic: a fixed seed,
no clock, no environment; the same library version always gives the same file.

Kinds of point (inputs -> what python3-iapws is asked):
  pt      (p, T) in regions 1, 2, 3 and 5            IAPWS97(P=p, T=T)
  psat    T -> saturation pressure                   IAPWS97(T=T, x=0.5).P
  tsat    p -> saturation temperature                IAPWS97(P=p, x=0.5).T
  satliq  p -> saturated liquid                      IAPWS97(P=p, x=0)
  satvap  p -> saturated vapour                      IAPWS97(P=p, x=1)
  px, tx  two-phase from p or T and dryness x        IAPWS97(P=p, x=x), IAPWS97(T=T, x=x)
  ph, ps  inversions, single-phase and two-phase     IAPWS97(P=p, h=h), IAPWS97(P=p, s=s)

What is excluded, and why (the spec prints these counts from the file's meta):
  * Region boundaries: no (p, T) within BOUNDARY_K of Tsat(p) (regions 1/2, and liquid/vapour
    of region 3 below pc), of 623.15 K (regions 1/3), of T_B23(p) (regions 2/3) or of
    1073.15 K (regions 2/5); no p within BOUNDARY_MPA of ps(623.15 K), where three regions meet.
    Exactly on a boundary either neighbouring equation is legitimate and the two equations
    differ there by up to the release's consistency limits (far above 1e-6), so a difference
    in the last digit of Tsat could flip the region.
  * Critical neighbourhood: no state with |T - Tc| < CRIT_K and |p - pc| < CRIT_MPA. There
    the density solving p3(rho, T) = p is ill-conditioned (dp/drho -> 0): at p = pc - 0.001 MPa
    on the saturation line, a pressure residual of 5e-12 MPa (a correct stopping point for an
    iteration) moves rho by 4e-9, which cp (diverging at the critical point) and x amplify to
    9e-7, at the tolerance itself. At 0.003 MPa below pc the two libraries agree to 6e-9, at
    0.01 MPa to 2e-9; the box keeps a margin over that, and the "near-critical" groups put
    points just outside it so the neighbourhood is still checked.
  * Two-phase states above 623.15 K (p > ps(623.15 K)): python3-iapws's IAPWS97(P, x) with
    0 < x < 1 takes the saturated volumes from the v(p,T) backward equations of IAPWS
    SR5-05 without iterating them onto the region-3 equation: measured against iterated ones
    they are 2e-6 off at 16.6 MPa and up to 1.8e-2 off (v'' at 22.05 MPa) near pc, because
    backward equations only approximate Eq. 28. IAPWS97(P, h) / IAPWS97(P, s) inside the
    dome return a single-phase region-3 root instead (e.g. p = 20 MPa, h halfway between
    h' and h'': T = 638.65 K below Tsat = 638.90 K, cp = -119.6 kJ/(kg K), physically
    impossible). By IF97 such a state is two-phase (region 4): its v, h, s are the lever
    rule between the saturated liquid and vapour, whose densities solve p3(rho, Ts) = ps.
    For these points the reference is built that way from python3-iapws's own iterated
    saturated states IAPWS97(P=p, x=0) and IAPWS97(P=p, x=1); "built": "lever" marks them.
  * Inversions python3-iapws gets wrong by its own standard: every (p, h) and (p, s) point is
    generated from a known state (p, T) or (p, x); if IAPWS97(P, h) or IAPWS97(P, s) does not
    return that state's T (to 1e-9 relative) the point is dropped and counted in
    meta.dropped. Such drops come from its approximate region-3/4 boundary test
    (psat,3(h) and psat,3(s) backward equations) and from fsolve landing on another root.
"""

import json
import os
import random
import subprocess
import sys

from iapws import IAPWS97
from iapws import iapws97 as if97

SEED = 9701
BOUNDARY_K = 0.01
BOUNDARY_MPA = 2e-3
CRIT_K = 0.05
CRIT_MPA = 0.01
TC, PC = 647.096, 22.064
P623 = if97._PSat_T(623.15)
P_MIN = 0.000612  # just above ps(273.15 K) = 0.000611213 MPa, python3-iapws's lowest pressure
NEAR_K, NEAR_MPA = 2.0, 1.0  # the near-critical groups: within this of Tc and pc
COUNTS = {"pt1": 950, "pt2": 950, "pt3": 700, "pt5": 400, "psat": 200, "tsat": 200,
          "satliq": 250, "satvap": 250, "px": 250, "tx": 250, "ph": 700, "ps": 700,
          "pt3NearCritical": 150, "satliqNearCritical": 50, "satvapNearCritical": 50,
          "pxNearCritical": 50, "phNearCritical": 50, "psNearCritical": 50}

rng = random.Random(SEED)
dropped = {}


def log_uniform(lo, hi):
    return lo * (hi / lo) ** rng.random()


def tsat(p):
    return if97._TSat_P(p)


def near_critical(p, T):
    return abs(T - TC) < CRIT_K and abs(p - PC) < CRIT_MPA


def near_boundary(p, T):
    """True within a hair of a boundary where the region choice is ambiguous."""
    if abs(p - P623) < BOUNDARY_MPA or abs(T - 1073.15) < BOUNDARY_K:
        return True
    if p < PC and abs(T - tsat(p)) < BOUNDARY_K:
        return True
    return p > P623 and (abs(T - 623.15) < BOUNDARY_K or abs(T - if97._t_P(p)) < BOUNDARY_K)


def single(st):
    """Every compared property of a single-phase python3-iapws state; x is null off the dome."""
    return {"p": st.P, "T": st.T, "v": st.v, "h": st.h, "u": st.u, "s": st.s,
            "cp": st.cp, "cv": st.cv, "w": st.w, "x": None, "region": st.region}


def saturated(st, x):
    return {**single(st), "x": x}


def lever(p, x):
    """Two-phase state by the lever rule between python3-iapws's iterated saturated states."""
    liq, vap = IAPWS97(P=p, x=0), IAPWS97(P=p, x=1)
    mix = {k: getattr(liq, k) + x * (getattr(vap, k) - getattr(liq, k)) for k in ("v", "h", "s")}
    mix["u"] = mix["h"] - p * 1000 * mix["v"]
    return {"p": p, "T": liq.T, **mix, "cp": None, "cv": None, "w": None, "x": x, "region": 4}


def mixture(st):
    """A python3-iapws two-phase state (at or below 623.15 K, where it is right)."""
    return {"p": st.P, "T": st.T, "v": st.v, "h": st.h, "u": st.u, "s": st.s,
            "cp": None, "cv": None, "w": None, "x": st.x, "region": st.region}


def two_phase(p, x):
    """A two-phase reference from p and x, and how it was built."""
    if p > P623:
        return lever(p, x), "lever"
    return mixture(IAPWS97(P=p, x=x)), "iapws"


def pt_state(region, near=False):
    """A (p, T) drawn uniformly over one region's area (or its near-critical part), away from
    boundaries and the critical point."""
    while True:
        if near:
            p, T = rng.uniform(PC - NEAR_MPA, PC + NEAR_MPA), rng.uniform(TC - NEAR_K, TC + NEAR_K)
        elif region == 5:
            p, T = log_uniform(P_MIN, 50), rng.uniform(1073.15, 2273.15)
        elif region == 3:
            p = rng.uniform(P623, 100)
            T = rng.uniform(623.15, if97._t_P(p))
        else:
            p, T = log_uniform(P_MIN, 100), rng.uniform(273.16, 1073.15)
        if if97._Bound_TP(T, p) == region and not near_boundary(p, T) \
                and not near_critical(p, T):
            return p, T


def sat_pressure(near=False):
    """A saturation pressure away from ps(623.15 K) and pc; log-spread for the low pressures,
    linear for one draw in three so the region-3 part of the dome is well covered."""
    while True:
        if near:
            p = rng.uniform(PC - NEAR_MPA, PC)
        else:
            p = log_uniform(P_MIN, PC) if rng.random() < 2 / 3 else rng.uniform(P_MIN, PC)
        if abs(p - P623) >= BOUNDARY_MPA and not near_critical(p, tsat(p)):
            return p


def make_pt(region, near=False):
    p, T = pt_state(region, near)
    return {"kind": "pt", "p": p, "T": T, "ref": single(IAPWS97(P=p, T=T))}


def make_sat(kind, near=False):
    p = sat_pressure(near)
    if kind == "tsat":
        return {"kind": kind, "p": p, "ref": {"T": IAPWS97(P=p, x=0.5).T}}
    if kind == "psat":
        T = tsat(p)
        return {"kind": kind, "T": T, "ref": {"p": IAPWS97(T=T, x=0.5).P}}
    x = 0 if kind == "satliq" else 1
    return {"kind": kind, "p": p, "ref": saturated(IAPWS97(P=p, x=x), x)}


def make_px(near=False):
    p, x = sat_pressure(near), rng.uniform(0.002, 0.998)
    ref, built = two_phase(p, x)
    return {"kind": "px", "p": p, "x": x, "ref": ref, "built": built}


def make_tx():
    while True:
        T, x = rng.uniform(273.16, TC - CRIT_K), rng.uniform(0.002, 0.998)
        if abs(T - 623.15) >= BOUNDARY_K:
            break
    if T > 623.15:
        ref, built = lever(if97._PSat_T(T), x), "lever"
        ref["T"] = T  # the lever state sits at Ts(ps(T)), equal to T to round-off
    else:
        ref, built = mixture(IAPWS97(T=T, x=x)), "iapws"
    return {"kind": "tx", "T": T, "x": x, "ref": ref, "built": built}


def inversion_seed(near):
    """A known state to invert: one in four two-phase, the rest spread over regions 1, 2, 3, 5
    (near the critical point: half two-phase, half region 3)."""
    r = rng.random()
    if r < (0.5 if near else 0.25):
        p, x = sat_pressure(near), rng.uniform(0.002, 0.998)
        return two_phase(p, x)
    region = 3 if near else 1 if r < 0.45 else 2 if r < 0.7 else 3 if r < 0.88 else 5
    p, T = pt_state(region, near)
    return single(IAPWS97(P=p, T=T)), "iapws"


def make_inversion(kind, near=False):
    """A (p, h) or (p, s) point whose answer python3-iapws reproduces from a known state."""
    while True:
        seed, built = inversion_seed(near)
        p, y = seed["p"], seed[kind[1]]
        if built == "lever":
            return {"kind": kind, "p": p, kind[1]: y, "ref": seed, "built": built}
        st = IAPWS97(P=p, **{kind[1]: y})
        ref = single(st) if seed["x"] is None else mixture(st)
        if abs(ref["T"] - seed["T"]) <= 1e-9 * seed["T"] and ref["region"] == seed["region"]:
            return {"kind": kind, "p": p, kind[1]: y, "ref": ref, "built": built}
        dropped[kind] = dropped.get(kind, 0) + 1


def library_version():
    try:
        out = subprocess.run(["dpkg-query", "-W", "-f=${Version}", "python3-iapws"],
                             capture_output=True, text=True, check=True)
        return out.stdout.strip()
    except (OSError, subprocess.CalledProcessError):
        return "unknown"


def main():
    makers = {
        "pt1": lambda: make_pt(1), "pt2": lambda: make_pt(2), "pt3": lambda: make_pt(3),
        "pt5": lambda: make_pt(5), "psat": lambda: make_sat("psat"),
        "tsat": lambda: make_sat("tsat"), "satliq": lambda: make_sat("satliq"),
        "satvap": lambda: make_sat("satvap"), "px": make_px, "tx": make_tx,
        "ph": lambda: make_inversion("ph"), "ps": lambda: make_inversion("ps"),
        "pt3NearCritical": lambda: make_pt(3, near=True),
        "satliqNearCritical": lambda: make_sat("satliq", near=True),
        "satvapNearCritical": lambda: make_sat("satvap", near=True),
        "pxNearCritical": lambda: make_px(near=True),
        "phNearCritical": lambda: make_inversion("ph", near=True),
        "psNearCritical": lambda: make_inversion("ps", near=True),
    }
    points = [makers[group]() for group, n in COUNTS.items() for _ in range(n)]
    meta = {
        "library": "Debian python3-iapws " + library_version(),
        "formulation": "IAPWS-IF97 (IAPWS R7-97(2012))",
        "seed": SEED, "counts": COUNTS, "dropped": dropped,
        "exclusions": {"boundaryK": BOUNDARY_K, "boundaryMPa": BOUNDARY_MPA,
                       "criticalK": CRIT_K, "criticalMPa": CRIT_MPA},
    }
    here = os.path.dirname(os.path.abspath(__file__))
    out = sys.argv[1] if len(sys.argv) > 1 else os.path.join(here, ".cache", "iapws-points.json")
    os.makedirs(os.path.dirname(out), exist_ok=True)
    tmp = f"{out}.{os.getpid()}.tmp"  # concurrent test runs must not share a half-written file
    with open(tmp, "w") as f:
        json.dump({"meta": meta, "points": points}, f)
    os.replace(tmp, out)
    print(f"{len(points)} points -> {out}; dropped {dropped}")


if __name__ == "__main__":
    main()
