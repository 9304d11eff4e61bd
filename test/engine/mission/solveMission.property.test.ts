import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MISSION_STATUSES } from '../../../engine/mission/missionStatus';
import { solveMission } from '../../../engine/mission/solveMission';
import type { Leg, MissionStatus, ReservePolicy, SolveMode } from '../../../engine/mission/missionTypes';
import { constantTsfcPropulsion, parabolicAero } from './support/analyticModels';
import { FT, KT, missionInput, TEST_AIRFRAME } from './support/missionFixtures';

// Every status except the solver's own fault.
const STATUSES: readonly MissionStatus[] = MISSION_STATUSES.filter((s) => s !== 'internal_error');

function allNumbers(value: unknown, path: string, out: [string, number][]): void {
  if (typeof value === 'number') out.push([path, value]);
  else if (value instanceof Float64Array || value instanceof Int32Array) value.forEach((v, i) => out.push([`${path}[${i}]`, v]));
  else if (Array.isArray(value)) value.forEach((v, i) => allNumbers(v, `${path}[${i}]`, out));
  else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) allNumbers(v, `${path}.${k}`, out);
}

const missionArb = fc.record({
  cruiseFt: fc.integer({ min: 20000, max: 43000 }),
  mach: fc.double({ min: 0.5, max: 0.85, noNaN: true }),
  cruise_m: fc.double({ min: 0, max: 6e6, noNaN: true }),
  solveKind: fc.constantFrom('takeoffWeight', 'payloadRange', 'maxRange'),
  tow: fc.double({ min: 45000, max: 85000, noNaN: true }),
  payload: fc.double({ min: 0, max: 20000, noNaN: true }),
  isaDev: fc.double({ min: -30, max: 30, noNaN: true }),
  wind: fc.double({ min: -60, max: 60, noNaN: true }),
  thrust0: fc.double({ min: 80000, max: 400000, noNaN: true }),
  preset: fc.constantFrom('icaoAnnex6', 'cfr121_639', 'cfr121_645', 'custom'),
  withAlternate: fc.boolean(),
  descentRate: fc.option(fc.double({ min: 3, max: 30, noNaN: true }), { nil: null }),
  profile: fc.constantFrom('constantAltitude', 'stepClimb', 'cruiseClimb'),
  speed: fc.constantFrom('mach', 'bestRange', 'longRange'),
});

describe('solveMission properties', () => {
  it('solveMission never returns NaN and always ends with a known status for plausible inputs', () => {
    fc.assert(
      fc.property(missionArb, (p) => {
        const cruiseAlt = p.cruiseFt * FT;
        const schedule = { lowCas_m_s: 250 * KT, lowAltitudeLimit_m: 10000 * FT, cas_m_s: 290 * KT, mach: p.mach };
        const legs: Leg[] = [
          { kind: 'taxiOut', name: 'taxi out', time_s: 600, fuelFlow_kg_s: 'idle' },
          { kind: 'takeoff', name: 'take-off', fuel_kg: null, time_s: 60 },
          { kind: 'climb', name: 'climb', toAltitude_m: cruiseAlt, schedule, rating: 'maxClimb' },
          {
            kind: 'cruise',
            name: 'cruise',
            altitude_m: cruiseAlt,
            speed: p.speed === 'mach' ? { kind: 'mach', mach: p.mach } : { kind: p.speed },
            profile:
              p.profile === 'stepClimb'
                ? { kind: 'stepClimb', step_m: 2000 * FT, maxAltitude_m: 43000 * FT }
                : p.profile === 'cruiseClimb'
                  ? { kind: 'cruiseClimb', maxAltitude_m: 43000 * FT }
                  : { kind: 'constantAltitude' },
            distance_m: p.solveKind === 'takeoffWeight' ? p.cruise_m : null,
          },
          { kind: 'descent', name: 'descent', toAltitude_m: 1500 * FT, schedule, mode: p.descentRate === null ? { kind: 'idle' } : { kind: 'rate', rate_m_s: p.descentRate } },
          { kind: 'hold', name: 'hold', altitude_m: 1500 * FT, time_s: 300, speed: { kind: 'bestEndurance' } },
          { kind: 'approach', name: 'approach', time_s: 240, fuel_kg: null },
          { kind: 'taxiIn', name: 'taxi in', time_s: 300, fuelFlow_kg_s: 'idle' },
        ];
        const alternate = p.withAlternate ? { distance_m: 300e3, cruiseAltitude_m: 25000 * FT, cruiseMach: 0.7, elevation_m: 100 } : null;
        const reserves: ReservePolicy =
          p.preset === 'icaoAnnex6'
            ? { preset: 'icaoAnnex6', contingencyFraction: 0.05, minContingency_s: 300, alternate, finalReserve_s: 1800 }
            : p.preset === 'cfr121_639'
              ? { preset: 'cfr121_639', alternate, finalReserve_s: 2700 }
              : p.preset === 'cfr121_645'
                ? { preset: 'cfr121_645', enRouteFraction: 0.1, alternate, finalReserve_s: 1800 }
                : { preset: 'custom', contingencyFraction: 0.03, alternate, finalReserve_s: 1800, extraFuel_kg: 100 };
        const solve: SolveMode =
          p.solveKind === 'takeoffWeight'
            ? { kind: 'takeoffWeight', takeoffMass_kg: p.tow, payload_kg: p.payload }
            : p.solveKind === 'payloadRange'
              ? { kind: 'payloadRange', payload_kg: p.payload, range_m: Math.max(p.cruise_m, 400e3) }
              : { kind: 'maxRange', payload_kg: p.payload };
        const r = solveMission(
          missionInput({
            legs,
            solve,
            reserves,
            isaDev_K: p.isaDev,
            wind_m_s: p.wind,
            aero: parabolicAero(0.022, 0.045, { wingArea_m2: 120, clMax: 1.4, buffetCl: 0.9 }),
            propulsion: constantTsfcPropulsion({ thrust0_N: p.thrust0, tsfc_kg_N_s: 1.7e-5, lapseExponent: 0.75 }),
            airframe: TEST_AIRFRAME,
          }),
        );
        expect(STATUSES).toContain(r.status);
        if (r.status !== 'ok') expect(r.statusMessage.length).toBeGreaterThan(0);
        const numbers: [string, number][] = [];
        allNumbers(r, 'result', numbers);
        for (const [path, v] of numbers) expect(Number.isFinite(v), path).toBe(true);
      }),
      { numRuns: 24, seed: 20261202 },
    );
    // Generous limit for a shared, loaded machine: this is not a speed check (speed lives in `npm run bench`).
  }, 300_000);
});
