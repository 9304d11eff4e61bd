/** Every change to the study is one of these named actions (see studyReducer.ts). */
import type { Project, ProjectIssue, ProjectLeg } from '../../engine/project';
import type { UnitSystem } from '../../engine/units';
import type { FieldUnit } from './fieldUnits';
import type { LegKindName } from './legTemplates';
import type { DocPath } from './projectPath';
import type { DeckFile, Highlight } from './studyState';

export type StudyAction =
  /** `unsaved`: the text is not what is on disk (recovered work), so the document starts edited. */
  /** `embedDeck`: the file had its deck inside (saving keeps it there). */
  | { readonly type: 'projectOpened'; readonly project: Project; readonly name: string; readonly deckFile: DeckFile | null; readonly unsaved?: boolean; readonly embedDeck?: boolean }
  | { readonly type: 'projectOpenFailed'; readonly name: string; readonly issues: readonly ProjectIssue[] }
  | { readonly type: 'deckImported'; readonly deckFile: DeckFile }
  /** Text typed into a quantity field; accepted only when it parses and passes the project's rules. */
  | { readonly type: 'fieldEdited'; readonly path: DocPath; readonly text: string; readonly unit: FieldUnit; readonly label: string }
  /** A typed value set as is (choices, names, switches); `undefined` removes an optional field. */
  | { readonly type: 'valueSet'; readonly path: DocPath; readonly value: unknown; readonly label: string }
  | { readonly type: 'rowAdded'; readonly path: DocPath; readonly label: string }
  | { readonly type: 'rowRemoved'; readonly path: DocPath; readonly index: number; readonly label: string }
  | { readonly type: 'legAdded'; readonly kind: LegKindName }
  | { readonly type: 'legRemoved'; readonly index: number }
  | { readonly type: 'legDuplicated'; readonly index: number }
  | { readonly type: 'legMoved'; readonly index: number; readonly by: -1 | 1 }
  | { readonly type: 'legReplaced'; readonly index: number; readonly leg: ProjectLeg }
  | { readonly type: 'draftDiscarded'; readonly path: DocPath }
  | { readonly type: 'undo' }
  | { readonly type: 'redo' }
  | { readonly type: 'unitsChosen'; readonly units: UnitSystem }
  | { readonly type: 'highlighted'; readonly highlight: Highlight | null }
  | { readonly type: 'saved' }
  /** The save option: write the deck inside the project or not (not a document edit). */
  | { readonly type: 'embedDeckChosen'; readonly embed: boolean };
