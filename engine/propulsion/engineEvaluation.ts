/**
 * One engine's installed point, as pure functions over an explicit scratch
 * record: deck point -> inlet recovery and airflow (inletFlow.ts,
 * inletRecovery.ts) -> the installation-correction step
 * (installationMethod.ts) -> spillage drag (spillageDrag.ts); then the
 * cautions of the point (engine/cautions) and the whole-aircraft
 * InstalledPoint. The scratch is reused inside a query and never escapes:
 * `assembleInstalledPoint` copies what it needs into a fresh object.
 */
import type { Caution } from '../cautions/caution';
import { checkThroatMach } from '../cautions/checks';
import { propulsionCautionShown, type CautionSettings } from '../cautions/cautionSettings';
import {
  checkFanFaceMach,
  checkSpillageShare,
  lipSuctionTableRangeCaution,
  deckLookupFailedCaution,
  noAirflowCaution,
  recoveryTableRangeCaution,
  throatChokedCaution,
} from '../cautions/propulsionCautions';
import type { AccessError, DeckAccess } from './deckAccess';
import { referenceRecoveryAt, type ReferenceRecovery } from './engineDeck';
import { geometryInletFlow, streamTubeArea, type FreeStream } from './inletFlow';
import { tableRecovery, type PreparedInlet } from './inletRecovery';
import type { LipSuctionValue, PreparedLipSuction } from './lipSuction';
import { correctDeckPointInto, type InstallationMethodId, type MutableCorrectedDeckPoint } from './installationMethod';
import type { InstallationSensitivities } from './installationSensitivities';
import type { InstallationSettings } from './installationCorrections';
import { milE5008bRecovery } from './milE5008b';
import type { DeckAxis, FlightCondition, InstalledPoint } from './propulsionModel';
import { additiveDrag_N, spillageDrag } from './spillageDrag';
import { sameNumber } from '../core/sameNumber';

export const NO_CAUTIONS: readonly Caution[] = Object.freeze([]);
const NO_AXES: readonly DeckAxis[] = Object.freeze([]);

/** The fixed parts of one installation, prepared once per model. */
export interface InstallationContext {
  /** Design whose recovery, throat and fan-face Mach are used. */
  readonly recoveryInlet: PreparedInlet;
  /** Capture area (m^2) and lip-suction factor (-) of the design that sets spillage. */
  readonly spillCapture_m2: number;
  readonly spillLip: number;
  /** The spillage design's lip suction over Mach and mass-flow ratio; null = the constant `spillLip`. */
  readonly spillLipTable: PreparedLipSuction | null;
  readonly installation: InstallationSettings;
  readonly method: InstallationMethodId;
  /** Added to the inlet's recovery (-), e.g. +0.01 for a trade factor; 0 normally. */
  readonly recoveryOffset: number;
  readonly referenceRecovery: ReferenceRecovery;
  readonly cautionSettings: CautionSettings;
  readonly engineCount: number;
  /** The deck's flight-idle power (-), null when it names none: no spillage-share caution at or below it. */
  readonly idlePower: number | null;
}

/**
 * Scratch of one engine evaluation (SI, per engine). Mutated only by the `...Into` functions below. Its optional
 * numbers (airflows, mass-flow ratio, throat and fan-face Mach) hold NaN for "none" and are never null: a field that
 * ever holds null keeps every number stored in it as a heap number of its own (an allocation and a write barrier
 * per store, thousands a mission), one that holds only numbers is updated in place. The NaN stays inside this
 * module: assembleInstalledPoint and the cautions turn it back into null (`orNull`).
 */
export interface EngineScratch {
  /**
   * Uninstalled deck thrust (N), fuel flow (kg/s), the physical airflow at
   * the inlet's recovery and the deck's own airflow (kg/s, NaN without an
   * airflow column), and the deck's sensitivities (null without them).
   */
  readonly deck: {
    thrust_N: number;
    fuelFlow_kg_s: number;
    airflow_kg_s: number;
    deckAirflow_kg_s: number;
    sensitivities: InstallationSensitivities | null;
  };
  /** Inlet recovery pt2/pt0 (-) and the deck's reference recovery (-). */
  readonly inlet: { recovery: number; referenceRecovery: number; mach: number };
  /** NaN when not computed (no airflow, or no throat and fan face for a recovery table). */
  massFlowRatio: number;
  throatMach: number;
  fanFaceMach: number;
  throatChoked: boolean;
  fanFaceChoked: boolean;
  tableOutside: 'below' | 'above' | null;
  /** After the installation-correction step, before spillage (N, kg/s, kg/s). */
  correctedThrust_N: number;
  fuelFlow_kg_s: number;
  /** NaN without an airflow column. */
  airflow_kg_s: number;
  /** The method's thrust loss parts (N): recovery (negative: a gain), bleed, extraction. */
  recoveryLoss_N: number;
  bleedLoss_N: number;
  extractionLoss_N: number;
  spillage_N: number;
  /** Lip suction used (-) and whether its table was left (edge held). */
  lipSuction: number;
  lipTableOutside: boolean;
  deckError: AccessError | null;
  outside: readonly DeckAxis[];
  deckCautions: readonly Caution[];
  /** The correction step's result and the lip-suction answer (reused). */
  readonly corrected: MutableCorrectedDeckPoint;
  readonly lip: LipSuctionValue;
  /** One-entry memo of a recovery table's value at a flight Mach (a pure function of it): Mach, recovery, outside. */
  memoMach: number;
  memoRecovery: number;
  memoOutside: 'below' | 'above' | null;
}

export function newEngineScratch(): EngineScratch {
  return {
    deck: { thrust_N: 0, fuelFlow_kg_s: 0, airflow_kg_s: Number.NaN, deckAirflow_kg_s: Number.NaN, sensitivities: null },
    inlet: { recovery: 1, referenceRecovery: 1, mach: 0 },
    massFlowRatio: Number.NaN,
    throatMach: Number.NaN,
    fanFaceMach: Number.NaN,
    throatChoked: false,
    fanFaceChoked: false,
    tableOutside: null,
    correctedThrust_N: 0,
    fuelFlow_kg_s: 0,
    airflow_kg_s: Number.NaN,
    recoveryLoss_N: 0,
    bleedLoss_N: 0,
    extractionLoss_N: 0,
    spillage_N: 0,
    lipSuction: 0,
    lipTableOutside: false,
    deckError: null,
    outside: NO_AXES,
    deckCautions: NO_CAUTIONS,
    corrected: { thrust_N: 0, fuelFlow_kg_s: 0, airflow_kg_s: Number.NaN, method: 'raymerCorrections', recoveryLoss_N: 0, bleedLoss_N: 0, extractionLoss_N: 0 },
    lip: { factor: 0, outside: false },
    memoMach: Number.NaN,
    memoRecovery: 1,
    memoOutside: null,
  };
}

/**
 * Installs one engine's deck point into `s`: recovery (and, with airflow,
 * the physical airflow scaled by eta/eta_ref), throat and fan-face Mach of
 * the recovery design; the correction step; spillage from the spillage
 * design's capture area at the corrected airflow (NACA Report 1187 additive
 * drag less lip suction). Thrust N, fuel kg/s, airflow kg/s (null: none);
 * `sensitivities` are the deck's at the point (null: none), needed by the
 * deckSensitivities method.
 */
export function installDeckPointInto(
  s: EngineScratch,
  ctx: InstallationContext,
  free: FreeStream,
  deckThrust_N: number,
  deckFuelFlow_kg_s: number,
  deckAirflow_kg_s: number | null,
  sensitivities: InstallationSensitivities | null,
): void {
  const mach = free.mach;
  s.throatMach = Number.NaN;
  s.fanFaceMach = Number.NaN;
  s.massFlowRatio = Number.NaN;
  s.throatChoked = false;
  s.fanFaceChoked = false;
  s.tableOutside = null;
  s.spillage_N = 0;
  s.lipSuction = ctx.spillLip;
  s.lipTableOutside = false;
  const inlet = s.inlet;
  const deck = s.deck;
  inlet.referenceRecovery = referenceRecoveryAt(ctx.referenceRecovery, mach);
  inlet.mach = mach;
  deck.thrust_N = deckThrust_N;
  deck.fuelFlow_kg_s = deckFuelFlow_kg_s;
  deck.deckAirflow_kg_s = deckAirflow_kg_s ?? Number.NaN;
  deck.sensitivities = sensitivities;
  const source = ctx.recoveryInlet.design.source;
  if (source.kind === 'geometry') {
    if (deckAirflow_kg_s !== null) {
      const flow = geometryInletFlow(source, free, deckAirflow_kg_s, inlet.referenceRecovery);
      inlet.recovery = flow.recovery;
      deck.airflow_kg_s = flow.airflow_kg_s;
      s.throatMach = flow.throatMach;
      s.fanFaceMach = flow.fanFaceMach;
      s.throatChoked = flow.throatChoked;
      s.fanFaceChoked = flow.fanFaceChoked;
    } else {
      // Without airflow only the shock part of the recovery is known.
      inlet.recovery = milE5008bRecovery(mach);
      deck.airflow_kg_s = Number.NaN;
    }
  } else {
    if (!sameNumber(s.memoMach, mach)) {
      const r = tableRecovery(ctx.recoveryInlet.table!, mach);
      s.memoMach = mach;
      s.memoRecovery = r.recovery;
      s.memoOutside = r.outside;
    }
    inlet.recovery = s.memoRecovery;
    s.tableOutside = s.memoOutside;
    deck.airflow_kg_s = deckAirflow_kg_s === null ? Number.NaN : (deckAirflow_kg_s * s.memoRecovery) / inlet.referenceRecovery;
  }
  if (ctx.recoveryOffset !== 0) {
    if (!Number.isNaN(deck.airflow_kg_s) && inlet.recovery > 0) deck.airflow_kg_s *= (inlet.recovery + ctx.recoveryOffset) / inlet.recovery;
    inlet.recovery += ctx.recoveryOffset;
  }
  // The step reads a NaN airflow as none and passes it through (installationMethod.ts correctDeckPointInto).
  const corrected = correctDeckPointInto(s.corrected, ctx.method, deck, inlet, ctx.installation);
  s.correctedThrust_N = corrected.thrust_N;
  s.fuelFlow_kg_s = corrected.fuelFlow_kg_s;
  s.airflow_kg_s = corrected.airflow_kg_s ?? Number.NaN;
  s.recoveryLoss_N = corrected.recoveryLoss_N;
  s.bleedLoss_N = corrected.bleedLoss_N;
  s.extractionLoss_N = corrected.extractionLoss_N;
  if (!Number.isNaN(s.airflow_kg_s)) {
    const m = spillMemo;
    if (m.ctx === ctx && sameNumber(m.airflow_kg_s, s.airflow_kg_s) && sameNumber(m.mach, mach) && sameNumber(m.pressure_Pa, free.pressure_Pa) && sameNumber(m.temperature_K, free.temperature_K)) {
      s.massFlowRatio = m.massFlowRatio;
      s.spillage_N = m.spillage_N;
      s.lipSuction = m.lipSuction;
      s.lipTableOutside = m.lipTableOutside;
      return;
    }
    const a0 = streamTubeArea(s.airflow_kg_s, free);
    s.massFlowRatio = Number.isFinite(a0) ? a0 / ctx.spillCapture_m2 : Number.NaN;
    if (!Number.isNaN(s.massFlowRatio)) {
      const add_N = additiveDrag_N(mach, free.pressure_Pa, s.massFlowRatio, ctx.spillCapture_m2);
      if (ctx.spillLipTable !== null && add_N > 0) {
        const lip = s.lip;
        ctx.spillLipTable.atInto(mach, s.massFlowRatio, lip);
        s.lipSuction = lip.factor;
        s.lipTableOutside = lip.outside;
      }
      s.spillage_N = spillageDrag(add_N, s.lipSuction);
    }
    m.ctx = ctx;
    m.airflow_kg_s = s.airflow_kg_s;
    m.mach = mach;
    m.pressure_Pa = free.pressure_Pa;
    m.temperature_K = free.temperature_K;
    m.massFlowRatio = s.massFlowRatio;
    m.spillage_N = s.spillage_N;
    m.lipSuction = s.lipSuction;
    m.lipTableOutside = s.lipTableOutside;
  }
}

/**
 * One-entry memo of installDeckPointInto's spillage step, whose answer (mass-flow ratio, spillage drag, lip suction
 * and whether its table was left) is a pure function of the installation and the free stream (Mach, static pressure
 * and temperature) and the corrected airflow, keyed by them (the context by identity, the numbers by Object.is).
 * The part-power solve's root is where its last curve point was installed, so the full lookup that follows there
 * finds the additive drag (a Newton solve for the capture Mach) and the lip suction instead of computing them again.
 * Module-level (the engine is single-threaded per realm) so that every scratch shares it.
 */
const spillMemo: {
  ctx: InstallationContext | null;
  airflow_kg_s: number;
  mach: number;
  pressure_Pa: number;
  temperature_K: number;
  /** NaN when not computed. */
  massFlowRatio: number;
  spillage_N: number;
  lipSuction: number;
  lipTableOutside: boolean;
} = {
  ctx: null,
  airflow_kg_s: Number.NaN,
  mach: Number.NaN,
  pressure_Pa: Number.NaN,
  temperature_K: Number.NaN,
  massFlowRatio: Number.NaN,
  spillage_N: 0,
  lipSuction: 0,
  lipTableOutside: false,
};

/**
 * Evaluates one engine at `power` into `s` through the full deck lookup. A
 * refused lookup leaves zero thrust and fuel flow at the reference recovery
 * and records the deck's error (raised as deck_lookup_failed).
 */
export function evaluateEngineInto(
  s: EngineScratch,
  ctx: InstallationContext,
  access: DeckAccess,
  condition: FlightCondition,
  free: FreeStream,
  power: number,
): void {
  const looked = access.lookup(condition, power);
  if (!looked.ok) {
    installDeckPointInto(s, ctx, free, 0, 0, null, null);
    s.deckError = looked.error;
    s.correctedThrust_N = 0;
    s.fuelFlow_kg_s = 0;
    s.recoveryLoss_N = 0;
    s.bleedLoss_N = 0;
    s.extractionLoss_N = 0;
    s.inlet.recovery = s.inlet.referenceRecovery;
    s.outside = NO_AXES;
    s.deckCautions = NO_CAUTIONS;
    return;
  }
  const d = looked.value;
  s.deckError = null;
  s.outside = d.outside;
  s.deckCautions = d.cautions;
  installDeckPointInto(s, ctx, free, d.thrust_N, d.fuelFlow_kg_s, d.airflow_kg_s, d.sensitivities);
}

/** A scratch number as the points carry it: null for the scratch's NaN ("none"). */
function orNull(x: number): number | null {
  return Number.isNaN(x) ? null : x;
}

/** Installed net propulsive force of one engine in `s` (N): corrected thrust less spillage. */
export function netThrustOf(s: EngineScratch): number {
  return s.correctedThrust_N - s.spillage_N;
}

/** The cautions of the point in `s`, after `extra` (rating fallbacks); built by engine/cautions, in a fixed order. */
export function engineCautions(s: EngineScratch, ctx: InstallationContext, extra: readonly Caution[]): readonly Caution[] {
  // Pushed inline (no helper closure: this runs on every propulsion query).
  const settings = ctx.cautionSettings;
  const design = ctx.recoveryInlet.design;
  let list: Caution[] | null = extra.length === 0 ? null : [...extra];
  if (s.deckError) (list ??= []).push(deckLookupFailedCaution(s.deckError.code, s.deckError.message));
  for (const c of s.deckCautions) {
    if (propulsionCautionShown(c, settings)) (list ??= []).push(c);
  }
  if (Number.isNaN(s.airflow_kg_s) && !s.deckError) (list ??= []).push(noAirflowCaution(design.source.kind === 'geometry'));
  if (s.tableOutside !== null) (list ??= []).push(recoveryTableRangeCaution(s.tableOutside, design.name, s.inlet.recovery));
  const throat = checkThroatMach(orNull(s.throatMach), settings.maxThroatMach);
  if (throat !== null) (list ??= []).push(throat);
  if (s.throatChoked) (list ??= []).push(throatChokedCaution(design.name));
  const fanFace = checkFanFaceMach(orNull(s.fanFaceMach), settings.minFanFaceMach, settings.maxFanFaceMach, s.fanFaceChoked);
  if (fanFace !== null) (list ??= []).push(fanFace);
  if (s.lipTableOutside) (list ??= []).push(lipSuctionTableRangeCaution(s.lipSuction, Number.isNaN(s.massFlowRatio) ? 0 : s.massFlowRatio));
  return list ?? extra;
}

/** The whole-aircraft point (every engine) of the engine in `s` at `condition` and `power`, with its cautions. */
export function assembleInstalledPoint(
  s: EngineScratch,
  ctx: InstallationContext,
  condition: FlightCondition,
  power: number,
  extraCautions: readonly Caution[],
): InstalledPoint {
  let extra = extraCautions;
  const perEngineThrust_N = netThrustOf(s);
  const thrust_N = perEngineThrust_N * ctx.engineCount;
  // Spillage share: only where thrust is asked for (above flight idle), not in idle descents where the idling engine spills most of its stream tube.
  const spill = ctx.idlePower !== null && power <= ctx.idlePower ? null : checkSpillageShare(s.spillage_N, s.correctedThrust_N, ctx.cautionSettings.maxSpillageShare);
  if (spill !== null) extra = extra.length === 0 ? [spill] : [...extra, spill];
  const fuelFlow_kg_s = s.fuelFlow_kg_s * ctx.engineCount;
  return {
    altitude_m: condition.altitude_m,
    mach: condition.mach,
    isaDev_K: condition.isaDev_K,
    power,
    thrust_N,
    fuelFlow_kg_s,
    tsfc_kg_N_s: thrust_N > 0 ? fuelFlow_kg_s / thrust_N : null,
    perEngine: {
      uninstalledThrust_N: s.deck.thrust_N,
      uninstalledFuelFlow_kg_s: s.deck.fuelFlow_kg_s,
      correctedThrust_N: s.correctedThrust_N,
      spillageDrag_N: s.spillage_N,
      thrust_N: perEngineThrust_N,
      fuelFlow_kg_s: s.fuelFlow_kg_s,
      airflow_kg_s: orNull(s.airflow_kg_s),
      recovery: s.inlet.recovery,
      referenceRecovery: s.inlet.referenceRecovery,
      massFlowRatio: orNull(s.massFlowRatio),
      throatMach: orNull(s.throatMach),
      fanFaceMach: orNull(s.fanFaceMach),
      installationMethod: ctx.method,
      recoveryLoss_N: s.recoveryLoss_N,
      bleedLoss_N: s.bleedLoss_N,
      extractionLoss_N: s.extractionLoss_N,
    },
    outsideTable: s.outside,
    cautions: engineCautions(s, ctx, extra),
  };
}
