/**
 * Mission inputs that mix two inlet designs factor by factor (recovery,
 * spillage, external drag, weight), for the A-vs-B attribution.
 */
import type { CautionSettings } from '../cautions/cautionSettings';
import type { MissionInput } from '../mission/missionTypes';
import type { EngineDeck } from '../propulsion/engineDeck';
import type { InletDesign } from '../propulsion/inletDesign';
import type { InstallationSettings } from '../propulsion/installationCorrections';
import { makeInstalledPropulsion } from '../propulsion/installedPropulsion';
import type { PropulsionModel } from '../propulsion/propulsionModel';
import type { FactorChoice, InletFactorBuilder } from './inletComparison';

export interface InletPair {
  /** Mission inputs of design A and design B (from engine/project buildMissionInput). */
  readonly inputA: MissionInput;
  readonly inputB: MissionInput;
  readonly inletA: InletDesign;
  readonly inletB: InletDesign;
  readonly deck: EngineDeck;
  readonly engineCount: number;
  readonly installation: InstallationSettings;
  readonly cautionSettings: CautionSettings;
}

/**
 * A builder for compareInlets: the airframe (OEW with the inlet weight) from
 * the weight choice, the polar (with the inlet's external drag increment)
 * from the external-drag choice, and the installed propulsion from the
 * recovery and spillage choices; mixed propulsion is
 * makeInstalledPropulsion with `recoveryFrom` / `spillageFrom`. All-A and
 * all-B return design A's and design B's own inputs.
 */
export function inletFactorBuilder(pair: InletPair): InletFactorBuilder {
  const hybrids = new Map<string, PropulsionModel>();
  const propulsionFor = (choice: FactorChoice): PropulsionModel => {
    if (choice.recovery === 'A' && choice.spillage === 'A') return pair.inputA.propulsion;
    if (choice.recovery === 'B' && choice.spillage === 'B') return pair.inputB.propulsion;
    const key = `${choice.recovery}${choice.spillage}`;
    let model = hybrids.get(key);
    if (!model) {
      const recoveryFrom = choice.recovery === 'A' ? pair.inletA : pair.inletB;
      const spillageFrom = choice.spillage === 'A' ? pair.inletA : pair.inletB;
      model = makeInstalledPropulsion({
        deck: pair.deck,
        engineCount: pair.engineCount,
        inlet: recoveryFrom,
        recoveryFrom,
        spillageFrom,
        installation: pair.installation,
        cautionSettings: pair.cautionSettings,
      });
      hybrids.set(key, model);
    }
    return model;
  };
  return (choice) => ({
    ...pair.inputA,
    airframe: choice.weight === 'A' ? pair.inputA.airframe : pair.inputB.airframe,
    aero: choice.externalDrag === 'A' ? pair.inputA.aero : pair.inputB.aero,
    propulsion: propulsionFor(choice),
  });
}
