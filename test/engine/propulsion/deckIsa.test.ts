import { describe, expect, it } from 'vitest';
import { isaPressureRatio, isaTemperature_K } from '../../../engine/propulsion/deckIsa';
import { expectClose } from '../../support/assertInDelta';

// Layer base values of the U.S. Standard Atmosphere 1976 (NOAA-S/T 76-1562, Table 4; from memory):
// 11 km 216.65 K 22632.06 Pa; 20 km 216.65 K 5474.889 Pa; 32 km 228.65 K 868.0187 Pa; 47 km 270.65 K 110.9063 Pa.
describe('deckIsa', () => {
  it('isaTemperature_K follows the 1976 layers', () => {
    expect(isaTemperature_K(0)).toBe(288.15);
    expectClose(isaTemperature_K(11000), 216.65, { abs: 1e-9 }, 'US Standard Atmosphere 1976');
    expectClose(isaTemperature_K(15000), 216.65, { abs: 1e-9 }, 'US Standard Atmosphere 1976');
    expectClose(isaTemperature_K(32000), 228.65, { abs: 1e-9 }, 'US Standard Atmosphere 1976');
    expectClose(isaTemperature_K(47000), 270.65, { abs: 1e-9 }, 'US Standard Atmosphere 1976');
    expectClose(isaTemperature_K(-1000), 294.65, { abs: 1e-9 }, 'US Standard Atmosphere 1976');
  });

  it('isaPressureRatio matches the 1976 layer base pressures', () => {
    expect(isaPressureRatio(0)).toBe(1);
    expectClose(isaPressureRatio(11000) * 101325, 22632.06, { rel: 2e-6 }, 'US Standard Atmosphere 1976');
    expectClose(isaPressureRatio(20000) * 101325, 5474.889, { rel: 2e-6 }, 'US Standard Atmosphere 1976');
    expectClose(isaPressureRatio(32000) * 101325, 868.0187, { rel: 2e-6 }, 'US Standard Atmosphere 1976');
    expectClose(isaPressureRatio(47000) * 101325, 110.9063, { rel: 2e-6 }, 'US Standard Atmosphere 1976');
  });

  it('isaPressureRatio at 35000 ft is 0.2353 (standard altitude tables; from memory)', () => {
    expectClose(isaPressureRatio(10668), 0.2353, { abs: 1e-4 }, 'standard altitude table');
  });

  it('isaTemperature_K throws outside -5 km..84.852 km', () => {
    expect(() => isaTemperature_K(90000)).toThrow(RangeError);
    expect(() => isaPressureRatio(Number.NaN)).toThrow(RangeError);
  });
});
