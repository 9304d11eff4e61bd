/**
 * Editors of the project's installation assumptions (docs/installation.md):
 * the recovery method, Raymer's C_ram and its supersonic form and fuel-flow
 * convention where Raymer's rule applies, and the deck interpolation
 * variables. A method the deck cannot fly is offered disabled with the reason.
 */
import { DEFAULT_C_RAM } from '../../engine/propulsion';
import type { Project } from '../../engine/project';
import { useStudy } from '../state/studyContext';
import { ChoiceField } from './ChoiceField';
import { QuantityField } from './QuantityField';

type Installation = Project['engine']['installation'];
type MethodChoice = 'deckDefault' | 'raymer' | 'deckSensitivities';

/** Why the deck-sensitivities method does not apply, or undefined when it does (or the deck is not loaded yet: the engine then checks). */
export function sensitivitiesUnavailable(hasSensitivities: boolean | undefined): string | undefined {
  return hasSensitivities === false ? 'the deck has no installation-sensitivity columns (a cycle-generated deck carries them)' : undefined;
}

/** Whether Raymer's rule is the method flown: set, or the default on a deck without sensitivity columns. */
export function raymerApplies(i: Installation, hasSensitivities: boolean | undefined): boolean {
  return i.recoveryMethod === 'raymer' || (i.recoveryMethod === undefined && hasSensitivities !== true);
}

export function InstallationFields(props: { readonly hasSensitivities: boolean | undefined }) {
  const { state, dispatch } = useStudy();
  const project = state.doc!.present;
  const i = project.engine.installation;
  const p = ['engine', 'installation'] as const;
  const raymer = raymerApplies(i, props.hasSensitivities);
  const defaultLabel = props.hasSensitivities === undefined ? "the deck's default (its sensitivity columns when it has them, else Raymer's rule)" : props.hasSensitivities ? "the deck's default (its sensitivity columns)" : "the deck's default (Raymer's rule: the deck has no sensitivity columns)";
  const sensitivitiesReason = sensitivitiesUnavailable(props.hasSensitivities);
  return (
    <>
      <ChoiceField<MethodChoice>
        label="Recovery method"
        testId="field-recovery-method"
        value={i.recoveryMethod ?? 'deckDefault'}
        choices={[
          { value: 'deckDefault', label: defaultLabel },
          { value: 'raymer', label: "Raymer's rule with C_ram" },
          { value: 'deckSensitivities', label: "The deck's sensitivity columns", ...(sensitivitiesReason === undefined || i.recoveryMethod === 'deckSensitivities' ? {} : { unavailable: sensitivitiesReason }) },
        ]}
        onChoose={(m) => dispatch({ type: 'valueSet', path: [...p, 'recoveryMethod'], value: m === 'deckDefault' ? undefined : m, label: 'Set recovery method' })}
      />
      {i.recoveryMethod === 'deckSensitivities' && sensitivitiesReason !== undefined ? (
        <p className="field-error" role="alert" data-testid="recovery-method-refused">
          engine.installation.recoveryMethod: {sensitivitiesReason}; the study is not flown until you choose Raymer's rule or the deck's default.
        </p>
      ) : null}
      {raymer ? (
        <>
          <QuantityField label={`Ram-recovery factor C_ram (blank: Raymer's subsonic value ${DEFAULT_C_RAM})`} path={[...p, 'ramRecoveryFactor']} unit="dimensionless" testId="field-c-ram" optional />
          <ChoiceField<'supersonic' | 'held'>
            label="C_ram above Mach 1"
            testId="field-ram-supersonic"
            value={i.ramSupersonicForm === false ? 'held' : 'supersonic'}
            choices={[
              { value: 'supersonic', label: "Raymer's supersonic form, C_ram - 0.15 (M - 1)" },
              { value: 'held', label: 'held at the subsonic value' },
            ]}
            onChoose={(v) => dispatch({ type: 'valueSet', path: [...p, 'ramSupersonicForm'], value: v === 'held' ? false : undefined, label: 'Set C_ram above Mach 1' })}
          />
          <ChoiceField<'heldAtPower' | 'scaledWithRecovery'>
            label="Fuel flow under Raymer's rule"
            testId="field-ram-fuel-flow"
            value={i.ramFuelFlow ?? 'heldAtPower'}
            choices={[
              { value: 'heldAtPower', label: 'held at the power setting' },
              { value: 'scaledWithRecovery', label: 'scaled with recovery (a corrected-flow engine)' },
            ]}
            onChoose={(v) => dispatch({ type: 'valueSet', path: [...p, 'ramFuelFlow'], value: v === 'heldAtPower' ? undefined : v, label: 'Set fuel-flow convention' })}
          />
        </>
      ) : (
        <p className="small" data-testid="raymer-not-applied">C_ram, its supersonic form and the fuel-flow convention apply to Raymer's rule only; the deck's sensitivity columns are flown.</p>
      )}
      <ChoiceField<'corrected' | 'raw'>
        label="Deck interpolation variables"
        testId="field-deck-interpolation"
        value={project.engine.deckInterpolation ?? 'corrected'}
        choices={[
          { value: 'corrected', label: 'corrected parameters (thrust, fuel flow and airflow over free-stream total conditions)' },
          { value: 'raw', label: 'raw tabulated thrust, fuel flow and airflow' },
        ]}
        onChoose={(v) => dispatch({ type: 'valueSet', path: ['engine', 'deckInterpolation'], value: v === 'corrected' ? undefined : v, label: 'Set deck interpolation variables' })}
      />
    </>
  );
}
