/**
 * Machs where the lift coefficient needed at a load factor reaches a lift
 * limit of the polar (CLmax or buffet-onset CL): CL = n m g / (q S) with
 * q = 0.7 p M^2 (NACA Report 1135, eq. 42 form), found by scanning Mach and
 * refining with Brent's method.
 */
import type { AeroModel } from '../aero/aeroModel';
import { rootsOnPoints, uniformGrid } from './scalarSearch';

export interface LiftLimitMachs {
  /** Mach where CL needed falls to the limit (the low-speed limit); null when CL needed is already within the limit at machLo, or never. */
  readonly lowMach: number | null;
  /** Mach above which CL needed exceeds the limit again (high-speed buffet); null when none in range. */
  readonly highMach: number | null;
  /** True when CL needed exceeds the limit over the whole range. */
  readonly exceededEverywhere: boolean;
}

/** Mach tolerance of the lift-limit roots (-). */
export const LIFT_LIMIT_MACH_TOL = 1e-9;

/**
 * Low- and high-speed Machs where n * CL(1 g) = CL limit at an altitude and
 * mass, over [machLo, machHi] (machLo > 0). `limit` picks CLmax (stall) or
 * the buffet-onset CL of the polar (aero/aeroModel.ts DragBreakdown).
 */
export function liftLimitMachs(
  aero: AeroModel,
  query: { readonly altitude_m: number; readonly mass_kg: number; readonly loadFactor: number },
  limit: 'clMax' | 'buffetCl',
  machLo: number,
  machHi: number,
  samples = 120,
): LiftLimitMachs {
  const margin = (mach: number): number => {
    const d = aero.drag({ altitude_m: query.altitude_m, mach, mass_kg: query.mass_kg, loadFactor: query.loadFactor });
    return d[limit] - d.cl;
  };
  const xs = uniformGrid(machLo, machHi, samples);
  const roots = rootsOnPoints(margin, xs, LIFT_LIMIT_MACH_TOL);
  const first = margin(machLo);
  let lowMach: number | null = null;
  let highMach: number | null = null;
  let inside = first >= 0;
  let everInside = inside;
  for (const r of roots) {
    const rising = margin(Math.min(machHi, r + 1e-6)) > 0;
    if (rising && !inside) {
      if (lowMach === null) lowMach = r;
      inside = true;
      everInside = true;
    } else if (!rising && inside) {
      highMach = r;
      inside = false;
    }
  }
  const exceededEverywhere = !everInside;
  return { lowMach, highMach, exceededEverywhere };
}
