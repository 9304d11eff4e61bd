/**
 * From a parsed Project (SI) and its resources (the deck read by the caller)
 * to the solver's MissionInput: airframe with the active inlet's weight, the
 * polar with the inlet's external-drag increment, the installed propulsion
 * model, legs, reserves and solve mode.
 */
import { legKindLabel } from './legKinds';
import type { AeroModel } from '../aero/aeroModel';
import { makeAeroModel } from '../aero/dragPolar';
import { err, ok, type Result } from '../core/result';
import type { AlternateSpec, DistanceBasis, HoldSpeed, Leg, ReserveCommon, MissionInput, ReservePolicy, SolveMode } from '../mission/missionTypes';
import type { EngineDeck } from '../propulsion/engineDeck';
import { inletDragIncrementCd0, inletWeight, type InletDesign } from '../propulsion/inletDesign';
import { validateInstallation } from '../propulsion/installationCorrections';
import { makeInstalledPropulsion } from '../propulsion/installedPropulsion';
import type { PropulsionModel } from '../propulsion/propulsionModel';
import { makeIssue, type ProjectIssue } from './projectIssue';
import type { Project, ProjectLeg } from './projectSchema';
import { cautionSettingsOf, inletDesignOf, installationOf, polarIssuePath, polarSpecOf } from './projectSpecs';
import { projectDeck } from './projectDeck';

/** What the caller read from disk (or elsewhere) for the project. */
export interface ProjectResources {
  /** The deck named by a `{ kind: 'file' }` deck reference, parsed by the caller. */
  readonly deck?: EngineDeck;
}

/** Replacements applied on top of the project's mission (e.g. from CLI options or an analysis). */
export interface MissionOverrides {
  readonly isaDev_K?: number;
  readonly wind_m_s?: number;
  readonly solve?: SolveMode;
  readonly reserves?: ReservePolicy;
  readonly distanceBasis?: DistanceBasis;
}

export interface BuildOptions {
  /** Inlet design to fly; default the project's `activeInlet`. */
  readonly inletName?: string;
  readonly overrides?: MissionOverrides;
}

/** The project's inlet design by name (default the active one), or an issue naming the choices. */
export function projectInlet(project: Project, inletName?: string): Result<InletDesign, ProjectIssue[]> {
  const name = inletName ?? project.activeInlet;
  const inlet = project.inlets.find((i) => i.name === name);
  if (!inlet) {
    const list = project.inlets.map((i) => JSON.stringify(i.name)).join(', ');
    const where = inletName === undefined ? 'activeInlet' : 'inlet';
    return err([makeIssue(where, JSON.stringify(name), `one of ${list}`, `${JSON.stringify(name)} is not an inlet design of this project; expected one of ${list}`)]);
  }
  return ok(inletDesignOf(inlet));
}

function legOf(leg: ProjectLeg, index: number): Leg {
  const env = {
    name: leg.name ?? `${legKindLabel(leg.kind)} (leg ${index + 1})`,
    ...(leg.isaDeviation === undefined ? {} : { isaDev_K: leg.isaDeviation }),
    ...(leg.wind === undefined ? {} : { wind_m_s: leg.wind }),
  };
  switch (leg.kind) {
    case 'taxiOut':
    case 'taxiIn':
      return { ...env, kind: leg.kind, time_s: leg.time, fuelFlow_kg_s: leg.fuelFlow };
    case 'takeoff':
      return { ...env, kind: 'takeoff', time_s: leg.time, fuel_kg: leg.fuel };
    case 'approach':
      return { ...env, kind: 'approach', time_s: leg.time, fuel_kg: leg.fuel };
    case 'climb':
      return { ...env, kind: 'climb', toAltitude_m: leg.toAltitude, schedule: scheduleOf(leg.schedule), rating: leg.rating };
    case 'descent':
      return {
        ...env,
        kind: 'descent',
        toAltitude_m: leg.toAltitude,
        schedule: scheduleOf(leg.schedule),
        mode: leg.mode.kind === 'idle' ? { kind: 'idle' } : { kind: 'rate', rate_m_s: leg.mode.rate },
      };
    case 'cruise': {
      const p = leg.profile;
      return {
        ...env,
        kind: 'cruise',
        altitude_m: leg.altitude,
        speed: leg.speed,
        profile:
          p.kind === 'constantAltitude'
            ? { kind: 'constantAltitude' }
            : p.kind === 'stepClimb'
              ? { kind: 'stepClimb', step_m: p.step, maxAltitude_m: p.maxAltitude }
              : { kind: 'cruiseClimb', maxAltitude_m: p.maxAltitude },
        distance_m: leg.distance === 'solve' ? null : leg.distance,
      };
    }
    case 'hold':
      return {
        ...env,
        kind: 'hold',
        altitude_m: leg.altitude,
        time_s: leg.time,
        speed: holdSpeedOf(leg.speed),
      };
  }
}

function scheduleOf(s: { lowCas: number; lowAltitudeLimit: number; cas: number; mach: number }) {
  return { lowCas_m_s: s.lowCas, lowAltitudeLimit_m: s.lowAltitudeLimit, cas_m_s: s.cas, mach: s.mach };
}

type ProjectReserves = Project['mission']['reserves'];

function alternateOf(a: ProjectReserves['alternate']): AlternateSpec | null {
  if (a === null) return null;
  return {
    distance_m: a.distance,
    cruiseAltitude_m: a.cruiseAltitude,
    cruiseMach: a.cruiseMach,
    elevation_m: a.elevation,
    ...(a.wind === undefined ? {} : { wind_m_s: a.wind }),
  };
}

/** A holding speed in SI. */
function holdSpeedOf(s: ProjectLegHoldSpeed): HoldSpeed {
  if (s.kind === 'cas') return { kind: 'cas', cas_m_s: s.cas };
  return {
    kind: 'bestEndurance',
    ...(s.minCas === undefined ? {} : { minCas_m_s: s.minCas }),
    ...(s.speedFactor === undefined ? {} : { speedFactor: s.speedFactor }),
  };
}
type ProjectLegHoldSpeed = Extract<ProjectLeg, { kind: 'hold' }>['speed'];

/** The reserve settings all presets share, in SI (absent fields stay absent: the defaults of reserveRules.ts). */
function reserveCommonOf(r: ProjectReserves): ReserveCommon {
  const allowance = (a: { time: number; fuel: number | null }) => ({ time_s: a.time, fuel_kg: a.fuel });
  return {
    ...(r.arrival === undefined
      ? {}
      : { arrival: { missedApproach: allowance(r.arrival.missedApproach), alternateApproach: allowance(r.arrival.alternateApproach) } }),
    ...(r.holdSpeed === undefined ? {} : { holdSpeed: holdSpeedOf(r.holdSpeed) }),
  };
}

/** The project's reserve policy in SI. */
export function reservesOf(r: ProjectReserves): ReservePolicy {
  return { ...reserveCommonOf(r), ...presetOf(r) };
}

function presetOf(r: ProjectReserves): ReservePolicy {
  switch (r.preset) {
    case 'icaoAnnex6':
      return { preset: 'icaoAnnex6', contingencyFraction: r.contingencyFraction, minContingency_s: r.minContingencyTime, alternate: alternateOf(r.alternate), finalReserve_s: r.finalReserveTime };
    case 'cfr121_639':
      return { preset: 'cfr121_639', alternate: alternateOf(r.alternate), finalReserve_s: r.finalReserveTime };
    case 'cfr121_645':
      return { preset: 'cfr121_645', enRouteFraction: r.enRouteFraction, alternate: alternateOf(r.alternate), finalReserve_s: r.finalReserveTime };
    case 'custom':
      return { preset: 'custom', contingencyFraction: r.contingencyFraction, alternate: alternateOf(r.alternate), finalReserve_s: r.finalReserveTime, extraFuel_kg: r.extraFuel };
  }
}

/** The project's solve mode in SI. */
export function solveModeOf(s: Project['mission']['solve']): SolveMode {
  switch (s.mode) {
    case 'takeoffWeight':
      return { kind: 'takeoffWeight', takeoffMass_kg: s.takeoffWeight, payload_kg: s.payload };
    case 'payloadRange':
      return { kind: 'payloadRange', payload_kg: s.payload, range_m: s.range };
    case 'maxRange':
      return { kind: 'maxRange', payload_kg: s.payload };
  }
}

/** Maps an InstallationSettings issue path to the project path. */
export function installationIssuePath(settingsPath: string): string {
  const renamed: Readonly<Record<string, string>> = {
    'bleed.bleed_kg_s': 'bleed.massFlow',
    powerExtraction_W: 'powerExtraction',
    cRam: 'ramRecoveryFactor',
    cBleed: 'bleedFactor',
  };
  return `engine.installation.${renamed[settingsPath] ?? settingsPath}`;
}

/**
 * Builds the MissionInput for `project` flying inlet `options.inletName`
 * (default the active inlet). Airframe OEW = operatingEmpty + inlet weight
 * per engine x engine count; aero = polar + dCD0 with
 * dCD0 = externalDragArea x engine count / wing area (D/q definition);
 * propulsion = makeInstalledPropulsion on the deck (file from `resources`,
 * embedded, or parametric). Failures are ProjectIssues with JSON paths.
 */
export function buildMissionInput(
  project: Project,
  resources: ProjectResources,
  options: BuildOptions = {},
): Result<MissionInput, readonly ProjectIssue[]> {
  const deck = projectDeck(project, resources);
  if (!deck.ok) return deck;
  return missionInputOnDeck(project, deck.value, options);
}

/**
 * The polar and the installed propulsion built for a project, kept so that a
 * neighbouring project (a sweep's next case) whose fields they are built from
 * are the same objects reuses them instead of building them again: the aero
 * model from `polar`, `airframe.wingArea`, the inlet and `engine.count`; the
 * propulsion (and its checks) from the deck, `engine`, the inlet and
 * `cautions`; the legs from `mission.legs`. The propulsion model's caches are
 * exact (a reused model answers as a fresh one), so the mission input is the
 * same either way.
 */
export interface MissionInputMemo {
  aero?: { readonly key: readonly unknown[]; readonly value: Result<AeroModel, readonly ProjectIssue[]> };
  propulsion?: { readonly key: readonly unknown[]; readonly value: Result<PropulsionModel, readonly ProjectIssue[]> };
  legs?: { readonly key: readonly unknown[]; readonly value: Leg[] };
}

function sameKey(a: readonly unknown[], b: readonly unknown[]): boolean {
  return a.length === b.length && a.every((v, i) => Object.is(v, b[i]));
}

function remembered<T>(memo: MissionInputMemo | undefined, slot: keyof MissionInputMemo, key: readonly unknown[], build: () => T): T {
  const kept = memo?.[slot];
  if (kept !== undefined && sameKey(kept.key, key)) return kept.value as T;
  const value = build();
  if (memo !== undefined) memo[slot] = { key, value } as never;
  return value;
}

/** As buildMissionInput, on the project's deck already built (engine/study builds it once for every inlet). */
export function missionInputOnDeck(
  project: Project,
  engineDeck: EngineDeck,
  options: BuildOptions = {},
  memo?: MissionInputMemo,
): Result<MissionInput, readonly ProjectIssue[]> {
  const inlet = projectInlet(project, options.inletName);
  if (!inlet.ok) return inlet;

  const wingArea_m2 = project.airframe.wingArea;
  const engineCount = project.engine.count;
  const inletName = inlet.value.name;
  const aero = remembered(memo, 'aero', [project.polar, wingArea_m2, project.inlets, inletName, engineCount], (): Result<AeroModel, readonly ProjectIssue[]> => {
    const polar = makeAeroModel(polarSpecOf(project), wingArea_m2);
    if (!polar.ok) {
      return err(polar.error.map((i) => makeIssue(polarIssuePath(i.path), '', 'a valid drag polar', `${i.path} ${i.message}`)));
    }
    return ok(polar.value.withIncrement(inletDragIncrementCd0(inlet.value, engineCount, wingArea_m2)));
  });
  if (!aero.ok) return aero;
  const cautionSettings = cautionSettingsOf(project);
  const propulsion = remembered(memo, 'propulsion', [engineDeck, project.engine, project.inlets, inletName, project.cautions], (): Result<PropulsionModel, readonly ProjectIssue[]> => {
    const installation = installationOf(project);
    const installationIssues = validateInstallation(installation, engineDeck.hasAirflow);
    if (installationIssues.length > 0) {
      return err(
        installationIssues.map((i) => makeIssue(installationIssuePath(i.path), '', 'valid installation settings', i.message)),
      );
    }
    if (installation.method === 'deckSensitivities' && !engineDeck.hasSensitivities) {
      return err([
        makeIssue('engine.installation.recoveryMethod', '"deckSensitivities"', '"raymer", or a deck with sensitivity columns', `the deck "${engineDeck.title}" has no installation-sensitivity columns; use "raymer" or a deck that carries them (a cycle deck does)`),
      ]);
    }
    return ok(makeInstalledPropulsion({ deck: engineDeck, engineCount, inlet: inlet.value, installation, cautionSettings }));
  });
  if (!propulsion.ok) return propulsion;
  const w = project.airframe.weights;
  const overrides = options.overrides ?? {};
  return ok({
    airframe: {
      oew_kg: w.operatingEmpty + inletWeight(inlet.value, engineCount),
      mzfw_kg: w.maxZeroFuel,
      mtow_kg: w.maxTakeoff,
      mlw_kg: w.maxLanding,
      maxFuel_kg: w.maxFuel,
      wingArea_m2,
      vmo_m_s: project.airframe.vmo,
      mmo: project.airframe.mmo,
    },
    aero: aero.value,
    propulsion: propulsion.value,
    legs: remembered(memo, 'legs', [project.mission.legs], () => project.mission.legs.map(legOf)),
    reserves: overrides.reserves ?? reservesOf(project.mission.reserves),
    solve: overrides.solve ?? solveModeOf(project.mission.solve),
    cautionSettings,
    isaDev_K: overrides.isaDev_K ?? project.mission.isaDeviation,
    wind_m_s: overrides.wind_m_s ?? project.mission.wind,
    destinationElevation_m: project.mission.destinationElevation ?? 0,
    distanceBasis: overrides.distanceBasis ?? project.mission.distanceBasis,
  });
}
