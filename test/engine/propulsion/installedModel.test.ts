/**
 * The installed model over a synthetic linear deck reached through the
 * DeckAccess seam, so each figure has a closed form or a scipy value:
 * Raymer's ram-recovery and bleed corrections (Aircraft Design: A
 * Conceptual Approach, installed thrust; coefficients from memory), the
 * geometry inlet and additive drag of test/reference/installationReference.py
 * (numpy/scipy), MIL-E-5008B's standard recovery, and the part-power root of
 * a linear thrust line (closed form).
 */
import { describe, expect, it } from 'vitest';
import { checkThroatMach } from '../../../engine/cautions/checks';
import { DEFAULT_CAUTION_SETTINGS } from '../../../engine/cautions/cautionSettings';
import type { Caution } from '../../../engine/cautions/caution';
import { err, ok } from '../../../engine/core/result';
import { CURVE_FUEL_FLOW, type DeckAccess } from '../../../engine/propulsion/deckAccess';
import type { ReferenceRecovery } from '../../../engine/propulsion/engineDeck';
import type { InletDesign } from '../../../engine/propulsion/inletDesign';
import type { InstallationSettings } from '../../../engine/propulsion/installationCorrections';
import { correctDeckPoint, INSTALLATION_METHODS } from '../../../engine/propulsion/installationMethod';
import { FOR_THRUST_TOLERANCE, makeInstalledModel, type InstalledModelOptions } from '../../../engine/propulsion/installedModel';
import type { FlightCondition, RatingName } from '../../../engine/propulsion/propulsionModel';
import { expectClose } from '../../support/assertInDelta';
import { ref } from './installationReference';

/** Linear invented deck per engine: thrust T0 p (N), fuel flow F0 p (kg/s), airflow M0 (kg/s) at power p in [0.1, 1]. */
const T0 = 40_000;
const F0 = 0.8;
interface LinearDeck {
  readonly airflow_kg_s: number | null;
  readonly ambient: { readonly pressure_Pa: number; readonly temperature_K: number };
  readonly referenceRecovery?: ReferenceRecovery;
  readonly ratings?: Partial<Record<RatingName, number>>;
  readonly refuseAbove?: number;
  readonly cautions?: readonly Caution[];
  readonly withCurve?: boolean;
}

function linearAccess(d: LinearDeck): DeckAccess {
  const ratings: Partial<Record<RatingName, number>> = d.ratings ?? { takeoff: 1, maxClimb: 0.95, maxCruise: 0.9, maxContinuous: 0.95, flightIdle: 0.1 };
  const access: DeckAccess = {
    title: 'Linear test deck (invented)',
    parametric: true,
    hasAirflow: d.airflow_kg_s !== null,
    hasSensitivities: false,
    referenceRecovery: d.referenceRecovery ?? { kind: 'constant', value: 1 },
    lookup: (_c, power) =>
      d.refuseAbove !== undefined && power > d.refuseAbove
        ? err({ code: 'outside_deck', message: `power ${power} beyond the table` })
        : ok({ power, thrust_N: T0 * power, fuelFlow_kg_s: F0 * power, airflow_kg_s: d.airflow_kg_s, sensitivities: null, outside: [], cautions: d.cautions ?? [] }),
    ratingPower: (r) => ratings[r] ?? null,
    powerBounds: () => ({ idle: 0.1, max: 1 }),
    powerForThrust: (_c, thrust_N) => thrust_N / T0,
    ambient: () => ok(d.ambient),
  };
  if (d.withCurve) {
    access.curveAt = () => (power, out) => {
      out[0] = T0 * power;
      out[1] = d.airflow_kg_s ?? Number.NaN;
      out[CURVE_FUEL_FLOW] = F0 * power;
      return true;
    };
  }
  return access;
}

const STRATOSPHERE = { pressure_Pa: 22632.06, temperature_K: 216.65 }; // ICAO standard atmosphere at 11 km (ISO 2533)
const CRUISE: FlightCondition = { altitude_m: 11000, mach: 0.8, isaDev_K: 0 };
const NO_INSTALL: InstallationSettings = { bleed: { kind: 'coreFraction', fraction: 0 }, powerExtraction_W: 0, powerExtractionFuel_kg_s_W: 0 };

function tableInlet(recovery: number, captureArea_m2 = 1): InletDesign {
  return {
    name: `Flat ${recovery}`,
    description: 'Invented flat recovery table.',
    source: { kind: 'recoveryTable', mach: [0, 2], recovery: [recovery, recovery], captureArea_m2 },
    lipSuctionFactor: 0,
    externalDragArea_m2: 0,
    weight_kg: 0,
  };
}

function options(inlet: InletDesign, extra: Partial<InstalledModelOptions> = {}): InstalledModelOptions {
  return { engineCount: 2, inlet, installation: NO_INSTALL, cautionSettings: DEFAULT_CAUTION_SETTINGS, ...extra };
}

describe('installation-correction step', () => {
  it('correctDeckPoint raymerCorrections applies the ram-recovery and bleed losses as Raymer adds them', () => {
    // Raymer, installed thrust: % loss = C_ram (eta_ref - eta) x 100 and C_bleed x bleed ratio x 100; C_ram 1.35, C_bleed 2.0 (from memory).
    const installation: InstallationSettings = { bleed: { kind: 'coreFraction', fraction: 0.04 }, powerExtraction_W: 0, powerExtractionFuel_kg_s_W: 0 };
    const c = correctDeckPoint('raymerCorrections', { thrust_N: 30_000, fuelFlow_kg_s: 0.6, airflow_kg_s: 80 }, { recovery: 0.97, referenceRecovery: 1 }, installation);
    expectClose(c.thrust_N, 30_000 * (1 - 1.35 * 0.03 - 2.0 * 0.04), { rel: 1e-15 }, 'Raymer closed form');
    expect(c.fuelFlow_kg_s).toBe(0.6);
    expect(c.airflow_kg_s).toBe(80);
    expect(c.method).toBe('raymerCorrections');
    expect(INSTALLATION_METHODS[c.method].source).toContain('Raymer');
  });
});

describe('makeInstalledModel point evaluation', () => {
  it('makeInstalledModel atPower on a table inlet gives the Raymer-corrected deck times the engine count', () => {
    // No airflow column: no spillage. Thrust = 2 T0 p (1 - 1.35 (1 - 0.96)) (Raymer, from memory); fuel flow held (deck value).
    const m = makeInstalledModel(linearAccess({ airflow_kg_s: null, ambient: STRATOSPHERE }), options(tableInlet(0.96)));
    const p = m.atPower(CRUISE, 0.7);
    expectClose(p.thrust_N, 2 * T0 * 0.7 * (1 - 1.35 * 0.04), { rel: 1e-14 }, 'Raymer closed form');
    expectClose(p.fuelFlow_kg_s, 2 * F0 * 0.7, { rel: 1e-15 }, 'deck fuel flow held at the power setting');
    expectClose(p.tsfc_kg_N_s!, p.fuelFlow_kg_s / p.thrust_N, { rel: 1e-15 }, 'definition');
    expect(p.perEngine.spillageDrag_N).toBe(0);
    expect(p.cautions.map((c) => c.id)).toEqual(['no_airflow_spillage_skipped']);
  });

  it.each(ref.geometryInlet.map((row, i) => [i, row] as const))(
    'makeInstalledModel on a geometry inlet matches the scipy inlet solution, case %i',
    (_i, row) => {
      // test/reference/installationReference.py (scipy brentq on A/A*, NACA Report 1135 relations).
      // The supersonic row is referred to MIL-E-5008B, the subsonic rows to a constant.
      const reference: ReferenceRecovery = row.mach > 1 ? { kind: 'milE5008b' } : { kind: 'constant', value: row.referenceRecovery };
      const inlet: InletDesign = {
        name: 'Reference geometry',
        description: 'The inlet of installationReference.py',
        source: { kind: 'geometry', captureArea_m2: 10, throatArea_m2: row.throatArea_m2, fanFaceArea_m2: row.fanFaceArea_m2, diffuserLossCoefficient: row.diffuserLossCoefficient },
        lipSuctionFactor: 1,
        externalDragArea_m2: 0,
        weight_kg: 0,
      };
      const access = linearAccess({ airflow_kg_s: row.deckAirflow_kg_s, ambient: { pressure_Pa: row.p0_Pa, temperature_K: row.t0_K }, referenceRecovery: reference });
      const e = makeInstalledModel(access, options(inlet, { cautionSettings: { ...DEFAULT_CAUTION_SETTINGS, maxThroatMach: 1, minFanFaceMach: 0, maxFanFaceMach: 1 } })).atPower(
        { altitude_m: 11000, mach: row.mach, isaDev_K: 0 },
        0.5,
      ).perEngine;
      expectClose(e.referenceRecovery, row.referenceRecovery, { rel: 1e-12 }, 'deck reference (constant or MIL-E-5008B)');
      expectClose(e.recovery, row.recovery, { rel: 1e-9 }, 'scipy recovery');
      expectClose(e.throatMach!, row.throatMach, { rel: 1e-7 }, 'scipy throat Mach');
      expectClose(e.fanFaceMach!, row.fanFaceMach, { rel: 1e-7 }, 'scipy fan-face Mach');
      expectClose(e.airflow_kg_s!, row.airflow_kg_s, { rel: 1e-9 }, 'scipy airflow');
      expectClose(e.massFlowRatio!, row.streamTubeArea_m2 / 10, { rel: 1e-9 }, 'scipy A0 / capture area');
      // Raymer ram-recovery correction on the recovery found (from memory): C_ram 1.35 subsonic, 1.35 - 0.15 (M - 1) above Mach 1
      // (Raymer's supersonic form, on by default since the installation assumptions were made explicit).
      const cRam = row.mach > 1 ? 1.35 - 0.15 * (row.mach - 1) : 1.35;
      expectClose(e.correctedThrust_N, T0 * 0.5 * (1 - cRam * (row.referenceRecovery - row.recovery)), { rel: 1e-9 }, 'Raymer closed form');
    },
  );

  it.each(ref.additiveDrag.filter((r) => r.mach < 1).map((row, i) => [i, row] as const))(
    'makeInstalledModel spillage equals the scipy additive drag at the same mass-flow ratio, case %i',
    (_i, row) => {
      // Sibulkin, NACA Report 1187, 1-D momentum balance (installationReference.py); lip suction 0 so spillage = additive drag.
      const ambient = { pressure_Pa: row.p0_Pa, temperature_K: 216.65 };
      const rho = ambient.pressure_Pa / (287.05287 * ambient.temperature_K); // ICAO Doc 7488/3 gas constant
      const v = row.mach * Math.sqrt(1.4 * 287.05287 * ambient.temperature_K);
      const airflow = row.massFlowRatio * row.captureArea_m2 * rho * v;
      const m = makeInstalledModel(linearAccess({ airflow_kg_s: airflow, ambient }), options(tableInlet(1, row.captureArea_m2)));
      const e = m.atPower({ altitude_m: 11000, mach: row.mach, isaDev_K: 0 }, 1).perEngine;
      expectClose(e.massFlowRatio!, row.massFlowRatio, { rel: 1e-12 }, 'continuity');
      expectClose(e.spillageDrag_N, row.drag_N, { rel: 1e-8 }, 'scipy additive drag');
      expectClose(e.thrust_N, T0 - row.drag_N, { rel: 1e-9 }, 'corrected thrust less spillage');
    },
  );

  it('makeInstalledModel without airflow takes the MIL-E-5008B recovery of a geometry inlet above Mach 1', () => {
    // MIL-E-5008B: eta = 1 - 0.075 (M - 1)^1.35 for 1 < M <= 5; 0.925 at Mach 2 (installationReference.json).
    const inlet: InletDesign = { ...tableInlet(1), source: { kind: 'geometry', captureArea_m2: 1, throatArea_m2: 0.8, fanFaceArea_m2: 1, diffuserLossCoefficient: 0.1 } };
    const at2 = ref.milE5008b.find((r) => r.mach === 2)!;
    const p = makeInstalledModel(linearAccess({ airflow_kg_s: null, ambient: STRATOSPHERE }), options(inlet)).atPower({ ...CRUISE, mach: 2 }, 1);
    expectClose(p.perEngine.recovery, at2.recovery, { rel: 1e-12 }, 'MIL-E-5008B');
    expect(p.perEngine.throatMach).toBeNull();
    expect(p.cautions.find((c) => c.id === 'no_airflow_spillage_skipped')?.message).toContain('diffuser loss');
  });

  it('makeInstalledModel reports a refused deck lookup as zero thrust and fuel flow with a warning, never NaN', () => {
    const m = makeInstalledModel(linearAccess({ airflow_kg_s: 80, ambient: STRATOSPHERE, refuseAbove: 0.5 }), options(tableInlet(0.98)));
    const p = m.atPower(CRUISE, 0.9);
    expect(p.thrust_N).toBe(0);
    expect(p.fuelFlow_kg_s).toBe(0);
    expect(p.tsfc_kg_N_s).toBeNull();
    expect(p.perEngine.recovery).toBe(p.perEngine.referenceRecovery);
    expect(p.cautions[0]).toMatchObject({ id: 'deck_lookup_failed', severity: 'warning' });
    expect(p.cautions[0]!.message).toContain('outside_deck');
  });

  it('makeInstalledModel refuses a caller bug with a thrown error naming the field', () => {
    const access = linearAccess({ airflow_kg_s: 80, ambient: STRATOSPHERE });
    expect(() => makeInstalledModel(access, options(tableInlet(0.98), { engineCount: 0 }))).toThrow(/engineCount/);
    expect(() => makeInstalledModel(access, options(tableInlet(0.98), { installation: { ...NO_INSTALL, cRam: 9 } }))).toThrow(/cRam/);
    const m = makeInstalledModel(access, options(tableInlet(0.98)));
    expect(() => m.atPower({ ...CRUISE, mach: Number.NaN }, 0.5)).toThrow(RangeError);
    expect(() => m.atPower(CRUISE, Number.POSITIVE_INFINITY)).toThrow(RangeError);
  });
});

describe('makeInstalledModel cautions', () => {
  it('throat_mach_high has one builder: the installed point carries the same caution the mission check builds', () => {
    const row = ref.geometryInlet[0]!;
    const inlet: InletDesign = {
      ...tableInlet(1),
      source: { kind: 'geometry', captureArea_m2: 10, throatArea_m2: row.throatArea_m2, fanFaceArea_m2: row.fanFaceArea_m2, diffuserLossCoefficient: row.diffuserLossCoefficient },
    };
    const settings = { ...DEFAULT_CAUTION_SETTINGS, maxThroatMach: 0.5, minFanFaceMach: 0, maxFanFaceMach: 1 };
    const access = linearAccess({ airflow_kg_s: row.deckAirflow_kg_s, ambient: { pressure_Pa: row.p0_Pa, temperature_K: row.t0_K } });
    const p = makeInstalledModel(access, options(inlet, { cautionSettings: settings })).atPower({ ...CRUISE, mach: row.mach }, 0.5);
    const own = p.cautions.find((c) => c.id === 'throat_mach_high');
    // Throat Mach 0.6088 (scipy, installationReference.json) is above the 0.5 limit.
    expect(own).toEqual(checkThroatMach(p.perEngine.throatMach, 0.5));
    expect(own?.value).toBeCloseTo(row.throatMach, 7);
  });

  it('deck_extrapolation passes through only while the setting asks for it; other deck cautions always', () => {
    const cautions: Caution[] = [
      { id: 'deck_extrapolation', severity: 'caution', message: 'outside the Mach range' },
      { id: 'deck_clamped', severity: 'caution', message: 'clamped at the power bound' },
    ];
    const access = linearAccess({ airflow_kg_s: null, ambient: STRATOSPHERE, cautions });
    const shown = makeInstalledModel(access, options(tableInlet(1))).atPower(CRUISE, 0.5);
    expect(shown.cautions.map((c) => c.id)).toEqual(['deck_extrapolation', 'deck_clamped', 'no_airflow_spillage_skipped']);
    const quiet = makeInstalledModel(access, options(tableInlet(1), { cautionSettings: { ...DEFAULT_CAUTION_SETTINGS, cautionOnDeckExtrapolation: false } })).atPower(CRUISE, 0.5);
    expect(quiet.cautions.map((c) => c.id)).toEqual(['deck_clamped', 'no_airflow_spillage_skipped']);
  });

  it('a rating the deck does not name falls back to the deck bound with rating_not_in_deck first', () => {
    const m = makeInstalledModel(linearAccess({ airflow_kg_s: null, ambient: STRATOSPHERE, ratings: { takeoff: 1 } }), options(tableInlet(1)));
    const p = m.atRating(CRUISE, 'flightIdle');
    expect(p.power).toBe(0.1);
    expect(p.cautions[0]).toMatchObject({ id: 'rating_not_in_deck', value: 0.1 });
    expect(p.cautions[0]!.message).toContain('lowest');
    expect(m.atRating(CRUISE, 'takeoff').cautions.map((c) => c.id)).toEqual(['no_airflow_spillage_skipped']);
  });
});

describe('makeInstalledModel forThrust', () => {
  // Linear deck, table inlet 0.97, no spillage (no airflow): installed thrust per engine T0 p k, k = 1 - 1.35 x 0.03 (Raymer, from memory),
  // so the root is p = T / (2 T0 k) in closed form.
  const k = 1 - 1.35 * 0.03;
  it.each([false, true])('forThrust finds the closed-form power of a linear thrust line (fast deck curve: %s)', (withCurve) => {
    const m = makeInstalledModel(linearAccess({ airflow_kg_s: null, ambient: STRATOSPHERE, withCurve }), options(tableInlet(0.97)));
    const required = 2 * T0 * 0.4 * k;
    const p = m.forThrust(CRUISE, required);
    expect(p.limit).toBe('within');
    expect(p.thrustRequired_N).toBe(required);
    expectClose(p.power, 0.4, { rel: 1e-6 }, 'closed form p = T / (2 T0 k)');
    expectClose(p.thrust_N, required, { rel: FOR_THRUST_TOLERANCE }, 'solve tolerance');
  });

  it('forThrust stops at the ceiling rating or flight idle and says which', () => {
    const m = makeInstalledModel(linearAccess({ airflow_kg_s: null, ambient: STRATOSPHERE }), options(tableInlet(0.97)));
    const above = m.forThrust(CRUISE, 2 * T0, 'maxCruise');
    expect(above).toMatchObject({ limit: 'above_rating', power: 0.9 });
    expectClose(above.thrust_N, 2 * T0 * 0.9 * k, { rel: 1e-14 }, 'closed form at the ceiling');
    const below = m.forThrust(CRUISE, 100);
    expect(below).toMatchObject({ limit: 'below_idle', power: 0.1 });
    expectClose(below.thrust_N, 2 * T0 * 0.1 * k, { rel: 1e-14 }, 'closed form at idle');
  });
});
