import { readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { BENCH_SECTIONS } from './sections/index';

// The bench is bundled (scripts/bench.mjs), so its sections are a static list: a section file left out of it would never run.
describe('bench sections', () => {
  it('lists every section file in test/bench/sections once, each with cases', () => {
    const files = readdirSync(fileURLToPath(new URL('./sections/', import.meta.url)))
      .filter((f) => f.endsWith('.ts') && f !== 'index.ts')
      .map((f) => f.slice(0, -3))
      .sort();
    expect(BENCH_SECTIONS.map((s) => s.file).sort()).toEqual(files);
    for (const { section } of BENCH_SECTIONS) expect(section.cases.length).toBeGreaterThan(0);
  });
});
