import { describe, expect, it } from 'vitest';
import { DEFAULT_CAUTION_SETTINGS, type CautionSettings } from '../../../engine/cautions/cautionSettings';
import { expectOk } from '../../../engine/core/result';
import { CURVE_FUEL_FLOW, CURVE_VALUES } from '../../../engine/propulsion/deckAccess';
import { lookupDeck } from '../../../engine/propulsion/deckLookup';
import { DEMO_ENGINE_SPEC } from '../../../engine/propulsion/deckDemoSpec';
import type { EngineDeck } from '../../../engine/propulsion/engineDeck';
import type { InletDesign } from '../../../engine/propulsion/inletDesign';
import type { InstallationSettings } from '../../../engine/propulsion/installationCorrections';
import { FOR_THRUST_TOLERANCE, makeInstalledModel } from '../../../engine/propulsion/installedModel';
import {
  deckAccess,
  deckCurve,
  inletDragIncrementCd0,
  inletWeight,
  makeInstalledPropulsion,
  type InstalledPropulsionOptions,
} from '../../../engine/propulsion/installedPropulsion';
import { milE5008bRecovery } from '../../../engine/propulsion/milE5008b';
import { buildParametricDeck } from '../../../engine/propulsion/parametricDeck';
import type { FlightCondition, InstalledPoint, PropulsionModel } from '../../../engine/propulsion/propulsionModel';
import { additiveDrag } from '../../../engine/propulsion/spillageDrag';
import { expectClose } from '../../support/assertInDelta';
import { LONG_PITOT, SHORT_INLET, TABLE_INLET } from './inletDesigns';

const FT = 0.3048;
const deck: EngineDeck = buildParametricDeck(DEMO_ENGINE_SPEC);
const NO_INSTALL: InstallationSettings = { bleed: { kind: 'coreFraction', fraction: 0 }, powerExtraction_W: 0, powerExtractionFuel_kg_s_W: 0 };
const CRUISE: FlightCondition = { altitude_m: 35000 * FT, mach: 0.8, isaDev_K: 0 };

function model(inlet: InletDesign, extra: Partial<InstalledPropulsionOptions> = {}): PropulsionModel {
  return makeInstalledPropulsion({
    deck,
    engineCount: 2,
    inlet,
    installation: NO_INSTALL,
    cautionSettings: DEFAULT_CAUTION_SETTINGS,
    ...extra,
  });
}

/** An inlet whose recovery equals the deck's reference below Mach 1 and spills nothing measurable. */
const IDEAL: InletDesign = {
  ...TABLE_INLET,
  name: 'Ideal',
  source: { kind: 'recoveryTable', mach: [0, 1], recovery: [1, 1], captureArea_m2: 1e-6 },
  lipSuctionFactor: 1,
};

function ids(p: InstalledPoint): string[] {
  return p.cautions.map((c) => c.id);
}

describe('makeInstalledPropulsion', () => {
  it('makeInstalledPropulsion with an ideal inlet and no installation losses returns the deck times the engine count', () => {
    // Identity check against the deck lookup itself (no installation: recovery = reference, no spillage).
    const p = model(IDEAL).atRating(CRUISE, 'maxCruise');
    const d = expectOk(lookupDeck(deck, CRUISE, 0.88), 'deck');
    expectClose(p.thrust_N, 2 * d.thrust_N, { rel: 1e-14 }, 'deck x 2');
    expectClose(p.fuelFlow_kg_s, 2 * d.fuelFlow_kg_s, { rel: 1e-14 }, 'deck x 2');
    expect(p.perEngine.recovery).toBe(1);
    expect(p.perEngine.spillageDrag_N).toBe(0);
    expect(model(IDEAL).label).toContain('parametric');
    expect(model(IDEAL).inletName).toBe('Ideal');
    expect(p.tsfc_kg_N_s).toBeCloseTo(p.fuelFlow_kg_s / p.thrust_N, 15);
  });

  it("makeInstalledPropulsion applies Raymer's ram correction: recovery 0.97 against 1.0 loses 4.05 %", () => {
    // Raymer, installed thrust: % loss = C_ram (eta_ref - eta) x 100, C_ram 1.35 (from memory) -> 4.05 %.
    const flat: InletDesign = { ...IDEAL, source: { kind: 'recoveryTable', mach: [0, 1], recovery: [0.97, 0.97], captureArea_m2: 1e-6 } };
    const p = model(flat).atRating(CRUISE, 'maxCruise');
    expectClose(p.perEngine.correctedThrust_N, p.perEngine.uninstalledThrust_N * (1 - 0.0405), { rel: 1e-13 }, 'Raymer worked number');
    expect(p.perEngine.referenceRecovery).toBe(1); // MIL-E-5008B below Mach 1
    expect(p.fuelFlow_kg_s).toBeCloseTo(2 * p.perEngine.uninstalledFuelFlow_kg_s, 15);
  });

  it('makeInstalledPropulsion measures recovery against MIL-E-5008B above Mach 1', () => {
    // The deck states MIL-E-5008B as its reference; at M 0.9 (top of the table) it is 1.
    const p = model(LONG_PITOT).atRating({ ...CRUISE, mach: 0.9 }, 'maxCruise');
    expect(p.perEngine.referenceRecovery).toBe(milE5008bRecovery(0.9));
  });

  it('makeInstalledPropulsion charges spillage from the mass-flow ratio and ISA free stream', () => {
    // 35,000 ft ISA: p 23,842 Pa, rho 0.37956 kg/m^3, a 296.54 m/s (U.S. Standard Atmosphere 1976 tables, from memory).
    const p = model(LONG_PITOT).atRating(CRUISE, 'maxCruise');
    const e = p.perEngine;
    const a0 = e.airflow_kg_s! / (0.37956 * 0.8 * 296.54);
    expectClose(e.massFlowRatio!, a0 / 0.56, { rel: 2e-4 }, 'A0/Ac from 1976 ISA tables');
    const expected = (1 - 0.8) * additiveDrag(0.8, 23842, e.massFlowRatio!, 0.56).drag_N;
    expectClose(e.spillageDrag_N, expected, { rel: 1e-4 }, 'NACA Report 1187 additive drag less lip suction');
    expect(e.spillageDrag_N).toBeGreaterThan(0);
    expectClose(e.thrust_N, e.correctedThrust_N - e.spillageDrag_N, { rel: 1e-15 }, 'bookkeeping');
    expectClose(p.thrust_N, 2 * e.thrust_N, { rel: 1e-15 }, 'all engines');
    // Engine holds corrected flow: physical airflow scales with recovery / reference.
    const deckAirflow = expectOk(lookupDeck(deck, CRUISE, 0.88), 'deck').airflow_kg_s!;
    expectClose(e.airflow_kg_s!, deckAirflow * e.recovery, { rel: 1e-14 }, 'corrected flow held');
  });

  it('makeInstalledPropulsion applies bleed and shaft power extraction', () => {
    const base = model(IDEAL).atRating(CRUISE, 'maxCruise').perEngine;
    const bled = model(IDEAL, {
      installation: { bleed: { kind: 'coreFraction', fraction: 0.02 }, powerExtraction_W: 50e3 },
    }).atRating(CRUISE, 'maxCruise').perEngine;
    // Raymer: 2 % of core flow x C_bleed 2.0 = 4 % thrust; 50 kW / (0.35 x 43 MJ/kg) fuel (common practice).
    expectClose(bled.correctedThrust_N, base.correctedThrust_N * 0.96, { rel: 1e-13 }, 'Raymer bleed');
    expectClose(bled.fuelFlow_kg_s, base.fuelFlow_kg_s + 50e3 / (0.35 * 43e6), { rel: 1e-13 }, 'extraction fuel');
  });
});

describe('hybrid recoveryFrom / spillageFrom', () => {
  const cond: FlightCondition = { altitude_m: 30000 * FT, mach: 0.75, isaDev_K: 0 };

  it('hybrid options set to the pure designs reproduce the pure models', () => {
    const pureB = model(SHORT_INLET).atRating(cond, 'maxClimb');
    const viaA = model(LONG_PITOT, { recoveryFrom: SHORT_INLET, spillageFrom: SHORT_INLET }).atRating(cond, 'maxClimb');
    expect(viaA.perEngine).toEqual(pureB.perEngine);
    expect(viaA.thrust_N).toBe(pureB.thrust_N);
    const pureA = model(LONG_PITOT).atRating(cond, 'maxClimb');
    const selfA = model(LONG_PITOT, { recoveryFrom: LONG_PITOT, spillageFrom: LONG_PITOT }).atRating(cond, 'maxClimb');
    expect(selfA.perEngine).toEqual(pureA.perEngine);
  });

  it("hybrid B's recovery with A's spillage takes each part from its own design", () => {
    const a = model(LONG_PITOT).atRating(cond, 'maxClimb').perEngine;
    const b = model(SHORT_INLET).atRating(cond, 'maxClimb').perEngine;
    const h = model(LONG_PITOT, { recoveryFrom: SHORT_INLET }).atRating(cond, 'maxClimb').perEngine;
    expect(h.recovery).toBe(b.recovery);
    expect(h.correctedThrust_N).toBe(b.correctedThrust_N);
    expect(h.throatMach).toBe(b.throatMach);
    // Spillage uses A's capture area at B's airflow.
    expectClose(h.massFlowRatio!, (b.massFlowRatio! * 0.5) / 0.56, { rel: 1e-13 }, 'A0 over A capture');
    expect(h.spillageDrag_N).not.toBe(b.spillageDrag_N);
    expect(h.spillageDrag_N).not.toBe(a.spillageDrag_N);
    // 30,000 ft ISA static pressure 30,090 Pa (U.S. Standard Atmosphere 1976 table, from memory); A's lip suction 0.8.
    const expected = (1 - 0.8) * additiveDrag(0.75, 30090, h.massFlowRatio!, 0.56).drag_N;
    expectClose(h.spillageDrag_N, expected, { rel: 1e-4 }, "NACA Report 1187 with A's capture area");
  });
});

describe('forThrust', () => {
  const m = model(LONG_PITOT, { installation: { bleed: { kind: 'coreFraction', fraction: 0.01 }, powerExtraction_W: 20e3 } });

  it('forThrust round-trips installed thrust to the stated tolerance', () => {
    const top = m.atRating(CRUISE, 'maxCruise');
    for (const share of [0.15, 0.4, 0.63, 0.9, 0.999]) {
      const want = share * top.thrust_N;
      const p = m.forThrust(CRUISE, want, 'maxCruise');
      expect(p.limit).toBe('within');
      expect(p.thrustRequired_N).toBe(want);
      expectClose(p.thrust_N, want, { rel: FOR_THRUST_TOLERANCE }, 'round trip');
      expect(p.power).toBeGreaterThan(0.06);
      expect(p.power).toBeLessThan(0.88);
      // The point is the atPower point at that setting.
      expectClose(m.atPower(CRUISE, p.power).thrust_N, p.thrust_N, { rel: 1e-14 }, 'same point');
    }
  });

  it('forThrust reports above_rating at the rating and below_idle at idle', () => {
    const top = m.atRating(CRUISE, 'maxCruise');
    const over = m.forThrust(CRUISE, 1.5 * top.thrust_N, 'maxCruise');
    expect(over.limit).toBe('above_rating');
    expect(over.power).toBe(0.88);
    expect(over.thrust_N).toBe(top.thrust_N);
    const climbTop = m.forThrust(CRUISE, 1.01 * top.thrust_N, 'maxClimb');
    expect(climbTop.limit).toBe('within');
    // At flight idle in cruise the installed thrust is negative (spillage and extraction exceed the deck thrust).
    const idle = m.atRating(CRUISE, 'flightIdle');
    expect(idle.thrust_N).toBeLessThan(0);
    const under = m.forThrust(CRUISE, idle.thrust_N - 100, 'maxCruise');
    expect(under.limit).toBe('below_idle');
    expect(under.power).toBe(0.06);
    expect(under.thrust_N).toBe(idle.thrust_N);
    expect(under.tsfc_kg_N_s).toBeNull();
  });

  it('forThrust defaults the ceiling to maxCruise', () => {
    const top = m.atRating(CRUISE, 'maxCruise');
    expect(m.forThrust(CRUISE, 1.2 * top.thrust_N).power).toBe(0.88);
  });
});

describe('installed thrust shape (common practice)', () => {
  it('installed thrust at a fixed rating falls with Mach, bottoms out subsonic, then partly recovers', () => {
    // Common practice for a high-bypass turbofan (Mattingly's lapse delta0 (1 - 0.49 sqrt(M0))):
    // net thrust falls with speed, then ram pressure wins part of it back.
    const m = model(LONG_PITOT);
    const machs = [0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9];
    const thrust = machs.map((mach) => m.atRating({ altitude_m: 30000 * FT, mach, isaDev_K: 0 }, 'maxClimb').thrust_N);
    const iMin = thrust.indexOf(Math.min(...thrust));
    expect(machs[iMin]).toBeGreaterThan(0.3);
    expect(machs[iMin]).toBeLessThan(0.9);
    expect(thrust[0]!).toBeGreaterThan(thrust[iMin]!);
    expect(thrust.at(-1)!).toBeGreaterThan(thrust[iMin]!);
    // Installed below uninstalled everywhere (recovery < 1 and spillage > 0).
    for (const mach of machs) {
      const p = m.atRating({ altitude_m: 30000 * FT, mach, isaDev_K: 0 }, 'maxClimb');
      expect(p.perEngine.thrust_N).toBeLessThan(p.perEngine.uninstalledThrust_N);
    }
  });
});

describe('two inlet designs', () => {
  it('long pitot and short inlet give different installed thrust, and perEngine shows why', () => {
    const long = model(LONG_PITOT).atRating(CRUISE, 'maxCruise').perEngine;
    const short = model(SHORT_INLET).atRating(CRUISE, 'maxCruise').perEngine;
    // Recovery: the long pitot's gentler diffuser (K_d 0.04 vs 0.1) loses less.
    expect(long.recovery).toBeGreaterThan(short.recovery);
    expect(long.correctedThrust_N).toBeGreaterThan(short.correctedThrust_N);
    // Spillage: the long pitot's larger capture spills more (lower A0/Ac).
    expect(long.massFlowRatio!).toBeLessThan(short.massFlowRatio!);
    expect(long.spillageDrag_N).toBeGreaterThan(short.spillageDrag_N);
    expect(long.thrust_N).not.toBeCloseTo(short.thrust_N, 0);
    // Airframe side: more external drag and weight for the long pitot.
    expect(inletDragIncrementCd0(LONG_PITOT, 2, 35)).toBeGreaterThan(inletDragIncrementCd0(SHORT_INLET, 2, 35));
    expect(inletWeight(LONG_PITOT, 2)).toBeGreaterThan(inletWeight(SHORT_INLET, 2));
  });
});

describe('cautions', () => {
  it('every query carries throat and fan-face Mach cautions against the settings', () => {
    const strict: CautionSettings = { ...DEFAULT_CAUTION_SETTINGS, maxThroatMach: 0.3, minFanFaceMach: 0.55, maxFanFaceMach: 0.6 };
    const p = model(SHORT_INLET, { cautionSettings: strict }).atRating(CRUISE, 'maxCruise');
    expect(ids(p)).toContain('throat_mach_high');
    expect(ids(p)).toContain('fan_face_mach_range');
    const high = p.cautions.find((c) => c.id === 'throat_mach_high')!;
    expect(high.value).toBe(p.perEngine.throatMach);
    expect(high.threshold).toBe(0.3);
    const relaxed: CautionSettings = { ...DEFAULT_CAUTION_SETTINGS, maxThroatMach: 0.99, minFanFaceMach: 0.01, maxFanFaceMach: 0.99 };
    expect(model(SHORT_INLET, { cautionSettings: relaxed }).atRating(CRUISE, 'maxCruise').cautions).toEqual([]);
  });

  it('a choked throat is reported with a warning and Mach 1', () => {
    const tiny: InletDesign = { ...SHORT_INLET, name: 'Tiny throat', source: { ...SHORT_INLET.source, kind: 'geometry', captureArea_m2: 0.5, throatArea_m2: 0.2, fanFaceArea_m2: 0.6, diffuserLossCoefficient: 0.2 } };
    const p = model(tiny).atRating({ altitude_m: 0, mach: 0.2, isaDev_K: 0 }, 'takeoff');
    expect(p.perEngine.throatMach).toBe(1);
    expect(ids(p)).toContain('inlet_throat_choked');
  });

  it('a deck without airflow skips spillage and says so', () => {
    const noAir: EngineDeck = { ...deck, hasAirflow: false, grid: { ...deck.grid, airflow_kg_s: null } };
    const p = makeInstalledPropulsion({ deck: noAir, engineCount: 2, inlet: TABLE_INLET, installation: NO_INSTALL, cautionSettings: DEFAULT_CAUTION_SETTINGS }).atRating(CRUISE, 'maxCruise');
    expect(p.perEngine.spillageDrag_N).toBe(0);
    expect(p.perEngine.massFlowRatio).toBeNull();
    expect(p.perEngine.airflow_kg_s).toBeNull();
    // A recovery table has no throat or fan face: null in the point (the evaluation's scratch holds NaN for none).
    expect(p.perEngine.throatMach).toBeNull();
    expect(p.perEngine.fanFaceMach).toBeNull();
    const c = p.cautions.find((x) => x.id === 'no_airflow_spillage_skipped')!;
    expect(c.severity).toBe('info');
    // With airflow, after the point without it (the same scratch): numbers again, and no caution.
    const withAir = makeInstalledPropulsion({ deck, engineCount: 2, inlet: TABLE_INLET, installation: NO_INSTALL, cautionSettings: DEFAULT_CAUTION_SETTINGS });
    withAir.atRating(CRUISE, 'maxCruise');
    const q = withAir.forThrust(CRUISE, 0.5 * withAir.atRating(CRUISE, 'maxCruise').thrust_N, 'maxCruise');
    expect(q.perEngine.airflow_kg_s).toBeGreaterThan(0);
    expect(q.perEngine.massFlowRatio).toBeGreaterThan(0);
    expect(q.perEngine.throatMach).toBeNull();
    expect(q.cautions.some((x) => x.id === 'no_airflow_spillage_skipped')).toBe(false);
  });

  it('deck extrapolation cautions pass through, unless the settings turn them off', () => {
    const beyond: FlightCondition = { ...CRUISE, mach: 0.95 };
    expect(ids(model(TABLE_INLET).atRating(beyond, 'maxCruise'))).toContain('deck_extrapolation');
    const quiet = model(TABLE_INLET, { cautionSettings: { ...DEFAULT_CAUTION_SETTINGS, cautionOnDeckExtrapolation: false } }).atRating(beyond, 'maxCruise');
    expect(ids(quiet)).not.toContain('deck_extrapolation');
    // The recovery table ends at M 0.9: its end value is held with a caution.
    expect(ids(quiet)).toContain('inlet_recovery_table_range');
    expect(quiet.outsideTable).toContain('mach');
  });

  it('a rating the deck does not name falls back to the deck bound with a caution', () => {
    const fewer: EngineDeck = { ...deck, ratings: { takeoff: 1, flightIdle: 0.06 } };
    const p = makeInstalledPropulsion({ deck: fewer, engineCount: 2, inlet: TABLE_INLET, installation: NO_INSTALL, cautionSettings: DEFAULT_CAUTION_SETTINGS }).atRating(CRUISE, 'maxCruise');
    expect(p.power).toBe(1);
    expect(ids(p)).toContain('rating_not_in_deck');
  });

  it('invalid designs, settings and conditions are refused with the field named', () => {
    expect(() => model({ ...LONG_PITOT, lipSuctionFactor: 2 })).toThrow(/lipSuctionFactor/);
    expect(() => model(LONG_PITOT, { engineCount: 0 })).toThrow(/engineCount/);
    expect(() => model(LONG_PITOT, { installation: { ...NO_INSTALL, powerExtraction_W: -1 } })).toThrow(/powerExtraction_W/);
    expect(() => model(LONG_PITOT).atPower({ ...CRUISE, mach: Number.NaN }, 0.5)).toThrow(/Mach/);
    expect(() => model(LONG_PITOT).forThrust(CRUISE, Number.NaN)).toThrow(/thrust required/);
  });
});

describe('atRating memo', () => {
  it('atRating answers depend only on the query: the same as a fresh model after any history, -0 kept apart from 0', () => {
    const m = model(TABLE_INLET);
    const asked: [FlightCondition, 'maxClimb' | 'flightIdle' | 'maxCruise'][] = [
      [CRUISE, 'maxClimb'],
      [CRUISE, 'maxClimb'],
      [CRUISE, 'flightIdle'],
      [{ ...CRUISE, mach: 0.78 }, 'maxClimb'],
      [CRUISE, 'maxClimb'],
      [{ altitude_m: 0, mach: 0.3, isaDev_K: 0 }, 'maxCruise'],
      [{ altitude_m: -0, mach: 0.3, isaDev_K: 0 }, 'maxCruise'],
    ];
    for (const [condition, rating] of asked) {
      m.forThrust(condition, 0.5 * m.atRating(condition, 'maxCruise').thrust_N);
      const p = m.atRating(condition, rating);
      expect(p).toEqual(model(TABLE_INLET).atRating(condition, rating));
      expect(Object.is(p.altitude_m, condition.altitude_m)).toBe(true);
    }
    expect(m.atRating(CRUISE, 'maxClimb')).toBe(m.atRating({ ...CRUISE }, 'maxClimb'));
  });
});

describe('deckCurve', () => {
  it('deckCurve evaluates exactly what lookupDeck returns, incl. off-table, ISA deviation and negative tabulated thrust', () => {
    // The parametric deck with 3 kN taken off every thrust: negative at idle inside the table (kept) and beyond it
    // (floored at zero, as lookupDeck floors it).
    const shifted: EngineDeck = { ...deck, grid: { ...deck.grid, thrust_N: deck.grid.thrust_N.map((t) => t - 3000) } };
    const out = new Float64Array(CURVE_VALUES);
    let negative = 0;
    for (const d0 of [deck, shifted]) {
      const curve = deckCurve(d0);
      for (const condition of [CRUISE, { ...CRUISE, mach: 0.95 }, { altitude_m: 1500, mach: 0.25, isaDev_K: 15 }, { altitude_m: 13000, mach: 0.85, isaDev_K: -10 }]) {
        curve.prepare(condition);
        for (const power of [0.06, 0.2, 0.5, 0.88, 1]) {
          const d = expectOk(lookupDeck(d0, condition, power), 'deck');
          if (d.thrust_N < 0 && d.outside.length === 0) negative++;
          expect(curve.evaluate(power, out)).toBe(true);
          // To the bit: the same weights, factors and order of operations (deckLookup.ts finishLookup).
          expect(out[0]).toBe(d.thrust_N);
          expect(out[1]).toBe(d.airflow_kg_s);
          expect(out[CURVE_FUEL_FLOW]).toBe(d.fuelFlow_kg_s);
        }
      }
    }
    expect(negative).toBeGreaterThan(0);
  });

  it('the deck access keeps one prepared condition: its lookups equal lookupDeck whatever was asked before', () => {
    const access = deckAccess(deck);
    const high = { ...CRUISE, mach: 0.95 };
    const sequence: [FlightCondition, number][] = [
      [CRUISE, 0.5],
      [CRUISE, 1.2],
      [CRUISE, 0.5],
      [high, 0.88],
      [high, 0.01],
      [high, 0.88],
      [{ altitude_m: 1500, mach: 0.25, isaDev_K: 15 }, 0.2],
      [CRUISE, 0.88],
    ];
    for (const [condition, power] of sequence) {
      access.curveAt!(high)(0.3, new Float64Array(CURVE_VALUES));
      expect(access.lookup(condition, power)).toEqual(lookupDeck(deck, condition, power));
      expect(access.lookup(condition, power)).toEqual(lookupDeck(deck, condition, power));
    }
  });

  it('forThrust gives the same answer with and without the fast deck curve', () => {
    const settings = { engineCount: 2, inlet: SHORT_INLET, installation: NO_INSTALL, cautionSettings: DEFAULT_CAUTION_SETTINGS };
    const fast = makeInstalledModel(deckAccess(deck), settings);
    const { curveAt: _unused, ...slowAccess } = deckAccess(deck);
    const slow = makeInstalledModel(slowAccess, settings);
    const cond = { altitude_m: 9000, mach: 0.7, isaDev_K: 10 };
    const top = fast.atRating(cond, 'maxClimb').thrust_N;
    for (const share of [0.2, 0.55, 0.95]) {
      const a = fast.forThrust(cond, share * top, 'maxClimb');
      const b = slow.forThrust(cond, share * top, 'maxClimb');
      expectClose(a.thrust_N, share * top, { rel: FOR_THRUST_TOLERANCE }, 'round trip, fast');
      expectClose(b.thrust_N, share * top, { rel: FOR_THRUST_TOLERANCE }, 'round trip, full lookups');
      expectClose(a.power, b.power, { rel: 1e-6 }, 'same power');
    }
  });
});

describe('edge cases', () => {
  it('at Mach 0 (static) nothing spills and the mass-flow ratio is not defined', () => {
    const m = model(LONG_PITOT);
    const p = m.atRating({ altitude_m: 0, mach: 0, isaDev_K: 0 }, 'takeoff');
    expect(p.perEngine.massFlowRatio).toBeNull();
    expect(p.perEngine.spillageDrag_N).toBe(0);
    expect(p.perEngine.recovery).toBeLessThan(1);
    expect(p.perEngine.throatMach!).toBeGreaterThan(0);
    const half = m.forThrust({ altitude_m: 0, mach: 0, isaDev_K: 0 }, 0.5 * p.thrust_N, 'takeoff');
    expectClose(half.thrust_N, 0.5 * p.thrust_N, { rel: FOR_THRUST_TOLERANCE }, 'static round trip');
  });

  it('a deck that refuses the condition gives zero thrust with a warning, not NaN', () => {
    const strict: EngineDeck = { ...deck, policy: { ...deck.policy, altitude: 'refuse' } };
    const m = makeInstalledPropulsion({ deck: strict, engineCount: 2, inlet: LONG_PITOT, installation: NO_INSTALL, cautionSettings: DEFAULT_CAUTION_SETTINGS });
    const p = m.atRating({ altitude_m: 60000 * FT, mach: 0.8, isaDev_K: 0 }, 'maxCruise');
    expect(p.thrust_N).toBe(0);
    expect(p.fuelFlow_kg_s).toBe(0);
    expect(p.tsfc_kg_N_s).toBeNull();
    const c = p.cautions.find((x) => x.id === 'deck_lookup_failed')!;
    expect(c.severity).toBe('warning');
    expect(c.message).toContain('outside_deck');
  });

  it('above Mach 1 the reference and the geometry inlet both carry the MIL-E-5008B shock recovery', () => {
    // The deck's reference is MIL-E-5008B; the geometry inlet adds its diffuser loss on top (docs/installation.md).
    const p = model(LONG_PITOT, { cautionSettings: { ...DEFAULT_CAUTION_SETTINGS, cautionOnDeckExtrapolation: false } }).atRating({ altitude_m: 40000 * FT, mach: 1.2, isaDev_K: 0 }, 'maxCruise');
    expect(p.perEngine.referenceRecovery).toBe(milE5008bRecovery(1.2));
    expect(p.perEngine.recovery).toBeLessThan(milE5008bRecovery(1.2));
    expect(p.perEngine.recovery).toBeGreaterThan(milE5008bRecovery(1.2) * 0.98);
  });

  it('an inlet better than a constant deck reference gains thrust (Raymer, negative loss)', () => {
    const constantRef: EngineDeck = { ...deck, referenceRecovery: { kind: 'constant', value: 0.98 } };
    const better: InletDesign = { ...IDEAL, source: { kind: 'recoveryTable', mach: [0, 1], recovery: [0.99, 0.99], captureArea_m2: 1e-6 } };
    const p = makeInstalledPropulsion({ deck: constantRef, engineCount: 2, inlet: better, installation: NO_INSTALL, cautionSettings: DEFAULT_CAUTION_SETTINGS }).atRating(CRUISE, 'maxCruise');
    // 1.35 x (0.98 - 0.99) = -1.35 %: a 1.35 % gain.
    expectClose(p.perEngine.correctedThrust_N, p.perEngine.uninstalledThrust_N * 1.0135, { rel: 1e-13 }, 'Raymer C_ram, gain');
  });

  it('off-ISA queries carry the deck temperature approximation caution', () => {
    const p = model(TABLE_INLET).atRating({ ...CRUISE, isaDev_K: 15 }, 'maxCruise');
    expect(ids(p)).toContain('deck_temperature_approximation');
  });
});
