/**
 * Cross-field rules a schema cannot state field by field: weights in order,
 * the active inlet exists, one solvable cruise leg, climbs go up and descents
 * down, the legs end no lower than the destination elevation, and the polar and inlet designs pass their own validators. Each
 * finding is a ProjectIssue with the JSON path it concerns.
 */
import { validatePolarSpec } from '../aero/polarSpec';
import { validateInletDesign } from '../propulsion/inletDesign';
import { formatMessageQuantity, msg, q, type MessageQuantity } from '../units/messageParts';
import { makeIssue, showValue, valueAtPath, type ProjectIssue } from './projectIssue';
import type { Project } from './projectSchema';
import { inletDesignOf, inletIssuePath, polarIssuePath, polarSpecOf } from './projectSpecs';
import { checkUncertainty } from './uncertaintyChecks';

/** Altitude agreement accepted between a cruise leg and the legs before it (m). */
const ALTITUDE_MATCH_TOLERANCE_M = 1;

/** Masses and altitudes as quantity parts (messages) and as text in both unit systems (the `expected` field). */
function kg(value: number) {
  return q(value, 'mass');
}
function ft(value_m: number) {
  return q(value_m, 'altitude');
}
function siText(part: MessageQuantity): string {
  return formatMessageQuantity(part, 'both');
}

function pathFromDotted(path: string): (string | number)[] {
  const out: (string | number)[] = [];
  for (const part of path.split('.')) {
    const m = /^([^[]*)((?:\[\d+\])*)$/.exec(part);
    if (!m) {
      out.push(part);
      continue;
    }
    if (m[1]) out.push(m[1]);
    for (const idx of (m[2] ?? '').matchAll(/\[(\d+)\]/g)) out.push(Number(idx[1]));
  }
  return out;
}

/**
 * The polar's and each inlet design's own validation kept by the object checked, so that checking a neighbouring
 * project that shares them (a sweep's next case) does not validate them again. The projects are never modified.
 */
export interface ProjectCheckMemo {
  readonly polar: WeakMap<object, ReturnType<typeof validatePolarSpec>>;
  readonly inlets: WeakMap<object, ReturnType<typeof validateInletDesign>>;
}

export function createProjectCheckMemo(): ProjectCheckMemo {
  return { polar: new WeakMap(), inlets: new WeakMap() };
}

function kept<K extends object, V>(map: WeakMap<K, V> | undefined, key: K, make: () => V): V {
  let v = map?.get(key);
  if (v === undefined) {
    v = make();
    map?.set(key, v);
  }
  return v;
}

/** Every cross-field issue of a schema-valid project; `doc` is the migrated JSON for showing values. */
export function checkProject(project: Project, doc: unknown, memo?: ProjectCheckMemo): ProjectIssue[] {
  const issues: ProjectIssue[] = [];
  const raw = (path: string): string => showValue(valueAtPath(doc, pathFromDotted(path)));
  const w = project.airframe.weights;

  if (w.maxZeroFuel > w.maxTakeoff) {
    const p = 'airframe.weights.maxZeroFuel';
    issues.push(makeIssue(p, raw(p), `at most the maximum takeoff weight (${siText(kg(w.maxTakeoff))})`, msg`the maximum zero-fuel weight ${kg(w.maxZeroFuel)} is above the maximum takeoff weight ${kg(w.maxTakeoff)}`));
  }
  if (w.maxLanding > w.maxTakeoff) {
    const p = 'airframe.weights.maxLanding';
    issues.push(makeIssue(p, raw(p), `at most the maximum takeoff weight (${siText(kg(w.maxTakeoff))})`, msg`the maximum landing weight ${kg(w.maxLanding)} is above the maximum takeoff weight ${kg(w.maxTakeoff)}`));
  }
  const inletWeights = project.inlets.map((i) => i.weight * project.engine.count);
  const heaviest = Math.max(0, ...inletWeights);
  if (w.operatingEmpty + heaviest >= w.maxZeroFuel) {
    const p = 'airframe.weights.operatingEmpty';
    issues.push(makeIssue(p, raw(p), `below the maximum zero-fuel weight (${siText(kg(w.maxZeroFuel))}) with the inlets' weight`, msg`the operating empty weight ${kg(w.operatingEmpty)} plus the inlets (${kg(w.operatingEmpty + heaviest)}) is not below the maximum zero-fuel weight ${kg(w.maxZeroFuel)}`));
  }

  const names = new Set<string>();
  project.inlets.forEach((inlet, i) => {
    if (inlet.lipSuction !== undefined && inlet.lipSuctionFactor !== undefined) {
      const p = `inlets[${i}].lipSuctionFactor`;
      issues.push(makeIssue(p, raw(p), 'either lipSuctionFactor or lipSuction, not both', `${raw(p)}: the inlet also gives lipSuction; keep one (a constant factor, or the table)`));
    }
    if (names.has(inlet.name)) {
      const p = `inlets[${i}].name`;
      issues.push(makeIssue(p, raw(p), 'a name no other inlet design has', `${raw(p)} is used by an earlier inlet design; names must be unique`));
    }
    names.add(inlet.name);
    for (const issue of kept(memo?.inlets, inlet, () => validateInletDesign(inletDesignOf(inlet)))) {
      const p = inletIssuePath(i, issue.path);
      issues.push(makeIssue(p, raw(p), 'a consistent inlet design', issue.message));
    }
  });
  if (!names.has(project.activeInlet)) {
    const list = [...names].map((n) => JSON.stringify(n)).join(', ');
    issues.push(makeIssue('activeInlet', raw('activeInlet'), `one of ${list}`, `${raw('activeInlet')} is not the name of an inlet design; expected one of ${list}`));
  }

  const polar = kept(memo?.polar, project.polar, () => validatePolarSpec(polarSpecOf(project)));
  if (!polar.ok) {
    for (const issue of polar.error) {
      const p = polarIssuePath(issue.path);
      issues.push(makeIssue(p, raw(p), 'a valid drag polar (docs/drag-polar.md)', `${issue.path} ${issue.message}`));
    }
  }

  const ff = project.cautions;
  if (ff.minFanFaceMach !== undefined && ff.maxFanFaceMach !== undefined && ff.minFanFaceMach > ff.maxFanFaceMach) {
    issues.push(makeIssue('cautions.minFanFaceMach', raw('cautions.minFanFaceMach'), 'at most cautions.maxFanFaceMach', `${raw('cautions.minFanFaceMach')} is above cautions.maxFanFaceMach (${raw('cautions.maxFanFaceMach')})`));
  }

  const legs = project.mission.legs;
  const solved = legs.flatMap((leg, i) => (leg.kind === 'cruise' && leg.distance === 'solve' ? [i] : []));
  if (solved.length > 1) {
    for (const i of solved.slice(1)) {
      const p = `mission.legs[${i}].distance`;
      issues.push(makeIssue(p, raw(p), 'a distance (only one cruise leg may be "solve")', `"solve" is already used by leg ${solved[0]! + 1}; only one cruise leg may have its distance solved`));
    }
  }
  const mode = project.mission.solve.mode;
  if ((mode === 'payloadRange' || mode === 'maxRange') && solved.length === 0) {
    issues.push(makeIssue('mission.legs', '(no cruise leg with "distance": "solve")', 'one cruise leg with "distance": "solve"', `solve mode "${mode}" needs one cruise leg with "distance": "solve" to adjust`));
  }
  const solve = project.mission.solve;
  if (solve.mode === 'takeoffWeight' && solve.takeoffWeight <= w.operatingEmpty + solve.payload) {
    const p = 'mission.solve.takeoffWeight';
    issues.push(makeIssue(p, raw(p), 'more than the operating empty weight plus payload', msg`the take-off weight ${kg(solve.takeoffWeight)} leaves no fuel above the operating empty weight plus payload (${kg(w.operatingEmpty + solve.payload)})`));
  }

  // After taxi in the aircraft is parked: a flying leg there would add distance and fuel to a finished trip.
  const taxiIn = legs.findIndex((l) => l.kind === 'taxiIn');
  if (taxiIn >= 0) {
    legs.forEach((leg, i) => {
      if (i > taxiIn && leg.kind !== 'taxiIn') {
        const p = `mission.legs[${i}].kind`;
        issues.push(makeIssue(p, raw(p), 'no flight leg after taxi in', `a ${leg.kind} leg cannot follow the taxi in (leg ${taxiIn + 1}): the aircraft is parked; move it before the taxi in or remove it`));
      }
    });
  }

  let altitude_m = 0;
  legs.forEach((leg, i) => {
    if (leg.kind === 'climb') {
      if (leg.toAltitude <= altitude_m) {
        const p = `mission.legs[${i}].toAltitude`;
        issues.push(makeIssue(p, raw(p), `above ${siText(ft(altitude_m))} (the altitude reached by the legs before)`, msg`the climb's target altitude ${ft(leg.toAltitude)} is not above ${ft(altitude_m)}, the altitude reached by the legs before; a climb must go up`));
      }
      altitude_m = leg.toAltitude;
    } else if (leg.kind === 'descent') {
      if (leg.toAltitude >= altitude_m) {
        const p = `mission.legs[${i}].toAltitude`;
        issues.push(makeIssue(p, raw(p), `below ${siText(ft(altitude_m))} (the altitude reached by the legs before)`, msg`the descent's target altitude ${ft(leg.toAltitude)} is not below ${ft(altitude_m)}, the altitude reached by the legs before; a descent must go down`));
      }
      altitude_m = leg.toAltitude;
    } else if (leg.kind === 'cruise') {
      if (Math.abs(leg.altitude - altitude_m) > ALTITUDE_MATCH_TOLERANCE_M) {
        const p = `mission.legs[${i}].altitude`;
        issues.push(makeIssue(p, raw(p), `${siText(ft(altitude_m))} (the altitude reached by the legs before)`, msg`the cruise altitude ${ft(leg.altitude)} differs from ${ft(altitude_m)}, the altitude reached by the legs before; add a climb or descent leg`));
      }
      if (leg.profile.kind !== 'constantAltitude' && leg.profile.maxAltitude < leg.altitude) {
        const p = `mission.legs[${i}].profile.maxAltitude`;
        issues.push(makeIssue(p, raw(p), 'at least the cruise altitude', msg`the highest altitude ${ft(leg.profile.maxAltitude)} is below the cruise altitude ${ft(leg.altitude)}`));
      }
      altitude_m = leg.altitude;
    }
  });
  const elevation_m = project.mission.destinationElevation;
  if (elevation_m !== undefined && elevation_m > altitude_m + ALTITUDE_MATCH_TOLERANCE_M) {
    const p = 'mission.destinationElevation';
    issues.push(makeIssue(p, raw(p), `at most ${siText(ft(altitude_m))} (the altitude the legs end at)`, msg`the destination elevation ${ft(elevation_m)} is above ${ft(altitude_m)}, the altitude the legs end at; the last descent should end above the destination (1,500 ft above it is common practice)`));
  }
  issues.push(...checkUncertainty(project, raw));
  return issues;
}
