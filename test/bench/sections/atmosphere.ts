import { airspeedsAt, casFromMach, machFromCas } from '../../../engine/aero/airspeeds';
import { atmosphere, pressureAltitude } from '../../../engine/aero/standardAtmosphere';
import { expectOk } from '../../../engine/core/result';
import { parseQuantity } from '../../../engine/units/quantity';
import { callCounter, type BenchSection } from '../benchTypes';

// Altitudes and speeds cycle through a small table so each call differs.
const ALTITUDES_M = Array.from({ length: 64 }, (_, i) => -1000 + i * 250);
const state = expectOk(atmosphere(10668), 'bench atmosphere');
const next = callCounter();

export const section: BenchSection = {
  title: 'atmosphere and airspeeds',
  cases: [
    { name: 'atmosphere(h, isaDev)', run: () => atmosphere(ALTITUDES_M[next()]!, 10) },
    { name: 'pressureAltitude(p)', run: () => pressureAltitude(20000 + 1000 * next()) },
    { name: 'casFromMach (subsonic)', run: () => casFromMach(0.3 + 0.008 * next(), 23842) },
    { name: 'machFromCas (subsonic)', run: () => machFromCas(100 + next(), 23842) },
    { name: 'machFromCas (supersonic, Brent)', run: () => machFromCas(400 + next(), 23842) },
    { name: 'airspeedsAt(state, CAS)', run: () => airspeedsAt(state, { cas_m_s: 120 + next() }) },
    { name: 'parseQuantity("35000 ft")', run: () => parseQuantity('35000 ft', 'length') },
  ],
};
