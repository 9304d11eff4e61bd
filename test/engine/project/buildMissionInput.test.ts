import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { makeAeroModel } from '../../../engine/aero/dragPolar';
import { DEFAULT_CAUTION_SETTINGS } from '../../../engine/cautions/cautionSettings';
import type { MissionInput } from '../../../engine/mission/missionTypes';
import { buildMissionInput } from '../../../engine/project/buildMissionInput';
import { parseProject, parseProjectData } from '../../../engine/project/parseProject';
import { deckReference } from '../../../engine/project/projectDeck';
import type { Project } from '../../../engine/project/projectSchema';
import { polarSpecOf } from '../../../engine/project/projectSpecs';
import { parseDeckCsv } from '../../../engine/propulsion/deckCsv';
import { deckToJson } from '../../../engine/propulsion/deckJson';
import type { EngineDeck } from '../../../engine/propulsion/engineDeck';
import { expectClose } from '../../support/assertInDelta';

// Conversion factors: NIST SP 811 (ft = 0.3048 m, lb = 0.45359237 kg, kt = 1852/3600 m/s, nmi = 1852 m).
const FT = 0.3048;
const LB = 0.45359237;
const KT = 1852 / 3600;
const NMI = 1852;

const fixture = (path: string): string => readFileSync(new URL(`../../../fixtures/${path}`, import.meta.url), 'utf8');
const demoText = fixture('demo/demo.blockwise.json');

function demoDoc(): Record<string, any> { // eslint-disable-line @typescript-eslint/no-explicit-any
  return JSON.parse(demoText) as Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
}

function parsedProject(doc: unknown): Project {
  const r = parseProjectData(doc);
  if (!r.ok) throw new Error(r.error.map((i) => i.message).join('\n'));
  return r.value;
}

let deck: EngineDeck;
let project: Project;
let input: MissionInput;

beforeAll(() => {
  const d = parseDeckCsv(fixture('demo/demo-engine.deck.csv'), 'demo-engine.deck.csv');
  if (!d.ok) throw new Error(d.error.map((e) => e.message).join('\n'));
  deck = d.value;
  const p = parseProject(demoText, 'demo');
  if (!p.ok) throw new Error('demo did not parse');
  project = p.value;
  const i = buildMissionInput(project, { deck });
  if (!i.ok) throw new Error(i.error.map((e) => e.message).join('\n'));
  input = i.value;
});

describe('buildMissionInput airframe and inlet increments', () => {
  it('buildMissionInput adds the active inlet weight per engine times the engine count to OEW', () => {
    // Demo: OEW 19,000 lb without inlets; long pitot 150 lb per engine; 2 engines (demo file).
    expectClose(input.airframe.oew_kg, (19000 + 2 * 150) * LB, { rel: 1e-12 }, 'OEW + n x inlet weight, NIST SP 811 lb');
    const short = buildMissionInput(project, { deck }, { inletName: 'short' });
    expect(short.ok).toBe(true);
    if (short.ok) expectClose(short.value.airframe.oew_kg, (19000 + 2 * 100) * LB, { rel: 1e-12 }, 'OEW + n x inlet weight');
  });

  it('buildMissionInput adds dCD0 = external drag area x engine count / wing area to the polar', () => {
    // D/q definition: dCD0 = n (D/q) / S. Demo: long pitot 0.55 ft2 per engine, 2 engines, 450 ft2 wing,
    // so dCD0 = 1.1 / 450 (the ft2 cancel).
    const base = makeAeroModel(polarSpecOf(project), project.airframe.wingArea);
    expect(base.ok).toBe(true);
    if (!base.ok) return;
    const query = { altitude_m: 10000, mach: 0.78, mass_kg: 14000, loadFactor: 1 };
    const withInlet = input.aero.drag(query);
    const without = base.value.drag(query);
    expectClose(withInlet.cdIncrement - without.cdIncrement, (2 * 0.55) / 450, { rel: 1e-12 }, 'dCD0 = n D/q / S');
    expectClose(withInlet.cd - without.cd, (2 * 0.55) / 450, { rel: 1e-9 }, 'dCD0 = n D/q / S');
    const short = buildMissionInput(project, { deck }, { inletName: 'short' });
    if (short.ok) expectClose(short.value.aero.drag(query).cdIncrement, (2 * 0.4) / 450, { rel: 1e-12 }, 'dCD0 = n D/q / S');
  });

  it('buildMissionInput copies the weights, wing area and speed limits in SI', () => {
    const a = input.airframe;
    expectClose(a.mtow_kg, 36500 * LB, { rel: 1e-15 }, 'NIST SP 811 lb');
    expectClose(a.mzfw_kg, 21500 * LB, { rel: 1e-15 }, 'NIST SP 811 lb');
    expectClose(a.mlw_kg, 29000 * LB, { rel: 1e-15 }, 'NIST SP 811 lb');
    expectClose(a.maxFuel_kg, 15000 * LB, { rel: 1e-15 }, 'NIST SP 811 lb');
    expectClose(a.wingArea_m2, 450 * FT * FT, { rel: 1e-15 }, 'NIST SP 811 ft2');
    expectClose(a.vmo_m_s, 340 * KT, { rel: 1e-15 }, 'NIST SP 811 kt');
    expect(a.mmo).toBe(0.85);
  });

  it('buildMissionInput flies the active inlet by default and the named one on request', () => {
    expect(input.propulsion.inletName).toBe('long pitot');
    expect(input.propulsion.engineCount).toBe(2);
    const short = buildMissionInput(project, { deck }, { inletName: 'short' });
    expect(short.ok && short.value.propulsion.inletName).toBe('short');
  });

  it('buildMissionInput refuses an inlet name the project does not have, naming the choices', () => {
    const r = buildMissionInput(project, { deck }, { inletName: 'scoop' });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error[0]!.path).toBe('inlet');
      expect(r.error[0]!.message).toContain('"long pitot", "short"');
    }
  });
});

describe('buildMissionInput mission', () => {
  it('buildMissionInput converts the legs to SI with the solved cruise distance as null', () => {
    expect(input.legs.map((l) => l.kind)).toEqual(['taxiOut', 'takeoff', 'climb', 'cruise', 'descent', 'approach', 'taxiIn']);
    const [taxiOut, takeoff, climb, cruise, descent] = input.legs;
    expect(taxiOut).toMatchObject({ name: 'Taxi out', time_s: 600, fuelFlow_kg_s: 'idle' });
    expect(takeoff).toMatchObject({ time_s: 60 });
    if (takeoff?.kind === 'takeoff') expectClose(takeoff.fuel_kg!, 150 * LB, { rel: 1e-15 }, 'NIST SP 811 lb');
    if (climb?.kind !== 'climb' || cruise?.kind !== 'cruise' || descent?.kind !== 'descent') throw new Error('leg kinds');
    expectClose(climb.toAltitude_m, 37000 * FT, { rel: 1e-15 }, 'NIST SP 811 ft');
    expectClose(climb.schedule.lowCas_m_s, 250 * KT, { rel: 1e-15 }, 'NIST SP 811 kt');
    expectClose(climb.schedule.lowAltitudeLimit_m, 10000 * FT, { rel: 1e-15 }, 'NIST SP 811 ft');
    expectClose(climb.schedule.cas_m_s, 280 * KT, { rel: 1e-15 }, 'NIST SP 811 kt');
    expect(climb.schedule.mach).toBe(0.75);
    expect(climb.rating).toBe('maxClimb');
    expect(cruise.distance_m).toBeNull();
    expect(cruise.speed).toEqual({ kind: 'mach', mach: 0.78 });
    expect(cruise.profile.kind).toBe('stepClimb');
    if (cruise.profile.kind === 'stepClimb') {
      expectClose(cruise.profile.step_m, 2000 * FT, { rel: 1e-15 }, 'NIST SP 811 ft');
      expectClose(cruise.profile.maxAltitude_m, 41000 * FT, { rel: 1e-15 }, 'NIST SP 811 ft');
    }
    expect(descent.mode).toEqual({ kind: 'idle' });
  });

  it('buildMissionInput converts reserves, solve mode, ISA deviation and wind to SI', () => {
    const r = input.reserves;
    expect(r.preset).toBe('icaoAnnex6');
    if (r.preset === 'icaoAnnex6') {
      expect(r.contingencyFraction).toBeCloseTo(0.05, 15);
      expect(r.minContingency_s).toBe(300);
      expect(r.finalReserve_s).toBe(1800);
      expectClose(r.alternate!.distance_m, 200 * NMI, { rel: 1e-15 }, 'NIST SP 811 nmi');
      expectClose(r.alternate!.cruiseAltitude_m, 25000 * FT, { rel: 1e-15 }, 'NIST SP 811 ft');
      expect(r.alternate!.cruiseMach).toBe(0.7);
    }
    expect(input.solve.kind).toBe('payloadRange');
    if (input.solve.kind === 'payloadRange') {
      expectClose(input.solve.range_m, 3000 * NMI, { rel: 1e-15 }, 'NIST SP 811 nmi');
      expectClose(input.solve.payload_kg, 1600 * LB, { rel: 1e-15 }, 'NIST SP 811 lb');
    }
    expect(input.isaDev_K).toBe(0);
    expect(input.wind_m_s).toBe(0);
  });

  it('buildMissionInput passes mission.destinationElevation in metres, and 0 m when the file has none', () => {
    const doc = demoDoc();
    doc.mission.destinationElevation = '450 ft';
    const withElevation = buildMissionInput(parsedProject(doc), { deck });
    if (!withElevation.ok) throw new Error(withElevation.error.map((e) => e.message).join('\n'));
    expectClose(withElevation.value.destinationElevation_m!, 450 * FT, { rel: 1e-15 }, 'NIST SP 811 ft');
    delete doc.mission.destinationElevation;
    const without = buildMissionInput(parsedProject(doc), { deck });
    expect(without.ok && without.value.destinationElevation_m).toBe(0);
  });

  it('buildMissionInput applies the caution overrides on the defaults', () => {
    // 300 ft/min = 300 x 0.3048 / 60 m/s (NIST SP 811 ft, definition of the minute).
    expectClose(input.cautionSettings.minResidualClimbRate_m_s, (300 * FT) / 60, { rel: 1e-15 }, 'NIST SP 811 ft/min');
    expect(input.cautionSettings.maxThroatMach).toBe(DEFAULT_CAUTION_SETTINGS.maxThroatMach);
  });

  it('buildMissionInput applies overrides of ISA deviation, wind and solve mode', () => {
    const r = buildMissionInput(project, { deck }, { overrides: { isaDev_K: 15, wind_m_s: -20, solve: { kind: 'maxRange', payload_kg: 500 } } });
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.value.isaDev_K).toBe(15);
      expect(r.value.wind_m_s).toBe(-20);
      expect(r.value.solve).toEqual({ kind: 'maxRange', payload_kg: 500 });
    }
  });

  it('buildMissionInput keeps per-leg ISA deviation and wind only where the file gives them', () => {
    const doc = demoDoc();
    doc.mission.legs[3].wind = '-50 kt';
    doc.mission.legs[3].isaDeviation = '+10 K';
    const r = buildMissionInput(parsedProject(doc), { deck });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expectClose(r.value.legs[3]!.wind_m_s!, -50 * KT, { rel: 1e-15 }, 'NIST SP 811 kt');
    expect(r.value.legs[3]!.isaDev_K).toBe(10);
    expect('wind_m_s' in r.value.legs[2]!).toBe(false);
  });
});

describe('buildMissionInput decks', () => {
  it('deckReference names the deck file as written in the project', () => {
    expect(deckReference(project)).toEqual({ kind: 'file', path: 'demo-engine.deck.csv' });
  });

  it('buildMissionInput says a file deck was not loaded when resources lack it', () => {
    const r = buildMissionInput(project, {});
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error[0]!.path).toBe('engine.deck.path');
  });

  it('buildMissionInput builds an embedded JSON deck that gives the same thrust as the file deck', () => {
    const doc = demoDoc();
    doc.engine.deck = { kind: 'embedded', deck: JSON.parse(deckToJson(deck)) };
    const p = parsedProject(doc);
    expect(deckReference(p)).toEqual({ kind: 'embedded' });
    const r = buildMissionInput(p, {});
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const condition = { altitude_m: 9000, mach: 0.7, isaDev_K: 0 };
    const embedded = r.value.propulsion.atRating(condition, 'maxClimb');
    const fromFile = input.propulsion.atRating(condition, 'maxClimb');
    expectClose(embedded.thrust_N, fromFile.thrust_N, { rel: 1e-12 }, 'same deck, two carriers');
    expectClose(embedded.fuelFlow_kg_s, fromFile.fuelFlow_kg_s, { rel: 1e-12 }, 'same deck, two carriers');
  });

  it('buildMissionInput reports an embedded deck that does not parse under engine.deck.deck', () => {
    const doc = demoDoc();
    doc.engine.deck = { kind: 'embedded', deck: { nothing: true } };
    const r = buildMissionInput(parsedProject(doc), {});
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error[0]!.path.startsWith('engine.deck.deck')).toBe(true);
  });

  it('buildMissionInput builds a parametric deck labelled parametric', () => {
    const doc = demoDoc();
    doc.engine.deck = {
      kind: 'parametric',
      model: 'highBypassTurbofan',
      title: 'Test turbofan (invented)',
      seaLevelStaticThrust: '6750 lbf',
      throttleRatio: 1.05,
      seaLevelStaticTsfc: '0.43 lb/(lbf h)',
      seaLevelStaticAirflow: '210 lb/s',
    };
    const p = parsedProject(doc);
    expect(deckReference(p)).toEqual({ kind: 'parametric' });
    const r = buildMissionInput(p, {});
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.propulsion.parametric).toBe(true);
    expect(r.value.propulsion.label).toContain('parametric');
    const point = r.value.propulsion.atRating({ altitude_m: 0, mach: 0, isaDev_K: 0 }, 'takeoff');
    // At sea-level static and full power the deck gives its stated thrust per engine (Mattingly lapse = 1 there);
    // installed thrust is lower by the inlet and installation corrections (a few per cent here).
    expectClose(point.perEngine.uninstalledThrust_N, 6750 * 4.4482216152605, { rel: 1e-9 }, 'NIST SP 811 lbf; Mattingly alpha(SLS) = 1');
  });

  it('buildMissionInput reports installation settings the propulsion model refuses, at their project path', () => {
    const doc = demoDoc();
    doc.engine.installation.bleed = { kind: 'coreFraction', fraction: 0.8 };
    const r = buildMissionInput(parsedProject(doc), { deck });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error[0]!.path).toBe('engine.installation.bleed.fraction');
  });
});
