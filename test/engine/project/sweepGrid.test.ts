import { describe, expect, it } from 'vitest';
import { resolveFieldPath, withFieldAt } from '../../../engine/project/projectFieldPath';
import { caseDocument, gridCase, gridSize, parseShard, parseVary, shardRange, type SweepAxis } from '../../../engine/project/sweepGrid';

// A small project-like document: the field paths, lists by index and by name, quantities and plain numbers.
const doc = {
  polar: { cdIncrement: 0 },
  mission: {
    solve: { kind: 'payloadRange', range: '3000 nmi', payload: '2000 lb' },
    legs: [
      { kind: 'climb', name: 'Climb', toAltitude: '37000 ft' },
      { kind: 'cruise', name: 'Cruise', speed: { kind: 'mach', mach: 0.78 } },
    ],
  },
  cautions: { enabled: true },
};

function axis(spec: string): SweepAxis {
  const r = parseVary(doc, spec);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe('projectFieldPath', () => {
  it('resolveFieldPath finds dotted fields, list entries by index and by name', () => {
    const a = resolveFieldPath(doc, 'mission.legs[1].speed.mach');
    const b = resolveFieldPath(doc, 'mission.legs[Cruise].speed.mach');
    expect(a.ok && a.value.value).toBe(0.78);
    expect(b.ok && b.value.path).toEqual(['mission', 'legs', 1, 'speed', 'mach']);
  });

  it('resolveFieldPath says which part is missing and what is there', () => {
    const r = resolveFieldPath(doc, 'mission.solve.rnage');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toBe('mission.solve has no field "rnage"; it has kind, range, payload');
    const n = resolveFieldPath(doc, 'mission.legs[Descent].toAltitude');
    if (!n.ok) expect(n.error.message).toBe('mission.legs has no entry named "Descent"; names: "Climb", "Cruise"');
    const i = resolveFieldPath(doc, 'mission.legs[5]');
    if (!i.ok) expect(i.error.message).toBe('mission.legs has no entry [5]: it has 2 entries, [0] to [1]');
    const g = resolveFieldPath(doc, 'mission.solve');
    if (!g.ok) expect(g.error.code).toBe('not_a_value');
    expect(resolveFieldPath(doc, 'mission..solve').ok).toBe(false);
  });

  it('withFieldAt returns a changed copy and leaves the document as it was', () => {
    const changed = withFieldAt(doc, ['mission', 'legs', 1, 'speed', 'mach'], 0.8) as typeof doc;
    expect(changed.mission.legs[1]!.speed).toEqual({ kind: 'mach', mach: 0.8 });
    expect(doc.mission.legs[1]!.speed!.mach).toBe(0.78);
    expect(changed.polar).toBe(doc.polar);
  });
});

describe('sweepGrid', () => {
  it('parseVary lists from, from + step, ... to, keeping the unit written for quantity fields', () => {
    expect(axis('mission.solve.range=1000nmi:2000nmi:250nmi').values).toEqual(['1000 nmi', '1250 nmi', '1500 nmi', '1750 nmi', '2000 nmi']);
    expect(axis('polar.cdIncrement=0:0.0003:0.0001').values).toEqual([0, 0.0001, 0.0002, 0.0003]);
    // No unit written: the field's own unit.
    expect(axis('mission.solve.range=1000:1500:500').values).toEqual(['1000 nmi', '1500 nmi']);
    // A "to" that is not on the step is not passed.
    expect(axis('mission.legs[Cruise].speed.mach=0.74:0.79:0.02').values).toEqual([0.74, 0.76, 0.78]);
  });

  it('parseVary refuses bad definitions with where and why', () => {
    const bad = (spec: string) => {
      const r = parseVary(doc, spec);
      return r.ok ? 'accepted' : `${r.error.where}: ${r.error.message}`;
    };
    expect(bad('mission.solve.range')).toMatch(/^--vary mission.solve.range: write it as <field>=<from>:<to>:<step>/);
    expect(bad('mission.solve.rnage=1:2:1')).toBe('--vary mission.solve.rnage=1:2:1: mission.solve has no field "rnage"; it has kind, range, payload');
    expect(bad('polar.cdIncrement=0:1')).toMatch(/is not <from>:<to>:<step>/);
    expect(bad('polar.cdIncrement=0:0.001:0')).toMatch(/step "0" must be greater than 0/);
    expect(bad('polar.cdIncrement=0.002:0.001:0.001')).toMatch(/to \(0.001\) is below from \(0.002\)/);
    expect(bad('polar.cdIncrement=0kg:1kg:1kg')).toMatch(/plain number in the file/);
    expect(bad('mission.solve.range=1000nmi:2000km:100nmi')).toMatch(/in one unit \(got nmi, km\)/);
    expect(bad('cautions.enabled=0:1:1')).toMatch(/yes\/no field/);
    expect(bad('polar.cdIncrement=a:1:1')).toMatch(/from "a" is not a number/);
  });

  it('gridCase enumerates every combination once, the last axis fastest', () => {
    const axes = [axis('polar.cdIncrement=0:0.0002:0.0001'), axis('mission.legs[Cruise].speed.mach=0.74:0.76:0.02')];
    expect(gridSize(axes)).toBe(6);
    const cases = Array.from({ length: 6 }, (_, k) => gridCase(axes, k));
    expect(cases).toEqual([
      [0, 0.74], [0, 0.76], [0.0001, 0.74], [0.0001, 0.76], [0.0002, 0.74], [0.0002, 0.76],
    ]);
    const d = caseDocument(doc, axes, cases[3]!) as typeof doc;
    expect(d.polar.cdIncrement).toBe(0.0001);
    expect(d.mission.legs[1]!.speed!.mach).toBe(0.76);
  });

  it('shardRange partitions the grid exactly: every case in one shard, the shards contiguous and in order', () => {
    for (const total of [0, 1, 7, 100, 10007]) {
      for (const count of [1, 2, 3, 8, 13]) {
        let expectStart = 0;
        for (let index = 1; index <= count; index++) {
          const r = shardRange(total, { index, count });
          expect(r.start).toBe(expectStart);
          expect(r.end).toBeGreaterThanOrEqual(r.start);
          expect(r.end - r.start).toBeLessThanOrEqual(Math.ceil(total / count));
          expectStart = r.end;
        }
        expect(expectStart).toBe(total);
      }
    }
  });

  it('parseShard reads i/n numbered from 1 and refuses others', () => {
    const s = parseShard('3/8');
    expect(s.ok && s.value).toEqual({ index: 3, count: 8 });
    for (const bad of ['0/4', '5/4', '1/0', '2', 'a/b']) expect(parseShard(bad).ok).toBe(false);
  });
});
