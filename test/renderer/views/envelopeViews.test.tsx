import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { formatQuantity } from '../../../engine/units';
import { EnvelopeView } from '../../../renderer/views/EnvelopeView';
import { demoState, renderWithStudy, TEST_CHART, NO_LIVE_STUDY, SI_TEXT } from '../support/studyHarness';
import { expectMassAboveMtowRefused } from '../support/massAboveMtow';

const live = NO_LIVE_STUDY;

describe('EnvelopeView', () => {
  it('draws the envelope with its limit lines and lists the ceilings in customary units', async () => {
    const initial = { ...demoState(), units: 'customary' as const };
    renderWithStudy(<EnvelopeView live={live} chartSize={TEST_CHART} />, initial);
    const chart = await screen.findByTestId('chart-envelope', {}, { timeout: 20000 });
    expect(chart.querySelector('[role="img"]')?.getAttribute('aria-label')).toMatch(/altitude against Mach/);
    const table = screen.getByTestId('envelope-ceilings');
    const text = table.textContent ?? '';
    expect(text).toMatch(/absolute/);
    expect(text).toMatch(/service/);
    expect(text).toMatch(/ft\/min/);
    expect(text).toMatch(/ ft/);
    // 100 ft/min for the service ceiling, shown through the one formatter (common practice definition).
    expect(text).toContain(formatQuantity((100 * 0.3048) / 60, 'climbRate', 'customary'));
    const all = screen.getByRole('heading', { name: 'Level-flight envelope' }).parentElement!.textContent ?? '';
    expect(all).not.toMatch(SI_TEXT);
    expect(all).not.toMatch(/NaN/);
    // Legend names the limit lines.
    expect(chart.textContent).toMatch(/stall/);
    expect(chart.textContent).toMatch(/buffet onset/);
    expect(chart.textContent).toMatch(/VMO\/MMO/);
  }, 30000);

  it('shows why there is no envelope for a mass above MTOW, without NaN', async () => {
    await expectMassAboveMtowRefused(<EnvelopeView live={live} chartSize={TEST_CHART} />, { chart: 'chart-envelope', massField: 'field-envelope-mass', failure: 'envelope-failure' }, 20000);
  }, 30000);
});
