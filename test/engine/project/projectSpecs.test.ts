import { describe, expect, it } from 'vitest';
import { inletIssuePath, polarIssuePath } from '../../../engine/project/projectSpecs';

describe('projectSpecs issue paths', () => {
  it('polarIssuePath maps table entries to rows of the project file', () => {
    expect(polarIssuePath('cd0.cd0[3]')).toBe('polar.cd0[3].cd0');
    expect(polarIssuePath('buffetCl.mach[1]')).toBe('polar.buffetCl[1].mach');
    expect(polarIssuePath('induced.k[0]')).toBe('polar.induced.rows[0].k');
    expect(polarIssuePath('clMax.cl')).toBe('polar.clMax');
    expect(polarIssuePath('compressibility.sweep_rad')).toBe('polar.compressibility.sweep');
    expect(polarIssuePath('cdIncrement')).toBe('polar.cdIncrement');
  });

  it('inletIssuePath maps design fields to the project names under inlets[i]', () => {
    expect(inletIssuePath(1, 'source.recovery[2]')).toBe('inlets[1].source.rows[2].recovery');
    expect(inletIssuePath(0, 'source.captureArea_m2')).toBe('inlets[0].source.captureArea');
    expect(inletIssuePath(0, 'weight_kg')).toBe('inlets[0].weight');
    expect(inletIssuePath(0, 'lipSuctionFactor')).toBe('inlets[0].lipSuctionFactor');
  });
});
