import { SAFETY_NOTICE_LINES } from '../../../engine/core/notice';
import { describe, expect, it } from 'vitest';
import type { LegRow, MissionResult, TimeHistory } from '../../../engine/mission/missionTypes';
import { fileStem, historyCsv, legsCsv } from '../../../engine/study/resultsCsv';

/** RFC 4180 field splitter (quoted fields with doubled quotes), written here independently of the writer. */
function splitCsvLine(line: string): string[] {
  const out: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i]!;
    if (quoted) {
      if (ch === '"' && line[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      out.push(field);
      field = '';
    } else field += ch;
  }
  out.push(field);
  return out;
}

function result(): MissionResult {
  const n = 3;
  const col = (f: (i: number) => number) => Float64Array.from({ length: n }, (_, i) => f(i));
  const history: TimeHistory = {
    time_s: col((i) => i * 10),
    distance_m: col((i) => i * 1000),
    altitude_m: col((i) => i * 100),
    mach: col(() => 0.5),
    cas_m_s: col(() => 100),
    tas_m_s: col(() => 160),
    mass_kg: col((i) => 9000 - i),
    thrustAvailable_N: col(() => 20000),
    thrustUsed_N: col(() => 15000),
    drag_N: col(() => 14000),
    fuelFlow_kg_s: col(() => 0.25),
    cl: col(() => 0.45),
    liftToDrag: col((i) => (i === 1 ? Number.NaN : 15)),
    climbRate_m_s: col(() => 10),
    legIndex: Int32Array.from([0, 0, 1]),
  };
  const leg = (index: number, name: string, kind: LegRow['kind']): LegRow => ({
    index,
    name,
    kind,
    startTime_s: 0,
    endTime_s: 60,
    startDistance_m: 0,
    endDistance_m: 1000,
    startGroundDistance_m: 0,
    endGroundDistance_m: 1000,
    startAltitude_m: 0,
    endAltitude_m: 100,
    startMass_kg: 9000,
    endMass_kg: 8990,
    fuel_kg: 10,
  });
  return { history, legs: [leg(0, 'Climb, "fast"', 'climb'), leg(1, 'Final reserve', 'reserve')] } as unknown as MissionResult;
}

describe('historyCsv', () => {
  it('writes one row per sample with units in the headers; a non-finite value is an empty cell', () => {
    const all = historyCsv(result().history).trimEnd().split('\n');
    // The safety notice heads the file as # comment lines (DESIGN.md §7).
    expect(all.filter((l) => l.startsWith('# '))).toEqual(SAFETY_NOTICE_LINES.map((l) => `# ${l}`));
    const lines = all.filter((l) => !l.startsWith('#'));
    expect(lines).toHaveLength(4);
    const head = splitCsvLine(lines[0]!);
    expect(head[0]).toBe('time[s]');
    expect(head).toContain('fuel_flow[kg/s]');
    const row = splitCsvLine(lines[2]!);
    expect(row).toHaveLength(head.length);
    expect(Number(row[head.indexOf('distance[m]')])).toBe(1000);
    expect(row[head.indexOf('lift_to_drag[-]')]).toBe('');
    expect(Number(splitCsvLine(lines[3]!)[head.indexOf('leg[-]')])).toBe(1);
  });
});

describe('legsCsv', () => {
  it('quotes names with commas and quotes (RFC 4180) and numbers reserve rows R', () => {
    const all = legsCsv(result()).trimEnd().split('\n');
    expect(all[0]).toBe(`# ${SAFETY_NOTICE_LINES[0]}`);
    const lines = all.filter((l) => !l.startsWith('#'));
    const first = splitCsvLine(lines[1]!);
    expect(first.slice(0, 3)).toEqual(['1', 'Climb, "fast"', 'climb']);
    expect(splitCsvLine(lines[2]!)[0]).toBe('R');
    expect(splitCsvLine(lines[0]!)).toHaveLength(first.length);
  });
});

describe('fileStem', () => {
  it('drops the project extension', () => {
    expect(fileStem('demo.blockwise.json')).toBe('demo');
    expect(fileStem('other.json')).toBe('other');
    expect(fileStem('')).toBe('blockwise');
  });

  it('in display units: every dimensional column converted by the unit table and its header naming the unit; Mach, CL and the leg index as they are', () => {
    const r = result();
    const base = historyCsv(r.history).trimEnd().split('\n').filter((l) => !l.startsWith('#'));
    const shown = historyCsv(r.history, { display: 'customary' }).trimEnd().split('\n').filter((l) => !l.startsWith('#'));
    const head = shown[0]!.split(',');
    expect(head).toEqual(['time[h]', 'distance[nmi]', 'altitude[ft]', 'mach[-]', 'cas[kt]', 'tas[kt]', 'mass[lb]', 'thrust_available[lbf]', 'thrust_used[lbf]', 'drag[lbf]', 'fuel_flow[lb/h]', 'cl[-]', 'lift_to_drag[-]', 'climb_rate[ft/min]', 'leg[-]']);
    const b = base[2]!.split(',').map(Number);
    const c = shown[2]!.split(',').map(Number);
    // exact factors, NIST SP 811: ft 0.3048 m, nmi 1852 m, lb 0.45359237 kg, lbf 4.4482216152605 N, kt 1852/3600 m/s
    expect(c[0]).toBeCloseTo(b[0]! / 3600, 12);
    expect(c[1]).toBeCloseTo(b[1]! / 1852, 9);
    expect(c[2]).toBeCloseTo(b[2]! / 0.3048, 9);
    expect(c[3]).toBe(b[3]);
    expect(c[4]).toBeCloseTo(b[4]! / (1852 / 3600), 9);
    expect(c[6]).toBeCloseTo(b[6]! / 0.45359237, 9);
    expect(c[9]).toBeCloseTo(b[9]! / 4.4482216152605, 9);
    expect(c[10]).toBeCloseTo((b[10]! * 3600) / 0.45359237, 6);
    expect(c[13]).toBeCloseTo((b[13]! * 60) / 0.3048, 9);
    expect(c[14]).toBe(b[14]);
    const legs = legsCsv(r, { display: 'customary' }).trimEnd().split('\n').filter((l) => !l.startsWith('#'));
    expect(legs[0]).toBe('leg,name,kind,start_time[h],end_time[h],start_distance[nmi],end_distance[nmi],start_altitude[ft],end_altitude[ft],start_mass[lb],end_mass[lb],fuel[lb]');
    const legsBase = legsCsv(r).trimEnd().split('\n').filter((l) => !l.startsWith('#'));
    expect(legsBase[0]).toBe('leg,name,kind,start_time[s],end_time[s],start_distance[m],end_distance[m],start_altitude[m],end_altitude[m],start_mass[kg],end_mass[kg],fuel[kg]');
  });
});
