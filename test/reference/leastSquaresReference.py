"""Reference for engine/core/levenbergMarquardt.ts: scipy.optimize.least_squares
on a small bounded problem (a decaying exponential plus offset, fitted to
fixed invented data), written to leastSquaresReference.json.
Run: python3 test/reference/leastSquaresReference.py"""
import json, os
import numpy as np
from scipy.optimize import least_squares

t = np.linspace(0.0, 4.0, 9)
y = np.array([5.2, 3.9, 3.1, 2.45, 2.02, 1.73, 1.52, 1.40, 1.30])

def r(p):
    a, b, c = p
    return a * np.exp(-b * t) + c - y

cases = []
for x0, lo, hi in [([1.0, 0.1, 0.0], [0.0, 0.0, 0.0], [10.0, 5.0, 5.0]),
                   ([1.0, 0.1, 1.6], [0.0, 0.0, 1.5], [10.0, 5.0, 5.0])]:  # second: bound on c active
    s = least_squares(r, x0, bounds=(lo, hi), method='trf', xtol=1e-15, ftol=1e-15, gtol=1e-15)
    cases.append({"x0": x0, "lower": lo, "upper": hi, "x": s.x.tolist(), "cost": float(s.cost)})
out = {"source": "scipy.optimize.least_squares (trf, tolerances 1e-15)", "t": t.tolist(), "y": y.tolist(), "cases": cases}
json.dump(out, open(os.path.join(os.path.dirname(__file__), "leastSquaresReference.json"), "w"), indent=1)
print(json.dumps(out, indent=1))
