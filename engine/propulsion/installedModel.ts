/**
 * The installed propulsion model on top of any uninstalled deck reached
 * through the DeckAccess seam (deckAccess.ts; installedPropulsion.ts wires
 * it to the engine deck and the standard atmosphere). Per engine: deck
 * point -> inlet recovery, mass-flow ratio, throat and fan-face Mach -> the
 * installation-correction step (installationMethod.ts) -> minus spillage
 * drag (engineEvaluation.ts); then times the engine count. Part power:
 * partPowerSolve.ts. Bookkeeping in propulsionModel.ts and
 * docs/installation.md.
 */
import type { Caution } from '../cautions/caution';
import type { CautionSettings } from '../cautions/cautionSettings';
import { ratingNotInDeckCaution } from '../cautions/propulsionCautions';
import type { DeckAccess } from './deckAccess';
import {
  assembleInstalledPoint,
  evaluateEngineInto,
  newEngineScratch,
  NO_CAUTIONS,
  type InstallationContext,
} from './engineEvaluation';
import { expectOk } from '../core/result';
import { prepareLipSuction } from './lipSuction';
import type { InletDesign } from './inletDesign';
import type { FreeStream } from './inletFlow';
import { prepareInlet, type PreparedInlet } from './inletRecovery';
import { createRatingMemo, RATING_MEMO_ENTRIES } from './ratingMemo';
import { defaultInstallationMethod, type InstallationMethodId } from './installationMethod';
import { validateInstallation, type InstallationSettings } from './installationCorrections';
import { newPartPowerSolve, PART_POWER_MEMO_CONDITIONS, solvedFuelFlow, solvedScratch, solvePartPower, type PartPowerRoot } from './partPowerSolve';
import { conditionKey, propulsionModelOf, sameFlightCondition, type FlightCondition, type InstalledPoint, type PartPowerPoint, type PropulsionModel, type RatingName, type SlopeBreaks, type ThrustLimit } from './propulsionModel';

export type { AccessError, DeckAccess, DeckPoint } from './deckAccess';
export { FOR_THRUST_TOLERANCE } from './partPowerSolve';

export interface InstalledModelOptions {
  readonly engineCount: number;
  /** The inlet applied (its name labels the model). */
  readonly inlet: InletDesign;
  /** Design whose recovery (and throat/fan-face Mach) is used; default `inlet`. */
  readonly recoveryFrom?: InletDesign;
  /** Design whose capture area and lip suction set the spillage drag; default `inlet`. */
  readonly spillageFrom?: InletDesign;
  readonly installation: InstallationSettings;
  /**
   * How the deck point is corrected to the installation; default the deck's
   * sensitivities when it carries them, else raymerCorrections.
   */
  readonly method?: InstallationMethodId;
  /**
   * Added to the inlet's recovery (-), e.g. +0.01 for a trade factor; the
   * installation method then carries it through (default 0).
   */
  readonly recoveryOffset?: number;
  readonly cautionSettings: CautionSettings;
  /**
   * Entries of the model's rating memo (ratingMemo.ts; default RATING_MEMO_ENTRIES): its answers do not depend on
   * it, only how often a point is computed again.
   */
  readonly ratingMemoEntries?: number;
  /**
   * Conditions the part-power memo holds (partPowerSolve.ts; default PART_POWER_MEMO_CONDITIONS): its answers do not
   * depend on it either.
   */
  readonly partPowerMemoConditions?: number;
}

function unwrapInlet(design: InletDesign, role: string): PreparedInlet {
  const prepared = prepareInlet(design);
  if (!prepared.ok) {
    throw new Error(`inlet design "${design.name}" (${role}) is invalid: ${prepared.error.map((i) => `${i.path}: ${i.message}`).join('; ')}`);
  }
  return prepared.value;
}

/** The checked, prepared installation of `options` over `access`; invalid options are a caller bug and throw with every issue. */
function installationContext(access: DeckAccess, options: InstalledModelOptions): InstallationContext {
  const engineCount = options.engineCount;
  if (!Number.isInteger(engineCount) || engineCount < 1) {
    throw new Error(`engineCount is ${engineCount}, expected a whole number >= 1`);
  }
  const installIssues = validateInstallation(options.installation, access.hasAirflow);
  if (installIssues.length > 0) {
    throw new Error(`installation settings are invalid: ${installIssues.map((i) => `${i.path}: ${i.message}`).join('; ')}`);
  }
  const method = options.method ?? options.installation.method ?? defaultInstallationMethod(access.hasSensitivities);
  if (method === 'deckSensitivities' && !access.hasSensitivities) {
    throw new Error(`installation method deckSensitivities needs a deck with sensitivity columns; deck "${access.title}" has none`);
  }
  const recoveryOffset = options.recoveryOffset ?? 0;
  if (!Number.isFinite(recoveryOffset) || Math.abs(recoveryOffset) > 0.5) {
    throw new Error(`recoveryOffset is ${recoveryOffset}, expected a finite number within +-0.5`);
  }
  unwrapInlet(options.inlet, 'inlet');
  const recoveryInlet = unwrapInlet(options.recoveryFrom ?? options.inlet, 'recoveryFrom');
  const spillageInlet = unwrapInlet(options.spillageFrom ?? options.inlet, 'spillageFrom');
  return {
    recoveryInlet,
    spillCapture_m2: spillageInlet.design.source.captureArea_m2,
    spillLip: spillageInlet.design.lipSuctionFactor,
    spillLipTable: spillageInlet.design.lipSuction === undefined ? null : expectOk(prepareLipSuction(spillageInlet.design.lipSuction), 'lip suction (validated with the design)'),
    installation: options.installation,
    method,
    recoveryOffset,
    referenceRecovery: access.referenceRecovery,
    cautionSettings: options.cautionSettings,
    engineCount,
    idlePower: access.ratingPower('flightIdle'),
  };
}

/**
 * Free stream at a condition. An altitude the standard atmosphere does not
 * serve (-5 km to 71 km) is a caller bug: conditions are validated upstream.
 */
function freeStreamOf(access: DeckAccess, condition: FlightCondition): FreeStream {
  const amb = access.ambient(condition);
  if (!amb.ok) {
    throw new RangeError(`installed propulsion: no atmosphere at altitude ${condition.altitude_m} m, ISA deviation ${condition.isaDev_K} K: ${amb.error.message}`);
  }
  return { mach: condition.mach, pressure_Pa: amb.value.pressure_Pa, temperature_K: amb.value.temperature_K };
}

function checkCondition(condition: FlightCondition): void {
  if (!Number.isFinite(condition.altitude_m) || !Number.isFinite(condition.isaDev_K) || !(condition.mach >= 0) || !Number.isFinite(condition.mach)) {
    throw new RangeError(
      `installed propulsion: flight condition must be finite with Mach >= 0, got altitude ${condition.altitude_m} m, Mach ${condition.mach}, ISA dev ${condition.isaDev_K} K`,
    );
  }
}

interface ResolvedRating {
  readonly power: number;
  readonly caution: Caution | null;
}

/** Rating power: the deck's own value (cached in `named`), else the deck's bound at the condition with a caution. */
function resolveRating(access: DeckAccess, named: Map<RatingName, ResolvedRating | null>, condition: FlightCondition, rating: RatingName): ResolvedRating {
  let entry = named.get(rating);
  if (entry === undefined) {
    const p = access.ratingPower(rating);
    entry = p === null ? null : { power: p, caution: null };
    named.set(rating, entry);
  }
  if (entry !== null) return entry;
  const bounds = access.powerBounds(condition);
  const lowest = rating === 'flightIdle';
  const power = lowest ? bounds.idle : bounds.max;
  return { power, caution: ratingNotInDeckCaution(rating, lowest, power) };
}

/**
 * Builds the installed PropulsionModel over `access`. Options are checked
 * here: invalid inlet designs or installation settings are a caller bug
 * (validate them first with validateInletDesign / validateInstallation)
 * and throw with every issue and its field path.
 */
/** The deck's slope breaks (grid altitudes, Machs and powers) with the recovery table's Machs added. */
function installedSlopeBreaks(access: DeckAccess, ctx: InstallationContext): SlopeBreaks | undefined {
  const deck = access.slopeBreaks;
  const recovery = ctx.recoveryInlet.table?.x ?? [];
  if (deck === undefined && recovery.length === 0) return undefined;
  const machs = [...new Set([...(deck?.machs ?? []), ...recovery])].sort((a, b) => a - b);
  return deck?.powers === undefined ? { altitudes_m: deck?.altitudes_m ?? [], machs } : { altitudes_m: deck.altitudes_m, machs, powers: deck.powers };
}

export function makeInstalledModel(access: DeckAccess, options: InstalledModelOptions): PropulsionModel {
  const ctx = installationContext(access, options);
  const scratch = newEngineScratch();
  const solve = newPartPowerSolve(ctx, access, scratch, options.partPowerMemoConditions ?? PART_POWER_MEMO_CONDITIONS);
  const named = new Map<RatingName, ResolvedRating | null>();

  function pointAt(condition: FlightCondition, free: FreeStream, power: number, extra: readonly Caution[]): InstalledPoint {
    evaluateEngineInto(scratch, ctx, access, condition, free, power);
    return assembleInstalledPoint(scratch, ctx, condition, power, extra);
  }

  function atPower(condition: FlightCondition, power: number): InstalledPoint {
    checkCondition(condition);
    if (!Number.isFinite(power)) throw new RangeError(`installed propulsion: power setting is ${power}, expected a finite number`);
    return pointAt(condition, freeStream(condition), power, NO_CAUTIONS);
  }

  // Bounded memo of the points at a rating, keyed by the condition's three numbers (Object.is) and the rating alone:
  // the model's answer at a rating is a pure function of them, so a repeated query returns the same point, shared
  // (points are read-only; freezing each cost 5 % of atRating). A converged demo solve asks 811 times for 143
  // distinct points; the memo lives as long as the model, across the passes and the missions flown on it.
  const ratingMemo = createRatingMemo(options.ratingMemoEntries ?? RATING_MEMO_ENTRIES);

  // One-entry memo of the free stream, keyed by the condition's three numbers alone (a pure function of them).
  let freeKey: FlightCondition | null = null;
  let freeValue: FreeStream = { mach: 0, pressure_Pa: 0, temperature_K: 0 };
  function freeStream(condition: FlightCondition): FreeStream {
    if (freeKey === null || !sameFlightCondition(freeKey, condition)) {
      freeValue = freeStreamOf(access, condition);
      freeKey = conditionKey(condition);
    }
    return freeValue;
  }

  function atRating(condition: FlightCondition, rating: RatingName): InstalledPoint {
    checkCondition(condition);
    const memo = ratingMemo.get(condition, rating);
    if (memo !== undefined) return memo;
    const { power, caution } = resolveRating(access, named, condition, rating);
    const point = pointAt(condition, freeStream(condition), power, caution ? [caution] : NO_CAUTIONS);
    ratingMemo.setEntry(condition, rating, point);
    return point;
  }

  /** The part-power root for forThrust and fuelFlowForThrust (same checks, same solve), with the rating fallbacks' cautions. */
  function partPowerRoot(condition: FlightCondition, thrustRequired_N: number, ceilingRating: RatingName): { root: PartPowerRoot & { ok: true }; free: FreeStream; extra: readonly Caution[] } {
    checkCondition(condition);
    if (!Number.isFinite(thrustRequired_N)) {
      throw new RangeError(`installed propulsion: thrust required is ${thrustRequired_N}, expected a finite number`);
    }
    const free = freeStream(condition);
    const ceiling = resolveRating(access, named, condition, ceilingRating);
    const idle = resolveRating(access, named, condition, 'flightIdle');
    const extra: readonly Caution[] =
      ceiling.caution === null && idle.caution === null ? NO_CAUTIONS : [ceiling.caution, idle.caution].filter((c): c is Caution => c !== null);
    const root = solvePartPower(solve, condition, free, thrustRequired_N / ctx.engineCount, idle.power, ceiling.power);
    if (!root.ok) {
      // Thrust is bracketed between idle and the ceiling, so only a non-monotone or broken deck lands here.
      throw new Error(`installed propulsion: forThrust could not solve for ${thrustRequired_N.toFixed(1)} N: ${root.error.message}`);
    }
    return { root, free, extra };
  }

  function forThrust(condition: FlightCondition, thrustRequired_N: number, ceilingRating: RatingName = 'maxCruise'): PartPowerPoint {
    const { root, free, extra } = partPowerRoot(condition, thrustRequired_N, ceilingRating);
    // The solve's last curve evaluation at the root when it has one (the usual case), else a full one there.
    const solved = solvedScratch(solve, root.power);
    const point = (solved !== null ? assembleInstalledPoint(solved, ctx, condition, root.power, extra) : pointAt(condition, free, root.power, extra)) as InstalledPoint & {
      limit: ThrustLimit;
      thrustRequired_N: number;
    };
    point.limit = root.limit;
    point.thrustRequired_N = thrustRequired_N;
    return point;
  }

  function fuelFlowForThrust(condition: FlightCondition, thrustRequired_N: number, ceilingRating: RatingName = 'maxCruise'): number {
    const { root } = partPowerRoot(condition, thrustRequired_N, ceilingRating);
    return solvedFuelFlow(solve, root.power) * ctx.engineCount;
  }

  return propulsionModelOf({
    engineCount: ctx.engineCount,
    label: access.title,
    parametric: access.parametric,
    inletName: options.inlet.name,
    slopeBreaks: installedSlopeBreaks(access, ctx),
    installationMethod: ctx.method,
    atRating,
    atPower,
    forThrust,
    fuelFlowForThrust,
    withRecoveryOffset: (delta) => makeInstalledModel(access, { ...options, recoveryOffset: ctx.recoveryOffset + delta }),
  });
}
