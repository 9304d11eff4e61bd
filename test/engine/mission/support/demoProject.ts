/** The demo project (invented aircraft and deck, fixtures/demo) as a MissionInput, for mission tests that need the real deck and installation. */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { expectOk } from '../../../../engine/core/result';
import type { MissionInput } from '../../../../engine/mission/missionTypes';
import { buildMissionInput } from '../../../../engine/project/buildMissionInput';
import { parseProject } from '../../../../engine/project/parseProject';
import { parseDeckCsv } from '../../../../engine/propulsion/deckCsv';

const root = fileURLToPath(new URL('../../../../fixtures/demo/', import.meta.url));

/** Reads and builds the demo project's MissionInput (throws with the issues when the fixture does not build). */
export function demoMissionInput(): MissionInput {
  const project = expectOk(parseProject(readFileSync(`${root}demo.blockwise.json`, 'utf8'), 'demo.blockwise.json'), 'demo project');
  const deck = expectOk(parseDeckCsv(readFileSync(`${root}demo-engine.deck.csv`, 'utf8'), 'demo-engine.deck.csv'), 'demo deck');
  return expectOk(buildMissionInput(project, { deck }), 'demo input');
}
