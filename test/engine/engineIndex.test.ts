import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
// @ts-expect-error -- a plain ES module script without type declarations
import { engineIndexText } from '../../scripts/writeEngineIndex.mjs';
import * as engine from '../../engine/index';

describe('engine/index.ts', () => {
  it('re-exports every engine module (regenerate with node scripts/writeEngineIndex.mjs)', () => {
    const committed = readFileSync(new URL('../../engine/index.ts', import.meta.url), 'utf8');
    expect(committed).toBe(engineIndexText());
  });

  it('exposes the main entry points', () => {
    expect(typeof engine.solveMission).toBe('function');
    expect(typeof engine.parseProject).toBe('function');
    expect(typeof engine.parseDeckCsv).toBe('function');
    expect(typeof engine.thrustDragCrossover).toBe('function');
    expect(typeof engine.atmosphere).toBe('function');
    expect(engine.SAFETY_NOTICE).toMatch(/not approved/);
  });
});
