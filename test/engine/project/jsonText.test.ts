import { execFileSync } from 'node:child_process';
import { beforeAll, describe, expect, it } from 'vitest';
import { lineAndColumn, parseJsonText } from '../../../engine/project/jsonText';

// Independent reference: Python's json module reports the line and column of
// a syntax error (json.JSONDecodeError.lineno / .colno, 1-based). One python3
// run checks every case.
function pythonErrorPositions(texts: readonly string[]): ({ line: number; column: number } | null)[] {
  const script = [
    'import json, sys',
    'out = []',
    'for t in json.loads(sys.stdin.read()):',
    '    try:',
    '        json.loads(t)',
    '        out.append(None)',
    '    except json.JSONDecodeError as e:',
    '        out.append({"line": e.lineno, "column": e.colno})',
    'print(json.dumps(out))',
  ].join('\n');
  return JSON.parse(execFileSync('python3', ['-c', script], { input: JSON.stringify(texts), encoding: 'utf8' })) as (
    | { line: number; column: number }
    | null
  )[];
}

const BROKEN: readonly string[] = [
  '{"a": 1,\n}',
  '{"a": 1\n "b": 2}',
  '[1, 2,, 3]',
  '{"a": tru}',
  '{"a": "x\ny"}',
  '{"a": 01}',
  '{"a": 1} x',
  '{\n  "name": "demo",\n  "mmo": 0.85,\n}\n',
  '{"a": [1, 2}',
  '{"a" 1}',
];

describe('parseJsonText', () => {
  it('parseJsonText returns the value of valid JSON', () => {
    const r = parseJsonText('{"a": [1, 2.5e3, "x"], "b": null}');
    expect(r).toEqual({ ok: true, value: { a: [1, 2500, 'x'], b: null } });
  });

  let references: ({ line: number; column: number } | null)[] = [];
  beforeAll(() => {
    references = pythonErrorPositions(BROKEN);
  });

  it.each(BROKEN.map((text, index) => ({ text, index })))('parseJsonText locates the error in $text where Python json does', ({ text, index }) => {
    const reference = references[index];
    expect(reference).not.toBeNull();
    const r = parseJsonText(text);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect({ line: r.error.line, column: r.error.column }).toEqual(reference);
    expect(r.error.message).toContain(`line ${reference!.line}, column ${reference!.column}`);
  });

  it('parseJsonText says an empty or blank file is empty', () => {
    for (const text of ['', '  \n\t']) {
      const r = parseJsonText(text);
      expect(r.ok).toBe(false);
      if (!r.ok) {
        expect(r.error.code).toBe('empty');
        expect(r.error.message).toContain('empty');
      }
    }
  });

  it('parseJsonText reads 1e999 as Infinity (JSON.parse does), for the schema to refuse', () => {
    const r = parseJsonText('{"x": 1e999}');
    expect(r).toEqual({ ok: true, value: { x: Infinity } });
  });

  it('lineAndColumn counts lines from 1 and columns from 1', () => {
    expect(lineAndColumn('ab\ncd', 0)).toEqual({ line: 1, column: 1 });
    expect(lineAndColumn('ab\ncd', 3)).toEqual({ line: 2, column: 1 });
    expect(lineAndColumn('ab\ncd', 4)).toEqual({ line: 2, column: 2 });
  });
});
