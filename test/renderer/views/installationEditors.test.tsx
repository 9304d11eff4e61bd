import { fireEvent, render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { describeInstallationMethod } from '../../../engine/propulsion';
import { InstallationFields } from '../../../renderer/components/InstallationFields';
import { StudyContext } from '../../../renderer/state/studyContext';
import { studyReducer } from '../../../renderer/state/studyReducer';
import type { StudyState } from '../../../renderer/state/studyState';
import { EngineView } from '../../../renderer/views/EngineView';
import { InletsView } from '../../../renderer/views/InletsView';
import { MissionView } from '../../../renderer/views/MissionView';
import { ResultsView } from '../../../renderer/views/ResultsView';
import type { StudySnapshot } from '../../../renderer/worker/engineProtocol';
import { createDeckCache, runEngineRequest } from '../../../renderer/worker/engineRunner';
import type { LiveStudy } from '../../../renderer/worker/useEngine';
import { expectClose } from '../../support/assertInDelta';
import { demoState, renderWithStudy } from '../support/studyHarness';

const NO_RESULT: LiveStudy = { snapshot: null, snapshotRevision: -1, revision: 0, stale: false, running: false, failure: null };

const undo = (s: StudyState) => studyReducer(s, { type: 'undo' });

function type(testId: string, text: string) {
  const f = screen.getByTestId(testId) as HTMLInputElement;
  fireEvent.change(f, { target: { value: text } });
  fireEvent.blur(f);
}

function study(s: StudyState) {
  return runEngineRequest({ kind: 'study', project: s.doc!.present, deckFile: s.deckFile }, createDeckCache());
}

describe('installation assumption editors (engine view)', () => {
  it('sets the recovery method to Raymer\'s rule, undo restores it, and the study flies the method chosen', () => {
    const { probe } = renderWithStudy(<EngineView live={NO_RESULT} />);
    const before = probe.current.doc!.present.engine.installation.recoveryMethod;
    fireEvent.change(screen.getByTestId('field-recovery-method'), { target: { value: 'raymer' } });
    expect(probe.current.doc!.present.engine.installation.recoveryMethod).toBe('raymer');
    const r = study(probe.current);
    expect(r.ok).toBe(true);
    if (r.ok) expect((r.value as StudySnapshot).deck.installationMethod).toBe('raymerCorrections');
    expect(undo(probe.current).doc!.present.engine.installation.recoveryMethod).toBe(before);
  });

  it('C_ram, the supersonic form and the fuel-flow convention reach the project; undo restores each', () => {
    const { probe } = renderWithStudy(<EngineView live={NO_RESULT} />);
    fireEvent.change(screen.getByTestId('field-recovery-method'), { target: { value: 'raymer' } });
    type('field-c-ram', '1.2');
    expect(probe.current.doc!.present.engine.installation.ramRecoveryFactor).toBe(1.2);
    expect(undo(probe.current).doc!.present.engine.installation.ramRecoveryFactor).toBeUndefined();
    fireEvent.change(screen.getByTestId('field-ram-fuel-flow'), { target: { value: 'scaledWithRecovery' } });
    expect(probe.current.doc!.present.engine.installation.ramFuelFlow).toBe('scaledWithRecovery');
    expect(undo(probe.current).doc!.present.engine.installation.ramFuelFlow).toBeUndefined();
    fireEvent.change(screen.getByTestId('field-ram-supersonic'), { target: { value: 'held' } });
    expect(probe.current.doc!.present.engine.installation.ramSupersonicForm).toBe(false);
    // The edited project is what the study is asked to fly, and it flies (a scaled fuel flow is a valid assumption).
    expect(study(probe.current).ok).toBe(true);
  });

  it('a C_ram that is not a number stays in the field with a located message and leaves the project alone', () => {
    const { probe } = renderWithStudy(<EngineView live={NO_RESULT} />);
    fireEvent.change(screen.getByTestId('field-recovery-method'), { target: { value: 'raymer' } });
    type('field-c-ram', 'lots');
    expect(screen.getByTestId('field-c-ram-error').textContent).toMatch(/number/);
    expect(probe.current.doc!.present.engine.installation.ramRecoveryFactor).toBeUndefined();
  });

  it('offers the deck-sensitivities method disabled, with the reason, on a deck without sensitivity columns, and refuses it', () => {
    const initial = demoState();
    let state = initial;
    const dispatch = (a: Parameters<typeof studyReducer>[1]) => {
      state = studyReducer(state, a);
    };
    render(
      <StudyContext.Provider value={{ state: initial, dispatch }}>
        <InstallationFields hasSensitivities={false} />
      </StudyContext.Provider>,
    );
    const option = screen.getByRole('option', { name: /sensitivity columns \(unavailable\)/ }) as HTMLOptionElement;
    expect(option.disabled).toBe(true);
    expect(screen.getByTestId('field-recovery-method-unavailable-deckSensitivities').textContent).toMatch(/no installation-sensitivity columns/);
    fireEvent.change(screen.getByTestId('field-recovery-method'), { target: { value: 'deckSensitivities' } });
    expect(state.doc!.present.engine.installation.recoveryMethod).toBe(initial.doc!.present.engine.installation.recoveryMethod);
  });

  it('the study refuses the sensitivity method on a deck without the columns with a located message, or flies it on one that has them', () => {
    const s = demoState();
    const r0 = study(s);
    expect(r0.ok).toBe(true);
    const has = r0.ok && (r0.value as StudySnapshot).deck.hasSensitivities;
    const next = studyReducer(s, { type: 'valueSet', path: ['engine', 'installation', 'recoveryMethod'], value: 'deckSensitivities', label: 'Set recovery method' });
    const r = study(next);
    if (has) {
      expect(r.ok && (r.value as StudySnapshot).deck.installationMethod).toBe('deckSensitivities');
    } else {
      expect(r.ok).toBe(false);
      expect(JSON.stringify(r.ok ? null : r.error)).toMatch(/engine\.installation\.recoveryMethod/);
    }
  });

  it('switches the deck interpolation variables to raw and back by undo', () => {
    const { probe } = renderWithStudy(<EngineView live={NO_RESULT} />);
    fireEvent.change(screen.getByTestId('field-deck-interpolation'), { target: { value: 'raw' } });
    expect(probe.current.doc!.present.engine.deckInterpolation).toBe('raw');
    expect(study(probe.current).ok).toBe(true);
    expect(undo(probe.current).doc!.present.engine.deckInterpolation).toBeUndefined();
  });
});

describe('lip suction and spillage-share editors (inlets view)', () => {
  it('chooses a constant lip suction, then the rounded-pitot table with its source named; the own table is offered disabled with the reason', () => {
    const { probe } = renderWithStudy(<InletsView live={NO_RESULT} />);
    fireEvent.change(screen.getByTestId('field-inlet-0-lip-kind'), { target: { value: 'constant' } });
    type('field-inlet-0-lip-suction', '0.4');
    const inlet = probe.current.doc!.present.inlets[0]!;
    expect(inlet.lipSuction).toBeUndefined();
    expect(inlet.lipSuctionFactor).toBe(0.4);
    fireEvent.change(screen.getByTestId('field-inlet-0-lip-kind'), { target: { value: 'roundedPitot' } });
    expect(probe.current.doc!.present.inlets[0]!.lipSuction).toEqual({ kind: 'roundedPitot' });
    expect(screen.getByTestId('field-inlet-0-lip-source').textContent).toMatch(/Source: \S/);
    expect(undo(probe.current).doc!.present.inlets[0]!.lipSuctionFactor).toBe(0.4);
    expect(screen.getByTestId('field-inlet-0-lip-kind-unavailable-table').textContent).toMatch(/project file/);
  });

  it('reads the spillage-share threshold in percent: 8 % is 0.08 in the project; blank restores the default', () => {
    const { probe } = renderWithStudy(<InletsView live={NO_RESULT} />);
    type('field-spillage-share', '8 %');
    expectClose(probe.current.doc!.present.cautions.maxSpillageShare!, 0.08, { abs: 1e-12 }, '1 % = 0.01 (definition)');
    type('field-spillage-share', '');
    expect(probe.current.doc!.present.cautions.maxSpillageShare).toBeUndefined();
    expect(undo(probe.current).doc!.present.cautions.maxSpillageShare).toBeCloseTo(0.08, 12);
  });
});

describe('reserve settings every preset shares (mission view)', () => {
  it('sets the distance basis to still air; undo restores ground', () => {
    const { probe } = renderWithStudy(<MissionView />);
    const before = probe.current.doc!.present.mission.distanceBasis;
    fireEvent.change(screen.getByTestId('field-distance-basis'), { target: { value: before === 'stillAir' ? 'ground' : 'stillAir' } });
    expect(probe.current.doc!.present.mission.distanceBasis).not.toBe(before);
    expect(undo(probe.current).doc!.present.mission.distanceBasis).toBe(before);
  });

  it('sets a hold CAS from knots (1 kt = 1852 m / 3600 s, international definition) and undo restores the default', () => {
    const { probe } = renderWithStudy(<MissionView />);
    fireEvent.change(screen.getByTestId('field-hold-speed'), { target: { value: 'cas' } });
    type('field-hold-cas', '180 kt');
    const hold = probe.current.doc!.present.mission.reserves.holdSpeed;
    expect(hold?.kind).toBe('cas');
    expectClose(hold?.kind === 'cas' ? hold.cas : NaN, (180 * 1852) / 3600, { rel: 1e-12 }, 'international knot');
    const back = undo(undo(probe.current));
    expect(back.doc!.present.mission.reserves.holdSpeed).toBeUndefined();
    expect(study(probe.current).ok).toBe(true);
  });

  it('sets own arrival allowances, a missed approach of 2 min is 120 s, and keeps them across a preset change', () => {
    const { probe } = renderWithStudy(<MissionView />);
    fireEvent.click(screen.getByTestId('arrival-toggle'));
    type('field-missed-approach-time', '2 min');
    expect(probe.current.doc!.present.mission.reserves.arrival?.missedApproach.time).toBe(120);
    type('field-alternate-approach-fuel', '150 kg');
    expect(probe.current.doc!.present.mission.reserves.arrival?.alternateApproach.fuel).toBe(150);
    fireEvent.change(screen.getByTestId('reserves-preset'), { target: { value: 'cfr121_645' } });
    expect(probe.current.doc!.present.mission.reserves.arrival?.missedApproach.time).toBe(120);
    expect(undo(probe.current).doc!.present.mission.reserves.preset).not.toBe('cfr121_645');
    expect(study(probe.current).ok).toBe(true);
  });
});

describe('results view names the installation method flown', () => {
  it('shows the method of the study\'s result, which follows the project\'s recovery method', () => {
    const s = studyReducer(demoState(), { type: 'valueSet', path: ['engine', 'installation', 'recoveryMethod'], value: 'raymer', label: 'Set recovery method' });
    const r = study(s);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const snapshot = r.value as StudySnapshot;
    renderWithStudy(<ResultsView live={{ ...NO_RESULT, snapshot, snapshotRevision: 1, revision: 1 }} />, s);
    expect(screen.getByTestId('results-installation-method').textContent).toContain(describeInstallationMethod('raymerCorrections'));
  });
});

describe('recovery method declared uncertain (engine view)', () => {
  it('declares it with two Raymer alternatives, edits a weight, undo restores it', () => {
    const { probe } = renderWithStudy(<EngineView live={NO_RESULT} />);
    // The demo may already declare it: make it certain first (a removal is itself an edit).
    if (screen.queryByTestId('uncertain-recovery-method-remove')) fireEvent.click(screen.getByTestId('uncertain-recovery-method-remove'));
    fireEvent.click(screen.getByTestId('uncertain-recovery-method-add'));
    const decl = () => probe.current.doc!.present.uncertainty?.inputs.find((d) => d.input === 'recoveryMethod');
    expect(decl()).toMatchObject({ alternatives: [{ method: 'raymerHeld', weight: 1 }, { method: 'raymerScaled', weight: 1 }] });
    type('uncertain-recovery-method-raymerScaled-weight', '3');
    const d = decl();
    expect(d?.input === 'recoveryMethod' && d.alternatives[1]!.weight).toBe(3);
    const back = undo(probe.current).doc!.present.uncertainty?.inputs.find((x) => x.input === 'recoveryMethod');
    expect(back?.input === 'recoveryMethod' && back.alternatives[1]!.weight).toBe(1);
  });

  it('offers the sensitivity alternative disabled with the reason when the deck has no columns', async () => {
    const { RecoveryMethodUncertainty } = await import('../../../renderer/components/RecoveryMethodUncertainty');
    const s = studyReducer(demoState(), { type: 'valueSet', path: ['uncertainty'], value: { samples: 200, seed: 1, inputs: [{ input: 'recoveryMethod', alternatives: [{ method: 'raymerHeld', weight: 1 }], reason: '' }] }, label: 'x' });
    render(
      <StudyContext.Provider value={{ state: s, dispatch: () => undefined }}>
        <RecoveryMethodUncertainty hasSensitivities={false} />
      </StudyContext.Provider>,
    );
    expect((screen.getByTestId('uncertain-recovery-method-deckSensitivities') as HTMLInputElement).disabled).toBe(true);
    expect(screen.getByTestId('uncertain-recovery-method-deckSensitivities-unavailable').textContent).toMatch(/no installation-sensitivity columns/);
  });
});
