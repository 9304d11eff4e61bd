import { describe, expect, it } from 'vitest';
import type { CrossoverResult } from '../../../engine/analysis';
import { beyondLimits, crossoverSeries } from '../../../renderer/charts/crossoverSeries';
import type { CrossoverSet } from '../../../renderer/worker/engineProtocol';

function result(marks: Partial<CrossoverResult>): CrossoverResult {
  return {
    lowMach: null,
    highMach: null,
    minThrustMach: null,
    stallMach: null,
    buffetOnsetMach: null,
    speedLimitMach: null,
    lowSpeedLimit: null,
    highSpeedLimit: null,
    curves: { mach: [0.3, 0.9], thrustAvailable_N: [2000, 1500], drag_N: [2500, 1500], excessThrust_N: [], specificExcessPower_m_s: [] },
    ...marks,
  } as CrossoverResult;
}

describe('crossover limits', () => {
  it('draws stall, buffet onset and VMO/MMO and flags a crossover past a limit', () => {
    // A crossover below buffet onset or above MMO is not level flight inside the limits (the band is
    // [max(stall, buffet onset, low crossover), min(high crossover, VMO/MMO)], common practice).
    const r = result({
      lowMach: 0.4,
      highMach: 0.86,
      stallMach: 0.32,
      buffetOnsetMach: 0.45,
      speedLimitMach: 0.82,
      lowSpeedLimit: { mach: 0.45, source: 'buffetOnset' },
      highSpeedLimit: { mach: 0.82, source: 'mmo' },
    });
    const s = crossoverSeries({ curves: [{ inletName: 'A', result: r }] } as CrossoverSet, 'customary');
    expect(s.limits.map((l) => [l.what, l.mach])).toEqual([
      ['stall', 0.32],
      ['buffet onset', 0.45],
      ['VMO/MMO', 0.82],
    ]);
    const low = s.markers.find((m) => m.what === 'low crossover')!;
    const high = s.markers.find((m) => m.what === 'high crossover')!;
    expect(low.beyond).toBe('below buffet onset');
    expect(high.beyond).toBe('past VMO/MMO');
    expect(beyondLimits(r, 0.6)).toBeNull();
    expect(beyondLimits(r, 0.3)).toBe('below stall');
  });

  it('leaves a crossover inside the limits unflagged, and flags every Mach when the limits leave no band', () => {
    const inside = result({ lowMach: 0.5, highMach: 0.8, stallMach: 0.3, buffetOnsetMach: 0.35, speedLimitMach: 0.85, lowSpeedLimit: { mach: 0.5, source: 'crossover' }, highSpeedLimit: { mach: 0.8, source: 'crossover' } });
    expect(beyondLimits(inside, 0.5)).toBeNull();
    expect(beyondLimits(inside, 0.8)).toBeNull();
    const none = result({ stallMach: 0.3, buffetOnsetMach: 0.7, speedLimitMach: 0.8, lowSpeedLimit: null, highSpeedLimit: null });
    expect(beyondLimits(none, 0.75)).toMatch(/no level-flight band/);
  });
});
