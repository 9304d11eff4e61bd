/**
 * The recovery method declared uncertain (engine/uncertainty, docs/uncertainty.md):
 * a discrete distribution over the methods, each with a weight. The
 * deck-sensitivities alternative is offered disabled, with the reason, on a
 * deck without sensitivity columns.
 */
import type { Project } from '../../engine/project';
import { useStudy } from '../state/studyContext';
import { QuantityField } from './QuantityField';
import { sensitivitiesUnavailable } from './InstallationFields';

type Declared = NonNullable<Project['uncertainty']>['inputs'][number];
type MethodDecl = Extract<Declared, { input: 'recoveryMethod' }>;
type Alt = MethodDecl['alternatives'][number]['method'];

const ALTERNATIVES: readonly { readonly method: Alt; readonly label: string }[] = [
  { method: 'raymerHeld', label: "Raymer's rule, fuel flow held at the power setting" },
  { method: 'raymerScaled', label: "Raymer's rule, fuel flow scaled with recovery" },
  { method: 'deckSensitivities', label: "the deck's sensitivity columns" },
];

export function RecoveryMethodUncertainty(props: { readonly hasSensitivities: boolean | undefined }) {
  const { state, dispatch } = useStudy();
  const project = state.doc!.present;
  const inputs = project.uncertainty?.inputs ?? [];
  const at = inputs.findIndex((d) => d.input === 'recoveryMethod');
  const decl = at >= 0 ? (inputs[at] as MethodDecl) : null;
  const setInputs = (next: readonly Declared[], label: string) => {
    if (project.uncertainty === undefined) dispatch({ type: 'valueSet', path: ['uncertainty'], value: { samples: 200, seed: 1, inputs: next }, label });
    else dispatch({ type: 'valueSet', path: ['uncertainty', 'inputs'], value: next, label });
  };
  const reason = sensitivitiesUnavailable(props.hasSensitivities);
  if (decl === null) {
    return (
      <button
        type="button"
        className="uncertainty-add"
        data-testid="uncertain-recovery-method-add"
        onClick={() =>
          setInputs([...inputs, { input: 'recoveryMethod', alternatives: [{ method: 'raymerHeld', weight: 1 }, { method: 'raymerScaled', weight: 1 }], reason: '' }], 'Declare the recovery method uncertain')
        }
      >
        Recovery method: uncertain…
      </button>
    );
  }
  const base = ['uncertainty', 'inputs', at, 'alternatives'] as const;
  return (
    <div className="uncertainty-row" data-testid="uncertain-recovery-method">
      <span className="uncertainty-label">Recovery method uncertain (each sample flies one, by weight):</span>
      {ALTERNATIVES.map((a) => {
        const k = decl.alternatives.findIndex((x) => x.method === a.method);
        const blocked = reason !== undefined && a.method === 'deckSensitivities' && k < 0;
        return (
          <div key={a.method}>
            <label className="toggle">
              <input
                type="checkbox"
                data-testid={`uncertain-recovery-method-${a.method}`}
                checked={k >= 0}
                disabled={blocked || (k >= 0 && decl.alternatives.length === 1)}
                onChange={(e) =>
                  dispatch({
                    type: 'valueSet',
                    path: base,
                    value: e.target.checked ? [...decl.alternatives, { method: a.method, weight: 1 }] : decl.alternatives.filter((x) => x.method !== a.method),
                    label: `${e.target.checked ? 'Add' : 'Remove'} recovery-method alternative`,
                  })
                }
              />{' '}
              {a.label}
            </label>
            {blocked ? <span className="small" data-testid={`uncertain-recovery-method-${a.method}-unavailable`}> unavailable: {reason}</span> : null}
            {k >= 0 ? <QuantityField label="weight" path={[...base, k, 'weight']} unit="dimensionless" testId={`uncertain-recovery-method-${a.method}-weight`} /> : null}
          </div>
        );
      })}
      <button type="button" data-testid="uncertain-recovery-method-remove" onClick={() => setInputs(inputs.filter((_, i) => i !== at), 'Remove recovery-method uncertainty')}>
        Certain
      </button>
    </div>
  );
}
