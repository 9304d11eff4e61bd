import { describe, expect, it } from 'vitest';
import { additiveDrag, spillageDrag } from '../../../engine/propulsion/spillageDrag';
import { expectClose } from '../../support/assertInDelta';
import { ref } from './installationReference';

describe('additiveDrag', () => {
  it('additiveDrag matches the 1-D momentum balance computed independently (NACA Report 1187 form)', () => {
    // Reference: test/reference/installationReference.py,
    // D = p1 A1 (1 + g M1^2) - p0 A0 (1 + g M0^2) - p0 (A1 - A0) with A/A* from NACA Report 1135,
    // normal shock ahead of the lip above Mach 1 (Sibulkin's open-nose inlet).
    for (const row of ref.additiveDrag) {
      const d = additiveDrag(row.mach, row.p0_Pa, row.massFlowRatio, row.captureArea_m2);
      const where = `scipy reference M ${row.mach}, A0/Ac ${row.massFlowRatio}`;
      expectClose(d.drag_N, row.drag_N, { rel: 1e-8 }, where);
      expectClose(d.coefficient, row.coefficient, { rel: 1e-8 }, where);
      expectClose(d.captureMach, row.captureMach, { rel: 1e-9 }, where);
    }
  });

  it('additiveDrag is zero at mass-flow ratio 1 and above, and at rest', () => {
    expect(additiveDrag(0.8, 22632, 1, 2).drag_N).toBe(0);
    expect(additiveDrag(0.8, 22632, 1.3, 2).drag_N).toBe(0);
    expect(additiveDrag(0, 101325, 0.5, 2).drag_N).toBe(0);
    // Just below 1 it is small and tends to 0 (second order in 1 - A0/Ac).
    const near = additiveDrag(0.8, 22632, 0.999, 2);
    expect(near.drag_N).toBeGreaterThan(0);
    expect(near.drag_N).toBeLessThan(1);
  });

  it('additiveDrag grows as the mass-flow ratio falls', () => {
    let last = 0;
    for (const mfr of [0.95, 0.85, 0.7, 0.5, 0.3, 0.1]) {
      const d = additiveDrag(0.75, 25000, mfr, 2).drag_N;
      expect(d).toBeGreaterThan(last);
      last = d;
    }
  });

  it('additiveDrag at mass-flow ratio 0 equals the stagnation-point limit', () => {
    // As A0/Ac -> 0 subsonic, the capture plane stagnates: D/(p0 Ac) -> pt0/p0 - 1, so
    // C_D,add -> (pt0/p0 - 1)/(q0/p0) = the pitot pressure coefficient (compressible Bernoulli,
    // NACA Report 1135): at M 0.6, ((1 + 0.2*0.36)^3.5 - 1)/(0.7*0.36) = 1.0921.
    const c = additiveDrag(0.6, 40000, 1e-9, 1).coefficient;
    expectClose(c, (Math.pow(1.072, 3.5) - 1) / 0.252, { rel: 1e-6 }, 'stagnation limit, NACA 1135 pitot relation');
  });

  it('additiveDrag of the open-nose inlet at mass-flow ratio 0 supersonic is the Rayleigh pitot limit', () => {
    // Behind the normal shock the capture plane stagnates: D/(p0 Ac) -> p02/p0 - 1 (Sibulkin, NACA Report 1187,
    // open-nose inlet). Rayleigh pitot ratio p02/p1 = 5.640 at M 2 (NACA Report 1135 normal-shock table, from memory):
    // C_D,add = (5.640 - 1) / (0.7 x 4) = 1.657.
    expectClose(additiveDrag(2, 20000, 1e-9, 1).coefficient, (5.64 - 1) / 2.8, { rel: 2e-4 }, 'Rayleigh pitot, NACA 1135');
  });

  it('additiveDrag at low Mach approaches the incompressible closed form', () => {
    // Incompressible 1-D momentum (the low-speed limit of the same balance, as in Seddon & Goldsmith,
    // Intake Aerodynamics): continuity gives V1 = mfr V0, Bernoulli p1 - p0 = q0 (1 - mfr^2), and
    // mdot (V1 - V0) = -2 q0 Ac mfr (1 - mfr), so D/(q0 Ac) = (1 - mfr^2) - 2 mfr (1 - mfr) = (1 - mfr)^2.
    const mfr = 0.6;
    expectClose(additiveDrag(0.01, 101325, mfr, 1).coefficient, (1 - mfr) ** 2, { rel: 1e-3 }, 'incompressible closed form');
  });
});

describe('spillageDrag', () => {
  it('spillageDrag charges the additive drag less lip suction', () => {
    expect(spillageDrag(1000, 0)).toBe(1000);
    expect(spillageDrag(1000, 0.7)).toBeCloseTo(300, 12);
    expect(spillageDrag(1000, 1)).toBe(0);
  });
});
