/**
 * The peer at equal accuracy: the scripted Python mission
 * (peer/demoMission.py) first at a tight tolerance (its own reference), then
 * with the tolerance loosened a decade at a time until its block fuel leaves
 * EQUAL_ACCURACY of that reference; the loosest tolerance still within it is
 * the peer's fair setting, timed with a few repetitions. Blockwise is checked
 * the same way against its own fine-step answer (stepScale 1/8): at its
 * production steps (the headline ratio), and with its steps loosened the same
 * way (stepScale 2, 4, ... while its block fuel stays within EQUAL_ACCURACY),
 * so both sides are also timed at their loosest setting within the tolerance.
 * Blockwise's solves are timed warm (BLOCKWISE_WARMUP solves first), as the
 * mission rows of the table are: the peer has no JIT to warm.
 */
import { spawnSync } from 'node:child_process';
import { performance } from 'node:perf_hooks';
import { solveMission } from '../../engine/mission/solveMission';
import type { MissionInput, MissionResult } from '../../engine/mission/missionTypes';
import { PEER_PROJECT_PATH, loadDemoInput, PEER_SCRIPT_PATH } from './peer/demoInput';
import { median, parsePeerOutput, type PeerReport } from './sideBySide';

/** Largest relative block-fuel difference to the tight answer that counts as equal accuracy (0.01 %). */
export const EQUAL_ACCURACY = 1e-4;
/** The peer's tight tolerance (its reference) and the tolerances tried, tightest first. */
export const PEER_TIGHT_RTOL = 1e-10;
export const PEER_RTOLS: readonly number[] = [1e-7, 1e-6, 1e-5, 1e-4, 1e-3, 1e-2];
/** Blockwise's step scales tried beyond production (1), tightest first. */
export const BLOCKWISE_STEP_SCALES: readonly number[] = [2, 4, 8, 16, 32];
/** Solves run before Blockwise's timed ones (the JIT's warm-up; the first tens of solves run 2 to 4 times slower). */
export const BLOCKWISE_WARMUP = 200;

export interface PeerTry {
  readonly rtol: number;
  /** Set when the peer failed at this tolerance (e.g. its root finder lost the bracket): counts as outside. */
  readonly error?: string;
  readonly blockFuel_kg: number;
  readonly relativeDifference: number;
  readonly mission_s: number;
}

/** A step scale Blockwise was tried at: its status, block fuel (kg) and difference to its fine-step answer. */
export interface BlockwiseTry {
  readonly stepScale: number;
  readonly status: string;
  readonly blockFuel_kg: number;
  readonly relativeDifference: number;
}

export interface BlockwiseTiming {
  readonly medianMission_s: number;
  readonly blockFuel_kg: number;
  readonly tightBlockFuel_kg: number;
  readonly relativeDifference: number;
}

export interface EqualAccuracy {
  readonly tolerance: number;
  /** At production steps (stepScale 1). */
  readonly blockwise: BlockwiseTiming;
  /** At the loosest step scale tried that stays ok and within the tolerance (1, production, when none does). */
  readonly blockwiseLoosened: BlockwiseTiming & { readonly stepScale: number; readonly tries: readonly BlockwiseTry[] };
  readonly peer:
    | { readonly tightBlockFuel_kg: number; readonly tries: readonly PeerTry[]; readonly rtol: number; readonly medianMission_s: number; readonly blockFuel_kg: number; readonly relativeDifference: number; readonly repeat: number }
    | { readonly error: string };
  /** Peer time / Blockwise time at equal accuracy (Blockwise at production steps). */
  readonly ratio: number | null;
  /** Peer time / Blockwise time, both at their loosest setting within the tolerance. */
  readonly ratioLoosened: number | null;
}

function runPeer(rtol: number, repeat: number): PeerReport | string {
  const child = spawnSync('python3', [PEER_SCRIPT_PATH, PEER_PROJECT_PATH, '--repeat', String(repeat), '--rtol', String(rtol)], { encoding: 'utf8', timeout: 1_800_000 });
  if (child.error) return `python3 could not be started: ${child.error.message}`;
  if (child.status !== 0) return `the peer exited with ${child.status}: ${child.stderr.trim().split('\n').at(-1) ?? ''}`;
  return parsePeerOutput(child.stdout);
}

/** Median wall time (s) of `runs` solves at `stepScale`, after BLOCKWISE_WARMUP untimed ones, and the last result. */
function timeBlockwise(input: MissionInput, stepScale: number, runs: number): { readonly median_s: number; readonly last: MissionResult } {
  let last = solveMission(input, { stepScale });
  for (let i = 0; i < BLOCKWISE_WARMUP; i++) last = solveMission(input, { stepScale });
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    last = solveMission(input, { stepScale });
    times.push((performance.now() - t0) / 1000);
  }
  return { median_s: median(times), last };
}

/** Blockwise's step scales beyond production, loosened while the solve stays ok and within EQUAL_ACCURACY of `tight_kg`. */
export function loosenBlockwise(input: MissionInput, tight_kg: number): { readonly tries: readonly BlockwiseTry[]; readonly chosen: number } {
  const tries: BlockwiseTry[] = [];
  let chosen = 1;
  for (const stepScale of BLOCKWISE_STEP_SCALES) {
    const r = solveMission(input, { stepScale });
    const t: BlockwiseTry = { stepScale, status: r.status, blockFuel_kg: r.blockFuel_kg, relativeDifference: (r.blockFuel_kg - tight_kg) / tight_kg };
    tries.push(t);
    if (r.status !== 'ok' || !(Math.abs(t.relativeDifference) <= EQUAL_ACCURACY)) break;
    chosen = stepScale;
  }
  return { tries, chosen };
}

/** Runs both sides at equal accuracy; `blockwiseRuns` timed in-process solves, `peerRepeat` repetitions of the chosen peer setting. */
export function runEqualAccuracy(blockwiseRuns = 31, peerRepeat = 3): EqualAccuracy {
  const { input } = loadDemoInput(undefined, PEER_PROJECT_PATH);
  const tight = solveMission(input, { stepScale: 0.125 });
  const timing = (stepScale: number): BlockwiseTiming => {
    const { median_s, last } = timeBlockwise(input, stepScale, blockwiseRuns);
    return {
      medianMission_s: median_s,
      blockFuel_kg: last.blockFuel_kg,
      tightBlockFuel_kg: tight.blockFuel_kg,
      relativeDifference: (last.blockFuel_kg - tight.blockFuel_kg) / tight.blockFuel_kg,
    };
  };
  const blockwise = timing(1);
  const loose = loosenBlockwise(input, tight.blockFuel_kg);
  const blockwiseLoosened = { ...timing(loose.chosen), stepScale: loose.chosen, tries: loose.tries };
  const reference = runPeer(PEER_TIGHT_RTOL, 1);
  if (typeof reference === 'string') return { tolerance: EQUAL_ACCURACY, blockwise, blockwiseLoosened, peer: { error: reference }, ratio: null, ratioLoosened: null };
  const tries: PeerTry[] = [];
  let chosen: PeerTry | null = null;
  for (const rtol of PEER_RTOLS) {
    const r = runPeer(rtol, 1);
    if (typeof r === 'string') {
      tries.push({ rtol, blockFuel_kg: Number.NaN, relativeDifference: Number.NaN, mission_s: Number.NaN, error: r });
      break;
    }
    const t: PeerTry = { rtol, blockFuel_kg: r.blockFuel_kg, relativeDifference: (r.blockFuel_kg - reference.blockFuel_kg) / reference.blockFuel_kg, mission_s: r.medianMission_s };
    tries.push(t);
    if (Math.abs(t.relativeDifference) > EQUAL_ACCURACY) break;
    chosen = t;
  }
  if (chosen === null) return { tolerance: EQUAL_ACCURACY, blockwise, blockwiseLoosened, peer: { error: `no tolerance from ${PEER_RTOLS[0]} up kept the peer within ${EQUAL_ACCURACY * 100} %` }, ratio: null, ratioLoosened: null };
  const timed = runPeer(chosen.rtol, peerRepeat);
  if (typeof timed === 'string') return { tolerance: EQUAL_ACCURACY, blockwise, blockwiseLoosened, peer: { error: timed }, ratio: null, ratioLoosened: null };
  const peer = {
    tightBlockFuel_kg: reference.blockFuel_kg,
    tries,
    rtol: chosen.rtol,
    medianMission_s: timed.medianMission_s,
    blockFuel_kg: timed.blockFuel_kg,
    relativeDifference: (timed.blockFuel_kg - reference.blockFuel_kg) / reference.blockFuel_kg,
    repeat: peerRepeat,
  };
  return {
    tolerance: EQUAL_ACCURACY,
    blockwise,
    blockwiseLoosened,
    peer,
    ratio: peer.medianMission_s / blockwise.medianMission_s,
    ratioLoosened: peer.medianMission_s / blockwiseLoosened.medianMission_s,
  };
}

function ms(t_s: number): string {
  return t_s >= 1 ? `${t_s.toFixed(2)} s` : t_s >= 1e-3 ? `${(t_s * 1000).toFixed(2)} ms` : `${(t_s * 1e6).toFixed(0)} us`;
}

function pct(x: number): string {
  const p = 100 * x;
  return `${p >= 0 ? '+' : ''}${Math.abs(p) < 1e-3 && p !== 0 ? p.toExponential(1) : p.toFixed(4)} %`;
}

/** The equal-accuracy comparison as text lines. */
export function formatEqualAccuracy(r: EqualAccuracy): string {
  const b = r.blockwise;
  const lines = [
    `At equal accuracy (block fuel within ${(100 * r.tolerance).toFixed(2)} % of each program's own tight answer):`,
    `  Blockwise (production steps, median of the timed runs after ${BLOCKWISE_WARMUP} warm-up solves) ${ms(b.medianMission_s)}, block fuel ${b.blockFuel_kg.toFixed(3)} kg, ${pct(b.relativeDifference)} from its fine-step answer ${b.tightBlockFuel_kg.toFixed(3)} kg`,
  ];
  const l = r.blockwiseLoosened;
  for (const t of l.tries) lines.push(`    stepScale ${t.stepScale}: ${t.status === 'ok' ? `block fuel ${t.blockFuel_kg.toFixed(3)} kg, ${pct(t.relativeDifference)}` : t.status}${t.status !== 'ok' || Math.abs(t.relativeDifference) > r.tolerance ? '  (outside)' : ''}`);
  lines.push(`  Blockwise loosened (stepScale ${l.stepScale}, the loosest within): ${ms(l.medianMission_s)}, block fuel ${l.blockFuel_kg.toFixed(3)} kg, ${pct(l.relativeDifference)} from its fine-step answer`);
  const p = r.peer;
  if ('error' in p) {
    lines.push(`  Python peer: not run (${p.error})`);
    return lines.join('\n');
  }
  lines.push(`  Python peer tight (rtol ${PEER_TIGHT_RTOL}): block fuel ${p.tightBlockFuel_kg.toFixed(3)} kg`);
  for (const t of p.tries) {
    if (t.error !== undefined) lines.push(`    rtol ${t.rtol.toExponential(0)}: the peer failed (${t.error}); counted as outside`);
    else lines.push(`    rtol ${t.rtol.toExponential(0)}: block fuel ${t.blockFuel_kg.toFixed(3)} kg, ${pct(t.relativeDifference)}, ${ms(t.mission_s)}${Math.abs(t.relativeDifference) > r.tolerance ? '  (outside)' : ''}`);
  }
  lines.push(
    `  Python peer at rtol ${p.rtol.toExponential(0)} (median of ${p.repeat}): ${ms(p.medianMission_s)}, block fuel ${p.blockFuel_kg.toFixed(3)} kg, ${pct(p.relativeDifference)} from its tight answer`,
    `  Ratio at equal accuracy, peer / Blockwise: ${r.ratio === null ? 'n/a' : `${r.ratio.toFixed(0)} x`} (Blockwise at production steps)`,
  );
  if (r.ratioLoosened !== null) lines.push(`  Ratio with both sides at their loosest setting within ${(100 * r.tolerance).toFixed(2)} %: ${r.ratioLoosened.toFixed(0)} x`);
  return lines.join('\n');
}
