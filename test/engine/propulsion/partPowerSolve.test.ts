/**
 * The part-power solve (forThrust) against a brute-force reference: at each
 * condition and thrust the power found is compared with plain bisection on
 * the installed thrust of atPower, run until the bracket is two adjacent
 * doubles (bisection needs no smoothness; it converges to the last bit,
 * common practice). The models spill (installed thrust is not linear in
 * power between the deck's power nodes) and cover both installation
 * methods and both deck interpolations.
 */
import { describe, expect, it } from 'vitest';
import { DEFAULT_CAUTION_SETTINGS } from '../../../engine/cautions/cautionSettings';
import { ok } from '../../../engine/core/result';
import { CURVE_FUEL_FLOW, type DeckAccess } from '../../../engine/propulsion/deckAccess';
import { DEMO_ENGINE_SPEC } from '../../../engine/propulsion/deckDemoSpec';
import type { InletDesign } from '../../../engine/propulsion/inletDesign';
import { ROUNDED_PITOT_LIP_SUCTION } from '../../../engine/propulsion/lipSuction';
import { FOR_THRUST_TOLERANCE, makeInstalledModel } from '../../../engine/propulsion/installedModel';
import { deckAccess } from '../../../engine/propulsion/installedPropulsion';
import { deckForInterpolation } from '../../../engine/propulsion/deckCorrection';
import { buildParametricDeck } from '../../../engine/propulsion/parametricDeck';
import type { InstallationSettings } from '../../../engine/propulsion/installationCorrections';
import type { FlightCondition, PropulsionModel, RatingName } from '../../../engine/propulsion/propulsionModel';
import { expectClose } from '../../support/assertInDelta';
import { LONG_PITOT, TABLE_INLET } from './inletDesigns';
import { syntheticDeck } from './sensitivityDeck';

const SPILLING_TABLE_INLET: InletDesign = { ...TABLE_INLET, name: 'spilling table inlet', source: { ...TABLE_INLET.source, captureArea_m2: 0.9 } as InletDesign['source'], lipSuction: ROUNDED_PITOT_LIP_SUCTION };
const SPILLING_PITOT: InletDesign = { ...LONG_PITOT, name: 'spilling pitot', lipSuction: ROUNDED_PITOT_LIP_SUCTION };

interface Counted {
  readonly access: DeckAccess;
  /** Deck-curve evaluations since the last reset. */
  count(): number;
  reset(): void;
}

/** The deck's access with its curve evaluations counted. */
function counted(access: DeckAccess): Counted {
  let n = 0;
  const curveAt = access.curveAt!;
  return {
    access: {
      ...access,
      curveAt: (condition) => {
        const curve = curveAt(condition);
        return (power, out) => {
          n++;
          return curve(power, out);
        };
      },
    },
    count: () => n,
    reset: () => {
      n = 0;
    },
  };
}

interface Case {
  readonly name: string;
  readonly access: Counted;
  readonly inlet: InletDesign;
  readonly conditions: readonly FlightCondition[];
}

const install = { bleed: { kind: 'coreFraction', fraction: 0.02 }, powerExtraction_W: 60e3 } as const;
const synthetic = syntheticDeck(true);
const parametric = buildParametricDeck(DEMO_ENGINE_SPEC);
const CASES: readonly Case[] = [
  {
    name: 'affine deck with sensitivities, raw, recovery table',
    access: counted(deckAccess(synthetic)),
    inlet: SPILLING_TABLE_INLET,
    conditions: [
      { altitude_m: 300, mach: 0.3, isaDev_K: 0 },
      { altitude_m: 4321, mach: 0.63, isaDev_K: 7 },
      { altitude_m: 10500, mach: 0.8, isaDev_K: -5 },
    ],
  },
  {
    name: 'affine deck with sensitivities, corrected parameters',
    access: counted(deckAccess(deckForInterpolation(synthetic, 'corrected'))),
    inlet: SPILLING_TABLE_INLET,
    conditions: [
      { altitude_m: 2500, mach: 0.45, isaDev_K: 0 },
      { altitude_m: 9000, mach: 0.78, isaDev_K: 12 },
    ],
  },
  {
    name: "parametric deck (Raymer's rule), corrected parameters, geometry inlet",
    access: counted(deckAccess(deckForInterpolation(parametric, 'corrected'))),
    inlet: SPILLING_PITOT,
    conditions: [
      { altitude_m: 1000, mach: 0.35, isaDev_K: 0 },
      { altitude_m: 7000, mach: 0.6, isaDev_K: 10 },
      { altitude_m: 11300, mach: 0.8, isaDev_K: 0 },
      { altitude_m: 12500, mach: 0.72, isaDev_K: -8 },
    ],
  },
];

function modelOf(c: Case): PropulsionModel {
  return makeInstalledModel(c.access.access, { engineCount: 2, inlet: c.inlet, installation: install, cautionSettings: DEFAULT_CAUTION_SETTINGS });
}

/** Bisection on atPower's installed thrust between idle and the ceiling, to adjacent doubles. */
function bisectionPower(m: PropulsionModel, condition: FlightCondition, required_N: number, ceiling: RatingName): number {
  let lo = m.atRating(condition, 'flightIdle').power;
  let hi = m.atRating(condition, ceiling).power;
  for (let i = 0; i < 2000; i++) {
    const mid = 0.5 * (lo + hi);
    if (!(mid > lo && mid < hi)) break;
    if (m.atPower(condition, mid).thrust_N < required_N) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

describe('part-power solve', () => {
  it('forThrust meets the thrust asked for to FOR_THRUST_TOLERANCE on either side, at the power bisection finds', () => {
    let above = 0;
    let below = 0;
    for (const c of CASES) {
      const m = modelOf(c);
      for (const condition of c.conditions) {
        for (const ceiling of ['maxCruise', 'maxClimb'] as const) {
          const idle = m.atRating(condition, 'flightIdle').thrust_N;
          const top = m.atRating(condition, ceiling).thrust_N;
          for (let k = 1; k <= 23; k++) {
            const required = idle + ((top - idle) * k) / 24;
            const p = m.forThrust(condition, required, ceiling);
            const where = `${c.name}, ${condition.altitude_m} m, Mach ${condition.mach}, ${ceiling}, ${k}/24`;
            expect(p.limit, where).toBe('within');
            expectClose(p.thrust_N, required, { rel: FOR_THRUST_TOLERANCE }, where);
            expect(m.atPower(condition, p.power).thrust_N, `${where}: the point is the atPower point`).toBe(p.thrust_N);
            // The RK4 stages' query: the point's fuel flow, to the bit (ISA deviations, corrected parameters, both methods).
            expect(m.fuelFlowForThrust!(condition, required, ceiling), `${where}: fuel flow alone`).toBe(p.fuelFlow_kg_s);
            // dT/dpower is of order T/power here, so the powers agree to a few times the thrust tolerance.
            expectClose(p.power, bisectionPower(m, condition, required, ceiling), { rel: 20 * FOR_THRUST_TOLERANCE }, `${where}: bisection reference`);
            if (p.thrust_N > required) above++;
            if (p.thrust_N < required) below++;
          }
        }
      }
    }
    // Unbiased: the residual falls on both sides (the old Brent stop at 1e-7 fell on one side).
    expect(above).toBeGreaterThan(10);
    expect(below).toBeGreaterThan(10);
  });

  it("forThrust's point is atPower's point at its power, field for field, inside and off the table", () => {
    // The point is built from the solve's last curve evaluation when it was at the root inside the table, else from a
    // full lookup; both must be the full lookup's point to the bit (cautions, breakdown, outside list), so the
    // reference is atPower at the power found (the model's own full evaluation). Off the table (the synthetic deck's
    // grid ends at 11,000 m and Mach 0.85) the cautions name the axes left; off ISA on a deck without an ISA axis they
    // carry the temperature approximation's.
    const offTable: Readonly<Record<string, readonly FlightCondition[]>> = {
      [CASES[0]!.name]: [
        { altitude_m: 11600, mach: 0.7, isaDev_K: 0 },
        { altitude_m: 8000, mach: 0.9, isaDev_K: 6 },
      ],
    };
    let inside = 0;
    let outside = 0;
    for (const c of CASES) {
      const m = modelOf(c);
      for (const condition of [...c.conditions, ...(offTable[c.name] ?? [])]) {
        const idle = m.atRating(condition, 'flightIdle').thrust_N;
        const top = m.atRating(condition, 'maxCruise').thrust_N;
        for (let k = 1; k <= 11; k++) {
          const p = m.forThrust(condition, idle + ((top - idle) * k) / 12, 'maxCruise');
          const { limit, thrustRequired_N, ...point } = p;
          const where = `${c.name}, ${condition.altitude_m} m, Mach ${condition.mach}, ${k}/12`;
          expect([limit, thrustRequired_N], where).toEqual(['within', idle + ((top - idle) * k) / 12]);
          expect(point, where).toStrictEqual(m.atPower(condition, p.power));
          if (p.outsideTable.length === 0) inside++;
          else outside++;
        }
      }
    }
    expect(inside).toBeGreaterThan(50);
    expect(outside).toBeGreaterThan(10);
  });

  it('forThrust brackets the root on one deck power segment and needs fewer than 7 deck evaluations a solve on average', () => {
    // Counted: the ceiling and idle evaluations, the segment ends and the refinement (Brent to 1e-7 took about 8.5 on the demo).
    let evaluations = 0;
    let solves = 0;
    for (const c of CASES) {
      const m = modelOf(c);
      for (const condition of c.conditions) {
        const idle = m.atRating(condition, 'flightIdle').thrust_N;
        const top = m.atRating(condition, 'maxCruise').thrust_N;
        for (let k = 1; k <= 15; k++) {
          c.access.reset();
          m.forThrust(condition, idle + ((top - idle) * k) / 16, 'maxCruise');
          evaluations += c.access.count();
          solves++;
        }
      }
    }
    expect(evaluations / solves).toBeLessThan(7);
  });

  it('forThrust asked again at one condition (a level flight) gives a fresh model its point to the bit, evaluating less', () => {
    // The thrusts at idle, the ceiling and the power nodes are a pure function of the condition and the power: kept
    // per condition, they must change nothing; each point still meets the thrust asked for (the solve's definition).
    let firstEvaluations = 0;
    let againEvaluations = 0;
    for (const c of CASES) {
      const warm = modelOf(c);
      for (const condition of c.conditions) {
        const idle = warm.atRating(condition, 'flightIdle').thrust_N;
        const top = warm.atRating(condition, 'maxCruise').thrust_N;
        for (let k = 1; k <= 7; k++) {
          const required = idle + ((top - idle) * k) / 8;
          c.access.reset();
          const p = warm.forThrust(condition, required, 'maxCruise');
          if (k === 1) firstEvaluations += c.access.count();
          else againEvaluations += c.access.count() / 6;
          const fresh = modelOf(c).forThrust(condition, required, 'maxCruise');
          expect([p.power, p.thrust_N, p.fuelFlow_kg_s, p.limit]).toEqual([fresh.power, fresh.thrust_N, fresh.fuelFlow_kg_s, fresh.limit]);
          expectClose(p.thrust_N, required, { rel: FOR_THRUST_TOLERANCE }, `${c.name}, ${condition.altitude_m} m, ${k}/8`);
        }
      }
    }
    expect(againEvaluations).toBeLessThan(0.75 * firstEvaluations);
  });

  it('the limits are unchanged: at or beyond the ceiling the ceiling, at or below idle flight idle', () => {
    for (const c of CASES) {
      const m = modelOf(c);
      const condition = c.conditions[0]!;
      const top = m.atRating(condition, 'maxCruise');
      const idle = m.atRating(condition, 'flightIdle');
      const over = m.forThrust(condition, top.thrust_N * 1.01, 'maxCruise');
      expect(over.limit).toBe('above_rating');
      expect(over.power).toBe(top.power);
      expect(over.thrust_N).toBe(top.thrust_N);
      const exact = m.forThrust(condition, top.thrust_N, 'maxCruise');
      expect([exact.limit, exact.power]).toEqual(['within', top.power]);
      const under = m.forThrust(condition, idle.thrust_N - 50, 'maxCruise');
      expect(under.limit).toBe('below_idle');
      expect(under.power).toBe(idle.power);
      expect(under.thrust_N).toBe(idle.thrust_N);
    }
  });
});

/**
 * A deck whose installed thrust is known in closed form: no airflow (so no spillage), a flat recovery equal to the
 * reference, no bleed and no extraction, so Raymer's corrections leave the deck thrust as it is (checked below) and
 * the installed thrust per engine is `thrust(power)` times the condition's factor 1 - altitude / 40 km. Tabulated
 * powers 0.2, 0.3, ..., 1 (the curve's breakpoints); fuel flow 0.1 + 0.5 power kg/s. Curve evaluations counted.
 */
function closedFormAccess(thrust: (power: number) => number): Counted {
  let n = 0;
  const breaks = [0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1];
  const ratings: Partial<Record<RatingName, number>> = { flightIdle: 0.2, maxCruise: 0.85, maxClimb: 0.9, maxContinuous: 0.95, takeoff: 1 };
  const factor = (c: FlightCondition): number => 1 - c.altitude_m / 40000;
  let prepared: FlightCondition = { altitude_m: 0, mach: 0, isaDev_K: 0 };
  return {
    access: {
      title: 'Closed-form test deck (invented)',
      parametric: true,
      hasAirflow: false,
      hasSensitivities: false,
      referenceRecovery: { kind: 'constant', value: 1 },
      lookup: (c, power) =>
        ok({ power, thrust_N: factor(c) * thrust(power), fuelFlow_kg_s: 0.1 + 0.5 * power, airflow_kg_s: null, sensitivities: null, outside: [], cautions: [] }),
      ratingPower: (r) => ratings[r] ?? null,
      powerBounds: () => ({ idle: 0.2, max: 1 }),
      powerForThrust: () => null,
      curveAt: (c) => {
        prepared = { ...c };
        return (power, out) => {
          n++;
          out[0] = factor(prepared) * thrust(power);
          out[1] = Number.NaN;
          out[CURVE_FUEL_FLOW] = 0.1 + 0.5 * power;
          return true;
        };
      },
      curveBreakAfter: (after) => breaks.find((q) => q > after) ?? Infinity,
      ambient: () => ok({ pressure_Pa: 22632.06, temperature_K: 216.65 }), // ISO 2533 standard atmosphere at 11 km
    },
    count: () => n,
    reset: () => {
      n = 0;
    },
  };
}

const FLAT_INLET: InletDesign = {
  name: 'Flat 1',
  description: 'Invented flat recovery table at the reference recovery.',
  source: { kind: 'recoveryTable', mach: [0, 2], recovery: [1, 1], captureArea_m2: 1 },
  lipSuctionFactor: 0,
  externalDragArea_m2: 0,
  weight_kg: 0,
};
const NO_INSTALL: InstallationSettings = { bleed: { kind: 'coreFraction', fraction: 0 }, powerExtraction_W: 0, powerExtractionFuel_kg_s_W: 0 };
const CRUISE: FlightCondition = { altitude_m: 11000, mach: 0.78, isaDev_K: 0 };

function closedFormModel(access: DeckAccess, partPowerMemoConditions?: number): PropulsionModel {
  return makeInstalledModel(access, {
    engineCount: 2,
    inlet: FLAT_INLET,
    installation: NO_INSTALL,
    cautionSettings: DEFAULT_CAUTION_SETTINGS,
    ...(partPowerMemoConditions === undefined ? {} : { partPowerMemoConditions }),
  });
}

// Smooth and increasing on [0.2, 1]: dT/dp = 30000 + 16000 p - 15000 p^2 > 0 there (closed form).
const cubic = (p: number): number => 1000 + 30000 * p + 8000 * p * p - 5000 * p * p * p;
const line = (p: number): number => 2000 + 40000 * p;
// A slope break at 0.637, inside the tabulated segment [0.6, 0.7] and inside one of its parts (0.6359 .. 0.6375).
const KINK = 0.637;
const kinked = (p: number): number => line(p) + 9000 * Math.max(0, p - KINK);

describe('part-power solve on a closed-form curve', () => {
  it('forThrust finds the closed-form power of a cubic, a straight and a kinked thrust curve to the tolerance, its fuel flow alone to the bit', () => {
    const f = 1 - CRUISE.altitude_m / 40000;
    for (const [name, thrust] of [['cubic', cubic], ['line', line], ['kinked', kinked]] as const) {
      const m = closedFormModel(closedFormAccess(thrust).access);
      expect(m.atPower(CRUISE, 0.55).thrust_N, 'installed = deck thrust, all engines').toBe(2 * (f * thrust(0.55)));
      const powers = [0.2004, 0.31, 0.45, 0.5999, 0.6362, 0.6366, 0.637, 0.6373, 0.6389, 0.71, 0.8499];
      for (const exact of powers) {
        // The thrust at `exact`: the root is `exact` (the curves are increasing), to within what the thrust
        // tolerance allows in power (|dT/dp| >= 30000 N per unit power per engine here).
        const required = 2 * f * thrust(exact);
        const p = m.forThrust(CRUISE, required, 'maxCruise');
        const where = `${name}, power ${exact}`;
        expect(p.limit, where).toBe('within');
        expectClose(p.thrust_N, required, { rel: FOR_THRUST_TOLERANCE }, `${where}: thrust asked`);
        expectClose(p.power, exact, { abs: (FOR_THRUST_TOLERANCE * required) / (2 * f * 30000) + 1e-15 }, `${where}: closed-form root`);
        expect(m.fuelFlowForThrust!(CRUISE, required, 'maxCruise'), where).toBe(p.fuelFlow_kg_s);
        expect(p.fuelFlow_kg_s, `${where}: fuel flow of the root`).toBe(2 * (0.1 + 0.5 * p.power));
      }
    }
  });

  it('a warm query on a smooth segment costs one curve evaluation; next to a kink inside a part the secant finishes', () => {
    const counts = (thrust: (p: number) => number, powers: readonly number[]): number => {
      const c = closedFormAccess(thrust);
      const m = closedFormModel(c.access);
      const f = 1 - CRUISE.altitude_m / 40000;
      for (const p of powers) m.forThrust(CRUISE, 2 * f * thrust(p), 'maxCruise');
      c.reset();
      // Nearby thrusts in the same parts (a level leg burning fuel): the nodes around them are kept.
      for (const p of powers) m.fuelFlowForThrust!(CRUISE, 2 * f * thrust(p + 1e-5), 'maxCruise');
      return c.count() / powers.length;
    };
    expect(counts(line, [0.4537, 0.6213, 0.7743])).toBe(1);
    expect(counts(cubic, [0.4537, 0.6213, 0.7743])).toBe(1);
    // In the part holding the kink the inverse cubic misses: more than one evaluation, and still the root.
    expect(counts(kinked, [0.6365, 0.6368])).toBeGreaterThan(1);
  });

  it('conditions asked once (a hold whose Mach follows the mass) pass through without evicting one asked again and again', () => {
    const c = closedFormAccess(cubic);
    const m = closedFormModel(c.access, 4);
    const fresh = (cond: FlightCondition, t: number) => closedFormModel(closedFormAccess(cubic).access).forThrust(cond, t, 'maxCruise');
    const f = 1 - CRUISE.altitude_m / 40000;
    const warm = [0.4537, 0.4538, 0.4539];
    for (const p of warm) m.forThrust(CRUISE, 2 * f * cubic(p), 'maxCruise');
    // Twenty one-off conditions, five times the memo's size; each answered as a fresh model answers it.
    for (let i = 0; i < 20; i++) {
      const once = { altitude_m: 450, mach: 0.3 + 0.001 * i, isaDev_K: 0 };
      const t = 2 * (1 - once.altitude_m / 40000) * cubic(0.5 + 0.01 * i);
      expect(m.forThrust(once, t, 'maxCruise')).toStrictEqual(fresh(once, t));
      // The cruise condition asked between them: admitted when it comes back the first time (asked among the recent
      // new conditions), then it keeps its nodes: one curve evaluation, the guess's check.
      c.reset();
      const t2 = 2 * f * cubic(0.45385);
      expect(m.forThrust(CRUISE, t2, 'maxCruise')).toStrictEqual(fresh(CRUISE, t2));
      if (i > 0) expect(c.count(), `after one-off condition ${i}`).toBe(1);
    }
  });

  it('at and beyond the limits: the ceiling or idle, the fuel flow alone the point\'s', () => {
    const m = closedFormModel(closedFormAccess(cubic).access);
    const f = 1 - CRUISE.altitude_m / 40000;
    const cases: [number, 'within' | 'above_rating' | 'below_idle', number][] = [
      [2 * f * cubic(0.85), 'within', 0.85],
      [2 * f * cubic(0.85) * 1.001, 'above_rating', 0.85],
      [2 * f * cubic(0.2), 'within', 0.2],
      [2 * f * cubic(0.2) * 0.999, 'below_idle', 0.2],
      [-1000, 'below_idle', 0.2],
    ];
    for (const [required, limit, power] of cases) {
      const p = m.forThrust(CRUISE, required, 'maxCruise');
      expect([p.limit, p.power]).toEqual([limit, power]);
      expect(m.fuelFlowForThrust!(CRUISE, required, 'maxCruise')).toBe(p.fuelFlow_kg_s);
    }
    expect(m.forThrust(CRUISE, 2 * f * cubic(0.9) * 1.001, 'maxClimb')).toMatchObject({ limit: 'above_rating', power: 0.9 });
  });

  it('with a 1- and a 2-condition memo and more segments than a condition keeps, every answer is a fresh model\'s', () => {
    const access = closedFormAccess(kinked).access;
    const kept = closedFormModel(access);
    const one = closedFormModel(access, 1);
    const two = closedFormModel(access, 2);
    const conditions: FlightCondition[] = [CRUISE, { altitude_m: 7620, mach: 0.7, isaDev_K: 0 }, { altitude_m: 3000, mach: 0.5, isaDev_K: 10 }];
    const next = lcg(7);
    for (let k = 0; k < 120; k++) {
      const c = conditions[Math.floor(next() * conditions.length)]!;
      // Roots over every segment from idle to the ceiling (seven: more than the four a condition keeps).
      const required = 2 * (1 - c.altitude_m / 40000) * kinked(0.19 + 0.67 * next());
      const fresh = closedFormModel(access).forThrust(c, required, 'maxCruise');
      for (const m of [kept, one, two]) {
        expect(m.forThrust(c, required, 'maxCruise')).toStrictEqual(fresh);
        expect(m.fuelFlowForThrust!(c, required, 'maxCruise')).toBe(fresh.fuelFlow_kg_s);
      }
    }
  });
});

/** A deterministic sequence in [0, 1) (a linear congruential generator; Numerical Recipes' constants, from memory). */
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}
