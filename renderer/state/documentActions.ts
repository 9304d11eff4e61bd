/**
 * Turning files into actions: a project's text into `projectOpened` (or
 * `projectOpenFailed` with every issue), the bundled demo, a deck file.
 */
import { parseProject } from '../../engine/project';
import type { StudyAction } from './studyActions';
import type { DeckFile } from './studyState';

/**
 * Parses project text. `deckFile` is a deck already at hand (the demo's, or
 * the one in use); it is kept only when the project names a deck file of
 * that name.
 */
export function openProjectAction(name: string, text: string, deckFile: DeckFile | null): StudyAction {
  const parsed = parseProject(text, name);
  if (!parsed.ok) return { type: 'projectOpenFailed', name, issues: parsed.error };
  const project = parsed.value;
  const deck = project.engine.deck;
  const keep = deck.kind === 'file' && deckFile !== null && deck.path === deckFile.name;
  return { type: 'projectOpened', project, name, deckFile: keep ? deckFile : null };
}
