/**
 * The inputs a project declares uncertain (its `uncertainty` block), in the
 * engine's terms, and applying one sample of them to the project: each
 * input's drawn value is an offset or a relative change of a project field.
 * A drawn value of exactly 0 leaves the project untouched, so a study whose
 * spreads are all zero flies exactly the deterministic project.
 */
import { DEFAULT_C_BLEED, DEFAULT_C_RAM } from '../propulsion/installationCorrections';
import type { Project, ProjectInlet } from '../project/projectSchema';
import { lipSuctionOf } from '../project/projectSpecs';
import { describeDistribution, type InputDistribution } from './inputDistribution';

export type UncertainInputKind = 'cd0' | 'k' | 'tsfc' | 'oew' | 'cRam' | 'cBleed' | 'recovery' | 'lipSuction' | 'recoveryMethod';

/** A recovery method a sample can fly (uncertainty `recoveryMethod` alternatives). */
export type RecoveryMethodChoice = 'raymerHeld' | 'raymerScaled' | 'deckSensitivities';

export const RECOVERY_METHOD_CHOICE_TEXT: Readonly<Record<RecoveryMethodChoice, string>> = {
  raymerHeld: "Raymer's rule, fuel held",
  raymerScaled: "Raymer's rule, fuel scaled with recovery",
  deckSensitivities: "the deck's sensitivities",
};

export interface UncertainInput {
  /** Unique id, e.g. "cd0", "recovery:short" (an inlet-specific input carries the inlet name). */
  readonly id: string;
  readonly kind: UncertainInputKind;
  /** The inlet an inlet input applies to; null = every inlet (one draw for all). */
  readonly inlet: string | null;
  /** Words for reports, e.g. "CD0 (drag counts)". */
  readonly label: string;
  /** The unit the distribution is written in ("counts", "%", "kg", ""). */
  readonly unit: string;
  /** Distribution in SI-like engine units: counts for CD0, fractions for K and TSFC, kg for OEW, plain numbers else. */
  readonly distribution: InputDistribution;
  readonly description: string;
  readonly reason: string;
  /** For `recoveryMethod`: the alternative of each index of the discrete distribution. */
  readonly alternatives?: readonly RecoveryMethodChoice[];
}

const LABEL: Readonly<Record<UncertainInputKind, string>> = {
  cd0: 'CD0',
  k: 'induced-drag factor K',
  tsfc: 'TSFC',
  oew: 'operating empty weight',
  cRam: 'C_ram (Raymer)',
  cBleed: 'C_bleed (Raymer)',
  recovery: 'inlet recovery',
  lipSuction: 'lip suction',
  recoveryMethod: 'recovery method',
};

const UNIT: Readonly<Record<UncertainInputKind, string>> = { cd0: 'counts', k: '%', tsfc: '%', oew: 'kg', cRam: '', cBleed: '', recovery: '', lipSuction: '', recoveryMethod: '' };

type DeclaredInput = NonNullable<Project['uncertainty']>['inputs'][number];

function distributionOf(d: Extract<DeclaredInput, { distribution: unknown }>['distribution']): InputDistribution {
  return d.kind === 'normal'
    ? { kind: 'normal', mean: d.mean, sd: d.sd, ...(d.min === undefined ? {} : { min: d.min }), ...(d.max === undefined ? {} : { max: d.max }) }
    : { kind: 'uniform', min: d.min, max: d.max };
}

/** Shown in the input's unit: fractions as percent. */
function displayDistribution(kind: UncertainInputKind, d: InputDistribution): InputDistribution {
  if (UNIT[kind] !== '%') return d;
  const s = (x: number) => x * 100;
  return d.kind === 'normal'
    ? { kind: 'normal', mean: s(d.mean), sd: s(d.sd), ...(d.min === undefined ? {} : { min: s(d.min) }), ...(d.max === undefined ? {} : { max: s(d.max) }) }
    : d.kind === 'uniform'
      ? { kind: 'uniform', min: s(d.min), max: s(d.max) }
      : d;
}

/** The project's declared uncertain inputs (empty when it declares none). */
export function uncertainInputsOf(project: Project): UncertainInput[] {
  const declared = project.uncertainty?.inputs ?? [];
  return declared.map((d): UncertainInput => {
    if (d.input === 'recoveryMethod') {
      const alternatives = d.alternatives.map((a) => a.method);
      const distribution: InputDistribution = { kind: 'discrete', weights: d.alternatives.map((a) => a.weight) };
      return {
        id: 'recoveryMethod',
        kind: 'recoveryMethod',
        inlet: null,
        label: LABEL.recoveryMethod,
        unit: '',
        distribution,
        description: describeDistribution(distribution, '', alternatives.map((a) => RECOVERY_METHOD_CHOICE_TEXT[a])),
        reason: d.reason,
        alternatives,
      };
    }
    const inlet = 'inlet' in d && d.inlet !== undefined ? d.inlet : null;
    const distribution = distributionOf(d.distribution);
    const where = inlet === null ? (d.input === 'recovery' || d.input === 'lipSuction' ? ' (every inlet)' : '') : ` (${inlet})`;
    return {
      id: inlet === null ? d.input : `${d.input}:${inlet}`,
      kind: d.input,
      inlet,
      label: `${LABEL[d.input]}${where}`,
      unit: UNIT[d.input],
      distribution,
      description: describeDistribution(displayDistribution(d.input, distribution), UNIT[d.input]),
      reason: d.reason,
    };
  });
}

/** A project with one sample applied, and what else the sample changes. */
export interface AppliedSample {
  readonly project: Project;
  /** Multiplier on fuel flow at a given thrust (-): 1 + the TSFC draw. */
  readonly fuelFlowScale: number;
  /** Values held at a physical bound (recovery <= 1, lip suction 0..1, coefficients >= 0), one line each. */
  readonly held: readonly string[];
}

function appliesTo(input: UncertainInput, inlet: ProjectInlet): boolean {
  return input.inlet === null || input.inlet === inlet.name;
}

/**
 * The project with `values[i]` of `inputs[i]` applied:
 *   cd0: polar.cdIncrement + value x 1e-4;   k: K x (1 + value) (Oswald e / (1 + value), or every K row);
 *   tsfc: fuel flow x (1 + value) at a given thrust (returned as fuelFlowScale);
 *   oew: operatingEmpty + value;   cRam, cBleed: coefficient + value (default when absent);
 *   recovery: every recovery-table row + value, held at 1;
 *   lipSuction: the constant factor, or every value of the lip-suction table (the rounded-pitot default made explicit), + value, held in 0..1.
 * Inputs whose value is exactly 0 change nothing.
 */
export function applySample(project: Project, inputs: readonly UncertainInput[], values: ArrayLike<number>): AppliedSample {
  let p: Project = project;
  let fuelFlowScale = 1;
  const held: string[] = [];
  inputs.forEach((input, i) => {
    const v = values[i]!;
    if (input.kind === 'recoveryMethod') {
      // A discrete draw: v is the alternative's index (0 is an alternative too).
      const choice = input.alternatives?.[v] ?? 'raymerHeld';
      const inst = p.engine.installation;
      const installation =
        choice === 'deckSensitivities'
          ? { ...inst, recoveryMethod: 'deckSensitivities' as const }
          : { ...inst, recoveryMethod: 'raymer' as const, ramFuelFlow: choice === 'raymerHeld' ? ('heldAtPower' as const) : ('scaledWithRecovery' as const) };
      p = { ...p, engine: { ...p.engine, installation } };
      return;
    }
    if (v === 0) return;
    switch (input.kind) {
      case 'cd0':
        p = { ...p, polar: { ...p.polar, cdIncrement: p.polar.cdIncrement + v * 1e-4 } };
        return;
      case 'k': {
        const f = 1 + v;
        const induced = p.polar.induced;
        p = {
          ...p,
          polar: {
            ...p.polar,
            induced:
              induced.kind === 'oswald'
                ? { ...induced, oswaldEfficiency: induced.oswaldEfficiency / f }
                : { ...induced, rows: induced.rows.map((r) => ({ ...r, k: r.k * f })) },
          },
        };
        return;
      }
      case 'tsfc':
        fuelFlowScale *= 1 + v;
        return;
      case 'oew':
        p = { ...p, airframe: { ...p.airframe, weights: { ...p.airframe.weights, operatingEmpty: p.airframe.weights.operatingEmpty + v } } };
        return;
      case 'cRam':
      case 'cBleed': {
        const inst = p.engine.installation;
        const field = input.kind === 'cRam' ? 'ramRecoveryFactor' : 'bleedFactor';
        const base = inst[field] ?? (input.kind === 'cRam' ? DEFAULT_C_RAM : DEFAULT_C_BLEED);
        let c = base + v;
        if (c < 0) {
          held.push(`${input.label} ${c.toFixed(3)} held at 0`);
          c = 0;
        }
        p = { ...p, engine: { ...p.engine, installation: { ...inst, [field]: c } } };
        return;
      }
      case 'recovery':
        p = {
          ...p,
          inlets: p.inlets.map((inlet) => {
            if (!appliesTo(input, inlet) || inlet.source.kind !== 'recoveryTable') return inlet;
            const rows = inlet.source.rows.map((r) => {
              const eta = r.recovery + v;
              if (eta > 1) held.push(`recovery of "${inlet.name}" at Mach ${r.mach} ${eta.toFixed(4)} held at 1`);
              else if (!(eta > 0)) held.push(`recovery of "${inlet.name}" at Mach ${r.mach} ${eta.toFixed(4)} held at 0.01`);
              return { ...r, recovery: Math.min(1, Math.max(0.01, eta)) };
            });
            return { ...inlet, source: { ...inlet.source, rows } };
          }),
        };
        return;
      case 'lipSuction':
        p = {
          ...p,
          inlets: p.inlets.map((inlet) => {
            if (!appliesTo(input, inlet)) return inlet;
            const shift = (what: string) => (f: number): number => {
              const g = f + v;
              if (g < 0 || g > 1) held.push(`${what} "${inlet.name}" ${g.toFixed(3)} held at ${g < 0 ? 0 : 1}`);
              return Math.min(1, Math.max(0, g));
            };
            if (inlet.lipSuction === undefined && inlet.lipSuctionFactor !== undefined) return { ...inlet, lipSuctionFactor: shift('lip suction of')(inlet.lipSuctionFactor) };
            // A table, or the rounded-pitot default (made explicit): every value shifted.
            const table = lipSuctionOf(inlet).lipSuction;
            if (table === undefined || table.kind !== 'table') return inlet;
            return { ...inlet, lipSuction: { kind: 'table' as const, mach: [...table.mach], massFlowRatio: [...table.massFlowRatio], factor: table.factor.map((row) => row.map(shift('some cells of the lip-suction table of'))) } };
          }),
        };
        return;
    }
  });
  return { project: p, fuelFlowScale, held };
}
