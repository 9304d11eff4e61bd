/**
 * Prints the cycle model's figures quoted in docs/cycle.md: ideal-limit
 * agreement, design-point closure, net thrust against Mach at a fixed fan
 * speed, the recovery sensitivity at the ratings beside Raymer's C_ram, and
 * the demo's envelope convergence.  Run: npx tsx scripts/cycleFigures.ts
 */
import { readFileSync } from 'node:fs';
import { expectOk } from '../engine/core/result';
import { parseCycleFile } from '../engine/cycle/cycleFile';
import { designEngine, runCyclePoint, type CycleEngine, type CycleSpec, type CycleThrottle } from '../engine/cycle/index';
import { RATING_NAMES } from '../engine/propulsion/propulsionModel';
import { FOOT_M } from '../engine/units';

const FT = FOOT_M;
const root = new URL('../', import.meta.url);
function spec(path: string): CycleSpec {
  return expectOk(parseCycleFile(readFileSync(new URL(path, root), 'utf8'), path), path);
}
function design(s: CycleSpec): CycleEngine {
  return expectOk(designEngine(s), s.title);
}
const ideal = design(spec('fixtures/cycle/ideal-turbofan.cycle.json'));
const demoSpec = spec('fixtures/cycle/demo-turbofan.cycle.json');
const demo = design(demoSpec);

function rel(a: number, b: number): number {
  return Math.abs(a / b - 1);
}

function idealAgreement(): void {
  const ref = JSON.parse(readFileSync(new URL('test/reference/cycleIdealReference.json', root), 'utf8')) as Record<string, number>;
  const s = ideal.design;
  const jet = 0.5 * s.turbineFlow_kg_s * s.coreNozzle.exitVelocity_m_s ** 2 + 0.5 * s.bypassFlow_kg_s * s.bypassNozzle.exitVelocity_m_s ** 2 - 0.5 * s.totalFlow_kg_s * s.free.velocity_m_s ** 2;
  const pairs: [string, number, number][] = [
    ['specific thrust', ideal.summary.specificThrust_N_s_kg, ref.specificThrust_N_s_kg!],
    ['fuel/air ratio', s.fuelAirRatio, ref.fuelAirRatio!],
    ['TSFC', ideal.summary.tsfc_kg_N_s, ref.tsfc_kg_N_s!],
    ['thermal efficiency', jet / (s.fuelFlow_kg_s * ideal.spec.fuel.heatingValue_J_kg), ref.thermalEfficiency!],
    ['propulsive efficiency', (s.thrust_N * s.free.velocity_m_s) / jet, ref.propulsiveEfficiency!],
  ];
  console.log('Ideal limit against the closed-form ideal turbofan (test/reference/cycleIdealReference.json):');
  for (const [name, a, b] of pairs) console.log(`  ${name.padEnd(22)} cycle ${a.toPrecision(12).padEnd(16)} closed form ${b.toPrecision(12).padEnd(16)} rel. diff ${rel(a, b).toExponential(1)}`);
}

function idealOffDesign(): void {
  const ref = JSON.parse(readFileSync(new URL('test/reference/cycleIdealOffDesignReference.json', root), 'utf8')) as { points: Record<string, number>[] };
  let worst = 0;
  for (const r of ref.points) {
    const p = runCyclePoint(ideal, { altitude_m: r.altitude_ft! * FT, mach: r.mach!, isaDeviation_K: 0, throttle: { kind: 'turbineInletTemperature', value_K: r.tt4_K! } });
    for (const [a, b] of [[p.thrust_N!, r.thrust_N!], [p.fuelFlow_kg_s!, r.fuelFlow_kg_s!], [p.airflow_kg_s!, r.airflow_kg_s!], [p.bypassRatio!, r.bypassRatio!], [p.fanPressureRatio!, r.fanPressureRatio!], [p.fanSpeed!, r.fanSpeed!]] as const) worst = Math.max(worst, rel(a, b));
  }
  console.log(`\nIdeal engine off design against the independent scipy match (test/reference/cycleIdealOffDesignReference.json, ${ref.points.length} points, thrust, fuel flow, airflow, bypass ratio, fan pressure ratio, N1): worst rel. diff ${worst.toExponential(1)}`);
}

function closure(): void {
  console.log('\nDesign-point closure (off-design solve at the design condition and throttle):');
  const i = runCyclePoint(ideal, { altitude_m: 35000 * FT, mach: 0.8, isaDeviation_K: 0, throttle: { kind: 'turbineInletTemperature', value_K: 1600 } });
  const d = runCyclePoint(demo, { altitude_m: 0, mach: 0, isaDeviation_K: 0, throttle: { kind: 'rating', rating: 'takeoff' } });
  for (const [name, e, p] of [['ideal', ideal, i], ['demo (takeoff rating)', demo, d]] as const) {
    console.log(`  ${name.padEnd(22)} thrust ${rel(p.thrust_N!, e.summary.thrust_N).toExponential(1)}, fuel flow ${rel(p.fuelFlow_kg_s!, e.summary.fuelFlow_kg_s).toExponential(1)}, airflow ${rel(p.airflow_kg_s!, e.summary.airflow_kg_s).toExponential(1)}, residual ${p.residual!.toExponential(1)}`);
  }
}

/** Thrust minimum along Mach at a fixed N1: the lowest of a 0.01 grid, refined by a parabola through its neighbours. */
function machMinimum(e: CycleEngine, altitude_ft: number, n1: number) {
  const pts: { mach: number; thrust: number; tsfc: number }[] = [];
  for (let k = 0; k <= 95; k++) {
    const p = runCyclePoint(e, { altitude_m: altitude_ft * FT, mach: k / 100, isaDeviation_K: 0, throttle: { kind: 'fanSpeed', fraction: n1 } });
    if (p.status === 'converged') pts.push({ mach: k / 100, thrust: p.thrust_N!, tsfc: p.tsfc_kg_N_s! });
  }
  let j = 0;
  for (let k = 1; k < pts.length; k++) if (pts[k]!.thrust < pts[j]!.thrust) j = k;
  let mMin = pts[j]!.mach;
  if (j > 0 && j < pts.length - 1) {
    const [a, b, c] = [pts[j - 1]!, pts[j]!, pts[j + 1]!];
    const denom = a.thrust - 2 * b.thrust + c.thrust;
    if (denom > 0) mMin = b.mach + (0.01 * (a.thrust - c.thrust)) / (2 * denom);
  }
  const at = (m: number) => pts.find((p) => Math.abs(p.mach - m) < 1e-9)!;
  return { mMin, fMin: pts[j]!.thrust, f0: pts[0]!.thrust, f90: at(0.9).thrust, tsfc0: pts[0]!.tsfc, tsfc90: at(0.9).tsfc, interior: j > 0 && j < pts.length - 1 };
}

function thrustMach(): void {
  console.log('\nNet thrust against Mach at a fixed mechanical fan speed N1 (ISA), Mach 0 to 0.95:');
  for (const [name, e] of [['demo', demo], ['ideal', ideal]] as const) {
    for (const alt of [0, 15000, 35000]) {
      for (const n1 of [1, 0.9]) {
        const m = machMinimum(e, alt, n1);
        console.log(
          `  ${name.padEnd(6)} ${String(alt).padStart(5)} ft N1 ${n1.toFixed(2)}: F(M0) ${(m.f0 / 1000).toFixed(2)} kN, minimum ${(m.fMin / 1000).toFixed(2)} kN at Mach ${m.mMin.toFixed(2)}${m.interior ? '' : ' (at the end of the range)'}, F(M0.9) ${(m.f90 / 1000).toFixed(2)} kN (${((m.f90 / m.fMin - 1) * 100).toFixed(1)} % above the minimum); TSFC ${(m.tsfc0 * 1e6).toFixed(1)} -> ${(m.tsfc90 * 1e6).toFixed(1)} mg/(N s)`,
        );
      }
    }
  }
}

function ratingsAlongMach(): void {
  console.log('\nDemo net thrust (kN) and TSFC (mg/(N s)) against Mach at the ratings (ISA):');
  for (const alt of [0, 15000, 35000]) {
    for (const rating of ['takeoff', 'maxClimb', 'maxCruise', 'flightIdle'] as const) {
      const cells: string[] = [];
      for (const mach of [0, 0.2, 0.4, 0.6, 0.8, 0.9]) {
        const p = runCyclePoint(demo, { altitude_m: alt * FT, mach, isaDeviation_K: 0, throttle: { kind: 'rating', rating } });
        cells.push(p.status === 'converged' ? `M${mach} ${(p.thrust_N! / 1000).toFixed(2)}/${(p.tsfc_kg_N_s! * 1e6).toFixed(1)}` : `M${mach} ${p.status}`);
      }
      console.log(`  ${String(alt).padStart(5)} ft ${rating.padEnd(10)} ${cells.join('  ')}`);
    }
  }
}

function perPercent(e: CycleEngine, alt: number, mach: number, throttle: CycleThrottle, isa = 0): { dF: number; dWf: number; limit: string; grossOverNet: number } | null {
  const a = runCyclePoint(e, { altitude_m: alt * FT, mach, isaDeviation_K: isa, throttle, recovery: 1 });
  const b = runCyclePoint(e, { altitude_m: alt * FT, mach, isaDeviation_K: isa, throttle, recovery: 0.99 });
  if (a.status !== 'converged' || b.status !== 'converged') return null;
  const s = a.state!;
  return {
    dF: (1 - b.thrust_N! / a.thrust_N!) * 100,
    dWf: (1 - b.fuelFlow_kg_s! / a.fuelFlow_kg_s!) * 100,
    limit: a.activeLimit ?? 'fixed',
    grossOverNet: (s.coreNozzle.grossThrust_N + s.bypassNozzle.grossThrust_N) / a.thrust_N!,
  };
}

function recovery(): void {
  console.log("\nThrust change per 1 % inlet recovery (recovery 1 -> 0.99) at the ratings; Raymer's rule C_ram = 1.35 (from memory):");
  const points = [[0, 0], [0, 0.25], [10000, 0.5], [25000, 0.7], [35000, 0.8], [41000, 0.8]] as const;
  const variants: [string, CycleEngine][] = [
    ['demo (BPR 4.5)', demo],
    ['demo as BPR 8', design({ ...demoSpec, design: { ...demoSpec.design, bypassRatio: 8, fanPressureRatio: 1.5 } })],
    ['demo as turbojet', design({ ...demoSpec, design: { ...demoSpec.design, bypassRatio: 0, fanPressureRatio: 3, overallPressureRatio: 15, size: { kind: 'airflow', airflow_kg_s: 30 } } })],
  ];
  for (const [name, e] of variants) {
    for (const rating of ['takeoff', 'maxClimb', 'maxCruise'] as const) {
      const cells = points.map(([alt, m]) => {
        const r = perPercent(e, alt, m, { kind: 'rating', rating });
        return r === null ? `${alt}/${m}: n/a` : `${alt / 1000}k/M${m}: ${r.dF.toFixed(2)} % (Fg/Fn ${r.grossOverNet.toFixed(2)})`;
      });
      console.log(`  ${name.padEnd(17)} ${rating.padEnd(9)} ${cells.join('  ')}`);
    }
  }
  const hot = perPercent(demo, 0, 0, { kind: 'rating', rating: 'takeoff' }, 30);
  const fixedN1 = perPercent(demo, 35000, 0.8, { kind: 'fanSpeed', fraction: 0.9 });
  const fixedTt4 = perPercent(demo, 35000, 0.8, { kind: 'turbineInletTemperature', value_K: 1300 });
  console.log(`  demo takeoff ISA+30 sea-level static (${hot!.limit}): ${hot!.dF.toFixed(2)} % thrust, ${hot!.dWf.toFixed(2)} % fuel flow`);
  console.log(`  demo 35,000 ft M0.8 at fixed N1 0.9: ${fixedN1!.dF.toFixed(2)} % thrust, ${fixedN1!.dWf.toFixed(2)} % fuel flow; at fixed Tt4 1,300 K: ${fixedTt4!.dF.toFixed(2)} % thrust, ${fixedTt4!.dWf.toFixed(2)} % fuel flow`);
}

function envelope(): void {
  let n = 0;
  let ok = 0;
  let iterations = 0;
  for (const rating of RATING_NAMES) {
    for (let alt = 0; alt <= 45000; alt += 5000) {
      for (let i = 0; i <= 9; i++) {
        for (const isa of [-20, 0, 15, 30]) {
          const p = runCyclePoint(demo, { altitude_m: alt * FT, mach: i / 10, isaDeviation_K: isa, throttle: { kind: 'rating', rating } });
          n++;
          if (p.status === 'converged') ok++;
          iterations += p.iterations;
        }
      }
    }
  }
  console.log(`\nDemo envelope (0-45,000 ft by 5,000, Mach 0-0.9 by 0.1, ISA-20/0/+15/+30, ${RATING_NAMES.length} ratings): ${ok}/${n} converged (${((100 * ok) / n).toFixed(1)} %), ${(iterations / n).toFixed(1)} Newton iterations per point (last match)`);
}

idealAgreement();
idealOffDesign();
closure();
thrustMach();
ratingsAlongMach();
recovery();
envelope();
