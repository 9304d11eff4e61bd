/**
 * Compressibility (wave) drag from the Korn equation extended to swept wings
 * by simple sweep theory, with Lock's fourth-power drag rise. Published in
 * W. H. Mason, "Transonic Aerodynamics of Airfoils and Wings" (Virginia Tech
 * configuration aerodynamics notes) and in Gur, Mason & Schetz, "Full-
 * configuration drag estimation", J. Aircraft 47(4), 2010:
 *
 *   M_dd   = kappa_A / cos L - (t/c) / cos^2 L - CL / (10 cos^3 L)
 *   M_crit = M_dd - (0.1 / 80)^(1/3)
 *   CD_w   = 20 (M - M_crit)^4   for M > M_crit, else 0
 *
 * M_dd here is the Mach where dCD_w/dM = 0.1 (so CD_w(M_dd) = 20 (0.1/80)^(4/3)
 * = 0.00269). kappa_A is about 0.87 for conventional (NACA 6-series) sections
 * and 0.95 for supercritical sections.
 */

/** The Lock-form offset M_dd - M_crit = (0.1/80)^(1/3) = 0.1077 (-). */
export const LOCK_CRITICAL_OFFSET: number = Math.cbrt(0.1 / 80);

export interface KornWing {
  /** Sweep (rad), usually of the quarter chord; 0 to about 1.2 (70 deg). */
  readonly sweep_rad: number;
  /** Streamwise thickness-to-chord ratio (-). */
  readonly thicknessRatio: number;
  /** Korn airfoil technology factor kappa_A (-). */
  readonly kornTechnologyFactor: number;
}

/**
 * Drag-divergence Mach number (-) by the Korn equation with simple sweep
 * theory (Mason; Gur, Mason & Schetz 2010). `cl` is the wing lift
 * coefficient; its magnitude is used, so a negative CL is treated like the
 * same positive CL. Valid for subsonic transport wings, sweep 0 to ~40 deg,
 * t/c ~0.08 to 0.16, CL 0 to ~0.8.
 */
export function kornDragDivergenceMach(wing: KornWing, cl: number): number {
  const c = Math.cos(wing.sweep_rad);
  return wing.kornTechnologyFactor / c - wing.thicknessRatio / (c * c) - Math.abs(cl) / (10 * c * c * c);
}

/** Critical Mach number (-) from the Korn M_dd: M_crit = M_dd - (0.1/80)^(1/3) (Lock; Gur, Mason & Schetz 2010). */
export function kornCriticalMach(wing: KornWing, cl: number): number {
  return kornDragDivergenceMach(wing, cl) - LOCK_CRITICAL_OFFSET;
}

/**
 * Lock's fourth-power wave drag rise (-): 20 (M - M_crit)^4 above M_crit,
 * 0 below (Gur, Mason & Schetz 2010). Intended up to about M_dd + 0.1;
 * beyond that the rise is an extrapolation.
 */
export function lockWaveDrag(mach: number, criticalMach: number): number {
  const dm = mach - criticalMach;
  return dm > 0 ? 20 * dm * dm * dm * dm : 0;
}

/** Wave drag coefficient (-) of a Korn wing at a Mach and CL: lockWaveDrag(M, kornCriticalMach(wing, CL)). */
export function kornWaveDrag(wing: KornWing, mach: number, cl: number): number {
  return lockWaveDrag(mach, kornCriticalMach(wing, cl));
}

/**
 * The terms of the Korn equation that depend on the wing alone, worked out once: kappa_A / cos L - (t/c) / cos^2 L
 * and the lift term's divisor 10 cos^3 L, in kornDragDivergenceMach's order of operations.
 */
export interface KornTerms {
  readonly wingTerms: number;
  readonly liftDivisor: number;
}

/** The wing's Korn terms (see KornTerms). */
export function kornTerms(wing: KornWing): KornTerms {
  const c = Math.cos(wing.sweep_rad);
  return { wingTerms: wing.kornTechnologyFactor / c - wing.thicknessRatio / (c * c), liftDivisor: 10 * c * c * c };
}

/** kornWaveDrag(wing, mach, cl) from the wing's Korn terms: the same operations in the same order, so the same bits, without a cosine per query. */
export function kornWaveDragOf(terms: KornTerms, mach: number, cl: number): number {
  return lockWaveDrag(mach, terms.wingTerms - Math.abs(cl) / terms.liftDivisor - LOCK_CRITICAL_OFFSET);
}
