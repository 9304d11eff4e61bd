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
import { createPassMemo } from '../mission/passMemo';
import { analysisSolver, lagrangeWeights, type NeighbourStart } from './warmStart';

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
 * the first mission when that corner does not exist).
 */
export function payloadRangeDiagram(
  base: MissionInput,
  options: PayloadRangeOptions,
): Result<PayloadRangeResult, AnalysisError> {
  const solve: MissionSolver = options.solve ?? analysisSolver(createPassMemo());
  const between = options.pointsBetween ?? 3;
  if (!Number.isInteger(between) || between < 0 || between > 50) {
    return err({ code: 'invalid_input', message: `payload-range: points between corners ${between} must be an integer 0..50` });
  }
  const af = base.airframe;
  const maxPayload_kg = af.mzfw_kg - af.oew_kg;
  if (!(maxPayload_kg > 0)) {
    return err({ code: 'invalid_input', message: `payload-range: MZFW ${af.mzfw_kg} kg is not above OEW ${af.oew_kg} kg, so no payload can be carried` });
  }
  // Missions to fly; one fewer once the MTOW-full-fuel corner turns out not to exist.
  let total = 3 + 2 * between;
  let done = 0;
  // Missions flown so far by payload: each next one starts from the nearest and its solvable leg's distance is
  // predicted by the line (or parabola) through the nearest two (three) on its side of the MTOW-full-fuel corner.
  const flown: { readonly payload_kg: number; readonly result: MissionResult }[] = [];
  let corner: number | null = null;
  const startFor = (payload_kg: number): NeighbourStart | undefined => {
    const side = (p: number) => (corner === null ? 0 : p > corner + 1e-9 ? 1 : p < corner - 1e-9 ? -1 : 0);
    const s = side(payload_kg);
    const near = flown
      .filter((f) => s === 0 || side(f.payload_kg) === 0 || side(f.payload_kg) === s)
      .sort((x, y) => Math.abs(x.payload_kg - payload_kg) - Math.abs(y.payload_kg - payload_kg))
      .slice(0, 3);
    if (near.length === 0) return undefined;
    const weights = lagrangeWeights(near.map((f) => f.payload_kg), payload_kg);
    return { from: near[0]!.result, blend: near.map((f, k) => ({ weight: weights[k]!, result: f.result })) };
  };
  const fly = (payload_kg: number, what: string): Result<MissionResult, AnalysisError> => {
    if (options.shouldCancel?.()) return err({ code: 'cancelled', message: `payload-range cancelled after ${done} of ${total} missions` });
    const r = solve({ ...base, solve: { kind: 'maxRange', payload_kg } }, startFor(payload_kg));
    if (r.status === 'ok') flown.push({ payload_kg, result: r });
    done++;
    options.onProgress?.(done, total);
    if (r.status !== 'ok') {
      return err({ code: 'mission_failed', message: `payload-range: the ${what} mission (payload ${payload_kg.toFixed(0)} kg) failed: ${r.status}: ${r.statusMessage}` });
    }
    return ok(r);
  };
  const a = fly(maxPayload_kg, 'maximum-payload');
  if (!a.ok) return a;
  const taxiOut_kg = a.value.rampMass_kg - a.value.takeoffMass_kg;
  const payloadB = af.mtow_kg + taxiOut_kg - af.oew_kg - af.maxFuel_kg;
  const hasB = payloadB > 0 && payloadB < maxPayload_kg;
  if (hasB) corner = payloadB;
  let b: MissionResult | null = null;
  if (hasB) {
    const rb = fly(payloadB, 'MTOW-full-fuel');
    if (!rb.ok) return rb;
    b = rb.value;
  } else {
    // No MTOW-full-fuel corner: no mission for it, so the count to fly drops by one.
    total--;
  }
  const c = fly(0, 'ferry');
  if (!c.ok) return c;
  const segments: [number, number][] = hasB ? [[maxPayload_kg, payloadB], [payloadB, 0]] : [[maxPayload_kg, 0]];
  const mids: PayloadRangePoint[][] = [];
  for (const [hi, lo] of segments) {
    const list: PayloadRangePoint[] = [];
    const n = hasB ? between : 2 * between;
    for (let i = 1; i <= n; i++) {
      const r = fly(hi + ((lo - hi) * i) / (n + 1), 'intermediate');
      if (!r.ok) return r;
      list.push(pointOf('between', r.value));
    }
    mids.push(list);
  }
  const pa = pointOf('maxPayload', a.value);
  const pb = b === null ? null : pointOf('mtowFullFuel', b);
  const pc = pointOf('ferry', c.value);
  const points = pb === null ? [pa, ...mids[0]!, pc] : [pa, ...mids[0]!, pb, ...mids[1]!, pc];
  const note =
    pb === null
      ? payloadB >= maxPayload_kg
        ? 'Full tanks fit under MTOW even at maximum payload: the diagram has no MTOW-limited segment.'
        : 'Full tanks never fit under MTOW, even with no payload: the ferry point is MTOW-limited.'
      : 'Maximum payload to the MTOW-full-fuel corner is MTOW-limited; beyond it, fuel-capacity-limited.';
  return ok({ points, maxPayload: pa, mtowFullFuel: pb, ferry: pc, missions: done, note });
}
