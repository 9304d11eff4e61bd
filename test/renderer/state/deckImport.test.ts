/**
 * Importing a deck into the study: parsed by engine/study's parseDeckText
 * (CSV or JSON by content, docs/deck-format.md) before the store sees it.
 */
import { describe, expect, it } from 'vitest';
import { deckToJson } from '../../../engine/propulsion';
import { parseDeckText } from '../../../engine/study';
import { deckImportAction } from '../../../renderer/state/documentActions';
import { studyReducer } from '../../../renderer/state/studyReducer';
import { demoState } from '../support/studyHarness';
import { demoFiles, fixtureText } from '../support/fakeBridge';

function demoDeckAsJson(): string {
  const csv = parseDeckText(demoFiles().deckText, 'demo-engine.deck.csv');
  if (!csv.ok) throw new Error('demo deck does not parse');
  return deckToJson(csv.value);
}

describe('deckImportAction', () => {
  it('accepts the JSON deck form (docs/deck-format.md "JSON form") and the CSV form alike', () => {
    const json = deckImportAction({ name: 'engine.deck.json', text: demoDeckAsJson() });
    expect(json).toEqual({ ok: true, action: { type: 'deckImported', deckFile: { name: 'engine.deck.json', text: demoDeckAsJson() } } });
    // The form is chosen by content, not by name: JSON text under a .csv name still reads as JSON.
    expect(deckImportAction({ name: 'misnamed.csv', text: demoDeckAsJson() }).ok).toBe(true);
    expect(deckImportAction({ name: 'demo-engine.deck.csv', text: demoFiles().deckText }).ok).toBe(true);
  });

  it('refuses a bad CSV deck with the parser\'s line and column (fixtures/bad-decks/expected.json)', () => {
    const expected = JSON.parse(fixtureText('fixtures/bad-decks/expected.json')) as Record<string, string>;
    for (const name of ['non-numeric-cell.csv', 'ragged-row.csv', 'unknown-unit.csv']) {
      const r = deckImportAction({ name, text: fixtureText(`fixtures/bad-decks/${name}`) });
      if (r.ok) throw new Error(`${name} was accepted`);
      expect(r.message).toContain(expected[name]!);
      expect(r.message).toContain('nothing changed');
    }
  });

  it('refuses a truncated JSON deck with its line and column (fixtures/corpus/expected.json)', () => {
    const expected = (JSON.parse(fixtureText('fixtures/corpus/expected.json')) as Record<string, { where: string; fragment: string }>)['truncated.deck.json']!;
    const r = deckImportAction({ name: 'truncated.deck.json', text: fixtureText('fixtures/corpus/truncated.deck.json') });
    if (r.ok) throw new Error('truncated deck was accepted');
    expect(r.message).toContain(expected.where);
    expect(r.message).toContain(expected.fragment);
  });

  it('a refused deck yields no action, so the study is left deep-equal to before', () => {
    const s0 = demoState();
    const snapshot = structuredClone({ deckFile: s0.deckFile, project: s0.doc!.present, past: s0.doc!.past.length, saved: s0.savedAtStep });
    const r = deckImportAction({ name: 'non-numeric-cell.csv', text: fixtureText('fixtures/bad-decks/non-numeric-cell.csv') });
    expect(r.ok).toBe(false);
    const s1 = r.ok ? studyReducer(s0, r.action) : s0;
    expect({ deckFile: s1.deckFile, project: s1.doc!.present, past: s1.doc!.past.length, saved: s1.savedAtStep }).toEqual(snapshot);
  });
});
