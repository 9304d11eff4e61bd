/**
 * The analyses of the printable report: whatever the user has run in this
 * session (inlet comparison with its breakdown, trade factors, payload-range,
 * uncertainty bands), read from the job store where the views keep them. An
 * analysis run for older inputs is printed marked as such; one never run is
 * left out with a line saying so, so the reader knows it was not forgotten.
 */
import type { Project } from '../../engine/project';
import { displayUnit, formatQuantity, type UnitSystem } from '../../engine/units';
import type { UncertaintyResult } from '../../engine/uncertainty';
import { FACTOR_LABEL, payloadRangeRows } from '../charts/compareSeries';
import { ComparisonTable } from '../components/ComparisonTable';
import { LineChartPanel } from '../components/LineChartPanel';
import type { EngineReplies, EngineRequest, EngineRequestKind } from '../worker/engineProtocol';
import { useJobStore } from '../worker/jobStore';

const REPORT_CHART = { width: 680, height: 220 };

/** Job-store keys of the analyses the report prints (the views' persistKey values). */
export const REPORT_JOB_KEYS = {
  compare: 'compare',
  tradeFactors: 'tradeFactors',
  payloadRange: 'payloadRange',
  uncertaintyCompare: 'uncertainty.compare-uncertainty',
  uncertaintyResults: 'uncertainty.results-uncertainty',
} as const;

interface Ran<K extends EngineRequestKind> {
  readonly value: EngineReplies[K];
  /** Run for another version of the project or deck than the one printed. */
  readonly outdated: boolean;
}

function useRan<K extends EngineRequestKind>(key: string, project: Project): Ran<K> | null {
  const store = useJobStore();
  if (store === null) return null;
  const slot = store.slot(key);
  if (slot.lastValue === null) return null;
  const request = slot.request as EngineRequest | null;
  return { value: slot.lastValue as EngineReplies[K], outdated: request === null || request.project !== project };
}

function Outdated(props: { readonly ran: { readonly outdated: boolean } }) {
  return props.ran.outdated ? <p className="stale-mark">Computed for an earlier version of the inputs.</p> : null;
}

export function ReportAnalyses(props: { readonly project: Project; readonly units: UnitSystem }) {
  const { project, units: u } = props;
  const compare = useRan<'compare'>(REPORT_JOB_KEYS.compare, project);
  const trade = useRan<'tradeFactors'>(REPORT_JOB_KEYS.tradeFactors, project);
  const payloadRange = useRan<'payloadRange'>(REPORT_JOB_KEYS.payloadRange, project);
  const bandCompare = useRan<'uncertainty'>(REPORT_JOB_KEYS.uncertaintyCompare, project);
  const bandResults = useRan<'uncertainty'>(REPORT_JOB_KEYS.uncertaintyResults, project);
  const notRun = [
    compare === null ? 'inlet comparison' : null,
    trade === null ? 'trade factors' : null,
    payloadRange === null ? 'payload-range diagram' : null,
    bandCompare === null && bandResults === null ? 'uncertainty band' : null,
  ].filter((x): x is string => x !== null);
  return (
    <>
      {compare ? (
        <section className="report-section" data-testid="report-compare">
          <h2>
            Inlet comparison: {compare.value.designs[0]?.name} (A) against {compare.value.designs[1]?.name} (B)
          </h2>
          <Outdated ran={compare} />
          <ComparisonTable result={compare.value} units={u} idPrefix="report-compare" />
          <table data-testid="report-compare-breakdown">
            <thead>
              <tr>
                <th>Part of B - A</th>
                <th>Block fuel</th>
              </tr>
            </thead>
            <tbody>
              {compare.value.breakdown.parts.map((p) => (
                <tr key={p.factor}>
                  <td>{FACTOR_LABEL[p.factor]}</td>
                  <td>{formatQuantity(p.blockFuel_kg, 'mass', u)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="small">{compare.value.breakdown.description}</p>
        </section>
      ) : null}
      {bandCompare ? <BandSection title="How sure is B - A?" ran={bandCompare} units={u} testId="report-band-compare" /> : null}
      {bandResults ? <BandSection title="Block-fuel band" ran={bandResults} units={u} testId="report-band-results" /> : null}
      {trade ? (
        <section className="report-section" data-testid="report-trade">
          <h2>Trade factors ({project.activeInlet})</h2>
          <Outdated ran={trade} />
          <table>
            <thead>
              <tr>
                <th>Change</th>
                <th>Block fuel change</th>
              </tr>
            </thead>
            <tbody>
              {trade.value.factors.map((f) => (
                <tr key={f.name}>
                  <td>{f.unit}</td>
                  <td>{f.blockFuelPerUnit_kg === null ? '—' : formatQuantity(f.blockFuelPerUnit_kg, 'mass', u, 1)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="small">{trade.value.recoveryMethod}</p>
        </section>
      ) : null}
      {payloadRange ? (
        <section className="report-section" data-testid="report-payload-range">
          <h2>Payload against range ({project.activeInlet})</h2>
          <Outdated ran={payloadRange} />
          <LineChartPanel
            title="Payload-range diagram (reserves carried)"
            testId="report-chart-payload-range"
            data={payloadRangeRows(payloadRange.value, u)}
            xKey="range"
            xLabel={`range (${displayUnit('distance', u)})`}
            yLabel={`payload (${displayUnit('mass', u)})`}
            series={[{ key: 'payload', name: 'payload' }]}
            size={REPORT_CHART}
          />
          <table>
            <thead>
              <tr>
                <th>Corner</th>
                <th>Payload</th>
                <th>Range</th>
                <th>Take-off mass</th>
              </tr>
            </thead>
            <tbody>
              {[
                { name: 'Maximum payload', p: payloadRange.value.maxPayload },
                ...(payloadRange.value.mtowFullFuel ? [{ name: 'MTOW with full tanks', p: payloadRange.value.mtowFullFuel }] : []),
                { name: 'Ferry', p: payloadRange.value.ferry },
              ].map((c) => (
                <tr key={c.name}>
                  <td>{c.name}</td>
                  <td>{formatQuantity(c.p.payload_kg, 'mass', u)}</td>
                  <td>{formatQuantity(c.p.range_m, 'distance', u)}</td>
                  <td>{formatQuantity(c.p.takeoffMass_kg, 'mass', u)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      ) : null}
      {notRun.length > 0 ? (
        <p className="small" data-testid="report-not-run">
          Not run in this session, so not in this report: {notRun.join(', ')}.
        </p>
      ) : null}
    </>
  );
}

function BandSection(props: { readonly title: string; readonly ran: Ran<'uncertainty'>; readonly units: UnitSystem; readonly testId: string }) {
  const { value: r } = props.ran as { value: UncertaintyResult };
  const u = props.units;
  return (
    <section className="report-section" data-testid={props.testId}>
      <h2>{props.title}</h2>
      <Outdated ran={props.ran} />
      <table>
        <thead>
          <tr>
            <th />
            <th>Mean</th>
            <th>P5</th>
            <th>P50</th>
            <th>P95</th>
          </tr>
        </thead>
        <tbody>
          {r.designs.map((d) => (
            <tr key={d.name}>
              <td>Block fuel, {d.name}</td>
              <td>{formatQuantity(d.blockFuel_kg.mean, 'mass', u)}</td>
              <td>{formatQuantity(d.blockFuel_kg.p05, 'mass', u)}</td>
              <td>{formatQuantity(d.blockFuel_kg.p50, 'mass', u)}</td>
              <td>{formatQuantity(d.blockFuel_kg.p95, 'mass', u)}</td>
            </tr>
          ))}
          {r.difference_kg ? (
            <tr>
              <td>B - A</td>
              <td>{formatQuantity(r.difference_kg.mean, 'mass', u)}</td>
              <td>{formatQuantity(r.difference_kg.p05, 'mass', u)}</td>
              <td>{formatQuantity(r.difference_kg.p50, 'mass', u)}</td>
              <td>{formatQuantity(r.difference_kg.p95, 'mass', u)}</td>
            </tr>
          ) : null}
        </tbody>
      </table>
      <p className="small">
        {r.samplesUsed} of {r.samples} samples flown, seed {r.seed}; {r.method}
        {r.probabilityBBetter === null ? '' : `; B burns less in ${(100 * r.probabilityBBetter).toFixed(0)} % of samples`}.
      </p>
    </section>
  );
}
