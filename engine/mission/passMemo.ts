/**
 * What the passes of one fuel iteration learn about the flights they share, so a later pass need not fly them
 * again: the alternate's descent distance against its mass at the top of descent, and the contingency minimum's
 * hold fuel against the landing mass. Created once per solve (solveMission.ts) and carried in MissionContext;
 * a flight without one flies everything.
 */

/** Values (one per mass, kg) of a smooth function of the mass, from flights already flown. */
export class MassTable {
  private readonly masses: number[] = [];
  private readonly values: number[] = [];

  /** Adds a flown point (ignored unless both are finite). */
  add(mass_kg: number, value: number): void {
    if (!Number.isFinite(mass_kg) || !Number.isFinite(value)) return;
    let i = 0;
    while (i < this.masses.length && this.masses[i] < mass_kg) i++;
    if (i < this.masses.length && Math.abs(this.masses[i] - mass_kg) <= 1e-9 * Math.abs(mass_kg)) {
      this.values[i] = value;
      return;
    }
    this.masses.splice(i, 0, mass_kg);
    this.values.splice(i, 0, value);
  }

  get size(): number {
    return this.masses.length;
  }

  /** The flown point nearest in mass, or null when none. */
  nearest(mass_kg: number): { readonly mass_kg: number; readonly value: number } | null {
    let best = -1;
    for (let i = 0; i < this.masses.length; i++) if (best < 0 || Math.abs(this.masses[i] - mass_kg) < Math.abs(this.masses[best] - mass_kg)) best = i;
    return best < 0 ? null : { mass_kg: this.masses[best], value: this.values[best] };
  }

  /**
   * The value at `mass_kg` by the parabola through the two flown points that bracket it (no more than `maxSpan_kg`
   * apart) and the nearer neighbour outside them that lies at least a tenth of their spacing beyond (the line through
   * the two when there is none); or, when it lies within `maxExtrapolation_kg` outside them, by the parabola through
   * the three outermost points on its side (the line through the two outermost when the third is as close). Null when neither holds: the flight is to be flown.
   */
  at(mass_kg: number, maxSpan_kg: number, maxExtrapolation_kg: number): number | null {
    const m = this.masses;
    const n = m.length;
    if (n < 2 || !Number.isFinite(mass_kg)) return null;
    let hi = 0;
    while (hi < n && m[hi] < mass_kg) hi++;
    if (hi > 0 && hi < n) {
      const lo = hi - 1;
      if (m[hi] - m[lo] > maxSpan_kg) return null;
      // The third point: the nearer neighbour outside the bracket that lies at least a tenth of the bracket's width
      // beyond it (one closer would make the parabola's curvature the difference of two nearly equal slopes, the
      // flights' own rounding magnified); the line when there is none.
      const clear = (i: number) => i >= 0 && i < n && Math.min(Math.abs(m[i] - m[lo]), Math.abs(m[i] - m[hi])) >= 0.1 * (m[hi] - m[lo]);
      const below = lo - 1;
      const above = hi + 1;
      const order = below >= 0 && above < n && m[above] - mass_kg < mass_kg - m[below] ? [above, below] : [below, above];
      const third = order.find(clear);
      return third === undefined ? this.line(lo, hi, mass_kg) : this.parabola(lo, hi, third, mass_kg);
    }
    const [a, b] = hi === 0 ? [0, 1] : [n - 2, n - 1];
    const outside = hi === 0 ? m[0] - mass_kg : mass_kg - m[n - 1];
    if (!(outside <= maxExtrapolation_kg && m[b] - m[a] > 0)) return null;
    // Outside: the parabola through the two nearest and the next point in that lies a tenth of their spacing beyond
    // (the line through the two when there is none).
    const next = hi === 0 ? 2 : n - 3;
    const clear = next >= 0 && next < n && Math.min(Math.abs(m[next] - m[a]), Math.abs(m[next] - m[b])) >= 0.1 * (m[b] - m[a]);
    return clear ? this.parabola(a, b, next, mass_kg) : this.line(a, b, mass_kg);
  }

  private line(a: number, b: number, x: number): number {
    const m = this.masses;
    const v = this.values;
    return v[a] + ((v[b] - v[a]) * (x - m[a])) / (m[b] - m[a]);
  }

  /** Lagrange parabola through three points. */
  private parabola(a: number, b: number, c: number, x: number): number {
    const m = this.masses;
    const v = this.values;
    const la = ((x - m[b]) * (x - m[c])) / ((m[a] - m[b]) * (m[a] - m[c]));
    const lb = ((x - m[a]) * (x - m[c])) / ((m[b] - m[a]) * (m[b] - m[c]));
    const lc = ((x - m[a]) * (x - m[b])) / ((m[c] - m[a]) * (m[c] - m[b]));
    return la * v[a] + lb * v[b] + lc * v[c];
  }
}

export interface PassMemo {
  /** The alternate's descent distance (m, mission's basis) from its cruise altitude, against the mass there (kg). */
  readonly alternateDescent: MassTable;
  /** The contingency minimum's hold fuel (kg) against the mass it starts with (kg). */
  readonly contingencyHold: MassTable;
}

export function createPassMemo(): PassMemo {
  return { alternateDescent: new MassTable(), contingencyHold: new MassTable() };
}
