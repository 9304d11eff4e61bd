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
import { interp2d, makeTable2d, type Table2d } from '../core/table2d';

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
    return ok({ spec, at: () => value });
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
      const r = interp2d(table, mach, massFlowRatio, 'clamp');
      if (!r.ok) return { factor: 0, outside: true };
      return { factor: r.value.value, outside: r.value.outsideX !== null || r.value.outsideY !== null };
    },
  });
}
