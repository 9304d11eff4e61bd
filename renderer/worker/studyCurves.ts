/** The curves the views plot, computed from a mission input (runs in the worker). */
import { defaultInstallationMethod, describeReferenceRecovery, type EngineDeck, type InstallationMethodId, type PropulsionModel, type RatingName } from '../../engine/propulsion';
import { type DragPolarModel, polarCoefficients } from '../../engine/aero';
import type { MissionInput } from '../../engine/mission';
import type { DeckSummary, InletCurves, LapseCurves, PolarCurves } from './engineProtocol';
import { FOOT_M } from '../../engine/units';

const FT = FOOT_M;
export const PLOT_MACHS: readonly number[] = Array.from({ length: 18 }, (_, i) => 0.05 * (i + 1));
export const POLAR_MACHS: readonly number[] = [0.4, 0.7, 0.78, 0.82, 0.85];
export const POLAR_CLS: readonly number[] = Array.from({ length: 21 }, (_, i) => i * 0.05);
/** Ratings plotted in the engine view, in menu order. */
export const LAPSE_RATINGS: readonly RatingName[] = ['maxCruise', 'maxClimb', 'maxContinuous', 'takeoff'];
export const LAPSE_ALTITUDES_M: readonly number[] = [0, 10000 * FT, 20000 * FT, 30000 * FT, 40000 * FT];

function finiteOrNull(x: number | null | undefined): number | null {
  return x === null || x === undefined || !Number.isFinite(x) ? null : x;
}

/** CD(CL) of the mission's polar (with the inlet's external-drag increment) at POLAR_MACHS. */
export function polarCurves(aero: MissionInput['aero']): PolarCurves {
  const model = aero as DragPolarModel;
  return {
    machs: POLAR_MACHS,
    cl: POLAR_CLS,
    cd: POLAR_MACHS.map((m) => POLAR_CLS.map((cl) => polarCoefficients(model, m, cl).cd)),
  };
}

function safePoint<T>(f: () => T): T | null {
  try {
    return f();
  } catch {
    return null;
  }
}

/** Uninstalled and installed thrust and TSFC against Mach at LAPSE_ALTITUDES_M (ISA). */
export function lapseCurves(propulsion: PropulsionModel, rating: RatingName): LapseCurves {
  const n = propulsion.engineCount;
  const points = LAPSE_ALTITUDES_M.map((altitude_m) =>
    PLOT_MACHS.map((mach) => safePoint(() => propulsion.atRating({ altitude_m, mach, isaDev_K: 0 }, rating))),
  );
  return {
    rating,
    mach: PLOT_MACHS,
    altitudes_m: LAPSE_ALTITUDES_M,
    uninstalledThrust_N: points.map((row) => row.map((p) => finiteOrNull(p && p.perEngine.uninstalledThrust_N * n))),
    installedThrust_N: points.map((row) => row.map((p) => finiteOrNull(p?.thrust_N))),
    uninstalledTsfc_kg_N_s: points.map((row) =>
      row.map((p) => (p && p.perEngine.uninstalledThrust_N > 0 ? finiteOrNull(p.perEngine.uninstalledFuelFlow_kg_s / p.perEngine.uninstalledThrust_N) : null)),
    ),
    installedTsfc_kg_N_s: points.map((row) => row.map((p) => finiteOrNull(p?.tsfc_kg_N_s))),
  };
}

/** Recovery, spillage drag, throat and fan-face Mach of one inlet against Mach at `altitude_m`, maxCruise. */
export function inletCurves(propulsion: PropulsionModel, active: boolean, altitude_m: number): InletCurves {
  const points = PLOT_MACHS.map((mach) => safePoint(() => propulsion.atRating({ altitude_m, mach, isaDev_K: 0 }, 'maxCruise')));
  return {
    name: propulsion.inletName,
    active,
    altitude_m,
    mach: PLOT_MACHS,
    recovery: points.map((p) => finiteOrNull(p?.perEngine.recovery)),
    referenceRecovery: points.map((p) => finiteOrNull(p?.perEngine.referenceRecovery)),
    spillageDrag_N: points.map((p) => finiteOrNull(p?.perEngine.spillageDrag_N)),
    throatMach: points.map((p) => finiteOrNull(p?.perEngine.throatMach)),
    fanFaceMach: points.map((p) => finiteOrNull(p?.perEngine.fanFaceMach)),
  };
}

function range(values: Float64Array): readonly [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return [lo, hi];
}

/** The deck's grid in a few figures. */
/** The deck's grid in a few figures, with the installation method the study flies (`method`; default: the deck's default). */
export function deckSummary(deck: EngineDeck, method?: InstallationMethodId): DeckSummary {
  const g = deck.grid;
  return {
    title: deck.title,
    parametric: deck.parametric,
    points: g.power.length,
    altitudes_m: range(g.altitudes_m),
    altitudeCount: new Set(g.altitudes_m).size,
    machs: range(g.machs),
    powers: range(g.power),
    ratings: Object.entries(deck.ratings).map(([name, power]) => ({ name, power: power ?? NaN })),
    referenceRecovery: describeReferenceRecovery(deck.referenceRecovery),
    hasAirflow: deck.hasAirflow,
    hasSensitivities: deck.hasSensitivities,
    installationMethod: method ?? defaultInstallationMethod(deck.hasSensitivities),
    notes: deck.notes,
  };
}
