import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { CrossoverView } from '../../../renderer/views/CrossoverView';
import { demoState, renderWithStudy, TEST_CHART, NO_LIVE_STUDY } from '../support/studyHarness';

const live = NO_LIVE_STUDY;

describe('CrossoverView limits', () => {
  it('lists and draws the stall, buffet-onset and VMO/MMO limits beside the crossovers', async () => {
    renderWithStudy(<CrossoverView live={live} chartSize={TEST_CHART} />, { ...demoState(), units: 'customary' });
    const chart = await screen.findByTestId('chart-crossover', {}, { timeout: 20000 });
    const limits = screen.getByTestId('crossover-limits').textContent ?? '';
    // The project has VMO and MMO, so the speed limit is always there.
    expect(limits).toMatch(/VMO\/MMO/);
    expect(chart.textContent).toMatch(/limit: VMO\/MMO/);
    expect(limits).not.toMatch(/NaN/);
  }, 30000);
});
