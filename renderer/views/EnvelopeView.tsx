import { useMemo } from 'react';
import { RATING_NAMES, type RatingName } from '../../engine/propulsion';
import { envelopeSeries, limitsAtCeiling } from '../charts/envelopeSeries';
import { ChoiceField } from '../components/ChoiceField';
import { FailureNotice } from '../components/IssueList';
import { LineChartPanel, type ChartSize } from '../components/LineChartPanel';
import { LocalQuantityField } from '../components/LocalQuantityField';
import { machText, ratingLabel } from '../state/displayText';
import { useStudy } from '../state/studyContext';
import { formatQuantity, messageIn, FOOT_M } from '../../engine/units';
import type { EnvelopeRequestQuery } from '../worker/engineProtocol';
import { usePersistentValue } from '../worker/jobStore';
import { useLiveAnalysis, type LiveStudy } from '../worker/useEngine';

const FT = FOOT_M;

/** The level-flight envelope at a chosen mass, rating and ISA deviation: altitude against Mach with every limit line, and the ceilings. */
export function EnvelopeView(props: { readonly live: LiveStudy; readonly chartSize?: ChartSize }) {
  const { state } = useStudy();
  const project = state.doc!.present;
  const [mass_kg, setMass] = usePersistentValue('envelope.mass_kg', project.airframe.weights.maxTakeoff);
  const [rating, setRating] = usePersistentValue<RatingName>('envelope.rating', 'maxClimb');
  const [isaDev_K, setIsaDev] = usePersistentValue('envelope.isaDev_K', project.mission.isaDeviation);
  // The CLI's defaults (cli/verbs/envelope.ts): rows to 50,000 ft in steps of 2,000 ft.
  const query = useMemo<EnvelopeRequestQuery>(() => ({ mass_kg, rating, isaDev_K, top_m: 50000 * FT, step_m: 2000 * FT }), [mass_kg, rating, isaDev_K]);
  const job = useLiveAnalysis('envelope', { project, deckFile: state.deckFile }, query);
  const u = state.units;
  const s = job.state;
  const shown = s.status === 'failed' ? null : job.lastValue;
  const plot = shown ? envelopeSeries(shown, u) : null;
  return (
    <section>
      <h2>Level-flight envelope</h2>
      <div className="field-grid">
        <LocalQuantityField label="Aircraft mass" value_si={mass_kg} unit="mass" units={u} testId="field-envelope-mass" onValue={setMass} />
        <ChoiceField label="Rating" testId="envelope-rating" value={rating} choices={RATING_NAMES.map((r) => ({ value: r, label: ratingLabel(r) }))} onChoose={setRating} />
        <LocalQuantityField label="ISA deviation" value_si={isaDev_K} unit="temperatureDelta" units={u} testId="field-envelope-isa" onValue={setIsaDev} />
      </div>
      {s.status === 'failed' ? <FailureNotice failure={s.failure} testId="envelope-failure" /> : null}
      {s.status === 'running' ? <p role="status">Computing…</p> : null}
      {plot && shown ? (
        <>
          <LineChartPanel
            title="Level-flight envelope: altitude against Mach"
            testId="chart-envelope"
            data={plot.rows}
            xKey="mach"
            xLabel="Mach"
            yLabel={`pressure altitude (${plot.unit})`}
            series={plot.series}
            pathsInDataOrder
            dashed={(k) => k.startsWith('margin')}
            horizontalMarks={plot.ceilings.map((c) => ({ y: c.altitude, label: `${c.name} ceiling` }))}
            {...(props.chartSize ? { size: props.chartSize } : {})}
          />
          <table data-testid="envelope-ceilings">
            <caption>Ceilings at {formatQuantity(shown.mass_kg, 'mass', u)}, {ratingLabel(shown.rating)}</caption>
            <thead>
              <tr>
                <th>Ceiling</th>
                <th>Residual climb rate</th>
                <th>Pressure altitude</th>
                <th>Best-climb Mach</th>
                <th>Binding limit</th>
              </tr>
            </thead>
            <tbody>
              {shown.ceilings.map((c) => {
                const band = c.altitude_m === null ? null : limitsAtCeiling(shown, c.altitude_m);
                return (
                  <tr key={c.name}>
                    <td>{c.name}</td>
                    <td>{formatQuantity(c.climbRate_m_s, 'climbRate', u)}</td>
                    <td>{c.altitude_m === null ? messageIn(c, u) : formatQuantity(c.altitude_m, 'altitude', u)}</td>
                    <td>{machText(c.bestClimbMach)}</td>
                    <td>{c.altitude_m === null ? '—' : `climb rate (thrust available less drag)${band === null ? '' : `; level flight there from ${band}`}`}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
          <p className="note">{shown.climbRateDefinition}</p>
        </>
      ) : null}
    </section>
  );
}
