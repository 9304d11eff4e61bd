/** Read-only views of the study state for components (pure). */
import type { MissionResult } from '../../engine/mission';
import type { Project, ProjectIssue } from '../../engine/project';
import { formatQuantity, type UnitSystem } from '../../engine/units';
import { formatField, type FieldUnit } from './fieldUnits';
import { pathText, readAt, type DocPath } from './projectPath';
import type { StudyState } from './studyState';

export function selectProject(state: StudyState): Project | null {
  return state.doc?.present ?? null;
}

export function selectCanUndo(state: StudyState): boolean {
  return (state.doc?.past.length ?? 0) > 0;
}

export function selectCanRedo(state: StudyState): boolean {
  return (state.doc?.future.length ?? 0) > 0;
}

/** Label of the step Ctrl+Z would undo, or null. */
export function selectUndoLabel(state: StudyState): string | null {
  const past = state.doc?.past ?? [];
  return past.length > 0 ? past[past.length - 1]!.label : null;
}

/** True when the document changed since it was opened or saved. */
export function selectDirty(state: StudyState): boolean {
  if (state.doc === null) return false;
  return state.savedAtStep !== state.doc.past.length;
}

/** What a field shows: its rejected draft (with the message) or the document's value in display units. */
export function selectFieldView(
  state: StudyState,
  path: DocPath,
  unit: FieldUnit,
): { readonly text: string; readonly error: string | null } {
  const draft = state.drafts[pathText(path)];
  if (draft) return { text: draft.text, error: draft.message };
  const value = readAt(state.doc?.present, path);
  return { text: typeof value === 'number' ? formatField(value, unit, state.units) : '', error: null };
}

/** Issues of the present project at or below `prefix` (e.g. `airframe.weights`). */
export function selectIssuesUnder(state: StudyState, prefix: string): readonly ProjectIssue[] {
  return state.issues.filter((i) => i.path === prefix || i.path.startsWith(`${prefix}.`) || i.path.startsWith(`${prefix}[`));
}

export interface HeadlineFigure {
  readonly id: string;
  readonly label: string;
  readonly text: string;
}

/** The results view's headline figures, formatted in the unit system. */
export function selectHeadline(result: MissionResult, units: UnitSystem): readonly HeadlineFigure[] {
  return [
    { id: 'block-fuel', label: 'Block fuel', text: formatQuantity(result.blockFuel_kg, 'mass', units) },
    { id: 'block-time', label: 'Block time', text: formatQuantity(result.blockTime_s, 'time', units) },
    { id: 'trip-fuel', label: 'Trip fuel', text: formatQuantity(result.tripFuel_kg, 'mass', units) },
    { id: 'reserve-fuel', label: 'Reserve fuel', text: formatQuantity(result.reserveFuel_kg, 'mass', units) },
    { id: 'tow', label: 'Take-off mass', text: formatQuantity(result.takeoffMass_kg, 'mass', units) },
    { id: 'lw', label: 'Landing mass', text: formatQuantity(result.landingMass_kg, 'mass', units) },
    { id: 'zfw', label: 'Zero-fuel mass', text: formatQuantity(result.zeroFuelMass_kg, 'mass', units) },
    result.distanceBasis === 'ground'
      ? { id: 'distance', label: 'Ground distance', text: formatQuantity(result.groundDistance_m, 'distance', units) }
      : { id: 'distance', label: 'Still-air distance (design-range study)', text: formatQuantity(result.airDistance_m, 'distance', units) },
  ];
}
