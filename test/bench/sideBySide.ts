/**
 * The side by side printed last by `npm run bench`: the converged demo
 * mission in Blockwise (in-process, median of many runs) against the same
 * mission scripted in Python with numpy/scipy (test/bench/peer/demoMission.py),
 * spawned once with N repetitions. Reports the peer's own timing of the
 * mission part (interpreter start-up and imports excluded), the whole
 * process's wall time, the time ratio and the block-fuel agreement.
 */
import { spawnSync } from 'node:child_process';
import { cpus } from 'node:os';
import { performance } from 'node:perf_hooks';
import { solveMission } from '../../engine/mission/solveMission';
import { loadDemoInput, PEER_SCRIPT_PATH, PEER_PROJECT_PATH } from './peer/demoInput';

export interface PeerReport {
  readonly blockFuel_kg: number;
  readonly tripFuel_kg: number;
  readonly blockTime_s: number;
  readonly tripTime_s: number;
  readonly reserveFuel_kg: number;
  readonly repeat: number;
  readonly missionWall_s: readonly number[];
  readonly medianMission_s: number;
}

export interface SideBySide {
  readonly cores: number;
  readonly blockwise: { readonly runs: number; readonly medianMission_s: number; readonly blockFuel_kg: number; readonly tripFuel_kg: number; readonly blockTime_s: number };
  readonly peer: (PeerReport & { readonly process_s: number }) | { readonly error: string };
}

export function median(values: readonly number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 === 1 ? s[mid]! : 0.5 * (s[mid - 1]! + s[mid]!);
}

/** Checks the peer's JSON and returns it, or a message saying what is wrong. */
export function parsePeerOutput(stdout: string): PeerReport | string {
  let data: unknown;
  try {
    data = JSON.parse(stdout.trim().split('\n').at(-1) ?? '');
  } catch {
    return `the peer printed no JSON (got ${JSON.stringify(stdout.slice(0, 200))})`;
  }
  const d = data as Record<string, unknown>;
  for (const key of ['blockFuel_kg', 'tripFuel_kg', 'blockTime_s', 'tripTime_s', 'reserveFuel_kg', 'medianMission_s', 'repeat']) {
    if (typeof d[key] !== 'number' || !Number.isFinite(d[key])) return `the peer's JSON has no finite number "${key}"`;
  }
  if (!Array.isArray(d.missionWall_s)) return 'the peer\'s JSON has no "missionWall_s" list';
  return d as unknown as PeerReport;
}

/** Runs both sides: Blockwise `runs` times in-process, the peer once with `repeat` repetitions. */
export function runSideBySide(runs = 15, repeat = 3): SideBySide {
  const { input } = loadDemoInput(undefined, PEER_PROJECT_PATH);
  solveMission(input); // warm-up (JIT)
  const times: number[] = [];
  let last = solveMission(input);
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    last = solveMission(input);
    times.push((performance.now() - t0) / 1000);
  }
  const blockwise = { runs, medianMission_s: median(times), blockFuel_kg: last.blockFuel_kg, tripFuel_kg: last.tripFuel_kg, blockTime_s: last.blockTime_s };
  const t0 = performance.now();
  const child = spawnSync('python3', [PEER_SCRIPT_PATH, PEER_PROJECT_PATH, '--repeat', String(repeat)], { encoding: 'utf8', timeout: 900_000 });
  const process_s = (performance.now() - t0) / 1000;
  const cores = cpus().length;
  if (child.error) return { cores, blockwise, peer: { error: `python3 could not be started: ${child.error.message}` } };
  if (child.status !== 0) return { cores, blockwise, peer: { error: `the peer exited with ${child.status}: ${child.stderr.trim().split('\n').at(-1) ?? ''}` } };
  const peer = parsePeerOutput(child.stdout);
  if (typeof peer === 'string') return { cores, blockwise, peer: { error: peer } };
  return { cores, blockwise, peer: { ...peer, process_s } };
}

function ms(t_s: number): string {
  return t_s >= 1 ? `${t_s.toFixed(2)} s` : `${(t_s * 1000).toFixed(1)} ms`;
}

/** The side by side as text lines. */
export function formatSideBySide(r: SideBySide): string {
  const b = r.blockwise;
  const lines = [
    `Side by side: converged demo mission (payload + range, fuel iterated to the reserve), ${r.cores} cores`,
    `  Blockwise (in-process, median of ${b.runs})   ${ms(b.medianMission_s).padStart(10)}   block fuel ${b.blockFuel_kg.toFixed(1)} kg, trip fuel ${b.tripFuel_kg.toFixed(1)} kg, block time ${(b.blockTime_s / 60).toFixed(1)} min`,
  ];
  const p = r.peer;
  if ('error' in p) {
    lines.push(`  Python peer: not run (${p.error})`);
    return lines.join('\n');
  }
  const startup = p.process_s - p.missionWall_s.reduce((a, x) => a + x, 0);
  const agreement = (100 * (p.blockFuel_kg - b.blockFuel_kg)) / b.blockFuel_kg;
  lines.push(
    `  Python peer (numpy/scipy, median of ${p.repeat})  ${ms(p.medianMission_s).padStart(10)}   block fuel ${p.blockFuel_kg.toFixed(1)} kg, trip fuel ${p.tripFuel_kg.toFixed(1)} kg, block time ${(p.blockTime_s / 60).toFixed(1)} min`,
    `  Python whole process (start-up + ${p.repeat} missions) ${ms(p.process_s)}; start-up and imports about ${ms(Math.max(startup, 0))}`,
    `  Time ratio peer / Blockwise: ${(p.medianMission_s / b.medianMission_s).toFixed(1)} x (mission part); ${((startup + p.medianMission_s) / b.medianMission_s).toFixed(1)} x for one mission including Python start-up`,
    `  Block fuel: peer - Blockwise = ${(p.blockFuel_kg - b.blockFuel_kg).toFixed(2)} kg (${agreement >= 0 ? '+' : ''}${agreement.toFixed(3)} %); trip fuel ${((100 * (p.tripFuel_kg - b.tripFuel_kg)) / b.tripFuel_kg).toFixed(3)} %`,
  );
  return lines.join('\n');
}
