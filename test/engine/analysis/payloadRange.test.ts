import { describe, expect, it } from 'vitest';
import { payloadRangeDiagram } from '../../../engine/analysis/payloadRange';
import { expectOk } from '../../../engine/core/result';
import { expectClose } from '../../support/assertInDelta';
import { FINAL_RESERVE_KG, TAXI_FUEL_KG, makeBreguetSolver, type BreguetCounter } from './breguetSolver';
import { testMissionInput } from './testMission';

describe('payloadRangeDiagram', () => {
  it('payloadRangeDiagram corners sit on MTOW and the fuel capacity, and agree with missions flown directly', () => {
    const solve = makeBreguetSolver();
    const input = testMissionInput();
    const r = expectOk(payloadRangeDiagram(input, { solve }), 'payload-range');
    const af = input.airframe;
    expectClose(r.maxPayload.payload_kg, af.mzfw_kg - af.oew_kg, { abs: 1e-9 }, 'max payload = MZFW - OEW (definition)');
    expectClose(r.maxPayload.takeoffMass_kg, af.mtow_kg, { abs: 1e-6 }, 'corner A at MTOW');
    expect(r.mtowFullFuel).not.toBeNull();
    expectClose(r.mtowFullFuel!.takeoffMass_kg, af.mtow_kg, { abs: 1e-6 }, 'corner B at MTOW');
    expectClose(r.mtowFullFuel!.fuelOnBoard_kg, af.maxFuel_kg, { abs: 1e-6 }, 'corner B with full tanks');
    expectClose(r.ferry.payload_kg, 0, { abs: 1e-12 });
    expectClose(r.ferry.fuelOnBoard_kg, af.maxFuel_kg, { abs: 1e-6 }, 'ferry with full tanks');
    // Fly each corner's payload over its range in payload-and-range mode: the fuel must come back the same.
    for (const corner of [r.maxPayload, r.mtowFullFuel!, r.ferry]) {
      const direct = solve({ ...input, solve: { kind: 'payloadRange', payload_kg: corner.payload_kg, range_m: corner.range_m } });
      expectClose(direct.takeoffMass_kg, corner.takeoffMass_kg, { rel: 1e-9 }, 'mission flown directly');
      expectClose(direct.blockFuel_kg, corner.blockFuel_kg, { rel: 1e-8 }, 'mission flown directly');
    }
    // Ranges increase along the diagram; payload falls.
    for (let i = 1; i < r.points.length; i++) {
      expect(r.points[i]!.range_m).toBeGreaterThan(r.points[i - 1]!.range_m);
      expect(r.points[i]!.payload_kg).toBeLessThan(r.points[i - 1]!.payload_kg);
    }
    expect(r.points).toHaveLength(3 + 2 * 3);
    // Breguet with the fixed allowances of the stand-in solver: trip = (fuel - taxi - final) / 1.05
    expectClose(r.ferry.tripFuel_kg, (af.maxFuel_kg - TAXI_FUEL_KG - FINAL_RESERVE_KG) / 1.05, { rel: 1e-12 });
  });

  it('payloadRangeDiagram reports progress and stops when cancelled', () => {
    const counter: BreguetCounter = { calls: 0 };
    const seen: [number, number][] = [];
    const r = expectOk(
      payloadRangeDiagram(testMissionInput(), { solve: makeBreguetSolver(counter), pointsBetween: 2, onProgress: (d, t) => seen.push([d, t]) }),
      'payload-range',
    );
    expect(seen[seen.length - 1]).toEqual([7, 7]);
    expect(counter.calls).toBe(7);
    expect(r.missions).toBe(7);
    let polls = 0;
    const cancelled = payloadRangeDiagram(testMissionInput(), { solve: makeBreguetSolver(), shouldCancel: () => ++polls > 2 });
    expect(cancelled.ok ? 'ok' : cancelled.error.code).toBe('cancelled');
  });

  it('payloadRangeDiagram reports progress once per mission flown, with or without the MTOW-full-fuel corner', () => {
    // Without an MTOW-limited segment (MTOW raised so full tanks fit at maximum payload) the
    // MTOW-full-fuel corner is not flown: 2 + 2 * pointsBetween missions (the documented cost of
    // payloadRangeDiagram), each reported once, the last report saying (missions, missions).
    const input = testMissionInput();
    const roomy = { ...input, airframe: { ...input.airframe, mtow_kg: 80000 } };
    for (const pointsBetween of [0, 1, 2]) {
      const counter: BreguetCounter = { calls: 0 };
      const seen: [number, number][] = [];
      const r = expectOk(
        payloadRangeDiagram(roomy, { solve: makeBreguetSolver(counter), pointsBetween, onProgress: (d, t) => seen.push([d, t]) }),
        'payload-range',
      );
      const flown = 2 + 2 * pointsBetween;
      expect(r.mtowFullFuel).toBeNull();
      expect(counter.calls).toBe(flown);
      expect(r.missions).toBe(flown);
      expect(seen.map(([d]) => d)).toEqual(Array.from({ length: flown }, (_, i) => i + 1));
      // the first report still counts the corner that might exist; from the second on it is known
      expect(seen[0]).toEqual([1, flown + 1]);
      expect(seen[seen.length - 1]).toEqual([flown, flown]);
    }
    // With both corners every planned mission is flown and reported.
    const counter: BreguetCounter = { calls: 0 };
    const seen: [number, number][] = [];
    const r = expectOk(payloadRangeDiagram(input, { solve: makeBreguetSolver(counter), pointsBetween: 1, onProgress: (d, t) => seen.push([d, t]) }), 'payload-range');
    expect(r.mtowFullFuel).not.toBeNull();
    expect(seen).toEqual([1, 2, 3, 4, 5].map((d) => [d, 5]));
    expect(counter.calls).toBe(5);
    expect(r.missions).toBe(5);
  });

  it('payloadRangeDiagram without an MTOW-limited corner says so', () => {
    const input = testMissionInput();
    const roomy = { ...input, airframe: { ...input.airframe, mtow_kg: 80000 } };
    const r = expectOk(payloadRangeDiagram(roomy, { solve: makeBreguetSolver() }), 'payload-range');
    expect(r.mtowFullFuel).toBeNull();
    expect(r.note).toMatch(/Full tanks fit under MTOW/);
    const bad = payloadRangeDiagram({ ...input, airframe: { ...input.airframe, mzfw_kg: 30000 } }, { solve: makeBreguetSolver() });
    expect(bad.ok ? '' : bad.error.message).toMatch(/MZFW 30000 kg is not above OEW 38000 kg/);
  });
});
