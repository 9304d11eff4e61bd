import type { MissionResult } from '../../engine/mission/missionTypes';
import type { UnitSystem } from '../../engine/units/quantity';
import { selectHeadline } from '../state/selectors';

/** The mission's headline figures (block fuel, block time, trip and reserve fuel, TOW/LW/ZFW). */
export function HeadlineFigures(props: { readonly result: MissionResult; readonly units: UnitSystem; readonly idPrefix?: string }) {
  const prefix = props.idPrefix ?? 'headline';
  return (
    <dl className="headline" data-testid={prefix}>
      {selectHeadline(props.result, props.units).map((f) => (
        <div key={f.id} className="headline-figure">
          <dt>{f.label}</dt>
          <dd data-testid={`${prefix}-${f.id}`}>{f.text}</dd>
        </div>
      ))}
    </dl>
  );
}
