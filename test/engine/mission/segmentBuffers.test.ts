import { describe, expect, it } from 'vitest';
import { evaluateMission } from '../../../engine/mission/fuelIteration';
import type { MissionContext } from '../../../engine/mission/missionContext';
import { newSegmentBuffers, type SegmentBuffers } from '../../../engine/mission/segmentBuffers';
import { solveMission } from '../../../engine/mission/solveMission';
import { createFlightLog } from '../../../engine/mission/timeHistoryBuilder';
import { demoMissionInput } from './support/demoProject';

describe('segmentBuffers', () => {
  it('segments sharing one set of buffers fly the demo trip and reserves exactly as segments with buffers of their own', () => {
    // The reference is the contract's other end: a context without `buffers`, where every segment writes into records
    // of its own (segmentBuffers.ts). One shared set must give the same flight, point for point (time history,
    // cautions, legs, reserves), since each segment writes every entry it hands on.
    const input = demoMissionInput();
    const r = solveMission(input);
    const cruise = r.legs.find((l) => l.kind === 'cruise');
    expect(cruise).toBeDefined();
    const distance = cruise!.endGroundDistance_m - cruise!.startGroundDistance_m;
    const context = (buffers: SegmentBuffers | null): MissionContext => ({
      input,
      options: { stepScale: 1, allowNegativeFuel: false },
      zeroFuelMass_kg: r.zeroFuelMass_kg,
      log: createFlightLog(input.airframe, input.cautionSettings),
      ...(buffers === null ? {} : { buffers }),
    });
    const own = evaluateMission(context(null), r.rampMass_kg, distance);
    const shared = evaluateMission(context(newSegmentBuffers()), r.rampMass_kg, distance);
    expect(own.log.legIndex.length).toBeGreaterThan(40);
    expect(shared).toStrictEqual(own);
  });
});
