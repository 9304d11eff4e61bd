/**
 * An inlet design in SI: where its total-pressure recovery comes from (a
 * table against flight Mach, or 1-D geometry), its capture area for the
 * spillage (additive) drag, its lip-suction factor, and the airframe
 * increments it brings (external drag area, weight). See docs/installation.md.
 */

import { prepareLipSuction, type LipSuction } from './lipSuction';

/** Recovery tabulated against flight Mach (linear interpolation, end values held with a caution). */
export interface RecoveryTableSource {
  readonly kind: 'recoveryTable';
  /** Flight Mach axis (-), strictly increasing, >= 0. */
  readonly mach: readonly number[];
  /** Total-pressure recovery pt2/pt0 (-) at each Mach, in (0, 1]. */
  readonly recovery: readonly number[];
  /** Capture (highlight) area (m^2), for the mass-flow ratio and spillage drag. */
  readonly captureArea_m2: number;
}

/** Recovery from 1-D geometry: lossless to the throat, diffuser loss K_d q_throat after it. */
export interface GeometrySource {
  readonly kind: 'geometry';
  /** Capture (highlight) area (m^2). */
  readonly captureArea_m2: number;
  /** Throat (minimum) area (m^2), <= capture area. */
  readonly throatArea_m2: number;
  /** Fan-face (engine face) area (m^2), net of the spinner. */
  readonly fanFaceArea_m2: number;
  /** Diffuser total-pressure loss as a multiple of throat dynamic pressure (-), >= 0. */
  readonly diffuserLossCoefficient: number;
}

export type InletSource = RecoveryTableSource | GeometrySource;

export interface InletDesign {
  readonly name: string;
  readonly description: string;
  readonly source: InletSource;
  /** Fraction of the additive drag recovered by lip suction (-), 0..1; used when `lipSuction` is absent. */
  readonly lipSuctionFactor: number;
  /** Lip suction over flight Mach and mass-flow ratio (lipSuction.ts); when present it replaces `lipSuctionFactor`. */
  readonly lipSuction?: LipSuction;
  /** Nacelle/inlet external drag as D/q per engine (m^2); an airframe increment. */
  readonly externalDragArea_m2: number;
  /** Inlet/nacelle weight per engine (kg), added to the operating empty mass. */
  readonly weight_kg: number;
}

/** One problem with an inlet design: the field path and what is wrong. */
export interface InletDesignIssue {
  /** Dotted path from the design, e.g. `source.recovery[3]`. */
  readonly path: string;
  readonly message: string;
}

function finiteIssue(issues: InletDesignIssue[], path: string, value: number, what: string): boolean {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    issues.push({ path, message: `${path} is ${String(value)}, expected ${what}` });
    return false;
  }
  return true;
}

function positive(issues: InletDesignIssue[], path: string, value: number, unit: string): void {
  if (finiteIssue(issues, path, value, `a positive number (${unit})`) && value <= 0) {
    issues.push({ path, message: `${path} is ${value} ${unit}, expected a positive number` });
  }
}

function nonNegative(issues: InletDesignIssue[], path: string, value: number, unit: string): void {
  if (finiteIssue(issues, path, value, `a number >= 0 (${unit})`) && value < 0) {
    issues.push({ path, message: `${path} is ${value} ${unit}, expected a number >= 0` });
  }
}

/**
 * Checks an inlet design; returns every issue found with its field path
 * (empty when the design is usable).
 */
export function validateInletDesign(design: InletDesign): readonly InletDesignIssue[] {
  const issues: InletDesignIssue[] = [];
  if (typeof design.name !== 'string' || design.name.trim() === '') {
    issues.push({ path: 'name', message: 'name is empty, expected a name for the inlet design' });
  }
  if (finiteIssue(issues, 'lipSuctionFactor', design.lipSuctionFactor, 'a fraction 0..1')) {
    if (design.lipSuctionFactor < 0 || design.lipSuctionFactor > 1) {
      issues.push({ path: 'lipSuctionFactor', message: `lipSuctionFactor is ${design.lipSuctionFactor}, expected a fraction 0..1` });
    }
  }
  if (design.lipSuction !== undefined) {
    const lip = prepareLipSuction(design.lipSuction);
    if (!lip.ok) for (const i of lip.error) issues.push({ path: `lipSuction.${i.path}`, message: i.message });
  }
  nonNegative(issues, 'externalDragArea_m2', design.externalDragArea_m2, 'm^2');
  nonNegative(issues, 'weight_kg', design.weight_kg, 'kg');
  const source = design.source;
  if (source.kind === 'recoveryTable') {
    positive(issues, 'source.captureArea_m2', source.captureArea_m2, 'm^2');
    const n = source.mach.length;
    if (n === 0) {
      issues.push({ path: 'source.mach', message: 'source.mach is empty, expected at least one Mach number' });
    }
    if (source.recovery.length !== n) {
      issues.push({
        path: 'source.recovery',
        message: `source.recovery has ${source.recovery.length} values but source.mach has ${n}`,
      });
    }
    for (let i = 0; i < n; i++) {
      const path = `source.mach[${i}]`;
      const m = source.mach[i]!;
      if (!finiteIssue(issues, path, m, 'a Mach number >= 0')) continue;
      if (m < 0) issues.push({ path, message: `${path} is ${m}, expected a Mach number >= 0` });
      if (i > 0 && Number.isFinite(source.mach[i - 1]) && m <= source.mach[i - 1]!) {
        issues.push({ path, message: `${path} is ${m} after ${source.mach[i - 1]}, expected strictly increasing Mach` });
      }
    }
    for (let i = 0; i < source.recovery.length; i++) {
      const path = `source.recovery[${i}]`;
      const r = source.recovery[i]!;
      if (finiteIssue(issues, path, r, 'a recovery in (0, 1]') && (r <= 0 || r > 1)) {
        issues.push({ path, message: `${path} is ${r}, expected a recovery in (0, 1]` });
      }
    }
  } else if (source.kind === 'geometry') {
    positive(issues, 'source.captureArea_m2', source.captureArea_m2, 'm^2');
    positive(issues, 'source.throatArea_m2', source.throatArea_m2, 'm^2');
    positive(issues, 'source.fanFaceArea_m2', source.fanFaceArea_m2, 'm^2');
    nonNegative(issues, 'source.diffuserLossCoefficient', source.diffuserLossCoefficient, '(-)');
    if (source.diffuserLossCoefficient >= 1) {
      issues.push({
        path: 'source.diffuserLossCoefficient',
        message: `source.diffuserLossCoefficient is ${source.diffuserLossCoefficient}, expected less than 1 (a fraction of the throat dynamic pressure)`,
      });
    }
    if (source.throatArea_m2 > source.captureArea_m2) {
      issues.push({
        path: 'source.throatArea_m2',
        message: `source.throatArea_m2 is ${source.throatArea_m2} m^2, larger than the capture area ${source.captureArea_m2} m^2`,
      });
    }
    if (source.throatArea_m2 > source.fanFaceArea_m2) {
      issues.push({
        path: 'source.throatArea_m2',
        message: `source.throatArea_m2 is ${source.throatArea_m2} m^2, larger than the fan-face area ${source.fanFaceArea_m2} m^2 (a diffuser widens)`,
      });
    }
  } else {
    issues.push({ path: 'source.kind', message: `source.kind is ${String((source as { kind: unknown }).kind)}, expected 'recoveryTable' or 'geometry'` });
  }
  return issues;
}

/** Capture (highlight) area of a design (m^2). */
export function inletCaptureArea(design: InletDesign): number {
  return design.source.captureArea_m2;
}

/**
 * Airframe parasite increment of the inlets/nacelles (-):
 * dCD0 = externalDragArea_m2 * engineCount / wingArea_m2 (definition of D/q).
 */
export function inletDragIncrementCd0(inlet: InletDesign, engineCount: number, wingArea_m2: number): number {
  if (!(wingArea_m2 > 0) || !(engineCount >= 1)) {
    throw new RangeError(`inletDragIncrementCd0: wing area ${wingArea_m2} m^2 and engine count ${engineCount} must be positive`);
  }
  return (inlet.externalDragArea_m2 * engineCount) / wingArea_m2;
}

/** Weight the inlets add to the operating empty mass, all engines (kg). */
export function inletWeight(inlet: InletDesign, engineCount: number): number {
  return inlet.weight_kg * engineCount;
}
