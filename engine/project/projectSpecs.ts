/**
 * From the project file's layout (rows of `{ mach, value }`, SI numbers) to
 * the engine's SI specifications: PolarSpec, InletDesign, InstallationSettings,
 * CautionSettings. Pure renaming; no arithmetic beyond table transposition.
 */
import type { PolarSpec } from '../aero/polarSpec';
import { DEFAULT_CAUTION_SETTINGS, type CautionSettings } from '../cautions/cautionSettings';
import type { InletDesign } from '../propulsion/inletDesign';
import type { InstallationSettings } from '../propulsion/installationCorrections';
import { ROUNDED_PITOT_LIP_SUCTION, type LipSuction } from '../propulsion/lipSuction';
import type { Project, ProjectInlet } from './projectSchema';

/** The project's drag polar as a PolarSpec (SI). */
export function polarSpecOf(project: Project): PolarSpec {
  const p = project.polar;
  const comp = p.compressibility;
  return {
    cd0: { mach: p.cd0.map((r) => r.mach), cd0: p.cd0.map((r) => r.cd0) },
    cdIncrement: p.cdIncrement,
    induced:
      p.induced.kind === 'oswald'
        ? { kind: 'oswald', aspectRatio: p.induced.aspectRatio, oswaldEfficiency: p.induced.oswaldEfficiency }
        : { kind: 'table', mach: p.induced.rows.map((r) => r.mach), k: p.induced.rows.map((r) => r.k) },
    clMinDrag: p.clMinDrag,
    compressibility:
      comp.kind === 'none'
        ? { kind: 'none' }
        : comp.kind === 'korn'
          ? { kind: 'korn', sweep_rad: comp.sweep, thicknessRatio: comp.thicknessRatio, kornTechnologyFactor: comp.kornTechnologyFactor }
          : { kind: 'table', mach: comp.mach, cl: comp.cl, cdWave: comp.cdWave },
    buffetCl: { mach: p.buffetCl.map((r) => r.mach), cl: p.buffetCl.map((r) => r.cl) },
    clMax: { mach: p.clMax.map((r) => r.mach), cl: p.clMax.map((r) => r.cl) },
  };
}

/**
 * The inlet's lip suction: its table, its constant factor, or (neither given)
 * the rounded subsonic pitot lip default (engine/propulsion/lipSuction.ts).
 */
export function lipSuctionOf(inlet: ProjectInlet): { readonly lipSuction?: LipSuction } {
  const ls = inlet.lipSuction;
  if (ls?.kind === 'table') return { lipSuction: { kind: 'table', mach: ls.mach, massFlowRatio: ls.massFlowRatio, factor: ls.factor } };
  if (ls?.kind === 'roundedPitot' || inlet.lipSuctionFactor === undefined) return { lipSuction: ROUNDED_PITOT_LIP_SUCTION };
  return {};
}

/** A project inlet as an InletDesign (SI). */
export function inletDesignOf(inlet: ProjectInlet): InletDesign {
  const s = inlet.source;
  return {
    name: inlet.name,
    description: inlet.description,
    source:
      s.kind === 'recoveryTable'
        ? { kind: 'recoveryTable', captureArea_m2: s.captureArea, mach: s.rows.map((r) => r.mach), recovery: s.rows.map((r) => r.recovery) }
        : {
            kind: 'geometry',
            captureArea_m2: s.captureArea,
            throatArea_m2: s.throatArea,
            fanFaceArea_m2: s.fanFaceArea,
            diffuserLossCoefficient: s.diffuserLossCoefficient,
          },
    lipSuctionFactor: inlet.lipSuctionFactor ?? 0,
    ...lipSuctionOf(inlet),
    externalDragArea_m2: inlet.externalDragArea,
    weight_kg: inlet.weight,
  };
}

/** The project's installation settings (per engine, SI). */
export function installationOf(project: Project): InstallationSettings {
  const i = project.engine.installation;
  return {
    bleed:
      i.bleed.kind === 'coreFraction'
        ? { kind: 'coreFraction', fraction: i.bleed.fraction }
        : { kind: 'massFlow', bleed_kg_s: i.bleed.massFlow, coreFlowFraction: i.bleed.coreFlowFraction },
    powerExtraction_W: i.powerExtraction,
    ...(i.ramRecoveryFactor === undefined ? {} : { cRam: i.ramRecoveryFactor }),
    ...(i.bleedFactor === undefined ? {} : { cBleed: i.bleedFactor }),
    ...(i.ramFuelFlow === undefined ? {} : { ramFuelFlow: i.ramFuelFlow }),
    ...(i.ramSupersonicForm === undefined ? {} : { cRamSupersonicForm: i.ramSupersonicForm }),
    deckInterpolation: project.engine.deckInterpolation ?? 'corrected',
    ...(i.recoveryMethod === undefined ? {} : { method: i.recoveryMethod === 'raymer' ? 'raymerCorrections' : 'deckSensitivities' }),
  };
}

/** The project's caution thresholds: its overrides on DEFAULT_CAUTION_SETTINGS. */
export function cautionSettingsOf(project: Project): CautionSettings {
  const c = project.cautions;
  const d = DEFAULT_CAUTION_SETTINGS;
  // Every field written, in the interface's order (as DEFAULT_CAUTION_SETTINGS): a spread copy has a shape of its own,
  // and the installed model's caution reads went polymorphic in a process that had also used the defaults.
  return {
    minResidualClimbRate_m_s: c.minResidualClimbRate ?? d.minResidualClimbRate_m_s,
    minBuffetLoadFactor: c.minBuffetLoadFactor ?? d.minBuffetLoadFactor,
    vmoMargin_m_s: c.vmoMargin ?? d.vmoMargin_m_s,
    mmoMargin: c.mmoMargin ?? d.mmoMargin,
    minReserveFraction: c.minReserveFraction ?? d.minReserveFraction,
    cautionOnDeckExtrapolation: c.cautionOnDeckExtrapolation ?? d.cautionOnDeckExtrapolation,
    maxThroatMach: c.maxThroatMach ?? d.maxThroatMach,
    minFanFaceMach: c.minFanFaceMach ?? d.minFanFaceMach,
    maxFanFaceMach: c.maxFanFaceMach ?? d.maxFanFaceMach,
    maxSpillageShare: c.maxSpillageShare ?? d.maxSpillageShare,
  };
}

/** Maps a PolarSpec issue path (`cd0.cd0[3]`) to the project path (`polar.cd0[3].cd0`). */
export function polarIssuePath(specPath: string): string {
  const rows = /^(cd0|buffetCl|clMax)\.(\w+)\[(\d+)\]$/.exec(specPath);
  if (rows) return `polar.${rows[1]}[${rows[3]}].${rows[2]}`;
  const induced = /^induced\.(mach|k)\[(\d+)\]$/.exec(specPath);
  if (induced) return `polar.induced.rows[${induced[2]}].${induced[1]}`;
  const table = /^(cd0|buffetCl|clMax)\.(\w+)$/.exec(specPath);
  if (table) return `polar.${table[1]}`;
  if (specPath === 'compressibility.sweep_rad') return 'polar.compressibility.sweep';
  return `polar.${specPath}`;
}

/** Maps an InletDesign issue path (`source.recovery[2]`) to the project path under `inlets[index]`. */
export function inletIssuePath(index: number, designPath: string): string {
  const base = `inlets[${index}]`;
  const rows = /^source\.(mach|recovery)\[(\d+)\]$/.exec(designPath);
  if (rows) return `${base}.source.rows[${rows[2]}].${rows[1]}`;
  const renamed: Readonly<Record<string, string>> = {
    'source.mach': 'source.rows',
    'source.recovery': 'source.rows',
    'source.captureArea_m2': 'source.captureArea',
    'source.throatArea_m2': 'source.throatArea',
    'source.fanFaceArea_m2': 'source.fanFaceArea',
    externalDragArea_m2: 'externalDragArea',
    weight_kg: 'weight',
  };
  return `${base}.${renamed[designPath] ?? designPath}`;
}
