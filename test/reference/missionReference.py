#!/usr/bin/env python3
"""Independent reference for the Blockwise mission solver (engine/mission).

Flies the demo-like mission of test/engine/mission/support/missionFixtures.ts
with the same analytic models (parabolic polar, constant-TSFC engines with a
density thrust lapse) using scipy.integrate.solve_ivp (DOP853, rtol 1e-11)
with terminal events. It shares no code with the TypeScript solver and, unlike
it, does NOT use the closed-form energy share factor: the energy equation

    (Thr - D) V / (m g0) = dh/dt + (V / g0) dV/dt,   dh/dHp = T / T_isa

is solved for dHp/dt with dV/dHp taken by central finite differences of the
held-speed V(Hp) (CAS via the NACA Report 1135 pitot relation, or Mach).

Also computes analytic references used by the tests:
  * time to climb at constant Mach in the troposphere with constant excess
    thrust and mass (energy method, closed-form integral);
  * time to climb at constant CAS in the troposphere by scipy.integrate.quad.

Run:  python3 test/reference/missionReference.py > test/reference/missionReference.json
The committed JSON is what test/engine/mission/missionReference.test.ts loads.
"""
import json
import math

import numpy as np
from scipy.integrate import quad, solve_ivp
from scipy.optimize import brentq

G0 = 9.80665
R = 287.05287
KAPPA = 1.4
T0 = 288.15
P0 = 101325.0
A0 = math.sqrt(KAPPA * R * T0)
FT = 0.3048
KT = 1852.0 / 3600.0
RHO0 = P0 / (R * T0)


# ---- U.S. Standard Atmosphere 1976, to 20 km -------------------------------
def isa(hp, dev):
    if hp < 11000.0:
        t_isa = T0 - 0.0065 * hp
        p = P0 * (t_isa / T0) ** (G0 / (R * 0.0065))
    else:
        t_isa = 216.65
        p11 = P0 * (216.65 / T0) ** (G0 / (R * 0.0065))
        p = p11 * math.exp(-G0 * (hp - 11000.0) / (R * 216.65))
    t = t_isa + dev
    return t, t_isa, p, p / (R * t), math.sqrt(KAPPA * R * t)


def mach_of_cas(cas, p):
    qc = P0 * ((1 + 0.2 * (cas / A0) ** 2) ** 3.5 - 1)
    return math.sqrt(5 * ((qc / p + 1) ** (2 / 7) - 1))


def transition_altitude(cas, mach):
    qc = P0 * ((1 + 0.2 * (cas / A0) ** 2) ** 3.5 - 1)
    p_t = qc / ((1 + 0.2 * mach * mach) ** 3.5 - 1)
    return brentq(lambda h: isa(h, 0)[2] - p_t, 0.0, 20000.0, xtol=1e-10)


# ---- models (mirror test/engine/mission/support/analyticModels.ts) ---------
CD0, K, S = 0.022, 0.045, 120.0
THRUST0, TSFC, LAPSE = 240000.0, 1.7e-5, 0.75
RATING = {"takeoff": 1.2, "maxClimb": 1.0, "maxCruise": 0.9, "maxContinuous": 0.95, "flightIdle": 0.05}


def drag(hp, mach, m):
    p = isa(hp, 0)[2]
    q = 0.7 * p * mach * mach
    cl = m * G0 / (q * S)
    return q * S * (CD0 + K * cl * cl)


def thrust(hp, dev, rating):
    rho = isa(hp, dev)[3]
    return THRUST0 * RATING[rating] * (rho / RHO0) ** LAPSE


# ---- legs -------------------------------------------------------------------
class Flight:
    def __init__(self, mass, dev, wind):
        self.t = 0.0
        self.x = 0.0
        self.xg = 0.0
        self.h = 0.0
        self.m = mass
        self.dev = dev
        self.wind = wind
        self.rows = []

    def row(self, name):
        self.rows.append({"name": name, "time_s": self.t, "distance_m": self.x, "mass_kg": self.m, "altitude_m": self.h})


def held_speed(held, value, hp, dev):
    t, _, p, _, a = isa(hp, dev)
    mach = value if held == "mach" else mach_of_cas(value, p)
    return mach, mach * a


def dv_dhp(held, value, hp, dev, lo, hi):
    d = 0.5
    a, b = hp - d, hp + d
    if a < lo:
        a, b = hp, hp + 2 * d
    if b > hi:
        a, b = hp - 2 * d, hp
    return (held_speed(held, value, b, dev)[1] - held_speed(held, value, a, dev)[1]) / (b - a)


def fly_vertical(f, held, value, target, thrust_of):
    """Climb/descent holding CAS or Mach from f.h to target; thrust_of(hp, mach) gives thrust."""
    lo, hi = min(f.h, target), max(f.h, target)

    def rhs(_t, y):
        x, xg, hp, m = y
        tt, t_isa, _, _, _ = isa(hp, f.dev)
        mach, v = held_speed(held, value, hp, f.dev)
        thr = thrust_of(hp, mach)
        excess = (thr - drag(hp, mach, m)) * v / (m * G0)
        hp_dot = excess / (tt / t_isa + (v / G0) * dv_dhp(held, value, hp, f.dev, lo, hi))
        h_dot = hp_dot * tt / t_isa
        horiz = math.sqrt(max(v * v - h_dot * h_dot, 0.0))
        return [horiz, horiz + f.wind, hp_dot, -TSFC * thr]

    ev = lambda _t, y: y[2] - target
    ev.terminal = True
    sol = solve_ivp(rhs, (f.t, f.t + 1e6), [f.x, f.xg, f.h, f.m], method="DOP853", rtol=1e-11, atol=1e-9, events=ev)
    f.t = sol.t_events[0][0]
    f.x, f.xg, f.h, f.m = sol.y_events[0][0]
    f.h = target


def fly_speed_change(f, to_mach, rating):
    a = isa(f.h, f.dev)[4]
    v_from = f.v
    v_to = to_mach * a
    sign = 1.0 if v_to > v_from else -1.0

    def rhs(_t, y):
        x, xg, v, m = y
        mach = v / a
        thr = thrust(f.h, f.dev, rating)
        return [v, v + f.wind, (thr - drag(f.h, mach, m)) / m, -TSFC * thr]

    ev = lambda _t, y: sign * (y[2] - v_to)
    ev.terminal = True
    sol = solve_ivp(rhs, (f.t, f.t + 1e5), [f.x, f.xg, v_from, f.m], method="DOP853", rtol=1e-11, atol=1e-9, events=ev)
    f.t = sol.t_events[0][0]
    f.x, f.xg, _, f.m = sol.y_events[0][0]


def fly_schedule(f, target, low_cas, limit, cas, mach, rating_thrust):
    """Phases of the schedule from f.h to target, with the speed change at the limit."""
    up = target > f.h
    t_low = transition_altitude(low_cas, mach)
    t_high = transition_altitude(cas, mach)
    cuts = {f.h, target}
    for c in (limit, 11000.0, t_low, t_high):
        if min(f.h, target) < c < max(f.h, target):
            cuts.add(c)
    pts = sorted(cuts, reverse=not up)
    prev_zone_cas = None
    for a, b in zip(pts[:-1], pts[1:]):
        mid = 0.5 * (a + b)
        zone_cas = low_cas if mid < limit else cas
        trans = t_low if mid < limit else t_high
        held = "mach" if mid >= trans else "cas"
        value = mach if held == "mach" else zone_cas
        if prev_zone_cas is not None and zone_cas != prev_zone_cas:
            p = isa(a, 0)[2]
            f.v = min(mach_of_cas(prev_zone_cas, p), mach) * isa(a, f.dev)[4]
            to_mach = min(mach_of_cas(zone_cas, p), mach)
            fly_speed_change(f, to_mach, "maxClimb" if up else "flightIdle")
        fly_vertical(f, held, value, b, rating_thrust)
        prev_zone_cas = zone_cas


def fly_cruise(f, mach, distance):
    a = isa(f.h, f.dev)[4]
    v = mach * a
    end = f.x + distance

    def rhs(_t, y):
        return [v, v + f.wind, -TSFC * drag(f.h, mach, y[2])]

    ev = lambda _t, y: y[0] - end
    ev.terminal = True
    sol = solve_ivp(rhs, (f.t, f.t + 1e6), [f.x, f.xg, f.m], method="DOP853", rtol=1e-12, atol=1e-9, events=ev)
    f.t = sol.t_events[0][0]
    f.x, f.xg, f.m = sol.y_events[0][0]


def allowance(f, seconds, ff):
    f.t += seconds
    f.m -= ff * seconds


def demo_mission(tow, cruise_distance, dev, wind, elevation=0.0):
    low_cas, limit, cas, mach = 250 * KT, 10000 * FT, 290 * KT, 0.78
    taxi_ff = TSFC * thrust(0.0, dev, "flightIdle")
    f = Flight(tow + 600 * taxi_ff, dev, wind)
    allowance(f, 600, taxi_ff)
    f.row("taxi out")
    allowance(f, 60, TSFC * thrust(0.0, dev, "takeoff"))
    f.row("take-off")
    fly_schedule(f, 35000 * FT, low_cas, limit, cas, mach, lambda hp, m: thrust(hp, dev, "maxClimb"))
    f.row("climb")
    fly_cruise(f, mach, cruise_distance)
    f.row("cruise")
    f.v = mach * isa(f.h, dev)[4]
    fly_schedule(f, 1500 * FT, low_cas, limit, cas, mach, lambda hp, m: thrust(hp, dev, "flightIdle"))
    f.row("descent")
    # Approach: flightIdle fuel flow at the middle altitude while the altitude falls to the destination elevation.
    allowance(f, 300, TSFC * thrust(0.5 * (f.h + elevation), dev, "flightIdle"))
    f.h = elevation
    f.row("approach")
    allowance(f, 300, TSFC * thrust(elevation, dev, "flightIdle"))
    f.row("taxi in")
    ramp = tow + 600 * taxi_ff
    return {
        "takeoffMass_kg": tow,
        "cruiseDistance_m": cruise_distance,
        "isaDev_K": dev,
        "wind_m_s": wind,
        "destinationElevation_m": elevation,
        "rampMass_kg": ramp,
        "blockFuel_kg": ramp - f.m,
        "blockTime_s": f.t,
        "airDistance_m": f.x,
        "groundDistance_m": f.xg,
        "legs": f.rows,
    }


# ---- analytic climb references ----------------------------------------------
def constant_mach_troposphere(mach, h0, h1, excess_thrust, mass):
    """t = integral dh / (Ps f), Ps = (Thr - D) M a(h) / (m g), f = [1 + kappa R beta M^2 / (2 g)]^-1 (ISA)."""
    beta = -0.0065
    f = 1.0 / (1.0 + KAPPA * R * beta * mach * mach / (2 * G0))
    c = excess_thrust * mach * math.sqrt(KAPPA * R) / (mass * G0)
    # integral of dh / sqrt(T0 + beta h) = (2 / beta) [sqrt(T(h1)) - sqrt(T(h0))]
    integral = (2.0 / beta) * (math.sqrt(T0 + beta * h1) - math.sqrt(T0 + beta * h0))
    return integral / (c * f)


def constant_cas_troposphere(cas, h0, h1, excess_thrust, mass):
    """Quadrature with dV/dHp by finite differences (no closed-form factor)."""

    def dt_dh(hp):
        t, t_isa, p, _, a = isa(hp, 0)
        mach = mach_of_cas(cas, p)
        v = mach * a
        dv = dv_dhp("cas", cas, hp, 0, h0, h1)
        return (t / t_isa + (v / G0) * dv) / (excess_thrust * v / (mass * G0))

    return quad(dt_dh, h0, h1, epsabs=1e-10, epsrel=1e-12, limit=200)[0]


if __name__ == "__main__":
    out = {
        "source": "test/reference/missionReference.py (scipy solve_ivp DOP853, rtol 1e-11)",
        "demoIsa": demo_mission(70000.0, 2000e3, 0.0, 0.0),
        "demoHotHeadwind": demo_mission(72000.0, 1500e3, 10.0, -20.0),
        "demoElevatedDestination": demo_mission(70000.0, 2000e3, 0.0, 0.0, 300.0),
        "climbConstantMachTroposphere": {
            "mach": 0.6, "from_m": 1000.0, "to_m": 9000.0, "excessThrust_N": 60000.0, "mass_kg": 60000.0,
            "time_s": constant_mach_troposphere(0.6, 1000.0, 9000.0, 60000.0, 60000.0),
        },
        "climbConstantCasTroposphere": {
            "cas_m_s": 280 * KT, "from_m": 1000.0, "to_m": 9000.0, "excessThrust_N": 60000.0, "mass_kg": 60000.0,
            "time_s": constant_cas_troposphere(280 * KT, 1000.0, 9000.0, 60000.0, 60000.0),
        },
    }
    print(json.dumps(out, indent=1))
