import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { SAFETY_NOTICE, SAFETY_NOTICE_LINES } from '../../engine/core/notice';
import { expectClose } from '../support/assertInDelta';
import { run, type Json } from './support/cliRun';

const IDEAL = 'fixtures/cycle/ideal-turbofan.cycle.json';
const DEMO = 'fixtures/cycle/demo-turbofan.cycle.json';
const dir = mkdtempSync(join(tmpdir(), 'blockwise-cycle-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('blockwise cycle point', { timeout: 60_000 }, () => {
  it('--json carries the contract keys and, at the design point, the closed-form ideal thrust', async () => {
    const r = await run('cycle', 'point', IDEAL, '--altitude', '35000 ft', '--mach', '0.8', '--fan-speed', '1', '--json');
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as Json;
    for (const key of ['thrust_N', 'fuelFlow_kg_s', 'airflow_kg_s', 'fanSpeed', 'fanCorrectedSpeed', 'turbineInletTemperature_K', 'activeLimit', 'status', 'stations']) {
      expect(doc, key).toHaveProperty(key);
    }
    expect(doc.status).toBe('converged');
    // 20,396.406 N: Mattingly ideal turbofan closed form, test/reference/cycleIdealReference.json (100 kg/s x 203.964 N s/kg)
    expectClose(doc.thrust_N as number, 20396.406124273406, { rel: 1e-8 }, 'test/reference/cycleIdealReference.json');
    expectClose(doc.turbineInletTemperature_K as number, 1600, { rel: 1e-8 }, 'fixture design Tt4');
    expect(doc.activeLimit).toBeNull();
    expect((doc.stations as Json[]).map((s) => s.station)).toEqual(['0', '2', '21', '25', '3', '31', '4', '45', '5', '8', '9', '13', '18', '19']);
    expect(doc.notice).toBe(SAFETY_NOTICE);
  });

  it('a rating reports the limit that holds it; recovery, bleed and extraction come back as given', async () => {
    const r = await run('cycle', 'point', DEMO, '--altitude', '0 ft', '--mach', '0', '--rating', 'takeoff', '--isa-dev', '+30 K', '--recovery', '0.98', '--bleed', '2 %', '--power-extraction', '40 kW', '--json');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as Json;
    // ISA+30 is above the demo's flat-rating corner (about ISA+15): the turbine temperature limit (1,641 K, the file) holds.
    expect(doc.activeLimit).toBe('turbineInletTemperature');
    expectClose(doc.turbineInletTemperature_K as number, 1641, { rel: 1e-9 }, 'fixtures/cycle/demo-turbofan.cycle.json takeoff limit');
    expect(doc.recovery).toBe(0.98);
    expect(doc.bleedFraction).toBe(0.02);
    expect(doc.powerExtraction_W).toBe(40000);
  });

  it('text output names the status, the limit and the station table and ends with the notice', async () => {
    const r = await run('cycle', 'point', DEMO, '--altitude', '35000 ft', '--mach', '0.8', '--rating', 'maxCruise');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/status {6}converged/);
    expect(r.out).toMatch(/limit {7}fanCorrectedSpeed/);
    expect(r.out).toMatch(/HP turbine inlet/);
    expect(r.out.endsWith(`\n\n${SAFETY_NOTICE_LINES.join('\n')}\n`)).toBe(true); // the notice rule, cli/common/report.ts
  });

  it('a bad command line is a usage error (exit 2) naming the option', async () => {
    const both = await run('cycle', 'point', DEMO, '--altitude', '0', '--mach', '0', '--rating', 'takeoff', '--fan-speed', '0.9');
    expect(both.code).toBe(2);
    expect(both.err).toMatch(/one of --rating NAME or --fan-speed FRACTION/);
    const rating = await run('cycle', 'point', DEMO, '--altitude', '0', '--mach', '0', '--rating', 'cruise');
    expect(rating.code).toBe(2);
    expect(rating.err).toMatch(/--rating: "cruise" is not a rating/);
    const unit = await run('cycle', 'point', DEMO, '--altitude', '10 kg', '--mach', '0', '--fan-speed', '0.9');
    expect(unit.code).toBe(2);
    expect(unit.err).toMatch(/--altitude/);
  });

  it('a rating the file lacks, or a point that cannot be matched, exits 3 with the status', async () => {
    const missing = await run('cycle', 'point', IDEAL, '--altitude', '0', '--mach', '0', '--rating', 'takeoff');
    expect(missing.code).toBe(3);
    expect(missing.err).toMatch(/unknown_rating: the cycle has no rating "takeoff"/);
    const json = await run('cycle', 'point', IDEAL, '--altitude', '0', '--mach', '0', '--rating', 'takeoff', '--json');
    expect(json.code).toBe(3);
    const doc = JSON.parse(json.out) as Json;
    expect(doc.status).toBe('unknown_rating');
    expect(doc.thrust_N).toBeNull();
  });

  it('a cycle file with errors is refused with each located error (exit 1)', async () => {
    const bad = join(dir, 'bad.cycle.json');
    writeFileSync(bad, JSON.stringify({ format: 'blockwise-cycle', version: 1, title: 'x', design: { altitude: '10 kg' } }));
    const r = await run('cycle', 'point', bad, '--altitude', '0', '--mach', '0', '--fan-speed', '0.9');
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/design\.altitude: .*"10 kg"/);
    expect(r.err).toMatch(/cycle not loaded/);
  });
});
