import { readFileSync } from 'node:fs';
import { expectOk } from '../../../engine/core/result';
import { parseCycleFile } from '../../../engine/cycle/cycleFile';
import { designEngine, runCyclePoint, type CyclePointResult } from '../../../engine/cycle/index';
import type { BenchSection } from '../benchTypes';

// The demo cycle (fixtures/cycle/demo-turbofan.cycle.json): the deck generator's calls.
const path = 'fixtures/cycle/demo-turbofan.cycle.json';
const spec = expectOk(parseCycleFile(readFileSync(new URL(`../../../${path}`, import.meta.url), 'utf8'), path), path);
const engine = expectOk(designEngine(spec), 'demo cycle');

const conditions = Array.from({ length: 40 }, (_, i) => ({ altitude_m: (i % 10) * 1400, mach: 0.1 * (i % 9), isaDeviation_K: 0 }));
let k = 0;
function next() {
  k = (k + 1) % conditions.length;
  return conditions[k]!;
}
let previous: CyclePointResult | null = null;
let m = 0;

export const section: BenchSection = {
  title: 'engine cycle',
  cases: [
    { name: 'designEngine (demo, sized to thrust)', run: () => designEngine(spec) },
    { name: 'runCyclePoint at a rating, cold start', run: () => runCyclePoint(engine, { ...next(), throttle: { kind: 'rating', rating: 'maxClimb' } }) },
    { name: 'runCyclePoint at a fixed N1, cold start', run: () => runCyclePoint(engine, { ...next(), throttle: { kind: 'fanSpeed', fraction: 0.9 } }) },
    {
      name: 'runCyclePoint at a rating, warm start along Mach',
      run: () => {
        m = (m + 1) % 19;
        previous = runCyclePoint(engine, { altitude_m: 9000, mach: 0.05 * m, isaDeviation_K: 0, throttle: { kind: 'rating', rating: 'maxClimb' }, ...(previous?.start && m > 0 ? { start: previous.start } : {}) });
        return previous;
      },
    },
  ],
};
