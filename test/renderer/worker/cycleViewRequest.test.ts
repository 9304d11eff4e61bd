import { beforeAll, describe, expect, it } from 'vitest';
import { parseProject } from '../../../engine/project/parseProject';
import type { Project } from '../../../engine/project/projectSchema';
import { createDeckCache, runEngineRequest } from '../../../renderer/worker/engineRunner';
import type { CycleViewReply, CycleViewRequest } from '../../../renderer/worker/engineProtocol';
import { demoFiles, fixtureText } from '../support/fakeBridge';

const FT = 0.3048;
const CYCLE_NAME = 'demo-turbofan.cycle.json';
const cycleText = fixtureText('fixtures/cycle/demo-turbofan.cycle.json');

/** The demo project with the demo cycle as its engine, on a small deck grid (fast to generate). */
function cycleProject(): Project {
  const d = demoFiles();
  const p = parseProject(d.projectText, d.projectName);
  if (!p.ok) throw new Error(JSON.stringify(p.error));
  const grid = { altitudes: [0, 20000, 45000].map((f) => f * FT), machs: [0, 0.45, 0.9] };
  return { ...p.value, engine: { ...p.value.engine, deck: { kind: 'cycle', path: CYCLE_NAME, grid } } } as Project;
}

function run(request: CycleViewRequest): CycleViewReply {
  const r = runEngineRequest(request, createDeckCache());
  if (!r.ok) throw new Error(JSON.stringify(r.error));
  return r.value as CycleViewReply;
}

const query = {
  point: { altitude_m: 30000 * FT, mach: 0.78, isaDev_K: 0, throttle: { kind: 'rating', rating: 'maxCruise' } },
  curveRating: 'maxCruise',
  curveFanSpeed: 0.9,
} as const;

describe('cycleView request', () => {
  let withProject: CycleViewReply;
  beforeAll(() => {
    withProject = run({ kind: 'cycleView', project: cycleProject(), deckFile: { name: CYCLE_NAME, text: cycleText }, query });
  });

  it('closes the core mass balance in the station table (mass conservation)', () => {
    const p = withProject.point;
    expect(p.status).toBe('converged');
    const w = Object.fromEntries(p.stations.map((s) => [s.station, s.massFlow_kg_s]));
    const spec = withProject.spec;
    const rel = 1e-9;
    // Mass conservation at the fan splitter: W2 = W21 + W13, and W21 / W13 = 1 / BPR (definition of bypass ratio)
    expect(Math.abs(w['2']! - (w['21']! + w['13']!)) / w['2']!).toBeLessThan(rel);
    expect(Math.abs(w['13']! / w['21']! - p.bypassRatio!)).toBeLessThan(1e-9);
    // Compressor: no flow added or lost (W25 = W3 = W21); bleed taken before the burner: W31 = W3 (1 - bleed)
    expect(w['25']).toBe(w['21']);
    expect(Math.abs(w['31']! - w['3']! * (1 - p.bleedFraction)) / w['3']!).toBeLessThan(rel);
    // Burner: W4 = W31 + Wf when the fuel's mass is carried through the core, else W4 = W31
    const wf = spec.fuel.massInCore ? p.fuelFlow_kg_s! : 0;
    expect(Math.abs(w['4']! - (w['31']! + wf)) / w['4']!).toBeLessThan(rel);
    // Turbines and nozzle: W4 = W45 = W5 = W9
    for (const s of ['45', '5', '8', '9']) expect(w[s]).toBe(w['4']);
    // Free stream is the engine's total airflow
    expect(Math.abs(w['0']! - p.airflow_kg_s!) / w['0']!).toBeLessThan(rel);
  });

  it('gives thrust at a fixed fan speed near sea level that falls with Mach from Mach 0.2 (ram drag, common practice)', () => {
    const c = withProject.fanSpeedCurves;
    expect(c.altitudes_m[0]).toBe(0);
    const line = c.uninstalledThrust_N[0]!;
    const i02 = c.mach.findIndex((m) => Math.abs(m - 0.2) < 1e-9);
    const i05 = c.mach.findIndex((m) => Math.abs(m - 0.5) < 1e-9);
    expect(i02).toBeGreaterThanOrEqual(0);
    for (let i = i02; i < i05; i++) expect(line[i + 1]!, `Mach ${c.mach[i + 1]}`).toBeLessThan(line[i]!);
    // Installed: every installed point below its uninstalled one (recovery below the design's, bleed, extraction, spillage: losses, common practice)
    const installed = c.installedThrust_N![0]!;
    for (let i = i02; i <= i05; i++) expect(installed[i]!).toBeLessThan(line[i]!);
  });

  it('has rating curves with thrust falling with altitude at a Mach (air density lapse, common practice)', () => {
    const c = withProject.ratingCurves;
    const i = c.mach.findIndex((m) => Math.abs(m - 0.5) < 1e-9);
    const col = c.uninstalledThrust_N.map((row) => row[i]!);
    for (let a = 1; a < col.length; a++) expect(col[a]!).toBeLessThan(col[a - 1]!);
    expect(withProject.inletName).toBe(cycleProject().activeInlet);
  });

  it('reports a point that does not match with its status and message, no numbers', () => {
    const bad = run({ kind: 'cycleView', project: null, deckFile: { name: CYCLE_NAME, text: cycleText }, query: { ...query, point: { ...query.point, throttle: { kind: 'fanSpeed', fraction: 1.6 } } } });
    expect(bad.point.status).toBe('invalid_condition');
    expect(bad.point.message).toMatch(/fan speed 1.6/);
    expect(bad.point.thrust_N).toBeNull();
    expect(bad.point.stations).toEqual([]);
    expect(bad.ratingCurves.installedThrust_N).toBeNull();
  });

  it('refuses a cycle file that does not parse, naming the file', () => {
    const r = runEngineRequest({ kind: 'cycleView', project: null, deckFile: { name: 'x.cycle.json', text: '{"format": 1}' }, query }, createDeckCache());
    expect(r.ok).toBe(false);
    if (!r.ok) expect(JSON.stringify(r.error)).toMatch(/x\.cycle\.json/);
  });

  it('reports progress by Mach line and stops when cancelled', () => {
    const seen: [number, number][] = [];
    const request: CycleViewRequest = { kind: 'cycleView', project: null, deckFile: { name: CYCLE_NAME, text: cycleText }, query };
    const whole = runEngineRequest(request, createDeckCache(), { onProgress: (d, t) => seen.push([d, t]) });
    expect(whole.ok).toBe(true);
    // two throttles x four altitudes, counted one line at a time
    expect(seen.map(([d]) => d)).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
    expect(seen.every(([, t]) => t === 8)).toBe(true);
    let lines = 0;
    const stopped = runEngineRequest(request, createDeckCache(), { onProgress: () => (lines += 1), shouldCancel: () => lines >= 2 });
    expect(stopped.ok).toBe(false);
    if (!stopped.ok) expect(stopped.error).toMatchObject({ kind: 'analysis', code: 'cancelled' });
    expect(lines).toBe(2);
  });
});
