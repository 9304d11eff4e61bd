/**
 * A PropulsionModel with a recovery offset and/or a fuel-flow scale applied
 * on top of another, for trade factors (+1 % recovery, +1 % TSFC).
 */
import { brent } from '../core/rootFind';
import { propulsionModelOf, type FlightCondition, type InstalledPoint, type PartPowerPoint, type PropulsionModel, type RatingName, type ThrustLimit } from '../propulsion/propulsionModel';

export interface PropulsionAdjustment {
  /** Added inlet total-pressure recovery (-), e.g. 0.01 for +1 %. */
  readonly recoveryDelta: number;
  /** Ram-recovery correction coefficient C_ram (-) of the installation (Raymer; 1.35 subsonic). */
  readonly cRam: number;
  /** Multiplier on fuel flow at a given thrust and power (-), e.g. 1.01 for +1 % TSFC. */
  readonly fuelFlowScale: number;
}

/** Power-setting tolerance of the adjusted part-power inversion (-). */
export const ADJUSTED_POWER_TOL = 1e-12;

/**
 * Wraps `base`: installed thrust gains engineCount * C_ram * dEta * T_deck
 * per Raymer's ram-recovery correction (thrust loss = C_ram (eta_ref - eta),
 * Aircraft Design: A Conceptual Approach, installed thrust), with fuel flow
 * held at the power setting; fuel flow and TSFC are multiplied by
 * fuelFlowScale. The engine airflow's own change with recovery (and so
 * spillage and bleed fraction) is not followed: a first-order model of the
 * recovery change. Part power is re-solved on the adjusted thrust by Brent's
 * method between flight idle and the ceiling rating.
 */
export function adjustPropulsion(base: PropulsionModel, adj: PropulsionAdjustment): PropulsionModel {
  const adjust = (p: InstalledPoint): InstalledPoint => {
    const perEngineGain = adj.cRam * adj.recoveryDelta * p.perEngine.uninstalledThrust_N;
    return adjustedPoint(p, p.thrust_N + base.engineCount * perEngineGain, p.fuelFlow_kg_s * adj.fuelFlowScale, perEngineGain, adj);
  };
  const atPower = (c: FlightCondition, power: number) => adjust(base.atPower(c, power));
  // Without a recovery change the part-power point is base's with its fuel flow scaled: so is its fuel flow alone.
  const baseFuelFlow = adj.recoveryDelta === 0 ? base.fuelFlowForThrust?.bind(base) : undefined;
  return propulsionModelOf({
    engineCount: base.engineCount,
    label: base.label,
    parametric: base.parametric,
    inletName: base.inletName,
    // A wrapper states no slope breaks of its own (as before the one model shape: the key was absent).
    slopeBreaks: undefined,
    installationMethod: base.installationMethod,
    atRating: (c, r) => adjust(base.atRating(c, r)),
    atPower,
    forThrust(c: FlightCondition, required: number, ceilingRating: RatingName = 'maxCruise'): PartPowerPoint {
      if (adj.recoveryDelta === 0) {
        const p = base.forThrust(c, required, ceilingRating);
        return atLimit(adjust(p), p.limit, p.thrustRequired_N);
      }
      const lo = base.atRating(c, 'flightIdle').power;
      const hi = base.atRating(c, ceilingRating).power;
      const top = atPower(c, hi);
      if (top.thrust_N < required) return atLimit(top, 'above_rating', required);
      const idle = atPower(c, lo);
      if (idle.thrust_N > required) return atLimit(idle, 'below_idle', required);
      const root = brent((p) => atPower(c, p).thrust_N - required, lo, hi, { xTol: ADJUSTED_POWER_TOL });
      if (!root.ok) {
        // Bracketed and finite at both ends: only a non-finite lookup inside can fail; report the nearer end.
        return atLimit(top, 'above_rating', required);
      }
      return atLimit(atPower(c, root.value.x), 'within', required);
    },
    fuelFlowForThrust:
      baseFuelFlow === undefined
        ? undefined
        : (c: FlightCondition, required: number, ceilingRating: RatingName = 'maxCruise') => baseFuelFlow(c, required, ceilingRating) * adj.fuelFlowScale,
    withRecoveryOffset: undefined,
  });
}

/**
 * `p` adjusted: whole-aircraft thrust and fuel flow (and so TSFC) as given, per engine the thrust gain, the fuel-flow
 * scale and the recovery change applied. Written key by key in the order of the installed model's points
 * (engineEvaluation.ts assembleInstalledPoint): a spread copy has a shape of its own, and the mission's reads of a
 * point went polymorphic once a wrapped model had flown in the process.
 */
function adjustedPoint(p: InstalledPoint, thrust_N: number, fuelFlow_kg_s: number, perEngineGain: number, adj: PropulsionAdjustment): InstalledPoint {
  const e = p.perEngine;
  return {
    altitude_m: p.altitude_m,
    mach: p.mach,
    isaDev_K: p.isaDev_K,
    power: p.power,
    thrust_N,
    fuelFlow_kg_s,
    tsfc_kg_N_s: thrust_N > 0 ? fuelFlow_kg_s / thrust_N : null,
    perEngine: {
      uninstalledThrust_N: e.uninstalledThrust_N,
      uninstalledFuelFlow_kg_s: e.uninstalledFuelFlow_kg_s,
      correctedThrust_N: e.correctedThrust_N + perEngineGain,
      spillageDrag_N: e.spillageDrag_N,
      thrust_N: e.thrust_N + perEngineGain,
      fuelFlow_kg_s: e.fuelFlow_kg_s * adj.fuelFlowScale,
      airflow_kg_s: e.airflow_kg_s,
      recovery: e.recovery + adj.recoveryDelta,
      referenceRecovery: e.referenceRecovery,
      massFlowRatio: e.massFlowRatio,
      throatMach: e.throatMach,
      fanFaceMach: e.fanFaceMach,
      installationMethod: e.installationMethod,
      recoveryLoss_N: e.recoveryLoss_N,
      bleedLoss_N: e.bleedLoss_N,
      extractionLoss_N: e.extractionLoss_N,
    },
    outsideTable: p.outsideTable,
    cautions: p.cautions,
  };
}

/** A part-power point of `point`, a fresh point of this module: its two fields are added as the installed model adds them (the same shape). */
function atLimit(point: InstalledPoint, limit: ThrustLimit, thrustRequired_N: number): PartPowerPoint {
  const out = point as InstalledPoint & { limit: ThrustLimit; thrustRequired_N: number };
  out.limit = limit;
  out.thrustRequired_N = thrustRequired_N;
  return out;
}
