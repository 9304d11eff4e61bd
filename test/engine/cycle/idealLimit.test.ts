import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { expectOk } from '../../../engine/core/result';
import { designEngine, runCyclePoint, type CycleSpec, type CycleState } from '../../../engine/cycle/index';
import { expectClose } from '../../support/assertInDelta';
import { designedCycle, ft, IDEAL_CYCLE } from './cycleFixtures';

// Mattingly, Elements of Propulsion, parametric cycle analysis of ideal engines (ideal turbofan,
// separate exhausts), evaluated by numpy in test/reference/cycleIdealReference.py for the fixture.
const REF = JSON.parse(readFileSync(new URL('../../reference/cycleIdealReference.json', import.meta.url), 'utf8')) as Record<string, number>;
const SOURCE = 'Mattingly ideal turbofan closed form, test/reference/cycleIdealReference.py';
const TIGHT = { rel: 1e-9 };

function jetPower(s: CycleState): number {
  return 0.5 * s.turbineFlow_kg_s * s.coreNozzle.exitVelocity_m_s ** 2 + 0.5 * s.bypassFlow_kg_s * s.bypassNozzle.exitVelocity_m_s ** 2 - 0.5 * s.totalFlow_kg_s * s.free.velocity_m_s ** 2;
}

describe('designEngine in the ideal limit (fixtures/cycle/ideal-turbofan.cycle.json)', () => {
  const engine = designedCycle(IDEAL_CYCLE);
  const s = engine.design;

  it('takes the ambient temperature of the 1976 standard atmosphere at 35,000 ft', () => {
    expectClose(s.free.t0_K, REF.t0_K!, TIGHT, 'U.S. Standard Atmosphere 1976 troposphere');
    expectClose(s.free.speedOfSound_m_s, REF.a0_m_s!, TIGHT, SOURCE);
  });

  it('gives the closed-form exit velocities, specific thrust and thrust to 1e-9', () => {
    expectClose(s.coreNozzle.exitVelocity_m_s, REF.coreExitVelocity_m_s!, TIGHT, SOURCE);
    expectClose(s.bypassNozzle.exitVelocity_m_s, REF.bypassExitVelocity_m_s!, TIGHT, SOURCE);
    expectClose(engine.summary.specificThrust_N_s_kg, REF.specificThrust_N_s_kg!, TIGHT, SOURCE);
    expectClose(engine.summary.thrust_N, REF.thrust_N!, TIGHT, SOURCE);
    expectClose(engine.summary.airflow_kg_s, 100, { rel: 1e-15 }, 'fixture: total airflow 100 kg/s');
  });

  it('gives the closed-form fuel/air ratio, fuel flow and TSFC to 1e-9', () => {
    expectClose(s.fuelAirRatio, REF.fuelAirRatio!, TIGHT, SOURCE);
    expectClose(engine.summary.fuelFlow_kg_s, REF.fuelFlow_kg_s!, TIGHT, SOURCE);
    expectClose(engine.summary.tsfc_kg_N_s, REF.tsfc_kg_N_s!, TIGHT, SOURCE);
  });

  it('gives the closed-form thermal, propulsive and overall efficiencies to 1e-9', () => {
    const fuelPower = s.fuelFlow_kg_s * engine.spec.fuel.heatingValue_J_kg;
    const thermal = jetPower(s) / fuelPower;
    const propulsive = (s.thrust_N * s.free.velocity_m_s) / jetPower(s);
    expectClose(thermal, REF.thermalEfficiency!, TIGHT, SOURCE);
    expectClose(propulsive, REF.propulsiveEfficiency!, TIGHT, SOURCE);
    expectClose(thermal * propulsive, REF.overallEfficiency!, TIGHT, SOURCE);
  });

  it('expands both nozzles fully to ambient pressure (no pressure thrust)', () => {
    expectClose(s.coreNozzle.exitStaticPressure_Pa, s.free.p0_Pa, { rel: 1e-15 }, 'fully expanded nozzle: p9 = p0 (fixture)');
    expectClose(s.bypassNozzle.exitStaticPressure_Pa, s.free.p0_Pa, { rel: 1e-15 }, 'fully expanded nozzle: p19 = p0 (fixture)');
  });

  it('carrying the fuel mass through the core raises thrust and lowers the fuel/air ratio (the textbook form neglects it)', () => {
    const spec = { ...engine.spec, fuel: { ...engine.spec.fuel, massInCore: true } };
    const withFuel = designedCycleFromSpec(spec);
    // Mattingly's real-cycle burner balance: f = (tau_lambda - tau_r tau_c) / (h/(cp T0) - tau_lambda), the same closed form with the fuel's enthalpy counted.
    const tauLambda = 1600 / REF.t0_K!;
    const tauRC = s.tt3_K / REF.t0_K!;
    const fReal = (tauLambda - tauRC) / (42.8e6 / (1004.5 * REF.t0_K!) - tauLambda);
    expectClose(withFuel.design.fuelAirRatio, fReal, TIGHT, 'Mattingly, parametric cycle analysis of real engines, burner energy balance');
    expect(withFuel.summary.thrust_N).toBeGreaterThan(engine.summary.thrust_N);
  });
});

function designedCycleFromSpec(spec: CycleSpec) {
  return expectOk(designEngine(spec), 'spec');
}

describe('runCyclePoint at the design condition and design throttle (ideal fixture)', () => {
  const engine = designedCycle(IDEAL_CYCLE);
  const at = { altitude_m: ft(35000), mach: 0.8, isaDeviation_K: 0 };

  it('reproduces the design point to 1e-8 at the design turbine inlet temperature', () => {
    const p = runCyclePoint(engine, { ...at, throttle: { kind: 'turbineInletTemperature', value_K: 1600 } });
    expect(p.status).toBe('converged');
    expectClose(p.thrust_N!, engine.summary.thrust_N, { rel: 1e-8 }, 'design point (designEngine)');
    expectClose(p.fuelFlow_kg_s!, engine.summary.fuelFlow_kg_s, { rel: 1e-8 }, 'design point');
    expectClose(p.airflow_kg_s!, 100, { rel: 1e-8 }, 'design point');
    expectClose(p.fanSpeed!, 1, { rel: 1e-8 }, 'design point: N1 = 1 by definition');
    expectClose(p.fanCorrectedSpeed!, 1, { rel: 1e-8 }, 'design point');
    expectClose(p.bypassRatio!, 6, { rel: 1e-8 }, 'fixture');
    expectClose(p.fanPressureRatio!, 1.6, { rel: 1e-8 }, 'fixture');
    expectClose(p.overallPressureRatio!, 30, { rel: 1e-8 }, 'fixture');
  });

  it('reproduces the design point from a fan-speed throttle of 1 and from the rating held at 1,600 K', () => {
    const n1 = runCyclePoint(engine, { ...at, throttle: { kind: 'fanSpeed', fraction: 1 } });
    expect(n1.status).toBe('converged');
    expectClose(n1.turbineInletTemperature_K!, 1600, { rel: 1e-8 }, 'design point');
    expectClose(n1.thrust_N!, engine.summary.thrust_N, { rel: 1e-8 }, 'design point');
    const rated = runCyclePoint(engine, { ...at, throttle: { kind: 'rating', rating: 'maxCruise' } });
    expect(rated.status).toBe('converged');
    expect(rated.activeLimit).toBe('turbineInletTemperature');
    expectClose(rated.thrust_N!, engine.summary.thrust_N, { rel: 1e-8 }, 'design point');
  });
});
