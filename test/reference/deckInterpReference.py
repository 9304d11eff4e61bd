#!/usr/bin/env python3
"""Independent reference values for the deck interpolation (engine/propulsion/deckGrid.ts).

Writes deckInterpReference.json next to this script:
  - "regular": a regular (altitude, Mach, power) grid and scipy
    RegularGridInterpolator(method="linear") values at grid-aligned and
    in-between points;
  - "regular4": the same with an ISA-deviation axis (4-D);
  - "ragged": a ragged grid (each altitude its own Machs, each node its own
    powers) and values from numpy.interp along power, then Mach, then
    altitude, the order the engine uses.
Run: python3 test/reference/deckInterpReference.py [output.json]
"""
import json
import os
import sys

import numpy as np
from scipy.interpolate import RegularGridInterpolator

rng = np.random.default_rng(20261201)


def thrust_fn(isa, alt, mach, power):
    # any smooth, non-linear, strictly rising-in-power invented surface (N)
    return (30000.0 * np.exp(-alt / 9000.0) * (1 - 0.4 * np.sqrt(mach) + 0.5 * mach**2) * (0.05 + power**1.3)
            * (1 - 0.004 * isa))


def fuel_fn(isa, alt, mach, power):
    return 0.6 * np.exp(-alt / 11000.0) * (1 + 0.3 * mach) * (0.1 + 0.9 * power**1.1) * (1 + 0.002 * isa)


def air_fn(isa, alt, mach, power):
    return 95.0 * np.exp(-alt / 8000.0) * (1 + 0.2 * mach**2) ** 3.5 * power**0.3 / np.sqrt(1 + isa / 288.15)


def regular(with_isa):
    isas = np.array([-20.0, 0.0, 15.0, 35.0]) if with_isa else np.array([0.0])
    alts = np.array([0.0, 1524.0, 3048.0, 6096.0, 9144.0, 10668.0, 12192.0])
    machs = np.array([0.0, 0.2, 0.4, 0.6, 0.75, 0.9])
    powers = np.array([0.05, 0.2, 0.45, 0.7, 0.85, 1.0])
    I, A, M, P = np.meshgrid(isas, alts, machs, powers, indexing="ij")
    cols = {"thrust_N": thrust_fn, "fuelFlow_kg_s": fuel_fn, "airflow_kg_s": air_fn}
    values = {k: f(I, A, M, P) for k, f in cols.items()}
    rows = [[float(I.flat[n]), float(A.flat[n]), float(M.flat[n]), float(P.flat[n])] + [float(values[k].flat[n]) for k in cols]
            for n in range(I.size)]
    axes = (isas, alts, machs, powers) if with_isa else (alts, machs, powers)
    interps = {k: RegularGridInterpolator(axes, v if with_isa else v[0], method="linear") for k, v in values.items()}
    queries = []
    # grid-aligned: every 7th tabulated point
    for n in range(0, I.size, 7):
        queries.append([float(I.flat[n]), float(A.flat[n]), float(M.flat[n]), float(P.flat[n])])
    # in between: uniform inside the hull
    for _ in range(200):
        q = [float(rng.uniform(isas[0], isas[-1])) if with_isa else 0.0,
             float(rng.uniform(alts[0], alts[-1])), float(rng.uniform(machs[0], machs[-1])),
             float(rng.uniform(powers[0], powers[-1]))]
        queries.append(q)
    out = []
    for q in queries:
        x = np.array([q]) if with_isa else np.array([q[1:]])
        out.append({"isaDev_K": q[0], "altitude_m": q[1], "mach": q[2], "power": q[3],
                    **{k: float(interps[k](x)[0]) for k in cols}})
    return {"columns": ["isaDev_K", "altitude_m", "mach", "power", *cols], "rows": rows, "queries": out}


def ragged():
    alts = [0.0, 3048.0, 7620.0, 10668.0, 13716.0]
    mach_lists = [[0.0, 0.25, 0.5, 0.6], [0.0, 0.3, 0.55, 0.7], [0.1, 0.4, 0.65, 0.8, 0.9],
                  [0.3, 0.5, 0.7, 0.85, 0.9], [0.4, 0.6, 0.8, 0.9]]
    rows = []
    nodes = {}
    for ai, alt in enumerate(alts):
        for mi, mach in enumerate(mach_lists[ai]):
            # each node its own power points (different counts and positions)
            base = [0.06, 0.15, 0.3, 0.5, 0.7, 0.85, 1.0]
            drop = (ai + mi) % 3
            powers = [p for j, p in enumerate(base) if j == 0 or j == len(base) - 1 or (j + drop) % 3 != 0]
            if (ai + mi) % 2 == 1:
                powers = sorted(set(powers + [0.4 + 0.01 * mi]))
            pw = np.array(powers)
            t = thrust_fn(0.0, alt, mach, pw)
            f = fuel_fn(0.0, alt, mach, pw)
            a = air_fn(0.0, alt, mach, pw)
            nodes[(ai, mi)] = (pw, t, f, a)
            for j in range(len(pw)):
                rows.append([0.0, alt, mach, float(pw[j]), float(t[j]), float(f[j]), float(a[j])])

    def at(alt, mach, power, col):
        ai_hi = int(np.searchsorted(alts, alt, side="left"))
        brackets = [max(ai_hi - 1, 0), min(ai_hi, len(alts) - 1)]
        per_alt = []
        for ai in sorted(set(brackets)):
            vals = [np.interp(power, nodes[(ai, mi)][0], nodes[(ai, mi)][col]) for mi in range(len(mach_lists[ai]))]
            per_alt.append((alts[ai], np.interp(mach, mach_lists[ai], vals)))
        xs = [p[0] for p in per_alt]
        ys = [p[1] for p in per_alt]
        return float(np.interp(alt, xs, ys)) if len(xs) > 1 else float(ys[0])

    queries = []
    # grid-aligned: tabulated points
    for r in rows[::5]:
        queries.append((r[1], r[2], r[3]))
    # in between: inside every axis' local range (Mach inside both bracketing altitudes' ranges)
    while len(queries) < len(rows[::5]) + 200:
        alt = float(rng.uniform(alts[0], alts[-1]))
        ai_hi = int(np.searchsorted(alts, alt))
        lo_ai, hi_ai = max(ai_hi - 1, 0), ai_hi
        m_lo = max(mach_lists[lo_ai][0], mach_lists[hi_ai][0])
        m_hi = min(mach_lists[lo_ai][-1], mach_lists[hi_ai][-1])
        mach = float(rng.uniform(m_lo, m_hi))
        power = float(rng.uniform(0.06, 1.0))
        queries.append((alt, mach, power))
    out = [{"isaDev_K": 0.0, "altitude_m": q[0], "mach": q[1], "power": q[2],
            "thrust_N": at(*q, 1), "fuelFlow_kg_s": at(*q, 2), "airflow_kg_s": at(*q, 3)} for q in queries]
    return {"columns": ["isaDev_K", "altitude_m", "mach", "power", "thrust_N", "fuelFlow_kg_s", "airflow_kg_s"],
            "rows": rows, "queries": out}


if __name__ == "__main__":
    doc = {
        "source": "test/reference/deckInterpReference.py (numpy %s, scipy RegularGridInterpolator / numpy.interp)" % np.__version__,
        "regular": regular(False),
        "regular4": regular(True),
        "ragged": ragged(),
    }
    path = sys.argv[1] if len(sys.argv) > 1 else os.path.join(os.path.dirname(os.path.abspath(__file__)), "deckInterpReference.json")
    with open(path, "w") as fh:
        json.dump(doc, fh, indent=None, separators=(",", ":"))
        fh.write("\n")
    print("wrote", path)
