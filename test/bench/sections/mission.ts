import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { expectOk } from '../../../engine/core/result';
import { solveMission } from '../../../engine/mission/solveMission';
import type { MissionInput } from '../../../engine/mission/missionTypes';
import { buildMissionInput } from '../../../engine/project/buildMissionInput';
import { parseProject } from '../../../engine/project/parseProject';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import { demoLegs, missionInput } from '../../engine/mission/support/missionFixtures';
import { callCounter, type BenchSection } from '../benchTypes';
import { section as aeroSection } from './aero';
import { section as analysisSection } from './analysis';
import { section as atmosphereSection } from './atmosphere';
import { section as cycleSection } from './cycle';
import { section as deckSection } from './deck';
import { section as installedSection } from './installed';

// The demo project (invented aircraft and engine deck) and the analytic test models of the mission tests;
// payloads cycle so each call differs.
const root = fileURLToPath(new URL('../../../fixtures/demo/', import.meta.url));
const project = expectOk(parseProject(readFileSync(`${root}demo.blockwise.json`, 'utf8'), 'demo.blockwise.json'), 'demo project');
const deck = expectOk(parseDeckCsv(readFileSync(`${root}demo-engine.deck.csv`, 'utf8'), 'demo-engine.deck.csv'), 'demo deck');
const demo = expectOk(buildMissionInput(project, { deck }), 'demo input');

const next = callCounter(8);

// The installed model keeps its rated points across solves (engine/propulsion/ratingMemo.ts), so a mission repeated
// on one model is timed with a warm memo: three rows tell the memo's share apart. Fresh: a model built for every
// call (buildMissionInput's propulsion alone, timed in its own row). Same: one model, the same mission every call.
// Stepped: one model, payload and range stepped through a cycle of 15 missions (the live work of a sweep or an
// analysis on one model).
const demoPayload_kg = demo.solve.payload_kg;
const demoRange_m = demo.solve.kind === 'payloadRange' ? demo.solve.range_m : 3000 * 1852;
const freshModel = (): MissionInput['propulsion'] => expectOk(buildMissionInput(project, { deck }), 'demo input').propulsion;
const stepped = callCounter(15);
function steppedDemo(k: number): MissionInput {
  return { ...demo, solve: { kind: 'payloadRange', payload_kg: demoPayload_kg + 100 * (k % 5), range_m: demoRange_m - 100 * 1852 * (k % 3) } };
}

function withPayload(input: MissionInput, delta_kg: number): MissionInput {
  return { ...input, solve: { ...input.solve, payload_kg: input.solve.payload_kg + delta_kg } };
}

// The bench runs each section in a process of its own (sectionProcess.ts). The app's worker and the command line's
// analyses fly missions in a process that has run other work; the last row times the demo mission after every case
// of the sections before this one (in the bench's order) has run this long, untimed, in the same process.
const MIXED_PER_CASE_S = 0.3;
function runOtherSections(): void {
  for (const other of [aeroSection, analysisSection, atmosphereSection, cycleSection, deckSection, installedSection]) {
    for (const bench of other.cases) {
      const end = performance.now() + MIXED_PER_CASE_S * 1000;
      while (performance.now() < end) bench.run();
    }
  }
}

const analytic = missionInput({
  legs: demoLegs(null),
  solve: { kind: 'payloadRange', payload_kg: 10000, range_m: 3000 * 1852 },
  reserves: {
    preset: 'icaoAnnex6',
    contingencyFraction: 0.05,
    minContingency_s: 300,
    alternate: { distance_m: 200 * 1852, cruiseAltitude_m: 7600, cruiseMach: 0.7, elevation_m: 0 },
    finalReserve_s: 1800,
  },
});

export const section: BenchSection = {
  title: 'mission solver',
  // Whole missions: each case warmed to the JIT's steady speed, then timed over 1.5 s (benchTypes.ts BenchSection.timing).
  timing: { warmUp_s: 3, measure_s: 1.5 },
  cases: [
    { name: `demo project, solve mode '${demo.solve.kind}' (deck + installation)`, run: () => solveMission(withPayload(demo, 10 * next())) },
    {
      name: 'demo project, payloadRange with fuel iteration',
      run: () => solveMission({ ...demo, solve: { kind: 'payloadRange', payload_kg: demo.solve.payload_kg + 10 * next(), range_m: 1500 * 1852 } }),
    },
    { name: 'demo project, payloadRange, a model built fresh for each call (model build included)', run: () => solveMission({ ...demo, propulsion: freshModel() }) },
    { name: 'demo project, building the installed model alone (buildMissionInput)', run: () => freshModel() },
    { name: 'demo project, payloadRange, the same model and the same mission each call (warm memo)', run: () => solveMission(demo) },
    { name: 'demo project, payloadRange, the same model, payload and range stepped through 15 missions', run: () => solveMission(steppedDemo(stepped())) },
    { name: 'analytic models, payloadRange + ICAO reserves', run: () => solveMission(withPayload(analytic, 10 * next())) },
    { name: 'analytic models, maxRange', run: () => solveMission({ ...analytic, solve: { kind: 'maxRange', payload_kg: 10000 + 10 * next() } }) },
    {
      name: `demo project, solve mode '${demo.solve.kind}', after the other sections' cases ran ${MIXED_PER_CASE_S} s each in this process`,
      prepare: runOtherSections,
      run: () => solveMission(withPayload(demo, 10 * next())),
    },
  ],
};
