import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseProject, parseProjectData } from '../../../engine/project/parseProject';
import { migrateProject } from '../../../engine/project/projectMigrations';
import { projectSchema } from '../../../engine/project/projectSchema';
import { expectClose } from '../../support/assertInDelta';

const fixture = (path: string): string => readFileSync(new URL(`../../../fixtures/${path}`, import.meta.url), 'utf8');
const demoText = fixture('demo/demo.blockwise.json');

interface Expectation {
  readonly stage: 'parse' | 'load';
  readonly path: string;
  readonly fragment: string;
}
const expected = JSON.parse(fixture('bad-projects/expected.json')) as Record<string, Expectation>;

// Conversion factors: NIST SP 811 (ft = 0.3048 m, lb = 0.45359237 kg, kt = 1852/3600 m/s, nmi = 1852 m).
const FT = 0.3048;
const LB = 0.45359237;
const KT = 1852 / 3600;
const NMI = 1852;

describe('parseProject on the demo project', () => {
  const r = parseProject(demoText, 'demo.blockwise.json');

  it('parseProject accepts the demo project', () => {
    if (!r.ok) throw new Error(r.error.map((i) => i.message).join('\n'));
    expect(r.ok).toBe(true);
  });

  it('parseProject converts the demo weights, speeds and distances to SI', () => {
    if (!r.ok) throw new Error('demo did not parse');
    const p = r.value;
    expectClose(p.airframe.weights.maxTakeoff, 36500 * LB, { rel: 1e-15 }, 'NIST SP 811: lb');
    expectClose(p.airframe.wingArea, 450 * FT * FT, { rel: 1e-15 }, 'NIST SP 811: ft2');
    expectClose(p.airframe.vmo, 340 * KT, { rel: 1e-15 }, 'NIST SP 811: kt');
    const climb = p.mission.legs[2]!;
    expect(climb.kind).toBe('climb');
    if (climb.kind === 'climb') {
      expectClose(climb.toAltitude, 11277.6, { abs: 4e-12 }, '37000 ft, definition of the foot');
      expectClose(climb.schedule.lowCas, 250 * KT, { rel: 1e-15 }, 'NIST SP 811: kt');
    }
    const solve = p.mission.solve;
    expect(solve.mode).toBe('payloadRange');
    if (solve.mode === 'payloadRange') {
      expectClose(solve.range, 3000 * NMI, { rel: 1e-15 }, 'NIST SP 811: nmi');
      expectClose(solve.payload, 1600 * LB, { rel: 1e-15 }, 'NIST SP 811: lb');
    }
    const reserves = p.mission.reserves;
    expect(reserves.preset).toBe('icaoAnnex6');
    if (reserves.preset === 'icaoAnnex6') {
      expect(reserves.contingencyFraction).toBeCloseTo(0.05, 15);
      expect(reserves.finalReserveTime).toBe(1800);
    }
  });

  it('parseProject fills defaults the file leaves out', () => {
    const doc = JSON.parse(demoText) as { cautions?: unknown; engine: { installation?: unknown } };
    delete doc.cautions;
    delete doc.engine.installation;
    const p = parseProjectData(doc);
    expect(p.ok).toBe(true);
    if (p.ok) {
      expect(p.value.cautions).toEqual({});
      expect(p.value.engine.installation).toEqual({ bleed: { kind: 'coreFraction', fraction: 0 }, powerExtraction: 0 });
    }
  });
});

describe('parseProject mission.destinationElevation', () => {
  const withElevation = (value: unknown): unknown => {
    const doc = JSON.parse(demoText) as { mission: Record<string, unknown> };
    if (value === undefined) delete doc.mission.destinationElevation;
    else doc.mission.destinationElevation = value;
    return doc;
  };

  it('parseProject converts mission.destinationElevation to metres', () => {
    const p = parseProjectData(withElevation('450 ft'));
    if (!p.ok) throw new Error(p.error.map((i) => i.message).join('\n'));
    // NIST SP 811: 1 ft = 0.3048 m exactly.
    expectClose(p.value.mission.destinationElevation!, 450 * FT, { rel: 1e-15 }, 'NIST SP 811: ft');
  });

  it('parseProject leaves mission.destinationElevation absent when the file has none', () => {
    const p = parseProjectData(withElevation(undefined));
    expect(p.ok).toBe(true);
    if (p.ok) expect(p.value.mission.destinationElevation).toBeUndefined();
  });

  it('parseProject rejects a destination elevation that is not a length, naming the field', () => {
    const p = parseProjectData(withElevation('450 kt'));
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.error.some((i) => i.path === 'mission.destinationElevation' && /speed/.test(i.message))).toBe(true);
  });

  it('parseProject rejects a destination elevation above 65,000 ft, naming the field and the range', () => {
    const p = parseProjectData(withElevation('70000 ft'));
    expect(p.ok).toBe(false);
    if (!p.ok) expect(p.error.some((i) => i.path === 'mission.destinationElevation' && i.message.includes('65,000 ft'))).toBe(true);
  });
});

describe('parseProject on fixtures/bad-projects', () => {
  const cases = Object.entries(expected).filter(([, e]) => e.stage === 'parse');

  it.each(cases)('parseProject rejects %s at the expected path with the expected message', (file, e) => {
    const r = parseProject(fixture(`bad-projects/${file}`), file);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const hit = r.error.find((i) => i.path === e.path && i.message.includes(e.fragment));
    expect(hit, `issues: ${JSON.stringify(r.error, null, 1)}`).toBeDefined();
    for (const issue of r.error) {
      expect(issue.message.length).toBeGreaterThan(0);
      expect(issue.expected.length).toBeGreaterThan(0);
    }
  });

  it('the bad-project fixture with a missing deck parses (the CLI reports the missing file)', () => {
    expect(parseProject(fixture('bad-projects/missing-deck.blockwise.json'), 'missing-deck').ok).toBe(true);
  });

  it('parseProject reports every issue of a file with several, not just the first', () => {
    const doc = JSON.parse(demoText) as { airframe: { wingArea: unknown; vmo: unknown }; mission: { wind: unknown } };
    doc.airframe.wingArea = '50 kg';
    doc.airframe.vmo = 'fast';
    doc.mission.wind = Infinity;
    const r = parseProjectData(doc);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.map((i) => i.path).sort()).toEqual(['airframe.vmo', 'airframe.wingArea', 'mission.wind']);
  });

  it('parseProject names the value and what was expected in each issue', () => {
    const doc = JSON.parse(demoText) as { mission: { legs: { toAltitude?: unknown }[] } };
    doc.mission.legs[2]!.toAltitude = '41000 kt';
    const r = parseProjectData(doc);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error[0]).toMatchObject({ path: 'mission.legs[2].toAltitude', value: '"41000 kt"' });
      expect(r.error[0]!.expected).toContain('a length');
      expect(r.error[0]!.message).toContain('"41000 kt" is a speed, expected a length');
    }
  });
});

describe('parseProject robustness', () => {
  it('parseProject never throws on arbitrary text and always explains a failure', () => {
    fc.assert(
      fc.property(fc.string(), (text) => {
        const r = parseProject(text, 'random');
        if (!r.ok) {
          expect(r.error.length).toBeGreaterThan(0);
          for (const i of r.error) expect(i.message).not.toBe('');
        }
      }),
      { numRuns: 300 },
    );
  });

  it('parseProject never throws on arbitrary JSON values and always explains a failure', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (value) => {
        const r = parseProjectData(value);
        expect(r.ok).toBe(false);
        if (!r.ok) for (const i of r.error) expect(i.path).not.toBe('');
      }),
      { numRuns: 300 },
    );
  });

  it('parseProject never throws when a demo field is replaced by an arbitrary JSON value', () => {
    const paths: readonly (readonly (string | number)[])[] = [
      ['airframe', 'weights', 'maxTakeoff'],
      ['polar', 'cd0', 1],
      ['polar', 'induced'],
      ['engine', 'deck'],
      ['inlets', 0, 'source'],
      ['mission', 'legs', 3],
      ['mission', 'reserves', 'alternate'],
      ['mission', 'solve'],
      ['cautions'],
    ];
    fc.assert(
      fc.property(fc.constantFrom(...paths), fc.jsonValue(), (path, value) => {
        const doc = JSON.parse(demoText) as Record<string | number, unknown>;
        let node = doc;
        for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
        node[path[path.length - 1]!] = value;
        const r = parseProjectData(doc);
        if (!r.ok) for (const i of r.error) expect(i.message).toMatch(/\S/);
      }),
      { numRuns: 300 },
    );
  });
});

// parseProjectData runs the schema jitless (a one-shot parse; see parseProject.ts). zod's compiled fast path is
// the reference: on the demo, every bad-project fixture and perturbed demos, both give the same data or the same issues.
describe('parseProject parses jitless with the same outcome as zod compiled', () => {
  const outcome = (doc: unknown, jitless: boolean): unknown => {
    const r = projectSchema.safeParse(doc, { jitless });
    return r.success ? { data: r.data } : { issues: r.error.issues };
  };
  const migrated = (doc: unknown): unknown => {
    const m = migrateProject(doc);
    return m.ok ? m.value.doc : doc;
  };

  it('jitless and compiled agree on the demo and on every bad-project fixture', () => {
    const docs = [JSON.parse(demoText) as unknown];
    for (const file of Object.keys(expected)) {
      try {
        docs.push(JSON.parse(fixture(`bad-projects/${file}`)) as unknown);
      } catch {
        // not JSON: stops before the schema
      }
    }
    expect(docs.length).toBeGreaterThan(5);
    for (const doc of docs) expect(outcome(migrated(doc), true)).toEqual(outcome(migrated(doc), false));
    expect(outcome(migrated(docs[0]), true)).toHaveProperty('data');
  });

  it('jitless and compiled agree when a demo field is replaced by an arbitrary JSON value', () => {
    const paths: readonly (readonly (string | number)[])[] = [
      ['airframe', 'weights', 'maxTakeoff'],
      ['polar', 'induced'],
      ['engine', 'deck'],
      ['inlets', 0],
      ['mission', 'legs', 2],
      ['mission', 'reserves'],
      ['mission', 'solve'],
    ];
    fc.assert(
      fc.property(fc.constantFrom(...paths), fc.jsonValue(), (path, value) => {
        const doc = migrated(JSON.parse(demoText)) as Record<string | number, unknown>;
        let node = doc;
        for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
        node[path[path.length - 1]!] = value;
        expect(outcome(doc, true)).toEqual(outcome(doc, false));
      }),
      { numRuns: 200 },
    );
  });
});
