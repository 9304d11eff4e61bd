/**
 * One entry per caution id the mission raises: title, severity, default
 * threshold (SI, matching DEFAULT_CAUTION_SETTINGS) and where the default
 * comes from. Cautions are data (DESIGN.md §7).
 */
import type { CautionSeverity } from './caution';
import { DEFAULT_CAUTION_SETTINGS } from './cautionSettings';

export type MissionCautionId =
  | 'residual_climb_low'
  | 'buffet_margin_low'
  | 'cl_above_clmax'
  | 'vmo_exceeded'
  | 'mmo_exceeded'
  | 'mtow_exceeded'
  | 'mlw_exceeded'
  | 'mzfw_exceeded'
  | 'fuel_capacity_exceeded'
  | 'reserve_below_minimum'
  | 'deck_extrapolation'
  | 'deck_output_floored'
  | 'throat_mach_high'
  | 'polar_table_clamped'
  | 'thrust_below_drag'
  | 'climb_not_reached'
  | 'descent_thrust_below_idle'
  | 'idle_thrust_above_drag'
  | 'alternate_too_short'
  | 'altitude_jump'
  | 'profile_altitude_limited'
  | 'still_air_distances'
  | 'cruise_climb_start_limited';

export interface CautionEntry {
  readonly id: MissionCautionId;
  readonly title: string;
  readonly severity: CautionSeverity;
  /** Default threshold in SI (null when the limit is an input such as MTOW). */
  readonly defaultThreshold: number | null;
  readonly unit: string;
  /** Where the default or the rule comes from. */
  readonly source: string;
}

const S = DEFAULT_CAUTION_SETTINGS;

export const CAUTION_CATALOGUE: Readonly<Record<MissionCautionId, CautionEntry>> = {
  residual_climb_low: {
    id: 'residual_climb_low',
    title: 'Residual climb rate at top of climb below the minimum',
    severity: 'caution',
    defaultThreshold: S.minResidualClimbRate_m_s,
    unit: 'm/s',
    source: '300 ft/min at the climb rating at top of climb, common practice',
  },
  buffet_margin_low: {
    id: 'buffet_margin_low',
    title: 'Load factor to buffet onset below the minimum',
    severity: 'caution',
    defaultThreshold: S.minBuffetLoadFactor,
    unit: '-',
    source: '1.3 g to buffet onset (about 40 degrees of bank), common practice',
  },
  cl_above_clmax: {
    id: 'cl_above_clmax',
    title: 'Lift coefficient above the maximum lift coefficient',
    severity: 'warning',
    defaultThreshold: null,
    unit: '-',
    source: 'CLmax of the drag polar (airframe input)',
  },
  vmo_exceeded: {
    id: 'vmo_exceeded',
    title: 'CAS above VMO less the set margin',
    severity: 'warning',
    defaultThreshold: S.vmoMargin_m_s,
    unit: 'm/s',
    source: 'VMO of the airframe input; margin 0 by default, common practice',
  },
  mmo_exceeded: {
    id: 'mmo_exceeded',
    title: 'Mach above MMO less the set margin',
    severity: 'warning',
    defaultThreshold: S.mmoMargin,
    unit: '-',
    source: 'MMO of the airframe input; margin 0 by default, common practice',
  },
  mtow_exceeded: {
    id: 'mtow_exceeded',
    title: 'Take-off mass above MTOW',
    severity: 'warning',
    defaultThreshold: null,
    unit: 'kg',
    source: 'MTOW of the airframe input',
  },
  mlw_exceeded: {
    id: 'mlw_exceeded',
    title: 'Landing mass above the maximum landing mass',
    severity: 'warning',
    defaultThreshold: null,
    unit: 'kg',
    source: 'Maximum landing mass of the airframe input',
  },
  mzfw_exceeded: {
    id: 'mzfw_exceeded',
    title: 'Zero-fuel mass above MZFW',
    severity: 'warning',
    defaultThreshold: null,
    unit: 'kg',
    source: 'MZFW of the airframe input',
  },
  fuel_capacity_exceeded: {
    id: 'fuel_capacity_exceeded',
    title: 'Fuel on board at block-out above the fuel capacity',
    severity: 'warning',
    defaultThreshold: null,
    unit: 'kg',
    source: 'Maximum fuel of the airframe input',
  },
  reserve_below_minimum: {
    id: 'reserve_below_minimum',
    title: "Fuel on board at landing below the reserve policy's minimum",
    severity: 'warning',
    defaultThreshold: S.minReserveFraction,
    unit: '-',
    source: 'The reserve preset (ICAO Annex 6 Part I 4.3.6.3, 14 CFR 121.639, 14 CFR 121.645(b) or custom); fraction 1.0 by default',
  },
  deck_extrapolation: {
    id: 'deck_extrapolation',
    title: 'Engine deck looked up outside its table',
    severity: 'caution',
    defaultThreshold: null,
    unit: '-',
    source: 'Passed through from the propulsion model, first time per leg',
  },
  deck_output_floored: {
    id: 'deck_output_floored',
    title: 'Extrapolated engine deck value below zero, read as zero',
    severity: 'warning',
    defaultThreshold: 0,
    unit: '-',
    source: 'A linear extrapolation off the table gave a negative thrust, fuel flow or airflow; it is floored at zero (no engine makes negative fuel flow or airflow)',
  },
  throat_mach_high: {
    id: 'throat_mach_high',
    title: 'Inlet throat Mach above the maximum',
    severity: 'caution',
    defaultThreshold: S.maxThroatMach,
    unit: '-',
    source: 'About 0.8 throat Mach, common practice in inlet sizing; also passed through from the propulsion model',
  },
  polar_table_clamped: {
    id: 'polar_table_clamped',
    title: 'Drag polar read outside its tables (clamped)',
    severity: 'caution',
    defaultThreshold: null,
    unit: '-',
    source: "The drag polar's out-of-range policy: clamped at the table edge; raised first time per leg",
  },
  thrust_below_drag: {
    id: 'thrust_below_drag',
    title: 'Thrust at the rating below the drag to be balanced',
    severity: 'warning',
    defaultThreshold: null,
    unit: 'N',
    source: 'Point-mass equilibrium (drag must be balanced by the rating thrust)',
  },
  climb_not_reached: {
    id: 'climb_not_reached',
    title: 'Climb could not reach its altitude',
    severity: 'warning',
    defaultThreshold: 0.508,
    unit: 'm/s',
    source: 'Climb stops where the climb rate falls below 100 ft/min (the service-ceiling rate), common practice',
  },
  descent_thrust_below_idle: {
    id: 'descent_thrust_below_idle',
    title: 'The set descent rate needs less than idle thrust',
    severity: 'info',
    defaultThreshold: null,
    unit: 'N',
    source: 'Idle thrust of the propulsion model; the rate is held and idle fuel flow used (drag devices assumed)',
  },
  idle_thrust_above_drag: {
    id: 'idle_thrust_above_drag',
    title: 'Level-flight drag below idle thrust',
    severity: 'info',
    defaultThreshold: null,
    unit: 'N',
    source: 'Idle thrust of the propulsion model; idle fuel flow used, the excess thrust assumed cancelled by drag devices',
  },
  alternate_too_short: {
    id: 'alternate_too_short',
    title: 'Alternate shorter than its climb and descent',
    severity: 'caution',
    defaultThreshold: null,
    unit: 'm',
    source: 'Alternate specification; its cruise is dropped and the distance flown is longer than specified',
  },
  altitude_jump: {
    id: 'altitude_jump',
    title: 'Leg starts away from the altitude the previous leg reached',
    severity: 'info',
    defaultThreshold: 1,
    unit: 'm',
    source: 'Leg input: cruise and hold legs fly at their own altitude; the change is not flown (beyond a small tolerance)',
  },
  profile_altitude_limited: {
    id: 'profile_altitude_limited',
    title: 'Cruise altitude held at a profile limit',
    severity: 'info',
    defaultThreshold: null,
    unit: 'm',
    source: 'Step or cruise-climb profile maximum altitude (input)',
  },
  still_air_distances: {
    id: 'still_air_distances',
    title: 'Distances flown in still air (design-range study)',
    severity: 'info',
    defaultThreshold: null,
    unit: 'm/s',
    source: 'Mission input distanceBasis "stillAir": the range, set cruise distances and the alternate are still-air distances; the wind changes only the ground distance, not the fuel or the time',
  },
  cruise_climb_start_limited: {
    id: 'cruise_climb_start_limited',
    title: 'Cruise-climb starts below its optimum, held by a cruise limit',
    severity: 'info',
    defaultThreshold: null,
    unit: 'm',
    source: 'Caution settings: the residual climb rate (default 300 ft/min, common practice) and the buffet margin (default 1.3 g, common practice) at the start level',
  },
};
