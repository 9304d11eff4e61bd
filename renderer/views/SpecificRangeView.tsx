import { useMemo } from 'react';
import type { OptimumAltitudeResult } from '../../engine/analysis';
import { specificRangeSeries } from '../charts/specificRangeSeries';
import { FailureNotice } from '../components/IssueList';
import { LineChartPanel, type ChartSize } from '../components/LineChartPanel';
import { LocalQuantityField } from '../components/LocalQuantityField';
import { machText } from '../state/displayText';
import { useStudy } from '../state/studyContext';
import { formatQuantity, FOOT_M } from '../../engine/units';
import type { SpecificRangeRequestQuery } from '../worker/engineProtocol';
import { usePersistentValue } from '../worker/jobStore';
import { useLiveAnalysis, type LiveStudy } from '../worker/useEngine';

const FT = FOOT_M;
/** The altitudes of the curves: 25,000 to 41,000 ft every 4,000 ft (flight levels of jet cruise, common practice). */
const ALTITUDES_M = [25000, 29000, 33000, 37000, 41000].map((ft) => ft * FT);

const BINDING_TEXT: Readonly<Record<OptimumAltitudeResult['binding'], string>> = {
  specificRange: 'the best specific range itself (no limit binds)',
  cruiseCeiling: 'the cruise ceiling (residual climb rate)',
  buffetMargin: 'the buffet margin',
};

/** Specific range against Mach at several altitudes at one mass, with the maximum- and long-range Machs, and the optimum altitude. */
export function SpecificRangeView(props: { readonly live: LiveStudy; readonly chartSize?: ChartSize }) {
  const { state } = useStudy();
  const project = state.doc!.present;
  const [mass_kg, setMass] = usePersistentValue('specificRange.mass_kg', 0.9 * project.airframe.weights.maxTakeoff);
  const query = useMemo<SpecificRangeRequestQuery>(() => ({ mass_kg, isaDev_K: project.mission.isaDeviation, altitudes_m: ALTITUDES_M }), [mass_kg, project.mission.isaDeviation]);
  const job = useLiveAnalysis('specificRange', { project, deckFile: state.deckFile }, query);
  const u = state.units;
  const s = job.state;
  const shown = s.status === 'failed' ? null : job.lastValue;
  const plot = shown ? specificRangeSeries(shown, u) : null;
  const o = shown?.optimum ?? null;
  return (
    <section>
      <h2>Specific range</h2>
      <div className="field-grid">
        <LocalQuantityField label="Aircraft mass" value_si={mass_kg} unit="mass" units={u} testId="field-sr-mass" onValue={setMass} />
      </div>
      {s.status === 'failed' ? <FailureNotice failure={s.failure} testId="sr-failure" /> : null}
      {s.status === 'running' ? (
        <p role="status" data-testid="sr-progress">
          Computing… {s.total > 0 ? `${s.done} of ${s.total}` : ''}{' '}
          <button type="button" onClick={job.cancel}>
            Cancel
          </button>
        </p>
      ) : null}
      {plot && shown ? (
        <>
          <p data-testid="sr-optimum">
            {o === null
              ? `No optimum altitude: ${shown.optimumError ?? ''}`
              : `Optimum altitude ${formatQuantity(o.altitude_m, 'altitude', u)} at M ${machText(o.maxRangeMach)}, ${formatQuantity(o.specificRange_m_kg, 'specificRange', u)}, set by ${BINDING_TEXT[o.binding]}.`}
          </p>
          <LineChartPanel
            title={`Specific range against Mach at ${formatQuantity(shown.mass_kg, 'mass', u)}`}
            testId="chart-specific-range"
            data={plot.rows}
            xKey="mach"
            xLabel="Mach"
            yLabel={`specific range (${plot.unit})`}
            series={plot.series}
            // each altitude has its own Mach samples: rows are merged by Mach, so a curve joins across the others' rows
            pathsInDataOrder
            points={plot.markers.map((m) => ({ x: m.mach, y: m.specificRange, label: `${m.what} ${m.altitude_m}` }))}
            {...(props.chartSize ? { size: props.chartSize } : {})}
          />
          <table data-testid="sr-table">
            <thead>
              <tr>
                <th>Pressure altitude</th>
                <th>Maximum-range Mach</th>
                <th>Best specific range</th>
                <th>Long-range Mach (99 %)</th>
                <th>Specific range there</th>
              </tr>
            </thead>
            <tbody>
              {shown.curves.map((c) => (
                <tr key={c.altitude_m}>
                  <td>{formatQuantity(c.altitude_m, 'altitude', u)}</td>
                  {c.ok ? (
                    <>
                      <td>{machText(c.result.maxRangeMach)}</td>
                      <td>{formatQuantity(c.result.maxSpecificRange_m_kg, 'specificRange', u)}</td>
                      <td>{machText(c.result.longRangeMach)}</td>
                      <td>{c.result.longRangeSpecificRange_m_kg === null ? '— (beyond the level-flight band)' : formatQuantity(c.result.longRangeSpecificRange_m_kg, 'specificRange', u)}</td>
                    </>
                  ) : (
                    <td colSpan={4}>{c.code === 'no_solution' ? 'No level flight at this mass and altitude: above the ceiling, or thrust cannot equal drag inside the limits.' : 'Not computed: the analysis stopped at this altitude.'}</td>
                  )}
                </tr>
              ))}
            </tbody>
          </table>
        </>
      ) : null}
    </section>
  );
}
