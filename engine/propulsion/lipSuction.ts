/**
 * Lip suction: the part of an inlet's additive (pre-entry) drag that the
 * cowl lip recovers as suction when the inlet spills. Bookkeeping after
 * Nicolai & Carichner, Fundamentals of Aircraft and Airship Design, vol. 1
 * (AIAA 2010), inlet drag: the spillage drag charged to the propulsion
 * system is D_spill = K_add D_add, with the additive-drag correction factor
 * K_add read from curves over the mass-flow ratio A0/Ac, one per flight Mach
 * (recalled from memory; not digitised here). Blockwise states the same
 * relation as the recovered fraction, lip suction = 1 - K_add, given as a
 * constant or as a table over flight Mach and mass-flow ratio (bilinear,
 * held at its edges with the caution `lip_suction_table_range`).
 */
import { err, ok, type Result } from '../core/result';
import { bisectAxis, lerp } from '../core/table1d';
import { makeTable2d, type Table2d } from '../core/table2d';

export type LipSuction =
  /** One recovered fraction (-), 0..1, at every Mach and mass-flow ratio. */
  | { readonly kind: 'constant'; readonly factor: number }
  /** factor[i][j] (-), 0..1, at flight Mach mach[i] and mass-flow ratio A0/Ac massFlowRatio[j]. */
  | { readonly kind: 'table'; readonly mach: readonly number[]; readonly massFlowRatio: readonly number[]; readonly factor: readonly (readonly number[])[] };

/**
 * Default lip suction of a rounded subsonic pitot lip (-), over flight Mach
 * 0 to 1 and mass-flow ratio 0.3 to 1. Its shape follows the published trend
 * of the additive-drag correction for a well-rounded subsonic lip (Nicolai &
 * Carichner's K_add curves, and Seddon & Goldsmith, Intake Aerodynamics,
 * 2nd ed., ch. 3, on cowl-lip suction; both from memory): close to full
 * suction near A0/Ac = 1 (0.98 to 1.0 below Mach 0.8), falling as the inlet
 * spills more (the lip flow separates) and as the flight Mach nears 1 (the
 * suction peak turns supersonic and shocks). The numbers are rounded values
 * of that trend, not a digitised chart: replace them with data for a real lip.
 */
export const ROUNDED_PITOT_LIP_SUCTION: LipSuction = {
  kind: 'table',
  mach: [0, 0.6, 0.8, 0.9, 1.0],
  massFlowRatio: [0.3, 0.5, 0.7, 0.85, 1.0],
  factor: [
    [0.55, 0.75, 0.9, 0.97, 1.0],
    [0.5, 0.7, 0.88, 0.96, 1.0],
    [0.4, 0.6, 0.8, 0.92, 0.98],
    [0.3, 0.5, 0.7, 0.85, 0.95],
    [0.1, 0.2, 0.35, 0.5, 0.6],
  ],
};

export const ROUNDED_PITOT_LIP_SOURCE =
  "Rounded subsonic pitot lip: near-full suction at mass-flow ratio 1, less as the inlet spills more and as Mach nears 1 (the trend of Nicolai & Carichner's additive-drag correction curves and Seddon & Goldsmith, recalled from memory; rounded, not digitised)";

/** A lip suction ready for lookups. */
export interface PreparedLipSuction {
  readonly spec: LipSuction;
  /** Recovered fraction (-) at flight Mach and mass-flow ratio; `outside` true when the table was left (edge held). */
  at(mach: number, massFlowRatio: number): { readonly factor: number; readonly outside: boolean };
  /** As `at`, into `out` (no allocation: the installed model's hot path). */
  atInto(mach: number, massFlowRatio: number, out: LipSuctionValue): void;
}

/** A writable lip-suction answer (scratch). */
export interface LipSuctionValue {
  factor: number;
  outside: boolean;
}

/** One problem with a lip-suction spec: a path below the inlet's `lipSuction` and a message. */
export interface LipSuctionIssue {
  readonly path: string;
  readonly message: string;
}

/** Checks a lip-suction spec (fractions 0..1, table axes strictly increasing, sizes agreeing) and builds its table. */
export function prepareLipSuction(spec: LipSuction): Result<PreparedLipSuction, readonly LipSuctionIssue[]> {
  if (spec.kind === 'constant') {
    if (!(spec.factor >= 0 && spec.factor <= 1)) return err([{ path: 'factor', message: `lip suction ${spec.factor} is not a fraction 0..1` }]);
    const value = { factor: spec.factor, outside: false };
    return ok({
      spec,
      at: () => value,
      atInto: (_mach, _massFlowRatio, out) => {
        out.factor = spec.factor;
        out.outside = false;
      },
    });
  }
  const issues: LipSuctionIssue[] = [];
  spec.factor.forEach((row, i) =>
    row.forEach((f, j) => {
      if (!(f >= 0 && f <= 1)) issues.push({ path: `factor[${i}][${j}]`, message: `lip suction ${f} at Mach ${spec.mach[i]}, mass-flow ratio ${spec.massFlowRatio[j]} is not a fraction 0..1` });
    }),
  );
  if (issues.length > 0) return err(issues);
  const built = makeTable2d(spec.mach, spec.massFlowRatio, spec.factor, 'lip suction');
  if (!built.ok) {
    const path = built.error.field === 'x' ? 'mach' : built.error.field === 'y' ? 'massFlowRatio' : 'factor';
    return err([{ path, message: built.error.message }]);
  }
  const table: Table2d = built.value;
  return ok({
    spec,
    at(mach, massFlowRatio) {
      const out = { factor: 0, outside: false };
      bilinearClampInto(table, mach, massFlowRatio, out);
      return out;
    },
    atInto: (mach, massFlowRatio, out) => bilinearClampInto(table, mach, massFlowRatio, out),
  });
}

// Position along one axis of the last axisPosition call (module-level: no allocation).
let positionIndex = 0;
let positionT = 0;
let positionOutside = false;

/** interp2d's axis weight under 'clamp' (core/table2d.ts), into the position above. */
function axisPosition(axis: readonly number[], q: number): void {
  const n = axis.length;
  positionOutside = false;
  if (n === 1) {
    positionIndex = 0;
    positionT = 0;
    return;
  }
  if (q < axis[0]!) {
    positionIndex = 0;
    positionT = 0;
    positionOutside = true;
    return;
  }
  if (q > axis[n - 1]!) {
    positionIndex = n - 2;
    positionT = 1;
    positionOutside = true;
    return;
  }
  const lo = bisectAxis(axis, q);
  positionIndex = lo;
  positionT = (q - axis[lo]!) / (axis[lo + 1]! - axis[lo]!);
}

/**
 * interp2d(table, x, y, 'clamp') written out without its records: the same
 * bilinear value (lerp of lerps, core/table1d.ts) and the same answer for a
 * query it refuses (a non-finite coordinate or value: factor 0, outside).
 */
function bilinearClampInto(table: Table2d, x: number, y: number, out: LipSuctionValue): void {
  if (!Number.isFinite(x) || !Number.isFinite(y)) {
    out.factor = 0;
    out.outside = true;
    return;
  }
  axisPosition(table.x, x);
  const i = positionIndex;
  const tx = positionT;
  const outsideX = positionOutside;
  axisPosition(table.y, y);
  const j = positionIndex;
  const ty = positionT;
  const i1 = table.x.length === 1 ? 0 : i + 1;
  const j1 = table.y.length === 1 ? 0 : j + 1;
  const z = table.z;
  const value = lerp(lerp(z[i]![j]!, z[i]![j1]!, ty), lerp(z[i1]![j]!, z[i1]![j1]!, ty), tx);
  if (!Number.isFinite(value)) {
    out.factor = 0;
    out.outside = true;
    return;
  }
  out.factor = value;
  out.outside = outsideX || positionOutside;
}
