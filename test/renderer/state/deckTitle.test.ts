import { describe, expect, it } from 'vitest';
import { deckTitleText } from '../../../renderer/state/deckTitle';

describe('deckTitleText', () => {
  it('deckTitleText adds "(parametric)" to a parametric deck whose title does not say it', () => {
    expect(deckTitleText('Invented turbofan deck', true)).toBe('Invented turbofan deck (parametric)');
  });

  it('deckTitleText leaves a title that already says parametric (any case) as it is', () => {
    expect(deckTitleText('Demo turbofan, 36 kN class (invented, parametric)', true)).toBe('Demo turbofan, 36 kN class (invented, parametric)');
    expect(deckTitleText('Parametric deck from thrust-lapse models', true)).toBe('Parametric deck from thrust-lapse models');
  });

  it('deckTitleText leaves a tabulated deck title alone', () => {
    expect(deckTitleText('Invented turbofan deck', false)).toBe('Invented turbofan deck');
  });
});
