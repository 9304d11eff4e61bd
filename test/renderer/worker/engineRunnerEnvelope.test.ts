import { beforeAll, describe, expect, it } from 'vitest';
import { flightEnvelope, thrustDragCrossover } from '../../../engine/analysis';
import type { MissionInput } from '../../../engine/mission';
import { createDeckCache, envelopeQueryFor, runEngineRequest } from '../../../renderer/worker/engineRunner';
import type { EngineReplies, EnvelopeRequestQuery, StudyInputs } from '../../../renderer/worker/engineProtocol';
import { demoStudy } from '../support/demoStudy';

const FT = 0.3048;

let demo: StudyInputs;
let input: MissionInput;
beforeAll(() => {
  ({ demo, input } = demoStudy());
});

function query(over: Partial<EnvelopeRequestQuery> = {}): EnvelopeRequestQuery {
  return { mass_kg: 0.9 * demo.project.airframe.weights.maxTakeoff, rating: 'maxClimb', isaDev_K: 0, top_m: 50000 * FT, step_m: 2000 * FT, ...over };
}

describe('runEngineRequest envelope', () => {
  it('returns what flightEnvelope (the CLI envelope verb) gives on the same input', () => {
    const q = query();
    const r = runEngineRequest({ kind: 'envelope', ...demo, query: q }, createDeckCache());
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    const direct = flightEnvelope({ aero: input.aero, propulsion: input.propulsion }, envelopeQueryFor(input, q));
    if (!direct.ok) throw new Error(direct.error.message);
    expect(r.value).toEqual(direct.value);
    // The query is the CLI's: project VMO/MMO, buffet-margin load factor, rows 0..top.
    const v = r.value as EngineReplies['envelope'];
    expect(v.buffetLoadFactor).toBe(input.cautionSettings.minBuffetLoadFactor);
    expect(v.rows[0]!.altitude_m).toBe(0);
    expect(v.rows.at(-1)!.altitude_m).toBeCloseTo(q.top_m, 9);
  });

  it('puts the service ceiling where the greatest steady climb rate is 100 ft/min', () => {
    const r = runEngineRequest({ kind: 'envelope', ...demo, query: query() }, createDeckCache());
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    const v = r.value as EngineReplies['envelope'];
    const service = v.ceilings.find((c) => c.name === 'service')!;
    // Service ceiling: the altitude where the best rate of climb is 100 ft/min (14 CFR 1.1 usage and
    // common practice; from memory). Checked independently: the greatest Ps = (T - D) V / W over Mach,
    // from the crossover scan, is above 100 ft/min 30 m below and below it 30 m above.
    expect(service.altitude_m).not.toBeNull();
    const h = service.altitude_m!;
    const maxPs = (alt: number) => {
      const c = thrustDragCrossover({ aero: input.aero, propulsion: input.propulsion }, { altitude_m: alt, mass_kg: query().mass_kg, rating: 'maxClimb', isaDev_K: 0, speedLimits: { vmo_m_s: input.airframe.vmo_m_s, mmo: input.airframe.mmo } });
      if (!c.ok || c.value.maxSpecificExcessPower_m_s === null) throw new Error('no climb rate');
      return c.value.maxSpecificExcessPower_m_s;
    };
    const rate = (100 * FT) / 60;
    expect(service.climbRate_m_s).toBeCloseTo(rate, 12);
    expect(maxPs(h - 30)).toBeGreaterThan(rate);
    expect(maxPs(h + 30)).toBeLessThan(rate);
    expect(Math.abs(service.climbRateAtCeiling_m_s! - rate)).toBeLessThan(0.01 * rate + 1e-4);
    // Ordering by definition: absolute (0 ft/min) above service (100) above cruise (300).
    const alt = (n: string) => v.ceilings.find((c) => c.name === n)!.altitude_m!;
    expect(alt('absolute')).toBeGreaterThan(alt('service'));
    expect(alt('service')).toBeGreaterThan(alt('cruise'));
  });

  it('refuses a mass above MTOW with a message saying where and what', () => {
    const r = runEngineRequest({ kind: 'envelope', ...demo, query: query({ mass_kg: 1.5 * demo.project.airframe.weights.maxTakeoff }) }, createDeckCache());
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.kind).toBe('analysis');
    expect(JSON.stringify(r.error)).toMatch(/envelope: aircraft mass .* at most the MTOW/);
    expect(JSON.stringify(r.error)).not.toMatch(/NaN/);
  });
});
