import { describe, expect, it } from 'vitest';
import { bestRangeMach, longRangeMach, minimumDragMach, specificRangeAt } from '../../../engine/mission/bestSpeeds';
import { missionAir } from '../../../engine/mission/missionAtmosphere';
import { expectClose } from '../../support/assertInDelta';
import { constantTsfcPropulsion, parabolicAero } from './support/analyticModels';
import { missionInput } from './support/missionFixtures';

const G0 = 9.80665;
const CD0 = 0.02;
const K = 0.05;
const S = 120;
const input = missionInput({
  legs: [],
  solve: { kind: 'takeoffWeight', takeoffMass_kg: 60000, payload_kg: 0 },
  aero: parabolicAero(CD0, K, { wingArea_m2: S }),
  propulsion: constantTsfcPropulsion({ thrust0_N: 400000, tsfc_kg_N_s: 1.7e-5, lapseExponent: 0.5 }),
  airframe: {
    oew_kg: 40000, mzfw_kg: 60000, mtow_kg: 80000, mlw_kg: 66000, maxFuel_kg: 25000, wingArea_m2: S, vmo_m_s: 250, mmo: 0.95,
  },
});

/** Mach (-) flying lift coefficient `cl` at mass m, altitude h: from L = 0.7 p M^2 S CL. */
function machAtCl(cl: number, m: number, h: number): number {
  return Math.sqrt((m * G0) / (0.7 * missionAir(h, 0).pressure_Pa * S * cl));
}

describe('bestSpeeds', () => {
  it('minimumDragMach flies CL = sqrt(CD0/K) of a parabolic polar', () => {
    // Minimum drag at CL_md = sqrt(CD0/K) (Anderson, Aircraft Performance and Design, section 5.4).
    const m = minimumDragMach(input, 6000, 60000, 0);
    expectClose(m, machAtCl(Math.sqrt(CD0 / K), 60000, 6000), { rel: 1e-4 }, 'CL_md = sqrt(CD0/K)');
  });

  it('bestRangeMach of a constant-TSFC jet flies CL = sqrt(CD0/(3K)) (maximum V/D)', () => {
    // Jet best range at maximum CL^0.5/CD, i.e. CL = sqrt(CD0/(3K)) (Anderson, section 5.13, constant TSFC).
    const m = bestRangeMach(input, 9000, 60000, 0);
    expectClose(m, machAtCl(Math.sqrt(CD0 / (3 * K)), 60000, 9000), { rel: 1e-3 }, 'CL = sqrt(CD0/(3K))');
  });

  it('longRangeMach is faster than best range and gives 99 % of its specific range', () => {
    const best = bestRangeMach(input, 9000, 60000, 0);
    const lrc = longRangeMach(input, 9000, 60000, 0);
    expect(lrc).toBeGreaterThan(best);
    // 99 % of the best specific range: long-range cruise definition, common practice.
    expectClose(specificRangeAt(input, 9000, lrc, 60000, 0), 0.99 * specificRangeAt(input, 9000, best, 60000, 0), { rel: 1e-6 }, '99 % rule');
  });

  it('specificRangeAt is 0 where the maxCruise rating cannot balance the drag', () => {
    const weak = { ...input, propulsion: constantTsfcPropulsion({ thrust0_N: 1000, tsfc_kg_N_s: 1.7e-5, lapseExponent: 0 }) };
    expect(specificRangeAt(weak, 9000, 0.7, 60000, 0)).toBe(0);
  });
});
