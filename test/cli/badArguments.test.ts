/**
 * A bad command line for every verb: one line on stderr naming what is wrong,
 * nothing on stdout, the documented exit code (README "Exit codes": 2 bad
 * command line, 1 unreadable file), never a stack trace. Also the top-level
 * guard: a fault inside a verb is one line and exit 70, and names from files
 * reach the terminal with their control characters escaped.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { EXIT_FILE, EXIT_INTERNAL, EXIT_USAGE } from '../../cli/exitCodes';
import { runCli } from '../../cli/main';
import { hasControlCharacters } from '../../hostio/terminalText';
import { verbs } from '../../cli/verbs/index';
import { DEMO_DECK, DEMO_PROJECT, repoRoot, run } from './support/cliRun';

const P = DEMO_PROJECT;
const D = DEMO_DECK;
const CYCLE = 'fixtures/cycle/demo-turbofan.cycle.json';
const MISSING = 'fixtures/no-such-file.blockwise.json';

// [verb, argv after the verb, exit code, what stderr must say]
const TABLE: readonly (readonly [string, readonly string[], number, RegExp])[] = [
  ['fly', [], EXIT_USAGE, /^blockwise fly: missing the project file/],
  ['fly', [P, P], EXIT_USAGE, /one project file at a time/],
  ['fly', [P, '--csv='], EXIT_USAGE, /--csv: give a file name/],
  ['fly', [P, '--csv-units', 'customary'], EXIT_USAGE, /--csv-units goes with --csv <file>/],
  ['fly', [P, '--csv', 'x.csv', '--csv-units', 'imperial'], EXIT_USAGE, /--csv-units: "imperial" is not base, si or customary/],
  ['fly', [P, '--inlet', 'scoop'], EXIT_USAGE, /"scoop" is not an inlet design/],
  ['fly', [P, '--speed'], EXIT_USAGE, /Unknown option '--speed'/],
  ['fly', [MISSING], EXIT_FILE, /no-such-file\.blockwise\.json.*no such file/],
  ['air', [], EXIT_USAGE, /missing --altitude/],
  ['air', ['--altitude', '35000 ft', '--mach=1e308'], EXIT_USAGE, /--mach: "1e308" is 1\.00e\+308 in SI units, beyond any physical value/],
  ['air', ['--altitude', '35000 ft', '--mach', '5e-324'], EXIT_USAGE, /--mach: "5e-324" is a subnormal number/],
  ['air', ['--altitude', '35000 ft', '--cas', '250 kt', '--tas', '400 kt'], EXIT_USAGE, /give one speed, not --cas and --tas/],
  ['air', ['--altitude', '35000 lb'], EXIT_USAGE, /--altitude: .*is a mass/],
  ['deck', [], EXIT_USAGE, /^blockwise deck: give a sub-verb: check .*; at /],
  ['deck', ['weigh'], EXIT_USAGE, /^blockwise deck: "weigh" is not one of its sub-verbs/],
  ['deck check', [], EXIT_USAGE, /give exactly one deck file \(got 0\)/],
  ['deck check', [MISSING], EXIT_FILE, /cannot read/],
  ['deck at', [D, '--altitude', '10000 ft', '--mach', '1e308', '--power', 'maxCruise'], EXIT_USAGE, /--mach: "1e308" is 1\.00e\+308 in SI units/],
  ['deck at', [D, '--altitude', '10000 ft', '--mach', '0.5', '--power', 'full'], EXIT_USAGE, /--power: "full" is neither a number nor a rating/],
  ['deck at', [D, '--altitude', '10000 ft', '--mach', '0.5'], EXIT_USAGE, /missing --power/],
  ['inlet', [D, '--design', P, '--altitude=-99999ft', '--mach', '0.8'], EXIT_USAGE, /--altitude: "-99999ft" is out of range: expected a pressure altitude from -3281 ft/],
  ['inlet', [D, '--design', P, '--altitude', '35000 ft', '--mach', '0.8', '--bleed', '150 %'], EXIT_USAGE, /--bleed: "150 %" is out of range: expected a fraction from 0 to 1/],
  ['crossover', [P, '--altitude', '35000 ft', '--weight', '1e308kg'], EXIT_USAGE, /--weight: "1e308kg" is 1\.00e\+308 in SI units/],
  ['crossover', [P, '--altitude', '35000 ft', '--weight', '0 kg'], EXIT_USAGE, /--weight: "0 kg" is out of range: expected a mass above 0/],
  ['crossover', [P, '--altitude', '35000 ft', '--weight', '15000 kg', '--rating', 'max'], EXIT_USAGE, /--rating: "max" is not a rating/],
  ['envelope', [P, '--weight', '1e308kg'], EXIT_USAGE, /--weight: "1e308kg" is 1\.00e\+308 in SI units/],
  ['envelope', [P, '--top=1e9ft'], EXIT_USAGE, /^blockwise envelope: --top: "1e9ft" is out of range: expected an altitude above 0 and at most 30000 m/],
  ['envelope', [P, '--top=90000ft', '--step=10m'], EXIT_USAGE, /^blockwise envelope: --step: 10m gives 2744 rows/],
  ['envelope', [P, '--service-rate', '0 ft/min'], EXIT_USAGE, /--service-rate: "0 ft\/min" is out of range: expected a climb rate above 0/],
  ['range-speeds', [P, '--altitude', '35000 ft', '--weight', '1e308kg'], EXIT_USAGE, /--weight: "1e308kg" is 1\.00e\+308/],
  ['range-speeds', [P, '--altitude', '1e6 ft', '--weight', '15000 kg'], EXIT_USAGE, /--altitude: "1e6 ft" is out of range/],
  ['payload-range', [P, '--between', 'many'], EXIT_USAGE, /--between: expected a whole number 0\.\.50/],
  ['compare', [P, '--inlets', 'long pitot'], EXIT_USAGE, /--inlets/],
  ['trade', [], EXIT_USAGE, /missing the project file/],
  ['uncertainty', [P, '--samples', '1e308'], EXIT_USAGE, /--samples: "1e308" is not a whole number/],
  ['uncertainty', [], EXIT_USAGE, /missing the project file/],
  ['sweep', [], EXIT_USAGE, /missing the project file/],
  ['sweep', [P], EXIT_USAGE, /give at least one --vary <field>=<from>:<to>:<step>/],
  ['cycle point', [CYCLE, '--altitude', '35000 ft', '--mach', '1e308', '--rating', 'maxCruise'], EXIT_USAGE, /--mach: "1e308" is 1\.00e\+308/],
  ['cycle point', [CYCLE, '--altitude', '35000 ft', '--mach', '0.8'], EXIT_USAGE, /give one of --rating NAME or --fan-speed FRACTION/],
  ['cycle deck', [CYCLE], EXIT_USAGE, /missing --out/],
  ['cycle deck', [CYCLE, '--out', 'x.csv', '--machs', '0.8, 0.2'], EXIT_USAGE, /--machs: the values must rise/],
  ['cycle match', ['fixtures/parametric/demo-parametric.deck.csv', '--out', 'x.cycle.json'], EXIT_USAGE, /missing --start/],
  ['cycle match', ['fixtures/parametric/demo-parametric.deck.csv', '--start', CYCLE, '--out', 'x.cycle.json', '--deck-out', 'fixtures/parametric/demo-parametric.deck.csv'], EXIT_USAGE, /--deck-out: .* is the deck file itself/],
  ['cycle match', ['fixtures/parametric/demo-parametric.deck.csv', '--start', CYCLE, '--out', 'x.cycle.json', '--free', 'bypassRatio,span'], EXIT_USAGE, /--free: "span" is not one of/],
  ['cycle match', ['fixtures/parametric/demo-parametric.deck.csv', '--start', CYCLE, '--out', 'x.cycle.json', '--bounds', 'airflow=200:100'], EXIT_USAGE, /--bounds: airflow: expected two finite numbers, lower below upper/],
  ['cycle match', ['fixtures/parametric/demo-parametric.deck.csv', '--start', CYCLE, '--out', 'x.cycle.json', '--bounds', 'turbineInletTemperature=1600:1900'], EXIT_USAGE, /starting turbineInletTemperature 1560 lies outside its bounds 1600 to 1900/],
  ['cycle match', [MISSING, '--start', CYCLE, '--out', 'x.cycle.json'], EXIT_FILE, /no-such-file\.blockwise\.json.*no such file/],
];

describe('bad command lines', () => {
  it('the table covers every registered verb', () => {
    const covered = new Set(TABLE.map(([verb]) => verb));
    for (const verb of verbs) expect(covered, `no bad-argument case for "${verb.name}"`).toContain(verb.name);
  });

  it.each(TABLE)('blockwise %s %j exits %i with one line naming the problem', async (verb, args, code, message) => {
    const r = await run(...verb.split(' '), ...args);
    expect(r.code).toBe(code);
    expect(r.err).toMatch(message);
    expect(r.out).toBe('');
    // A usage error is one line; a file error may list one line per problem, never a stack trace.
    if (code === EXIT_USAGE) expect(r.err.trimEnd().split('\n')).toHaveLength(1);
    expect(r.err).not.toMatch(/\n\s+at /);
    expect(r.err.endsWith('\n')).toBe(true);
  });
});

describe('the top-level guard', () => {
  it('a fault inside a verb is one line saying what was being done and asking to report it, exit 70', async () => {
    let err = '';
    const code = await runCli(['air', '--altitude', '35000 ft'], {
      out: () => {
        throw new Error('stdout closed');
      },
      err: (t) => (err += t),
      cwd: repoRoot,
    });
    expect(code).toBe(EXIT_INTERNAL);
    expect(err).toBe('blockwise: internal error while running "blockwise air --altitude 35000 ft": stdout closed. This is a fault in Blockwise; please report it with the command line and the files (exit 70).\n');
  });

  const dir = mkdtempSync(join(tmpdir(), 'blockwise-escape-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('names from a project reach stdout and stderr with their control characters escaped', async () => {
    const doc = JSON.parse(readFileSync(join(repoRoot, P), 'utf8')) as { name: string; engine: { deck: { path: string } }; inlets: { name: string }[]; activeInlet: string };
    doc.name = 'Demo \u001b]0;owned\u0007\u001b[2J\u202e';
    doc.engine.deck.path = join(repoRoot, D);
    const file = join(dir, 'escape.blockwise.json');
    writeFileSync(file, JSON.stringify(doc));
    const r = await run('fly', file, '--inlet', 'scoop\u001b[31m');
    // JSON quoting writes ESC as \u001b; either way no raw control character reaches the terminal.
    expect(r.err).toContain('scoop\\u001b[31m');
    expect(r.err).not.toContain('\u001b');
    const flown = await run('fly', file);
    expect(flown.out).toContain('Demo \\x1b]0;owned\\x07\\x1b[2J\\u202e');
    expect(hasControlCharacters(flown.out)).toBe(false);
  }, 60_000);
});
