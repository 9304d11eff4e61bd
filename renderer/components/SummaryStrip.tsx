import { formatQuantity, type UnitSystem } from '../../engine/units';
import { statusLabel } from '../state/displayText';
import { healthClass, resultHealth } from '../state/resultHealth';
import type { LiveStudy } from '../worker/useEngine';

/** Block fuel, the mission status and whether the figures are current: on every view. */
export function SummaryStrip(props: { readonly live: LiveStudy; readonly units: UnitSystem }) {
  const { snapshot, running, failure } = props.live;
  const health = resultHealth(props.live);
  if (snapshot === null) {
    return (
      <p className="summary-strip" data-testid="summary-strip" role="status">
        {failure !== null ? 'No result: the project cannot be flown as it stands.' : running ? 'Flying the mission…' : 'No result yet.'}
      </p>
    );
  }
  const m = snapshot.mission;
  const failed = health.mission === 'failed';
  return (
    <p className={`summary-strip ${healthClass(health)}`} data-testid="summary-strip" role="status">
      <span>
        Block fuel <strong data-testid="summary-block-fuel">{failed ? 'not valid' : formatQuantity(m.blockFuel_kg, 'mass', props.units)}</strong>
      </span>
      <span>
        Block time <strong>{failed ? 'not valid' : formatQuantity(m.blockTime_s, 'time', props.units)}</strong>
      </span>
      <span data-testid="summary-status" className={health.mission === 'good' ? 'status-ok' : 'status-bad'}>
        Mission {statusLabel(m.status)}
      </span>
      {health.stale ? (
        <span className="badge badge-stale" data-testid="summary-stale">
          {running ? 'updating…' : 'out of date'}
        </span>
      ) : null}
    </p>
  );
}
