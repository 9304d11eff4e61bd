import type { EngineRequestKind } from '../worker/engineProtocol';
import type { JobState } from '../worker/useEngine';

/** Progress of a long run with its cancel button, or its cancelled state. */
export function JobProgress<K extends EngineRequestKind>(props: { readonly state: JobState<K>; readonly onCancel: () => void; readonly testId: string; readonly steps?: string }) {
  const s = props.state;
  if (s.status === 'running') {
    return (
      <div className="job-progress" data-testid={props.testId}>
        <progress max={s.total || 1} value={s.done} />
        <span>
          {s.total > 0 ? `${s.done} of ${s.total} ${props.steps ?? 'missions'}` : 'starting'}
        </span>
        <button type="button" data-testid={`${props.testId}-cancel`} onClick={props.onCancel}>
          Cancel
        </button>
      </div>
    );
  }
  if (s.status === 'cancelled') return <p className="job-progress" data-testid={`${props.testId}-cancelled`}>Cancelled.</p>;
  return null;
}
