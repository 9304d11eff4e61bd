/**
 * The robustness generator: more than 10,000 mutated and extreme inputs
 * (deck files, project files, command lines), seeded so every run is the
 * same. Every one must end in a result or a clear refusal:
 * - decks: parseDeckCsv never throws; a deck that loads gives finite,
 *   non-negative thrust, fuel flow and airflow at any condition asked
 *   (extrapolated values are floored with a warning);
 * - projects: parseProject never throws; a project that parses and builds is
 *   flown, and solveMission never throws, never returns NaN, never negative
 *   fuel or mass, never 'internal_error', and never calls an impossible
 *   flight 'ok' (ground distance not positive, take-off above MTOW, fuel above
 *   capacity, landing above MLW or below zero-fuel mass);
 * - command lines: runCli never throws, ends with a documented exit code,
 *   never prints a stack trace or a raw control character.
 * The counts are printed with the test output. Cheap by design: most inputs
 * fail fast at a parser, and the missions flown are short.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { EXIT_CODES } from '../../cli/exitCodes';
import { runCli } from '../../cli/main';
import { hasControlCharacters } from '../../hostio/terminalText';
import type { MissionResult } from '../../engine/mission/missionTypes';
import { solveMission } from '../../engine/mission/solveMission';
import { buildMissionInput } from '../../engine/project/buildMissionInput';
import { parseProject } from '../../engine/project/parseProject';
import { parseDeckCsv } from '../../engine/propulsion/deckCsv';
import { lookupDeck } from '../../engine/propulsion/deckLookup';
import type { EngineDeck } from '../../engine/propulsion/engineDeck';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const demoDeckText = readFileSync(`${repoRoot}fixtures/demo/demo-engine.deck.csv`, 'utf8');
const demoProjectText = readFileSync(`${repoRoot}fixtures/demo/demo.blockwise.json`, 'utf8');

/** Mulberry32: a small seeded generator (the test is the same on every run). */
function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
type Rand = () => number;
const pick = <T,>(r: Rand, xs: readonly T[]): T => xs[Math.floor(r() * xs.length)]!;

// ------------------------------------------------------------------ decks

/** A small deck cut from the demo deck: its metadata, header and the rows at four altitudes, three Machs, all powers. */
function smallDeck(): string {
  const lines = demoDeckText.split('\n');
  const header = lines.findIndex((l) => l.startsWith('altitude['));
  const keep = lines.slice(header + 1).filter((l) => {
    const [alt, mach] = l.split(',');
    return ['0', '15000', '35000', '51000'].includes(alt!) && ['0', '0.4', '0.8'].includes(mach!);
  });
  return [...lines.slice(0, header + 1), ...keep].join('\n');
}
const SMALL_DECK = smallDeck();
const EXTREME_CELLS = ['1e308', '-1e308', '5e-324', '-5e-324', '2.2e-308', 'NaN', 'Infinity', '', '-0', '0x10', '1,5', '1e999', '\u001b[2J', '9'.repeat(400), '-1', '0'];
const HEADER_SLIPS: readonly [string, string][] = [
  ['fuel_flow[lb/h]', 'fuel_flow[kg/min]'],
  ['thrust[lbf]', 'thrust[kN]'],
  ['altitude[ft]', 'altitude[in]'],
  ['fuel_flow[lb/h],airflow[lb/s]', 'airflow[lb/h],fuel_flow[lb/s]'],
  ['mach[-]', 'mach[kt]'],
  ['power[-]', 'power[%]'],
  ['thrust[lbf]', 'thrust[lb]'],
];

function mutateDeck(r: Rand): string {
  let text = SMALL_DECK;
  const lines = text.split('\n');
  const header = lines.findIndex((l) => l.startsWith('altitude['));
  const kind = Math.floor(r() * 8);
  if (kind === 0) return text.slice(0, Math.floor(r() * text.length)); // cut off anywhere, mid-number too
  if (kind === 1) {
    const [from, to] = pick(r, HEADER_SLIPS);
    return text.replace(from, to);
  }
  if (kind === 2) return `\ufeff${text}`;
  if (kind === 3) {
    const i = header + 1 + Math.floor(r() * (lines.length - header - 1));
    lines.splice(i, 1);
    return lines.join('\n');
  }
  if (kind === 4) {
    const i = header + 1 + Math.floor(r() * (lines.length - header - 1));
    lines.splice(i, 0, lines[i]!);
    return lines.join('\n');
  }
  // A few cells replaced by extreme or broken values.
  const n = 1 + Math.floor(r() * 3);
  for (let k = 0; k < n; k++) {
    const i = header + 1 + Math.floor(r() * (lines.length - header - 1));
    const cells = lines[i]!.split(',');
    cells[Math.floor(r() * cells.length)] = pick(r, EXTREME_CELLS);
    lines[i] = cells.join(',');
  }
  text = lines.join('\n');
  return text;
}

const CONDITIONS = [
  { altitude_m: 0, mach: 0, isaDev_K: 0 },
  { altitude_m: 11000, mach: 0.8, isaDev_K: 15 },
  { altitude_m: 30000, mach: 5, isaDev_K: -80 },
  { altitude_m: -1000, mach: 2.5, isaDev_K: 80 },
  { altitude_m: 71000, mach: 0, isaDev_K: 0 },
];

// ------------------------------------------------------------------ projects

type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

/** The demo project flying a short mission (300 nmi, constant altitude), its deck path absolute, no uncertainty block. */
function shortDemo(): Json {
  const doc = JSON.parse(demoProjectText) as Json;
  doc.engine.deck.path = `${repoRoot}fixtures/demo/demo-engine.deck.csv`;
  delete doc.uncertainty;
  doc.mission.solve = { mode: 'payloadRange', payload: '1600 lb', range: '300 nmi' };
  doc.mission.legs[3].profile = { kind: 'constantAltitude' };
  return doc;
}
const SHORT_DEMO = shortDemo();
const demoDeck = parseDeckCsv(demoDeckText, 'demo-engine.deck.csv');
if (!demoDeck.ok) throw new Error('the demo deck does not parse');
const DEMO_DECK = demoDeck.value;

/** The extreme ends of what the schema accepts, per kind of field, and values it must refuse. */
const EXTREME_VALUES: Readonly<Record<string, readonly (string | number)[]>> = {
  mass: ['1000000 kg', '1 kg', 0.001, '5e-324 kg', '1e308 kg', -1, '2204622 lb'],
  time: ['48 h', '0 s', '20 h', '47.99 h', '49 h', 1e308],
  speed: ['400 m/s', '1 kt', '0.001 m/s', '778 kt', '1e308 kt'],
  wind: ['150 m/s', '-150 m/s', '-291 kt', '0 kt', '151 m/s'],
  length: ['40075 km', '1 m', '5000 nmi', '21600 nmi', '1e308 m', 0],
  altitude: ['65000 ft', '-2000 ft', '64999 ft', '0 ft', '66000 ft'],
  isa: ['80 K', '-80 K', '+79 K', '81 K'],
  rate: ['100 m/s', '1 ft/min', '19685 ft/min', '101 m/s'],
  mach: [0.99, 0.05, 0.5, 1.2, 5e-324],
};

type Mutation = (doc: Json, r: Rand) => void;
const legOf = (doc: Json, kind: string): Json | undefined => (doc.mission.legs as Json[]).find((l) => l.kind === kind);
const MUTATIONS: readonly Mutation[] = [
  (d, r) => (d.airframe.weights[pick(r, ['operatingEmpty', 'maxZeroFuel', 'maxTakeoff', 'maxLanding', 'maxFuel'])] = pick(r, EXTREME_VALUES.mass!)),
  (d, r) => (d.mission.solve = { mode: 'takeoffWeight', takeoffWeight: pick(r, [...EXTREME_VALUES.mass!, '40000 lb', '36500 lb', '30000 lb']), payload: '1600 lb' }),
  (d, r) => (d.mission.solve = { mode: 'payloadRange', payload: pick(r, ['0 lb', '1600 lb', '6000 lb']), range: pick(r, EXTREME_VALUES.length!) }),
  (d, r) => (d.mission.solve = { mode: 'maxRange', payload: pick(r, ['0 lb', '1600 lb', '1e6 kg']) }),
  (d, r) => (legOf(d, 'taxiOut')!.time = pick(r, EXTREME_VALUES.time!)),
  (d, r) => (d.mission.legs[1] = { kind: 'takeoff', name: 'Takeoff', time: pick(r, EXTREME_VALUES.time!) }),
  (d, r) => (d.mission.legs as Json[]).splice(5, 0, { kind: 'hold', name: 'Hold', altitude: '1920 ft', time: pick(r, EXTREME_VALUES.time!) }),
  (d, r) => (d.mission.reserves.alternate.distance = pick(r, EXTREME_VALUES.length!)),
  (d, r) => (d.mission.reserves.finalReserveTime = pick(r, EXTREME_VALUES.time!)),
  (d, r) => (d.mission.wind = pick(r, EXTREME_VALUES.wind!)),
  (d, r) => (legOf(d, 'climb')!.wind = pick(r, EXTREME_VALUES.wind!)),
  (d, r) => (d.mission.isaDeviation = pick(r, EXTREME_VALUES.isa!)),
  (d, r) => {
    const alt = pick(r, EXTREME_VALUES.altitude!);
    legOf(d, 'climb')!.toAltitude = alt;
    legOf(d, 'cruise')!.altitude = alt;
  },
  (d, r) => (legOf(d, 'climb')!.schedule[pick(r, ['lowCas', 'cas'])] = pick(r, EXTREME_VALUES.speed!)),
  (d, r) => (legOf(d, 'climb')!.schedule.mach = pick(r, EXTREME_VALUES.mach!)),
  (d, r) => (legOf(d, 'descent')!.mode = { kind: 'rate', rate: pick(r, EXTREME_VALUES.rate!) }),
  (d, r) => (legOf(d, 'cruise')!.speed = { kind: 'mach', mach: pick(r, EXTREME_VALUES.mach!) }),
  (d, r) => (legOf(d, 'cruise')!.profile = { kind: 'cruiseClimb', maxAltitude: pick(r, EXTREME_VALUES.altitude!) }),
  (d, r) => (d.airframe.wingArea = pick(r, ['1 m2', '10000 m2', '1e308 m2', '0.0001 ft2'])),
  (d, r) => (d.airframe.vmo = pick(r, EXTREME_VALUES.speed!)),
  (d, r) => (d.engine.count = pick(r, [1, 8, 0, 9, 2.5])),
  (d, r) => (d.engine.installation.powerExtraction = pick(r, ['0 kW', '1 GW', '1e308 W', '500 kW'])),
  (d, r) => (d.polar.cdIncrement = pick(r, [0, 0.5, -0.0165, 1e6, 1e7])),
  (d, r) => (d.name = pick(r, ['\u001b]0;title\u0007', 'x'.repeat(5000), '\u202eeman', ''])),
];

function mutateProject(r: Rand): string {
  // Three in five are broken text (refused by the parser at once), two in five extreme values that fly.
  const kind = Math.floor(r() * 5);
  if (kind === 0) return demoProjectText.slice(0, Math.floor(r() * demoProjectText.length));
  if (kind === 1 || kind === 2) {
    const at = Math.floor(r() * demoProjectText.length);
    return demoProjectText.slice(0, at) + pick(r, ['1e308', '5e-324', '"', '}', 'NaN', '\u0000', ',', '-']) + demoProjectText.slice(at + 1);
  }
  const doc = structuredClone(SHORT_DEMO);
  const n = 1 + Math.floor(r() * 2);
  for (let k = 0; k < n; k++) pick(r, MUTATIONS)(doc, r);
  return JSON.stringify(doc);
}

/** Every number in a result, with its path, that is not finite. */
function nonFinite(value: unknown, path: string, out: string[]): void {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) out.push(`${path} = ${value}`);
  } else if (value instanceof Float64Array || value instanceof Int32Array) {
    for (let i = 0; i < value.length; i++) if (!Number.isFinite(value[i]!)) out.push(`${path}[${i}]`);
  } else if (Array.isArray(value)) value.forEach((v, i) => nonFinite(v, `${path}[${i}]`, out));
  else if (value !== null && typeof value === 'object') for (const [k, v] of Object.entries(value)) nonFinite(v, `${path}.${k}`, out);
}

/** Why an 'ok' result is impossible, or null. */
function impossibleButOk(r: MissionResult, mtow_kg: number, maxFuel_kg: number, mlw_kg: number): string | null {
  if (r.status !== 'ok') return null;
  const tol = 1e-6;
  if (!(r.groundDistance_m > 0)) return `ground distance ${r.groundDistance_m} m`;
  if (r.takeoffMass_kg > mtow_kg * (1 + tol)) return `take-off ${r.takeoffMass_kg} kg above MTOW ${mtow_kg} kg`;
  if (r.rampMass_kg - r.zeroFuelMass_kg > maxFuel_kg * (1 + tol)) return 'fuel above capacity';
  if (r.landingMass_kg > mlw_kg * (1 + tol)) return 'landing above MLW';
  if (r.landingMass_kg < r.zeroFuelMass_kg - tol) return 'landed with negative fuel';
  if (!(r.blockFuel_kg > 0)) return `block fuel ${r.blockFuel_kg} kg`;
  return null;
}

// ------------------------------------------------------------------ command lines

const CLI_FILES = ['fixtures/demo/demo-engine.deck.csv', 'fixtures/no-such-file.csv', 'fixtures/corpus/binary-garbage.csv', 'fixtures', '/dev/zero', '/proc/self/environ'];
const CLI_VALUES = ['1e308', '-1e308', '5e-324', '1e9ft', '-99999ft', 'NaN', '', '\u001b[31m', '35000 ft', '0.8', '-0.5', '1e308kg', 'x'.repeat(300), 'maxCruise', '0', '400 kt'];
const CLI_VERBS: readonly (readonly string[])[] = [['air'], ['deck', 'at'], ['deck', 'check'], ['deck'], ['inlet'], ['fly'], ['nosuchverb'], []];
const CLI_OPTIONS = ['--altitude', '--mach', '--cas', '--tas', '--isa-dev', '--power', '--weight', '--top', '--step', '--design', '--json', '--help', '--nope'];

function commandLine(r: Rand): string[] {
  const argv = [...pick(r, CLI_VERBS)];
  if (r() < 0.7) argv.push(pick(r, CLI_FILES));
  const n = Math.floor(r() * 4);
  for (let k = 0; k < n; k++) {
    const option = pick(r, CLI_OPTIONS);
    argv.push(option === '--json' || option === '--help' ? option : `${option}=${pick(r, CLI_VALUES)}`);
  }
  return argv;
}

// ------------------------------------------------------------------ the run

describe('robustness generator', () => {
  it('10,000+ mutated and extreme decks, projects and command lines: 0 throws, 0 stack traces, 0 NaN, 0 negative fuel, 0 impossible-but-ok', async () => {
    const r = rng(20261202);
    const counts = { inputs: 0, decks: 0, decksLoaded: 0, projects: 0, missionsFlown: 0, statusNotOk: 0, commandLines: 0, throws: 0, stackTraces: 0, nan: 0, negativeFuel: 0, impossibleButOk: 0, internalErrors: 0 };
    const failures: string[] = [];
    const fail = (what: keyof typeof counts, detail: string) => {
      counts[what]++;
      if (failures.length < 10) failures.push(`${what}: ${detail}`);
    };

    const started = { decks: performance.now(), projects: 0, commandLines: 0 };
    for (let i = 0; i < 5500; i++) {
      counts.inputs++;
      counts.decks++;
      const text = mutateDeck(r);
      let deck: EngineDeck;
      try {
        const parsed = parseDeckCsv(text, 'generated.csv');
        if (!parsed.ok) continue;
        deck = parsed.value;
      } catch (e) {
        fail('throws', `parseDeckCsv: ${(e as Error).message}`);
        continue;
      }
      counts.decksLoaded++;
      for (const c of CONDITIONS) {
        try {
          const v = lookupDeck(deck, c, 1);
          if (!v.ok) continue;
          const values = [v.value.thrust_N, v.value.fuelFlow_kg_s, v.value.airflow_kg_s ?? 0];
          if (values.some((x) => !Number.isFinite(x))) fail('nan', `lookup at ${JSON.stringify(c)}`);
          if (values.some((x) => x < 0)) fail('negativeFuel', `negative deck output at ${JSON.stringify(c)}`);
        } catch (e) {
          fail('throws', `lookupDeck: ${(e as Error).message}`);
        }
      }
    }

    started.projects = performance.now();
    for (let i = 0; i < 3000; i++) {
      counts.inputs++;
      counts.projects++;
      const text = mutateProject(r);
      try {
        const parsed = parseProject(text, 'generated.blockwise.json');
        if (!parsed.ok) continue;
        const built = buildMissionInput(parsed.value, { deck: DEMO_DECK });
        if (!built.ok) continue;
        const input = built.value;
        const result = solveMission(input);
        counts.missionsFlown++;
        if (result.status !== 'ok') counts.statusNotOk++;
        if (result.status === 'internal_error') fail('internalErrors', result.statusMessage);
        const bad: string[] = [];
        nonFinite(result, 'result', bad);
        if (bad.length > 0) fail('nan', bad.slice(0, 3).join('; '));
        if (result.legs.length > 0) {
          const low = result.legs.find((row) => row.endMass_kg < result.zeroFuelMass_kg - 1e-6 || row.endMass_kg <= 0);
          if (low !== undefined) fail('negativeFuel', `${low.name}: ${low.endMass_kg} kg below zero-fuel ${result.zeroFuelMass_kg} kg (${result.status})`);
          for (let k = 0; k < result.history.mass_kg.length; k++) {
            if (result.history.mass_kg[k]! < result.zeroFuelMass_kg - 1e-6) {
              fail('negativeFuel', `history sample ${k}: ${result.history.mass_kg[k]} kg`);
              break;
            }
          }
        }
        const a = input.airframe;
        const impossible = impossibleButOk(result, a.mtow_kg, a.maxFuel_kg, a.mlw_kg);
        if (impossible !== null) fail('impossibleButOk', impossible);
        if (result.status !== 'ok' && result.statusMessage.trim() === '') fail('impossibleButOk', `status ${result.status} without a sentence`);
      } catch (e) {
        fail('throws', `project: ${(e as Error).message}`);
      }
    }

    started.commandLines = performance.now();
    for (let i = 0; i < 2000; i++) {
      counts.inputs++;
      counts.commandLines++;
      const argv = commandLine(r);
      let out = '';
      let err = '';
      try {
        const code = await runCli(argv, { out: (t) => (out += t), err: (t) => (err += t), cwd: repoRoot });
        if (!EXIT_CODES.includes(code) || code === 70) fail('throws', `exit ${code} for ${JSON.stringify(argv)}: ${err.slice(0, 200)}`);
        if (/\n\s+at .*:\d+:\d+/.test(err + out)) fail('stackTraces', JSON.stringify(argv));
        if (hasControlCharacters(out) || hasControlCharacters(err)) fail('stackTraces', `raw control characters for ${JSON.stringify(argv)}`);
        if (out.includes('NaN') || err.includes('NaN N')) fail('nan', `NaN printed for ${JSON.stringify(argv)}`);
      } catch (e) {
        fail('throws', `runCli ${JSON.stringify(argv)}: ${(e as Error).message}`);
      }
    }

    const end = performance.now();
    const seconds = (a: number, b: number) => `${((b - a) / 1000).toFixed(1)} s`;
    console.log(`robustness generator: ${JSON.stringify(counts)}`);
    console.log(`robustness generator time (not asserted): decks ${seconds(started.decks, started.projects)}, projects ${seconds(started.projects, started.commandLines)}, command lines ${seconds(started.commandLines, end)}`);
    expect(failures).toEqual([]);
    expect(counts.inputs).toBeGreaterThanOrEqual(10000);
    // Not vacuous: many decks load, many missions are flown, and a good share of them end with a status other than ok.
    expect(counts.decksLoaded).toBeGreaterThan(500);
    expect(counts.missionsFlown).toBeGreaterThan(600);
    expect(counts.statusNotOk).toBeGreaterThan(100);
  }, 600_000); // about 25 s of CPU; the generous limit is for a loaded machine, speed is not what this test checks
});
