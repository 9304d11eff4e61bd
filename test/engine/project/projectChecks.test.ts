import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseProjectData } from '../../../engine/project/parseProject';
import type { ProjectIssue } from '../../../engine/project/projectIssue';

const demoText = readFileSync(new URL('../../../fixtures/demo/demo.blockwise.json', import.meta.url), 'utf8');

function issuesAfter(edit: (doc: Record<string, any>) => void): readonly ProjectIssue[] { // eslint-disable-line @typescript-eslint/no-explicit-any
  const doc = JSON.parse(demoText) as Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
  edit(doc);
  const r = parseProjectData(doc);
  return r.ok ? [] : r.error;
}

function paths(issues: readonly ProjectIssue[]): string[] {
  return issues.map((i) => i.path);
}

describe('checkProject (through parseProject)', () => {
  it('checkProject refuses a landing weight above the maximum takeoff weight', () => {
    const issues = issuesAfter((d) => (d.airframe.weights.maxLanding = '37000 lb'));
    expect(paths(issues)).toEqual(['airframe.weights.maxLanding']);
    expect(issues[0]!.message).toContain('is above the maximum takeoff weight');
  });

  it('checkProject refuses an OEW that with the inlets reaches the maximum zero-fuel weight', () => {
    const issues = issuesAfter((d) => (d.airframe.weights.operatingEmpty = '21300 lb'));
    expect(paths(issues)).toEqual(['airframe.weights.operatingEmpty']);
  });

  it('checkProject refuses two inlet designs with the same name', () => {
    const issues = issuesAfter((d) => {
      d.inlets[1].name = 'long pitot';
      delete d.uncertainty; // its inputs name the inlet "short" (checked in uncertaintyChecks.test.ts)
    });
    expect(paths(issues)).toEqual(['inlets[1].name']);
  });

  it('checkProject maps polar validator findings to project paths', () => {
    // CD0 Mach axis out of order at row 2: the polar validator reports cd0.mach[2].
    const issues = issuesAfter((d) => (d.polar.cd0[2].mach = 0.3));
    expect(paths(issues)).toContain('polar.cd0[2].mach');
  });

  it('checkProject maps inlet validator findings to project paths', () => {
    const issues = issuesAfter((d) => (d.inlets[0].source.rows[2].mach = 0.1));
    expect(paths(issues)).toContain('inlets[0].source.rows[2].mach');
  });

  it('checkProject needs a solvable cruise leg in payload-range mode', () => {
    const issues = issuesAfter((d) => (d.mission.legs[3].distance = '2000 nmi'));
    expect(paths(issues)).toEqual(['mission.legs']);
    expect(issues[0]!.message).toContain('"distance": "solve"');
  });

  it('checkProject accepts fixed cruise distances in takeoff-weight mode', () => {
    const issues = issuesAfter((d) => {
      d.mission.legs[3].distance = '2000 nmi';
      d.mission.solve = { mode: 'takeoffWeight', takeoffWeight: '34000 lb', payload: '1600 lb' };
    });
    expect(issues).toEqual([]);
  });

  it('checkProject refuses a takeoff weight that leaves no fuel', () => {
    const issues = issuesAfter((d) => {
      d.mission.legs[3].distance = '2000 nmi';
      d.mission.solve = { mode: 'takeoffWeight', takeoffWeight: '19500 lb', payload: '1600 lb' };
    });
    expect(paths(issues)).toEqual(['mission.solve.takeoffWeight']);
  });

  it('checkProject refuses a climb that does not go up and a cruise away from the altitude reached', () => {
    const issues = issuesAfter((d) => {
      d.mission.legs[2].toAltitude = '0 ft';
    });
    expect(paths(issues)).toEqual(['mission.legs[2].toAltitude', 'mission.legs[3].altitude']);
  });

  it('checkProject refuses a destination elevation above the altitude the last descent ends at', () => {
    const issues = issuesAfter((d) => {
      d.mission.legs[4].toAltitude = '1500 ft';
      d.mission.destinationElevation = '5000 ft';
    });
    expect(paths(issues)).toEqual(['mission.destinationElevation']);
    expect(issues[0]!.message).toContain('1,500 ft (457 m)');
  });

  it('checkProject accepts a destination elevation at or below the altitude the last descent ends at', () => {
    expect(issuesAfter((d) => {
      d.mission.legs[4].toAltitude = '1500 ft';
      d.mission.destinationElevation = '1500 ft';
    })).toEqual([]);
    expect(issuesAfter((d) => {
      d.mission.legs[4].toAltitude = '1500 ft';
      delete d.mission.destinationElevation;
    })).toEqual([]);
  });

  it('checkProject refuses a step-climb ceiling below the cruise altitude', () => {
    const issues = issuesAfter((d) => (d.mission.legs[3].profile.maxAltitude = '31000 ft'));
    expect(paths(issues)).toEqual(['mission.legs[3].profile.maxAltitude']);
  });

  it('checkProject refuses a fan-face Mach band upside down', () => {
    const issues = issuesAfter((d) => {
      d.cautions.minFanFaceMach = 0.6;
      d.cautions.maxFanFaceMach = 0.4;
    });
    expect(paths(issues)).toEqual(['cautions.minFanFaceMach']);
  });
});

describe('checkProject: no flight after taxi in', () => {
  it('checkProject refuses a hold placed after the taxi in, naming both legs as the list numbers them', () => {
    const demo = JSON.parse(demoText) as { mission: { legs: unknown[] } };
    const n = demo.mission.legs.length;
    demo.mission.legs.push({ kind: 'hold', altitude: '1500 ft', time: '30 min', speed: { kind: 'bestEndurance' } });
    const r = parseProjectData(demo);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const issue = r.error.find((i) => i.path === `mission.legs[${n}].kind`);
    expect(issue?.message).toContain(`cannot follow the taxi in (leg ${n})`);
  });
});
