import { makeAeroModel, polarCoefficients } from '../../../engine/aero/dragPolar';
import type { PolarSpec } from '../../../engine/aero/polarSpec';
import { kornWaveDrag } from '../../../engine/aero/waveDrag';
import { expectOk } from '../../../engine/core/result';
import { interp1d, makeTable1d } from '../../../engine/core/table1d';
import { interp2d, makeTable2d } from '../../../engine/core/table2d';
import { callCounter, type BenchSection } from '../benchTypes';

// An invented polar; queries cycle through a small table so each call differs.
const spec: PolarSpec = {
  cd0: { mach: [0.2, 0.4, 0.6, 0.7, 0.8, 0.85, 0.9], cd0: [0.021, 0.0205, 0.02, 0.0201, 0.0204, 0.0208, 0.0215] },
  cdIncrement: 0.0003,
  induced: { kind: 'oswald', aspectRatio: 9.5, oswaldEfficiency: 0.82 },
  clMinDrag: 0.05,
  compressibility: { kind: 'korn', sweep_rad: 0.47, thicknessRatio: 0.11, kornTechnologyFactor: 0.95 },
  buffetCl: { mach: [0.5, 0.7, 0.85], cl: [0.8, 0.72, 0.55] },
  clMax: { mach: [0.2, 0.6], cl: [1.5, 1.3] },
};
const model = expectOk(makeAeroModel(spec, 122), 'bench polar');
const axis = Array.from({ length: 40 }, (_, i) => i * 0.025);
const table = expectOk(makeTable1d(axis, axis.map((x) => x * x), 'bench'), 'bench table');
const cubic = expectOk(makeTable1d(axis, axis.map((x) => x * x), 'bench', 'monotoneCubic'), 'bench cubic');
const grid = expectOk(
  makeTable2d(axis, axis.slice(0, 10), axis.map((x) => axis.slice(0, 10).map((y) => x * y)), 'bench grid'),
  'bench grid',
);

const next = callCounter();

export const section: BenchSection = {
  title: 'tables and drag polar',
  cases: [
    { name: 'interp1d linear (40 nodes)', run: () => interp1d(table, 0.015 * next(), 'clamp') },
    { name: 'interp1d monotone cubic (40 nodes)', run: () => interp1d(cubic, 0.015 * next(), 'clamp') },
    { name: 'interp2d bilinear (40 x 10)', run: () => interp2d(grid, 0.015 * next(), 0.003 * next(), 'clamp') },
    { name: 'kornWaveDrag', run: () => kornWaveDrag({ sweep_rad: 0.47, thicknessRatio: 0.11, kornTechnologyFactor: 0.95 }, 0.7 + 0.002 * next(), 0.5) },
    { name: 'polarCoefficients (Korn)', run: () => polarCoefficients(model, 0.6 + 0.004 * next(), 0.5) },
    {
      name: 'AeroModel.drag (atmosphere + polar)',
      run: () => model.drag({ altitude_m: 8000 + 50 * next(), mach: 0.78, mass_kg: 60000, loadFactor: 1 }),
    },
  ],
};
