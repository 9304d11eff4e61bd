import { describe, expect, it } from 'vitest';
import { formatCliTiming } from './cliTiming';
import { solveMission } from '../../engine/mission/solveMission';
import { BLOCKWISE_STEP_SCALES, EQUAL_ACCURACY, formatEqualAccuracy, loosenBlockwise, PEER_RTOLS } from './equalAccuracy';
import { loadDemoInput, PEER_PROJECT_PATH } from './peer/demoInput';

// Formatting only: the bench measures, tests never time anything.
describe('equal-accuracy comparison and CLI timing text (no timing assertions)', () => {
  it('the tolerances are tried from tight to loose and equal accuracy is 0.01 %', () => {
    expect(EQUAL_ACCURACY).toBe(1e-4);
    expect([...PEER_RTOLS].sort((a, b) => a - b)).toEqual(PEER_RTOLS);
    expect([...BLOCKWISE_STEP_SCALES].sort((a, b) => a - b)).toEqual(BLOCKWISE_STEP_SCALES);
    expect(BLOCKWISE_STEP_SCALES[0]).toBeGreaterThan(1);
  });

  it('formatEqualAccuracy prints the peer tolerance chosen, its time and difference, and the ratio', () => {
    const b = { medianMission_s: 0.002, blockFuel_kg: 5000.1, tightBlockFuel_kg: 5000, relativeDifference: 2e-5 };
    const text = formatEqualAccuracy({
      tolerance: 1e-4,
      blockwise: b,
      blockwiseLoosened: { ...b, stepScale: 1, tries: [] },
      peer: {
        tightBlockFuel_kg: 5001,
        tries: [
          { rtol: 1e-4, blockFuel_kg: 5001.2, relativeDifference: 4e-5, mission_s: 0.8 },
          { rtol: 1e-3, blockFuel_kg: 5003, relativeDifference: 4e-4, mission_s: 0.5 },
        ],
        rtol: 1e-4,
        medianMission_s: 0.8,
        blockFuel_kg: 5001.2,
        relativeDifference: 4e-5,
        repeat: 3,
      },
      ratio: 400,
      ratioLoosened: null,
    });
    expect(text).toContain('within 0.01 %');
    expect(text).toContain('rtol 1e-3: block fuel 5003.000 kg, +0.0400 %, 500.00 ms  (outside)');
    expect(text).toContain('Python peer at rtol 1e-4 (median of 3): 800.00 ms');
    expect(text).toContain('peer / Blockwise: 400 x');
  });

  it('formatEqualAccuracy prints Blockwise loosened: each step scale tried, the one chosen and the second ratio', () => {
    const b = { medianMission_s: 0.002, blockFuel_kg: 5000.1, tightBlockFuel_kg: 5000, relativeDifference: 2e-5 };
    const text = formatEqualAccuracy({
      tolerance: 1e-4,
      blockwise: b,
      blockwiseLoosened: {
        ...b,
        medianMission_s: 0.001,
        stepScale: 4,
        tries: [
          { stepScale: 2, status: 'ok', blockFuel_kg: 5000.2, relativeDifference: 4e-5 },
          { stepScale: 4, status: 'ok', blockFuel_kg: 5000.3, relativeDifference: 6e-5 },
          { stepScale: 8, status: 'ok', blockFuel_kg: 5001, relativeDifference: 2e-4 },
        ],
      },
      peer: { tightBlockFuel_kg: 5001, tries: [], rtol: 1e-4, medianMission_s: 0.8, blockFuel_kg: 5001.2, relativeDifference: 4e-5, repeat: 3 },
      ratio: 400,
      ratioLoosened: 800,
    });
    expect(text).toContain('stepScale 8: block fuel 5001.000 kg, +0.0200 %  (outside)');
    expect(text).toContain('Blockwise loosened (stepScale 4, the loosest within): 1.00 ms');
    expect(text).toContain('peer / Blockwise: 400 x (Blockwise at production steps)');
    expect(text).toContain('loosest setting within 0.01 %: 800 x');
  });

  it('loosenBlockwise keeps the loosest step scale whose solve is ok and within 0.01 % of the fine-step answer (frozen demo)', () => {
    const { input } = loadDemoInput(undefined, PEER_PROJECT_PATH);
    const tight = solveMission(input, { stepScale: 0.125 });
    const { tries, chosen } = loosenBlockwise(input, tight.blockFuel_kg);
    const within = (t: (typeof tries)[number]) => t.status === 'ok' && Math.abs(t.relativeDifference) <= EQUAL_ACCURACY;
    // Tried in order, stopping at the first outside; the chosen one is the last inside (1, production, when none is).
    expect(tries.map((t) => t.stepScale)).toEqual(BLOCKWISE_STEP_SCALES.slice(0, tries.length));
    expect(tries.slice(0, -1).every(within)).toBe(true);
    const inside = tries.filter(within);
    expect(chosen).toBe(inside.length > 0 ? inside[inside.length - 1]!.stepScale : 1);
    for (const t of tries) expect(t.relativeDifference).toBeCloseTo((t.blockFuel_kg - tight.blockFuel_kg) / tight.blockFuel_kg, 12);
  });

  it('formatEqualAccuracy and formatCliTiming say why a part did not run', () => {
    const b = { medianMission_s: 0.002, blockFuel_kg: 1, tightBlockFuel_kg: 1, relativeDifference: 0 };
    expect(formatEqualAccuracy({ tolerance: 1e-4, blockwise: b, blockwiseLoosened: { ...b, stepScale: 1, tries: [] }, peer: { error: 'python3 could not be started: ENOENT' }, ratio: null, ratioLoosened: null })).toContain('not run (python3 could not be started');
    const t = formatCliTiming({ bundle: 'is not built', runs: 3, help_s: 0.1, fly_s: 0.2, nodeBare_s: 0.05, sweep: { error: 'boom' } });
    expect(t).toContain('NOT bundled: the bundle is not built');
    expect(t).toContain('blockwise --help 100 ms; blockwise fly <demo> 200 ms');
    expect(t).toContain('sweep: not run (boom)');
  });

  it('formatCliTiming gives the sweep grid, its start-up, the rate of the sample, the projection and the whole run or why not', () => {
    const sweep = { grid: ['a=1:2:1', 'b=1:2:1'], cases: 10000, workers: 2, start_s: 0.5, sampleCases: 1000, sample_s: 1.5, projected_s: 15 };
    const flown = formatCliTiming({ bundle: null, runs: 3, help_s: 0.1, fly_s: 0.2, nodeBare_s: 0.05, sweep: { ...sweep, whole_s: 8 } });
    expect(flown).toContain('sweep of 10,000 demo cases (a=1:2:1 x b=1:2:1) on 2 workers: start-up 500 ms; 1,000 cases (--shard 1/10) 1.50 s, so at most 15.0 s for all; flown whole: 8.00 s (1250 cases/s)');
    const skipped = formatCliTiming({ bundle: null, runs: 3, help_s: 0.1, fly_s: 0.2, nodeBare_s: 0.05, sweep: { ...sweep, whole_s: null } });
    expect(skipped).toMatch(/not flown whole \(projected above \d+ s\)/);
  });
});
