/**
 * Turning files into actions: a project's text into `projectOpened` (or
 * `projectOpenFailed` with every issue), the bundled demo, a deck file.
 */
import { parseProject } from '../../engine/project/parseProject';
import type { StudyAction } from './studyActions';
import type { DeckFile } from './studyState';

/** Parses project text; `deckFile` is the deck that came with it (the demo's), if any. */
export function openProjectAction(name: string, text: string, deckFile: DeckFile | null): StudyAction {
  const parsed = parseProject(text, name);
  if (!parsed.ok) return { type: 'projectOpenFailed', name, issues: parsed.error };
  const project = parsed.value;
  const usesFile = project.engine.deck.kind === 'file';
  return { type: 'projectOpened', project, name, deckFile: usesFile ? deckFile : null };
}
