/** The compare view's overlaid mission profiles of two inlet designs (the 'profiles' request). */
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import type { MissionResult, TimeHistory } from '../../../engine/mission/missionTypes';
import { toDisplay } from '../../../engine/units';
import { profileCompareRows, profileKey } from '../../../renderer/charts/profileCompareSeries';
import type { DesignProfile, ProfilesReply } from '../../../renderer/worker/engineProtocol';
import { createDeckCache, runEngineRequest } from '../../../renderer/worker/engineRunner';
import type { LiveStudy } from '../../../renderer/worker/useEngine';
import { CompareView } from '../../../renderer/views/CompareView';
import { expectClose } from '../../support/assertInDelta';
import { demoState, renderWithStudy, TEST_CHART } from '../support/studyHarness';
import { flyStudy } from '../support/demoStudy';

// Conversion factors, NIST SP 811 appendix B (exact): 1 nmi = 1852 m, 1 lb = 0.45359237 kg, 1 ft = 0.3048 m.
const NMI = 1852;
const LB = 0.45359237;
const NIST = 'NIST SP 811 appendix B';

let reply: ProfilesReply;
let names: string[];
beforeAll(() => {
  const s = demoState();
  names = s.doc!.present.inlets.map((i) => i.name);
  const r = runEngineRequest({ kind: 'profiles', project: s.doc!.present, deckFile: s.deckFile, designs: [names[0]!, names[1]!] }, createDeckCache());
  if (!r.ok) throw new Error(JSON.stringify(r.error));
  reply = r.value as ProfilesReply;
});

/** The last row carrying design k's key of `quantity`. */
function lastOf(rows: ReturnType<typeof profileCompareRows>, quantity: 'altitude' | 'mass' | 'fuel', k: number) {
  const own = rows.filter((r) => r[profileKey(quantity, k)] !== undefined);
  return { first: own[0]!, last: own[own.length - 1]!, count: own.length };
}

describe("the 'profiles' request", () => {
  it('flies each design on the study request\'s code path: the same block fuel as the study of that inlet', () => {
    expect(names.length).toBeGreaterThanOrEqual(2);
    const s = demoState();
    for (const [k, name] of [names[0]!, names[1]!].entries()) {
      const project = { ...s.doc!.present, activeInlet: name };
      const study = flyStudy({ project, deckFile: s.deckFile });
      const mission = study.mission;
      expect(study.inletName).toBe(name);
      expect(reply.designs[k]!.name).toBe(name);
      // The same input solved by the same function: equal to the last bit.
      expect(reply.designs[k]!.mission.blockFuel_kg).toBe(mission.blockFuel_kg);
      expect(reply.designs[k]!.mission.tripFuel_kg).toBe(mission.tripFuel_kg);
    }
  });

  it("ends each design's line at its own mission distance, with fuel burned at the end equal to its trip fuel", () => {
    const rows = profileCompareRows(reply.designs, 'si');
    reply.designs.forEach((d, k) => {
      const { first, last } = lastOf(rows, 'fuel', k);
      // The history's distance is the still-air distance (timeHistoryBuilder records S_AIR): the mission's airDistance_m.
      expectClose(last.distance, toDisplay(d.mission.airDistance_m, 'distance', 'si'), { rel: 1e-12 }, 'mission result, air distance');
      // Mass conservation (common practice): fuel burned = take-off mass - mass, so at landing it is the trip fuel.
      expectClose(last[profileKey('fuel', k)]!, toDisplay(d.mission.tripFuel_kg, 'mass', 'si'), { rel: 1e-9 }, 'mass conservation');
      expectClose(first[profileKey('mass', k)]!, toDisplay(d.mission.takeoffMass_kg, 'mass', 'si'), { rel: 1e-12 }, 'trip starts at take-off mass');
      expectClose(last[profileKey('mass', k)]!, toDisplay(d.mission.landingMass_kg, 'mass', 'si'), { rel: 1e-12 }, 'trip ends at landing mass');
      expect(first[profileKey('fuel', k)]).toBe(0);
    });
  });
});

/** A synthetic trip: `n` samples, distance i * step nmi, mass 10000 - i kg, taxi out and taxi in around it. */
function synthetic(name: string, n: number, step_nmi: number): DesignProfile {
  const total = n + 2;
  const col = (f: (i: number) => number) => Float64Array.from({ length: total }, (_, i) => f(i));
  const trip = (i: number) => Math.min(Math.max(i - 1, 0), n - 1);
  const history = {
    time_s: col((i) => 10 * i),
    distance_m: col((i) => trip(i) * step_nmi * NMI),
    altitude_m: col(() => 3000),
    mass_kg: col((i) => 10100 - 50 * Math.min(i, 1) - trip(i) - 25 * Math.max(i - n, 0)),
    legIndex: Int32Array.from({ length: total }, (_, i) => (i === 0 ? 0 : i === total - 1 ? 2 : 1)),
  } as unknown as TimeHistory;
  return { name, mission: { history } as MissionResult, tripLegs: [1, 1] };
}

describe('profileCompareRows', () => {
  it("keeps each design on its own keys and ends its line at its own final distance, leaving the taxi legs out", () => {
    const rows = profileCompareRows([synthetic('short', 11, 10), synthetic('long', 501, 2)], 'customary', 50);
    const a = lastOf(rows, 'altitude', 0);
    const b = lastOf(rows, 'altitude', 1);
    // Closed form: short ends at 10 * 10 nmi, long at 500 * 2 nmi; NIST SP 811 for the metre per nmi.
    expectClose(a.last.distance, 100, { rel: 1e-12 }, NIST);
    expectClose(b.last.distance, 1000, { rel: 1e-12 }, NIST);
    expect(a.count).toBe(11);
    expect(b.count).toBe(50);
    expect(rows.filter((r) => r[profileKey('altitude', 0)] !== undefined && r[profileKey('altitude', 1)] !== undefined)).toHaveLength(0);
    // Fuel burned from the trip's first mass (10050 kg, after the 50 kg taxi out), not from the ramp mass.
    expectClose(b.last[profileKey('fuel', 1)]!, 500 / LB, { rel: 1e-12 }, NIST);
    expectClose(a.first[profileKey('mass', 0)]!, 10050 / LB, { rel: 1e-12 }, NIST);
  });
});

describe('CompareView profiles panel', () => {
  const live: LiveStudy = { snapshot: null, snapshotRevision: 0, revision: 0, stale: false, running: false, failure: null } as unknown as LiveStudy;

  it('draws three plots with one series per design, named after it, in customary units only', async () => {
    renderWithStudy(<CompareView live={live} chartSize={TEST_CHART} />);
    fireEvent.click(screen.getByTestId('profiles-run'));
    await waitFor(() => expect(screen.getByTestId('chart-profiles-fuel').querySelector('svg')).not.toBeNull(), { timeout: 30000 });
    for (const q of ['altitude', 'mass', 'fuel']) {
      const chart = screen.getByTestId(`chart-profiles-${q}`);
      const legend = [...chart.querySelectorAll('.recharts-legend-item-text')].map((e) => e.textContent);
      expect(legend).toEqual([names[0], names[1]]);
      expect(chart.querySelectorAll('path.recharts-curve.recharts-line-curve')).toHaveLength(2);
      // Customary display (the demo's units): no SI unit in the axis labels or ticks.
      expect(chart.textContent).not.toMatch(/\bkg\b|\bkm\b|\(m\)/);
      expect(chart.textContent).toMatch(q === 'altitude' ? /\(ft\)/ : /\(lb\)/);
    }
    const summary = screen.getByTestId('profiles-summary').textContent!;
    expect(summary).toContain(names[0]!);
    expect(summary).toContain(names[1]!);
    expect(summary).not.toMatch(/\bkg\b|\bkm\b/);
  }, 60000);
});
