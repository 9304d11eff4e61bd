import { describe, expect, it } from 'vitest';
import type { GeometrySource } from '../../../engine/propulsion/inletDesign';
import { geometryInletFlow, streamTubeArea } from '../../../engine/propulsion/inletFlow';
import { expectClose } from '../../support/assertInDelta';
import { ref, type GeometryInletRow } from './installationReference';

function geometry(row: GeometryInletRow): GeometrySource {
  return {
    kind: 'geometry',
    captureArea_m2: row.throatArea_m2 * 1.1,
    throatArea_m2: row.throatArea_m2,
    fanFaceArea_m2: row.fanFaceArea_m2,
    diffuserLossCoefficient: row.diffuserLossCoefficient,
  };
}

describe('geometryInletFlow', () => {
  it('geometryInletFlow matches the independent scipy solution for recovery, throat and fan-face Mach', () => {
    // Reference: test/reference/installationReference.py solves the same model with
    // the area-Mach relation A/A* (NACA Report 1135) and nested scipy.optimize.brentq.
    for (const row of ref.geometryInlet) {
      const flow = geometryInletFlow(
        geometry(row),
        { mach: row.mach, pressure_Pa: row.p0_Pa, temperature_K: row.t0_K },
        row.deckAirflow_kg_s,
        row.referenceRecovery,
      );
      const where = `scipy reference at M ${row.mach}`;
      expectClose(flow.recovery, row.recovery, { rel: 1e-9 }, where);
      expectClose(flow.throatMach, row.throatMach, { rel: 1e-8 }, where);
      expectClose(flow.fanFaceMach, row.fanFaceMach, { rel: 1e-8 }, where);
      expectClose(flow.airflow_kg_s, row.airflow_kg_s, { rel: 1e-9 }, where);
      expectClose(flow.streamTubeArea_m2, row.streamTubeArea_m2, { rel: 1e-9 }, where);
      expect(flow.throatChoked).toBe(false);
    }
  });

  it('geometryInletFlow with no diffuser loss recovers 1 subsonic and the MIL-E-5008B value supersonic', () => {
    const g: GeometrySource = { kind: 'geometry', captureArea_m2: 1, throatArea_m2: 0.9, fanFaceArea_m2: 1.1, diffuserLossCoefficient: 0 };
    const sub = geometryInletFlow(g, { mach: 0.7, pressure_Pa: 30000, temperature_K: 230 }, 40, 1);
    expect(sub.recovery).toBe(1);
    const sup = geometryInletFlow(g, { mach: 2, pressure_Pa: 20000, temperature_K: 216.65 }, 40, 0.925);
    // MIL-E-5008B at M 2: 1 - 0.075 = 0.925.
    expectClose(sup.recovery, 0.925, { abs: 1e-15 }, 'MIL-E-5008B at M 2');
    expect(sup.shockRecovery).toBe(sup.recovery);
  });

  it('geometryInletFlow reports a choked throat at Mach 1 instead of a NaN', () => {
    const g: GeometrySource = { kind: 'geometry', captureArea_m2: 0.5, throatArea_m2: 0.4, fanFaceArea_m2: 0.6, diffuserLossCoefficient: 0.1 };
    // 11 km, M 0.8: choked flow per area ~ 89 kg/s/m^2 at pt0 34.5 kPa, Tt 244 K; 100 kg/s through 0.4 m^2 chokes.
    const flow = geometryInletFlow(g, { mach: 0.8, pressure_Pa: 22632.06, temperature_K: 216.65 }, 100, 1);
    expect(flow.throatChoked).toBe(true);
    expect(flow.throatMach).toBe(1);
    expect(Number.isFinite(flow.recovery)).toBe(true);
    // Throat loss at M 1: K_d (gamma/2) (p/pt)(1) = 0.1 * 0.7 * 0.528282 (NACA Report 1135 p/pt at M 1).
    expectClose(flow.recovery, 1 - 0.1 * 0.7 * 0.528282, { abs: 1e-6 }, 'NACA 1135 p/pt at M 1');
  });

  it('geometryInletFlow throat Mach rises with airflow (more flow through the same throat)', () => {
    const g: GeometrySource = { kind: 'geometry', captureArea_m2: 2.3, throatArea_m2: 2.1, fanFaceArea_m2: 2.6, diffuserLossCoefficient: 0.1 };
    const free = { mach: 0.78, pressure_Pa: 23842.3, temperature_K: 218.65 };
    const low = geometryInletFlow(g, free, 80, 1);
    const high = geometryInletFlow(g, free, 150, 1);
    expect(high.throatMach).toBeGreaterThan(low.throatMach);
    expect(high.recovery).toBeLessThan(low.recovery);
  });
});

describe('streamTubeArea', () => {
  it('streamTubeArea is mdot / (rho0 V0) and infinite at rest', () => {
    // Sea-level ISA: rho 1.225 kg/m^3, a 340.294 m/s (U.S. Standard Atmosphere 1976); M 0.5 -> V 170.147 m/s.
    // 100 kg/s / (1.225 * 170.147) = 0.47977 m^2, by hand.
    expectClose(streamTubeArea(100, { mach: 0.5, pressure_Pa: 101325, temperature_K: 288.15 }), 0.47977, { rel: 1e-4 }, 'by hand, ISA sea level');
    expect(streamTubeArea(100, { mach: 0, pressure_Pa: 101325, temperature_K: 288.15 })).toBe(Number.POSITIVE_INFINITY);
  });
});
