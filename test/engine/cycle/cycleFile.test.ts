import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCycleFile } from '../../../engine/cycle/cycleFile';
import { expectClose } from '../../support/assertInDelta';
import { DEMO_CYCLE, IDEAL_CYCLE } from './cycleFixtures';

const idealText = readFileSync(new URL(`../../../${IDEAL_CYCLE}`, import.meta.url), 'utf8');

/** The ideal fixture's text with fields set (dotted paths; undefined deletes). */
function withChange(...edits: readonly [string, unknown][]): string {
  const doc = JSON.parse(idealText) as Record<string, unknown>;
  for (const [path, value] of edits) {
    const keys = path.split('.');
    let node = doc;
    for (const k of keys.slice(0, -1)) node = node[k] as Record<string, unknown>;
    if (value === undefined) delete node[keys[keys.length - 1]!];
    else node[keys[keys.length - 1]!] = value;
  }
  return JSON.stringify(doc);
}

function issues(text: string) {
  const r = parseCycleFile(text, 'test.cycle.json');
  expect(r.ok).toBe(false);
  return r.ok ? [] : r.error;
}

describe('parseCycleFile', () => {
  it('reads the ideal fixture into SI (NIST SP 811: ft = 0.3048 m; MJ = 1e6 J)', () => {
    const r = parseCycleFile(idealText, IDEAL_CYCLE);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const s = r.value;
    expectClose(s.design.altitude_m, 10668, { rel: 1e-15 }, '35,000 ft x 0.3048 m/ft');
    expect(s.design.mach).toBe(0.8);
    expect(s.design.bypassRatio).toBe(6);
    expect(s.design.fanPressureRatio).toBe(1.6);
    expect(s.design.overallPressureRatio).toBe(30);
    expect(s.design.turbineInletTemperature_K).toBe(1600);
    expect(s.design.size).toEqual({ kind: 'airflow', airflow_kg_s: 100 });
    expect(s.gas.cold).toEqual({ cp_J_kgK: 1004.5, gamma: 1.4 });
    expectClose(s.fuel.heatingValue_J_kg, 42.8e6, { rel: 1e-15 }, '42.8 MJ/kg');
    expect(s.fuel.massInCore).toBe(false);
    expect(s.nozzles).toEqual({ core: 'fullyExpanded', bypass: 'fullyExpanded' });
    expect(s.ratings.maxCruise).toEqual({ kind: 'limits', limits: { turbineInletTemperature: 1600 } });
  });

  it('reads the demo fixture with its thrust size, limits and a set-point idle', () => {
    const r = parseCycleFile(readFileSync(new URL(`../../../${DEMO_CYCLE}`, import.meta.url), 'utf8'), DEMO_CYCLE);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.design.size).toEqual({ kind: 'thrust', thrust_N: 36000 });
    expect(r.value.ratings.flightIdle).toEqual({ kind: 'fanCorrectedSpeed', fraction: 0.5 });
    expect(r.value.limits.fanSpeed).toBe(1.06);
  });

  it('reads a limit schedule by ambient temperature in its own units', () => {
    const text = withChange(['ratings.maxCruise.limits.fanCorrectedSpeed', { byAmbientTemperature: [['-40 degC', 1.02], ['30 degC', '100 %']] }]);
    const r = parseCycleFile(text, 'x');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const rating = r.value.ratings.maxCruise!;
    const schedule = rating.kind === 'limits' ? rating.limits.fanCorrectedSpeed : undefined;
    if (schedule === undefined || typeof schedule === 'number') throw new Error('expected a schedule');
    const [[t0, v0], [t1, v1]] = schedule.byAmbientTemperature as [[number, number], [number, number]];
    expectClose(t0, 233.15, { abs: 1e-12 }, '-40 degC = 233.15 K (NIST SP 811)');
    expectClose(t1, 303.15, { abs: 1e-12 }, '30 degC = 303.15 K');
    expect([v0, v1]).toEqual([1.02, 1]);
  });

  it('names the path, the value and what was expected for a wrong unit, a value out of range and an unknown field', () => {
    const found = issues(
      withChange(['design.turbineInletTemperature', '1600 kg'], ['components.fanPolytropicEfficiency', 1.2], ['ratings.cruise', { fanSpeed: 0.5 }]),
    );
    const messages = found.map((i) => i.message);
    expect(messages.some((m) => /^design\.turbineInletTemperature: .*kg.*temperature/.test(m))).toBe(true);
    expect(messages.some((m) => /^components\.fanPolytropicEfficiency: 1\.2 is out of range: expected between 0\.3 and 1/.test(m))).toBe(true);
    expect(messages.some((m) => /^ratings\.cruise: unknown field "cruise".*docs\/cycle-format\.md/.test(m))).toBe(true);
  });

  it('refuses a missing field, NaN-like text, an unknown nozzle type and an overall ratio below the fan ratio', () => {
    expect(issues(withChange(['design.mach', undefined]))[0]!.path).toBe('design.mach');
    expect(issues(withChange(['design.bypassRatio', 'Infinity']))[0]!.path).toBe('design.bypassRatio');
    expect(issues(withChange(['nozzles.core', 'plug']))[0]!.path).toBe('nozzles.core');
    const cross = issues(withChange(['design.overallPressureRatio', 1.2]));
    expect(cross[0]!.path).toBe('design.overallPressureRatio');
    expect(cross[0]!.message).toMatch(/below the fan pressure ratio/);
  });

  it('locates a JSON syntax error by line and column, and refuses an empty file', () => {
    const broken = issues('{\n  "format": "blockwise-cycle",\n  "version": 1,,\n}');
    expect(broken[0]!.path).toBe('(line 3, column 16)');
    expect(issues('  ')[0]!.message).toMatch(/empty/);
  });
});
