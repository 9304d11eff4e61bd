/**
 * `blockwise uncertainty` and `compare --uncertainty`: the JSON contract for
 * automated checks (samples, seed, designs[].blockFuel_kg.{mean,p05,p50,p95},
 * difference_kg.{mean,p05,p50,p95}, probabilityBBetter, drivers[]), the same
 * seed giving the same numbers, and bad options as usage errors. The
 * statistics themselves are checked in test/engine/uncertainty.
 */
import { describe, expect, it } from 'vitest';
import { run, type Json, shortDemoForSuite } from './support/cliRun';

const LONG = 240_000;
const demo = shortDemoForSuite('blockwise-uncertainty-', '600 nmi');

type Band = { mean: number; sd: number; p05: number; p50: number; p95: number };

describe('blockwise uncertainty', () => {
  it('--json keeps the contract, and the same seed gives the same numbers', async () => {
    const a = await run('uncertainty', demo.project(), '--samples', '6', '--seed', '7', '--json');
    expect(a.err).toBe('');
    expect(a.code).toBe(0);
    const doc = (JSON.parse(a.out) as { uncertainty: Json & { designs: { name: string; blockFuel_kg: Band }[]; difference_kg: Band; drivers: Json[] } }).uncertainty;
    expect(doc.samples).toBe(6);
    expect(doc.seed).toBe(7);
    expect(doc.designs.map((d) => d.name)).toEqual(['long pitot', 'short']);
    for (const band of [...doc.designs.map((d) => d.blockFuel_kg), doc.difference_kg]) {
      for (const k of ['mean', 'p05', 'p50', 'p95'] as const) expect(Number.isFinite(band[k])).toBe(true);
      expect(band.p05 <= band.p50 && band.p50 <= band.p95).toBe(true);
    }
    expect(typeof doc.probabilityBBetter).toBe('number');
    expect(doc.drivers.length).toBe(10); // the demo declares ten uncertain inputs
    const b = await run('uncertainty', demo.project(), '--samples', '6', '--seed', '7', '--json');
    const again = (JSON.parse(b.out) as { uncertainty: Json }).uncertainty;
    expect({ ...again, elapsed_s: 0 }).toEqual({ ...doc, elapsed_s: 0 });
  }, LONG);

  it('prints the band, P(B better) and the drivers, ending with the notice', async () => {
    const r = await run('uncertainty', demo.project(), '--samples', '4');
    expect(r.code).toBe(0);
    expect(r.out).toContain('B - A');
    expect(r.out).toMatch(/P\(B burns less block fuel than A\) = \d+\.\d %/);
    expect(r.out).toContain('Drivers of B - A');
    expect(r.out).toContain('Latin hypercube');
  }, LONG);

  it('refuses bad --samples and --seed with exit 2', async () => {
    for (const args of [['--samples', 'ten'], ['--samples', '1'], ['--seed', '-3'], ['--seed', '1.5']]) {
      const r = await run('uncertainty', demo.project(), ...args);
      expect(r.code, args.join(' ')).toBe(2);
      expect(r.err).toMatch(/--(samples|seed)/);
    }
  });
});

describe('blockwise compare --uncertainty', () => {
  it('adds the Monte Carlo to the comparison, text and JSON', async () => {
    const j = await run('compare', demo.project(), '--uncertainty', '--samples', '3', '--json');
    expect(j.code).toBe(0);
    const doc = JSON.parse(j.out) as { breakdown: Json; uncertainty: { difference_kg: Band; samples: number } };
    expect(doc.breakdown.method).toBe('shapley');
    expect(doc.uncertainty.samples).toBe(3);
    expect(Number.isFinite(doc.uncertainty.difference_kg.p95)).toBe(true);
    const t = await run('compare', demo.project(), '--uncertainty', '--samples', '3');
    expect(t.out).toContain('Block-fuel difference B - A');
    expect(t.out).toContain('Uncertainty — 3 of 3 samples');
  }, LONG);

  it('--samples without --uncertainty is a usage error', async () => {
    const r = await run('compare', demo.project(), '--samples', '3');
    expect(r.code).toBe(2);
  });
});
