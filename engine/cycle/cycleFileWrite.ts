/**
 * A CycleSpec written back as a cycle file document (docs/cycle-format.md),
 * SI with units in the text, so parseCycleData(cycleFileOf(spec)) gives the
 * same spec back (numbers written in full precision). Used by `cycle match`
 * to save the fitted cycle.
 */
import type { RatingName } from '../propulsion/propulsionModel';
import { CYCLE_FORMAT, CYCLE_VERSION } from './cycleFile';
import { LIMIT_NAMES, type CycleRating, type CycleSpec, type LimitName, type LimitSet, type LimitValue } from './cycleSpec';

const LIMIT_UNIT: Readonly<Record<LimitName, string>> = {
  turbineInletTemperature: 'K',
  fanSpeed: '',
  fanCorrectedSpeed: '',
  coreSpeed: '',
  compressorExitPressure: 'Pa',
  compressorExitTemperature: 'K',
};

const q = (v: number, unit: string): string => `${v} ${unit}`;

function limitText(name: LimitName, v: number): number | string {
  const unit = LIMIT_UNIT[name];
  return unit === '' ? v : q(v, unit);
}

function limitValueDoc(name: LimitName, v: LimitValue): unknown {
  return typeof v === 'number' ? limitText(name, v) : { byAmbientTemperature: v.byAmbientTemperature.map(([t, x]) => [q(t, 'K'), limitText(name, x)]) };
}

function limitSetDoc(set: LimitSet): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const name of LIMIT_NAMES) {
    const v = set[name];
    if (v !== undefined) out[name] = limitValueDoc(name, v);
  }
  return out;
}

function ratingDoc(r: CycleRating): unknown {
  if (r.kind === 'limits') return { limits: limitSetDoc(r.limits) };
  return r.kind === 'fanSpeed' ? { fanSpeed: r.fraction } : { fanCorrectedSpeed: r.fraction };
}

/** The cycle file document of `spec`, with `notes`. */
export function cycleFileOf(spec: CycleSpec, notes: readonly string[] = []): Record<string, unknown> {
  const d = spec.design;
  const ratings: Record<string, unknown> = {};
  for (const [name, r] of Object.entries(spec.ratings) as [RatingName, CycleRating][]) ratings[name] = ratingDoc(r);
  return {
    format: CYCLE_FORMAT,
    version: CYCLE_VERSION,
    title: spec.title,
    notes: [...notes],
    design: {
      altitude: q(d.altitude_m, 'm'),
      mach: d.mach,
      isaDeviation: q(d.isaDeviation_K, 'K'),
      bypassRatio: d.bypassRatio,
      fanPressureRatio: d.fanPressureRatio,
      overallPressureRatio: d.overallPressureRatio,
      turbineInletTemperature: q(d.turbineInletTemperature_K, 'K'),
      inletRecovery: d.inletRecovery,
      bleedFraction: d.bleedFraction,
      powerExtraction: q(d.powerExtraction_W, 'W'),
      size: d.size.kind === 'airflow' ? { airflow: q(d.size.airflow_kg_s, 'kg/s') } : { thrust: q(d.size.thrust_N, 'N') },
    },
    components: { ...spec.components },
    nozzles: { ...spec.nozzles },
    gas: {
      cold: { cp: q(spec.gas.cold.cp_J_kgK, 'J/(kg K)'), gamma: spec.gas.cold.gamma },
      hot: { cp: q(spec.gas.hot.cp_J_kgK, 'J/(kg K)'), gamma: spec.gas.hot.gamma },
    },
    fuel: { heatingValue: q(spec.fuel.heatingValue_J_kg, 'J/kg'), massInCore: spec.fuel.massInCore },
    limits: limitSetDoc(spec.limits),
    ratings,
  };
}
