/**
 * Messages between the renderer and the engine worker. Requests carry the
 * project (SI) and the deck file; replies carry plain data (structured clone).
 */
import type { InstallationMethodId, RatingName } from '../../engine/propulsion';
import type { CrossoverResult, EnvelopeResult, InletComparisonResult, OptimumAltitudeResult, SpecificRangeResult, PayloadRangeResult, RecoveryTradeByMethod, TradeFactorsResult } from '../../engine/analysis';
import type { UncertaintyResult } from '../../engine/uncertainty';
import type { MissionResult } from '../../engine/mission';
import type { Project, SweepAxis, SweepRow } from '../../engine/project';
import type { Result } from '../../engine/core';
import type { StudyFailure } from '../../engine/study';
import type { DeckFile } from '../state/studyState';
import type { CycleDesignSummary, CyclePointResult, CycleSpec, CycleThrottle } from '../../engine/cycle';

export interface StudyInputs {
  readonly project: Project;
  readonly deckFile: DeckFile | null;
}

export interface CrossoverRequestQuery {
  readonly altitude_m: number;
  readonly mass_kg: number;
  readonly rating: RatingName;
  readonly isaDev_K: number;
  /** Also compute the curves of every other inlet design. */
  readonly allInlets: boolean;
}

/** The engine view's cycle point (ISA deviation in K) and the throttles of its Mach curves. */
export interface CycleViewQuery {
  readonly point: { readonly altitude_m: number; readonly mach: number; readonly isaDev_K: number; readonly throttle: CycleThrottle };
  readonly curveRating: RatingName;
  /** Mechanical fan speed of the fixed-speed curves, fraction of design. */
  readonly curveFanSpeed: number;
}

/**
 * A cycle file's engine view: `deckFile` is the cycle text; `project` the
 * project that names it as its engine (its active inlet and installation give
 * the installed curves), or null for a cycle opened on its own.
 */
export interface CycleViewRequest {
  readonly kind: 'cycleView';
  readonly project: Project | null;
  readonly deckFile: DeckFile;
  readonly query: CycleViewQuery;
}

/** The level-flight envelope's condition (the CLI's `envelope` verb with the same defaults). */
export interface EnvelopeRequestQuery {
  readonly mass_kg: number;
  readonly rating: RatingName;
  readonly isaDev_K: number;
  /** Highest altitude of the rows and the ceiling search (m). */
  readonly top_m: number;
  /** Altitude step of the rows (m). */
  readonly step_m: number;
}

/** Specific range at several altitudes and the optimum altitude, at one mass (the CLI's `range-speeds`). */
export interface SpecificRangeRequestQuery {
  readonly mass_kg: number;
  readonly isaDev_K: number;
  readonly altitudes_m: readonly number[];
}

/** One altitude's specific range, or why there is none there (e.g. above the ceiling). */
export type SpecificRangeAtAltitude =
  | { readonly altitude_m: number; readonly ok: true; readonly result: SpecificRangeResult }
  | { readonly altitude_m: number; readonly ok: false; readonly code: string; readonly message: string };

export interface SpecificRangeSet {
  readonly mass_kg: number;
  readonly curves: readonly SpecificRangeAtAltitude[];
  readonly optimum: OptimumAltitudeResult | null;
  /** Why there is no optimum altitude (null when there is one). */
  readonly optimumError: string | null;
}

export type EngineRequest =
  | CycleViewRequest
  | ({ readonly kind: 'study' } & StudyInputs)
  | ({ readonly kind: 'crossover'; readonly query: CrossoverRequestQuery } & StudyInputs)
  | ({ readonly kind: 'envelope'; readonly query: EnvelopeRequestQuery } & StudyInputs)
  | ({ readonly kind: 'specificRange'; readonly query: SpecificRangeRequestQuery } & StudyInputs)
  | ({ readonly kind: 'payloadRange' } & StudyInputs)
  | ({ readonly kind: 'tradeFactors' } & StudyInputs)
  /** The +1 % recovery trade factor by every recovery method (Raymer held/scaled, deck sensitivities, cycle). */
  | ({ readonly kind: 'recoveryByMethod' } & StudyInputs)
  | ({ readonly kind: 'compare'; readonly nameA: string; readonly nameB: string } & StudyInputs)
  /** A parameter study of one project field over a range (`field=from:to:step`, the CLI's `sweep --vary`), the active inlet. */
  | ({ readonly kind: 'sweep'; readonly vary: string } & StudyInputs)
  /** Each named inlet design's flown mission (its study input), for the overlaid profiles of the compare view. */
  | ({ readonly kind: 'profiles'; readonly designs: readonly string[] } & StudyInputs)
  /** The declared uncertainties' Monte Carlo over one design (its band) or two (A, B: the band of B - A). */
  | ({ readonly kind: 'uncertainty'; readonly designs: readonly string[]; readonly samples?: number; readonly seed?: number } & StudyInputs);

export type EngineRequestKind = EngineRequest['kind'];

/** CD against CL at several Mach numbers (the drag polar plot). */
export interface PolarCurves {
  readonly machs: readonly number[];
  readonly cl: readonly number[];
  /** cd[i][j] at machs[i], cl[j]. */
  readonly cd: readonly (readonly number[])[];
}

/** Whole-aircraft thrust and TSFC at a rating against Mach, at several altitudes. */
export interface LapseCurves {
  readonly rating: RatingName;
  readonly mach: readonly number[];
  readonly altitudes_m: readonly number[];
  /** [altitude][mach], N, all engines; NaN-free: null where the lookup failed. */
  readonly uninstalledThrust_N: readonly (readonly (number | null)[])[];
  readonly installedThrust_N: readonly (readonly (number | null)[])[];
  readonly uninstalledTsfc_kg_N_s: readonly (readonly (number | null)[])[];
  readonly installedTsfc_kg_N_s: readonly (readonly (number | null)[])[];
}

/** One inlet design's numbers against Mach at the cruise altitude and maxCruise rating. */
export interface InletCurves {
  readonly name: string;
  readonly active: boolean;
  readonly altitude_m: number;
  readonly mach: readonly number[];
  readonly recovery: readonly (number | null)[];
  readonly referenceRecovery: readonly (number | null)[];
  /** Per engine (N). */
  readonly spillageDrag_N: readonly (number | null)[];
  readonly throatMach: readonly (number | null)[];
  readonly fanFaceMach: readonly (number | null)[];
}

export interface DeckSummary {
  readonly title: string;
  readonly parametric: boolean;
  readonly points: number;
  readonly altitudes_m: readonly [number, number];
  readonly altitudeCount: number;
  readonly machs: readonly [number, number];
  readonly powers: readonly [number, number];
  readonly ratings: readonly { readonly name: string; readonly power: number }[];
  readonly referenceRecovery: string;
  readonly hasAirflow: boolean;
  /** Whether the deck carries installation-sensitivity columns (the "deck sensitivities" recovery method needs them). */
  readonly hasSensitivities: boolean;
  /** How the study's installation applies recovery, bleed and extraction (the project's recovery method, else the deck's default). */
  readonly installationMethod: InstallationMethodId;
  readonly notes: readonly string[];
}

export interface StudySnapshot {
  readonly mission: MissionResult;
  readonly inletName: string;
  readonly deck: DeckSummary;
  readonly polar: PolarCurves;
  /** One set per rating the deck names (flight idle left out), maxCruise first when present. */
  readonly lapse: readonly LapseCurves[];
  readonly inlets: readonly InletCurves[];
}

export interface CrossoverSet {
  readonly curves: readonly { readonly inletName: string; readonly result: CrossoverResult }[];
}

/** A cycle point as the view shows it: the point result without its solver state and warm start. */
export type CyclePointView = Omit<CyclePointResult, 'state' | 'start'>;

/** Per-engine net thrust and TSFC of one throttle against Mach, [altitude][mach]; null where no point matched. */
export interface CycleCurveSet {
  readonly label: string;
  readonly mach: readonly number[];
  readonly altitudes_m: readonly number[];
  readonly uninstalledThrust_N: readonly (readonly (number | null)[])[];
  readonly uninstalledTsfc_kg_N_s: readonly (readonly (number | null)[])[];
  /** null when there is no installation (a cycle opened without a project). */
  readonly installedThrust_N: readonly (readonly (number | null)[])[] | null;
  readonly installedTsfc_kg_N_s: readonly (readonly (number | null)[])[] | null;
  /** Each uninstalled point's status. */
  readonly statuses: readonly (readonly string[])[];
}

export interface CycleViewReply {
  readonly title: string;
  readonly spec: CycleSpec;
  readonly design: CycleDesignSummary;
  readonly point: CyclePointView;
  /** The active inlet of the installed curves (null: uninstalled only). */
  readonly inletName: string | null;
  readonly ratingCurves: CycleCurveSet;
  readonly fanSpeedCurves: CycleCurveSet;
}

/** One inlet design's flown mission and the legs of its trip (after taxi out, before taxi in). */
export interface DesignProfile {
  readonly name: string;
  readonly mission: MissionResult;
  /** Indices of the first and last trip leg (the history's legIndex): the trip runs from take-off mass to landing mass. */
  readonly tripLegs: readonly [number, number];
}

export interface ProfilesReply {
  readonly designs: readonly DesignProfile[];
}

/** A flown parameter study: the varied field, its values as written, and one row per case (engine/project's SweepRow). */
export interface SweepReply {
  readonly field: string;
  readonly axes: readonly SweepAxis[];
  readonly rows: readonly SweepRow[];
}

export interface EngineReplies {
  readonly cycleView: CycleViewReply;
  readonly study: StudySnapshot;
  readonly crossover: CrossoverSet;
  readonly envelope: EnvelopeResult;
  readonly specificRange: SpecificRangeSet;
  readonly payloadRange: PayloadRangeResult;
  readonly tradeFactors: TradeFactorsResult;
  readonly recoveryByMethod: RecoveryTradeByMethod;
  readonly compare: InletComparisonResult;
  readonly profiles: ProfilesReply;
  readonly sweep: SweepReply;
  readonly uncertainty: UncertaintyResult;
}

/** Why a request produced no result: the project's issues, the deck file's errors, or an analysis error. */
export type EngineFailure = StudyFailure | { readonly kind: 'analysis'; readonly code: string; readonly message: string };

/** A request's reply in the engine's one Result shape (engine/core/result.ts): the value, or why there is none. */
export type EngineOutcome<K extends EngineRequestKind> = Result<EngineReplies[K], EngineFailure>;

/** Main thread -> worker. */
export interface WorkerRequestMessage {
  readonly id: number;
  readonly request: EngineRequest;
}

/** Worker -> main thread. */
export type WorkerReplyMessage =
  | { readonly id: number; readonly type: 'progress'; readonly done: number; readonly total: number }
  | { readonly id: number; readonly type: 'done'; readonly outcome: EngineOutcome<EngineRequestKind> };
