import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { formatQuantity } from '../../../engine/units/quantity';
import { AirframeView } from '../../../renderer/views/AirframeView';
import { CompareView } from '../../../renderer/views/CompareView';
import { CrossoverView } from '../../../renderer/views/CrossoverView';
import { EngineView } from '../../../renderer/views/EngineView';
import { ResultsView } from '../../../renderer/views/ResultsView';
import type { StudySnapshot } from '../../../renderer/worker/engineProtocol';
import type { EngineClient } from '../../../renderer/worker/engineClient';
import type { InletComparisonResult } from '../../../engine/analysis/inletComparison';
import type { LiveStudy } from '../../../renderer/worker/useEngine';
import { cannedClient, demoState, renderWithStudy, TEST_CHART } from '../support/studyHarness';
import { flyStudy } from '../support/demoStudy';

let snapshot: StudySnapshot;
beforeAll(() => {
  const s = demoState();
  snapshot = flyStudy({ project: s.doc!.present, deckFile: s.deckFile });
});

function live(over: Partial<LiveStudy> = {}): LiveStudy {
  return { snapshot, snapshotRevision: 1, revision: 1, stale: false, running: false, failure: null, ...over };
}

describe('ResultsView', () => {
  it('links a caution to its leg: clicking it highlights the row and marks the time', () => {
    const climb = snapshot.mission.legs.find((l) => l.kind === 'climb')!;
    const withCaution: StudySnapshot = {
      ...snapshot,
      mission: {
        ...snapshot.mission,
        cautions: [{ id: 'residual_climb_low', severity: 'caution', message: 'Residual climb rate 250 ft/min', legIndex: climb.index, legName: climb.name, time_s: climb.endTime_s }],
      },
    };
    renderWithStudy(<ResultsView live={live({ snapshot: withCaution })} chartSize={TEST_CHART} />);
    const rowIndex = withCaution.mission.legs.indexOf(climb);
    expect(screen.getByTestId(`legs-row-${rowIndex}`).className).not.toContain('highlighted');
    fireEvent.click(within(screen.getByTestId('caution-0')).getByRole('button'));
    expect(screen.getByTestId(`legs-row-${rowIndex}`).className).toContain('highlighted');
    expect(screen.getByTestId('highlight-note').textContent).toContain(`leg ${climb.index + 1}`);
  });

  it('marks the figures stale while a newer edit is flown, and shows why a project cannot be flown', () => {
    renderWithStudy(
      <ResultsView
        live={live({ stale: true, failure: { kind: 'project', issues: [{ path: 'airframe.weights.maxZeroFuel', value: '1', expected: 'x', message: 'airframe.weights.maxZeroFuel: too heavy' }] } })}
        chartSize={TEST_CHART}
      />,
    );
    expect(screen.getByTestId('results-stale').textContent).toMatch(/last project that could be flown/);
    expect(screen.getByTestId('results-failure').textContent).toContain('too heavy');
    expect(screen.getByTestId('headline-block-fuel').textContent).toBe(formatQuantity(snapshot.mission.blockFuel_kg, 'mass', 'customary'));
  });
});

describe('plots of the editor views', () => {
  it('AirframeView draws the drag polar, EngineView the lapse and TSFC curves and the deck summary', () => {
    renderWithStudy(<AirframeView live={live()} chartSize={TEST_CHART} />);
    expect(screen.getByTestId('chart-polar').querySelector('svg')).not.toBeNull();
    expect(screen.getByTestId('chart-polar').textContent).toContain('M 0.78');
  });

  it('EngineView shows the deck summary and both lapse plots', () => {
    renderWithStudy(<EngineView live={live()} chartSize={TEST_CHART} />);
    expect(screen.getByTestId('deck-summary').textContent).toContain(String(snapshot.deck.points));
    // The demo deck is generated from the demo cycle (fixtures/demo/NOTE.md): not parametric, so the summary shows
    // its title as the file has it and never calls it parametric (the doubled-word case: test of deckTitleText).
    expect(snapshot.deck.parametric).toBe(false);
    expect(screen.getByTestId('deck-summary').textContent).toContain(snapshot.deck.title);
    expect(screen.getByTestId('deck-summary').textContent!.match(/parametric/gi)).toBeNull();
    expect(screen.getByTestId('chart-thrust-lapse').querySelector('svg')).not.toBeNull();
    expect(screen.getByTestId('chart-tsfc').querySelector('svg')).not.toBeNull();
    expect(screen.queryByTestId('deck-errors')).toBeNull();
  });
});

describe('CrossoverView', () => {
  it('computes the curves for the chosen condition and lists the marked Machs', async () => {
    renderWithStudy(<CrossoverView live={live()} chartSize={TEST_CHART} />);
    const chart = await screen.findByTestId('chart-crossover', {}, { timeout: 15000 });
    expect(chart.querySelector('svg')).not.toBeNull();
    expect(screen.getByTestId('crossover-markers').textContent).toMatch(/high crossover/);
    fireEvent.click(screen.getByTestId('crossover-all-inlets'));
    await waitFor(() => expect(screen.getAllByTestId('crossover-message')).toHaveLength(2), { timeout: 15000 });
  });

  it('shows a bad altitude inline and keeps the last curves', async () => {
    renderWithStudy(<CrossoverView live={live()} chartSize={TEST_CHART} />);
    await screen.findByTestId('chart-crossover', {}, { timeout: 15000 });
    const field = screen.getByTestId('field-crossover-altitude');
    fireEvent.change(field, { target: { value: 'high' } });
    fireEvent.blur(field);
    expect(screen.getByTestId('field-crossover-altitude-error').textContent).toMatch(/does not start with a number/);
    expect(screen.getByTestId('chart-crossover')).toBeInTheDocument();
  });
});

describe('CompareView', () => {
  it('shows the comparison side by side with B - A and the breakdown whose parts add up to the total', async () => {
    const names = demoState().doc!.present.inlets.map((i) => i.name);
    const design = (name: string, fuel: number, lowMach: number | null = 0.5) => ({
      name,
      blockFuel_kg: fuel,
      blockTime_s: 20000,
      tripFuel_kg: fuel - 500,
      takeoffMass_kg: 16000,
      crossover: { status: 'ok' as const, lowMach, highMach: 0.82, minThrustMach: 0.7 },
      ceilings: [{ name: 'service', altitude_m: 12000 }] as unknown as InletComparisonResult['designs'][0]['ceilings'],
      cautions: [],
    });
    const canned: InletComparisonResult = {
      designs: [design(names[0]!, 4000), design(names[1]!, 4025, null)],
      difference: { blockFuel_kg: 25, blockTime_s: 0, tripFuel_kg: 25, takeoffMass_kg: 25, lowMach: 0, highMach: 0, ceilings: [{ name: 'service', altitude_m: 0 }] },
      crossoverCondition: { altitude_m: 10000, mass_kg: 15000, rating: 'maxCruise', isaDev_K: 0 },
      breakdown: {
        method: 'shapley',
        parts: [
          { factor: 'recovery', blockFuel_kg: 40 },
          { factor: 'spillage', blockFuel_kg: -5 },
          { factor: 'externalDrag', blockFuel_kg: 10 },
          { factor: 'weight', blockFuel_kg: -20 },
        ],
        total_kg: 25,
        sumOfParts_kg: 25,
        missions: 16,
        description: 'Shapley attribution',
      },
    };
    const requests: string[] = [];
    const engine: EngineClient = {
      run: (request) => {
        requests.push(request.kind);
        return { outcome: Promise.resolve({ ok: true, value: canned } as never), cancel: () => undefined };
      },
      dispose: () => undefined,
    };
    renderWithStudy(<CompareView live={live()} chartSize={TEST_CHART} />, demoState(), engine);
    fireEvent.click(screen.getByTestId('compare-run'));
    await screen.findByTestId('compare-table', {}, { timeout: 15000 });
    expect(requests).toEqual(['compare']);
    expect(screen.getByTestId('compare-design-name-0').textContent).toBe(`A: ${names[0]}`);
    expect(screen.getByTestId('compare-design-name-1').textContent).toBe(`B: ${names[1]}`);
    // 25 kg = 55 lb (25 / 0.45359237 = 55.1, NIST SP 811)
    expect(screen.getByTestId('compare-diff-block-fuel').textContent).toBe('55 lb');
    expect(screen.getByTestId('compare-breakdown').querySelectorAll('li')).toHaveLength(4);
    expect(screen.getByTestId('chart-breakdown').querySelector('svg')).not.toBeNull();
    // B has no low crossover: its cell reads — and the note says why.
    expect(screen.getByText('— / 0.820')).toBeInTheDocument();
    expect(screen.getByText(/A crossover shown as — does not exist there/)).toBeInTheDocument();
  });

  it('runs the real comparison in-thread and shows its table or the reason it stopped', async () => {
    renderWithStudy(<CompareView live={live()} chartSize={TEST_CHART} />);
    fireEvent.click(screen.getByTestId('compare-run'));
    await waitFor(() => expect(screen.queryByTestId('compare-table') ?? screen.queryByTestId('compare-failure')).not.toBeNull(), { timeout: 30000 });
    const failure = screen.queryByTestId('compare-failure');
    if (failure) expect(failure.textContent).toMatch(/inlet comparison: the mission with .* failed/);
    else expect(screen.getAllByTestId(/^compare-design-name-/)).toHaveLength(2);
  }, 60000);

  it('cancels a run and says so', async () => {
    renderWithStudy(<CompareView live={live()} chartSize={TEST_CHART} />);
    fireEvent.click(screen.getByTestId('trade-run'));
    fireEvent.click(screen.getByTestId('trade-progress-cancel'));
    expect(await screen.findByTestId('trade-progress-cancelled', {}, { timeout: 15000 })).toBeInTheDocument();
    expect(screen.queryByTestId('trade-table')).toBeNull();
  });

  it('flies the payload-range diagram and draws it, or says which mission failed', async () => {
    renderWithStudy(<CompareView live={live()} chartSize={TEST_CHART} />);
    fireEvent.click(screen.getByTestId('payload-range-run'));
    await waitFor(() => expect(screen.queryByTestId('chart-payload-range') ?? screen.queryByTestId('payload-range-failure')).not.toBeNull(), { timeout: 30000 });
    const failure = screen.queryByTestId('payload-range-failure');
    if (failure) expect(failure.textContent).toMatch(/payload-range: the .* mission \(payload \d+ kg\) failed/);
    else expect(screen.getByTestId('chart-payload-range').querySelector('svg')).not.toBeNull();
  }, 60000);

  it('draws a payload-range result from maximum payload at zero range to the ferry point', async () => {
    const NMI = 1852;
    const point = (kind: string, payload_kg: number, range_nmi: number) => ({ kind, payload_kg, range_m: range_nmi * NMI });
    const canned = {
      maxPayload: point('maxPayload', 1000, 2500),
      points: [point('maxPayload', 1000, 2500), point('mtowFullFuel', 700, 3100), point('ferry', 0, 3400)],
      missions: 3,
      note: 'reserves carried',
    };
    renderWithStudy(<CompareView live={live()} chartSize={TEST_CHART} />, demoState(), cannedClient(canned));
    fireEvent.click(screen.getByTestId('payload-range-run'));
    const chart = await screen.findByTestId('chart-payload-range', {}, { timeout: 15000 });
    expect(chart.querySelectorAll('path.recharts-curve').length).toBeGreaterThan(0);
    expect(screen.getByText('reserves carried')).toBeInTheDocument();
  });
});
