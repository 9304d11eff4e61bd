/**
 * Reading a `*.cycle.json` file (format described in docs/cycle-format.md):
 * JSON text -> schema (zod; quantities with units to SI through
 * engine/units, as the project file does) -> CycleSpec -> cross-field
 * checks. Every problem names its JSON path, the value found and what was
 * expected; JSON syntax errors carry line and column.
 */
import * as z from 'zod';
import { err, ok, type Result } from '../core/result';
import { parseJsonText } from '../project/jsonText';
import { fromZodIssues, makeIssue, showValue, valueAtPath, type ProjectIssue } from '../project/projectIssue';
import { quantity } from '../project/quantityField';
import type { Dimension } from '../units/quantity';
import { RATING_NAMES, type RatingName } from '../propulsion/propulsionModel';
import { LIMIT_NAMES, type CycleRating, type CycleSpec, type LimitName, type LimitSet, type LimitValue } from './cycleSpec';
import { checkCycleSpec } from './specChecks';

export type CycleFileIssue = ProjectIssue;

export const CYCLE_FORMAT = 'blockwise-cycle';
export const CYCLE_VERSION = 1;

const LIMIT_DIMENSIONS: Readonly<Record<LimitName, Dimension>> = {
  turbineInletTemperature: 'temperature',
  fanSpeed: 'dimensionless',
  fanCorrectedSpeed: 'dimensionless',
  coreSpeed: 'dimensionless',
  compressorExitPressure: 'pressure',
  compressorExitTemperature: 'temperature',
};

const between = (min: number, max: number) => quantity('dimensionless', { min, max, what: `between ${min} and ${max}` });
const efficiency = () => between(0.3, 1);
const lossRatio = () => between(0.5, 1);

function limitValue(dimension: Dimension) {
  const schedule = z.strictObject({
    byAmbientTemperature: z.array(z.tuple([quantity('temperature'), quantity(dimension, { min: 1e-9, what: 'positive' })])).min(1),
  });
  return z.union([quantity(dimension, { min: 1e-9, what: 'positive' }), schedule]);
}

const limitSetSchema = z.strictObject(
  Object.fromEntries(LIMIT_NAMES.map((n) => [n, limitValue(LIMIT_DIMENSIONS[n]).optional()])) as Record<LimitName, z.ZodOptional<ReturnType<typeof limitValue>>>,
);

const ratingSchema = z.union([
  z.strictObject({ limits: limitSetSchema }),
  z.strictObject({ fanSpeed: between(0.05, 1.5) }),
  z.strictObject({ fanCorrectedSpeed: between(0.05, 1.5) }),
]);

const gasSchema = z.strictObject({
  cp: quantity('specificHeat', { min: 500, max: 2000, what: 'between 500 and 2000 J/(kg K)' }),
  gamma: between(1.05, 1.67),
});

export const cycleFileSchema = z.strictObject({
  format: z.literal(CYCLE_FORMAT),
  version: z.literal(CYCLE_VERSION),
  title: z.string().min(1),
  notes: z.array(z.string()).optional(),
  design: z.strictObject({
    altitude: quantity('length', { min: -5000, max: 25000, what: 'between -5,000 m and 25,000 m' }),
    mach: between(0, 2.5),
    isaDeviation: quantity('temperatureDelta', { min: -100, max: 100, what: 'between -100 K and +100 K' }).optional(),
    bypassRatio: between(0, 25),
    fanPressureRatio: between(1.0001, 10),
    overallPressureRatio: between(1.0001, 80),
    turbineInletTemperature: quantity('temperature', { min: 500, max: 2500, what: 'between 500 K and 2,500 K' }),
    inletRecovery: between(0.5, 1).optional(),
    bleedFraction: between(0, 0.3).optional(),
    powerExtraction: quantity('power', { min: 0, what: 'zero or positive' }).optional(),
    size: z.union([
      z.strictObject({ airflow: quantity('massFlow', { min: 1e-6, what: 'positive' }) }),
      z.strictObject({ thrust: quantity('force', { min: 1e-6, what: 'positive' }) }),
    ]),
  }),
  components: z.strictObject({
    fanPolytropicEfficiency: efficiency(),
    compressorPolytropicEfficiency: efficiency(),
    hpTurbinePolytropicEfficiency: efficiency(),
    lpTurbinePolytropicEfficiency: efficiency(),
    burnerEfficiency: efficiency(),
    burnerPressureRatio: lossRatio(),
    interCompressorDuctPressureRatio: lossRatio().optional(),
    bypassDuctPressureRatio: lossRatio().optional(),
    coreNozzlePressureRatio: lossRatio().optional(),
    hpMechanicalEfficiency: efficiency(),
    lpMechanicalEfficiency: efficiency(),
  }),
  nozzles: z.strictObject({ core: z.enum(['convergent', 'fullyExpanded']), bypass: z.enum(['convergent', 'fullyExpanded']) }),
  gas: z.strictObject({ cold: gasSchema, hot: gasSchema }),
  fuel: z.strictObject({
    heatingValue: quantity('specificEnergy', { min: 1e6, max: 2e8, what: 'between 1 and 200 MJ/kg' }),
    massInCore: z.boolean(),
  }),
  limits: limitSetSchema,
  ratings: z.strictObject(Object.fromEntries(RATING_NAMES.map((r) => [r, ratingSchema.optional()])) as Record<RatingName, z.ZodOptional<typeof ratingSchema>>),
});

export type CycleFile = z.output<typeof cycleFileSchema>;

type ParsedLimit = z.output<ReturnType<typeof limitValue>>;

function toLimitValue(v: ParsedLimit): LimitValue {
  return typeof v === 'number' ? v : { byAmbientTemperature: v.byAmbientTemperature.map(([t, x]) => [t, x] as const) };
}

function toLimitSet(set: Readonly<Partial<Record<LimitName, ParsedLimit>>>): LimitSet {
  const out: Partial<Record<LimitName, LimitValue>> = {};
  for (const name of LIMIT_NAMES) {
    const v = set[name];
    if (v !== undefined) out[name] = toLimitValue(v);
  }
  return out;
}

function toRating(r: z.output<typeof ratingSchema>): CycleRating {
  if ('limits' in r) return { kind: 'limits', limits: toLimitSet(r.limits) };
  if ('fanSpeed' in r) return { kind: 'fanSpeed', fraction: r.fanSpeed };
  return { kind: 'fanCorrectedSpeed', fraction: r.fanCorrectedSpeed };
}

/** The SI CycleSpec of a parsed file (optional losses default to none, recovery to 1, bleed and extraction to 0). */
export function cycleSpecOf(file: CycleFile): CycleSpec {
  const d = file.design;
  const k = file.components;
  const ratings: Partial<Record<RatingName, CycleRating>> = {};
  for (const name of RATING_NAMES) {
    const r = file.ratings[name];
    if (r !== undefined) ratings[name] = toRating(r);
  }
  return {
    title: file.title,
    design: {
      altitude_m: d.altitude,
      mach: d.mach,
      isaDeviation_K: d.isaDeviation ?? 0,
      bypassRatio: d.bypassRatio,
      fanPressureRatio: d.fanPressureRatio,
      overallPressureRatio: d.overallPressureRatio,
      turbineInletTemperature_K: d.turbineInletTemperature,
      inletRecovery: d.inletRecovery ?? 1,
      bleedFraction: d.bleedFraction ?? 0,
      powerExtraction_W: d.powerExtraction ?? 0,
      size: 'airflow' in d.size ? { kind: 'airflow', airflow_kg_s: d.size.airflow } : { kind: 'thrust', thrust_N: d.size.thrust },
    },
    components: {
      ...k,
      interCompressorDuctPressureRatio: k.interCompressorDuctPressureRatio ?? 1,
      bypassDuctPressureRatio: k.bypassDuctPressureRatio ?? 1,
      coreNozzlePressureRatio: k.coreNozzlePressureRatio ?? 1,
    },
    nozzles: file.nozzles,
    gas: { cold: { cp_J_kgK: file.gas.cold.cp, gamma: file.gas.cold.gamma }, hot: { cp_J_kgK: file.gas.hot.cp, gamma: file.gas.hot.gamma } },
    fuel: { heatingValue_J_kg: file.fuel.heatingValue, massInCore: file.fuel.massInCore },
    limits: toLimitSet(file.limits),
    ratings,
  };
}

/** Parses an already-read JSON value as a cycle file. */
export function parseCycleData(doc: unknown): Result<CycleSpec, readonly CycleFileIssue[]> {
  const parsed = cycleFileSchema.safeParse(doc, { jitless: true }); // one-shot parse: see engine/project/parseProject.ts on jitless
  if (!parsed.success) {
    return err(fromZodIssues(parsed.error.issues, doc).map((i) => ({ ...i, message: i.message.replace('docs/project-format.md', 'docs/cycle-format.md') })));
  }
  const spec = cycleSpecOf(parsed.data);
  const problem = checkCycleSpec(spec);
  if (problem !== null) {
    const path = problem.split(/[:\s]/)[0]!;
    const reason = problem.slice(path.length).replace(/^:\s*/, '').trim();
    return err([makeIssue(path, showValue(valueAtPath(doc, path.split('.'))), 'a consistent cycle', reason)]);
  }
  return ok(spec);
}

/** Parses cycle-file text; `sourceName` is used in the syntax-error message only. */
export function parseCycleFile(text: string, sourceName: string): Result<CycleSpec, readonly CycleFileIssue[]> {
  const json = parseJsonText(text);
  if (!json.ok) {
    const e = json.error;
    const path = e.code === 'empty' ? '(file)' : `(line ${e.line}, column ${e.column})`;
    return err([{ path, value: e.code === 'empty' ? '(empty)' : '(invalid JSON)', expected: e.code === 'empty' ? 'a JSON object' : 'valid JSON', message: `${sourceName}: ${e.message}` }]);
  }
  return parseCycleData(json.value);
}
