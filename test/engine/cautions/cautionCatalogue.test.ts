import { describe, expect, it } from 'vitest';
import { CAUTION_CATALOGUE } from '../../../engine/cautions/cautionCatalogue';
import { DEFAULT_CAUTION_SETTINGS } from '../../../engine/cautions/cautionSettings';

describe('cautionCatalogue', () => {
  it('CAUTION_CATALOGUE keys every entry by its own id and names a source for each', () => {
    for (const [key, entry] of Object.entries(CAUTION_CATALOGUE)) {
      expect(entry.id).toBe(key);
      expect(entry.source.length).toBeGreaterThan(10);
      expect(['info', 'caution', 'warning']).toContain(entry.severity);
    }
  });

  it('CAUTION_CATALOGUE defaults agree with DEFAULT_CAUTION_SETTINGS', () => {
    // 300 ft/min = 1.524 m/s (common practice), 1.3 g buffet margin (common practice).
    expect(CAUTION_CATALOGUE.residual_climb_low.defaultThreshold).toBeCloseTo(1.524, 6);
    expect(CAUTION_CATALOGUE.buffet_margin_low.defaultThreshold).toBe(DEFAULT_CAUTION_SETTINGS.minBuffetLoadFactor);
    expect(CAUTION_CATALOGUE.throat_mach_high.defaultThreshold).toBe(DEFAULT_CAUTION_SETTINGS.maxThroatMach);
  });
});
