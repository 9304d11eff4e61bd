/** The demo project (invented aircraft, deck and inlets, fixtures/demo) and its deck, for the uncertainty tests. */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { expectOk } from '../../../engine/core/result';
import { parseProject } from '../../../engine/project/parseProject';
import type { Project } from '../../../engine/project/projectSchema';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import type { EngineDeck } from '../../../engine/propulsion/engineDeck';

const root = fileURLToPath(new URL('../../../fixtures/demo/', import.meta.url));

export function demoProject(): { project: Project; deck: EngineDeck } {
  const project = expectOk(parseProject(readFileSync(`${root}demo.blockwise.json`, 'utf8'), 'demo.blockwise.json'), 'demo project');
  const deck = expectOk(parseDeckCsv(readFileSync(`${root}demo-engine.deck.csv`, 'utf8'), 'demo-engine.deck.csv'), 'demo deck');
  return { project, deck };
}
