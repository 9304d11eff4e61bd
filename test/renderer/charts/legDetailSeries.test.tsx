import { render, screen, fireEvent } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { toDisplay } from '../../../engine/units';
import { legDetailSeries, legSampleIndices } from '../../../renderer/charts/legDetailSeries';
import { LegDetailPlots } from '../../../renderer/components/LegDetailPlots';
import type { StudySnapshot } from '../../../renderer/worker/engineProtocol';
import { demoState } from '../support/studyHarness';
import { flyStudy } from '../support/demoStudy';

let snapshot: StudySnapshot;
beforeAll(() => {
  const s = demoState();
  snapshot = flyStudy({ project: s.doc!.present, deckFile: s.deckFile });
});

const tripLegs = () => snapshot.mission.legs.filter((l) => l.kind !== 'reserve');

describe('legDetailSeries', () => {
  it("each trip leg's series spans exactly the leg's time, and the mass it loses is the leg's fuel (mass conservation, dm/dt = -fuel flow)", () => {
    const m = snapshot.mission;
    const h = m.history;
    for (const leg of tripLegs()) {
      const idx = legSampleIndices(h, leg.index);
      expect(idx.length, leg.name).toBeGreaterThanOrEqual(2);
      expect(h.time_s[idx[0]!]!, leg.name).toBeCloseTo(leg.startTime_s, 6);
      expect(h.time_s[idx[idx.length - 1]!]!, leg.name).toBeCloseTo(leg.endTime_s, 6);
      const lost = h.mass_kg[idx[0]!]! - h.mass_kg[idx[idx.length - 1]!]!;
      expect(Math.abs(lost - leg.fuel_kg), leg.name).toBeLessThan(1e-6 * leg.fuel_kg + 1e-9);
      const d = legDetailSeries(h, m.legs, leg.index, 'si')!;
      expect(d.startTime_s).toBe(h.time_s[idx[0]!]);
      expect(d.rows[0]!.time).toBe(0);
      expect(d.rows[d.rows.length - 1]!.time).toBeCloseTo(toDisplay(leg.endTime_s - leg.startTime_s, 'time', 'si'), 9);
      expect(d.legStarts).toEqual([]);
    }
  });

  it('the whole trip is thinned to the point budget keeping both ends, in display units, with a mark where each later leg starts', () => {
    const m = snapshot.mission;
    const h = m.history;
    const d = legDetailSeries(h, m.legs, null, 'customary', 20)!;
    expect(d.rows).toHaveLength(Math.min(20, h.time_s.length));
    const last = h.time_s.length - 1;
    expect(d.rows[d.rows.length - 1]!.drag).toBeCloseTo(toDisplay(h.drag_N[last]!, 'force', 'customary'), 9);
    // 1 lbf = 4.4482216152605 N exactly (NIST SP 811 B.8)
    expect(d.rows[0]!.thrustUsed).toBeCloseTo(h.thrustUsed_N[0]! / 4.4482216152605, 6);
    expect(d.legStarts.map((s) => s.label)).toEqual(tripLegs().filter((l) => l.index > 0 && l.startTime_s > h.time_s[0]!).map((l) => String(l.index + 1)));
    for (const row of d.rows) for (const v of Object.values(row)) expect(Number.isFinite(v)).toBe(true);
  });

  it('a leg with no samples gives null, not an empty plot', () => {
    expect(legDetailSeries(snapshot.mission.history, snapshot.mission.legs, 999, 'si')).toBeNull();
  });
});

describe('LegDetailPlots', () => {
  it('offers the whole trip and every flown leg numbered as the legs table numbers them, and draws three plots for the one chosen', () => {
    render(<LegDetailPlots mission={snapshot.mission} units="customary" />);
    const select = screen.getByTestId('leg-detail-choice') as HTMLSelectElement;
    const labels = [...select.options].map((o) => o.textContent);
    expect(labels[0]).toBe('Whole trip');
    expect(labels.slice(1)).toEqual(tripLegs().map((l) => `${l.index + 1}. ${l.name}`));
    const cruise = tripLegs().find((l) => l.kind === 'cruise')!;
    fireEvent.change(select, { target: { value: String(cruise.index) } });
    expect(select.value).toBe(String(cruise.index));
    for (const id of ['chart-leg-forces', 'chart-leg-fuel-flow', 'chart-leg-speeds']) expect(screen.getByTestId(id).querySelector('svg'), id).not.toBeNull();
    expect(screen.getByTestId('chart-leg-fuel-flow').textContent).toContain('lb/h');
  });
});
