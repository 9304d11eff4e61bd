/** The parameter-study view and its 'sweep' worker request (the CLI's `blockwise sweep` code path). */
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { flySweepCase, parseProjectData, parseVary } from '../../../engine/project';
import { SAFETY_NOTICE_LINES } from '../../../engine/core';
import { prepareStudy } from '../../../engine/study';
import { sweepCsv, sweepRows } from '../../../renderer/charts/sweepSeries';
import type { SweepReply } from '../../../renderer/worker/engineProtocol';
import { createDeckCache, runEngineRequest } from '../../../renderer/worker/engineRunner';
import type { LiveStudy } from '../../../renderer/worker/useEngine';
import { SweepView } from '../../../renderer/views/SweepView';
import { demoFiles } from '../support/fakeBridge';
import { demoState, renderWithStudy, TEST_CHART } from '../support/studyHarness';
import { flyStudy } from '../support/demoStudy';

const VARY = 'mission.solve.range=2000nmi:3000nmi:500nmi';

let reply: SweepReply;
beforeAll(() => {
  const s = demoState();
  const r = runEngineRequest({ kind: 'sweep', project: s.doc!.present, deckFile: s.deckFile, vary: VARY }, createDeckCache());
  if (!r.ok) throw new Error(JSON.stringify(r.error));
  reply = r.value as SweepReply;
});

describe("the 'sweep' request", () => {
  it("flies each case as the CLI's flySweepCase does from the project file's own text: equal block fuel", () => {
    const files = demoFiles();
    const fileDoc: unknown = JSON.parse(files.projectText);
    const axis = parseVary(fileDoc, VARY);
    if (!axis.ok) throw new Error(axis.error.message);
    const parsed = parseProjectData(fileDoc);
    if (!parsed.ok) throw new Error('demo project does not parse');
    const study = prepareStudy(parsed.value, { name: files.deckName, text: files.deckText });
    if (!study.ok) throw new Error('demo study does not build');
    expect(reply.rows).toHaveLength(3);
    for (let k = 0; k < 3; k++) {
      const cli = flySweepCase(fileDoc, [axis.value], k, { deck: study.value.deck });
      expect(reply.rows[k]!.inputs).toEqual(cli.inputs);
      expect(reply.rows[k]!.status).toBe(cli.status);
      expect(reply.rows[k]!.blockFuel_kg).toBe(cli.blockFuel_kg);
    }
  });

  it("the case at the project's own range is the flight results' mission, and more range burns more fuel", () => {
    const s = demoState();
    const mission = flyStudy({ project: s.doc!.present, deckFile: s.deckFile }).mission;
    // The demo's range is 3000 nmi (the file's mission.solve.range), the last case of 2000:3000:500.
    expect(String(reply.rows[2]!.inputs[0])).toMatch(/^3000\b/);
    expect(reply.rows[2]!.blockFuel_kg).toBe(mission.blockFuel_kg);
    // Breguet range equation (common practice): at a fixed payload, block fuel rises with range.
    const ok = reply.rows.filter((row) => row.status === 'ok');
    for (let i = 1; i < ok.length; i++) expect(ok[i]!.blockFuel_kg).toBeGreaterThan(ok[i - 1]!.blockFuel_kg);
  });

  it('refuses a field the project file does not have, saying which', () => {
    const s = demoState();
    const r = runEngineRequest({ kind: 'sweep', project: s.doc!.present, deckFile: s.deckFile, vary: 'mission.solve.rnage=1:2:1' }, createDeckCache());
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.kind).toBe('analysis');
      expect(JSON.stringify(r.error)).toContain('rnage');
    }
  });

  it('reports progress per case and stops when cancelled', () => {
    const s = demoState();
    const progress: [number, number][] = [];
    const r = runEngineRequest({ kind: 'sweep', project: s.doc!.present, deckFile: s.deckFile, vary: VARY }, createDeckCache(), {
      onProgress: (done, total) => progress.push([done, total]),
      shouldCancel: () => progress.length >= 1,
    });
    expect(progress).toEqual([[1, 3]]);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatchObject({ kind: 'analysis', code: 'cancelled' });
  });

  it('refuses more cases than the view flies, before flying any', () => {
    const s = demoState();
    const r = runEngineRequest({ kind: 'sweep', project: s.doc!.present, deckFile: s.deckFile, vary: 'mission.solve.range=1000nmi:3000nmi:1nmi' }, createDeckCache());
    expect(r.ok).toBe(false);
    if (!r.ok) expect(JSON.stringify(r.error)).toContain('2001 cases');
  });

  it('writes the CSV with the notice as # lines first, then the header and one line per case', () => {
    const lines = sweepCsv(reply).trimEnd().split('\n');
    const comments = lines.filter((l) => l.startsWith('#'));
    expect(comments.length).toBeGreaterThanOrEqual(SAFETY_NOTICE_LINES.length);
    expect(lines.slice(0, comments.length).every((l) => l.startsWith('#'))).toBe(true);
    expect(comments.join(' ')).toContain(SAFETY_NOTICE_LINES[0]!.trim());
    expect(lines[comments.length]).toMatch(/^case,mission\.solve\.range,status,blockFuel\[kg\]/);
    expect(lines).toHaveLength(comments.length + 1 + 3);
    // Conversion, NIST SP 811 appendix B (exact): 1 lb = 0.45359237 kg.
    const rows = sweepRows(reply, 'customary');
    expect(rows[0]!.blockFuel).toBeCloseTo(reply.rows[0]!.blockFuel_kg / 0.45359237, 9);
  });
});

describe('SweepView', () => {
  const live = { snapshot: null, snapshotRevision: 0, revision: 0, stale: false, running: false, failure: null } as unknown as LiveStudy;

  it('flies the cases, draws block fuel against the input and tables the cases in customary units only; exports the CSV', async () => {
    const exported: { text: string; name: string }[] = [];
    renderWithStudy(<SweepView live={live} chartSize={TEST_CHART} onExportText={(text, name) => exported.push({ text, name })} />);
    fireEvent.change(screen.getByTestId('sweep-field'), { target: { value: 'mission.solve.range' } });
    fireEvent.change(screen.getByTestId('sweep-from'), { target: { value: '2000' } });
    fireEvent.change(screen.getByTestId('sweep-to'), { target: { value: '3000' } });
    fireEvent.change(screen.getByTestId('sweep-step'), { target: { value: '500' } });
    fireEvent.click(screen.getByTestId('sweep-run'));
    await waitFor(() => expect(screen.getByTestId('sweep-table')).toBeTruthy(), { timeout: 30000 });
    expect(screen.getByTestId('chart-sweep').querySelector('svg')).not.toBeNull();
    const table = screen.getByTestId('sweep-table').textContent!;
    expect(screen.getAllByTestId(/^sweep-row-/)).toHaveLength(3);
    expect(table).not.toMatch(/\bkg\b/);
    expect(table).toMatch(/\blb\b/);
    expect(screen.getByTestId('chart-sweep').textContent).toMatch(/\(lb\)/);
    fireEvent.click(screen.getByTestId('sweep-export'));
    expect(exported).toHaveLength(1);
    expect(exported[0]!.text.startsWith('#')).toBe(true);
    expect(exported[0]!.name).toMatch(/-study\.csv$/);
  }, 60000);
});
