#!/usr/bin/python3
"""Evaluations per second of Debian's python3-iapws for the operations scripts/bench.ts times.

Reads {"seconds": s, "inputs": {operation: [[a, b], ...] or [a, ...]}} on stdin; prints JSON
{"library": ..., "cpu": {operation: n}, "wall": {operation: n}, "core": {operation: n}}.
Each operation runs through its inputs, over and over, for about s seconds of CPU after a
warm-up, timed around whole passes so the clocks are not read per call: evaluations per CPU
second (time.process_time) and per wall-clock second (time.perf_counter).
"core" times the bare functions _Region1, _Region2 and _TSat_P, which skip the transport and
derived properties IAPWS97() also computes, for a like-for-like view of the arithmetic.
"""

import json
import subprocess
import sys
import time

from iapws import IAPWS97
from iapws import iapws97 as if97

OPERATIONS = {
    "ptRegion1": lambda p, T: IAPWS97(P=p, T=T),
    "ptRegion2": lambda p, T: IAPWS97(P=p, T=T),
    # Its public way to Tsat(p) is a saturated state, as for every other row; the bare Eq. 31
    # function _TSat_P is timed under "core" and printed beside it.
    "saturationTemperature": lambda p: IAPWS97(P=p, x=0).T,
    "ph": lambda p, h: IAPWS97(P=p, h=h),
    "ps": lambda p, s: IAPWS97(P=p, s=s),
}
CORE = {
    "ptRegion1": lambda p, T: if97._Region1(T, p),
    "ptRegion2": lambda p, T: if97._Region2(T, p),
    "saturationTemperature": if97._TSat_P,
}


def rate(fn, inputs, seconds):
    calls = [args if isinstance(args, list) else [args] for args in inputs]
    for args in calls[:50]:
        fn(*args)
    count, wall, cpu = 0, time.perf_counter(), time.process_time()
    while True:
        for args in calls:
            fn(*args)
        count += len(calls)
        used = time.process_time() - cpu
        if used >= seconds:
            return {"cpu": count / used, "wall": count / (time.perf_counter() - wall)}


def version():
    out = subprocess.run(["dpkg-query", "-W", "-f=${Version}", "python3-iapws"],
                         capture_output=True, text=True)
    return "Debian python3-iapws " + (out.stdout.strip() or "unknown")


def main():
    job = json.load(sys.stdin)
    seconds, inputs = job["seconds"], job["inputs"]
    rates = {op: rate(fn, inputs[op], seconds) for op, fn in OPERATIONS.items()}
    result = {
        "library": version(),
        "cpu": {op: r["cpu"] for op, r in rates.items()},
        "wall": {op: r["wall"] for op, r in rates.items()},
        "core": {op: rate(fn, inputs[op], seconds / 2)["cpu"] for op, fn in CORE.items()},
    }
    json.dump(result, sys.stdout)


if __name__ == "__main__":
    main()
