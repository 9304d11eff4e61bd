import { useEffect, useId, useState } from 'react';
import type { FieldUnit } from '../state/fieldUnits';
import { fieldUnitLabel } from '../state/fieldUnits';
import type { DocPath } from '../state/projectPath';
import { selectFieldView } from '../state/selectors';
import { useStudy } from '../state/studyContext';
import { undoKeyCommand } from '../state/undoKeys';

export interface QuantityFieldProps {
  readonly label: string;
  readonly path: DocPath;
  readonly unit: FieldUnit;
  readonly testId: string;
  /** Shown after the label, e.g. the default of a caution threshold. */
  readonly hint?: string;
  /** Empty text removes the value (the project's default applies). */
  readonly optional?: boolean;
  /** The label is read by assistive technology but not shown (a table row already says it). */
  readonly hideLabel?: boolean;
}

/**
 * A quantity input. Typed text is sent on Enter or when the field loses
 * focus; text that does not parse (or breaks a project rule here) stays in
 * the field with its message below and does not reach the project.
 */
export function QuantityField(props: QuantityFieldProps) {
  const { state, dispatch } = useStudy();
  const view = selectFieldView(state, props.path, props.unit);
  const [text, setText] = useState(view.text);
  const id = useId();
  useEffect(() => setText(view.text), [view.text]);
  const commit = () => {
    if (text === view.text) return;
    if (props.optional === true && text.trim() === '') {
      dispatch({ type: 'valueSet', path: props.path, value: undefined, label: `Clear ${props.label}` });
      return;
    }
    dispatch({ type: 'fieldEdited', path: props.path, text, unit: props.unit, label: `Set ${props.label}` });
  };
  const unitLabel = fieldUnitLabel(props.unit, state.units);
  return (
    <div className={view.error ? 'field field-invalid' : 'field'}>
      <label htmlFor={id} className={props.hideLabel ? 'visually-hidden' : undefined}>
        {props.label}
        {unitLabel ? <span className="field-unit"> ({unitLabel})</span> : null}
        {props.hint ? <span className="field-hint"> {props.hint}</span> : null}
      </label>
      <input
        id={id}
        data-testid={props.testId}
        value={text}
        aria-invalid={view.error !== null}
        onChange={(e) => setText(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          // While the field holds uncommitted text, Ctrl+Z edits that text, not the project.
          if (text !== view.text && undoKeyCommand(e) !== null) e.stopPropagation();
          if (e.key === 'Enter') commit();
          if (e.key === 'Escape') {
            dispatch({ type: 'draftDiscarded', path: props.path });
            setText(selectFieldView({ ...state, drafts: {} }, props.path, props.unit).text);
          }
        }}
      />
      {view.error ? (
        <div className="field-error" role="alert" data-testid={`${props.testId}-error`}>
          {view.error}
        </div>
      ) : null}
    </div>
  );
}
