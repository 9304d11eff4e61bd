import { polarSeries } from '../charts/polarSeries';
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

const W = ['airframe', 'weights'] as const;

/** Weights, geometry, speed limits and the drag polar with its plot. */
export function AirframeView(props: { readonly live: LiveStudy; readonly chartSize?: ChartSize }) {
  const { state, dispatch } = useStudy();
  const project = state.doc!.present;
  const polar = project.polar;
  const issues = [...selectIssuesUnder(state, 'airframe'), ...selectIssuesUnder(state, 'polar')];
  const snapshot = props.live.snapshot;
  const plot = snapshot ? polarSeries(snapshot.polar) : null;
  return (
    <section>
      <h2>Airframe and drag polar</h2>
      <IssueList issues={issues} testId="project-issues" title="Rules the airframe breaks" />
      <div className="field-grid">
        <fieldset>
          <legend>Weights</legend>
          <QuantityField label="Operating empty (without inlets)" path={[...W, 'operatingEmpty']} unit="mass" testId="field-oew" />
          <QuantityField label="Maximum zero fuel" path={[...W, 'maxZeroFuel']} unit="mass" testId="field-mzfw" />
          <QuantityField label="Maximum take-off" path={[...W, 'maxTakeoff']} unit="mass" testId="field-mtow" />
          <QuantityField label="Maximum landing" path={[...W, 'maxLanding']} unit="mass" testId="field-mlw" />
          <QuantityField label="Fuel capacity" path={[...W, 'maxFuel']} unit="mass" testId="field-max-fuel" />
          <UncertaintyRows kinds={['oew']} testId="uncertain-weights" />
        </fieldset>
        <fieldset>
          <legend>Geometry and limits</legend>
          <QuantityField label="Wing reference area" path={['airframe', 'wingArea']} unit="area" testId="field-wing-area" />
          <QuantityField label="VMO (CAS)" path={['airframe', 'vmo']} unit="speed" testId="field-vmo" />
          <QuantityField label="MMO" path={['airframe', 'mmo']} unit="dimensionless" testId="field-mmo" />
        </fieldset>
        <fieldset>
          <legend>Lift-dependent drag</legend>
          <ChoiceField
            label="Induced-drag factor K from"
            testId="induced-kind"
            value={polar.induced.kind}
            choices={[
              { value: 'oswald', label: 'aspect ratio and Oswald efficiency' },
              { value: 'table', label: 'a table of K against Mach' },
            ]}
            onChoose={(kind) =>
              dispatch({
                type: 'valueSet',
                path: ['polar', 'induced'],
                label: 'Change induced-drag model',
                value: kind === 'oswald' ? { kind: 'oswald', aspectRatio: 9, oswaldEfficiency: 0.8 } : { kind: 'table', rows: [{ mach: 0, k: 0.0442 }] },
              })
            }
          />
          {polar.induced.kind === 'oswald' ? (
            <>
              <QuantityField label="Aspect ratio" path={['polar', 'induced', 'aspectRatio']} unit="dimensionless" testId="field-aspect-ratio" />
              <QuantityField label="Oswald efficiency" path={['polar', 'induced', 'oswaldEfficiency']} unit="dimensionless" testId="field-oswald" />
            </>
          ) : (
            <RowTableEditor
              title="K against Mach"
              path={['polar', 'induced', 'rows']}
              prefix="k"
              columns={[
                { key: 'mach', label: 'Mach', unit: 'dimensionless', idPart: 'mach' },
                { key: 'k', label: 'K', unit: 'dimensionless', idPart: '' },
              ]}
            />
          )}
          <QuantityField label="CL of minimum drag (CLmd)" path={['polar', 'clMinDrag']} unit="dimensionless" testId="field-cl-min-drag" />
          <QuantityField label="Parasite increment dCD0" path={['polar', 'cdIncrement']} unit="dimensionless" testId="field-cd-increment" />
          <UncertaintyRows kinds={['cd0', 'k']} testId="uncertain-polar" />
        </fieldset>
        <fieldset>
          <legend>Compressibility drag</legend>
          <ChoiceField
            label="Wave drag"
            testId="compressibility-kind"
            value={polar.compressibility.kind}
            choices={[
              { value: 'none', label: 'none' },
              { value: 'korn', label: 'Korn equation with Lock rise' },
              { value: 'table', label: 'table (edit in the project file)' },
            ]}
            onChoose={(kind) => {
              if (kind === 'table') return;
              dispatch({
                type: 'valueSet',
                path: ['polar', 'compressibility'],
                label: 'Change wave-drag model',
                value: kind === 'none' ? { kind: 'none' } : { kind: 'korn', sweep: (27 * Math.PI) / 180, thicknessRatio: 0.11, kornTechnologyFactor: 0.95 },
              });
            }}
          />
          {polar.compressibility.kind === 'korn' ? (
            <>
              <QuantityField label="Sweep (quarter chord)" path={['polar', 'compressibility', 'sweep']} unit="angle" testId="field-sweep" />
              <QuantityField label="Thickness ratio t/c" path={['polar', 'compressibility', 'thicknessRatio']} unit="dimensionless" testId="field-thickness" />
              <QuantityField label="Korn technology factor" path={['polar', 'compressibility', 'kornTechnologyFactor']} unit="dimensionless" testId="field-korn-factor" />
            </>
          ) : null}
          {polar.compressibility.kind === 'table' ? (
            <p>
              Wave-drag table of {polar.compressibility.mach.length} Mach by {polar.compressibility.cl.length} CL values.
            </p>
          ) : null}
        </fieldset>
      </div>
      <div className="field-grid">
        <RowTableEditor
          title="CD0 against Mach"
          path={['polar', 'cd0']}
          prefix="cd0"
          columns={[
            { key: 'mach', label: 'Mach', unit: 'dimensionless', idPart: 'mach' },
            { key: 'cd0', label: 'CD0', unit: 'dimensionless', idPart: '' },
          ]}
        />
        <RowTableEditor
          title="Buffet-onset CL against Mach"
          path={['polar', 'buffetCl']}
          prefix="buffet"
          columns={[
            { key: 'mach', label: 'Mach', unit: 'dimensionless', idPart: 'mach' },
            { key: 'cl', label: 'CL', unit: 'dimensionless', idPart: '' },
          ]}
        />
        <RowTableEditor
          title="CLmax against Mach"
          path={['polar', 'clMax']}
          prefix="clmax"
          columns={[
            { key: 'mach', label: 'Mach', unit: 'dimensionless', idPart: 'mach' },
            { key: 'cl', label: 'CL', unit: 'dimensionless', idPart: '' },
          ]}
        />
      </div>
      <StaleMark stale={props.live.stale} running={props.live.running} />
      {plot ? (
        <LineChartPanel
          title={`Drag polar with the active inlet's external drag (${snapshot!.inletName})`}
          testId="chart-polar"
          data={plot.rows}
          xKey="cl"
          xLabel="CL"
          yLabel="CD"
          series={plot.series}
          {...(props.chartSize ? { size: props.chartSize } : {})}
        />
      ) : null}
    </section>
  );
}
