"""Independent reference values for the tables, the Korn/Lock wave drag and
the drag polar tests (test/engine/core/table*.test.ts,
test/engine/aero/{waveDrag,dragPolar}.test.ts).

Run:  python3 test/reference/dragPolarReference.py > test/reference/dragPolarReference.json

Sources: numpy.interp (linear), scipy.interpolate.PchipInterpolator
(Fritsch-Carlson monotone cubic), scipy.interpolate.RegularGridInterpolator
(bilinear, with fill_value=None for extrapolation), the Korn equation with
Lock's rise as written in Gur, Mason & Schetz (2010), J. Aircraft 47(4),
and the U.S. Standard Atmosphere 1976 pressure at 11 km geopotential.
"""
import json
import math

import numpy as np
from scipy.interpolate import PchipInterpolator, RegularGridInterpolator
from scipy.optimize import minimize_scalar

out = {}

# 1-D linear: an uneven axis.
x1 = [0.0, 0.3, 0.5, 0.8, 0.9]
y1 = [0.0210, 0.0205, 0.0200, 0.0215, 0.0260]
q1 = [0.0, 0.1, 0.3, 0.42, 0.65, 0.85, 0.9]
out["linear"] = {"x": x1, "y": y1, "q": q1, "v": [float(v) for v in np.interp(q1, x1, y1)]}

# Monotone cubic (PCHIP) on data with a flat part and a steep rise.
x2 = [0.0, 1.0, 2.0, 3.5, 4.0, 6.0]
y2 = [0.0, 0.1, 0.1, 1.5, 3.0, 3.2]
q2 = [0.25, 0.5, 1.5, 2.2, 3.0, 3.7, 4.5, 5.9]
p = PchipInterpolator(x2, y2)
out["pchip"] = {
    "x": x2, "y": y2, "q": q2,
    "v": [float(v) for v in p(q2)],
    "endSlopes": [float(p.derivative()(x2[0])), float(p.derivative()(x2[-1]))],
}

# 2-D bilinear on a regular grid, inside and extrapolated.
gx = [0.5, 0.7, 0.8, 0.85]
gy = [0.0, 0.3, 0.6]
gz = [[0.0, 0.0, 0.0002], [0.0, 0.0003, 0.0010], [0.0004, 0.0012, 0.0030], [0.0020, 0.0040, 0.0080]]
rgi = RegularGridInterpolator((gx, gy), np.array(gz), method="linear", bounds_error=False, fill_value=None)
pts = [[0.6, 0.15], [0.75, 0.45], [0.82, 0.5], [0.7, 0.3], [0.9, 0.45], [0.4, 0.7]]
out["bilinear"] = {"x": gx, "y": gy, "z": gz, "q": pts, "v": [float(v) for v in rgi(pts)]}

# Korn + Lock (Gur, Mason & Schetz 2010, eqs. for M_DD, M_cr, CD_w).
def korn(ka, sweep, tc, cl):
    c = math.cos(sweep)
    mdd = ka / c - tc / c**2 - cl / (10 * c**3)
    mcr = mdd - (0.1 / 80) ** (1 / 3)
    return mdd, mcr

cases = []
for ka, sweep_deg, tc, cl, m in [
    (0.95, 30.0, 0.10, 0.50, 0.80),
    (0.87, 25.0, 0.12, 0.45, 0.78),
    (0.95, 0.0, 0.12, 0.40, 0.76),
    (0.87, 35.0, 0.09, 0.60, 0.84),
]:
    mdd, mcr = korn(ka, math.radians(sweep_deg), tc, cl)
    cdw = 20 * (m - mcr) ** 4 if m > mcr else 0.0
    cases.append({"kappa": ka, "sweep_deg": sweep_deg, "tc": tc, "cl": cl, "mach": m,
                  "mdd": mdd, "mcrit": mcr, "cdw": cdw})
out["korn"] = cases

# Drag at a weight, altitude and Mach: 1976 atmosphere, 11 000 m geopotential.
# Pressure from the 1976 hydrostatic formula (cross-checks the printed 22632 Pa).
g0 = 9.80665
R = 8314.32 / 28.9644
p11 = 101325.0 * (216.65 / 288.15) ** (g0 / (R * 0.0065))
S = 122.0
mass = 62000.0
mach = 0.78
q = 0.5 * 1.4 * p11 * mach**2
cl = mass * g0 / (q * S)
cd0, k, clmd = 0.0200, 1 / (math.pi * 0.82 * 9.5), 0.05
ka, sweep, tc = 0.95, math.radians(27.0), 0.11
mdd, mcr = korn(ka, sweep, tc, cl)
cdw = 20 * (mach - mcr) ** 4 if mach > mcr else 0.0
cd = cd0 + 0.0003 + k * (cl - clmd) ** 2 + cdw
out["drag"] = {"pressure_Pa": p11, "q_Pa": q, "cl": cl, "cdWave": cdw, "cd": cd, "drag_N": q * S * cd,
               "S": S, "mass": mass, "mach": mach, "altitude_m": 11000.0}

# Best L/D with Korn wave drag at M 0.80 (bounded scalar minimisation of CD/CL).
def cd_of(clv, m=0.80):
    _, mc = korn(ka, sweep, tc, clv)
    w = 20 * (m - mc) ** 4 if m > mc else 0.0
    return cd0 + 0.0003 + k * (clv - clmd) ** 2 + w
res = minimize_scalar(lambda c: cd_of(c) / c, bounds=(0.05, 1.5), method="bounded", options={"xatol": 1e-10})
out["bestLiftToDrag"] = {"mach": 0.80, "cl": float(res.x), "liftToDrag": float(res.x / cd_of(res.x))}

print(json.dumps(out, indent=1))
