/**
 * Properties of the parsers on damaged copies of real files (the demo
 * project, the demo deck CSV and its JSON form): a random edit (truncation,
 * a deleted or inserted character, a cell or value replaced by a hostile
 * token, a dropped or repeated line) never makes a parser throw, and every
 * refusal says where: a CSV line (and column) inside the file, a JSON path,
 * or the line and column of a JSON syntax error. A damaged deck that still
 * parses flies the demo mission to a status without a non-finite number.
 * The owners' properties cover random text; these start from valid files so
 * the edits reach the deep checks.
 */
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { solveMission } from '../../engine/mission/solveMission';
import { buildMissionInput } from '../../engine/project/buildMissionInput';
import { parseProject } from '../../engine/project/parseProject';
import { parseDeckCsv } from '../../engine/propulsion/deckCsv';
import { deckToJson, parseDeckJson } from '../../engine/propulsion/deckJson';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const demoText = readFileSync(`${repoRoot}fixtures/demo/demo.blockwise.json`, 'utf8');
const deckText = readFileSync(`${repoRoot}fixtures/demo/demo-engine.deck.csv`, 'utf8');
const demoDeck = parseDeckCsv(deckText, 'demo-engine.deck.csv');
if (!demoDeck.ok) throw new Error('the demo deck does not parse');
const deckJsonText = deckToJson(demoDeck.value);
const demoProject = parseProject(demoText, 'demo.blockwise.json');
if (!demoProject.ok) throw new Error('the demo project does not parse');

const HOSTILE = ['', ' ', 'NaN', '-Infinity', '1e400', '-1e400', '0x10', '1,5', '"', '\u0000', '\u2212', '[', '{', '}', ']', ':', ',', '#', '\\', 'null', 'true', '-0', '1e-400', '9'.repeat(400), '\ufeff', '\r'];

type Edit =
  | { readonly kind: 'truncate'; readonly at: number }
  | { readonly kind: 'delete'; readonly at: number }
  | { readonly kind: 'insert'; readonly at: number; readonly text: string }
  | { readonly kind: 'replaceToken'; readonly at: number; readonly text: string }
  | { readonly kind: 'dropLine'; readonly at: number }
  | { readonly kind: 'repeatLine'; readonly at: number };

// Unbiased positions: fast-check's default bias would put most edits at the very start of the file.
const fraction = fc.noBias(fc.integer({ min: 0, max: 999_999 })).map((k) => k / 1e6);
const hostile = fc.oneof(fc.constantFrom(...HOSTILE), fc.string({ maxLength: 6 }));
const edit: fc.Arbitrary<Edit> = fc.oneof(
  fraction.map((at) => ({ kind: 'truncate', at }) as const),
  fraction.map((at) => ({ kind: 'delete', at }) as const),
  fc.record({ kind: fc.constant('insert' as const), at: fraction, text: hostile }),
  fc.record({ kind: fc.constant('replaceToken' as const), at: fraction, text: hostile }),
  fraction.map((at) => ({ kind: 'dropLine', at }) as const),
  fraction.map((at) => ({ kind: 'repeatLine', at }) as const),
);

/** Applies one edit; positions are fractions of the text so every edit lands inside it. */
function applyEdit(text: string, e: Edit): string {
  const i = Math.floor(e.at * text.length);
  switch (e.kind) {
    case 'truncate':
      return text.slice(0, i);
    case 'delete':
      return text.slice(0, i) + text.slice(i + 1);
    case 'insert':
      return text.slice(0, i) + e.text + text.slice(i);
    case 'replaceToken': {
      // The run of characters that are not separators around i (a CSV cell, a JSON number or word).
      let a = i;
      let b = i;
      while (a > 0 && !/[,\n"{}[\]:]/.test(text[a - 1]!)) a--;
      while (b < text.length && !/[,\n"{}[\]:]/.test(text[b]!)) b++;
      return text.slice(0, a) + e.text + text.slice(b);
    }
    case 'dropLine':
    case 'repeatLine': {
      const lines = text.split('\n');
      const k = Math.floor(e.at * lines.length);
      if (e.kind === 'dropLine') lines.splice(k, 1);
      else lines.splice(k, 0, lines[k]!);
      return lines.join('\n');
    }
  }
}

/** True when a message holds a raw control character (bytes from the file printed as they are). */
function hasControl(text: string): boolean {
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c < 0x20 || c === 0x7f) return true;
  }
  return false;
}

const edits = fc.array(edit, { minLength: 1, maxLength: 3 });
const lineCount = (text: string) => text.split('\n').length;

describe('parsers on damaged demo files', () => {
  it('parseDeckCsv never throws on a damaged demo deck and every error names a line inside the file', () => {
    fc.assert(
      fc.property(edits, (es) => {
        const text = es.reduce(applyEdit, deckText);
        const r = parseDeckCsv(text, 'damaged.csv');
        if (r.ok) return;
        expect(r.error.length).toBeGreaterThan(0);
        for (const e of r.error) {
          expect(e.line).not.toBeNull();
          expect(e.line!).toBeGreaterThanOrEqual(1);
          expect(e.line!).toBeLessThanOrEqual(lineCount(text) + 1);
          expect(e.message.startsWith(`damaged.csv line ${e.line}`)).toBe(true);
          expect(hasControl(e.message), e.message).toBe(false);
        }
      }),
      { numRuns: 150, seed: 20261202 },
    );
  });

  it('parseDeckJson never throws on a damaged JSON deck and every error names a path or a line and column', () => {
    fc.assert(
      fc.property(edits, (es) => {
        const text = es.reduce(applyEdit, deckJsonText);
        const r = parseDeckJson(text, 'damaged.json');
        if (r.ok) return;
        for (const e of r.error) {
          expect(e.message.startsWith('damaged.json')).toBe(true);
          expect(hasControl(e.message), e.message).toBe(false);
          if (e.code === 'bad_json') expect(e.message).toMatch(/line \d+, column \d+|the JSON parser refused it/);
          else if (e.code !== 'empty_file') expect(e.column ?? e.message).toMatch(/\S/);
        }
      }),
      { numRuns: 150, seed: 20261203 },
    );
  });

  it('parseProject never throws on a damaged demo project and every issue has a path (syntax errors: line and column)', () => {
    fc.assert(
      fc.property(edits, (es) => {
        const text = es.reduce(applyEdit, demoText);
        const r = parseProject(text, 'damaged.blockwise.json');
        if (r.ok) return;
        for (const issue of r.error) {
          expect(issue.path).toMatch(/\S/);
          expect(issue.message).toMatch(/\S/);
          expect(hasControl(issue.message), issue.message).toBe(false);
          const syntax = /^\(line (\d+), column (\d+)\)$/.exec(issue.path);
          if (syntax) expect(Number(syntax[1])).toBeLessThanOrEqual(lineCount(text) + 1);
        }
      }),
      { numRuns: 300, seed: 20261204 },
    );
  });

  it('a damaged deck that still parses flies the demo mission to a status with finite figures', () => {
    let flown = 0;
    fc.assert(
      fc.property(fc.array(fc.record({ at: fraction, scale: fc.double({ min: 0.7, max: 1.3, noNaN: true }) }), { minLength: 1, maxLength: 20 }), (cells) => {
        // Scale numeric cells of data rows: the deck stays well-formed but its shape changes.
        const lines = deckText.split('\n');
        const data = lines.map((l, i) => (/^[0-9]/.test(l) ? i : -1)).filter((i) => i >= 0);
        for (const c of cells) {
          const k = data[Math.floor(c.at * data.length)]!;
          const row = lines[k]!.split(',');
          const j = 3 + Math.floor(c.at * 1e6) % 3;
          row[j] = String(Number(row[j]) * c.scale);
          lines[k] = row.join(',');
        }
        const deck = parseDeckCsv(lines.join('\n'), 'scaled.csv');
        if (!deck.ok) {
          for (const e of deck.error) expect(e.line).not.toBeNull();
          return;
        }
        const built = buildMissionInput(demoProject.value, { deck: deck.value });
        expect(built.ok).toBe(true);
        if (!built.ok) return;
        flown++;
        const r = solveMission(built.value);
        for (const v of [r.blockFuel_kg, r.tripFuel_kg, r.blockTime_s, r.rampMass_kg, r.reserveFuel_kg, r.residual_kg]) expect(Number.isFinite(v)).toBe(true);
        for (const col of Object.values(r.history)) for (const v of col as Float64Array) expect(Number.isFinite(v)).toBe(true);
        if (r.status !== 'ok') expect(r.statusMessage).toMatch(/\S/);
      }),
      { numRuns: 6, seed: 20261205 },
    );
    expect(flown).toBeGreaterThan(0);
  }, 60_000);
});
