import { describe, expect, it } from 'vitest';
import { temperatureApproximationCaution, temperatureFlowFactor } from '../../../engine/propulsion/deckTemperature';
import { expectClose } from '../../support/assertInDelta';

describe('temperatureFlowFactor', () => {
  it('temperatureFlowFactor is sqrt(T/T_ISA), the corrected fuel-flow scaling Wf/(delta sqrt(theta)) (Walsh & Fletcher)', () => {
    // sea level ISA+15: sqrt(303.15/288.15) (hand calculation)
    expectClose(temperatureFlowFactor(0, 15), Math.sqrt(303.15 / 288.15), { rel: 1e-15 }, 'hand calculation');
    // 35000 ft (T_ISA = 218.808 K, US Standard Atmosphere 1976) ISA-10: sqrt(208.808/218.808)
    expectClose(temperatureFlowFactor(10668, -10), Math.sqrt(208.808 / 218.808), { rel: 1e-12 }, 'hand calculation');
    expect(temperatureFlowFactor(5000, 0)).toBe(1);
  });

  it('temperatureFlowFactor throws when the static temperature would not be positive', () => {
    expect(() => temperatureFlowFactor(0, -300)).toThrow(RangeError);
  });
});

describe('temperatureApproximationCaution', () => {
  it('temperatureApproximationCaution names itself and says what it does', () => {
    const c = temperatureApproximationCaution('Deck X', 20);
    expect(c.id).toBe('deck_temperature_approximation');
    expect(c.message).toContain('ISA+20 K');
    expect(c.message).toContain('F/delta');
    expect(c.message).toContain('optimistic');
    expect(c.value).toBe(20);
  });
});
