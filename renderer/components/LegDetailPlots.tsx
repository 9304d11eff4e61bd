/**
 * Detail plots of one leg or the whole trip against time: thrust used and
 * available and drag (all engines, installed), fuel flow, Mach and CAS. Legs
 * are numbered as the legs table numbers them (from 1).
 */
import { useMemo, useState } from 'react';
import type { MissionResult } from '../../engine/mission';
import { displayUnit, type UnitSystem } from '../../engine/units';
import { legDetailSeries } from '../charts/legDetailSeries';
import { ChoiceField } from './ChoiceField';
import { LineChartPanel, type ChartSize } from './LineChartPanel';

const WHOLE_TRIP = 'trip';

export function LegDetailPlots(props: { readonly mission: MissionResult; readonly units: UnitSystem; readonly chartSize?: ChartSize }) {
  const { mission: m, units: u } = props;
  const flown = useMemo(() => new Set(Array.from(m.history.legIndex)), [m]);
  const legs = m.legs.filter((l) => l.kind !== 'reserve' && flown.has(l.index));
  const [chosen, setChosen] = useState<string>(WHOLE_TRIP);
  // A leg that is no longer flown (an edit removed it) falls back to the whole trip.
  const legIndex = chosen === WHOLE_TRIP || !legs.some((l) => String(l.index) === chosen) ? null : Number(chosen);
  const detail = useMemo(() => legDetailSeries(m.history, m.legs, legIndex, u), [m, legIndex, u]);
  const choices = [{ value: WHOLE_TRIP, label: 'Whole trip' }, ...legs.map((l) => ({ value: String(l.index), label: `${l.index + 1}. ${l.name}` }))];
  const size = props.chartSize ? { size: props.chartSize } : {};
  const time = `time (${displayUnit('time', u)})`;
  const marks = detail === null ? [] : detail.legStarts.map((s) => ({ x: s.time, label: `leg ${s.label}` }));
  return (
    <div className="leg-detail" data-testid="leg-detail">
      <h3>Leg detail against time</h3>
      <ChoiceField label="Show" testId="leg-detail-choice" value={legIndex === null ? WHOLE_TRIP : String(legIndex)} choices={choices} onChoose={setChosen} />
      {detail === null ? (
        <p data-testid="leg-detail-empty">No time history for this selection.</p>
      ) : (
        <div className="chart-row">
          <LineChartPanel
            title="Thrust and drag, all engines"
            testId="chart-leg-forces"
            data={detail.rows}
            xKey="time"
            xLabel={time}
            yLabel={`force (${displayUnit('force', u)})`}
            series={[
              { key: 'thrustUsed', name: 'thrust used' },
              { key: 'thrustAvailable', name: 'thrust available at the rating' },
              { key: 'drag', name: 'drag' },
            ]}
            verticalMarks={marks}
            {...size}
          />
          <LineChartPanel
            title="Fuel flow, all engines"
            testId="chart-leg-fuel-flow"
            data={detail.rows}
            xKey="time"
            xLabel={time}
            yLabel={`fuel flow (${displayUnit('fuelFlow', u)})`}
            series={[{ key: 'fuelFlow', name: 'fuel flow' }]}
            verticalMarks={marks}
            {...size}
          />
          <LineChartPanel
            title="Mach and calibrated airspeed"
            testId="chart-leg-speeds"
            data={detail.rows}
            xKey="time"
            xLabel={time}
            yLabel="Mach"
            series={[
              { key: 'mach', name: 'Mach' },
              { key: 'cas', name: 'CAS' },
            ]}
            secondAxisKeys={['cas']}
            secondAxisLabel={`CAS (${displayUnit('speed', u)})`}
            verticalMarks={marks}
            {...size}
          />
        </div>
      )}
    </div>
  );
}
