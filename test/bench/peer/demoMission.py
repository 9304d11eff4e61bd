#!/usr/bin/env python3
"""
The demo mission scripted the way a performance engineer would do it WITHOUT
Blockwise: numpy + scipy, reading the same files Blockwise reads
(fixtures/demo/demo.blockwise.json and the deck CSV it names), and printing
block fuel, trip fuel, times and its own wall time as JSON.

It shares no code with Blockwise. What it models (and where it simplifies) is
written down in docs/benchmarks.md ("The Python peer"); in short:

* ISA (troposphere and lower stratosphere, ISA deviation 0 only), compressible
  CAS/Mach (NACA Report 1135), gamma 1.4.
* Deck: the CSV is ragged (each altitude tabulates its own Mach range, every
  node the same power points), so there is one scipy RegularGridInterpolator
  over (Mach, power) per tabulated altitude (linear, extrapolating in Mach),
  and linear interpolation between the two altitudes around the query.
* Installation per engine: recovery table vs Mach (np.interp, ends held);
  Raymer's ram-recovery correction C_ram (eta_ref - eta) with C_ram = 1.35
  and eta_ref = 1 (MIL-E-5008B, subsonic); bleed loss C_bleed x fraction with
  C_bleed = 2; shaft power extraction as fuel at 0.35 x 43 MJ/kg; airflow
  scaled by eta / eta_ref; spillage = (1 - lip suction) x 1-D additive drag
  (momentum balance on the capture stream tube, NACA Report 1187 form).
* Airframe: CD = CD0(M) + dCD0(inlet external drag area x 2 / S)
  + K (CL - CLmd)^2 + Korn/Lock wave drag; OEW + inlet weight x 2.
* Legs: taxi at idle fuel flow; fixed take-off/approach fuel; climb and
  descent by the energy method with the energy share factor on a CAS/Mach
  schedule with a level speed change at the 10,000 ft limit; cruise at
  thrust = drag with step climbs when the next level has the better specific
  range and 300 ft/min of residual climb; reserves per ICAO Annex 6 (5 %
  contingency, alternate climb/cruise/descent, 30 min hold at 1,500 ft at
  minimum-drag speed).
* Integration: scipy solve_ivp (RK45, rtol 1e-7) with terminal events for
  altitude, speed, distance, time and the step-climb condition.
* Fuel iteration: scipy brentq on the ramp mass so the aircraft lands with
  exactly the reserve on board (taxi-in fuel is burned after landing); the
  cruise distance is set each pass so the trip's still-air distance equals
  the range.

Usage: python3 demoMission.py [project.json] [--repeat N] [--rtol R]
(--rtol sets solve_ivp's relative tolerance, default 1e-7; the bench loosens it
until block fuel leaves 0.01 % of the tight answer, to time the peer at equal accuracy.)
Prints one JSON object on stdout.
"""
import json
import math
import os
import sys
import time

import numpy as np
from scipy.integrate import solve_ivp
from scipy.interpolate import RegularGridInterpolator
from scipy.optimize import brentq, minimize_scalar

# ---------------------------------------------------------------- constants
G0 = 9.80665
R = 287.05287
GAMMA = 1.4
P0 = 101325.0
T0 = 288.15
A0 = math.sqrt(GAMMA * R * T0)
FT = 0.3048
LB = 0.45359237
KT = 1852.0 / 3600.0

# ---------------------------------------------------------------- units
UNITS = {
    # unit: (factor to SI, offset)
    'm': 1.0, 'ft': FT, 'km': 1000.0, 'nmi': 1852.0,
    'kg': 1.0, 'lb': LB, 't': 1000.0,
    'm2': 1.0, 'ft2': FT * FT,
    'm/s': 1.0, 'kt': KT, 'ft/min': FT / 60.0,
    's': 1.0, 'min': 60.0, 'h': 3600.0,
    'K': 1.0, 'deg': math.pi / 180.0, 'rad': 1.0,
    '%': 0.01, '-': 1.0,
    'W': 1.0, 'kW': 1000.0,
    'N': 1.0, 'lbf': LB * G0, 'kN': 1000.0,
    'kg/s': 1.0, 'lb/h': LB / 3600.0, 'lb/s': LB, 'kg/h': 1.0 / 3600.0,
}


def si(value):
    """'35000 ft' -> 10668.0; a bare number is already SI."""
    if isinstance(value, (int, float)):
        return float(value)
    text = value.strip()
    number, _, unit = text.partition(' ')
    unit = unit.strip() or '-'
    if unit not in UNITS:
        raise ValueError(f'unknown unit {unit!r} in {value!r}')
    return float(number) * UNITS[unit]


# ---------------------------------------------------------------- atmosphere (ISA)
def isa(h):
    """Temperature (K), pressure (Pa), lapse (K/m) at pressure altitude h (m), up to 20 km."""
    if h <= 11000.0:
        t = T0 - 0.0065 * h
        return t, P0 * (t / T0) ** (G0 / (0.0065 * R)), -0.0065
    t11 = T0 - 0.0065 * 11000.0
    p11 = P0 * (t11 / T0) ** (G0 / (0.0065 * R))
    return t11, p11 * math.exp(-G0 * (h - 11000.0) / (R * t11)), 0.0


def altitude_of_pressure(p):
    t11 = T0 - 0.0065 * 11000.0
    p11 = P0 * (t11 / T0) ** (G0 / (0.0065 * R))
    if p >= p11:
        return (T0 / 0.0065) * (1.0 - (p / P0) ** (0.0065 * R / G0))
    return 11000.0 - R * t11 / G0 * math.log(p / p11)


def cas_of_mach(mach, p):
    qc = p * ((1.0 + 0.2 * mach * mach) ** 3.5 - 1.0)
    return A0 * math.sqrt(5.0 * ((qc / P0 + 1.0) ** (2.0 / 7.0) - 1.0))


def mach_of_cas(cas, p):
    qc = P0 * ((1.0 + 0.2 * (cas / A0) ** 2) ** 3.5 - 1.0)
    return math.sqrt(5.0 * ((qc / p + 1.0) ** (2.0 / 7.0) - 1.0))


def transition_altitude(cas, mach):
    qc = P0 * ((1.0 + 0.2 * (cas / A0) ** 2) ** 3.5 - 1.0)
    return altitude_of_pressure(qc / ((1.0 + 0.2 * mach * mach) ** 3.5 - 1.0))


# ---------------------------------------------------------------- deck
def read_deck(path):
    header = None
    meta = {}
    rows = []
    with open(path) as f:
        for line in f:
            s = line.strip()
            if not s:
                continue
            if s.startswith('#'):
                key, sep, val = s.lstrip('#').partition(':')
                if sep:
                    meta[key.strip()] = val.strip()
                continue
            if header is None:
                header = [c.strip() for c in s.split(',')]
                continue
            rows.append([float(c) for c in s.split(',')])
    data = np.array(rows)
    cols = {}
    for i, h in enumerate(header):
        name, unit = h.rstrip(']').split('[')
        cols[name] = data[:, i] * UNITS[unit]
    ratings = {k.split()[1]: float(v) for k, v in meta.items() if k.startswith('rating ')}
    return cols, ratings


class Deck:
    """Per-altitude RegularGridInterpolator over (Mach, power); linear in altitude."""

    def __init__(self, cols):
        alt = cols['altitude']
        self.altitudes = np.unique(alt)
        self.powers = np.unique(cols['power'])
        self.tables = []
        for a in self.altitudes:
            sel = alt == a
            machs = np.unique(cols['mach'][sel])
            values = np.zeros((len(machs), len(self.powers), 3))
            for i, m in enumerate(machs):
                node = sel & (cols['mach'] == m)
                order = np.argsort(cols['power'][node])
                values[i, :, 0] = cols['thrust'][node][order]
                values[i, :, 1] = cols['fuel_flow'][node][order]
                values[i, :, 2] = cols['airflow'][node][order]
            self.tables.append(RegularGridInterpolator((machs, self.powers), values, bounds_error=False, fill_value=None))

    def curves(self, h, mach):
        """Thrust, fuel flow, airflow (per engine, SI) at every tabulated power, at altitude h and Mach."""
        j = int(np.clip(np.searchsorted(self.altitudes, h) - 1, 0, len(self.altitudes) - 2))
        a0, a1 = self.altitudes[j], self.altitudes[j + 1]
        w = (h - a0) / (a1 - a0)
        pts = np.column_stack((np.full(len(self.powers), mach), self.powers))
        v0 = self.tables[j](pts)
        v1 = self.tables[j + 1](pts)
        return (1.0 - w) * v0 + w * v1


# ---------------------------------------------------------------- inlet spillage (1-D)
def mass_flow_function(m):
    return m / (1.0 + 0.2 * m * m) ** 3


def additive_drag(mach, p, mfr, capture):
    """Additive drag (N) of a subsonic inlet spilling to mass-flow ratio mfr (1-D momentum, NACA Report 1187)."""
    if mach <= 0.0 or mfr >= 1.0:
        return 0.0
    f1 = min(mfr * mass_flow_function(mach), 1.0 / 1.2 ** 3)
    m1 = brentq(lambda m: mass_flow_function(m) - f1, 0.0, 1.0, xtol=1e-14)
    p1 = (1.0 + 0.2 * mach * mach) ** 3.5 / (1.0 + 0.2 * m1 * m1) ** 3.5
    return max(0.0, p1 * (1.0 + GAMMA * m1 * m1) - mfr * (1.0 + GAMMA * mach * mach) - (1.0 - mfr)) * p * capture


# ---------------------------------------------------------------- the aircraft
class Aircraft:
    def __init__(self, project, deck, ratings):
        af = project['airframe']
        w = af['weights']
        inlet = next(i for i in project['inlets'] if i['name'] == project['activeInlet'])
        eng = project['engine']
        self.n = eng['count']
        self.oew = si(w['operatingEmpty']) + self.n * si(inlet['weight'])
        self.mtow = si(w['maxTakeoff'])
        self.S = si(af['wingArea'])
        self.vmo = si(af['vmo'])
        self.mmo = si(af['mmo'])
        pol = project['polar']
        self.cd0_m = np.array([r['mach'] for r in pol['cd0']])
        self.cd0_v = np.array([r['cd0'] for r in pol['cd0']])
        self.dcd0 = pol['cdIncrement'] + self.n * si(inlet['externalDragArea']) / self.S
        ind = pol['induced']
        self.k = 1.0 / (math.pi * ind['oswaldEfficiency'] * ind['aspectRatio'])
        self.clmd = pol['clMinDrag']
        c = pol['compressibility']
        self.sweep = si(c['sweep'])
        self.tc = c['thicknessRatio']
        self.ka = c['kornTechnologyFactor']
        src = inlet['source']
        self.rec_m = np.array([r['mach'] for r in src['rows']])
        self.rec_v = np.array([r['recovery'] for r in src['rows']])
        self.capture = si(src['captureArea'])
        self.lip = inlet['lipSuctionFactor']
        inst = eng['installation']
        self.bleed = si(inst['bleed']['fraction'])
        self.extraction_fuel = si(inst['powerExtraction']) / (0.35 * 43e6)
        self.deck = deck
        self.ratings = ratings
        self.min_rate = si(project['cautions']['minResidualClimbRate'])

    # -- aerodynamics
    def drag(self, h, mach, m):
        t, p, _ = isa(h)
        qs = 0.5 * GAMMA * p * mach * mach * self.S
        cl = m * G0 / qs
        cs = math.cos(self.sweep)
        mcrit = self.ka / cs - self.tc / cs ** 2 - abs(cl) / (10.0 * cs ** 3) - (0.1 / 80.0) ** (1.0 / 3.0)
        cdw = 20.0 * (mach - mcrit) ** 4 if mach > mcrit else 0.0
        cd = np.interp(mach, self.cd0_m, self.cd0_v) + self.dcd0 + self.k * (cl - self.clmd) ** 2 + cdw
        return qs * cd

    # -- installed engines (all engines)
    def _installed(self, h, mach):
        """Functions of power: installed thrust and fuel flow, all engines, at (h, Mach)."""
        t, p, _ = isa(h)
        curves = self.deck.curves(h, mach)
        powers = self.deck.powers
        eta = float(np.interp(mach, self.rec_m, self.rec_v))
        factor = 1.0 - 1.35 * (1.0 - eta) - 2.0 * self.bleed
        rho_v = p / (R * t) * mach * math.sqrt(GAMMA * R * t)

        def thrust(power):
            deck_t = np.interp(power, powers, curves[:, 0])
            spill = 0.0
            if mach > 0.0:
                airflow = np.interp(power, powers, curves[:, 2]) * eta
                spill = (1.0 - self.lip) * additive_drag(mach, p, airflow / rho_v / self.capture, self.capture)
            return self.n * (deck_t * factor - spill)

        def fuel(power):
            return self.n * (np.interp(power, powers, curves[:, 1]) + self.extraction_fuel)

        return thrust, fuel

    def at_rating(self, h, mach, rating):
        thrust, fuel = self._installed(h, mach)
        pw = self.ratings[rating]
        return thrust(pw), fuel(pw)

    def fuel_for_thrust(self, h, mach, required, ceiling='maxCruise'):
        """Fuel flow (kg/s) giving installed thrust = required, and the thrust available at the ceiling rating."""
        thrust, fuel = self._installed(h, mach)
        lo, hi = self.ratings['flightIdle'], self.ratings[ceiling]
        t_hi = thrust(hi)
        if t_hi <= required:
            return fuel(hi), t_hi
        if thrust(lo) >= required:
            return fuel(lo), t_hi
        pw = brentq(lambda x: thrust(x) - required, lo, hi, xtol=1e-12)
        return fuel(pw), t_hi

    def specific_range(self, h, mach, m):
        t, _, _ = isa(h)
        d = self.drag(h, mach, m)
        ff, avail = self.fuel_for_thrust(h, mach, d)
        return 0.0 if avail < d else mach * math.sqrt(GAMMA * R * t) / ff


def share_factor(held, mach, lapse):
    inv = 1.0 + GAMMA * R * lapse / (2.0 * G0) * mach * mach
    if held == 'cas':
        b = 1.0 + 0.2 * mach * mach
        inv += b ** -2.5 * (b ** 3.5 - 1.0)
    return 1.0 / inv


# ---------------------------------------------------------------- legs
# State y = [time (s), distance (m), altitude (m), mass (kg)]; TAS is carried beside it.
RTOL = 1e-7


class Flight:
    def __init__(self, ac):
        self.ac = ac

    def climb_segment(self, y0, held, value, to_h, rating='maxClimb', up=True):
        ac = self.ac

        def rhs(_t, y):
            h, m = y[2], y[3]
            t, p, lapse = isa(h)
            mach = value if held == 'mach' else mach_of_cas(value, p)
            v = mach * math.sqrt(GAMMA * R * t)
            d = ac.drag(h, mach, m)
            thr, ff = ac.at_rating(h, mach, rating)
            rate = (thr - d) * v * share_factor(held, mach, lapse) / (m * G0)
            return [1.0, math.sqrt(max(v * v - rate * rate, 0.0)), rate, -ff]

        def reached(_t, y):
            return y[2] - to_h

        reached.terminal = True
        sol = solve_ivp(rhs, (y0[0], y0[0] + 4 * 3600), y0, rtol=RTOL, atol=[1e-3, 1e-2, 1e-3, 1e-4], events=reached)
        if sol.status != 1:
            raise RuntimeError(f'{"climb" if up else "descent"} to {to_h:.0f} m not reached')
        y = sol.y_events[0][0].copy()
        y[2] = to_h
        t, p, _ = isa(to_h)
        mach = value if held == 'mach' else mach_of_cas(value, p)
        return y, mach * math.sqrt(GAMMA * R * t)

    def speed_change(self, y0, v0, to_mach, rating):
        ac = self.ac
        h = y0[2]
        a = math.sqrt(GAMMA * R * isa(h)[0])
        v_target = to_mach * a

        def rhs(_t, z):
            m, v = z[3], z[4]
            thr, ff = ac.at_rating(h, v / a, rating)
            return [1.0, v, 0.0, -ff, (thr - ac.drag(h, v / a, m)) / m]

        def reached(_t, z):
            return z[4] - v_target

        reached.terminal = True
        sol = solve_ivp(rhs, (y0[0], y0[0] + 3600), list(y0) + [v0], rtol=RTOL, events=reached)
        z = sol.y_events[0][0]
        return z[:4].copy(), v_target

    def schedule_phases(self, sched, h_from, h_to):
        low_cas, limit, cas, mach = sched
        cuts = {h_from, h_to}
        lo, hi = min(h_from, h_to), max(h_from, h_to)
        lt, ht = transition_altitude(low_cas, mach), transition_altitude(cas, mach)
        for c in (limit, 11000.0, lt if lt < limit else None, ht if ht >= limit else None):
            if c is not None and lo < c < hi:
                cuts.add(c)
        pts = sorted(cuts, reverse=bool(h_to < h_from))
        phases = []
        for i in range(len(pts) - 1):
            a, b = pts[i], pts[i + 1]
            mid = 0.5 * (a + b)
            zone_cas = low_cas if mid < limit else cas
            held = 'mach' if mid >= transition_altitude(zone_cas, mach) else 'cas'
            if i > 0 and a == limit:
                phases.append(('speed', a))
            phases.append((held, mach if held == 'mach' else zone_cas, b))
        return phases

    def climb(self, y, v, sched, to_h):
        for ph in self.schedule_phases(sched, y[2], to_h):
            if ph[0] == 'speed':
                p = isa(y[2])[1]
                y, v = self.speed_change(y, v, min(mach_of_cas(sched[2], p), sched[3]), 'maxClimb')
            else:
                y, v = self.climb_segment(y, ph[0], ph[1], ph[2])
        return y, v

    def descent(self, y, v, sched, to_h):
        for ph in self.schedule_phases(sched, y[2], to_h):
            if ph[0] == 'speed':
                p = isa(y[2])[1]
                y, v = self.speed_change(y, v, min(mach_of_cas(sched[0], p), sched[3]), 'flightIdle')
            else:
                y, v = self.climb_segment(y, ph[0], ph[1], ph[2], rating='flightIdle', up=False)
        return y, v

    def level(self, y0, mach, end_x=None, end_t=None, extra_event=None, ceiling='maxCruise', mach_of_mass=None):
        ac = self.ac
        h = y0[2]
        a = math.sqrt(GAMMA * R * isa(h)[0])

        def rhs(_t, y):
            mm = mach if mach_of_mass is None else mach_of_mass(y[3])
            ff, _ = ac.fuel_for_thrust(h, mm, ac.drag(h, mm, y[3]), ceiling)
            return [1.0, mm * a, 0.0, -ff]

        events = []
        if end_x is not None:
            def dist(_t, y):
                return y[1] - end_x
            dist.terminal = True
            events.append(dist)
        if end_t is not None:
            def tim(_t, y):
                return y[0] - end_t
            tim.terminal = True
            events.append(tim)
        if extra_event is not None:
            extra_event.terminal = True
            extra_event.direction = 1
            events.append(extra_event)
        sol = solve_ivp(rhs, (y0[0], y0[0] + 20 * 3600), y0, rtol=RTOL, atol=[1e-3, 1e-2, 1e-3, 1e-4], events=events)
        for i, ev in enumerate(sol.t_events):
            if len(ev):
                y = sol.y_events[i][0].copy()
                return y, events[i]
        raise RuntimeError('level flight did not end')

    def cruise(self, y, mach, h, step, max_h, end_x):
        ac = self.ac
        y = y.copy()
        y[2] = h
        while True:
            h = y[2]
            step_event = None
            if step > 0 and h + step <= max_h + 1e-6:
                up = h + step

                def step_event(_t, yy, h=h, up=up):
                    m = yy[3]
                    sr_now = ac.specific_range(h, mach, m)
                    sr_up = ac.specific_range(up, mach, m)
                    t, p, lapse = isa(up)
                    v = mach * math.sqrt(GAMMA * R * t)
                    thr, _ = ac.at_rating(up, mach, 'maxClimb')
                    rate = (thr - ac.drag(up, mach, m)) * v * share_factor('mach', mach, lapse) / (m * G0)
                    return min((sr_up - sr_now) / sr_now, (rate - ac.min_rate) / ac.min_rate)
            if step_event is not None and step_event(0.0, y) > 0:
                # The step already pays at the start of this level (solve_ivp's
                # events only see sign changes): climb now.
                y, _ = self.climb_segment(y, 'mach', mach, h + step)
                if y[1] >= end_x:
                    return y
                continue
            y, ev = self.level(y, mach, end_x=end_x, extra_event=step_event)
            if ev is not step_event:
                y[1] = end_x
                return y
            y, _ = self.climb_segment(y, 'mach', mach, h + step)
            if y[1] >= end_x:
                return y

    def hold(self, y0, h, duration):
        ac = self.ac
        m0 = y0[3]
        p = isa(h)[1]
        top = min(ac.mmo, mach_of_cas(ac.vmo, p))
        m_md = minimize_scalar(lambda mm: ac.drag(h, mm, m0), bounds=(0.15, top), method='bounded', options={'xatol': 1e-6}).x
        y = y0.copy()
        y[2] = h
        y, _ = self.level(y, None, end_t=y0[0] + duration, ceiling='maxContinuous', mach_of_mass=lambda m: m_md * math.sqrt(m / m0))
        return y


# ---------------------------------------------------------------- the mission
class DemoMission:
    def __init__(self, project_path):
        with open(project_path) as f:
            self.project = json.load(f)
        pr = self.project
        deck_path = os.path.join(os.path.dirname(project_path), pr['engine']['deck']['path'])
        cols, ratings = read_deck(deck_path)
        self.ac = Aircraft(pr, Deck(cols), ratings)
        self.flight = Flight(self.ac)
        legs = {leg['kind']: leg for leg in pr['mission']['legs']}
        self.legs = legs

        def sched(s):
            return (si(s['lowCas']), si(s['lowAltitudeLimit']), si(s['cas']), float(s['mach']))

        self.climb_sched = sched(legs['climb']['schedule'])
        self.climb_to = si(legs['climb']['toAltitude'])
        cr = legs['cruise']
        self.cruise_h = si(cr['altitude'])
        self.cruise_mach = cr['speed']['mach']
        self.step = si(cr['profile']['step'])
        self.max_h = si(cr['profile']['maxAltitude'])
        self.descent_sched = sched(legs['descent']['schedule'])
        self.descent_to = si(legs['descent']['toAltitude'])
        rs = pr['mission']['reserves']
        self.contingency = si(rs['contingencyFraction'])
        self.min_contingency_s = si(rs['minContingencyTime'])
        alt = rs['alternate']
        self.alt_distance = si(alt['distance'])
        self.alt_h = si(alt['cruiseAltitude'])
        self.alt_mach = float(alt['cruiseMach'])
        self.alt_elev = si(alt['elevation'])
        self.final_s = si(rs['finalReserveTime'])
        solve = pr['mission']['solve']
        self.payload = si(solve['payload'])
        self.range = si(solve['range'])
        self.zfw = self.ac.oew + self.payload
        mission = pr['mission']
        self.dest_elev = si(mission.get('destinationElevation', 0))
        if si(mission.get('isaDeviation', 0)) != 0 or si(mission.get('wind', 0)) != 0:
            raise ValueError('this script models ISA and still air only (mission.isaDeviation and mission.wind must be 0)')
        if rs['preset'] != 'icaoAnnex6' or solve['mode'] != 'payloadRange':
            raise ValueError('this script flies ICAO Annex 6 reserves in payload-and-range mode only')
        self.descent_guess = 140e3
        self.last = None

    def idle_fuel_flow(self, h):
        return self.ac.at_rating(h, 0.0, 'flightIdle')[1]

    def trip(self, ramp):
        lg = self.legs
        taxi_out = self.idle_fuel_flow(0.0) * si(lg['taxiOut']['time'])
        y = np.array([si(lg['taxiOut']['time']), 0.0, 0.0, ramp - taxi_out])
        tow = y[3]
        y[0] += si(lg['takeoff']['time'])
        y[3] -= si(lg['takeoff']['fuel'])
        y, v = self.flight.climb(y, 0.0, self.climb_sched, self.climb_to)
        climbed = y.copy()
        for _ in range(4):
            end_x = self.range - self.descent_guess
            top = self.flight.cruise(climbed, self.cruise_mach, self.cruise_h, self.step, self.max_h, end_x)
            a = math.sqrt(GAMMA * R * isa(top[2])[0])
            end, _ = self.flight.descent(top, self.cruise_mach * a, self.descent_sched, self.descent_to)
            descent_x = end[1] - top[1]
            if abs(end[1] - self.range) <= 1.0:
                break
            self.descent_guess = descent_x
        y = end.copy()
        y[0] += si(lg['approach']['time'])
        y[3] -= si(lg['approach']['fuel'])
        y[2] = self.dest_elev  # the approach allowance ends on the destination runway
        landing = y.copy()
        taxi_in = self.idle_fuel_flow(landing[2]) * si(lg['taxiIn']['time'])
        block_in = landing.copy()
        block_in[0] += si(lg['taxiIn']['time'])
        block_in[3] -= taxi_in
        return tow, landing, block_in

    def reserves(self, tow, landing):
        f = self.flight
        trip_fuel = tow - landing[3]
        hold_h = landing[2] + 1500 * FT
        five = landing.copy()
        five = f.hold(five, hold_h, self.min_contingency_s)
        contingency = max(self.contingency * trip_fuel, landing[3] - five[3])
        y = landing.copy()
        y[1] = 0.0
        y[3] -= contingency
        start_mass = y[3]
        # Alternate: climb, cruise, descent to 1,500 ft above the alternate.
        hold_alt = self.alt_elev + 1500 * FT
        top, v = f.climb(y, 0.0, self.climb_sched, self.alt_h)
        trial, _ = f.descent(top, v, self.descent_sched, hold_alt)
        descent_x = trial[1] - top[1]
        for _ in range(4):
            # Cruise to the top of descent, descend; fly again until the alternate's distance is met within 1 m.
            tod, _ = f.level(top, self.alt_mach, end_x=self.alt_distance - descent_x)
            a = math.sqrt(GAMMA * R * isa(tod[2])[0])
            end, _ = f.descent(tod, self.alt_mach * a, self.descent_sched, hold_alt)
            if abs(end[1] - self.alt_distance) <= 1.0:
                break
            descent_x = end[1] - tod[1]
        alternate = start_mass - end[3]
        final = f.hold(end, hold_alt, self.final_s)
        final_fuel = end[3] - final[3]
        return contingency + alternate + final_fuel

    def residual(self, ramp):
        tow, landing, block_in = self.trip(ramp)
        reserve = self.reserves(tow, landing)
        self.last = (ramp, tow, landing, block_in, reserve)
        # Land with exactly the reserve on board; taxi-in fuel is burned after landing, on top of it.
        return landing[3] - self.zfw - reserve

    def solve(self):
        guess = self.zfw * 1.6
        ramp = brentq(self.residual, guess - 1500.0, guess + 1500.0, xtol=0.01)
        self.residual(ramp)
        ramp, tow, landing, block_in, reserve = self.last
        return {
            'blockFuel_kg': ramp - block_in[3],
            'tripFuel_kg': tow - landing[3],
            'blockTime_s': block_in[0],
            'tripTime_s': landing[0] - si(self.legs['taxiOut']['time']),
            'reserveFuel_kg': reserve,
            'rampMass_kg': ramp,
            'landingMass_kg': landing[3],
        }


def main(argv):
    global RTOL
    here = os.path.dirname(os.path.abspath(__file__))
    project = os.path.join(here, '..', '..', '..', 'fixtures', 'demo', 'demo.blockwise.json')
    repeat = 1
    args = list(argv)
    while args:
        a = args.pop(0)
        if a == '--repeat':
            repeat = int(args.pop(0))
        elif a == '--rtol':
            RTOL = float(args.pop(0))
        else:
            project = a
    times = []
    result = None
    for _ in range(repeat):
        t0 = time.perf_counter()
        result = DemoMission(project).solve()
        times.append(time.perf_counter() - t0)
    result['repeat'] = repeat
    result['rtol'] = RTOL
    result['missionWall_s'] = times
    result['medianMission_s'] = float(np.median(times))
    print(json.dumps(result))


if __name__ == '__main__':
    main(sys.argv[1:])
