import { useId } from 'react';

export interface ChoiceFieldProps<T extends string> {
  readonly label: string;
  readonly value: T;
  readonly choices: readonly { readonly value: T; readonly label: string }[];
  readonly onChoose: (value: T) => void;
  readonly testId: string;
}

/** A labelled select among fixed choices. */
export function ChoiceField<T extends string>(props: ChoiceFieldProps<T>) {
  const id = useId();
  return (
    <div className="field">
      <label htmlFor={id}>{props.label}</label>
      <select id={id} data-testid={props.testId} value={props.value} onChange={(e) => props.onChoose(e.target.value as T)}>
        {props.choices.map((c) => (
          <option key={c.value} value={c.value}>
            {c.label}
          </option>
        ))}
      </select>
    </div>
  );
}
