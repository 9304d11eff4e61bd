/**
 * Pure caution checks. Each returns a draft (id, severity, message, value,
 * threshold) when its limit is crossed and null otherwise; the mission adds
 * where and when. A check fires strictly beyond its threshold: a value equal
 * to the threshold passes.
 */
import type { Caution } from './caution';
import { CAUTION_CATALOGUE, type MissionCautionId } from './cautionCatalogue';

export type CautionDraft = Caution & { readonly id: MissionCautionId };

function draft(id: MissionCautionId, message: string, value: number, threshold: number): CautionDraft {
  return { id, severity: CAUTION_CATALOGUE[id].severity, message, value, threshold };
}

const KT = 1852 / 3600;

/** CAS (m/s) above VMO less margin (m/s). */
export function checkVmo(cas_m_s: number, vmo_m_s: number, margin_m_s: number): CautionDraft | null {
  const limit = vmo_m_s - margin_m_s;
  return cas_m_s > limit
    ? draft('vmo_exceeded', `CAS ${(cas_m_s / KT).toFixed(1)} kt is above VMO less margin ${(limit / KT).toFixed(1)} kt.`, cas_m_s, limit)
    : null;
}

/** Mach (-) above MMO less margin (-). */
export function checkMmo(mach: number, mmo: number, margin: number): CautionDraft | null {
  const limit = mmo - margin;
  return mach > limit ? draft('mmo_exceeded', `Mach ${mach.toFixed(3)} is above MMO less margin ${limit.toFixed(3)}.`, mach, limit) : null;
}

/** CL (-) above CLmax (-). */
export function checkClMax(cl: number, clMax: number): CautionDraft | null {
  return cl > clMax ? draft('cl_above_clmax', `CL ${cl.toFixed(3)} is above CLmax ${clMax.toFixed(3)}.`, cl, clMax) : null;
}

/** Load factor to buffet onset (-) below the minimum (-). */
export function checkBuffetMargin(buffetLoadFactor: number, minLoadFactor: number): CautionDraft | null {
  return buffetLoadFactor < minLoadFactor
    ? draft(
        'buffet_margin_low',
        `Load factor to buffet onset ${buffetLoadFactor.toFixed(3)} g is below the minimum ${minLoadFactor.toFixed(3)} g.`,
        buffetLoadFactor,
        minLoadFactor,
      )
    : null;
}

/** Residual climb rate at top of climb (m/s) below the minimum (m/s). */
export function checkResidualClimb(climbRate_m_s: number, min_m_s: number): CautionDraft | null {
  const fpm = (v: number) => ((v / 0.3048) * 60).toFixed(0);
  return climbRate_m_s < min_m_s
    ? draft(
        'residual_climb_low',
        `Residual climb rate at top of climb ${fpm(climbRate_m_s)} ft/min is below the minimum ${fpm(min_m_s)} ft/min.`,
        climbRate_m_s,
        min_m_s,
      )
    : null;
}

function massCheck(id: MissionCautionId, what: string, mass_kg: number, limit_kg: number): CautionDraft | null {
  return mass_kg > limit_kg
    ? draft(id, `${what} ${mass_kg.toFixed(1)} kg is above the limit ${limit_kg.toFixed(1)} kg by ${(mass_kg - limit_kg).toFixed(1)} kg.`, mass_kg, limit_kg)
    : null;
}

/** Take-off mass (kg) above MTOW (kg). */
export function checkMtow(takeoffMass_kg: number, mtow_kg: number): CautionDraft | null {
  return massCheck('mtow_exceeded', 'Take-off mass', takeoffMass_kg, mtow_kg);
}

/** Landing mass (kg) above the maximum landing mass (kg). */
export function checkMlw(landingMass_kg: number, mlw_kg: number): CautionDraft | null {
  return massCheck('mlw_exceeded', 'Landing mass', landingMass_kg, mlw_kg);
}

/** Zero-fuel mass (kg) above MZFW (kg). */
export function checkMzfw(zeroFuelMass_kg: number, mzfw_kg: number): CautionDraft | null {
  return massCheck('mzfw_exceeded', 'Zero-fuel mass', zeroFuelMass_kg, mzfw_kg);
}

/** Fuel at block-out (kg) above the fuel capacity (kg). */
export function checkFuelCapacity(rampFuel_kg: number, maxFuel_kg: number): CautionDraft | null {
  return massCheck('fuel_capacity_exceeded', 'Fuel at block-out', rampFuel_kg, maxFuel_kg);
}

/** Fuel on board at landing (kg) below `fraction` (-) of the policy's reserve (kg). */
export function checkReserve(fuelAtLanding_kg: number, requiredReserve_kg: number, fraction: number): CautionDraft | null {
  const limit = requiredReserve_kg * fraction;
  return fuelAtLanding_kg < limit
    ? draft(
        'reserve_below_minimum',
        `Fuel on board at landing ${fuelAtLanding_kg.toFixed(1)} kg is below the required reserve ${limit.toFixed(1)} kg.`,
        fuelAtLanding_kg,
        limit,
      )
    : null;
}

/** Inlet throat Mach (-) above the maximum (-); null throat Mach (not computed) passes. */
export function checkThroatMach(throatMach: number | null, maxThroatMach: number): CautionDraft | null {
  return throatMach !== null && throatMach > maxThroatMach
    ? draft('throat_mach_high', `Inlet throat Mach ${throatMach.toFixed(3)} is above ${maxThroatMach.toFixed(3)}.`, throatMach, maxThroatMach)
    : null;
}

/** Thrust available (N) below the drag to balance (N). */
export function checkThrustBelowDrag(thrustAvailable_N: number, thrustRequired_N: number): CautionDraft | null {
  return thrustAvailable_N < thrustRequired_N
    ? draft(
        'thrust_below_drag',
        `Thrust at the rating ${thrustAvailable_N.toFixed(0)} N is below the ${thrustRequired_N.toFixed(0)} N required.`,
        thrustAvailable_N,
        thrustRequired_N,
      )
    : null;
}

/** The drag polar left one of its tables and clamped (names of the tables); empty passes. */
export function checkPolarClamped(outsideTables: readonly string[]): CautionDraft | null {
  return outsideTables.length > 0
    ? draft(
        'polar_table_clamped',
        `The drag polar was read outside its ${outsideTables.join(', ')} table${outsideTables.length > 1 ? 's' : ''} and clamped at the edge.`,
        outsideTables.length,
        0,
      )
    : null;
}

/** Level flight whose drag (N) is below idle thrust (N): flown at idle fuel flow as if the excess were cancelled (info). */
export function idleAboveDragCaution(drag_N: number, idleThrust_N: number): CautionDraft {
  return draft(
    'idle_thrust_above_drag',
    `Drag ${drag_N.toFixed(0)} N is below idle thrust ${idleThrust_N.toFixed(0)} N in level flight; idle fuel flow used (drag devices assumed).`,
    drag_N,
    idleThrust_N,
  );
}
