import { useMemo } from 'react';
import { usePersistentValue } from '../worker/jobStore';
import { displayUnit, formatQuantity } from '../../engine/units';
import { breakdownWaterfall, FACTOR_LABEL, payloadRangeRows } from '../charts/compareSeries';
import { profileCompareRows, profileCompareSeries, type ProfileQuantity } from '../charts/profileCompareSeries';
import { ChoiceField } from '../components/ChoiceField';
import { ComparisonTable } from '../components/ComparisonTable';
import { FailureNotice } from '../components/IssueList';
import { JobProgress } from '../components/JobProgress';
import { LineChartPanel, type ChartSize } from '../components/LineChartPanel';
import { UncertaintyBand } from '../components/UncertaintyBand';
import { WaterfallChart } from '../components/WaterfallChart';
import { ratingLabel } from '../state/displayText';
import { useStudy } from '../state/studyContext';
import { useEngineJob, useLiveRerun, type LiveStudy } from '../worker/useEngine';
import { StaleMark } from '../components/StaleMark';


/** Inlet A against B on block fuel, side by side, with the breakdown of the difference. */
function InletComparisonPanel(props: { readonly chartSize?: ChartSize }) {
  const { state } = useStudy();
  const project = state.doc!.present;
  const names = project.inlets.map((i) => i.name);
  const [chosenA, setA] = usePersistentValue('compare.nameA', names[0] ?? '');
  const [chosenB, setB] = usePersistentValue('compare.nameB', names[1] ?? names[0] ?? '');
  // A renamed or removed design falls back to the first ones.
  const nameA = names.includes(chosenA) ? chosenA : (names[0] ?? '');
  const nameB = names.includes(chosenB) ? chosenB : (names[1] ?? names[0] ?? '');
  const compare = useEngineJob<'compare'>({ persistKey: 'compare' });
  const inputs = { project, deckFile: state.deckFile };
  const outdated = useLiveRerun(compare, { kind: 'compare', ...inputs, nameA: compare.request?.nameA ?? nameA, nameB: compare.request?.nameB ?? nameB });
  const u = state.units;
  const size = props.chartSize ? { size: props.chartSize } : {};
  const c = compare.state;
  const choices = names.map((n) => ({ value: n, label: n }));
  return (
    <>
      <h2>Inlet A against inlet B</h2>
      <div className="field-grid">
        <ChoiceField label="Design A" testId="compare-inlet-a" value={nameA} choices={choices} onChoose={setA} />
        <ChoiceField label="Design B" testId="compare-inlet-b" value={nameB} choices={choices} onChoose={setB} />
        <button type="button" data-testid="compare-run" disabled={nameA === nameB || c.status === 'running'} onClick={() => compare.start({ kind: 'compare', ...inputs, nameA, nameB })}>
          Compare (16 missions)
        </button>
      </div>
      {nameA === nameB ? <p>Choose two different designs.</p> : null}
      <JobProgress state={c} onCancel={compare.cancel} testId="compare-progress" />
      <StaleMark stale={outdated} running={c.status === 'running'} />
      {c.status === 'failed' ? <FailureNotice failure={c.failure} testId="compare-failure" /> : null}
      {c.status === 'done' ? (
        <>
          <ComparisonTable result={c.value} units={u} idPrefix="compare" />
          <p className="small">
            Crossover compared at {formatQuantity(c.value.crossoverCondition.altitude_m, 'altitude', u)}, {formatQuantity(c.value.crossoverCondition.mass_kg, 'mass', u)},{' '}
            {ratingLabel(c.value.crossoverCondition.rating)}.
            {c.value.designs.some((d) => d.crossover.lowMach === null || d.crossover.highMach === null)
              ? ' A crossover shown as — does not exist there: thrust exceeds drag down to the stall or the lowest Mach examined (low), or up to the highest (high).'
              : ''}
          </p>
          <WaterfallChart rows={breakdownWaterfall(c.value, u)} unit={displayUnit('mass', u)} {...size} />
          <ul data-testid="compare-breakdown">
            {c.value.breakdown.parts.map((p) => (
              <li key={p.factor}>
                {FACTOR_LABEL[p.factor]}: {formatQuantity(p.blockFuel_kg, 'mass', u)}
              </li>
            ))}
          </ul>
          <p className="small">{c.value.breakdown.description}</p>
        </>
      ) : null}
      <ProfileOverlayPanel nameA={nameA} nameB={nameB} {...(props.chartSize ? { chartSize: props.chartSize } : {})} />
      <UncertaintyBand designs={[nameA, nameB]} testId="compare-uncertainty" {...(props.chartSize ? { chartSize: props.chartSize } : {})} />

    </>
  );
}

const PROFILE_PLOTS: readonly { readonly quantity: ProfileQuantity; readonly title: string; readonly kind: 'altitude' | 'mass'; readonly what: string }[] = [
  { quantity: 'altitude', title: 'Altitude against distance', kind: 'altitude', what: 'altitude' },
  { quantity: 'mass', title: 'Mass against distance', kind: 'mass', what: 'mass' },
  { quantity: 'fuel', title: 'Fuel burned against distance (from take-off)', kind: 'mass', what: 'fuel burned' },
];

/** The two designs' flown missions overlaid: altitude, mass and fuel burned against distance. */
function ProfileOverlayPanel(props: { readonly nameA: string; readonly nameB: string; readonly chartSize?: ChartSize }) {
  const { state } = useStudy();
  const project = state.doc!.present;
  const job = useEngineJob<'profiles'>({ persistKey: 'compare.profiles' });
  const inputs = { project, deckFile: state.deckFile };
  const designs = job.request?.designs ?? [props.nameA, props.nameB];
  const outdated = useLiveRerun(job, { kind: 'profiles', ...inputs, designs });
  const u = state.units;
  const size = props.chartSize ? { size: props.chartSize } : {};
  const j = job.state;
  const rows = useMemo(() => (j.status === 'done' ? profileCompareRows(j.value.designs, u) : []), [j, u]);
  const same = props.nameA === props.nameB;
  return (
    <>
      <h3>Mission profiles of the two designs</h3>
      <button
        type="button"
        data-testid="profiles-run"
        disabled={same || j.status === 'running'}
        onClick={() => job.start({ kind: 'profiles', ...inputs, designs: [props.nameA, props.nameB] })}
      >
        Fly both missions
      </button>
      <JobProgress state={j} onCancel={job.cancel} testId="profiles-progress" />
      <StaleMark stale={outdated} running={j.status === 'running'} />
      {j.status === 'failed' ? <FailureNotice failure={j.failure} testId="profiles-failure" /> : null}
      {j.status === 'done' ? (
        <>
          {PROFILE_PLOTS.map((plot) => (
            <LineChartPanel
              key={plot.quantity}
              title={plot.title}
              testId={`chart-profiles-${plot.quantity}`}
              data={rows}
              xKey="distance"
              xLabel={`air distance (${displayUnit('distance', u)})`}
              yLabel={`${plot.what} (${displayUnit(plot.kind, u)})`}
              series={profileCompareSeries(j.value.designs, plot.quantity)}
              pathsInDataOrder
              {...size}
            />
          ))}
          <ul data-testid="profiles-summary">
            {j.value.designs.map((d) => (
              <li key={d.name}>
                {d.name}: {formatQuantity(d.mission.airDistance_m, 'distance', u)} in the air, trip fuel {formatQuantity(d.mission.tripFuel_kg, 'mass', u)}, block fuel{' '}
                {formatQuantity(d.mission.blockFuel_kg, 'mass', u)}
                {d.mission.status === 'ok' ? '' : ` (${d.mission.status}: the profile stops where the mission did)`}
              </li>
            ))}
          </ul>
        </>
      ) : null}
    </>
  );
}

/** The payload-range diagram of the flown inlet, run on request with progress and cancel. */
function PayloadRangePanel(props: { readonly chartSize?: ChartSize }) {
  const { state } = useStudy();
  const project = state.doc!.present;
  const payloadRange = useEngineJob<'payloadRange'>({ persistKey: 'payloadRange' });
  const inputs = { project, deckFile: state.deckFile };
  const outdated = useLiveRerun(payloadRange, { kind: 'payloadRange', ...inputs });
  const u = state.units;
  const size = props.chartSize ? { size: props.chartSize } : {};
  const pr = payloadRange.state;
  return (
    <>
      <h3>Payload against range ({project.activeInlet})</h3>
      <button type="button" data-testid="payload-range-run" disabled={pr.status === 'running'} onClick={() => payloadRange.start({ kind: 'payloadRange', ...inputs })}>
        Fly the payload-range diagram
      </button>
      <JobProgress state={pr} onCancel={payloadRange.cancel} testId="payload-range-progress" />
      <StaleMark stale={outdated} running={pr.status === 'running'} />
      {pr.status === 'failed' ? <FailureNotice failure={pr.failure} testId="payload-range-failure" /> : null}
      {pr.status === 'done' ? (
        <>
          <LineChartPanel
            title="Payload-range diagram (reserves carried)"
            testId="chart-payload-range"
            data={payloadRangeRows(pr.value, u)}
            xKey="range"
            xLabel={`still-air range (${displayUnit('distance', u)})`}
            yLabel={`payload (${displayUnit('mass', u)})`}
            series={[{ key: 'payload', name: 'payload' }]}
            {...size}
          />
          <p className="small">{pr.value.note}</p>
        </>
      ) : null}

    </>
  );
}

/** Trade factors of the flown inlet, run on request with progress and cancel. */
function TradeFactorsPanel() {
  const { state } = useStudy();
  const project = state.doc!.present;
  const trade = useEngineJob<'tradeFactors'>({ persistKey: 'tradeFactors' });
  const inputs = { project, deckFile: state.deckFile };
  const outdated = useLiveRerun(trade, { kind: 'tradeFactors', ...inputs });
  const u = state.units;
  const t = trade.state;
  return (
    <>
      <h3>Trade factors ({project.activeInlet})</h3>
      <button type="button" data-testid="trade-run" disabled={t.status === 'running'} onClick={() => trade.start({ kind: 'tradeFactors', ...inputs })}>
        Compute trade factors
      </button>
      <JobProgress state={t} onCancel={trade.cancel} testId="trade-progress" />
      <StaleMark stale={outdated} running={t.status === 'running'} />
      {t.status === 'failed' ? <FailureNotice failure={t.failure} testId="trade-failure" /> : null}
      {t.status === 'done' ? (
        <>
          <table data-testid="trade-table">
            <thead>
              <tr>
                <th>Change</th>
                <th>Block fuel change</th>
                <th>Step check</th>
              </tr>
            </thead>
            <tbody>
              {t.value.factors.map((f) => (
                <tr key={f.name}>
                  <td>{f.unit}</td>
                  <td>{f.blockFuelPerUnit_kg === null ? '—' : formatQuantity(f.blockFuelPerUnit_kg, 'mass', u, 1)}</td>
                  <td>{f.converged ? 'converged' : (f.note ?? 'not converged')}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="small">
            Baseline block fuel {formatQuantity(t.value.baselineBlockFuel_kg, 'mass', u)} for {formatQuantity(t.value.designMission.payload_kg, 'mass', u)} over{' '}
            {formatQuantity(t.value.designMission.range_m, 'distance', u)}. {t.value.recoveryMethod}
          </p>
        </>
      ) : null}
      <RecoveryByMethodPanel />
    </>
  );
}

/** +1 % recovery by every recovery method side by side: the check of Raymer's rule against the deck's sensitivities and the cycle. */
function RecoveryByMethodPanel() {
  const { state } = useStudy();
  const project = state.doc!.present;
  const job = useEngineJob<'recoveryByMethod'>();
  const u = state.units;
  const j = job.state;
  return (
    <>
      <h3>+1 % recovery by each method</h3>
      <button type="button" data-testid="recovery-methods-run" disabled={j.status === 'running'} onClick={() => job.start({ kind: 'recoveryByMethod', project, deckFile: state.deckFile })}>
        Check Raymer&apos;s rule against the deck and the cycle
      </button>
      <JobProgress state={j} onCancel={job.cancel} testId="recovery-methods-progress" />
      {j.status === 'failed' ? <FailureNotice failure={j.failure} testId="recovery-methods-failure" /> : null}
      {j.status === 'done' ? (
        <>
          <table data-testid="recovery-methods-table">
            <thead>
              <tr>
                <th>Method</th>
                <th>Block fuel per +1 % recovery</th>
                <th>Against the first</th>
              </tr>
            </thead>
            <tbody>
              {j.value.rows.map((row, i) => (
                <tr key={row.id}>
                  <td>{row.label}</td>
                  <td>{row.blockFuelPerPercent_kg === null ? '—' : formatQuantity(row.blockFuelPerPercent_kg, 'mass', u, 1)}</td>
                  <td>{row.blockFuelPerPercent_kg === null ? row.note : j.value.relativeToFirst[i] == null ? '—' : `${(100 * j.value.relativeToFirst[i]!).toFixed(0)} %`}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="small">{j.value.description}</p>
        </>
      ) : null}
    </>
  );
}

/** Inlet A against B on block fuel with the breakdown, the payload-range diagram and the trade factors. */
export function CompareView(props: { readonly live: LiveStudy; readonly chartSize?: ChartSize }) {
  const size = props.chartSize ? { chartSize: props.chartSize } : {};
  return (
    <section>
      <InletComparisonPanel {...size} />
      <PayloadRangePanel {...size} />
      <TradeFactorsPanel />
    </section>
  );
}
