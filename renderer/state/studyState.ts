/**
 * The renderer's state: the project document with its undo history, the
 * deck file it uses, the unit system (display only), field drafts that did
 * not parse, and what the results view highlights.
 */
import type { Project, ProjectIssue } from '../../engine/project';
import type { UnitSystem } from '../../engine/units';
import type { Undoable } from './undoHistory';

/** A deck file as read (the worker parses it). */
export interface DeckFile {
  readonly name: string;
  readonly text: string;
}

/** Text typed into a field that was not accepted, and why. */
export interface FieldDraft {
  readonly text: string;
  readonly message: string;
}

/** A leg and mission time the results view points at (from a clicked caution). */
export interface Highlight {
  readonly legIndex: number | null;
  readonly time_s: number | null;
}

export interface StudyState {
  /** Null until a project is opened. */
  readonly doc: Undoable<Project> | null;
  readonly documentName: string;
  /** Counts the documents opened: a new value means the figures on screen belong to another project. */
  readonly documentKey: number;
  readonly deckFile: DeckFile | null;
  readonly units: UnitSystem;
  /** Rejected field texts by JSON path text (`airframe.weights.maxTakeoff`). */
  readonly drafts: Readonly<Record<string, FieldDraft>>;
  /** Whole-document issues of the present project (cross-field rules), from the project validator. */
  readonly issues: readonly ProjectIssue[];
  /** Issues of the last project that failed to open (the open project stays). */
  readonly openIssues: readonly ProjectIssue[];
  /** Number of undo steps at the last save (null: never saved). */
  readonly savedAtStep: number | null;
  readonly highlight: Highlight | null;
  /**
   * Whether saving writes the deck file's text inside the project
   * (`engine.deck.text`): null follows the host (the browser build embeds, the
   * desktop writes the reference only); a project opened with its deck inside keeps
   * it. Chosen per document: opening another project starts again from the host's way.
   */
  readonly embedDeck: boolean | null;
}

export function emptyStudy(): StudyState {
  return {
    doc: null,
    documentName: '',
    documentKey: 0,
    deckFile: null,
    units: 'customary',
    drafts: {},
    issues: [],
    openIssues: [],
    savedAtStep: null,
    highlight: null,
    embedDeck: null,
  };
}
