/**
 * Cross-field rules of the `uncertainty` block: the inlet an input names
 * exists (and has a recovery table, for a recovery offset), a uniform's
 * bounds are in order, a normal's bounds contain its mean, and a relative
 * change of K or TSFC stays above -100 %.
 */
import { makeIssue, type ProjectIssue } from './projectIssue';
import type { Project } from './projectSchema';

/** Issues of `project.uncertainty`; `raw(path)` shows the value as written. */
export function checkUncertainty(project: Project, raw: (path: string) => string): ProjectIssue[] {
  const issues: ProjectIssue[] = [];
  const inputs = project.uncertainty?.inputs ?? [];
  const names = project.inlets.map((i) => JSON.stringify(i.name)).join(', ');
  inputs.forEach((input, i) => {
    const base = `uncertainty.inputs[${i}]`;
    if ('inlet' in input && input.inlet !== undefined) {
      const inlet = project.inlets.find((x) => x.name === input.inlet);
      if (inlet === undefined) {
        issues.push(makeIssue(`${base}.inlet`, raw(`${base}.inlet`), `one of ${names}`, `${raw(`${base}.inlet`)} is not an inlet design of this project; expected one of ${names}`));
      } else if (input.input === 'recovery' && inlet.source.kind !== 'recoveryTable') {
        issues.push(makeIssue(`${base}.inlet`, raw(`${base}.inlet`), 'an inlet with a recovery table', `a recovery offset applies to recovery-table inlets; "${inlet.name}" is a geometry inlet (make its diffuser loss coefficient the uncertain input instead)`));
      }
    }
    if (input.input === 'recoveryMethod') return;
    const d = input.distribution;
    const p = `${base}.distribution`;
    if (d.kind === 'uniform' && d.min > d.max) {
      issues.push(makeIssue(`${p}.max`, raw(`${p}.max`), `at least the minimum ${raw(`${p}.min`)}`, `${raw(`${p}.max`)} is below the minimum ${raw(`${p}.min`)}`));
    }
    if (d.kind === 'normal') {
      if (d.min !== undefined && d.min > d.mean) issues.push(makeIssue(`${p}.min`, raw(`${p}.min`), 'at most the mean', `${raw(`${p}.min`)} is above the mean; the bounds must contain the mean`));
      if (d.max !== undefined && d.max < d.mean) issues.push(makeIssue(`${p}.max`, raw(`${p}.max`), 'at least the mean', `${raw(`${p}.max`)} is below the mean; the bounds must contain the mean`));
    }
    if (input.input === 'k' || input.input === 'tsfc') {
      const lowest = d.kind === 'uniform' ? d.min : (d.min ?? d.mean - 3 * d.sd);
      if (!(lowest > -1)) {
        issues.push(makeIssue(p, raw(p), 'a relative change above -100 %', `the lowest ${input.input === 'k' ? 'K' : 'TSFC'} change the distribution allows (${(lowest * 100).toFixed(1)} %) is not above -100 %`));
      }
    }
  });
  return issues;
}
