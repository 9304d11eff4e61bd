/**
 * The deck JSON form (docs/deck-format.md): SI column arrays with the same
 * metadata as the CSV form, validated with zod. Errors name the JSON path.
 */
import * as z from 'zod';
import { err, type Result } from '../core/result';
import { assembleDeck, DECK_VALUE_LIMITS, sensitivityColumnIssues, type DeckColumn, type SensitivityColumn } from './deckAssembly';
import { deckFileError, type DeckFileError } from './deckFileError';
import { deckGridPoints, type DeckGridPoint } from './deckGrid';
import { DEFAULT_DECK_POLICY, type EngineDeck } from './engineDeck';
import { RATING_NAMES, type RatingName } from './propulsionModel';
import { parseJsonText } from '../project/jsonText';
import { SENSITIVITY_FIELDS, type InstallationSensitivities } from './installationSensitivities';

const JSON_COLUMNS = [
  'altitude_m',
  'mach',
  'power',
  'thrust_N',
  'fuelFlow_kg_s',
  'airflow_kg_s',
  'isaDev_K',
  'dThrust_dRecovery_N',
  'dFuelFlow_dRecovery_kg_s',
  'dAirflow_dRecovery_kg_s',
  'dThrust_dBleed_N',
  'dFuelFlow_dBleed_kg_s',
  'dAirflow_dBleed_kg_s',
  'dThrust_dExtraction_N_W',
  'dFuelFlow_dExtraction_kg_s_W',
  'dAirflow_dExtraction_kg_s_W',
] as const;
type JsonColumn = (typeof JSON_COLUMNS)[number];
const COLUMN_OF: Readonly<Record<JsonColumn, DeckColumn>> = {
  altitude_m: 'altitude',
  mach: 'mach',
  power: 'power',
  thrust_N: 'thrust',
  fuelFlow_kg_s: 'fuel_flow',
  airflow_kg_s: 'airflow',
  isaDev_K: 'isa_dev',
  dThrust_dRecovery_N: 'dthrust_drecovery',
  dFuelFlow_dRecovery_kg_s: 'dfuel_flow_drecovery',
  dAirflow_dRecovery_kg_s: 'dairflow_drecovery',
  dThrust_dBleed_N: 'dthrust_dbleed',
  dFuelFlow_dBleed_kg_s: 'dfuel_flow_dbleed',
  dAirflow_dBleed_kg_s: 'dairflow_dbleed',
  dThrust_dExtraction_N_W: 'dthrust_dextraction',
  dFuelFlow_dExtraction_kg_s_W: 'dfuel_flow_dextraction',
  dAirflow_dExtraction_kg_s_W: 'dairflow_dextraction',
};
const JSON_NAME_OF = Object.fromEntries(SENSITIVITY_FIELDS.map((f) => [f.csv, f.key])) as unknown as Record<SensitivityColumn, JsonColumn>;
const SI_SUFFIX: Readonly<Record<DeckColumn, string>> = {
  altitude: ' m',
  mach: '',
  power: '',
  thrust: ' N',
  fuel_flow: ' kg/s',
  airflow: ' kg/s',
  isa_dev: ' K',
  dthrust_drecovery: ' N',
  dfuel_flow_drecovery: ' kg/s',
  dairflow_drecovery: ' kg/s',
  dthrust_dbleed: ' N',
  dfuel_flow_dbleed: ' kg/s',
  dairflow_dbleed: ' kg/s',
  dthrust_dextraction: ' N/W',
  dfuel_flow_dextraction: ' kg/s/W',
  dairflow_dextraction: ' kg/s/W',
};
const REQUIRED: readonly JsonColumn[] = ['altitude_m', 'mach', 'power', 'thrust_N', 'fuelFlow_kg_s'];

const policySchema = z.enum(['refuse', 'clamp', 'extrapolate']);
const ratingsShape = Object.fromEntries(RATING_NAMES.map((r) => [r, z.number().optional()])) as Record<
  RatingName,
  z.ZodOptional<z.ZodNumber>
>;

/** The deck JSON document (format "blockwise-deck", version 1). Values SI. */
export const deckJsonSchema = z
  .object({
    format: z.literal('blockwise-deck'),
    version: z.literal(1),
    title: z.string().min(1),
    parametric: z.boolean().default(false),
    referenceRecovery: z.discriminatedUnion('kind', [
      z.object({ kind: z.literal('constant'), value: z.number().gt(0).lte(1) }).strict(),
      z.object({ kind: z.literal('milE5008b') }).strict(),
    ]),
    ratings: z.object(ratingsShape).strict().default({}),
    notes: z.array(z.string()).default([]),
    policy: z
      .object({
        altitude: policySchema.optional(),
        mach: policySchema.optional(),
        power: policySchema.optional(),
        isaDev: policySchema.optional(),
      })
      .strict()
      .default({}),
    columns: z.array(z.enum(JSON_COLUMNS)).min(1),
    points: z.array(z.array(z.number())).min(1),
  })
  .strict();

export type DeckJson = z.input<typeof deckJsonSchema>;

function pathText(path: readonly PropertyKey[]): string {
  let out = '';
  for (const p of path) out += typeof p === 'number' ? `[${p}]` : `${out === '' ? '' : '.'}${String(p)}`;
  return out === '' ? '(document)' : out;
}

/**
 * Parses the deck JSON form into an EngineDeck. Never throws; errors name
 * the JSON path, e.g. `deck.json, points[12][3]: ...`.
 */
export function parseDeckJson(text: string, sourceName: string): Result<EngineDeck, readonly DeckFileError[]> {
  const src = sourceName;
  if (typeof text !== 'string' || text.trim() === '') {
    return err([deckFileError(src, 'empty_file', null, null, null, 'a deck JSON document', 'the file is empty')]);
  }
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    // Locate the first offending character (line, column) with the project's JSON scanner.
    const located = parseJsonText(text);
    const what = located.ok ? 'the JSON parser refused it' : located.error.message;
    return err([deckFileError(src, 'bad_json', null, null, null, 'valid JSON', `not valid JSON: ${what}`)]);
  }
  const parsed = deckJsonSchema.safeParse(raw, { jitless: true }); // one-shot parse: see parseProject.ts on jitless
  if (!parsed.success) {
    return err(
      parsed.error.issues.slice(0, 100).map((issue) =>
        deckFileError(src, 'schema', null, pathText(issue.path), null, 'the deck JSON schema (docs/deck-format.md)', issue.message),
      ),
    );
  }
  const doc = parsed.data;
  const errors: DeckFileError[] = [];
  const index: Partial<Record<JsonColumn, number>> = {};
  doc.columns.forEach((c, j) => {
    if (index[c] !== undefined) {
      errors.push(deckFileError(src, 'duplicate_column', null, `columns[${j}]`, c, 'each column once', `column "${c}" appears twice`));
    }
    index[c] = j;
  });
  for (const c of REQUIRED) {
    if (index[c] === undefined) {
      errors.push(deckFileError(src, 'missing_column', null, 'columns', null, REQUIRED.join(', '), `missing column "${c}"; required columns are ${REQUIRED.join(', ')}`));
    }
  }
  const hasAirflow = index.airflow_kg_s !== undefined;
  for (const issue of sensitivityColumnIssues((c) => index[JSON_NAME_OF[c]] !== undefined, hasAirflow, (c) => JSON_NAME_OF[c])) {
    errors.push(deckFileError(src, issue.kind === 'missing' ? 'missing_column' : 'unknown_column', null, 'columns', JSON_NAME_OF[issue.column],
      issue.kind === 'missing' ? `a ${JSON_NAME_OF[issue.column]} column` : 'an airflow_kg_s column', issue.message));
  }
  const hasSensitivities = SENSITIVITY_FIELDS.some((f) => index[f.key] !== undefined);
  if (errors.length > 0) return err(errors);
  const rows: DeckGridPoint[] = [];
  const rowIndex: number[] = [];
  doc.points.forEach((point, i) => {
    if (errors.length >= 100) return;
    if (point.length !== doc.columns.length) {
      errors.push(deckFileError(src, 'ragged_row', null, `points[${i}]`, null, `${doc.columns.length} values like "columns"`, `${point.length} values where "columns" has ${doc.columns.length}`));
      return;
    }
    let good = true;
    point.forEach((v, j) => {
      const column = COLUMN_OF[doc.columns[j]!];
      const [lo, hi] = DECK_VALUE_LIMITS[column];
      if (v < lo || v > hi) {
        const flow = column === 'fuel_flow' || column === 'airflow';
        errors.push(
          deckFileError(src, flow && v < 0 ? 'negative_flow' : 'out_of_range', null, `points[${i}][${j}]`, String(v), `${lo} to ${hi}${SI_SUFFIX[column]}`,
            flow && v < 0 ? `${v} is negative; a flow must be zero or more` : `${v} is outside the plausible range ${lo} to ${hi}${SI_SUFFIX[column]}`),
        );
        good = false;
      }
    });
    if (!good) return;
    const get = (c: JsonColumn): number | undefined => (index[c] === undefined ? undefined : point[index[c]]);
    rows.push({
      isaDev_K: get('isaDev_K') ?? 0,
      altitude_m: get('altitude_m')!,
      mach: get('mach')!,
      power: get('power')!,
      thrust_N: get('thrust_N')!,
      fuelFlow_kg_s: get('fuelFlow_kg_s')!,
      airflow_kg_s: get('airflow_kg_s') ?? null,
      sensitivities: hasSensitivities ? sensitivitiesOf(get, hasAirflow) : null,
    });
    rowIndex.push(i);
  });
  if (errors.length > 0) return err(errors);
  const ratings = RATING_NAMES.flatMap((name) => {
    const value = doc.ratings[name];
    return value === undefined ? [] : [{ name, value, line: null, column: `ratings.${name}` }];
  });
  return assembleDeck({
    source: src,
    title: doc.title,
    parametric: doc.parametric,
    referenceRecovery: doc.referenceRecovery,
    ratings,
    notes: doc.notes,
    policy: { ...DEFAULT_DECK_POLICY, ...doc.policy },
    hasAirflow,
    hasIsaDev: index.isaDev_K !== undefined,
    hasSensitivities,
    rows,
    locate: {
      line: () => null,
      column: (row, column) => {
        const jc = JSON_COLUMNS.find((c) => COLUMN_OF[c] === column)!;
        return `points[${rowIndex[row]}][${index[jc]}]`;
      },
      show: (column, v) => `${v}${SI_SUFFIX[column]}`,
    },
  });
}

function sensitivitiesOf(get: (c: JsonColumn) => number | undefined, hasAirflow: boolean): InstallationSensitivities {
  const out: Record<string, number | null> = {};
  for (const f of SENSITIVITY_FIELDS) out[f.key] = f.quantity === 'airflow' && !hasAirflow ? null : get(f.key)!;
  return out as unknown as InstallationSensitivities;
}

/** Writes a deck in the JSON form (SI, exact round trip), one point per line. */
export function deckToJson(deck: EngineDeck): string {
  const columns: JsonColumn[] = ['altitude_m', 'mach', 'power', 'thrust_N', 'fuelFlow_kg_s'];
  if (deck.hasAirflow) columns.push('airflow_kg_s');
  if (deck.hasIsaDev) columns.push('isaDev_K');
  const sensitivityFields = deck.hasSensitivities ? SENSITIVITY_FIELDS.filter((f) => deck.hasAirflow || f.quantity !== 'airflow') : [];
  for (const f of sensitivityFields) columns.push(f.key);
  const head = JSON.stringify(
    {
      format: 'blockwise-deck',
      version: 1,
      title: deck.title,
      parametric: deck.parametric,
      referenceRecovery: deck.referenceRecovery,
      ratings: deck.ratings,
      notes: deck.notes,
      policy: deck.policy,
      columns,
    },
    null,
    2,
  );
  const points = deckGridPoints(deck.grid).map((p) => {
    const row = [p.altitude_m, p.mach, p.power, p.thrust_N, p.fuelFlow_kg_s];
    if (deck.hasAirflow) row.push(p.airflow_kg_s ?? 0);
    if (deck.hasIsaDev) row.push(p.isaDev_K);
    for (const f of sensitivityFields) row.push(p.sensitivities?.[f.key] ?? 0);
    return `    ${JSON.stringify(row)}`;
  });
  return `${head.slice(0, head.lastIndexOf('}')).trimEnd()},\n  "points": [\n${points.join(',\n')}\n  ]\n}\n`;
}
