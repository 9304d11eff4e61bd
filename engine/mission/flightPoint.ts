/**
 * Evaluates the airframe and the installed engines at one flight point and
 * packs the result as a FlightSample.
 */
import type { DragBreakdown, DragSample } from '../aero/aeroModel';
import type { InstalledPoint, RatingName } from '../propulsion/propulsionModel';
import { casOfMach, missionAir, type MissionAir } from './missionAtmosphere';
import type { MissionInput } from './missionTypes';
import type { MissionContext } from './missionContext';
import { S_ALT, S_MASS, S_TAS, STATE_SIZE, type Evaluation, type FlightSample, type SegmentEvent } from './missionState';

export interface AirPoint {
  readonly altitude_m: number;
  readonly air: MissionAir;
  readonly mach: number;
  readonly tas_m_s: number;
  readonly drag: DragBreakdown;
}

/**
 * Air data and 1 g drag at pressure altitude (m), Mach (-), mass (kg), ISA deviation (K). The CAS is left to
 * makeSample: only a sample reads it, and the RK4 stages build none.
 */
export function airPoint(input: MissionInput, altitude_m: number, mach: number, mass_kg: number, isaDev_K: number): AirPoint {
  return airPointIn(input, missionAir(altitude_m, isaDev_K), altitude_m, mach, mass_kg);
}

/** airPoint with the air data `air` already looked up at `altitude_m` (missionAir at the leg's ISA deviation). */
export function airPointIn(input: MissionInput, air: MissionAir, altitude_m: number, mach: number, mass_kg: number): AirPoint {
  const drag = input.aero.drag({ altitude_m, mach, mass_kg, loadFactor: 1 });
  return {
    altitude_m,
    air,
    mach,
    tas_m_s: mach * air.speedOfSound_m_s,
    drag,
  };
}

/**
 * The drag force (N) at 1 g of `input.aero` at pressure altitude (m), Mach and mass (kg): the model's
 * dragForce_N where it has one (no breakdown object: the same bits), else drag(...).drag_N. For RK4 stages,
 * which read the force alone.
 */
export function dragForceAt(input: MissionInput, altitude_m: number, mach: number, mass_kg: number): number {
  const aero = input.aero;
  return aero.dragForce_N !== undefined ? aero.dragForce_N(altitude_m, mach, mass_kg, 1) : aero.drag({ altitude_m, mach, mass_kg, loadFactor: 1 }).drag_N;
}

/**
 * The drag at 1 g of `input.aero` at pressure altitude (m), Mach and mass (kg) as the fields a sample reads, written
 * into `out` (the model's dragSampleInto, the same bits as its drag(); else copied from drag()). For accepted
 * points that build a sample and no AirPoint: no breakdown object either.
 */
export function dragSampleAt(input: MissionInput, altitude_m: number, mach: number, mass_kg: number, out: DragSample): DragSample {
  const aero = input.aero;
  if (aero.dragSampleInto !== undefined) {
    aero.dragSampleInto(altitude_m, mach, mass_kg, 1, out);
    return out;
  }
  const d = aero.drag({ altitude_m, mach, mass_kg, loadFactor: 1 });
  out.drag_N = d.drag_N;
  out.cl = d.cl;
  out.clMax = d.clMax;
  out.buffetLoadFactor = d.buffetLoadFactor;
  out.liftToDrag = d.liftToDrag;
  out.outsideTables = d.outsideTables;
  return out;
}

/** Installed thrust and fuel flow (all engines) at a rating. */
export function ratingPoint(input: MissionInput, at: AirPoint, isaDev_K: number, rating: RatingName): InstalledPoint {
  return input.propulsion.atRating({ altitude_m: at.altitude_m, mach: at.mach, isaDev_K }, rating);
}

/**
 * The fuel flow (kg/s, all engines) of the part-power point giving `thrust_N` (all engines) at pressure altitude
 * (m), Mach and ISA deviation (K), limited by `ceiling`: forThrust's fuel flow, to the bit, by the model's
 * fuelFlowForThrust where it has one. For RK4 stages, which read the fuel flow alone.
 */
export function partPowerFuelFlow(input: MissionInput, altitude_m: number, mach: number, isaDev_K: number, thrust_N: number, ceiling: RatingName): number {
  const propulsion = input.propulsion;
  const condition = { altitude_m, mach, isaDev_K };
  return propulsion.fuelFlowForThrust !== undefined
    ? propulsion.fuelFlowForThrust(condition, thrust_N, ceiling)
    : propulsion.forThrust(condition, thrust_N, ceiling).fuelFlow_kg_s;
}

/** A FlightSample a segment writes each accepted point into (Segment.evaluate): a hot loop's own record. */
export type SampleRecord = { -readonly [K in keyof FlightSample]: FlightSample[K] };

/** A blank SampleRecord, its numbers NaN (doubles from the start, so that writing one allocates nothing). */
export function newSampleRecord(): SampleRecord {
  return {
    altitude_m: Number.NaN,
    mach: Number.NaN,
    cas_m_s: Number.NaN,
    tas_m_s: Number.NaN,
    thrustAvailable_N: Number.NaN,
    thrustUsed_N: Number.NaN,
    drag_N: Number.NaN,
    fuelFlow_kg_s: Number.NaN,
    cl: Number.NaN,
    clMax: Number.NaN,
    buffetLoadFactor: Number.NaN,
    liftToDrag: Number.NaN,
    climbRate_m_s: Number.NaN,
    throatMach: null,
    idleAboveDrag: false,
    polarOutside: [],
    propulsionCautions: [],
  };
}

/** Copies every field of `sample` into `out` and returns `out`. */
export function copySampleInto(out: SampleRecord, sample: FlightSample): SampleRecord {
  out.altitude_m = sample.altitude_m;
  out.mach = sample.mach;
  out.cas_m_s = sample.cas_m_s;
  out.tas_m_s = sample.tas_m_s;
  out.thrustAvailable_N = sample.thrustAvailable_N;
  out.thrustUsed_N = sample.thrustUsed_N;
  out.drag_N = sample.drag_N;
  out.fuelFlow_kg_s = sample.fuelFlow_kg_s;
  out.cl = sample.cl;
  out.clMax = sample.clMax;
  out.buffetLoadFactor = sample.buffetLoadFactor;
  out.liftToDrag = sample.liftToDrag;
  out.climbRate_m_s = sample.climbRate_m_s;
  out.throatMach = sample.throatMach;
  out.idleAboveDrag = sample.idleAboveDrag;
  out.polarOutside = sample.polarOutside;
  out.propulsionCautions = sample.propulsionCautions;
  return out;
}

/** A sample of its own with the fields of `sample` (what an integrator returns of a record it will write again). */
export function copyOfSample(sample: FlightSample): FlightSample {
  return copySampleInto(newSampleRecord(), sample);
}

/** Writes a FlightSample into `out` (the solve's shared record, Segment.evaluate) from the point's numbers, its air data and its drag (a breakdown or a DragSample record). */
export function packSampleInto(
  out: SampleRecord,
  altitude_m: number,
  mach: number,
  air: MissionAir,
  tas_m_s: number,
  drag: DragSample | DragBreakdown,
  thrustAvailable_N: number,
  thrustUsed_N: number,
  fuelFlow_kg_s: number,
  climbRate_m_s: number,
  engine: InstalledPoint,
): FlightSample {
  out.altitude_m = altitude_m;
  out.mach = mach;
  out.cas_m_s = casOfMach(mach, air.pressure_Pa);
  out.tas_m_s = tas_m_s;
  out.thrustAvailable_N = thrustAvailable_N;
  out.thrustUsed_N = thrustUsed_N;
  out.drag_N = drag.drag_N;
  out.fuelFlow_kg_s = fuelFlow_kg_s;
  out.cl = drag.cl;
  out.clMax = drag.clMax;
  out.buffetLoadFactor = drag.buffetLoadFactor;
  out.liftToDrag = drag.liftToDrag;
  out.climbRate_m_s = climbRate_m_s;
  out.throatMach = engine.perEngine.throatMach;
  out.idleAboveDrag = 'limit' in engine && engine.limit === 'below_idle' && drag.drag_N < engine.thrust_N && climbRate_m_s === 0;
  out.polarOutside = drag.outsideTables ?? [];
  out.propulsionCautions = engine.cautions;
  return out;
}

/** Fuel-exhaustion event function: >= 0 once the mass reaches zero-fuel mass. */
export function fuelExhaustedG(zeroFuelMass_kg: number, mass_kg: number): number {
  return zeroFuelMass_kg - mass_kg;
}

/** The fuel-exhausted stop of a segment; none when the options let fuel go negative (convergence studies). */
export function fuelExhaustedEvents(ctx: MissionContext): SegmentEvent[] {
  if (ctx.options.allowNegativeFuel) return [];
  return [{ stop: 'fuel_exhausted', stateOnly: true, g: (y) => fuelExhaustedG(ctx.zeroFuelMass_kg, y[S_MASS]) }];
}

/**
 * d(state)/dt on a climbing or descending path at constant TAS: the
 * pressure-altitude rate (m/s) becomes a geometric rate through T/T_isa, the
 * horizontal speed is what the TAS leaves of it, and the wind (m/s, + tail)
 * adds to the ground track. Fuel flow in kg/s.
 */
export function pathDerivative(
  pressureAltitudeRate_m_s: number,
  tas_m_s: number,
  air: MissionAir,
  wind_m_s: number,
  fuelFlow_kg_s: number,
): Evaluation['derivative'] {
  return writePathDerivative(new Float64Array(STATE_SIZE), pressureAltitudeRate_m_s, tas_m_s, air, wind_m_s, fuelFlow_kg_s);
}

/** pathDerivative written into `d` (STATE_SIZE entries, every one written: the TAS holds): a reused buffer (segmentBuffers.ts). */
export function writePathDerivative(
  d: Float64Array<ArrayBuffer>,
  pressureAltitudeRate_m_s: number,
  tas_m_s: number,
  air: MissionAir,
  wind_m_s: number,
  fuelFlow_kg_s: number,
): Float64Array<ArrayBuffer> {
  const geometric = (pressureAltitudeRate_m_s * air.temperature_K) / air.isaTemperature_K;
  const horizontal = Math.sqrt(Math.max(tas_m_s * tas_m_s - geometric * geometric, 0));
  d[0] = 1;
  d[1] = horizontal;
  d[2] = horizontal + wind_m_s;
  d[S_ALT] = pressureAltitudeRate_m_s;
  d[S_MASS] = -fuelFlow_kg_s;
  d[S_TAS] = 0;
  return d;
}
