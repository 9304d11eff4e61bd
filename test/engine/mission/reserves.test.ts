import { describe, expect, it } from 'vitest';
import { solveMission } from '../../../engine/mission/solveMission';
import type { Leg, ReservePolicy } from '../../../engine/mission/missionTypes';
import { expectClose } from '../../support/assertInDelta';
import { constantLiftToDragAero, constantTsfcPropulsion } from './support/analyticModels';
import { demoLegs, missionInput } from './support/missionFixtures';
import { demoMissionInput } from './support/demoProject';
import { initialState } from '../../../engine/mission/flyTrip';
import { flyHold } from '../../../engine/mission/holdLeg';
import { S_ALT, S_MASS } from '../../../engine/mission/missionState';
import { HOLD_HEIGHT_M } from '../../../engine/mission/reserves';
import { RESERVE_RULES } from '../../../engine/mission/reserveRules';
import { createFlightLog } from '../../../engine/mission/timeHistoryBuilder';

// With constant L/D and constant TSFC every reserve item has a closed form:
// cruise of distance d at speed V: m1 = m0 exp(-d c g / (V L/D)) (Breguet range);
// any level flight of time t (hold or cruise): m1 = m0 exp(-t c g / (L/D)) (Breguet endurance).
// (Anderson, Aircraft Performance and Design, sections 5.13-5.14.)
const G0 = 9.80665;
const LD = 16;
const C = 1.6e-5;
const H = 11000;
const V = 0.8 * Math.sqrt(1.4 * 287.05287 * 216.65); // ISA 216.65 K above 11 km (U.S. Standard Atmosphere 1976)
const HOLD_FT = 1500 * 0.3048; // ICAO Annex 6 450 m / 14 CFR 121.645 1,500 ft above the aerodrome
const TRIP = 3_000_000;
const TOW = 72000;

const legs: Leg[] = [
  { kind: 'cruise', name: 'cruise', altitude_m: H, speed: { kind: 'mach', mach: 0.8 }, profile: { kind: 'constantAltitude' }, distance_m: TRIP },
];
// The alternate starts and ends at the cruise level (elevation = H - 1,500 ft) so it is a pure cruise.
const alternate = { distance_m: 400_000, cruiseAltitude_m: H, cruiseMach: 0.8, elevation_m: H - HOLD_FT };
// Set arrival allowances so each is a known fuel: missed approach at the destination, approach and landing at the alternate.
const MISSED_KG = 120;
const LANDING_KG = 80;
const arrival = { missedApproach: { time_s: 60, fuel_kg: MISSED_KG }, alternateApproach: { time_s: 300, fuel_kg: LANDING_KG } };

// The destination is placed at the cruise level so the alternate departs level (its holds, 1,500 ft higher, burn
// the same with constant L/D and TSFC).
function fly(reserves: ReservePolicy) {
  return solveMission({
    ...missionInput({
      legs,
      solve: { kind: 'takeoffWeight', takeoffMass_kg: TOW, payload_kg: 10000 },
      reserves,
      aero: constantLiftToDragAero(LD),
      propulsion: constantTsfcPropulsion({ thrust0_N: 400000, tsfc_kg_N_s: C, lapseExponent: 0 }),
    }),
    destinationElevation_m: H,
  });
}
const timeBurn = (m0: number, t: number) => m0 * (1 - Math.exp((-t * C * G0) / LD));
const rangeBurn = (m0: number, d: number) => m0 * (1 - Math.exp((-d * C * G0) / (V * LD)));
const mLanding = TOW - rangeBurn(TOW, TRIP);
const tripFuel = TOW - mLanding;

describe('reserves', () => {
  it('reserves per ICAO Annex 6 Part I 4.3.6.3: 5 % contingency, alternate, 30 min final reserve', () => {
    const r = fly({ preset: 'icaoAnnex6', contingencyFraction: 0.05, minContingency_s: 300, alternate, finalReserve_s: 1800, arrival });
    expect(r.status).toBe('ok');
    // 5 % of trip fuel exceeds 5 min holding here (about 3,000 kg x 5 % vs about 50 kg).
    expectClose(r.reserves.contingency_kg, 0.05 * tripFuel, { rel: 1e-6 }, 'ICAO 4.3.6.3 c) 5 % of trip fuel');
    const afterContingency = mLanding - r.reserves.contingency_kg;
    // ICAO 4.3.6.3 d): alternate fuel = missed approach at the destination + the flight + approach and landing.
    const flight = rangeBurn(afterContingency - MISSED_KG, alternate.distance_m);
    const alt = MISSED_KG + flight + LANDING_KG;
    expectClose(r.reserves.alternate_kg, alt, { rel: 1e-5 }, 'ICAO 4.3.6.3 d) alternate fuel, Breguet range for the flight');
    expect(r.reserves.missedApproach_kg).toBe(MISSED_KG);
    expect(r.reserves.alternateApproach_kg).toBe(LANDING_KG);
    expectClose(r.reserves.finalReserve_kg, timeBurn(afterContingency - alt, 1800), { rel: 1e-6 }, 'ICAO 4.3.6.3 e) 30 min hold');
    expectClose(r.reserves.total_kg, r.reserves.contingency_kg + alt + r.reserves.finalReserve_kg, { rel: 1e-9 }, 'sum');
    expect(r.legs.filter((l) => l.kind === 'reserve').map((l) => l.name)).toEqual([
      'reserve: contingency (ICAO Annex 6 Part I 4.3.6.3 c))',
      'reserve: missed approach at the destination (ICAO Annex 6 Part I 4.3.6.3 d))',
      'reserve: alternate (ICAO Annex 6 Part I 4.3.6.3 d))',
      'reserve: approach and landing at the alternate (ICAO Annex 6 Part I 4.3.6.3 d))',
      'reserve: final reserve hold (ICAO Annex 6 Part I 4.3.6.3 e); interpretation)',
    ]);
  });

  it('reserves per ICAO Annex 6: the 5 min holding minimum wins over a small 5 % of a short trip', () => {
    const r = fly({ preset: 'icaoAnnex6', contingencyFraction: 0.001, minContingency_s: 300, alternate: null, finalReserve_s: 1800 });
    expect(r.status).toBe('ok');
    expectClose(r.reserves.contingency_kg, timeBurn(mLanding, 300), { rel: 1e-6 }, 'ICAO 4.3.6.3 c) 5 min holding at 1,500 ft');
    expect(r.reserves.contingency_kg).toBeGreaterThan(0.001 * tripFuel);
  });

  it('reserves per 14 CFR 121.639: most distant alternate then 45 min at normal cruise consumption', () => {
    const r = fly({ preset: 'cfr121_639', alternate, finalReserve_s: 2700, arrival });
    expect(r.status).toBe('ok');
    expect(r.reserves.contingency_kg).toBe(0);
    // 121.639(b) "to fly to and land at the most distant alternate": missed approach (interpretation), flight, landing.
    const alt = MISSED_KG + rangeBurn(mLanding - MISSED_KG, alternate.distance_m) + LANDING_KG;
    expectClose(r.reserves.alternate_kg, alt, { rel: 1e-5 }, '121.639(b) alternate');
    expect(r.legs.filter((l) => l.kind === 'reserve').map((l) => l.name)).toEqual([
      'reserve: missed approach at the destination (14 CFR 121.639(b); interpretation)',
      'reserve: alternate (14 CFR 121.639(b))',
      'reserve: approach and landing at the alternate (14 CFR 121.639(b))',
      'reserve: final reserve at normal cruise (14 CFR 121.639(c); interpretation)',
    ]);
    expectClose(r.reserves.finalReserve_kg, timeBurn(mLanding - alt, 2700), { rel: 1e-6 }, '121.639(c) 45 min at normal cruise');
  });

  it('reserves per 14 CFR 121.645(b): 10 % of en-route time, alternate, 30 min holding at 1,500 ft', () => {
    const r = fly({ preset: 'cfr121_645', enRouteFraction: 0.1, alternate, finalReserve_s: 1800, arrival });
    expect(r.status).toBe('ok');
    expectClose(r.tripTime_s, TRIP / V, { rel: 1e-9 }, 'en-route time = R / V');
    const enRoute = timeBurn(mLanding, 0.1 * (TRIP / V));
    expectClose(r.reserves.contingency_kg, enRoute, { rel: 1e-6 }, '121.645(b)(2) 10 % of the total time');
    const alt = MISSED_KG + rangeBurn(mLanding - enRoute - MISSED_KG, alternate.distance_m) + LANDING_KG;
    expectClose(r.reserves.alternate_kg, alt, { rel: 1e-5 }, '121.645(b)(3) to fly to and land at the alternate');
    const names = r.legs.filter((l) => l.kind === 'reserve').map((l) => l.name);
    // 121.645(b)(2) says only "to fly for a period of 10 percent of the total time": the row says it is interpreted.
    expect(names[0]).toBe('reserve: 10 % en-route time (14 CFR 121.645(b)(2); interpretation)');
    expect(names).toHaveLength(5);
    expectClose(r.reserves.finalReserve_kg, timeBurn(mLanding - enRoute - alt, 1800), { rel: 1e-6 }, '121.645(b)(4) 30 min hold');
  });

  it('121.645(b) on the demo: the alternate starts at the destination after the en-route time, and the fuel iteration closes', () => {
    // 121.645(b)(3): fuel "to fly to and land at the most distant alternate airport" from the destination: the missed
    // approach and the climb to the alternate's level start on the ground there, not at the cruise level where the
    // en-route time was flown (which made the alternate a function of two descents and the iteration stall).
    const demo = demoMissionInput();
    const input = { ...demo, reserves: { preset: 'cfr121_645' as const, enRouteFraction: 0.1, alternate: demo.reserves.alternate, finalReserve_s: 1800 } };
    const r = solveMission(input);
    expect(r.status).toBe('ok');
    const rows = r.legs.filter((l) => l.kind === 'reserve');
    expectClose(rows[1]!.startAltitude_m, demo.destinationElevation_m ?? 0, { abs: 1e-9 }, 'missed approach at the destination');
    expectClose(rows[2]!.startAltitude_m, demo.destinationElevation_m ?? 0, { abs: 1e-9 }, 'alternate from the destination');
    expect(r.residual_kg).toBeGreaterThanOrEqual(0);
    expect(r.residual_kg).toBeLessThanOrEqual(0.02);
    // The same mission converged into a 1 g band lands on the same block fuel to 1e-6: the residual is a smooth
    // function of the ramp mass (the two stopped 40 passes apart, 2 kg or more apart, before).
    const ref = solveMission(input, { fuelTolerance_kg: 0.001 });
    expect(Math.abs(r.blockFuel_kg - ref.blockFuel_kg) / ref.blockFuel_kg).toBeLessThan(1e-6);
    expect(r.iterations).toBeLessThanOrEqual(5);
  });

  it('reserves custom: contingency fraction, final hold and a fixed extra fuel', () => {
    const r = fly({ preset: 'custom', contingencyFraction: 0.03, alternate: null, finalReserve_s: 1200, extraFuel_kg: 500 });
    expectClose(r.reserves.contingency_kg, 0.03 * tripFuel, { rel: 1e-6 }, 'custom fraction');
    expectClose(r.reserves.finalReserve_kg, timeBurn(mLanding - 0.03 * tripFuel, 1200), { rel: 1e-6 }, 'custom hold');
    expect(r.reserves.extra_kg).toBe(500);
  });

  it('reserves below the policy raise reserve_below_minimum, and not when the fuel suffices', () => {
    const policy: ReservePolicy = { preset: 'custom', contingencyFraction: 0, alternate: null, finalReserve_s: 0, extraFuel_kg: 0 };
    const ok = fly(policy);
    const fuelLeft = ok.landingMass_kg - ok.zeroFuelMass_kg;
    const justEnough = fly({ ...policy, extraFuel_kg: fuelLeft - 1 });
    const tooMuch = fly({ ...policy, extraFuel_kg: fuelLeft + 1 });
    expect(justEnough.cautions.some((c) => c.id === 'reserve_below_minimum')).toBe(false);
    const c = tooMuch.cautions.find((x) => x.id === 'reserve_below_minimum');
    expect(c?.threshold).toBeCloseTo(fuelLeft + 1, 6);
  });

  it('reserves fly the alternate (climb, cruise, descent) over its still-air distance', () => {
    const distance_m = 200 * 1852;
    const r = solveMission(
      missionInput({
        legs: demoLegs(1_500_000),
        solve: { kind: 'takeoffWeight', takeoffMass_kg: 70000, payload_kg: 10000 },
        reserves: { preset: 'icaoAnnex6', contingencyFraction: 0.05, minContingency_s: 300, alternate: { distance_m, cruiseAltitude_m: 7600, cruiseMach: 0.7, elevation_m: 0 }, finalReserve_s: 1800 },
      }),
    );
    expect(r.status).toBe('ok');
    const row = r.legs.find((l) => l.name.startsWith('reserve: alternate ('))!;
    expectClose(row.endDistance_m - row.startDistance_m, distance_m, { rel: 1e-3 }, 'AlternateSpec.distance_m');
    expectClose(row.endAltitude_m, HOLD_FT, { abs: 1e-6 }, 'descends to 1,500 ft above the alternate');
  });

  it('reserves hold 1,500 ft above a destination at elevation, and the alternate departs from it (ICAO Annex 6 4.3.6.3)', () => {
    // Demo project (invented aircraft and deck), destination at 1,200 m. ICAO Annex 6 Part I 4.3.6.3 c): the
    // contingency minimum is 5 min holding at 450 m (1,500 ft) above the DESTINATION; e): the final reserve is held
    // 1,500 ft above the alternate (here at 0 m). A tiny 0.1 % fraction makes the 5 min hold decide the contingency.
    const demo = demoMissionInput();
    const elevation = 1200;
    const input = {
      ...demo,
      destinationElevation_m: elevation,
      reserves: {
        preset: 'icaoAnnex6',
        contingencyFraction: 0.001,
        minContingency_s: 300,
        alternate: { distance_m: 200 * 1852, cruiseAltitude_m: 7620, cruiseMach: 0.7, elevation_m: 0 },
        finalReserve_s: 1800,
      },
    } as const;
    const r = solveMission(input);
    expect(r.status).toBe('ok');
    const byKind = (k: string) => r.legs.filter((l) => l.kind === k);
    expectClose(byKind('approach')[0].endAltitude_m, elevation, { abs: 1e-9 }, 'the approach ends at the destination elevation');
    expectClose(byKind('taxiIn')[0].startAltitude_m, elevation, { abs: 1e-9 }, 'taxi in at the destination');
    expectClose(byKind('taxiIn')[0].endAltitude_m, elevation, { abs: 1e-9 }, 'taxi in at the destination');
    const reserveRows = byKind('reserve');
    const alternateRow = reserveRows.find((l) => l.name.startsWith('reserve: alternate ('))!;
    const missedRow = reserveRows.find((l) => l.name.startsWith('reserve: missed approach'))!;
    expectClose(missedRow.startAltitude_m, elevation, { abs: 1e-9 }, 'the missed approach is flown at the destination');
    expectClose(alternateRow.startAltitude_m, elevation, { abs: 1e-9 }, 'the alternate departs from the destination');
    expectClose(alternateRow.endAltitude_m, HOLD_FT, { abs: 1e-6 }, 'descends to 1,500 ft above the alternate');
    const finalRow = reserveRows.find((l) => l.name.startsWith('reserve: final reserve hold'))!;
    expectClose(finalRow.endAltitude_m, HOLD_FT, { abs: 1e-9 }, 'ICAO 4.3.6.3 e) 1,500 ft above the alternate');
    // The contingency equals a 5 min best-endurance hold at elevation + 1,500 ft from the landing mass, ISA, still air.
    const holdFuel = (altitude_m: number) => {
      const ctx = { input, options: { stepScale: 1, allowNegativeFuel: true }, zeroFuelMass_kg: r.zeroFuelMass_kg, log: createFlightLog(input.airframe, input.cautionSettings, true) };
      const start = initialState(r.landingMass_kg);
      start[S_ALT] = altitude_m;
      const target = { legIndex: -1, legName: 'check', env: { isaDev_K: 0, wind_m_s: 0 }, recordHistory: false };
      // The reserves' default hold speed: best endurance at 1.1 x the minimum-drag speed (reserveRules.ts).
      return r.landingMass_kg - flyHold(ctx, target, start, altitude_m, 300, { kind: 'bestEndurance', speedFactor: 1.1 }).state[S_MASS];
    };
    expectClose(HOLD_HEIGHT_M, HOLD_FT, { abs: 1e-12 }, '1,500 ft = 457.2 m');
    expectClose(r.reserves.contingency_kg, holdFuel(elevation + HOLD_HEIGHT_M), { rel: 1e-9 }, 'ICAO 4.3.6.3 c) 5 min at 1,500 ft above the destination');
    // Not the hold 1,500 ft above sea level: a jet burns visibly more lower down (common practice).
    expect(holdFuel(HOLD_HEIGHT_M) - r.reserves.contingency_kg).toBeGreaterThan(0.5);
  });

  it('RESERVE_RULES quote each rule and mark where the flying interprets it', () => {
    // Rule texts (from memory): 14 CFR 121.645(b)(2) "to fly for a period of 10 percent of the total time required to
    // fly from the airport of departure to, and land at, the airport to which it was released" - no fuel-consumption
    // words, so flying it at normal cruise must be labelled an interpretation; 121.639(c) does say "normal cruising
    // fuel consumption"; ICAO Annex 6 alternate fuel names the missed approach and the approach and landing.
    const b2 = RESERVE_RULES.cfr121_645.items.find((i) => i.item === 'enRouteTime')!;
    expect(RESERVE_RULES.cfr121_645.quotation).toContain('10 percent of the total time');
    expect(RESERVE_RULES.cfr121_645.quotation).not.toMatch(/10 percent[^;]*normal cruising/);
    expect(b2.paragraph).toBe('14 CFR 121.645(b)(2)');
    expect(b2.interpretation).toMatch(/interpretation/);
    expect(RESERVE_RULES.cfr121_639.quotation).toContain('45 minutes at normal cruising fuel consumption');
    expect(RESERVE_RULES.icaoAnnex6.quotation).toContain('missed approach at the destination aerodrome');
    expect(RESERVE_RULES.icaoAnnex6.quotation).toContain('approach and landing at the destination alternate aerodrome');
    for (const rule of Object.values(RESERVE_RULES)) {
      expect(rule.items.map((i) => i.item)).toContain('finalReserve');
      if (rule.preset !== 'custom') expect(rule.quotation).toMatch(/from memory/);
    }
  });

  it('reserves default the arrival allowances to the mission\'s take-off and approach allowances (common practice)', () => {
    const demo = demoMissionInput();
    const r = solveMission(demo);
    expect(r.status).toBe('ok');
    const takeoff = r.legs.find((l) => l.kind === 'takeoff')!;
    const approach = r.legs.find((l) => l.kind === 'approach')!;
    const missed = r.legs.find((l) => l.name.startsWith('reserve: missed approach'))!;
    const landing = r.legs.find((l) => l.name.startsWith('reserve: approach and landing'))!;
    // The demo sets 150 lb for each (fixtures/demo/demo.blockwise.json).
    expectClose(missed.fuel_kg, takeoff.fuel_kg, { rel: 1e-12 }, 'missed approach = take-off allowance');
    expectClose(landing.fuel_kg, approach.fuel_kg, { rel: 1e-12 }, 'approach and landing = the approach allowance');
    expectClose(r.reserves.alternate_kg, r.legs.filter((l) => l.kind === 'reserve' && /missed approach|alternate/.test(l.name)).reduce((t, l) => t + l.fuel_kg, 0), { rel: 1e-12 }, 'alternate fuel = its three rows');
    expectClose(landing.endAltitude_m, demo.reserves.alternate!.elevation_m, { abs: 1e-9 }, 'lands at the alternate elevation');
  });
});
