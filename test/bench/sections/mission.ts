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

// The demo project (invented aircraft and engine deck) and the analytic test models of the mission tests;
// payloads cycle so each call differs.
const root = fileURLToPath(new URL('../../../fixtures/demo/', import.meta.url));
const project = expectOk(parseProject(readFileSync(`${root}demo.blockwise.json`, 'utf8'), 'demo.blockwise.json'), 'demo project');
const deck = expectOk(parseDeckCsv(readFileSync(`${root}demo-engine.deck.csv`, 'utf8'), 'demo-engine.deck.csv'), 'demo deck');
const demo = expectOk(buildMissionInput(project, { deck }), 'demo input');

const next = callCounter(8);

function withPayload(input: MissionInput, delta_kg: number): MissionInput {
  return { ...input, solve: { ...input.solve, payload_kg: input.solve.payload_kg + delta_kg } };
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
  cases: [
    { name: `demo project, solve mode '${demo.solve.kind}' (deck + installation)`, run: () => solveMission(withPayload(demo, 10 * next())) },
    {
      name: 'demo project, payloadRange with fuel iteration',
      run: () => solveMission({ ...demo, solve: { kind: 'payloadRange', payload_kg: demo.solve.payload_kg + 10 * next(), range_m: 1500 * 1852 } }),
    },
    { name: 'analytic models, payloadRange + ICAO reserves', run: () => solveMission(withPayload(analytic, 10 * next())) },
    { name: 'analytic models, maxRange', run: () => solveMission({ ...analytic, solve: { kind: 'maxRange', payload_kg: 10000 + 10 * next() } }) },
  ],
};
