import { render, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { LineChartPanel, markKeys, markLabels } from '../../../renderer/components/LineChartPanel';

// Two inlet designs can share a marker at the same Mach (e.g. the thrust
// minimum where both thrust curves bottom out on the same sample); React
// requires sibling keys to be unique (React docs, "Rules of keys": common practice).

const ROWS = [
  { mach: 0.3752, t0: 2282.4, d0: 2350.1, t1: 2270.9 },
  { mach: 0.4501, t0: 2278.2, d0: 1900.7, t1: 2266.3 },
  { mach: 0.5248502732003647, t0: 2290.6, d0: 1800.2, t1: 2280.1 },
  { mach: 0.8183, t0: 2471.3, d0: 2471.3, t1: 2460.8 },
];
const SERIES = [
  { key: 't0', name: 'thrust available, A' },
  { key: 'd0', name: 'drag' },
  { key: 't1', name: 'thrust available, B' },
];
const MARKS = [
  { x: 0.4501, label: 'thrust minimum' },
  { x: 0.4501, label: 'thrust minimum' },
  { x: 0.8183, label: 'high crossover' },
];

afterEach(() => vi.restoreAllMocks());

function tickTexts(chart: HTMLElement, axis: 'xAxis' | 'yAxis'): string[] {
  const orientation = axis === 'xAxis' ? 'bottom' : 'left';
  return [...chart.querySelectorAll(`text.recharts-cartesian-axis-tick-value[orientation="${orientation}"]`)].map((t) => t.textContent ?? '');
}

/** Renders the panel and waits until recharts has drawn the axes and the marks (it draws them after mounting). */
async function renderPanel(): Promise<HTMLElement> {
  const { getByTestId } = render(
    <LineChartPanel
      title="t"
      testId="chart-test"
      data={ROWS}
      xKey="mach"
      xLabel="Mach"
      yLabel="force (lbf)"
      series={SERIES}
      verticalMarks={MARKS}
      points={MARKS.map((m, i) => ({ x: m.x, y: 2278.2 - i, label: m.label }))}
      size={{ width: 400, height: 200 }}
    />,
  );
  const chart = getByTestId('chart-test');
  await waitFor(() => expect(tickTexts(chart, 'xAxis').length).toBeGreaterThan(0), { timeout: 10_000 });
  await waitFor(() => expect(chart.querySelectorAll('.recharts-reference-line').length).toBe(MARKS.length), { timeout: 10_000 });
  return chart;
}

describe('LineChartPanel', () => {
  it('markKeys gives two inlets marking the same point at the same Mach different keys', () => {
    const keys = markKeys(MARKS);
    expect(new Set(keys).size).toBe(MARKS.length);
  });

  it('markLabels says a label repeated nearby once, keeps it far away, and joins other labels nearby', () => {
    const marks = [
      { at: 0.878, label: 'high crossover' },
      { at: 0.882, label: 'high crossover' },
      { at: 0.95, label: 'high crossover' },
    ];
    // 500 px per Mach: 0.004 Mach = 2 px (shared), 0.072 Mach = 36 px (own label).
    expect(markLabels(marks, 500, 'left')).toEqual(['high crossover', null, 'high crossover']);
    expect(markLabels([...marks, { at: 0.88, label: 'thrust minimum' }], 500, 'left')).toEqual(['high crossover / thrust minimum', null, 'high crossover', null]);
    // Legs starting within a label's thickness share one label (whole trip, 8 h on ~500 px: about 60 px/h).
    const legs = [2, 3, 6.6, 6.98, 7.0].map((t, i) => ({ at: t, label: `leg ${i + 2}` }));
    expect(markLabels(legs, 60, 'left')).toEqual(['leg 2', 'leg 3', 'leg 4', 'leg 5 / 6', null]);
    expect(markLabels(legs, 5, 'left')).toEqual(['leg 2 / 3', null, 'leg 4 / 5 / 6', null, null]);
  });

  it('markLabels gives ceilings closer than a label thickness one shared label, far ones their own', () => {
    const ceilings = [
      { at: 40577, label: 'cruise ceiling' },
      { at: 43452, label: 'absolute ceiling' },
      { at: 42489, label: 'service ceiling' },
    ];
    // 0.0045 px/ft: the three lie within 13 px of the top one (2,875 ft = 12.9 px).
    expect(markLabels(ceilings, 0.0045, 'top')).toEqual([null, 'absolute / service / cruise ceiling', null]);
    // 0.012 px/ft: absolute and service 11.6 px apart share; cruise 2,875 ft below the top is 35 px down: its own.
    expect(markLabels(ceilings, 0.012, 'top')).toEqual(['cruise ceiling', 'absolute / service ceiling', null]);
    // Far apart: every mark its own label.
    expect(markLabels(ceilings, 1, 'top')).toEqual(['cruise ceiling', 'absolute ceiling', 'service ceiling']);
    // Labels without a shared first or last word are joined whole.
    expect(markLabels([{ at: 1, label: 'FL 1' }, { at: 1.001, label: 'tropopause' }], 1, 'top')).toEqual([null, 'tropopause / FL 1']);
    expect(markLabels([], 1, 'top')).toEqual([]);
  });

  it('LineChartPanel draws a repeated mark once labelled', async () => {
    const chart = await renderPanel();
    const labels = [...chart.querySelectorAll('text.recharts-label')].map((t) => t.textContent);
    expect(labels.filter((t) => t === 'thrust minimum')).toHaveLength(1);
    expect(labels.filter((t) => t === 'high crossover')).toHaveLength(1);
  });

  it('LineChartPanel draws two equal marks without a React key warning', async () => {
    const errors = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    const chart = await renderPanel();
    expect(chart.querySelectorAll('.recharts-reference-dot').length).toBe(MARKS.length);
    const keyWarnings = errors.mock.calls.filter((c) => c.map(String).join(' ').includes('same key'));
    expect(keyWarnings).toEqual([]);
  });

  it('LineChartPanel labels the Mach axis with round ticks (no float noise)', async () => {
    const chart = await renderPanel();
    const xTicks = tickTexts(chart, 'xAxis');
    // Heckbert nice numbers for 0.3752..0.8183 Mach: steps of 0.1 (test/reference/niceTicksReference.py).
    expect(xTicks).toEqual(['0.3', '0.4', '0.5', '0.6', '0.7', '0.8', '0.9']);
    const yTicks = tickTexts(chart, 'yAxis');
    expect(yTicks.length).toBeGreaterThanOrEqual(3);
    for (const t of yTicks) expect(t).toMatch(/^\d{1,3}(,\d{3})*$/);
  });
});
