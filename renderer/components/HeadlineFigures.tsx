import type { MissionResult } from '../../engine/mission';
import type { UnitSystem } from '../../engine/units';
import { healthClass, missionHealth } from '../state/resultHealth';
import { selectHeadline } from '../state/selectors';

/** Figures that do not hold when the mission was not flown to its destination. */
const FLOWN_FIGURES: ReadonlySet<string> = new Set(['block-fuel', 'block-time', 'trip-fuel', 'reserve-fuel', 'lw', 'distance']);

/**
 * The mission's headline figures (block fuel, block time, trip and reserve
 * fuel, TOW/LW/ZFW). Out-of-date figures are greyed with a badge; for a
 * mission not flown to its destination the flown figures read "not valid";
 * a broken hard limit is marked.
 */
export function HeadlineFigures(props: { readonly result: MissionResult; readonly units: UnitSystem; readonly idPrefix?: string; readonly stale?: boolean }) {
  const prefix = props.idPrefix ?? 'headline';
  const health = { mission: missionHealth(props.result), stale: props.stale ?? false };
  const failed = health.mission === 'failed';
  return (
    <div className={`headline-block ${healthClass(health)}`}>
      {health.stale ? <p className="badge badge-stale" data-testid={`${prefix}-stale-badge`}>Out of date</p> : null}
      {failed ? <p className="badge badge-failed" data-testid={`${prefix}-failed-badge`}>Not a valid flight: the mission did not reach its destination</p> : null}
      {health.mission === 'limit' ? <p className="badge badge-limit" data-testid={`${prefix}-limit-badge`}>Flown, but a hard limit is broken</p> : null}
      <dl className="headline" data-testid={prefix}>
        {selectHeadline(props.result, props.units).map((f) => (
          <div key={f.id} className="headline-figure">
            <dt>{f.label}</dt>
            <dd data-testid={`${prefix}-${f.id}`}>{failed && FLOWN_FIGURES.has(f.id) ? 'not valid' : f.text}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
