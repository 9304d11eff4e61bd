/**
 * The engine view of a cycle (runs in the worker): the cycle's inputs, one
 * matched point with its station table, and net thrust and TSFC against Mach
 * at several altitudes for a rating and for a fixed fan speed, uninstalled
 * and installed (per engine).
 *
 * Installed here means the cycle run at the installation the project puts
 * on it: the inlet recovery of the active inlet at that flight condition
 * (the installed model of engine/propulsion on the project's deck, which is
 * generated from this cycle), the project's customer bleed and shaft power
 * extraction, and the inlet's spillage drag from the same installed point
 * taken off the net thrust. A cycle opened without a project has no
 * installation: its installed curves are null.
 */
import { designEngine, parseCycleFile, runCyclePoint, type CycleEngine, type CyclePointRequest, type CyclePointResult, type CycleThrottle, type CycleWarmStart } from '../../engine/cycle';
import { err, ok, type Result } from '../../engine/core';
import type { PropulsionModel, RatingName } from '../../engine/propulsion';
import type { Project } from '../../engine/project';
import type { CycleCurveSet, CycleViewQuery, CycleViewReply, CyclePointView, EngineFailure } from './engineProtocol';
import { PLOT_MACHS } from './studyCurves';
import { FOOT_M } from '../../engine/units';

const FT = FOOT_M;
/** Altitudes of the cycle's Mach curves: sea level, 15,000, 30,000 and 40,000 ft (ISA). */
export const CYCLE_CURVE_ALTITUDES_M: readonly number[] = [0, 15000 * FT, 30000 * FT, 40000 * FT];

/** The text's designed engine, kept for the last text (a point edit does not redesign it). */
let lastEngine: { readonly text: string; readonly engine: Result<CycleEngine, EngineFailure> } | null = null;

export function cycleEngineOf(text: string, name: string): Result<CycleEngine, EngineFailure> {
  if (lastEngine?.text === text) return lastEngine.engine;
  const spec = parseCycleFile(text, name);
  let engine: Result<CycleEngine, EngineFailure>;
  if (!spec.ok) {
    engine = err({ kind: 'analysis', code: 'cycle_file', message: `${name}: ${spec.error.length} problem(s) in the cycle file: ${spec.error.map((i) => i.message).join('; ')}` });
  } else {
    const d = designEngine(spec.value);
    engine = d.ok ? ok(d.value) : err({ kind: 'analysis', code: 'cycle_design', message: `${name}: the cycle cannot be designed: ${d.error.message}` });
  }
  lastEngine = { text, engine };
  return engine;
}

/** A point result without its solver state (the reply stays small). */
export function pointView(r: CyclePointResult): CyclePointView {
  const { state: _state, start: _start, ...rest } = r;
  void _state;
  void _start;
  return rest;
}

/** The installation the project puts on one engine at a flight condition, from its installed model. */
export interface CycleInstallation {
  readonly recovery: number;
  readonly bleedFraction: number;
  readonly powerExtraction_W: number;
  readonly spillageDrag_N: number;
}

export type InstallationAt = (altitude_m: number, mach: number, rating: RatingName) => CycleInstallation | null;

/** The project's installation at a condition: the active inlet's recovery and spillage drag (per engine) at `rating`. */
export function projectInstallation(project: Project, propulsion: PropulsionModel, engine: CycleEngine): InstallationAt {
  const inst = project.engine.installation;
  const bpr = engine.spec.design.bypassRatio;
  return (altitude_m, mach, rating) => {
    try {
      const p = propulsion.atRating({ altitude_m, mach, isaDev_K: 0 }, rating);
      const e = p.perEngine;
      let bleedFraction: number;
      if (inst.bleed.kind === 'coreFraction') bleedFraction = inst.bleed.fraction;
      else if (e.airflow_kg_s !== null && e.airflow_kg_s > 0) bleedFraction = inst.bleed.massFlow / (e.airflow_kg_s / (1 + bpr));
      else return null;
      if (![e.recovery, e.spillageDrag_N, bleedFraction].every(Number.isFinite)) return null;
      return { recovery: e.recovery, bleedFraction, powerExtraction_W: inst.powerExtraction, spillageDrag_N: e.spillageDrag_N };
    } catch {
      return null;
    }
  };
}

function finite(x: number | null): number | null {
  return x !== null && Number.isFinite(x) ? x : null;
}

/** One throttle's thrust and TSFC against PLOT_MACHS at CYCLE_CURVE_ALTITUDES_M, warm-started along each Mach line. */
export function cycleCurves(
  engine: CycleEngine,
  throttle: CycleThrottle,
  label: string,
  installationAt: InstallationAt | null,
  onLine?: () => boolean,
): CycleCurveSet | null {
  const curveRating: RatingName = throttle.kind === 'rating' ? throttle.rating : 'maxCruise';
  const thrust: (number | null)[][] = [];
  const tsfc: (number | null)[][] = [];
  const iThrust: (number | null)[][] = [];
  const iTsfc: (number | null)[][] = [];
  const statuses: string[][] = [];
  for (const altitude_m of CYCLE_CURVE_ALTITUDES_M) {
    let start: CycleWarmStart | undefined;
    let iStart: CycleWarmStart | undefined;
    const t: (number | null)[] = [];
    const s: (number | null)[] = [];
    const it: (number | null)[] = [];
    const is: (number | null)[] = [];
    const st: string[] = [];
    for (const mach of PLOT_MACHS) {
      const req: CyclePointRequest = { altitude_m, mach, isaDeviation_K: 0, throttle, ...(start ? { start } : {}) };
      const r = runCyclePoint(engine, req);
      if (r.start) start = r.start;
      const ok = r.status === 'converged';
      t.push(ok ? finite(r.thrust_N) : null);
      s.push(ok ? finite(r.tsfc_kg_N_s) : null);
      st.push(r.status);
      const inst = installationAt?.(altitude_m, mach, curveRating) ?? null;
      if (inst === null) {
        it.push(null);
        is.push(null);
        continue;
      }
      const ri = runCyclePoint(engine, { ...req, recovery: inst.recovery, bleedFraction: inst.bleedFraction, powerExtraction_W: inst.powerExtraction_W, ...(iStart ? { start: iStart } : {}) });
      if (ri.start) iStart = ri.start;
      const net = ri.status === 'converged' && ri.thrust_N !== null ? ri.thrust_N - inst.spillageDrag_N : null;
      it.push(finite(net));
      is.push(net !== null && net > 0 && ri.fuelFlow_kg_s !== null ? finite(ri.fuelFlow_kg_s / net) : null);
    }
    thrust.push(t);
    tsfc.push(s);
    iThrust.push(it);
    iTsfc.push(is);
    statuses.push(st);
    if (onLine && onLine()) return null;
  }
  return {
    label,
    mach: PLOT_MACHS,
    altitudes_m: CYCLE_CURVE_ALTITUDES_M,
    uninstalledThrust_N: thrust,
    uninstalledTsfc_kg_N_s: tsfc,
    installedThrust_N: installationAt ? iThrust : null,
    installedTsfc_kg_N_s: installationAt ? iTsfc : null,
    statuses,
  };
}

/** The whole reply: inputs, the chosen point (uninstalled and, with a project, installed) and both curve sets. */
export function cycleViewReply(
  engine: CycleEngine,
  query: CycleViewQuery,
  installationAt: InstallationAt | null,
  inletName: string | null,
  hooks: { readonly onProgress?: (done: number, total: number) => void; readonly shouldCancel?: () => boolean },
): Result<CycleViewReply, EngineFailure> {
  const p = query.point;
  const pointReq: CyclePointRequest = { altitude_m: p.altitude_m, mach: p.mach, isaDeviation_K: p.isaDev_K, throttle: p.throttle };
  const point = runCyclePoint(engine, pointReq);
  const total = 2 * CYCLE_CURVE_ALTITUDES_M.length;
  let done = 0;
  const onLine = (): boolean => {
    done += 1;
    hooks.onProgress?.(done, total);
    return hooks.shouldCancel?.() ?? false;
  };
  const cancelled = err<EngineFailure>({ kind: 'analysis', code: 'cancelled', message: 'cancelled' });
  const rating = cycleCurves(engine, { kind: 'rating', rating: query.curveRating }, query.curveRating, installationAt, onLine);
  if (rating === null) return cancelled;
  const fan = cycleCurves(engine, { kind: 'fanSpeed', fraction: query.curveFanSpeed }, `fan speed ${query.curveFanSpeed}`, installationAt, onLine);
  if (fan === null) return cancelled;
  return ok({
    title: engine.spec.title,
    spec: engine.spec,
    design: engine.summary,
    point: pointView(point),
    inletName,
    ratingCurves: rating,
    fanSpeedCurves: fan,
  });
}
