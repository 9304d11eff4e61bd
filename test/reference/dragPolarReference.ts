import { readFileSync } from 'node:fs';

/**
 * Values computed by test/reference/dragPolarReference.py (numpy/scipy and the
 * published Korn/Lock and 1976-atmosphere formulas), stored as JSON beside it.
 */
export interface DragPolarReference {
  readonly linear: { x: number[]; y: number[]; q: number[]; v: number[] };
  readonly pchip: { x: number[]; y: number[]; q: number[]; v: number[]; endSlopes: number[] };
  readonly bilinear: { x: number[]; y: number[]; z: number[][]; q: number[][]; v: number[] };
  readonly korn: {
    kappa: number;
    sweep_deg: number;
    tc: number;
    cl: number;
    mach: number;
    mdd: number;
    mcrit: number;
    cdw: number;
  }[];
  readonly drag: {
    pressure_Pa: number;
    q_Pa: number;
    cl: number;
    cdWave: number;
    cd: number;
    drag_N: number;
    S: number;
    mass: number;
    mach: number;
    altitude_m: number;
  };
  readonly bestLiftToDrag: { mach: number; cl: number; liftToDrag: number };
}

export const dragPolarReference: DragPolarReference = JSON.parse(
  readFileSync(new URL('./dragPolarReference.json', import.meta.url), 'utf8'),
) as DragPolarReference;
