import { beforeAll, describe, expect, it } from 'vitest';
import { thrustDragCrossover } from '../../../engine/analysis';
import type { MissionInput } from '../../../engine/mission';
import { createDeckCache, runEngineRequest } from '../../../renderer/worker/engineRunner';
import type { EngineReplies, StudyInputs } from '../../../renderer/worker/engineProtocol';
import { demoStudy } from '../support/demoStudy';

const FT = 0.3048;

let demo: StudyInputs;
let input: MissionInput;
beforeAll(() => {
  ({ demo, input } = demoStudy());
});

describe('runEngineRequest crossover limits', () => {
  it('returns what thrustDragCrossover gives with the project VMO/MMO, as the CLI crossover verb passes them', () => {
    const q = { altitude_m: 35000 * FT, mass_kg: 0.85 * demo.project.airframe.weights.maxTakeoff, rating: 'maxCruise' as const, isaDev_K: 0 };
    const r = runEngineRequest({ kind: 'crossover', ...demo, query: { ...q, allInlets: false } }, createDeckCache());
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    const direct = thrustDragCrossover({ aero: input.aero, propulsion: input.propulsion }, { ...q, speedLimits: { vmo_m_s: input.airframe.vmo_m_s, mmo: input.airframe.mmo } });
    if (!direct.ok) throw new Error(direct.error.message);
    const set = r.value as EngineReplies['crossover'];
    expect(set.curves[0]!.result).toEqual(direct.value);
    // The speed limit is the lower of MMO and the Mach of VMO, so never above MMO (definition).
    expect(set.curves[0]!.result.speedLimitMach).not.toBeNull();
    expect(set.curves[0]!.result.speedLimitMach!).toBeLessThanOrEqual(input.airframe.mmo);
  });
});
