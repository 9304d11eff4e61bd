import { useEffect, useMemo, useState } from 'react';
import type { CycleSpec, CycleThrottle, LimitValue } from '../../engine/cycle';
import { RATING_LABEL, RATING_NAMES, type RatingName } from '../../engine/propulsion';
import type { Project } from '../../engine/project';
import { formatQuantity, type UnitSystem, FOOT_M } from '../../engine/units';
import { cycleSeries } from '../charts/cycleSeries';
import { ChoiceField } from '../components/ChoiceField';
import { FailureNotice } from '../components/IssueList';
import { JobProgress } from '../components/JobProgress';
import { ThrustLapseChart, TsfcLapseChart } from '../components/LapseCharts';
import type { ChartSize } from '../components/LineChartPanel';
import { LocalQuantityField } from '../components/LocalQuantityField';
import { formatField, type FieldUnit } from '../state/fieldUnits';
import type { DeckFile } from '../state/studyState';
import type { CycleViewQuery, CyclePointView } from '../worker/engineProtocol';
import { useEngineJob } from '../worker/useEngine';

const FT = FOOT_M;

/** A value in the display units ("—" when there is none; never NaN). */
function show(value: number | null | undefined, unit: FieldUnit, units: UnitSystem): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  return formatField(value, unit, units);
}

function fraction(value: number | null | undefined): string {
  return value === null || value === undefined || !Number.isFinite(value) ? '—' : `${(value * 100).toFixed(1)} % of design`;
}

const LIMIT_UNIT: Readonly<Record<string, FieldUnit | 'fraction'>> = {
  turbineInletTemperature: 'temperature',
  fanSpeed: 'fraction',
  fanCorrectedSpeed: 'fraction',
  coreSpeed: 'fraction',
  compressorExitPressure: 'pressure',
  compressorExitTemperature: 'temperature',
};

const LIMIT_LABEL: Readonly<Record<string, string>> = {
  turbineInletTemperature: 'turbine inlet temperature',
  fanSpeed: 'fan speed',
  fanCorrectedSpeed: 'corrected fan speed',
  coreSpeed: 'core speed',
  compressorExitPressure: 'compressor exit pressure',
  compressorExitTemperature: 'compressor exit temperature',
};

function limitText(name: string, value: LimitValue, units: UnitSystem): string {
  const unit = LIMIT_UNIT[name] ?? 'dimensionless';
  const one = (v: number) => (unit === 'fraction' ? fraction(v) : show(v, unit, units));
  if (typeof value === 'number') return one(value);
  return value.byAmbientTemperature.map(([t, v]) => `${one(v)} at ambient ${show(t, 'temperature', units)}`).join(', then ');
}

function limitsText(limits: Readonly<Record<string, LimitValue | undefined>>, units: UnitSystem): string {
  const parts = Object.entries(limits)
    .filter((e): e is [string, LimitValue] => e[1] !== undefined)
    .map(([n, v]) => `${LIMIT_LABEL[n] ?? n} ≤ ${limitText(n, v, units)}`);
  return parts.length ? parts.join('; ') : 'none';
}

function CycleInputs(props: { readonly spec: CycleSpec; readonly units: UnitSystem }) {
  const { spec, units: u } = props;
  const d = spec.design;
  const c = spec.components;
  const rows: [string, string][] = [
    ['Design altitude', show(d.altitude_m, 'altitude', u)],
    ['Design Mach', String(d.mach)],
    ['Design ISA deviation', show(d.isaDeviation_K, 'temperatureDelta', u)],
    ['Bypass ratio', String(d.bypassRatio)],
    ['Fan pressure ratio', String(d.fanPressureRatio)],
    ['Overall pressure ratio', String(d.overallPressureRatio)],
    ['Turbine inlet temperature', show(d.turbineInletTemperature_K, 'temperature', u)],
    ['Design inlet recovery', String(d.inletRecovery)],
    ['Design size', d.size.kind === 'airflow' ? `airflow ${show(d.size.airflow_kg_s, 'massFlow', u)}` : `net thrust ${show(d.size.thrust_N, 'force', u)}`],
    ['Fan polytropic efficiency', String(c.fanPolytropicEfficiency)],
    ['Compressor polytropic efficiency', String(c.compressorPolytropicEfficiency)],
    ['HP turbine polytropic efficiency', String(c.hpTurbinePolytropicEfficiency)],
    ['LP turbine polytropic efficiency', String(c.lpTurbinePolytropicEfficiency)],
    ['Burner efficiency', String(c.burnerEfficiency)],
    ['Burner pressure ratio', String(c.burnerPressureRatio)],
    ['Hard limits', limitsText(spec.limits, u)],
  ];
  for (const r of RATING_NAMES) {
    const rating = spec.ratings[r];
    if (rating === undefined) continue;
    rows.push([
      `Rating: ${RATING_LABEL[r]}`,
      rating.kind === 'limits' ? limitsText(rating.limits, u) : `${rating.kind === 'fanSpeed' ? 'fan speed' : 'corrected fan speed'} ${fraction(rating.fraction)}`,
    ]);
  }
  return (
    <dl className="deck-summary" data-testid="cycle-inputs">
      {rows.map(([k, v]) => (
        <div key={k}>
          <dt>{k}</dt>
          <dd>{v}</dd>
        </div>
      ))}
    </dl>
  );
}

function PointFigures(props: { readonly point: CyclePointView; readonly units: UnitSystem }) {
  const { point: p, units: u } = props;
  if (p.status !== 'converged') {
    return (
      <p role="alert" className="issues" data-testid="cycle-point-status">
        The point did not match: {p.status.replace(/_/g, ' ')} — {p.message}
        {p.residual !== null && Number.isFinite(p.residual) ? ` (largest scaled residual ${p.residual.toExponential(2)})` : ''}
      </p>
    );
  }
  return (
    <>
      <dl className="deck-summary" data-testid="cycle-point-figures">
        <dt>Status</dt>
        <dd data-testid="cycle-point-status">converged (residual {p.residual === null ? '—' : p.residual.toExponential(2)})</dd>
        <dt>Net thrust, one engine</dt>
        <dd data-testid="cycle-thrust">{show(p.thrust_N, 'force', u)}</dd>
        <dt>Fuel flow</dt>
        <dd data-testid="cycle-fuel-flow">{show(p.fuelFlow_kg_s, 'fuelFlow', u)}</dd>
        <dt>TSFC</dt>
        <dd>{p.tsfc_kg_N_s === null ? '—' : formatQuantity(p.tsfc_kg_N_s, 'tsfc', u)}</dd>
        <dt>Airflow</dt>
        <dd data-testid="cycle-airflow">{show(p.airflow_kg_s, 'massFlow', u)}</dd>
        <dt>Fan speed</dt>
        <dd>{fraction(p.fanSpeed)}</dd>
        <dt>Corrected fan speed</dt>
        <dd>{fraction(p.fanCorrectedSpeed)}</dd>
        <dt>Turbine inlet temperature</dt>
        <dd data-testid="cycle-tit">{show(p.turbineInletTemperature_K, 'temperature', u)}</dd>
        <dt>Active limit</dt>
        <dd data-testid="cycle-active-limit">{p.activeLimit === null ? 'none (fixed setting)' : (LIMIT_LABEL[p.activeLimit] ?? p.activeLimit)}</dd>
        {p.exceededLimits.length > 0 ? (
          <>
            <dt>Limits exceeded</dt>
            <dd data-testid="cycle-exceeded">{p.exceededLimits.map((l) => LIMIT_LABEL[l] ?? l).join(', ')}</dd>
          </>
        ) : null}
      </dl>
      {p.cautions.length > 0 ? (
        <ul className="cautions" data-testid="cycle-point-cautions">
          {p.cautions.map((c) => (
            <li key={c.code}>{c.message}</li>
          ))}
        </ul>
      ) : null}
      <table data-testid="cycle-stations">
        <thead>
          <tr>
            <th>Station</th>
            <th>Name</th>
            <th>Total temperature</th>
            <th>Total pressure</th>
            <th>Mass flow</th>
          </tr>
        </thead>
        <tbody>
          {p.stations.map((s) => (
            <tr key={s.station} data-testid={`cycle-station-${s.station}`}>
              <td>{s.station}</td>
              <td>{s.name}</td>
              <td>{show(s.totalTemperature_K, 'temperature', u)}</td>
              <td>{show(s.totalPressure_Pa, 'pressure', u)}</td>
              <td>{show(s.massFlow_kg_s, 'massFlow', u)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </>
  );
}

type ThrottleChoice = RatingName | 'fanSpeed';

/**
 * The engine view of a cycle: its inputs (read-only: the cycle file is the
 * source), one point with its station table and figures, and net thrust and
 * TSFC against Mach for a rating and a fixed fan speed, uninstalled and, with
 * a project, installed with its active inlet. Runs as a worker job.
 */
export function CycleEnginePanel(props: { readonly project: Project | null; readonly cycleFile: DeckFile; readonly units: UnitSystem; readonly chartSize?: ChartSize }) {
  const u = props.units;
  const job = useEngineJob<'cycleView'>();
  const [altitude_m, setAltitude] = useState(30000 * FT);
  const [mach, setMach] = useState(0.78);
  const [isaDev_K, setIsaDev] = useState(0);
  const [throttleChoice, setThrottleChoice] = useState<ThrottleChoice>('maxCruise');
  const [pointFan, setPointFan] = useState(0.9);
  const [curveRating, setCurveRating] = useState<RatingName>('maxCruise');
  const [curveFan, setCurveFan] = useState(0.9);
  const query = useMemo<CycleViewQuery>(() => {
    const throttle: CycleThrottle = throttleChoice === 'fanSpeed' ? { kind: 'fanSpeed', fraction: pointFan } : { kind: 'rating', rating: throttleChoice };
    return { point: { altitude_m, mach, isaDev_K, throttle }, curveRating, curveFanSpeed: curveFan };
  }, [altitude_m, mach, isaDev_K, throttleChoice, pointFan, curveRating, curveFan]);
  const { start } = job;
  useEffect(() => {
    start({ kind: 'cycleView', project: props.project, deckFile: props.cycleFile, query });
  }, [start, props.project, props.cycleFile, query]);
  const value = job.state.status === 'done' ? job.state.value : job.lastValue;
  const ratings = value ? RATING_NAMES.filter((r) => value.spec.ratings[r] !== undefined) : RATING_NAMES;
  const size = props.chartSize ? { size: props.chartSize } : {};
  const rating = value ? cycleSeries(value.ratingCurves, curveRating, u) : null;
  const fan = value ? cycleSeries(value.fanSpeedCurves, curveRating, u) : null;
  const installedText = value?.inletName ? ` and installed with ${value.inletName} (solid)` : ' (no project installation: uninstalled only)';
  return (
    <section data-testid="cycle-engine">
      <h3>Engine cycle{value ? `: ${value.title}` : ''}</h3>
      <JobProgress state={job.state} onCancel={job.cancel} testId="cycle-progress" steps="Mach lines" />
      {job.state.status === 'failed' ? <FailureNotice failure={job.state.failure} testId="cycle-failure" /> : null}
      {value ? <CycleInputs spec={value.spec} units={u} /> : null}
      <fieldset>
        <legend>Point</legend>
        <LocalQuantityField label="Altitude" value_si={altitude_m} unit="altitude" units={u} testId="cycle-altitude" onValue={setAltitude} />
        <LocalQuantityField label="Mach" value_si={mach} unit="dimensionless" units={u} testId="cycle-mach" onValue={setMach} />
        <LocalQuantityField label="ISA deviation" value_si={isaDev_K} unit="temperatureDelta" units={u} testId="cycle-isa" onValue={setIsaDev} />
        <ChoiceField
          label="Throttle"
          testId="cycle-throttle"
          value={throttleChoice}
          choices={[...ratings.map((r) => ({ value: r as ThrottleChoice, label: RATING_LABEL[r] })), { value: 'fanSpeed' as ThrottleChoice, label: 'fixed fan speed' }]}
          onChoose={setThrottleChoice}
        />
        {throttleChoice === 'fanSpeed' ? (
          <LocalQuantityField label="Fan speed, fraction of design" value_si={pointFan} unit="dimensionless" units={u} testId="cycle-point-fan" onValue={setPointFan} />
        ) : null}
      </fieldset>
      {value ? <PointFigures point={value.point} units={u} /> : null}
      <fieldset>
        <legend>Curves</legend>
        <ChoiceField label="Rating plotted" testId="cycle-curve-rating" value={curveRating} choices={ratings.map((r) => ({ value: r, label: RATING_LABEL[r] }))} onChoose={setCurveRating} />
        <LocalQuantityField label="Fixed fan speed plotted, fraction of design" value_si={curveFan} unit="dimensionless" units={u} testId="cycle-curve-fan" onValue={setCurveFan} />
      </fieldset>
      {rating && fan && value ? (
        <>
          <div className="chart-row">
            <ThrustLapseChart title={`Net thrust at ${RATING_LABEL[curveRating]}, one engine, ISA: uninstalled (dashed)${installedText}`} testId="chart-cycle-thrust-rating" lapse={rating} {...size} />
            <TsfcLapseChart title={`TSFC at ${RATING_LABEL[curveRating]}: uninstalled (dashed)${installedText}`} testId="chart-cycle-tsfc-rating" lapse={rating} {...size} />
          </div>
          <div className="chart-row">
            <ThrustLapseChart title={`Net thrust at ${value.fanSpeedCurves.label} of design, one engine, ISA: uninstalled (dashed)${installedText}`} testId="chart-cycle-thrust-fan" lapse={fan} {...size} />
            <TsfcLapseChart title={`TSFC at ${value.fanSpeedCurves.label} of design: uninstalled (dashed)${installedText}`} testId="chart-cycle-tsfc-fan" lapse={fan} {...size} />
          </div>
        </>
      ) : null}
    </section>
  );
}
