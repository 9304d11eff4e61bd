import { fireEvent, screen, waitFor } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { openProjectAction } from '../../../renderer/state/documentActions';
import { studyReducer } from '../../../renderer/state/studyReducer';
import { emptyStudy, type StudyState } from '../../../renderer/state/studyState';
import { EngineView } from '../../../renderer/views/EngineView';
import { createDeckCache, runEngineRequest } from '../../../renderer/worker/engineRunner';
import type { CycleViewReply } from '../../../renderer/worker/engineProtocol';
import type { LiveStudy } from '../../../renderer/worker/useEngine';
import { demoFiles, fixtureText } from '../support/fakeBridge';
import { renderWithStudy, TEST_CHART } from '../support/studyHarness';

const FT = 0.3048;
const CYCLE_NAME = 'demo-turbofan.cycle.json';
const cycleText = fixtureText('fixtures/cycle/demo-turbofan.cycle.json');
const NO_RESULT: LiveStudy = { snapshot: null, snapshotRevision: -1, revision: 0, stale: false, running: false, failure: null };

/** The demo project with the demo cycle as its engine (small deck grid, fast), opened with the cycle file. */
function cycleState(units: StudyState['units']): StudyState {
  const d = demoFiles();
  const json = JSON.parse(d.projectText) as { engine: { deck: unknown } };
  json.engine.deck = { kind: 'cycle', path: CYCLE_NAME, grid: { altitudes: ['0 ft', '20000 ft', '45000 ft'], machs: [0, 0.45, 0.9] } };
  const opened = studyReducer(emptyStudy(), openProjectAction(d.projectName, JSON.stringify(json), { name: CYCLE_NAME, text: cycleText }));
  if (opened.doc === null) throw new Error(JSON.stringify(opened.openIssues));
  return { ...opened, units };
}

/** The view's default point, run directly (the reference the screen must show, converted). */
let reference: CycleViewReply;
beforeAll(() => {
  const s = cycleState('si');
  const r = runEngineRequest(
    {
      kind: 'cycleView',
      project: s.doc!.present,
      deckFile: s.deckFile!,
      query: { point: { altitude_m: 30000 * FT, mach: 0.78, isaDev_K: 0, throttle: { kind: 'rating', rating: 'maxCruise' } }, curveRating: 'maxCruise', curveFanSpeed: 0.9 },
    },
    createDeckCache(),
  );
  if (!r.ok) throw new Error(JSON.stringify(r.error));
  reference = r.value as CycleViewReply;
});

function numberIn(text: string): number {
  return Number(text.replace(/,/g, '').match(/[-+]?\d+(?:\.\d+)?/)![0]);
}

describe('EngineView of a cycle project', () => {
  it('shows the inputs, the station table and both plots with uninstalled and installed series', async () => {
    renderWithStudy(<EngineView live={NO_RESULT} chartSize={TEST_CHART} />, cycleState('customary'));
    const table = await screen.findByTestId('cycle-stations', {}, { timeout: 15000 });
    expect(table.querySelectorAll('tbody tr')).toHaveLength(reference.point.stations.length);
    expect(screen.getByTestId('cycle-station-4').textContent).toContain('HP turbine inlet');
    expect(screen.getByTestId('cycle-inputs').textContent).toContain(`Bypass ratio${reference.spec.design.bypassRatio}`);
    expect(screen.getByTestId('cycle-point-status').textContent).toMatch(/^converged/);
    for (const id of ['chart-cycle-thrust-rating', 'chart-cycle-tsfc-rating', 'chart-cycle-thrust-fan', 'chart-cycle-tsfc-fan']) {
      const chart = screen.getByTestId(id);
      expect(chart.querySelector('svg')).not.toBeNull();
      // one uninstalled and one installed series per altitude: sea level, 15,000, 30,000 and 40,000 ft
      for (const alt of ['0 ft', '15,000 ft', '30,000 ft', '40,000 ft']) {
        expect(chart.textContent).toContain(`uninstalled, ${alt}`);
        expect(chart.textContent).toContain(`installed, ${alt}`);
      }
    }
  });

  it('shows temperatures, pressures and flows in the chosen units', async () => {
    const tit_K = reference.point.turbineInletTemperature_K!;
    const pt3 = reference.point.stations.find((s) => s.station === '3')!.totalPressure_Pa;
    const w2 = reference.point.stations.find((s) => s.station === '2')!.massFlow_kg_s;
    const first = renderWithStudy(<EngineView live={NO_RESULT} chartSize={TEST_CHART} />, cycleState('customary'));
    await screen.findByTestId('cycle-stations', {}, { timeout: 15000 });
    const titC = screen.getByTestId('cycle-tit').textContent!;
    // degC = K - 273.15 (definition, SI Brochure 9th ed. 2.3.1)
    expect(titC).toMatch(/°C|degC/);
    expect(Math.abs(numberIn(titC) - (tit_K - 273.15))).toBeLessThan(1);
    const row3 = screen.getByTestId('cycle-station-3').querySelectorAll('td');
    // 1 inHg (conventional) = 3386.389 Pa, 1 lb = 0.45359237 kg (NIST SP 811 appendix B)
    expect(row3[3]!.textContent).toMatch(/inHg/);
    expect(numberIn(row3[3]!.textContent!) / (pt3 / 3386.389)).toBeCloseTo(1, 3);
    const row2 = screen.getByTestId('cycle-station-2').querySelectorAll('td');
    expect(row2[4]!.textContent).toMatch(/lb\/s/);
    expect(numberIn(row2[4]!.textContent!) / (w2 / 0.45359237)).toBeCloseTo(1, 3);
    first.unmount();
    renderWithStudy(<EngineView live={NO_RESULT} chartSize={TEST_CHART} />, cycleState('si'));
    await screen.findByTestId('cycle-stations', {}, { timeout: 15000 });
    const titK = screen.getByTestId('cycle-tit').textContent!;
    expect(titK).toMatch(/K$/);
    expect(numberIn(titK) / tit_K).toBeCloseTo(1, 3);
    const row2si = screen.getByTestId('cycle-station-2').querySelectorAll('td');
    expect(row2si[4]!.textContent).toMatch(/kg\/s/);
    expect(numberIn(row2si[4]!.textContent!) / w2).toBeCloseTo(1, 3);
  });

  it('shows the status and message of a point that does not match, and no figures', async () => {
    renderWithStudy(<EngineView live={NO_RESULT} chartSize={TEST_CHART} />, cycleState('si'));
    await screen.findByTestId('cycle-stations', {}, { timeout: 15000 });
    fireEvent.change(screen.getByTestId('cycle-throttle'), { target: { value: 'fanSpeed' } });
    const fan = screen.getByTestId('cycle-point-fan');
    fireEvent.change(fan, { target: { value: '1.6' } });
    fireEvent.blur(fan);
    await waitFor(() => expect(screen.getByTestId('cycle-point-status').textContent).toMatch(/did not match: invalid condition .*fan speed 1\.6/), { timeout: 15000 });
    expect(screen.queryByTestId('cycle-stations')).toBeNull();
    expect(screen.queryByTestId('cycle-thrust')).toBeNull();
    expect(document.body.textContent).not.toContain('NaN');
  });
});

describe('importing a cycle file', () => {
  it('makes the project engine that cycle (one undoable step), and refuses a cycle file with errors, naming it', async () => {
    const { deckImportAction } = await import('../../../renderer/state/documentActions');
    const s = cycleState('si');
    const asFileDeck = studyReducer(s, { type: 'deckImported', deckFile: { name: 'other.deck.csv', text: demoFiles().deckText } });
    expect(asFileDeck.doc!.present.engine.deck.kind).toBe('file');
    const imported = deckImportAction({ name: CYCLE_NAME, text: cycleText });
    expect(imported.ok).toBe(true);
    if (!imported.ok) return;
    const after = studyReducer(asFileDeck, imported.action);
    expect(after.doc!.present.engine.deck).toEqual({ kind: 'cycle', path: CYCLE_NAME });
    expect(after.deckFile?.name).toBe(CYCLE_NAME);
    const bad = deckImportAction({ name: 'broken.cycle.json', text: '{"format": "blockwise-cycle"}' });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.message).toMatch(/^Cycle file broken\.cycle\.json not imported, nothing changed: /);
  });
});
