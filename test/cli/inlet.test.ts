import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { DEFAULT_CAUTION_SETTINGS } from '../../engine/cautions/cautionSettings';
import { SAFETY_NOTICE_LINES } from '../../engine/core/notice';
import { expectOk } from '../../engine/core/result';
import { parseDeckCsv } from '../../engine/propulsion/deckCsv';
import { makeInstalledPropulsion } from '../../engine/propulsion/installedPropulsion';
import { expectClose } from '../support/assertInDelta';
import { syntheticDeckCsv } from '../engine/propulsion/sensitivityDeck';
import { repoRoot, run } from './support/cliRun';

const DEMO_DECK = 'fixtures/demo/demo-engine.deck.csv';
const DEMO_PROJECT = 'fixtures/demo/demo.blockwise.json';
// NIST SP 811 (2008) B.8: 1 ft = 0.3048 m exactly.
const FT = 0.3048;
const dir = mkdtempSync(join(tmpdir(), 'blockwise-inlet-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));


const GEOMETRY_INLET = {
  name: 'geometry one',
  source: { kind: 'geometry', captureArea: '0.56 m2', throatArea: '0.5 m2', fanFaceArea: '0.6 m2', diffuserLossCoefficient: 0.04 },
  lipSuctionFactor: 0.8,
  externalDragArea: '0.14 m2',
  weight: '110 kg',
};

/** GEOMETRY_INLET as the engine holds it once parsed (SI numbers, an empty description), for the direct engine calls. */
const GEOMETRY_ONE_SI = {
  name: 'geometry one',
  description: '',
  source: { kind: 'geometry', captureArea_m2: 0.56, throatArea_m2: 0.5, fanFaceArea_m2: 0.6, diffuserLossCoefficient: 0.04 },
  lipSuctionFactor: 0.8,
  externalDragArea_m2: 0.14,
  weight_kg: 110,
} as const;

describe('blockwise inlet', () => {
  it('inlet on the demo project inlets prints both designs, the breakdown and the notice', async () => {
    const r = await run('inlet', DEMO_DECK, '--design', DEMO_PROJECT, '--altitude', '35000 ft', '--mach', '0.8');
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    expect(r.out).toContain('long pitot');
    expect(r.out).toContain('short');
    expect(r.out).toContain('less spillage drag');
    expect(r.out).toContain('"short" minus "long pitot"');
    for (const line of SAFETY_NOTICE_LINES) expect(r.out).toContain(line);
  });

  it('inlet --json equals makeInstalledPropulsion on the same deck and design', async () => {
    const file = join(dir, 'geometry.json');
    writeFileSync(file, JSON.stringify(GEOMETRY_INLET));
    const r = await run('inlet', DEMO_DECK, '--design', file, '--altitude', '30000 ft', '--mach', '0.75', '--power', 'maxClimb', '--json');
    expect(r.code).toBe(0);
    const json = JSON.parse(r.out) as { designs: { point: { thrust_N: number; perEngine: { throatMach: number } } }[] };
    const deck = expectOk(parseDeckCsv(readFileSync(join(repoRoot, DEMO_DECK), 'utf8'), DEMO_DECK), 'demo deck');
    const model = makeInstalledPropulsion({
      deck,
      engineCount: 2,
      inlet: GEOMETRY_ONE_SI,
      installation: { bleed: { kind: 'coreFraction', fraction: 0 }, powerExtraction_W: 0 },
      cautionSettings: DEFAULT_CAUTION_SETTINGS,
    });
    const p = model.atRating({ altitude_m: 30000 * FT, mach: 0.75, isaDev_K: 0 }, 'maxClimb');
    expectClose(json.designs[0]!.point.thrust_N, p.thrust_N, { rel: 1e-12 }, 'same engine call');
    expect(json.designs[0]!.point.perEngine.throatMach).toBeGreaterThan(0);
  });

  it('inlet names the file and JSON path of a bad design', async () => {
    const file = join(dir, 'bad.json');
    writeFileSync(file, JSON.stringify([GEOMETRY_INLET, { ...GEOMETRY_INLET, lipSuctionFactor: 3 }]));
    const r = await run('inlet', DEMO_DECK, '--design', file, '--altitude', '30000 ft', '--mach', '0.75');
    expect(r.code).toBe(1);
    expect(r.err).toContain('bad.json');
    expect(r.err).toContain('[1].lipSuctionFactor');
  });

  it('inlet refuses a bad command line with exit code 2', async () => {
    const missing = await run('inlet', DEMO_DECK, '--altitude', '30000 ft', '--mach', '0.75');
    expect(missing.code).toBe(2);
    expect(missing.err).toContain('--design');
    const badMach = await run('inlet', DEMO_DECK, '--design', DEMO_PROJECT, '--altitude', '30000 ft', '--mach', '-1');
    expect(badMach.code).toBe(2);
    expect(badMach.err).toContain('--mach');
    const badBleed = await run('inlet', DEMO_DECK, '--design', DEMO_PROJECT, '--altitude', '30000 ft', '--mach', '0.7', '--bleed', '0.9');
    expect(badBleed.code).toBe(2);
    expect(badBleed.err).toContain('--bleed');
  });

  it('inlet on a deck with sensitivity columns installs through them and names the method in text and JSON', async () => {
    const deckFile = join(dir, 'synthetic.csv');
    writeFileSync(deckFile, syntheticDeckCsv(true));
    const design = join(dir, 'geometry-sens.json');
    writeFileSync(design, JSON.stringify(GEOMETRY_INLET));
    const args = [deckFile, '--design', design, '--altitude', '20000 ft', '--mach', '0.6', '--power', 'maxCruise', '--bleed', '0.01', '--extraction', '50 kW'];
    const text = await run('inlet', ...args);
    expect(text.code).toBe(0);
    expect(text.out).toContain("installation method: The deck's installation sensitivities");
    const r = await run('inlet', ...args, '--json');
    const json = JSON.parse(r.out) as { installationMethod: string; designs: { point: { thrust_N: number; perEngine: { installationMethod: string } } }[] };
    expect(json.installationMethod).toBe('deckSensitivities');
    expect(json.designs[0]!.point.perEngine.installationMethod).toBe('deckSensitivities');
    const deck = expectOk(parseDeckCsv(syntheticDeckCsv(true), 'synthetic.csv'), 'synthetic deck');
    const model = makeInstalledPropulsion({
      deck,
      engineCount: 2,
      inlet: GEOMETRY_ONE_SI,
      installation: { bleed: { kind: 'coreFraction', fraction: 0.01 }, powerExtraction_W: 50e3 },
      cautionSettings: DEFAULT_CAUTION_SETTINGS,
    });
    const p = model.atRating({ altitude_m: 20000 * FT, mach: 0.6, isaDev_K: 0 }, 'maxCruise');
    expectClose(json.designs[0]!.point.thrust_N, p.thrust_N, { rel: 1e-12 }, 'same engine call');
  });
});
