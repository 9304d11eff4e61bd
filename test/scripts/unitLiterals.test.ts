/**
 * Convention held by a test (docs/style.md §6): unit-conversion factors are written
 * once, in engine/units/unitTable.ts; every other source file imports them by
 * name (engine/units's index, or ../units/unitTable inside engine/). The test
 * fails when a factor's literal appears in any other source file.
 *
 * Allowed on purpose: test/ (tests check against independent values, so they
 * write the NIST figures out rather than import the table they check) and
 * fixtures/ (sample files hold plain numbers).
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative, sep } from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * The literals of unitTable.ts's factors (NIST SP 811, Appendix B.8) and the
 * rounded reciprocals and products people type instead of importing them
 * (ft per m, m/s per kt, ft per nmi, Pa per psi, lbf in N, km per nmi).
 */
const FACTOR_LITERALS = [
  '0.3048', '0.0254', '1852', '1609.344', '0.45359237', '9.80665', '3386.389', '133.3224', '1055.05585262',
  '4.4482216152605', '0.514444', '3.28084', '6076.1', '6894.757', '1.852',
];
const SOURCE_FOLDERS = ['engine', 'cli', 'renderer', 'electron', 'hostio', 'scripts'];
const HOME_OF_FACTORS = ['engine', 'units', 'unitTable.ts'].join(sep);

function literalPattern(literal: string): RegExp {
  return new RegExp(`(?<![0-9.\\w])${literal.replace(/\./g, '\\.')}(?![0-9\\w])`);
}

function sourceFiles(dir: string): string[] {
  const out: string[] = [];
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    if (entry.name === 'node_modules' || entry.name === 'dist') continue;
    const path = join(dir, entry.name);
    if (entry.isDirectory()) out.push(...sourceFiles(path));
    else if (/\.(ts|tsx|mts|mjs|js)$/.test(entry.name)) out.push(path);
  }
  return out;
}

/** Every "file:line: literal" where a factor literal appears outside unitTable.ts. */
function findUnitLiterals(root: string): string[] {
  const found: string[] = [];
  for (const folder of SOURCE_FOLDERS) {
    let files: string[];
    try {
      files = sourceFiles(join(root, folder));
    } catch {
      continue; // folder absent in this tree
    }
    for (const file of files) {
      const rel = relative(root, file);
      if (rel === HOME_OF_FACTORS) continue;
      readFileSync(file, 'utf8').split('\n').forEach((line, i) => {
        for (const literal of FACTOR_LITERALS) {
          if (literalPattern(literal).test(line)) found.push(`${rel}:${i + 1}: ${literal}`);
        }
      });
    }
  }
  return found;
}

describe('unit-conversion literals', () => {
  it('appear in no source file outside engine/units/unitTable.ts', () => {
    expect(findUnitLiterals(process.cwd())).toEqual([]);
  });

  it('are reported when planted in a source file (the scanner can fail)', () => {
    const root = mkdtempSync(join(tmpdir(), 'unit-literals-'));
    try {
      mkdirSync(join(root, 'cli'));
      mkdirSync(join(root, 'engine', 'units'), { recursive: true });
      writeFileSync(join(root, 'cli', 'planted.ts'), 'const a = 1;\nconst ft = m / 0.3048;\nconst nm = 2 * 1852;\nconst x = 10.3048;\n');
      writeFileSync(join(root, 'engine', 'units', 'unitTable.ts'), 'export const FOOT_M = 0.3048;\n');
      expect(findUnitLiterals(root)).toEqual([`cli${sep}planted.ts:2: 0.3048`, `cli${sep}planted.ts:3: 1852`]);
    } finally {
      rmSync(root, { recursive: true, force: true });
    }
  });
});
