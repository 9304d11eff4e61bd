/** The uncertainty block's cross-field rules, through parseProject on edited copies of the demo project. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseProjectData } from '../../../engine/project/parseProject';
import type { ProjectIssue } from '../../../engine/project/projectIssue';

const demoText = readFileSync(new URL('../../../fixtures/demo/demo.blockwise.json', import.meta.url), 'utf8');

type Doc = { uncertainty: { inputs: Record<string, unknown>[] }; inlets: Record<string, unknown>[] };
function issuesAfter(edit: (doc: Doc) => void): readonly ProjectIssue[] {
  const doc = JSON.parse(demoText) as Doc;
  edit(doc);
  const r = parseProjectData(doc);
  return r.ok ? [] : r.error;
}

describe('uncertainty checks', () => {
  it('the demo declares valid uncertainties', () => {
    expect(issuesAfter(() => {})).toEqual([]);
  });
  it('an unknown inlet is an issue naming the designs', () => {
    const issues = issuesAfter((d) => (d.uncertainty.inputs[5]!.inlet = 'medium'));
    expect(issues.map((i) => i.path)).toEqual(['uncertainty.inputs[5].inlet']);
    expect(issues[0]!.message).toContain('"long pitot", "short"');
  });
  it('uniform bounds out of order, and a normal whose bounds leave out the mean, are issues', () => {
    const issues = issuesAfter((d) => {
      d.uncertainty.inputs[4]!.distribution = { kind: 'uniform', min: 0.2, max: -0.2 };
      d.uncertainty.inputs[0]!.distribution = { kind: 'normal', sd: 5, min: 1 };
    });
    expect(issues.map((i) => i.path).sort()).toEqual(['uncertainty.inputs[0].distribution.min', 'uncertainty.inputs[4].distribution.max']);
  });
  it('a TSFC change reaching -100 % is an issue', () => {
    const issues = issuesAfter((d) => (d.uncertainty.inputs[2]!.distribution = { kind: 'normal', sd: '40 %' }));
    expect(issues.map((i) => i.path)).toEqual(['uncertainty.inputs[2].distribution']);
  });
  it('a negative standard deviation and an unknown input are schema issues', () => {
    expect(issuesAfter((d) => (d.uncertainty.inputs[0]!.distribution = { kind: 'normal', sd: -1 })).map((i) => i.path)).toEqual(['uncertainty.inputs[0].distribution.sd']);
    expect(issuesAfter((d) => (d.uncertainty.inputs[0]!.input = 'wingArea')).map((i) => i.path)).toEqual(['uncertainty.inputs[0].input']);
  });
});
