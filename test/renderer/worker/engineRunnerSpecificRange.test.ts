import { beforeAll, describe, expect, it } from 'vitest';
import { optimumAltitude, specificRange } from '../../../engine/analysis';
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

function run(mass_kg: number, altitudes_m: readonly number[]) {
  return runEngineRequest({ kind: 'specificRange', ...demo, query: { mass_kg, isaDev_K: 0, altitudes_m } }, createDeckCache());
}

describe('runEngineRequest specificRange', () => {
  it('returns what specificRange and optimumAltitude (the CLI range-speeds verb) give on the same input', () => {
    const mass_kg = 0.85 * demo.project.airframe.weights.maxTakeoff;
    const altitudes = [29000 * FT, 35000 * FT];
    const r = run(mass_kg, altitudes);
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    const v = r.value as EngineReplies['specificRange'];
    const models = { aero: input.aero, propulsion: input.propulsion };
    altitudes.forEach((altitude_m, i) => {
      const direct = specificRange(models, { altitude_m, mass_kg, isaDev_K: 0, cautionSettings: input.cautionSettings, mmo: input.airframe.mmo });
      const got = v.curves[i]!;
      expect(got.altitude_m).toBe(altitude_m);
      if (direct.ok) expect(got).toEqual({ altitude_m, ok: true, result: direct.value });
      else expect(got).toEqual({ altitude_m, ok: false, code: direct.error.code, message: direct.error.message });
    });
    const opt = optimumAltitude(models, { mass_kg, isaDev_K: 0, mmo: input.airframe.mmo, cautionSettings: input.cautionSettings });
    expect(v.optimum).toEqual(opt.ok ? opt.value : null);
  });

  it('marks the maximum of each curve and the long-range Mach at 99 % of it on the fast side', () => {
    const r = run(0.85 * demo.project.airframe.weights.maxTakeoff, [31000 * FT, 35000 * FT]);
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    const v = r.value as EngineReplies['specificRange'];
    let checked = 0;
    for (const c of v.curves) {
      if (!c.ok) continue;
      const { mach, specificRange_m_kg } = c.result.curves;
      const srs = specificRange_m_kg.flatMap((x, j) => (x === null ? [] : [{ m: mach[j]!, sr: x }]));
      // Definition (closed form): the maximum-range Mach maximises SR = V / fuel flow; no sampled point exceeds it
      // (relative 1e-9 for the refinement) and the sampled maximum is within one sample step of it.
      const best = srs.reduce((a, b) => (b.sr > a.sr ? b : a));
      expect(best.sr).toBeLessThanOrEqual(c.result.maxSpecificRange_m_kg * (1 + 1e-9));
      const step = (mach.at(-1)! - mach[0]!) / (mach.length - 1);
      expect(Math.abs(best.m - c.result.maxRangeMach)).toBeLessThanOrEqual(step + 1e-9);
      // Long-range cruise: the faster Mach where SR = 0.99 x the maximum (common practice).
      if (c.result.longRangeMach !== null) {
        expect(c.result.longRangeMach).toBeGreaterThan(c.result.maxRangeMach);
        expect(c.result.longRangeSpecificRange_m_kg! / c.result.maxSpecificRange_m_kg).toBeCloseTo(0.99, 6);
        // Every sampled point faster than the long-range Mach has SR below 99 % of the maximum.
        for (const p of srs) if (p.m > c.result.longRangeMach + 1e-6) expect(p.sr).toBeLessThan(0.99 * c.result.maxSpecificRange_m_kg * (1 + 1e-9));
      }
      checked++;
    }
    expect(checked).toBeGreaterThan(0);
  });

  it('refuses a mass above MTOW with a message saying where and what', () => {
    const r = run(1.5 * demo.project.airframe.weights.maxTakeoff, [35000 * FT]);
    expect(r.ok).toBe(false);
    expect(JSON.stringify(r.ok ? null : r.error)).toMatch(/specific range: aircraft mass .* at most the MTOW/);
    expect(JSON.stringify(r.ok ? null : r.error)).not.toMatch(/NaN/);
  });
});
