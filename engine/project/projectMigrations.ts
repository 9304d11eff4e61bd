/**
 * Project-file migrations (docs/style.md §10): each step takes a document of
 * version n to version n + 1 as plain JSON data, pure and small, with its own
 * test and a sample in fixtures/old-versions/. Steps move and rename fields;
 * they do not validate (the current schema does that after the last step).
 *
 * Version 1: weights flat in `airframe` (oew, mzfw, mtow, mlw, maxFuel) and one
 *   inlet under `engine.inlet`, no inlet list.
 * Version 2: `airframe.weights`, `inlets` list and `activeInlet`; the range, set
 *   cruise distances and the alternate's distance were still-air distances.
 * Version 3 (current): `mission.distanceBasis` ("ground" by default, the wind
 *   changes fuel and time); the alternate's own `wind`; the reserves' `arrival`
 *   allowances and `holdSpeed` (optional, with defaults).
 */
import { err, ok, type Result } from '../core/result';
import { makeIssue, showValue, type ProjectIssue } from './projectIssue';
import { CURRENT_VERSION, PROJECT_FORMAT } from './projectSchema';

export type JsonObject = { readonly [key: string]: unknown };

function isObject(value: unknown): value is JsonObject {
  return value !== null && typeof value === 'object' && !Array.isArray(value);
}

/** Name given to a version-1 file's single inlet when it had none. */
export const V1_INLET_DEFAULT_NAME = 'inlet';

/** Version 1 -> 2: weights into `airframe.weights`; `engine.inlet` into `inlets[0]` and `activeInlet`. */
export function migrateV1toV2(doc: JsonObject): JsonObject {
  const { airframe, engine, ...rest } = doc;
  let newAirframe: unknown = airframe;
  if (isObject(airframe)) {
    const { oew, mzfw, mtow, mlw, maxFuel, ...others } = airframe;
    newAirframe = {
      weights: { operatingEmpty: oew, maxZeroFuel: mzfw, maxTakeoff: mtow, maxLanding: mlw, maxFuel },
      ...others,
    };
  }
  let newEngine: unknown = engine;
  let inlets: unknown[] = [];
  let activeInlet: unknown;
  if (isObject(engine)) {
    const { inlet, ...others } = engine;
    newEngine = others;
    if (isObject(inlet)) {
      const name = typeof inlet.name === 'string' && inlet.name.trim() !== '' ? inlet.name : V1_INLET_DEFAULT_NAME;
      inlets = [{ ...inlet, name }];
      activeInlet = name;
    } else if (inlet !== undefined) {
      inlets = [inlet];
    }
  }
  return { ...rest, version: 2, airframe: newAirframe, engine: newEngine, inlets, activeInlet };
}

/** True when a wind field of a version-2 file is absent or reads as zero (a bare 0, or "0" with any unit). */
function windIsZero(value: unknown): boolean {
  if (value === undefined || value === null) return true;
  if (typeof value === 'number') return value === 0;
  if (typeof value !== 'string') return false;
  const number = /^\s*([+-]?[0-9.]+(?:e[+-]?[0-9]+)?)/i.exec(value);
  return number !== null && Number(number[1]) === 0;
}

/**
 * Version 2 -> 3: a version-2 file's distances were still-air distances. Where any wind is set (the mission's,
 * a leg's) the file keeps that meaning with `mission.distanceBasis: "stillAir"`; without wind the two bases fly
 * the same mission, so the file takes the new default ("ground").
 */
export function migrateV2toV3(doc: JsonObject): JsonObject {
  const { mission, ...rest } = doc;
  if (!isObject(mission)) return { ...rest, version: 3, mission };
  const legs = Array.isArray(mission.legs) ? mission.legs : [];
  const windy = !windIsZero(mission.wind) || legs.some((l) => isObject(l) && !windIsZero(l.wind));
  return { ...rest, version: 3, mission: windy ? { ...mission, distanceBasis: 'stillAir' } : mission };
}

/** Steps by the version they start from. */
export const MIGRATIONS: Readonly<Record<number, (doc: JsonObject) => JsonObject>> = {
  1: migrateV1toV2,
  2: migrateV2toV3,
};

export const OLDEST_VERSION = 1;

/**
 * Checks `format` and `version` and migrates the document to CURRENT_VERSION.
 * A newer or unknown version is an issue at `version`.
 */
export function migrateProject(doc: unknown): Result<{ doc: JsonObject; fromVersion: number }, ProjectIssue[]> {
  if (!isObject(doc)) {
    return err([makeIssue('(file)', showValue(doc), 'a JSON object', `the file holds ${showValue(doc)}, expected a JSON object ({ "format": "${PROJECT_FORMAT}", ... })`)]);
  }
  if (doc.format !== PROJECT_FORMAT) {
    const value = showValue(doc.format);
    const reason =
      doc.format === undefined
        ? `missing; expected "${PROJECT_FORMAT}" (is this a Blockwise project file?)`
        : `${value} is not "${PROJECT_FORMAT}" (is this a Blockwise project file?)`;
    return err([makeIssue('format', value, `"${PROJECT_FORMAT}"`, reason)]);
  }
  const version = doc.version;
  const supported = `a version from ${OLDEST_VERSION} to ${CURRENT_VERSION}`;
  if (typeof version !== 'number' || !Number.isInteger(version)) {
    const reason = version === undefined ? `missing; expected ${supported}` : `${showValue(version)} is not ${supported}`;
    return err([makeIssue('version', showValue(version), supported, reason)]);
  }
  if (version > CURRENT_VERSION) {
    return err([
      makeIssue(
        'version',
        String(version),
        supported,
        `version ${version} is newer than this Blockwise reads (${OLDEST_VERSION} to ${CURRENT_VERSION}); open it with a newer Blockwise`,
      ),
    ]);
  }
  if (version < OLDEST_VERSION) {
    return err([makeIssue('version', String(version), supported, `version ${version} is not a known project version; expected ${supported}`)]);
  }
  let current: JsonObject = doc;
  for (let v = version; v < CURRENT_VERSION; v++) {
    const step = MIGRATIONS[v];
    if (!step) throw new Error(`projectMigrations: no step from version ${v}`);
    current = step(current);
  }
  return ok({ doc: current, fromVersion: version });
}
