/**
 * Payload-range diagram: the corner points (maximum payload at MTOW, MTOW
 * with full fuel, ferry = zero payload with full fuel) and points between
 * them, each a whole mission with reserves flown by the mission solver in
 * maximum-range mode.
 */
import type { Caution } from '../cautions/caution';
import { err, ok, type Result } from '../core/result';
import type { MissionInput, MissionResult } from '../mission/missionTypes';
import type { AnalysisError, MissionSolver } from './analysisTypes';
import { flySerially, type AnalysisSteps, type MissionRound, type PlannedMission, type RoundResults } from './missionPlan';
import { lagrangeWeights, type NeighbourStart } from './warmStart';

export type PayloadRangePointKind = 'maxPayload' | 'mtowFullFuel' | 'ferry' | 'between';

export interface PayloadRangePoint {
  readonly kind: PayloadRangePointKind;
  readonly payload_kg: number;
  /** Range (m) in the mission's distance basis (over the ground, or in still air in a design-range study). */
  readonly range_m: number;
  /** Still-air and ground distance of the trip (m). */
  readonly airDistance_m: number;
  readonly groundDistance_m: number;
  readonly takeoffMass_kg: number;
  readonly rampMass_kg: number;
  /** Fuel on board at block-out = ramp mass - zero-fuel mass (kg). */
  readonly fuelOnBoard_kg: number;
  readonly blockFuel_kg: number;
  readonly tripFuel_kg: number;
  readonly reserveFuel_kg: number;
  readonly blockTime_s: number;
  readonly cautions: readonly Caution[];
}

export interface PayloadRangeResult {
  /** Flown points in order of increasing range, maximum payload to ferry (the segment from zero range at maximum payload is implied). */
  readonly points: readonly PayloadRangePoint[];
  readonly maxPayload: PayloadRangePoint;
  /** Null when full tanks never fit under MTOW at any payload >= 0 or always fit at maximum payload. */
  readonly mtowFullFuel: PayloadRangePoint | null;
  readonly ferry: PayloadRangePoint;
  /** Missions flown. */
  readonly missions: number;
  readonly note: string;
}

export interface PayloadRangeOptions {
  /** Mission solver; default warmStart.ts analysisSolver with one pass memo for all its missions (they differ in payload alone), no time history. */
  readonly solve?: MissionSolver;
  /** Points between corners on each segment; default 3. */
  readonly pointsBetween?: number;
  /** Called after each mission with (done, total). */
  readonly onProgress?: (done: number, total: number) => void;
  /** Polled before each mission; true stops the run with a `cancelled` error. */
  readonly shouldCancel?: () => boolean;
}

function pointOf(kind: PayloadRangePointKind, r: MissionResult): PayloadRangePoint {
  return {
    kind,
    payload_kg: r.payload_kg,
    range_m: r.distanceBasis === 'ground' ? r.groundDistance_m : r.airDistance_m,
    airDistance_m: r.airDistance_m,
    groundDistance_m: r.groundDistance_m,
    takeoffMass_kg: r.takeoffMass_kg,
    rampMass_kg: r.rampMass_kg,
    fuelOnBoard_kg: r.rampMass_kg - r.zeroFuelMass_kg,
    blockFuel_kg: r.blockFuel_kg,
    tripFuel_kg: r.tripFuel_kg,
    reserveFuel_kg: r.reserveFuel_kg,
    blockTime_s: r.blockTime_s,
    cautions: r.cautions,
  };
}

/**
 * Payload-range diagram of a mission input (its solve mode is replaced).
 * Maximum payload = MZFW - OEW; the MTOW-full-fuel payload is
 * MTOW + taxi-out fuel - OEW - max fuel, with the taxi-out fuel (ramp minus
 * take-off mass) taken from the maximum-payload mission; every point is
 * flown in `maxRange` mode, which loads the most fuel MTOW and the tanks
 * allow. Cost: 3 + 2 * pointsBetween missions, one fewer without an
 * MTOW-full-fuel corner; onProgress(done, total) is called once after each
 * mission flown and ends at (missions, missions) (total drops by one after
 * the first mission when that corner does not exist). On the calling thread
 * (missionPlan.ts flySerially).
 */
export function payloadRangeDiagram(
  base: MissionInput,
  options: PayloadRangeOptions,
): Result<PayloadRangeResult, AnalysisError> {
  let done = 0;
  const count = { total: 3 + 2 * (options.pointsBetween ?? 3) };
  return flySerially(payloadRangeSteps(base, options, count), {
    ...(options.solve ? { solve: options.solve } : {}),
    ...(options.shouldCancel ? { shouldCancel: options.shouldCancel } : {}),
    onMission: () => options.onProgress?.(++done, count.total),
  });
}

/** A point flown: its payload and result. */
interface FlownPoint {
  readonly payload_kg: number;
  readonly result: MissionResult;
}

/**
 * payloadRangeDiagram as rounds of planned missions (missionPlan.ts), each
 * lane sharing one pass memo: the maximum-payload mission; the
 * MTOW-full-fuel corner (when there is one) from it; then two lanes, the
 * points below the first corner flown downwards from it, and the ferry
 * point (from the corner before it) with the points above it flown upwards.
 * Each point starts from the (up to three) nearest points on its side of
 * the MTOW-full-fuel corner (the diagram has a kink there) among the
 * corners flown before and its lane's points before it: the polynomial in
 * payload through them (Lagrange weights). `count.total` is set to the
 * missions to fly once known.
 */
export function* payloadRangeSteps(base: MissionInput, options: PayloadRangeOptions, count: { total: number } = { total: 0 }): AnalysisSteps<Result<PayloadRangeResult, AnalysisError>> {
  const between = options.pointsBetween ?? 3;
  if (!Number.isInteger(between) || between < 0 || between > 50) {
    return err({ code: 'invalid_input', message: `payload-range: points between corners ${between} must be an integer 0..50` });
  }
  const af = base.airframe;
  const maxPayload_kg = af.mzfw_kg - af.oew_kg;
  if (!(maxPayload_kg > 0)) {
    return err({ code: 'invalid_input', message: `payload-range: MZFW ${af.mzfw_kg} kg is not above OEW ${af.oew_kg} kg, so no payload can be carried` });
  }
  count.total = 3 + 2 * between;
  let done = 0;
  let corner: number | null = null;
  const side = (p: number) => (corner === null ? 0 : p > corner + 1e-9 ? 1 : p < corner - 1e-9 ? -1 : 0);
  // The nearest (up to three) points of `candidates` on the side of `payload_kg`, and the polynomial through them.
  const startAmong = (payload_kg: number, candidates: readonly FlownPoint[]): NeighbourStart | undefined => {
    const s = side(payload_kg);
    const near = candidates
      .filter((f) => f.result.status === 'ok' && (s === 0 || side(f.payload_kg) === 0 || side(f.payload_kg) === s))
      .sort((x, y) => Math.abs(x.payload_kg - payload_kg) - Math.abs(y.payload_kg - payload_kg))
      .slice(0, 3);
    if (near.length === 0) return undefined;
    const weights = lagrangeWeights(near.map((f) => f.payload_kg), payload_kg);
    return { from: near[0]!.result, blend: near.map((f, k) => ({ weight: weights[k]!, result: f.result })) };
  };
  const corners: FlownPoint[] = [];
  const planned = (payload_kg: number, lane: number, after: readonly number[], ahead: readonly number[]): PlannedMission => ({
    input: { ...base, solve: { kind: 'maxRange', payload_kg } },
    after,
    lane,
    start: (results) => startAmong(payload_kg, [...corners, ...after.map((i) => ({ payload_kg: ahead[i]!, result: results[i]! })).filter((f) => f.result !== undefined)]),
  });
  const failure = (r: MissionResult | undefined, payload_kg: number, what: string): Result<never, AnalysisError> | null => {
    if (r === undefined) return err({ code: 'cancelled', message: `payload-range cancelled after ${done} of ${count.total} missions` });
    done++;
    if (r.status === 'ok') return null;
    return err({ code: 'mission_failed', message: `payload-range: the ${what} mission (payload ${payload_kg.toFixed(0)} kg) failed: ${r.status}: ${r.statusMessage}` });
  };
  // One mission alone in its round, in lane 0.
  function* single(payload_kg: number, what: string): Generator<MissionRound, Result<MissionResult, AnalysisError>, RoundResults> {
    const flown = yield { missions: [planned(payload_kg, 0, [], [payload_kg])], laneMemos: true, stopAtFailure: true };
    const r = flown.results[0];
    const bad = failure(r, payload_kg, what);
    return bad ?? ok(r!);
  }
  const a = yield* single(maxPayload_kg, 'maximum-payload');
  if (!a.ok) return a;
  corners.push({ payload_kg: maxPayload_kg, result: a.value });
  const taxiOut_kg = a.value.rampMass_kg - a.value.takeoffMass_kg;
  const payloadB = af.mtow_kg + taxiOut_kg - af.oew_kg - af.maxFuel_kg;
  const hasB = payloadB > 0 && payloadB < maxPayload_kg;
  let b: MissionResult | null = null;
  if (hasB) {
    corner = payloadB;
    const rb = yield* single(payloadB, 'MTOW-full-fuel');
    if (!rb.ok) return rb;
    b = rb.value;
    corners.push({ payload_kg: payloadB, result: b });
  } else {
    // No MTOW-full-fuel corner: no mission for it, so the count to fly drops by one.
    count.total--;
  }
  // The points between: below the first corner (maximum payload) on the upper segment, above the ferry point on the lower.
  const segments: [number, number][] = hasB ? [[maxPayload_kg, payloadB], [payloadB, 0]] : [[maxPayload_kg, 0]];
  const mids = segments.map(([hi, lo]) => {
    const n = hasB ? between : 2 * between;
    return Array.from({ length: n }, (_, i) => hi + ((lo - hi) * (i + 1)) / (n + 1));
  });
  // Lane 0 flies down from maximum payload; lane 1 flies the ferry point, then up from it.
  const all = mids.flat();
  const down = hasB ? mids[0]! : all.slice(0, Math.ceil(all.length / 2));
  const up = (hasB ? mids[1]! : all.slice(down.length)).slice().reverse();
  const payloads = [...down, 0, ...up];
  const missions: PlannedMission[] = payloads.map((p, i) => {
    const lane = i < down.length ? 0 : 1;
    const first = lane === 0 ? 0 : down.length;
    return planned(p, lane, Array.from({ length: i - first }, (_, k) => first + k), payloads);
  });
  const flown = yield { missions, laneMemos: true, stopAtFailure: true };
  if (flown.cancelled) {
    return err({ code: 'cancelled', message: `payload-range cancelled after ${done + flown.results.filter((r) => r !== undefined).length} of ${count.total} missions` });
  }
  // The first failure in plan order (a serial run stops there; the missions before it fly the same on any thread).
  const ferryAt = down.length;
  for (const [i, r] of flown.results.entries()) {
    if (r === undefined) continue;
    const bad = failure(r, payloads[i]!, i === ferryAt ? 'ferry' : 'intermediate');
    if (bad) return bad;
  }
  const c = flown.results[ferryAt];
  const pointAt = (p: number) => pointOf('between', flown.results[payloads.indexOf(p)]!);
  const pa = pointOf('maxPayload', a.value);
  const pb = b === null ? null : pointOf('mtowFullFuel', b);
  const pc = pointOf('ferry', c!);
  const points = pb === null ? [pa, ...mids[0]!.map(pointAt), pc] : [pa, ...mids[0]!.map(pointAt), pb, ...mids[1]!.map(pointAt), pc];
  const note =
    pb === null
      ? payloadB >= maxPayload_kg
        ? 'Full tanks fit under MTOW even at maximum payload: the diagram has no MTOW-limited segment.'
        : 'Full tanks never fit under MTOW, even with no payload: the ferry point is MTOW-limited.'
      : 'Maximum payload to the MTOW-full-fuel corner is MTOW-limited; beyond it, fuel-capacity-limited.';
  return ok({ points, maxPayload: pa, mtowFullFuel: pb, ferry: pc, missions: done, note });
}
