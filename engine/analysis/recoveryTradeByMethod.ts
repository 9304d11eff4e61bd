/**
 * The +1 % recovery trade factor computed by each recovery method side by
 * side: the check of Raymer's rule against the deck's own sensitivities and
 * against the cycle. Each method's mission input is built by the caller
 * (engine/project/recoveryMethodVariants.ts); recovery is raised through the
 * installation itself (the propulsion model's withRecoveryOffset: engine
 * airflow, spillage and bleed fraction follow), by central differences at
 * steps of 1 and 1/2 point of recovery, on the design mission (payload and
 * range; another solve mode is flown once to fix them).
 */
import { err, ok, type Result } from '../core/result';
import type { MissionInput } from '../mission/missionTypes';
import { solveMission } from '../mission/solveMission';
import type { AnalysisError, MissionSolver } from './analysisTypes';

export interface RecoveryMethodCase {
  readonly id: string;
  readonly label: string;
  /** The mission input flown with this method, or why the method does not apply (e.g. the deck has no sensitivities). */
  readonly input: MissionInput | { readonly unavailable: string };
}

export interface RecoveryTradeRow {
  readonly id: string;
  readonly label: string;
  /** d(block fuel) per +1 % recovery (+0.01) with a step of 0.01 (kg); null when unavailable or a mission failed. */
  readonly blockFuelPerPercent_kg: number | null;
  /** The same with a step of 0.005 (kg). */
  readonly halfStep_kg: number | null;
  readonly converged: boolean;
  /** Baseline block fuel with this method (kg); methods differ by how they treat the inlet's own shortfall too. */
  readonly baselineBlockFuel_kg: number | null;
  /** Why a value is missing or the steps disagree; null otherwise. */
  readonly note: string | null;
}

export interface RecoveryTradeByMethod {
  readonly rows: readonly RecoveryTradeRow[];
  /** Each row relative to the first available (Raymer's) row (-), null where either is missing. */
  readonly relativeToFirst: readonly (number | null)[];
  readonly missions: number;
  readonly description: string;
}

export const RECOVERY_TRADE_DESCRIPTION =
  "+1 % recovery (+0.01 on the inlet's recovery at every Mach) carried through the installation by each method, central differences at steps of 0.01 and 0.005 on the design mission; agreement within 5 % + 0.01 kg counts as converged.";

/** The trade factor of each case; unavailable cases get a row saying why. */
export function recoveryTradeByMethod(
  cases: readonly RecoveryMethodCase[],
  options: { readonly solve?: MissionSolver; readonly onProgress?: (done: number, total: number) => void; readonly shouldCancel?: () => boolean } = {},
): Result<RecoveryTradeByMethod, AnalysisError> {
  const solve: MissionSolver = options.solve ?? ((m) => solveMission(m));
  const flyable = cases.filter((c) => !('unavailable' in c.input)).length;
  const total = flyable * 6;
  let done = 0;
  const rows: RecoveryTradeRow[] = [];
  for (const c of cases) {
    if ('unavailable' in c.input) {
      rows.push({ id: c.id, label: c.label, blockFuelPerPercent_kg: null, halfStep_kg: null, converged: false, baselineBlockFuel_kg: null, note: c.input.unavailable });
      continue;
    }
    const base: MissionInput = c.input;
    const fly = (m: MissionInput): number | string => {
      const r = solve(m);
      done++;
      options.onProgress?.(done, total);
      return r.status === 'ok' ? r.blockFuel_kg : `${r.status}: ${r.statusMessage}`;
    };
    if (options.shouldCancel?.()) return err({ code: 'cancelled', message: `recovery trade cancelled after ${done} of ${total} missions` });
    let design = base;
    const first = solve(base);
    done++;
    if (first.status !== 'ok') {
      rows.push({ id: c.id, label: c.label, blockFuelPerPercent_kg: null, halfStep_kg: null, converged: false, baselineBlockFuel_kg: null, note: `the design mission failed: ${first.status}: ${first.statusMessage}` });
      continue;
    }
    if (base.solve.kind !== 'payloadRange') design = { ...base, solve: { kind: 'payloadRange', payload_kg: first.payload_kg, range_m: first.airDistance_m } };
    const offset = design.propulsion.withRecoveryOffset;
    if (offset === undefined) {
      rows.push({ id: c.id, label: c.label, blockFuelPerPercent_kg: null, halfStep_kg: null, converged: false, baselineBlockFuel_kg: first.blockFuel_kg, note: 'this propulsion model cannot raise its recovery' });
      continue;
    }
    const values = [0.01, -0.01, 0.005, -0.005].map((d) => {
      if (options.shouldCancel?.()) return 'cancelled';
      return fly({ ...design, propulsion: offset.call(design.propulsion, d) });
    });
    if (values.includes('cancelled')) return err({ code: 'cancelled', message: `recovery trade cancelled after ${done} of ${total} missions` });
    const failed = values.find((v) => typeof v === 'string');
    const [p1, m1, p2, m2] = values as number[];
    const full = typeof failed === 'string' ? null : (p1! - m1!) / 2;
    const half = typeof failed === 'string' ? null : p2! - m2!;
    const converged = full !== null && half !== null && Math.abs(full - half) <= 0.05 * Math.abs(half) + 0.01;
    rows.push({
      id: c.id,
      label: c.label,
      blockFuelPerPercent_kg: full,
      halfStep_kg: half,
      converged,
      baselineBlockFuel_kg: first.blockFuel_kg,
      note: typeof failed === 'string' ? `a perturbed mission failed: ${failed}` : converged ? null : 'the steps of 0.01 and 0.005 disagree by more than 5 %: block fuel is not smooth here',
    });
  }
  const reference = rows.find((r) => r.blockFuelPerPercent_kg !== null)?.blockFuelPerPercent_kg ?? null;
  return ok({
    rows,
    relativeToFirst: rows.map((r) => (r.blockFuelPerPercent_kg === null || reference === null || reference === 0 ? null : r.blockFuelPerPercent_kg / reference - 1)),
    missions: done,
    description: RECOVERY_TRADE_DESCRIPTION,
  });
}
