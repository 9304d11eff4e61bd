/**
 * Inlet total-pressure recovery of a 'recoveryTable' inlet design against
 * flight Mach (geometry inlets: inletFlow.ts). The deck's reference
 * recovery is `referenceRecoveryAt` in engineDeck.ts.
 */
import { err, ok, type Result } from '../core/result';
import { interp1d, makeTable1d, type Table1d } from '../core/table1d';
import { validateInletDesign, type InletDesign, type InletDesignIssue } from './inletDesign';

/** An inlet design checked once, with its recovery table built. */
export interface PreparedInlet {
  readonly design: InletDesign;
  /** Recovery against flight Mach for 'recoveryTable' designs, else null. */
  readonly table: Table1d | null;
}

/** Checks a design and builds its recovery table; the issues carry field paths. */
export function prepareInlet(design: InletDesign): Result<PreparedInlet, readonly InletDesignIssue[]> {
  const issues = validateInletDesign(design);
  if (issues.length > 0) return err(issues);
  if (design.source.kind === 'geometry') return ok({ design, table: null });
  const table = makeTable1d(design.source.mach, design.source.recovery, `${design.name} recovery`);
  if (!table.ok) return err([{ path: `source.${table.error.field === 'x' ? 'mach' : 'recovery'}`, message: table.error.message }]);
  return ok({ design, table: table.value });
}

export interface TableRecovery {
  /** Recovery pt2/pt0 (-). */
  readonly recovery: number;
  /** The Mach left the table: the end value was held. */
  readonly outside: 'below' | 'above' | null;
}

/**
 * Recovery of a 'recoveryTable' inlet at flight Mach `mach` (>= 0): linear
 * interpolation; outside the table the end value is held and `outside`
 * says so (the caller raises the caution).
 */
export function tableRecovery(table: Table1d, mach: number): TableRecovery {
  const r = interp1d(table, mach, 'clamp');
  if (!r.ok) throw new RangeError(`tableRecovery: ${r.error.message}`);
  return { recovery: r.value.value, outside: r.value.outside };
}
