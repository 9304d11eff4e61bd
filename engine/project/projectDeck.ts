/**
 * The engine deck a project names: a file (read and parsed by the caller,
 * passed in `resources.deck`), a deck embedded in the JSON deck format, or a
 * parametric deck built from published thrust-lapse and TSFC models.
 */
import { err, ok, type Result } from '../core/result';
import type { EngineDeck } from '../propulsion/engineDeck';
import { makeIssue, type ProjectIssue } from './projectIssue';
import type { Project } from './projectSchema';

export type DeckReference =
  | { readonly kind: 'file'; readonly path: string }
  | { readonly kind: 'embedded' }
  | { readonly kind: 'parametric' };

/**
 * What the caller must supply for the project's deck: for `file`, the path as
 * written (relative paths resolve from the project file's folder; resolving
 * is the caller's job, the engine reads no files).
 */
export function deckReference(project: Project): DeckReference {
  const d = project.engine.deck;
  return d.kind === 'file' ? { kind: 'file', path: d.path } : { kind: d.kind };
}

/** The project's deck: from `resources` for a file reference, else embedded or parametric. */
export function projectDeck(project: Project, resources: { readonly deck?: EngineDeck }): Result<EngineDeck, ProjectIssue[]> {
  const d = project.engine.deck;
  if (d.kind === 'file') {
    if (resources.deck === undefined) {
      return err([makeIssue('engine.deck.path', JSON.stringify(d.path), 'a deck file read by the caller', `the deck file ${JSON.stringify(d.path)} was not loaded`)]);
    }
    return ok(resources.deck);
  }
  if (resources.deck !== undefined) return ok(resources.deck);
  return err([makeIssue('engine.deck', `{ "kind": "${d.kind}" }`, 'a deck file', `${d.kind} decks are not available in this build yet`)]);
}
