import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { CAUTION_CATALOGUE } from '../../../engine/cautions/cautionCatalogue';
import { MissionView } from '../../../renderer/views/MissionView';
import { CautionsView } from '../../../renderer/views/CautionsView';
import { InletsView } from '../../../renderer/views/InletsView';
import type { LiveStudy } from '../../../renderer/worker/useEngine';
import { expectClose } from '../../support/assertInDelta';
import { renderWithStudy } from '../support/studyHarness';

const NO_RESULT: LiveStudy = { snapshot: null, snapshotRevision: -1, revision: 0, stale: false, running: false, failure: null };

describe('MissionView', () => {
  it('adds, duplicates, moves and removes legs with the buttons', () => {
    const { probe } = renderWithStudy(<MissionView />);
    const kinds = () => probe.current.doc!.present.mission.legs.map((l) => l.kind);
    const start = kinds();
    fireEvent.change(screen.getByTestId('leg-add-kind'), { target: { value: 'hold' } });
    fireEvent.click(screen.getByTestId('leg-add'));
    expect(kinds()).toEqual([...start, 'hold']);
    expect(screen.getByTestId(`leg-${start.length}`)).toBeInTheDocument();
    fireEvent.click(screen.getByTestId(`leg-${start.length}-up`));
    expect(kinds()).toEqual([...start.slice(0, -1), 'hold', start[start.length - 1]]);
    fireEvent.click(screen.getByTestId('leg-0-duplicate'));
    expect(kinds().slice(0, 2)).toEqual([start[0], start[0]]);
    fireEvent.click(screen.getByTestId('leg-0-remove'));
    fireEvent.click(screen.getByTestId(`leg-${start.length - 1}-remove`));
    expect(kinds()).toEqual(start);
    expect((screen.getByTestId('leg-0-up') as HTMLButtonElement).disabled).toBe(true);
  });

  it("edits a leg field in the display unit and shows a bad value inline without changing the leg", () => {
    const { probe } = renderWithStudy(<MissionView />);
    const legs = probe.current.doc!.present.mission.legs;
    const n = legs.findIndex((l) => l.kind === 'taxiOut');
    expect(n).toBeGreaterThanOrEqual(0);
    const time = screen.getByTestId(`field-leg-${n}-time`) as HTMLInputElement;
    fireEvent.change(time, { target: { value: 'soon' } });
    fireEvent.blur(time);
    expect(screen.getByTestId(`field-leg-${n}-time-error`).textContent).toMatch(/does not start with a number/);
    expect(probe.current.doc!.present.mission.legs[n]).toEqual(legs[n]);
    fireEvent.change(time, { target: { value: '45 min' } });
    fireEvent.blur(time);
    expect(screen.queryByTestId(`field-leg-${n}-time-error`)).toBeNull();
    expect((probe.current.doc!.present.mission.legs[n] as { time: number }).time).toBe(2700);
  });

  it('switches the reserve rule to a preset with its defaults and the solve mode keeps the payload', () => {
    const { probe } = renderWithStudy(<MissionView />);
    const payload = probe.current.doc!.present.mission.solve.payload;
    fireEvent.change(screen.getByTestId('reserves-preset'), { target: { value: 'cfr121_639' } });
    // 14 CFR 121.639(c): 45 minutes at normal cruising fuel consumption
    expect(probe.current.doc!.present.mission.reserves).toMatchObject({ preset: 'cfr121_639', finalReserveTime: 2700 });
    fireEvent.change(screen.getByTestId('solve-mode'), { target: { value: 'maxRange' } });
    expect(probe.current.doc!.present.mission.solve).toEqual({ mode: 'maxRange', payload });
    expect(screen.queryByTestId('field-range')).toBeNull();
  });
});

describe('MissionView destination elevation', () => {
  it('edits the destination elevation next to ISA deviation and wind, clears it to the 0 ft default, and refuses one above the legs\' end', () => {
    const { probe } = renderWithStudy(<MissionView />);
    const field = screen.getByTestId('field-destination-elevation') as HTMLInputElement;
    // Same fieldset as the other mission-wide fields.
    expect(field.closest('fieldset')).toBe(screen.getByTestId('field-mission-isa').closest('fieldset'));
    const start = probe.current.doc!.present.mission.destinationElevation;
    expect(field.value).toBe(start === undefined ? '' : `${Math.round(start / 0.3048).toLocaleString('en-US')} ft`);
    fireEvent.change(field, { target: { value: '1,200' } });
    fireEvent.blur(field);
    // a bare number is read in the field's unit: 1,200 ft = 365.76 m (NIST SP 811, 1 ft = 0.3048 m)
    expectClose(probe.current.doc!.present.mission.destinationElevation!, 365.76, { abs: 1e-9 }, 'NIST SP 811');
    fireEvent.change(field, { target: { value: '' } });
    fireEvent.blur(field);
    expect(probe.current.doc!.present.mission.destinationElevation).toBeUndefined();
    expect(field.value).toBe('');
    expect(screen.getByText(/blank: 0 ft/)).toBeInTheDocument();
    // Above where the legs end (the demo's last descent ends low): the project rule's message, project unchanged.
    fireEvent.change(field, { target: { value: '60000 ft' } });
    fireEvent.blur(field);
    expect(screen.getByTestId('field-destination-elevation-error').textContent).toMatch(/above .*the altitude the legs end at/);
    expect(probe.current.doc!.present.mission.destinationElevation).toBeUndefined();
  });
});

describe('CautionsView', () => {
  it('lists every limit with its default and the source from the caution catalogue', () => {
    renderWithStudy(<CautionsView />);
    const row = screen.getByTestId('caution-limit-minResidualClimbRate');
    // 300 ft/min, common practice (engine/cautions/cautionCatalogue.ts)
    expect(within(row).getByText('300 ft/min')).toBeInTheDocument();
    expect(row.textContent).toContain(CAUTION_CATALOGUE.residual_climb_low.source);
    expect(screen.getByTestId('caution-limit-maxThroatMach').textContent).toContain(CAUTION_CATALOGUE.throat_mach_high.source);
    expect(screen.getByTestId('caution-fixed').textContent).toContain(CAUTION_CATALOGUE.mtow_exceeded.title);
  });

  it('sets a limit, rejects a bad one inline, and resets it to the default', () => {
    const { probe } = renderWithStudy(<CautionsView />);
    const field = screen.getByTestId('field-caution-minResidualClimbRate') as HTMLInputElement;
    fireEvent.change(field, { target: { value: '500' } });
    fireEvent.blur(field);
    // 500 ft/min = 500 x 0.3048 / 60 m/s (NIST SP 811)
    expectClose(probe.current.doc!.present.cautions.minResidualClimbRate!, (500 * 0.3048) / 60, { rel: 1e-12 }, 'NIST SP 811');
    const throat = screen.getByTestId('field-caution-maxThroatMach') as HTMLInputElement;
    fireEvent.change(throat, { target: { value: '1.4' } });
    fireEvent.blur(throat);
    expect(screen.getByTestId('field-caution-maxThroatMach-error').textContent).toMatch(/Mach number from 0 to 1/);
    expect(probe.current.doc!.present.cautions.maxThroatMach).toBeUndefined();
    fireEvent.click(screen.getByTestId('caution-limit-minResidualClimbRate-reset'));
    expect(probe.current.doc!.present.cautions.minResidualClimbRate).toBeUndefined();
    expect((screen.getByTestId('field-caution-minResidualClimbRate') as HTMLInputElement).value).toBe('');
  });
});

describe('InletsView', () => {
  it('shows each design and switches the one that is flown', () => {
    const { probe } = renderWithStudy(<InletsView live={NO_RESULT} />);
    const names = probe.current.doc!.present.inlets.map((i) => i.name);
    expect(names.length).toBe(2);
    expect(screen.getByTestId('inlet-0').textContent).toContain(names[0]);
    fireEvent.change(screen.getByTestId('active-inlet'), { target: { value: names[1] } });
    expect(probe.current.doc!.present.activeInlet).toBe(names[1]);
    expect(screen.getByTestId('inlet-1').textContent).toContain('(flown)');
  });
});
