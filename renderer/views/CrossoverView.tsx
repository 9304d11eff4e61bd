import { useMemo } from 'react';
import { usePersistentValue } from '../worker/jobStore';
import { RATING_NAMES, type RatingName } from '../../engine/propulsion';
import { crossoverSeries } from '../charts/crossoverSeries';
import { ChoiceField } from '../components/ChoiceField';
import { FailureNotice } from '../components/IssueList';
import { LineChartPanel, type ChartSize } from '../components/LineChartPanel';
import { LocalQuantityField } from '../components/LocalQuantityField';
import { machText, ratingLabel } from '../state/displayText';
import { useStudy } from '../state/studyContext';
import { groupDigits, messageIn, FOOT_M } from '../../engine/units';
import type { CrossoverRequestQuery } from '../worker/engineProtocol';
import { useLiveAnalysis, type LiveStudy } from '../worker/useEngine';

const FT = FOOT_M;

/** Thrust available and drag against Mach at a chosen altitude, mass and rating, with the crossovers and thrust minimum marked. */
export function CrossoverView(props: { readonly live: LiveStudy; readonly chartSize?: ChartSize }) {
  const { state } = useStudy();
  const project = state.doc!.present;
  const firstCruise = project.mission.legs.find((l) => l.kind === 'cruise');
  const [altitude_m, setAltitude] = usePersistentValue('crossover.altitude_m', firstCruise?.kind === 'cruise' ? firstCruise.altitude : 35000 * FT);
  const [mass_kg, setMass] = usePersistentValue('crossover.mass_kg', 0.9 * project.airframe.weights.maxTakeoff);
  const [rating, setRating] = usePersistentValue<RatingName>('crossover.rating', 'maxCruise');
  const [allInlets, setAllInlets] = usePersistentValue('crossover.allInlets', false);
  const query = useMemo<CrossoverRequestQuery>(() => ({ altitude_m, mass_kg, rating, isaDev_K: project.mission.isaDeviation, allInlets }), [altitude_m, mass_kg, rating, allInlets, project.mission.isaDeviation]);
  const job = useLiveAnalysis('crossover', { project, deckFile: state.deckFile }, query);
  const u = state.units;
  const s = job.state;
  const shown = job.lastValue;
  const plot = shown ? crossoverSeries(shown, u) : null;
  return (
    <section>
      <h2>Thrust against drag</h2>
      <div className="field-grid">
        <LocalQuantityField label="Pressure altitude" value_si={altitude_m} unit="altitude" units={u} testId="field-crossover-altitude" onValue={setAltitude} />
        <LocalQuantityField label="Aircraft mass" value_si={mass_kg} unit="mass" units={u} testId="field-crossover-mass" onValue={setMass} />
        <ChoiceField label="Rating" testId="crossover-rating" value={rating} choices={RATING_NAMES.map((r) => ({ value: r, label: ratingLabel(r) }))} onChoose={setRating} />
        <label className="toggle">
          <input type="checkbox" data-testid="crossover-all-inlets" checked={allInlets} onChange={(e) => setAllInlets(e.target.checked)} /> Every inlet design
        </label>
      </div>
      {s.status === 'failed' ? <FailureNotice failure={s.failure} testId="crossover-failure" /> : null}
      {s.status === 'running' ? <p role="status">Computing…</p> : null}
      {plot && shown ? (
        <>
          {shown.curves.map(({ inletName, result }) => (
            <p key={inletName} data-testid="crossover-message">
              {inletName}: {messageIn(result, u)}
            </p>
          ))}
          <LineChartPanel
            title="Thrust available and drag in level flight"
            testId="chart-crossover"
            data={plot.rows}
            xKey="mach"
            xLabel="Mach"
            yLabel={`force (${plot.unit})`}
            series={plot.series}
            dashed={(k) => k.startsWith('d')}
            verticalMarks={[...plot.markers.map((m) => ({ x: m.mach, label: m.beyond ? `${m.what} (${m.beyond})` : m.what })), ...plot.limits.map((l) => ({ x: l.mach, label: `limit: ${l.what}` }))]}
            points={plot.markers.flatMap((m) => (m.thrust === null ? [] : [{ x: m.mach, y: m.thrust, label: `${m.inletName} ${m.what}` }]))}
            {...(props.chartSize ? { size: props.chartSize } : {})}
          />
          <table data-testid="crossover-markers">
            <thead>
              <tr>
                <th>Inlet</th>
                <th>Point</th>
                <th>Mach</th>
                <th>Thrust available ({plot.unit})</th>
              </tr>
            </thead>
            <tbody>
              {plot.markers.map((m) => (
                <tr key={`${m.inletName}-${m.what}`}>
                  <td>{m.inletName}</td>
                  <td>{m.beyond ? `${m.what}, ${m.beyond}: not level flight inside the limits` : m.what}</td>
                  <td>{machText(m.mach)}</td>
                  <td>{m.thrust === null ? '—' : groupDigits(m.thrust, u === 'si' ? 2 : 0)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <table data-testid="crossover-limits">
            <caption>Limits of level flight (stall at CLmax, buffet onset at 1 g, VMO/MMO)</caption>
            <thead>
              <tr>
                <th>Inlet</th>
                <th>Limit</th>
                <th>Mach</th>
              </tr>
            </thead>
            <tbody>
              {plot.limits.map((l) => (
                <tr key={`${l.inletName}-${l.what}`}>
                  <td>{l.inletName}</td>
                  <td>{l.what}</td>
                  <td>{machText(l.mach)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </>
      ) : null}
    </section>
  );
}
