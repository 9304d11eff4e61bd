import { describe, expect, it } from 'vitest';
import type { CrossoverResult } from '../../../engine/analysis/crossover';
import type { InletComparisonResult } from '../../../engine/analysis/inletComparison';
import type { PayloadRangeResult } from '../../../engine/analysis/payloadRange';
import type { TimeHistory } from '../../../engine/mission/missionTypes';
import { breakdownWaterfall, payloadRangeRows } from '../../../renderer/charts/compareSeries';
import { crossoverSeries, interpolateAt } from '../../../renderer/charts/crossoverSeries';
import { inletSeries } from '../../../renderer/charts/inletSeries';
import { lapseSeries } from '../../../renderer/charts/lapseSeries';
import { polarSeries } from '../../../renderer/charts/polarSeries';
import { profileSeries } from '../../../renderer/charts/profileSeries';
import { sampleIndices, tickText } from '../../../renderer/charts/seriesKeys';
import type { CrossoverSet, InletCurves, LapseCurves } from '../../../renderer/worker/engineProtocol';
import { expectClose } from '../../support/assertInDelta';

// Conversion factors, NIST SP 811 appendix B (exact unless noted):
const FT = 0.3048;
const NMI = 1852;
const LB = 0.45359237;
const LBF = 4.4482216152605; // N
const NIST = 'NIST SP 811 appendix B';

function history(n: number): TimeHistory {
  const col = (f: (i: number) => number) => Float64Array.from({ length: n }, (_, i) => f(i));
  return {
    time_s: col((i) => 10 * i),
    distance_m: col((i) => i * NMI),
    altitude_m: col((i) => i * 1000 * FT),
    mach: col(() => 0.7),
    cas_m_s: col(() => 120),
    tas_m_s: col(() => 200),
    mass_kg: col((i) => 10000 - i),
    thrustAvailable_N: col(() => 1),
    thrustUsed_N: col(() => 1),
    drag_N: col(() => 1),
    fuelFlow_kg_s: col(() => 0.1),
    cl: col(() => 0.5),
    liftToDrag: col(() => 16),
    climbRate_m_s: col(() => 0),
    legIndex: Int32Array.from({ length: n }, (_, i) => (i < n / 2 ? 0 : 1)),
  };
}

describe('profileSeries', () => {
  it('converts distance, altitude and mass to display units', () => {
    const rows = profileSeries(history(5), 'customary');
    expect(rows).toHaveLength(5);
    expectClose(rows[3]!.distance, 3, { rel: 1e-12 }, NIST);
    expectClose(rows[3]!.altitude, 3000, { rel: 1e-12 }, NIST);
    expectClose(rows[3]!.mass, 9997 / LB, { rel: 1e-12 }, NIST);
    const si = profileSeries(history(5), 'si');
    expectClose(si[3]!.distance, 3 * 1.852, { rel: 1e-12 }, NIST);
    expectClose(si[3]!.altitude, 3000 * FT, { rel: 1e-12 }, NIST);
    expect(si[4]!.legIndex).toBe(1);
    expect(si[4]!.time_s).toBe(40);
  });

  it('thins long histories to at most maxPoints, keeping the first and last sample', () => {
    const rows = profileSeries(history(1001), 'si', 101);
    expect(rows).toHaveLength(101);
    expect(rows[0]!.time_s).toBe(0);
    expect(rows[100]!.time_s).toBe(10000);
    expect(sampleIndices(0, 10)).toEqual([]);
    expect(sampleIndices(3, 10)).toEqual([0, 1, 2]);
    expect(sampleIndices(11, 3)).toEqual([0, 5, 10]);
  });
});

describe('polarSeries', () => {
  it('puts one CD column per Mach against CL', () => {
    const { rows, series } = polarSeries({ machs: [0.5, 0.8], cl: [0, 0.5], cd: [[0.02, 0.03], [0.021, 0.035]] });
    expect(series).toEqual([{ key: 'm0', name: 'M 0.50' }, { key: 'm1', name: 'M 0.80' }]);
    expect(rows).toEqual([{ cl: 0, m0: 0.02, m1: 0.021 }, { cl: 0.5, m0: 0.03, m1: 0.035 }]);
  });
});

describe('lapseSeries', () => {
  const curves: LapseCurves = {
    rating: 'maxCruise',
    mach: [0.2, 0.4],
    altitudes_m: [0, 10000 * FT],
    uninstalledThrust_N: [[1000 * LBF, 900 * LBF], [600 * LBF, null]],
    installedThrust_N: [[950 * LBF, 850 * LBF], [560 * LBF, 500 * LBF]],
    uninstalledTsfc_kg_N_s: [[1e-5, 1.1e-5], [1.2e-5, null]],
    installedTsfc_kg_N_s: [[1.05e-5, 1.15e-5], [1.25e-5, 1.3e-5]],
  };

  it('converts thrust to lbf and TSFC to lb/(lbf h), keeping gaps as null', () => {
    const s = lapseSeries(curves, 'customary');
    expect(s.thrustUnit).toBe('lbf');
    expectClose(s.thrust[0]!.u0 as number, 1000, { rel: 1e-12 }, NIST);
    expectClose(s.thrust[1]!.i1 as number, 500, { rel: 1e-12 }, NIST);
    expect(s.thrust[1]!.u1).toBeNull();
    // 1 lb/(lbf h) = 0.45359237 / (4.4482216152605 x 3600) kg/(N s) (NIST SP 811)
    expectClose(s.tsfc[0]!.u0 as number, 1e-5 / (LB / (LBF * 3600)), { rel: 1e-9 }, NIST);
    expect(s.series.map((x) => x.key)).toEqual(['u0', 'i0', 'u1', 'i1']);
    expect(s.series[3]!.name).toBe('installed, 10,000 ft');
  });

  it('shows kN and mg/(N s) in SI', () => {
    const s = lapseSeries(curves, 'si');
    expectClose(s.thrust[0]!.u0 as number, (1000 * LBF) / 1000, { rel: 1e-12 }, NIST);
    expectClose(s.tsfc[0]!.u0 as number, 10, { rel: 1e-12 }, '1 mg/(N s) = 1e-6 kg/(N s), SI prefixes');
  });
});

describe('inletSeries', () => {
  const inlet = (name: string, k: number): InletCurves => ({
    name,
    active: k === 0,
    altitude_m: 10000,
    mach: [0.5, 0.8],
    recovery: [0.99 - k * 0.01, 0.985 - k * 0.01],
    referenceRecovery: [1, 1],
    spillageDrag_N: [0, 100 * LBF],
    throatMach: [0.5, 0.7 + k * 0.05],
    fanFaceMach: [0.45, 0.5],
  });

  it('lines up both designs on the Mach axis with the deck reference', () => {
    const s = inletSeries([inlet('short', 0), inlet('long', 1)], 'customary');
    expect(s.recovery[1]).toEqual({ mach: 0.8, ref: 1, r0: 0.985, r1: 0.975 });
    expectClose(s.spillage[1]!.s1 as number, 100, { rel: 1e-12 }, NIST);
    expect(s.internalMach[1]).toEqual({ mach: 0.8, t0: 0.7, f0: 0.5, t1: 0.75, f1: 0.5 });
    expect(s.recoverySeries.map((x) => x.name)).toEqual(['deck reference', 'short', 'long']);
    expect(s.spillageUnit).toBe('lbf');
    expect(s.hasInternalMach).toBe(true);
    const tableOnly = { ...inlet('t', 0), throatMach: [null, null], fanFaceMach: [null, null] };
    expect(inletSeries([tableOnly], 'si').hasInternalMach).toBe(false);
  });
});

describe('crossoverSeries', () => {
  function result(mach: number[], thrust: number[], drag: number[], marks: Partial<CrossoverResult>): CrossoverResult {
    return {
      lowMach: null,
      highMach: null,
      minThrustMach: null,
      curves: { mach, thrustAvailable_N: thrust, drag_N: drag, excessThrust_N: [], specificExcessPower_m_s: [] },
      ...marks,
    } as CrossoverResult;
  }

  it('merges the Mach grids of the designs, marks crossovers and the thrust minimum', () => {
    const set: CrossoverSet = {
      curves: [
        { inletName: 'A', result: result([0.3, 0.5], [2000, 1800], [2500, 1500], { lowMach: 0.35, highMach: 0.8, minThrustMach: 0.6 }) },
        { inletName: 'B', result: result([0.4, 0.5], [1900, 1700], [2400, 1500], { lowMach: 0.37 }) },
      ],
    };
    const s = crossoverSeries(set, 'si');
    expect(s.unit).toBe('kN');
    expect(s.rows.map((r) => r.mach)).toEqual([0.3, 0.4, 0.5]);
    expect(s.rows[0]).toEqual({ mach: 0.3, t0: 2, d0: 2.5, t1: null, d1: null });
    expect(s.rows[1]).toEqual({ mach: 0.4, t1: 1.9, d1: 2.4, t0: null, d0: null });
    expect(s.markers.map(({ inletName, what, mach }) => [inletName, what, mach])).toEqual([
      ['A', 'low crossover', 0.35],
      ['A', 'high crossover', 0.8],
      ['A', 'thrust minimum', 0.6],
      ['B', 'low crossover', 0.37],
    ]);
    // thrust at the low crossover, linear between (0.3, 2000 N) and (0.5, 1800 N): 1950 N = 1.95 kN
    expectClose(s.markers[0]!.thrust!, 1.95, { rel: 1e-12 }, 'linear interpolation by hand');
    expect(s.markers[1]!.thrust).toBeNull();
    expect(interpolateAt([0, 1], [5, 7], 0.25)).toBe(5.5);
    expect(interpolateAt([0, 1], [5, 7], 1.5)).toBeNull();
  });
});

describe('breakdownWaterfall and payloadRangeRows', () => {
  it('stacks each factor from where the last ended and ends with the total from zero', () => {
    const parts = [
      { factor: 'recovery', blockFuel_kg: 30 },
      { factor: 'spillage', blockFuel_kg: -10 },
      { factor: 'externalDrag', blockFuel_kg: 5 },
      { factor: 'weight', blockFuel_kg: -40 },
    ] as const;
    const result = { breakdown: { parts, total_kg: -15, sumOfParts_kg: -15 } } as unknown as InletComparisonResult;
    const rows = breakdownWaterfall(result, 'si');
    expect(rows.map((r) => [r.base, r.height, r.value])).toEqual([
      [0, 30, 30],
      [20, 10, -10],
      [20, 5, 5],
      [-15, 40, -40],
      [-15, 15, -15],
    ]);
    // the last factor bar ends where the total bar is: the parts add up to the total (Shapley efficiency)
    expect(rows[3]!.base).toBe(rows[4]!.base);
    expect(rows[4]!.total).toBe(true);
    const lb = breakdownWaterfall(result, 'customary');
    expectClose(lb[0]!.value, 30 / LB, { rel: 1e-12 }, NIST);
  });

  it('starts the payload-range line at zero range with the maximum payload', () => {
    const point = (kind: string, payload_kg: number, range_m: number) => ({ kind, payload_kg, range_m });
    const result = {
      maxPayload: point('maxPayload', 2000, 1000 * NMI),
      points: [point('maxPayload', 2000, 1000 * NMI), point('mtowFullFuel', 1000, 2000 * NMI), point('ferry', 0, 2300 * NMI)],
    } as unknown as PayloadRangeResult;
    const rows = payloadRangeRows(result, 'customary');
    expect(rows.map((r) => r.kind)).toEqual(['start', 'maxPayload', 'mtowFullFuel', 'ferry']);
    expect(rows[0]!.range).toBe(0);
    expectClose(rows[2]!.range, 2000, { rel: 1e-12 }, NIST);
    expectClose(rows[2]!.payload, 1000 / LB, { rel: 1e-12 }, NIST);
  });
});

describe('tickText', () => {
  it('shows at most four significant digits without float noise, thousands grouped', () => {
    expect(tickText(2999.999990090659)).toBe('3,000');
    expect(tickText(0.5248502732003647)).toBe('0.5249');
    expect(tickText(0)).toBe('0');
    expect(tickText(-1050)).toBe('-1,050');
    expect(tickText(45000)).toBe('45,000');
    expect(tickText(1234.5678)).toBe('1,235');
    expect(tickText(123456)).toBe('123,500');
    expect(tickText(12345678)).toBe('1.23e+7');
    expect(tickText(0.0004)).toBe('4.00e-4');
    expect(tickText(Number.NaN)).toBe('');
  });
});
