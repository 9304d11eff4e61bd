import { describe, expect, it } from 'vitest';
import { integrateSegment } from '../../../engine/mission/integrator';
import { S_ALT, S_GROUND, S_MASS, STATE_SIZE, type FlightSample, type Segment } from '../../../engine/mission/missionState';
import { expectClose } from '../../support/assertInDelta';
import { recordingSink, reusingSegment } from '../../support/reusingSegment';

const SAMPLE: FlightSample = {
  altitude_m: 0, mach: 0, cas_m_s: 0, tas_m_s: 0, thrustAvailable_N: 0, thrustUsed_N: 0, drag_N: 0, fuelFlow_kg_s: 0,
  cl: 0, clMax: 0, buffetLoadFactor: 0, liftToDrag: 0, climbRate_m_s: 0, throatMach: null, idleAboveDrag: false, polarOutside: [], propulsionCautions: [],
};

/** dm/dt = -k m: m(t) = m0 exp(-k t) (exact solution of the linear ODE). */
function decay(k: number, step_s: number, stopAt: number): Segment {
  return {
    step_s,
    evaluate: (y) => {
      const d = new Float64Array(STATE_SIZE);
      d[0] = 1;
      d[S_MASS] = -k * y[S_MASS];
      return { derivative: d, sample: SAMPLE };
    },
    events: [{ stop: 'fuel_exhausted', g: (y) => stopAt - y[S_MASS] }],
  };
}

function start(mass: number) {
  const s = new Float64Array(STATE_SIZE);
  s[S_MASS] = mass;
  return s;
}

describe('integrator', () => {
  it('integrateSegment stops on the event at t = ln 2 / k when the mass halves', () => {
    const run = integrateSegment(decay(0.01, 7, 50), start(100), () => {});
    expect(run.stop).toBe('fuel_exhausted');
    // Exact solution of dm/dt = -k m; RK4 with k h = 0.07 has local error ~ (k h)^5 / 120.
    expectClose(run.end[0], Math.log(2) / 0.01, { rel: 1e-6 }, 'exact: t = ln 2 / k (RK4 global error ~2e-7 here)');
    expectClose(run.end[S_MASS], 50, { abs: 1e-7 }, 'the event value is met');
  });

  it('integrateSegment error falls by about 2^4 when the step is halved (fourth order)', () => {
    const errorAt = (h: number) => {
      const seg: Segment = { ...decay(0.05, h, -1), events: [{ stop: 'time_reached', g: (y) => y[0] - 100 }] };
      const run = integrateSegment(seg, start(1), () => {});
      return Math.abs(run.end[S_MASS] - Math.exp(-5));
    };
    const ratio = errorAt(4) / errorAt(2);
    expect(ratio).toBeGreaterThan(14);
    expect(ratio).toBeLessThan(20);
  });

  it('integrateSegment stops at once when an event already holds at the start', () => {
    let samples = 0;
    const run = integrateSegment(decay(0.01, 7, 200), start(100), () => samples++);
    expect(run.stop).toBe('fuel_exhausted');
    expect(run.end[0]).toBe(0);
    expect(samples).toBe(1);
  });

  it('integrateSegment reports numerical_failure instead of passing NaN on', () => {
    const seg: Segment = {
      step_s: 1,
      evaluate: (y) => {
        const d = new Float64Array(STATE_SIZE);
        d[0] = 1;
        d[S_MASS] = y[0] > 2.5 ? Number.NaN : -1;
        return { derivative: d, sample: SAMPLE };
      },
      events: [],
    };
    const run = integrateSegment(seg, start(100), () => {});
    expect(run.stop).toBe('numerical_failure');
    expect(Number.isFinite(run.end[S_MASS])).toBe(true);
  });
});

describe('integrator domain', () => {
  // dh/dt = 100 m/s from 0 m: h(t) = 100 t (closed form); the domain ends at 1,000 m.
  const DOMAIN = { minAltitude_m: -100, maxAltitude_m: 1000, minMass_kg: 0, maxTas_m_s: 500 };
  const rising = (step_s: number): Segment => ({
    step_s,
    evaluate: (y) => {
      if (y[S_ALT] > DOMAIN.maxAltitude_m) throw new Error(`evaluated outside the domain at ${y[S_ALT]} m`);
      const d = new Float64Array(STATE_SIZE);
      d[0] = 1;
      d[S_ALT] = 100;
      d[S_GROUND] = 50;
      return { derivative: d, sample: SAMPLE };
    },
    events: [],
  });

  it('integrateSegment cuts the step so no stage leaves the domain, then stops with left_domain at the last state inside', () => {
    const run = integrateSegment(rising(7), start(100), () => {}, DOMAIN);
    expect(run.stop).toBe('left_domain');
    expect(run.domainExit).toBe('altitude_high');
    expect(run.end[S_ALT]).toBeLessThanOrEqual(1000);
    // The last step tried was 7/1024 s: the state stops within 100 m/s x 7/1024 s of the bound.
    expect(run.end[S_ALT]).toBeGreaterThan(1000 - (100 * 7) / 1024);
    expectClose(run.end[S_ALT], 100 * run.end[0], { rel: 1e-12 }, 'h = 100 t (exact for a constant rate)');
  });

  it('integrateSegment refuses a start outside the domain without evaluating it', () => {
    const s = start(100);
    s[S_ALT] = 2000;
    const run = integrateSegment(rising(1), s, () => {}, DOMAIN);
    expect(run.stop).toBe('left_domain');
    expect(run.domainExit).toBe('altitude_high');
  });

  it('integrateSegment stops with no_ground_progress where the ground speed is not positive, when the domain asks', () => {
    const backwards: Segment = {
      step_s: 1,
      evaluate: (y) => {
        const d = new Float64Array(STATE_SIZE);
        d[0] = 1;
        d[S_GROUND] = 5 - y[0];
        return { derivative: d, sample: SAMPLE };
      },
      events: [],
    };
    const run = integrateSegment(backwards, start(100), () => {}, { ...DOMAIN, requireGroundProgress: true });
    expect(run.stop).toBe('no_ground_progress');
    // Ground speed 5 - t reaches 0 at t = 5 s, an accepted point on the 1 s grid.
    expect(run.end[0]).toBe(5);
    expect(integrateSegment({ ...backwards, events: [{ stop: 'time_reached', g: (y) => y[0] - 10 }] }, start(100), () => {}, DOMAIN).stop).toBe('time_reached');
  });
});

describe('integrator slope breaks', () => {
  // dm/dt = -q - k (m - m*) above m*, -q below (a slope break of the right-hand side at m*, as a deck power node is of
  // the fuel flow). Closed form: m(t) = m* + (m0 - m* + q/k) exp(-k t) - q/k until m* at t* = ln((m0 - m* + q/k)/(q/k)) / k,
  // then m* - q (t - t*) (linear ODE, then constant rate).
  const q = 1;
  const k = 1 / 500;
  const mStar = 800;
  const m0 = 1000;
  const tStar = Math.log((m0 - mStar + q / k) / (q / k)) / k;
  const T = 600;
  const exact = mStar - q * (T - tStar);
  const kinked = (breakValues?: readonly number[]): Segment => ({
    step_s: 100,
    evaluate: (y) => {
      const d = new Float64Array(STATE_SIZE);
      d[0] = 1;
      d[S_MASS] = -q - (y[S_MASS] > mStar ? k * (y[S_MASS] - mStar) : 0);
      return { derivative: d, sample: SAMPLE, breakCoordinate: y[S_MASS] };
    },
    events: [{ stop: 'time_reached', stateOnly: true, g: (y) => y[0] - T }],
    ...(breakValues === undefined ? {} : { breakValues }),
  });

  it('integrateSegment ends a step where the break coordinate crosses a break value, keeping RK4 accurate across it (closed form)', () => {
    const ends: number[] = [];
    const run = integrateSegment(kinked([500, mStar, 1200]), start(m0), (y) => ends.push(y[0]));
    expect(run.stop).toBe('time_reached');
    // A step ends within a tenth of a second of t* (of a 100 s step), so the break is straddled by at most that.
    expect(Math.min(...ends.map((t) => Math.abs(t - tStar)))).toBeLessThan(0.1);
    const cutError = Math.abs(run.end[S_MASS] - exact);
    expectClose(run.end[S_MASS], exact, { abs: 3e-3 }, 'closed form across the break');
    // Straddling the break instead is a first-order error, far larger.
    const straddled = integrateSegment(kinked(), start(m0), () => {});
    expect(Math.abs(straddled.end[S_MASS] - exact)).toBeGreaterThan(10 * cutError);
  });

  it('integrateSegment cuts at the same breaks, bit for bit, when the segment writes every evaluation into one buffer and one record', () => {
    const fresh = recordingSink();
    const reused = recordingSink();
    const a = integrateSegment(kinked([500, mStar, 1200]), start(m0), fresh.sink);
    const b = integrateSegment(reusingSegment(kinked([500, mStar, 1200])), start(m0), reused.sink);
    expectClose(a.end[S_MASS], exact, { abs: 3e-3 }, 'closed form across the break');
    expect(b).toStrictEqual(a);
    expect(reused.points).toStrictEqual(fresh.points);
  });
});

describe('integrator and a segment that reuses its evaluation buffers', () => {
  // dm/dt = -k m from 100 kg, the sample's drag standing for the mass: m(t) = 100 exp(-k t) (exact solution), so the
  // sample event (drag below 60) fires at t = ln(100 / 60) / k = 51.08 s, and the state event (t = 52 s) in the
  // same 7 s step: both are located, the sample event's trial points evaluated before the state event's search
  // reads the step's end.
  const k = 0.01;
  const bothInOneStep = (): Segment => ({
    step_s: 7,
    evaluate: (y) => {
      const d = new Float64Array(STATE_SIZE);
      d[0] = 1;
      d[S_MASS] = -k * y[S_MASS];
      return { derivative: d, sample: { ...SAMPLE, drag_N: y[S_MASS], fuelFlow_kg_s: k * y[S_MASS] } };
    },
    events: [
      { stop: 'thrust_below_drag', g: (_y, s) => 60 - s.drag_N },
      { stop: 'time_reached', stateOnly: true, g: (y) => y[0] - 52 },
    ],
  });

  it('integrateSegment gives the same run, bit for bit, when every evaluation and stage is written into one buffer and one record', () => {
    const fresh = recordingSink();
    const reused = recordingSink();
    const a = integrateSegment(bothInOneStep(), start(100), fresh.sink);
    const b = integrateSegment(reusingSegment(bothInOneStep()), start(100), reused.sink);
    expect(a.stop).toBe('thrust_below_drag');
    expectClose(a.end[0], Math.log(100 / 60) / k, { rel: 1e-6 }, 'exact: t = ln(100 / 60) / k');
    expect(b).toStrictEqual(a);
    expect(reused.points).toStrictEqual(fresh.points);
  });

  it('integrateSegment keeps its end sample when the segment is evaluated again after the run', () => {
    const segment = reusingSegment(bothInOneStep());
    const run = integrateSegment(segment, start(100), () => {});
    const kept = { ...run.endSample };
    segment.evaluate(start(1));
    expect(run.endSample).toStrictEqual(kept);
    expectClose(run.endSample.drag_N, 60, { abs: 1e-6 }, 'the event value: the drag stands for the mass, 60 kg at the event');
  });
});
