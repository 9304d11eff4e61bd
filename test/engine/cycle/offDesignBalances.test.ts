import { describe, expect, it } from 'vitest';
import { runCyclePoint, type CyclePointResult, type CycleThrottle } from '../../../engine/cycle/index';
import { expectClose } from '../../support/assertInDelta';
import { designedCycle, DEMO_CYCLE, ft } from './cycleFixtures';

// Conservation of mass and of energy (first law for a steady open system, e.g. Mattingly,
// Elements of Propulsion, the steady-flow energy equation) checked from the station table
// and the reported flows, independently of how the solver reached the point.
const engine = designedCycle(DEMO_CYCLE);
const cold = engine.spec.gas.cold.cp_J_kgK;
const hot = engine.spec.gas.hot.cp_J_kgK;
const k = engine.spec.components;

function row(p: CyclePointResult, station: string) {
  const r = p.stations.find((s) => s.station === station);
  if (!r) throw new Error(`no station ${station}`);
  return r;
}

function checkBalances(p: CyclePointResult, label: string): void {
  expect(p.status, label).toBe('converged');
  const s = p.state!;
  const m0 = row(p, '0').massFlow_kg_s;
  const m9 = row(p, '9').massFlow_kg_s;
  const m19 = row(p, '19').massFlow_kg_s;
  const bleed = row(p, '3').massFlow_kg_s - row(p, '31').massFlow_kg_s;
  const fuel = p.fuelFlow_kg_s!;
  // mass: air in + fuel = core jet + bypass jet + bleed (fuel mass carried in the demo file)
  expectClose(m9 + m19 + bleed, m0 + fuel, { rel: 1e-12 }, `${label}: mass balance`);
  expectClose(bleed, p.bleedFraction * row(p, '25').massFlow_kg_s, { rel: 1e-12, abs: 1e-15 }, `${label}: bleed = fraction x core flow`);
  // energy: inflow enthalpy + heat released = outflow enthalpy + extraction + mechanical losses
  const hptWork = m9 * hot * (row(p, '4').totalTemperature_K - row(p, '45').totalTemperature_K);
  const lptWork = m9 * hot * (row(p, '45').totalTemperature_K - row(p, '5').totalTemperature_K);
  const losses = (1 - k.hpMechanicalEfficiency) * hptWork + (1 - k.lpMechanicalEfficiency) * lptWork;
  const inflow = m0 * cold * row(p, '0').totalTemperature_K + k.burnerEfficiency * fuel * engine.spec.fuel.heatingValue_J_kg;
  const outflow = m19 * cold * row(p, '19').totalTemperature_K + m9 * hot * row(p, '9').totalTemperature_K + bleed * cold * row(p, '3').totalTemperature_K + p.powerExtraction_W + losses;
  expectClose(outflow, inflow, { rel: 1e-10 }, `${label}: energy balance`);
  // spool balances from the station temperatures
  const fanWork = m0 * cold * (row(p, '13').totalTemperature_K - row(p, '2').totalTemperature_K);
  const hpcWork = row(p, '25').massFlow_kg_s * cold * (row(p, '3').totalTemperature_K - row(p, '25').totalTemperature_K);
  expectClose(k.lpMechanicalEfficiency * lptWork, fanWork, { rel: 1e-9 }, `${label}: LP spool balance`);
  expectClose(k.hpMechanicalEfficiency * hptWork, hpcWork + p.powerExtraction_W, { rel: 1e-9 }, `${label}: HP spool balance`);
  // continuity at the fixed convergent nozzle exits: rho V A with the design throat areas
  expectClose(row(p, '9').area_m2!, engine.sizes.coreNozzleThroatArea_m2, { rel: 1e-9 }, `${label}: core nozzle area fixed`);
  expectClose(row(p, '19').area_m2!, engine.sizes.bypassNozzleThroatArea_m2, { rel: 1e-9 }, `${label}: bypass nozzle area fixed`);
  // momentum: net thrust from the exit rows (Mattingly: F = sum m V + A (p - p0) - m0 V0)
  const p0 = row(p, '0').staticPressure_Pa!;
  const jet = (r: ReturnType<typeof row>) => r.massFlow_kg_s * r.velocity_m_s! + r.area_m2! * (r.staticPressure_Pa! - p0);
  expectClose(p.thrust_N!, jet(row(p, '9')) + jet(row(p, '19')) - m0 * row(p, '0').velocity_m_s!, { rel: 1e-10, abs: 1e-6 }, `${label}: momentum balance`);
  expect(s.valid).toBe(true);
}

describe('runCyclePoint balances close at every converged point (demo engine)', () => {
  const throttles: readonly [string, CycleThrottle][] = [
    ['takeoff', { kind: 'rating', rating: 'takeoff' }],
    ['maxCruise', { kind: 'rating', rating: 'maxCruise' }],
    ['flightIdle', { kind: 'rating', rating: 'flightIdle' }],
    ['N1 0.85', { kind: 'fanSpeed', fraction: 0.85 }],
  ];
  const installations = [
    { recovery: 1, bleedFraction: 0, powerExtraction_W: 0 },
    { recovery: 0.97, bleedFraction: 0.03, powerExtraction_W: 60e3 },
  ];
  for (const altitude of [0, 20000, 40000]) {
    for (const mach of [0, 0.4, 0.8]) {
      it(`closes mass, energy, spool, continuity and momentum balances at ${altitude} ft, Mach ${mach}`, () => {
        for (const [name, throttle] of throttles) {
          for (const inst of installations) {
            const p = runCyclePoint(engine, { altitude_m: ft(altitude), mach, isaDeviation_K: 0, throttle, ...inst });
            checkBalances(p, `${name} ${altitude} ft M${mach} rec ${inst.recovery}`);
          }
        }
      });
    }
  }
});

describe('runCyclePoint at the demo design point (sea-level static ISA, takeoff)', () => {
  it('reproduces the design point to 1e-8 through the takeoff rating held by the corrected fan speed', () => {
    const p = runCyclePoint(engine, { altitude_m: 0, mach: 0, isaDeviation_K: 0, throttle: { kind: 'rating', rating: 'takeoff' } });
    expect(p.status).toBe('converged');
    expect(p.activeLimit).toBe('fanCorrectedSpeed');
    expectClose(p.thrust_N!, 36000, { rel: 1e-8 }, 'fixtures/cycle/demo-turbofan.cycle.json: sized to 36 kN');
    expectClose(p.fuelFlow_kg_s!, engine.summary.fuelFlow_kg_s, { rel: 1e-8 }, 'design point');
    expectClose(p.turbineInletTemperature_K!, 1560, { rel: 1e-8 }, 'fixture design Tt4');
    expectClose(p.bypassRatio!, 4.5, { rel: 1e-8 }, 'fixture');
    expectClose(p.overallPressureRatio!, 25 * 0.99, { rel: 1e-8 }, 'fixture OPR 25 with the 0.99 inter-compressor duct');
  });

  it('a warm start from a neighbouring point gives the same answer', () => {
    const a = runCyclePoint(engine, { altitude_m: ft(30000), mach: 0.7, isaDeviation_K: 0, throttle: { kind: 'rating', rating: 'maxClimb' } });
    const b = runCyclePoint(engine, { altitude_m: ft(30000), mach: 0.75, isaDeviation_K: 0, throttle: { kind: 'rating', rating: 'maxClimb' } });
    const warm = runCyclePoint(engine, { altitude_m: ft(30000), mach: 0.75, isaDeviation_K: 0, throttle: { kind: 'rating', rating: 'maxClimb' }, start: a.start! });
    expect(warm.status).toBe('converged');
    expectClose(warm.thrust_N!, b.thrust_N!, { rel: 1e-9 }, 'same point from a cold start');
    // the cost measure: a warm start spends fewer residual evaluations than a cold one
    expect(warm.evaluations).toBeGreaterThan(0);
    expect(warm.evaluations).toBeLessThan(b.evaluations);
  });
});
