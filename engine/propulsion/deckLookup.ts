/**
 * Reading the deck at a flight condition and power setting: multilinear
 * interpolation on the ragged grid (deckGrid.ts), the out-of-table policy of
 * each axis, and the corrected-parameter temperature approximation for decks
 * without an ISA-deviation axis (deckTemperature.ts). Per engine, uninstalled.
 */
import type { Caution } from '../cautions/caution';
import { err, ok, type Result } from '../core/result';
import { messageText, msg, q, withParts, type MessageParts } from '../units/messageParts';
import type { EngineDeck, OutOfTablePolicy } from './engineDeck';
import type { DeckAxis, FlightCondition, RatingName } from './propulsionModel';
import {
  AXIS_ALTITUDE,
  AXIS_ISA_DEV,
  AXIS_MACH,
  AXIS_POWER,
  DECK_AXES,
  DECK_VALUES_WITH_SENSITIVITIES,
  createDeckNodeSet,
  evaluateDeckNodesInto,
  fillDeckNodes,
  nodesPowerRangeInto,
  type DeckNodeSet,
} from './deckGrid';
import { queryCorrectionInto } from './deckCorrection';
import { temperatureApproximationCaution, temperatureFlowFactor } from './deckTemperature';
import { readSensitivities, type InstallationSensitivities } from './installationSensitivities';

export interface DeckLookup {
  /** Power setting asked for (-), on the deck's power axis. */
  readonly power: number;
  /** Uninstalled net thrust per engine (N). */
  readonly thrust_N: number;
  /** Uninstalled fuel flow per engine (kg/s). */
  readonly fuelFlow_kg_s: number;
  /** Engine airflow per engine (kg/s); null when the deck has none. */
  readonly airflow_kg_s: number | null;
  /** The deck's installation sensitivities at this point, interpolated like the rest; null when the deck has none. */
  readonly sensitivities: InstallationSensitivities | null;
  /** Axes the lookup left (empty when inside the table). */
  readonly outside: readonly DeckAxis[];
  readonly cautions: readonly Caution[];
}

export interface DeckLookupError {
  readonly code: 'outside_deck';
  readonly axis: DeckAxis;
  readonly value: number;
  readonly min: number;
  readonly max: number;
  readonly message: string;
}

const NOTHING: readonly never[] = Object.freeze([]);

/** The outside list of a lookup inside the table on every axis (shared, frozen). */
export const INSIDE_TABLE: readonly DeckAxis[] = NOTHING;
const scratch = createDeckNodeSet();
const values = new Float64Array(DECK_VALUES_WITH_SENSITIVITIES);
const range = new Float64Array(2);
const factors = new Float64Array(3);

/**
 * Uninstalled thrust (N), fuel flow (kg/s) and airflow (kg/s) per engine at
 * `condition` and power setting `power`. Multilinear on the deck's grid;
 * off the table each axis follows `deck.policy` (extrapolate or clamp with a
 * caution, or the error `outside_deck` for 'refuse'). A non-finite input is a
 * caller bug and throws.
 */
export function lookupDeck(
  deck: EngineDeck,
  condition: FlightCondition,
  power: number,
): Result<DeckLookup, DeckLookupError> {
  assertFiniteInputs(condition, power);
  const s = scratch;
  const filled = fillDeckNodes(deck.grid, deck.policy, condition.isaDev_K, condition.altitude_m, condition.mach, s);
  return lookupFilledDeck(deck, condition, power, s, filled, s.outsideMask);
}

/**
 * lookupDeck on a node set already filled at `condition` by fillDeckNodes
 * (`filled` its return value, `conditionMask` the outside mask it left): for
 * callers that keep the nodes of one condition for several powers. The same
 * answer as lookupDeck to the bit.
 */
export function lookupFilledDeck(
  deck: EngineDeck,
  condition: FlightCondition,
  power: number,
  s: DeckNodeSet,
  filled: boolean,
  conditionMask: number,
  correction?: Float64Array,
): Result<DeckLookup, DeckLookupError> {
  assertFiniteInputs(condition, power);
  if (!filled) return err(refusal(deck, s));
  // A previous power may have left the power axis: start from the condition's own mask.
  s.outsideMask = conditionMask;
  s.refusedAxis = -1;
  if (!evaluateDeckNodesInto(deck.grid, s, power, deck.policy.power, values)) {
    return err(refusal(deck, s));
  }
  return ok(finishLookup(deck, condition, power, s, values, correction));
}

/**
 * Builds the lookup from evaluated node values (thrust, fuel flow, airflow in
 * v[0..2], sensitivities in v[3..11] when the deck has them) and the node
 * set's outside flags. Shared with deckInversion.ts. `correction`, when given,
 * holds the corrected-parameter factors at `condition` (queryCorrectionInto's).
 */
export function finishLookup(
  deck: EngineDeck,
  condition: FlightCondition,
  power: number,
  s: DeckNodeSet,
  v: Float64Array,
  correction?: Float64Array,
): DeckLookup {
  if (deck.interpolation === 'corrected') {
    // `correction`: the query's factors (queryCorrectionInto) when the caller holds them.
    const c = correction ?? factors;
    if (correction === undefined) queryCorrectionInto(deck, condition.altitude_m, condition.mach, condition.isaDev_K, factors);
    v[0] = v[0]! * c[0]!;
    v[1] = v[1]! * c[1]!;
    v[2] = v[2]! * c[2]!;
  }
  let fuelFlow = v[1]!;
  let airflow: number | null = deck.hasAirflow ? v[2]! : null;
  const approximateTemperature = !deck.hasIsaDev && condition.isaDev_K !== 0;
  let f = 1;
  if (approximateTemperature) {
    f = temperatureFlowFactor(condition.altitude_m, condition.isaDev_K);
    fuelFlow *= f;
    if (airflow !== null) airflow /= f;
  }
  const sensitivities = deck.hasSensitivities && v.length >= DECK_VALUES_WITH_SENSITIVITIES ? readSensitivities(v, 3, deck.hasAirflow, f) : null;
  if (s.outsideMask === 0) {
    return { power, thrust_N: v[0]!, fuelFlow_kg_s: fuelFlow, airflow_kg_s: airflow, sensitivities, outside: INSIDE_TABLE, cautions: insideTableCautions(deck, condition.isaDev_K) };
  }
  const outside: DeckAxis[] = [];
  const cautions: Caution[] = [];
  for (let axis = 0; axis < 4; axis++) {
    if ((s.outsideMask & (1 << axis)) === 0) continue;
    outside.push(DECK_AXES[axis]!);
    cautions.push(outsideCaution(deck, axis, s));
  }
  if (approximateTemperature) cautions.push(temperatureCaution(deck.title, condition.isaDev_K));
  // Off the table, a linear extrapolation can fall below zero: no engine gives negative fuel flow or airflow,
  // and the installed model needs thrust >= 0; each is floored at zero with a caution naming the value.
  const floored: MessageParts[] = [];
  const floor = (name: string, value: number, kind: 'force' | 'fuelFlow' | 'airflow'): number => {
    if (value >= 0) return value;
    floored.push(msg`${name} ${q(value, kind)}`);
    return 0;
  };
  const thrust = floor('thrust', v[0]!, 'force');
  fuelFlow = floor('fuel flow', fuelFlow, 'fuelFlow');
  if (airflow !== null) airflow = floor('airflow', airflow, 'airflow');
  if (floored.length > 0) {
    const list = floored.flatMap((f, k) => (k === 0 ? f : [', ', ...f]));
    cautions.push({
      id: 'deck_output_floored',
      severity: 'warning',
      ...withParts(msg`Deck "${deck.title}": the extrapolation off the table gave ${list}; read as 0 (${outside.join(', ')} outside the table).`),
      value: v[0]!,
      threshold: 0,
    });
  }
  return { power, thrust_N: thrust, fuelFlow_kg_s: fuelFlow, airflow_kg_s: airflow, sensitivities, outside, cautions };
}

// The temperature caution is the same for every lookup of a deck at one ISA deviation (a mission
// makes ~1e5 of them): keep the last one, frozen, instead of rebuilding its message each time.
let cachedTitle = '';
let cachedIsaDev_K = Number.NaN;
let cachedCaution: Caution | null = null;
let cachedList: readonly Caution[] = NOTHING;

function temperatureCaution(title: string, isaDev_K: number): Caution {
  if (cachedCaution === null || title !== cachedTitle || isaDev_K !== cachedIsaDev_K) {
    cachedCaution = Object.freeze(temperatureApproximationCaution(title, isaDev_K));
    cachedList = Object.freeze([cachedCaution]);
    cachedTitle = title;
    cachedIsaDev_K = isaDev_K;
  }
  return cachedCaution;
}

function temperatureCautionList(title: string, isaDev_K: number): readonly Caution[] {
  temperatureCaution(title, isaDev_K);
  return cachedList;
}

/**
 * The cautions of a lookup of `deck` inside the table on every axis at an ISA deviation (K): the temperature
 * approximation's on a deck without an ISA axis off a standard day, else none (finishLookup's, the same list).
 */
export function insideTableCautions(deck: EngineDeck, isaDev_K: number): readonly Caution[] {
  return !deck.hasIsaDev && isaDev_K !== 0 ? temperatureCautionList(deck.title, isaDev_K) : NOTHING;
}

/** Describes the 'refuse' stop recorded in `s` as the `outside_deck` error. */
export function refusal(deck: EngineDeck, s: DeckNodeSet): DeckLookupError {
  const axis = s.refusedAxis;
  const value = s.outsideValue[axis]!;
  const min = s.outsideMin[axis]!;
  const max = s.outsideMax[axis]!;
  return {
    code: 'outside_deck',
    axis: DECK_AXES[axis]!,
    value,
    min,
    max,
    message: messageText(
      msg`Deck "${deck.title}": ${describeValue(axis, value)} is outside the table (${describeRange(axis, min, max, s)}) and the ${DECK_AXES[axis]!} policy is 'refuse'.`,
      'both',
    ),
  };
}

function outsideCaution(deck: EngineDeck, axis: number, s: DeckNodeSet): Caution {
  const value = s.outsideValue[axis]!;
  const min = s.outsideMin[axis]!;
  const max = s.outsideMax[axis]!;
  const policy: OutOfTablePolicy = deck.policy[DECK_AXES[axis]!];
  const above = value > max;
  const bound = above ? max : min;
  const what =
    policy === 'clamp'
      ? `read at the ${above ? 'highest' : 'lowest'} tabulated value`
      : 'extrapolated linearly from the last two tabulated values';
  const parts = msg`Deck "${deck.title}": ${describeValue(axis, value)} is ${above ? 'above' : 'below'} the table (${describeRange(axis, min, max, s)}); ${what}.`;
  return {
    id: policy === 'clamp' ? 'deck_clamped' : 'deck_extrapolation',
    severity: 'caution',
    message: messageText(parts, 'both'),
    parts,
    value,
    threshold: bound,
  };
}

function describeValue(axis: number, value: number): MessageParts {
  switch (axis) {
    case AXIS_ALTITUDE:
      return msg`altitude ${q(value, 'altitude')}`;
    case AXIS_MACH:
      return msg`Mach ${q(value, 'mach')}`;
    case AXIS_POWER:
      return msg`power ${q(value, 'ratio')}`;
    case AXIS_ISA_DEV:
      return msg`ISA deviation ${q(value, 'temperatureDelta')}`;
    default:
      throw new RangeError(`unknown deck axis ${axis}`);
  }
}

function describeRange(axis: number, min: number, max: number, s: DeckNodeSet): MessageParts {
  const kind = axis === AXIS_ALTITUDE ? 'altitude' : axis === AXIS_ISA_DEV ? 'temperatureDelta' : axis === AXIS_MACH ? 'mach' : 'ratio';
  const alt = q(s.outsideAtAltitude_m[axis]!, 'altitude');
  const where =
    axis === AXIS_MACH
      ? msg` at the tabulated altitude ${alt}`
      : axis === AXIS_POWER
        ? msg` at the tabulated node ${alt}, Mach ${q(s.outsideAtMach[axis]!, 'mach')}`
        : [];
  return [q(min, kind), ' to ', q(max, kind), ...where];
}

function assertFiniteInputs(condition: FlightCondition, power: number): void {
  if (
    !Number.isFinite(condition.altitude_m) ||
    !Number.isFinite(condition.mach) ||
    !Number.isFinite(condition.isaDev_K) ||
    !Number.isFinite(power)
  ) {
    throw new RangeError(
      `deck lookup: non-finite input (altitude ${condition.altitude_m} m, Mach ${condition.mach}, ` +
        `ISA deviation ${condition.isaDev_K} K, power ${power})`,
    );
  }
}

/** The power-axis value of a named rating (-), or `unknown_rating` when the deck does not define it. */
export function ratingPower(
  deck: EngineDeck,
  rating: RatingName,
): Result<number, { readonly code: 'unknown_rating'; readonly message: string }> {
  const value = deck.ratings[rating];
  if (value === undefined) {
    const known = Object.keys(deck.ratings);
    return err({
      code: 'unknown_rating',
      message: `Deck "${deck.title}" defines no rating "${rating}"${known.length ? ` (it has: ${known.join(', ')})` : ' (it has none)'}.`,
    });
  }
  return ok(value);
}

/**
 * The power range (-) at `condition`: `max` is the highest power tabulated
 * at every surrounding (altitude, Mach) node; `idle` is the deck's
 * flightIdle rating if it has one, else the lowest power tabulated at every
 * surrounding node. 'refuse' policies act as 'clamp' here.
 */
export function powerBounds(deck: EngineDeck, condition: FlightCondition): { readonly idle: number; readonly max: number } {
  assertFiniteInputs(condition, 0);
  fillDeckNodes(deck.grid, deck.policy, condition.isaDev_K, condition.altitude_m, condition.mach, scratch, false);
  nodesPowerRangeInto(deck.grid, scratch, range);
  return { idle: deck.ratings.flightIdle ?? range[0]!, max: range[1]! };
}
