import { describe, expect, it } from 'vitest';
import { adjustPropulsion } from '../../../engine/analysis/adjustedPropulsion';
import { expectClose } from '../../support/assertInDelta';
import { analyticPropulsion } from './analyticModels';

const engine = { thrust_N: 160e3, lapse: 'mattingly' as const, tsfc_kg_N_s: 1.6e-5 };
const cond = { altitude_m: 9000, mach: 0.78, isaDev_K: 0 };

describe('adjustPropulsion', () => {
  it('adjustPropulsion raises thrust by C_ram dEta of deck thrust at the same fuel flow (Raymer ram-recovery correction)', () => {
    // Raymer, Aircraft Design: A Conceptual Approach, installed thrust: % loss = C_ram (eta_ref - eta) x 100.
    // +0.01 recovery with C_ram 1.35 = +1.35 % of deck thrust: the analytic engine with thrustScale 1.0135.
    const adjusted = adjustPropulsion(analyticPropulsion(engine), { recoveryDelta: 0.01, cRam: 1.35, fuelFlowScale: 1 });
    const reference = analyticPropulsion({ ...engine, thrustScale: 1.0135 });
    const a = adjusted.atRating(cond, 'maxCruise');
    const r = reference.atRating(cond, 'maxCruise');
    expectClose(a.thrust_N, r.thrust_N, { rel: 1e-12 }, 'Raymer correction, worked by hand');
    expectClose(a.fuelFlow_kg_s, r.fuelFlow_kg_s, { rel: 1e-12 });
    expectClose(a.perEngine.recovery, 1.01, { abs: 1e-12 });
    const fa = adjusted.forThrust(cond, 30e3, 'maxCruise');
    const fr = reference.forThrust(cond, 30e3, 'maxCruise');
    expect(fa.limit).toBe('within');
    expectClose(fa.thrust_N, 30e3, { rel: 1e-9 });
    expectClose(fa.fuelFlow_kg_s, fr.fuelFlow_kg_s, { rel: 1e-9 }, 'part-power fuel flow of the scaled engine');
  });

  it('adjustPropulsion scales fuel flow and TSFC and keeps thrust', () => {
    const base = analyticPropulsion(engine);
    const adjusted = adjustPropulsion(base, { recoveryDelta: 0, cRam: 1.35, fuelFlowScale: 1.01 });
    const p = adjusted.forThrust(cond, 30e3);
    const q = base.forThrust(cond, 30e3);
    expectClose(p.thrust_N, q.thrust_N, { rel: 1e-15 });
    expectClose(p.fuelFlow_kg_s, 1.01 * q.fuelFlow_kg_s, { rel: 1e-14 });
    expectClose(p.tsfc_kg_N_s!, 1.01 * q.tsfc_kg_N_s!, { rel: 1e-14 });
  });

  it('adjustPropulsion reports the rating limit when the thrust asked for is out of reach', () => {
    const adjusted = adjustPropulsion(analyticPropulsion(engine), { recoveryDelta: 0.01, cRam: 1.35, fuelFlowScale: 1 });
    const p = adjusted.forThrust(cond, 1e7);
    expect(p.limit).toBe('above_rating');
    expect(p.thrustRequired_N).toBe(1e7);
    expect(adjusted.forThrust(cond, 1).limit).toBe('below_idle');
  });
});
