/**
 * The user-editable caution limits: project field, its default, unit and
 * where the default comes from (engine/cautions/cautionCatalogue.ts).
 */
import { CAUTION_CATALOGUE, DEFAULT_CAUTION_SETTINGS, type MissionCautionId } from '../../engine/cautions';
import type { Project } from '../../engine/project';
import type { FieldUnit } from './fieldUnits';

export type CautionLimitKey = Exclude<keyof Project['cautions'], 'cautionOnDeckExtrapolation'>;

export interface CautionLimit {
  readonly key: CautionLimitKey;
  readonly label: string;
  readonly unit: FieldUnit;
  readonly default_si: number;
  readonly source: string;
  readonly catalogueId: MissionCautionId | null;
}

const D = DEFAULT_CAUTION_SETTINGS;
const C = CAUTION_CATALOGUE;
const SPILLAGE_SOURCE = 'Spillage drag above about 5 % of thrust means the inlet is oversized for the airflow or the lip-suction assumption carries the answer; 5 % is our default, edit it to your practice';
const FAN_FACE_SOURCE = 'Fan-face Mach band of about 0.4 to 0.6, common practice';

export const CAUTION_LIMITS: readonly CautionLimit[] = [
  { key: 'minResidualClimbRate', label: 'Least residual climb rate at top of climb', unit: 'climbRate', default_si: D.minResidualClimbRate_m_s, source: C.residual_climb_low.source, catalogueId: 'residual_climb_low' },
  { key: 'minBuffetLoadFactor', label: 'Least load factor to buffet onset', unit: 'dimensionless', default_si: D.minBuffetLoadFactor, source: C.buffet_margin_low.source, catalogueId: 'buffet_margin_low' },
  { key: 'vmoMargin', label: 'Margin below VMO', unit: 'speed', default_si: D.vmoMargin_m_s, source: C.vmo_exceeded.source, catalogueId: 'vmo_exceeded' },
  { key: 'mmoMargin', label: 'Margin below MMO', unit: 'dimensionless', default_si: D.mmoMargin, source: C.mmo_exceeded.source, catalogueId: 'mmo_exceeded' },
  { key: 'minReserveFraction', label: "Least reserve, fraction of the rule's minimum", unit: 'dimensionless', default_si: D.minReserveFraction, source: C.reserve_below_minimum.source, catalogueId: 'reserve_below_minimum' },
  { key: 'maxThroatMach', label: 'Highest inlet throat Mach', unit: 'dimensionless', default_si: D.maxThroatMach, source: C.throat_mach_high.source, catalogueId: 'throat_mach_high' },
  { key: 'minFanFaceMach', label: 'Lowest fan-face Mach', unit: 'dimensionless', default_si: D.minFanFaceMach, source: FAN_FACE_SOURCE, catalogueId: null },
  { key: 'maxFanFaceMach', label: 'Highest fan-face Mach', unit: 'dimensionless', default_si: D.maxFanFaceMach, source: FAN_FACE_SOURCE, catalogueId: null },
  { key: 'maxSpillageShare', label: 'Largest spillage drag, share of thrust', unit: 'percent', default_si: D.maxSpillageShare, source: SPILLAGE_SOURCE, catalogueId: null },
];

/** Catalogue entries whose limit is an input elsewhere (MTOW, CLmax ...) rather than a threshold here. */
export function fixedCautions(): readonly (typeof C)[MissionCautionId][] {
  const editable = new Set(CAUTION_LIMITS.map((l) => l.catalogueId));
  return (Object.keys(C) as MissionCautionId[]).filter((id) => !editable.has(id)).map((id) => C[id]);
}
