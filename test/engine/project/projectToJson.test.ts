import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseProject } from '../../../engine/project/parseProject';
import { CURRENT_VERSION, type Project } from '../../../engine/project/projectSchema';
import { projectToJson } from '../../../engine/project/projectToJson';

const fixture = (path: string): string => readFileSync(new URL(`../../../fixtures/${path}`, import.meta.url), 'utf8');

function parsed(text: string): Project {
  const r = parseProject(text, 'test');
  if (!r.ok) throw new Error(r.error.map((i) => i.message).join('\n'));
  return r.value;
}

describe('projectToJson', () => {
  it('projectToJson round-trips the demo project exactly', () => {
    const project = parsed(fixture('demo/demo.blockwise.json'));
    expect(parsed(projectToJson(project))).toEqual(project);
  });

  it('projectToJson writes a migrated version-1 project in the current version', () => {
    const project = parsed(fixture('old-versions/v1.blockwise.json'));
    const text = projectToJson(project);
    const doc = JSON.parse(text) as { version: number; airframe: { weights: unknown } };
    expect(doc.version).toBe(CURRENT_VERSION);
    expect(doc.airframe.weights).toBeDefined();
    expect(parsed(text)).toEqual(project);
  });

  it('projectToJson writes quantities with their SI unit and plain numbers without one', () => {
    const project = parsed(fixture('demo/demo.blockwise.json'));
    const doc = JSON.parse(projectToJson(project)) as {
      airframe: { wingArea: string; mmo: number };
      mission: { legs: { distance?: unknown; time?: unknown }[] };
      polar: { compressibility: { sweep: string } };
    };
    expect(doc.airframe.wingArea).toMatch(/^[0-9.]+ m2$/);
    expect(doc.airframe.mmo).toBe(0.85);
    expect(doc.polar.compressibility.sweep).toMatch(/ rad$/);
    expect(doc.mission.legs[3]!.distance).toBe('solve');
    expect(doc.mission.legs[0]!.time).toBe('600 s');
  });

  it('projectToJson round-trips alternative layouts: other reserves, solve modes, legs and deck kinds', () => {
    const doc = JSON.parse(fixture('demo/demo.blockwise.json')) as Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
    doc.mission.reserves = { preset: 'custom', contingencyFraction: 0.03, alternate: null, finalReserveTime: '45 min', extraFuel: '200 lb' };
    doc.mission.solve = { mode: 'takeoffWeight', takeoffWeight: '38000 lb', payload: '1000 lb' };
    doc.mission.legs[3].distance = '2500 nmi';
    doc.mission.legs[3].profile = { kind: 'stepClimb', step: '2000 ft', maxAltitude: '45000 ft' };
    doc.mission.legs.splice(5, 0, { kind: 'hold', altitude: '1500 ft', time: '10 min', speed: { kind: 'cas', cas: '200 kt' } });
    doc.engine.installation = { bleed: { kind: 'massFlow', massFlow: '1 lb/s', coreFlowFraction: 0.2 }, powerExtraction: '20 kW', ramRecoveryFactor: 1.2 };
    doc.engine.deck = { kind: 'embedded', deck: { title: 'anything', rows: [1, 2, 3] } };
    doc.polar.induced = { kind: 'table', rows: [{ mach: 0, k: 0.05 }, { mach: 0.9, k: 0.06 }] };
    delete doc.uncertainty.inputs[5]; // a recovery offset needs a recovery-table inlet (uncertaintyChecks.ts)
    doc.uncertainty.inputs = doc.uncertainty.inputs.filter(Boolean);
    doc.inlets[0].source = { kind: 'geometry', captureArea: '5.6 ft2', throatArea: '5.0 ft2', fanFaceArea: '6 ft2', diffuserLossCoefficient: 0.1 };
    const project = parsed(JSON.stringify(doc));
    expect(parsed(projectToJson(project))).toEqual(project);
  });

  it('projectToJson writes mission.destinationElevation in metres and only when the project has one', () => {
    const doc = JSON.parse(fixture('demo/demo.blockwise.json')) as { mission: Record<string, unknown> };
    doc.mission.destinationElevation = '450 ft';
    const project = parsed(JSON.stringify(doc));
    const written = JSON.parse(projectToJson(project)) as { mission: { destinationElevation?: string } };
    // 450 ft = 137.16 m (NIST SP 811: 1 ft = 0.3048 m).
    expect(written.mission.destinationElevation).toBe('137.16 m');
    expect(parsed(projectToJson(project))).toEqual(project);
    delete doc.mission.destinationElevation;
    const without = JSON.parse(projectToJson(parsed(JSON.stringify(doc)))) as { mission: Record<string, unknown> };
    expect('destinationElevation' in without.mission).toBe(false);
  });

  it('projectToJson round-trips arbitrary finite values of quantity fields exactly', () => {
    const base = parsed(fixture('demo/demo.blockwise.json'));
    fc.assert(
      fc.property(
        fc.double({ min: 1e-6, max: 1e6, noNaN: true }),
        fc.double({ min: 1e-6, max: 1e4, noNaN: true }),
        // -0 and 0 are the same deviation; JSON writes both as 0. A subnormal number is refused by the schema (not a
        // physical value), so the generator reads it as 0.
        fc.double({ min: -80, max: 80, noNaN: true }).map((v) => (Math.abs(v) < 2.2250738585072014e-308 ? 0 : v)),
        fc.double({ min: 0, max: 1, noNaN: true }).map((v) => (v < 2.2250738585072014e-308 ? 0 : v)),
        (mass, area, isaDev, fraction) => {
          const project: Project = {
            ...base,
            airframe: { ...base.airframe, wingArea: area, weights: { ...base.airframe.weights, maxFuel: mass } },
            mission: { ...base.mission, isaDeviation: isaDev },
            // A constant lip-suction factor replaces the demo's lip-suction table (the schema takes one of the two).
            inlets: base.inlets.map(({ lipSuction: _table, ...i }) => ({ ...i, lipSuctionFactor: fraction })),
          };
          expect(parsed(projectToJson(project))).toEqual(project);
        },
      ),
      { numRuns: 200 },
    );
  });
});
