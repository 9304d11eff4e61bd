/**
 * Every file in fixtures/corpus, with the message it must produce
 * (fixtures/corpus/expected.json), through the engine parsers and through
 * the CLI (`blockwise deck check`, `blockwise fly`): refused with a non-zero
 * exit and a message naming the file and the place (line/column or path).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../cli/main';
import { parseProject } from '../../engine/project/parseProject';
import { parseDeckCsv } from '../../engine/propulsion/deckCsv';
import { parseDeckJson } from '../../engine/propulsion/deckJson';
import { escapeControls } from '../../engine/propulsion/deckFileError';
import { lookupDeck } from '../../engine/propulsion/deckLookup';
import { expectClose } from '../support/assertInDelta';

interface Expectation {
  readonly kind: 'deckCsv' | 'deckJson' | 'project';
  /** 'warn': a deck that loads with a plausibility warning; 'fly': a project that flies to `status` with exit code `exit`. */
  readonly stage: 'parse' | 'load' | 'accept' | 'warn' | 'fly';
  readonly exit?: number;
  readonly status?: string;
  readonly where: string;
  readonly fragment: string;
  /** When the command line's file reader refuses the file before any parser sees it (hostio/textFile.ts): what it says. */
  readonly reader?: string;
}

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const corpusDir = `${repoRoot}fixtures/corpus/`;
const expected = JSON.parse(readFileSync(`${corpusDir}expected.json`, 'utf8')) as Record<string, Expectation>;
const read = (file: string) => readFileSync(corpusDir + file, 'utf8');

async function run(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const code = await runCli(argv, { out: (t) => (out += t), err: (t) => (err += t), cwd: repoRoot });
  return { code, out, err };
}

/** True when a message line holds a raw control character (a binary file's bytes printed as they are). */
function hasControl(text: string): boolean {
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if ((c < 0x20 && c !== 0x0a) || c === 0x7f) return true;
  }
  return false;
}

function deckErrors(file: string, kind: 'deckCsv' | 'deckJson') {
  return kind === 'deckCsv' ? parseDeckCsv(read(file), file) : parseDeckJson(read(file), file);
}

describe('fixtures/corpus/expected.json', () => {
  it('lists every corpus file and only those', () => {
    const files = readdirSync(corpusDir).filter((f) => f !== 'expected.json' && f !== 'README.md');
    expect(Object.keys(expected).sort()).toEqual(files.sort());
  });
});

describe('corpus through the engine parsers', () => {
  for (const [file, e] of Object.entries(expected)) {
    if (e.kind !== 'project' && e.stage === 'parse') {
      it(`${e.kind === 'deckCsv' ? 'parseDeckCsv' : 'parseDeckJson'} refuses ${file} at ${e.where || 'the file'}`, () => {
        const r = deckErrors(file, e.kind as 'deckCsv' | 'deckJson');
        expect(r.ok).toBe(false);
        if (r.ok) return;
        const first = r.error[0]!;
        // CSV: `<file> line L, column "C": ...`; JSON: `<file>, path: ...` or `<file>: not valid JSON: line L, column C: ...`.
        expect(first.message.startsWith(file)).toBe(true);
        expect(first.message).toContain(e.where);
        expect(first.message).toContain(e.fragment);
        expect(hasControl(first.message)).toBe(false);
        if (e.kind === 'deckCsv') expect(first.line).toBeGreaterThanOrEqual(1);
      });
    }
    if (e.kind === 'project' && e.stage === 'parse') {
      it(`parseProject refuses ${file} at ${e.where}`, () => {
        const r = parseProject(read(file), file);
        expect(r.ok).toBe(false);
        if (r.ok) return;
        const issue = r.error.find((i) => i.path === e.where);
        expect(issue, `issues: ${r.error.map((i) => i.message).join(' | ')}`).toBeDefined();
        expect(issue!.message).toContain(e.fragment);
        expect(hasControl(issue!.message)).toBe(false);
      });
    }
    if (e.kind === 'project' && e.stage === 'load') {
      it(`${file} parses, and the deck it names is refused at ${e.where}`, () => {
        const r = parseProject(read(file), file);
        expect(r.ok).toBe(true);
        if (!r.ok) return;
        const ref = r.value.engine.deck;
        expect(ref.kind).toBe('file');
        if (ref.kind !== 'file') return;
        const deck = parseDeckCsv(read(ref.path), ref.path);
        expect(deck.ok).toBe(false);
        if (!deck.ok) {
          expect(deck.error[0]!.message).toContain(`${ref.path} ${e.where}`);
          expect(deck.error[0]!.message).toContain(e.fragment);
        }
      });
    }
  }

  it('parseDeckCsv reads CRLF line endings like LF: same lookups (crlf-line-endings.csv)', () => {
    const crlf = read('crlf-line-endings.csv');
    const a = parseDeckCsv(crlf, 'crlf');
    const b = parseDeckCsv(crlf.replace(/\r\n/g, '\n'), 'lf');
    expect(a.ok && b.ok).toBe(true);
    if (!a.ok || !b.ok) return;
    for (const [alt, mach, power] of [
      [0, 0, 0.5],
      [1000, 0.3, 0.7],
      [3000, 0.5, 1],
    ] as const) {
      const la = lookupDeck(a.value, { altitude_m: alt, mach, isaDev_K: 0 }, power);
      const lb = lookupDeck(b.value, { altitude_m: alt, mach, isaDev_K: 0 }, power);
      expect(la.ok && lb.ok).toBe(true);
      if (la.ok && lb.ok) expectClose(la.value.thrust_N, lb.value.thrust_N, { rel: 0 }, 'same file with LF endings');
    }
    // Row 2 of the file is a tabulated point: 0 ft, Mach 0, power 0.5, 3000 lbf (NIST SP 811: 1 lbf = 4.4482216152605 N).
    const node = lookupDeck(a.value, { altitude_m: 0, mach: 0, isaDev_K: 0 }, 0.5);
    if (node.ok) expectClose(node.value.thrust_N, 3000 * 4.4482216152605, { rel: 1e-12 }, 'NIST SP 811 lbf');
  });
});

describe('corpus through the CLI', () => {
  for (const [file, e] of Object.entries(expected)) {
    const path = `fixtures/corpus/${file}`;
    if (e.kind !== 'project') {
      it(`blockwise deck check ${path} ${e.stage === 'accept' || e.stage === 'warn' ? 'exits 0' : 'exits 1 naming the place'}`, async () => {
        const r = await run('deck', 'check', path);
        if (e.stage === 'warn') {
          // Valid but implausible: the summary on stdout, one warning line per check on stderr, with the line.
          expect(r.code).toBe(0);
          expect(r.out).toContain('valid');
          const warning = r.err.split('\n').find((l) => l.includes(e.fragment));
          expect(warning, r.err).toBeDefined();
          expect(warning!.startsWith(`blockwise deck check: warning: ${path} ${e.where}: `)).toBe(true);
          expect(hasControl(r.err)).toBe(false);
          return;
        }
        if (e.stage === 'accept') {
          expect(r.code).toBe(0);
          expect(r.err).toBe('');
          return;
        }
        expect(r.code).toBe(1);
        expect(r.out).toBe('');
        const first = r.err.split('\n')[0]!;
        if (e.reader !== undefined) {
          expect(first).toBe(`blockwise deck: cannot read ${JSON.stringify(path)}: ${e.reader}`);
          return;
        }
        expect(first.startsWith(path)).toBe(true);
        expect(first).toContain(e.where);
        expect(first).toContain(e.fragment);
        expect(hasControl(r.err)).toBe(false);
      });
    } else if (e.stage === 'fly') {
      it(`blockwise fly ${path} ends with status ${e.status} and exit ${e.exit}`, async () => {
        const json = await run('fly', path, '--json');
        expect(json.code).toBe(e.exit);
        const result = JSON.parse(json.out) as { status: string; statusMessage: string };
        expect(result.status).toBe(e.status);
        const text = await run('fly', path);
        expect(text.code).toBe(e.exit);
        expect(e.status === 'ok' ? text.out : result.statusMessage).toContain(e.fragment);
        expect(hasControl(text.out + text.err)).toBe(false);
        expect(text.err).not.toMatch(/\n\s+at /);
      }, 60_000);
    } else {
      it(`blockwise fly ${path} exits 1 naming ${e.where}`, async () => {
        const r = await run('fly', path);
        expect(r.code).toBe(1);
        expect(r.out).toBe('');
        // The first line names the file at fault (the project, or its deck for stage "load").
        const [head, ...rest] = r.err.split('\n');
        expect(head).toContain(e.stage === 'load' ? 'fixtures/corpus/' : file);
        const body = rest.join('\n');
        if (e.reader !== undefined) {
          expect(body).toContain(`(file): cannot read ${JSON.stringify(`${repoRoot}${path}`)}: ${e.reader}`);
          return;
        }
        // A JSON syntax issue's path "(line L, column C)" reads "line L, column C" in the message.
        // Control characters in a path read as \uXXXX escapes in the message.
        expect(body).toContain(escapeControls(e.where.replace(/^\((.*)\)$/, '$1')));
        expect(body).toContain(e.fragment);
        expect(hasControl(r.err)).toBe(false);
      });
    }
  }
});
