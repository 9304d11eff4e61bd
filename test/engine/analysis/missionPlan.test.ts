import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { analysisJobInput, pointJobOutput, type AnalysisJobBase, type PointOutput } from '../../../engine/analysis/analysisJobs';
import { compareInlets, compareInletsSteps } from '../../../engine/analysis/inletComparison';
import { inletFactorBuilder } from '../../../engine/analysis/inletFactorBuilder';
import { flySerially, plannedStart, type AnalysisSteps, type MissionRound } from '../../../engine/analysis/missionPlan';
import { payloadRangeDiagram, payloadRangeSteps } from '../../../engine/analysis/payloadRange';
import { tradeFactors, tradeFactorsSteps } from '../../../engine/analysis/tradeFactors';
import { analysisSolver } from '../../../engine/analysis/warmStart';
import { expectOk } from '../../../engine/core/result';
import { createPassMemo, type PassMemo } from '../../../engine/mission/passMemo';
import type { MissionInput, MissionResult } from '../../../engine/mission/missionTypes';
import { buildMissionInput } from '../../../engine/project/buildMissionInput';
import { parseProject } from '../../../engine/project/parseProject';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import { prepareStudy } from '../../../engine/study';

const root = fileURLToPath(new URL('../../../fixtures/demo/', import.meta.url));
const project = expectOk(parseProject(readFileSync(`${root}demo.blockwise.json`, 'utf8'), 'demo'), 'demo');
const deckText = readFileSync(`${root}demo-engine.deck.csv`, 'utf8');
const deck = expectOk(parseDeckCsv(deckText, 'deck'), 'deck');
const demo: MissionInput = expectOk(buildMissionInput(project, { deck }), 'demo input');
const [nameA, nameB] = [project.inlets[0]!.name, project.inlets[1]!.name];
const build = inletFactorBuilder(expectOk(expectOk(prepareStudy(project, { name: 'demo-engine.deck.csv', text: deckText }), 'study').inletPair(nameA, nameB), 'pair'));

/**
 * Flies each round as a pool might: always the ready mission of highest index first (a mission is ready when its
 * `after` and its lane's missions before it are flown), each input built again from its job, one memo per lane.
 */
function flyOutOfOrder<R>(steps: AnalysisSteps<R>, rebuild: (m: MissionRound['missions'][number]) => MissionInput, base: AnalysisJobBase): R {
  const memos = new Map<number, PassMemo>();
  let next = steps.next();
  while (!next.done) {
    if ('tasks' in next.value) {
      // Point tasks from their jobs alone, the last first.
      const tasks = next.value.tasks;
      const outputs = tasks.map(() => undefined as PointOutput | undefined);
      for (let i = tasks.length - 1; i >= 0; i--) outputs[i] = pointJobOutput(base, tasks[i]!.job)!;
      next = steps.next({ outputs: outputs as PointOutput[] });
      continue;
    }
    const round = next.value;
    const results: (MissionResult | undefined)[] = round.missions.map(() => undefined);
    const ready = (i: number) =>
      results[i] === undefined && round.missions[i]!.after.every((k) => results[k] !== undefined) && round.missions.every((o, k) => k >= i || o.lane !== round.missions[i]!.lane || results[k] !== undefined);
    for (let left = round.missions.length; left > 0; left--) {
      let i = round.missions.length - 1;
      while (!ready(i)) i--;
      const m = round.missions[i]!;
      let memo = memos.get(m.lane);
      if (round.laneMemos && memo === undefined) memos.set(m.lane, (memo = createPassMemo()));
      results[i] = analysisSolver(round.laneMemos ? memo : undefined)(rebuild(m), plannedStart(m, results));
    }
    next = steps.next({ results, cancelled: false });
  }
  return next.value;
}

describe('planned missions (missionPlan.ts)', () => {
  it('any order that keeps each mission after its `after` and its lane gives the serial answer bit for bit, inputs built from the jobs', () => {
    // The warm start of a mission reads only the results it names and the solver is deterministic: the property the
    // worker-thread pool relies on (its missions finish in any order, each input built again from its job).
    const compareBase = { kind: 'compare', build } as const;
    expect(flyOutOfOrder(compareInletsSteps(build, { nameA, nameB }), (m) => analysisJobInput(compareBase, m.job)!, compareBase)).toEqual(compareInlets(build, { nameA, nameB }));
    const tradeBase = { kind: 'trade', input: demo, cRam: 1.35 } as const;
    expect(flyOutOfOrder(tradeFactorsSteps(demo, {}), (m) => analysisJobInput(tradeBase, m.job)!, tradeBase)).toEqual(tradeFactors(demo, {}));
    const prBase = { kind: 'payloadRange', input: demo } as const;
    for (const pointsBetween of [3, 4]) {
      expect(flyOutOfOrder(payloadRangeSteps(demo, { pointsBetween }), (m) => analysisJobInput(prBase, m.job)!, prBase)).toEqual(payloadRangeDiagram(demo, { pointsBetween }));
    }
  }, 120_000);

  it('flySerially stops a round at a failed mission when the round says so, and reports a cancel before the next mission', () => {
    let polls = 0;
    const cancelled = flySerially(compareInletsSteps(build, { nameA, nameB }), { shouldCancel: () => ++polls > 3 });
    expect(cancelled.ok ? '' : cancelled.error.message).toBe('inlet comparison cancelled after 3 of 16 missions');
    let flown = 0;
    const far: MissionInput = { ...demo, solve: { kind: 'payloadRange', payload_kg: 1000, range_m: 20000e3 } };
    const r = flySerially(tradeFactorsSteps(far, {}), { onMission: () => flown++ });
    expect(r.ok).toBe(false);
    // The trade's main round flies every step (a failed step only empties its factor), then reports the baseline.
    expect(flown).toBe(17);
    expect(r.ok ? '' : r.error.message).toMatch(/^trade factors: the baseline mission failed/);
    // The payload-range diagram's rounds stop at a failure: the maximum-payload mission alone is flown.
    flown = 0;
    const pr = flySerially(payloadRangeSteps({ ...demo, airframe: { ...demo.airframe, maxFuel_kg: 1 } }, {}), { onMission: () => flown++ });
    expect(pr.ok ? '' : pr.error.message).toMatch(/^payload-range: the maximum-payload mission/);
    expect(flown).toBe(1);
  }, 60_000);
});
