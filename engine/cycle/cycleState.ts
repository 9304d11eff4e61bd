/**
 * The whole engine's state for one set of cycle variables: every station's
 * total temperature and pressure, the flows, the component powers and the
 * thrust. Both the design point (designPoint.ts) and the matched off-design
 * point (offDesign.ts) evaluate the engine through this one function; they
 * differ only in how they choose the variables. Relations: Mattingly,
 * Elements of Propulsion, parametric cycle analysis of real engines (the
 * separate-exhaust turbofan: polytropic component relations, burner energy
 * balance, spool power balances, nozzle exit states) with customer bleed
 * and HP power extraction as in Mattingly, Elements of Gas Turbine
 * Propulsion (bleed leaving at the compressor exit; power take-off on the
 * HP shaft).
 */
import type { CycleComponents, NozzleType } from './cycleSpec';
import type { FreeStream } from './freeStream';
import { compressorPressureRatio, turbineExpansionRatio, type Gas } from './gasProperties';
import { nozzleExit, type NozzleState } from './nozzleExit';

/** What the evaluation needs from the spec (fixed for an engine). */
export interface CycleConstants {
  readonly cold: Gas;
  readonly hot: Gas;
  readonly components: CycleComponents;
  readonly nozzles: { readonly core: NozzleType; readonly bypass: NozzleType };
  readonly heatingValue_J_kg: number;
  readonly fuelMassInCore: boolean;
}

/** The cycle variables: everything the station values follow from. */
export interface CycleVariables {
  /** Fan-face over free-stream total pressure. */
  readonly recovery: number;
  /** Tt13/Tt2. */
  readonly tauFan: number;
  /** Tt3/Tt25 (the HP compressor). */
  readonly tauCompressor: number;
  readonly tt4_K: number;
  /** Tt45/Tt4. */
  readonly tauHpt: number;
  /** Tt5/Tt45. */
  readonly tauLpt: number;
  /** Core flow entering the compressor, station 25 (kg/s). */
  readonly coreFlow_kg_s: number;
  readonly bypassRatio: number;
  /** Customer bleed off station 3 as a fraction of the core flow. */
  readonly bleedFraction: number;
  readonly powerExtraction_W: number;
}

export interface CycleState {
  readonly free: FreeStream;
  readonly variables: CycleVariables;
  readonly tt2_K: number;
  readonly pt2_Pa: number;
  readonly fanPressureRatio: number;
  readonly tt13_K: number;
  readonly pt13_Pa: number;
  readonly pt18_Pa: number;
  readonly pt25_Pa: number;
  readonly compressorPressureRatio: number;
  readonly tt3_K: number;
  readonly pt3_Pa: number;
  readonly pt4_Pa: number;
  readonly hptExpansionRatio: number;
  readonly tt45_K: number;
  readonly pt45_Pa: number;
  readonly lptExpansionRatio: number;
  readonly tt5_K: number;
  readonly pt5_Pa: number;
  readonly pt8_Pa: number;
  readonly totalFlow_kg_s: number;
  readonly bypassFlow_kg_s: number;
  readonly bleedFlow_kg_s: number;
  /** Air entering the burner, station 31 (kg/s). */
  readonly burnerAirFlow_kg_s: number;
  /** Fuel over burner air. */
  readonly fuelAirRatio: number;
  readonly fuelFlow_kg_s: number;
  /** Flow through the turbines and core nozzle (kg/s): burner air plus fuel when its mass is carried. */
  readonly turbineFlow_kg_s: number;
  readonly fanPower_W: number;
  readonly compressorPower_W: number;
  readonly hptPower_W: number;
  readonly lptPower_W: number;
  readonly coreNozzle: NozzleState;
  readonly bypassNozzle: NozzleState;
  readonly ramDrag_N: number;
  readonly thrust_N: number;
  /** False when a variable puts the engine where the relations do not hold (reason says which). */
  readonly valid: boolean;
  readonly reason: string;
}

/** Highest turbine inlet temperature the constant-property relations are used to (K): near-stoichiometric beyond. */
export const MAX_CYCLE_TT4_K = 2500;

function positiveFinite(...xs: readonly number[]): boolean {
  for (const x of xs) if (!(x > 0) || !Number.isFinite(x)) return false;
  return true;
}

/** The engine's state for the given variables at the free-stream condition (SI throughout). */
export function evaluateCycle(c: CycleConstants, free: FreeStream, v: CycleVariables): CycleState {
  const { cold, hot, components: k } = c;
  const tt2 = free.tt0_K;
  const pt2 = free.pt0_Pa * v.recovery;
  const piF = compressorPressureRatio(cold, v.tauFan, k.fanPolytropicEfficiency);
  const tt13 = tt2 * v.tauFan;
  const pt13 = pt2 * piF;
  const pt18 = pt13 * k.bypassDuctPressureRatio;
  const pt25 = pt13 * k.interCompressorDuctPressureRatio;
  const piC = compressorPressureRatio(cold, v.tauCompressor, k.compressorPolytropicEfficiency);
  const tt3 = tt13 * v.tauCompressor;
  const pt3 = pt25 * piC;
  const core = v.coreFlow_kg_s;
  const bypass = core * v.bypassRatio;
  const total = core + bypass;
  const bleed = core * v.bleedFraction;
  const m31 = core - bleed;
  const h = c.heatingValue_J_kg;
  const f = c.fuelMassInCore
    ? (hot.cp * v.tt4_K - cold.cp * tt3) / (k.burnerEfficiency * h - hot.cp * v.tt4_K)
    : (hot.cp * v.tt4_K - cold.cp * tt3) / (k.burnerEfficiency * h);
  const fuel = f * m31;
  const m4 = c.fuelMassInCore ? m31 + fuel : m31;
  const pt4 = pt3 * k.burnerPressureRatio;
  const prH = turbineExpansionRatio(hot, v.tauHpt, k.hpTurbinePolytropicEfficiency);
  const tt45 = v.tt4_K * v.tauHpt;
  const pt45 = pt4 / prH;
  const prL = turbineExpansionRatio(hot, v.tauLpt, k.lpTurbinePolytropicEfficiency);
  const tt5 = tt45 * v.tauLpt;
  const pt5 = pt45 / prL;
  const pt8 = pt5 * k.coreNozzlePressureRatio;
  const p0 = free.p0_Pa;
  const coreNozzle = nozzleExit(hot, c.nozzles.core, m4, tt5, pt8, p0);
  const bypassNozzle = nozzleExit(cold, c.nozzles.bypass, bypass, tt13, pt18, p0);
  const ramDrag = total * free.velocity_m_s;
  const thrust = coreNozzle.grossThrust_N + bypassNozzle.grossThrust_N - ramDrag;
  let reason = '';
  if (!positiveFinite(v.tauFan, v.tauCompressor, v.tauHpt, v.tauLpt, core, pt5, tt5)) reason = 'a temperature or pressure ratio left the physical range';
  else if (v.tauFan < 1 || v.tauCompressor < 1) reason = 'a compressor would expand the flow';
  else if (v.tauHpt > 1 || v.tauLpt > 1) reason = 'a turbine would compress the flow';
  else if (!(f >= 0) || !Number.isFinite(f) || !(k.burnerEfficiency * h > hot.cp * v.tt4_K)) reason = 'the turbine inlet temperature is below the compressor exit temperature (no fuel to burn)';
  else if (v.tt4_K > MAX_CYCLE_TT4_K) reason = `the turbine inlet temperature would pass ${MAX_CYCLE_TT4_K} K`;
  else if (!(v.bypassRatio >= 0)) reason = 'the bypass ratio went negative';
  else if (!(m31 > 0)) reason = 'the bleed takes the whole core flow';
  return {
    free,
    variables: v,
    tt2_K: tt2,
    pt2_Pa: pt2,
    fanPressureRatio: piF,
    tt13_K: tt13,
    pt13_Pa: pt13,
    pt18_Pa: pt18,
    pt25_Pa: pt25,
    compressorPressureRatio: piC,
    tt3_K: tt3,
    pt3_Pa: pt3,
    pt4_Pa: pt4,
    hptExpansionRatio: prH,
    tt45_K: tt45,
    pt45_Pa: pt45,
    lptExpansionRatio: prL,
    tt5_K: tt5,
    pt5_Pa: pt5,
    pt8_Pa: pt8,
    totalFlow_kg_s: total,
    bypassFlow_kg_s: bypass,
    bleedFlow_kg_s: bleed,
    burnerAirFlow_kg_s: m31,
    fuelAirRatio: f,
    fuelFlow_kg_s: fuel,
    turbineFlow_kg_s: m4,
    fanPower_W: total * cold.cp * (tt13 - tt2),
    compressorPower_W: core * cold.cp * (tt3 - tt13),
    hptPower_W: m4 * hot.cp * (v.tt4_K - tt45),
    lptPower_W: m4 * hot.cp * (tt45 - tt5),
    coreNozzle,
    bypassNozzle,
    ramDrag_N: ramDrag,
    thrust_N: thrust,
    valid: reason === '',
    reason,
  };
}
