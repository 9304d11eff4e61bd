import { describe, expect, it } from 'vitest';
import { energyShareFactor } from '../../../engine/mission/energyShareFactor';
import { heldCasMach, machOfCas, missionAir } from '../../../engine/mission/missionAtmosphere';
import { MODEL_TRACKS, stageTrack } from '../../../engine/mission/stageMemo';
import { constantTsfcPropulsion } from './support/analyticModels';
import { KT } from './support/missionFixtures';

const model = () => constantTsfcPropulsion({ thrust0_N: 240000, tsfc_kg_N_s: 1.7e-5, lapseExponent: 0.75 });

describe('stageMemo', () => {
  it('stageTrack answers as the direct computation at every altitude, asked in any order and again', () => {
    // The direct computation: missionAir (ISA, 1976), the held CAS's Mach (NACA Report 1135 through machOfCas),
    // the energy share factor and the model's rated point, each worked out afresh.
    const propulsion = model();
    const cas = 290 * KT;
    const track = stageTrack(propulsion, 'cas', cas, 10, 'maxClimb');
    const altitudes = [0, 3048, 7620.5, 10999.9, 11000, 9000, 0, 3048, -0];
    for (const h of altitudes) {
      const air = missionAir(h, 10);
      const mach = machOfCas(cas, air.pressure_Pa);
      const got = track.at(h);
      expect(got.air).toEqual(air);
      expect(got.mach).toBe(mach);
      expect(got.mach).toBe(heldCasMach(cas)(air.pressure_Pa));
      expect(got.factor).toBe(energyShareFactor('cas', mach, air.lapse_K_m, air.temperature_K, air.isaTemperature_K));
      expect(got.engine).toStrictEqual(propulsion.atRating({ altitude_m: h, mach, isaDev_K: 10 }, 'maxClimb'));
    }
    const mach = stageTrack(propulsion, 'mach', 0.78, 0, null).at(11500);
    expect(mach.mach).toBe(0.78);
    expect(mach.engine).toBeNull();
  });

  it('stageTrack keeps one track per model and exact five, -0 apart from 0, and stays right past its bounds', () => {
    const a = model();
    const b = model();
    const t = stageTrack(a, 'cas', 150, 0, 'flightIdle');
    expect(stageTrack(a, 'cas', 150, 0, 'flightIdle')).toBe(t);
    expect(stageTrack(b, 'cas', 150, 0, 'flightIdle')).not.toBe(t);
    expect(stageTrack(a, 'cas', 150, -0, 'flightIdle')).not.toBe(t);
    expect(stageTrack(a, 'cas', 150 + 1e-13, 0, 'flightIdle')).not.toBe(t);
    expect(stageTrack(a, 'mach', 150, 0, 'flightIdle')).not.toBe(t);
    expect(stageTrack(a, 'cas', 150, 0, null)).not.toBe(t);
    // More tracks than a model keeps, and a track of 2 altitudes asked for 5: the answers are the direct ones.
    for (let i = 0; i <= MODEL_TRACKS + 3; i++) stageTrack(a, 'cas', 100 + i, 0, 'maxClimb');
    const small = stageTrack(a, 'cas', 150, 0, 'maxClimb', 2);
    for (const h of [0, 1000, 2000, 0, 3000, 1000]) {
      const air = missionAir(h, 0);
      expect(small.at(h).mach).toBe(machOfCas(150, air.pressure_Pa));
      expect(small.size).toBeLessThanOrEqual(2);
    }
  });
});
