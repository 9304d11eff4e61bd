import { useMemo } from 'react';
import { formatQuantity, displayUnit } from '../../engine/units';
import { sweepCsv, sweepRows, writtenUnit } from '../charts/sweepSeries';
import { FailureNotice } from '../components/IssueList';
import { JobProgress } from '../components/JobProgress';
import { LineChartPanel, type ChartSize } from '../components/LineChartPanel';
import { statusLabel } from '../state/displayText';
import { useStudy } from '../state/studyContext';
import { usePersistentValue } from '../worker/jobStore';
import { useEngineJob, useLiveRerun, type LiveStudy } from '../worker/useEngine';
import { StaleMark } from '../components/StaleMark';
import { fileStem } from '../../engine/study';

function TextInput(props: { readonly label: string; readonly value: string; readonly testId: string; readonly onValue: (v: string) => void; readonly wide?: boolean }) {
  return (
    <label>
      {props.label}{' '}
      <input type="text" data-testid={props.testId} value={props.value} size={props.wide ? 36 : 10} onChange={(e) => props.onValue(e.target.value)} />
    </label>
  );
}

/**
 * A parameter study: one field of the project file (its JSON path, as
 * `blockwise sweep --vary` takes it) from, to, step; every case flown in the
 * worker on the CLI's code path, block fuel against the input and the cases.
 */
export function SweepView(props: { readonly live: LiveStudy; readonly chartSize?: ChartSize; readonly onExportText?: (text: string, name: string) => void }) {
  const { state } = useStudy();
  const project = state.doc!.present;
  const [field, setField] = usePersistentValue('sweep.field', 'mission.solve.range');
  const [from, setFrom] = usePersistentValue('sweep.from', '');
  const [to, setTo] = usePersistentValue('sweep.to', '');
  const [step, setStep] = usePersistentValue('sweep.step', '');
  const [unit, setUnit] = usePersistentValue('sweep.unit', 'nmi');
  const job = useEngineJob<'sweep'>({ persistKey: 'sweep' });
  const inputs = { project, deckFile: state.deckFile };
  const u1 = unit.trim();
  const vary = `${field.trim()}=${from.trim()}${u1}:${to.trim()}${u1}:${step.trim()}${u1}`;
  const outdated = useLiveRerun(job, { kind: 'sweep', ...inputs, vary: job.request?.vary ?? vary });
  const u = state.units;
  const j = job.state;
  const rows = useMemo(() => (j.status === 'done' ? sweepRows(j.value, u) : []), [j, u]);
  const size = props.chartSize ? { size: props.chartSize } : {};
  const written = j.status === 'done' ? writtenUnit(j.value) : '';
  return (
    <section>
      <h2>Parameter study</h2>
      <p className="small">
        Vary one field of the project file, named by its path (e.g. mission.solve.range, airframe.weights.operatingEmpty), from a value to another by a step, in the
        unit given (nmi, lb, ft, ...). Leave the unit empty for a plain-number field; a quantity field then takes the SI unit the app writes it in. The active inlet ({project.activeInlet}) is flown in every case, as blockwise sweep flies it.
      </p>
      <div className="field-grid">
        <TextInput label="Field" value={field} testId="sweep-field" onValue={setField} wide />
        <TextInput label="From" value={from} testId="sweep-from" onValue={setFrom} />
        <TextInput label="To" value={to} testId="sweep-to" onValue={setTo} />
        <TextInput label="Step" value={step} testId="sweep-step" onValue={setStep} />
        <TextInput label="Unit" value={unit} testId="sweep-unit" onValue={setUnit} />
        <button type="button" data-testid="sweep-run" disabled={j.status === 'running'} onClick={() => job.start({ kind: 'sweep', ...inputs, vary })}>
          Fly the cases
        </button>
      </div>
      <JobProgress state={j} onCancel={job.cancel} testId="sweep-progress" />
      <StaleMark stale={outdated} running={j.status === 'running'} />
      {j.status === 'failed' ? <FailureNotice failure={j.failure} testId="sweep-failure" /> : null}
      {j.status === 'done' ? (
        <>
          <LineChartPanel
            title={`Block fuel against ${j.value.field}`}
            testId="chart-sweep"
            data={rows}
            xKey="input"
            xLabel={written === '' ? j.value.field : `${j.value.field} (${written})`}
            yLabel={`block fuel (${displayUnit('mass', u)})`}
            series={[{ key: 'blockFuel', name: 'block fuel' }]}
            {...size}
          />
          <button
            type="button"
            data-testid="sweep-export"
            disabled={props.onExportText === undefined}
            onClick={() => props.onExportText?.(sweepCsv(j.value), `${fileStem(state.documentName)}-study.csv`)}
          >
            Cases CSV
          </button>
          <table data-testid="sweep-table">
            <thead>
              <tr>
                <th>{j.value.field}</th>
                <th>Status</th>
                <th>Block fuel</th>
                <th>Block time</th>
                <th>Take-off mass</th>
              </tr>
            </thead>
            <tbody>
              {j.value.rows.map((r) => {
                const flown = r.status !== 'invalid_input';
                return (
                  <tr key={r.case} data-testid={`sweep-row-${r.case}`}>
                    <td>{String(r.inputs[0])}</td>
                    <td title={r.message}>{statusLabel(r.status)}</td>
                    <td>{flown && r.status === 'ok' ? formatQuantity(r.blockFuel_kg, 'mass', u) : '—'}</td>
                    <td>{flown && r.status === 'ok' ? formatQuantity(r.blockTime_s, 'time', u) : '—'}</td>
                    <td>{flown ? formatQuantity(r.takeoffMass_kg, 'mass', u) : '—'}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
          <p className="small">A case not flown to its destination shows its status and no block fuel; its message is on the status.</p>
        </>
      ) : null}
    </section>
  );
}
