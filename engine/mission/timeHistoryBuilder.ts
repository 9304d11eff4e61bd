/**
 * The flight log a mission writes while it is flown: time-history columns
 * and cautions (first occurrence per caution id and leg), built into the
 * MissionResult's typed arrays at the end. A log without history (a sweep's
 * solves, SolveOptions.timeHistory false) raises the same cautions and
 * leaves the columns empty.
 */
import type { Caution } from '../cautions/caution';
import {
  checkBuffetMargin,
  checkClMax,
  checkMmo,
  checkPolarClamped,
  checkThroatMach,
  checkVmo,
  idleAboveDragCaution,
  type CautionDraft,
} from '../cautions/checks';
import { propulsionCautionShown, type CautionSettings } from '../cautions/cautionSettings';
import type { Airframe, TimeHistory } from './missionTypes';
import { S_AIR, S_MASS, S_TIME, type FlightSample, type StateVector } from './missionState';
import type { LegTarget } from './missionContext';

const COLUMNS = [
  'time_s',
  'distance_m',
  'altitude_m',
  'mach',
  'cas_m_s',
  'tas_m_s',
  'mass_kg',
  'thrustAvailable_N',
  'thrustUsed_N',
  'drag_N',
  'fuelFlow_kg_s',
  'cl',
  'liftToDrag',
  'climbRate_m_s',
] as const;

type Column = (typeof COLUMNS)[number];

export interface FlightLog {
  readonly columns: Record<Column, number[]>;
  readonly legIndex: number[];
  /** The cautions raised, in the order raised: the first of each id on each leg. */
  readonly cautions: Caution[];
  /** The caution ids raised per leg index (the has-check of every point's checks). */
  readonly raised: (Set<string> | undefined)[];
  readonly airframe: Airframe;
  readonly settings: CautionSettings;
  /** A quiet log (the reserves' trial flights) records neither history nor cautions. */
  readonly quiet: boolean;
  /** False: the time-history columns stay empty (cautions are still raised, unless quiet). */
  readonly history: boolean;
}

/**
 * An empty column that holds doubles from the start: an empty array literal holds small integers until a fraction
 * arrives, and a column whose first values are whole (a leg's first times and rates) then sends the optimised
 * appendSample back to the interpreter ("lost precision") every time a later log's column meets its first fraction.
 */
function doubleColumn(): number[] {
  const column = [0.5];
  column.length = 0;
  return column;
}

/** An empty flight log; a quiet one ignores samples and cautions, one without `history` keeps no time history. */
export function createFlightLog(airframe: Airframe, settings: CautionSettings, quiet = false, history = true): FlightLog {
  // A literal in COLUMNS order (one shape for every log; a keyed store per column would go megamorphic).
  const columns: Record<Column, number[]> = {
    time_s: doubleColumn(),
    distance_m: doubleColumn(),
    altitude_m: doubleColumn(),
    mach: doubleColumn(),
    cas_m_s: doubleColumn(),
    tas_m_s: doubleColumn(),
    mass_kg: doubleColumn(),
    thrustAvailable_N: doubleColumn(),
    thrustUsed_N: doubleColumn(),
    drag_N: doubleColumn(),
    fuelFlow_kg_s: doubleColumn(),
    cl: doubleColumn(),
    liftToDrag: doubleColumn(),
    climbRate_m_s: doubleColumn(),
  };
  return { columns, legIndex: [], cautions: [], raised: [], airframe, settings, quiet, history };
}

/** A new empty log that records what `log` records (a fuel-iteration pass's own log). */
export function freshFlightLog(log: FlightLog): FlightLog {
  return createFlightLog(log.airframe, log.settings, log.quiet, log.history);
}

/** Whether a caution with this id was already raised on the target's leg. */
function raisedOnLeg(log: FlightLog, id: string, target: LegTarget): boolean {
  return log.raised[target.legIndex]?.has(id) === true;
}

/** Adds a caution unless one with the same id was already raised on the same leg. */
export function appendCaution(log: FlightLog, target: LegTarget, drafted: CautionDraft | Caution | null, time_s: number): void {
  if (drafted === null || log.quiet) return;
  const id = drafted.id;
  if (raisedOnLeg(log, id, target)) return;
  const leg = target.legIndex;
  (log.raised[leg] ??= new Set()).add(id);
  log.cautions.push(placedCaution(drafted, leg, target.legName, time_s));
}

/**
 * The caution `drafted` raised on a leg at a time: its fields copied in order, a lazily worked-out field (the
 * message of checks.ts drafts) copied as the getter, not read (only the converged pass's cautions are read).
 */
function placedCaution(drafted: CautionDraft | Caution, legIndex: number, legName: string, time_s: number): Caution {
  const out: Record<string, unknown> = {};
  for (const key of Object.keys(drafted)) {
    const field = Object.getOwnPropertyDescriptor(drafted, key)!;
    if (field.get !== undefined) Object.defineProperty(out, key, { get: field.get, enumerable: true, configurable: true });
    else out[key] = field.value;
  }
  out.legIndex = legIndex;
  out.legName = legName;
  out.time_s = time_s;
  return out as unknown as Caution;
}

/** Id of the caution idleAboveDragCaution drafts (its message is only written when the leg has not raised it yet). */
const IDLE_ABOVE_DRAG_ID = idleAboveDragCaution(0, 0).id;

/** Records one accepted point: history row (trip legs) and the per-point caution checks. */
export function appendSample(log: FlightLog, target: LegTarget, state: StateVector, sample: FlightSample): void {
  if (log.quiet) return;
  const t = state[S_TIME];
  if (target.recordHistory && log.history) {
    const c = log.columns;
    const n = log.legIndex.length;
    const duplicate = n > 0 && log.legIndex[n - 1] === target.legIndex && c.time_s[n - 1] === t;
    if (!duplicate) {
      c.time_s.push(t);
      c.distance_m.push(state[S_AIR]);
      c.altitude_m.push(sample.altitude_m);
      c.mach.push(sample.mach);
      c.cas_m_s.push(sample.cas_m_s);
      c.tas_m_s.push(sample.tas_m_s);
      c.mass_kg.push(state[S_MASS]);
      c.thrustAvailable_N.push(sample.thrustAvailable_N);
      c.thrustUsed_N.push(sample.thrustUsed_N);
      c.drag_N.push(sample.drag_N);
      c.fuelFlow_kg_s.push(sample.fuelFlow_kg_s);
      c.cl.push(sample.cl);
      c.liftToDrag.push(sample.liftToDrag);
      c.climbRate_m_s.push(sample.climbRate_m_s);
      log.legIndex.push(target.legIndex);
    }
  }
  if (sample.tas_m_s > 0) {
    const s = log.settings;
    appendCaution(log, target, checkVmo(sample.cas_m_s, log.airframe.vmo_m_s, s.vmoMargin_m_s), t);
    appendCaution(log, target, checkMmo(sample.mach, log.airframe.mmo, s.mmoMargin), t);
    appendCaution(log, target, checkClMax(sample.cl, sample.clMax), t);
    appendCaution(log, target, checkBuffetMargin(sample.buffetLoadFactor, s.minBuffetLoadFactor), t);
  }
  appendCaution(log, target, checkThroatMach(sample.throatMach, log.settings.maxThroatMach), t);
  appendCaution(log, target, checkPolarClamped(sample.polarOutside), t);
  // The draft formats two forces into its message: written only for the leg's first such point (the one kept).
  if (sample.idleAboveDrag && !raisedOnLeg(log, IDLE_ABOVE_DRAG_ID, target)) {
    appendCaution(log, target, idleAboveDragCaution(sample.drag_N, sample.thrustUsed_N), t);
  }
  const engineCautions = sample.propulsionCautions;
  for (let i = 0; i < engineCautions.length; i++) {
    const c = engineCautions[i]!;
    if (propulsionCautionShown(c, log.settings)) appendCaution(log, target, c, t);
  }
}

/**
 * The time history as typed arrays: views on one buffer (one backing store instead of fifteen, each of which costs
 * an allocation outside the JavaScript heap), the columns in COLUMNS order and the leg index last.
 */
export function buildTimeHistory(log: FlightLog): TimeHistory {
  const c = log.columns;
  const n = log.legIndex.length;
  const buffer = new ArrayBuffer(n * (COLUMNS.length * Float64Array.BYTES_PER_ELEMENT + Int32Array.BYTES_PER_ELEMENT));
  const legIndex = new Int32Array(buffer, n * COLUMNS.length * Float64Array.BYTES_PER_ELEMENT, n);
  legIndex.set(log.legIndex);
  let offset = 0;
  const column = (values: readonly number[]): Float64Array<ArrayBuffer> => {
    const view = new Float64Array(buffer, offset, n);
    view.set(values);
    offset += n * Float64Array.BYTES_PER_ELEMENT;
    return view;
  };
  return {
    time_s: column(c.time_s),
    distance_m: column(c.distance_m),
    altitude_m: column(c.altitude_m),
    mach: column(c.mach),
    cas_m_s: column(c.cas_m_s),
    tas_m_s: column(c.tas_m_s),
    mass_kg: column(c.mass_kg),
    thrustAvailable_N: column(c.thrustAvailable_N),
    thrustUsed_N: column(c.thrustUsed_N),
    drag_N: column(c.drag_N),
    fuelFlow_kg_s: column(c.fuelFlow_kg_s),
    cl: column(c.cl),
    liftToDrag: column(c.liftToDrag),
    climbRate_m_s: column(c.climbRate_m_s),
    legIndex,
  };
}
