import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { SAFETY_NOTICE_LINES } from '../../../engine/core/notice';
import { formatQuantity } from '../../../engine/units/quantity';
import { StudyReport } from '../../../renderer/report/StudyReport';
import { createDeckCache, runEngineRequest } from '../../../renderer/worker/engineRunner';
import type { StudySnapshot } from '../../../renderer/worker/engineProtocol';
import { demoState } from '../support/studyHarness';

describe('StudyReport', () => {
  it('prints the inputs, the results with plots, the legs, the cautions and the notice', () => {
    const s = demoState();
    const project = s.doc!.present;
    const r = runEngineRequest({ kind: 'study', project, deckFile: s.deckFile }, createDeckCache());
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    const snapshot = r.value as StudySnapshot;
    render(<StudyReport project={project} snapshot={snapshot} units="si" stale={true} />);
    const report = screen.getByTestId('print-report');
    expect(report.textContent).toContain(project.name);
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
});
