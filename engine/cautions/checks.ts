/**
 * Pure caution checks. Each returns a draft (id, severity, message, value,
 * threshold) when its limit is crossed and null otherwise; the mission adds
 * where and when. A check fires strictly beyond its threshold: a value equal
 * to the threshold passes.
 */
import { messageText, msg, q, type MessageParts } from '../units/messageParts';
import type { Caution } from './caution';
import { CAUTION_CATALOGUE, type MissionCautionId } from './cautionCatalogue';

export type CautionDraft = Caution & { readonly id: MissionCautionId };

/**
 * A draft with its message text worked out at its first read (an enumerable getter, in the message's place among
 * the keys: a spread, JSON and a structured clone read it as a field): a mission raises a caution on every fuel
 * pass, and only the converged pass's are read; formatting the quantities in two unit systems is the costly part.
 */
function draft(id: MissionCautionId, parts: MessageParts, value: number, threshold: number): CautionDraft {
  let text: string | undefined;
  return {
    id,
    severity: CAUTION_CATALOGUE[id].severity,
    get message(): string {
      return (text ??= messageText(parts, 'both'));
    },
    parts,
    value,
    threshold,
  };
}

/** CAS (m/s) above VMO less margin (m/s). */
export function checkVmo(cas_m_s: number, vmo_m_s: number, margin_m_s: number): CautionDraft | null {
  const limit = vmo_m_s - margin_m_s;
  return cas_m_s > limit
    ? draft('vmo_exceeded', msg`CAS ${q(cas_m_s, 'speed')} is above VMO less margin ${q(limit, 'speed')}.`, cas_m_s, limit)
    : null;
}

/** Mach (-) above MMO less margin (-). */
export function checkMmo(mach: number, mmo: number, margin: number): CautionDraft | null {
  const limit = mmo - margin;
  return mach > limit ? draft('mmo_exceeded', msg`Mach ${q(mach, 'mach')} is above MMO less margin ${q(limit, 'mach')}.`, mach, limit) : null;
}

/** CL (-) above CLmax (-). */
export function checkClMax(cl: number, clMax: number): CautionDraft | null {
  return cl > clMax ? draft('cl_above_clmax', msg`CL ${q(cl, 'coefficient')} is above CLmax ${q(clMax, 'coefficient')}.`, cl, clMax) : null;
}

/** Load factor to buffet onset (-) below the minimum (-). */
export function checkBuffetMargin(buffetLoadFactor: number, minLoadFactor: number): CautionDraft | null {
  return buffetLoadFactor < minLoadFactor
    ? draft(
        'buffet_margin_low',
        msg`Load factor to buffet onset ${q(buffetLoadFactor, 'loadFactor')} is below the minimum ${q(minLoadFactor, 'loadFactor')}.`,
        buffetLoadFactor,
        minLoadFactor,
      )
    : null;
}

/** Residual climb rate at top of climb (m/s) below the minimum (m/s). */
export function checkResidualClimb(climbRate_m_s: number, min_m_s: number): CautionDraft | null {
  return climbRate_m_s < min_m_s
    ? draft(
        'residual_climb_low',
        msg`Residual climb rate at top of climb ${q(climbRate_m_s, 'climbRate')} is below the minimum ${q(min_m_s, 'climbRate')}.`,
        climbRate_m_s,
        min_m_s,
      )
    : null;
}

function massCheck(id: MissionCautionId, what: string, mass_kg: number, limit_kg: number): CautionDraft | null {
  return mass_kg > limit_kg
    ? draft(id, msg`${what} ${q(mass_kg, 'mass')} is above the limit ${q(limit_kg, 'mass')} by ${q(mass_kg - limit_kg, 'mass')}.`, mass_kg, limit_kg)
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
        msg`Fuel on board at landing ${q(fuelAtLanding_kg, 'mass')} is below the required reserve ${q(limit, 'mass')}.`,
        fuelAtLanding_kg,
        limit,
      )
    : null;
}

/** Inlet throat Mach (-) above the maximum (-); null throat Mach (not computed) passes. */
export function checkThroatMach(throatMach: number | null, maxThroatMach: number): CautionDraft | null {
  return throatMach !== null && throatMach > maxThroatMach
    ? draft('throat_mach_high', msg`Inlet throat Mach ${q(throatMach, 'mach')} is above ${q(maxThroatMach, 'mach')}.`, throatMach, maxThroatMach)
    : null;
}

/** Thrust available (N) below the drag to balance (N). */
export function checkThrustBelowDrag(thrustAvailable_N: number, thrustRequired_N: number): CautionDraft | null {
  return thrustAvailable_N < thrustRequired_N
    ? draft(
        'thrust_below_drag',
        msg`Thrust at the rating ${q(thrustAvailable_N, 'force')} is below the ${q(thrustRequired_N, 'force')} required.`,
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
        msg`The drag polar was read outside its ${outsideTables.join(', ')} table${outsideTables.length > 1 ? 's' : ''} and clamped at the edge.`,
        outsideTables.length,
        0,
      )
    : null;
}

/** Level flight whose drag (N) is below idle thrust (N): flown at idle fuel flow as if the excess were cancelled (info). */
export function idleAboveDragCaution(drag_N: number, idleThrust_N: number): CautionDraft {
  return draft(
    'idle_thrust_above_drag',
    msg`Drag ${q(drag_N, 'force')} is below idle thrust ${q(idleThrust_N, 'force')} in level flight; idle fuel flow used (drag devices assumed).`,
    drag_N,
    idleThrust_N,
  );
}
