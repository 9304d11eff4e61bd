import { describe, expect, it } from 'vitest';
import { parseSectionOutput } from './sectionProcess';

describe('parseSectionOutput', () => {
  const row = { section: 'mission solver', name: 'demo', opsPerSecond: 1000, medianCall_s: 1e-3, calls: 1500 };

  it('reads a child section’s JSON list of results', () => {
    const outcome = parseSectionOutput('mission', `${JSON.stringify([row, { ...row, name: 'other' }])}\n`);
    expect(outcome).toEqual({ ok: true, results: [row, { ...row, name: 'other' }] });
  });

  it('names the section and says why when the output is not JSON or not results', () => {
    expect(parseSectionOutput('deck', 'Error: boom')).toEqual({ ok: false, file: 'deck', reason: 'its output is not JSON (11 characters)' });
    expect(parseSectionOutput('deck', '{"section":"x"}')).toEqual({ ok: false, file: 'deck', reason: 'its output is not a list of results' });
    expect(parseSectionOutput('deck', JSON.stringify([{ ...row, medianCall_s: '1 ms' }]))).toMatchObject({ ok: false, file: 'deck' });
  });
});
