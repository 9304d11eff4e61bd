import { useEffect, useState } from 'react';
import type { Project } from '../../engine/project';
import type { UncertainInputKind } from '../../engine/uncertainty';
import type { FieldUnit } from '../state/fieldUnits';
import { useStudy } from '../state/studyContext';
import { QuantityField } from './QuantityField';

type AnyDeclared = NonNullable<Project['uncertainty']>['inputs'][number];
/** Inputs with a continuous distribution (the recovery-method alternatives are edited in the file). */
type Declared = Exclude<AnyDeclared, { input: 'recoveryMethod' }>;
type ContinuousKind = Exclude<UncertainInputKind, 'recoveryMethod'>;

const WHAT: Readonly<Record<ContinuousKind, { readonly label: string; readonly unit: FieldUnit; readonly unitText: string; readonly sd: number }>> = {
  cd0: { label: 'CD0', unit: 'dimensionless', unitText: 'drag counts', sd: 3 },
  k: { label: 'K', unit: 'percent', unitText: '', sd: 0.03 },
  tsfc: { label: 'TSFC', unit: 'percent', unitText: '', sd: 0.01 },
  oew: { label: 'OEW', unit: 'mass', unitText: '', sd: 100 },
  cRam: { label: 'C_ram', unit: 'dimensionless', unitText: '', sd: 0.1 },
  cBleed: { label: 'C_bleed', unit: 'dimensionless', unitText: '', sd: 0.2 },
  recovery: { label: 'recovery', unit: 'dimensionless', unitText: 'offset', sd: 0.002 },
  lipSuction: { label: 'lip suction', unit: 'dimensionless', unitText: 'offset', sd: 0.1 },
};

function matches(d: AnyDeclared, kinds: readonly ContinuousKind[], inlet: string | undefined): d is Declared {
  if (d.input === 'recoveryMethod' || !kinds.includes(d.input)) return false;
  if (inlet === undefined) return true;
  return 'inlet' in d && d.inlet === inlet;
}

/**
 * The declared uncertainties of some inputs, edited beside those inputs
 * (compact): distribution (normal with its sd, or uniform with its bounds),
 * the reason, remove; and an "uncertain" button for each input not yet
 * declared. Writes the project's `uncertainty` block (undoable like any edit).
 */
export function UncertaintyRows(props: { readonly kinds: readonly ContinuousKind[]; readonly inlet?: string; readonly testId: string }) {
  const { state, dispatch } = useStudy();
  const project = state.doc!.present;
  const inputs = project.uncertainty?.inputs ?? [];
  const setInputs = (next: readonly AnyDeclared[], label: string) => {
    if (project.uncertainty === undefined) dispatch({ type: 'valueSet', path: ['uncertainty'], value: { samples: 200, seed: 1, inputs: next }, label });
    else dispatch({ type: 'valueSet', path: ['uncertainty', 'inputs'], value: next, label });
  };
  const rows = inputs.flatMap((d, i) => (matches(d, props.kinds, props.inlet) ? [{ d, i }] : []));
  const missing = props.kinds.filter((k) => !rows.some(({ d }) => d.input === k));
  return (
    <div className="uncertainty-rows" data-testid={props.testId}>
      {rows.map(({ d, i }) => {
        const what = WHAT[d.input];
        const base = ['uncertainty', 'inputs', i, 'distribution'] as const;
        const id = `${props.testId}-${d.input}`;
        return (
          <div key={i} className="uncertainty-row" data-testid={id}>
            <span className="uncertainty-label">
              {what.label} uncertain{what.unitText ? ` (${what.unitText})` : ''}:
            </span>
            <select
              aria-label={`${what.label} distribution`}
              data-testid={`${id}-kind`}
              value={d.distribution.kind}
              onChange={(e) => {
                const sd = d.distribution.kind === 'normal' ? d.distribution.sd : (d.distribution.max - d.distribution.min) / Math.sqrt(12);
                const mean = d.distribution.kind === 'normal' ? d.distribution.mean : (d.distribution.max + d.distribution.min) / 2;
                const next = e.target.value === 'uniform' ? { kind: 'uniform', min: mean - Math.sqrt(3) * sd, max: mean + Math.sqrt(3) * sd } : { kind: 'normal', mean, sd };
                dispatch({ type: 'valueSet', path: base, value: next, label: `${what.label} uncertainty distribution` });
              }}
            >
              <option value="normal">normal</option>
              <option value="uniform">uniform</option>
            </select>
            {d.distribution.kind === 'normal' ? (
              <QuantityField label="sd" path={[...base, 'sd']} unit={what.unit} testId={`${id}-sd`} />
            ) : (
              <>
                <QuantityField label="from" path={[...base, 'min']} unit={what.unit} testId={`${id}-min`} />
                <QuantityField label="to" path={[...base, 'max']} unit={what.unit} testId={`${id}-max`} />
              </>
            )}
            <ReasonField
              value={d.reason}
              testId={`${id}-reason`}
              onCommit={(reason) => dispatch({ type: 'valueSet', path: ['uncertainty', 'inputs', i, 'reason'], value: reason, label: `${what.label} uncertainty reason` })}
            />
            <button type="button" data-testid={`${id}-remove`} onClick={() => setInputs(inputs.filter((_, k) => k !== i), `Remove ${what.label} uncertainty`)}>
              Certain
            </button>
          </div>
        );
      })}
      {missing.map((k) => (
        <button
          key={k}
          type="button"
          className="uncertainty-add"
          data-testid={`${props.testId}-add-${k}`}
          onClick={() =>
            setInputs(
              [...inputs, { input: k, ...(props.inlet !== undefined ? { inlet: props.inlet } : {}), distribution: { kind: 'normal', mean: 0, sd: WHAT[k].sd }, reason: '' } as Declared],
              `Declare ${WHAT[k].label} uncertain`,
            )
          }
        >
          {WHAT[k].label}: uncertain…
        </button>
      ))}
    </div>
  );
}

function ReasonField(props: { readonly value: string; readonly testId: string; readonly onCommit: (reason: string) => void }) {
  const [text, setText] = useState(props.value);
  useEffect(() => setText(props.value), [props.value]);
  return (
    <input
      aria-label="reason"
      placeholder="why (source of the spread)"
      data-testid={props.testId}
      value={text}
      onChange={(e) => setText(e.target.value)}
      onBlur={() => text !== props.value && props.onCommit(text)}
      onKeyDown={(e) => e.key === 'Enter' && text !== props.value && props.onCommit(text)}
    />
  );
}
