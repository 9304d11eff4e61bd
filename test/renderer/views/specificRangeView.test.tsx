import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { SpecificRangeView } from '../../../renderer/views/SpecificRangeView';
import { demoState, renderWithStudy, TEST_CHART, NO_LIVE_STUDY, SI_TEXT } from '../support/studyHarness';
import { expectMassAboveMtowRefused } from '../support/massAboveMtow';

const live = NO_LIVE_STUDY;

describe('SpecificRangeView', () => {
  it('draws specific range against Mach per altitude in nmi per 1000 lb, with the optimum altitude', async () => {
    const initial = { ...demoState(), units: 'customary' as const };
    renderWithStudy(<SpecificRangeView live={live} chartSize={TEST_CHART} />, initial);
    const chart = await screen.findByTestId('chart-specific-range', {}, { timeout: 30000 });
    expect(chart.querySelector('[role="img"]')?.getAttribute('aria-label')).toMatch(/Specific range against Mach/);
    expect(chart.textContent).toMatch(/nmi\/\(1000 lb\)/);
    expect(screen.getByTestId('sr-optimum').textContent).toMatch(/Optimum altitude [\d,]+ ft|No optimum altitude/);
    const table = screen.getByTestId('sr-table').textContent ?? '';
    expect(table).toMatch(/ ft/);
    const all = screen.getByRole('heading', { name: 'Specific range' }).parentElement!.textContent ?? '';
    expect(all).not.toMatch(SI_TEXT);
    expect(all).not.toMatch(/NaN/);
  }, 40000);

  it('shows why there is no result for a mass above MTOW, without NaN', async () => {
    await expectMassAboveMtowRefused(<SpecificRangeView live={live} chartSize={TEST_CHART} />, { chart: 'chart-specific-range', massField: 'field-sr-mass', failure: 'sr-failure' }, 30000);
  }, 40000);
});
