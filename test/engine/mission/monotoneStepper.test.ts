import { describe, expect, it } from 'vitest';
import { integrateSegment, type StateDomain } from '../../../engine/mission/integrator';
import { integrateMonotone, intervalSteps, MAX_INTERVAL_STEPS, monotoneIntervalEnds, monotoneStepEnds, newMonotoneScratch } from '../../../engine/mission/monotoneStepper';
import { S_ALT, S_GROUND, S_MASS, S_TAS, S_TIME, STATE_SIZE, type FlightSample, type Segment, type StateVector } from '../../../engine/mission/missionState';
import { expectClose } from '../../support/assertInDelta';
import { recordingSink, reusingSegment } from '../../support/reusingSegment';

const SAMPLE: FlightSample = {
  altitude_m: 0, mach: 0, cas_m_s: 0, tas_m_s: 0, thrustAvailable_N: 0, thrustUsed_N: 0, drag_N: 0, fuelFlow_kg_s: 0,
  cl: 0, clMax: 0, buffetLoadFactor: 0, liftToDrag: 0, climbRate_m_s: 0, throatMach: null, idleAboveDrag: false, polarOutside: [], propulsionCautions: [],
};

/**
 * Climb with dh/dt = a - b h (rate falling linearly to zero at the absolute ceiling a / b) and constant fuel flow q:
 * closed form t(h) = ln(a / (a - b h)) / b, m(h) = m0 - q t(h) (separable linear ODE).
 */
function linearCeilingClimb(a: number, b: number, q: number, zeroFuel_kg = 0, to_m = 9000): Segment {
  const f = (y: StateVector) => {
    const d = new Float64Array(STATE_SIZE);
    d[S_TIME] = 1;
    d[S_ALT] = a - b * y[S_ALT];
    d[S_MASS] = -q;
    return d;
  };
  return {
    step_s: 5,
    evaluate: (y) => ({ derivative: f(y), sample: { ...SAMPLE, altitude_m: y[S_ALT], climbRate_m_s: a - b * y[S_ALT] } }),
    derivative: f,
    events: [
      { stop: 'altitude_reached', stateOnly: true, g: (y) => y[S_ALT] - to_m },
      { stop: 'climb_stalled', g: (_y, s) => 0.5 - s.climbRate_m_s },
      { stop: 'fuel_exhausted', stateOnly: true, g: (y) => zeroFuel_kg - y[S_MASS] },
    ],
  };
}

function start(mass_kg: number): StateVector {
  const y = new Float64Array(STATE_SIZE) as StateVector;
  y[S_MASS] = mass_kg;
  return y;
}

const plan = (maxStep: number, breaks: readonly number[] = []) =>
  ({ component: S_ALT, to: 9000, breaks, maxStep, minRate: 0.5, targetStop: 'altitude_reached' }) as const;

describe('monotoneStepEnds', () => {
  it('monotoneStepEnds ends a step on every break between the ends and cuts intervals evenly to the longest step', () => {
    expect(monotoneStepEnds(0, 1000, [250, 1200, -5, 250], 400)).toEqual([250, 625, 1000]);
    expect(monotoneStepEnds(1000, 0, [250, 600], 500)).toEqual([600, 250, 0]);
    expect(monotoneStepEnds(0, 100, [], 1000)).toEqual([100]);
  });

  it('monotoneIntervalEnds lists the breaks inside in flight order, each once, then the target', () => {
    expect(monotoneIntervalEnds(0, 1000, [250, 1200, -5, 250, 600])).toEqual([250, 600, 1000]);
    expect(monotoneIntervalEnds(1000, 0, [250, 600, 1000])).toEqual([600, 250, 0]);
    expect(monotoneIntervalEnds(0, 0, [])).toEqual([0]);
  });

  it('monotoneIntervalEnds orders unsorted breaks with repeats as the built-in sort does, both ways', () => {
    // Reference: Array.prototype.sort on the breaks inside, then the repeats dropped (ECMAScript's sort, not ours).
    let seed = 12345;
    const next = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
    for (let trial = 0; trial < 200; trial++) {
      const breaks = Array.from({ length: Math.floor(next() * 30) }, () => Math.round(next() * 40) * 250 - 1000);
      const [from, to] = trial % 2 === 0 ? [0, 9000] : [9000, 0];
      const inside = breaks.filter((b) => b > Math.min(from, to) && b < Math.max(from, to));
      const sorted = [...new Set(inside)].sort((a, b) => (to > from ? a - b : b - a));
      expect(monotoneIntervalEnds(from, to, breaks)).toEqual([...sorted, to]);
    }
  });

  it('intervalSteps takes the larger of the altitude and the time bound, at least 1, the time bound at most MAX_INTERVAL_STEPS', () => {
    // 1,524 m at 5 m/s is 304.8 s: 3 steps of at most 145 s; at 50 m/s the 1,600 m bound gives 1, a 1,200 m bound 2.
    expect(intervalSteps(1524, 1600, 5, 145)).toBe(3);
    expect(intervalSteps(1524, 1600, -5, 145)).toBe(3);
    expect(intervalSteps(1524, 1600, 50, 145)).toBe(1);
    expect(intervalSteps(1524, 1200, 50, 145)).toBe(2);
    expect(intervalSteps(1524, 1200, 50)).toBe(2);
    // Exactly 2 x 145 s is 2 steps (the 1e-9 allowance), not 3.
    expect(intervalSteps(1450, 1600, 5, 145)).toBe(2);
    expect(intervalSteps(1524, 1600, 1e-6, 145)).toBe(MAX_INTERVAL_STEPS);
    // The length bound alone is not capped (as monotoneStepEnds always cut it).
    expect(intervalSteps(10000, 1, 1e-6, 145)).toBe(10000);
    expect(intervalSteps(0, 1600, 5, 145)).toBe(1);
  });
});

describe('integrateMonotone', () => {
  // a = 20 m/s, b = 1/900 1/s: the ceiling is at 18,000 m, the rate at 9,000 m is 10 m/s.
  const a = 20;
  const b = 1 / 900;
  const q = 0.3;
  const exactTime = Math.log(a / (a - b * 9000)) / b;

  it('integrateMonotone lands exactly on the target altitude with the closed-form time and fuel (separable linear ODE)', () => {
    const run = integrateMonotone(linearCeilingClimb(a, b, q), start(10000), () => {}, plan(600));
    expect(run.stop).toBe('altitude_reached');
    expect(run.end[S_ALT]).toBe(9000);
    expectClose(run.end[S_TIME], exactTime, { rel: 1e-7 }, 'closed form ln(a / (a - b h)) / b');
    expectClose(run.end[S_MASS], 10000 - q * exactTime, { rel: 1e-8 }, 'closed form m0 - q t');
  });

  it('integrateMonotone converges at fourth order as the altitude step halves (RK4, Hairer, Norsett & Wanner II.1)', () => {
    const err = (step: number) => Math.abs(integrateMonotone(linearCeilingClimb(a, b, q), start(10000), () => {}, plan(step)).end[S_TIME] - exactTime);
    const ratio = err(3000) / err(1500);
    expect(ratio).toBeGreaterThan(12);
    expect(ratio).toBeLessThan(20);
  });

  it('integrateMonotone cuts each break interval into ceil(L / (rate x maxStepTime_s)) steps, the rate at its start', () => {
    // Rate a - b h: 20 m/s at 0 m, 16 m/s at 3,600 m, 12 m/s at 7,200 m (closed form of the linear-ceiling climb).
    const seen: number[] = [];
    const run = integrateMonotone(linearCeilingClimb(a, b, q), start(10000), (y) => seen.push(y[S_ALT]), {
      ...plan(5000, [3600, 7200]),
      maxStepTime_s: 60,
    });
    // 3,600 m / (20 x 60) = 3 steps; 3,600 / (16 x 60) = 3.75 -> 4; 1,800 / (12 x 60) = 2.5 -> 3.
    expect(seen).toEqual([0, 1200, 2400, 3600, 4500, 5400, 6300, 7200, 7800, 8400, 9000]);
    expect(run.stop).toBe('altitude_reached');
    expectClose(run.end[S_TIME], exactTime, { rel: 1e-6 }, 'closed form ln(a / (a - b h)) / b, within the RK4 truncation of these steps');
  });

  it('integrateMonotone converges at fourth order as maxStepTime_s halves (RK4, Hairer, Norsett & Wanner II.1)', () => {
    // Breaks every 450 m keep the intervals short, so the step counts follow the time bound: doubling them (from
    // about 2.5 a step at 80 s) divides the error by about 16.
    const breaks = Array.from({ length: 19 }, (_, k) => 450 * (k + 1));
    const err = (time_s: number) =>
      Math.abs(integrateMonotone(linearCeilingClimb(a, b, q), start(10000), () => {}, { ...plan(5000, breaks), maxStepTime_s: time_s }).end[S_TIME] - exactTime);
    const ratio = err(40) / err(20);
    expect(ratio).toBeGreaterThan(12);
    expect(ratio).toBeLessThan(20);
  });

  it('integrateMonotone ends a step on each break and hands every accepted point to the sink', () => {
    const seen: number[] = [];
    integrateMonotone(linearCeilingClimb(a, b, q), start(10000), (y) => seen.push(y[S_ALT]), plan(5000, [1234.5]));
    expect(seen).toEqual([0, 1234.5, 5117.25, 9000]);
  });

  it('integrateMonotone gives the same run, bit for bit, when the segment writes every evaluation and stage into one buffer and one record', () => {
    // A full climb over breaks, and one handed to the time integrator where the fuel runs out.
    for (const zeroFuel_kg of [0, 9900]) {
      const fresh = recordingSink();
      const reused = recordingSink();
      const freshRun = integrateMonotone(linearCeilingClimb(a, b, q, zeroFuel_kg), start(10000), fresh.sink, plan(600, [1234.5, 4000]));
      const segment = reusingSegment(linearCeilingClimb(a, b, q, zeroFuel_kg));
      const reusedRun = integrateMonotone(segment, start(10000), reused.sink, plan(600, [1234.5, 4000]));
      expect(freshRun.stop).toBe(zeroFuel_kg > 0 ? 'fuel_exhausted' : 'altitude_reached');
      expect(reusedRun).toStrictEqual(freshRun);
      expect(reused.points).toStrictEqual(fresh.points);
      // The run's end sample is its own: evaluating the segment again leaves it as it was.
      segment.evaluate(start(1));
      expect(reusedRun.endSample).toStrictEqual(freshRun.endSample);
    }
    expectClose(integrateMonotone(reusingSegment(linearCeilingClimb(a, b, q)), start(10000), () => {}, plan(600)).end[S_TIME], exactTime, { rel: 1e-7 }, 'closed form ln(a / (a - b h)) / b');
  });

  it('integrateMonotone writes its stage scratch before reading it: a scratch full of NaN, or one a run before used, gives the same run', () => {
    const own = integrateMonotone(linearCeilingClimb(a, b, q), start(10000), () => {}, plan(600, [1234.5, 4000]));
    const poisoned = newMonotoneScratch();
    poisoned.stagePoint.fill(Number.NaN);
    poisoned.slopes.fill(Number.NaN);
    expect(integrateMonotone(linearCeilingClimb(a, b, q), start(10000), () => {}, plan(600, [1234.5, 4000]), undefined, poisoned)).toStrictEqual(own);
    // The same scratch again, after a run that stalled in it.
    integrateMonotone(linearCeilingClimb(20, 20 / 9450, q, 0, 9400), start(10000), () => {}, { ...plan(600), to: 9400 }, undefined, poisoned);
    expect(integrateMonotone(linearCeilingClimb(a, b, q), start(10000), () => {}, plan(600, [1234.5, 4000]), undefined, poisoned)).toStrictEqual(own);
    expectClose(own.end[S_TIME], exactTime, { rel: 1e-7 }, 'closed form ln(a / (a - b h)) / b');
  });

  it('integrateMonotone hands a stalling climb to the time integrator, which stops it at the stall rate', () => {
    // Ceiling at 9,450 m: the rate falls to the 0.5 m/s stall rate at 9,213.75 m, below the 9,400 m target.
    const seg = linearCeilingClimb(20, 20 / 9450, q, 0, 9400);
    const run = integrateMonotone(seg, start(10000), () => {}, { ...plan(600), to: 9400 });
    // Stall where a - b h = 0.5: h = (a - 0.5) / b (closed form).
    expect(run.stop).toBe('climb_stalled');
    expectClose(run.end[S_ALT], (20 - 0.5) / (20 / 9450), { abs: 1e-3 }, 'closed form h = (a - 0.5) / b');
  });

  it('integrateMonotone hands over to the time integrator where fuel runs out, which locates it', () => {
    const run = integrateMonotone(linearCeilingClimb(a, b, q, 9900), start(10000), () => {}, plan(600));
    expect(run.stop).toBe('fuel_exhausted');
    expectClose(run.end[S_MASS], 9900, { abs: 1e-6 }, 'the zero-fuel mass the event is set at');
    // 100 kg at 0.3 kg/s: t = 333.3 s, so h = (a / b)(1 - exp(-b t)) (closed form).
    expectClose(run.end[S_ALT], (a / b) * (1 - Math.exp((-b * 100) / q)), { rel: 1e-6 }, 'closed form h(t)');
  });

  it('integrateMonotone nudges the first stage only where the start lies on one of the plan jumps (piecewise-constant fuel flow)', () => {
    // Fuel flow q below 0 m and 2q from 0 m up (a value jump at the start, as the lapse rate jumps at 11 km), on the
    // linear-ceiling climb: over (0, 9000] the flow is 2q throughout, so m = m0 - 2 q t(h) (closed form).
    const jumping = (): Segment => {
      const base = linearCeilingClimb(a, b, q);
      const f = (y: StateVector): Float64Array<ArrayBuffer> => {
        const d = Float64Array.from(base.derivative!(y));
        d[S_MASS] = y[S_ALT] > 0 ? -2 * q : -q;
        return d;
      };
      return { ...base, evaluate: (y) => ({ ...base.evaluate(y), derivative: f(y) }), derivative: f };
    };
    const exact = 10000 - 2 * q * exactTime;
    const onJump = integrateMonotone(jumping(), start(10000), () => {}, { ...plan(600), jumps: [0, 4000] });
    expectClose(onJump.end[S_MASS], exact, { rel: 1e-8 }, 'closed form m0 - 2 q t (first stage inside the segment)');
    // Told nothing jumps at its start, the first stage takes the start's own flow q: the fuel of the first step is off.
    const told = integrateMonotone(jumping(), start(10000), () => {}, { ...plan(600), jumps: [4000] });
    expect(Math.abs(told.end[S_MASS] - exact)).toBeGreaterThan(1e-3);
    // A continuous right-hand side gives the closed form either way.
    const smooth = integrateMonotone(linearCeilingClimb(a, b, q), start(10000), () => {}, { ...plan(600), jumps: [] });
    expectClose(smooth.end[S_MASS], 10000 - q * exactTime, { rel: 1e-8 }, 'closed form m0 - q t');
  });
  it('integrateMonotone leaves a start outside the domain to the time integrator, which names the bound (NaN, altitude, mass, TAS)', () => {
    const domain: StateDomain = { minAltitude_m: -100, maxAltitude_m: 20000, minMass_kg: 5000, maxTas_m_s: 400 };
    const cases: [number, number][] = [
      [S_GROUND, Number.NaN],
      [S_TIME, Number.POSITIVE_INFINITY],
      [S_ALT, -200],
      [S_MASS, 5000],
      [S_TAS, -1],
      [S_TAS, 401],
    ];
    for (const [component, value] of cases) {
      const y = start(10000);
      y[component] = value;
      const monotone = integrateMonotone(linearCeilingClimb(a, b, q), y, () => {}, plan(600), domain);
      const timed = integrateSegment(linearCeilingClimb(a, b, q), y, () => {}, domain);
      expect(monotone.stop).toBe('left_domain');
      expect(monotone.domainExit).toBe(timed.domainExit);
    }
    // Inside it (negative components are finite: -0 from 0 x a negative value must not read as NaN), the stepper flies to the target.
    const inside = start(10000);
    inside[S_GROUND] = -5;
    inside[S_TIME] = -1;
    const run = integrateMonotone(linearCeilingClimb(a, b, q), inside, () => {}, plan(600), domain);
    expect(run.stop).toBe('altitude_reached');
    expectClose(run.end[S_TIME], exactTime - 1, { rel: 1e-6 }, 'closed form ln(a / (a - b h)) / b, within the RK4 truncation of 600 m steps');
  });
});
