/**
 * Where the steps of a climb, descent or level speed change must end: the
 * slope breaks of the engine and airframe models (propulsionModel.ts
 * `slopeBreaks`, aeroModel.ts `slopeBreakMachs`) met along the path. Steps
 * that straddle a break lose the integrator's order there (common practice
 * for piecewise-linear tables).
 */
import { transitionAltitude } from './missionAtmosphere';
import type { MissionInput } from './missionTypes';

/**
 * Longest steps of the climbs and descents (before `stepScale`; monotoneStepper.ts `MonotonePlan`): 1,600 m of
 * altitude, and 145 s at the rate met at each break interval's start. Between breaks the RK4 error of an interval
 * of duration t in n even steps goes as t^5 / n^4 (the fuel and time are quadratures of 1 / rate, whose fourth
 * derivative grows as the rate falls), so the steps that give the least error for their number are equal in time,
 * n proportional to t: measured on the demo (docs/mission.md, Speed, "Climb and descent steps, 3 December 2026"),
 * 145 s gives the error of the 1,200 m steps before it with a fifth fewer steps, the steps moved from the fast
 * climb and descent above 10,000 ft to the slow idle descent below it.
 */
export const BASE_ALTITUDE_STEP = {
  altitude_m: 1600,
  time_s: 145,
} as const;

/**
 * Break Machs and the CAS/Mach break altitudes of each held CAS, per pair of models: a pure function of the
 * (readonly) models, remembered because every pass of the fuel iteration flies the same schedules.
 */
interface ModelBreaks {
  readonly machs: readonly number[];
  readonly casAltitudes: Map<number, readonly number[]>;
}
const memo = new WeakMap<object, WeakMap<object, ModelBreaks>>();

function modelBreaks(input: MissionInput): ModelBreaks {
  let byAero = memo.get(input.propulsion);
  if (byAero === undefined) {
    byAero = new WeakMap();
    memo.set(input.propulsion, byAero);
  }
  let found = byAero.get(input.aero);
  if (found === undefined) {
    const machs = [...(input.propulsion.slopeBreaks?.machs ?? []), ...(input.aero.slopeBreakMachs ?? [])].filter((m) => m > 0);
    found = { machs: [...new Set(machs)].sort((a, b) => a - b), casAltitudes: new Map() };
    byAero.set(input.aero, found);
  }
  return found;
}

/** The models' break Machs (-), positive, ascending, distinct. */
export function breakMachs(input: MissionInput): readonly number[] {
  return modelBreaks(input).machs;
}

/** Pressure altitudes (m) where a held CAS (m/s) reaches each break Mach (finite ones only). */
function casBreakAltitudes(input: MissionInput, cas_m_s: number): readonly number[] {
  const breaks = modelBreaks(input);
  let found = breaks.casAltitudes.get(cas_m_s);
  if (found === undefined) {
    found = breaks.machs.map((mach) => transitionAltitude(cas_m_s, mach)).filter((h) => Number.isFinite(h));
    breaks.casAltitudes.set(cas_m_s, found);
  }
  return found;
}

/**
 * Pressure altitudes (m) strictly between `from_m` and `to_m` where a climb
 * or descent holding CAS (m/s) or Mach (-) meets a slope break: the deck's
 * grid altitudes and, holding CAS, the altitude where the Mach reaches each
 * break Mach (the CAS/Mach transition altitude of that pair, NACA Report
 * 1135 via missionAtmosphere.ts).
 */
export function pathBreakAltitudes(input: MissionInput, held: 'cas' | 'mach', value: number, from_m: number, to_m: number): number[] {
  const lo = Math.min(from_m, to_m);
  const hi = Math.max(from_m, to_m);
  const out: number[] = [];
  for (const h of input.propulsion.slopeBreaks?.altitudes_m ?? []) if (h > lo && h < hi) out.push(h);
  if (held === 'cas') for (const h of casBreakAltitudes(input, value)) if (h > lo && h < hi) out.push(h);
  return out;
}

/** TAS values (m/s) strictly between `fromTas_m_s` and `toTas_m_s` at the break Machs, for a level speed change where the speed of sound is `speedOfSound_m_s`. */
export function speedBreaks(input: MissionInput, speedOfSound_m_s: number, fromTas_m_s: number, toTas_m_s: number): number[] {
  const lo = Math.min(fromTas_m_s, toTas_m_s);
  const hi = Math.max(fromTas_m_s, toTas_m_s);
  return breakMachs(input)
    .map((m) => m * speedOfSound_m_s)
    .filter((v) => v > lo && v < hi);
}
