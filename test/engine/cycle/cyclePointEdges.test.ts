import { describe, expect, it } from 'vitest';
import { designEngine, runCyclePoint, type CyclePointResult } from '../../../engine/cycle/index';
import { expectOk } from '../../../engine/core/result';
import { cycleSpecFile, designedCycle, DEMO_CYCLE, ft } from './cycleFixtures';

const engine = designedCycle(DEMO_CYCLE);
const at = { altitude_m: ft(20000), mach: 0.6, isaDeviation_K: 0 };

function noNumberIsNaN(p: CyclePointResult): void {
  for (const [key, v] of Object.entries(p)) if (typeof v === 'number') expect(Number.isNaN(v), key).toBe(false);
}

describe('runCyclePoint refuses what it cannot run, with a status and never NaN', () => {
  it('an altitude outside the standard atmosphere is invalid_condition', () => {
    const p = runCyclePoint(engine, { ...at, altitude_m: 90000, throttle: { kind: 'rating', rating: 'maxClimb' } });
    expect(p.status).toBe('invalid_condition');
    expect(p.message).toMatch(/90000 m/);
    expect(p.thrust_N).toBeNull();
    noNumberIsNaN(p);
  });

  it('NaN or negative Mach, recovery out of (0.3, 1], bleed out of [0, 0.3) and negative extraction are invalid_condition', () => {
    const bad = [
      runCyclePoint(engine, { ...at, mach: Number.NaN, throttle: { kind: 'rating', rating: 'maxClimb' } }),
      runCyclePoint(engine, { ...at, mach: -0.1, throttle: { kind: 'rating', rating: 'maxClimb' } }),
      runCyclePoint(engine, { ...at, recovery: 1.01, throttle: { kind: 'rating', rating: 'maxClimb' } }),
      runCyclePoint(engine, { ...at, bleedFraction: 0.5, throttle: { kind: 'rating', rating: 'maxClimb' } }),
      runCyclePoint(engine, { ...at, powerExtraction_W: -1, throttle: { kind: 'rating', rating: 'maxClimb' } }),
      runCyclePoint(engine, { ...at, throttle: { kind: 'fanSpeed', fraction: Number.NaN } }),
    ];
    for (const p of bad) {
      expect(p.status).toBe('invalid_condition');
      noNumberIsNaN(p);
    }
  });

  it('a rating the file does not define is unknown_rating and names the ones it has', () => {
    const ideal = designedCycle('fixtures/cycle/ideal-turbofan.cycle.json');
    const p = runCyclePoint(ideal, { ...at, throttle: { kind: 'rating', rating: 'takeoff' } });
    expect(p.status).toBe('unknown_rating');
    expect(p.message).toMatch(/maxClimb, maxCruise/);
  });

  it('a sub-idle fan speed matches with cautions; one needing Tt4 past 2,500 K or an extraction the core cannot give is a status', () => {
    const low = runCyclePoint(engine, { ...at, throttle: { kind: 'fanSpeed', fraction: 0.1 } });
    expect(low.status).toBe('converged');
    expect(low.cautions.map((c) => c.code)).toEqual(['lp_turbine_unchoking', 'thrust_not_positive']);
    const idle = runCyclePoint(engine, { ...at, throttle: { kind: 'rating', rating: 'flightIdle' } });
    expect(idle.cautions).toEqual([]);
    const high = runCyclePoint(engine, { altitude_m: 0, mach: 0.9, isaDeviation_K: 30, throttle: { kind: 'fanSpeed', fraction: 1.5 } });
    expect(['limit_unreachable', 'not_converged']).toContain(high.status);
    expect(high.thrust_N).toBeNull();
    expect(high.message).toMatch(/fanSpeed 1.5/);
    noNumberIsNaN(high);
    const heavy = runCyclePoint(engine, { ...at, powerExtraction_W: 50e6, throttle: { kind: 'rating', rating: 'maxClimb' } });
    expect(heavy.status).not.toBe('converged');
    expect(heavy.message.length).toBeGreaterThan(10);
    noNumberIsNaN(heavy);
  });

  it('a fixed fan speed above the hard limits converges and lists the limits it exceeds', () => {
    const p = runCyclePoint(engine, { altitude_m: 0, mach: 0.5, isaDeviation_K: 30, throttle: { kind: 'fanSpeed', fraction: 1.1 } });
    expect(p.status).toBe('converged');
    expect(p.exceededLimits).toContain('fanSpeed');
    expect(p.activeLimit).toBeNull();
  });
});

describe('a rating comes out of its limits', () => {
  it('takeoff is flat-rated: thrust held by the corrected fan speed on cool days, by Tt4 above the corner', () => {
    // Flat rating (common practice): constant takeoff thrust up to a corner temperature, then falling.
    // The demo file holds N1c at 1.0 and Tt4 at 1,641 K = 1,560 K x (303.15/288.15): a corner near ISA+15.
    const thrust = (isa: number) => runCyclePoint(engine, { altitude_m: 0, mach: 0, isaDeviation_K: isa, throttle: { kind: 'rating', rating: 'takeoff' } });
    const cool = [-20, -10, 0, 10].map(thrust);
    for (const p of cool) {
      expect(p.activeLimit).toBe('fanCorrectedSpeed');
      expect(Math.abs(p.thrust_N! / 36000 - 1)).toBeLessThan(0.01);
    }
    const hot = [20, 30].map(thrust);
    for (const p of hot) expect(p.activeLimit).toBe('turbineInletTemperature');
    expect(hot[1]!.thrust_N!).toBeLessThan(hot[0]!.thrust_N!);
    expect(hot[0]!.thrust_N!).toBeLessThan(cool[3]!.thrust_N!);
  });

  it('ratings are ordered takeoff >= max continuous >= max climb >= max cruise > flight idle at sample points', () => {
    for (const [alt, mach, isa] of [[0, 0, 0], [0, 0.3, 30], [20000, 0.6, 0], [41000, 0.8, -10]] as const) {
      const t = (['takeoff', 'maxContinuous', 'maxClimb', 'maxCruise', 'flightIdle'] as const).map(
        (rating) => runCyclePoint(engine, { altitude_m: ft(alt), mach, isaDeviation_K: isa, throttle: { kind: 'rating', rating } }).thrust_N!,
      );
      for (let i = 1; i < t.length; i++) expect(t[i]!, `${alt} ft M${mach} ISA${isa}`).toBeLessThanOrEqual(t[i - 1]! * (1 + 1e-12));
      expect(t[4]!).toBeLessThan(t[3]!);
    }
  });

  it('a mechanical fan speed limit below the corrected one takes over when the inlet is hot (high Mach, low altitude)', () => {
    const spec = cycleSpecFile(DEMO_CYCLE);
    const tight = expectOk(designEngine({ ...spec, limits: { ...spec.limits, fanSpeed: 1.0 } }), 'tight');
    const p = runCyclePoint(tight, { altitude_m: 0, mach: 0.8, isaDeviation_K: -10, throttle: { kind: 'rating', rating: 'takeoff' } });
    expect(p.status).toBe('converged');
    expect(p.activeLimit).toBe('fanSpeed');
    expect(Math.abs(p.fanSpeed! - 1)).toBeLessThan(1e-9);
    expect(p.fanCorrectedSpeed!).toBeLessThan(1);
  });
});

describe('a turbojet is the zero-bypass case', () => {
  it('designs and matches without a bypass stream and reproduces its design point', () => {
    const spec = cycleSpecFile(DEMO_CYCLE);
    const jet = expectOk(designEngine({ ...spec, design: { ...spec.design, bypassRatio: 0, fanPressureRatio: 3, overallPressureRatio: 12, size: { kind: 'airflow', airflow_kg_s: 20 } } }), 'turbojet');
    expect(jet.sizes.bypassNozzleThroatArea_m2).toBe(0);
    const p = runCyclePoint(jet, { altitude_m: 0, mach: 0, isaDeviation_K: 0, throttle: { kind: 'turbineInletTemperature', value_K: 1560 } });
    expect(p.status).toBe('converged');
    expect(Math.abs(p.thrust_N! / jet.summary.thrust_N - 1)).toBeLessThan(1e-8);
    expect(p.stations.map((s) => s.station)).not.toContain('19');
    const cruise = runCyclePoint(jet, { altitude_m: ft(30000), mach: 0.8, isaDeviation_K: 0, throttle: { kind: 'rating', rating: 'maxCruise' } });
    expect(cruise.status).toBe('converged');
  });
});

describe('designEngine refuses a cycle that cannot run', () => {
  it('a turbine inlet temperature too low to drive the compressors is turbine_cannot_drive or nozzle_not_flowing', () => {
    const spec = cycleSpecFile(DEMO_CYCLE);
    const r = designEngine({ ...spec, design: { ...spec.design, turbineInletTemperature_K: 900, bypassRatio: 10 } });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(['turbine_cannot_drive', 'nozzle_not_flowing', 'invalid_spec']).toContain(r.error.code);
  });

  it('an efficiency above 1 is invalid_spec naming the field', () => {
    const spec = cycleSpecFile(DEMO_CYCLE);
    const r = designEngine({ ...spec, components: { ...spec.components, fanPolytropicEfficiency: 1.2 } });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toMatch(/components\.fanPolytropicEfficiency/);
  });
});
