import { beforeAll, describe, expect, it } from 'vitest';
import { parseProject } from '../../../engine/project/parseProject';
import type { Project } from '../../../engine/project/projectSchema';
import { createDeckCache, runEngineRequest } from '../../../renderer/worker/engineRunner';
import type { EngineReplies, StudyInputs } from '../../../renderer/worker/engineProtocol';
import { POLAR_CLS, POLAR_MACHS } from '../../../renderer/worker/studyCurves';
import { interpolateAt } from '../../../renderer/charts/crossoverSeries';
import { expectClose } from '../../support/assertInDelta';
import { demoFiles, fixtureText } from '../support/fakeBridge';

const FT = 0.3048;

let demo: StudyInputs;
beforeAll(() => {
  const d = demoFiles();
  const p = parseProject(d.projectText, d.projectName);
  if (!p.ok) throw new Error(JSON.stringify(p.error));
  demo = { project: p.value, deckFile: { name: d.deckName, text: d.deckText } };
});

function study(inputs: StudyInputs): EngineReplies['study'] {
  const r = runEngineRequest({ kind: 'study', ...inputs }, createDeckCache());
  if (!r.ok) throw new Error(JSON.stringify(r.error));
  return r.value as EngineReplies['study'];
}

describe('runEngineRequest study', () => {
  it('flies the demo and summarises its deck as the CSV file lists it', () => {
    const s = study(demo);
    expect(s.mission.status).toBe('ok');
    expect(s.mission.blockFuel_kg).toBeGreaterThan(0);
    expect(s.inletName).toBe(demo.project.activeInlet);
    // Independent count: data rows of fixtures/demo/demo-engine.deck.csv (lines that are not comments or the header)
    const rows = demo.deckFile!.text.split('\n').filter((l) => l.trim() !== '' && !l.startsWith('#'));
    expect(s.deck.points).toBe(rows.length - 1);
    const altitudes_ft = new Set(rows.slice(1).map((l) => Number(l.split(',')[0])));
    expect(s.deck.altitudeCount).toBe(altitudes_ft.size);
    expectClose(s.deck.altitudes_m[1], Math.max(...altitudes_ft) * FT, { rel: 1e-9 }, 'NIST SP 811 ft');
    // The file's own "# reference recovery:" line (the cycle deck's is 1, its design inlet recovery).
    const refLine = demo.deckFile!.text.split('\n').find((l) => l.startsWith('# reference recovery:'))!;
    expect(s.deck.referenceRecovery).toBe(refLine.endsWith('MIL-E-5008B') ? 'MIL-E-5008B' : `constant ${refLine.split(':')[1]!.trim()}`);
    expect(s.inlets.map((i) => i.name)).toEqual(demo.project.inlets.map((i) => i.name));
    expect(s.inlets.filter((i) => i.active).map((i) => i.name)).toEqual([demo.project.activeInlet]);
  });

  it('plots the drag polar as CD0(M) + dCD0 + K (CL - CLmd)^2 with K = 1/(pi AR e) when wave drag is off', () => {
    const p: Project = { ...demo.project, polar: { ...demo.project.polar, compressibility: { kind: 'none' } } };
    const s = study({ ...demo, project: p });
    const induced = p.polar.induced;
    if (induced.kind !== 'oswald') throw new Error('demo polar uses aspect ratio and Oswald efficiency');
    // Raymer, Aircraft Design, eq. 12.48: K = 1 / (pi A e); parabolic polar about CLmd (eq. 12.5)
    const K = 1 / (Math.PI * induced.aspectRatio * induced.oswaldEfficiency);
    const inlet = p.inlets.find((i) => i.name === p.activeInlet)!;
    // external-drag increment D/q per engine x engines / S (docs: project format, D/q definition)
    const dcd0 = (inlet.externalDragArea * p.engine.count) / p.airframe.wingArea + p.polar.cdIncrement;
    const rows = p.polar.cd0;
    const cd0At = (m: number) => {
      // linear interpolation in the CD0 table (common practice)
      for (let i = 0; i + 1 < rows.length; i++) {
        const a = rows[i]!;
        const b = rows[i + 1]!;
        if (m >= a.mach && m <= b.mach) return a.cd0 + ((b.cd0 - a.cd0) * (m - a.mach)) / (b.mach - a.mach);
      }
      throw new Error(`Mach ${m} outside the demo CD0 table`);
    };
    POLAR_MACHS.forEach((m, i) => {
      POLAR_CLS.forEach((cl, j) => {
        const expected = cd0At(m) + dcd0 + K * (cl - p.polar.clMinDrag) ** 2;
        expectClose(s.polar.cd[i]![j]!, expected, { rel: 1e-12 }, 'Raymer eq. 12.5 and 12.48');
      });
    });
  });

  it('gives installed thrust below uninstalled and recovery at most the deck reference at high Mach (losses, common practice)', () => {
    const s = study(demo);
    // the demo deck names takeoff, maxClimb, maxCruise, maxContinuous and flightIdle (fixtures/demo/demo-engine.deck.csv)
    expect(s.lapse.map((l) => l.rating)).toEqual(['maxCruise', 'maxClimb', 'maxContinuous', 'takeoff']);
    for (const set of s.lapse) {
      const last = set.mach.length - 1;
      for (let a = 0; a < set.altitudes_m.length; a++) {
        const u = set.uninstalledThrust_N[a]![last];
        const i = set.installedThrust_N[a]![last];
        if (u !== null && i !== null) expect(i).toBeLessThan(u);
      }
    }
    for (const inlet of s.inlets) for (const r of inlet.recovery) if (r !== null) expect(r).toBeLessThanOrEqual(1);
  });
});

describe('runEngineRequest failures', () => {
  it('asks for the deck file when the project names one and none was imported', () => {
    const r = runEngineRequest({ kind: 'study', project: demo.project, deckFile: null }, createDeckCache());
    expect(r.ok).toBe(false);
    if (!r.ok && r.error.kind === 'project') {
      expect(r.error.issues[0]!.path).toBe('engine.deck.path');
      expect(r.error.issues[0]!.message).toMatch(/import it/);
    } else throw new Error('expected a project failure');
  });

  it("returns a bad deck's errors with line and column as fixtures/bad-decks/expected.json states them", () => {
    const expected = JSON.parse(fixtureText('fixtures/bad-decks/expected.json')) as Record<string, string>;
    for (const name of ['non-numeric-cell.csv', 'ragged-row.csv', 'unknown-unit.csv']) {
      const r = runEngineRequest({ kind: 'study', project: demo.project, deckFile: { name, text: fixtureText(`fixtures/bad-decks/${name}`) } }, createDeckCache());
      if (r.ok || r.error.kind !== 'deck') throw new Error(`expected deck errors for ${name}`);
      // expected.json holds the start of each message (the parser may add detail after it)
      expect(r.error.errors.some((e) => e.message.startsWith(expected[name]!))).toBe(true);
      expect(r.error.errors[0]!.line).not.toBeNull();
    }
  });

  it('reports an analysis error as a failure with its code', () => {
    const r = runEngineRequest({ kind: 'crossover', ...demo, query: { altitude_m: 10000, mass_kg: -5, rating: 'maxCruise', isaDev_K: 0, allInlets: false } }, createDeckCache());
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatchObject({ kind: 'analysis', code: 'invalid_input' });
  });
});

describe('runEngineRequest long runs', () => {
  it('payload-range reports each mission flown, then its corners in order of range or the mission that failed', () => {
    const progress: [number, number][] = [];
    const r = runEngineRequest({ kind: 'payloadRange', ...demo }, createDeckCache(), { onProgress: (d, t) => progress.push([d, t]) });
    expect(progress.length).toBeGreaterThan(0);
    for (let k = 1; k < progress.length; k++) expect(progress[k]![0]).toBeGreaterThan(progress[k - 1]![0]);
    for (const [d, t] of progress) expect(d).toBeLessThanOrEqual(t);
    if (!r.ok) {
      // the engine may refuse a point it cannot converge; the runner passes its code and message on
      expect(r.error).toMatchObject({ kind: 'analysis', code: 'mission_failed' });
      return;
    }
    const value = r.value as EngineReplies['payloadRange'];
    // one report per mission flown, the last one saying all of them are done
    expect(progress.length).toBe(value.missions);
    expect(progress[progress.length - 1]).toEqual([value.missions, value.missions]);
    const ranges = value.points.map((p) => p.range_m);
    expect([...ranges].sort((a, b) => a - b)).toEqual(ranges);
  });

  it('stops between missions when asked to cancel', () => {
    let flown = 0;
    const r = runEngineRequest({ kind: 'tradeFactors', ...demo }, createDeckCache(), { onProgress: () => flown++, shouldCancel: () => flown >= 2 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatchObject({ kind: 'analysis', code: 'cancelled' });
    expect(flown).toBe(2);
  });

  it('crossover with every inlet gives one curve set per design with crossovers inside the Mach range', () => {
    const r = runEngineRequest({ kind: 'crossover', ...demo, query: { altitude_m: 35000 * FT, mass_kg: 15000, rating: 'maxCruise', isaDev_K: 0, allInlets: true } }, createDeckCache());
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    const set = r.value as EngineReplies['crossover'];
    expect(set.curves.map((c) => c.inletName)).toEqual(demo.project.inlets.map((i) => i.name));
    let checked = 0;
    for (const { result } of set.curves) {
      for (const m of [result.lowMach, result.highMach]) {
        if (m === null) continue;
        checked++;
        expect(m).toBeGreaterThanOrEqual(result.machRange[0]);
        expect(m).toBeLessThanOrEqual(result.machRange[1]);
        // a crossover is where thrust available equals drag (Anderson, Aircraft Performance and Design, ch. 5);
        // read off the plotted curves by linear interpolation, so only to the curve spacing
        const c = result.curves;
        const t = interpolateAt(c.mach, c.thrustAvailable_N, m)!;
        const d = interpolateAt(c.mach, c.drag_N, m)!;
        expectClose(t, d, { rel: 0.02 }, 'T = D at a crossover');
      }
    }
    // at FL350 and 15 t the demo has a high-speed crossover below Mach 0.95 for each design
    expect(checked).toBeGreaterThanOrEqual(set.curves.length);
  });
});
