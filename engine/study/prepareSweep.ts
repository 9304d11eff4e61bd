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
 *   neighbours' (neighbourStart): the demo's grids then need 1.0 to 1.7
 *   fuel passes a case instead of 4 cold (2 from the neighbour's start
 *   alone). Only the start moves: each case's answer is its cold answer
 *   within the fuel iteration's band (FUEL_TOLERANCE_KG), whatever order the
 *   cases are flown in; a case that does not come out ok is flown again
 *   cold, so its row is the case's own.
 */
import type { Result } from '../core/result';
import { FUEL_TOLERANCE_KG } from '../mission/fuelIteration';
import type { MissionStart } from '../mission/missionTypes';
import { solveMission, type SolveOptions } from '../mission/solveMission';
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

/** A sweep's solves: its rows read the figures, cautions and status, never the time history. */
const LEAN: SolveOptions = { timeHistory: false };

/** Most converged solves kept for warm starts (a row's worth, twice, on the usual grids). */
const MAX_KEPT = 100_000;

/** A converged case kept for its neighbours' starts. */
interface Flown {
  readonly start: MissionStart;
  /**
   * Where the fuel iteration's root lies: the converged ramp mass (or solvable-leg distance) moved by the converged
   * residual's offset from the middle of the band over the secant slope. The converged values themselves scatter
   * across the band's width; these roots lie on a smooth curve, so extrapolating them lands a first pass in the band.
   */
  readonly root: number;
}

function flownOf(start: MissionStart, residual_kg: number): Flown | null {
  const x = start.rampMass_kg ?? start.distance_m;
  if (x === undefined || !Number.isFinite(x)) return null;
  const slope = start.slope;
  const shift = slope !== undefined && Number.isFinite(slope) && Math.abs(slope) > 0 ? (residual_kg - FUEL_TOLERANCE_KG / 2) / slope : 0;
  return { start, root: Number.isFinite(shift) ? x - shift : x };
}

/**
 * The start of a case predicted from flown neighbours with weights (summing to 1; the first is the nearest): the
 * nearest one's start with the weighted sum of the roots as its ramp mass (or distance), and, as the top of descent
 * moves with the case too (another range, drag or cruise speed), the weighted sum of their tops of descent (the mass
 * at the solvable leg's end and the distance after it) as the point of its top-of-descent model.
 */
function predictedStart(terms: readonly (readonly [Flown, number])[]): MissionStart {
  const s = terms[0]![0].start;
  let root = 0;
  let mass_kg = 0;
  let distance_m = 0;
  for (const [f, w] of terms) {
    root += w * f.root;
    const after = f.start.afterSolvable;
    mass_kg += w * (after?.mass_kg ?? Number.NaN);
    distance_m += w * (after?.distance_m ?? Number.NaN);
  }
  const afterSolvable = s.afterSolvable !== undefined && Number.isFinite(mass_kg) && Number.isFinite(distance_m) ? { ...s.afterSolvable, mass_kg, distance_m } : s.afterSolvable;
  if (s.rampMass_kg !== undefined) return { ...s, rampMass_kg: root, ...(afterSolvable === undefined ? {} : { afterSolvable }) };
  if (s.distance_m !== undefined) return { ...s, distance_m: root };
  return s;
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

  const flown = new Map<number, Flown>();
  /**
   * The start of case `k`, from the cases flown in this thread: along the fastest axis with a neighbour flown, the
   * quadratic (or line, or constant) through the up to three cases before it, plus that polynomial's miss at the case
   * one step back along the next axis (the row before) when those were flown too. On the demo's grids the first pass
   * then lands within a few grams of the converged ramp mass and a metre or two of its top of descent.
   */
  function neighbourStart(k: number, indices: readonly number[]): MissionStart | undefined {
    for (let f = axes.length - 1; f >= 0; f--) {
      if (indices[f]! < 1) continue;
      const sf = strides[f]!;
      if (flown.get(k - sf) === undefined) continue;
      // The polynomial along axis f through the cases before k: offsets (in steps) and weights.
      const order = indices[f]! >= 3 && flown.has(k - 2 * sf) && flown.has(k - 3 * sf) ? 3 : indices[f]! >= 2 && flown.has(k - 2 * sf) ? 2 : 1;
      const poly: (readonly [number, number])[] = order === 3 ? [[1, 3], [2, -3], [3, 1]] : order === 2 ? [[1, 2], [2, -1]] : [[1, 1]];
      const terms: [Flown, number][] = poly.map(([o, w]) => [flown.get(k - o * sf)!, w]);
      // Plus the same polynomial's miss one step back along the next axis (the row before), when that row was flown here.
      for (let g = f - 1; g >= 0; g--) {
        if (indices[g]! < 1) continue;
        const sg = strides[g]!;
        if (flown.has(k - sg) && poly.every(([o]) => flown.has(k - sg - o * sf))) {
          terms.push([flown.get(k - sg)!, 1]);
          for (const [o, w] of poly) terms.push([flown.get(k - sg - o * sf)!, -w]);
        }
        break;
      }
      return predictedStart(terms);
    }
    return undefined;
  }
  function keep(k: number, f: Flown): void {
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
      // A row reads no time history: none is kept (every figure it reads is the same bit for bit without).
      let r = solveMission(input.value, start === undefined ? LEAN : { ...LEAN, warmStart: start });
      passes += r.iterations;
      // A case that does not come out ok is flown again cold: its status and message (which name the failing pass's
      // figures) are then those of the case flown alone, and a start that led the iteration astray costs nothing else.
      if (start !== undefined && r.status !== 'ok') {
        r = solveMission(input.value, LEAN);
        passes += r.iterations;
      }
      const kept = warm && r.status === 'ok' && r.warmStart !== undefined ? flownOf(r.warmStart, r.residual_kg) : null;
      if (kept !== null) keep(k, kept);
      return sweepRowOf(k, inputs, r);
    },
  };
}
