"""Independent reference values for test/engine/aero/*.test.ts and test/engine/units.

Written separately from the TypeScript (numpy/scipy, no shared code) from the
published formulas:
  - U.S. Standard Atmosphere, 1976 (NOAA-S/T 76-1562): Table 4 layer bases and
    lapse rates, hydrostatic equations 33a/33b, geopotential H = r0 z/(r0 + z).
  - NACA Report 1135 (1953): subsonic pitot (eq. 44), Rayleigh pitot (eq. 100),
    isentropic relations (eqs. 43-45), area ratio (eq. 80), normal shock (93-99).
Run: python3 test/reference/atmosphere_airspeed_reference.py
"""
import json
import numpy as np
from scipy.optimize import brentq

g0 = 9.80665
Rstar = 8314.32
M0 = 28.9644
R = 287.05287  # ICAO Doc 7488: R* / M with M = 28.96442 kg/kmol (density, speed of sound)
# hydrostatics use the 1976 g0 M0 / R*, as the 1976 Table 4 base pressures do
gam = 1.4
r0 = 6356766.0
P0, T0 = 101325.0, 288.15
layers = [(0.0, -6.5e-3), (11000.0, 0.0), (20000.0, 1.0e-3), (32000.0, 2.8e-3),
          (47000.0, 0.0), (51000.0, -2.8e-3), (71000.0, -2.0e-3)]


def isa(H):
    T, p = T0, P0
    for i, (hb, L) in enumerate(layers):
        top = layers[i + 1][0] if i + 1 < len(layers) else 84852.0
        h_end = min(H, top) if H >= hb or i == 0 else hb
        if i > 0 and H < hb:
            break
        dh = h_end - hb
        if L == 0:
            p = p * np.exp(-g0 * M0 / Rstar * dh / T)
            Tn = T
        else:
            Tn = T + L * dh
            p = p * (T / Tn) ** (g0 * M0 / (Rstar * L))
        T = Tn
        if H <= top:
            break
    rho = p / (R * T)
    return T, p, rho, np.sqrt(gam * R * T)


def geop(z):
    return r0 * z / (r0 + z)


def qc_ratio(M):
    if M <= 1:
        return (1 + 0.2 * M * M) ** 3.5 - 1
    return (166.92158 * M ** 7) / (7 * M * M - 1) ** 2.5 - 1  # NACA 1135 eq. 100, gamma = 1.4 numerics


def qc_ratio_exact(M):
    if M <= 1:
        return (1 + (gam - 1) / 2 * M * M) ** (gam / (gam - 1)) - 1
    a = ((gam + 1) ** 2 * M * M / (4 * gam * M * M - 2 * (gam - 1))) ** (gam / (gam - 1))
    return a * (1 - gam + 2 * gam * M * M) / (gam + 1) - 1


a0 = np.sqrt(gam * R * T0)


def mach_from_ratio(r):
    return brentq(lambda m: qc_ratio_exact(m) - r, 0.0, 60.0, xtol=1e-15)


def cas_from_mach(M, p):
    return a0 * mach_from_ratio(p * qc_ratio_exact(M) / P0)


def mach_from_cas(V, p):
    return mach_from_ratio(P0 * qc_ratio_exact(V / a0) / p)


def area_ratio(M):
    return (1 / M) * ((2 / (gam + 1)) * (1 + (gam - 1) / 2 * M * M)) ** ((gam + 1) / (2 * (gam - 1)))


out = {}
out['geometric'] = {}
for z in [-5000, -2000, 0, 1000, 5000, 10000, 11000, 15000, 20000, 25000, 30000, 32000, 40000, 47000]:
    H = geop(z)
    T, p, rho, a = isa(H)
    out['geometric'][z] = dict(H=H, T=T, p=p, rho=rho, a=a)
out['geopotential'] = {}
for H in [-5000, 0, 11000, 20000, 32000, 47000, 51000, 71000]:
    T, p, rho, a = isa(H)
    out['geopotential'][H] = dict(T=T, p=p, rho=rho, a=a)
ft = 0.3048
kt = 1852 / 3600
out['feet'] = {}
for hft in [10000, 35000, 36089, 41000]:
    T, p, rho, a = isa(hft * ft)
    out['feet'][hft] = dict(T=T, p=p, rho=rho, a=a)
out['cas_mach'] = {}
for hft, M in [(35000, 0.78), (35000, 0.85), (10000, 0.5), (41000, 0.8), (20000, 1.5), (0, 2.0)]:
    T, p, rho, a = isa(hft * ft)
    out['cas_mach'][f'{hft} ft M{M}'] = dict(cas_kt=cas_from_mach(M, p) / kt, eas_kt=a0 * M * np.sqrt(p / P0) / kt,
                                            tas_kt=M * a / kt)
out['transition'] = {}
for cas_kt, M in [(300, 0.78), (280, 0.76), (310, 0.80), (250, 0.70)]:
    p = P0 * qc_ratio_exact(cas_kt * kt / a0) / qc_ratio_exact(M)
    H = brentq(lambda h: isa(h)[1] - p, -4000, 20000, xtol=1e-9)
    out['transition'][f'{cas_kt} kt M{M}'] = H / ft
out['sonic_cas_check'] = dict(a0=a0, qc_ratio_eq100_vs_exact=[qc_ratio(m) - qc_ratio_exact(m) for m in (1.0, 1.5, 2.5)])
out['area_mach'] = {r: dict(sub=brentq(lambda m: area_ratio(m) - r, 1e-9, 1.0, xtol=1e-15),
                            sup=brentq(lambda m: area_ratio(m) - r, 1.0, 50.0, xtol=1e-15))
                    for r in (1.2, 2.0, 4.0, 10.0)}
print(json.dumps(out, indent=1, default=float))
