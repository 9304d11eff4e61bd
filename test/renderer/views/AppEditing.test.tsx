import { CURRENT_VERSION } from '../../../engine/project/projectSchema';
import { act, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { AUTOSAVE_EVERY_MS } from '../../../renderer/bridge/autosaveTimer';
import { SAFETY_NOTICE_LINES } from '../../../engine/core/notice';
import { App } from '../../../renderer/App';
import { deckToJson } from '../../../engine/propulsion';
import { parseDeckText } from '../../../engine/study';
import { createInThreadClient } from '../../../renderer/worker/engineClient';
import { expectClose } from '../../support/assertInDelta';
import { createFakeBridge, fixtureText, demoFiles, type FakeBridge } from '../support/fakeBridge';
import { TEST_CHART } from '../support/studyHarness';

function numberIn(text: string | null): number {
  const m = /-?\d[\d,]*(?:\.\d+)?/.exec(text ?? '');
  if (m === null) throw new Error(`no number in "${text}"`);
  return Number(m[0].replace(/,/g, ''));
}

async function blockFuel(): Promise<number> {
  const el = await screen.findByTestId('headline-block-fuel', {}, { timeout: 15000 });
  return numberIn(el.textContent);
}

async function waitForChange(previous: number): Promise<number> {
  let now = previous;
  await waitFor(
    () => {
      now = numberIn(screen.getByTestId('headline-block-fuel').textContent);
      expect(now).not.toBe(previous);
    },
    { timeout: 15000 },
  );
  return now;
}

/**
 * The block fuel of the document on screen once its own study has landed: `isTheDocument` holds (the document that
 * was opened is the one shown), its headline is there and not marked out of date. Opening a document drops the last
 * figures at once (useLiveStudy), so a headline shown for it is its own flight, never the previous document's.
 */
async function settledBlockFuel(isTheDocument: () => void): Promise<number> {
  let fuel = Number.NaN;
  await waitFor(
    () => {
      isTheDocument();
      expect(screen.queryByTestId('results-stale')).toBeNull();
      fuel = numberIn(screen.getByTestId('headline-block-fuel').textContent);
    },
    { timeout: 15000 },
  );
  return fuel;
}

/** The demo deck in its JSON form (docs/deck-format.md), with every point's fuel flow times `fuelFlowFactor`. */
function demoDeckJson(fuelFlowFactor = 1): string {
  const csv = parseDeckText(demoFiles().deckText, 'demo-engine.deck.csv');
  if (!csv.ok) throw new Error('demo deck does not parse');
  if (fuelFlowFactor === 1) return deckToJson(csv.value);
  const json = JSON.parse(deckToJson(csv.value)) as { columns: string[]; points: number[][] };
  const ff = json.columns.indexOf('fuelFlow_kg_s');
  expect(ff).toBeGreaterThanOrEqual(0);
  for (const p of json.points) p[ff] = p[ff]! * fuelFlowFactor;
  return JSON.stringify(json);
}

function renderApp(setup: (bridge: FakeBridge) => void = () => undefined) {
  const bridge = createFakeBridge();
  setup(bridge);
  render(<App bridge={bridge} engine={createInThreadClient()} chartSize={TEST_CHART} />);
  return bridge;
}

describe('the App with the demo study', () => {
  it('shows an invalid CD0 inline, keeps the last result, then re-flies a valid one; Ctrl+Z restores it', async () => {
    renderApp();
    const before = await blockFuel();
    fireEvent.click(screen.getByTestId('view-tab-airframe'));
    const cd0 = screen.getByTestId('field-cd0-3') as HTMLInputElement;
    const cd0Before = Number(cd0.value);
    expect(cd0Before).toBeGreaterThan(0);

    fireEvent.change(cd0, { target: { value: '0.02 parsecs' } });
    fireEvent.keyDown(cd0, { key: 'Enter' });
    expect(screen.getByTestId('field-cd0-3-error').textContent).toMatch(/unknown unit "parsecs"/);
    for (const line of SAFETY_NOTICE_LINES) expect(screen.getByTestId('safety-notice').textContent).toContain(line);
    fireEvent.click(screen.getByTestId('view-tab-results'));
    expect(await blockFuel()).toBe(before);

    fireEvent.click(screen.getByTestId('view-tab-airframe'));
    const field = screen.getByTestId('field-cd0-3') as HTMLInputElement;
    fireEvent.change(field, { target: { value: String(cd0Before + 0.004) } });
    fireEvent.keyDown(field, { key: 'Enter' });
    expect(screen.queryByTestId('field-cd0-3-error')).toBeNull();
    fireEvent.click(screen.getByTestId('view-tab-results'));
    // Parabolic polar CD = CD0 + K (CL - CLmd)^2 (Raymer ch. 12): more CD0 at the cruise Mach (row 3, Mach 0.8; the
    // demo cruises at 0.78) is more cruise drag, hence more fuel. (Row 0, Mach 0, is not used: more low-speed drag
    // shortens the idle descent, and on the demo's cycle deck, whose flight idle is high, that saves more idle fuel
    // than the longer cruise costs, by `blockwise fly` on a copy with CD0(M 0) 0.0212: 4,413 against 4,417 kg.)
    const after = await waitForChange(before);
    expect(after).toBeGreaterThan(before);

    act(() => {
      window.dispatchEvent(new KeyboardEvent('keydown', { key: 'z', ctrlKey: true }));
    });
    expect(await waitForChange(after)).toBe(before);
    fireEvent.click(screen.getByTestId('view-tab-airframe'));
    expect(Number((screen.getByTestId('field-cd0-3') as HTMLInputElement).value)).toBe(cd0Before);
    act(() => {
      window.dispatchEvent(new KeyboardEvent('keydown', { key: 'y', ctrlKey: true }));
    });
    expect(Number((screen.getByTestId('field-cd0-3') as HTMLInputElement).value)).toBe(cd0Before + 0.004);
  }, 60000);

  it('switching units changes the display only: kg = lb x 0.45359237', async () => {
    renderApp();
    const lb = await blockFuel();
    expect(screen.getByTestId('headline-block-fuel').textContent).toMatch(/lb$/);
    fireEvent.change(screen.getByTestId('unit-system-toggle'), { target: { value: 'si' } });
    const text = screen.getByTestId('headline-block-fuel').textContent;
    expect(text).toMatch(/kg$/);
    // NIST SP 811 appendix B: 1 lb = 0.45359237 kg; both figures rounded to whole units
    expectClose(numberIn(text), lb * 0.45359237, { abs: 1 }, 'NIST SP 811');
    expect(screen.queryByTestId('results-stale')).toBeNull();
  }, 60000);

  it('refuses a bad deck on import: the message says line and column, and the deck, results and history stay', async () => {
    const bridge = renderApp();
    const before = await blockFuel();
    fireEvent.click(screen.getByTestId('view-tab-engine'));
    const deckLine = screen.getByTestId('engine-deck-source').textContent;
    bridge.nextDeck = { name: 'non-numeric-cell.csv', text: fixtureText('fixtures/bad-decks/non-numeric-cell.csv') };
    fireEvent.click(screen.getByTestId('command-importDeck'));
    // The located message is the deck parser's own (fixtures/bad-decks/expected.json, docs/deck-format.md "Errors").
    const expected = (JSON.parse(fixtureText('fixtures/bad-decks/expected.json')) as Record<string, string>)['non-numeric-cell.csv']!;
    await waitFor(() => expect(screen.getByTestId('app-message').textContent).toContain(expected), { timeout: 15000 });
    expect(screen.getByTestId('app-message').textContent).toMatch(/nothing changed/);
    expect(screen.getByTestId('engine-deck-source').textContent).toBe(deckLine);
    expect(screen.queryByTestId('deck-errors')).toBeNull();
    fireEvent.click(screen.getByTestId('view-tab-results'));
    expect(screen.queryByTestId('results-stale')).toBeNull();
    expect(await blockFuel()).toBe(before);
    // No undo step was recorded: the document is still unedited.
    expect(bridge.documentStates.at(-1)).toEqual({ name: 'demo.blockwise.json', dirty: false });
  }, 60000);

  it('imports the JSON form of the deck in use and flies it to the same block fuel', async () => {
    const bridge = renderApp();
    const before = await blockFuel();
    // docs/deck-format.md "JSON form": deckToJson writes the JSON form with exact round trip, so the same deck as JSON flies the same mission.
    bridge.nextDeck = { name: 'same-engine.deck.json', text: demoDeckJson() };
    fireEvent.click(screen.getByTestId('command-importDeck'));
    await waitFor(() => expect(screen.getByTestId('app-message').textContent).toMatch(/^Imported deck same-engine\.deck\.json\./), { timeout: 15000 });
    fireEvent.click(screen.getByTestId('view-tab-engine'));
    expect(screen.getByTestId('engine-deck-source').textContent).toContain('same-engine.deck.json');
    fireEvent.click(screen.getByTestId('view-tab-results'));
    await waitFor(() => expect(screen.queryByTestId('results-stale')).toBeNull(), { timeout: 15000 });
    expect(await blockFuel()).toBe(before);
    await waitFor(() => expect(bridge.documentStates.at(-1)).toEqual({ name: 'demo.blockwise.json', dirty: true }));
  }, 60000);

  it('undo after a deck import re-flies the old deck and marks the project unedited; redo flies the import again', async () => {
    const bridge = renderApp();
    const before = await blockFuel();
    // The same deck burning 10 % more fuel at every point: by Breguet's range equation (fuel burn grows with
    // specific fuel consumption) the mission must take more fuel; only the direction is checked.
    bridge.nextDeck = { name: 'thirsty.deck.json', text: demoDeckJson(1.1) };
    fireEvent.click(screen.getByTestId('command-importDeck'));
    const thirsty = await waitForChange(before);
    expect(thirsty).toBeGreaterThan(before);
    await waitFor(() => expect(bridge.documentStates.at(-1)).toEqual({ name: 'demo.blockwise.json', dirty: true }));

    fireEvent.click(screen.getByTestId('command-undo'));
    expect(await waitForChange(thirsty)).toBe(before);
    fireEvent.click(screen.getByTestId('view-tab-engine'));
    expect(screen.getByTestId('engine-deck-source').textContent).toContain('demo-engine.deck.csv');
    expect(screen.getByTestId('engine-deck-source').textContent).not.toContain('thirsty');
    await waitFor(() => expect(bridge.documentStates.at(-1)).toEqual({ name: 'demo.blockwise.json', dirty: false }));

    fireEvent.click(screen.getByTestId('command-redo'));
    expect(screen.getByTestId('engine-deck-source').textContent).toContain('thirsty.deck.json');
    fireEvent.click(screen.getByTestId('view-tab-results'));
    expect(await waitForChange(before)).toBe(thirsty);
    await waitFor(() => expect(bridge.documentStates.at(-1)).toEqual({ name: 'demo.blockwise.json', dirty: true }));
  }, 60000);

  it('exports the time history and legs as CSV and prints the report through the bridge', async () => {
    const bridge = renderApp();
    await blockFuel();
    fireEvent.click(screen.getByTestId('command-exportHistory'));
    fireEvent.click(screen.getByTestId('command-exportLegs'));
    fireEvent.click(screen.getByTestId('command-print'));
    await waitFor(() => expect(bridge.exports).toHaveLength(2), { timeout: 15000 });
    expect(bridge.exports.map((e) => e.name)).toEqual(['demo-time-history.csv', 'demo-legs.csv']);
    expect(bridge.exports[0]!.mime).toBe('text/csv');
    const exported = bridge.exports[0]!.text.split('\n');
    // The safety notice heads every export as # comment lines (DESIGN.md §7).
    expect(exported[0]).toBe(`# ${SAFETY_NOTICE_LINES[0]}`);
    // In the display units on screen (customary here): each header names its unit (docs/results-csv.md).
    expect(exported.find((l) => !l.startsWith('#'))).toMatch(/^time\[h\],distance\[nmi\],altitude\[ft\]/);
    const legs = bridge.exports[1]!.text.split('\n').find((l) => !l.startsWith('#'));
    expect(legs).toMatch(/fuel\[lb\]$/);
    await waitFor(() => expect(bridge.prints).toEqual(['demo-report.pdf']), { timeout: 15000 });
    // Mounted only to print: there while printing, gone after.
    expect(bridge.printedReportText).toContain(SAFETY_NOTICE_LINES[0]);
    expect(bridge.printedReportText).toContain(screen.getByTestId('headline-block-fuel').textContent);
    expect(screen.queryByTestId('print-report')).toBeNull();
  }, 60000);

  it('saves the project as JSON that reads back, and marks the document clean', async () => {
    const bridge = renderApp();
    await blockFuel();
    fireEvent.click(screen.getByTestId('command-save'));
    await waitFor(() => expect(bridge.saves).toHaveLength(1), { timeout: 15000 });
    expect(bridge.saves[0]!.name).toBe('demo.blockwise.json');
    expect(JSON.parse(bridge.saves[0]!.text)).toMatchObject({ format: 'blockwise-project', version: CURRENT_VERSION });
    expect(screen.getByTestId('document-name').textContent).toBe('demo.blockwise.json');
  }, 60000);

  it('the browser build saves the deck inside the project: reopening it later flies that deck again', async () => {
    const bridge = renderApp();
    const before = await blockFuel();
    // A deck burning 20 % more fuel everywhere needs more block fuel (Breguet's range equation; direction only).
    const thirstyText = demoDeckJson(1.2);
    bridge.nextDeck = { name: 'thirsty.deck.json', text: thirstyText };
    fireEvent.click(screen.getByTestId('command-importDeck'));
    const thirsty = await waitForChange(before);
    fireEvent.click(screen.getByTestId('view-tab-engine'));
    expect((screen.getByTestId('engine-embed-deck') as HTMLInputElement).checked).toBe(true);
    fireEvent.click(screen.getByTestId('command-save'));
    await waitFor(() => expect(bridge.saves).toHaveLength(1), { timeout: 15000 });
    const saved = JSON.parse(bridge.saves[0]!.text) as { engine: { deck: unknown } };
    expect(saved.engine.deck).toEqual({ kind: 'file', path: 'thirsty.deck.json', text: thirstyText });
    // The bridge has the text before the app marks the document saved; until then opening the demo would ask before
    // discarding the "unsaved" import, and nothing would open.
    await waitFor(() => expect(screen.getByTestId('document-name').textContent).toBe('demo.blockwise.json'), { timeout: 15000 });

    fireEvent.click(screen.getByTestId('command-openDemo'));
    fireEvent.click(screen.getByTestId('view-tab-results'));
    // The demo opened afresh: no question asked, and nothing to undo (the deck import was an undoable step).
    const demoAgain = await settledBlockFuel(() => {
      expect(screen.queryByTestId('confirm-dialog')).toBeNull();
      expect((screen.getByTestId('command-undo') as HTMLButtonElement).disabled).toBe(true);
    });
    expect(demoAgain).toBe(before);
    bridge.nextProject = { name: 'saved.blockwise.json', text: bridge.saves[0]!.text };
    fireEvent.click(screen.getByTestId('command-open'));
    const reopened = await settledBlockFuel(() => expect(screen.getByTestId('document-name').textContent).toBe('saved.blockwise.json'));
    expect(reopened).toBe(thirsty);
    fireEvent.click(screen.getByTestId('view-tab-engine'));
    expect(screen.getByTestId('engine-deck-source').textContent).toContain('loaded thirsty.deck.json');
  }, 60000);

  it('the recovery copy in the browser build carries the imported deck, so recovering restores it', async () => {
    vi.useFakeTimers({ toFake: ['setInterval', 'clearInterval'] });
    try {
      const bridge = renderApp();
      await blockFuel();
      const text = demoFiles().deckText.replace(/\r?\n$/, '') + '\n';
      bridge.nextDeck = { name: 'copy.deck.csv', text };
      fireEvent.click(screen.getByTestId('command-importDeck'));
      await waitFor(() => expect(bridge.documentStates.at(-1)?.dirty).toBe(true), { timeout: 15000 });
      await act(async () => {
        vi.advanceTimersByTime(AUTOSAVE_EVERY_MS);
      });
      await waitFor(() => expect(bridge.autosaves.length).toBeGreaterThan(0));
      const copy = JSON.parse(bridge.autosaves.at(-1)!.text) as { engine: { deck: unknown } };
      expect(copy.engine.deck).toEqual({ kind: 'file', path: 'copy.deck.csv', text });
    } finally {
      vi.useRealTimers();
    }
  }, 60000);

  it('offers unsaved work from an earlier session and restores it with the deck in use', async () => {
    const edited = demoFiles().projectText.replace('"payload": "1600 lb"', '"payload": "1800 lb"');
    expect(edited).not.toBe(demoFiles().projectText);
    renderApp((b) => {
      b.recovery = { name: 'demo.blockwise.json', text: edited, savedAt_ms: Date.UTC(2026, 0, 2, 3, 4), projectPath: null };
    });
    const before = await blockFuel();
    expect(screen.getByTestId('recovery-offer').textContent).toContain('2026-01-02 03:04 UTC');
    fireEvent.click(screen.getByTestId('recovery-restore'));
    // 200 lb more payload over the same range needs more fuel (Breguet: fuel grows with the weight carried)
    const after = await waitForChange(before);
    expect(after).toBeGreaterThan(before);
    expect(screen.queryByTestId('recovery-offer')).toBeNull();
    expect(screen.getByTestId('document-name').textContent).toBe('demo.blockwise.json (edited)');
  }, 60000);

  it('discarding the recovery copy tells the bridge', async () => {
    const bridge = renderApp((b) => {
      b.recovery = { name: 'x.blockwise.json', text: '{}', savedAt_ms: 0, projectPath: null };
    });
    fireEvent.click(await screen.findByTestId('recovery-discard', {}, { timeout: 15000 }));
    await waitFor(() => expect(bridge.discarded).toBe(1), { timeout: 15000 });
    expect(screen.queryByTestId('recovery-offer')).toBeNull();
  }, 60000);

  it('a project that cannot be read lists its issues and keeps the open study', async () => {
    const bridge = renderApp();
    const before = await blockFuel();
    bridge.nextProject = { name: 'weights-out-of-order.blockwise.json', text: fixtureText('fixtures/bad-projects/weights-out-of-order.blockwise.json') };
    fireEvent.click(screen.getByTestId('command-open'));
    const issues = await screen.findByTestId('open-issues', {}, { timeout: 15000 });
    // fixtures/bad-projects/expected.json: the path and a fragment of the message each bad file must produce
    const expected = (JSON.parse(fixtureText('fixtures/bad-projects/expected.json')) as Record<string, { path: string; fragment: string }>)['weights-out-of-order.blockwise.json']!;
    expect(issues.textContent).toContain(expected.path);
    expect(issues.textContent).toContain(expected.fragment);
    expect(numberIn(screen.getByTestId('headline-block-fuel').textContent)).toBe(before);
    expect(screen.getByTestId('document-name').textContent).toBe('demo.blockwise.json');
  }, 60000);

  it('follows the menu: undo and redo, and tells the shell when the document is edited', async () => {
    const bridge = renderApp();
    await blockFuel();
    fireEvent.click(screen.getByTestId('view-tab-mission'));
    fireEvent.click(screen.getByTestId('leg-0-duplicate'));
    expect(screen.getByTestId('document-name').textContent).toBe('demo.blockwise.json (edited)');
    await waitFor(() => expect(bridge.documentStates.at(-1)).toEqual({ name: 'demo.blockwise.json', dirty: true }), { timeout: 15000 });
    const legs = () => screen.getAllByTestId(/^leg-\d+$/).length;
    const n = legs();
    act(() => bridge.menu('undo'));
    expect(legs()).toBe(n - 1);
    await waitFor(() => expect(bridge.documentStates.at(-1)).toEqual({ name: 'demo.blockwise.json', dirty: false }), { timeout: 15000 });
    act(() => bridge.menu('redo'));
    expect(legs()).toBe(n);
    // Figures for the newest edit (an out-of-date result would be exported only after a question).
    await waitFor(() => expect(screen.queryByTestId('summary-stale')).toBeNull(), { timeout: 15000 });
    act(() => bridge.menu('exportResultsCsv'));
    await waitFor(() => expect(bridge.exports.map((e) => e.name)).toEqual(['demo-time-history.csv', 'demo-legs.csv']), { timeout: 15000 });
  }, 60000);

  it('a project that breaks a rule is not flown: the last result stays, marked stale, with the rule shown', async () => {
    renderApp();
    const before = await blockFuel();
    fireEvent.click(screen.getByTestId('view-tab-airframe'));
    const mtow = screen.getByTestId('field-mtow');
    // below the demo's MZFW of 21,500 lb: the rule is at maxZeroFuel, so the edit is taken and the project listed as broken
    fireEvent.change(mtow, { target: { value: '21000' } });
    fireEvent.keyDown(mtow, { key: 'Enter' });
    expect(screen.getByTestId('project-issues').textContent).toContain('maximum zero-fuel weight');
    fireEvent.click(screen.getByTestId('view-tab-results'));
    await screen.findByTestId('results-stale', {}, { timeout: 15000 });
    expect(screen.getByTestId('results-failure').textContent).toContain('is above the maximum takeoff weight');
    expect(numberIn(screen.getByTestId('headline-block-fuel').textContent)).toBe(before);
    fireEvent.click(screen.getByTestId('command-undo'));
    await waitFor(() => expect(screen.queryByTestId('results-stale')).toBeNull(), { timeout: 15000 });
    expect(screen.queryByTestId('results-failure')).toBeNull();
  }, 60000);
});
