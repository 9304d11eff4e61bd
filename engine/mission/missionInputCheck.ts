/**
 * Checks a MissionInput before it is flown: every number finite, masses and
 * areas positive, legs well formed. Returns the first problem as a sentence
 * naming the field, or null. (engine/project validates files; this guards
 * the solver's own entry point so no NaN travels.)
 */
import { MAX_PHYSICAL_MAGNITUDE } from '../units/quantity';
import type { HoldSpeed, MissionInput } from './missionTypes';

function badNumber(path: string, value: unknown, rule: 'finite' | 'positive' | 'nonNegative'): string | null {
  if (typeof value !== 'number' || !Number.isFinite(value)) return `${path} must be a finite number, got ${String(value)}.`;
  if (Math.abs(value) > MAX_PHYSICAL_MAGNITUDE) return `${path} is ${value}, beyond any physical value (at most ${MAX_PHYSICAL_MAGNITUDE} in SI units).`;
  if (rule === 'positive' && !(value > 0)) return `${path} must be positive, got ${value}.`;
  if (rule === 'nonNegative' && value < 0) return `${path} must not be negative, got ${value}.`;
  return null;
}

/** Pressure altitudes the solver accepts (m): the troposphere and the layers above to 30 km. */
export const MIN_ALTITUDE_M = -1000;
export const MAX_ALTITUDE_M = 30000;
/** ISA deviations the solver accepts (K). */
export const MAX_ABS_ISA_DEV_K = 80;

function badRange(path: string, value: number, lo: number, hi: number, unit: string): string | null {
  const finite = badNumber(path, value, 'finite');
  if (finite) return finite;
  return value < lo || value > hi ? `${path} must lie between ${lo} and ${hi} ${unit}, got ${value}.` : null;
}

function badAltitude(path: string, value: number): string | null {
  return badRange(path, value, MIN_ALTITUDE_M, MAX_ALTITUDE_M, 'm');
}

function badMach(path: string, value: number): string | null {
  return badRange(path, value, 0.05, 0.99, '(subsonic Mach)');
}

function first(...problems: (string | null)[]): string | null {
  for (const p of problems) if (p !== null) return p;
  return null;
}

/** A problem with a holding speed, or null. */
function holdSpeedProblem(path: string, speed: HoldSpeed): string | null {
  if (speed.kind === 'cas') return badNumber(`${path}.cas_m_s`, speed.cas_m_s, 'positive');
  return first(
    speed.minCas_m_s === undefined ? null : badNumber(`${path}.minCas_m_s`, speed.minCas_m_s, 'nonNegative'),
    speed.speedFactor === undefined ? null : badNumber(`${path}.speedFactor`, speed.speedFactor, 'positive'),
  );
}

/** The first problem with `input`, or null when it can be flown. */
export function missionInputProblem(input: MissionInput): string | null {
  const a = input.airframe;
  const airframe = first(
    badNumber('airframe.oew_kg', a.oew_kg, 'positive'),
    badNumber('airframe.mzfw_kg', a.mzfw_kg, 'positive'),
    badNumber('airframe.mtow_kg', a.mtow_kg, 'positive'),
    badNumber('airframe.mlw_kg', a.mlw_kg, 'positive'),
    badNumber('airframe.maxFuel_kg', a.maxFuel_kg, 'nonNegative'),
    badNumber('airframe.wingArea_m2', a.wingArea_m2, 'positive'),
    badNumber('airframe.vmo_m_s', a.vmo_m_s, 'positive'),
    badMach('airframe.mmo', a.mmo),
    badRange('isaDev_K', input.isaDev_K, -MAX_ABS_ISA_DEV_K, MAX_ABS_ISA_DEV_K, 'K'),
    badNumber('wind_m_s', input.wind_m_s, 'finite'),
    input.distanceBasis === undefined || input.distanceBasis === 'ground' || input.distanceBasis === 'stillAir'
      ? null
      : `distanceBasis ${JSON.stringify(input.distanceBasis)} is neither "ground" nor "stillAir".`,
    input.destinationElevation_m === undefined ? null : badAltitude('destinationElevation_m', input.destinationElevation_m),
  );
  if (airframe) return airframe;
  if (input.legs.length === 0) return 'legs must hold at least one leg.';
  let solvable = 0;
  for (let i = 0; i < input.legs.length; i++) {
    const leg = input.legs[i];
    const p = `legs[${i}] (${leg.name})`;
    const env = first(
      leg.isaDev_K === undefined ? null : badRange(`${p}.isaDev_K`, leg.isaDev_K, -MAX_ABS_ISA_DEV_K, MAX_ABS_ISA_DEV_K, 'K'),
      leg.wind_m_s === undefined ? null : badNumber(`${p}.wind_m_s`, leg.wind_m_s, 'finite'),
    );
    if (env) return env;
    let problem: string | null = null;
    switch (leg.kind) {
      case 'taxiOut':
      case 'taxiIn':
        problem = first(
          badNumber(`${p}.time_s`, leg.time_s, 'nonNegative'),
          leg.fuelFlow_kg_s === 'idle' ? null : badNumber(`${p}.fuelFlow_kg_s`, leg.fuelFlow_kg_s, 'nonNegative'),
        );
        break;
      case 'takeoff':
      case 'approach':
        problem = first(
          badNumber(`${p}.time_s`, leg.time_s, 'nonNegative'),
          leg.fuel_kg === null ? null : badNumber(`${p}.fuel_kg`, leg.fuel_kg, 'nonNegative'),
        );
        break;
      case 'climb':
      case 'descent':
        problem = first(
          badAltitude(`${p}.toAltitude_m`, leg.toAltitude_m),
          badNumber(`${p}.schedule.lowCas_m_s`, leg.schedule.lowCas_m_s, 'positive'),
          badAltitude(`${p}.schedule.lowAltitudeLimit_m`, leg.schedule.lowAltitudeLimit_m),
          badNumber(`${p}.schedule.cas_m_s`, leg.schedule.cas_m_s, 'positive'),
          badMach(`${p}.schedule.mach`, leg.schedule.mach),
          leg.kind === 'descent' && leg.mode.kind === 'rate' ? badNumber(`${p}.mode.rate_m_s`, leg.mode.rate_m_s, 'positive') : null,
        );
        break;
      case 'cruise':
        if (leg.distance_m === null) solvable++;
        problem = first(
          badAltitude(`${p}.altitude_m`, leg.altitude_m),
          leg.distance_m === null ? null : badNumber(`${p}.distance_m`, leg.distance_m, 'nonNegative'),
          leg.speed.kind === 'mach' ? badMach(`${p}.speed.mach`, leg.speed.mach) : null,
          leg.profile.kind === 'stepClimb' ? badNumber(`${p}.profile.step_m`, leg.profile.step_m, 'positive') : null,
          leg.profile.kind === 'constantAltitude' ? null : badAltitude(`${p}.profile.maxAltitude_m`, leg.profile.maxAltitude_m),
        );
        break;
      case 'hold':
        problem = first(
          badAltitude(`${p}.altitude_m`, leg.altitude_m),
          badNumber(`${p}.time_s`, leg.time_s, 'nonNegative'),
          holdSpeedProblem(`${p}.speed`, leg.speed),
        );
        break;
    }
    if (problem) return problem;
  }
  if (solvable > 1) return `At most one cruise leg may have distance_m null; ${solvable} have.`;
  const s = input.solve;
  const solve = first(
    badNumber('solve.payload_kg', s.payload_kg, 'nonNegative'),
    s.kind === 'takeoffWeight' ? badNumber('solve.takeoffMass_kg', s.takeoffMass_kg, 'positive') : null,
    s.kind === 'payloadRange' ? badNumber('solve.range_m', s.range_m, 'nonNegative') : null,
  );
  if (solve) return solve;
  if (s.kind !== 'takeoffWeight' && solvable === 0) return `solve.kind ${s.kind} needs one cruise leg with distance_m null (the leg whose distance is solved).`;
  const r = input.reserves;
  const alt = r.alternate;
  return first(
    badNumber('reserves.finalReserve_s', r.finalReserve_s, 'nonNegative'),
    'contingencyFraction' in r ? badNumber('reserves.contingencyFraction', r.contingencyFraction, 'nonNegative') : null,
    r.preset === 'icaoAnnex6' ? badNumber('reserves.minContingency_s', r.minContingency_s, 'nonNegative') : null,
    r.preset === 'cfr121_645' ? badNumber('reserves.enRouteFraction', r.enRouteFraction, 'nonNegative') : null,
    r.preset === 'custom' ? badNumber('reserves.extraFuel_kg', r.extraFuel_kg, 'nonNegative') : null,
    alt === null ? null : badNumber('reserves.alternate.distance_m', alt.distance_m, 'nonNegative'),
    alt === null ? null : badAltitude('reserves.alternate.cruiseAltitude_m', alt.cruiseAltitude_m),
    alt === null ? null : badMach('reserves.alternate.cruiseMach', alt.cruiseMach),
    alt === null ? null : badAltitude('reserves.alternate.elevation_m', alt.elevation_m),
    alt === null || alt.wind_m_s === undefined ? null : badNumber('reserves.alternate.wind_m_s', alt.wind_m_s, 'finite'),
    r.arrival === undefined ? null : badNumber('reserves.arrival.missedApproach.time_s', r.arrival.missedApproach.time_s, 'nonNegative'),
    r.arrival?.missedApproach.fuel_kg == null ? null : badNumber('reserves.arrival.missedApproach.fuel_kg', r.arrival.missedApproach.fuel_kg, 'nonNegative'),
    r.arrival === undefined ? null : badNumber('reserves.arrival.alternateApproach.time_s', r.arrival.alternateApproach.time_s, 'nonNegative'),
    r.arrival?.alternateApproach.fuel_kg == null ? null : badNumber('reserves.arrival.alternateApproach.fuel_kg', r.arrival.alternateApproach.fuel_kg, 'nonNegative'),
    r.holdSpeed === undefined ? null : holdSpeedProblem('reserves.holdSpeed', r.holdSpeed),
  );
}
