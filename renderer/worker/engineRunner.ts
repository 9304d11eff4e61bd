/**
 * Runs one engine request to completion. The same code runs inside the Web
 * Worker (engineWorker.ts) and in-thread in component tests. Long analyses
 * report progress and poll `shouldCancel` between missions.
 */
import { type AnalysisError, compareInlets, DEFAULT_RESIDUAL_CLIMB_RATES, type EnvelopeQuery, flightEnvelope, optimumAltitude, specificRange, inletFactorBuilder, payloadRangeDiagram, recoveryTradeByMethod, thrustDragCrossover, tradeFactors } from '../../engine/analysis';
import { flySweepCase, gridSize, makeIssue, parseVary, projectToJson, recoveryMethodVariants } from '../../engine/project';
import { err, ok, type Result } from '../../engine/core';
import { type MissionInput, solveMission } from '../../engine/mission';
import { createDeckTextMemo, prepareStudy, type DeckTextMemo, type Study } from '../../engine/study';
import { runUncertainty } from '../../engine/uncertainty';
import type { EngineFailure, EngineOutcome, EngineReplies, EngineRequest, EngineRequestKind, EnvelopeRequestQuery, SpecificRangeAtAltitude, StudyInputs } from './engineProtocol';
import { formatQuantity } from '../../engine/units';
import { cycleEngineOf, cycleViewReply, projectInstallation, type InstallationAt } from './cycleView';
import { deckSummary, inletCurves, LAPSE_RATINGS, lapseCurves, polarCurves } from './studyCurves';
import { FOOT_M } from '../../engine/units';

export interface RunHooks {
  readonly onProgress?: (done: number, total: number) => void;
  readonly shouldCancel?: () => boolean;
}

/** Remembers the last parsed deck file so that edits do not re-parse it (engine/study's memo). */
export type DeckCache = DeckTextMemo;

export function createDeckCache(): DeckCache {
  return createDeckTextMemo();
}

/** The request's study (engine/study): the deck built once, each inlet's mission input built once. */
function prepare(inputs: StudyInputs, cache: DeckCache): Result<Study, EngineFailure> {
  const deck = inputs.project.engine.deck;
  if ((deck.kind === 'cycle' || (deck.kind === 'file' && deck.text === undefined)) && inputs.deckFile === null) {
    const what = deck.kind === 'cycle' ? 'cycle file' : 'deck file';
    return err({
      kind: 'project',
      issues: [makeIssue('engine.deck.path', JSON.stringify(deck.path), `an imported ${what}`, `the project uses the ${what} ${JSON.stringify(deck.path)}: import it (Engine deck view)`)],
    });
  }
  return prepareStudy(inputs.project, inputs.deckFile, { deckMemo: cache });
}

function analysisFailure(e: AnalysisError): EngineFailure {
  return { kind: 'analysis', code: e.code, message: e.message };
}

function firstCruiseAltitude(input: MissionInput): number {
  const cruise = input.legs.find((l) => l.kind === 'cruise');
  return cruise?.kind === 'cruise' ? cruise.altitude_m : 35000 * FOOT_M;
}

function runStudy(inputs: StudyInputs, cache: DeckCache): Result<EngineReplies['study'], EngineFailure> {
  const study = prepare(inputs, cache);
  if (!study.ok) return study;
  const base = study.value.inputFor();
  if (!base.ok) return base;
  const input = base.value;
  const deck = study.value.deck;
  const altitude_m = firstCruiseAltitude(input);
  const inlets = [];
  for (const inlet of inputs.project.inlets) {
    const other = study.value.inputFor(inlet.name);
    if (other.ok) inlets.push(inletCurves(other.value.propulsion, inlet.name === input.propulsion.inletName, altitude_m));
  }
  return ok({
    mission: solveMission(input),
    inletName: input.propulsion.inletName,
    deck: deckSummary(deck, input.propulsion.installationMethod),
    polar: polarCurves(input.aero),
    lapse: LAPSE_RATINGS.filter((r) => deck.ratings[r] !== undefined).map((r) => lapseCurves(input.propulsion, r)),
    inlets,
  });
}

function runCrossover(request: Extract<EngineRequest, { kind: 'crossover' }>, cache: DeckCache): Result<EngineReplies['crossover'], EngineFailure> {
  const study = prepare(request, cache);
  if (!study.ok) return study;
  const active = study.value.inputFor();
  if (!active.ok) return active;
  const names = request.query.allInlets ? request.project.inlets.map((i) => i.name) : [active.value.propulsion.inletName];
  const curves = [];
  for (const name of names) {
    const prepared = study.value.inputFor(name);
    if (!prepared.ok) return prepared;
    const { aero, propulsion, airframe } = prepared.value;
    const q = request.query;
    // VMO/MMO as the CLI's crossover verb passes them, so the band and the limit lines include them.
    const speedLimits = { vmo_m_s: airframe.vmo_m_s, mmo: airframe.mmo };
    const r = thrustDragCrossover({ aero, propulsion }, { altitude_m: q.altitude_m, mass_kg: q.mass_kg, rating: q.rating, isaDev_K: q.isaDev_K, speedLimits });
    if (!r.ok) return err(analysisFailure(r.error));
    curves.push({ inletName: name, result: r.value });
  }
  return ok({ curves });
}

const bothMass = (kg: number) => (Number.isFinite(kg) ? `${formatQuantity(kg, 'mass', 'customary')} (${formatQuantity(kg, 'mass', 'si')})` : 'not a number');

/** A mass outside (0, MTOW] is refused with where and what, before any analysis runs. */
function massFailure(where: string, mass_kg: number, mtow_kg: number): EngineFailure | null {
  if (Number.isFinite(mass_kg) && mass_kg > 0 && mass_kg <= mtow_kg) return null;
  return { kind: 'analysis', code: 'invalid_input', message: `${where}: aircraft mass ${bothMass(mass_kg)} must be above zero and at most the MTOW ${bothMass(mtow_kg)}` };
}

/**
 * The envelope query the CLI's `envelope` verb builds (cli/verbs/envelope.ts):
 * the project's buffet-margin load factor, VMO/MMO and the default residual
 * climb rates, rows from 0 to the top.
 */
export function envelopeQueryFor(input: MissionInput, q: EnvelopeRequestQuery): EnvelopeQuery {
  return {
    mass_kg: q.mass_kg,
    rating: q.rating,
    isaDev_K: q.isaDev_K,
    altitudeRange: [0, q.top_m],
    altitudeStep_m: q.step_m,
    buffetLoadFactor: input.cautionSettings.minBuffetLoadFactor,
    residualClimbRates: DEFAULT_RESIDUAL_CLIMB_RATES,
    speedLimits: { vmo_m_s: input.airframe.vmo_m_s, mmo: input.airframe.mmo },
  };
}

function runEnvelope(request: Extract<EngineRequest, { kind: 'envelope' }>, cache: DeckCache): Result<EngineReplies['envelope'], EngineFailure> {
  const study = prepare(request, cache);
  const base = study.ok ? study.value.inputFor() : study;
  if (!base.ok) return base;
  const input = base.value;
  const bad = massFailure('envelope', request.query.mass_kg, input.airframe.mtow_kg);
  if (bad) return err(bad);
  const r = flightEnvelope({ aero: input.aero, propulsion: input.propulsion }, envelopeQueryFor(input, request.query));
  return r.ok ? r : err(analysisFailure(r.error));
}

/**
 * Specific range at each altitude and the optimum altitude, with the queries
 * the CLI's `range-speeds` verb builds (cli/verbs/rangeSpeeds.ts): the
 * project's caution settings and MMO.
 */
function runSpecificRange(request: Extract<EngineRequest, { kind: 'specificRange' }>, cache: DeckCache, hooks: RunHooks): Result<EngineReplies['specificRange'], EngineFailure> {
  const study = prepare(request, cache);
  const base = study.ok ? study.value.inputFor() : study;
  if (!base.ok) return base;
  const input = base.value;
  const { mass_kg, isaDev_K, altitudes_m } = request.query;
  const bad = massFailure('specific range', mass_kg, input.airframe.mtow_kg);
  if (bad) return err(bad);
  const models = { aero: input.aero, propulsion: input.propulsion };
  const total = altitudes_m.length + 1;
  const curves: SpecificRangeAtAltitude[] = [];
  for (const [i, altitude_m] of altitudes_m.entries()) {
    if (hooks.shouldCancel?.()) return err({ kind: 'analysis', code: 'cancelled', message: 'specific range: cancelled' });
    const r = specificRange(models, { altitude_m, mass_kg, isaDev_K, cautionSettings: input.cautionSettings, mmo: input.airframe.mmo });
    curves.push(r.ok ? { altitude_m, ok: true, result: r.value } : { altitude_m, ok: false, code: r.error.code, message: r.error.message });
    hooks.onProgress?.(i + 1, total);
  }
  const opt = optimumAltitude(models, { mass_kg, isaDev_K, mmo: input.airframe.mmo, cautionSettings: input.cautionSettings });
  hooks.onProgress?.(total, total);
  return ok({ mass_kg, curves, optimum: opt.ok ? opt.value : null, optimumError: opt.ok ? null : opt.error.message });
}

function runCompare(request: Extract<EngineRequest, { kind: 'compare' }>, cache: DeckCache, hooks: RunHooks): Result<EngineReplies['compare'], EngineFailure> {
  const study = prepare(request, cache);
  if (!study.ok) return study;
  const pair = study.value.inletPair(request.nameA, request.nameB);
  if (!pair.ok) return pair;
  const r = compareInlets(inletFactorBuilder(pair.value), { nameA: request.nameA, nameB: request.nameB, ...hooks });
  return r.ok ? r : err(analysisFailure(r.error));
}

/** Trip legs of a mission input: the first leg that is not taxi out to the last that is not taxi in. */
function tripLegsOf(input: MissionInput): readonly [number, number] {
  let first = 0;
  while (first < input.legs.length && input.legs[first]!.kind === 'taxiOut') first++;
  let last = input.legs.length - 1;
  while (last >= 0 && input.legs[last]!.kind === 'taxiIn') last--;
  return [first, last];
}

/** Each named design flown from the study's own input for it (the same input the study request flies). */
function runProfiles(request: Extract<EngineRequest, { kind: 'profiles' }>, cache: DeckCache, hooks: RunHooks): Result<EngineReplies['profiles'], EngineFailure> {
  const study = prepare(request, cache);
  if (!study.ok) return study;
  const designs = [];
  for (const [k, name] of request.designs.entries()) {
    if (hooks.shouldCancel?.()) return err({ kind: 'analysis', code: 'cancelled', message: 'profiles: cancelled' });
    const input = study.value.inputFor(name);
    if (!input.ok) return input;
    designs.push({ name, mission: solveMission(input.value), tripLegs: tripLegsOf(input.value) });
    hooks.onProgress?.(k + 1, request.designs.length);
  }
  return ok({ designs });
}

/** Most cases the app's study view flies in one request (the CLI's sweep takes larger grids, in parallel). */
export const MAX_VIEW_SWEEP_CASES = 500;

/**
 * A one-field parameter study on the CLI's code path (`blockwise sweep`):
 * the project written as its file (projectToJson), the `--vary` text read by
 * parseVary, each case flown by flySweepCase with the study's deck.
 */
function runSweep(request: Extract<EngineRequest, { kind: 'sweep' }>, cache: DeckCache, hooks: RunHooks): Result<EngineReplies['sweep'], EngineFailure> {
  const study = prepare(request, cache);
  if (!study.ok) return study;
  const doc: unknown = JSON.parse(projectToJson(request.project));
  const axis = parseVary(doc, request.vary);
  if (!axis.ok) return err({ kind: 'analysis', code: 'invalid_input', message: `${axis.error.where}: ${axis.error.message}` });
  const axes = [axis.value];
  const total = gridSize(axes);
  if (total > MAX_VIEW_SWEEP_CASES) {
    return err({ kind: 'analysis', code: 'invalid_input', message: `${request.vary}: ${total} cases is more than ${MAX_VIEW_SWEEP_CASES} here; use a larger step, or blockwise sweep` });
  }
  const rows = [];
  for (let k = 0; k < total; k++) {
    if (hooks.shouldCancel?.()) return err({ kind: 'analysis', code: 'cancelled', message: `sweep cancelled after ${k} of ${total} cases` });
    rows.push(flySweepCase(doc, axes, k, { deck: study.value.deck }));
    hooks.onProgress?.(k + 1, total);
  }
  return ok({ field: axis.value.field, axes, rows });
}

function runCycleView(request: Extract<EngineRequest, { kind: 'cycleView' }>, cache: DeckCache, hooks: RunHooks): Result<EngineReplies['cycleView'], EngineFailure> {
  const engine = cycleEngineOf(request.deckFile.text, request.deckFile.name);
  if (!engine.ok) return engine;
  let installationAt: InstallationAt | null = null;
  let inletName: string | null = null;
  const project = request.project;
  if (project !== null && project.engine.deck.kind === 'cycle') {
    const study = prepare({ project, deckFile: request.deckFile }, cache);
    const base = study.ok ? study.value.inputFor() : study;
    if (!base.ok) return base;
    installationAt = projectInstallation(project, base.value.propulsion, engine.value);
    inletName = base.value.propulsion.inletName;
  }
  return cycleViewReply(engine.value, request.query, installationAt, inletName, hooks);
}

function dispatch(request: EngineRequest, cache: DeckCache, hooks: RunHooks): Result<EngineReplies[EngineRequestKind], EngineFailure> {
  switch (request.kind) {
    case 'cycleView':
      return runCycleView(request, cache, hooks);
    case 'study':
      return runStudy(request, cache);
    case 'crossover':
      return runCrossover(request, cache);
    case 'envelope':
      return runEnvelope(request, cache);
    case 'specificRange':
      return runSpecificRange(request, cache, hooks);
    case 'payloadRange': {
      const study = prepare(request, cache);
      const base = study.ok ? study.value.inputFor() : study;
      if (!base.ok) return base;
      const r = payloadRangeDiagram(base.value, { ...hooks });
      return r.ok ? r : err(analysisFailure(r.error));
    }
    case 'tradeFactors': {
      const study = prepare(request, cache);
      const base = study.ok ? study.value.inputFor() : study;
      if (!base.ok) return base;
      const cRam = request.project.engine.installation.ramRecoveryFactor;
      const r = tradeFactors(base.value, { ...hooks, ...(cRam === undefined ? {} : { cRam }) });
      return r.ok ? r : err(analysisFailure(r.error));
    }
    case 'compare':
      return runCompare(request, cache, hooks);
    case 'profiles':
      return runProfiles(request, cache, hooks);
    case 'sweep':
      return runSweep(request, cache, hooks);
    case 'recoveryByMethod': {
      const study = prepare(request, cache);
      if (!study.ok) return study;
      const r = recoveryTradeByMethod(recoveryMethodVariants(request.project, study.value.deck), hooks);
      return r.ok ? r : err(analysisFailure(r.error));
    }
    case 'uncertainty': {
      const study = prepare(request, cache);
      if (!study.ok) return study;
      const size = { ...(request.samples === undefined ? {} : { samples: request.samples }), ...(request.seed === undefined ? {} : { seed: request.seed }) };
      const r = runUncertainty({ project: request.project, resources: { deck: study.value.deck }, designs: request.designs, ...size }, hooks);
      return r.ok ? r : err(analysisFailure(r.error));
    }
  }
}

/** Runs `request`; an exception inside the engine (a bug) comes back as an analysis failure with its message. */
export function runEngineRequest(request: EngineRequest, cache: DeckCache, hooks: RunHooks = {}): EngineOutcome<EngineRequestKind> {
  try {
    return dispatch(request, cache, hooks);
  } catch (e) {
    return { ok: false, error: { kind: 'analysis', code: 'internal_error', message: `engine error: ${e instanceof Error ? e.message : String(e)}` } };
  }
}
