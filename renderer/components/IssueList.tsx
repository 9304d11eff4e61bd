import type { EngineFailure } from '../worker/engineProtocol';
import type { ProjectIssue } from '../../engine/project/projectIssue';

/** Project issues: path and message each. */
export function IssueList(props: { readonly issues: readonly ProjectIssue[]; readonly testId: string; readonly title: string }) {
  if (props.issues.length === 0) return null;
  return (
    <section className="issues" data-testid={props.testId} role="alert">
      <h3>{props.title}</h3>
      <ul>
        {props.issues.map((i, k) => (
          <li key={`${i.path}-${k}`}>
            <code>{i.path}</code> {i.message}
          </li>
        ))}
      </ul>
    </section>
  );
}

/** Why the engine gave no result for the newest inputs. */
export function FailureNotice(props: { readonly failure: EngineFailure | null; readonly testId: string }) {
  const f = props.failure;
  if (f === null) return null;
  if (f.kind === 'project') return <IssueList issues={f.issues} testId={props.testId} title="The project cannot be flown as it stands" />;
  if (f.kind === 'deck') {
    return (
      <section className="issues" data-testid={props.testId} role="alert">
        <h3>The deck file has errors</h3>
        <ul>
          {f.errors.map((e, k) => (
            <li key={k}>{e.message}</li>
          ))}
        </ul>
      </section>
    );
  }
  return (
    <section className="issues" data-testid={props.testId} role="alert">
      <h3>The analysis stopped</h3>
      <p>
        {f.message} <span className="code">({f.code})</span>
      </p>
    </section>
  );
}
