/**
 * The project flown by every recovery method that applies to it, for the
 * side-by-side recovery trade factor (engine/analysis/recoveryTradeByMethod.ts):
 * Raymer's rule with fuel flow held at the power setting, Raymer's rule
 * with fuel flow scaled with recovery, the deck's own sensitivity columns
 * (when the deck has them), and the cycle (when the engine is a cycle: its
 * deck's sensitivities are computed through the cycle).
 */
import type { RecoveryMethodCase } from '../analysis/recoveryTradeByMethod';
import type { EngineDeck } from '../propulsion/engineDeck';
import { missionInputOnDeck } from './buildMissionInput';
import type { Project } from './projectSchema';

type Installation = Project['engine']['installation'];

/** The cases for `inletName` (default the active inlet) on the project's deck already built. */
export function recoveryMethodVariants(project: Project, deck: EngineDeck, inletName?: string): RecoveryMethodCase[] {
  const withInstallation = (changes: Partial<Installation>): Project => ({ ...project, engine: { ...project.engine, installation: { ...project.engine.installation, ...changes } } });
  const build = (p: Project): RecoveryMethodCase['input'] => {
    const r = missionInputOnDeck(p, deck, inletName === undefined ? {} : { inletName });
    return r.ok ? r.value : { unavailable: r.error.map((e) => e.message).join('; ') };
  };
  const isCycle = project.engine.deck.kind === 'cycle';
  const noSensitivities = { unavailable: `the deck "${deck.title}" has no installation-sensitivity columns` };
  return [
    { id: 'raymerHeld', label: "Raymer's rule, fuel flow held at the power setting", input: build(withInstallation({ recoveryMethod: 'raymer', ramFuelFlow: 'heldAtPower' })) },
    { id: 'raymerScaled', label: "Raymer's rule, fuel flow scaled with recovery", input: build(withInstallation({ recoveryMethod: 'raymer', ramFuelFlow: 'scaledWithRecovery' })) },
    {
      id: 'deckSensitivities',
      label: "the deck's sensitivity columns",
      input: isCycle ? { unavailable: 'the engine is a cycle: its deck sensitivities are the cycle row' } : deck.hasSensitivities ? build(withInstallation({ recoveryMethod: 'deckSensitivities' })) : noSensitivities,
    },
    {
      id: 'cycle',
      label: 'the cycle (its deck sensitivities, computed through the cycle)',
      input: !isCycle ? { unavailable: 'the engine is a deck, not a cycle (engine.deck.kind "cycle" makes it one)' } : deck.hasSensitivities ? build(withInstallation({ recoveryMethod: 'deckSensitivities' })) : noSensitivities,
    },
  ];
}
