import { useId } from 'react';

export interface Choice<T extends string> {
  readonly value: T;
  readonly label: string;
  /** Set when the choice does not apply here: it is offered disabled, with this reason beside it. */
  readonly unavailable?: string;
}

export interface ChoiceFieldProps<T extends string> {
  readonly label: string;
  readonly value: T;
  readonly choices: readonly Choice<T>[];
  readonly onChoose: (value: T) => void;
  readonly testId: string;
}

/** A labelled select among fixed choices; a choice that does not apply is disabled and its reason shown below. */
export function ChoiceField<T extends string>(props: ChoiceFieldProps<T>) {
  const id = useId();
  const unavailable = props.choices.filter((c) => c.unavailable !== undefined);
  return (
    <div className="field">
      <label htmlFor={id}>{props.label}</label>
      <select
        id={id}
        data-testid={props.testId}
        value={props.value}
        onChange={(e) => {
          const chosen = props.choices.find((c) => c.value === e.target.value);
          if (chosen && chosen.unavailable === undefined) props.onChoose(chosen.value);
        }}
      >
        {props.choices.map((c) => (
          <option key={c.value} value={c.value} disabled={c.unavailable !== undefined}>
            {c.unavailable === undefined ? c.label : `${c.label} (unavailable)`}
          </option>
        ))}
      </select>
      {unavailable.map((c) => (
        <p key={c.value} className="small field-note" data-testid={`${props.testId}-unavailable-${c.value}`}>
          {c.label}: unavailable, {c.unavailable}.
        </p>
      ))}
    </div>
  );
}
