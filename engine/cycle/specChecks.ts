/**
 * Range checks of a CycleSpec built in code (the cycle file's schema makes
 * the same checks with file locations). Returns the first problem as a
 * sentence naming the field, or null.
 */
import type { CycleSpec, LimitSet, LimitValue } from './cycleSpec';

interface Bound {
  readonly path: string;
  readonly value: number;
  readonly min: number;
  readonly max: number;
  /** Whether min itself is allowed. */
  readonly minIncluded?: boolean;
}

function limitValueProblem(path: string, v: LimitValue): string | null {
  if (typeof v === 'number') return Number.isFinite(v) && v > 0 ? null : `${path}: ${v} is not a positive finite number`;
  const pts = v.byAmbientTemperature;
  if (pts.length === 0) return `${path}: the schedule has no points`;
  for (let i = 0; i < pts.length; i++) {
    const [t, x] = pts[i]!;
    if (!(Number.isFinite(t) && t > 0 && Number.isFinite(x) && x > 0)) return `${path}: point ${i + 1} is not a pair of positive finite numbers`;
    if (i > 0 && !(t > pts[i - 1]![0])) return `${path}: the ambient temperatures must rise from point to point (point ${i + 1})`;
  }
  return null;
}

function limitSetProblem(path: string, limits: LimitSet): string | null {
  for (const [name, v] of Object.entries(limits)) {
    if (v === undefined) continue;
    const p = limitValueProblem(`${path}.${name}`, v);
    if (p) return p;
  }
  return null;
}

export function checkCycleSpec(spec: CycleSpec): string | null {
  const d = spec.design;
  const k = spec.components;
  const bounds: Bound[] = [
    { path: 'design.mach', value: d.mach, min: 0, max: 2.5, minIncluded: true },
    { path: 'design.bypassRatio', value: d.bypassRatio, min: 0, max: 25, minIncluded: true },
    { path: 'design.fanPressureRatio', value: d.fanPressureRatio, min: 1, max: 10 },
    { path: 'design.overallPressureRatio', value: d.overallPressureRatio, min: 1, max: 80 },
    { path: 'design.turbineInletTemperature', value: d.turbineInletTemperature_K, min: 500, max: 2500 },
    { path: 'design.inletRecovery', value: d.inletRecovery, min: 0.5, max: 1, minIncluded: true },
    { path: 'design.bleedFraction', value: d.bleedFraction, min: 0, max: 0.3, minIncluded: true },
    { path: 'design.powerExtraction', value: d.powerExtraction_W, min: 0, max: 1e8, minIncluded: true },
    { path: 'gas.cold.cp', value: spec.gas.cold.cp_J_kgK, min: 500, max: 2000 },
    { path: 'gas.cold.gamma', value: spec.gas.cold.gamma, min: 1.05, max: 1.67 },
    { path: 'gas.hot.cp', value: spec.gas.hot.cp_J_kgK, min: 500, max: 2000 },
    { path: 'gas.hot.gamma', value: spec.gas.hot.gamma, min: 1.05, max: 1.67 },
    { path: 'fuel.heatingValue', value: spec.fuel.heatingValue_J_kg, min: 1e6, max: 2e8 },
  ];
  for (const [name, value] of Object.entries(k)) bounds.push({ path: `components.${name}`, value, min: 0.3, max: 1 });
  for (const b of bounds) {
    const above = b.minIncluded ? b.value >= b.min : b.value > b.min;
    if (!Number.isFinite(b.value) || !above || b.value > b.max) {
      return `${b.path}: ${b.value} is outside ${b.minIncluded ? '[' : '('}${b.min}, ${b.max}]`;
    }
  }
  if (d.overallPressureRatio < d.fanPressureRatio) return `design.overallPressureRatio (${d.overallPressureRatio}) is below the fan pressure ratio (${d.fanPressureRatio}); it includes the fan`;
  const size = d.size.kind === 'airflow' ? d.size.airflow_kg_s : d.size.thrust_N;
  if (!(Number.isFinite(size) && size > 0)) return `design.size: ${size} is not a positive finite ${d.size.kind}`;
  const hard = limitSetProblem('limits', spec.limits);
  if (hard) return hard;
  for (const [name, r] of Object.entries(spec.ratings)) {
    if (r === undefined) continue;
    if (r.kind === 'limits') {
      const p = limitSetProblem(`ratings.${name}.limits`, r.limits);
      if (p) return p;
      if (Object.keys(r.limits).length === 0 && Object.keys(spec.limits).length === 0) return `ratings.${name}: no limit sets its throttle`;
    } else if (!(Number.isFinite(r.fraction) && r.fraction > 0 && r.fraction <= 1.5)) {
      return `ratings.${name}.fraction: ${r.fraction} is outside (0, 1.5]`;
    }
  }
  return null;
}
