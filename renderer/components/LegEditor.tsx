import type { ProjectLeg } from '../../engine/project';
import { RATING_NAMES } from '../../engine/propulsion';
import { LEG_KIND_LABEL, LEG_KINDS, newLeg, type LegKindName } from '../state/legTemplates';
import { ratingLabel } from '../state/displayText';
import { useStudy } from '../state/studyContext';
import { ChoiceField } from './ChoiceField';
import { QuantityField } from './QuantityField';
import { FOOT_M, NAUTICAL_MILE_M } from '../../engine/units';

function Schedule(props: { readonly n: number }) {
  const p = ['mission', 'legs', props.n, 'schedule'] as const;
  const id = (f: string) => `field-leg-${props.n}-${f}`;
  return (
    <>
      <QuantityField label="CAS below the limit altitude" path={[...p, 'lowCas']} unit="speed" testId={id('low-cas')} />
      <QuantityField label="Limit altitude" path={[...p, 'lowAltitudeLimit']} unit="altitude" testId={id('low-altitude-limit')} />
      <QuantityField label="CAS above" path={[...p, 'cas']} unit="speed" testId={id('cas')} />
      <QuantityField label="Mach above the crossover altitude" path={[...p, 'mach']} unit="dimensionless" testId={id('mach')} />
    </>
  );
}

function Toggle(props: { readonly label: string; readonly checked: boolean; readonly testId: string; readonly onChange: (checked: boolean) => void }) {
  return (
    <label className="toggle">
      <input type="checkbox" data-testid={props.testId} checked={props.checked} onChange={(e) => props.onChange(e.target.checked)} /> {props.label}
    </label>
  );
}

/** The fields of one mission leg, by kind. */
export function LegFields(props: { readonly leg: ProjectLeg; readonly n: number }) {
  const { dispatch } = useStudy();
  const { leg, n } = props;
  const p = ['mission', 'legs', n] as const;
  const id = (f: string) => `field-leg-${n}-${f}`;
  const set = (path: readonly (string | number)[], value: unknown, label: string) => dispatch({ type: 'valueSet', path: [...p, ...path], value, label: `Leg ${n + 1}: ${label}` });
  switch (leg.kind) {
    case 'taxiOut':
    case 'taxiIn':
      return (
        <>
          <QuantityField label="Time" path={[...p, 'time']} unit="duration" testId={id('time')} />
          <Toggle label="Fuel flow at idle" testId={id('idle')} checked={leg.fuelFlow === 'idle'} onChange={(c) => set(['fuelFlow'], c ? 'idle' : 0.05, 'fuel flow')} />
          {leg.fuelFlow !== 'idle' ? <QuantityField label="Fuel flow" path={[...p, 'fuelFlow']} unit="fuelFlow" testId={id('fuel-flow')} /> : null}
        </>
      );
    case 'takeoff':
    case 'approach':
      return (
        <>
          <QuantityField label="Time" path={[...p, 'time']} unit="duration" testId={id('time')} />
          <Toggle label="Fuel as a fixed allowance" testId={id('fixed-fuel')} checked={leg.fuel !== null} onChange={(c) => set(['fuel'], c ? 100 : null, 'fuel allowance')} />
          {leg.fuel !== null ? <QuantityField label="Fuel allowance" path={[...p, 'fuel']} unit="mass" testId={id('fuel')} /> : null}
        </>
      );
    case 'climb':
      return (
        <>
          <QuantityField label="To altitude" path={[...p, 'toAltitude']} unit="altitude" testId={id('to-altitude')} />
          <Schedule n={n} />
          <ChoiceField label="Rating" testId={id('rating')} value={leg.rating} choices={RATING_NAMES.map((r) => ({ value: r, label: ratingLabel(r) }))} onChoose={(r) => set(['rating'], r, 'rating')} />
        </>
      );
    case 'cruise':
      return (
        <>
          <QuantityField label="Altitude" path={[...p, 'altitude']} unit="altitude" testId={id('altitude')} />
          <ChoiceField
            label="Speed"
            testId={id('speed-kind')}
            value={leg.speed.kind}
            choices={[
              { value: 'mach', label: 'constant Mach' },
              { value: 'bestRange', label: 'best-range Mach' },
              { value: 'longRange', label: 'long-range Mach (99 % of best specific range)' },
            ]}
            onChoose={(k) => set(['speed'], k === 'mach' ? { kind: 'mach', mach: 0.76 } : { kind: k }, 'cruise speed')}
          />
          {leg.speed.kind === 'mach' ? <QuantityField label="Mach" path={[...p, 'speed', 'mach']} unit="dimensionless" testId={id('mach')} /> : null}
          <ChoiceField
            label="Profile"
            testId={id('profile')}
            value={leg.profile.kind}
            choices={[
              { value: 'constantAltitude', label: 'constant altitude' },
              { value: 'stepClimb', label: 'step climbs' },
              { value: 'cruiseClimb', label: 'cruise-climb' },
            ]}
            onChoose={(k) =>
              set(
                ['profile'],
                k === 'constantAltitude' ? { kind: k } : k === 'stepClimb' ? { kind: k, step: 4000 * FOOT_M, maxAltitude: 41000 * FOOT_M } : { kind: k, maxAltitude: 41000 * FOOT_M },
                'cruise profile',
              )
            }
          />
          {leg.profile.kind === 'stepClimb' ? <QuantityField label="Step" path={[...p, 'profile', 'step']} unit="altitude" testId={id('step')} /> : null}
          {leg.profile.kind !== 'constantAltitude' ? <QuantityField label="Highest altitude" path={[...p, 'profile', 'maxAltitude']} unit="altitude" testId={id('max-altitude')} /> : null}
          <Toggle label="Distance solved to meet the mission range" testId={id('solve-distance')} checked={leg.distance === 'solve'} onChange={(c) => set(['distance'], c ? 'solve' : 500 * NAUTICAL_MILE_M, 'distance')} />
          {leg.distance !== 'solve' ? <QuantityField label="Distance" path={[...p, 'distance']} unit="distance" testId={id('distance')} /> : null}
        </>
      );
    case 'descent':
      return (
        <>
          <QuantityField label="To altitude" path={[...p, 'toAltitude']} unit="altitude" testId={id('to-altitude')} />
          <Schedule n={n} />
          <Toggle label="Idle descent" testId={id('idle')} checked={leg.mode.kind === 'idle'} onChange={(c) => set(['mode'], c ? { kind: 'idle' } : { kind: 'rate', rate: 1500 * FOOT_M / 60 }, 'descent mode')} />
          {leg.mode.kind === 'rate' ? <QuantityField label="Descent rate" path={[...p, 'mode', 'rate']} unit="climbRate" testId={id('rate')} /> : null}
        </>
      );
    case 'hold':
      return (
        <>
          <QuantityField label="Altitude" path={[...p, 'altitude']} unit="altitude" testId={id('altitude')} />
          <QuantityField label="Time" path={[...p, 'time']} unit="duration" testId={id('time')} />
          <Toggle label="Best-endurance speed" testId={id('best-endurance')} checked={leg.speed.kind === 'bestEndurance'} onChange={(c) => set(['speed'], c ? { kind: 'bestEndurance' } : { kind: 'cas', cas: 210 * NAUTICAL_MILE_M / 3600 }, 'hold speed')} />
          {leg.speed.kind === 'cas' ? <QuantityField label="CAS" path={[...p, 'speed', 'cas']} unit="speed" testId={id('hold-cas')} /> : null}
        </>
      );
  }
}

/** One leg in the ordered list: kind, name, order buttons, its fields and optional wind and ISA deviation. */
export function LegEditor(props: { readonly leg: ProjectLeg; readonly n: number; readonly count: number }) {
  const { dispatch } = useStudy();
  const { leg, n } = props;
  return (
    <li className="leg" data-testid={`leg-${n}`}>
      <div className="leg-head">
        <strong>{n + 1}.</strong>
        <ChoiceField
          label="Kind"
          testId={`leg-${n}-kind`}
          value={leg.kind as LegKindName}
          choices={LEG_KINDS.map((k) => ({ value: k, label: LEG_KIND_LABEL[k] }))}
          onChoose={(k) => dispatch({ type: 'legReplaced', index: n, leg: { ...newLeg(k), ...(leg.name === undefined ? {} : { name: leg.name }) } })}
        />
        <label>
          Name{' '}
          <input
            data-testid={`leg-${n}-name`}
            defaultValue={leg.name ?? ''}
            key={leg.name ?? ''}
            onBlur={(e) => {
              const name = e.target.value.trim();
              if (name !== (leg.name ?? '')) dispatch({ type: 'valueSet', path: ['mission', 'legs', n, 'name'], value: name === '' ? undefined : name, label: `Rename leg ${n + 1}` });
            }}
          />
        </label>
        <button type="button" data-testid={`leg-${n}-up`} disabled={n === 0} onClick={() => dispatch({ type: 'legMoved', index: n, by: -1 })}>
          Up
        </button>
        <button type="button" data-testid={`leg-${n}-down`} disabled={n === props.count - 1} onClick={() => dispatch({ type: 'legMoved', index: n, by: 1 })}>
          Down
        </button>
        <button type="button" data-testid={`leg-${n}-duplicate`} onClick={() => dispatch({ type: 'legDuplicated', index: n })}>
          Duplicate
        </button>
        <button type="button" data-testid={`leg-${n}-remove`} disabled={props.count <= 1} onClick={() => dispatch({ type: 'legRemoved', index: n })}>
          Remove
        </button>
      </div>
      <div className="leg-fields">
        <LegFields leg={leg} n={n} />
        <QuantityField label="Wind (+ tail; blank: mission's)" path={['mission', 'legs', n, 'wind']} unit="speed" testId={`field-leg-${n}-wind`} optional />
        <QuantityField label="ISA deviation (blank: mission's)" path={['mission', 'legs', n, 'isaDeviation']} unit="temperatureDelta" testId={`field-leg-${n}-isa`} optional />
      </div>
    </li>
  );
}
