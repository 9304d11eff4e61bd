/**
 * A PropulsionModel with a recovery offset and/or a fuel-flow scale applied
 * on top of another, for trade factors (+1 % recovery, +1 % TSFC).
 */
import { brent } from '../core/rootFind';
import type { FlightCondition, InstalledPoint, PartPowerPoint, PropulsionModel, RatingName } from '../propulsion/propulsionModel';

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
    const thrust_N = p.thrust_N + base.engineCount * perEngineGain;
    const fuelFlow_kg_s = p.fuelFlow_kg_s * adj.fuelFlowScale;
    return {
      ...p,
      thrust_N,
      fuelFlow_kg_s,
      tsfc_kg_N_s: thrust_N > 0 ? fuelFlow_kg_s / thrust_N : null,
      perEngine: {
        ...p.perEngine,
        correctedThrust_N: p.perEngine.correctedThrust_N + perEngineGain,
        thrust_N: p.perEngine.thrust_N + perEngineGain,
        fuelFlow_kg_s: p.perEngine.fuelFlow_kg_s * adj.fuelFlowScale,
        recovery: p.perEngine.recovery + adj.recoveryDelta,
      },
    };
  };
  const atPower = (c: FlightCondition, power: number) => adjust(base.atPower(c, power));
  // Without a recovery change the part-power point is base's with its fuel flow scaled: so is its fuel flow alone.
  const baseFuelFlow = adj.recoveryDelta === 0 ? base.fuelFlowForThrust?.bind(base) : undefined;
  return {
    engineCount: base.engineCount,
    label: base.label,
    parametric: base.parametric,
    inletName: base.inletName,
    installationMethod: base.installationMethod,
    atRating: (c, r) => adjust(base.atRating(c, r)),
    atPower,
    forThrust(c: FlightCondition, required: number, ceilingRating: RatingName = 'maxCruise'): PartPowerPoint {
      if (adj.recoveryDelta === 0) {
        const p = base.forThrust(c, required, ceilingRating);
        return { ...adjust(p), limit: p.limit, thrustRequired_N: p.thrustRequired_N };
      }
      const lo = base.atRating(c, 'flightIdle').power;
      const hi = base.atRating(c, ceilingRating).power;
      const top = atPower(c, hi);
      if (top.thrust_N < required) return { ...top, limit: 'above_rating', thrustRequired_N: required };
      const idle = atPower(c, lo);
      if (idle.thrust_N > required) return { ...idle, limit: 'below_idle', thrustRequired_N: required };
      const root = brent((p) => atPower(c, p).thrust_N - required, lo, hi, { xTol: ADJUSTED_POWER_TOL });
      if (!root.ok) {
        // Bracketed and finite at both ends: only a non-finite lookup inside can fail; report the nearer end.
        return { ...top, limit: 'above_rating', thrustRequired_N: required };
      }
      return { ...atPower(c, root.value.x), limit: 'within', thrustRequired_N: required };
    },
    ...(baseFuelFlow === undefined
      ? {}
      : { fuelFlowForThrust: (c: FlightCondition, required: number, ceilingRating: RatingName = 'maxCruise') => baseFuelFlow(c, required, ceilingRating) * adj.fuelFlowScale }),
  };
}
