import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { compareInlets, compareInletsSteps, inletFactorBuilder, payloadRangeDiagram, payloadRangeSteps, tradeFactors, tradeFactorsSteps } from '../../engine/analysis';
import { expectOk } from '../../engine/core';
import { parseProject } from '../../engine/project';
import { prepareStudy } from '../../engine/study';
import { createAnalysisPool, type StudySource } from '../../hostio/analysisPool';

const root = fileURLToPath(new URL('../../fixtures/demo/', import.meta.url));
const project = expectOk(parseProject(readFileSync(`${root}demo.blockwise.json`, 'utf8'), 'demo'), 'demo');
const source: StudySource = { project, deckFile: { name: 'demo-engine.deck.csv', text: readFileSync(`${root}demo-engine.deck.csv`, 'utf8') } };
const study = expectOk(prepareStudy(source.project, source.deckFile), 'study');
const input = expectOk(study.inputFor(), 'input');
const [nameA, nameB] = [project.inlets[0]!.name, project.inlets[1]!.name];
const build = inletFactorBuilder(expectOk(study.inletPair(nameA, nameB), 'pair'));
const workerUrl = new URL('../../hostio/sourceAnalysisWorker.mjs', import.meta.url);
const pool = createAnalysisPool({ workerUrl, threads: 2 });
afterAll(() => pool.close());

describe('analysisPool (worker threads)', () => {
  it('gives each analysis bit for bit as on the calling thread, run after run on the same workers', async () => {
    // The planned missions' warm starts read only the results they name (engine/analysis/missionPlan.ts), each lane
    // stays on one worker with its memo, and every worker builds the same input from the same study and job.
    for (let run = 0; run < 2; run++) {
      expect(await pool.run(source, { kind: 'compare', nameA, nameB }, () => compareInletsSteps(build, { nameA, nameB }))).toEqual(compareInlets(build, { nameA, nameB }));
      expect(await pool.run(source, { kind: 'trade', cRam: 1.35 }, () => tradeFactorsSteps(input, {}))).toEqual(tradeFactors(input, {}));
      expect(await pool.run(source, { kind: 'payloadRange' }, () => payloadRangeSteps(input, { pointsBetween: 4 }))).toEqual(payloadRangeDiagram(input, { pointsBetween: 4 }));
    }
    expect(pool.threads()).toBe(2);
  }, 180_000);

  it('counts every mission and stops at a cancel; a study its workers cannot build falls back to the calling thread', async () => {
    let flown = 0;
    const r = await pool.run(source, { kind: 'payloadRange' }, () => payloadRangeSteps(input, {}), { onMission: () => flown++ });
    expect(expectOk(r, 'pool').missions).toBe(flown);
    let polls = 0;
    const c = await pool.run(source, { kind: 'compare', nameA, nameB }, () => compareInletsSteps(build, { nameA, nameB }), { shouldCancel: () => ++polls > 2 });
    expect(c.ok ? '' : c.error.code).toBe('cancelled');
    // A spec naming an inlet the project does not have: the workers refuse, the run is flown serially, same answer.
    const lonely = createAnalysisPool({ workerUrl, threads: 1 });
    try {
      const serial = await lonely.run(source, { kind: 'compare', nameA, nameB: 'no such inlet' }, () => compareInletsSteps(build, { nameA, nameB }));
      expect(serial).toEqual(compareInlets(build, { nameA, nameB }));
      expect(lonely.threads()).toBe(0);
    } finally {
      await lonely.close();
    }
  }, 180_000);
});
