import { describe, expect, it } from 'vitest';
import { DEFAULT_CAUTION_SETTINGS } from '../../../engine/cautions/cautionSettings';
import { DEMO_ENGINE_SPEC } from '../../../engine/propulsion/deckDemoSpec';
import type { InstallationSettings } from '../../../engine/propulsion/installationCorrections';
import { installedLossBreakdown } from '../../../engine/propulsion/installedLossBreakdown';
import { makeInstalledPropulsion } from '../../../engine/propulsion/installedPropulsion';
import { buildParametricDeck } from '../../../engine/propulsion/parametricDeck';
import { expectClose } from '../../support/assertInDelta';
import { LONG_PITOT, SHORT_INLET } from './inletDesigns';

const deck = buildParametricDeck(DEMO_ENGINE_SPEC);
const installation: InstallationSettings = {
  bleed: { kind: 'massFlow', bleed_kg_s: 0.3, coreFlowFraction: 1 / 5.5 },
  powerExtraction_W: 40e3,
  powerExtractionThrust_N_W: 0.001,
};
const cruise = { altitude_m: 10668, mach: 0.8, isaDev_K: 0 };

describe('installedLossBreakdown', () => {
  it('installedLossBreakdown parts add up to uninstalled minus installed thrust', () => {
    for (const inlet of [LONG_PITOT, SHORT_INLET]) {
      const m = makeInstalledPropulsion({ deck, engineCount: 2, inlet, installation, cautionSettings: DEFAULT_CAUTION_SETTINGS });
      for (const rating of ['maxCruise', 'maxClimb', 'flightIdle'] as const) {
        const e = m.atRating(cruise, rating).perEngine;
        const b = installedLossBreakdown(e);
        expectClose(b.total_N, e.uninstalledThrust_N - e.thrust_N, { rel: 1e-12, abs: 1e-9 }, 'bookkeeping identity');
        expect(b.spillage_N).toBe(e.spillageDrag_N);
        expect(b.extractionLoss_N).toBeCloseTo(40, 12);
        // Raymer's ram correction on the point's own recoveries.
        expectClose(b.recoveryLoss_N, e.uninstalledThrust_N * 1.35 * (e.referenceRecovery - e.recovery), { rel: 1e-14 }, 'Raymer C_ram');
      }
    }
  });

  it('installedLossBreakdown shows the long pitot losing less to recovery and more to spillage than the short inlet', () => {
    const at = (inlet: typeof LONG_PITOT) =>
      installedLossBreakdown(
        makeInstalledPropulsion({ deck, engineCount: 2, inlet, installation, cautionSettings: DEFAULT_CAUTION_SETTINGS }).atRating(cruise, 'maxCruise').perEngine,
      );
    const long = at(LONG_PITOT);
    const short = at(SHORT_INLET);
    expect(long.recoveryLoss_N).toBeLessThan(short.recoveryLoss_N);
    expect(long.spillage_N).toBeGreaterThan(short.spillage_N);
  });
});
