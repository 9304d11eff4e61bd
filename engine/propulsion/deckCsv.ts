/**
 * The deck CSV format (docs/deck-format.md): `#` metadata lines
 * (`# key: value`), `##` free comments, one header row of `name[unit]`
 * columns, then one row per tabulated point. Units are read with the
 * project's unit table (engine/units); values are stored in SI.
 */
import { err, type Result } from '../core/result';
import { toSi, type Dimension } from '../units/quantity';
import {
  assembleDeck,
  DECK_VALUE_LIMITS,
  isSensitivityColumn,
  sensitivityColumnIssues,
  type DeckColumn,
  type SensitivityColumn,
} from './deckAssembly';
import { deckFileError, type DeckFileError, type DeckFileErrorCode } from './deckFileError';
import { deckGridPoints, type DeckGridPoint } from './deckGrid';
import {
  DEFAULT_DECK_POLICY,
  type EngineDeck,
  type OutOfTablePolicy,
  type ReferenceRecovery,
} from './engineDeck';
import { RATING_NAMES, type DeckAxis, type RatingName } from './propulsionModel';
import { SENSITIVITY_FIELDS, type InstallationSensitivities, type SensitivityQuantity } from './installationSensitivities';

interface ColumnSpec {
  readonly required: boolean;
  readonly dimensions: readonly Dimension[];
  readonly expected: string;
  /** A derivative per watt: the unit is `<unit of dimensions>/<power unit>`, e.g. lbf/hp. */
  readonly perPower?: boolean;
}

const SENSITIVITY_UNIT: Readonly<Record<SensitivityQuantity, { dimension: Dimension; perUnit: string; perPower: string }>> = {
  thrust: { dimension: 'force', perUnit: 'a force unit (lbf, N, kN) per unit', perPower: 'a force per power unit (lbf/hp, N/kW, N/W)' },
  fuelFlow: { dimension: 'massFlow', perUnit: 'a mass-flow unit (lb/h, kg/h, kg/s) per unit', perPower: 'a mass flow per power unit (lb/h/hp, kg/h/kW, kg/s/W)' },
  airflow: { dimension: 'massFlow', perUnit: 'a mass-flow unit (lb/s, kg/s) per unit', perPower: 'a mass flow per power unit (lb/s/hp, kg/s/kW, kg/s/W)' },
};

const SENSITIVITY_COLUMNS = Object.fromEntries(
  SENSITIVITY_FIELDS.map((f) => {
    const u = SENSITIVITY_UNIT[f.quantity];
    const perPower = f.variable === 'extraction';
    return [f.csv, { required: false, dimensions: [u.dimension], expected: perPower ? u.perPower : u.perUnit, perPower }];
  }),
) as unknown as Record<SensitivityColumn, ColumnSpec>;

const COLUMNS: Readonly<Record<DeckColumn, ColumnSpec>> = {
  ...SENSITIVITY_COLUMNS,
  altitude: { required: true, dimensions: ['length'], expected: 'a length unit (ft, m, km)' },
  mach: { required: true, dimensions: ['dimensionless'], expected: 'no unit: mach[-]' },
  power: { required: true, dimensions: ['dimensionless'], expected: 'a plain-number unit: power[-] or power[%]' },
  thrust: { required: true, dimensions: ['force'], expected: 'a force unit (lbf, N, kN)' },
  fuel_flow: { required: true, dimensions: ['massFlow'], expected: 'a mass-flow unit (lb/h, kg/h, kg/s)' },
  airflow: { required: false, dimensions: ['massFlow'], expected: 'a mass-flow unit (lb/s, kg/s)' },
  isa_dev: { required: false, dimensions: ['temperatureDelta', 'temperature'], expected: 'a temperature-difference unit (K, degC)' },
};
const COLUMN_NAMES = Object.keys(COLUMNS) as DeckColumn[];


const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
const NOT_FINITE_WORD = /^[+-]?(?:nan|inf|infinity)$/i;
const HEADER_CELL = /^([A-Za-z_][A-Za-z0-9_]*)\s*\[(.*)\]$/;
const POLICY_AXES: Readonly<Record<string, DeckAxis>> = { altitude: 'altitude', mach: 'mach', power: 'power', isa_dev: 'isaDev' };
const METADATA_KEYS = 'title, parametric, reference recovery, rating <name>, note, outside <axis>';

interface ColumnUnit {
  readonly header: string;
  readonly unit: string;
  readonly scale: number;
  readonly offset: number;
}

/**
 * Parses a deck CSV (see docs/deck-format.md) into an EngineDeck in SI.
 * Never throws: every problem comes back as a DeckFileError naming the line
 * and column, e.g. `demo.csv line 14, column "thrust[lbf]": "12x0" is not a number`.
 */
export function parseDeckCsv(text: string, sourceName: string): Result<EngineDeck, readonly DeckFileError[]> {
  const src = sourceName;
  const errors: DeckFileError[] = [];
  const add = (
    code: DeckFileErrorCode,
    line: number | null,
    column: string | null,
    value: string | null,
    expected: string,
    what: string,
  ): void => {
    if (errors.length < 100) errors.push(deckFileError(src, code, line, column, value, expected, what));
  };
  if (typeof text !== 'string' || text.trim() === '') {
    return err([deckFileError(src, 'empty_file', 1, null, null, 'a header row such as altitude[ft],mach[-],power[-],thrust[lbf],fuel_flow[lb/h]', 'the file is empty')]);
  }
  const lines = text.split(/\r\n|\r|\n/);

  let title: string | null = null;
  let parametric: boolean | null = null;
  let referenceRecovery: ReferenceRecovery | null = null;
  const ratings: { name: RatingName; raw: number; line: number }[] = [];
  const notes: string[] = [];
  const policy: Record<DeckAxis, OutOfTablePolicy> = { ...DEFAULT_DECK_POLICY };
  const policyLines: Partial<Record<DeckAxis, number>> = {};

  let headerLine = 0;
  let columns: (DeckColumn | null)[] = [];
  let headerCells: string[] = [];
  const units: Partial<Record<DeckColumn, ColumnUnit>> = {};
  /** Each header column's conversion and plausible SI limits, by position (the usual cell's short way in readRow). */
  let limits: { readonly scale: number; readonly offset: number; readonly lo: number; readonly hi: number }[] = [];
  const rows: DeckGridPoint[] = [];
  const rowLines: number[] = [];
  let hasSensitivities = false;

  for (let i = 0; i < lines.length; i++) {
    const lineNo = i + 1;
    const raw = lines[i]!;
    const trimmed = raw.trim();
    if (trimmed === '' || trimmed.startsWith('##')) continue;
    if (trimmed.startsWith('#')) {
      readMetadata(trimmed.slice(1), lineNo);
      continue;
    }
    if (headerLine === 0) {
      headerLine = lineNo;
      readHeader(trimmed, lineNo);
      if (errors.length > 0) return err(errors);
      continue;
    }
    readRow(raw, lineNo);
    if (errors.length >= 100) {
      if (i + 1 < lines.length) {
        errors.push(deckFileError(src, 'too_many_errors', lineNo, null, null, 'at most 100 errors', `stopped after 100 errors; lines ${lineNo + 1} to ${lines.length} were not checked`));
      }
      break;
    }
  }

  if (headerLine === 0) {
    add('no_header', lines.length, null, null, 'a header row of name[unit] columns', 'no header row: the file has only comments or metadata');
    return err(errors);
  }
  if (rows.length === 0 && errors.length === 0) {
    add('no_data', headerLine, null, null, 'rows of numbers below the header', 'no data rows below the header');
  }
  if (errors.length > 0) return err(errors);

  const powerUnit = units.power!;
  return assembleDeck({
    source: src,
    title: title ?? src,
    parametric: parametric ?? false,
    referenceRecovery: referenceRecovery ?? { kind: 'constant', value: 1 },
    ratings: ratings.map((r) => ({ name: r.name, value: r.raw * powerUnit.scale + powerUnit.offset, line: r.line, column: null })),
    notes,
    policy,
    hasAirflow: units.airflow !== undefined,
    hasIsaDev: units.isa_dev !== undefined,
    hasSensitivities,
    rows,
    locate: {
      line: (row) => rowLines[row] ?? null,
      column: (_row, column) => units[column]?.header ?? column,
      show: (column, value_si) => {
        const u = units[column];
        if (u === undefined) return String(value_si);
        const v = Number(((value_si - u.offset) / u.scale).toPrecision(10));
        return u.unit === '-' || u.unit === '' ? String(v) : `${v} ${u.unit}`;
      },
    },
  });

  function readMetadata(body: string, lineNo: number): void {
    const colon = body.indexOf(':');
    if (colon < 0) {
      add('bad_metadata', lineNo, null, body.trim(), '# key: value', `metadata line without "key: value" (free comments start with ##); keys are ${METADATA_KEYS}`);
      return;
    }
    const key = body.slice(0, colon).trim().replace(/\s+/g, ' ');
    const value = body.slice(colon + 1).trim();
    const lower = key.toLowerCase();
    if (lower === 'title') {
      if (title !== null) add('duplicate_metadata', lineNo, null, value, 'one title line', 'the title is given twice');
      else if (value === '') add('bad_metadata', lineNo, null, value, 'a title', 'the title is empty');
      else title = value;
    } else if (lower === 'parametric') {
      const v = value.toLowerCase();
      if (v === 'yes' || v === 'true') parametric = true;
      else if (v === 'no' || v === 'false') parametric = false;
      else add('bad_metadata', lineNo, null, value, 'yes or no', `parametric must be yes or no, got "${value}"`);
    } else if (lower === 'reference recovery') {
      if (referenceRecovery !== null) {
        add('duplicate_metadata', lineNo, null, value, 'one reference recovery line', 'the reference recovery is given twice');
      } else if (value.toUpperCase() === 'MIL-E-5008B') {
        referenceRecovery = { kind: 'milE5008b' };
      } else {
        const v = NUMBER.test(value) ? Number(value) : NaN;
        if (v > 0 && v <= 1) referenceRecovery = { kind: 'constant', value: v };
        else add('bad_metadata', lineNo, null, value, 'MIL-E-5008B or a number in (0, 1]', `reference recovery must be MIL-E-5008B or a number in (0, 1], got "${value}"`);
      }
    } else if (lower.startsWith('rating ')) {
      const name = key.slice(7).trim();
      const rating = RATING_NAMES.find((r) => r === name);
      const v = NUMBER.test(value) ? Number(value) : NaN;
      if (rating === undefined) {
        add('bad_metadata', lineNo, null, name, RATING_NAMES.join(', '), `unknown rating "${name}"; ratings are ${RATING_NAMES.join(', ')}`);
      } else if (ratings.some((r) => r.name === rating)) {
        add('duplicate_metadata', lineNo, null, value, 'each rating once', `rating ${rating} is given twice`);
      } else if (!Number.isFinite(v)) {
        add('bad_metadata', lineNo, null, value, 'a number on the power axis', `rating ${rating}: "${value}" is not a number`);
      } else {
        ratings.push({ name: rating, raw: v, line: lineNo });
      }
    } else if (lower === 'note') {
      notes.push(value);
    } else if (lower.startsWith('outside ')) {
      const axis = POLICY_AXES[lower.slice(8).trim()];
      if (axis === undefined) {
        add('bad_metadata', lineNo, null, key, 'outside altitude|mach|power|isa_dev', `unknown axis in "${key}"; axes are altitude, mach, power, isa_dev`);
      } else if (value !== 'refuse' && value !== 'clamp' && value !== 'extrapolate') {
        add('bad_metadata', lineNo, null, value, 'refuse, clamp or extrapolate', `"${key}" must be refuse, clamp or extrapolate, got "${value}"`);
      } else if (policyLines[axis] !== undefined) {
        add('duplicate_metadata', lineNo, null, value, 'each axis policy once', `"${key}" is given twice (line ${policyLines[axis]})`);
      } else {
        policy[axis] = value;
        policyLines[axis] = lineNo;
      }
    } else {
      add('unknown_metadata', lineNo, null, key, METADATA_KEYS, `unknown metadata key "${key}"; keys are ${METADATA_KEYS} (free comments start with ##)`);
    }
  }

  function readHeader(line: string, lineNo: number): void {
    headerCells = line.split(',').map((c) => c.trim());
    columns = headerCells.map(() => null);
    headerCells.forEach((cell, j) => {
      const m = HEADER_CELL.exec(cell);
      if (m === null) {
        add('bad_column_header', lineNo, cell, cell, 'name[unit], e.g. thrust[lbf]', `column header "${cell}" is not of the form name[unit], e.g. thrust[lbf]`);
        return;
      }
      const name = m[1]!.toLowerCase() as DeckColumn;
      const unit = m[2]!.trim();
      const spec = COLUMNS[name];
      if (spec === undefined) {
        add('unknown_column', lineNo, cell, cell, COLUMN_NAMES.join(', '), `unknown column "${m[1]}"; columns are ${COLUMN_NAMES.join(', ')}`);
        return;
      }
      if (units[name] !== undefined) {
        add('duplicate_column', lineNo, cell, cell, 'each column once', `column "${name}" appears twice`);
        return;
      }
      const split = spec.perPower === true ? unit.lastIndexOf('/') : -1;
      const numerator = split > 0 ? unit.slice(0, split).trim() : unit;
      const one = toSi(1, numerator === '' ? '-' : numerator);
      const zero = toSi(0, numerator === '' ? '-' : numerator);
      const per = split > 0 ? toSi(1, unit.slice(split + 1).trim()) : null;
      if (!one.ok || !zero.ok || (per !== null && !per.ok)) {
        add('unknown_unit', lineNo, cell, unit, spec.expected, `unknown unit "${unit}"; expected ${spec.expected}`);
        return;
      }
      if (!spec.dimensions.includes(one.value.dimension) || (spec.perPower === true && (per === null || !per.ok || per.value.dimension !== 'power'))) {
        add('wrong_unit_dimension', lineNo, cell, unit, spec.expected, `unit "${unit}" is not right for ${name}; expected ${spec.expected}`);
        return;
      }
      const perScale = per !== null && per.ok ? per.value.value_si : 1;
      const isDelta = name === 'isa_dev' || isSensitivityColumn(name);
      units[name] = {
        header: cell,
        unit,
        scale: (one.value.value_si - zero.value.value_si) / perScale,
        offset: isDelta ? 0 : zero.value.value_si,
      };
      columns[j] = name;
    });
    if (errors.length > 0) return;
    for (const name of COLUMN_NAMES) {
      if (COLUMNS[name].required && units[name] === undefined) {
        add('missing_column', lineNo, name, null, `a ${name}[unit] column`, `missing column "${name}"; required columns are altitude, mach, power, thrust, fuel_flow`);
      }
    }
    for (const issue of sensitivityColumnIssues((c) => units[c] !== undefined, units.airflow !== undefined, (c) => c)) {
      const header = units[issue.column]?.header ?? issue.column;
      add(issue.kind === 'missing' ? 'missing_column' : 'unknown_column', lineNo, header, null,
        issue.kind === 'missing' ? `a ${issue.column}[unit] column` : 'an airflow column', issue.message);
    }
    hasSensitivities = SENSITIVITY_FIELDS.some((f) => units[f.csv] !== undefined);
    limits = columns.map((name) => {
      const u = units[name!]!;
      const [lo, hi] = DECK_VALUE_LIMITS[name!];
      return { scale: u.scale, offset: u.offset, lo, hi };
    });
  }

  function readRow(raw: string, lineNo: number): void {
    const cells = raw.split(',').map((c) => c.trim());
    if (cells.length !== headerCells.length) {
      const missing = cells.length < headerCells.length;
      const column = missing ? headerCells[cells.length]! : `cell ${cells.length}`;
      add('ragged_row', lineNo, column, null, `${headerCells.length} cells like the header`,
        `${cells.length} cells where the header has ${headerCells.length} (${missing ? `no value for "${column}"` : 'extra cells at the end'})`);
      return;
    }
    const v: Partial<Record<DeckColumn, number>> = {};
    let good = true;
    cells.forEach((cell, j) => {
      const name = columns[j]!;
      const c = limits[j]!;
      if (NUMBER.test(cell)) {
        const x = Number(cell) * c.scale + c.offset;
        // NaN and the infinities fail the comparisons (the limits are finite) and are named below.
        if (x >= c.lo && x <= c.hi) {
          v[name] = x;
          return;
        }
      }
      const u = units[name]!;
      if (cell === '') {
        add('empty_cell', lineNo, u.header, cell, 'a number', 'the cell is empty');
        good = false;
        return;
      }
      if (NOT_FINITE_WORD.test(cell)) {
        add('not_finite', lineNo, u.header, cell, 'a finite number', `"${cell}" is not a finite number`);
        good = false;
        return;
      }
      if (!NUMBER.test(cell)) {
        add('not_a_number', lineNo, u.header, cell, 'a number', `"${cell}" is not a number`);
        good = false;
        return;
      }
      const si = Number(cell) * u.scale + u.offset;
      if (!Number.isFinite(si)) {
        add('not_finite', lineNo, u.header, cell, 'a finite number', `"${cell}" is not a finite number`);
        good = false;
        return;
      }
      const [lo, hi] = DECK_VALUE_LIMITS[name];
      if (si < lo || si > hi) {
        const isFlow = name === 'fuel_flow' || name === 'airflow';
        const show = (x: number): string => `${Number(((x - u.offset) / u.scale).toPrecision(6))}`;
        add(isFlow && si < 0 ? 'negative_flow' : 'out_of_range', lineNo, u.header, cell, `${show(lo)} to ${show(hi)} ${u.unit}`,
          isFlow && si < 0 ? `"${cell}" is negative; a flow must be zero or more` : `"${cell}" is outside the plausible range ${show(lo)} to ${show(hi)} ${u.unit}`);
        good = false;
        return;
      }
      v[name] = si;
    });
    if (!good) return;
    rows.push({
      isaDev_K: v.isa_dev ?? 0,
      altitude_m: v.altitude!,
      mach: v.mach!,
      power: v.power!,
      thrust_N: v.thrust!,
      fuelFlow_kg_s: v.fuel_flow!,
      airflow_kg_s: v.airflow ?? null,
      sensitivities: hasSensitivities ? sensitivitiesOf(v, units.airflow !== undefined) : null,
    });
    rowLines.push(lineNo);
  }
}

function sensitivitiesOf(v: Partial<Record<DeckColumn, number>>, hasAirflow: boolean): InstallationSensitivities {
  const air = (c: SensitivityColumn): number | null => (hasAirflow ? v[c]! : null);
  return {
    dThrust_dRecovery_N: v.dthrust_drecovery!,
    dFuelFlow_dRecovery_kg_s: v.dfuel_flow_drecovery!,
    dAirflow_dRecovery_kg_s: air('dairflow_drecovery'),
    dThrust_dBleed_N: v.dthrust_dbleed!,
    dFuelFlow_dBleed_kg_s: v.dfuel_flow_dbleed!,
    dAirflow_dBleed_kg_s: air('dairflow_dbleed'),
    dThrust_dExtraction_N_W: v.dthrust_dextraction!,
    dFuelFlow_dExtraction_kg_s_W: v.dfuel_flow_dextraction!,
    dAirflow_dExtraction_kg_s_W: air('dairflow_dextraction'),
  };
}

/** Units a deck is written in by `deckToCsv`. */
export interface DeckCsvUnits {
  readonly altitude: string;
  readonly thrust: string;
  readonly fuelFlow: string;
  readonly airflow: string;
  readonly isaDev: string;
  /** The shaft-power unit of the per-watt extraction sensitivities (W, kW, hp). */
  readonly shaftPower: string;
}

export const SI_DECK_UNITS: DeckCsvUnits = { altitude: 'm', thrust: 'N', fuelFlow: 'kg/s', airflow: 'kg/s', isaDev: 'K', shaftPower: 'W' };
export const CUSTOMARY_DECK_UNITS: DeckCsvUnits = { altitude: 'ft', thrust: 'lbf', fuelFlow: 'lb/h', airflow: 'lb/s', isaDev: 'K', shaftPower: 'hp' };

/**
 * Writes a deck as CSV in the given units. `significantDigits` (default 17,
 * exact round trip in SI) rounds every value; metadata lines carry title,
 * parametric flag, reference recovery, ratings, notes and non-default policies.
 */
export function deckToCsv(deck: EngineDeck, units: DeckCsvUnits = SI_DECK_UNITS, significantDigits = 17): string {
  const scale = (unit: string): number => {
    const r = toSi(1, unit);
    if (!r.ok) throw new Error(`deckToCsv: unknown unit "${unit}"`);
    return r.value.value_si;
  };
  const fmt = (x: number): string => String(Number(x.toPrecision(significantDigits)));
  const out: string[] = [];
  out.push(`# title: ${deck.title.replace(/[\r\n]+/g, " ")}`);
  out.push(`# parametric: ${deck.parametric ? 'yes' : 'no'}`);
  out.push(
    `# reference recovery: ${deck.referenceRecovery.kind === 'milE5008b' ? 'MIL-E-5008B' : fmt(deck.referenceRecovery.value)}`,
  );
  for (const name of RATING_NAMES) {
    const v = deck.ratings[name];
    if (v !== undefined) out.push(`# rating ${name}: ${fmt(v)}`);
  }
  for (const note of deck.notes) out.push(`# note: ${note.replace(/[\r\n]+/g, ' ')}`);
  for (const [column, axis] of Object.entries(POLICY_AXES)) {
    if (deck.policy[axis] !== DEFAULT_DECK_POLICY[axis]) out.push(`# outside ${column}: ${deck.policy[axis]}`);
  }
  const sAlt = scale(units.altitude);
  const sThrust = scale(units.thrust);
  const sFuel = scale(units.fuelFlow);
  const sAir = scale(units.airflow);
  const sIsa = scale(units.isaDev);
  const header = [`altitude[${units.altitude}]`, 'mach[-]', 'power[-]', `thrust[${units.thrust}]`, `fuel_flow[${units.fuelFlow}]`];
  if (deck.hasAirflow) header.push(`airflow[${units.airflow}]`);
  if (deck.hasIsaDev) header.push(`isa_dev[${units.isaDev}]`);
  const quantityUnit: Readonly<Record<SensitivityQuantity, readonly [string, number]>> = {
    thrust: [units.thrust, sThrust],
    fuelFlow: [units.fuelFlow, sFuel],
    airflow: [units.airflow, sAir],
  };
  const sShaft = scale(units.shaftPower);
  const sensitivityColumns = deck.hasSensitivities
    ? SENSITIVITY_FIELDS.filter((f) => deck.hasAirflow || f.quantity !== 'airflow').map((f) => {
        const [unit, s] = quantityUnit[f.quantity];
        const perPower = f.variable === 'extraction';
        header.push(`${f.csv}[${perPower ? `${unit}/${units.shaftPower}` : unit}]`);
        return { key: f.key, scale: perPower ? s / sShaft : s };
      })
    : [];
  out.push(header.join(','));
  for (const p of deckGridPoints(deck.grid)) {
    const cells = [fmt(p.altitude_m / sAlt), fmt(p.mach), fmt(p.power), fmt(p.thrust_N / sThrust), fmt(p.fuelFlow_kg_s / sFuel)];
    if (deck.hasAirflow) cells.push(fmt((p.airflow_kg_s ?? 0) / sAir));
    if (deck.hasIsaDev) cells.push(fmt(p.isaDev_K / sIsa));
    for (const c of sensitivityColumns) cells.push(fmt((p.sensitivities?.[c.key] ?? 0) / c.scale));
    out.push(cells.join(','));
  }
  return `${out.join('\n')}\n`;
}

