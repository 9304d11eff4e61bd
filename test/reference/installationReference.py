#!/usr/bin/env python3
"""Independent reference values for the installation tests (Blockwise).

Computes, with numpy/scipy and textbook forms written out separately from
the TypeScript code (area-Mach relation A/A*, not the mass-flow function):
  - MIL-E-5008B standard recovery at Mach 1.5, 2, 3;
  - throat and fan-face Mach of a geometry inlet (lossless to the throat,
    diffuser loss K_d q_throat), solved together with the airflow scaling
    mdot = mdot_deck * eta / eta_ref by nested scipy.optimize.brentq;
  - additive drag from the 1-D momentum balance (Sibulkin, NACA Report 1187),
    in the form D = p1 A1 (1 + g M1^2) - p0 A0 (1 + g M0^2) - p0 (A1 - A0),
    with a normal shock ahead of the lip above Mach 1.
Run:  python3 test/reference/installationReference.py > test/reference/installationReference.json
"""
import json
import numpy as np
from scipy.optimize import brentq

G = 1.4
R = 287.05287  # ICAO Doc 7488/3 gas constant of air, as in engine/aero/constants.ts


def area_ratio(m):
    """A/A* (isentropic, NACA Report 1135)."""
    return (1.0 / m) * ((2.0 / (G + 1)) * (1 + (G - 1) / 2 * m * m)) ** ((G + 1) / (2 * (G - 1)))


def p_over_pt(m):
    return (1 + (G - 1) / 2 * m * m) ** (-G / (G - 1))


def subsonic_mach_for_area_ratio(ar):
    return brentq(lambda m: area_ratio(m) - ar, 1e-9, 1.0, xtol=1e-15)


def choked_flow(pt, tt, a):
    """mdot through area a at M = 1."""
    return pt * a * np.sqrt(G / (R * tt)) * (2 / (G + 1)) ** ((G + 1) / (2 * (G - 1)))


def mil(m):
    if m <= 1:
        return 1.0
    if m <= 5:
        return 1 - 0.075 * (m - 1) ** 1.35
    return 800 / (m ** 4 + 935)


def normal_shock_pt_ratio(m):
    a = ((G + 1) * m * m) / ((G - 1) * m * m + 2)
    b = (G + 1) / (2 * G * m * m - (G - 1))
    return a ** (G / (G - 1)) * b ** (1 / (G - 1))


def geometry_case(mach, p0, t0, a_th, a_ff, kd, mdot_deck, eta_ref):
    tt = t0 * (1 + (G - 1) / 2 * mach * mach)
    pt0 = p0 / p_over_pt(mach)
    eta_s = mil(mach)
    pt_th = eta_s * pt0

    def throat_mach(eta):
        mdot = mdot_deck * eta / eta_ref
        astar = mdot / choked_flow(pt_th, tt, 1.0)  # A* at the throat total pressure
        return subsonic_mach_for_area_ratio(a_th / astar)

    def residual(eta):
        m_th = throat_mach(eta)
        q_over_pt = 0.5 * G * m_th ** 2 * p_over_pt(m_th)
        return eta - eta_s * (1 - kd * q_over_pt)

    eta = brentq(residual, 0.5 * eta_s, eta_s, xtol=1e-15, rtol=1e-15)
    m_th = throat_mach(eta)
    mdot = mdot_deck * eta / eta_ref
    astar_ff = mdot / choked_flow(eta * pt0, tt, 1.0)
    m_ff = subsonic_mach_for_area_ratio(a_ff / astar_ff)
    rho0 = p0 / (R * t0)
    v0 = mach * np.sqrt(G * R * t0)
    return {
        "mach": mach, "p0_Pa": p0, "t0_K": t0, "throatArea_m2": a_th, "fanFaceArea_m2": a_ff,
        "diffuserLossCoefficient": kd, "deckAirflow_kg_s": mdot_deck, "referenceRecovery": eta_ref,
        "recovery": float(eta), "throatMach": float(m_th), "fanFaceMach": float(m_ff),
        "airflow_kg_s": float(mdot), "streamTubeArea_m2": float(mdot / (rho0 * v0)),
    }


def additive_drag_case(mach, p0, mfr, ac):
    a0 = mfr * ac
    a1 = ac
    pt_ratio = normal_shock_pt_ratio(mach) if mach > 1 else 1.0
    # A* grows by 1/pt_ratio across the shock; station 1 subsonic.
    astar0 = a0 / area_ratio(mach)
    astar1 = astar0 / pt_ratio
    m1 = subsonic_mach_for_area_ratio(a1 / astar1)
    pt0 = p0 / p_over_pt(mach)
    p1 = pt_ratio * pt0 * p_over_pt(m1)
    d = p1 * a1 * (1 + G * m1 * m1) - p0 * a0 * (1 + G * mach * mach) - p0 * (a1 - a0)
    q0 = 0.5 * G * p0 * mach * mach
    return {"mach": mach, "p0_Pa": p0, "massFlowRatio": mfr, "captureArea_m2": ac,
            "drag_N": float(d), "coefficient": float(d / (q0 * ac)), "captureMach": float(m1)}


out = {
    "source": "test/reference/installationReference.py (numpy/scipy, independent forms)",
    "milE5008b": [{"mach": m, "recovery": mil(m)} for m in (1.5, 2.0, 3.0)],
    "geometryInlet": [
        # cruise-like: 11 km ISA, M 0.8
        geometry_case(0.8, 22632.06, 216.65, 2.20, 2.60, 0.10, 170.0, 1.0),
        # climb-like: 5 km ISA, M 0.5
        geometry_case(0.5, 54048.3, 255.65, 2.20, 2.60, 0.10, 250.0, 1.0),
        # supersonic with MIL-E-5008B reference: 11 km, M 1.6
        geometry_case(1.6, 22632.06, 216.65, 0.50, 0.65, 0.05, 70.0, mil(1.6)),
        # different loss, constant reference recovery 0.98
        geometry_case(0.78, 23842.3, 218.65, 1.40, 1.90, 0.25, 100.0, 0.98),
    ],
    "additiveDrag": [
        additive_drag_case(0.8, 22632.06, 0.7, 2.0),
        additive_drag_case(0.8, 22632.06, 0.9, 2.0),
        additive_drag_case(0.5, 54048.3, 0.5, 1.5),
        additive_drag_case(0.3, 101325.0, 0.8, 2.0),
        additive_drag_case(1.6, 22632.06, 0.8, 0.5),
        additive_drag_case(2.0, 22632.06, 0.6, 0.5),
    ],
}
print(json.dumps(out, indent=2))
