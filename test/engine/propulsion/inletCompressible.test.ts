import { describe, expect, it } from 'vitest';
import { machFromMassFlowParameter, massFlowParameter, normalShock } from '../../../engine/aero/compressibleFlow';
import { expectOk } from '../../../engine/core/result';
import {
  CHOKED_MASS_FLOW_FUNCTION,
  massFlowFunction,
  normalShockTotalPressureRatio,
  subsonicMachFromMassFlowFunction,
  totalToStaticPressure,
  totalToStaticTemperature,
} from '../../../engine/propulsion/inletCompressible';
import { expectClose } from '../../support/assertInDelta';

/** A/A* from the mass-flow function: f(1) / f(M). */
function areaRatio(m: number): number {
  return CHOKED_MASS_FLOW_FUNCTION / massFlowFunction(m);
}

describe('inletCompressible', () => {
  it('totalToStaticPressure and Temperature match NACA Report 1135 table values', () => {
    // NACA Report 1135, isentropic table, gamma 1.4 (from memory, 4 figures):
    // M 0.5: p/pt 0.8430, T/Tt 0.9524; M 0.8: p/pt 0.6560, T/Tt 0.8865; M 1: p/pt 0.5283.
    expectClose(1 / totalToStaticPressure(0.5), 0.843, { abs: 5e-5 }, 'NACA 1135 M 0.5');
    expectClose(1 / totalToStaticTemperature(0.5), 0.9524, { abs: 5e-5 }, 'NACA 1135 M 0.5');
    expectClose(1 / totalToStaticPressure(0.8), 0.656, { abs: 5e-5 }, 'NACA 1135 M 0.8');
    expectClose(1 / totalToStaticTemperature(0.8), 0.8865, { abs: 5e-5 }, 'NACA 1135 M 0.8');
    expectClose(1 / totalToStaticPressure(1), 0.5283, { abs: 5e-5 }, 'NACA 1135 M 1');
  });

  it('massFlowFunction gives the area ratio A/A* of NACA Report 1135', () => {
    // NACA Report 1135 isentropic table (from memory): A/A* = 1.3398 at M 0.5, 1.0382 at M 0.8, 2.0351 at M 0.3.
    expectClose(areaRatio(0.5), 1.3398, { abs: 5e-5 }, 'NACA 1135 A/A* M 0.5');
    expectClose(areaRatio(0.8), 1.0382, { abs: 5e-5 }, 'NACA 1135 A/A* M 0.8');
    expectClose(areaRatio(0.3), 2.0351, { abs: 5e-5 }, 'NACA 1135 A/A* M 0.3');
    expect(massFlowFunction(1)).toBe(CHOKED_MASS_FLOW_FUNCTION);
  });

  it('subsonicMachFromMassFlowFunction inverts massFlowFunction across 0..1', () => {
    for (const m of [1e-4, 0.05, 0.2, 0.45, 0.7, 0.9, 0.99]) {
      expectClose(subsonicMachFromMassFlowFunction(massFlowFunction(m)), m, { abs: 1e-12 }, 'round trip');
    }
    // Near Mach 1 the function is flat (zero slope), so M is only as good as sqrt(round-off).
    expectClose(subsonicMachFromMassFlowFunction(massFlowFunction(0.9999)), 0.9999, { abs: 1e-7 }, 'round trip near M 1');
    expect(subsonicMachFromMassFlowFunction(0)).toBe(0);
    expect(subsonicMachFromMassFlowFunction(CHOKED_MASS_FLOW_FUNCTION)).toBe(1);
  });

  it('subsonicMachFromMassFlowFunction returns NaN above choking for the caller to report', () => {
    expect(Number.isNaN(subsonicMachFromMassFlowFunction(CHOKED_MASS_FLOW_FUNCTION * 1.01))).toBe(true);
    expect(Number.isNaN(subsonicMachFromMassFlowFunction(-1))).toBe(true);
  });

  it('normalShockTotalPressureRatio matches the normal-shock table', () => {
    // NACA Report 1135 normal-shock table (from memory): pt2/pt1 = 0.7209 at M 2, 0.8952 at M 1.6, 0.9298 at M 1.5.
    expectClose(normalShockTotalPressureRatio(2), 0.7209, { abs: 5e-5 }, 'NACA 1135 normal shock M 2');
    expectClose(normalShockTotalPressureRatio(1.6), 0.8952, { abs: 5e-5 }, 'NACA 1135 normal shock M 1.6');
    expectClose(normalShockTotalPressureRatio(1.5), 0.9298, { abs: 5e-5 }, 'NACA 1135 normal shock M 1.5');
    expect(normalShockTotalPressureRatio(0.9)).toBe(1);
  });

  it('inletCompressible agrees with the general engine/aero/compressibleFlow relations it fast-paths', () => {
    // The inlet's closed forms (gamma 1.4, no Result allocation) must equal the project's general ones:
    // massFlowParameter = sqrt(gamma) x massFlowFunction; same inverse; same normal-shock pt ratio.
    for (const m of [0.05, 0.3, 0.55, 0.8, 0.97]) {
      expectClose(Math.sqrt(1.4) * massFlowFunction(m), massFlowParameter(m), { rel: 1e-14 }, 'compressibleFlow.massFlowParameter');
      const value = massFlowParameter(m);
      const general = expectOk(machFromMassFlowParameter(value, 'subsonic'), 'general inverse');
      expectClose(subsonicMachFromMassFlowFunction(value / Math.sqrt(1.4)), general, { abs: 1e-12 }, 'compressibleFlow.machFromMassFlowParameter');
    }
    for (const m of [1.2, 1.6, 2.5]) {
      expectClose(normalShockTotalPressureRatio(m), normalShock(m).totalPressureRatio, { rel: 1e-13 }, 'compressibleFlow.normalShock');
    }
  });
});
