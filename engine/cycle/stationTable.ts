/**
 * The station table of an engine state: per station its mass flow, total
 * temperature and total pressure, and at the nozzle exits the static
 * state, velocity, Mach number and area. Station numbers as in cycleSpec.ts.
 */
import type { CycleState } from './cycleState';
import type { NozzleState } from './nozzleExit';

export interface StationRow {
  /** Trade station number ("0", "2", "13", "25", "3", "31", "4", "45", "5", "8", "9", "18", "19"). */
  readonly station: string;
  readonly name: string;
  readonly massFlow_kg_s: number;
  readonly totalTemperature_K: number;
  readonly totalPressure_Pa: number;
  /** Static values, only at the free stream and the nozzle exits (null elsewhere). */
  readonly staticTemperature_K: number | null;
  readonly staticPressure_Pa: number | null;
  readonly velocity_m_s: number | null;
  readonly mach: number | null;
  readonly area_m2: number | null;
}

function row(station: string, name: string, massFlow_kg_s: number, tt: number, pt: number): StationRow {
  return { station, name, massFlow_kg_s, totalTemperature_K: tt, totalPressure_Pa: pt, staticTemperature_K: null, staticPressure_Pa: null, velocity_m_s: null, mach: null, area_m2: null };
}

function exitRow(station: string, name: string, massFlow_kg_s: number, tt: number, pt: number, n: NozzleState): StationRow {
  return {
    ...row(station, name, massFlow_kg_s, tt, pt),
    staticTemperature_K: n.exitStaticTemperature_K,
    staticPressure_Pa: n.exitStaticPressure_Pa,
    velocity_m_s: n.exitVelocity_m_s,
    mach: n.exitMach,
    area_m2: n.exitArea_m2,
  };
}

/** Every station of the state, free stream to nozzle exits; the bypass rows only for a turbofan. */
export function stationTable(s: CycleState): readonly StationRow[] {
  const f = s.free;
  const v = s.variables;
  const core = v.coreFlow_kg_s;
  const m4 = s.turbineFlow_kg_s;
  const rows: StationRow[] = [
    {
      ...row('0', 'free stream', s.totalFlow_kg_s, f.tt0_K, f.pt0_Pa),
      staticTemperature_K: f.t0_K,
      staticPressure_Pa: f.p0_Pa,
      velocity_m_s: f.velocity_m_s,
      mach: f.mach,
    },
    row('2', 'fan face', s.totalFlow_kg_s, s.tt2_K, s.pt2_Pa),
    row('21', 'fan exit, core side', core, s.tt13_K, s.pt13_Pa),
    row('25', 'compressor inlet', core, s.tt13_K, s.pt25_Pa),
    row('3', 'compressor exit', core, s.tt3_K, s.pt3_Pa),
    row('31', 'burner inlet (after bleed)', s.burnerAirFlow_kg_s, s.tt3_K, s.pt3_Pa),
    row('4', 'HP turbine inlet', m4, v.tt4_K, s.pt4_Pa),
    row('45', 'LP turbine inlet', m4, s.tt45_K, s.pt45_Pa),
    row('5', 'LP turbine exit', m4, s.tt5_K, s.pt5_Pa),
    row('8', 'core nozzle throat', m4, s.tt5_K, s.pt8_Pa),
    exitRow('9', 'core nozzle exit', m4, s.tt5_K, s.pt8_Pa, s.coreNozzle),
  ];
  if (s.bypassFlow_kg_s > 0) {
    rows.push(
      row('13', 'fan exit, bypass side', s.bypassFlow_kg_s, s.tt13_K, s.pt13_Pa),
      row('18', 'bypass nozzle throat', s.bypassFlow_kg_s, s.tt13_K, s.pt18_Pa),
      exitRow('19', 'bypass nozzle exit', s.bypassFlow_kg_s, s.tt13_K, s.pt18_Pa, s.bypassNozzle),
    );
  }
  return rows;
}
