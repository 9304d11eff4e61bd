/**
 * The limit schedule: each limit's maximum at an ambient temperature, the
 * value of each limited quantity in an engine state, and the limits a
 * rating applies (its own with the engine's hard limits, the lower of the two).
 * Schedules by ambient temperature are linear between their points and hold
 * their end values beyond them, as a flat-rating schedule is defined.
 */
import type { CycleEngine } from './cycleEngine';
import type { LimitName, LimitSet, LimitValue } from './cycleSpec';
import { LIMIT_NAMES } from './cycleSpec';
import type { CycleState } from './cycleState';
import { spoolSpeeds } from './spoolSpeeds';

/** A limit's maximum at the ambient static temperature (K). */
export function limitAt(value: LimitValue, ambient_K: number): number {
  if (typeof value === 'number') return value;
  const pts = value.byAmbientTemperature;
  if (ambient_K <= pts[0]![0]) return pts[0]![1];
  for (let i = 1; i < pts.length; i++) {
    const [t1, v1] = pts[i]!;
    if (ambient_K <= t1) {
      const [t0, v0] = pts[i - 1]!;
      return v0 + ((v1 - v0) * (ambient_K - t0)) / (t1 - t0);
    }
  }
  return pts[pts.length - 1]![1];
}

export interface ActiveLimit {
  readonly name: LimitName;
  readonly max: number;
}

/** The limits in force for a limits rating at an ambient temperature: for each quantity the lower of the rating's and the hard limit. */
export function limitsInForce(hard: LimitSet, rating: LimitSet, ambient_K: number): ActiveLimit[] {
  const out: ActiveLimit[] = [];
  for (const name of LIMIT_NAMES) {
    const a = hard[name];
    const b = rating[name];
    if (a === undefined && b === undefined) continue;
    const max = Math.min(a === undefined ? Infinity : limitAt(a, ambient_K), b === undefined ? Infinity : limitAt(b, ambient_K));
    out.push({ name, max });
  }
  return out;
}

/** The value of a limited quantity in an engine state (speeds as fractions of design, SI otherwise). */
export function limitQuantity(engine: CycleEngine, state: CycleState, name: LimitName): number {
  switch (name) {
    case 'turbineInletTemperature':
      return state.variables.tt4_K;
    case 'compressorExitPressure':
      return state.pt3_Pa;
    case 'compressorExitTemperature':
      return state.tt3_K;
    case 'fanSpeed':
      return spoolSpeeds(engine, state).fanSpeed;
    case 'fanCorrectedSpeed':
      return spoolSpeeds(engine, state).fanCorrectedSpeed;
    case 'coreSpeed':
      return spoolSpeeds(engine, state).coreSpeed;
  }
}

/** Units of each limit for messages. */
export const LIMIT_UNITS: Readonly<Record<LimitName, string>> = {
  turbineInletTemperature: 'K',
  fanSpeed: 'of design',
  fanCorrectedSpeed: 'of design',
  coreSpeed: 'of design',
  compressorExitPressure: 'Pa',
  compressorExitTemperature: 'K',
};
