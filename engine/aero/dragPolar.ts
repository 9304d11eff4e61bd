/**
 * The airframe drag polar (DESIGN.md §2.3), implementing AeroModel:
 *   CD = CD0(M) + dCD0 + K(M) (CL - CLmd)^2 + CDwave(M, CL)
 * with K = 1/(pi e AR) (Oswald) or K(M) tabulated, and CDwave from the Korn
 * equation with Lock's rise (engine/aero/waveDrag.ts) or a CDwave(M, CL)
 * table. Lift = n m g0 and q = (gamma/2) p M^2 at the pressure altitude
 * (NACA Report 1135, gamma = 1.4). Every Mach or CL table is clamped at its
 * ends and each breakdown lists the tables the query left.
 */
import { expectOk } from '../core/result';
import type { Result } from '../core/result';
import { clampedValue, interp1d, makeTable1d, outsideAxis, type Table1d } from '../core/table1d';
import { interp2d, makeTable2d, type Table2d } from '../core/table2d';
import type { AeroModel, DragBreakdown, DragQuery, DragSample } from './aeroModel';
import { validatePolarSpec, type PolarIssue, type PolarSpec } from './polarSpec';
import { g0, gamma } from './constants';
import { atmosphere, isaPressureAt } from './standardAtmosphere';
import { kornTerms, kornWaveDrag, kornWaveDragOf, type KornTerms, type KornWing } from './waveDrag';

/** Names used in `outsideTables` when a query leaves a table and is clamped. */
export type PolarTableName = 'cd0' | 'induced' | 'compressibility' | 'buffetCl' | 'clMax';

/** The built tables of a polar (ready for lookups). */
export interface PolarTables {
  readonly cd0: Table1d;
  /** Constant K or K(M) table. */
  readonly induced: number | Table1d;
  readonly wave:
    | { readonly kind: 'none' }
    | { readonly kind: 'korn'; readonly wing: KornWing; readonly terms: KornTerms }
    | { readonly kind: 'table'; readonly table: Table2d };
  readonly buffetCl: Table1d;
  readonly clMax: Table1d;
}

export interface PolarCoefficients {
  readonly cd0: number;
  readonly cdIncrement: number;
  readonly cdInduced: number;
  readonly cdWave: number;
  readonly cd: number;
  /** Tables the lookup left (each value held at the table's end). */
  readonly outsideTables: readonly PolarTableName[];
}

/** AeroModel with its spec and tables exposed for analyses. */
export interface DragPolarModel extends AeroModel {
  readonly spec: PolarSpec;
  readonly tables: PolarTables;
  withIncrement(deltaCd0: number): DragPolarModel;
}

function lookup(table: Table1d, x: number, name: PolarTableName, outside: PolarTableName[]): number {
  const r = expectOk(interp1d(table, x, 'clamp'), `polar table ${name}`);
  if (r.outside !== null && !outside.includes(name)) outside.push(name);
  return r.value;
}

function kornWave(wing: KornWing): PolarTables['wave'] {
  return { kind: 'korn', wing, terms: kornTerms(wing) };
}

function buildTables(spec: PolarSpec): PolarTables {
  const cd0 = expectOk(makeTable1d(spec.cd0.mach, spec.cd0.cd0, 'cd0'), 'validated cd0 table');
  const ind = spec.induced;
  const induced =
    ind.kind === 'oswald'
      ? 1 / (Math.PI * ind.oswaldEfficiency * ind.aspectRatio)
      : expectOk(makeTable1d(ind.mach, ind.k, 'induced'), 'validated induced table');
  const c = spec.compressibility;
  const wave: PolarTables['wave'] =
    c.kind === 'none'
      ? { kind: 'none' }
      : c.kind === 'korn'
        ? kornWave({ sweep_rad: c.sweep_rad, thicknessRatio: c.thicknessRatio, kornTechnologyFactor: c.kornTechnologyFactor })
        : { kind: 'table', table: expectOk(makeTable2d(c.mach, c.cl, c.cdWave, 'compressibility'), 'validated wave table') };
  return {
    cd0,
    induced,
    wave,
    buffetCl: expectOk(makeTable1d(spec.buffetCl.mach, spec.buffetCl.cl, 'buffetCl'), 'validated buffet table'),
    clMax: expectOk(makeTable1d(spec.clMax.mach, spec.clMax.cl, 'clMax'), 'validated clMax table'),
  };
}

function requireFinite(value: number, what: string): void {
  if (!Number.isFinite(value)) throw new RangeError(`drag polar: ${what} is ${String(value)}, expected a finite number`);
}

/** Induced-drag factor K(M) (-), clamped to the table. */
export function inducedFactor(model: DragPolarModel, mach: number): number {
  const t = model.tables.induced;
  return typeof t === 'number' ? t : lookup(t, mach, 'induced', []);
}

/**
 * Drag coefficients at Mach `mach` (>= 0) and lift coefficient `cl` (any
 * sign): CD0(M), dCD0, K(M)(CL - CLmd)^2, CDwave(M, CL) and their sum.
 * Wave drag uses |CL| in the Korn equation (a CDwave table is read at CL as
 * given). `source` is a built model or a spec; a spec is validated and its
 * tables built on every call, so build a model for repeated use. Throws
 * RangeError for an invalid spec, a non-finite or negative Mach or a
 * non-finite CL (caller bugs).
 */
export function polarCoefficients(source: DragPolarModel | PolarSpec, mach: number, cl: number): PolarCoefficients {
  requireFinite(mach, 'Mach');
  requireFinite(cl, 'CL');
  if (mach < 0) throw new RangeError(`drag polar: Mach is ${mach}, expected >= 0`);
  const model = 'tables' in source ? source : specModel(source);
  const outside: PolarTableName[] = [];
  const t = model.tables;
  const cd0 = lookup(t.cd0, mach, 'cd0', outside);
  const k = typeof t.induced === 'number' ? t.induced : lookup(t.induced, mach, 'induced', outside);
  const dcl = cl - model.spec.clMinDrag;
  const cdInduced = k * dcl * dcl;
  let cdWave = 0;
  if (t.wave.kind === 'korn') {
    cdWave = kornWaveDrag(t.wave.wing, mach, cl);
  } else if (t.wave.kind === 'table') {
    const w = expectOk(interp2d(t.wave.table, mach, cl, 'clamp'), 'polar table compressibility');
    if (w.outsideX !== null || w.outsideY !== null) outside.push('compressibility');
    cdWave = w.value;
  }
  const cdIncrement = model.spec.cdIncrement;
  return { cd0, cdIncrement, cdInduced, cdWave, cd: cd0 + cdIncrement + cdInduced + cdWave, outsideTables: outside };
}

function specModel(spec: PolarSpec): { readonly spec: PolarSpec; readonly tables: PolarTables } {
  const checked = validatePolarSpec(spec);
  if (!checked.ok) {
    throw new RangeError(`drag polar: invalid spec: ${checked.error.map((i) => `${i.path} ${i.message}`).join('; ')}`);
  }
  return { spec, tables: buildTables(spec) };
}

/** Buffet-onset CL (-) at a Mach, clamped to the table. */
export function buffetClAt(model: DragPolarModel, mach: number): number {
  return lookup(model.tables.buffetCl, mach, 'buffetCl', []);
}

/** Maximum lift coefficient (-) at a Mach, clamped to the table. */
export function clMaxAt(model: DragPolarModel, mach: number): number {
  return lookup(model.tables.clMax, mach, 'clMax', []);
}

/** The tables a lookup at `mach` (and `cl` for a wave-drag table) left, in polarCoefficients' order then buffet CL and CLmax; one shared empty list when none (the usual case). */
function outsideTablesAt(t: PolarTables, mach: number, cl: number): readonly PolarTableName[] {
  const cd0 = outsideAxis(t.cd0.x, mach);
  const induced = typeof t.induced !== 'number' && outsideAxis(t.induced.x, mach);
  const wave = t.wave.kind === 'table' && (outsideAxis(t.wave.table.x, mach) || outsideAxis(t.wave.table.y, cl));
  const buffet = outsideAxis(t.buffetCl.x, mach);
  const clMax = outsideAxis(t.clMax.x, mach);
  if (!cd0 && !induced && !wave && !buffet && !clMax) return NONE_OUTSIDE;
  const out: PolarTableName[] = [];
  if (cd0) out.push('cd0');
  if (induced) out.push('induced');
  if (wave) out.push('compressibility');
  if (buffet) out.push('buffetCl');
  if (clMax) out.push('clMax');
  return out;
}
const NONE_OUTSIDE: readonly PolarTableName[] = Object.freeze([]);

/**
 * What a drag query reads from the Mach tables alone (CD0, K, buffet CL,
 * CLmax, and the tables left when the wave drag is not a CL table): pure
 * functions of the Mach, kept for the last Mach asked. A climb or descent
 * step asks twice at each of its altitudes (two RK4 stages, or the last
 * stage and the accepted point) and level flight at one Mach throughout.
 */
interface MachMemo {
  /** The spec's CLmd and dCD0, copied here at the build: specs of other shapes (a literal, a spread copy) made the spec's reads polymorphic. */
  readonly clMinDrag: number;
  readonly cdIncrement: number;
  mach: number;
  cd0: number;
  k: number;
  buffetCl: number;
  clMax: number;
  outside: readonly PolarTableName[];
}

function newMachMemo(spec: PolarSpec): MachMemo {
  return { clMinDrag: spec.clMinDrag, cdIncrement: spec.cdIncrement, mach: Number.NaN, cd0: 0, k: 0, buffetCl: 0, clMax: 0, outside: NONE_OUTSIDE };
}

/** True when every number of a drag query is finite and the Mach and mass are > 0 (x - x is 0 exactly when x is finite). */
function usableQuery(altitude_m: number, mach: number, mass_kg: number, loadFactor: number): boolean {
  return altitude_m - altitude_m === 0 && mass_kg - mass_kg === 0 && loadFactor - loadFactor === 0 && mach - mach === 0 && mach > 0 && mass_kg > 0;
}

/** Throws the RangeError of the first bad number of a drag query, in the order they are checked (caller bugs). */
function refuseQuery(altitude_m: number, mach: number, mass_kg: number, loadFactor: number): never {
  requireFinite(altitude_m, 'altitude_m');
  requireFinite(mass_kg, 'mass_kg');
  requireFinite(loadFactor, 'loadFactor');
  requireFinite(mach, 'Mach');
  if (!(mach > 0)) throw new RangeError(`drag polar: Mach is ${mach}, expected > 0 for a lifting query`);
  throw new RangeError(`drag polar: mass_kg is ${mass_kg}, expected > 0`);
}

/** Throws the RangeError of an altitude outside the standard atmosphere (a caller bug). */
function refuseAltitude(altitude_m: number): never {
  const atm = atmosphere(altitude_m);
  throw new RangeError(`drag polar: ${atm.ok ? `no pressure at ${altitude_m} m` : atm.error.message}`);
}

/** Reads the Mach tables into the memo for `mach` (and the tables left, unless they depend on CL). */
function refreshMachMemo(t: PolarTables, memo: MachMemo, mach: number, cl: number): void {
  memo.cd0 = clampedValue(t.cd0, mach);
  memo.k = typeof t.induced === 'number' ? t.induced : clampedValue(t.induced, mach);
  memo.buffetCl = clampedValue(t.buffetCl, mach);
  memo.clMax = clampedValue(t.clMax, mach);
  if (t.wave.kind !== 'table') memo.outside = outsideTablesAt(t, mach, cl);
  memo.mach = mach;
}

/** CDwave (-) at a Mach and CL: Korn's equation, a CDwave(M, CL) table (clamped at its edges) or none. */
function waveDragAt(wave: PolarTables['wave'], mach: number, cl: number): number {
  if (wave.kind === 'korn') return kornWaveDragOf(wave.terms, mach, cl);
  return wave.kind === 'table' ? expectOk(interp2d(wave.table, mach, cl, 'clamp'), 'polar table compressibility').value : 0;
}

/**
 * One drag query: the same arithmetic as polarCoefficients plus the buffet
 * and CLmax lookups, without intermediate result objects (the mission asks
 * thousands per solve). Only the pressure of the standard atmosphere is
 * needed (dynamic pressure 0.5 gamma p M^2). Kept small, its rare paths in
 * functions of their own, so that the optimising compiler can inline it
 * into a caller that reads one field (the drag force) and drop the object.
 */
function dragAt(model: DragPolarModel, memo: MachMemo, query: DragQuery): DragBreakdown {
  const altitude_m = query.altitude_m;
  const mach = query.mach;
  const mass_kg = query.mass_kg;
  const loadFactor = query.loadFactor;
  if (!usableQuery(altitude_m, mach, mass_kg, loadFactor)) refuseQuery(altitude_m, mach, mass_kg, loadFactor);
  const pressure_Pa = isaPressureAt(altitude_m);
  if (pressure_Pa !== pressure_Pa) refuseAltitude(altitude_m); // NaN: outside the atmosphere
  const q_Pa = 0.5 * gamma * pressure_Pa * mach * mach;
  const qS = q_Pa * model.wingArea_m2;
  const weight_N = mass_kg * g0;
  const cl = (loadFactor * weight_N) / qS;
  const t = model.tables;
  if (mach !== memo.mach) refreshMachMemo(t, memo, mach, cl);
  const cd0 = memo.cd0;
  const dcl = cl - memo.clMinDrag;
  const cdInduced = memo.k * dcl * dcl;
  const cdWave = waveDragAt(t.wave, mach, cl);
  const cdIncrement = memo.cdIncrement;
  const cd = cd0 + cdIncrement + cdInduced + cdWave;
  const buffetCl = memo.buffetCl;
  return {
    cl,
    cd,
    cd0,
    cdIncrement,
    cdInduced,
    cdWave,
    q_Pa,
    drag_N: qS * cd,
    liftToDrag: cl / cd,
    buffetCl,
    // Load factor at which this mass reaches buffet onset here: CLbuffet / CL(1 g).
    buffetLoadFactor: (buffetCl * qS) / weight_N,
    clMax: memo.clMax,
    // With a CDwave(M, CL) table the tables left depend on CL too.
    outsideTables: t.wave.kind === 'table' ? outsideTablesAt(t, mach, cl) : memo.outside,
  };
}

/** dragAt's fields of a flight sample written into `out`: the same steps in the same order (the model's dragSampleInto). */
function dragSampleAt(model: DragPolarModel, memo: MachMemo, altitude_m: number, mach: number, mass_kg: number, loadFactor: number, out: DragSample): void {
  if (!usableQuery(altitude_m, mach, mass_kg, loadFactor)) refuseQuery(altitude_m, mach, mass_kg, loadFactor);
  const pressure_Pa = isaPressureAt(altitude_m);
  if (pressure_Pa !== pressure_Pa) refuseAltitude(altitude_m); // NaN: outside the atmosphere
  const q_Pa = 0.5 * gamma * pressure_Pa * mach * mach;
  const qS = q_Pa * model.wingArea_m2;
  const weight_N = mass_kg * g0;
  const cl = (loadFactor * weight_N) / qS;
  const t = model.tables;
  if (mach !== memo.mach) refreshMachMemo(t, memo, mach, cl);
  const dcl = cl - memo.clMinDrag;
  const cd = memo.cd0 + memo.cdIncrement + memo.k * dcl * dcl + waveDragAt(t.wave, mach, cl);
  out.drag_N = qS * cd;
  out.cl = cl;
  out.clMax = memo.clMax;
  out.buffetLoadFactor = (memo.buffetCl * qS) / weight_N;
  out.liftToDrag = cl / cd;
  out.outsideTables = t.wave.kind === 'table' ? outsideTablesAt(t, mach, cl) : memo.outside;
}

/** dragAt(...).drag_N without the breakdown: the same steps in the same order (drag polar model's dragForce_N). */
function dragForceAt(model: DragPolarModel, memo: MachMemo, altitude_m: number, mach: number, mass_kg: number, loadFactor: number): number {
  if (!usableQuery(altitude_m, mach, mass_kg, loadFactor)) refuseQuery(altitude_m, mach, mass_kg, loadFactor);
  const pressure_Pa = isaPressureAt(altitude_m);
  if (pressure_Pa !== pressure_Pa) refuseAltitude(altitude_m); // NaN: outside the atmosphere
  const qS = 0.5 * gamma * pressure_Pa * mach * mach * model.wingArea_m2;
  const cl = (loadFactor * (mass_kg * g0)) / qS;
  const t = model.tables;
  if (mach !== memo.mach) refreshMachMemo(t, memo, mach, cl);
  const dcl = cl - memo.clMinDrag;
  return qS * (memo.cd0 + memo.cdIncrement + memo.k * dcl * dcl + waveDragAt(t.wave, mach, cl));
}

/** The Mach nodes of the tables the drag reads (CD0, K(M), the wave-drag table), ascending. */
function polarSlopeBreakMachs(tables: PolarTables): number[] {
  const machs = [...tables.cd0.x];
  if (typeof tables.induced !== 'number') machs.push(...tables.induced.x);
  if (tables.wave.kind === 'table') machs.push(...tables.wave.table.x);
  return [...new Set(machs)].sort((a, b) => a - b);
}

function assemble(spec: PolarSpec, tables: PolarTables, wingArea_m2: number): DragPolarModel {
  const memo = newMachMemo(spec);
  const model: DragPolarModel = {
    spec,
    tables,
    wingArea_m2,
    slopeBreakMachs: polarSlopeBreakMachs(tables),
    drag: (query) => dragAt(model, memo, query),
    dragForce_N: (altitude_m, mach, mass_kg, loadFactor) => dragForceAt(model, memo, altitude_m, mach, mass_kg, loadFactor),
    dragSampleInto: (altitude_m, mach, mass_kg, loadFactor, out) => dragSampleAt(model, memo, altitude_m, mach, mass_kg, loadFactor, out),
    withIncrement: (deltaCd0) => {
      requireFinite(deltaCd0, 'deltaCd0');
      const cdIncrement = spec.cdIncrement + deltaCd0;
      const lowest = Math.min(...tables.cd0.y);
      if (lowest + cdIncrement <= 0) {
        throw new RangeError(`drag polar: increment ${deltaCd0} makes CD0 + dCD0 <= 0 (lowest CD0 ${lowest})`);
      }
      return assemble({ ...spec, cdIncrement }, tables, wingArea_m2);
    },
  };
  return model;
}

/**
 * Builds the drag polar model for a wing reference area `wingArea_m2` (> 0).
 * Returns every issue of the spec (validatePolarSpec) or of the area.
 */
export function makeAeroModel(spec: PolarSpec, wingArea_m2: number): Result<DragPolarModel, PolarIssue[]> {
  const checked = validatePolarSpec(spec);
  const issues = checked.ok ? [] : [...checked.error];
  if (!Number.isFinite(wingArea_m2) || wingArea_m2 <= 0) {
    issues.push({ path: 'wingArea_m2', message: `is ${String(wingArea_m2)}, expected a wing area > 0` });
  }
  if (issues.length > 0) return { ok: false, error: issues };
  return { ok: true, value: assemble(spec, buildTables(spec), wingArea_m2) };
}
