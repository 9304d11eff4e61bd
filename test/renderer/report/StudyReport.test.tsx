import { render, screen } from '@testing-library/react';
import type { ReactNode } from 'react';
import { describe, expect, it } from 'vitest';
import { SAFETY_NOTICE_LINES } from '../../../engine/core/notice';
import { formatQuantity } from '../../../engine/units/quantity';
import { reportDateText, StudyReport } from '../../../renderer/report/StudyReport';
import { REPORT_JOB_KEYS } from '../../../renderer/report/ReportAnalyses';
import { JobStoreProvider, useJobStore } from '../../../renderer/worker/jobStore';
import type { EngineRequest } from '../../../renderer/worker/engineProtocol';
import { createDeckCache, runEngineRequest } from '../../../renderer/worker/engineRunner';
import type { StudySnapshot } from '../../../renderer/worker/engineProtocol';
import { demoState } from '../support/studyHarness';
import { flyStudy } from '../support/demoStudy';

describe('StudyReport', () => {
  it('prints the inputs, the results with plots, the legs, the cautions and the notice', () => {
    const s = demoState();
    const project = s.doc!.present;
    const snapshot = flyStudy({ project, deckFile: s.deckFile });
    const printedAt = new Date(2026, 11, 2, 9, 5);
    render(<StudyReport project={project} snapshot={snapshot} units="si" stale={true} documentName="demo.blockwise.json" printedAt={printedAt} />);
    const report = screen.getByTestId('print-report');
    expect(report.textContent).toContain(project.name);
    // dated, with the project file's name
    expect(screen.getByTestId('report-meta').textContent).toContain('demo.blockwise.json');
    expect(screen.getByTestId('report-meta').textContent).toContain('printed 2026-12-02 09:05');
    // nothing run in this session (no job store): the report says which analyses it leaves out
    expect(screen.getByTestId('report-not-run').textContent).toContain('inlet comparison, trade factors, payload-range diagram, uncertainty band');
    expect(report.textContent).toContain(`MTOW ${formatQuantity(project.airframe.weights.maxTakeoff, 'mass', 'si')}`);
    expect(report.textContent).toContain('The results below are from before the latest edit.');
    expect(screen.getByTestId('report-headline-block-fuel').textContent).toBe(formatQuantity(snapshot.mission.blockFuel_kg, 'mass', 'si'));
    for (const id of ['report-chart-altitude', 'report-chart-mass', 'report-chart-polar', 'report-chart-lapse']) {
      expect(screen.getByTestId(id).querySelector('svg'), id).not.toBeNull();
    }
    expect(screen.getByTestId('report-legs-table').querySelectorAll('tbody tr')).toHaveLength(snapshot.mission.legs.length);
    expect(report.querySelectorAll('.report-notice')).toHaveLength(2);
    for (const line of SAFETY_NOTICE_LINES) expect(screen.getAllByTestId('report-notice')[0]!.textContent).toContain(line);
    expect(screen.queryByTestId('report-cautions') ?? screen.queryByTestId('report-cautions-empty')).not.toBeNull();
  }, 30000);

  it('prints the analyses run in this session from the job store, in the chosen units, marking one run for older inputs', () => {
    const s = demoState();
    const project = s.doc!.present;
    const inputs = { project, deckFile: s.deckFile };
    const run = (request: EngineRequest) => {
      const r = runEngineRequest(request, createDeckCache());
      if (!r.ok) throw new Error(JSON.stringify(r.error));
      return r.value;
    };
    const study = run({ kind: 'study', ...inputs }) as StudySnapshot;
    const names = project.inlets.map((i) => i.name);
    const compareRequest = { kind: 'compare' as const, ...inputs, nameA: names[0]!, nameB: names[1]! };
    const compare = run(compareRequest) as { difference: { blockFuel_kg: number }; breakdown: { parts: readonly { blockFuel_kg: number }[] } };
    // the payload-range diagram was flown for an earlier version of the project
    const olderProject = { ...project, name: `${project.name} (before an edit)` };
    const payloadRequest = { kind: 'payloadRange' as const, project: olderProject, deckFile: s.deckFile };
    const payloadRange = run(payloadRequest) as { ferry: { range_m: number } };
    function Seed(props: { readonly children: ReactNode }) {
      const store = useJobStore()!;
      const c = store.slot(REPORT_JOB_KEYS.compare);
      c.lastValue = compare as never;
      c.request = compareRequest;
      const p = store.slot(REPORT_JOB_KEYS.payloadRange);
      p.lastValue = payloadRange as never;
      p.request = payloadRequest;
      return <>{props.children}</>;
    }
    render(
      <JobStoreProvider documentKey={1}>
        <Seed>
          <StudyReport project={project} snapshot={study} units="customary" stale={false} documentName="demo.blockwise.json" printedAt={new Date()} />
        </Seed>
      </JobStoreProvider>,
    );
    const section = screen.getByTestId('report-compare');
    expect(section.textContent).toContain(formatQuantity(compare.difference.blockFuel_kg, 'mass', 'customary'));
    expect(section.textContent).not.toContain('earlier version');
    // the breakdown's parts add up to the difference (Shapley parts are exact, docs/analyses.md)
    const sum = compare.breakdown.parts.reduce((a, p) => a + p.blockFuel_kg, 0);
    expect(Math.abs(sum - compare.difference.blockFuel_kg)).toBeLessThan(1e-6);
    expect(screen.getByTestId('report-compare-breakdown').querySelectorAll('tbody tr')).toHaveLength(compare.breakdown.parts.length);
    const pr = screen.getByTestId('report-payload-range');
    expect(pr.textContent).toContain('Computed for an earlier version of the inputs.');
    expect(pr.textContent).toContain(formatQuantity(payloadRange.ferry.range_m, 'distance', 'customary'));
    expect(pr.querySelector('svg')).not.toBeNull();
    expect(screen.getByTestId('report-not-run').textContent).toBe('Not run in this session, so not in this report: trade factors, uncertainty band.');
  }, 60000);

  it('writes the date as year-month-day hours:minutes in local time', () => {
    expect(reportDateText(new Date(2026, 0, 5, 7, 3))).toBe('2026-01-05 07:03');
  });
});
