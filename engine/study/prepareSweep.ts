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
 *   solvable leg's distance) extrapolated linearly from the two neighbours
 *   before it when both converged. Only the start moves: each case's answer
 *   is its cold answer within the fuel iteration's band (FUEL_TOLERANCE_KG),
 *   whatever order the cases are flown in; a case that does not come out ok
 *   is flown again cold, so its row is the case's own.
 */
import type { Result } from '../core/result';
import type { MissionStart } from '../mission/missionTypes';
import { solveMission } from '../mission/solveMission';
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

/** Most converged solves kept for warm starts (a row's worth, twice, on the usual grids). */
const MAX_KEPT = 100_000;

/** The neighbour's converged start with its ramp mass (or distance) extrapolated through the neighbour before it. */
function extrapolated(a: MissionStart, b: MissionStart | undefined): MissionStart {
  if (b === undefined) return a;
  if (a.rampMass_kg !== undefined && b.rampMass_kg !== undefined) return { ...a, rampMass_kg: 2 * a.rampMass_kg - b.rampMass_kg };
  if (a.distance_m !== undefined && b.distance_m !== undefined) return { ...a, distance_m: 2 * a.distance_m - b.distance_m };
  return a;
}

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
  const reach = Math.min(MAX_KEPT, 2 * Math.max(1, ...strides.filter((_, i) => sizes[i]! > 1)) + 2);

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

  const flown = new Map<number, MissionStart>();
  function neighbourStart(k: number, indices: readonly number[]): MissionStart | undefined {
    for (let i = axes.length - 1; i >= 0; i--) {
      if (indices[i]! < 1) continue;
      const near = flown.get(k - strides[i]!);
      if (near === undefined) continue;
      return extrapolated(near, indices[i]! >= 2 ? flown.get(k - 2 * strides[i]!) : undefined);
    }
    return undefined;
  }
  function keep(k: number, f: MissionStart): void {
    flown.set(k, f);
    if (flown.size > 2 * reach + 64) {
      for (const key of flown.keys()) if (Math.abs(key - k) > reach) flown.delete(key);
    }
  }

  let passes = 0;
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
      const start = warm ? neighbourStart(k, indices) : undefined;
      let r = solveMission(input.value, start === undefined ? {} : { warmStart: start });
      passes += r.iterations;
      // A case that does not come out ok is flown again cold: its status and message (which name the failing pass's
      // figures) are then those of the case flown alone, and a start that led the iteration astray costs nothing else.
      if (start !== undefined && r.status !== 'ok') {
        r = solveMission(input.value);
        passes += r.iterations;
      }
      if (warm && r.status === 'ok' && r.warmStart !== undefined) keep(k, r.warmStart);
      return sweepRowOf(k, inputs, r);
    },
  };
}
