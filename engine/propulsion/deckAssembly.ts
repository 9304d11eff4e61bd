/**
 * Turning validated rows of a deck file (CSV or JSON) into an EngineDeck:
 * the checks that need the whole table (duplicate points, single-value
 * axes, thrust rising with power, ratings inside the power range), then the
 * ragged grid.
 */
import { deckPlausibility } from './deckPlausibility';
import { err, ok, type Result } from '../core/result';
import { buildDeckGrid, type DeckGridPoint } from './deckGrid';
import { deckFileError, type DeckFileError } from './deckFileError';
import { engineDeckOf, type DeckPolicy, type EngineDeck, type ReferenceRecovery } from './engineDeck';
import type { RatingName } from './propulsionModel';
import { requiredSensitivityFields, SENSITIVITY_FIELDS, type SensitivityCsvName } from './installationSensitivities';

/** The sensitivity columns of a deck file, by their CSV names (installationSensitivities.ts). */
export type SensitivityColumn = SensitivityCsvName;

/** The columns of a deck file. */
export type DeckColumn = 'altitude' | 'mach' | 'power' | 'thrust' | 'fuel_flow' | 'airflow' | 'isa_dev' | SensitivityColumn;

/**
 * Plausible limits in SI (common practice: the largest engines give ~0.5 MN,
 * ~5 kg/s fuel, ~1.5 t/s air; the sensitivity bounds are generous, set
 * to catch a unit mistake rather than to judge the engine).
 */
export const DECK_VALUE_LIMITS: Readonly<Record<DeckColumn, readonly [number, number]>> = {
  altitude: [-5000, 84852],
  mach: [0, 10],
  power: [-1e6, 1e6],
  thrust: [-1e7, 1e7],
  fuel_flow: [0, 1e3],
  airflow: [0, 1e4],
  isa_dev: [-100, 100],
  dthrust_drecovery: [-1e8, 1e8],
  dfuel_flow_drecovery: [-1e4, 1e4],
  dairflow_drecovery: [-1e5, 1e5],
  dthrust_dbleed: [-1e8, 1e8],
  dfuel_flow_dbleed: [-1e4, 1e4],
  dairflow_dbleed: [-1e5, 1e5],
  dthrust_dextraction: [-10, 10],
  dfuel_flow_dextraction: [-1e-3, 1e-3],
  dairflow_dextraction: [-1e-2, 1e-2],
};

/** Whether a deck column is one of the sensitivity columns. */
export function isSensitivityColumn(column: DeckColumn): column is SensitivityColumn {
  return SENSITIVITY_FIELDS.some((f) => f.csv === column);
}

/** A problem with which sensitivity columns a deck carries (the parser locates it). */
export interface SensitivityColumnIssue {
  readonly column: SensitivityColumn;
  readonly kind: 'missing' | 'without_airflow';
  readonly message: string;
}

/**
 * Checks the set of sensitivity columns present: none, or all six thrust
 * and fuel-flow ones plus the three airflow ones exactly when the deck has
 * an airflow column (docs/deck-format.md). `name` shows a column as the
 * file spells it (CSV name or JSON name).
 */
export function sensitivityColumnIssues(
  present: (column: SensitivityColumn) => boolean,
  hasAirflow: boolean,
  name: (column: SensitivityColumn) => string,
): readonly SensitivityColumnIssue[] {
  const all = SENSITIVITY_FIELDS.map((f) => f.csv);
  const given = all.filter(present);
  if (given.length === 0) return [];
  const issues: SensitivityColumnIssue[] = [];
  const required = new Set(requiredSensitivityFields(hasAirflow).map((f) => f.csv));
  const list = [...required].map(name).join(', ');
  for (const column of all) {
    if (required.has(column) && !present(column)) {
      issues.push({
        column,
        kind: 'missing',
        message: `missing column "${name(column)}": a deck with installation sensitivities carries all of ${list}`,
      });
    } else if (!required.has(column) && present(column)) {
      issues.push({
        column,
        kind: 'without_airflow',
        message: `column "${name(column)}" needs an airflow column: airflow sensitivities describe the deck's airflow`,
      });
    }
  }
  return issues;
}

/** Where a row's cell is in its file, and how to show a value in the file's units. */
export interface DeckRowLocator {
  readonly line: (row: number) => number | null;
  readonly column: (row: number, column: DeckColumn) => string | null;
  /** A value of `column` (SI) shown in the file's units, e.g. "35000 ft". */
  readonly show: (column: DeckColumn, value_si: number) => string;
}

export interface DeckAssemblyInput {
  readonly source: string;
  readonly title: string;
  readonly parametric: boolean;
  readonly referenceRecovery: ReferenceRecovery;
  /** Ratings on the power axis (-), with where each was given (line or JSON path) for messages. */
  readonly ratings: readonly { readonly name: RatingName; readonly value: number; readonly line: number | null; readonly column: string | null }[];
  readonly notes: readonly string[];
  readonly policy: DeckPolicy;
  readonly hasAirflow: boolean;
  readonly hasIsaDev: boolean;
  /** Every row carries `sensitivities` (the parser checked the columns). */
  readonly hasSensitivities: boolean;
  readonly rows: readonly DeckGridPoint[];
  readonly locate: DeckRowLocator;
}

const MAX_ERRORS = 100;

/** Whole-table checks and grid building; errors name the line (or JSON path) and column. */
export function assembleDeck(input: DeckAssemblyInput): Result<EngineDeck, readonly DeckFileError[]> {
  const { source, rows, locate } = input;
  const errors: DeckFileError[] = [];
  const add = (e: DeckFileError): void => {
    if (errors.length < MAX_ERRORS) errors.push(e);
  };
  const at = (row: number, column: DeckColumn) => ({ line: locate.line(row), column: locate.column(row, column) });

  const order = rows.map((_, i) => i);
  order.sort((a, b) => {
    const p = rows[a]!;
    const q = rows[b]!;
    return p.isaDev_K - q.isaDev_K || p.altitude_m - q.altitude_m || p.mach - q.mach || p.power - q.power || a - b;
  });

  const describe = (row: number): string => {
    const p = rows[row]!;
    const isa = input.hasIsaDev ? `ISA deviation ${locate.show('isa_dev', p.isaDev_K)}, ` : '';
    return `${isa}altitude ${locate.show('altitude', p.altitude_m)}, Mach ${locate.show('mach', p.mach)}`;
  };
  const lineText = (row: number): string => {
    const l = locate.line(row);
    return l !== null ? `line ${l}` : `point ${row}`;
  };

  // Duplicate points and thrust rising with power, node by node.
  for (let k = 1; k < order.length; k++) {
    const a = order[k - 1]!;
    const b = order[k]!;
    const p = rows[a]!;
    const q = rows[b]!;
    const sameNode = p.isaDev_K === q.isaDev_K && p.altitude_m === q.altitude_m && p.mach === q.mach;
    if (!sameNode) continue;
    const where = at(b, 'power');
    if (p.power === q.power) {
      add(
        deckFileError(source, 'duplicate_point', where.line, where.column, locate.show('power', q.power), 'each (altitude, Mach, power) once',
          `duplicate point: ${describe(b)}, power ${locate.show('power', q.power)} is also given on ${lineText(a)}`),
      );
    } else if (!(q.thrust_N > p.thrust_N)) {
      const w = at(b, 'thrust');
      add(
        deckFileError(source, 'thrust_not_rising', w.line, w.column, locate.show('thrust', q.thrust_N), `thrust above ${locate.show('thrust', p.thrust_N)}`,
          `thrust ${locate.show('thrust', q.thrust_N)} at power ${locate.show('power', q.power)} does not rise above ` +
            `${locate.show('thrust', p.thrust_N)} at power ${locate.show('power', p.power)} (${lineText(a)}) at ${describe(b)}; ` +
            'thrust must rise with power'),
      );
    }
  }

  // Axes with one value where two are needed.
  let k = 0;
  const isaLevels: number[] = [];
  while (k < order.length) {
    const isaStart = k;
    const isa = rows[order[k]!]!.isaDev_K;
    isaLevels.push(order[k]!);
    const altitudes: number[] = [];
    while (k < order.length && rows[order[k]!]!.isaDev_K === isa) {
      const alt = rows[order[k]!]!.altitude_m;
      altitudes.push(order[k]!);
      let machCount = 0;
      const altStart = k;
      while (k < order.length && rows[order[k]!]!.isaDev_K === isa && rows[order[k]!]!.altitude_m === alt) {
        const mach = rows[order[k]!]!.mach;
        const nodeStart = k;
        machCount++;
        while (
          k < order.length &&
          rows[order[k]!]!.isaDev_K === isa &&
          rows[order[k]!]!.altitude_m === alt &&
          rows[order[k]!]!.mach === mach
        ) {
          k++;
        }
        if (k - nodeStart < 2) {
          const r = order[nodeStart]!;
          const w = at(r, 'power');
          add(
            deckFileError(source, 'single_value_axis', w.line, w.column, locate.show('power', rows[r]!.power), 'at least two power settings',
              `only one power setting at ${describe(r)}; at least two are needed to interpolate in power`),
          );
        }
      }
      if (machCount < 2) {
        const r = order[altStart]!;
        const w = at(r, 'mach');
        add(
          deckFileError(source, 'single_value_axis', w.line, w.column, locate.show('mach', rows[r]!.mach), 'at least two Mach numbers',
            `only one Mach number (${locate.show('mach', rows[r]!.mach)}) at altitude ${locate.show('altitude', alt)}; at least two are needed to interpolate in Mach`),
        );
      }
    }
    if (altitudes.length < 2) {
      const r = order[isaStart]!;
      const w = at(r, 'altitude');
      add(
        deckFileError(source, 'single_value_axis', w.line, w.column, locate.show('altitude', rows[r]!.altitude_m), 'at least two altitudes',
          `only one altitude (${locate.show('altitude', rows[r]!.altitude_m)})${input.hasIsaDev ? ` at ISA deviation ${locate.show('isa_dev', isa)}` : ''}; at least two are needed to interpolate in altitude`),
      );
    }
  }
  if (input.hasIsaDev && isaLevels.length < 2 && order.length > 0) {
    const r = isaLevels[0]!;
    const w = at(r, 'isa_dev');
    add(
      deckFileError(source, 'single_value_axis', w.line, w.column, locate.show('isa_dev', rows[r]!.isaDev_K), 'at least two ISA deviations',
        `the isa_dev column has one value (${locate.show('isa_dev', rows[r]!.isaDev_K)}); give at least two, or drop the column`),
    );
  }

  // Ratings inside the tabulated power range; flight idle the lowest.
  if (rows.length > 0) {
    let minPower = Infinity;
    let maxPower = -Infinity;
    for (const r of rows) {
      if (r.power < minPower) minPower = r.power;
      if (r.power > maxPower) maxPower = r.power;
    }
    const idle = input.ratings.find((r) => r.name === 'flightIdle');
    for (const r of input.ratings) {
      if (r.value < minPower || r.value > maxPower) {
        add(
          deckFileError(source, 'bad_rating', r.line, r.column, locate.show('power', r.value), `a power between ${locate.show('power', minPower)} and ${locate.show('power', maxPower)}`,
            `rating ${r.name} = ${locate.show('power', r.value)} is outside the tabulated power range ${locate.show('power', minPower)} to ${locate.show('power', maxPower)}`),
        );
      } else if (idle !== undefined && r !== idle && r.value <= idle.value) {
        add(
          deckFileError(source, 'bad_rating', r.line, r.column, locate.show('power', r.value), `a power above flightIdle (${locate.show('power', idle.value)})`,
            `rating ${r.name} = ${locate.show('power', r.value)} is not above flightIdle = ${locate.show('power', idle.value)}`),
        );
      }
    }
  }

  if (errors.length > 0) return err(errors);
  const ratings: Partial<Record<RatingName, number>> = {};
  for (const r of input.ratings) ratings[r.name] = r.value;
  return ok(engineDeckOf({
    title: input.title,
    parametric: input.parametric,
    referenceRecovery: input.referenceRecovery,
    ratings,
    hasAirflow: input.hasAirflow,
    hasIsaDev: input.hasIsaDev,
    hasSensitivities: input.hasSensitivities,
    notes: input.notes,
    policy: input.policy,
    grid: buildDeckGrid(rows),
    warnings: deckPlausibility(rows, locate.line),
    interpolation: undefined,
  }));
}
