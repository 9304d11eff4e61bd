import type { EngineFailure } from '../worker/engineProtocol';
import type { ProjectIssue } from '../../engine/project';
import { issueReason, pathLabel } from '../state/displayText';
import { StudyContext } from '../state/studyContext';
import { useContext } from 'react';

/** Project issues: where (as a reader names it, legs from 1) and why, in the chosen units. */
export function IssueList(props: {
  readonly issues: readonly ProjectIssue[];
  readonly testId: string;
  readonly title: string;
  /** Also show each issue's place in the file (a file that failed to open is fixed in a text editor). */
  readonly showFilePath?: boolean;
}) {
  const units = useContext(StudyContext)?.state.units ?? 'customary';
  if (props.issues.length === 0) return null;
  return (
    <section className="issues" data-testid={props.testId} role="alert">
      <h3>{props.title}</h3>
      <ul>
        {props.issues.map((i, k) => (
          <li key={`${i.path}-${k}`}>
            <strong className="issue-where">{pathLabel(i.path)}:</strong> {issueReason(i, units)}
            {props.showFilePath && i.path !== '(file)' ? <span className="small"> (in the file at {i.path})</span> : null}
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
        {f.message}
      </p>
    </section>
  );
}
