/**
 * A deck file's text saved inside the project (`engine.deck.text`,
 * docs/project-format.md "Deck forms"): written by projectToJson, read back by
 * parseProject, used by prepareStudy when no file is read; files without it
 * (and older versions) load as before.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { embeddedDeckFile, parseProject, projectToJson, withEmbeddedDeckText, withoutEmbeddedDeckText } from '../../../engine/project';
import { deckToJson } from '../../../engine/propulsion';
import { parseDeckText, prepareStudy } from '../../../engine/study';

const read = (path: string) => readFileSync(new URL(`../../../${path}`, import.meta.url), 'utf8');
const demoText = read('fixtures/demo/demo.blockwise.json');
const deckText = read('fixtures/demo/demo-engine.deck.csv');

function demoProject() {
  const p = parseProject(demoText, 'demo.blockwise.json');
  if (!p.ok) throw new Error(p.error.map((i) => i.message).join('; '));
  return p.value;
}

describe('engine.deck.text', () => {
  it('round-trips the deck text exactly through save and reopen, CSV and JSON deck forms', () => {
    const project = demoProject();
    const deck = project.engine.deck;
    if (deck.kind !== 'file') throw new Error('the demo names a deck file');
    const csvDeck = parseDeckText(deckText, deck.path);
    if (!csvDeck.ok) throw new Error('demo deck does not parse');
    for (const text of [deckText, deckToJson(csvDeck.value)]) {
      const saved = projectToJson(withEmbeddedDeckText(project, { name: deck.path, text }));
      const reopened = parseProject(saved, 'saved.blockwise.json');
      if (!reopened.ok) throw new Error(reopened.error.map((i) => i.message).join('; '));
      expect(embeddedDeckFile(reopened.value)).toEqual({ name: deck.path, text });
      // Without the text, the reopened project is the project that was saved.
      expect(withoutEmbeddedDeckText(reopened.value)).toEqual(project);
    }
  });

  it('prepareStudy flies the saved text when the door reads no file: the same deck as reading the file', () => {
    const project = demoProject();
    const path = project.engine.deck.kind === 'file' ? project.engine.deck.path : '';
    const fromFile = prepareStudy(project, { name: path, text: deckText });
    const inside = parseProject(projectToJson(withEmbeddedDeckText(project, { name: path, text: deckText })), 'x.blockwise.json');
    if (!inside.ok || !fromFile.ok) throw new Error('study not prepared');
    const fromInside = prepareStudy(inside.value, null);
    if (!fromInside.ok) throw new Error('embedded study not prepared');
    expect(fromInside.value.deck).toEqual(fromFile.value.deck);
    // Without the text and without a file there is no deck: the reference alone cannot fly.
    expect(prepareStudy(project, null).ok).toBe(false);
  });

  it('is written only for the file the project names', () => {
    const project = demoProject();
    expect(withEmbeddedDeckText(project, { name: 'another.deck.csv', text: deckText })).toBe(project);
    expect(withEmbeddedDeckText(project, null)).toBe(project);
    expect(embeddedDeckFile(project)).toBeNull();
  });

  it('an empty text is refused at engine.deck.text', () => {
    const doc = JSON.parse(demoText) as { engine: { deck: Record<string, unknown> } };
    doc.engine.deck.text = '';
    const r = parseProject(JSON.stringify(doc), 'empty-text.blockwise.json');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.map((i) => i.path)).toContain('engine.deck.text');
  });

  it('old files without it still load (fixtures/old-versions v1 and v2, the current demo)', () => {
    for (const path of ['fixtures/old-versions/v1.blockwise.json', 'fixtures/old-versions/v2.blockwise.json', 'fixtures/demo/demo.blockwise.json']) {
      const r = parseProject(read(path), path);
      expect(r.ok, path).toBe(true);
      if (r.ok) expect(embeddedDeckFile(r.value)).toBeNull();
    }
  });
});
