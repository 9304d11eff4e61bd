/**
 * The converged demo mission against the same mission scripted independently
 * in Python with numpy/scipy (test/bench/peer/demoMission.py: per-altitude
 * scipy RegularGridInterpolator deck, solve_ivp legs with events, brentq fuel
 * iteration; method and differences in docs/benchmarks.md). Its output is
 * committed in demoMission.reference.json; regenerate with
 * `python3 test/bench/peer/demoMission.py` when the demo or the model changes.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { solveMission } from '../../../engine/mission/solveMission';
import { expectClose } from '../../support/assertInDelta';
import { loadDemoInput, PEER_PROJECT_PATH } from './demoInput';

const peer = JSON.parse(readFileSync(new URL('./demoMission.reference.json', import.meta.url), 'utf8')) as Record<string, number>;
const SOURCE = 'scripted Python peer, test/bench/peer/demoMission.py (numpy/scipy)';

describe('solveMission on the demo project against the scripted Python peer', () => {
  it('solveMission(demo) agrees with the peer on block fuel, trip fuel, reserve and block time within 0.5 %', () => {
    const r = solveMission(loadDemoInput(undefined, PEER_PROJECT_PATH).input);
    expect(r.status).toBe('ok');
    expectClose(r.blockFuel_kg, peer.blockFuel_kg!, { rel: 0.005 }, SOURCE);
    expectClose(r.tripFuel_kg, peer.tripFuel_kg!, { rel: 0.005 }, SOURCE);
    expectClose(r.reserveFuel_kg, peer.reserveFuel_kg!, { rel: 0.005 }, SOURCE);
    expectClose(r.blockTime_s, peer.blockTime_s!, { rel: 0.005 }, SOURCE);
    expectClose(r.landingMass_kg, peer.landingMass_kg!, { rel: 0.005 }, SOURCE);
  });
});
