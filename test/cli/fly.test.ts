import { execFile } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { beforeAll, describe, expect, it } from 'vitest';
import { SAFETY_NOTICE, SAFETY_NOTICE_LINES } from '../../engine/core/notice';
import { HISTORY_COLUMNS } from '../../engine/study';
import { expectClose } from '../support/assertInDelta';
import { DEMO_PROJECT, repoRoot, run, type Json } from './support/cliRun';
import { scratchFolderForSuite } from '../support/scratchFolder';

const DEMO = DEMO_PROJECT;
// Conversion factors: NIST SP 811 (nmi = 1852 m, lb = 0.45359237 kg).
const NMI = 1852;
const LB = 0.45359237;


const REQUIRED_NUMBERS = [
  'blockFuel_kg',
  'blockTime_s',
  'tripFuel_kg',
  'tripTime_s',
  'reserveFuel_kg',
  'takeoffWeight_kg',
  'landingWeight_kg',
  'zeroFuelWeight_kg',
  'payload_kg',
  'distance_m',
] as const;

describe('blockwise fly <demo> --json', () => {
  let demo: Json;
  let code = -1;
  beforeAll(async () => {
    const r = await run('fly', DEMO, '--json');
    code = r.code;
    expect(r.err).toBe('');
    demo = JSON.parse(r.out) as Json;
  });

  it('fly exits 0 with status ok on the demo project', () => {
    expect(demo.status).toBe('ok');
    expect(code).toBe(0);
  });

  it('fly --json has every required key, each a finite number', () => {
    for (const key of REQUIRED_NUMBERS) {
      expect(typeof demo[key], key).toBe('number');
      expect(Number.isFinite(demo[key]), key).toBe(true);
      expect(demo[key] as number, key).toBeGreaterThan(0);
    }
    expect(Array.isArray(demo.legs)).toBe(true);
    expect(Array.isArray(demo.cautions)).toBe(true);
    expect(demo.notice).toBe(SAFETY_NOTICE);
    // The method follows the deck: its sensitivity columns when it has them, else Raymer's rule.
    const demoDeckText = readFileSync(join(repoRoot, 'fixtures/demo/demo-engine.deck.csv'), 'utf8');
    expect(demo.installationMethod).toBe(/dthrust_drecovery\[/.test(demoDeckText) ? 'deckSensitivities' : 'raymerCorrections');
    const reserves = demo.reserves as Record<string, number>;
    for (const key of ['contingency_kg', 'alternate_kg', 'finalReserve_kg', 'extra_kg', 'total_kg']) {
      expect(Number.isFinite(reserves[key]), key).toBe(true);
    }
  });

  it('fly flies the range and carries the payload the demo file states', () => {
    // The demo asks for 3,000 nmi with 1,600 lb payload (fixtures/demo/demo.blockwise.json).
    expectClose(demo.distance_m as number, 3000 * NMI, { rel: 1e-3 }, 'project range, NIST SP 811 nmi');
    expectClose(demo.payload_kg as number, 1600 * LB, { rel: 1e-12 }, 'project payload, NIST SP 811 lb');
  });

  it('fly lands the demo at its destination elevation after a descent to 1,500 ft above it', () => {
    // The demo's destination is at 420 ft and its descent ends at 1,920 ft (fixtures/demo/demo.blockwise.json);
    // 1,500 ft above the aerodrome before the approach is common practice. NIST SP 811: 1 ft = 0.3048 m.
    const FT = 0.3048;
    const legs = demo.legs as { kind: string; startAltitude_m: number; endAltitude_m: number }[];
    const byKind = (kind: string) => legs.find((l) => l.kind === kind)!;
    expectClose(byKind('descent').endAltitude_m, 1920 * FT, { abs: 1e-6 }, 'descent target, demo file');
    expectClose(byKind('approach').endAltitude_m, 420 * FT, { abs: 1e-6 }, 'destination elevation, demo file');
    expectClose(byKind('taxiIn').startAltitude_m, 420 * FT, { abs: 1e-6 }, 'taxi in at the destination');
    // No warning and no caution. The one info allowed: the cycle deck's flight idle (fan speed 0.5 of design,
    // fixtures/cycle/demo-turbofan.cycle.json) gives more thrust than the drag of the final-reserve hold at the
    // minimum-drag speed, so that hold burns idle fuel flow (drag devices assumed); it must say so and carry the
    // two forces it compares (drag below idle thrust).
    const cautions = demo.cautions as { id: string; severity: string; legName: string; value: number; threshold: number }[];
    for (const c of cautions) {
      expect(c.id, c.legName).toBe('idle_thrust_above_drag');
      expect(c.severity).toBe('info');
      expect(c.legName).toMatch(/final reserve hold/);
      expect(c.value).toBeLessThan(c.threshold);
    }
  });

  it('fly --json figures add up: reserves = sum of parts, block fuel = sum of legs, landing = ZFW + reserve', () => {
    // Definitions of block and trip fuel (common practice): block fuel is burnt from block-out to
    // block-in; trip fuel from takeoff to landing; the reserve total is the sum of its parts.
    const r = demo.reserves as Record<string, number>;
    expectClose(r.total_kg!, r.contingency_kg! + r.alternate_kg! + r.finalReserve_kg! + r.extra_kg!, { abs: 1e-6 }, 'definition of the reserve total');
    expectClose(demo.reserveFuel_kg as number, r.total_kg!, { abs: 1e-6 }, 'definition of the reserve total');
    expect(demo.blockFuel_kg as number).toBeGreaterThan(demo.tripFuel_kg as number);
    const legs = demo.legs as { fuel_kg: number; kind: string }[];
    // payloadRange lands with exactly the reserve on board (issue 4; engine/mission/solveMission.ts); taxi-in is burned after landing.
    expectClose(demo.landingWeight_kg as number, (demo.zeroFuelWeight_kg as number) + (demo.reserveFuel_kg as number), { rel: 1e-4 }, 'payload-range mode lands with exactly the reserve (issue 4)');
    const legFuel = legs.filter((l) => l.kind !== 'reserve').reduce((s, l) => s + l.fuel_kg, 0);
    expectClose(legFuel, demo.blockFuel_kg as number, { rel: 1e-9 }, 'block fuel is the sum of the mission legs');
  });

  it('fly --json says what the distances measure and shows every reserve allowance as a leg', () => {
    // The demo flies over the ground (fixtures/demo/demo.blockwise.json distanceBasis "ground").
    expect(demo.distanceBasis).toBe('ground');
    expect(demo.distanceBasisNote).toMatch(/over the ground/);
    expectClose(demo.groundDistance_m as number, 3000 * NMI, { abs: 1 }, 'the range is a ground distance');
    // ICAO Annex 6 alternate fuel: missed approach at the destination, the flight, approach and landing (reserveRules.ts).
    const names = (demo.legs as { kind: string; name: string; fuel_kg: number }[]).filter((l) => l.kind === 'reserve');
    expect(names.map((l) => l.name.replace(/ \(.*$/, ''))).toEqual([
      'reserve: contingency',
      'reserve: missed approach at the destination',
      'reserve: alternate',
      'reserve: approach and landing at the alternate',
      'reserve: final reserve hold',
    ]);
    const r = demo.reserves as Record<string, number>;
    expectClose(r.alternate_kg!, names.slice(1, 4).reduce((t, l) => t + l.fuel_kg, 0), { rel: 1e-12 }, 'alternate fuel = its three legs');
  });
});

describe('blockwise fly text output', () => {
  it('fly prints the headline figures, the legs, the cautions and the safety notice', async () => {
    const r = await run('fly', DEMO);
    expect(r.code).toBe(0);
    for (const text of ['Block fuel', 'Block time', 'Trip fuel', 'Reserve fuel', 'contingency', 'alternate', 'final reserve', 'Takeoff weight', 'Landing weight', 'Zero-fuel weight', 'Payload', 'Distance', 'Legs', 'Cruise', 'Cautions']) {
      expect(r.out, text).toContain(text);
    }
    for (const line of SAFETY_NOTICE_LINES) expect(r.out).toContain(line);
    expect(r.out).toContain('Distances: over the ground');
    expect(r.out).toContain('missed approach');
    // legs numbered from 1, as the app's table and the messages number them
    expect(r.out).toMatch(/^\s+1\s+Taxi out\s/m);
    expect(r.out).not.toMatch(/^\s+0\s+Taxi out\s/m);
  });

  it("fly's installation assumptions name the method the result used: the demo's cycle deck by its sensitivity columns, a deck without them by Raymer's rule", async () => {
    const demo = await run('fly', DEMO, '--json');
    const j = JSON.parse(demo.out) as Json & { assumptions: string[]; installationMethod: string };
    expect(j.assumptions[0]).toContain("deck's own sensitivity columns");
    expect(j.assumptions[0]).not.toContain('Raymer');
    const dir = mkdtempSync(join(tmpdir(), 'blockwise-fly-method-'));
    try {
      const project = JSON.parse(readFileSync(join(repoRoot, DEMO), 'utf8')) as Json & { engine: { deck: Json } };
      project.engine.deck = { kind: 'file', path: join(repoRoot, 'fixtures/parametric/demo-parametric.deck.csv') };
      const file = join(dir, 'parametric.blockwise.json');
      writeFileSync(file, JSON.stringify(project));
      const r = await run('fly', file, '--json');
      const k = JSON.parse(r.out) as Json & { assumptions: string[] };
      expect(k.assumptions[0]).toContain("Raymer's rule");
      expect(k.assumptions[0]).not.toContain('uses those instead');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});

describe('blockwise fly options', () => {
  const dir = scratchFolderForSuite('blockwise-fly-');

  it('fly --csv writes the time history with units in the header', async () => {
    const file = join(dir(), 'history.csv');
    const r = await run('fly', DEMO, '--csv', file, '--json');
    expect(r.code).toBe(0);
    const all = readFileSync(file, 'utf8').trimEnd().split('\n');
    // The safety notice heads the file as # comment lines (DESIGN.md §7).
    expect(all.slice(0, SAFETY_NOTICE_LINES.length)).toEqual(SAFETY_NOTICE_LINES.map((l) => `# ${l}`));
    const lines = all.slice(SAFETY_NOTICE_LINES.length);
    const header = lines[0]!.split(',');
    // The one results CSV of the CLI and the app (engine/study/resultsCsv.ts, docs/results-csv.md).
    expect(header).toEqual(HISTORY_COLUMNS.map(([head]) => head));
    for (const h of ['time[s]', 'distance[m]', 'altitude[m]', 'mach[-]', 'mass[kg]', 'fuel_flow[kg/s]', 'leg[-]']) expect(header).toContain(h);
    expect(lines.length).toBeGreaterThan(20);
    for (const line of lines.slice(1)) {
      const cells = line.split(',');
      expect(cells).toHaveLength(header.length);
      for (const c of cells) expect(Number.isFinite(Number(c)), `cell ${c}`).toBe(true);
    }
    const time = header.indexOf('time[s]');
    const last = Number(lines.at(-1)!.split(',')[time]);
    const json = JSON.parse(r.out) as Json;
    expect(last).toBeGreaterThanOrEqual((json.blockTime_s as number) * 0.999);
  });

  it('fly --inlet flies the named inlet design: the two demo inlets give different block fuel', async () => {
    const a = JSON.parse((await run('fly', DEMO, '--json', '--inlet', 'long pitot')).out) as Json;
    const b = JSON.parse((await run('fly', DEMO, '--json', '--inlet', 'short')).out) as Json;
    expect(a.inlet).toBe('long pitot');
    expect(b.inlet).toBe('short');
    expect(a.status).toBe('ok');
    expect(b.status).toBe('ok');
    expect(a.blockFuel_kg).not.toBe(b.blockFuel_kg);
    // The short inlet is 50 lb per engine lighter (fixtures/demo/demo.blockwise.json): OEW, hence ZFW, differs by 100 lb.
    expectClose((a.zeroFuelWeight_kg as number) - (b.zeroFuelWeight_kg as number), 100 * LB, { rel: 1e-9 }, 'inlet weights in the demo file');
  });

  it('fly exits 4 (cannot reach) and still prints the result when the climb cannot reach its altitude', async () => {
    // Climb and cruise at 49,000 ft at this weight: beyond what the invented 36 kN engines can reach (the climb of
    // `blockwise fly` on this copy stalls near 48,400 ft with the cycle-generated deck).
    const doc = JSON.parse(readFileSync(join(repoRoot, DEMO), 'utf8')) as Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
    doc.engine.deck.path = join(repoRoot, 'fixtures/demo/demo-engine.deck.csv');
    doc.mission.legs[2].toAltitude = '49000 ft';
    doc.mission.legs[3].altitude = '49000 ft';
    doc.mission.legs[3].profile = { kind: 'constantAltitude' };
    const file = join(dir(), 'too-high.blockwise.json');
    writeFileSync(file, JSON.stringify(doc));
    const r = await run('fly', file, '--json');
    const j = JSON.parse(r.out) as Json;
    expect(j.status).not.toBe('ok');
    expect(String(j.statusMessage)).not.toBe('');
    expect(j.status).toBe('climb_not_reached');
    expect(r.code).toBe(4);
  });

  it('fly --inlet with an unknown name exits 2 and names the designs', async () => {
    const r = await run('fly', DEMO, '--inlet', 'scoop');
    expect(r.code).toBe(2);
    expect(r.err).toContain('"scoop" is not an inlet design');
    expect(r.err).toContain('"long pitot"');
  });

  it('fly without a project, with two projects or with an unknown option exits 2', async () => {
    expect((await run('fly')).code).toBe(2);
    expect((await run('fly', DEMO, DEMO)).code).toBe(2);
    const r = await run('fly', DEMO, '--speed', 'fast');
    expect(r.code).toBe(2);
    expect(r.err).toContain('blockwise fly:');
  });

  it('fly --help prints the usage', async () => {
    const r = await run('fly', '--help');
    expect(r.code).toBe(0);
    expect(r.out).toContain('Usage: blockwise fly');
  });
});

describe('blockwise fly on broken and old project files', () => {
  const expected = JSON.parse(readFileSync(join(repoRoot, 'fixtures/bad-projects/expected.json'), 'utf8')) as Record<
    string,
    { stage: string; path: string; fragment: string }
  >;

  it.each(Object.entries(expected))('fly exits 1 on %s with the file path, the JSON path and the reason', async (file, e) => {
    const r = await run('fly', `fixtures/bad-projects/${file}`);
    expect(r.code).toBe(1);
    expect(r.out).toBe('');
    expect(r.err).toContain(join(repoRoot, 'fixtures/bad-projects', file));
    // Whole-file problems (empty, invalid JSON) have a pseudo-path; their message carries the line and column.
    if (!e.path.startsWith('(')) expect(r.err).toContain(e.path);
    expect(r.err).toContain(e.fragment);
  });

  it('fly exits 1 when the project file does not exist', async () => {
    const r = await run('fly', 'fixtures/no-such-project.blockwise.json');
    expect(r.code).toBe(1);
    expect(r.err).toContain('no-such-project.blockwise.json');
    expect(r.err).toContain('no such file');
  });

  it('fly migrates the version-1 sample and flies it', async () => {
    const r = await run('fly', 'fixtures/old-versions/v1.blockwise.json', '--json');
    expect(r.err).toBe('');
    const j = JSON.parse(r.out) as Json;
    expect(j.status).toBe('ok');
    expect(r.code).toBe(0);
    expect(j.inlet).toBe('short');
    expectClose(j.distance_m as number, 3000 * NMI, { rel: 1e-3 }, 'project range, NIST SP 811 nmi');
  });
});

describe('bin/blockwise.mjs fly (spawned)', () => {
  it('node bin/blockwise.mjs fly <demo> --json prints the same block fuel as the in-process run', async () => {
    const exec = promisify(execFile);
    const { stdout } = await exec(process.execPath, ['bin/blockwise.mjs', 'fly', DEMO, '--json'], { cwd: repoRoot });
    const spawned = JSON.parse(stdout) as Json;
    const inProcess = JSON.parse((await run('fly', DEMO, '--json')).out) as Json;
    expect(spawned.blockFuel_kg).toBe(inProcess.blockFuel_kg);
  }, 60_000);
});
