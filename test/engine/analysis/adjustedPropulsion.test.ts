import { describe, expect, it } from 'vitest';
import { adjustPropulsion } from '../../../engine/analysis/adjustedPropulsion';
import { expectClose } from '../../support/assertInDelta';
import { DEFAULT_CAUTION_SETTINGS } from '../../../engine/cautions/cautionSettings';
import { DEMO_ENGINE_SPEC } from '../../../engine/propulsion/deckDemoSpec';
import { makeInstalledPropulsion } from '../../../engine/propulsion/installedPropulsion';
import { buildParametricDeck } from '../../../engine/propulsion/parametricDeck';
import { LONG_PITOT } from '../propulsion/inletDesigns';
import { analyticPropulsion } from './analyticModels';
import { keyOutline } from '../../support/objectShape';

const engine = { thrust_N: 160e3, lapse: 'mattingly' as const, tsfc_kg_N_s: 1.6e-5 };
const cond = { altitude_m: 9000, mach: 0.78, isaDev_K: 0 };

/** The installed model on the invented parametric demo deck with the long pitot inlet. */
function parametricInstalled() {
  return makeInstalledPropulsion({
    deck: buildParametricDeck(DEMO_ENGINE_SPEC),
    engineCount: 2,
    inlet: LONG_PITOT,
    installation: { bleed: { kind: 'coreFraction', fraction: 0.02 }, powerExtraction_W: 60e3 },
    cautionSettings: DEFAULT_CAUTION_SETTINGS,
  });
}

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

  it('adjustPropulsion gives the fuel flow alone of its part-power point, to the bit, and offers it only without a recovery change', () => {
    const base = parametricInstalled();
    const scaled = adjustPropulsion(base, { recoveryDelta: 0, cRam: 1.35, fuelFlowScale: 1.01 });
    const top = base.atRating(cond, 'maxCruise').thrust_N;
    for (const share of [0.3, 0.55, 0.8, 1.2]) {
      expect(scaled.fuelFlowForThrust!(cond, share * top, 'maxCruise')).toBe(scaled.forThrust(cond, share * top, 'maxCruise').fuelFlow_kg_s);
    }
    // With a recovery change the root is re-solved on the adjusted thrust: callers take forThrust's fuel flow.
    expect(adjustPropulsion(base, { recoveryDelta: 0.01, cRam: 1.35, fuelFlowScale: 1 }).fuelFlowForThrust).toBeUndefined();
    expect(adjustPropulsion(analyticPropulsion(engine), { recoveryDelta: 0, cRam: 1.35, fuelFlowScale: 1 }).fuelFlowForThrust).toBeUndefined();
  });

  it('adjustPropulsion builds its model and its points in the installed model\'s key order (one shape for the mission\'s reads)', () => {
    const base = parametricInstalled();
    const scaled = adjustPropulsion(base, { recoveryDelta: 0, cRam: 1.35, fuelFlowScale: 1.01 });
    const raised = adjustPropulsion(base, { recoveryDelta: 0.01, cRam: 1.35, fuelFlowScale: 1 });
    const top = base.atRating(cond, 'maxCruise').thrust_N;
    for (const model of [scaled, raised]) {
      expect(Object.keys(model)).toEqual(Object.keys(base));
      expect(keyOutline(model.atRating(cond, 'maxClimb'))).toEqual(keyOutline(base.atRating(cond, 'maxClimb')));
      expect(keyOutline(model.atPower(cond, 0.6))).toEqual(keyOutline(base.atPower(cond, 0.6)));
      // Within the range (the root), above the rating and below idle: each limit's point has the installed part-power shape.
      for (const share of [0.5, 2, 0.001]) {
        expect(keyOutline(model.forThrust(cond, share * top))).toEqual(keyOutline(base.forThrust(cond, 0.5 * top)));
      }
    }
    // Same numbers as the spread copies before (Raymer's correction at zero recovery change is the base point).
    expect(scaled.atRating(cond, 'maxClimb').thrust_N).toBe(base.atRating(cond, 'maxClimb').thrust_N);
    expect(scaled.atRating(cond, 'maxClimb').perEngine.fuelFlow_kg_s).toBe(base.atRating(cond, 'maxClimb').perEngine.fuelFlow_kg_s * 1.01);
  });
});
