import { act, fireEvent, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { QuantityField } from '../../../renderer/components/QuantityField';
import { studyReducer } from '../../../renderer/state/studyReducer';
import { undoKeyCommand } from '../../../renderer/state/undoKeys';
import { expectClose } from '../../support/assertInDelta';
import { demoState, renderWithStudy } from '../support/studyHarness';

const MTOW = ['airframe', 'weights', 'maxTakeoff'] as const;

describe('QuantityField', () => {
  it('shows the value in display units with the unit in its label', () => {
    renderWithStudy(<QuantityField label="Maximum take-off" path={MTOW} unit="mass" testId="f" />);
    expect((screen.getByTestId('f') as HTMLInputElement).value).toBe('36,500 lb');
    expect(screen.getByLabelText(/Maximum take-off/).getAttribute('data-testid')).toBe('f');
    expect(screen.getByText('(lb)')).toBeInTheDocument();
  });

  it('commits on Enter, marks a bad value invalid with its message, and Escape brings the value back', () => {
    const { probe } = renderWithStudy(<QuantityField label="MTOW" path={MTOW} unit="mass" testId="f" />);
    const input = screen.getByTestId('f') as HTMLInputElement;
    fireEvent.change(input, { target: { value: '37 tonnes' } });
    fireEvent.keyDown(input, { key: 'Enter' });
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByRole('alert').textContent).toMatch(/unknown unit "tonnes"/);
    fireEvent.keyDown(input, { key: 'Escape' });
    expect(screen.queryByRole('alert')).toBeNull();
    expect(input.value).toBe('36,500 lb');
    fireEvent.change(input, { target: { value: '17000 kg' } });
    fireEvent.keyDown(input, { key: 'Enter' });
    expect(probe.current.doc!.present.airframe.weights.maxTakeoff).toBe(17000);
    // shown back in lb: 17,000 kg / 0.45359237 kg/lb (NIST SP 811), whole pounds
    expect(input.value).toMatch(/ lb$/);
    expectClose(Number(input.value.replace(/,/g, '').replace(' lb', '')), 17000 / 0.45359237, { abs: 0.5 }, 'NIST SP 811');
  });

  it('shows 30 kW as 40.23 hp and leaves the stored 30 kW alone when the field is left without an edit', () => {
    const POWER = ['engine', 'installation', 'powerExtraction'] as const;
    const s = studyReducer(demoState(), { type: 'valueSet', path: POWER, value: 30000, label: 'p' });
    const { probe } = renderWithStudy(<QuantityField label="Shaft power" path={POWER} unit="power" testId="f" />, s);
    const input = screen.getByTestId('f') as HTMLInputElement;
    // 30,000 W / 745.69987 W/hp (NIST SP 811 appendix B) = 40.2307 hp, four significant digits
    expect(input.value).toBe('40.23 hp');
    fireEvent.focus(input);
    fireEvent.keyDown(input, { key: 'Enter' });
    fireEvent.blur(input);
    expect(probe.current.doc!.present.engine.installation.powerExtraction).toBe(30000);
    expect(probe.current.doc!.past).toHaveLength(s.doc!.past.length);
    // Retyping the shown text is no edit (30 kW kept, not 29,999.8 W); a changed value is read as typed.
    fireEvent.change(input, { target: { value: '40.23 hp' } });
    fireEvent.keyDown(input, { key: 'Enter' });
    expect(probe.current.doc!.present.engine.installation.powerExtraction).toBe(30000);
    fireEvent.change(input, { target: { value: '40.24 hp' } });
    fireEvent.keyDown(input, { key: 'Enter' });
    expectClose(probe.current.doc!.present.engine.installation.powerExtraction!, 40.24 * 745.69987158, { rel: 1e-9 }, 'NIST SP 811');
  });

  it('keeps Ctrl+Z for the text while it is being typed; after commit Ctrl+Z reaches the window', () => {
    const seen: string[] = [];
    const onKey = (e: KeyboardEvent) => {
      const c = undoKeyCommand(e);
      if (c) seen.push(c);
    };
    window.addEventListener('keydown', onKey);
    try {
      renderWithStudy(<QuantityField label="MTOW" path={MTOW} unit="mass" testId="f" />);
      const input = screen.getByTestId('f');
      fireEvent.change(input, { target: { value: '36,6' } });
      fireEvent.keyDown(input, { key: 'z', ctrlKey: true });
      expect(seen).toEqual([]);
      fireEvent.change(input, { target: { value: '36,500 lb' } });
      fireEvent.keyDown(input, { key: 'z', ctrlKey: true });
      expect(seen).toEqual(['undo']);
    } finally {
      window.removeEventListener('keydown', onKey);
    }
  });

  it('an optional field left empty removes the value; the project default applies', () => {
    const s = studyReducer(demoState(), { type: 'valueSet', path: ['engine', 'installation', 'ramRecoveryFactor'], value: 1.2, label: 'c' });
    const { probe } = renderWithStudy(<QuantityField label="C_ram" path={['engine', 'installation', 'ramRecoveryFactor']} unit="dimensionless" testId="f" optional />, s);
    const input = screen.getByTestId('f') as HTMLInputElement;
    expect(input.value).toBe('1.2');
    fireEvent.change(input, { target: { value: '' } });
    act(() => {
      fireEvent.blur(input);
    });
    expect(probe.current.doc!.present.engine.installation.ramRecoveryFactor).toBeUndefined();
    expect(input.value).toBe('');
    expectClose(s.doc!.present.engine.installation.ramRecoveryFactor!, 1.2, { abs: 0 }, 'set above');
  });
});
