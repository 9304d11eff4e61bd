#!/usr/bin/env python3
"""Independent reference for the matched (off-design) ideal turbofan (Blockwise).

The ideal separate-exhaust turbofan of fixtures/cycle/ideal-turbofan.cycle.json
matched at other flight conditions and turbine inlet temperatures, with the
assumptions of Mattingly's performance analysis (Elements of Propulsion,
engine performance analysis; ideal components, constant gamma and cp, fuel
mass neglected): HP and LP turbine guide vanes choked, so the HP turbine
temperature ratio keeps its design value and the HP turbine flow parameter
m sqrt(Tt4)/Pt4 is held; fixed nozzle throat areas, each nozzle choked or
not by its pressure ratio; fan and compressor from the spool balances and
continuity; fully expanded exits.

Written separately from the TypeScript and solved differently: nested
scipy.optimize.brentq bracketing (LP turbine temperature ratio from core
nozzle continuity inside, fan temperature ratio from bypass nozzle
continuity outside) instead of Newton on all unknowns.
Ambient: U.S. Standard Atmosphere 1976 troposphere (NOAA-S/T 76-1562).
Run:  python3 test/reference/cycleIdealOffDesignReference.py > test/reference/cycleIdealOffDesignReference.json
"""
import json
import numpy as np
from scipy.optimize import brentq

G = 1.4
CP = 1004.5
R = CP * (G - 1) / G
K = (G - 1) / G
H_PR = 42.8e6
FT = 0.3048
G0 = 9.80665
R_AIR = 8314.32 / 28.9644  # U.S. Standard Atmosphere 1976: R* / M0 (the hydrostatic constant g0 M0 / R*)


def ambient(alt_ft):
    h = alt_ft * FT
    t = 288.15 - 0.0065 * h
    p = 101325 * (t / 288.15) ** (G0 / (R_AIR * 0.0065))
    return t, p


def mfp(m):
    return m * np.sqrt(G / R) * (1 + (G - 1) / 2 * m * m) ** (-(G + 1) / (2 * (G - 1)))


CRIT = ((G + 1) / 2) ** (G / (G - 1))


def throat_mfp(pt_over_p0):
    if pt_over_p0 >= CRIT:
        return mfp(1.0)
    if pt_over_p0 <= 1:
        return 0.0
    return mfp(np.sqrt(2 / (G - 1) * (pt_over_p0 ** K - 1)))


def jet_velocity(tt, pt_over_p0):
    return np.sqrt(2 * CP * tt * (1 - pt_over_p0 ** (-K)))


# Design point: Mach 0.8, 35,000 ft, BPR 6, FPR 1.6, OPR 30, Tt4 1,600 K, 100 kg/s.
T0R, P0R = ambient(35000)
M0R, ALPHA_R, PIF_R, PIC_R, TT4_R, W_R = 0.8, 6.0, 1.6, 30.0, 1600.0, 100.0


def flight(t0, p0, m0):
    tau_r = 1 + (G - 1) / 2 * m0 * m0
    return tau_r, tau_r ** (1 / K), m0 * np.sqrt(G * R * t0)


tau_rR, pi_rR, _ = flight(T0R, P0R, M0R)
TT2R = T0R * tau_rR
TAUF_R = PIF_R ** K
TAUCH_R = (PIC_R / PIF_R) ** K
TT25R = TT2R * TAUF_R
TT3R = TT25R * TAUCH_R
MC_R = W_R / (1 + ALPHA_R)
TAUTH = 1 - (TT3R - TT25R) / TT4_R  # HP spool balance, ideal
TT45R = TT4_R * TAUTH
TAUTL_R = 1 - W_R * (TT25R - TT2R) / (MC_R * TT45R)  # LP spool balance
PT4R = P0R * pi_rR * PIC_R
PRH = TAUTH ** (-1 / K)
PT5R = PT4R / PRH / TAUTL_R ** (-1 / K)
K4 = MC_R * np.sqrt(TT4_R) / PT4R
A8 = MC_R * np.sqrt(TT45R * TAUTL_R) / (PT5R * throat_mfp(PT5R / P0R))
PT13R = P0R * pi_rR * PIF_R
A18 = ALPHA_R * MC_R * np.sqrt(TT25R) / (PT13R * throat_mfp(PT13R / P0R))


def matched(alt_ft, m0, tt4):
    t0, p0 = ambient(alt_ft)
    tau_r, pi_r, v0 = flight(t0, p0, m0)
    tt2 = t0 * tau_r
    pt2 = p0 * pi_r

    def state(tau_f):
        pi_f = tau_f ** (1 / K)
        tt25 = tt2 * tau_f
        tau_ch = 1 + (1 - TAUTH) * tt4 / tt25
        pt4 = pt2 * pi_f * tau_ch ** (1 / K)
        mc = K4 * pt4 / np.sqrt(tt4)
        tt45 = tt4 * TAUTH
        pt45 = pt4 / PRH

        def core_nozzle(tau_tl):
            pt5 = pt45 * tau_tl ** (1 / K)
            return mc * np.sqrt(tt45 * tau_tl) / (pt5 * A8) - throat_mfp(pt5 / p0)

        tau_tl = brentq(core_nozzle, 0.2, 0.999999, xtol=1e-16, rtol=1e-15)
        alpha = mc * tt45 * (1 - tau_tl) / (mc * tt2 * (tau_f - 1)) - 1  # LP balance: (1 + alpha) mc cp Tt2 (tau_f - 1) = mc cp Tt45 (1 - tau_tL)
        return pi_f, tt25, tau_ch, pt4, mc, tt45, tau_tl, alpha

    def bypass_nozzle(tau_f):
        pi_f, tt25, _, _, mc, _, _, alpha = state(tau_f)
        pt13 = pt2 * pi_f
        return alpha * mc * np.sqrt(tt25) / (pt13 * A18) - throat_mfp(pt13 / p0)

    tau_f = brentq(bypass_nozzle, 1 + 1e-4, 1.5, xtol=1e-16, rtol=1e-15)
    pi_f, tt25, tau_ch, pt4, mc, tt45, tau_tl, alpha = state(tau_f)
    pt5 = pt4 / PRH * tau_tl ** (1 / K)
    tt5 = tt45 * tau_tl
    v9 = jet_velocity(tt5, pt5 / p0)
    v19 = jet_velocity(tt25, pt2 * pi_f / p0)
    w0 = mc * (1 + alpha)
    thrust = mc * v9 + alpha * mc * v19 - w0 * v0
    fuel = mc * CP * (tt4 - tt25 * tau_ch) / H_PR
    n1 = np.sqrt(tt2 * (tau_f - 1) / (TT2R * (TAUF_R - 1)))
    return {
        "altitude_ft": alt_ft, "mach": m0, "tt4_K": tt4,
        "thrust_N": thrust, "fuelFlow_kg_s": fuel, "airflow_kg_s": w0,
        "bypassRatio": alpha, "fanPressureRatio": pi_f, "fanSpeed": n1,
        "overallPressureRatio": pi_f * tau_ch ** (1 / K),
    }


points = [(35000, 0.8, 1600.0), (35000, 0.8, 1450.0), (35000, 0.6, 1400.0), (20000, 0.5, 1300.0), (10000, 0.3, 1200.0), (0, 0.0, 1100.0), (0, 0.4, 1000.0)]
print(json.dumps({
    "source": "Mattingly performance-analysis assumptions for the ideal turbofan, nested brentq (scipy)",
    "points": [matched(*p) for p in points],
}, indent=2))
