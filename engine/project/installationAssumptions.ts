/**
 * The installation assumptions a project's results rest on, in words, for
 * every report that depends on them (fly, compare, trade, uncertainty, the
 * app): the recovery method and its convention, each inlet's lip suction,
 * the spillage-share caution and what the deck is interpolated in.
 * docs/installation.md says what each means and where it comes from.
 */
import { DEFAULT_C_RAM } from '../propulsion/installationCorrections';
import { DECK_INTERPOLATION_TEXT } from '../propulsion/deckCorrection';
import { ROUNDED_PITOT_LIP_SOURCE } from '../propulsion/lipSuction';
import type { Project } from './projectSchema';
import { cautionSettingsOf } from './projectSpecs';

export interface InstallationAssumption {
  readonly id: 'recoveryMethod' | 'lipSuction' | 'spillageCaution' | 'deckInterpolation';
  readonly text: string;
}

/** The assumptions, one line each (lip suction one line per inlet). */
export function installationAssumptions(project: Project, deckHasSensitivities?: boolean): InstallationAssumption[] {
  const i = project.engine.installation;
  const bySensitivities = i.recoveryMethod === 'deckSensitivities' || (i.recoveryMethod === undefined && deckHasSensitivities === true);
  const cRam = i.ramRecoveryFactor ?? DEFAULT_C_RAM;
  const supersonic = i.ramSupersonicForm ?? true;
  const fuel = i.ramFuelFlow ?? 'heldAtPower';
  const raymer = `Raymer's rule: thrust loss C_ram (eta_ref - eta), C_ram ${cRam}`;
  const out: InstallationAssumption[] = [
    bySensitivities
      ? { id: 'recoveryMethod', text: "Recovery, bleed and extraction by the deck's own sensitivity columns (first order about each deck point; a cycle deck's are computed through the cycle)." }
      : {
      id: 'recoveryMethod',
      text:
        `Recovery effect by ${raymer}${i.ramRecoveryFactor === undefined ? " (Raymer's subsonic value)" : ''}` +
        `${supersonic ? `, falling as ${cRam} - 0.15 (M - 1) above Mach 1 (Raymer's supersonic form)` : ', held above Mach 1'}; ` +
        (fuel === 'heldAtPower' ? 'fuel flow held at the power setting' : 'fuel flow scaled with recovery eta/eta_ref (a corrected-flow engine)') +
        (i.recoveryMethod === undefined && deckHasSensitivities === undefined ? " (a deck with sensitivity columns uses those instead)." : '.'),
      },
  ];
  for (const inlet of project.inlets) {
    const ls = inlet.lipSuction;
    const text =
      ls?.kind === 'table'
        ? `a table over ${ls.mach.length} Mach x ${ls.massFlowRatio.length} mass-flow ratios`
        : ls?.kind === 'roundedPitot' || inlet.lipSuctionFactor === undefined
          ? `the rounded subsonic pitot lip default (${ROUNDED_PITOT_LIP_SOURCE})`
          : `constant ${inlet.lipSuctionFactor} of the additive drag`;
    out.push({ id: 'lipSuction', text: `Lip suction of "${inlet.name}": ${text}; spillage drag = (1 - lip suction) x additive drag (NACA Report 1187).` });
  }
  out.push({ id: 'spillageCaution', text: `Caution when spillage drag exceeds ${(100 * cautionSettingsOf(project).maxSpillageShare).toFixed(1)} % of an engine's thrust above flight idle.` });
  out.push({ id: 'deckInterpolation', text: `The ${DECK_INTERPOLATION_TEXT[project.engine.deckInterpolation ?? 'corrected']}.` });
  return out;
}
