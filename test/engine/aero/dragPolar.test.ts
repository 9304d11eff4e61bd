import { describe, expect, it } from 'vitest';
import {
  buffetClAt,
  clMaxAt,
  inducedFactor,
  makeAeroModel,
  polarCoefficients,
  type DragPolarModel,
} from '../../../engine/aero/dragPolar';
import { newDragSample } from '../../../engine/aero/aeroModel';
import { dynamicPressure_Pa } from '../../../engine/aero/airspeeds';
import { validatePolarSpec, type PolarSpec } from '../../../engine/aero/polarSpec';
import { atmosphere } from '../../../engine/aero/standardAtmosphere';
import { expectOk } from '../../../engine/core/result';
import { expectClose } from '../../support/assertInDelta';
import { dragPolarReference as ref } from '../../reference/dragPolarReference';

const deg = Math.PI / 180;

/** An invented polar (no real aircraft): parabolic, no wave drag. */
const parabolic: PolarSpec = {
  cd0: { mach: [0.2, 0.9], cd0: [0.02, 0.02] },
  cdIncrement: 0,
  induced: { kind: 'oswald', aspectRatio: 9.5, oswaldEfficiency: 0.82 },
  clMinDrag: 0,
  compressibility: { kind: 'none' },
  buffetCl: { mach: [0.5, 0.7, 0.85], cl: [0.8, 0.72, 0.55] },
  clMax: { mach: [0.2, 0.6], cl: [1.5, 1.3] },
};

/** The same with CLmd, an increment and Korn/Lock wave drag (the python reference's polar). */
const transonic: PolarSpec = {
  ...parabolic,
  cdIncrement: 0.0003,
  clMinDrag: 0.05,
  compressibility: { kind: 'korn', sweep_rad: 27 * deg, thicknessRatio: 0.11, kornTechnologyFactor: 0.95 },
};

function model(spec: PolarSpec, area = 122): DragPolarModel {
  return expectOk(makeAeroModel(spec, area), 'test polar');
}

describe('makeAeroModel', () => {
  it('makeAeroModel takes K from Oswald: K = 1/(pi e AR)', () => {
    // K = 1/(pi e AR): any performance text (Anderson, Aircraft Performance and Design, ch. 2).
    // 1/(pi * 0.82 * 9.5) = 1/24.473 = 0.0408613 (hand computation).
    expectClose(inducedFactor(model(parabolic), 0.5), 1 / (Math.PI * 0.82 * 9.5), { rel: 1e-15 }, 'Oswald K');
    expectClose(inducedFactor(model(parabolic), 0.5), 0.0408613, { abs: 5e-8 }, 'hand computation');
  });

  it('makeAeroModel takes K(M) from a table, clamped and flagged outside it', () => {
    const m = model({ ...parabolic, induced: { kind: 'table', mach: [0.4, 0.8], k: [0.04, 0.05] } });
    expectClose(polarCoefficients(m, 0.6, 0.5).cdInduced, 0.045 * 0.25, { rel: 1e-14 }, 'linear K(M), hand computation');
    const outside = polarCoefficients(m, 0.9, 0.5);
    expectClose(outside.cdInduced, 0.05 * 0.25, { rel: 1e-14 }, 'K held at the table end');
    expect(outside.outsideTables).toEqual(['induced']);
  });

  it('makeAeroModel gives minimum drag at CL = CLmd (scan)', () => {
    // The parabolic polar's minimum is at CLmd (definition; Anderson, Aircraft Performance and Design).
    const m = model({ ...parabolic, clMinDrag: 0.12 });
    let best = { cl: Number.NaN, cd: Number.POSITIVE_INFINITY };
    for (let cl = -0.5; cl <= 1; cl += 1e-4) {
      const cd = polarCoefficients(m, 0.5, cl).cd;
      if (cd < best.cd) best = { cl, cd };
    }
    expectClose(best.cl, 0.12, { abs: 1e-4 }, 'CLmd');
    expectClose(best.cd, 0.02, { abs: 1e-12 }, 'CD at CLmd = CD0');
  });

  it('makeAeroModel gives (L/D)max = 1/(2 sqrt(K CD0)) at CL = sqrt(CD0/K) for the parabolic polar (scan)', () => {
    // Anderson, Aircraft Performance and Design, ch. 5: (L/D)max = 1/sqrt(4 CD0 K), CL* = sqrt(CD0/K).
    const m = model(parabolic);
    const k = 1 / (Math.PI * 0.82 * 9.5);
    let best = { cl: 0, ld: 0 };
    for (let cl = 0.1; cl <= 1.5; cl += 1e-5) {
      const ld = cl / polarCoefficients(m, 0.5, cl).cd;
      if (ld > best.ld) best = { cl, ld };
    }
    expectClose(best.ld, 1 / (2 * Math.sqrt(k * 0.02)), { rel: 1e-9 }, '(L/D)max, Anderson');
    expectClose(best.cl, Math.sqrt(0.02 / k), { abs: 2e-5 }, 'CL for (L/D)max, Anderson');
  });

  it('makeAeroModel with Korn wave drag finds the same best L/D as scipy', () => {
    // Reference: scipy.optimize.minimize_scalar on CD/CL, test/reference/dragPolarReference.py.
    const m = model(transonic);
    let best = { cl: 0, ld: 0 };
    for (let cl = 0.3; cl <= 1.0; cl += 1e-5) {
      const ld = cl / polarCoefficients(m, ref.bestLiftToDrag.mach, cl).cd;
      if (ld > best.ld) best = { cl, ld };
    }
    expectClose(best.ld, ref.bestLiftToDrag.liftToDrag, { rel: 1e-8 }, 'scipy minimize_scalar');
    expectClose(best.cl, ref.bestLiftToDrag.cl, { abs: 2e-5 }, 'scipy minimize_scalar');
  });

  it('makeAeroModel refuses a bad spec with every issue and its field path', () => {
    const bad: PolarSpec = {
      ...parabolic,
      cd0: { mach: [0.2, 0.5, 0.4], cd0: [0.02, 0.02, 0.02] },
      induced: { kind: 'oswald', aspectRatio: 9.5, oswaldEfficiency: 1.4 },
      buffetCl: { mach: [0.5, 0.7], cl: [0.8, Number.NaN] },
    };
    const r = makeAeroModel(bad, -3);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      const paths = r.error.map((i) => i.path);
      expect(paths).toEqual(['cd0.mach[2]', 'induced.oswaldEfficiency', 'buffetCl.cl[1]', 'wingArea_m2']);
      expect(r.error[1]!.message).toContain('1.4');
      expect(r.error[2]!.message).toContain('NaN');
    }
  });
});

describe('validatePolarSpec', () => {
  it('validatePolarSpec accepts the demo polars', () => {
    expect(validatePolarSpec(parabolic).ok).toBe(true);
    expect(validatePolarSpec(transonic).ok).toBe(true);
  });

  it('validatePolarSpec refuses CD0 <= 0, a negative Mach and an increment that makes parasite drag vanish', () => {
    const r = validatePolarSpec({ ...parabolic, cd0: { mach: [-0.1, 0.5], cd0: [0.02, 0] }, cdIncrement: -0.03 });
    expect(r.ok ? [] : r.error.map((i) => i.path)).toEqual(['cd0.mach[0]', 'cd0.cd0[1]', 'cdIncrement']);
  });

  it('validatePolarSpec refuses Korn parameters out of range, naming each', () => {
    const r = validatePolarSpec({
      ...parabolic,
      compressibility: { kind: 'korn', sweep_rad: 80 * deg, thicknessRatio: 0, kornTechnologyFactor: Number.NaN },
    });
    expect(r.ok ? [] : r.error.map((i) => i.path)).toEqual([
      'compressibility.sweep_rad',
      'compressibility.thicknessRatio',
      'compressibility.kornTechnologyFactor',
    ]);
  });

  it('validatePolarSpec refuses a ragged or negative wave-drag table, naming the row', () => {
    const ragged = validatePolarSpec({
      ...parabolic,
      compressibility: { kind: 'table', mach: [0.7, 0.8], cl: [0, 0.5], cdWave: [[0, 0], [0.001]] },
    });
    expect(ragged.ok ? [] : ragged.error.map((i) => i.path)).toEqual(['compressibility.cdWave[1]']);
    const negative = validatePolarSpec({
      ...parabolic,
      compressibility: { kind: 'table', mach: [0.7, 0.8], cl: [0, 0.5], cdWave: [[0, 0], [0.001, -0.002]] },
    });
    expect(negative.ok ? [] : negative.error.map((i) => i.path)).toEqual(['compressibility.cdWave[1][1]']);
  });

  it('validatePolarSpec refuses an unknown induced or compressibility kind', () => {
    const r = validatePolarSpec({
      ...parabolic,
      induced: { kind: 'quadratic' } as unknown as PolarSpec['induced'],
      compressibility: { kind: 'magic' } as unknown as PolarSpec['compressibility'],
    });
    expect(r.ok ? [] : r.error.map((i) => i.path)).toEqual(['induced.kind', 'compressibility.kind']);
  });

  it('validatePolarSpec refuses an unequal CLmax table and an empty induced table', () => {
    const r = validatePolarSpec({
      ...parabolic,
      clMax: { mach: [0.2, 0.6], cl: [1.5] },
      induced: { kind: 'table', mach: [], k: [] },
    });
    expect(r.ok ? [] : r.error.map((i) => i.path)).toEqual(['induced.mach', 'clMax.cl']);
  });
});

describe('polarCoefficients', () => {
  it('polarCoefficients sums CD0 + dCD0 + K (CL - CLmd)^2 + CDwave', () => {
    const m = model(transonic);
    const c = polarCoefficients(m, 0.78, 0.5);
    const k = 1 / (Math.PI * 0.82 * 9.5);
    expectClose(c.cdInduced, k * 0.45 * 0.45, { rel: 1e-14 }, 'K (CL - CLmd)^2, hand computation');
    expect(c.cd).toBe(c.cd0 + c.cdIncrement + c.cdInduced + c.cdWave);
    expect(c.cdIncrement).toBe(0.0003);
    expect(c.outsideTables).toEqual([]);
  });

  it('polarCoefficients clamps CD0 outside its Mach table and says so', () => {
    const m = model({ ...parabolic, cd0: { mach: [0.3, 0.8], cd0: [0.021, 0.024] } });
    const low = polarCoefficients(m, 0.1, 0.3);
    expect(low.cd0).toBe(0.021);
    expect(low.outsideTables).toEqual(['cd0']);
    expect(polarCoefficients(m, 0.95, 0.3).cd0).toBe(0.024);
  });

  it('polarCoefficients reads a wave-drag table bilinearly and flags a CL beyond it', () => {
    const m = model({
      ...parabolic,
      compressibility: { kind: 'table', mach: ref.bilinear.x, cl: ref.bilinear.y, cdWave: ref.bilinear.z },
    });
    // scipy RegularGridInterpolator value at (0.75, 0.45), test/reference/dragPolarReference.py.
    expectClose(polarCoefficients(m, 0.75, 0.45).cdWave, ref.bilinear.v[1]!, { rel: 1e-12 }, 'scipy RegularGridInterpolator');
    const beyond = polarCoefficients(m, 0.8, 0.9);
    expect(beyond.cdWave).toBe(0.003);
    expect(beyond.outsideTables).toEqual(['compressibility']);
  });

  it('polarCoefficients on a spec equals polarCoefficients on its model', () => {
    expect(polarCoefficients(transonic, 0.8, 0.55)).toEqual(polarCoefficients(model(transonic), 0.8, 0.55));
  });

  it('polarCoefficients throws on an invalid spec, naming the field', () => {
    const bad: PolarSpec = { ...parabolic, induced: { kind: 'oswald', aspectRatio: 0, oswaldEfficiency: 0.8 } };
    expect(() => polarCoefficients(bad, 0.5, 0.5)).toThrow(/induced\.aspectRatio/);
  });

  it('polarCoefficients throws for a NaN or negative Mach (a caller bug)', () => {
    expect(() => polarCoefficients(model(parabolic), Number.NaN, 0.5)).toThrow(/Mach is NaN/);
    expect(() => polarCoefficients(model(parabolic), -0.1, 0.5)).toThrow(/Mach/);
    expect(() => polarCoefficients(model(parabolic), 0.5, Number.POSITIVE_INFINITY)).toThrow(/CL/);
  });
});

describe('AeroModel.drag', () => {
  it('drag at 62 t, 11 000 m, M 0.78 matches a hand computation on the 1976 atmosphere', () => {
    // p(11 km geopotential) = 22632 Pa: U.S. Standard Atmosphere 1976, Table I.
    // q = (gamma/2) p M^2 (NACA Report 1135); CL = m g0 / (q S); drag from the polar.
    // Reference: test/reference/dragPolarReference.py.
    const d = ref.drag;
    const b = model(transonic, d.S).drag({ altitude_m: d.altitude_m, mach: d.mach, mass_kg: d.mass, loadFactor: 1 });
    expectClose(d.pressure_Pa, 22632, { abs: 0.5 }, '1976 table, 11 km');
    expectClose(b.q_Pa, 0.7 * 22632.06 * 0.78 * 0.78, { rel: 1e-6 }, 'q = 0.7 p M^2, 1976 pressure');
    expectClose(b.q_Pa, d.q_Pa, { rel: 1e-6 }, 'python reference');
    expectClose(b.cl, d.cl, { rel: 1e-6 }, 'python reference');
    expectClose(b.cdWave, d.cdWave, { rel: 1e-4 }, 'python reference');
    expectClose(b.cd, d.cd, { rel: 1e-6 }, 'python reference');
    expectClose(b.drag_N, d.drag_N, { rel: 1e-6 }, 'python reference');
    expectClose(b.liftToDrag, d.cl / d.cd, { rel: 1e-6 }, 'L/D = CL/CD');
    // Only the CLmax table (to M 0.6) is left; the drag tables cover M 0.78.
    expect(b.outsideTables).toEqual(['clMax']);
  });

  it('drag uses the same dynamic pressure as the airspeed module at every altitude', () => {
    // q = 0.7 p M^2 (NACA Report 1135) via engine/aero/airspeeds.ts on the shared atmosphere.
    const m = model(parabolic);
    for (const altitude_m of [-500, 0, 5000, 11000, 15000]) {
      const p = expectOk(atmosphere(altitude_m), 'atmosphere').pressure_Pa;
      const b = m.drag({ altitude_m, mach: 0.6, mass_kg: 50000, loadFactor: 1 });
      expectClose(b.q_Pa, dynamicPressure_Pa(0.6, p), { rel: 1e-14 }, 'airspeeds.dynamicPressure_Pa');
      expectClose(b.cl, (50000 * 9.80665) / (b.q_Pa * 122), { rel: 1e-14 }, 'CL = m g0 / (q S), g0 = 9.80665 m/s^2 exact');
    }
  });

  it('drag reports buffet CL, CLmax and the load factor to buffet onset = CLbuffet / CL(1 g)', () => {
    // n_buffet = CL_buffet(M) / CL at 1 g (common practice).
    const m = model(parabolic);
    const level = m.drag({ altitude_m: 11000, mach: 0.78, mass_kg: 62000, loadFactor: 1 });
    const turning = m.drag({ altitude_m: 11000, mach: 0.78, mass_kg: 62000, loadFactor: 1.3 });
    const buffetCl = 0.72 + (0.08 / 0.15) * (0.55 - 0.72);
    expectClose(level.buffetCl, buffetCl, { rel: 1e-14 }, 'buffet table, hand computation');
    expectClose(level.buffetLoadFactor, buffetCl / level.cl, { rel: 1e-12 }, 'CLbuffet / CL(1 g)');
    expectClose(turning.buffetLoadFactor, level.buffetLoadFactor, { rel: 1e-12 }, 'independent of the query load factor');
    expectClose(turning.cl, 1.3 * level.cl, { rel: 1e-14 }, 'CL = n m g0 / (q S)');
    expect(level.clMax).toBe(1.3);
    expect(level.outsideTables).toEqual(['clMax']);
    expect(clMaxAt(m, 0.4)).toBe(1.4);
    expect(buffetClAt(m, 0.5)).toBe(0.8);
  });

  it('drag at a negative load factor uses |CL| for wave drag and keeps the induced term positive', () => {
    const m = model(transonic);
    const up = m.drag({ altitude_m: 11000, mach: 0.82, mass_kg: 62000, loadFactor: 1 });
    const down = m.drag({ altitude_m: 11000, mach: 0.82, mass_kg: 62000, loadFactor: -1 });
    expect(down.cl).toBe(-up.cl);
    expect(down.cdWave).toBe(up.cdWave);
    expect(down.cdInduced).toBeGreaterThan(up.cdInduced);
  });

  it('drag throws a clear RangeError outside the atmosphere or for a non-lifting query', () => {
    const m = model(parabolic);
    expect(() => m.drag({ altitude_m: 90000, mach: 0.8, mass_kg: 60000, loadFactor: 1 })).toThrow(/drag polar: .*90000/);
    expect(() => m.drag({ altitude_m: 10000, mach: 0, mass_kg: 60000, loadFactor: 1 })).toThrow(/Mach is 0/);
    expect(() => m.drag({ altitude_m: 10000, mach: 0.8, mass_kg: 0, loadFactor: 1 })).toThrow(/mass_kg is 0/);
    expect(() => m.drag({ altitude_m: Number.NaN, mach: 0.8, mass_kg: 1, loadFactor: 1 })).toThrow(/altitude_m is NaN/);
    // dragForce_N refuses the same queries with the same messages.
    for (const [h, mach, mass, n] of [[90000, 0.8, 60000, 1], [10000, 0, 60000, 1], [10000, 0.8, 0, 1], [Number.NaN, 0.8, 1, 1], [10000, 0.8, 1, Number.POSITIVE_INFINITY], [10000, -0.3, Number.NaN, 1]] as const) {
      let message = '';
      try {
        m.drag({ altitude_m: h, mach, mass_kg: mass, loadFactor: n });
      } catch (e) {
        message = (e as Error).message;
      }
      expect(message).toMatch(/^drag polar: /);
      expect(() => m.dragForce_N!(h, mach, mass, n)).toThrow(new RangeError(message));
      expect(() => m.dragSampleInto!(h, mach, mass, n, newDragSample())).toThrow(new RangeError(message));
    }
  });

  it('drag on a descending CD0 Mach axis equals drag on the ascending one', () => {
    const asc = model({ ...parabolic, cd0: { mach: [0.3, 0.6, 0.8], cd0: [0.021, 0.02, 0.023] } });
    const desc = model({ ...parabolic, cd0: { mach: [0.8, 0.6, 0.3], cd0: [0.023, 0.02, 0.021] } });
    const q = { altitude_m: 9000, mach: 0.7, mass_kg: 55000, loadFactor: 1 };
    expect(desc.drag(q).cd).toBe(asc.drag(q).cd);
  });
});

describe('AeroModel.withIncrement', () => {
  it('withIncrement adds dCD0 to every drag and leaves the original model unchanged', () => {
    const m = model(transonic);
    const q = { altitude_m: 10000, mach: 0.78, mass_kg: 60000, loadFactor: 1 };
    const plusTen = m.withIncrement(0.001);
    const before = m.drag(q);
    const after = plusTen.drag(q);
    expectClose(after.cd - before.cd, 0.001, { abs: 1e-15 }, '10 drag counts');
    expectClose(after.drag_N - before.drag_N, before.q_Pa * 122 * 0.001, { rel: 1e-9 }, 'dD = q S dCD0');
    expect(after.cdIncrement).toBe(0.0013);
    expect(m.drag(q).cd).toBe(before.cd);
    expect(m.spec.cdIncrement).toBe(0.0003);
    expect(plusTen.withIncrement(-0.001).drag(q).cd).toBeCloseTo(before.cd, 15);
  });

  it('withIncrement throws for a non-finite increment or one that removes all parasite drag', () => {
    const m = model(parabolic);
    expect(() => m.withIncrement(Number.NaN)).toThrow(/deltaCd0 is NaN/);
    expect(() => m.withIncrement(-0.02)).toThrow(/CD0 \+ dCD0 <= 0/);
  });
});

describe('drag query without intermediate objects', () => {
  // The hot-path drag (isaPressureAt, clampedValue) must give the very numbers of the general path: the 1976
  // standard atmosphere's pressure (U.S. Standard Atmosphere 1976, via atmosphere()) and polarCoefficients.
  const tabled: PolarSpec = {
    ...transonic,
    cd0: { mach: [0.3, 0.6, 0.8], cd0: [0.021, 0.0205, 0.0212] },
    induced: { kind: 'table', mach: [0.3, 0.85], k: [0.041, 0.046] },
    compressibility: { kind: 'table', mach: [0.6, 0.8, 0.9], cl: [0.2, 0.6], cdWave: [[0, 0], [0.0004, 0.0012], [0.004, 0.009]] },
  };
  for (const [name, spec] of [['Korn wave drag', transonic], ['tabled', tabled]] as const) {
    it(`${name}: drag, CL, CD parts, buffet and CLmax equal the general path exactly, inside and outside every table`, () => {
      const m = model(spec);
      for (const alt of [-4000, 0, 3048, 11000, 12500, 20100]) {
        for (const mach of [0.1, 0.3, 0.45, 0.6, 0.78, 0.8, 0.86, 0.95]) {
          for (const mass of [20000, 60000, 140000]) {
            const d = m.drag({ altitude_m: alt, mach, mass_kg: mass, loadFactor: 1.1 });
            const p = expectOk(atmosphere(alt), 'atmosphere').pressure_Pa;
            const q = dynamicPressure_Pa(mach, p);
            const cl = (1.1 * (mass * 9.80665)) / (q * 122); // the same association as the old general path
            const c = polarCoefficients(m, mach, cl);
            expect(d.q_Pa).toBe(q);
            expect(d.cl).toBe(cl);
            expect([d.cd, d.cd0, d.cdInduced, d.cdWave, d.cdIncrement]).toEqual([c.cd, c.cd0, c.cdInduced, c.cdWave, c.cdIncrement]);
            expect(d.drag_N).toBe(q * 122 * c.cd);
            expect(Object.is(m.dragForce_N!(alt, mach, mass, 1.1), d.drag_N)).toBe(true);
            expect(Object.is(m.withIncrement(0.0013).dragForce_N!(alt, mach, mass, 1.1), m.withIncrement(0.0013).drag({ altitude_m: alt, mach, mass_kg: mass, loadFactor: 1.1 }).drag_N)).toBe(true);
            // dragSampleInto writes the very fields of the breakdown a flight sample reads.
            const sample = newDragSample();
            m.dragSampleInto!(alt, mach, mass, 1.1, sample);
            expect(sample).toStrictEqual({ drag_N: d.drag_N, cl: d.cl, clMax: d.clMax, buffetLoadFactor: d.buffetLoadFactor, liftToDrag: d.liftToDrag, outsideTables: d.outsideTables });
            expect(d.buffetCl).toBe(buffetClAt(m, mach));
            expect(d.clMax).toBe(clMaxAt(m, mach));
            const expectedOutside = [...c.outsideTables];
            if (mach < spec.buffetCl.mach[0]! || mach > spec.buffetCl.mach.at(-1)!) expectedOutside.push('buffetCl');
            if (mach < spec.clMax.mach[0]! || mach > spec.clMax.mach.at(-1)!) expectedOutside.push('clMax');
            expect(d.outsideTables).toEqual(expectedOutside);
          }
        }
      }
    });
  }

  it('keeps the Mach tables of the last Mach only: a query at a Mach after another equals the query on a fresh model', () => {
    // The drag keeps CD0, K, buffet CL, CLmax and the tables left for the last Mach asked (pure functions of it);
    // the same queries in an order that changes the Mach at every call, and repeating it, must give the answers
    // of a model that never saw another query (the general path's numbers, checked against polarCoefficients above).
    for (const spec of [transonic, tabled]) {
      const shared = model(spec);
      const queries = [0.45, 0.45, 0.95, 0.1, 0.45, 0.8, 0.8, 0.3, 0.95].flatMap((mach, i) => [
        { altitude_m: 11000, mach, mass_kg: 40000 + 1000 * i, loadFactor: 1 },
        { altitude_m: 3048, mach, mass_kg: 90000, loadFactor: 1.2 },
      ]);
      for (const query of queries) expect(shared.drag(query)).toEqual(model(spec).drag(query));
    }
  });

  it('refuses an altitude outside the standard atmosphere with its message', () => {
    expect(() => model(transonic).drag({ altitude_m: 80000, mach: 0.5, mass_kg: 50000, loadFactor: 1 })).toThrow(/outside the standard atmosphere's range/);
  });
});
