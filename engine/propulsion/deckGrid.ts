/**
 * The deck's tabulated points as a ragged grid in flat typed arrays, and the
 * multilinear interpolation over it (the hot path of every mission).
 *
 * Levels: ISA deviation -> altitude -> Mach -> power. Each ISA level has its
 * own altitudes, each altitude its own Machs, each (altitude, Mach) node its
 * own power points; a regular grid is the special case where they coincide.
 *
 * Interpolation is linear along each axis in this order: power within each
 * (altitude, Mach) node, then Mach within each altitude, then altitude, then
 * ISA deviation. Written out, the value is a weighted sum of node values with
 * product weights, which is what `fillDeckNodes` computes.
 */
import type { DeckAxis } from './propulsionModel';
import type { DeckPolicy, OutOfTablePolicy } from './engineDeck';
import {
  SENSITIVITY_STRIDE,
  readSensitivities,
  writeSensitivities,
  type InstallationSensitivities,
} from './installationSensitivities';

/** One tabulated point (SI). `isaDev_K` is 0 for decks without an ISA-deviation column. */
export interface DeckGridPoint {
  readonly isaDev_K: number;
  readonly altitude_m: number;
  readonly mach: number;
  readonly power: number;
  readonly thrust_N: number;
  readonly fuelFlow_kg_s: number;
  readonly airflow_kg_s: number | null;
  /** Installation sensitivities at this point (installationSensitivities.ts); absent or null when the deck has none. */
  readonly sensitivities?: InstallationSensitivities | null;
}

export interface DeckGrid {
  /** ISA deviations (K), ascending; one level [0] when the deck has none. */
  readonly isaDevs_K: Float64Array;
  /** Altitudes of ISA level i are altitudes_m[altitudeStart[i] .. altitudeStart[i+1]). */
  readonly altitudeStart: Int32Array;
  readonly altitudes_m: Float64Array;
  /** Machs of altitude j are machs[machStart[j] .. machStart[j+1]). */
  readonly machStart: Int32Array;
  readonly machs: Float64Array;
  /** Points of (altitude, Mach) node k are [pointStart[k] .. pointStart[k+1]). */
  readonly pointStart: Int32Array;
  readonly power: Float64Array;
  readonly thrust_N: Float64Array;
  readonly fuelFlow_kg_s: Float64Array;
  /** Null when the deck has no airflow column. */
  readonly airflow_kg_s: Float64Array | null;
  /**
   * Installation sensitivities, SENSITIVITY_STRIDE values per point in the
   * slot order of SENSITIVITY_FIELDS (airflow slots 0 without airflow);
   * null when the deck has none.
   */
  readonly sensitivities: Float64Array | null;
}

/** Axis order used by the masks and per-axis arrays below. */
export const DECK_AXES: readonly DeckAxis[] = ['altitude', 'mach', 'power', 'isaDev'];
export const AXIS_ALTITUDE = 0;
export const AXIS_MACH = 1;
export const AXIS_POWER = 2;
export const AXIS_ISA_DEV = 3;

function compareGridPoints(a: DeckGridPoint, b: DeckGridPoint): number {
  return a.isaDev_K - b.isaDev_K || a.altitude_m - b.altitude_m || a.mach - b.mach || a.power - b.power;
}

/**
 * Builds the ragged grid from points in any order. The caller has checked
 * that the points are finite and unique; airflow is kept only when every
 * point has it.
 */
export function buildDeckGrid(points: readonly DeckGridPoint[]): DeckGrid {
  const sorted = [...points].sort(compareGridPoints);
  const n = sorted.length;
  const withAirflow = n > 0 && sorted.every((p) => p.airflow_kg_s !== null);
  const withSensitivities = n > 0 && sorted.every((p) => p.sensitivities != null);
  const isaDevs: number[] = [];
  const altitudeStart: number[] = [];
  const altitudes: number[] = [];
  const machStart: number[] = [];
  const machs: number[] = [];
  const pointStart: number[] = [];
  const power = new Float64Array(n);
  const thrust = new Float64Array(n);
  const fuelFlow = new Float64Array(n);
  const airflow = withAirflow ? new Float64Array(n) : null;
  const sensitivities = withSensitivities ? new Float64Array(n * SENSITIVITY_STRIDE) : null;
  for (let i = 0; i < n; i++) {
    const p = sorted[i]!;
    const prev = i > 0 ? sorted[i - 1]! : null;
    const newIsa = prev === null || prev.isaDev_K !== p.isaDev_K;
    const newAlt = newIsa || prev.altitude_m !== p.altitude_m;
    const newMach = newAlt || prev.mach !== p.mach;
    if (newIsa) {
      isaDevs.push(p.isaDev_K);
      altitudeStart.push(altitudes.length);
    }
    if (newAlt) {
      altitudes.push(p.altitude_m);
      machStart.push(machs.length);
    }
    if (newMach) {
      machs.push(p.mach);
      pointStart.push(i);
    }
    power[i] = p.power;
    thrust[i] = p.thrust_N;
    fuelFlow[i] = p.fuelFlow_kg_s;
    if (airflow) airflow[i] = p.airflow_kg_s ?? 0;
    if (sensitivities) writeSensitivities(p.sensitivities!, sensitivities, i * SENSITIVITY_STRIDE);
  }
  altitudeStart.push(altitudes.length);
  machStart.push(machs.length);
  pointStart.push(n);
  return deckGridOf({
    isaDevs_K: Float64Array.from(isaDevs),
    altitudeStart: Int32Array.from(altitudeStart),
    altitudes_m: Float64Array.from(altitudes),
    machStart: Int32Array.from(machStart),
    machs: Float64Array.from(machs),
    pointStart: Int32Array.from(pointStart),
    power,
    thrust_N: thrust,
    fuelFlow_kg_s: fuelFlow,
    airflow_kg_s: airflow,
    sensitivities,
  });
}

/**
 * A DeckGrid of `parts` in the one key order of DeckGrid: every grid the engine builds (buildDeckGrid, the corrected
 * copy of deckCorrection.ts) comes from here, so the grid reads of a lookup meet one object shape (a spread copy has
 * a shape of its own).
 */
export function deckGridOf(parts: DeckGrid): DeckGrid {
  return {
    isaDevs_K: parts.isaDevs_K,
    altitudeStart: parts.altitudeStart,
    altitudes_m: parts.altitudes_m,
    machStart: parts.machStart,
    machs: parts.machs,
    pointStart: parts.pointStart,
    power: parts.power,
    thrust_N: parts.thrust_N,
    fuelFlow_kg_s: parts.fuelFlow_kg_s,
    airflow_kg_s: parts.airflow_kg_s,
    sensitivities: parts.sensitivities,
  };
}

/** Every tabulated point of a grid, in grid order (for writers and reports). */
export function deckGridPoints(grid: DeckGrid): DeckGridPoint[] {
  const out: DeckGridPoint[] = [];
  for (let i = 0; i < grid.isaDevs_K.length; i++) {
    for (let j = grid.altitudeStart[i]!; j < grid.altitudeStart[i + 1]!; j++) {
      for (let k = grid.machStart[j]!; k < grid.machStart[j + 1]!; k++) {
        for (let q = grid.pointStart[k]!; q < grid.pointStart[k + 1]!; q++) {
          out.push({
            isaDev_K: grid.isaDevs_K[i]!,
            altitude_m: grid.altitudes_m[j]!,
            mach: grid.machs[k]!,
            power: grid.power[q]!,
            thrust_N: grid.thrust_N[q]!,
            fuelFlow_kg_s: grid.fuelFlow_kg_s[q]!,
            airflow_kg_s: grid.airflow_kg_s ? grid.airflow_kg_s[q]! : null,
            sensitivities: grid.sensitivities
              ? readSensitivities(grid.sensitivities, q * SENSITIVITY_STRIDE, grid.airflow_kg_s !== null)
              : null,
          });
        }
      }
    }
  }
  return out;
}

/**
 * Scratch buffers of one lookup: the contributing (altitude, Mach) nodes and
 * their weights, and which axes the lookup left. Reused across lookups so the
 * hot path does not allocate; `create...` makes one, `fill...` overwrites it.
 */
export interface DeckNodeSet {
  count: number;
  /** Node index (into `machs` / `pointStart`) of each contributor. */
  readonly node: Int32Array;
  readonly weight: Float64Array;
  /** Bit (1 << AXIS_x) set for each axis the lookup left. */
  outsideMask: number;
  /** Per axis (AXIS_x): the value asked for and the table range it left. */
  readonly outsideValue: Float64Array;
  readonly outsideMin: Float64Array;
  readonly outsideMax: Float64Array;
  /** Per axis: the tabulated altitude (m) and Mach of the level or node whose range was left (NaN where not applicable). */
  readonly outsideAtAltitude_m: Float64Array;
  readonly outsideAtMach: Float64Array;
  /** The axis whose 'refuse' policy stopped the lookup, or -1. */
  refusedAxis: number;
  /** Every node in the set tabulates the same power values (the grid is regular in power): one bracket serves all. */
  sharedPower: boolean;
}

/** A fresh, empty node set (scratch buffers for up to 8 nodes: 2 ISA levels x 2 altitudes x 2 Machs). */
export function createDeckNodeSet(): DeckNodeSet {
  return {
    count: 0,
    node: new Int32Array(8),
    weight: new Float64Array(8),
    outsideMask: 0,
    outsideValue: new Float64Array(4),
    outsideMin: new Float64Array(4),
    outsideMax: new Float64Array(4),
    outsideAtAltitude_m: new Float64Array(4),
    outsideAtMach: new Float64Array(4),
    refusedAxis: -1,
    sharedPower: false,
  };
}

// Result of the last `bracket` call (module-level to keep the hot path allocation-free).
let bracketT = 0;
let bracketSide = 0;

/**
 * Finds i in [lo, hi - 2] with a[i] <= x <= a[i+1] for ascending a[lo..hi)
 * (hi - lo >= 2) and sets bracketT = (x - a[i]) / (a[i+1] - a[i]). Outside the
 * range, bracketSide is -1 or +1 and bracketT follows the policy: clamped to
 * 0 or 1, or linear extrapolation from the end segment (also for 'refuse',
 * which the caller acts on).
 */
function bracket(a: Float64Array, lo: number, hi: number, x: number, policy: OutOfTablePolicy): number {
  let i: number;
  if (x < a[lo]!) {
    bracketSide = -1;
    i = lo;
    bracketT = policy === 'clamp' ? 0 : (x - a[lo]!) / (a[lo + 1]! - a[lo]!);
    return i;
  }
  if (x > a[hi - 1]!) {
    bracketSide = 1;
    i = hi - 2;
    bracketT = policy === 'clamp' ? 1 : (x - a[i]!) / (a[i + 1]! - a[i]!);
    return i;
  }
  bracketSide = 0;
  let l = lo;
  let h = hi - 1;
  while (h - l > 1) {
    const m = (l + h) >> 1;
    if (a[m]! <= x) l = m;
    else h = m;
  }
  bracketT = (x - a[l]!) / (a[l + 1]! - a[l]!);
  return l;
}

function noteOutside(
  s: DeckNodeSet,
  axis: number,
  value: number,
  min: number,
  max: number,
  atAltitude_m = Number.NaN,
  atMach = Number.NaN,
): void {
  const bit = 1 << axis;
  if ((s.outsideMask & bit) !== 0) return;
  s.outsideMask |= bit;
  s.outsideValue[axis] = value;
  s.outsideMin[axis] = min;
  s.outsideMax[axis] = max;
  s.outsideAtAltitude_m[axis] = atAltitude_m;
  s.outsideAtMach[axis] = atMach;
}

/** The tabulated altitude (m) of (altitude, Mach) node `node`. */
function nodeAltitude_m(grid: DeckGrid, node: number): number {
  let l = 0;
  let h = grid.altitudes_m.length - 1;
  // last altitude j with machStart[j] <= node
  while (l < h) {
    const m = (l + h + 1) >> 1;
    if (grid.machStart[m]! <= node) l = m;
    else h = m - 1;
  }
  return grid.altitudes_m[l]!;
}

function pushNode(s: DeckNodeSet, node: number, weight: number): void {
  if (weight === 0) return;
  s.node[s.count] = node;
  s.weight[s.count] = weight;
  s.count++;
}

/**
 * Fills `s` with the (altitude, Mach) nodes around a condition and their
 * multilinear weights. Returns false when an axis with policy 'refuse' was
 * left (s.refusedAxis says which), unless `allowRefusal` is false, in which
 * case 'refuse' acts as 'clamp'. Decks with one ISA level ignore `isaDev_K`
 * here (see deckTemperature.ts).
 */
export function fillDeckNodes(
  grid: DeckGrid,
  policy: DeckPolicy,
  isaDev_K: number,
  altitude_m: number,
  mach: number,
  s: DeckNodeSet,
  allowRefusal = true,
): boolean {
  s.count = 0;
  s.outsideMask = 0;
  s.refusedAxis = -1;
  const nIsa = grid.isaDevs_K.length;
  let iIsa = 0;
  let tIsa = 0;
  if (nIsa > 1) {
    const pol = effective(policy.isaDev, allowRefusal);
    iIsa = bracket(grid.isaDevs_K, 0, nIsa, isaDev_K, pol);
    tIsa = bracketT;
    if (bracketSide !== 0) {
      noteOutside(s, AXIS_ISA_DEV, isaDev_K, grid.isaDevs_K[0]!, grid.isaDevs_K[nIsa - 1]!);
      if (pol === 'refuse') {
        s.refusedAxis = AXIS_ISA_DEV;
        return false;
      }
    }
  }
  const altPolicy = effective(policy.altitude, allowRefusal);
  const machPolicy = effective(policy.mach, allowRefusal);
  const isaLevels = nIsa > 1 ? 2 : 1;
  for (let li = 0; li < isaLevels; li++) {
    const level = iIsa + li;
    const wIsa = isaLevels === 1 ? 1 : li === 0 ? 1 - tIsa : tIsa;
    if (wIsa === 0) continue;
    const a0 = grid.altitudeStart[level]!;
    const a1 = grid.altitudeStart[level + 1]!;
    const iAlt = bracket(grid.altitudes_m, a0, a1, altitude_m, altPolicy);
    const tAlt = bracketT;
    if (bracketSide !== 0) {
      noteOutside(s, AXIS_ALTITUDE, altitude_m, grid.altitudes_m[a0]!, grid.altitudes_m[a1 - 1]!);
      if (altPolicy === 'refuse') {
        s.refusedAxis = AXIS_ALTITUDE;
        return false;
      }
    }
    for (let la = 0; la < 2; la++) {
      const alt = iAlt + la;
      const wAlt = wIsa * (la === 0 ? 1 - tAlt : tAlt);
      if (wAlt === 0) continue;
      const m0 = grid.machStart[alt]!;
      const m1 = grid.machStart[alt + 1]!;
      const iMach = bracket(grid.machs, m0, m1, mach, machPolicy);
      const tMach = bracketT;
      if (bracketSide !== 0) {
        noteOutside(s, AXIS_MACH, mach, grid.machs[m0]!, grid.machs[m1 - 1]!, grid.altitudes_m[alt]!);
        if (machPolicy === 'refuse') {
          s.refusedAxis = AXIS_MACH;
          return false;
        }
      }
      pushNode(s, iMach, wAlt * (1 - tMach));
      pushNode(s, iMach + 1, wAlt * tMach);
    }
  }
  s.sharedPower = powerAxisShared(grid);
  return true;
}

// Whether every (altitude, Mach) node of a grid tabulates the same power values, per grid (computed once).
const sharedPowerAxes = new WeakMap<DeckGrid, boolean>();

function powerAxisShared(grid: DeckGrid): boolean {
  let shared = sharedPowerAxes.get(grid);
  if (shared === undefined) {
    shared = true;
    const n = grid.pointStart[1]! - grid.pointStart[0]!;
    for (let node = 1; shared && node < grid.pointStart.length - 1; node++) {
      const start = grid.pointStart[node]!;
      if (grid.pointStart[node + 1]! - start !== n) shared = false;
      for (let q = 0; shared && q < n; q++) if (grid.power[start + q] !== grid.power[q]) shared = false;
    }
    sharedPowerAxes.set(grid, shared);
  }
  return shared;
}

function effective(policy: OutOfTablePolicy, allowRefusal: boolean): OutOfTablePolicy {
  return policy === 'refuse' && !allowRefusal ? 'clamp' : policy;
}

/** Length of an output buffer for evaluateDeckNodesInto that also takes the sensitivities. */
export const DECK_VALUES_WITH_SENSITIVITIES = 3 + SENSITIVITY_STRIDE;

/**
 * Evaluates the nodes in `s` at power setting `power` and writes thrust (N),
 * fuel flow (kg/s) and airflow (kg/s; 0 without an airflow column) into
 * out[0..2]; when the grid has sensitivities and `out` has room
 * (DECK_VALUES_WITH_SENSITIVITIES), the sensitivities, interpolated by the
 * same weights, into out[3..11]. With `withFuelFlow` false the fuel flow and
 * its three sensitivities are skipped and written as 0 (for callers that need
 * thrust and airflow only). Sets the power bit of s.outsideMask when a node's power range is
 * left; returns false when that happens under policy 'refuse'.
 */
export function evaluateDeckNodesInto(
  grid: DeckGrid,
  s: DeckNodeSet,
  power: number,
  powerPolicy: OutOfTablePolicy,
  out: Float64Array,
  withFuelFlow = true,
): boolean {
  // Sums in locals (each starts at 0, so the result is the same as summing into `out`), written out at the end.
  let thrust = 0;
  let fuel = 0;
  let air = 0;
  let s0 = 0;
  let s1 = 0;
  let s2 = 0;
  let s3 = 0;
  let s4 = 0;
  let s5 = 0;
  let s6 = 0;
  let s7 = 0;
  let s8 = 0;
  const thrustColumn = grid.thrust_N;
  const fuelColumn = grid.fuelFlow_kg_s;
  const airflow = grid.airflow_kg_s;
  const sens = out.length >= DECK_VALUES_WITH_SENSITIVITIES ? grid.sensitivities : null;
  // With one power axis for every node, the first node's bracket (the same values, so the same index and weight)
  // serves them all, offset to each node's points.
  const shared = s.sharedPower && s.count > 0;
  let sharedOffset = 0;
  let sharedT = 0;
  let sharedSide = 0;
  if (shared) {
    const first = grid.pointStart[s.node[0]!]!;
    sharedOffset = bracket(grid.power, first, grid.pointStart[s.node[0]! + 1]!, power, powerPolicy) - first;
    sharedT = bracketT;
    sharedSide = bracketSide;
  }
  for (let k = 0; k < s.count; k++) {
    const node = s.node[k]!;
    const w = s.weight[k]!;
    const p0 = grid.pointStart[node]!;
    const p1 = grid.pointStart[node + 1]!;
    let i: number;
    let t: number;
    let side: number;
    if (shared) {
      i = p0 + sharedOffset;
      t = sharedT;
      side = sharedSide;
    } else {
      i = bracket(grid.power, p0, p1, power, powerPolicy);
      t = bracketT;
      side = bracketSide;
    }
    if (side !== 0) {
      if ((s.outsideMask & (1 << AXIS_POWER)) === 0) {
        noteOutside(s, AXIS_POWER, power, grid.power[p0]!, grid.power[p1 - 1]!, nodeAltitude_m(grid, node), grid.machs[node]!);
      }
      if (powerPolicy === 'refuse') {
        s.refusedAxis = AXIS_POWER;
        return false;
      }
    }
    const u = 1 - t;
    thrust += w * (u * thrustColumn[i]! + t * thrustColumn[i + 1]!);
    if (withFuelFlow) fuel += w * (u * fuelColumn[i]! + t * fuelColumn[i + 1]!);
    if (airflow) air += w * (u * airflow[i]! + t * airflow[i + 1]!);
    if (sens) {
      const a = i * SENSITIVITY_STRIDE;
      const b = a + SENSITIVITY_STRIDE;
      s0 += w * (u * sens[a]! + t * sens[b]!);
      s2 += w * (u * sens[a + 2]! + t * sens[b + 2]!);
      s3 += w * (u * sens[a + 3]! + t * sens[b + 3]!);
      s5 += w * (u * sens[a + 5]! + t * sens[b + 5]!);
      s6 += w * (u * sens[a + 6]! + t * sens[b + 6]!);
      s8 += w * (u * sens[a + 8]! + t * sens[b + 8]!);
      if (withFuelFlow) {
        s1 += w * (u * sens[a + 1]! + t * sens[b + 1]!);
        s4 += w * (u * sens[a + 4]! + t * sens[b + 4]!);
        s7 += w * (u * sens[a + 7]! + t * sens[b + 7]!);
      }
    }
  }
  out[0] = thrust;
  out[1] = fuel;
  out[2] = air;
  if (sens) {
    out[3] = s0;
    out[4] = s1;
    out[5] = s2;
    out[6] = s3;
    out[7] = s4;
    out[8] = s5;
    out[9] = s6;
    out[10] = s7;
    out[11] = s8;
  }
  return true;
}

/**
 * The power range common to every node in `s` (-): [max of node minima,
 * min of node maxima]; where the nodes do not overlap, their union.
 * Writes into out[0] (low) and out[1] (high).
 */
export function nodesPowerRangeInto(grid: DeckGrid, s: DeckNodeSet, out: Float64Array): void {
  let lo = -Infinity;
  let hi = Infinity;
  let uLo = Infinity;
  let uHi = -Infinity;
  for (let k = 0; k < s.count; k++) {
    const node = s.node[k]!;
    const a = grid.power[grid.pointStart[node]!]!;
    const b = grid.power[grid.pointStart[node + 1]! - 1]!;
    if (a > lo) lo = a;
    if (b < hi) hi = b;
    if (a < uLo) uLo = a;
    if (b > uHi) uHi = b;
  }
  if (lo > hi) {
    lo = uLo;
    hi = uHi;
  }
  out[0] = lo;
  out[1] = hi;
}

/**
 * The smallest tabulated power of any node in `s` strictly above `after`
 * (Infinity when none): the next breakpoint of the piecewise-linear thrust
 * at the interpolated condition.
 */
export function nextPowerBreakpoint(grid: DeckGrid, s: DeckNodeSet, after: number): number {
  let best = Infinity;
  for (let k = 0; k < s.count; k++) {
    const node = s.node[k]!;
    let l = grid.pointStart[node]!;
    let h = grid.pointStart[node + 1]!;
    // first index with power > after
    while (l < h) {
      const m = (l + h) >> 1;
      if (grid.power[m]! <= after) l = m + 1;
      else h = m;
    }
    if (l < grid.pointStart[node + 1]!) {
      const v = grid.power[l]!;
      if (v < best) best = v;
    }
  }
  return best;
}
