import type { MissionInput } from '../../../engine/mission/missionTypes';
import { solveMission } from '../../../engine/mission/solveMission';
import { DEMO_ENGINE_SPEC } from '../../../engine/propulsion/deckDemoSpec';
import { lookupDeck } from '../../../engine/propulsion/deckLookup';
import { buildParametricDeck } from '../../../engine/propulsion/parametricDeck';
import { loadDemoInput } from '../peer/demoInput';
import { callCounter, type BenchSection } from '../benchTypes';

// What the owners' sections do not time: a regular-grid deck lookup beside the
// ragged one in deck.ts, and one pass of the demo mission (no fuel iteration)
// beside the converged one in mission.ts. The converged mission, crossover,
// payload-range and trade factors are in mission.ts and analysis.ts; the side
// by side with the Python peer is printed after the table (sideBySide.ts).
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

const next = callCounter();

export const section: BenchSection = {
  title: 'demo one pass, regular deck',
  cases: [
    {
      name: 'lookupDeck inside (regular, 3 axes)',
      run: () => {
        const k = next();
        return lookupDeck(regular, { altitude_m: 9000 + 20 * k, mach: 0.7 + 0.002 * k, isaDev_K: 0 }, 0.5 + 0.005 * k);
      },
    },
    { name: 'demo mission, one pass (given TOW, fixed cruise)', run: () => solveMission(onePass) },
  ],
};
