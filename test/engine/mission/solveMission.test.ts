import { describe, expect, it } from 'vitest';
import { FUEL_TOLERANCE_KG } from '../../../engine/mission/fuelIteration';
import { solveMission } from '../../../engine/mission/solveMission';
import type { Leg, MissionInput, MissionResult } from '../../../engine/mission/missionTypes';
import { expectClose } from '../../support/assertInDelta';
import { constantLiftToDragAero, constantTsfcPropulsion } from './support/analyticModels';
import { demoMissionInput } from './support/demoProject';
import { demoLegs, FT, KT, missionInput, NO_RESERVES, TEST_AIRFRAME } from './support/missionFixtures';

const G0 = 9.80665;
// ISA above 11 km: T = 216.65 K (U.S. Standard Atmosphere 1976).
const A_11KM = Math.sqrt(1.4 * 287.05287 * 216.65);
const LD = 16;
const TSFC = 1.6e-5;
const breguetAero = constantLiftToDragAero(LD);
const breguetEngines = constantTsfcPropulsion({ thrust0_N: 400000, tsfc_kg_N_s: TSFC, lapseExponent: 0 });

function cruiseOnly(distance_m: number | null, mach = 0.8): Leg[] {
  return [
    {
      kind: 'cruise',
      name: 'cruise',
      altitude_m: 11000,
      speed: { kind: 'mach', mach },
      profile: { kind: 'constantAltitude' },
      distance_m,
    },
  ];
}

function expectNoNaN(r: MissionResult): void {
  for (const [k, v] of Object.entries(r)) if (typeof v === 'number') expect(Number.isFinite(v), k).toBe(true);
}

describe('solveMission', () => {
  it('solveMission flies a constant-L/D, constant-TSFC cruise as the Breguet range equation predicts', () => {
    // Breguet range for jets: R = (V / (c g)) (L/D) ln(W0/W1) (Anderson, Aircraft Performance and Design, eq. 5.155 form).
    const R = 3_000_000;
    const w0 = 70000;
    const r = solveMission(
      missionInput({ legs: cruiseOnly(R), solve: { kind: 'takeoffWeight', takeoffMass_kg: w0, payload_kg: 10000 }, aero: breguetAero, propulsion: breguetEngines }),
    );
    expect(r.status).toBe('ok');
    const V = 0.8 * A_11KM;
    const w1 = w0 * Math.exp(-(R * TSFC * G0) / (V * LD));
    expectClose(r.tripFuel_kg, w0 - w1, { rel: 0.001 }, 'Breguet range equation, within 0.1 %');
    expectClose(r.tripFuel_kg, w0 - w1, { rel: 1e-7 }, 'Breguet range equation (RK4 is in fact far tighter)');
    expectClose(r.tripTime_s, R / V, { rel: 1e-9 }, 'time = R / V at constant Mach');
    expectClose(r.airDistance_m, R, { abs: 1e-3 }, 'distance event stops the leg exactly');
  });

  it('solveMission in payloadRange mode lands with exactly the reserve and matches the closed form', () => {
    // Closed form with constant L/D and TSFC: final reserve hold of t_h seconds from landing mass mL leaves
    // ZFW = mL exp(-c g t_h / (L/D)) (Breguet endurance, Anderson eq. 5.130 form); the cruise gives
    // TOW = mL exp(R c g / (V L/D)) (Breguet range).
    const R = 2_500_000;
    const hold = 1800;
    const zfw = TEST_AIRFRAME.oew_kg + 12000;
    const r = solveMission(
      missionInput({
        legs: cruiseOnly(null),
        solve: { kind: 'payloadRange', payload_kg: 12000, range_m: R },
        aero: breguetAero,
        propulsion: breguetEngines,
        reserves: { preset: 'custom', contingencyFraction: 0, alternate: null, finalReserve_s: hold, extraFuel_kg: 0 },
      }),
    );
    expect(r.status).toBe('ok');
    const mL = zfw * Math.exp((TSFC * G0 * hold) / LD);
    const tow = mL * Math.exp((R * TSFC * G0) / (0.8 * A_11KM * LD));
    expectClose(r.landingMass_kg, mL, { abs: 0.2 }, 'closed-form landing mass');
    expectClose(r.takeoffMass_kg, tow, { abs: 0.2 }, 'closed-form take-off mass');
    expectClose(r.landingMass_kg - r.zeroFuelMass_kg, r.reserveFuel_kg, { abs: 0.1 }, 'lands with exactly the reserve (0.1 kg tolerance)');
    expect(Math.abs(r.residual_kg)).toBeLessThanOrEqual(0.1);
    expectClose(r.airDistance_m, R, { abs: 1 }, 'still-air distance equals the range');
    // The first guess's closed forms (rampMassGuess.ts) are the Breguet range equation itself on this aircraft, so
    // the first pass may already land in the band; the iteration flies at least that pass and needs no more than two.
    expect(r.iterations).toBeGreaterThanOrEqual(1);
    expect(r.iterations).toBeLessThanOrEqual(2);
  });

  it('solveMission converges on the demo-like mission in payloadRange mode with ICAO reserves', () => {
    const r = solveMission(
      missionInput({
        legs: demoLegs(null),
        solve: { kind: 'payloadRange', payload_kg: 10000, range_m: 3000 * 1852 },
        reserves: {
          preset: 'icaoAnnex6',
          contingencyFraction: 0.05,
          minContingency_s: 300,
          alternate: { distance_m: 200 * 1852, cruiseAltitude_m: 25000 * FT, cruiseMach: 0.7, elevation_m: 0 },
          finalReserve_s: 1800,
        },
      }),
    );
    expect(r.status).toBe('ok');
    expectNoNaN(r);
    expectClose(r.airDistance_m, 3000 * 1852, { abs: 1 }, 'range is matched in still air');
    // Lands with the reserve on board: the definition of the payloadRange mode.
    expectClose(r.landingMass_kg - r.zeroFuelMass_kg, r.reserveFuel_kg, { abs: 0.1 }, 'landing fuel = reserve');
    expect(r.blockFuel_kg).toBeGreaterThan(r.tripFuel_kg);
    // ICAO Annex 6 with an alternate: contingency, missed approach, alternate, approach and landing, final reserve.
    expect(r.legs.filter((l) => l.kind === 'reserve').length).toBe(5);
    expect(r.history.time_s.length).toBeGreaterThan(20);
    expect(r.history.legIndex.length).toBe(r.history.time_s.length);
  });

  it('solveMission block fuel changes by less than 0.05 % when every step is halved', () => {
    // Convergence requirement of DESIGN.md section 8; RK4 global error falls as h^4.
    const input = missionInput({
      legs: demoLegs(null),
      solve: { kind: 'payloadRange', payload_kg: 10000, range_m: 2500 * 1852 },
      reserves: { preset: 'icaoAnnex6', contingencyFraction: 0.05, minContingency_s: 300, alternate: null, finalReserve_s: 1800 },
      isaDev_K: 10,
      wind_m_s: -15,
    });
    const coarse = solveMission(input);
    const fine = solveMission(input, { stepScale: 0.5 });
    expect(coarse.status).toBe('ok');
    expect(fine.status).toBe('ok');
    const change = Math.abs(coarse.blockFuel_kg - fine.blockFuel_kg) / fine.blockFuel_kg;
    expect(change).toBeLessThan(0.0005);
  });

  it('solveMission in payloadRange mode meets the range when a step climb is due near the top of descent', () => {
    // Definition of the payloadRange mode: still-air distance = range (1 m), landing fuel = reserve (0 to FUEL_TOLERANCE_KG).
    // The demo project (invented aircraft and deck) steps from 33,000 ft to 41,000 ft; at 1,000 to 1,600 NM a step
    // is due shortly before the top of descent. The leg's end cuts such a step, so the residual stays continuous
    // in the ramp mass and the secant iteration (Burden & Faires, Numerical Analysis, 2.3) converges in a few
    // passes (it ran to 40 passes and 7 to 68 km past the range when the step overshot the end).
    const demo = demoMissionInput();
    let cutSteps = 0;
    for (let nm = 1000; nm <= 1600; nm += 150) {
      const r = solveMission({ ...demo, solve: { kind: 'payloadRange', payload_kg: demo.solve.payload_kg, range_m: nm * 1852 } });
      expect(r.status, `${nm} NM`).toBe('ok');
      expect(r.iterations, `${nm} NM`).toBeLessThanOrEqual(10);
      expectClose(r.airDistance_m, nm * 1852, { abs: 1 }, `${nm} NM: still-air distance equals the range`);
      expect(r.residual_kg).toBeGreaterThanOrEqual(0);
      expect(r.residual_kg).toBeLessThanOrEqual(FUEL_TOLERANCE_KG);
      const cruise = r.legs.find((l) => l.kind === 'cruise')!;
      if (Math.abs(cruise.endAltitude_m / FT - Math.round(cruise.endAltitude_m / FT / 2000) * 2000) > 10) cutSteps++;
    }
    // Not a vacuous sweep: the cruise ends part-way through a step at some of these ranges.
    expect(cutSteps).toBeGreaterThan(0);
  });

  it('solveMission ends the demo trip at the destination elevation: the project one, sea level when absent, or a given one', () => {
    // The demo's descent ends at its own altitude; the approach allowance then descends to the destination aerodrome and
    // taxi in is flown there (docs/mission.md). The time history's last samples sit on the aerodrome too.
    const demo = demoMissionInput();
    const descentLeg = demo.legs.find((l) => l.kind === 'descent')!;
    const descentTo = descentLeg.kind === 'descent' ? descentLeg.toAltitude_m : Number.NaN;
    const alternateElevation = demo.reserves.alternate?.elevation_m ?? Number.NaN;
    const { destinationElevation_m: _, ...withoutElevation } = demo;
    const cases: [MissionInput, number][] = [
      [demo, demo.destinationElevation_m ?? 0],
      [withoutElevation, 0],
      [{ ...demo, destinationElevation_m: 350 }, 350],
    ];
    for (const [input, expected] of cases) {
      const r = solveMission(input);
      expect(r.status).toBe('ok');
      const descent = r.legs.find((l) => l.kind === 'descent')!;
      const approach = r.legs.find((l) => l.kind === 'approach')!;
      const taxiIn = r.legs.find((l) => l.kind === 'taxiIn')!;
      expectClose(descent.endAltitude_m, descentTo, { abs: 1e-6 }, 'descent ends at its own altitude');
      expectClose(approach.startAltitude_m, descentTo, { abs: 1e-6 }, 'approach starts where the descent ends');
      expectClose(approach.endAltitude_m, expected, { abs: 1e-9 }, 'approach ends at the destination elevation');
      expectClose(taxiIn.endAltitude_m, expected, { abs: 1e-9 }, 'taxi in at the destination elevation');
      const h = r.history.altitude_m;
      expectClose(h[h.length - 1], expected, { abs: 1e-9 }, 'last history sample on the aerodrome');
      // ICAO Annex 6 4.3.6.3 e): the final reserve is held 1,500 ft above the alternate.
      expectClose(r.legs.find((l) => l.name.startsWith('reserve: final reserve hold'))!.endAltitude_m, alternateElevation + 1500 * FT, { abs: 1e-6 }, 'final hold');
    }
  });

  it('solveMission says infeasible, naming destinationElevation_m, for an elevation that is not finite or out of range', () => {
    const demo = demoMissionInput();
    for (const bad of [Number.NaN, 40000]) {
      const r = solveMission({ ...demo, destinationElevation_m: bad });
      expect(r.status).toBe('infeasible');
      expect(r.statusMessage).toContain('destinationElevation_m');
    }
  });

  it('solveMission in maxRange mode fills to MTOW or fuel capacity and lands with the reserve', () => {
    const r = solveMission(
      missionInput({
        legs: demoLegs(null),
        solve: { kind: 'maxRange', payload_kg: 10000 },
        reserves: { preset: 'custom', contingencyFraction: 0.05, alternate: null, finalReserve_s: 1800, extraFuel_kg: 200 },
      }),
    );
    expect(r.status).toBe('ok');
    const fuelLimited = Math.min(TEST_AIRFRAME.mtow_kg, r.zeroFuelMass_kg + TEST_AIRFRAME.maxFuel_kg - (r.rampMass_kg - r.takeoffMass_kg));
    expectClose(r.takeoffMass_kg, fuelLimited, { abs: 1e-6 }, 'TOW = min(MTOW, ZFW + capacity - taxi fuel)');
    expectClose(r.landingMass_kg - r.zeroFuelMass_kg, r.reserveFuel_kg, { abs: 0.1 }, 'landing fuel = reserve');
    expect(r.reserves.extra_kg).toBe(200);
  });

  it('solveMission in a still-air study applies the wind to the ground distance only, and says so', () => {
    const solve = { kind: 'takeoffWeight', takeoffMass_kg: 70000, payload_kg: 10000 } as const;
    const still = solveMission({ ...missionInput({ legs: cruiseOnly(1_000_000), solve }), distanceBasis: 'stillAir' });
    const windy = solveMission({ ...missionInput({ legs: cruiseOnly(1_000_000), solve, wind_m_s: -30 }), distanceBasis: 'stillAir' });
    expectClose(windy.airDistance_m, still.airDistance_m, { abs: 1e-3 }, 'still-air distance unchanged by wind');
    // ground = air + wind * time (definition of an along-track wind).
    expectClose(windy.groundDistance_m, windy.airDistance_m - 30 * windy.tripTime_s, { rel: 1e-9 }, 'ground distance = air distance + wind x time');
    expectClose(windy.tripFuel_kg, still.tripFuel_kg, { rel: 1e-9 }, 'fuel is flown in the air mass');
    expect(windy.distanceBasis).toBe('stillAir');
    expect(windy.cautions.some((c) => c.id === 'still_air_distances')).toBe(true);
  });

  it('solveMission flies a set cruise distance over the ground: Breguet range with the ground speed', () => {
    // Constant L/D, TSFC and TAS in a steady along-track wind w: dx/dt = V + w and dm/dt = -c m g / (L/D), so
    // x = ((V + w) / (c g)) (L/D) ln(W0/W1): the Breguet range equation with the ground speed (closed form;
    // Anderson, Aircraft Performance and Design, section 5.13, with V replaced by V + w).
    const R = 2_000_000;
    const w0 = 70000;
    const V = 0.8 * A_11KM;
    const solve = { kind: 'takeoffWeight', takeoffMass_kg: w0, payload_kg: 10000 } as const;
    for (const wind of [-50, 0, 40]) {
      const r = solveMission(missionInput({ legs: cruiseOnly(R), solve, aero: breguetAero, propulsion: breguetEngines, wind_m_s: wind }));
      expect(r.status).toBe('ok');
      expect(r.distanceBasis).toBe('ground');
      const w1 = w0 * Math.exp(-(R * TSFC * G0) / ((V + wind) * LD));
      expectClose(r.tripFuel_kg, w0 - w1, { rel: 1e-7 }, `Breguet range with ground speed V + w, w = ${wind} m/s`);
      expectClose(r.groundDistance_m, R, { abs: 1e-3 }, 'the set distance is a ground distance');
      expectClose(r.airDistance_m, (R * V) / (V + wind), { rel: 1e-9 }, 'air distance = ground distance x V / (V + w)');
      expectClose(r.tripTime_s, R / (V + wind), { rel: 1e-9 }, 'time = ground distance / ground speed');
    }
  });

  it('solveMission takes the leg wind and ISA deviation over the mission ones', () => {
    const leg = (extra: object): Leg[] => [{ ...cruiseOnly(1_000_000)[0], ...extra } as Leg];
    const solve = { kind: 'takeoffWeight', takeoffMass_kg: 70000, payload_kg: 10000 } as const;
    const own = solveMission(missionInput({ legs: leg({ wind_m_s: 25, isaDev_K: 12 }), solve, wind_m_s: -40, isaDev_K: -5 }));
    const mission = solveMission(missionInput({ legs: leg({}), solve, wind_m_s: 25, isaDev_K: 12 }));
    expectClose(own.airDistance_m, mission.airDistance_m, { rel: 1e-12 }, 'leg wind wins');
    expectClose(own.tripFuel_kg, mission.tripFuel_kg, { rel: 1e-12 }, 'leg ISA deviation wins');
    // ISA+12 at constant Mach: TAS scales with sqrt(T) (definition of TAS = M a); 1,000 km over the ground take
    // 1,000 km / (TAS + wind).
    const isa = solveMission(missionInput({ legs: leg({}), solve }));
    const vIsa = 0.8 * A_11KM;
    const vHot = vIsa * Math.sqrt((216.65 + 12) / 216.65);
    expectClose(isa.tripTime_s / own.tripTime_s, (vHot + 25) / vIsa, { rel: 1e-9 }, 'TAS = M sqrt(kappa R T), time = distance / ground speed');
  });

  it('solveMission reports that no fuel load can close the mission instead of returning a number', () => {
    // Fuel flow c*D = b (m - m_f)^2 makes the landing mass saturate at m_f + 1/(b T) below the zero-fuel mass:
    // no ramp mass lands with the reserve, so the iteration must say so instead of returning a number.
    const b = 5e-8;
    const mFloor = 40000;
    const tsfc = 1e-5;
    const aero = {
      ...constantLiftToDragAero(16),
      drag: (q: { altitude_m: number; mach: number; mass_kg: number; loadFactor: number }) => {
        const base = constantLiftToDragAero(16).drag(q);
        const u = Math.max(q.mass_kg - mFloor, 0);
        return { ...base, drag_N: (b * u * u) / tsfc };
      },
    };
    const r = solveMission(
      missionInput({
        legs: [...cruiseOnly(null), { kind: 'hold', name: 'hold', altitude_m: 11000, time_s: 3600, speed: { kind: 'cas', cas_m_s: 250 * KT } }],
        solve: { kind: 'payloadRange', payload_kg: 10000, range_m: 0 },
        aero,
        propulsion: constantTsfcPropulsion({ thrust0_N: 1e9, tsfc_kg_N_s: tsfc, lapseExponent: 0 }),
      }),
    );
    // Near the saturation mass the drag falls below idle thrust, so a pass burns idle fuel flow (6e3 N x 1e-5
    // kg/(N s) per N of the 1e9 N engine) and runs out of mass long before the hour's hold ends: the first pass
    // already shows that the fuel needed is far above any fuel carried (the mission domain's mass floor).
    expect(r.status).toBe('fuel_exhausted');
    expect(r.statusMessage).toMatch(/Fuel exhausted in the hold on hold/);
    expect(Number.isFinite(r.residual_kg)).toBe(true);
    expect(Math.abs(r.residual_kg)).toBeGreaterThan(0.1);
  });

  it('solveMission says infeasible, naming the field, for bad input', () => {
    const r = solveMission(missionInput({ legs: cruiseOnly(Number.NaN), solve: { kind: 'takeoffWeight', takeoffMass_kg: 70000, payload_kg: 0 } }));
    expect(r.status).toBe('infeasible');
    expect(r.statusMessage).toContain('legs[0] (cruise).distance_m');
    const noLeg = solveMission(missionInput({ legs: demoLegs(1000), solve: { kind: 'payloadRange', payload_kg: 1000, range_m: 1e6 } }));
    expect(noLeg.status).toBe('infeasible');
    expect(noLeg.statusMessage).toContain('distance_m null');
    expectNoNaN(noLeg);
  });

  it('solveMission says infeasible when the range is shorter than the climb and descent', () => {
    const r = solveMission(missionInput({ legs: demoLegs(null), solve: { kind: 'payloadRange', payload_kg: 10000, range_m: 50_000 } }));
    expect(r.status).toBe('infeasible');
    expect(r.statusMessage).toMatch(/shorter than the other legs/);
    expectNoNaN(r);
  });

  it('solveMission in maxRange mode says infeasible when the reserve cannot be carried at all', () => {
    // Payload so large that MTOW leaves 300 kg of fuel, less than the 30 min final reserve needs.
    const r = solveMission(
      missionInput({
        legs: demoLegs(null),
        solve: { kind: 'maxRange', payload_kg: TEST_AIRFRAME.mtow_kg - TEST_AIRFRAME.oew_kg - 300 },
        reserves: { preset: 'custom', contingencyFraction: 0, alternate: null, finalReserve_s: 1800, extraFuel_kg: 0 },
      }),
    );
    expect(r.status).toBe('infeasible');
    expect(r.statusMessage).toMatch(/cannot be carried/);
    expect(r.residual_kg).toBeLessThan(0);
    expectNoNaN(r);
  });

  it('solveMission history runs leg by leg: leg index never decreases', () => {
    const r = solveMission(
      missionInput({
        legs: demoLegs(null),
        solve: { kind: 'payloadRange', payload_kg: 8000, range_m: 2_000_000 },
        reserves: { preset: 'custom', contingencyFraction: 0.05, alternate: null, finalReserve_s: 1800, extraFuel_kg: 0 },
      }),
    );
    expect(r.status).toBe('ok');
    for (let i = 1; i < r.history.legIndex.length; i++) expect(r.history.legIndex[i]).toBeGreaterThanOrEqual(r.history.legIndex[i - 1]);
    expect(new Set(r.history.legIndex).size).toBe(r.legs.filter((l) => l.kind !== 'reserve').length);
  });

  it('solveMission in payloadRange mode with no reserve runs out taxiing in (the reserve is what lands)', () => {
    // The mode lands with exactly the reserve; taxi-in fuel comes out of it, so a zero reserve cannot taxi in.
    const r = solveMission(missionInput({ legs: demoLegs(null), solve: { kind: 'payloadRange', payload_kg: 8000, range_m: 2_000_000 } }));
    expect(r.status).toBe('fuel_exhausted');
    const flown = r.legs.filter((l) => l.kind !== 'reserve');
    expect(flown[flown.length - 1].kind).toBe('taxiIn');
    expect(r.statusMessage).toMatch(/taxi in/);
  });

  it('solveMission reports fuel_exhausted when the fuel runs out', () => {
    const r = solveMission(
      missionInput({ legs: cruiseOnly(20_000_000), solve: { kind: 'takeoffWeight', takeoffMass_kg: 60000, payload_kg: 10000 }, aero: breguetAero, propulsion: breguetEngines }),
    );
    expect(r.status).toBe('fuel_exhausted');
    expectClose(r.landingMass_kg, r.zeroFuelMass_kg, { abs: 1e-3 }, 'the fuel event stops the flight at zero fuel');
    expectNoNaN(r);
  });

  it('solveMission with takeoffWeight and a solvable cruise finds the distance that leaves exactly the reserve', () => {
    const r = solveMission(
      missionInput({
        legs: cruiseOnly(null),
        solve: { kind: 'takeoffWeight', takeoffMass_kg: 65000, payload_kg: 10000 },
        aero: breguetAero,
        propulsion: breguetEngines,
        reserves: NO_RESERVES,
      }),
    );
    expect(r.status).toBe('ok');
    // With no reserve the whole fuel is burnt: R = V/(c g) (L/D) ln(W0/ZFW) (Breguet).
    const R = ((0.8 * A_11KM) / (TSFC * G0)) * LD * Math.log(65000 / 50000);
    expectClose(r.airDistance_m, R, { rel: 1e-5 }, 'Breguet range to zero fuel');
  });
});
