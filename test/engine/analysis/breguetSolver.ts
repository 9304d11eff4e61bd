/**
 * A stand-in mission solver for the analysis tests: one cruise at constant
 * altitude and Mach flown by the Breguet range equation
 * R = (V / (c g)) (L/D) ln(W0 / W1) (Anderson, Aircraft Performance and
 * Design, ch. 5), with L/D and TSFC taken at MTOW (so the range factor is
 * constant over the mission and closed forms hold), a fixed
 * taxi fuel, and reserves = 5 % of trip fuel + a fixed final reserve. It
 * honours MTOW and fuel capacity in maxRange mode. It lets the payload-range,
 * comparison and trade-factor code be checked against closed forms.
 */
import type { AeroModel } from '../../../engine/aero/aeroModel';
import type { MissionInput, MissionResult } from '../../../engine/mission/missionTypes';
import type { PropulsionModel } from '../../../engine/propulsion/propulsionModel';
import { G0 } from './analyticModels';

export const BREGUET_ALTITUDE_M = 10000;
export const BREGUET_MACH = 0.75;
export const TAXI_FUEL_KG = 100;
export const FINAL_RESERVE_KG = 1200;
export const CONTINGENCY = 0.05;
/** Speed of sound at 10,000 m ISA (m/s): sqrt(1.4 * 287.05287 * 223.15), U.S. Standard Atmosphere 1976. */
const A_10KM = Math.sqrt(1.4 * 287.05287 * 223.15);

export function cruiseFactor(aero: AeroModel, propulsion: PropulsionModel, mass_kg: number): number {
  const d = aero.drag({ altitude_m: BREGUET_ALTITUDE_M, mach: BREGUET_MACH, mass_kg, loadFactor: 1 });
  const p = propulsion.forThrust({ altitude_m: BREGUET_ALTITUDE_M, mach: BREGUET_MACH, isaDev_K: 0 }, d.drag_N);
  if (p.limit !== 'within') return Number.NaN;
  const c = (p.fuelFlow_kg_s * G0) / d.drag_N; // thrust-specific fuel consumption by weight (1/s)
  return ((BREGUET_MACH * A_10KM) / c) * d.liftToDrag; // V / c * L/D (m)
}

export interface BreguetCounter {
  calls: number;
}

export function makeBreguetSolver(counter?: BreguetCounter): (input: MissionInput) => MissionResult {
  return (input) => {
    if (counter) counter.calls++;
    const { airframe, aero, propulsion, solve } = input;
    const zfw = airframe.oew_kg + solve.payload_kg;
    // Landing mass W1 = ZFW + reserves; reserves = 5 % trip + final reserve.
    const fly = (tripFuel: number) => {
      const w1 = zfw + FINAL_RESERVE_KG + CONTINGENCY * tripFuel;
      const w0 = w1 + tripFuel;
      return { w0, w1, range: cruiseFactor(aero, propulsion, airframe.mtow_kg) * Math.log(w0 / w1) };
    };
    let trip = 0;
    if (solve.kind === 'payloadRange') {
      trip = 5000;
      for (let i = 0; i < 200; i++) {
        const f = fly(trip);
        const next = trip * (solve.range_m / f.range);
        if (Math.abs(next - trip) < 1e-10) {
          trip = next;
          break;
        }
        trip = next;
      }
    } else {
      const tow = solve.kind === 'takeoffWeight' ? solve.takeoffMass_kg : airframe.mtow_kg;
      let totalFuel = tow - zfw + TAXI_FUEL_KG;
      if (solve.kind === 'maxRange') totalFuel = Math.min(totalFuel, airframe.maxFuel_kg);
      // total = taxi + trip + 5 % trip + final
      trip = (totalFuel - TAXI_FUEL_KG - FINAL_RESERVE_KG) / (1 + CONTINGENCY);
    }
    const f = fly(trip);
    if (!Number.isFinite(f.range)) throw new Error('stand-in solver: cruise thrust limited; pick a stronger test engine');
    const reserve = FINAL_RESERVE_KG + CONTINGENCY * trip;
    const empty = new Float64Array(0);
    return {
      status: trip > 0 ? 'ok' : 'infeasible',
      statusMessage: trip > 0 ? '' : 'no fuel for the trip',
      blockFuel_kg: trip + TAXI_FUEL_KG,
      blockTime_s: f.range / (BREGUET_MACH * A_10KM),
      tripFuel_kg: trip,
      tripTime_s: f.range / (BREGUET_MACH * A_10KM),
      reserveFuel_kg: reserve,
      reserves: { contingency_kg: CONTINGENCY * trip, alternate_kg: 0, missedApproach_kg: 0, alternateApproach_kg: 0, finalReserve_kg: FINAL_RESERVE_KG, extra_kg: 0, total_kg: reserve },
      takeoffMass_kg: f.w0,
      rampMass_kg: f.w0 + TAXI_FUEL_KG,
      landingMass_kg: f.w1,
      zeroFuelMass_kg: zfw,
      payload_kg: solve.payload_kg,
      airDistance_m: f.range,
      groundDistance_m: f.range,
      distanceBasis: 'ground',
      legs: [
        { index: 0, name: 'cruise', kind: 'cruise', startTime_s: 0, endTime_s: 1, startDistance_m: 0, endDistance_m: f.range, startGroundDistance_m: 0, endGroundDistance_m: f.range, startAltitude_m: BREGUET_ALTITUDE_M, endAltitude_m: BREGUET_ALTITUDE_M, startMass_kg: f.w0, endMass_kg: f.w1, fuel_kg: trip },
      ],
      history: {
        time_s: empty, distance_m: empty, altitude_m: empty, mach: empty, cas_m_s: empty, tas_m_s: empty, mass_kg: empty,
        thrustAvailable_N: empty, thrustUsed_N: empty, drag_N: empty, fuelFlow_kg_s: empty, cl: empty, liftToDrag: empty,
        climbRate_m_s: empty, legIndex: new Int32Array(0),
      },
      cautions: [],
      iterations: 1,
      residual_kg: 0,
    };
  };
}
