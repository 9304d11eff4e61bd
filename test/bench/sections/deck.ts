import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { expectOk } from '../../../engine/core/result';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import { DEMO_ENGINE_SPEC } from '../../../engine/propulsion/deckDemoSpec';
import { powerForThrust } from '../../../engine/propulsion/deckInversion';
import { lookupDeck } from '../../../engine/propulsion/deckLookup';
import { buildParametricDeck } from '../../../engine/propulsion/parametricDeck';
import { callCounter, type BenchSection } from '../benchTypes';

// The invented demo deck (ragged, 1120 points); queries cycle so each call differs.
const deck = buildParametricDeck(DEMO_ENGINE_SPEC);
const demoCsv = readFileSync(fileURLToPath(new URL('../../../fixtures/demo/demo-engine.deck.csv', import.meta.url)), 'utf8');
const withIsa = buildParametricDeck({ ...DEMO_ENGINE_SPEC, grid: { ...DEMO_ENGINE_SPEC.grid, isaDevs_K: [-20, 0, 20, 40] } });

const next = callCounter();

export const section: BenchSection = {
  title: 'engine deck',
  cases: [
    {
      name: 'lookupDeck inside (ragged, 3 axes)',
      run: () => {
        const k = next();
        return lookupDeck(deck, { altitude_m: 9000 + 20 * k, mach: 0.7 + 0.002 * k, isaDev_K: 0 }, 0.5 + 0.005 * k);
      },
    },
    {
      name: 'lookupDeck extrapolated in altitude (caution built)',
      run: () => lookupDeck(deck, { altitude_m: 16000 + 20 * next(), mach: 0.8, isaDev_K: 0 }, 0.9),
    },
    {
      name: 'lookupDeck with isa_dev axis (4 axes)',
      run: () => {
        const k = next();
        return lookupDeck(withIsa, { altitude_m: 9000 + 20 * k, mach: 0.75, isaDev_K: 0.3 * k }, 0.88);
      },
    },
    {
      name: 'powerForThrust (exact inversion)',
      run: () => {
        const k = next();
        return powerForThrust(deck, { altitude_m: 10000 + 10 * k, mach: 0.78, isaDev_K: 0 }, 3000 + 20 * k, 0.88);
      },
    },
    { name: 'parseDeckCsv demo deck (1120 rows)', run: () => expectOk(parseDeckCsv(demoCsv, 'demo'), 'demo') },
  ],
};
