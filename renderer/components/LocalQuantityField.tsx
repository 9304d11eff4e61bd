import { useEffect, useId, useState } from 'react';
import type { UnitSystem } from '../../engine/units';
import { fieldUnitLabel, formatField, parseField, type FieldUnit } from '../state/fieldUnits';

/** A quantity input for a view's own setting (not the project): same reading rules and inline errors as QuantityField. */
export function LocalQuantityField(props: {
  readonly label: string;
  readonly value_si: number;
  readonly unit: FieldUnit;
  readonly units: UnitSystem;
  readonly testId: string;
  readonly onValue: (value_si: number) => void;
}) {
  const shown = formatField(props.value_si, props.unit, props.units);
  const [text, setText] = useState(shown);
  const [error, setError] = useState<string | null>(null);
  const id = useId();
  useEffect(() => {
    setText(shown);
    setError(null);
  }, [shown]);
  const commit = () => {
    if (text === shown) return;
    const parsed = parseField(text, props.unit, props.units);
    if (!parsed.ok) setError(parsed.error);
    else {
      setError(null);
      props.onValue(parsed.value);
    }
  };
  const unitLabel = fieldUnitLabel(props.unit, props.units);
  return (
    <div className={error ? 'field field-invalid' : 'field'}>
      <label htmlFor={id}>
        {props.label}
        {unitLabel ? <span className="field-unit"> ({unitLabel})</span> : null}
      </label>
      <input id={id} data-testid={props.testId} value={text} aria-invalid={error !== null} onChange={(e) => setText(e.target.value)} onBlur={commit} onKeyDown={(e) => e.key === 'Enter' && commit()} />
      {error ? (
        <div className="field-error" role="alert" data-testid={`${props.testId}-error`}>
          {error}
        </div>
      ) : null}
    </div>
  );
}
