/**
 * The installed propulsion model on top of any uninstalled deck reached
 * through a small `DeckAccess` seam (installedPropulsion.ts wires it to the
 * engine deck and the standard atmosphere). Per engine: deck point ->
 * inlet recovery, mass-flow ratio, throat and fan-face Mach -> Raymer's
 * ram-recovery, bleed and power-extraction corrections -> minus spillage
 * drag; then times the engine count. Bookkeeping in propulsionModel.ts and
 * docs/installation.md.
 */
import type { Caution } from '../cautions/caution';
import type { CautionSettings } from '../cautions/cautionSettings';
import { brent } from '../core/rootFind';
import type { Result } from '../core/result';
import type { ReferenceRecovery } from './engineDeck';
import type { DeckLookup } from './deckLookup';
import type { InletDesign } from './inletDesign';
import { geometryInletFlow, streamTubeArea, type FreeStream } from './inletFlow';
import { prepareInlet, tableRecovery, type PreparedInlet } from './inletRecovery';
import { milE5008bRecovery } from './milE5008b';
import {
  applyInstallationCorrections,
  bleedFraction,
  validateInstallation,
  type InstallationSettings,
} from './installationCorrections';
import { additiveDrag, spillageDrag } from './spillageDrag';
import type {
  DeckAxis,
  EnginePoint,
  FlightCondition,
  InstalledPoint,
  PartPowerPoint,
  PropulsionModel,
  RatingName,
  ThrustLimit,
} from './propulsionModel';

/** One engine's uninstalled deck numbers at a condition and power: the deck lookup's own result. */
export type DeckPoint = DeckLookup;

/** A failed deck or atmosphere query: a literal code and a readable message. */
export interface AccessError {
  readonly code: string;
  readonly message: string;
}

/** What the installed model needs from an uninstalled deck and the atmosphere. */
export interface DeckAccess {
  readonly title: string;
  readonly parametric: boolean;
  readonly hasAirflow: boolean;
  readonly referenceRecovery: ReferenceRecovery;
  lookup(condition: FlightCondition, power: number): Result<DeckPoint, AccessError>;
  /** Power-axis value of a rating, or null when the deck does not name it. */
  ratingPower(rating: RatingName): number | null;
  /** Smallest and largest power on the deck at this condition. */
  powerBounds(condition: FlightCondition): { readonly idle: number; readonly max: number };
  /** Uninstalled power for a per-engine thrust (a first guess), or null. */
  powerForThrust(condition: FlightCondition, thrust_N: number, ceilingPower: number): number | null;
  /**
   * Optional fast path for solves at one condition: prepares the deck at
   * `condition` and returns an evaluator writing thrust (N) and airflow
   * (kg/s, NaN without airflow) at a power into out[0], out[1]; false when
   * the deck refuses. Must agree with `lookup`. The evaluator may share
   * buffers: it is valid until the next `curveAt` call.
   */
  curveAt?(condition: FlightCondition): (power: number, out: Float64Array) => boolean;
  /** Free-stream static pressure (Pa) and temperature (K). */
  ambient(condition: FlightCondition): Result<{ readonly pressure_Pa: number; readonly temperature_K: number }, AccessError>;
}

export interface InstalledModelOptions {
  readonly engineCount: number;
  /** The inlet applied (its name labels the model). */
  readonly inlet: InletDesign;
  /** Design whose recovery (and throat/fan-face Mach) is used; default `inlet`. */
  readonly recoveryFrom?: InletDesign;
  /** Design whose capture area and lip suction set the spillage drag; default `inlet`. */
  readonly spillageFrom?: InletDesign;
  readonly installation: InstallationSettings;
  readonly cautionSettings: CautionSettings;
}

/** Relative thrust tolerance of `forThrust` (-): |installed - required| <= this x required (or 1e-6 N). */
export const FOR_THRUST_TOLERANCE = 1e-7;

const NO_CAUTIONS: readonly Caution[] = Object.freeze([]);
const NO_AXES: readonly DeckAxis[] = Object.freeze([]);

/** Scratch of one engine evaluation (reused inside a query; never escapes). */
interface Scratch {
  deckThrust: number;
  deckFuel: number;
  airflow: number | null;
  correctedThrust: number;
  spillage: number;
  fuel: number;
  recovery: number;
  referenceRecovery: number;
  massFlowRatio: number | null;
  throatMach: number | null;
  fanFaceMach: number | null;
  throatChoked: boolean;
  fanFaceChoked: boolean;
  tableOutside: 'below' | 'above' | null;
  deckError: AccessError | null;
  outside: readonly DeckAxis[];
  deckCautions: readonly Caution[];
}

function newScratch(): Scratch {
  return {
    deckThrust: 0,
    deckFuel: 0,
    airflow: null,
    correctedThrust: 0,
    spillage: 0,
    fuel: 0,
    recovery: 1,
    referenceRecovery: 1,
    massFlowRatio: null,
    throatMach: null,
    fanFaceMach: null,
    throatChoked: false,
    fanFaceChoked: false,
    tableOutside: null,
    deckError: null,
    outside: NO_AXES,
    deckCautions: NO_CAUTIONS,
  };
}

function unwrapInlet(design: InletDesign, role: string): PreparedInlet {
  const prepared = prepareInlet(design);
  if (!prepared.ok) {
    throw new Error(`inlet design "${design.name}" (${role}) is invalid: ${prepared.error.map((i) => `${i.path}: ${i.message}`).join('; ')}`);
  }
  return prepared.value;
}

function fmt(x: number, digits = 3): string {
  return Number.isFinite(x) ? x.toFixed(digits) : String(x);
}

/**
 * Builds the installed PropulsionModel over `access`. Options are checked
 * here: invalid inlet designs or installation settings are a caller bug
 * (validate them first with validateInletDesign / validateInstallation)
 * and throw with every issue and its field path.
 */
export function makeInstalledModel(access: DeckAccess, options: InstalledModelOptions): PropulsionModel {
  const engineCount = options.engineCount;
  if (!Number.isInteger(engineCount) || engineCount < 1) {
    throw new Error(`engineCount is ${engineCount}, expected a whole number >= 1`);
  }
  const installIssues = validateInstallation(options.installation, access.hasAirflow);
  if (installIssues.length > 0) {
    throw new Error(`installation settings are invalid: ${installIssues.map((i) => `${i.path}: ${i.message}`).join('; ')}`);
  }
  unwrapInlet(options.inlet, 'inlet');
  const recoveryInlet = unwrapInlet(options.recoveryFrom ?? options.inlet, 'recoveryFrom');
  const spillageInlet = unwrapInlet(options.spillageFrom ?? options.inlet, 'spillageFrom');
  const spillCapture_m2 = spillageInlet.design.source.captureArea_m2;
  const spillLip = spillageInlet.design.lipSuctionFactor;
  const settings = options.cautionSettings;
  const installation = options.installation;
  const ratingCache = new Map<RatingName, number | null>();
  const scratch = newScratch();

  function ratingPower(rating: RatingName): number | null {
    if (!ratingCache.has(rating)) ratingCache.set(rating, access.ratingPower(rating));
    return ratingCache.get(rating)!;
  }

  const curveOut = new Float64Array(2);
  const fastScratch = newScratch();

  function referenceAt(mach: number): number {
    return access.referenceRecovery.kind === 'constant' ? access.referenceRecovery.value : milE5008bRecovery(mach);
  }

  /**
   * Installation of one engine's deck point into `s`: recovery (and, with
   * airflow, the physical airflow scaled by eta/eta_ref), throat and
   * fan-face Mach, spillage from the spillage design's capture area, then
   * the Raymer corrections.
   */
  function installInto(s: Scratch, mach: number, free: FreeStream, deckThrust: number, deckFuel: number, deckAirflow: number | null): void {
    s.throatMach = null;
    s.fanFaceMach = null;
    s.massFlowRatio = null;
    s.throatChoked = false;
    s.fanFaceChoked = false;
    s.tableOutside = null;
    s.spillage = 0;
    s.referenceRecovery = referenceAt(mach);
    s.deckThrust = deckThrust;
    s.deckFuel = deckFuel;
    const source = recoveryInlet.design.source;
    if (source.kind === 'geometry') {
      if (deckAirflow !== null) {
        const flow = geometryInletFlow(source, free, deckAirflow, s.referenceRecovery);
        s.recovery = flow.recovery;
        s.airflow = flow.airflow_kg_s;
        s.throatMach = flow.throatMach;
        s.fanFaceMach = flow.fanFaceMach;
        s.throatChoked = flow.throatChoked;
        s.fanFaceChoked = flow.fanFaceChoked;
      } else {
        // Without airflow only the shock part of the recovery is known.
        s.recovery = milE5008bRecovery(mach);
        s.airflow = null;
      }
    } else {
      const r = tableRecovery(recoveryInlet.table!, mach);
      s.recovery = r.recovery;
      s.tableOutside = r.outside;
      s.airflow = deckAirflow === null ? null : (deckAirflow * r.recovery) / s.referenceRecovery;
    }
    if (s.airflow !== null) {
      const a0 = streamTubeArea(s.airflow, free);
      s.massFlowRatio = Number.isFinite(a0) ? a0 / spillCapture_m2 : null;
      if (s.massFlowRatio !== null) {
        s.spillage = spillageDrag(additiveDrag(mach, free.pressure_Pa, s.massFlowRatio, spillCapture_m2).drag_N, spillLip);
      }
    }
    const corrected = applyInstallationCorrections(
      deckThrust,
      deckFuel,
      s.referenceRecovery,
      s.recovery,
      bleedFraction(installation.bleed, s.airflow),
      installation,
    );
    s.correctedThrust = corrected.thrust_N;
    s.fuel = corrected.fuelFlow_kg_s;
  }

  /** Evaluates one engine at `power` into `s` through the full deck lookup. */
  function evaluateInto(s: Scratch, condition: FlightCondition, free: FreeStream, power: number): void {
    const deck = access.lookup(condition, power);
    if (!deck.ok) {
      installInto(s, condition.mach, free, 0, 0, null);
      s.deckError = deck.error;
      s.correctedThrust = 0;
      s.fuel = 0;
      s.recovery = s.referenceRecovery;
      s.outside = NO_AXES;
      s.deckCautions = NO_CAUTIONS;
      return;
    }
    const d = deck.value;
    s.deckError = null;
    s.outside = d.outside;
    s.deckCautions = d.cautions;
    installInto(s, condition.mach, free, d.thrust_N, d.fuelFlow_kg_s, d.airflow_kg_s);
  }

  function cautionsOf(s: Scratch, source: InletDesign['source']): readonly Caution[] {
    // Pushed inline (no helper closure: this runs on every propulsion query).
    let list: Caution[] | null = null;
    if (s.deckError) {
      (list ??= []).push({ id: 'deck_lookup_failed', severity: 'warning', message: `Deck lookup failed (${s.deckError.code}): ${s.deckError.message}; thrust and fuel flow set to 0.` });
    }
    for (const c of s.deckCautions) {
      if (!settings.cautionOnDeckExtrapolation && c.id === 'deck_extrapolation') continue;
      (list ??= []).push(c);
    }
    if (s.airflow === null && !s.deckError) {
      (list ??= []).push({
        id: 'no_airflow_spillage_skipped',
        severity: 'info',
        message:
          source.kind === 'geometry'
            ? 'The deck has no airflow column: spillage drag, mass-flow ratio, throat and fan-face Mach not computed; recovery excludes the diffuser loss.'
            : 'The deck has no airflow column: spillage drag and mass-flow ratio not computed.',
      });
    }
    if (s.tableOutside !== null) {
      (list ??= []).push({
        id: 'inlet_recovery_table_range',
        severity: 'caution',
        message: `Flight Mach is ${s.tableOutside} the inlet recovery table of "${recoveryInlet.design.name}"; its end recovery ${fmt(s.recovery, 4)} is held.`,
        value: s.recovery,
      });
    }
    if (s.throatMach !== null && s.throatMach > settings.maxThroatMach) {
      (list ??= []).push({
        id: 'throat_mach_high',
        severity: 'caution',
        message: `Inlet throat Mach ${fmt(s.throatMach)} is above the limit ${fmt(settings.maxThroatMach)}.`,
        value: s.throatMach,
        threshold: settings.maxThroatMach,
      });
    }
    if (s.throatChoked) {
      (list ??= []).push({
        id: 'inlet_throat_choked',
        severity: 'warning',
        message: `The inlet throat of "${recoveryInlet.design.name}" is choked: the engine asks for more airflow than the throat passes at Mach 1; figures assume throat Mach 1.`,
        value: 1,
      });
    }
    if (s.fanFaceMach !== null && (s.fanFaceMach < settings.minFanFaceMach || s.fanFaceMach > settings.maxFanFaceMach)) {
      const low = s.fanFaceMach < settings.minFanFaceMach;
      (list ??= []).push({
        id: 'fan_face_mach_range',
        severity: 'caution',
        message: `Fan-face Mach ${fmt(s.fanFaceMach)} is outside the band ${fmt(settings.minFanFaceMach)} to ${fmt(settings.maxFanFaceMach)}${s.fanFaceChoked ? ' (fan face choked)' : ''}.`,
        value: s.fanFaceMach,
        threshold: low ? settings.minFanFaceMach : settings.maxFanFaceMach,
      });
    }
    return list ?? NO_CAUTIONS;
  }

  function perEngineOf(s: Scratch): EnginePoint {
    return {
      uninstalledThrust_N: s.deckThrust,
      uninstalledFuelFlow_kg_s: s.deckFuel,
      correctedThrust_N: s.correctedThrust,
      spillageDrag_N: s.spillage,
      thrust_N: s.correctedThrust - s.spillage,
      fuelFlow_kg_s: s.fuel,
      airflow_kg_s: s.airflow,
      recovery: s.recovery,
      referenceRecovery: s.referenceRecovery,
      massFlowRatio: s.massFlowRatio,
      throatMach: s.throatMach,
      fanFaceMach: s.fanFaceMach,
    };
  }

  function cautionsWith(s: Scratch, extra: readonly Caution[]): readonly Caution[] {
    const own = cautionsOf(s, recoveryInlet.design.source);
    return extra.length === 0 ? own : own.length === 0 ? extra : [...extra, ...own];
  }

  function assemble(s: Scratch, condition: FlightCondition, power: number, extra: readonly Caution[]): InstalledPoint {
    const thrust_N = (s.correctedThrust - s.spillage) * engineCount;
    const fuelFlow_kg_s = s.fuel * engineCount;
    return {
      altitude_m: condition.altitude_m,
      mach: condition.mach,
      isaDev_K: condition.isaDev_K,
      power,
      thrust_N,
      fuelFlow_kg_s,
      tsfc_kg_N_s: thrust_N > 0 ? fuelFlow_kg_s / thrust_N : null,
      perEngine: perEngineOf(s),
      outsideTable: s.outside,
      cautions: cautionsWith(s, extra),
    };
  }

  /** As assemble, with the part-power fields written into the same literal (an object spread per query was a measurable cost). */
  function assemblePartPower(
    s: Scratch,
    condition: FlightCondition,
    power: number,
    extra: readonly Caution[],
    limit: ThrustLimit,
    thrustRequired_N: number,
  ): PartPowerPoint {
    const thrust_N = (s.correctedThrust - s.spillage) * engineCount;
    const fuelFlow_kg_s = s.fuel * engineCount;
    return {
      altitude_m: condition.altitude_m,
      mach: condition.mach,
      isaDev_K: condition.isaDev_K,
      power,
      thrust_N,
      fuelFlow_kg_s,
      tsfc_kg_N_s: thrust_N > 0 ? fuelFlow_kg_s / thrust_N : null,
      perEngine: perEngineOf(s),
      outsideTable: s.outside,
      cautions: cautionsWith(s, extra),
      limit,
      thrustRequired_N,
    };
  }

  /**
   * Free stream at a condition. An altitude the standard atmosphere does not
   * serve (-5 km to 71 km) is a caller bug: conditions are validated upstream.
   */
  function freeStreamOf(condition: FlightCondition): FreeStream {
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

  /** Rating power, or the deck's bound with a caution when the deck does not name the rating. */
  const namedRatings = new Map<RatingName, { readonly power: number; readonly caution: null }>();

  function resolveRating(condition: FlightCondition, rating: RatingName): { readonly power: number; readonly caution: Caution | null } {
    const named = namedRatings.get(rating);
    if (named !== undefined) return named;
    const p = ratingPower(rating);
    if (p !== null) {
      const resolved = { power: p, caution: null };
      namedRatings.set(rating, resolved);
      return resolved;
    }
    const bounds = access.powerBounds(condition);
    const power = rating === 'flightIdle' ? bounds.idle : bounds.max;
    return {
      power,
      caution: {
        id: 'rating_not_in_deck',
        severity: 'caution',
        message: `The deck names no "${rating}" rating; the deck's ${rating === 'flightIdle' ? 'lowest' : 'highest'} power ${fmt(power, 4)} is used.`,
        value: power,
      },
    };
  }

  function atPower(condition: FlightCondition, power: number): InstalledPoint {
    checkCondition(condition);
    if (!Number.isFinite(power)) throw new RangeError(`installed propulsion: power setting is ${power}, expected a finite number`);
    const free = freeStreamOf(condition);
    evaluateInto(scratch, condition, free, power);
    return assemble(scratch, condition, power, NO_CAUTIONS);
  }

  function atRating(condition: FlightCondition, rating: RatingName): InstalledPoint {
    checkCondition(condition);
    const { power, caution } = resolveRating(condition, rating);
    const free = freeStreamOf(condition);
    evaluateInto(scratch, condition, free, power);
    return assemble(scratch, condition, power, caution ? [caution] : NO_CAUTIONS);
  }

  // State of the one forThrust solve in progress (set at its start, read by the residual below; never escapes a call).
  // Named functions instead of per-call closures: forThrust runs thousands of times per mission.
  let solveCondition: FlightCondition | null = null;
  let solveFree: FreeStream | null = null;
  let solveCurve: ((power: number, out: Float64Array) => boolean) | undefined;
  let solveRequired = 0;

  /** Installed thrust per engine (N) at `power` for the solve in progress: the deck's fixed-condition curve when it offers one, else full lookups. */
  function solveThrustAt(power: number): number {
    if (solveCurve !== undefined && solveCurve(power, curveOut)) {
      const air = curveOut[1]!;
      installInto(fastScratch, solveCondition!.mach, solveFree!, curveOut[0]!, 0, Number.isNaN(air) ? null : air);
      return fastScratch.correctedThrust - fastScratch.spillage;
    }
    evaluateInto(scratch, solveCondition!, solveFree!, power);
    return scratch.correctedThrust - scratch.spillage;
  }

  function solveResidual(power: number): number {
    return solveThrustAt(power) - solveRequired;
  }

  function partPowerPoint(
    condition: FlightCondition,
    free: FreeStream,
    power: number,
    limit: ThrustLimit,
    thrustRequired_N: number,
    extra: readonly Caution[],
  ): PartPowerPoint {
    evaluateInto(scratch, condition, free, power);
    return assemblePartPower(scratch, condition, power, extra, limit, thrustRequired_N);
  }

  function forThrust(condition: FlightCondition, thrustRequired_N: number, ceilingRating: RatingName = 'maxCruise'): PartPowerPoint {
    checkCondition(condition);
    if (!Number.isFinite(thrustRequired_N)) {
      throw new RangeError(`installed propulsion: thrust required is ${thrustRequired_N}, expected a finite number`);
    }
    const free = freeStreamOf(condition);
    const ceiling = resolveRating(condition, ceilingRating);
    const idle = resolveRating(condition, 'flightIdle');
    const extra: readonly Caution[] =
      ceiling.caution === null && idle.caution === null ? NO_CAUTIONS : [ceiling.caution, idle.caution].filter((c): c is Caution => c !== null);
    const perEngineRequired = thrustRequired_N / engineCount;
    solveCondition = condition;
    solveFree = free;
    solveCurve = access.curveAt?.(condition);
    solveRequired = perEngineRequired;
    const curve = solveCurve;
    const hiThrust = solveThrustAt(ceiling.power);
    const hiDeck = curve ? fastScratch.deckThrust : scratch.deckThrust;
    if (hiThrust <= perEngineRequired) {
      return partPowerPoint(condition, free, ceiling.power, hiThrust === perEngineRequired ? 'within' : 'above_rating', thrustRequired_N, extra);
    }
    const loThrust = solveThrustAt(idle.power);
    if (loThrust >= perEngineRequired) {
      return partPowerPoint(condition, free, idle.power, loThrust === perEngineRequired ? 'within' : 'below_idle', thrustRequired_N, extra);
    }
    // First guess: the deck inversion at the uninstalled thrust scaled by the
    // ceiling's installed/uninstalled ratio, when the deck has no fast curve
    // (the inversion costs several lookups); Brent's method from the bracket.
    let lo = idle.power;
    let hi = ceiling.power;
    if (!curve) {
      const ratio = hiThrust > 0 ? hiDeck / hiThrust : 1;
      const guess = access.powerForThrust(condition, perEngineRequired * ratio, ceiling.power);
      if (guess !== null && guess > lo && guess < hi) {
        const g = solveResidual(guess);
        if (g === 0) return partPowerPoint(condition, free, guess, 'within', thrustRequired_N, extra);
        if (g > 0) hi = guess;
        else lo = guess;
      }
    }
    const fTol = FOR_THRUST_TOLERANCE * Math.max(Math.abs(perEngineRequired), 10);
    const root = brent(solveResidual, lo, hi, {
      fTol,
      xTol: 1e-12 * Math.max(1, Math.abs(ceiling.power - idle.power)),
      maxIterations: 100,
    });
    if (!root.ok) {
      // Thrust is bracketed between idle and the ceiling, so only a non-monotone or broken deck lands here.
      throw new Error(`installed propulsion: forThrust could not solve for ${fmt(thrustRequired_N, 1)} N: ${root.error.message}`);
    }
    return partPowerPoint(condition, free, root.value.x, 'within', thrustRequired_N, extra);
  }

  return {
    engineCount,
    label: access.title,
    parametric: access.parametric,
    inletName: options.inlet.name,
    atRating,
    atPower,
    forThrust,
  };
}
