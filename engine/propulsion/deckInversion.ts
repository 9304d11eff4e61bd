/**
 * Part power: the deck power setting that gives a wanted uninstalled thrust.
 *
 * At a fixed condition the interpolated thrust is a weighted sum of each
 * surrounding node's piecewise-linear thrust-vs-power curve, so it is itself
 * piecewise linear with breakpoints at the union of the nodes' power values.
 * The solver walks those breakpoints upward from idle and solves the first
 * segment that reaches the wanted thrust exactly (no iteration tolerance).
 */
import { err, ok, type Result } from '../core/result';
import type { EngineDeck } from './engineDeck';
import type { FlightCondition, ThrustLimit } from './propulsionModel';
import {
  AXIS_POWER,
  DECK_VALUES_WITH_SENSITIVITIES,
  createDeckNodeSet,
  evaluateDeckNodesInto,
  fillDeckNodes,
  nextPowerBreakpoint,
  nodesPowerRangeInto,
} from './deckGrid';
import { queryCorrectionInto } from './deckCorrection';
import { finishLookup, refusal, type DeckLookup, type DeckLookupError } from './deckLookup';

const correction = new Float64Array(3);

const scratch = createDeckNodeSet();
const values = new Float64Array(DECK_VALUES_WITH_SENSITIVITIES);
const range = new Float64Array(2);

/**
 * Power setting (-) between idle (the flightIdle rating, else the lowest
 * common tabulated power) and `ceilingPower` (default: the highest common
 * tabulated power) at which the deck's uninstalled thrust per engine equals
 * `thrust_N` (N). Exact on the piecewise-linear interpolant. Outside that
 * range the point is AT the limit and `limit` says 'above_rating' or
 * 'below_idle'. Errors only when a 'refuse' policy stops a lookup. A
 * non-finite input or a ceiling below idle is a caller bug and throws.
 */
export function powerForThrust(
  deck: EngineDeck,
  condition: FlightCondition,
  wantedThrust_N: number,
  ceilingPower?: number,
): Result<{ readonly limit: ThrustLimit; readonly lookup: DeckLookup }, DeckLookupError> {
  // A corrected deck's grid holds F/delta: invert on the wanted thrust in the same terms.
  let thrust_N = wantedThrust_N;
  if (deck.interpolation === 'corrected' && Number.isFinite(wantedThrust_N) && Number.isFinite(condition.altitude_m) && Number.isFinite(condition.mach)) {
    queryCorrectionInto(deck, condition.altitude_m, condition.mach, condition.isaDev_K, correction);
    thrust_N = wantedThrust_N / correction[0]!;
  }
  if (!Number.isFinite(thrust_N) || (ceilingPower !== undefined && !Number.isFinite(ceilingPower))) {
    throw new RangeError(`powerForThrust: non-finite thrust ${thrust_N} N or ceiling ${ceilingPower}`);
  }
  const { altitude_m, mach, isaDev_K } = condition;
  if (!Number.isFinite(altitude_m) || !Number.isFinite(mach) || !Number.isFinite(isaDev_K)) {
    throw new RangeError(`powerForThrust: non-finite condition ${altitude_m} m, Mach ${mach}, ${isaDev_K} K`);
  }
  const s = scratch;
  const grid = deck.grid;
  if (!fillDeckNodes(grid, deck.policy, isaDev_K, altitude_m, mach, s)) return err(refusal(deck, s));
  nodesPowerRangeInto(grid, s, range);
  const idle = deck.ratings.flightIdle ?? range[0]!;
  const ceiling = ceilingPower ?? range[1]!;
  if (ceiling < idle) {
    throw new RangeError(`powerForThrust: ceiling power ${ceiling} is below idle ${idle}`);
  }
  const mask = s.outsideMask;
  const powerPolicy = deck.policy.power;

  if (!evaluateDeckNodesInto(grid, s, idle, powerPolicy, values)) return err(refusal(deck, s));
  const idleThrust = values[0]!;
  if (thrust_N < idleThrust) return finish(deck, condition, idle, 'below_idle', mask);
  if (!evaluateDeckNodesInto(grid, s, ceiling, powerPolicy, values)) return err(refusal(deck, s));
  if (thrust_N > values[0]!) return finish(deck, condition, ceiling, 'above_rating', mask);

  let p0 = idle;
  let t0 = idleThrust;
  for (;;) {
    const next = nextPowerBreakpoint(grid, s, p0);
    const p1 = next < ceiling ? next : ceiling;
    if (!evaluateDeckNodesInto(grid, s, p1, powerPolicy, values)) return err(refusal(deck, s));
    const t1 = values[0]!;
    if (t1 >= thrust_N || p1 === ceiling) {
      const power = t1 === t0 ? p0 : p0 + ((thrust_N - t0) * (p1 - p0)) / (t1 - t0);
      return finish(deck, condition, power, 'within', mask);
    }
    p0 = p1;
    t0 = t1;
  }
}

function finish(
  deck: EngineDeck,
  condition: FlightCondition,
  power: number,
  limit: ThrustLimit,
  conditionMask: number,
): Result<{ readonly limit: ThrustLimit; readonly lookup: DeckLookup }, DeckLookupError> {
  const s = scratch;
  // Report only what the final point leaves: the condition's axes plus power at the solution.
  s.outsideMask = conditionMask & ~(1 << AXIS_POWER);
  if (!evaluateDeckNodesInto(deck.grid, s, power, deck.policy.power, values)) return err(refusal(deck, s));
  return ok({ limit, lookup: finishLookup(deck, condition, power, s, values) });
}
