/**
 * The contract between the airframe aerodynamics (drag polar) and its users.
 * SI throughout. See engine/aero/dragPolar.ts for the implementation.
 */
export interface DragQuery {
  /** Pressure altitude (m). */
  readonly altitude_m: number;
  readonly mach: number;
  /** Aircraft mass (kg); lift = loadFactor * mass * g0. */
  readonly mass_kg: number;
  /** Load factor n (-), 1 in level flight. */
  readonly loadFactor: number;
  /** Flight-path angle (rad); lift = n m g cos(gamma) is NOT applied here: callers pass n. */
}

export interface DragBreakdown {
  readonly cl: number;
  /** Total drag coefficient (-). */
  readonly cd: number;
  /** Zero-lift parasite part CD0(M) (-). */
  readonly cd0: number;
  /** Added parasite increments (e.g. the inlet's external drag, user dCD0) (-). */
  readonly cdIncrement: number;
  /** Lift-dependent part K(M)(CL - CLmd)^2 (-). */
  readonly cdInduced: number;
  /** Compressibility (wave) drag (-). */
  readonly cdWave: number;
  /** Dynamic pressure (Pa). */
  readonly q_Pa: number;
  /** Drag force (N). */
  readonly drag_N: number;
  /** Lift-to-drag ratio (-). */
  readonly liftToDrag: number;
  /** Buffet-onset CL at this Mach (-) and the load factor to buffet onset (-). */
  readonly buffetCl: number;
  readonly buffetLoadFactor: number;
  /** Maximum lift coefficient at this Mach (-). */
  readonly clMax: number;
  /** Polar tables this query left and was clamped on ('cd0', 'induced', 'compressibility', 'buffetCl', 'clMax'); empty inside. */
  readonly outsideTables: readonly string[];
}

/** The part of a DragBreakdown a flight sample reads, written into a record the caller keeps (AeroModel.dragSampleInto). */
export interface DragSample {
  drag_N: number;
  cl: number;
  clMax: number;
  buffetLoadFactor: number;
  liftToDrag: number;
  outsideTables: readonly string[];
}

/** An empty DragSample record to write into. */
export function newDragSample(): DragSample {
  return { drag_N: 0, cl: 0, clMax: 0, buffetLoadFactor: 0, liftToDrag: 0, outsideTables: [] };
}

export interface AeroModel {
  readonly wingArea_m2: number;
  drag(query: DragQuery): DragBreakdown;
  /**
   * The drag force (N) of `drag` for a query given as its four numbers (pressure altitude m, Mach, mass kg, load
   * factor), without the breakdown object: the same arithmetic, so the same bits as
   * `drag({ altitude_m, mach, mass_kg, loadFactor }).drag_N`, and the same RangeErrors. For right-hand sides that
   * read only the force (thousands of queries a mission). Optional: ask `drag` of a model without it.
   */
  dragForce_N?(altitude_m: number, mach: number, mass_kg: number, loadFactor: number): number;
  /**
   * `drag`'s fields a flight sample reads (drag force, CL, CLmax, buffet load factor, L/D, tables left) for a query
   * given as its four numbers, written into `out` instead of a new breakdown: the same arithmetic, so the same bits
   * and the same RangeErrors. For the accepted points of the mission's climbs and descents. Optional.
   */
  dragSampleInto?(altitude_m: number, mach: number, mass_kg: number, loadFactor: number, out: DragSample): void;
  /** Machs (-) at which the drag has slope breaks (its tables' nodes), ascending; absent for a smooth polar. Mission climbs and descents end steps there. */
  readonly slopeBreakMachs?: readonly number[];
  /** Same polar with an extra parasite increment (drag counts / 1e4) added. */
  withIncrement(deltaCd0: number): AeroModel;
}
