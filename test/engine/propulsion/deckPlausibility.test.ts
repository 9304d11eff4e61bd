import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';

// Ranges: TSFC 0.2-3 lb/(lbf h), thrust per airflow 20-1,500 N s/kg (common practice; Mattingly, Aircraft Engine
// Design, ch. 2), fuel-air ratio at most 0.068 (stoichiometric for kerosene; Walsh & Fletcher, ch. 3).
const demo = readFileSync(fileURLToPath(new URL('../../../fixtures/demo/demo-engine.deck.csv', import.meta.url)), 'utf8');
const warningsOf = (text: string) => expectOk(parseDeckCsv(text, 'deck.csv'), 'deck').warnings ?? [];

describe('deckPlausibility', () => {
  it('the demo deck (a parametric turbofan from Mattingly\'s models) raises no warning', () => {
    expect(warningsOf(demo)).toEqual([]);
  });

  it('fuel_flow[kg/min] written for lb/h: TSFC 132 times too large, the slip named, with the line', () => {
    const w = warningsOf(demo.replace('fuel_flow[lb/h]', 'fuel_flow[kg/min]'));
    const tsfc = w.find((x) => x.code === 'implausible_tsfc');
    expect(tsfc?.line).toBeGreaterThan(0);
    expect(tsfc?.message).toMatch(/^line \d+: TSFC \d+(\.\d+)? lb\/\(lbf h\) at full power, outside 0\.2 to 3/);
    expect(tsfc?.message).toContain('fuel_flow in kg/min where lb/h was meant');
  });

  it('thrust[kN] written for lbf: TSFC and thrust per airflow both out, the slip named', () => {
    const w = warningsOf(demo.replace('thrust[lbf]', 'thrust[kN]'));
    expect(w.map((x) => x.code)).toEqual(['implausible_tsfc', 'implausible_specific_thrust']);
    for (const x of w) expect(x.message).toContain('thrust in kN where lbf was meant');
  });

  it('altitude[in] written for ft: the highest altitude about 1.3 km, the slip named', () => {
    const w = warningsOf(demo.replace('altitude[ft]', 'altitude[in]'));
    expect(w.map((x) => x.code)).toEqual(['implausible_altitude_range']);
    expect(w[0]!.message).toContain('altitude in in where ft was meant');
  });

  it('airflow and fuel_flow names swapped: the fuel-air ratio is flagged', () => {
    const w = warningsOf(demo.replace('fuel_flow[lb/h],airflow[lb/s]', 'airflow[lb/h],fuel_flow[lb/s]'));
    expect(w.map((x) => x.code)).toContain('implausible_fuel_air_ratio');
  });
});
