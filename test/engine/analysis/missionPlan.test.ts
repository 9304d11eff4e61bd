import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { compareInletsSteps } from '../../../engine/analysis/inletComparison';
import { inletFactorBuilder } from '../../../engine/analysis/inletFactorBuilder';
import { flySerially } from '../../../engine/analysis/missionPlan';
import { payloadRangeSteps } from '../../../engine/analysis/payloadRange';
import { tradeFactorsSteps } from '../../../engine/analysis/tradeFactors';
import { expectOk } from '../../../engine/core/result';
import type { MissionInput } from '../../../engine/mission/missionTypes';
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

describe('planned missions (missionPlan.ts)', () => {
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
