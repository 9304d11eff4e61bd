import { describe, expect, it } from 'vitest';
import { runCyclePoint } from '../../../engine/cycle/index';
import { designedCycle, DEMO_CYCLE, ft, IDEAL_CYCLE } from './cycleFixtures';

// Common practice: at a fixed fan speed near sea level, a turbofan's net thrust falls with Mach
// (ram drag grows with V0), reaches a minimum and partly recovers as the ram pressure rise
// (growing with the square of speed) takes over; TSFC rises with Mach. The cycle is not tuned
// to this; the tests check the shape and the minimum's Mach is a reported figure (docs/cycle.md).
function machLine(path: string, altitude_ft: number, fanSpeed: number) {
  const engine = designedCycle(path);
  const out: { mach: number; thrust: number; tsfc: number }[] = [];
  for (let i = 0; i <= 18; i++) {
    const mach = i * 0.05;
    const p = runCyclePoint(engine, { altitude_m: ft(altitude_ft), mach, isaDeviation_K: 0, throttle: { kind: 'fanSpeed', fraction: fanSpeed } });
    expect(p.status, `Mach ${mach}`).toBe('converged');
    out.push({ mach, thrust: p.thrust_N!, tsfc: p.tsfc_kg_N_s! });
  }
  return out;
}

function minimumIndex(line: readonly { thrust: number }[]): number {
  let best = 0;
  for (let i = 1; i < line.length; i++) if (line[i]!.thrust < line[best]!.thrust) best = i;
  return best;
}

describe('net thrust against Mach at a fixed fan speed (common practice shape)', () => {
  const cases: readonly [string, string, number, number][] = [
    ['demo', DEMO_CYCLE, 0, 1],
    ['demo', DEMO_CYCLE, 0, 0.9],
    ['demo', DEMO_CYCLE, 35000, 0.9],
    ['ideal', IDEAL_CYCLE, 0, 0.9],
  ];
  for (const [name, path, altitude, n1] of cases) {
    it(`${name} engine at ${altitude} ft, N1 ${n1}: falls from static, has an interior minimum, partly recovers; TSFC rises`, () => {
      const line = machLine(path, altitude, n1);
      const iMin = minimumIndex(line);
      expect(iMin).toBeGreaterThan(0);
      expect(iMin).toBeLessThan(line.length - 1);
      for (let i = 1; i <= iMin; i++) expect(line[i]!.thrust).toBeLessThan(line[i - 1]!.thrust);
      for (let i = iMin + 1; i < line.length; i++) expect(line[i]!.thrust).toBeGreaterThan(line[i - 1]!.thrust);
      // partial recovery: the end of the line stays well below static thrust
      expect(line[line.length - 1]!.thrust).toBeLessThan(0.9 * line[0]!.thrust);
      for (let i = 1; i < line.length; i++) expect(line[i]!.tsfc).toBeGreaterThan(line[i - 1]!.tsfc);
    });
  }
});
