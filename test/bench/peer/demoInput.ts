/**
 * The demo project (fixtures/demo) read synchronously and built into a
 * MissionInput, for the bench's mission and analysis cases and the side by
 * side with the Python peer. Throws with the file's own message when the
 * demo does not load (the bench cannot run without it).
 */
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { MissionInput } from '../../../engine/mission/missionTypes';
import { buildMissionInput } from '../../../engine/project/buildMissionInput';
import { parseProject } from '../../../engine/project/parseProject';
import type { Project } from '../../../engine/project/projectSchema';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';

export const DEMO_PROJECT_PATH = fileURLToPath(new URL('../../../fixtures/demo/demo.blockwise.json', import.meta.url));
export const PEER_SCRIPT_PATH = fileURLToPath(new URL('./demoMission.py', import.meta.url));
/** The demo as the peer models it (frozenDemo/NOTE.md): both sides of the side by side and of the equal-accuracy comparison fly it. */
export const PEER_PROJECT_PATH = fileURLToPath(new URL('./frozenDemo/demo.blockwise.json', import.meta.url));

export interface DemoInput {
  readonly project: Project;
  readonly input: MissionInput;
}

/** Reads the demo project (or the one at `projectPath`) and its deck CSV and builds the mission input for `inletName` (default the active inlet). */
export function loadDemoInput(inletName?: string, projectPath: string = DEMO_PROJECT_PATH): DemoInput {
  const parsed = parseProject(readFileSync(projectPath, 'utf8'), projectPath);
  if (!parsed.ok) throw new Error(`demo project: ${parsed.error.map((i) => i.message).join('; ')}`);
  const project = parsed.value;
  const ref = project.engine.deck;
  if (ref.kind !== 'file') throw new Error('demo project: expected a deck file reference');
  const deckPath = join(dirname(projectPath), ref.path);
  const deck = parseDeckCsv(readFileSync(deckPath, 'utf8'), deckPath);
  if (!deck.ok) throw new Error(`demo deck: ${deck.error.map((e) => e.message).join('; ')}`);
  const built = buildMissionInput(project, { deck: deck.value }, inletName === undefined ? {} : { inletName });
  if (!built.ok) throw new Error(`demo mission input: ${built.error.map((i) => i.message).join('; ')}`);
  return { project, input: built.value };
}
