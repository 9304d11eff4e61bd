/**
 * The SI description of an airframe drag polar (DESIGN.md §2.3):
 *   CD = CD0(M) + dCD0 + K(M) (CL - CLmd)^2 + CDwave(M, CL)
 * with CLmax(M) and buffet-onset CL(M). Tables are given as parallel arrays;
 * engine/aero/dragPolar.ts builds the model and validatePolarSpec checks it.
 */
import { err, ok, type Result } from '../core/result';
import { makeTable1d, type TableError } from '../core/table1d';
import { makeTable2d } from '../core/table2d';

export type InducedSpec =
  | {
      /** K = 1 / (pi e AR), constant in Mach. */
      readonly kind: 'oswald';
      readonly aspectRatio: number;
      readonly oswaldEfficiency: number;
    }
  | { readonly kind: 'table'; readonly mach: readonly number[]; readonly k: readonly number[] };

export type CompressibilitySpec =
  | { readonly kind: 'none' }
  | {
      /** Korn equation with Lock's fourth-power rise (engine/aero/waveDrag.ts). */
      readonly kind: 'korn';
      /** Sweep of the wing (rad), usually quarter chord. */
      readonly sweep_rad: number;
      /** Average streamwise thickness-to-chord ratio (-). */
      readonly thicknessRatio: number;
      /** Korn airfoil technology factor kappa_A (-): about 0.87 conventional, 0.95 supercritical. */
      readonly kornTechnologyFactor: number;
    }
  | {
      /** Wave drag tabulated over Mach (rows) and CL (columns): cdWave[i][j] at mach[i], cl[j]. */
      readonly kind: 'table';
      readonly mach: readonly number[];
      readonly cl: readonly number[];
      readonly cdWave: readonly (readonly number[])[];
    };

export interface PolarSpec {
  /** Zero-lift parasite drag vs Mach. */
  readonly cd0: { readonly mach: readonly number[]; readonly cd0: readonly number[] };
  /** Constant parasite increment dCD0 (-), e.g. an inlet's external drag. */
  readonly cdIncrement: number;
  readonly induced: InducedSpec;
  /** CL of minimum drag, CLmd (-). */
  readonly clMinDrag: number;
  readonly compressibility: CompressibilitySpec;
  /** Buffet-onset CL vs Mach (1 g). */
  readonly buffetCl: { readonly mach: readonly number[]; readonly cl: readonly number[] };
  /** Maximum lift coefficient vs Mach. */
  readonly clMax: { readonly mach: readonly number[]; readonly cl: readonly number[] };
}

/** One problem with a polar: the field path (e.g. `cd0.mach[2]`) and what is wrong. */
export interface PolarIssue {
  readonly path: string;
  readonly message: string;
}

function tableIssue(prefix: string, names: Readonly<Record<string, string>>, e: TableError): PolarIssue {
  const base = e.field.replace(/\[.*$/, '');
  const field = (names[base] ?? base) + e.field.slice(base.length);
  const at = e.index === undefined ? '' : `[${e.index}]`;
  const what: Record<TableError['code'], string> = {
    empty: 'has no points',
    length_mismatch: 'does not have one value per axis point',
    not_finite: `is ${String(e.value)}, expected a finite number`,
    not_increasing: `= ${String(e.value)} breaks the order; the axis must be strictly increasing (or strictly decreasing throughout)`,
  };
  return { path: `${prefix}.${field}${at}`, message: what[e.code] };
}

function checkNumber(
  issues: PolarIssue[],
  path: string,
  value: number,
  test: (v: number) => boolean,
  expected: string,
): void {
  if (!Number.isFinite(value)) {
    issues.push({ path, message: `is ${String(value)}, expected a finite number` });
  } else if (!test(value)) {
    issues.push({ path, message: `is ${value}, expected ${expected}` });
  }
}

function checkEach(
  issues: PolarIssue[],
  path: string,
  values: readonly number[],
  test: (v: number) => boolean,
  expected: string,
): void {
  values.forEach((v, i) => {
    if (Number.isFinite(v) && !test(v)) issues.push({ path: `${path}[${i}]`, message: `is ${v}, expected ${expected}` });
  });
}

function checkMachAxis(issues: PolarIssue[], path: string, mach: readonly number[]): void {
  checkEach(issues, path, mach, (m) => m >= 0, 'a Mach number >= 0');
}

/**
 * Checks a polar: every table well formed (see engine/core/table1d.ts),
 * CD0 > 0 and CD0 + dCD0 > 0 at every node, K > 0, 0 < e <= 1, AR > 0,
 * Mach axes >= 0, CLmax and buffet CL > 0, Korn parameters in range
 * (sweep 0 to 70 deg, t/c 0 to 0.3, kappa_A 0.7 to 1.1). Returns every
 * issue found, each naming its field path.
 */
export function validatePolarSpec(spec: PolarSpec): Result<PolarSpec, PolarIssue[]> {
  const issues: PolarIssue[] = [];

  const cd0 = makeTable1d(spec.cd0.mach, spec.cd0.cd0, 'cd0');
  if (!cd0.ok) issues.push(tableIssue('cd0', { x: 'mach', y: 'cd0' }, cd0.error));
  checkMachAxis(issues, 'cd0.mach', spec.cd0.mach);
  checkEach(issues, 'cd0.cd0', spec.cd0.cd0, (v) => v > 0, 'a drag coefficient > 0');

  checkNumber(issues, 'cdIncrement', spec.cdIncrement, () => true, 'a finite number');
  if (Number.isFinite(spec.cdIncrement)) {
    spec.cd0.cd0.forEach((v, i) => {
      if (Number.isFinite(v) && v > 0 && v + spec.cdIncrement <= 0) {
        issues.push({
          path: 'cdIncrement',
          message: `is ${spec.cdIncrement}, which makes CD0 + dCD0 <= 0 at cd0.cd0[${i}] = ${v}`,
        });
      }
    });
  }

  const induced = spec.induced;
  if (induced.kind === 'oswald') {
    checkNumber(issues, 'induced.aspectRatio', induced.aspectRatio, (v) => v > 0, 'an aspect ratio > 0');
    checkNumber(issues, 'induced.oswaldEfficiency', induced.oswaldEfficiency, (v) => v > 0 && v <= 1, 'an Oswald efficiency in (0, 1]');
  } else if (induced.kind === 'table') {
    const k = makeTable1d(induced.mach, induced.k, 'induced');
    if (!k.ok) issues.push(tableIssue('induced', { x: 'mach', y: 'k' }, k.error));
    checkMachAxis(issues, 'induced.mach', induced.mach);
    checkEach(issues, 'induced.k', induced.k, (v) => v > 0, 'an induced-drag factor K > 0');
  } else {
    issues.push({ path: 'induced.kind', message: `is "${String((induced as { kind: unknown }).kind)}", expected "oswald" or "table"` });
  }

  checkNumber(issues, 'clMinDrag', spec.clMinDrag, (v) => Math.abs(v) < 2, 'a CL of minimum drag between -2 and 2');

  const comp = spec.compressibility;
  if (comp.kind === 'korn') {
    checkNumber(issues, 'compressibility.sweep_rad', comp.sweep_rad, (v) => v >= 0 && v <= (70 * Math.PI) / 180, 'a sweep from 0 to 70 deg (0 to 1.2217 rad)');
    checkNumber(issues, 'compressibility.thicknessRatio', comp.thicknessRatio, (v) => v > 0 && v <= 0.3, 'a thickness ratio in (0, 0.3]');
    checkNumber(issues, 'compressibility.kornTechnologyFactor', comp.kornTechnologyFactor, (v) => v >= 0.7 && v <= 1.1, 'a Korn technology factor from 0.7 to 1.1');
  } else if (comp.kind === 'table') {
    const t = makeTable2d(comp.mach, comp.cl, comp.cdWave, 'compressibility');
    if (!t.ok) issues.push(tableIssue('compressibility', { x: 'mach', y: 'cl', z: 'cdWave' }, t.error));
    checkMachAxis(issues, 'compressibility.mach', comp.mach);
    comp.cdWave.forEach((row, i) =>
      checkEach(issues, `compressibility.cdWave[${i}]`, row, (v) => v >= 0, 'a wave drag coefficient >= 0'),
    );
  } else if (comp.kind !== 'none') {
    issues.push({
      path: 'compressibility.kind',
      message: `is "${String((comp as { kind: unknown }).kind)}", expected "none", "korn" or "table"`,
    });
  }

  const buffet = makeTable1d(spec.buffetCl.mach, spec.buffetCl.cl, 'buffetCl');
  if (!buffet.ok) issues.push(tableIssue('buffetCl', { x: 'mach', y: 'cl' }, buffet.error));
  checkMachAxis(issues, 'buffetCl.mach', spec.buffetCl.mach);
  checkEach(issues, 'buffetCl.cl', spec.buffetCl.cl, (v) => v > 0, 'a buffet-onset CL > 0');

  const clMax = makeTable1d(spec.clMax.mach, spec.clMax.cl, 'clMax');
  if (!clMax.ok) issues.push(tableIssue('clMax', { x: 'mach', y: 'cl' }, clMax.error));
  checkMachAxis(issues, 'clMax.mach', spec.clMax.mach);
  checkEach(issues, 'clMax.cl', spec.clMax.cl, (v) => v > 0, 'a maximum CL > 0');

  return issues.length === 0 ? ok(spec) : err(issues);
}
