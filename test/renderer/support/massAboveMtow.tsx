import { fireEvent, screen, waitFor } from '@testing-library/react';
import type { ReactElement } from 'react';
import { expect } from 'vitest';
import { demoState, renderWithStudy } from './studyHarness';

/** 1 lb = 0.45359237 kg exactly (NIST SP 811, appendix B). */
const KG_PER_LB = 0.45359237;

/**
 * Renders an analysis view on the demo in customary units, waits for its chart, then commits 1.5 x MTOW (in lb) in
 * its mass field: the view must say why there is no result (the MTOW limit), show no NaN, and drop the chart.
 */
export async function expectMassAboveMtowRefused(view: ReactElement, ids: { readonly chart: string; readonly massField: string; readonly failure: string }, timeout_ms: number): Promise<void> {
  const initial = { ...demoState(), units: 'customary' as const };
  renderWithStudy(view, initial);
  await screen.findByTestId(ids.chart, {}, { timeout: timeout_ms });
  const field = screen.getByTestId(ids.massField);
  const mtow_lb = initial.doc!.present.airframe.weights.maxTakeoff / KG_PER_LB;
  fireEvent.change(field, { target: { value: `${Math.round(mtow_lb * 1.5)} lb` } });
  fireEvent.blur(field);
  const failure = await screen.findByTestId(ids.failure, {}, { timeout: timeout_ms });
  expect(failure.textContent).toMatch(/at most the MTOW/);
  expect(failure.textContent).not.toMatch(/NaN/);
  await waitFor(() => expect(screen.queryByTestId(ids.chart)).toBeNull());
}
