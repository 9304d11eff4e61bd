/**
 * The +1 % recovery trade factor by method. Checks: a stand-in solver whose
 * block fuel is linear in the recovery offset gives back its slope exactly
 * (central differences are exact on a line); unavailable methods say why;
 * on the demo, Raymer's rule with fuel held at the power setting saves more
 * fuel per point of recovery than with fuel scaled with recovery, since the
 * scaled convention also raises fuel flow with the recovered pressure
 * (Raymer's bookkeeping and corrected fuel flow held, Walsh & Fletcher).
 */
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import type { MissionInput, MissionResult } from '../../../engine/mission/missionTypes';
import type { PropulsionModel } from '../../../engine/propulsion/propulsionModel';
import { recoveryTradeByMethod } from '../../../engine/analysis/recoveryTradeByMethod';
import { recoveryMethodVariants } from '../../../engine/project/recoveryMethodVariants';
import { expectClose } from '../../support/assertInDelta';
import { demoProject } from '../uncertainty/demoStudy';

/** A propulsion stand-in that remembers its recovery offset. */
function offsetModel(offset: number): PropulsionModel {
  return { offset, withRecoveryOffset: (d: number) => offsetModel(offset + d) } as unknown as PropulsionModel;
}

describe('recoveryTradeByMethod', () => {
  it('recovers a linear response exactly and reports unavailable methods with their reason', () => {
    const input = { solve: { kind: 'payloadRange', payload_kg: 500, range_m: 1e6 }, propulsion: offsetModel(0) } as unknown as MissionInput;
    const solve = (m: MissionInput) => ({ status: 'ok', statusMessage: '', blockFuel_kg: 5000 - 6000 * (m.propulsion as unknown as { offset: number }).offset }) as unknown as MissionResult;
    const r = expectOk(recoveryTradeByMethod([{ id: 'a', label: 'a', input }, { id: 'b', label: 'b', input: { unavailable: 'no columns' } }], { solve }), 'trade');
    // d(block fuel)/d(+0.01 recovery) = -6000 x 0.01 = -60 kg, both steps (central differences are exact on a line).
    expectClose(r.rows[0]!.blockFuelPerPercent_kg!, -60, { abs: 1e-9 }, 'slope of the line');
    expectClose(r.rows[0]!.halfStep_kg!, -60, { abs: 1e-9 }, 'slope of the line');
    expect(r.rows[0]!.converged).toBe(true);
    expect(r.rows[1]).toMatchObject({ blockFuelPerPercent_kg: null, note: 'no columns' });
    expect(r.relativeToFirst).toEqual([0, null]);
  });

  it('takes a case computed elsewhere on the same input instead of flying it, and says so', () => {
    const input = { solve: { kind: 'payloadRange', payload_kg: 500, range_m: 1e6 }, propulsion: offsetModel(0) } as unknown as MissionInput;
    let flown = 0;
    const solve = (m: MissionInput) => {
      flown++;
      return { status: 'ok', statusMessage: '', blockFuel_kg: 5000 - 6000 * (m.propulsion as unknown as { offset: number }).offset } as unknown as MissionResult;
    };
    const progress: [number, number][] = [];
    const known = { baselineBlockFuel_kg: 4000, blockFuelPerPercent_kg: -40, halfStep_kg: -30 };
    const r = expectOk(
      recoveryTradeByMethod([{ id: 'a', label: 'a', input }, { id: 'own', label: 'own', input }], { solve, reuse: (c) => (c.id === 'own' ? known : undefined), onProgress: (d, t) => progress.push([d, t]) }),
      'trade',
    );
    // One case flown (the design mission and four steps), the other taken as given.
    expect(flown).toBe(5);
    expect(r.missions).toBe(5);
    expect(r.reused).toEqual(['own']);
    expect(progress.at(-1)).toEqual([5, 5]);
    // -40 against -30 kg: |d(1) - d(1/2)| = 10 > 5 % x 30 + 0.01, so the steps disagree (the stated tolerance).
    expect(r.rows[1]).toMatchObject({ blockFuelPerPercent_kg: -40, halfStep_kg: -30, baselineBlockFuel_kg: 4000, converged: false });
    expect(r.rows[1]!.note).toMatch(/disagree/);
  });

  it('on the demo: both Raymer conventions and the deck\'s sensitivity columns save fuel, fuel held more than fuel scaled; the cycle row says why it is absent', () => {
    const { project, deck } = demoProject();
    const short = { ...project, mission: { ...project.mission, solve: { mode: 'payloadRange' as const, payload: 700, range: 800 * 1852 } } };
    const r = expectOk(recoveryTradeByMethod(recoveryMethodVariants(short, deck)), 'demo');
    const [held, scaled, sens, cycle] = r.rows;
    expect(held!.blockFuelPerPercent_kg!).toBeLessThan(0);
    expect(scaled!.blockFuelPerPercent_kg!).toBeLessThan(0);
    expect(held!.blockFuelPerPercent_kg!).toBeLessThan(scaled!.blockFuelPerPercent_kg!);
    // The demo deck is generated from its cycle and carries the sensitivity columns (fixtures/demo/NOTE.md).
    expect(sens!.blockFuelPerPercent_kg!).toBeLessThan(0);
    expect(cycle!.note).toMatch(/not a cycle/);
  }, 120_000);
});
