/**
 * Property over the EXTREME ranges the project schema accepts (not only the
 * plausible ones): masses up to 1,000 t, leg times up to 48 h, winds of
 * 150 m/s either way, ISA deviations of 80 K, airspeeds up to 400 m/s,
 * altitudes -2,000 ft to 65,000 ft, alternates up to 40,075 km. Every such
 * project that parses is flown; it must end with a result or a status and a
 * sentence: never a throw, never NaN, never negative fuel or mass, never
 * 'internal_error', never an impossible flight called 'ok'.
 */
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { solveMission } from '../../engine/mission/solveMission';
import { buildMissionInput } from '../../engine/project/buildMissionInput';
import { parseProject } from '../../engine/project/parseProject';
import { parseDeckCsv } from '../../engine/propulsion/deckCsv';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const demoText = readFileSync(`${repoRoot}fixtures/demo/demo.blockwise.json`, 'utf8');
const deckResult = parseDeckCsv(readFileSync(`${repoRoot}fixtures/demo/demo-engine.deck.csv`, 'utf8'), 'demo-engine.deck.csv');
if (!deckResult.ok) throw new Error('the demo deck does not parse');
const deck = deckResult.value;

/** A value anywhere in [min, max], with the ends themselves drawn often (the extremes are the point). */
const within = (min: number, max: number) =>
  fc.oneof(
    { weight: 2, arbitrary: fc.constantFrom(min, max) },
    { weight: 3, arbitrary: fc.double({ min, max, noNaN: true, noDefaultInfinity: true }).map((v) => (Math.abs(v) < 2.2250738585072014e-308 ? 0 : v)) },
  );

const extremes = fc.record({
  oew_kg: within(2000, 9000),
  mtow_kg: within(16000, 1e6),
  maxFuel_kg: within(1, 1e6),
  mlw_kg: within(10000, 1e6),
  taxi_s: within(0, 48 * 3600),
  takeoff_s: within(0, 48 * 3600),
  hold_s: fc.option(within(0, 48 * 3600), { nil: null }),
  wind_m_s: within(-150, 150),
  isaDev_K: within(-80, 80),
  lowCas_m_s: within(1, 400),
  cruise_ft: within(-2000, 65000),
  alternate_m: within(1, 4.0075e7),
  finalReserve_s: within(0, 48 * 3600),
  solve: fc.oneof(
    fc.record({ mode: fc.constant('payloadRange'), payload: within(0, 5000), range: within(1000, 2_000_000) }),
    fc.record({ mode: fc.constant('maxRange'), payload: within(0, 5000) }),
    fc.record({ mode: fc.constant('takeoffWeight'), payload: within(0, 5000), takeoffWeight: within(1, 1e6) }),
  ),
});

type Extremes = typeof extremes extends fc.Arbitrary<infer T> ? T : never;
type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

function projectText(x: Extremes): string {
  const doc = JSON.parse(demoText) as Json;
  doc.engine.deck.path = `${repoRoot}fixtures/demo/demo-engine.deck.csv`;
  delete doc.uncertainty;
  const w = doc.airframe.weights;
  w.operatingEmpty = x.oew_kg;
  w.maxZeroFuel = x.oew_kg + 6000;
  w.maxTakeoff = Math.max(x.mtow_kg, x.oew_kg + 6000);
  w.maxLanding = Math.min(x.mlw_kg, w.maxTakeoff);
  w.maxFuel = x.maxFuel_kg;
  const legs = doc.mission.legs as Json[];
  legs[0].time = x.taxi_s;
  legs[1] = { kind: 'takeoff', name: 'Takeoff', time: x.takeoff_s };
  legs[2].schedule.lowCas = x.lowCas_m_s;
  legs[2].toAltitude = x.cruise_ft > 1920 ? `${x.cruise_ft} ft` : '2500 ft';
  legs[3].altitude = legs[2].toAltitude;
  legs[3].profile = { kind: 'constantAltitude' };
  if (x.hold_s !== null) legs.splice(5, 0, { kind: 'hold', name: 'Hold', altitude: '1920 ft', time: x.hold_s });
  doc.mission.wind = x.wind_m_s;
  doc.mission.isaDeviation = x.isaDev_K;
  doc.mission.reserves.alternate.distance = x.alternate_m;
  doc.mission.reserves.finalReserveTime = x.finalReserve_s;
  doc.mission.solve = x.solve;
  return JSON.stringify(doc);
}

function nonFinite(value: unknown, path: string, out: string[]): void {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) out.push(`${path} = ${value}`);
  } else if (value instanceof Float64Array || value instanceof Int32Array) {
    for (let i = 0; i < value.length; i++) if (!Number.isFinite(value[i]!)) out.push(`${path}[${i}]`);
  } else if (Array.isArray(value)) value.forEach((v, i) => nonFinite(v, `${path}[${i}]`, out));
  else if (value !== null && typeof value === 'object') for (const [k, v] of Object.entries(value)) nonFinite(v, `${path}.${k}`, out);
}

describe('projects at the extremes the schema accepts', () => {
  it('solveMission ends every one with a result or a status and a sentence: no throw, NaN, negative fuel or impossible ok', () => {
    let flown = 0;
    let notOk = 0;
    fc.assert(
      fc.property(extremes, (x) => {
        const parsed = parseProject(projectText(x), 'extreme.blockwise.json');
        if (!parsed.ok) {
          for (const issue of parsed.error) expect(issue.message).toMatch(/\S/);
          return;
        }
        const built = buildMissionInput(parsed.value, { deck });
        if (!built.ok) return;
        const input = built.value;
        const r = solveMission(input);
        flown++;
        expect(r.status).not.toBe('internal_error');
        const bad: string[] = [];
        nonFinite(r, 'result', bad);
        expect(bad.slice(0, 5)).toEqual([]);
        for (const row of r.legs) expect(row.endMass_kg, row.name).toBeGreaterThanOrEqual(r.zeroFuelMass_kg - 1e-6);
        if (r.status !== 'ok') {
          notOk++;
          expect(r.statusMessage).toMatch(/\S/);
          return;
        }
        // 'ok' only for a possible flight (the hard limits and the ground are the solver's own statuses otherwise).
        const a = input.airframe;
        expect(r.groundDistance_m).toBeGreaterThan(0);
        expect(r.takeoffMass_kg).toBeLessThanOrEqual(a.mtow_kg * (1 + 1e-6));
        expect(r.rampMass_kg - r.zeroFuelMass_kg).toBeLessThanOrEqual(a.maxFuel_kg * (1 + 1e-6));
        expect(r.landingMass_kg).toBeLessThanOrEqual(a.mlw_kg * (1 + 1e-6));
        expect(r.landingMass_kg).toBeGreaterThanOrEqual(r.zeroFuelMass_kg - 1e-6);
      }),
      { numRuns: 80, seed: 12_2026_12 },
    );
    // Not vacuous: most extreme projects are flown, and many end with a status other than ok.
    expect(flown).toBeGreaterThan(40);
    expect(notOk).toBeGreaterThan(10);
  }, 300_000);
});
