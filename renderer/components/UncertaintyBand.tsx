import { useState } from 'react';
import { Bar, BarChart, CartesianGrid, Cell, Tooltip, XAxis, YAxis } from 'recharts';
import { displayUnit, formatQuantity, toDisplay } from '../../engine/units';
import { bandRows, histogram } from '../charts/uncertaintySeries';
import { tickText } from '../charts/seriesKeys';
import { useStudy } from '../state/studyContext';
import { useEngineJob } from '../worker/useEngine';
import { ChoiceField } from './ChoiceField';
import { FailureNotice } from './IssueList';
import { JobProgress } from './JobProgress';
import { DEFAULT_CHART_SIZE, type ChartSize } from './LineChartPanel';

const SAMPLE_CHOICES = ['50', '100', '200', '500'] as const;

/**
 * The block-fuel band of the declared uncertainties, run on request: with one
 * design its band; with two (A, B) the bands and the difference B - A as a
 * band and a histogram, with the share of samples in which B burns less.
 */
export function UncertaintyBand(props: { readonly designs: readonly string[]; readonly testId: string; readonly chartSize?: ChartSize }) {
  const { state } = useStudy();
  const project = state.doc!.present;
  // Kept in the job store (under its test id) so a tab switch keeps it and the printed report can include it.
  const job = useEngineJob<'uncertainty'>({ persistKey: `uncertainty.${props.testId}` });
  const declared = project.uncertainty?.inputs.length ?? 0;
  const [samples, setSamples] = useState<(typeof SAMPLE_CHOICES)[number]>(String(project.uncertainty?.samples ?? 100) as (typeof SAMPLE_CHOICES)[number]);
  const u = state.units;
  const j = job.state;
  const size = props.chartSize ?? DEFAULT_CHART_SIZE;
  const choices = SAMPLE_CHOICES.map((s) => ({ value: s, label: `${s} samples` }));
  if (!choices.some((c) => c.value === samples)) choices.push({ value: samples, label: `${samples} samples` });
  const two = props.designs.length === 2;
  return (
    <div className="uncertainty-band" data-testid={props.testId}>
      <h3>{two ? 'How sure is B - A?' : 'Block-fuel band'}</h3>
      <p className="small">
        {declared === 0
          ? 'The project declares no uncertain inputs (add them beside the polar, weights, engine and inlet fields): the band is the deterministic answer.'
          : `${declared} uncertain input${declared === 1 ? '' : 's'} declared; Latin-hypercube Monte Carlo, seed ${project.uncertainty?.seed ?? 1}${two ? ', both designs on the same samples' : ''}.`}
      </p>
      <div className="field-grid">
        <ChoiceField label="Samples" testId={`${props.testId}-samples`} value={samples} choices={choices} onChoose={setSamples} />
        <button
          type="button"
          data-testid={`${props.testId}-run`}
          disabled={j.status === 'running' || props.designs.some((d) => d === '') || (two && props.designs[0] === props.designs[1])}
          onClick={() => job.start({ kind: 'uncertainty', project, deckFile: state.deckFile, designs: props.designs, samples: Number(samples) })}
        >
          Fly the band ({Number(samples) * props.designs.length + props.designs.length} missions)
        </button>
      </div>
      <JobProgress state={j} onCancel={job.cancel} testId={`${props.testId}-progress`} />
      {j.status === 'failed' ? <FailureNotice failure={j.failure} testId={`${props.testId}-failure`} /> : null}
      {j.status === 'done' ? <BandResult value={j.value} units={u} width={size.width} testId={props.testId} /> : null}
    </div>
  );
}

function BandResult(props: { readonly value: import('../../engine/uncertainty/uncertaintyRun').UncertaintyResult; readonly units: 'si' | 'customary'; readonly width: number; readonly testId: string }) {
  const r = props.value;
  const u = props.units;
  const rows = bandRows(r, u);
  const unit = displayUnit('mass', u);
  const target = r.values.difference_kg ?? r.values.blockFuel_kg[0]!;
  const bins = histogram(target, 20, (x) => toDisplay(x, 'mass', u));
  const diff = rows.find((x) => x.name === 'B - A');
  return (
    <>
      <table className="compare-table" data-testid={`${props.testId}-table`}>
        <thead>
          <tr>
            <th>Block fuel</th>
            <th>P5</th>
            <th>P50</th>
            <th>P95</th>
            <th>mean ± sd</th>
            <th>as written</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.name}>
              <td>{row.name}</td>
              <td>{row.p05.toFixed(0)} {unit}</td>
              <td>{row.p50.toFixed(0)} {unit}</td>
              <td>{row.p95.toFixed(0)} {unit}</td>
              <td>
                {row.mean.toFixed(0)} ± {row.sd.toFixed(0)} {unit}
              </td>
              <td>{row.deterministic.toFixed(0)} {unit}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {r.probabilityBBetter !== null ? (
        <p data-testid={`${props.testId}-p-b-better`} className="headline">
          B burns less block fuel than A in {(100 * r.probabilityBBetter).toFixed(0)} % of {r.samplesUsed} samples
          {diff ? ` (B - A from ${formatQuantity(r.difference_kg!.p05, 'mass', u)} to ${formatQuantity(r.difference_kg!.p95, 'mass', u)}, P5 to P95)` : ''}.
        </p>
      ) : null}
      <figure className="chart" data-testid={`${props.testId}-histogram`}>
        <figcaption>
          {r.values.difference_kg ? `B - A over the samples (${unit}); green: B burns less` : `Block fuel over the samples (${unit})`}
        </figcaption>
        <BarChart accessibilityLayer={false} role="img" aria-label="Histogram of block fuel B - A" width={props.width} height={200} data={bins} margin={{ top: 8, right: 24, bottom: 8, left: 16 }}>
          <CartesianGrid strokeDasharray="3 3" />
          <XAxis dataKey="label" interval={3} tick={{ fontSize: 11 }} />
          <YAxis allowDecimals={false} width={40} tickFormatter={tickText} label={{ value: 'samples', angle: -90, position: 'insideLeft' }} />
          <Tooltip formatter={(v) => [String(v), 'samples']} />
          <Bar dataKey="count" isAnimationActive={false}>
            {bins.map((b, i) => (
              <Cell key={i} fill={!r.values.difference_kg ? '#4a6fa5' : b.side === 'below' ? '#2e8540' : b.side === 'above' ? '#c2571a' : '#999999'} />
            ))}
          </Bar>
        </BarChart>
      </figure>
      {r.drivers.length > 0 ? (
        <p className="small" data-testid={`${props.testId}-drivers`}>
          Drivers{r.values.difference_kg ? ' of B - A' : ''} (Spearman rank correlation, share of rho²):{' '}
          {r.drivers
            .filter((d) => d.share !== null)
            .slice(0, 4)
            .map((d) => `${d.label} ${(100 * d.share!).toFixed(0)} %`)
            .join(', ')}
          .
        </p>
      ) : null}
      {r.failures.count > 0 ? <p className="small">{r.failures.count} samples did not fly and are left out: {r.failures.messages[0]}</p> : null}
      {r.held.length > 0 ? <p className="small">Held at a physical bound: {r.held.map((h) => `${h.what} (${h.samples})`).join('; ')}.</p> : null}
      <p className="small">{r.method}</p>
    </>
  );
}
