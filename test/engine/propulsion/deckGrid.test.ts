import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import { AXIS_MACH, buildDeckGrid, createDeckNodeSet, deckGridPoints, fillDeckNodes } from '../../../engine/propulsion/deckGrid';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import { lookupDeck } from '../../../engine/propulsion/deckLookup';
import type { EngineDeck } from '../../../engine/propulsion/engineDeck';
import { expectClose } from '../../support/assertInDelta';
import { loadInterpReference, raggedDeck, referenceDeck, type ReferenceCase, type ReferenceFile } from './deckTestDecks';

const ref = loadInterpReference();

function checkAgainstReference(deck: EngineDeck, c: ReferenceCase, label: string): void {
  for (const q of c.queries) {
    const r = expectOk(lookupDeck(deck, { altitude_m: q.altitude_m, mach: q.mach, isaDev_K: q.isaDev_K }, q.power), label);
    const source = `${label} at ${q.altitude_m} m, M ${q.mach}, ${q.power}, ISA${q.isaDev_K} (${ref.source})`;
    expectClose(r.thrust_N, q.thrust_N, { rel: 1e-9, abs: 1e-9 }, source);
    expectClose(r.fuelFlow_kg_s, q.fuelFlow_kg_s, { rel: 1e-9, abs: 1e-15 }, source);
    expectClose(r.airflow_kg_s!, q.airflow_kg_s, { rel: 1e-9, abs: 1e-12 }, source);
    expect(r.outside).toEqual([]);
  }
}

describe('deckGrid', () => {
  it('interpolates a regular grid like scipy RegularGridInterpolator (linear), on and between grid points', () => {
    checkAgainstReference(referenceDeck(ref.regular, false), ref.regular, 'regular 3-D');
  });

  it('interpolates a regular grid with an ISA-deviation axis like scipy RegularGridInterpolator in 4-D', () => {
    const deck = referenceDeck(ref.regular4, true);
    expect(deck.hasIsaDev).toBe(true);
    checkAgainstReference(deck, ref.regular4, 'regular 4-D');
  });

  it('interpolates a ragged grid like numpy.interp along power, then Mach, then altitude', () => {
    checkAgainstReference(referenceDeck(ref.ragged, false), ref.ragged, 'ragged');
  });

  it('builds a ragged grid with each altitude its own Machs and each node its own powers', () => {
    const g = raggedDeck().grid;
    expect(Array.from(g.altitudes_m)).toEqual([0, 3000]);
    expect(Array.from(g.machs)).toEqual([0, 0.5, 0.2, 0.6, 0.8]);
    expect(Array.from(g.machStart)).toEqual([0, 2, 5]);
    expect(Array.from(g.pointStart)).toEqual([0, 3, 6, 9, 13, 15]);
    expect(deckGridPoints(g)).toHaveLength(15);
  });

  it('interpolates ISA levels that each have their own altitudes (hand calculation)', () => {
    const rows = [
      // isa, alt, M, thrust at power 0 and 1
      [0, 0, 0, 100, 200], [0, 0, 1, 90, 180], [0, 1000, 0, 80, 160], [0, 1000, 1, 70, 140],
      [20, 0, 0, 95, 190], [20, 0, 1, 85, 170], [20, 2000, 0, 60, 120], [20, 2000, 1, 50, 100],
    ];
    const text = ['isa_dev[K],altitude[m],mach[-],power[-],thrust[N],fuel_flow[kg/s]']
      .concat(rows.flatMap(([i, a, m, t0, t1]) => [`${i},${a},${m},0,${t0},0.1`, `${i},${a},${m},1,${t1},0.2`]))
      .join('\n');
    const deck = expectOk(parseDeckCsv(text, 'isa.csv'), 'isa deck');
    // ISA+0: 500 m between 0 m (190 N at M 0.5) and 1000 m (150 N): 170 N.
    // ISA+20: 500 m is a quarter of the way from 0 m (180 N) to 2000 m (110 N): 162.5 N.
    // ISA+10 halfway: 166.25 N.
    const r = expectOk(lookupDeck(deck, { altitude_m: 500, mach: 0.5, isaDev_K: 10 }, 1), 'isa lookup');
    expectClose(r.thrust_N, 166.25, { rel: 1e-14 }, 'hand calculation');
    expect(r.outside).toEqual([]);
    expect(r.cautions).toEqual([]);
  });

  it('buildDeckGrid sorts points given in any order', () => {
    const pts = deckGridPoints(raggedDeck().grid);
    const shuffled = [...pts].reverse();
    expect(deckGridPoints(buildDeckGrid(shuffled))).toEqual(pts);
  });

  it('fillDeckNodes reports the Mach axis when a bracketing altitude has a narrower Mach range', () => {
    const deck = raggedDeck();
    const s = createDeckNodeSet();
    // Mach 0.7 is inside 3000 m's range (0.2..0.8) but above 0 m's (0..0.5).
    expect(fillDeckNodes(deck.grid, deck.policy, 0, 1500, 0.7, s)).toBe(true);
    expect(s.outsideMask).toBe(1 << AXIS_MACH);
    expect(s.outsideMax[AXIS_MACH]).toBe(0.5);
    let sum = 0;
    for (let k = 0; k < s.count; k++) sum += s.weight[k]!;
    expectClose(sum, 1, { abs: 1e-12 }, 'multilinear weights sum to one (partition of unity)');
  });

  it('is exact on every tabulated point (property)', () => {
    const c = ref.ragged;
    const deck = referenceDeck(c, false);
    fc.assert(
      fc.property(fc.integer({ min: 0, max: c.rows.length - 1 }), (i) => {
        const [, alt, mach, power, thrust, fuel, air] = c.rows[i]!;
        const r = expectOk(lookupDeck(deck, { altitude_m: alt!, mach: mach!, isaDev_K: 0 }, power!), 'grid point');
        expect(r.thrust_N).toBe(thrust);
        expect(r.fuelFlow_kg_s).toBe(fuel);
        expect(r.airflow_kg_s).toBe(air);
      }),
    );
  });

  it('stays within the hull of the surrounding tabulated values inside the table (property)', () => {
    const c = ref.regular;
    const deck = referenceDeck(c, false);
    const alts = [...new Set(c.rows.map((r) => r[1]!))];
    const machs = [...new Set(c.rows.map((r) => r[2]!))];
    const powers = [...new Set(c.rows.map((r) => r[3]!))];
    const cell = (axis: readonly number[], x: number): [number, number] => {
      let i = 0;
      while (i < axis.length - 2 && x > axis[i + 1]!) i++;
      return [axis[i]!, axis[i + 1]!];
    };
    fc.assert(
      fc.property(
        fc.double({ min: alts[0]!, max: alts.at(-1)!, noNaN: true }),
        fc.double({ min: machs[0]!, max: machs.at(-1)!, noNaN: true }),
        fc.double({ min: powers[0]!, max: powers.at(-1)!, noNaN: true }),
        (alt, mach, power) => {
          const r = expectOk(lookupDeck(deck, { altitude_m: alt, mach, isaDev_K: 0 }, power), 'inside');
          const [a0, a1] = cell(alts, alt);
          const [m0, m1] = cell(machs, mach);
          const [p0, p1] = cell(powers, power);
          const corners = c.rows.filter(
            (row) => (row[1] === a0 || row[1] === a1) && (row[2] === m0 || row[2] === m1) && (row[3] === p0 || row[3] === p1),
          );
          expect(corners).toHaveLength(8);
          const t = corners.map((row) => row[4]!);
          const tol = 1e-9 * Math.max(...t);
          expect(r.thrust_N).toBeGreaterThanOrEqual(Math.min(...t) - tol);
          expect(r.thrust_N).toBeLessThanOrEqual(Math.max(...t) + tol);
          expect(r.outside).toEqual([]);
        },
      ),
    );
  });
});

describe('deckInterpReference.json', () => {
  it('is what test/reference/deckInterpReference.py computes now (numpy/scipy)', () => {
    const dir = mkdtempSync(join(tmpdir(), 'blockwise-deckref-'));
    try {
      const out = join(dir, 'ref.json');
      const script = fileURLToPath(new URL('../../reference/deckInterpReference.py', import.meta.url));
      execFileSync('python3', [script, out], { stdio: 'pipe' });
      const committed = fileURLToPath(new URL('../../reference/deckInterpReference.json', import.meta.url));
      const fresh = JSON.parse(readFileSync(out, 'utf8')) as ReferenceFile;
      const saved = JSON.parse(readFileSync(committed, 'utf8')) as ReferenceFile;
      expect(fresh.ragged.queries.length).toBeGreaterThan(200);
      for (const key of ['regular', 'regular4', 'ragged'] as const) {
        expect(fresh[key].rows).toEqual(saved[key].rows);
        fresh[key].queries.forEach((q, i) => {
          const s = saved[key].queries[i]!;
          expectClose(q.thrust_N, s.thrust_N, { rel: 1e-14, abs: 1e-12 }, 'scipy re-run');
          expectClose(q.fuelFlow_kg_s, s.fuelFlow_kg_s, { rel: 1e-14, abs: 1e-16 }, 'scipy re-run');
        });
      }
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
    // importing scipy can take seconds on a loaded machine; this is not a speed check
  }, 60_000);
});
