"""Independent reference values for test/engine/analysis/*.test.ts.

Re-implements the analytic test models of test/engine/analysis/analyticModels.ts
(parabolic polar, Mattingly high-bypass lapse alpha = delta0 (1 - 0.49 sqrt(M)),
constant TSFC, U.S. Standard Atmosphere 1976 pressure) with numpy/scipy and
prints the numbers the tests paste. Run: python3 test/reference/analysisReference.py
"""
import numpy as np
from scipy.optimize import brentq, minimize_scalar

G0 = 9.80665


def isa_pressure(h):
    p0, T0, L, R = 101325.0, 288.15, 0.0065, 287.05287
    if h <= 11000:
        return p0 * (1 - L * h / T0) ** (G0 / (L * R))
    p11 = p0 * (1 - L * 11000 / T0) ** (G0 / (L * R))
    return p11 * np.exp(-G0 * (h - 11000) / (R * 216.65))


S, CD0, K = 90.0, 0.02, 0.045


def drag(h, M, m, mcrit=None):
    q = 0.7 * isa_pressure(h) * M * M
    cl = m * G0 / (q * S)
    cdw = 20 * (M - mcrit) ** 4 if (mcrit is not None and M > mcrit) else 0.0
    return q * S * (CD0 + K * cl * cl + cdw)


def mattingly(h, M, t0):
    delta0 = isa_pressure(h) / 101325.0 * (1 + 0.2 * M * M) ** 3.5
    return t0 * delta0 * (1 - 0.49 * np.sqrt(M))


# 1. Mach of least thrust of the Mattingly lapse (independent of altitude)
r = minimize_scalar(lambda M: mattingly(0.0, M, 1.0), bounds=(0.05, 0.95), method="bounded",
                    options={"xatol": 1e-12})
print(f"mattingly_min_thrust_mach = {r.x:.10f}")

# 2. Crossovers, Mattingly lapse T0 = 160 kN (whole aircraft), m = 60000 kg, 9000 m, Lock drag rise above M 0.78
f = lambda M: mattingly(9000.0, M, 160e3) - drag(9000.0, M, 60000.0, 0.78)
Ms = np.linspace(0.1, 0.95, 2001)
vals = [f(M) for M in Ms]
roots = [brentq(f, Ms[i], Ms[i + 1], xtol=1e-14) for i in range(len(Ms) - 1) if vals[i] * vals[i + 1] < 0]
print("mattingly_crossovers_9000m_60t =", ", ".join(f"{x:.10f}" for x in roots))

# 3. Long-range Mach (faster Mach at 99 % of the best SR), parabolic polar, constant TSFC,
#    8000 m, 55000 kg. SR = V / (c D); a and c cancel in the ratio.
h, m = 8000.0, 55000.0
sr = lambda M: M / drag(h, M, m)
best = minimize_scalar(lambda M: -sr(M), bounds=(0.3, 0.95), method="bounded", options={"xatol": 1e-12})
lrc = brentq(lambda M: sr(M) - 0.99 * sr(best.x), best.x, 0.95, xtol=1e-14)
print(f"parabolic_best_range_mach_8000m_55t = {best.x:.10f}")
print(f"parabolic_long_range_mach_8000m_55t = {lrc:.10f}")

# 4. Absolute ceiling (max over Mach of (T - D) V = 0), Mattingly lapse T0 = 160 kN, 60000 kg, drag rise above M 0.78
#    V = M a and a > 0, so the sign of Ps is that of the max over Mach of (T - D) M a ... the
#    ceiling is where max_M (T - D) M = 0, i.e. where max_M (T - D) = 0.
def max_excess(hh):
    r = minimize_scalar(lambda M: -(mattingly(hh, M, 160e3) - drag(hh, M, 60000.0, 0.78)), bounds=(0.2, 0.95),
                        method="bounded", options={"xatol": 1e-12})
    return -r.fun
ceil = brentq(max_excess, 8000.0, 16000.0, xtol=1e-9)
print(f"mattingly_absolute_ceiling_60t_m = {ceil:.6f}")

# 5. Optimum altitude: Mattingly lapse T0 = 160 kN (maxCruise ceiling), drag rise above M 0.78,
#    TSFC constant 1.6e-5 kg/(N s), 60000 kg: altitude maximising the best SR = M a / (c D)
#    over the Mach band where thrust >= drag.
def sound(h):
    T = 288.15 - 0.0065 * h if h <= 11000 else 216.65
    return np.sqrt(1.4 * 287.05287 * T)


def best_sr(h, m=60000.0):
    Ms = np.linspace(0.3, 0.95, 651)
    ok = [M for M in Ms if mattingly(h, M, 160e3) >= drag(h, M, m, 0.78)]
    if not ok:
        return np.nan
    lo, hi = min(ok), max(ok)
    g = lambda M: mattingly(h, M, 160e3) - drag(h, M, m, 0.78)
    if lo > Ms[0]:
        lo = brentq(g, lo - (Ms[1] - Ms[0]), lo, xtol=1e-14)
    if hi < Ms[-1]:
        hi = brentq(g, hi, hi + (Ms[1] - Ms[0]), xtol=1e-14)
    r = minimize_scalar(lambda M: -(M * sound(h) / (1.6e-5 * drag(h, M, m, 0.78))), bounds=(lo, hi),
                        method="bounded", options={"xatol": 1e-10})
    return -r.fun


hs = np.linspace(3000, 12000, 91)
vals = [best_sr(h) for h in hs]
i = int(np.nanargmax(vals))
r = minimize_scalar(lambda h: -best_sr(h), bounds=(hs[max(0, i - 1)], hs[min(len(hs) - 1, i + 1)]),
                    method="bounded", options={"xatol": 1e-3})
print(f"mattingly_optimum_altitude_60t_m = {r.x:.3f}")
print(f"mattingly_optimum_best_sr_60t_m_kg = {-r.fun:.6f}")

# 6. Shapley values by brute force over all 4! = 24 orderings (itertools), for a
#    non-additive value function v(a, b, c, d) with a..d in {0, 1}.
from itertools import permutations


def v(bits):
    a, b, c, d = bits
    return 100 + 3 * a + 5 * b - 2 * c + 7 * d + 4 * a * b - 6 * b * c * d + 2.5 * a * c * d


shares = [0.0] * 4
perms = list(permutations(range(4)))
for order in perms:
    state = [0, 0, 0, 0]
    for i in order:
        before = v(state)
        state[i] = 1
        shares[i] += (v(state) - before) / len(perms)
print("shapley_shares =", ", ".join(f"{x:.12f}" for x in shares))

# 7. Service (100 ft/min) and cruise (300 ft/min) ceilings, same model as 4 (common practice
#    residual rates): max over Mach of Ps = (T - D) M a / (m g0) equals the residual rate.
def max_ps(hh, m=60000.0):
    r = minimize_scalar(lambda M: -((mattingly(hh, M, 160e3) - drag(hh, M, m, 0.78)) * M * sound(hh) / (m * G0)),
                        bounds=(0.2, 0.95), method="bounded", options={"xatol": 1e-12})
    return -r.fun


for name, rate_fpm in (("service", 100.0), ("cruise", 300.0)):
    rate = rate_fpm * 0.3048 / 60
    hc = brentq(lambda hh: max_ps(hh) - rate, 6000.0, 12000.0, xtol=1e-9)
    print(f"mattingly_{name}_ceiling_60t_m = {hc:.6f}")
