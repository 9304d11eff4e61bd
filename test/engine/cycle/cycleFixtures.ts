/** The cycle fixtures, parsed and designed, for the cycle tests. */
import { readFileSync } from 'node:fs';
import { expectOk } from '../../../engine/core/result';
import { parseCycleFile } from '../../../engine/cycle/cycleFile';
import { designEngine, type CycleEngine, type CycleSpec } from '../../../engine/cycle/index';

export const IDEAL_CYCLE = 'fixtures/cycle/ideal-turbofan.cycle.json';
export const DEMO_CYCLE = 'fixtures/cycle/demo-turbofan.cycle.json';

export function cycleSpecFile(path: string): CycleSpec {
  const text = readFileSync(new URL(`../../../${path}`, import.meta.url), 'utf8');
  return expectOk(parseCycleFile(text, path), path);
}

export function designedCycle(path: string): CycleEngine {
  return expectOk(designEngine(cycleSpecFile(path)), path);
}

/** Pressure altitude of a height in feet (m; international foot, NIST SP 811). */
export function ft(feet: number): number {
  return feet * 0.3048;
}
