import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runCyclePoint } from '../../../engine/cycle/index';
import { expectClose } from '../../support/assertInDelta';
import { designedCycle, ft, IDEAL_CYCLE } from './cycleFixtures';

// The matched ideal turbofan off design, against an independent scipy computation with the
// assumptions of Mattingly's performance analysis, solved by nested bracketing instead of Newton
// (test/reference/cycleIdealOffDesignReference.py).
interface RefPoint {
  readonly altitude_ft: number;
  readonly mach: number;
  readonly tt4_K: number;
  readonly thrust_N: number;
  readonly fuelFlow_kg_s: number;
  readonly airflow_kg_s: number;
  readonly bypassRatio: number;
  readonly fanPressureRatio: number;
  readonly fanSpeed: number;
  readonly overallPressureRatio: number;
}
const REF = JSON.parse(readFileSync(new URL('../../reference/cycleIdealOffDesignReference.json', import.meta.url), 'utf8')) as { points: RefPoint[] };
const SOURCE = 'test/reference/cycleIdealOffDesignReference.py (scipy, Mattingly performance-analysis assumptions)';

describe('runCyclePoint off design, ideal engine, against the independent matched-engine reference', () => {
  const engine = designedCycle(IDEAL_CYCLE);
  for (const ref of REF.points) {
    it(`matches at ${ref.altitude_ft} ft, Mach ${ref.mach}, Tt4 ${ref.tt4_K} K to 1e-9`, () => {
      const p = runCyclePoint(engine, { altitude_m: ft(ref.altitude_ft), mach: ref.mach, isaDeviation_K: 0, throttle: { kind: 'turbineInletTemperature', value_K: ref.tt4_K } });
      expect(p.status).toBe('converged');
      expectClose(p.thrust_N!, ref.thrust_N, { rel: 1e-9 }, SOURCE);
      expectClose(p.fuelFlow_kg_s!, ref.fuelFlow_kg_s, { rel: 1e-9 }, SOURCE);
      expectClose(p.airflow_kg_s!, ref.airflow_kg_s, { rel: 1e-9 }, SOURCE);
      expectClose(p.bypassRatio!, ref.bypassRatio, { rel: 1e-9 }, SOURCE);
      expectClose(p.fanPressureRatio!, ref.fanPressureRatio, { rel: 1e-9 }, SOURCE);
      expectClose(p.overallPressureRatio!, ref.overallPressureRatio, { rel: 1e-9 }, SOURCE);
      expectClose(p.fanSpeed!, ref.fanSpeed, { rel: 1e-9 }, SOURCE);
    });
  }
});
