import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseJsonText } from '../../engine/project/jsonText';
import { parseVary } from '../../engine/project/sweepGrid';
import type { SweepRow } from '../../engine/project/sweepCase';
import { runSweepPool, startSweepCrew } from '../../cli/sweep/sweepPool';
import { SAFETY_NOTICE_LINES } from '../../engine/core/notice';
import { FUEL_TOLERANCE_KG } from '../../engine/mission/fuelIteration';
import { run, writeShortDemo, type Json, shortDemoForSuite } from './support/cliRun';

const demo = shortDemoForSuite('blockwise-sweep-', '600 nmi');

/** The data rows of a sweep CSV (after the # notice lines and the header), by case number. */
function csvRows(text: string): Map<number, string[]> {
  const lines = text.trim().split('\n').filter((l) => !l.startsWith('#'));
  const rows = new Map<number, string[]>();
  for (const line of lines.slice(1)) {
    const cells = line.split(',');
    rows.set(Number(cells[0]), cells);
  }
  return rows;
}

describe('blockwise sweep', () => {
  it('blockwise sweep writes one row per case whose block fuel is the single fly run of that case, within the fuel band', async () => {
    const out = join(demo.dir(), 'ranges.csv');
    // One worker: the second and third cases start from their neighbours' solves (engine/study/prepareSweep.ts).
    const r = await run('sweep', demo.project(), '--vary', 'mission.solve.range=600nmi:700nmi:50nmi', '--workers', '1', '--out', out);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^3 of 3 cases flown in .* on 1 threads; status: ok 3; rows in /);
    const text = readFileSync(out, 'utf8');
    // The notice as # lines, as every exported CSV (engine/core/notice.ts).
    expect(text.startsWith(SAFETY_NOTICE_LINES.map((l) => `# ${l}\n`).join(''))).toBe(true);
    expect(text).toContain('case,mission.solve.range,status,blockFuel[kg],blockTime[s],tripFuel[kg],takeoffMass[kg],cautions,message\n');
    const rows = csvRows(text);
    expect([...rows.keys()].sort()).toEqual([0, 1, 2]);
    for (const [k, range] of [[0, '600 nmi'], [1, '650 nmi'], [2, '700 nmi']] as const) {
      const single = await run('fly', writeShortDemo(mkdtempSync(join(demo.dir(), 'one-')), range), '--json');
      const doc = JSON.parse(single.out) as Json & { blockFuel_kg: number; blockTime_s: number; takeoffWeight_kg: number };
      const row = rows.get(k)!;
      expect(row[1]).toBe(range);
      expect(row[2]).toBe('ok');
      // The fuel iteration meets the reserve within its band (FUEL_TOLERANCE_KG) from any start, cold or warm.
      expect(Math.abs(Number(row[3]) - doc.blockFuel_kg)).toBeLessThanOrEqual(FUEL_TOLERANCE_KG);
      expect(Math.abs(Number(row[6]) - doc.takeoffWeight_kg)).toBeLessThanOrEqual(FUEL_TOLERANCE_KG);
      expect(Math.abs(Number(row[4]) - doc.blockTime_s)).toBeLessThan(1);
    }
  }, 120_000);

  it('blockwise sweep --shard i/n flies disjoint blocks that together are the whole grid', async () => {
    const seen: number[] = [];
    for (const shard of ['1/3', '2/3', '3/3']) {
      const r = await run('sweep', demo.project(), '--vary', 'polar.cdIncrement=0:0.0004:0.0001', '--workers', '1', '--shard', shard, '--json');
      expect(r.code).toBe(0);
      const lines = r.out.trim().split('\n').map((l) => JSON.parse(l) as Json);
      expect(lines[0]!.cases).toBe(5);
      for (const row of lines.slice(1)) seen.push(row.case as number);
    }
    expect(seen.sort()).toEqual([0, 1, 2, 3, 4]);
  }, 120_000);

  it('blockwise sweep names the bad part of a --vary on one line with exit code 2', async () => {
    const r = await run('sweep', demo.project(), '--vary', 'mission.solve.rnage=1:2:1');
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err).toMatch(/^blockwise sweep: --vary mission.solve.rnage=1:2:1: mission.solve has no field "rnage"; it has .*range.*\n$/);
    const none = await run('sweep', demo.project());
    expect(none.code).toBe(2);
    expect(none.err).toMatch(/give at least one --vary/);
    const shard = await run('sweep', demo.project(), '--vary', 'polar.cdIncrement=0:0.001:0.001', '--shard', '4/3');
    expect(shard.err).toMatch(/--shard 4\/3: i must be from 1 to 3/);
  });

  it('runSweepPool over three lanes flies every case of its range exactly once, lanes taken over as they finish', async () => {
    const doc = parseJsonText(readFileSync(demo.project(), 'utf8'));
    if (!doc.ok) throw new Error('short demo does not parse');
    const axis = parseVary(doc.value, 'polar.cdIncrement=0:0.0012:0.0001');
    if (!axis.ok) throw new Error(axis.error.message);
    const { loadProjectFromDisk } = await import('../../cli/projectFiles');
    const loaded = await loadProjectFromDisk(demo.project());
    if (!loaded.ok) throw new Error('short demo does not load');
    const seen: number[] = [];
    const pool = runSweepPool({ doc: doc.value, axes: [axis.value], deck: loaded.value.deck, inletName: undefined }, { start: 2, end: 13 }, 3, (r) => {
      seen.push(...r.map((row) => row.case));
    });
    const result = await pool.finished;
    expect(result).toEqual({ completed: 11, stopped: false, error: null });
    expect(seen.sort((a, b) => a - b)).toEqual([2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
  }, 120_000);

  it('runSweepPool flies on workers started ahead (startSweepCrew), starting more when the crew is short, and leaves the rest to the crew', async () => {
    const doc = parseJsonText(readFileSync(demo.project(), 'utf8'));
    if (!doc.ok) throw new Error('short demo does not parse');
    const axis = parseVary(doc.value, 'polar.cdIncrement=0:0.0005:0.0001');
    if (!axis.ok) throw new Error(axis.error.message);
    const { loadProjectFromDisk } = await import('../../cli/projectFiles');
    const loaded = await loadProjectFromDisk(demo.project());
    if (!loaded.ok) throw new Error('short demo does not load');
    const data = { doc: doc.value, axes: [axis.value], deck: loaded.value.deck, inletName: undefined };
    // Three started, two used: one is left with the crew.
    const crew = startSweepCrew(3);
    const seen: number[] = [];
    const result = await runSweepPool(data, { start: 0, end: 6 }, 2, (r) => seen.push(...r.map((row) => row.case)), crew).finished;
    expect(result).toEqual({ completed: 6, stopped: false, error: null });
    expect(seen.sort((a, b) => a - b)).toEqual([0, 1, 2, 3, 4, 5]);
    const left = crew.take(5);
    expect(left).toHaveLength(1);
    await left[0]!.terminate();
    // One started, two wanted: the pool starts the second itself; a disposed crew has none left.
    const short = startSweepCrew(1);
    const again = await runSweepPool(data, { start: 0, end: 6 }, 2, () => {}, short).finished;
    expect(again.completed).toBe(6);
    short.dispose();
    expect(short.take(1)).toEqual([]);
  }, 120_000);

  it('blockwise sweep interrupted (SIGINT) keeps the rows flown, says so and exits with 130', async () => {
    const out = join(demo.dir(), 'interrupted.csv');
    const running = run('sweep', demo.project(), '--vary', 'polar.cdIncrement=0:0.01:0.00005', '--workers', '1', '--out', out);
    // Interrupted once some rows are on disk (the grid has 201 cases; the rows are written as they come).
    for (let i = 0; i < 600 && !(existsSync(out) && csvRows(readFileSync(out, 'utf8')).size >= 3); i++) await new Promise((r) => setTimeout(r, 100));
    process.emit('SIGINT');
    const r = await running;
    expect(r.code).toBe(130);
    expect(r.out).toMatch(/^Interrupted: \d+ of 201 cases flown/);
    const rows = csvRows(readFileSync(out, 'utf8'));
    expect(rows.size).toBeGreaterThanOrEqual(3);
    expect(rows.size).toBeLessThan(201);
    expect(r.out).toContain(`Interrupted: ${rows.size} of 201 cases flown`);
    for (const cells of rows.values()) expect(cells[2]).toBe('ok');
  }, 120_000);

  it('runSweepPool stopped early keeps the rows received and says it was stopped', async () => {
    const doc = parseJsonText(readFileSync(demo.project(), 'utf8'));
    if (!doc.ok) throw new Error('short demo does not parse');
    const axis = parseVary(doc.value, 'polar.cdIncrement=0:0.01:0.0001');
    if (!axis.ok) throw new Error(axis.error.message);
    const rows: SweepRow[] = [];
    const { loadProjectFromDisk } = await import('../../cli/projectFiles');
    const loaded = await loadProjectFromDisk(demo.project());
    if (!loaded.ok) throw new Error('short demo does not load');
    const pool = runSweepPool({ doc: doc.value, axes: [axis.value], deck: loaded.value.deck, inletName: undefined }, { start: 0, end: 101 }, 1, (r) => {
      rows.push(...r);
      if (rows.length >= 3) pool.stop();
    });
    const result = await pool.finished;
    expect(result.stopped).toBe(true);
    expect(result.completed).toBe(rows.length);
    expect(rows.length).toBeGreaterThanOrEqual(3);
    expect(rows.length).toBeLessThan(101);
  }, 120_000);
});
