/**
 * The first pass's ramp mass in payloadRange, from closed forms on the models' own point figures before anything is
 * flown: the trip and the reserve as the mission's legs and the reserve policy define them, each piece from a few
 * flight points at a reference mass.
 *
 * - Cruise (the solvable leg, a set-distance cruise, the alternate's cruise, and the reserve items flown at normal
 *   cruise or in a hold): the specific range or fuel flow as a power of the mass, SR = SR_0 (m / m_0)^-alpha (alpha
 *   from two points 2 % either side of the reference mass), integrated over the distance or time in closed form:
 *   m_end^(1-alpha) = m_start^(1-alpha) - (1 - alpha) D m_0^-alpha / SR_0, the Breguet range equation when alpha = 1
 *   (Anderson, Aircraft Performance and Design, section 5.13; the power-law form is this module's).
 * - Climbs and descents: the energy method along the leg's speed schedule (the rate of climb from the excess thrust
 *   and the energy share factor, as the legs fly it), time, fuel and distance by Simpson's rule on five altitudes
 *   (Burden & Faires, Numerical Analysis, 4.3); descents at flight idle (or at the set rate).
 * - Allowances as flown (allowanceFuel).
 *
 * The landing mass is zero-fuel mass plus the reserve so estimated, and the ramp mass is found by the secant method
 * on these closed forms (no flight). NaN when a piece has no usable figure (the caller then falls back).
 */
import { allowanceFuel, destinationElevation } from './allowanceLegs';
import { basisSpecificRange, minimumDragMach, specificRangeAt } from './bestSpeeds';
import { cruiseMach } from './cruiseLeg';
import { energyShareFactor, pressureAltitudeRate } from './energyShareFactor';
import { dragForceAt } from './flightPoint';
import { solvableLegIndex } from './flyTrip';
import { legEnvironment } from './missionContext';
import { machOfCas, missionAir } from './missionAtmosphere';
import type { DescentMode } from './descentLeg';
import type { HoldSpeed, Leg, MissionInput, SpeedSchedule } from './missionTypes';
import { climbSettings, descentSettings, HOLD_HEIGHT_M } from './reserves';
import { reserveArrival, reserveHoldSpeed } from './reserveRules';
import { scheduleMach } from './speedSchedule';
import type { RatingName } from '../propulsion/propulsionModel';
import { FOOT_M } from '../units/unitTable';
import { sameNumber } from '../core/sameNumber';

type Env = { readonly isaDev_K: number; readonly wind_m_s: number };
type CruiseLeg = Extract<Leg, { kind: 'cruise' }>;

/** Mass burned per unit of distance or time as a power of the mass: rate_0 (m / mass_0)^exponent (kg/m or kg/s). */
export interface MassLaw {
  readonly rate0: number;
  readonly mass0_kg: number;
  readonly exponent: number;
}

/** A law from a rate (kg per unit) as a function of the mass (kg), read 2 % either side of `mass_kg`; null when a rate is not positive. */
function massLaw(rateOf: (mass_kg: number) => number, mass_kg: number): MassLaw | null {
  const rate0 = rateOf(mass_kg);
  const up = rateOf(mass_kg * 1.02);
  const down = rateOf(mass_kg / 1.02);
  if (!(rate0 > 0 && up > 0 && down > 0)) return null;
  const exponent = Math.log(up / down) / Math.log(1.02 * 1.02);
  return Number.isFinite(exponent) && exponent > -2 && exponent < 3 ? { rate0, mass0_kg: mass_kg, exponent } : null;
}

/** Mass (kg) left after `amount` (m or s) under a law from `start_kg`: the closed-form integral of dm = -rate dx; NaN when it runs out. */
export function afterBurn(law: MassLaw, start_kg: number, amount: number): number {
  if (!(amount > 0)) return start_kg;
  const e = law.exponent;
  const scale = law.rate0 * Math.pow(law.mass0_kg, -e);
  if (Math.abs(1 - e) < 1e-6) return start_kg * Math.exp(-scale * amount);
  const base = Math.pow(start_kg, 1 - e) - (1 - e) * scale * amount;
  if (e < 1 && !(base > 0)) return Number.NaN;
  return Math.pow(base, 1 / (1 - e));
}

/** The levels (m) a cruise leg may fly: its altitude, its steps up to the maximum, or for a cruise-climb every 1,000 ft up to the maximum. */
export function cruiseLevels(leg: CruiseLeg): number[] {
  const levels = [leg.altitude_m];
  const p = leg.profile;
  const spacing = p.kind === 'stepClimb' ? p.step_m : p.kind === 'cruiseClimb' ? 1000 * FOOT_M : 0;
  if (p.kind !== 'constantAltitude' && spacing > 0) for (let h = leg.altitude_m + spacing; h <= p.maxAltitude_m + 1e-6 && levels.length < 40; h += spacing) levels.push(h);
  return levels;
}

/** The best specific range (m/kg, mission's basis) among `levels` (m) of a cruise leg at a mass (kg). */
export function bestLevelSpecificRange(input: MissionInput, speed: CruiseLeg['speed'], levels: readonly number[], env: Env, mass_kg: number): number {
  let best = 0;
  for (const h of levels) {
    const mach = cruiseMach(input, speed, h, mass_kg, env.isaDev_K);
    best = Math.max(best, basisSpecificRange(input, specificRangeAt(input, h, mach, mass_kg, env.isaDev_K), h, mach, env));
  }
  return best;
}

/** Fuel per metre law of a cruise at its best level at `mass_kg` (the envelope of the levels has that level's slope there). */
function cruiseDistanceLaw(input: MissionInput, leg: CruiseLeg, mass_kg: number): MassLaw | null {
  const env = legEnvironment(input, leg);
  let best = leg.altitude_m;
  let bestSr = 0;
  for (const h of cruiseLevels(leg)) {
    const sr = bestLevelSpecificRange(input, leg.speed, [h], env, mass_kg);
    if (sr > bestSr) [best, bestSr] = [h, sr];
  }
  return massLaw((m) => 1 / (m === mass_kg ? bestSr : bestLevelSpecificRange(input, leg.speed, [best], env, m)), mass_kg);
}

/** Fuel flow (kg/s) in level flight at a Mach: TAS over the specific air range; 0 when it cannot be flown. */
function levelFuelFlow(input: MissionInput, altitude_m: number, mach: number, mass_kg: number, isaDev_K: number): number {
  const sr = specificRangeAt(input, altitude_m, mach, mass_kg, isaDev_K);
  return sr > 0 ? (mach * missionAir(altitude_m, isaDev_K).speedOfSound_m_s) / sr : 0;
}

/** Fuel flow law (kg/s) of a hold at an altitude as flyHold flies it (best endurance with its factor and floor, or a CAS), ISA and still air unless `isaDev_K`. */
function holdLaw(input: MissionInput, altitude_m: number, speed: HoldSpeed, mass_kg: number, isaDev_K = 0): MassLaw | null {
  const pressure_Pa = missionAir(altitude_m, 0).pressure_Pa;
  // Best endurance as flyHold flies it: the minimum-drag Mach searched at one mass, then at constant lift
  // coefficient (Mach proportional to sqrt(mass)).
  const factor = speed.kind === 'bestEndurance' && speed.speedFactor !== undefined && speed.speedFactor > 0 ? speed.speedFactor : 1;
  const floor = speed.kind === 'bestEndurance' && speed.minCas_m_s !== undefined && speed.minCas_m_s > 0 ? machOfCas(speed.minCas_m_s, pressure_Pa) : 0;
  const minimumDrag = speed.kind === 'cas' ? 0 : factor * minimumDragMach(input, altitude_m, mass_kg, isaDev_K);
  const machAt = (m: number) => (speed.kind === 'cas' ? machOfCas(speed.cas_m_s, pressure_Pa) : Math.max(minimumDrag * Math.sqrt(m / mass_kg), floor));
  return massLaw((m) => levelFuelFlow(input, altitude_m, machAt(m), m, isaDev_K), mass_kg);
}

/** Fuel flow law (kg/s) at the mission's normal cruise (first cruise leg's altitude and speed rule), in the mission's air. */
function normalCruiseLaw(input: MissionInput, mass_kg: number): MassLaw | null {
  const cruise = input.legs.find((l) => l.kind === 'cruise');
  if (!cruise || cruise.kind !== 'cruise') return holdLaw(input, destinationElevation(input) + HOLD_HEIGHT_M, { kind: 'bestEndurance' }, mass_kg, input.isaDev_K);
  return massLaw((m) => levelFuelFlow(input, cruise.altitude_m, cruiseMach(input, cruise.speed, cruise.altitude_m, m, input.isaDev_K), m, input.isaDev_K), mass_kg);
}

/** Fuel (kg), time (s) and distance (m, mission's basis) of a climb or descent. */
interface PathEstimate {
  readonly fuel_kg: number;
  readonly time_s: number;
  readonly distance_m: number;
}

/** Nodes of pathEstimate's Simpson's rule (an even number of intervals). */
const PATH_INTERVALS = 4;

/** Per node of a path: Mach, TAS (m/s), energy share factor, the rating's thrust (N) and fuel flow (kg/s), temperature and ISA temperature (K). */
const NODE_VALUES = 7;

/** Paths whose mass-free node values a model keeps (the trip's climbs and descents and the alternate's) before they are emptied. */
const PATH_MEMO_ENTRIES = 16;

interface PathNodes {
  /** The schedule's four numbers, the two altitudes (m), the ISA deviation (K). */
  readonly key: Float64Array;
  readonly rating: RatingName;
  readonly values: Float64Array;
}

// Per propulsion model (the payload cycles on one model, as the app and the analyses fly it): what each node of a
// path needs that does not depend on the mass (the schedule's Mach, the air, the share factor, the rating's point),
// keyed exactly by the numbers it is a pure function of (sameNumber) and the rating; so a path costs its drags
// alone after its first estimate. The entry that would pass PATH_MEMO_ENTRIES empties the model's list first.
const pathMemo = new WeakMap<MissionInput['propulsion'], PathNodes[]>();

/** The mass-free node values of a path (PathNodes.values), kept per model. */
function pathNodes(input: MissionInput, from_m: number, to_m: number, schedule: SpeedSchedule, rating: RatingName, isaDev_K: number): Float64Array {
  let list = pathMemo.get(input.propulsion);
  if (list === undefined) {
    list = [];
    pathMemo.set(input.propulsion, list);
  }
  for (const entry of list) {
    const k = entry.key;
    if (
      entry.rating === rating &&
      sameNumber(k[0]!, schedule.lowCas_m_s) &&
      sameNumber(k[1]!, schedule.lowAltitudeLimit_m) &&
      sameNumber(k[2]!, schedule.cas_m_s) &&
      sameNumber(k[3]!, schedule.mach) &&
      sameNumber(k[4]!, from_m) &&
      sameNumber(k[5]!, to_m) &&
      sameNumber(k[6]!, isaDev_K)
    ) {
      return entry.values;
    }
  }
  const values = new Float64Array((PATH_INTERVALS + 1) * NODE_VALUES);
  const dh = (to_m - from_m) / PATH_INTERVALS;
  for (let i = 0; i <= PATH_INTERVALS; i++) {
    const h = from_m + i * dh;
    const mach = scheduleMach(schedule, h);
    const air = missionAir(h, isaDev_K);
    const held = mach >= schedule.mach - 1e-9 ? 'mach' : 'cas';
    const p = input.propulsion.atRating({ altitude_m: h, mach, isaDev_K }, rating);
    const v = i * NODE_VALUES;
    // The TAS as airPoint has it.
    values[v] = mach;
    values[v + 1] = mach * air.speedOfSound_m_s;
    values[v + 2] = energyShareFactor(held, mach, air.lapse_K_m, air.temperature_K, air.isaTemperature_K);
    values[v + 3] = p.thrust_N;
    values[v + 4] = p.fuelFlow_kg_s;
    values[v + 5] = air.temperature_K;
    values[v + 6] = air.isaTemperature_K;
  }
  if (list.length >= PATH_MEMO_ENTRIES) list.length = 0;
  list.push({ key: Float64Array.of(schedule.lowCas_m_s, schedule.lowAltitudeLimit_m, schedule.cas_m_s, schedule.mach, from_m, to_m, isaDev_K), rating, values });
  return values;
}

/**
 * A climb at a rating, or a descent at flight idle (or at a set rate), along a speed schedule between two altitudes
 * at a mass (kg): the energy method's rate at five altitudes, integrated by Simpson's rule; null when the rate is not
 * of the leg's sign somewhere.
 */
function pathEstimate(input: MissionInput, from_m: number, to_m: number, schedule: SpeedSchedule, how: { readonly rating: RatingName } | { readonly descent: DescentMode }, mass_kg: number, env: Env): PathEstimate | null {
  if (Math.abs(to_m - from_m) < 1) return { fuel_kg: 0, time_s: 0, distance_m: 0 };
  const n = PATH_INTERVALS;
  const dh = (to_m - from_m) / n;
  const nodes = pathNodes(input, from_m, to_m, schedule, 'rating' in how ? how.rating : 'flightIdle', env.isaDev_K);
  let time = 0;
  let fuel = 0;
  let distance = 0;
  for (let i = 0; i <= n; i++) {
    const h = from_m + i * dh;
    const v = i * NODE_VALUES;
    const mach = nodes[v]!;
    const tas_m_s = nodes[v + 1]!;
    // The drag force as airPoint has it (dragForceAt: the breakdown's drag_N to the bit).
    const drag_N = dragForceAt(input, h, mach, mass_kg);
    const rate =
      'descent' in how && how.descent.kind === 'rate'
        ? -how.descent.rate_m_s
        : pressureAltitudeRate(nodes[v + 3]!, drag_N, tas_m_s, mass_kg, nodes[v + 2]!, nodes[v + 5]!, nodes[v + 6]!);
    const flow = nodes[v + 4]!;
    const perMetre = 1 / rate;
    if (!(perMetre * dh > 0) || !Number.isFinite(perMetre)) return null;
    const w = (i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2) * (dh / 3) * perMetre;
    time += w;
    fuel += w * flow;
    distance += w * (input.distanceBasis === 'stillAir' ? tas_m_s : tas_m_s + env.wind_m_s);
  }
  return Number.isFinite(time + fuel + distance) ? { fuel_kg: fuel, time_s: time, distance_m: distance } : null;
}

/** What the closed forms need, worked out once at reference masses (a ramp and a landing mass, kg). */
interface Figures {
  /** Per leg before landing: fuel (kg) as a function of the mass at its start and the solvable leg's distance, and its distance (m) and time (s). */
  readonly legs: readonly ((mass_kg: number, solvable_m: number) => { fuel_kg: number; distance_m: number; time_s: number })[];
  /** The reserve (kg) from a landing mass (kg), trip fuel (kg) and trip time (s). */
  readonly reserve: (landing_kg: number, tripFuel_kg: number, tripTime_s: number) => number;
}

function figures(input: MissionInput, ramp_kg: number, landing_kg: number): Figures | null {
  const solvable = solvableLegIndex(input);
  let last = input.legs.length - 1;
  while (last >= 0 && input.legs[last].kind === 'taxiIn') last--;
  const legs: Figures['legs'][number][] = [];
  let altitude = 0;
  let bad = false;
  for (let i = 0; i <= last && !bad; i++) {
    const leg = input.legs[i];
    const env = legEnvironment(input, leg);
    const mass = i < solvable ? ramp_kg : landing_kg;
    switch (leg.kind) {
      case 'taxiOut':
      case 'takeoff':
      case 'approach':
      case 'taxiIn': {
        const elevation = leg.kind === 'approach' ? destinationElevation(input) : altitude;
        const a = allowanceFuel(input, leg, elevation, env.isaDev_K);
        legs.push(() => ({ fuel_kg: a.fuel_kg, distance_m: 0, time_s: a.time_s }));
        if (leg.kind === 'approach') altitude = destinationElevation(input);
        break;
      }
      case 'climb':
      case 'descent': {
        const p = leg.kind === 'climb' ? pathEstimate(input, altitude, leg.toAltitude_m, leg.schedule, { rating: leg.rating }, mass, env) : pathEstimate(input, altitude, leg.toAltitude_m, leg.schedule, { descent: leg.mode }, mass, env);
        if (p === null) bad = true;
        else legs.push(() => p);
        altitude = leg.toAltitude_m;
        break;
      }
      case 'cruise': {
        const law = cruiseDistanceLaw(input, leg, mass);
        const speed = input.distanceBasis === 'stillAir' ? 0 : env.wind_m_s;
        const tas = cruiseMach(input, leg.speed, leg.altitude_m, mass, env.isaDev_K) * missionAir(leg.altitude_m, env.isaDev_K).speedOfSound_m_s;
        if (law === null || !(tas + speed > 0)) bad = true;
        else {
          const set = leg.distance_m;
          legs.push((m, solvable_m) => {
            const d = set ?? solvable_m;
            return { fuel_kg: m - afterBurn(law, m, d), distance_m: d, time_s: d / (tas + speed) };
          });
        }
        altitude = leg.altitude_m;
        break;
      }
      case 'hold': {
        const law = holdLaw(input, leg.altitude_m, leg.speed, mass, env.isaDev_K);
        if (law === null) bad = true;
        else legs.push((m) => ({ fuel_kg: m - afterBurn(law, m, leg.time_s), distance_m: 0, time_s: leg.time_s }));
        altitude = leg.altitude_m;
        break;
      }
    }
  }
  const reserve = reserveFigures(input, landing_kg);
  return bad || reserve === null ? null : { legs, reserve };
}

/** The reserve policy's items as closed forms from a landing mass. */
function reserveFigures(input: MissionInput, landing_kg: number): Figures['reserve'] | null {
  const policy = input.reserves;
  const destination = destinationElevation(input);
  const holdSpeed = reserveHoldSpeed(policy);
  // Normal cruise only where the policy flies it (the final reserve of 121.639, the en-route time of 121.645(b)).
  const cruiseTime = policy.preset === 'cfr121_639' || policy.preset === 'cfr121_645' ? normalCruiseLaw(input, landing_kg) : null;
  const contingencyHold = policy.preset === 'icaoAnnex6' ? holdLaw(input, destination + HOLD_HEIGHT_M, holdSpeed, landing_kg) : null;
  const finalHold = policy.preset === 'cfr121_639' ? cruiseTime : holdLaw(input, (policy.alternate?.elevation_m ?? destination) + HOLD_HEIGHT_M, holdSpeed, landing_kg);
  if (finalHold === null || (policy.preset === 'cfr121_645' && cruiseTime === null) || (policy.preset === 'icaoAnnex6' && contingencyHold === null)) return null;
  let alternate: ((m: number) => number) | null = () => 0;
  if (policy.alternate !== null) {
    const alt = policy.alternate;
    const env = { isaDev_K: input.isaDev_K, wind_m_s: alt.wind_m_s ?? input.wind_m_s };
    const arrival = reserveArrival(input);
    const missed = allowanceFuel(input, { kind: 'takeoff', name: '', time_s: arrival.missedApproach.time_s, fuel_kg: arrival.missedApproach.fuel_kg }, destination, env.isaDev_K).fuel_kg;
    const landing = allowanceFuel(input, { kind: 'approach', name: '', time_s: arrival.alternateApproach.time_s, fuel_kg: arrival.alternateApproach.fuel_kg }, alt.elevation_m, env.isaDev_K).fuel_kg;
    const top = Math.max(alt.cruiseAltitude_m, alt.elevation_m + HOLD_HEIGHT_M);
    const up = climbSettings(input, alt);
    const down = descentSettings(input, alt);
    const climb = pathEstimate(input, destination, top, up.schedule, { rating: up.rating }, landing_kg, env);
    const descent = pathEstimate(input, top, alt.elevation_m + HOLD_HEIGHT_M, down.schedule, { descent: down.mode }, landing_kg, env);
    const law = massLaw((m) => 1 / basisSpecificRange(input, specificRangeAt(input, top, alt.cruiseMach, m, env.isaDev_K), top, alt.cruiseMach, env), landing_kg);
    alternate =
      climb === null || descent === null || law === null
        ? null
        : (m: number) => {
            const cruise_m = Math.max(alt.distance_m - climb.distance_m - descent.distance_m, 0);
            const top_kg = m - missed - climb.fuel_kg;
            return missed + climb.fuel_kg + (top_kg - afterBurn(law, top_kg, cruise_m)) + descent.fuel_kg + landing;
          };
  }
  if (alternate === null) return null;
  const altFuel = alternate;
  return (landing_kg, tripFuel_kg, tripTime_s) => {
    let m = landing_kg;
    let contingency = 0;
    if (policy.preset === 'icaoAnnex6') contingency = Math.max(policy.contingencyFraction * tripFuel_kg, m - afterBurn(contingencyHold as MassLaw, m, policy.minContingency_s));
    else if (policy.preset === 'custom') contingency = policy.contingencyFraction * tripFuel_kg;
    else if (policy.preset === 'cfr121_645') contingency = m - afterBurn(cruiseTime as MassLaw, m, policy.enRouteFraction * tripTime_s);
    m -= contingency;
    const toAlternate = altFuel(m);
    m -= toAlternate;
    const final = m - afterBurn(finalHold, m, policy.finalReserve_s);
    return contingency + toAlternate + final + (policy.preset === 'custom' ? policy.extraFuel_kg : 0);
  };
}

interface ClosedFlight {
  readonly residual_kg: number;
  readonly top_kg: number;
  readonly after_m: number;
  readonly landing_kg: number;
  readonly tripFuel_kg: number;
  readonly tripTime_s: number;
}

/** The closed forms' flight from a ramp mass (kg): the residual at the range (kg: landing mass - zero-fuel mass - reserve), the top of descent's mass (kg) and the distance after it (m). */
function closedFlight(f: Figures, input: MissionInput, zfw_kg: number, ramp_kg: number, range_m: number): ClosedFlight {
  const solvable = solvableLegIndex(input);
  // The solvable leg's distance: the range less the others' (their distances do not depend on it).
  let others = 0;
  for (let i = 0; i < f.legs.length; i++) if (i !== solvable) others += f.legs[i](ramp_kg, 0).distance_m;
  return closedFlightAt(f, input, zfw_kg, ramp_kg, Math.max(range_m - others, 0));
}

/** The closed forms' flight from a ramp mass (kg) with the solvable leg `solvable_m` long (closedFlight). */
function closedFlightAt(f: Figures, input: MissionInput, zfw_kg: number, ramp_kg: number, solvable_m: number): ClosedFlight {
  const solvable = solvableLegIndex(input);
  let after = 0;
  for (let i = solvable + 1; i < f.legs.length; i++) after += f.legs[i](ramp_kg, 0).distance_m;
  let m = ramp_kg;
  let takeoff = ramp_kg;
  let top = ramp_kg;
  let time = 0;
  const first = input.legs.findIndex((l) => l.kind !== 'taxiOut');
  for (let i = 0; i < f.legs.length; i++) {
    if (i === first) takeoff = m;
    const leg = f.legs[i](m, solvable_m);
    m -= leg.fuel_kg;
    if (i === solvable) top = m;
    if (i >= first) time += leg.time_s;
  }
  return { residual_kg: m - zfw_kg - f.reserve(m, takeoff - m, time), top_kg: top, after_m: after, landing_kg: m, tripFuel_kg: takeoff - m, tripTime_s: time };
}

/** A first guess: the ramp mass (kg), and the top of descent (its mass, kg, and the distance after it, m) the closed forms fly from it. */
export interface RampGuess {
  readonly rampMass_kg: number;
  readonly top_kg: number;
  readonly after_m: number;
  /** How the reserve's flown items grow with the landing mass there (-), the trip fuel and time held: a kilogram either side. */
  readonly itemsPerKg: number;
}

/** The closed forms' d(reserve)/d(landing mass) (-) at a landing mass (kg) with the trip fuel (kg) and time (s) held; 0 when not finite or implausible. */
function itemsSlope(f: Figures, landing_kg: number, tripFuel_kg: number, tripTime_s: number): number {
  const slope = (f.reserve(landing_kg + 1, tripFuel_kg, tripTime_s) - f.reserve(landing_kg - 1, tripFuel_kg, tripTime_s)) / 2;
  return Number.isFinite(slope) && Math.abs(slope) < 0.5 ? slope : 0;
}

/**
 * First guess of the ramp mass (kg) for payloadRange (see the file comment); null when the closed forms have no
 * usable figure or do not close. `reference_kg` is a ramp mass to work the figures out at (e.g. a Breguet guess).
 */
export function rampMassGuess(input: MissionInput, zfw_kg: number, range_m: number, reference_kg: number): RampGuess | null {
  const f = figures(input, reference_kg, 1.1 * zfw_kg);
  if (f === null) return null;
  // Secant method on the closed forms (Burden & Faires, Numerical Analysis, 2.3).
  let x0 = reference_kg;
  let r0 = closedFlight(f, input, zfw_kg, x0, range_m).residual_kg;
  let x1 = x0 - r0 / 0.85;
  for (let k = 0; k < 20; k++) {
    if (!(x1 > zfw_kg) || !Number.isFinite(x1)) return null;
    const flight = closedFlight(f, input, zfw_kg, x1, range_m);
    const r1 = flight.residual_kg;
    if (!Number.isFinite(r1)) return null;
    if (Math.abs(r1) < 1e-3) {
      if (!Number.isFinite(flight.top_kg) || !Number.isFinite(flight.after_m)) return null;
      return { rampMass_kg: x1, top_kg: flight.top_kg, after_m: flight.after_m, itemsPerKg: itemsSlope(f, flight.landing_kg, flight.tripFuel_kg, flight.tripTime_s) };
    }
    const slope = (r1 - r0) / (x1 - x0);
    const next = x1 - r1 / (Number.isFinite(slope) && slope > 0.05 ? slope : 0.85);
    x0 = x1;
    r0 = r1;
    x1 = next;
  }
  return null;
}

/**
 * First guess of the solvable leg's distance (m, mission's basis) with a fixed ramp mass (maxRange, takeoffWeight
 * with a solvable leg): where the closed forms' residual vanishes (the secant method), with the reserve items'
 * growth with the landing mass there; null when they have no usable
 * figure, do not close, or the reserve cannot be carried at zero length by them.
 */
export function solvableDistanceGuess(input: MissionInput, zfw_kg: number, ramp_kg: number): { readonly distance_m: number; readonly itemsPerKg: number } | null {
  const f = figures(input, ramp_kg, 1.1 * zfw_kg);
  if (f === null) return null;
  let d0 = 0;
  let r0 = closedFlightAt(f, input, zfw_kg, ramp_kg, d0).residual_kg;
  if (!(r0 > 0)) return null;
  let d1 = 1e6;
  for (let k = 0; k < 30; k++) {
    const flight = closedFlightAt(f, input, zfw_kg, ramp_kg, d1);
    const r1 = flight.residual_kg;
    if (!Number.isFinite(r1)) {
      // Past where the closed forms run out of fuel: halve back towards the last usable distance.
      d1 = 0.5 * (d0 + d1);
      continue;
    }
    if (Math.abs(r1) < 1e-3) return d1 > 0 ? { distance_m: d1, itemsPerKg: itemsSlope(f, flight.landing_kg, flight.tripFuel_kg, flight.tripTime_s) } : null;
    const slope = (r1 - r0) / (d1 - d0);
    if (!(slope < 0) || !Number.isFinite(slope)) return null;
    d0 = d1;
    r0 = r1;
    d1 = Math.max(d1 - r1 / slope, 0.5 * d1);
  }
  return null;
}
