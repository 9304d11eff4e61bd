import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CURRENT_VERSION } from '../../../engine/project/projectSchema';
import { migrateProject, migrateV1toV2, migrateV2toV3, MIGRATIONS, OLDEST_VERSION, V1_INLET_DEFAULT_NAME } from '../../../engine/project/projectMigrations';
import { parseProject } from '../../../engine/project/parseProject';

const v1Text = readFileSync(new URL('../../../fixtures/old-versions/v1.blockwise.json', import.meta.url), 'utf8');
const demoText = readFileSync(new URL('../../../fixtures/demo/demo.blockwise.json', import.meta.url), 'utf8');
const v2Text = readFileSync(new URL('../../../fixtures/old-versions/v2.blockwise.json', import.meta.url), 'utf8');

describe('migrateV1toV2', () => {
  it('migrateV1toV2 moves flat weights into airframe.weights with their new names', () => {
    const out = migrateV1toV2({
      format: 'blockwise-project',
      version: 1,
      airframe: { oew: 1, mzfw: 2, mtow: 3, mlw: 4, maxFuel: 5, wingArea: 6, vmo: 7, mmo: 0.8 },
    });
    expect(out.version).toBe(2);
    expect(out.airframe).toEqual({
      weights: { operatingEmpty: 1, maxZeroFuel: 2, maxTakeoff: 3, maxLanding: 4, maxFuel: 5 },
      wingArea: 6,
      vmo: 7,
      mmo: 0.8,
    });
  });

  it('migrateV1toV2 turns engine.inlet into a one-design inlets list and makes it active', () => {
    const out = migrateV1toV2({ version: 1, engine: { count: 2, inlet: { name: 'pitot', weight: 10 } } });
    expect(out.engine).toEqual({ count: 2 });
    expect(out.inlets).toEqual([{ name: 'pitot', weight: 10 }]);
    expect(out.activeInlet).toBe('pitot');
  });

  it('migrateV1toV2 names an unnamed inlet', () => {
    const out = migrateV1toV2({ version: 1, engine: { inlet: { weight: 10 } } });
    expect(out.inlets).toEqual([{ weight: 10, name: V1_INLET_DEFAULT_NAME }]);
    expect(out.activeInlet).toBe(V1_INLET_DEFAULT_NAME);
  });

  it('migrateV1toV2 does not modify its input', () => {
    const input = { version: 1, airframe: { oew: 1 }, engine: { inlet: { name: 'a' } } };
    const copy = structuredClone(input);
    migrateV1toV2(input);
    expect(input).toEqual(copy);
  });
});

describe('migrateV2toV3', () => {
  it('migrateV2toV3 keeps a windy version-2 mission a still-air study (what version 2 meant by its distances)', () => {
    for (const wind of ['-40 kt', 12, '+5 m/s']) {
      const out = migrateV2toV3({ version: 2, mission: { wind, legs: [] } });
      expect(out.version).toBe(3);
      expect((out.mission as Record<string, unknown>).distanceBasis, String(wind)).toBe('stillAir');
    }
    const legWind = migrateV2toV3({ version: 2, mission: { wind: '0 kt', legs: [{ kind: 'cruise', wind: '-20 kt' }] } });
    expect((legWind.mission as Record<string, unknown>).distanceBasis).toBe('stillAir');
  });

  it('migrateV2toV3 gives a windless version-2 mission the new default (both bases fly it the same)', () => {
    for (const wind of [undefined, 0, '0 kt', '0.0 m/s']) {
      const out = migrateV2toV3({ version: 2, mission: { wind, legs: [{ kind: 'cruise' }] } });
      expect((out.mission as Record<string, unknown>).distanceBasis, String(wind)).toBeUndefined();
    }
  });

  it('migrateV2toV3 does not modify its input', () => {
    const input = { version: 2, mission: { wind: '-10 kt', legs: [] } };
    const copy = structuredClone(input);
    migrateV2toV3(input);
    expect(input).toEqual(copy);
  });
});

describe('migrateProject', () => {
  it('migrateProject has one step per version from the oldest to the current', () => {
    for (let v = OLDEST_VERSION; v < CURRENT_VERSION; v++) expect(typeof MIGRATIONS[v]).toBe('function');
  });

  it('migrateProject refuses a newer version with a clear message at "version"', () => {
    const r = migrateProject({ format: 'blockwise-project', version: CURRENT_VERSION + 1 });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error[0]!.path).toBe('version');
      expect(r.error[0]!.message).toContain(`version ${CURRENT_VERSION + 1} is newer than this Blockwise reads`);
    }
  });

  it('migrateProject refuses version 0, a fractional version and a missing version', () => {
    for (const version of [0, 1.5, undefined, '2']) {
      const r = migrateProject({ format: 'blockwise-project', version });
      expect(r.ok, `version ${String(version)}`).toBe(false);
      if (!r.ok) expect(r.error[0]!.path).toBe('version');
    }
  });

  it('migrateProject leaves a current document as it is', () => {
    const doc = JSON.parse(demoText) as Record<string, unknown>;
    const r = migrateProject(doc);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.value.fromVersion).toBe(CURRENT_VERSION);
      expect(r.value.doc).toBe(doc);
    }
  });
});

describe('version-1 sample (fixtures/old-versions/v1.blockwise.json)', () => {
  it('parseProject migrates the version-1 sample and reads it like the current layout', () => {
    const v1 = parseProject(v1Text, 'v1.blockwise.json');
    const demo = parseProject(demoText, 'demo.blockwise.json');
    expect(v1.ok).toBe(true);
    expect(demo.ok).toBe(true);
    if (!v1.ok || !demo.ok) return;
    expect(v1.value.version).toBe(CURRENT_VERSION);
    // Same weights as the demo, written flat in version 1.
    expect(v1.value.airframe).toEqual(demo.value.airframe);
    expect(v1.value.inlets).toHaveLength(1);
    // The demo's short inlet now gives its lip suction as a table over Mach and mass-flow ratio; the version-1 sample keeps
    // the constant 0.5 it was written with. Everything else is the same.
    const { lipSuction: _table, lipSuctionFactor: _none, ...demoShort } = demo.value.inlets[1]!;
    const { lipSuctionFactor, ...v1Short } = v1.value.inlets[0]!;
    expect(v1Short).toEqual(demoShort);
    expect(lipSuctionFactor).toBe(0.5);
    expect(v1.value.activeInlet).toBe(demo.value.inlets[1]!.name);
  });
});

describe('version-2 sample (fixtures/old-versions/v2.blockwise.json)', () => {
  it('parseProject migrates the windy version-2 sample to a still-air study and keeps the rest', () => {
    const v2 = parseProject(v2Text, 'v2.blockwise.json');
    const demo = parseProject(demoText, 'demo.blockwise.json');
    expect(v2.ok).toBe(true);
    expect(demo.ok).toBe(true);
    if (!v2.ok || !demo.ok) return;
    expect(v2.value.version).toBe(CURRENT_VERSION);
    expect(v2.value.mission.distanceBasis).toBe('stillAir');
    expect(demo.value.mission.distanceBasis).toBe('ground');
    // 40 kt = 40 x 1852 / 3600 m/s (NIST SP 811).
    expect(v2.value.mission.wind).toBeCloseTo((-40 * 1852) / 3600, 9);
    expect(v2.value.mission.legs).toEqual(demo.value.mission.legs);
  });
});
