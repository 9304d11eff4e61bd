/**
 * Runs one engine request to completion. The same code runs inside the Web
 * Worker (engineWorker.ts) and in-thread in component tests. Long analyses
 * report progress and poll `shouldCancel` between missions.
 */
import { thrustDragCrossover } from '../../engine/analysis/crossover';
import { compareInlets } from '../../engine/analysis/inletComparison';
import { inletFactorBuilder } from '../../engine/analysis/inletFactorBuilder';
import { payloadRangeDiagram } from '../../engine/analysis/payloadRange';
import { tradeFactors } from '../../engine/analysis/tradeFactors';
import { err, ok, type Result } from '../../engine/core/result';
import type { MissionInput } from '../../engine/mission/missionTypes';
import { solveMission } from '../../engine/mission/solveMission';
import { buildMissionInput } from '../../engine/project/buildMissionInput';
import { projectDeck } from '../../engine/project/projectDeck';
import { makeIssue } from '../../engine/project/projectIssue';
import { cautionSettingsOf, inletDesignOf, installationOf } from '../../engine/project/projectSpecs';
import { parseDeckCsv } from '../../engine/propulsion/deckCsv';
import type { EngineDeck } from '../../engine/propulsion/engineDeck';
import type { AnalysisError } from '../../engine/analysis/analysisTypes';
import { runUncertainty } from '../../engine/uncertainty/uncertaintyRun';
import type { EngineFailure, EngineOutcome, EngineReplies, EngineRequest, EngineRequestKind, StudyInputs } from './engineProtocol';
import { deckSummary, inletCurves, LAPSE_RATINGS, lapseCurves, polarCurves } from './studyCurves';

export interface RunHooks {
  readonly onProgress?: (done: number, total: number) => void;
  readonly shouldCancel?: () => boolean;
}

/** Remembers the last parsed deck file so that edits do not re-parse it. */
export interface DeckCache {
  text: string | null;
  result: ReturnType<typeof parseDeckCsv> | null;
}

export function createDeckCache(): DeckCache {
  return { text: null, result: null };
}

interface Prepared {
  readonly deck: EngineDeck;
  readonly input: MissionInput;
}

function deckOf(inputs: StudyInputs, cache: DeckCache): Result<EngineDeck | undefined, EngineFailure> {
  if (inputs.project.engine.deck.kind !== 'file') return ok(undefined);
  const file = inputs.deckFile;
  if (file === null) {
    const path = inputs.project.engine.deck.path;
    return err({
      kind: 'project',
      issues: [makeIssue('engine.deck.path', JSON.stringify(path), 'an imported deck file', `the project uses the deck file ${JSON.stringify(path)}: import it (Engine deck view)`)],
    });
  }
  if (cache.text !== file.text || cache.result === null) {
    cache.text = file.text;
    cache.result = parseDeckCsv(file.text, file.name);
  }
  const parsed = cache.result;
  return parsed.ok ? ok(parsed.value) : err({ kind: 'deck', errors: parsed.error });
}

function prepare(inputs: StudyInputs, cache: DeckCache, inletName?: string): Result<Prepared, EngineFailure> {
  const file = deckOf(inputs, cache);
  if (!file.ok) return file;
  const resources = file.value === undefined ? {} : { deck: file.value };
  const deck = projectDeck(inputs.project, resources);
  if (!deck.ok) return err({ kind: 'project', issues: deck.error });
  const input = buildMissionInput(inputs.project, resources, inletName === undefined ? {} : { inletName });
  if (!input.ok) return err({ kind: 'project', issues: input.error });
  return ok({ deck: deck.value, input: input.value });
}

function analysisFailure(e: AnalysisError): EngineFailure {
  return { kind: 'analysis', code: e.code, message: e.message };
}

function firstCruiseAltitude(input: MissionInput): number {
  const cruise = input.legs.find((l) => l.kind === 'cruise');
  return cruise?.kind === 'cruise' ? cruise.altitude_m : 35000 * 0.3048;
}

function runStudy(inputs: StudyInputs, cache: DeckCache): Result<EngineReplies['study'], EngineFailure> {
  const base = prepare(inputs, cache);
  if (!base.ok) return base;
  const { input, deck } = base.value;
  const altitude_m = firstCruiseAltitude(input);
  const inlets = [];
  for (const inlet of inputs.project.inlets) {
    const active = inlet.name === input.propulsion.inletName;
    const other = active ? base : prepare(inputs, cache, inlet.name);
    if (other.ok) inlets.push(inletCurves(other.value.input.propulsion, active, altitude_m));
  }
  return ok({
    mission: solveMission(input),
    inletName: input.propulsion.inletName,
    deck: deckSummary(deck),
    polar: polarCurves(input.aero),
    lapse: LAPSE_RATINGS.filter((r) => deck.ratings[r] !== undefined).map((r) => lapseCurves(input.propulsion, r)),
    inlets,
  });
}

function runCrossover(request: Extract<EngineRequest, { kind: 'crossover' }>, cache: DeckCache): Result<EngineReplies['crossover'], EngineFailure> {
  const active = prepare(request, cache);
  if (!active.ok) return active;
  const names = request.query.allInlets ? request.project.inlets.map((i) => i.name) : [active.value.input.propulsion.inletName];
  const curves = [];
  for (const name of names) {
    const prepared = name === active.value.input.propulsion.inletName ? active : prepare(request, cache, name);
    if (!prepared.ok) return prepared;
    const { aero, propulsion } = prepared.value.input;
    const q = request.query;
    const r = thrustDragCrossover({ aero, propulsion }, { altitude_m: q.altitude_m, mass_kg: q.mass_kg, rating: q.rating, isaDev_K: q.isaDev_K });
    if (!r.ok) return err(analysisFailure(r.error));
    curves.push({ inletName: name, result: r.value });
  }
  return ok({ curves });
}

function runCompare(request: Extract<EngineRequest, { kind: 'compare' }>, cache: DeckCache, hooks: RunHooks): Result<EngineReplies['compare'], EngineFailure> {
  const a = prepare(request, cache, request.nameA);
  if (!a.ok) return a;
  const b = prepare(request, cache, request.nameB);
  if (!b.ok) return b;
  const p = request.project;
  const inletA = p.inlets.find((i) => i.name === request.nameA)!;
  const inletB = p.inlets.find((i) => i.name === request.nameB)!;
  const build = inletFactorBuilder({
    inputA: a.value.input,
    inputB: b.value.input,
    inletA: inletDesignOf(inletA),
    inletB: inletDesignOf(inletB),
    deck: a.value.deck,
    engineCount: p.engine.count,
    installation: installationOf(p),
    cautionSettings: cautionSettingsOf(p),
  });
  const r = compareInlets(build, { nameA: request.nameA, nameB: request.nameB, ...hooks });
  return r.ok ? r : err(analysisFailure(r.error));
}

function dispatch(request: EngineRequest, cache: DeckCache, hooks: RunHooks): Result<EngineReplies[EngineRequestKind], EngineFailure> {
  switch (request.kind) {
    case 'study':
      return runStudy(request, cache);
    case 'crossover':
      return runCrossover(request, cache);
    case 'payloadRange': {
      const base = prepare(request, cache);
      if (!base.ok) return base;
      const r = payloadRangeDiagram(base.value.input, { ...hooks });
      return r.ok ? r : err(analysisFailure(r.error));
    }
    case 'tradeFactors': {
      const base = prepare(request, cache);
      if (!base.ok) return base;
      const cRam = request.project.engine.installation.ramRecoveryFactor;
      const r = tradeFactors(base.value.input, { ...hooks, ...(cRam === undefined ? {} : { cRam }) });
      return r.ok ? r : err(analysisFailure(r.error));
    }
    case 'compare':
      return runCompare(request, cache, hooks);
    case 'uncertainty': {
      const file = deckOf(request, cache);
      if (!file.ok) return file;
      const size = { ...(request.samples === undefined ? {} : { samples: request.samples }), ...(request.seed === undefined ? {} : { seed: request.seed }) };
      const r = runUncertainty({ project: request.project, resources: file.value === undefined ? {} : { deck: file.value }, designs: request.designs, ...size }, hooks);
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
