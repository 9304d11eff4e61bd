import { useMemo } from 'react';
import { describeInstallationMethod } from '../../engine/propulsion';
import { healthClass, resultHealth } from '../state/resultHealth';
import { displayUnit, formatQuantity } from '../../engine/units';
import { profileSeries } from '../charts/profileSeries';
import { CautionList } from '../components/CautionList';
import { HeadlineFigures } from '../components/HeadlineFigures';
import { FailureNotice } from '../components/IssueList';
import { LegDetailPlots } from '../components/LegDetailPlots';
import { LegsTable } from '../components/LegsTable';
import { LineChartPanel, type ChartSize } from '../components/LineChartPanel';
import { StaleMark } from '../components/StaleMark';
import { UncertaintyBand } from '../components/UncertaintyBand';
import { useStudy } from '../state/studyContext';
import { deckTitleText } from '../state/deckTitle';
import { missionStatusText, statusLabel } from '../state/displayText';
import type { LiveStudy } from '../worker/useEngine';

function distanceAtTime(rows: ReturnType<typeof profileSeries>, time_s: number): number | null {
  let best: number | null = null;
  for (const r of rows) if (r.time_s <= time_s) best = r.distance;
  return best;
}

/** Headline figures, profile plots, the legs table and the cautions of the live mission. */
export function ResultsView(props: { readonly live: LiveStudy; readonly chartSize?: ChartSize }) {
  const { state, dispatch } = useStudy();
  const { snapshot, failure, stale, running } = props.live;
  const u = state.units;
  // Chart rows are derived once per result and unit system, not on every render.
  const rows = useMemo(() => (snapshot === null ? [] : profileSeries(snapshot.mission.history, u)), [snapshot, u]);
  if (snapshot === null) {
    return (
      <section>
        <h2>Flight results</h2>
        <FailureNotice failure={failure} testId="results-failure" />
        {failure === null ? <p data-testid="results-waiting">Flying the mission…</p> : null}
      </section>
    );
  }
  const m = snapshot.mission;
  const h = state.highlight;
  const highlightX = h?.time_s != null ? distanceAtTime(rows, h.time_s) : null;
  const marks = highlightX === null ? [] : [{ x: highlightX, label: 'caution' }];
  return (
    <section>
      <h2>Flight results</h2>
      <StaleMark stale={stale} running={running} />
      <FailureNotice failure={failure} testId="results-failure" />
      <p data-testid="mission-status" className={m.status === 'ok' ? 'status-ok' : 'status-bad'}>
        Mission status: {statusLabel(m.status)}
        {m.status !== 'ok' ? ` — ${missionStatusText(m, u)}` : ''} (inlet <span data-user-text>{snapshot.inletName}</span>; deck <span data-user-text>{deckTitleText(snapshot.deck.title, snapshot.deck.parametric)}</span>)
      </p>
      <p className="small" data-testid="results-installation-method">
        Installation method flown: {describeInstallationMethod(snapshot.deck.installationMethod)}.
      </p>
      <HeadlineFigures result={m} units={u} stale={stale} />
      <div className={`results-body ${healthClass(resultHealth(props.live))}`} data-testid="results-body">
      <UncertaintyBand designs={[snapshot.inletName]} testId="results-uncertainty" {...(props.chartSize ? { chartSize: props.chartSize } : {})} />
      <div className="chart-row">
        <LineChartPanel
          title="Altitude against distance"
          testId="chart-altitude"
          data={rows}
          xKey="distance"
          xLabel={`distance (${displayUnit('distance', u)})`}
          yLabel={`altitude (${displayUnit('altitude', u)})`}
          series={[{ key: 'altitude', name: 'pressure altitude' }]}
          verticalMarks={marks}
          {...(props.chartSize ? { size: props.chartSize } : {})}
        />
        <LineChartPanel
          title="Mass against distance"
          testId="chart-mass"
          data={rows}
          xKey="distance"
          xLabel={`distance (${displayUnit('distance', u)})`}
          yLabel={`mass (${displayUnit('mass', u)})`}
          series={[{ key: 'mass', name: 'aircraft mass' }]}
          verticalMarks={marks}
          {...(props.chartSize ? { size: props.chartSize } : {})}
        />
      </div>
      <h3>Legs</h3>
      <LegsTable legs={m.legs} units={u} highlightLeg={h?.legIndex ?? null} />
      <LegDetailPlots mission={m} units={u} {...(props.chartSize ? { chartSize: props.chartSize } : {})} />
      <h3>Cautions</h3>
      <CautionList cautions={m.cautions} units={u} onPick={(highlight) => dispatch({ type: 'highlighted', highlight })} />
      {h !== null ? (
        <p data-testid="highlight-note">
          Highlighted: {h.legIndex !== null ? `leg ${h.legIndex + 1}` : 'the mission'}
          {h.time_s !== null ? `, distance ${highlightX === null ? '—' : `${Math.round(highlightX)} ${displayUnit('distance', u)}`}` : ''}{' '}
          <button type="button" onClick={() => dispatch({ type: 'highlighted', highlight: null })}>
            Clear
          </button>
        </p>
      ) : null}
      <p className="small">Reserve fuel {formatQuantity(m.reserves.total_kg, 'mass', u)}: contingency, alternate, final reserve and extra as the reserve preset sets them.</p>
      </div>
    </section>
  );
}
