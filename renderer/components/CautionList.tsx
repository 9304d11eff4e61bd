import type { Caution } from '../../engine/cautions';
import { formatQuantity, type UnitSystem } from '../../engine/units';
import { cautionText, severityLabel } from '../state/displayText';
import type { Highlight } from '../state/studyState';

/** Every caution a result raised; clicking one highlights its leg and time. */
export function CautionList(props: {
  readonly cautions: readonly Caution[];
  readonly units: UnitSystem;
  readonly onPick?: (highlight: Highlight) => void;
  readonly testId?: string;
}) {
  const testId = props.testId ?? 'caution-list';
  if (props.cautions.length === 0) return <p data-testid={`${testId}-empty`}>No cautions raised.</p>;
  return (
    <ul className="caution-list" data-testid={testId}>
      {props.cautions.map((c, k) => {
        const where = [c.legName, c.time_s === undefined ? undefined : `at ${formatQuantity(c.time_s, 'time', props.units)}`].filter(Boolean).join(' ');
        const body = (
          <>
            <span className={`severity severity-${c.severity}`}>{severityLabel(c.severity)}</span> {cautionText(c, props.units)}
            {where ? <span className="caution-where"> ({where})</span> : null}
          </>
        );
        return (
          <li key={`${c.id}-${k}`} data-testid={testId === 'caution-list' ? `caution-${k}` : `${testId}-${k}`}>
            {props.onPick ? (
              <button type="button" className="link" onClick={() => props.onPick?.({ legIndex: c.legIndex ?? null, time_s: c.time_s ?? null })}>
                {body}
              </button>
            ) : (
              body
            )}
          </li>
        );
      })}
    </ul>
  );
}
