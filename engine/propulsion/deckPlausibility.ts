/**
 * Plausibility of a deck that parsed: values no turbofan or turbojet gives
 * are warnings (the deck still loads), each naming the line, and a ratio
 * that matches a common unit slip names the slip. Checked at each (ISA
 * deviation, altitude, Mach) node's highest power, where thrust and fuel
 * flow are well defined (idle TSFC is large by nature):
 * - TSFC from 0.2 to 3 lb/(lbf h): high-bypass turbofans about 0.3 static and
 *   0.5-0.65 in cruise, turbojets about 0.8-1.2, with afterburner about 2
 *   (common practice; Mattingly, Aircraft Engine Design, ch. 2);
 * - specific thrust F/mdot from 20 to 1,500 N s/kg (high-bypass cruise about
 *   100, turbojet with afterburner about 1,000; common practice);
 * - overall fuel-air ratio fuel flow / airflow at most 0.068, stoichiometric
 *   for kerosene (Walsh & Fletcher, Gas Turbine Performance, ch. 3: FAR about
 *   0.068), so more is impossible for any engine;
 * - the highest tabulated altitude at least 3 km (a jet's deck reaches its
 *   cruise altitudes; common practice).
 */
import { POUND_FORCE_N, POUND_KG, INCH_M, FOOT_M } from '../units/unitTable';
import type { DeckGridPoint } from './deckGrid';

/** 1 lb/(lbf h) in kg/(N s) (NIST SP 811 lb and lbf). */
const LB_LBF_H = POUND_KG / POUND_FORCE_N / 3600;
export const TSFC_RANGE_LB_LBF_H = { min: 0.2, max: 3 } as const;
export const SPECIFIC_THRUST_RANGE_N_S_KG = { min: 20, max: 1500 } as const;
export const MAX_FUEL_AIR_RATIO = 0.068;
/** A jet's deck reaches the cruise altitudes; a highest altitude below this (m) is implausible (common practice). */
export const MIN_TOP_ALTITUDE_M = 3000;

export interface DeckWarning {
  readonly code: 'implausible_tsfc' | 'implausible_specific_thrust' | 'implausible_fuel_air_ratio' | 'implausible_altitude_range';
  /** Line of the first row concerned (CSV) or null. */
  readonly line: number | null;
  readonly message: string;
}

/** A common unit slip: how many times it multiplies the checked quantity, and what it is. */
interface Slip {
  readonly factor: number;
  readonly what: string;
}

const FUEL_KG_MIN_FOR_LB_H = 1 / 60 / (POUND_KG / 3600);
const THRUST_KN_FOR_LBF = 1000 / POUND_FORCE_N;
const FT_M = FOOT_M;

/** Slips and their effect on TSFC = fuel flow / thrust. */
const TSFC_SLIPS: readonly Slip[] = [
  { factor: FUEL_KG_MIN_FOR_LB_H, what: 'fuel_flow in kg/min where lb/h was meant' },
  { factor: 1 / FUEL_KG_MIN_FOR_LB_H, what: 'fuel_flow in lb/h where kg/min was meant' },
  { factor: 3600, what: 'fuel_flow per second where per hour was meant' },
  { factor: 1 / 3600, what: 'fuel_flow per hour where per second was meant' },
  { factor: 1 / THRUST_KN_FOR_LBF, what: 'thrust in kN where lbf was meant' },
  { factor: THRUST_KN_FOR_LBF, what: 'thrust in lbf where kN was meant' },
  { factor: POUND_FORCE_N, what: 'thrust in N where lbf was meant' },
];
/** Slips and their effect on thrust / airflow. */
const SPECIFIC_THRUST_SLIPS: readonly Slip[] = [
  { factor: THRUST_KN_FOR_LBF, what: 'thrust in kN where lbf was meant' },
  { factor: 1 / THRUST_KN_FOR_LBF, what: 'thrust in lbf where kN was meant' },
  { factor: 3600, what: 'airflow per hour where per second was meant (or the airflow and fuel_flow columns swapped)' },
  { factor: 1 / POUND_KG, what: 'airflow in lb/s where kg/s was meant' },
];
/** Slips and their effect on fuel flow / airflow. */
const FUEL_AIR_SLIPS: readonly Slip[] = [
  { factor: FUEL_KG_MIN_FOR_LB_H, what: 'fuel_flow in kg/min where lb/h was meant' },
  { factor: 3600 * 3600, what: 'the airflow and fuel_flow columns swapped' },
  { factor: 3600, what: 'fuel_flow per second where per hour was meant' },
];
/** Slips and their effect on the highest tabulated altitude. */
const ALTITUDE_SLIPS: readonly Slip[] = [
  { factor: INCH_M / FT_M, what: 'altitude in in where ft was meant' },
  { factor: FT_M, what: 'altitude in ft where m was meant' },
  { factor: 1 / 1000, what: 'altitude in m where km was meant' },
];

/** The slip whose factor is within a factor 2 of `off` (how many times the value is off its typical size), or null. */
function slipFor(off: number, slips: readonly Slip[]): string | null {
  let best: { what: string; error: number } | null = null;
  for (const s of slips) {
    const error = Math.abs(Math.log(off / s.factor));
    if (error < Math.log(2) && (best === null || error < best.error)) best = { what: s.what, error };
  }
  return best === null ? null : best.what;
}

function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)]!;
}

const round3 = (x: number) => Number(x.toPrecision(3));

/**
 * Warnings about implausible values in `rows` (SI); `lineOf(row)` gives the file line of a row. At most one
 * warning per check, naming the first row concerned and how many nodes are affected.
 */
export function deckPlausibility(rows: readonly DeckGridPoint[], lineOf: (row: number) => number | null): DeckWarning[] {
  // Highest-power row at each node.
  const top = new Map<string, number>();
  rows.forEach((r, i) => {
    const key = `${r.isaDev_K}|${r.altitude_m}|${r.mach}`;
    const j = top.get(key);
    if (j === undefined || rows[j]!.power < r.power) top.set(key, i);
  });
  const nodes = [...top.values()].filter((i) => rows[i]!.thrust_N > 0);
  const warnings: DeckWarning[] = [];
  const check = (
    code: DeckWarning['code'],
    valueOf: (r: DeckGridPoint) => number | null,
    inRange: (v: number) => boolean,
    typical: number,
    describe: (v: number) => string,
    range: string,
    slips: readonly Slip[],
  ) => {
    const values = nodes.flatMap((i) => {
      const v = valueOf(rows[i]!);
      return v === null || !Number.isFinite(v) ? [] : [{ i, v }];
    });
    const bad = values.filter((x) => !inRange(x.v));
    if (bad.length === 0) return;
    const first = bad[0]!;
    const line = lineOf(first.i);
    const mid = median(bad.map((x) => x.v));
    const slip = slipFor(mid / typical, slips);
    warnings.push({
      code,
      line,
      message:
        `${line !== null ? `line ${line}: ` : ''}${describe(first.v)} at full power, outside ${range} that any turbofan or turbojet gives ` +
        `(${bad.length} of ${values.length} nodes)${slip !== null ? `; the values look like ${slip}: check the column's unit` : ''}.`,
    });
  };
  check(
    'implausible_tsfc',
    (r) => r.fuelFlow_kg_s / r.thrust_N / LB_LBF_H,
    (v) => v >= TSFC_RANGE_LB_LBF_H.min && v <= TSFC_RANGE_LB_LBF_H.max,
    0.6,
    (v) => `TSFC ${round3(v)} lb/(lbf h)`,
    `${TSFC_RANGE_LB_LBF_H.min} to ${TSFC_RANGE_LB_LBF_H.max} lb/(lbf h)`,
    TSFC_SLIPS,
  );
  check(
    'implausible_specific_thrust',
    (r) => (r.airflow_kg_s !== null && r.airflow_kg_s > 0 ? r.thrust_N / r.airflow_kg_s : null),
    (v) => v >= SPECIFIC_THRUST_RANGE_N_S_KG.min && v <= SPECIFIC_THRUST_RANGE_N_S_KG.max,
    300,
    (v) => `thrust per airflow ${round3(v)} N s/kg`,
    `${SPECIFIC_THRUST_RANGE_N_S_KG.min} to ${SPECIFIC_THRUST_RANGE_N_S_KG.max} N s/kg`,
    SPECIFIC_THRUST_SLIPS,
  );
  check(
    'implausible_fuel_air_ratio',
    (r) => (r.airflow_kg_s !== null && r.airflow_kg_s > 0 ? r.fuelFlow_kg_s / r.airflow_kg_s : null),
    (v) => v <= MAX_FUEL_AIR_RATIO,
    0.01,
    (v) => `fuel-air ratio ${round3(v)} (fuel flow / airflow)`,
    `0 to ${MAX_FUEL_AIR_RATIO} (stoichiometric for kerosene)`,
    FUEL_AIR_SLIPS,
  );
  // A jet's deck reaches the cruise altitudes (10 km and more); one that tops out below 3 km likely has an altitude unit slip.
  let highest = -Infinity;
  let highestRow = 0;
  rows.forEach((r, i) => {
    if (r.altitude_m > highest) {
      highest = r.altitude_m;
      highestRow = i;
    }
  });
  if (rows.length > 0 && highest < MIN_TOP_ALTITUDE_M) {
    const line = lineOf(highestRow);
    const slip = slipFor(highest / 12000, ALTITUDE_SLIPS);
    warnings.push({
      code: 'implausible_altitude_range',
      line,
      message:
        `${line !== null ? `line ${line}: ` : ''}the highest tabulated altitude is ${round3(highest)} m, below the ${MIN_TOP_ALTITUDE_M} m any jet's deck reaches` +
        `${slip !== null ? `; the values look like ${slip}: check the column's unit` : ''}.`,
    });
  }
  return warnings;
}
