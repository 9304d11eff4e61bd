import { describe, expect, it } from 'vitest';
import { machFromCas } from '../../../engine/aero/airspeeds';
import { pressureAltitude } from '../../../engine/aero/standardAtmosphere';
import { breakMachs, pathBreakAltitudes, speedBreaks } from '../../../engine/mission/stepBreaks';
import { missionAir } from '../../../engine/mission/missionAtmosphere';
import { expectClose } from '../../support/assertInDelta';
import { demoMissionInput } from './support/demoProject';
import { demoLegs, missionInput } from './support/missionFixtures';

const demo = demoMissionInput();
const FT = 0.3048;

describe('stepBreaks', () => {
  it('breakMachs joins the deck, inlet-recovery and polar Mach nodes of the demo (fixtures/demo)', () => {
    const machs = breakMachs(demo);
    // Demo deck Machs 0.1 ... 0.9 by 0.1; polar CD0 nodes 0.5, 0.7, 0.8, 0.9; recovery rows 0.3, 0.6, 0.8, 0.9.
    expect(machs).toEqual([0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9]);
  });

  it('pathBreakAltitudes holding Mach gives the deck grid altitudes strictly inside the climb', () => {
    // Demo deck altitudes every 5,000 ft to 45,000 ft, then 51,000 ft.
    const got = pathBreakAltitudes(demo, 'mach', 0.75, 9000, 12500);
    expect(got.map((h) => Math.round(h / FT))).toEqual([30000, 35000, 40000]);
  });

  it('pathBreakAltitudes holding CAS adds where the Mach reaches each break Mach (NACA Report 1135 CAS/Mach relation)', () => {
    const cas = (280 * 1852) / 3600;
    const got = pathBreakAltitudes(demo, 'cas', cas, 3048, 9000).filter((h) => Math.abs(h / FT / 5000 - Math.round(h / FT / 5000)) > 1e-6);
    expect(got.length).toBeGreaterThan(0);
    for (const h of got) {
      const mach = machFromCas(cas, missionAir(h, 0).pressure_Pa);
      expectClose(mach, Math.round(mach * 10) / 10, { abs: 1e-9 }, 'Mach at the break altitude is a break Mach');
    }
    // Cross-check one against the standard atmosphere: 280 kt reaches Mach 0.6 where p = qc(280 kt) / ((1 + 0.2 x 0.36)^3.5 - 1).
    const qc = 101325 * ((1 + 0.2 * (cas / 340.294) ** 2) ** 3.5 - 1);
    const p06 = qc / ((1 + 0.2 * 0.36) ** 3.5 - 1);
    const h06 = pressureAltitude(p06);
    expect(h06.ok).toBe(true);
    if (h06.ok) expect(got.some((h) => Math.abs(h - h06.value) < 1e-3)).toBe(true);
  });

  it('speedBreaks gives the TAS of each break Mach inside a speed change, and models without breaks give none', () => {
    expect(speedBreaks(demo, 300, 130, 200)).toEqual([150, 180]);
    const smooth = missionInput({ legs: demoLegs(null), solve: { kind: 'maxRange', payload_kg: 1000 } });
    expect(breakMachs(smooth)).toEqual([]);
    expect(pathBreakAltitudes(smooth, 'cas', 150, 0, 10000)).toEqual([]);
  });
});
