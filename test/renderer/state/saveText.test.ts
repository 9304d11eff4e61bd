/** Saving with the deck inside the project, and reopening such a file (docs/project-format.md, docs/desktop.md). */
import { describe, expect, it } from 'vitest';
import { parseProject } from '../../../engine/project';
import { openProjectAction } from '../../../renderer/state/documentActions';
import { projectSaveText, savesDeckInside } from '../../../renderer/state/saveText';
import { studyReducer } from '../../../renderer/state/studyReducer';
import { demoState } from '../support/studyHarness';

function savedDeck(text: string | null): unknown {
  if (text === null) throw new Error('nothing saved');
  const r = parseProject(text, 'saved.blockwise.json');
  if (!r.ok) throw new Error(r.error.map((i) => i.message).join('; '));
  return r.value.engine.deck;
}

describe('projectSaveText', () => {
  it('the browser build saves the deck inside, the desktop the reference only, unless the option says otherwise', () => {
    const s = demoState();
    const deckFile = s.deckFile!;
    expect(savedDeck(projectSaveText(s, 'browser'))).toEqual({ kind: 'file', path: deckFile.name, text: deckFile.text });
    expect(savedDeck(projectSaveText(s, 'desktop'))).toEqual({ kind: 'file', path: deckFile.name });
    const chosen = studyReducer(s, { type: 'embedDeckChosen', embed: true });
    expect(savedDeck(projectSaveText(chosen, 'desktop'))).toEqual({ kind: 'file', path: deckFile.name, text: deckFile.text });
    const off = studyReducer(s, { type: 'embedDeckChosen', embed: false });
    expect(savesDeckInside(off, 'browser')).toBe(false);
    // The option is not a document edit: no undo step.
    expect(chosen.doc).toBe(s.doc);
  });

  it('reopening a file with its deck inside restores deck and project, keeps embedding, and saves the same text again', () => {
    const s = demoState();
    const saved = projectSaveText(s, 'browser')!;
    const reopened = studyReducer(s, openProjectAction('saved.blockwise.json', saved, null));
    expect(reopened.deckFile).toEqual(s.deckFile);
    // The document holds the reference only: the deck text stays out of the edits and the undo history.
    expect(reopened.doc!.present).toEqual(s.doc!.present);
    expect(reopened.embedDeck).toBe(true);
    expect(projectSaveText(reopened, 'desktop')).toBe(saved);
  });
});
