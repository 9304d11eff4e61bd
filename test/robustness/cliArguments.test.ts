/**
 * Property across the CLI: random command lines built from every registered
 * verb and its own options (string options with awkward values, boolean
 * flags, stray tokens) and file arguments that load fast (the demo deck,
 * corpus files, a folder, a missing file) never make `runCli` throw. Each
 * ends with a documented exit code (0 done, 1 bad file, 2 bad command line,
 * 3 a mission that did not succeed), says something on the right stream,
 * and prints no raw control characters.
 */
import fc from 'fast-check';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../cli/main';
import { verbs } from '../../cli/verbs/index';
import { EXIT_CODES, EXIT_INTERNAL } from '../../cli/exitCodes';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));

// Files that load or fail fast: no argument here is a project that flies (a
// demo mission per run would make the property slow); the demo project only
// appears as an inlet-design file for `blockwise inlet --design`.
const FILES = [
  'fixtures/demo/demo-engine.deck.csv',
  'fixtures/corpus/negative-infinity.csv',
  'fixtures/corpus/nan-literal.deck.json',
  'fixtures/corpus/version-zero.blockwise.json',
  'fixtures/corpus/truncated.blockwise.json',
  'fixtures/corpus/deck-with-wrong-unit.blockwise.json',
  'fixtures/corpus',
  'fixtures/no-such-file.blockwise.json',
];
const VALUES = ['35000 ft', '0.78', '250 kt', '10 K', 'maxCruise', '2', '1.5 %', '30 kW', '', 'NaN', '-1', '1e400', 'kt', 'bogus', '0', '99', 'fixtures/demo/demo.blockwise.json', ...FILES];

function hasControl(text: string): boolean {
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if ((c < 0x20 && c !== 0x0a) || c === 0x7f) return true;
  }
  return false;
}

const option = (names: readonly [string, { type: string }][]) =>
  fc
    .constantFrom(...names)
    .chain(([name, o]) => (o.type === 'boolean' ? fc.constant(`--${name}`) : fc.constantFrom(...VALUES).map((v) => `--${name}=${v}`)));
const stray = fc.oneof(fc.constantFrom('--help', '-x', '--', '--nope=1', 'extra'), fc.string({ maxLength: 8 }));

// Mostly well-formed: the verb, the one file it takes (if any), its own options; sometimes a stray token.
const commandLine = fc.constantFrom(...verbs).chain((verb) => {
  const names = Object.entries(verb.options) as [string, { type: string }][];
  const words = verb.name.split(' ');
  return fc
    .tuple(
      verb.allowPositionals ? fc.constantFrom(...FILES).map((f) => [f]) : fc.constant([] as string[]),
      names.length > 0 ? fc.array(option(names), { maxLength: 4 }) : fc.constant([] as string[]),
      fc.oneof({ weight: 4, arbitrary: fc.constant(null) }, { weight: 1, arbitrary: stray }),
    )
    .map(([files, options, extra]) => [...words, ...files, ...options, ...(extra === null ? [] : [extra])]);
});

describe('blockwise command lines', () => {
  it('runCli never throws on random arguments and ends with a documented exit code and a message', async () => {
    await fc.assert(
      fc.asyncProperty(fc.oneof({ weight: 9, arbitrary: commandLine }, { weight: 1, arbitrary: fc.array(fc.string({ maxLength: 6 }), { maxLength: 3 }) }), async (argv) => {
        let out = '';
        let err = '';
        const code = await runCli(argv, { out: (t) => (out += t), err: (t) => (err += t), cwd: repoRoot });
        expect(EXIT_CODES).toContain(code);
        expect(code).not.toBe(EXIT_INTERNAL);
        expect(err).not.toMatch(/\n\s+at /);
        expect(hasControl(err), err).toBe(false);
        if (argv.length === 0) {
          // No verb: the overview on stdout, exit 2.
          expect(code).toBe(2);
          expect(out).toContain('Usage');
          return;
        }
        if (code === 0) expect(out).toMatch(/\S/);
        // A refusal is said on stderr, or on stdout as JSON when --json asked for it.
        if (code !== 0) expect(argv.includes('--json') ? err + out : err).toMatch(/\S/);
      }),
      { numRuns: 200, seed: 20261206 },
    );
  }, 60_000);
});
