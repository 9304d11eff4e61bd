import { useState } from 'react';
import { ChoiceField } from '../components/ChoiceField';
import { IssueList } from '../components/IssueList';
import { LegEditor } from '../components/LegEditor';
import { QuantityField } from '../components/QuantityField';
import { formatField } from '../state/fieldUnits';
import { solveModeLabel } from '../state/displayText';
import { LEG_KIND_LABEL, LEG_KINDS, type LegKindName } from '../state/legTemplates';
import { RESERVE_PRESET_LABEL, reservesForPreset, type ReservePreset } from '../state/reservePresets';
import { selectIssuesUnder } from '../state/selectors';
import { useStudy } from '../state/studyContext';
import { FOOT_M, NAUTICAL_MILE_M } from '../../engine/units';

const NMI = NAUTICAL_MILE_M;
const FT = FOOT_M;

function Reserves() {
  const { state, dispatch } = useStudy();
  const r = state.doc!.present.mission.reserves;
  const p = ['mission', 'reserves'] as const;
  const alt = r.alternate;
  return (
    <fieldset>
      <legend>Reserves</legend>
      <ChoiceField
        label="Reserve rule"
        testId="reserves-preset"
        value={r.preset}
        choices={(Object.keys(RESERVE_PRESET_LABEL) as ReservePreset[]).map((k) => ({ value: k, label: RESERVE_PRESET_LABEL[k] }))}
        onChoose={(preset) => dispatch({ type: 'valueSet', path: p, value: reservesForPreset(preset, r.alternate), label: `Reserves: ${RESERVE_PRESET_LABEL[preset]}` })}
      />
      {r.preset === 'icaoAnnex6' || r.preset === 'custom' ? <QuantityField label="Contingency fraction of trip fuel" path={[...p, 'contingencyFraction']} unit="percent" testId="field-contingency" /> : null}
      {r.preset === 'icaoAnnex6' ? <QuantityField label="Least contingency (time at holding)" path={[...p, 'minContingencyTime']} unit="duration" testId="field-min-contingency" /> : null}
      {r.preset === 'cfr121_645' ? <QuantityField label="Fraction of en-route time" path={[...p, 'enRouteFraction']} unit="percent" testId="field-en-route-fraction" /> : null}
      <QuantityField label="Final reserve time" path={[...p, 'finalReserveTime']} unit="duration" testId="field-final-reserve" />
      {r.preset === 'custom' ? <QuantityField label="Extra fuel" path={[...p, 'extraFuel']} unit="mass" testId="field-extra-fuel" /> : null}
      <label className="toggle">
        <input
          type="checkbox"
          data-testid="alternate-toggle"
          checked={alt !== null}
          onChange={(e) =>
            dispatch({
              type: 'valueSet',
              path: [...p, 'alternate'],
              value: e.target.checked ? { distance: 200 * NMI, cruiseAltitude: 25000 * FT, cruiseMach: 0.7, elevation: 0 } : null,
              label: e.target.checked ? 'Add alternate' : 'Remove alternate',
            })
          }
        />{' '}
        Alternate aerodrome
      </label>
      {alt !== null ? (
        <>
          <QuantityField label="Alternate distance" path={[...p, 'alternate', 'distance']} unit="distance" testId="field-alternate-distance" />
          <QuantityField label="Alternate cruise altitude" path={[...p, 'alternate', 'cruiseAltitude']} unit="altitude" testId="field-alternate-altitude" />
          <QuantityField label="Alternate cruise Mach" path={[...p, 'alternate', 'cruiseMach']} unit="dimensionless" testId="field-alternate-mach" />
          <QuantityField label="Alternate elevation" path={[...p, 'alternate', 'elevation']} unit="altitude" testId="field-alternate-elevation" />
        </>
      ) : null}
    </fieldset>
  );
}

function Solve() {
  const { state, dispatch } = useStudy();
  const project = state.doc!.present;
  const s = project.mission.solve;
  const p = ['mission', 'solve'] as const;
  const payload = s.payload;
  return (
    <fieldset>
      <legend>What to solve</legend>
      <ChoiceField
        label="Given"
        testId="solve-mode"
        value={s.mode}
        choices={[
          { value: 'payloadRange', label: 'payload and range (fuel found)' },
          { value: 'takeoffWeight', label: 'payload and take-off mass' },
          { value: 'maxRange', label: 'payload (longest range)' },
        ]}
        onChoose={(mode) =>
          dispatch({
            type: 'valueSet',
            path: p,
            label: `Solve for ${solveModeLabel(mode)}`,
            value:
              mode === 'payloadRange'
                ? { mode, payload, range: 1500 * NMI }
                : mode === 'takeoffWeight'
                  ? { mode, payload, takeoffWeight: project.airframe.weights.maxTakeoff }
                  : { mode, payload },
          })
        }
      />
      <QuantityField label="Payload" path={[...p, 'payload']} unit="mass" testId="field-payload" />
      {s.mode === 'payloadRange' ? <QuantityField label="Range" path={[...p, 'range']} unit="distance" testId="field-range" /> : null}
      {s.mode === 'takeoffWeight' ? <QuantityField label="Take-off mass" path={[...p, 'takeoffWeight']} unit="mass" testId="field-tow" /> : null}
    </fieldset>
  );
}

/** The mission: legs in order (add, remove, duplicate, move), atmosphere, wind and destination elevation, reserves, and what is solved. */
export function MissionView() {
  const { state, dispatch } = useStudy();
  const legs = state.doc!.present.mission.legs;
  const [kind, setKind] = useState<LegKindName>('cruise');
  return (
    <section>
      <h2>Mission</h2>
      <IssueList issues={selectIssuesUnder(state, 'mission')} testId="project-issues" title="Rules the mission breaks" />
      <div className="field-grid">
        <Solve />
        <Reserves />
        <fieldset>
          <legend>Whole mission: atmosphere, wind, destination</legend>
          <QuantityField label="ISA deviation" path={['mission', 'isaDeviation']} unit="temperatureDelta" testId="field-mission-isa" />
          <QuantityField label="Along-track wind (+ tail)" path={['mission', 'wind']} unit="speed" testId="field-mission-wind" />
          <QuantityField
            label="Destination elevation"
            path={['mission', 'destinationElevation']}
            unit="altitude"
            testId="field-destination-elevation"
            hint={`(blank: ${formatField(0, 'altitude', state.units)})`}
            optional
          />
        </fieldset>
      </div>
      <h3>Legs</h3>
      <ol className="legs">
        {legs.map((leg, n) => (
          <LegEditor key={n} leg={leg} n={n} count={legs.length} />
        ))}
      </ol>
      <div className="leg-add">
        <ChoiceField label="New leg" testId="leg-add-kind" value={kind} choices={LEG_KINDS.map((k) => ({ value: k, label: LEG_KIND_LABEL[k] }))} onChoose={setKind} />
        <button type="button" data-testid="leg-add" onClick={() => dispatch({ type: 'legAdded', kind })}>
          Add leg at the end
        </button>
      </div>
    </section>
  );
}
