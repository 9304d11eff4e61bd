/** Inlet curves -> rows of Mach with recovery, spillage, throat and fan-face Mach per design. */
import { displayUnit, toDisplay, type UnitSystem } from '../../engine/units';
import type { InletCurves } from '../worker/engineProtocol';
import type { SeriesDef } from './polarSeries';
import { seriesKey } from './seriesKeys';

type Row = Record<string, number | null>;

export interface InletSeries {
  readonly recovery: Row[];
  readonly spillage: Row[];
  readonly internalMach: Row[];
  readonly recoverySeries: SeriesDef[];
  readonly spillageSeries: SeriesDef[];
  readonly machSeries: SeriesDef[];
  readonly spillageUnit: string;
  /** False when no design has throat or fan-face Mach (recovery-table designs have no geometry). */
  readonly hasInternalMach: boolean;
}

/** Rows over the shared Mach axis of the designs (all computed on PLOT_MACHS); spillage per engine in force display units. */
export function inletSeries(inlets: readonly InletCurves[], units: UnitSystem): InletSeries {
  const mach = inlets[0]?.mach ?? [];
  const recovery: Row[] = [];
  const spillage: Row[] = [];
  const internalMach: Row[] = [];
  mach.forEach((m, j) => {
    const r: Row = { mach: m, ref: inlets[0]?.referenceRecovery[j] ?? null };
    const s: Row = { mach: m };
    const t: Row = { mach: m };
    inlets.forEach((inlet, i) => {
      r[seriesKey('r', i)] = inlet.recovery[j] ?? null;
      const spill = inlet.spillageDrag_N[j] ?? null;
      s[seriesKey('s', i)] = spill === null ? null : toDisplay(spill, 'force', units);
      t[seriesKey('t', i)] = inlet.throatMach[j] ?? null;
      t[seriesKey('f', i)] = inlet.fanFaceMach[j] ?? null;
    });
    recovery.push(r);
    spillage.push(s);
    internalMach.push(t);
  });
  return {
    recovery,
    spillage,
    internalMach,
    recoverySeries: [{ key: 'ref', name: 'deck reference', colorIndex: 7 }, ...inlets.map((inlet, i) => ({ key: seriesKey('r', i), name: inlet.name, colorIndex: i }))],
    spillageSeries: inlets.map((inlet, i) => ({ key: seriesKey('s', i), name: inlet.name, colorIndex: i })),
    machSeries: inlets.flatMap((inlet, i) => [
      { key: seriesKey('t', i), name: `${inlet.name} throat`, colorIndex: i },
      { key: seriesKey('f', i), name: `${inlet.name} fan face`, colorIndex: i },
    ]),
    spillageUnit: displayUnit('force', units),
    hasInternalMach: inlets.some((inlet) => inlet.throatMach.some((m) => m !== null) || inlet.fanFaceMach.some((m) => m !== null)),
  };
}
