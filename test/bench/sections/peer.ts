import { thrustDragCrossover } from '../../../engine/analysis/crossover';
import { payloadRangeDiagram } from '../../../engine/analysis/payloadRange';
import { tradeFactors } from '../../../engine/analysis/tradeFactors';
import type { MissionInput } from '../../../engine/mission/missionTypes';
import { solveMission } from '../../../engine/mission/solveMission';
import { DEMO_ENGINE_SPEC } from '../../../engine/propulsion/deckDemoSpec';
import { lookupDeck } from '../../../engine/propulsion/deckLookup';
import { buildParametricDeck } from '../../../engine/propulsion/parametricDeck';
import { loadDemoInput } from '../peer/demoInput';
import type { BenchSection } from '../benchTypes';

// The demo mission and the analyses built on it, plus a regular-grid deck
// lookup to set beside the ragged one in deck.ts. The side by side with the
// Python peer is printed after the table (test/bench/sideBySide.ts).
const { input } = loadDemoInput();
// One pass: the converged take-off mass and cruise distance flown once (trip and reserves, no iteration).
const converged = solveMission(input);
const cruiseRow = converged.legs.find((row) => row.kind === 'cruise');
const cruise_m = cruiseRow === undefined ? 0 : cruiseRow.endDistance_m - cruiseRow.startDistance_m;
const onePass: MissionInput = {
  ...input,
  solve: { kind: 'takeoffWeight', takeoffMass_kg: converged.takeoffMass_kg, payload_kg: converged.payload_kg },
  legs: input.legs.map((l) => (l.kind === 'cruise' && l.distance_m === null ? { ...l, distance_m: cruise_m } : l)),
};
const regular = buildParametricDeck({ ...DEMO_ENGINE_SPEC, grid: { ...DEMO_ENGINE_SPEC.grid, machRanges: undefined } });
const crossoverQuery = { altitude_m: 10668, mass_kg: 14500, rating: 'maxCruise', isaDev_K: 0 } as const;

let k = 0;
function next(): number {
  k = (k + 1) & 63;
  return k;
}

export const section: BenchSection = {
  title: 'demo mission and analyses',
  cases: [
    {
      name: 'lookupDeck inside (regular, 3 axes)',
      run: () => lookupDeck(regular, { altitude_m: 9000 + 20 * next(), mach: 0.7 + 0.002 * k, isaDev_K: 0 }, 0.5 + 0.005 * k),
    },
    { name: 'demo mission, one pass (given TOW, fixed cruise)', run: () => solveMission(onePass) },
    { name: 'demo mission, converged (payload + range)', run: () => solveMission(input) },
    { name: 'crossover curve (81 Machs, FL350)', run: () => thrustDragCrossover(input, crossoverQuery) },
    { name: 'payload-range diagram (9 missions)', run: () => payloadRangeDiagram(input, {}) },
    { name: 'trade-factor table (17 missions)', run: () => tradeFactors(input, {}) },
  ],
};
