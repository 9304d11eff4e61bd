import { useState } from 'react';
import { ChoiceField } from '../components/ChoiceField';
import { IssueList } from '../components/IssueList';
import { LegEditor } from '../components/LegEditor';
import { QuantityField } from '../components/QuantityField';
import { formatField } from '../state/fieldUnits';
import { solveModeLabel } from '../state/displayText';
import { LEG_KIND_LABEL, LEG_KINDS, type LegKindName } from '../state/legTemplates';
import { DEFAULT_ALTERNATE_APPROACH, DEFAULT_MISSED_APPROACH, DEFAULT_RESERVE_HOLD_SPEED } from '../../engine/mission';
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
        onChoose={(preset) => dispatch({ type: 'valueSet', path: p, value: { ...reservesForPreset(preset, r.alternate), ...(r.arrival ? { arrival: r.arrival } : {}), ...(r.holdSpeed ? { holdSpeed: r.holdSpeed } : {}) }, label: `Reserves: ${RESERVE_PRESET_LABEL[preset]}` })}
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
      <ReserveCommon />
    </fieldset>
  );
}

/** One knot (m/s): a nautical mile per hour. */
const KT = NMI / 3600;

/** The settings every reserve preset shares: distance basis, arrival allowances, hold speed. */
function ReserveCommon() {
  const { state, dispatch } = useStudy();
  const mission = state.doc!.present.mission;
  const r = mission.reserves;
  const p = ['mission', 'reserves'] as const;
  const hold = r.holdSpeed;
  return (
    <>
      <ChoiceField<'ground' | 'stillAir'>
        label="Distances measured"
        testId="field-distance-basis"
        value={mission.distanceBasis}
        choices={[
          { value: 'ground', label: 'over the ground (the wind changes air distance, fuel and time)' },
          { value: 'stillAir', label: 'in still air (a design-range study)' },
        ]}
        onChoose={(v) => dispatch({ type: 'valueSet', path: ['mission', 'distanceBasis'], value: v, label: 'Set distance basis' })}
      />
      <label className="toggle">
        <input
          type="checkbox"
          data-testid="arrival-toggle"
          checked={r.arrival !== undefined}
          onChange={(e) =>
            dispatch({
              type: 'valueSet',
              path: [...p, 'arrival'],
              value: e.target.checked
                ? { missedApproach: { time: DEFAULT_MISSED_APPROACH.time_s, fuel: null }, alternateApproach: { time: DEFAULT_ALTERNATE_APPROACH.time_s, fuel: null } }
                : undefined,
              label: e.target.checked ? 'Set arrival allowances' : "Arrival allowances from the mission's take-off and approach",
            })
          }
        />{' '}
        Own arrival allowances (else the mission's take-off and approach allowances)
      </label>
      {r.arrival !== undefined ? (
        <>
          <QuantityField label="Missed approach time" path={[...p, 'arrival', 'missedApproach', 'time']} unit="duration" testId="field-missed-approach-time" />
          <QuantityField label="Missed approach fuel (blank: the time at the takeoff rating)" path={[...p, 'arrival', 'missedApproach', 'fuel']} unit="mass" testId="field-missed-approach-fuel" optional />
          <QuantityField label="Approach and landing at the alternate, time" path={[...p, 'arrival', 'alternateApproach', 'time']} unit="duration" testId="field-alternate-approach-time" />
          <QuantityField label="Approach and landing at the alternate, fuel (blank: the time at flight idle)" path={[...p, 'arrival', 'alternateApproach', 'fuel']} unit="mass" testId="field-alternate-approach-fuel" optional />
        </>
      ) : null}
      <ChoiceField<'default' | 'bestEndurance' | 'cas'>
        label="Reserve hold speed"
        testId="field-hold-speed"
        value={hold === undefined ? 'default' : hold.kind}
        choices={[
          { value: 'default', label: `default: best endurance at ${DEFAULT_RESERVE_HOLD_SPEED.kind === 'bestEndurance' ? (DEFAULT_RESERVE_HOLD_SPEED.speedFactor ?? 1) : 1} x the minimum-drag speed` },
          { value: 'bestEndurance', label: 'best endurance, a factor on the minimum-drag speed' },
          { value: 'cas', label: 'a set calibrated airspeed' },
        ]}
        onChoose={(v) =>
          dispatch({
            type: 'valueSet',
            path: [...p, 'holdSpeed'],
            value: v === 'default' ? undefined : v === 'cas' ? { kind: 'cas', cas: 200 * KT } : { kind: 'bestEndurance', speedFactor: DEFAULT_RESERVE_HOLD_SPEED.kind === 'bestEndurance' ? (DEFAULT_RESERVE_HOLD_SPEED.speedFactor ?? 1) : 1 },
            label: 'Set reserve hold speed',
          })
        }
      />
      {hold?.kind === 'bestEndurance' ? (
        <>
          <QuantityField label="Hold speed factor on the minimum-drag speed" path={[...p, 'holdSpeed', 'speedFactor']} unit="dimensionless" testId="field-hold-factor" optional />
          <QuantityField label="Least hold CAS (blank: none)" path={[...p, 'holdSpeed', 'minCas']} unit="speed" testId="field-hold-min-cas" optional />
        </>
      ) : null}
      {hold?.kind === 'cas' ? <QuantityField label="Hold CAS" path={[...p, 'holdSpeed', 'cas']} unit="speed" testId="field-hold-cas" /> : null}
    </>
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
