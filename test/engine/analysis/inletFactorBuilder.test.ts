import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { inletFactorBuilder } from '../../../engine/analysis/inletFactorBuilder';
import type { FactorChoice } from '../../../engine/analysis/inletComparison';
import { expectOk } from '../../../engine/core/result';
import { buildMissionInput, projectInlet } from '../../../engine/project/buildMissionInput';
import { parseProject } from '../../../engine/project/parseProject';
import { projectDeck } from '../../../engine/project/projectDeck';
import { cautionSettingsOf, installationOf } from '../../../engine/project/projectSpecs';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import { expectClose } from '../../support/assertInDelta';

// The invented demo project and deck (fixtures/demo).
const root = fileURLToPath(new URL('../../../fixtures/demo/', import.meta.url));
const project = expectOk(parseProject(readFileSync(`${root}demo.blockwise.json`, 'utf8'), 'demo'), 'demo project');
const deck = expectOk(parseDeckCsv(readFileSync(`${root}demo-engine.deck.csv`, 'utf8'), 'demo deck'), 'demo deck');
const [nameA, nameB] = [project.inlets[0]!.name, project.inlets[1]!.name];
const inputA = expectOk(buildMissionInput(project, { deck }, { inletName: nameA }), 'A');
const inputB = expectOk(buildMissionInput(project, { deck }, { inletName: nameB }), 'B');
const build = inletFactorBuilder({
  inputA,
  inputB,
  inletA: expectOk(projectInlet(project, nameA), 'inlet A'),
  inletB: expectOk(projectInlet(project, nameB), 'inlet B'),
  deck: expectOk(projectDeck(project, { deck }), 'deck'),
  engineCount: project.engine.count,
  installation: installationOf(project),
  cautionSettings: cautionSettingsOf(project),
});
const all = (x: 'A' | 'B'): FactorChoice => ({ recovery: x, spillage: x, externalDrag: x, weight: x });
const cond = { altitude_m: 10000, mach: 0.78, isaDev_K: 0 };

describe('inletFactorBuilder', () => {
  it('inletFactorBuilder returns the designs\' own inputs for all-A and all-B', () => {
    const a = build(all('A'));
    const b = build(all('B'));
    expect(a.propulsion).toBe(inputA.propulsion);
    expect(a.aero).toBe(inputA.aero);
    expect(a.airframe).toBe(inputA.airframe);
    expect(b.propulsion).toBe(inputB.propulsion);
    expect(b.aero).toBe(inputB.aero);
    expect(b.airframe).toBe(inputB.airframe);
  });

  it('inletFactorBuilder mixes B\'s recovery with A\'s spillage, drag and weight', () => {
    const mix = build({ recovery: 'B', spillage: 'A', externalDrag: 'A', weight: 'A' });
    const pm = mix.propulsion.atRating(cond, 'maxCruise').perEngine;
    const pa = inputA.propulsion.atRating(cond, 'maxCruise').perEngine;
    const pb = inputB.propulsion.atRating(cond, 'maxCruise').perEngine;
    expect(pa.recovery).not.toBe(pb.recovery);
    expectClose(pm.recovery, pb.recovery, { abs: 1e-12 }, 'recovery from B');
    expect(mix.airframe.oew_kg).toBe(inputA.airframe.oew_kg);
    expect(mix.aero).toBe(inputA.aero);
    // Spillage depends on airflow and capture area: with A's capture area it differs from B's spillage
    // whenever the two capture areas differ.
    const spill = build({ recovery: 'A', spillage: 'B', externalDrag: 'A', weight: 'A' }).propulsion.atRating(cond, 'maxCruise').perEngine;
    expectClose(spill.recovery, pa.recovery, { abs: 1e-12 }, 'recovery from A');
    // The demo inlets differ in capture area (6.3 vs 6.1 ft2) and lip suction (0.7 vs 0.5), so spillage differs;
    // with B's capture area and lip, the mix's spillage lies near B's (airflow differs slightly through recovery).
    expect(pa.spillageDrag_N).not.toBe(pb.spillageDrag_N);
    expect(Math.abs(spill.spillageDrag_N - pb.spillageDrag_N)).toBeLessThan(Math.abs(spill.spillageDrag_N - pa.spillageDrag_N));
    expect(Math.abs(pm.spillageDrag_N - pa.spillageDrag_N)).toBeLessThan(Math.abs(pm.spillageDrag_N - pb.spillageDrag_N));
  });

  it('inletFactorBuilder takes OEW and the drag increment from the weight and external-drag choices', () => {
    const m = build({ recovery: 'A', spillage: 'A', externalDrag: 'B', weight: 'B' });
    expect(m.airframe.oew_kg).toBe(inputB.airframe.oew_kg);
    const q = { altitude_m: 10000, mach: 0.78, mass_kg: 14000, loadFactor: 1 };
    expectClose(m.aero.drag(q).cdIncrement, inputB.aero.drag(q).cdIncrement, { abs: 1e-15 });
  });
});
