import { describeInstallationMethod } from '../../engine/propulsion';
import { SAFETY_NOTICE_LINES } from '../../engine/core';
import type { Project } from '../../engine/project';
import { displayUnit, formatQuantity, type UnitSystem } from '../../engine/units';
import { lapseSeries } from '../charts/lapseSeries';
import { polarSeries } from '../charts/polarSeries';
import { profileSeries } from '../charts/profileSeries';
import { CautionList } from '../components/CautionList';
import { HeadlineFigures } from '../components/HeadlineFigures';
import { LegsTable } from '../components/LegsTable';
import { ThrustLapseChart } from '../components/LapseCharts';
import { LineChartPanel } from '../components/LineChartPanel';
import { deckTitleText } from '../state/deckTitle';
import { missionStatusText, ratingLabel, solveModeLabel, statusLabel } from '../state/displayText';
import { LEG_KIND_LABEL } from '../state/legTemplates';
import { RESERVE_PRESET_LABEL } from '../state/reservePresets';
import type { StudySnapshot } from '../worker/engineProtocol';
import { ReportAnalyses } from './ReportAnalyses';

const REPORT_CHART = { width: 680, height: 240 };

/** When the report was printed, in the reader's local time: 2026-12-02 14:05. */
export function reportDateText(d: Date): string {
  const two = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${two(d.getMonth() + 1)}-${two(d.getDate())} ${two(d.getHours())}:${two(d.getMinutes())}`;
}

/**
 * The whole study as a printable report (mounted only to print; print.css
 * lays it out, with page numbers in the page margin): the project file and the
 * date, inputs, results with plots, the analyses run in this session, legs,
 * cautions and the notice at both ends.
 */
export function StudyReport(props: {
  readonly project: Project;
  readonly snapshot: StudySnapshot;
  readonly units: UnitSystem;
  readonly stale: boolean;
  readonly documentName: string;
  readonly printedAt: Date;
}) {
  const { project: p, snapshot: s, units: u } = props;
  const m = s.mission;
  const rows = profileSeries(m.history, u, 200);
  const w = p.airframe.weights;
  const polar = polarSeries(s.polar);
  const lapse = s.lapse.length > 0 ? lapseSeries(s.lapse[0]!, u) : null;
  return (
    <article className="print-report" data-testid="print-report" aria-hidden="true">
      <h1>{p.name}</h1>
      <p className="report-meta" data-testid="report-meta">
        Project file <span data-user-text>{props.documentName}</span>; printed {reportDateText(props.printedAt)}; units {u === 'si' ? 'SI' : 'customary (ft, kt, lb)'}.
      </p>
      <p className="report-notice" data-testid="report-notice">
        {SAFETY_NOTICE_LINES.join(' ')}
      </p>
      {props.stale ? <p className="stale-mark">The results below are from before the latest edit.</p> : null}
      <h2>Inputs</h2>
      <table className="report-inputs">
        <tbody>
          <tr>
            <td>Weights</td>
            <td>
              OEW {formatQuantity(w.operatingEmpty, 'mass', u)} (without inlets), MZFW {formatQuantity(w.maxZeroFuel, 'mass', u)}, MTOW {formatQuantity(w.maxTakeoff, 'mass', u)}, MLW{' '}
              {formatQuantity(w.maxLanding, 'mass', u)}, fuel capacity {formatQuantity(w.maxFuel, 'mass', u)}
            </td>
          </tr>
          <tr>
            <td>Wing, limits</td>
            <td>
              {formatQuantity(p.airframe.wingArea, 'area', u)}; VMO {formatQuantity(p.airframe.vmo, 'speed', u)}, MMO {p.airframe.mmo}
            </td>
          </tr>
          <tr>
            <td>Engine</td>
            <td>
              {p.engine.count} x {deckTitleText(s.deck.title, s.deck.parametric)}; reference recovery {s.deck.referenceRecovery}
            </td>
          </tr>
          <tr>
            <td>Installation method</td>
            <td data-testid="report-installation-method">{describeInstallationMethod(s.deck.installationMethod)}</td>
          </tr>
          <tr>
            <td>Inlet flown</td>
            <td>
              {s.inletName} (designs: {p.inlets.map((i) => i.name).join(', ')})
            </td>
          </tr>
          <tr>
            <td>Legs</td>
            <td>{p.mission.legs.map((l, k) => `${k + 1}. ${l.name ?? LEG_KIND_LABEL[l.kind]}`).join('; ')}</td>
          </tr>
          <tr>
            <td>Reserves</td>
            <td>{RESERVE_PRESET_LABEL[p.mission.reserves.preset]}</td>
          </tr>
          <tr>
            <td>Solve</td>
            <td>
              {solveModeLabel(p.mission.solve.mode)}, payload {formatQuantity(p.mission.solve.payload, 'mass', u)}
            </td>
          </tr>
        </tbody>
      </table>
      <h2>Results</h2>
      <p>Mission status: {statusLabel(m.status)}{m.status !== 'ok' ? ` — ${missionStatusText(m, u)}` : ''}</p>
      <HeadlineFigures result={m} units={u} idPrefix="report-headline" />
      <LineChartPanel title="Altitude against distance" testId="report-chart-altitude" data={rows} xKey="distance" xLabel={`distance (${displayUnit('distance', u)})`} yLabel={`altitude (${displayUnit('altitude', u)})`} series={[{ key: 'altitude', name: 'pressure altitude' }]} size={REPORT_CHART} />
      <LineChartPanel title="Mass against distance" testId="report-chart-mass" data={rows} xKey="distance" xLabel={`distance (${displayUnit('distance', u)})`} yLabel={`mass (${displayUnit('mass', u)})`} series={[{ key: 'mass', name: 'aircraft mass' }]} size={REPORT_CHART} />
      {polar ? <LineChartPanel title={`Drag polar with ${s.inletName}'s external drag`} testId="report-chart-polar" data={polar.rows} xKey="cl" xLabel="CL" yLabel="CD" series={polar.series} size={REPORT_CHART} /> : null}
      {lapse ? (
        <ThrustLapseChart
          title={`Thrust at ${ratingLabel(s.lapse[0]!.rating)}, all engines: uninstalled (dashed) and installed`}
          testId="report-chart-lapse"
          lapse={lapse}
          size={REPORT_CHART}
        />
      ) : null}
      <ReportAnalyses project={p} units={u} />
      <h2>Legs</h2>
      <LegsTable legs={m.legs} units={u} highlightLeg={null} testId="report-legs" />
      <h2>Cautions</h2>
      <CautionList cautions={m.cautions} units={u} testId="report-cautions" />
      <p className="report-notice report-notice-end">{SAFETY_NOTICE_LINES.join(' ')}</p>
    </article>
  );
}
