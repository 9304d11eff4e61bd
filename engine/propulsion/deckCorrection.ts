/**
 * Interpolating a deck in corrected (referred) parameters: the grid holds
 * F/delta, Wf/(delta sqrt(theta)) and W sqrt(theta)/delta instead of thrust,
 * fuel flow and airflow, is interpolated over pressure altitude, Mach (and
 * ISA deviation and power) as before, and each lookup multiplies back by
 * delta and theta at the query. delta = pt0/p_SL and theta = Tt0/T_SL are the
 * free-stream total (engine-inlet) pressure and temperature ratios,
 * pt0 = p (1 + 0.2 M^2)^3.5, Tt0 = T (1 + 0.2 M^2) (gamma 1.4; NACA Report
 * 1135), with T the static temperature of the node's (or query's) ISA
 * level: the referred parameter groups of Walsh & Fletcher, Gas Turbine
 * Performance, ch. 4, and Mattingly's delta_0 and theta_0. Those groups
 * take out most of the deck's variation with altitude and Mach, so linear
 * interpolation between coarse grid nodes errs less (docs/deck-format.md,
 * test/engine/propulsion/deckCorrection.test.ts). At a node both ways agree
 * exactly; power interpolation is unchanged (one factor per node).
 */
import { T0 } from '../aero/constants';
import { atmosphere } from '../aero/standardAtmosphere';
import { deckGridOf, type DeckGrid } from './deckGrid';
import { engineDeckOf, type EngineDeck } from './engineDeck';

/** What a deck's grid is interpolated in. */
export type DeckInterpolation = 'raw' | 'corrected';

export const DECK_INTERPOLATION_TEXT: Readonly<Record<DeckInterpolation, string>> = {
  corrected: 'deck interpolated in corrected parameters F/delta, Wf/(delta sqrt(theta)), W sqrt(theta)/delta (free-stream total conditions) over pressure altitude and Mach',
  raw: 'deck interpolated in its raw tabulated thrust, fuel flow and airflow',
};

/**
 * delta_t, delta_t sqrt(theta_t), delta_t / sqrt(theta_t) (-) at pressure
 * altitude `altitude_m`, Mach `mach` and ISA deviation `isaDev_K`, written
 * into out[0..2]: the divisors of thrust, fuel flow and airflow. The
 * condition must be inside the standard atmosphere (throws otherwise: a bug).
 */
export function correctionFactorsInto(altitude_m: number, mach: number, isaDev_K: number, out: Float64Array): void {
  correctionFactorsOfAir(atmosphere(altitude_m, isaDev_K), mach, out);
}

/**
 * correctionFactorsInto from the standard atmosphere already evaluated at the
 * pressure altitude and ISA deviation (`air` = atmosphere(altitude_m,
 * isaDev_K); throws on its error, a bug): for callers that hold it.
 */
export function correctionFactorsOfAir(air: ReturnType<typeof atmosphere>, mach: number, out: Float64Array): void {
  if (!air.ok) throw new RangeError(`deck correction: ${air.error.message}`);
  const ram = 1 + 0.2 * mach * mach;
  const delta = air.value.delta * ram * ram * ram * Math.sqrt(ram);
  const rootTheta = Math.sqrt((air.value.temperature_K * ram) / T0);
  out[0] = delta;
  out[1] = delta * rootTheta;
  out[2] = delta / rootTheta;
}

const corrected = new WeakMap<EngineDeck, EngineDeck>();

function correctedGrid(grid: DeckGrid): DeckGrid {
  const thrust = Float64Array.from(grid.thrust_N);
  const fuel = Float64Array.from(grid.fuelFlow_kg_s);
  const air = grid.airflow_kg_s === null ? null : Float64Array.from(grid.airflow_kg_s);
  const f = new Float64Array(3);
  for (let i = 0; i < grid.isaDevs_K.length; i++) {
    for (let j = grid.altitudeStart[i]!; j < grid.altitudeStart[i + 1]!; j++) {
      for (let k = grid.machStart[j]!; k < grid.machStart[j + 1]!; k++) {
        correctionFactorsInto(grid.altitudes_m[j]!, grid.machs[k]!, grid.isaDevs_K[i]!, f);
        for (let q = grid.pointStart[k]!; q < grid.pointStart[k + 1]!; q++) {
          thrust[q] = thrust[q]! / f[0]!;
          fuel[q] = fuel[q]! / f[1]!;
          if (air !== null) air[q] = air[q]! / f[2]!;
        }
      }
    }
  }
  return deckGridOf({ ...grid, thrust_N: thrust, fuelFlow_kg_s: fuel, airflow_kg_s: air });
}

/**
 * The deck to interpolate in `mode`: itself for 'raw' (or when already in
 * that mode), else a copy whose grid holds the corrected parameters and
 * whose `interpolation` is 'corrected' (lookups multiply back). Built once
 * per deck object (kept while the deck lives).
 */
export function deckForInterpolation(deck: EngineDeck, mode: DeckInterpolation): EngineDeck {
  const current = deck.interpolation ?? 'raw';
  if (mode === current) return deck;
  if (mode === 'raw') throw new Error('deckForInterpolation: a corrected deck has no raw copy here; keep the parsed deck');
  let c = corrected.get(deck);
  if (c === undefined) {
    c = engineDeckOf({ ...deck, warnings: deck.warnings, interpolation: 'corrected', grid: correctedGrid(deck.grid) });
    corrected.set(deck, c);
  }
  return c;
}

// One-entry memo of the query factors (a mission asks at the same condition many times in a row).
let memoAltitude = Number.NaN;
let memoMach = Number.NaN;
let memoIsaDev = Number.NaN;
const memo = new Float64Array(3);

/**
 * The multiply-back factors at a query (out[0..2], as correctionFactorsInto)
 * for `deck`: the query's own ISA deviation when the deck has an ISA axis,
 * else ISA (the deck's temperature approximation then applies on top).
 */
export function queryCorrectionInto(deck: EngineDeck, altitude_m: number, mach: number, isaDev_K: number, out: Float64Array): void {
  const dev = deck.hasIsaDev ? isaDev_K : 0;
  if (altitude_m !== memoAltitude || mach !== memoMach || dev !== memoIsaDev) {
    correctionFactorsInto(altitude_m, mach, dev, memo);
    memoAltitude = altitude_m;
    memoMach = mach;
    memoIsaDev = dev;
  }
  out[0] = memo[0]!;
  out[1] = memo[1]!;
  out[2] = memo[2]!;
}
