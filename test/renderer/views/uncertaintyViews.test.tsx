/**
 * The uncertainty pieces of the app: the band and histogram with P(B burns
 * less) in the comparison, the one-design band in the results view, and the
 * declared uncertainties edited beside the inputs (an inlet's recovery).
 * The statistics themselves are checked in test/engine/uncertainty.
 */
import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import type { MissionResult } from '../../../engine/mission/missionTypes';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import { runUncertainty } from '../../../engine/uncertainty/uncertaintyRun';
import { UncertaintyBand } from '../../../renderer/components/UncertaintyBand';
import { CompareView } from '../../../renderer/views/CompareView';
import { InletsView } from '../../../renderer/views/InletsView';
import type { LiveStudy } from '../../../renderer/worker/useEngine';
import { demoFiles } from '../support/fakeBridge';
import { cannedClient, demoState, renderWithStudy, TEST_CHART } from '../support/studyHarness';

function live(): LiveStudy {
  return { snapshot: null, failure: null, stale: false, running: false } as unknown as LiveStudy;
}

/** A result with the real shape (the demo's declared inputs) from a stand-in solver: B - A between -40 and -20 kg in every sample. */
function cannedResult() {
  const state = demoState();
  const project = state.doc!.present;
  const deck = expectOk(parseDeckCsv(demoFiles().deckText, 'demo deck'), 'deck');
  let k = 0;
  const solve = (m: { airframe: { oew_kg: number }; propulsion: { inletName: string } }) =>
    ({ status: 'ok', statusMessage: '', blockFuel_kg: 4800 + (m.propulsion.inletName === 'short' ? -30 + 10 * Math.sin(k++) : m.airframe.oew_kg * 0) }) as unknown as MissionResult;
  return expectOk(runUncertainty({ project, resources: { deck }, designs: ['long pitot', 'short'], samples: 40, seed: 3, solve: solve as never }), 'canned');
}

describe('UncertaintyBand', () => {
  it('shows the bands, the share of samples where B wins and the histogram of B - A', async () => {
    const value = cannedResult();
    const requests: string[] = [];
    renderWithStudy(<UncertaintyBand designs={['long pitot', 'short']} testId="u" chartSize={TEST_CHART} />, demoState(), cannedClient(value, requests));
    fireEvent.click(screen.getByTestId('u-run'));
    const table = await screen.findByTestId('u-table');
    expect(requests).toEqual(['uncertainty']);
    expect(within(table).getByText('B - A')).toBeInTheDocument();
    // Every sample has B - A between -40 and -20 kg: B wins in all of them.
    expect(screen.getByTestId('u-p-b-better').textContent).toMatch(/B burns less block fuel than A in 100 % of 40 samples/);
    expect(screen.getByTestId('u-histogram').querySelector('svg')).not.toBeNull();
    expect(screen.getByTestId('u-drivers').textContent).toMatch(/Spearman/);
  });
});

describe('+1 % recovery by method in the trade panel', () => {
  it('lists each method with its trade factor, or why it does not apply', async () => {
    const value = {
      rows: [
        { id: 'raymerHeld', label: "Raymer's rule, fuel flow held at the power setting", blockFuelPerPercent_kg: -65, halfStep_kg: -65, converged: true, baselineBlockFuel_kg: 4761, note: null },
        { id: 'cycle', label: 'the cycle', blockFuelPerPercent_kg: null, halfStep_kg: null, converged: false, baselineBlockFuel_kg: null, note: 'the engine is a deck, not a cycle' },
      ],
      relativeToFirst: [0, null],
      missions: 5,
      description: 'by each method',
    };
    const requests: string[] = [];
    renderWithStudy(<CompareView live={live()} chartSize={TEST_CHART} />, demoState(), cannedClient(value, requests));
    fireEvent.click(screen.getByTestId('recovery-methods-run'));
    const table = await screen.findByTestId('recovery-methods-table');
    expect(requests).toEqual(['recoveryByMethod']);
    expect(within(table).getByText('the engine is a deck, not a cycle')).toBeInTheDocument();
    // -65 kg = -143.3 lb (NIST SP 811: 1 lb = 0.45359237 kg), in the demo's customary units.
    expect(within(table).getByText(/-143\.3 lb/)).toBeInTheDocument();
  });
});

describe('declared uncertainties beside the inputs', () => {
  it('declares an inlet recovery uncertain, edits its sd, and makes it certain again', () => {
    const { probe } = renderWithStudy(<InletsView live={live()} chartSize={TEST_CHART} />);
    const before = probe.current.doc!.present.uncertainty!.inputs.length;
    // The demo already declares both inlets' recovery; remove the short inlet's, then declare it again.
    fireEvent.click(screen.getByTestId('field-inlet-1-uncertain-recovery-remove'));
    expect(probe.current.doc!.present.uncertainty!.inputs.length).toBe(before - 1);
    fireEvent.click(screen.getByTestId('field-inlet-1-uncertain-add-recovery'));
    const inputs = probe.current.doc!.present.uncertainty!.inputs;
    expect(inputs.length).toBe(before);
    expect(inputs[inputs.length - 1]).toEqual({ input: 'recovery', inlet: 'short', distribution: { kind: 'normal', mean: 0, sd: 0.002 }, reason: '' });
    const sd = screen.getByTestId('field-inlet-1-uncertain-recovery-sd') as HTMLInputElement;
    fireEvent.change(sd, { target: { value: '0.005' } });
    fireEvent.keyDown(sd, { key: 'Enter' });
    const last = probe.current.doc!.present.uncertainty!.inputs.at(-1)!;
    expect(last).toMatchObject({ input: 'recovery', distribution: { kind: 'normal', mean: 0, sd: 0.005 } });
  });
});
