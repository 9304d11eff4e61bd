/**
 * The one table of mission-leg kinds a project may hold, in flight order, with
 * the label people read. Typed with `satisfies Record<ProjectLegKind, ...>`, so a
 * kind added to the leg schema (projectSchema.ts) and missing here, or listed
 * here and missing there, is a type error.
 */
import type { ProjectLeg } from './projectSchema';

export type ProjectLegKind = ProjectLeg['kind'];

export interface LegKindInfo {
  /** Our label for the kind (leg names default to it). */
  readonly label: string;
}

export const LEG_KINDS = {
  taxiOut: { label: 'Taxi out' },
  takeoff: { label: 'Takeoff' },
  climb: { label: 'Climb' },
  cruise: { label: 'Cruise' },
  descent: { label: 'Descent' },
  hold: { label: 'Hold' },
  approach: { label: 'Approach' },
  taxiIn: { label: 'Taxi in' },
} as const satisfies Readonly<Record<ProjectLegKind, LegKindInfo>>;

/** The kinds in flight order (the table's order). */
export const LEG_KIND_ORDER: readonly ProjectLegKind[] = Object.keys(LEG_KINDS) as ProjectLegKind[];

/** The label of a leg kind. */
export function legKindLabel(kind: ProjectLegKind): string {
  return LEG_KINDS[kind].label;
}
