/** The text a save writes: the project, with the deck file's text inside it when the save option says so. */
import { projectToJson, withEmbeddedDeckText } from '../../engine/project';
import type { StudyState } from './studyState';

/** Whether a save from `state` on a host of `kind` writes the deck inside the project. */
export function savesDeckInside(state: StudyState, kind: 'desktop' | 'browser'): boolean {
  return state.embedDeck ?? kind === 'browser';
}

/** The project file text to save (null: no project open). */
export function projectSaveText(state: StudyState, kind: 'desktop' | 'browser'): string | null {
  if (state.doc === null) return null;
  const project = savesDeckInside(state, kind) ? withEmbeddedDeckText(state.doc.present, state.deckFile) : state.doc.present;
  return projectToJson(project);
}
