import { ROUNDED_PITOT_LIP_SOURCE } from '../../engine/propulsion';
import type { Project } from '../../engine/project';
import { formatQuantity } from '../../engine/units';
import { DEFAULT_CAUTION_SETTINGS } from '../../engine/cautions';
import { formatField } from '../state/fieldUnits';
import { inletSeries } from '../charts/inletSeries';
import { ChoiceField } from '../components/ChoiceField';
import { IssueList } from '../components/IssueList';
import { LineChartPanel, type ChartSize } from '../components/LineChartPanel';
import { QuantityField } from '../components/QuantityField';
import { UncertaintyRows } from '../components/UncertaintyRows';
import { RowTableEditor } from '../components/RowTableEditor';
import { StaleMark } from '../components/StaleMark';
import { selectIssuesUnder } from '../state/selectors';
import { useStudy } from '../state/studyContext';
import type { LiveStudy } from '../worker/useEngine';

type LipKind = 'roundedPitot' | 'constant' | 'table';

/** The lip suction an inlet flies: the project's kind, as the engine reads it (engine/project/projectSpecs.ts lipSuctionOf). */
export function lipSuctionKind(inlet: Project['inlets'][number]): LipKind {
  if (inlet.lipSuction?.kind === 'table') return 'table';
  if (inlet.lipSuction?.kind === 'roundedPitot' || inlet.lipSuctionFactor === undefined) return 'roundedPitot';
  return 'constant';
}

/** Lip suction: the rounded-pitot table default (its source named), a constant, or the project's own table (not editable here). */
function LipSuctionField(props: { readonly inlet: Project['inlets'][number]; readonly n: number }) {
  const { dispatch } = useStudy();
  const { inlet, n } = props;
  const kind = lipSuctionKind(inlet);
  const path = ['inlets', n] as const;
  const choose = (k: LipKind) => {
    const { lipSuction: _ls, lipSuctionFactor, ...rest } = inlet;
    void _ls;
    const value = k === 'constant' ? { ...rest, lipSuctionFactor: lipSuctionFactor ?? 0 } : { ...rest, lipSuction: { kind: 'roundedPitot' as const } };
    dispatch({ type: 'valueSet', path, value, label: `Lip suction of ${inlet.name}: ${k === 'constant' ? 'constant' : 'rounded-pitot table'}` });
  };
  return (
    <>
      <ChoiceField<LipKind>
        label="Lip suction"
        testId={`field-inlet-${n}-lip-kind`}
        value={kind}
        choices={[
          { value: 'roundedPitot', label: 'table over mass-flow ratio and Mach: rounded subsonic pitot lip (default)' },
          { value: 'constant', label: 'a constant share of the additive drag' },
          { value: 'table', label: "the project's own table", ...(kind === 'table' ? {} : { unavailable: 'give a table in the project file (inlets[].lipSuction, docs/installation.md); it is not typed in here' }) },
        ]}
        onChoose={choose}
      />
      {kind === 'roundedPitot' ? <p className="small" data-testid={`field-inlet-${n}-lip-source`}>Source: {ROUNDED_PITOT_LIP_SOURCE}</p> : null}
      {kind === 'constant' ? <QuantityField label="Lip suction factor" path={[...path, 'lipSuctionFactor']} unit="dimensionless" testId={`field-inlet-${n}-lip-suction`} /> : null}
    </>
  );
}

/** The inlet designs' inputs, which one is flown, and recovery, spillage, throat and fan-face Mach against Mach. */
export function InletsView(props: { readonly live: LiveStudy; readonly chartSize?: ChartSize }) {
  const { state, dispatch } = useStudy();
  const project = state.doc!.present;
  const snapshot = props.live.snapshot;
  const series = snapshot && snapshot.inlets.length > 0 ? inletSeries(snapshot.inlets, state.units) : null;
  const size = props.chartSize ? { size: props.chartSize } : {};
  return (
    <section>
      <h2>Inlet designs</h2>
      <IssueList issues={selectIssuesUnder(state, 'inlets')} testId="project-issues" title="Rules the inlet designs break" />
      <ChoiceField
        label="Inlet flown in the mission"
        testId="active-inlet"
        value={project.activeInlet}
        choices={project.inlets.map((i) => ({ value: i.name, label: i.name }))}
        onChoose={(name) => dispatch({ type: 'valueSet', path: ['activeInlet'], value: name, label: `Fly inlet ${name}` })}
      />
      <QuantityField label="Spillage-share caution: spillage drag above this share of thrust" path={['cautions', 'maxSpillageShare']} unit="percent" testId="field-spillage-share" hint={`(blank: ${formatField(DEFAULT_CAUTION_SETTINGS.maxSpillageShare, 'percent', state.units)})`} optional />
      <div className="field-grid">
        {project.inlets.map((inlet, n) => {
          const base = ['inlets', n] as const;
          const id = (f: string) => `field-inlet-${n}-${f}`;
          return (
            <fieldset key={n} data-testid={`inlet-${n}`} className={inlet.name === project.activeInlet ? 'active-design' : undefined}>
              <legend>
                {inlet.name}
                {inlet.name === project.activeInlet ? ' (flown)' : ''}
              </legend>
              {inlet.description ? <p className="small">{inlet.description}</p> : null}
              <QuantityField label="Capture area" path={[...base, 'source', 'captureArea']} unit="area" testId={id('capture')} />
              {inlet.source.kind === 'geometry' ? (
                <>
                  <QuantityField label="Throat area" path={[...base, 'source', 'throatArea']} unit="area" testId={id('throat')} />
                  <QuantityField label="Fan-face area" path={[...base, 'source', 'fanFaceArea']} unit="area" testId={id('fan-face')} />
                  <QuantityField label="Diffuser loss coefficient" path={[...base, 'source', 'diffuserLossCoefficient']} unit="dimensionless" testId={id('diffuser-loss')} />
                </>
              ) : (
                <RowTableEditor
                  title="Recovery against Mach"
                  path={[...base, 'source', 'rows']}
                  prefix={`inlet-${n}-recovery`}
                  columns={[
                    { key: 'mach', label: 'Mach', unit: 'dimensionless', idPart: 'mach' },
                    { key: 'recovery', label: 'Recovery', unit: 'dimensionless', idPart: '' },
                  ]}
                />
              )}
              <LipSuctionField inlet={inlet} n={n} />
              <QuantityField label="External drag area D/q per engine" path={[...base, 'externalDragArea']} unit="area" testId={id('external-drag')} />
              <QuantityField label="Weight per engine" path={[...base, 'weight']} unit="mass" testId={id('weight')} />
              <UncertaintyRows kinds={inlet.source.kind === 'recoveryTable' ? ['recovery', 'lipSuction'] : ['lipSuction']} inlet={inlet.name} testId={id('uncertain')} />
            </fieldset>
          );
        })}
      </div>
      <StaleMark stale={props.live.stale} running={props.live.running} />
      {series ? (
        <>
          <p className="small">
            At {formatQuantity(snapshot!.inlets[0]!.altitude_m, 'altitude', state.units)} (first cruise altitude), maxCruise rating, ISA.
          </p>
          <div className="chart-row">
            <LineChartPanel title="Total-pressure recovery against Mach" testId="chart-recovery" data={series.recovery} xKey="mach" xLabel="Mach" yLabel="recovery pt2/pt0" series={series.recoverySeries} dashed={(k) => k === 'ref'} {...size} />
            <LineChartPanel title="Spillage drag per engine against Mach" testId="chart-spillage" data={series.spillage} xKey="mach" xLabel="Mach" yLabel={`spillage drag (${series.spillageUnit})`} series={series.spillageSeries} {...size} />
            {series.hasInternalMach ? (
              <LineChartPanel title="Throat and fan-face Mach against flight Mach" testId="chart-inlet-mach" data={series.internalMach} xKey="mach" xLabel="flight Mach" yLabel="internal Mach" series={series.machSeries} dashed={(k) => k.startsWith('f')} {...size} />
            ) : (
              <p className="small" data-testid="inlet-mach-none">
                Throat and fan-face Mach come from inlet geometry (capture, throat and fan-face areas); these designs are given as recovery tables.
              </p>
            )}
          </div>
        </>
      ) : null}
    </section>
  );
}
