import { RecoveryMethodUncertainty } from '../components/RecoveryMethodUncertainty';
import { InstallationFields } from '../components/InstallationFields';
import { describeInstallationMethod, type RatingName } from '../../engine/propulsion';
import { useState } from 'react';
import { formatQuantity } from '../../engine/units';
import { ChoiceField } from '../components/ChoiceField';
import { lapseSeries } from '../charts/lapseSeries';
import { FailureNotice } from '../components/IssueList';
import { ThrustLapseChart, TsfcLapseChart } from '../components/LapseCharts';
import type { ChartSize } from '../components/LineChartPanel';
import { QuantityField } from '../components/QuantityField';
import { UncertaintyRows } from '../components/UncertaintyRows';
import { StaleMark } from '../components/StaleMark';
import type { ToolbarCommand } from '../components/Toolbar';
import { useStudy } from '../state/studyContext';
import { deckTitleText } from '../state/deckTitle';
import { savesDeckInside } from '../state/saveText';
import type { LiveStudy } from '../worker/useEngine';
import { CycleEnginePanel } from './CycleEnginePanel';

/** The deck (import, errors by line and column, grid summary), the installation, and thrust lapse and TSFC plots. */
export function EngineView(props: { readonly live: LiveStudy; readonly chartSize?: ChartSize; readonly onCommand?: (command: ToolbarCommand) => void; readonly hostKind?: 'desktop' | 'browser' }) {
  const { state, dispatch } = useStudy();
  const project = state.doc!.present;
  const deckSource = project.engine.deck;
  const { snapshot, failure } = props.live;
  const u = state.units;
  const deckErrors = failure?.kind === 'deck' ? failure.errors : [];
  const [rating, setRating] = useState<RatingName>('maxCruise');
  const curves = snapshot?.lapse.find((l) => l.rating === rating) ?? snapshot?.lapse[0] ?? null;
  const lapse = curves ? lapseSeries(curves, u) : null;
  const size = props.chartSize ? { size: props.chartSize } : {};
  return (
    <section>
      <h2>Engine deck and installation</h2>
      <p data-testid="engine-deck-source">
        Deck source: {deckSource.kind === 'file' ? `file ${deckSource.path}` : deckSource.kind === 'cycle' ? `generated from the cycle file ${deckSource.path}` : deckSource.kind === 'parametric' ? `parametric (${deckSource.title})` : 'embedded in the project'}
        {state.deckFile ? ` — loaded ${state.deckFile.name}` : ''}{' '}
        <button type="button" data-testid="engine-import-deck" onClick={() => props.onCommand?.('importDeck')}>
          Import deck file…
        </button>
      </p>
      {deckSource.kind === 'file' ? (
        <p>
          <label>
            <input
              type="checkbox"
              data-testid="engine-embed-deck"
              checked={savesDeckInside(state, props.hostKind ?? 'browser')}
              onChange={(e) => dispatch({ type: 'embedDeckChosen', embed: e.currentTarget.checked })}
            />{' '}
            Save the deck file inside the project
          </label>
        </p>
      ) : null}
      {deckErrors.length > 0 ? (
        <section className="issues" data-testid="deck-errors" role="alert">
          <h3>The deck file has {deckErrors.length} error{deckErrors.length === 1 ? '' : 's'}</h3>
          <table>
            <thead>
              <tr>
                <th>Line</th>
                <th>Column</th>
                <th>Problem</th>
              </tr>
            </thead>
            <tbody>
              {deckErrors.map((e, k) => (
                <tr key={k} data-testid={`deck-error-${k}`}>
                  <td>{e.line ?? '—'}</td>
                  <td>{e.column ?? '—'}</td>
                  <td>{e.message}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      ) : (
        <FailureNotice failure={failure} testId="engine-failure" />
      )}
      {snapshot ? (
        <dl className="deck-summary" data-testid="deck-summary">
          <dt>Title</dt>
          <dd>
            {deckTitleText(snapshot.deck.title, snapshot.deck.parametric)}
          </dd>
          <dt>Points</dt>
          <dd>{snapshot.deck.points}</dd>
          <dt>Altitudes</dt>
          <dd>
            {snapshot.deck.altitudeCount} from {formatQuantity(snapshot.deck.altitudes_m[0], 'altitude', u)} to {formatQuantity(snapshot.deck.altitudes_m[1], 'altitude', u)}
          </dd>
          <dt>Mach</dt>
          <dd>
            {snapshot.deck.machs[0]} to {snapshot.deck.machs[1]}
          </dd>
          <dt>Power setting</dt>
          <dd>
            {snapshot.deck.powers[0]} to {snapshot.deck.powers[1]}
          </dd>
          <dt>Ratings</dt>
          <dd>{snapshot.deck.ratings.map((r) => `${r.name} ${r.power}`).join(', ')}</dd>
          <dt>Reference recovery</dt>
          <dd>{snapshot.deck.referenceRecovery}</dd>
          <dt>Airflow column</dt>
          <dd>{snapshot.deck.hasAirflow ? 'yes' : 'no (spillage drag not computed)'}</dd>
          <dt>Installation method</dt>
          <dd data-testid="installation-method">{describeInstallationMethod(snapshot.deck.installationMethod)}</dd>
        </dl>
      ) : null}
      <div className="field-grid">
        <fieldset>
          <legend>Installation</legend>
          <QuantityField label="Engines" path={['engine', 'count']} unit="dimensionless" testId="field-engine-count" />
          {project.engine.installation.bleed.kind === 'coreFraction' ? (
            <QuantityField label="Customer bleed, fraction of core flow" path={['engine', 'installation', 'bleed', 'fraction']} unit="percent" testId="field-bleed" />
          ) : (
            <QuantityField label="Customer bleed" path={['engine', 'installation', 'bleed', 'massFlow']} unit="massFlow" testId="field-bleed" />
          )}
          <QuantityField label="Shaft power extraction per engine" path={['engine', 'installation', 'powerExtraction']} unit="power" testId="field-power-extraction" />
          <InstallationFields hasSensitivities={snapshot?.deck.hasSensitivities} />
          <UncertaintyRows kinds={['tsfc', 'cRam', 'cBleed']} testId="uncertain-engine" />
          <RecoveryMethodUncertainty hasSensitivities={snapshot?.deck.hasSensitivities} />
        </fieldset>
        {deckSource.kind === 'parametric' ? (
          <fieldset>
            <legend>Parametric deck</legend>
            <QuantityField label="Sea-level static thrust" path={['engine', 'deck', 'seaLevelStaticThrust']} unit="force" testId="field-sls-thrust" />
            <QuantityField label="Sea-level static TSFC" path={['engine', 'deck', 'seaLevelStaticTsfc']} unit="tsfc" testId="field-sls-tsfc" />
            <QuantityField label="Sea-level static airflow" path={['engine', 'deck', 'seaLevelStaticAirflow']} unit="massFlow" testId="field-sls-airflow" />
            <QuantityField label="Throttle ratio" path={['engine', 'deck', 'throttleRatio']} unit="dimensionless" testId="field-throttle-ratio" />
          </fieldset>
        ) : null}
      </div>
      {deckSource.kind === 'cycle' && state.deckFile ? <CycleEnginePanel project={project} cycleFile={state.deckFile} units={u} {...(props.chartSize ? { chartSize: props.chartSize } : {})} /> : null}
      <StaleMark stale={props.live.stale} running={props.live.running} />
      {snapshot && snapshot.lapse.length > 0 ? (
        <ChoiceField label="Rating plotted" testId="lapse-rating" value={curves?.rating ?? rating} choices={snapshot.lapse.map((l) => ({ value: l.rating, label: l.rating }))} onChoose={setRating} />
      ) : null}
      {lapse && curves ? (
        <div className="chart-row">
          <ThrustLapseChart
            title={`Thrust at ${curves.rating}, all engines, ISA: uninstalled (dashed) and installed with ${snapshot!.inletName}`}
            testId="chart-thrust-lapse"
            lapse={lapse}
            {...size}
          />
          <TsfcLapseChart title="TSFC at the same rating: uninstalled (dashed) and installed" testId="chart-tsfc" lapse={lapse} {...size} />
        </div>
      ) : null}
    </section>
  );
}
