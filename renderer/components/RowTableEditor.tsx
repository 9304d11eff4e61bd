import type { FieldUnit } from '../state/fieldUnits';
import type { DocPath } from '../state/projectPath';
import { readAt } from '../state/projectPath';
import { useStudy } from '../state/studyContext';
import { QuantityField } from './QuantityField';

export interface RowColumn {
  readonly key: string;
  readonly label: string;
  readonly unit: FieldUnit;
  /** Test id of the cell in row n: `field-<prefix>-<idPart>-<n>`, or `field-<prefix>-<n>` when idPart is ''. */
  readonly idPart: string;
}

/** Editor for a table of rows (e.g. CD0 against Mach): one field per cell, add a row (copy of the last) and remove a row. */
export function RowTableEditor(props: { readonly title: string; readonly path: DocPath; readonly columns: readonly RowColumn[]; readonly prefix: string }) {
  const { state, dispatch } = useStudy();
  const rows = readAt(state.doc?.present, props.path);
  const count = Array.isArray(rows) ? rows.length : 0;
  return (
    <fieldset className="row-table" data-testid={`${props.prefix}-table`}>
      <legend>{props.title}</legend>
      {Array.from({ length: count }, (_, n) => (
        <div className="row" key={n}>
          {props.columns.map((c) => (
            <QuantityField
              key={c.key}
              label={`${c.label} ${n + 1}`}
              path={[...props.path, n, c.key]}
              unit={c.unit}
              testId={c.idPart === '' ? `field-${props.prefix}-${n}` : `field-${props.prefix}-${c.idPart}-${n}`}
            />
          ))}
          <button
            type="button"
            data-testid={`${props.prefix}-remove-${n}`}
            disabled={count <= 1}
            onClick={() => dispatch({ type: 'rowRemoved', path: props.path, index: n, label: `Remove ${props.title} row ${n + 1}` })}
          >
            Remove
          </button>
        </div>
      ))}
      <button type="button" data-testid={`${props.prefix}-add-row`} onClick={() => dispatch({ type: 'rowAdded', path: props.path, label: `Add ${props.title} row` })}>
        Add row
      </button>
    </fieldset>
  );
}
