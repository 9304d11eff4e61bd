import { describe, expect, it } from 'vitest';
import { integrateSegment } from '../../../engine/mission/integrator';
import { S_MASS, STATE_SIZE, type FlightSample, type Segment } from '../../../engine/mission/missionState';
import { expectClose } from '../../support/assertInDelta';

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
