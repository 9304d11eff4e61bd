/**
 * A parameter study's cases flown one after another in one thread (a sweep
 * worker of `blockwise sweep`): what the cases share is done once, and each
 * case's fuel iteration starts from its neighbour's.
 *
 * - The base project is parsed once. A varied field whose schema reads its
 *   value alone (engine/project/projectFieldSchema.ts) has each of its values
 *   read once; a case's project is then the base project with those values
 *   set in, checked by the same cross-field rules (checkProject). A case
 *   whose value is refused or whose cross-field check finds an issue, and
 *   every case of a field that cannot be read alone, is parsed from its whole
 *   document as flySweepCase does, so its status (invalid_input) and message
 *   are the same as there.
 * - The deck is built once per `engine` block, the polar, the installed
 *   propulsion and the legs once per set of fields they are built from
 *   (MissionInputMemo); the polar's and inlets' own checks once per object
 *   (ProjectCheckMemo).
 * - Warm start: each case starts from the converged solve of its neighbour
 *   along the fastest-varying axis flown in this thread (the previous case),
 *   or along the next axis at the start of a row, its ramp mass (or the
 *   solvable leg's distance) and its top of descent predicted from the
 *   neighbours' (neighbourStart) by the warm start the analyses use too
 *   (engine/analysis/warmStart.ts, warmStartFor and solveFrom): the demo's
 *   grids then need 1.0 to 1.7 fuel passes a case instead of 4 cold (2 from
 *   the neighbour's start alone). Only the start moves: each case's answer
 *   is its cold answer within the fuel iteration's band (FUEL_TOLERANCE_KG),
 *   whatever order the cases are flown in; a case that does not come out ok
 *   is flown again cold (solveFrom), so its row is the case's own.
 * - A grid that varies mission.solve alone (payload, range, take-off
 *   weight) shares one pass memo along its cases (SolveOptions.passMemo):
 *   the alternate's trial descents are read from the descents of the cases
 *   before (about a tenth of a demo case's time), each figure within 1e-9
 *   relative of the case's own memo's.
 */
import { iterationRoot, solveFrom, type Blend, type FlownMission, type NeighbourStart, type SolveFromOptions } from '../analysis/warmStart';
import type { Result } from '../core/result';
import { createPassMemo, type PassMemo } from '../mission/passMemo';
import { missionInputOnDeck, type MissionInputMemo, type ProjectResources } from '../project/buildMissionInput';
import { parseProjectData } from '../project/parseProject';
import { checkProject, createProjectCheckMemo } from '../project/projectChecks';
import { projectDeck } from '../project/projectDeck';
import { fieldReaderAt } from '../project/projectFieldSchema';
import { withFieldAt } from '../project/projectFieldPath';
import { valueAtPath, type ProjectIssue } from '../project/projectIssue';
import { CURRENT_VERSION, type Project } from '../project/projectSchema';
import { invalidSweepRow, sweepRowOf, type SweepRow } from '../project/sweepCase';
import { caseDocument, type SweepAxis } from '../project/sweepGrid';
import type { EngineDeck } from '../propulsion/engineDeck';

export interface SweepStudyOptions {
  /** Start each case's fuel iteration from its neighbours' (default true); false flies every case cold, as flySweepCase. */
  readonly warmStart?: boolean;
}

/** The cases of one study, flown in any order (each row is the same, within the fuel band, whatever the order). */
export interface SweepStudy {
  /** Flies case `k` (0-based) of the grid. */
  fly(k: number): SweepRow;
  /** Fuel passes flown so far, over every case (a cold retry's included). */
  passes(): number;
}

/** Most flights a shared pass memo holds before a fresh one is started (the demo adds one or two a case). */
const MAX_SHARED_FLIGHTS = 64;

/** Most converged solves kept for warm starts (a row's worth, twice, on the usual grids). */
const MAX_KEPT = 100_000;

/**
 * The study of the grid `axes` over the project document `doc` (the parsed
 * JSON before the schema) with `resources` (the deck file, read once by the
 * caller), flying `inletName` (default the active inlet).
 */
export function prepareSweep(
  doc: unknown,
  axes: readonly SweepAxis[],
  resources: ProjectResources,
  inletName?: string,
  options: SweepStudyOptions = {},
): SweepStudy {
  const warm = options.warmStart !== false;
  const sizes = axes.map((a) => a.values.length);
  const strides = sizes.map((_, i) => sizes.slice(i + 1).reduce((n, s) => n * s, 1));
  const reach = Math.min(MAX_KEPT, 3 * Math.max(1, ...strides.filter((_, i) => sizes[i]! > 1)) + 2);

  // Fields read alone: a reader per axis and each value's reading, made on first use.
  const base = parseProjectData(doc);
  const current = base.ok && (doc as { version?: unknown }).version === CURRENT_VERSION;
  const readers = axes.map((a) => {
    if (!current) return null;
    const reader = fieldReaderAt(doc, a.path);
    if (reader === null) return null;
    // The reader must give the base project's own value for the base document's (the paths agree).
    const own = reader(valueAtPath(doc, a.path));
    return own.ok && Object.is(own.value, valueAtPath(base.value, a.path)) ? reader : null;
  });
  const alone = base.ok && readers.every((r) => r !== null);
  const readings = axes.map((a) => new Array<Result<unknown, unknown> | undefined>(a.values.length));
  const checks = createProjectCheckMemo();

  function caseProject(indices: readonly number[], inputs: readonly (number | string)[]): Result<Project, readonly ProjectIssue[]> {
    if (alone && base.ok) {
      let project: unknown = base.value;
      let refused = false;
      for (let i = 0; i < axes.length && !refused; i++) {
        const j = indices[i]!;
        const reading = (readings[i]![j] ??= readers[i]!(inputs[i]));
        if (reading.ok) project = withFieldAt(project, axes[i]!.path, reading.value);
        else refused = true;
      }
      // A refused value or a cross-field issue: the whole document's parse says what and where.
      if (!refused && checkProject(project as Project, doc, checks).length === 0) return { ok: true, value: project as Project };
    }
    return parseProjectData(caseDocument(doc, axes, inputs));
  }

  let deckEngine: unknown = null;
  let deck: Result<EngineDeck, readonly ProjectIssue[]> | null = null;
  const memo: MissionInputMemo = {};
  const buildOptions = inletName === undefined ? {} : { inletName };

  const flown = new Map<number, FlownMission>();
  /**
   * The start of case `k`, from the cases flown in this thread: along the fastest axis with a neighbour flown, the
   * quadratic (or line, or constant) through the up to three cases before it, plus that polynomial's miss at the case
   * one step back along the next axis (the row before) when those were flown too; the blend is of the cases' iteration
   * roots and tops of descent (engine/analysis/warmStart.ts warmStartFor), from the case just before. On the demo's
   * grids the first pass then lands within a few grams of the converged ramp mass and a metre or two of its top of
   * descent.
   */
  function neighbourStart(k: number, indices: readonly number[]): NeighbourStart | undefined {
    for (let f = axes.length - 1; f >= 0; f--) {
      if (indices[f]! < 1) continue;
      const sf = strides[f]!;
      const from = flown.get(k - sf);
      if (from === undefined) continue;
      // The polynomial along axis f through the cases before k: offsets (in steps) and weights.
      const order = indices[f]! >= 3 && flown.has(k - 2 * sf) && flown.has(k - 3 * sf) ? 3 : indices[f]! >= 2 && flown.has(k - 2 * sf) ? 2 : 1;
      const poly: (readonly [number, number])[] = order === 3 ? [[1, 3], [2, -3], [3, 1]] : order === 2 ? [[1, 2], [2, -1]] : [[1, 1]];
      const blend: Blend[] = poly.map(([o, weight]) => ({ weight, result: flown.get(k - o * sf)! }));
      // Plus the same polynomial's miss one step back along the next axis (the row before), when that row was flown here.
      for (let g = f - 1; g >= 0; g--) {
        if (indices[g]! < 1) continue;
        const sg = strides[g]!;
        if (flown.has(k - sg) && poly.every(([o]) => flown.has(k - sg - o * sf))) {
          blend.push({ weight: 1, result: flown.get(k - sg)! });
          for (const [o, weight] of poly) blend.push({ weight: -weight, result: flown.get(k - sg - o * sf)! });
        }
        break;
      }
      return { from, blend };
    }
    return undefined;
  }
  function keep(k: number, f: FlownMission): void {
    flown.set(k, f);
    if (flown.size > 2 * reach + 64) {
      for (const key of flown.keys()) if (Math.abs(key - k) > reach) flown.delete(key);
    }
  }

  // Cases that differ in mission.solve alone (payload, range, take-off weight, mode) fly the same aircraft, legs,
  // reserves and air: their alternate descent and contingency hold depend on the mass alone, so the cases share one
  // pass memo (engine/mission/passMemo.ts) as the passes of one solve do, the trial descents read from the flights of
  // the cases before. Started afresh once it holds MAX_SHARED_FLIGHTS flights (its look-ups scan it).
  const shareFlights = warm && axes.every((a) => a.path[0] === 'mission' && a.path[1] === 'solve');
  let shared: PassMemo | null = null;
  const passMemo = (): PassMemo | undefined => {
    if (!shareFlights) return undefined;
    if (shared === null || shared.alternateDescent.size + shared.contingencyHold.size > MAX_SHARED_FLIGHTS) shared = createPassMemo();
    return shared;
  };

  let passes = 0;
  // A row reads no time history, so none is kept (every figure it reads is the same bit for bit without one);
  // the passes of every solve flown are counted, a cold retry's included.
  const solveOptions: SolveFromOptions = { timeHistory: false, onPasses: (n) => (passes += n) };
  return {
    passes: () => passes,
    fly(k: number): SweepRow {
      const indices = new Array<number>(axes.length);
      const inputs = new Array<number | string>(axes.length);
      let rest = k;
      for (let i = axes.length - 1; i >= 0; i--) {
        const j = rest % sizes[i]!;
        indices[i] = j;
        inputs[i] = axes[i]!.values[j]!;
        rest = Math.floor(rest / sizes[i]!);
      }
      const project = caseProject(indices, inputs);
      if (!project.ok) return invalidSweepRow(k, inputs, project.error);
      if (deck === null || project.value.engine !== deckEngine) {
        deckEngine = project.value.engine;
        deck = projectDeck(project.value, resources);
      }
      if (!deck.ok) return invalidSweepRow(k, inputs, deck.error);
      const input = missionInputOnDeck(project.value, deck.value, buildOptions, memo);
      if (!input.ok) return invalidSweepRow(k, inputs, input.error);
      const r = solveFrom(input.value, warm ? neighbourStart(k, indices) : undefined, { ...solveOptions, passMemo: passMemo() });
      // Kept for its neighbours: its start and residual only (what a prediction reads), when it converged ok.
      if (warm && r.status === 'ok' && r.warmStart !== undefined && iterationRoot(r) !== undefined) keep(k, { warmStart: r.warmStart, residual_kg: r.residual_kg });
      return sweepRowOf(k, inputs, r);
    },
  };
}
